//! Floor joists cantilevered past their support (R502.3.3): no farther than the joist's
//! nominal depth, unless the cantilever carries a balcony within Table R502.3.3(2) (with a
//! backspan at least twice the cantilever) or a wall and roof by Table R502.3.3(1), which
//! needs the roof's width and snow load and is left to a professional here.

use super::shared::{dim, len};
use crate::finding::{Basis, Bound, Check, Finding, RuleInfo, Status, Value, Wording};
use crate::model::{CantileverLoad, ObservationKind};
use crate::units::{Length, UnitSystem};
use crate::validate::MemberContext;

pub const RULE: RuleInfo = RuleInfo {
    id: "cantilever",
    title: "Joist cantilever",
    code_section: Some("R502.3.3, Tables R502.3.3(1) and R502.3.3(2)"),
    other_source: None,
    basis: Basis::CodeLimit,
};

/// Source: IRC Table R502.3.3(2), cantilever spans for floor joists supporting an exterior
/// balcony (No. 2 DFL, HF, SP, SPF; as reprinted in a public code discussion of the table):
/// (nominal depth, spacing in) -> maximum cantilever, in.
const BALCONY: [((u8, u16), f64); 7] = [
    ((8, 12), 42.0),
    ((8, 16), 36.0),
    ((10, 12), 61.0),
    ((10, 16), 53.0),
    ((10, 24), 43.0),
    ((12, 16), 72.0),
    ((12, 24), 58.0),
];
/// Source: the same table's footnote b: backspan at least twice the cantilever.
const BALCONY_BACKSPAN_RATIO: f64 = 2.0;

#[derive(Debug, Clone, PartialEq)]
pub struct CantileverDetail {
    pub length: Length,
    pub carries: CantileverLoad,
}

pub fn check(ctx: &MemberContext, out: &mut Vec<Finding>) {
    for o in &ctx.observations {
        let ObservationKind::Cantilever {
            length,
            backspan,
            carries,
        } = &o.kind
        else {
            continue;
        };
        let b = ctx.finding(&RULE, Some(&o.id));
        let detail = CantileverDetail {
            length: *length,
            carries: *carries,
        };
        let u = ctx.units;
        let Some(section) = ctx.section else {
            out.push(b.not_checked("the joist size is not entered", detail));
            continue;
        };
        let nominal = section.nominal;
        let finding = match carries {
            CantileverLoad::FloorOnly => b
                .check(Check::numeric(
                    "cantilever",
                    Value::Length(*length),
                    Value::Length(Length::inches(nominal.depth as f64)),
                    Bound::AtMost,
                    u,
                ))
                .finish(detail),
            CantileverLoad::WallAndRoof => b.not_checked(
                "a cantilever carrying a wall and roof is held to Table R502.3.3(1) by roof width and snow load, which are not recorded",
                detail,
            ),
            CantileverLoad::Balcony => {
                let spacing = ctx.framing.spacing.map(|s| s.in_inches().round() as u16);
                let cell = BALCONY
                    .iter()
                    .find(|((d, s), _)| *d == nominal.depth && Some(*s) == spacing)
                    .map(|(_, max)| *max);
                match cell {
                    None => b.not_checked(
                        format!("{nominal} at this spacing is not in Table R502.3.3(2)"),
                        detail,
                    ),
                    Some(max) => {
                        let b = b.check(Check::numeric(
                            "balcony cantilever",
                            Value::Length(*length),
                            Value::Length(Length::inches(max)),
                            Bound::AtMost,
                            u,
                        ));
                        let b = match backspan {
                            Some(back) => b.check(Check::numeric(
                                "backspan",
                                Value::Length(*back),
                                Value::Length(*length * BALCONY_BACKSPAN_RATIO),
                                Bound::AtLeast,
                                u,
                            )),
                            None => b.check(Check::skipped(
                                "backspan",
                                "twice the cantilever",
                                "not measured",
                            )),
                        };
                        b.finish(detail)
                    }
                }
            }
        };
        out.push(finding);
    }
}

impl Wording for CantileverDetail {
    fn summary(&self, u: UnitSystem) -> String {
        let carrying = match self.carries {
            CantileverLoad::FloorOnly => "the floor",
            CantileverLoad::Balcony => "a balcony",
            CantileverLoad::WallAndRoof => "a wall and roof",
        };
        let length = if self.length.in_inches() < 24.0 {
            dim(u, self.length)
        } else {
            len(u, self.length)
        };
        format!("Joists cantilever {length} past their support, carrying {carrying}")
    }

    fn assumptions(&self, _u: UnitSystem) -> Vec<String> {
        vec!["On a cantilever the top edge is the tension side over the support: notches there are held to the tension-side limits".into()]
    }

    fn recommendation(&self, status: Status, _u: UnitSystem) -> String {
        match status {
            Status::OverLimit => "The cantilever is longer than the code allows for these joists. Refer to a licensed professional to evaluate it and its connection at the backspan.".into(),
            Status::NotChecked => "Refer the cantilever to a licensed professional, who can hold it to the code's cantilever tables.".into(),
            _ => "Within the code's cantilever limit; no action.".into(),
        }
    }
}
