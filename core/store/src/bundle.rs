//! One-file export and import of an inspection with its photos: a zip holding
//! `inspection.json` (the interchange format), `notes.json` (the inspector's notes on
//! findings), `photos/<hash>.jpg` (report images), `thumbs/<hash>.jpg` and, when kept,
//! `originals/<hash>.<jpg|png>`. Import checks every name and size, refuses bombs, and
//! replaces an inspection with the same id rather than duplicating it.

use super::clock::now_utc;
use super::files::{content_hash, is_hash, write_durably, Kind, PhotoFiles};
use super::save;
use super::{Result, Store, StoreError, StoredPhoto};
use std::collections::HashSet;
use std::io::{Read, Write};
use std::path::Path;
use thiserror::Error;
use undercroft_engine::interchange;
use undercroft_engine::model::FindingNote;
use undercroft_engine::model::{renumber, Inspection};
use undercroft_photo::{self as photo, sniff, SourceFormat};
use zip::write::SimpleFileOptions;
use zip::CompressionMethod;

/// Most entries a bundle may hold.
const MAX_ENTRIES: usize = 20_000;
/// Most bytes one entry may expand to.
const MAX_ENTRY_BYTES: u64 = photo::MAX_FILE_BYTES as u64;
/// Most bytes all entries together may expand to.
const MAX_TOTAL_BYTES: u64 = 4 * 1024 * 1024 * 1024;

#[derive(Debug, Error, PartialEq)]
pub enum BundleError {
    #[error("not a bundle (not a zip file): {0}")]
    NotAZip(String),
    #[error("the bundle has {0} entries; at most 20000")]
    TooManyEntries(usize),
    #[error(
        "entry \"{0}\" is not a name a bundle holds (refused: it could write outside the store)"
    )]
    BadName(String),
    #[error("entry \"{0}\" expands to more than its limit")]
    TooBig(String),
    #[error("the bundle expands to more than 4 GiB")]
    TooBigInAll,
    #[error("the bundle has no inspection.json")]
    NoInspection,
    #[error("inspection.json: {0}")]
    Inspection(#[from] interchange::InterchangeError),
    #[error("entry \"{0}\": {1}")]
    BadEntry(String, String),
    #[error("entry \"{0}\" appears twice (refused: which one would be kept is not for the bundle to decide)")]
    Duplicate(String),
    #[error("entry \"{0}\" does not hold the photo its name promises (its SHA-256 differs); refused: it could pass off one picture as another")]
    HashMismatch(String),
}

/// What an import did.
#[derive(Debug, Clone, PartialEq)]
pub struct ImportOutcome {
    pub inspection_id: String,
    /// True when an inspection with this id was already in the store and was replaced.
    pub replaced: bool,
    pub photos: usize,
}

/// One entry's place in a bundle.
#[derive(Debug, Clone, PartialEq, Eq, Hash)]
enum Entry {
    Inspection,
    Notes,
    Image(Kind, String, &'static str),
}

fn classify(name: &str) -> Option<Entry> {
    match name {
        "inspection.json" => return Some(Entry::Inspection),
        "notes.json" => return Some(Entry::Notes),
        _ => {}
    }
    let (folder, file) = name.split_once('/')?;
    let (hash, ext) = file.split_once('.')?;
    if !is_hash(hash) {
        return None;
    }
    match (folder, ext) {
        ("photos", "jpg") => Some(Entry::Image(Kind::Report, hash.into(), "jpg")),
        ("thumbs", "jpg") => Some(Entry::Image(Kind::Thumb, hash.into(), "jpg")),
        ("originals", "jpg") => Some(Entry::Image(Kind::Original, hash.into(), "jpg")),
        ("originals", "png") => Some(Entry::Image(Kind::Original, hash.into(), "png")),
        _ => None,
    }
}

impl Store {
    /// Puts an inspection read from an interchange file into the store (replacing one with the
    /// same id). Photo references keep their file names; their images come with a bundle.
    pub fn import_inspection(&mut self, inspection: &Inspection) -> Result<ImportOutcome> {
        self.replace(inspection, &[])
    }

