//! Protection of wood posts against decay where they stand (R317.1.4): a wood column on
//! concrete or masonry is of durable or treated wood unless its pier or pedestal lifts it
//! clear (1 in above a concrete floor; more than 8 in above exposed ground in a crawl
//! space); a post on soil is always treated wood.

use super::context::GirderContext;
use crate::finding::{
    Basis, Bound, Check, Finding, FindingBuilder, RuleInfo, Status, Value, Wording,
};
use crate::model::{AreaKind, Post, PostBase, PostMaterial};
use crate::units::{Length, UnitSystem};

pub const RULE: RuleInfo = RuleInfo {
    id: "post-decay-protection",
    title: "Post protected against decay",
    code_section: Some("R317.1.4"),
    other_source: None,
    basis: Basis::CodeLimit,
};

/// Source: IRC 2018 R317.1.4 exceptions: supported by concrete piers or metal pedestals
/// projecting 1 in above a concrete floor; in enclosed crawl spaces, at a height greater
/// than 8 in from exposed ground (the wording from memory; both numbers as several code
/// summaries give them).
const ABOVE_FLOOR_IN: f64 = 1.0;
const ABOVE_GROUND_IN: f64 = 8.0;

#[derive(Debug, Clone, PartialEq)]
pub struct DecayDetail {
    pub on: Option<PostBase>,
    pub treated: Option<bool>,
}

pub fn check(g: &GirderContext, out: &mut Vec<Finding>) {
    for post in g.supports.iter().filter_map(|s| s.post) {
        if post.material != PostMaterial::Wood {
            continue;
        }
        out.push(one(g, post));
    }
}

fn one(g: &GirderContext, post: &Post) -> Finding {
    let u = g.common.units;
    let b = FindingBuilder::at(&RULE, g.post_place(post), &g.common);
    let detail = DecayDetail {
        on: post.stands_on,
        treated: post.treated,
    };
    if post.treated == Some(true) {
        return b
            .check(Check::qualitative(
                "durable or treated wood",
                "treated or naturally durable",
                "durable or treated wood",
                true,
            ))
            .finish(detail);
    }
    let Some(on) = post.stands_on else {
        return b.not_checked("what the post stands on is not recorded", detail);
    };
    if on == PostBase::Soil {
        return match post.treated {
            Some(false) => b
                .check(Check::qualitative(
                    "wood in contact with the ground",
                    "untreated wood on soil",
                    "treated for ground contact",
                    false,
                ))
                .finish(detail),
            _ => b.not_checked(
                "the post stands on soil and whether it is treated is not recorded",
                detail,
            ),
        };
    }
    let (min, what) = if g.area.kind == AreaKind::Crawlspace {
        (
            ABOVE_GROUND_IN,
            "height of the pier top above exposed ground (more than 8 in)",
        )
    } else {
        (
            ABOVE_FLOOR_IN,
            "height of the pier or pedestal top above the floor",
        )
    };
    let b = match post.base_height {
        Some(h) if h.in_inches() >= min || post.treated == Some(false) => b.check(Check::numeric(
            what,
            Value::Length(h),
            Value::Length(Length::inches(min)),
            Bound::AtLeast,
            u,
        )),
        Some(_) => b.check(Check::skipped(
            what,
            "or durable or treated wood",
            "lower than the code's clearance, and whether the post is treated is not recorded",
        )),
        None => b.check(Check::skipped(what, "R317.1.4", "not measured")),
    };
    b.finish(detail)
}

impl Wording for DecayDetail {
    fn summary(&self, _u: UnitSystem) -> String {
        match (self.treated, self.on) {
            (Some(true), _) => "The post is treated or naturally durable wood".into(),
            (_, Some(on)) => format!("An untreated or unmarked wood post on a {}", on.name()),
            _ => String::new(),
        }
    }

    fn recommendation(&self, status: Status, _u: UnitSystem) -> String {
        match status {
            Status::OverLimit => "An untreated post this close to the ground or floor takes up moisture and decays. Probe the base for decay; have a contractor raise it on a pedestal or replace it with treated wood.".into(),
            Status::NotChecked => "Record what the post stands on, its height above the ground or floor, and whether it is treated.".into(),
            _ => "Protected against decay as the code asks; no action.".into(),
        }
    }
}
