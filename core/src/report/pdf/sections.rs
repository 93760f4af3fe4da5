//! The report's parts laid out in order: cover, summary, one section per area (member table,
//! findings with photos, side views), method appendix and the limits of the inspection.

use super::draw::side_view;
use super::fonts::{self, Face};
use super::writer::{Writer, INK, MARGIN, MUTED};
use crate::report::{AreaSection, FindingBlock, MemberRow, PhotoSlot, Report};

const BODY: f32 = 9.5;
const SMALL: f32 = 8.0;
/// Width of the label column of a finding's facts.
const LABEL_WIDTH: f32 = 104.0;

/// A heading, kept on the page with at least a few lines of what follows it.
fn heading(w: &mut Writer, text: &str, size: f32) {
    w.ensure(size * 3.0 + 60.0);
    w.space(size * 0.6);
    w.paragraph(text, size, Face::Bold, 0.0, INK);
    w.space(size * 0.3);
}

pub fn cover(w: &mut Writer, r: &Report) {
    w.space(60.0);
    w.paragraph(&r.cover.title, 22.0, Face::Bold, 0.0, INK);
    w.space(10.0);
    w.paragraph(&r.cover.property, 16.0, Face::Regular, 0.0, INK);
    w.space(24.0);
    for (label, value) in &r.cover.facts {
        w.labelled(label, value, 10.5, 130.0, 0.0);
        w.space(3.0);
    }
    w.space(28.0);
    notice_box(w, &r.cover.notice);
}

fn notice_box(w: &mut Writer, text: &str) {
    let lines = fonts::wrap(text, BODY, Face::Regular, w.content_width() - 24.0);
    let h = lines.len() as f32 * BODY * 1.35 + 16.0;
    w.ensure(h + 4.0);
    let top = w.y;
    w.rect(
        MARGIN,
        top - h,
        w.content_width(),
        h,
        Some((0.95, 0.95, 0.93)),
        Some((0.55, 0.55, 0.5)),
    );
    w.y = top - 8.0;
    for line in lines {
        w.y -= BODY * 1.35;
        w.text_at(
            MARGIN + 12.0,
            w.y + BODY * 0.25,
            &line,
            BODY,
            Face::Regular,
            INK,
        );
    }
    w.y = top - h - 6.0;
}

pub fn summary(w: &mut Writer, r: &Report) {
    w.new_page();
    heading(w, "Summary", 16.0);
    w.paragraph(&r.summary.counts, BODY, Face::Regular, 0.0, MUTED);
    if let Some(benchmark) = &r.summary.benchmark {
        w.space(3.0);
        w.paragraph(&format!("{benchmark}."), BODY, Face::Regular, 0.0, MUTED);
    }
    w.space(6.0);
    for group in &r.summary.groups {
        heading(w, &group.title, 12.0);
        for line in &group.lines {
            w.ensure(BODY * 3.0);
            w.space(2.0);
            let top = w.y;
            w.y -= BODY * 1.35;
            w.text_at(
                MARGIN,
                w.y + BODY * 0.25,
                &line.use_text,
                BODY,
                Face::Bold,
                INK,
            );
            w.y = top;
            w.paragraph(&line.text, BODY, Face::Regular, 64.0, INK);
            w.paragraph(&line.location, SMALL, Face::Regular, 64.0, MUTED);
            w.space(3.0);
        }
    }
    if r.summary.groups.is_empty() {
        w.paragraph(
            "Nothing measured is over or near a limit, and no condition was recorded for evaluation.",
            BODY,
            Face::Regular,
            0.0,
            INK,
        );
    }
}

