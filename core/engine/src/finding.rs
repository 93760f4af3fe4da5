//! A finding: what was measured, the limit it is held to, the use ratio, the provision, the
//! assumptions and a plain recommendation. Rules build findings only through
//! `FindingBuilder`; the numbers are set when the rule runs, the wording is written from them
//! when it is read (`summary`, `assumptions`, `recommendation`), so evaluating stays cheap.
//! A finding knows no rule: each rule owns its detail type and words it (`Wording`), and the
//! finding keeps it as a `KeptDetail`.

use crate::units::{format_dimension, format_length, round_down, round_up, Length, UnitSystem};
use serde::ser::SerializeStruct;
use serde::Serialize;
use std::any::Any;
use std::borrow::Cow;
use std::fmt::Debug;
use std::sync::Arc;

/// Text that is usually a fixed phrase and sometimes composed.
pub type Text = Cow<'static, str>;

/// The share of a limit at which a finding is called "near limit".
pub const NEAR_LIMIT_RATIO: f64 = 0.9;
/// Measurements equal to a limit within this relative tolerance count as at the limit.
const RATIO_TOLERANCE: f64 = 1e-9;
/// Source: NIST SP 811 Appendix B (1 lbf = 4.448 222 N).
const NEWTONS_PER_POUND: f64 = 4.448_222;
/// Source: NIST SP 811 Appendix B (1 psi = 6.894 757 kPa).
const PSI_TO_MPA: f64 = 0.006_894_757;
/// Lengths shorter than this are shown in inches only (`14"`), longer ones in feet-inches.
const SHORT_LENGTH_INCHES: f64 = 24.0;

/// What a finding's limit rests on: the code, a computed engineering reference that is not a
/// code requirement, or what the inspector saw.
#[derive(Debug, Clone, Copy, PartialEq, Eq, PartialOrd, Ord, Hash, Serialize)]
#[serde(rename_all = "kebab-case")]
pub enum Basis {
    /// A prescriptive limit of the residential code (notch, hole, bearing, bridging, a span
    /// within the printed tables).
    CodeLimit,
    /// A computed engineering reference (NDS mechanics outside the printed tables, measured
    /// sag against L/360, moisture against 19 %): a screening reference, not a requirement.
    Reference,
    /// A condition seen (decay, insects, a cut) that has no numeric limit to hold it to.
    Observed,
}

impl Basis {
    pub fn name(self) -> &'static str {
        match self {
            Basis::CodeLimit => "code limit",
            Basis::Reference => "engineering reference",
            Basis::Observed => "observed condition",
        }
    }
}

#[derive(Debug, Clone, Copy, PartialEq, Eq, PartialOrd, Ord, Hash, Serialize)]
#[serde(rename_all = "kebab-case")]
pub enum Status {
    /// Exceeds the limit.
    OverLimit,
    /// An observed condition (damage, a cut) for a professional to evaluate.
    ToEvaluate,
    /// At 90 % of the limit or more, but not over it.
    NearLimit,
    /// Some limits were checked and met, but at least one could not be checked: never reads
    /// as within.
    Incomplete,
    Within,
    /// Could not be checked; the finding says why.
    NotChecked,
}

