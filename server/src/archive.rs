//! Reading the archive: inspections found by address, client, date, inspector or the words
//! of a finding; one inspection with its revisions, findings and deliveries; a delivered
//! PDF. An inspector reads only their own; office staff read all.

use crate::auth::{Caller, Role};
use crate::error::ApiError;
use crate::Office;
use serde::{Deserialize, Serialize};

/// What to look for; empty fields match everything.
#[derive(Debug, Clone, Default, Deserialize, Serialize)]
#[serde(default)]
pub struct Search {
    pub address: String,
    pub client: String,
    pub inspector: String,
    /// `YYYY-MM-DD`, inclusive.
    pub from: String,
    pub to: String,
    /// Words of a finding, e.g. "decay at a bearing".
    pub finding: String,
}

/// One inspection in a list: its latest revision.
#[derive(Debug, Clone, Serialize)]
pub struct Listed {
    pub id: String,
    pub address: String,
    pub client: String,
    pub inspected_on: Option<String>,
    pub inspector: String,
    pub revisions: i64,
    pub conflicts: i64,
    pub latest_pushed_at: String,
    /// Findings over or near a limit, to be evaluated, or not fully checked.
    pub open_findings: i64,
    /// Findings matching the words looked for, as "title: place".
    pub matching: Vec<String>,
}

/// A finding of a revision.
#[derive(Debug, Clone, Serialize)]
pub struct FindingLine {
    pub status: String,
    pub status_label: String,
    pub basis: String,
    pub title: String,
    pub place: String,
    pub summary: String,
    pub citation: String,
}

#[derive(Debug, Clone, Serialize)]
pub struct RevisionLine {
    pub id: i64,
    pub pushed_at: String,
    pub pushed_by: String,
    pub device: String,
    pub content_sha256: String,
    pub conflict_with: Option<i64>,
}

#[derive(Debug, Clone, Serialize)]
pub struct DeliveryLine {
    pub report_id: String,
    pub delivered_at: String,
    pub file_name: String,
    pub recipient: String,
    pub bytes: i64,
    pub pdf_kept: bool,
}

/// One inspection: a revision's header and findings, every revision, every delivery.
#[derive(Debug, Clone, Serialize)]
pub struct InspectionView {
    pub id: String,
    pub revision: i64,
    pub latest_revision: i64,
    pub address: String,
    pub client: String,
    pub inspected_on: Option<String>,
    pub inspector: String,
    pub code_edition: String,
    pub photos: i64,
    pub findings: Vec<FindingLine>,
    pub revisions: Vec<RevisionLine>,
    pub deliveries: Vec<DeliveryLine>,
}

const OPEN: &str = "('over-limit', 'to-evaluate', 'near-limit', 'incomplete')";

/// `%words%` for ILIKE, with the pattern's own characters taken literally.
fn contains(text: &str) -> String {
    let escaped = text
        .trim()
        .replace('\\', "\\\\")
        .replace('%', "\\%")
        .replace('_', "\\_");
    format!("%{escaped}%")
}

fn date_or_none(text: &str, what: &str) -> Result<Option<String>, ApiError> {
    let text = text.trim();
    if text.is_empty() {
        return Ok(None);
    }
    undercroft_engine::model::check_date(text)
        .map_err(|e| ApiError::BadRequest(format!("{what}: {e}")))?;
    Ok(Some(text.into()))
}

const UTC_MINUTE: &str = "'YYYY-MM-DD HH24:MI \"UTC\"'";

