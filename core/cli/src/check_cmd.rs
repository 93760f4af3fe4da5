//! `undercroft check (FILE.json | --inspection ID)`: the findings of an inspection, for a
//! terminal or as JSON.

use anyhow::Context;
use clap::Args;
use serde::Serialize;
use std::io::Write;
use std::path::PathBuf;
use undercroft_engine::finding::benchmark_note;
use undercroft_engine::finding::Bound;
use undercroft_engine::interchange::from_json_bytes;
use undercroft_engine::{evaluate, Finding, Inspection, SCREENING_NOTICE};

#[derive(Args)]
pub struct CheckArgs {
    /// An inspection file in the interchange format (docs/inspection-format.md).
    file: Option<PathBuf>,
    /// The id of an inspection in the store instead of a file.
    #[arg(long, conflicts_with = "file")]
    inspection: Option<String>,
    /// Print one JSON object: the findings and the input problems.
    #[arg(long)]
    json: bool,
}

pub fn run(args: &CheckArgs, db: Option<&std::path::Path>) -> anyhow::Result<()> {
    let inspection = match (&args.file, &args.inspection) {
        (Some(file), _) => {
            let bytes = crate::store_cmd::read_capped(
                file,
                undercroft_engine::interchange::MAX_FILE_BYTES,
                "an inspection file",
            )?;
            from_json_bytes(&bytes)
                .with_context(|| format!("{} is not a usable inspection file", file.display()))?
        }
        (None, Some(id)) => crate::store_cmd::open_existing(db)?.load_inspection(id)?,
        (None, None) => anyhow::bail!("give an inspection file or --inspection ID"),
    };
    let evaluation = evaluate(&inspection);
    // Both outputs are written as a stream: a 20,000-member inspection's text is never
    // held whole in memory.
    let mut out = std::io::BufWriter::new(std::io::stdout().lock());
    if args.json {
        let report = JsonOut {
            inspection_id: &inspection.id,
            code_edition: &inspection.code_edition,
            notice: SCREENING_NOTICE,
            benchmark: benchmark_note(&inspection.code_edition, inspection.property.year_built),
            counts: evaluation.counts(),
            findings: &evaluation.findings,
            problems: &evaluation.problems,
        };
        serde_json::to_writer_pretty(&mut out, &report)?;
        writeln!(out)?;
    } else {
        write_text(&mut out, &inspection, &evaluation)?;
    }
    out.flush()?;
    Ok(())
}

/// The JSON output, serialized straight to the terminal.
#[derive(Serialize)]
struct JsonOut<'a> {
    inspection_id: &'a str,
    code_edition: &'a str,
    notice: &'a str,
    benchmark: Option<String>,
    counts: undercroft_engine::engine::Counts,
    findings: &'a [Finding],
    problems: &'a [undercroft_engine::validate::Problem],
}

/// The terminal rendering: header, counts, findings over limit first, input problems, notice;
/// each finding written as soon as it is worded.
fn write_text(
    w: &mut impl Write,
    inspection: &Inspection,
    evaluation: &undercroft_engine::Evaluation,
) -> std::io::Result<()> {
    let mut out = String::new();
    let line = |out: &mut String, text: String| {
        out.push_str(&text);
        out.push('\n');
    };
    line(
        &mut out,
        format!(
            "{} - inspected {}",
            inspection.property.address, inspection.date
        ),
    );
    line(
        &mut out,
        format!(
            "Code edition: {}{}",
            inspection.code_edition,
            if inspection.local_amendments.is_empty() {
                String::new()
            } else {
                format!(" (local amendments: {})", inspection.local_amendments)
            }
        ),
    );
    if let Some(note) = benchmark_note(&inspection.code_edition, inspection.property.year_built) {
        line(&mut out, format!("{note}."));
    }
    line(&mut out, format!("{}\n", evaluation.counts().text()));
    w.write_all(out.as_bytes())?;
    out.clear();
    for f in evaluation.by_attention() {
        finding_text(&mut out, f);
        w.write_all(out.as_bytes())?;
        out.clear();
    }
    if !evaluation.problems.is_empty() {
        line(&mut out, "Input problems:".into());
        for p in &evaluation.problems {
            line(&mut out, format!("  {}: {}", p.location, p.message));
        }
        out.push('\n');
    }
    line(&mut out, SCREENING_NOTICE.into());
    w.write_all(out.as_bytes())
}

fn finding_text(out: &mut String, f: &Finding) {
    let share = f
        .use_text()
        .map(|u| format!(" {u} of limit"))
        .unwrap_or_default();
    let summary = f.summary();
    out.push_str(&format!(
        "[{}{share}] {} - {}\n",
        f.status_label(),
        f.rule_id(),
        f.place.location
    ));
    out.push_str(&format!("  {summary}\n"));
    if let Some(g) = f.governing_check() {
        let bound = match (g.bound, g.ratio) {
            (_, None) => "",
            (Bound::AtLeast, Some(_)) => "at least ",
            (Bound::AtMost, Some(_)) => "at most ",
        };
        out.push_str(&format!(
            "  {}: {}; limit {bound}{}\n",
            g.what,
            g.measured_shown().text,
            g.limit_shown().text
        ));
    }
    for option in f.options() {
        out.push_str(&format!("  option: {option}\n"));
    }
    match &f.not_checked_because {
        Some(why) if !summary.starts_with("Not checked") => {
            out.push_str(&format!("  not checked: {why}\n"))
        }
        _ => {}
    }
    out.push_str(&format!("  basis: {}\n", f.basis.name()));
    out.push_str(&format!("  cites {}\n", f.citation()));
    for a in f.assumptions() {
        out.push_str(&format!("  assumes: {a}\n"));
    }
    out.push_str(&format!("  -> {}\n\n", f.recommendation()));
}