impl Status {
    /// The status alone, without its basis (see `Finding::status_label`).
    pub fn label(self) -> &'static str {
        match self {
            Status::OverLimit => "OVER LIMIT",
            Status::ToEvaluate => "TO BE EVALUATED",
            Status::NearLimit => "near limit",
            Status::Incomplete => "not fully checked",
            Status::Within => "within",
            Status::NotChecked => "not checked",
        }
    }

    /// The status as said of a finding on the given basis: "over the code limit" only of a
    /// code limit.
    pub fn label_on(self, basis: Basis) -> &'static str {
        match (self, basis) {
            (Status::OverLimit, Basis::CodeLimit) => "OVER CODE LIMIT",
            (Status::OverLimit, _) => "BEYOND REFERENCE",
            (Status::NearLimit, Basis::CodeLimit) => "near code limit",
            (Status::NearLimit, _) => "near reference",
            (Status::Within, Basis::CodeLimit) => "within code limit",
            (Status::Within, _) => "within reference",
            (other, _) => other.label(),
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

/// A length in the given units: inches only below 2 ft, feet-inches above.
pub fn length_text(length: Length, units: UnitSystem) -> String {
    if length.in_inches() < SHORT_LENGTH_INCHES {
        format_dimension(length, units)
    } else {
        format_length(length, units)
    }
}

/// A measured or limiting value, typed so it can be shown in either unit system.
#[derive(Debug, Clone, PartialEq)]
pub enum Value {
    Length(Length),
    /// A force in pounds (shown in kN in metric).
    Pounds(f64),
    /// A stress in psi (shown in MPa in metric).
    Psi(f64),
    /// An area in square inches (shown in square feet, or m² in metric).
    SquareInches(f64),
    /// A plain number (a slenderness ratio).
    Number(f64),
    Percent(f64),
    Count(u32),
    Text(Text),
}

impl Value {
    pub fn text(&self, units: UnitSystem) -> String {
        match self {
            Value::Length(l) => length_text(*l, units),
            Value::Pounds(lb) => match units {
                UnitSystem::Imperial => format!("{lb:.0} lb"),
                UnitSystem::Metric => format!("{:.2} kN", lb * NEWTONS_PER_POUND / 1000.0),
            },
            Value::Psi(psi) => match units {
                UnitSystem::Imperial => format!("{psi:.0} psi"),
                UnitSystem::Metric => format!("{:.2} MPa", psi * PSI_TO_MPA),
            },
            Value::SquareInches(a) => match units {
                UnitSystem::Imperial => format!("{:.2} sq ft", a / 144.0),
                UnitSystem::Metric => format!("{:.3} m²", a * 0.000_645_16),
            },
            Value::Number(n) => format!("{n:.1}"),
            Value::Percent(p) => format!("{p:.1} %"),
            Value::Count(n) => n.to_string(),
            Value::Text(t) => t.to_string(),
        }
    }

    pub fn number(&self) -> Option<f64> {
        match self {
            Value::Length(l) => Some(l.in_inches()),
            Value::Pounds(lb) => Some(*lb),
            Value::Psi(psi) => Some(*psi),
            Value::SquareInches(a) => Some(*a),
            Value::Number(n) => Some(*n),
            Value::Percent(p) => Some(*p),
            Value::Count(n) => Some(*n as f64),
            Value::Text(_) => None,
        }
    }

    pub fn unit(&self) -> Option<&'static str> {
        match self {
            Value::Length(_) => Some("in"),
            Value::Pounds(_) => Some("lb"),
            Value::Psi(_) => Some("psi"),
            Value::SquareInches(_) => Some("sq in"),
            Value::Number(_) => Some("ratio"),
            Value::Percent(_) => Some("%"),
            Value::Count(_) => Some("count"),
            Value::Text(_) => None,
        }
    }
}

/// A value as written out: the number in base units and its text.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct Shown {
    #[serde(skip_serializing_if = "Option::is_none")]
    pub value: Option<f64>,
    #[serde(skip_serializing_if = "Option::is_none")]
    pub unit: Option<&'static str>,
    pub text: String,
}