pub fn area(w: &mut Writer, a: &AreaSection) {
    w.new_page();
    heading(w, &a.heading, 15.0);
    w.paragraph(&a.about, BODY, Face::Regular, 0.0, MUTED);
    if !a.notes.is_empty() {
        w.paragraph(&a.notes, BODY, Face::Regular, 0.0, INK);
    }
    if !a.members.is_empty() {
        heading(w, "Members", 11.0);
        member_table(w, &a.members);
    }
    if !a.girders.is_empty() {
        heading(w, "Girders and posts", 11.0);
        for g in &a.girders {
            super::girder_draw::girder_view(w, g);
        }
    }
    if !a.views.is_empty() {
        heading(w, "Side views", 11.0);
        for v in &a.views {
            side_view(w, v);
        }
    }
    if !a.findings.is_empty() {
        heading(w, "Findings", 11.0);
        for f in &a.findings {
            finding(w, f);
        }
    }
    if !a.photos.is_empty() {
        heading(w, "Photos", 11.0);
        photos(w, &a.photos);
    }
}

const COLUMNS: [(&str, f32); 8] = [
    ("Member", 0.25),
    ("Size", 0.11),
    ("Species, grade", 0.19),
    ("Spacing", 0.08),
    ("Span", 0.09),
    ("Allowable", 0.10),
    ("Use", 0.07),
    ("Governs", 0.11),
];

fn member_table(w: &mut Writer, rows: &[MemberRow]) {
    let size = 7.5;
    let header: Vec<String> = COLUMNS.iter().map(|c| c.0.to_string()).collect();
    table_row(w, &header, size, Face::Bold, Some((0.9, 0.9, 0.88)));
    for (n, r) in rows.iter().enumerate() {
        let cells = vec![
            r.member.clone(),
            r.size.clone(),
            r.species_grade.clone(),
            r.spacing.clone(),
            r.span.clone(),
            r.allowable.clone(),
            r.use_text.clone(),
            r.governs.clone(),
        ];
        table_row(
            w,
            &cells,
            size,
            Face::Regular,
            (n % 2 == 1).then_some((0.97, 0.97, 0.96)),
        );
    }
    w.space(6.0);
}

