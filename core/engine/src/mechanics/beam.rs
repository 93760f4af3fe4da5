//! A simply supported sawn beam (a joist, or a girder of one to four plies) under a uniform
//! line load: bending, shear and live-load deflection each as a share of what NDS allows.

use crate::lumber::{
    design_values, load_duration_factor, size_factor_fb, wet_service, Grade, LoadDuration,
    NominalSize, Species, REPETITIVE_MEMBER_FACTOR,
};
use crate::units::Length;

/// A beam as measured and loaded.
#[derive(Debug, Clone, PartialEq)]
pub struct BeamInput {
    pub species: Species,
    pub grade: Grade,
    /// The size of one ply.
    pub ply: NominalSize,
    /// Plies side by side (1 for a joist or a solid member).
    pub plies: u8,
    pub span: Length,
    /// Uniform loads along the beam, lb per foot.
    pub total_plf: f64,
    pub live_plf: f64,
    /// Point loads standing on the span (dead load): distance from the left support (in)
    /// and pounds.
    pub points: Vec<(f64, f64)>,
    /// The n of the live-load deflection limit L/n.
    pub deflection_denominator: f64,
    pub wet_service: bool,
    /// Incised for preservative treatment (NDS 2018 4.3.8).
    pub incised: bool,
    pub duration: LoadDuration,
    /// Whether the repetitive-member factor applies (the caller decides and says why).
    pub repetitive: bool,
}

/// Each check's demand against its capacity; a ratio above 1 is over.
#[derive(Debug, Clone, PartialEq)]
pub struct BeamChecks {
    /// fb against Fb' (psi).
    pub bending: (f64, f64),
    /// fv against Fv' (psi).
    pub shear: (f64, f64),
    /// Live-load deflection against L/n (in).
    pub deflection: (f64, f64),
    /// End reactions under the total load (lb), left and right.
    pub reactions_lb: (f64, f64),
    /// The beam's width (all plies), for bearing.
    pub width_in: f64,
    /// Fc-perp' (psi), for bearing at the supports.
    pub fc_perp_psi: f64,
}

impl BeamChecks {
    pub fn ratios(&self) -> [f64; 3] {
        [
            self.bending.0 / self.bending.1,
            self.shear.0 / self.shear.1,
            self.deflection.0 / self.deflection.1,
        ]
    }
}

/// Source: NDS 2018 3.3 (fb = M / S), 3.4.2 (fv = 3V / 2bd, V = wL/2 taken at the support,
/// which is conservative), 3.5 (simple-span deflection 5wL^4 / 384EI, Table R301.7 for the
/// limit). The compression edge is taken as braced by what bears on it (CL = 1.0, NDS
/// 3.3.3.3). None when the lumber has no design values here or the input cannot be a beam.
pub fn check_beam(input: &BeamInput) -> Option<BeamChecks> {
    let design = design_values(input.species, input.grade, input.ply)?;
    let span = input.span.in_inches();
    let loads_read = input.total_plf.is_finite() && input.total_plf >= input.live_plf;
    let points_read = input
        .points
        .iter()
        .all(|(a, p)| a.is_finite() && p.is_finite() && *p >= 0.0 && (0.0..=span).contains(a));
    if !span.is_finite() || span <= 0.0 || input.plies == 0 || !loads_read || !points_read {
        return None;
    }
    let section = input.ply.dressed_section();
    let (b, d) = (
        section.thickness.in_inches() * input.plies as f64,
        section.depth.in_inches(),
    );
    let cf = if design.size_factor_included {
        1.0
    } else {
        size_factor_fb(input.species, input.ply)
    };
    let wet = if input.wet_service {
        wet_service(design.fb.0 * cf)
    } else {
        crate::lumber::WetFactors::DRY
    };
    let cd = load_duration_factor(input.duration);
    let cr = if input.repetitive {
        REPETITIVE_MEMBER_FACTOR
    } else {
        1.0
    };
    let incising = if input.incised {
        INCISED
    } else {
        IncisingFactors::NONE
    };
    let fb_allowed = design.fb.0 * cd * wet.fb * cf * cr * incising.strength;
    let fv_allowed = design.fv.0 * cd * wet.fv * incising.strength;
    let e = design.e.0 * wet.e * incising.stiffness;
    let (w_total, w_live) = (input.total_plf / 12.0, input.live_plf / 12.0);
    let (left, right) = reactions(span, w_total, &input.points);
    let moment = max_moment(span, w_total, left, &input.points);
    let shear = left.max(right);
    let section_modulus = b * d * d / 6.0;
    let inertia = b * d * d * d / 12.0;
    let deflection = 5.0 * w_live * span.powi(4) / (384.0 * e * inertia);
    Some(BeamChecks {
        bending: (moment / section_modulus, fb_allowed),
        shear: (1.5 * shear / (b * d), fv_allowed),
        deflection: (deflection, span / input.deflection_denominator),
        reactions_lb: (left, right),
        width_in: b,
        fc_perp_psi: design.fc_perp.0 * wet.fc_perp,
    })
}

