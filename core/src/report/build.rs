//! Builds the report value from an inspection, its findings, the inspector's notes and where
//! the photos' report images are.

use super::model::*;
use super::side_view::side_view;
use crate::engine::Evaluation;
use crate::finding::{benchmark_note, Basis, Finding, Status};
use crate::lumber::{design_values, DesignValues};
use crate::model::{Inspection, PhotoRef};
use crate::rules::Detail;
use crate::store::FindingNote;
use crate::units::{format_dimension, format_length, Length, UnitSystem};
use crate::validate::{members, MemberContext};
use crate::SCREENING_NOTICE;
use std::collections::{HashMap, HashSet};
use std::path::PathBuf;

/// Where each photo's report-size image is, by photo id.
pub type PhotoFiles = HashMap<String, PathBuf>;

pub struct ReportInput<'a> {
    pub inspection: &'a Inspection,
    pub evaluation: &'a Evaluation,
    pub notes: &'a [FindingNote],
    pub photo_files: &'a PhotoFiles,
    pub paper: Paper,
}

pub fn build_report(input: &ReportInput) -> Report {
    let i = input.inspection;
    let notes: HashMap<&str, &FindingNote> =
        input.notes.iter().map(|n| (n.key.as_str(), n)).collect();
    let (contexts, _) = members(i);
    let common = crate::finding::Common {
        units: i.units,
        edition: std::sync::Arc::from(i.code_edition.as_str()),
        year_built: i.property.year_built,
    };
    let (lines, _) = crate::load_path::girders(i, &common);
    let mut placed = HashSet::new();
    let areas = i
        .areas
        .iter()
        .map(|area| {
            let ctxs: Vec<&MemberContext> = contexts
                .iter()
                .filter(|c| *c.place.area_id == area.id)
                .collect();
            area_section(input, area, &ctxs, &lines, &notes, &mut placed)
        })
        .collect();
    Report {
        paper: input.paper,
        running_head: format!(
            "{} - wood floor framing screening, {}",
            i.property.address, i.date
        ),
        cover: cover(i),
        summary: summary(i, input.evaluation, &notes),
        areas,
        appendix: appendix(i, &contexts),
        limits: limits(i),
    }
}

fn cover(i: &Inspection) -> Cover {
    let mut facts = vec![
        ("Client".to_string(), i.client.name.clone()),
        ("Inspector".into(), i.inspector.name.clone()),
        ("Company".into(), i.inspector.company.clone()),
        ("License".into(), i.inspector.license.clone()),
        ("Date of inspection".into(), i.date.clone()),
        ("Conditions".into(), i.conditions.clone()),
        (
            "Code edition".into(),
            match benchmark_note(&i.code_edition, i.property.year_built) {
                Some(_) => format!(
                    "{}, used as a benchmark of current practice{}",
                    i.code_edition,
                    i.property
                        .year_built
                        .map(|y| format!(" (the house was built in {y})"))
                        .unwrap_or_default()
                ),
                None => i.code_edition.clone(),
            },
        ),
        (
            "Local amendments".into(),
            if i.local_amendments.is_empty() {
                "none given to the inspector".into()
            } else {
                i.local_amendments.clone()
            },
        ),
        (
            "Loads".into(),
            loads_text(&i.loads.resolve(&Default::default())),
        ),
    ];
    if let Some(year) = i.property.year_built {
        facts.insert(0, ("Year built".into(), year.to_string()));
    }
    facts.retain(|(_, v)| !v.trim().is_empty());
    Cover {
        title: "Wood floor framing: screening report".into(),
        property: i.property.address.clone(),
        facts,
        notice: SCREENING_NOTICE.into(),
    }
}

fn loads_text(l: &crate::model::ResolvedLoads) -> String {
    format!(
        "{} psf live ({}), {} psf dead, live-load deflection L/{:.0}",
        l.live.0,
        l.room_use.describe(),
        l.dead.0,
        l.deflection_denominator
    )
}

fn not_applicable<'n>(f: &Finding, notes: &HashMap<&str, &'n FindingNote>) -> Option<&'n str> {
    notes
        .get(f.key().as_str())
        .and_then(|n| n.not_applicable_reason.as_deref())
}

