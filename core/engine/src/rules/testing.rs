//! Test helper: runs one rule on a one-member inspection built from framing and observations.

use crate::finding::{Finding, Status};
use crate::lumber::{GradeChoice, NominalSize, Species};
use crate::model::{
    Area, AreaKind, Framing, Inspection, LoadSettings, Member, Observation, ObservationKind,
};
use crate::units::Length;
use crate::validate::{members, MemberContext};

pub fn inches(v: f64) -> Length {
    Length::inches(v)
}

/// Sawn SPF No. 2 of the given nominal size at 16 in with the given clear span (inches).
pub fn spf_no2(size: (u8, u8), span_in: f64) -> Framing {
    Framing {
        species: Some(Species::SprucePineFir),
        grade: Some(GradeChoice::Stamped(crate::lumber::Grade::No2)),
        size: Some(NominalSize::new(size.0, size.1)),
        spacing: Some(inches(16.0)),
        clear_span: Some(inches(span_in)),
        ..Default::default()
    }
}

pub fn observation(kind: ObservationKind) -> Observation {
    Observation {
        id: "o1".into(),
        kind,
        note: String::new(),
    }
}

pub fn inspection(
    framing: Framing,
    observations: Vec<Observation>,
    loads: LoadSettings,
) -> Inspection {
    Inspection {
        format: crate::model::FORMAT_NAME.into(),
        version: crate::model::FORMAT_VERSION,
        id: "t".into(),
        property: Default::default(),
        client: Default::default(),
        inspector: Default::default(),
        date: "2026-12-01".into(),
        conditions: String::new(),
        code_edition: "IRC 2018".into(),
        local_amendments: String::new(),
        units: Default::default(),
        loads,
        areas: vec![Area {
            id: "a".into(),
            name: "Crawlspace".into(),
            kind: AreaKind::Crawlspace,
            loads: LoadSettings::default(),
            runs: vec![],
            members: vec![Member {
                id: "m".into(),
                label: "Joist".into(),
                framing,
                observations,
            }],
            girders: vec![],
            conditions: Default::default(),
            notes: String::new(),
        }],
        photos: vec![],
    }
}

/// Runs `rule` on the single member and returns its findings.
pub fn run(
    rule: fn(&MemberContext, &mut Vec<Finding>),
    framing: Framing,
    observations: Vec<Observation>,
) -> Vec<Finding> {
    let inspection = inspection(framing, observations, LoadSettings::default());
    let (ctxs, _) = members(&inspection);
    let mut out = Vec::new();
    rule(&ctxs[0], &mut out);
    out
}

/// The status of the only finding `rule` gives.
pub fn status(
    rule: fn(&MemberContext, &mut Vec<Finding>),
    framing: Framing,
    observations: Vec<Observation>,
) -> Status {
    let findings = run(rule, framing, observations);
    assert_eq!(findings.len(), 1, "{findings:#?}");
    findings[0].status
}
