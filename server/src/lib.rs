//! Undercroft's office server: the firm's archive of every inspection its inspectors' devices
//! push, with every revision kept, each photo and report stored once under its SHA-256, the
//! firm's settings for every device, and a plain office page to find any report years later.
//! Backed by PostgreSQL.

pub mod api;
pub mod archive;
pub mod auth;
pub mod error;
pub mod files;
pub mod migrate;
pub mod page;
pub mod people;
pub mod pg_cluster;
pub mod push;
mod random;
pub mod synthetic;

use auth::Caller;
use axum::extract::{DefaultBodyLimit, FromRequestParts};
use axum::http::request::Parts;
use axum::routing::{get, post, put};
use axum::Router;
use error::ApiError;
use std::path::Path;
use std::str::FromStr;
use std::sync::Arc;
use std::time::Duration;

/// The server's state: the database pool, the file folder, and what it remembers of tokens.
pub struct Office {
    pub pool: deadpool_postgres::Pool,
    pub files: files::FileStore,
    checked: auth::CheckedSecrets,
    uploads: tokio::sync::Semaphore,
}

/// Most bytes of a revision's JSON (the inspection, notes and file lists).
pub const MAX_REVISION_BYTES: usize = 32 * 1024 * 1024;

impl Office {
    /// Connects to the database (TLS where the URL asks for it), brings its schema up to
    /// date, and opens the file folder.
    pub async fn open(database_url: &str, files_dir: &Path) -> anyhow::Result<Arc<Office>> {
        let config = tokio_postgres::Config::from_str(database_url).map_err(|e| {
            anyhow::anyhow!("the database address is not one PostgreSQL reads: {e}")
        })?;
        let tls = postgres_native_tls::MakeTlsConnector::new(native_tls::TlsConnector::new()?);
        let manager = deadpool_postgres::Manager::from_config(
            config,
            tls,
            deadpool_postgres::ManagerConfig {
                recycling_method: deadpool_postgres::RecyclingMethod::Fast,
            },
        );
        let pool = deadpool_postgres::Pool::builder(manager)
            .max_size(16)
            .runtime(deadpool_postgres::Runtime::Tokio1)
            .wait_timeout(Some(Duration::from_secs(20)))
            .create_timeout(Some(Duration::from_secs(5)))
            .recycle_timeout(Some(Duration::from_secs(5)))
            .build()?;
        let mut client = pool
            .get()
            .await
            .map_err(|e| anyhow::anyhow!("the office database cannot be reached: {e}"))?;
        migrate::migrate(&mut client).await?;
        drop(client);
        let parallel = std::thread::available_parallelism().map_or(2, |n| n.get());
        Ok(Arc::new(Office {
            pool,
            files: files::FileStore::open(files_dir)?,
            checked: auth::CheckedSecrets::default(),
            uploads: tokio::sync::Semaphore::new(2 * parallel),
        }))
    }
}

/// Every route: the JSON API under `/api/v1`, the office page under `/office`.
pub fn router(office: Arc<Office>) -> Router {
    let largest_file =
        undercroft_sync::blob::MAX_IMAGE_BYTES.max(undercroft_sync::blob::MAX_PDF_BYTES) as usize;
    let api = Router::new()
        .route("/blobs/missing", post(push::missing))
        .route(
            "/blobs/{kind}/{sha256}",
            put(push::put_blob).layer(DefaultBodyLimit::max(largest_file)),
        )
        .route("/inspections", get(api::list))
        .route("/inspections/{id}", get(api::inspection))
        .route("/inspections/{id}/revisions", post(push::push_revision))
        .route(
            "/inspections/{id}/reports/{report_id}",
            get(api::report_pdf),
        )
        .route("/settings", get(api::get_settings).put(api::put_settings))
        .route("/tokens", get(api::list_tokens).post(api::issue_token))
        .route("/tokens/{id}/revoke", post(api::revoke_token))
        .layer(DefaultBodyLimit::max(MAX_REVISION_BYTES));
    Router::new()
        .nest("/api/v1", api)
        .merge(page::routes())
        .route("/health", get(|| async { "ok" }))
        .with_state(office)
}

/// The token of a request: `Authorization: Bearer ...`, or the office page's cookie.
fn token_of(parts: &Parts) -> Option<String> {
    if let Some(value) = parts.headers.get(axum::http::header::AUTHORIZATION) {
        return value
            .to_str()
            .ok()
            .and_then(|v| v.strip_prefix("Bearer "))
            .map(String::from);
    }
    page::cookie_token(&parts.headers)
}

impl FromRequestParts<Arc<Office>> for Caller {
    type Rejection = ApiError;

    async fn from_request_parts(
        parts: &mut Parts,
        office: &Arc<Office>,
    ) -> Result<Self, Self::Rejection> {
        let token = token_of(parts).ok_or(ApiError::SignedOut)?;
        office.caller_of(&token).await
    }
}

/// Serves until the process is stopped (Ctrl-C or SIGTERM), finishing requests in flight.
pub async fn serve(listener: tokio::net::TcpListener, office: Arc<Office>) -> std::io::Result<()> {
    axum::serve(listener, router(office))
        .with_graceful_shutdown(async {
            let ctrl_c = tokio::signal::ctrl_c();
            let mut term =
                tokio::signal::unix::signal(tokio::signal::unix::SignalKind::terminate())
                    .expect("a SIGTERM handler");
            tokio::select! {
                _ = ctrl_c => {},
                _ = term.recv() => {},
            }
        })
        .await
}
