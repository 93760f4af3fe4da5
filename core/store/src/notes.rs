//! The inspector's notes and overrides on findings (kept apart from the computed findings),
//! and the record of delivered reports.

use super::clock::now_utc;
use super::files::content_hash;
use super::{new_id, Result, Store};
use rusqlite::params;
use undercroft_engine::model::FindingNote;

/// A report handed to the client.
#[derive(Debug, Clone, PartialEq, serde::Serialize, serde::Deserialize)]
pub struct DeliveredReport {
    pub id: String,
    pub delivered_at: String,
    pub file_name: String,
    pub sha256: String,
    pub bytes: u64,
    /// Who it went to, in the inspector's words (a name or an address); empty if not said.
    pub recipient: String,
}

impl Store {
    /// Saves (or, when everything is empty, clears) the inspector's note on a finding.
    pub fn set_finding_note(&mut self, inspection_id: &str, note: &FindingNote) -> Result<()> {
        self.edit(inspection_id, |tx| {
            let empty = note.note.is_empty()
                && note.recommendation.is_none()
                && note.not_applicable_reason.is_none()
                && note.priority.is_none();
            let priority = note.priority.map(|p| p.key());
            if empty {
                tx.execute("DELETE FROM finding_notes WHERE inspection_id = ?1 AND finding_key = ?2", params![inspection_id, note.key])?;
            } else {
                tx.execute(
                    "INSERT INTO finding_notes (inspection_id, finding_key, note, recommendation, not_applicable_reason, priority, updated_at)
                     VALUES (?1, ?2, ?3, ?4, ?5, ?6, ?7)
                     ON CONFLICT (inspection_id, finding_key) DO UPDATE SET note = ?3, recommendation = ?4,
                        not_applicable_reason = ?5, priority = ?6, updated_at = ?7",
                    params![inspection_id, note.key, note.note, note.recommendation, note.not_applicable_reason, priority, now_utc()],
                )?;
            }
            Ok(())
        })
    }

    pub fn finding_notes(&self, inspection_id: &str) -> Result<Vec<FindingNote>> {
        let mut stmt = self.conn.prepare_cached(
            "SELECT finding_key, note, recommendation, not_applicable_reason, priority FROM finding_notes
             WHERE inspection_id = ?1 ORDER BY finding_key",
        )?;
        let rows = stmt.query_map([inspection_id], |r| {
            Ok(FindingNote {
                key: r.get(0)?,
                note: r.get(1)?,
                recommendation: r.get(2)?,
                not_applicable_reason: r.get(3)?,
                // A word this version does not know reads as "not changed".
                priority: r
                    .get::<_, Option<String>>(4)?
                    .and_then(|p| undercroft_engine::priority::Priority::parse(&p)),
            })
        })?;
        Ok(rows.collect::<rusqlite::Result<_>>()?)
    }

    /// Records a delivered report: its file name, hash and size, who it went to, and the
    /// findings as delivered.
    pub fn record_report(
        &mut self,
        inspection_id: &str,
        file_name: &str,
        pdf: &[u8],
        findings_json: &str,
        recipient: &str,
    ) -> Result<DeliveredReport> {
        let report = DeliveredReport {
            id: new_id(),
            delivered_at: now_utc(),
            file_name: file_name.into(),
            sha256: content_hash(pdf),
            bytes: pdf.len() as u64,
            recipient: recipient.trim().into(),
        };
        // A copy named by its hash, so the delivered PDF can be sent to the office exactly as
        // delivered even after a later report takes its file name.
        let kept = self.delivered_pdf_path(&report.sha256);
        if let Some(folder) = kept.parent() {
            std::fs::create_dir_all(folder)?;
        }
        super::write_durably(&kept, pdf)?;
        self.edit(inspection_id, |tx| {
            tx.execute(
                "INSERT INTO reports (id, inspection_id, delivered_at, file_name, sha256, bytes, findings, recipient) VALUES (?1, ?2, ?3, ?4, ?5, ?6, ?7, ?8)",
                params![report.id, inspection_id, report.delivered_at, report.file_name, report.sha256, report.bytes as i64, findings_json, report.recipient],
            )?;
            Ok(())
        })?;
        Ok(report)
    }

    /// Delivered reports, newest first.
    pub fn reports(&self, inspection_id: &str) -> Result<Vec<DeliveredReport>> {
        let mut stmt = self.conn.prepare_cached(
            "SELECT id, delivered_at, file_name, sha256, bytes, recipient FROM reports WHERE inspection_id = ?1 ORDER BY delivered_at DESC, id DESC",
        )?;
        let rows = stmt.query_map([inspection_id], |r| {
            Ok(DeliveredReport {
                id: r.get(0)?,
                delivered_at: r.get(1)?,
                file_name: r.get(2)?,
                sha256: r.get(3)?,
                bytes: r.get::<_, i64>(4)? as u64,
                recipient: r.get(5)?,
            })
        })?;
        Ok(rows.collect::<rusqlite::Result<_>>()?)
    }
}
