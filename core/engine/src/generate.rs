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
                        at: None,
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

/// The same inspection with `lines` girder lines of `posts_per_line` posts each, spread over
/// its areas; every run bears on one of its area's girders, and the posts vary in size,
/// height, base and footing.
pub fn inspection_with_load_path(
    members: usize,
    lines: usize,
    posts_per_line: usize,
) -> Inspection {
    let mut inspection = inspection_with_members(members);
    let areas = inspection.areas.len().max(1);
    for n in 0..lines {
        let area = &mut inspection.areas[n % areas];
        let id = format!("g{n}");
        let mut line = GirderLine::new(id.clone(), format!("Girder {}", n + 1));
        line.species = Some(Species::ALL[n % 4]);
        line.grade = Some(GradeChoice::Stamped(Grade::No2));
        line.size = Some(NominalSize::new(2, [8, 10, 12][n % 3]));
        line.plies = Some(2 + (n % 3) as u8);
        let span = 72.0 + (n % 5) as f64 * 12.0;
        line.length = Some(Length::inches(span * (posts_per_line + 1) as f64));
        line.end_a = Some(Bearing {
            length: Some(Length::inches(4.0)),
            on: BearingSupport::Concrete,
        });
        line.end_b = line.end_a;
        line.ground_clearance = Some(Length::inches(10.0 + n as f64));
        line.splices = vec![Length::inches(span)];
        line.posts = (0..posts_per_line)
            .map(|k| {
                let mut post = Post::new(
                    format!("{id}-p{k}"),
                    format!("Post {}", k + 1),
                    Length::inches(span * (k + 1) as f64),
                );
                post.species = Some(Species::DouglasFirLarch);
                post.grade = Some(GradeChoice::Stamped(Grade::No2));
                post.size = Some(NominalSize::new(4, 4 + 2 * (k % 2) as u8));
                post.height = Some(Length::inches(24.0 + (k * 12) as f64));
                post.top = Some(PostHold::Connector);
                post.bottom = Some(if k % 2 == 0 {
                    PostHold::Pinned
                } else {
                    PostHold::NoneSeen
                });
                post.stands_on = Some(PostBase::ConcretePier);
                post.base_height = Some(Length::inches(6.0 + k as f64));
                post.footing = Footing {
                    visible: k % 3 != 2,
                    width: Some(Length::inches(20.0)),
                    length: Some(Length::inches(20.0)),
                    thickness: Some(Length::inches(8.0)),
                };
                if k % 4 == 1 {
                    post.conditions = vec![PostCondition::Shimmed];
                }
                post
            })
            .collect();
        area.girders.push(line);
    }
    for area in &mut inspection.areas {
        let ids: Vec<String> = area.girders.iter().map(|g| g.id.clone()).collect();
        if ids.is_empty() {
            continue;
        }
        for (k, run) in area.runs.iter_mut().enumerate() {
            run.bears_on = vec![ids[k % ids.len()].clone()];
        }
        area.conditions.vapor_retarder = Some(VaporRetarder::Partial);
    }
    inspection
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
    fn makes_the_load_path_asked_for() {
        let i = inspection_with_load_path(500, 20, 3);
        let lines: Vec<&GirderLine> = i.areas.iter().flat_map(|a| &a.girders).collect();
        assert_eq!(lines.len(), 20);
        assert_eq!(lines.iter().map(|g| g.posts.len()).sum::<usize>(), 60);
        let e = crate::evaluate(&i);
        assert!(e.problems.is_empty(), "{:?}", e.problems);
        let strength = e
            .findings
            .iter()
            .filter(|f| f.rule_id() == "girder-strength" && f.status != crate::Status::NotChecked)
            .count();
        assert_eq!(strength, 80, "four spans on each of 20 lines are computed");
    }

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
