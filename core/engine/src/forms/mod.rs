//! Form state for the app's screens, as plain structs: what the inspector typed (text), how
//! it becomes the model (with an error per field), and the live check of a joist run while it
//! is being typed. No UI code: the app's components only read and call these.

mod framing_form;
mod header_form;
mod joist_walk;
mod live_check;
mod observation_form;
mod path_form;
mod picks;
mod plausible;
mod preview;

pub use framing_form::{keep_stored, FieldError, FramingForm};
pub use header_form::{
    area_with, inspection_with, AREA_FIELDS, AREA_KINDS, CODE_EDITIONS, INSPECTION_FIELDS,
};
pub use joist_walk::{
    first_place, joist_at, place_from_key, place_key, previous_joist, walk_label, walk_step,
};
pub use live_check::{live_check, LiveCheck};
pub use observation_form::{fields_of, FieldSpec, FieldType, ObservationForm, KINDS, SUPPORTS};
pub use path_form::{
    field_text, girder_with, post_position_problem, post_with, site_with, with_field, PathField,
    PathFieldType, GIRDER_FIELDS, POST_FIELDS, SITE_FIELDS,
};
pub use picks::{
    BRIDGING, END_RESTRAINTS, FINISHES, GRADES, MEMBER_KINDS, ROOM_USES, SIZES, SPECIES,
};
pub use plausible::{framing_question, Question};
pub use preview::{preview_observation, side_view_of, side_view_with};
