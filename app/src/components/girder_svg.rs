//! A girder line's side view as SVG: the girder to scale along its length, its ends and
//! posts (over marked in words too), span lengths with their use, the joists' load as arrows,
//! ply joints dashed.

use dioxus::prelude::*;
use undercroft_engine::views::GirderView;

const W: f64 = 320.0;
const H: f64 = 150.0;
const OVER: &str = "#9e1a1a";

#[component]
pub fn GirderSvg(view: GirderView) -> Element {
    let sx = (W - 40.0) / view.length_in;
    let x = move |inches: f64| 20.0 + inches * sx;
    let top = 50.0;
    let girder_h = 12.0;
    let arrows: Vec<f64> = (0..=16)
        .map(|k| 20.0 + (W - 40.0) * k as f64 / 16.0)
        .collect();
    rsx! {
        figure { class: "side-view girder-view",
            svg { view_box: "0 0 {W} {H}", width: "100%", role: "img",
                "aria-label": "Side view of the girder with its posts and spans",
                for ax in arrows {
                    line { x1: "{ax}", y1: "{top - 14.0}", x2: "{ax}", y2: "{top - 2.0}", stroke: "currentColor", stroke_width: "0.6" }
                    path { d: "M {ax - 2.0} {top - 5.0} L {ax} {top - 1.0} L {ax + 2.0} {top - 5.0}", fill: "none", stroke: "currentColor", stroke_width: "0.6" }
                }
                for s in view.spans.iter() {
                    text { x: "{(x(s.x0) + x(s.x1)) / 2.0}", y: "{top - 18.0}", font_size: "9", text_anchor: "middle",
                        fill: if s.over { OVER } else { "currentColor" }, font_weight: if s.over { "bold" } else { "normal" },
                        "{s.label}" if s.over { " over" } }
                }
                rect { x: "20", y: "{top}", width: "{W - 40.0}", height: "{girder_h}", fill: "#ead9b5", stroke: "currentColor" }
                for s in view.spans.iter().filter(|s| s.over) {
                    rect { x: "{x(s.x0)}", y: "{top}", width: "{x(s.x1) - x(s.x0)}", height: "{girder_h}", fill: "none", stroke: OVER, stroke_width: "2" }
                }
                for (at, over) in view.splices.iter() {
                    line { x1: "{x(*at)}", y1: "{top - 3.0}", x2: "{x(*at)}", y2: "{top + girder_h + 3.0}", stroke: if *over { OVER } else { "currentColor" }, stroke_dasharray: "2 2" }
                }
                for (n, s) in view.supports.iter().enumerate() {
                    if s.is_post {
                        rect { x: "{x(s.x) - 3.0}", y: "{top + girder_h}", width: "6", height: "34", fill: "#ead9b5", stroke: if s.over { OVER } else { "currentColor" } }
                        rect { x: "{x(s.x) - 7.0}", y: "{top + girder_h + 34.0}", width: "14", height: "6", fill: "#888" }
                    } else {
                        rect { x: "{x(s.x) - 6.0}", y: "{top + girder_h}", width: "12", height: "40", fill: "#888", stroke: if s.over { OVER } else { "none" } }
                    }
                    text { x: "{x(s.x)}", y: "{top + girder_h + 52.0 + (n % 2) as f64 * 22.0}", font_size: "9", text_anchor: "middle",
                        fill: if s.over { OVER } else { "currentColor" }, font_weight: if s.over { "bold" } else { "normal" },
                        "{s.label}" if s.over { " (see findings)" } }
                    text { x: "{x(s.x)}", y: "{top + girder_h + 62.0 + (n % 2) as f64 * 22.0}", font_size: "8", text_anchor: "middle", fill: "currentColor",
                        "{s.load_text}" }
                }
            }
            figcaption { "{view.title}. {view.load_text}." }
        }
    }
}
