//! The client's words for a finding: its status said on its basis, one plain sentence for
//! the first page, the measured value against its limit, and a check met as a table row.
//! No rule ids and no formulas: those stay with the professional notes.

use super::grouping::Group;
use super::model::CheckedRow;
use undercroft_engine::finding::{Basis, Bound, Check, Finding, Status};

/// The status in words that match the basis.
pub fn status_words(basis: Basis, status: Status) -> &'static str {
    match (status, basis) {
        (Status::OverLimit, Basis::CodeLimit) => "Over the code limit",
        (Status::OverLimit, Basis::Reference) => "Beyond the engineering reference",
        (Status::OverLimit, Basis::Observed) => "Seen, needs attention",
        (Status::ToEvaluate, _) => "Seen, to be evaluated",
        (Status::NearLimit, Basis::CodeLimit) => "Near the code limit",
        (Status::NearLimit, _) => "Near the engineering reference",
        (Status::Incomplete, _) => "Not fully checked",
        (Status::Within, Basis::CodeLimit) => "Within the code limit",
        (Status::Within, _) => "Within the engineering reference",
        (Status::NotChecked, _) => "Not checked",
    }
}

fn source_word(basis: Basis) -> &'static str {
    match basis {
        Basis::Reference => "the engineering reference",
        _ => "the code",
    }
}

/// The governing check's numbers, when it has both a measure and a limit.
fn numbers(f: &Finding) -> Option<(&Check, String, String)> {
    let g = f.governing_check()?;
    g.ratio?;
    Some((g, g.measured_shown().text, g.limit_shown().text))
}

/// Text without a closing full stop, so a sentence can be built on it.
fn bare(text: &str) -> &str {
    text.trim().trim_end_matches('.')
}

/// One plain sentence for the first page: what, at how many places, measured against what.
pub fn sentence(g: &Group) -> String {
    let f = g.worst();
    let head = match g.count_text() {
        Some(count) => format!("{} at {count}, worst", f.title()),
        None => f.title().to_string(),
    };
    let body = match (f.status, numbers(f)) {
        // A span is read with the joist it is about: size, species, grade and spacing.
        (Status::OverLimit | Status::NearLimit, Some(_))
            if matches!(f.rule_id(), "joist-span" | "deck-joist-span") =>
        {
            bare(&f.summary()).to_string()
        }
        (Status::OverLimit, Some((c, m, l))) => match c.bound {
            Bound::AtMost => format!(
                "{} is {m}, where {} allows at most {l}",
                c.what,
                source_word(f.basis)
            ),
            Bound::AtLeast => format!(
                "{} is {m}, where {} asks for at least {l}",
                c.what,
                source_word(f.basis)
            ),
        },
        (Status::NearLimit, Some((c, m, l))) if m == l => format!(
            "{} is {m}, exactly the {} allowed",
            c.what,
            match c.bound {
                Bound::AtMost => "largest",
                Bound::AtLeast => "least",
            }
        ),
        (Status::NearLimit, Some((c, m, l))) => format!(
            "{} is {m}, close to the {} of {l}",
            c.what,
            match c.bound {
                Bound::AtMost => "largest allowed",
                Bound::AtLeast => "least allowed",
            }
        ),
        (Status::NotChecked, _) => format!(
            "not checked: {}",
            bare(
                f.not_checked_because
                    .as_deref()
                    .unwrap_or("a value is missing")
            )
        ),
        (Status::Incomplete, _) => format!(
            "not every limit could be checked: {}",
            bare(
                f.not_checked_because
                    .as_deref()
                    .unwrap_or("a value is missing")
            )
        ),
        (Status::OverLimit, None) => match f.governing_check() {
            // A yes/no limit: what was seen against what is asked for (what was seen only
            // where the summary does not say it already).
            Some(c) if c.not_checked_because.is_none() => {
                let summary = f.summary();
                let seen = c.measured_shown().text;
                let asks = if summary.contains(seen.as_str()) {
                    format!("{} asks for", source_word(f.basis))
                } else {
                    format!("{seen} found where {} asks for", source_word(f.basis))
                };
                format!(
                    "{}; {asks} {}",
                    decapital(bare(&summary)),
                    c.limit_shown().text
                )
            }
            _ => decapital(bare(&f.summary())),
        },
        _ => decapital(bare(&f.summary())),
    };
    format!("{head}: {body}.")
}

fn decapital(text: &str) -> String {
    let mut c = text.chars();
    match (c.next(), c.clone().next()) {
        // Keep "I-joist", "2x10" and acronyms as written.
        (Some(first), Some(second))
            if first.is_uppercase() && !second.is_uppercase() && second != '-' =>
        {
            first.to_lowercase().chain(c).collect()
        }
        _ => text.to_string(),
    }
}

/// A check met as one table row; a group's row gives its count and its worst case.
pub fn checked_row(g: &Group, area_name: &str) -> CheckedRow {
    let f = g.worst();
    let place = short_place(&g.place, area_name);
    let location = match g.count_text() {
        Some(count) => format!("{place} ({count})"),
        None => place,
    };
    let (measured, limit) = match f.governing_check() {
        Some(c) => {
            let bound = match (c.bound, c.ratio) {
                (Bound::AtLeast, Some(_)) => "at least ",
                (Bound::AtMost, Some(_)) => "at most ",
                _ => "",
            };
            let worst = if g.findings.len() > 1 && c.ratio.is_some() {
                "worst "
            } else {
                ""
            };
            (
                format!("{worst}{}", c.measured_shown().text),
                format!("{bound}{}", c.limit_shown().text),
            )
        }
        None => (bare(&f.summary()).to_string(), "-".into()),
    };
    CheckedRow {
        what: f.title().to_string(),
        location,
        measured,
        limit,
    }
}

/// A check as the professional reads it: what, measured, limit, use.
pub fn check_line(c: &Check) -> String {
    let bound = match c.bound {
        Bound::AtLeast => "at least",
        Bound::AtMost => "at most",
    };
    match (&c.not_checked_because, c.ratio) {
        (Some(why), _) => format!("{}: not checked ({why})", c.what),
        (None, Some(r)) => format!(
            "{}: {} against {bound} {} (use {:.2})",
            c.what,
            c.measured_shown().text,
            c.limit_shown().text,
            r
        ),
        (None, None) => format!(
            "{}: {} ({})",
            c.what,
            c.measured_shown().text,
            c.limit_shown().text
        ),
    }
}

/// The provision a client needs to find the limit: the first code section (or the first
/// other source), without the tables and notes the full citation lists.
pub fn short_citation(f: &Finding) -> String {
    let first = |text: &str| {
        text.split([',', ';'])
            .next()
            .unwrap_or(text)
            .split(" (")
            .next()
            .unwrap_or(text)
            .trim()
            .to_string()
    };
    match (f.rule.code_section, f.rule.other_source) {
        (Some(code), _) => format!("{} {}", f.edition, first(code)),
        (None, Some(other)) => first(other),
        (None, None) => String::new(),
    }
}

/// A location without the place it is in written in front ("Kitchen joists > Joist 7" in
/// "Kitchen crawlspace"); the location itself when it is that place or not inside it.
pub fn short_place(location: &str, within: &str) -> String {
    location
        .strip_prefix(within)
        .map(|s| s.trim_start_matches(" > "))
        .filter(|s| !s.is_empty())
        .unwrap_or(location)
        .to_string()
}
