//! Nominal sizes, their dressed dimensions, and measured (rough-sawn) sections.

use crate::units::{parse_length, Length, LengthError};
use serde::{Deserialize, Serialize};
use std::fmt;
use std::str::FromStr;
use thiserror::Error;

/// Nominal thicknesses and depths the engine carries (inches).
const THICKNESSES: [u8; 3] = [2, 3, 4];
const DEPTHS: [u8; 6] = [4, 6, 8, 10, 12, 14];

#[derive(Debug, Clone, PartialEq, Error)]
pub enum SizeError {
    #[error("\"{0}\" is not a lumber size; write it like 2x10")]
    NotASize(String),
    #[error("{0} is not a size the engine carries; nominal 2x, 3x or 4x, 4 to 14 in deep")]
    Unsupported(String),
    #[error("actual size \"{0}\": {1}")]
    BadDimension(String, LengthError),
    #[error("actual size {0}: each side must be more than 0 and at most 24 in")]
    OutOfRange(String),
}

/// A nominal size such as 2x10 (thickness x depth, inches).
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash)]
pub struct NominalSize {
    pub thickness: u8,
    pub depth: u8,
}

impl NominalSize {
    pub const fn new(thickness: u8, depth: u8) -> Self {
        NominalSize { thickness, depth }
    }

    /// Standard dressed dry dimension of a nominal dimension.
    /// Source: NDS Supplement (2018) Table 1B, section properties of standard dressed (S4S)
    /// sawn lumber: 2 -> 1-1/2, 3 -> 2-1/2, 4 -> 3-1/2, 6 -> 5-1/2, 8 -> 7-1/4, 10 -> 9-1/4,
    /// 12 -> 11-1/4, 14 -> 13-1/4 in.
    pub fn dressed(nominal: u8) -> Length {
        let inches = match nominal {
            0..=7 => nominal as f64 - 0.5,
            _ => nominal as f64 - 0.75,
        };
        Length::inches(inches)
    }

    pub fn dressed_section(self) -> Section {
        Section {
            thickness: Self::dressed(self.thickness),
            depth: Self::dressed(self.depth),
            nominal: self,
            rough_sawn: false,
        }
    }

    /// The nominal size a measured section belongs to: the smallest standard nominal whose
    /// value is not below the measured dimension (a 9-1/4 or a full 10 in depth is a "10").
    pub fn enclosing(thickness: Length, depth: Length) -> Option<NominalSize> {
        let pick = |value: Length, list: &[u8]| {
            list.iter()
                .copied()
                .find(|&n| n as f64 >= value.in_inches() - 1e-9)
        };
        Some(NominalSize::new(
            pick(thickness, &THICKNESSES)?,
            pick(depth, &DEPTHS)?,
        ))
    }

    pub fn all_standard_depths(thickness: u8) -> impl Iterator<Item = NominalSize> {
        DEPTHS
            .into_iter()
            .map(move |d| NominalSize::new(thickness, d))
    }
}

impl fmt::Display for NominalSize {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        write!(f, "{}x{}", self.thickness, self.depth)
    }
}

impl FromStr for NominalSize {
    type Err = SizeError;
    fn from_str(text: &str) -> Result<Self, SizeError> {
        let (t, d) = split_by(text).ok_or_else(|| SizeError::NotASize(text.trim().into()))?;
        let (Ok(t), Ok(d)) = (t.trim().parse::<u8>(), d.trim().parse::<u8>()) else {
            return Err(SizeError::NotASize(text.trim().into()));
        };
        if !THICKNESSES.contains(&t) || !DEPTHS.contains(&d) {
            return Err(SizeError::Unsupported(format!("{t}x{d}")));
        }
        Ok(NominalSize::new(t, d))
    }
}

impl Serialize for NominalSize {
    fn serialize<S: serde::Serializer>(&self, s: S) -> Result<S::Ok, S::Error> {
        s.collect_str(self)
    }
}

impl<'de> Deserialize<'de> for NominalSize {
    fn deserialize<D: serde::Deserializer<'de>>(d: D) -> Result<Self, D::Error> {
        let text = String::deserialize(d)?;
        text.parse().map_err(serde::de::Error::custom)
    }
}

fn split_by(text: &str) -> Option<(&str, &str)> {
    let lower = text.trim();
    lower
        .split_once(['x', 'X', '\u{00D7}'])
        .filter(|(a, b)| !a.trim().is_empty() && !b.trim().is_empty())
}

/// The cross-section used in the mechanics: actual thickness (b) and depth (d).
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Section {
    pub thickness: Length,
    pub depth: Length,
    /// The nominal size the section is graded and size-factored as.
    pub nominal: NominalSize,
    /// True when the dimensions were measured rather than taken as standard dressed sizes.
    pub rough_sawn: bool,
}

