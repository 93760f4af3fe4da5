//! Where defects sit on a member's side view: positions along the span from support A, heights
//! from the bottom edge, the end zones and middle third, and clear distances between defects.

use crate::model::{Edge, End, ObservationKind};
use crate::units::Length;

/// A rectangle on the side view: x along the span from the face of support A, y up from the
/// bottom edge, inches.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Rect {
    pub x0: f64,
    pub x1: f64,
    pub y0: f64,
    pub y1: f64,
}

/// A bored hole on the side view.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Circle {
    pub x: f64,
    pub y: f64,
    pub r: f64,
}

/// Position along the span from support A of a point `from` the face of support `end`,
/// extending `extent` away from that support. Needs the span when measured from end B.
fn along(from: f64, extent: f64, end: End, span: Option<Length>) -> Option<(f64, f64)> {
    match end {
        End::A => Some((from, from + extent)),
        End::B => span.map(|s| (s.in_inches() - from - extent, s.in_inches() - from)),
    }
}

/// The notch as a rectangle. A notch at the end with no distance given sits over the bearing,
/// just outside the clear span.
pub fn notch_rect(kind: &ObservationKind, depth: Length, span: Option<Length>) -> Option<Rect> {
    let ObservationKind::Notch {
        edge,
        depth: nd,
        length,
        at_end,
        from_support,
        end,
    } = kind
    else {
        return None;
    };
    let from = match (from_support, at_end) {
        (Some(f), _) => f.in_inches(),
        (None, true) => -length.in_inches(),
        (None, false) => return None,
    };
    let (x0, x1) = along(from, length.in_inches(), *end, span)?;
    let (y0, y1) = match edge {
        Edge::Bottom => (0.0, nd.in_inches()),
        Edge::Top => (depth.in_inches() - nd.in_inches(), depth.in_inches()),
    };
    Some(Rect { x0, x1, y0, y1 })
}

/// The hole as a circle.
pub fn hole_circle(kind: &ObservationKind, span: Option<Length>) -> Option<Circle> {
    let ObservationKind::Hole {
        diameter,
        from_support,
        end,
        center_above_bottom,
    } = kind
    else {
        return None;
    };
    let (x, _) = along(from_support.in_inches(), 0.0, *end, span)?;
    Some(Circle {
        x,
        y: center_above_bottom.in_inches(),
        r: diameter.in_inches() / 2.0,
    })
}

/// Clear distance between a hole's edge and a rectangle (0 if they touch or overlap).
pub fn circle_to_rect(c: Circle, r: Rect) -> f64 {
    let dx = (r.x0 - c.x).max(0.0).max(c.x - r.x1);
    let dy = (r.y0 - c.y).max(0.0).max(c.y - r.y1);
    (dx.hypot(dy) - c.r).max(0.0)
}

/// Clear distance between two holes' edges (0 if they touch or overlap).
pub fn circle_to_circle(a: Circle, b: Circle) -> f64 {
    ((a.x - b.x).hypot(a.y - b.y) - a.r - b.r).max(0.0)
}

/// The middle third of a span, from support A.
pub fn middle_third(span: Length) -> (f64, f64) {
    let s = span.in_inches();
    (s / 3.0, 2.0 * s / 3.0)
}

#[cfg(test)]
mod tests {
    use super::*;

    // Common practice, no source: plane geometry.
    #[test]
    fn clear_distances() {
        let c = Circle {
            x: 10.0,
            y: 5.0,
            r: 1.0,
        };
        let r = Rect {
            x0: 14.0,
            x1: 20.0,
            y0: 0.0,
            y1: 2.0,
        };
        assert!((circle_to_rect(c, r) - (4.0f64.hypot(3.0) - 1.0)).abs() < 1e-12);
        let d = Circle {
            x: 16.0,
            y: 5.0,
            r: 2.0,
        };
        assert_eq!(circle_to_circle(c, d), 3.0);
        assert_eq!(circle_to_circle(c, c), 0.0);
    }

    #[test]
    fn positions_from_end_b_need_the_span() {
        let hole = ObservationKind::Hole {
            diameter: Length::inches(2.0),
            from_support: Length::inches(30.0),
            end: End::B,
            center_above_bottom: Length::inches(4.0),
        };
        assert_eq!(hole_circle(&hole, None), None);
        assert_eq!(
            hole_circle(&hole, Some(Length::inches(180.0))).unwrap().x,
            150.0
        );
    }
}
