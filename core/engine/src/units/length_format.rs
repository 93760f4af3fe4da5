//! Formats a length back the way a tape reads: feet-inches to the nearest 1/16 in, or mm.

use super::Length;
use serde::{Deserialize, Serialize};

/// Which units lengths are shown in.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Default, Serialize, Deserialize)]
#[serde(rename_all = "kebab-case")]
pub enum UnitSystem {
    #[default]
    Imperial,
    Metric,
}

/// `13' 7-1/2"`, `7/8"`, `0"` in imperial; `4150 mm` in metric.
pub fn format_length(length: Length, units: UnitSystem) -> String {
    match units {
        UnitSystem::Metric => format!("{:.0} mm", length.in_millimetres()),
        UnitSystem::Imperial => feet_inches(length),
    }
}

/// A member dimension or a short length: inches only in imperial (`14"`, `9-1/4"`), which is
/// how sizes, spacings, notches and holes are spoken of; mm in metric.
pub fn format_dimension(length: Length, units: UnitSystem) -> String {
    match units {
        UnitSystem::Metric => format!("{:.0} mm", length.in_millimetres()),
        UnitSystem::Imperial => inches_only(length),
    }
}

/// A joist spacing: the 19.2 in layout (five joists to 8 ft) is shown as the trade and the
/// code's tables name it, 19.2", not rounded to 19-3/16"; any other as a dimension.
pub fn format_spacing(length: Length, units: UnitSystem) -> String {
    let tenths = length.in_inches() * 10.0;
    let on_tenths = (tenths - tenths.round()).abs() < 1e-6;
    let on_grid = {
        let s = length.in_inches() * 16.0;
        (s - s.round()).abs() < 1e-6
    };
    match units {
        UnitSystem::Imperial if on_tenths && !on_grid => {
            format!("{:.1}\"", length.in_inches())
        }
        _ => format_dimension(length, units),
    }
}

/// The grid lengths are shown on: 1/16 in, or 1 mm.
fn display_step_inches(units: UnitSystem) -> f64 {
    match units {
        UnitSystem::Imperial => 1.0 / 16.0,
        UnitSystem::Metric => 1.0 / super::length::MM_PER_INCH,
    }
}

/// Steps of the display grid in a length, with a tolerance for values already on the grid.
fn steps(length: Length, units: UnitSystem) -> f64 {
    length.in_inches() / display_step_inches(units)
}

/// A maximum as shown: rounded down to the display grid, so that a value equal to the
/// shown limit passes (2x10 d/6 = 1.542 in is shown, and held, as 1-1/2 in).
pub fn round_down(length: Length, units: UnitSystem) -> Length {
    Length::inches((steps(length, units) + 1e-6).floor().max(0.0) * display_step_inches(units))
}

/// A minimum as shown: rounded up to the display grid.
pub fn round_up(length: Length, units: UnitSystem) -> Length {
    Length::inches((steps(length, units) - 1e-6).ceil().max(0.0) * display_step_inches(units))
}

fn feet_inches(length: Length) -> String {
    let sixteenths = (length.in_inches() * 16.0).round().max(0.0) as u64;
    let feet = sixteenths / 192;
    let inches = inches_text(sixteenths % 192);
    if feet == 0 {
        inches
    } else {
        format!("{feet}' {inches}")
    }
}

fn inches_only(length: Length) -> String {
    inches_text((length.in_inches() * 16.0).round().max(0.0) as u64)
}

/// Whole inches and a reduced fraction of sixteenths: `7-1/2"`, `7/8"`, `0"`.
fn inches_text(sixteenths: u64) -> String {
    let (whole, mut top, mut bottom) = (sixteenths / 16, sixteenths % 16, 16);
    while top != 0 && top % 2 == 0 {
        top /= 2;
        bottom /= 2;
    }
    match (whole, top) {
        (w, 0) => format!("{w}\""),
        (0, t) => format!("{t}/{bottom}\""),
        (w, t) => format!("{w}-{t}/{bottom}\""),
    }
}

