//! The footing under a post: the area the post's load needs on the soil at the presumptive
//! bearing value of Table R401.4.1 (1,500 psf where the soil is not known), and the code's
//! least footing width and thickness (R403.1.1). A footing that cannot be seen is not
//! evaluated.

use super::context::{GirderContext, Support};
use crate::finding::{
    Basis, Bound, Check, Finding, FindingBuilder, RuleInfo, Status, Value, Wording,
};
use crate::model::{Post, SoilClass};
use crate::units::{Length, UnitSystem};

pub const RULE: RuleInfo = RuleInfo {
    id: "post-footing",
    title: "Footing under a post",
    code_section: Some("R401.4.1, Table R401.4.1; R403.1.1"),
    other_source: None,
    basis: Basis::CodeLimit,
};

/// Source: IRC 2018 Table R401.4.1: the lowest presumptive value (clay, sandy clay, silty
/// clay, clayey silt, silt and sandy silt), which R401.4.1 has assumed in lieu of a soil
/// investigation, and below which the building official asks for one.
pub const UNKNOWN_SOIL_PSF: f64 = 1_500.0;
/// Source: IRC 2018 R403.1.1: footings not less than 12 in wide and 6 in thick.
const MIN_WIDTH_IN: f64 = 12.0;
const MIN_THICKNESS_IN: f64 = 6.0;

#[derive(Debug, Clone, PartialEq)]
pub struct FootingDetail {
    pub visible: bool,
    pub load_lb: Option<f64>,
    pub soil: Option<SoilClass>,
    pub bearing_psf: f64,
}

pub fn check(g: &GirderContext, out: &mut Vec<Finding>) {
    for s in g.supports.iter().filter(|s| s.post.is_some()) {
        out.push(one(g, s, s.post.expect("filtered to posts")));
    }
}

fn one(g: &GirderContext, s: &Support, post: &Post) -> Finding {
    let u = g.common.units;
    let soil = g.site.soil;
    let bearing_psf = soil.map_or(UNKNOWN_SOIL_PSF, SoilClass::bearing_psf);
    let detail = FootingDetail {
        visible: post.footing.visible,
        load_lb: s.reaction_lb,
        soil,
        bearing_psf,
    };
    let b = FindingBuilder::at(&RULE, g.post_place(post), &g.common);
    let f = post.footing;
    if !f.visible {
        return b.not_checked("the footing cannot be seen: not evaluated", detail);
    }
    let mut b = b;
    b = match (f.width, f.length, s.reaction_lb) {
        (Some(w), Some(l), Some(load)) => b.check(Check::numeric(
            "footing area",
            Value::SquareInches(w.in_inches() * l.in_inches()),
            Value::SquareInches(load / bearing_psf * 144.0),
            Bound::AtLeast,
            u,
        )),
        (Some(_), Some(_), None) => b.check(Check::skipped(
            "footing area",
            "load over the soil's bearing value",
            "the load on the post is not known",
        )),
        _ => b.check(Check::skipped(
            "footing area",
            "load over the soil's bearing value",
            "the footing's width and length are not measured",
        )),
    };
    let least = match (f.width, f.length) {
        (Some(w), Some(l)) => Some(if w.in_inches() <= l.in_inches() { w } else { l }),
        (w, l) => w.or(l),
    };
    if let Some(w) = least {
        b = b.check(Check::numeric(
            "footing width",
            Value::Length(w),
            Value::Length(Length::inches(MIN_WIDTH_IN)),
            Bound::AtLeast,
            u,
        ));
    }
    b = match f.thickness {
        Some(t) => b.check(Check::numeric(
            "footing thickness",
            Value::Length(t),
            Value::Length(Length::inches(MIN_THICKNESS_IN)),
            Bound::AtLeast,
            u,
        )),
        None => b.check(Check::skipped("footing thickness", "6 in", "not measured")),
    };
    b.finish(detail)
}

impl Wording for FootingDetail {
    fn summary(&self, u: UnitSystem) -> String {
        match (self.visible, self.load_lb) {
            (false, _) => "The footing under the post cannot be seen".into(),
            (true, Some(load)) => format!(
                "The post brings {} to its footing",
                Value::Pounds(load).text(u)
            ),
            (true, None) => "The footing under the post".into(),
        }
    }

    fn assumptions(&self, _u: UnitSystem) -> Vec<String> {
        let mut out = vec![match self.soil {
            Some(soil) => format!(
                "Soil: {} at {:.0} psf (Table R401.4.1)",
                soil.name(),
                self.bearing_psf
            ),
            None => format!(
                "The soil was not identified: {:.0} psf assumed, the lowest presumptive value of Table R401.4.1, which the code uses in lieu of a soil investigation",
                self.bearing_psf
            ),
        }];
        out.push("The footing's own weight is not added to the load".into());
        out
    }

    fn recommendation(&self, status: Status, _u: UnitSystem) -> String {
        match (self.visible, status) {
            (false, _) => "The footing is buried or hidden, so its size and condition are not known. Where the post shows settlement or the girder sags, have a licensed professional investigate the footing.".into(),
            (_, Status::OverLimit) => "The footing is smaller than the post's load needs on this soil, or smaller than the code's minimum. Refer to a licensed professional to evaluate the footing.".into(),
            (_, Status::NotChecked) => "Measure the footing's width, length and thickness where it can be seen.".into(),
            _ => "The footing meets the area the load needs and the code's minimum size; no action.".into(),
        }
    }
}
