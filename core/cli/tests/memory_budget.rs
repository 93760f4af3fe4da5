//! Every command stays under 256 MiB on hostile input: each case runs the real binary and
//! reads the child's peak resident memory from wait4's rusage.

mod common;
use common::Temp;
use std::io::Write;
use std::path::Path;
use std::process::{Command, Stdio};

/// The budget of the store issue: no single command above 256 MiB.
const BUDGET_KIB: i64 = 256 * 1024;

/// Runs the command and returns (success, peak RSS in KiB, stderr). The child is reaped by
/// wait4 (which also gives its rusage), not by `Child::wait`.
#[allow(clippy::zombie_processes)]
fn peak(args: &[&str]) -> (bool, i64, String) {
    let err_path = std::env::temp_dir().join(format!(
        "undercroft-mem-stderr-{}-{}",
        std::process::id(),
        args.join("_").len()
    ));
    let err = std::fs::File::create(&err_path).unwrap();
    let child = Command::new(env!("CARGO_BIN_EXE_undercroft"))
        .args(args)
        .stdout(Stdio::null())
        .stderr(err)
        .spawn()
        .expect("the binary runs");
    let pid = child.id() as libc::pid_t;
    let mut status = 0;
    // SAFETY: rusage is plain data; wait4 fills it for our own child, which `child` does not
    // wait for afterwards.
    let mut usage: libc::rusage = unsafe { std::mem::zeroed() };
    let waited = unsafe { libc::wait4(pid, &mut status, 0, &mut usage) };
    assert_eq!(waited, pid, "wait4 failed");
    let stderr = std::fs::read_to_string(&err_path).unwrap_or_default();
    let _ = std::fs::remove_file(&err_path);
    let ok = libc::WIFEXITED(status) && libc::WEXITSTATUS(status) == 0;
    (ok, usage.ru_maxrss, stderr)
}

fn store_with_demo(t: &Temp) -> String {
    let db = t.0.join("store.sqlite").display().to_string();
    let demo = common::demo_file();
    let (ok, _, err) = peak(&["--db", &db, "import", demo.to_str().unwrap()]);
    assert!(ok, "{err}");
    db
}

/// A JPEG header declaring a progressive 14000 x 15000 image (4:2:0), with no image data:
/// libjpeg-turbo would buffer every coefficient (about 630 MB) before reading a scan.
fn progressive_bomb(path: &Path) {
    let mut b = vec![0xFF, 0xD8];
    // One quantization table (all 1s), so that a decoder goes on to allocate.
    b.extend([0xFF, 0xDB, 0x00, 0x43, 0x00]);
    b.extend([0x01; 64]);
    // One DC Huffman table (a single 1-bit code), for the first scan.
    b.extend([0xFF, 0xC4, 0x00, 0x14, 0x00, 0x01]);
    b.extend([0x00; 15]);
    b.push(0x00);
    let (w, h) = (14000u16, 15000u16);
    b.extend([0xFF, 0xC2, 0x00, 0x11, 0x08]);
    b.extend(h.to_be_bytes());
    b.extend(w.to_be_bytes());
    b.extend([0x03, 0x01, 0x22, 0x00, 0x02, 0x11, 0x00, 0x03, 0x11, 0x00]);
    b.extend([0xFF, 0xDA, 0x00, 0x08, 0x01, 0x01, 0x00, 0x00, 0x00, 0x00]);
    b.extend([0x00; 64]);
    b.extend([0xFF, 0xD9]);
    std::fs::write(path, b).unwrap();
}

/// A 16-bit RGBA PNG of 6000 x 6000 px, all zero: a few hundred KB that decode to 288 MB.
fn png16_bomb(path: &Path) {
    let file = std::io::BufWriter::new(std::fs::File::create(path).unwrap());
    let mut encoder = png::Encoder::new(file, 6000, 6000);
    encoder.set_color(png::ColorType::Rgba);
    encoder.set_depth(png::BitDepth::Sixteen);
    encoder.set_compression(png::Compression::Fast);
    let mut writer = encoder
        .write_header()
        .unwrap()
        .into_stream_writer()
        .unwrap();
    let row = vec![0u8; 6000 * 8];
    for _ in 0..6000 {
        writer.write_all(&row).unwrap();
    }
    writer.finish().unwrap();
}

