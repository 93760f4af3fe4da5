//! What a member is and how it is framed: kind, lumber, spacing, span, bearing, restraint.

use super::LoadSettings;
use crate::lumber::{GradeChoice, NominalSize, Species};
use crate::units::Length;
use serde::{Deserialize, Serialize};

/// Sawn lumber, or one of the engineered products R502.8.2 covers.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Default, Serialize, Deserialize)]
#[serde(rename_all = "kebab-case")]
pub enum MemberKind {
    #[default]
    Sawn,
    IJoist,
    /// Structural composite lumber: LVL, LSL, PSL.
    CompositeLumber,
    FloorTruss,
    Glulam,
}

impl MemberKind {
    pub fn is_engineered(self) -> bool {
        self != MemberKind::Sawn
    }
    pub fn name(self) -> &'static str {
        match self {
            MemberKind::Sawn => "sawn lumber",
            MemberKind::IJoist => "I-joist",
            MemberKind::CompositeLumber => "structural composite lumber",
            MemberKind::FloorTruss => "floor truss",
            MemberKind::Glulam => "glued-laminated timber",
        }
    }
}

/// What a joist end sits on.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, Deserialize)]
#[serde(rename_all = "kebab-case")]
pub enum BearingSupport {
    Wood,
    Metal,
    Masonry,
    Concrete,
    /// Carried by a joist hanger.
    Hanger,
    /// On a 1x4 ribbon strip let into the studs.
    Ribbon,
    /// On a ledger strip along a girder.
    Ledger,
}

impl BearingSupport {
    pub fn name(self) -> &'static str {
        match self {
            BearingSupport::Wood => "wood",
            BearingSupport::Metal => "metal",
            BearingSupport::Masonry => "masonry",
            BearingSupport::Concrete => "concrete",
            BearingSupport::Hanger => "joist hanger",
            BearingSupport::Ribbon => "ribbon strip",
            BearingSupport::Ledger => "ledger strip",
        }
    }
}

/// Bearing at a joist end: the length on the support and what the support is.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct Bearing {
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub length: Option<Length>,
    pub on: BearingSupport,
}

/// What keeps a joist end from rolling over (R502.7).
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, Deserialize)]
#[serde(rename_all = "kebab-case")]
pub enum EndRestraint {
    /// Full-depth rim or band joist.
    RimJoist,
    /// Full-depth solid blocking, 2 in nominal or thicker.
    SolidBlocking,
    /// A full-depth header.
    Header,
    /// Attachment to an adjoining stud.
    Stud,
    /// Nothing seen.
    None,
}

impl EndRestraint {
    pub fn name(self) -> &'static str {
        match self {
            EndRestraint::RimJoist => "rim or band joist",
            EndRestraint::SolidBlocking => "full-depth solid blocking",
            EndRestraint::Header => "full-depth header",
            EndRestraint::Stud => "adjoining stud",
            EndRestraint::None => "none seen",
        }
    }
}

#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, Deserialize)]
#[serde(rename_all = "kebab-case")]
pub enum BridgingKind {
    None,
    SolidBlocking,
    Diagonal,
    /// A continuous 1x3 strip nailed across the bottom edges.
    Strap,
}

/// Mid-span bracing of the joists (R502.7.1).
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct Bridging {
    pub kind: BridgingKind,
    /// Largest distance between lines of bracing (or from an end to the nearest line).
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub interval: Option<Length>,
}

/// Actual measured dimensions (rough-sawn or non-standard lumber).
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct ActualSize {
    pub thickness: Length,
    pub depth: Length,
}

/// How a run, joist or member is framed. Every field is optional: a joist lists only what
/// differs from its run, and a missing value means "not measured" (that check is skipped
/// and says so).
#[derive(Debug, Clone, PartialEq, Default, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct Framing {
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub kind: Option<MemberKind>,
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub species: Option<Species>,
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub grade: Option<GradeChoice>,
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub size: Option<NominalSize>,
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub actual: Option<ActualSize>,
    /// On-centre spacing of the joists.
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub spacing: Option<Length>,
    /// Clear span, face to face of the supports.
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub clear_span: Option<Length>,
    /// Typical bearing at both ends.
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub bearing: Option<Bearing>,
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub end_restraint: Option<EndRestraint>,
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub bridging: Option<Bridging>,
    /// Loads where the room above differs from its area's (a family room in a sleeping area).
    #[serde(default, skip_serializing_if = "LoadSettings::is_unset")]
    pub loads: LoadSettings,
    /// Least distance from the joists' bottom edges to exposed ground.
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub ground_clearance: Option<Length>,
    /// Naturally durable or preservative-treated wood (a stamp or the green or brown tint
    /// of treatment seen).
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub treated: Option<bool>,
}

impl Framing {
    /// `self`'s values where given, else `base`'s: a joist over its run.
    pub fn over(&self, base: &Framing) -> Framing {
        Framing {
            kind: self.kind.or(base.kind),
            species: self.species.or(base.species),
            grade: self.grade.or(base.grade),
            size: self.size.or(base.size),
            actual: self.actual.or(base.actual),
            spacing: self.spacing.or(base.spacing),
            clear_span: self.clear_span.or(base.clear_span),
            bearing: self.bearing.or(base.bearing),
            end_restraint: self.end_restraint.or(base.end_restraint),
            bridging: self.bridging.or(base.bridging),
            loads: self.loads.over(&base.loads),
            ground_clearance: self.ground_clearance.or(base.ground_clearance),
            treated: self.treated.or(base.treated),
        }
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn joist_values_win_over_the_run() {
        let run = Framing {
            species: Some(Species::SprucePineFir),
            clear_span: Some(Length::inches(180.0)),
            ..Default::default()
        };
        let joist = Framing {
            clear_span: Some(Length::inches(190.0)),
            ..Default::default()
        };
        let merged = joist.over(&run);
        assert_eq!(merged.species, Some(Species::SprucePineFir));
        assert_eq!(merged.clear_span, Some(Length::inches(190.0)));
    }
}
