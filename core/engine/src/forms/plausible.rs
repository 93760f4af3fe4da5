//! Values that read but cannot be what the inspector meant for this member: a joist span of
//! 182 ft or of 15 in, a spacing of 16 ft, a bearing of 3 ft, bridging lines farther apart
//! than the span. The screen asks before keeping such a value, and offers the likely reading
//! where one stands out (182 ft typed for 18' 2", 15 typed for 15 ft).
//!
//! The bounds are common practice, no source: floor joists of sawn lumber span about 4 to
//! 26 ft (IRC Table R502.3.1(2) tops out near 26 ft for 2x12 at 12 in), engineered joists
//! rarely beyond 40 ft, and layouts run from 12 to 24 in (R502.3 tables).

use crate::model::{Framing, MemberKind};
use crate::units::{format_dimension, format_length, Length, UnitSystem};
use serde::Serialize;

/// A question about one field's value, with the answers the screen offers.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct Question {
    pub field: &'static str,
    /// What looks wrong, in words.
    pub message: String,
    /// The button that keeps the value as read.
    pub keep: String,
    /// The likely reading: (button text, the text to put in the field).
    pub instead: Option<(String, String)>,
}

/// Longest clear span asked about without a question, inches: sawn lumber, then engineered.
const LONGEST_SAWN_SPAN_IN: f64 = 30.0 * 12.0;
const LONGEST_ENGINEERED_SPAN_IN: f64 = 48.0 * 12.0;
/// Shortest clear span of a floor joist that is not asked about.
const SHORTEST_SPAN_IN: f64 = 3.0 * 12.0;
const SPACING_RANGE_IN: (f64, f64) = (4.0, 48.0);
const LONGEST_BEARING_IN: f64 = 24.0;

/// The question about `field` of `framing` (the member's values in force: a joist's over its
/// run's), if its value is not plausible. `typed` is the field's text as entered.
pub fn framing_question(
    field: &str,
    typed: &str,
    framing: &Framing,
    units: UnitSystem,
) -> Option<Question> {
    let long = |l: Length| format_length(l, units);
    let short = |l: Length| format_dimension(l, units);
    let bare = typed.trim().parse::<f64>().is_ok();
    match field {
        "clear_span" => {
            let span = framing.clear_span?;
            let engineered = framing.kind.is_some_and(MemberKind::is_engineered);
            let longest = if engineered {
                LONGEST_ENGINEERED_SPAN_IN
            } else {
                LONGEST_SAWN_SPAN_IN
            };
            if span.in_inches() > longest {
                Some(Question {
                    field: "clear_span",
                    message: format!(
                        "A clear span of {} is longer than floor joists of this kind reach (about {} at most).",
                        long(span),
                        long(Length::inches(longest))
                    ),
                    keep: format!("Keep {}", long(span)),
                    instead: run_together_feet_inches(span)
                        .map(|l| (format!("Use {}", long(l)), long(l))),
                })
            } else if span.in_inches() < SHORTEST_SPAN_IN {
                let as_feet = bare.then(|| Length::inches(span.in_inches() * 12.0));
                Some(Question {
                    field: "clear_span",
                    message: format!(
                        "A clear span of {} is shorter than a floor joist spans. A number alone is read as {}.",
                        long(span),
                        unit_name(units)
                    ),
                    keep: format!("Keep {}", long(span)),
                    instead: as_feet
                        .filter(|_| units == UnitSystem::Imperial)
                        .map(|l| (format!("Use {}", long(l)), long(l))),
                })
            } else {
                None
            }
        }
        "spacing" => {
            let spacing = framing.spacing?;
            let (low, high) = SPACING_RANGE_IN;
            let inches = spacing.in_inches();
            (inches < low || inches > high).then(|| Question {
                field: "spacing",
                message: format!(
                    "Joists {} apart on centre is outside any floor layout (12 to 24 in is usual).",
                    short(spacing)
                ),
                keep: format!("Keep {}", short(spacing)),
                instead: feet_typed_for_inches(typed, spacing)
                    .map(|l| (format!("Use {}", short(l)), short(l))),
            })
        }
        "bearing_length" => {
            let length = framing.bearing.and_then(|b| b.length)?;
            (length.in_inches() > LONGEST_BEARING_IN).then(|| Question {
                field: "bearing_length",
                message: format!(
                    "A bearing of {} is longer than a joist end rests on a support.",
                    short(length)
                ),
                keep: format!("Keep {}", short(length)),
                instead: feet_typed_for_inches(typed, length)
                    .map(|l| (format!("Use {}", short(l)), short(l))),
            })
        }
        "bridging_interval" => {
            let interval = framing.bridging.and_then(|b| b.interval)?;
            let span = framing.clear_span?;
            (interval.in_inches() > span.in_inches()).then(|| Question {
                field: "bridging_interval",
                message: format!(
                    "Bridging lines {} apart is more than the clear span of {}.",
                    long(interval),
                    long(span)
                ),
                keep: format!("Keep {}", long(interval)),
                instead: None,
            })
        }
        _ => None,
    }
}

