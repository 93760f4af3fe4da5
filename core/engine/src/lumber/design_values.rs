//! Reference design values of visually graded dimension lumber, read from the compiled-in
//! table `core/engine/data/design-values.csv` (NDS Supplement 2018, Tables 4A and 4B).

use super::{Grade, NominalSize, Species};
use crate::units::Psi;
use std::collections::HashMap;
use std::sync::OnceLock;

/// Where the design values come from, for the report's appendix.
pub const DESIGN_VALUES_SOURCE: &str =
    "NDS Supplement (2018), Table 4A (Douglas fir-larch, hem-fir, spruce-pine-fir) and Table 4B (southern pine)";

const TABLE: &str = include_str!("../../data/design-values.csv");

/// Reference (unadjusted) design values for one species, grade and size.
#[derive(Debug, Clone, PartialEq)]
pub struct DesignValues {
    pub fb: Psi,
    pub ft: Psi,
    pub fv: Psi,
    pub fc_perp: Psi,
    pub fc: Psi,
    pub e: Psi,
    pub e_min: Psi,
    /// True where the size factor is already in the tabulated values (southern pine).
    pub size_factor_included: bool,
    /// The published source of this row, as the table records it.
    pub source: &'static str,
    /// True for a southern pine row wider than 12 in, derived from the 2x12 row with CF 0.9.
    pub derived_wide: bool,
    /// True where some value of the row was recorded from memory rather than a seen copy.
    pub from_memory: bool,
}

type Key = (Species, Grade, Option<u8>);

fn table() -> &'static HashMap<Key, DesignValues> {
    static CELLS: OnceLock<HashMap<Key, DesignValues>> = OnceLock::new();
    CELLS.get_or_init(|| parse_table(TABLE).expect("compiled-in design-value table is well formed"))
}

/// The design values for a species, grade and nominal size.
pub fn design_values(
    species: Species,
    grade: Grade,
    size: NominalSize,
) -> Option<&'static DesignValues> {
    let cells = table();
    cells
        .get(&(species, grade, None))
        .or_else(|| cells.get(&(species, grade, Some(size.depth))))
}

/// Southern pine values are tabulated per width with the size factor included. For widths
/// beyond 12 in, NDS Supplement (2018) Table 4B's size-factor note applies CF = 0.9 to the
/// 2x12 values for Fb, Ft and Fc (as an open-source tabulation of Table 4B also does): those
/// rows are added here.
fn add_wide_southern_pine(cells: &mut HashMap<Key, DesignValues>) {
    for grade in Grade::ALL {
        if let Some(base) = cells
            .get(&(Species::SouthernPine, grade, Some(12)))
            .cloned()
        {
            let wide = DesignValues {
                fb: Psi(base.fb.0 * 0.9),
                ft: Psi(base.ft.0 * 0.9),
                fc: Psi(base.fc.0 * 0.9),
                from_memory: false,
                derived_wide: true,
                ..base
            };
            cells.insert((Species::SouthernPine, grade, Some(14)), wide);
        }
    }
}

fn parse_table(text: &'static str) -> Result<HashMap<Key, DesignValues>, String> {
    let mut cells = HashMap::new();
    for (n, line) in text
        .lines()
        .enumerate()
        .skip(1)
        .filter(|(_, l)| !l.trim().is_empty())
    {
        let f = split_csv_line(line);
        if f.len() < 11 {
            return Err(format!("line {}: {} fields", n + 1, f.len()));
        }
        let species: Species = f[0].parse()?;
        let grade = f[1].parse::<super::GradeChoice>()?.grade_for_design();
        let size = match f[2].as_str() {
            "all" => None,
            s => Some(s.parse::<NominalSize>().map_err(|e| e.to_string())?.depth),
        };
        let num = |i: usize| {
            f[i].parse::<f64>()
                .map(Psi)
                .map_err(|e| format!("line {}: {e}", n + 1))
        };
        let note = f.get(11).cloned().unwrap_or_default();
        let values = DesignValues {
            fb: num(3)?,
            ft: num(4)?,
            fv: num(5)?,
            fc_perp: num(6)?,
            fc: num(7)?,
            e: num(8)?,
            e_min: num(9)?,
            size_factor_included: size.is_some(),
            from_memory: f[10].contains("from memory") || note.contains("from memory"),
            source: static_field(text, &f[10]),
            derived_wide: false,
        };
        cells.insert((species, grade, size), values);
    }
    add_wide_southern_pine(&mut cells);
    Ok(cells)
}

