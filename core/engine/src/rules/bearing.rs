//! Bearing of joist ends (IRC R502.6): at least 1-1/2 in on wood or metal, 3 in on masonry or
//! concrete, or carried by hangers, ribbon or ledger strips; with the bearing that Fc-perp
//! requires for the computed reaction (NDS 3.10.2) beside it.

use super::shared::{dim, dim_min, Ends};
use crate::finding::{Basis, Bound, Check, Finding, Missing, RuleInfo, Status, Value, Wording};
use crate::model::{Bearing, BearingSupport, End, ObservationKind};
use crate::units::{Length, UnitSystem};
use crate::validate::MemberContext;
use std::sync::Arc;

pub const RULE: RuleInfo = RuleInfo {
    id: "bearing-length",
    title: "Bearing at joist ends",
    code_section: Some("R502.6, R502.6.2"),
    other_source: Some("NDS 2018 3.10.2 (bearing perpendicular to grain)"),
    basis: Basis::CodeLimit,
};

/// Source: IRC 2018 R502.6: not less than 1-1/2 in on wood or metal, 3 in on masonry or
/// concrete. R502.6.2: joists framing into the side of a girder bear on ledger strips not
/// less than nominal 2x2 (1-1/2 in dressed), so a joist on a ledger is held to 1-1/2 in of it.
fn minimum_bearing(on: BearingSupport) -> Option<Length> {
    match on {
        BearingSupport::Wood | BearingSupport::Metal | BearingSupport::Ledger => {
            Some(Length::inches(1.5))
        }
        BearingSupport::Masonry | BearingSupport::Concrete => Some(Length::inches(3.0)),
        BearingSupport::Hanger | BearingSupport::Ribbon => None,
    }
}

/// Ends with damage over the bearing, and how far in from the end it reaches.
fn damaged_ends(ctx: &MemberContext) -> Vec<(End, Option<Length>)> {
    ctx.observations
        .iter()
        .filter_map(|o| match o.kind {
            ObservationKind::Damage {
                at_end: Some(end),
                reach,
                ..
            } => Some((end, reach)),
            _ => None,
        })
        .collect()
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
    /// The least bearing left sound where damage at an end eats into it.
    pub sound: Option<Length>,
}

