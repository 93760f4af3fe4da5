//! What the inspector saw on a member: notches, holes, bearing, sag, moisture, damage, laps,
//! openings, bearing partitions and cantilevers.

use super::{BearingSupport, EndRestraint};
use crate::units::Length;
use serde::{Deserialize, Serialize};
use std::sync::Arc;

/// Which support a position is measured from: end A (the first support named) or end B.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Default, Serialize, Deserialize)]
#[serde(rename_all = "lowercase")]
pub enum End {
    #[default]
    A,
    B,
}

/// The edge of the member a notch is cut from. For a simple span under gravity load the
/// bottom edge is the tension side.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, Deserialize)]
#[serde(rename_all = "lowercase")]
pub enum Edge {
    Top,
    Bottom,
}

#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, Deserialize)]
#[serde(rename_all = "kebab-case")]
pub enum DamageCause {
    Decay,
    Insects,
    Fire,
    Other,
}

/// One offset read from a string or laser line stretched between the bearings.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct SagReading {
    /// Distance from the face of support A.
    pub at: Length,
    /// Gap between the line and the joist's bottom edge (or, with spacer blocks, the gap read
    /// on the tape; see `spacer`).
    pub offset: Length,
}

/// One observation with its id and the inspector's note.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct Observation {
    /// Shared, so that every finding about it can name it without a copy.
    pub id: Arc<str>,
    #[serde(flatten)]
    pub kind: ObservationKind,
    #[serde(default, skip_serializing_if = "String::is_empty")]
    pub note: String,
}

#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(tag = "kind", rename_all = "kebab-case")]
pub enum ObservationKind {
    /// A notch cut from an edge.
    Notch {
        edge: Edge,
        depth: Length,
        length: Length,
        /// The notch is at the member's end, over or at the bearing.
        #[serde(default)]
        at_end: bool,
        /// Distance from the nearest support face to the near side of the notch (not needed
        /// for a notch at the end).
        #[serde(default, skip_serializing_if = "Option::is_none")]
        from_support: Option<Length>,
        #[serde(default)]
        end: End,
    },
    /// A bored hole through the member.
    Hole {
        diameter: Length,
        /// Distance from the nearest support face to the hole's centre.
        from_support: Length,
        #[serde(default)]
        end: End,
        /// Height of the hole's centre above the member's bottom edge.
        center_above_bottom: Length,
    },
    /// Bearing at one end, where it differs from the run's or needs recording.
    Bearing {
        end: End,
        #[serde(default, skip_serializing_if = "Option::is_none")]
        length: Option<Length>,
        on: BearingSupport,
    },
    /// Offsets read along a line between the bearings.
    Sag {
        readings: Vec<SagReading>,
        /// Thickness of equal spacer blocks holding the line off the member at the bearings;
        /// the sag is then the spacer less the gap read. None: readings are the sag itself.
        #[serde(default, skip_serializing_if = "Option::is_none")]
        spacer: Option<Length>,
    },
    /// A moisture meter reading, percent moisture content.
    Moisture {
        percent: f64,
        #[serde(default, skip_serializing_if = "String::is_empty")]
        location: String,
    },
    /// Decay, insect or other damage, with the inspector's own words for how bad.
    Damage {
        cause: DamageCause,
        #[serde(default)]
        severity: String,
        #[serde(default, skip_serializing_if = "String::is_empty")]
        extent: String,
        /// The damage is at this end of the member, at or over its bearing.
        #[serde(default, skip_serializing_if = "Option::is_none")]
        at_end: Option<End>,
        /// How far the damage reaches in from that end of the member (the bearing it leaves
        /// sound is the bearing length less this).
        #[serde(default, skip_serializing_if = "Option::is_none")]
        reach: Option<Length>,
    },
    /// Joists from opposite sides lapped over a support.
    Lap {
        #[serde(default, skip_serializing_if = "Option::is_none")]
        length: Option<Length>,
        /// Number of 10d face nails seen.
        #[serde(default, skip_serializing_if = "Option::is_none")]
        nails: Option<u32>,
        /// Spliced with a connection of equal strength instead of lapped.
        #[serde(default)]
        spliced: bool,
    },
    /// End restraint at one end, where it differs from the run's.
    Restraint { end: End, restraint: EndRestraint },
    /// Any other cut into the member (a flange cut or sawn web, say).
    Cut {
        #[serde(default)]
        description: String,
    },
    /// An opening framed in the floor (a stair, a chimney): its header and trimmers.
    Opening {
        /// Span of the header joist across the opening.
        header_span: Length,
        /// Plies in the header joist and in each trimmer joist.
        header_plies: u8,
        trimmer_plies: u8,
        /// The header hangs on approved hangers at the trimmers.
        #[serde(default)]
        hangers: bool,
        /// Longest tail joist framing into the header.
        #[serde(default, skip_serializing_if = "Option::is_none")]
        tail_length: Option<Length>,
        /// The tail joists hang on framing anchors or sit on ledger strips at the header.
        #[serde(default)]
        tails_supported: bool,
    },
    /// A bearing partition above: parallel to the joists (over this joist), or across them
    /// and set back from the support below.
    Partition {
        parallel: bool,
        /// For a parallel partition: the joist under it is doubled (or a beam carries it).
        #[serde(default)]
        doubled: bool,
        /// For a partition across the joists: its distance from the girder, wall or
        /// partition below.
        #[serde(default, skip_serializing_if = "Option::is_none")]
        offset: Option<Length>,
    },
    /// The joists run past their support as a cantilever.
    Cantilever {
        /// Overhang past the face of the support.
        length: Length,
        /// The span inside, from that support to the next.
        #[serde(default, skip_serializing_if = "Option::is_none")]
        backspan: Option<Length>,
        #[serde(default)]
        carries: CantileverLoad,
    },
}

/// What the cantilevered end of the joists carries.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Default, Serialize, Deserialize)]
#[serde(rename_all = "kebab-case")]
pub enum CantileverLoad {
    /// The floor only.
    #[default]
    FloorOnly,
    /// An exterior balcony.
    Balcony,
    /// A light-frame exterior bearing wall and roof.
    WallAndRoof,
}

impl ObservationKind {
    pub fn name(&self) -> &'static str {
        match self {
            ObservationKind::Notch { .. } => "notch",
            ObservationKind::Hole { .. } => "bored hole",
            ObservationKind::Bearing { .. } => "bearing",
            ObservationKind::Sag { .. } => "sag readings",
            ObservationKind::Moisture { .. } => "moisture reading",
            ObservationKind::Damage { .. } => "damage",
            ObservationKind::Lap { .. } => "lap",
            ObservationKind::Restraint { .. } => "end restraint",
            ObservationKind::Cut { .. } => "cut",
            ObservationKind::Opening { .. } => "floor opening",
            ObservationKind::Partition { .. } => "bearing partition",
            ObservationKind::Cantilever { .. } => "cantilever",
        }
    }
}
