//! One inspection: its areas, each with a count of what is over a limit; add an area.

use crate::components::{worst_status, AutosaveFields, PathChange, RowStatus, TopBar};
use crate::edits::save_header_field;
use crate::{use_app, Route};
use dioxus::prelude::*;
use undercroft_engine::forms::{field_text, INSPECTION_FIELDS};
use undercroft_engine::model::{Area, AreaKind};
use undercroft_engine::Status;
use undercroft_store::new_id;

#[component]
pub fn InspectionView(id: String) -> Element {
    let app = use_app();
    let mut name = use_signal(String::new);
    let mut kind = use_signal(|| "crawlspace".to_string());
    let mut error = use_signal(|| None::<String>);
    let loaded = app.store.borrow().load_inspection(&id);
    let Ok(inspection) = loaded else {
        return rsx! { main { p { "This inspection is not in the store." } Link { to: Route::Inspections {}, "Back to inspections" } } };
    };
    let evaluation = app.evaluation(&inspection);
    let header_texts: Vec<String> = INSPECTION_FIELDS
        .iter()
        .map(|f| field_text(&inspection, f, inspection.units))
        .collect();
    let save_header = {
        let app = app.clone();
        let id = id.clone();
        use_callback(move |(name, text): PathChange| {
            app.change_field(|s| save_header_field(s, &id, name, &text))
        })
    };
    let over_in = |area_id: &str| {
        evaluation
            .findings
            .iter()
            .filter(|f| {
                &*f.place.area_id == area_id
                    && matches!(f.status, Status::OverLimit | Status::ToEvaluate)
            })
            .count()
    };
    let areas: Vec<(String, String, usize)> = inspection
        .areas
        .iter()
        .map(|a| (a.id.clone(), a.name.clone(), over_in(&a.id)))
        .collect();
    let inspection_id = id.clone();
    let add = {
        let app = app.clone();
        move |_| {
            let kind: AreaKind =
                serde_json::from_value(serde_json::Value::String(kind())).unwrap_or_default();
            let area = Area {
                id: new_id(),
                name: name(),
                kind,
                loads: Default::default(),
                runs: vec![],
                members: vec![],
                girders: vec![],
                conditions: Default::default(),
                notes: String::new(),
            };
            if area.name.trim().is_empty() {
                error.set(Some("Name the area first.".into()));
                return;
            }
            match app.change(|s| s.add_area(&inspection_id, &area)) {
                Ok(()) => {
                    navigator().push(Route::AreaView { id: area.id });
                }
                Err(e) => error.set(Some(e)),
            }
        }
    };
    let total_over = evaluation.count(Status::OverLimit);
    let to_evaluate = evaluation.count(Status::ToEvaluate);
    let archived = app.store.borrow().is_archived(&id).unwrap_or(false);
    let archive = {
        let app = app.clone();
        let id = id.clone();
        move |_| {
            if app.change(|s| s.archive_inspection(&id, !archived)).is_ok() && !archived {
                navigator().push(Route::Inspections {});
            }
        }
    };
    rsx! {
        main {
            TopBar { title: "{inspection.property.address}", Link { to: Route::Inspections {}, "‹ Inspections" } }
            p { class: "muted", "{inspection.client.name} {inspection.date} {inspection.code_edition}" }
            p { class: "notice", id: "screening-notice",
                "A screening tool, not an engineering evaluation: findings are checked against the {inspection.code_edition} and wood mechanics. Local codes and amendments govern; refer structural concerns to a licensed professional."
            }
            p { Link { to: Route::Findings { id: id.clone() }, id: "findings-link", "Findings: {total_over} over a limit, {to_evaluate} to be evaluated" } }
            p { Link { to: Route::ReportView { id: id.clone() }, id: "report-link", "Report" } }
            h2 { "Areas" }
            ul { class: "list",
                for (area_id, area_name, over) in areas {
                    li { key: "{area_id}",
                        Link { to: Route::AreaView { id: area_id.clone() }, "{area_name}"
                            br {}
                            RowStatus { status: worst_status(&evaluation, &[&area_id]) }
                            span { class: "muted", " {over} over a limit or to be evaluated" }
                        }
                    }
                }
            }
            h2 { "Add an area" }
            label { r#for: "area-name", "Name" }
            input { id: "area-name", placeholder: "Crawlspace under the kitchen", value: "{name}", oninput: move |e| name.set(e.value()) }
            label { r#for: "area-kind", "Kind" }
            select { id: "area-kind", value: "{kind}", onchange: move |e| kind.set(e.value()),
                option { value: "crawlspace", "Crawlspace" }
                option { value: "basement", "Basement" }
                option { value: "garage", "Garage" }
                option { value: "porch", "Porch" }
                option { value: "other", "Other" }
            }
            if let Some(e) = error() {
                p { class: "field-error", "{e}" }
            }
            button { id: "add-area", onclick: add, "Add area" }
            details { id: "about-inspection",
                summary { "About this inspection: client, date, code edition, loads" }
                AutosaveFields { prefix: "inspection", fields: INSPECTION_FIELDS, initial: header_texts, save: save_header }
            }
            h2 { "This inspection" }
            if archived {
                p { class: "status", "Archived: hidden from the list of inspections." }
                button { class: "quiet", id: "archive", onclick: archive, "Bring it back to the list" }
            } else {
                button { class: "quiet", id: "archive", onclick: archive, "Archive it (hidden from the list, kept)" }
            }
        }
    }
}
