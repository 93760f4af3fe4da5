//! Floor loads: room use above (Table R301.5) and finishes (10 or 20 psf dead load).

use crate::units::Psf;
use serde::{Deserialize, Serialize};

/// What the room above is used for, which sets the live load.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, Deserialize)]
#[serde(rename_all = "kebab-case")]
pub enum RoomUse {
    Sleeping,
    Living,
}

impl RoomUse {
    /// Source: IRC 2018 Table R301.5: sleeping rooms 30 psf, rooms other than sleeping
    /// rooms 40 psf.
    pub fn live_load(self) -> Psf {
        match self {
            RoomUse::Sleeping => Psf(30.0),
            RoomUse::Living => Psf(40.0),
        }
    }

    pub fn describe(self) -> &'static str {
        match self {
            RoomUse::Sleeping => "sleeping rooms above",
            RoomUse::Living => "rooms other than sleeping rooms above",
        }
    }
}

/// Load choices, set on the inspection and overridden per area. Unset means "inherit";
/// at the top, living use, light finishes, L/360.
#[derive(Debug, Clone, Copy, PartialEq, Default, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct LoadSettings {
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub room_use_above: Option<RoomUse>,
    /// Heavy finishes above (tile, stone, mortar bed): 20 psf dead load instead of 10.
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub heavy_finish: Option<bool>,
    /// A live load other than the room use gives, psf.
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub live_psf: Option<f64>,
    /// A dead load other than the finishes give, psf.
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub dead_psf: Option<f64>,
    /// The n of the live-load deflection limit L/n.
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub deflection: Option<f64>,
}

/// Loads resolved for one area.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct ResolvedLoads {
    pub room_use: RoomUse,
    pub heavy_finish: bool,
    pub live: Psf,
    pub dead: Psf,
    pub deflection_denominator: f64,
}

impl LoadSettings {
    /// True when nothing is set (everything inherited).
    pub fn is_unset(&self) -> bool {
        *self == LoadSettings::default()
    }

    /// These settings where set, else `base`'s: a member's over its area's.
    pub fn over(&self, base: &LoadSettings) -> LoadSettings {
        LoadSettings {
            room_use_above: self.room_use_above.or(base.room_use_above),
            heavy_finish: self.heavy_finish.or(base.heavy_finish),
            live_psf: self.live_psf.or(base.live_psf),
            dead_psf: self.dead_psf.or(base.dead_psf),
            deflection: self.deflection.or(base.deflection),
        }
    }

    /// This area's settings over the inspection's, then the defaults.
    /// Source for the defaults: IRC 2018 Table R301.5 (40 psf living areas), the dead loads
    /// of Tables R502.3.1(1)/(2) (10 psf, or 20 psf), Table R301.7 (floors L/360).
    pub fn resolve(&self, outer: &LoadSettings) -> ResolvedLoads {
        let room_use = self
            .room_use_above
            .or(outer.room_use_above)
            .unwrap_or(RoomUse::Living);
        let heavy_finish = self.heavy_finish.or(outer.heavy_finish).unwrap_or(false);
        let live = self
            .live_psf
            .or(outer.live_psf)
            .map(Psf)
            .unwrap_or(room_use.live_load());
        let dead = self
            .dead_psf
            .or(outer.dead_psf)
            .map(Psf)
            .unwrap_or(Psf(if heavy_finish { 20.0 } else { 10.0 }));
        let deflection_denominator = self.deflection.or(outer.deflection).unwrap_or(360.0);
        ResolvedLoads {
            room_use,
            heavy_finish,
            live,
            dead,
            deflection_denominator,
        }
    }
}

impl LoadSettings {
    /// These settings with unusable numbers removed, and a note of each removed.
    pub fn usable(&self) -> (LoadSettings, Vec<String>) {
        let mut out = *self;
        let mut notes = Vec::new();
        let mut keep = |value: &mut Option<f64>, ok: fn(f64) -> bool, what: &str| {
            if let Some(v) = *value {
                if !ok(v) {
                    notes.push(format!("{what} {v} is not usable; the default is used"));
                    *value = None;
                }
            }
        };
        keep(
            &mut out.live_psf,
            |v| v > 0.0 && v <= 500.0,
            "live load (psf, more than 0 to 500)",
        );
        keep(
            &mut out.dead_psf,
            |v| (0.0..=500.0).contains(&v),
            "dead load (psf, 0 to 500)",
        );
        keep(
            &mut out.deflection,
            |v| (60.0..=1200.0).contains(&v),
            "deflection limit L/n (n 60 to 1200)",
        );
        (out, notes)
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    // Source: IRC 2018 Table R301.5 (30 / 40 psf); Tables R502.3.1(1)/(2) dead loads 10 / 20 psf;
    // Table R301.7 floors L/360.
    #[test]
    fn resolution_and_defaults() {
        let top = LoadSettings {
            room_use_above: Some(RoomUse::Sleeping),
            ..Default::default()
        };
        let area = LoadSettings {
            heavy_finish: Some(true),
            ..Default::default()
        };
        let r = area.resolve(&top);
        assert_eq!(
            (r.live, r.dead, r.deflection_denominator),
            (Psf(30.0), Psf(20.0), 360.0)
        );
        let r = LoadSettings::default().resolve(&LoadSettings::default());
        assert_eq!((r.live, r.dead), (Psf(40.0), Psf(10.0)));
        let r = LoadSettings {
            live_psf: Some(50.0),
            ..Default::default()
        }
        .resolve(&top);
        assert_eq!(r.live, Psf(50.0));
    }
}
