//! The load path checked by hand: tributary loads, reactions, footing areas, and what is
//! never read as within.

use super::*;
use crate::finding::{Basis, Status};
use crate::model::{GirderLine, Post};
use crate::units::Length;

fn demo() -> Inspection {
    crate::interchange::demo()
}

fn common(i: &Inspection) -> Common {
    Common {
        units: i.units,
        edition: std::sync::Arc::from(i.code_edition.as_str()),
        year_built: i.property.year_built,
    }
}

// Hand calculation of the demo's centre girder. Kitchen joists 15' 2" and dining joists
// 12' 6", both at 40 psf live (Table R301.5, rooms other than sleeping rooms) and 20 psf dead
// (heavy finishes): tributary 7.583 ft + 6.25 ft = 13.833 ft; live 553.3 lb/ft; total
// 60 x 13.833 = 830.0 lb/ft. Simple spans of 6, 6 and 10 ft: post 1 carries
// 830 x 6/2 + 830 x 6/2 = 4980 lb; post 2 830 x 6/2 + 830 x 10/2 = 6640 lb; end B 4150 lb.
#[test]
fn the_demo_girder_by_hand() {
    let i = demo();
    let (lines, problems) = girders(&i, &common(&i));
    assert!(problems.is_empty(), "{problems:?}");
    let g = lines.iter().find(|g| g.line.id == "girder-centre").unwrap();
    let load = g.load.as_ref().unwrap();
    assert!((load.live_plf - 553.33).abs() < 0.01, "{}", load.live_plf);
    assert!((load.total_plf - 830.0).abs() < 0.01, "{}", load.total_plf);
    let reactions: Vec<f64> = g.supports.iter().map(|s| s.reaction_lb.unwrap()).collect();
    let expected = [2490.0, 4980.0, 6640.0, 4150.0];
    for (r, e) in reactions.iter().zip(expected) {
        assert!((r - e).abs() < 0.5, "{reactions:?}");
    }
}

// Hand calculation: 3-ply 2x12 SPF No. 2 over 10 ft at 830 lb/ft. Fb 875 psi, CF 1.0 for
// 2x12 (NDS Supplement 2018 Table 4A), no Cr. M = 69.17 x 120^2 / 8 = 124,500 lb-in;
// S = 4.5 x 11.25^2 / 6 = 94.92 in^3; fb = 1311.6 psi; 150 % of 875 psi.
#[test]
fn the_long_span_is_over_by_bending() {
    let (findings, _) = evaluate(&demo());
    let over: Vec<_> = findings
        .iter()
        .filter(|f| f.rule_id() == "girder-strength" && f.status == Status::OverLimit)
        .collect();
    assert_eq!(over.len(), 1, "one span of the demo girder is over");
    let g = over[0].governing_check().unwrap();
    assert_eq!(g.what, "bending stress");
    assert!((over[0].ratio().unwrap() - 1311.6 / 875.0).abs() < 0.001);
    assert_eq!(over[0].basis, Basis::Reference);
}

// Source: IRC 2018 Table R401.4.1 (1,500 psf where the soil is not identified). Post 1's
// 4980 lb needs 3.32 sq ft; its 24 x 24 in footing has 4.0 sq ft: 83 %.
#[test]
fn footing_area_from_the_presumptive_bearing_value() {
    let (findings, _) = evaluate(&demo());
    let footing = findings
        .iter()
        .find(|f| f.rule_id() == "post-footing" && &*f.place.member_id == "post-1")
        .unwrap();
    assert_eq!(footing.status, Status::Within);
    assert!((footing.ratio().unwrap() - 4980.0 / 1500.0 / 4.0).abs() < 1e-9);
    let hidden = findings
        .iter()
        .find(|f| f.rule_id() == "post-footing" && &*f.place.member_id == "post-2")
        .unwrap();
    assert_eq!(hidden.status, Status::NotChecked);
    assert!(hidden.summary().contains("cannot be seen"));
}

#[test]
fn a_girder_with_nothing_linked_is_not_checked_never_within() {
    let mut i = demo();
    for area in &mut i.areas {
        for run in &mut area.runs {
            run.bears_on.clear();
        }
    }
    let (findings, _) = evaluate(&i);
    for f in findings.iter().filter(|f| {
        matches!(
            f.rule_id(),
            "girder-strength" | "post-capacity" | "post-footing"
        ) && f.place.location.contains("Centre girder")
    }) {
        assert!(
            !matches!(f.status, Status::Within | Status::NearLimit),
            "{} reads {:?} with no load",
            f.rule_id(),
            f.status
        );
    }
}

