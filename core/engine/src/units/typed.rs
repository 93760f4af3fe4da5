//! The one rule for a number typed with no unit, in every length field of the app: it is
//! inches (millimetres when the inspection is metric), as a tape's inch scale reads. Feet
//! always carry their mark: `15'`, `15' 2"`, `15-2`. A value that reads but cannot be what
//! was meant (a 15 in joist span) is questioned by `forms::plausible`, not guessed at.

use super::{parse_length, Length, LengthError, UnitSystem};

/// Inches per unit of a bare number.
pub fn bare_number_inches(units: UnitSystem) -> f64 {
    match units {
        UnitSystem::Imperial => 1.0,
        UnitSystem::Metric => 1.0 / 25.4,
    }
}

/// What every length field shows while empty, so the rule is in sight where it applies.
pub fn bare_number_hint(units: UnitSystem) -> &'static str {
    match units {
        UnitSystem::Imperial => "a number alone is inches; feet with '",
        UnitSystem::Metric => "a number alone is mm",
    }
}

/// A length as typed into any field of the app.
pub fn parse_typed_length(text: &str, units: UnitSystem) -> Result<Length, LengthError> {
    parse_length(text, Some(bare_number_inches(units)))
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn a_bare_number_is_inches_or_millimetres_and_feet_need_their_mark() {
        let imperial = |t: &str| {
            parse_typed_length(t, UnitSystem::Imperial)
                .unwrap()
                .in_inches()
        };
        assert_eq!(imperial("182"), 182.0);
        assert_eq!(imperial("36"), 36.0);
        assert_eq!(imperial("15'"), 180.0);
        assert_eq!(imperial("15' 2\""), 182.0);
        assert_eq!(imperial("15-2"), 182.0);
        assert_eq!(imperial("1 1/2"), 1.5);
        let mm = parse_typed_length("4150", UnitSystem::Metric).unwrap();
        assert!((mm.in_millimetres() - 4150.0).abs() < 1e-9);
    }
}
