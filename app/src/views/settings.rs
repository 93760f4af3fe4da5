//! Settings: the inspector, screen, units, code edition and default loads, saved as they
//! change; and the firm's office to send finished inspections to.

use crate::components::{OfficeSync, TopBar};
use crate::{use_app, Route};
use dioxus::prelude::*;
use undercroft_engine::forms::CODE_EDITIONS;
use undercroft_engine::model::RoomUse;
use undercroft_engine::units::UnitSystem;
use undercroft_store::{Screen, Settings};

#[component]
pub fn SettingsView() -> Element {
    let app = use_app();
    let mut settings = use_signal(|| app.store.borrow().settings().unwrap_or_default());
    let mut error = use_signal(|| None::<String>);
    let save = use_callback(move |edit: (&'static str, String)| {
        settings.with_mut(|s: &mut Settings| match edit.0 {
            "name" => s.inspector_name = edit.1,
            "company" => s.company = edit.1,
            "license" => s.license = edit.1,
            "edition" => s.code_edition = edit.1,
            "units" => {
                s.units = if edit.1 == "metric" {
                    UnitSystem::Metric
                } else {
                    UnitSystem::Imperial
                }
            }
            "room" => {
                s.room_use_above = if edit.1 == "sleeping" {
                    RoomUse::Sleeping
                } else {
                    RoomUse::Living
                }
            }
            "screen" => s.screen = Screen::from_key(&edit.1),
            _ => s.heavy_finish = edit.1 == "true",
        });
        let current = settings();
        error.set(app.change(|s| s.save_settings(&current)).err());
    });
    let s = settings();
    let metric = s.units == UnitSystem::Metric;
    let sleeping = s.room_use_above == RoomUse::Sleeping;
    rsx! {
        main {
            TopBar { title: "Settings", Link { to: Route::Inspections {}, "‹ Inspections" } }
            label { r#for: "inspector-name", "Inspector" }
            input { id: "inspector-name", value: "{s.inspector_name}", oninput: move |e| save.call(("name", e.value())) }
            label { r#for: "company", "Company" }
            input { id: "company", value: "{s.company}", oninput: move |e| save.call(("company", e.value())) }
            label { r#for: "license", "License number" }
            input { id: "license", value: "{s.license}", oninput: move |e| save.call(("license", e.value())) }
            label { r#for: "screen", "Screen" }
            select { id: "screen", onchange: move |e| save.call(("screen", e.value())),
                for (value, text) in [(Screen::Device, "As the device is set"), (Screen::Dark, "Dark, for dim light"), (Screen::Light, "Light")] {
                    option { value: value.key(), selected: s.screen == value, "{text}" }
                }
            }
            label { r#for: "units", "Units" }
            select { id: "units", onchange: move |e| save.call(("units", e.value())),
                option { value: "imperial", selected: !metric, "Feet and inches" }
                option { value: "metric", selected: metric, "Millimetres" }
            }
            label { r#for: "edition", "Code edition" }
            select { id: "edition", onchange: move |e| save.call(("edition", e.value())),
                for (value, text) in CODE_EDITIONS.iter() {
                    option { value: "{value}", selected: s.code_edition == *value, "{text}" }
                }
            }
            label { r#for: "room", "Default rooms above" }
            select { id: "room", onchange: move |e| save.call(("room", e.value())),
                option { value: "living", selected: !sleeping, "Living areas (40 psf)" }
                option { value: "sleeping", selected: sleeping, "Sleeping rooms (30 psf)" }
            }
            label {
                input { r#type: "checkbox", checked: s.heavy_finish, onchange: move |e| save.call(("heavy", e.checked().to_string())) }
                " Heavy finishes by default (20 psf dead load)"
            }
            if let Some(e) = error() {
                p { class: "field-error", "{e}" }
            }
            OfficeSync {}
        }
    }
}
