//! Store tests: inspections, edits, photos, bundles, and refusing bad databases and files.

use super::*;
use std::path::PathBuf;
use undercroft_engine::model::*;
use undercroft_photo::test_images::{camera_jpeg, png_claiming, upright_scene};

struct Temp(PathBuf);

impl Temp {
    fn new(name: &str) -> Temp {
        let dir = std::env::temp_dir().join(format!(
            "undercroft-store-{name}-{}-{}",
            std::process::id(),
            new_id()
        ));
        std::fs::create_dir_all(&dir).unwrap();
        Temp(dir)
    }
    fn db(&self) -> PathBuf {
        self.0.join("undercroft.sqlite")
    }
}

impl Drop for Temp {
    fn drop(&mut self) {
        std::fs::remove_dir_all(&self.0).ok();
    }
}

/// The demo inspection without its photo references: these tests add their own photos.
fn demo() -> Inspection {
    let mut demo: Inspection = undercroft_engine::interchange::demo();
    demo.photos.clear();
    demo
}

fn files_in(dir: &std::path::Path) -> usize {
    walk(dir).len()
}

fn walk(dir: &std::path::Path) -> Vec<PathBuf> {
    let mut out = Vec::new();
    for entry in std::fs::read_dir(dir).into_iter().flatten().flatten() {
        let p = entry.path();
        if p.is_dir() {
            out.extend(walk(&p));
        } else {
            out.push(p);
        }
    }
    out
}

#[test]
fn create_list_search_rename_archive_delete() {
    let t = Temp::new("list");
    let mut store = Store::open(&t.db()).unwrap();
    let new = |address: &str, client: &str| NewInspection {
        address: address.into(),
        client_name: client.into(),
        date: "2026-12-01".into(),
        ..Default::default()
    };
    let a = store
        .create_inspection(&new("12 Birch Lane", "Ada Park"))
        .unwrap();
    let b = store
        .create_inspection(&new("7 Ángel Street", "Nguyễn Thị Zoë"))
        .unwrap();
    let list = store.list_inspections(&ListFilter::default()).unwrap();
    assert_eq!(
        list.iter().map(|s| s.id.as_str()).collect::<Vec<_>>(),
        [b.as_str(), a.as_str()],
        "newest first"
    );
    let find = |store: &Store, q: &str| {
        store
            .list_inspections(&ListFilter {
                search: q.into(),
                include_archived: false,
            })
            .unwrap()
    };
    assert_eq!(find(&store, "birch").len(), 1);
    assert_eq!(
        find(&store, "ÁNGEL")[0].id,
        b,
        "non-Latin search folds case"
    );
    assert_eq!(find(&store, "nguyễn")[0].id, b);
    assert_eq!(find(&store, "100%").len(), 0, "LIKE wildcards are literal");
    store.rename_inspection(&a, "14 Birch Lane").unwrap();
    assert_eq!(find(&store, "14 birch")[0].id, a);
    assert_eq!(
        store.list_inspections(&ListFilter::default()).unwrap()[0].id,
        a,
        "a change moves it to the top"
    );
    assert!(!store.is_archived(&a).unwrap());
    store.archive_inspection(&a, true).unwrap();
    assert!(store.is_archived(&a).unwrap());
    assert_eq!(
        store
            .list_inspections(&ListFilter::default())
            .unwrap()
            .len(),
        1
    );
    assert!(
        store
            .list_inspections(&ListFilter {
                include_archived: true,
                ..Default::default()
            })
            .unwrap()[0]
            .archived
    );
    store.delete_inspection(&a).unwrap();
    assert!(matches!(
        store.load_inspection(&a),
        Err(StoreError::NotFound(_))
    ));
    assert!(matches!(
        store.delete_inspection(&a),
        Err(StoreError::NotFound(_))
    ));
    let header = store.load_inspection(&b).unwrap();
    assert_eq!(header.client.name, "Nguyễn Thị Zoë");
    assert_eq!(header.code_edition, "IRC 2018");
}

