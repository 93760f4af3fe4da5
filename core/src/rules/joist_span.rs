//! Joist span against the allowable span (IRC R502.3.1, Tables R502.3.1(1)/(2), by NDS
//! mechanics), with dry or wet service.

use super::shared::{dim, len, load_lines, LumberNotes};
use super::Detail;
use crate::finding::{Bound, Check, Finding, FindingBuilder, RuleInfo, Status, Value, Wording};
use crate::lumber::{GradeChoice, NominalSize, Species};
use crate::mechanics::Governing;
use crate::model::{MemberKind, ResolvedLoads};
use crate::units::{Length, UnitSystem};
use crate::validate::MemberContext;

pub const RULE: RuleInfo = RuleInfo {
    id: "joist-span",
    title: "Joist span",
    code_section: Some("R502.3.1, Tables R502.3.1(1) and R502.3.1(2)"),
    other_source: Some("NDS 2018 3.3, 3.4, 3.5 (bending, shear, deflection)"),
};

/// What a span finding is worded from.
#[derive(Debug, Clone, PartialEq)]
pub enum SpanDetail {
    Checked(Box<CheckedSpan>),
    Engineered(MemberKind),
}

#[derive(Debug, Clone, PartialEq)]
pub struct CheckedSpan {
    pub nominal: NominalSize,
    pub species: Species,
    pub grade: GradeChoice,
    pub spacing: Length,
    pub span: Length,
    /// As the printed tables hold it: to the nearest inch.
    pub allowable: Length,
    pub governing: Governing,
    /// Unrounded allowable, bending, deflection and shear spans, inches.
    pub mechanics: [f64; 4],
    pub loads: ResolvedLoads,
    pub lumber: LumberNotes,
    /// Moisture content and the wet-service factors on Fb, Fv and E, when wet.
    pub wet: Option<(f64, [f64; 3])>,
}

pub fn check(ctx: &MemberContext, out: &mut Vec<Finding>) {
    if !ctx.report_span {
        return;
    }
    let b = FindingBuilder::new(&RULE, ctx, None);
    if ctx.kind.is_engineered() {
        out.push(b.not_checked(
            "its span is set by the maker's span tables, not the sawn-lumber tables",
            Detail::JoistSpan(SpanDetail::Engineered(ctx.kind)),
        ));
        return;
    }
    let missing = missing_inputs(ctx);
    let (Some(result), Some(span), Some(lumber), Some(spacing), true) = (
        &ctx.span,
        ctx.clear_span(),
        &ctx.lumber,
        ctx.framing.spacing,
        missing.is_empty(),
    ) else {
        out.push(b.not_checked(
            format!("{} not entered", missing.join(", ")),
            Detail::Missing("Measure and enter the missing values to check the span."),
        ));
        return;
    };
    let allowable = result.allowable_rounded();
    let f = &result.factors;
    let detail = CheckedSpan {
        nominal: lumber.section.nominal,
        species: lumber.species,
        grade: lumber.grade,
        spacing,
        span,
        allowable,
        governing: result.governing,
        mechanics: [
            result.allowable_span_in,
            result.bending_span_in,
            result.deflection_span_in,
            result.shear_span_in,
        ],
        loads: ctx.loads,
        lumber: LumberNotes::of(ctx),
        wet: ctx
            .moisture_percent
            .filter(|_| ctx.is_wet())
            .map(|mc| (mc, [f.cm_fb, f.cm_fv, f.cm_e])),
    };
    out.push(
        b.check(Check::numeric(
            "clear span",
            Value::Length(span),
            Value::Length(allowable),
            Bound::AtMost,
            ctx.units,
        ))
        .finish(Detail::JoistSpan(SpanDetail::Checked(Box::new(detail)))),
    );
}

fn missing_inputs(ctx: &MemberContext) -> Vec<&'static str> {
    let mut missing: Vec<&'static str> = ctx.lumber_missing.clone();
    if ctx.framing.spacing.is_none() {
        missing.push("spacing");
    }
    if ctx.clear_span().is_none() {
        missing.push("clear span");
    }
    missing
}

