//! Inspections as a whole: create, list (newest first, searched by address or client),
//! change the header, rename, archive, delete.

use super::migrate::search_key;
use super::{clock::now_utc, new_id, Result, Store, StoreError};
use rusqlite::{params, OptionalExtension};
use undercroft_engine::model::{LoadSettings, RoomUse, FORMAT_VERSION};

/// What starting an inspection asks for.
#[derive(Debug, Clone, PartialEq, Default)]
pub struct NewInspection {
    pub address: String,
    pub client_name: String,
    /// `YYYY-MM-DD`
    pub date: String,
    pub room_use_above: Option<RoomUse>,
    pub heavy_finish: bool,
    pub code_edition: String,
    pub inspector_name: String,
    pub inspector_company: String,
    pub inspector_license: String,
    pub units: undercroft_engine::units::UnitSystem,
}

/// One line of the inspection list.
#[derive(Debug, Clone, PartialEq)]
pub struct InspectionSummary {
    pub id: String,
    pub address: String,
    pub client_name: String,
    pub date: String,
    pub updated_at: String,
    pub archived: bool,
}

/// Which inspections to list.
#[derive(Debug, Clone, PartialEq, Default)]
pub struct ListFilter {
    /// Words found in the address or the client's name (case-insensitive).
    pub search: String,
    pub include_archived: bool,
}

impl Store {
    /// Starts an inspection and returns its id.
    /// What the inspection leaves empty is filled from the firm's settings, when the office
    /// has sent them: company, licence, the county's edition and amendments, default loads.
    pub fn create_inspection(&mut self, new: &NewInspection) -> Result<String> {
        let mut new = new.clone();
        let firm = self.firm_settings()?;
        let amendments = firm.as_ref().and_then(|f| f.fill(&mut new));
        let new = &new;
        if new.date.trim().is_empty() {
            return Err(StoreError::Invalid("the inspection needs a date".into()));
        }
        undercroft_engine::model::check_date(new.date.trim()).map_err(StoreError::Invalid)?;
        let id = new_id();
        let now = now_utc();
        // The firm's dead load stands unless heavy finishes are said; its live load only
        // where the rooms above are not said (a room use picked on the device wins).
        let loads = LoadSettings {
            room_use_above: new.room_use_above,
            heavy_finish: Some(new.heavy_finish),
            live_psf: firm
                .as_ref()
                .and_then(|f| f.live_psf)
                .filter(|_| new.room_use_above.is_none()),
            dead_psf: firm
                .as_ref()
                .and_then(|f| f.dead_psf)
                .filter(|_| !new.heavy_finish),
            ..Default::default()
        };
        let edition = if new.code_edition.trim().is_empty() {
            "IRC 2018"
        } else {
            new.code_edition.trim()
        };
        self.conn.execute(
            "INSERT INTO inspections (id, format_version, address, client_name, visit_date, code_edition,
                inspector_name, inspector_company, inspector_license, loads, created_at, updated_at, search_key, units, local_amendments)
             VALUES (?1, ?2, ?3, ?4, ?5, ?6, ?7, ?8, ?9, ?10, ?11, ?11, ?12, ?13, ?14)",
            params![
                id,
                FORMAT_VERSION,
                new.address,
                new.client_name,
                new.date,
                edition,
                new.inspector_name,
                new.inspector_company,
                new.inspector_license,
                serde_json::to_string(&loads)?,
                now,
                search_key(&new.address, &new.client_name),
                super::save::text_of(&new.units)?,
                amendments.unwrap_or_default(),
            ],
        )?;
        Ok(id)
    }

    /// Inspections, most recently changed first.
    pub fn list_inspections(&self, filter: &ListFilter) -> Result<Vec<InspectionSummary>> {
        let pattern = format!("%{}%", escape_like(&filter.search.trim().to_lowercase()));
        let mut stmt = self.conn.prepare(
            "SELECT id, address, client_name, visit_date, updated_at, archived_at IS NOT NULL
             FROM inspections
             WHERE search_key LIKE ?1 ESCAPE '\\' AND (?2 OR archived_at IS NULL)
             ORDER BY updated_at DESC, id DESC",
        )?;
        let rows = stmt.query_map(params![pattern, filter.include_archived], |r| {
            Ok(InspectionSummary {
                id: r.get(0)?,
                address: r.get(1)?,
                client_name: r.get(2)?,
                date: r.get(3)?,
                updated_at: r.get(4)?,
                archived: r.get(5)?,
            })
        })?;
        Ok(rows.collect::<rusqlite::Result<_>>()?)
    }

    /// Renames an inspection: its property address, as the list shows it.
    pub fn rename_inspection(&mut self, id: &str, address: &str) -> Result<()> {
        let client: String = self
            .conn
            .query_row(
                "SELECT client_name FROM inspections WHERE id = ?1",
                [id],
                |r| r.get(0),
            )
            .optional()?
            .ok_or_else(|| StoreError::NotFound(id.into()))?;
        self.conn.execute(
            "UPDATE inspections SET address = ?2, search_key = ?3, updated_at = ?4 WHERE id = ?1",
            params![id, address, search_key(address, &client), now_utc()],
        )?;
        Ok(())
    }

    /// Archives (hides from the default list) or brings back an inspection.
    pub fn archive_inspection(&mut self, id: &str, archived: bool) -> Result<()> {
        let stamp = archived.then(now_utc);
        let changed = self.conn.execute(
            "UPDATE inspections SET archived_at = ?2 WHERE id = ?1",
            params![id, stamp],
        )?;
        found(changed, id)
    }

    /// Whether an inspection is archived.
    pub fn is_archived(&self, id: &str) -> Result<bool> {
        let stamp: Option<Option<String>> = self
            .conn
            .query_row(
                "SELECT archived_at FROM inspections WHERE id = ?1",
                [id],
                |r| r.get(0),
            )
            .optional()?;
        match stamp {
            Some(stamp) => Ok(stamp.is_some()),
            None => Err(StoreError::NotFound(id.to_string())),
        }
    }

    /// Deletes an inspection with everything in it; its photo files go when no other photo
    /// uses them.
    pub fn delete_inspection(&mut self, id: &str) -> Result<()> {
        let changed = self
            .conn
            .execute("DELETE FROM inspections WHERE id = ?1", [id])?;
        found(changed, id)?;
        self.sweep_orphans()?;
        Ok(())
    }

    /// Marks the inspection changed now (every edit calls this in its transaction).
    pub(super) fn touch(tx: &rusqlite::Transaction, inspection_id: &str) -> Result<()> {
        tx.execute(
            "UPDATE inspections SET updated_at = ?2 WHERE id = ?1",
            params![inspection_id, now_utc()],
        )?;
        Ok(())
    }
}

/// NotFound when no row changed.
pub(super) fn found(changed: usize, id: &str) -> Result<()> {
    if changed == 0 {
        Err(StoreError::NotFound(id.to_string()))
    } else {
        Ok(())
    }
}

fn escape_like(text: &str) -> String {
    text.replace('\\', "\\\\")
        .replace('%', "\\%")
        .replace('_', "\\_")
}
