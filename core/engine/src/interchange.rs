//! Reads and writes an inspection as JSON (the interchange format of `docs/inspection-format.md`),
//! refusing malformed files with the path of the bad field.

use crate::model::{Inspection, FORMAT_NAME, FORMAT_VERSION};
use std::collections::HashSet;
use thiserror::Error;

/// Files larger than this are refused before parsing (an inspection is tens of kilobytes).
pub const MAX_FILE_BYTES: usize = 32 * 1024 * 1024;

#[derive(Debug, Error, PartialEq)]
pub enum InterchangeError {
    #[error("the file is empty")]
    Empty,
    #[error("the file is {0} bytes; an inspection file is at most 32 MiB")]
    TooLarge(usize),
    #[error("the file is not UTF-8 text")]
    NotText,
    #[error("at {path}: {message}")]
    Field { path: String, message: String },
    #[error("not an inspection file (format is \"{0}\", expected \"undercroft-inspection\")")]
    WrongFormat(String),
    #[error("format version {0} is newer than this app reads ({FORMAT_VERSION}); update the app")]
    TooNew(u32),
    #[error("id \"{0}\" is used more than once")]
    DuplicateId(String),
    #[error("{0} has an empty id")]
    EmptyId(String),
}

pub type Result<T> = std::result::Result<T, InterchangeError>;

/// Parses and checks an inspection file.
pub fn from_json_bytes(bytes: &[u8]) -> Result<Inspection> {
    if bytes.iter().all(u8::is_ascii_whitespace) {
        return Err(InterchangeError::Empty);
    }
    if bytes.len() > MAX_FILE_BYTES {
        return Err(InterchangeError::TooLarge(bytes.len()));
    }
    let text = std::str::from_utf8(bytes).map_err(|_| InterchangeError::NotText)?;
    from_json(text)
}

pub fn from_json(text: &str) -> Result<Inspection> {
    let mut de = serde_json::Deserializer::from_str(text);
    let inspection: Inspection = serde_path_to_error::deserialize(&mut de).map_err(|e| {
        let path = e.path().to_string();
        let inner = e.into_inner();
        let message = if inner.is_eof() {
            "the file ends too early (truncated?)".to_string()
        } else {
            inner.to_string()
        };
        InterchangeError::Field {
            path: if path == "." { "the top".into() } else { path },
            message,
        }
    })?;
    de.end().map_err(|e| InterchangeError::Field {
        path: "the end".into(),
        message: e.to_string(),
    })?;
    if inspection.format != FORMAT_NAME {
        return Err(InterchangeError::WrongFormat(inspection.format));
    }
    if inspection.version > FORMAT_VERSION {
        return Err(InterchangeError::TooNew(inspection.version));
    }
    crate::model::check_date(&inspection.date).map_err(|message| InterchangeError::Field {
        path: "date".into(),
        message,
    })?;
    check_ids(&inspection)?;
    Ok(inspection)
}

/// The invented demo inspection of `demo-data/`, as its file reads: the app's first launch,
/// tests and benchmarks start from it.
pub const DEMO_JSON: &str = include_str!("../../../demo-data/demo-inspection.json");

/// The demo inspection, read.
pub fn demo() -> Inspection {
    from_json(DEMO_JSON).expect("the demo reads")
}

/// Writes the inspection as pretty JSON.
pub fn to_json(inspection: &Inspection) -> String {
    serde_json::to_string_pretty(inspection).expect("the model always serializes")
}

fn check_ids(inspection: &Inspection) -> Result<()> {
    if inspection.id.trim().is_empty() {
        return Err(InterchangeError::EmptyId("the inspection".into()));
    }
    let mut seen = HashSet::new();
    for id in crate::model::renumber::ids_of(inspection)
        .into_iter()
        .skip(1)
    {
        if id.trim().is_empty() {
            return Err(InterchangeError::EmptyId(
                "an area, run, joist, member, girder, post, observation or photo".into(),
            ));
        }
        if !seen.insert(id) {
            return Err(InterchangeError::DuplicateId(id.to_string()));
        }
    }
    Ok(())
}

#[cfg(test)]
mod tests {
    use super::*;

    const MINIMAL: &str = r#"{"format":"undercroft-inspection","version":1,"id":"i1","property":{"address":"1 Elm"},"date":"2026-12-01"}"#;

