//! Benchmark: the client report with 40 findings, each with one photo from
//! `scripts/make-bench-photos.py`, already imported: build time (target 0.15 s or less), peak memory
//! (150 MiB or less), file size (10 MB or less); and the whole job, importing the 40 raw
//! photos on both cores and building the report (2 s or less).
//!
//! `python3 scripts/make-bench-photos.py --n 40 --seed 2 --out /tmp/photos40`, then
//! `UNDERCROFT_BENCH_PHOTOS=/tmp/photos40 cargo bench -p undercroft-tests --bench report`.

use std::path::{Path, PathBuf};
use std::time::Instant;
use undercroft_engine::interchange::from_json;
use undercroft_engine::model::*;
use undercroft_engine::units::Length;
use undercroft_engine::{evaluate, Inspection};
use undercroft_report::{build_report, pdf, Paper, PhotoFiles, ReportInput};
use undercroft_store::{prepare_photo, Store};

const INSPECTION: &str = "bench-report";

/// 40 runs of one joist each with a notch: 40 findings that do not group, each to photograph.
fn inspection(joists: usize) -> Inspection {
    let mut i = from_json(&format!(
        r#"{{"format":"undercroft-inspection","version":1,"id":"{INSPECTION}","property":{{"address":"12 Bench Street"}},"date":"2026-12-01",
        "areas":[{{"id":"a","name":"Crawlspace","runs":[{{"id":"r","label":"Run","framing":{{"species":"spf","grade":"no2","size":"2x10","spacing":16,"clear_span":180,"bearing":{{"length":3,"on":"concrete"}},"end_restraint":"rim-joist"}}}}]}}]}}"#
    ))
    .unwrap();
    let template = i.areas[0].runs.remove(0);
    for n in 0..joists {
        let mut run = template.clone();
        run.id = format!("r{n}");
        run.label = format!("Run {}", n + 1);
        let notch = ObservationKind::Notch {
            edge: Edge::Bottom,
            depth: Length::inches(1.0 + (n % 5) as f64 * 0.25),
            length: Length::inches(3.0),
            at_end: false,
            from_support: Some(Length::inches(12.0 + n as f64)),
            end: End::A,
        };
        run.joists.push(Joist {
            id: format!("j{n}"),
            label: format!("Joist {}", n + 1),
            at: None,
            framing: Framing::default(),
            observations: vec![Observation {
                id: format!("n{n}").into(),
                kind: notch,
                note: String::new(),
            }],
        });
        i.areas[0].runs.push(run);
    }
    i
}

fn build(store: &Store, out: &Path) -> usize {
    let inspection = store.load_inspection(INSPECTION).unwrap();
    let files: PhotoFiles = store
        .photos_of_inspection(INSPECTION)
        .unwrap()
        .into_iter()
        .filter_map(|p| p.report_path.map(|f| (p.id, f)))
        .collect();
    let evaluation = evaluate(&inspection);
    let report = build_report(&ReportInput {
        inspection: &inspection,
        evaluation: &evaluation,
        notes: &[],
        photo_files: &files,
        paper: Paper::Letter,
        repair_options: false,
    });
    let bytes = pdf::render(&report);
    std::fs::write(out, &bytes).unwrap();
    evaluation.findings.len()
}

fn peak_rss_mib() -> f64 {
    let status = std::fs::read_to_string("/proc/self/status").unwrap_or_default();
    status
        .lines()
        .find_map(|l| l.strip_prefix("VmHWM:"))
        .and_then(|v| v.trim().trim_end_matches("kB").trim().parse::<f64>().ok())
        .unwrap_or(0.0)
        / 1024.0
}

