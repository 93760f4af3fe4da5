//! `undercroft-server`: runs the office server, and issues and revokes the firm's tokens.

use clap::{Parser, Subcommand};
use std::path::PathBuf;
use std::process::ExitCode;
use undercroft_server::auth::Role;
use undercroft_server::Office;

#[derive(Parser)]
#[command(
    name = "undercroft-server",
    version,
    about = "The firm's office server: every inspection and delivered report its devices send, on PostgreSQL"
)]
struct Cli {
    /// The PostgreSQL database, e.g. postgres://undercroft@db.internal/undercroft?sslmode=require
    #[arg(long, env = "UNDERCROFT_DATABASE_URL")]
    database_url: String,
    /// The folder that keeps photos and reports, each once under its SHA-256.
    #[arg(
        long,
        env = "UNDERCROFT_FILES",
        default_value = "undercroft-office-files"
    )]
    files: PathBuf,
    #[command(subcommand)]
    command: Command,
}

#[derive(Subcommand)]
enum Command {
    /// Serve the API and the office page (run it behind a TLS proxy).
    Serve {
        /// Address to listen on; keep it on loopback or a private network behind the proxy.
        #[arg(long, default_value = "127.0.0.1:8750")]
        listen: String,
    },
    /// Bring the database's schema up to date, then stop.
    Migrate,
    /// Issue a token to a person (added if new); it is shown once.
    IssueToken {
        #[arg(long)]
        name: String,
        /// inspector (pushes and reads their own) or office (reads all, manages settings)
        #[arg(long, default_value = "inspector")]
        role: String,
    },
    /// Revoke a token by its id (the 16 hex digits after uct_); it stops working at once.
    RevokeToken { id: String },
    /// The tokens issued, live and revoked (never their secrets).
    ListTokens,
}

fn main() -> ExitCode {
    let cli = Cli::parse();
    let runtime = match tokio::runtime::Runtime::new() {
        Ok(r) => r,
        Err(e) => {
            eprintln!("undercroft-server: {e}");
            return ExitCode::from(2);
        }
    };
    match runtime.block_on(run(cli)) {
        Ok(()) => ExitCode::SUCCESS,
        Err(e) => {
            eprintln!("undercroft-server: {e:#}");
            ExitCode::from(2)
        }
    }
}

async fn run(cli: Cli) -> anyhow::Result<()> {
    let office = Office::open(&cli.database_url, &cli.files).await?;
    match cli.command {
        Command::Serve { listen } => {
            let listener = tokio::net::TcpListener::bind(&listen).await?;
            println!(
                "undercroft-server: listening on http://{}",
                listener.local_addr()?
            );
            undercroft_server::serve(listener, office).await?;
        }
        Command::Migrate => println!(
            "undercroft-server: schema at version {}",
            undercroft_server::migrate::SCHEMA_VERSION
        ),
        Command::IssueToken { name, role } => {
            let role = Role::from_key(&role)
                .ok_or_else(|| anyhow::anyhow!("role is \"inspector\" or \"office\""))?;
            let token = office.issue_token(&name, role).await?;
            println!("{token}");
            eprintln!("Hand this token to {name} now: it is not kept and cannot be shown again.");
        }
        Command::RevokeToken { id } => {
            if office.revoke_token(&id).await? {
                println!("revoked {id}");
            } else {
                anyhow::bail!("no live token {id}");
            }
        }
        Command::ListTokens => {
            for t in office.tokens().await? {
                println!(
                    "{}  {:<9} {:<24} issued {}{}",
                    t.id,
                    t.role,
                    t.person,
                    t.created_at,
                    t.revoked_at
                        .map(|r| format!(", revoked {r}"))
                        .unwrap_or_default()
                );
            }
        }
    }
    Ok(())
}