impl Section {
    /// Parses measured dimensions such as `1.625x9.5` or `2 x 10` or `1-5/8 x 9-1/2`
    /// (inches unless a unit is typed).
    pub fn measured(text: &str, nominal: Option<NominalSize>) -> Result<Section, SizeError> {
        let (t, d) = split_by(text).ok_or_else(|| SizeError::NotASize(text.trim().into()))?;
        let parse = |part: &str| {
            parse_length(part, Some(1.0))
                .map_err(|e| SizeError::BadDimension(part.trim().into(), e))
        };
        let (thickness, depth) = (parse(t)?, parse(d)?);
        Section::from_dimensions(thickness, depth, nominal)
    }

    pub fn from_dimensions(
        thickness: Length,
        depth: Length,
        nominal: Option<NominalSize>,
    ) -> Result<Section, SizeError> {
        let in_range = |l: Length| l.in_inches() > 0.0 && l.in_inches() <= 24.0;
        let shown = format!("{}x{}", thickness.in_inches(), depth.in_inches());
        if !in_range(thickness) || !in_range(depth) {
            return Err(SizeError::OutOfRange(shown));
        }
        let nominal = match nominal {
            Some(n) => n,
            None => NominalSize::enclosing(thickness, depth)
                .ok_or_else(|| SizeError::Unsupported(shown.clone()))?,
        };
        Ok(Section {
            thickness,
            depth,
            nominal,
            rough_sawn: true,
        })
    }

    /// Section modulus S = b d^2 / 6 (in^3).
    pub fn section_modulus(&self) -> f64 {
        self.thickness.in_inches() * self.depth.in_inches().powi(2) / 6.0
    }

    /// Moment of inertia I = b d^3 / 12 (in^4).
    pub fn moment_of_inertia(&self) -> f64 {
        self.thickness.in_inches() * self.depth.in_inches().powi(3) / 12.0
    }

    /// Area A = b d (in^2).
    pub fn area(&self) -> f64 {
        self.thickness.in_inches() * self.depth.in_inches()
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    // Source: NDS Supplement (2018) Table 1B (dressed sizes and section properties):
    // 2x10: b = 1.5, d = 9.25, A = 13.88 in^2, S = 21.39 in^3, I = 98.93 in^4.
    #[test]
    fn dressed_2x10_section_properties() {
        let s: Section = "2x10".parse::<NominalSize>().unwrap().dressed_section();
        assert_eq!(s.thickness.in_inches(), 1.5);
        assert_eq!(s.depth.in_inches(), 9.25);
        assert!((s.area() - 13.88).abs() <= 0.0051);
        assert!((s.section_modulus() - 21.39).abs() < 0.005);
        assert!((s.moment_of_inertia() - 98.93).abs() < 0.005);
    }

    // Source: NDS Supplement (2018) Table 1B, dressed depths of 2x4 .. 2x14.
    #[test]
    fn dressed_depths() {
        let table = [
            (4, 3.5),
            (6, 5.5),
            (8, 7.25),
            (10, 9.25),
            (12, 11.25),
            (14, 13.25),
        ];
        for (nominal, dressed) in table {
            assert_eq!(NominalSize::dressed(nominal).in_inches(), dressed);
        }
        assert_eq!(NominalSize::dressed(4).in_inches(), 3.5);
        assert_eq!(NominalSize::dressed(3).in_inches(), 2.5);
    }

    #[test]
    fn parses_sizes_and_refuses_others() {
        assert_eq!("2x10".parse::<NominalSize>(), Ok(NominalSize::new(2, 10)));
        assert_eq!(
            " 2 X 12 ".parse::<NominalSize>(),
            Ok(NominalSize::new(2, 12))
        );
        assert_eq!(
            "4\u{00D7}8".parse::<NominalSize>(),
            Ok(NominalSize::new(4, 8))
        );
        assert!(matches!(
            "2x9".parse::<NominalSize>(),
            Err(SizeError::Unsupported(_))
        ));
        assert!(matches!(
            "ten".parse::<NominalSize>(),
            Err(SizeError::NotASize(_))
        ));
        assert!(matches!(
            "x10".parse::<NominalSize>(),
            Err(SizeError::NotASize(_))
        ));
    }

    #[test]
    fn measured_sections_find_their_nominal() {
        let rough = Section::measured("2x10", None).unwrap();
        assert_eq!(rough.nominal, NominalSize::new(2, 10));
        assert!(rough.rough_sawn);
        let s = Section::measured("1.625x9.5", None).unwrap();
        assert_eq!(s.nominal, NominalSize::new(2, 10));
        assert_eq!(s.depth.in_inches(), 9.5);
        let s = Section::measured("1-5/8 x 9-1/2", None).unwrap();
        assert_eq!(s.thickness.in_inches(), 1.625);
        assert!(matches!(
            Section::measured("0x10", None),
            Err(SizeError::OutOfRange(_))
        ));
        assert!(matches!(
            Section::measured("2x30", None),
            Err(SizeError::OutOfRange(_))
        ));
        assert!(matches!(
            Section::measured("2xabc", None),
            Err(SizeError::BadDimension(..))
        ));
        assert!(matches!(
            Section::measured("2x20", None),
            Err(SizeError::Unsupported(_))
        ));
    }
}
