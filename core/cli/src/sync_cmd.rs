//! `undercroft sync`: sends the store's finished inspections (those with a delivered report)
//! to the firm's office server and takes the firm's settings back. The office's address and
//! token are kept in the store once given.

use crate::output::say;
use clap::Args;
use std::path::Path;
use undercroft_store::OfficeLink;
use undercroft_sync::Office;

#[derive(Args)]
pub struct SyncArgs {
    /// The office server's address, e.g. https://office.example.com (kept for next time).
    #[arg(long)]
    office: Option<String>,
    /// The token the office issued you (kept for next time); also read from UNDERCROFT_TOKEN.
    #[arg(long, env = "UNDERCROFT_TOKEN", hide_env_values = true)]
    token: Option<String>,
}

pub fn run(args: &SyncArgs, db: Option<&Path>) -> anyhow::Result<()> {
    let mut store = super::store_cmd::open(db)?;
    let mut link = store.office_link()?;
    if let Some(url) = &args.office {
        link.url = url.trim().into();
    }
    if let Some(token) = &args.token {
        link.token = token.trim().into();
    }
    if link.url.is_empty() {
        anyhow::bail!(
            "no office address yet: give --office https://... (it is kept for next time)"
        );
    }
    let office = Office::new(&link.url, &link.token)?;
    if args.office.is_some() || args.token.is_some() {
        store.save_office_link(&OfficeLink {
            url: link.url.clone(),
            token: link.token.clone(),
        })?;
    }
    let summary = office.sync(&mut store)?;
    say!("Synced with {}: {}", link.url, summary.text())?;
    for (id, why) in &summary.refused {
        say!("  refused {id}: {why}")?;
    }
    if !summary.refused.is_empty() {
        anyhow::bail!(
            "{} inspection(s) were refused by the office",
            summary.refused.len()
        );
    }
    Ok(())
}