/// Incising factors for dimension lumber incised for preservative treatment.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct IncisingFactors {
    /// On Fb, Ft, Fc and Fv.
    pub strength: f64,
    /// On E and Emin.
    pub stiffness: f64,
}

impl IncisingFactors {
    pub const NONE: IncisingFactors = IncisingFactors {
        strength: 1.0,
        stiffness: 1.0,
    };
}

/// Source: NDS 2018 Table 4.3.8, incising factors Ci: E and Emin 0.95; Fb, Ft, Fc, Fv 0.80;
/// Fc-perp 1.00.
pub const INCISED: IncisingFactors = IncisingFactors {
    strength: 0.80,
    stiffness: 0.95,
};

/// Support reactions of a simple span under a uniform load (lb/in) and point loads.
pub fn reactions(span: f64, w: f64, points: &[(f64, f64)]) -> (f64, f64) {
    let (mut left, mut right) = (w * span / 2.0, w * span / 2.0);
    for (a, p) in points {
        left += p * (span - a) / span;
        right += p * a / span;
    }
    (left, right)
}

/// Largest bending moment (lb-in) of the span: at a point load or where the uniform load's
/// shear crosses zero between them.
fn max_moment(span: f64, w: f64, left: f64, points: &[(f64, f64)]) -> f64 {
    let moment_at = |x: f64| {
        left * x
            - w * x * x / 2.0
            - points
                .iter()
                .filter(|(a, _)| *a < x)
                .map(|(a, p)| p * (x - a))
                .sum::<f64>()
    };
    let mut candidates: Vec<f64> = points.iter().map(|(a, _)| *a).collect();
    if w > 0.0 {
        // Shear is zero where left - w x - (points before x) = 0, on one of the segments.
        let mut sorted = candidates.clone();
        sorted.sort_by(f64::total_cmp);
        sorted.dedup();
        let mut before = 0.0;
        let mut start = 0.0;
        for a in sorted.iter().copied().chain([span]) {
            let x = (left - before) / w;
            if x >= start && x <= a {
                candidates.push(x);
            }
            before += points
                .iter()
                .filter(|(pa, _)| *pa == a)
                .map(|(_, p)| p)
                .sum::<f64>();
            start = a;
        }
    }
    candidates.into_iter().map(moment_at).fold(0.0, f64::max)
}

#[cfg(test)]
mod tests {
    use super::*;

    fn girder(plies: u8, span_in: f64, total: f64, live: f64) -> BeamInput {
        BeamInput {
            species: Species::DouglasFirLarch,
            grade: Grade::No2,
            ply: NominalSize::new(2, 10),
            plies,
            span: Length::inches(span_in),
            total_plf: total,
            live_plf: live,
            points: vec![],
            deflection_denominator: 360.0,
            wet_service: false,
            incised: false,
            duration: LoadDuration::TenYears,
            repetitive: false,
        }
    }

    // Hand calculation (NDS 2018 3.3, 3.4.2, 3.5), every number shown: a 3-ply 2x10 Douglas
    // fir-larch No. 2 girder, 8 ft span, 600 plf total (50 lb/in), 480 plf live (40 lb/in).
    //   Fb 900, Fv 180, E 1,600,000 psi (NDS Supplement 2018 Table 4A); CF 1.1; CD 1.0;
    //   M = 50 x 96^2 / 8 = 57,600 lb-in; S = 3 x 1.5 x 9.25^2 / 6 = 64.17 in^3;
    //   fb = 897.6 psi against Fb' = 990 psi (0.907);
    //   V = 2400 lb; fv = 1.5 x 2400 / 41.625 = 86.5 psi against 180 psi (0.480);
    //   I = 296.79 in^4; live deflection = 5 x 40 x 96^4 / (384 x 1.6e6 x 296.79) = 0.0932 in
    //   against L/360 = 0.2667 in (0.349).
    #[test]
    fn a_three_ply_girder_by_hand() {
        let c = check_beam(&girder(3, 96.0, 600.0, 480.0)).unwrap();
        let [bending, shear, deflection] = c.ratios();
        assert!((c.bending.0 - 897.6).abs() < 0.1, "{:?}", c.bending);
        assert!((c.bending.1 - 990.0).abs() < 1e-9);
        assert!((bending - 0.9067).abs() < 0.0005, "{bending}");
        assert!((shear - 0.4805).abs() < 0.0005, "{shear}");
        assert!((deflection - 0.3493).abs() < 0.0005, "{deflection}");
        assert_eq!(c.reactions_lb, (2400.0, 2400.0));
    }

