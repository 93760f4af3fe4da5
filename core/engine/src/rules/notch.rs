//! Notches in sawn lumber joists (IRC R502.8.1): depth, length, the middle third, the ends,
//! and the tension side of members 4 in nominal or thicker.

use super::shared::{dim, dim_max, len};
use crate::finding::{Basis, Bound, Check, Finding, Missing, RuleInfo, Status, Value, Wording};
use crate::geometry::{middle_third, notch_rect};
use crate::model::{Edge, ObservationKind};
use crate::units::{Length, UnitSystem};
use crate::validate::MemberContext;
use std::sync::Arc;

pub const RULE: RuleInfo = RuleInfo {
    id: "sawn-notch",
    title: "Notch in a sawn joist",
    code_section: Some("R502.8.1"),
    other_source: None,
    basis: Basis::CodeLimit,
};

/// Source: IRC 2018 R502.8.1: notches not deeper than 1/6 of the member's depth, not longer
/// than 1/3 of its depth, not in the middle third of the span; notches at the ends not deeper
/// than 1/4 of the depth; the tension side of members 4 in nominal or thicker not notched
/// except at the ends.
const SPAN_NOTCH_DEPTH: f64 = 1.0 / 6.0;
const END_NOTCH_DEPTH: f64 = 1.0 / 4.0;
const NOTCH_LENGTH: f64 = 1.0 / 3.0;
const TENSION_SIDE_MIN_THICKNESS: u8 = 4;

/// What a notch finding is worded from.
#[derive(Debug, Clone, PartialEq)]
pub struct NotchDetail {
    pub at_end: bool,
    pub edge: Edge,
    pub depth: Length,
    pub length: Length,
    pub from_support: Option<Length>,
    /// Depth of the member.
    pub member_depth: Length,
    pub measured_section: bool,
}

pub fn check(ctx: &MemberContext, out: &mut Vec<Finding>) {
    if ctx.kind.is_engineered() {
        return;
    }
    out.extend(
        ctx.observations
            .iter()
            .filter(|o| matches!(o.kind, ObservationKind::Notch { .. }))
            .map(|o| one(ctx, &o.id, &o.kind)),
    );
}

fn one(ctx: &MemberContext, id: &Arc<str>, kind: &ObservationKind) -> Finding {
    let ObservationKind::Notch {
        edge,
        depth: notch_depth,
        length,
        at_end,
        from_support,
        ..
    } = kind
    else {
        unreachable!("filtered to notches")
    };
    let mut b = ctx.finding(&RULE, Some(id));
    let Some(section) = ctx.section else {
        return b.not_checked(
            "joist size not entered, so its depth is unknown",
            Missing("Enter the joist size to check the notch."),
        );
    };
    let d = section.depth;
    let u = ctx.units;
    if *at_end {
        b = b
            .check(Check::numeric(
                "end notch depth",
                Value::Length(*notch_depth),
                Value::Length(d * END_NOTCH_DEPTH),
                Bound::AtMost,
                u,
            ))
            .check(Check::numeric(
                "end notch length",
                Value::Length(*length),
                Value::Length(d * NOTCH_LENGTH),
                Bound::AtMost,
                u,
            ));
    } else {
        b = b
            .check(Check::numeric(
                "notch depth",
                Value::Length(*notch_depth),
                Value::Length(d * SPAN_NOTCH_DEPTH),
                Bound::AtMost,
                u,
            ))
            .check(Check::numeric(
                "notch length",
                Value::Length(*length),
                Value::Length(d * NOTCH_LENGTH),
                Bound::AtMost,
                u,
            ))
            .check(middle_third_check(ctx, kind, d));
        if section.nominal.thickness >= TENSION_SIDE_MIN_THICKNESS {
            // R502.3.3: over a cantilever's support and along the overhang the top edge is
            // the tension side, so a cantilevered member has none it may notch.
            let cantilevered = ctx
                .observations
                .iter()
                .any(|o| matches!(o.kind, ObservationKind::Cantilever { .. }));
            let edge_text = match (*edge, cantilevered) {
                (Edge::Top, false) => "top edge",
                (Edge::Top, true) => {
                    "top edge of a cantilevered member, in tension over its support"
                }
                (Edge::Bottom, _) => "bottom edge, away from the end",
            };
            b = b.check(Check::qualitative(
                "tension side",
                edge_text,
                if cantilevered {
                    "no notch in a tension edge except at the ends (both edges of a cantilevered member)"
                } else {
                    "no notch in the tension (bottom) edge except at the ends"
                },
                *edge == Edge::Top && !cantilevered,
            ));
        }
    }
    b.finish(NotchDetail {
        at_end: *at_end,
        edge: *edge,
        depth: *notch_depth,
        length: *length,
        from_support: *from_support,
        member_depth: d,
        measured_section: section.rough_sawn,
    })
}

impl Wording for NotchDetail {
    fn summary(&self, u: UnitSystem) -> String {
        let edge = if self.edge == Edge::Top {
            "top"
        } else {
            "bottom"
        };
        let d = self.member_depth;
        if self.at_end {
            format!(
                "Notch at the end, {} deep x {} long in the {edge} edge of a {} deep joist; limits d/4 = {} deep, d/3 = {} long",
                dim(u, self.depth),
                dim(u, self.length),
                dim(u, d),
                dim_max(u, d * END_NOTCH_DEPTH),
                dim_max(u, d * NOTCH_LENGTH)
            )
        } else {
            format!(
                "Notch {} deep x {} long in the {edge} edge, {} from the support, in a {} deep joist; limits d/6 = {} deep, d/3 = {} long, outside the middle third",
                dim(u, self.depth),
                dim(u, self.length),
                self.from_support
                    .map_or("distance not entered".to_string(), |f| len(u, f)),
                dim(u, d),
                dim_max(u, d * SPAN_NOTCH_DEPTH),
                dim_max(u, d * NOTCH_LENGTH)
            )
        }
    }

