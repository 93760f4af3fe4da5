//! What was seen on a run or member: its observations, each opening its own screen, and the
//! pick that starts a new one.

use crate::Route;
use dioxus::prelude::*;
use undercroft_engine::forms::{ObservationForm, KINDS};
use undercroft_engine::model::Observation;
use undercroft_engine::units::UnitSystem;
use undercroft_store::new_id;

#[component]
pub fn ObservationList(
    /// The run or member the observations are on.
    owner: String,
    observations: Vec<Observation>,
    units: UnitSystem,
) -> Element {
    let rows: Vec<(String, String, String)> = observations
        .iter()
        .map(|o| {
            (
                o.id.to_string(),
                ObservationForm::from_observation(o, units).kind,
                o.kind.name().to_string(),
            )
        })
        .collect();
    let new_owner = owner.clone();
    rsx! {
        if rows.is_empty() {
            p { class: "muted", "Nothing recorded yet." }
        }
        ul { class: "list",
            for (id, kind, name) in rows {
                li { key: "{id}", Link { to: Route::ObservationView { owner: owner.clone(), kind, id: id.clone() }, "{name}" } }
            }
        }
        label { r#for: "add-observation", "Add an observation" }
        select { id: "add-observation",
            onchange: move |e| {
                let kind = e.value();
                if !kind.is_empty() {
                    navigator().push(Route::ObservationView { owner: new_owner.clone(), kind, id: new_id() });
                }
            },
            option { value: "", "Pick what you saw" }
            for (value, text) in KINDS.iter() { option { value: "{value}", "{text}" } }
        }
    }
}
