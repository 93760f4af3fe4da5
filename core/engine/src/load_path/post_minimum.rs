//! The code's minimums for columns (R407.3): wood not less than nominal 4x4, steel not less
//! than 3 in Schedule 40 pipe, and restrained against lateral displacement at the bottom
//! end (with the exception for short columns on a pier inside a continuous foundation).

use super::context::GirderContext;
use crate::finding::{
    Basis, Bound, Check, Finding, FindingBuilder, RuleInfo, Status, Value, Wording,
};
use crate::model::{AreaKind, Post, PostBase, PostHold, PostMaterial};
use crate::rules::shared::dim;
use crate::units::{Length, UnitSystem};

pub const RULE: RuleInfo = RuleInfo {
    id: "post-minimum",
    title: "Post size and restraint at its base",
    code_section: Some("R407.3"),
    other_source: None,
    basis: Basis::CodeLimit,
};

/// Source: IRC 2018 R407.3: steel columns not less than 3-inch-diameter Schedule 40 pipe;
/// a 3 in nominal pipe is 3-1/2 in outside diameter (ASME B36.10M).
const STEEL_MIN_OD_IN: f64 = 3.5;
/// Source: IRC 2018 R407.3 exception: in Seismic Design Categories A, B and C, columns not
/// more than 48 in tall on a pier or footing in an under-floor area enclosed by a continuous
/// foundation are exempt from the bottom restraint.
const SHORT_COLUMN_IN: f64 = 48.0;

#[derive(Debug, Clone, PartialEq)]
pub struct MinimumDetail {
    pub material: PostMaterial,
    pub short_exception: bool,
}

pub fn check(g: &GirderContext, out: &mut Vec<Finding>) {
    for post in g.supports.iter().filter_map(|s| s.post) {
        if post.material == PostMaterial::Masonry {
            continue;
        }
        out.push(one(g, post));
    }
}

fn one(g: &GirderContext, post: &Post) -> Finding {
    let u = g.common.units;
    let mut b = FindingBuilder::at(&RULE, g.post_place(post), &g.common);
    b = match (post.material, post.size, post.diameter) {
        (PostMaterial::Wood, Some(size), _) => b.check(Check::qualitative(
            "post size",
            size.to_string(),
            "nominal 4x4 or larger",
            size.thickness >= 4 && size.depth >= 4,
        )),
        (PostMaterial::Steel, _, Some(od)) => b.check(Check::numeric(
            "column outside diameter",
            Value::Length(od),
            Value::Length(Length::inches(STEEL_MIN_OD_IN)),
            Bound::AtLeast,
            u,
        )),
        _ => b.check(Check::skipped(
            "post size",
            "R407.3 minimum",
            "not measured",
        )),
    };
    let on_pier = matches!(
        post.stands_on,
        Some(PostBase::ConcretePier | PostBase::MasonryPier | PostBase::Slab)
    );
    let short_exception = post
        .height
        .is_some_and(|h| h.in_inches() <= SHORT_COLUMN_IN)
        && on_pier
        && g.area.kind == AreaKind::Crawlspace;
    b = match post.bottom {
        Some(hold) if hold.restrains() => b.check(Check::qualitative(
            "restraint at the base",
            hold.name(),
            "restrained against lateral displacement",
            true,
        )),
        Some(PostHold::NoneSeen) if short_exception => b.check(Check::skipped(
            "restraint at the base",
            "restrained, or the short-column exception",
            "nothing holds the base; the exception for columns 48 in or shorter on a pier holds only in Seismic Design Categories A, B and C, which is not recorded",
        )),
        Some(hold) => b.check(Check::qualitative(
            "restraint at the base",
            hold.name(),
            "restrained against lateral displacement",
            false,
        )),
        None => b.check(Check::skipped(
            "restraint at the base",
            "R407.3",
            "not recorded",
        )),
    };
    b.finish(MinimumDetail {
        material: post.material,
        short_exception,
    })
}

impl Wording for MinimumDetail {
    fn summary(&self, u: UnitSystem) -> String {
        match self.material {
            PostMaterial::Steel => format!(
                "A steel column: at least {} outside diameter (3 in Schedule 40 pipe) and held at its base",
                dim(u, Length::inches(STEEL_MIN_OD_IN))
            ),
            _ => "A wood post: nominal 4x4 or larger and held at its base".into(),
        }
    }

    fn recommendation(&self, status: Status, _u: UnitSystem) -> String {
        match status {
            Status::OverLimit => "The post is smaller than the code's minimum or not held at its base, so it can be knocked or slide off its support. Have a contractor fasten it (a post base or pin) or replace it as a licensed professional advises.".into(),
            _ => "Meets the code's minimum size and base restraint; no action.".into(),
        }
    }
}
