//! Every finding of an inspection, over limit first, with its numbers, citation and
//! recommendation.

use crate::components::StatusBadge;
use crate::{use_app, Route};
use dioxus::prelude::*;
use undercroft_core::evaluate;

#[component]
pub fn Findings(id: String) -> Element {
    let app = use_app();
    let loaded = app.store.borrow().load_inspection(&id);
    let Ok(inspection) = loaded else {
        return rsx! { main { p { "This inspection is not in the store." } } };
    };
    let evaluation = evaluate(&inspection);
    let rows: Vec<_> = evaluation
        .by_attention()
        .into_iter()
        .map(|f| {
            (
                f.key(),
                f.status,
                f.use_text(),
                f.title(),
                f.summary(),
                f.citation(),
                f.recommendation(),
                f.place.location.to_string(),
            )
        })
        .collect();
    rsx! {
        main {
            nav { class: "back", Link { to: Route::InspectionView { id: id.clone() }, "< {inspection.property.address}" } }
            h1 { "Findings" }
            for (key, status, use_text, title, summary, citation, recommendation, location) in rows {
                div { class: "card finding", key: "{key}",
                    StatusBadge { status, use_text }
                    h2 { "{title}" }
                    p { class: "muted", "{location}" }
                    p { "{summary}" }
                    p { class: "muted", "Cites {citation}" }
                    p { "{recommendation}" }
                }
            }
        }
    }
}
