//! Where a finding leads when tapped: the observation it was made from, or else the joist,
//! run, member, girder, post or area it is about.

use crate::Route;
use undercroft_engine::forms::ObservationForm;
use undercroft_engine::model::{Inspection, Observation};
use undercroft_engine::Finding;

/// The screen to fix or look at what a finding is about.
pub fn route_of(inspection: &Inspection, f: &Finding) -> Option<Route> {
    if let Some(id) = f.observation_id.as_deref() {
        if let Some((owner, o)) = observation(inspection, id) {
            return Some(Route::ObservationView {
                owner: owner.to_string(),
                kind: ObservationForm::from_observation(o, inspection.units).kind,
                id: id.to_string(),
            });
        }
    }
    let id = &*f.place.member_id;
    for area in &inspection.areas {
        if area.id == id {
            return Some(Route::AreaView { id: id.into() });
        }
        for run in &area.runs {
            if run.id == id {
                return Some(Route::RunView { id: id.into() });
            }
            if run.joists.iter().any(|j| j.id == id) {
                return Some(Route::MemberView { id: id.into() });
            }
        }
        if area.members.iter().any(|m| m.id == id) {
            return Some(Route::MemberView { id: id.into() });
        }
        for girder in &area.girders {
            if girder.id == id {
                return Some(Route::GirderScreen { id: id.into() });
            }
            if girder.posts.iter().any(|p| p.id == id) {
                return Some(Route::PostScreen { id: id.into() });
            }
        }
    }
    None
}

/// An observation by id, with the id of the run, joist or member it is on.
fn observation<'i>(inspection: &'i Inspection, id: &str) -> Option<(&'i str, &'i Observation)> {
    let on = |owner: &'i str, list: &'i [Observation]| {
        list.iter().find(|o| &*o.id == id).map(|o| (owner, o))
    };
    inspection.areas.iter().find_map(|area| {
        area.runs
            .iter()
            .find_map(|run| {
                on(&run.id, &run.observations)
                    .or_else(|| run.joists.iter().find_map(|j| on(&j.id, &j.observations)))
            })
            .or_else(|| area.members.iter().find_map(|m| on(&m.id, &m.observations)))
    })
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn every_demo_finding_leads_somewhere() {
        let i: Inspection = undercroft_engine::interchange::from_json(include_str!(
            "../../../demo-data/demo-inspection.json"
        ))
        .unwrap();
        let e = undercroft_engine::evaluate(&i);
        for f in &e.findings {
            assert!(
                route_of(&i, f).is_some(),
                "{} at {}",
                f.rule_id(),
                f.place.location
            );
        }
        let notch = e
            .findings
            .iter()
            .find(|f| f.observation_id.as_deref() == Some("obs-k7-notch"))
            .unwrap();
        assert_eq!(
            route_of(&i, notch),
            Some(Route::ObservationView {
                owner: "joist-k7".into(),
                kind: "notch".into(),
                id: "obs-k7-notch".into()
            })
        );
        let post = e
            .findings
            .iter()
            .find(|f| &*f.place.member_id == "post-1")
            .unwrap();
        assert_eq!(
            route_of(&i, post),
            Some(Route::PostScreen {
                id: "post-1".into()
            })
        );
    }
}
