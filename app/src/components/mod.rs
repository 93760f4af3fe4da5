//! Reusable widgets.

mod framing_fields;
mod girder_svg;
mod live_card;
mod observation_list;
mod path_fields;
mod photos;
mod remove_button;
mod side_view;
mod status_badge;

pub use framing_fields::{FieldChange, FramingFields};
pub use girder_svg::GirderSvg;
pub use live_card::LiveCard;
pub use observation_list::ObservationList;
pub use path_fields::{PathChange, PathFields};
pub use photos::Photos;
pub use remove_button::RemoveButton;
pub use side_view::SideViewSvg;
pub use status_badge::StatusBadge;
