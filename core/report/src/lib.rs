//! The client report: first a plain `Report` value built from an inspection and its findings
//! (what must be done first, numbered findings grouped where alike, checks met as tables,
//! photos and drawings as numbered figures), then a PDF printer that only renders that value.

mod appendix;
mod areas;
mod build;
mod grouping;
mod model;
pub mod pdf;
pub mod readiness;
mod renumber;
mod wording;

pub use build::{build_report, PhotoFiles, ReportInput};
pub use model::*;
// The drawings of the report model are the engine's geometry.
pub use undercroft_engine::views::{GirderView, SideView};
