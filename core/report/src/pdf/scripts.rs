//! Right-to-left text made drawable by a left-to-right text writer: Arabic letters joined into
//! their positional forms (ar-reshaper, the Unicode presentation forms), and each line put in
//! visual order by the Unicode Bidirectional Algorithm (unicode-bidi, UAX #9).

use std::borrow::Cow;

/// True for characters of the right-to-left scripts handled here (Hebrew, Arabic and their
/// presentation forms).
fn is_rtl(c: char) -> bool {
    matches!(c as u32, 0x0590..=0x08FF | 0xFB1D..=0xFDFF | 0xFE70..=0xFEFF)
}

/// One line as it is to be drawn left to right: Arabic joined, right-to-left runs reversed
/// into visual order. Lines with no right-to-left character are returned as they are.
pub fn visual(line: &str) -> Cow<'_, str> {
    if !line.chars().any(is_rtl) {
        return Cow::Borrowed(line);
    }
    let joined = ar_reshaper::reshape_line(line);
    // The report is written left to right: the paragraph level is LTR, as UAX #9 HL1 allows.
    let info = unicode_bidi::BidiInfo::new(&joined, Some(unicode_bidi::Level::ltr()));
    let mut out = String::with_capacity(joined.len());
    for paragraph in &info.paragraphs {
        out.push_str(&info.reorder_line(paragraph, paragraph.range.clone()));
    }
    Cow::Owned(out)
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn latin_is_untouched() {
        assert!(matches!(visual("Joist 7, 2x10"), Cow::Borrowed(_)));
    }

    // Source: Unicode Standard ch. 9 and the Arabic Presentation Forms-B chart: SEEN MEDIAL
    // is U+FEB4, LAM-ALEF isolated ligature U+FEFB; in visual order the first logical letter
    // is drawn last (rightmost).
    #[test]
    fn arabic_is_joined_and_reversed() {
        let shown = visual("سلام");
        let chars: Vec<char> = shown.chars().collect();
        assert_eq!(chars.last(), Some(&'\u{FEB3}'), "{shown}"); // SEEN INITIAL, drawn rightmost
        assert!(
            shown.contains('\u{FEFC}') || shown.contains('\u{FEFB}'),
            "{shown}"
        );
        assert!(
            !shown.contains('\u{0633}'),
            "no unjoined letter left: {shown}"
        );
    }

    // Hebrew has no joining: only the order changes. "שלום" (shin lamed vav final-mem) is
    // drawn mem, vav, lamed, shin; Latin around it keeps its order.
    #[test]
    fn hebrew_is_reversed_within_latin() {
        assert_eq!(visual("a שלום b"), "a םולש b");
    }
}
