//! Text pieces several rules share: loads and lumber assumptions, lengths in the user's units.

use crate::lumber::{GradeChoice, UNKNOWN_GRADE_DEFAULT};
use crate::units::{format_dimension, format_length, Length};
use crate::validate::MemberContext;

/// A length in the inspection's units.
pub fn len(ctx: &MemberContext, length: Length) -> String {
    format_length(length, ctx.units)
}

/// A member dimension or short length in the inspection's units (`9-1/4"`).
pub fn dim(ctx: &MemberContext, length: Length) -> String {
    format_dimension(length, ctx.units)
}

/// The assumptions behind any computation with this member's lumber and loads.
pub fn lumber_assumptions(ctx: &MemberContext) -> Vec<String> {
    let mut out = Vec::new();
    if let Some(lumber) = &ctx.lumber {
        if lumber.grade == GradeChoice::NoStampVisible {
            out.push(format!(
                "No grade stamp visible: designed as {} {}, a conservative default; a visible stamp may allow more",
                lumber.species.name(),
                UNKNOWN_GRADE_DEFAULT.name()
            ));
        }
        if lumber.section.rough_sawn {
            out.push(format!(
                "Measured section {} x {} used (graded and size-factored as {}); design values of dressed lumber of the same grade assumed",
                dim(ctx, lumber.section.thickness),
                dim(ctx, lumber.section.depth),
                lumber.section.nominal
            ));
        }
    }
    if let Some(span) = &ctx.span {
        if span.design.from_memory {
            out.push(format!("Design values: {} (a value in this row is from memory, not a seen copy)", span.design.source_short()));
        }
    }
    out
}

/// The load assumptions of the span computation.
pub fn load_assumptions(ctx: &MemberContext) -> Vec<String> {
    let l = &ctx.loads;
    vec![
        format!(
            "Live load {} psf ({}, Table R301.5); dead load {} psf ({})",
            l.live.0,
            l.room_use.describe(),
            l.dead.0,
            if l.heavy_finish { "heavy finishes" } else { "light finishes" }
        ),
        format!("Live-load deflection limited to L/{} (Table R301.7)", l.deflection_denominator),
        "Simple span, uniformly loaded, repetitive members (Cr 1.15 at 24 in or less), normal load duration (CD 1.0)".into(),
    ]
}
