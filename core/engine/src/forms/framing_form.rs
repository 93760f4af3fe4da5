//! The fields of a joist run or member as typed, to and from the model's `Framing`.

use crate::lumber::{GradeChoice, NominalSize, Species};
use crate::model::{
    ActualSize, Bearing, BearingSupport, Bridging, BridgingKind, EndRestraint, Framing, MemberKind,
    RoomUse,
};
use crate::units::{format_dimension, format_length, parse_typed_length, Length, UnitSystem};
use serde::{Deserialize, Serialize};

/// One field's problem, named so the screen can show it beside the field.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct FieldError {
    pub field: &'static str,
    pub message: String,
}

/// A run's or member's framing as the inspector typed or picked it. Empty means not entered.
#[derive(Debug, Clone, PartialEq, Default, Serialize, Deserialize)]
pub struct FramingForm {
    /// `sawn` (or empty), `i-joist`, `composite-lumber`, `floor-truss`, `glulam`.
    pub kind: String,
    pub species: String,
    /// A grade, or `none` when no stamp is visible.
    pub grade: String,
    /// Nominal size such as `2x10`.
    pub size: String,
    /// Measured section for rough-sawn lumber, such as `2 x 10`.
    pub actual: String,
    /// As a tape reads; a bare number is inches (mm in metric).
    pub spacing: String,
    /// As a tape reads: `15' 2"`, `15-2`, `15'`; a bare number is inches (see `units::typed`).
    pub clear_span: String,
    /// As a tape reads; a bare number is inches (mm in metric).
    pub bearing_length: String,
    /// `wood`, `metal`, `masonry`, `concrete`, `hanger`, `ribbon`, `ledger`.
    pub bearing_on: String,
    /// `rim-joist`, `solid-blocking`, `header`, `stud`, `none`.
    pub end_restraint: String,
    /// `none`, `solid-blocking`, `diagonal`, `strap`.
    pub bridging: String,
    /// As a tape reads; a bare number is inches (mm in metric).
    pub bridging_interval: String,
    /// Where the room above differs from its area's: `sleeping`, `living`; empty inherits.
    pub room_use_above: String,
    /// Where the finishes differ from the area's: `light`, `heavy`; empty inherits.
    pub finishes: String,
}

fn enum_from<T: serde::de::DeserializeOwned>(text: &str) -> Option<T> {
    serde_json::from_value(serde_json::Value::String(text.trim().to_string())).ok()
}

fn enum_text<T: Serialize>(value: &T) -> String {
    serde_json::to_value(value)
        .ok()
        .and_then(|v| v.as_str().map(str::to_string))
        .unwrap_or_default()
}

/// Puts back the stored value of one field (by its form name) into `framing`: for a field
/// that does not read, or whose value waits on the inspector's answer to a question.
pub fn keep_stored(framing: &mut Framing, stored: &Framing, field: &str) {
    match field {
        "kind" => framing.kind = stored.kind,
        "species" => framing.species = stored.species,
        "grade" => framing.grade = stored.grade,
        "size" => framing.size = stored.size,
        "actual" => framing.actual = stored.actual,
        "spacing" => framing.spacing = stored.spacing,
        "clear_span" => framing.clear_span = stored.clear_span,
        "bearing_length" | "bearing_on" => framing.bearing = stored.bearing,
        "end_restraint" => framing.end_restraint = stored.end_restraint,
        "bridging" | "bridging_interval" => framing.bridging = stored.bridging,
        "room_use_above" => framing.loads.room_use_above = stored.loads.room_use_above,
        "finishes" => framing.loads.heavy_finish = stored.loads.heavy_finish,
        _ => {}
    }
}

impl FramingForm {
    /// The form showing a stored framing, lengths written the way a tape reads.
    pub fn from_framing(f: &Framing, units: UnitSystem) -> FramingForm {
        let short = |l: Option<Length>| l.map(|l| format_dimension(l, units)).unwrap_or_default();
        let long = |l: Option<Length>| l.map(|l| format_length(l, units)).unwrap_or_default();
        FramingForm {
            kind: f.kind.map(|k| enum_text(&k)).unwrap_or_default(),
            species: f.species.map(|s| s.key().to_string()).unwrap_or_default(),
            grade: f.grade.map(|g| g.key().to_string()).unwrap_or_default(),
            size: f.size.map(|s| s.to_string()).unwrap_or_default(),
            actual: f
                .actual
                .map(|a| {
                    format!(
                        "{} x {}",
                        format_dimension(a.thickness, units),
                        format_dimension(a.depth, units)
                    )
                })
                .unwrap_or_default(),
            spacing: short(f.spacing),
            clear_span: long(f.clear_span),
            bearing_length: short(f.bearing.and_then(|b| b.length)),
            bearing_on: f.bearing.map(|b| enum_text(&b.on)).unwrap_or_default(),
            end_restraint: f.end_restraint.map(|r| enum_text(&r)).unwrap_or_default(),
            bridging: f.bridging.map(|b| enum_text(&b.kind)).unwrap_or_default(),
            bridging_interval: long(f.bridging.and_then(|b| b.interval)),
            room_use_above: f
                .loads
                .room_use_above
                .map(|r| enum_text(&r))
                .unwrap_or_default(),
            finishes: match f.loads.heavy_finish {
                Some(true) => "heavy".into(),
                Some(false) => "light".into(),
                None => String::new(),
            },
        }
    }

