//! The fields of a girder line, a post and an area's conditions as typed: the text each shows,
//! and one field changed at a time with its own error, so a screen can save on every change.

use super::FieldError;
use crate::model::{GirderLine, Post, SiteConditions};
use crate::units::{format_dimension, format_length, parse_typed_length, Length, UnitSystem};
use serde::de::DeserializeOwned;
use serde::Serialize;
use serde_json::{Map, Value};

/// How a load-path field is entered.
#[derive(Debug, Clone, Copy, PartialEq)]
pub enum PathFieldType {
    Text,
    /// Text that must not be left empty (an address, an area's name).
    Required,
    /// A visit date, `YYYY-MM-DD`.
    Date,
    /// A short length: inches when no unit is typed (mm in metric).
    Short,
    /// A position or length along a girder (feet with their mark; see `units::typed`).
    Long,
    /// A plain number within bounds, with its unit for the label.
    Number {
        min: f64,
        max: f64,
    },
    /// A whole number within bounds.
    Count {
        min: u32,
        max: u32,
    },
    Choice(&'static [(&'static str, &'static str)]),
    /// Yes, no, or not recorded.
    YesNo,
    /// Any of the picks, as a list.
    Many(&'static [(&'static str, &'static str)]),
    /// Positions along the girder, separated by commas or lines.
    Lengths,
}

/// One field: its name (dotted for a nested value, `end_a.on`), label and type.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct PathField {
    pub name: &'static str,
    pub label: &'static str,
    pub kind: PathFieldType,
    /// What the empty choice of a pick reads: "Not recorded" unless given.
    pub empty: &'static str,
}

pub(super) const fn f(name: &'static str, label: &'static str, kind: PathFieldType) -> PathField {
    PathField {
        name,
        label,
        kind,
        empty: "Not recorded",
    }
}

impl PathField {
    /// The same field with another text for its empty choice.
    pub(super) const fn empty_reads(self, empty: &'static str) -> PathField {
        PathField { empty, ..self }
    }
}

pub const GIRDER_KINDS: &[(&str, &str)] = &[
    ("built-up", "Built-up plies of 2x lumber"),
    ("solid-sawn", "Solid sawn timber"),
    ("engineered", "Glulam, LVL or PSL"),
    ("steel", "Steel"),
];
pub const FASTENINGS: &[(&str, &str)] = &[
    ("nailed", "Nailed"),
    ("bolted", "Bolted"),
    ("none-seen", "No fastening seen"),
];
pub const GIRDER_SIZES: &[(&str, &str)] = &[
    ("2x6", "2x6"),
    ("2x8", "2x8"),
    ("2x10", "2x10"),
    ("2x12", "2x12"),
    ("4x6", "4x6"),
    ("4x8", "4x8"),
    ("4x10", "4x10"),
    ("4x12", "4x12"),
    ("6x8", "6x8"),
    ("6x10", "6x10"),
    ("6x12", "6x12"),
];
pub const POST_SIZES: &[(&str, &str)] = &[
    ("2x4", "2x4"),
    ("2x6", "2x6"),
    ("4x4", "4x4"),
    ("4x6", "4x6"),
    ("6x6", "6x6"),
];
pub const POST_MATERIALS: &[(&str, &str)] = &[
    ("wood", "Wood post"),
    ("steel", "Steel column"),
    ("masonry", "Masonry or concrete pier up to the girder"),
];
pub const POST_HOLDS: &[(&str, &str)] = &[
    ("connector", "Metal connector"),
    ("pinned", "Pinned or bolted"),
    ("nailed", "Toenails or cleats"),
    ("none-seen", "Nothing seen"),
];
pub const POST_BASES: &[(&str, &str)] = &[
    ("concrete-pier", "Poured concrete pier"),
    ("masonry-pier", "Masonry pier"),
    ("stacked-block", "Stacked blocks, no mortar"),
    ("wood-block", "Wood block"),
    ("slab", "Concrete floor slab"),
    ("soil", "Bare soil"),
];
pub const POST_CONDITIONS: &[(&str, &str)] = &[
    ("shimmed", "Shimmed"),
    ("stacked-blocks", "Height made up with blocks"),
    ("cracked", "Cracked"),
    ("leaning", "Leaning"),
    ("decay", "Decay or insect damage"),
    ("settled", "Pier or footing settled"),
];
pub const VAPOR_RETARDERS: &[(&str, &str)] = &[
    ("full", "Covers the ground"),
    ("partial", "Torn, displaced or partial"),
    ("none", "None"),
];
pub const VENTILATIONS: &[(&str, &str)] = &[
    ("vented", "Vents open"),
    ("vents-blocked", "Vents closed or blocked"),
    ("unvented", "Unvented, conditioned"),
    ("none-seen", "No vents, no conditioning"),
];
pub const SOILS: &[(&str, &str)] = &[
    ("crystalline-bedrock", "Crystalline bedrock (12,000 psf)"),
    ("sedimentary-rock", "Sedimentary rock (4,000 psf)"),
    ("sandy-gravel", "Sandy gravel, gravel (3,000 psf)"),
    ("sand", "Sand, silty or clayey sand or gravel (2,000 psf)"),
    ("clay-silt", "Clay, silt (1,500 psf)"),
];

use super::picks::{GRADES, SPECIES};
use super::SUPPORTS;

/// The fields of a girder line, in screen order.
pub const GIRDER_FIELDS: &[PathField] = &[
    f("label", "Label", PathFieldType::Text),
    f("kind", "Girder", PathFieldType::Choice(GIRDER_KINDS)),
    f("species", "Species", PathFieldType::Choice(SPECIES)),
    f(
        "grade",
        "Grade (from the stamp)",
        PathFieldType::Choice(GRADES),
    ),
    f(
        "size",
        "Size of one ply, or of the timber",
        PathFieldType::Choice(GIRDER_SIZES),
    ),
    f(
        "plies",
        "Plies side by side",
        PathFieldType::Count { min: 1, max: 4 },
    ),
    f(
        "fastening",
        "Plies held by",
        PathFieldType::Choice(FASTENINGS),
    ),
    f(
        "product",
        "Steel shape or engineered product as marked",
        PathFieldType::Text,
    ),
    f(
        "length",
        "Length, end A to end B (22' 0\" or 22)",
        PathFieldType::Long,
    ),
    f(
        "end_a.on",
        "End A bears on",
        PathFieldType::Choice(SUPPORTS),
    ),
    f("end_a.length", "End A bearing length", PathFieldType::Short),
    f(
        "end_b.on",
        "End B bears on",
        PathFieldType::Choice(SUPPORTS),
    ),
    f("end_b.length", "End B bearing length", PathFieldType::Short),
    f(
        "pocket_air_space",
        "Air space around an end in a pocket",
        PathFieldType::Short,
    ),
    f(
        "splices",
        "Ply joints, distance from end A (6' 1\", 16')",
        PathFieldType::Lengths,
    ),
    f(
        "wall_above_plf",
        "Wall above, lb per foot",
        PathFieldType::Number {
            min: 0.0,
            max: 5000.0,
        },
    ),
    f(
        "ground_clearance",
        "Clearance to exposed ground",
        PathFieldType::Short,
    ),
    f(
        "treated",
        "Treated or naturally durable wood",
        PathFieldType::YesNo,
    ),
    f(
        "moisture_percent",
        "Moisture reading, %",
        PathFieldType::Number {
            min: 0.0,
            max: 100.0,
        },
    ),
    f("notes", "Notes", PathFieldType::Text),
];

/// The fields of a post, in screen order.
pub const POST_FIELDS: &[PathField] = &[
    f("label", "Label", PathFieldType::Text),
    f(
        "at",
        "Distance from end A to its centre",
        PathFieldType::Long,
    ),
    f("material", "Post", PathFieldType::Choice(POST_MATERIALS)),
    f("species", "Species", PathFieldType::Choice(SPECIES)),
    f(
        "grade",
        "Grade (from the stamp)",
        PathFieldType::Choice(GRADES),
    ),
    f("size", "Size", PathFieldType::Choice(POST_SIZES)),
    f(
        "diameter",
        "Steel column outside diameter",
        PathFieldType::Short,
    ),
    f("height", "Height, pier top to girder", PathFieldType::Long),
    f(
        "bearing",
        "Girder length resting on the post (cap plate)",
        PathFieldType::Short,
    ),
    f(
        "top",
        "Held at the top by",
        PathFieldType::Choice(POST_HOLDS),
    ),
    f(
        "bottom",
        "Held at the base by",
        PathFieldType::Choice(POST_HOLDS),
    ),
    f("stands_on", "Stands on", PathFieldType::Choice(POST_BASES)),
    f(
        "base_height",
        "Pier top above the ground or floor",
        PathFieldType::Short,
    ),
    f(
        "treated",
        "Treated or naturally durable wood",
        PathFieldType::YesNo,
    ),
    f(
        "footing.visible",
        "Footing can be seen",
        PathFieldType::YesNo,
    ),
    f("footing.width", "Footing width", PathFieldType::Short),
    f("footing.length", "Footing length", PathFieldType::Short),
    f(
        "footing.thickness",
        "Footing thickness",
        PathFieldType::Short,
    ),
    f(
        "conditions",
        "Seen on the post",
        PathFieldType::Many(POST_CONDITIONS),
    ),
    f("notes", "Notes", PathFieldType::Text),
];

/// The conditions of an area's under-floor space.
pub const SITE_FIELDS: &[PathField] = &[
    f("standing_water", "Standing water", PathFieldType::YesNo),
    f(
        "vapor_retarder",
        "Ground cover (vapour retarder)",
        PathFieldType::Choice(VAPOR_RETARDERS),
    ),
    f(
        "ventilation",
        "Ventilation",
        PathFieldType::Choice(VENTILATIONS),
    ),
    f(
        "fungal_growth",
        "Fungal growth on the framing",
        PathFieldType::YesNo,
    ),
    f(
        "soil",
        "Soil, where a report or the building office says",
        PathFieldType::Choice(SOILS),
    ),
];

fn value_at<'v>(root: &'v Value, name: &str) -> Option<&'v Value> {
    name.split('.').try_fold(root, |v, key| v.get(key))
}

