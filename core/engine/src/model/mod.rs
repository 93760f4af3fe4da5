//! The inspection as entered: people, areas, joist runs, single members, girder lines and
//! their posts, observations, photos.
//! This is also the JSON interchange format (see `docs/inspection-format.md`).

mod date;
mod finding_note;
mod framing;
mod inspection;
mod load;
mod load_path;
mod marks;
mod observation;
pub mod renumber;
mod site;

pub use date::check_date;
pub use finding_note::FindingNote;
pub use framing::{
    ActualSize, Bearing, BearingSupport, Bridging, BridgingKind, EndRestraint, Framing, MemberKind,
};
pub use inspection::{
    Area, AreaKind, Client, Inspection, InspectorInfo, Joist, JoistRun, Member, MemberAt, PhotoRef,
    Property, FORMAT_NAME, FORMAT_VERSION,
};
pub use load::{LoadSettings, ResolvedLoads, RoomUse};
pub use load_path::{
    Footing, GirderKind, GirderLine, PlyFastening, PointLoad, Post, PostBase, PostCondition,
    PostHold, PostMaterial, SoilClass,
};
pub use marks::{marks_problem, PhotoMark, Spot, MOST_MARKS};
pub use observation::{
    CantileverLoad, DamageCause, Edge, End, Observation, ObservationKind, SagReading,
};
pub use site::{SiteConditions, VaporRetarder, Ventilation};
