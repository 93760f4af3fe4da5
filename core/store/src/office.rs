//! The store's side of the office sync: the device's id, the office's address and token, the
//! firm's settings as last taken, and what was pushed of each inspection.

use super::settings::{read_setting, write_setting};
use super::{Result, Store};
use crate::firm::FirmSettings;
use rusqlite::{params, OptionalExtension};
use serde::{Deserialize, Serialize};
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
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::NewInspection;

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
            .save_firm_settings(&crate::firm::FirmSettings {
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
            room_use_above: Some(undercroft_engine::model::RoomUse::Sleeping),
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
