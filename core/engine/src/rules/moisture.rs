//! Moisture readings: above 19 % the member is in wet service (and its span is re-checked with
//! wet-service factors by `joist-span`); near fibre saturation decay can grow.

use crate::finding::{Basis, Bound, Check, Finding, RuleInfo, Status, Value, Wording};
use crate::model::ObservationKind;
use crate::units::UnitSystem;
use crate::validate::{MemberContext, WET_SERVICE_MC_PERCENT};
use std::sync::Arc;

pub const RULE: RuleInfo = RuleInfo {
    id: "moisture-content",
    title: "Moisture content of the wood",
    code_section: None,
    other_source: Some("NDS Supplement 2018 Table 4A (wet service over 19 % moisture content); USDA Wood Handbook (FPL-GTR-282) ch. 14"),
    basis: Basis::Reference,
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
    /// Whether this member's span (and bearing) was re-checked in wet service.
    pub span_rechecked: bool,
}

fn one(ctx: &MemberContext, id: &Arc<str>, percent: f64, location: &str) -> Finding {
    ctx.finding(&RULE, Some(id))
        .check(Check::numeric(
            "moisture content",
            Value::Percent(percent),
            Value::Percent(WET_SERVICE_MC_PERCENT),
            Bound::AtMost,
            ctx.units,
        ))
        .finish(MoistureDetail {
            percent,
            location: location.to_string(),
            span_rechecked: ctx.span.is_some() && ctx.clear_span().is_some(),
        })
}

impl MoistureDetail {
    fn rechecked_text(&self) -> &'static str {
        if self.span_rechecked {
            ": the span and bearing were re-checked in wet service"
        } else {
            ": the span could not be re-checked in wet service (its lumber, spacing or span was not entered)"
        }
    }
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
        vec![
            "Pin-meter reading as shown, without species or temperature correction".into(),
            "One reading shows the wood's moisture on the day; whether it stays wet (sustained moisture) needs readings over time".into(),
            "19 % is the NDS wet-service threshold, an engineering reference, not a code limit".into(),
        ]
    }

    fn recommendation(&self, status: Status, _: UnitSystem) -> String {
        match status {
            Status::OverLimit if self.percent >= DECAY_RISK_PERCENT => format!(
                "Wet wood ({:.0} %){}; if moisture near {DECAY_RISK_PERCENT:.0} % or more is sustained, decay fungi can grow. Find and stop the water source (grading, gutters, plumbing, vapour retarder, ventilation), probe for decay, and re-measure in another season.",
                self.percent,
                self.rechecked_text()
            ),
            Status::OverLimit => format!(
                "Above 19 %{}. Find and reduce the moisture source and re-measure.",
                self.rechecked_text()
            ),
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
        assert!(f.recommendation().contains("were re-checked"));
        let mut unknown = spf_no2((2, 10), 180.0);
        unknown.size = None;
        let f = &run(check, unknown, reading(28.0))[0];
        assert!(
            f.recommendation().contains("could not be re-checked"),
            "{}",
            f.recommendation()
        );
    }

    #[test]
    fn impossible_readings_are_left_to_validation() {
        assert!(run(check, spf_no2((2, 10), 180.0), reading(250.0)).is_empty());
    }
}
