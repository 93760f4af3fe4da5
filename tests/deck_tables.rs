//! Porch and deck joists, wet and incised, against the printed deck joist span table: the
//! same NDS mechanics as the floor tables with the wet-service factors (NDS Supplement Table
//! 4A) and the incising factors (NDS 2018 Table 4.3.8).
//!
//! Source: IRC 2015 Table R507.5 (IRC 2018 Table R507.6, the same cells), reprinted as AWC
//! DCA 6 (2015) Table 2 "Maximum joist spans": No. 2 grade, 40 psf live, 10 psf dead, L/360,
//! wet service; incising assumed for Douglas fir-larch, hem-fir and spruce-pine-fir, none for
//! southern pine; joists no longer than 18 ft. The Douglas fir-larch, hem-fir and
//! spruce-pine-fir row is one row: the weakest of the three.

use undercroft_engine::lumber::{Grade, LoadDuration, NominalSize, Species};
use undercroft_engine::mechanics::{allowable_span, SpanInput};
use undercroft_engine::units::{Length, Psf};

/// (size, [12, 16, 24 in o.c.] as printed, inches)
const SOUTHERN_PINE: [(u8, [f64; 3]); 4] = [
    (6, [119.0, 108.0, 91.0]),   // 9-11, 9-0, 7-7
    (8, [157.0, 142.0, 116.0]),  // 13-1, 11-10, 9-8
    (10, [194.0, 168.0, 137.0]), // 16-2, 14-0, 11-5
    (12, [216.0, 198.0, 162.0]), // 18-0, 16-6, 13-6
];
const FIR_HEM_SPRUCE: [(u8, [f64; 3]); 4] = [
    (6, [114.0, 100.0, 82.0]),   // 9-6, 8-4, 6-10
    (8, [150.0, 133.0, 109.0]),  // 12-6, 11-1, 9-1
    (10, [188.0, 163.0, 133.0]), // 15-8, 13-7, 11-1
    (12, [216.0, 189.0, 154.0]), // 18-0, 15-9, 12-10
];

fn deck_span(species: Species, depth: u8, spacing: f64) -> f64 {
    let r = allowable_span(&SpanInput {
        species,
        grade: Grade::No2,
        section: NominalSize::new(2, depth).dressed_section(),
        spacing: Length::inches(spacing),
        live: Psf(40.0),
        dead: Psf(10.0),
        deflection_denominator: 360.0,
        wet_service: true,
        incised: species != Species::SouthernPine,
        duration: LoadDuration::TenYears,
        repetitive: true,
    })
    .expect("design values for No. 2 2x6 to 2x12");
    r.allowable_span_in.min(216.0)
}

fn compare(row: &str, species: &[Species], cells: &[(u8, [f64; 3])]) -> Vec<String> {
    let mut misses = Vec::new();
    for (depth, printed) in cells {
        for (spacing, printed) in [12.0, 16.0, 24.0].into_iter().zip(printed) {
            let computed = species
                .iter()
                .map(|s| deck_span(*s, *depth, spacing))
                .fold(f64::INFINITY, f64::min);
            // Printed to the inch: the computation rounds to the printed cell (a tie at
            // x.50 may print either way).
            if (computed - printed).abs() > 0.5 + 0.005 {
                misses.push(format!(
                    "{row} 2x{depth} at {spacing} in: computed {computed:.1} in, printed {printed} in"
                ));
            }
        }
    }
    misses
}

#[test]
fn southern_pine_deck_joists_match_the_printed_cells() {
    let misses = compare("SP", &[Species::SouthernPine], &SOUTHERN_PINE);
    assert!(misses.is_empty(), "{misses:#?}");
}

#[test]
fn fir_hem_spruce_deck_joists_match_the_printed_cells() {
    let misses = compare(
        "DFL/HF/SPF",
        &[
            Species::DouglasFirLarch,
            Species::HemFir,
            Species::SprucePineFir,
        ],
        &FIR_HEM_SPRUCE,
    );
    assert!(misses.is_empty(), "{misses:#?}");
}
