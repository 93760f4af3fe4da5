//! Turns the inspection as entered into validated members the rules can check, and lists the
//! input problems found on the way. Never fails: what cannot be used is reported and skipped.

use crate::finding::{Common, FindingBuilder, Place, RuleInfo};
use crate::lumber::{GradeChoice, LoadDuration, Section, Species};
use crate::mechanics::{allowable_span, SpanInput, SpanResult};
use crate::model::{
    AreaKind, Framing, Inspection, LoadSettings, MemberKind, Observation, ObservationKind,
    ResolvedLoads, SiteConditions,
};
use crate::units::{Length, UnitSystem};
use serde::Serialize;
use std::sync::Arc;

/// Moisture content above which wood is in wet service.
/// Source: NDS (2018) Supplement Table 4A adjustment factors (wet service: moisture content
/// over 19 % for an extended period).
pub const WET_SERVICE_MC_PERCENT: f64 = 19.0;

/// The on-centre layouts of the printed span tables.
/// Source: IRC 2018 Tables R502.3.1(1) and R502.3.1(2), columns 12, 16, 19.2 and 24 in.
pub const STANDARD_LAYOUTS: [f64; 4] = [12.0, 16.0, 19.2, 24.0];
/// A taped spacing within this of a standard layout is that layout, framed with the usual
/// scatter of a tape and a crown. Common practice, no source.
const LAYOUT_TOLERANCE_IN: f64 = 0.75;
/// An end notch is one over or at the bearing: its near side within this of the support
/// face (a tape's reading at a bearing). Common practice, no source.
const END_NOTCH_TOLERANCE_IN: f64 = 0.5;

/// The standard layout a taped spacing stands for, if it is within framing tolerance of one.
pub fn layout_of(taped: Length) -> Option<f64> {
    STANDARD_LAYOUTS
        .into_iter()
        .find(|l| (taped.in_inches() - l).abs() <= LAYOUT_TOLERANCE_IN)
}

/// Why an observation cannot be what the inspector meant, given the member's clear span:
/// a position beyond the span, or a notch "at the end" that is entered away from it.
/// Forms refuse it; in files it is an input problem and the observation is not used.
pub fn observation_problem(kind: &ObservationKind, span: Option<Length>) -> Option<String> {
    let fmt = |l: Length| crate::units::format_length(l, crate::units::UnitSystem::Imperial);
    let beyond = |what: &str, at: Length| -> Option<String> {
        let span = span?;
        (at.in_inches() > span.in_inches() + 1e-9).then(|| {
            format!(
                "{what} {} from the support is beyond the clear span of {}; check the entry",
                fmt(at),
                fmt(span)
            )
        })
    };
    match kind {
        ObservationKind::Notch {
            at_end,
            from_support: Some(from),
            length,
            ..
        } => {
            if *at_end && from.in_inches() > END_NOTCH_TOLERANCE_IN {
                return Some(format!(
                    "a notch marked at the end is entered {} from the support: an end notch is over or at the bearing, so either the distance or \"at the end\" is wrong",
                    fmt(*from)
                ));
            }
            beyond("the far side of the notch", *from + *length)
        }
        ObservationKind::Hole { from_support, .. } => beyond("the hole", *from_support),
        ObservationKind::Sag { readings, .. } => {
            readings.iter().find_map(|r| beyond("a sag reading", r.at))
        }
        ObservationKind::Damage {
            reach: Some(reach), ..
        } => beyond("the damage reaching", *reach),
        _ => None,
    }
}

/// Something entered that could not be used as it is.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct Problem {
    pub location: String,
    pub message: String,
}

/// The lumber of a sawn member, validated.
#[derive(Debug, Clone, PartialEq)]
pub struct Lumber {
    pub species: Species,
    pub grade: GradeChoice,
    pub section: Section,
}

