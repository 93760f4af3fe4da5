//! Parses a length the way a tape reads: `13' 7-1/2"`, `13-7 1/2`, `163.5 in`, `4150 mm`.

use super::Length;
use thiserror::Error;

/// The longest text accepted; anything longer is not a typed measurement.
const MAX_TEXT_CHARS: usize = 40;
/// The longest length accepted (1000 ft): a larger value is a typing slip, not a framing member.
const MAX_INCHES: f64 = 12_000.0;

/// Why a typed length was refused. Each message names what was wrong.
#[derive(Debug, Clone, PartialEq, Error)]
pub enum LengthError {
    #[error("nothing was entered")]
    Empty,
    #[error("too long to be a measurement ({0} characters; at most 40)")]
    TooLong(usize),
    #[error("a length cannot be negative")]
    Negative,
    #[error("\"{0}\" is not a number")]
    NotANumber(String),
    #[error("unexpected \"{0}\"")]
    Unexpected(String),
    #[error("no unit: add ' or ft, \" or in, mm, cm or m")]
    NoUnit,
    #[error("the inches after the feet must be under 12 (got {0})")]
    InchesOverTwelve(String),
    #[error(
        "fraction {0} is not valid: the bottom must be a whole number above 0 and above the top"
    )]
    BadFraction(String),
    #[error("fraction {typed} is 1 or more: did you mean {suggestion}?")]
    ImproperFraction { typed: String, suggestion: String },
    #[error("{0} is larger than 1000 ft")]
    TooLarge(String),
    #[error("the length is incomplete")]
    Incomplete,
}

/// Parses what an inspector typed. A bare number with no unit is refused unless
/// `bare_unit_inches` gives the unit to assume (for fields where the unit is printed beside
/// the box), in which case it is multiplied by that many inches.
pub fn parse_length(text: &str, bare_unit_inches: Option<f64>) -> Result<Length, LengthError> {
    let count = text.chars().count();
    if count > MAX_TEXT_CHARS {
        return Err(LengthError::TooLong(count));
    }
    let normal = normalise(text);
    let trimmed = normal.trim();
    if trimmed.is_empty() {
        return Err(LengthError::Empty);
    }
    if trimmed.starts_with('-') {
        return Err(LengthError::Negative);
    }
    let tokens = tokenize(trimmed)?;
    let inches = Parser {
        tokens: &tokens,
        at: 0,
        bare_unit_inches,
    }
    .length()?;
    if !inches.is_finite() || inches > MAX_INCHES {
        return Err(LengthError::TooLarge(trimmed.to_string()));
    }
    Ok(Length::inches(inches))
}

/// Maps phone-keyboard punctuation and vulgar fractions onto plain ASCII.
fn normalise(text: &str) -> String {
    let mut out = String::with_capacity(text.len());
    for c in text.chars() {
        match c {
            '\u{2019}' | '\u{2018}' | '\u{2032}' | '`' | '\u{00B4}' => out.push('\''),
            '\u{201C}' | '\u{201D}' | '\u{2033}' => out.push('"'),
            '\u{2010}'..='\u{2014}' | '\u{2212}' => out.push('-'),
            '\u{00A0}' | '\t' => out.push(' '),
            '\u{00BD}' => out.push_str(" 1/2"),
            '\u{00BC}' => out.push_str(" 1/4"),
            '\u{00BE}' => out.push_str(" 3/4"),
            '\u{215B}' => out.push_str(" 1/8"),
            '\u{215C}' => out.push_str(" 3/8"),
            '\u{215D}' => out.push_str(" 5/8"),
            '\u{215E}' => out.push_str(" 7/8"),
            other => out.extend(other.to_lowercase()),
        }
    }
    out
}

#[derive(Debug, Clone, PartialEq)]
enum Token {
    Number(f64, String),
    Fraction(f64, String),
    Feet,
    Inches,
    Dash,
    Metric(f64),
}

