//! The device's side of the office exchange: what a push holds (`manifest`), a finished
//! inspection read from the store as it goes out (`outgoing`), how each file it carries is
//! checked (`blob`) and the client that sends it and takes the firm's settings back (`client`).

pub mod blob;
pub mod client;
pub mod manifest;
pub mod outgoing;

pub use blob::{check_blob, BlobError, BlobKind};
pub use client::{Office, OfficeError, SyncSummary};
pub use manifest::{
    ImageRef, Manifest, ManifestError, PushAnswer, PushOutcome, PushRequest, ReportRef,
};
pub use outgoing::{outgoing_revision, OutgoingRevision};
// The firm's settings the office sends: the store keeps them and fills new inspections from
// them, so they are the store's type.
pub use undercroft_store::firm::{CountyRule, FirmSettings, FirmSettingsError, LicenseEntry};
