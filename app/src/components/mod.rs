//! Reusable widgets.

mod live_card;
mod photos;
mod side_view;
mod status_badge;

pub use live_card::LiveCard;
pub use photos::Photos;
pub use side_view::SideViewSvg;
pub use status_badge::StatusBadge;
