//! Benchmark: time to evaluate the demo inspection, a generated 500-member inspection
//! (target: 500 members in 1 ms or less) and the same with 20 girder lines and 60 posts
//! (target: 2 ms or less). Run with `cargo bench -p undercroft-engine`.

use std::hint::black_box;
use std::time::{Duration, Instant};
use undercroft_engine::{evaluate, generate, interchange, Inspection};

/// Times `evaluate` over `rounds` runs (after a warm-up) and prints median, p95 and min.
fn time(name: &str, inspection: &Inspection, rounds: usize) -> Duration {
    for _ in 0..rounds / 10 + 1 {
        black_box(evaluate(black_box(inspection)));
    }
    let mut samples: Vec<Duration> = (0..rounds)
        .map(|_| {
            let start = Instant::now();
            black_box(evaluate(black_box(inspection)));
            start.elapsed()
        })
        .collect();
    samples.sort();
    let median = samples[samples.len() / 2];
    let p95 = samples[samples.len() * 95 / 100];
    let findings = evaluate(inspection).findings.len();
    println!(
        "{name:<28} {findings:>6} findings  median {median:>10.3?}  p95 {p95:>10.3?}  min {:>10.3?}",
        samples[0]
    );
    median
}

fn main() {
    // `cargo test --benches` runs this without --bench: a short pass then.
    let quick = !std::env::args().any(|a| a == "--bench");
    let rounds = if quick { 5 } else { 400 };
    let demo_text = include_str!("../../../demo-data/demo-inspection.json");
    let demo = interchange::from_json(demo_text).expect("demo reads");
    time("demo inspection", &demo, rounds);
    let large = generate::inspection_with_members(500);
    let median = time("500 generated members", &large, rounds);
    let with_path = generate::inspection_with_load_path(500, 20, 3);
    let path_median = time("500 members, 20 girders, 60 posts", &with_path, rounds);
    let start = Instant::now();
    let parsed = interchange::from_json(&interchange::to_json(&large)).expect("round trip");
    println!(
        "{:<28} {:>6}           once   {:>10.3?}",
        "500 members JSON round trip",
        "",
        start.elapsed()
    );
    black_box(parsed);
    if quick {
        println!("quick pass (a smoke run, not a measurement): run `cargo bench` to measure");
    } else {
        let verdict = if median <= Duration::from_millis(1) {
            "met"
        } else {
            "NOT met"
        };
        println!("target: 500 members in 1 ms or less -> {verdict}");
        let verdict = if path_median <= Duration::from_millis(2) {
            "met"
        } else {
            "NOT met"
        };
        println!("target: 500 members, 20 girder lines, 60 posts in 2 ms or less -> {verdict}");
    }
}
