//! Starting the app: the store opened (with the demo inspection in it the first time, when
//! asked), and the root component that hands it to every screen.

use crate::{App, AppState};
use dioxus::prelude::*;
use std::path::Path;
use undercroft_core::store::{ListFilter, Store};

/// The invented demo inspection shipped with the app.
pub const DEMO_INSPECTION: &str = include_str!("../../demo-data/demo-inspection.json");

/// Opens (or creates) the store at `db`; when `with_demo` is set and the store holds no
/// inspection yet, puts the demo inspection in it.
pub fn prepare_store(db: &Path, with_demo: bool) -> Result<(), String> {
    let mut store =
        Store::open(db).map_err(|e| format!("cannot open the store at {}: {e}", db.display()))?;
    if !with_demo {
        return Ok(());
    }
    let all = ListFilter {
        include_archived: true,
        ..Default::default()
    };
    let empty = store
        .list_inspections(&all)
        .map_err(|e| e.to_string())?
        .is_empty();
    if empty {
        let demo = undercroft_core::interchange::from_json(DEMO_INSPECTION)
            .map_err(|e| format!("the demo inspection does not read: {e}"))?;
        store
            .import_inspection(&demo)
            .map_err(|e| format!("the demo inspection was not stored: {e}"))?;
    }
    Ok(())
}

/// The app over the store at `db`. A store that cannot be opened is said on screen.
#[component]
pub fn Root(db: String) -> Element {
    let state = use_hook(|| {
        Store::open(Path::new(&db))
            .map(AppState::new)
            .map_err(|e| e.to_string())
    });
    match state {
        Ok(state) => {
            use_context_provider(|| state);
            rsx! { App {} }
        }
        Err(e) => rsx! {
            main {
                h1 { "The store could not be opened" }
                p { "{db}" }
                p { class: "field-error", "{e}" }
            }
        },
    }
}

/// The store's path, given to a launcher's context (launchers take a plain function).
#[derive(Clone, Debug)]
pub struct StorePath(pub String);

/// The root for launchers that pass the store's path as context.
pub fn root_from_context() -> Element {
    let db = use_context::<StorePath>().0;
    rsx! { Root { db } }
}
