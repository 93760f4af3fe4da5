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
    /// The n of the live-load deflection limit L/n.
    pub deflection_denominator: f64,
    pub wet_service: bool,
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
    /// End reaction under the total load (lb).
    pub reaction_lb: f64,
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
    if !span.is_finite() || span <= 0.0 || input.plies == 0 || !loads_read {
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
    let fb_allowed = design.fb.0 * cd * wet.fb * cf * cr;
    let fv_allowed = design.fv.0 * cd * wet.fv;
    let e = design.e.0 * wet.e;
    let (w_total, w_live) = (input.total_plf / 12.0, input.live_plf / 12.0);
    let moment = w_total * span * span / 8.0;
    let shear = w_total * span / 2.0;
    let section_modulus = b * d * d / 6.0;
    let inertia = b * d * d * d / 12.0;
    let deflection = 5.0 * w_live * span.powi(4) / (384.0 * e * inertia);
    Some(BeamChecks {
        bending: (moment / section_modulus, fb_allowed),
        shear: (1.5 * shear / (b * d), fv_allowed),
        deflection: (deflection, span / input.deflection_denominator),
        reaction_lb: shear,
    })
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
            deflection_denominator: 360.0,
            wet_service: false,
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
        assert!((c.reaction_lb - 2400.0).abs() < 1e-9);
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
            deflection_denominator: 360.0,
            wet_service: false,
            duration: LoadDuration::TenYears,
            repetitive: true,
        })
        .unwrap();
        assert!((c.ratios()[0] - 1.0).abs() < 0.001, "{:?}", c.ratios());
    }

    #[test]
    fn impossible_beams_are_not_computed() {
        assert!(check_beam(&girder(0, 96.0, 600.0, 480.0)).is_none());
        assert!(check_beam(&girder(2, 0.0, 600.0, 480.0)).is_none());
        assert!(check_beam(&girder(2, 96.0, 100.0, 480.0)).is_none());
    }
}
