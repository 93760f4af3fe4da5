//! Shared helpers for the cross-crate tests: where the committed data and the demo live.

use std::path::PathBuf;

/// The repository's root folder.
pub fn repo_root() -> PathBuf {
    PathBuf::from(env!("CARGO_MANIFEST_DIR"))
        .parent()
        .expect("tests/ sits in the repo")
        .to_path_buf()
}

/// The demo inspection file.
pub fn demo_path() -> PathBuf {
    repo_root().join("demo-data").join("demo-inspection.json")
}

/// Splits one CSV line, honouring double-quoted fields.
pub fn csv_fields(line: &str) -> Vec<String> {
    let mut fields = vec![String::new()];
    let mut quoted = false;
    for c in line.chars() {
        match (c, quoted) {
            ('"', _) => quoted = !quoted,
            (',', false) => fields.push(String::new()),
            (c, _) => fields.last_mut().expect("never empty").push(c),
        }
    }
    fields
}
