//! Engineered members (IRC R502.8.2): a cut or notch is a finding; a hole is checked against
//! the maker's instructions, which the engine does not carry.

use crate::finding::{Check, Finding, FindingBuilder, RuleInfo};
use crate::model::ObservationKind;
use crate::validate::MemberContext;

pub const CUT_RULE: RuleInfo = RuleInfo {
    id: "engineered-cut",
    title: "Cut or notch in an engineered member",
    code_section: Some("R502.8.2"),
    other_source: None,
};

pub const HOLE_RULE: RuleInfo = RuleInfo {
    id: "engineered-hole",
    title: "Hole in an engineered member",
    code_section: Some("R502.8.2"),
    other_source: None,
};

/// Source: IRC 2018 R502.8.2: cuts, notches and holes in engineered wood products are not
/// permitted unless the manufacturer's recommendations or a registered design professional
/// allow them.
const LIMIT: &str = "none, unless the maker's instructions or a registered design professional allow it";

pub fn check_cuts(ctx: &MemberContext) -> Vec<Finding> {
    if !ctx.kind.is_engineered() {
        return vec![];
    }
    ctx.observations
        .iter()
        .filter_map(|o| {
            let what = match &o.kind {
                ObservationKind::Notch { .. } => "notch".to_string(),
                ObservationKind::Cut { description } if description.is_empty() => "cut".to_string(),
                ObservationKind::Cut { description } => format!("cut: {description}"),
                _ => return None,
            };
            Some(
                FindingBuilder::new(&CUT_RULE, ctx.edition, ctx.place(), Some(&o.id))
                    .check(Check::qualitative("cut or notch", &what, LIMIT, false))
                    .summary(format!("A {what}, in an engineered member ({}): not permitted without the maker's or a design professional's approval", ctx.kind.name()))
                    .finish(|_| "Refer to a licensed professional or the maker for a repair; cut engineered members can lose much of their strength.".into()),
            )
        })
        .collect()
}

pub fn check_holes(ctx: &MemberContext) -> Vec<Finding> {
    if !ctx.kind.is_engineered() {
        return vec![];
    }
    ctx.observations
        .iter()
        .filter(|o| matches!(o.kind, ObservationKind::Hole { .. }))
        .map(|o| {
            FindingBuilder::new(&HOLE_RULE, ctx.edition, ctx.place(), Some(&o.id))
                .summary(format!("Hole in an engineered member ({}): check against the maker's instructions", ctx.kind.name()))
                .not_checked(
                    "holes in engineered members are governed by the maker's instructions, which this tool does not carry",
                    "Check the hole's size and position against the maker's hole chart for this product, or have a design professional review it.",
                )
        })
        .collect()
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::finding::Status;
    use crate::model::{Edge, End, MemberKind};
    use crate::rules::testing::*;

    // Source: IRC 2018 R502.8.2.
    #[test]
    fn any_cut_is_a_finding_and_holes_defer_to_the_maker() {
        let mut f = spf_no2((2, 10), 180.0);
        f.kind = Some(MemberKind::IJoist);
        let notch = observation(ObservationKind::Notch { edge: Edge::Bottom, depth: inches(0.25), length: inches(1.0), at_end: false, from_support: Some(inches(10.0)), end: End::A });
        assert_eq!(status(check_cuts, f.clone(), vec![notch.clone()]), Status::OverLimit);
        let hole = observation(ObservationKind::Hole { diameter: inches(1.0), from_support: inches(30.0), end: End::A, center_above_bottom: inches(4.0) });
        let found = run(check_holes, f.clone(), vec![hole.clone()]);
        assert_eq!(found[0].status, Status::NotChecked);
        assert!(found[0].summary.contains("maker's instructions"));
        // The same notch in sawn lumber is not this rule's business.
        assert!(run(check_cuts, spf_no2((2, 10), 180.0), vec![notch]).is_empty());
        assert!(run(check_holes, spf_no2((2, 10), 180.0), vec![hole]).is_empty());
    }
}
