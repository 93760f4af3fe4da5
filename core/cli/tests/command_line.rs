//! The `undercroft` command as a user runs it: span and check, in text and JSON, and the
//! clear refusals of bad input.

use std::path::PathBuf;
use std::process::{Command, Output};

fn undercroft(args: &[&str]) -> Output {
    Command::new(env!("CARGO_BIN_EXE_undercroft"))
        .args(args)
        .output()
        .expect("the binary runs")
}

fn stdout(o: &Output) -> String {
    String::from_utf8_lossy(&o.stdout).into_owned()
}

fn stderr(o: &Output) -> String {
    String::from_utf8_lossy(&o.stderr).into_owned()
}

fn demo() -> String {
    PathBuf::from(env!("CARGO_MANIFEST_DIR"))
        .join("../../demo-data/demo-inspection.json")
        .display()
        .to_string()
}

fn span_json(args: &[&str]) -> serde_json::Value {
    let mut all = vec!["span", "--json"];
    all.extend_from_slice(args);
    let o = undercroft(&all);
    assert!(o.status.success(), "{}", stderr(&o));
    serde_json::from_str(&stdout(&o)).expect("one JSON object")
}

// Source: IRC 2015 Table R502.3.1(2), SPF No. 2 2x10 at 16 in, 40/10 psf: 15-5 (185 in).
#[test]
fn span_json_reproduces_the_printed_table() {
    let v = span_json(&[
        "--species",
        "spf",
        "--grade",
        "no2",
        "--size",
        "2x10",
        "--spacing",
        "16",
        "--live",
        "40",
        "--dead",
        "10",
    ]);
    assert_eq!(v["allowable_span_rounded_in"], 185.0);
    assert_eq!(v["governing"], "bending");
    let unrounded = v["allowable_span_in"].as_f64().unwrap();
    assert!((unrounded - 184.65).abs() < 0.01, "{unrounded}");
    assert_eq!(v["allowable_span_ftin"], "15' 5\"");
}

// Source: IRC 2018 Table R502.3.1(2) as reproduced in the 2018 Seattle Residential Code:
// SPF SS 2x6 at 12 in, 40/10 psf: 10-6 (126 in).
#[test]
fn spellings_users_type_are_accepted() {
    for (species, grade) in [
        ("SPF", "ss"),
        ("spruce-pine-fir", "select-structural"),
        ("spf", "SS"),
    ] {
        let v = span_json(&[
            "--species",
            species,
            "--grade",
            grade,
            "--size",
            "2x6",
            "--spacing",
            "12",
        ]);
        assert_eq!(v["allowable_span_rounded_in"], 126.0, "{species} {grade}");
    }
    for grade in ["#2", "2", "no2"] {
        let v = span_json(&[
            "--species",
            "dfl",
            "--grade",
            grade,
            "--size",
            "2x10",
            "--spacing",
            "16",
        ]);
        assert_eq!(v["grade"], "no2");
    }
}

#[test]
fn wet_and_rough_sawn_options() {
    let dry = span_json(&[
        "--species",
        "spf",
        "--grade",
        "no2",
        "--size",
        "2x10",
        "--spacing",
        "16",
    ]);
    let wet = span_json(&[
        "--species",
        "spf",
        "--grade",
        "no2",
        "--size",
        "2x10",
        "--spacing",
        "16",
        "--wet",
    ]);
    assert!(wet["deflection_span_in"].as_f64() < dry["deflection_span_in"].as_f64());
    let rough = span_json(&[
        "--species",
        "spf",
        "--grade",
        "no2",
        "--size",
        "2x10",
        "--spacing",
        "16",
        "--actual",
        "1.625x9.5",
    ]);
    assert_eq!(rough["depth_in"], 9.5);
    assert_eq!(rough["rough_sawn"], true);
    assert!(rough["allowable_span_in"].as_f64() > dry["allowable_span_in"].as_f64());
    let none = span_json(&[
        "--species",
        "spf",
        "--grade",
        "none",
        "--size",
        "2x10",
        "--spacing",
        "16",
    ]);
    assert_eq!(none["grade_used"], "no3");
}

