//! Engineered members (IRC R502.8.2): a cut or notch is a finding; a hole is checked against
//! the maker's instructions, which the engine does not carry.

use crate::finding::{Basis, Check, Finding, RuleInfo, Status, Text, Wording};
use crate::model::{MemberKind, ObservationKind};
use crate::units::UnitSystem;
use crate::validate::MemberContext;

pub const CUT_RULE: RuleInfo = RuleInfo {
    id: "engineered-cut",
    title: "Cut or notch in an engineered member",
    code_section: Some("R502.8.2"),
    other_source: None,
    basis: Basis::CodeLimit,
};

pub const HOLE_RULE: RuleInfo = RuleInfo {
    id: "engineered-hole",
    title: "Hole in an engineered member",
    code_section: Some("R502.8.2"),
    other_source: None,
    basis: Basis::CodeLimit,
};

/// Source: IRC 2018 R502.8.2: cuts, notches and holes in engineered wood products are not
/// permitted unless the manufacturer's recommendations or a registered design professional
/// allow them.
const LIMIT: &str =
    "none, unless the maker's instructions or a registered design professional allow it";

/// What an engineered-member finding is worded from.
#[derive(Debug, Clone, PartialEq)]
pub struct EngineeredDetail {
    pub kind: MemberKind,
    /// "notch", "cut: bottom flange cut through", or "hole".
    pub what: Text,
}

pub fn check_cuts(ctx: &MemberContext, out: &mut Vec<Finding>) {
    if !ctx.kind.is_engineered() {
        return;
    }
    out.extend(ctx.observations.iter().filter_map(|o| {
        let what: Text = match &o.kind {
            ObservationKind::Notch { .. } => "notch".into(),
            ObservationKind::Cut { description } if description.is_empty() => "cut".into(),
            ObservationKind::Cut { description } => format!("cut: {description}").into(),
            _ => return None,
        };
        Some(
            ctx.finding(&CUT_RULE, Some(&o.id))
                .check(Check::qualitative(
                    "cut or notch",
                    what.clone(),
                    LIMIT,
                    false,
                ))
                .finish(EngineeredDetail {
                    kind: ctx.kind,
                    what,
                }),
        )
    }));
}

pub fn check_holes(ctx: &MemberContext, out: &mut Vec<Finding>) {
    if !ctx.kind.is_engineered() {
        return;
    }
    out.extend(
        ctx.observations
        .iter()
        .filter(|o| matches!(o.kind, ObservationKind::Hole { .. }))
        .map(|o| {
            ctx.finding(&HOLE_RULE, Some(&o.id)).not_checked(
                "holes in engineered members are governed by the maker's instructions, which this tool does not carry",
                EngineeredDetail { kind: ctx.kind, what: "hole".into() },
            )
        })
    );
}

impl Wording for EngineeredDetail {
    fn summary(&self, _: UnitSystem) -> String {
        if self.what == "hole" {
            format!(
                "Hole in an engineered member ({}): check against the maker's instructions",
                self.kind.name()
            )
        } else {
            format!(
                "A {}, in an engineered member ({}): not permitted without the maker's or a design professional's approval",
                self.what,
                self.kind.name()
            )
        }
    }

    fn recommendation(&self, _: Status, _: UnitSystem) -> String {
        if self.what == "hole" {
            "Check the hole's size and position against the maker's hole chart for this product, or have a design professional review it.".into()
        } else {
            "Refer to a licensed professional or the maker for a repair; cut engineered members can lose much of their strength.".into()
        }
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::model::{Edge, End};
    use crate::rules::testing::*;

    // Source: IRC 2018 R502.8.2.
    #[test]
    fn any_cut_is_a_finding_and_holes_defer_to_the_maker() {
        let mut f = spf_no2((2, 10), 180.0);
        f.kind = Some(MemberKind::IJoist);
        let notch = observation(ObservationKind::Notch {
            edge: Edge::Bottom,
            depth: inches(0.25),
            length: inches(1.0),
            at_end: false,
            from_support: Some(inches(10.0)),
            end: End::A,
        });
        assert_eq!(
            status(check_cuts, f.clone(), vec![notch.clone()]),
            Status::OverLimit
        );
        let hole = observation(ObservationKind::Hole {
            diameter: inches(1.0),
            from_support: inches(30.0),
            end: End::A,
            center_above_bottom: inches(4.0),
        });
        let found = run(check_holes, f.clone(), vec![hole.clone()]);
        assert_eq!(found[0].status, Status::NotChecked);
        assert!(found[0].summary().contains("maker's instructions"));
        // The same notch in sawn lumber is not this rule's business.
        assert!(run(check_cuts, spf_no2((2, 10), 180.0), vec![notch]).is_empty());
        assert!(run(check_holes, spf_no2((2, 10), 180.0), vec![hole]).is_empty());
    }
}
