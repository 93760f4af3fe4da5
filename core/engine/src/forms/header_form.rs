//! The fields of an inspection's header and of an area, editable after creation: the same
//! one-field-at-a-time changes as the girder and post fields, so every screen saves alike.

use super::path_form::{f, with_field, PathField, PathFieldType};
use super::picks::ROOM_USES;
use super::FieldError;
use crate::model::{Area, Inspection};
use crate::units::UnitSystem;

/// The code editions the findings can cite. The 2018 section numbers are kept by 2021, and
/// the 2015 floor joist span tables are computed by the same method as 2018's.
pub const CODE_EDITIONS: &[(&str, &str)] = &[
    ("IRC 2015", "IRC 2015"),
    ("IRC 2018", "IRC 2018"),
    ("IRC 2021", "IRC 2021"),
];

pub const AREA_KINDS: &[(&str, &str)] = &[
    ("crawlspace", "Crawlspace"),
    ("basement", "Basement"),
    ("garage", "Garage"),
    ("porch", "Porch"),
    ("other", "Other"),
];

/// The load fields, shared by the inspection (defaults) and each area (overrides).
macro_rules! load_fields {
    ($empty:expr) => {
        [
            f(
                "loads.room_use_above",
                "Rooms above",
                PathFieldType::Choice(ROOM_USES),
            )
            .empty_reads($empty),
            f(
                "loads.heavy_finish",
                "Tile, stone or a mortar bed above (20 psf dead load)",
                PathFieldType::YesNo,
            )
            .empty_reads($empty),
            f(
                "loads.live_psf",
                "Live load, psf, where the room use does not give it",
                PathFieldType::Number {
                    min: 10.0,
                    max: 200.0,
                },
            ),
            f(
                "loads.dead_psf",
                "Dead load, psf, where the finishes do not give it",
                PathFieldType::Number {
                    min: 5.0,
                    max: 100.0,
                },
            ),
            f(
                "loads.deflection",
                "Deflection limit L/n under live load: n (360 unless set)",
                PathFieldType::Number {
                    min: 120.0,
                    max: 960.0,
                },
            ),
        ]
    };
}

const INSPECTION_LOADS: [PathField; 5] = load_fields!("Code default");
const AREA_LOADS: [PathField; 5] = load_fields!("As the inspection");

/// The inspection's header, in screen order.
pub const INSPECTION_FIELDS: &[PathField] = &[
    f("property.address", "Address", PathFieldType::Required),
    f(
        "property.year_built",
        "Year built",
        PathFieldType::Count {
            min: 1600,
            max: 2100,
        },
    ),
    f("client.name", "Client", PathFieldType::Text),
    f("client.phone", "Client's phone", PathFieldType::Text),
    f("client.email", "Client's email", PathFieldType::Text),
    f(
        "date",
        "Date of the visit (YYYY-MM-DD)",
        PathFieldType::Date,
    ),
    f(
        "conditions",
        "Weather and site conditions",
        PathFieldType::Text,
    ),
    f(
        "code_edition",
        "Code edition the findings cite",
        PathFieldType::Choice(CODE_EDITIONS),
    ),
    f(
        "local_amendments",
        "Local amendments you were told of",
        PathFieldType::Text,
    ),
    INSPECTION_LOADS[0],
    INSPECTION_LOADS[1],
    INSPECTION_LOADS[2],
    INSPECTION_LOADS[3],
    INSPECTION_LOADS[4],
];

/// An area's own fields (not its framing or conditions), in screen order.
pub const AREA_FIELDS: &[PathField] = &[
    f("name", "Name", PathFieldType::Required),
    f("kind", "Kind", PathFieldType::Choice(AREA_KINDS)),
    AREA_LOADS[0],
    AREA_LOADS[1],
    AREA_LOADS[2],
    AREA_LOADS[3],
    AREA_LOADS[4],
    f("notes", "Notes", PathFieldType::Text),
];

/// The inspection with one header field changed from its typed text, or that field's error.
pub fn inspection_with(
    inspection: &Inspection,
    name: &str,
    text: &str,
) -> Result<Inspection, FieldError> {
    let mut next = with_field(inspection, INSPECTION_FIELDS, name, text, inspection.units)?;
    // An empty pick of the edition is not offered; a typed one outside the list is refused
    // by the pick itself. Keep the areas as they were (the header save leaves them alone).
    next.areas.clone_from(&inspection.areas);
    Ok(next)
}

/// The area with one of its own fields changed, or that field's error.
pub fn area_with(
    area: &Area,
    name: &str,
    text: &str,
    units: UnitSystem,
) -> Result<Area, FieldError> {
    with_field(area, AREA_FIELDS, name, text, units)
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::forms::field_text;
    use crate::model::RoomUse;

    fn demo() -> Inspection {
        crate::interchange::demo()
    }

    #[test]
    fn every_header_field_reads_back_what_was_typed() {
        let i = demo();
        let cases = [
            ("property.address", "12 Rue des Érables, Québec"),
            ("property.year_built", "1962"),
            ("client.name", "山田 花子"),
            ("date", "2026-02-28"),
            ("code_edition", "IRC 2021"),
            ("local_amendments", "County requires L/480 under tile"),
            ("loads.room_use_above", "sleeping"),
            ("loads.heavy_finish", "yes"),
            ("loads.live_psf", "50"),
            ("loads.deflection", "480"),
        ];
        for (name, text) in cases {
            let next = inspection_with(&i, name, text).unwrap();
            let field = INSPECTION_FIELDS.iter().find(|f| f.name == name).unwrap();
            assert_eq!(field_text(&next, field, next.units), text, "{name}");
            assert_eq!(next.areas, i.areas, "{name} leaves the areas alone");
        }
    }

    #[test]
    fn the_header_refuses_in_words_and_changes_nothing() {
        let i = demo();
        for (name, text, says) in [
            ("property.address", "  ", "Address cannot be left empty"),
            ("date", "2026-02-30", "day"),
            ("date", "", "cannot be left empty"),
            ("property.year_built", "62", "whole number from 1600"),
            ("code_edition", "IRC 1997", "pick one of IRC 2015"),
            ("loads.live_psf", "4000", "a number from 10"),
        ] {
            let e = inspection_with(&i, name, text).unwrap_err();
            assert_eq!(e.field, name);
            assert!(e.message.contains(says), "{name} {text}: {}", e.message);
        }
    }

    #[test]
    fn an_area_takes_its_loads_and_clears_them_back_to_the_inspection() {
        let i = demo();
        let area = &i.areas[0];
        let tiled = area_with(area, "loads.heavy_finish", "yes", i.units).unwrap();
        assert_eq!(tiled.loads.heavy_finish, Some(true));
        let family = area_with(&tiled, "loads.room_use_above", "living", i.units).unwrap();
        assert_eq!(family.loads.room_use_above, Some(RoomUse::Living));
        let cleared = area_with(&family, "loads.heavy_finish", "", i.units).unwrap();
        assert_eq!(cleared.loads.heavy_finish, None);
        assert_eq!(cleared.runs, area.runs, "the framing is untouched");
        let renamed = area_with(area, "name", "Crawlspace under the kitchen", i.units).unwrap();
        assert_eq!(renamed.name, "Crawlspace under the kitchen");
        assert!(area_with(area, "name", "", i.units).is_err());
        assert!(area_with(area, "kind", "attic", i.units).is_err());
    }
}
