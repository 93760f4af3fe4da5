//! Bearing of joist ends (IRC R502.6): at least 1-1/2 in on wood or metal, 3 in on masonry or
//! concrete, or carried by hangers, ribbon or ledger strips; with the bearing that Fc-perp
//! requires for the computed reaction (NDS 3.10.2) beside it.

use super::shared::dim as len;
use crate::finding::{Bound, Check, Finding, FindingBuilder, RuleInfo, Status, Value};
use crate::model::{Bearing, BearingSupport, End, ObservationKind};
use crate::units::Length;
use crate::validate::MemberContext;

pub const RULE: RuleInfo = RuleInfo {
    id: "bearing-length",
    title: "Bearing at joist ends",
    code_section: Some("R502.6"),
    other_source: Some("NDS 2018 3.10.2 (bearing perpendicular to grain)"),
};

/// Source: IRC 2018 R502.6: not less than 1-1/2 in on wood or metal, 3 in on masonry or
/// concrete.
fn minimum_bearing(on: BearingSupport) -> Option<Length> {
    match on {
        BearingSupport::Wood | BearingSupport::Metal => Some(Length::inches(1.5)),
        BearingSupport::Masonry | BearingSupport::Concrete => Some(Length::inches(3.0)),
        BearingSupport::Hanger | BearingSupport::Ribbon | BearingSupport::Ledger => None,
    }
}

pub fn check(ctx: &MemberContext) -> Vec<Finding> {
    let mut out = Vec::new();
    if ctx.report_framing {
        if let Some(bearing) = ctx.framing.bearing {
            out.push(one(ctx, bearing, "both ends", None));
        } else {
            let b = FindingBuilder::new(&RULE, ctx.edition, ctx.place(), None);
            out.push(b.not_checked("bearing not recorded", "Record the bearing length and what the joists bear on."));
        }
    }
    for o in &ctx.observations {
        if let ObservationKind::Bearing { end, length, on } = &o.kind {
            let which = match end {
                End::A => "end A",
                End::B => "end B",
            };
            out.push(one(ctx, Bearing { length: *length, on: *on }, which, Some(&o.id)));
        }
    }
    out
}

fn one(ctx: &MemberContext, bearing: Bearing, which: &str, observation: Option<&str>) -> Finding {
    let b = FindingBuilder::new(&RULE, ctx.edition, ctx.place(), observation);
    let Some(minimum) = minimum_bearing(bearing.on) else {
        return b
            .check(Check::qualitative(
                format!("support at {which}"),
                bearing.on.name(),
                "approved hanger, ribbon strip or ledger accepted",
                true,
            ))
            .summary(format!("Joists at {which} carried by {}: accepted by R502.6 in place of bearing length", bearing.on.name()))
            .assume("The hanger, ribbon or ledger and its nailing were not evaluated for capacity")
            .finish(|_| "Confirm hangers are the right size for the joist and every nail hole is filled.".into());
    };
    let Some(length) = bearing.length else {
        return b.not_checked(format!("bearing length at {which} not measured"), "Measure the bearing length at the joist ends.");
    };
    let mut builder = b.check(Check::numeric(
        format!("bearing on {} at {which}", bearing.on.name()),
        Value::Length(length),
        Value::Length(minimum),
        Bound::AtLeast,
        ctx.units,
    ));
    let mut summary = format!("Bearing {} on {} at {which}, minimum {}", len(ctx, length), bearing.on.name(), len(ctx, minimum));
    if let (Some(result), Some(span)) = (&ctx.span, ctx.clear_span()) {
        let required = result.required_bearing(span);
        summary.push_str(&format!("; the reaction of {:.0} lb needs {}", result.reaction_lb(span), len(ctx, required)));
        builder = builder
            .check(Check::numeric(
                "bearing for the computed reaction (Fc-perp)",
                Value::Length(length),
                Value::Length(required),
                Bound::AtLeast,
                ctx.units,
            ))
            .assume(format!(
                "Reaction = total load x clear span / 2; Fc-perp' {:.0} psi over the joist thickness, bearing area factor Cb taken as 1.0",
                result.fc_perp().0
            ));
    }
    builder.summary(summary).finish(|status| match status {
        Status::OverLimit => "Short bearing: have the joist ends supported (a full-bearing ledger, post, or hanger) as a licensed professional directs.".into(),
        Status::NearLimit => "Bearing is close to the minimum; look for crushing or movement at the ends.".into(),
        _ => "Bearing meets the minimum.".into(),
    })
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::rules::testing::*;

    fn with_bearing(length: f64, on: BearingSupport) -> crate::model::Framing {
        let mut f = spf_no2((2, 10), 180.0);
        f.bearing = Some(Bearing { length: Some(inches(length)), on });
        f
    }

    // Source: IRC 2018 R502.6: 1-1/2 in on wood or metal, 3 in on masonry or concrete.
    #[test]
    fn limits_by_support() {
        let table = [
            (1.25, BearingSupport::Wood, Status::OverLimit),
            (1.5, BearingSupport::Wood, Status::NearLimit),
            (1.75, BearingSupport::Metal, Status::Within),
            (2.5, BearingSupport::Concrete, Status::OverLimit),
            (3.0, BearingSupport::Masonry, Status::NearLimit),
            (3.5, BearingSupport::Masonry, Status::Within),
        ];
        for (length, on, expect) in table {
            assert_eq!(status(check, with_bearing(length, on), vec![]), expect, "{length} on {on:?}");
        }
    }

    #[test]
    fn hangers_are_accepted_and_reaction_is_shown() {
        assert_eq!(status(check, with_bearing(0.0, BearingSupport::Hanger), vec![]), Status::Within);
        let f = &run(check, with_bearing(3.0, BearingSupport::Wood), vec![])[0];
        // NDS 3.10.2 by hand: 5.556 lb/in x 180 / 2 = 500 lb; 500 / (425 x 1.5) = 0.78 in.
        assert!(f.summary.contains("500 lb"), "{}", f.summary);
        assert_eq!(f.checks.len(), 2);
    }

    #[test]
    fn per_end_observation() {
        let o = observation(ObservationKind::Bearing { end: End::B, length: Some(inches(1.0)), on: BearingSupport::Wood });
        let f = run(check, with_bearing(3.0, BearingSupport::Wood), vec![o]);
        assert_eq!(f.len(), 2);
        assert_eq!(f[1].status, Status::OverLimit);
        assert!(f[1].summary.contains("end B"));
    }
}
