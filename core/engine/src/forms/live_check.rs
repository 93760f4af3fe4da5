//! The live check card of a run being typed: the allowable span, the use of it and what
//! governs, recomputed on every keystroke from what parses so far.

use super::{FieldError, FramingForm};
use crate::finding::Status;
use crate::lumber::{LoadDuration, Section};
use crate::mechanics::{allowable_span, Governing, SpanInput};
use crate::model::ResolvedLoads;
use crate::units::{format_length, UnitSystem};
use serde::Serialize;

/// What the card shows.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct LiveCheck {
    pub status: Status,
    /// "14' 1"" (as the printed tables hold it).
    pub allowable: Option<String>,
    /// "108 % of the allowable span".
    pub use_text: Option<String>,
    pub governing: Option<Governing>,
    /// One line: the verdict, or what is still missing.
    pub message: String,
    pub errors: Vec<FieldError>,
}

/// Checks the span of what has been typed, under the area's loads.
pub fn live_check(form: &FramingForm, loads: &ResolvedLoads, units: UnitSystem) -> LiveCheck {
    let (framing, errors) = form.to_framing(units);
    let mut card = LiveCheck {
        status: Status::NotChecked,
        allowable: None,
        use_text: None,
        governing: None,
        message: String::new(),
        errors,
    };
    if framing.kind.is_some_and(|k| k.is_engineered()) {
        card.message = "Engineered member: compare the span with the maker's span table.".into();
        return card;
    }
    let section = match (framing.size, framing.actual) {
        (nominal, Some(a)) => Section::from_dimensions(a.thickness, a.depth, nominal).ok(),
        (Some(n), None) => Some(n.dressed_section()),
        (None, None) => None,
    };
    let mut missing = Vec::new();
    if framing.species.is_none() {
        missing.push("species");
    }
    if framing.grade.is_none() {
        missing.push("grade");
    }
    if section.is_none() {
        missing.push("size");
    }
    if framing.spacing.is_none() {
        missing.push("spacing");
    }
    let (Some(species), Some(grade), Some(section), Some(spacing)) =
        (framing.species, framing.grade, section, framing.spacing)
    else {
        card.message = format!("Enter {} to see the allowable span.", missing.join(", "));
        return card;
    };
    let Some(result) = allowable_span(&SpanInput {
        species,
        grade: grade.grade_for_design(),
        section,
        spacing,
        live: loads.live,
        dead: loads.dead,
        deflection_denominator: loads.deflection_denominator,
        wet_service: false,
        incised: false,
        duration: LoadDuration::TenYears,
        repetitive: true,
    }) else {
        card.message = "No design values for this species, grade and size.".into();
        return card;
    };
    let allowable = result.allowable_rounded();
    card.allowable = Some(format_length(allowable, units));
    card.governing = Some(result.governing);
    match framing.clear_span {
        Some(span) => {
            let ratio = span / allowable;
            card.status = Status::of_ratio(ratio);
            card.use_text = Some(format!("{:.0} % of the allowable span", ratio * 100.0));
            let verdict = match card.status {
                Status::OverLimit => "over the allowable span",
                Status::NearLimit => "near the allowable span",
                _ => "within the allowable span",
            };
            card.message = format!(
                "Clear span {} is {verdict} of {} ({} governs)",
                format_length(span, units),
                format_length(allowable, units),
                result.governing.name()
            );
        }
        None => {
            card.message = format!(
                "Allowable span {} ({} governs); enter the clear span to compare.",
                format_length(allowable, units),
                result.governing.name()
            )
        }
    }
    card
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::model::{LoadSettings, RoomUse};

    fn living() -> ResolvedLoads {
        LoadSettings {
            room_use_above: Some(RoomUse::Living),
            ..Default::default()
        }
        .resolve(&LoadSettings::default())
    }

    // Source: IRC 2015 Table R502.3.1(2), SPF No. 2 2x10 at 16 in, 40/10 psf: 15-5. A 16 ft 0 in
    // clear span is 192 / 185 = 104 % of it, bending governing.
    #[test]
    fn sixteen_feet_of_spf_2x10_is_over() {
        let form = FramingForm {
            species: "spf".into(),
            grade: "no2".into(),
            size: "2x10".into(),
            spacing: "16".into(),
            clear_span: "16-0".into(),
            ..Default::default()
        };
        let card = live_check(&form, &living(), UnitSystem::Imperial);
        assert_eq!(card.status, Status::OverLimit);
        assert_eq!(card.allowable.as_deref(), Some("15' 5\""));
        assert_eq!(
            card.use_text.as_deref(),
            Some("104 % of the allowable span")
        );
        assert_eq!(card.governing, Some(Governing::Bending));
    }

    #[test]
    fn partial_input_says_what_is_missing() {
        let form = FramingForm {
            species: "spf".into(),
            size: "2x1".into(),
            ..Default::default()
        };
        let card = live_check(&form, &living(), UnitSystem::Imperial);
        assert_eq!(card.status, Status::NotChecked);
        assert_eq!(
            card.message,
            "Enter grade, size, spacing to see the allowable span."
        );
        assert_eq!(card.errors[0].field, "size");
        let no_span = FramingForm {
            species: "spf".into(),
            grade: "2".into(),
            size: "2x10".into(),
            spacing: "16".into(),
            ..Default::default()
        };
        assert!(live_check(&no_span, &living(), UnitSystem::Imperial)
            .message
            .starts_with("Allowable span 15' 5\""));
    }
}