/// The text a field shows for this girder, post or conditions.
pub fn field_text<T: Serialize>(item: &T, field: &PathField, units: UnitSystem) -> String {
    let root = serde_json::to_value(item).unwrap_or(Value::Null);
    let Some(v) = value_at(&root, field.name) else {
        return String::new();
    };
    let length = |v: &Value| Length::inches(v.as_f64().unwrap_or(0.0));
    match (field.kind, v) {
        (PathFieldType::Short, Value::Number(_)) => format_dimension(length(v), units),
        (PathFieldType::Long, Value::Number(_)) => format_length(length(v), units),
        (PathFieldType::Lengths, Value::Array(items)) => items
            .iter()
            .map(|i| format_length(length(i), units))
            .collect::<Vec<_>>()
            .join(", "),
        (PathFieldType::Many(_), Value::Array(items)) => items
            .iter()
            .filter_map(Value::as_str)
            .collect::<Vec<_>>()
            .join(","),
        (PathFieldType::YesNo, Value::Bool(b)) => if *b { "yes" } else { "no" }.into(),
        (_, Value::String(s)) => s.clone(),
        (_, Value::Number(n)) => match n.as_f64() {
            Some(x) if x.fract() == 0.0 && x.abs() < 1e15 => format!("{}", x as i64),
            _ => n.to_string(),
        },
        _ => String::new(),
    }
}