#[test]
fn json_import_and_export_round_trip_exactly_and_twice_is_once() {
    let t = Temp::new("json");
    let mut store = Store::open(&t.db()).unwrap();
    let demo = demo();
    let first = store.import_inspection(&demo).unwrap();
    assert!(!first.replaced);
    assert_eq!(store.export_inspection(&demo.id).unwrap(), demo);
    let again = store.import_inspection(&demo).unwrap();
    assert!(again.replaced);
    assert_eq!(
        store
            .list_inspections(&ListFilter::default())
            .unwrap()
            .len(),
        1
    );
    assert_eq!(
        undercroft_engine::interchange::to_json(&store.export_inspection(&demo.id).unwrap()),
        undercroft_engine::interchange::to_json(&demo)
    );
    // Findings come straight from the engine on what the store loads.
    let findings = undercroft_engine::evaluate(&store.load_inspection(&demo.id).unwrap());
    assert_eq!(findings, undercroft_engine::evaluate(&demo));
}

#[test]
fn edits_inside_an_inspection() {
    let t = Temp::new("edits");
    let mut store = Store::open(&t.db()).unwrap();
    let id = store
        .create_inspection(&NewInspection {
            address: "1 Elm".into(),
            date: "2026-12-01".into(),
            ..Default::default()
        })
        .unwrap();
    let area = Area {
        id: new_id(),
        name: "Crawlspace".into(),
        kind: AreaKind::Crawlspace,
        loads: Default::default(),
        runs: vec![],
        members: vec![],
        girders: vec![],
        conditions: Default::default(),
        notes: String::new(),
    };
    store.add_area(&id, &area).unwrap();
    let run = JoistRun {
        id: new_id(),
        label: "Run 1".into(),
        framing: Framing::default(),
        observations: vec![],
        joists: vec![],
        bears_on: vec![],
    };
    store.add_run(&area.id, &run).unwrap();
    let framing = Framing {
        species: Some(undercroft_engine::lumber::Species::SprucePineFir),
        grade: Some(undercroft_engine::lumber::GradeChoice::Stamped(
            undercroft_engine::lumber::Grade::No2,
        )),
        size: Some(undercroft_engine::lumber::NominalSize::new(2, 10)),
        spacing: Some(undercroft_engine::units::Length::inches(16.0)),
        clear_span: Some(undercroft_engine::units::Length::inches(192.0)),
        ..Default::default()
    };
    store.update_run(&run.id, "Kitchen run", &framing).unwrap();
    let joist = Joist {
        id: new_id(),
        label: "Joist 3".into(),
        at: None,
        framing: Framing::default(),
        observations: vec![],
    };
    store.add_joist(&run.id, &joist).unwrap();
    let notch = Observation {
        id: new_id().into(),
        kind: ObservationKind::Notch {
            edge: Edge::Bottom,
            depth: undercroft_engine::units::Length::inches(2.0),
            length: undercroft_engine::units::Length::inches(3.0),
            at_end: false,
            from_support: Some(undercroft_engine::units::Length::inches(36.0)),
            end: End::A,
        },
        note: "for a drain".into(),
    };
    store.add_observation(&joist.id, &notch).unwrap();
    let moisture = Observation {
        id: new_id().into(),
        kind: ObservationKind::Moisture {
            percent: 14.0,
            location: String::new(),
        },
        note: String::new(),
    };
    store.add_observation(&run.id, &moisture).unwrap();
    let member = Member {
        id: new_id(),
        label: "Header".into(),
        framing: framing.clone(),
        observations: vec![],
    };
    store.add_member(&area.id, &member).unwrap();

    let loaded = store.load_inspection(&id).unwrap();
    let r = &loaded.areas[0].runs[0];
    assert_eq!((r.label.as_str(), &r.framing), ("Kitchen run", &framing));
    assert_eq!(r.observations, std::slice::from_ref(&moisture));
    assert_eq!(r.joists[0].observations, std::slice::from_ref(&notch));
    assert_eq!(loaded.areas[0].members[0].label, "Header");
    let statuses: Vec<_> = undercroft_engine::evaluate(&loaded)
        .findings
        .iter()
        .map(|f| (f.rule_id(), f.status))
        .collect();
    assert!(
        statuses.contains(&("sawn-notch", undercroft_engine::Status::OverLimit)),
        "{statuses:?}"
    );

    let mut changed = notch.clone();
    changed.note = "drain line, 2 in PVC".into();
    store.update_observation(&changed).unwrap();
    let second = Joist {
        id: new_id(),
        label: "Joist 9".into(),
        at: Some(undercroft_engine::units::Length::inches(144.0)),
        framing: Framing::default(),
        observations: vec![],
    };
    store.add_joist(&run.id, &second).unwrap();
    store.move_to(&second.id, 0).unwrap();
    let loaded = store.load_inspection(&id).unwrap();
    let labels: Vec<_> = loaded.areas[0].runs[0]
        .joists
        .iter()
        .map(|j| j.label.as_str())
        .collect();
    assert_eq!(labels, ["Joist 9", "Joist 3"]);
    let placed: Vec<_> = loaded.areas[0].runs[0]
        .joists
        .iter()
        .map(|j| j.at.map(|l| l.in_inches()))
        .collect();
    assert_eq!(
        placed,
        [Some(144.0), None],
        "a walked joist keeps its place"
    );
    let again = undercroft_engine::interchange::from_json(
        &undercroft_engine::interchange::to_json(&loaded),
    )
    .unwrap();
    assert_eq!(again, loaded, "and so does its file");
    assert_eq!(
        loaded.areas[0].runs[0].joists[1].observations[0].note,
        "drain line, 2 in PVC"
    );
    store.remove(&joist.id).unwrap();
    let loaded = store.load_inspection(&id).unwrap();
    assert_eq!(loaded.areas[0].runs[0].joists.len(), 1);
    assert!(matches!(
        store.remove("no-such-id"),
        Err(StoreError::NotFound(_))
    ));
    assert!(matches!(
        store.add_observation(&area.id, &moisture),
        Err(StoreError::Invalid(_))
    ));
}

