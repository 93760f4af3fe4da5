//! Builds the report value from an inspection, its findings, the inspector's notes and where
//! the photos' report images are: the first page of actions, one section per area, the
//! inspector's statement, then the professional's notes, the method and the limits.

use super::areas::{area_section, AreaWork, Numbered};
use super::grouping::{group, Group, Parents};
use super::model::*;
use super::wording::{check_line, sentence};
use std::collections::HashMap;
use std::path::PathBuf;
use undercroft_engine::engine::Evaluation;
use undercroft_engine::finding::{benchmark_note, Basis, Finding, Status};
use undercroft_engine::model::FindingNote;
use undercroft_engine::model::Inspection;
use undercroft_engine::priority::Priority;
use undercroft_engine::validate::{members, MemberContext};
use undercroft_engine::words::count;
use undercroft_engine::SCREENING_NOTICE;

/// Where each photo's report-size image is, by photo id.
pub type PhotoFiles = HashMap<String, PathBuf>;

pub struct ReportInput<'a> {
    pub inspection: &'a Inspection,
    pub evaluation: &'a Evaluation,
    pub notes: &'a [FindingNote],
    pub photo_files: &'a PhotoFiles,
    pub paper: Paper,
    /// Show the computed repair options (sizes, spacings, supports): for a contractor or
    /// engineer reader, off for the client.
    pub repair_options: bool,
}

pub fn build_report(input: &ReportInput) -> Report {
    let i = input.inspection;
    let notes: HashMap<&str, &FindingNote> =
        input.notes.iter().map(|n| (n.key.as_str(), n)).collect();
    let (contexts, _) = members(i);
    let common = undercroft_engine::finding::Common {
        units: i.units,
        edition: std::sync::Arc::from(i.code_edition.as_str()),
        year_built: i.property.year_built,
    };
    let (lines, _) = undercroft_engine::load_path::girders(i, &common);
    let grouped = group(&input.evaluation.findings, &Parents::of(i), &notes);
    let mut work = AreaWork::new(input, &notes);
    let cover_photo = i
        .photos
        .iter()
        .find(|p| p.attached_to == i.id)
        .map(|p| work.photo(p, false));
    let areas: Vec<AreaSection> = i
        .areas
        .iter()
        .map(|area| {
            let ctxs: Vec<&MemberContext> = contexts
                .iter()
                .filter(|c| *c.place.area_id == area.id)
                .collect();
            let groups: Vec<&Group> = grouped
                .groups
                .iter()
                .filter(|g| *g.worst().place.area_id == area.id)
                .collect();
            area_section(&mut work, area, &ctxs, &groups, &lines)
        })
        .collect();
    let (professional, assumptions) = professional_notes(&work.numbered);
    let mut report = Report {
        paper: input.paper,
        running_head: format!(
            "{} - wood floor framing screening, {}",
            i.property.address, i.date
        ),
        meta: Meta {
            title: format!("Wood floor framing screening: {}", i.property.address),
            author: [i.inspector.name.as_str(), i.inspector.company.as_str()]
                .iter()
                .filter(|s| !s.trim().is_empty())
                .copied()
                .collect::<Vec<_>>()
                .join(", "),
            subject: format!(
                "Screening of the wood floor framing against the {}, inspected {}",
                i.code_edition, i.date
            ),
        },
        cover: cover(i, cover_photo),
        actions: actions(i, input.evaluation, &work, &grouped.set_aside),
        areas,
        attestation: attestation(i),
        professional,
        assumptions,
        appendix: super::appendix::appendix(i, &contexts),
        limits: super::appendix::limits(i),
    };
    super::renumber::in_reading_order(&mut report);
    report
}

fn cover(i: &Inspection, photo: Option<Figure>) -> Cover {
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
        photo,
    }
}

pub fn loads_text(l: &undercroft_engine::model::ResolvedLoads) -> String {
    format!(
        "{} psf live ({}), {} psf dead, live-load deflection L/{:.0}",
        l.live.0,
        l.room_use.describe(),
        l.dead.0,
        l.deflection_denominator
    )
}