impl Shown {
    pub fn of(value: &Value, units: UnitSystem) -> Shown {
        Shown {
            value: value.number(),
            unit: value.unit(),
            text: value.text(units),
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

/// One criterion of a finding: a measured value held to one limit.
#[derive(Debug, Clone, PartialEq)]
pub struct Check {
    pub what: Text,
    pub measured: Value,
    pub limit: Value,
    pub bound: Bound,
    /// Use of the limit (measured / maximum, or minimum / measured); above 1 is over.
    pub ratio: Option<f64>,
    pub status: Status,
    pub not_checked_because: Option<Text>,
    pub units: UnitSystem,
}

impl Check {
    /// A numeric criterion. A zero measurement against a minimum is over with no ratio.
    /// A length limit is held as it is shown: a maximum rounded down and a minimum rounded
    /// up to the display grid (1/16 in or 1 mm), so a value equal to the shown limit passes.
    pub fn numeric(
        what: impl Into<Text>,
        measured: Value,
        limit: Value,
        bound: Bound,
        units: UnitSystem,
    ) -> Check {
        let limit = match (limit, bound) {
            (Value::Length(l), Bound::AtMost) => Value::Length(round_down(l, units)),
            (Value::Length(l), Bound::AtLeast) => Value::Length(round_up(l, units)),
            (other, _) => other,
        };
        let ratio = match (measured.number(), limit.number(), bound) {
            (Some(m), Some(l), Bound::AtMost) if l > 0.0 => Some(m / l),
            (Some(m), Some(l), Bound::AtLeast) if m > 0.0 => Some(l / m),
            _ => None,
        };
        let status = ratio.map(Status::of_ratio).unwrap_or(Status::OverLimit);
        Check {
            what: what.into(),
            measured,
            limit,
            bound,
            ratio,
            status,
            not_checked_because: None,
            units,
        }
    }

    /// A yes/no criterion (end restraint present, engineered member uncut).
    pub fn qualitative(
        what: impl Into<Text>,
        measured: impl Into<Text>,
        limit: impl Into<Text>,
        passes: bool,
    ) -> Check {
        Check {
            what: what.into(),
            measured: Value::Text(measured.into()),
            limit: Value::Text(limit.into()),
            bound: Bound::AtMost,
            ratio: None,
            status: if passes {
                Status::Within
            } else {
                Status::OverLimit
            },
            not_checked_because: None,
            units: UnitSystem::Imperial,
        }
    }

    /// A criterion that could not be evaluated, with the reason.
    pub fn skipped(
        what: impl Into<Text>,
        limit: impl Into<Text>,
        because: impl Into<Text>,
    ) -> Check {
        Check {
            what: what.into(),
            measured: Value::Text(Cow::Borrowed("not measured")),
            limit: Value::Text(limit.into()),
            bound: Bound::AtMost,
            ratio: None,
            status: Status::NotChecked,
            not_checked_because: Some(because.into()),
            units: UnitSystem::Imperial,
        }
    }

    pub fn measured_shown(&self) -> Shown {
        Shown::of(&self.measured, self.units)
    }

    pub fn limit_shown(&self) -> Shown {
        Shown::of(&self.limit, self.units)
    }
}

impl Serialize for Check {
    fn serialize<S: serde::Serializer>(&self, s: S) -> Result<S::Ok, S::Error> {
        let mut st = s.serialize_struct("Check", 7)?;
        st.serialize_field("what", &self.what)?;
        st.serialize_field("measured", &self.measured_shown())?;
        st.serialize_field("limit", &self.limit_shown())?;
        st.serialize_field("bound", &self.bound)?;
        if let Some(r) = self.ratio {
            st.serialize_field("ratio", &r)?;
        }
        st.serialize_field("status", &self.status)?;
        if let Some(why) = &self.not_checked_because {
            st.serialize_field("not_checked_because", why)?;
        }
        st.end()
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
    /// What the rule's limit rests on, unless a finding says otherwise (a span outside the
    /// printed tables is an engineering reference).
    pub basis: Basis,
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

/// Where a finding sits in the inspection. Cheap to clone.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct Place {
    pub area_id: Arc<str>,
    /// The run, joist or member the finding is about.
    pub member_id: Arc<str>,
    /// "Crawlspace > Run 1 > Joist 7"
    pub location: Arc<str>,
}

/// How a finding's wording is written from its numbers; each rule's detail implements it.
pub trait Wording {
    /// One line: what, measured against what.
    fn summary(&self, units: UnitSystem) -> String;
    fn assumptions(&self, _units: UnitSystem) -> Vec<String> {
        Vec::new()
    }
    fn recommendation(&self, status: Status, units: UnitSystem) -> String;
    /// Computed options to discuss (for an over-span).
    fn options(&self, _units: UnitSystem) -> Vec<String> {
        Vec::new()
    }
}

/// What a finding keeps to be worded: any rule's detail type (the numbers it is worded
/// from). Findings compare and print their details; a reader that draws (the girder view)
/// looks one up by its type with `Finding::detail_as`.
pub trait Detail: Wording + Any + Debug + Send + Sync {
    /// Whether `other` is a detail of the same type with the same numbers.
    fn same_as(&self, other: &dyn Detail) -> bool;
    /// A copy, kept as a finding keeps it.
    fn kept_copy(&self) -> KeptDetail;
}

impl<T: Wording + Clone + PartialEq + Debug + Send + Sync + 'static> Detail for T {
    fn same_as(&self, other: &dyn Detail) -> bool {
        (other as &dyn Any).downcast_ref::<T>() == Some(self)
    }

    fn kept_copy(&self) -> KeptDetail {
        KeptDetail::new(self.clone())
    }
}

/// Room for a detail kept inside the finding, in machine words: a detail that fits is kept
/// inline, a wider one on the heap. Most rules' details fit, which spares an allocation per
/// finding (`cargo bench -p undercroft-engine --bench evaluate`).
type DetailRoom = smallbox::space::S8;

/// A finding's detail as kept: compared by value, read as a `Detail`.
#[derive(Debug)]
pub struct KeptDetail(smallbox::SmallBox<dyn Detail, DetailRoom>);

impl KeptDetail {
    pub fn new(detail: impl Detail) -> Self {
        KeptDetail(smallbox::smallbox!(detail))
    }
}

impl Clone for KeptDetail {
    fn clone(&self) -> Self {
        self.0.kept_copy()
    }
}

impl std::ops::Deref for KeptDetail {
    type Target = dyn Detail;
    fn deref(&self) -> &(dyn Detail + 'static) {
        &*self.0
    }
}

impl PartialEq for KeptDetail {
    fn eq(&self, other: &Self) -> bool {
        self.0.same_as(&*other.0)
    }
}

/// The detail of a finding not checked for want of input: what to do to check it. The
/// summary is written from the finding's reason (`Finding::summary`).
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Missing(pub &'static str);

impl Wording for Missing {
    fn summary(&self, _: UnitSystem) -> String {
        String::new()
    }

    fn recommendation(&self, _: Status, _: UnitSystem) -> String {
        self.0.to_string()
    }
}

#[derive(Debug, Clone, PartialEq)]
pub struct Finding {
    pub rule: &'static RuleInfo,
    pub basis: Basis,
    pub status: Status,
    pub place: Place,
    pub observation_id: Option<Arc<str>>,
    /// Which part of the member the finding is about, where a rule makes several findings
    /// on one member with no observation (a girder's spans, its ends, a post's conditions).
    pub part: Option<Text>,
    pub checks: Vec<Check>,
    /// Index in `checks` of the governing criterion (the highest use of its limit).
    pub governing: Option<usize>,
    pub not_checked_because: Option<Text>,
    /// The numbers the wording is written from, of the rule's own type.
    pub detail: KeptDetail,
    pub units: UnitSystem,
    pub edition: Arc<str>,
    /// The year the house was built, where known.
    pub year_built: Option<u16>,
}

/// The year of a code edition named like "IRC 2018".
pub fn edition_year(edition: &str) -> Option<u16> {
    edition
        .split(|c: char| !c.is_ascii_digit())
        .find(|w| w.len() == 4)
        .and_then(|w| w.parse().ok())
}

/// How the chosen edition stands to an existing house: a benchmark of current practice, not
/// a code it had to meet. None for a house built in the edition's year or later.
pub fn benchmark_note(edition: &str, year_built: Option<u16>) -> Option<String> {
    match (year_built, edition_year(edition)) {
        (Some(built), Some(year)) if built >= year => None,
        (Some(built), _) => Some(format!(
            "The house was built in {built}: the {edition} is used as a benchmark of current practice, not as a code the house had to meet when it was built"
        )),
        (None, _) => Some(format!(
            "The {edition} is used as a benchmark of current practice; an existing house is held to the code in force when it was built, which may differ"
        )),
    }
}

impl Finding {
    pub fn rule_id(&self) -> &'static str {
        self.rule.id
    }
    /// A stable identity for notes kept on this finding: rule id / member id / observation
    /// id (or the part of the member, or "-").
    pub fn key(&self) -> String {
        format!(
            "{}/{}/{}",
            self.rule.id,
            self.place.member_id,
            self.observation_id
                .as_deref()
                .or(self.part.as_deref())
                .unwrap_or("-")
        )
    }
    pub fn title(&self) -> &'static str {
        self.rule.title
    }
    /// The status as the client reads it, on this finding's basis.
    pub fn status_label(&self) -> &'static str {
        self.status.label_on(self.basis)
    }
    pub fn governing_check(&self) -> Option<&Check> {
        self.governing.map(|i| &self.checks[i])
    }
    pub fn ratio(&self) -> Option<f64> {
        self.governing_check().and_then(|c| c.ratio)
    }
    /// "112 %" style use of the limit, when the finding has a ratio.
    pub fn use_text(&self) -> Option<String> {
        self.ratio().map(|r| format!("{:.0} %", r * 100.0))
    }
    pub fn measured(&self) -> Option<Shown> {
        self.governing_check().map(Check::measured_shown)
    }
    pub fn limit(&self) -> Option<Shown> {
        self.governing_check().map(Check::limit_shown)
    }
    pub fn citation(&self) -> String {
        self.rule.citation(&self.edition)
    }
    /// The finding's detail, when it is of type `T`.
    pub fn detail_as<T: Detail>(&self) -> Option<&T> {
        (&*self.detail as &dyn Any).downcast_ref()
    }
    pub fn summary(&self) -> String {
        let text = self.detail.summary(self.units);
        match &self.not_checked_because {
            Some(why) if text.is_empty() => format!("Not checked: {why}"),
            _ => text,
        }
    }
    pub fn assumptions(&self) -> Vec<String> {
        let mut out = self.detail.assumptions(self.units);
        if self.basis == Basis::CodeLimit {
            out.extend(benchmark_note(&self.edition, self.year_built));
        }
        out
    }
    pub fn recommendation(&self) -> String {
        if self.status == Status::Incomplete {
            return format!(
                "Not every limit was checked ({}): measure and enter what is missing before relying on this finding.",
                self.not_checked_because.as_deref().unwrap_or("a limit was not checked")
            );
        }
        self.detail.recommendation(self.status, self.units)
    }
    pub fn options(&self) -> Vec<String> {
        self.detail.options(self.units)
    }
}

impl Serialize for Finding {
    fn serialize<S: serde::Serializer>(&self, s: S) -> Result<S::Ok, S::Error> {
        let mut st = s.serialize_struct("Finding", 20)?;
        st.serialize_field("rule_id", self.rule.id)?;
        st.serialize_field("title", self.rule.title)?;
        st.serialize_field("basis", &self.basis)?;
        st.serialize_field("status", &self.status)?;
        st.serialize_field("status_label", self.status_label())?;
        st.serialize_field("area_id", &self.place.area_id)?;
        st.serialize_field("member_id", &self.place.member_id)?;
        st.serialize_field("location", &self.place.location)?;
        if let Some(id) = &self.observation_id {
            st.serialize_field("observation_id", id)?;
        }
        st.serialize_field("summary", &self.summary())?;
        if let Some(g) = self.governing_check() {
            st.serialize_field("governing_check", &g.what)?;
            st.serialize_field("bound", &g.bound)?;
            st.serialize_field("measured", &g.measured_shown())?;
            st.serialize_field("limit", &g.limit_shown())?;
            if let Some(r) = g.ratio {
                st.serialize_field("ratio", &r)?;
            }
        }
        st.serialize_field("citation", &self.citation())?;
        st.serialize_field("checks", &self.checks)?;
        st.serialize_field("assumptions", &self.assumptions())?;
        st.serialize_field("recommendation", &self.recommendation())?;
        let options = self.options();
        if !options.is_empty() {
            st.serialize_field("options", &options)?;
        }
        if let Some(why) = &self.not_checked_because {
            st.serialize_field("not_checked_because", why)?;
        }
        st.end()
    }
}

/// What every finding of one inspection shares: units, code edition, year built.
#[derive(Debug, Clone, PartialEq)]
pub struct Common {
    pub units: UnitSystem,
    pub edition: Arc<str>,
    pub year_built: Option<u16>,
}

/// Builds a finding; rules call this and nothing else to make findings (a member's rules
/// start one with `MemberContext::finding`).
pub struct FindingBuilder {
    rule: &'static RuleInfo,
    basis: Basis,
    place: Place,
    observation_id: Option<Arc<str>>,
    part: Option<Text>,
    checks: Vec<Check>,
    common: Common,
}

impl FindingBuilder {
    /// A finding placed by the caller (a member, a girder line, a post, an area).
    pub fn at(rule: &'static RuleInfo, place: Place, common: &Common) -> Self {
        FindingBuilder::sharing(rule, place, common.clone())
    }

