//! The framing fields of a run, joist or member: picks for what can be picked, lengths typed
//! as a tape reads. For a joist, an empty field means "same as the run" and shows the run's
//! value.

use dioxus::prelude::*;
use undercroft_core::forms::{
    FramingForm, BRIDGING, END_RESTRAINTS, FINISHES, GRADES, MEMBER_KINDS, ROOM_USES, SIZES,
    SPECIES, SUPPORTS,
};

/// A field changed: its name (as `FramingForm::set` takes it) and its new text.
pub type FieldChange = (&'static str, String);

#[component]
pub fn FramingFields(
    form: FramingForm,
    /// The run's values, for a joist that lists only what differs.
    base: Option<FramingForm>,
    on_change: EventHandler<FieldChange>,
) -> Element {
    let base = base.unwrap_or_default();
    let inherits = base != FramingForm::default();
    rsx! {
        Pick { name: "kind", label: "Member", picks: MEMBER_KINDS, value: form.kind.clone(), inherited: inherits.then(|| base.kind.clone()), on_change }
        Pick { name: "species", label: "Species", picks: SPECIES, value: form.species.clone(), inherited: inherits.then(|| base.species.clone()), on_change }
        Pick { name: "grade", label: "Grade (from the stamp)", picks: GRADES, value: form.grade.clone(), inherited: inherits.then(|| base.grade.clone()), on_change }
        Pick { name: "size", label: "Size", picks: SIZES, value: form.size.clone(), inherited: inherits.then(|| base.size.clone()), on_change }
        Typed { name: "actual", label: "Measured section, if not dressed lumber (1-3/4 x 9-1/2)", inputmode: "text", value: form.actual.clone(), inherited: base.actual.clone(), on_change }
        Typed { name: "spacing", label: "Spacing, inches on centre", inputmode: "decimal", value: form.spacing.clone(), inherited: base.spacing.clone(), on_change }
        Typed { name: "clear_span", label: "Clear span (15' 2\", 15-2 or 15)", inputmode: "text", value: form.clear_span.clone(), inherited: base.clear_span.clone(), on_change }
        Pick { name: "bearing_on", label: "Ends bear on", picks: SUPPORTS, value: form.bearing_on.clone(), inherited: inherits.then(|| base.bearing_on.clone()), on_change }
        Typed { name: "bearing_length", label: "Bearing length, inches", inputmode: "decimal", value: form.bearing_length.clone(), inherited: base.bearing_length.clone(), on_change }
        Pick { name: "end_restraint", label: "End restraint", picks: END_RESTRAINTS, value: form.end_restraint.clone(), inherited: inherits.then(|| base.end_restraint.clone()), on_change }
        Pick { name: "bridging", label: "Bridging", picks: BRIDGING, value: form.bridging.clone(), inherited: inherits.then(|| base.bridging.clone()), on_change }
        Typed { name: "bridging_interval", label: "Largest distance between bridging lines (feet)", inputmode: "text", value: form.bridging_interval.clone(), inherited: base.bridging_interval.clone(), on_change }
        Pick { name: "room_use_above", label: "Room above, if not as the area", picks: ROOM_USES, value: form.room_use_above.clone(), inherited: inherits.then(|| base.room_use_above.clone()), on_change }
        Pick { name: "finishes", label: "Finishes above, if not as the area", picks: FINISHES, value: form.finishes.clone(), inherited: inherits.then(|| base.finishes.clone()), on_change }
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
    }
}

#[component]
fn Typed(
    name: &'static str,
    label: &'static str,
    inputmode: &'static str,
    value: String,
    /// The run's value, shown as the placeholder of a joist's empty field.
    inherited: String,
    on_change: EventHandler<FieldChange>,
) -> Element {
    let id = field_id(name);
    let placeholder = if inherited.is_empty() {
        String::new()
    } else {
        format!("Same as the run: {inherited}")
    };
    rsx! {
        label { r#for: "{id}", "{label}" }
        input { id: "{id}", inputmode, autocomplete: "off", value: "{value}", placeholder: "{placeholder}",
            oninput: move |e| on_change.call((name, e.value())) }
    }
}