/// The summary's groups, in order: what each holds and its title.
const SUMMARY_GROUPS: [(Basis, Status, &str); 6] = [
    (Basis::CodeLimit, Status::OverLimit, "Over a code limit"),
    (
        Basis::Observed,
        Status::ToEvaluate,
        "Observed conditions to be evaluated",
    ),
    (
        Basis::Reference,
        Status::OverLimit,
        "Beyond an engineering reference (not a code requirement)",
    ),
    (
        Basis::CodeLimit,
        Status::NearLimit,
        "Near a code limit (90 % of it or more)",
    ),
    (
        Basis::Reference,
        Status::NearLimit,
        "Near an engineering reference (90 % of it or more)",
    ),
    (
        Basis::CodeLimit,
        Status::Incomplete,
        "Not fully checked (a limit could not be checked)",
    ),
];

fn summary(
    i: &Inspection,
    evaluation: &Evaluation,
    notes: &HashMap<&str, &FindingNote>,
) -> Summary {
    // The group's title says the status; the left column holds the use of the limit, or a
    // short word where there is no ratio.
    let line = |f: &Finding| SummaryLine {
        use_text: match (f.status, f.use_text()) {
            (Status::OverLimit | Status::NearLimit, Some(u)) => u,
            (Status::OverLimit, None) => "over".into(),
            (Status::ToEvaluate, _) => "evaluate".into(),
            (Status::Incomplete, _) => "partial".into(),
            _ => f.status_label().to_string(),
        },
        text: format!("{}: {}", f.title(), f.summary()),
        location: f.place.location.to_string(),
    };
    let mut groups: Vec<SummaryGroup> = SUMMARY_GROUPS
        .iter()
        .map(|(_, _, title)| SummaryGroup {
            title: title.to_string(),
            lines: vec![],
        })
        .collect();
    let mut set_aside = Vec::new();
    let mut counted: HashMap<(Basis, Status), usize> = HashMap::new();
    for f in evaluation.by_attention() {
        if let Some(reason) = not_applicable(f, notes) {
            set_aside.push(SummaryLine {
                use_text: "set aside".into(),
                text: format!("{}: {reason}", f.title()),
                location: f.place.location.to_string(),
            });
            continue;
        }
        *counted.entry((f.basis, f.status)).or_default() += 1;
        // Not fully checked findings of any basis share one group.
        let basis = if f.status == Status::Incomplete {
            Basis::CodeLimit
        } else {
            f.basis
        };
        if let Some(g) = SUMMARY_GROUPS
            .iter()
            .position(|(b, s, _)| *b == basis && *s == f.status)
        {
            groups[g].lines.push(line(f));
        }
    }
    let n = |b: Basis, s: Status| counted.get(&(b, s)).copied().unwrap_or(0);
    let across = |s: Status| {
        [Basis::CodeLimit, Basis::Reference, Basis::Observed]
            .into_iter()
            .map(|b| n(b, s))
            .sum::<usize>()
    };
    let counts = format!(
        "Code limits: {} over, {} near, {} within. Engineering references: {} beyond, {} near, {} within. Observed conditions: {} to be evaluated. {} not fully checked, {} not checked, {} set aside by the inspector.",
        n(Basis::CodeLimit, Status::OverLimit),
        n(Basis::CodeLimit, Status::NearLimit),
        n(Basis::CodeLimit, Status::Within),
        n(Basis::Reference, Status::OverLimit),
        n(Basis::Reference, Status::NearLimit),
        n(Basis::Reference, Status::Within),
        n(Basis::Observed, Status::ToEvaluate),
        across(Status::Incomplete),
        across(Status::NotChecked),
        set_aside.len()
    );
    groups.push(SummaryGroup {
        title: "Entries that could not be used (check and correct them)".into(),
        lines: evaluation
            .problems
            .iter()
            .map(|p| SummaryLine {
                use_text: "input".into(),
                text: p.message.clone(),
                location: p.location.clone(),
            })
            .collect(),
    });
    groups.push(SummaryGroup {
        title: "Set aside by the inspector".into(),
        lines: set_aside,
    });
    groups.retain(|g| !g.lines.is_empty());
    Summary {
        counts,
        benchmark: benchmark_note(&i.code_edition, i.property.year_built),
        groups,
    }
}

