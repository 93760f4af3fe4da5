//! Photos in the store: imported through the photo pipeline, files written durably before the
//! row, named by content hash, captioned and ordered per owner; orphan files swept.

use super::clock::now_utc;
use super::files::{content_hash, Kind};
use super::inspections::found;
use super::{KeepOriginals, Result, Store, StoreError};
use rusqlite::{params, OptionalExtension};
use std::collections::HashSet;
use std::path::PathBuf;
use undercroft_engine::model::{marks_problem, PhotoMark, PhotoRef};
use undercroft_photo::{self as photo, sniff};

/// A photo run through the import pipeline, ready to store: pure work, so many can be
/// prepared on several threads and stored one after another.
#[derive(Debug, Clone, PartialEq)]
pub struct PreparedPhoto {
    pub hash: String,
    pub format: photo::SourceFormat,
    /// None when the store already holds this content's images.
    pub processed: Option<photo::ProcessedPhoto>,
}

/// Hashes and imports a photo (decode, resize, orient, encode) without touching the store.
pub fn prepare_photo(bytes: &[u8]) -> Result<PreparedPhoto> {
    let format = sniffed(bytes)?;
    // The hash (about 10 ms for a 4 MB photo) runs beside the decode.
    let (hash, processed) = std::thread::scope(|s| {
        let hash = s.spawn(|| content_hash(bytes));
        let processed = photo::process(bytes);
        (hash.join().expect("hashing does not panic"), processed)
    });
    Ok(PreparedPhoto {
        hash,
        format,
        processed: Some(processed?),
    })
}

/// The photo's format, or why it is refused (an empty file said as such).
fn sniffed(bytes: &[u8]) -> Result<photo::SourceFormat> {
    Ok(sniff(bytes).map_err(|e| {
        if bytes.is_empty() {
            photo::PhotoError::Empty
        } else {
            e
        }
    })?)
}

/// A stored photo with where its files are.
#[derive(Debug, Clone, PartialEq)]
pub struct StoredPhoto {
    pub id: String,
    pub inspection_id: String,
    pub attached_to: String,
    pub caption: String,
    /// Content hash of the original file; None for a reference imported without its image.
    pub hash: Option<String>,
    pub width: Option<u32>,
    pub height: Option<u32>,
    pub report_path: Option<PathBuf>,
    pub thumb_path: Option<PathBuf>,
    pub original_path: Option<PathBuf>,
}

impl Store {
    /// Imports a photo and attaches it (last in order) to an area, run, member or
    /// observation. Nothing is stored when the bytes are refused.
    pub fn add_photo(
        &mut self,
        attached_to: &str,
        bytes: &[u8],
        caption: &str,
    ) -> Result<PhotoRef> {
        let inspection_id = self.check_owner(attached_to)?;
        let format = sniffed(bytes)?;
        // The hash comes first (a few ms): a photo the store already holds is not decoded
        // and resized again, its stored images serve.
        let hash = content_hash(bytes);
        if self.existing_size(&hash)?.is_some() {
            let prepared = PreparedPhoto {
                hash,
                format,
                processed: None,
            };
            return self.store_prepared(
                &inspection_id,
                attached_to,
                bytes,
                &prepared,
                caption,
                None,
            );
        }
        // A new photo: the original is written and synced while it is decoded; it gets its
        // name (the hash) when the row is written.
        let files = &self.photos;
        let keep = self.keep_originals == KeepOriginals::Yes;
        let (staged, processed) = std::thread::scope(|s| {
            let staged = keep.then(|| s.spawn(|| files.stage(Kind::Original, bytes)));
            let processed = photo::process(bytes);
            let staged = staged.map(|t| t.join().expect("a file write does not panic"));
            (staged, processed)
        });
        let staged = staged.transpose()?;
        let processed = match processed {
            Ok(p) => p,
            Err(e) => {
                if let Some(staged) = staged {
                    staged.discard();
                }
                return Err(e.into());
            }
        };
        let prepared = PreparedPhoto {
            hash,
            format,
            processed: Some(processed),
        };
        self.store_prepared(
            &inspection_id,
            attached_to,
            bytes,
            &prepared,
            caption,
            staged,
        )
    }