    /// Imports an inspection file together with the images of its photos (by photo id), each
    /// put through the same import as a photo taken in the app. A photo whose image is not
    /// given stays a reference without an image; one whose image is refused is said in the
    /// returned list and kept as a reference, and nothing else is lost.
    pub fn import_inspection_with_images(
        &mut self,
        inspection: &Inspection,
        images: &std::collections::HashMap<String, Vec<u8>>,
    ) -> Result<(ImportOutcome, Vec<(String, StoreError)>)> {
        let mut bare = inspection.clone();
        bare.photos.retain(|p| !images.contains_key(&p.id));
        let mut outcome = self.replace(&bare, &[])?;
        let mut refused = Vec::new();
        for p in inspection
            .photos
            .iter()
            .filter(|p| images.contains_key(&p.id))
        {
            match self.add_photo(&p.attached_to, &images[&p.id], &p.caption) {
                Ok(_) => outcome.photos += 1,
                Err(e) => {
                    refused.push((p.id.clone(), e));
                    // Kept as a reference without an image, after the others.
                    let position = 1_000_000 + refused.len() as i64;
                    self.edit(&inspection.id, |tx| {
                        save::insert_photo_ref(tx, &inspection.id, position, p, &now_utc())
                    })?;
                    outcome.photos += 1;
                }
            }
        }
        Ok((outcome, refused))
    }

    /// The inspection as an interchange value (the same as `load_inspection`).
    pub fn export_inspection(&self, id: &str) -> Result<Inspection> {
        self.load_inspection(id)
    }

    /// Writes one inspection and its photos to a bundle file, durably. Returns the photos
    /// whose image files are missing from the store (their rows go in the bundle without
    /// images), for the caller to say so.
    pub fn export_bundle(&self, inspection_id: &str, path: &Path) -> Result<Vec<StoredPhoto>> {
        let inspection = self.load_inspection(inspection_id)?;
        let notes = self.finding_notes(inspection_id)?;
        let mut zip = zip::ZipWriter::new(std::io::Cursor::new(Vec::new()));
        let json = SimpleFileOptions::default().compression_method(CompressionMethod::Deflated);
        let stored = SimpleFileOptions::default().compression_method(CompressionMethod::Stored);
        let zip_err = |e: zip::result::ZipError| StoreError::Io(std::io::Error::other(e));
        zip.start_file("inspection.json", json).map_err(zip_err)?;
        zip.write_all(interchange::to_json(&inspection).as_bytes())?;
        zip.start_file("notes.json", json).map_err(zip_err)?;
        zip.write_all(serde_json::to_string_pretty(&notes)?.as_bytes())?;
        let mut written = std::collections::HashSet::new();
        let mut missing = Vec::new();
        for p in self.photos_of_inspection(inspection_id)? {
            if p.report_path.is_none() {
                missing.push(p.clone());
            }
            let Some(hash) = p.hash.filter(|h| written.insert(h.clone())) else {
                continue;
            };
            let files = [
                (p.report_path, format!("photos/{hash}.jpg")),
                (p.thumb_path, format!("thumbs/{hash}.jpg")),
                (
                    p.original_path.clone(),
                    format!(
                        "originals/{hash}.{}",
                        original_ext(p.original_path.as_deref())
                    ),
                ),
            ];
            for (path, name) in files {
                if let Some(path) = path {
                    zip.start_file(name, stored).map_err(zip_err)?;
                    zip.write_all(&std::fs::read(path)?)?;
                }
            }
        }
        let bytes = zip.finish().map_err(zip_err)?.into_inner();
        write_durably(path, &bytes)?;
        Ok(missing)
    }

    /// Reads a bundle into the store (replacing an inspection with the same id).
    pub fn import_bundle(
        &mut self,
        path: &Path,
    ) -> std::result::Result<ImportOutcome, ImportError> {
        self.import_bundle_with(path, false)
    }

