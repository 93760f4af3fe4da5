//! Drawings as geometry: the side view of a joist (its notches, holes and sag) and of a
//! girder line (its supports, spans and loads), for the app's screens and the report to draw.

mod girder;
mod side;

pub use girder::{girder_view, girder_view_of};
pub use side::side_view;

use serde::Serialize;

/// A scaled side view of one joist: supports, end zones, middle third, defects, sag.
/// Geometry in inches: x along the clear span from the face of support A, y up from the
/// bottom edge.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct SideView {
    pub title: String,
    pub span_in: f64,
    pub depth_in: f64,
    pub span_text: String,
    pub depth_text: String,
    pub notches: Vec<ViewRect>,
    pub holes: Vec<ViewCircle>,
    /// Sag readings (x, sag), and the L/n reference sag.
    pub sag: Vec<(f64, f64)>,
    pub sag_reference_in: Option<f64>,
    pub sag_reference_text: String,
    /// The largest sag read, as text.
    pub sag_largest_text: String,
}

/// A scaled side view of a girder line: its ends and posts, the spans between them with
/// their use, the load from the joists it carries, and ply joints. Geometry in inches from
/// the face of the support at end A.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct GirderView {
    pub title: String,
    /// The drawn length: to end B, or a little past the last post when the length is not known.
    pub length_in: f64,
    pub end_b_known: bool,
    pub supports: Vec<SupportMark>,
    pub spans: Vec<SpanMark>,
    /// "830 lb/ft from Kitchen joists (7.6 ft), Dining room joists (6.2 ft)".
    pub load_text: String,
    /// Ply joints: position and whether it is over (between supports).
    pub splices: Vec<(f64, bool)>,
}

#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct SupportMark {
    pub x: f64,
    pub is_post: bool,
    pub label: String,
    /// The load brought to it, as text.
    pub load_text: String,
    /// Bearing as measured, as text.
    pub bearing_text: String,
    /// Some finding about this support is over its limit or to be evaluated.
    pub over: bool,
}

#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct SpanMark {
    pub x0: f64,
    pub x1: f64,
    pub label: String,
    pub over: bool,
}

#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct ViewRect {
    pub x0: f64,
    pub x1: f64,
    pub y0: f64,
    pub y1: f64,
    pub label: String,
    pub over: bool,
}

#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct ViewCircle {
    pub x: f64,
    pub y: f64,
    pub r: f64,
    pub label: String,
    pub over: bool,
}
