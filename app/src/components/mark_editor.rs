//! Marks drawn on a photo with two taps each: an arrow (its tail, then what it shows), a
//! circle (its centre, then its edge), a measured dimension (one end, the other, and what it
//! measures). Saved as a layer beside the photo; the photo itself is never changed.

use crate::use_app;
use dioxus::prelude::*;
use undercroft_engine::model::{PhotoMark, Spot};

#[derive(Clone, Copy, PartialEq)]
enum Tool {
    Arrow,
    Circle,
    Dimension,
}

impl Tool {
    fn first_tap(self) -> &'static str {
        match self {
            Tool::Arrow => "Tap where the arrow starts, then what it points at.",
            Tool::Circle => "Tap the centre of the circle, then its edge.",
            Tool::Dimension => "Type what it measures, then tap one end and the other.",
        }
    }
}

/// The mark two taps make with a tool.
fn mark_of(tool: Tool, a: Spot, b: Spot, aspect: f64, label: &str) -> PhotoMark {
    match tool {
        Tool::Arrow => PhotoMark::Arrow { from: a, to: b },
        Tool::Circle => {
            // The radius as a fraction of the width, the height scaled by the photo's shape.
            let (dx, dy) = (b[0] - a[0], (b[1] - a[1]) * aspect);
            PhotoMark::Circle {
                centre: a,
                radius: (dx * dx + dy * dy).sqrt().clamp(0.01, 1.0),
            }
        }
        Tool::Dimension => PhotoMark::Dimension {
            from: a,
            to: b,
            label: label.trim().to_string(),
        },
    }
}

/// Sends each tap on the surface as [x, y, height / width], x and y as fractions of its size;
/// marks the surface ready once it listens.
fn tap_script(surface_id: &str) -> String {
    format!(
        r#"
const s = document.getElementById("{surface_id}");
if (s && !s.dataset.ready) {{
  s.addEventListener("click", e => {{
    const r = s.getBoundingClientRect();
    if (r.width > 0 && r.height > 0) dioxus.send([(e.clientX - r.left) / r.width, (e.clientY - r.top) / r.height, r.height / r.width]);
  }});
  s.dataset.ready = "1";
}}
"#
    )
}