/// Imports the photos, one per notch: prepared on `threads` threads, stored in order.
fn import(store: &mut Store, photos: &[Vec<u8>], threads: usize) {
    let prepared: Vec<_> = std::thread::scope(|scope| {
        let chunk = photos.len().div_ceil(threads);
        let handles: Vec<_> = photos
            .chunks(chunk)
            .map(|part| {
                scope.spawn(move || {
                    part.iter()
                        .map(|b| prepare_photo(b).unwrap())
                        .collect::<Vec<_>>()
                })
            })
            .collect();
        handles
            .into_iter()
            .flat_map(|h| h.join().unwrap())
            .collect()
    });
    for (n, (bytes, p)) in photos.iter().zip(&prepared).enumerate() {
        store
            .add_prepared_photo(
                &format!("n{n}"),
                bytes,
                p,
                &format!("Notch of joist {}", n + 1),
            )
            .unwrap();
    }
}

fn main() {
    let args: Vec<String> = std::env::args().collect();
    // Child mode: build the report from an existing store, report time and peak memory.
    if let Some(at) = args.iter().position(|a| a == "--build-only") {
        let db = PathBuf::from(&args[at + 1]);
        let store = Store::open(&db).unwrap();
        let out = db.with_extension("pdf");
        let mut times = Vec::new();
        for _ in 0..5 {
            let start = Instant::now();
            build(&store, &out);
            times.push(start.elapsed());
        }
        times.sort();
        let size = std::fs::metadata(&out).unwrap().len() as f64 / 1e6;
        println!(
            "build (load, evaluate, report value, PDF, write): median {:.1?}, min {:.1?}",
            times[2], times[0]
        );
        println!(
            "PDF size {size:.2} MB; peak memory of the building process {:.0} MiB",
            peak_rss_mib()
        );
        return;
    }
    let quick = !args.iter().any(|a| a == "--bench");
    let Some(dir) = std::env::var_os("UNDERCROFT_BENCH_PHOTOS").map(PathBuf::from) else {
        println!(
            "report: set UNDERCROFT_BENCH_PHOTOS to a folder of scripts/make-bench-photos.py output to measure"
        );
        return;
    };
    let mut files: Vec<PathBuf> = std::fs::read_dir(&dir)
        .unwrap()
        .flatten()
        .map(|e| e.path())
        .filter(|p| p.extension().is_some_and(|e| e == "jpg"))
        .collect();
    files.sort();
    files.truncate(if quick { 2 } else { 40 });
    let photos: Vec<Vec<u8>> = files.iter().map(|p| std::fs::read(p).unwrap()).collect();
    let n = photos.len();
    let tmp = std::env::temp_dir().join(format!("undercroft-report-bench-{}", std::process::id()));
    std::fs::create_dir_all(&tmp).unwrap();

    // Already imported: a store with the photos in, then a child process builds the report.
    let db = tmp.join("imported.sqlite");
    let mut store = Store::open(&db).unwrap();
    store.import_inspection(&inspection(n)).unwrap();
    import(&mut store, &photos, 2);
    drop(store);
    let child = std::process::Command::new(std::env::current_exe().unwrap())
        .arg("--build-only")
        .arg(&db)
        .output()
        .unwrap();
    print!("{}", String::from_utf8_lossy(&child.stdout));

    // The whole job: raw photos in, report out.
    let mut whole = Vec::new();
    for round in 0..if quick { 1 } else { 3 } {
        let db = tmp.join(format!("whole-{round}.sqlite"));
        let start = Instant::now();
        let mut store = Store::open(&db).unwrap();
        store.import_inspection(&inspection(n)).unwrap();
        import(&mut store, &photos, 2);
        let findings = build(&store, &db.with_extension("pdf"));
        whole.push(start.elapsed());
        if round == 0 {
            println!("{n} photos, {findings} findings");
        }
    }
    whole.sort();
    println!("whole job (import {n} raw photos on 2 threads, store them, build the report): median {:.2?}", whole[whole.len() / 2]);
    let single = Instant::now();
    let mut store = Store::open(&tmp.join("single.sqlite")).unwrap();
    store.import_inspection(&inspection(n)).unwrap();
    import(&mut store, &photos, 1);
    println!("(the same import on 1 thread: {:.2?})", single.elapsed());
    std::fs::remove_dir_all(&tmp).ok();
}
