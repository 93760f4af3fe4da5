//! Made-up inspections for the load tests and the push benchmark: the demo inspection under
//! new ids with generated photos (each seed its own file) and a small delivered report.

use std::collections::HashMap;
use std::path::PathBuf;
use undercroft_sync::PushRequest;

fn repo_root() -> PathBuf {
    PathBuf::from(env!("CARGO_MANIFEST_DIR"))
        .parent()
        .expect("server/ sits in the repo")
        .to_path_buf()
}

/// A small PDF that passes the office's check (header and end marker).
pub fn tiny_pdf(text: &str) -> Vec<u8> {
    format!("%PDF-1.7\n% {text}\n1 0 obj\n<<>>\nendobj\ntrailer\n<<>>\n%%EOF\n").into_bytes()
}

/// A photo of the given size whose pixels depend on `seed` (so each seed is its own file).
pub fn photo(seed: u64, width: u32, height: u32) -> Vec<u8> {
    let mut pixels = Vec::with_capacity((width * height * 3) as usize);
    let mut state = seed
        .wrapping_mul(6364136223846793005)
        .wrapping_add(1442695040888963407);
    for _ in 0..width * height {
        state = state.wrapping_mul(6364136223846793005).wrapping_add(1);
        pixels.extend_from_slice(&[
            (state >> 33) as u8,
            (state >> 41) as u8,
            (state >> 49) as u8,
        ]);
    }
    undercroft_photo::encode_rgb(width, height, pixels, 80).unwrap()
}

/// A made-up push of the demo inspection under new ids, with `photos` photos: the first
/// `shared` of them the device's own, shared by all its inspections (so stored once), the
/// rest this inspection's alone; and one delivered report. Returns the inspection id, the
/// request and every file it names by hash.
pub fn synthetic_push(
    device: u64,
    inspection: u64,
    photos: u64,
    shared: u64,
) -> (String, PushRequest, HashMap<String, Vec<u8>>) {
    use undercroft_sync::{ImageRef, Manifest, ReportRef};
    let demo_text =
        std::fs::read_to_string(repo_root().join("demo-data/demo-inspection.json")).unwrap();
    let demo = undercroft_engine::interchange::from_json(&demo_text).unwrap();
    let (mut copy, _) =
        undercroft_engine::model::renumber::renumbered(&demo, undercroft_store::new_id);
    copy.property.address = format!("{} Load Test Road, unit {device}", inspection + 1);
    let owner = copy.areas[0].id.clone();
    let mut files = HashMap::new();
    let mut images = Vec::new();
    copy.photos.clear();
    for n in 0..photos {
        let seed = if n < shared {
            device * 1_000_000 + n
        } else {
            device * 1_000_000 + 1_000 + inspection * 100 + n
        };
        let bytes = photo(seed, 24, 16);
        let sha = undercroft_store::content_hash(&bytes);
        let id = undercroft_store::new_id();
        copy.photos.push(undercroft_engine::model::PhotoRef {
            id: id.clone(),
            file: format!("photos/{sha}.jpg"),
            attached_to: owner.clone(),
            caption: format!("Photo {n}"),
            marks: vec![],
        });
        images.push(ImageRef {
            photo_id: id,
            report_sha256: sha.clone(),
            report_bytes: bytes.len() as u64,
            original_sha256: None,
            original_bytes: None,
        });
        files.insert(sha, bytes);
    }
    let pdf = tiny_pdf(&format!("device {device} inspection {inspection}"));
    let pdf_sha = undercroft_store::content_hash(&pdf);
    let report = ReportRef {
        id: undercroft_store::new_id(),
        delivered_at: "2026-11-30T16:00:00Z".into(),
        file_name: "Report.pdf".into(),
        recipient: "Client".into(),
        sha256: pdf_sha.clone(),
        bytes: pdf.len() as u64,
        pdf_sent: true,
    };
    files.insert(pdf_sha, pdf);
    let manifest = Manifest {
        inspection: undercroft_engine::interchange::to_json(&copy),
        notes: vec![],
        images,
        reports: vec![report],
    };
    let request = PushRequest {
        manifest,
        based_on: None,
        device: format!("device-{device}"),
    };
    (copy.id, request, files)
}
