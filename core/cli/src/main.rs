//! `undercroft`: the command line over the engine, the store, the report and the office sync:
//! allowable spans, the findings of an inspection, reports, the store and the sync.

mod check_cmd;
mod output;
mod photo_files;
mod report_cmd;
mod rules_cmd;
mod span_cmd;
mod store_cmd;
mod sync_cmd;

use clap::{Parser, Subcommand};
use std::process::ExitCode;

#[derive(Parser)]
#[command(
    name = "undercroft",
    version,
    about = "Checks wood floor framing against the residential code and wood mechanics (a screening tool)"
)]
struct Cli {
    /// The store's database file (default: the platform's data folder).
    #[arg(long, global = true)]
    db: Option<std::path::PathBuf>,
    #[command(subcommand)]
    command: Command,
}

#[derive(Subcommand)]
enum Command {
    /// Allowable span of a sawn joist: each check's span and which governs.
    Span(span_cmd::SpanArgs),
    /// The findings of an inspection file, or of an inspection in the store.
    Check(check_cmd::CheckArgs),
    /// Inspections in the store, most recently changed first.
    List(store_cmd::ListArgs),
    /// Start an inspection in the store.
    New(store_cmd::NewArgs),
    /// Import an inspection file (.json) or bundle (.zip) into the store.
    Import(store_cmd::ImportArgs),
    /// Export an inspection from the store as a bundle (.zip) or an inspection file (--json).
    Export(store_cmd::ExportArgs),
    /// Add a photo to an area, run, member or observation of a stored inspection.
    AddPhoto(store_cmd::AddPhotoArgs),
    /// Build the client report (PDF) of an inspection file or a stored inspection.
    Report(report_cmd::ReportArgs),
    /// The rules the engine applies, with their ids and citations.
    Rules,
    /// Send finished inspections and their delivered reports to the firm's office server,
    /// and take the firm's settings.
    Sync(sync_cmd::SyncArgs),
}

fn main() -> ExitCode {
    let cli = Cli::parse();
    let result = match cli.command {
        Command::Span(args) => span_cmd::run(&args),
        Command::Check(args) => check_cmd::run(&args, cli.db.as_deref()),
        Command::Rules => rules_cmd::run(),
        Command::Report(args) => report_cmd::run(&args, cli.db.as_deref()),
        Command::List(args) => store_cmd::list(&args, cli.db.as_deref()),
        Command::New(args) => store_cmd::new(&args, cli.db.as_deref()),
        Command::Import(args) => store_cmd::import(&args, cli.db.as_deref()),
        Command::Export(args) => store_cmd::export(&args, cli.db.as_deref()),
        Command::AddPhoto(args) => store_cmd::add_photo(&args, cli.db.as_deref()),
        Command::Sync(args) => sync_cmd::run(&args, cli.db.as_deref()),
    };
    match result {
        Ok(()) => ExitCode::SUCCESS,
        Err(e) if output::is_closed_pipe(&e) => ExitCode::SUCCESS,
        Err(e) => {
            eprintln!("undercroft: {e:#}");
            ExitCode::from(2)
        }
    }
}