#[test]
fn impossible_entries_are_problems_not_guesses() {
    let mut i = demo();
    let line = &mut i.areas[0].girders[0];
    line.posts
        .push(Post::new("post-x", "Post 9", Length::inches(400.0)));
    line.plies = Some(7);
    i.areas[0].runs[0].bears_on.push("no-such-girder".into());
    let (findings, problems) = evaluate(&i);
    let text: Vec<&str> = problems.iter().map(|p| p.message.as_str()).collect();
    assert!(
        text.iter().any(|m| m.contains("Post 9 is placed")),
        "{text:?}"
    );
    assert!(text.iter().any(|m| m.contains("7 plies")), "{text:?}");
    assert!(
        text.iter().any(|m| m.contains("no-such-girder")),
        "{text:?}"
    );
    assert!(findings
        .iter()
        .filter(|f| f.rule_id() == "girder-strength")
        .all(|f| f.status == Status::NotChecked));
}

// Hand calculation (NDS 2018 3.7.1, as in mechanics::column): a DFL No. 2 4x4, 7 ft, carries
// 8681 lb. Under a girder bringing 10,000 lb it is over by 115 %.
#[test]
fn a_tall_post_over_its_capacity() {
    let mut i = demo();
    let area = &mut i.areas[0];
    let mut line = GirderLine::new("g2", "Girder by hand");
    line.length = Some(Length::feet(20.0));
    line.wall_above_plf = Some(1000.0);
    let mut post = Post::new("p2", "Tall post", Length::feet(10.0));
    post.species = Some(crate::lumber::Species::DouglasFirLarch);
    post.grade = Some(crate::lumber::GradeChoice::Stamped(
        crate::lumber::Grade::No2,
    ));
    post.size = Some(crate::lumber::NominalSize::new(4, 4));
    post.height = Some(Length::feet(7.0));
    line.posts.push(post);
    area.girders.push(line);
    let (findings, _) = evaluate(&i);
    let f = findings
        .iter()
        .find(|f| f.rule_id() == "post-capacity" && &*f.place.member_id == "p2")
        .unwrap();
    assert_eq!(f.status, Status::OverLimit);
    assert!(
        (f.ratio().unwrap() - 10_000.0 / 8681.0).abs() < 0.002,
        "{:?}",
        f.ratio()
    );
}

#[test]
fn post_conditions_are_observed_and_reach_the_summary() {
    let (findings, _) = evaluate(&demo());
    let shim = findings
        .iter()
        .find(|f| f.rule_id() == "post-condition")
        .unwrap();
    assert_eq!(
        (shim.basis, shim.status),
        (Basis::Observed, Status::ToEvaluate)
    );
    assert!(shim.summary().contains("Shims"));
}

#[test]
fn standing_water_leaves_unmeasured_spans_not_fully_checked() {
    let mut i = demo();
    i.areas[0].conditions.standing_water = Some(true);
    let dining = |i: &Inspection| {
        crate::evaluate(i)
            .findings
            .into_iter()
            .find(|f| f.rule_id() == "joist-span" && &*f.place.member_id == "run-dining")
            .unwrap()
    };
    // The dining run has a reading of its own: still within.
    assert_eq!(dining(&i).status, Status::Within);
    let run = &mut i.areas[0].runs[1];
    run.observations
        .retain(|o| !matches!(o.kind, crate::model::ObservationKind::Moisture { .. }));
    let f = dining(&i);
    assert_eq!(f.status, Status::Incomplete);
    assert!(f
        .not_checked_because
        .as_deref()
        .unwrap()
        .contains("standing water"));
}

/// Notes on findings and the app's lists are keyed by `Finding::key`: no two findings of an
/// inspection share one, even where a rule makes several on one member (spans, ends,
/// conditions), or a file repeats a condition.
#[test]
fn every_finding_has_its_own_key() {
    let mut repeated = demo();
    repeated.areas[0].girders[0].posts[0].conditions =
        vec![crate::model::PostCondition::Shimmed; 3];
    for i in [
        demo(),
        crate::generate::inspection_with_load_path(500, 20, 3),
        repeated,
    ] {
        let findings = crate::evaluate(&i).findings;
        let mut keys = std::collections::HashSet::new();
        for f in &findings {
            assert!(keys.insert(f.key()), "{} is repeated", f.key());
        }
    }
}
