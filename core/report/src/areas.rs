//! One area's section: its numbered finding cards with their own photos, the drawings of its
//! joists and girder lines, the checks met as a compact table, and the photos left over.

use super::build::{loads_text, ReportInput};
use super::grouping::Group;
use super::model::*;
use super::wording::{checked_row, short_place, status_words};
use std::collections::{HashMap, HashSet};
use undercroft_engine::finding::Status;
use undercroft_engine::load_path::GirderContext;
use undercroft_engine::model::FindingNote;
use undercroft_engine::model::{Area, PhotoRef};
use undercroft_engine::validate::MemberContext;
use undercroft_engine::views::{girder_view, side_view, GirderView};

/// What is carried from area to area: finding and figure numbers, photos already placed,
/// and each numbered finding with its first photo (for the first page).
pub struct AreaWork<'i, 'a> {
    input: &'i ReportInput<'a>,
    notes: &'i HashMap<&'i str, &'i FindingNote>,
    next_finding: usize,
    next_figure: usize,
    placed: HashSet<String>,
    pub numbered: Vec<Numbered<'a>>,
}

impl<'i, 'a> AreaWork<'i, 'a> {
    pub fn new(input: &'i ReportInput<'a>, notes: &'i HashMap<&'i str, &'i FindingNote>) -> Self {
        AreaWork {
            input,
            notes,
            next_finding: 1,
            next_figure: 1,
            placed: HashSet::new(),
            numbered: Vec::new(),
        }
    }

    /// A photo as a figure, numbered unless it is the cover's.
    pub fn photo(&mut self, p: &PhotoRef, numbered: bool) -> Figure {
        self.placed.insert(p.id.clone());
        let number = if numbered { self.figure() } else { 0 };
        Figure {
            number,
            caption: p.caption.clone(),
            file: self.input.photo_files.get(&p.id).cloned(),
            marks: p.marks.clone(),
        }
    }

    fn figure(&mut self) -> usize {
        self.next_figure += 1;
        self.next_figure - 1
    }

    /// The photos attached to any of `owners` that are not placed yet, numbered.
    fn photos_of(&mut self, owners: &HashSet<&str>) -> Vec<Figure> {
        let inspection = self.input.inspection;
        let mut out = Vec::new();
        for p in &inspection.photos {
            if owners.contains(p.attached_to.as_str()) && !self.placed.contains(&p.id) {
                out.push(self.photo(p, true));
            }
        }
        out
    }
}

pub fn area_section<'a>(
    work: &mut AreaWork<'_, 'a>,
    area: &Area,
    ctxs: &[&MemberContext],
    groups: &[&Group<'a>],
    lines: &[GirderContext],
) -> AreaSection {
    let input = work.input;
    let i = input.inspection;
    let loads = area.loads.resolve(&i.loads);
    let kind = serde_json::to_value(area.kind)
        .ok()
        .and_then(|v| v.as_str().map(str::to_string))
        .unwrap_or_default();
    // The inspector's notes on the area's observations, by observation id.
    let seen_notes: HashMap<&str, &str> = ctxs
        .iter()
        .flat_map(|c| c.observations.iter())
        .map(|o| (&*o.id, o.note.trim()))
        .filter(|(_, note)| !note.is_empty())
        .collect();
    let first_number = work.next_finding;
    let mut findings = Vec::new();
    let mut checked = Vec::new();
    for g in groups {
        if g.status() == Status::Within && !g.priority.needs_action() {
            checked.push(checked_row(g, &area.name));
        } else {
            let row = number_group(work, g, &seen_notes, &area.name);
            // Findings that need action are told in full on the first pages; the area's
            // table keeps those the inspector said need none.
            if !g.priority.needs_action() {
                findings.push(row);
            }
        }
    }
    let checked = merge_alike(checked);
    // Drawings: girder lines, then joists with notches, holes or sag readings.
    let girders: Vec<Drawing<GirderView>> = lines
        .iter()
        .filter(|g| g.area.id == area.id)
        .map(|g| Drawing {
            figure: work.figure(),
            view: girder_view(g, &input.evaluation.findings),
        })
        .collect();
    let mut views = Vec::new();
    let mut drawn: HashMap<String, usize> = HashMap::new();
    for ctx in ctxs {
        if let Some(view) = side_view(ctx, &area.name, input.evaluation) {
            let figure = work.figure();
            drawn.insert(ctx.place.member_id.to_string(), figure);
            views.push(Drawing { figure, view });
        }
    }
    for (girder, drawing) in area.girders.iter().zip(&girders) {
        drawn.insert(girder.id.clone(), drawing.figure);
        for post in &girder.posts {
            drawn.insert(post.id.clone(), drawing.figure);
        }
    }
    for n in work
        .numbered
        .iter_mut()
        .filter(|n| n.number >= first_number)
    {
        let mut figures: Vec<usize> = n
            .group
            .findings
            .iter()
            .filter_map(|f| drawn.get(&*f.place.member_id).copied())
            .collect();
        figures.sort_unstable();
        figures.dedup();
        if let Some(row) = findings.iter_mut().find(|r| r.number == n.number) {
            row.figures.extend(&figures);
        }
        n.drawings = figures;
    }
    // The photos left: the area's own, and any of its parts not placed with a finding.
    let mut owners: HashSet<&str> = HashSet::from([area.id.as_str()]);
    for girder in &area.girders {
        owners.insert(&girder.id);
        owners.extend(girder.posts.iter().map(|p| p.id.as_str()));
    }
    for ctx in ctxs {
        owners.insert(&ctx.place.member_id);
        owners.extend(ctx.observations.iter().map(|o| &*o.id));
    }
    let photos = work.photos_of(&owners);
    AreaSection {
        heading: area.name.clone(),
        about: format!("{kind}; {}", loads_text(&loads)),
        notes: area.notes.clone(),
        findings,
        checked,
        views,
        girders,
        photos,
    }
}

