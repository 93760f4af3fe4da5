//! Photos of an area, run, member or observation: thumbnails with captions, reorder, remove,
//! and adding photos from the camera or the library.
//!
//! The bytes come through a plain `<input type="file">` read by a few lines of JavaScript
//! (`file.arrayBuffer()`, sent back as base64): the path that delivers the bytes on every
//! renderer tried (desktop webview, liveview, web), where the framework's own file events
//! gave names without bytes.

use crate::use_app;
use base64::Engine;
use dioxus::prelude::*;

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

#[component]
pub fn Photos(owner: String) -> Element {
    let app = use_app();
    let mut message = use_signal(|| None::<String>);
    let input_id = format!("photo-input-{owner}");
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
    let script = reader_script(&input_id);
    let listener_app = app.clone();
    let listener_owner = owner.clone();
    use_effect(move || {
        let app = listener_app.clone();
        let owner = listener_owner.clone();
        let mut eval = document::eval(&script);
        spawn(async move {
            while let Ok(picked) = eval.recv::<serde_json::Value>().await {
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
                    .and_then(|bytes| app.change(|s| s.add_photo(&owner, &bytes, "")));
                message.set(Some(match result {
                    Ok(_) => format!("{name} added"),
                    Err(e) => format!("{name} was not added: {e}"),
                }));
            }
        });
    });
    let count = thumbs.len();
    rsx! {
        div { class: "photos",
            h2 { "Photos" }
            for (n, (id, caption, data)) in thumbs.into_iter().enumerate() {
                PhotoRow { key: "{id}", id, caption, data, index: n, count }
            }
            label { r#for: "{input_id}", class: "button", style: "display:inline-block", "Take or pick photos" }
            input { id: "{input_id}", r#type: "file", accept: "image/*", multiple: true, style: "position:absolute;left:-9999px" }
            if let Some(m) = message() {
                p { role: "status", "{m}" }
            }
        }
    }
}

#[component]
fn PhotoRow(id: String, caption: String, data: String, index: usize, count: usize) -> Element {
    let app = use_app();
    let (up_id, down_id, remove_id, caption_id) = (id.clone(), id.clone(), id.clone(), id.clone());
    let (up_app, down_app, remove_app) = (app.clone(), app.clone(), app.clone());
    rsx! {
        div { class: "card photo",
            if !data.is_empty() {
                img { src: "data:image/jpeg;base64,{data}", alt: "{caption}", style: "max-width:100%" }
            }
            input { value: "{caption}", placeholder: "Caption", oninput: move |e| { let _ = app.change(|s| s.set_photo_caption(&caption_id, &e.value())); } }
            button { class: "quiet", disabled: index == 0, onclick: move |_| { let _ = up_app.change(|s| s.move_to(&up_id, index.saturating_sub(1))); }, "Earlier" }
            button { class: "quiet", disabled: index + 1 == count, onclick: move |_| { let _ = down_app.change(|s| s.move_to(&down_id, index + 1)); }, "Later" }
            button { class: "quiet", onclick: move |_| { let _ = remove_app.change(|s| s.remove(&remove_id)); }, "Remove" }
        }
    }
}
