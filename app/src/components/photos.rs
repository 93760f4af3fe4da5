//! Photos of an area, run, member or observation: thumbnails with captions, reorder, remove
//! (with an undo), and adding photos from the camera in one tap or from the library; a file
//! that could not be stored is said aloud.
//!
//! The bytes come through a plain `<input type="file">` read by a few lines of JavaScript
//! (`file.arrayBuffer()`, sent back as base64): the path that delivers the bytes on every
//! renderer tried (desktop webview, liveview, web), where the framework's own file events
//! gave names without bytes.

use super::MarkEditor;
use crate::use_app;
use base64::Engine;
use dioxus::prelude::*;
use undercroft_store::RemovedPhoto;

/// The script that reads picked files and sends each back as `{name, size, data}`. Files
/// picked before the script ran (the screen is drawn before its listener is wired, most of
/// all right after a save redraws it) are sent when it runs, not lost.
fn reader_script(input_id: &str) -> String {
    format!(
        r#"
const input = document.getElementById("{input_id}");
if (input && !input.dataset.ready) {{
  input.dataset.ready = "1";
  input.addEventListener("click", e => e.stopPropagation(), true);
  const send = async () => {{
    const files = Array.from(input.files);
    input.value = "";
    for (const file of files) {{
      const bytes = new Uint8Array(await file.arrayBuffer());
      let text = "";
      for (let i = 0; i < bytes.length; i += 0x8000) text += String.fromCharCode.apply(null, bytes.subarray(i, i + 0x8000));
      dioxus.send({{ name: file.name, size: file.size, data: btoa(text) }});
    }}
  }};
  input.addEventListener("change", send);
  if (input.files && input.files.length > 0) send();
}}
"#
    )
}

/// What became of a picked file: its message, and whether it was stored.
#[derive(Debug, Clone, PartialEq)]
pub struct PhotoOutcome {
    pub message: String,
    pub stored: bool,
}

