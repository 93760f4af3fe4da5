//! What the inspector adds to a computed finding: a note, a recommendation of their own, a
//! reason it does not apply, a changed priority. Kept apart from the findings, which are
//! computed, never stored.

/// What the inspector added to one finding.
#[derive(Debug, Clone, PartialEq, Default, serde::Serialize, serde::Deserialize)]
pub struct FindingNote {
    /// `Finding::key()`: rule id / member id / observation id.
    pub key: String,
    #[serde(default)]
    pub note: String,
    /// The inspector's own recommendation text, in place of the computed one.
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub recommendation: Option<String>,
    /// Set when the inspector marks the finding not applicable, with why.
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub not_applicable_reason: Option<String>,
    /// Who should act and how soon, where the inspector changed it from the default.
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub priority: Option<crate::priority::Priority>,
}
