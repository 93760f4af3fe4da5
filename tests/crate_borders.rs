//! The borders between core's crates, as ARCHITECTURE.md draws them: each crate names in its
//! manifest only the crates of ours below it, so the compiler refuses any reach upward. This
//! test keeps the manifests to the drawing.

use undercroft_tests::repo_root;

/// Each crate of `core/`, lowest first, with the crates of ours it may depend on.
const BORDERS: &[(&str, &[&str])] = &[
    ("engine", &[]),
    ("photo", &[]),
    ("report", &["undercroft-engine", "undercroft-photo"]),
    ("store", &["undercroft-engine", "undercroft-photo"]),
    (
        "sync",
        &["undercroft-engine", "undercroft-photo", "undercroft-store"],
    ),
    (
        "cli",
        &[
            "undercroft-engine",
            "undercroft-photo",
            "undercroft-report",
            "undercroft-store",
            "undercroft-sync",
        ],
    ),
];

/// The crates of ours a manifest names, in any dependency table (tests and benchmarks too).
fn our_dependencies(manifest: &str) -> Vec<String> {
    let mut in_dependencies = false;
    let mut found = Vec::new();
    for line in manifest.lines().map(str::trim) {
        if line.starts_with('[') {
            in_dependencies = line.ends_with("dependencies]");
            continue;
        }
        let name = line.split(['=', ' ', '.']).next().unwrap_or("");
        if in_dependencies && name.starts_with("undercroft-") {
            found.push(name.to_string());
        }
    }
    found
}

#[test]
fn each_core_crate_depends_only_on_crates_below_it() {
    for (folder, allowed) in BORDERS {
        let path = repo_root().join("core").join(folder).join("Cargo.toml");
        let manifest = std::fs::read_to_string(&path).unwrap();
        for dependency in our_dependencies(&manifest) {
            assert!(
                allowed.contains(&dependency.as_str()),
                "core/{folder} depends on {dependency}, which is not below it"
            );
        }
    }
}

#[test]
fn the_engine_needs_nothing_but_pure_rust_data_crates() {
    // No I/O, no C library, no clock: the engine builds for wasm32-unknown-unknown (CI builds
    // it there), so it takes only serialization, error-type and pure-Rust container crates.
    let manifest = std::fs::read_to_string(repo_root().join("core/engine/Cargo.toml")).unwrap();
    let mut section = "";
    for line in manifest.lines().map(str::trim) {
        if line.starts_with('[') {
            section = line;
            continue;
        }
        let name = line.split(['=', ' ', '.']).next().unwrap_or("");
        if section == "[dependencies]" && !name.is_empty() && !name.starts_with('#') {
            assert!(
                [
                    "serde",
                    "serde_json",
                    "serde_path_to_error",
                    "thiserror",
                    "smallbox"
                ]
                .contains(&name),
                "the engine depends on {name}"
            );
        }
    }
}

#[test]
fn every_core_folder_is_in_the_drawing() {
    let mut folders: Vec<String> = std::fs::read_dir(repo_root().join("core"))
        .unwrap()
        .flatten()
        .filter(|e| e.path().join("Cargo.toml").exists())
        .map(|e| e.file_name().to_string_lossy().into_owned())
        .collect();
    folders.sort();
    let mut drawn: Vec<String> = BORDERS.iter().map(|(f, _)| f.to_string()).collect();
    drawn.sort();
    assert_eq!(folders, drawn);
}