fn table_row(
    w: &mut Writer,
    cells: &[String],
    size: f32,
    style: Face,
    shade: Option<(f32, f32, f32)>,
) {
    let cw = w.content_width();
    let wrapped: Vec<Vec<String>> = cells
        .iter()
        .zip(COLUMNS)
        .map(|(c, (_, frac))| fonts::wrap(c, size, style, cw * frac - 6.0))
        .collect();
    let lines = wrapped.iter().map(Vec::len).max().unwrap_or(1).max(1);
    let h = lines as f32 * size * 1.3 + 5.0;
    w.ensure(h);
    let top = w.y;
    if let Some(s) = shade {
        w.rect(MARGIN, top - h, cw, h, Some(s), None);
    }
    let mut x = MARGIN;
    for (cell, (_, frac)) in wrapped.iter().zip(COLUMNS) {
        for (k, line) in cell.iter().enumerate() {
            w.text_at(
                x + 3.0,
                top - 3.0 - (k as f32 + 1.0) * size * 1.3 + size * 0.3,
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

fn badge_colors(f: &FindingBlock) -> ((f32, f32, f32), (f32, f32, f32)) {
    if f.over || f.badge.starts_with("TO BE") {
        ((0.62, 0.1, 0.1), (1.0, 1.0, 1.0))
    } else if f.badge.starts_with("near") || f.badge.starts_with("not fully") {
        ((0.98, 0.8, 0.35), INK)
    } else {
        ((0.9, 0.9, 0.9), INK)
    }
}

fn finding(w: &mut Writer, f: &FindingBlock) {
    w.ensure(90.0);
    w.space(6.0);
    w.rule((0.8, 0.8, 0.8), 0.5);
    w.space(4.0);
    let (fill, text) = badge_colors(f);
    let bw = fonts::width(&f.badge, 8.5, Face::Bold) + 10.0;
    w.rect(MARGIN, w.y - 13.0, bw, 13.0, Some(fill), None);
    w.text_at(MARGIN + 5.0, w.y - 9.5, &f.badge, 8.5, Face::Bold, text);
    let title = format!("{}  ({})", f.title, f.rule_id);
    w.text_at(
        MARGIN + bw + 8.0,
        w.y - 9.5,
        &super::writer::fit(&title, 10.0, Face::Bold, w.content_width() - bw - 10.0),
        10.0,
        Face::Bold,
        INK,
    );
    w.space(16.0);
    w.paragraph(&f.location, SMALL, Face::Regular, 0.0, MUTED);
    w.paragraph(&f.summary, BODY, Face::Regular, 0.0, INK);
    w.space(2.0);
    for (label, value) in &f.facts {
        w.labelled(label, value, SMALL + 0.5, LABEL_WIDTH, 0.0);
    }
    for a in &f.assumptions {
        w.paragraph(&format!("Assumes: {a}"), SMALL, Face::Regular, 0.0, MUTED);
    }
    for o in &f.options {
        w.paragraph(
            &format!("Option: {o}"),
            SMALL + 0.5,
            Face::Regular,
            0.0,
            INK,
        );
    }
    if let Some(reason) = &f.not_applicable {
        w.labelled("Set aside", reason, BODY, LABEL_WIDTH, 0.0);
    }
    w.labelled("Recommendation", &f.recommendation, BODY, LABEL_WIDTH, 0.0);
    if let Some(note) = &f.note {
        w.labelled("Inspector's note", note, BODY, LABEL_WIDTH, 0.0);
    }
    if !f.photos.is_empty() {
        w.space(4.0);
        photos(w, &f.photos);
    }
}

/// Photos two to a row, each with its caption under it.
fn photos(w: &mut Writer, slots: &[PhotoSlot]) {
    let gap = 12.0;
    let pw = (w.content_width() - gap) / 2.0;
    for pair in slots.chunks(2) {
        let images: Vec<_> = pair
            .iter()
            .map(|s| s.file.as_deref().and_then(|p| w.jpeg(p)))
            .collect();
        let heights: Vec<f32> = images
            .iter()
            .map(|i| {
                i.as_ref()
                    .map_or(pw * 0.5, |(_, iw, ih)| pw * *ih as f32 / *iw as f32)
            })
            .collect();
        let captions: Vec<Vec<String>> = pair
            .iter()
            .map(|s| fonts::wrap(&s.caption, SMALL, Face::Regular, pw))
            .collect();
        let caption_h = captions.iter().map(Vec::len).max().unwrap_or(0) as f32 * SMALL * 1.3;
        let row_h = heights
            .iter()
            .cloned()
            .fold(0.0, f32::max)
            .min(w.height * 0.55)
            + caption_h
            + 10.0;
        w.ensure(row_h);
        let top = w.y;
        for (k, slot) in pair.iter().enumerate() {
            let x = super::writer::MARGIN + k as f32 * (pw + gap);
            let h = heights[k].min(w.height * 0.55);
            let iw = if heights[k] > h {
                pw * h / heights[k]
            } else {
                pw
            };
            match &images[k] {
                Some((id, px_w, _)) => w.place_image(id.clone(), *px_w, x, top - h, iw),
                None => {
                    w.rect(
                        x,
                        top - h,
                        pw,
                        h,
                        Some((0.95, 0.95, 0.95)),
                        Some((0.6, 0.6, 0.6)),
                    );
                    let missing = if slot.file.is_some() {
                        "photo file unreadable"
                    } else {
                        "photo not on this device"
                    };
                    w.text_at(x + 8.0, top - h / 2.0, missing, SMALL, Face::Regular, MUTED);
                }
            }
            for (n, line) in captions[k].iter().enumerate() {
                w.text_at(
                    x,
                    top - h - 4.0 - (n as f32 + 1.0) * SMALL * 1.3 + SMALL * 0.3,
                    line,
                    SMALL,
                    Face::Regular,
                    INK,
                );
            }
        }
        w.y = top - row_h;
    }
}

pub fn appendix(w: &mut Writer, r: &Report) {
    w.new_page();
    heading(w, "Appendix: method, loads, values and sources", 14.0);
    for section in &r.appendix {
        heading(w, &section.heading, 11.0);
        for p in &section.paragraphs {
            w.paragraph(p, BODY, Face::Regular, 0.0, INK);
            w.space(3.0);
        }
    }
    heading(w, &r.limits.heading, 14.0);
    for p in &r.limits.paragraphs {
        w.paragraph(p, BODY, Face::Regular, 0.0, INK);
        w.space(3.0);
    }
}
