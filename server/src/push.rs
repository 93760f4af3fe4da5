//! What devices send: which files the office lacks, each file (checked against its hash and
//! by the same import as a photo taken in the app), and revisions of inspections, each
//! stored whole in one transaction or not at all.

use crate::auth::Caller;
use crate::error::ApiError;
use crate::Office;
use axum::body::Body;
use axum::extract::{Path, State};
use axum::Json;
use serde::Deserialize;
use std::sync::Arc;
use undercroft_engine::{Finding, Inspection};
use undercroft_sync::{check_blob, BlobError, BlobKind, PushAnswer, PushOutcome, PushRequest};

/// Most hashes one "which are missing" question may ask about.
const MOST_HASHES: usize = 20_000;

#[derive(Deserialize)]
pub struct HashList {
    hashes: Vec<String>,
}

pub async fn missing(
    State(office): State<Arc<Office>>,
    _caller: Caller,
    Json(list): Json<HashList>,
) -> Result<Json<serde_json::Value>, ApiError> {
    if list.hashes.len() > MOST_HASHES {
        return Err(ApiError::TooLarge(format!(
            "ask about at most {MOST_HASHES} files at a time"
        )));
    }
    if let Some(bad) = list.hashes.iter().find(|h| !undercroft_store::is_hash(h)) {
        return Err(ApiError::BadRequest(format!(
            "\"{}\" is not a SHA-256",
            bad.chars().take(80).collect::<String>()
        )));
    }
    let client = office.pool.get().await?;
    let known: Vec<String> = client
        .query(
            "SELECT sha256 FROM blobs WHERE sha256 = ANY($1)",
            &[&list.hashes],
        )
        .await?
        .iter()
        .map(|r| r.get(0))
        .collect();
    let known: std::collections::HashSet<&str> = known.iter().map(String::as_str).collect();
    let mut seen = std::collections::HashSet::new();
    let missing: Vec<&String> = list
        .hashes
        .iter()
        .filter(|h| !known.contains(h.as_str()) && seen.insert(h.as_str()))
        .collect();
    Ok(Json(serde_json::json!({ "missing": missing })))
}

/// Takes one file under its hash. A file the office holds already is answered at once.
pub async fn put_blob(
    State(office): State<Arc<Office>>,
    _caller: Caller,
    Path((kind, sha256)): Path<(String, String)>,
    body: Body,
) -> Result<Json<serde_json::Value>, ApiError> {
    let kind = BlobKind::from_key(&kind)
        .ok_or_else(|| ApiError::NotFound(format!("no kind of file called \"{kind}\"")))?;
    if !undercroft_store::is_hash(&sha256) {
        return Err(ApiError::BadRequest(
            BlobError::NotAHash(sha256).to_string(),
        ));
    }
    if office.known_blob(&sha256).await?.is_some() {
        return Ok(Json(
            serde_json::json!({ "stored": false, "sha256": sha256 }),
        ));
    }
    // Files are read and checked a few at a time, so many devices at once cannot take all
    // the memory.
    let _permit = office
        .uploads
        .acquire()
        .await
        .map_err(|e| ApiError::Internal(e.to_string()))?;
    let bytes = axum::body::to_bytes(body, kind.limit() as usize)
        .await
        .map_err(|_| {
            ApiError::TooLarge(format!(
                "the file is over the limit of {} bytes, or was cut off",
                kind.limit()
            ))
        })?;
    let (files, name) = (office.files.clone(), sha256.clone());
    let size = tokio::task::spawn_blocking(move || -> Result<u64, ApiError> {
        let size =
            check_blob(kind, &name, &bytes).map_err(|e| ApiError::Unprocessable(e.to_string()))?;
        files.put(&name, &bytes)?;
        Ok(size)
    })
    .await
    .map_err(|e| ApiError::Internal(e.to_string()))??;
    let client = office.pool.get().await?;
    client
        .execute(
            "INSERT INTO blobs (sha256, kind, bytes) VALUES ($1, $2, $3) ON CONFLICT (sha256) DO NOTHING",
            &[&sha256, &kind.key(), &(size as i64)],
        )
        .await?;
    Ok(Json(
        serde_json::json!({ "stored": true, "sha256": sha256 }),
    ))
}

