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
];

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

/// Applies every pending migration in one transaction.
pub fn run(conn: &mut Connection) -> Result<()> {
    let tx = conn.transaction()?;
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
