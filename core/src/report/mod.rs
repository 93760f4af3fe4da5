//! The client report: first a plain `Report` value built from an inspection and its findings
//! (what must be done first, numbered findings grouped where alike, checks met as tables,
//! photos and drawings as numbered figures), then a PDF printer that only renders that value.

mod appendix;
mod areas;
mod build;
mod girder_view;
mod grouping;
mod model;
pub mod pdf;
pub mod readiness;
mod renumber;
mod side_view;
mod wording;

pub use wording::count;

pub use build::{build_report, PhotoFiles, ReportInput};
pub use girder_view::girder_view_of;
pub use model::*;
pub use side_view::side_view as side_view_for;
