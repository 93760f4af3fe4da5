//! The store's side of the office sync: the device's id, the office's address and token, the
//! firm's settings as last taken, what was pushed of each inspection, and a finished
//! inspection's manifest with where each of its files is.

use super::settings::{read_setting, write_setting};
use super::{Result, Store, StoreError};
use crate::sync::{FirmSettings, ImageRef, Manifest, ReportRef};
use rusqlite::{params, OptionalExtension};
use serde::{Deserialize, Serialize};
use std::collections::HashMap;
use std::path::PathBuf;

/// Where the office is and the token it issued this inspector.
#[derive(Debug, Clone, PartialEq, Default, Serialize, Deserialize)]
#[serde(default)]
pub struct OfficeLink {
    /// e.g. `https://office.example.com`
    pub url: String,
    pub token: String,
}

/// How the last sync with the office went, kept so any screen can say it.
#[derive(Debug, Clone, PartialEq, Default, Serialize, Deserialize)]
#[serde(default)]
pub struct SyncOutcome {
    /// UTC, RFC 3339.
    pub at: String,
    pub ok: bool,
    /// What was sent and taken, or why it could not be.
    pub text: String,
}

/// What the office acknowledged for one inspection.
#[derive(Debug, Clone, PartialEq)]
pub struct PushedRevision {
    pub content_sha256: String,
    pub revision: i64,
    pub pushed_at: String,
}

/// A manifest and the files it names, by SHA-256.
#[derive(Debug, Clone)]
pub struct OutgoingRevision {
    pub manifest: Manifest,
    pub files: HashMap<String, PathBuf>,
    /// Reports whose PDF the device no longer holds (recorded, not sent).
    pub reports_without_pdf: usize,
    /// Photos with no image on this device (references only).
    pub photos_without_image: usize,
}

impl Store {
    fn setting<T: for<'de> Deserialize<'de>>(&self, key: &str) -> Result<Option<T>> {
        read_setting(&self.conn, key)
    }

    fn put_setting<T: Serialize>(&mut self, key: &str, value: &T) -> Result<()> {
        write_setting(&self.conn, key, value)
    }

    /// This device's id, made once and kept.
    pub fn device_id(&mut self) -> Result<String> {
        if let Some(id) = self.setting::<String>("device")? {
            return Ok(id);
        }
        let id = super::new_id();
        self.put_setting("device", &id)?;
        Ok(id)
    }

    pub fn office_link(&self) -> Result<OfficeLink> {
        Ok(self.setting("office")?.unwrap_or_default())
    }

    pub fn save_office_link(&mut self, link: &OfficeLink) -> Result<()> {
        self.put_setting("office", link)
    }

    /// Keeps how a sync went (now).
    pub fn record_sync_outcome(&mut self, ok: bool, text: &str) -> Result<()> {
        let outcome = SyncOutcome {
            at: super::now_utc(),
            ok,
            text: text.into(),
        };
        self.put_setting("office_last", &outcome)
    }

    /// How the last sync went, if there was one.
    pub fn last_sync_outcome(&self) -> Result<Option<SyncOutcome>> {
        self.setting("office_last")
    }

    /// The firm's settings as last taken from the office, if ever.
    pub fn firm_settings(&self) -> Result<Option<FirmSettings>> {
        self.setting("firm")
    }

    /// Keeps the firm's settings and puts its company, licence and edition into the device's
    /// own settings.
    pub fn save_firm_settings(&mut self, firm: &FirmSettings) -> Result<()> {
        let mut settings = self.settings()?;
        firm.apply_to(&mut settings);
        let tx = self.conn.transaction()?;
        write_setting(&tx, "firm", firm)?;
        write_setting(&tx, super::settings::KEY, &settings)?;
        tx.commit()?;
        Ok(())
    }

    /// Inspections with at least one delivered report: the ones a sync sends.
    pub fn finished_inspections(&self) -> Result<Vec<String>> {
        let mut stmt = self.conn.prepare(
            "SELECT i.id FROM inspections i WHERE EXISTS (SELECT 1 FROM reports r WHERE r.inspection_id = i.id) ORDER BY i.created_at, i.id",
        )?;
        let ids = stmt
            .query_map([], |r| r.get(0))?
            .collect::<rusqlite::Result<_>>()?;
        Ok(ids)
    }

    pub fn pushed_revision(&self, inspection_id: &str) -> Result<Option<PushedRevision>> {
        Ok(self
            .conn
            .query_row(
                "SELECT content_sha256, revision, pushed_at FROM office_pushes WHERE inspection_id = ?1",
                [inspection_id],
                |r| {
                    Ok(PushedRevision {
                        content_sha256: r.get(0)?,
                        revision: r.get(1)?,
                        pushed_at: r.get(2)?,
                    })
                },
            )
            .optional()?)
    }

