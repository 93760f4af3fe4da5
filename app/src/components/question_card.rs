//! A question about a value that reads but cannot be what was meant, under its field: what
//! looks wrong, a button to keep the value, and the likely reading when one stands out.

use dioxus::prelude::*;
use undercroft_engine::forms::Question;

#[component]
pub fn QuestionCard(
    id: String,
    question: Question,
    on_keep: EventHandler<()>,
    /// The likely reading chosen: its text goes into the field.
    on_instead: EventHandler<String>,
) -> Element {
    rsx! {
        div { class: "question", id: "{id}", role: "alert",
            p { "{question.message} Nothing is saved until you answer." }
            div { class: "answers",
                if let Some((label, text)) = question.instead.clone() {
                    button { id: "{id}-instead", onclick: move |_| on_instead.call(text.clone()), "{label}" }
                }
                button { class: "quiet", id: "{id}-keep", onclick: move |_| on_keep.call(()), "{question.keep}" }
            }
        }
    }
}
