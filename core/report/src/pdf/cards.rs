//! An area's pages: numbered finding cards with their photos, the drawings, the table of
//! checks met, and the area's own photos.

use super::draw::side_view;
use super::fonts::{self, Face};
use super::marks_draw::{draw_marks, ImageBox};
use super::sections::{caption, heading, BODY, SMALL};
use super::writer::{Writer, INK, MARGIN, MUTED};
use crate::{AreaSection, CheckedRow, Figure, NotedRow};

/// The room an area's start needs: its heading kept with the first thing under it.
pub fn start_height(a: &AreaSection) -> f32 {
    let first = if !a.findings.is_empty() || !a.checked.is_empty() {
        60.0
    } else if !a.girders.is_empty() {
        super::girder_draw::GIRDER_VIEW_HEIGHT + 4.0
    } else if let Some(v) = a.views.first() {
        super::draw::side_view_height(&v.view) + 4.0
    } else {
        120.0
    };
    14.0 * 1.7 + SMALL * 2.5 + first
}

pub fn area(w: &mut Writer, a: &AreaSection) {
    w.ensure(start_height(a));
    heading(w, &a.heading, 14.0);
    w.paragraph(&a.about, SMALL, Face::Regular, 0.0, MUTED);
    if !a.notes.is_empty() {
        w.paragraph(&a.notes, BODY, Face::Regular, 0.0, INK);
    }
    if !a.findings.is_empty() {
        heading(
            w,
            &format!("Findings in {} the inspector set to no action", a.heading),
            10.5,
        );
        noted_table(w, &a.findings);
    }
    // The table first: it can break across a page, the drawings cannot.
    if !a.checked.is_empty() {
        heading(w, &format!("Checks met in {}", a.heading), 10.5);
        checked_table(w, &a.checked);
    }
    for g in &a.girders {
        w.space(4.0);
        super::girder_draw::girder_view(w, &g.view, g.figure);
    }
    for v in &a.views {
        w.space(4.0);
        side_view(w, &v.view, v.figure);
    }
    if !a.photos.is_empty() {
        heading(w, &format!("Photos of {}", a.heading), 10.5);
        photo_row(w, &a.photos, 3);
    }
}

const COLUMNS: [(&str, f32); 4] = [
    ("Checked", 0.22),
    ("Where", 0.37),
    ("Measured", 0.16),
    ("Limit", 0.25),
];

const NOTED_COLUMNS: [(&str, f32); 4] = [
    ("No., finding", 0.27),
    ("Where", 0.25),
    ("Status", 0.14),
    ("Measured against the limit, or why not checked", 0.34),
];

fn noted_table(w: &mut Writer, rows: &[NotedRow]) {
    let cells = rows.iter().map(|r| {
        vec![
            format!("{}. {}", r.number, r.what),
            r.location.clone(),
            r.status.clone(),
            match r.figures.as_slice() {
                [] => r.detail.clone(),
                [one] => format!("{} (Figure {one})", r.detail),
                many => format!(
                    "{} (Figures {})",
                    r.detail,
                    many.iter()
                        .map(usize::to_string)
                        .collect::<Vec<_>>()
                        .join(", ")
                ),
            },
        ]
    });
    table(w, &NOTED_COLUMNS, 7.5, cells);
}

fn checked_table(w: &mut Writer, rows: &[CheckedRow]) {
    let cells = rows.iter().map(|r| {
        vec![
            r.what.clone(),
            r.location.clone(),
            r.measured.clone(),
            r.limit.clone(),
        ]
    });
    table(w, &COLUMNS, 7.0, cells);
}

/// A table: a shaded header row of the columns' names, then the rows, every other one shaded.
fn table(
    w: &mut Writer,
    columns: &[(&str, f32)],
    size: f32,
    rows: impl Iterator<Item = Vec<String>>,
) {
    let header: Vec<String> = columns.iter().map(|c| c.0.to_string()).collect();
    table_row(
        w,
        &header,
        columns,
        size,
        Face::Bold,
        Some((0.9, 0.9, 0.88)),
    );
    for (n, cells) in rows.enumerate() {
        table_row(
            w,
            &cells,
            columns,
            size,
            Face::Regular,
            (n % 2 == 1).then_some((0.97, 0.97, 0.96)),
        );
    }
    w.space(4.0);
}

