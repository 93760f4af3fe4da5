//! A girder line made ready for its checks: the supports in order, the spans between them,
//! the line load from the joist runs that bear on it, and each support's reaction.

use crate::finding::{Common, Place};
use crate::lumber::{Grade, GradeChoice, NominalSize, Species};
use crate::mechanics::reactions;
use crate::model::{
    Area, AreaKind, End, GirderKind, GirderLine, Inspection, LoadSettings, Post, SiteConditions,
};
use crate::units::Length;
use crate::validate::{Problem, WET_SERVICE_MC_PERCENT};
use std::sync::Arc;

/// Girder lines longer than this are taken as a typing error.
const MAX_LINE_IN: f64 = 1200.0;

/// One support of a girder line: an end (on a wall or in a pocket) or a post.
#[derive(Debug, Clone)]
pub struct Support<'a> {
    pub at: Length,
    pub end: Option<End>,
    pub post: Option<&'a Post>,
    /// Load delivered to the support (lb), when the spans on both sides are known.
    pub reaction_lb: Option<f64>,
}

impl Support<'_> {
    pub fn name(&self) -> String {
        match (self.end, self.post) {
            (_, Some(p)) => p.label.clone(),
            (Some(End::A), _) => "end A".into(),
            (Some(End::B), _) => "end B".into(),
            (None, None) => "a support".into(),
        }
    }
}

/// The share of a joist run's floor that a girder carries.
#[derive(Debug, Clone, PartialEq)]
pub struct RunShare {
    pub label: String,
    /// The run's clear span; the girder carries half of it.
    pub span: Length,
    pub live_psf: f64,
    pub dead_psf: f64,
}

impl RunShare {
    /// Tributary width in feet: half the joist span.
    pub fn width_ft(&self) -> f64 {
        self.span.in_inches() / 24.0
    }
}

/// The uniform load along a girder line, lb per foot.
#[derive(Debug, Clone, PartialEq)]
pub struct LineLoad {
    pub shares: Vec<RunShare>,
    pub wall_plf: f64,
    pub live_plf: f64,
    pub total_plf: f64,
}

/// The sawn lumber of a girder, validated.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct GirderLumber {
    pub species: Species,
    pub grade: GradeChoice,
    pub ply: NominalSize,
    pub plies: u8,
}

impl GirderLumber {
    pub fn design_grade(&self) -> Grade {
        self.grade.grade_for_design()
    }
    /// Width of all plies together, inches.
    pub fn width_in(&self) -> f64 {
        self.ply.dressed_section().thickness.in_inches() * self.plies as f64
    }
    /// "3-ply 2x10" or "4x8".
    pub fn describe(&self) -> String {
        if self.plies > 1 {
            format!("{}-ply {}", self.plies, self.ply)
        } else {
            self.ply.to_string()
        }
    }
}

/// A girder line ready for its checks.
#[derive(Debug, Clone)]
pub struct GirderContext<'a> {
    pub area: &'a Area,
    pub line: &'a GirderLine,
    pub place: Place,
    pub common: Common,
    pub supports: Vec<Support<'a>>,
    /// Point loads per span: (distance from the span's left support, in; lb).
    pub span_points: Vec<Vec<(f64, f64)>>,
    /// The line load, or why it is not known.
    pub load: Result<LineLoad, String>,
    /// Sawn lumber with design values, or why the strength cannot be computed.
    pub lumber: Result<GirderLumber, String>,
    pub wet: bool,
    pub incised: bool,
    pub site: SiteConditions,
}

impl<'a> GirderContext<'a> {
    /// Spans in order: (left support, right support, length).
    pub fn spans(&self) -> impl Iterator<Item = (usize, usize, Length)> + '_ {
        self.supports
            .windows(2)
            .enumerate()
            .map(|(i, w)| (i, i + 1, w[1].at - w[0].at))
    }

    /// Place of a finding about one post of this line.
    pub fn post_place(&self, post: &Post) -> Place {
        Place {
            area_id: self.place.area_id.clone(),
            member_id: Arc::from(post.id.as_str()),
            location: Arc::from(format!("{} > {}", self.place.location, post.label).as_str()),
        }
    }
}

