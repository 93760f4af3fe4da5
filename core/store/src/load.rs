//! Reading an inspection out of its rows into the engine's model, in stored order.

use super::{Result, Store, StoreError};
use rusqlite::{params, OptionalExtension};
use undercroft_engine::model::*;

/// A joist's or single member's stored parts: id, label, framing, observations, and a
/// joist's place along its run.
type StoredMember = (String, String, Framing, Vec<Observation>, Option<f64>);

impl Store {
    /// The whole inspection as the engine's model (and the interchange format).
    /// Reads an inspection whole, inside one read transaction: a consistent snapshot even
    /// while another process commits changes between the reads of its rows.
    pub fn load_inspection(&self, id: &str) -> Result<Inspection> {
        if !self.conn.is_autocommit() {
            return self.read_inspection(id);
        }
        self.conn.execute_batch("BEGIN DEFERRED")?;
        let read = self.read_inspection(id);
        let end = self
            .conn
            .execute_batch(if read.is_ok() { "COMMIT" } else { "ROLLBACK" });
        let inspection = read?;
        end?;
        Ok(inspection)
    }

    fn read_inspection(&self, id: &str) -> Result<Inspection> {
        let mut inspection = self
            .conn
            .query_row(
                "SELECT id, format_version, address, year_built, client_name, client_email, client_phone,
                    inspector_name, inspector_company, inspector_license, visit_date, conditions,
                    code_edition, local_amendments, units, loads
                 FROM inspections WHERE id = ?1",
                [id],
                |r| {
                    Ok((
                        Inspection {
                            format: FORMAT_NAME.into(),
                            version: r.get(1)?,
                            id: r.get(0)?,
                            property: Property { address: r.get(2)?, year_built: r.get(3)? },
                            client: Client { name: r.get(4)?, email: r.get(5)?, phone: r.get(6)? },
                            inspector: InspectorInfo { name: r.get(7)?, company: r.get(8)?, license: r.get(9)? },
                            date: r.get(10)?,
                            conditions: r.get(11)?,
                            code_edition: r.get(12)?,
                            local_amendments: r.get(13)?,
                            units: Default::default(),
                            loads: Default::default(),
                            areas: vec![],
                            photos: vec![],
                        },
                        r.get::<_, String>(14)?,
                        r.get::<_, String>(15)?,
                    ))
                },
            )
            .optional()?
            .map(|(mut i, units, loads)| -> Result<Inspection> {
                i.units = serde_json::from_value(serde_json::Value::String(units))?;
                i.loads = serde_json::from_str(&loads)?;
                Ok(i)
            })
            .ok_or_else(|| StoreError::NotFound(id.into()))??;
        inspection.areas = self.areas(id)?;
        inspection.photos = self.photo_refs(id)?;
        Ok(inspection)
    }

    fn areas(&self, inspection_id: &str) -> Result<Vec<Area>> {
        let mut stmt = self.conn.prepare_cached(
            "SELECT id, name, kind, loads, notes, conditions FROM areas WHERE inspection_id = ?1 ORDER BY position, id",
        )?;
        type AreaRow = (String, String, String, String, String, String);
        let rows: Vec<AreaRow> = stmt
            .query_map([inspection_id], |r| {
                Ok((
                    r.get(0)?,
                    r.get(1)?,
                    r.get(2)?,
                    r.get(3)?,
                    r.get(4)?,
                    r.get(5)?,
                ))
            })?
            .collect::<rusqlite::Result<_>>()?;
        rows.into_iter()
            .map(|(id, name, kind, loads, notes, conditions)| {
                Ok(Area {
                    kind: serde_json::from_value(serde_json::Value::String(kind))?,
                    loads: serde_json::from_str(&loads)?,
                    conditions: serde_json::from_str(&conditions)?,
                    girders: self.girders(&id)?,
                    runs: self.runs(&id)?,
                    members: self
                        .members(&id, None)?
                        .into_iter()
                        .map(|(id, label, framing, observations, _)| Member {
                            id,
                            label,
                            framing,
                            observations,
                        })
                        .collect(),
                    id,
                    name,
                    notes,
                })
            })
            .collect()
    }

    fn runs(&self, area_id: &str) -> Result<Vec<JoistRun>> {
        let mut stmt = self.conn.prepare_cached(
            "SELECT id, label, framing, bears_on FROM runs WHERE area_id = ?1 ORDER BY position, id",
        )?;
        let rows: Vec<(String, String, String, String)> = stmt
            .query_map([area_id], |r| {
                Ok((r.get(0)?, r.get(1)?, r.get(2)?, r.get(3)?))
            })?
            .collect::<rusqlite::Result<_>>()?;
        rows.into_iter()
            .map(|(id, label, framing, bears_on)| {
                Ok(JoistRun {
                    framing: serde_json::from_str(&framing)?,
                    bears_on: serde_json::from_str(&bears_on)?,
                    observations: self.observations("run_id", &id)?,
                    joists: self
                        .members(area_id, Some(&id))?
                        .into_iter()
                        .map(|(id, label, framing, observations, at)| Joist {
                            id,
                            label,
                            at: at.map(undercroft_engine::units::Length::inches),
                            framing,
                            observations,
                        })
                        .collect(),
                    id,
                    label,
                })
            })
            .collect()
    }

