//! A length field with the tape keypad: digits, feet and inch marks and the fractions of a
//! tape in sixteenths (millimetres when the inspection is metric), in reach of one thumb.
//! The keypad opens when the field is tapped and stays on it until "Done" or the screen
//! changes; the first key
//! after it opens replaces the value shown (a field filled "same as before" is retyped, not
//! appended to). "Keyboard" hands the field to the phone's own keyboard instead.

use crate::Route;
use dioxus::prelude::*;

/// Which length field has the keypad, shared by every field of the app (one keypad at a time).
#[derive(Clone, Copy)]
pub struct TapeState {
    /// The field with the keypad open: its screen's address and element id (`place_key`),
    /// so a field of the same id on another screen does not open with it.
    pub active: Signal<Option<String>>,
    /// The inspector chose the phone's keyboard for lengths.
    pub system_keyboard: Signal<bool>,
    /// The next key replaces the value (the keypad has just opened on the field).
    pub fresh: Signal<bool>,
}

impl TapeState {
    pub fn new() -> TapeState {
        TapeState {
            active: Signal::new(None),
            system_keyboard: Signal::new(false),
            fresh: Signal::new(false),
        }
    }

    /// Keeps the keypad of the field now open on the same field of the screen at `next`
    /// (the joist walk's next joist), ready to retype it.
    pub fn carry_open(mut self, next: &Route) {
        let open = self
            .active
            .peek()
            .as_deref()
            .and_then(|key| key.rsplit_once('#'))
            .map(|(_, id)| format!("{next}#{id}"));
        if open.is_some() {
            self.active.set(open);
            self.fresh.set(true);
        }
    }
}

impl Default for TapeState {
    fn default() -> Self {
        TapeState::new()
    }
}

/// The key of a field on the screen now showing.
fn place_key(id: &str) -> String {
    format!("{}#{id}", use_route::<Route>())
}

/// The eighths shown at once; the sixteenths behind one key.
const EIGHTHS: [&str; 7] = ["1/8", "1/4", "3/8", "1/2", "5/8", "3/4", "7/8"];
const SIXTEENTHS: [&str; 8] = [
    "1/16", "3/16", "5/16", "7/16", "9/16", "11/16", "13/16", "15/16",
];

#[component]
pub fn TapeInput(
    id: String,
    value: String,
    placeholder: String,
    metric: bool,
    on_input: EventHandler<String>,
) -> Element {
    let tape = use_context_or_local();
    let TapeState {
        mut active,
        system_keyboard,
        mut fresh,
        ..
    } = tape;
    let key = place_key(&id);
    let open = active.read().as_deref() == Some(key.as_str());
    let inputmode = if system_keyboard() {
        if metric {
            "decimal"
        } else {
            "text"
        }
    } else {
        "none"
    };
    rsx! {
        input { id: "{id}", class: "tape", inputmode, autocomplete: "off", value: "{value}", placeholder: "{placeholder}",
            // Opened by a tap, not by focus alone: a field focused by the keyboard's tab or
            // by a script keeps the page uncovered.
            onclick: move |_| {
                if !system_keyboard() {
                    active.set(Some(key.clone()));
                    fresh.set(true);
                }
            },
            oninput: move |e| {
                fresh.set(false);
                on_input.call(e.value())
            }
        }
        if open {
            Keypad { id: id.clone(), value: value.clone(), metric, on_input }
            div { class: "keypad-room" }
        }
    }
}