impl Wording for SpanDetail {
    fn summary(&self, u: UnitSystem) -> String {
        match self {
            SpanDetail::Engineered(kind) => format!(
                "Not checked: {} spans come from the maker's span tables",
                kind.name()
            ),
            SpanDetail::Checked(d) => format!(
                "{} {}, {}, at {} o.c.: clear span {} against allowable {} ({} governs{})",
                d.nominal,
                d.species.name(),
                d.grade,
                dim(u, d.spacing),
                len(u, d.span),
                len(u, d.allowable),
                d.governing.name(),
                if d.wet.is_some() { ", wet service" } else { "" },
            ),
        }
    }

    fn assumptions(&self, u: UnitSystem) -> Vec<String> {
        let SpanDetail::Checked(d) = self else {
            return vec![];
        };
        let mut out = load_lines(&d.loads);
        out.extend(d.lumber.lines(u));
        let [all, bending, deflection, shear] = d.mechanics;
        out.push(format!(
            "Allowable span by NDS mechanics {all:.1} in (bending {bending:.1}, deflection {deflection:.1}, shear {shear:.1}); held to the nearest inch as the printed tables are"
        ));
        if let Some((mc, [fb, fv, e])) = d.wet {
            out.push(format!(
                "Moisture content {mc:.0} % is over 19 %: checked in wet service (CM Fb {fb}, Fv {fv}, E {e}); the code's tables assume dry service"
            ));
        }
        out
    }

    fn recommendation(&self, status: Status, u: UnitSystem) -> String {
        match (self, status) {
            (SpanDetail::Engineered(_), _) => "Compare the span with the maker's published span table for this product, depth and spacing.".into(),
            (SpanDetail::Checked(d), Status::OverLimit) => format!(
                "The joists span {} more than the code allows for these loads. Refer to a licensed professional to evaluate and design a repair; options to discuss are listed.",
                len(u, d.span - d.allowable)
            ),
            (_, Status::NearLimit) => "Within the allowable span but close to it: note any bounce or sag, and avoid added load (tile, heavy fixtures) without evaluation.".into(),
            _ => "Within the allowable span for the loads assumed; no action for span.".into(),
        }
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::rules::testing::*;

    // Source: IRC 2015 Table R502.3.1(2): SPF No. 2 2x10 at 16 in, 40 psf live, 10 psf dead:
    // 15-5 (185 in). Under, at, just over and well over the printed span.
    #[test]
    fn spf_no2_2x10_at_16_against_15_ft_5_in() {
        let table = [
            (166.0, Status::Within), // 90 % of 185 is 166.5
            (167.0, Status::NearLimit),
            (185.0, Status::NearLimit),
            (185.5, Status::OverLimit),
            (192.0, Status::OverLimit),
        ];
        for (span, expect) in table {
            assert_eq!(
                status(check, spf_no2((2, 10), span), vec![]),
                expect,
                "span {span}"
            );
        }
    }

    #[test]
    fn missing_values_are_named() {
        let mut framing = spf_no2((2, 10), 180.0);
        framing.spacing = None;
        framing.species = None;
        let f = &run(check, framing, vec![])[0];
        assert_eq!(f.status, Status::NotChecked);
        assert_eq!(
            f.not_checked_because.as_deref(),
            Some("species, spacing not entered")
        );
        assert_eq!(f.summary(), "Not checked: species, spacing not entered");
    }

    #[test]
    fn wet_service_is_stated() {
        let wet = crate::model::ObservationKind::Moisture {
            percent: 24.0,
            location: String::new(),
        };
        let f = &run(check, spf_no2((2, 10), 180.0), vec![observation(wet)])[0];
        assert!(
            f.assumptions().iter().any(|a| a.contains("wet service")),
            "{:?}",
            f.assumptions()
        );
        assert!(f.summary().contains("wet service"));
    }
}