#[component]
pub fn MarkEditor(photo_id: String, image: String) -> Element {
    let app = use_app();
    let stored = app
        .store
        .borrow()
        .photo_marks(&photo_id)
        .unwrap_or_default();
    let mut marks = use_signal(|| stored);
    let mut tool = use_signal(|| Tool::Arrow);
    let mut first = use_signal(|| None::<Spot>);
    let mut label = use_signal(String::new);
    // The drawn photo's shape: (1, height / width), from the taps.
    let mut size = use_signal(|| (1.0f64, 0.75f64));
    let mut problem = use_signal(|| None::<String>);
    let save = {
        let app = app.clone();
        let photo_id = photo_id.clone();
        move |next: Vec<PhotoMark>| match app.change(|s| s.set_photo_marks(&photo_id, &next)) {
            Ok(()) => {
                marks.set(next);
                problem.set(None);
            }
            Err(e) => problem.set(Some(e)),
        }
    };
    // Taps are read by a few lines of script: where on the photo, as fractions of its drawn
    // size, the same on every renderer (the framework's element coordinates and sizes were
    // not available on all of them).
    let surface_id = format!("mark-surface-{photo_id}");
    let script = tap_script(&surface_id);
    let tap_save = save.clone();
    use_effect(move || {
        let mut save = tap_save.clone();
        let mut taps = document::eval(&script);
        spawn(async move {
            while let Ok([x, y, aspect]) = taps.recv::<[f64; 3]>().await {
                if !(x.is_finite() && y.is_finite() && aspect.is_finite() && aspect > 0.0) {
                    continue;
                }
                size.set((1.0, aspect));
                let spot = [x.clamp(0.0, 1.0), y.clamp(0.0, 1.0)];
                let Some(a) = first() else {
                    first.set(Some(spot));
                    continue;
                };
                first.set(None);
                let mut next = marks();
                next.push(mark_of(tool(), a, spot, aspect, &label()));
                save(next);
            }
        });
    });
    let aspect = size().1 / size().0;
    let view_h = 100.0 * aspect;
    let hint = match first() {
        None => tool().first_tap(),
        Some(_) => "Now the second tap.",
    };
    rsx! {
        div { class: "mark-editor",
            div { class: "mark-tools",
                for (t, name, key) in [(Tool::Arrow, "Arrow", "arrow"), (Tool::Circle, "Circle", "circle"), (Tool::Dimension, "Dimension", "dimension")] {
                    button { key: "{key}", id: "mark-tool-{key}", class: if tool() == t { "chosen" } else { "quiet" },
                        onclick: move |_| { tool.set(t); first.set(None); }, "{name}" }
                }
            }
            if tool() == Tool::Dimension {
                label { r#for: "mark-label", "What it measures" }
                input { id: "mark-label", value: "{label}", placeholder: "2-1/2\"", oninput: move |e| label.set(e.value()) }
            }
            p { class: "muted", id: "mark-hint", "{hint}" }
            div { class: "mark-canvas",
                img { src: "data:image/jpeg;base64,{image}", alt: "The photo being marked" }
                svg { id: "{surface_id}", class: "mark-surface", view_box: "0 0 100 {view_h}", preserve_aspect_ratio: "none",
                    for (n, mark) in marks().iter().enumerate() {
                        MarkShape { key: "{n}", mark: mark.clone(), view_h }
                    }
                    if let Some(a) = first() {
                        circle { cx: "{a[0] * 100.0}", cy: "{a[1] * view_h}", r: "1.5", class: "mark-first" }
                    }
                }
            }
            if let Some(e) = problem() {
                p { class: "field-error", role: "alert", "Not kept: {e}" }
            }
            div { class: "mark-actions",
                button { class: "quiet", id: "mark-undo", disabled: marks().is_empty(), onclick: {
                    let mut save = save.clone();
                    move |_| { let mut next = marks(); next.pop(); save(next); }
                }, "Take back the last mark" }
                button { class: "quiet", id: "mark-clear", disabled: marks().is_empty(), onclick: {
                    let mut save = save.clone();
                    move |_| save(vec![])
                }, "Clear the marks" }
            }
            p { class: "muted", id: "mark-count",
                match marks().len() {
                    0 => "No marks yet.".to_string(),
                    1 => "1 mark.".to_string(),
                    n => format!("{n} marks."),
                }
                " They are drawn over the photo in the report; the photo itself is kept as taken."
            }
        }
    }
}

/// One mark in the editor's drawing space: x from 0 to 100, y from 0 to `view_h`.
#[component]
fn MarkShape(mark: PhotoMark, view_h: f64) -> Element {
    let at = |s: Spot| (s[0] * 100.0, s[1] * view_h);
    match mark {
        PhotoMark::Arrow { from, to } => {
            let ((x1, y1), (x2, y2)) = (at(from), at(to));
            let angle = (y1 - y2).atan2(x1 - x2);
            let head = |side: f64| {
                (
                    x2 + 6.0 * (angle + side).cos(),
                    y2 + 6.0 * (angle + side).sin(),
                )
            };
            let ((ax, ay), (bx, by)) = (head(-0.45), head(0.45));
            rsx! {
                polyline { class: "mark", points: "{x1},{y1} {x2},{y2}" }
                polyline { class: "mark", points: "{ax},{ay} {x2},{y2} {bx},{by}" }
            }
        }
        PhotoMark::Circle { centre, radius } => {
            let (cx, cy) = at(centre);
            rsx! { circle { class: "mark", cx: "{cx}", cy: "{cy}", r: "{radius * 100.0}" } }
        }
        PhotoMark::Dimension { from, to, label } => {
            let ((x1, y1), (x2, y2)) = (at(from), at(to));
            rsx! {
                polyline { class: "mark", points: "{x1},{y1} {x2},{y2}" }
                text { class: "mark-label", x: "{(x1 + x2) / 2.0}", y: "{(y1 + y2) / 2.0 - 2.0}", "{label}" }
            }
        }
    }
}
