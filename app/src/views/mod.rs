//! The screens, one per route.

mod area;
mod findings;
mod inspection;
mod inspections;
mod run;

pub use area::AreaView;
pub use findings::Findings;
pub use inspection::InspectionView;
pub use inspections::Inspections;
pub use run::RunView;