    pub fn record_push(
        &mut self,
        inspection_id: &str,
        content_sha256: &str,
        revision: i64,
    ) -> Result<()> {
        self.conn.execute(
            "INSERT INTO office_pushes (inspection_id, content_sha256, revision, pushed_at) VALUES (?1, ?2, ?3, ?4)
             ON CONFLICT (inspection_id) DO UPDATE SET content_sha256 = ?2, revision = ?3, pushed_at = ?4",
            params![inspection_id, content_sha256, revision, super::now_utc()],
        )?;
        Ok(())
    }

    /// Where the copy of a delivered PDF is kept, by its SHA-256.
    pub fn delivered_pdf_path(&self, sha256: &str) -> PathBuf {
        self.report_dir()
            .join("delivered")
            .join(format!("{sha256}.pdf"))
    }

    /// The inspection as the office will keep it, and where each file it names is. A report
    /// image or PDF is named by the SHA-256 of its bytes, read now; an original by the
    /// content hash the store gave it (the office checks every file against its name).
    pub fn outgoing_revision(&self, inspection_id: &str) -> Result<OutgoingRevision> {
        let inspection = self.load_inspection(inspection_id)?;
        let mut files = HashMap::new();
        let mut images = Vec::new();
        let mut photos_without_image = 0;
        for photo in self.photos_of_inspection(inspection_id)? {
            let Some(report) = photo.report_path.as_ref().filter(|p| p.exists()) else {
                photos_without_image += 1;
                continue;
            };
            let (report_sha256, report_bytes) = hash_file(report)?;
            files.insert(report_sha256.clone(), report.clone());
            // The original is already named by its content hash (checked when it came in):
            // only its size is read, not its bytes.
            let original = match (photo.original_path.as_ref(), photo.hash.as_ref()) {
                (Some(path), Some(sha)) if path.exists() => {
                    files.insert(sha.clone(), path.clone());
                    Some((sha.clone(), std::fs::metadata(path)?.len()))
                }
                _ => None,
            };
            images.push(ImageRef {
                photo_id: photo.id,
                report_sha256,
                report_bytes,
                original_sha256: original.as_ref().map(|o| o.0.clone()),
                original_bytes: original.map(|o| o.1),
            });
        }
        let mut reports = Vec::new();
        let mut reports_without_pdf = 0;
        for delivered in self.reports(inspection_id)? {
            let kept = [
                self.delivered_pdf_path(&delivered.sha256),
                self.report_dir().join(&delivered.file_name),
            ]
            .into_iter()
            .find(|p| hash_file(p).is_ok_and(|(sha, _)| sha == delivered.sha256));
            if let Some(path) = &kept {
                files.insert(delivered.sha256.clone(), path.clone());
            } else {
                reports_without_pdf += 1;
            }
            reports.push(ReportRef {
                id: delivered.id,
                delivered_at: delivered.delivered_at,
                file_name: delivered.file_name,
                recipient: delivered.recipient,
                sha256: delivered.sha256,
                bytes: delivered.bytes,
                pdf_sent: kept.is_some(),
            });
        }
        // Oldest first, so the manifest does not change when nothing did.
        reports.reverse();
        let manifest = Manifest {
            inspection: crate::interchange::to_json(&inspection),
            notes: self.finding_notes(inspection_id)?,
            images,
            reports,
        };
        if manifest.check().is_err() {
            return Err(StoreError::Invalid(format!(
                "inspection {inspection_id} cannot be sent as it is: {}",
                manifest
                    .check()
                    .err()
                    .map(|e| e.to_string())
                    .unwrap_or_default()
            )));
        }
        Ok(OutgoingRevision {
            manifest,
            files,
            reports_without_pdf,
            photos_without_image,
        })
    }
}