fn tokenize(text: &str) -> Result<Vec<Token>, LengthError> {
    let chars: Vec<char> = text.chars().collect();
    let mut tokens = Vec::new();
    let mut i = 0;
    while i < chars.len() {
        let c = chars[i];
        if c == ' ' {
            i += 1;
        } else if c.is_ascii_digit() || c == '.' {
            let start = i;
            while i < chars.len() && (chars[i].is_ascii_digit() || chars[i] == '.') {
                i += 1;
            }
            let number: String = chars[start..i].iter().collect();
            let value = decimal(&number)?;
            if i < chars.len() && chars[i] == '/' {
                i += 1;
                let start = i;
                while i < chars.len() && chars[i].is_ascii_digit() {
                    i += 1;
                }
                let bottom: String = chars[start..i].iter().collect();
                let whole = format!("{number}/{bottom}");
                let top_ok = !number.contains('.');
                match bottom.parse::<u32>() {
                    Ok(b) if b > 0 && top_ok => {
                        tokens.push(Token::Fraction(value / b as f64, whole))
                    }
                    _ => return Err(LengthError::BadFraction(whole)),
                }
            } else {
                tokens.push(Token::Number(value, number));
            }
        } else if c == '\'' {
            if chars.get(i + 1) == Some(&'\'') {
                return Err(LengthError::Unexpected("''".into()));
            }
            tokens.push(Token::Feet);
            i += 1;
        } else if c == '"' {
            tokens.push(Token::Inches);
            i += 1;
        } else if c == '-' {
            tokens.push(Token::Dash);
            i += 1;
        } else if c.is_alphabetic() {
            let start = i;
            while i < chars.len() && chars[i].is_alphabetic() {
                i += 1;
            }
            let word: String = chars[start..i].iter().collect();
            tokens.push(match word.as_str() {
                "ft" | "feet" | "foot" => Token::Feet,
                "in" | "inch" | "inches" => Token::Inches,
                "mm" => Token::Metric(1.0 / super::length::MM_PER_INCH),
                "cm" => Token::Metric(10.0 / super::length::MM_PER_INCH),
                "m" => Token::Metric(1000.0 / super::length::MM_PER_INCH),
                "nan" | "inf" | "infinity" => return Err(LengthError::NotANumber(word)),
                _ => return Err(LengthError::Unexpected(word)),
            });
        } else {
            return Err(LengthError::Unexpected(c.to_string()));
        }
    }
    Ok(tokens)
}

/// A plain decimal: digits with at most one point, at least one digit; no exponent.
fn decimal(text: &str) -> Result<f64, LengthError> {
    let digits = text.chars().filter(char::is_ascii_digit).count();
    if digits == 0 || text.matches('.').count() > 1 {
        return Err(LengthError::NotANumber(text.to_string()));
    }
    text.parse::<f64>()
        .map_err(|_| LengthError::NotANumber(text.to_string()))
}

struct Parser<'t> {
    tokens: &'t [Token],
    at: usize,
    bare_unit_inches: Option<f64>,
}

