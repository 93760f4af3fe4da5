//! Joints in the plies of a built-up girder: each over a support. Common practice, no
//! source: the code gives no rule for floor girders, and a joint between supports leaves
//! the plies there to carry the whole span's moment.

use super::context::GirderContext;
use crate::finding::{Basis, Check, Finding, FindingBuilder, RuleInfo, Status, Wording};
use crate::model::GirderKind;
use crate::rules::shared::len;
use crate::units::{Length, UnitSystem};

pub const RULE: RuleInfo = RuleInfo {
    id: "girder-splice",
    title: "Ply joints of a built-up girder",
    code_section: None,
    other_source: Some("Common practice, no published source: ply joints over a support"),
    basis: Basis::Reference,
};

/// A joint within this of a support's centre is over it (half a 4x post plus a tape's
/// scatter). Common practice, no source.
const OVER_SUPPORT_IN: f64 = 3.0;

#[derive(Debug, Clone, PartialEq)]
pub struct SpliceDetail {
    pub at: Length,
    /// The support it is over, if any.
    pub over: Option<String>,
}

pub fn check(g: &GirderContext, out: &mut Vec<Finding>) {
    if g.line.kind != GirderKind::BuiltUp {
        return;
    }
    for (n, at) in g.line.splices.iter().enumerate() {
        let over = g
            .supports
            .iter()
            .find(|s| (s.at - *at).in_inches().abs() <= OVER_SUPPORT_IN)
            .map(|s| s.name());
        out.push(
            FindingBuilder::at(&RULE, g.place.clone(), &g.common)
                .part(format!("joint-{}", n + 1))
                .check(Check::qualitative(
                    format!("ply joint at {}", len(g.common.units, *at)),
                    over.clone()
                        .map_or("between supports".to_string(), |s| format!("over {s}")),
                    "over a support",
                    over.is_some(),
                ))
                .finish(SpliceDetail { at: *at, over }),
        );
    }
}

impl Wording for SpliceDetail {
    fn summary(&self, u: UnitSystem) -> String {
        match &self.over {
            Some(s) => format!("A ply joint {} from end A is over {s}", len(u, self.at)),
            None => format!(
                "A ply joint {} from end A falls between supports",
                len(u, self.at)
            ),
        }
    }

    fn recommendation(&self, status: Status, _u: UnitSystem) -> String {
        match status {
            Status::OverLimit => "A joint in the plies between supports weakens the girder where it bends. Refer to a licensed professional to evaluate; a post under the joint is the usual remedy.".into(),
            _ => "The joint is over a support; no action.".into(),
        }
    }
}
