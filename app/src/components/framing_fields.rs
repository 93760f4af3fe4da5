//! The framing fields of a run, joist or member: picks for what can be picked, lengths typed
//! as a tape reads. For a joist, an empty field means "same as the run" and shows the run's
//! value.

use super::{QuestionCard, TapeInput};
use crate::edits::FieldCheck;
use dioxus::prelude::*;
use undercroft_engine::forms::{
    FieldError, FramingForm, Question, BRIDGING, END_RESTRAINTS, FINISHES, GRADES, MEMBER_KINDS,
    ROOM_USES, SIZES, SPECIES, SUPPORTS,
};
use undercroft_engine::units::{bare_number_hint, UnitSystem};

/// A field changed: its name (as `FramingForm::set` takes it) and its new text.
pub type FieldChange = (&'static str, String);

#[component]
pub fn FramingFields(
    form: FramingForm,
    /// The run's values, for a joist that lists only what differs.
    base: Option<FramingForm>,
    /// Each field's problem and the question waiting for an answer, shown under its field.
    check: FieldCheck,
    /// Metric inspections get the millimetre keypad.
    metric: bool,
    on_change: EventHandler<FieldChange>,
    /// "Keep" answered to the question about a field's value.
    on_keep: EventHandler<FieldChange>,
    /// Only these fields (the joist walk's few); all when None.
    #[props(default)]
    only: Option<&'static [&'static str]>,
) -> Element {
    let shown = |name: &str| only.is_none_or(|names| names.contains(&name));
    let base = base.unwrap_or_default();
    let inherits = base != FramingForm::default();
    let error = |name: &str| error_of(&check.errors, name);
    let question = |name: &str| check.question.clone().filter(|q| q.field == name);
    rsx! {
        if shown("kind") { Pick { name: "kind", label: "Member", picks: MEMBER_KINDS, value: form.kind.clone(), inherited: inherits.then(|| base.kind.clone()), error: error("kind"), on_change } }
        if shown("species") { Pick { name: "species", label: "Species", picks: SPECIES, value: form.species.clone(), inherited: inherits.then(|| base.species.clone()), error: error("species"), on_change } }
        if shown("grade") { Pick { name: "grade", label: "Grade (from the stamp)", picks: GRADES, value: form.grade.clone(), inherited: inherits.then(|| base.grade.clone()), error: error("grade"), on_change } }
        if shown("size") { Pick { name: "size", label: "Size", picks: SIZES, value: form.size.clone(), inherited: inherits.then(|| base.size.clone()), error: error("size"), on_change } }
        if shown("actual") { Typed { name: "actual", tape: false, label: "Measured section, if not dressed lumber (1-3/4 x 9-1/2)", inputmode: "text", value: form.actual.clone(), inherited: base.actual.clone(), error: error("actual"), question: question("actual"), metric, on_change, on_keep } }
        if shown("spacing") { Typed { name: "spacing", tape: true, label: "Spacing on centre", inputmode: "decimal", value: form.spacing.clone(), inherited: base.spacing.clone(), error: error("spacing"), question: question("spacing"), metric, on_change, on_keep } }
        if shown("clear_span") { Typed { name: "clear_span", tape: true, label: "Clear span (15' 2\" or 15-2)", inputmode: "text", value: form.clear_span.clone(), inherited: base.clear_span.clone(), error: error("clear_span"), question: question("clear_span"), metric, on_change, on_keep } }
        if shown("bearing_on") { Pick { name: "bearing_on", label: "Ends bear on", picks: SUPPORTS, value: form.bearing_on.clone(), inherited: inherits.then(|| base.bearing_on.clone()), error: error("bearing_on"), on_change } }
        if shown("bearing_length") { Typed { name: "bearing_length", tape: true, label: "Bearing length", inputmode: "decimal", value: form.bearing_length.clone(), inherited: base.bearing_length.clone(), error: error("bearing_length"), question: question("bearing_length"), metric, on_change, on_keep } }
        if shown("end_restraint") { Pick { name: "end_restraint", label: "End restraint", picks: END_RESTRAINTS, value: form.end_restraint.clone(), inherited: inherits.then(|| base.end_restraint.clone()), error: error("end_restraint"), on_change } }
        if shown("bridging") { Pick { name: "bridging", label: "Bridging", picks: BRIDGING, value: form.bridging.clone(), inherited: inherits.then(|| base.bridging.clone()), error: error("bridging"), on_change } }
        if shown("bridging_interval") { Typed { name: "bridging_interval", tape: true, label: "Largest distance between bridging lines", inputmode: "text", value: form.bridging_interval.clone(), inherited: base.bridging_interval.clone(), error: error("bridging_interval"), question: question("bridging_interval"), metric, on_change, on_keep } }
        if shown("room_use_above") { Pick { name: "room_use_above", label: "Room above, if not as the area", picks: ROOM_USES, value: form.room_use_above.clone(), inherited: inherits.then(|| base.room_use_above.clone()), error: error("room_use_above"), on_change } }
        if shown("finishes") { Pick { name: "finishes", label: "Finishes above, if not as the area", picks: FINISHES, value: form.finishes.clone(), inherited: inherits.then(|| base.finishes.clone()), error: error("finishes"), on_change } }
    }
}

