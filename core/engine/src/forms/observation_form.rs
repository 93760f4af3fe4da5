//! An observation as typed: which fields each kind has (for the screen to lay out), the typed
//! text of each, and the conversion to and from the model with an error per field.

use super::FieldError;
use crate::model::{Observation, ObservationKind};
use crate::units::{format_dimension, format_length, parse_typed_length, Length, UnitSystem};
use crate::validate::observation_problem;
use serde_json::{Map, Value};
use std::collections::BTreeMap;
use std::sync::Arc;

/// How a field is entered.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum FieldType {
    /// A short length, inches when no unit is typed (a notch depth).
    Short,
    /// A position or span (feet with their mark; see `units::typed`).
    Long,
    /// Percent, a plain number.
    Percent,
    /// A whole number.
    Count,
    /// One of the listed (value, label) picks.
    Choice(&'static [(&'static str, &'static str)]),
    /// Yes or no ("true"/"false").
    Flag,
    /// Free text.
    Text,
    /// Sag readings, one per line: "distance, offset".
    Readings,
}

/// One field of an observation form.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub struct FieldSpec {
    pub name: &'static str,
    pub label: &'static str,
    pub kind: FieldType,
    pub required: bool,
}

const EDGES: &[(&str, &str)] = &[("bottom", "Bottom edge"), ("top", "Top edge")];
const ENDS: &[(&str, &str)] = &[("a", "From support A"), ("b", "From support B")];
/// What a joist end can bear on, as (value, label).
pub const SUPPORTS: &[(&str, &str)] = &[
    ("wood", "Wood"),
    ("metal", "Metal"),
    ("masonry", "Masonry"),
    ("concrete", "Concrete"),
    ("hanger", "Joist hanger"),
    ("ribbon", "Ribbon strip"),
    ("ledger", "Ledger strip"),
];
const CAUSES: &[(&str, &str)] = &[
    ("decay", "Decay"),
    ("insects", "Insects"),
    ("fire", "Fire"),
    ("other", "Other"),
];
const RESTRAINTS: &[(&str, &str)] = &[
    ("rim-joist", "Rim or band joist"),
    ("solid-blocking", "Full-depth blocking"),
    ("header", "Header"),
    ("stud", "Adjoining stud"),
    ("none", "None seen"),
];

const fn field(
    name: &'static str,
    label: &'static str,
    kind: FieldType,
    required: bool,
) -> FieldSpec {
    FieldSpec {
        name,
        label,
        kind,
        required,
    }
}

/// The kinds of observation, as (value, label), in the order a picker shows them.
pub const KINDS: &[(&str, &str)] = &[
    ("notch", "Notch"),
    ("hole", "Bored hole"),
    ("bearing", "Bearing"),
    ("sag", "Sag readings"),
    ("moisture", "Moisture reading"),
    ("damage", "Decay or insect damage"),
    ("lap", "Lap over a support"),
    ("restraint", "End restraint"),
    ("cut", "Other cut"),
    ("opening", "Floor opening"),
    ("partition", "Bearing partition above"),
    ("cantilever", "Cantilever"),
];

