//! Who may do what, checked on every request: unknown, malformed and revoked tokens refused;
//! an inspector reads and pushes only their own inspections; office staff read all and
//! manage settings and tokens; files under a name that is not their hash, bombs, garbage,
//! oversized bodies and revisions naming files the office lacks are refused in words.

mod common;

use common::*;
use undercroft_server::auth::Role;
use undercroft_store::content_hash;
use undercroft_sync::Office as Device;

#[test]
fn every_route_refuses_a_missing_wrong_or_revoked_token() {
    let server = start("access_tokens");
    let token = server.token("Ana Ruiz", Role::Inspector);
    let routes = [
        ("GET", "/api/v1/inspections"),
        ("GET", "/api/v1/inspections/x"),
        ("GET", "/api/v1/settings"),
        ("POST", "/api/v1/blobs/missing"),
        ("GET", "/api/v1/tokens"),
    ];
    let forged = format!("uct_{}_{}", "0".repeat(16), "1".repeat(64));
    let mut wrong_secret = token.clone();
    wrong_secret.replace_range(
        token.len() - 1..,
        if token.ends_with('0') { "1" } else { "0" },
    );
    for (method, path) in routes {
        let url = format!("{}{path}", server.url);
        for bad in [
            None,
            Some("nonsense"),
            Some(forged.as_str()),
            Some(wrong_secret.as_str()),
        ] {
            let (status, body) = call(method, &url, bad, Some(b"{\"hashes\":[]}".to_vec()));
            assert_eq!(status, 401, "{method} {path} with {bad:?}: {body}");
            assert!(body.contains("token"), "{body}");
        }
    }
    // A token that worked stops at once when revoked, though it was just checked.
    let list = format!("{}/api/v1/inspections", server.url);
    assert_eq!(call("GET", &list, Some(&token), None).0, 200);
    let id = &token[4..20];
    assert!(server
        .runtime
        .block_on(server.office.revoke_token(id))
        .unwrap());
    assert_eq!(call("GET", &list, Some(&token), None).0, 401);
    // The database keeps only the Argon2id hash.
    let stored = server.sql(&format!("SELECT secret_hash FROM tokens WHERE id = '{id}'"));
    assert!(stored[0].starts_with("$argon2id$"), "{stored:?}");
    assert!(!stored[0].contains(&token[21..]));
}