    /// As `at`, taking the shared values themselves (a member's, made for this finding).
    pub(crate) fn sharing(rule: &'static RuleInfo, place: Place, common: Common) -> Self {
        FindingBuilder {
            rule,
            basis: rule.basis,
            place,
            observation_id: None,
            part: None,
            checks: Vec::new(),
            common,
        }
    }

    /// Names the observation the finding is about.
    pub fn observation(mut self, id: Option<&Arc<str>>) -> Self {
        self.observation_id = id.cloned();
        self
    }

    pub fn check(mut self, check: Check) -> Self {
        self.checks.push(check);
        self
    }

    /// Names the part of the member this finding is about (see `Finding::part`).
    pub fn part(mut self, part: impl Into<Text>) -> Self {
        self.part = Some(part.into());
        self
    }

    /// Sets the basis where it differs from the rule's.
    pub fn basis(mut self, basis: Basis) -> Self {
        self.basis = basis;
        self
    }

    /// The finding with the given status and detail; governing and reason still unset.
    fn build(self, status: Status, detail: impl Detail) -> Finding {
        Finding {
            rule: self.rule,
            basis: self.basis,
            status,
            place: self.place,
            observation_id: self.observation_id,
            part: self.part,
            checks: self.checks,
            governing: None,
            not_checked_because: None,
            detail: KeptDetail::new(detail),
            units: self.common.units,
            edition: self.common.edition,
            year_built: self.common.year_built,
        }
    }

