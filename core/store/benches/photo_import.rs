//! Benchmark: photo import per photo, single-threaded, against libjpeg-turbo's
//! `djpeg -scale 1/2` on the same files as the floor (target: 1.5 x the floor or less).
//!
//! Photos: `python3 scripts/make-bench-photos.py --n 20 --seed 1 --out /tmp/photos20`, then
//! `UNDERCROFT_BENCH_PHOTOS=/tmp/photos20 cargo bench -p undercroft-store --bench photo_import`.
//! Also times `Store::add_photo` (hashing, the three files written durably, the row).

use std::path::PathBuf;
use std::process::Command;
use std::time::{Duration, Instant};
use undercroft_photo as photo;
use undercroft_store::Store;

fn median(mut v: Vec<Duration>) -> Duration {
    v.sort();
    v[v.len() / 2]
}

fn djpeg(path: &std::path::Path) -> Option<Duration> {
    let start = Instant::now();
    let status = Command::new("djpeg")
        .args(["-scale", "1/2", "-outfile", "/dev/null"])
        .arg(path)
        .status()
        .ok()?;
    status.success().then(|| start.elapsed())
}

fn main() {
    let quick = !std::env::args().any(|a| a == "--bench");
    let Some(dir) = std::env::var_os("UNDERCROFT_BENCH_PHOTOS").map(PathBuf::from) else {
        println!("photo_import: set UNDERCROFT_BENCH_PHOTOS to a folder of scripts/make-bench-photos.py output to measure");
        return;
    };
    let mut files: Vec<PathBuf> = std::fs::read_dir(&dir)
        .expect("photo folder")
        .flatten()
        .map(|e| e.path())
        .filter(|p| p.extension().is_some_and(|e| e == "jpg"))
        .collect();
    files.sort();
    if quick {
        files.truncate(2);
    }
    let photos: Vec<Vec<u8>> = files.iter().map(|p| std::fs::read(p).unwrap()).collect();
    let mb = photos.iter().map(Vec::len).sum::<usize>() as f64 / photos.len() as f64 / 1e6;
    println!("{} photos, {mb:.1} MB each on average", photos.len());

    let floor_start: Vec<Duration> = files.iter().filter_map(|p| djpeg(p)).collect();
    // Warm-up, then one pass timing each photo.
    let _ = photo::process(&photos[0]);
    let mut times = Vec::new();
    let mut report_bytes = 0usize;
    for bytes in &photos {
        let start = Instant::now();
        let out = photo::process(bytes).expect("imports");
        times.push(start.elapsed());
        report_bytes += out.report_jpeg.len();
    }
    let floor_end: Vec<Duration> = files.iter().filter_map(|p| djpeg(p)).collect();
    let ours = median(times);
    println!("import (decode 1/2 scale, resize, orient, encode report + thumb): median {ours:.1?}");
    println!(
        "report image average {:.0} KB",
        report_bytes as f64 / photos.len() as f64 / 1e3
    );
    if floor_start.is_empty() {
        println!("djpeg not found (Debian: libjpeg-turbo-progs): no floor");
    } else {
        let (a, b) = (median(floor_start), median(floor_end));
        let floor = (a + b) / 2;
        println!("floor djpeg -scale 1/2 (process included): median {a:.1?} before, {b:.1?} after");
        println!(
            "ratio {:.2} x the floor (target 1.5 or less)",
            ours.as_secs_f64() / floor.as_secs_f64()
        );
    }

    let dir = std::env::temp_dir().join(format!("undercroft-photo-bench-{}", std::process::id()));
    let mut store = Store::open(&dir.join("bench.sqlite")).unwrap();
    let inspection = undercroft_engine::interchange::from_json(include_str!(
        "../../../demo-data/demo-inspection.json"
    ))
    .unwrap();
    store.import_inspection(&inspection).unwrap();
    // Each photo's add is timed right after djpeg on the same file, so that the shared
    // machine's drift hits both: the ratio is taken photo by photo.
    let mut floor_again = Vec::new();
    let mut times = Vec::new();
    let mut ratios = Vec::new();
    for (bytes, file) in photos.iter().zip(&files) {
        let floor = djpeg(file);
        let start = Instant::now();
        store.add_photo("obs-k7-notch", bytes, "bench").unwrap();
        let took = start.elapsed();
        times.push(took);
        if let Some(floor) = floor {
            floor_again.push(floor);
            ratios.push(took.as_secs_f64() / floor.as_secs_f64());
        }
    }
    let added = median(times);
    println!("Store::add_photo (import + hash + 3 files synced + row): median {added:.1?}");
    if !ratios.is_empty() {
        ratios.sort_by(f64::total_cmp);
        println!(
            "add_photo against djpeg on the same file just before: median ratio {:.2} (target 1.5 or less)",
            ratios[ratios.len() / 2]
        );
    }
    let (mut preparing, mut storing) = (Vec::new(), Vec::new());
    for (n, bytes) in photos.iter().enumerate() {
        let mut bytes = bytes.clone();
        bytes.extend_from_slice(&(n as u32).to_le_bytes()); // a new hash, the same picture
        let start = Instant::now();
        let prepared = undercroft_store::prepare_photo(&bytes).unwrap();
        preparing.push(start.elapsed());
        let start = Instant::now();
        store
            .add_prepared_photo("obs-k7-notch", &bytes, &prepared, "bench")
            .unwrap();
        storing.push(start.elapsed());
    }
    println!(
        "  of which preparing (hash beside decode, resize, encode) {:.1?}, storing (3 files synced + row) {:.1?}",
        median(preparing),
        median(storing)
    );
    // The same photos again (a second tap on the same picture, an observation given a photo
    // the inspection already holds): the store has their images, so nothing is decoded.
    let again: Vec<Duration> = photos
        .iter()
        .map(|bytes| {
            let start = Instant::now();
            store.add_photo("obs-k7-notch", bytes, "again").unwrap();
            start.elapsed()
        })
        .collect();
    println!(
        "Store::add_photo of a photo already stored (hash, found, row): median {:.1?}",
        median(again)
    );
    if !floor_again.is_empty() {
        let floor = median(floor_again);
        println!(
            "floor djpeg -scale 1/2 in the same loop: median {floor:.1?}; medians {:.2} x",
            added.as_secs_f64() / floor.as_secs_f64()
        );
    }
    std::fs::remove_dir_all(&dir).ok();
}