#[test]
fn span_text_names_the_governing_check() {
    let o = undercroft(&[
        "span",
        "--species",
        "spf",
        "--grade",
        "no2",
        "--size",
        "2x10",
        "--spacing",
        "16",
    ]);
    let text = stdout(&o);
    assert!(text.contains("Allowable span: 15' 5\" (185 in"), "{text}");
    assert!(
        text.contains("bending") && text.contains("<- governs"),
        "{text}"
    );
    assert!(text.contains("licensed professional"), "{text}");
}

#[test]
fn unknown_species_and_grade_list_the_known_ones() {
    let o = undercroft(&[
        "span",
        "--species",
        "oak",
        "--grade",
        "no2",
        "--size",
        "2x10",
        "--spacing",
        "16",
    ]);
    assert!(!o.status.success());
    let err = stderr(&o);
    assert!(
        err.contains("unknown species \"oak\"") && err.contains("spruce-pine-fir"),
        "{err}"
    );
    let o = undercroft(&[
        "span",
        "--species",
        "spf",
        "--grade",
        "utility",
        "--size",
        "2x10",
        "--spacing",
        "16",
    ]);
    assert!(stderr(&o).contains("select-structural"), "{}", stderr(&o));
}

#[test]
fn bad_numbers_are_refused_clearly() {
    let cases: &[(&[&str], &str)] = &[
        (&["--spacing", "13''7"], "--spacing"),
        (&["--spacing", "100"], "expected 4 to 48 in"),
        (&["--spacing", "16", "--live", "0"], "--live"),
        (&["--spacing", "16", "--live", "NaN"], "--live"),
        (&["--spacing", "16", "--dead", "-5"], "--dead"),
        (&["--spacing", "16", "--actual", "2xfoo"], "--actual"),
    ];
    for (extra, expect) in cases {
        let mut args = vec![
            "span",
            "--species",
            "spf",
            "--grade",
            "no2",
            "--size",
            "2x10",
        ];
        args.extend_from_slice(extra);
        let o = undercroft(&args);
        assert!(!o.status.success(), "{extra:?} was accepted");
        assert!(stderr(&o).contains(expect), "{extra:?}: {}", stderr(&o));
    }
}

#[test]
fn check_json_lists_findings_with_citations() {
    let o = undercroft(&["check", &demo(), "--json"]);
    assert!(o.status.success(), "{}", stderr(&o));
    let v: serde_json::Value = serde_json::from_str(&stdout(&o)).unwrap();
    let findings = v["findings"].as_array().unwrap();
    assert!(findings.len() > 30);
    for f in findings {
        for key in ["rule_id", "basis", "status", "status_label", "citation"] {
            assert!(f.get(key).is_some(), "{key} missing in {f}");
        }
        if f["status"] != "not-checked" && f["status"] != "to-evaluate" {
            assert!(
                f.get("measured").is_some() && f.get("limit").is_some(),
                "{f}"
            );
        }
    }
    let notch = findings
        .iter()
        .find(|f| f["observation_id"] == "obs-k7-notch")
        .unwrap();
    assert_eq!(notch["status"], "over-limit");
    assert_eq!(notch["citation"], "IRC 2018 R502.8.1");
    assert_eq!(notch["status_label"], "OVER CODE LIMIT");
    assert_eq!(notch["measured"]["value"], 2.0);
    // Source: IRC 2018 R502.8.1, d/6 of a 9-1/4 in 2x10 = 1.542 in, held as shown: 1-1/2 in.
    assert_eq!(notch["limit"]["text"], "1-1/2\"");
    assert!((notch["ratio"].as_f64().unwrap() - 2.0 / 1.5).abs() < 1e-9);
    let counts = &v["counts"];
    assert!(counts["code_over"].as_u64().unwrap() > 0, "{counts}");
    // Decay, a cut joist, a shimmed post and a torn ground cover.
    assert_eq!(counts["observed_to_evaluate"], 4, "{counts}");
    assert!(v["benchmark"].as_str().unwrap().contains("built in 1948"));
}

#[test]
fn typed_fractions_of_one_or_more_are_refused_with_a_suggestion() {
    let o = undercroft(&[
        "span",
        "--species",
        "spf",
        "--grade",
        "no2",
        "--size",
        "2x10",
        "--spacing",
        "11/2",
    ]);
    assert!(!o.status.success());
    assert!(
        stderr(&o).contains("did you mean 1-1/2\""),
        "{}",
        stderr(&o)
    );
}