fn unit_name(units: UnitSystem) -> &'static str {
    match units {
        UnitSystem::Imperial => "inches",
        UnitSystem::Metric => "millimetres",
    }
}

/// 182 ft is most likely 18' 2" typed without the foot mark in its place: the last digit
/// (or two, under 12) taken as inches. Only for a whole number of feet.
fn run_together_feet_inches(span: Length) -> Option<Length> {
    let feet = span.in_inches() / 12.0;
    if feet.fract() != 0.0 || feet < 100.0 {
        return None;
    }
    let whole = feet as u64;
    [100, 10]
        .into_iter()
        .map(|split| (whole / split, whole % split))
        .find(|&(ft, inch)| inch < 12 && (3..=40).contains(&ft))
        .map(|(ft, inch)| Length::feet_inches(ft as f64, inch as f64))
}

/// A value typed with a foot mark where inches were meant (`16'` for a 16 in layout).
fn feet_typed_for_inches(typed: &str, read: Length) -> Option<Length> {
    typed
        .contains(['\'', '\u{2019}', '\u{2032}'])
        .then(|| Length::inches(read.in_inches() / 12.0))
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::forms::FramingForm;

    fn ask(field: &str, typed: &str) -> Option<Question> {
        let mut form = FramingForm {
            spacing: "16".into(),
            clear_span: "14'".into(),
            bridging: "solid-blocking".into(),
            ..Default::default()
        };
        form.set(field, typed.into());
        let (framing, errors) = form.to_framing(UnitSystem::Imperial);
        assert!(errors.is_empty(), "{errors:?}");
        framing_question(field, typed, &framing, UnitSystem::Imperial)
    }

    #[test]
    fn a_span_of_182_feet_is_asked_about_with_18_2_offered() {
        let q = ask("clear_span", "182'").unwrap();
        assert!(q.message.contains("182' 0\""), "{}", q.message);
        assert_eq!(q.keep, "Keep 182' 0\"");
        assert_eq!(q.instead, Some(("Use 18' 2\"".into(), "18' 2\"".into())));
    }

    #[test]
    fn a_bare_15_for_a_span_is_15_inches_and_asked_about_with_15_feet_offered() {
        let q = ask("clear_span", "15").unwrap();
        assert!(q.message.contains("read as inches"), "{}", q.message);
        assert_eq!(q.instead, Some(("Use 15' 0\"".into(), "15' 0\"".into())));
    }

    #[test]
    fn plausible_values_are_not_asked_about() {
        for (field, typed) in [
            ("clear_span", "182"),
            ("clear_span", "15' 2\""),
            ("spacing", "19.2"),
            ("spacing", "24"),
            ("bridging_interval", "8'"),
        ] {
            assert_eq!(ask(field, typed), None, "{field} {typed}");
        }
    }

    #[test]
    fn a_layout_typed_in_feet_and_bridging_beyond_the_span_are_asked_about() {
        let q = ask("spacing", "16'").unwrap();
        assert_eq!(q.instead, Some(("Use 16\"".into(), "16\"".into())));
        let q = ask("bridging_interval", "20'").unwrap();
        assert!(
            q.message.contains("more than the clear span"),
            "{}",
            q.message
        );
    }
}
