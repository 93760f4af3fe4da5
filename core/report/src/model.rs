//! The report as plain data: what each page says, in order. Snapshot-tested; the PDF printer
//! renders it and decides nothing about content.

use serde::Serialize;
use std::path::PathBuf;
use undercroft_engine::views::{GirderView, SideView};

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
    /// The PDF's own title, author and subject.
    pub meta: Meta,
    pub cover: Cover,
    /// The first page: what must be done, by whom and how soon.
    pub actions: Actions,
    pub areas: Vec<AreaSection>,
    /// The inspector's signed statement.
    pub attestation: Attestation,
    /// For the professional reader: each numbered finding's rule and citation.
    pub professional: Vec<ProfessionalNote>,
    /// The assumptions behind the findings, each said once with the findings it is behind.
    pub assumptions: Vec<(String, Vec<usize>)>,
    pub appendix: Vec<TextSection>,
    pub limits: TextSection,
}

#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct Meta {
    pub title: String,
    pub author: String,
    pub subject: String,
}

#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct Cover {
    pub title: String,
    pub property: String,
    /// Label and value pairs: client, inspector, company, license, date, conditions, code...
    pub facts: Vec<(String, String)>,
    pub notice: String,
    /// A photo of the house, when the inspector took one.
    pub photo: Option<Figure>,
}

#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct Actions {
    /// How many findings need action, in one sentence.
    pub lead: String,
    /// The action items in groups of one priority, most pressing first; empty groups left out.
    pub groups: Vec<ActionGroup>,
    /// Entries the engine could not use: for the inspector to correct.
    pub input_problems: Vec<ProblemLine>,
    /// Findings the inspector set aside, with why.
    pub set_aside: Vec<ProblemLine>,
    /// Counts by basis and status, in words.
    pub counts: String,
    /// How the code edition stands to this house.
    pub benchmark: Option<String>,
}

#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct ActionGroup {
    /// "Engineer first".
    pub label: String,
    /// Who acts and how soon, in a sentence.
    pub meaning: String,
    pub items: Vec<ActionItem>,
}

#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct ActionItem {
    /// The finding's number in the report.
    pub number: usize,
    /// One plain sentence: what, where it stands against its limit.
    pub sentence: String,
    pub location: String,
    /// The status on its basis and the provision cited: "Over the code limit: IRC 2018 R502.6".
    pub basis: String,
    /// Where else the same finding was made, for a finding of several joists or posts.
    pub also_at: Vec<String>,
    pub what_to_do: String,
    /// What the inspector wrote on the observation when it was made.
    pub noted_on_site: Option<String>,
    pub note: Option<String>,
    /// Computed repair options, only when the inspector turned them on.
    pub options: Vec<String>,
    /// The finding's own photos.
    pub photos: Vec<Figure>,
    /// Figure numbers of drawings of the members it is about.
    pub drawings: Vec<usize>,
}

#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct ProblemLine {
    pub location: String,
    pub text: String,
}

#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct AreaSection {
    pub heading: String,
    /// Kind of area and the loads used.
    pub about: String,
    pub notes: String,
    /// Numbered findings the inspector said need no action (those that need action are told
    /// in full on the first pages).
    pub findings: Vec<NotedRow>,
    /// Checks met: what was checked, where, measured and limit, alike rows merged.
    pub checked: Vec<CheckedRow>,
    /// Scaled side views of joists with notches, holes or sag readings.
    pub views: Vec<Drawing<SideView>>,
    /// Each girder line with its posts, spans and loads.
    pub girders: Vec<Drawing<GirderView>>,
    /// Photos of the area itself, and any not placed with a finding.
    pub photos: Vec<Figure>,
}

/// A drawing with its figure number.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct Drawing<T> {
    pub figure: usize,
    pub view: T,
}

/// A numbered finding as a table row.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct NotedRow {
    pub number: usize,
    pub status: String,
    pub what: String,
    pub location: String,
    /// Measured against the limit, or why it was not checked.
    pub detail: String,
    /// Photos and drawings of it.
    pub figures: Vec<usize>,
}

/// A check met, as a table row.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct CheckedRow {
    pub what: String,
    pub location: String,
    pub measured: String,
    pub limit: String,
}

/// A photo with its figure number and caption.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct Figure {
    pub number: usize,
    pub caption: String,
    /// The stored report-size JPEG, when it is on this device.
    pub file: Option<PathBuf>,
    /// Arrows, circles and dimensions drawn over the image.
    #[serde(skip_serializing_if = "Vec::is_empty")]
    pub marks: Vec<undercroft_engine::model::PhotoMark>,
}

#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct Attestation {
    pub statement: String,
    /// Label and value: inspector, license, company, date.
    pub lines: Vec<(String, String)>,
}

#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct ProfessionalNote {
    pub number: usize,
    pub rule_id: String,
    pub citation: String,
    /// Every check made, with its numbers.
    pub checks: Vec<String>,
}

#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct TextSection {
    pub heading: String,
    pub paragraphs: Vec<String>,
}
