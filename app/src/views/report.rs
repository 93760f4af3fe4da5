//! The report: build it with visible progress, then open it; earlier deliveries listed.

use crate::components::{SharePdf, TopBar};
use crate::{use_app, Route};
use dioxus::prelude::*;
use undercroft_engine::evaluate;
use undercroft_report::readiness::before_handover;
use undercroft_report::{build_report, pdf, Paper, PhotoFiles, ReportInput};
use undercroft_store::local_time;

/// Lets the screen draw the progress line before the next step runs.
async fn yield_now() {
    let mut yielded = false;
    std::future::poll_fn(move |cx| {
        if yielded {
            std::task::Poll::Ready(())
        } else {
            yielded = true;
            cx.waker().wake_by_ref();
            std::task::Poll::Pending
        }
    })
    .await
}

/// A file name from the address and date, letters and digits only.
fn file_name(address: &str, date: &str) -> String {
    let clean: String = address
        .chars()
        .map(|c| if c.is_alphanumeric() { c } else { '-' })
        .collect();
    let clean = clean
        .split('-')
        .filter(|p| !p.is_empty())
        .collect::<Vec<_>>()
        .join("-");
    format!(
        "{}-{date}.pdf",
        if clean.is_empty() {
            "report".into()
        } else {
            clean
        }
    )
}

