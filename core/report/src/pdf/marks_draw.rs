//! The marks drawn on a photo (arrows, circles, measured dimensions), laid over its image in
//! the report: the photo's JPEG is embedded as stored and the marks are drawn on top, so the
//! original stays untouched. Each stroke is dark under bright, legible on any photo.

use super::fonts::{self, Face};
use super::writer::Writer;
use undercroft_engine::model::{PhotoMark, Spot};

/// Bright over dark: seen on a dim crawlspace photo and on a bright one.
const MARK: (f32, f32, f32) = (1.0, 0.82, 0.05);
const UNDER: (f32, f32, f32) = (0.08, 0.08, 0.08);
const LABEL_SIZE: f32 = 8.0;

/// Where the image is on the page: its bottom-left corner and size, in points.
#[derive(Debug, Clone, Copy)]
pub struct ImageBox {
    pub x: f32,
    pub bottom: f32,
    pub width: f32,
    pub height: f32,
}

impl ImageBox {
    /// A spot on the photo (fractions from its top left) on the page.
    fn at(&self, s: Spot) -> (f32, f32) {
        (
            self.x + s[0] as f32 * self.width,
            self.bottom + (1.0 - s[1] as f32) * self.height,
        )
    }
}

/// Draws each mark over the image in `area`.
pub fn draw_marks(w: &mut Writer, marks: &[PhotoMark], area: ImageBox) {
    let weight = (area.width.min(area.height) / 90.0).clamp(1.2, 2.4);
    let stroke = |w: &mut Writer, points: &[(f32, f32)]| {
        w.line(points, UNDER, weight * 2.0, None);
        w.line(points, MARK, weight, None);
    };
    for mark in marks {
        match mark {
            PhotoMark::Arrow { from, to } => {
                let (a, b) = (area.at(*from), area.at(*to));
                stroke(w, &[a, b]);
                let head = area.width.min(area.height) * 0.07;
                let angle = (a.1 - b.1).atan2(a.0 - b.0);
                for side in [-0.45f32, 0.45] {
                    let end = (
                        b.0 + head * (angle + side).cos(),
                        b.1 + head * (angle + side).sin(),
                    );
                    stroke(w, &[end, b]);
                }
            }
            PhotoMark::Circle { centre, radius } => {
                let (cx, cy) = area.at(*centre);
                let r = *radius as f32 * area.width;
                let points: Vec<(f32, f32)> = (0..=48)
                    .map(|k| {
                        let t = k as f32 / 48.0 * std::f32::consts::TAU;
                        (cx + r * t.cos(), cy + r * t.sin())
                    })
                    .collect();
                stroke(w, &points);
            }
            PhotoMark::Dimension { from, to, label } => {
                let (a, b) = (area.at(*from), area.at(*to));
                stroke(w, &[a, b]);
                let (dx, dy) = (b.0 - a.0, b.1 - a.1);
                let length = (dx * dx + dy * dy).sqrt().max(1e-3);
                let tick = area.width.min(area.height) * 0.03;
                let (nx, ny) = (-dy / length * tick, dx / length * tick);
                for p in [a, b] {
                    stroke(w, &[(p.0 - nx, p.1 - ny), (p.0 + nx, p.1 + ny)]);
                }
                let text_w = fonts::width(label, LABEL_SIZE, Face::Bold);
                let mid = ((a.0 + b.0) / 2.0, (a.1 + b.1) / 2.0);
                let (bx, by) = (mid.0 - text_w / 2.0 - 2.0, mid.1 + tick + 1.0);
                w.rect(
                    bx,
                    by,
                    text_w + 4.0,
                    LABEL_SIZE + 3.0,
                    Some(MARK),
                    Some(UNDER),
                );
                w.text_at(bx + 2.0, by + 2.5, label, LABEL_SIZE, Face::Bold, UNDER);
            }
        }
    }
}
