//! Benchmark: pushes per second and push latency (the whole push: which files are missing,
//! each missing file, the revision) with many devices at once, against the office server in
//! this process on a throwaway PostgreSQL cluster on loopback. Run with
//! `cargo bench -p undercroft-server --bench push`; a quick pass runs under `cargo test`.

use std::sync::{Arc, Mutex};
use std::time::{Duration, Instant};
use undercroft_server::auth::Role;
use undercroft_server::pg_cluster::test_database;
use undercroft_server::synthetic::synthetic_push;
use undercroft_server::Office;
use undercroft_sync::Office as Device;

fn main() {
    let quick = !std::env::args().any(|a| a == "--bench");
    let (devices, per_device, photos) = if quick { (4, 2, 10) } else { (50, 4, 40) };
    let db = test_database("bench_push");
    let files = std::env::temp_dir().join(format!("undercroft-bench-push-{}", std::process::id()));
    let runtime = tokio::runtime::Runtime::new().unwrap();
    let (office, url) = runtime.block_on(async {
        let office = Office::open(&db.url, &files).await.unwrap();
        let listener = tokio::net::TcpListener::bind("127.0.0.1:0").await.unwrap();
        let url = format!("http://{}", listener.local_addr().unwrap());
        let router = undercroft_server::router(office.clone());
        tokio::spawn(async move { axum::serve(listener, router).await });
        (office, url)
    });
    let tokens: Vec<String> = (0..devices)
        .map(|n| {
            runtime
                .block_on(office.issue_token(&format!("Bench inspector {n}"), Role::Inspector))
                .unwrap()
        })
        .collect();
    // One device alone first: a push's own time, without others queued beside it.
    let alone = Device::new(&url, &tokens[0]).unwrap();
    let mut solo: Vec<Duration> = (0..if quick { 3 } else { 20 })
        .map(|i| {
            let (id, request, files) = synthetic_push(9_999, i, photos, 5);
            let t = Instant::now();
            alone
                .push_revision(&id, &request, |sha| Ok(files[sha].clone()))
                .expect("the push is acknowledged");
            t.elapsed()
        })
        .collect();
    solo.sort();
    println!(
        "one device alone, {photos} photos a push: median {:.0?}, p95 {:.0?} ({} pushes)",
        solo[solo.len() / 2],
        solo[(solo.len() * 95 / 100).min(solo.len() - 1)],
        solo.len()
    );
    // Pushes are made before the clock starts: only the exchange is timed.
    let prepared: Vec<Vec<_>> = (0..devices)
        .map(|d| {
            (0..per_device)
                .map(|i| synthetic_push(d as u64, i, photos, 5))
                .collect()
        })
        .collect();
    let latencies = Arc::new(Mutex::new(Vec::new()));
    let started = Instant::now();
    std::thread::scope(|scope| {
        for (token, pushes) in tokens.iter().zip(&prepared) {
            let latencies = latencies.clone();
            let url = &url;
            scope.spawn(move || {
                let device = Device::new(url, token).unwrap();
                for (id, request, files) in pushes {
                    let t = Instant::now();
                    device
                        .push_revision(id, request, |sha| Ok(files[sha].clone()))
                        .expect("the push is acknowledged");
                    latencies.lock().unwrap().push(t.elapsed());
                }
            });
        }
    });
    let wall = started.elapsed();
    let mut latencies: Vec<Duration> = Arc::try_unwrap(latencies).unwrap().into_inner().unwrap();
    latencies.sort();
    let n = latencies.len();
    println!(
        "{devices} devices x {per_device} inspections x {photos} photos: {n} pushes in {wall:.2?}: \
         {:.1} pushes/s ({:.0} files/s); latency median {:.0?}, p95 {:.0?}, max {:.0?}",
        n as f64 / wall.as_secs_f64(),
        (n as f64 * (photos + 1) as f64) / wall.as_secs_f64(),
        latencies[n / 2],
        latencies[(n * 95 / 100).min(n - 1)],
        latencies[n - 1]
    );
    drop(office);
    std::fs::remove_dir_all(&files).ok();
}
