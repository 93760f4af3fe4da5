//! Photo files on disk: written to a temporary name, synced, renamed, and the folder synced;
//! named by the content hash so the same photo is stored once.

use std::collections::HashSet;
use std::fs::{self, File};
use std::io::Write;
use std::path::{Path, PathBuf};

/// The three images of a photo.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum Kind {
    /// The report-size JPEG.
    Report,
    Thumb,
    /// The file as the camera gave it (the evidence).
    Original,
}

impl Kind {
    const ALL: [Kind; 3] = [Kind::Report, Kind::Thumb, Kind::Original];

    fn folder(self) -> &'static str {
        match self {
            Kind::Report => "report",
            Kind::Thumb => "thumb",
            Kind::Original => "original",
        }
    }
}

pub struct PhotoFiles {
    root: PathBuf,
}

impl PhotoFiles {
    pub fn new(root: PathBuf) -> std::io::Result<PhotoFiles> {
        for kind in Kind::ALL {
            fs::create_dir_all(root.join(kind.folder()))?;
        }
        Ok(PhotoFiles { root })
    }

    pub fn root(&self) -> &Path {
        &self.root
    }

    /// Where a photo's file of one kind lives.
    pub fn path(&self, kind: Kind, hash: &str, ext: &str) -> PathBuf {
        self.root.join(kind.folder()).join(format!("{hash}.{ext}"))
    }

    /// Writes the file durably unless it is already there (same hash, same bytes).
    pub fn put(&self, kind: Kind, hash: &str, ext: &str, bytes: &[u8]) -> std::io::Result<PathBuf> {
        let path = self.path(kind, hash, ext);
        if path.exists() {
            return Ok(path);
        }
        write_durably(&path, bytes)?;
        Ok(path)
    }

    /// Removes every file whose hash is not in `keep`, and any temporary file left by a
    /// killed write. Returns how many files were removed.
    pub fn sweep(&self, keep: &HashSet<String>) -> std::io::Result<usize> {
        let mut removed = 0;
        for kind in Kind::ALL {
            for entry in fs::read_dir(self.root.join(kind.folder()))? {
                let path = entry?.path();
                let name = path
                    .file_name()
                    .and_then(|n| n.to_str())
                    .unwrap_or_default();
                let hash = name.split('.').next().unwrap_or_default();
                if name.contains(".tmp") || !keep.contains(hash) {
                    fs::remove_file(&path)?;
                    removed += 1;
                }
            }
        }
        Ok(removed)
    }
}

/// Write to `<name>.tmp-<pid>`, fsync, rename over `path`, fsync the folder.
pub fn write_durably(path: &Path, bytes: &[u8]) -> std::io::Result<()> {
    let name = path.file_name().and_then(|n| n.to_str()).unwrap_or("file");
    let tmp = path.with_file_name(format!("{name}.tmp-{}", std::process::id()));
    {
        let mut file = File::create(&tmp)?;
        file.write_all(bytes)?;
        file.sync_all()?;
    }
    fs::rename(&tmp, path)?;
    if let Some(dir) = path.parent() {
        File::open(dir)?.sync_all()?;
    }
    Ok(())
}

/// Lower-case hex SHA-256 of the bytes.
pub fn content_hash(bytes: &[u8]) -> String {
    use sha2::{Digest, Sha256};
    let digest = Sha256::digest(bytes);
    let mut out = String::with_capacity(64);
    for b in digest.iter() {
        out.push_str(&format!("{b:02x}"));
    }
    out
}

/// True for a 64-character lower-case hex string (a name this store could have made).
pub fn is_hash(text: &str) -> bool {
    text.len() == 64
        && text
            .bytes()
            .all(|b| b.is_ascii_digit() || (b'a'..=b'f').contains(&b))
}

#[cfg(test)]
mod tests {
    use super::*;

    // Source: FIPS 180-4 test vector, SHA-256("abc").
    #[test]
    fn sha256_of_abc() {
        assert_eq!(
            content_hash(b"abc"),
            "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad"
        );
        assert!(is_hash(&content_hash(b"")));
        assert!(!is_hash("../etc/passwd"));
    }
}