impl Office {
    pub async fn search(&self, caller: &Caller, search: &Search) -> Result<Vec<Listed>, ApiError> {
        let owner: i64 = match caller.role {
            Role::Inspector => caller.person_id,
            Role::Office => 0,
        };
        let from = date_or_none(&search.from, "from")?;
        let to = date_or_none(&search.to, "to")?;
        if search.finding.len() > 500 {
            return Err(ApiError::BadRequest(
                "look for at most 500 characters of a finding".into(),
            ));
        }
        let sql = format!(
            "SELECT i.id, r.address, r.client, to_char(r.inspected_on, 'YYYY-MM-DD'), r.inspector_name,
                (SELECT count(*) FROM revisions x WHERE x.inspection_id = i.id),
                (SELECT count(*) FROM revisions x WHERE x.inspection_id = i.id AND x.conflict_with IS NOT NULL),
                to_char(r.pushed_at AT TIME ZONE 'UTC', {UTC_MINUTE}),
                (SELECT count(*) FROM findings f WHERE f.revision_id = r.id AND f.status IN {OPEN}),
                ARRAY(SELECT f.title || ': ' || f.place FROM findings f
                      WHERE $7 <> '' AND f.revision_id = r.id AND f.search @@ plainto_tsquery('english', $7)
                      ORDER BY f.position LIMIT 5)
             FROM inspections i
             JOIN revisions r ON r.id = i.latest_revision
             JOIN people o ON o.id = i.owner_id
             WHERE ($1::bigint = 0 OR i.owner_id = $1)
               AND ($2 = '%%' OR r.address ILIKE $2)
               AND ($3 = '%%' OR r.client ILIKE $3)
               AND ($4 = '%%' OR r.inspector_name ILIKE $4 OR o.name ILIKE $4)
               AND ($5::text IS NULL OR r.inspected_on >= $5::text::date)
               AND ($6::text IS NULL OR r.inspected_on <= $6::text::date)
               AND ($7 = '' OR EXISTS (SELECT 1 FROM findings f WHERE f.revision_id = r.id
                                       AND f.search @@ plainto_tsquery('english', $7)))
             ORDER BY r.inspected_on DESC NULLS LAST, i.id
             LIMIT 500"
        );
        let client = self.pool.get().await?;
        let rows = client
            .query(
                &sql,
                &[
                    &owner,
                    &contains(&search.address),
                    &contains(&search.client),
                    &contains(&search.inspector),
                    &from,
                    &to,
                    &search.finding.trim(),
                ],
            )
            .await?;
        Ok(rows
            .iter()
            .map(|r| Listed {
                id: r.get(0),
                address: r.get(1),
                client: r.get(2),
                inspected_on: r.get(3),
                inspector: r.get(4),
                revisions: r.get(5),
                conflicts: r.get(6),
                latest_pushed_at: r.get(7),
                open_findings: r.get(8),
                matching: r.get(9),
            })
            .collect())
    }

    /// The inspection's owner, if the caller may read it; "not found" otherwise, so an
    /// inspector cannot learn which ids another holds.
    async fn readable(&self, caller: &Caller, id: &str) -> Result<i64, ApiError> {
        let client = self.pool.get().await?;
        let row = client
            .query_opt(
                "SELECT owner_id, latest_revision FROM inspections WHERE id = $1",
                &[&id],
            )
            .await?;
        match row {
            Some(r) if caller.role == Role::Office || r.get::<_, i64>(0) == caller.person_id => r
                .get::<_, Option<i64>>(1)
                .ok_or_else(|| ApiError::NotFound(format!("no inspection {id}"))),
            _ => Err(ApiError::NotFound(format!(
                "no inspection {id} that you may read"
            ))),
        }
    }

