//! Joists lapped over a support: at least 3 in of lap and three 10d face nails, or a splice of
//! equal strength (IRC R502.6.1).

use super::shared::{dim, dim_min};
use crate::finding::{Basis, Bound, Check, Finding, RuleInfo, Status, Value, Wording};
use crate::model::ObservationKind;
use crate::units::{Length, UnitSystem};
use crate::validate::MemberContext;
use std::sync::Arc;

pub const RULE: RuleInfo = RuleInfo {
    id: "lap-over-support",
    title: "Lap of joists over a support",
    code_section: Some("R502.6.1"),
    other_source: None,
    basis: Basis::CodeLimit,
};

/// Source: IRC 2018 R502.6.1: lapped not less than 3 in, nailed with at least three 10d face
/// nails.
const MIN_LAP: Length = Length::inches(3.0);
const MIN_NAILS: u32 = 3;

/// What a lap finding is worded from.
#[derive(Debug, Clone, PartialEq)]
pub struct LapDetail {
    pub length: Option<Length>,
    pub nails: Option<u32>,
    pub spliced: bool,
}

pub fn check(ctx: &MemberContext, out: &mut Vec<Finding>) {
    out.extend(ctx.observations.iter().filter_map(|o| match &o.kind {
        ObservationKind::Lap {
            length,
            nails,
            spliced,
        } => Some(one(
            ctx,
            &o.id,
            LapDetail {
                length: *length,
                nails: *nails,
                spliced: *spliced,
            },
        )),
        _ => None,
    }));
}

fn one(ctx: &MemberContext, id: &Arc<str>, lap: LapDetail) -> Finding {
    let b = ctx.finding(&RULE, Some(id));
    if lap.spliced {
        return b
            .check(Check::qualitative(
                "connection over the support",
                "spliced",
                "a splice of equal strength",
                true,
            ))
            .finish(lap);
    }
    let length = match lap.length {
        Some(l) => Check::numeric(
            "lap length",
            Value::Length(l),
            Value::Length(MIN_LAP),
            Bound::AtLeast,
            ctx.units,
        ),
        None => Check::skipped(
            "lap length",
            format!("{} minimum", dim(ctx.units, MIN_LAP)),
            "lap length not measured",
        ),
    };
    let nailing = match lap.nails {
        Some(n) => Check::numeric(
            "10d face nails",
            Value::Count(n),
            Value::Count(MIN_NAILS),
            Bound::AtLeast,
            ctx.units,
        ),
        None => Check::skipped("10d face nails", "3 minimum", "nails not counted"),
    };
    b.check(length).check(nailing).finish(lap)
}

impl Wording for LapDetail {
    fn summary(&self, u: UnitSystem) -> String {
        if self.spliced {
            return "Joists spliced over the support instead of lapped".into();
        }
        format!(
            "Lap over the support: {}, {}; minimum {} and {} nails",
            self.length
                .map_or("length not measured".into(), |l| dim(u, l)),
            self.nails
                .map_or("nails not counted".into(), |n| format!("{n} nails")),
            dim_min(u, MIN_LAP),
            MIN_NAILS
        )
    }

    fn assumptions(&self, _: UnitSystem) -> Vec<String> {
        if self.spliced {
            vec!["The splice's strength was not evaluated".into()]
        } else {
            vec![]
        }
    }

    fn recommendation(&self, status: Status, u: UnitSystem) -> String {
        match status {
            _ if self.spliced => format!("Confirm the splice is of equal strength to a {} lap with three 10d nails.", dim(u, MIN_LAP)),
            Status::OverLimit => format!("Lengthen the lap or add nails (at least {} of lap and three 10d face nails), or add a splice of equal strength.", dim(u, MIN_LAP)),
            Status::NotChecked | Status::Incomplete => "Measure the lap and count the nails.".into(),
            _ => "Lap meets the minimum.".into(),
        }
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::rules::testing::*;

    fn lap(length: Option<f64>, nails: Option<u32>) -> Vec<crate::model::Observation> {
        vec![observation(ObservationKind::Lap {
            length: length.map(inches),
            nails,
            spliced: false,
        })]
    }

    // Source: IRC 2018 R502.6.1: lap at least 3 in, three 10d face nails.
    #[test]
    fn lap_and_nails() {
        let table = [
            (Some(2.5), Some(3), Status::OverLimit),
            (Some(3.0), Some(3), Status::NearLimit),
            (Some(6.0), Some(4), Status::Within),
            (Some(6.0), Some(2), Status::OverLimit),
            (Some(6.0), None, Status::Incomplete), // nails not counted
            (None, None, Status::NotChecked),
        ];
        for (length, nails, expect) in table {
            assert_eq!(
                status(check, spf_no2((2, 10), 180.0), lap(length, nails)),
                expect,
                "{length:?} {nails:?}"
            );
        }
    }
}
