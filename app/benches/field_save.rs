//! Benchmark: from a field change on the run screen to its durable save (target 10 ms or
//! less), through the same function the screen's handler calls: the form updated, what reads
//! committed with synchronous=FULL. Also timed: the work of the screen's next render (the
//! inspection loaded again and the live check recomputed). Keystrokes are typed one at a
//! time, as an inspector types `16' 0"`, into a store on disk holding the demo inspection.
//! Run with `cargo bench -p undercroft-app --bench field_save`.

use std::time::{Duration, Instant};
use undercroft_app::edits::{
    save_area_field, save_framing_field, save_header_field, FramingEdit, FramingOwner,
};
use undercroft_app::startup::DEMO_INSPECTION;
use undercroft_engine::forms::{live_check, FramingForm};
use undercroft_store::Store;

const DEMO_ID: &str = "0193a1c2-7d00-7000-8000-00000000d001";

fn summary(name: &str, mut v: Vec<Duration>) {
    v.sort();
    println!(
        "{name:<44} n {:>4}  min {:>9.3?}  median {:>9.3?}  p95 {:>9.3?}  max {:>9.3?}",
        v.len(),
        v[0],
        v[v.len() / 2],
        v[v.len() * 95 / 100],
        v[v.len() - 1]
    );
}

fn main() {
    let quick = !std::env::args().any(|a| a == "--bench");
    let rounds = if quick { 3 } else { 100 };
    let dir = std::env::temp_dir().join(format!("undercroft-field-bench-{}", std::process::id()));
    let _ = std::fs::remove_dir_all(&dir);
    let mut store = Store::open(&dir.join("bench.sqlite")).expect("store opens");
    let demo = undercroft_engine::interchange::from_json(DEMO_INSPECTION).expect("demo reads");
    store.import_inspection(&demo).expect("demo stored");
    let inspection = store.load_inspection(DEMO_ID).expect("demo loads");
    let (area, run) = inspection.run("run-kitchen").expect("the kitchen run");
    let (stored, loads, units) = (
        run.framing.clone(),
        area.loads.resolve(&inspection.loads),
        inspection.units,
    );
    let owner = FramingOwner::Run {
        id: "run-kitchen",
        label: &run.label,
    };

    let typed = "16' 0\"";
    let (mut saves, mut renders) = (Vec::new(), Vec::new());
    for _ in 0..rounds {
        let mut form = FramingForm::from_framing(&stored, units);
        for end in 0..=typed.len() {
            let text = typed[..end].to_string();
            let start = Instant::now();
            let errors = save_framing_field(
                &mut store,
                owner,
                &mut form,
                &stored,
                units,
                FramingEdit {
                    field: "clear_span",
                    value: text,
                    confirmed: false,
                },
            )
            .expect("saved");
            saves.push(start.elapsed());
            std::hint::black_box(errors);

            let start = Instant::now();
            let reloaded = store.load_inspection(DEMO_ID).expect("loads");
            std::hint::black_box(live_check(&form, &loads, units));
            std::hint::black_box(reloaded);
            renders.push(start.elapsed());
        }
    }
    summary("field change to durable save", saves);
    summary("next render's work (reload + live check)", renders);

    // The inspection's header and an area's loads, edited after creation, saved the same way.
    let address = "12 Rue des Érables, Québec";
    let mut header = Vec::new();
    let mut area_saves = Vec::new();
    for _ in 0..rounds {
        for end in address.char_indices().map(|(i, _)| i).skip(1) {
            let start = Instant::now();
            save_header_field(&mut store, DEMO_ID, "property.address", &address[..end])
                .expect("header saved");
            header.push(start.elapsed());
        }
        for text in ["4", "40", "45", "50"] {
            let start = Instant::now();
            save_area_field(&mut store, "area-crawl", "loads.live_psf", text)
                .or_else(|e| if e.field == "save" { Err(e) } else { Ok(()) })
                .expect("area saved");
            area_saves.push(start.elapsed());
        }
    }
    summary("header field change to durable save", header);
    summary("area field change to durable save", area_saves);
    std::fs::remove_dir_all(&dir).ok();
}
