//! `undercroft rules`: lists every rule with its id, title and citation.

use undercroft_core::rules::all_rule_infos;

pub fn run() -> anyhow::Result<()> {
    for info in all_rule_infos() {
        println!(
            "{:<24} {:<46} {}",
            info.id,
            info.title,
            info.citation("IRC 2018")
        );
    }
    Ok(())
}