#[test]
fn a_newer_database_is_refused_untouched_and_garbage_is_refused() {
    let t = Temp::new("versions");
    drop(Store::open(&t.db()).unwrap());
    {
        let conn = rusqlite::Connection::open(t.db()).unwrap();
        conn.pragma_update(None, "journal_mode", "DELETE").unwrap();
        conn.pragma_update(None, "user_version", 99).unwrap();
    }
    let before = std::fs::read(t.db()).unwrap();
    let err = Store::open(&t.db()).err().expect("refused");
    assert!(matches!(err, StoreError::TooNew { found: 99, .. }), "{err}");
    assert!(err.to_string().contains("update the app"));
    assert_eq!(std::fs::read(t.db()).unwrap(), before, "left untouched");

    let garbage = t.0.join("garbage.sqlite");
    std::fs::write(&garbage, b"this is not a database, just text pretending to be one ....................................................................").unwrap();
    let err = Store::open(&garbage).err().expect("refused");
    assert!(matches!(err, StoreError::NotADatabase(..)), "{err}");

    let cut = t.0.join("cut.sqlite");
    let full = std::fs::read(t.db()).unwrap();
    std::fs::write(&cut, &full[..full.len() / 3]).unwrap();
    assert!(
        Store::open(&cut).is_err(),
        "a truncated database is refused"
    );
}

