//! End restraint of joists against rotation (IRC R502.7).

use crate::finding::{Check, Finding, FindingBuilder, RuleInfo, Status};
use crate::model::{End, EndRestraint, ObservationKind};
use crate::validate::MemberContext;

pub const RULE: RuleInfo = RuleInfo {
    id: "end-restraint",
    title: "Lateral restraint at joist ends",
    code_section: Some("R502.7"),
    other_source: None,
};

const LIMIT: &str = "full-depth blocking, header, rim or band joist, or an adjoining stud";

pub fn check(ctx: &MemberContext) -> Vec<Finding> {
    let mut out = Vec::new();
    if ctx.report_framing {
        match ctx.framing.end_restraint {
            Some(r) => out.push(one(ctx, r, "both ends", None)),
            None => out.push(
                FindingBuilder::new(&RULE, ctx.edition, ctx.place(), None)
                    .not_checked("end restraint not recorded", "Record what holds the joist ends (rim, blocking, header)."),
            ),
        }
    }
    for o in &ctx.observations {
        if let ObservationKind::Restraint { end, restraint } = o.kind {
            let which = if end == End::A { "end A" } else { "end B" };
            out.push(one(ctx, restraint, which, Some(&o.id)));
        }
    }
    out
}

fn one(ctx: &MemberContext, restraint: EndRestraint, which: &str, observation: Option<&str>) -> Finding {
    let present = restraint != EndRestraint::None;
    FindingBuilder::new(&RULE, ctx.edition, ctx.place(), observation)
        .check(Check::qualitative(format!("restraint at {which}"), restraint.name(), LIMIT, present))
        .summary(format!("End restraint at {which}: {}", restraint.name()))
        .finish(|status| match status {
            Status::OverLimit => "Add full-depth blocking or a rim joist at the joist ends so they cannot roll.".into(),
            _ => "Ends are restrained.".into(),
        })
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
        assert_eq!(status(check, spf_no2((2, 10), 180.0), vec![]), Status::NotChecked);
    }
}
