//! The joist walk: the inspector steps along a run joist by joist, by place (a joist at
//! 5' 4" from the start stays that joist even when one was skipped), not by count. Each joist
//! starts as the previous one was; only what differs from the run is stored.

use crate::model::{Joist, JoistRun};
use crate::units::{format_length, Length, UnitSystem};

/// The layout the walk steps by when the run's spacing is not entered: 16 in on centre, the
/// most common floor layout (common practice, no source).
const USUAL_SPACING_IN: f64 = 16.0;
/// Two places this close are the same joist (a tape read from either side of a joist).
const SAME_PLACE_IN: f64 = 0.5;

/// How far apart the walk's steps are: the run's spacing, else the usual layout.
pub fn walk_step(run: &JoistRun) -> Length {
    run.framing
        .spacing
        .filter(|s| s.in_inches() > 0.0)
        .unwrap_or(Length::inches(USUAL_SPACING_IN))
}

/// Where the walk begins: the first joist in from the starting wall.
pub fn first_place(run: &JoistRun) -> Length {
    walk_step(run)
}

/// The stored joist at a place along the run, if one was recorded there.
pub fn joist_at(run: &JoistRun, at: Length) -> Option<&Joist> {
    run.joists.iter().find(|j| {
        j.at.is_some_and(|p| (p.in_inches() - at.in_inches()).abs() <= SAME_PLACE_IN)
    })
}

/// The joist one step back, whose values a new place starts from ("same as previous").
pub fn previous_joist(run: &JoistRun, at: Length) -> Option<&Joist> {
    let back = at.in_inches() - walk_step(run).in_inches();
    (back > -SAME_PLACE_IN)
        .then(|| joist_at(run, Length::inches(back)))
        .flatten()
}

/// The label a walked joist gets: where it is.
pub fn walk_label(at: Length, units: UnitSystem) -> String {
    format!("Joist at {}", format_length(at, units))
}

/// The place written into the screen's address: inches, to a thousandth.
pub fn place_key(at: Length) -> String {
    let text = format!("{:.3}", at.in_inches());
    text.trim_end_matches('0').trim_end_matches('.').to_string()
}

/// A place read back from the screen's address, if it is one.
pub fn place_from_key(key: &str) -> Option<Length> {
    key.parse::<f64>()
        .ok()
        .filter(|x| x.is_finite() && (0.0..=12_000.0).contains(x))
        .map(Length::inches)
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::model::Framing;

    fn run_with(spacing: Option<f64>, placed: &[f64]) -> JoistRun {
        JoistRun {
            id: "r".into(),
            label: "Run".into(),
            framing: Framing {
                spacing: spacing.map(Length::inches),
                ..Default::default()
            },
            observations: vec![],
            joists: placed
                .iter()
                .map(|at| Joist {
                    id: format!("j{at}"),
                    label: String::new(),
                    at: Some(Length::inches(*at)),
                    framing: Framing::default(),
                    observations: vec![],
                })
                .collect(),
            bears_on: vec![],
        }
    }

    #[test]
    fn the_walk_steps_by_the_runs_layout_and_finds_joists_by_place() {
        let run = run_with(Some(19.2), &[19.2, 57.6]);
        assert_eq!(walk_step(&run).in_inches(), 19.2);
        assert_eq!(first_place(&run).in_inches(), 19.2);
        assert_eq!(joist_at(&run, Length::inches(57.5)).unwrap().id, "j57.6");
        assert!(joist_at(&run, Length::inches(38.4)).is_none(), "skipped");
        assert!(
            previous_joist(&run, Length::inches(57.6)).is_none(),
            "the one before was not recorded: the run's values"
        );
        assert_eq!(
            previous_joist(&run, Length::inches(76.8)).unwrap().id,
            "j57.6"
        );
        let usual = run_with(None, &[]);
        assert_eq!(walk_step(&usual).in_inches(), 16.0);
    }

    #[test]
    fn places_go_through_the_address_and_labels_say_where() {
        assert_eq!(place_key(Length::inches(57.6)), "57.6");
        assert_eq!(place_key(Length::inches(64.0)), "64");
        assert_eq!(place_from_key("57.6").unwrap().in_inches(), 57.6);
        assert!(place_from_key("-3").is_none());
        assert!(place_from_key("NaN").is_none());
        assert!(place_from_key("1e9").is_none());
        assert_eq!(
            walk_label(Length::inches(64.0), UnitSystem::Imperial),
            "Joist at 5' 4\""
        );
    }
}
