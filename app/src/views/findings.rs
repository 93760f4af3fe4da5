//! Every finding of an inspection, over limit first, with its numbers, citation and
//! recommendation; the inspector can add a note, write their own recommendation, or set a
//! finding aside as not applicable with a reason. Each is saved as it is typed.

use super::finding_route::route_of;
use super::findings_filter::{shown, StatusFilter};
use crate::components::{PhotoMessage, PhotoOutcome, PhotoPicker, StatusBadge, TopBar};
use crate::{use_app, Route};
use dioxus::prelude::*;
use undercroft_engine::model::FindingNote;
use undercroft_engine::priority::{default_priority, effective_priority, Priority};

/// One finding as the screen shows it.
#[derive(Clone, PartialEq)]
struct Row {
    key: String,
    status: undercroft_engine::Status,
    label: String,
    basis: String,
    use_text: Option<String>,
    title: String,
    summary: String,
    measured: String,
    citation: String,
    recommendation: String,
    location: String,
    area_id: String,
    /// The screen of what the finding is about.
    go: Option<Route>,
    note: FindingNote,
    /// Who acts and how soon, as the report will say it.
    priority: Priority,
    /// The priority set from the finding, before the inspector changes it.
    default_priority: Priority,
    /// What a photo of this finding is attached to: its observation, else its member.
    photo_owner: String,
    /// Photos already attached there.
    photos: usize,
}

