//! Joists near exposed ground (R317.1 item 1): wood joists or the bottom of a wood floor
//! closer than 18 in to exposed ground in a crawl space are naturally durable or
//! preservative-treated.

use super::shared::dim;
use crate::finding::{Basis, Bound, Check, Finding, RuleInfo, Status, Value, Wording};
use crate::model::AreaKind;
use crate::units::{Length, UnitSystem};
use crate::validate::MemberContext;

pub const RULE: RuleInfo = RuleInfo {
    id: "joist-clearance",
    title: "Joist clearance from exposed ground",
    code_section: Some("R317.1 item 1"),
    other_source: None,
    basis: Basis::CodeLimit,
};

/// Source: IRC 2018 R317.1 item 1: joists closer than 18 in to exposed ground.
const JOIST_CLEARANCE_IN: f64 = 18.0;

#[derive(Debug, Clone, PartialEq)]
pub struct JoistClearanceDetail {
    pub clearance: Length,
    pub treated: Option<bool>,
}

pub fn check(ctx: &MemberContext, out: &mut Vec<Finding>) {
    let Some(clearance) = ctx.framing.ground_clearance else {
        return;
    };
    if !ctx.report_framing || ctx.area_kind != AreaKind::Crawlspace {
        return;
    }
    let treated = ctx.framing.treated;
    let detail = JoistClearanceDetail { clearance, treated };
    let b = ctx.finding(&RULE, None);
    let min = Length::inches(JOIST_CLEARANCE_IN);
    let finding = if treated == Some(true) {
        b.check(Check::qualitative(
            "durable or treated wood",
            "treated or naturally durable",
            "treated or naturally durable closer than 18 in",
            true,
        ))
        .finish(detail)
    } else if clearance.in_inches() >= JOIST_CLEARANCE_IN || treated == Some(false) {
        b.check(Check::numeric(
            "clearance to exposed ground",
            Value::Length(clearance),
            Value::Length(min),
            Bound::AtLeast,
            ctx.units,
        ))
        .finish(detail)
    } else {
        b.not_checked(
            format!(
                "the joists are {} from the ground and whether they are treated is not recorded",
                dim(ctx.units, clearance)
            ),
            detail,
        )
    };
    out.push(finding);
}

impl Wording for JoistClearanceDetail {
    fn summary(&self, u: UnitSystem) -> String {
        format!(
            "The joists are {} above exposed ground{}",
            dim(u, self.clearance),
            if self.treated == Some(true) {
                ", of treated or durable wood"
            } else {
                ""
            }
        )
    }

    fn recommendation(&self, status: Status, _u: UnitSystem) -> String {
        match status {
            Status::OverLimit => "Untreated joists this close to the ground are at risk of decay. Probe them for decay; have the ground lowered, covered, or the wood protected as a contractor or licensed professional advises.".into(),
            Status::NotChecked => "Look for a treatment stamp or the tint of treatment and record it.".into(),
            _ => "Clear of the ground as the code asks; no action.".into(),
        }
    }
}
