//! Edits inside an inspection: the header; areas, runs, joists, single members,
//! observations, girder lines and posts added, changed, removed and moved. Each call is one
//! transaction.

use super::clock::now_utc;
use super::inspections::found;
use super::save::{self, Owner};
use super::{Result, Store, StoreError};
use rusqlite::{params, OptionalExtension, Transaction};
use undercroft_engine::model::{
    Area, Framing, GirderLine, Inspection, Joist, JoistRun, Member, Observation, Post,
};

/// The tables that hold ordered children, and the column naming their parent.
const ORDERED: [(&str, &str); 7] = [
    ("areas", "inspection_id"),
    ("runs", "area_id"),
    ("members", "area_id, run_id"),
    ("observations", "run_id, member_id"),
    ("girders", "area_id"),
    ("posts", "girder_id"),
    ("photos", "inspection_id, attached_to"),
];

impl Store {
    /// Rewrites the inspection's header (property, client, inspector, date, conditions, code
    /// edition, units, loads); its areas and photos are left as they are.
    pub fn update_header(&mut self, inspection: &Inspection) -> Result<()> {
        let tx = self
            .conn
            .transaction_with_behavior(rusqlite::TransactionBehavior::Immediate)?;
        let changed = save::update_header(&tx, inspection, &now_utc())?;
        found(changed, &inspection.id)?;
        tx.commit()?;
        Ok(())
    }

    /// Adds an area (with whatever it already holds) at the end of the inspection.
    pub fn add_area(&mut self, inspection_id: &str, area: &Area) -> Result<()> {
        self.edit(inspection_id, |tx| {
            let position = next_position(tx, "areas", "inspection_id = ?1", inspection_id)?;
            save::insert_area(tx, inspection_id, position, area)
        })
    }

    /// Changes an area's name, kind, loads and notes.
    pub fn update_area(&mut self, area: &Area) -> Result<()> {
        let inspection_id = self.inspection_of(&area.id)?;
        self.edit(&inspection_id, |tx| {
            let changed = tx.execute(
                "UPDATE areas SET name = ?2, kind = ?3, loads = ?4, notes = ?5, conditions = ?6 WHERE id = ?1",
                params![
                    area.id,
                    area.name,
                    save::text_of(&area.kind)?,
                    serde_json::to_string(&area.loads)?,
                    area.notes,
                    serde_json::to_string(&area.conditions)?
                ],
            )?;
            found(changed, &area.id)
        })
    }

    /// Adds a joist run (with its joists and observations) at the end of an area.
    pub fn add_run(&mut self, area_id: &str, run: &JoistRun) -> Result<()> {
        let inspection_id = self.inspection_of(area_id)?;
        self.edit(&inspection_id, |tx| {
            let position = next_position(tx, "runs", "area_id = ?1", area_id)?;
            save::insert_run(tx, area_id, position, run)
        })
    }

    /// Changes a run's label and framing.
    pub fn update_run(&mut self, run_id: &str, label: &str, framing: &Framing) -> Result<()> {
        let inspection_id = self.inspection_of(run_id)?;
        self.edit(&inspection_id, |tx| {
            let changed = tx.execute(
                "UPDATE runs SET label = ?2, framing = ?3 WHERE id = ?1",
                params![run_id, label, serde_json::to_string(framing)?],
            )?;
            found(changed, run_id)
        })
    }

    /// Sets the girder lines a run's joists bear on.
    pub fn set_bears_on(&mut self, run_id: &str, girder_ids: &[String]) -> Result<()> {
        let inspection_id = self.inspection_of(run_id)?;
        self.edit(&inspection_id, |tx| {
            let changed = tx.execute(
                "UPDATE runs SET bears_on = ?2 WHERE id = ?1",
                params![run_id, serde_json::to_string(girder_ids)?],
            )?;
            found(changed, run_id)
        })
    }

    /// Adds a girder line (with its posts) at the end of an area.
    pub fn add_girder(&mut self, area_id: &str, girder: &GirderLine) -> Result<()> {
        let inspection_id = self.inspection_of(area_id)?;
        self.edit(&inspection_id, |tx| {
            let position = next_position(tx, "girders", "area_id = ?1", area_id)?;
            save::insert_girder(tx, area_id, position, girder)
        })
    }

    /// Changes a girder line's label and fields; its posts are left as they are.
    pub fn update_girder(&mut self, girder: &GirderLine) -> Result<()> {
        let inspection_id = self.inspection_of(&girder.id)?;
        self.edit(&inspection_id, |tx| {
            let changed = tx.execute(
                "UPDATE girders SET label = ?2, data = ?3 WHERE id = ?1",
                params![girder.id, girder.label, save::girder_data(girder)?],
            )?;
            found(changed, &girder.id)
        })
    }

    /// Adds a post to a girder line.
    pub fn add_post(&mut self, girder_id: &str, post: &Post) -> Result<()> {
        let inspection_id = self.inspection_of(girder_id)?;
        self.edit(&inspection_id, |tx| {
            let position = next_position(tx, "posts", "girder_id = ?1", girder_id)?;
            save::insert_post(tx, girder_id, position, post)
        })
    }

