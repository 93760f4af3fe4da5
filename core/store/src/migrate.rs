//! The `user_version` migration runner: numbered SQL files from `migrations/`, all pending
//! ones in one transaction; a database newer than the code is refused untouched.

use super::{Result, StoreError};
use rusqlite::{Connection, Transaction};

/// A migration: its SQL, and an optional step in Rust run after it in the same transaction.
struct Migration {
    sql: &'static str,
    after: Option<fn(&Transaction) -> Result<()>>,
}

const MIGRATIONS: &[Migration] = &[
    Migration {
        sql: include_str!("../../../migrations/0001_first_schema.sql"),
        after: None,
    },
    Migration {
        sql: include_str!("../../../migrations/0002_notes_reports_search.sql"),
        after: Some(fill_search_keys),
    },
    Migration {
        sql: include_str!("../../../migrations/0003_application_id.sql"),
        after: None,
    },
    Migration {
        sql: include_str!("../../../migrations/0004_load_path.sql"),
        after: None,
    },
    Migration {
        sql: include_str!("../../../migrations/0005_finding_priority.sql"),
        after: None,
    },
    Migration {
        sql: include_str!("../../../migrations/0006_joist_position.sql"),
        after: None,
    },
    Migration {
        sql: include_str!("../../../migrations/0007_recipient_and_marks.sql"),
        after: None,
    },
    Migration {
        sql: include_str!("../../../migrations/0008_office_sync.sql"),
        after: None,
    },
];

/// The `application_id` a store of ours carries from version 3 ("UNDC").
pub const APPLICATION_ID: i64 = 1_431_192_643;

/// Refuses a database that is not a store of ours: one with tables but no schema version
/// (another program's), one with another program's application id, or one whose version
/// says it is ours but has no inspections table. Reads only, from one snapshot: a store that
/// another process is creating at this moment is seen before or after, never half made (its
/// tables without its version).
pub fn check_ours(conn: &Connection) -> std::result::Result<(), String> {
    let snapshot = conn.unchecked_transaction().map_err(|e| e.to_string())?;
    let conn = &*snapshot;
    let version: i64 = conn
        .query_row("PRAGMA user_version", [], |r| r.get(0))
        .map_err(|e| e.to_string())?;
    let app_id: i64 = conn
        .query_row("PRAGMA application_id", [], |r| r.get(0))
        .map_err(|e| e.to_string())?;
    let tables: Vec<String> = conn
        .prepare("SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%' ORDER BY name")
        .and_then(|mut s| s.query_map([], |r| r.get(0))?.collect())
        .map_err(|e| e.to_string())?;
    let named = || {
        let mut shown: Vec<&str> = tables.iter().take(5).map(String::as_str).collect();
        if tables.len() > 5 {
            shown.push("...");
        }
        shown.join(", ")
    };
    if app_id != 0 && app_id != APPLICATION_ID {
        return Err(format!(
            "it is another program's database (application id {app_id})"
        ));
    }
    if version == 0 && !tables.is_empty() {
        return Err(format!(
            "it is another program's database (tables {})",
            named()
        ));
    }
    if version > 0 && !tables.iter().any(|t| t == "inspections") {
        return Err(format!("it has no inspections table (tables {})", named()));
    }
    Ok(())
}

/// The schema version this code writes.
pub const SCHEMA_VERSION: i64 = MIGRATIONS.len() as i64;

/// Refuses a database newer than the code, before anything is written to it.
pub fn check_version(conn: &Connection) -> Result<()> {
    let found: i64 = conn.query_row("PRAGMA user_version", [], |r| r.get(0))?;
    if found > SCHEMA_VERSION {
        return Err(StoreError::TooNew {
            found,
            known: SCHEMA_VERSION,
        });
    }
    Ok(())
}

/// Applies every pending migration in one transaction, begun as a writer (so that two
/// processes opening a new store take turns), and re-reads the version inside it.
pub fn run(conn: &mut Connection) -> Result<()> {
    let pending: i64 = conn.query_row("PRAGMA user_version", [], |r| r.get(0))?;
    if pending >= SCHEMA_VERSION {
        return check_version(conn);
    }
    let tx = conn.transaction_with_behavior(rusqlite::TransactionBehavior::Immediate)?;
    let found: i64 = tx.query_row("PRAGMA user_version", [], |r| r.get(0))?;
    if found > SCHEMA_VERSION {
        return Err(StoreError::TooNew {
            found,
            known: SCHEMA_VERSION,
        });
    }
    for (index, migration) in MIGRATIONS.iter().enumerate().skip(found as usize) {
        tx.execute_batch(migration.sql)?;
        if let Some(after) = migration.after {
            after(&tx)?;
        }
        tx.pragma_update(None, "user_version", index as i64 + 1)?;
    }
    tx.commit()?;
    Ok(())
}

/// Fills `inspections.search_key` with Unicode lower case (SQLite's lower() is ASCII only).
fn fill_search_keys(tx: &Transaction) -> Result<()> {
    let rows: Vec<(String, String, String)> = tx
        .prepare("SELECT id, address, client_name FROM inspections")?
        .query_map([], |r| Ok((r.get(0)?, r.get(1)?, r.get(2)?)))?
        .collect::<rusqlite::Result<_>>()?;
    for (id, address, client) in rows {
        tx.execute(
            "UPDATE inspections SET search_key = ?1 WHERE id = ?2",
            (search_key(&address, &client), id),
        )?;
    }
    Ok(())
}

/// What the inspection list searches: address and client, lower-cased.
pub fn search_key(address: &str, client: &str) -> String {
    format!("{address} {client}").to_lowercase()
}