/// A numbered finding with what its first-page item needs.
#[derive(Debug, Clone)]
pub struct Numbered<'a> {
    pub number: usize,
    pub group: Group<'a>,
    pub photos: Vec<Figure>,
    pub drawings: Vec<usize>,
    pub what_to_do: String,
    pub noted_on_site: Option<String>,
    pub note: Option<String>,
    pub options: Vec<String>,
    pub also_at: Vec<String>,
    pub basis: String,
}

/// Numbers a group, places its photos, and gives its table row.
fn number_group<'a>(
    work: &mut AreaWork<'_, 'a>,
    g: &Group<'a>,
    seen_notes: &HashMap<&str, &str>,
    area_name: &str,
) -> NotedRow {
    let input = work.input;
    let f = g.worst();
    let number = work.next_finding;
    work.next_finding += 1;
    // The finding's own photos: those of its observations, and for one that needs action,
    // those of its members (a joist's, a girder's, a post's).
    let mut owners: HashSet<&str> = g
        .findings
        .iter()
        .filter_map(|f| f.observation_id.as_deref())
        .collect();
    let mut photos = work.photos_of(&owners);
    if g.priority.needs_action() {
        owners = g.findings.iter().map(|f| &*f.place.member_id).collect();
        photos.extend(work.photos_of(&owners));
    }
    let note = work.notes.get(f.key().as_str()).copied();
    let seen = f
        .observation_id
        .as_deref()
        .and_then(|id| seen_notes.get(id).copied());
    let mut options = Vec::new();
    if input.repair_options {
        options.extend(f.options());
        if matches!(f.rule_id(), "joist-span" | "deck-joist-span") {
            let members: HashSet<&str> = g.findings.iter().map(|f| &*f.place.member_id).collect();
            for o in
                input.evaluation.findings.iter().filter(|o| {
                    o.rule_id() == "span-options" && members.contains(&*o.place.member_id)
                })
            {
                options.extend(o.options());
            }
        }
        options.dedup();
    }
    let short = |location: &str| short_place(location, &g.place);
    let also_at = g
        .findings
        .iter()
        .skip(1)
        .map(|other| match other.measured() {
            Some(m) if other.ratio().is_some() => {
                format!("{} ({})", short(&other.place.location), m.text)
            }
            _ => short(&other.place.location),
        })
        .collect();
    let citation = super::wording::short_citation(f);
    // The sentence says over or near and whether it is the code; the line names the
    // provision, or the basis where no provision applies.
    let basis = if citation.is_empty() {
        status_words(f.basis, f.status).to_string()
    } else {
        citation
    };
    let mut detail = noted_detail(f);
    if let Some(seen) = seen {
        detail = format!("{detail}. Noted on site: {seen}");
    }
    let noted_on_site = seen.map(str::to_string);
    let row = NotedRow {
        number,
        status: status_words(f.basis, f.status).to_string(),
        what: f.title().to_string(),
        location: match g.count_text() {
            Some(count) => format!("{} ({count})", short_place(&g.place, area_name)),
            None => short_place(&f.place.location, area_name),
        },
        detail,
        figures: photos.iter().map(|p| p.number).collect(),
    };
    work.numbered.push(Numbered {
        number,
        group: g.clone(),
        photos,
        drawings: Vec::new(),
        what_to_do: note
            .and_then(|n| n.recommendation.clone())
            .unwrap_or_else(|| {
                let text = f.recommendation();
                // The options are a professional's aid, in the report only when turned on.
                if input.repair_options {
                    text
                } else {
                    text.replace("; options to discuss are listed.", ".")
                }
            }),
        noted_on_site,
        note: note.map(|n| n.note.clone()).filter(|n| !n.is_empty()),
        options,
        also_at,
        basis,
    });
    row
}

/// Rows of one check with the same measure and limit made one, their places listed.
fn merge_alike(rows: Vec<CheckedRow>) -> Vec<CheckedRow> {
    let mut out: Vec<CheckedRow> = Vec::new();
    for row in rows {
        match out
            .iter_mut()
            .find(|r| r.what == row.what && r.measured == row.measured && r.limit == row.limit)
        {
            Some(same) => same.location = format!("{}; {}", same.location, row.location),
            None => out.push(row),
        }
    }
    out
}

/// Measured against the limit, or why it was not (fully) checked.
fn noted_detail(f: &undercroft_engine::finding::Finding) -> String {
    if let Some(why) = &f.not_checked_because {
        return format!("Not checked: {why}");
    }
    match f.governing_check() {
        Some(c) if c.ratio.is_some() => format!(
            "{} {}; limit {} {}",
            c.what,
            c.measured_shown().text,
            match c.bound {
                undercroft_engine::finding::Bound::AtMost => "at most",
                undercroft_engine::finding::Bound::AtLeast => "at least",
            },
            c.limit_shown().text
        ),
        _ => f.summary(),
    }
}
