//! The joist walk: one joist at a time along a run, by place. A joist starts as the previous
//! one was ("same as previous"); a change is saved at once (the joist is recorded the first
//! time something differs from the run); one tap opens an observation on it; "Next joist"
//! steps one layout on, keeping the tape keypad open on the field being walked.

use crate::components::{
    worst_status, FieldChange, FramingFields, LiveCard, RowStatus, TapeState, TopBar,
};
use crate::edits::{FieldCheck, FramingEdit, FramingOwner};
use crate::{use_app, AppState, Route};
use dioxus::prelude::*;
use undercroft_engine::forms::{
    joist_at, live_check, place_from_key, place_key, previous_joist, walk_label, walk_step,
    FramingForm,
};
use undercroft_engine::model::{Framing, Joist, JoistRun};
use undercroft_engine::units::{format_length, format_spacing, Length, UnitSystem};
use undercroft_store::new_id;

/// The fields that change joist to joist along a run; the rest are the run's.
const WALKED_FIELDS: &[&str] = &["size", "clear_span", "bearing_length", "bearing_on"];
/// What is most often seen on one joist, one tap each.
const QUICK_OBSERVATIONS: &[(&str, &str)] = &[
    ("notch", "Notch"),
    ("hole", "Hole"),
    ("damage", "Decay or damage"),
    ("cut", "Other cut"),
    ("sag", "Sag"),
];

#[component]
pub fn JoistWalk(run: String, at: String) -> Element {
    let Some(place) = place_from_key(&at) else {
        return rsx! { main { p { "This is not a place along a run." } Link { to: Route::RunView { id: run }, "Back to the run" } } };
    };
    rsx! { WalkAt { key: "{run}-{at}", run_id: run, at: place.in_inches() } }
}

/// The stored run, read fresh.
fn stored_run(app: &AppState, run_id: &str) -> Option<JoistRun> {
    app.inspection_holding(run_id)
        .and_then(|i| i.run(run_id).map(|(_, r)| r.clone()))
}

/// The joist at this place, recorded now if it was not (labelled by its place).
fn record_joist(
    app: &AppState,
    run_id: &str,
    at: Length,
    units: UnitSystem,
) -> Result<Joist, String> {
    let run = stored_run(app, run_id).ok_or("the run is no longer in the store")?;
    if let Some(j) = joist_at(&run, at) {
        return Ok(j.clone());
    }
    let joist = Joist {
        id: new_id(),
        label: walk_label(at, units),
        at: Some(at),
        framing: Framing::default(),
        observations: vec![],
    };
    app.change(|s| s.add_joist(run_id, &joist))?;
    Ok(joist)
}

