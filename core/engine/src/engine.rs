//! Evaluates an inspection: validated members through every rule, giving findings and the
//! input problems met on the way. Never fails.

use crate::finding::{Basis, Finding, Status};
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
    /// Findings ordered for attention: over a limit first, then observed conditions to
    /// evaluate, near, not fully checked, within, not checked; within a status, code limits
    /// before engineering references, then the highest use of the limit; otherwise report
    /// order.
    pub fn by_attention(&self) -> Vec<&Finding> {
        let mut out: Vec<&Finding> = self.findings.iter().collect();
        out.sort_by(|a, b| {
            a.status.cmp(&b.status).then(a.basis.cmp(&b.basis)).then(
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

    fn count_on(&self, basis: Basis, status: Status) -> usize {
        self.findings
            .iter()
            .filter(|f| f.basis == basis && f.status == status)
            .count()
    }

    /// Counts by basis and status, the bases kept apart.
    pub fn counts(&self) -> Counts {
        Counts {
            code_over: self.count_on(Basis::CodeLimit, Status::OverLimit),
            code_near: self.count_on(Basis::CodeLimit, Status::NearLimit),
            code_within: self.count_on(Basis::CodeLimit, Status::Within),
            reference_beyond: self.count_on(Basis::Reference, Status::OverLimit),
            reference_near: self.count_on(Basis::Reference, Status::NearLimit),
            reference_within: self.count_on(Basis::Reference, Status::Within),
            observed_to_evaluate: self.count(Status::ToEvaluate),
            not_fully_checked: self.count(Status::Incomplete),
            not_checked: self.count(Status::NotChecked),
        }
    }
}

/// How many findings of each basis and status.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize)]
pub struct Counts {
    pub code_over: usize,
    pub code_near: usize,
    pub code_within: usize,
    pub reference_beyond: usize,
    pub reference_near: usize,
    pub reference_within: usize,
    pub observed_to_evaluate: usize,
    pub not_fully_checked: usize,
    pub not_checked: usize,
}

impl Counts {
    /// One line for a terminal or a screen.
    pub fn text(&self) -> String {
        format!(
            "code limits: {} over, {} near, {} within; engineering references: {} beyond, {} near, {} within; observed conditions: {} to be evaluated; {} not fully checked, {} not checked",
            self.code_over,
            self.code_near,
            self.code_within,
            self.reference_beyond,
            self.reference_near,
            self.reference_within,
            self.observed_to_evaluate,
            self.not_fully_checked,
            self.not_checked
        )
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
    let (path_findings, path_problems) = crate::load_path::evaluate(inspection);
    findings.extend(path_findings);
    let mut problems = problems;
    problems.extend(path_problems);
    Evaluation { findings, problems }
}
