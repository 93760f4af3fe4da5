//! Species groups of visually graded dimension lumber, as a user may type them.

use std::fmt;
use std::str::FromStr;

/// The species groups whose design values the engine carries (NDS Supplement Tables 4A/4B).
/// In JSON written as its kebab-case key (`"spruce-pine-fir"`); read leniently like typed text.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash)]
pub enum Species {
    DouglasFirLarch,
    HemFir,
    SouthernPine,
    SprucePineFir,
}

impl Species {
    pub const ALL: [Species; 4] = [
        Species::DouglasFirLarch,
        Species::HemFir,
        Species::SouthernPine,
        Species::SprucePineFir,
    ];

    /// The short code used in the design-value table and on grade stamps.
    pub fn code(self) -> &'static str {
        match self {
            Species::DouglasFirLarch => "DFL",
            Species::HemFir => "HF",
            Species::SouthernPine => "SP",
            Species::SprucePineFir => "SPF",
        }
    }

    /// The stable key used in files and on the command line.
    pub fn key(self) -> &'static str {
        match self {
            Species::DouglasFirLarch => "douglas-fir-larch",
            Species::HemFir => "hem-fir",
            Species::SouthernPine => "southern-pine",
            Species::SprucePineFir => "spruce-pine-fir",
        }
    }

    pub fn name(self) -> &'static str {
        match self {
            Species::DouglasFirLarch => "Douglas fir-larch",
            Species::HemFir => "Hem-fir",
            Species::SouthernPine => "Southern pine",
            Species::SprucePineFir => "Spruce-pine-fir",
        }
    }

    /// The accepted spellings, for error messages.
    pub fn known_names() -> &'static str {
        "dfl (douglas-fir-larch), hf (hem-fir), sp (southern-pine), spf (spruce-pine-fir)"
    }
}

impl fmt::Display for Species {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        f.write_str(self.name())
    }
}

impl FromStr for Species {
    type Err = String;
    fn from_str(text: &str) -> Result<Self, String> {
        let key = super::typed_key(text);
        match key.as_str() {
            "dfl" | "df" | "douglasfirlarch" | "douglasfir" | "dfir" => {
                Ok(Species::DouglasFirLarch)
            }
            "hf" | "hemfir" => Ok(Species::HemFir),
            "sp" | "syp" | "southernpine" | "southernyellowpine" => Ok(Species::SouthernPine),
            "spf" | "sprucepinefir" => Ok(Species::SprucePineFir),
            _ => Err(format!(
                "unknown species \"{}\"; known: {}",
                text.trim(),
                Species::known_names()
            )),
        }
    }
}

crate::serde_via_text!(Species, key);

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn accepts_what_users_type() {
        let table = [
            ("spf", Species::SprucePineFir),
            ("SPF", Species::SprucePineFir),
            ("spruce-pine-fir", Species::SprucePineFir),
            ("Spruce Pine Fir", Species::SprucePineFir),
            ("dfl", Species::DouglasFirLarch),
            ("DF-L", Species::DouglasFirLarch),
            ("hem-fir", Species::HemFir),
            ("HEM FIR", Species::HemFir),
            ("sp", Species::SouthernPine),
            ("SYP", Species::SouthernPine),
        ];
        for (text, expect) in table {
            assert_eq!(text.parse::<Species>(), Ok(expect), "{text}");
        }
    }

    #[test]
    fn unknown_lists_the_known() {
        let err = "oak".parse::<Species>().unwrap_err();
        assert!(
            err.contains("\"oak\"") && err.contains("spruce-pine-fir"),
            "{err}"
        );
    }
}
