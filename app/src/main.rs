//! The desktop launcher (a phone-sized window, for development and office review): opens the
//! store in the platform's data folder, puts the demo inspection in it the first time, and
//! starts the app. The webview's own data goes to the same folder.
//!
//! With `UNDERCROFT_STARTUP_PROBE=print` (or `=exit`) it writes to stderr, once the first
//! screen has been painted, how long that took from the start of `main` and the screen's
//! heading (and then exits): the desktop smoke test and the cold-start measurement use it.

use dioxus::desktop::{Config, LogicalSize, WindowBuilder};
use dioxus::prelude::*;
use std::time::Instant;
use undercroft_app::startup::{prepare_store, root_from_context, wants_demo, DemoLater, StorePath};
use undercroft_store::Store;

static STARTED: std::sync::OnceLock<Instant> = std::sync::OnceLock::new();

/// Waits two animation frames after the first render (the frame with the screen in it has
/// been painted), then reports.
const PAINTED: &str = "requestAnimationFrame(() => requestAnimationFrame(() => { const h = document.querySelector('h1'); dioxus.send(h ? h.textContent : ''); }));";

/// The app, reporting its first painted screen when asked to.
fn desktop_root() -> Element {
    use_effect(|| {
        let Ok(mode) = std::env::var("UNDERCROFT_STARTUP_PROBE") else {
            return;
        };
        spawn(async move {
            let mut painted = document::eval(PAINTED);
            if let Ok(heading) = painted.recv::<String>().await {
                let ms = STARTED
                    .get()
                    .map_or(0.0, |t| t.elapsed().as_secs_f64() * 1000.0);
                // The wall clock too, so a launcher can count from before the process began.
                let unix_ms = std::time::SystemTime::now()
                    .duration_since(std::time::UNIX_EPOCH)
                    .map_or(0, |d| d.as_millis());
                eprintln!(
                    "first screen \"{heading}\" painted {ms:.1} ms after start (unix ms {unix_ms})"
                );
                if mode == "exit" {
                    std::process::exit(0);
                }
            }
        });
    });
    root_from_context()
}

fn main() {
    STARTED.get_or_init(Instant::now);
    let Some(db) = std::env::var_os("UNDERCROFT_DB")
        .map(std::path::PathBuf::from)
        .or_else(Store::default_path)
    else {
        eprintln!("undercroft-app: no data folder found for the store; set UNDERCROFT_DB");
        std::process::exit(2);
    };
    // The store is opened (and migrated) before the window; the demo of a first launch is
    // imported after the first screen is up, on its own thread.
    if let Err(e) = prepare_store(&db, false) {
        eprintln!("undercroft-app: {e}");
        std::process::exit(1);
    }
    let demo_later = wants_demo(&db).unwrap_or(false);
    let data_dir = db
        .parent()
        .map(std::path::Path::to_path_buf)
        .unwrap_or_default();
    let webview_dir = data_dir.join("webview");
    // WebKitGTK keeps some of its own data (HSTS, caches) in the user's XDG folders whatever
    // the data directory says: point those at the app's folder too. Set before any thread
    // starts; the store's path was resolved above.
    #[cfg(target_os = "linux")]
    {
        std::env::set_var("XDG_DATA_HOME", webview_dir.join("data"));
        std::env::set_var("XDG_CACHE_HOME", webview_dir.join("cache"));
        // The screens are plain forms: WebKit's GPU compositing buys nothing here and, on a
        // first launch, compiling its shaders doubled the time to the first screen (1.0 s
        // against 0.5 s, measured under Xvfb). An explicit setting is left alone.
        if std::env::var_os("WEBKIT_DISABLE_COMPOSITING_MODE").is_none() {
            std::env::set_var("WEBKIT_DISABLE_COMPOSITING_MODE", "1");
        }
    }
    let window = WindowBuilder::new()
        .with_title("Undercroft")
        .with_inner_size(LogicalSize::new(390.0, 844.0));
    let config = Config::new()
        .with_window(window)
        .with_menu(None)
        .with_data_directory(&webview_dir);
    let mut launch = dioxus::LaunchBuilder::desktop()
        .with_cfg(config)
        .with_context(StorePath(db.display().to_string()));
    if demo_later {
        launch = launch.with_context(DemoLater(db.display().to_string()));
    }
    launch.launch(desktop_root);
}
