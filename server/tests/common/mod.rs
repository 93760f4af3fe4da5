//! Shared set-up of the office server's tests: a database of the test's own, the server
//! running in this process on a loopback port, tokens, and a device store holding the demo
//! inspection with its photos and a delivered report.
#![allow(dead_code, unused_imports)]

use std::path::{Path, PathBuf};
use std::sync::Arc;
use undercroft_server::auth::Role;
use undercroft_server::pg_cluster::{test_database, TestDatabase};
pub use undercroft_server::synthetic::{photo, synthetic_push, tiny_pdf};
use undercroft_server::Office;
use undercroft_store::Store;

pub struct Running {
    pub url: String,
    pub office: Arc<Office>,
    pub files: PathBuf,
    pub runtime: tokio::runtime::Runtime,
    pub db: TestDatabase,
}

impl Running {
    pub fn token(&self, name: &str, role: Role) -> String {
        self.runtime
            .block_on(self.office.issue_token(name, role))
            .expect("a token is issued")
    }

    /// Runs SQL on the office database and returns the first column of each row as text.
    pub fn sql(&self, query: &str) -> Vec<String> {
        self.runtime.block_on(async {
            let client = self.office.pool.get().await.expect("a connection");
            client
                .simple_query(query)
                .await
                .expect("the query runs")
                .into_iter()
                .filter_map(|m| match m {
                    tokio_postgres::SimpleQueryMessage::Row(r) => {
                        Some(r.get(0).unwrap_or("NULL").to_string())
                    }
                    _ => None,
                })
                .collect()
        })
    }
}

pub fn temp_dir(name: &str) -> PathBuf {
    let dir = std::env::temp_dir().join(format!(
        "undercroft-server-test-{name}-{}-{}",
        std::process::id(),
        undercroft_store::new_id()
    ));
    std::fs::create_dir_all(&dir).unwrap();
    dir
}

/// The runtime the office runs on in a test: two workers, as on the machines it is sized for.
fn runtime() -> tokio::runtime::Runtime {
    tokio::runtime::Builder::new_multi_thread()
        .worker_threads(2)
        .enable_all()
        .build()
        .unwrap()
}

/// Status and body of a request with a token (or none), whatever the status.
pub fn call(method: &str, url: &str, token: Option<&str>, body: Option<Vec<u8>>) -> (u16, String) {
    let agent: ureq::Agent = ureq::Agent::config_builder()
        .http_status_as_error(false)
        .build()
        .into();
    let request = ureq::http::Request::builder().method(method).uri(url);
    let request = match token {
        Some(t) => request.header("Authorization", format!("Bearer {t}")),
        None => request,
    };
    let request = request
        .header("Content-Type", "application/json")
        .body(body.unwrap_or_default())
        .unwrap();
    let mut response = agent.run(request).unwrap();
    let status = response.status().as_u16();
    let text = response.body_mut().read_to_string().unwrap_or_default();
    (status, text)
}

/// A successful GET's JSON.
pub fn get_json(url: &str, token: &str) -> serde_json::Value {
    let (status, body) = call("GET", url, Some(token), None);
    assert_eq!(status, 200, "GET {url}: {body}");
    serde_json::from_str(&body).unwrap()
}

/// The server on a loopback port with a database of its own.
pub fn start(name: &str) -> Running {
    start_on(test_database(name), name)
}

/// The office opened on a database (its schema made) without serving it: for tests that
/// run the server as a child process and read the database beside it.
pub fn open_only(db: TestDatabase, name: &str) -> Running {
    let files = temp_dir(&format!("{name}-files"));
    let runtime = runtime();
    let office = runtime
        .block_on(Office::open(&db.url, &files))
        .expect("the office opens");
    Running {
        url: String::new(),
        office,
        files,
        runtime,
        db,
    }
}

/// The server on a loopback port, on the given database.
pub fn start_on(db: TestDatabase, name: &str) -> Running {
    let files = temp_dir(&format!("{name}-files"));
    let runtime = runtime();
    let (office, url) = runtime.block_on(async {
        let office = Office::open(&db.url, &files)
            .await
            .expect("the office opens");
        let listener = tokio::net::TcpListener::bind("127.0.0.1:0").await.unwrap();
        let url = format!("http://{}", listener.local_addr().unwrap());
        let router = undercroft_server::router(office.clone());
        tokio::spawn(async move { axum::serve(listener, router).await });
        (office, url)
    });
    Running {
        url,
        office,
        files,
        runtime,
        db,
    }
}

pub fn repo_root() -> PathBuf {
    PathBuf::from(env!("CARGO_MANIFEST_DIR"))
        .parent()
        .unwrap()
        .to_path_buf()
}

/// A device store holding the demo inspection with its photos and one delivered report.
pub fn device_with_demo(dir: &Path) -> (Store, String) {
    let mut store = Store::open(&dir.join("device.sqlite")).unwrap();
    let demo_text =
        std::fs::read_to_string(repo_root().join("demo-data/demo-inspection.json")).unwrap();
    let demo = undercroft_engine::interchange::from_json(&demo_text).unwrap();
    let images = demo
        .photos
        .iter()
        .map(|p| {
            (
                p.id.clone(),
                std::fs::read(repo_root().join("demo-data").join(&p.file)).unwrap(),
            )
        })
        .collect();
    let (outcome, refused) = store.import_inspection_with_images(&demo, &images).unwrap();
    assert!(refused.is_empty(), "{refused:?}");
    store
        .record_report(
            &outcome.inspection_id,
            "Report.pdf",
            &tiny_pdf("first"),
            "[]",
            "Dana Whitlock",
        )
        .unwrap();
    (store, outcome.inspection_id)
}

/// Pushes until the office acknowledges, waiting out an office or database that is down
/// (at most `tries` attempts, 100 ms apart); returns the answer, the last attempt's time and
/// the attempts made. Any other refusal fails the test.
pub fn push_until_acknowledged(
    device: &undercroft_sync::Office,
    id: &str,
    request: &undercroft_sync::PushRequest,
    files: &std::collections::HashMap<String, Vec<u8>>,
    tries: usize,
) -> (undercroft_sync::PushAnswer, std::time::Duration, usize) {
    use undercroft_sync::OfficeError;
    for attempt in 1..=tries {
        let started = std::time::Instant::now();
        match device.push_revision(id, request, |sha| Ok(files[sha].clone())) {
            Ok((answer, _, _)) => return (answer, started.elapsed(), attempt),
            Err(OfficeError::Unreachable(_)) => {}
            Err(OfficeError::Refused { status: 503, .. }) => {}
            Err(OfficeError::Refused {
                status: 500,
                message,
            }) if message.contains("connection") => {}
            Err(other) => panic!("push of {id} refused: {other}"),
        }
        std::thread::sleep(std::time::Duration::from_millis(100));
    }
    panic!("push of {id} not acknowledged after {tries} tries");
}

/// Checks every revision's files are stored, on disk and whole; returns the number of files.
pub fn every_revisions_files_present(server: &Running) -> usize {
    let missing = server.sql(
        "SELECT count(*) FROM revision_files rf LEFT JOIN blobs b ON b.sha256 = rf.sha256 WHERE b.sha256 IS NULL",
    );
    assert_eq!(missing, ["0"], "every file a revision names has its row");
    let hashes = server.sql("SELECT sha256 FROM blobs");
    for sha in &hashes {
        let path = server.files.join(&sha[..2]).join(sha);
        let bytes = std::fs::read(&path).unwrap_or_else(|e| panic!("{}: {e}", path.display()));
        assert_eq!(&undercroft_store::content_hash(&bytes), sha);
    }
    hashes.len()
}