    /// Reads a bundle into the store; with `as_copy`, every id is made new so the copy sits
    /// beside an inspection that holds the same ids. Every name, size and photo hash is
    /// checked before anything is written; report images and thumbnails are made again from
    /// the verified originals (a bundle's own are not trusted), and only one entry is in
    /// memory at a time.
    pub fn import_bundle_with(
        &mut self,
        path: &Path,
        as_copy: bool,
    ) -> std::result::Result<ImportOutcome, ImportError> {
        let mut file = std::fs::File::open(path).map_err(StoreError::from)?;
        let declared = declared_entries(&mut file);
        let mut zip =
            zip::ZipArchive::new(file).map_err(|e| BundleError::NotAZip(e.to_string()))?;
        // The zip reader keeps one entry per name; a directory that declares more entries
        // than it yields repeats a name.
        if declared.is_some_and(|n| n != zip.len() as u64) {
            return Err(
                BundleError::Duplicate("(a name repeated in the zip directory)".into()).into(),
            );
        }
        let survey = survey(&mut zip)?;
        // Every original must be what its name says before anything is written.
        for image in survey.images.iter().filter(|i| i.kind == Kind::Original) {
            let bytes = read_entry(&mut zip, image.index, &image.name)?;
            if content_hash(&bytes) != image.hash {
                return Err(BundleError::HashMismatch(image.name.clone()).into());
            }
        }
        let (mut inspection, mut notes) = (survey.inspection, survey.notes);
        if as_copy {
            let (copy, map) = renumber::renumbered(&inspection, super::new_id);
            for note in &mut notes {
                note.key = renumber::renumbered_key(&note.key, &map);
            }
            inspection = copy;
        }
        let originals: HashSet<&str> = survey
            .images
            .iter()
            .filter(|i| i.kind == Kind::Original)
            .map(|i| i.hash.as_str())
            .collect();
        for image in &survey.images {
            let bytes = read_entry(&mut zip, image.index, &image.name)?;
            let bad = |e: undercroft_photo::PhotoError| {
                ImportError::from(BundleError::BadEntry(image.name.clone(), e.to_string()))
            };
            match image.kind {
                Kind::Original => {
                    let made = photo::process(&bytes).map_err(bad)?;
                    let put =
                        |kind, jpeg: &[u8]| self.photos.replace(kind, &image.hash, "jpg", jpeg);
                    put(Kind::Report, &made.report_jpeg).map_err(StoreError::from)?;
                    put(Kind::Thumb, &made.thumb_jpeg).map_err(StoreError::from)?;
                    self.photos
                        .put(Kind::Original, &image.hash, image.ext, &bytes)
                        .map_err(StoreError::from)?;
                }
                // Without its original a report image cannot be verified: it is made again
                // (upright, resized, no metadata) and never replaces an image already here.
                Kind::Report if !originals.contains(image.hash.as_str()) => {
                    let made = photo::process(&bytes).map_err(bad)?;
                    self.photos
                        .put(Kind::Report, &image.hash, "jpg", &made.report_jpeg)
                        .map_err(StoreError::from)?;
                    self.photos
                        .put(Kind::Thumb, &image.hash, "jpg", &made.thumb_jpeg)
                        .map_err(StoreError::from)?;
                }
                // Thumbnails are always made from the report image or the original.
                Kind::Report | Kind::Thumb => {}
            }
        }
        Ok(self.replace(&inspection, &notes)?)
    }

    /// Names the stored inspection that holds one of this inspection's inner ids: called only
    /// when the rows' insert met a taken id, so the happy path pays nothing for it.
    fn refuse_foreign_ids(&self, inspection: &Inspection) -> Result<()> {
        for id in renumber::ids_of(inspection).into_iter().skip(1) {
            match self.inspection_of(id) {
                Ok(other) if other != inspection.id => {
                    let address: String = self
                        .conn
                        .query_row(
                            "SELECT address FROM inspections WHERE id = ?1",
                            [&other],
                            |r| r.get(0),
                        )
                        .unwrap_or_default();
                    return Err(StoreError::IdsTaken {
                        id: id.to_string(),
                        other,
                        address,
                    });
                }
                Ok(_) | Err(StoreError::NotFound(_)) => {}
                Err(e) => return Err(e),
            }
        }
        Ok(())
    }

    /// Puts an inspection file into the store as a copy: every id new, so it sits beside
    /// an inspection holding the same ids.
    pub fn import_inspection_copy(&mut self, inspection: &Inspection) -> Result<ImportOutcome> {
        let (copy, _) = renumber::renumbered(inspection, super::new_id);
        self.replace(&copy, &[])
    }

    /// Replaces (or creates) the inspection with this id, in one transaction. An inner id
    /// that another stored inspection holds is refused with that inspection named, not with
    /// SQLite's constraint message.
    fn replace(&mut self, inspection: &Inspection, notes: &[FindingNote]) -> Result<ImportOutcome> {
        match self.replace_rows(inspection, notes) {
            Err(StoreError::Sql(e))
                if e.sqlite_error_code() == Some(rusqlite::ErrorCode::ConstraintViolation) =>
            {
                self.refuse_foreign_ids(inspection)?;
                Err(StoreError::Sql(e))
            }
            other => other,
        }
    }