#[component]
pub fn ReportView(id: String) -> Element {
    let app = use_app();
    let mut progress = use_signal(|| None::<String>);
    let mut built = use_signal(|| None::<std::path::PathBuf>);
    let mut paper = use_signal(|| "letter".to_string());
    let mut options = use_signal(|| false);
    let (inspection, deliveries) = {
        let store = app.store.borrow();
        (
            store.load_inspection(&id).ok(),
            store.reports(&id).unwrap_or_default(),
        )
    };
    let Some(inspection) = inspection else {
        return rsx! { main { p { "This inspection is not in the store." } } };
    };
    let client = inspection.client.clone();
    let mut recipient = use_signal(move || {
        if client.email.trim().is_empty() {
            client.name.clone()
        } else {
            format!("{} <{}>", client.name, client.email)
        }
    });
    // What to look at before handing the report over.
    let checklist = {
        let with_images: std::collections::HashSet<String> = app
            .store
            .borrow()
            .photos_of_inspection(&inspection.id)
            .unwrap_or_default()
            .into_iter()
            .filter(|p| p.report_path.is_some())
            .map(|p| p.id)
            .collect();
        let evaluation = app.evaluation(&inspection);
        before_handover(&inspection, &evaluation, &with_images)
    };
    let build = {
        let app = app.clone();
        let inspection = inspection.clone();
        move |_| {
            let app = app.clone();
            let inspection = inspection.clone();
            spawn(async move {
                progress.set(Some("Checking every member against its limits...".into()));
                yield_now().await;
                let (files, notes, dir) = {
                    let store = app.store.borrow();
                    let files: PhotoFiles = store
                        .photos_of_inspection(&inspection.id)
                        .unwrap_or_default()
                        .into_iter()
                        .filter_map(|p| p.report_path.map(|f| (p.id, f)))
                        .collect();
                    (
                        files,
                        store.finding_notes(&inspection.id).unwrap_or_default(),
                        store.report_dir(),
                    )
                };
                let evaluation = evaluate(&inspection);
                progress.set(Some(format!(
                    "Laying out {} findings and {} photos...",
                    evaluation.findings.len(),
                    files.len()
                )));
                yield_now().await;
                let paper = Paper::parse(&paper()).unwrap_or_default();
                let report = build_report(&ReportInput {
                    inspection: &inspection,
                    evaluation: &evaluation,
                    notes: &notes,
                    photo_files: &files,
                    paper,
                    repair_options: options(),
                });
                let bytes = pdf::render(&report);
                progress.set(Some("Saving the PDF...".into()));
                yield_now().await;
                let name = file_name(&inspection.property.address, &inspection.date);
                let path = dir.join(&name);
                let written =
                    std::fs::create_dir_all(&dir).and_then(|_| std::fs::write(&path, &bytes));
                match written {
                    Ok(()) => {
                        let findings =
                            serde_json::to_string(&evaluation.findings).unwrap_or_default();
                        match app.change(|s| {
                            s.record_report(&inspection.id, &name, &bytes, &findings, &recipient())
                        }) {
                            Ok(_) => {
                                let plural = |n: usize, one: &str, many: &str| {
                                    format!("{n} {}", if n == 1 { one } else { many })
                                };
                                progress.set(Some(format!(
                                    "Report ready: {} in {}, {:.1} MB",
                                    plural(evaluation.findings.len(), "finding", "findings"),
                                    plural(report.areas.len(), "area", "areas"),
                                    bytes.len() as f64 / 1e6
                                )));
                                built.set(Some(path));
                                crate::components::sync_if_linked(&app);
                            }
                            Err(e) => progress.set(Some(format!(
                                "The report was written but not recorded: {e}"
                            ))),
                        }
                    }
                    Err(e) => progress.set(Some(format!("The report could not be saved: {e}"))),
                }
            });
        }
    };
    rsx! {
        main {
            TopBar { title: "Report", Link { to: Route::InspectionView { id: id.clone() }, "‹ {inspection.property.address}" } }
            div { class: "card", id: "before-handover",
                h2 { "Before you hand it over" }
                if checklist.is_empty() {
                    p { "Nothing left to look at: name, licence, photos and entries are in order." }
                }
                ul {
                    for line in checklist.iter() {
                        li { "{line}" }
                    }
                }
            }
            label { r#for: "paper", "Paper" }
            select { id: "paper", onchange: move |e| paper.set(e.value()),
                option { value: "letter", selected: paper() == "letter", "Letter" }
                option { value: "a4", selected: paper() == "a4", "A4" }
            }
            div { class: "checks",
                label {
                    input { r#type: "checkbox", id: "repair-options", checked: options(),
                        onchange: move |e| options.set(e.checked()) }
                    " Include the computed repair options (for a contractor or engineer reader)"
                }
            }
            label { r#for: "recipient", "Goes to (kept with the delivery)" }
            input { id: "recipient", value: "{recipient}", oninput: move |e| recipient.set(e.value()) }
            p { button { id: "build-report", onclick: build, "Build the report" } }
            if let Some(line) = progress() {
                p { id: "report-progress", role: "status", "{line}" }
            }
            if let Some(path) = built() {
                p { id: "report-path", class: "muted", "{path.display()}" }
                button { class: "quiet", onclick: {
                    let path = path.clone();
                    move |_| { let _ = open_file(&path); }
                }, "Open the PDF" }
                SharePdf { path: path.clone() }
            }
            h2 { "Delivered" }
            if deliveries.is_empty() {
                p { class: "muted", "No report delivered yet." }
            }
            ul { class: "list",
                for d in deliveries {
                    li { key: "{d.id}", class: "delivery",
                        span { "{d.file_name}" }
                        br {}
                        span { class: "delivered-when", "{local_time(&d.delivered_at)}" }
                        if !d.recipient.is_empty() {
                            span { class: "delivered-to", ", to {d.recipient}" }
                        }
                        br {}
                        span { class: "muted", "{d.bytes} bytes, SHA-256 {short_hash(&d.sha256)}" }
                    }
                }
            }
        }
    }
}

/// The first 12 hex digits of a hash, enough to tell deliveries apart on screen.
fn short_hash(hash: &str) -> String {
    format!("{}...", hash.chars().take(12).collect::<String>())
}

/// Opens a file with the platform's viewer (share sheets on phones are for the mobile
/// build to add).
fn open_file(path: &std::path::Path) -> std::io::Result<()> {
    let program = if cfg!(target_os = "macos") {
        "open"
    } else {
        "xdg-open"
    };
    std::process::Command::new(program)
        .arg(path)
        .spawn()
        .map(|_| ())
}

#[cfg(test)]
mod tests {
    use super::file_name;

    #[test]
    fn report_file_names() {
        assert_eq!(
            file_name("2719 Quillback Road, Marrow Falls", "2026-11-30"),
            "2719-Quillback-Road-Marrow-Falls-2026-11-30.pdf"
        );
        assert_eq!(file_name("../../etc", "2026-11-30"), "etc-2026-11-30.pdf");
        assert_eq!(file_name("李 Street", "d"), "李-Street-d.pdf");
    }
}
