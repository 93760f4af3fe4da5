//! Mid-span bracing of joists deeper than nominal 2x12, at intervals not over 8 ft
//! (IRC R502.7.1).

use super::shared::len;
use crate::finding::{Basis, Bound, Check, Finding, Missing, RuleInfo, Status, Value, Wording};
use crate::lumber::NominalSize;
use crate::model::BridgingKind;
use crate::units::{Length, UnitSystem};
use crate::validate::MemberContext;

pub const RULE: RuleInfo = RuleInfo {
    id: "bridging",
    title: "Bridging of deep joists",
    code_section: Some("R502.7.1"),
    other_source: None,
    basis: Basis::CodeLimit,
};

/// Source: IRC 2018 R502.7.1: intervals not exceeding 8 ft.
const MAX_INTERVAL: Length = Length::inches(96.0);
/// Source: IRC 2018 R502.7.1 applies to joists exceeding a nominal 2 by 12.
const DEEPEST_WITHOUT_BRIDGING: u8 = 12;

/// What a bridging finding is worded from.
#[derive(Debug, Clone, PartialEq)]
pub struct BridgingDetail {
    pub nominal: NominalSize,
    pub interval: Length,
    /// No bridging at all: the interval is the clear span.
    pub none: bool,
}

pub fn check(ctx: &MemberContext, out: &mut Vec<Finding>) {
    // The requirement depends on the depth alone, not on species or grade.
    let Some(section) = &ctx.section else { return };
    if ctx.kind.is_engineered()
        || !ctx.report_framing
        || section.nominal.depth <= DEEPEST_WITHOUT_BRIDGING
    {
        return;
    }
    let b = ctx.finding(&RULE, None);
    let none = ctx
        .framing
        .bridging
        .is_some_and(|br| br.kind == BridgingKind::None);
    let interval = match ctx.framing.bridging {
        Some(_) if none => ctx.clear_span(),
        Some(br) => br.interval,
        None => None,
    };
    let Some(interval) = interval else {
        let what_to_do = "Record the bridging (blocking, diagonal bridging or strap) and the largest distance between lines of it.";
        out.push(b.not_checked("bridging or its interval not recorded", Missing(what_to_do)));
        return;
    };
    out.push(
        b.check(Check::numeric(
            "unbraced interval",
            Value::Length(interval),
            Value::Length(MAX_INTERVAL),
            Bound::AtMost,
            ctx.units,
        ))
        .finish(BridgingDetail {
            nominal: section.nominal,
            interval,
            none,
        }),
    );
}

impl Wording for BridgingDetail {
    fn summary(&self, u: UnitSystem) -> String {
        if self.none {
            format!(
                "No bridging on {} joists: unbraced over the full span of {}, limit {}",
                self.nominal,
                len(u, self.interval),
                len(u, MAX_INTERVAL)
            )
        } else {
            format!(
                "Bridging of {} joists at intervals up to {}, limit {}",
                self.nominal,
                len(u, self.interval),
                len(u, MAX_INTERVAL)
            )
        }
    }

    fn assumptions(&self, _: UnitSystem) -> Vec<String> {
        vec!["Joist ends count as braced (R502.7 end restraint)".into()]
    }

    fn recommendation(&self, status: Status, u: UnitSystem) -> String {
        match status {
            Status::OverLimit => format!("Add solid blocking, diagonal bridging or a continuous 1x3 strip across the bottom edges so no interval exceeds {}.", len(u, MAX_INTERVAL)),
            _ => "Bridging interval meets the limit.".into(),
        }
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::model::Bridging;
    use crate::rules::testing::*;

    fn deep(span: f64, bridging: Option<Bridging>) -> crate::model::Framing {
        let mut f = spf_no2((2, 14), span);
        f.bridging = bridging;
        f
    }

    // Source: IRC 2018 R502.7.1: joists deeper than 2x12 braced at intervals not over 8 ft.
    #[test]
    fn interval_limit() {
        let at = |ft: f64| {
            Some(Bridging {
                kind: BridgingKind::SolidBlocking,
                interval: Some(Length::feet(ft)),
            })
        };
        let table = [
            (7.0, Status::Within),
            (7.5, Status::NearLimit),
            (8.0, Status::NearLimit),
            (8.1, Status::OverLimit),
        ];
        for (ft, expect) in table {
            assert_eq!(
                status(check, deep(240.0, at(ft)), vec![]),
                expect,
                "{ft} ft"
            );
        }
        let none = Some(Bridging {
            kind: BridgingKind::None,
            interval: None,
        });
        assert_eq!(status(check, deep(240.0, none), vec![]), Status::OverLimit);
        assert_eq!(status(check, deep(90.0, none), vec![]), Status::NearLimit);
    }

    // Source: IRC 2018 R502.7.1 (depth only): a 2x14 at 20 ft with no bridging and no grade
    // or species recorded is still over.
    #[test]
    fn depth_alone_sets_the_requirement() {
        let mut f = deep(
            240.0,
            Some(Bridging {
                kind: BridgingKind::None,
                interval: None,
            }),
        );
        f.grade = None;
        f.species = None;
        assert_eq!(status(check, f, vec![]), Status::OverLimit);
    }

    #[test]
    fn not_required_at_2x12_and_shallower() {
        let mut f = spf_no2((2, 12), 240.0);
        f.bridging = Some(Bridging {
            kind: BridgingKind::None,
            interval: None,
        });
        assert!(run(check, f, vec![]).is_empty());
    }
}
