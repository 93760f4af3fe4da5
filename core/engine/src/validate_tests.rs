//! Tests of validation: positions held to the span, taped layouts, moisture a joist takes
//! from its run, and loads set on a run.

use super::*;
use crate::finding::{Basis, Status};
use crate::model::{AreaKind, Edge, End, Joist, JoistRun, LoadSettings, RoomUse, SagReading};
use crate::rules::testing::{inspection, observation, spf_no2};
use crate::units::Psf;

fn inches(v: f64) -> Length {
    Length::inches(v)
}

fn notch(at_end: bool, from: Option<f64>) -> ObservationKind {
    ObservationKind::Notch {
        edge: Edge::Bottom,
        depth: inches(1.0),
        length: inches(2.0),
        at_end,
        from_support: from.map(inches),
        end: End::A,
    }
}

// A notch typed 25' 0" out on a 15 ft joist is not taken as being at the support: it is an
// input problem and the notch is not used.
#[test]
fn positions_beyond_the_span_are_input_problems() {
    let span = Some(Length::feet(15.0));
    assert!(observation_problem(&notch(false, Some(300.0)), span).is_some());
    assert!(observation_problem(&notch(false, Some(178.0)), span).is_none());
    assert!(observation_problem(&notch(false, Some(178.5)), span).is_some()); // 180.5 > 180
    assert!(observation_problem(&notch(false, Some(300.0)), None).is_none());
    let hole = ObservationKind::Hole {
        diameter: inches(1.0),
        from_support: inches(181.0),
        end: End::A,
        center_above_bottom: inches(4.0),
    };
    assert!(observation_problem(&hole, span).is_some());
    let sag = ObservationKind::Sag {
        readings: vec![SagReading {
            at: inches(200.0),
            offset: inches(0.5),
        }],
        spacer: None,
    };
    assert!(observation_problem(&sag, span).is_some());

    let i = inspection(
        spf_no2((2, 10), 180.0),
        vec![observation(notch(false, Some(300.0)))],
        LoadSettings::default(),
    );
    let (ctxs, problems) = members(&i);
    assert!(ctxs[0].observations.is_empty());
    assert_eq!(problems.len(), 1);
    assert!(
        problems[0].message.contains("beyond the clear span"),
        "{problems:?}"
    );
}

// An end notch is one over or at the bearing: "at the end" with a distance out in the span
// contradicts itself (common practice, no source: 1/2 in of tape tolerance at the bearing).
#[test]
fn an_end_notch_away_from_the_end_is_a_contradiction() {
    let span = Some(Length::feet(15.0));
    assert!(observation_problem(&notch(true, Some(90.0)), span).is_some());
    assert!(observation_problem(&notch(true, Some(0.5)), span).is_none());
    assert!(observation_problem(&notch(true, None), span).is_none());
}

// Source: IRC 2018 Table R502.3.1(2), SPF No. 1/No. 2 2x12 at 24 in, 40 psf live, 20 psf
// dead: 13-4 (160 in). Taped at 24-1/2 in, the layout is the 24 in column, and the
// repetitive-member factor stays; 28 in is off-layout and used as taped, outside the tables.
#[test]
fn a_taped_spacing_is_held_to_its_layout() {
    assert_eq!(layout_of(inches(24.5)), Some(24.0));
    assert_eq!(layout_of(inches(19.5)), Some(19.2));
    assert_eq!(layout_of(inches(15.25)), Some(16.0));
    assert_eq!(layout_of(inches(24.75)), Some(24.0));
    assert_eq!(layout_of(inches(24.8)), None);
    assert_eq!(layout_of(inches(28.0)), None);
    let mut framing = spf_no2((2, 12), 160.0);
    framing.spacing = Some(inches(24.5));
    let loads = LoadSettings {
        heavy_finish: Some(true),
        ..Default::default()
    };
    let i = inspection(framing.clone(), vec![], loads);
    let (ctxs, _) = members(&i);
    assert_eq!(ctxs[0].framing.spacing, Some(inches(24.0)));
    assert_eq!(ctxs[0].spacing_taped, Some(inches(24.5)));
    assert_eq!(
        ctxs[0].span.as_ref().unwrap().allowable_span_rounded_in,
        160.0
    );
    let f = crate::evaluate(&i);
    let span = f
        .findings
        .iter()
        .find(|f| f.rule_id() == "joist-span")
        .unwrap();
    assert_eq!(
        (span.status, span.basis),
        (Status::NearLimit, Basis::CodeLimit)
    );
    assert!(span
        .assumptions()
        .iter()
        .any(|a| a.contains("held to the standard 24\" layout")));

    framing.spacing = Some(inches(28.0));
    let i = inspection(framing, vec![], loads);
    let f = crate::evaluate(&i);
    let span = f
        .findings
        .iter()
        .find(|f| f.rule_id() == "joist-span")
        .unwrap();
    assert_eq!(span.basis, Basis::Reference);
    assert_eq!(span.status_label(), "BEYOND REFERENCE");
}