/// The two ways to add photos to `owner`: the camera in one tap on a phone (a file picker on
/// a desktop), or several from the library. Each file's outcome is told to `on_outcome`.
#[component]
pub fn PhotoPicker(
    owner: String,
    /// Told apart from other pickers of the same owner on one screen (two findings of one
    /// member), so each input has its own id.
    #[props(default)]
    tag: String,
    on_outcome: EventHandler<PhotoOutcome>,
) -> Element {
    let app = use_app();
    let camera_id = format!("photo-camera-{owner}{tag}");
    let library_id = format!("photo-input-{owner}{tag}");
    for input_id in [camera_id.clone(), library_id.clone()] {
        let script = reader_script(&input_id);
        let app = app.clone();
        let owner = owner.clone();
        use_effect(move || {
            let app = app.clone();
            let owner = owner.clone();
            let mut eval = document::eval(&script);
            spawn(async move {
                while let Ok(picked) = eval.recv::<serde_json::Value>().await {
                    on_outcome.call(store_picked(&app, &owner, &picked));
                }
            });
        });
    }
    rsx! {
        div { class: "photo-picker",
            label { r#for: "{camera_id}", class: "button", "Take a photo" }
            input { id: "{camera_id}", r#type: "file", accept: "image/*", capture: "environment", class: "offscreen" }
            label { r#for: "{library_id}", class: "button quiet", "Pick photos" }
            input { id: "{library_id}", r#type: "file", accept: "image/*", multiple: true, class: "offscreen" }
        }
    }
}

/// Stores one file sent by the reader script; says what became of it, by name.
fn store_picked(app: &crate::AppState, owner: &str, picked: &serde_json::Value) -> PhotoOutcome {
    let name = picked
        .get("name")
        .and_then(|v| v.as_str())
        .unwrap_or("photo")
        .to_string();
    let data = picked
        .get("data")
        .and_then(|v| v.as_str())
        .unwrap_or_default();
    let result = base64::engine::general_purpose::STANDARD
        .decode(data)
        .map_err(|e| e.to_string())
        .and_then(|bytes| app.change(|s| s.add_photo(owner, &bytes, "")));
    match result {
        Ok(_) => PhotoOutcome {
            message: format!("{name} added"),
            stored: true,
        },
        Err(e) => PhotoOutcome {
            message: format!("{name} was not added: {e}"),
            stored: false,
        },
    }
}

/// A picked file's outcome, in words: a refusal is an alert, never a silent loss.
#[component]
pub fn PhotoMessage(outcome: Option<PhotoOutcome>) -> Element {
    rsx! {
        if let Some(o) = outcome {
            if o.stored {
                p { role: "status", "{o.message}" }
            } else {
                p { class: "field-error", role: "alert", "{o.message}" }
            }
        }
    }
}

#[component]
pub fn Photos(owner: String) -> Element {
    let app = use_app();
    let mut outcome = use_signal(|| None::<PhotoOutcome>);
    let mut removed = use_signal(|| None::<RemovedPhoto>);
    let photos = app.store.borrow().photos_of(&owner).unwrap_or_default();
    let thumbs: Vec<(String, String, String)> = photos
        .iter()
        .map(|p| {
            let data = p
                .thumb_path
                .as_ref()
                .and_then(|t| std::fs::read(t).ok())
                .map(|b| base64::engine::general_purpose::STANDARD.encode(b))
                .unwrap_or_default();
            (p.id.clone(), p.caption.clone(), data)
        })
        .collect();
    let count = thumbs.len();
    let undo = {
        let app = app.clone();
        move |_| {
            let Some(photo) = removed() else { return };
            match app.change(|s| s.restore_photo(&photo)) {
                Ok(_) => {
                    removed.set(None);
                    outcome.set(Some(PhotoOutcome {
                        message: "Photo put back".into(),
                        stored: true,
                    }));
                }
                Err(e) => outcome.set(Some(PhotoOutcome {
                    message: format!("The photo could not be put back: {e}"),
                    stored: false,
                })),
            }
        }
    };
    rsx! {
        div { class: "photos",
            h2 { "Photos" }
            for (n, (id, caption, data)) in thumbs.into_iter().enumerate() {
                PhotoRow { key: "{id}", id, caption, data, index: n, count,
                    on_removed: move |photo: RemovedPhoto| {
                        outcome.set(None);
                        removed.set(Some(photo));
                    }
                }
            }
            if let Some(photo) = removed() {
                div { class: "undo-bar", role: "status",
                    span { if photo.caption.is_empty() { "Photo removed." } else { "Photo \"{photo.caption}\" removed." } }
                    button { id: "undo-remove", onclick: undo, "Undo" }
                }
            }
            PhotoPicker { owner: owner.clone(), on_outcome: move |o| outcome.set(Some(o)) }
            PhotoMessage { outcome: outcome() }
        }
    }
}

#[component]
fn PhotoRow(
    id: String,
    caption: String,
    data: String,
    index: usize,
    count: usize,
    on_removed: EventHandler<RemovedPhoto>,
) -> Element {
    let app = use_app();
    let (up_id, down_id, remove_id, caption_id) = (id.clone(), id.clone(), id.clone(), id.clone());
    let (up_app, down_app, remove_app) = (app.clone(), app.clone(), app.clone());
    let mut problem = use_signal(|| None::<String>);
    let mut marking = use_signal(|| false);
    let marks_id = id.clone();
    rsx! {
        div { class: "card photo",
            if marking() {
                MarkEditor { photo_id: marks_id, image: data.clone() }
            } else if !data.is_empty() {
                img { src: "data:image/jpeg;base64,{data}", alt: "{caption}", style: "max-width:100%" }
            }
            button { class: "quiet mark-toggle", onclick: move |_| marking.toggle(), if marking() { "Done marking" } else { "Mark it: arrow, circle, dimension" } }
            input { value: "{caption}", placeholder: "Caption", oninput: move |e| { let _ = app.change(|s| s.set_photo_caption(&caption_id, &e.value())); } }
            button { class: "quiet", disabled: index == 0, onclick: move |_| { let _ = up_app.change(|s| s.move_to(&up_id, index.saturating_sub(1))); }, "Earlier" }
            button { class: "quiet", disabled: index + 1 == count, onclick: move |_| { let _ = down_app.change(|s| s.move_to(&down_id, index + 1)); }, "Later" }
            button { class: "quiet remove-photo", onclick: move |_| match remove_app.change(|s| s.remove_photo(&remove_id)) {
                Ok(photo) => on_removed.call(photo),
                Err(e) => problem.set(Some(e)),
            }, "Remove" }
            if let Some(e) = problem() {
                p { class: "field-error", role: "alert", "Not removed: {e}" }
            }
        }
    }
}