    /// Changes a post's label and fields.
    pub fn update_post(&mut self, post: &Post) -> Result<()> {
        let inspection_id = self.inspection_of(&post.id)?;
        self.edit(&inspection_id, |tx| {
            let changed = tx.execute(
                "UPDATE posts SET label = ?2, data = ?3 WHERE id = ?1",
                params![post.id, post.label, save::post_data(post)?],
            )?;
            found(changed, &post.id)
        })
    }

    /// Adds a joist (what differs from its run, and what was seen on it) to a run.
    pub fn add_joist(&mut self, run_id: &str, joist: &Joist) -> Result<()> {
        let inspection_id = self.inspection_of(run_id)?;
        self.edit(&inspection_id, |tx| {
            let area_id: String =
                tx.query_row("SELECT area_id FROM runs WHERE id = ?1", [run_id], |r| {
                    r.get(0)
                })?;
            let position = next_position(tx, "members", "run_id = ?1", run_id)?;
            save::insert_joist(tx, &area_id, run_id, position, joist)
        })
    }

    /// Adds a single member to an area.
    pub fn add_member(&mut self, area_id: &str, member: &Member) -> Result<()> {
        let inspection_id = self.inspection_of(area_id)?;
        self.edit(&inspection_id, |tx| {
            let position =
                next_position(tx, "members", "area_id = ?1 AND run_id IS NULL", area_id)?;
            save::insert_member(
                tx,
                area_id,
                None,
                position,
                &member.id,
                &member.label,
                &member.framing,
                &member.observations,
            )
        })
    }

    /// Changes a joist's or member's label and framing.
    pub fn update_member(&mut self, member_id: &str, label: &str, framing: &Framing) -> Result<()> {
        let inspection_id = self.inspection_of(member_id)?;
        self.edit(&inspection_id, |tx| {
            let changed = tx.execute(
                "UPDATE members SET label = ?2, framing = ?3 WHERE id = ?1",
                params![member_id, label, serde_json::to_string(framing)?],
            )?;
            found(changed, member_id)
        })
    }

    /// Adds an observation to a run (its typical joist) or a member, at the end.
    pub fn add_observation(&mut self, owner_id: &str, observation: &Observation) -> Result<()> {
        let inspection_id = self.inspection_of(owner_id)?;
        self.edit(&inspection_id, |tx| {
            let is_run: bool = tx.query_row(
                "SELECT EXISTS(SELECT 1 FROM runs WHERE id = ?1)",
                [owner_id],
                |r| r.get(0),
            )?;
            let is_member: bool = tx.query_row(
                "SELECT EXISTS(SELECT 1 FROM members WHERE id = ?1)",
                [owner_id],
                |r| r.get(0),
            )?;
            let (owner, column) = match (is_run, is_member) {
                (true, _) => (Owner::Run(owner_id), "run_id"),
                (_, true) => (Owner::Member(owner_id), "member_id"),
                _ => {
                    return Err(StoreError::Invalid(format!(
                        "{owner_id} is neither a run nor a member"
                    )))
                }
            };
            let position = next_position(tx, "observations", &format!("{column} = ?1"), owner_id)?;
            save::insert_observation(tx, owner, position, observation)
        })
    }

    /// Changes an observation's details and note.
    pub fn update_observation(&mut self, observation: &Observation) -> Result<()> {
        let inspection_id = self.inspection_of(&observation.id)?;
        self.edit(&inspection_id, |tx| {
            let changed = tx.execute(
                "UPDATE observations SET kind = ?2, data = ?3, note = ?4 WHERE id = ?1",
                params![
                    observation.id.as_ref(),
                    observation.kind.name(),
                    serde_json::to_string(&observation.kind)?,
                    observation.note
                ],
            )?;
            found(changed, &observation.id)
        })
    }

    /// Removes an area, run, joist, member or observation with everything under it, and the
    /// photos attached to any of them.
    pub fn remove(&mut self, id: &str) -> Result<()> {
        let inspection_id = self.inspection_of(id)?;
        self.edit(&inspection_id, |tx| {
            let owned = owned_ids(tx, id)?;
            for owner in &owned {
                tx.execute("DELETE FROM photos WHERE attached_to = ?1", [owner])?;
            }
            let mut changed = 0;
            for (table, _) in ORDERED {
                changed += tx.execute(&format!("DELETE FROM {table} WHERE id = ?1"), [id])?;
            }
            found(changed, id)
        })?;
        self.sweep_orphans()?;
        Ok(())
    }

