//! Undercroft's engine: the inspection model and its interchange format, validation, and the
//! rules that turn measurements of wood floor framing into findings citing the governing
//! limit. Pure: no I/O, no C library, no clock, so it builds for any platform (the browser's
//! `wasm32-unknown-unknown` included).

pub mod engine;
pub mod finding;
pub mod forms;
pub mod generate;
pub mod geometry;
pub mod interchange;
pub mod load_path;
pub mod lumber;
pub mod mechanics;
pub mod model;
pub mod priority;
pub mod rules;
mod serde_text;
pub mod units;
pub mod validate;
pub mod views;
pub mod words;

pub use engine::{evaluate, Evaluation};
pub use finding::{Basis, Finding, Status};
pub use model::Inspection;

/// The caution every output carries.
pub const SCREENING_NOTICE: &str = "Screening tool, not an engineering evaluation. Findings compare field measurements with the prescriptive limits of the residential code edition named and with wood mechanics (NDS); local codes and amendments govern. Refer structural concerns to a licensed professional.";
