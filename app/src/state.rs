//! The app's shared state: the open store, handed to every screen through context.

use crate::edits::{save_framing_field, FieldCheck, FramingEdit, FramingOwner};
use dioxus::prelude::*;
use std::cell::RefCell;
use std::rc::Rc;
use undercroft_engine::forms::{FieldError, FramingForm};
use undercroft_engine::model::{Framing, Inspection};
use undercroft_engine::units::UnitSystem;
use undercroft_engine::{evaluate, Evaluation};
use undercroft_store::Store;

/// An evaluation and what it was made of: (revision, inspection id, findings).
type Evaluated = (u64, String, Rc<Evaluation>);

/// What every screen can reach. Cheap to clone (shared handles).
#[derive(Clone)]
pub struct AppState {
    pub store: Rc<RefCell<Store>>,
    /// Bumped after every change, so screens that read the store render again.
    pub revision: Signal<u64>,
    /// The last evaluation: (revision, inspection id, findings), computed once per change.
    evaluated: Rc<RefCell<Option<Evaluated>>>,
}

impl AppState {
    pub fn new(store: Store) -> AppState {
        AppState {
            store: Rc::new(RefCell::new(store)),
            revision: Signal::new(0),
            evaluated: Rc::default(),
        }
    }

    /// The findings of `inspection` as stored now: evaluated once per change, shared by the
    /// screens that show it.
    pub fn evaluation(&self, inspection: &Inspection) -> Rc<Evaluation> {
        let revision = *self.revision.peek();
        let mut cached = self.evaluated.borrow_mut();
        if let Some((at, id, evaluation)) = cached.as_ref() {
            if *at == revision && *id == inspection.id {
                return evaluation.clone();
            }
        }
        let evaluation = Rc::new(evaluate(inspection));
        *cached = Some((revision, inspection.id.clone(), evaluation.clone()));
        evaluation
    }

    /// The stored inspection that holds the area, run, joist, member or observation `id`.
    pub fn inspection_holding(&self, id: &str) -> Option<Inspection> {
        let store = self.store.borrow();
        store
            .inspection_of(id)
            .and_then(|i| store.load_inspection(&i))
            .ok()
    }

    /// A framing field change on a run, joist or member, saved at once: the problems to show
    /// beside the fields (a failed save is one of them, under "save").
    pub fn save_framing(
        &self,
        owner: FramingOwner,
        form: &mut FramingForm,
        stored: &Framing,
        units: UnitSystem,
        edit: FramingEdit,
    ) -> FieldCheck {
        self.change(|s| save_framing_field(s, owner, form, stored, units, edit))
            .unwrap_or_else(|message| FieldCheck {
                errors: vec![FieldError {
                    field: "save",
                    message,
                }],
                question: None,
            })
    }

    /// A field change through one of `edits`' functions, which says the field's problem (or
    /// the store's, under "save") itself; the screens are refreshed as for any change.
    pub fn change_field(
        &self,
        edit: impl FnOnce(&mut Store) -> Result<(), FieldError>,
    ) -> Result<(), FieldError> {
        let mut outcome = Ok(());
        let _ = self.change(|s| {
            outcome = edit(s);
            Ok(())
        });
        outcome
    }

    /// Runs a change against the store (saved when it returns) and refreshes the screens.
    pub fn change<T>(
        &self,
        edit: impl FnOnce(&mut Store) -> undercroft_store::Result<T>,
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
