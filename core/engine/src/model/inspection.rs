//! The inspection record and its tree: areas hold joist runs and single members.

use super::{Framing, GirderLine, LoadSettings, Observation, Post, SiteConditions};
use crate::units::UnitSystem;
use serde::{Deserialize, Serialize};

/// The `format` field every interchange file carries.
pub const FORMAT_NAME: &str = "undercroft-inspection";
/// The interchange format version this code writes and reads.
/// Version 2 added girder lines, posts, site conditions and the girders a run bears on;
/// version 1 files read unchanged.
pub const FORMAT_VERSION: u32 = 2;

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

    /// A joist of a run or a single member, with where it is.
    /// The clear span of the run, joist or member an observation is on (a joist's own, else
    /// its run's), where entered.
    pub fn clear_span_of(&self, owner: &str) -> Option<crate::units::Length> {
        if let Some((_, run)) = self.run(owner) {
            return run.framing.clear_span;
        }
        let m = self.member(owner)?;
        m.framing
            .clear_span
            .or_else(|| m.run.and_then(|r| r.framing.clear_span))
    }

    /// A walked joist's run and its place along it (None for a joist entered by label, or
    /// anything else).
    pub fn joist_place(&self, id: &str) -> Option<(&JoistRun, crate::units::Length)> {
        self.areas.iter().flat_map(|a| a.runs.iter()).find_map(|r| {
            r.joists
                .iter()
                .find(|j| j.id == id)
                .and_then(|j| j.at.map(|at| (r, at)))
        })
    }

    /// A girder line and the area it is in.
    pub fn girder(&self, id: &str) -> Option<(&Area, &GirderLine)> {
        self.areas
            .iter()
            .find_map(|a| a.girders.iter().find(|g| g.id == id).map(|g| (a, g)))
    }

    /// A post, its girder line and its area.
    pub fn post(&self, id: &str) -> Option<(&Area, &GirderLine, &Post)> {
        self.areas.iter().find_map(|a| {
            a.girders
                .iter()
                .find_map(|g| g.posts.iter().find(|p| p.id == id).map(|p| (a, g, p)))
        })
    }

    /// The joist runs that bear on a girder line, with their areas.
    pub fn runs_on(&self, girder_id: &str) -> Vec<(&Area, &JoistRun)> {
        self.areas
            .iter()
            .flat_map(|a| a.runs.iter().map(move |r| (a, r)))
            .filter(|(_, r)| r.bears_on.iter().any(|g| g == girder_id))
            .collect()
    }

    pub fn member(&self, id: &str) -> Option<MemberAt<'_>> {
        self.areas.iter().find_map(|area| {
            let joist = area.runs.iter().find_map(|run| {
                run.joists.iter().find(|j| j.id == id).map(|j| MemberAt {
                    area,
                    run: Some(run),
                    id: &j.id,
                    label: &j.label,
                    framing: &j.framing,
                    observations: &j.observations,
                })
            });
            joist.or_else(|| {
                area.members.iter().find(|m| m.id == id).map(|m| MemberAt {
                    area,
                    run: None,
                    id: &m.id,
                    label: &m.label,
                    framing: &m.framing,
                    observations: &m.observations,
                })
            })
        })
    }
}

/// A joist (its run given) or a single member (no run), found by id.
#[derive(Debug, Clone, Copy)]
pub struct MemberAt<'a> {
    pub area: &'a Area,
    pub run: Option<&'a JoistRun>,
    pub id: &'a str,
    pub label: &'a str,
    /// For a joist, only what differs from its run.
    pub framing: &'a Framing,
    pub observations: &'a [Observation],
}

impl MemberAt<'_> {
    /// The framing the checks use: a joist's own values over its run's.
    pub fn effective_framing(&self) -> Framing {
        match self.run {
            Some(run) => self.framing.over(&run.framing),
            None => self.framing.clone(),
        }
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
    /// Girder lines with their posts.
    #[serde(default, skip_serializing_if = "Vec::is_empty")]
    pub girders: Vec<GirderLine>,
    /// Water, ground cover, ventilation, fungal growth, soil.
    #[serde(default, skip_serializing_if = "SiteConditions::is_unset")]
    pub conditions: SiteConditions,
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
    /// Ids of the girder lines the run's joists bear on (half the run's span loads each).
    #[serde(default, skip_serializing_if = "Vec::is_empty")]
    pub bears_on: Vec<String>,
}

/// One joist of a run: what differs from the run, and what was seen on it.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct Joist {
    pub id: String,
    pub label: String,
    /// Where the joist is, measured along the run from its start (the wall the inspector
    /// began at); unset for a joist entered by label only.
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub at: Option<crate::units::Length>,
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
    /// Arrows, circles and dimensions drawn over the photo in the report; the file is as taken.
    #[serde(default, skip_serializing_if = "Vec::is_empty")]
    pub marks: Vec<super::PhotoMark>,
}

#[cfg(test)]
mod tests {
    use crate::lumber::NominalSize;
    use crate::units::Length;

    fn demo() -> super::Inspection {
        crate::interchange::demo()
    }

    #[test]
    fn a_joist_is_found_with_its_run_and_takes_the_run_values_it_does_not_list() {
        let demo = demo();
        let joist = demo.member("joist-k7").expect("joist 7 is in the demo");
        assert_eq!(joist.run.map(|r| r.id.as_str()), Some("run-kitchen"));
        assert_eq!(
            joist.framing.size, None,
            "the joist lists no size of its own"
        );
        let framing = joist.effective_framing();
        assert_eq!(framing.size, Some("2x10".parse::<NominalSize>().unwrap()));
        assert_eq!(framing.clear_span, Some(Length::inches(182.0)));
        assert_eq!(joist.observations.len(), 3);
    }

    #[test]
    fn a_single_member_stands_alone_and_runs_are_not_members() {
        let demo = demo();
        let member = demo.member("member-hearth").expect("the hearth member");
        assert!(member.run.is_none());
        assert_eq!(member.area.id, demo.areas[1].id);
        assert_eq!(
            member.effective_framing().size,
            Some("2x14".parse::<NominalSize>().unwrap())
        );
        assert!(demo.member("run-kitchen").is_none());
        assert!(demo.member("no-such-id").is_none());
    }
}
