//! Who should act on a finding and how soon: a small scale of our own, in plain words, set
//! from the finding's basis, status and rule, and adjustable by the inspector per finding.

use crate::finding::{Basis, Finding, Status};
use serde::{Deserialize, Serialize};

/// Who acts and how soon, most pressing first.
#[derive(Debug, Clone, Copy, PartialEq, Eq, PartialOrd, Ord, Hash, Serialize, Deserialize)]
#[serde(rename_all = "kebab-case")]
pub enum Priority {
    /// A licensed engineer evaluates it before any repair, jacking or added load.
    EngineerFirst,
    /// A qualified contractor corrects it in the coming months.
    ContractorSoon,
    /// Something was not measured or could not be seen: measure it before relying on the report.
    MeasureFirst,
    /// The owner keeps an eye on it; look again at the next inspection or if it changes.
    OwnerWatch,
    /// Nothing to do.
    NoAction,
}

impl Priority {
    pub const ALL: [Priority; 5] = [
        Priority::EngineerFirst,
        Priority::ContractorSoon,
        Priority::MeasureFirst,
        Priority::OwnerWatch,
        Priority::NoAction,
    ];

    /// Short words for a list or a button.
    pub fn label(self) -> &'static str {
        match self {
            Priority::EngineerFirst => "Engineer first",
            Priority::ContractorSoon => "Contractor soon",
            Priority::MeasureFirst => "Measure first",
            Priority::OwnerWatch => "Owner to watch",
            Priority::NoAction => "No action",
        }
    }

    /// Who acts and how soon, in one sentence.
    pub fn meaning(self) -> &'static str {
        match self {
            Priority::EngineerFirst => "A licensed engineer should evaluate this before any repair, jacking or added load, and before the sale closes if one is pending.",
            Priority::ContractorSoon => "A qualified contractor should correct this in the coming months; no design is needed beyond the code's own remedy.",
            Priority::MeasureFirst => "A measurement is missing or the part could not be seen: the inspector or a professional should measure or open it up before anyone relies on this report.",
            Priority::OwnerWatch => "Nothing to repair now: the owner should keep an eye on it and have it looked at again if it changes.",
            Priority::NoAction => "Checked and within its limit: nothing to do.",
        }
    }

    /// The stored word (kebab-case), as in the interchange format.
    pub fn key(self) -> &'static str {
        match self {
            Priority::EngineerFirst => "engineer-first",
            Priority::ContractorSoon => "contractor-soon",
            Priority::MeasureFirst => "measure-first",
            Priority::OwnerWatch => "owner-watch",
            Priority::NoAction => "no-action",
        }
    }

    pub fn parse(text: &str) -> Option<Priority> {
        Priority::ALL.into_iter().find(|p| p.key() == text.trim())
    }

    /// Whether a finding of this priority is on the report's first page.
    pub fn needs_action(self) -> bool {
        self != Priority::NoAction
    }
}

/// Rules whose limit protects against decay, moisture or a missing prescriptive detail: a
/// contractor corrects them by the code's own remedy. Every other rule over its limit bears on
/// strength and goes to an engineer first.
const CONTRACTOR_RULES: &[&str] = &[
    "end-restraint",
    "bridging",
    "lap-over-support",
    "joist-clearance",
    "girder-clearance",
    "post-minimum",
    "girder-post-connection",
    "post-decay-protection",
    "moisture-content",
    "crawlspace-conditions",
];

/// Observed conditions that always need an engineer: damage and cuts.
fn is_damage_or_cut(f: &Finding) -> bool {
    matches!(
        f.rule_id(),
        "wood-damage" | "sawn-cut" | "engineered-cut" | "post-condition"
    )
}

/// The priority a finding gets before the inspector says otherwise.
pub fn default_priority(f: &Finding) -> Priority {
    let contractor = CONTRACTOR_RULES.contains(&f.rule_id());
    match f.status {
        Status::OverLimit | Status::ToEvaluate if is_damage_or_cut(f) => Priority::EngineerFirst,
        Status::OverLimit | Status::ToEvaluate if contractor => Priority::ContractorSoon,
        Status::OverLimit | Status::ToEvaluate => Priority::EngineerFirst,
        Status::NearLimit => Priority::OwnerWatch,
        Status::Incomplete => Priority::MeasureFirst,
        // Options to discuss are an aid, not a check.
        Status::NotChecked if f.rule_id() == "span-options" => Priority::NoAction,
        Status::NotChecked => Priority::MeasureFirst,
        Status::Within => Priority::NoAction,
    }
}

/// The priority the report uses: the inspector's choice where one was made, except that
/// observed damage and cuts never drop off the first page.
pub fn effective_priority(f: &Finding, chosen: Option<Priority>) -> Priority {
    let p = chosen.unwrap_or_else(|| default_priority(f));
    let must_show =
        is_damage_or_cut(f) || (f.basis == Basis::Observed && f.status == Status::ToEvaluate);
    if must_show && p == Priority::NoAction {
        Priority::OwnerWatch
    } else {
        p
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn keys_round_trip_and_order_is_most_pressing_first() {
        for p in Priority::ALL {
            assert_eq!(Priority::parse(p.key()), Some(p));
            let json = serde_json::to_string(&p).unwrap();
            assert_eq!(json, format!("\"{}\"", p.key()));
        }
        assert!(Priority::EngineerFirst < Priority::ContractorSoon);
        assert!(Priority::OwnerWatch < Priority::NoAction);
        assert_eq!(Priority::parse("urgent"), None);
    }

    #[test]
    fn demo_findings_get_the_expected_defaults() {
        let i = crate::interchange::demo();
        let e = crate::evaluate(&i);
        let of = |rule: &str, status: Status| {
            e.findings
                .iter()
                .find(|f| f.rule_id() == rule && f.status == status)
                .map(default_priority)
        };
        assert_eq!(
            of("wood-damage", Status::ToEvaluate),
            Some(Priority::EngineerFirst)
        );
        assert_eq!(
            of("sawn-cut", Status::ToEvaluate),
            Some(Priority::EngineerFirst)
        );
        assert_eq!(
            of("bridging", Status::OverLimit),
            Some(Priority::ContractorSoon)
        );
        assert_eq!(
            of("joist-span", Status::OverLimit),
            Some(Priority::EngineerFirst)
        );
        assert_eq!(
            of("post-footing", Status::NotChecked),
            Some(Priority::MeasureFirst)
        );
        assert_eq!(of("joist-span", Status::Within), Some(Priority::NoAction));
        // Damage set to "no action" by the inspector still reaches the first page.
        let damage = e
            .findings
            .iter()
            .find(|f| f.rule_id() == "wood-damage")
            .unwrap();
        assert_eq!(
            effective_priority(damage, Some(Priority::NoAction)),
            Priority::OwnerWatch
        );
        let span = e
            .findings
            .iter()
            .find(|f| f.rule_id() == "joist-span" && f.status == Status::OverLimit)
            .unwrap();
        assert_eq!(
            effective_priority(span, Some(Priority::ContractorSoon)),
            Priority::ContractorSoon
        );
    }
}