    // Source: IRC 2015 Table R502.3.1(2), SPF No. 2 2x10 at 16 in, 40/10 psf: 15-5; by NDS
    // mechanics the bending span is 184.65 in (the span module's check). The same joist as a
    // beam with 66.7 plf total at that span uses all of its bending capacity.
    #[test]
    fn agrees_with_the_joist_span_tables() {
        let c = check_beam(&BeamInput {
            species: Species::SprucePineFir,
            grade: Grade::No2,
            ply: NominalSize::new(2, 10),
            plies: 1,
            span: Length::inches(184.65),
            total_plf: 50.0 * 16.0 / 12.0,
            live_plf: 40.0 * 16.0 / 12.0,
            points: vec![],
            deflection_denominator: 360.0,
            wet_service: false,
            incised: false,
            duration: LoadDuration::TenYears,
            repetitive: true,
        })
        .unwrap();
        assert!((c.ratios()[0] - 1.0).abs() < 0.001, "{:?}", c.ratios());
    }

    // Statics (any mechanics text, e.g. AWC Design Aid 6 "Beam design formulas", cases 1, 7
    // and 8): a 10 ft span with 100 lb/ft uniform and 1000 lb at 4 ft from the left.
    //   Reactions: 500 + 1000 x 6/10 = 1100 lb and 500 + 400 = 900 lb.
    //   Shear is 1100 - 8.333 x (x in inches) until 48 in: 700 lb left of the point load,
    //   -300 lb right of it, so the largest moment is under the load:
    //   M = 1100 x 48 - 8.333 x 48^2 / 2 = 52,800 - 9,600 = 43,200 lb-in.
    #[test]
    fn a_point_load_on_the_span() {
        let mut input = girder(2, 120.0, 100.0, 0.0);
        input.points = vec![(48.0, 1000.0)];
        let c = check_beam(&input).unwrap();
        assert!((c.reactions_lb.0 - 1100.0).abs() < 1e-9);
        assert!((c.reactions_lb.1 - 900.0).abs() < 1e-9);
        let s = 2.0 * 1.5 * 9.25 * 9.25 / 6.0;
        assert!(
            (c.bending.0 * s - 43_200.0).abs() < 0.5,
            "{}",
            c.bending.0 * s
        );
        // A point load near the end: the moment peaks between it and midspan.
        input.points = vec![(6.0, 100.0)];
        let c = check_beam(&input).unwrap();
        let (left, w) = (c.reactions_lb.0, 100.0 / 12.0);
        let x = (left - 100.0) / w;
        let expected = left * x - w * x * x / 2.0 - 100.0 * (x - 6.0);
        assert!((c.bending.0 * s - expected).abs() < 0.5);
    }

    // Source: NDS 2018 Table 4.3.8: incised lumber, Fb x 0.80 and E x 0.95.
    #[test]
    fn incising_reduces_strength_and_stiffness() {
        let plain = check_beam(&girder(2, 96.0, 600.0, 480.0)).unwrap();
        let mut input = girder(2, 96.0, 600.0, 480.0);
        input.incised = true;
        let incised = check_beam(&input).unwrap();
        assert!((incised.bending.1 / plain.bending.1 - 0.80).abs() < 1e-12);
        assert!((incised.deflection.0 / plain.deflection.0 - 1.0 / 0.95).abs() < 1e-12);
    }

    #[test]
    fn impossible_beams_are_not_computed() {
        assert!(check_beam(&girder(0, 96.0, 600.0, 480.0)).is_none());
        assert!(check_beam(&girder(2, 0.0, 600.0, 480.0)).is_none());
        assert!(check_beam(&girder(2, 96.0, 100.0, 480.0)).is_none());
        let mut beyond = girder(2, 96.0, 600.0, 480.0);
        beyond.points = vec![(100.0, 500.0)];
        assert!(check_beam(&beyond).is_none());
    }
}
