//! The client report: first a plain `Report` value built from an inspection and its findings
//! (sections, tables, findings, photo references, drawings as geometry), then a PDF printer
//! that only renders that value.

mod build;
mod girder_view;
mod model;
pub mod pdf;
mod side_view;

pub use build::{build_report, PhotoFiles, ReportInput};
pub use girder_view::girder_view_of;
pub use model::*;
pub use side_view::side_view as side_view_for;