    /// Stores a photo prepared by `prepare_photo` (which may run on other threads).
    pub fn add_prepared_photo(
        &mut self,
        attached_to: &str,
        bytes: &[u8],
        prepared: &PreparedPhoto,
        caption: &str,
    ) -> Result<PhotoRef> {
        let inspection_id = self.check_owner(attached_to)?;
        self.store_prepared(&inspection_id, attached_to, bytes, prepared, caption, None)
    }

    /// Writes the prepared photo's files durably, then its row (the owner already checked).
    fn store_prepared(
        &mut self,
        inspection_id: &str,
        attached_to: &str,
        bytes: &[u8],
        prepared: &PreparedPhoto,
        caption: &str,
        staged: Option<super::files::Staged>,
    ) -> Result<PhotoRef> {
        let inspection_id = inspection_id.to_string();
        let hash = &prepared.hash;
        // The three files are written (and synced) on their own threads, so their fsyncs
        // overlap; the row is written only once all three are durable.
        let keep_original = self.keep_originals == KeepOriginals::Yes;
        let files = &self.photos;
        let ext = prepared.format.extension();
        let (images, original) = std::thread::scope(|s| {
            let original = keep_original.then(|| {
                s.spawn(move || match staged {
                    Some(staged) => files.commit(staged, Kind::Original, hash, ext),
                    None => files.put(Kind::Original, hash, ext, bytes),
                })
            });
            let images = match &prepared.processed {
                Some(processed) => {
                    let thumb = s.spawn(move || {
                        files.replace(Kind::Thumb, hash, "jpg", &processed.thumb_jpeg)
                    });
                    let report = files.replace(Kind::Report, hash, "jpg", &processed.report_jpeg);
                    let thumb = thumb.join().expect("a file write does not panic");
                    Some(
                        report
                            .and(thumb)
                            .map(|_| (processed.report_width, processed.report_height)),
                    )
                }
                None => None,
            };
            (
                images,
                original.map(|t| t.join().expect("a file write does not panic")),
            )
        });
        let (width, height) = match images {
            Some(written) => written?,
            None => self.existing_size(hash)?.ok_or_else(|| {
                StoreError::Invalid("the photo's stored images are missing".into())
            })?,
        };
        let original_ext = match original {
            Some(written) => {
                written?;
                Some(ext)
            }
            None => None,
        };
        let id = super::new_id();
        let file = format!("photos/{hash}.jpg");
        self.edit(&inspection_id, |tx| {
            let position: i64 =
                tx.query_row("SELECT COALESCE(MAX(position) + 1, 0) FROM photos WHERE inspection_id = ?1", [&inspection_id], |r| r.get(0))?;
            tx.execute(
                "INSERT INTO photos (id, inspection_id, attached_to, position, caption, file, content_hash, width, height, original_ext, created_at)
                 VALUES (?1, ?2, ?3, ?4, ?5, ?6, ?7, ?8, ?9, ?10, ?11)",
                params![id, inspection_id, attached_to, position, caption, file, hash, width, height, original_ext, now_utc()],
            )?;
            Ok(())
        })?;
        Ok(PhotoRef {
            id,
            file,
            attached_to: attached_to.into(),
            caption: caption.into(),
            marks: vec![],
        })
    }

    /// The inspection of a photo's owner, which must be an area, run, member or observation.
    /// The inspection a photo's owner is in. The inspection itself may own a photo: the
    /// front of the house, shown with the report's title.
    pub(super) fn check_owner(&self, attached_to: &str) -> Result<String> {
        self.inspection_of(attached_to)
    }

    /// Size of an already stored report image of this content, if there is one made from a
    /// verified original (its file is named by the hash of its own bytes). Images without
    /// their original here (from a bundle that left it out) are not reused: the photo is
    /// made again from the bytes just hashed, and replaces them.
    fn existing_size(&self, hash: &str) -> Result<Option<(u32, u32)>> {
        let (report, thumb) = (
            self.photos.path(Kind::Report, hash, "jpg"),
            self.photos.path(Kind::Thumb, hash, "jpg"),
        );
        let original = ["jpg", "png"]
            .iter()
            .any(|ext| self.photos.path(Kind::Original, hash, ext).exists());
        if !(original && report.exists() && thumb.exists()) {
            return Ok(None);
        }
        Ok(photo::jpeg_size(&std::fs::read(report)?).ok())
    }

