//! One girder line: its fields saved on every change, its side view with the posts and the
//! load of the joists it carries, its findings and its posts' findings, its posts (add one by
//! its distance from end A), photos.

use crate::components::{
    worst_status, GirderSvg, PathChange, PathFields, Photos, RemoveButton, RowStatus, StatusBadge,
    TapeInput, TopBar,
};
use crate::{use_app, Route};
use dioxus::prelude::*;
use undercroft_engine::forms::{
    field_text, girder_with, post_position_problem, FieldError, GIRDER_FIELDS,
};
use undercroft_engine::model::Post;
use undercroft_engine::units::UnitSystem;
use undercroft_engine::units::{bare_number_hint, parse_typed_length};
use undercroft_engine::views::girder_view_of;
use undercroft_store::new_id;

#[component]
pub fn GirderScreen(id: String) -> Element {
    let app = use_app();
    let loaded = app.inspection_holding(&id).and_then(|i| {
        let (area, line) = i.girder(&id).map(|(a, g)| (a.clone(), g.clone()))?;
        Some((i, area, line))
    });
    let Some((inspection, area, line)) = loaded else {
        return rsx! { main { p { "This girder is not in the store." } Link { to: Route::Inspections {}, "Back to inspections" } } };
    };
    let units = inspection.units;
    let mut texts = use_signal(|| {
        GIRDER_FIELDS
            .iter()
            .map(|f| field_text(&line, f, units))
            .collect::<Vec<_>>()
    });
    let mut errors = use_signal(Vec::<FieldError>::new);
    let save = {
        let app = app.clone();
        let id = id.clone();
        use_callback(move |(name, text): PathChange| {
            if let Some(i) = GIRDER_FIELDS.iter().position(|f| f.name == name) {
                texts.write()[i] = text.clone();
            }
            // The stored girder, read fresh so quick changes build on each other.
            let Some(current) = app
                .inspection_holding(&id)
                .and_then(|i| i.girder(&id).map(|(_, g)| g.clone()))
            else {
                return;
            };
            let mut errs: Vec<FieldError> =
                errors().into_iter().filter(|e| e.field != name).collect();
            match girder_with(&current, name, &text, units) {
                Ok(changed) => {
                    if let Err(message) = app.change(|s| s.update_girder(&changed)) {
                        errs.push(FieldError {
                            field: "save",
                            message,
                        });
                    }
                }
                Err(e) => errs.push(e),
            }
            errors.set(errs);
        })
    };
    let evaluation = app.evaluation(&inspection);
    let view = girder_view_of(&inspection, &evaluation.findings, &id);
    let post_ids: Vec<&str> = line.posts.iter().map(|p| p.id.as_str()).collect();
    let findings: Vec<_> = evaluation
        .by_attention()
        .into_iter()
        .filter(|f| *f.place.member_id == *id || post_ids.contains(&&*f.place.member_id))
        .map(|f| {
            (
                f.key(),
                f.status,
                f.status_label().to_string(),
                f.use_text(),
                f.title().to_string(),
                f.summary(),
                f.place.location.to_string(),
            )
        })
        .collect();
    let linked: Vec<String> = inspection
        .runs_on(&id)
        .iter()
        .map(|(_, r)| r.label.clone())
        .collect();
    let mut position = use_signal(String::new);
    let mut post_error = use_signal(|| None::<String>);
    let add_post = {
        let app = app.clone();
        let line = line.clone();
        move |_| {
            let at = match parse_typed_length(&position(), units) {
                Ok(at) => at,
                Err(e) => {
                    post_error.set(Some(format!("Distance from end A: {e}")));
                    return;
                }
            };
            let post = Post::new(new_id(), format!("Post {}", line.posts.len() + 1), at);
            if let Some(problem) = post_position_problem(&line, &post) {
                post_error.set(Some(format!("Distance from end A: {problem}")));
                return;
            }
            match app.change(|s| s.add_post(&line.id, &post)) {
                Ok(()) => {
                    navigator().push(Route::PostScreen { id: post.id });
                }
                Err(e) => post_error.set(Some(e)),
            }
        }
    };
    rsx! {
        main {
            TopBar { title: "{line.label}", Link { to: Route::AreaView { id: area.id.clone() }, "‹ {area.name}" } }
            if let Some(view) = view {
                GirderSvg { view }
            }
            if linked.is_empty() {
                p { class: "muted", id: "girder-load-hint", "No joist run bears on this girder yet: link runs from their screens to load it." }
            } else {
                p { class: "muted", id: "girder-carries", "Carries: {linked.join(\", \")}" }
            }
            h2 { "Findings" }
            ul { class: "list findings-brief",
                for (key, status, label, use_text, title, summary, location) in findings {
                    li { key: "{key}",
                        StatusBadge { status, label, use_text }
                        " {title}"
                        br {}
                        span { class: "muted", "{location}: {summary}" }
                    }
                }
            }
            h2 { "Posts" }
            ul { class: "list",
                for post in line.posts_in_order() {
                    li { key: "{post.id}",
                        Link { to: Route::PostScreen { id: post.id.clone() }, "{post.label}"
                            br {}
                            RowStatus { status: worst_status(&evaluation, &[&post.id]) }
                        }
                    }
                }
            }
            label { r#for: "post-at", "A post at this distance from end A" }
            TapeInput { id: "post-at", value: position(), placeholder: bare_number_hint(units), metric: units == UnitSystem::Metric, on_input: move |t| position.set(t) }
            if let Some(e) = post_error() {
                p { class: "field-error", role: "alert", "{e}" }
            }
            button { id: "add-post", onclick: add_post, "Add post" }
            h2 { "The girder" }
            PathFields { prefix: "girder", fields: GIRDER_FIELDS, values: texts(), errors: errors(), metric: units == UnitSystem::Metric, on_change: save }
            for e in errors().iter().filter(|e| e.field == "save") {
                p { class: "field-error", "Not saved: {e.message}" }
            }
            Photos { owner: id.clone() }
            RemoveButton { id: id.clone(), what: "this girder and its posts", then: Route::AreaView { id: area.id.clone() } }
        }
    }
}
