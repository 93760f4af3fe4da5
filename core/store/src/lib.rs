//! The local store: the only code that touches SQLite and the photo files. Every change is
//! one transaction, durable when the call returns; loading gives the engine's model.

mod bundle;
mod clock;
pub(crate) mod files;
pub mod firm;
mod inspections;
mod load;
mod migrate;
mod notes;
mod office;
mod photo_undo;
mod photos;
mod save;
mod settings;
mod tree;

pub use bundle::{BundleError, ImportOutcome};
pub use clock::{local_time, now_utc};
pub use files::{content_hash, file_hash, is_hash, write_durably};
pub use firm::{CountyRule, FirmSettings, FirmSettingsError, LicenseEntry};
pub use inspections::{InspectionSummary, ListFilter, NewInspection};
pub use migrate::{APPLICATION_ID, SCHEMA_VERSION};
pub use notes::DeliveredReport;
pub use office::{OfficeLink, PushedRevision, SyncOutcome};
pub use photo_undo::RemovedPhoto;
pub use photos::{prepare_photo, PreparedPhoto, StoredPhoto};
pub use settings::{Screen, Settings};

use rusqlite::Connection;
use std::path::{Path, PathBuf};
use thiserror::Error;

#[derive(Debug, Error)]
pub enum StoreError {
    #[error("the database is version {found}, newer than this app (version {known}); update the app. The file was left untouched")]
    TooNew { found: i64, known: i64 },
    #[error("{0} is not an Undercroft database or is damaged: {1}")]
    NotADatabase(PathBuf, String),
    #[error("{0} is not an Undercroft store: {1}. It was left untouched")]
    NotOurs(PathBuf, String),
    #[error("there is no store at {0}")]
    NoStore(PathBuf),
    #[error("the id {id} is already used by the stored inspection {other} ({address}); import it as a copy with new ids instead (`undercroft import --as-copy`)")]
    IdsTaken {
        id: String,
        other: String,
        address: String,
    },
    #[error("no inspection, area, run, member, observation or photo with id {0}")]
    NotFound(String),
    #[error("{0}")]
    Invalid(String),
    #[error(transparent)]
    Photo(#[from] undercroft_photo::PhotoError),
    #[error(transparent)]
    Sql(#[from] rusqlite::Error),
    #[error(transparent)]
    Io(#[from] std::io::Error),
    #[error(transparent)]
    Json(#[from] serde_json::Error),
}

pub type Result<T> = std::result::Result<T, StoreError>;

/// Whether the original photo files are kept beside the report images (the evidence).
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum KeepOriginals {
    Yes,
    No,
}

/// An open store: one SQLite database and its photo folder beside it.
pub struct Store {
    conn: Connection,
    photos: files::PhotoFiles,
    keep_originals: KeepOriginals,
}

impl Store {
    /// Opens (creating if needed) the store at `db_path`; photos live in a folder beside it
    /// named after it (`undercroft.sqlite` -> `undercroft-photos/`). Applies pending migrations
    /// and sweeps photo files no row refers to.
    pub fn open(db_path: &Path) -> Result<Store> {
        if let Some(parent) = db_path.parent().filter(|p| !p.as_os_str().is_empty()) {
            std::fs::create_dir_all(parent)?;
        }
        let bad =
            |e: rusqlite::Error| StoreError::NotADatabase(db_path.to_path_buf(), e.to_string());
        let mut conn = Connection::open(db_path).map_err(bad)?;
        conn.busy_timeout(std::time::Duration::from_secs(BUSY_TIMEOUT_SECS))
            .map_err(bad)?;
        migrate::check_version(&conn).map_err(|e| match e {
            StoreError::Sql(e) => bad(e),
            other => other,
        })?;
        migrate::check_ours(&conn)
            .map_err(|why| StoreError::NotOurs(db_path.to_path_buf(), why))?;
        configure(&conn).map_err(bad)?;
        migrate::run(&mut conn)?;
        let stem = db_path
            .file_stem()
            .and_then(|s| s.to_str())
            .unwrap_or("undercroft");
        let photo_dir = db_path.with_file_name(format!("{stem}-photos"));
        let store = Store {
            conn,
            photos: files::PhotoFiles::new(photo_dir)?,
            keep_originals: KeepOriginals::Yes,
        };
        store.sweep_orphans()?;
        Ok(store)
    }

    /// Opens a store that must already exist (for commands that only read): a missing path
    /// is refused, not created.
    pub fn open_existing(db_path: &Path) -> Result<Store> {
        if !db_path.is_file() {
            return Err(StoreError::NoStore(db_path.to_path_buf()));
        }
        Store::open(db_path)
    }

    /// The platform's data folder for the store (e.g. `~/.local/share/undercroft` on Linux).
    pub fn default_path() -> Option<PathBuf> {
        directories::ProjectDirs::from("", "", "undercroft")
            .map(|d| d.data_dir().join("undercroft.sqlite"))
    }

    /// Whether new photos keep their original file (on by default).
    pub fn set_keep_originals(&mut self, keep: KeepOriginals) {
        self.keep_originals = keep;
    }

    /// `PRAGMA integrity_check` result ("ok" when sound).
    pub fn integrity_check(&self) -> Result<String> {
        Ok(self
            .conn
            .query_row("PRAGMA integrity_check", [], |r| r.get(0))?)
    }

    pub fn photo_dir(&self) -> &Path {
        self.photos.root()
    }

    /// The database file, for opening a second connection from another thread (the office
    /// sync runs beside the screens).
    pub fn db_path(&self) -> Option<PathBuf> {
        self.conn
            .path()
            .filter(|p| !p.is_empty())
            .map(PathBuf::from)
    }

    /// Where built reports are written: a folder beside the photos.
    pub fn report_dir(&self) -> PathBuf {
        let root = self.photos.root();
        let name = root
            .file_name()
            .and_then(|n| n.to_str())
            .unwrap_or("undercroft-photos")
            .replace("-photos", "-reports");
        root.with_file_name(name)
    }
}

/// Per-connection settings. WAL with synchronous=FULL: every committed transaction is on
/// disk (the WAL is synced at each commit) before the call returns, so an acknowledged edit
/// survives a killed app or a power cut; NORMAL would only guard against corruption.
/// The busy timeout comes first, so that switching to WAL waits for another process too;
/// every transaction that writes begins IMMEDIATE (as a writer), so the timeout applies to
/// it and two writers take turns instead of failing with "database is locked".
fn configure(conn: &Connection) -> rusqlite::Result<()> {
    conn.busy_timeout(std::time::Duration::from_secs(BUSY_TIMEOUT_SECS))?;
    switch_to_wal(conn)?;
    conn.pragma_update(None, "synchronous", "FULL")?;
    conn.pragma_update(None, "foreign_keys", "ON")?;
    Ok(())
}

/// Puts the store in write-ahead-log mode. Switching needs the database to itself, and
/// SQLite answers "database is locked" at once, without its busy handler, when another
/// process is reading it at that moment (two processes opening a new store together): so
/// the switch is tried again until the other lets go, within the same wait as a writer's.
fn switch_to_wal(conn: &Connection) -> rusqlite::Result<()> {
    let deadline = std::time::Instant::now() + std::time::Duration::from_secs(BUSY_TIMEOUT_SECS);
    loop {
        match conn.pragma_update(None, "journal_mode", "WAL") {
            Err(rusqlite::Error::SqliteFailure(e, _))
                if e.code == rusqlite::ErrorCode::DatabaseBusy
                    && std::time::Instant::now() < deadline =>
            {
                std::thread::sleep(std::time::Duration::from_millis(5));
            }
            done => return done,
        }
    }
}

/// How long a writer waits for another to finish. A photo import holds the lock for one
/// short insert; a bundle import for one transaction of its rows.
const BUSY_TIMEOUT_SECS: u64 = 30;

/// A new time-ordered id (UUID v7).
pub fn new_id() -> String {
    uuid::Uuid::now_v7().to_string()
}

#[cfg(test)]
mod tests;
