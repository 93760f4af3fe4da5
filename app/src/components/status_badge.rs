//! A finding's status in words (never colour alone), with its use of the limit.

use dioxus::prelude::*;
use undercroft_core::Status;

#[component]
pub fn StatusBadge(status: Status, use_text: Option<String>) -> Element {
    let class = format!(
        "status status-{}",
        serde_json::to_value(status)
            .ok()
            .and_then(|v| v.as_str().map(str::to_string))
            .unwrap_or_default()
    );
    let text = match use_text {
        Some(u) => format!("{} {u}", status.label()),
        None => status.label().to_string(),
    };
    rsx! { span { class: "{class}", "{text}" } }
}