fn table_row(
    w: &mut Writer,
    cells: &[String],
    columns: &[(&str, f32)],
    size: f32,
    style: Face,
    shade: Option<(f32, f32, f32)>,
) {
    let cw = w.content_width();
    let wrapped: Vec<Vec<String>> = cells
        .iter()
        .zip(columns)
        .map(|(c, (_, frac))| fonts::wrap(c, size, style, cw * frac - 6.0))
        .collect();
    let lines = wrapped.iter().map(Vec::len).max().unwrap_or(1).max(1);
    let h = lines as f32 * size * 1.2 + 3.0;
    w.ensure(h);
    let top = w.y;
    if let Some(s) = shade {
        w.rect(MARGIN, top - h, cw, h, Some(s), None);
    }
    let mut x = MARGIN;
    for (cell, (_, frac)) in wrapped.iter().zip(columns) {
        for (k, line) in cell.iter().enumerate() {
            w.text_at(
                x + 3.0,
                top - 1.5 - (k as f32 + 1.0) * size * 1.2 + size * 0.3,
                line,
                size,
                style,
                INK,
            );
        }
        x += cw * frac;
    }
    w.y = top - h;
}

/// Draws a figure's image (or a blank saying why) inside a box `max_w` by `max_h` whose top
/// left corner is at (x, top); returns the height used.
pub fn image_at(w: &mut Writer, f: &Figure, x: f32, top: f32, max_w: f32, max_h: f32) -> f32 {
    match f.file.as_deref().and_then(|p| w.jpeg(p)) {
        Some((id, px_w, px_h)) => {
            let aspect = px_h as f32 / px_w.max(1) as f32;
            let (iw, ih) = if max_w * aspect > max_h {
                (max_h / aspect, max_h)
            } else {
                (max_w, max_w * aspect)
            };
            w.place_image(id, px_w, x, top - ih, iw);
            let area = ImageBox {
                x,
                bottom: top - ih,
                width: iw,
                height: ih,
            };
            draw_marks(w, &f.marks, area);
            ih
        }
        None => {
            let h = max_h.min(max_w * 0.6);
            w.rect(
                x,
                top - h,
                max_w,
                h,
                Some((0.95, 0.95, 0.95)),
                Some((0.6, 0.6, 0.6)),
            );
            let missing = if f.file.is_some() {
                "photo file unreadable"
            } else {
                "photo not on this device"
            };
            w.text_at(x + 6.0, top - h / 2.0, missing, SMALL, Face::Regular, MUTED);
            h
        }
    }
}

/// Photos `per_row` to a row, each with its figure number and caption under it.
pub fn photo_row(w: &mut Writer, figures: &[Figure], per_row: usize) {
    photo_row_at(w, figures, per_row, 0.0);
}

/// Photos `per_row` to a row from `indent` points in.
pub fn photo_row_at(w: &mut Writer, figures: &[Figure], per_row: usize, indent: f32) {
    let gap = 10.0;
    let per_row = per_row.max(1);
    let pw = (w.content_width() - indent - gap * (per_row as f32 - 1.0)) / per_row as f32;
    let max_h = if per_row == 1 { 200.0 } else { pw * 0.8 };
    for row in figures.chunks(per_row) {
        let captions: Vec<Vec<String>> = row
            .iter()
            .map(|f| fonts::wrap(&caption(f), SMALL, Face::Regular, pw))
            .collect();
        let caption_h = captions.iter().map(Vec::len).max().unwrap_or(0) as f32 * SMALL * 1.3;
        w.ensure(max_h + caption_h + 8.0);
        let top = w.y;
        let mut used: f32 = 0.0;
        for (k, f) in row.iter().enumerate() {
            let x = MARGIN + indent + k as f32 * (pw + gap);
            let h = image_at(w, f, x, top, pw, max_h);
            used = used.max(h);
            for (n, line) in captions[k].iter().enumerate() {
                w.text_at(
                    x,
                    top - h - 3.0 - (n as f32 + 1.0) * SMALL * 1.3 + SMALL * 0.3,
                    line,
                    SMALL,
                    Face::Regular,
                    INK,
                );
            }
        }
        w.y = top - used - caption_h - 8.0;
    }
}
