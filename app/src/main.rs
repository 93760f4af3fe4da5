//! The desktop launcher (a phone-sized window, for development and office review): opens the
//! store in the platform's data folder, puts the demo inspection in it the first time, and
//! starts the app. The webview's own data goes to the same folder.

use dioxus::desktop::{Config, LogicalSize, WindowBuilder};
use undercroft_app::startup::{prepare_store, root_from_context, StorePath};
use undercroft_core::store::Store;

fn main() {
    let Some(db) = std::env::var_os("UNDERCROFT_DB")
        .map(std::path::PathBuf::from)
        .or_else(Store::default_path)
    else {
        eprintln!("undercroft-app: no data folder found for the store; set UNDERCROFT_DB");
        std::process::exit(2);
    };
    if let Err(e) = prepare_store(&db, true) {
        eprintln!("undercroft-app: {e}");
        std::process::exit(1);
    }
    let data_dir = db
        .parent()
        .map(std::path::Path::to_path_buf)
        .unwrap_or_default();
    let window = WindowBuilder::new()
        .with_title("Undercroft")
        .with_inner_size(LogicalSize::new(390.0, 844.0));
    let config = Config::new()
        .with_window(window)
        .with_data_directory(data_dir.join("webview"));
    dioxus::LaunchBuilder::desktop()
        .with_cfg(config)
        .with_context(StorePath(db.display().to_string()))
        .launch(root_from_context);
}
