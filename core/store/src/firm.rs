//! The firm's settings, kept by the office and taken by every device at sync: the company's
//! name, each inspector's licence, the code edition and local amendments of each county the
//! firm works in, and default loads. They fill the fields of a new inspection.

use crate::{NewInspection, Settings};
use serde::{Deserialize, Serialize};
use thiserror::Error;

#[derive(Debug, Clone, PartialEq, Default, Serialize, Deserialize)]
#[serde(default, deny_unknown_fields)]
pub struct FirmSettings {
    pub company: String,
    pub licenses: Vec<LicenseEntry>,
    /// The edition a county has not named otherwise, e.g. "IRC 2018".
    pub code_edition: String,
    pub counties: Vec<CountyRule>,
    /// Live load, psf, for floors whose room use the inspector has not picked.
    pub live_psf: Option<f64>,
    /// Dead load, psf, for floors without heavy finishes (tile, stone).
    pub dead_psf: Option<f64>,
}

/// An inspector's licence, by the name they sign with.
#[derive(Debug, Clone, PartialEq, Default, Serialize, Deserialize)]
#[serde(default, deny_unknown_fields)]
pub struct LicenseEntry {
    pub inspector: String,
    pub number: String,
}

/// What applies in one county (matched against the end of an address, case-insensitively).
#[derive(Debug, Clone, PartialEq, Default, Serialize, Deserialize)]
#[serde(default, deny_unknown_fields)]
pub struct CountyRule {
    pub county: String,
    pub code_edition: String,
    pub local_amendments: String,
}

