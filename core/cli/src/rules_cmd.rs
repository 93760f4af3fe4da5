//! `undercroft rules`: lists every rule with its id, title and citation.

use crate::output::say;
use undercroft_engine::rules::all_rule_infos;

pub fn run() -> anyhow::Result<()> {
    for info in all_rule_infos() {
        say!(
            "{:<24} {:<46} {}",
            info.id,
            info.title,
            info.citation("IRC 2018")
        )?;
    }
    Ok(())
}
