//! Framing around floor openings (R502.10): header and trimmer joists doubled where the
//! header spans more than 4 ft, the header hung on hangers where it spans more than 6 ft,
//! and tail joists over 12 ft long carried by framing anchors or ledger strips.

use super::shared::len;
use crate::finding::{Basis, Check, Finding, RuleInfo, Status, Wording};
use crate::model::ObservationKind;
use crate::units::{Length, UnitSystem};
use crate::validate::MemberContext;

pub const RULE: RuleInfo = RuleInfo {
    id: "floor-opening",
    title: "Headers and trimmers at floor openings",
    code_section: Some("R502.10"),
    other_source: None,
    basis: Basis::CodeLimit,
};

/// Source: IRC 2018 R502.10: header joist span over 4 ft, header and trimmers doubled; over
/// 6 ft, hangers at the header-to-trimmer connections; tail joists over 12 ft supported at
/// the header by framing anchors or on ledger strips not less than 2 in by 2 in.
const DOUBLED_OVER_IN: f64 = 48.0;
const HANGERS_OVER_IN: f64 = 72.0;
const TAIL_ANCHORS_OVER_IN: f64 = 144.0;

#[derive(Debug, Clone, PartialEq)]
pub struct OpeningDetail {
    pub header_span: Length,
}

pub fn check(ctx: &MemberContext, out: &mut Vec<Finding>) {
    for o in &ctx.observations {
        let ObservationKind::Opening {
            header_span,
            header_plies,
            trimmer_plies,
            hangers,
            tail_length,
            tails_supported,
        } = &o.kind
        else {
            continue;
        };
        let span = header_span.in_inches();
        let mut b = ctx.finding(&RULE, Some(&o.id));
        if span > DOUBLED_OVER_IN {
            b = b
                .check(Check::qualitative(
                    "header joist",
                    plies_text(*header_plies),
                    "doubled (header over 4 ft)",
                    *header_plies >= 2,
                ))
                .check(Check::qualitative(
                    "trimmer joists",
                    plies_text(*trimmer_plies),
                    "doubled (header over 4 ft)",
                    *trimmer_plies >= 2,
                ));
        } else {
            b = b.check(Check::qualitative(
                "header joist",
                plies_text(*header_plies),
                "single allowed (header 4 ft or less)",
                *header_plies >= 1,
            ));
        }
        if span > HANGERS_OVER_IN {
            b = b.check(Check::qualitative(
                "header to trimmer connection",
                if *hangers { "hangers" } else { "no hangers" },
                "approved hangers (header over 6 ft)",
                *hangers,
            ));
        }
        if let Some(tail) = tail_length.filter(|t| t.in_inches() > TAIL_ANCHORS_OVER_IN) {
            b = b.check(Check::qualitative(
                format!("tail joists {} long at the header", len(ctx.units, tail)),
                if *tails_supported {
                    "framing anchors or ledger strips"
                } else {
                    "nailed only"
                },
                "framing anchors or 2x2 ledger strips (tails over 12 ft)",
                *tails_supported,
            ));
        }
        out.push(b.finish(OpeningDetail {
            header_span: *header_span,
        }));
    }
}

fn plies_text(plies: u8) -> String {
    match plies {
        0 => "none".into(),
        1 => "single".into(),
        2 => "doubled".into(),
        n => format!("{n} plies"),
    }
}

impl Wording for OpeningDetail {
    fn summary(&self, u: UnitSystem) -> String {
        format!(
            "Floor opening with a header spanning {}",
            len(u, self.header_span)
        )
    }

    fn recommendation(&self, status: Status, _u: UnitSystem) -> String {
        match status {
            Status::OverLimit => "The opening is framed lighter than the code asks for its size. Have a contractor double the header or trimmers or add hangers as a licensed professional directs.".into(),
            _ => "The opening is framed as the code asks for its size; no action.".into(),
        }
    }
}
