//! Hands a built report to the platform's share sheet (mail, messages, a cloud drive) where
//! the screen's renderer offers one (a phone's browser: the Web Share API with files). Where
//! it does not, the screen says so and the PDF is opened or found at its path instead.

use base64::Engine;
use dioxus::prelude::*;
use std::path::PathBuf;

/// Asks the page whether it can share a PDF file.
const CAN_SHARE: &str = r#"
const probe = new File([new Uint8Array([37, 80, 68, 70])], "probe.pdf", { type: "application/pdf" });
dioxus.send(!!(navigator.share && navigator.canShare && navigator.canShare({ files: [probe] })));
"#;

/// Receives the PDF as base64 with its name, and shares it; says how it went.
const SHARE: &str = r#"
const { name, data } = await dioxus.recv();
const text = atob(data);
const bytes = new Uint8Array(text.length);
for (let i = 0; i < text.length; i++) bytes[i] = text.charCodeAt(i);
const file = new File([bytes], name, { type: "application/pdf" });
try {
  await navigator.share({ files: [file], title: name });
  dioxus.send("Handed to the share sheet: " + name);
} catch (e) {
  dioxus.send(e && e.name === "AbortError" ? "Not shared: the share sheet was closed." : "Not shared: " + (e && e.message ? e.message : e));
}
"#;

#[component]
pub fn SharePdf(path: PathBuf) -> Element {
    let mut can_share = use_signal(|| None::<bool>);
    let mut said = use_signal(|| None::<String>);
    use_effect(move || {
        let mut probe = document::eval(CAN_SHARE);
        spawn(async move {
            let answer = probe.recv::<bool>().await.unwrap_or(false);
            can_share.set(Some(answer));
        });
    });
    let share = {
        let path = path.clone();
        move |_| {
            let name = path
                .file_name()
                .and_then(|n| n.to_str())
                .unwrap_or("report.pdf")
                .to_string();
            let bytes = match std::fs::read(&path) {
                Ok(b) => b,
                Err(e) => {
                    return said.set(Some(format!("Not shared: the PDF cannot be read ({e})")))
                }
            };
            let data = base64::engine::general_purpose::STANDARD.encode(bytes);
            let mut eval = document::eval(SHARE);
            spawn(async move {
                let sent = eval.send(serde_json::json!({ "name": name, "data": data }));
                let answer = match sent {
                    Ok(()) => eval
                        .recv::<String>()
                        .await
                        .unwrap_or_else(|e| format!("Not shared: {e}")),
                    Err(e) => format!("Not shared: {e}"),
                };
                said.set(Some(answer));
            });
        }
    };
    rsx! {
        match can_share() {
            Some(true) => rsx! {
                button { id: "share-report", onclick: share, "Share the PDF" }
            },
            Some(false) => rsx! {
                p { class: "muted", id: "no-share-sheet", "This screen offers no share sheet: open the PDF and send it from there." }
            },
            None => rsx! {},
        }
        if let Some(line) = said() {
            p { id: "share-outcome", role: "status", "{line}" }
        }
    }
}