    #[test]
    fn minimal_file_reads() {
        let i = from_json(MINIMAL).unwrap();
        assert_eq!(i.code_edition, "IRC 2018");
        assert_eq!(from_json(&to_json(&i)).unwrap(), i);
    }

    #[test]
    fn bad_fields_name_their_path() {
        let bad_span = MINIMAL.replace(
            r#""date":"2026-12-01""#,
            r#""date":"2026-12-01","areas":[{"id":"a","name":"Crawl","runs":[{"id":"r","label":"R","framing":{"clear_span":"13''7"}}]}]"#,
        );
        let err = from_json(&bad_span).unwrap_err();
        let InterchangeError::Field { path, message } = &err else {
            panic!("{err}")
        };
        assert_eq!(path, "areas[0].runs[0].framing.clear_span");
        assert!(message.contains("13''7"), "{message}");

        let bad_species = MINIMAL.replace(
            r#""date":"2026-12-01""#,
            r#""date":"2026-12-01","areas":[{"id":"a","name":"Crawl","members":[{"id":"m","label":"M","framing":{"species":"oak"}}]}]"#,
        );
        let err = from_json(&bad_species).unwrap_err().to_string();
        assert!(
            err.starts_with("at areas[0].members[0].framing.species: unknown species \"oak\""),
            "{err}"
        );
    }

    #[test]
    fn dates_and_ids_are_checked() {
        let with = |date: &str, id: &str| {
            MINIMAL
                .replace("2026-12-01", date)
                .replace(r#""id":"i1""#, &format!(r#""id":"{id}""#))
        };
        assert!(from_json(&with("2026-12-01", "i1")).is_ok());
        for date in ["2026-02-30", "yesterday"] {
            match from_json(&with(date, "i1")) {
                Err(InterchangeError::Field { path, .. }) => assert_eq!(path, "date"),
                other => panic!("{date}: {other:?}"),
            }
        }
        assert_eq!(
            from_json(&with("2026-12-01", " ")),
            Err(InterchangeError::EmptyId("the inspection".into()))
        );
    }

    #[test]
    fn garbage_and_edges() {
        assert_eq!(from_json_bytes(b""), Err(InterchangeError::Empty));
        assert_eq!(from_json_bytes(b"\xff\xfe"), Err(InterchangeError::NotText));
        assert!(matches!(
            from_json_bytes(&MINIMAL.as_bytes()[..40]),
            Err(InterchangeError::Field { .. })
        ));
        assert!(matches!(
            from_json("[1,2]"),
            Err(InterchangeError::Field { .. })
        ));
        assert!(matches!(
            from_json(&format!("{MINIMAL} x")),
            Err(InterchangeError::Field { .. })
        ));
        let other = MINIMAL.replace("undercroft-inspection", "something-else");
        assert!(matches!(
            from_json(&other),
            Err(InterchangeError::WrongFormat(_))
        ));
        let newer = MINIMAL.replace(r#""version":1"#, r#""version":9"#);
        assert_eq!(from_json(&newer), Err(InterchangeError::TooNew(9)));
        let dup = MINIMAL.replace(
            r#""date":"2026-12-01""#,
            r#""date":"2026-12-01","areas":[{"id":"a","name":"A"},{"id":"a","name":"B"}]"#,
        );
        assert_eq!(
            from_json(&dup),
            Err(InterchangeError::DuplicateId("a".into()))
        );
        let big = vec![b' '; MAX_FILE_BYTES + 1];
        assert_eq!(from_json_bytes(&big), Err(InterchangeError::Empty));
    }

    #[test]
    fn photo_references_read_and_write() {
        let text = MINIMAL.replace(
            r#""date":"2026-12-01""#,
            r#""date":"2026-12-01","photos":[{"id":"p1","file":"photos/a.jpg","attached_to":"o1","caption":"Notch, 李"}]"#,
        );
        let i = from_json(&text).unwrap();
        assert_eq!(i.photos[0].caption, "Notch, 李");
        assert_eq!(from_json(&to_json(&i)).unwrap(), i);
    }

    #[test]
    fn non_latin_text_survives() {
        let text = MINIMAL.replace("1 Elm", "Nguyễn Văn 李 Zoë Ångström");
        let i = from_json(&text).unwrap();
        assert_eq!(i.property.address, "Nguyễn Văn 李 Zoë Ångström");
    }
}
