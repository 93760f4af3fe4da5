//! A device's sync against the office server on PostgreSQL: only missing files sent, pushes
//! idempotent, revisions kept beside each other, conflicts between devices seen by the
//! office, the firm's settings taken into new inspections, a cut-off upload stored as
//! nothing and sent again.

mod common;

use common::*;
use undercroft_server::auth::Role;
use undercroft_store::{NewInspection, OfficeLink};
use undercroft_sync::{CountyRule, FirmSettings, LicenseEntry, Office as Device, PushOutcome};

#[test]
fn a_device_sends_what_changed_and_only_the_files_the_office_lacks() {
    let server = start("sync_changes");
    let token = server.token("Ana Ruiz", Role::Inspector);
    let dir = temp_dir("sync-changes");
    let (mut store, id) = device_with_demo(&dir);
    let photos = store.photos_of_inspection(&id).unwrap().len();
    assert!(photos >= 5, "the demo has its photos");
    let device = Device::new(&server.url, &token).unwrap();

    let first = device.sync(&mut store).unwrap();
    assert_eq!(first.pushed, 1, "{first:?}");
    // Each photo's report image and original, and the PDF.
    let sent_first = first.files_sent;
    assert!(sent_first > photos, "{first:?}");
    assert_eq!(first.files_already_there, 0);

    // The same again: nothing new, nothing sent.
    let again = device.sync(&mut store).unwrap();
    assert_eq!(
        (again.pushed, again.unchanged, again.files_sent),
        (0, 1, 0),
        "{again:?}"
    );

    // A changed address is a new revision; no file is sent again.
    store
        .rename_inspection(&id, "14 Quarry Lane (rear unit)")
        .unwrap();
    let changed = device.sync(&mut store).unwrap();
    assert_eq!((changed.pushed, changed.files_sent), (1, 0), "{changed:?}");
    assert_eq!(changed.files_already_there, sent_first);

    // Two revisions kept, the latest shown; each file stored once.
    assert_eq!(
        server.sql(&format!(
            "SELECT count(*) FROM revisions WHERE inspection_id = '{id}'"
        )),
        ["2"]
    );
    assert_eq!(
        server.sql(&format!("SELECT r.address FROM inspections i JOIN revisions r ON r.id = i.latest_revision WHERE i.id = '{id}'")),
        ["14 Quarry Lane (rear unit)"]
    );
    assert_eq!(
        server.sql("SELECT count(*) FROM blobs"),
        [sent_first.to_string()]
    );
    let stored_files = walk_files(&server.files).len();
    assert_eq!(stored_files, sent_first, "one file on disk per hash");
    // Every file on disk is what its name says.
    for path in walk_files(&server.files) {
        let bytes = std::fs::read(&path).unwrap();
        assert_eq!(
            undercroft_store::content_hash(&bytes),
            path.file_name().unwrap().to_str().unwrap()
        );
    }
    // The delivery is recorded with its recipient and its PDF downloadable as delivered.
    let pdf = ureq::get(format!(
        "{}/api/v1/inspections/{id}/reports/{}",
        server.url,
        store.reports(&id).unwrap()[0].id
    ))
    .header("Authorization", &format!("Bearer {token}"))
    .call()
    .unwrap()
    .body_mut()
    .read_to_vec()
    .unwrap();
    assert_eq!(pdf, tiny_pdf("first"));
    std::fs::remove_dir_all(&dir).ok();
}

