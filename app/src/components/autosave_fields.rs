//! A set of fields saved one change at a time: each field keeps what was typed, its own error
//! under it, and a failed save is said in words under the set. The caller says how one change
//! is saved.

use super::{PathChange, PathFields};
use dioxus::prelude::*;
use undercroft_engine::forms::{FieldError, PathField};

#[component]
pub fn AutosaveFields(
    /// A prefix for element ids, so two sets on one screen do not collide.
    prefix: &'static str,
    fields: &'static [PathField],
    /// Each field's text as stored when the screen opened, in the order of `fields`.
    initial: Vec<String>,
    /// Saves one change: the field's error (or the store's, under "save") when it cannot.
    save: Callback<PathChange, Result<(), FieldError>>,
    /// Metric inspections get the millimetre keypad.
    #[props(default)]
    metric: bool,
) -> Element {
    let mut texts = use_signal(|| initial);
    let mut errors = use_signal(Vec::<FieldError>::new);
    let change = move |(name, text): PathChange| {
        if let Some(i) = fields.iter().position(|f| f.name == name) {
            texts.write()[i] = text.clone();
        }
        let mut kept: Vec<FieldError> = errors()
            .into_iter()
            .filter(|e| e.field != name && e.field != "save")
            .collect();
        if let Err(e) = save.call((name, text)) {
            kept.push(e);
        }
        errors.set(kept);
    };
    rsx! {
        PathFields { prefix, fields, values: texts(), errors: errors(), metric, on_change: change }
        for e in errors().iter().filter(|e| e.field == "save") {
            p { class: "field-error", role: "alert", "Not saved: {e.message}" }
        }
    }
}