#[test]
fn photos_are_stored_once_ordered_and_swept() {
    let t = Temp::new("photos");
    let mut store = Store::open(&t.db()).unwrap();
    let demo = demo();
    store.import_inspection(&demo).unwrap();
    let jpeg = camera_jpeg(&upright_scene(2000, 1500), 6);
    let first = store
        .add_photo("obs-k7-notch", &jpeg, "notch, near")
        .unwrap();
    let second = store
        .add_photo("obs-k7-notch", &jpeg, "same photo again")
        .unwrap();
    let other = store
        .add_photo(
            "obs-k7-notch",
            &camera_jpeg(&upright_scene(1000, 800), 1),
            "another",
        )
        .unwrap();
    let photos = store.photos_of("obs-k7-notch").unwrap();
    assert_eq!(
        photos.iter().map(|p| p.id.as_str()).collect::<Vec<_>>(),
        [first.id.as_str(), second.id.as_str(), other.id.as_str()]
    );
    assert_eq!(photos[0].hash, photos[1].hash);
    assert_eq!(
        (photos[0].width, photos[0].height),
        (Some(960), Some(1280)),
        "upright: portrait"
    );
    // Two distinct photos: three files each (report, thumbnail, original).
    assert_eq!(files_in(store.photo_dir()), 6);
    let report = std::fs::read(photos[0].report_path.as_ref().unwrap()).unwrap();
    assert!(!undercroft_photo::test_images::has_app1(&report));
    assert_eq!(
        std::fs::read(photos[0].original_path.as_ref().unwrap()).unwrap(),
        jpeg,
        "original kept unchanged"
    );

    store.move_to(&other.id, 0).unwrap();
    store
        .set_photo_caption(&first.id, "notch, 2 in deep")
        .unwrap();
    let photos = store.photos_of("obs-k7-notch").unwrap();
    assert_eq!(photos[0].id, other.id);
    assert_eq!(photos[1].caption, "notch, 2 in deep");

    store.remove(&first.id).unwrap();
    assert_eq!(
        files_in(store.photo_dir()),
        6,
        "still used by the second photo"
    );
    store.remove(&second.id).unwrap();
    assert_eq!(
        files_in(store.photo_dir()),
        6,
        "kept for the grace period: another process may be about to commit a row for them"
    );
    store
        .sweep_orphans_older_than(std::time::Duration::ZERO)
        .unwrap();
    assert_eq!(
        files_in(store.photo_dir()),
        3,
        "swept when no photo uses them"
    );

    // A stray file and a half-written temporary are swept when the store opens, once older
    // than the grace period; a young one (another process's, not committed yet) stays.
    let stray = store
        .photo_dir()
        .join("report")
        .join(format!("{}.jpg", "ab".repeat(32)));
    let tmp = store.photo_dir().join("thumb").join("x.jpg.tmp-1");
    let young = store
        .photo_dir()
        .join("report")
        .join(format!("{}.jpg", "cd".repeat(32)));
    let two_hours_ago = std::time::SystemTime::now() - std::time::Duration::from_secs(7200);
    for path in [&stray, &tmp, &young] {
        std::fs::write(path, b"x").unwrap();
    }
    for path in [&stray, &tmp] {
        std::fs::File::options()
            .append(true)
            .open(path)
            .unwrap()
            .set_modified(two_hours_ago)
            .unwrap();
    }
    let dir = store.photo_dir().to_path_buf();
    drop(store);
    let store = Store::open(&t.db()).unwrap();
    assert!(!stray.exists() && !tmp.exists() && young.exists());
    assert_eq!(files_in(&dir), 4);
    assert_eq!(store.photos_of("obs-k7-notch").unwrap().len(), 1);
}

#[test]
fn a_photo_already_stored_is_found_by_its_hash_and_made_again_when_its_images_are_gone() {
    let t = Temp::new("photo-again");
    let mut store = Store::open(&t.db()).unwrap();
    store.import_inspection(&demo()).unwrap();
    let jpeg = camera_jpeg(&upright_scene(1200, 900), 6);
    store.add_photo("obs-k7-notch", &jpeg, "first").unwrap();
    let first = store.photos_of("obs-k7-notch").unwrap().remove(0);
    let report = first.report_path.clone().unwrap();
    let made = std::fs::read(&report).unwrap();
    assert!(first.width.is_some() && first.height.is_some());
    // Again: the stored images serve, with their size.
    store.add_photo("area-crawl", &jpeg, "again").unwrap();
    let again = store.photos_of("area-crawl").unwrap().remove(0);
    assert_eq!(
        (again.hash.as_ref(), again.width, again.height),
        (first.hash.as_ref(), first.width, first.height)
    );
    assert_eq!(files_in(store.photo_dir()), 3, "one set of files");
    // With its report image gone, the photo is made again from its bytes.
    std::fs::remove_file(&report).unwrap();
    store.add_photo("area-crawl", &jpeg, "third").unwrap();
    assert_eq!(std::fs::read(&report).unwrap(), made);
    // An empty file is said to be empty.
    let empty = store.add_photo("area-crawl", b"", "nothing").unwrap_err();
    assert!(empty.to_string().contains("empty"), "{empty}");
}