/// A member ready for the rules: merged framing, resolved loads, the span result.
#[derive(Debug, Clone)]
pub struct MemberContext<'a> {
    /// Where the member is: area id, member id, "Area > Run > Joist".
    pub place: Place,
    pub edition: Arc<str>,
    pub units: UnitSystem,
    pub framing: Framing,
    pub kind: MemberKind,
    pub lumber: Option<Lumber>,
    /// The cross-section, when the size is known (even if species or grade is not).
    pub section: Option<Section>,
    pub loads: ResolvedLoads,
    pub observations: Vec<&'a Observation>,
    /// Highest moisture reading, percent, if any was taken.
    pub moisture_percent: Option<f64>,
    /// The span computation, for sawn members with lumber and spacing known.
    pub span: Option<SpanResult>,
    /// Whether member-wide checks (bearing, restraint, bridging) are reported for this member:
    /// true for runs and single members, and for a joist whose framing differs from its run's.
    pub report_framing: bool,
    /// Whether the span is reported: as `report_framing`, and also for a joist that is wet
    /// while its run is not (or the reverse), whose span is re-checked.
    pub report_span: bool,
    /// Why the lumber is not known (for "not checked" findings).
    pub lumber_missing: Vec<&'static str>,
    /// The spacing as taped, where it was held to the standard layout in `framing.spacing`.
    pub spacing_taped: Option<Length>,
    /// True when the moisture is its run's reading, the joist having none of its own.
    pub moisture_from_run: bool,
    /// The year the house was built, where known (the code edition is then a benchmark).
    pub year_built: Option<u16>,
    /// Porch or deck framing, open to the weather: wet service whatever the meter says.
    pub exterior: bool,
    /// What kind of space the member is over (exposed ground in a crawlspace).
    pub area_kind: AreaKind,
    /// Exterior framing of a species incised for treatment (all but southern pine), as
    /// the deck tables assume.
    pub incised: bool,
    /// Standing water or fungal growth recorded in the area, where no moisture reading was
    /// taken on the member: wet service is then not ruled out.
    pub wetting_unmeasured: Option<&'static str>,
    /// Inputs that were entered but refused (out of range): a check that needs one says so,
    /// never "not entered".
    pub refused: Vec<&'static str>,
}

impl MemberContext<'_> {
    /// Starts a finding of `rule` about this member, or about one observation on it.
    pub fn finding(
        &self,
        rule: &'static RuleInfo,
        observation_id: Option<&Arc<str>>,
    ) -> FindingBuilder {
        let common = Common {
            units: self.units,
            edition: self.edition.clone(),
            year_built: self.year_built,
        };
        FindingBuilder::sharing(rule, self.place.clone(), common).observation(observation_id)
    }

    /// Wet service: a reading above 19 %, or exterior (porch or deck) framing.
    pub fn is_wet(&self) -> bool {
        self.exterior
            || self
                .moisture_percent
                .is_some_and(|mc| mc > WET_SERVICE_MC_PERCENT)
    }
    pub fn clear_span(&self) -> Option<Length> {
        self.framing.clear_span
    }
    pub fn depth(&self) -> Option<Length> {
        self.section.map(|s| s.depth)
    }
    pub fn member_id(&self) -> &str {
        &self.place.member_id
    }
}

/// Photo references that cannot be what was meant: attached to nothing in the inspection, or
/// naming a file outside it (an absolute path or `..`).
fn photo_problems(inspection: &Inspection) -> Vec<Problem> {
    // The inspection itself may own a photo (the front of the house).
    let photo_ids: std::collections::HashSet<&str> =
        inspection.photos.iter().map(|p| p.id.as_str()).collect();
    let owners: std::collections::HashSet<&str> = crate::model::renumber::ids_of(inspection)
        .into_iter()
        .filter(|id| !photo_ids.contains(id))
        .collect();
    let mut out = Vec::new();
    for p in &inspection.photos {
        let location = format!("Photo {}", p.id);
        if !owners.contains(p.attached_to.as_str()) {
            out.push(Problem {
                location: location.clone(),
                message: format!(
                    "attached to \"{}\", which is not this inspection nor any of its areas, runs, members, girders, posts or observations; not shown",
                    p.attached_to
                ),
            });
        }
        let file = std::path::Path::new(&p.file);
        if file.is_absolute()
            || p.file.contains('\\')
            || file
                .components()
                .any(|c| !matches!(c, std::path::Component::Normal(_)))
        {
            out.push(Problem {
                location,
                message: format!(
                    "its file \"{}\" is outside the inspection's folder; not used",
                    p.file
                ),
            });
        }
    }
    out
}

