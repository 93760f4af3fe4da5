//! Conditions seen on a post or under it (shims, stacked blocks, cracks, lean, decay, a
//! settled pier), and a post standing on unmortared blocks or a wood block: observed
//! conditions for a professional to evaluate, each with its own words.

use super::context::GirderContext;
use crate::finding::{Basis, Finding, FindingBuilder, RuleInfo, Status, Wording};
use crate::model::{PostBase, PostCondition};
use crate::units::UnitSystem;

pub const RULE: RuleInfo = RuleInfo {
    id: "post-condition",
    title: "Condition of a post or its support",
    code_section: None,
    other_source: Some("Observed condition"),
    basis: Basis::Observed,
};

#[derive(Debug, Clone, Copy, PartialEq)]
pub enum ConditionDetail {
    Seen(PostCondition),
    StandsOn(PostBase),
}

pub fn check(g: &GirderContext, out: &mut Vec<Finding>) {
    for post in g.supports.iter().filter_map(|s| s.post) {
        let mut seen: Vec<ConditionDetail> = Vec::new();
        for c in &post.conditions {
            if !seen.contains(&ConditionDetail::Seen(*c)) {
                seen.push(ConditionDetail::Seen(*c));
            }
        }
        if let Some(on @ (PostBase::StackedBlock | PostBase::WoodBlock)) = post.stands_on {
            if !post.conditions.contains(&PostCondition::StackedBlocks) {
                seen.push(ConditionDetail::StandsOn(on));
            }
        }
        for d in seen {
            out.push(
                FindingBuilder::at(&RULE, g.post_place(post), &g.common)
                    .part(d.key())
                    .observed(d),
            );
        }
    }
}

impl ConditionDetail {
    /// The part of a finding's key: which condition.
    pub fn key(&self) -> &'static str {
        match self {
            ConditionDetail::Seen(PostCondition::Shimmed) => "shimmed",
            ConditionDetail::Seen(PostCondition::StackedBlocks) => "stacked-blocks",
            ConditionDetail::Seen(PostCondition::Cracked) => "cracked",
            ConditionDetail::Seen(PostCondition::Leaning) => "leaning",
            ConditionDetail::Seen(PostCondition::Decay) => "decay",
            ConditionDetail::Seen(PostCondition::Settled) => "settled",
            ConditionDetail::StandsOn(_) => "stands-on",
        }
    }
}

impl Wording for ConditionDetail {
    fn summary(&self, _u: UnitSystem) -> String {
        match self {
            ConditionDetail::Seen(PostCondition::Shimmed) => {
                "Shims between the post and what it carries or stands on".into()
            }
            ConditionDetail::Seen(PostCondition::StackedBlocks) => {
                "The post's height is made up with stacked blocks".into()
            }
            ConditionDetail::Seen(PostCondition::Cracked) => "The post is cracked".into(),
            ConditionDetail::Seen(PostCondition::Leaning) => "The post leans out of plumb".into(),
            ConditionDetail::Seen(PostCondition::Decay) => {
                "Decay or insect damage in the post".into()
            }
            ConditionDetail::Seen(PostCondition::Settled) => {
                "The pier or footing under the post has settled or tilted".into()
            }
            ConditionDetail::StandsOn(on) => format!("The post stands on a {}", on.name()),
        }
    }

    fn recommendation(&self, _status: Status, _u: UnitSystem) -> String {
        match self {
            ConditionDetail::Seen(PostCondition::Shimmed) => "Shims can crush, split or slip, and often mark a girder that has settled. Have a licensed professional or experienced contractor evaluate the support and replace shims with a solid, fastened bearing.".into(),
            ConditionDetail::Seen(PostCondition::Decay) => "Probe the post to find the extent of the damage; refer to a licensed professional for replacement.".into(),
            ConditionDetail::Seen(PostCondition::Leaning | PostCondition::Cracked | PostCondition::Settled) => "A post that leans, cracks or sinks no longer carries the girder as built. Refer to a licensed professional to evaluate the post, its pier and footing.".into(),
            ConditionDetail::Seen(PostCondition::StackedBlocks) | ConditionDetail::StandsOn(_) => "Loose blocks and wood blocks are not a lasting support: they shift, crush or decay. Refer to a licensed professional or experienced contractor to provide a pier on a footing.".into(),
        }
    }
}