    fn girders(&self, area_id: &str) -> Result<Vec<GirderLine>> {
        let mut stmt = self.conn.prepare_cached(
            "SELECT id, label, data FROM girders WHERE area_id = ?1 ORDER BY position, id",
        )?;
        let rows: Vec<(String, String, String)> = stmt
            .query_map([area_id], |r| Ok((r.get(0)?, r.get(1)?, r.get(2)?)))?
            .collect::<rusqlite::Result<_>>()?;
        rows.into_iter()
            .map(|(id, label, data)| {
                let mut girder: GirderLine = with_identity(&data, &id, &label)?;
                girder.posts = self.posts(&id)?;
                Ok(girder)
            })
            .collect()
    }

    fn posts(&self, girder_id: &str) -> Result<Vec<Post>> {
        let mut stmt = self.conn.prepare_cached(
            "SELECT id, label, data FROM posts WHERE girder_id = ?1 ORDER BY position, id",
        )?;
        let rows: Vec<(String, String, String)> = stmt
            .query_map([girder_id], |r| Ok((r.get(0)?, r.get(1)?, r.get(2)?)))?
            .collect::<rusqlite::Result<_>>()?;
        rows.into_iter()
            .map(|(id, label, data)| with_identity(&data, &id, &label))
            .collect()
    }

    /// Members of an area: the joists of `run_id`, or the single members when None.
    fn members(&self, area_id: &str, run_id: Option<&str>) -> Result<Vec<StoredMember>> {
        let mut stmt = self.conn.prepare_cached(
            "SELECT id, label, framing, at_inches FROM members WHERE area_id = ?1 AND run_id IS ?2 ORDER BY position, id",
        )?;
        let rows: Vec<(String, String, String, Option<f64>)> = stmt
            .query_map(params![area_id, run_id], |r| {
                Ok((r.get(0)?, r.get(1)?, r.get(2)?, r.get(3)?))
            })?
            .collect::<rusqlite::Result<_>>()?;
        rows.into_iter()
            .map(|(id, label, framing, at)| {
                let observations = self.observations("member_id", &id)?;
                Ok((id, label, serde_json::from_str(&framing)?, observations, at))
            })
            .collect()
    }

    fn observations(&self, owner_column: &str, owner_id: &str) -> Result<Vec<Observation>> {
        let sql = format!("SELECT id, data, note FROM observations WHERE {owner_column} = ?1 ORDER BY position, id");
        let mut stmt = self.conn.prepare_cached(&sql)?;
        let rows: Vec<(String, String, String)> = stmt
            .query_map([owner_id], |r| Ok((r.get(0)?, r.get(1)?, r.get(2)?)))?
            .collect::<rusqlite::Result<_>>()?;
        rows.into_iter()
            .map(|(id, data, note)| {
                Ok(Observation {
                    id: id.into(),
                    kind: serde_json::from_str(&data)?,
                    note,
                })
            })
            .collect()
    }

    fn photo_refs(&self, inspection_id: &str) -> Result<Vec<PhotoRef>> {
        let mut stmt = self.conn.prepare_cached(
            "SELECT id, file, attached_to, caption, marks FROM photos WHERE inspection_id = ?1 ORDER BY position, id",
        )?;
        let rows = stmt.query_map([inspection_id], |r| {
            Ok((
                PhotoRef {
                    id: r.get(0)?,
                    file: r.get(1)?,
                    attached_to: r.get(2)?,
                    caption: r.get(3)?,
                    marks: vec![],
                },
                r.get::<_, String>(4)?,
            ))
        })?;
        rows.map(|row| {
            let (mut photo, marks) = row?;
            photo.marks = serde_json::from_str(&marks)?;
            Ok(photo)
        })
        .collect()
    }
}

/// A row's JSON `data` with its id and label columns put back.
fn with_identity<T: serde::de::DeserializeOwned>(data: &str, id: &str, label: &str) -> Result<T> {
    let mut value: serde_json::Value = serde_json::from_str(data)?;
    if let Some(map) = value.as_object_mut() {
        map.insert("id".into(), id.into());
        map.insert("label".into(), label.into());
    }
    Ok(serde_json::from_value(value)?)
}
