//! What the command-line tests share: a scratch folder removed at the end, and the demo
//! inspection's path.

use std::path::PathBuf;

/// A scratch folder for one test, made empty and removed when dropped.
pub struct Temp(pub PathBuf);

impl Temp {
    pub fn new(name: &str) -> Temp {
        let dir = std::env::temp_dir().join(format!("undercroft-{name}-{}", std::process::id()));
        let _ = std::fs::remove_dir_all(&dir);
        std::fs::create_dir_all(&dir).unwrap();
        Temp(dir)
    }
}

impl Drop for Temp {
    fn drop(&mut self) {
        let _ = std::fs::remove_dir_all(&self.0);
    }
}

/// The demo inspection file.
pub fn demo_file() -> PathBuf {
    PathBuf::from(env!("CARGO_MANIFEST_DIR")).join("../../demo-data/demo-inspection.json")
}
