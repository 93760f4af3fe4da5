//! The server's file folder: each pushed file kept once under the SHA-256 of its bytes
//! (`ab/abcdef....`), written to a temporary name, synced, then renamed into place, so a file
//! under its final name is always whole.

use std::io::Write;
use std::path::{Path, PathBuf};

#[derive(Debug, Clone)]
pub struct FileStore {
    root: PathBuf,
}

impl FileStore {
    pub fn open(root: &Path) -> std::io::Result<FileStore> {
        std::fs::create_dir_all(root.join("incoming"))?;
        Ok(FileStore { root: root.into() })
    }

    /// Where the file with this hash lives (the hash is checked to be hex by the caller).
    pub fn path(&self, sha256: &str) -> PathBuf {
        self.root.join(&sha256[..2]).join(sha256)
    }

    pub fn has(&self, sha256: &str) -> bool {
        self.path(sha256).is_file()
    }

    /// Writes the bytes under their hash, durably; a file already there is left alone.
    pub fn put(&self, sha256: &str, bytes: &[u8]) -> std::io::Result<()> {
        let path = self.path(sha256);
        if path.is_file() {
            return Ok(());
        }
        let dir = path.parent().expect("a hash path has a folder");
        std::fs::create_dir_all(dir)?;
        let temp = self
            .root
            .join("incoming")
            .join(format!("{sha256}.{}", crate::random::hex(8)));
        let mut file = std::fs::File::create(&temp)?;
        file.write_all(bytes)?;
        file.sync_all()?;
        drop(file);
        std::fs::rename(&temp, &path)?;
        std::fs::File::open(dir)?.sync_all()
    }

    pub fn read(&self, sha256: &str) -> std::io::Result<Vec<u8>> {
        std::fs::read(self.path(sha256))
    }
}
