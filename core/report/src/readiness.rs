//! What to look at before a report is handed over: the inspector's name and licence for the
//! statement, findings that need action but have no photo, entries the engine could not use,
//! and photos whose image is not on this device.

use std::collections::HashSet;
use undercroft_engine::engine::Evaluation;
use undercroft_engine::finding::Status;
use undercroft_engine::model::Inspection;
use undercroft_engine::words::count;

/// Each thing to look at, in words; empty when the report is ready to hand over.
/// `with_images` holds the ids of the photos whose report image is on this device.
pub fn before_handover(
    inspection: &Inspection,
    evaluation: &Evaluation,
    with_images: &HashSet<String>,
) -> Vec<String> {
    let mut out = Vec::new();
    if inspection.inspector.name.trim().is_empty() {
        out.push("No inspector's name: the statement will show a blank line to fill in.".into());
    }
    if inspection.inspector.license.trim().is_empty() {
        out.push("No licence number: the statement will show a blank line to fill in.".into());
    }
    let owners: HashSet<&str> = inspection
        .photos
        .iter()
        .map(|p| p.attached_to.as_str())
        .collect();
    let unphotographed = evaluation
        .findings
        .iter()
        .filter(|f| matches!(f.status, Status::OverLimit | Status::ToEvaluate))
        .filter(|f| {
            !f.observation_id
                .as_deref()
                .is_some_and(|o| owners.contains(o))
                && !owners.contains(&*f.place.member_id)
        })
        .count();
    if unphotographed > 0 {
        out.push(format!(
            "{} over a limit or seen to evaluate {} no photo.",
            count(unphotographed, "finding", "findings"),
            if unphotographed == 1 { "has" } else { "have" }
        ));
    }
    if !evaluation.problems.is_empty() {
        out.push(format!(
            "{} could not be used: correct {} or the report lists {}.",
            count(evaluation.problems.len(), "entry", "entries"),
            if evaluation.problems.len() == 1 {
                "it"
            } else {
                "them"
            },
            if evaluation.problems.len() == 1 {
                "it"
            } else {
                "them"
            },
        ));
    }
    let missing = inspection
        .photos
        .iter()
        .filter(|p| !with_images.contains(&p.id))
        .count();
    if missing > 0 {
        out.push(format!(
            "{} not on this device: the report shows a blank in {} place.",
            count(missing, "photo is", "photos are"),
            if missing == 1 { "its" } else { "their" }
        ));
    }
    out
}

#[cfg(test)]
mod tests {
    use super::*;

    fn demo() -> Inspection {
        undercroft_engine::interchange::demo()
    }

    #[test]
    fn the_demo_with_its_photos_lacks_only_photos_of_some_findings() {
        let i = demo();
        let e = undercroft_engine::evaluate(&i);
        let all: HashSet<String> = i.photos.iter().map(|p| p.id.clone()).collect();
        let said = before_handover(&i, &e, &all);
        assert_eq!(said.len(), 1, "{said:?}");
        assert!(said[0].contains("have no photo"), "{said:?}");
    }

    #[test]
    fn a_missing_licence_a_bad_entry_and_a_missing_image_are_said() {
        let mut i = demo();
        i.inspector.license.clear();
        i.areas[0].runs[0].framing.spacing = Some(undercroft_engine::units::Length::inches(96.0));
        let e = undercroft_engine::evaluate(&i);
        let said = before_handover(&i, &e, &HashSet::new());
        let text = said.join("\n");
        assert!(text.contains("No licence number"), "{text}");
        // The run and each of its joists that inherit the spacing.
        assert!(text.contains("3 entries could not be used"), "{text}");
        assert!(text.contains("7 photos are not on this device"), "{text}");
    }
}
