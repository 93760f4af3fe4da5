//! A finding: what was measured, the limit it is held to, the use ratio, the provision, the
//! assumptions and a plain recommendation. Built only through `FindingBuilder`.

use crate::units::{format_dimension, format_length, Length, UnitSystem};

/// Lengths shorter than this are shown in inches only (`14"`), longer ones in feet-inches.
const SHORT_LENGTH_INCHES: f64 = 24.0;
use serde::Serialize;

/// The share of a limit at which a finding is called "near limit".
pub const NEAR_LIMIT_RATIO: f64 = 0.9;
/// Measurements equal to a limit within this relative tolerance count as at the limit.
const RATIO_TOLERANCE: f64 = 1e-9;

#[derive(Debug, Clone, Copy, PartialEq, Eq, PartialOrd, Ord, Hash, Serialize)]
#[serde(rename_all = "kebab-case")]
pub enum Status {
    /// Exceeds the limit.
    OverLimit,
    /// At 90 % of the limit or more, but not over it.
    NearLimit,
    Within,
    /// Could not be checked; the finding says why.
    NotChecked,
}

impl Status {
    pub fn label(self) -> &'static str {
        match self {
            Status::OverLimit => "OVER LIMIT",
            Status::NearLimit => "near limit",
            Status::Within => "within",
            Status::NotChecked => "not checked",
        }
    }

    /// Status of a use ratio (measured use of the limit; above 1 is over).
    pub fn of_ratio(ratio: f64) -> Status {
        if ratio > 1.0 + RATIO_TOLERANCE {
            Status::OverLimit
        } else if ratio >= NEAR_LIMIT_RATIO - RATIO_TOLERANCE {
            Status::NearLimit
        } else {
            Status::Within
        }
    }
}

/// A measured or limiting value, typed so it can be shown in either unit system.
#[derive(Debug, Clone, PartialEq)]
pub enum Value {
    Length(Length),
    Percent(f64),
    Count(u32),
    Text(String),
}

impl Value {
    pub fn text(&self, units: UnitSystem) -> String {
        match self {
            Value::Length(l) if l.in_inches() < SHORT_LENGTH_INCHES => format_dimension(*l, units),
            Value::Length(l) => format_length(*l, units),
            Value::Percent(p) => format!("{p:.1} %"),
            Value::Count(n) => n.to_string(),
            Value::Text(t) => t.clone(),
        }
    }

    fn number(&self) -> Option<f64> {
        match self {
            Value::Length(l) => Some(l.in_inches()),
            Value::Percent(p) => Some(*p),
            Value::Count(n) => Some(*n as f64),
            Value::Text(_) => None,
        }
    }

    fn unit(&self) -> Option<&'static str> {
        match self {
            Value::Length(_) => Some("in"),
            Value::Percent(_) => Some("%"),
            Value::Count(_) => Some("count"),
            Value::Text(_) => None,
        }
    }
}

/// Whether the limit is a maximum (notch depth) or a minimum (bearing length).
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize)]
#[serde(rename_all = "kebab-case")]
pub enum Bound {
    AtMost,
    AtLeast,
}

/// A value as written in a finding: the number in base units and its text.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct Shown {
    #[serde(skip_serializing_if = "Option::is_none")]
    pub value: Option<f64>,
    #[serde(skip_serializing_if = "Option::is_none")]
    pub unit: Option<&'static str>,
    pub text: String,
}

impl Shown {
    fn of(value: &Value, units: UnitSystem) -> Shown {
        Shown { value: value.number(), unit: value.unit(), text: value.text(units) }
    }
}

/// One criterion of a finding: a measured value held to one limit.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct Check {
    pub what: String,
    pub measured: Shown,
    pub limit: Shown,
    pub bound: Bound,
    /// Use of the limit (measured / maximum, or minimum / measured); above 1 is over.
    #[serde(skip_serializing_if = "Option::is_none")]
    pub ratio: Option<f64>,
    pub status: Status,
    #[serde(skip_serializing_if = "Option::is_none")]
    pub not_checked_because: Option<String>,
}

