//! Evaluates an inspection: validated members through every rule, giving findings and the
//! input problems met on the way. Never fails.

use crate::finding::{Finding, Status};
use crate::model::Inspection;
use crate::rules::RULES;
use crate::validate::{members, Problem};
use serde::Serialize;

/// What the engine returns: findings in report order, and what could not be used.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct Evaluation {
    pub findings: Vec<Finding>,
    pub problems: Vec<Problem>,
}

impl Evaluation {
    /// Findings ordered for attention: over limit first, then near, within, not checked;
    /// within a status, the highest use of the limit first; otherwise report order.
    pub fn by_attention(&self) -> Vec<&Finding> {
        let mut out: Vec<&Finding> = self.findings.iter().collect();
        out.sort_by(|a, b| {
            a.status.cmp(&b.status).then(
                b.ratio()
                    .unwrap_or(0.0)
                    .total_cmp(&a.ratio().unwrap_or(0.0)),
            )
        });
        out
    }

    pub fn count(&self, status: Status) -> usize {
        self.findings.iter().filter(|f| f.status == status).count()
    }
}

/// Runs every rule over every member.
pub fn evaluate(inspection: &Inspection) -> Evaluation {
    let (contexts, problems) = members(inspection);
    // About one finding per observation, and up to four member-wide ones per member.
    let observations: usize = contexts.iter().map(|c| c.observations.len()).sum();
    let mut findings = Vec::with_capacity(observations + contexts.len() * 4);
    for ctx in &contexts {
        for rule in RULES {
            (rule.check)(ctx, &mut findings);
        }
    }
    Evaluation { findings, problems }
}
