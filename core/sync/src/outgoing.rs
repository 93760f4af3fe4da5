//! A finished inspection as it goes to the office: its manifest, read from the store, and
//! where each file the manifest names is on this device.

use crate::manifest::{ImageRef, Manifest, ReportRef};
use std::collections::HashMap;
use std::path::PathBuf;
use undercroft_engine::interchange;
use undercroft_store::{file_hash, Store, StoreError};

/// A manifest and the files it names, by SHA-256.
#[derive(Debug, Clone)]
pub struct OutgoingRevision {
    pub manifest: Manifest,
    pub files: HashMap<String, PathBuf>,
    /// Reports whose PDF the device no longer holds (recorded, not sent).
    pub reports_without_pdf: usize,
    /// Photos with no image on this device (references only).
    pub photos_without_image: usize,
}

/// The inspection as the office will keep it, and where each file it names is. A report
/// image or PDF is named by the SHA-256 of its bytes, read now; an original by the
/// content hash the store gave it (the office checks every file against its name).
pub fn outgoing_revision(
    store: &Store,
    inspection_id: &str,
) -> Result<OutgoingRevision, StoreError> {
    let inspection = store.load_inspection(inspection_id)?;
    let mut files = HashMap::new();
    let mut images = Vec::new();
    let mut photos_without_image = 0;
    for photo in store.photos_of_inspection(inspection_id)? {
        let Some(report) = photo.report_path.as_ref().filter(|p| p.exists()) else {
            photos_without_image += 1;
            continue;
        };
        let (report_sha256, report_bytes) = file_hash(report)?;
        files.insert(report_sha256.clone(), report.clone());
        // The original is already named by its content hash (checked when it came in):
        // only its size is read, not its bytes.
        let original = match (photo.original_path.as_ref(), photo.hash.as_ref()) {
            (Some(path), Some(sha)) if path.exists() => {
                files.insert(sha.clone(), path.clone());
                Some((sha.clone(), std::fs::metadata(path)?.len()))
            }
            _ => None,
        };
        images.push(ImageRef {
            photo_id: photo.id,
            report_sha256,
            report_bytes,
            original_sha256: original.as_ref().map(|o| o.0.clone()),
            original_bytes: original.map(|o| o.1),
        });
    }
    let mut reports = Vec::new();
    let mut reports_without_pdf = 0;
    for delivered in store.reports(inspection_id)? {
        let kept = [
            store.delivered_pdf_path(&delivered.sha256),
            store.report_dir().join(&delivered.file_name),
        ]
        .into_iter()
        .find(|p| file_hash(p).is_ok_and(|(sha, _)| sha == delivered.sha256));
        if let Some(path) = &kept {
            files.insert(delivered.sha256.clone(), path.clone());
        } else {
            reports_without_pdf += 1;
        }
        reports.push(ReportRef {
            id: delivered.id,
            delivered_at: delivered.delivered_at,
            file_name: delivered.file_name,
            recipient: delivered.recipient,
            sha256: delivered.sha256,
            bytes: delivered.bytes,
            pdf_sent: kept.is_some(),
        });
    }
    // Oldest first, so the manifest does not change when nothing did.
    reports.reverse();
    let manifest = Manifest {
        inspection: interchange::to_json(&inspection),
        notes: store.finding_notes(inspection_id)?,
        images,
        reports,
    };
    if let Err(e) = manifest.check() {
        return Err(StoreError::Invalid(format!(
            "inspection {inspection_id} cannot be sent as it is: {e}"
        )));
    }
    Ok(OutgoingRevision {
        manifest,
        files,
        reports_without_pdf,
        photos_without_image,
    })
}

#[cfg(test)]
mod tests {
    use super::*;
    use undercroft_photo::test_images::{camera_jpeg, upright_scene};
    use undercroft_store::content_hash;

    fn temp(name: &str) -> PathBuf {
        let dir = std::env::temp_dir().join(format!(
            "undercroft-outgoing-{name}-{}-{}",
            std::process::id(),
            undercroft_store::new_id()
        ));
        std::fs::create_dir_all(&dir).unwrap();
        dir
    }

    #[test]
    fn only_delivered_inspections_go_and_their_manifest_names_each_file_by_its_hash() {
        let dir = temp("outgoing");
        let mut store = Store::open(&dir.join("s.sqlite")).unwrap();
        let mut demo = undercroft_engine::interchange::demo();
        demo.photos.clear();
        store.import_inspection(&demo).unwrap();
        assert!(
            store.finished_inspections().unwrap().is_empty(),
            "nothing delivered yet"
        );
        let jpeg = camera_jpeg(&upright_scene(640, 480), 6);
        let photo = store.add_photo("obs-family-decay", &jpeg, "Decay").unwrap();
        let pdf = b"%PDF-1.7\n%%EOF\n".to_vec();
        store
            .record_report(&demo.id, "Report.pdf", &pdf, "[]", "Dana")
            .unwrap();
        assert_eq!(store.finished_inspections().unwrap(), vec![demo.id.clone()]);

        let out = outgoing_revision(&store, &demo.id).unwrap();
        assert_eq!(out.manifest.images.len(), 1);
        let image = &out.manifest.images[0];
        assert_eq!(image.photo_id, photo.id);
        // The original is named by the photo's own content hash; every file by its bytes.
        assert_eq!(
            image.original_sha256.as_deref(),
            Some(content_hash(&jpeg).as_str())
        );
        for (sha, path) in &out.files {
            assert_eq!(&content_hash(&std::fs::read(path).unwrap()), sha);
        }
        assert_eq!(out.manifest.reports[0].sha256, content_hash(&pdf));
        assert!(out.manifest.reports[0].pdf_sent);
        assert_eq!(out.reports_without_pdf, 0);
        // The same store, asked again, gives the same content hash.
        let again = outgoing_revision(&store, &demo.id).unwrap();
        assert_eq!(
            again.manifest.content_sha256(),
            out.manifest.content_sha256()
        );
        // A delivered PDF the device no longer holds is recorded, not sent.
        std::fs::remove_file(store.delivered_pdf_path(&content_hash(&pdf))).unwrap();
        let without = outgoing_revision(&store, &demo.id).unwrap();
        assert!(!without.manifest.reports[0].pdf_sent);
        assert_eq!(without.reports_without_pdf, 1);
        std::fs::remove_dir_all(&dir).ok();
    }
}
