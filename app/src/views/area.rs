//! One area: its joist runs, single members and girder lines; add a run (copying the previous
//! one's values), a single member or a girder line; the conditions of the space, saved as
//! they are picked.

use crate::components::{worst_status, AutosaveFields, PathChange, Photos, RowStatus, TopBar};
use crate::edits::save_area_field;
use crate::{use_app, Route};
use dioxus::prelude::*;
use undercroft_engine::forms::{field_text, site_with, FieldError, AREA_FIELDS, SITE_FIELDS};
use undercroft_engine::model::{Area, GirderKind, GirderLine, JoistRun, Member};
use undercroft_engine::units::UnitSystem;
use undercroft_store::new_id;

#[component]
pub fn AreaView(id: String) -> Element {
    let app = use_app();
    let mut label = use_signal(String::new);
    let mut copy = use_signal(|| true);
    let mut member_label = use_signal(String::new);
    let mut error = use_signal(|| None::<String>);
    let Some((inspection, area)) = app
        .inspection_holding(&id)
        .and_then(|i| i.area(&id).cloned().map(|a| (i, a)))
    else {
        return rsx! { main { p { "This area is not in the store." } Link { to: Route::Inspections {}, "Back to inspections" } } };
    };
    let evaluation = app.evaluation(&inspection);
    let run_status = |r: &JoistRun| {
        let mut ids: Vec<&str> = vec![&r.id];
        ids.extend(r.joists.iter().map(|j| j.id.as_str()));
        worst_status(&evaluation, &ids)
    };
    let girder_status = |g: &GirderLine| {
        let mut ids: Vec<&str> = vec![&g.id];
        ids.extend(g.posts.iter().map(|p| p.id.as_str()));
        worst_status(&evaluation, &ids)
    };
    let previous = area.runs.last().map(|r| r.framing.clone());
    let units = inspection.units;
    let site_texts: Vec<String> = SITE_FIELDS
        .iter()
        .map(|f| field_text(&area.conditions, f, units))
        .collect();
    let own_texts: Vec<String> = AREA_FIELDS
        .iter()
        .map(|f| field_text(&area, f, units))
        .collect();
    // Both sets save the same way: the stored area read fresh, one field changed, rewritten.
    let save_area = {
        let app = app.clone();
        let id = id.clone();
        move |change: &dyn Fn(&Area) -> Result<Area, FieldError>| {
            let current = app
                .inspection_holding(&id)
                .and_then(|i| i.area(&id).cloned())
                .ok_or_else(|| not_saved("this area is no longer in the store".into()))?;
            let next = change(&current)?;
            app.change(|s| s.update_area(&next)).map_err(not_saved)
        }
    };
    let save_site = {
        let save_area = save_area.clone();
        use_callback(move |(name, text): PathChange| {
            save_area(&|a: &Area| {
                let conditions = site_with(&a.conditions, name, &text, units)?;
                Ok(Area {
                    conditions,
                    ..a.clone()
                })
            })
        })
    };
    let save_own = {
        let app = app.clone();
        let id = id.clone();
        use_callback(move |(name, text): PathChange| {
            app.change_field(|s| save_area_field(s, &id, name, &text))
        })
    };
    let mut girder_label = use_signal(String::new);
    let add_girder = {
        let app = app.clone();
        let area_id = id.clone();
        move |_| {
            let mut line = GirderLine::new(new_id(), label_or(girder_label(), "Girder"));
            line.kind = GirderKind::BuiltUp;
            match app.change(|s| s.add_girder(&area_id, &line)) {
                Ok(()) => {
                    navigator().push(Route::GirderScreen { id: line.id });
                }
                Err(e) => error.set(Some(e)),
            }
        }
    };
    let area_id = id.clone();
    let add = {
        let app = app.clone();
        move |_| {
            let label_text = label();
            let run = JoistRun {
                id: new_id(),
                label: label_or(label_text, "Joist run"),
                framing: if copy() {
                    previous.clone().unwrap_or_default()
                } else {
                    Default::default()
                },
                observations: vec![],
                joists: vec![],
                bears_on: vec![],
            };
            match app.change(|s| s.add_run(&area_id, &run)) {
                Ok(()) => {
                    navigator().push(Route::RunView { id: run.id });
                }
                Err(e) => error.set(Some(e)),
            }
        }
    };
    let add_member = {
        let app = app.clone();
        let area_id = id.clone();
        move |_| {
            let label_text = member_label();
            let member = Member {
                id: new_id(),
                label: label_or(label_text, "Single member"),
                framing: Default::default(),
                observations: vec![],
            };
            match app.change(|s| s.add_member(&area_id, &member)) {
                Ok(()) => {
                    navigator().push(Route::MemberView { id: member.id });
                }
                Err(e) => error.set(Some(e)),
            }
        }
    };
    rsx! {
        main {
            TopBar { title: "{area.name}", Link { to: Route::InspectionView { id: inspection.id.clone() }, "‹ {inspection.property.address}" } }
            h2 { "Joist runs" }
            ul { class: "list",
                for run in area.runs.iter() {
                    li { key: "{run.id}",
                        Link { to: Route::RunView { id: run.id.clone() }, "{run.label}"
                            br {}
                            RowStatus { status: run_status(run) }
                        }
                    }
                }
            }
            h2 { "Single members" }
            if area.members.is_empty() {
                p { class: "muted", "None yet: a header, a lone joist, an engineered member." }
            }
            ul { class: "list",
                for m in area.members.iter() {
                    li { key: "{m.id}",
                        Link { to: Route::MemberView { id: m.id.clone() }, "{m.label}"
                            br {}
                            RowStatus { status: worst_status(&evaluation, &[&m.id]) }
                        }
                    }
                }
            }
            label { r#for: "member-name", "A single member" }
            input { id: "member-name", placeholder: "Header at the stair opening", value: "{member_label}", oninput: move |e| member_label.set(e.value()) }
            button { class: "quiet", id: "add-member", onclick: add_member, "Add member" }
            h2 { "Girders and posts" }
            if area.girders.is_empty() {
                p { class: "muted", "None yet: a girder or beam the joists bear on, with its posts." }
            }
            ul { class: "list",
                for g in area.girders.iter() {
                    li { key: "{g.id}",
                        Link { to: Route::GirderScreen { id: g.id.clone() },
                            "{g.label}"
                            br {}
                            RowStatus { status: girder_status(g) }
                            span { class: "muted", " {g.posts.len()} posts" }
                        }
                    }
                }
            }
            label { r#for: "girder-label", "A girder line" }
            input { id: "girder-label", placeholder: "Centre girder", value: "{girder_label}", oninput: move |e| girder_label.set(e.value()) }
            button { class: "quiet", id: "add-girder", onclick: add_girder, "Add girder" }
            h2 { "Add a joist run" }
            label { r#for: "run-label", "Label" }
            input { id: "run-label", placeholder: "Joists between the rim and the girder", value: "{label}", oninput: move |e| label.set(e.value()) }
            label {
                input { r#type: "checkbox", checked: copy(), onchange: move |e| copy.set(e.checked()) }
                " Same values as the previous run"
            }
            if let Some(e) = error() {
                p { class: "field-error", "{e}" }
            }
            button { id: "add-run", onclick: add, "Add run" }
            h2 { "The space under the floor" }
            AutosaveFields { prefix: "site", fields: SITE_FIELDS, initial: site_texts, save: save_site, metric: units == UnitSystem::Metric }
            details { id: "about-area",
                summary { "About this area: name, kind, loads, notes" }
                AutosaveFields { prefix: "area", fields: AREA_FIELDS, initial: own_texts, save: save_own }
            }
            Photos { owner: id.clone() }
        }
    }
}

/// What was typed as a label, or `default` when nothing was.
fn label_or(typed: String, default: &str) -> String {
    if typed.trim().is_empty() {
        default.to_string()
    } else {
        typed
    }
}

/// A save the store refused, said under the fields.
fn not_saved(message: String) -> FieldError {
    FieldError {
        field: "save",
        message,
    }
}
