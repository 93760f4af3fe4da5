//! The photo files an inspection file names, read only from inside its folder: no absolute
//! paths, no `..`, no link out of it, each no larger than a photo may be.

use std::collections::HashMap;
use std::path::{Component, Path};
use undercroft_engine::model::Inspection;

/// The bytes of every photo file found inside `base`, by photo id. A photo that cannot be
/// read is said on stderr with `then` (what happens without it).
pub fn read_all(inspection: &Inspection, base: &Path, then: &str) -> HashMap<String, Vec<u8>> {
    let mut out = HashMap::new();
    let root = base.canonicalize().ok();
    for p in &inspection.photos {
        let refuse = |why: String| eprintln!("warning: photo {} ({}): {why}; {then}", p.id, p.file);
        let rel = Path::new(&p.file);
        if rel.is_absolute() || rel.components().any(|c| !matches!(c, Component::Normal(_))) {
            refuse(format!("is not inside {}", base.display()));
            continue;
        }
        let path = base.join(rel);
        let inside = match (&root, path.canonicalize()) {
            (Some(root), Ok(real)) => real.starts_with(root),
            (_, Err(e)) => {
                refuse(format!("cannot be read ({e})"));
                continue;
            }
            (None, _) => false,
        };
        if !inside {
            refuse(format!("leads outside {}", base.display()));
            continue;
        }
        match crate::store_cmd::read_capped(&path, undercroft_photo::MAX_FILE_BYTES, "a photo") {
            Ok(bytes) => {
                out.insert(p.id.clone(), bytes);
            }
            Err(e) => refuse(format!("{e:#}")),
        }
    }
    out
}

/// The folder an inspection file's photos are looked for in: the file's own.
pub fn folder_of(file: &Path) -> std::path::PathBuf {
    match file.parent() {
        Some(p) if !p.as_os_str().is_empty() => p.to_path_buf(),
        _ => std::path::PathBuf::from("."),
    }
}