/// Builds every girder line of the inspection, with the input problems met.
pub fn girders<'a>(
    inspection: &'a Inspection,
    common: &Common,
) -> (Vec<GirderContext<'a>>, Vec<Problem>) {
    let mut problems = Vec::new();
    let mut out = Vec::new();
    let (top_loads, _) = inspection.loads.usable();
    for area in &inspection.areas {
        for run in &area.runs {
            for id in &run.bears_on {
                if inspection.girder(id).is_none() {
                    problems.push(Problem {
                        location: format!("{} > {}", area.name, run.label),
                        message: format!(
                            "bears on girder \"{id}\", which is not in this inspection; link not used"
                        ),
                    });
                }
            }
        }
        for line in &area.girders {
            let location = format!("{} > {}", area.name, line.label);
            let mut problem = |message: String| {
                problems.push(Problem {
                    location: location.clone(),
                    message,
                })
            };
            let length = line.length.filter(|l| {
                let ok = l.in_inches() > 0.0 && l.in_inches() <= MAX_LINE_IN;
                if !ok {
                    problem(format!(
                        "length {:.1} in is outside 0 to 100 ft; check the entry",
                        l.in_inches()
                    ));
                }
                ok
            });
            let supports = supports(line, length, &mut problem);
            let load = line_load(inspection, line, &top_loads, &mut problem);
            let span_points = points_by_span(line, &supports, &mut problem);
            let lumber = lumber(line, &mut problem);
            let exterior = area.kind == AreaKind::Porch;
            let wet = exterior
                || line
                    .moisture_percent
                    .is_some_and(|mc| mc > WET_SERVICE_MC_PERCENT);
            let incised = exterior
                && line.treated != Some(false)
                && line.species.is_some_and(|s| s != Species::SouthernPine);
            let mut ctx = GirderContext {
                area,
                line,
                place: Place {
                    area_id: Arc::from(area.id.as_str()),
                    member_id: Arc::from(line.id.as_str()),
                    location: Arc::from(location.as_str()),
                },
                common: common.clone(),
                supports,
                span_points,
                load,
                lumber,
                wet,
                incised,
                site: area.conditions,
            };
            fill_reactions(&mut ctx);
            out.push(ctx);
        }
    }
    (out, problems)
}

/// End A, the posts in order, and end B where the length is known. A post at or beyond an
/// end, or two posts at one place, is a problem and not used.
fn supports<'a>(
    line: &'a GirderLine,
    length: Option<Length>,
    problem: &mut impl FnMut(String),
) -> Vec<Support<'a>> {
    let mut out = vec![Support {
        at: Length::ZERO,
        end: Some(End::A),
        post: None,
        reaction_lb: None,
    }];
    for post in line.posts_in_order() {
        let at = post.at.in_inches();
        let beyond = length.is_some_and(|l| at >= l.in_inches());
        let last = out.last().map(|s| s.at.in_inches()).unwrap_or(0.0);
        if !at.is_finite() || at <= 0.0 || beyond {
            problem(format!(
                "{} is placed {:.1} in from end A, not between the ends; post not used",
                post.label, at
            ));
        } else if at - last < 1.0 {
            problem(format!(
                "{} is at the same place as the support before it; post not used",
                post.label
            ));
        } else {
            out.push(Support {
                at: post.at,
                end: None,
                post: Some(post),
                reaction_lb: None,
            });
        }
    }
    if let Some(l) = length {
        out.push(Support {
            at: l,
            end: Some(End::B),
            post: None,
            reaction_lb: None,
        });
    }
    out
}

/// The uniform load: half the span of each run that bears on the line, at that run's loads,
/// plus a wall above.
fn line_load(
    inspection: &Inspection,
    line: &GirderLine,
    top: &LoadSettings,
    problem: &mut impl FnMut(String),
) -> Result<LineLoad, String> {
    let runs = inspection.runs_on(&line.id);
    let wall_plf = match line.wall_above_plf {
        Some(w) if !(w.is_finite() && (0.0..=5000.0).contains(&w)) => {
            problem(format!(
                "wall load {w} lb/ft is outside 0 to 5000; not used"
            ));
            0.0
        }
        other => other.unwrap_or(0.0),
    };
    if runs.is_empty() && wall_plf == 0.0 {
        return Err("no joist run is linked to this girder, so its load is not known".into());
    }
    let mut shares = Vec::new();
    let mut unknown = Vec::new();
    for (run_area, run) in runs {
        let Some(span) = run.framing.clear_span else {
            unknown.push(run.label.clone());
            continue;
        };
        let (area_loads, _) = run_area.loads.usable();
        let (own, _) = run.framing.loads.usable();
        let loads = own.over(&area_loads).resolve(top);
        shares.push(RunShare {
            label: run.label.clone(),
            span,
            live_psf: loads.live.0,
            dead_psf: loads.dead.0,
        });
    }
    if !unknown.is_empty() {
        return Err(format!(
            "the clear span of {} is not entered, so the girder's share of it is not known",
            unknown.join(", ")
        ));
    }
    let live_plf: f64 = shares.iter().map(|s| s.live_psf * s.width_ft()).sum();
    let dead_plf: f64 = shares.iter().map(|s| s.dead_psf * s.width_ft()).sum();
    Ok(LineLoad {
        shares,
        wall_plf,
        live_plf,
        total_plf: live_plf + dead_plf + wall_plf,
    })
}

