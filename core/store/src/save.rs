//! Writing model values into rows (inside a caller's transaction): the header, and whole
//! areas, runs, members and observations with their positions.

use super::migrate::search_key;
use super::Result;
use rusqlite::{params, Transaction};
use undercroft_engine::model::{
    Area, Framing, GirderLine, Inspection, JoistRun, Observation, PhotoRef, Post,
};

/// Where an observation hangs: a run's typical joist, or a member (joist or single member).
#[derive(Debug, Clone, Copy)]
pub enum Owner<'a> {
    Run(&'a str),
    Member(&'a str),
}

/// The header columns, in the order both statements below name them.
const HEADER_COLUMNS: &str =
    "format_version, address, year_built, client_name, client_email, client_phone,
    inspector_name, inspector_company, inspector_license, visit_date, conditions, code_edition,
    local_amendments, units, loads, search_key";

/// Values of `HEADER_COLUMNS` for an inspection.
fn header_values(i: &Inspection) -> Result<Vec<rusqlite::types::Value>> {
    use rusqlite::types::Value::{Integer, Null, Text};
    Ok(vec![
        Integer(i.version.into()),
        Text(i.property.address.clone()),
        i.property.year_built.map_or(Null, |y| Integer(y.into())),
        Text(i.client.name.clone()),
        Text(i.client.email.clone()),
        Text(i.client.phone.clone()),
        Text(i.inspector.name.clone()),
        Text(i.inspector.company.clone()),
        Text(i.inspector.license.clone()),
        Text(i.date.clone()),
        Text(i.conditions.clone()),
        Text(i.code_edition.clone()),
        Text(i.local_amendments.clone()),
        Text(text_of(&i.units)?),
        Text(serde_json::to_string(&i.loads)?),
        Text(search_key(&i.property.address, &i.client.name)),
    ])
}

pub fn insert_header(
    tx: &Transaction,
    i: &Inspection,
    created_at: &str,
    updated_at: &str,
) -> Result<()> {
    let mut values = header_values(i)?;
    let placeholders: Vec<String> = (1..=values.len() + 3).map(|n| format!("?{n}")).collect();
    values.extend([
        i.id.clone().into(),
        created_at.to_string().into(),
        updated_at.to_string().into(),
    ]);
    let sql = format!(
        "INSERT INTO inspections ({HEADER_COLUMNS}, id, created_at, updated_at) VALUES ({})",
        placeholders.join(", ")
    );
    tx.execute(&sql, rusqlite::params_from_iter(values))?;
    Ok(())
}

/// Rewrites the header fields (everything but areas and photos).
pub fn update_header(tx: &Transaction, i: &Inspection, updated_at: &str) -> Result<usize> {
    let mut values = header_values(i)?;
    let sets: Vec<String> = HEADER_COLUMNS
        .split(',')
        .enumerate()
        .map(|(n, c)| format!("{} = ?{}", c.trim(), n + 1))
        .collect();
    let sql = format!(
        "UPDATE inspections SET {}, updated_at = ?{} WHERE id = ?{}",
        sets.join(", "),
        values.len() + 1,
        values.len() + 2
    );
    values.extend([updated_at.to_string().into(), i.id.clone().into()]);
    Ok(tx.execute(&sql, rusqlite::params_from_iter(values))?)
}

pub fn insert_area(
    tx: &Transaction,
    inspection_id: &str,
    position: i64,
    area: &Area,
) -> Result<()> {
    tx.execute(
        "INSERT INTO areas (id, inspection_id, position, name, kind, loads, notes, conditions) VALUES (?1, ?2, ?3, ?4, ?5, ?6, ?7, ?8)",
        params![
            area.id,
            inspection_id,
            position,
            area.name,
            text_of(&area.kind)?,
            serde_json::to_string(&area.loads)?,
            area.notes,
            serde_json::to_string(&area.conditions)?
        ],
    )?;
    for (n, girder) in area.girders.iter().enumerate() {
        insert_girder(tx, &area.id, n as i64, girder)?;
    }
    for (n, run) in area.runs.iter().enumerate() {
        insert_run(tx, &area.id, n as i64, run)?;
    }
    for (n, member) in area.members.iter().enumerate() {
        insert_member(
            tx,
            &area.id,
            None,
            n as i64,
            &member.id,
            &member.label,
            &member.framing,
            &member.observations,
        )?;
    }
    Ok(())
}

pub fn insert_run(tx: &Transaction, area_id: &str, position: i64, run: &JoistRun) -> Result<()> {
    tx.execute(
        "INSERT INTO runs (id, area_id, position, label, framing, bears_on) VALUES (?1, ?2, ?3, ?4, ?5, ?6)",
        params![
            run.id,
            area_id,
            position,
            run.label,
            serde_json::to_string(&run.framing)?,
            serde_json::to_string(&run.bears_on)?
        ],
    )?;
    for (n, o) in run.observations.iter().enumerate() {
        insert_observation(tx, Owner::Run(&run.id), n as i64, o)?;
    }
    for (n, joist) in run.joists.iter().enumerate() {
        insert_joist(tx, area_id, &run.id, n as i64, joist)?;
    }
    Ok(())
}

/// The girder's own fields as stored in its `data` column: everything but its id, label and
/// posts, which have columns and rows of their own.
pub fn girder_data(girder: &GirderLine) -> Result<String> {
    let mut value = serde_json::to_value(girder)?;
    if let Some(map) = value.as_object_mut() {
        for key in ["id", "label", "posts"] {
            map.remove(key);
        }
    }
    Ok(value.to_string())
}

/// A post's own fields as stored in its `data` column.
pub fn post_data(post: &Post) -> Result<String> {
    let mut value = serde_json::to_value(post)?;
    if let Some(map) = value.as_object_mut() {
        for key in ["id", "label"] {
            map.remove(key);
        }
    }
    Ok(value.to_string())
}

pub fn insert_girder(
    tx: &Transaction,
    area_id: &str,
    position: i64,
    girder: &GirderLine,
) -> Result<()> {
    tx.execute(
        "INSERT INTO girders (id, area_id, position, label, data) VALUES (?1, ?2, ?3, ?4, ?5)",
        params![
            girder.id,
            area_id,
            position,
            girder.label,
            girder_data(girder)?
        ],
    )?;
    for (n, post) in girder.posts.iter().enumerate() {
        insert_post(tx, &girder.id, n as i64, post)?;
    }
    Ok(())
}

pub fn insert_post(tx: &Transaction, girder_id: &str, position: i64, post: &Post) -> Result<()> {
    tx.execute(
        "INSERT INTO posts (id, girder_id, position, label, data) VALUES (?1, ?2, ?3, ?4, ?5)",
        params![post.id, girder_id, position, post.label, post_data(post)?],
    )?;
    Ok(())
}

#[allow(clippy::too_many_arguments)]
pub fn insert_member(
    tx: &Transaction,
    area_id: &str,
    run_id: Option<&str>,
    position: i64,
    id: &str,
    label: &str,
    framing: &Framing,
    observations: &[Observation],
) -> Result<()> {
    tx.execute(
        "INSERT INTO members (id, area_id, run_id, position, label, framing) VALUES (?1, ?2, ?3, ?4, ?5, ?6)",
        params![id, area_id, run_id, position, label, serde_json::to_string(framing)?],
    )?;
    for (n, o) in observations.iter().enumerate() {
        insert_observation(tx, Owner::Member(id), n as i64, o)?;
    }
    Ok(())
}

/// A joist of a run: a member row with the run's id and the joist's place along the run.
pub fn insert_joist(
    tx: &Transaction,
    area_id: &str,
    run_id: &str,
    position: i64,
    joist: &undercroft_engine::model::Joist,
) -> Result<()> {
    insert_member(
        tx,
        area_id,
        Some(run_id),
        position,
        &joist.id,
        &joist.label,
        &joist.framing,
        &joist.observations,
    )?;
    if let Some(at) = joist.at {
        tx.execute(
            "UPDATE members SET at_inches = ?2 WHERE id = ?1",
            params![joist.id, at.in_inches()],
        )?;
    }
    Ok(())
}

pub fn insert_observation(
    tx: &Transaction,
    owner: Owner,
    position: i64,
    o: &Observation,
) -> Result<()> {
    let (run_id, member_id) = match owner {
        Owner::Run(id) => (Some(id), None),
        Owner::Member(id) => (None, Some(id)),
    };
    tx.execute(
        "INSERT INTO observations (id, run_id, member_id, position, kind, data, note) VALUES (?1, ?2, ?3, ?4, ?5, ?6, ?7)",
        params![o.id.as_ref(), run_id, member_id, position, o.kind.name(), serde_json::to_string(&o.kind)?, o.note],
    )?;
    Ok(())
}

/// A photo reference from an interchange file (its image files may come later, or never).
pub fn insert_photo_ref(
    tx: &Transaction,
    inspection_id: &str,
    position: i64,
    p: &PhotoRef,
    created_at: &str,
) -> Result<()> {
    let hash = p
        .file
        .rsplit('/')
        .next()
        .and_then(|name| name.split('.').next())
        .filter(|h| super::files::is_hash(h));
    if let Some(why) = undercroft_engine::model::marks_problem(&p.marks) {
        return Err(super::StoreError::Invalid(format!("photo {}: {why}", p.id)));
    }
    tx.execute(
        "INSERT INTO photos (id, inspection_id, attached_to, position, caption, file, content_hash, created_at, marks)
         VALUES (?1, ?2, ?3, ?4, ?5, ?6, ?7, ?8, ?9)",
        params![p.id, inspection_id, p.attached_to, position, p.caption, p.file, hash, created_at, serde_json::to_string(&p.marks)?],
    )?;
    Ok(())
}

/// The kebab-case text serde gives a unit enum.
pub fn text_of<T: serde::Serialize>(value: &T) -> Result<String> {
    Ok(serde_json::to_value(value)?
        .as_str()
        .unwrap_or_default()
        .to_string())
}