#[derive(Debug, Error, PartialEq)]
pub enum FirmSettingsError {
    #[error(
        "the code edition \"{0}\" is not one this app checks against (IRC 2015, 2018 or 2021)"
    )]
    UnknownEdition(String),
    #[error("{0} load {1} psf is not a floor load (0 to 300 psf)")]
    BadLoad(&'static str, f64),
    #[error("{0} is longer than 4096 characters")]
    TooLong(&'static str),
    #[error("county \"{0}\" is listed twice")]
    DuplicateCounty(String),
}

impl FirmSettings {
    /// Checks what the office typed: editions the engine knows, loads a floor can carry.
    pub fn check(&self) -> Result<(), FirmSettingsError> {
        let known = |e: &str| {
            e.is_empty()
                || undercroft_engine::forms::CODE_EDITIONS
                    .iter()
                    .any(|(k, _)| k.eq_ignore_ascii_case(e))
        };
        let editions = std::iter::once(&self.code_edition)
            .chain(self.counties.iter().map(|c| &c.code_edition));
        for edition in editions {
            if !known(edition) {
                return Err(FirmSettingsError::UnknownEdition(edition.clone()));
            }
        }
        for (which, load) in [("live", self.live_psf), ("dead", self.dead_psf)] {
            if let Some(psf) = load.filter(|p| !(0.0..=300.0).contains(p) || p.is_nan()) {
                return Err(FirmSettingsError::BadLoad(which, psf));
            }
        }
        let texts = [("the company", &self.company)]
            .into_iter()
            .chain(
                self.counties
                    .iter()
                    .map(|c| ("a county's amendments", &c.local_amendments)),
            )
            .chain(self.licenses.iter().map(|l| ("a licence", &l.number)));
        for (what, text) in texts {
            if text.chars().count() > 4096 {
                return Err(FirmSettingsError::TooLong(what));
            }
        }
        let mut seen = std::collections::HashSet::new();
        for c in &self.counties {
            if !seen.insert(c.county.trim().to_lowercase()) {
                return Err(FirmSettingsError::DuplicateCounty(c.county.clone()));
            }
        }
        Ok(())
    }

    /// The county rule whose county the address names, if any.
    pub fn county_of(&self, address: &str) -> Option<&CountyRule> {
        let address = address.to_lowercase();
        self.counties.iter().find(|c| {
            let county = c.county.trim().to_lowercase();
            !county.is_empty() && address.contains(&county)
        })
    }

    /// The licence the firm holds for this inspector, if any.
    pub fn license_of(&self, inspector: &str) -> Option<&str> {
        let inspector = inspector.trim();
        self.licenses
            .iter()
            .find(|l| !inspector.is_empty() && l.inspector.trim().eq_ignore_ascii_case(inspector))
            .map(|l| l.number.as_str())
    }

    /// Fills what a new inspection leaves empty: the company, this inspector's licence, the
    /// edition of the address's county (else the firm's). Returns the county's amendments to
    /// set on the inspection, if any.
    pub fn fill(&self, new: &mut NewInspection) -> Option<String> {
        if new.inspector_company.trim().is_empty() {
            new.inspector_company = self.company.clone();
        }
        if new.inspector_license.trim().is_empty() {
            if let Some(number) = self.license_of(&new.inspector_name) {
                new.inspector_license = number.into();
            }
        }
        let county = self.county_of(&new.address);
        let edition = county
            .map(|c| c.code_edition.as_str())
            .filter(|e| !e.is_empty())
            .or(Some(self.code_edition.as_str()).filter(|e| !e.is_empty()));
        if let Some(edition) = edition {
            new.code_edition = edition.into();
        }
        county
            .map(|c| c.local_amendments.clone())
            .filter(|a| !a.trim().is_empty())
    }

    /// The device's own settings with the firm's company, licence and edition put in.
    pub fn apply_to(&self, settings: &mut Settings) {
        if !self.company.trim().is_empty() {
            settings.company = self.company.clone();
        }
        if let Some(number) = self.license_of(&settings.inspector_name) {
            settings.license = number.into();
        }
        if !self.code_edition.trim().is_empty() {
            settings.code_edition = self.code_edition.clone();
        }
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    fn firm() -> FirmSettings {
        FirmSettings {
            company: "Lantern Hill Inspections".into(),
            licenses: vec![LicenseEntry {
                inspector: "Ana Ruiz".into(),
                number: "HI-4471".into(),
            }],
            code_edition: "IRC 2018".into(),
            counties: vec![CountyRule {
                county: "Marrow County".into(),
                code_edition: "IRC 2021".into(),
                local_amendments: "Marrow County amends R502.8: no notches in the middle third."
                    .into(),
            }],
            live_psf: Some(40.0),
            dead_psf: Some(10.0),
        }
    }

    #[test]
    fn a_new_inspection_takes_the_county_edition_and_the_inspectors_licence() {
        let mut new = NewInspection {
            address: "12 Quarry Lane, Fenwick, Marrow County".into(),
            inspector_name: "ana ruiz".into(),
            ..Default::default()
        };
        let amendments = firm().fill(&mut new);
        assert_eq!(new.code_edition, "IRC 2021");
        assert_eq!(new.inspector_license, "HI-4471");
        assert_eq!(new.inspector_company, "Lantern Hill Inspections");
        assert!(amendments.unwrap().contains("middle third"));
        let mut elsewhere = NewInspection {
            address: "3 Elm St, Other County".into(),
            inspector_license: "kept".into(),
            ..Default::default()
        };
        assert_eq!(firm().fill(&mut elsewhere), None);
        assert_eq!(elsewhere.code_edition, "IRC 2018");
        assert_eq!(elsewhere.inspector_license, "kept");
    }

    #[test]
    fn unknown_editions_impossible_loads_and_repeated_counties_are_refused() {
        let mut f = firm();
        f.code_edition = "IRC 1897".into();
        assert!(matches!(
            f.check(),
            Err(FirmSettingsError::UnknownEdition(_))
        ));
        let mut f = firm();
        f.live_psf = Some(-5.0);
        assert!(matches!(
            f.check(),
            Err(FirmSettingsError::BadLoad("live", _))
        ));
        let mut f = firm();
        f.counties.push(f.counties[0].clone());
        assert!(matches!(
            f.check(),
            Err(FirmSettingsError::DuplicateCounty(_))
        ));
        assert_eq!(firm().check(), Ok(()));
    }
}
