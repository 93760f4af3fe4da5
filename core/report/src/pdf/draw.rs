//! The side view of a joist: supports, end zones and middle third, notches and holes where
//! they sit, dimensions, and the sag profile against the L/n reference line.

use super::fonts::{self, Face};
use super::writer::{Writer, INK, MARGIN, MUTED};
use crate::SideView;

const OVER: (f32, f32, f32) = (0.62, 0.1, 0.1);
const DEFECT: (f32, f32, f32) = (0.2, 0.35, 0.6);
const WOOD: (f32, f32, f32) = (0.93, 0.87, 0.74);
const JOIST_HEIGHT: f32 = 30.0;
const SAG_HEIGHT: f32 = 22.0;

/// The height a side view takes on the page.
pub fn side_view_height(v: &SideView) -> f32 {
    14.0 + 24.0
        + JOIST_HEIGHT
        + 34.0
        + if v.sag.is_empty() {
            0.0
        } else {
            SAG_HEIGHT + 30.0
        }
}

pub fn side_view(w: &mut Writer, v: &SideView, figure: usize) {
    w.ensure(side_view_height(v));
    let has_sag = !v.sag.is_empty();
    let top = w.y;
    let title = super::writer::fit(
        &format!("Figure {figure}. {}", v.title),
        9.0,
        Face::Bold,
        w.content_width(),
    );
    w.text_at(MARGIN, top - 10.0, &title, 9.0, Face::Bold, INK);

    let x0 = MARGIN + 24.0;
    let plot_w = w.content_width() - 48.0;
    let sx = plot_w / v.span_in as f32;
    let sy = JOIST_HEIGHT / v.depth_in as f32;
    let base = top - 14.0 - 24.0 - JOIST_HEIGHT;
    let x = |inches: f64| x0 + inches as f32 * sx;
    let y = |inches: f64| base + inches as f32 * sy;

    // Zones: end zone | middle third | end zone, dashed at L/3 and 2L/3.
    let third = v.span_in / 3.0;
    for k in [1.0, 2.0] {
        let xx = x(third * k);
        w.line(
            &[(xx, base - 6.0), (xx, base + JOIST_HEIGHT + 14.0)],
            MUTED,
            0.5,
            Some(&[3.0, 2.0]),
        );
    }
    for (k, label) in ["end zone", "middle third (no notches)", "end zone"]
        .iter()
        .enumerate()
    {
        let cx = x(third * (k as f64 + 0.5));
        let lw = fonts::width(label, 7.0, Face::Regular);
        w.text_at(
            cx - lw / 2.0,
            base + JOIST_HEIGHT + 16.0,
            label,
            7.0,
            Face::Regular,
            MUTED,
        );
    }
    // The joist and its supports.
    w.rect(x0, base, plot_w, JOIST_HEIGHT, Some(WOOD), Some(INK));
    for sx0 in [x0 - 16.0, x0 + plot_w] {
        w.rect(
            sx0,
            base - 12.0,
            16.0,
            12.0 + JOIST_HEIGHT * 0.15,
            Some((0.55, 0.55, 0.55)),
            Some(INK),
        );
    }
    w.text_at(x0 - 22.0, base - 22.0, "A", 8.0, Face::Bold, INK);
    w.text_at(x0 + plot_w + 14.0, base - 22.0, "B", 8.0, Face::Bold, INK);
    // Defects to scale, labels staggered so neighbours do not collide.
    for (n, r) in v.notches.iter().enumerate() {
        let color = if r.over { OVER } else { DEFECT };
        let (rx0, rx1) = (x(r.x0.max(-v.span_in * 0.02)), x(r.x1));
        w.rect(
            rx0,
            y(r.y0),
            (rx1 - rx0).max(1.5),
            (y(r.y1) - y(r.y0)).max(1.5),
            Some((1.0, 1.0, 1.0)),
            Some(color),
        );
        label(
            w,
            &r.label,
            rx0,
            if r.y0 <= 0.0 {
                base - 10.0 - (n % 2) as f32 * 9.0
            } else {
                base + JOIST_HEIGHT + 4.0 + (n % 2) as f32 * 8.0
            },
            (x0 + 2.0, x0 + plot_w - 2.0),
            color,
            r.over,
        );
    }
    for (n, c) in v.holes.iter().enumerate() {
        let color = if c.over { OVER } else { DEFECT };
        let (cx, cy) = (x(c.x), y(c.y));
        w.circle(
            cx,
            cy,
            (c.r as f32 * sy).max(1.5),
            Some((1.0, 1.0, 1.0)),
            color,
        );
        label(
            w,
            &c.label,
            cx - 10.0,
            base - 10.0 - ((n + v.notches.len()) % 2) as f32 * 9.0,
            (x0 + 2.0, x0 + plot_w - 2.0),
            color,
            c.over,
        );
    }
    // Dimensions.
    let dim_y = base - 30.0;
    w.line(&[(x0, dim_y), (x0 + plot_w, dim_y)], MUTED, 0.5, None);
    for xx in [x0, x0 + plot_w] {
        w.line(&[(xx, dim_y - 3.0), (xx, dim_y + 3.0)], MUTED, 0.5, None);
    }
    let span_label = format!("clear span {}", v.span_text);
    let lw = fonts::width(&span_label, 7.5, Face::Regular);
    w.rect(
        x0 + plot_w / 2.0 - lw / 2.0 - 3.0,
        dim_y - 4.0,
        lw + 6.0,
        8.0,
        Some((1.0, 1.0, 1.0)),
        None,
    );
    w.text_at(
        x0 + plot_w / 2.0 - lw / 2.0,
        dim_y - 2.5,
        &span_label,
        7.5,
        Face::Regular,
        INK,
    );
    let depth_label = format!("d = {}", v.depth_text);
    w.text_at(
        MARGIN - 4.0,
        base + JOIST_HEIGHT + 3.0,
        &depth_label,
        7.0,
        Face::Regular,
        MUTED,
    );
    let exaggeration = sy / sx;
    let mut bottom = dim_y - 12.0;
    w.text_at(
        MARGIN,
        bottom,
        &format!("Drawn to scale along the span; depth drawn x{exaggeration:.0} for legibility."),
        7.0,
        Face::Regular,
        MUTED,
    );

    if has_sag {
        sag_plot(w, v, x0, plot_w, sx, bottom - 8.0);
        bottom -= SAG_HEIGHT + 30.0;
    }
    w.y = bottom - 8.0;
}

