//! Joist span against the allowable span (IRC R502.3.1, Tables R502.3.1(1)/(2), by NDS
//! mechanics), with dry or wet service.

use super::shared::{dim, len, load_lines, LumberNotes};
use crate::finding::{Basis, Bound, Check, Finding, Missing, RuleInfo, Status, Value, Wording};
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
    basis: Basis::CodeLimit,
};

/// Porch and deck joists, open to the weather: the deck joist table and wet service.
pub const DECK_RULE: RuleInfo = RuleInfo {
    id: "deck-joist-span",
    title: "Porch or deck joist span",
    code_section: Some("R507.6, Table R507.6"),
    other_source: Some(
        "NDS 2018 3.3, 3.4, 3.5; Supplement Table 4A (wet service); Table 4.3.8 (incising)",
    ),
    basis: Basis::CodeLimit,
};

/// Source: IRC 2018 Table R507.6 footnote: joist length limited to 18 ft for footing design
/// (the table's longest cells read 18-0).
pub const DECK_JOIST_MAX_IN: f64 = 216.0;

/// What a span finding is worded from.
#[derive(Debug, Clone, PartialEq)]
pub enum SpanDetail {
    Checked(Box<CheckedSpan>),
    Engineered(MemberKind),
}

/// How a porch or deck joist was computed.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Exterior {
    pub incised: bool,
    /// The table's 18 ft limit governs.
    pub length_limited: bool,
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
    /// True when the wet reading is the run's (the joist has none of its own).
    pub wet_from_run: bool,
    /// The spacing as taped, where it was held to a standard layout.
    pub spacing_taped: Option<Length>,
    /// Porch or deck framing: wet service always, incised unless southern pine.
    pub exterior: Option<Exterior>,
    /// Why the case is outside the printed span tables (empty: within them, a code limit).
    pub outside_tables: Vec<&'static str>,
}

/// Why a checked span is outside the printed tables, which R502.3 leaves to engineering
/// references: each reason in a few words. Empty when the tables cover the case.
/// Source: IRC 2018 R502.3 and Tables R502.3.1(1)/(2): 2x6 to 2x12; DFL, HF, SP, SPF in
/// SS, No. 1, No. 2, No. 3; 12, 16, 19.2 and 24 in; 30 or 40 psf live with 10 or 20 psf dead;
/// L/360; dry service (the tables' footnotes), dressed sizes.
pub fn outside_tables(ctx: &MemberContext) -> Vec<&'static str> {
    if ctx.exterior {
        return outside_deck_tables(ctx);
    }
    let mut out = Vec::new();
    let Some(lumber) = &ctx.lumber else {
        return out;
    };
    let nominal = lumber.section.nominal;
    if nominal.thickness != 2 {
        out.push("members thicker than nominal 2 in");
    }
    if !(6..=12).contains(&nominal.depth) {
        out.push(if nominal.depth > 12 {
            "joists deeper than 2x12"
        } else {
            "joists shallower than 2x6"
        });
    }
    if let Some(spacing) = ctx.framing.spacing {
        if !crate::validate::STANDARD_LAYOUTS
            .iter()
            .any(|l| (spacing.in_inches() - l).abs() < 1e-9)
        {
            out.push("a spacing other than 12, 16, 19.2 or 24 in");
        }
    }
    let (live, dead) = (ctx.loads.live.0, ctx.loads.dead.0);
    if live != 30.0 && live != 40.0 {
        out.push("a live load other than 30 or 40 psf");
    }
    if dead != 10.0 && dead != 20.0 {
        out.push("a dead load other than 10 or 20 psf");
    }
    if ctx.loads.deflection_denominator != 360.0 {
        out.push("a deflection limit other than L/360");
    }
    if lumber.section.rough_sawn {
        out.push("a measured (rough-sawn) section");
    }
    if ctx.is_wet() {
        out.push("wet service");
    }
    out
}

