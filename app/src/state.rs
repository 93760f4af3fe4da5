//! The app's shared state: the open store, handed to every screen through context.

use dioxus::prelude::*;
use std::cell::RefCell;
use std::rc::Rc;
use undercroft_core::store::Store;

/// What every screen can reach. Cheap to clone (shared handles).
#[derive(Clone)]
pub struct AppState {
    pub store: Rc<RefCell<Store>>,
    /// Bumped after every change, so screens that read the store render again.
    pub revision: Signal<u64>,
}

impl AppState {
    pub fn new(store: Store) -> AppState {
        AppState {
            store: Rc::new(RefCell::new(store)),
            revision: Signal::new(0),
        }
    }

    /// Runs a change against the store (saved when it returns) and refreshes the screens.
    pub fn change<T>(
        &self,
        edit: impl FnOnce(&mut Store) -> undercroft_core::store::Result<T>,
    ) -> Result<T, String> {
        let result = edit(&mut self.store.borrow_mut()).map_err(|e| e.to_string());
        let mut revision = self.revision;
        revision += 1;
        result
    }
}

/// The app state provided by the root.
pub fn use_app() -> AppState {
    let app = use_context::<AppState>();
    // Reading the revision subscribes the calling screen to changes.
    let _ = (app.revision)();
    app
}
