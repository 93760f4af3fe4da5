//! Girder strength, span by span: bending, shear and live-load deflection of each span
//! between supports under the load of the joist runs that bear on the girder (NDS 2018 3.3,
//! 3.4, 3.5; L/360 by Table R301.7). An engineering reference: the code prints no table for
//! a floor girder carrying joists only.

use super::context::{GirderContext, GirderLumber, LineLoad};
use crate::finding::{
    Basis, Bound, Check, Finding, FindingBuilder, Missing, RuleInfo, Status, Value, Wording,
};
use crate::lumber::LoadDuration;
use crate::mechanics::{check_beam, BeamInput};
use crate::rules::shared::len;
use crate::units::{Length, UnitSystem};

pub const RULE: RuleInfo = RuleInfo {
    id: "girder-strength",
    title: "Girder span: bending, shear and deflection",
    code_section: Some("R301.7 (deflection L/360)"),
    other_source: Some("NDS 2018 3.3, 3.4, 3.5, 4.3.9"),
    basis: Basis::Reference,
};

/// What a girder span finding is worded from.
#[derive(Debug, Clone, PartialEq)]
pub enum StrengthDetail {
    Span(Box<SpanCheck>),
    /// The strength could not be computed; the finding says why.
    NotComputed {
        engineered_or_steel: bool,
    },
}

#[derive(Debug, Clone, PartialEq)]
pub struct SpanCheck {
    pub lumber: GirderLumber,
    pub span_no: usize,
    pub between: (String, String),
    pub length: Length,
    pub load: LineLoad,
    pub points: usize,
    pub wet: bool,
    pub incised: bool,
    /// Fb' and Fv' (psi).
    pub allowed: [f64; 2],
    pub deflection_denominator: f64,
}

pub fn check(g: &GirderContext, out: &mut Vec<Finding>) {
    let b = || FindingBuilder::at(&RULE, g.place.clone(), &g.common);
    let lumber = match &g.lumber {
        Ok(l) => *l,
        Err(why) => {
            out.push(b().not_checked(
                why.clone(),
                StrengthDetail::NotComputed {
                    engineered_or_steel: g.line.kind.is_engineered_or_steel(),
                },
            ));
            return;
        }
    };
    let load = match &g.load {
        Ok(l) => l,
        Err(why) => {
            out.push(b().not_checked(
                why.clone(),
                Missing("Link the joist runs that bear on this girder (each with its clear span) to compute its load."),
            ));
            return;
        }
    };
    let deflection_denominator = 360.0;
    for (i, j, length) in g.spans() {
        let input = BeamInput {
            species: lumber.species,
            grade: lumber.design_grade(),
            ply: lumber.ply,
            plies: lumber.plies,
            span: length,
            total_plf: load.total_plf,
            live_plf: load.live_plf,
            points: g.span_points[i].clone(),
            deflection_denominator,
            wet_service: g.wet,
            incised: g.incised,
            duration: LoadDuration::TenYears,
            // NDS 4.3.9: Cr is for three or more members joined by a load-distributing
            // element (the floor sheathing of joists); a girder's plies are not.
            repetitive: false,
        };
        let Some(c) = check_beam(&input) else {
            out.push(b().part(format!("span-{}", i + 1)).not_checked(
                format!("span {} could not be computed", i + 1),
                Missing("Check the girder's entries."),
            ));
            continue;
        };
        let u = g.common.units;
        let detail = SpanCheck {
            lumber,
            span_no: i + 1,
            between: (g.supports[i].name(), g.supports[j].name()),
            length,
            load: load.clone(),
            points: g.span_points[i].len(),
            wet: g.wet,
            incised: g.incised,
            allowed: [c.bending.1, c.shear.1],
            deflection_denominator,
        };
        out.push(
            b().part(format!("span-{}", i + 1))
                .check(Check::numeric(
                    "bending stress",
                    Value::Psi(c.bending.0),
                    Value::Psi(c.bending.1),
                    Bound::AtMost,
                    u,
                ))
                .check(Check::numeric(
                    "shear stress",
                    Value::Psi(c.shear.0),
                    Value::Psi(c.shear.1),
                    Bound::AtMost,
                    u,
                ))
                .check(Check::numeric(
                    "live-load deflection",
                    Value::Length(Length::inches(c.deflection.0)),
                    Value::Length(Length::inches(c.deflection.1)),
                    Bound::AtMost,
                    u,
                ))
                .finish(StrengthDetail::Span(Box::new(detail))),
        );
    }
    if g.line.length.is_none() && g.supports.len() > 1 {
        out.push(b().part("past-last-post").not_checked(
            "the girder's length is not entered, so the span past the last post is not known",
            Missing("Measure the girder from end A to end B."),
        ));
    }
}

