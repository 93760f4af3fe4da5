//! `undercroft`: the command line of the check engine: allowable spans, and the findings of an
//! inspection file.

mod check_cmd;
mod rules_cmd;
mod span_cmd;

use clap::{Parser, Subcommand};
use std::process::ExitCode;

#[derive(Parser)]
#[command(
    name = "undercroft",
    version,
    about = "Checks wood floor framing against the residential code and wood mechanics (a screening tool)"
)]
struct Cli {
    #[command(subcommand)]
    command: Command,
}

#[derive(Subcommand)]
enum Command {
    /// Allowable span of a sawn joist: each check's span and which governs.
    Span(span_cmd::SpanArgs),
    /// The findings of an inspection file.
    Check(check_cmd::CheckArgs),
    /// The rules the engine applies, with their ids and citations.
    Rules,
}

fn main() -> ExitCode {
    let cli = Cli::parse();
    let result = match cli.command {
        Command::Span(args) => span_cmd::run(&args),
        Command::Check(args) => check_cmd::run(&args),
        Command::Rules => rules_cmd::run(),
    };
    match result {
        Ok(()) => ExitCode::SUCCESS,
        Err(e) => {
            eprintln!("undercroft: {e:#}");
            ExitCode::from(2)
        }
    }
}