impl Parser<'_> {
    fn peek(&self) -> Option<&Token> {
        self.tokens.get(self.at)
    }
    fn peek_at(&self, ahead: usize) -> Option<&Token> {
        self.tokens.get(self.at + ahead)
    }
    fn bump(&mut self) -> Option<Token> {
        let t = self.tokens.get(self.at).cloned();
        self.at += 1;
        t
    }

    /// length := metric | feet [inches] | number '-' inches | inches
    fn length(&mut self) -> Result<f64, LengthError> {
        let (value, marked) = match (self.peek(), self.peek_at(1)) {
            (Some(Token::Number(n, _)), Some(Token::Metric(factor))) => {
                let v = n * factor;
                self.at += 2;
                (v, true)
            }
            (Some(Token::Number(feet, _)), Some(Token::Feet)) => {
                let feet = *feet;
                self.at += 2;
                if self.peek() == Some(&Token::Dash) {
                    self.at += 1;
                }
                let inches = if self.peek().is_some() {
                    self.inches_after_feet()?
                } else {
                    0.0
                };
                (feet * 12.0 + inches, true)
            }
            (Some(Token::Number(feet, _)), Some(Token::Dash))
                if matches!(self.peek_at(2), Some(Token::Number(..))) =>
            {
                // `13-7 1/2`: feet, dash, inches, no marks.
                let feet = *feet;
                self.at += 2;
                (feet * 12.0 + self.inches_after_feet()?, true)
            }
            _ => self.inch_part()?,
        };
        if let Some(token) = self.bump() {
            return Err(LengthError::Unexpected(describe(&token)));
        }
        if marked {
            Ok(value)
        } else {
            Ok(value * self.bare_unit_inches.ok_or(LengthError::NoUnit)?)
        }
    }

    fn inches_after_feet(&mut self) -> Result<f64, LengthError> {
        let start = self.at;
        let (inches, _) = self.inch_part()?;
        if inches >= 12.0 {
            let typed: Vec<String> = self.tokens[start..self.at].iter().map(describe).collect();
            return Err(LengthError::InchesOverTwelve(typed.join(" ")));
        }
        Ok(inches)
    }

    /// inch_part := number [['-'] fraction] ['"'] | fraction ['"']; returns (inches, had a mark)
    fn inch_part(&mut self) -> Result<(f64, bool), LengthError> {
        let value = match self.bump() {
            Some(Token::Number(whole, _)) => {
                let dash_fraction = self.peek() == Some(&Token::Dash)
                    && matches!(self.peek_at(1), Some(Token::Fraction(..)));
                if dash_fraction {
                    self.at += 1;
                }
                if let Some(Token::Fraction(part, text)) = self.peek().cloned() {
                    if part >= 1.0 {
                        return Err(improper(&text, None));
                    }
                    self.at += 1;
                    whole + part
                } else {
                    whole
                }
            }
            // A bare fraction of 1 or more is a slip (`11/4"` typed for 1-1/4"), not a length.
            Some(Token::Fraction(part, text)) if part >= 1.0 => {
                return Err(improper(&text, Some(part)))
            }
            Some(Token::Fraction(part, _)) => part,
            Some(token) => return Err(LengthError::Unexpected(describe(&token))),
            None => return Err(LengthError::Incomplete),
        };
        let marked = self.peek() == Some(&Token::Inches);
        if marked {
            self.at += 1;
        } else if let Some(Token::Metric(_)) = self.peek() {
            return Err(LengthError::Unexpected("a metric unit here".into()));
        }
        Ok((value, marked))
    }
}

/// The refusal of a fraction of 1 or more, with what was likely meant: the top's last digit
/// as the fraction after a whole number (`11/4` -> `1-1/4"`), else its value as a mixed
/// number (`99/2` -> `49-1/2"`). `value` is None for a fraction that follows a whole number,
/// whose value is then only named.
fn improper(text: &str, value: Option<f64>) -> LengthError {
    let mut meant = Vec::new();
    if let (Some((top, bottom)), Some(v)) = (text.split_once('/'), value) {
        let b: u32 = bottom.parse().unwrap_or(0);
        for cut in 1..top.len() {
            let (whole, part) = top.split_at(cut);
            let p: u32 = part.parse().unwrap_or(0);
            if p > 0 && p < b && !part.starts_with('0') {
                meant.push(format!("{whole}-{part}/{bottom}\""));
            }
        }
        let mixed = super::format_dimension(super::Length::inches(v), super::UnitSystem::Imperial);
        if !meant.contains(&mixed) {
            meant.push(mixed);
        }
    }
    LengthError::ImproperFraction {
        typed: text.to_string(),
        suggestion: if meant.is_empty() {
            "a fraction under 1 (carry the whole inches in front)".into()
        } else {
            meant.join(" or ")
        },
    }
}

