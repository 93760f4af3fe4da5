//! Plain words every output shares: a count with its noun.

/// "1 finding", "3 findings".
pub fn count(n: usize, one: &str, many: &str) -> String {
    if n == 1 {
        format!("1 {one}")
    } else {
        format!("{n} {many}")
    }
}
