//! Bearing of joist ends (IRC R502.6): at least 1-1/2 in on wood or metal, 3 in on masonry or
//! concrete, or carried by hangers, ribbon or ledger strips; with the bearing that Fc-perp
//! requires for the computed reaction (NDS 3.10.2) beside it.

use super::shared::{dim, Ends};
use super::Detail;
use crate::finding::{Bound, Check, Finding, FindingBuilder, RuleInfo, Status, Value, Wording};
use crate::model::{Bearing, BearingSupport, ObservationKind};
use crate::units::{Length, UnitSystem};
use crate::validate::MemberContext;
use std::sync::Arc;

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

/// What a bearing finding is worded from.
#[derive(Debug, Clone, PartialEq)]
pub struct BearingDetail {
    pub ends: Ends,
    pub on: BearingSupport,
    pub length: Length,
    /// None where a hanger, ribbon or ledger carries the joist.
    pub minimum: Option<Length>,
    /// The computed end reaction (lb), the bearing it needs, and Fc-perp' (psi).
    pub reaction: Option<(f64, Length, f64)>,
}

pub fn check(ctx: &MemberContext, out: &mut Vec<Finding>) {
    if ctx.report_framing {
        match ctx.framing.bearing {
            Some(bearing) => out.push(one(ctx, bearing, Ends::Both, None)),
            None => out.push(FindingBuilder::new(&RULE, ctx, None).not_checked(
                "bearing not recorded",
                Detail::Missing("Record the bearing length and what the joists bear on."),
            )),
        }
    }
    for o in &ctx.observations {
        if let ObservationKind::Bearing { end, length, on } = &o.kind {
            out.push(one(
                ctx,
                Bearing {
                    length: *length,
                    on: *on,
                },
                Ends::One(*end),
                Some(&o.id),
            ));
        }
    }
}

fn one(
    ctx: &MemberContext,
    bearing: Bearing,
    ends: Ends,
    observation: Option<&Arc<str>>,
) -> Finding {
    let b = FindingBuilder::new(&RULE, ctx, observation);
    let minimum = minimum_bearing(bearing.on);
    let detail = |length, reaction| {
        Detail::Bearing(Box::new(BearingDetail {
            ends,
            on: bearing.on,
            length,
            minimum,
            reaction,
        }))
    };
    let Some(minimum) = minimum else {
        return b
            .check(Check::qualitative(
                format!("support at {}", ends.name()),
                bearing.on.name(),
                "approved hanger, ribbon strip or ledger accepted",
                true,
            ))
            .finish(detail(bearing.length.unwrap_or_default(), None));
    };
    let Some(length) = bearing.length else {
        return b.not_checked(
            format!("bearing length at {} not measured", ends.name()),
            Detail::Missing("Measure the bearing length at the joist ends."),
        );
    };
    let mut b = b.check(Check::numeric(
        format!("bearing on {} at {}", bearing.on.name(), ends.name()),
        Value::Length(length),
        Value::Length(minimum),
        Bound::AtLeast,
        ctx.units,
    ));
    let mut reaction = None;
    if let (Some(result), Some(span)) = (&ctx.span, ctx.clear_span()) {
        let required = result.required_bearing(span);
        reaction = Some((result.reaction_lb(span), required, result.fc_perp().0));
        b = b.check(Check::numeric(
            "bearing for the computed reaction (Fc-perp)",
            Value::Length(length),
            Value::Length(required),
            Bound::AtLeast,
            ctx.units,
        ));
    }
    b.finish(detail(length, reaction))
}

impl Wording for BearingDetail {
    fn summary(&self, u: UnitSystem) -> String {
        let Some(minimum) = self.minimum else {
            return format!(
                "Joists at {} carried by {}: accepted by R502.6 in place of bearing length",
                self.ends.name(),
                self.on.name()
            );
        };
        let mut text = format!(
            "Bearing {} on {} at {}, minimum {}",
            dim(u, self.length),
            self.on.name(),
            self.ends.name(),
            dim(u, minimum)
        );
        if let Some((lb, required, _)) = self.reaction {
            text.push_str(&format!(
                "; the reaction of {lb:.0} lb needs {}",
                dim(u, required)
            ));
        }
        text
    }

    fn assumptions(&self, _: UnitSystem) -> Vec<String> {
        match (self.minimum, self.reaction) {
            (None, _) => vec!["The hanger, ribbon or ledger and its nailing were not evaluated for capacity".into()],
            (Some(_), Some((_, _, fc_perp))) => vec![format!(
                "Reaction = total load x clear span / 2; Fc-perp' {fc_perp:.0} psi over the joist thickness, bearing area factor Cb taken as 1.0"
            )],
            _ => vec![],
        }
    }

    fn recommendation(&self, status: Status, _: UnitSystem) -> String {
        match (self.minimum, status) {
            (None, _) => "Confirm hangers are the right size for the joist and every nail hole is filled.".into(),
            (_, Status::OverLimit) => "Short bearing: have the joist ends supported (a full-bearing ledger, post, or hanger) as a licensed professional directs.".into(),
            (_, Status::NearLimit) => "Bearing is close to the minimum; look for crushing or movement at the ends.".into(),
            _ => "Bearing meets the minimum.".into(),
        }
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::model::End;
    use crate::rules::testing::*;

    fn with_bearing(length: f64, on: BearingSupport) -> crate::model::Framing {
        let mut f = spf_no2((2, 10), 180.0);
        f.bearing = Some(Bearing {
            length: Some(inches(length)),
            on,
        });
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
            assert_eq!(
                status(check, with_bearing(length, on), vec![]),
                expect,
                "{length} on {on:?}"
            );
        }
    }

    #[test]
    fn hangers_are_accepted_and_reaction_is_shown() {
        assert_eq!(
            status(check, with_bearing(0.0, BearingSupport::Hanger), vec![]),
            Status::Within
        );
        let f = &run(check, with_bearing(3.0, BearingSupport::Wood), vec![])[0];
        // NDS 3.10.2 by hand: 5.556 lb/in x 180 / 2 = 500 lb; 500 / (425 x 1.5) = 0.78 in.
        assert!(f.summary().contains("500 lb"), "{}", f.summary());
        assert_eq!(f.checks.len(), 2);
    }

    #[test]
    fn per_end_observation() {
        let o = observation(ObservationKind::Bearing {
            end: End::B,
            length: Some(inches(1.0)),
            on: BearingSupport::Wood,
        });
        let f = run(check, with_bearing(3.0, BearingSupport::Wood), vec![o]);
        assert_eq!(f.len(), 2);
        assert_eq!(f[1].status, Status::OverLimit);
        assert!(f[1].summary().contains("end B"));
    }
}
