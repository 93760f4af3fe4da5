//! The live check card of a run: allowable span, use of it, what governs.

use super::StatusBadge;
use dioxus::prelude::*;
use undercroft_engine::forms::LiveCheck;

#[component]
pub fn LiveCard(check: LiveCheck) -> Element {
    let governing = check
        .governing
        .map(|g| g.name().to_string())
        .unwrap_or_default();
    rsx! {
        div { class: "card", id: "live-check",
            StatusBadge { status: check.status, label: check.status.label().to_string(), use_text: check.use_text.clone() }
            p { "{check.message}" }
            if let Some(allowable) = &check.allowable {
                p { class: "muted", "Allowable span {allowable}; {governing} governs" }
            }
        }
    }
}
