//! Benchmark: edit-to-durable time per change (target 10 ms or less): each call is one
//! transaction committed with synchronous=FULL in WAL mode, so it has reached the disk when
//! it returns. Run with `cargo bench -p undercroft-store --bench store_edits`.

use std::time::{Duration, Instant};
use undercroft_engine::model::{Framing, Observation, ObservationKind};
use undercroft_engine::units::Length;
use undercroft_store::{new_id, Store};

fn summary(name: &str, mut v: Vec<Duration>) {
    v.sort();
    println!(
        "{name:<34} median {:>9.3?}  p95 {:>9.3?}  max {:>9.3?}",
        v[v.len() / 2],
        v[v.len() * 95 / 100],
        v[v.len() - 1]
    );
}

fn main() {
    let quick = !std::env::args().any(|a| a == "--bench");
    let rounds = if quick { 20 } else { 500 };
    let dir = std::env::temp_dir().join(format!("undercroft-edit-bench-{}", std::process::id()));
    let mut store = Store::open(&dir.join("bench.sqlite")).unwrap();
    let inspection = undercroft_engine::interchange::from_json(include_str!(
        "../../../demo-data/demo-inspection.json"
    ))
    .unwrap();
    store.import_inspection(&inspection).unwrap();

    let mut framing_edits = Vec::new();
    for n in 0..rounds {
        let framing = Framing {
            clear_span: Some(Length::inches(150.0 + (n % 40) as f64)),
            ..Default::default()
        };
        let start = Instant::now();
        store
            .update_member("joist-k7", "Joist 7 from the north wall", &framing)
            .unwrap();
        framing_edits.push(start.elapsed());
    }
    summary("change a joist's clear span", framing_edits);

    let mut adds = Vec::new();
    for n in 0..rounds {
        let o = Observation {
            id: new_id().into(),
            kind: ObservationKind::Moisture {
                percent: (n % 30) as f64,
                location: String::new(),
            },
            note: String::new(),
        };
        let start = Instant::now();
        store.add_observation("joist-k12", &o).unwrap();
        adds.push(start.elapsed());
    }
    summary("add a moisture reading", adds);

    let mut loads = Vec::new();
    for _ in 0..rounds.min(100) {
        let start = Instant::now();
        std::hint::black_box(store.load_inspection(&inspection.id).unwrap());
        loads.push(start.elapsed());
    }
    summary("load the inspection (model)", loads);
    std::fs::remove_dir_all(&dir).ok();
}