/// `item` with one field set from its typed text (empty clears it), or that field's error in
/// words. Nothing else changes.
pub fn with_field<T: Serialize + DeserializeOwned>(
    item: &T,
    fields: &'static [PathField],
    name: &str,
    text: &str,
    units: UnitSystem,
) -> Result<T, FieldError> {
    let Some(field) = fields.iter().find(|f| f.name == name) else {
        return Err(FieldError {
            field: "save",
            message: format!("no field \"{name}\" here"),
        });
    };
    let error = |message: String| FieldError {
        field: field.name,
        message,
    };
    let text = text.trim();
    let length = |t: &str, _long: bool| {
        parse_typed_length(t, units)
            .map(|l| Value::from(l.in_inches()))
            .map_err(|e| error(e.to_string()))
    };
    let value: Option<Value> = if text.is_empty() {
        match field.kind {
            PathFieldType::Text => Some(Value::String(String::new())),
            PathFieldType::Required => {
                return Err(error(format!("{} cannot be left empty", field.label)))
            }
            PathFieldType::Date => {
                return Err(error("the date of the visit cannot be left empty".into()))
            }
            PathFieldType::Lengths | PathFieldType::Many(_) => Some(Value::Array(vec![])),
            _ => None,
        }
    } else {
        Some(match field.kind {
            PathFieldType::Text | PathFieldType::Required => Value::String(text.to_string()),
            PathFieldType::Date => {
                crate::model::check_date(text).map_err(error)?;
                Value::String(text.to_string())
            }
            PathFieldType::Short => length(text, false)?,
            PathFieldType::Long => length(text, true)?,
            PathFieldType::Lengths => Value::Array(
                text.split([',', '\n', ';'])
                    .map(str::trim)
                    .filter(|t| !t.is_empty())
                    .map(|t| length(t, true))
                    .collect::<Result<_, _>>()?,
            ),
            PathFieldType::Number { min, max } => text
                .parse::<f64>()
                .ok()
                .filter(|n| n.is_finite() && (min..=max).contains(n))
                .map(Value::from)
                .ok_or_else(|| error(format!("a number from {min} to {max}")))?,
            PathFieldType::Count { min, max } => text
                .parse::<u32>()
                .ok()
                .filter(|n| (min..=max).contains(n))
                .map(Value::from)
                .ok_or_else(|| error(format!("a whole number from {min} to {max}")))?,
            PathFieldType::YesNo => match text {
                "yes" | "true" => Value::Bool(true),
                "no" | "false" => Value::Bool(false),
                _ => return Err(error("yes or no".into())),
            },
            PathFieldType::Choice(picks) => picks
                .iter()
                .find(|(v, _)| *v == text)
                .map(|(v, _)| Value::from(*v))
                .ok_or_else(|| {
                    error(format!(
                        "pick one of {}",
                        picks.iter().map(|p| p.1).collect::<Vec<_>>().join(", ")
                    ))
                })?,
            PathFieldType::Many(picks) => Value::Array(
                text.split(',')
                    .map(str::trim)
                    .filter(|t| !t.is_empty())
                    .map(|t| {
                        picks
                            .iter()
                            .find(|(v, _)| *v == t)
                            .map(|(v, _)| Value::from(*v))
                            .ok_or_else(|| error(format!("\"{t}\" is not one of the picks")))
                    })
                    .collect::<Result<_, _>>()?,
            ),
        })
    };
    let mut root = serde_json::to_value(item).map_err(|e| error(e.to_string()))?;
    set_at(&mut root, field.name, value);
    serde_json::from_value(root).map_err(|_| {
        error(match field.name.split_once('.') {
            Some((_, "length")) => "pick what the end bears on first".into(),
            _ => "this value cannot be kept".into(),
        })
    })
}