#[test]
fn hostile_photos_are_refused_within_the_budget() {
    let t = Temp::new("mem-photos");
    let db = store_with_demo(&t);
    let jpeg = t.0.join("bomb.jpg");
    progressive_bomb(&jpeg);
    let png = t.0.join("bomb.png");
    png16_bomb(&png);
    assert!(std::fs::metadata(&png).unwrap().len() < 2_000_000);
    for (file, says) in [
        (jpeg.to_str().unwrap(), "128 MiB"),
        (png.to_str().unwrap(), "128 MiB"),
        ("/dev/zero", "too large"),
    ] {
        let (ok, kib, err) = peak(&["--db", &db, "add-photo", "obs-k7-notch", file]);
        assert!(kib < BUDGET_KIB, "{file}: peak {kib} KiB");
        assert!(!ok, "{file} was accepted");
        assert!(err.contains(says), "{file}: {err}");
    }
}

#[test]
fn hostile_files_are_refused_within_the_budget() {
    let t = Temp::new("mem-files");
    let sparse = t.0.join("sparse.json");
    std::fs::File::create(&sparse)
        .unwrap()
        .set_len(4 << 30)
        .unwrap();
    let (ok, kib, err) = peak(&["check", sparse.to_str().unwrap()]);
    assert!(!ok && err.contains("too large"), "{err}");
    assert!(kib < BUDGET_KIB, "check: peak {kib} KiB");

    // A bundle of 30 "originals" of 40 MB each (deflated zeros, a few MB in all).
    let bundle = t.0.join("bomb.zip");
    let mut zip = zip::ZipWriter::new(std::fs::File::create(&bundle).unwrap());
    let deflated = zip::write::SimpleFileOptions::default()
        .compression_method(zip::CompressionMethod::Deflated);
    let demo = std::fs::read(common::demo_file()).unwrap();
    zip.start_file("inspection.json", deflated).unwrap();
    zip.write_all(&demo).unwrap();
    let chunk = vec![0u8; 1 << 20];
    for n in 0..30 {
        zip.start_file(
            format!("originals/{}.jpg", format!("{n:02}").repeat(32)),
            deflated,
        )
        .unwrap();
        for _ in 0..40 {
            zip.write_all(&chunk).unwrap();
        }
    }
    zip.finish().unwrap();
    let db = t.0.join("store.sqlite").display().to_string();
    let (ok, kib, err) = peak(&["--db", &db, "import", bundle.to_str().unwrap()]);
    assert!(!ok, "the bundle was accepted");
    assert!(
        err.contains("not an image") || err.contains("does not hold"),
        "{err}"
    );
    assert!(kib < BUDGET_KIB, "import: peak {kib} KiB");
}

/// `check --json` on a generated 20,000-member inspection is written as a stream: its peak is
/// the inspection and its findings, not the text on top of them.
#[test]
fn a_large_check_streams_its_output() {
    let t = Temp::new("mem-large");
    let inspection = undercroft_engine::generate::inspection_with_members(20_000);
    let file = t.0.join("large.json");
    std::fs::write(&file, undercroft_engine::interchange::to_json(&inspection)).unwrap();
    drop(inspection);
    for args in [vec!["check", "--json"], vec!["check"]] {
        let mut args = args;
        args.push(file.to_str().unwrap());
        let (ok, kib, err) = peak(&args);
        assert!(ok, "{err}");
        eprintln!("{args:?}: peak {kib} KiB");
        assert!(kib < BUDGET_KIB, "{args:?}: peak {kib} KiB");
    }
}
