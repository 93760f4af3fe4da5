//! The span computation against every printed span-table cell we hold: IRC 2018 Table
//! R802.5.1(2) (ceiling joists, 20 psf live, 10 psf dead, L/240) and IRC 2015/2018 Table
//! R502.3.1(2) (floor joists, 40 psf live, L/360). Each row of `data/published-span-cells.csv`
//! names its source.

use undercroft_engine::lumber::{GradeChoice, LoadDuration, NominalSize, Species};
use undercroft_engine::mechanics::{allowable_span, SpanInput};
use undercroft_engine::units::{Length, Psf};
use undercroft_tests::csv_fields;

const CELLS: &str = include_str!("data/published-span-cells.csv");

struct Cell {
    line: usize,
    table: String,
    source: String,
    input: SpanInput,
    printed_in: f64,
}

fn cells() -> Vec<Cell> {
    let mut out = Vec::new();
    for (n, line) in CELLS
        .lines()
        .enumerate()
        .skip(1)
        .filter(|(_, l)| !l.trim().is_empty())
    {
        let f = csv_fields(line);
        // table,edition,live_psf,dead_psf,defl_limit,species,grade,size,spacing_in,span_ftin,span_in,source,source_title
        let grade = f[6].split('/').next_back().expect("a grade");
        let num = |i: usize| {
            f[i].parse::<f64>()
                .unwrap_or_else(|e| panic!("line {}: field {i}: {e}", n + 1))
        };
        out.push(Cell {
            line: n + 1,
            table: f[0].clone(),
            source: format!("{} ({})", f[12], f[1]),
            input: SpanInput {
                species: f[5].parse::<Species>().unwrap(),
                grade: grade.parse::<GradeChoice>().unwrap().grade_for_design(),
                section: f[7].parse::<NominalSize>().unwrap().dressed_section(),
                spacing: Length::inches(num(8)),
                live: Psf(num(2)),
                dead: Psf(num(3)),
                deflection_denominator: num(4),
                wet_service: false,
                incised: false,
                duration: LoadDuration::TenYears,
                repetitive: true,
            },
            printed_in: num(10),
        });
    }
    out
}

/// Exact half-inch ties (x.5 within 0.005 in) are rounded both ways in the printed tables, so a
/// cell whose mechanics value sits on a tie may print either neighbour.
fn is_half_inch_tie(value: f64) -> bool {
    ((value - value.floor()) - 0.5).abs() < 0.005
}

// Source: every row of data/published-span-cells.csv, each naming its printed source:
// IRC 2018 Table R802.5.1(2) (152 cells), IRC 2018 Table R502.3.1(2) as reproduced in the 2018
// Seattle Residential Code (2 cells), IRC 2015 Table R502.3.1(2) (1 cell).
#[test]
fn every_printed_cell_to_the_inch() {
    let cells = cells();
    assert_eq!(
        cells.len(),
        155,
        "the reference file holds 152 ceiling and 3 floor cells"
    );
    let mut failures = Vec::new();
    let mut ties = Vec::new();
    for cell in &cells {
        let r = allowable_span(&cell.input).expect("design values for every cell");
        if r.allowable_span_rounded_in == cell.printed_in {
            continue;
        }
        if is_half_inch_tie(r.allowable_span_in)
            && (r.allowable_span_in - cell.printed_in).abs() <= 0.5 + 1e-9
        {
            ties.push((
                cell.line,
                format!("{:.4}", r.allowable_span_in),
                cell.printed_in,
            ));
            continue;
        }
        failures.push(format!(
            "line {} {} {} {} {} @ {} in: computed {:.3} in ({}), printed {} in [{}]",
            cell.line,
            cell.table,
            cell.input.species.code(),
            cell.input.grade.code(),
            cell.input.section.nominal,
            cell.input.spacing.in_inches(),
            r.allowable_span_in,
            r.governing.name(),
            cell.printed_in,
            cell.source
        ));
    }
    assert!(
        failures.is_empty(),
        "{} of {} cells differ:\n{}",
        failures.len(),
        cells.len(),
        failures.join("\n")
    );
    // Exempted, each an exact half-inch tie of the mechanics printed one inch below what
    // rounding half up gives: SP SS 2x10 @ 19.2 (277.5 -> printed 277), SPF SS 2x8 @ 16
    // (217.5 -> 217), SPF SS 2x10 @ 16 (277.5 -> 277). The same tie of SP SS 2x8 @ 19.2
    // (217.5) prints 218, so no single rounding rule reproduces every cell; the check engine
    // rounds half up.
    let lines: Vec<usize> = ties.iter().map(|t| t.0).collect();
    assert_eq!(lines, [37, 144, 145], "half-inch ties exempted: {ties:?}");
}

// Source: IRC 2015 Table R502.3.1(2), SPF No. 2 2x10 at 16 in o.c., 40/10 psf: 15-5.
#[test]
fn floor_cell_governed_by_bending() {
    let cell = cells()
        .into_iter()
        .find(|c| c.table == "R502.3.1(2)" && c.input.spacing.in_inches() == 16.0)
        .unwrap();
    let r = allowable_span(&cell.input).unwrap();
    assert_eq!(r.allowable_span_rounded_in, 185.0);
    assert_eq!(r.governing.name(), "bending");
}