/// Point loads assigned to the span they stand on, measured from its left support.
fn points_by_span(
    line: &GirderLine,
    supports: &[Support],
    problem: &mut impl FnMut(String),
) -> Vec<Vec<(f64, f64)>> {
    let mut out = vec![Vec::new(); supports.len().saturating_sub(1)];
    for p in &line.point_loads {
        let at = p.at.in_inches();
        if !(p.pounds.is_finite() && (0.0..=100_000.0).contains(&p.pounds)) {
            problem(format!(
                "point load of {} lb is outside 0 to 100,000 lb; not used",
                p.pounds
            ));
            continue;
        }
        let span = supports
            .windows(2)
            .position(|w| at >= w[0].at.in_inches() && at <= w[1].at.in_inches());
        match span {
            Some(i) => out[i].push((at - supports[i].at.in_inches(), p.pounds)),
            None => problem(format!(
                "point load {:.1} in from end A is not on a span between supports; not used",
                at
            )),
        }
    }
    out
}

/// The girder's sawn lumber, or why its strength cannot be computed.
fn lumber(line: &GirderLine, problem: &mut impl FnMut(String)) -> Result<GirderLumber, String> {
    match line.kind {
        GirderKind::Engineered => {
            return Err("an engineered girder's capacity comes from the maker's tables".into())
        }
        GirderKind::Steel => {
            return Err(
                "a steel girder's capacity needs the shape's published properties, which are not carried here".into(),
            )
        }
        GirderKind::BuiltUp | GirderKind::SolidSawn => {}
    }
    let mut missing = Vec::new();
    if line.species.is_none() {
        missing.push("species");
    }
    if line.grade.is_none() {
        missing.push("grade");
    }
    if line.size.is_none() {
        missing.push("size");
    }
    let plies = match line.kind {
        GirderKind::BuiltUp => match line.plies {
            Some(n @ 2..=4) => n,
            Some(n) => {
                problem(format!(
                    "{n} plies: a built-up girder here has 2 to 4; plies not used"
                ));
                missing.push("plies");
                0
            }
            None => {
                missing.push("plies");
                0
            }
        },
        _ => 1,
    };
    if !missing.is_empty() {
        return Err(format!("{} not entered", missing.join(", ")));
    }
    let (Some(species), Some(grade), Some(ply)) = (line.species, line.grade, line.size) else {
        unreachable!("checked above")
    };
    if ply.thickness > 4 {
        return Err(format!(
            "{ply} is a timber (5 in and thicker), whose design values (NDS Supplement Table 4D) are not carried here"
        ));
    }
    if line.kind == GirderKind::BuiltUp && ply.thickness != 2 {
        problem(format!(
            "plies of {ply}: a built-up girder is made of 2x lumber; taken as entered"
        ));
    }
    if crate::lumber::design_values(species, grade.grade_for_design(), ply).is_none() {
        return Err(format!(
            "no design values for {} {} {ply}",
            species.name(),
            grade
        ));
    }
    Ok(GirderLumber {
        species,
        grade,
        ply,
        plies,
    })
}

/// Each support's reaction, from simple spans on each side.
fn fill_reactions(ctx: &mut GirderContext) {
    let Ok(load) = &ctx.load else { return };
    let w = load.total_plf / 12.0;
    let n = ctx.supports.len();
    let mut sums: Vec<Option<f64>> = vec![Some(0.0); n];
    for (i, j, length) in ctx.spans().collect::<Vec<_>>() {
        let (left, right) = reactions(length.in_inches(), w, &ctx.span_points[i]);
        sums[i] = sums[i].map(|s| s + left);
        sums[j] = sums[j].map(|s| s + right);
    }
    // Without end B, the last post's span to the right is not known.
    if ctx.supports.last().is_some_and(|s| s.end != Some(End::B)) {
        sums[n - 1] = None;
    }
    for (s, r) in ctx.supports.iter_mut().zip(sums) {
        s.reaction_lb = r;
    }
}
