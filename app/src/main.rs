//! The desktop launcher (a phone-sized window, for development and office review): opens the
//! store in the platform's data folder, puts the demo inspection in it the first time, and
//! starts the app. The webview's own data goes to the same folder.

use dioxus::desktop::{Config, LogicalSize, WindowBuilder};
use dioxus::prelude::*;
use undercroft_app::{App, AppState};
use undercroft_core::store::{ListFilter, Store};

const DEMO: &str = include_str!("../../demo-data/demo-inspection.json");

/// The store's path, set once before launch (the launcher takes a plain function).
static DB: std::sync::OnceLock<std::path::PathBuf> = std::sync::OnceLock::new();

fn root() -> Element {
    let state = use_hook(|| {
        AppState::new(Store::open(DB.get().expect("set before launch")).expect("store opens"))
    });
    use_context_provider(|| state);
    rsx! { App {} }
}

fn main() {
    let db = std::env::var_os("UNDERCROFT_DB")
        .map(std::path::PathBuf::from)
        .or_else(Store::default_path)
        .expect("a data folder for the store (set UNDERCROFT_DB)");
    let data_dir = db
        .parent()
        .map(std::path::Path::to_path_buf)
        .unwrap_or_default();
    {
        let mut store = Store::open(&db)
            .unwrap_or_else(|e| panic!("cannot open the store at {}: {e}", db.display()));
        let empty = store
            .list_inspections(&ListFilter {
                include_archived: true,
                ..Default::default()
            })
            .map(|l| l.is_empty())
            .unwrap_or(false);
        if empty {
            let demo =
                undercroft_core::interchange::from_json(DEMO).expect("the demo inspection reads");
            store
                .import_inspection(&demo)
                .expect("the demo inspection is stored");
        }
    }
    let window = WindowBuilder::new()
        .with_title("Undercroft")
        .with_inner_size(LogicalSize::new(390.0, 844.0));
    let config = Config::new()
        .with_window(window)
        .with_data_directory(data_dir.join("webview"));
    DB.set(db).expect("set once");
    dioxus::LaunchBuilder::desktop()
        .with_cfg(config)
        .launch(root);
}
