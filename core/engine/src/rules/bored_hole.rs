//! Bored holes in sawn lumber joists (IRC R502.8.1): diameter, distance from the edges, from
//! other holes and from notches.

use super::shared::{dim, dim_max, dim_min, len};
use crate::finding::{Basis, Bound, Check, Finding, Missing, RuleInfo, Status, Value, Wording};
use crate::geometry::{circle_to_circle, circle_to_rect, hole_circle, notch_rect};
use crate::model::ObservationKind;
use crate::units::{Length, UnitSystem};
use crate::validate::MemberContext;
use std::sync::Arc;

pub const RULE: RuleInfo = RuleInfo {
    id: "sawn-bored-hole",
    title: "Bored hole in a sawn joist",
    code_section: Some("R502.8.1"),
    other_source: None,
    basis: Basis::CodeLimit,
};

/// Source: IRC 2018 R502.8.1: hole diameter not over 1/3 of the member's depth; holes not
/// closer than 2 in to the top or bottom of the member, to any other hole, or to a notch.
const MAX_DIAMETER: f64 = 1.0 / 3.0;
const MIN_CLEARANCE: Length = Length::inches(2.0);

pub fn check(ctx: &MemberContext, out: &mut Vec<Finding>) {
    if ctx.kind.is_engineered() {
        return;
    }
    out.extend(
        ctx.observations
            .iter()
            .filter(|o| matches!(o.kind, ObservationKind::Hole { .. }))
            .map(|o| one(ctx, &o.id, &o.kind)),
    );
}

/// What a bored-hole finding is worded from.
#[derive(Debug, Clone, PartialEq)]
pub struct HoleDetail {
    pub diameter: Length,
    pub from_support: Length,
    pub centre_above_bottom: Length,
    pub member_depth: Length,
}

fn one(ctx: &MemberContext, id: &Arc<str>, kind: &ObservationKind) -> Finding {
    let ObservationKind::Hole {
        diameter,
        from_support,
        center_above_bottom,
        ..
    } = kind
    else {
        unreachable!("filtered to holes")
    };
    let b = ctx.finding(&RULE, Some(id));
    let Some(d) = ctx.depth() else {
        return b.not_checked(
            "joist size not entered, so its depth is unknown",
            Missing("Enter the joist size to check the hole."),
        );
    };
    let u = ctx.units;
    let r = diameter.in_inches() / 2.0;
    let y = center_above_bottom.in_inches();
    let to_top = Length::inches((d.in_inches() - y - r).max(0.0));
    let to_bottom = Length::inches((y - r).max(0.0));
    let clearance = |what: &'static str, measured: Length| {
        Check::numeric(
            what,
            Value::Length(measured),
            Value::Length(MIN_CLEARANCE),
            Bound::AtLeast,
            u,
        )
    };
    let mut b = b
        .check(Check::numeric(
            "hole diameter",
            Value::Length(*diameter),
            Value::Length(d * MAX_DIAMETER),
            Bound::AtMost,
            u,
        ))
        .check(clearance("distance to the top edge", to_top))
        .check(clearance("distance to the bottom edge", to_bottom));

    let span = ctx.clear_span();
    let me = hole_circle(kind, span);
    let others: Vec<_> = ctx.observations.iter().filter(|o| o.id != *id).collect();
    if others
        .iter()
        .any(|o| matches!(o.kind, ObservationKind::Hole { .. }))
    {
        let nearest = me.and_then(|c| {
            let mut gaps = others
                .iter()
                .filter_map(|o| hole_circle(&o.kind, span).map(|h| circle_to_circle(c, h)));
            let first = gaps.next()?;
            Some(gaps.fold(first, f64::min))
        });
        b = b.check(match nearest {
            Some(gap) => clearance("distance to the nearest other hole", Length::inches(gap)),
            None => Check::skipped(
                "distance to the nearest other hole",
                dim(u, MIN_CLEARANCE),
                "positions measured from different supports and the clear span not entered",
            ),
        });
    }
    if others
        .iter()
        .any(|o| matches!(o.kind, ObservationKind::Notch { .. }))
    {
        let nearest = me.and_then(|c| {
            let mut gaps = others
                .iter()
                .filter_map(|o| notch_rect(&o.kind, d, span).map(|n| circle_to_rect(c, n)));
            let first = gaps.next()?;
            Some(gaps.fold(first, f64::min))
        });
        b = b.check(match nearest {
            Some(gap) => clearance("distance to the nearest notch", Length::inches(gap)),
            None => Check::skipped(
                "distance to the nearest notch",
                dim(u, MIN_CLEARANCE),
                "the notch's position is not known on the same line",
            ),
        });
    }
    b.finish(HoleDetail {
        diameter: *diameter,
        from_support: *from_support,
        centre_above_bottom: *center_above_bottom,
        member_depth: d,
    })
}

