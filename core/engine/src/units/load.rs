//! Area loads (psf) and stresses (psi), kept apart so one is never used as the other.

use serde::{Deserialize, Serialize};

/// Pounds per square foot: floor live and dead loads.
#[derive(Debug, Clone, Copy, PartialEq, PartialOrd, Serialize, Deserialize)]
#[serde(transparent)]
pub struct Psf(pub f64);

/// Pounds per square inch: design values and stresses.
#[derive(Debug, Clone, Copy, PartialEq, PartialOrd, Serialize, Deserialize)]
#[serde(transparent)]
pub struct Psi(pub f64);

impl Psf {
    /// Line load in pounds per inch on a member carrying a strip `tributary` wide.
    pub fn line_load_lb_per_in(self, tributary: super::Length) -> f64 {
        // psf x (width in ft) = lb per ft of member; / 12 = lb per inch.
        self.0 * tributary.in_feet() / 12.0
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::units::Length;

    // Common practice, no source: 40 psf on a 16 in tributary width = 53.33 plf = 4.444 lb/in.
    #[test]
    fn line_load_from_area_load() {
        let w = Psf(40.0).line_load_lb_per_in(Length::inches(16.0));
        assert!((w - 40.0 * 16.0 / 144.0).abs() < 1e-12);
    }
}
