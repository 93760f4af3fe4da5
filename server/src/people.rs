//! The firm's people and their tokens: issue (shown once), revoke (at once), list, and the
//! check of every request's token.

use crate::auth::{self, Caller, Role};
use crate::error::ApiError;
use crate::Office;

/// A token as the office lists it (never its secret).
#[derive(Debug, Clone, serde::Serialize)]
pub struct TokenRow {
    pub id: String,
    pub person: String,
    pub role: String,
    pub created_at: String,
    pub revoked_at: Option<String>,
}

impl Office {
    /// Issues a token to the named person (added with this role if new; a person keeps the
    /// role they were first given). Returns the token, to be handed over once.
    pub async fn issue_token(&self, name: &str, role: Role) -> Result<String, ApiError> {
        let name = name.trim();
        if name.is_empty() || name.chars().count() > 200 {
            return Err(ApiError::BadRequest(
                "a person's name is 1 to 200 characters".into(),
            ));
        }
        let (id, token, hash) = tokio::task::spawn_blocking(auth::new_token)
            .await
            .map_err(|e| ApiError::Internal(e.to_string()))?;
        let mut client = self.pool.get().await?;
        let tx = client.transaction().await?;
        tx.execute(
            "INSERT INTO people (name, role) VALUES ($1, $2) ON CONFLICT (name) DO NOTHING",
            &[&name, &role.key()],
        )
        .await?;
        let person: i64 = tx
            .query_one("SELECT id FROM people WHERE name = $1", &[&name])
            .await?
            .get(0);
        tx.execute(
            "INSERT INTO tokens (id, person_id, secret_hash) VALUES ($1, $2, $3)",
            &[&id, &person, &hash],
        )
        .await?;
        tx.commit().await?;
        Ok(token)
    }

    /// Revokes a token by its id (the part after `uct_`); true if it was live.
    pub async fn revoke_token(&self, id: &str) -> Result<bool, ApiError> {
        let client = self.pool.get().await?;
        let n = client
            .execute(
                "UPDATE tokens SET revoked_at = now() WHERE id = $1 AND revoked_at IS NULL",
                &[&id],
            )
            .await?;
        Ok(n == 1)
    }

    pub async fn tokens(&self) -> Result<Vec<TokenRow>, ApiError> {
        let client = self.pool.get().await?;
        let rows = client
            .query(
                "SELECT t.id, p.name, p.role, to_char(t.created_at AT TIME ZONE 'UTC', 'YYYY-MM-DD HH24:MI \"UTC\"'),
                        to_char(t.revoked_at AT TIME ZONE 'UTC', 'YYYY-MM-DD HH24:MI \"UTC\"')
                 FROM tokens t JOIN people p ON p.id = t.person_id ORDER BY t.created_at, t.id",
                &[],
            )
            .await?;
        Ok(rows
            .iter()
            .map(|r| TokenRow {
                id: r.get(0),
                person: r.get(1),
                role: r.get(2),
                created_at: r.get(3),
                revoked_at: r.get(4),
            })
            .collect())
    }

    /// The person a token belongs to, if it is live.
    pub async fn caller_of(&self, token: &str) -> Result<Caller, ApiError> {
        let parts = auth::split_token(token).ok_or(ApiError::SignedOut)?;
        let client = self.pool.get().await?;
        let row = client
            .query_opt(
                "SELECT t.secret_hash, p.id, p.name, p.role FROM tokens t JOIN people p ON p.id = t.person_id
                 WHERE t.id = $1 AND t.revoked_at IS NULL",
                &[&parts.id],
            )
            .await?
            .ok_or(ApiError::SignedOut)?;
        drop(client);
        let hash: String = row.get(0);
        if !self.checked.knows(parts.id, parts.secret) {
            let (secret, stored) = (parts.secret.to_string(), hash.clone());
            let ok = tokio::task::spawn_blocking(move || auth::secret_matches(&secret, &stored))
                .await
                .map_err(|e| ApiError::Internal(e.to_string()))?;
            if !ok {
                return Err(ApiError::SignedOut);
            }
            self.checked.remember(parts.id, parts.secret);
        }
        let role: String = row.get(3);
        Ok(Caller {
            person_id: row.get(1),
            name: row.get(2),
            role: Role::from_key(&role).ok_or(ApiError::SignedOut)?,
        })
    }
}