pub fn check(ctx: &MemberContext, out: &mut Vec<Finding>) {
    if !ctx.report_span {
        return;
    }
    let rule = if ctx.exterior { &DECK_RULE } else { &RULE };
    let b = ctx.finding(rule, None);
    if ctx.kind.is_engineered() {
        out.push(b.not_checked(
            "its span is set by the maker's span tables, not the sawn-lumber tables",
            SpanDetail::Engineered(ctx.kind),
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
            missing_text(ctx, &missing),
            Missing("Measure and enter the missing values to check the span."),
        ));
        return;
    };
    let outside = outside_tables(ctx);
    let length_limited =
        ctx.exterior && outside.is_empty() && result.allowable_span_rounded_in > DECK_JOIST_MAX_IN;
    let allowable = if length_limited {
        Length::inches(DECK_JOIST_MAX_IN)
    } else {
        result.allowable_rounded()
    };
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
            .filter(|_| ctx.is_wet() && !ctx.exterior)
            .map(|mc| (mc, [f.cm_fb, f.cm_fv, f.cm_e])),
        exterior: ctx.exterior.then_some(Exterior {
            incised: ctx.incised,
            length_limited,
        }),
        wet_from_run: ctx.moisture_from_run,
        spacing_taped: ctx.spacing_taped,
        outside_tables: outside,
    };
    let basis = if detail.outside_tables.is_empty() {
        Basis::CodeLimit
    } else {
        Basis::Reference
    };
    let mut b = b.basis(basis).check(Check::numeric(
        "clear span",
        Value::Length(span),
        Value::Length(allowable),
        Bound::AtMost,
        ctx.units,
    ));
    if let Some(sign) = ctx.wetting_unmeasured {
        b = b.check(Check::skipped(
            "moisture content",
            "19 % (dry service)",
            format!("{sign} was recorded in this area and no moisture reading was taken on these joists, so wet service is not ruled out"),
        ));
    }
    out.push(b.finish(SpanDetail::Checked(Box::new(detail))));
}

/// Why a porch or deck joist is outside the deck joist table.
/// Source: IRC 2018 Table R507.6 and its footnotes: No. 2 grade of southern pine, Douglas
/// fir-larch, hem-fir and spruce-pine-fir (and redwood and cedars, not carried here), 2x6 to
/// 2x12 at 12, 16 or 24 in, 40 psf live and 10 psf dead, L/360, wet service, incised except
/// southern pine.
pub fn outside_deck_tables(ctx: &MemberContext) -> Vec<&'static str> {
    let mut out = Vec::new();
    let Some(lumber) = &ctx.lumber else {
        return out;
    };
    let nominal = lumber.section.nominal;
    if nominal.thickness != 2 || !(6..=12).contains(&nominal.depth) {
        out.push("a size other than 2x6 to 2x12");
    }
    if lumber.grade != GradeChoice::Stamped(crate::lumber::Grade::No2) {
        out.push("a grade other than No. 2");
    }
    if let Some(spacing) = ctx.framing.spacing {
        if ![12.0, 16.0, 24.0]
            .iter()
            .any(|l| (spacing.in_inches() - l).abs() < 1e-9)
        {
            out.push("a spacing other than 12, 16 or 24 in");
        }
    }
    if ctx.loads.live.0 != 40.0 || ctx.loads.dead.0 != 10.0 {
        out.push("loads other than 40 psf live and 10 psf dead");
    }
    if ctx.loads.deflection_denominator != 360.0 {
        out.push("a deflection limit other than L/360");
    }
    if lumber.section.rough_sawn {
        out.push("a measured (rough-sawn) section");
    }
    if !ctx.incised && lumber.species != Species::SouthernPine {
        out.push("lumber not incised");
    }
    out
}

