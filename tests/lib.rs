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

/// The demo's drawn photos, read from `demo-data/photos`, by photo id.
pub fn demo_images(
    inspection: &undercroft_engine::Inspection,
) -> std::collections::HashMap<String, Vec<u8>> {
    let base = repo_root().join("demo-data");
    inspection
        .photos
        .iter()
        .map(|p| {
            let bytes = std::fs::read(base.join(&p.file))
                .unwrap_or_else(|e| panic!("demo photo {}: {e}", p.file));
            (p.id.clone(), bytes)
        })
        .collect()
}

/// Runs a command-line reader of PDFs (poppler-utils, qpdf) and returns what it prints.
pub fn tool(name: &str, args: &[&std::ffi::OsStr]) -> String {
    let out = std::process::Command::new(name)
        .args(args)
        .output()
        .unwrap_or_else(|e| panic!("{name} is needed (Debian: poppler-utils, qpdf): {e}"));
    assert!(
        out.status.success(),
        "{name} failed: {}",
        String::from_utf8_lossy(&out.stderr)
    );
    String::from_utf8_lossy(&out.stdout).into_owned()
}

/// Text with every run of white space made one space.
pub fn normalise(text: &str) -> String {
    text.split_whitespace().collect::<Vec<_>>().join(" ")
}

/// A scratch folder for one test, removed when the test ends.
pub struct TempDir(pub PathBuf);

impl TempDir {
    /// A fresh folder named for the test and this process.
    pub fn new(name: &str) -> TempDir {
        let dir = std::env::temp_dir().join(format!("undercroft-{name}-{}", std::process::id()));
        std::fs::create_dir_all(&dir).unwrap();
        TempDir(dir)
    }
}

impl Drop for TempDir {
    fn drop(&mut self) {
        std::fs::remove_dir_all(&self.0).ok();
    }
}