fn describe(token: &Token) -> String {
    match token {
        Token::Number(_, text) | Token::Fraction(_, text) => text.clone(),
        Token::Feet => "'".into(),
        Token::Inches => "\"".into(),
        Token::Dash => "-".into(),
        Token::Metric(_) => "a metric unit here".into(),
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    fn inches(text: &str) -> f64 {
        parse_length(text, None)
            .unwrap_or_else(|e| panic!("{text:?}: {e}"))
            .in_inches()
    }

    // Common practice, no source: how tapes and framing plans write lengths.
    #[test]
    fn forms_a_tape_reads() {
        let table: &[(&str, f64)] = &[
            ("13' 7-1/2\"", 163.5),
            ("13'7.5\"", 163.5),
            ("13-7 1/2", 163.5),
            ("13-7.5", 163.5),
            ("13 ft 7 in", 163.0),
            ("13 ft 7-1/2 in", 163.5),
            ("13'-7\"", 163.0),
            ("13'", 156.0),
            ("16' 0\"", 192.0),
            ("163.5 in", 163.5),
            ("163.5\"", 163.5),
            ("13.625 ft", 163.5),
            ("7/8\"", 0.875),
            ("1-1/2\"", 1.5),
            ("1 1/2 in", 1.5),
            ("13\u{2019} 7\u{00BD}\u{201D}", 163.5),
            ("13\u{2032}7\u{2033}", 163.0),
            ("  163.5 IN ", 163.5),
            (".5\"", 0.5),
        ];
        for (text, expect) in table {
            assert!(
                (inches(text) - expect).abs() < 1e-9,
                "{text}: {} != {expect}",
                inches(text)
            );
        }
    }

    // Source: NIST SP 811 Appendix B (1 in = 25.4 mm exactly).
    #[test]
    fn metric_forms() {
        for text in ["4150 mm", "415 cm", "4.15 m", "4150mm"] {
            assert!((inches(text) - 4150.0 / 25.4).abs() < 1e-9, "{text}");
        }
    }

    #[test]
    fn garbage_is_refused_with_a_reason() {
        let table: &[(&str, LengthError)] = &[
            ("", LengthError::Empty),
            ("   ", LengthError::Empty),
            ("13''7", LengthError::Unexpected("''".into())),
            ("-4", LengthError::Negative),
            ("-4\"", LengthError::Negative),
            ("1e309", LengthError::Unexpected("e".into())),
            ("NaN", LengthError::NotANumber("nan".into())),
            ("inf ft", LengthError::NotANumber("inf".into())),
            ("163.5", LengthError::NoUnit),
            ("13' 14\"", LengthError::InchesOverTwelve("14 \"".into())),
            ("1/0\"", LengthError::BadFraction("1/0".into())),
            (
                "7 3/2\"",
                LengthError::ImproperFraction {
                    typed: "3/2".into(),
                    suggestion: "a fraction under 1 (carry the whole inches in front)".into(),
                },
            ),
            ("1.2.3\"", LengthError::NotANumber("1.2.3".into())),
            ("13 7", LengthError::Unexpected("7".into())),
            ("13' ft", LengthError::Unexpected("'".into())),
            ("99999999 ft", LengthError::TooLarge("99999999 ft".into())),
            ("4 furlongs", LengthError::Unexpected("furlongs".into())),
            ("長さ", LengthError::Unexpected("長さ".into())),
            (
                "13 ft 4 mm",
                LengthError::Unexpected("a metric unit here".into()),
            ),
        ];
        for (text, expect) in table {
            assert_eq!(parse_length(text, None).as_ref(), Err(expect), "{text:?}");
        }
        assert_eq!(
            parse_length(&"9".repeat(10_000), None),
            Err(LengthError::TooLong(10_000))
        );
    }

    // A bare fraction of 1 or more is refused with what was likely meant, as a fraction of
    // 1 or more after whole inches is (common practice, no source: tape fractions are
    // proper).
    #[test]
    fn improper_fractions_are_questioned_not_guessed() {
        let refused = |text: &str, bare: Option<f64>| match parse_length(text, bare) {
            Err(LengthError::ImproperFraction { suggestion, .. }) => suggestion,
            other => panic!("{text:?}: {other:?}"),
        };
        assert_eq!(refused("11/4\"", None), "1-1/4\" or 2-3/4\"");
        assert_eq!(refused("11/2", Some(1.0)), "1-1/2\" or 5-1/2\"");
        assert_eq!(refused("16/16\"", None), "1-6/16\" or 1\"");
        assert_eq!(refused("99/2\"", None), "49-1/2\"");
        assert!(refused("12' 11 16/16\"", None).contains("under 1"));
        let message = parse_length("11/4\"", None).unwrap_err().to_string();
        assert_eq!(
            message,
            "fraction 11/4 is 1 or more: did you mean 1-1/4\" or 2-3/4\"?"
        );
        // Proper fractions still read.
        assert_eq!(parse_length("15/16\"", None).unwrap().in_inches(), 0.9375);
    }

    #[test]
    fn bare_numbers_take_the_field_unit() {
        assert_eq!(parse_length("16", Some(12.0)).unwrap().in_inches(), 192.0);
        assert_eq!(parse_length("2-1/2", Some(1.0)).unwrap().in_inches(), 2.5);
        // A typed unit wins over the field's unit.
        assert_eq!(parse_length("16\"", Some(12.0)).unwrap().in_inches(), 16.0);
    }
}
