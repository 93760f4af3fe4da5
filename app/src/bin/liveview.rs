//! The app served as liveview on loopback: the same components in any browser, used by the
//! end-to-end test that drives the real UI at phone size.
//!
//! `undercroft-liveview --db PATH [--port N] [--demo]` prints `listening on http://ADDR` once
//! it accepts connections. Each browser tab gets its own virtual DOM over the same store.

use axum::extract::ws::WebSocketUpgrade;
use axum::response::Html;
use axum::routing::get;
use axum::Router;
use dioxus::prelude::*;
use dioxus_liveview::{axum_socket, interpreter_glue, LiveViewPool};
use std::io::Write;
use std::sync::Arc;
use undercroft_app::startup::{prepare_store, Root, RootProps};

struct Options {
    db: std::path::PathBuf,
    port: u16,
    demo: bool,
}

fn options() -> Result<Options, String> {
    let mut args = std::env::args().skip(1);
    let (mut db, mut port, mut demo) = (None, 0, false);
    while let Some(arg) = args.next() {
        match arg.as_str() {
            "--db" => db = args.next().map(std::path::PathBuf::from),
            "--port" => {
                port = args
                    .next()
                    .and_then(|p| p.parse().ok())
                    .ok_or("--port takes a number")?
            }
            "--demo" => demo = true,
            other => return Err(format!("unknown argument {other:?}")),
        }
    }
    Ok(Options {
        db: db.ok_or("--db PATH is required")?,
        port,
        demo,
    })
}

/// The page: a phone viewport, the mount point and the glue that opens the socket.
fn page() -> String {
    format!(
        r#"<!DOCTYPE html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>Undercroft</title>
</head>
<body><div id="main"></div>{}</body>
</html>"#,
        interpreter_glue("/ws")
    )
}

#[tokio::main]
async fn main() {
    let options = match options() {
        Ok(o) => o,
        Err(e) => {
            eprintln!("undercroft-liveview: {e}");
            std::process::exit(2);
        }
    };
    if let Err(e) = prepare_store(&options.db, options.demo) {
        eprintln!("undercroft-liveview: {e}");
        std::process::exit(1);
    }
    let db = options.db.display().to_string();
    let pool = Arc::new(LiveViewPool::new());
    let page = page();
    let app = Router::new()
        .route(
            "/ws",
            get(move |ws: WebSocketUpgrade| async move {
                ws.on_upgrade(move |socket| async move {
                    let db = db.clone();
                    let _ = pool
                        .launch_virtualdom(axum_socket(socket), move || {
                            VirtualDom::new_with_props(Root, RootProps { db })
                        })
                        .await;
                })
            }),
        )
        .fallback(get(move || async move { Html(page) }));
    let listener = match tokio::net::TcpListener::bind(("127.0.0.1", options.port)).await {
        Ok(l) => l,
        Err(e) => {
            eprintln!("undercroft-liveview: cannot listen: {e}");
            std::process::exit(1);
        }
    };
    if let Ok(addr) = listener.local_addr() {
        println!("listening on http://{addr}");
        let _ = std::io::stdout().flush();
    }
    if let Err(e) = axum::serve(listener, app).await {
        eprintln!("undercroft-liveview: {e}");
        std::process::exit(1);
    }
}