impl Wording for StrengthDetail {
    fn summary(&self, u: UnitSystem) -> String {
        match self {
            StrengthDetail::NotComputed { .. } => String::new(),
            StrengthDetail::Span(d) => format!(
                "Span {} ({} to {}), {}: {} {} {}, carrying {:.0} lb/ft{}",
                d.span_no,
                d.between.0,
                d.between.1,
                len(u, d.length),
                d.lumber.describe(),
                d.lumber.species.name(),
                d.lumber.grade,
                d.load.total_plf,
                if d.points > 0 { " and point loads" } else { "" }
            ),
        }
    }

    fn assumptions(&self, u: UnitSystem) -> Vec<String> {
        let StrengthDetail::Span(d) = self else {
            return vec![];
        };
        let mut out: Vec<String> = d
            .load
            .shares
            .iter()
            .map(|s| {
                format!(
                    "{}: half of its {} clear span ({:.1} ft) at {} psf live and {} psf dead",
                    s.label,
                    len(u, s.span),
                    s.width_ft(),
                    s.live_psf,
                    s.dead_psf
                )
            })
            .collect();
        if d.load.wall_plf > 0.0 {
            out.push(format!(
                "A wall above adds {:.0} lb/ft, taken as dead load",
                d.load.wall_plf
            ));
        }
        out.push("Each span taken as simply supported on its posts; a girder continuous over a post carries up to a quarter more to it, and joists continuous over the girder add up to a quarter to its load".into());
        out.push("The girder's own weight is not added (small next to the floor's)".into());
        out.push(format!(
            "Allowed: Fb' {:.0} psi, Fv' {:.0} psi; live-load deflection L/{:.0} (Table R301.7); normal load duration (CD 1.0)",
            d.allowed[0], d.allowed[1], d.deflection_denominator
        ));
        if d.lumber.plies > 1 {
            out.push("The repetitive-member factor (Cr 1.15, NDS 4.3.9) is not applied: it is for three or more members joined by a load-distributing element such as the floor sheathing, which a girder's plies are not; leaving it out is conservative".into());
        }
        if d.wet {
            out.push(format!(
                "Wet service (CM on Fb, Fv and E){}",
                if d.incised {
                    ", and incising for treatment (Ci, NDS Table 4.3.8)"
                } else {
                    ""
                }
            ));
        }
        out
    }

    fn recommendation(&self, status: Status, _u: UnitSystem) -> String {
        match (self, status) {
            (StrengthDetail::NotComputed { engineered_or_steel: true }, _) => {
                "Compare the girder with the maker's or the steel shape's published capacity for this span and load, or refer to a licensed professional.".into()
            }
            (StrengthDetail::NotComputed { .. }, _) => {
                "Record the girder's species, grade, size and plies to compute its capacity.".into()
            }
            (_, Status::OverLimit) => "The girder span is more than NDS mechanics allow for the floor it carries (an engineering reference). Refer to a licensed professional to evaluate; a post added mid-span or a deeper girder are the usual remedies.".into(),
            (_, Status::NearLimit) => "Close to what the girder can carry: avoid added load above without evaluation.".into(),
            _ => "Within what NDS mechanics allow for the floor it carries; no action for the girder span.".into(),
        }
    }
}