#[test]
fn check_text_puts_over_limit_first() {
    let o = undercroft(&["check", &demo()]);
    let text = stdout(&o);
    let first = text.lines().find(|l| l.starts_with('[')).unwrap();
    assert!(first.starts_with("[OVER CODE LIMIT"), "{first}");
    assert!(text.contains("[TO BE EVALUATED] wood-damage"), "{text}");
    assert!(text.contains("benchmark of current practice"), "{text}");
    assert!(text.contains("Screening tool"), "{text}");
}

#[test]
fn check_refuses_bad_files_with_the_field_path() {
    let dir = std::env::temp_dir().join(format!("undercroft-cli-{}", std::process::id()));
    std::fs::create_dir_all(&dir).unwrap();
    let bad = dir.join("bad.json");
    let text = std::fs::read_to_string(demo())
        .unwrap()
        .replace("\"clear_span\": \"15' 2\\\"\"", "\"clear_span\": \"-4\"");
    std::fs::write(&bad, text).unwrap();
    let o = undercroft(&["check", bad.to_str().unwrap()]);
    assert_eq!(o.status.code(), Some(2));
    let err = stderr(&o);
    assert!(
        err.contains("areas[0].runs[0].framing.clear_span") && err.contains("negative"),
        "{err}"
    );

    for (name, bytes) in [
        ("empty.json", &b""[..]),
        ("binary.json", &b"\x89PNG\r\n\x1a\n\0\0"[..]),
        ("cut.json", &b"{\"format\": \"underc"[..]),
    ] {
        let p = dir.join(name);
        std::fs::write(&p, bytes).unwrap();
        let o = undercroft(&["check", p.to_str().unwrap()]);
        assert_eq!(o.status.code(), Some(2), "{name}");
        assert!(
            stderr(&o).contains("not a usable inspection file"),
            "{name}: {}",
            stderr(&o)
        );
    }
    let o = undercroft(&["check", dir.join("missing.json").to_str().unwrap()]);
    assert!(stderr(&o).contains("cannot read"), "{}", stderr(&o));
    std::fs::remove_dir_all(&dir).ok();
}

#[test]
fn rules_lists_every_id() {
    let text = stdout(&undercroft(&["rules"]));
    for id in [
        "joist-span",
        "sawn-notch",
        "sawn-bored-hole",
        "bearing-length",
        "bridging",
        "sag-reading",
        "deck-joist-span",
        "girder-strength",
        "post-capacity",
        "post-footing",
        "crawlspace-conditions",
    ] {
        assert!(text.contains(id), "{id} missing");
    }
}

/// Runs the command with its output's reader already gone (as `| head` that has exited).
fn with_reader_gone(args: &[&str]) -> Output {
    let mut child = Command::new(env!("CARGO_BIN_EXE_undercroft"))
        .args(args)
        .stdout(std::process::Stdio::piped())
        .stderr(std::process::Stdio::piped())
        .spawn()
        .expect("the binary runs");
    // Closing our end before the command writes makes its every write meet a closed pipe.
    drop(child.stdout.take());
    child.wait_with_output().expect("the command ends")
}

#[test]
fn a_reader_that_stops_early_ends_the_command_quietly() {
    let demo = demo();
    for args in [
        vec!["rules"],
        vec!["check", demo.as_str()],
        vec!["check", "--json", demo.as_str()],
        vec![
            "span",
            "--species",
            "spf",
            "--grade",
            "no2",
            "--size",
            "2x10",
            "--spacing",
            "16",
        ],
    ] {
        let o = with_reader_gone(&args);
        assert_eq!(o.status.code(), Some(0), "{args:?}: {}", stderr(&o));
        assert_eq!(stderr(&o), "", "{args:?}");
    }
}

