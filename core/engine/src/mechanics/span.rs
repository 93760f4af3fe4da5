//! Allowable span of a sawn joist from bending, live-load deflection and shear, and the end
//! reaction with the bearing length that Fc-perp requires.

use crate::lumber::{
    design_values, load_duration_factor, size_factor_fb, wet_service, DesignValues, Grade,
    LoadDuration, Section, Species, WetFactors, REPETITIVE_MEMBER_FACTOR,
};
use crate::units::{Length, Psf, Psi};
use serde::Serialize;

/// Which check sets the allowable span.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize)]
#[serde(rename_all = "lowercase")]
pub enum Governing {
    Bending,
    Deflection,
    Shear,
}

impl Governing {
    pub fn name(self) -> &'static str {
        match self {
            Governing::Bending => "bending",
            Governing::Deflection => "deflection",
            Governing::Shear => "shear",
        }
    }
}

/// Everything the span computation needs, already validated.
#[derive(Debug, Clone, PartialEq)]
pub struct SpanInput {
    pub species: Species,
    pub grade: Grade,
    pub section: Section,
    pub spacing: Length,
    pub live: Psf,
    pub dead: Psf,
    /// The n of L/n for live-load deflection (360 for floors, Table R301.7).
    pub deflection_denominator: f64,
    pub wet_service: bool,
    /// Incised for preservative treatment (NDS 2018 Table 4.3.8).
    pub incised: bool,
    pub duration: LoadDuration,
    /// Three or more members at most 24 in apart sharing the load (Cr applies).
    pub repetitive: bool,
}

/// The result: each check's span, the governing one, and the adjusted values used.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct SpanResult {
    /// Unrounded allowable span, inches.
    pub allowable_span_in: f64,
    /// As the printed tables give it: to the nearest inch.
    pub allowable_span_rounded_in: f64,
    pub governing: Governing,
    pub bending_span_in: f64,
    pub deflection_span_in: f64,
    pub shear_span_in: f64,
    pub factors: AppliedFactors,
    /// Line loads, lb per inch of joist.
    pub w_live_lb_per_in: f64,
    pub w_total_lb_per_in: f64,
    #[serde(skip)]
    pub design: &'static DesignValues,
    #[serde(skip)]
    pub section: Section,
}

/// The factors and adjusted design values used, for the method appendix.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct AppliedFactors {
    pub cd: f64,
    pub cf: f64,
    pub cr: f64,
    pub cm_fb: f64,
    pub cm_fv: f64,
    pub cm_e: f64,
    pub cm_fc_perp: f64,
    pub fb_adjusted_psi: f64,
    pub fv_adjusted_psi: f64,
    pub e_adjusted_psi: f64,
    pub fc_perp_adjusted_psi: f64,
}

/// Allowable span from NDS mechanics, reproducing how the IRC joist span tables are computed:
/// - bending under total load, w L^2 / 8 <= Fb' S, with Fb' = Fb CD CM CF Cr (NDS 3.3);
/// - live-load deflection 5 w L^4 / (384 E' I) <= L / n with the reference E (NDS 3.5);
/// - shear V = w L / 2 <= (2/3) Fv' b d (NDS 3.4.2; the load within d of the supports is
///   not deducted, which is conservative).
///
/// Returns `None` when the species, grade and size have no design values.
pub fn allowable_span(input: &SpanInput) -> Option<SpanResult> {
    let design = design_values(input.species, input.grade, input.section.nominal)?;
    let cd = load_duration_factor(input.duration);
    let cf = if design.size_factor_included {
        1.0
    } else {
        size_factor_fb(input.species, input.section.nominal)
    };
    let cr = if input.repetitive && input.spacing.in_inches() <= 24.0 {
        REPETITIVE_MEMBER_FACTOR
    } else {
        1.0
    };
    let wet = if input.wet_service {
        wet_service(design.fb.0 * cf)
    } else {
        WetFactors::DRY
    };

    let ci = if input.incised {
        super::INCISED
    } else {
        super::IncisingFactors::NONE
    };
    let fb = design.fb.0 * cd * wet.fb * cf * cr * ci.strength;
    let fv = design.fv.0 * cd * wet.fv * ci.strength;
    let e = design.e.0 * wet.e * ci.stiffness;
    let fc_perp = design.fc_perp.0 * wet.fc_perp;

    let w_live = input.live.line_load_lb_per_in(input.spacing);
    let w_total = Psf(input.live.0 + input.dead.0).line_load_lb_per_in(input.spacing);
    let s = input.section.section_modulus();
    let i = input.section.moment_of_inertia();
    let a = input.section.area();

    let bending = (8.0 * fb * s / w_total).sqrt();
    let deflection = (384.0 * e * i / (5.0 * input.deflection_denominator * w_live)).cbrt();
    let shear = 2.0 * (2.0 / 3.0) * fv * a / w_total;

    let (governing, allowable) = [
        (Governing::Bending, bending),
        (Governing::Deflection, deflection),
        (Governing::Shear, shear),
    ]
    .into_iter()
    .fold((Governing::Bending, f64::INFINITY), |best, c| {
        if c.1 < best.1 {
            c
        } else {
            best
        }
    });

    Some(SpanResult {
        allowable_span_in: allowable,
        allowable_span_rounded_in: allowable.round(),
        governing,
        bending_span_in: bending,
        deflection_span_in: deflection,
        shear_span_in: shear,
        factors: AppliedFactors {
            cd,
            cf,
            cr,
            cm_fb: wet.fb,
            cm_fv: wet.fv,
            cm_e: wet.e,
            cm_fc_perp: wet.fc_perp,
            fb_adjusted_psi: fb,
            fv_adjusted_psi: fv,
            e_adjusted_psi: e,
            fc_perp_adjusted_psi: fc_perp,
        },
        w_live_lb_per_in: w_live,
        w_total_lb_per_in: w_total,
        section: input.section,
        design,
    })
}

