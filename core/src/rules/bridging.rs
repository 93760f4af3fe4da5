//! Mid-span bracing of joists deeper than nominal 2x12, at intervals not over 8 ft
//! (IRC R502.7.1).

use super::shared::len;
use crate::finding::{Bound, Check, Finding, FindingBuilder, RuleInfo, Status, Value};
use crate::model::BridgingKind;
use crate::units::Length;
use crate::validate::MemberContext;

pub const RULE: RuleInfo = RuleInfo {
    id: "bridging",
    title: "Bridging of deep joists",
    code_section: Some("R502.7.1"),
    other_source: None,
};

/// Source: IRC 2018 R502.7.1: intervals not exceeding 8 ft.
const MAX_INTERVAL: Length = Length::inches(96.0);
/// Source: IRC 2018 R502.7.1 applies to joists exceeding a nominal 2 by 12.
const DEEPEST_WITHOUT_BRIDGING: u8 = 12;

pub fn check(ctx: &MemberContext) -> Vec<Finding> {
    let Some(lumber) = &ctx.lumber else { return vec![] };
    if !ctx.report_framing || lumber.section.nominal.depth <= DEEPEST_WITHOUT_BRIDGING {
        return vec![];
    }
    let b = FindingBuilder::new(&RULE, ctx.edition, ctx.place(), None);
    let interval = match ctx.framing.bridging {
        Some(br) if br.kind == BridgingKind::None => ctx.clear_span(),
        Some(br) => br.interval,
        None => None,
    };
    let Some(interval) = interval else {
        return vec![b.not_checked(
            "bridging or its interval not recorded",
            "Record the bridging (blocking, diagonal bridging or strap) and the largest distance between lines of it.",
        )];
    };
    let none = ctx.framing.bridging.is_some_and(|br| br.kind == BridgingKind::None);
    let summary = if none {
        format!("No bridging on {} joists: unbraced over the full span of {}, limit {}", lumber.section.nominal, len(ctx, interval), len(ctx, MAX_INTERVAL))
    } else {
        format!("Bridging of {} joists at intervals up to {}, limit {}", lumber.section.nominal, len(ctx, interval), len(ctx, MAX_INTERVAL))
    };
    vec![b
        .check(Check::numeric("unbraced interval", Value::Length(interval), Value::Length(MAX_INTERVAL), Bound::AtMost, ctx.units))
        .summary(summary)
        .assume("Joist ends count as braced (R502.7 end restraint)")
        .finish(|status| match status {
            Status::OverLimit => "Add solid blocking, diagonal bridging or a continuous 1x3 strip across the bottom edges so no interval exceeds 8 ft.".into(),
            _ => "Bridging interval meets the limit.".into(),
        })]
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
        let at = |ft: f64| Some(Bridging { kind: BridgingKind::SolidBlocking, interval: Some(Length::feet(ft)) });
        let table = [(7.0, Status::Within), (7.5, Status::NearLimit), (8.0, Status::NearLimit), (8.1, Status::OverLimit)];
        for (ft, expect) in table {
            assert_eq!(status(check, deep(240.0, at(ft)), vec![]), expect, "{ft} ft");
        }
        let none = Some(Bridging { kind: BridgingKind::None, interval: None });
        assert_eq!(status(check, deep(240.0, none), vec![]), Status::OverLimit);
        assert_eq!(status(check, deep(90.0, none), vec![]), Status::NearLimit);
    }

    #[test]
    fn not_required_at_2x12_and_shallower() {
        let mut f = spf_no2((2, 12), 240.0);
        f.bridging = Some(Bridging { kind: BridgingKind::None, interval: None });
        assert!(run(check, f, vec![]).is_empty());
    }
}
