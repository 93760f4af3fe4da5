//! Writes `tests/fixtures/store-v1.sqlite`: a store database at schema version 1 (only
//! migrations/0001 applied) holding `tests/fixtures/store-v1-content.json` with every field
//! filled, written with version-1 SQL. Run once when the fixture is made; the upgrade test
//! opens a copy with the current code.
//!
//! cargo run -p undercroft-tests --bin make-store-fixture

use rusqlite::{params, Connection};
use undercroft_engine::interchange::from_json;
use undercroft_engine::model::{Framing, Observation};

fn main() -> Result<(), Box<dyn std::error::Error>> {
    let root = undercroft_tests::repo_root();
    let inspection = from_json(&std::fs::read_to_string(
        root.join("tests/fixtures/store-v1-content.json"),
    )?)?;
    let path = root.join("tests/fixtures/store-v1.sqlite");
    let _ = std::fs::remove_file(&path);
    let conn = Connection::open(&path)?;
    conn.execute_batch(include_str!("../../migrations/0001_first_schema.sql"))?;
    conn.pragma_update(None, "user_version", 1)?;
    let i = &inspection;
    let text = |v: serde_json::Value| v.as_str().unwrap_or_default().to_string();
    conn.execute(
        "INSERT INTO inspections VALUES (?1, ?2, ?3, ?4, ?5, ?6, ?7, ?8, ?9, ?10, ?11, ?12, ?13, ?14, ?15, ?16, ?17, ?18, NULL)",
        params![
            i.id, i.version, i.property.address, i.property.year_built, i.client.name, i.client.email, i.client.phone,
            i.inspector.name, i.inspector.company, i.inspector.license, i.date, i.conditions, i.code_edition,
            i.local_amendments, text(serde_json::to_value(i.units)?), serde_json::to_string(&i.loads)?,
            "2026-11-30T18:00:00.000Z", "2026-11-30T19:30:00.000Z"
        ],
    )?;
    let observation = |owner: (&str, &str), n: usize, o: &Observation| -> rusqlite::Result<usize> {
        let (run, member) = if owner.0 == "run" {
            (Some(owner.1), None)
        } else {
            (None, Some(owner.1))
        };
        conn.execute(
            "INSERT INTO observations VALUES (?1, ?2, ?3, ?4, ?5, ?6, ?7)",
            params![
                o.id.as_ref(),
                run,
                member,
                n as i64,
                o.kind.name(),
                serde_json::to_string(&o.kind).unwrap(),
                o.note
            ],
        )
    };
    let member =
        |area: &str, run: Option<&str>, n: usize, id: &str, label: &str, framing: &Framing| {
            conn.execute(
                "INSERT INTO members VALUES (?1, ?2, ?3, ?4, ?5, ?6)",
                params![
                    id,
                    area,
                    run,
                    n as i64,
                    label,
                    serde_json::to_string(framing).unwrap()
                ],
            )
        };
    for (a, area) in i.areas.iter().enumerate() {
        conn.execute(
            "INSERT INTO areas VALUES (?1, ?2, ?3, ?4, ?5, ?6, ?7)",
            params![
                area.id,
                i.id,
                a as i64,
                area.name,
                text(serde_json::to_value(area.kind)?),
                serde_json::to_string(&area.loads)?,
                area.notes
            ],
        )?;
        for (r, run) in area.runs.iter().enumerate() {
            conn.execute(
                "INSERT INTO runs VALUES (?1, ?2, ?3, ?4, ?5)",
                params![
                    run.id,
                    area.id,
                    r as i64,
                    run.label,
                    serde_json::to_string(&run.framing)?
                ],
            )?;
            for (n, o) in run.observations.iter().enumerate() {
                observation(("run", &run.id), n, o)?;
            }
            for (j, joist) in run.joists.iter().enumerate() {
                member(
                    &area.id,
                    Some(&run.id),
                    j,
                    &joist.id,
                    &joist.label,
                    &joist.framing,
                )?;
                for (n, o) in joist.observations.iter().enumerate() {
                    observation(("member", &joist.id), n, o)?;
                }
            }
        }
        for (m, single) in area.members.iter().enumerate() {
            member(
                &area.id,
                None,
                m,
                &single.id,
                &single.label,
                &single.framing,
            )?;
            for (n, o) in single.observations.iter().enumerate() {
                observation(("member", &single.id), n, o)?;
            }
        }
    }
    for (n, p) in i.photos.iter().enumerate() {
        let hash = p
            .file
            .trim_start_matches("photos/")
            .trim_end_matches(".jpg");
        conn.execute(
            "INSERT INTO photos VALUES (?1, ?2, ?3, ?4, ?5, ?6, ?7, ?8, ?9, ?10, ?11)",
            params![
                p.id,
                i.id,
                p.attached_to,
                n as i64,
                p.caption,
                p.file,
                hash,
                1600,
                1200,
                "jpg",
                "2026-11-30T18:30:00.000Z"
            ],
        )?;
    }
    conn.execute_batch("VACUUM")?;
    println!("wrote {}", path.display());
    Ok(())
}
