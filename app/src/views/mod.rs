//! The screens, one per route.

mod area;
mod finding_route;
mod findings;
mod findings_filter;
mod girder;
mod inspection;
mod inspections;
mod member;
mod observation;
mod post;
mod report;
mod run;
mod settings;
mod walk;

pub use area::AreaView;
pub use findings::Findings;
pub use girder::GirderScreen;
pub use inspection::InspectionView;
pub use inspections::Inspections;
pub use member::MemberView;
pub use observation::ObservationView;
pub use post::PostScreen;
pub use report::ReportView;
pub use run::RunView;
pub use settings::SettingsView;
pub use walk::JoistWalk;