#[test]
fn check_covers_the_load_path_and_questions_impossible_posts() {
    let o = undercroft(&["check", "--json", &demo()]);
    assert!(o.status.success(), "{}", stderr(&o));
    let v: serde_json::Value = serde_json::from_str(&stdout(&o)).unwrap();
    let findings = v["findings"].as_array().unwrap();
    let over_span = findings
        .iter()
        .find(|f| f["rule_id"] == "girder-strength" && f["status"] == "over-limit")
        .expect("the demo girder's long span");
    assert_eq!(over_span["basis"], "reference");
    assert_eq!(over_span["status_label"], "BEYOND REFERENCE");
    let hidden = findings
        .iter()
        .find(|f| f["rule_id"] == "post-footing" && f["member_id"] == "post-2")
        .unwrap();
    assert_eq!(hidden["status"], "not-checked");

    // A post typed past the girder's end is an input problem, not a guess.
    let mut inspection: serde_json::Value =
        serde_json::from_str(&std::fs::read_to_string(demo()).unwrap()).unwrap();
    inspection["areas"][0]["girders"][0]["posts"][1]["at"] = serde_json::json!("30' 0\"");
    let dir = TempStore::new("load-path");
    let file = dir.0.join("far-post.json");
    std::fs::write(&file, inspection.to_string()).unwrap();
    let o = undercroft(&["check", &file.display().to_string()]);
    let text = stdout(&o);
    assert!(
        text.contains("Post 2 is placed 360.0 in from end A, not between the ends; post not used"),
        "{text}"
    );
}

/// A temporary folder for a store, removed at the end.
struct TempStore(PathBuf);

impl TempStore {
    fn new(name: &str) -> TempStore {
        let dir = std::env::temp_dir().join(format!(
            "undercroft-cli-store-{name}-{}",
            std::process::id()
        ));
        std::fs::create_dir_all(&dir).unwrap();
        TempStore(dir)
    }
    fn db(&self) -> String {
        self.0.join("store.sqlite").display().to_string()
    }
}

impl Drop for TempStore {
    fn drop(&mut self) {
        std::fs::remove_dir_all(&self.0).ok();
    }
}

fn jpeg_file(dir: &std::path::Path) -> PathBuf {
    let image = image::RgbImage::from_fn(800, 600, |x, y| {
        image::Rgb([(x % 256) as u8, (y % 256) as u8, 90])
    });
    let mut png = Vec::new();
    image::DynamicImage::ImageRgb8(image)
        .write_to(&mut std::io::Cursor::new(&mut png), image::ImageFormat::Png)
        .unwrap();
    let path = dir.join("photo.png");
    std::fs::write(&path, png).unwrap();
    path
}

#[test]
fn store_commands_from_import_to_export() {
    let t = TempStore::new("flow");
    let db = t.db();
    let run = |args: &[&str]| {
        let mut all = vec!["--db", db.as_str()];
        all.extend_from_slice(args);
        let o = undercroft(&all);
        assert!(o.status.success(), "{args:?}: {}", stderr(&o));
        stdout(&o)
    };
    assert!(run(&["import", &demo()]).starts_with("imported 0193a1c2-7d00-7000-8000-00000000d001"));
    assert!(
        run(&["import", &demo()]).starts_with("replaced"),
        "importing twice does not duplicate"
    );
    let listed = run(&["list"]);
    assert_eq!(listed.lines().count(), 1, "{listed}");
    assert!(listed.contains("Zoë Ångström-Nguyễn"));
    let id = run(&[
        "new",
        "--address",
        "5 Oak Street",
        "--date",
        "2026-12-01",
        "--room-use",
        "sleeping",
    ])
    .trim()
    .to_string();
    assert_eq!(
        run(&["list", "--search", "OAK"])
            .lines()
            .next()
            .unwrap()
            .split_whitespace()
            .next(),
        Some(id.as_str())
    );
    let photo = jpeg_file(&t.0);
    let added = run(&[
        "add-photo",
        "obs-k7-notch",
        photo.to_str().unwrap(),
        "--caption",
        "notch",
    ]);
    assert!(added.contains("photos/"), "{added}");
    let findings = run(&[
        "check",
        "--inspection",
        "0193a1c2-7d00-7000-8000-00000000d001",
        "--json",
    ]);
    assert!(findings.contains("\"sawn-notch\""));
    let bundle = t.0.join("out.zip");
    run(&[
        "export",
        "0193a1c2-7d00-7000-8000-00000000d001",
        "-o",
        bundle.to_str().unwrap(),
    ]);
    let other = TempStore::new("flow-other");
    let o = undercroft(&["--db", &other.db(), "import", bundle.to_str().unwrap()]);
    assert!(stdout(&o).contains("(8 photos)"), "{}", stdout(&o));
    let json = t.0.join("out.json");
    run(&["export", &id, "-o", json.to_str().unwrap(), "--json"]);
    assert!(std::fs::read_to_string(&json)
        .unwrap()
        .contains("5 Oak Street"));
}

