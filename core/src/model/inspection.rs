//! The inspection record and its tree: areas hold joist runs and single members.

use super::{Framing, LoadSettings, Observation};
use crate::units::UnitSystem;
use serde::{Deserialize, Serialize};

/// The `format` field every interchange file carries.
pub const FORMAT_NAME: &str = "undercroft-inspection";
/// The interchange format version this code writes and reads.
pub const FORMAT_VERSION: u32 = 1;

#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct Inspection {
    pub format: String,
    pub version: u32,
    pub id: String,
    pub property: Property,
    #[serde(default)]
    pub client: Client,
    #[serde(default)]
    pub inspector: InspectorInfo,
    /// Date of the visit, `YYYY-MM-DD`.
    pub date: String,
    /// Weather and site conditions in the inspector's words.
    #[serde(default)]
    pub conditions: String,
    /// Code edition the findings cite, e.g. "IRC 2018".
    #[serde(default = "default_edition")]
    pub code_edition: String,
    /// Local amendments the inspector was told of, in their words.
    #[serde(default)]
    pub local_amendments: String,
    #[serde(default)]
    pub units: UnitSystem,
    #[serde(default)]
    pub loads: LoadSettings,
    #[serde(default)]
    pub areas: Vec<Area>,
    #[serde(default)]
    pub photos: Vec<PhotoRef>,
}

impl Inspection {
    /// Every observation with the id of the run or member it is on, in entry order.
    pub fn observations(&self) -> impl Iterator<Item = (&str, &Observation)> {
        self.areas.iter().flat_map(|a| {
            let runs = a.runs.iter().flat_map(|r| {
                let typical = r.observations.iter().map(move |o| (r.id.as_str(), o));
                let joists = r
                    .joists
                    .iter()
                    .flat_map(|j| j.observations.iter().map(move |o| (j.id.as_str(), o)));
                typical.chain(joists)
            });
            let members = a
                .members
                .iter()
                .flat_map(|m| m.observations.iter().map(move |o| (m.id.as_str(), o)));
            runs.chain(members)
        })
    }

    pub fn area(&self, id: &str) -> Option<&Area> {
        self.areas.iter().find(|a| a.id == id)
    }

    /// A joist run and the area it is in.
    pub fn run(&self, id: &str) -> Option<(&Area, &JoistRun)> {
        self.areas
            .iter()
            .find_map(|a| a.runs.iter().find(|r| r.id == id).map(|r| (a, r)))
    }
}

fn default_edition() -> String {
    "IRC 2018".into()
}

#[derive(Debug, Clone, PartialEq, Default, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct Property {
    pub address: String,
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub year_built: Option<u16>,
}

#[derive(Debug, Clone, PartialEq, Default, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct Client {
    #[serde(default)]
    pub name: String,
    #[serde(default, skip_serializing_if = "String::is_empty")]
    pub email: String,
    #[serde(default, skip_serializing_if = "String::is_empty")]
    pub phone: String,
}

#[derive(Debug, Clone, PartialEq, Default, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct InspectorInfo {
    #[serde(default)]
    pub name: String,
    #[serde(default)]
    pub company: String,
    #[serde(default)]
    pub license: String,
}

#[derive(Debug, Clone, Copy, PartialEq, Eq, Default, Serialize, Deserialize)]
#[serde(rename_all = "kebab-case")]
pub enum AreaKind {
    #[default]
    Crawlspace,
    Basement,
    Garage,
    Porch,
    Other,
}

/// One part of the building looked at from below, with the room use above it.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct Area {
    pub id: String,
    pub name: String,
    #[serde(default)]
    pub kind: AreaKind,
    /// Loads for this area; unset fields fall back to the inspection's.
    #[serde(default)]
    pub loads: LoadSettings,
    #[serde(default)]
    pub runs: Vec<JoistRun>,
    #[serde(default)]
    pub members: Vec<Member>,
    #[serde(default)]
    pub notes: String,
}

/// Joists alike in size, spacing, grade and span, measured once; exceptions listed as joists.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct JoistRun {
    pub id: String,
    pub label: String,
    #[serde(default)]
    pub framing: Framing,
    /// Observations that hold for the run's typical joist.
    #[serde(default)]
    pub observations: Vec<Observation>,
    /// Individual joists of the run with their own values or observations.
    #[serde(default)]
    pub joists: Vec<Joist>,
}

/// One joist of a run: what differs from the run, and what was seen on it.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct Joist {
    pub id: String,
    pub label: String,
    /// Only the fields that differ from the run.
    #[serde(default)]
    pub framing: Framing,
    #[serde(default)]
    pub observations: Vec<Observation>,
}

/// A member on its own (a single joist, a header, an engineered member), not part of a run.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct Member {
    pub id: String,
    pub label: String,
    #[serde(default)]
    pub framing: Framing,
    #[serde(default)]
    pub observations: Vec<Observation>,
}

/// A photo file and what it belongs to (an observation, member, joist, run or area id).
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct PhotoRef {
    pub id: String,
    pub file: String,
    pub attached_to: String,
    #[serde(default)]
    pub caption: String,
}
