//! Who is asking: tokens issued by the office (`uct_<id>_<secret>`), kept as Argon2id hashes,
//! checked on every request against the database, so a revoked token stops working at once.
//! A token's Argon2 check is slow by design; once it has passed, a SHA-256 of the secret is
//! remembered in memory so later requests are not slowed (the revocation is still read from
//! the database each time).

use crate::error::ApiError;
use argon2::password_hash::{PasswordHash, PasswordHasher, PasswordVerifier, SaltString};
use argon2::Argon2;
use sha2::{Digest, Sha256};
use std::collections::HashMap;
use std::sync::Mutex;

/// What a person may do.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum Role {
    /// Pushes and reads their own inspections.
    Inspector,
    /// Reads every inspection, manages the firm's settings and tokens.
    Office,
}

impl Role {
    pub fn key(self) -> &'static str {
        match self {
            Role::Inspector => "inspector",
            Role::Office => "office",
        }
    }

    pub fn from_key(key: &str) -> Option<Role> {
        match key {
            "inspector" => Some(Role::Inspector),
            "office" => Some(Role::Office),
            _ => None,
        }
    }
}

/// The person a request comes from.
#[derive(Debug, Clone, PartialEq)]
pub struct Caller {
    pub person_id: i64,
    pub name: String,
    pub role: Role,
}

impl Caller {
    pub fn require_office(&self) -> Result<(), ApiError> {
        match self.role {
            Role::Office => Ok(()),
            Role::Inspector => Err(ApiError::Forbidden("only office staff may do this".into())),
        }
    }
}

/// A token split into its id and secret.
pub struct TokenParts<'a> {
    pub id: &'a str,
    pub secret: &'a str,
}

pub fn split_token(token: &str) -> Option<TokenParts<'_>> {
    let rest = token.trim().strip_prefix("uct_")?;
    let (id, secret) = rest.split_once('_')?;
    let hex = |s: &str, n: usize| s.len() == n && s.bytes().all(|b| b.is_ascii_hexdigit());
    (hex(id, 16) && hex(secret, 64)).then_some(TokenParts { id, secret })
}

/// A new token: its id, the whole token to hand over once, and the hash to keep.
pub fn new_token() -> (String, String, String) {
    let mut raw = [0u8; 40];
    getrandom::fill(&mut raw).expect("the system's random source");
    let hex = |b: &[u8]| b.iter().map(|x| format!("{x:02x}")).collect::<String>();
    let (id, secret) = (hex(&raw[..8]), hex(&raw[8..]));
    let salt = SaltString::encode_b64(&raw[..16]).expect("16 bytes make a salt");
    let hash = Argon2::default()
        .hash_password(secret.as_bytes(), &salt)
        .expect("Argon2 with default parameters")
        .to_string();
    (id.clone(), format!("uct_{id}_{secret}"), hash)
}

/// Whether `secret` is the one `hash` was made from (Argon2id; slow by design).
pub fn secret_matches(secret: &str, hash: &str) -> bool {
    PasswordHash::new(hash)
        .map(|h| {
            Argon2::default()
                .verify_password(secret.as_bytes(), &h)
                .is_ok()
        })
        .unwrap_or(false)
}

/// Secrets that passed their Argon2 check in this process, by token id, as SHA-256.
#[derive(Default)]
pub struct CheckedSecrets(Mutex<HashMap<String, [u8; 32]>>);

impl CheckedSecrets {
    pub fn knows(&self, id: &str, secret: &str) -> bool {
        let digest: [u8; 32] = Sha256::digest(secret.as_bytes()).into();
        self.0
            .lock()
            .map(|m| m.get(id) == Some(&digest))
            .unwrap_or(false)
    }

    pub fn remember(&self, id: &str, secret: &str) {
        let digest: [u8; 32] = Sha256::digest(secret.as_bytes()).into();
        if let Ok(mut m) = self.0.lock() {
            m.insert(id.into(), digest);
        }
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn a_new_token_checks_against_its_hash_and_a_changed_one_does_not() {
        let (id, token, hash) = new_token();
        let parts = split_token(&token).expect("a token we made splits");
        assert_eq!(parts.id, id);
        assert!(hash.starts_with("$argon2id$"), "{hash}");
        assert!(!hash.contains(parts.secret));
        assert!(secret_matches(parts.secret, &hash));
        let mut wrong = parts.secret.to_string();
        wrong.replace_range(0..1, if wrong.starts_with('0') { "1" } else { "0" });
        assert!(!secret_matches(&wrong, &hash));
        assert!(!secret_matches(parts.secret, "not a hash"));
    }

    #[test]
    fn malformed_tokens_do_not_split() {
        for bad in [
            "",
            "uct_",
            "uct_abc_def",
            "Bearer x",
            "uct_0123456789abcdef_xyz",
        ] {
            assert!(split_token(bad).is_none(), "{bad}");
        }
    }
}
