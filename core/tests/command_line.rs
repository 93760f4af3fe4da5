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
        .join("../demo-data/demo-inspection.json")
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
        for key in ["rule_id", "status", "citation"] {
            assert!(f.get(key).is_some(), "{key} missing in {f}");
        }
        if f["status"] != "not-checked" {
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
    assert_eq!(notch["measured"]["value"], 2.0);
    assert!((notch["ratio"].as_f64().unwrap() - 2.0 / (9.25 / 6.0)).abs() < 1e-9);
}

#[test]
fn check_text_puts_over_limit_first() {
    let o = undercroft(&["check", &demo()]);
    let text = stdout(&o);
    let first = text.lines().find(|l| l.starts_with('[')).unwrap();
    assert!(first.starts_with("[OVER LIMIT"), "{first}");
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
    ] {
        assert!(text.contains(id), "{id} missing");
    }
}
