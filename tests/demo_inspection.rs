//! The demo inspection: it reads cleanly, triggers every rule, over and within its limit where
//! the rule has a limit, and its findings are pinned by a snapshot.

use std::collections::{BTreeMap, BTreeSet};
use undercroft_engine::interchange::{from_json_bytes, to_json};
use undercroft_engine::rules::RULES;
use undercroft_engine::{evaluate, Basis, Status};
use undercroft_tests::demo_path;

fn demo() -> undercroft_engine::Inspection {
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
    let again = undercroft_engine::interchange::from_json(&to_json(&inspection)).unwrap();
    assert_eq!(again, inspection);
}

/// Rules that report only one way by nature: options exist only for an over-span; engineered
/// cuts are always a finding; engineered holes defer to the maker; damage and cuts in sawn
/// joists are observed conditions to be evaluated.
const ONE_WAY_RULES: [&str; 5] = [
    "span-options",
    "engineered-cut",
    "engineered-hole",
    "wood-damage",
    "sawn-cut",
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
        // A rule with no published limit says so: an observed condition, or common practice.
        assert!(
            citation.contains("IRC 2018")
                || citation.contains("NDS")
                || citation.contains("Common practice, no published source")
                || (f.basis == Basis::Observed && citation.contains("Observed condition")),
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
            Status::ToEvaluate => assert_eq!(f.basis, Basis::Observed, "{}", f.rule_id()),
            Status::Incomplete => assert!(
                f.not_checked_because.is_some() && f.measured().is_some(),
                "{} names no unchecked limit",
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
                "{:<17} {:<17} {:>5} {} | {} | {} -> {}",
                f.status_label(),
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

/// Decay at a bearing and a joist cut through for a duct reach the top of the attention
/// order as observed conditions, right after what is over a limit; the decayed end's bearing
/// counts only its sound wood, and the family room (in a sleeping-room area) is held to
/// 40 psf. Source: IRC 2018 Table R301.5 (40 psf for rooms other than sleeping rooms);
/// R502.6 (3 in on masonry).
#[test]
fn observed_damage_reaches_the_top_and_shortens_the_bearing() {
    let evaluation = evaluate(&demo());
    let order: Vec<Status> = evaluation.by_attention().iter().map(|f| f.status).collect();
    let first_observed = order.iter().position(|s| *s == Status::ToEvaluate).unwrap();
    assert!(order[..first_observed]
        .iter()
        .all(|s| *s == Status::OverLimit));
    let observed: Vec<&str> = evaluation
        .findings
        .iter()
        .filter(|f| f.status == Status::ToEvaluate)
        .map(|f| f.rule_id())
        .collect();
    assert_eq!(
        observed,
        [
            "sawn-cut",
            "wood-damage",
            "post-condition",
            "crawlspace-conditions"
        ]
    );
    let family_bearing = evaluation
        .findings
        .iter()
        .find(|f| f.rule_id() == "bearing-length" && f.place.location.contains("Family room"))
        .unwrap();
    assert_eq!(family_bearing.status, Status::OverLimit);
    assert!(
        family_bearing.summary().contains("only 1\" of it is sound"),
        "{}",
        family_bearing.summary()
    );
    let family_span = evaluation
        .findings
        .iter()
        .find(|f| f.rule_id() == "joist-span" && f.place.location.contains("Family room"))
        .unwrap();
    assert!(
        family_span
            .assumptions()
            .iter()
            .any(|a| a.starts_with("Live load 40 psf")),
        "{:?}",
        family_span.assumptions()
    );
    // A rough-sawn 2x14 at 24 in is outside the printed tables: an engineering reference.
    assert_eq!(family_span.basis, Basis::Reference);
}

/// In a metric inspection every limit, summary and recommendation is in millimetres: no inch
/// or foot marks left (the inspector's own words aside, which have none in the demo).
#[test]
fn metric_findings_show_no_inches() {
    let mut inspection = demo();
    inspection.units = undercroft_engine::units::UnitSystem::Metric;
    for f in evaluate(&inspection).findings {
        let mut texts = vec![f.summary(), f.recommendation()];
        texts.extend(f.checks.iter().map(|c| c.limit_shown().text));
        texts.extend(f.options());
        for text in texts {
            assert!(
                !text.contains('"') && !text.contains("' "),
                "{}: {text}",
                f.rule_id()
            );
        }
    }
}