impl SpanResult {
    pub fn allowable(&self) -> Length {
        Length::inches(self.allowable_span_in)
    }
    pub fn allowable_rounded(&self) -> Length {
        Length::inches(self.allowable_span_rounded_in)
    }

    /// End reaction (lb) of a simple span under the total load.
    pub fn reaction_lb(&self, span: Length) -> f64 {
        self.w_total_lb_per_in * span.in_inches() / 2.0
    }

    /// Bearing length that Fc-perp requires for that reaction: R / (Fc-perp' b).
    /// Source: NDS (2018) 3.10.2 (bearing perpendicular to grain; Cb taken as 1.0).
    pub fn required_bearing(&self, span: Length) -> Length {
        let capacity_per_inch =
            self.factors.fc_perp_adjusted_psi * self.section.thickness.in_inches();
        Length::inches(self.reaction_lb(span) / capacity_per_inch)
    }

    pub fn fc_perp(&self) -> Psi {
        Psi(self.factors.fc_perp_adjusted_psi)
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::lumber::NominalSize;

    /// The tests' case: SPF No. 2 2x10 at 16 in, 40 psf live, 10 psf dead, L/360.
    fn spf_no2_2x10(wet_service: bool) -> SpanInput {
        SpanInput {
            species: Species::SprucePineFir,
            grade: Grade::No2,
            section: NominalSize::new(2, 10).dressed_section(),
            spacing: Length::inches(16.0),
            live: Psf(40.0),
            dead: Psf(10.0),
            deflection_denominator: 360.0,
            wet_service,
            incised: false,
            duration: LoadDuration::TenYears,
            repetitive: true,
        }
    }

    fn dry() -> SpanResult {
        allowable_span(&spf_no2_2x10(false)).unwrap()
    }

    // Source: IRC 2015 Table R502.3.1(2), SPF No. 2 2x10 at 16 in, 40 psf live, 10 psf dead:
    // 15-5 (185 in).
    #[test]
    fn spf_no2_2x10_16_oc() {
        let r = dry();
        assert_eq!(r.allowable_span_rounded_in, 185.0);
        assert_eq!(r.governing, Governing::Bending);
    }

    // Source: the shear check is NDS (2018) 3.4.2, fv = 3V/(2bd); for this case hand-computed:
    // Fv' = 135 psi, A = 13.875 in^2, w = 50 psf x 16/12 ft / 12 = 5.556 lb/in:
    // L = (4/3) 135 x 13.875 / 5.556 = 449.6 in.
    #[test]
    fn shear_span_by_hand() {
        let r = dry();
        assert!(
            (r.shear_span_in - 449.55).abs() < 0.1,
            "{}",
            r.shear_span_in
        );
    }

    // Source: NDS (2018) 3.10.2: R = 5.556 lb/in x 192 in / 2 = 533.3 lb; Fc-perp' 425 psi x
    // 1.5 in = 637.5 lb/in of bearing; required 0.837 in. Hand computation.
    #[test]
    fn required_bearing_by_hand() {
        let r = dry();
        let need = r.required_bearing(Length::inches(192.0)).in_inches();
        assert!((need - 533.33 / 637.5).abs() < 0.001, "{need}");
    }

    // Source: NDS Supplement Table 4A wet service factors: a wet SPF No. 2 2x10
    // has Fb x CF = 962.5 <= 1150, so CM(Fb) = 1.0 and bending is unchanged; E drops by 0.9,
    // so the deflection span drops by 0.9^(1/3).
    #[test]
    fn wet_service_reduces_stiffness() {
        let dry = dry();
        let mut input = spf_no2_2x10(true);
        let wet = allowable_span(&input).unwrap();
        assert_eq!(wet.bending_span_in, dry.bending_span_in);
        assert!((wet.deflection_span_in / dry.deflection_span_in - 0.9f64.cbrt()).abs() < 1e-12);
        input.wet_service = false;
        assert_eq!(allowable_span(&input).unwrap(), dry);
    }
}
