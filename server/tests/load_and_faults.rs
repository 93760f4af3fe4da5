//! The office under load and faults, on loopback only, in bounded loops: 50 devices pushing
//! 200 inspections of 40 photos each at once; the server killed mid-push and started again;
//! the database restarted under load. Afterwards every acknowledged push is there exactly
//! once, with every file it names stored whole.

mod common;

use common::*;
use std::sync::{Arc, Mutex};
use undercroft_server::auth::Role;
use undercroft_server::pg_cluster::{own_database, test_database};
use undercroft_sync::{Office as Device, PushOutcome};

/// `devices` threads, each pushing `per_device` inspections of `photos` photos (5 shared by
/// the device's inspections); returns each acknowledgement as (inspection id, revision), and
/// how many pushes had to be tried again.
fn push_from_devices(
    url: &str,
    tokens: &[String],
    per_device: u64,
    photos: u64,
    tries: usize,
    while_pushing: impl FnOnce(&Mutex<Vec<(String, i64)>>),
) -> (Vec<(String, i64)>, usize) {
    let acknowledged = Arc::new(Mutex::new(Vec::new()));
    let retried = Arc::new(std::sync::atomic::AtomicUsize::new(0));
    std::thread::scope(|scope| {
        for (n, token) in tokens.iter().enumerate() {
            let acknowledged = acknowledged.clone();
            let retried = retried.clone();
            scope.spawn(move || {
                let device = Device::new(url, token).unwrap();
                for i in 0..per_device {
                    let (id, request, files) = synthetic_push(n as u64, i, photos, 5);
                    let (answer, _, attempts) =
                        push_until_acknowledged(&device, &id, &request, &files, tries);
                    if attempts > 1 {
                        retried.fetch_add(1, std::sync::atomic::Ordering::Relaxed);
                    }
                    assert_ne!(answer.outcome, PushOutcome::Conflict, "{id}");
                    acknowledged.lock().unwrap().push((id, answer.revision));
                }
            });
        }
        while_pushing(&acknowledged);
    });
    let retried = retried.load(std::sync::atomic::Ordering::Relaxed);
    (
        Arc::try_unwrap(acknowledged).unwrap().into_inner().unwrap(),
        retried,
    )
}

fn tokens(server: &Running, devices: usize) -> Vec<String> {
    (0..devices)
        .map(|n| server.token(&format!("Inspector {n}"), Role::Inspector))
        .collect()
}

fn assert_each_acknowledged_once(server: &Running, acknowledged: &[(String, i64)]) {
    for (id, revision) in acknowledged {
        let found = server.sql(&format!(
            "SELECT count(*) FROM revisions WHERE inspection_id = '{id}' AND id = {revision}"
        ));
        assert_eq!(found, ["1"], "acknowledged revision {revision} of {id}");
    }
    let total = server.sql("SELECT count(*) FROM revisions");
    assert_eq!(
        total,
        [acknowledged.len().to_string()],
        "nothing stored twice"
    );
}

#[test]
fn fifty_devices_push_two_hundred_inspections_of_forty_photos_at_once() {
    let server = start("load_fifty");
    let tokens = tokens(&server, 50);
    let (acknowledged, _) = push_from_devices(&server.url, &tokens, 4, 40, 50, |_| {});
    assert_eq!(acknowledged.len(), 200);
    assert_each_acknowledged_once(&server, &acknowledged);
    // 35 photos of each inspection its own, 5 of each device shared, a PDF each.
    let expected_files = 200 * 35 + 50 * 5 + 200;
    assert_eq!(every_revisions_files_present(&server), expected_files);
    assert_eq!(
        server.sql("SELECT count(*) FROM revision_files"),
        [(200 * 41).to_string()],
        "every revision names its 40 photos and its PDF"
    );
    let per_revision =
        server.sql("SELECT DISTINCT jsonb_array_length(manifest->'images') FROM revisions");
    assert_eq!(per_revision, ["40"]);
}

#[test]
fn every_push_acknowledged_before_the_server_was_killed_is_there_after_it_restarts() {
    let server = open_only(test_database("fault_kill"), "fault_kill");
    let tokens = tokens(&server, 6);
    let port = std::net::TcpListener::bind("127.0.0.1:0")
        .unwrap()
        .local_addr()
        .unwrap()
        .port();
    let url = format!("http://127.0.0.1:{port}");
    let spawn = || {
        let mut child = std::process::Command::new(env!("CARGO_BIN_EXE_undercroft-server"))
            .args(["--database-url", &server.db.url, "--files"])
            .arg(&server.files)
            .args(["serve", "--listen", &format!("127.0.0.1:{port}")])
            .stdout(std::process::Stdio::null())
            .spawn()
            .unwrap();
        // Ready when it answers.
        for _ in 0..200 {
            if ureq::get(format!("{url}/health")).call().is_ok() {
                return child;
            }
            std::thread::sleep(std::time::Duration::from_millis(25));
        }
        child.kill().ok();
        child.wait().ok();
        panic!("the server did not start");
    };
    let mut child = spawn();
    let mut restarted = None;
    let (acknowledged, retried) = push_from_devices(&url, &tokens, 5, 12, 300, |acks| {
        // Kill it (SIGKILL: no chance to finish anything) once some pushes are in.
        while acks.lock().unwrap().len() < 6 {
            std::thread::sleep(std::time::Duration::from_millis(5));
        }
        child.kill().unwrap();
        child.wait().unwrap();
        let at_kill = acks.lock().unwrap().len();
        std::thread::sleep(std::time::Duration::from_millis(300));
        restarted = Some((spawn(), at_kill));
    });
    let (mut second, at_kill) = restarted.unwrap();
    assert!(at_kill < 30, "the kill came mid-push ({at_kill} of 30 in)");
    assert!(
        retried > 0,
        "some push was cut off by the kill and tried again"
    );
    assert_eq!(acknowledged.len(), 30);
    assert_each_acknowledged_once(&server, &acknowledged);
    every_revisions_files_present(&server);
    second.kill().ok();
    second.wait().ok();
}

#[test]
fn the_database_restarted_under_load_loses_nothing() {
    let server = start_on(own_database(), "fault_db");
    let tokens = tokens(&server, 8);
    let cluster = server.db.cluster.as_ref().unwrap();
    let (acknowledged, retried) = push_from_devices(&server.url, &tokens, 4, 12, 300, |acks| {
        while acks.lock().unwrap().len() < 4 {
            std::thread::sleep(std::time::Duration::from_millis(5));
        }
        cluster.restart().expect("the database restarts");
    });
    assert_eq!(acknowledged.len(), 32);
    assert!(retried > 0, "some push met the restart and was tried again");
    assert_each_acknowledged_once(&server, &acknowledged);
    every_revisions_files_present(&server);
}
