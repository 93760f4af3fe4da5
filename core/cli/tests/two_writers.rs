//! Two processes on one store, as the release command is used: writers take turns (no
//! "database is locked"), and a reader's open never removes another process's new photos.

mod common;
use common::Temp;
use std::path::Path;
use std::process::{Command, Output};
use undercroft_store::Store;

fn undercroft(db: &str, args: &[&str]) -> Output {
    Command::new(env!("CARGO_BIN_EXE_undercroft"))
        .arg("--db")
        .arg(db)
        .args(args)
        .output()
        .expect("the binary runs")
}

fn demo() -> String {
    common::demo_file().display().to_string()
}

/// A small PNG of its own colour, so every photo has its own hash.
fn photo(dir: &Path, n: u32) -> String {
    let image = image::RgbImage::from_fn(96, 64, |x, y| {
        image::Rgb([(n * 7 % 256) as u8, (x * 2) as u8, (y * 3 + n) as u8])
    });
    let path = dir.join(format!("photo-{n}.png"));
    image.save(&path).unwrap();
    path.display().to_string()
}

fn failures(outputs: Vec<Output>) -> Vec<String> {
    outputs
        .into_iter()
        .filter(|o| !o.status.success())
        .map(|o| String::from_utf8_lossy(&o.stderr).into_owned())
        .collect()
}

#[test]
fn processes_that_open_a_new_store_at_once_all_see_it_as_ours() {
    // One process makes the store's tables while the others look at the file: each must see
    // it before or after, never half made (it was once refused as another program's).
    let t = Temp::new("new-store-race");
    for round in 0..150 {
        let db =
            t.0.join(format!("store-{round}.sqlite"))
                .display()
                .to_string();
        let runs: Vec<_> = (0..4)
            .map(|k| {
                let db = db.clone();
                std::thread::spawn(move || {
                    let address = format!("{k} Elm Street");
                    undercroft(&db, &["new", "--address", &address, "--date", "2026-01-01"])
                })
            })
            .collect();
        let failed = failures(runs.into_iter().map(|r| r.join().unwrap()).collect());
        assert!(failed.is_empty(), "round {round}: {failed:?}");
        assert_eq!(
            Store::open(Path::new(&db))
                .unwrap()
                .list_inspections(&Default::default())
                .unwrap()
                .len(),
            4
        );
    }
}

#[test]
fn two_importers_take_turns() {
    let t = Temp::new("two-import");
    let db = t.0.join("store.sqlite").display().to_string();
    let runs: Vec<_> = (0..2)
        .map(|_| {
            let db = db.clone();
            std::thread::spawn(move || {
                (0..15)
                    .map(|_| undercroft(&db, &["import", &demo()]))
                    .collect::<Vec<_>>()
            })
        })
        .collect();
    let outputs: Vec<Output> = runs.into_iter().flat_map(|r| r.join().unwrap()).collect();
    assert_eq!(outputs.len(), 30);
    let failed = failures(outputs);
    assert!(
        failed.is_empty(),
        "{} of 30 failed: {:?}",
        failed.len(),
        failed.first()
    );
}

#[test]
fn photos_added_while_another_process_opens_the_store_keep_their_files() {
    let t = Temp::new("two-photos");
    let db = t.0.join("store.sqlite").display().to_string();
    assert!(undercroft(&db, &["import", &demo()]).status.success());
    let files: Vec<String> = (0..24).map(|n| photo(&t.0, n)).collect();
    let (first, second) = files.split_at(12);
    let adder = |db: String, files: Vec<String>| {
        std::thread::spawn(move || {
            files
                .iter()
                .map(|f| undercroft(&db, &["add-photo", "obs-k7-notch", f]))
                .collect::<Vec<_>>()
        })
    };
    let a = adder(db.clone(), first.to_vec());
    let b = adder(db.clone(), second.to_vec());
    let lister = {
        let db = db.clone();
        std::thread::spawn(move || {
            (0..24)
                .map(|_| undercroft(&db, &["list"]))
                .collect::<Vec<_>>()
        })
    };
    let mut outputs = a.join().unwrap();
    outputs.extend(b.join().unwrap());
    let added = outputs.len();
    let failed = failures(outputs);
    assert!(
        failed.is_empty(),
        "{} of {added} adds failed: {:?}",
        failed.len(),
        failed.first()
    );
    let failed = failures(lister.join().unwrap());
    assert!(failed.is_empty(), "list failed: {:?}", failed.first());

    let store = Store::open(Path::new(&db)).unwrap();
    // The 24 added, and the demo's own photo of this notch, imported with the demo.
    let photos = store.photos_of("obs-k7-notch").unwrap();
    assert_eq!(photos.len(), 24 + 1);
    for p in &photos {
        assert!(
            p.report_path.is_some() && p.thumb_path.is_some() && p.original_path.is_some(),
            "photo {} lost its files",
            p.id
        );
    }
    drop(store);
    // A photo whose file is gone is said aloud by the report, not left out silently.
    let report_dir = Store::open(Path::new(&db))
        .unwrap()
        .photo_dir()
        .join("report");
    let gone = std::fs::read_dir(&report_dir)
        .unwrap()
        .next()
        .unwrap()
        .unwrap()
        .path();
    std::fs::remove_file(gone).unwrap();
    let pdf = t.0.join("r.pdf");
    let o = undercroft(
        &db,
        &[
            "report",
            "--inspection",
            "0193a1c2-7d00-7000-8000-00000000d001",
            "-o",
            pdf.to_str().unwrap(),
        ],
    );
    assert!(o.status.success());
    assert!(
        String::from_utf8_lossy(&o.stderr).contains("has lost its image file"),
        "{}",
        String::from_utf8_lossy(&o.stderr)
    );
    let bundle = t.0.join("b.zip");
    let o = undercroft(
        &db,
        &[
            "export",
            "0193a1c2-7d00-7000-8000-00000000d001",
            "-o",
            bundle.to_str().unwrap(),
        ],
    );
    assert!(o.status.success());
    assert!(
        String::from_utf8_lossy(&o.stderr).contains("has no image file in the store"),
        "{}",
        String::from_utf8_lossy(&o.stderr)
    );
}

/// A report killed at any moment leaves the PDF already at the output path whole: the new
/// one is written under a temporary name and renamed.
#[test]
fn a_killed_report_never_leaves_a_cut_short_pdf() {
    let t = Temp::new("two-killed");
    let pdf = t.0.join("report.pdf");
    let out = pdf.to_str().unwrap().to_string();
    let first = Command::new(env!("CARGO_BIN_EXE_undercroft"))
        .args(["report", &demo(), "-o", &out])
        .output()
        .unwrap();
    assert!(first.status.success());
    let whole = |bytes: &[u8]| {
        bytes.starts_with(b"%PDF-") && bytes.windows(5).rev().take(64).any(|w| w == b"%%EOF")
    };
    assert!(whole(&std::fs::read(&pdf).unwrap()));
    for trial in 0..16u64 {
        let mut child = Command::new(env!("CARGO_BIN_EXE_undercroft"))
            .args(["report", &demo(), "-o", &out])
            .stdout(std::process::Stdio::null())
            .stderr(std::process::Stdio::null())
            .spawn()
            .unwrap();
        std::thread::sleep(std::time::Duration::from_millis(trial * 37 % 400));
        let _ = child.kill();
        let _ = child.wait();
        let bytes = std::fs::read(&pdf).unwrap();
        assert!(
            whole(&bytes),
            "trial {trial}: {} bytes, not a whole PDF",
            bytes.len()
        );
    }
}
