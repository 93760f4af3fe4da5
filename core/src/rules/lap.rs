//! Joists lapped over a support: at least 3 in of lap and three 10d face nails, or a splice of
//! equal strength (IRC R502.6.1).

use super::shared::dim as len;
use crate::finding::{Bound, Check, Finding, FindingBuilder, RuleInfo, Status, Value};
use crate::model::ObservationKind;
use crate::units::Length;
use crate::validate::MemberContext;

pub const RULE: RuleInfo = RuleInfo {
    id: "lap-over-support",
    title: "Lap of joists over a support",
    code_section: Some("R502.6.1"),
    other_source: None,
};

/// Source: IRC 2018 R502.6.1: lapped not less than 3 in, nailed with at least three 10d face
/// nails.
const MIN_LAP: Length = Length::inches(3.0);
const MIN_NAILS: u32 = 3;

pub fn check(ctx: &MemberContext) -> Vec<Finding> {
    ctx.observations
        .iter()
        .filter_map(|o| match &o.kind {
            ObservationKind::Lap { length, nails, spliced } => Some(one(ctx, &o.id, *length, *nails, *spliced)),
            _ => None,
        })
        .collect()
}

fn one(ctx: &MemberContext, id: &str, length: Option<Length>, nails: Option<u32>, spliced: bool) -> Finding {
    let b = FindingBuilder::new(&RULE, ctx.edition, ctx.place(), Some(id));
    if spliced {
        return b
            .check(Check::qualitative("connection over the support", "spliced", "a splice of equal strength", true))
            .summary("Joists spliced over the support instead of lapped")
            .assume("The splice's strength was not evaluated")
            .finish(|_| "Confirm the splice is of equal strength to a 3 in lap with three 10d nails.".into());
    }
    let lap = match length {
        Some(l) => Check::numeric("lap length", Value::Length(l), Value::Length(MIN_LAP), Bound::AtLeast, ctx.units),
        None => Check::skipped("lap length", "3\" minimum", "lap length not measured"),
    };
    let nailing = match nails {
        Some(n) => Check::numeric("10d face nails", Value::Count(n), Value::Count(MIN_NAILS), Bound::AtLeast, ctx.units),
        None => Check::skipped("10d face nails", "3 minimum", "nails not counted"),
    };
    let summary = format!(
        "Lap over the support: {}, {} nails; minimum {} and {}",
        length.map_or("length not measured".into(), |l| len(ctx, l)),
        nails.map_or("?".into(), |n| n.to_string()),
        len(ctx, MIN_LAP),
        MIN_NAILS
    );
    b.check(lap).check(nailing).summary(summary).finish(|status| match status {
        Status::OverLimit => "Lengthen the lap or add nails (at least 3 in of lap and three 10d face nails), or add a splice of equal strength.".into(),
        Status::NotChecked => "Measure the lap and count the nails.".into(),
        _ => "Lap meets the minimum.".into(),
    })
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::rules::testing::*;

    fn lap(length: Option<f64>, nails: Option<u32>) -> Vec<crate::model::Observation> {
        vec![observation(ObservationKind::Lap { length: length.map(inches), nails, spliced: false })]
    }

    // Source: IRC 2018 R502.6.1: lap at least 3 in, three 10d face nails.
    #[test]
    fn lap_and_nails() {
        let table = [
            (Some(2.5), Some(3), Status::OverLimit),
            (Some(3.0), Some(3), Status::NearLimit),
            (Some(6.0), Some(4), Status::Within),
            (Some(6.0), Some(2), Status::OverLimit),
            (Some(6.0), None, Status::Within),
            (None, None, Status::NotChecked),
        ];
        for (length, nails, expect) in table {
            assert_eq!(status(check, spf_no2((2, 10), 180.0), lap(length, nails)), expect, "{length:?} {nails:?}");
        }
    }
}
