//! The screens, one per route.

mod area;
mod findings;
mod inspection;
mod inspections;
mod member;
mod observation;
mod report;
mod run;
mod settings;

pub use area::AreaView;
pub use findings::Findings;
pub use inspection::InspectionView;
pub use inspections::Inspections;
pub use member::MemberView;
pub use observation::ObservationView;
pub use report::ReportView;
pub use run::RunView;
pub use settings::SettingsView;