impl Check {
    /// A numeric criterion. A zero measurement against a minimum is over with no ratio.
    pub fn numeric(what: impl Into<String>, measured: Value, limit: Value, bound: Bound, units: UnitSystem) -> Check {
        let ratio = match (measured.number(), limit.number(), bound) {
            (Some(m), Some(l), Bound::AtMost) if l > 0.0 => Some(m / l),
            (Some(m), Some(l), Bound::AtLeast) if m > 0.0 => Some(l / m),
            _ => None,
        };
        let status = ratio.map(Status::of_ratio).unwrap_or(Status::OverLimit);
        Check {
            what: what.into(),
            measured: Shown::of(&measured, units),
            limit: Shown::of(&limit, units),
            bound,
            ratio,
            status,
            not_checked_because: None,
        }
    }

    /// A yes/no criterion (end restraint present, engineered member uncut).
    pub fn qualitative(what: impl Into<String>, measured: &str, limit: &str, passes: bool) -> Check {
        Check {
            what: what.into(),
            measured: Shown { value: None, unit: None, text: measured.into() },
            limit: Shown { value: None, unit: None, text: limit.into() },
            bound: Bound::AtMost,
            ratio: None,
            status: if passes { Status::Within } else { Status::OverLimit },
            not_checked_because: None,
        }
    }

    /// A criterion that could not be evaluated, with the reason.
    pub fn skipped(what: impl Into<String>, limit: &str, because: impl Into<String>) -> Check {
        Check {
            what: what.into(),
            measured: Shown { value: None, unit: None, text: "not measured".into() },
            limit: Shown { value: None, unit: None, text: limit.into() },
            bound: Bound::AtMost,
            ratio: None,
            status: Status::NotChecked,
            not_checked_because: Some(because.into()),
        }
    }
}

/// Identity of a rule: stable id, title and the provision it applies.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize)]
pub struct RuleInfo {
    /// Stable kebab-case id; cited in reports, never renamed.
    pub id: &'static str,
    pub title: &'static str,
    /// Section(s) of the residential code, written after the edition ("R502.8.1").
    pub code_section: Option<&'static str>,
    /// Other published source (NDS), written as is.
    pub other_source: Option<&'static str>,
}

impl RuleInfo {
    /// Full citation for the given code edition, e.g. "IRC 2018 R502.8.1".
    pub fn citation(&self, edition: &str) -> String {
        let code = self.code_section.map(|s| format!("{edition} {s}"));
        match (code, self.other_source) {
            (Some(c), Some(o)) => format!("{c}; {o}"),
            (Some(c), None) => c,
            (None, Some(o)) => o.to_string(),
            (None, None) => String::new(),
        }
    }
}

/// Where a finding sits in the inspection.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct Place {
    pub area_id: String,
    /// The run, joist or member the finding is about.
    pub member_id: String,
    /// "Crawlspace > Run 1 > Joist 7"
    pub location: String,
}

#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct Finding {
    pub rule_id: &'static str,
    pub title: &'static str,
    pub status: Status,
    #[serde(flatten)]
    pub place: Place,
    #[serde(skip_serializing_if = "Option::is_none")]
    pub observation_id: Option<String>,
    /// One line: what, measured against what.
    pub summary: String,
    /// The governing criterion (the one with the highest use of its limit) and its values.
    #[serde(skip_serializing_if = "Option::is_none")]
    pub governing_check: Option<String>,
    #[serde(skip_serializing_if = "Option::is_none")]
    pub bound: Option<Bound>,
    #[serde(skip_serializing_if = "Option::is_none")]
    pub measured: Option<Shown>,
    #[serde(skip_serializing_if = "Option::is_none")]
    pub limit: Option<Shown>,
    #[serde(skip_serializing_if = "Option::is_none")]
    pub ratio: Option<f64>,
    pub citation: String,
    pub checks: Vec<Check>,
    pub assumptions: Vec<String>,
    pub recommendation: String,
    /// Computed options to discuss (for an over-span).
    #[serde(skip_serializing_if = "Vec::is_empty")]
    pub options: Vec<String>,
    #[serde(skip_serializing_if = "Option::is_none")]
    pub not_checked_because: Option<String>,
}

impl Finding {
    /// "112 % of limit" style severity, when the finding has a ratio.
    pub fn use_text(&self) -> Option<String> {
        self.ratio.map(|r| format!("{:.0} %", r * 100.0))
    }
}

/// Builds a finding; rules call this and nothing else to make findings.
pub struct FindingBuilder {
    finding: Finding,
}

