//! End restraint of joists against rotation (IRC R502.7).

use super::shared::Ends;
use crate::finding::{Basis, Check, Finding, Missing, RuleInfo, Status, Wording};
use crate::model::{EndRestraint, MemberKind, ObservationKind};
use crate::units::UnitSystem;
use crate::validate::MemberContext;
use std::sync::Arc;

pub const RULE: RuleInfo = RuleInfo {
    id: "end-restraint",
    title: "Lateral restraint at joist ends",
    code_section: Some("R502.7 and its exception for engineered members"),
    other_source: None,
    basis: Basis::CodeLimit,
};

const LIMIT: &str = "full-depth blocking, header, rim or band joist, or an adjoining stud";

/// What an end-restraint finding is worded from.
#[derive(Debug, Clone, PartialEq)]
pub struct RestraintDetail {
    pub ends: Ends,
    pub restraint: EndRestraint,
    /// The member is an engineered product: R502.7's exception defers to the maker's details.
    pub engineered: Option<MemberKind>,
}

pub fn check(ctx: &MemberContext, out: &mut Vec<Finding>) {
    if ctx.report_framing {
        match ctx.framing.end_restraint {
            Some(r) => out.push(one(ctx, r, Ends::Both, None)),
            None => out.push(ctx.finding(&RULE, None).not_checked(
                "end restraint not recorded",
                Missing("Record what holds the joist ends (rim, blocking, header)."),
            )),
        }
    }
    for o in &ctx.observations {
        if let ObservationKind::Restraint { end, restraint } = o.kind {
            out.push(one(ctx, restraint, Ends::One(end), Some(&o.id)));
        }
    }
}

fn one(
    ctx: &MemberContext,
    restraint: EndRestraint,
    ends: Ends,
    observation: Option<&Arc<str>>,
) -> Finding {
    ctx.finding(&RULE, observation)
        .check(Check::qualitative(
            format!("restraint at {}", ends.name()),
            restraint.name(),
            LIMIT,
            restraint != EndRestraint::None,
        ))
        .finish(RestraintDetail {
            ends,
            restraint,
            engineered: ctx.kind.is_engineered().then_some(ctx.kind),
        })
}

impl Wording for RestraintDetail {
    fn summary(&self, _: UnitSystem) -> String {
        format!(
            "End restraint at {}: {}",
            self.ends.name(),
            self.restraint.name()
        )
    }

    fn assumptions(&self, _: UnitSystem) -> Vec<String> {
        match self.engineered {
            Some(kind) => vec![format!(
                "For {}s, the exception to R502.7 requires lateral support as the maker's details show; the rim, blocking or hangers of those details are the measure",
                kind.name()
            )],
            None => vec![],
        }
    }

    fn recommendation(&self, status: Status, _: UnitSystem) -> String {
        match status {
            Status::OverLimit if self.engineered.is_some() => "Add the end restraint the maker's details call for (rim board, blocking panels or hangers), as the exception to R502.7 requires.".into(),
            Status::OverLimit => {
                "Add full-depth blocking or a rim joist at the joist ends so they cannot roll."
                    .into()
            }
            _ => "Ends are restrained.".into(),
        }
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::rules::testing::*;

    // Source: IRC 2018 R502.7: ends restrained by full-depth solid blocking, a header, band or
    // rim joist, or an adjoining stud.
    #[test]
    fn restraint_present_or_not() {
        let table = [
            (EndRestraint::RimJoist, Status::Within),
            (EndRestraint::SolidBlocking, Status::Within),
            (EndRestraint::Header, Status::Within),
            (EndRestraint::Stud, Status::Within),
            (EndRestraint::None, Status::OverLimit),
        ];
        for (restraint, expect) in table {
            let mut f = spf_no2((2, 10), 180.0);
            f.end_restraint = Some(restraint);
            assert_eq!(status(check, f, vec![]), expect, "{restraint:?}");
        }
        assert_eq!(
            status(check, spf_no2((2, 10), 180.0), vec![]),
            Status::NotChecked
        );
    }
}
