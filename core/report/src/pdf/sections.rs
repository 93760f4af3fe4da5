//! The report's front and back: the title block and the first page of actions, the contents,
//! the facts of the inspection, the inspector's statement, the professional's notes, the
//! method and the limits of the inspection.

use super::fonts::{self, Face};
use super::writer::{Writer, INK, LEADING, MARGIN, MUTED};
use crate::{ActionItem, Figure, ProblemLine, Report};

pub const BODY: f32 = 8.5;
pub const SMALL: f32 = 7.0;
/// Width of a photo beside a first-page item.
const THUMB: f32 = 92.0;
/// How many photos stand beside a first-page item; more go in rows under it.
const BESIDE: usize = 2;

/// A heading, kept on the page with at least three lines of what follows it (a block that
/// needs more room asks for it before its heading).
pub fn heading(w: &mut Writer, text: &str, size: f32) {
    w.ensure(size * 2.0 + 36.0);
    w.space(size * 0.5);
    w.paragraph(text, size, Face::Bold, 0.0, INK);
    w.space(size * 0.2);
}

/// The title block at the head of the first page.
pub fn title_block(w: &mut Writer, r: &Report) {
    let top = w.y;
    let photo_w = if r.cover.photo.is_some() { 150.0 } else { 0.0 };
    let width = w.content_width() - photo_w;
    w.paragraph_within(&r.cover.title, 18.0, Face::Bold, 0.0, width, INK);
    w.space(2.0);
    w.paragraph_within(&r.cover.property, 13.0, Face::Regular, 0.0, width, INK);
    w.space(2.0);
    let fact = |label: &str| {
        r.cover
            .facts
            .iter()
            .find(|(l, _)| l == label)
            .map(|(_, v)| v.as_str())
            .unwrap_or("")
    };
    let line = [
        ("for ", fact("Client")),
        ("inspected ", fact("Date of inspection")),
        ("by ", fact("Inspector")),
    ]
    .iter()
    .filter(|(_, v)| !v.is_empty())
    .map(|(k, v)| format!("{k}{v}"))
    .chain(
        r.cover
            .facts
            .iter()
            .find(|(l, _)| l == "Code edition")
            .map(|(_, v)| format!("held to the {}", v.split(',').next().unwrap_or(v))),
    )
    .collect::<Vec<_>>()
    .join(", ");
    w.paragraph_within(&capitalised(&line), BODY, Face::Regular, 0.0, width, MUTED);
    if let Some(photo) = &r.cover.photo {
        let x = MARGIN + w.content_width() - 140.0;
        let h = super::cards::image_at(w, photo, x, top, 140.0, 90.0);
        let label = super::writer::fit(&caption(photo), SMALL - 0.5, Face::Regular, 140.0);
        w.text_at(
            x,
            top - h - SMALL * 1.1,
            &label,
            SMALL - 0.5,
            Face::Regular,
            MUTED,
        );
        w.y = w.y.min(top - h - SMALL * 1.6);
    }
    w.space(6.0);
    notice_box(w, &r.cover.notice);
}

fn capitalised(text: &str) -> String {
    let mut c = text.chars();
    c.next()
        .map(|f| f.to_uppercase().chain(c).collect())
        .unwrap_or_default()
}

pub fn notice_box(w: &mut Writer, text: &str) {
    let lines = fonts::wrap(text, SMALL + 0.5, Face::Regular, w.content_width() - 20.0);
    let size = SMALL + 0.5;
    let h = lines.len() as f32 * size * LEADING + 10.0;
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
    w.y = top - 5.0;
    for line in lines {
        w.y -= size * LEADING;
        w.text_at(
            MARGIN + 10.0,
            w.y + size * 0.25,
            &line,
            size,
            Face::Regular,
            INK,
        );
    }
    w.y = top - h - 4.0;
}

/// The first page: what must be done, by whom and how soon, then what could not be used.
pub fn actions(w: &mut Writer, r: &Report) {
    heading(w, "What needs to be done", 15.0);
    w.paragraph(&r.actions.lead, BODY, Face::Regular, 0.0, INK);
    for group in &r.actions.groups {
        w.ensure(70.0);
        w.space(8.0);
        let top = w.y;
        w.rect(
            MARGIN,
            top - 15.0,
            w.content_width(),
            15.0,
            Some(band(&group.label)),
            None,
        );
        w.text_at(
            MARGIN + 6.0,
            top - 11.0,
            &group.label,
            10.0,
            Face::Bold,
            INK,
        );
        w.y = top - 15.0;
        w.space(2.0);
        w.paragraph(&group.meaning, SMALL, Face::Regular, 0.0, MUTED);
        let full = matches!(group.label.as_str(), "Engineer first" | "Contractor soon");
        for item in &group.items {
            if full || !item.photos.is_empty() {
                action_item(w, item);
            } else {
                short_item(w, item);
            }
        }
    }
    problem_list(
        w,
        "Entries that could not be used (to be corrected)",
        &r.actions.input_problems,
    );
    problem_list(w, "Set aside by the inspector", &r.actions.set_aside);
}