fn actions(
    i: &Inspection,
    evaluation: &Evaluation,
    work: &AreaWork,
    set_aside: &[(&Finding, String)],
) -> Actions {
    let mut numbered: Vec<&Numbered> = work
        .numbered
        .iter()
        .filter(|n| n.group.priority.needs_action())
        .collect();
    numbered
        .sort_by(|a, b| super::grouping::order(&a.group, &b.group).then(a.number.cmp(&b.number)));
    let groups: Vec<ActionGroup> = Priority::ALL
        .into_iter()
        .filter(|p| p.needs_action())
        .map(|p| ActionGroup {
            label: p.label().to_string(),
            meaning: p.meaning().to_string(),
            items: numbered
                .iter()
                .filter(|n| n.group.priority == p)
                .map(|n| ActionItem {
                    number: n.number,
                    sentence: sentence(&n.group),
                    location: match n.group.findings.len() {
                        1 => n.group.worst().place.location.to_string(),
                        _ => n.group.place.clone(),
                    },
                    basis: n.basis.clone(),
                    also_at: n.also_at.clone(),
                    what_to_do: n.what_to_do.clone(),
                    noted_on_site: n.noted_on_site.clone(),
                    note: n.note.clone(),
                    options: n.options.clone(),
                    photos: n.photos.clone(),
                    drawings: n.drawings.clone(),
                })
                .collect(),
        })
        .filter(|g| !g.items.is_empty())
        .collect();
    let needing = |p: Priority| {
        groups
            .iter()
            .filter(|g| g.label == p.label())
            .map(|g| g.items.len())
            .sum::<usize>()
    };
    let lead = if groups.is_empty() {
        "Nothing measured is over or near a limit, and no condition was recorded for evaluation."
            .to_string()
    } else {
        format!(
            "{} for a licensed engineer, {} for a contractor, {} to measure before relying on this report, {} for the owner to watch. The numbers refer to the findings in the sections that follow.",
            count(needing(Priority::EngineerFirst), "finding", "findings"),
            count(needing(Priority::ContractorSoon), "finding", "findings"),
            count(needing(Priority::MeasureFirst), "finding", "findings"),
            count(needing(Priority::OwnerWatch), "finding", "findings"),
        )
    };
    Actions {
        lead,
        groups,
        input_problems: evaluation
            .problems
            .iter()
            .map(|p| ProblemLine {
                location: p.location.clone(),
                text: p.message.clone(),
            })
            .collect(),
        set_aside: set_aside
            .iter()
            .map(|(f, reason)| ProblemLine {
                location: f.place.location.to_string(),
                text: format!("{}: {reason}", f.title()),
            })
            .collect(),
        counts: counts(evaluation, set_aside.len()),
        benchmark: benchmark_note(&i.code_edition, i.property.year_built),
    }
}

/// Counts by basis and status, each basis kept apart, with correct plurals.
fn counts(evaluation: &Evaluation, set_aside: usize) -> String {
    let n = |b: Option<Basis>, s: Status| {
        evaluation
            .findings
            .iter()
            .filter(|f| f.rule_id() != "span-options")
            .filter(|f| f.status == s && b.is_none_or(|b| f.basis == b))
            .count()
    };
    let checks = |k: usize| count(k, "check", "checks");
    format!(
        "Code limits: {} over, {} near, {} within. Engineering references: {} beyond, {} near, {} within. Observed conditions: {} to be evaluated. {} not fully checked, {} not checked, {} set aside by the inspector.",
        checks(n(Some(Basis::CodeLimit), Status::OverLimit)),
        n(Some(Basis::CodeLimit), Status::NearLimit),
        n(Some(Basis::CodeLimit), Status::Within),
        checks(n(Some(Basis::Reference), Status::OverLimit)),
        n(Some(Basis::Reference), Status::NearLimit),
        n(Some(Basis::Reference), Status::Within),
        count(n(Some(Basis::Observed), Status::ToEvaluate), "condition", "conditions"),
        n(None, Status::Incomplete),
        n(None, Status::NotChecked),
        set_aside,
    )
}

fn attestation(i: &Inspection) -> Attestation {
    let name = if i.inspector.name.trim().is_empty() {
        "the inspector".to_string()
    } else {
        i.inspector.name.clone()
    };
    Attestation {
        statement: format!(
            "I, {name}, inspected the visible wood floor framing at {} on {}. This report states what I saw and measured that day and compares it with the {} and with wood mechanics. It is a screening, not an engineering evaluation or a repair design.",
            i.property.address, i.date, i.code_edition
        ),
        lines: vec![
            ("Inspector".to_string(), i.inspector.name.clone()),
            ("License".into(), i.inspector.license.clone()),
            ("Company".into(), i.inspector.company.clone()),
            ("Date".into(), i.date.clone()),
        ],
    }
}

/// Rule ids, citations and every check with its numbers, by finding number; and the
/// assumptions, each once with the numbers of the findings it is behind.
type Assumptions = Vec<(String, Vec<usize>)>;

fn professional_notes(numbered: &[Numbered]) -> (Vec<ProfessionalNote>, Assumptions) {
    let mut assumptions: Assumptions = Vec::new();
    let mut notes: Vec<ProfessionalNote> = numbered
        .iter()
        .map(|numbered| {
            let n = &numbered.number;
            let f = numbered.group.worst();
            // The benchmark note is said once, on the first pages.
            let benchmark = benchmark_note(&f.edition, f.year_built);
            for a in f.assumptions() {
                if Some(&a) == benchmark.as_ref() {
                    continue;
                }
                match assumptions.iter_mut().find(|(text, _)| *text == a) {
                    Some((_, numbers)) => numbers.push(*n),
                    None => assumptions.push((a, vec![*n])),
                }
            }
            ProfessionalNote {
                number: *n,
                rule_id: f.rule_id().to_string(),
                citation: f.citation(),
                // One check is the first page's sentence; several are all listed.
                checks: match f.checks.len() {
                    0 | 1 => Vec::new(),
                    _ => f.checks.iter().map(check_line).collect(),
                },
            }
        })
        .collect();
    notes.sort_by_key(|n| n.number);
    for (_, numbers) in &mut assumptions {
        numbers.sort_unstable();
    }
    (notes, assumptions)
}