/// The element id of a field: its name with dashes (`clear_span` is `#clear-span`).
fn field_id(name: &str) -> String {
    name.replace('_', "-")
}

#[component]
fn Pick(
    name: &'static str,
    label: &'static str,
    picks: &'static [(&'static str, &'static str)],
    value: String,
    /// `Some` for a joist: the run's value, shown on the empty choice.
    inherited: Option<String>,
    error: Option<String>,
    on_change: EventHandler<FieldChange>,
) -> Element {
    let id = field_id(name);
    let empty = match &inherited {
        Some(v) => {
            let shown = picks
                .iter()
                .find(|p| p.0 == v)
                .map_or("not entered", |p| p.1);
            format!("Same as the run ({shown})")
        }
        None if matches!(name, "room_use_above" | "finishes") => "As the area".to_string(),
        None => "Pick".to_string(),
    };
    rsx! {
        label { r#for: "{id}", "{label}" }
        select { id: "{id}", onchange: move |e| on_change.call((name, e.value())),
            option { value: "", selected: value.is_empty(), "{empty}" }
            for (key, text) in picks.iter() {
                option { value: "{key}", selected: value == *key, "{text}" }
            }
        }
        if let Some(e) = error {
            p { class: "field-error", role: "alert", "{e}" }
        }
    }
}

#[component]
fn Typed(
    name: &'static str,
    label: &'static str,
    inputmode: &'static str,
    /// A length: the tape keypad opens for it.
    tape: bool,
    value: String,
    /// The run's value, shown as the placeholder of a joist's empty field.
    inherited: String,
    error: Option<String>,
    question: Option<Question>,
    metric: bool,
    on_change: EventHandler<FieldChange>,
    on_keep: EventHandler<FieldChange>,
) -> Element {
    let id = field_id(name);
    let placeholder = if !inherited.is_empty() {
        format!("Same as the run: {inherited}")
    } else if tape {
        bare_number_hint(if metric {
            UnitSystem::Metric
        } else {
            UnitSystem::Imperial
        })
        .to_string()
    } else {
        String::new()
    };
    let typed = value.clone();
    rsx! {
        label { r#for: "{id}", "{label}" }
        if tape {
            TapeInput { id: id.clone(), value, placeholder, metric, on_input: move |text| on_change.call((name, text)) }
        } else {
            input { id: "{id}", inputmode, autocomplete: "off", value: "{value}", placeholder: "{placeholder}",
                oninput: move |e| on_change.call((name, e.value())) }
        }
        if let Some(e) = error {
            p { class: "field-error", role: "alert", "{e}" }
        }
        if let Some(q) = question {
            QuestionCard { id: format!("{id}-question"), question: q,
                on_keep: move |_| on_keep.call((name, typed.clone())),
                on_instead: move |text| on_change.call((name, text)) }
        }
    }
}

/// The message of a field's problem, if it has one.
fn error_of(errors: &[FieldError], name: &str) -> Option<String> {
    errors
        .iter()
        .find(|e| e.field == name)
        .map(|e| e.message.clone())
}