/// Sets (or, with None, removes) the value at a dotted name, making the parent object where
/// it does not exist yet. A bearing left empty by a removal is removed with it (a footing
/// keeps its defaults).
fn set_at(root: &mut Value, name: &str, value: Option<Value>) {
    let Some(map) = root.as_object_mut() else {
        return;
    };
    let Some((parent, key)) = name.split_once('.') else {
        match value {
            Some(v) => map.insert(name.to_string(), v),
            None => map.remove(name),
        };
        return;
    };
    let child = map
        .entry(parent.to_string())
        .or_insert_with(|| Value::Object(Map::new()));
    if !child.is_object() {
        *child = Value::Object(Map::new());
    }
    let inner = child.as_object_mut().expect("made an object above");
    match value {
        Some(v) => inner.insert(key.to_string(), v),
        None => inner.remove(key),
    };
    if inner.is_empty() && parent != "footing" {
        map.remove(parent);
    }
}

/// A post placed beyond its girder's length, or at end A, cannot be what was meant.
pub fn post_position_problem(line: &GirderLine, post: &Post) -> Option<String> {
    let at = post.at.in_inches();
    if at <= 0.0 {
        return Some(
            "a post stands between the ends: its distance from end A is more than 0".into(),
        );
    }
    let length = line.length?;
    (at >= length.in_inches()).then(|| {
        format!(
            "{} from end A is at or beyond the girder's length of {}; check the entry",
            format_length(post.at, UnitSystem::Imperial),
            format_length(length, UnitSystem::Imperial)
        )
    })
}

