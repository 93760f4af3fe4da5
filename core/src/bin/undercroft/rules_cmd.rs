//! `undercroft rules`: lists every rule with its id, title and citation.

use undercroft_core::rules::RULES;

pub fn run() -> anyhow::Result<()> {
    for rule in RULES {
        println!(
            "{:<18} {:<52} {}",
            rule.info.id,
            rule.info.title,
            rule.info.citation("IRC 2018")
        );
    }
    Ok(())
}