fn run_with_joist(
    run_obs: Vec<crate::model::Observation>,
    joist_obs: Vec<crate::model::Observation>,
) -> crate::model::Inspection {
    let mut i = inspection(spf_no2((2, 10), 180.0), vec![], LoadSettings::default());
    i.areas[0].members.clear();
    i.areas[0].runs.push(JoistRun {
        id: "r".into(),
        label: "Run".into(),
        framing: spf_no2((2, 10), 180.0),
        observations: run_obs,
        joists: vec![Joist {
            id: "j".into(),
            label: "Joist 3".into(),
            at: None,
            framing: Default::default(),
            observations: joist_obs,
        }],
        bears_on: vec![],
    });
    i
}

fn reading(id: &str, percent: f64) -> crate::model::Observation {
    let mut o = observation(ObservationKind::Moisture {
        percent,
        location: String::new(),
    });
    o.id = id.into();
    o
}

// Source: NDS Supplement (2018) Table 4A: wet service above 19 %. A joist of a wet run with no
// reading of its own is wet; its own dry reading makes it dry, and its span is re-checked.
#[test]
fn joists_take_the_moisture_of_their_run() {
    let i = run_with_joist(vec![reading("m1", 24.0)], vec![]);
    let (ctxs, _) = members(&i);
    assert!(ctxs[1].is_wet() && ctxs[1].moisture_from_run);
    assert!(!ctxs[1].report_span, "same as its run: not repeated");
    let i = run_with_joist(vec![reading("m1", 24.0)], vec![reading("m2", 12.0)]);
    let (ctxs, _) = members(&i);
    assert!(!ctxs[1].is_wet());
    assert!(ctxs[1].report_span, "drier than its run: span re-checked");
    let e = crate::evaluate(&i);
    let bearing_of_joist = e
        .findings
        .iter()
        .filter(|f| f.rule_id() == "bearing-length" && &*f.place.member_id == "j")
        .count();
    assert_eq!(bearing_of_joist, 1, "bearing re-checked where the span is");
}

// Source: IRC 2018 Table R301.5: 40 psf over rooms other than sleeping rooms. A family room
// run in a sleeping-room area is held to 40 psf when its run says so.
#[test]
fn loads_can_be_set_on_a_run() {
    let mut i = run_with_joist(vec![], vec![]);
    i.areas[0].kind = AreaKind::Basement;
    i.areas[0].loads.room_use_above = Some(RoomUse::Sleeping);
    let (ctxs, _) = members(&i);
    assert_eq!(ctxs[0].loads.live, Psf(30.0));
    i.areas[0].runs[0].framing.loads.room_use_above = Some(RoomUse::Living);
    let (ctxs, _) = members(&i);
    assert_eq!(ctxs[0].loads.live, Psf(40.0));
    assert_eq!(ctxs[1].loads.live, Psf(40.0), "its joists too");
}

#[test]
fn photo_references_outside_the_inspection_are_problems() {
    let mut i = inspection(spf_no2((2, 10), 180.0), vec![], LoadSettings::default());
    let photo = |id: &str, file: &str, owner: &str| crate::model::PhotoRef {
        id: id.into(),
        file: file.into(),
        attached_to: owner.into(),
        caption: String::new(),
        marks: vec![],
    };
    i.photos = vec![
        photo("p1", "photos/a.jpg", "m"),
        photo("p2", "/etc/passwd", "m"),
        photo("p3", "../../secret.jpg", "m"),
        photo("p4", "photos/b.jpg", "nobody"),
    ];
    let (_, problems) = members(&i);
    let named: Vec<&str> = problems.iter().map(|p| p.location.as_str()).collect();
    assert_eq!(named, ["Photo p2", "Photo p3", "Photo p4"], "{problems:?}");
}