impl FindingBuilder {
    pub fn new(rule: &RuleInfo, edition: &str, place: Place, observation_id: Option<&str>) -> Self {
        FindingBuilder {
            finding: Finding {
                rule_id: rule.id,
                title: rule.title,
                status: Status::NotChecked,
                place,
                observation_id: observation_id.map(str::to_string),
                summary: String::new(),
                governing_check: None,
                bound: None,
                measured: None,
                limit: None,
                ratio: None,
                citation: rule.citation(edition),
                checks: Vec::new(),
                assumptions: Vec::new(),
                recommendation: String::new(),
                options: Vec::new(),
                not_checked_because: None,
            },
        }
    }

    pub fn check(mut self, check: Check) -> Self {
        self.finding.checks.push(check);
        self
    }

    pub fn assume(mut self, assumption: impl Into<String>) -> Self {
        self.finding.assumptions.push(assumption.into());
        self
    }

    pub fn assume_all(mut self, assumptions: impl IntoIterator<Item = String>) -> Self {
        self.finding.assumptions.extend(assumptions);
        self
    }

    pub fn option(mut self, option: impl Into<String>) -> Self {
        self.finding.options.push(option.into());
        self
    }

    pub fn summary(mut self, text: impl Into<String>) -> Self {
        self.finding.summary = text.into();
        self
    }

    /// Sets the status, the headline values and the recommendation for that status.
    /// `recommend` gives the recommendation text for the final status.
    pub fn finish(mut self, recommend: impl FnOnce(Status) -> String) -> Finding {
        let f = &mut self.finding;
        let evaluated: Vec<&Check> = f.checks.iter().filter(|c| c.status != Status::NotChecked).collect();
        if evaluated.is_empty() {
            f.status = Status::NotChecked;
            if f.not_checked_because.is_none() {
                let why: Vec<&str> = f.checks.iter().filter_map(|c| c.not_checked_because.as_deref()).collect();
                f.not_checked_because = Some(if why.is_empty() { "nothing to check".into() } else { why.join("; ") });
            }
        } else {
            let worst = evaluated
                .iter()
                .copied()
                .min_by(|a, b| a.status.cmp(&b.status).then(b.ratio.unwrap_or(0.0).total_cmp(&a.ratio.unwrap_or(0.0))))
                .expect("non-empty");
            f.status = worst.status;
            f.governing_check = Some(worst.what.clone());
            f.bound = (worst.ratio.is_some() || worst.measured.value.is_some()).then_some(worst.bound);
            f.measured = Some(worst.measured.clone());
            f.limit = Some(worst.limit.clone());
            f.ratio = worst.ratio;
        }
        f.recommendation = recommend(f.status);
        self.finding
    }

    /// A finding that could not be evaluated at all.
    pub fn not_checked(mut self, because: impl Into<String>, recommendation: impl Into<String>) -> Finding {
        let because = because.into();
        if self.finding.summary.is_empty() {
            self.finding.summary = format!("Not checked: {because}");
        }
        self.finding.not_checked_because = Some(because);
        self.finding.status = Status::NotChecked;
        self.finding.recommendation = recommendation.into();
        self.finding
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn status_thresholds() {
        // Product rule: near limit from 90 % of the limit; over only above 100 %.
        let table = [(0.5, Status::Within), (0.8999, Status::Within), (0.9, Status::NearLimit), (1.0, Status::NearLimit), (1.0001, Status::OverLimit)];
        for (ratio, status) in table {
            assert_eq!(Status::of_ratio(ratio), status, "{ratio}");
        }
    }

    #[test]
    fn minimum_limits_use_inverse_ratio() {
        let u = UnitSystem::Imperial;
        let c = Check::numeric("bearing", Value::Length(Length::inches(1.0)), Value::Length(Length::inches(1.5)), Bound::AtLeast, u);
        assert_eq!(c.ratio, Some(1.5));
        assert_eq!(c.status, Status::OverLimit);
        let zero = Check::numeric("bearing", Value::Length(Length::ZERO), Value::Length(Length::inches(1.5)), Bound::AtLeast, u);
        assert_eq!((zero.ratio, zero.status), (None, Status::OverLimit));
    }

    #[test]
    fn citation_carries_the_edition() {
        let rule = RuleInfo { id: "x", title: "X", code_section: Some("R502.8.1"), other_source: Some("NDS 2018 3.3") };
        assert_eq!(rule.citation("IRC 2021"), "IRC 2021 R502.8.1; NDS 2018 3.3");
    }
}