#[test]
fn store_commands_refuse_bad_input_clearly() {
    let t = TempStore::new("bad");
    let db = t.db();
    let fail = |args: &[&str], expect: &str| {
        let mut all = vec!["--db", db.as_str()];
        all.extend_from_slice(args);
        let o = undercroft(&all);
        assert_eq!(o.status.code(), Some(2), "{args:?} succeeded");
        assert!(stderr(&o).contains(expect), "{args:?}: {}", stderr(&o));
    };
    undercroft(&["--db", &db, "import", &demo()]);
    let text = t.0.join("notes.txt");
    std::fs::write(&text, "not a photo").unwrap();
    fail(
        &["add-photo", "obs-k7-notch", text.to_str().unwrap()],
        "not an image",
    );
    fail(
        &["add-photo", "no-such-owner", text.to_str().unwrap()],
        "no inspection",
    );
    fail(&["check"], "give an inspection file or --inspection ID");
    let zip = t.0.join("fake.zip");
    std::fs::write(&zip, b"PK\x03\x04 not really a zip").unwrap();
    fail(&["import", zip.to_str().unwrap()], "not a usable bundle");
    fail(
        &[
            "export",
            "no-such-id",
            "-o",
            t.0.join("x.zip").to_str().unwrap(),
        ],
        "no inspection",
    );
    let bad_db = t.0.join("bad.sqlite");
    std::fs::write(&bad_db, vec![0x42u8; 4096]).unwrap();
    let o = undercroft(&["--db", bad_db.to_str().unwrap(), "list"]);
    assert!(
        stderr(&o).contains("not an Undercroft database"),
        "{}",
        stderr(&o)
    );
}

#[test]
fn report_command_writes_a_pdf_and_records_the_delivery() {
    let t = TempStore::new("report");
    let db = t.db();
    let pdf = t.0.join("file-report.pdf");
    let o = undercroft(&[
        "report",
        &demo(),
        "-o",
        pdf.to_str().unwrap(),
        "--paper",
        "a4",
    ]);
    assert!(o.status.success(), "{}", stderr(&o));
    let bytes = std::fs::read(&pdf).unwrap();
    assert!(bytes.starts_with(b"%PDF-") && bytes.len() > 10_000);
    undercroft(&["--db", &db, "import", &demo()]);
    let stored = t.0.join("stored-report.pdf");
    let o = undercroft(&[
        "--db",
        &db,
        "report",
        "--inspection",
        "0193a1c2-7d00-7000-8000-00000000d001",
        "-o",
        stored.to_str().unwrap(),
        "--to",
        "Zoë Ångström-Nguyễn",
    ]);
    assert!(o.status.success(), "{}", stderr(&o));
    let store = undercroft_store::Store::open(std::path::Path::new(&db)).unwrap();
    let delivered = store
        .reports("0193a1c2-7d00-7000-8000-00000000d001")
        .unwrap();
    assert_eq!(delivered.len(), 1);
    assert_eq!(delivered[0].recipient, "Zoë Ångström-Nguyễn");
    // A recipient is kept with a delivery of the store: with a file there is none to keep it.
    let o = undercroft(&["report", &demo(), "-o", pdf.to_str().unwrap(), "--to", "x"]);
    assert!(!o.status.success());
    assert!(stderr(&o).contains("--inspection"), "{}", stderr(&o));
    assert_eq!(
        delivered[0].bytes,
        std::fs::metadata(&stored).unwrap().len()
    );
    let o = undercroft(&[
        "report",
        &demo(),
        "-o",
        pdf.to_str().unwrap(),
        "--paper",
        "legal",
    ]);
    assert!(
        stderr(&o).contains("expected letter or a4"),
        "{}",
        stderr(&o)
    );
}

