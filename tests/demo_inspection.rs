//! The demo inspection: it reads cleanly, triggers every rule, over and within its limit where
//! the rule has a limit, and its findings are pinned by a snapshot.

use std::collections::{BTreeMap, BTreeSet};
use undercroft_core::interchange::{from_json_bytes, to_json};
use undercroft_core::rules::RULES;
use undercroft_core::{evaluate, Status};
use undercroft_tests::demo_path;

fn demo() -> undercroft_core::Inspection {
    let bytes = std::fs::read(demo_path()).expect("demo-data/demo-inspection.json is committed");
    from_json_bytes(&bytes).expect("the demo reads")
}

#[test]
fn demo_reads_without_problems() {
    let evaluation = evaluate(&demo());
    assert!(evaluation.problems.is_empty(), "{:#?}", evaluation.problems);
}

#[test]
fn demo_round_trips_through_json() {
    let inspection = demo();
    let again = undercroft_core::interchange::from_json(&to_json(&inspection)).unwrap();
    assert_eq!(again, inspection);
}

/// Rules that report only one way by nature: options exist only for an over-span; engineered
/// cuts are always a finding; engineered holes defer to the maker; damage is recorded.
const ONE_WAY_RULES: [&str; 4] = [
    "span-options",
    "engineered-cut",
    "engineered-hole",
    "wood-damage",
];

#[test]
fn demo_triggers_every_rule_over_and_within() {
    let evaluation = evaluate(&demo());
    let mut statuses: BTreeMap<&str, BTreeSet<Status>> = BTreeMap::new();
    for f in &evaluation.findings {
        statuses.entry(f.rule_id()).or_default().insert(f.status);
    }
    for rule in RULES {
        let seen = statuses
            .get(rule.info.id)
            .unwrap_or_else(|| panic!("{} never triggered", rule.info.id));
        if ONE_WAY_RULES.contains(&rule.info.id) {
            continue;
        }
        assert!(
            seen.contains(&Status::OverLimit),
            "{} never over its limit: {seen:?}",
            rule.info.id
        );
        assert!(
            seen.contains(&Status::Within) || seen.contains(&Status::NearLimit),
            "{} never within its limit: {seen:?}",
            rule.info.id
        );
    }
}

#[test]
fn every_finding_carries_citation_and_recommendation() {
    for f in evaluate(&demo()).findings {
        let citation = f.citation();
        assert!(
            citation.contains("IRC 2018") || citation.contains("NDS"),
            "{}: {citation}",
            f.rule_id()
        );
        assert!(
            !f.recommendation().is_empty(),
            "{} has no recommendation",
            f.rule_id()
        );
        assert!(!f.summary().is_empty(), "{} has no summary", f.rule_id());
        match f.status {
            Status::NotChecked => assert!(
                f.not_checked_because.is_some(),
                "{} says not why",
                f.rule_id()
            ),
            _ => assert!(
                f.measured().is_some() && f.limit().is_some(),
                "{} lacks measured or limit",
                f.rule_id()
            ),
        }
    }
}

#[test]
fn demo_findings_snapshot() {
    let evaluation = evaluate(&demo());
    let lines: Vec<String> = evaluation
        .findings
        .iter()
        .map(|f| {
            format!(
                "{:<12} {:<17} {:>5} {} | {} | {} -> {}",
                f.status.label(),
                f.rule_id(),
                f.use_text().unwrap_or_default(),
                f.place.location,
                f.summary(),
                f.measured().map(|m| m.text).unwrap_or("-".into()),
                f.limit().map(|l| l.text).unwrap_or("-".into()),
            )
        })
        .collect();
    insta::assert_snapshot!(lines.join("\n"));
}
