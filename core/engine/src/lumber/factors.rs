//! NDS adjustment factors: size (CF), repetitive member (Cr), load duration (CD), wet service (CM).

use super::{NominalSize, Species};
use serde::{Deserialize, Serialize};

/// Repetitive member factor for Fb of dimension lumber 2 to 4 in thick, spaced not more than
/// 24 in on centres, three or more members joined by a load-distributing element.
/// Source: NDS (2018) 4.3.9 and NDS Supplement Table 4A adjustment factors, Cr = 1.15.
pub const REPETITIVE_MEMBER_FACTOR: f64 = 1.15;

/// Size factor CF for Fb of visually graded dimension lumber.
/// Source: NDS Supplement (2018) Table 4A, size factors: 2 and 3 in thick: width <= 4 in 1.5,
/// 6 in 1.3, 8 in 1.2, 10 in 1.1, 12 in 1.0, 14 in and wider 0.9; 4 in thick: 1.5, 1.3, 1.3,
/// 1.2, 1.1, 1.0 (the same values in an open-source tabulation of Table 4A, checked against
/// it). Southern pine values include CF already (Table 4B), so 1.0.
pub fn size_factor_fb(species: Species, size: NominalSize) -> f64 {
    if species == Species::SouthernPine {
        return 1.0;
    }
    let four_inch = size.thickness >= 4;
    match (size.depth, four_inch) {
        (0..=4, _) => 1.5,
        (5, _) => 1.4,
        (6..=7, _) => 1.3,
        (8..=9, false) => 1.2,
        (8..=9, true) => 1.3,
        (10..=11, false) => 1.1,
        (10..=11, true) => 1.2,
        (12..=13, false) => 1.0,
        (12..=13, true) => 1.1,
        (_, false) => 0.9,
        (_, true) => 1.0,
    }
}

/// Load durations of NDS Table 2.3.2.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Default, Serialize, Deserialize)]
#[serde(rename_all = "kebab-case")]
pub enum LoadDuration {
    Permanent,
    /// Occupancy live load: the floor case.
    #[default]
    TenYears,
    TwoMonths,
    SevenDays,
    TenMinutes,
    Impact,
}

/// Load duration factor CD. Applies to Fb, Ft, Fv, Fc; not to E or Fc-perp.
/// Source: NDS (2018) Table 2.3.2.
pub fn load_duration_factor(duration: LoadDuration) -> f64 {
    match duration {
        LoadDuration::Permanent => 0.9,
        LoadDuration::TenYears => 1.0,
        LoadDuration::TwoMonths => 1.15,
        LoadDuration::SevenDays => 1.25,
        LoadDuration::TenMinutes => 1.6,
        LoadDuration::Impact => 2.0,
    }
}

/// Wet service factors CM, for moisture content above 19 %.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct WetFactors {
    pub fb: f64,
    pub fv: f64,
    pub fc_perp: f64,
    pub e: f64,
}

impl WetFactors {
    pub const DRY: WetFactors = WetFactors {
        fb: 1.0,
        fv: 1.0,
        fc_perp: 1.0,
        e: 1.0,
    };
}

/// Wet service factors for a member whose Fb x CF is `fb_times_cf`.
/// Source: NDS Supplement (2018) Table 4A adjustment factors: Fb 0.85, or 1.0 when
/// Fb x CF <= 1150 psi; Fv 0.97; Fc-perp 0.67; E and Emin 0.9 (the same values in two
/// open-source tabulations of Table 4A, checked against them).
pub fn wet_service(fb_times_cf: f64) -> WetFactors {
    WetFactors {
        fb: if fb_times_cf <= 1150.0 { 1.0 } else { 0.85 },
        fv: 0.97,
        fc_perp: 0.67,
        e: 0.9,
    }
}

/// Wet service factor for Fc of a member whose Fc x CF is `fc_times_cf`.
/// Source: NDS Supplement (2018) Table 4A adjustment factors: Fc 0.8, or 1.0 when
/// Fc x CF <= 750 psi (the same in an open-source tabulation of Table 4A, checked against it).
pub fn wet_service_fc(fc_times_cf: f64) -> f64 {
    if fc_times_cf <= 750.0 {
        1.0
    } else {
        0.8
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    // Source: NDS Supplement (2018) Table 4A size factors for Fb, 2 in thick.
    #[test]
    fn size_factors_two_inch() {
        let table = [
            (4, 1.5),
            (6, 1.3),
            (8, 1.2),
            (10, 1.1),
            (12, 1.0),
            (14, 0.9),
        ];
        for (depth, cf) in table {
            assert_eq!(
                size_factor_fb(Species::SprucePineFir, NominalSize::new(2, depth)),
                cf,
                "2x{depth}"
            );
        }
        assert_eq!(
            size_factor_fb(Species::SouthernPine, NominalSize::new(2, 10)),
            1.0
        );
    }

    // Source: NDS (2018) Table 2.3.2.
    #[test]
    fn load_duration() {
        assert_eq!(load_duration_factor(LoadDuration::TenYears), 1.0);
        assert_eq!(load_duration_factor(LoadDuration::Permanent), 0.9);
        assert_eq!(load_duration_factor(LoadDuration::TwoMonths), 1.15);
    }

    // Source: NDS Supplement (2018) Table 4A, wet service factor for Fb.
    #[test]
    fn wet_fb_threshold() {
        assert_eq!(wet_service(1150.0).fb, 1.0);
        assert_eq!(wet_service(1150.1).fb, 0.85);
        assert_eq!(wet_service(800.0).e, 0.9);
    }
}
