//! The rules: one module per provision, each with a stable id, a title, a citation and a
//! pure check of one validated member. `RULES` lists them all and sets report order.

mod bearing;
mod bored_hole;
mod bridging;
mod cantilever;
mod end_restraint;
mod engineered;
mod ground_clearance;
mod joist_span;
mod lap;
mod moisture;
mod notch;
mod notched_end;
mod opening;
mod partition;
mod sag;
pub use sag::sag_of;
pub(crate) mod shared;
mod span_options;
mod wood_damage;

#[cfg(test)]
pub(crate) mod testing;

use crate::finding::{Finding, RuleInfo};
use crate::validate::MemberContext;

/// A rule: its identity and its check.
pub struct Rule {
    pub info: &'static RuleInfo,
    /// Appends this rule's findings for one member.
    pub check: fn(&MemberContext, &mut Vec<Finding>),
}

/// Every rule, in report order.
pub static RULES: &[Rule] = &[
    Rule {
        info: &joist_span::RULE,
        check: joist_span::check,
    },
    Rule {
        info: &span_options::RULE,
        check: span_options::check,
    },
    Rule {
        info: &bearing::RULE,
        check: bearing::check,
    },
    Rule {
        info: &end_restraint::RULE,
        check: end_restraint::check,
    },
    Rule {
        info: &bridging::RULE,
        check: bridging::check,
    },
    Rule {
        info: &lap::RULE,
        check: lap::check,
    },
    Rule {
        info: &notch::RULE,
        check: notch::check,
    },
    Rule {
        info: &notched_end::RULE,
        check: notched_end::check,
    },
    Rule {
        info: &bored_hole::RULE,
        check: bored_hole::check,
    },
    Rule {
        info: &opening::RULE,
        check: opening::check,
    },
    Rule {
        info: &partition::RULE,
        check: partition::check,
    },
    Rule {
        info: &cantilever::RULE,
        check: cantilever::check,
    },
    Rule {
        info: &ground_clearance::RULE,
        check: ground_clearance::check,
    },
    Rule {
        info: &engineered::CUT_RULE,
        check: engineered::check_cuts,
    },
    Rule {
        info: &engineered::HOLE_RULE,
        check: engineered::check_holes,
    },
    Rule {
        info: &sag::RULE,
        check: sag::check,
    },
    Rule {
        info: &moisture::RULE,
        check: moisture::check,
    },
    Rule {
        info: &wood_damage::RULE,
        check: wood_damage::check,
    },
    Rule {
        info: &wood_damage::CUT_RULE,
        check: wood_damage::check_cuts,
    },
];

/// Rule identities reported by a check listed under another rule (porch and deck joist
/// spans, by the joist span check) and by the load path: with `RULES`, every id a finding
/// can carry.
pub fn all_rule_infos() -> impl Iterator<Item = &'static RuleInfo> {
    RULES
        .iter()
        .map(|r| r.info)
        .chain(std::iter::once(&joist_span::DECK_RULE))
        .chain(crate::load_path::rule_infos())
}

/// Looks a rule up by id.
pub fn rule(id: &str) -> Option<&'static Rule> {
    RULES.iter().find(|r| r.info.id == id)
}

#[cfg(test)]
mod tests {
    use super::*;
    use std::collections::HashSet;

    #[test]
    fn ids_are_unique_kebab_case() {
        let mut seen = HashSet::new();
        for info in all_rule_infos() {
            assert!(seen.insert(info.id), "duplicate id {}", info.id);
            assert!(
                info.id
                    .chars()
                    .all(|c| c.is_ascii_lowercase() || c.is_ascii_digit() || c == '-')
                    && !info.id.starts_with('-')
                    && !info.id.ends_with('-'),
                "{} is not kebab-case",
                info.id
            );
            assert!(
                info.code_section.is_some() || info.other_source.is_some(),
                "{} cites nothing",
                info.id
            );
        }
    }

    #[test]
    fn rule_list_snapshot() {
        let list: Vec<String> = all_rule_infos()
            .map(|info| {
                format!(
                    "{:<26} {:<44} {}",
                    info.id,
                    info.title,
                    info.citation("IRC 2018")
                )
            })
            .collect();
        insta::assert_snapshot!(list.join("\n"));
    }
}
