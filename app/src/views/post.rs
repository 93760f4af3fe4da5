//! One post under a girder line: its fields saved on every change, its findings (capacity,
//! code minimums, decay protection, footing, what was seen), photos.

use crate::components::{PathChange, PathFields, Photos, RemoveButton, StatusBadge, TopBar};
use crate::{use_app, Route};
use dioxus::prelude::*;
use undercroft_engine::forms::{field_text, post_with, FieldError, POST_FIELDS};
use undercroft_engine::units::UnitSystem;

#[component]
pub fn PostScreen(id: String) -> Element {
    let app = use_app();
    let loaded = app.inspection_holding(&id).and_then(|i| {
        let (line, post) = i.post(&id).map(|(_, g, p)| (g.clone(), p.clone()))?;
        Some((i, line, post))
    });
    let Some((inspection, line, post)) = loaded else {
        return rsx! { main { p { "This post is not in the store." } Link { to: Route::Inspections {}, "Back to inspections" } } };
    };
    let units = inspection.units;
    let mut texts = use_signal(|| {
        POST_FIELDS
            .iter()
            .map(|f| field_text(&post, f, units))
            .collect::<Vec<_>>()
    });
    let mut errors = use_signal(Vec::<FieldError>::new);
    let save = {
        let app = app.clone();
        let id = id.clone();
        use_callback(move |(name, text): PathChange| {
            if let Some(i) = POST_FIELDS.iter().position(|f| f.name == name) {
                texts.write()[i] = text.clone();
            }
            let Some((line, current)) = app
                .inspection_holding(&id)
                .and_then(|i| i.post(&id).map(|(_, g, p)| (g.clone(), p.clone())))
            else {
                return;
            };
            let mut errs: Vec<FieldError> =
                errors().into_iter().filter(|e| e.field != name).collect();
            match post_with(&line, &current, name, &text, units) {
                Ok(changed) => {
                    if let Err(message) = app.change(|s| s.update_post(&changed)) {
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
    let findings: Vec<_> = evaluation
        .by_attention()
        .into_iter()
        .filter(|f| *f.place.member_id == *id)
        .map(|f| {
            (
                f.key(),
                f.status,
                f.status_label().to_string(),
                f.use_text(),
                f.title().to_string(),
                f.summary(),
                f.recommendation(),
            )
        })
        .collect();
    rsx! {
        main {
            TopBar { title: "{post.label}", Link { to: Route::GirderScreen { id: line.id.clone() }, "‹ {line.label}" } }
            h2 { "Findings" }
            ul { class: "list findings-brief",
                for (key, status, label, use_text, title, summary, recommendation) in findings {
                    li { key: "{key}",
                        StatusBadge { status, label, use_text }
                        " {title}"
                        br {}
                        span { "{summary}" }
                        br {}
                        span { class: "muted", "{recommendation}" }
                    }
                }
            }
            h2 { "The post" }
            PathFields { prefix: "post", fields: POST_FIELDS, values: texts(), errors: errors(), metric: units == UnitSystem::Metric, on_change: save }
            for e in errors().iter().filter(|e| e.field == "save") {
                p { class: "field-error", "Not saved: {e.message}" }
            }
            Photos { owner: id.clone() }
            RemoveButton { id: id.clone(), what: "this post", then: Route::GirderScreen { id: line.id.clone() } }
        }
    }
}