    fn assumptions(&self, u: UnitSystem) -> Vec<String> {
        let mut out = vec![format!(
            "Depth of the member d = {} ({})",
            dim(u, self.member_depth),
            if self.measured_section {
                "measured"
            } else {
                "dressed size"
            }
        )];
        if self.depth >= self.member_depth {
            out.push("The notch entered is as deep as the joist: check the entry".into());
        }
        out
    }

    fn recommendation(&self, status: Status, _: UnitSystem) -> String {
        match status {
            Status::OverLimit => "The notch exceeds the code's limits and weakens the joist. Refer to a licensed professional for a repair design (for example sistering or reinforcement); do not cut further.".into(),
            Status::NearLimit => "The notch is close to the limit; do not enlarge it.".into(),
            Status::Within => "Within the code's notch limits.".into(),
            _ => "Enter the missing measurements to check the notch.".into(),
        }
    }
}

/// The notch may not reach into the middle third: its farthest point from the nearest support
/// is held to L/3.
fn middle_third_check(ctx: &MemberContext, kind: &ObservationKind, d: Length) -> Check {
    const LIMIT: &str = "outside the middle third of the span";
    let Some(span) = ctx.clear_span() else {
        return Check::skipped("position in the span", LIMIT, "clear span not entered");
    };
    let Some(rect) = notch_rect(kind, d, Some(span)) else {
        return Check::skipped(
            "position in the span",
            LIMIT,
            "distance from the support not entered",
        );
    };
    let (third, _) = middle_third(span);
    let s = span.in_inches();
    let reach = if rect.x0 <= s / 2.0 && rect.x1 >= s / 2.0 {
        s / 2.0
    } else {
        rect.x0.min(s - rect.x0).max(rect.x1.min(s - rect.x1))
    };
    Check::numeric(
        "reach from the nearest support (the middle third starts at L/3)",
        Value::Length(Length::inches(reach.max(0.0))),
        Value::Length(Length::inches(third)),
        Bound::AtMost,
        ctx.units,
    )
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::model::End;
    use crate::rules::testing::*;

    fn notch(
        depth: f64,
        length: f64,
        from: Option<f64>,
        at_end: bool,
        edge: Edge,
    ) -> Vec<crate::model::Observation> {
        vec![observation(ObservationKind::Notch {
            edge,
            depth: inches(depth),
            length: inches(length),
            at_end,
            from_support: from.map(inches),
            end: End::A,
        })]
    }

    // Source: IRC 2018 R502.8.1. A 2x10 is 9-1/4 in deep: d/6 = 1.542 in, d/3 = 3.083 in,
    // d/4 = 2.3125 in. Span 180 in: the middle third starts 60 in from each support.
    #[test]
    fn limits_under_at_and_over() {
        let f = || spf_no2((2, 10), 180.0);
        let table = [
            // depth, length, from, at end, expected
            (1.25, 2.0, Some(24.0), false, Status::Within),
            (1.5, 2.0, Some(24.0), false, Status::NearLimit), // 97 % of d/6
            (1.5625, 2.0, Some(24.0), false, Status::OverLimit), // 1-9/16 > 1.542
            (1.0, 3.0, Some(24.0), false, Status::NearLimit), // 97 % of d/3
            (1.0, 3.25, Some(24.0), false, Status::OverLimit),
            (1.0, 2.0, Some(58.0), false, Status::NearLimit), // reaches 60 = L/3
            (1.0, 2.0, Some(58.5), false, Status::OverLimit), // into the middle third
            (1.0, 2.0, Some(88.0), false, Status::OverLimit), // at mid-span
            (2.25, 3.0, None, true, Status::NearLimit),       // end notch, 97 % of d/4
            (2.375, 3.0, None, true, Status::OverLimit),
            (2.0, 3.25, None, true, Status::OverLimit), // end notch longer than d/3
            (1.0, 2.0, None, false, Status::Incomplete), // middle third not checked
            (2.0, 3.0, Some(36.0), false, Status::OverLimit), // the 2 in notch 3 ft out
        ];
        for (depth, length, from, at_end, expect) in table {
            assert_eq!(
                status(check, f(), notch(depth, length, from, at_end, Edge::Bottom)),
                expect,
                "{depth} x {length} at {from:?}"
            );
        }
    }

    // Source: IRC 2018 R502.8.1, tension side of members 4 in nominal or thicker.
    #[test]
    fn tension_side_of_thick_members() {
        let mut f = spf_no2((4, 10), 180.0);
        f.spacing = Some(inches(48.0));
        assert_eq!(
            status(
                check,
                f.clone(),
                notch(1.0, 2.0, Some(24.0), false, Edge::Bottom)
            ),
            Status::OverLimit
        );
        assert_eq!(
            status(
                check,
                f.clone(),
                notch(1.0, 2.0, Some(24.0), false, Edge::Top)
            ),
            Status::Within
        );
        assert_eq!(
            status(check, f, notch(1.0, 2.0, None, true, Edge::Bottom)),
            Status::Within
        );
    }

    #[test]
    fn unknown_size_is_not_checked() {
        let mut f = spf_no2((2, 10), 180.0);
        f.size = None;
        assert_eq!(
            status(check, f, notch(1.0, 2.0, Some(24.0), false, Edge::Top)),
            Status::NotChecked
        );
    }
}