#[test]
fn stores_that_are_not_ours_or_not_there_are_refused_untouched() {
    let t = TempStore::new("foreign");
    let other = t.0.join("other-app.sqlite");
    {
        let conn = rusqlite::Connection::open(&other).unwrap();
        conn.execute_batch("CREATE TABLE songs (title TEXT); INSERT INTO songs VALUES ('x');")
            .unwrap();
    }
    let before = std::fs::read(&other).unwrap();
    let o = undercroft(&["--db", other.to_str().unwrap(), "list"]);
    assert_eq!(o.status.code(), Some(2));
    assert!(
        stderr(&o).contains("another program's database"),
        "{}",
        stderr(&o)
    );
    assert_eq!(std::fs::read(&other).unwrap(), before, "left untouched");
    assert!(!t.0.join("other-app-photos").exists());

    let missing = t.0.join("nothing-here.sqlite");
    let o = undercroft(&["--db", missing.to_str().unwrap(), "list"]);
    assert!(stderr(&o).contains("there is no store"), "{}", stderr(&o));
    assert!(!missing.exists(), "a read-only command created a store");
}

#[test]
fn import_names_the_inspection_holding_the_ids_and_imports_a_copy() {
    let t = TempStore::new("ids");
    let db = t.db();
    assert!(undercroft(&["--db", &db, "import", &demo()])
        .status
        .success());
    let renamed = t.0.join("renamed.json");
    let text = std::fs::read_to_string(demo())
        .unwrap()
        .replace("0193a1c2-7d00-7000-8000-00000000d001", "another-id");
    std::fs::write(&renamed, text).unwrap();
    let o = undercroft(&["--db", &db, "import", renamed.to_str().unwrap()]);
    assert_eq!(o.status.code(), Some(2));
    let err = stderr(&o);
    assert!(
        err.contains("2719 Quillback Road") && err.contains("--as-copy") && !err.contains("UNIQUE"),
        "{err}"
    );
    let o = undercroft(&[
        "--db",
        &db,
        "import",
        "--as-copy",
        renamed.to_str().unwrap(),
    ]);
    assert!(o.status.success(), "{}", stderr(&o));
    assert_eq!(
        stdout(&undercroft(&["--db", &db, "list"])).lines().count(),
        2
    );

    // Dates are real days.
    let o = undercroft(&[
        "--db",
        &db,
        "new",
        "--address",
        "1 Elm",
        "--date",
        "2026-02-30",
    ]);
    assert!(stderr(&o).contains("has 28 days"), "{}", stderr(&o));
}