    fn replace_rows(
        &mut self,
        inspection: &Inspection,
        notes: &[FindingNote],
    ) -> Result<ImportOutcome> {
        let tx = self
            .conn
            .transaction_with_behavior(rusqlite::TransactionBehavior::Immediate)?;
        let created: Option<String> = rusqlite::OptionalExtension::optional(tx.query_row(
            "SELECT created_at FROM inspections WHERE id = ?1",
            [&inspection.id],
            |r| r.get(0),
        ))?;
        let replaced = created.is_some();
        tx.execute("DELETE FROM inspections WHERE id = ?1", [&inspection.id])?;
        let now = now_utc();
        save::insert_header(&tx, inspection, created.as_deref().unwrap_or(&now), &now)?;
        for (n, area) in inspection.areas.iter().enumerate() {
            save::insert_area(&tx, &inspection.id, n as i64, area)?;
        }
        for (n, photo) in inspection.photos.iter().enumerate() {
            save::insert_photo_ref(&tx, &inspection.id, n as i64, photo, &now)?;
        }
        fill_photo_details(&self.photos, &tx, &inspection.id)?;
        for note in notes {
            tx.execute(
                "INSERT INTO finding_notes (inspection_id, finding_key, note, recommendation, not_applicable_reason, priority, updated_at)
                 VALUES (?1, ?2, ?3, ?4, ?5, ?6, ?7)",
                rusqlite::params![inspection.id, note.key, note.note, note.recommendation, note.not_applicable_reason, note.priority.map(|p| p.key()), now],
            )?;
        }
        tx.commit()?;
        self.sweep_orphans()?;
        Ok(ImportOutcome {
            inspection_id: inspection.id.clone(),
            replaced,
            photos: inspection.photos.len(),
        })
    }
}

/// Sets size and original extension on photo rows whose files are present.
fn fill_photo_details(
    files: &PhotoFiles,
    tx: &rusqlite::Transaction,
    inspection_id: &str,
) -> Result<()> {
    let hashes: Vec<String> = tx
        .prepare("SELECT DISTINCT content_hash FROM photos WHERE inspection_id = ?1 AND content_hash IS NOT NULL")?
        .query_map([inspection_id], |r| r.get(0))?
        .collect::<rusqlite::Result<_>>()?;
    for hash in hashes {
        let report = files.path(Kind::Report, &hash, "jpg");
        let size = std::fs::read(&report)
            .ok()
            .and_then(|b| photo::jpeg_size(&b).ok());
        let ext = ["jpg", "png"]
            .into_iter()
            .find(|e| files.path(Kind::Original, &hash, e).exists());
        tx.execute(
            "UPDATE photos SET width = ?3, height = ?4, original_ext = ?5 WHERE inspection_id = ?1 AND content_hash = ?2",
            rusqlite::params![inspection_id, hash, size.map(|s| s.0), size.map(|s| s.1), ext],
        )?;
    }
    Ok(())
}

fn original_ext(path: Option<&Path>) -> &'static str {
    match path.and_then(|p| p.extension()).and_then(|e| e.to_str()) {
        Some("png") => "png",
        _ => "jpg",
    }
}

