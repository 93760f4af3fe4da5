//! The office on the settings screen: the office's address and the token it issued, kept as
//! typed; a button that sends the finished inspections (those with a delivered report) and
//! takes the firm's settings, run on its own thread and connection so the screens stay live;
//! what it did, or why it could not, in words. The same send runs by itself after a report
//! is delivered and when the app starts, whenever the office is set.

use crate::use_app;
use dioxus::prelude::*;
use undercroft_engine::words::count;
use undercroft_store::{OfficeLink, Store};
use undercroft_sync::Office;

/// Sends and takes on a plain thread with its own connection to the store, and keeps how it
/// went in the store.
fn sync_in_background(
    db: std::path::PathBuf,
) -> futures_channel::mpsc::UnboundedReceiver<Result<String, String>> {
    let (tx, rx) = futures_channel::mpsc::unbounded();
    std::thread::spawn(move || {
        let outcome = Store::open(&db)
            .map_err(|e| e.to_string())
            .and_then(|mut store| {
                let link = store.office_link().map_err(|e| e.to_string())?;
                let sent = Office::new(&link.url, &link.token)
                    .and_then(|office| office.sync(&mut store))
                    .map(|summary| {
                        let mut text = summary.text();
                        for (id, why) in &summary.refused {
                            text.push_str(&format!(". Refused {id}: {why}"));
                        }
                        text
                    })
                    .map_err(|e| e.to_string());
                let (ok, text) = match &sent {
                    Ok(t) => (true, t.as_str()),
                    Err(e) => (false, e.as_str()),
                };
                store
                    .record_sync_outcome(ok, text)
                    .map_err(|e| e.to_string())?;
                sent
            });
        let _ = tx.unbounded_send(outcome);
    });
    rx
}

/// Sends to the office in the background when the store knows one (after a delivery, at
/// start); the outcome is kept in the store and the screens refresh when it is done.
pub fn sync_if_linked(app: &crate::AppState) {
    let (linked, db) = {
        let store = app.store.borrow();
        let link = store.office_link().unwrap_or_default();
        (
            !link.url.is_empty() && !link.token.is_empty(),
            store.db_path(),
        )
    };
    let (true, Some(db)) = (linked, db) else {
        return;
    };
    let mut rx = sync_in_background(db);
    let mut revision = app.revision;
    spawn(async move {
        let _ = rx.recv().await;
        revision += 1;
    });
}

#[component]
pub fn OfficeSync() -> Element {
    let app = use_app();
    let mut link = use_signal(|| app.store.borrow().office_link().unwrap_or_default());
    let mut outcome = use_signal(|| None::<Result<String, String>>);
    let mut busy = use_signal(|| false);
    let save = {
        let app = app.clone();
        use_callback(move |edit: (&'static str, String)| {
            link.with_mut(|l: &mut OfficeLink| match edit.0 {
                "url" => l.url = edit.1.trim().to_string(),
                _ => l.token = edit.1.trim().to_string(),
            });
            let current = link();
            if let Err(e) = app.change(|s| s.save_office_link(&current)) {
                outcome.set(Some(Err(e)));
            }
        })
    };
    let firm = app.store.borrow().firm_settings().ok().flatten();
    let last = app.store.borrow().last_sync_outcome().ok().flatten();
    let finished = app
        .store
        .borrow()
        .finished_inspections()
        .map(|f| f.len())
        .unwrap_or(0);
    let start = {
        let app = app.clone();
        move |_| {
            let Some(db) = app.store.borrow().db_path() else {
                outcome.set(Some(Err(
                    "this store has no file to share with the sync".into()
                )));
                return;
            };
            busy.set(true);
            outcome.set(None);
            let mut rx = sync_in_background(db);
            let mut revision = app.revision;
            spawn(async move {
                let done = rx
                    .recv()
                    .await
                    .unwrap_or_else(|_| Err("the sync stopped without saying why".into()));
                busy.set(false);
                outcome.set(Some(done));
                revision += 1;
            });
        }
    };
    let l = link();
    rsx! {
        section { id: "office",
            h2 { "The firm's office" }
            p { class: "hint",
                "Finished inspections (with a delivered report) are sent when you tap the button; everything stays on this device too. Use the https:// address the office gives you."
            }
            label { r#for: "office-url", "Office address" }
            input { id: "office-url", r#type: "url", inputmode: "url", placeholder: "https://office.example.com",
                value: "{l.url}", oninput: move |e| save.call(("url", e.value())) }
            label { r#for: "office-token", "Token from the office" }
            input { id: "office-token", r#type: "password", autocomplete: "off",
                value: "{l.token}", oninput: move |e| save.call(("token", e.value())) }
            button { id: "office-sync", disabled: busy() || l.url.is_empty(), onclick: start,
                if busy() { "Sending…" } else { "Send {finished} finished to the office" }
            }
            match outcome() {
                Some(Ok(text)) => rsx! { p { id: "office-outcome", role: "status", "{text}" } },
                Some(Err(why)) => rsx! { p { id: "office-outcome", class: "field-error", role: "alert", "{why}" } },
                None => match last {
                    Some(last) => rsx! {
                        p { id: "office-last", class: if last.ok { "hint" } else { "field-error" },
                            "Last sent {undercroft_store::local_time(&last.at)}: {last.text}"
                        }
                    },
                    None => rsx! {},
                },
            }
            if let Some(firm) = firm {
                p { id: "firm-settings", class: "hint",
                    "From the office: {firm.company}"
                    if !firm.code_edition.is_empty() { ", {firm.code_edition}" }
                    ", {count(firm.counties.len(), \"county\", \"counties\")}, {count(firm.licenses.len(), \"licence\", \"licences\")}. New inspections take them."
                }
            }
        }
    }
}
