//! Wording pieces several rules share: lengths in the user's units, the assumptions behind a
//! computation with a member's lumber and loads, and which end a finding is about.

use crate::lumber::{GradeChoice, Section, Species, UNKNOWN_GRADE_DEFAULT};
use crate::model::{End, ResolvedLoads};
use crate::units::{format_dimension, format_length, round_down, round_up, Length, UnitSystem};
use crate::validate::MemberContext;

/// A span or position in feet-inches (`15' 2"`), or mm.
pub fn len(units: UnitSystem, length: Length) -> String {
    format_length(length, units)
}

/// A member dimension or short length in inches (`9-1/4"`), or mm.
pub fn dim(units: UnitSystem, length: Length) -> String {
    format_dimension(length, units)
}

/// A maximum as it is held and shown: rounded down to the display grid.
pub fn dim_max(units: UnitSystem, length: Length) -> String {
    format_dimension(round_down(length, units), units)
}

/// A minimum as it is held and shown: rounded up to the display grid.
pub fn dim_min(units: UnitSystem, length: Length) -> String {
    format_dimension(round_up(length, units), units)
}

/// Which end(s) of a member a finding is about.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum Ends {
    Both,
    One(End),
}

impl Ends {
    pub fn name(self) -> &'static str {
        match self {
            Ends::Both => "both ends",
            Ends::One(End::A) => "end A",
            Ends::One(End::B) => "end B",
        }
    }
}

/// What about the lumber has to be stated with any computation that uses it.
#[derive(Debug, Clone, PartialEq)]
pub struct LumberNotes {
    /// Set when no grade stamp was visible: the species designed at the default grade.
    pub no_stamp: Option<Species>,
    /// Set when measured dimensions were used.
    pub measured: Option<Section>,
}

impl LumberNotes {
    pub fn of(ctx: &MemberContext) -> LumberNotes {
        let lumber = ctx.lumber.as_ref();
        LumberNotes {
            no_stamp: lumber
                .filter(|l| l.grade == GradeChoice::NoStampVisible)
                .map(|l| l.species),
            measured: lumber.filter(|l| l.section.rough_sawn).map(|l| l.section),
        }
    }

    pub fn lines(&self, units: UnitSystem) -> Vec<String> {
        let mut out = Vec::new();
        if let Some(species) = self.no_stamp {
            out.push(format!(
                "No grade stamp visible: designed as {} {}, a conservative default; a visible stamp may allow more",
                species.name(),
                UNKNOWN_GRADE_DEFAULT.name()
            ));
        }
        if let Some(section) = self.measured {
            out.push(format!(
                "Measured section {} x {} used (graded and size-factored as {}); design values of dressed lumber of the same grade assumed",
                dim(units, section.thickness),
                dim(units, section.depth),
                section.nominal
            ));
        }
        out
    }
}

/// The load assumptions of a span computation.
pub fn load_lines(loads: &ResolvedLoads) -> Vec<String> {
    vec![
        format!(
            "Live load {} psf ({}, Table R301.5); dead load {} psf ({})",
            loads.live.0,
            loads.room_use.describe(),
            loads.dead.0,
            if loads.heavy_finish { "heavy finishes" } else { "light finishes" }
        ),
        format!("Live-load deflection limited to L/{} (Table R301.7)", loads.deflection_denominator),
        "Simple span, uniformly loaded, repetitive members (Cr 1.15 at 24 in or less), normal load duration (CD 1.0)".into(),
    ]
}