/// A headed list of lines, each with where it is; nothing when empty.
fn problem_list(w: &mut Writer, title: &str, lines: &[ProblemLine]) {
    if lines.is_empty() {
        return;
    }
    heading(w, title, 11.0);
    for p in lines {
        w.ensure(BODY * 2.8);
        w.paragraph(&p.text, BODY, Face::Regular, 0.0, INK);
        w.paragraph(&p.location, SMALL, Face::Regular, 0.0, MUTED);
        w.space(2.0);
    }
}

/// A light band colour per priority, always with its words beside it.
fn band(label: &str) -> (f32, f32, f32) {
    match label {
        "Engineer first" => (0.96, 0.78, 0.74),
        "Contractor soon" => (0.98, 0.88, 0.68),
        "Measure first" => (0.82, 0.88, 0.96),
        _ => (0.88, 0.9, 0.86),
    }
}

fn action_item(w: &mut Writer, item: &ActionItem) {
    let number = format!("{}.", item.number);
    let x = 22.0;
    // One or two photos stand beside the text; more go in rows under it.
    let beside: &[Figure] = if item.photos.len() <= BESIDE {
        &item.photos
    } else {
        &[]
    };
    let photo_w = if beside.is_empty() { 0.0 } else { THUMB + 10.0 };
    let width = w.content_width() - x - photo_w;
    let lines = fonts::wrap(&item.sentence, BODY, Face::Bold, width).len() + 3;
    let photos_h = beside.len() as f32 * (THUMB * 0.75 + SMALL * 1.6);
    w.ensure((lines as f32 * BODY * LEADING + 6.0).max(photos_h + 4.0));
    w.space(4.0);
    let top = w.y;
    w.text_at(MARGIN, top - BODY * 1.05, &number, BODY, Face::Bold, INK);
    w.paragraph_within(&item.sentence, BODY, Face::Bold, x, width, INK);
    let mut facts = vec![item.location.clone(), item.basis.clone()];
    if !item.also_at.is_empty() {
        facts.push(format!("Also at {}", item.also_at.join("; ")));
    }
    if !item.drawings.is_empty() {
        let list = item
            .drawings
            .iter()
            .map(usize::to_string)
            .collect::<Vec<_>>()
            .join(", ");
        let word = if item.drawings.len() == 1 {
            "Drawing: Figure"
        } else {
            "Drawings: Figures"
        };
        facts.push(format!("{word} {list}"));
    }
    // Each photo's caption in full here; the thumbnail carries its number.
    facts.extend(item.photos.iter().map(caption));
    w.paragraph_within(&facts.join(". "), SMALL, Face::Regular, x, width, MUTED);
    if let Some(seen) = &item.noted_on_site {
        w.paragraph_within(
            &format!("Noted on site: {seen}"),
            SMALL + 0.5,
            Face::Regular,
            x,
            width,
            INK,
        );
    }
    w.paragraph_within(
        &format!("What to do: {}", item.what_to_do),
        SMALL + 0.5,
        Face::Regular,
        x,
        width,
        INK,
    );
    if let Some(note) = &item.note {
        w.paragraph_within(
            &format!("Inspector's note: {note}"),
            SMALL + 0.5,
            Face::Regular,
            x,
            width,
            INK,
        );
    }
    for o in &item.options {
        w.paragraph_within(
            &format!("Repair option: {o}"),
            SMALL,
            Face::Regular,
            x,
            width,
            INK,
        );
    }
    // The finding's photos stacked at the right, each with its figure number.
    let text_bottom = w.y;
    let mut y = top;
    let px = MARGIN + w.content_width() - THUMB;
    for photo in beside {
        let h = super::cards::image_at(w, photo, px, y, THUMB, THUMB * 0.75);
        let label = format!("Figure {}", photo.number);
        w.text_at(
            px,
            y - h - SMALL * 1.1,
            &label,
            SMALL - 0.5,
            Face::Regular,
            MUTED,
        );
        y -= h + SMALL * 1.6;
    }
    w.y = text_bottom.min(y);
    if beside.is_empty() && !item.photos.is_empty() {
        w.space(3.0);
        super::cards::photo_row_at(w, &item.photos, 5, x);
    }
    w.space(1.0);
}

/// One line for a finding to measure or watch: number, sentence and where, in small type.
fn short_item(w: &mut Writer, item: &ActionItem) {
    let text = format!(
        "{}. {} ({})",
        item.number,
        item.sentence.trim_end_matches('.'),
        item.location
    );
    w.space(1.5);
    w.paragraph(&text, SMALL, Face::Regular, 0.0, INK);
}

/// The contents, with the page each part starts on.
pub fn contents(w: &mut Writer, titles: &[String]) -> Vec<PageSlot> {
    heading(w, "Contents", 12.0);
    let mut slots = Vec::new();
    for title in titles {
        w.ensure(BODY * 1.4);
        w.y -= BODY * 1.4;
        let title = super::writer::fit(title, BODY, Face::Regular, w.content_width() - 40.0);
        w.text_at(MARGIN, w.y + 2.0, &title, BODY, Face::Regular, INK);
        slots.push(PageSlot {
            page: w.page_number(),
            y: w.y + 2.0,
        });
    }
    slots
}

