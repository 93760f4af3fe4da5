//! One revision of an inspection as pushed to the office: the inspection file, the notes on
//! its findings, the images of its photos and its delivered reports, each file named by the
//! SHA-256 of its bytes. The server checks a manifest with the same rules as a bundle import.

use serde::{Deserialize, Serialize};
use std::collections::HashSet;
use thiserror::Error;
use undercroft_engine::interchange;
use undercroft_engine::model::FindingNote;
use undercroft_engine::model::Inspection;

/// Most photos one inspection may carry (a bundle's entry limit).
pub const MOST_IMAGES: usize = 20_000;
/// Most delivered reports one inspection may carry.
pub const MOST_REPORTS: usize = 1_000;
/// Most notes on findings.
pub const MOST_NOTES: usize = 20_000;
/// Longest text of a report's file name or recipient, and of one note's fields, in bytes.
const LONGEST_TEXT: usize = 4_096;

/// What a device sends for one revision of an inspection.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct Manifest {
    /// The inspection in the interchange format, as text (parsed by the same reader as a file).
    pub inspection: String,
    #[serde(default)]
    pub notes: Vec<FindingNote>,
    #[serde(default)]
    pub images: Vec<ImageRef>,
    #[serde(default)]
    pub reports: Vec<ReportRef>,
}

/// The files of one photo: the report image always, the original where the device kept it.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct ImageRef {
    pub photo_id: String,
    /// SHA-256 of the report image's bytes (the image the PDF prints).
    pub report_sha256: String,
    pub report_bytes: u64,
    /// SHA-256 of the original file (the photo's content hash on the device), where kept.
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub original_sha256: Option<String>,
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub original_bytes: Option<u64>,
}

/// A report handed to the client, with the SHA-256 of its PDF.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct ReportRef {
    /// The device's id of the delivery.
    pub id: String,
    /// UTC, RFC 3339.
    pub delivered_at: String,
    pub file_name: String,
    #[serde(default)]
    pub recipient: String,
    pub sha256: String,
    pub bytes: u64,
    /// False when the device no longer holds the PDF (delivered before it kept a copy): the
    /// delivery is recorded, its file is not sent.
    #[serde(default = "yes")]
    pub pdf_sent: bool,
}

fn yes() -> bool {
    true
}

/// The body of a push: the manifest, which revision the device started from, and which device.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct PushRequest {
    pub manifest: Manifest,
    /// The content hash of the revision this device last had acknowledged for the inspection;
    /// None on its first push.
    #[serde(default)]
    pub based_on: Option<String>,
    /// The device's own id (kept in its store), so the office can tell two devices apart.
    pub device: String,
}

/// What the office answers to a push.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct PushAnswer {
    pub revision: i64,
    pub content_sha256: String,
    pub outcome: PushOutcome,
    /// The revision this one disagrees with, when another device pushed a change first.
    #[serde(default)]
    pub conflict_with: Option<i64>,
}

#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, Deserialize)]
#[serde(rename_all = "kebab-case")]
pub enum PushOutcome {
    /// A new revision, following the one the device started from (or the first).
    New,
    /// The office already had exactly this revision: nothing was added.
    AlreadyThere,
    /// Kept beside another device's newer revision; the office sees both.
    Conflict,
}