/// Why a bundle could not be imported.
#[derive(Debug, Error)]
pub enum ImportError {
    #[error(transparent)]
    Bundle(#[from] BundleError),
    #[error(transparent)]
    Store(#[from] StoreError),
}

/// One image entry of a bundle, located and named.
struct ImageEntry {
    index: usize,
    name: String,
    kind: Kind,
    hash: String,
    ext: &'static str,
}

/// A bundle's entries checked by name and declared size, its inspection and notes read.
struct Survey {
    inspection: Inspection,
    notes: Vec<FindingNote>,
    images: Vec<ImageEntry>,
}

/// Checks every entry's name (no duplicates, nothing outside the bundle's own names) and
/// declared size, and reads the inspection and notes; image bytes are not read here.
fn survey<R: Read + std::io::Seek>(
    zip: &mut zip::ZipArchive<R>,
) -> std::result::Result<Survey, BundleError> {
    if zip.len() > MAX_ENTRIES {
        return Err(BundleError::TooManyEntries(zip.len()));
    }
    let mut total = 0u64;
    let mut seen = HashSet::new();
    let mut images_seen = HashSet::new();
    let (mut inspection, mut notes, mut images) = (None, Vec::new(), Vec::new());
    for index in 0..zip.len() {
        let (name, size, is_dir) = {
            let entry = zip
                .by_index_raw(index)
                .map_err(|e| BundleError::NotAZip(e.to_string()))?;
            (entry.name().to_string(), entry.size(), entry.is_dir())
        };
        if is_dir {
            continue;
        }
        if !seen.insert(name.clone()) {
            return Err(BundleError::Duplicate(name));
        }
        let Some(place) = classify(&name) else {
            return Err(BundleError::BadName(name));
        };
        if size > MAX_ENTRY_BYTES {
            return Err(BundleError::TooBig(name));
        }
        total += size;
        if total > MAX_TOTAL_BYTES {
            return Err(BundleError::TooBigInAll);
        }
        match place {
            Entry::Inspection => {
                let bytes = read_entry(zip, index, &name)?;
                inspection = Some(interchange::from_json_bytes(&bytes)?);
            }
            Entry::Notes => {
                let bytes = read_entry(zip, index, &name)?;
                notes = serde_json::from_slice(&bytes)
                    .map_err(|e| BundleError::BadEntry(name.clone(), e.to_string()))?;
            }
            Entry::Image(kind, hash, ext) => {
                if !images_seen.insert((kind, hash.clone())) {
                    return Err(BundleError::Duplicate(name));
                }
                images.push(ImageEntry {
                    index,
                    name,
                    kind,
                    hash,
                    ext,
                });
            }
        }
    }
    Ok(Survey {
        inspection: inspection.ok_or(BundleError::NoInspection)?,
        notes,
        images,
    })
}

/// The number of entries the zip's end-of-central-directory record declares (APPNOTE 4.3.16:
/// signature 50 4B 05 06, total entries at offset 10), if it can be read and is not the
/// ZIP64 placeholder.
fn declared_entries(file: &mut std::fs::File) -> Option<u64> {
    use std::io::{Seek, SeekFrom};
    let len = file.seek(SeekFrom::End(0)).ok()?;
    let tail = len.min(22 + 65_535);
    file.seek(SeekFrom::Start(len - tail)).ok()?;
    let mut bytes = Vec::with_capacity(tail as usize);
    file.take(tail).read_to_end(&mut bytes).ok()?;
    file.seek(SeekFrom::Start(0)).ok()?;
    let at = bytes
        .windows(4)
        .rposition(|w| w == [0x50, 0x4B, 0x05, 0x06])?;
    let total = u16::from_le_bytes([*bytes.get(at + 10)?, *bytes.get(at + 11)?]);
    (total != 0xFFFF).then_some(total as u64)
}

/// One entry's bytes, read at most to the limit + 1 byte whatever its header claims (a lying
/// header or a deflate bomb stops there), and checked as the kind of entry it is.
fn read_entry<R: Read + std::io::Seek>(
    zip: &mut zip::ZipArchive<R>,
    index: usize,
    name: &str,
) -> std::result::Result<Vec<u8>, BundleError> {
    let mut entry = zip
        .by_index(index)
        .map_err(|e| BundleError::BadEntry(name.into(), e.to_string()))?;
    let mut bytes = Vec::new();
    (&mut entry)
        .take(MAX_ENTRY_BYTES + 1)
        .read_to_end(&mut bytes)
        .map_err(|e| BundleError::BadEntry(name.into(), e.to_string()))?;
    if bytes.len() as u64 > MAX_ENTRY_BYTES {
        return Err(BundleError::TooBig(name.into()));
    }
    if let Some(Entry::Image(kind, _, _)) = classify(name) {
        check_image(kind, &bytes).map_err(|e| BundleError::BadEntry(name.into(), e))?;
    }
    Ok(bytes)
}

/// Report images and thumbnails must be JPEGs within the size limits; originals JPEG or PNG.
fn check_image(kind: Kind, bytes: &[u8]) -> std::result::Result<(), String> {
    let format = sniff(bytes).map_err(|e| e.to_string())?;
    match (kind, format) {
        (Kind::Report | Kind::Thumb, SourceFormat::Jpeg) => photo::jpeg_size(bytes)
            .map(|_| ())
            .map_err(|e| e.to_string()),
        (Kind::Original, _) => Ok(()),
        _ => Err("not a JPEG".into()),
    }
}