const NOTCH_FIELDS: &[FieldSpec] = &[
    field("edge", "Edge", FieldType::Choice(EDGES), true),
    field("depth", "Depth", FieldType::Short, true),
    field("length", "Length along the joist", FieldType::Short, true),
    field(
        "at_end",
        "At the end, over the bearing",
        FieldType::Flag,
        false,
    ),
    field(
        "from_support",
        "Distance from the support face",
        FieldType::Long,
        false,
    ),
    field("end", "Measured from", FieldType::Choice(ENDS), false),
];
const HOLE_FIELDS: &[FieldSpec] = &[
    field("diameter", "Diameter", FieldType::Short, true),
    field(
        "from_support",
        "Distance from the support face to its centre",
        FieldType::Long,
        true,
    ),
    field("end", "Measured from", FieldType::Choice(ENDS), false),
    field(
        "center_above_bottom",
        "Centre above the bottom edge",
        FieldType::Short,
        true,
    ),
];
const BEARING_FIELDS: &[FieldSpec] = &[
    field("end", "End", FieldType::Choice(ENDS), true),
    field("length", "Bearing length", FieldType::Short, false),
    field("on", "Bears on", FieldType::Choice(SUPPORTS), true),
];
const SAG_FIELDS: &[FieldSpec] = &[
    field(
        "readings",
        "Readings (distance from A, offset), one per line",
        FieldType::Readings,
        true,
    ),
    field("spacer", "Spacer block thickness", FieldType::Short, false),
];
const MOISTURE_FIELDS: &[FieldSpec] = &[
    field("percent", "Moisture content, %", FieldType::Percent, true),
    field("location", "Where", FieldType::Text, false),
];
const DAMAGE_AT: &[(&str, &str)] = &[
    ("a", "At end A, over the bearing"),
    ("b", "At end B, over the bearing"),
];
const DAMAGE_FIELDS: &[FieldSpec] = &[
    field("cause", "Cause", FieldType::Choice(CAUSES), true),
    field("severity", "How bad (your words)", FieldType::Text, false),
    field("extent", "Extent", FieldType::Text, false),
    field("at_end", "Where", FieldType::Choice(DAMAGE_AT), false),
    field(
        "reach",
        "How far it reaches in from that end",
        FieldType::Short,
        false,
    ),
];
const LAP_FIELDS: &[FieldSpec] = &[
    field("length", "Lap length", FieldType::Short, false),
    field("nails", "10d face nails", FieldType::Count, false),
    field(
        "spliced",
        "Spliced instead of lapped",
        FieldType::Flag,
        false,
    ),
];
const RESTRAINT_FIELDS: &[FieldSpec] = &[
    field("end", "End", FieldType::Choice(ENDS), true),
    field(
        "restraint",
        "Restraint",
        FieldType::Choice(RESTRAINTS),
        true,
    ),
];
const CUT_FIELDS: &[FieldSpec] = &[field("description", "What was cut", FieldType::Text, false)];
const OPENING_FIELDS: &[FieldSpec] = &[
    field(
        "header_span",
        "Header span across the opening",
        FieldType::Long,
        true,
    ),
    field(
        "header_plies",
        "Plies in the header",
        FieldType::Count,
        true,
    ),
    field(
        "trimmer_plies",
        "Plies in each trimmer",
        FieldType::Count,
        true,
    ),
    field("hangers", "Header hung on hangers", FieldType::Flag, false),
    field("tail_length", "Longest tail joist", FieldType::Long, false),
    field(
        "tails_supported",
        "Tails on framing anchors or ledger strips",
        FieldType::Flag,
        false,
    ),
];
const PARTITION_FIELDS: &[FieldSpec] = &[
    field("parallel", "Runs along the joists", FieldType::Flag, false),
    field(
        "doubled",
        "Joist under it doubled (or a beam)",
        FieldType::Flag,
        false,
    ),
    field(
        "offset",
        "Across the joists: distance from the support below",
        FieldType::Short,
        false,
    ),
];
const CARRIES: &[(&str, &str)] = &[
    ("floor-only", "The floor only"),
    ("balcony", "A balcony"),
    ("wall-and-roof", "A wall and roof"),
];
const CANTILEVER_FIELDS: &[FieldSpec] = &[
    field(
        "length",
        "Overhang past the support",
        FieldType::Short,
        true,
    ),
    field("backspan", "Span inside (backspan)", FieldType::Long, false),
    field("carries", "Carries", FieldType::Choice(CARRIES), false),
];

