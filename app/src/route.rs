//! The app's screens and their addresses.

use crate::views::{
    AreaView, Findings, GirderScreen, InspectionView, Inspections, JoistWalk, MemberView,
    ObservationView, PostScreen, ReportView, RunView, SettingsView,
};
use dioxus::prelude::*;

#[derive(Routable, Clone, PartialEq, Debug)]
pub enum Route {
    /// Inspections, newest first; search; start one.
    #[route("/")]
    Inspections {},
    /// One inspection: its areas and what is over a limit in each.
    #[route("/inspection/:id")]
    InspectionView { id: String },
    /// One area: its joist runs and single members.
    #[route("/area/:id")]
    AreaView { id: String },
    /// One joist run: its framing, checked live as it is typed.
    #[route("/run/:id")]
    RunView { id: String },
    /// The joist walk along a run: the joist at `at` inches from where the walk began.
    #[route("/walk/:run/:at")]
    JoistWalk { run: String, at: String },
    /// One joist of a run, or a single member: its framing, observations and photos.
    #[route("/member/:id")]
    MemberView { id: String },
    /// One girder line: its posts along a scaled side view, the joists it carries, findings.
    #[route("/girder/:id")]
    GirderScreen { id: String },
    /// One post under a girder: size, height, ends, base, footing, what was seen.
    #[route("/post/:id")]
    PostScreen { id: String },
    /// One observation on a run or member (new when `id` is not stored yet): its fields,
    /// the verdict with its citation, and the side view, live.
    #[route("/observe/:owner/:kind/:id")]
    ObservationView {
        owner: String,
        kind: String,
        id: String,
    },
    /// Build the client report and see earlier deliveries.
    #[route("/inspection/:id/report")]
    ReportView { id: String },
    /// The inspector, units, code edition, default loads.
    #[route("/settings")]
    SettingsView {},
    /// Every finding of an inspection, over limit first.
    #[route("/inspection/:id/findings")]
    Findings { id: String },
}