    /// Replaces the marks drawn on a photo (an empty list clears them). Marks that cannot be
    /// kept are refused in words and nothing changes.
    pub fn set_photo_marks(&mut self, photo_id: &str, marks: &[PhotoMark]) -> Result<()> {
        if let Some(why) = marks_problem(marks) {
            return Err(StoreError::Invalid(why));
        }
        let inspection_id = self.inspection_of(photo_id)?;
        let text = serde_json::to_string(marks)?;
        self.edit(&inspection_id, |tx| {
            found(
                tx.execute(
                    "UPDATE photos SET marks = ?2 WHERE id = ?1",
                    params![photo_id, text],
                )?,
                photo_id,
            )
        })
    }

    /// The marks drawn on a photo.
    pub fn photo_marks(&self, photo_id: &str) -> Result<Vec<PhotoMark>> {
        let text: String = self
            .conn
            .query_row("SELECT marks FROM photos WHERE id = ?1", [photo_id], |r| {
                r.get(0)
            })
            .optional()?
            .ok_or_else(|| StoreError::NotFound(photo_id.into()))?;
        Ok(serde_json::from_str(&text)?)
    }

    pub fn set_photo_caption(&mut self, photo_id: &str, caption: &str) -> Result<()> {
        let inspection_id = self.inspection_of(photo_id)?;
        self.edit(&inspection_id, |tx| {
            found(
                tx.execute(
                    "UPDATE photos SET caption = ?2 WHERE id = ?1",
                    params![photo_id, caption],
                )?,
                photo_id,
            )
        })
    }

    /// The photos attached to one owner, in order.
    pub fn photos_of(&self, attached_to: &str) -> Result<Vec<StoredPhoto>> {
        self.query_photos("attached_to = ?1", attached_to)
    }

    /// Every photo of an inspection, in order.
    pub fn photos_of_inspection(&self, inspection_id: &str) -> Result<Vec<StoredPhoto>> {
        self.query_photos("inspection_id = ?1", inspection_id)
    }

    pub fn photo(&self, photo_id: &str) -> Result<StoredPhoto> {
        self.query_photos("id = ?1", photo_id)?
            .into_iter()
            .next()
            .ok_or_else(|| StoreError::NotFound(photo_id.into()))
    }

    fn query_photos(&self, filter: &str, value: &str) -> Result<Vec<StoredPhoto>> {
        let sql = format!(
            "SELECT id, inspection_id, attached_to, caption, content_hash, width, height, original_ext
             FROM photos WHERE {filter} ORDER BY position, id"
        );
        let mut stmt = self.conn.prepare_cached(&sql)?;
        let rows = stmt.query_map([value], |r| {
            Ok((
                r.get::<_, String>(0)?,
                r.get::<_, String>(1)?,
                r.get::<_, String>(2)?,
                r.get::<_, String>(3)?,
                r.get::<_, Option<String>>(4)?,
                r.get::<_, Option<u32>>(5)?,
                r.get::<_, Option<u32>>(6)?,
                r.get::<_, Option<String>>(7)?,
            ))
        })?;
        let mut out = Vec::new();
        for row in rows {
            let (id, inspection_id, attached_to, caption, hash, width, height, ext) = row?;
            let existing = |kind, ext: &str| {
                hash.as_ref()
                    .map(|h| self.photos.path(kind, h, ext))
                    .filter(|p| p.exists())
            };
            out.push(StoredPhoto {
                report_path: existing(Kind::Report, "jpg"),
                thumb_path: existing(Kind::Thumb, "jpg"),
                original_path: ext.as_deref().and_then(|e| existing(Kind::Original, e)),
                id,
                inspection_id,
                attached_to,
                caption,
                hash,
                width,
                height,
            });
        }
        Ok(out)
    }

    /// Deletes photo files no row refers to, and temporary files of interrupted writes, once
    /// older than the grace period (`files::SWEEP_GRACE`): a younger one may be another
    /// process's photo whose row is not committed yet.
    pub(super) fn sweep_orphans(&self) -> Result<usize> {
        self.sweep_orphans_older_than(super::files::SWEEP_GRACE)
    }

    /// As `sweep_orphans`, with another grace period (zero in tests that need it now).
    pub fn sweep_orphans_older_than(&self, grace: std::time::Duration) -> Result<usize> {
        let keep: HashSet<String> = self
            .conn
            .prepare("SELECT DISTINCT content_hash FROM photos WHERE content_hash IS NOT NULL")?
            .query_map([], |r| r.get(0))?
            .collect::<rusqlite::Result<_>>()?;
        Ok(self.photos.sweep(&keep, grace)?)
    }
}