#[test]
fn an_inspector_sees_and_pushes_only_their_own_and_the_office_sees_all() {
    let server = start("access_roles");
    let ana = server.token("Ana Ruiz", Role::Inspector);
    let ben = server.token("Ben Okafor", Role::Inspector);
    let desk = server.token("Front Desk", Role::Office);
    let dir = temp_dir("roles");
    let (mut store, id) = device_with_demo(&dir);
    Device::new(&server.url, &ana)
        .unwrap()
        .sync(&mut store)
        .unwrap();
    let report = store.reports(&id).unwrap()[0].id.clone();

    let inspection = format!("{}/api/v1/inspections/{id}", server.url);
    let pdf = format!("{inspection}/reports/{report}");
    let list = format!("{}/api/v1/inspections", server.url);
    assert_eq!(call("GET", &inspection, Some(&ana), None).0, 200);
    assert_eq!(call("GET", &inspection, Some(&desk), None).0, 200);
    assert_eq!(call("GET", &pdf, Some(&desk), None).0, 200);
    let (status, body) = call("GET", &inspection, Some(&ben), None);
    assert_eq!(status, 404, "{body}");
    assert_eq!(call("GET", &pdf, Some(&ben), None).0, 404);
    assert!(call("GET", &list, Some(&ben), None).1.trim() == "[]");
    assert!(call("GET", &list, Some(&desk), None).1.contains(&id));

    // Ben's device holding Ana's inspection (a bundle passed along) may not push it.
    let bundle = dir.join("passed-along.zip");
    store.export_bundle(&id, &bundle).unwrap();
    let ben_dir = temp_dir("ben");
    let mut bens = undercroft_store::Store::open(&ben_dir.join("d.sqlite")).unwrap();
    bens.import_bundle(&bundle).unwrap();
    bens.record_report(&id, "Report.pdf", &tiny_pdf("ben"), "[]", "")
        .unwrap();
    let summary = Device::new(&server.url, &ben)
        .unwrap()
        .sync(&mut bens)
        .unwrap();
    assert_eq!(summary.pushed, 0);
    assert_eq!(summary.refused.len(), 1, "{summary:?}");
    assert!(
        summary.refused[0].1.contains("another inspector"),
        "{summary:?}"
    );
    assert_eq!(server.sql("SELECT count(*) FROM revisions"), ["1"]);

    // Settings and tokens are the office's.
    let settings = format!("{}/api/v1/settings", server.url);
    let firm = br#"{"company":"Lantern Hill Inspections"}"#.to_vec();
    assert_eq!(
        call("PUT", &settings, Some(&ana), Some(firm.clone())).0,
        403
    );
    assert_eq!(call("PUT", &settings, Some(&desk), Some(firm)).0, 200);
    let tokens = format!("{}/api/v1/tokens", server.url);
    let new = br#"{"name":"Cara Lind","role":"office"}"#.to_vec();
    assert_eq!(call("POST", &tokens, Some(&ana), Some(new.clone())).0, 403);
    let (status, body) = call("POST", &tokens, Some(&desk), Some(new));
    assert_eq!(status, 200, "{body}");
    let issued: serde_json::Value = serde_json::from_str(&body).unwrap();
    let cara = issued["token"].as_str().unwrap();
    assert_eq!(call("GET", &list, Some(cara), None).0, 200);
    let (status, body) = call(
        "PUT",
        &settings,
        Some(&desk),
        Some(br#"{"code_edition":"IRC 1990"}"#.to_vec()),
    );
    assert_eq!(status, 422, "{body}");
    assert!(body.contains("IRC 1990"), "{body}");
    for d in [dir, ben_dir] {
        std::fs::remove_dir_all(d).ok();
    }
}

#[test]
fn planted_hashes_bombs_garbage_and_oversized_bodies_are_refused() {
    let server = start("access_hostile");
    let token = server.token("Ana Ruiz", Role::Inspector);
    let put = |kind: &str, name: &str, bytes: Vec<u8>| {
        call(
            "PUT",
            &format!("{}/api/v1/blobs/{kind}/{name}", server.url),
            Some(&token),
            Some(bytes),
        )
    };
    let real = photo(7, 64, 48);
    // Bytes under another file's name.
    let other = content_hash(b"some other picture");
    let (status, body) = put("image", &other, real.clone());
    assert_eq!(status, 422, "{body}");
    assert!(body.contains("SHA-256"), "{body}");
    // A header claiming 60000 x 60000 px.
    let mut bomb = real.clone();
    let sof = bomb.windows(2).position(|w| w == [0xFF, 0xC0]).unwrap();
    bomb[sof + 5..sof + 7].copy_from_slice(&60_000u16.to_be_bytes());
    bomb[sof + 7..sof + 9].copy_from_slice(&60_000u16.to_be_bytes());
    let (status, body) = put("image", &content_hash(&bomb), bomb);
    assert_eq!(status, 422, "{body}");
    // Garbage as a photo, a photo as a PDF, a name that is not a hash, a kind that is not one.
    let garbage = b"\x00\x01garbage".to_vec();
    assert_eq!(put("image", &content_hash(&garbage), garbage).0, 422);
    assert_eq!(put("pdf", &content_hash(&real), real.clone()).0, 422);
    assert_eq!(put("image", "..%2F..%2Fetc%2Fpasswd", real.clone()).0, 400);
    assert_eq!(put("script", &content_hash(&real), real.clone()).0, 404);
    // Over the limit: a body larger than a photo may be.
    let huge = vec![0xFFu8; (undercroft_sync::blob::MAX_IMAGE_BYTES + 1) as usize];
    let (status, body) = put("image", &content_hash(&huge), huge);
    assert_eq!(status, 413, "{body}");
    assert_eq!(
        server.sql("SELECT count(*) FROM blobs"),
        ["0"],
        "nothing refused was kept"
    );

    // A revision whose JSON is over its limit.
    let revisions = format!("{}/api/v1/inspections/x/revisions", server.url);
    let big = vec![b' '; undercroft_server::MAX_REVISION_BYTES + 10];
    assert_eq!(call("POST", &revisions, Some(&token), Some(big)).0, 413);
    // A revision naming files the office lacks, and one whose id is not the path's.
    let dir = temp_dir("hostile");
    let (mut store, id) = device_with_demo(&dir);
    let outgoing = undercroft_sync::outgoing_revision(&store, &id).unwrap();
    let request = undercroft_sync::PushRequest {
        manifest: outgoing.manifest.clone(),
        based_on: None,
        device: store.device_id().unwrap(),
    };
    let body = serde_json::to_vec(&request).unwrap();
    let url = format!("{}/api/v1/inspections/{id}/revisions", server.url);
    let (status, answer) = call("POST", &url, Some(&token), Some(body.clone()));
    assert_eq!(status, 409, "{answer}");
    let missing: serde_json::Value = serde_json::from_str(&answer).unwrap();
    assert_eq!(
        missing["missing"].as_array().unwrap().len(),
        outgoing.files.len()
    );
    let elsewhere = format!("{}/api/v1/inspections/someone-else/revisions", server.url);
    assert_eq!(call("POST", &elsewhere, Some(&token), Some(body)).0, 422);
    // A manifest that names a PDF's hash as a photo is refused once the files are there.
    Device::new(&server.url, &token)
        .unwrap()
        .sync(&mut store)
        .unwrap();
    let mut mixed = request.clone();
    let pdf_hash = mixed.manifest.reports[0].sha256.clone();
    mixed.manifest.images[0].report_sha256 = pdf_hash;
    let (status, answer) = call(
        "POST",
        &url,
        Some(&token),
        Some(serde_json::to_vec(&mixed).unwrap()),
    );
    assert_eq!(status, 422, "{answer}");
    // Not JSON at all.
    assert_eq!(
        call("POST", &url, Some(&token), Some(b"{not json".to_vec())).0,
        400
    );
    std::fs::remove_dir_all(&dir).ok();
}
