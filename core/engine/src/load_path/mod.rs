//! The load path under the joists: girder lines loaded by the runs that bear on them, the
//! posts that carry the girders, the footings under the posts, and the conditions of the
//! space. One module per provision, as the joist rules are.

mod context;
mod footing;
mod girder_bearing;
mod girder_clearance;
mod girder_splice;
mod girder_strength;
mod post_capacity;
mod post_condition;
mod post_decay;
mod post_minimum;
mod post_top;
mod site_conditions;

pub use context::{girders, GirderContext, GirderLumber, LineLoad, RunShare, Support};
pub use footing::UNKNOWN_SOIL_PSF;
pub use girder_bearing::GirderBearingDetail;
pub use girder_strength::{SpanCheck, StrengthDetail};

use crate::finding::{Common, Finding, RuleInfo};
use crate::model::Inspection;
use crate::validate::Problem;

/// A rule of the load path: its identity and its check of one girder line.
pub struct GirderRule {
    pub info: &'static RuleInfo,
    pub check: fn(&GirderContext, &mut Vec<Finding>),
}

/// Every girder-line rule, in report order.
pub static GIRDER_RULES: &[GirderRule] = &[
    GirderRule {
        info: &girder_strength::RULE,
        check: girder_strength::check,
    },
    GirderRule {
        info: &girder_bearing::RULE,
        check: girder_bearing::check,
    },
    GirderRule {
        info: &girder_splice::RULE,
        check: girder_splice::check,
    },
    GirderRule {
        info: &girder_clearance::RULE,
        check: girder_clearance::check,
    },
    GirderRule {
        info: &post_capacity::RULE,
        check: post_capacity::check,
    },
    GirderRule {
        info: &post_minimum::RULE,
        check: post_minimum::check,
    },
    GirderRule {
        info: &post_top::RULE,
        check: post_top::check,
    },
    GirderRule {
        info: &post_decay::RULE,
        check: post_decay::check,
    },
    GirderRule {
        info: &post_condition::RULE,
        check: post_condition::check,
    },
    GirderRule {
        info: &footing::RULE,
        check: footing::check,
    },
];

/// The rule of an area's own conditions.
pub static SITE_RULE: &RuleInfo = &site_conditions::RULE;

/// Every load-path finding of the inspection (girder lines in area order, then each area's
/// conditions), and the input problems met.
pub fn evaluate(inspection: &Inspection) -> (Vec<Finding>, Vec<Problem>) {
    let common = Common {
        units: inspection.units,
        edition: std::sync::Arc::from(inspection.code_edition.as_str()),
        year_built: inspection.property.year_built,
    };
    let (lines, problems) = girders(inspection, &common);
    let mut out = Vec::with_capacity(lines.len() * 16);
    for g in &lines {
        for rule in GIRDER_RULES {
            (rule.check)(g, &mut out);
        }
    }
    for area in &inspection.areas {
        site_conditions::check(area, &common, &mut out);
    }
    (out, problems)
}

/// Every rule identity the load path reports under.
pub fn rule_infos() -> impl Iterator<Item = &'static RuleInfo> {
    GIRDER_RULES
        .iter()
        .map(|r| r.info)
        .chain(std::iter::once(SITE_RULE))
}

#[cfg(test)]
mod tests;
