//! Side views of joists with notches, holes or sag readings, as geometry for the printer.

use super::{SideView, ViewCircle, ViewRect};
use crate::engine::Evaluation;
use crate::geometry::{hole_circle, notch_rect};
use crate::model::ObservationKind;
use crate::rules::sag_of;
use crate::units::{format_dimension, format_length};
use crate::validate::MemberContext;
use crate::Status;

/// The side view of one member, when it has something to draw and its span and depth are
/// known.
pub fn side_view(
    ctx: &MemberContext,
    area_name: &str,
    evaluation: &Evaluation,
) -> Option<SideView> {
    let (span, depth) = (ctx.clear_span()?, ctx.depth()?);
    let over = |id: &str| {
        evaluation
            .findings
            .iter()
            .any(|f| f.observation_id.as_deref() == Some(id) && f.status == Status::OverLimit)
    };
    let dim = |l| format_dimension(l, ctx.units);
    let mut view = SideView {
        title: ctx
            .place
            .location
            .strip_prefix(area_name)
            .map_or(&*ctx.place.location, |s| s.trim_start_matches(" > "))
            .to_string(),
        span_in: span.in_inches(),
        depth_in: depth.in_inches(),
        span_text: format_length(span, ctx.units),
        depth_text: dim(depth),
        notches: vec![],
        holes: vec![],
        sag: vec![],
        sag_reference_in: None,
        sag_reference_text: String::new(),
        sag_largest_text: String::new(),
    };
    for o in &ctx.observations {
        match &o.kind {
            kind @ ObservationKind::Notch {
                depth: d, length, ..
            } => {
                if let Some(r) = notch_rect(kind, depth, Some(span)) {
                    let at = format_length(crate::units::Length::inches(r.x0.max(0.0)), ctx.units);
                    let label = format!("notch {} x {} at {at}", dim(*d), dim(*length));
                    view.notches.push(ViewRect {
                        x0: r.x0,
                        x1: r.x1,
                        y0: r.y0,
                        y1: r.y1,
                        label,
                        over: over(&o.id),
                    });
                }
            }
            kind @ ObservationKind::Hole { diameter, .. } => {
                if let Some(c) = hole_circle(kind, Some(span)) {
                    let at = format_length(crate::units::Length::inches(c.x), ctx.units);
                    let label = format!("hole {} at {at}", dim(*diameter));
                    view.holes.push(ViewCircle {
                        x: c.x,
                        y: c.y,
                        r: c.r,
                        label,
                        over: over(&o.id),
                    });
                }
            }
            ObservationKind::Sag { readings, spacer } => {
                let denominator = ctx.loads.deflection_denominator;
                view.sag_reference_in = Some(span.in_inches() / denominator);
                view.sag_reference_text =
                    format!("L/{denominator:.0} = {}", dim(span / denominator));
                view.sag.extend(
                    readings
                        .iter()
                        .filter(|r| r.at <= span)
                        .map(|r| (r.at.in_inches(), sag_of(r, *spacer).in_inches())),
                );
            }
            _ => {}
        }
    }
    view.sag.sort_by(|a, b| a.0.total_cmp(&b.0));
    let largest = view.sag.iter().map(|p| p.1).fold(0.0, f64::max);
    view.sag_largest_text = dim(crate::units::Length::inches(largest));
    (!view.notches.is_empty() || !view.holes.is_empty() || !view.sag.is_empty()).then_some(view)
}
