//! Sawn lumber: species groups, grades, sizes, NDS design values and adjustment factors.

mod design_values;
mod factors;
mod grade;
mod size;
mod species;

pub use design_values::{design_values, DesignValues, DESIGN_VALUES_SOURCE};
pub use factors::{
    load_duration_factor, size_factor_fb, wet_service, wet_service_fc, LoadDuration, WetFactors,
    REPETITIVE_MEMBER_FACTOR,
};
pub use grade::{Grade, GradeChoice, UNKNOWN_GRADE_DEFAULT};
pub use size::{NominalSize, Section, SizeError};
pub use species::Species;

/// What a user typed for a species or grade, reduced to lower-case letters and digits, so
/// "DF-L", "df l" and "dfl" read alike.
fn typed_key(text: &str) -> String {
    text.trim()
        .to_lowercase()
        .chars()
        .filter(|c| c.is_alphanumeric())
        .collect()
}