#[test]
fn two_devices_that_changed_one_inspection_both_keep_their_revision() {
    let server = start("sync_conflict");
    let token = server.token("Ana Ruiz", Role::Inspector);
    let office = server.token("Front Desk", Role::Office);
    let (dir_a, dir_b) = (temp_dir("phone"), temp_dir("tablet"));
    let (mut phone, id) = device_with_demo(&dir_a);
    let device = Device::new(&server.url, &token).unwrap();
    device.sync(&mut phone).unwrap();
    // The tablet has the same inspection (a bundle from the phone) and its own device id.
    let bundle = dir_a.join("bundle.zip");
    phone.export_bundle(&id, &bundle).unwrap();
    let mut tablet = undercroft_store::Store::open(&dir_b.join("device.sqlite")).unwrap();
    tablet.import_bundle(&bundle).unwrap();
    tablet
        .record_report(&id, "Report.pdf", &tiny_pdf("first"), "[]", "Dana Whitlock")
        .unwrap();
    // Both change it, each its own way.
    phone
        .rename_inspection(&id, "12 Quarry Lane, as the phone has it")
        .unwrap();
    tablet
        .rename_inspection(&id, "12 Quarry Lane, as the tablet has it")
        .unwrap();
    let a = device.sync(&mut phone).unwrap();
    assert_eq!(a.pushed, 1, "{a:?}");
    let b = device.sync(&mut tablet).unwrap();
    assert_eq!(
        b.conflicts, 1,
        "the tablet's revision does not follow the phone's: {b:?}"
    );
    let view = get_json(&format!("{}/api/v1/inspections/{id}", server.url), &office);
    let revisions = view["revisions"].as_array().unwrap();
    assert_eq!(
        revisions.len(),
        3,
        "first push, the phone's and the tablet's: {view}"
    );
    assert!(
        revisions[0]["conflict_with"].is_i64(),
        "the newest names the one it disagrees with"
    );
    assert_eq!(
        view["address"], "12 Quarry Lane, as the tablet has it",
        "the latest is shown"
    );
    // The phone's revision is still there to read.
    let phone_rev = revisions[1]["id"].as_i64().unwrap();
    let older = get_json(
        &format!(
            "{}/api/v1/inspections/{id}?revision={phone_rev}",
            server.url
        ),
        &office,
    );
    assert_eq!(older["address"], "12 Quarry Lane, as the phone has it");
    // The office page says so, in the list and on the inspection.
    let page = |path: &str| {
        ureq::get(format!("{}{path}", server.url))
            .header("Cookie", &format!("undercroft_office={office}"))
            .call()
            .unwrap()
            .body_mut()
            .read_to_string()
            .unwrap()
    };
    let list = page("/office");
    assert!(list.contains("1 revision from another device"), "{list}");
    let shown = page(&format!("/office/inspections/{id}"));
    assert!(
        shown.contains(&format!(
            "pushed beside revision {phone_rev} from another device: both kept"
        )),
        "{shown}"
    );
    assert!(shown.contains("as the tablet has it") && shown.contains("Revision 3"));
    for d in [dir_a, dir_b] {
        std::fs::remove_dir_all(d).ok();
    }
}

#[test]
fn the_firms_settings_fill_a_new_inspection_on_the_device() {
    let server = start("sync_settings");
    let token = server.token("Ana Ruiz", Role::Inspector);
    let office_token = server.token("Front Desk", Role::Office);
    let firm = FirmSettings {
        company: "Lantern Hill Inspections".into(),
        licenses: vec![LicenseEntry {
            inspector: "Ana Ruiz".into(),
            number: "HI-4471".into(),
        }],
        code_edition: "IRC 2018".into(),
        counties: vec![CountyRule {
            county: "Marrow County".into(),
            code_edition: "IRC 2021".into(),
            local_amendments: "No notches in the middle third of any joist.".into(),
        }],
        live_psf: None,
        dead_psf: None,
    };
    // An inspector may not set them; the office may.
    let settings = format!("{}/api/v1/settings", server.url);
    let put = |token: &str| {
        call(
            "PUT",
            &settings,
            Some(token),
            Some(serde_json::to_vec(&firm).unwrap()),
        )
        .0
    };
    assert_eq!(put(&token), 403);
    assert_eq!(put(&office_token), 200);

    let dir = temp_dir("settings");
    let mut store = undercroft_store::Store::open(&dir.join("device.sqlite")).unwrap();
    let mut settings = store.settings().unwrap();
    settings.inspector_name = "Ana Ruiz".into();
    store.save_settings(&settings).unwrap();
    store
        .save_office_link(&OfficeLink {
            url: server.url.clone(),
            token: token.clone(),
        })
        .unwrap();
    let link = store.office_link().unwrap();
    let summary = Device::new(&link.url, &link.token)
        .unwrap()
        .sync(&mut store)
        .unwrap();
    assert!(summary.settings_taken, "{summary:?}");
    assert_eq!(
        store.settings().unwrap().company,
        "Lantern Hill Inspections"
    );
    assert_eq!(store.settings().unwrap().license, "HI-4471");

    let id = store
        .create_inspection(&NewInspection {
            address: "9 Tanner Row, Fenwick, Marrow County".into(),
            date: "2026-11-30".into(),
            inspector_name: "Ana Ruiz".into(),
            ..Default::default()
        })
        .unwrap();
    let made = store.load_inspection(&id).unwrap();
    assert_eq!(made.code_edition, "IRC 2021");
    assert_eq!(made.inspector.license, "HI-4471");
    assert_eq!(made.inspector.company, "Lantern Hill Inspections");
    assert!(made.local_amendments.contains("middle third"));
    std::fs::remove_dir_all(&dir).ok();
}