#[derive(Debug, Error, PartialEq)]
pub enum ManifestError {
    #[error("inspection: {0}")]
    Inspection(String),
    #[error("{0} is named both as a photo and as a report PDF")]
    TwoKinds(String),
    #[error("{0} is not a SHA-256 (64 lower-case hex digits)")]
    NotAHash(String),
    #[error("photo {0} is not a photo of this inspection")]
    UnknownPhoto(String),
    #[error("photo {0} is listed twice")]
    DuplicatePhoto(String),
    #[error("report {0} is listed twice")]
    DuplicateReport(String),
    #[error("too many {0} (at most {1})")]
    TooMany(&'static str, usize),
    #[error("{0} is longer than {1} bytes")]
    TooLong(&'static str, usize),
    #[error("report file name \"{0}\" is not a plain file name ending in .pdf")]
    BadFileName(String),
    #[error("report {0}: delivery time \"{1}\" is not a UTC time like 2026-05-14T15:02:11Z")]
    BadTime(String, String),
    #[error("{0} is {1} bytes, over the limit of {2}")]
    TooBig(String, u64, u64),
}

impl Manifest {
    /// SHA-256 of the manifest as serialized: equal manifests, equal hashes; any change in
    /// the inspection, a note, a photo or a report gives another.
    pub fn content_sha256(&self) -> String {
        let text = serde_json::to_vec(self).expect("a manifest always serializes");
        undercroft_store::content_hash(&text)
    }

    /// Every hash the manifest names (report images, originals, PDFs), each once.
    pub fn blob_hashes(&self) -> Vec<String> {
        let mut seen = HashSet::new();
        let images = self.images.iter().flat_map(|i| {
            std::iter::once(i.report_sha256.clone()).chain(i.original_sha256.clone())
        });
        images
            .chain(
                self.reports
                    .iter()
                    .filter(|r| r.pdf_sent)
                    .map(|r| r.sha256.clone()),
            )
            .filter(|h| seen.insert(h.clone()))
            .collect()
    }

    /// Checks the manifest as the store checks a bundle: the inspection by the same reader
    /// as an inspection file, every hash well formed, every photo one of the inspection's,
    /// nothing twice, sizes within the photo and report limits, file names plain. Returns the
    /// inspection.
    pub fn check(&self) -> Result<Inspection, ManifestError> {
        let inspection = interchange::from_json(&self.inspection)
            .map_err(|e| ManifestError::Inspection(e.to_string()))?;
        if self.images.len() > MOST_IMAGES {
            return Err(ManifestError::TooMany("photos", MOST_IMAGES));
        }
        if self.reports.len() > MOST_REPORTS {
            return Err(ManifestError::TooMany("reports", MOST_REPORTS));
        }
        if self.notes.len() > MOST_NOTES {
            return Err(ManifestError::TooMany("notes", MOST_NOTES));
        }
        let photo_ids: HashSet<&str> = inspection.photos.iter().map(|p| p.id.as_str()).collect();
        let mut listed = HashSet::new();
        for image in &self.images {
            if !photo_ids.contains(image.photo_id.as_str()) {
                return Err(ManifestError::UnknownPhoto(image.photo_id.clone()));
            }
            if !listed.insert(image.photo_id.as_str()) {
                return Err(ManifestError::DuplicatePhoto(image.photo_id.clone()));
            }
            check_hash(&image.report_sha256)?;
            check_size(
                "a report image",
                image.report_bytes,
                super::blob::MAX_IMAGE_BYTES,
            )?;
            if let Some(original) = &image.original_sha256 {
                check_hash(original)?;
                let bytes = image.original_bytes.unwrap_or(0);
                check_size("an original photo", bytes, super::blob::MAX_IMAGE_BYTES)?;
            }
        }
        let image_hashes: HashSet<&str> = self
            .images
            .iter()
            .flat_map(|i| {
                std::iter::once(i.report_sha256.as_str()).chain(i.original_sha256.as_deref())
            })
            .collect();
        let mut reports = HashSet::new();
        for report in &self.reports {
            if report.pdf_sent && image_hashes.contains(report.sha256.as_str()) {
                return Err(ManifestError::TwoKinds(report.sha256.clone()));
            }
            if !reports.insert(report.id.as_str()) {
                return Err(ManifestError::DuplicateReport(report.id.clone()));
            }
            check_text("a report id", &report.id)?;
            check_text("a recipient", &report.recipient)?;
            check_hash(&report.sha256)?;
            check_size(&report.file_name, report.bytes, super::blob::MAX_PDF_BYTES)?;
            if !plain_pdf_name(&report.file_name) {
                return Err(ManifestError::BadFileName(report.file_name.clone()));
            }
            if !utc_time(&report.delivered_at) {
                return Err(ManifestError::BadTime(
                    report.id.clone(),
                    report.delivered_at.clone(),
                ));
            }
        }
        for note in &self.notes {
            check_text("a note's finding key", &note.key)?;
            check_text("a note", &note.note)?;
            for text in [&note.recommendation, &note.not_applicable_reason]
                .into_iter()
                .flatten()
            {
                check_text("a note", text)?;
            }
        }
        Ok(inspection)
    }
}

fn check_hash(hash: &str) -> Result<(), ManifestError> {
    if undercroft_store::is_hash(hash) {
        Ok(())
    } else {
        Err(ManifestError::NotAHash(hash.chars().take(80).collect()))
    }
}

fn check_size(what: &str, bytes: u64, limit: u64) -> Result<(), ManifestError> {
    if bytes == 0 || bytes > limit {
        return Err(ManifestError::TooBig(
            what.chars().take(80).collect(),
            bytes,
            limit,
        ));
    }
    Ok(())
}

fn check_text(what: &'static str, text: &str) -> Result<(), ManifestError> {
    if text.len() > LONGEST_TEXT {
        return Err(ManifestError::TooLong(what, LONGEST_TEXT));
    }
    Ok(())
}

/// A file name with no folder, no control characters, ending in `.pdf`.
fn plain_pdf_name(name: &str) -> bool {
    !name.is_empty()
        && name.len() <= 255
        && name.to_ascii_lowercase().ends_with(".pdf")
        && !name.starts_with('.')
        && !name
            .chars()
            .any(|c| c == '/' || c == '\\' || c.is_control())
}

/// `YYYY-MM-DDTHH:MM:SSZ`, optionally with fractions of a second.
fn utc_time(text: &str) -> bool {
    chrono::DateTime::parse_from_rfc3339(text).is_ok() && text.ends_with('Z')
}

#[cfg(test)]
mod tests {
    use super::*;

    fn manifest() -> Manifest {
        let demo = undercroft_engine::interchange::demo();
        let images = demo
            .photos
            .iter()
            .map(|p| ImageRef {
                photo_id: p.id.clone(),
                report_sha256: undercroft_store::content_hash(p.id.as_bytes()),
                report_bytes: 1000,
                original_sha256: None,
                original_bytes: None,
            })
            .collect();
        Manifest {
            inspection: undercroft_engine::interchange::to_json(&demo),
            notes: vec![],
            images,
            reports: vec![ReportRef {
                id: "r1".into(),
                delivered_at: "2026-05-14T15:02:11Z".into(),
                file_name: "Report.pdf".into(),
                recipient: "Client".into(),
                sha256: "ab".repeat(32),
                bytes: 2000,
                pdf_sent: true,
            }],
        }
    }

    #[test]
    fn a_good_manifest_passes_and_its_hash_follows_its_content() {
        let m = manifest();
        assert_eq!(
            m.check().unwrap().id,
            undercroft_engine::interchange::demo().id
        );
        let mut changed = m.clone();
        assert_eq!(changed.content_sha256(), m.content_sha256());
        changed.reports[0].recipient = "Someone else".into();
        assert_ne!(changed.content_sha256(), m.content_sha256());
        assert_eq!(m.blob_hashes().len(), m.images.len() + 1);
    }

    #[test]
    fn every_kind_of_bad_manifest_is_refused_in_words() {
        type Spoil = fn(&mut Manifest);
        let cases: Vec<(Spoil, &str)> = vec![
            (|m| m.inspection = "{".into(), "inspection:"),
            (
                |m| m.images[0].report_sha256 = "../../etc/passwd".into(),
                "not a SHA-256",
            ),
            (
                |m| m.images[0].photo_id = "someone-else".into(),
                "not a photo of this",
            ),
            (|m| m.images.push(m.images[0].clone()), "listed twice"),
            (|m| m.images[0].report_bytes = 1 << 40, "over the limit"),
            (
                |m| m.reports[0].file_name = "../x.pdf".into(),
                "plain file name",
            ),
            (
                |m| m.reports[0].file_name = "x.exe".into(),
                "plain file name",
            ),
            (
                |m| m.reports[0].delivered_at = "yesterday".into(),
                "UTC time",
            ),
            (|m| m.reports.push(m.reports[0].clone()), "listed twice"),
            (
                |m| m.reports[0].sha256 = m.images[0].report_sha256.clone(),
                "both as a photo and as a report",
            ),
            (
                |m| m.reports[0].recipient = "x".repeat(10_000),
                "longer than",
            ),
        ];
        for (spoil, said) in cases {
            let mut m = manifest();
            spoil(&mut m);
            let error = m.check().expect_err(said).to_string();
            assert!(error.contains(said), "{error:?} should say {said:?}");
        }
    }

    #[test]
    fn unknown_fields_are_refused_when_read() {
        let mut value = serde_json::to_value(manifest()).unwrap();
        value["extra"] = serde_json::json!(1);
        assert!(serde_json::from_value::<Manifest>(value).is_err());
    }
}
