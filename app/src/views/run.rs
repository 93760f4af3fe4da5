//! One joist run: its framing as typed, saved on every change, with the live check card.

use crate::components::{LiveCard, Photos};
use crate::{use_app, Route};
use dioxus::prelude::*;
use undercroft_core::forms::{live_check, FramingForm, ObservationForm, KINDS, SUPPORTS};
use undercroft_core::model::Joist;
use undercroft_core::store::new_id;

/// The pick lists: the trade's choices, so nothing needs typing that a tap can pick.
const SPECIES: [(&str, &str); 4] = [
    ("spruce-pine-fir", "Spruce-pine-fir"),
    ("douglas-fir-larch", "Douglas fir-larch"),
    ("hem-fir", "Hem-fir"),
    ("southern-pine", "Southern pine"),
];
const GRADES: [(&str, &str); 5] = [
    ("select-structural", "Select Structural"),
    ("no1", "No. 1"),
    ("no2", "No. 2"),
    ("no3", "No. 3"),
    ("none", "No stamp visible"),
];
const SIZES: [&str; 6] = ["2x4", "2x6", "2x8", "2x10", "2x12", "2x14"];

#[component]
pub fn RunView(id: String) -> Element {
    let app = use_app();
    let found = {
        let store = app.store.borrow();
        store
            .inspection_of(&id)
            .and_then(|i| store.load_inspection(&i))
    };
    let Some((inspection, area, run)) = found.ok().and_then(|i| {
        i.areas
            .iter()
            .find_map(|a| {
                a.runs
                    .iter()
                    .find(|r| r.id == id)
                    .map(|r| (a.clone(), r.clone()))
            })
            .map(|(a, r)| (i, a, r))
    }) else {
        return rsx! { main { p { "This run is not in the store." } } };
    };
    let units = inspection.units;
    let stored = run.framing.clone();
    let mut form = use_signal(|| FramingForm::from_framing(&stored, units));
    let mut errors = use_signal(Vec::new);
    let loads = area.loads.resolve(&inspection.loads);
    let check = live_check(&form(), &loads, units);
    let run_id = id.clone();
    let label = run.label.clone();
    // Every change is saved the moment it is made; a field that does not read yet keeps its
    // stored value.
    let save_app = app.clone();
    let save = use_callback(move |(field, value): (&'static str, String)| {
        form.with_mut(|f| f.set(field, value));
        let (framing, field_errors) = form().merged_with(&stored, units);
        errors.set(field_errors);
        if let Err(e) = save_app.change(|s| s.update_run(&run_id, &label, &framing)) {
            errors.set(vec![undercroft_core::forms::FieldError {
                field: "save",
                message: e,
            }]);
        }
    });
    let f = form();
    let observations: Vec<(String, String, String)> = run
        .observations
        .iter()
        .map(|o| {
            (
                o.id.to_string(),
                ObservationForm::from_observation(o, units).kind,
                o.kind.name().to_string(),
            )
        })
        .collect();
    let owner = id.clone();
    let add_joist = {
        let app = app.clone();
        let run_id = id.clone();
        let next = run.joists.len() + 1;
        move |_| {
            let joist = Joist {
                id: new_id(),
                label: format!("Joist {next}"),
                framing: Default::default(),
                observations: vec![],
            };
            let _ = app.change(|s| s.add_joist(&run_id, &joist));
        }
    };
    rsx! {
        main {
            nav { class: "back", Link { to: Route::AreaView { id: area.id.clone() }, "< {area.name}" } }
            h1 { "{run.label}" }
            LiveCard { check }
            label { r#for: "species", "Species" }
            select { id: "species", value: "{f.species}", onchange: move |e| save.call(("species", e.value())),
                option { value: "", "Pick" }
                for (key, name) in SPECIES { option { value: key, selected: f.species == key, "{name}" } }
            }
            label { r#for: "grade", "Grade (from the stamp)" }
            select { id: "grade", value: "{f.grade}", onchange: move |e| save.call(("grade", e.value())),
                option { value: "", "Pick" }
                for (key, name) in GRADES { option { value: key, selected: f.grade == key, "{name}" } }
            }
            label { r#for: "size", "Size" }
            select { id: "size", value: "{f.size}", onchange: move |e| save.call(("size", e.value())),
                option { value: "", "Pick" }
                for size in SIZES { option { value: size, selected: f.size == size, "{size}" } }
            }
            label { r#for: "spacing", "Spacing, inches on centre" }
            input { id: "spacing", inputmode: "decimal", value: "{f.spacing}", oninput: move |e| save.call(("spacing", e.value())) }
            label { r#for: "clear-span", "Clear span (15' 2\", 15-2 or 15)" }
            input { id: "clear-span", inputmode: "text", autocomplete: "off", value: "{f.clear_span}", oninput: move |e| save.call(("clear_span", e.value())) }
            label { r#for: "bearing-on", "Ends bear on" }
            select { id: "bearing-on", value: "{f.bearing_on}", onchange: move |e| save.call(("bearing_on", e.value())),
                option { value: "", "Pick" }
                for (key, name) in SUPPORTS.iter().copied() { option { value: key, selected: f.bearing_on == key, "{name}" } }
            }
            label { r#for: "bearing-length", "Bearing length, inches" }
            input { id: "bearing-length", inputmode: "decimal", value: "{f.bearing_length}", oninput: move |e| save.call(("bearing_length", e.value())) }
            for e in errors() {
                p { class: "field-error", "{e.field}: {e.message}" }
            }
            h2 { "Joists with their own observations" }
            for joist in run.joists.iter() {
                div { class: "card", key: "{joist.id}",
                    h2 { "{joist.label}" }
                    ul { class: "list",
                        for o in joist.observations.iter() {
                            li { key: "{o.id}", Link { to: Route::ObservationView { owner: joist.id.clone(), kind: ObservationForm::from_observation(o, units).kind, id: o.id.to_string() }, "{o.kind.name()}" } }
                        }
                    }
                    Link { to: Route::ObservationView { owner: joist.id.clone(), kind: "notch".into(), id: new_id() }, "Add a notch on this joist" }
                }
            }
            button { class: "quiet", id: "add-joist", onclick: add_joist, "Add a joist of this run" }
            h2 { "Observations on these joists" }
            ul { class: "list",
                for (oid, okind, oname) in observations {
                    li { key: "{oid}", Link { to: Route::ObservationView { owner: id.clone(), kind: okind, id: oid.clone() }, "{oname}" } }
                }
            }
            label { r#for: "add-observation", "Add an observation" }
            select { id: "add-observation",
                onchange: move |e| {
                    let kind = e.value();
                    if !kind.is_empty() {
                        navigator().push(Route::ObservationView { owner: owner.clone(), kind, id: new_id() });
                    }
                },
                option { value: "", "Pick what you saw" }
                for (value, text) in KINDS.iter() { option { value: "{value}", "{text}" } }
            }
            Photos { owner: id.clone() }
        }
    }
}