    /// One inspection as of a revision (the latest when none is named).
    pub async fn inspection(
        &self,
        caller: &Caller,
        id: &str,
        revision: Option<i64>,
    ) -> Result<InspectionView, ApiError> {
        let latest = self.readable(caller, id).await?;
        let revision = revision.unwrap_or(latest);
        let client = self.pool.get().await?;
        let head = client
            .query_opt(
                "SELECT address, client, to_char(inspected_on, 'YYYY-MM-DD'), inspector_name, code_edition,
                        jsonb_array_length(manifest->'images')
                 FROM revisions WHERE id = $1 AND inspection_id = $2",
                &[&revision, &id],
            )
            .await?
            .ok_or_else(|| ApiError::NotFound(format!("no revision {revision} of {id}")))?;
        let findings = client
            .query(
                "SELECT status, status_label, basis, title, place, summary, citation FROM findings
                 WHERE revision_id = $1 ORDER BY position",
                &[&revision],
            )
            .await?
            .iter()
            .map(|r| FindingLine {
                status: r.get(0),
                status_label: r.get(1),
                basis: r.get(2),
                title: r.get(3),
                place: r.get(4),
                summary: r.get(5),
                citation: r.get(6),
            })
            .collect();
        let revisions = client
            .query(
                &format!(
                    "SELECT r.id, to_char(r.pushed_at AT TIME ZONE 'UTC', {UTC_MINUTE}), p.name, r.device, r.content_sha256, r.conflict_with
                     FROM revisions r JOIN people p ON p.id = r.pushed_by WHERE r.inspection_id = $1 ORDER BY r.id DESC"
                ),
                &[&id],
            )
            .await?
            .iter()
            .map(|r| RevisionLine {
                id: r.get(0),
                pushed_at: r.get(1),
                pushed_by: r.get(2),
                device: r.get(3),
                content_sha256: r.get(4),
                conflict_with: r.get(5),
            })
            .collect();
        let deliveries = client
            .query(
                &format!(
                    "SELECT report_id, to_char(delivered_at AT TIME ZONE 'UTC', {UTC_MINUTE}), file_name, recipient, bytes, pdf IS NOT NULL
                     FROM deliveries WHERE inspection_id = $1 ORDER BY delivered_at DESC, report_id"
                ),
                &[&id],
            )
            .await?
            .iter()
            .map(|r| DeliveryLine {
                report_id: r.get(0),
                delivered_at: r.get(1),
                file_name: r.get(2),
                recipient: r.get(3),
                bytes: r.get(4),
                pdf_kept: r.get(5),
            })
            .collect();
        Ok(InspectionView {
            id: id.into(),
            revision,
            latest_revision: latest,
            address: head.get(0),
            client: head.get(1),
            inspected_on: head.get(2),
            inspector: head.get(3),
            code_edition: head.get(4),
            photos: head.get::<_, Option<i32>>(5).unwrap_or(0) as i64,
            findings,
            revisions,
            deliveries,
        })
    }

    /// A delivered report's PDF: its file name and bytes.
    pub async fn delivered_pdf(
        &self,
        caller: &Caller,
        id: &str,
        report_id: &str,
    ) -> Result<(String, Vec<u8>), ApiError> {
        self.readable(caller, id).await?;
        let client = self.pool.get().await?;
        let row = client
            .query_opt(
                "SELECT file_name, pdf FROM deliveries WHERE inspection_id = $1 AND report_id = $2",
                &[&id, &report_id],
            )
            .await?
            .ok_or_else(|| ApiError::NotFound(format!("no delivered report {report_id}")))?;
        let pdf: Option<String> = row.get(1);
        let pdf = pdf.ok_or_else(|| {
            ApiError::NotFound("the device no longer held this report's PDF when it synced".into())
        })?;
        let files = self.files.clone();
        let bytes = tokio::task::spawn_blocking(move || files.read(&pdf))
            .await
            .map_err(|e| ApiError::Internal(e.to_string()))??;
        Ok((row.get(0), bytes))
    }

    pub async fn firm_settings(&self) -> Result<Option<undercroft_sync::FirmSettings>, ApiError> {
        let client = self.pool.get().await?;
        let row = client
            .query_opt("SELECT body FROM firm_settings WHERE id = 1", &[])
            .await?;
        row.map(|r| serde_json::from_value(r.get(0)))
            .transpose()
            .map_err(|e| ApiError::Internal(e.to_string()))
    }

    pub async fn save_firm_settings(
        &self,
        caller: &Caller,
        firm: &undercroft_sync::FirmSettings,
    ) -> Result<(), ApiError> {
        caller.require_office()?;
        firm.check()
            .map_err(|e| ApiError::Unprocessable(e.to_string()))?;
        let body = serde_json::to_value(firm).map_err(|e| ApiError::Internal(e.to_string()))?;
        let client = self.pool.get().await?;
        client
            .execute(
                "INSERT INTO firm_settings (id, body, updated_by) VALUES (1, $1, $2)
                 ON CONFLICT (id) DO UPDATE SET body = $1, updated_by = $2, updated_at = now()",
                &[&body, &caller.person_id],
            )
            .await?;
        Ok(())
    }
}
