//! One area: its joist runs and single members; add a run (copying the previous one's values)
//! or a single member.

use crate::components::Photos;
use crate::{use_app, Route};
use dioxus::prelude::*;
use undercroft_core::model::{JoistRun, Member};
use undercroft_core::store::new_id;

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
    let previous = area.runs.last().map(|r| r.framing.clone());
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
            nav { class: "back", Link { to: Route::InspectionView { id: inspection.id.clone() }, "< {inspection.property.address}" } }
            h1 { "{area.name}" }
            h2 { "Joist runs" }
            ul { class: "list",
                for run in area.runs.iter() {
                    li { key: "{run.id}", Link { to: Route::RunView { id: run.id.clone() }, "{run.label}" } }
                }
            }
            h2 { "Single members" }
            if area.members.is_empty() {
                p { class: "muted", "None yet: a header, a lone joist, an engineered member." }
            }
            ul { class: "list",
                for m in area.members.iter() {
                    li { key: "{m.id}", Link { to: Route::MemberView { id: m.id.clone() }, "{m.label}" } }
                }
            }
            label { r#for: "member-name", "A single member" }
            input { id: "member-name", placeholder: "Header at the stair opening", value: "{member_label}", oninput: move |e| member_label.set(e.value()) }
            button { class: "quiet", id: "add-member", onclick: add_member, "Add member" }
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
