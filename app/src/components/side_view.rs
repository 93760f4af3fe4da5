//! A joist's side view as SVG: the joist to scale along its span (depth exaggerated, said
//! so), supports, end zones and middle third, notches and holes where they sit.

use dioxus::prelude::*;
use undercroft_engine::views::SideView;

const W: f64 = 300.0;
const H: f64 = 130.0;
const JOIST_H: f64 = 40.0;

#[component]
pub fn SideViewSvg(view: SideView) -> Element {
    let sx = (W - 40.0) / view.span_in;
    let sy = JOIST_H / view.depth_in;
    let x = move |inches: f64| 20.0 + inches * sx;
    let base = 80.0;
    let y = move |inches: f64| base - inches * sy;
    let third = view.span_in / 3.0;
    let (t1, t2) = (x(third), x(2.0 * third));
    let exaggeration = (sy / sx).round();
    let labels = ["end zone", "middle third", "end zone"];
    rsx! {
        figure { class: "side-view",
            svg { view_box: "0 0 {W} {H}", width: "100%", role: "img",
                "aria-label": "Side view of the joist with its notches and holes",
                rect { x: "20", y: "{base - JOIST_H}", width: "{W - 40.0}", height: "{JOIST_H}", fill: "#ead9b5", stroke: "currentColor" }
                rect { x: "8", y: "{base}", width: "12", height: "12", fill: "#888" }
                rect { x: "{W - 20.0}", y: "{base}", width: "12", height: "12", fill: "#888" }
                line { x1: "{t1}", y1: "{base - JOIST_H - 12.0}", x2: "{t1}", y2: "{base + 6.0}", stroke: "currentColor", stroke_dasharray: "3 2" }
                line { x1: "{t2}", y1: "{base - JOIST_H - 12.0}", x2: "{t2}", y2: "{base + 6.0}", stroke: "currentColor", stroke_dasharray: "3 2" }
                for (k, label) in labels.iter().enumerate() {
                    text { x: "{x(third * (k as f64 + 0.5))}", y: "{base - JOIST_H - 16.0}", font_size: "10", text_anchor: "middle", fill: "currentColor", "{label}" }
                }
                for n in view.notches.iter() {
                    rect { x: "{x(n.x0.max(0.0))}", y: "{y(n.y1)}", width: "{((n.x1 - n.x0.max(0.0)) * sx).max(2.0)}", height: "{((n.y1 - n.y0) * sy).max(2.0)}",
                        fill: "white", stroke: if n.over { "#9e1a1a" } else { "#2a4f8a" }, stroke_width: "1.5" }
                    text { x: "{x(n.x0.max(0.0))}", y: "{base + 24.0}", font_size: "10", fill: "currentColor", "{n.label}" if n.over { " (over)" } }
                }
                for c in view.holes.iter() {
                    circle { cx: "{x(c.x)}", cy: "{y(c.y)}", r: "{(c.r * sy).max(2.0)}", fill: "white", stroke: if c.over { "#9e1a1a" } else { "#2a4f8a" }, stroke_width: "1.5" }
                    text { x: "{x(c.x)}", y: "{base + 36.0}", font_size: "10", fill: "currentColor", "{c.label}" if c.over { " (over)" } }
                }
                text { x: "{W / 2.0}", y: "{H - 6.0}", font_size: "10", text_anchor: "middle", fill: "currentColor", "clear span {view.span_text}; depth {view.depth_text} drawn x{exaggeration}" }
            }
        }
    }
}