pub fn check(ctx: &MemberContext, out: &mut Vec<Finding>) {
    // Bearing is re-checked wherever the span is (a wet joist of a dry run, say).
    if ctx.report_framing || ctx.report_span {
        match ctx.framing.bearing {
            Some(bearing) => out.push(one(ctx, bearing, Ends::Both, None)),
            None => out.push(ctx.finding(&RULE, None).not_checked(
                "bearing not recorded",
                Missing("Record the bearing length and what the joists bear on."),
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
    let b = ctx.finding(&RULE, observation);
    let minimum = minimum_bearing(bearing.on);
    let detail = |length, reaction, sound| BearingDetail {
        ends,
        on: bearing.on,
        length,
        minimum,
        reaction,
        sound,
    };
    let Some(minimum) = minimum else {
        return b
            .check(Check::qualitative(
                format!("support at {}", ends.name()),
                bearing.on.name(),
                "an approved joist hanger, or a 1x4 ribbon let into the studs with the joist nailed to the stud",
                true,
            ))
            .finish(detail(bearing.length.unwrap_or_default(), None, None));
    };
    let Some(length) = bearing.length else {
        return b.not_checked(
            format!("bearing length at {} not measured", ends.name()),
            Missing("Measure the bearing length at the joist ends."),
        );
    };
    let mut b = b.check(Check::numeric(
        format!("bearing on {} at {}", bearing.on.name(), ends.name()),
        Value::Length(length),
        Value::Length(minimum),
        Bound::AtLeast,
        ctx.units,
    ));
    // Damage at an end over the bearing: only the sound wood beyond it bears.
    let mut sound: Option<Length> = None;
    for (end, reach) in damaged_ends(ctx) {
        if let Ends::One(e) = ends {
            if e != end {
                continue;
            }
        }
        let at = Ends::One(end).name();
        b = b.check(match reach {
            Some(reach) => {
                let left = Length::inches((length - reach).in_inches().max(0.0));
                sound = Some(sound.map_or(left, |s: Length| if left < s { left } else { s }));
                Check::numeric(
                    format!("sound bearing at {at}, past the damage"),
                    Value::Length(left),
                    Value::Length(minimum),
                    Bound::AtLeast,
                    ctx.units,
                )
            }
            None => Check::skipped(
                format!("sound bearing at {at}, past the damage"),
                format!("{} minimum", dim(ctx.units, minimum)),
                format!("damage at {at}: how far it reaches in from the end was not measured"),
            ),
        });
    }
    let mut reaction = None;
    if let (Some(result), Some(span)) = (&ctx.span, ctx.clear_span()) {
        let required = result.required_bearing(span);
        reaction = Some((result.reaction_lb(span), required, result.fc_perp().0));
        b = b.check(Check::numeric(
            "bearing the computed reaction needs on the wood",
            Value::Length(sound.unwrap_or(length)),
            Value::Length(required),
            Bound::AtLeast,
            ctx.units,
        ));
    }
    b.finish(detail(length, reaction, sound))
}

impl Wording for BearingDetail {
    fn summary(&self, u: UnitSystem) -> String {
        let Some(minimum) = self.minimum else {
            return match self.on {
                BearingSupport::Ribbon => format!(
                    "Joists at {} on a 1x4 ribbon let into the studs, each nailed to the stud beside it, in place of bearing on a plate",
                    self.ends.name()
                ),
                _ => format!(
                    "Joists at {} carried by {}s: R502.6 accepts approved hangers in place of bearing length",
                    self.ends.name(),
                    self.on.name()
                ),
            };
        };
        let mut text = format!(
            "Bearing {} on {} at {}, minimum {}",
            dim(u, self.length),
            self.on.name(),
            self.ends.name(),
            dim_min(u, minimum)
        );
        if self.on == BearingSupport::Ledger {
            text.push_str(" (R502.6.2: a ledger strip at least nominal 2x2 under the joists)");
        }
        if let Some(sound) = self.sound {
            text.push_str(&format!(
                "; only {} of it is sound past the damage",
                dim(u, sound)
            ));
        }
        if let Some((lb, required, _)) = self.reaction {
            text.push_str(&format!(
                "; the reaction of {} needs {}",
                crate::finding::Value::Pounds(lb).text(u),
                dim_min(u, required)
            ));
        }
        text
    }

    fn assumptions(&self, _: UnitSystem) -> Vec<String> {
        match (self.minimum, self.reaction) {
            (None, _) => vec![format!("The {} and its nailing were not evaluated for capacity", self.on.name())],
            (Some(_), Some((_, _, fc_perp))) => vec![format!(
                "Reaction = total load x clear span / 2; Fc-perp' {fc_perp:.0} psi over the joist thickness, bearing area factor Cb taken as 1.0"
            )],
            _ => vec![],
        }
    }

    fn recommendation(&self, status: Status, _: UnitSystem) -> String {
        match (self.minimum, status) {
            (None, _) if self.on == BearingSupport::Ribbon => "Confirm the ribbon is let into the studs and each joist is nailed to the stud beside it.".into(),
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
    use crate::model::DamageCause;
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

    // Source: IRC 2018 R502.6 (1-1/2 in on wood): decay reaching 1 in into a 3 in bearing
    // leaves 2 in sound (within); reaching 2 in leaves 1 in (over).
    #[test]
    fn decay_at_an_end_shortens_the_bearing() {
        let decay = |reach: Option<f64>| {
            vec![observation(ObservationKind::Damage {
                cause: DamageCause::Decay,
                severity: String::new(),
                extent: String::new(),
                at_end: Some(End::A),
                reach: reach.map(inches),
            })]
        };
        let f = &run(
            check,
            with_bearing(3.0, BearingSupport::Wood),
            decay(Some(1.0)),
        )[0];
        assert_eq!(f.status, Status::Within);
        let f = &run(
            check,
            with_bearing(3.0, BearingSupport::Wood),
            decay(Some(2.0)),
        )[0];
        assert_eq!(f.status, Status::OverLimit);
        assert!(
            f.summary().contains("only 1\" of it is sound"),
            "{}",
            f.summary()
        );
        let f = &run(check, with_bearing(3.0, BearingSupport::Wood), decay(None))[0];
        assert_eq!(f.status, Status::Incomplete);
    }

    // Source: IRC 2018 R502.6.2: ledger strips at least nominal 2x2 (1-1/2 in dressed).
    #[test]
    fn ledger_strips_are_held_to_a_2x2() {
        assert_eq!(
            status(check, with_bearing(1.0, BearingSupport::Ledger), vec![]),
            Status::OverLimit
        );
        let f = &run(check, with_bearing(1.5, BearingSupport::Ledger), vec![])[0];
        assert!(f.summary().contains("R502.6.2"), "{}", f.summary());
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
