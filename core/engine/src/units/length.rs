//! `Length`: a distance held in inches, with its conversion table.

use serde::{Deserialize, Serialize};

/// Inches per unit, the one conversion table for lengths.
/// Source: NIST SP 811 Appendix B (1 in = 25.4 mm exactly; 1 ft = 12 in).
pub(crate) const INCHES_PER_FOOT: f64 = 12.0;
pub(crate) const MM_PER_INCH: f64 = 25.4;

/// A length, stored in inches. Construct with the unit you have.
///
/// In JSON a length is written as a number of inches (`163.5`) or as typed text
/// (`"13' 7-1/2\""`), which is parsed as a tape reads; it is always written back as inches.
#[derive(Debug, Clone, Copy, PartialEq, PartialOrd, Serialize, Default)]
#[serde(transparent)]
pub struct Length(f64);

impl<'de> Deserialize<'de> for Length {
    fn deserialize<D: serde::Deserializer<'de>>(d: D) -> Result<Self, D::Error> {
        #[derive(Deserialize)]
        #[serde(untagged)]
        enum Written {
            Inches(f64),
            Text(String),
        }
        use serde::de::Error;
        match Written::deserialize(d).map_err(|_| {
            D::Error::custom(
                "expected a length: inches as a number, or text such as \"13' 7-1/2\\\"\"",
            )
        })? {
            Written::Inches(v) if v.is_finite() && (0.0..=12_000.0).contains(&v) => Ok(Length(v)),
            Written::Inches(v) => Err(D::Error::custom(format!(
                "{v} in is not a usable length (0 to 12000 in)"
            ))),
            Written::Text(t) => {
                super::parse_length(&t, None).map_err(|e| D::Error::custom(format!("\"{t}\": {e}")))
            }
        }
    }
}

impl Length {
    pub const ZERO: Length = Length(0.0);

    pub const fn inches(value: f64) -> Self {
        Length(value)
    }
    pub fn feet(value: f64) -> Self {
        Length(value * INCHES_PER_FOOT)
    }
    pub fn millimetres(value: f64) -> Self {
        Length(value / MM_PER_INCH)
    }
    pub fn feet_inches(feet: f64, inches: f64) -> Self {
        Length(feet * INCHES_PER_FOOT + inches)
    }
    pub const fn in_inches(self) -> f64 {
        self.0
    }
    pub fn in_feet(self) -> f64 {
        self.0 / INCHES_PER_FOOT
    }
    pub fn in_millimetres(self) -> f64 {
        self.0 * MM_PER_INCH
    }
    pub fn min(self, other: Length) -> Length {
        Length(self.0.min(other.0))
    }
    pub fn max(self, other: Length) -> Length {
        Length(self.0.max(other.0))
    }
}

impl std::ops::Add for Length {
    type Output = Length;
    fn add(self, rhs: Length) -> Length {
        Length(self.0 + rhs.0)
    }
}

impl std::ops::Sub for Length {
    type Output = Length;
    fn sub(self, rhs: Length) -> Length {
        Length(self.0 - rhs.0)
    }
}

impl std::ops::Mul<f64> for Length {
    type Output = Length;
    fn mul(self, rhs: f64) -> Length {
        Length(self.0 * rhs)
    }
}

impl std::ops::Div<f64> for Length {
    type Output = Length;
    fn div(self, rhs: f64) -> Length {
        Length(self.0 / rhs)
    }
}

impl std::ops::Div for Length {
    type Output = f64;
    fn div(self, rhs: Length) -> f64 {
        self.0 / rhs.0
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    // Source: NIST SP 811 Appendix B.8 (inch = 2.54 cm exactly, foot = 12 in).
    #[test]
    fn conversion_table() {
        assert_eq!(Length::feet(1.0).in_inches(), 12.0);
        assert_eq!(Length::inches(1.0).in_millimetres(), 25.4);
        assert!((Length::millimetres(4150.0).in_inches() - 163.385_826_771_653_5).abs() < 1e-9);
        assert_eq!(Length::feet_inches(13.0, 7.5).in_inches(), 163.5);
        assert_eq!(Length::inches(18.0).in_feet(), 1.5);
    }
}