/// The fields of one kind of observation.
pub fn fields_of(kind: &str) -> &'static [FieldSpec] {
    match kind {
        "notch" => NOTCH_FIELDS,
        "hole" => HOLE_FIELDS,
        "bearing" => BEARING_FIELDS,
        "sag" => SAG_FIELDS,
        "moisture" => MOISTURE_FIELDS,
        "damage" => DAMAGE_FIELDS,
        "lap" => LAP_FIELDS,
        "restraint" => RESTRAINT_FIELDS,
        "cut" => CUT_FIELDS,
        "opening" => OPENING_FIELDS,
        "partition" => PARTITION_FIELDS,
        "cantilever" => CANTILEVER_FIELDS,
        _ => &[],
    }
}

/// An observation as typed: its kind, the text of each field, the note.
#[derive(Debug, Clone, PartialEq, Default)]
pub struct ObservationForm {
    pub kind: String,
    pub values: BTreeMap<String, String>,
    pub note: String,
}

impl ObservationForm {
    pub fn new(kind: &str) -> ObservationForm {
        ObservationForm {
            kind: kind.into(),
            ..Default::default()
        }
    }

    pub fn value(&self, field: &str) -> &str {
        self.values.get(field).map(String::as_str).unwrap_or("")
    }

    /// The form showing a stored observation.
    pub fn from_observation(o: &Observation, units: UnitSystem) -> ObservationForm {
        let json = serde_json::to_value(&o.kind).unwrap_or(Value::Null);
        let kind = json
            .get("kind")
            .and_then(Value::as_str)
            .unwrap_or_default()
            .to_string();
        let mut values = BTreeMap::new();
        for spec in fields_of(&kind) {
            let Some(v) = json.get(spec.name) else {
                continue;
            };
            let text = match (spec.kind, v) {
                (FieldType::Short, Value::Number(n)) => {
                    format_dimension(Length::inches(n.as_f64().unwrap_or(0.0)), units)
                }
                (FieldType::Long, Value::Number(n)) => {
                    format_length(Length::inches(n.as_f64().unwrap_or(0.0)), units)
                }
                (FieldType::Readings, Value::Array(rows)) => rows
                    .iter()
                    .map(|r| {
                        let at = Length::inches(r.get("at").and_then(Value::as_f64).unwrap_or(0.0));
                        let off =
                            Length::inches(r.get("offset").and_then(Value::as_f64).unwrap_or(0.0));
                        format!(
                            "{}, {}",
                            format_length(at, units),
                            format_dimension(off, units)
                        )
                    })
                    .collect::<Vec<_>>()
                    .join("\n"),
                (_, Value::String(s)) => s.clone(),
                (_, Value::Bool(b)) => b.to_string(),
                (_, Value::Number(n)) => n.to_string(),
                _ => continue,
            };
            values.insert(spec.name.to_string(), text);
        }
        ObservationForm {
            kind,
            values,
            note: o.note.clone(),
        }
    }

