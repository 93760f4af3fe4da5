//! Sag read along a line between the bearings, compared with the L/360 floor reference of
//! IRC Table R301.7, worded for what it is: a reference, not a limit on long-term sag.

use super::shared::{dim, dim_max, len};
use crate::finding::{Basis, Bound, Check, Finding, Missing, RuleInfo, Status, Value, Wording};
use crate::model::{ObservationKind, SagReading};
use crate::units::{Length, UnitSystem};
use crate::validate::MemberContext;
use std::sync::Arc;

pub const RULE: RuleInfo = RuleInfo {
    id: "sag-reading",
    title: "Measured sag against the floor deflection reference",
    code_section: Some("Table R301.7 (reference)"),
    other_source: None,
    basis: Basis::Reference,
};

/// The largest sag of a set of readings, where it was read, and span / sag.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct SagSummary {
    pub largest: Length,
    pub at: Length,
    /// Span divided by the largest sag (the n of L/n); infinite when there is no sag.
    pub span_over_sag: f64,
}

/// Sag of each reading: the reading itself, or the spacer less the gap read.
pub fn sag_of(reading: &SagReading, spacer: Option<Length>) -> Length {
    match spacer {
        Some(s) => Length::inches((s.in_inches() - reading.offset.in_inches()).max(0.0)),
        None => reading.offset,
    }
}

/// The largest sag among readings inside the span.
pub fn summarize(
    readings: &[SagReading],
    spacer: Option<Length>,
    span: Length,
) -> Option<SagSummary> {
    readings
        .iter()
        .filter(|r| r.at <= span)
        .map(|r| (sag_of(r, spacer), r.at))
        .max_by(|a, b| a.0.in_inches().total_cmp(&b.0.in_inches()))
        .map(|(largest, at)| SagSummary {
            largest,
            at,
            span_over_sag: span / largest,
        })
}

pub fn check(ctx: &MemberContext, out: &mut Vec<Finding>) {
    out.extend(ctx.observations.iter().filter_map(|o| match &o.kind {
        ObservationKind::Sag { readings, spacer } => Some(one(ctx, &o.id, readings, *spacer)),
        _ => None,
    }));
}

/// What a sag finding is worded from.
#[derive(Debug, Clone, PartialEq)]
pub struct SagDetail {
    pub sag: SagSummary,
    pub span: Length,
    /// The n of the L/n reference.
    pub denominator: f64,
    pub readings: usize,
}

fn one(
    ctx: &MemberContext,
    id: &Arc<str>,
    readings: &[SagReading],
    spacer: Option<Length>,
) -> Finding {
    let b = ctx.finding(&RULE, Some(id));
    let Some(span) = ctx.clear_span() else {
        return b.not_checked(
            "clear span not entered",
            Missing("Enter the clear span to compare the sag with L/360."),
        );
    };
    let Some(sag) = summarize(readings, spacer, span) else {
        return b.not_checked(
            "no sag readings inside the span",
            Missing("Read offsets from the line at several points, including mid-span."),
        );
    };
    let denominator = ctx.loads.deflection_denominator;
    let detail = SagDetail {
        sag,
        span,
        denominator,
        readings: readings.len(),
    };
    b.check(Check::numeric(
        "largest sag",
        Value::Length(sag.largest),
        Value::Length(span / denominator),
        Bound::AtMost,
        ctx.units,
    ))
    .finish(detail)
}

impl Wording for SagDetail {
    fn summary(&self, u: UnitSystem) -> String {
        let ratio = if self.sag.span_over_sag.is_finite() {
            format!("L/{:.0}", self.sag.span_over_sag)
        } else {
            "no sag".into()
        };
        format!(
            "Largest sag {} at {} from support A ({ratio}) against the L/{:.0} reference of {} for a {} span",
            dim(u, self.sag.largest),
            len(u, self.sag.at),
            self.denominator,
            dim_max(u, self.span / self.denominator),
            len(u, self.span)
        )
    }

    fn assumptions(&self, _: UnitSystem) -> Vec<String> {
        vec![
            format!(
                "L/{:.0} in Table R301.7 limits the calculated deflection under live load; a measured sag also holds creep, shrinkage and how the joist was installed, so this comparison is a reference, not a code violation",
                self.denominator
            ),
            format!(
                "{} along a line stretched between the bearings",
                match self.readings {
                    1 => "1 reading".to_string(),
                    n => format!("{n} readings"),
                }
            ),
        ]
    }

    fn recommendation(&self, status: Status, _: UnitSystem) -> String {
        match status {
            Status::OverLimit => "The sag is more than the L/360 reference. Long-term sag can come from over-span, notching, decay, added load or a removed support: have the cause evaluated by a licensed professional before any jacking or repair.".into(),
            Status::NearLimit => "The sag is close to the L/360 reference; re-measure over time to see whether it is growing.".into(),
            _ => "The sag is small compared with the L/360 reference.".into(),
        }
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::rules::testing::*;

    fn readings(offsets: &[(f64, f64)]) -> Vec<crate::model::Observation> {
        let readings = offsets
            .iter()
            .map(|&(at, offset)| SagReading {
                at: inches(at),
                offset: inches(offset),
            })
            .collect();
        vec![observation(ObservationKind::Sag {
            readings,
            spacer: None,
        })]
    }

    // Source: IRC 2018 Table R301.7, floors L/360. A 180 in span: L/360 = 0.5 in.
    #[test]
    fn against_l_over_360() {
        let table = [
            (0.25, Status::Within),
            (0.45, Status::NearLimit),
            (0.5, Status::NearLimit),
            (0.5625, Status::OverLimit),
        ];
        for (offset, expect) in table {
            let obs = readings(&[(45.0, offset / 2.0), (90.0, offset), (135.0, offset / 3.0)]);
            assert_eq!(
                status(check, spf_no2((2, 10), 180.0), obs),
                expect,
                "{offset}"
            );
        }
    }

    #[test]
    fn largest_and_ratio() {
        let r = [
            SagReading {
                at: inches(60.0),
                offset: inches(0.25),
            },
            SagReading {
                at: inches(90.0),
                offset: inches(0.75),
            },
        ];
        let s = summarize(&r, None, inches(180.0)).unwrap();
        assert_eq!(
            (s.largest, s.at, s.span_over_sag),
            (inches(0.75), inches(90.0), 240.0)
        );
        // Spacer blocks of 1-1/2 in: a gap of 3/4 in read at mid-span is 3/4 in of sag.
        let gap = [SagReading {
            at: inches(90.0),
            offset: inches(0.75),
        }];
        assert_eq!(
            summarize(&gap, Some(inches(1.5)), inches(180.0))
                .unwrap()
                .largest,
            inches(0.75)
        );
        let f = &run(check, spf_no2((2, 10), 180.0), readings(&[(90.0, 0.75)]))[0];
        assert!(f.summary().contains("L/240"), "{}", f.summary());
    }

    /// A reading beyond the clear span cannot be what was meant: the readings are an input
    /// problem (`validate::observation_problem`), not a finding from the rest.
    #[test]
    fn readings_past_the_span_are_an_input_problem() {
        assert!(run(
            check,
            spf_no2((2, 10), 180.0),
            readings(&[(90.0, 0.25), (400.0, 3.0)]),
        )
        .is_empty());
    }
}
