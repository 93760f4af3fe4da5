//! Visual grades from the grade stamp, and the stated default when no stamp is visible.

use std::fmt;
use std::str::FromStr;

/// Visual stress grades of dimension lumber (NDS Supplement Tables 4A/4B).
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash)]
pub enum Grade {
    SelectStructural,
    No1,
    No2,
    No3,
}

/// The grade assumed when no grade stamp is visible: No. 3, the lowest structural grade the
/// engine carries. Stated on every finding that uses it. (A conservative choice of this
/// product, common practice, no source: old or unstamped lumber cannot be shown to be better.)
pub const UNKNOWN_GRADE_DEFAULT: Grade = Grade::No3;

/// What the inspector recorded: a grade read off the stamp, or no stamp visible.
/// In JSON: `"select-structural"`, `"no1"`, `"no2"`, `"no3"` or `"none"`; read leniently.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash)]
pub enum GradeChoice {
    Stamped(Grade),
    NoStampVisible,
}

impl GradeChoice {
    /// The stable key used in files and on the command line.
    pub fn key(self) -> &'static str {
        match self {
            GradeChoice::Stamped(g) => g.key(),
            GradeChoice::NoStampVisible => "none",
        }
    }

    /// The grade used in the computation.
    pub fn grade_for_design(self) -> Grade {
        match self {
            GradeChoice::Stamped(g) => g,
            GradeChoice::NoStampVisible => UNKNOWN_GRADE_DEFAULT,
        }
    }
}

impl Grade {
    pub const ALL: [Grade; 4] = [Grade::SelectStructural, Grade::No1, Grade::No2, Grade::No3];

    pub fn key(self) -> &'static str {
        match self {
            Grade::SelectStructural => "select-structural",
            Grade::No1 => "no1",
            Grade::No2 => "no2",
            Grade::No3 => "no3",
        }
    }

    /// The code used in the design-value table.
    pub fn code(self) -> &'static str {
        match self {
            Grade::SelectStructural => "SS",
            Grade::No1 => "#1",
            Grade::No2 => "#2",
            Grade::No3 => "#3",
        }
    }

    pub fn name(self) -> &'static str {
        match self {
            Grade::SelectStructural => "Select Structural",
            Grade::No1 => "No. 1",
            Grade::No2 => "No. 2",
            Grade::No3 => "No. 3",
        }
    }

    pub fn known_names() -> &'static str {
        "ss (select-structural), no1 (#1, 1), no2 (#2, 2), no3 (#3, 3), or none (no grade stamp visible)"
    }
}

impl fmt::Display for Grade {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        f.write_str(self.name())
    }
}

impl FromStr for GradeChoice {
    type Err = String;
    fn from_str(text: &str) -> Result<Self, String> {
        let key = super::typed_key(text);
        let grade = match key.as_str() {
            "ss" | "selectstructural" | "sel" | "selstr" => Grade::SelectStructural,
            "1" | "no1" | "number1" => Grade::No1,
            "2" | "no2" | "number2" => Grade::No2,
            "3" | "no3" | "number3" => Grade::No3,
            "none" | "nostamp" | "unknown" | "nostampvisible" | "nogradestampvisible" => {
                return Ok(GradeChoice::NoStampVisible)
            }
            _ => {
                return Err(format!(
                    "unknown grade \"{}\"; known: {}",
                    text.trim(),
                    Grade::known_names()
                ))
            }
        };
        Ok(GradeChoice::Stamped(grade))
    }
}

impl fmt::Display for GradeChoice {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        match self {
            GradeChoice::Stamped(g) => f.write_str(g.name()),
            GradeChoice::NoStampVisible => write!(
                f,
                "no grade stamp visible ({} assumed)",
                UNKNOWN_GRADE_DEFAULT.name()
            ),
        }
    }
}

crate::serde_via_text!(GradeChoice, key);

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn accepts_what_users_type() {
        let table = [
            ("no2", GradeChoice::Stamped(Grade::No2)),
            ("#2", GradeChoice::Stamped(Grade::No2)),
            ("2", GradeChoice::Stamped(Grade::No2)),
            ("No. 1", GradeChoice::Stamped(Grade::No1)),
            ("ss", GradeChoice::Stamped(Grade::SelectStructural)),
            (
                "select-structural",
                GradeChoice::Stamped(Grade::SelectStructural),
            ),
            ("#3", GradeChoice::Stamped(Grade::No3)),
            ("none", GradeChoice::NoStampVisible),
            ("no stamp visible", GradeChoice::NoStampVisible),
        ];
        for (text, expect) in table {
            assert_eq!(text.parse::<GradeChoice>(), Ok(expect), "{text}");
        }
        assert_eq!(GradeChoice::NoStampVisible.grade_for_design(), Grade::No3);
    }

    #[test]
    fn unknown_lists_the_known() {
        let err = "construction".parse::<GradeChoice>().unwrap_err();
        assert!(
            err.contains("\"construction\"") && err.contains("select-structural"),
            "{err}"
        );
    }
}