/// SHA-256 and size of a file, read in pieces.
fn hash_file(path: &std::path::Path) -> Result<(String, u64)> {
    use sha2::{Digest, Sha256};
    use std::io::Read;
    let mut file = std::fs::File::open(path)?;
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
    Ok((super::files::hex(&hasher.finalize()), total))
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::photo::test_images::{camera_jpeg, upright_scene};
    use crate::store::{content_hash, NewInspection};

    fn temp(name: &str) -> PathBuf {
        let dir = std::env::temp_dir().join(format!(
            "undercroft-office-{name}-{}-{}",
            std::process::id(),
            super::super::new_id()
        ));
        std::fs::create_dir_all(&dir).unwrap();
        dir
    }

    #[test]
    fn only_delivered_inspections_go_and_their_manifest_names_each_file_by_its_hash() {
        let dir = temp("outgoing");
        let mut store = Store::open(&dir.join("s.sqlite")).unwrap();
        let mut demo = crate::interchange::demo();
        demo.photos.clear();
        store.import_inspection(&demo).unwrap();
        assert!(
            store.finished_inspections().unwrap().is_empty(),
            "nothing delivered yet"
        );
        let jpeg = camera_jpeg(&upright_scene(640, 480), 6);
        let photo = store.add_photo("obs-family-decay", &jpeg, "Decay").unwrap();
        let pdf = b"%PDF-1.7\n%%EOF\n".to_vec();
        store
            .record_report(&demo.id, "Report.pdf", &pdf, "[]", "Dana")
            .unwrap();
        assert_eq!(store.finished_inspections().unwrap(), vec![demo.id.clone()]);

        let out = store.outgoing_revision(&demo.id).unwrap();
        assert_eq!(out.manifest.images.len(), 1);
        let image = &out.manifest.images[0];
        assert_eq!(image.photo_id, photo.id);
        // The original is named by the photo's own content hash; every file by its bytes.
        assert_eq!(
            image.original_sha256.as_deref(),
            Some(content_hash(&jpeg).as_str())
        );
        for (sha, path) in &out.files {
            assert_eq!(&content_hash(&std::fs::read(path).unwrap()), sha);
        }
        assert_eq!(out.manifest.reports[0].sha256, content_hash(&pdf));
        assert!(out.manifest.reports[0].pdf_sent);
        assert_eq!(out.reports_without_pdf, 0);
        // The same store, asked again, gives the same content hash.
        let again = store.outgoing_revision(&demo.id).unwrap();
        assert_eq!(
            again.manifest.content_sha256(),
            out.manifest.content_sha256()
        );
        // A delivered PDF the device no longer holds is recorded, not sent.
        std::fs::remove_file(store.delivered_pdf_path(&content_hash(&pdf))).unwrap();
        let without = store.outgoing_revision(&demo.id).unwrap();
        assert!(!without.manifest.reports[0].pdf_sent);
        assert_eq!(without.reports_without_pdf, 1);
        std::fs::remove_dir_all(&dir).ok();
    }

    #[test]
    fn what_was_pushed_the_firms_settings_and_the_last_outcome_are_kept() {
        let dir = temp("kept");
        let db = dir.join("s.sqlite");
        let mut store = Store::open(&db).unwrap();
        let id = store
            .create_inspection(&NewInspection {
                address: "1 Elm".into(),
                date: "2026-11-30".into(),
                ..Default::default()
            })
            .unwrap();
        store.record_push(&id, &"a".repeat(64), 7).unwrap();
        store.record_push(&id, &"b".repeat(64), 9).unwrap();
        let device = store.device_id().unwrap();
        store
            .save_firm_settings(&crate::sync::FirmSettings {
                company: "Lantern Hill Inspections".into(),
                code_edition: "IRC 2021".into(),
                ..Default::default()
            })
            .unwrap();
        store
            .record_sync_outcome(false, "the office could not be reached")
            .unwrap();
        drop(store);
        let store = Store::open(&db).unwrap();
        let pushed = store.pushed_revision(&id).unwrap().unwrap();
        assert_eq!(
            (pushed.content_sha256, pushed.revision),
            ("b".repeat(64), 9)
        );
        let mut store = store;
        assert_eq!(
            store.device_id().unwrap(),
            device,
            "the device keeps its id"
        );
        assert_eq!(
            store.settings().unwrap().company,
            "Lantern Hill Inspections"
        );
        assert_eq!(store.settings().unwrap().code_edition, "IRC 2021");
        let last = store.last_sync_outcome().unwrap().unwrap();
        assert!(!last.ok && last.text.contains("could not be reached"));
        // The firm's dead load fills a new inspection unless heavy finishes are said; its
        // live load only where no room use was picked.
        let mut firm = store.firm_settings().unwrap().unwrap();
        firm.live_psf = Some(50.0);
        firm.dead_psf = Some(15.0);
        store.save_firm_settings(&firm).unwrap();
        let loads_of = |store: &mut Store, new: NewInspection| {
            let id = store.create_inspection(&new).unwrap();
            store.load_inspection(&id).unwrap().loads
        };
        let plain = NewInspection {
            address: "2 Elm".into(),
            date: "2026-11-30".into(),
            ..Default::default()
        };
        let loads = loads_of(&mut store, plain.clone());
        assert_eq!((loads.live_psf, loads.dead_psf), (Some(50.0), Some(15.0)));
        let picked = NewInspection {
            room_use_above: Some(crate::model::RoomUse::Sleeping),
            heavy_finish: true,
            ..plain
        };
        let loads = loads_of(&mut store, picked);
        assert_eq!((loads.live_psf, loads.dead_psf), (None, None));
        // Deleting the inspection forgets what was pushed of it.
        store.delete_inspection(&id).unwrap();
        assert_eq!(store.pushed_revision(&id).unwrap(), None);
        std::fs::remove_dir_all(&dir).ok();
    }
}
