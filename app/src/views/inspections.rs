//! Inspections, newest first, with search, and the form that starts one.

use crate::{use_app, Route};
use dioxus::prelude::*;
use undercroft_engine::model::RoomUse;
use undercroft_store::{now_utc, ListFilter, NewInspection};

#[component]
pub fn Inspections() -> Element {
    let app = use_app();
    let mut search = use_signal(String::new);
    let mut show_archived = use_signal(|| false);
    let mut address = use_signal(String::new);
    let mut client = use_signal(String::new);
    // Today (as UTC has it; the inspector can change it).
    let mut date = use_signal(|| now_utc().chars().take(10).collect::<String>());
    let settings = app.store.borrow().settings().unwrap_or_default();
    let mut room = use_signal(|| {
        if settings.room_use_above == RoomUse::Sleeping {
            "sleeping".to_string()
        } else {
            "living".to_string()
        }
    });
    let mut heavy = use_signal(|| settings.heavy_finish);
    let mut error = use_signal(|| None::<String>);
    let list = app
        .store
        .borrow()
        .list_inspections(&ListFilter {
            search: search(),
            include_archived: show_archived(),
        })
        .unwrap_or_default();
    let start = {
        let app = app.clone();
        move |_| {
            let new = NewInspection {
                address: address(),
                client_name: client(),
                date: date(),
                room_use_above: Some(if room() == "sleeping" {
                    RoomUse::Sleeping
                } else {
                    RoomUse::Living
                }),
                heavy_finish: heavy(),
                code_edition: settings.code_edition.clone(),
                inspector_name: settings.inspector_name.clone(),
                inspector_company: settings.company.clone(),
                inspector_license: settings.license.clone(),
                units: settings.units,
            };
            match app.change(|s| s.create_inspection(&new)) {
                Ok(id) => {
                    navigator().push(Route::InspectionView { id });
                }
                Err(e) => error.set(Some(e)),
            }
        }
    };
    rsx! {
        main {
            header { class: "top-bar",
                nav { class: "bar-action", Link { to: Route::SettingsView {}, id: "settings-link", "Settings" } }
                h1 { "Inspections" }
            }
            input { r#type: "search", id: "search", placeholder: "Search address or client", value: "{search}", oninput: move |e| search.set(e.value()) }
            label {
                input { r#type: "checkbox", id: "show-archived", checked: show_archived(), onchange: move |e| show_archived.set(e.checked()) }
                " Show archived inspections"
            }
            if list.is_empty() {
                p { class: "muted", "No inspections yet." }
            }
            ul { class: "list",
                for s in list {
                    li { key: "{s.id}",
                        Link { to: Route::InspectionView { id: s.id.clone() },
                            "{s.address}"
                            br {}
                            span { class: "muted", "{s.client_name} {s.date}" }
                            if s.archived {
                                span { class: "muted", " (archived)" }
                            }
                        }
                    }
                }
            }
            h2 { "Start an inspection" }
            label { r#for: "new-address", "Property address" }
            input { id: "new-address", value: "{address}", oninput: move |e| address.set(e.value()) }
            label { r#for: "new-client", "Client" }
            input { id: "new-client", value: "{client}", oninput: move |e| client.set(e.value()) }
            label { r#for: "new-date", "Date" }
            input { id: "new-date", r#type: "date", value: "{date}", oninput: move |e| date.set(e.value()) }
            label { r#for: "new-room", "Rooms above" }
            select { id: "new-room", value: "{room}", onchange: move |e| room.set(e.value()),
                option { value: "living", "Living areas (40 psf)" }
                option { value: "sleeping", "Sleeping rooms (30 psf)" }
            }
            label {
                input { r#type: "checkbox", id: "new-heavy", checked: heavy(), onchange: move |e| heavy.set(e.checked()) }
                " Heavy finishes above (tile, stone): 20 psf dead load"
            }
            if let Some(e) = error() {
                p { class: "field-error", "{e}" }
            }
            button { id: "start-inspection", onclick: start, "Start inspection" }
        }
    }
}