#[test]
fn bundles_cannot_plant_pictures_or_repeat_entries() {
    let t = TempStore::new("plant");
    let db = t.db();
    assert!(undercroft(&["--db", &db, "import", &demo()])
        .status
        .success());
    let photo = jpeg_file(&t.0);
    let real = std::fs::read(&photo).unwrap();
    let hash = {
        use sha2::Digest;
        sha2::Sha256::digest(&real)
            .iter()
            .map(|b| format!("{b:02x}"))
            .collect::<String>()
    };
    let demo_bytes = std::fs::read(demo()).unwrap();
    let write_zip = |name: &str, entries: &[(&str, &[u8])]| {
        let path = t.0.join(name);
        let mut zip = zip::ZipWriter::new(std::fs::File::create(&path).unwrap());
        let stored = zip::write::SimpleFileOptions::default()
            .compression_method(zip::CompressionMethod::Stored);
        zip.start_file("inspection.json", stored).unwrap();
        std::io::Write::write_all(&mut zip, &demo_bytes).unwrap();
        for (entry, bytes) in entries {
            zip.start_file(*entry, stored).unwrap();
            std::io::Write::write_all(&mut zip, bytes).unwrap();
        }
        zip.finish().unwrap();
        path
    };
    // Another picture under the real photo's hash.
    let other = {
        let image = image::RgbImage::from_fn(64, 64, |_, _| image::Rgb([200, 0, 0]));
        let mut png = Vec::new();
        image::DynamicImage::ImageRgb8(image)
            .write_to(&mut std::io::Cursor::new(&mut png), image::ImageFormat::Png)
            .unwrap();
        png
    };
    let planted = write_zip("planted.zip", &[(&format!("originals/{hash}.png"), &other)]);
    let o = undercroft(&["--db", &db, "import", planted.to_str().unwrap()]);
    assert_eq!(o.status.code(), Some(2));
    assert!(
        stderr(&o).contains("does not hold the photo its name promises"),
        "{}",
        stderr(&o)
    );
    // Nothing of it was stored: the real photo, added now, is processed from its own bytes.
    let report_dir = t.0.join("store-photos").join("report");
    assert!(!report_dir.join(format!("{hash}.jpg")).exists());

    // A repeated entry is refused. The zip writer will not repeat a name, so two entries
    // whose names differ in one letter's case are written and the bytes patched to match.
    let once = write_zip("once.zip", &[(&format!("originals/{hash}.png"), &real)]);
    let twice_name = format!("originals/{hash}.png").replace("originals", "Originals");
    let twice = t.0.join("twice.zip");
    let mut zip = zip::ZipWriter::new(std::fs::File::create(&twice).unwrap());
    let stored =
        zip::write::SimpleFileOptions::default().compression_method(zip::CompressionMethod::Stored);
    zip.start_file("inspection.json", stored).unwrap();
    std::io::Write::write_all(&mut zip, &demo_bytes).unwrap();
    for name in [format!("originals/{hash}.png"), twice_name.clone()] {
        zip.start_file(name, stored).unwrap();
        std::io::Write::write_all(&mut zip, &real).unwrap();
    }
    zip.finish().unwrap();
    let mut raw = std::fs::read(&twice).unwrap();
    let from = twice_name.as_bytes();
    let to = format!("originals/{hash}.png");
    let mut at = 0;
    while let Some(pos) = raw[at..].windows(from.len()).position(|w| w == from) {
        raw[at + pos..at + pos + from.len()].copy_from_slice(to.as_bytes());
        at += pos + from.len();
    }
    std::fs::write(&twice, &raw).unwrap();
    let o = undercroft(&["--db", &db, "import", twice.to_str().unwrap()]);
    assert_eq!(o.status.code(), Some(2));
    assert!(stderr(&o).contains("appears twice"), "{}", stderr(&o));

    // The honest bundle imports, its images made from the verified original.
    let o = undercroft(&["--db", &db, "import", once.to_str().unwrap()]);
    assert!(o.status.success(), "{}", stderr(&o));
    assert!(report_dir.join(format!("{hash}.jpg")).exists());
}

#[test]
fn report_photos_stay_inside_the_files_folder_and_outputs_are_whole() {
    let t = TempStore::new("reportpaths");
    let photo = jpeg_file(&t.0);
    let inner = t.0.join("inner");
    std::fs::create_dir_all(&inner).unwrap();
    let mut value: serde_json::Value =
        serde_json::from_str(&std::fs::read_to_string(demo()).unwrap()).unwrap();
    value["photos"] = serde_json::json!([
        {"id": "p-out", "file": photo.display().to_string(), "attached_to": "obs-k7-notch"},
        {"id": "p-up", "file": "../photo.png", "attached_to": "obs-k7-notch"}
    ]);
    let text = serde_json::to_string_pretty(&value).unwrap();
    let file = inner.join("inspection.json");
    std::fs::write(&file, text).unwrap();
    // A bare output name is written in the current folder.
    let o = Command::new(env!("CARGO_BIN_EXE_undercroft"))
        .current_dir(&inner)
        .args(["report", "inspection.json", "-o", "bare.pdf"])
        .output()
        .unwrap();
    assert!(o.status.success(), "{}", stderr(&o));
    let err = stderr(&o);
    assert!(
        err.contains("p-out") && err.contains("p-up") && err.contains("not inside"),
        "{err}"
    );
    assert!(std::fs::read(inner.join("bare.pdf"))
        .unwrap()
        .starts_with(b"%PDF-"));
    let leftovers: Vec<_> = std::fs::read_dir(&inner)
        .unwrap()
        .flatten()
        .filter(|e| e.file_name().to_string_lossy().contains(".tmp"))
        .collect();
    assert!(leftovers.is_empty());

    let db = t.db();
    undercroft(&["--db", &db, "import", &demo()]);
    let o = Command::new(env!("CARGO_BIN_EXE_undercroft"))
        .current_dir(&t.0)
        .args([
            "--db",
            &db,
            "export",
            "0193a1c2-7d00-7000-8000-00000000d001",
            "-o",
            "bundle.zip",
        ])
        .output()
        .unwrap();
    assert!(o.status.success(), "{}", stderr(&o));
    assert!(t.0.join("bundle.zip").is_file());
}
