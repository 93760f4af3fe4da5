//! The device's side of the office sync, over HTTP(S): asks which files the office lacks,
//! sends only those (each checked by the office against its SHA-256), then the revision;
//! and takes the firm's settings back. Every step can be repeated: a push cut off at any
//! byte is sent again from the first file the office does not hold, and a revision the
//! office already has is answered as such, never stored twice.

use super::blob::BlobKind;

use super::manifest::{Manifest, PushAnswer, PushOutcome, PushRequest};
use crate::outgoing::{outgoing_revision, OutgoingRevision};
use serde::{Deserialize, Serialize};
use std::collections::HashMap;
use std::time::Duration;
use thiserror::Error;
use undercroft_store::{FirmSettings, Store, StoreError};

/// The office server, as this device reaches it.
#[derive(Clone)]
pub struct Office {
    base: String,
    token: String,
    agent: ureq::Agent,
}

#[derive(Debug, Error)]
pub enum OfficeError {
    #[error("the office address \"{0}\" is not an http:// or https:// address")]
    BadAddress(String),
    #[error("no token: ask the office for one and enter it in the settings")]
    NoToken,
    #[error("the office could not be reached: {0}")]
    Unreachable(String),
    #[error(
        "the office refused the token (it may have been revoked): ask the office for a new one"
    )]
    SignedOut,
    #[error("the office refused ({status}): {message}")]
    Refused { status: u16, message: String },
    #[error("the office's answer could not be read: {0}")]
    Garbled(String),
    #[error(transparent)]
    Store(#[from] StoreError),
    #[error("reading a file to send: {0}")]
    File(#[from] std::io::Error),
}

/// The office's list of files it lacks.
#[derive(Debug, Serialize, Deserialize)]
pub struct MissingBlobs {
    pub missing: Vec<String>,
}

/// What one sync did.
#[derive(Debug, Clone, Default, PartialEq)]
pub struct SyncSummary {
    /// Inspections sent as a new revision.
    pub pushed: usize,
    /// Inspections the office already had as they are.
    pub unchanged: usize,
    /// Inspections kept beside another device's revision (the office sees both).
    pub conflicts: usize,
    /// Files sent, and the bytes of them; files the office already held were not sent.
    pub files_sent: usize,
    pub bytes_sent: u64,
    pub files_already_there: usize,
    /// Inspections the office refused, with why.
    pub refused: Vec<(String, String)>,
    /// Deliveries whose PDF this device no longer holds (recorded without the file).
    pub reports_without_pdf: usize,
    /// Whether the firm's settings were taken.
    pub settings_taken: bool,
}

impl SyncSummary {
    /// One line for a screen or a terminal.
    pub fn text(&self) -> String {
        let mut parts = vec![
            format!("{} sent", self.pushed),
            format!("{} already at the office", self.unchanged),
        ];
        if self.conflicts > 0 {
            parts.push(format!(
                "{} kept beside another device's revision (the office sees both)",
                self.conflicts
            ));
        }
        parts.push(format!(
            "{} sent ({} KB), {} the office already had",
            undercroft_engine::words::count(self.files_sent, "file", "files"),
            self.bytes_sent.div_ceil(1024),
            self.files_already_there
        ));
        if !self.refused.is_empty() {
            parts.push(format!("{} refused", self.refused.len()));
        }
        if self.reports_without_pdf > 0 {
            parts.push(format!(
                "{} deliveries recorded without their PDF (no longer on this device)",
                self.reports_without_pdf
            ));
        }
        if self.settings_taken {
            parts.push("the firm's settings taken".into());
        }
        parts.join("; ")
    }
}

impl Office {
    pub fn new(url: &str, token: &str) -> Result<Office, OfficeError> {
        let base = url.trim().trim_end_matches('/').to_string();
        if !(base.starts_with("http://") || base.starts_with("https://")) || base.len() < 10 {
            return Err(OfficeError::BadAddress(url.into()));
        }
        if token.trim().is_empty() {
            return Err(OfficeError::NoToken);
        }
        let tls = ureq::tls::TlsConfig::builder()
            .provider(ureq::tls::TlsProvider::NativeTls)
            .root_certs(ureq::tls::RootCerts::PlatformVerifier)
            .build();
        let agent: ureq::Agent = ureq::Agent::config_builder()
            .http_status_as_error(false)
            .timeout_connect(Some(Duration::from_secs(10)))
            .timeout_global(Some(Duration::from_secs(300)))
            .tls_config(tls)
            .build()
            .into();
        Ok(Office {
            base,
            token: token.trim().into(),
            agent,
        })
    }

    fn bearer(&self) -> String {
        format!("Bearer {}", self.token)
    }

    /// Reads an answer: JSON on success, the office's words on refusal.
    fn answer<T: for<'de> Deserialize<'de>>(
        result: Result<ureq::http::Response<ureq::Body>, ureq::Error>,
    ) -> Result<T, OfficeError> {
        let mut response = result.map_err(|e| OfficeError::Unreachable(e.to_string()))?;
        let status = response.status().as_u16();
        let body = response
            .body_mut()
            .with_config()
            .limit(64 * 1024 * 1024)
            .read_to_string()
            .map_err(|e| OfficeError::Unreachable(e.to_string()))?;
        match status {
            200..=299 => {
                serde_json::from_str(&body).map_err(|e| OfficeError::Garbled(e.to_string()))
            }
            401 => Err(OfficeError::SignedOut),
            _ => Err(OfficeError::Refused {
                status,
                message: serde_json::from_str::<serde_json::Value>(&body)
                    .ok()
                    .and_then(|v| v["error"].as_str().map(String::from))
                    .unwrap_or_else(|| body.chars().take(300).collect()),
            }),
        }
    }

    /// Which of these files the office does not hold.
    pub fn missing(&self, hashes: &[String]) -> Result<Vec<String>, OfficeError> {
        let mut missing = Vec::new();
        for chunk in hashes.chunks(5_000) {
            let answer: MissingBlobs = Self::answer(
                self.agent
                    .post(format!("{}/api/v1/blobs/missing", self.base))
                    .header("Authorization", &self.bearer())
                    .send_json(serde_json::json!({ "hashes": chunk })),
            )?;
            missing.extend(answer.missing);
        }
        Ok(missing)
    }

    /// Sends one file under its SHA-256.
    pub fn put_blob(&self, kind: BlobKind, sha256: &str, bytes: &[u8]) -> Result<(), OfficeError> {
        let _: serde_json::Value = Self::answer(
            self.agent
                .put(format!(
                    "{}/api/v1/blobs/{}/{sha256}",
                    self.base,
                    kind.key()
                ))
                .header("Authorization", &self.bearer())
                .header("Content-Type", "application/octet-stream")
                .send(bytes),
        )?;
        Ok(())
    }

    /// Sends a revision whose files the office holds.
    pub fn post_revision(
        &self,
        inspection_id: &str,
        request: &PushRequest,
    ) -> Result<PushAnswer, OfficeError> {
        Self::answer(
            self.agent
                .post(format!(
                    "{}/api/v1/inspections/{}/revisions",
                    self.base,
                    url_segment(inspection_id)
                ))
                .header("Authorization", &self.bearer())
                .send_json(request),
        )
    }

    /// The whole push of one revision: the files the office lacks (read by `read`), then the
    /// revision. Returns the office's answer and how many files and bytes were sent.
    pub fn push_revision(
        &self,
        inspection_id: &str,
        request: &PushRequest,
        read: impl Fn(&str) -> std::io::Result<Vec<u8>>,
    ) -> Result<(PushAnswer, usize, u64), OfficeError> {
        let kinds = kinds_of(&request.manifest);
        let missing = self.missing(&request.manifest.blob_hashes())?;
        let mut bytes_sent = 0;
        for sha in &missing {
            let kind = kinds.get(sha.as_str()).copied().ok_or_else(|| {
                OfficeError::Garbled(format!("the office asked for {sha}, which was not offered"))
            })?;
            let bytes = read(sha)?;
            self.put_blob(kind, sha, &bytes)?;
            bytes_sent += bytes.len() as u64;
        }
        let answer = self.post_revision(inspection_id, request)?;
        Ok((answer, missing.len(), bytes_sent))
    }

    /// The firm's settings, or None when the office has not set any.
    pub fn firm_settings(&self) -> Result<Option<FirmSettings>, OfficeError> {
        Self::answer(
            self.agent
                .get(format!("{}/api/v1/settings", self.base))
                .header("Authorization", &self.bearer())
                .call(),
        )
    }

    /// Pushes every finished inspection that changed since its last push, then takes the
    /// firm's settings. An inspection the office refuses is named in the summary and the
    /// others go on; an office that cannot be reached stops the sync (nothing is lost: what
    /// was not acknowledged is sent next time).
    pub fn sync(&self, store: &mut Store) -> Result<SyncSummary, OfficeError> {
        let device = store.device_id()?;
        let mut summary = SyncSummary::default();
        for id in store.finished_inspections()? {
            let outgoing = match outgoing_revision(store, &id) {
                Ok(o) => o,
                Err(e) => {
                    summary.refused.push((id, e.to_string()));
                    continue;
                }
            };
            summary.reports_without_pdf += outgoing.reports_without_pdf;
            let content = outgoing.manifest.content_sha256();
            let pushed = store.pushed_revision(&id)?;
            if pushed.as_ref().is_some_and(|p| p.content_sha256 == content) {
                summary.unchanged += 1;
                continue;
            }
            let request = PushRequest {
                manifest: outgoing.manifest.clone(),
                based_on: pushed.map(|p| p.content_sha256),
                device: device.clone(),
            };
            match self.push_revision(&id, &request, |sha| read_outgoing(&outgoing, sha)) {
                Ok((answer, files, bytes)) => {
                    summary.files_sent += files;
                    summary.bytes_sent += bytes;
                    summary.files_already_there += request.manifest.blob_hashes().len() - files;
                    store.record_push(&id, &answer.content_sha256, answer.revision)?;
                    match answer.outcome {
                        PushOutcome::New => summary.pushed += 1,
                        PushOutcome::AlreadyThere => summary.unchanged += 1,
                        PushOutcome::Conflict => summary.conflicts += 1,
                    }
                }
                Err(OfficeError::Refused { status, message }) if status != 503 => {
                    summary.refused.push((id, message));
                }
                Err(e) => return Err(e),
            }
        }
        if let Some(firm) = self.firm_settings()? {
            store.save_firm_settings(&firm)?;
            summary.settings_taken = true;
        }
        Ok(summary)
    }
}

fn read_outgoing(outgoing: &OutgoingRevision, sha: &str) -> std::io::Result<Vec<u8>> {
    let path = outgoing.files.get(sha).ok_or_else(|| {
        std::io::Error::new(std::io::ErrorKind::NotFound, format!("no file for {sha}"))
    })?;
    std::fs::read(path)
}

/// The kind of every file a manifest names.
pub fn kinds_of(manifest: &Manifest) -> HashMap<&str, BlobKind> {
    let mut kinds = HashMap::new();
    for image in &manifest.images {
        kinds.insert(image.report_sha256.as_str(), BlobKind::Image);
        if let Some(original) = &image.original_sha256 {
            kinds.insert(original.as_str(), BlobKind::Image);
        }
    }
    for report in manifest.reports.iter().filter(|r| r.pdf_sent) {
        kinds.insert(report.sha256.as_str(), BlobKind::Pdf);
    }
    kinds
}

/// An id as one path segment: anything but letters, digits, `-` and `_` percent-encoded.
fn url_segment(id: &str) -> String {
    id.bytes()
        .map(|b| {
            if b.is_ascii_alphanumeric() || b == b'-' || b == b'_' {
                (b as char).to_string()
            } else {
                format!("%{b:02X}")
            }
        })
        .collect()
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn addresses_that_are_not_http_and_missing_tokens_are_refused() {
        assert!(matches!(
            Office::new("office", "t"),
            Err(OfficeError::BadAddress(_))
        ));
        assert!(matches!(
            Office::new("ftp://office.example", "t"),
            Err(OfficeError::BadAddress(_))
        ));
        assert!(matches!(
            Office::new("https://office.example", " "),
            Err(OfficeError::NoToken)
        ));
        assert!(Office::new("https://office.example/", "uct_x").is_ok());
        assert_eq!(url_segment("a/b c"), "a%2Fb%20c");
    }

    #[test]
    fn an_office_that_is_not_there_is_said_to_be_unreachable() {
        // Port 9 on loopback: nothing listens there on a test machine.
        let office = Office::new("http://127.0.0.1:9", "uct_x").unwrap();
        assert!(matches!(
            office.missing(&["a".repeat(64)]),
            Err(OfficeError::Unreachable(_))
        ));
    }
}
