//! Capacity of a solid sawn wood post in axial compression by NDS column stability (NDS 2018
//! 3.6 and 3.7): the slenderness le/d held to 50, the column stability factor Cp, and the
//! allowable load on the gross area.

use crate::lumber::{
    design_values, load_duration_factor, wet_service_fc, Grade, LoadDuration, NominalSize, Species,
};
use crate::units::Length;

/// Source: NDS 2018 3.7.1.4: the slenderness ratio le/d of a solid column shall not exceed 50.
pub const MAX_SLENDERNESS: f64 = 50.0;
/// Source: NDS 2018 3.7.1.5: c = 0.8 for sawn lumber.
const C_SAWN: f64 = 0.8;
/// Source: NDS 2018 Equation 3.7-1: FcE = 0.822 Emin' / (le/d)^2.
const EULER_COEFFICIENT: f64 = 0.822;

/// A post as measured: nominal size (its least dressed side is d), species, grade, unbraced
/// length, wet or dry, and the load duration.
#[derive(Debug, Clone, PartialEq)]
pub struct PostInput {
    pub species: Species,
    pub grade: Grade,
    pub size: NominalSize,
    /// Unbraced length between points of lateral support (effective length factor Ke = 1.0,
    /// pinned at both ends: NDS Appendix G, Table G1).
    pub unbraced: Length,
    pub wet_service: bool,
    pub duration: LoadDuration,
}

/// The computation, every factor shown.
#[derive(Debug, Clone, PartialEq)]
pub struct PostCapacity {
    pub slenderness: f64,
    /// Fc* = Fc CD CM CF (psi).
    pub fc_star: f64,
    /// FcE = 0.822 Emin' / (le/d)^2 (psi).
    pub fc_e: f64,
    pub cp: f64,
    /// Fc' = Fc* Cp (psi).
    pub fc_adjusted: f64,
    /// Gross area (in^2) and the allowable axial load Fc' A (lb).
    pub area: f64,
    pub capacity_lb: f64,
}

/// Size factor CF for Fc of dimension lumber by width.
/// Source: NDS Supplement (2018) Table 4A size factors, Fc: 2, 3 and 4 in wide 1.15; 5 and
/// 6 in 1.1; 8 in 1.05; 10 and 12 in 1.0; 14 in and wider 0.9.
pub fn size_factor_fc(width: u8) -> f64 {
    match width {
        0..=4 => 1.15,
        5..=6 => 1.1,
        7..=8 => 1.05,
        9..=12 => 1.0,
        _ => 0.9,
    }
}

/// Source: NDS 2018 Equation 3.7-1, the column stability factor.
pub fn column_stability_factor(fc_e: f64, fc_star: f64, c: f64) -> f64 {
    let r = fc_e / fc_star;
    let a = (1.0 + r) / (2.0 * c);
    a - (a * a - r / c).sqrt()
}

/// The post's allowable axial load; None when the lumber has no design values here or the
/// post is more slender than NDS allows (le/d over 50), which is its own finding.
pub fn post_capacity(input: &PostInput) -> Option<PostCapacity> {
    let design = design_values(input.species, input.grade, input.size)?;
    let section = input.size.dressed_section();
    let d = section.thickness.in_inches().min(section.depth.in_inches());
    let slenderness = input.unbraced.in_inches() / d;
    if !(slenderness > 0.0 && slenderness <= MAX_SLENDERNESS) {
        return None;
    }
    let cf = if design.size_factor_included {
        1.0
    } else {
        size_factor_fc(input.size.depth)
    };
    let (wet, wet_e) = if input.wet_service {
        (
            wet_service_fc(design.fc.0 * cf),
            crate::lumber::wet_service(design.fb.0).e,
        )
    } else {
        (1.0, 1.0)
    };
    let fc_star = design.fc.0 * load_duration_factor(input.duration) * wet * cf;
    let fc_e = EULER_COEFFICIENT * design.e_min.0 * wet_e / (slenderness * slenderness);
    let cp = column_stability_factor(fc_e, fc_star, C_SAWN);
    let area = section.thickness.in_inches() * section.depth.in_inches();
    Some(PostCapacity {
        slenderness,
        fc_star,
        fc_e,
        cp,
        fc_adjusted: fc_star * cp,
        area,
        capacity_lb: fc_star * cp * area,
    })
}

#[cfg(test)]
mod tests {
    use super::*;

    // Hand calculation by NDS 2018 3.7.1, every factor shown. A Douglas fir-larch No. 2 4x4
    // post (3.5 x 3.5 in), 7 ft unbraced, dry, ten-year (occupancy) load:
    //   Fc 1350 psi, Emin 580,000 psi (NDS Supplement 2018 Table 4A); CF for Fc 1.15 (4 in);
    //   le/d = 84 / 3.5 = 24;  FcE = 0.822 x 580,000 / 24^2 = 827.7 psi;
    //   Fc* = 1350 x 1.0 x 1.15 = 1552.5 psi;  FcE/Fc* = 0.5331;
    //   Cp = (1 + 0.5331)/1.6 - sqrt(((1 + 0.5331)/1.6)^2 - 0.5331/0.8) = 0.4564;
    //   Fc' = 708.6 psi;  P = 708.6 x 12.25 = 8681 lb.
    #[test]
    fn a_4x4_post_by_hand() {
        let p = post_capacity(&PostInput {
            species: Species::DouglasFirLarch,
            grade: Grade::No2,
            size: NominalSize::new(4, 4),
            unbraced: Length::feet(7.0),
            wet_service: false,
            duration: LoadDuration::TenYears,
        })
        .unwrap();
        assert!((p.slenderness - 24.0).abs() < 1e-9);
        assert!((p.fc_e - 827.7).abs() < 0.1, "{}", p.fc_e);
        assert!((p.fc_star - 1552.5).abs() < 1e-9);
        assert!((p.cp - 0.4564).abs() < 0.0005, "{}", p.cp);
        assert!((p.capacity_lb - 8681.0).abs() < 10.0, "{}", p.capacity_lb);
    }

    // Source: NDS 2018 3.7.1.4: le/d over 50 is not allowed; at 50 it is computed.
    #[test]
    fn slenderness_limit() {
        let post = |inches: f64| PostInput {
            species: Species::DouglasFirLarch,
            grade: Grade::No2,
            size: NominalSize::new(4, 4),
            unbraced: Length::inches(inches),
            wet_service: false,
            duration: LoadDuration::TenYears,
        };
        assert!(post_capacity(&post(175.0)).is_some()); // 50.0
        assert!(post_capacity(&post(175.5)).is_none());
    }

    // A short column tends to Cp = 1 (FcE much larger than Fc*); a long one to FcE/Fc* / c
    // behaviour: Cp stays within (0, 1].
    #[test]
    fn cp_is_between_zero_and_one() {
        for r in [0.01, 0.1, 0.5, 1.0, 5.0, 100.0] {
            let cp = column_stability_factor(r * 1000.0, 1000.0, 0.8);
            assert!(cp > 0.0 && cp <= 1.0, "{r}: {cp}");
        }
        assert!(column_stability_factor(1e9, 1000.0, 0.8) > 0.999);
    }
}