    /// An observed condition with no numeric limit: reaches the summary to be evaluated.
    pub fn observed(mut self, detail: impl Detail) -> Finding {
        self.basis = Basis::Observed;
        self.build(Status::ToEvaluate, detail)
    }

    /// Sets the status and the governing criterion from the checks, and the detail the
    /// wording is written from.
    pub fn finish(self, detail: impl Detail) -> Finding {
        let mut finding = self.build(Status::NotChecked, detail);
        let f = &mut finding;
        let governing = f
            .checks
            .iter()
            .enumerate()
            .filter(|(_, c)| c.status != Status::NotChecked)
            .min_by(|(_, a), (_, b)| {
                a.status
                    .cmp(&b.status)
                    .then(b.ratio.unwrap_or(0.0).total_cmp(&a.ratio.unwrap_or(0.0)))
            })
            .map(|(i, c)| (i, c.status));
        match governing {
            Some((i, status)) => {
                f.governing = Some(i);
                f.status = status;
                // A finding whose checks were not all made never reads as within or near.
                let skipped: Vec<String> = f
                    .checks
                    .iter()
                    .filter(|c| c.status == Status::NotChecked)
                    .map(|c| match &c.not_checked_because {
                        Some(why) => format!("{} not checked: {why}", c.what),
                        None => format!("{} not checked", c.what),
                    })
                    .collect();
                if !skipped.is_empty() && matches!(status, Status::Within | Status::NearLimit) {
                    f.status = Status::Incomplete;
                    f.not_checked_because = Some(skipped.join("; ").into());
                }
            }
            None => {
                let why: Vec<&str> = f
                    .checks
                    .iter()
                    .filter_map(|c| c.not_checked_because.as_deref())
                    .collect();
                f.not_checked_because = Some(if why.is_empty() {
                    "nothing to check".into()
                } else {
                    why.join("; ").into()
                });
            }
        }
        finding
    }