impl Office {
    /// The kind of a file the office holds (its row and its bytes both), if it does.
    pub async fn known_blob(&self, sha256: &str) -> Result<Option<BlobKind>, ApiError> {
        let client = self.pool.get().await?;
        let row = client
            .query_opt("SELECT kind FROM blobs WHERE sha256 = $1", &[&sha256])
            .await?;
        Ok(row
            .and_then(|r| BlobKind::from_key(r.get::<_, &str>(0)))
            .filter(|_| self.files.has(sha256)))
    }
}

/// One finding as the office keeps it for search.
struct FindingRow {
    status: String,
    status_label: String,
    basis: String,
    title: String,
    place: String,
    summary: String,
    citation: String,
}

fn finding_rows(inspection: &Inspection) -> Vec<FindingRow> {
    let evaluation = undercroft_engine::evaluate(inspection);
    evaluation
        .by_attention()
        .into_iter()
        .map(|f: &Finding| FindingRow {
            status: serde_json::to_value(f.status)
                .ok()
                .and_then(|v| v.as_str().map(String::from))
                .unwrap_or_default(),
            status_label: f.status_label().into(),
            basis: f.basis.name().into(),
            title: f.title().into(),
            place: f.place.location.to_string(),
            summary: f.summary(),
            citation: f.citation(),
        })
        .collect()
}

/// Takes a revision of an inspection whose files the office holds.
pub async fn push_revision(
    State(office): State<Arc<Office>>,
    caller: Caller,
    Path(inspection_id): Path<String>,
    Json(request): Json<PushRequest>,
) -> Result<Json<PushAnswer>, ApiError> {
    let manifest = request.manifest.clone();
    let (inspection, rows, content) = tokio::task::spawn_blocking(move || {
        let inspection = manifest
            .check()
            .map_err(|e| ApiError::Unprocessable(e.to_string()))?;
        let rows = finding_rows(&inspection);
        Ok::<_, ApiError>((inspection, rows, manifest.content_sha256()))
    })
    .await
    .map_err(|e| ApiError::Internal(e.to_string()))??;
    if inspection.id != inspection_id {
        return Err(ApiError::Unprocessable(format!(
            "the revision is of inspection {}, not {inspection_id}",
            inspection.id
        )));
    }
    if request.device.trim().is_empty() || request.device.len() > 200 {
        return Err(ApiError::Unprocessable(
            "the device's id is 1 to 200 characters".into(),
        ));
    }
    if let Some(based_on) = &request.based_on {
        if !undercroft_store::is_hash(based_on) {
            return Err(ApiError::Unprocessable("based_on is not a SHA-256".into()));
        }
    }
    let answer = office
        .store_revision(&caller, &inspection, &request, &rows, &content)
        .await?;
    Ok(Json(answer))
}

