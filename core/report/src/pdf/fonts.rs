//! The report's fonts, parsed once: DejaVu Sans (regular, bold; Latin, Greek, Cyrillic,
//! Hebrew, Arabic), Droid Sans Fallback for Chinese and Japanese, and NanumSquare for Korean
//! Hangul. Text is measured here and split into runs by font.

use printpdf::ParsedFont;
use std::sync::OnceLock;

const REGULAR: &[u8] = include_bytes!("../../assets/fonts/DejaVuSans.ttf");
const BOLD: &[u8] = include_bytes!("../../assets/fonts/DejaVuSans-Bold.ttf");
const FALLBACK: &[u8] = include_bytes!("../../assets/fonts/DroidSansFallbackFull.ttf");
const HANGUL: &[u8] = include_bytes!("../../assets/fonts/NanumSquareR.ttf");

#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash)]
pub enum Face {
    Regular,
    Bold,
    Fallback,
    Hangul,
}

fn parse(bytes: &[u8]) -> ParsedFont {
    ParsedFont::from_bytes(bytes, 0, &mut Vec::new()).expect("bundled font parses")
}

pub fn font(face: Face) -> &'static ParsedFont {
    static REG: OnceLock<ParsedFont> = OnceLock::new();
    static BLD: OnceLock<ParsedFont> = OnceLock::new();
    static FB: OnceLock<ParsedFont> = OnceLock::new();
    static HG: OnceLock<ParsedFont> = OnceLock::new();
    match face {
        Face::Regular => REG.get_or_init(|| parse(REGULAR)),
        Face::Bold => BLD.get_or_init(|| parse(BOLD)),
        Face::Fallback => FB.get_or_init(|| parse(FALLBACK)),
        Face::Hangul => HG.get_or_init(|| parse(HANGUL)),
    }
}

/// Korean letters: Hangul syllables, jamo and compatibility jamo.
fn is_hangul(c: char) -> bool {
    matches!(c as u32, 0xAC00..=0xD7A3 | 0x1100..=0x11FF | 0x3130..=0x318F | 0xA960..=0xA97F | 0xD7B0..=0xD7FF)
}

fn has(face: Face, c: char) -> bool {
    font(face)
        .lookup_glyph_index(c as u32)
        .is_some_and(|g| g != 0)
}

/// The face that draws `c` in the wanted style: the style's own, else the Hangul face for
/// Korean, else the CJK fallback when it has the glyph, else the style's own (which draws a
/// missing-glyph box).
fn face_for(c: char, style: Face) -> Face {
    if c.is_whitespace() || has(style, c) {
        return style;
    }
    if is_hangul(c) && has(Face::Hangul, c) {
        Face::Hangul
    } else if has(Face::Fallback, c) {
        Face::Fallback
    } else {
        style
    }
}

/// Splits text into runs drawn by one face each.
pub fn runs(text: &str, style: Face) -> Vec<(Face, String)> {
    let mut out: Vec<(Face, String)> = Vec::new();
    for c in text.chars() {
        let face = face_for(c, style);
        match out.last_mut() {
            Some((f, s)) if *f == face => s.push(c),
            _ => out.push((face, c.to_string())),
        }
    }
    out
}

/// Advance width of `text` in points at `size`.
pub fn width(text: &str, size: f32, style: Face) -> f32 {
    runs(text, style)
        .iter()
        .map(|(face, s)| run_width(s, size, *face))
        .sum()
}

fn run_width(text: &str, size: f32, face: Face) -> f32 {
    let f = font(face);
    let units = f.units_per_em.max(1) as f32;
    let advance: u32 = text
        .chars()
        .map(|c| {
            let gid = f.lookup_glyph_index(c as u32).unwrap_or(0);
            f.get_glyph_width(gid).unwrap_or(f.units_per_em / 2) as u32
        })
        .sum();
    advance as f32 / units * size
}

/// Width of one run (for placing the next).
pub fn measure_run(text: &str, size: f32, face: Face) -> f32 {
    run_width(text, size, face)
}

/// Breaks text into lines no wider than `max` (words longer than a line are cut).
pub fn wrap(text: &str, size: f32, style: Face, max: f32) -> Vec<String> {
    let mut lines = Vec::new();
    for paragraph in text.split('\n') {
        let mut line = String::new();
        for word in paragraph.split_whitespace() {
            let candidate = if line.is_empty() {
                word.to_string()
            } else {
                format!("{line} {word}")
            };
            if width(&candidate, size, style) <= max {
                line = candidate;
                continue;
            }
            if !line.is_empty() {
                lines.push(std::mem::take(&mut line));
            }
            // A word wider than the line is cut by characters (CJK text has no spaces).
            for c in word.chars() {
                let mut next = line.clone();
                next.push(c);
                if width(&next, size, style) > max && !line.is_empty() {
                    lines.push(std::mem::take(&mut line));
                    line.push(c);
                } else {
                    line = next;
                }
            }
        }
        lines.push(line);
    }
    lines
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn non_latin_text_finds_a_face() {
        assert_eq!(
            runs("Zoë Ångström Nguyễn", Face::Regular).len(),
            1,
            "DejaVu covers Latin and Vietnamese"
        );
        let r = runs("Client 李 Zoë", Face::Bold);
        assert_eq!(
            r.iter().map(|(f, _)| *f).collect::<Vec<_>>(),
            [Face::Bold, Face::Fallback, Face::Bold]
        );
    }

    #[test]
    fn wrapping_keeps_every_word_and_fits() {
        let text = "The joists span 1' 1\" more than the code allows for these loads. Refer to a licensed professional.";
        let lines = wrap(text, 10.0, Face::Regular, 150.0);
        assert!(lines.len() > 2);
        assert!(lines.iter().all(|l| width(l, 10.0, Face::Regular) <= 150.0));
        assert_eq!(lines.join(" "), text);
        let cjk = "李".repeat(60);
        assert!(wrap(&cjk, 10.0, Face::Regular, 100.0).len() > 3);
    }
}
