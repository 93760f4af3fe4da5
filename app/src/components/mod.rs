//! Reusable widgets.

mod live_card;
mod status_badge;

pub use live_card::LiveCard;
pub use status_badge::StatusBadge;