    /// The model's observation, or every field's problem. `clear_span` is the member's, when
    /// known: a position beyond it, or a notch "at the end" entered away from the end, is
    /// refused under the field that holds it (the rule of `validate::observation_problem`).
    pub fn to_observation(
        &self,
        id: Arc<str>,
        units: UnitSystem,
        clear_span: Option<Length>,
    ) -> Result<Observation, Vec<FieldError>> {
        let specs = fields_of(&self.kind);
        if specs.is_empty() {
            return Err(vec![FieldError {
                field: "kind",
                message: format!("unknown observation \"{}\"", self.kind),
            }]);
        }
        let mut errors = Vec::new();
        let mut object = Map::new();
        object.insert("kind".into(), Value::String(self.kind.clone()));
        for spec in specs {
            let text = self.value(spec.name).trim();
            if text.is_empty() {
                if spec.required {
                    errors.push(FieldError {
                        field: spec.name,
                        message: format!("{} is needed", spec.label.to_lowercase()),
                    });
                }
                continue;
            }
            let value = match spec.kind {
                FieldType::Short | FieldType::Long => parse_typed_length(text, units)
                    .map(|l| Value::from(l.in_inches()))
                    .map_err(|e| e.to_string()),
                FieldType::Percent => text
                    .trim_end_matches('%')
                    .trim()
                    .parse::<f64>()
                    .ok()
                    .filter(|p| p.is_finite() && (0.0..=100.0).contains(p))
                    .map(Value::from)
                    .ok_or_else(|| "a percentage from 0 to 100".to_string()),
                FieldType::Count => text
                    .parse::<u32>()
                    .map(Value::from)
                    .map_err(|_| "a whole number".to_string()),
                FieldType::Flag => Ok(Value::Bool(matches!(text, "true" | "yes" | "on"))),
                FieldType::Choice(options) => options
                    .iter()
                    .find(|(v, _)| *v == text)
                    .map(|(v, _)| Value::from(*v))
                    .ok_or_else(|| {
                        format!(
                            "pick one of {}",
                            options.iter().map(|o| o.1).collect::<Vec<_>>().join(", ")
                        )
                    }),
                FieldType::Text => Ok(Value::from(text)),
                FieldType::Readings => readings(text, units).map(Value::Array),
            };
            match value {
                Ok(v) => {
                    object.insert(spec.name.into(), v);
                }
                Err(message) => errors.push(FieldError {
                    field: spec.name,
                    message,
                }),
            }
        }
        if self.kind == "notch"
            && self.value("at_end") != "true"
            && self.value("from_support").trim().is_empty()
        {
            errors.push(FieldError {
                field: "from_support",
                message: "the distance from the support is needed unless the notch is at the end"
                    .into(),
            });
        }
        if !errors.is_empty() {
            return Err(errors);
        }
        let kind: ObservationKind = serde_json::from_value(Value::Object(object)).map_err(|e| {
            vec![FieldError {
                field: "kind",
                message: e.to_string(),
            }]
        })?;
        if let Some(message) = observation_problem(&kind, clear_span) {
            let field = match &kind {
                ObservationKind::Sag { .. } => "readings",
                ObservationKind::Damage { .. } => "reach",
                _ => "from_support",
            };
            return Err(vec![FieldError { field, message }]);
        }
        Ok(Observation {
            id,
            kind,
            note: self.note.clone(),
        })
    }
}

/// "7' 7", 5/8"" per line -> [{at, offset}] in inches.
fn readings(text: &str, units: UnitSystem) -> Result<Vec<Value>, String> {
    text.lines()
        .filter(|l| !l.trim().is_empty())
        .enumerate()
        .map(|(n, line)| {
            let (at, offset) = line
                .split_once([',', ';'])
                .ok_or_else(|| format!("line {}: write \"distance, offset\"", n + 1))?;
            let at = parse_typed_length(at, units)
                .map_err(|e| format!("line {}: distance: {e}", n + 1))?;
            let offset = parse_typed_length(offset, units)
                .map_err(|e| format!("line {}: offset: {e}", n + 1))?;
            let mut row = Map::new();
            row.insert("at".into(), Value::from(at.in_inches()));
            row.insert("offset".into(), Value::from(offset.in_inches()));
            Ok(Value::Object(row))
        })
        .collect()
}

#[cfg(test)]
mod tests {
    use super::*;

    fn form(kind: &str, pairs: &[(&str, &str)]) -> ObservationForm {
        let mut f = ObservationForm::new(kind);
        for (k, v) in pairs {
            f.values.insert(k.to_string(), v.to_string());
        }
        f
    }

    #[test]
    fn a_notch_as_typed() {
        let f = form(
            "notch",
            &[
                ("edge", "bottom"),
                ("depth", "2"),
                ("length", "3-1/2"),
                ("from_support", "3'"),
            ],
        );
        let o = f
            .to_observation("n1".into(), UnitSystem::Imperial, None)
            .unwrap();
        let ObservationKind::Notch {
            depth,
            length,
            from_support,
            at_end,
            ..
        } = o.kind
        else {
            panic!("{o:?}")
        };
        assert_eq!(
            (depth, length, from_support, at_end),
            (
                Length::inches(2.0),
                Length::inches(3.5),
                Some(Length::inches(36.0)),
                false
            )
        );
        let back = ObservationForm::from_observation(
            &Observation {
                id: "n1".into(),
                kind: o.kind.clone(),
                note: String::new(),
            },
            UnitSystem::Imperial,
        );
        assert_eq!(back.value("from_support"), "3' 0\"");
        assert_eq!(
            back.to_observation("n1".into(), UnitSystem::Imperial, None)
                .unwrap()
                .kind,
            o.kind
        );
    }