#[component]
fn WalkAt(run_id: String, at: f64) -> Element {
    let app = use_app();
    let at = Length::inches(at);
    let loaded = app.inspection_holding(&run_id).and_then(|i| {
        let (area, run) = i.run(&run_id).map(|(a, r)| (a.clone(), r.clone()))?;
        Some((i, area, run))
    });
    let Some((inspection, area, run)) = loaded else {
        return rsx! { main { p { "This run is not in the store." } Link { to: Route::Inspections {}, "Back to inspections" } } };
    };
    let units = inspection.units;
    let here = joist_at(&run, at).cloned();
    let step = walk_step(&run);
    let number = (at.in_inches() / step.in_inches()).round().max(1.0) as u32;
    let shown_framing = here.as_ref().map(|j| j.framing.clone()).unwrap_or_default();
    let mut form = use_signal(|| FramingForm::from_framing(&shown_framing, units));
    let mut check_of_fields = use_signal(FieldCheck::default);
    let mut walk_error = use_signal(|| None::<String>);
    let tape = try_use_context::<TapeState>();
    let base = FramingForm::from_framing(&run.framing, units);
    let mut effective = form();
    effective.fill_from(&base);
    let loads = area.loads.resolve(&inspection.loads);
    let check = live_check(&effective, &loads, units);
    let evaluation = app.evaluation(&inspection);
    let status = here
        .as_ref()
        .map(|j| worst_status(&evaluation, &[&j.id]))
        .unwrap_or_else(|| worst_status(&evaluation, &[&run.id]));

    let save_with = {
        let app = app.clone();
        let run_id = run_id.clone();
        let run_framing = run.framing.clone();
        use_callback(
            move |(field, value, confirmed): (&'static str, String, bool)| {
                let joist = match record_joist(&app, &run_id, at, units) {
                    Ok(j) => j,
                    Err(e) => return walk_error.set(Some(e)),
                };
                let owner = FramingOwner::Member {
                    id: &joist.id,
                    label: &joist.label,
                    run: Some(&run_framing),
                };
                let edit = FramingEdit {
                    field,
                    value,
                    confirmed,
                };
                let checked =
                    app.save_framing(owner, &mut form.write(), &joist.framing, units, edit);
                check_of_fields.set(checked);
            },
        )
    };
    let save = move |(field, value): FieldChange| save_with.call((field, value, false));
    let keep = move |(field, value): FieldChange| save_with.call((field, value, true));

    let go_to = {
        let run_id = run_id.clone();
        move |place: Length| {
            let next = Route::JoistWalk {
                run: run_id.clone(),
                at: place_key(place),
            };
            if let Some(tape) = tape {
                tape.carry_open(&next);
            }
            navigator().push(next);
        }
    };
    // Next: the joist one layout on starts as this one is, unless it was recorded already.
    let next = {
        let app = app.clone();
        let run_id = run_id.clone();
        let go_to = go_to.clone();
        move |_| {
            let ahead = at + step;
            if let Some(run) = stored_run(&app, &run_id) {
                let this = joist_at(&run, at)
                    .map(|j| j.framing.clone())
                    .unwrap_or_default();
                if joist_at(&run, ahead).is_none() && this != Framing::default() {
                    let joist = Joist {
                        id: new_id(),
                        label: walk_label(ahead, units),
                        at: Some(ahead),
                        framing: this,
                        observations: vec![],
                    };
                    if let Err(e) = app.change(|s| s.add_joist(&run_id, &joist)) {
                        return walk_error.set(Some(e));
                    }
                }
            }
            go_to(ahead);
        }
    };
    let back = {
        let go_to = go_to.clone();
        move |_| {
            go_to(Length::inches(
                (at.in_inches() - step.in_inches()).max(step.in_inches()),
            ))
        }
    };
    // Back to the run's values: the joist's own values cleared (the record dropped if nothing
    // else was recorded on it).
    let as_run = {
        let app = app.clone();
        let here = here.clone();
        move |_| {
            let Some(j) = &here else { return };
            let done = if j.observations.is_empty() {
                app.change(|s| s.remove(&j.id))
            } else {
                app.change(|s| s.update_member(&j.id, &j.label, &Framing::default()))
            };
            match done {
                Ok(()) => form.set(FramingForm::default()),
                Err(e) => walk_error.set(Some(e)),
            }
        }
    };
    let observe = {
        let app = app.clone();
        let run_id = run_id.clone();
        move |kind: &'static str| match record_joist(&app, &run_id, at, units) {
            Ok(joist) => {
                navigator().push(Route::ObservationView {
                    owner: joist.id,
                    kind: kind.into(),
                    id: new_id(),
                });
            }
            Err(e) => walk_error.set(Some(e)),
        }
    };
    let from_previous =
        here.is_none() && previous_joist(&run, at).is_some_and(|p| p.framing != Framing::default());
    let summary = match &here {
        Some(j) if j.framing == Framing::default() => "Recorded, as the run".to_string(),
        Some(j) => format!(
            "Differs from the run: {}",
            FramingForm::from_framing(&j.framing, units)
                .filled_fields()
                .join(", ")
        ),
        None if from_previous => "Same as the previous joist".into(),
        None => "Same as the run".into(),
    };
    let seen = here.as_ref().map_or(0, |j| j.observations.len());
    rsx! {
        main { class: "walk",
            TopBar { title: "Joist walk", Link { to: Route::RunView { id: run_id.clone() }, "‹ {run.label}" } }
            div { class: "walk-bar",
                button { class: "quiet", id: "walk-back", onclick: back, "‹ Back" }
                div { class: "walk-place",
                    strong { id: "walk-place", "{walk_label(at, units)}" }
                    span { class: "muted", " joist {number}, {format_spacing(step, units)} on centre" }
                }
                button { id: "next-joist", onclick: next, "Next joist ›" }
            }
            p { id: "walk-summary", RowStatus { status } " {summary}" }
            if seen > 0 {
                p { class: "muted", "{seen} observations on this joist" }
            }
            if here.as_ref().is_some_and(|j| j.framing != Framing::default()) {
                button { class: "quiet", id: "as-run", onclick: as_run, "Same as the run" }
            }
            LiveCard { check }
            FramingFields { form: form(), base: Some(base), check: check_of_fields(), metric: units == UnitSystem::Metric,
                on_change: save, on_keep: keep, only: Some(WALKED_FIELDS) }
            for e in check_of_fields().errors.iter().filter(|e| e.field == "save") {
                p { class: "field-error", role: "alert", "Not saved: {e.message}" }
            }
            if let Some(e) = walk_error() {
                p { class: "field-error", role: "alert", "Not saved: {e}" }
            }
            h2 { "Seen on this joist" }
            div { class: "quick-observations",
                for (kind, label) in QUICK_OBSERVATIONS.iter().copied() {
                    button { key: "{kind}", class: "quiet", id: "observe-{kind}", onclick: {
                        let mut observe = observe.clone();
                        move |_| observe(kind)
                    }, "{label}" }
                }
            }
            if let Some(j) = &here {
                p { Link { to: Route::MemberView { id: j.id.clone() }, "All of this joist's fields and photos" } }
            }
            p { class: "muted", "Run span {run.framing.clear_span.map(|l| format_length(l, units)).unwrap_or_else(|| \"not entered\".into())}; places are measured from where the walk began." }
        }
    }
}