fn area_section(
    input: &ReportInput,
    area: &crate::model::Area,
    ctxs: &[&MemberContext],
    lines: &[crate::load_path::GirderContext],
    notes: &HashMap<&str, &FindingNote>,
    placed: &mut HashSet<String>,
) -> AreaSection {
    let i = input.inspection;
    let loads = area.loads.resolve(&i.loads);
    let kind = serde_json::to_value(area.kind)
        .ok()
        .and_then(|v| v.as_str().map(str::to_string))
        .unwrap_or_default();
    let photos_of = |owner: &str, placed: &mut HashSet<String>| -> Vec<PhotoSlot> {
        i.photos
            .iter()
            .filter(|p| p.attached_to == owner && placed.insert(p.id.clone()))
            .map(|p| slot(p, input.photo_files))
            .collect()
    };
    let mut findings: Vec<&Finding> = input
        .evaluation
        .findings
        .iter()
        .filter(|f| *f.place.area_id == area.id)
        .collect();
    findings.sort_by(|a, b| {
        a.status.cmp(&b.status).then(
            b.ratio()
                .unwrap_or(0.0)
                .total_cmp(&a.ratio().unwrap_or(0.0)),
        )
    });
    // Options to discuss follow the over-span they are about.
    let options: Vec<&Finding> = findings
        .iter()
        .copied()
        .filter(|f| f.rule_id() == "span-options")
        .collect();
    findings.retain(|f| f.rule_id() != "span-options");
    for o in options {
        let after = findings
            .iter()
            .position(|f| f.rule_id() == "joist-span" && f.place.member_id == o.place.member_id);
        findings.insert(after.map_or(findings.len(), |p| p + 1), o);
    }
    // The inspector's notes on the area's observations, by observation id, looked up once.
    let seen_notes: HashMap<&str, &str> = ctxs
        .iter()
        .flat_map(|c| c.observations.iter())
        .map(|o| (&*o.id, o.note.trim()))
        .filter(|(_, note)| !note.is_empty())
        .collect();
    let blocks = findings
        .iter()
        .map(|f| {
            let owner = f.observation_id.as_deref().map(str::to_string).or_else(|| {
                // A member's photos go with its span finding; a girder's or post's with
                // its first (worst) finding.
                (f.rule_id() == "joist-span" || matches!(f.detail, Detail::Path(_)))
                    .then(|| f.place.member_id.to_string())
            });
            let photos = owner.map(|o| photos_of(&o, placed)).unwrap_or_default();
            let seen = f
                .observation_id
                .as_deref()
                .and_then(|id| seen_notes.get(id).copied());
            finding_block(f, notes, seen, photos)
        })
        .collect();
    let mut photos = photos_of(&area.id, placed);
    for girder in &area.girders {
        photos.extend(photos_of(&girder.id, placed));
        for post in &girder.posts {
            photos.extend(photos_of(&post.id, placed));
        }
    }
    for ctx in ctxs {
        photos.extend(photos_of(&ctx.place.member_id, placed));
        for o in &ctx.observations {
            photos.extend(photos_of(&o.id, placed));
        }
    }
    AreaSection {
        heading: area.name.clone(),
        about: format!("{kind}; {}", loads_text(&loads)),
        notes: area.notes.clone(),
        members: ctxs
            .iter()
            .filter(|c| c.report_span)
            .map(|c| member_row(c, &area.name))
            .collect(),
        findings: blocks,
        views: ctxs
            .iter()
            .filter_map(|c| side_view(c, &area.name, input.evaluation))
            .collect(),
        girders: lines
            .iter()
            .filter(|g| g.area.id == area.id)
            .map(|g| super::girder_view::girder_view(g, &input.evaluation.findings))
            .collect(),
        photos,
    }
}

fn slot(p: &PhotoRef, files: &PhotoFiles) -> PhotoSlot {
    PhotoSlot {
        caption: p.caption.clone(),
        file: files.get(&p.id).cloned(),
    }
}

