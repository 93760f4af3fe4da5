//! A database of the first schema version, committed as `fixtures/store-v1.sqlite` (made by
//! `make-store-fixture` with version-1 SQL), and one of version 3 (`fixtures/store-v3.sqlite`,
//! the demo inspection as the version-3 code stored it), opened by the current code: each is
//! upgraded in place and every field survives.

use undercroft_engine::interchange::from_json;
use undercroft_store::{ListFilter, Store, SCHEMA_VERSION};
use undercroft_tests::repo_root;

#[test]
fn version_1_database_upgrades_with_every_field() {
    let dir = std::env::temp_dir().join(format!("undercroft-upgrade-{}", std::process::id()));
    std::fs::create_dir_all(&dir).unwrap();
    let db = dir.join("undercroft.sqlite");
    std::fs::copy(repo_root().join("tests/fixtures/store-v1.sqlite"), &db).unwrap();
    let before: i64 = rusqlite::Connection::open(&db)
        .unwrap()
        .query_row("PRAGMA user_version", [], |r| r.get(0))
        .unwrap();
    assert_eq!(before, 1);

    let store = Store::open(&db).unwrap();
    let after: i64 = rusqlite::Connection::open(&db)
        .unwrap()
        .query_row("PRAGMA user_version", [], |r| r.get(0))
        .unwrap();
    assert_eq!(after, SCHEMA_VERSION);
    const {
        assert!(
            SCHEMA_VERSION >= 2,
            "the fixture must be older than the code"
        )
    };

    let expected = from_json(
        &std::fs::read_to_string(repo_root().join("tests/fixtures/store-v1-content.json")).unwrap(),
    )
    .unwrap();
    let loaded = store.load_inspection(&expected.id).unwrap();
    assert_eq!(
        loaded, expected,
        "every field of the version-1 rows survives"
    );

    // Row-level fields the model does not carry.
    let photos = store.photos_of_inspection(&expected.id).unwrap();
    assert_eq!(photos.len(), 3);
    assert!(photos
        .iter()
        .all(|p| p.width == Some(1600) && p.height == Some(1200)));
    assert_eq!(photos[1].caption, "Basement, looking north — 北");
    let listed = store.list_inspections(&ListFilter::default()).unwrap();
    assert_eq!(listed[0].updated_at, "2026-11-30T19:30:00.000Z");
    // The version 2 search key was filled by the upgrade, with Unicode lower case.
    let hits = store
        .list_inspections(&ListFilter {
            search: "ZOË ÅNGSTRÖM".into(),
            include_archived: false,
        })
        .unwrap();
    assert_eq!(hits.len(), 1);
    // Version 2 tables are there and usable.
    assert!(store.finding_notes(&expected.id).unwrap().is_empty());
    assert_eq!(store.integrity_check().unwrap(), "ok");
    drop(store);
    std::fs::remove_dir_all(&dir).ok();
}

#[test]
fn version_3_database_upgrades_and_takes_the_load_path() {
    use undercroft_engine::model::{GirderLine, Post};
    use undercroft_engine::units::Length;
    let dir = std::env::temp_dir().join(format!("undercroft-upgrade3-{}", std::process::id()));
    std::fs::create_dir_all(&dir).unwrap();
    let db = dir.join("undercroft.sqlite");
    std::fs::copy(repo_root().join("tests/fixtures/store-v3.sqlite"), &db).unwrap();
    let version = |db: &std::path::Path| -> i64 {
        rusqlite::Connection::open(db)
            .unwrap()
            .query_row("PRAGMA user_version", [], |r| r.get(0))
            .unwrap()
    };
    assert_eq!(version(&db), 3);
    let mut store = Store::open(&db).unwrap();
    assert_eq!(version(&db), SCHEMA_VERSION);
    const {
        assert!(
            SCHEMA_VERSION >= 4,
            "the fixture must be older than the code"
        )
    };

    let expected = from_json(
        &std::fs::read_to_string(repo_root().join("tests/fixtures/store-v3-content.json")).unwrap(),
    )
    .unwrap();
    let loaded = store.load_inspection(&expected.id).unwrap();
    assert_eq!(
        loaded, expected,
        "every field of the version-3 rows survives"
    );
    assert!(loaded.areas.iter().all(|a| a.girders.is_empty()));

    // The new tables take a girder line with a post, linked from a run.
    let area = loaded.areas[0].id.clone();
    let mut line = GirderLine::new("girder-after-upgrade", "Centre girder");
    line.length = Some(Length::feet(20.0));
    store.add_girder(&area, &line).unwrap();
    store
        .add_post(
            &line.id,
            &Post::new("post-after-upgrade", "Post 1", Length::feet(10.0)),
        )
        .unwrap();
    store
        .set_bears_on(&loaded.areas[0].runs[0].id, std::slice::from_ref(&line.id))
        .unwrap();
    let again = store.load_inspection(&expected.id).unwrap();
    assert_eq!(again.areas[0].girders[0].posts[0].label, "Post 1");
    assert_eq!(again.areas[0].runs[0].bears_on, [line.id.clone()]);
    assert_eq!(store.integrity_check().unwrap(), "ok");
    drop(store);
    std::fs::remove_dir_all(&dir).ok();
}
