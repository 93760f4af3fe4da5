//! Sending finished inspections to the firm's office server and taking the firm's settings
//! back: what a push holds (`manifest`), how each file it carries is checked (`blob`), the
//! firm's settings (`firm`) and the device's side of the exchange (`client`).

pub mod blob;
pub mod client;
pub mod firm;
pub mod manifest;

pub use blob::{check_blob, BlobError, BlobKind};
pub use client::{Office, OfficeError, SyncSummary};
pub use firm::{CountyRule, FirmSettings, LicenseEntry};
pub use manifest::{
    ImageRef, Manifest, ManifestError, PushAnswer, PushOutcome, PushRequest, ReportRef,
};
