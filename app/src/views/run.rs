//! One joist run: its framing as typed, saved on every change, with the live check card; its
//! joists that differ or carry their own observations; what was seen on its typical joist.

use crate::components::{
    worst_status, FieldChange, FramingFields, LiveCard, ObservationList, Photos, RemoveButton,
    RowStatus, TopBar,
};
use crate::edits::{FieldCheck, FramingEdit, FramingOwner};
use crate::{use_app, Route};
use dioxus::prelude::*;
use undercroft_engine::forms::{first_place, live_check, place_key, FramingForm};
use undercroft_engine::model::Joist;
use undercroft_engine::units::UnitSystem;
use undercroft_store::new_id;

#[component]
pub fn RunView(id: String) -> Element {
    let app = use_app();
    let Some((inspection, area, run)) = app.inspection_holding(&id).and_then(|i| {
        i.run(&id)
            .map(|(a, r)| (a.clone(), r.clone()))
            .map(|(a, r)| (i, a, r))
    }) else {
        return rsx! { main { p { "This run is not in the store." } Link { to: Route::Inspections {}, "Back to inspections" } } };
    };
    let units = inspection.units;
    let evaluation = app.evaluation(&inspection);
    let stored = run.framing.clone();
    let mut form = use_signal(|| FramingForm::from_framing(&stored, units));
    let mut check_of_fields = use_signal(FieldCheck::default);
    let loads = area.loads.resolve(&inspection.loads);
    let check = live_check(&form(), &loads, units);
    let run_id = id.clone();
    let label = run.label.clone();
    // Every change is saved the moment it is made; a field that does not read yet keeps its
    // stored value.
    let save_app = app.clone();
    let save_with = use_callback(move |edit: FramingEdit| {
        let owner = FramingOwner::Run {
            id: &run_id,
            label: &label,
        };
        check_of_fields.set(save_app.save_framing(owner, &mut form.write(), &stored, units, edit));
    });
    let save = move |(field, value): FieldChange| {
        save_with.call(FramingEdit {
            field,
            value,
            confirmed: false,
        })
    };
    let keep = move |(field, value): FieldChange| {
        save_with.call(FramingEdit {
            field,
            value,
            confirmed: true,
        })
    };
    let add_joist = {
        let app = app.clone();
        let run_id = id.clone();
        let next = run.joists.len() + 1;
        move |_| {
            let joist = Joist {
                id: new_id(),
                label: format!("Joist {next}"),
                at: None,
                framing: Default::default(),
                observations: vec![],
            };
            if app.change(|s| s.add_joist(&run_id, &joist)).is_ok() {
                navigator().push(Route::MemberView { id: joist.id });
            }
        }
    };
    // The girder lines anywhere in the inspection, and whether this run bears on each.
    let girders: Vec<(String, String, bool)> = inspection
        .areas
        .iter()
        .flat_map(|a| a.girders.iter().map(move |g| (a, g)))
        .map(|(a, g)| {
            (
                g.id.clone(),
                format!("{} ({})", g.label, a.name),
                run.bears_on.contains(&g.id),
            )
        })
        .collect();
    let mut link_error = use_signal(|| None::<String>);
    let link = {
        let app = app.clone();
        let run_id = id.clone();
        let bears_on = run.bears_on.clone();
        move |(girder, on): (String, bool)| {
            let mut next: Vec<String> =
                bears_on.iter().filter(|g| **g != girder).cloned().collect();
            if on {
                next.push(girder);
            }
            if let Err(e) = app.change(|s| s.set_bears_on(&run_id, &next)) {
                link_error.set(Some(e));
            }
        }
    };
    rsx! {
        main {
            TopBar { title: "{run.label}", Link { to: Route::AreaView { id: area.id.clone() }, "‹ {area.name}" } }
            LiveCard { check }
            if !girders.is_empty() {
                h2 { "Bears on" }
                p { class: "muted", "The girder carries half of this run's span." }
                div { class: "checks", id: "bears-on",
                    for (gid, name, on) in girders {
                        label { key: "{gid}",
                            input { r#type: "checkbox", checked: on,
                                onchange: {
                                    let mut link = link.clone();
                                    let gid = gid.clone();
                                    move |e: Event<FormData>| link((gid.clone(), e.checked()))
                                }
                            }
                            " {name}"
                        }
                    }
                }
                if let Some(e) = link_error() {
                    p { class: "field-error", role: "alert", "{e}" }
                }
            }
            FramingFields { form: form(), base: None, check: check_of_fields(), metric: units == UnitSystem::Metric, on_change: save, on_keep: keep }
            for e in check_of_fields().errors.iter().filter(|e| e.field == "save") {
                p { class: "field-error", role: "alert", "Not saved: {e.message}" }
            }
            h2 { "What was seen on these joists" }
            ObservationList { owner: id.clone(), observations: run.observations.clone(), units }
            h2 { "Joists that differ or have their own observations" }
            p { Link { class: "button", id: "walk-joists", to: Route::JoistWalk { run: id.clone(), at: place_key(first_place(&run)) }, "Walk the joists one by one" } }
            ul { class: "list",
                for joist in run.joists.iter() {
                    li { key: "{joist.id}",
                        Link { to: Route::MemberView { id: joist.id.clone() },
                            "{joist.label}"
                            br {}
                            RowStatus { status: worst_status(&evaluation, &[&joist.id]) }
                            span { class: "muted", " {joist_summary(joist, units)}" }
                        }
                    }
                }
            }
            button { class: "quiet", id: "add-joist", onclick: add_joist, "Add a joist of this run" }
            Photos { owner: id.clone() }
            RemoveButton { id: id.clone(), what: "this run", then: Route::AreaView { id: area.id.clone() } }
        }
    }
}

/// What a joist row says beside its status: what differs from the run, and how many
/// observations it carries.
fn joist_summary(joist: &Joist, units: UnitSystem) -> String {
    let differs = FramingForm::from_framing(&joist.framing, units).filled_fields();
    let seen = match joist.observations.len() {
        0 => String::new(),
        1 => "1 observation".into(),
        n => format!("{n} observations"),
    };
    match (differs.is_empty(), seen.is_empty()) {
        (true, true) => "as the run".into(),
        (true, false) => seen,
        (false, true) => differs.join(", "),
        (false, false) => format!("{}; {seen}", differs.join(", ")),
    }
}
