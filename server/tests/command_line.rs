//! `undercroft sync` from the command line against the office server: the address and token
//! kept in the store after the first run, the summary printed, a revoked token said in
//! words. The `undercroft` binary is core's; `cargo test --workspace` (as `scripts/test-all`
//! runs it) builds every binary before any test starts.

mod common;

use common::*;
use std::process::Command;
use undercroft_server::auth::Role;

fn undercroft() -> Command {
    let exe = std::env::current_exe().unwrap();
    let bin = exe.parent().unwrap().parent().unwrap().join("undercroft");
    assert!(
        bin.exists(),
        "{} is missing: run the workspace's tests (cargo test --workspace), which build it",
        bin.display()
    );
    Command::new(bin)
}

#[test]
fn undercroft_sync_sends_the_store_and_keeps_the_office_for_next_time() {
    let server = start("cli_sync");
    let token = server.token("Ana Ruiz", Role::Inspector);
    let dir = temp_dir("cli");
    let (store, _) = device_with_demo(&dir);
    drop(store);
    let db = dir.join("device.sqlite");
    let first = undercroft()
        .arg("--db")
        .arg(&db)
        .args(["sync", "--office", &server.url])
        .env("UNDERCROFT_TOKEN", &token)
        .output()
        .unwrap();
    let said = String::from_utf8_lossy(&first.stdout);
    assert!(
        first.status.success(),
        "{said}{}",
        String::from_utf8_lossy(&first.stderr)
    );
    assert!(said.contains("1 sent"), "{said}");
    // The second run needs neither address nor token, and sends nothing.
    let second = undercroft()
        .arg("--db")
        .arg(&db)
        .arg("sync")
        .env_remove("UNDERCROFT_TOKEN")
        .output()
        .unwrap();
    let said = String::from_utf8_lossy(&second.stdout);
    assert!(second.status.success(), "{said}");
    assert!(said.contains("0 sent; 1 already at the office"), "{said}");
    assert!(!said.contains(&token), "the token is never printed");
    // Revoked: refused in words, exit code 2, nothing lost on the device.
    let id = &token[4..20];
    server
        .runtime
        .block_on(server.office.revoke_token(id))
        .unwrap();
    let third = undercroft()
        .arg("--db")
        .arg(&db)
        .arg("sync")
        .output()
        .unwrap();
    assert_eq!(third.status.code(), Some(2));
    let said = String::from_utf8_lossy(&third.stderr);
    assert!(said.contains("refused the token"), "{said}");
    std::fs::remove_dir_all(&dir).ok();
}

#[test]
fn undercroft_sync_without_an_office_or_with_a_wrong_one_says_so() {
    let dir = temp_dir("cli-wrong");
    let db = dir.join("device.sqlite");
    let none = undercroft()
        .arg("--db")
        .arg(&db)
        .arg("sync")
        .env_remove("UNDERCROFT_TOKEN")
        .output()
        .unwrap();
    assert_eq!(none.status.code(), Some(2));
    assert!(String::from_utf8_lossy(&none.stderr).contains("no office address yet"));
    let sync_to = |office: &str, token: &str| {
        undercroft()
            .arg("--db")
            .arg(&db)
            .args(["sync", "--office", office, "--token", token])
            .output()
            .unwrap()
    };
    let ftp = sync_to("ftp://office", "x");
    assert!(String::from_utf8_lossy(&ftp.stderr).contains("not an http:// or https:// address"));
    let gone = sync_to("http://127.0.0.1:9", "uct_x");
    assert!(
        String::from_utf8_lossy(&gone.stderr).contains("could not be reached"),
        "{}",
        String::from_utf8_lossy(&gone.stderr)
    );
    std::fs::remove_dir_all(&dir).ok();
}
