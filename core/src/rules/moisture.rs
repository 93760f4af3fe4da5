//! Moisture readings: above 19 % the member is in wet service (and its span is re-checked with
//! wet-service factors by `joist-span`); near fibre saturation decay can grow.

use super::Detail;
use crate::finding::{Bound, Check, Finding, FindingBuilder, RuleInfo, Status, Value, Wording};
use crate::model::ObservationKind;
use crate::units::UnitSystem;
use crate::validate::{MemberContext, WET_SERVICE_MC_PERCENT};
use std::sync::Arc;

pub const RULE: RuleInfo = RuleInfo {
    id: "moisture-content",
    title: "Moisture content of the wood",
    code_section: None,
    other_source: Some("NDS Supplement 2018 Table 4A (wet service over 19 % moisture content); USDA Wood Handbook (FPL-GTR-282) ch. 14"),
};

/// Moisture content around which decay fungi grow when sustained: roughly fibre saturation.
/// Source: USDA Forest Products Laboratory, Wood Handbook (2021), ch. 14 (from memory:
/// "around 25-30 %").
const DECAY_RISK_PERCENT: f64 = 25.0;

pub fn check(ctx: &MemberContext, out: &mut Vec<Finding>) {
    out.extend(ctx.observations.iter().filter_map(|o| match &o.kind {
        ObservationKind::Moisture { percent, location }
            if percent.is_finite() && (0.0..=100.0).contains(percent) =>
        {
            Some(one(ctx, &o.id, *percent, location))
        }
        _ => None,
    }));
}

/// What a moisture finding is worded from.
#[derive(Debug, Clone, PartialEq)]
pub struct MoistureDetail {
    pub percent: f64,
    pub location: String,
}

fn one(ctx: &MemberContext, id: &Arc<str>, percent: f64, location: &str) -> Finding {
    FindingBuilder::new(&RULE, ctx, Some(id))
        .check(Check::numeric(
            "moisture content",
            Value::Percent(percent),
            Value::Percent(WET_SERVICE_MC_PERCENT),
            Bound::AtMost,
            ctx.units,
        ))
        .finish(Detail::Moisture(MoistureDetail {
            percent,
            location: location.to_string(),
        }))
}

impl Wording for MoistureDetail {
    fn summary(&self, _: UnitSystem) -> String {
        let at = if self.location.is_empty() {
            String::new()
        } else {
            format!(" at {}", self.location)
        };
        format!(
            "Moisture content {:.0} %{at}; wet service above {WET_SERVICE_MC_PERCENT:.0} %",
            self.percent
        )
    }

    fn assumptions(&self, _: UnitSystem) -> Vec<String> {
        vec!["Pin-meter reading as shown, without species or temperature correction".into()]
    }

    fn recommendation(&self, status: Status, _: UnitSystem) -> String {
        match status {
            Status::OverLimit if self.percent >= DECAY_RISK_PERCENT => format!(
                "Wet wood ({:.0} %): the span was re-checked in wet service, and sustained moisture near {DECAY_RISK_PERCENT:.0} % or more lets decay fungi grow. Find and stop the water source (grading, gutters, plumbing, vapour retarder, ventilation) and probe for decay.",
                self.percent
            ),
            Status::OverLimit => "Above 19 %: the span was re-checked in wet service. Find and reduce the moisture source and re-measure.".into(),
            Status::NearLimit => "Close to wet service; re-measure in the wet season.".into(),
            _ => "Dry service.".into(),
        }
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::rules::testing::*;

    fn reading(percent: f64) -> Vec<crate::model::Observation> {
        vec![observation(ObservationKind::Moisture {
            percent,
            location: String::new(),
        })]
    }

    // Source: NDS Supplement (2018) Table 4A: wet service above 19 % moisture content.
    #[test]
    fn nineteen_percent() {
        let table = [
            (12.0, Status::Within),
            (17.0, Status::Within),
            (17.2, Status::NearLimit),
            (19.0, Status::NearLimit),
            (19.5, Status::OverLimit),
            (30.0, Status::OverLimit),
        ];
        for (percent, expect) in table {
            assert_eq!(
                status(check, spf_no2((2, 10), 180.0), reading(percent)),
                expect,
                "{percent}"
            );
        }
        let f = &run(check, spf_no2((2, 10), 180.0), reading(28.0))[0];
        assert!(f.recommendation().contains("decay"));
    }

    #[test]
    fn impossible_readings_are_left_to_validation() {
        assert!(run(check, spf_no2((2, 10), 180.0), reading(250.0)).is_empty());
    }
}