/// Convenience for the three kinds of item.
pub fn girder_with(
    line: &GirderLine,
    name: &str,
    text: &str,
    units: UnitSystem,
) -> Result<GirderLine, FieldError> {
    with_field(line, GIRDER_FIELDS, name, text, units)
}

pub fn post_with(
    line: &GirderLine,
    post: &Post,
    name: &str,
    text: &str,
    units: UnitSystem,
) -> Result<Post, FieldError> {
    let changed = with_field(post, POST_FIELDS, name, text, units)?;
    match post_position_problem(line, &changed) {
        Some(message) if name == "at" => Err(FieldError {
            field: "at",
            message,
        }),
        _ => Ok(changed),
    }
}

pub fn site_with(
    site: &SiteConditions,
    name: &str,
    text: &str,
    units: UnitSystem,
) -> Result<SiteConditions, FieldError> {
    with_field(site, SITE_FIELDS, name, text, units)
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::model::{BearingSupport, PostCondition};

    fn demo_line() -> GirderLine {
        let demo = crate::interchange::demo();
        demo.areas[0].girders[0].clone()
    }

    #[test]
    fn every_field_shows_and_reads_back_its_own_text() {
        let line = demo_line();
        let u = UnitSystem::Imperial;
        for field in GIRDER_FIELDS {
            let text = field_text(&line, field, u);
            let again = girder_with(&line, field.name, &text, u)
                .unwrap_or_else(|e| panic!("{}: {text:?}: {e:?}", field.name));
            assert_eq!(again, line, "{} = {text:?}", field.name);
        }
        for post in &line.posts {
            for field in POST_FIELDS {
                let text = field_text(post, field, u);
                let again = post_with(&line, post, field.name, &text, u)
                    .unwrap_or_else(|e| panic!("{}: {text:?}: {e:?}", field.name));
                assert_eq!(&again, post, "{} = {text:?}", field.name);
            }
        }
    }

    #[test]
    fn a_bare_number_is_inches_along_the_girder_and_across_it() {
        let line = demo_line();
        let u = UnitSystem::Imperial;
        let changed = girder_with(&line, "length", "288", u).unwrap();
        assert_eq!(changed.length, Some(Length::inches(288.0)));
        let changed = girder_with(&line, "length", "24'", u).unwrap();
        assert_eq!(changed.length, Some(Length::inches(288.0)));
        let changed = girder_with(&line, "end_a.length", "4", u).unwrap();
        assert_eq!(changed.end_a.unwrap().length, Some(Length::inches(4.0)));
        assert_eq!(changed.end_a.unwrap().on, BearingSupport::Concrete);
    }

    #[test]
    fn wrong_input_is_refused_in_words_and_changes_nothing() {
        let line = demo_line();
        let u = UnitSystem::Imperial;
        let e = girder_with(&line, "plies", "7", u).unwrap_err();
        assert_eq!(e.field, "plies");
        assert!(e.message.contains("1 to 4"), "{}", e.message);
        assert!(girder_with(&line, "length", "twelve", u).is_err());
        assert!(girder_with(&line, "wall_above_plf", "NaN", u).is_err());
        assert!(girder_with(&line, "kind", "timber", u).is_err());
        let post = &line.posts[0];
        let e = post_with(&line, post, "at", "30'", u).unwrap_err();
        assert!(e.message.contains("beyond the girder"), "{}", e.message);
        let shimmed = post_with(&line, post, "conditions", "shimmed,leaning", u).unwrap();
        assert_eq!(
            shimmed.conditions,
            [PostCondition::Shimmed, PostCondition::Leaning]
        );
        assert!(post_with(&line, post, "conditions", "wobbly", u).is_err());
        // Non-Latin text is kept as typed.
        let named = post_with(&line, post, "label", "支柱 2 — Stütze", u).unwrap();
        assert_eq!(named.label, "支柱 2 — Stütze");
    }

    #[test]
    fn a_cleared_field_is_not_recorded() {
        let line = demo_line();
        let u = UnitSystem::Imperial;
        let cleared = girder_with(&line, "treated", "", u).unwrap();
        assert_eq!(cleared.treated, None);
        let site = site_with(&SiteConditions::default(), "standing_water", "yes", u).unwrap();
        assert_eq!(site.standing_water, Some(true));
        assert_eq!(
            site_with(&site, "standing_water", "", u).unwrap(),
            SiteConditions::default()
        );
    }
}
