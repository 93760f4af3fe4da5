//! Typed quantities: lengths (with the tape-measure parser and formatter) and loads.

mod length;
mod length_format;
mod length_parse;
mod load;
mod typed;

pub use length::Length;
pub use length_format::{
    format_dimension, format_length, format_spacing, round_down, round_up, UnitSystem,
};
pub use length_parse::{parse_length, LengthError};
pub use load::{Psf, Psi};
pub use typed::{bare_number_hint, bare_number_inches, parse_typed_length};