#[test]
fn an_upload_cut_off_midway_is_stored_as_nothing_and_the_push_then_completes() {
    use std::io::Write;
    let server = start("sync_cut");
    let token = server.token("Ana Ruiz", Role::Inspector);
    let dir = temp_dir("cut");
    let (mut store, id) = device_with_demo(&dir);
    let outgoing = undercroft_sync::outgoing_revision(&store, &id).unwrap();
    let (sha, path) = outgoing
        .files
        .iter()
        .find(|(_, p)| p.to_string_lossy().contains("photos"))
        .unwrap();
    let bytes = std::fs::read(path).unwrap();
    // Half a body, then the connection closes.
    let address = server.url.trim_start_matches("http://");
    let mut stream = std::net::TcpStream::connect(address).unwrap();
    write!(
        stream,
        "PUT /api/v1/blobs/image/{sha} HTTP/1.1\r\nHost: {address}\r\nAuthorization: Bearer {token}\r\nContent-Length: {}\r\n\r\n",
        bytes.len()
    )
    .unwrap();
    stream.write_all(&bytes[..bytes.len() / 2]).unwrap();
    stream.shutdown(std::net::Shutdown::Both).unwrap();
    drop(stream);
    let device = Device::new(&server.url, &token).unwrap();
    assert_eq!(
        device.missing(std::slice::from_ref(sha)).unwrap(),
        vec![sha.clone()],
        "nothing kept of half a file"
    );
    let summary = device.sync(&mut store).unwrap();
    assert_eq!(summary.pushed, 1);
    assert!(device
        .missing(std::slice::from_ref(sha))
        .unwrap()
        .is_empty());
    let outcome = server.sql("SELECT count(*) FROM revisions");
    assert_eq!(outcome, ["1"]);
    std::fs::remove_dir_all(&dir).ok();
}

#[test]
fn pushing_the_same_revision_twice_is_answered_as_already_there() {
    let server = start("sync_twice");
    let token = server.token("Ana Ruiz", Role::Inspector);
    let dir = temp_dir("twice");
    let (mut store, id) = device_with_demo(&dir);
    let device = Device::new(&server.url, &token).unwrap();
    let outgoing = undercroft_sync::outgoing_revision(&store, &id).unwrap();
    let request = undercroft_sync::PushRequest {
        manifest: outgoing.manifest.clone(),
        based_on: None,
        device: store.device_id().unwrap(),
    };
    let read = |sha: &str| std::fs::read(&outgoing.files[sha]);
    let (first, _, _) = device.push_revision(&id, &request, read).unwrap();
    let (second, files, _) = device.push_revision(&id, &request, read).unwrap();
    assert_eq!(first.outcome, PushOutcome::New);
    assert_eq!(second.outcome, PushOutcome::AlreadyThere);
    assert_eq!((second.revision, files), (first.revision, 0));
    assert_eq!(server.sql("SELECT count(*) FROM revisions"), ["1"]);
    assert_eq!(server.sql("SELECT count(*) FROM deliveries"), ["1"]);
    std::fs::remove_dir_all(&dir).ok();
}

fn walk_files(root: &std::path::Path) -> Vec<std::path::PathBuf> {
    let mut out = Vec::new();
    for entry in std::fs::read_dir(root).unwrap().flatten() {
        let path = entry.path();
        if path.is_dir() && path.file_name().is_some_and(|n| n != "incoming") {
            out.extend(walk_files(&path));
        } else if path.is_file() {
            out.push(path);
        }
    }
    out
}
