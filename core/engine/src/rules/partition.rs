//! Joists under bearing partitions (R502.4): a partition across the joists is not offset
//! from the girder, wall or partition below by more than the joist depth; a bearing partition
//! parallel to the joists stands on a doubled joist or a beam.

use crate::finding::{Basis, Bound, Check, Finding, RuleInfo, Status, Value, Wording};
use crate::model::ObservationKind;
use crate::units::UnitSystem;
use crate::validate::MemberContext;

pub const RULE: RuleInfo = RuleInfo {
    id: "bearing-partition",
    title: "Joists under bearing partitions",
    code_section: Some("R502.4"),
    other_source: None,
    basis: Basis::CodeLimit,
};

#[derive(Debug, Clone, PartialEq)]
pub struct PartitionDetail {
    pub parallel: bool,
}

pub fn check(ctx: &MemberContext, out: &mut Vec<Finding>) {
    for o in &ctx.observations {
        let ObservationKind::Partition {
            parallel,
            doubled,
            offset,
        } = &o.kind
        else {
            continue;
        };
        let b = ctx.finding(&RULE, Some(&o.id));
        let detail = PartitionDetail {
            parallel: *parallel,
        };
        let finding = if *parallel {
            // R502.4 asks for joists "of adequate size"; doubling is how that is met in
            // practice (common practice, no source for the doubling itself).
            b.basis(Basis::Reference)
                .check(Check::qualitative(
                    "joist under a parallel bearing partition",
                    if *doubled { "doubled" } else { "single" },
                    "doubled joist or beam",
                    *doubled,
                ))
                .finish(detail)
        } else {
            match (offset, ctx.depth()) {
                (Some(off), Some(depth)) => b
                    .check(Check::numeric(
                        "partition offset from the support below",
                        Value::Length(*off),
                        Value::Length(depth),
                        Bound::AtMost,
                        ctx.units,
                    ))
                    .finish(detail),
                (None, _) => b.not_checked("the offset is not measured", detail),
                (_, None) => b.not_checked("the joist size is not entered", detail),
            }
        };
        out.push(finding);
    }
}

impl Wording for PartitionDetail {
    fn summary(&self, _u: UnitSystem) -> String {
        if self.parallel {
            "A bearing partition above runs along the joists".into()
        } else {
            "A bearing partition above crosses the joists, set back from the support below".into()
        }
    }

    fn assumptions(&self, _u: UnitSystem) -> Vec<String> {
        if self.parallel {
            vec!["R502.4 asks for joists of adequate size under a parallel bearing partition; a doubled joist or a beam is taken as meeting it (common practice, no source)".into()]
        } else {
            vec![]
        }
    }

    fn recommendation(&self, status: Status, _u: UnitSystem) -> String {
        match (self.parallel, status) {
            (true, Status::OverLimit) => "A single joist carries a bearing wall along its length. Refer to a licensed professional; a doubled joist or a beam under the wall is the usual remedy.".into(),
            (false, Status::OverLimit) => "The partition bears on the joists farther from the support than the joists are deep, which the code allows only for joists sized for it. Refer to a licensed professional to evaluate.".into(),
            (_, Status::NotChecked) => "Measure the partition's offset from the support below and the joist size.".into(),
            _ => "Framed under the partition as the code asks; no action.".into(),
        }
    }
}
