//! Removing an area, run, joist, member or observation: two taps (the second says what goes
//! with it), then the screen above it.

use crate::{use_app, Route};
use dioxus::prelude::*;

#[component]
pub fn RemoveButton(
    /// The id of what is removed.
    id: String,
    /// "this run", "this observation", ...
    what: &'static str,
    /// Where to go once it is gone.
    then: Route,
) -> Element {
    let app = use_app();
    let mut confirming = use_signal(|| false);
    let mut error = use_signal(|| None::<String>);
    let remove = move |_| {
        // Leave the screen first: it is about to show something that no longer exists.
        navigator().push(then.clone());
        if let Err(e) = app.change(|s| s.remove(&id)) {
            error.set(Some(e));
        }
    };
    rsx! {
        div { class: "danger-zone",
            if confirming() {
                p { "Remove {what}, with its observations and photos?" }
                button { class: "danger", id: "remove-confirm", onclick: remove, "Yes, remove it" }
                button { class: "quiet", onclick: move |_| confirming.set(false), "Keep it" }
            } else {
                button { class: "quiet", id: "remove", onclick: move |_| confirming.set(true), "Remove {what}" }
            }
            if let Some(e) = error() {
                p { class: "field-error", "{e}" }
            }
        }
    }
}
