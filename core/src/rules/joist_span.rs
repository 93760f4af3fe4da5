//! Joist span against the allowable span (IRC R502.3.1, Tables R502.3.1(1)/(2), by NDS
//! mechanics), with dry or wet service.

use super::shared::{dim, len, load_assumptions, lumber_assumptions};
use crate::finding::{Bound, Check, Finding, FindingBuilder, RuleInfo, Status, Value};
use crate::units::Length;
use crate::validate::MemberContext;

pub const RULE: RuleInfo = RuleInfo {
    id: "joist-span",
    title: "Joist span",
    code_section: Some("R502.3.1, Tables R502.3.1(1) and R502.3.1(2)"),
    other_source: Some("NDS 2018 3.3, 3.4, 3.5 (bending, shear, deflection)"),
};

pub fn check(ctx: &MemberContext) -> Vec<Finding> {
    if !ctx.report_span {
        return vec![];
    }
    let b = FindingBuilder::new(&RULE, ctx.edition, ctx.place(), None);
    if ctx.kind.is_engineered() {
        return vec![b.not_checked(
            format!("{}: its span is set by the maker's span tables, not the sawn-lumber tables", ctx.kind.name()),
            "Compare the span with the maker's published span table for this product, depth and spacing.",
        )];
    }
    let missing = missing_inputs(ctx);
    let (Some(result), Some(span), true) = (&ctx.span, ctx.clear_span(), missing.is_empty()) else {
        return vec![b.not_checked(format!("{} not entered", missing.join(", ")), "Measure and enter the missing values to check the span.")];
    };
    let allowable = result.allowable_rounded();
    let lumber = ctx.lumber.as_ref().expect("span computed only with lumber");
    let summary = format!(
        "{} {}, {}, at {} o.c.: clear span {} against allowable {} ({} governs{})",
        lumber.section.nominal,
        lumber.species.name(),
        lumber.grade,
        dim(ctx, ctx.framing.spacing.unwrap_or_default()),
        len(ctx, span),
        len(ctx, allowable),
        result.governing.name(),
        if ctx.is_wet() { ", wet service" } else { "" },
    );
    let mut assumptions = load_assumptions(ctx);
    assumptions.extend(lumber_assumptions(ctx));
    assumptions.push(format!(
        "Allowable span by NDS mechanics {:.1} in (bending {:.1}, deflection {:.1}, shear {:.1}); held to the nearest inch as the printed tables are",
        result.allowable_span_in, result.bending_span_in, result.deflection_span_in, result.shear_span_in
    ));
    if let Some(mc) = ctx.moisture_percent.filter(|_| ctx.is_wet()) {
        assumptions.push(format!(
            "Moisture content {mc:.0} % is over 19 %: checked in wet service (CM Fb {}, Fv {}, E {}); the code's tables assume dry service",
            result.factors.cm_fb, result.factors.cm_fv, result.factors.cm_e
        ));
    }
    vec![b
        .check(Check::numeric("clear span", Value::Length(span), Value::Length(allowable), Bound::AtMost, ctx.units))
        .summary(summary)
        .assume_all(assumptions)
        .finish(|status| recommendation(status, ctx, allowable, span))]
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

fn recommendation(status: Status, ctx: &MemberContext, allowable: Length, span: Length) -> String {
    match status {
        Status::OverLimit => format!(
            "The joists span {} more than the code allows for these loads. Refer to a licensed professional to evaluate and design a repair; options to discuss are listed.",
            len(ctx, span - allowable)
        ),
        Status::NearLimit => "Within the allowable span but close to it: note any bounce or sag, and avoid added load (tile, heavy fixtures) without evaluation.".into(),
        _ => "Within the allowable span for the loads assumed; no action for span.".into(),
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
            (166.0, Status::Within),     // 90 % of 185 is 166.5
            (167.0, Status::NearLimit),
            (185.0, Status::NearLimit),
            (185.5, Status::OverLimit),
            (192.0, Status::OverLimit),
        ];
        for (span, expect) in table {
            assert_eq!(status(check, spf_no2((2, 10), span), vec![]), expect, "span {span}");
        }
    }

    #[test]
    fn missing_values_are_named() {
        let mut framing = spf_no2((2, 10), 180.0);
        framing.spacing = None;
        framing.species = None;
        let f = &run(check, framing, vec![])[0];
        assert_eq!(f.status, Status::NotChecked);
        assert_eq!(f.not_checked_because.as_deref(), Some("species, spacing not entered"));
    }

    #[test]
    fn wet_service_is_stated() {
        let wet = crate::model::ObservationKind::Moisture { percent: 24.0, location: String::new() };
        let f = &run(check, spf_no2((2, 10), 180.0), vec![observation(wet)])[0];
        assert!(f.assumptions.iter().any(|a| a.contains("wet service")), "{:?}", f.assumptions);
        assert!(f.summary.contains("wet service"));
    }
}
