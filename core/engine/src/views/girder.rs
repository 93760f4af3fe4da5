//! The side view of a girder line for the report: ends and posts where they stand, each span
//! with its length and use (over marked), the load the joists bring, and ply joints.

use super::{GirderView, SpanMark, SupportMark};
use crate::finding::{Finding, Status, Value};
use crate::load_path::{GirderBearingDetail, GirderContext, StrengthDetail};
use crate::rules::shared::{dim, len};
use crate::units::UnitSystem;

/// The view of one girder line, from its context and the inspection's findings.
pub fn girder_view(g: &GirderContext, findings: &[Finding]) -> GirderView {
    let u = g.common.units;
    let last = g.supports.last().map_or(0.0, |s| s.at.in_inches());
    let end_b_known = g.line.length.is_some();
    let length_in = if end_b_known {
        last
    } else {
        last + (last * 0.15).max(24.0)
    };
    let over_at = |member: &str| {
        findings.iter().any(|f| {
            &*f.place.member_id == member
                && matches!(f.status, Status::OverLimit | Status::ToEvaluate)
        })
    };
    let end_over = |name: &str| {
        findings.iter().any(|f| {
            &*f.place.member_id == g.line.id.as_str()
                && f.status == Status::OverLimit
                && f.detail_as::<GirderBearingDetail>()
                    .is_some_and(|b| b.at == name)
        })
    };
    let supports = g
        .supports
        .iter()
        .map(|s| {
            let bearing = match (s.end, s.post) {
                (_, Some(p)) => p.bearing.map(|b| dim(u, b)),
                (Some(crate::model::End::A), None) => {
                    g.line.end_a.and_then(|b| b.length).map(|b| dim(u, b))
                }
                (_, None) => g.line.end_b.and_then(|b| b.length).map(|b| dim(u, b)),
            };
            SupportMark {
                x: s.at.in_inches(),
                is_post: s.post.is_some(),
                label: s.name(),
                load_text: s
                    .reaction_lb
                    .map(|r| Value::Pounds(r).text(u))
                    .unwrap_or_default(),
                bearing_text: bearing.map(|b| format!("bears {b}")).unwrap_or_default(),
                over: match s.post {
                    Some(p) => over_at(&p.id),
                    None => end_over(&s.name()),
                },
            }
        })
        .collect();
    let strength: Vec<(usize, Option<f64>, bool)> = findings
        .iter()
        .filter(|f| &*f.place.member_id == g.line.id.as_str())
        .filter_map(|f| match f.detail_as::<StrengthDetail>()? {
            StrengthDetail::Span(d) => Some((d.span_no, f.ratio(), f.status == Status::OverLimit)),
            _ => None,
        })
        .collect();
    let spans = g
        .spans()
        .map(|(i, j, length)| {
            let found = strength.iter().find(|(n, _, _)| *n == i + 1);
            let use_text = found
                .and_then(|(_, r, _)| *r)
                .map(|r| format!(", {:.0} %", r * 100.0))
                .unwrap_or_default();
            SpanMark {
                x0: g.supports[i].at.in_inches(),
                x1: g.supports[j].at.in_inches(),
                label: format!("{}{use_text}", len(u, length)),
                over: found.is_some_and(|(_, _, over)| *over),
            }
        })
        .collect();
    let splices = g
        .line
        .splices
        .iter()
        .map(|at| {
            let over = !g
                .supports
                .iter()
                .any(|s| (s.at - *at).in_inches().abs() <= 3.0);
            (at.in_inches(), over)
        })
        .collect();
    GirderView {
        title: title(g, u),
        length_in: length_in.max(1.0),
        end_b_known,
        supports,
        spans,
        load_text: load_text(g),
        splices,
    }
}

fn title(g: &GirderContext, u: UnitSystem) -> String {
    let what = match &g.lumber {
        Ok(l) => format!("{} {} {}", l.describe(), l.species.name(), l.grade),
        Err(_) if !g.line.product.is_empty() => {
            format!("{} {}", g.line.kind.name(), g.line.product)
        }
        Err(_) => g.line.kind.name().to_string(),
    };
    match g.line.length {
        Some(l) => format!("{}: {what}, {}", g.line.label, len(u, l)),
        None => format!("{}: {what}, length not entered", g.line.label),
    }
}

fn load_text(g: &GirderContext) -> String {
    match &g.load {
        Ok(load) => {
            let mut parts: Vec<String> = load
                .shares
                .iter()
                .map(|s| format!("{} ({:.1} ft)", s.label, s.width_ft()))
                .collect();
            if load.wall_plf > 0.0 {
                parts.push(format!("a wall above ({:.0} lb/ft)", load.wall_plf));
            }
            format!("{:.0} lb/ft from {}", load.total_plf, parts.join(", "))
        }
        Err(why) => format!("Load not known: {why}"),
    }
}

/// The view of one girder line of an inspection, by id (for the app's girder screen).
pub fn girder_view_of(
    inspection: &crate::model::Inspection,
    findings: &[Finding],
    girder_id: &str,
) -> Option<GirderView> {
    let common = crate::finding::Common {
        units: inspection.units,
        edition: std::sync::Arc::from(inspection.code_edition.as_str()),
        year_built: inspection.property.year_built,
    };
    let (lines, _) = crate::load_path::girders(inspection, &common);
    lines
        .iter()
        .find(|g| g.line.id == girder_id)
        .map(|g| girder_view(g, findings))
}
