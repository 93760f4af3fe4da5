//! Options to discuss for an over-spanned joist, computed, not prescribed, and each one
//! buildable on what is there: where a mid-span support would have to go, sistering each
//! joist full length at the same layout, and the smallest deeper size at the same layout.

use super::shared::len;
use crate::finding::{Basis, Finding, RuleInfo, Status, Wording};
use crate::lumber::{GradeChoice, NominalSize, Species};
use crate::mechanics::{allowable_span, SpanInput};
use crate::units::{Length, UnitSystem};
use crate::validate::MemberContext;

pub const RULE: RuleInfo = RuleInfo {
    id: "span-options",
    title: "Options to discuss for an over-span",
    code_section: Some("R502.3.1"),
    other_source: Some("NDS 2018 3.3-3.5 (computed alternatives)"),
    basis: Basis::Reference,
};

/// The options, as data, for the app and the report.
#[derive(Debug, Clone, PartialEq)]
pub struct SpanOptions {
    /// The longest span that passes (rounded as the tables are).
    pub longest_passing: Length,
    /// A support line anywhere in this range from support A makes both spans pass.
    pub support_zone: Option<(Length, Length)>,
    pub smallest_size: Option<(NominalSize, Length)>,
    /// The allowable span with each joist sistered full length by one of the same size and
    /// grade (two plies at the same layout), and whether it reaches the span.
    pub sistered: Option<(Length, bool)>,
}

/// Computes the options for a sawn member whose clear span is over its allowable span.
pub fn options(ctx: &MemberContext) -> Option<SpanOptions> {
    let (result, span, lumber, spacing) = (
        ctx.span.as_ref()?,
        ctx.clear_span()?,
        ctx.lumber.as_ref()?,
        ctx.framing.spacing?,
    );
    let longest = result.allowable_rounded();
    if span <= longest {
        return None;
    }
    let support_zone = (span <= longest * 2.0).then(|| (span - longest, longest));
    let base = SpanInput {
        species: lumber.species,
        grade: lumber.grade.grade_for_design(),
        section: lumber.section,
        spacing,
        live: ctx.loads.live,
        dead: ctx.loads.dead,
        deflection_denominator: ctx.loads.deflection_denominator,
        wet_service: ctx.is_wet(),
        incised: ctx.incised,
        duration: Default::default(),
        repetitive: true,
    };
    let passes = |input: &SpanInput| {
        allowable_span(input)
            .map(|r| r.allowable_rounded())
            .filter(|a| span <= *a)
    };
    let smallest_size = NominalSize::all_standard_depths(lumber.section.nominal.thickness)
        .filter(|n| n.depth > lumber.section.nominal.depth)
        .find_map(|n| {
            passes(&SpanInput {
                section: n.dressed_section(),
                ..base.clone()
            })
            .map(|a| (n, a))
        });
    let two_plies = crate::lumber::Section {
        thickness: lumber.section.thickness * 2.0,
        ..lumber.section
    };
    let sistered = allowable_span(&SpanInput {
        section: two_plies,
        ..base.clone()
    })
    .map(|r| r.allowable_rounded())
    .map(|a| (a, span <= a));
    Some(SpanOptions {
        longest_passing: longest,
        support_zone,
        smallest_size,
        sistered,
    })
}

/// What an options finding is worded from.
#[derive(Debug, Clone, PartialEq)]
pub struct OptionsDetail {
    pub span: Length,
    pub nominal: NominalSize,
    pub species: Species,
    pub grade: GradeChoice,
    pub options: SpanOptions,
}

pub fn check(ctx: &MemberContext, out: &mut Vec<Finding>) {
    if !ctx.report_span || ctx.kind.is_engineered() {
        return;
    }
    let (Some(o), Some(lumber), Some(span)) = (options(ctx), &ctx.lumber, ctx.clear_span()) else {
        return;
    };
    let detail = OptionsDetail {
        span,
        nominal: lumber.section.nominal,
        species: lumber.species,
        grade: lumber.grade,
        options: o,
    };
    out.push(ctx.finding(&RULE, None).not_checked(
        "options to discuss for the over-span above, computed, not prescribed",
        detail,
    ));
}

