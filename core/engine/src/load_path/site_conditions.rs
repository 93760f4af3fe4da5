//! Conditions of the space under the floor that the inspector records beside the framing:
//! standing water, the ground cover, ventilation and fungal growth. Each is an observed
//! condition with its own words; R408 is cited for what it asks of under-floor spaces.

use crate::finding::{Basis, Common, Finding, FindingBuilder, Place, RuleInfo, Status, Wording};
use crate::model::{Area, AreaKind, VaporRetarder, Ventilation};
use crate::units::UnitSystem;
use std::sync::Arc;

pub const RULE: RuleInfo = RuleInfo {
    id: "crawlspace-conditions",
    title: "Conditions of the space under the floor",
    code_section: Some("R408 (under-floor space)"),
    other_source: Some("Observed condition"),
    basis: Basis::Observed,
};

#[derive(Debug, Clone, Copy, PartialEq)]
pub enum SiteDetail {
    StandingWater,
    NoGroundCover(VaporRetarder),
    Ventilation(Ventilation),
    FungalGrowth,
}

pub fn check(area: &Area, common: &Common, out: &mut Vec<Finding>) {
    let c = &area.conditions;
    let mut seen = Vec::new();
    if c.standing_water == Some(true) {
        seen.push(SiteDetail::StandingWater);
    }
    if c.fungal_growth == Some(true) {
        seen.push(SiteDetail::FungalGrowth);
    }
    if area.kind == AreaKind::Crawlspace {
        if let Some(v @ (VaporRetarder::None | VaporRetarder::Partial)) = c.vapor_retarder {
            seen.push(SiteDetail::NoGroundCover(v));
        }
        if let Some(v @ (Ventilation::VentsBlocked | Ventilation::NoneSeen)) = c.ventilation {
            seen.push(SiteDetail::Ventilation(v));
        }
    }
    let place = Place {
        area_id: Arc::from(area.id.as_str()),
        member_id: Arc::from(area.id.as_str()),
        location: Arc::from(area.name.as_str()),
    };
    for d in seen {
        let part = match d {
            SiteDetail::StandingWater => "standing-water",
            SiteDetail::FungalGrowth => "fungal-growth",
            SiteDetail::NoGroundCover(_) => "ground-cover",
            SiteDetail::Ventilation(_) => "ventilation",
        };
        out.push(
            FindingBuilder::at(&RULE, place.clone(), common)
                .part(part)
                .observed(d),
        );
    }
}

impl Wording for SiteDetail {
    fn summary(&self, _u: UnitSystem) -> String {
        match self {
            SiteDetail::StandingWater => "Standing water on the ground under the floor".into(),
            SiteDetail::FungalGrowth => "Visible fungal growth on the framing".into(),
            SiteDetail::NoGroundCover(VaporRetarder::Partial) => {
                "The ground cover (vapour retarder) is torn, displaced or partial".into()
            }
            SiteDetail::NoGroundCover(_) => {
                "No ground cover (vapour retarder) over the exposed ground".into()
            }
            SiteDetail::Ventilation(Ventilation::VentsBlocked) => {
                "The crawlspace vents are closed or blocked".into()
            }
            SiteDetail::Ventilation(_) => {
                "No ventilation openings and no conditioning of the crawlspace seen".into()
            }
        }
    }

    fn assumptions(&self, _u: UnitSystem) -> Vec<String> {
        match self {
            SiteDetail::StandingWater | SiteDetail::FungalGrowth => vec!["Where no moisture reading was taken on a joist run in this area, its span is not fully checked: wet service is not ruled out".into()],
            _ => vec![],
        }
    }

    fn recommendation(&self, _status: Status, _u: UnitSystem) -> String {
        match self {
            SiteDetail::StandingWater => "Water under the floor wets the framing and feeds decay. Have a contractor find the source (grading, gutters, plumbing) and provide drainage; take moisture readings of the framing.".into(),
            SiteDetail::FungalGrowth => "Growth on wood means it has been wet for long. Take moisture readings, probe for decay, and have the moisture source corrected; refer to a qualified professional for cleaning.".into(),
            SiteDetail::NoGroundCover(_) => "Exposed ground gives off moisture into the crawlspace. Have a contractor cover the ground with a vapour retarder, laps overlapped.".into(),
            SiteDetail::Ventilation(_) => "A crawlspace is either ventilated or conditioned. Have a contractor open the vents or evaluate conditioning the space.".into(),
        }
    }
}
