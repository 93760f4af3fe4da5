//! Undercroft's app: routes, screens and widgets. Components hold no business logic: they read
//! state and call plain structs from the core crates (the store, the framing form, the live
//! check, the engine).

pub mod components;
pub mod edits;
pub mod route;
pub mod startup;
pub mod state;
pub mod style;
pub mod views;

pub use route::Route;
pub use startup::{prepare_store, Root, RootProps};
pub use state::{use_app, AppState};

use dioxus::prelude::*;

/// The whole app: the shared state is provided by the caller (see `Root`).
#[component]
pub fn App() -> Element {
    let app = use_app();
    use_context_provider(components::TapeState::new);
    let screen = app
        .store
        .borrow()
        .settings()
        .map(|s| s.screen)
        .unwrap_or_default();
    rsx! {
        style { {style::CSS} }
        div { class: "app screen-{screen.key()}",
            Router::<Route> {}
        }
    }
}
