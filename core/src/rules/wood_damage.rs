//! Decay, insect and other damage: recorded observations in the inspector's own words, with no
//! numeric limit to hold them to.

use crate::finding::{Finding, FindingBuilder, RuleInfo};
use crate::model::{DamageCause, ObservationKind};
use crate::validate::MemberContext;

pub const RULE: RuleInfo = RuleInfo {
    id: "wood-damage",
    title: "Decay or insect damage",
    code_section: Some("R317, R318 (protection against decay and termites)"),
    other_source: None,
};

pub fn check(ctx: &MemberContext) -> Vec<Finding> {
    ctx.observations
        .iter()
        .filter_map(|o| match &o.kind {
            ObservationKind::Damage { cause, severity, extent } => {
                let what = match cause {
                    DamageCause::Decay => "Decay",
                    DamageCause::Insects => "Insect damage",
                    DamageCause::Fire => "Fire damage",
                    DamageCause::Other => "Damage",
                };
                let mut summary = what.to_string();
                if !severity.is_empty() {
                    summary.push_str(&format!(", inspector's rating: {severity}"));
                }
                if !extent.is_empty() {
                    summary.push_str(&format!("; extent: {extent}"));
                }
                Some(
                    FindingBuilder::new(&RULE, ctx.edition, ctx.place(), Some(&o.id))
                        .summary(summary)
                        .assume("Extent judged by eye and probing; hidden damage may be larger")
                        .not_checked(
                            "a recorded observation: the code sets no numeric limit for damage",
                            "Have the damaged framing evaluated by a licensed professional, and the cause (moisture, insects) found and corrected; a licensed pest professional for insects.",
                        ),
                )
            }
            _ => None,
        })
        .collect()
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::finding::Status;
    use crate::rules::testing::*;

    #[test]
    fn damage_is_recorded_with_the_inspectors_words() {
        let o = observation(ObservationKind::Damage { cause: DamageCause::Decay, severity: "soft 1 in deep".into(), extent: "bottom edge, 3 ft".into() });
        let f = &run(check, spf_no2((2, 10), 180.0), vec![o])[0];
        assert_eq!(f.status, Status::NotChecked);
        assert!(f.summary.contains("soft 1 in deep") && f.summary.contains("3 ft"));
    }
}
