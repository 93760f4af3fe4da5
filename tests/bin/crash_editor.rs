//! A child process for the crash test: makes rapid edits to a store and prints a line for
//! each one after the store call returns (the edit is acknowledged), until it is killed.
//!
//! crash-editor DB_PATH

use std::io::Write;
use undercroft_engine::model::*;
use undercroft_engine::units::Length;
use undercroft_store::Store;

const INSPECTION: &str = "crash-inspection";
const JOIST: &str = "crash-joist";

fn main() {
    let db = std::env::args()
        .nth(1)
        .expect("usage: crash-editor DB_PATH");
    let mut store = Store::open(std::path::Path::new(&db)).expect("store opens");
    if store.load_inspection(INSPECTION).is_err() {
        let mut inspection = undercroft_engine::interchange::from_json(
            r#"{"format":"undercroft-inspection","version":1,"id":"crash-inspection","property":{"address":"Crash test"},"date":"2026-12-01",
                "areas":[{"id":"crash-area","name":"Crawlspace","runs":[{"id":"crash-run","label":"Run",
                "joists":[{"id":"crash-joist","label":"Joist"}]}]}]}"#,
        )
        .expect("seed inspection");
        inspection.id = INSPECTION.into();
        store.import_inspection(&inspection).expect("seed stored");
    }
    let photo = std::fs::read(std::env::args().nth(2).unwrap_or_default()).ok();
    let out = std::io::stdout();
    let pid = std::process::id();
    for n in 0u64.. {
        let line = match n % 10 {
            // A photo now and then: its files and row must both survive or neither.
            9 if photo.is_some() => {
                let p = store
                    .add_photo(
                        JOIST,
                        photo.as_deref().unwrap_or_default(),
                        &format!("photo {pid}-{n}"),
                    )
                    .expect("photo");
                format!("photo {}", p.id)
            }
            0..=5 => {
                let id = format!("obs-{pid}-{n}");
                let o = Observation {
                    id: id.clone().into(),
                    kind: ObservationKind::Moisture {
                        percent: (n % 30) as f64,
                        location: String::new(),
                    },
                    note: format!("edit {n}"),
                };
                store.add_observation(JOIST, &o).expect("observation");
                format!("observation {id}")
            }
            _ => {
                let span = 100.0 + (n % 1000) as f64;
                let framing = Framing {
                    clear_span: Some(Length::inches(span)),
                    ..Default::default()
                };
                store
                    .update_member(JOIST, &format!("Joist {pid}-{n}"), &framing)
                    .expect("update");
                format!("label Joist {pid}-{n}")
            }
        };
        let mut lock = out.lock();
        writeln!(lock, "{line}").expect("stdout");
        lock.flush().expect("stdout");
    }
}
