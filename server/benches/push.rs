//! Benchmark placeholder, written below.
fn main() {}
