//! Builds large invented inspections for benchmarks and load tests: many runs and joists with
//! notches, holes, sag readings and moisture readings, in varied sizes and spans.

use crate::lumber::{Grade, GradeChoice, NominalSize, Species};
use crate::model::*;
use crate::units::Length;

/// An inspection of `members` members: runs of ten (one typical plus nine listed joists),
/// every listed joist carrying a notch, a hole, sag readings and a moisture reading.
pub fn inspection_with_members(members: usize) -> Inspection {
    let species = Species::ALL;
    let grades = [Grade::SelectStructural, Grade::No1, Grade::No2, Grade::No3];
    let depths = [6u8, 8, 10, 12, 14];
    let mut areas = Vec::new();
    let mut made = 0;
    let mut n = 0usize;
    while made < members {
        let mut runs = Vec::new();
        for _ in 0..10 {
            if made >= members {
                break;
            }
            n += 1;
            let depth = depths[n % depths.len()];
            let span = 90.0 + (n * 37 % 150) as f64;
            let framing = Framing {
                kind: None,
                species: Some(species[n % 4]),
                grade: Some(GradeChoice::Stamped(grades[n / 4 % 4])),
                size: Some(NominalSize::new(2, depth)),
                actual: None,
                spacing: Some(Length::inches([12.0, 16.0, 19.2, 24.0][n % 4])),
                clear_span: Some(Length::inches(span)),
                bearing: Some(Bearing {
                    length: Some(Length::inches(1.0 + (n % 4) as f64)),
                    on: BearingSupport::Wood,
                }),
                end_restraint: Some(if n % 7 == 0 {
                    EndRestraint::None
                } else {
                    EndRestraint::RimJoist
                }),
                bridging: Some(Bridging {
                    kind: BridgingKind::SolidBlocking,
                    interval: Some(Length::inches(60.0 + (n % 60) as f64)),
                }),
                loads: Default::default(),
                ground_clearance: None,
                treated: None,
            };
            made += 1;
            let joists = (0..9.min(members - made))
                .map(|j| {
                    made += 1;
                    let id = format!("j{n}-{j}");
                    Joist {
                        id: id.clone(),
                        label: format!("Joist {j}"),
                        framing: Framing::default(),
                        observations: observations(&id, span, j),
                    }
                })
                .collect();
            runs.push(JoistRun {
                id: format!("r{n}"),
                label: format!("Run {n}"),
                framing,
                observations: vec![],
                joists,
                bears_on: vec![],
            });
        }
        areas.push(Area {
            id: format!("a{}", areas.len()),
            name: format!("Area {}", areas.len() + 1),
            kind: AreaKind::Crawlspace,
            loads: LoadSettings::default(),
            runs,
            members: vec![],
            girders: vec![],
            conditions: Default::default(),
            notes: String::new(),
        });
    }
    Inspection {
        format: FORMAT_NAME.into(),
        version: FORMAT_VERSION,
        id: "generated".into(),
        property: Property {
            address: "Generated inspection".into(),
            year_built: None,
        },
        client: Client::default(),
        inspector: InspectorInfo::default(),
        date: "2026-12-01".into(),
        conditions: String::new(),
        code_edition: "IRC 2018".into(),
        local_amendments: String::new(),
        units: Default::default(),
        loads: LoadSettings::default(),
        areas,
        photos: vec![],
    }
}

fn observations(id: &str, span: f64, j: usize) -> Vec<Observation> {
    let o = |suffix: &str, kind| Observation {
        id: format!("{id}-{suffix}").into(),
        kind,
        note: String::new(),
    };
    let inches = Length::inches;
    vec![
        o(
            "n",
            ObservationKind::Notch {
                edge: Edge::Bottom,
                depth: inches(0.5 + j as f64 * 0.25),
                length: inches(2.0),
                at_end: false,
                from_support: Some(inches(12.0 + j as f64 * 4.0)),
                end: End::A,
            },
        ),
        o(
            "h",
            ObservationKind::Hole {
                diameter: inches(1.0 + j as f64 * 0.125),
                from_support: inches(30.0),
                end: End::B,
                center_above_bottom: inches(3.0),
            },
        ),
        o(
            "s",
            ObservationKind::Sag {
                readings: (1..4)
                    .map(|k| SagReading {
                        at: inches(span * k as f64 / 4.0),
                        offset: inches(0.1 * k as f64),
                    })
                    .collect(),
                spacer: None,
            },
        ),
        o(
            "m",
            ObservationKind::Moisture {
                percent: 10.0 + j as f64 * 2.0,
                location: String::new(),
            },
        ),
    ]
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn makes_the_members_asked_for() {
        let i = inspection_with_members(500);
        let members: usize = i
            .areas
            .iter()
            .flat_map(|a| &a.runs)
            .map(|r| 1 + r.joists.len())
            .sum();
        assert_eq!(members, 500);
        let e = crate::evaluate(&i);
        assert!(
            e.problems.is_empty(),
            "{:?}",
            &e.problems[..3.min(e.problems.len())]
        );
        assert!(e.findings.len() > 2000);
        crate::interchange::from_json(&crate::interchange::to_json(&i)).unwrap();
    }
}