#[cfg(test)]
mod tests {
    // A limit shown is the limit held: maxima round down, minima up, on the shown grid.
    // Source: IRC 2018 R502.8.1 (d/6 of a 9-1/4 in 2x10 is 1.542 in).
    #[test]
    fn limits_round_towards_the_safe_side() {
        use super::{round_down, round_up};
        let d6 = Length::inches(9.25 / 6.0);
        assert_eq!(round_down(d6, UnitSystem::Imperial), Length::inches(1.5));
        assert_eq!(round_up(d6, UnitSystem::Imperial), Length::inches(1.5625));
        assert_eq!(
            round_down(Length::inches(1.5), UnitSystem::Imperial),
            Length::inches(1.5)
        );
        assert_eq!(
            round_up(Length::inches(1.5), UnitSystem::Imperial),
            Length::inches(1.5)
        );
        let mm = round_down(d6, UnitSystem::Metric).in_millimetres();
        assert!((mm - 39.0).abs() < 1e-9, "{mm}");
        assert!((round_up(d6, UnitSystem::Metric).in_millimetres() - 40.0).abs() < 1e-9);
    }
    use super::*;
    use crate::units::parse_length;
    use proptest::prelude::*;

    #[test]
    fn examples() {
        let table: &[(f64, &str)] = &[
            (163.5, "13' 7-1/2\""),
            (192.0, "16' 0\""),
            (0.875, "7/8\""),
            (0.0, "0\""),
            (12.0625, "1' 1/16\""),
            (185.0, "15' 5\""),
            (11.99, "1' 0\""),
            (9.25, "9-1/4\""),
        ];
        for (inches, text) in table {
            assert_eq!(
                format_length(Length::inches(*inches), UnitSystem::Imperial),
                *text
            );
        }
        assert_eq!(
            format_length(Length::millimetres(4150.0), UnitSystem::Metric),
            "4150 mm"
        );
        assert_eq!(
            format_dimension(Length::inches(14.0), UnitSystem::Imperial),
            "14\""
        );
        assert_eq!(
            format_dimension(Length::inches(19.2), UnitSystem::Imperial),
            "19-3/16\""
        );
        // Source: IRC 2018 Table R502.3.1(2) names the layout "19.2" in its column heads.
        assert_eq!(
            super::format_spacing(Length::inches(19.2), UnitSystem::Imperial),
            "19.2\""
        );
        assert_eq!(
            super::format_spacing(Length::inches(16.0), UnitSystem::Imperial),
            "16\""
        );
        assert_eq!(
            super::format_spacing(Length::inches(19.2), UnitSystem::Metric),
            "488 mm"
        );
        assert_eq!(
            format_dimension(Length::inches(0.4375), UnitSystem::Imperial),
            "7/16\""
        );
    }

    proptest! {
        #[test]
        fn imperial_round_trips(sixteenths in 0u32..192_000) {
            let length = Length::inches(sixteenths as f64 / 16.0);
            let text = format_length(length, UnitSystem::Imperial);
            let back = parse_length(&text, None).unwrap();
            prop_assert_eq!(back.in_inches(), length.in_inches(), "{}", text);
        }

        #[test]
        fn metric_round_trips(mm in 0u32..300_000) {
            let length = Length::millimetres(mm as f64);
            let text = format_length(length, UnitSystem::Metric);
            let back = parse_length(&text, None).unwrap();
            prop_assert!((back.in_millimetres() - mm as f64).abs() < 1e-6, "{}", text);
        }

        #[test]
        fn no_input_panics(text in "\\PC{0,60}") {
            let _ = parse_length(&text, None);
            let _ = parse_length(&text, Some(12.0));
        }

        #[test]
        fn tape_like_input_never_panics(text in "[0-9 .'\"/ftinmc\u{2019}\u{201D}-]{0,40}") {
            if let Ok(length) = parse_length(&text, Some(1.0)) {
                prop_assert!(length.in_inches().is_finite() && length.in_inches() >= 0.0);
            }
        }
    }
}