/// Where a contents line's page number goes, written once the pages are known.
pub struct PageSlot {
    pub page: usize,
    pub y: f32,
}

/// Writes each part's page number into its contents line.
pub fn fill_contents(w: &mut Writer, slots: &[PageSlot], pages: &[usize]) {
    for (slot, page) in slots.iter().zip(pages) {
        let text = page.to_string();
        let x = MARGIN + w.content_width() - fonts::width(&text, BODY, Face::Regular);
        w.text_on_page(slot.page, x, slot.y, &text, BODY, Face::Regular, INK);
    }
}

/// The facts of the inspection and the counts of checks.
pub fn about(w: &mut Writer, r: &Report) {
    heading(w, "About this inspection", 12.0);
    // Client, inspector and date are on the first page and in the statement.
    let said_elsewhere = [
        "Client",
        "Inspector",
        "Company",
        "License",
        "Date of inspection",
    ];
    for (label, value) in r
        .cover
        .facts
        .iter()
        .filter(|(l, _)| !said_elsewhere.contains(&l.as_str()))
    {
        w.labelled(label, value, BODY, 110.0, 0.0);
        w.space(1.0);
    }
    w.space(4.0);
    w.paragraph(&r.actions.counts, SMALL, Face::Regular, 0.0, MUTED);
    if let Some(b) = &r.actions.benchmark {
        w.space(2.0);
        w.paragraph(&format!("{b}."), SMALL, Face::Regular, 0.0, MUTED);
    }
}

/// The inspector's statement with a line to sign on.
pub fn attestation(w: &mut Writer, r: &Report) {
    let a = &r.attestation;
    w.ensure(160.0);
    heading(w, "Inspector's statement", 12.0);
    w.paragraph(&a.statement, BODY, Face::Regular, 0.0, INK);
    w.space(6.0);
    for (label, value) in &a.lines {
        let value = if value.trim().is_empty() {
            "________________________"
        } else {
            value
        };
        w.labelled(label, value, BODY, 80.0, 0.0);
    }
    w.space(26.0);
    let y = w.y;
    w.line(&[(MARGIN, y), (MARGIN + 220.0, y)], INK, 0.6, None);
    w.text_at(MARGIN, y - 10.0, "Signature", SMALL, Face::Regular, MUTED);
    w.line(&[(MARGIN + 260.0, y), (MARGIN + 380.0, y)], INK, 0.6, None);
    w.text_at(
        MARGIN + 260.0,
        y - 10.0,
        "Date",
        SMALL,
        Face::Regular,
        MUTED,
    );
    w.y = y - 16.0;
}

/// For the professional reader: each numbered finding's rule, citation and checks, then the
/// assumptions, each once with the findings it is behind.
pub fn professional(w: &mut Writer, r: &Report) {
    heading(
        w,
        "For the professional: rules, checks and assumptions",
        11.0,
    );

    let size = SMALL - 1.0;
    // Findings resting on one check in one flowing paragraph; those with several checks
    // each on their own lines.
    let single = r
        .professional
        .iter()
        .filter(|n| n.checks.is_empty())
        .map(|n| format!("{}. {} ({})", n.number, n.rule_id, n.citation))
        .collect::<Vec<_>>()
        .join("; ");
    if !single.is_empty() {
        w.paragraph(&format!("{single}."), size, Face::Regular, 0.0, INK);
        w.space(2.0);
    }
    for note in r.professional.iter().filter(|n| !n.checks.is_empty()) {
        let line = format!(
            "{}. {} ({}): {}",
            note.number,
            note.rule_id,
            note.citation,
            note.checks.join("; ")
        );
        w.paragraph(&line, size, Face::Regular, 0.0, INK);
        w.space(1.0);
    }
    if !r.assumptions.is_empty() {
        heading(w, "Assumptions", 10.0);
        for (text, numbers) in &r.assumptions {
            let list = numbers
                .iter()
                .map(usize::to_string)
                .collect::<Vec<_>>()
                .join(", ");
            w.paragraph(&format!("{text} ({list})"), size, Face::Regular, 0.0, INK);
            w.space(1.0);
        }
    }
}

pub fn appendix(w: &mut Writer, r: &Report) {
    for section in &r.appendix {
        heading(w, &section.heading, 11.0);
        for p in &section.paragraphs {
            w.paragraph(p, SMALL, Face::Regular, 0.0, INK);
            w.space(2.0);
        }
    }
}

pub fn limits(w: &mut Writer, r: &Report) {
    heading(w, &r.limits.heading, 12.0);
    for p in &r.limits.paragraphs {
        w.paragraph(p, SMALL + 0.5, Face::Regular, 0.0, INK);
        w.space(2.0);
    }
}

/// A figure's caption: "Figure 3. Notch at the drain line".
pub fn caption(f: &Figure) -> String {
    match (f.number, f.caption.trim()) {
        (0, c) => c.to_string(),
        (n, "") => format!("Figure {n}"),
        (n, c) => format!("Figure {n}. {c}"),
    }
}