/// Validates every member of the inspection.
pub fn members(inspection: &Inspection) -> (Vec<MemberContext<'_>>, Vec<Problem>) {
    let mut out = Vec::new();
    let mut problems = Vec::new();
    let edition: Arc<str> = Arc::from(inspection.code_edition.as_str());
    let (top_loads, notes) = inspection.loads.usable();
    for message in notes {
        problems.push(Problem {
            location: "Inspection loads".into(),
            message,
        });
    }
    problems.extend(photo_problems(inspection));
    for area in &inspection.areas {
        let (area_loads, notes) = area.loads.usable();
        for message in notes {
            problems.push(Problem {
                location: format!("{} loads", area.name),
                message,
            });
        }
        let base = Shared {
            inspection,
            kind: area.kind,
            conditions: area.conditions,
            area_id: Arc::from(area.id.as_str()),
            edition: edition.clone(),
            area_loads,
            top_loads,
        };
        for run in &area.runs {
            let where_run = format!("{} > {}", area.name, run.label);
            let typical = base.member(
                &run.id,
                where_run.clone(),
                &run.framing,
                &run.observations,
                Role::OWN,
                &mut problems,
            );
            let run_wet = typical.is_wet();
            let run_moisture = typical.moisture_percent;
            out.push(typical);
            for joist in &run.joists {
                let framing = joist.framing.over(&run.framing);
                let own = joist.framing != Framing::default();
                let mut ctx = base.member(
                    &joist.id,
                    format!("{where_run} > {}", joist.label),
                    &framing,
                    &joist.observations,
                    Role {
                        report_framing: own,
                        run_moisture,
                    },
                    &mut problems,
                );
                ctx.report_span = own || ctx.is_wet() != run_wet;
                out.push(ctx);
            }
        }
        for member in &area.members {
            let location = format!("{} > {}", area.name, member.label);
            out.push(base.member(
                &member.id,
                location,
                &member.framing,
                &member.observations,
                Role::OWN,
                &mut problems,
            ));
        }
    }
    (out, problems)
}

/// What a member is to the report: whether its member-wide checks are its own, and the
/// moisture reading of its run, which a joist with no reading of its own takes.
#[derive(Clone, Copy)]
struct Role {
    report_framing: bool,
    run_moisture: Option<f64>,
}

impl Role {
    /// A run's typical joist or a single member.
    const OWN: Role = Role {
        report_framing: true,
        run_moisture: None,
    };
}

struct Shared<'a> {
    inspection: &'a Inspection,
    kind: AreaKind,
    conditions: SiteConditions,
    area_id: Arc<str>,
    edition: Arc<str>,
    area_loads: LoadSettings,
    top_loads: LoadSettings,
}

