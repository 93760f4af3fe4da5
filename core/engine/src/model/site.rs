//! What the inspector records about the space itself beside the framing: water, the ground
//! cover, ventilation, fungal growth, and the soil under the footings.

use super::SoilClass;
use serde::{Deserialize, Serialize};

/// The ground cover of a crawlspace.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, Deserialize)]
#[serde(rename_all = "kebab-case")]
pub enum VaporRetarder {
    /// The ground is covered, laps sealed or lapped.
    Full,
    /// Torn, displaced or covering part of the ground.
    Partial,
    None,
}

/// How the crawlspace is ventilated.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, Deserialize)]
#[serde(rename_all = "kebab-case")]
pub enum Ventilation {
    /// Vents through the foundation walls, open.
    Vented,
    /// Vents present but closed or blocked.
    VentsBlocked,
    /// Built as an unvented (conditioned) crawlspace.
    Unvented,
    /// No vents and no conditioning seen.
    NoneSeen,
}

/// Conditions of the space under the framing. Every field is optional: unset means "not
/// recorded", which is different from "none".
#[derive(Debug, Clone, Copy, PartialEq, Default, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct SiteConditions {
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub standing_water: Option<bool>,
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub vapor_retarder: Option<VaporRetarder>,
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub ventilation: Option<Ventilation>,
    /// Visible fungal growth on the framing.
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub fungal_growth: Option<bool>,
    /// The soil under the footings, where a report or the local office says.
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub soil: Option<SoilClass>,
}

impl SiteConditions {
    pub fn is_unset(&self) -> bool {
        *self == SiteConditions::default()
    }

    /// Standing water or visible fungal growth: wood here may be wet even where no reading
    /// was taken.
    pub fn signs_of_wetting(&self) -> Option<&'static str> {
        if self.standing_water == Some(true) {
            Some("standing water")
        } else if self.fungal_growth == Some(true) {
            Some("visible fungal growth")
        } else {
            None
        }
    }
}
