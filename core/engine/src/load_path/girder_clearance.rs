//! Girders near exposed ground and girder ends in masonry pockets (R317.1, items 1 and 4):
//! closer than 12 in to the ground, or with less than 1/2 in of air around an end in a
//! pocket, the wood must be naturally durable or preservative-treated.

use super::context::GirderContext;
use crate::finding::{
    Basis, Bound, Check, Finding, FindingBuilder, RuleInfo, Status, Value, Wording,
};
use crate::model::{AreaKind, BearingSupport};
use crate::units::{Length, UnitSystem};

pub const RULE: RuleInfo = RuleInfo {
    id: "girder-clearance",
    title: "Girder clearance from ground and in pockets",
    code_section: Some("R317.1 items 1 and 4"),
    other_source: None,
    basis: Basis::CodeLimit,
};

/// Source: IRC 2018 R317.1 item 1: wood girders closer than 12 in to exposed ground in crawl
/// spaces; item 4: ends of wood girders entering masonry or concrete walls with less than
/// 1/2 in of clearance on tops, sides and ends.
const GROUND_IN: f64 = 12.0;
const POCKET_IN: f64 = 0.5;

#[derive(Debug, Clone, PartialEq)]
pub struct ClearanceDetail {
    pub treated: Option<bool>,
}

pub fn check(g: &GirderContext, out: &mut Vec<Finding>) {
    if g.line.kind == crate::model::GirderKind::Steel {
        return;
    }
    let in_pocket = [g.line.end_a, g.line.end_b]
        .iter()
        .flatten()
        .any(|b| matches!(b.on, BearingSupport::Masonry | BearingSupport::Concrete));
    let ground = g.area.kind == AreaKind::Crawlspace;
    if !ground && !in_pocket {
        return;
    }
    let u = g.common.units;
    let mut b = FindingBuilder::at(&RULE, g.place.clone(), &g.common);
    let treated = g.line.treated;
    if treated == Some(true) {
        b = b.check(Check::qualitative(
            "durable or treated wood",
            "treated or naturally durable",
            "treated or naturally durable where close to ground or in a pocket",
            true,
        ));
    } else {
        let limit = |what: &str, measured: Option<Length>, min: f64| match measured {
            Some(m) if m.in_inches() >= min || treated == Some(false) => Check::numeric(
                what.to_string(),
                Value::Length(m),
                Value::Length(Length::inches(min)),
                Bound::AtLeast,
                u,
            ),
            Some(_) => Check::skipped(
                what.to_string(),
                "or durable or treated wood",
                "closer than the code's clearance, and whether the wood is treated is not recorded",
            ),
            None => Check::skipped(what.to_string(), "R317.1", "not measured"),
        };
        if ground {
            b = b.check(limit(
                "clearance to exposed ground",
                g.line.ground_clearance,
                GROUND_IN,
            ));
        }
        if in_pocket {
            b = b.check(limit(
                "air space around the end in its pocket",
                g.line.pocket_air_space,
                POCKET_IN,
            ));
        }
    }
    out.push(b.finish(ClearanceDetail { treated }));
}

impl Wording for ClearanceDetail {
    fn summary(&self, _u: UnitSystem) -> String {
        match self.treated {
            Some(true) => "The girder is of treated or naturally durable wood".into(),
            _ => "Clearance of the girder from the ground and around its ends".into(),
        }
    }

    fn recommendation(&self, status: Status, _u: UnitSystem) -> String {
        match status {
            Status::OverLimit => "Untreated wood this close to the ground or tight in a masonry pocket is at risk of decay. Probe it for decay, and have the clearance, a barrier or treated wood provided as a contractor or licensed professional advises.".into(),
            _ => "No action for clearance.".into(),
        }
    }
}
