//! Reusable widgets.

mod autosave_fields;
mod framing_fields;
mod girder_svg;
mod live_card;
mod mark_editor;
mod observation_list;
mod office_sync;
mod path_fields;
mod photos;
mod question_card;
mod remove_button;
mod row_status;
mod share_pdf;
mod side_view;
mod status_badge;
mod tape_input;
mod top_bar;

pub use autosave_fields::AutosaveFields;
pub use framing_fields::{FieldChange, FramingFields};
pub use girder_svg::GirderSvg;
pub use live_card::LiveCard;
pub use mark_editor::MarkEditor;
pub use observation_list::ObservationList;
pub use office_sync::{sync_if_linked, OfficeSync};
pub use path_fields::{PathChange, PathFields};
pub use photos::{PhotoMessage, PhotoOutcome, PhotoPicker, Photos};
pub use question_card::QuestionCard;
pub use remove_button::RemoveButton;
pub use row_status::{worst_status, RowStatus};
pub use share_pdf::SharePdf;
pub use side_view::SideViewSvg;
pub use status_badge::StatusBadge;
pub use tape_input::{pressed, TapeInput, TapeState};
pub use top_bar::TopBar;
