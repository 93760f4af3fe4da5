//! One observation: its fields laid out from core's field list, saved the moment they read,
//! with the verdict and citation and the member's side view updating as it is typed.

use crate::components::{Photos, RemoveButton, SideViewSvg, StatusBadge, TapeInput, TopBar};
use crate::{use_app, Route};
use dioxus::prelude::*;
use undercroft_engine::forms::{
    fields_of, place_key, preview_observation, side_view_with, FieldType, ObservationForm, KINDS,
};
use undercroft_engine::units::{bare_number_hint, UnitSystem};

#[component]
pub fn ObservationView(owner: String, kind: String, id: String) -> Element {
    let app = use_app();
    let inspection = app.inspection_holding(&owner);
    let stored = inspection.as_ref().and_then(|i| {
        i.observations()
            .find(|(_, o)| *o.id == *id)
            .map(|(_, o)| o.clone())
    });
    let Some(inspection) = inspection else {
        return rsx! { main { p { "This member is not in the store." } } };
    };
    let units = inspection.units;
    let mut form = use_signal(|| match &stored {
        Some(o) => ObservationForm::from_observation(o, units),
        None => ObservationForm::new(&kind),
    });
    let mut errors = use_signal(Vec::new);
    let exists = stored.is_some();
    let (owner_id, obs_id) = (owner.clone(), id.clone());
    let evaluation = app.evaluation(&inspection);
    let span = inspection.clear_span_of(&owner);
    let save = use_callback(move |(field, value): (&'static str, String)| {
        form.with_mut(|f| {
            if field == "note" {
                f.note = value;
            } else {
                f.values.insert(field.to_string(), value);
            }
        });
        match form().to_observation(obs_id.clone().into(), units, span) {
            Ok(observation) => {
                errors.set(vec![]);
                let result = if exists || app.store.borrow().inspection_of(&obs_id).is_ok() {
                    app.change(|s| s.update_observation(&observation))
                } else {
                    app.change(|s| s.add_observation(&owner_id, &observation))
                };
                if let Err(e) = result {
                    errors.set(vec![undercroft_engine::forms::FieldError {
                        field: "save",
                        message: e,
                    }]);
                }
            }
            Err(field_errors) => errors.set(field_errors),
        }
    });
    let f = form();
    let title = KINDS
        .iter()
        .find(|k| k.0 == f.kind)
        .map_or("Observation", |k| k.1);
    let verdict = f
        .to_observation(id.clone().into(), units, span)
        .ok()
        .map(|o| preview_observation(&inspection, &owner, &o))
        .unwrap_or_default();
    let view = side_view_with(&inspection, &owner, &evaluation);
    let specs = fields_of(&f.kind);
    // Back up to the run or member the observation is on.
    let walked = inspection.joist_place(&owner);
    let (up, up_name) = match (inspection.run(&owner), inspection.member(&owner)) {
        (_, Some(member)) if walked.is_some() => {
            let (run, at) = walked.expect("checked");
            (
                Route::JoistWalk {
                    run: run.id.clone(),
                    at: place_key(at),
                },
                format!("{} (the walk)", member.label),
            )
        }
        (Some((_, run)), _) => (Route::RunView { id: run.id.clone() }, run.label.clone()),
        (None, Some(member)) => (
            Route::MemberView {
                id: member.id.to_string(),
            },
            member.label.to_string(),
        ),
        (None, None) => (
            Route::InspectionView {
                id: inspection.id.clone(),
            },
            inspection.property.address.clone(),
        ),
    };
    rsx! {
        main {
            TopBar { title: "{title}", Link { to: up.clone(), "‹ {up_name}" } }
            for finding in verdict.iter() {
                div { class: "card", id: "verdict",
                    StatusBadge { status: finding.status, label: finding.status_label().to_string(), use_text: finding.use_text() }
                    p { "{finding.summary()}" }
                    p { class: "muted", "Cites {finding.citation()}" }
                }
            }
            if let Some(view) = view {
                SideViewSvg { view }
            }
            for spec in specs.iter() {
                label { r#for: "{spec.name}", "{spec.label}" }
                match spec.kind {
                    FieldType::Choice(options) => rsx! {
                        select { id: "{spec.name}", onchange: move |e| save.call((spec.name, e.value())),
                            option { value: "", "Pick" }
                            for (value, text) in options.iter() {
                                option { value: "{value}", selected: f.value(spec.name) == *value, "{text}" }
                            }
                        }
                    },
                    FieldType::Flag => rsx! {
                        input { id: "{spec.name}", r#type: "checkbox", checked: f.value(spec.name) == "true",
                            onchange: move |e| save.call((spec.name, e.checked().to_string())) }
                    },
                    FieldType::Readings => rsx! {
                        textarea { id: "{spec.name}", value: "{f.value(spec.name)}", placeholder: "7' 7\", 5/8\"  (a number alone is inches)",
                            oninput: move |e| save.call((spec.name, e.value())) }
                    },
                    FieldType::Text => rsx! {
                        textarea { id: "{spec.name}", value: "{f.value(spec.name)}", oninput: move |e| save.call((spec.name, e.value())) }
                    },
                    FieldType::Percent | FieldType::Count => rsx! {
                        input { id: "{spec.name}", inputmode: "decimal", value: "{f.value(spec.name)}", oninput: move |e| save.call((spec.name, e.value())) }
                    },
                    FieldType::Short | FieldType::Long => rsx! {
                        TapeInput { id: spec.name, value: f.value(spec.name).to_string(), placeholder: bare_number_hint(units), metric: units == UnitSystem::Metric,
                            on_input: move |text| save.call((spec.name, text)) }
                    },
                }
                for e in errors().iter().filter(|e| e.field == spec.name) {
                    if e.message.ends_with("is needed") {
                        p { class: "field-needed", "Needed to save it" }
                    } else {
                        p { class: "field-error", role: "alert", "{e.message}" }
                    }
                }
            }
            label { r#for: "note", "Note" }
            textarea { id: "note", value: "{f.note}", oninput: move |e| save.call(("note", e.value())) }
            for e in errors().iter().filter(|e| !specs.iter().any(|s| s.name == e.field)) {
                p { class: "field-error", role: "alert", "{e.message}" }
            }
            if exists {
                Photos { owner: id.clone() }
                RemoveButton { id: id.clone(), what: "this observation", then: up.clone() }
            } else {
                p { class: "muted", "Photos can be added once the observation is saved (its required fields filled)." }
            }
        }
    }
}