#[test]
fn bad_photos_store_nothing() {
    let t = Temp::new("badphotos");
    let mut store = Store::open(&t.db()).unwrap();
    store.import_inspection(&demo()).unwrap();
    let good = camera_jpeg(&upright_scene(1200, 900), 1);
    let cases: Vec<(&str, Vec<u8>)> = vec![
        ("empty", vec![]),
        ("text", b"hello".to_vec()),
        ("truncated", good[..good.len() / 2].to_vec()),
        ("bomb", png_claiming(30_000, 30_000)),
        ("heic", b"\0\0\0\x18ftypheic\0\0\0\0mif1heic".to_vec()),
        ("huge", vec![0xFF; 200 * 1024 * 1024]),
    ];
    for (name, bytes) in cases {
        let err = store
            .add_photo("obs-k7-notch", &bytes, name)
            .err()
            .unwrap_or_else(|| panic!("{name} accepted"));
        assert!(matches!(err, StoreError::Photo(_)), "{name}: {err}");
    }
    assert!(store.photos_of("obs-k7-notch").unwrap().is_empty());
    assert_eq!(files_in(store.photo_dir()), 0);
    assert!(matches!(
        store.add_photo("nowhere", &good, ""),
        Err(StoreError::NotFound(_))
    ));
}

#[test]
fn originals_can_be_turned_off() {
    let t = Temp::new("noorig");
    let mut store = Store::open(&t.db()).unwrap();
    store.import_inspection(&demo()).unwrap();
    store.set_keep_originals(KeepOriginals::No);
    store
        .add_photo("area-crawl", &camera_jpeg(&upright_scene(900, 600), 1), "")
        .unwrap();
    assert_eq!(files_in(store.photo_dir()), 2);
    assert!(store.photos_of("area-crawl").unwrap()[0]
        .original_path
        .is_none());
}

#[test]
fn bundles_round_trip_and_import_once() {
    let t = Temp::new("bundle");
    let mut store = Store::open(&t.db()).unwrap();
    let demo = demo();
    store.import_inspection(&demo).unwrap();
    // The demo's own photo references have no images; replace them with real photos.
    let mut plain = demo.clone();
    plain.photos.clear();
    store.import_inspection(&plain).unwrap();
    let notch_photo = store
        .add_photo(
            "obs-k7-notch",
            &camera_jpeg(&upright_scene(1800, 1200), 3),
            "notch",
        )
        .unwrap();
    // Marks drawn on it travel with it, as their own layer.
    let marks = vec![
        undercroft_engine::model::PhotoMark::Arrow {
            from: [0.2, 0.2],
            to: [0.45, 0.5],
        },
        undercroft_engine::model::PhotoMark::Dimension {
            from: [0.3, 0.7],
            to: [0.6, 0.7],
            label: "2\"".into(),
        },
    ];
    store.set_photo_marks(&notch_photo.id, &marks).unwrap();
    let bad = [undercroft_engine::model::PhotoMark::Circle {
        centre: [0.5, 0.5],
        radius: -1.0,
    }];
    assert!(store.set_photo_marks(&notch_photo.id, &bad).is_err());
    assert_eq!(store.photo_marks(&notch_photo.id).unwrap(), marks);
    store
        .add_photo(
            "area-base",
            &undercroft_photo::test_images::png(&upright_scene(640, 480)),
            "basement",
        )
        .unwrap();
    store
        .set_finding_note(
            &demo.id,
            &FindingNote {
                key: "sawn-notch/joist-k7/obs-k7-notch".into(),
                note: "seen from the hatch".into(),
                priority: Some(undercroft_engine::priority::Priority::OwnerWatch),
                ..Default::default()
            },
        )
        .unwrap();
    let bundle = t.0.join("demo.zip");
    store.export_bundle(&demo.id, &bundle).unwrap();

    let other = Temp::new("bundle-in");
    let mut fresh = Store::open(&other.db()).unwrap();
    let outcome = fresh.import_bundle(&bundle).unwrap();
    assert_eq!((outcome.replaced, outcome.photos), (false, 2));
    assert_eq!(
        fresh.export_inspection(&demo.id).unwrap(),
        store.export_inspection(&demo.id).unwrap()
    );
    assert_eq!(fresh.photo_marks(&notch_photo.id).unwrap(), marks);
    assert_eq!(
        fresh.finding_notes(&demo.id).unwrap(),
        store.finding_notes(&demo.id).unwrap()
    );
    let (a, b) = (
        store.photos_of_inspection(&demo.id).unwrap(),
        fresh.photos_of_inspection(&demo.id).unwrap(),
    );
    for (x, y) in a.iter().zip(&b) {
        assert_eq!((x.width, x.height, &x.hash), (y.width, y.height, &y.hash));
        for (p, q) in [
            (&x.report_path, &y.report_path),
            (&x.thumb_path, &y.thumb_path),
            (&x.original_path, &y.original_path),
        ] {
            assert_eq!(
                std::fs::read(p.as_ref().unwrap()).unwrap(),
                std::fs::read(q.as_ref().unwrap()).unwrap()
            );
        }
    }
    let again = fresh.import_bundle(&bundle).unwrap();
    assert!(again.replaced);
    assert_eq!(
        fresh
            .list_inspections(&ListFilter::default())
            .unwrap()
            .len(),
        1
    );
    assert_eq!(fresh.photos_of_inspection(&demo.id).unwrap().len(), 2);
    assert_eq!(fresh.finding_notes(&demo.id).unwrap().len(), 1);
    assert_eq!(files_in(fresh.photo_dir()), 6);
}