impl<'a> Shared<'a> {
    fn member(
        &self,
        id: &'a str,
        location: String,
        framing: &Framing,
        observations: &'a [Observation],
        role: Role,
        problems: &mut Vec<Problem>,
    ) -> MemberContext<'a> {
        let mut problem = |message: String| {
            problems.push(Problem {
                location: location.clone(),
                message,
            })
        };
        let (own_loads, notes) = framing.loads.usable();
        for message in notes {
            problem(format!("loads: {message}"));
        }
        let loads: ResolvedLoads = own_loads.over(&self.area_loads).resolve(&self.top_loads);
        let kind = framing.kind.unwrap_or_default();
        let mut lumber_missing = Vec::new();
        if framing.species.is_none() {
            lumber_missing.push("species");
        }
        if framing.grade.is_none() {
            lumber_missing.push("grade");
        }
        if framing.size.is_none() && framing.actual.is_none() {
            lumber_missing.push("size");
        }
        let mut refused = Vec::new();
        let section = match (framing.size, framing.actual) {
            (nominal, Some(actual)) => {
                match Section::from_dimensions(actual.thickness, actual.depth, nominal) {
                    Ok(s) => Some(s),
                    Err(e) => {
                        refused.push("size");
                        if !lumber_missing.contains(&"size") {
                            lumber_missing.push("size");
                        }
                        problem(format!("actual size: {e}; size not used"));
                        None
                    }
                }
            }
            (Some(nominal), None) => Some(nominal.dressed_section()),
            (None, None) => None,
        };
        let lumber = match (framing.species, framing.grade, section) {
            (Some(species), Some(grade), Some(section)) if kind == MemberKind::Sawn => {
                Some(Lumber {
                    species,
                    grade,
                    section,
                })
            }
            _ => None,
        };
        if let Some(spacing) = framing.spacing {
            if !(4.0..=48.0).contains(&spacing.in_inches()) {
                refused.push("spacing");
                problem(format!(
                    "spacing {} in is outside 4 to 48 in; spacing not used",
                    spacing.in_inches()
                ));
            }
        }
        if let Some(span) = framing.clear_span {
            if span.in_inches() < 12.0 || span.in_inches() > 600.0 {
                problem(format!(
                    "clear span {:.1} in is outside 1 to 50 ft; check the entry",
                    span.in_inches()
                ));
            }
        }
        let mut moisture_percent: Option<f64> = None;
        let observations: Vec<&'a Observation> = observations
            .iter()
            .filter(|o| match observation_problem(&o.kind, framing.clear_span) {
                Some(message) => {
                    problem(format!("{}: {message}; not used", o.kind.name()));
                    false
                }
                None => true,
            })
            .collect();
        for o in &observations {
            if let ObservationKind::Moisture { percent, .. } = o.kind {
                if percent.is_finite() && (0.0..=100.0).contains(&percent) {
                    moisture_percent = Some(moisture_percent.map_or(percent, |m| m.max(percent)));
                } else {
                    problem(format!(
                        "moisture reading {percent} % is outside 0 to 100 %; reading not used"
                    ));
                }
            }
        }
        // A joist with no reading of its own is as wet as its run's reading says.
        let moisture_from_run = moisture_percent.is_none() && role.run_moisture.is_some();
        if moisture_from_run {
            moisture_percent = role.run_moisture;
        }
        let taped = framing
            .spacing
            .filter(|s| (4.0..=48.0).contains(&s.in_inches()));
        let layout = taped.and_then(layout_of).map(Length::inches);
        let spacing = layout.or(taped);
        let spacing_taped =
            taped.filter(|t| layout.is_some_and(|l| (*t - l).in_inches().abs() > 1e-9));
        let exterior = self.kind == AreaKind::Porch;
        let incised = exterior
            && framing.treated != Some(false)
            && lumber
                .as_ref()
                .is_some_and(|l| l.species != Species::SouthernPine);
        let wet = exterior || moisture_percent.is_some_and(|mc| mc > WET_SERVICE_MC_PERCENT);
        let wetting_unmeasured = moisture_percent
            .is_none()
            .then(|| self.conditions.signs_of_wetting())
            .flatten()
            .filter(|_| !exterior);
        let span = match (&lumber, spacing) {
            (Some(l), Some(spacing)) => allowable_span(&SpanInput {
                species: l.species,
                grade: l.grade.grade_for_design(),
                section: l.section,
                spacing,
                live: loads.live,
                dead: loads.dead,
                deflection_denominator: loads.deflection_denominator,
                wet_service: wet,
                incised,
                duration: LoadDuration::TenYears,
                repetitive: true,
            }),
            _ => None,
        };
        let mut framing = framing.clone();
        framing.spacing = spacing;
        MemberContext {
            place: Place {
                area_id: self.area_id.clone(),
                member_id: Arc::from(id),
                location: Arc::from(location.as_str()),
            },
            edition: self.edition.clone(),
            units: self.inspection.units,
            framing,
            kind,
            lumber,
            section,
            loads,
            observations,
            moisture_percent,
            span,
            report_framing: role.report_framing,
            report_span: role.report_framing,
            lumber_missing,
            spacing_taped,
            moisture_from_run,
            year_built: self.inspection.property.year_built,
            exterior,
            area_kind: self.kind,
            incised,
            wetting_unmeasured,
            refused,
        }
    }
}

#[cfg(test)]
#[path = "validate_tests.rs"]
mod tests;