    /// Moves an area, run, joist, member, observation or photo to `index` among its siblings.
    pub fn move_to(&mut self, id: &str, index: usize) -> Result<()> {
        let inspection_id = self.inspection_of(id)?;
        self.edit(&inspection_id, |tx| {
            for (table, parent) in ORDERED {
                let columns: Vec<&str> = parent.split(", ").collect();
                let select = format!("SELECT {} FROM {table} WHERE id = ?1", columns.join(", "));
                let parents: Option<Vec<Option<String>>> = tx
                    .query_row(&select, [id], |r| {
                        (0..columns.len()).map(|i| r.get(i)).collect()
                    })
                    .optional()?;
                let Some(parents) = parents else { continue };
                let filter: Vec<String> = columns
                    .iter()
                    .enumerate()
                    .map(|(i, c)| format!("{c} IS ?{}", i + 1))
                    .collect();
                let sql = format!(
                    "SELECT id FROM {table} WHERE {} ORDER BY position, id",
                    filter.join(" AND ")
                );
                let mut siblings: Vec<String> = tx
                    .prepare(&sql)?
                    .query_map(rusqlite::params_from_iter(parents.iter()), |r| r.get(0))?
                    .collect::<rusqlite::Result<_>>()?;
                let from = siblings
                    .iter()
                    .position(|s| s == id)
                    .expect("the row is among its siblings");
                let moved = siblings.remove(from);
                siblings.insert(index.min(siblings.len()), moved);
                if table == "photos" {
                    // Photo positions are global within the inspection: reuse the siblings'
                    // own slots in their new order.
                    let mut slots: Vec<i64> = Vec::new();
                    for s in &siblings {
                        slots.push(tx.query_row(
                            "SELECT position FROM photos WHERE id = ?1",
                            [s],
                            |r| r.get(0),
                        )?);
                    }
                    slots.sort_unstable();
                    for (s, slot) in siblings.iter().zip(slots) {
                        tx.execute(
                            "UPDATE photos SET position = ?2 WHERE id = ?1",
                            params![s, slot],
                        )?;
                    }
                } else {
                    for (n, s) in siblings.iter().enumerate() {
                        tx.execute(
                            &format!("UPDATE {table} SET position = ?2 WHERE id = ?1"),
                            params![s, n as i64],
                        )?;
                    }
                }
                return Ok(());
            }
            Err(StoreError::NotFound(id.into()))
        })
    }

    /// Runs `change` in one transaction and marks the inspection changed.
    pub(super) fn edit(
        &mut self,
        inspection_id: &str,
        change: impl FnOnce(&Transaction) -> Result<()>,
    ) -> Result<()> {
        let tx = self
            .conn
            .transaction_with_behavior(rusqlite::TransactionBehavior::Immediate)?;
        change(&tx)?;
        Store::touch(&tx, inspection_id)?;
        tx.commit()?;
        Ok(())
    }

    /// The inspection an area, run, member, observation or photo belongs to.
    pub fn inspection_of(&self, id: &str) -> Result<String> {
        let sql = "SELECT inspection_id FROM areas WHERE id = ?1
            UNION ALL SELECT a.inspection_id FROM runs r JOIN areas a ON a.id = r.area_id WHERE r.id = ?1
            UNION ALL SELECT a.inspection_id FROM members m JOIN areas a ON a.id = m.area_id WHERE m.id = ?1
            UNION ALL SELECT a.inspection_id FROM observations o
                JOIN members m ON m.id = o.member_id JOIN areas a ON a.id = m.area_id WHERE o.id = ?1
            UNION ALL SELECT a.inspection_id FROM observations o
                JOIN runs r ON r.id = o.run_id JOIN areas a ON a.id = r.area_id WHERE o.id = ?1
            UNION ALL SELECT a.inspection_id FROM girders g JOIN areas a ON a.id = g.area_id WHERE g.id = ?1
            UNION ALL SELECT a.inspection_id FROM posts p
                JOIN girders g ON g.id = p.girder_id JOIN areas a ON a.id = g.area_id WHERE p.id = ?1
            UNION ALL SELECT inspection_id FROM photos WHERE id = ?1
            UNION ALL SELECT id FROM inspections WHERE id = ?1
            LIMIT 1";
        self.conn
            .query_row(sql, [id], |r| r.get(0))
            .optional()?
            .ok_or_else(|| StoreError::NotFound(id.into()))
    }
}

fn next_position(tx: &Transaction, table: &str, filter: &str, parent: &str) -> Result<i64> {
    let sql = format!("SELECT COALESCE(MAX(position) + 1, 0) FROM {table} WHERE {filter}");
    Ok(tx.query_row(&sql, [parent], |r| r.get(0))?)
}

/// The id and every id below it (runs, members, observations), which photos may hang on.
fn owned_ids(tx: &Transaction, id: &str) -> Result<Vec<String>> {
    let sql = "WITH RECURSIVE below(id) AS (
            SELECT ?1
            UNION SELECT r.id FROM runs r JOIN below b ON r.area_id = b.id
            UNION SELECT m.id FROM members m JOIN below b ON m.area_id = b.id OR m.run_id = b.id
            UNION SELECT o.id FROM observations o JOIN below b ON o.run_id = b.id OR o.member_id = b.id
            UNION SELECT g.id FROM girders g JOIN below b ON g.area_id = b.id
            UNION SELECT p.id FROM posts p JOIN below b ON p.girder_id = b.id
        ) SELECT id FROM below";
    let ids = tx
        .prepare(sql)?
        .query_map([id], |r| r.get(0))?
        .collect::<rusqlite::Result<_>>()?;
    Ok(ids)
}
