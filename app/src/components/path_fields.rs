//! The fields of a girder line, a post or an area's conditions: picks for what can be picked,
//! lengths typed as a tape reads, yes/no/not recorded; each field's error directly under it.

use super::TapeInput;
use dioxus::prelude::*;
use undercroft_engine::forms::{FieldError, PathField, PathFieldType};
use undercroft_engine::units::{bare_number_hint, UnitSystem};

/// A field changed: its name and its new text.
pub type PathChange = (&'static str, String);

#[component]
pub fn PathFields(
    /// A prefix for element ids, so two forms on one screen do not collide.
    prefix: &'static str,
    fields: &'static [PathField],
    /// Each field's text, in the order of `fields`.
    values: Vec<String>,
    errors: Vec<FieldError>,
    /// Metric inspections get the millimetre keypad.
    #[props(default)]
    metric: bool,
    on_change: EventHandler<PathChange>,
) -> Element {
    rsx! {
        for (field, value) in fields.iter().zip(values) {
            PathInput {
                key: "{field.name}",
                id: format!("{prefix}-{}", field.name.replace(['_', '.'], "-")),
                field: *field,
                value,
                error: errors.iter().find(|e| e.field == field.name).map(|e| e.message.clone()),
                metric,
                on_change,
            }
        }
    }
}

#[component]
fn PathInput(
    id: String,
    field: PathField,
    value: String,
    error: Option<String>,
    metric: bool,
    on_change: EventHandler<PathChange>,
) -> Element {
    let name = field.name;
    let control = match field.kind {
        PathFieldType::Choice(picks) => rsx! {
            select { id: "{id}", onchange: move |e| on_change.call((name, e.value())),
                option { value: "", selected: value.is_empty(), "{field.empty}" }
                for (key, text) in picks.iter() {
                    option { value: "{key}", selected: value == *key, "{text}" }
                }
            }
        },
        PathFieldType::YesNo => rsx! {
            select { id: "{id}", onchange: move |e| on_change.call((name, e.value())),
                option { value: "", selected: value.is_empty(), "{field.empty}" }
                option { value: "yes", selected: value == "yes", "Yes" }
                option { value: "no", selected: value == "no", "No" }
            }
        },
        PathFieldType::Many(picks) => {
            let chosen: Vec<String> = value
                .split(',')
                .filter(|v| !v.is_empty())
                .map(str::to_string)
                .collect();
            rsx! {
                div { id: "{id}", class: "checks",
                    for (key, text) in picks.iter() {
                        label { key: "{key}",
                            input { r#type: "checkbox", checked: chosen.iter().any(|c| c == key),
                                onchange: {
                                    let chosen = chosen.clone();
                                    move |e: Event<FormData>| {
                                        let mut next: Vec<&str> = chosen.iter().map(String::as_str).filter(|c| c != key).collect();
                                        if e.checked() {
                                            next.push(key);
                                        }
                                        on_change.call((name, next.join(",")));
                                    }
                                }
                            }
                            " {text}"
                        }
                    }
                }
            }
        }
        PathFieldType::Date => rsx! {
            input { id: "{id}", r#type: "date", value: "{value}",
                oninput: move |e| on_change.call((name, e.value())) }
        },
        PathFieldType::Short | PathFieldType::Long => {
            let units = if metric {
                UnitSystem::Metric
            } else {
                UnitSystem::Imperial
            };
            rsx! {
                TapeInput { id: id.clone(), value, placeholder: bare_number_hint(units), metric,
                    on_input: move |text| on_change.call((name, text)) }
            }
        }
        kind => {
            let inputmode = match kind {
                PathFieldType::Number { .. } | PathFieldType::Count { .. } => "decimal",
                _ => "text",
            };
            let hint = match kind {
                PathFieldType::Lengths => "15' 6\", 31' 0\"",
                _ => "",
            };
            rsx! {
                input { id: "{id}", inputmode, autocomplete: "off", value: "{value}", placeholder: "{hint}",
                    oninput: move |e| on_change.call((name, e.value())) }
            }
        }
    };
    rsx! {
        label { r#for: "{id}", "{field.label}" }
        {control}
        if let Some(e) = error {
            p { class: "field-error", role: "alert", "{e}" }
        }
    }
}
