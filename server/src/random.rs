//! Random names: hex of bytes from the system's random source.

/// `bytes` random bytes as lower-case hex.
pub fn hex(bytes: usize) -> String {
    let mut raw = vec![0u8; bytes];
    getrandom::fill(&mut raw).expect("the system's random source");
    raw.iter().map(|b| format!("{b:02x}")).collect()
}
