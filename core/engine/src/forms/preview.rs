//! The live verdict of an observation being typed, and the side view of its member: the
//! inspection with the observation put in place, run through the engine.

use crate::model::{Inspection, Observation};
use crate::views::SideView;
use crate::{evaluate, Evaluation, Finding};

/// Puts `observation` on the run or member `owner_id` (replacing one with the same id).
fn with_observation(
    inspection: &Inspection,
    owner_id: &str,
    observation: &Observation,
) -> Option<Inspection> {
    let mut copy = inspection.clone();
    let place = |list: &mut Vec<Observation>| match list.iter_mut().find(|o| o.id == observation.id)
    {
        Some(slot) => *slot = observation.clone(),
        None => list.push(observation.clone()),
    };
    for area in &mut copy.areas {
        for run in &mut area.runs {
            if run.id == owner_id {
                place(&mut run.observations);
                return Some(copy);
            }
            if let Some(j) = run.joists.iter_mut().find(|j| j.id == owner_id) {
                place(&mut j.observations);
                return Some(copy);
            }
        }
        if let Some(m) = area.members.iter_mut().find(|m| m.id == owner_id) {
            place(&mut m.observations);
            return Some(copy);
        }
    }
    None
}

/// The findings the observation would give on its member, as the engine sees it.
pub fn preview_observation(
    inspection: &Inspection,
    owner_id: &str,
    observation: &Observation,
) -> Vec<Finding> {
    let Some(copy) = with_observation(inspection, owner_id, observation) else {
        return vec![];
    };
    evaluate(&copy)
        .findings
        .into_iter()
        .filter(|f| f.observation_id.as_deref() == Some(&*observation.id))
        .collect()
}

/// The side view of a run (its typical joist), joist or member, when it has notches, holes or
/// sag readings and its span and depth are known.
pub fn side_view_of(inspection: &Inspection, member_id: &str) -> Option<SideView> {
    side_view_with(inspection, member_id, &evaluate(inspection))
}

/// `side_view_of` with the inspection's evaluation already at hand.
pub fn side_view_with(
    inspection: &Inspection,
    member_id: &str,
    evaluation: &Evaluation,
) -> Option<SideView> {
    let (contexts, _) = crate::validate::members(inspection);
    let ctx = contexts.iter().find(|c| c.member_id() == member_id)?;
    let area = inspection
        .areas
        .iter()
        .find(|a| *a.id == *ctx.place.area_id)?;
    crate::views::side_view(ctx, &area.name, evaluation)
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::forms::ObservationForm;
    use crate::units::UnitSystem;
    use crate::Status;

    // Source: IRC 2018 R502.8.1: a 2 in notch 3 ft from the support of a 2x10 (d/6 = 1.54 in)
    // is over the limit.
    #[test]
    fn a_typed_notch_is_judged_before_it_is_saved() {
        let demo = crate::interchange::demo();
        let mut form = ObservationForm::new("notch");
        for (k, v) in [
            ("edge", "bottom"),
            ("depth", "2"),
            ("length", "3"),
            ("from_support", "3"),
        ] {
            form.values.insert(k.into(), v.into());
        }
        let notch = form
            .to_observation("new-notch".into(), UnitSystem::Imperial, None)
            .unwrap();
        let findings = preview_observation(&demo, "run-dining", &notch);
        assert_eq!(findings.len(), 1);
        assert_eq!(findings[0].status, Status::OverLimit);
        assert_eq!(findings[0].citation(), "IRC 2018 R502.8.1");
        assert!(preview_observation(&demo, "nowhere", &notch).is_empty());
        let view = side_view_of(&demo, "joist-k7").expect("joist 7 has a notch and a hole");
        assert_eq!((view.notches.len(), view.holes.len()), (1, 1));
        assert!(
            side_view_of(&demo, "run-dining").is_none(),
            "nothing to draw"
        );
    }
}
