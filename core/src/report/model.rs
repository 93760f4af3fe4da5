//! The report as plain data: what each page says, in order. Snapshot-tested; the PDF printer
//! renders it and decides nothing about content.

use serde::Serialize;
use std::path::PathBuf;

/// Paper sizes, in points (1/72 in).
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, Default)]
#[serde(rename_all = "lowercase")]
pub enum Paper {
    #[default]
    Letter,
    A4,
}

impl Paper {
    /// (width, height) in points. Source: ANSI/ASME Y14.1 (letter 8.5 x 11 in); ISO 216 (A4
    /// 210 x 297 mm).
    pub fn size_pt(self) -> (f32, f32) {
        match self {
            Paper::Letter => (612.0, 792.0),
            Paper::A4 => (595.276, 841.89),
        }
    }

    pub fn parse(text: &str) -> Option<Paper> {
        match text.trim().to_lowercase().as_str() {
            "letter" | "us" => Some(Paper::Letter),
            "a4" => Some(Paper::A4),
            _ => None,
        }
    }
}

#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct Report {
    pub paper: Paper,
    /// Shown at the top of every page.
    pub running_head: String,
    pub cover: Cover,
    pub summary: Summary,
    pub areas: Vec<AreaSection>,
    pub appendix: Vec<TextSection>,
    pub limits: TextSection,
}

#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct Cover {
    pub title: String,
    pub property: String,
    /// Label and value pairs: client, inspector, company, license, date, conditions, code...
    pub facts: Vec<(String, String)>,
    pub notice: String,
}

#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct Summary {
    /// Counts by basis and status, the bases kept apart.
    pub counts: String,
    /// How the code edition stands to this house (a benchmark for an existing house).
    pub benchmark: Option<String>,
    /// Findings that need attention, in groups that keep code limits, engineering references
    /// and observed conditions apart; empty groups left out.
    pub groups: Vec<SummaryGroup>,
}

#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct SummaryGroup {
    pub title: String,
    pub lines: Vec<SummaryLine>,
}

#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct SummaryLine {
    /// "112 %" or the status when there is no ratio.
    pub use_text: String,
    pub text: String,
    pub location: String,
}

#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct AreaSection {
    pub heading: String,
    /// Kind of area and the loads used.
    pub about: String,
    pub notes: String,
    pub members: Vec<MemberRow>,
    pub findings: Vec<FindingBlock>,
    pub views: Vec<SideView>,
    /// Each girder line with its posts, spans and loads.
    pub girders: Vec<GirderView>,
    /// Photos of the area itself, and any not placed with a finding.
    pub photos: Vec<PhotoSlot>,
}

/// One row of an area's member table.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct MemberRow {
    pub member: String,
    pub size: String,
    pub species_grade: String,
    pub spacing: String,
    pub span: String,
    pub allowable: String,
    pub use_text: String,
    pub governs: String,
}

#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct FindingBlock {
    /// "OVER LIMIT 130 %", "within 52 %", "not checked".
    pub badge: String,
    pub over: bool,
    pub title: String,
    pub rule_id: String,
    pub location: String,
    pub summary: String,
    /// Label and value: measured, limit, use, citation.
    pub facts: Vec<(String, String)>,
    pub assumptions: Vec<String>,
    pub options: Vec<String>,
    pub recommendation: String,
    pub note: Option<String>,
    pub not_applicable: Option<String>,
    pub photos: Vec<PhotoSlot>,
}

#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct PhotoSlot {
    pub caption: String,
    /// The stored report-size JPEG, when it is on this device.
    pub file: Option<PathBuf>,
}

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

#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct TextSection {
    pub heading: String,
    pub paragraphs: Vec<String>,
}
