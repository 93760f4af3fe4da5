//! Decay, insect and other damage: recorded observations in the inspector's own words, with no
//! numeric limit to hold them to.

use super::Detail;
use crate::finding::{Finding, FindingBuilder, RuleInfo, Status, Wording};
use crate::model::{DamageCause, ObservationKind};
use crate::units::UnitSystem;
use crate::validate::MemberContext;

pub const RULE: RuleInfo = RuleInfo {
    id: "wood-damage",
    title: "Decay or insect damage",
    code_section: Some("R317, R318 (protection against decay and termites)"),
    other_source: None,
};

/// What a damage finding is worded from: the inspector's own words.
#[derive(Debug, Clone, PartialEq)]
pub struct DamageDetail {
    pub cause: DamageCause,
    pub severity: String,
    pub extent: String,
}

pub fn check(ctx: &MemberContext, out: &mut Vec<Finding>) {
    out.extend(ctx.observations.iter().filter_map(|o| match &o.kind {
        ObservationKind::Damage {
            cause,
            severity,
            extent,
        } => Some(FindingBuilder::new(&RULE, ctx, Some(&o.id)).not_checked(
            "a recorded observation: the code sets no numeric limit for damage",
            Detail::Damage(DamageDetail {
                cause: *cause,
                severity: severity.clone(),
                extent: extent.clone(),
            }),
        )),
        _ => None,
    }));
}

impl Wording for DamageDetail {
    fn summary(&self, _: UnitSystem) -> String {
        let mut summary = match self.cause {
            DamageCause::Decay => "Decay",
            DamageCause::Insects => "Insect damage",
            DamageCause::Fire => "Fire damage",
            DamageCause::Other => "Damage",
        }
        .to_string();
        if !self.severity.is_empty() {
            summary.push_str(&format!(", inspector's rating: {}", self.severity));
        }
        if !self.extent.is_empty() {
            summary.push_str(&format!("; extent: {}", self.extent));
        }
        summary
    }

    fn assumptions(&self, _: UnitSystem) -> Vec<String> {
        vec!["Extent judged by eye and probing; hidden damage may be larger".into()]
    }

    fn recommendation(&self, _: Status, _: UnitSystem) -> String {
        "Have the damaged framing evaluated by a licensed professional, and the cause (moisture, insects) found and corrected; a licensed pest professional for insects.".into()
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::rules::testing::*;

    #[test]
    fn damage_is_recorded_with_the_inspectors_words() {
        let o = observation(ObservationKind::Damage {
            cause: DamageCause::Decay,
            severity: "soft 1 in deep".into(),
            extent: "bottom edge, 3 ft".into(),
        });
        let f = &run(check, spf_no2((2, 10), 180.0), vec![o])[0];
        assert_eq!(f.status, Status::NotChecked);
        assert!(f.summary().contains("soft 1 in deep") && f.summary().contains("3 ft"));
    }
}
