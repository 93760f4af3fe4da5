//! The inspection as entered: people, areas, joist runs, single members, observations, photos.
//! This is also the JSON interchange format (see `docs/inspection-format.md`).

mod date;
mod framing;
mod inspection;
mod load;
mod observation;
pub mod renumber;

pub use date::check_date;
pub use framing::{
    ActualSize, Bearing, BearingSupport, Bridging, BridgingKind, EndRestraint, Framing, MemberKind,
};
pub use inspection::{
    Area, AreaKind, Client, Inspection, InspectorInfo, Joist, JoistRun, Member, MemberAt, PhotoRef,
    Property, FORMAT_NAME, FORMAT_VERSION,
};
pub use load::{LoadSettings, ResolvedLoads, RoomUse};
pub use observation::{DamageCause, Edge, End, Observation, ObservationKind, SagReading};