    /// The model's framing, and a problem for each field that could not be read (that field
    /// is left out; nothing else is lost).
    pub fn to_framing(&self, units: UnitSystem) -> (Framing, Vec<FieldError>) {
        let mut errors = Vec::new();
        let mut fail =
            |field: &'static str, message: String| errors.push(FieldError { field, message });
        let mut framing = Framing::default();
        let filled = |t: &str| !t.trim().is_empty();

        if filled(&self.kind) {
            match enum_from::<MemberKind>(&self.kind) {
                Some(k) => framing.kind = Some(k),
                None => fail(
                    "kind",
                    format!("unknown member kind \"{}\"", self.kind.trim()),
                ),
            }
        }
        if filled(&self.species) {
            match self.species.parse::<Species>() {
                Ok(s) => framing.species = Some(s),
                Err(e) => fail("species", e),
            }
        }
        if filled(&self.grade) {
            match self.grade.parse::<GradeChoice>() {
                Ok(g) => framing.grade = Some(g),
                Err(e) => fail("grade", e),
            }
        }
        if filled(&self.size) {
            match self.size.parse::<NominalSize>() {
                Ok(s) => framing.size = Some(s),
                Err(e) => fail("size", e.to_string()),
            }
        }
        if filled(&self.actual) {
            match crate::lumber::Section::measured(&self.actual, framing.size) {
                Ok(s) => {
                    framing.actual = Some(ActualSize {
                        thickness: s.thickness,
                        depth: s.depth,
                    })
                }
                Err(e) => fail("actual", e.to_string()),
            }
        }
        let mut length = |field: &'static str, text: &str| -> Option<Length> {
            if !filled(text) {
                return None;
            }
            match parse_typed_length(text, units) {
                Ok(l) => Some(l),
                Err(e) => {
                    fail(field, e.to_string());
                    None
                }
            }
        };
        framing.spacing = length("spacing", &self.spacing);
        framing.clear_span = length("clear_span", &self.clear_span);
        let bearing_length = length("bearing_length", &self.bearing_length);
        let interval = length("bridging_interval", &self.bridging_interval);
        if filled(&self.bearing_on) {
            match enum_from::<BearingSupport>(&self.bearing_on) {
                Some(on) => {
                    framing.bearing = Some(Bearing {
                        length: bearing_length,
                        on,
                    })
                }
                None => fail(
                    "bearing_on",
                    format!("unknown support \"{}\"", self.bearing_on.trim()),
                ),
            }
        } else if bearing_length.is_some() {
            fail("bearing_on", "pick what the joists bear on".into());
        }
        if filled(&self.end_restraint) {
            match enum_from::<EndRestraint>(&self.end_restraint) {
                Some(r) => framing.end_restraint = Some(r),
                None => fail(
                    "end_restraint",
                    format!("unknown end restraint \"{}\"", self.end_restraint.trim()),
                ),
            }
        }
        if filled(&self.bridging) {
            match enum_from::<BridgingKind>(&self.bridging) {
                Some(kind) => framing.bridging = Some(Bridging { kind, interval }),
                None => fail(
                    "bridging",
                    format!("unknown bridging \"{}\"", self.bridging.trim()),
                ),
            }
        } else if interval.is_some() {
            fail("bridging", "pick the kind of bridging".into());
        }
        if filled(&self.room_use_above) {
            match enum_from::<RoomUse>(&self.room_use_above) {
                Some(r) => framing.loads.room_use_above = Some(r),
                None => fail(
                    "room_use_above",
                    format!("unknown room use \"{}\"", self.room_use_above.trim()),
                ),
            }
        }
        match self.finishes.trim() {
            "" => {}
            "heavy" => framing.loads.heavy_finish = Some(true),
            "light" => framing.loads.heavy_finish = Some(false),
            other => fail("finishes", format!("unknown finishes \"{other}\"")),
        }
        (framing, errors)
    }

    /// Sets one field by its name (the names `FieldError` uses); unknown names change nothing.
    pub fn set(&mut self, field: &str, value: String) {
        let slot = match field {
            "kind" => &mut self.kind,
            "species" => &mut self.species,
            "grade" => &mut self.grade,
            "size" => &mut self.size,
            "actual" => &mut self.actual,
            "spacing" => &mut self.spacing,
            "clear_span" => &mut self.clear_span,
            "bearing_length" => &mut self.bearing_length,
            "bearing_on" => &mut self.bearing_on,
            "end_restraint" => &mut self.end_restraint,
            "bridging" => &mut self.bridging,
            "bridging_interval" => &mut self.bridging_interval,
            "room_use_above" => &mut self.room_use_above,
            "finishes" => &mut self.finishes,
            _ => return,
        };
        *slot = value;
    }

    /// What to save while the inspector is typing: the form's framing, except that a field
    /// that does not read yet keeps its stored value (nothing saved is lost to a keystroke).
    pub fn merged_with(&self, stored: &Framing, units: UnitSystem) -> (Framing, Vec<FieldError>) {
        let (mut framing, errors) = self.to_framing(units);
        for e in &errors {
            keep_stored(&mut framing, stored, e.field);
        }
        // Loads the form does not show (a typed live or dead load from a file) are kept.
        framing.loads.live_psf = stored.loads.live_psf;
        framing.loads.dead_psf = stored.loads.dead_psf;
        framing.loads.deflection = stored.loads.deflection;
        (framing, errors)
    }

    /// A joist's form as read against its run: a bearing length or a bridging interval typed
    /// without saying what it bears on or what kind of bridging takes the run's.
    pub fn with_run_kinds(&self, run: &Framing) -> FramingForm {
        let mut form = self.clone();
        if form.bearing_on.trim().is_empty() && !form.bearing_length.trim().is_empty() {
            if let Some(b) = run.bearing {
                form.bearing_on = enum_text(&b.on);
            }
        }
        if form.bridging.trim().is_empty() && !form.bridging_interval.trim().is_empty() {
            if let Some(b) = run.bridging {
                form.bridging = enum_text(&b.kind);
            }
        }
        form
    }

    /// The fields filled in, each as a short phrase ("span 13' 0\"", "bearing 2\""): what a
    /// joist lists as differing from its run.
    pub fn filled_fields(&self) -> Vec<String> {
        let named: [(&str, &String); 14] = [
            ("", &self.kind),
            ("", &self.species),
            ("grade", &self.grade),
            ("", &self.size),
            ("measured", &self.actual),
            ("spacing", &self.spacing),
            ("span", &self.clear_span),
            ("bearing", &self.bearing_length),
            ("on", &self.bearing_on),
            ("ends", &self.end_restraint),
            ("bridging", &self.bridging),
            ("bridging every", &self.bridging_interval),
            ("rooms above", &self.room_use_above),
            ("finishes", &self.finishes),
        ];
        named
            .iter()
            .filter(|(_, v)| !v.trim().is_empty())
            .map(|(name, v)| {
                if name.is_empty() {
                    v.trim().to_string()
                } else {
                    format!("{name} {}", v.trim())
                }
            })
            .collect()
    }

    /// Fills every empty field from the previous run's form (one tap: "same as before").
    pub fn fill_from(&mut self, previous: &FramingForm) {
        let pairs: [(&mut String, &String); 14] = [
            (&mut self.kind, &previous.kind),
            (&mut self.species, &previous.species),
            (&mut self.grade, &previous.grade),
            (&mut self.size, &previous.size),
            (&mut self.actual, &previous.actual),
            (&mut self.spacing, &previous.spacing),
            (&mut self.clear_span, &previous.clear_span),
            (&mut self.bearing_length, &previous.bearing_length),
            (&mut self.bearing_on, &previous.bearing_on),
            (&mut self.end_restraint, &previous.end_restraint),
            (&mut self.bridging, &previous.bridging),
            (&mut self.bridging_interval, &previous.bridging_interval),
            (&mut self.room_use_above, &previous.room_use_above),
            (&mut self.finishes, &previous.finishes),
        ];
        for (mine, theirs) in pairs {
            if mine.trim().is_empty() {
                *mine = theirs.clone();
            }
        }
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    fn typed() -> FramingForm {
        FramingForm {
            species: "SPF".into(),
            grade: "#2".into(),
            size: "2x10".into(),
            spacing: "16".into(),
            clear_span: "16' 0\"".into(),
            bearing_length: "1-1/2".into(),
            bearing_on: "wood".into(),
            end_restraint: "rim-joist".into(),
            ..Default::default()
        }
    }

    #[test]
    fn typed_values_become_the_model_and_back() {
        let (framing, errors) = typed().to_framing(UnitSystem::Imperial);
        assert!(errors.is_empty(), "{errors:?}");
        assert_eq!(framing.clear_span, Some(Length::inches(192.0)));
        assert_eq!(framing.spacing, Some(Length::inches(16.0)));
        assert_eq!(
            framing.bearing,
            Some(Bearing {
                length: Some(Length::inches(1.5)),
                on: BearingSupport::Wood
            })
        );
        let shown = FramingForm::from_framing(&framing, UnitSystem::Imperial);
        assert_eq!(
            (
                shown.clear_span.as_str(),
                shown.spacing.as_str(),
                shown.species.as_str()
            ),
            ("16' 0\"", "16\"", "spruce-pine-fir")
        );
        assert_eq!(shown.to_framing(UnitSystem::Imperial).0, framing);
    }

    #[test]
    fn a_bare_number_is_inches_in_every_length_field() {
        let form = FramingForm {
            clear_span: "15-2".into(),
            spacing: "19.2".into(),
            ..Default::default()
        };
        let (f, _) = form.to_framing(UnitSystem::Imperial);
        assert_eq!(f.clear_span, Some(Length::inches(182.0)));
        let form = FramingForm {
            clear_span: "182".into(),
            ..Default::default()
        };
        assert_eq!(
            form.to_framing(UnitSystem::Imperial).0.clear_span,
            Some(Length::inches(182.0))
        );
        let metric = FramingForm {
            clear_span: "4150".into(),
            spacing: "406".into(),
            ..Default::default()
        };
        let (f, _) = metric.to_framing(UnitSystem::Metric);
        assert!((f.clear_span.unwrap().in_millimetres() - 4150.0).abs() < 1e-9);
    }

    #[test]
    fn each_bad_field_is_named_and_the_rest_kept() {
        let mut form = typed();
        form.species = "oak".into();
        form.clear_span = "13''7".into();
        form.grade = "utility".into();
        let (framing, errors) = form.to_framing(UnitSystem::Imperial);
        let fields: Vec<_> = errors.iter().map(|e| e.field).collect();
        assert_eq!(fields, ["species", "grade", "clear_span"]);
        assert_eq!(
            framing.size,
            Some(NominalSize::new(2, 10)),
            "good fields survive"
        );
        assert!(framing.clear_span.is_none());
    }

    #[test]
    fn a_half_typed_field_keeps_the_stored_value() {
        let (stored, _) = typed().to_framing(UnitSystem::Imperial);
        let mut form = typed();
        form.clear_span = "16-".into();
        form.spacing = String::new();
        let (merged, errors) = form.merged_with(&stored, UnitSystem::Imperial);
        assert_eq!(errors[0].field, "clear_span");
        assert_eq!(
            merged.clear_span, stored.clear_span,
            "kept while the entry does not read"
        );
        assert_eq!(
            merged.spacing, None,
            "a field emptied on purpose is emptied"
        );
    }

    #[test]
    fn copy_the_previous_run() {
        let mut next = FramingForm {
            clear_span: "12' 6\"".into(),
            ..Default::default()
        };
        next.fill_from(&typed());
        assert_eq!(next.species, "SPF");
        assert_eq!(next.clear_span, "12' 6\"", "what was typed stays");
    }

    // Source: IRC 2018 Table R301.5 (40 psf for rooms other than sleeping rooms): a family
    // room run in a sleeping-room area is set to "other rooms" on the run; a typed live load
    // from a file, which the form does not show, survives a field edit.
    #[test]
    fn a_run_can_say_its_room_and_finishes() {
        let mut form = typed();
        form.set("room_use_above", "living".into());
        form.set("finishes", "heavy".into());
        let (framing, errors) = form.to_framing(UnitSystem::Imperial);
        assert!(errors.is_empty(), "{errors:?}");
        assert_eq!(framing.loads.room_use_above, Some(RoomUse::Living));
        assert_eq!(framing.loads.heavy_finish, Some(true));
        let back = FramingForm::from_framing(&framing, UnitSystem::Imperial);
        assert_eq!(
            (back.room_use_above.as_str(), back.finishes.as_str()),
            ("living", "heavy")
        );
        let mut stored = framing.clone();
        stored.loads.live_psf = Some(50.0);
        let (merged, _) = back.merged_with(&stored, UnitSystem::Imperial);
        assert_eq!(merged.loads.live_psf, Some(50.0));
    }
}