/// What is missing, in words: refused entries said as refused, never as "not entered".
pub fn missing_text(ctx: &MemberContext, missing: &[&'static str]) -> String {
    let (refused, absent): (Vec<&str>, Vec<&str>) =
        missing.iter().partition(|m| ctx.refused.contains(m));
    let mut parts = Vec::new();
    if !absent.is_empty() {
        parts.push(format!("{} not entered", absent.join(", ")));
    }
    if !refused.is_empty() {
        parts.push(format!(
            "{} entered but out of range (see the entries that could not be used)",
            refused.join(", ")
        ));
    }
    parts.join("; ")
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
                crate::units::format_spacing(d.spacing, u),
                len(u, d.span),
                len(u, d.allowable),
                d.governing.name(),
                if d.wet.is_some() || d.exterior.is_some() {
                    ", wet service"
                } else {
                    ""
                },
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
        if let Some(taped) = d.spacing_taped {
            out.push(format!(
                "Spacing taped at {} is held to the standard {} layout (within framing tolerance)",
                dim(u, taped),
                crate::units::format_spacing(d.spacing, u)
            ));
        }
        if let Some(ext) = d.exterior {
            out.push(format!(
                "Porch or deck framing, open to the weather: wet service (CM on Fb, Fv and E){}, as the deck joist table assumes",
                if ext.incised {
                    " and incising for preservative treatment (Ci 0.80 on Fb and Fv, 0.95 on E)"
                } else {
                    ""
                }
            ));
            if ext.length_limited {
                out.push("The deck joist table limits joist spans to 18 ft (for the footings); mechanics alone would allow more".into());
            }
        }
        if let Some((mc, [fb, fv, e])) = d.wet {
            out.push(format!(
                "A moisture reading of {mc:.0} %{} is over 19 %: checked in wet service (CM Fb {fb}, Fv {fv}, E {e}) as a precaution; one pin reading shows the wood is wet now, not that it stays wet, and the code's tables assume dry service",
                if d.wet_from_run { " taken on the run" } else { "" }
            ));
        }
        if !d.outside_tables.is_empty() {
            out.push(format!(
                "Outside the code's printed {} ({}): such spans are left to engineering references, so the allowable span is an NDS computation, not a code limit",
                if d.exterior.is_some() { "deck joist table" } else { "span tables" },
                d.outside_tables.join(", ")
            ));
        }
        out
    }

    fn recommendation(&self, status: Status, u: UnitSystem) -> String {
        match (self, status) {
            (SpanDetail::Engineered(_), _) => "Compare the span with the maker's published span table for this product, depth and spacing.".into(),
            (SpanDetail::Checked(d), Status::OverLimit) if d.outside_tables.is_empty() => format!(
                "The joists span {} more than the code allows for these loads. Refer to a licensed professional to evaluate and design a repair; options to discuss are listed.",
                len(u, d.span - d.allowable)
            ),
            (SpanDetail::Checked(d), Status::OverLimit) => format!(
                "The joists span {} more than NDS mechanics allow for these loads (an engineering reference; the code's tables do not cover this case). Refer to a licensed professional to evaluate and design a repair; options to discuss are listed.",
                len(u, d.span - d.allowable)
            ),
            (_, Status::NearLimit) => "Within the allowable span but close to it: note any bounce or sag, and avoid added load (tile, heavy fixtures) without evaluation.".into(),
            (SpanDetail::Checked(d), Status::Within) if !d.outside_tables.is_empty() => "Within the span NDS mechanics allow for the loads assumed (an engineering reference); no action for span.".into(),
            (_, Status::Within) => "Within the allowable span of the code's tables for the loads assumed; no action for span.".into(),
            _ => String::new(),
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

    // Source: IRC 2018 R502.3 and Tables R502.3.1(1)/(2): 2x6 to 2x12 at 12, 16, 19.2 or
    // 24 in, 30 or 40 psf live with 10 or 20 psf dead, L/360, dry. Anything else is computed
    // by NDS mechanics as an engineering reference, and says so.
    #[test]
    fn spans_outside_the_printed_tables_are_a_reference() {
        let basis_of = |framing: crate::model::Framing, loads: crate::model::LoadSettings| {
            let i = inspection(framing, vec![], loads);
            let (ctxs, _) = crate::validate::members(&i);
            let mut out = Vec::new();
            check(&ctxs[0], &mut out);
            (out[0].basis, outside_tables(&ctxs[0]))
        };
        let plain = Default::default();
        assert_eq!(
            basis_of(spf_no2((2, 10), 150.0), plain),
            (Basis::CodeLimit, vec![])
        );
        assert_eq!(basis_of(spf_no2((2, 12), 150.0), plain).0, Basis::CodeLimit);
        let (basis, why) = basis_of(spf_no2((2, 14), 150.0), plain);
        assert_eq!(
            (basis, why),
            (Basis::Reference, vec!["joists deeper than 2x12"])
        );
        let mut wide = spf_no2((2, 10), 150.0);
        wide.spacing = Some(inches(32.0));
        assert_eq!(
            basis_of(wide, plain).1,
            vec!["a spacing other than 12, 16, 19.2 or 24 in"]
        );
        let fifty = crate::model::LoadSettings {
            live_psf: Some(50.0),
            ..Default::default()
        };
        assert_eq!(
            basis_of(spf_no2((2, 10), 150.0), fifty).1,
            vec!["a live load other than 30 or 40 psf"]
        );
        let mut thick = spf_no2((4, 10), 150.0);
        thick.spacing = Some(inches(16.0));
        assert_eq!(basis_of(thick, plain).0, Basis::Reference);
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