#[component]
pub fn Findings(id: String) -> Element {
    let app = use_app();
    let (loaded, notes) = {
        let store = app.store.borrow();
        (
            store.load_inspection(&id),
            store.finding_notes(&id).unwrap_or_default(),
        )
    };
    let mut filter = use_signal(|| StatusFilter::NotWithin);
    let mut area = use_signal(|| None::<String>);
    let mut show_within = use_signal(|| false);
    let Ok(inspection) = loaded else {
        return rsx! { main { p { "This inspection is not in the store." } } };
    };
    let evaluation = app.evaluation(&inspection);
    let photo_count = |owner: &str| {
        inspection
            .photos
            .iter()
            .filter(|p| p.attached_to == owner)
            .count()
    };
    let rows: Vec<Row> = evaluation
        .by_attention()
        .into_iter()
        .map(|f| {
            let key = f.key();
            let note = notes
                .iter()
                .find(|n| n.key == key)
                .cloned()
                .unwrap_or(FindingNote {
                    key: key.clone(),
                    ..Default::default()
                });
            let not_checked = f
                .not_checked_because
                .as_deref()
                .map(|w| format!("Not checked: {w}"));
            let measured = match (f.measured(), f.limit(), not_checked) {
                (Some(m), Some(l), None) => format!("Measured {}, limit {}", m.text, l.text),
                (Some(m), Some(l), Some(why)) => {
                    format!("Measured {}, limit {}. {why}", m.text, l.text)
                }
                (_, _, why) => why.unwrap_or_default(),
            };
            Row {
                key,
                status: f.status,
                label: f.status_label().to_string(),
                basis: f.basis.name().to_string(),
                use_text: f.use_text(),
                title: f.title().to_string(),
                summary: f.summary(),
                measured,
                citation: f.citation(),
                recommendation: note
                    .recommendation
                    .clone()
                    .unwrap_or_else(|| f.recommendation()),
                location: f.place.location.to_string(),
                area_id: f.place.area_id.to_string(),
                go: route_of(&inspection, f),
                priority: effective_priority(f, note.priority),
                default_priority: default_priority(f),
                photo_owner: f
                    .observation_id
                    .as_deref()
                    .unwrap_or(&f.place.member_id)
                    .to_string(),
                photos: photo_count(f.observation_id.as_deref().unwrap_or(&f.place.member_id)),
                note,
            }
        })
        .collect();
    let status_of = status_and_area;
    let shown_rows = shown(&rows, status_of, filter(), area().as_deref());
    // Within-limit checks are folded under the default view, shown on request.
    let within_rows = shown(&rows, status_of, StatusFilter::Within, area().as_deref());
    let within_count = within_rows.len();
    rsx! {
        main {
            TopBar { title: "Findings", Link { to: Route::InspectionView { id: id.clone() }, "‹ {inspection.property.address}" } }
            if !evaluation.problems.is_empty() {
                div { class: "card", id: "input-problems",
                    h2 { "Entries that could not be used" }
                    p { class: "muted", "Correct these: the findings that need them say so, and the report lists them." }
                    ul {
                        for p in evaluation.problems.iter() {
                            li { strong { "{p.location}: " } "{p.message}" }
                        }
                    }
                }
            }
            div { class: "filters",
                label { r#for: "status-filter", "Show" }
                select { id: "status-filter", onchange: move |e| filter.set(StatusFilter::parse(&e.value())),
                    for f in StatusFilter::ALL {
                        option { value: "{f.key()}", selected: filter() == f, "{f.label()}" }
                    }
                }
                label { r#for: "area-filter", "Where" }
                select { id: "area-filter", onchange: move |e| area.set(Some(e.value()).filter(|v| !v.is_empty())),
                    option { value: "", selected: area().is_none(), "Every area" }
                    for a in inspection.areas.iter() {
                        option { value: "{a.id}", selected: area().as_deref() == Some(a.id.as_str()), "{a.name}" }
                    }
                }
            }
            if shown_rows.is_empty() {
                p { class: "muted", id: "no-findings", "No finding of this kind here." }
            }
            for row in shown_rows {
                FindingCard { key: "{row.key}", inspection_id: id.clone(), row: row.clone() }
            }
            if filter() == StatusFilter::NotWithin && within_count > 0 {
                button { class: "quiet", id: "show-within", onclick: move |_| show_within.toggle(),
                    if show_within() { "Fold the {within_count} checks within their limits" } else { "Show the {within_count} checks within their limits" }
                }
                if show_within() {
                    for row in within_rows {
                        FindingCard { key: "{row.key}", inspection_id: id.clone(), row: row.clone() }
                    }
                }
            }
        }
    }
}

/// A row's status and area, for the filters.
fn status_and_area(r: &Row) -> (undercroft_engine::Status, &str) {
    (r.status, r.area_id.as_str())
}

#[component]
fn FindingCard(inspection_id: String, row: Row) -> Element {
    let app = use_app();
    let mut open = use_signal(|| false);
    let note = row.note.clone();
    let save = use_callback(move |edit: (&'static str, String)| {
        let mut n = note.clone();
        let value = edit.1;
        match edit.0 {
            "note" => n.note = value,
            "recommendation" => n.recommendation = (!value.trim().is_empty()).then_some(value),
            "priority" => n.priority = Priority::parse(&value),
            _ => n.not_applicable_reason = (!value.trim().is_empty()).then_some(value),
        }
        let _ = app.change(|s| s.set_finding_note(&inspection_id, &n));
    });
    let set_aside = row.note.not_applicable_reason.clone();
    let mut photo_outcome = use_signal(|| None::<PhotoOutcome>);
    let photos_said = match row.photos {
        0 => "No photo yet".to_string(),
        1 => "1 photo".to_string(),
        n => format!("{n} photos"),
    };
    rsx! {
        div { class: "card finding",
            StatusBadge { status: row.status, label: row.label.clone(), use_text: row.use_text.clone() }
            if let Some(reason) = &set_aside {
                p { class: "status", "Set aside: {reason}" }
            }
            h2 { "{row.title}" }
            p { class: "muted", "{row.location}" }
            p { "{row.summary}" }
            p { "{row.measured}" }
            p { class: "muted", "Basis: {row.basis}. Cites {row.citation}" }
            p { "{row.recommendation}" }
            p { class: "muted priority", "Who acts: {row.priority.label()}" }
            if let Some(go) = row.go.clone() {
                Link { class: "go", to: go, "Go to what it is about" }
            }
            if !row.note.note.is_empty() {
                p { "Note: {row.note.note}" }
            }
            p { class: "muted photo-count", "{photos_said}" }
            PhotoPicker { owner: row.photo_owner.clone(), tag: format!("-{}", row.key), on_outcome: move |o| photo_outcome.set(Some(o)) }
            PhotoMessage { outcome: photo_outcome() }
            button { class: "quiet", onclick: move |_| open.toggle(), if open() { "Close" } else { "Note, recommendation, set aside" } }
            if open() {
                label { r#for: "priority-{row.key}", "Who acts and how soon" }
                select { id: "priority-{row.key}", onchange: move |e| save.call(("priority", e.value())),
                    option { value: "", selected: row.note.priority.is_none(), "As set from the finding ({row.default_priority.label()})" }
                    for p in Priority::ALL {
                        option { value: "{p.key()}", selected: row.note.priority == Some(p), "{p.label()}: {p.meaning()}" }
                    }
                }
                label { "Your note" }
                textarea { value: "{row.note.note}", oninput: move |e| save.call(("note", e.value())) }
                label { "Your recommendation (leave empty for the computed one)" }
                textarea { value: "{row.note.recommendation.clone().unwrap_or_default()}", oninput: move |e| save.call(("recommendation", e.value())) }
                label { "Not applicable because (leave empty to keep the finding)" }
                textarea { value: "{row.note.not_applicable_reason.clone().unwrap_or_default()}", oninput: move |e| save.call(("not_applicable", e.value())) }
            }
        }
    }
}