fn zip_of(entries: &[(&str, &[u8])], method: zip::CompressionMethod) -> Vec<u8> {
    use std::io::Write;
    let mut zip = zip::ZipWriter::new(std::io::Cursor::new(Vec::new()));
    for (name, bytes) in entries {
        zip.start_file(
            *name,
            zip::write::SimpleFileOptions::default().compression_method(method),
        )
        .unwrap();
        zip.write_all(bytes).unwrap();
    }
    zip.finish().unwrap().into_inner()
}

#[test]
fn hostile_bundles_are_refused_and_store_nothing() {
    let t = Temp::new("hostile");
    let mut store = Store::open(&t.db()).unwrap();
    let json = undercroft_engine::interchange::to_json(&demo());
    let hash = "ab".repeat(32);
    let zeros = vec![0u8; 80 * 1024 * 1024];
    let cases: Vec<(&str, Vec<u8>)> = vec![
        ("not a zip", b"PK but not really".to_vec()),
        (
            "path escape",
            zip_of(
                &[
                    ("inspection.json", json.as_bytes()),
                    ("../../evil.sh", b"rm -rf /"),
                ],
                zip::CompressionMethod::Stored,
            ),
        ),
        (
            "absolute path",
            zip_of(&[("/etc/passwd", b"x")], zip::CompressionMethod::Stored),
        ),
        (
            "bad hash name",
            zip_of(&[("photos/../x.jpg", b"x")], zip::CompressionMethod::Stored),
        ),
        (
            "no inspection",
            zip_of(&[("notes.json", b"[]")], zip::CompressionMethod::Stored),
        ),
        (
            "deflate bomb",
            zip_of(
                &[
                    ("inspection.json", json.as_bytes()),
                    (&format!("photos/{hash}.jpg"), &zeros),
                ],
                zip::CompressionMethod::Deflated,
            ),
        ),
        (
            "not a jpeg",
            zip_of(
                &[
                    ("inspection.json", json.as_bytes()),
                    (&format!("photos/{hash}.jpg"), b"GIF89a"),
                ],
                zip::CompressionMethod::Stored,
            ),
        ),
        (
            "bad json",
            zip_of(
                &[("inspection.json", b"{\"format\": 3}")],
                zip::CompressionMethod::Stored,
            ),
        ),
    ];
    for (name, bytes) in cases {
        let path = t.0.join("hostile.zip");
        std::fs::write(&path, &bytes).unwrap();
        let err = store
            .import_bundle(&path)
            .err()
            .unwrap_or_else(|| panic!("{name} accepted"));
        assert!(!err.to_string().is_empty(), "{name}");
    }
    assert!(store
        .list_inspections(&ListFilter {
            include_archived: true,
            ..Default::default()
        })
        .unwrap()
        .is_empty());
    assert_eq!(files_in(store.photo_dir()), 0);
}

