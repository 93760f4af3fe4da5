//! A finding's status in words (never colour alone, and in the words of its basis: "over
//! code limit" only for a code limit), with its use of the limit.

use dioxus::prelude::*;
use undercroft_engine::Status;

#[component]
pub fn StatusBadge(status: Status, label: String, use_text: Option<String>) -> Element {
    let class = format!(
        "status status-{}",
        serde_json::to_value(status)
            .ok()
            .and_then(|v| v.as_str().map(str::to_string))
            .unwrap_or_default()
    );
    let text = match use_text {
        Some(u)
            if matches!(
                status,
                Status::OverLimit | Status::NearLimit | Status::Within
            ) =>
        {
            format!("{label} {u}")
        }
        _ => label,
    };
    rsx! { span { class: "{class}", "{text}" } }
}
