//! The connection of the girder to the post top: a girder that rests on a post by its weight
//! alone can slide or roll off it. Common practice, no source: a positive connection (a post
//! cap, a column plate, or cleats).

use super::context::GirderContext;
use crate::finding::{Basis, Check, Finding, FindingBuilder, RuleInfo, Status, Wording};
use crate::model::{PostHold, PostMaterial};
use crate::units::UnitSystem;

pub const RULE: RuleInfo = RuleInfo {
    id: "girder-post-connection",
    title: "Girder held to the post top",
    code_section: None,
    other_source: Some(
        "Common practice, no published source: a positive connection at the post top",
    ),
    basis: Basis::Reference,
};

#[derive(Debug, Clone, PartialEq)]
pub struct TopDetail {
    pub hold: Option<PostHold>,
}

pub fn check(g: &GirderContext, out: &mut Vec<Finding>) {
    for post in g.supports.iter().filter_map(|s| s.post) {
        if post.material == PostMaterial::Masonry {
            continue;
        }
        let b = FindingBuilder::at(&RULE, g.post_place(post), &g.common);
        let detail = TopDetail { hold: post.top };
        out.push(match post.top {
            Some(hold) => b
                .check(Check::qualitative(
                    "connection at the post top",
                    hold.name(),
                    "a connector, plate or cleats",
                    hold.restrains(),
                ))
                .finish(detail),
            None => b.not_checked("the post top connection is not recorded", detail),
        });
    }
}

impl Wording for TopDetail {
    fn summary(&self, _u: UnitSystem) -> String {
        match self.hold {
            Some(h) => format!("Girder to post top: {}", h.name()),
            None => String::new(),
        }
    }

    fn recommendation(&self, status: Status, _u: UnitSystem) -> String {
        match status {
            Status::OverLimit => {
                "Nothing holds the girder to this post. Have a contractor fit a post cap or cleats."
                    .into()
            }
            Status::NotChecked => "Look at the post top and record how the girder is held.".into(),
            _ => "The girder is held to the post; no action.".into(),
        }
    }
}