impl Office {
    async fn store_revision(
        &self,
        caller: &Caller,
        inspection: &Inspection,
        request: &PushRequest,
        rows: &[FindingRow],
        content: &str,
    ) -> Result<PushAnswer, ApiError> {
        let mut client = self.pool.get().await?;
        let tx = client.transaction().await?;
        tx.execute(
            "INSERT INTO inspections (id, owner_id) VALUES ($1, $2) ON CONFLICT (id) DO NOTHING",
            &[&inspection.id, &caller.person_id],
        )
        .await?;
        let row = tx
            .query_one(
                "SELECT i.owner_id, i.latest_revision, r.content_sha256 FROM inspections i
                 LEFT JOIN revisions r ON r.id = i.latest_revision WHERE i.id = $1 FOR UPDATE OF i",
                &[&inspection.id],
            )
            .await?;
        let owner: i64 = row.get(0);
        if owner != caller.person_id {
            return Err(ApiError::Forbidden(format!(
                "inspection {} belongs to another inspector; a device pushes only its inspector's own",
                inspection.id
            )));
        }
        let latest: Option<i64> = row.get(1);
        let latest_content: Option<String> = row.get(2);
        if let Some(same) = tx
            .query_opt(
                "SELECT id FROM revisions WHERE inspection_id = $1 AND content_sha256 = $2",
                &[&inspection.id, &content],
            )
            .await?
        {
            return Ok(PushAnswer {
                revision: same.get(0),
                content_sha256: content.into(),
                outcome: PushOutcome::AlreadyThere,
                conflict_with: None,
            });
        }
        let manifest = &request.manifest;
        let wanted = undercroft_sync::client::kinds_of(manifest);
        let hashes: Vec<String> = wanted.keys().map(|h| h.to_string()).collect();
        let held: Vec<(String, String)> = tx
            .query(
                "SELECT sha256, kind FROM blobs WHERE sha256 = ANY($1)",
                &[&hashes],
            )
            .await?
            .iter()
            .map(|r| (r.get(0), r.get(1)))
            .collect();
        let held: std::collections::HashMap<String, String> = held.into_iter().collect();
        let missing: Vec<String> = hashes
            .iter()
            .filter(|h| !held.contains_key(*h) || !self.files.has(h))
            .cloned()
            .collect();
        if !missing.is_empty() {
            return Err(ApiError::MissingFiles {
                message: format!(
                    "{} of the files this revision names are not at the office; send them first",
                    missing.len()
                ),
                missing,
            });
        }
        if let Some((sha, kind)) = wanted.iter().find(|(sha, kind)| held[**sha] != kind.key()) {
            return Err(ApiError::Unprocessable(format!(
                "{sha} is named as a {} but the office holds it as a {}",
                kind.key(),
                held[*sha]
            )));
        }
        let conflict_with = match (&latest_content, &request.based_on) {
            (Some(current), Some(base)) if current == base => None,
            (Some(_), _) => latest,
            (None, _) => None,
        };
        let manifest_json =
            serde_json::to_value(manifest).map_err(|e| ApiError::Internal(e.to_string()))?;
        let revision: i64 = tx
            .query_one(
                "INSERT INTO revisions (inspection_id, content_sha256, based_on, device, pushed_by, conflict_with,
                    address, client, inspected_on, inspector_name, code_edition, manifest)
                 VALUES ($1, $2, $3, $4, $5, $6, $7, $8, NULLIF($9, '')::date, $10, $11, $12) RETURNING id",
                &[
                    &inspection.id,
                    &content,
                    &request.based_on,
                    &request.device,
                    &caller.person_id,
                    &conflict_with,
                    &inspection.property.address,
                    &inspection.client.name,
                    &inspection.date,
                    &inspection.inspector.name,
                    &inspection.code_edition,
                    &manifest_json,
                ],
            )
            .await?
            .get(0);
        tx.execute(
            "INSERT INTO revision_files (revision_id, sha256) SELECT $1, unnest($2::text[])",
            &[&revision, &hashes],
        )
        .await?;
        let insert = tx
            .prepare(
                "INSERT INTO findings (revision_id, position, status, status_label, basis, title, place, summary, citation)
                 VALUES ($1, $2, $3, $4, $5, $6, $7, $8, $9)",
            )
            .await?;
        for (n, f) in rows.iter().enumerate() {
            tx.execute(
                &insert,
                &[
                    &revision,
                    &(n as i32),
                    &f.status,
                    &f.status_label,
                    &f.basis,
                    &f.title,
                    &f.place,
                    &f.summary,
                    &f.citation,
                ],
            )
            .await?;
        }
        for report in &manifest.reports {
            let pdf = report.pdf_sent.then_some(&report.sha256);
            tx.execute(
                "INSERT INTO deliveries (inspection_id, report_id, delivered_at, file_name, recipient, sha256, bytes, pdf, first_revision)
                 VALUES ($1, $2, $3::text::timestamptz, $4, $5, $6, $7, $8, $9)
                 ON CONFLICT (inspection_id, report_id) DO UPDATE SET pdf = COALESCE(deliveries.pdf, EXCLUDED.pdf)",
                &[&inspection.id, &report.id, &report.delivered_at, &report.file_name, &report.recipient, &report.sha256, &(report.bytes as i64), &pdf, &revision],
            )
            .await?;
        }
        tx.execute(
            "UPDATE inspections SET latest_revision = $2 WHERE id = $1",
            &[&inspection.id, &revision],
        )
        .await?;
        tx.commit().await?;
        Ok(PushAnswer {
            revision,
            content_sha256: content.into(),
            outcome: if conflict_with.is_some() {
                PushOutcome::Conflict
            } else {
                PushOutcome::New
            },
            conflict_with,
        })
    }
}
