//! Starting the app: the store opened (with the demo inspection in it the first time, when
//! asked), and the root component that hands it to every screen.

use crate::{App, AppState};
use dioxus::prelude::*;
use std::path::Path;
use undercroft_store::{ListFilter, Store};

/// The invented demo inspection shipped with the app.
pub const DEMO_INSPECTION: &str = undercroft_engine::interchange::DEMO_JSON;

/// The demo's drawn photos, by the file name the inspection gives them.
const DEMO_PHOTOS: [(&str, &[u8]); 7] = [
    (
        "photos/house-front.jpg",
        include_bytes!("../../demo-data/photos/house-front.jpg"),
    ),
    (
        "photos/decay-at-joist-end.jpg",
        include_bytes!("../../demo-data/photos/decay-at-joist-end.jpg"),
    ),
    (
        "photos/notch-at-drain.jpg",
        include_bytes!("../../demo-data/photos/notch-at-drain.jpg"),
    ),
    (
        "photos/cut-i-joist-flange.jpg",
        include_bytes!("../../demo-data/photos/cut-i-joist-flange.jpg"),
    ),
    (
        "photos/joist-cut-for-duct.jpg",
        include_bytes!("../../demo-data/photos/joist-cut-for-duct.jpg"),
    ),
    (
        "photos/shimmed-post.jpg",
        include_bytes!("../../demo-data/photos/shimmed-post.jpg"),
    ),
    (
        "photos/torn-ground-cover.jpg",
        include_bytes!("../../demo-data/photos/torn-ground-cover.jpg"),
    ),
];

/// Opens (or creates) the store at `db`; when `with_demo` is set and the store holds no
/// inspection yet, puts the demo inspection in it.
pub fn prepare_store(db: &Path, with_demo: bool) -> Result<(), String> {
    let store =
        Store::open(db).map_err(|e| format!("cannot open the store at {}: {e}", db.display()))?;
    if with_demo && holds_nothing(&store)? {
        import_demo(store)?;
    }
    Ok(())
}

/// Whether the store holds no inspection at all (archived ones count).
fn holds_nothing(store: &Store) -> Result<bool, String> {
    let all = ListFilter {
        include_archived: true,
        ..Default::default()
    };
    Ok(store
        .list_inspections(&all)
        .map_err(|e| e.to_string())?
        .is_empty())
}

/// Whether the store at `db` (already prepared) is waiting for the demo.
pub fn wants_demo(db: &Path) -> Result<bool, String> {
    let store = Store::open(db).map_err(|e| e.to_string())?;
    holds_nothing(&store)
}

/// Puts the demo inspection, with its photos, in the store.
fn import_demo(mut store: Store) -> Result<(), String> {
    let demo = undercroft_engine::interchange::from_json(DEMO_INSPECTION)
        .map_err(|e| format!("the demo inspection does not read: {e}"))?;
    let images = demo
        .photos
        .iter()
        .filter_map(|p| {
            DEMO_PHOTOS
                .iter()
                .find(|(file, _)| *file == p.file)
                .map(|(_, bytes)| (p.id.clone(), bytes.to_vec()))
        })
        .collect();
    let (_, refused) = store
        .import_inspection_with_images(&demo, &images)
        .map_err(|e| format!("the demo inspection was not stored: {e}"))?;
    if let Some((id, e)) = refused.first() {
        return Err(format!("the demo photo {id} was not stored: {e}"));
    }
    Ok(())
}

/// Given to the root by a launcher that leaves the demo's import until the first screen is
/// up (a first launch of the desktop app): it is imported on its own thread, through its own
/// connection to the store, and the screens are refreshed when it is in.
#[derive(Clone, Debug)]
pub struct DemoLater(pub String);

/// Starts the demo's import, if asked, and refreshes the screens when it is done.
fn use_demo_later(state: Option<AppState>) -> Signal<Option<String>> {
    let mut failed = use_signal(|| None::<String>);
    let later = try_use_context::<DemoLater>();
    use_hook(move || {
        let (Some(DemoLater(db)), Some(state)) = (later, state) else {
            return;
        };
        // A channel a plain thread can send on and the screen's task can wait on.
        let (tx, mut rx) = futures_channel::mpsc::unbounded::<Result<(), String>>();
        std::thread::spawn(move || {
            let done = Store::open(Path::new(&db))
                .map_err(|e| e.to_string())
                .and_then(|store| match holds_nothing(&store)? {
                    true => import_demo(store),
                    false => Ok(()),
                });
            let _ = tx.unbounded_send(done);
        });
        spawn(async move {
            if let Ok(done) = rx.recv().await {
                if let Err(e) = done {
                    eprintln!("undercroft-app: {e}");
                    failed.set(Some(e));
                }
                let mut revision = state.revision;
                revision += 1;
            }
        });
    });
    failed
}

/// The app over the store at `db`. A store that cannot be opened is said on screen.
#[component]
pub fn Root(db: String) -> Element {
    let state = use_hook(|| {
        Store::open(Path::new(&db))
            .map(AppState::new)
            .map_err(|e| e.to_string())
    });
    let failed = use_demo_later(state.as_ref().ok().cloned());
    // Whatever was finished while the office was out of reach goes now, if it can.
    use_hook(|| {
        if let Ok(state) = &state {
            crate::components::sync_if_linked(state);
        }
    });
    match state {
        Ok(state) => {
            use_context_provider(|| state);
            rsx! {
                if let Some(e) = failed() {
                    p { class: "field-error", role: "alert", "The demo inspection could not be added: {e}" }
                }
                App {}
            }
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

#[cfg(test)]
mod tests {
    #[test]
    fn the_demo_comes_with_its_photos() {
        let dir = std::env::temp_dir().join(format!("undercroft-demo-{}", std::process::id()));
        std::fs::create_dir_all(&dir).unwrap();
        let db = dir.join("store.sqlite");
        super::prepare_store(&db, true).unwrap();
        let store = undercroft_store::Store::open(&db).unwrap();
        let demo = undercroft_engine::interchange::from_json(super::DEMO_INSPECTION).unwrap();
        let photos = store.photos_of_inspection(&demo.id).unwrap();
        assert_eq!(photos.len(), super::DEMO_PHOTOS.len());
        assert!(photos
            .iter()
            .all(|p| p.report_path.as_ref().is_some_and(|f| f.exists())));
        // Each photo keeps its owner and caption.
        assert!(photos
            .iter()
            .any(|p| p.attached_to == "obs-family-decay" && p.caption.starts_with("Decay")));
        std::fs::remove_dir_all(&dir).ok();
    }
}
