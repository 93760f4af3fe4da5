//! Marks drawn on a photo to point at what a finding is about: an arrow, a circle, a measured
//! dimension. They are a layer of their own, kept beside the photo; the photo's files are
//! never changed, and the report draws the marks over its image.

use serde::{Deserialize, Serialize};

/// A point on a photo: fractions of its width (from the left) and height (from the top).
pub type Spot = [f64; 2];

/// The most marks one photo keeps: more hide the photo.
pub const MOST_MARKS: usize = 12;
/// The longest label of a dimension, in characters.
const LONGEST_LABEL: usize = 24;

#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(tag = "kind", rename_all = "kebab-case", deny_unknown_fields)]
pub enum PhotoMark {
    /// From its tail to the point it shows.
    Arrow { from: Spot, to: Spot },
    /// Around something; the radius as a fraction of the photo's width.
    Circle { centre: Spot, radius: f64 },
    /// A measured distance between two points, labelled as measured ("2-1/2\"").
    Dimension { from: Spot, to: Spot, label: String },
}

impl PhotoMark {
    /// Why the mark cannot be kept, in words, if it cannot.
    pub fn problem(&self) -> Option<String> {
        let on_photo = |s: &Spot| s.iter().all(|v| v.is_finite() && (0.0..=1.0).contains(v));
        match self {
            PhotoMark::Arrow { from, to } | PhotoMark::Dimension { from, to, .. }
                if !on_photo(from) || !on_photo(to) =>
            {
                Some("a mark's ends must be on the photo".into())
            }
            PhotoMark::Arrow { from, to } if from == to => {
                Some("an arrow needs two different points".into())
            }
            PhotoMark::Circle { centre, radius } => {
                (!on_photo(centre) || !radius.is_finite() || *radius <= 0.0 || *radius > 1.0)
                    .then(|| "a circle must be centred on the photo, with a size".into())
            }
            PhotoMark::Dimension { label, .. } if label.trim().is_empty() => {
                Some("say what the dimension measures (for example 2-1/2\")".into())
            }
            PhotoMark::Dimension { label, .. } if label.chars().count() > LONGEST_LABEL => Some(
                format!("a dimension's label is at most {LONGEST_LABEL} characters"),
            ),
            _ => None,
        }
    }
}

/// The problem with a photo's marks as a whole, if any.
pub fn marks_problem(marks: &[PhotoMark]) -> Option<String> {
    if marks.len() > MOST_MARKS {
        return Some(format!("at most {MOST_MARKS} marks on one photo"));
    }
    marks.iter().find_map(PhotoMark::problem)
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn marks_read_back_and_bad_ones_are_refused_in_words() {
        let marks = vec![
            PhotoMark::Arrow {
                from: [0.1, 0.2],
                to: [0.5, 0.5],
            },
            PhotoMark::Circle {
                centre: [0.5, 0.5],
                radius: 0.1,
            },
            PhotoMark::Dimension {
                from: [0.2, 0.8],
                to: [0.6, 0.8],
                label: "2-1/2\"".into(),
            },
        ];
        let json = serde_json::to_string(&marks).unwrap();
        assert_eq!(
            serde_json::from_str::<Vec<PhotoMark>>(&json).unwrap(),
            marks
        );
        assert_eq!(marks_problem(&marks), None);
        let off = PhotoMark::Arrow {
            from: [1.5, 0.2],
            to: [0.5, f64::NAN],
        };
        assert!(off.problem().unwrap().contains("on the photo"));
        let blank = PhotoMark::Dimension {
            from: [0.2, 0.8],
            to: [0.6, 0.8],
            label: "  ".into(),
        };
        assert!(blank
            .problem()
            .unwrap()
            .contains("what the dimension measures"));
        let many = vec![marks[0].clone(); MOST_MARKS + 1];
        assert!(marks_problem(&many).unwrap().contains("at most"));
        assert!(serde_json::from_str::<Vec<PhotoMark>>(r#"[{"kind":"star"}]"#).is_err());
    }
}
