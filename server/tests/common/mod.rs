//! Shared set-up of the office server's tests: a database of the test's own, the server
//! running in this process on a loopback port, tokens, and a device store holding the demo
//! inspection with its photos and a delivered report.
#![allow(dead_code)]

use std::path::{Path, PathBuf};
use std::sync::Arc;
use undercroft_core::store::Store;
use undercroft_server::auth::Role;
use undercroft_server::pg_cluster::{test_database, TestDatabase};
use undercroft_server::Office;

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
        undercroft_core::store::new_id()
    ));
    std::fs::create_dir_all(&dir).unwrap();
    dir
}

/// The server on a loopback port with a database of its own.
pub fn start(name: &str) -> Running {
    let db = test_database(name);
    let files = temp_dir(&format!("{name}-files"));
    let runtime = tokio::runtime::Builder::new_multi_thread()
        .worker_threads(2)
        .enable_all()
        .build()
        .unwrap();
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

/// A small PDF that passes the office's check (header and end marker).
pub fn tiny_pdf(text: &str) -> Vec<u8> {
    format!("%PDF-1.7\n% {text}\n1 0 obj\n<<>>\nendobj\ntrailer\n<<>>\n%%EOF\n").into_bytes()
}

/// A device store holding the demo inspection with its photos and one delivered report.
pub fn device_with_demo(dir: &Path) -> (Store, String) {
    let mut store = Store::open(&dir.join("device.sqlite")).unwrap();
    let demo_text =
        std::fs::read_to_string(repo_root().join("demo-data/demo-inspection.json")).unwrap();
    let demo = undercroft_core::interchange::from_json(&demo_text).unwrap();
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
    undercroft_core::photo::encode_rgb(width, height, pixels, 80).unwrap()
}