fn member_row(ctx: &MemberContext, area_name: &str) -> MemberRow {
    let u = ctx.units;
    let name = ctx
        .place
        .location
        .strip_prefix(area_name)
        .map(|s| s.trim_start_matches(" > "))
        .unwrap_or(&ctx.place.location)
        .to_string();
    let length = |l: Option<Length>| l.map(|l| format_length(l, u)).unwrap_or_else(|| "-".into());
    let size = match (&ctx.section, ctx.kind.is_engineered()) {
        (_, true) => ctx.kind.name().to_string(),
        (Some(s), _) if s.rough_sawn => format!(
            "{} x {} (measured)",
            format_dimension(s.thickness, u),
            format_dimension(s.depth, u)
        ),
        (Some(s), _) => s.nominal.to_string(),
        (None, _) => "-".into(),
    };
    let species_grade = ctx
        .lumber
        .as_ref()
        .map(|l| format!("{}, {}", l.species.name(), l.grade))
        .unwrap_or_else(|| "-".into());
    let (allowable, use_text, governs) = match (&ctx.span, ctx.clear_span()) {
        (Some(r), Some(span)) => (
            format_length(r.allowable_rounded(), u),
            format!("{:.0} %", span / r.allowable_rounded() * 100.0),
            format!(
                "{}{}",
                r.governing.name(),
                if ctx.is_wet() { " (wet)" } else { "" }
            ),
        ),
        _ => ("not checked".into(), "-".into(), "-".into()),
    };
    MemberRow {
        member: name,
        size,
        species_grade,
        spacing: ctx
            .framing
            .spacing
            .map(|s| format_dimension(s, u))
            .unwrap_or_else(|| "-".into()),
        span: length(ctx.clear_span()),
        allowable,
        use_text,
        governs,
    }
}

fn finding_block(
    f: &Finding,
    notes: &HashMap<&str, &FindingNote>,
    seen: Option<&str>,
    photos: Vec<PhotoSlot>,
) -> FindingBlock {
    let note = notes.get(f.key().as_str());
    let mut facts = Vec::new();
    if let Some(seen) = seen {
        facts.push(("Noted on site".to_string(), seen.to_string()));
    }
    if let Some(g) = f.governing_check() {
        let bound = match (g.bound, g.ratio) {
            (crate::finding::Bound::AtLeast, Some(_)) => "at least ",
            (crate::finding::Bound::AtMost, Some(_)) => "at most ",
            _ => "",
        };
        facts.push((
            "Measured".to_string(),
            format!("{} ({})", g.measured_shown().text, g.what),
        ));
        facts.push(("Limit".into(), format!("{bound}{}", g.limit_shown().text)));
    }
    if let Some(u) = f.use_text() {
        facts.push(("Use of the limit".into(), u));
    }
    if let Some(why) = &f.not_checked_because {
        facts.push(("Not checked".into(), why.to_string()));
    }
    facts.push(("Basis".into(), f.basis.name().to_string()));
    facts.push(("Cites".into(), f.citation()));
    FindingBlock {
        badge: match (f.status, f.use_text()) {
            (Status::OverLimit | Status::NearLimit | Status::Within, Some(u)) => {
                format!("{} {u}", f.status_label())
            }
            _ => f.status_label().to_string(),
        },
        over: f.status == Status::OverLimit,
        title: f.title().to_string(),
        rule_id: f.rule_id().to_string(),
        location: f.place.location.to_string(),
        summary: f.summary(),
        facts,
        assumptions: f.assumptions(),
        options: f.options(),
        recommendation: note
            .and_then(|n| n.recommendation.clone())
            .unwrap_or_else(|| f.recommendation()),
        note: note.map(|n| n.note.clone()).filter(|n| !n.is_empty()),
        not_applicable: note.and_then(|n| n.not_applicable_reason.clone()),
        photos,
    }
}

