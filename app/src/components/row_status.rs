//! The worst status of what a list row stands for (an area, a run with its joists, a member,
//! a girder with its posts), in words beside the row, so the inspector sees where the
//! problems are without opening each.

use dioxus::prelude::*;
use undercroft_engine::{Evaluation, Status};

/// How much a status asks of the reader: the larger, the sooner it is looked at.
fn weight(status: Status) -> u8 {
    match status {
        Status::OverLimit => 5,
        Status::ToEvaluate => 4,
        Status::NearLimit => 3,
        Status::Incomplete | Status::NotChecked => 2,
        _ => 1,
    }
}

/// The worst status among the findings about any of `ids` (area, run, joist, member, girder
/// or post ids), or None when nothing was found about them.
pub fn worst_status(evaluation: &Evaluation, ids: &[&str]) -> Option<Status> {
    evaluation
        .findings
        .iter()
        .filter(|f| {
            ids.iter()
                .any(|id| *f.place.member_id == **id || *f.place.area_id == **id)
        })
        .map(|f| f.status)
        .max_by_key(|s| weight(*s))
}

#[component]
pub fn RowStatus(status: Option<Status>) -> Element {
    let (class, words) = match status {
        Some(Status::OverLimit) => ("over-limit", "Over a limit"),
        Some(Status::ToEvaluate) => ("to-evaluate", "Needs evaluation"),
        Some(Status::NearLimit) => ("near-limit", "Near a limit"),
        Some(Status::Incomplete | Status::NotChecked) => ("incomplete", "Not all checked"),
        Some(_) => ("within", "Within the limits checked"),
        None => ("none", "Nothing checked yet"),
    };
    rsx! { span { class: "row-status status-{class}", "{words}" } }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn a_row_takes_the_worst_status_of_what_it_stands_for() {
        let demo =
            undercroft_engine::interchange::from_json(crate::startup::DEMO_INSPECTION).unwrap();
        let evaluation = undercroft_engine::evaluate(&demo);
        // The kitchen run is over its allowable span (the demo's 15' 2" against 14' 1").
        assert_eq!(
            worst_status(&evaluation, &["run-kitchen"]),
            Some(Status::OverLimit)
        );
        assert_eq!(worst_status(&evaluation, &["nothing-here"]), None);
        let statuses: Vec<Status> = evaluation.findings.iter().map(|f| f.status).collect();
        let worst = statuses.iter().copied().max_by_key(|s| weight(*s));
        assert_eq!(
            worst_status(&evaluation, &[demo.id.as_str(), "area-crawl", "area-base"]),
            worst
        );
        assert!(weight(Status::OverLimit) > weight(Status::ToEvaluate));
        assert!(weight(Status::ToEvaluate) > weight(Status::NearLimit));
        assert!(weight(Status::NotChecked) > weight(Status::Within));
    }
}