/// A defect's label, kept between the supports so it never sits over a support block or
/// runs off the page: a label that would pass the right support ends at it.
fn label(
    w: &mut Writer,
    text: &str,
    x: f32,
    y: f32,
    (left, right): (f32, f32),
    color: (f32, f32, f32),
    over: bool,
) {
    let text = if over {
        format!("{text} (over)")
    } else {
        text.to_string()
    };
    let face = if over { Face::Bold } else { Face::Regular };
    let text = super::writer::fit(&text, 7.0, face, right - left);
    let width = fonts::width(&text, 7.0, face);
    let x = x.min(right - width).max(left);
    w.text_at(
        x,
        y,
        &text,
        7.0,
        if over { Face::Bold } else { Face::Regular },
        color,
    );
}

/// Sag below a straight line between the bearings, magnified, with the L/n line.
fn sag_plot(w: &mut Writer, v: &SideView, x0: f32, plot_w: f32, sx: f32, top: f32) {
    let largest = v.sag.iter().map(|p| p.1).fold(0.0, f64::max);
    let reference = v.sag_reference_in.unwrap_or(0.0);
    let scale = SAG_HEIGHT / (largest.max(reference).max(0.01) as f32);
    let line_y = top - 4.0;
    w.line(&[(x0, line_y), (x0 + plot_w, line_y)], MUTED, 0.6, None);
    let ref_y = line_y - reference as f32 * scale;
    w.line(
        &[(x0, ref_y), (x0 + plot_w, ref_y)],
        OVER,
        0.6,
        Some(&[4.0, 2.0]),
    );
    w.text_at(
        x0 + plot_w - 120.0,
        ref_y - 8.0,
        &format!("reference {}", v.sag_reference_text),
        7.0,
        Face::Regular,
        OVER,
    );
    let mut points = vec![(x0, line_y)];
    points.extend(
        v.sag
            .iter()
            .map(|&(at, s)| (x0 + at as f32 * sx, line_y - s as f32 * scale)),
    );
    points.push((x0 + plot_w, line_y));
    w.line(&points, DEFECT, 1.2, None);
    for &(px, py) in &points[1..points.len() - 1] {
        w.circle(px, py, 1.8, Some(DEFECT), DEFECT);
    }
    w.text_at(
        MARGIN,
        top - SAG_HEIGHT - 18.0,
        &format!(
            "Measured sag from a line between the bearings, drawn x{:.0} (largest {}).",
            scale / sx.max(1e-6),
            v.sag_largest_text
        ),
        7.0,
        Face::Regular,
        MUTED,
    );
}