impl Wording for HoleDetail {
    fn summary(&self, u: UnitSystem) -> String {
        format!(
            "Hole {} across, {} from the support, centre {} above the bottom of a {} deep joist; limits d/3 = {} across, {} from edges, holes and notches",
            dim(u, self.diameter),
            len(u, self.from_support),
            dim(u, self.centre_above_bottom),
            dim(u, self.member_depth),
            dim_max(u, self.member_depth * MAX_DIAMETER),
            dim_min(u, MIN_CLEARANCE)
        )
    }

    fn recommendation(&self, status: Status, _: UnitSystem) -> String {
        match status {
            Status::OverLimit => "The hole exceeds the code's limits. Refer to a licensed professional for a repair design; do not bore further holes in this joist.".into(),
            Status::NearLimit => "The hole is close to a limit; do not enlarge it or bore near it.".into(),
            _ => "Within the code's limits for bored holes.".into(),
        }
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::model::{Edge, End};
    use crate::rules::testing::*;

    fn hole(id: &str, diameter: f64, from: f64, centre: f64) -> crate::model::Observation {
        let mut o = observation(ObservationKind::Hole {
            diameter: inches(diameter),
            from_support: inches(from),
            end: End::A,
            center_above_bottom: inches(centre),
        });
        o.id = id.into();
        o
    }

    fn first(obs: Vec<crate::model::Observation>) -> Status {
        run(check, spf_no2((2, 10), 180.0), obs)[0].status
    }

    // Source: IRC 2018 R502.8.1. 2x10, d = 9.25 in: diameter <= 3.083 in; edges >= 2 in.
    #[test]
    fn diameter_and_edges() {
        let table = [
            (2.0, 4.625, Status::Within),      // 3.625 in clear each side
            (3.0, 4.625, Status::NearLimit),   // 97 % of d/3; 3.125 in clear
            (3.125, 4.625, Status::OverLimit), // over d/3
            (1.0, 2.5, Status::NearLimit),     // 2.0 in to the bottom edge: at the limit
            (1.0, 2.4, Status::OverLimit),     // 1.9 in to the bottom edge
            (1.0, 6.75, Status::NearLimit),    // 2.0 in to the top edge
            (1.0, 6.9, Status::OverLimit),
        ];
        for (diameter, centre, expect) in table {
            assert_eq!(
                first(vec![hole("h", diameter, 30.0, centre)]),
                expect,
                "{diameter} at {centre}"
            );
        }
    }

    // A hole whose neighbouring notch cannot be placed is not fully checked (the 2 in to
    // a notch of IRC 2018 R502.8.1 was not checked), never within.
    #[test]
    fn an_unplaced_notch_leaves_the_hole_not_fully_checked() {
        let notch = observation(ObservationKind::Notch {
            edge: Edge::Bottom,
            depth: inches(1.0),
            length: inches(2.0),
            at_end: false,
            from_support: None,
            end: End::A,
        });
        let f = &run(
            check,
            spf_no2((2, 10), 180.0),
            vec![hole("a", 1.0, 30.0, 4.625), notch],
        )[0];
        assert_eq!(f.status, Status::Incomplete);
        assert_eq!(f.status_label(), "not fully checked");
        assert!(f
            .not_checked_because
            .as_deref()
            .unwrap()
            .contains("distance to the nearest notch"));
        assert!(
            !f.recommendation().contains("Within"),
            "{}",
            f.recommendation()
        );
    }

    // Source: IRC 2018 R502.8.1, 2 in between holes and from notches.
    #[test]
    fn spacing_to_holes_and_notches() {
        // 1 in holes with centres 3 in apart: 2 in clear.
        assert_eq!(
            first(vec![
                hole("a", 1.0, 30.0, 4.625),
                hole("b", 1.0, 33.0, 4.625)
            ]),
            Status::NearLimit
        );
        assert_eq!(
            first(vec![
                hole("a", 1.0, 30.0, 4.625),
                hole("b", 1.0, 32.5, 4.625)
            ]),
            Status::OverLimit
        );
        let notch = observation(ObservationKind::Notch {
            edge: Edge::Bottom,
            depth: inches(1.5),
            length: inches(2.0),
            at_end: false,
            from_support: Some(inches(20.0)),
            end: End::A,
        });
        // Notch 1.5 in deep from x = 20 to 22; a 1 in hole above it centred 4 in up: 2.0 in
        // clear; centred 3.9 in up: 1.9 in clear.
        assert_eq!(
            first(vec![hole("a", 1.0, 21.0, 4.0), notch.clone()]),
            Status::NearLimit
        );
        assert_eq!(
            first(vec![hole("a", 1.0, 21.0, 3.9), notch.clone()]),
            Status::OverLimit
        );
        // Beside the notch: x = 24.5, centre at 1 in up: 2.5 - 0.5 = 2.0 in clear horizontally,
        // but only 0.5 in from the bottom edge, which governs.
        assert_eq!(
            first(vec![hole("a", 1.0, 24.5, 1.0), notch]),
            Status::OverLimit
        );
    }
}
