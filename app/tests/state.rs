//! The app state's evaluation: computed once per change and shared, recomputed after a change.

use dioxus::prelude::*;
use std::cell::RefCell;
use std::rc::Rc;
use undercroft_app::AppState;
use undercroft_store::Store;

const DEMO: &str = "0193a1c2-7d00-7000-8000-00000000d001";

thread_local! {
    static SEEN: RefCell<Vec<String>> = const { RefCell::new(Vec::new()) };
}

#[allow(non_snake_case)]
fn Probe() -> Element {
    let dir = std::env::temp_dir().join(format!("undercroft-app-state-{}", std::process::id()));
    let _ = std::fs::remove_dir_all(&dir);
    let mut store = Store::open(&dir.join("store.sqlite")).unwrap();
    let demo = undercroft_engine::interchange::from_json(undercroft_app::startup::DEMO_INSPECTION)
        .unwrap();
    store.import_inspection(&demo).unwrap();
    let app = AppState::new(store);
    let inspection = app.store.borrow().load_inspection(DEMO).unwrap();
    let first = app.evaluation(&inspection);
    let again = app.evaluation(&inspection);
    let mut seen = vec![format!("shared {}", Rc::ptr_eq(&first, &again))];
    // The kitchen joists shortened well within their allowable span: one finding fewer over.
    let mut framing = inspection.run("run-kitchen").unwrap().1.framing.clone();
    framing.clear_span = Some(undercroft_engine::units::Length::inches(120.0));
    app.change(|s| s.update_run("run-kitchen", "Kitchen", &framing))
        .unwrap();
    let changed = app.store.borrow().load_inspection(DEMO).unwrap();
    let after = app.evaluation(&changed);
    seen.push(format!("recomputed {}", !Rc::ptr_eq(&first, &after)));
    let over = |e: &undercroft_engine::Evaluation| e.count(undercroft_engine::Status::OverLimit);
    seen.push(format!("fewer over {}", over(&after) < over(&first)));
    SEEN.with(|s| *s.borrow_mut() = seen);
    std::fs::remove_dir_all(&dir).ok();
    rsx! {}
}

#[test]
fn evaluation_is_shared_until_a_change() {
    let mut dom = VirtualDom::new(Probe);
    dom.rebuild_in_place();
    let seen = SEEN.with(|s| s.borrow().clone());
    assert_eq!(seen, ["shared true", "recomputed true", "fewer over true"]);
}
