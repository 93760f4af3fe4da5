//! Photo files on disk: written to a temporary name, synced, renamed, and the folder synced;
//! named by the content hash so the same photo is stored once.

use std::collections::HashSet;
use std::fs::{self, File};
use std::io::Write;
use std::path::{Path, PathBuf};
use std::time::{Duration, SystemTime};

/// A photo file (or a temporary file) younger than this is never swept: a writer in another
/// process may have written it and not yet committed its row. A write takes well under a
/// second; an hour leaves room for a paused or slow process. Common practice, no source.
pub const SWEEP_GRACE: Duration = Duration::from_secs(60 * 60);

/// The three images of a photo.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash)]
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

/// A file written and synced under a temporary name, waiting for its name.
pub struct Staged(PathBuf);

impl Staged {
    /// Drops the staged file (the photo was refused).
    pub fn discard(self) {
        let _ = fs::remove_file(&self.0);
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

    /// Writes the file durably unless it is already there (same hash, same bytes). A file
    /// already there has its time renewed, so that a sweep in another process leaves it for
    /// the grace period while this writer commits its row.
    pub fn put(&self, kind: Kind, hash: &str, ext: &str, bytes: &[u8]) -> std::io::Result<PathBuf> {
        let path = self.path(kind, hash, ext);
        if path.exists() && renew(&path).is_ok() {
            return Ok(path);
        }
        write_durably(&path, bytes)?;
        Ok(path)
    }

    /// Writes the file durably, replacing what is there (an image re-made from a verified
    /// original replaces one of unknown origin).
    pub fn replace(
        &self,
        kind: Kind,
        hash: &str,
        ext: &str,
        bytes: &[u8],
    ) -> std::io::Result<PathBuf> {
        let path = self.path(kind, hash, ext);
        write_durably(&path, bytes)?;
        Ok(path)
    }

    /// Writes bytes whose name is not known yet (a photo still being hashed) to a temporary
    /// file in `kind`'s folder and syncs it, so the sync overlaps the work that finds the name.
    pub fn stage(&self, kind: Kind, bytes: &[u8]) -> std::io::Result<Staged> {
        static NEXT: std::sync::atomic::AtomicU64 = std::sync::atomic::AtomicU64::new(0);
        let n = NEXT.fetch_add(1, std::sync::atomic::Ordering::Relaxed);
        let tmp = self
            .root
            .join(kind.folder())
            .join(format!("staged.tmp-{}-{n}", std::process::id()));
        let written = (|| {
            let mut file = File::create(&tmp)?;
            file.write_all(bytes)?;
            file.sync_all()
        })();
        match written {
            Ok(()) => Ok(Staged(tmp)),
            Err(e) => {
                let _ = fs::remove_file(&tmp);
                Err(e)
            }
        }
    }

    /// Gives a staged file its name (renamed, the folder synced); when a file of that name
    /// is already there, it is kept (renewed) and the staged copy dropped.
    pub fn commit(
        &self,
        staged: Staged,
        kind: Kind,
        hash: &str,
        ext: &str,
    ) -> std::io::Result<PathBuf> {
        let path = self.path(kind, hash, ext);
        if path.exists() && renew(&path).is_ok() {
            let _ = fs::remove_file(&staged.0);
            return Ok(path);
        }
        fs::rename(&staged.0, &path)?;
        File::open(self.root.join(kind.folder()))?.sync_all()?;
        Ok(path)
    }

    /// Removes every file whose hash is not in `keep`, and any temporary file left by a
    /// killed write, but only once older than `grace`: a younger file may belong to a row
    /// that a writer in another process has not committed yet. Returns how many were removed.
    pub fn sweep(&self, keep: &HashSet<String>, grace: Duration) -> std::io::Result<usize> {
        let mut removed = 0;
        let now = SystemTime::now();
        for kind in Kind::ALL {
            for entry in fs::read_dir(self.root.join(kind.folder()))? {
                let entry = entry?;
                let path = entry.path();
                let name = path
                    .file_name()
                    .and_then(|n| n.to_str())
                    .unwrap_or_default();
                let hash = name.split('.').next().unwrap_or_default();
                if !name.contains(".tmp") && keep.contains(hash) {
                    continue;
                }
                let age = entry
                    .metadata()
                    .and_then(|m| m.modified())
                    .ok()
                    .and_then(|t| now.duration_since(t).ok());
                // A file whose age cannot be read, or from the future, is left alone.
                if age.is_some_and(|a| a >= grace) {
                    match fs::remove_file(&path) {
                        Ok(()) => removed += 1,
                        // Another process's sweep got there first.
                        Err(e) if e.kind() == std::io::ErrorKind::NotFound => {}
                        Err(e) => return Err(e),
                    }
                }
            }
        }
        Ok(removed)
    }
}

/// Sets a file's modification time to now.
fn renew(path: &Path) -> std::io::Result<()> {
    File::options()
        .append(true)
        .open(path)?
        .set_modified(SystemTime::now())
}

/// Write to `<name>.tmp-<pid>-<n>`, fsync, rename over `path`, fsync the folder: whoever
/// reads `path` sees the old file or the whole new one, never a part. A bare file name
/// (`report.pdf`) is in the current folder.
pub fn write_durably(path: &Path, bytes: &[u8]) -> std::io::Result<()> {
    static NEXT: std::sync::atomic::AtomicU64 = std::sync::atomic::AtomicU64::new(0);
    let name = path.file_name().and_then(|n| n.to_str()).unwrap_or("file");
    let n = NEXT.fetch_add(1, std::sync::atomic::Ordering::Relaxed);
    let tmp = path.with_file_name(format!("{name}.tmp-{}-{n}", std::process::id()));
    let written = (|| {
        let mut file = File::create(&tmp)?;
        file.write_all(bytes)?;
        file.sync_all()?;
        fs::rename(&tmp, path)
    })();
    if let Err(e) = written {
        let _ = fs::remove_file(&tmp);
        return Err(e);
    }
    let dir = match path.parent() {
        Some(d) if !d.as_os_str().is_empty() => d,
        _ => Path::new("."),
    };
    File::open(dir)?.sync_all()
}

/// Lower-case hex SHA-256 of the bytes.
pub fn content_hash(bytes: &[u8]) -> String {
    use sha2::{Digest, Sha256};
    hex(&Sha256::digest(bytes))
}

/// Lower-case hex SHA-256 and size of a file, read in pieces.
pub fn file_hash(path: &Path) -> std::io::Result<(String, u64)> {
    use sha2::{Digest, Sha256};
    use std::io::Read;
    let mut file = File::open(path)?;
    let mut hasher = Sha256::new();
    let mut buffer = vec![0u8; 64 * 1024];
    let mut total = 0u64;
    loop {
        let n = file.read(&mut buffer)?;
        if n == 0 {
            break;
        }
        hasher.update(&buffer[..n]);
        total += n as u64;
    }
    Ok((hex(&hasher.finalize()), total))
}

/// Lower-case hex of a digest.
pub(crate) fn hex(digest: &[u8]) -> String {
    let mut out = String::with_capacity(2 * digest.len());
    for b in digest {
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

    /// A file another process wrote a moment ago is never swept, even with no row; once
    /// older than the grace period it is.
    #[test]
    fn young_files_survive_the_sweep() {
        let root = std::env::temp_dir().join(format!("undercroft-sweep-{}", std::process::id()));
        let _ = fs::remove_dir_all(&root);
        let files = PhotoFiles::new(root.clone()).unwrap();
        let hash = content_hash(b"x");
        let path = files.put(Kind::Report, &hash, "jpg", b"x").unwrap();
        assert_eq!(files.sweep(&HashSet::new(), SWEEP_GRACE).unwrap(), 0);
        assert!(path.exists());
        assert_eq!(files.sweep(&HashSet::new(), Duration::ZERO).unwrap(), 1);
        assert!(!path.exists());
        fs::remove_dir_all(&root).unwrap();
    }

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
