//! Decay, insect and fire damage, and cuts through sawn joists: observed conditions with no
//! numeric limit, which reach the summary for a professional to evaluate.

use super::shared::{dim, Ends};
use crate::finding::{Basis, Finding, RuleInfo, Status, Wording};
use crate::model::{DamageCause, End, ObservationKind};
use crate::units::{Length, UnitSystem};
use crate::validate::MemberContext;

pub const RULE: RuleInfo = RuleInfo {
    id: "wood-damage",
    title: "Decay or insect damage",
    code_section: Some("R317, R318 (protection against decay and termites)"),
    other_source: None,
    basis: Basis::Observed,
};

pub const CUT_RULE: RuleInfo = RuleInfo {
    id: "sawn-cut",
    title: "Cut in a sawn joist",
    code_section: Some("R502.8 (cutting, drilling and notching)"),
    other_source: None,
    basis: Basis::Observed,
};

/// What a damage finding is worded from: the inspector's own words and where it is.
#[derive(Debug, Clone, PartialEq)]
pub struct DamageDetail {
    pub cause: DamageCause,
    pub severity: String,
    pub extent: String,
    pub at_end: Option<End>,
    pub reach: Option<Length>,
}

/// What a cut finding is worded from.
#[derive(Debug, Clone, PartialEq)]
pub struct CutDetail {
    pub description: String,
}

pub fn check(ctx: &MemberContext, out: &mut Vec<Finding>) {
    out.extend(ctx.observations.iter().filter_map(|o| match &o.kind {
        ObservationKind::Damage {
            cause,
            severity,
            extent,
            at_end,
            reach,
        } => Some(ctx.finding(&RULE, Some(&o.id)).observed(DamageDetail {
            cause: *cause,
            severity: severity.clone(),
            extent: extent.clone(),
            at_end: *at_end,
            reach: *reach,
        })),
        _ => None,
    }));
}

/// A cut through a sawn joist (for a duct, say) is beyond any notch the code allows; the
/// engineered-member rule covers cuts in engineered products.
pub fn check_cuts(ctx: &MemberContext, out: &mut Vec<Finding>) {
    if ctx.kind.is_engineered() {
        return;
    }
    out.extend(ctx.observations.iter().filter_map(|o| match &o.kind {
        ObservationKind::Cut { description } => {
            Some(ctx.finding(&CUT_RULE, Some(&o.id)).observed(CutDetail {
                description: description.clone(),
            }))
        }
        _ => None,
    }));
}

impl Wording for DamageDetail {
    fn summary(&self, u: UnitSystem) -> String {
        let mut summary = match self.cause {
            DamageCause::Decay => "Decay",
            DamageCause::Insects => "Insect damage",
            DamageCause::Fire => "Fire damage",
            DamageCause::Other => "Damage",
        }
        .to_string();
        if let Some(end) = self.at_end {
            summary.push_str(&format!(" at {}, over the bearing", Ends::One(end).name()));
            if let Some(reach) = self.reach {
                summary.push_str(&format!(", reaching {} in from the end", dim(u, reach)));
            }
        }
        if !self.severity.is_empty() {
            summary.push_str(&format!("; inspector's rating: {}", self.severity));
        }
        if !self.extent.is_empty() {
            summary.push_str(&format!("; extent: {}", self.extent));
        }
        summary
    }

    fn assumptions(&self, _: UnitSystem) -> Vec<String> {
        let mut out = vec!["Extent judged by eye and probing; hidden damage may be larger".into()];
        if self.at_end.is_some() {
            out.push(if self.reach.is_some() {
                "Only the sound wood beyond the damage counts as bearing: the bearing finding uses the bearing length less the damage's reach".into()
            } else {
                "The damage's reach from the end was not measured, so the sound bearing left could not be checked".into()
            });
        }
        out
    }

    fn recommendation(&self, _: Status, _: UnitSystem) -> String {
        let who = match self.cause {
            DamageCause::Insects => {
                "by a licensed professional, and by a licensed pest professional for the insects"
            }
            _ => "by a licensed professional",
        };
        let at_bearing = if self.at_end.is_some() {
            " Damage at a bearing can let the joist drop: have it looked at soon."
        } else {
            ""
        };
        format!("Have the damaged framing evaluated {who}, and the cause (moisture, insects) found and corrected.{at_bearing}")
    }
}

impl Wording for CutDetail {
    fn summary(&self, _: UnitSystem) -> String {
        if self.description.trim().is_empty() {
            "Sawn joist cut into beyond a notch or bored hole".into()
        } else {
            format!("Sawn joist cut: {}", self.description.trim())
        }
    }

    fn assumptions(&self, _: UnitSystem) -> Vec<String> {
        vec!["A cut through a joist is not a notch or a bored hole the code allows: its effect on the joist was not computed".into()]
    }

    fn recommendation(&self, _: Status, _: UnitSystem) -> String {
        "Have the cut joist evaluated by a licensed professional for a repair (a header and support, or sistering); do not cut further.".into()
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::model::MemberKind;
    use crate::rules::testing::*;

    #[test]
    fn damage_is_an_observed_condition_to_evaluate() {
        let o = observation(ObservationKind::Damage {
            cause: DamageCause::Decay,
            severity: "soft 1 in deep".into(),
            extent: "bottom edge, 3 ft".into(),
            at_end: Some(End::A),
            reach: Some(inches(2.0)),
        });
        let f = &run(check, spf_no2((2, 10), 180.0), vec![o])[0];
        assert_eq!((f.status, f.basis), (Status::ToEvaluate, Basis::Observed));
        assert!(f.summary().contains("soft 1 in deep") && f.summary().contains("3 ft"));
        assert!(f.summary().contains("at end A"), "{}", f.summary());
        assert!(f.recommendation().contains("soon"));
    }

    #[test]
    fn a_cut_in_a_sawn_joist_is_a_finding() {
        let cut = || {
            vec![observation(ObservationKind::Cut {
                description: "cut through for a duct".into(),
            })]
        };
        let f = run(check_cuts, spf_no2((2, 10), 180.0), cut());
        assert_eq!(f.len(), 1);
        assert_eq!(f[0].status, Status::ToEvaluate);
        assert!(f[0].summary().contains("duct"));
        let mut engineered = spf_no2((2, 10), 180.0);
        engineered.kind = Some(MemberKind::IJoist);
        assert!(run(check_cuts, engineered, cut()).is_empty());
    }
}
