//! One joist of a run (only what differs from the run is typed; the rest shows the run's
//! values) or a single member: its framing with the live check, its observations, photos.

use crate::components::{
    FieldChange, FramingFields, LiveCard, ObservationList, Photos, RemoveButton, TopBar,
};
use crate::edits::{FieldCheck, FramingEdit, FramingOwner};
use crate::{use_app, Route};
use dioxus::prelude::*;
use undercroft_engine::forms::{live_check, place_key, FramingForm};
use undercroft_engine::units::UnitSystem;

#[component]
pub fn MemberView(id: String) -> Element {
    let app = use_app();
    let loaded = app.inspection_holding(&id).and_then(|i| {
        let m = i.member(&id)?;
        let parts = (
            m.area.clone(),
            m.run.cloned(),
            m.framing.clone(),
            m.label.to_string(),
            m.observations.to_vec(),
        );
        Some((i, parts))
    });
    let Some((inspection, (area, run, stored, stored_label, observations))) = loaded else {
        return rsx! { main { p { "This member is not in the store." } Link { to: Route::Inspections {}, "Back to inspections" } } };
    };
    let units = inspection.units;
    let base = run
        .as_ref()
        .map(|r| FramingForm::from_framing(&r.framing, units));
    let mut form = use_signal(|| FramingForm::from_framing(&stored, units));
    let mut label = use_signal(|| stored_label.clone());
    let mut check_of_fields = use_signal(FieldCheck::default);
    let loads = area.loads.resolve(&inspection.loads);
    // A joist is checked with the run's values where it lists none of its own.
    let mut effective = form();
    if let Some(base) = &base {
        effective.fill_from(base);
    }
    let check = live_check(&effective, &loads, units);
    let member_id = id.clone();
    let save_app = app.clone();
    let run_framing = run.as_ref().map(|r| r.framing.clone());
    let save_with = use_callback(
        move |(field, value, confirmed): (&'static str, String, bool)| {
            let (field, value) = if field == "label" {
                label.set(value);
                // The label is saved with the framing as it stands.
                ("", String::new())
            } else {
                (field, value)
            };
            let name = label();
            let owner = FramingOwner::Member {
                id: &member_id,
                label: &name,
                run: run_framing.as_ref(),
            };
            let edit = FramingEdit {
                field,
                value,
                confirmed,
            };
            check_of_fields.set(save_app.save_framing(
                owner,
                &mut form.write(),
                &stored,
                units,
                edit,
            ));
        },
    );
    let save = move |(field, value): FieldChange| save_with.call((field, value, false));
    let keep = move |(field, value): FieldChange| save_with.call((field, value, true));
    let up = match &run {
        Some(r) => Route::RunView { id: r.id.clone() },
        None => Route::AreaView {
            id: area.id.clone(),
        },
    };
    let what = if run.is_some() {
        "this joist"
    } else {
        "this member"
    };
    let back = match &run {
        Some(r) => rsx! { Link { to: Route::RunView { id: r.id.clone() }, "‹ {r.label}" } },
        None => rsx! { Link { to: Route::AreaView { id: area.id.clone() }, "‹ {area.name}" } },
    };
    rsx! {
        main {
            TopBar { title: "{label}", {back} }
            if run.is_some() {
                p { class: "muted", "A joist of this run: enter only what differs from the run." }
            }
            if let Some((walk_run, at)) = inspection.joist_place(&id) {
                p { Link { id: "back-to-walk", to: Route::JoistWalk { run: walk_run.id.clone(), at: place_key(at) }, "Back to the joist walk" } }
            }
            LiveCard { check }
            label { r#for: "member-label", "Label" }
            input { id: "member-label", value: "{label}", oninput: move |e| save_with.call(("label", e.value(), false)) }
            FramingFields { form: form(), base, check: check_of_fields(), metric: units == UnitSystem::Metric, on_change: save, on_keep: keep }
            for e in check_of_fields().errors.iter().filter(|e| e.field == "save") {
                p { class: "field-error", role: "alert", "Not saved: {e.message}" }
            }
            h2 { "What was seen on it" }
            ObservationList { owner: id.clone(), observations, units }
            Photos { owner: id.clone() }
            RemoveButton { id: id.clone(), what, then: up }
        }
    }
}
