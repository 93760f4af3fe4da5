//! Bearing of a girder at its ends and on each post: the length the code asks for (R502.6:
//! 1-1/2 in on wood or metal, 3 in on masonry or concrete) and the length the reaction needs
//! against crushing across the grain (NDS 2018 3.10.2).

use super::context::{GirderContext, Support};
use crate::finding::{
    Basis, Bound, Check, Finding, FindingBuilder, Missing, RuleInfo, Status, Value, Wording,
};
use crate::model::{BearingSupport, GirderKind, PostMaterial};
use crate::rules::shared::dim;
use crate::units::{Length, UnitSystem};

pub const RULE: RuleInfo = RuleInfo {
    id: "girder-bearing",
    title: "Girder bearing at ends and posts",
    code_section: Some("R502.6"),
    other_source: Some("NDS 2018 3.10.2 (bearing perpendicular to grain)"),
    basis: Basis::CodeLimit,
};

/// Source: IRC 2018 R502.6: not less than 1-1/2 in on wood or metal, 3 in on masonry or
/// concrete.
fn code_minimum(on: BearingSupport) -> Option<f64> {
    match on {
        BearingSupport::Wood | BearingSupport::Metal => Some(1.5),
        BearingSupport::Masonry | BearingSupport::Concrete => Some(3.0),
        _ => None,
    }
}

/// What a girder bearing finding is worded from.
#[derive(Debug, Clone, PartialEq)]
pub struct GirderBearingDetail {
    pub at: String,
    pub on: BearingSupport,
    pub length: Option<Length>,
    pub reaction_lb: Option<f64>,
    /// Fc-perp' (psi) and the girder's width (in), for sawn girders.
    pub fc_perp: Option<(f64, f64)>,
}

pub fn check(g: &GirderContext, out: &mut Vec<Finding>) {
    for s in &g.supports {
        let (length, on) = match (s.end, s.post) {
            (_, Some(post)) => (post_bearing(post), post_support(post.material)),
            (Some(end), None) => {
                let bearing = match end {
                    crate::model::End::A => g.line.end_a,
                    crate::model::End::B => g.line.end_b,
                };
                match bearing {
                    Some(b) => (b.length, b.on),
                    None => {
                        out.push(
                            FindingBuilder::at(&RULE, g.place.clone(), &g.common)
                                .part(end_part(end))
                                .not_checked(
                                    format!("the bearing at {} is not recorded", s.name()),
                                    Missing("Record what the girder end sits on and how far."),
                                ),
                        );
                        continue;
                    }
                }
            }
            (None, None) => continue,
        };
        out.push(one(g, s, length, on));
    }
}

/// The girder length on a post: as entered, or a wood post's least side.
fn post_bearing(post: &crate::model::Post) -> Option<Length> {
    post.bearing.or_else(|| {
        (post.material == PostMaterial::Wood)
            .then_some(post.size)
            .flatten()
            .map(|s| {
                let d = s.dressed_section();
                Length::inches(d.thickness.in_inches().min(d.depth.in_inches()))
            })
    })
}

fn end_part(end: crate::model::End) -> &'static str {
    match end {
        crate::model::End::A => "end-a",
        crate::model::End::B => "end-b",
    }
}

fn post_support(material: PostMaterial) -> BearingSupport {
    match material {
        PostMaterial::Wood => BearingSupport::Wood,
        PostMaterial::Steel => BearingSupport::Metal,
        PostMaterial::Masonry => BearingSupport::Masonry,
    }
}

fn one(g: &GirderContext, s: &Support, length: Option<Length>, on: BearingSupport) -> Finding {
    let u = g.common.units;
    let place = match s.post {
        Some(p) => g.post_place(p),
        None => g.place.clone(),
    };
    let mut b = FindingBuilder::at(&RULE, place, &g.common);
    if let (Some(end), None) = (s.end, s.post) {
        b = b.part(end_part(end));
    }
    let what = format!("bearing at {}", s.name());
    let sawn = g
        .lumber
        .as_ref()
        .ok()
        .filter(|_| matches!(g.line.kind, GirderKind::BuiltUp | GirderKind::SolidSawn));
    let fc_perp = sawn.and_then(|l| {
        crate::lumber::design_values(l.species, l.design_grade(), l.ply).map(|d| {
            let wet = if g.wet { 0.67 } else { 1.0 };
            (d.fc_perp.0 * wet, l.width_in())
        })
    });
    match (length, code_minimum(on)) {
        (Some(l), Some(min)) => {
            b = b.check(Check::numeric(
                what.clone(),
                Value::Length(l),
                Value::Length(Length::inches(min)),
                Bound::AtLeast,
                u,
            ))
        }
        (None, _) => {
            b = b.check(Check::skipped(
                what.clone(),
                "R502.6 minimum",
                "the bearing length is not measured",
            ))
        }
        (Some(_), None) => {}
    }
    match (length, s.reaction_lb, fc_perp) {
        (Some(l), Some(r), Some((fc, width))) => {
            b = b.check(Check::numeric(
                format!("{what} for crushing across the grain"),
                Value::Length(l),
                Value::Length(Length::inches(r / (fc * width))),
                Bound::AtLeast,
                u,
            ))
        }
        (_, None, Some(_)) => {
            b = b.check(Check::skipped(
                format!("{what} for crushing across the grain"),
                "NDS 3.10.2",
                "the load on this support is not known",
            ))
        }
        _ => {}
    }
    b.finish(GirderBearingDetail {
        at: s.name(),
        on,
        length,
        reaction_lb: s.reaction_lb,
        fc_perp,
    })
}

impl Wording for GirderBearingDetail {
    fn summary(&self, u: UnitSystem) -> String {
        match self.length {
            Some(l) => format!(
                "The girder bears {} on {} at {}",
                dim(u, l),
                self.on.name(),
                self.at
            ),
            None => format!("The girder bears on {} at {}", self.on.name(), self.at),
        }
    }

    fn assumptions(&self, _u: UnitSystem) -> Vec<String> {
        let mut out = Vec::new();
        if let (Some(r), Some((fc, w))) = (self.reaction_lb, self.fc_perp) {
            out.push(format!(
                "Load on this support {r:.0} lb; Fc-perp' {fc:.0} psi over the girder's {w:.2} in width (bearing area factor Cb taken as 1.0)"
            ));
        }
        out
    }

    fn recommendation(&self, status: Status, _u: UnitSystem) -> String {
        match status {
            Status::OverLimit => "The girder has less bearing than it needs here. Refer to a licensed professional; a wider post cap or a bearing plate is the usual remedy.".into(),
            Status::NearLimit => "Bearing is close to the minimum; check that the girder sits fully on its support.".into(),
            _ => "Bearing meets the minimum; no action for bearing.".into(),
        }
    }
}
