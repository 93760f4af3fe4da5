//! The office database's numbered migrations (`server/migrations/`), applied in order in one
//! transaction under an advisory lock, so two servers starting together take turns. A
//! database whose schema is newer than this server, or that holds another program's tables,
//! is refused untouched.

use thiserror::Error;
use tokio_postgres::Client;

const MIGRATIONS: &[(i32, &str, &str)] = &[(
    1,
    "office schema",
    include_str!("../migrations/0001_office_schema.sql"),
)];

/// The schema version this server knows.
pub const SCHEMA_VERSION: i32 = MIGRATIONS.len() as i32;

/// Any number, the same in every server: the key of the advisory lock migrations hold.
const LOCK_KEY: i64 = 0x5544_4e43_0001;

#[derive(Debug, Error)]
pub enum MigrateError {
    #[error("the office database is schema version {found}, newer than this server (version {known}); update the server. Nothing was changed")]
    TooNew { found: i32, known: i32 },
    #[error("the database holds tables of another program ({0}) and no Undercroft schema; point the server at an empty database of its own. Nothing was changed")]
    NotOurs(String),
    #[error(transparent)]
    Db(#[from] tokio_postgres::Error),
}

/// Brings the database to this server's schema; returns the version it was at.
pub async fn migrate(client: &mut Client) -> Result<i32, MigrateError> {
    let tx = client.transaction().await?;
    tx.execute("SELECT pg_advisory_xact_lock($1)", &[&LOCK_KEY])
        .await?;
    let ours = tx
        .query_one(
            "SELECT to_regclass('public.undercroft_schema') IS NOT NULL",
            &[],
        )
        .await?
        .get::<_, bool>(0);
    if !ours {
        let others: Vec<String> = tx
            .query(
                "SELECT table_name::text FROM information_schema.tables WHERE table_schema = 'public' ORDER BY 1 LIMIT 5",
                &[],
            )
            .await?
            .iter()
            .map(|r| r.get(0))
            .collect();
        if !others.is_empty() {
            return Err(MigrateError::NotOurs(others.join(", ")));
        }
        tx.batch_execute(
            "CREATE TABLE undercroft_schema (
                version     INT PRIMARY KEY,
                name        TEXT NOT NULL,
                applied_at  TIMESTAMPTZ NOT NULL DEFAULT now())",
        )
        .await?;
    }
    let found: i32 = tx
        .query_one(
            "SELECT COALESCE(MAX(version), 0) FROM undercroft_schema",
            &[],
        )
        .await?
        .get(0);
    if found > SCHEMA_VERSION {
        return Err(MigrateError::TooNew {
            found,
            known: SCHEMA_VERSION,
        });
    }
    for (version, name, sql) in MIGRATIONS.iter().filter(|m| m.0 > found) {
        tx.batch_execute(sql).await?;
        tx.execute(
            "INSERT INTO undercroft_schema (version, name) VALUES ($1, $2)",
            &[version, name],
        )
        .await?;
    }
    tx.commit().await?;
    Ok(found)
}