    #[test]
    fn every_kind_round_trips_through_its_form() {
        let demo = crate::interchange::demo();
        let observations = demo.observations().map(|(_, o)| o);
        let mut kinds = std::collections::HashSet::new();
        for o in observations {
            let f = ObservationForm::from_observation(o, UnitSystem::Imperial);
            kinds.insert(f.kind.clone());
            assert_eq!(
                f.to_observation(o.id.clone(), UnitSystem::Imperial, None)
                    .as_ref(),
                Ok(o),
                "{}",
                f.kind
            );
        }
        assert_eq!(
            kinds.len(),
            KINDS.len(),
            "the demo has every kind: {kinds:?}"
        );
    }

    // A notch typed 25' 0" out on a 15 ft joist, and a notch "at the end" entered 4 ft out,
    // are refused under the distance field (the same rule as inspection files).
    #[test]
    fn positions_are_held_to_the_span() {
        let span = Some(Length::feet(15.0));
        let far = form(
            "notch",
            &[
                ("edge", "bottom"),
                ("depth", "1\""),
                ("length", "2\""),
                ("from_support", "25' 0\""),
            ],
        );
        let e = far
            .to_observation("n".into(), UnitSystem::Imperial, span)
            .unwrap_err();
        assert_eq!(e[0].field, "from_support");
        assert!(
            e[0].message.contains("beyond the clear span"),
            "{}",
            e[0].message
        );
        assert!(far
            .to_observation("n".into(), UnitSystem::Imperial, Some(Length::feet(30.0)))
            .is_ok());
        let contradiction = form(
            "notch",
            &[
                ("edge", "bottom"),
                ("depth", "1\""),
                ("length", "2\""),
                ("at_end", "true"),
                ("from_support", "4'"),
            ],
        );
        let e = contradiction
            .to_observation("n".into(), UnitSystem::Imperial, span)
            .unwrap_err();
        assert!(e[0].message.contains("at the end"), "{}", e[0].message);
        let hole = form(
            "hole",
            &[
                ("diameter", "1\""),
                ("from_support", "16'"),
                ("center_above_bottom", "4\""),
            ],
        );
        assert!(hole
            .to_observation("h".into(), UnitSystem::Imperial, span)
            .is_err());
        let sag = form("sag", &[("readings", "7' 6\", 1/2\"\n17', 0")]);
        assert_eq!(
            sag.to_observation("s".into(), UnitSystem::Imperial, span)
                .unwrap_err()[0]
                .field,
            "readings"
        );
    }

    #[test]
    fn problems_name_their_fields() {
        let f = form("notch", &[("edge", "sideways"), ("depth", "13''7")]);
        let errors = f
            .to_observation("n".into(), UnitSystem::Imperial, None)
            .unwrap_err();
        let fields: Vec<_> = errors.iter().map(|e| e.field).collect();
        assert_eq!(fields, ["edge", "depth", "length", "from_support"]);
        let sag = form("sag", &[("readings", "7' 7\", 5/8\"\nnonsense")]);
        let errors = sag
            .to_observation("s".into(), UnitSystem::Imperial, None)
            .unwrap_err();
        assert!(errors[0].message.starts_with("line 2"), "{errors:?}");
        let wet = form("moisture", &[("percent", "250")]);
        assert_eq!(
            wet.to_observation("m".into(), UnitSystem::Imperial, None)
                .unwrap_err()[0]
                .field,
            "percent"
        );
    }
}