#[component]
fn Keypad(id: String, value: String, metric: bool, on_input: EventHandler<String>) -> Element {
    let tape = use_context_or_local();
    let TapeState {
        mut active,
        mut system_keyboard,
        mut fresh,
        ..
    } = tape;
    let mut sixteenths = use_signal(|| false);
    let press = {
        let value = value.clone();
        move |key: &'static str| {
            let base = if fresh() {
                String::new()
            } else {
                value.clone()
            };
            fresh.set(false);
            on_input.call(pressed(&base, key));
        }
    };
    let rows: &[[&'static str; 4]] = if metric {
        &[
            ["7", "8", "9", "del"],
            ["4", "5", "6", "."],
            ["1", "2", "3", "clear"],
        ]
    } else {
        &[
            ["7", "8", "9", "del"],
            ["4", "5", "6", "'"],
            ["1", "2", "3", "\""],
        ]
    };
    let fractions: &[&'static str] = if sixteenths() { &SIXTEENTHS } else { &EIGHTHS };
    rsx! {
        div { class: "keypad", id: "{id}-keypad", role: "group", aria_label: "Tape keypad",
            p { class: "keypad-shows", "{value}" }
            if !metric {
                div { class: "fractions",
                    for f in fractions.iter().copied() {
                        button { key: "{f}", class: "key fraction", "data-key": "{f}", onclick: {
                            let mut press = press.clone();
                            move |_| press(f)
                        }, "{f}" }
                    }
                    button { class: "key fraction", id: "{id}-sixteenths", onclick: move |_| sixteenths.toggle(),
                        if sixteenths() { "8ths" } else { "16ths" } }
                }
            }
            for row in rows.iter() {
                div { class: "keys",
                    for k in row.iter().copied() {
                        button { key: "{k}", class: "key", "data-key": "{k}", onclick: {
                            let mut press = press.clone();
                            move |_| press(k)
                        }, {key_face(k)} }
                    }
                }
            }
            div { class: "keys",
                button { class: "key quiet", id: "{id}-keyboard", onclick: move |_| {
                    system_keyboard.set(true);
                    active.set(None);
                }, "Keyboard" }
                button { class: "key", "data-key": "0", onclick: {
                    let mut press = press.clone();
                    move |_| press("0")
                }, "0" }
                if metric {
                    button { class: "key", "data-key": "mm", onclick: {
                        let mut press = press.clone();
                        move |_| press(" mm")
                    }, "mm" }
                } else {
                    button { class: "key", "data-key": "space", onclick: {
                        let mut press = press.clone();
                        move |_| press(" ")
                    }, "space" }
                }
                button { class: "key done", id: "{id}-done", onclick: move |_| active.set(None), "Done" }
            }
        }
    }
}

fn use_context_or_local() -> TapeState {
    try_use_context::<TapeState>().unwrap_or_else(|| use_hook(TapeState::new))
}

fn key_face(key: &str) -> &str {
    match key {
        "del" => "\u{232B}",
        "clear" => "C",
        "'" => "ft '",
        "\"" => "in \"",
        other => other,
    }
}

/// The text after one key: digits and marks appended as a tape is read aloud, a fraction
/// after a space, the foot mark followed by a space for the inches.
pub fn pressed(text: &str, key: &str) -> String {
    let mut out = text.to_string();
    match key {
        "del" => {
            out = out.trim_end().to_string();
            out.pop();
        }
        "clear" => out.clear(),
        "'" => {
            out = out.trim_end().to_string();
            out.push_str("' ");
        }
        "\"" => {
            out = out.trim_end().to_string();
            out.push('"');
        }
        f if f.contains('/') => {
            if out.ends_with(|c: char| c.is_ascii_digit()) {
                out.push(' ');
            }
            out.push_str(f);
        }
        other => out.push_str(other),
    }
    out
}

#[cfg(test)]
mod tests {
    use super::pressed;
    use undercroft_engine::units::{parse_typed_length, UnitSystem};

    fn typed(keys: &[&str]) -> String {
        keys.iter().fold(String::new(), |text, k| pressed(&text, k))
    }

    #[test]
    fn keys_build_what_the_parser_reads() {
        let read = |t: &str| {
            parse_typed_length(t, UnitSystem::Imperial)
                .unwrap()
                .in_inches()
        };
        assert_eq!(read(&typed(&["1", "5", "'", "2", "\""])), 182.0);
        assert_eq!(read(&typed(&["1", "5", "'", "2", "3/8", "\""])), 182.375);
        assert_eq!(read(&typed(&["1", "5/16"])), 1.3125);
        assert_eq!(read(&typed(&["3", "5", "del", "4"])), 34.0);
        assert_eq!(typed(&["1", "2", "'", "del"]), "12");
        let mm =
            parse_typed_length(&typed(&["4", "1", "5", "0", " mm"]), UnitSystem::Metric).unwrap();
        assert!((mm.in_millimetres() - 4150.0).abs() < 1e-9);
    }
}