impl Wording for OptionsDetail {
    fn summary(&self, u: UnitSystem) -> String {
        format!(
            "Options to discuss for a clear span of {} where {} is allowed",
            len(u, self.span),
            len(u, self.options.longest_passing)
        )
    }

    fn options(&self, u: UnitSystem) -> Vec<String> {
        let o = &self.options;
        let thickness = self.nominal.thickness;
        vec![
            match o.support_zone {
                Some((from, to)) => format!(
                    "A beam or wall across the joists anywhere from {} to {} from support A would leave both spans within {}",
                    len(u, from),
                    len(u, to),
                    len(u, o.longest_passing)
                ),
                None => format!("Supports at most {} apart would be needed (more than one)", len(u, o.longest_passing)),
            },
            match o.smallest_size {
                Some((size, allowable)) => {
                    format!("Replacing with {size} {}, {}, at the same layout allows {}", self.species.name(), self.grade, len(u, allowable))
                }
                None => format!("No {thickness}x size up to {thickness}x14 at this spacing reaches the span"),
            },
            match o.sistered {
                Some((allowable, true)) => format!("Sistering each joist full length with a {} of the same grade (two plies at the same layout) allows {}", self.nominal, len(u, allowable)),
                Some((allowable, false)) => format!("Sistering each joist full length with a {} would allow only {}: not enough alone", self.nominal, len(u, allowable)),
                None => "Sistering could not be computed for this lumber".into(),
            },
        ]
    }

    fn assumptions(&self, _: UnitSystem) -> Vec<String> {
        vec!["Same species, grade, layout and loads; each option re-checked by the same computation as a simple span. A sistered pair is counted as two full-length plies acting together, which depends on its fastening; a joist continuous over a new support behaves differently: the design is for a licensed professional.".into()]
    }

    fn recommendation(&self, _: Status, _: UnitSystem) -> String {
        "Discuss these options with a licensed professional, who designs the repair.".into()
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::rules::testing::*;

    // Source: IRC 2015 Table R502.3.1(2), SPF No. 2 at 40/10 psf: 2x10 at 16 in 15-5 (185 in),
    // so a 16-0 (192 in) span needs a support between 7 in and 185 in from support A.
    // The 2x12 result follows from the same mechanics (tests/ checks the mechanics against
    // every printed cell). Two plies of 2x10 (b = 3 in) double S, I and A: bending rises by
    // sqrt(2) to 261 in, deflection by 2^(1/3) from 188.03 to 236.9 in, which governs: 237 in.
    #[test]
    fn options_for_a_16_ft_2x10() {
        let inspection = inspection(spf_no2((2, 10), 192.0), vec![], Default::default());
        let (ctxs, _) = crate::validate::members(&inspection);
        let o = options(&ctxs[0]).unwrap();
        assert_eq!(o.longest_passing, inches(185.0));
        assert_eq!(o.support_zone, Some((inches(7.0), inches(185.0))));
        assert_eq!(o.smallest_size.map(|s| s.0), Some(NominalSize::new(2, 12)));
        let (sistered, reaches) = o.sistered.unwrap();
        assert!(reaches);
        assert!((sistered.in_inches() - 237.0).abs() < 1e-9, "{sistered:?}");
    }

    #[test]
    fn no_options_when_within() {
        assert!(run(check, spf_no2((2, 10), 180.0), vec![]).is_empty());
        let f = run(check, spf_no2((2, 10), 192.0), vec![]);
        assert_eq!(f.len(), 1);
        assert!(
            f[0].options()[1].starts_with("Replacing with 2x12"),
            "{:?}",
            f[0].options()
        );
    }

    #[test]
    fn very_long_spans_need_several_supports() {
        let f = run(check, spf_no2((2, 10), 400.0), vec![]);
        let options = f[0].options();
        assert!(options[0].contains("more than one"), "{options:?}");
        assert!(options[1].contains("No 2x size"), "{options:?}");
    }
}