#[test]
fn notes_and_reports() {
    let t = Temp::new("notes");
    let mut store = Store::open(&t.db()).unwrap();
    let demo = demo();
    store.import_inspection(&demo).unwrap();
    let note = FindingNote {
        key: "wood-damage/run-family/obs-family-decay".into(),
        note: String::new(),
        recommendation: None,
        not_applicable_reason: Some("Sill replaced last month; photo from the seller".into()),
        priority: Some(undercroft_engine::priority::Priority::ContractorSoon),
    };
    store.set_finding_note(&demo.id, &note).unwrap();
    assert_eq!(
        store.finding_notes(&demo.id).unwrap(),
        std::slice::from_ref(&note)
    );
    store
        .set_finding_note(
            &demo.id,
            &FindingNote {
                key: note.key.clone(),
                ..Default::default()
            },
        )
        .unwrap();
    assert!(store.finding_notes(&demo.id).unwrap().is_empty());
    let r = store
        .record_report(
            &demo.id,
            "report.pdf",
            b"%PDF-1.7 ...",
            "[]",
            " Zoë Ångström-Nguyễn <zoe@example.org> ",
        )
        .unwrap();
    assert_eq!(r.sha256.len(), 64);
    assert_eq!(r.recipient, "Zoë Ångström-Nguyễn <zoe@example.org>");
    assert_eq!(store.reports(&demo.id).unwrap(), [r]);
    assert_eq!(store.integrity_check().unwrap(), "ok");
}

#[test]
fn girder_lines_and_posts_are_edited_in_place() {
    use undercroft_engine::model::{GirderLine, Post, PostCondition, SiteConditions, SoilClass};
    use undercroft_engine::units::Length;
    let t = Temp::new("girders");
    let mut store = Store::open(&t.db()).unwrap();
    let demo = undercroft_engine::interchange::demo();
    store.import_inspection(&demo).unwrap();
    let area = demo.areas[0].id.clone();
    let mut line = GirderLine::new(new_id(), "Girder B");
    line.plies = Some(3);
    line.length = Some(Length::inches(240.0));
    store.add_girder(&area, &line).unwrap();
    let first = Post::new(new_id(), "Post 1", Length::inches(120.0));
    let mut second = Post::new(new_id(), "Post 2", Length::inches(60.0));
    store.add_post(&line.id, &first).unwrap();
    store.add_post(&line.id, &second).unwrap();
    second.conditions = vec![PostCondition::Shimmed];
    second.label = "Post 2, shimmed".into();
    store.update_post(&second).unwrap();
    store.move_to(&second.id, 0).unwrap();
    line.label = "Girder B (3-ply)".into();
    store.update_girder(&line).unwrap();
    let run = demo.areas[0].runs[0].id.clone();
    store
        .set_bears_on(&run, std::slice::from_ref(&line.id))
        .unwrap();
    let mut changed_area = demo.areas[0].clone();
    changed_area.conditions = SiteConditions {
        standing_water: Some(true),
        soil: Some(SoilClass::Sand),
        ..Default::default()
    };
    store.update_area(&changed_area).unwrap();

    let loaded = store.load_inspection(&demo.id).unwrap();
    let a = loaded.area(&area).unwrap();
    let g = a.girders.iter().find(|g| g.id == line.id).unwrap();
    assert_eq!(g.label, "Girder B (3-ply)");
    assert_eq!(g.plies, Some(3));
    let labels: Vec<&str> = g.posts.iter().map(|p| p.label.as_str()).collect();
    assert_eq!(labels, ["Post 2, shimmed", "Post 1"]);
    assert_eq!(g.posts[0].conditions, [PostCondition::Shimmed]);
    assert_eq!(a.runs[0].bears_on, [line.id.clone()]);
    assert_eq!(a.conditions.soil, Some(SoilClass::Sand));
    // The whole inspection survives a round trip through the store.
    assert_eq!(
        undercroft_engine::interchange::to_json(&store.export_inspection(&demo.id).unwrap()),
        undercroft_engine::interchange::to_json(&loaded)
    );

    // A post removed takes its photos; the girder removed takes its posts.
    store.remove(&first.id).unwrap();
    assert_eq!(
        store
            .load_inspection(&demo.id)
            .unwrap()
            .area(&area)
            .unwrap()
            .girders
            .iter()
            .find(|g| g.id == line.id)
            .unwrap()
            .posts
            .len(),
        1
    );
    store.remove(&line.id).unwrap();
    let n: i64 = store
        .conn
        .query_row(
            "SELECT COUNT(*) FROM posts WHERE girder_id = ?1",
            [&line.id],
            |r| r.get(0),
        )
        .unwrap();
    assert_eq!(n, 0);
}