fn appendix(i: &Inspection, contexts: &[MemberContext]) -> Vec<TextSection> {
    let mut values: Vec<String> = Vec::new();
    let mut seen = HashSet::new();
    for ctx in contexts {
        let Some(l) = &ctx.lumber else { continue };
        let grade = l.grade.grade_for_design();
        if !seen.insert((l.species, grade, l.section.nominal)) {
            continue;
        }
        if let Some(v) = design_values(l.species, grade, l.section.nominal) {
            values.push(design_line(
                &format!(
                    "{} {} {}",
                    l.species.name(),
                    grade.name(),
                    l.section.nominal
                ),
                v,
            ));
        }
    }
    values.sort();
    let units_note = match i.units {
        UnitSystem::Imperial => "Lengths in feet and inches, rounded to 1/16 in.",
        UnitSystem::Metric => "Lengths in millimetres, rounded to 1 mm.",
    };
    vec![
        TextSection {
            heading: "Method".into(),
            paragraphs: vec![
                "Each joist is checked as a simply supported beam under uniform load, as the residential code's span tables are computed: the allowable span is the least of the spans that bending (w L^2 / 8 <= Fb' S, total load), live-load deflection (5 w L^4 / 384 E' I <= L / n, live load) and shear (w L / 2 <= 2/3 Fv' b d, total load) allow. The span is held to the nearest inch, as the printed tables are, and compared with the measured clear span, face to face of the supports.".into(),
                "Fb' = Fb x CD x CM x CF x Cr; Fv' = Fv x CD x CM; E' = E x CM. CD = 1.0 (occupancy live load, NDS Table 2.3.2); Cr = 1.15 for repetitive members at 24 in or less (NDS 4.3.9); CF by width (NDS Supplement Table 4A; included in the southern pine values of Table 4B); CM wet-service factors when a moisture reading is over 19 % (NDS Supplement Table 4A: Fb 0.85 unless Fb x CF <= 1150 psi, Fv 0.97, E 0.9, Fc-perp 0.67).".into(),
                "Bearing needed for the reaction: R = w L / 2 over Fc-perp' times the joist thickness (NDS 3.10.2, Cb taken as 1.0). Notches, holes, bearing, laps, end restraint and bridging are held to IRC R502.6, R502.6.1, R502.7, R502.7.1, R502.8.1 and R502.8.2. Measured sag is compared with the L/360 floor reference of Table R301.7, which is a limit on calculated live-load deflection, not on long-term sag.".into(),
                units_note.into(),
            ],
        },
        TextSection {
            heading: "Loads".into(),
            paragraphs: vec![
                "Live load from the room use above (IRC Table R301.5): 30 psf over sleeping rooms, 40 psf over other rooms. Dead load 10 psf, or 20 psf under heavy finishes such as tile (the dead loads of IRC Tables R502.3.1(1) and (2)). Each area's loads are stated with it.".into(),
            ],
        },
        TextSection { heading: "Design values used (psi)".into(), paragraphs: if values.is_empty() { vec!["No sawn lumber was checked.".into()] } else { values } },
        TextSection {
            heading: "Assumptions".into(),
            paragraphs: vec![
                "Lumber without a visible grade stamp is designed as No. 3 of its species group, a conservative default: a visible stamp may allow more.".into(),
                "Rough-sawn lumber is designed with its measured section and the design values of dressed lumber of the same species and grade.".into(),
                "Engineered products (I-joists, structural composite lumber, floor trusses, glulam) are not checked against sawn-lumber tables: their spans and holes follow the maker's instructions.".into(),
            ],
        },
        TextSection {
            heading: "Sources".into(),
            paragraphs: vec![
                format!("International Residential Code, {} edition as stated on the cover.", i.code_edition),
                "National Design Specification (NDS) for Wood Construction, 2018, and its Supplement: Design Values for Wood Construction (Tables 1B, 4A, 4B).".into(),
                "USDA Forest Products Laboratory, Wood Handbook (FPL-GTR-282), chapters on moisture and on biodeterioration.".into(),
            ],
        },
    ]
}

fn design_line(name: &str, v: &DesignValues) -> String {
    format!(
        "{name}: Fb {:.0}, Fv {:.0}, Fc-perp {:.0}, E {:.0}; {}",
        v.fb.0,
        v.fv.0,
        v.fc_perp.0,
        v.e.0,
        v.source_short(),
    )
}

fn limits(i: &Inspection) -> TextSection {
    TextSection {
        heading: "Limits of this inspection".into(),
        paragraphs: vec![
            SCREENING_NOTICE.into(),
            "Only framing that was visible and reachable on the day was looked at. Insulation, finishes, stored goods and soil can hide damage; hidden conditions are not reported.".into(),
            "Measurements were taken with a tape, a moisture meter and a line; they carry the errors of those tools. Species and grade were read from grade stamps where visible.".into(),
            format!(
                "Findings compare measurements with the prescriptive limits of the {} and with wood mechanics (NDS). Local codes and amendments govern where they differ{}.",
                i.code_edition,
                if i.local_amendments.is_empty() { String::new() } else { format!(" (told to the inspector: {})", i.local_amendments) }
            ),
            "This report is not an engineering evaluation and does not design repairs. Refer every structural concern, and any finding over a limit, to a licensed professional (a structural engineer or architect) before repairs, jacking or added loads.".into(),
        ],
    }
}
