//! The checks every file pushed to the office passes before it is kept: its size, its kind
//! (an image goes through the same import as a photo taken in the app, which refuses
//! damaged files and decompression bombs; a report must be a whole PDF) and its SHA-256,
//! which must be the name it was sent under.

use thiserror::Error;
use undercroft_photo as photo;

/// Largest image accepted (the photo import's limit).
pub const MAX_IMAGE_BYTES: u64 = photo::MAX_FILE_BYTES as u64;
/// Largest report PDF accepted (a report with 40 photos is under 10 MB).
pub const MAX_PDF_BYTES: u64 = 64 * 1024 * 1024;

/// What a pushed file is.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum BlobKind {
    Image,
    Pdf,
}

impl BlobKind {
    pub fn key(self) -> &'static str {
        match self {
            BlobKind::Image => "image",
            BlobKind::Pdf => "pdf",
        }
    }

    pub fn from_key(key: &str) -> Option<BlobKind> {
        match key {
            "image" => Some(BlobKind::Image),
            "pdf" => Some(BlobKind::Pdf),
            _ => None,
        }
    }

    pub fn limit(self) -> u64 {
        match self {
            BlobKind::Image => MAX_IMAGE_BYTES,
            BlobKind::Pdf => MAX_PDF_BYTES,
        }
    }
}

#[derive(Debug, Error, PartialEq)]
pub enum BlobError {
    #[error("\"{0}\" is not a SHA-256 (64 lower-case hex digits)")]
    NotAHash(String),
    #[error("the file is empty")]
    Empty,
    #[error("the file is {0} bytes, over the limit of {1}")]
    TooBig(u64, u64),
    #[error("the file's SHA-256 is {found}, not the {named} it was sent as; refused: it could pass off one file as another")]
    HashMismatch { named: String, found: String },
    #[error("not a photo this app accepts: {0}")]
    BadImage(photo::PhotoError),
    #[error("not a whole PDF: {0}")]
    BadPdf(&'static str),
}

/// Checks one pushed file against the hash it was sent under; returns its size.
pub fn check_blob(kind: BlobKind, named: &str, bytes: &[u8]) -> Result<u64, BlobError> {
    if !undercroft_store::is_hash(named) {
        return Err(BlobError::NotAHash(named.chars().take(80).collect()));
    }
    if bytes.is_empty() {
        return Err(BlobError::Empty);
    }
    let size = bytes.len() as u64;
    if size > kind.limit() {
        return Err(BlobError::TooBig(size, kind.limit()));
    }
    let found = undercroft_store::content_hash(bytes);
    if found != named {
        return Err(BlobError::HashMismatch {
            named: named.into(),
            found,
        });
    }
    match kind {
        BlobKind::Image => {
            photo::process(bytes).map_err(BlobError::BadImage)?;
        }
        BlobKind::Pdf => check_pdf(bytes)?,
    }
    Ok(size)
}

/// A PDF starts with its header and ends with its end-of-file marker (a cut-short upload
/// does not).
fn check_pdf(bytes: &[u8]) -> Result<(), BlobError> {
    if !bytes.starts_with(b"%PDF-") {
        return Err(BlobError::BadPdf("it does not start with %PDF-"));
    }
    let tail = &bytes[bytes.len().saturating_sub(1024)..];
    if !tail.windows(5).any(|w| w == b"%%EOF") {
        return Err(BlobError::BadPdf("it has no %%EOF at its end (cut short?)"));
    }
    Ok(())
}

#[cfg(test)]
mod tests {
    use super::*;
    use undercroft_photo::test_images;
    use undercroft_store::content_hash;

    #[test]
    fn a_photo_passes_under_its_own_hash_and_no_other() {
        let jpeg = test_images::camera_jpeg(&test_images::upright_scene(64, 48), 1);
        let hash = content_hash(&jpeg);
        assert_eq!(
            check_blob(BlobKind::Image, &hash, &jpeg),
            Ok(jpeg.len() as u64)
        );
        let other = "0".repeat(64);
        assert!(matches!(
            check_blob(BlobKind::Image, &other, &jpeg),
            Err(BlobError::HashMismatch { .. })
        ));
        assert!(matches!(
            check_blob(BlobKind::Image, "../../etc", &jpeg),
            Err(BlobError::NotAHash(_))
        ));
    }

    #[test]
    fn bombs_garbage_and_cut_short_files_are_refused() {
        // A JPEG header claiming 60000 x 60000 px: refused before any decode.
        let bomb = test_images::jpeg_claiming(60_000, 60_000);
        let refused = check_blob(BlobKind::Image, &content_hash(&bomb), &bomb);
        assert!(
            matches!(refused, Err(BlobError::BadImage(_))),
            "{refused:?}"
        );
        let garbage = b"not an image at all".to_vec();
        assert!(matches!(
            check_blob(BlobKind::Image, &content_hash(&garbage), &garbage),
            Err(BlobError::BadImage(_))
        ));
        let pdf = b"%PDF-1.7\n1 0 obj\n<<>>\nendobj\ntrailer\n<<>>\n%%EOF\n".to_vec();
        assert!(check_blob(BlobKind::Pdf, &content_hash(&pdf), &pdf).is_ok());
        let cut = pdf[..20].to_vec();
        assert!(matches!(
            check_blob(BlobKind::Pdf, &content_hash(&cut), &cut),
            Err(BlobError::BadPdf(_))
        ));
        assert_eq!(
            check_blob(BlobKind::Pdf, &content_hash(b""), b""),
            Err(BlobError::Empty)
        );
    }
}
