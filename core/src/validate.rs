//! Turns the inspection as entered into validated members the rules can check, and lists the
//! input problems found on the way. Never fails: what cannot be used is reported and skipped.

use crate::finding::Place;
use crate::lumber::{GradeChoice, LoadDuration, Section, Species};
use crate::mechanics::{allowable_span, SpanInput, SpanResult};
use crate::model::{Framing, Inspection, MemberKind, Observation, ObservationKind, ResolvedLoads};
use crate::units::{Length, UnitSystem};
use serde::Serialize;
use std::sync::Arc;

/// Moisture content above which wood is in wet service.
/// Source: NDS (2018) Supplement Table 4A adjustment factors (wet service: moisture content
/// over 19 % for an extended period).
pub const WET_SERVICE_MC_PERCENT: f64 = 19.0;

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
}

impl MemberContext<'_> {
    pub fn is_wet(&self) -> bool {
        self.moisture_percent
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
    for area in &inspection.areas {
        let (area_loads, notes) = area.loads.usable();
        for message in notes {
            problems.push(Problem {
                location: format!("{} loads", area.name),
                message,
            });
        }
        let loads = area_loads.resolve(&top_loads);
        let base = Shared {
            inspection,
            area_id: Arc::from(area.id.as_str()),
            edition: edition.clone(),
            loads,
        };
        for run in &area.runs {
            let where_run = format!("{} > {}", area.name, run.label);
            let typical = base.member(
                &run.id,
                where_run.clone(),
                &run.framing,
                &run.observations,
                true,
                &mut problems,
            );
            let run_wet = typical.is_wet();
            out.push(typical);
            for joist in &run.joists {
                let framing = joist.framing.over(&run.framing);
                let own = joist.framing != Framing::default();
                let mut ctx = base.member(
                    &joist.id,
                    format!("{where_run} > {}", joist.label),
                    &framing,
                    &joist.observations,
                    own,
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
                true,
                &mut problems,
            ));
        }
    }
    (out, problems)
}

struct Shared<'a> {
    inspection: &'a Inspection,
    area_id: Arc<str>,
    edition: Arc<str>,
    loads: ResolvedLoads,
}

impl<'a> Shared<'a> {
    fn member(
        &self,
        id: &'a str,
        location: String,
        framing: &Framing,
        observations: &'a [Observation],
        report_framing: bool,
        problems: &mut Vec<Problem>,
    ) -> MemberContext<'a> {
        let mut problem = |message: String| {
            problems.push(Problem {
                location: location.clone(),
                message,
            })
        };
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
        let section = match (framing.size, framing.actual) {
            (nominal, Some(actual)) => {
                match Section::from_dimensions(actual.thickness, actual.depth, nominal) {
                    Ok(s) => Some(s),
                    Err(e) => {
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
        for o in observations {
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
        let spacing = framing
            .spacing
            .filter(|s| (4.0..=48.0).contains(&s.in_inches()));
        let wet = moisture_percent.is_some_and(|mc| mc > WET_SERVICE_MC_PERCENT);
        let span = match (&lumber, spacing) {
            (Some(l), Some(spacing)) => allowable_span(&SpanInput {
                species: l.species,
                grade: l.grade.grade_for_design(),
                section: l.section,
                spacing,
                live: self.loads.live,
                dead: self.loads.dead,
                deflection_denominator: self.loads.deflection_denominator,
                wet_service: wet,
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
            loads: self.loads,
            observations: observations.iter().collect(),
            moisture_percent,
            span,
            report_framing,
            report_span: report_framing,
            lumber_missing,
        }
    }
}