    /// A finding that could not be evaluated, with why; `detail` words it (`Missing` for
    /// the plain "Not checked: why" and what to do), or a rule's own detail.
    pub fn not_checked(self, because: impl Into<Text>, detail: impl Detail) -> Finding {
        let mut finding = self.build(Status::NotChecked, detail);
        finding.not_checked_because = Some(because.into());
        finding
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn status_thresholds() {
        // Product rule: near limit from 90 % of the limit; over only above 100 %.
        let table = [
            (0.5, Status::Within),
            (0.8999, Status::Within),
            (0.9, Status::NearLimit),
            (1.0, Status::NearLimit),
            (1.0001, Status::OverLimit),
        ];
        for (ratio, status) in table {
            assert_eq!(Status::of_ratio(ratio), status, "{ratio}");
        }
    }

    #[test]
    fn minimum_limits_use_inverse_ratio() {
        let u = UnitSystem::Imperial;
        let c = Check::numeric(
            "bearing",
            Value::Length(Length::inches(1.0)),
            Value::Length(Length::inches(1.5)),
            Bound::AtLeast,
            u,
        );
        assert_eq!(c.ratio, Some(1.5));
        assert_eq!(c.status, Status::OverLimit);
        let zero = Check::numeric(
            "bearing",
            Value::Length(Length::ZERO),
            Value::Length(Length::inches(1.5)),
            Bound::AtLeast,
            u,
        );
        assert_eq!((zero.ratio, zero.status), (None, Status::OverLimit));
    }

    #[test]
    fn an_older_house_is_held_to_a_benchmark() {
        let note = benchmark_note("IRC 2018", Some(1948)).unwrap();
        assert!(
            note.contains("built in 1948") && note.contains("benchmark"),
            "{note}"
        );
        assert_eq!(benchmark_note("IRC 2018", Some(2019)), None);
        assert!(benchmark_note("IRC 2021", None)
            .unwrap()
            .contains("benchmark"));
        assert_eq!(edition_year("IRC 2021"), Some(2021));
    }

    #[test]
    fn a_kept_detail_clones_compares_and_is_found_by_its_type() {
        #[derive(Debug, Clone, PartialEq)]
        struct Wide([f64; 40]);
        impl Wording for Wide {
            fn summary(&self, _: UnitSystem) -> String {
                format!("{}", self.0[39])
            }
            fn recommendation(&self, _: Status, _: UnitSystem) -> String {
                String::new()
            }
        }
        let missing = KeptDetail::new(Missing("Measure it."));
        let wide = KeptDetail::new(Wide([2.5; 40]));
        // Small details are kept inline, wide ones on the heap: both clone to an equal copy.
        assert_eq!(missing.clone(), missing);
        assert_eq!(wide.clone(), wide);
        assert_eq!(wide.clone().summary(UnitSystem::Imperial), "2.5");
        assert_ne!(missing, wide);
        assert_ne!(KeptDetail::new(Missing("Other.")), missing);
        let rule = &RuleInfo {
            id: "x",
            title: "X",
            code_section: Some("R502.8.1"),
            other_source: None,
            basis: Basis::CodeLimit,
        };
        let common = Common {
            units: UnitSystem::Imperial,
            edition: "IRC 2018".into(),
            year_built: None,
        };
        let place = Place {
            area_id: "a".into(),
            member_id: "m".into(),
            location: "Crawlspace".into(),
        };
        let finding = FindingBuilder::at(rule, place, &common).not_checked("why", Wide([1.0; 40]));
        assert_eq!(finding.detail_as::<Wide>().map(|w| w.0[0]), Some(1.0));
        assert!(finding.detail_as::<Missing>().is_none());
        assert_eq!(finding.clone(), finding);
    }

    #[test]
    fn citation_carries_the_edition() {
        let rule = RuleInfo {
            id: "x",
            title: "X",
            code_section: Some("R502.8.1"),
            other_source: Some("NDS 2018 3.3"),
            basis: Basis::CodeLimit,
        };
        assert_eq!(rule.citation("IRC 2021"), "IRC 2021 R502.8.1; NDS 2018 3.3");
    }

    #[test]
    fn short_lengths_in_inches() {
        assert_eq!(
            length_text(Length::inches(14.0), UnitSystem::Imperial),
            "14\""
        );
        assert_eq!(
            length_text(Length::inches(185.0), UnitSystem::Imperial),
            "15' 5\""
        );
    }
}