/// The same text as `field`, borrowed from the compiled-in table where it appears there
/// verbatim (every unquoted source does), so rows can point at it for the program's life.
fn static_field(table: &'static str, field: &str) -> &'static str {
    table
        .find(field)
        .map(|at| &table[at..at + field.len()])
        .unwrap_or("NDS Supplement (2018)")
}

/// Splits one CSV line, honouring double-quoted fields.
fn split_csv_line(line: &str) -> Vec<String> {
    let mut fields = vec![String::new()];
    let mut quoted = false;
    let mut chars = line.chars().peekable();
    while let Some(c) = chars.next() {
        match (c, quoted) {
            ('"', true) if chars.peek() == Some(&'"') => {
                chars.next();
                fields.last_mut().unwrap().push('"');
            }
            ('"', _) => quoted = !quoted,
            (',', false) => fields.push(String::new()),
            (c, _) => fields.last_mut().unwrap().push(c),
        }
    }
    fields
}

impl DesignValues {
    /// The table citation without the note of where it was transcribed from.
    pub fn source_short(&self) -> &'static str {
        if self.size_factor_included {
            "NDS Supplement (2018) Table 4B"
        } else {
            "NDS Supplement (2018) Table 4A"
        }
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn every_row_parses() {
        let cells = parse_table(TABLE).unwrap();
        // 3 species x 4 grades (all widths) + southern pine 4 grades x 5 widths, + 4 derived
        // 2x14 southern pine rows.
        assert_eq!(cells.len(), 12 + 20 + 4);
        assert!(cells.values().all(|v| v.source.contains("NDS Supplement")));
    }

    // Source: NDS Supplement (2018) Table 4A, spruce-pine-fir No. 1/No. 2:
    // Fb 875, Ft 450, Fv 135, Fc-perp 425, Fc 1150, E 1,400,000, Emin 510,000 psi.
    #[test]
    fn spf_no2() {
        let v = design_values(Species::SprucePineFir, Grade::No2, NominalSize::new(2, 10)).unwrap();
        assert_eq!(
            (v.fb, v.fv, v.fc_perp, v.e),
            (Psi(875.0), Psi(135.0), Psi(425.0), Psi(1_400_000.0))
        );
        assert!(!v.size_factor_included && !v.from_memory);
    }

    // Source: NDS Supplement (2018) Table 4B, southern pine No. 2 2x10: Fb 800 psi (size
    // factor included), E 1,400,000 psi.
    #[test]
    fn southern_pine_is_per_width() {
        let v = design_values(Species::SouthernPine, Grade::No2, NominalSize::new(2, 10)).unwrap();
        assert_eq!((v.fb, v.e), (Psi(800.0), Psi(1_400_000.0)));
        assert!(v.size_factor_included);
        let wide =
            design_values(Species::SouthernPine, Grade::No2, NominalSize::new(2, 14)).unwrap();
        assert_eq!(wide.fb, Psi(750.0 * 0.9));
        assert!(wide.derived_wide && !wide.from_memory);
    }

    // Source: NDS Supplement (2018) Table 4A, spruce-pine-fir Select Structural: Fb 1250,
    // Fv 135, E 1,500,000 psi (the Fb that reproduces the IRC span tables).
    #[test]
    fn spf_select_structural() {
        let v = design_values(
            Species::SprucePineFir,
            Grade::SelectStructural,
            NominalSize::new(2, 8),
        )
        .unwrap();
        assert_eq!((v.fb, v.e), (Psi(1250.0), Psi(1_500_000.0)));
    }

    /// Client text never says a design value is from memory: every row is cited.
    #[test]
    fn no_row_is_from_memory() {
        for species in [
            Species::DouglasFirLarch,
            Species::HemFir,
            Species::SouthernPine,
            Species::SprucePineFir,
        ] {
            for grade in Grade::ALL {
                for depth in [4, 6, 8, 10, 12, 14] {
                    if let Some(v) = design_values(species, grade, NominalSize::new(2, depth)) {
                        assert!(!v.from_memory, "{species:?} {grade:?} 2x{depth}");
                    }
                }
            }
        }
    }

    #[test]
    fn quoted_fields() {
        assert_eq!(
            split_csv_line(r#"a,"b, c","d ""e""",f"#),
            ["a", "b, c", "d \"e\"", "f"]
        );
    }
}
