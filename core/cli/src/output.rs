//! Standard output for the commands: a reader that stops early (`undercroft rules | head -3`)
//! ends the command quietly with success, never a panic or a failure status.

/// `println!` that hands back the write's error instead of panicking on it.
macro_rules! say {
    ($($arg:tt)*) => {{
        use std::io::Write as _;
        writeln!(std::io::stdout().lock(), $($arg)*)
    }};
}
pub(crate) use say;

/// Whether the error is standard output's reader having gone (a closed pipe).
pub fn is_closed_pipe(error: &anyhow::Error) -> bool {
    let broken = Some(std::io::ErrorKind::BrokenPipe);
    error.chain().any(|cause| {
        // JSON is written through serde_json, which wraps the write's error in its own.
        cause.downcast_ref::<std::io::Error>().map(|io| io.kind()) == broken
            || cause
                .downcast_ref::<serde_json::Error>()
                .and_then(serde_json::Error::io_error_kind)
                == broken
    })
}
