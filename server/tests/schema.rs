//! The office database's schema: made on first start, the same on the next, refused untouched
//! when newer than the server or when it holds another program's tables; two servers
//! starting on a new database together take turns.

mod common;

use common::temp_dir;
use undercroft_server::pg_cluster::test_database;
use undercroft_server::Office;

fn runtime() -> tokio::runtime::Runtime {
    tokio::runtime::Builder::new_multi_thread()
        .enable_all()
        .build()
        .unwrap()
}

#[test]
fn a_newer_schema_is_refused_and_left_as_it_was() {
    let db = test_database("schema_newer");
    let files = temp_dir("schema-newer");
    let rt = runtime();
    rt.block_on(async {
        let office = Office::open(&db.url, &files).await.unwrap();
        let client = office.pool.get().await.unwrap();
        client
            .execute(
                "INSERT INTO undercroft_schema (version, name) VALUES (99, 'from the future')",
                &[],
            )
            .await
            .unwrap();
        drop(client);
        drop(office);
        let refused = Office::open(&db.url, &files)
            .await
            .err()
            .expect("refused")
            .to_string();
        assert!(
            refused.contains("version 99, newer than this server"),
            "{refused}"
        );
        let (client, conn) = tokio_postgres::connect(&db.url, tokio_postgres::NoTls)
            .await
            .unwrap();
        tokio::spawn(conn);
        let max: i32 = client
            .query_one("SELECT max(version) FROM undercroft_schema", &[])
            .await
            .unwrap()
            .get(0);
        assert_eq!(max, 99);
    });
}

#[test]
fn another_programs_database_is_refused_untouched() {
    let db = test_database("schema_foreign");
    let files = temp_dir("schema-foreign");
    runtime().block_on(async {
        let (client, conn) = tokio_postgres::connect(&db.url, tokio_postgres::NoTls)
            .await
            .unwrap();
        tokio::spawn(conn);
        client
            .batch_execute("CREATE TABLE customers (id INT)")
            .await
            .unwrap();
        let refused = Office::open(&db.url, &files)
            .await
            .err()
            .expect("refused")
            .to_string();
        assert!(refused.contains("another program (customers)"), "{refused}");
        let ours: bool = client
            .query_one(
                "SELECT to_regclass('public.undercroft_schema') IS NOT NULL",
                &[],
            )
            .await
            .unwrap()
            .get(0);
        assert!(!ours, "nothing was created");
    });
}

#[test]
fn two_servers_starting_together_on_a_new_database_both_open_it() {
    let db = test_database("schema_together");
    let files = temp_dir("schema-together");
    runtime().block_on(async {
        let (a, b) = tokio::join!(Office::open(&db.url, &files), Office::open(&db.url, &files));
        a.unwrap();
        let b = b.unwrap();
        let client = b.pool.get().await.unwrap();
        let versions: i64 = client
            .query_one("SELECT count(*) FROM undercroft_schema", &[])
            .await
            .unwrap()
            .get(0);
        assert_eq!(versions, undercroft_server::migrate::SCHEMA_VERSION as i64);
    });
}

#[test]
fn a_database_that_cannot_be_reached_is_said_in_words() {
    let files = temp_dir("schema-unreachable");
    let refused = runtime()
        .block_on(Office::open(
            "postgres://nobody@127.0.0.1:9/none?sslmode=disable",
            &files,
        ))
        .err()
        .expect("refused")
        .to_string();
    assert!(refused.contains("cannot be reached"), "{refused}");
    let garbage = runtime()
        .block_on(Office::open("not a url at all", &files))
        .err()
        .unwrap()
        .to_string();
    assert!(garbage.contains("not one PostgreSQL reads"), "{garbage}");
}
