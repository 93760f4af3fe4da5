//! The pick lists of the framing form, as (value, label): the trade's choices, so nothing a
//! tap can pick needs typing. Every value reads back through `FramingForm::to_framing`.

/// What the member is.
pub const MEMBER_KINDS: &[(&str, &str)] = &[
    ("sawn", "Sawn lumber"),
    ("i-joist", "I-joist"),
    ("composite-lumber", "Structural composite lumber (LVL, LSL)"),
    ("floor-truss", "Floor truss"),
    ("glulam", "Glued-laminated timber"),
];

/// Species combinations with published design values.
pub const SPECIES: &[(&str, &str)] = &[
    ("spruce-pine-fir", "Spruce-pine-fir"),
    ("douglas-fir-larch", "Douglas fir-larch"),
    ("hem-fir", "Hem-fir"),
    ("southern-pine", "Southern pine"),
];

/// Grades as stamped, and the choice for lumber with no stamp in sight.
pub const GRADES: &[(&str, &str)] = &[
    ("select-structural", "Select Structural"),
    ("no1", "No. 1"),
    ("no2", "No. 2"),
    ("no3", "No. 3"),
    ("none", "No stamp visible"),
];

/// Nominal sizes of dimension lumber used as floor joists.
pub const SIZES: &[(&str, &str)] = &[
    ("2x4", "2x4"),
    ("2x6", "2x6"),
    ("2x8", "2x8"),
    ("2x10", "2x10"),
    ("2x12", "2x12"),
    ("2x14", "2x14"),
];

/// What holds the joist ends upright (R502.7).
pub const END_RESTRAINTS: &[(&str, &str)] = &[
    ("rim-joist", "Rim or band joist"),
    ("solid-blocking", "Full-depth solid blocking"),
    ("header", "Full-depth header"),
    ("stud", "Adjoining stud"),
    ("none", "None seen"),
];

/// Mid-span bracing (R502.7.1).
pub const BRIDGING: &[(&str, &str)] = &[
    ("none", "None"),
    ("solid-blocking", "Solid blocking"),
    ("diagonal", "Diagonal bridging"),
    ("strap", "1x3 strip across the bottom edges"),
];

/// The room above a run or member, where it differs from its area's (Table R301.5).
pub const ROOM_USES: &[(&str, &str)] = &[
    ("sleeping", "Sleeping rooms (30 psf)"),
    ("living", "Other rooms (40 psf)"),
];

/// The finishes above, where they differ from the area's (10 or 20 psf dead load).
pub const FINISHES: &[(&str, &str)] = &[
    ("light", "Light finishes (10 psf)"),
    ("heavy", "Tile, stone or mortar bed (20 psf)"),
];

#[cfg(test)]
mod tests {
    use super::*;
    use crate::forms::{FramingForm, SUPPORTS};
    use crate::units::UnitSystem;

    #[test]
    fn every_pick_reads_back_without_an_error() {
        let lists: [(&str, &[(&str, &str)]); 9] = [
            ("kind", MEMBER_KINDS),
            ("species", SPECIES),
            ("grade", GRADES),
            ("size", SIZES),
            ("end_restraint", END_RESTRAINTS),
            ("bridging", BRIDGING),
            ("bearing_on", SUPPORTS),
            ("room_use_above", ROOM_USES),
            ("finishes", FINISHES),
        ];
        for (field, picks) in lists {
            for (value, _) in picks {
                let mut form = FramingForm::default();
                form.set(field, value.to_string());
                let (framing, errors) = form.to_framing(UnitSystem::Imperial);
                assert!(errors.is_empty(), "{field} = {value}: {errors:?}");
                assert_ne!(
                    framing,
                    Default::default(),
                    "{field} = {value} was not kept"
                );
            }
        }
    }

    #[test]
    fn an_interval_without_its_kind_of_bridging_is_an_error_not_a_silent_loss() {
        let mut form = FramingForm::default();
        form.set("bridging_interval", "4' 0\"".into());
        let (_, errors) = form.to_framing(UnitSystem::Imperial);
        assert_eq!(errors.len(), 1);
        assert_eq!(errors[0].field, "bridging");
    }
}
