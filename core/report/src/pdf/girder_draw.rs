//! The side view of a girder line: the girder to scale along its length, end supports and
//! posts where they stand (over marked), spans labelled with length and use, the joists' load
//! as arrows on top, and ply joints.

use super::fonts::{self, Face};
use super::writer::{fit, Writer, INK, MARGIN, MUTED};
use crate::GirderView;

const OVER: (f32, f32, f32) = (0.62, 0.1, 0.1);
const WOOD: (f32, f32, f32) = (0.93, 0.87, 0.74);
const SUPPORT: (f32, f32, f32) = (0.55, 0.55, 0.55);
const GIRDER_HEIGHT: f32 = 16.0;
const POST_HEIGHT: f32 = 24.0;

/// The height a girder view takes on the page.
pub const GIRDER_VIEW_HEIGHT: f32 = 12.0 + 30.0 + GIRDER_HEIGHT + POST_HEIGHT + 40.0;

pub fn girder_view(w: &mut Writer, v: &GirderView, figure: usize) {
    w.ensure(GIRDER_VIEW_HEIGHT);
    let top = w.y;
    let title = fit(
        &format!("Figure {figure}. {}", v.title),
        9.0,
        Face::Bold,
        w.content_width(),
    );
    w.text_at(MARGIN, top - 10.0, &title, 9.0, Face::Bold, INK);
    let load = fit(&v.load_text, 7.0, Face::Regular, w.content_width());
    w.text_at(MARGIN, top - 20.0, &load, 7.0, Face::Regular, MUTED);

    let x0 = MARGIN + 20.0;
    let plot_w = w.content_width() - 40.0;
    let sx = plot_w / v.length_in as f32;
    let x = |inches: f64| x0 + inches as f32 * sx;
    let girder_y = top - 12.0 - 30.0 - GIRDER_HEIGHT;

    // Load arrows from the joists along the top.
    let arrows = 24;
    for k in 0..=arrows {
        let ax = x0 + plot_w * k as f32 / arrows as f32;
        let ay = girder_y + GIRDER_HEIGHT;
        w.line(&[(ax, ay + 10.0), (ax, ay + 1.0)], MUTED, 0.5, None);
        w.line(
            &[(ax - 1.5, ay + 3.5), (ax, ay + 1.0), (ax + 1.5, ay + 3.5)],
            MUTED,
            0.5,
            None,
        );
    }
    // Span labels above the arrows, over in red.
    for s in &v.spans {
        let (a, b) = (x(s.x0), x(s.x1));
        let color = if s.over { OVER } else { INK };
        let text = if s.over {
            format!("{} (over)", s.label)
        } else {
            s.label.clone()
        };
        let tw = fonts::width(&text, 7.0, Face::Regular).min(b - a);
        let face = if s.over { Face::Bold } else { Face::Regular };
        w.rect(
            (a + b) / 2.0 - tw / 2.0 - 2.0,
            girder_y + GIRDER_HEIGHT + 11.0,
            tw + 4.0,
            9.0,
            Some((1.0, 1.0, 1.0)),
            None,
        );
        w.text_at(
            (a + b) / 2.0 - tw / 2.0,
            girder_y + GIRDER_HEIGHT + 13.0,
            &fit(&text, 7.0, face, b - a),
            7.0,
            face,
            color,
        );
        if s.over {
            w.rect(a, girder_y, b - a, GIRDER_HEIGHT, None, Some(OVER));
        }
    }
    // The girder.
    w.rect(x0, girder_y, plot_w, GIRDER_HEIGHT, Some(WOOD), Some(INK));
    for s in &v.spans {
        if s.over {
            w.line(
                &[(x(s.x0), girder_y + 1.0), (x(s.x1), girder_y + 1.0)],
                OVER,
                2.0,
                None,
            );
        }
    }
    // Ply joints as short vertical ticks through the girder.
    for (at, over) in &v.splices {
        let color = if *over { OVER } else { MUTED };
        w.line(
            &[
                (x(*at), girder_y - 2.0),
                (x(*at), girder_y + GIRDER_HEIGHT + 2.0),
            ],
            color,
            1.0,
            Some(&[2.0, 1.5]),
        );
    }
    // Supports: ends as blocks, posts as columns down to a pier; labels below, staggered.
    for (n, s) in v.supports.iter().enumerate() {
        let color = if s.over { OVER } else { INK };
        let cx = x(s.x);
        if s.is_post {
            w.rect(
                cx - 3.0,
                girder_y - POST_HEIGHT,
                6.0,
                POST_HEIGHT,
                Some(WOOD),
                Some(color),
            );
            w.rect(
                cx - 7.0,
                girder_y - POST_HEIGHT - 5.0,
                14.0,
                5.0,
                Some(SUPPORT),
                Some(color),
            );
        } else {
            w.rect(
                cx - 6.0,
                girder_y - POST_HEIGHT - 5.0,
                12.0,
                POST_HEIGHT + 5.0,
                Some(SUPPORT),
                Some(color),
            );
        }
        let label = if s.over {
            format!("{} (see findings)", s.label)
        } else {
            s.label.clone()
        };
        let detail = [s.load_text.as_str(), s.bearing_text.as_str()]
            .iter()
            .filter(|t| !t.is_empty())
            .copied()
            .collect::<Vec<_>>()
            .join(", ");
        let stagger = (n % 2) as f32 * 16.0;
        let ly = girder_y - POST_HEIGHT - 14.0 - stagger;
        let lw =
            fonts::width(&label, 7.0, Face::Bold).max(fonts::width(&detail, 6.5, Face::Regular));
        let lx = (cx - lw / 2.0).clamp(MARGIN, MARGIN + w.content_width() - lw);
        w.text_at(
            lx,
            ly,
            &label,
            7.0,
            if s.over { Face::Bold } else { Face::Regular },
            color,
        );
        w.text_at(lx, ly - 7.5, &detail, 6.5, Face::Regular, MUTED);
    }
    if !v.end_b_known {
        let end = x0 + plot_w;
        w.text_at(
            end - 60.0,
            girder_y - 10.0,
            "length not entered",
            6.5,
            Face::Regular,
            MUTED,
        );
    }
    let bottom = girder_y - POST_HEIGHT - 14.0 - 16.0 - 14.0;
    w.text_at(
        MARGIN,
        bottom,
        "Drawn to scale along the girder; posts and supports not to scale. Arrows: the load of the joists it carries.",
        7.0,
        Face::Regular,
        MUTED,
    );
    w.y = bottom - 10.0;
}
