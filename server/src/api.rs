//! The JSON API's reading and managing routes (pushing is in `push`): the archive, the
//! firm's settings, tokens.

use crate::archive::{InspectionView, Listed, Search};
use crate::auth::{Caller, Role};
use crate::error::ApiError;
use crate::Office;
use axum::extract::{Path, Query, State};
use axum::http::header;
use axum::response::{IntoResponse, Response};
use axum::Json;
use serde::Deserialize;
use std::sync::Arc;
use undercroft_sync::FirmSettings;

pub async fn list(
    State(office): State<Arc<Office>>,
    caller: Caller,
    Query(search): Query<Search>,
) -> Result<Json<Vec<Listed>>, ApiError> {
    Ok(Json(office.search(&caller, &search).await?))
}

#[derive(Deserialize)]
pub struct RevisionQuery {
    revision: Option<i64>,
}

pub async fn inspection(
    State(office): State<Arc<Office>>,
    caller: Caller,
    Path(id): Path<String>,
    Query(q): Query<RevisionQuery>,
) -> Result<Json<InspectionView>, ApiError> {
    Ok(Json(office.inspection(&caller, &id, q.revision).await?))
}

pub async fn report_pdf(
    State(office): State<Arc<Office>>,
    caller: Caller,
    Path((id, report_id)): Path<(String, String)>,
) -> Result<Response, ApiError> {
    let (name, bytes) = office.delivered_pdf(&caller, &id, &report_id).await?;
    Ok(pdf_response(&name, bytes))
}

/// A PDF as a download under its file name.
pub fn pdf_response(name: &str, bytes: Vec<u8>) -> Response {
    let ascii: String = name
        .chars()
        .map(|c| {
            if c.is_ascii_graphic() && c != '"' && c != '\\' {
                c
            } else {
                '_'
            }
        })
        .collect();
    (
        [
            (header::CONTENT_TYPE, "application/pdf".to_string()),
            (
                header::CONTENT_DISPOSITION,
                format!("attachment; filename=\"{ascii}\""),
            ),
        ],
        bytes,
    )
        .into_response()
}

pub async fn get_settings(
    State(office): State<Arc<Office>>,
    _caller: Caller,
) -> Result<Json<Option<FirmSettings>>, ApiError> {
    Ok(Json(office.firm_settings().await?))
}

pub async fn put_settings(
    State(office): State<Arc<Office>>,
    caller: Caller,
    Json(firm): Json<FirmSettings>,
) -> Result<Json<FirmSettings>, ApiError> {
    office.save_firm_settings(&caller, &firm).await?;
    Ok(Json(firm))
}

#[derive(Deserialize)]
pub struct NewToken {
    name: String,
    role: String,
}

pub async fn issue_token(
    State(office): State<Arc<Office>>,
    caller: Caller,
    Json(new): Json<NewToken>,
) -> Result<Json<serde_json::Value>, ApiError> {
    caller.require_office()?;
    let role = Role::from_key(&new.role)
        .ok_or_else(|| ApiError::BadRequest("role is \"inspector\" or \"office\"".into()))?;
    let token = office.issue_token(&new.name, role).await?;
    Ok(Json(serde_json::json!({ "token": token })))
}

pub async fn revoke_token(
    State(office): State<Arc<Office>>,
    caller: Caller,
    Path(id): Path<String>,
) -> Result<Json<serde_json::Value>, ApiError> {
    caller.require_office()?;
    let revoked = office.revoke_token(&id).await?;
    if !revoked {
        return Err(ApiError::NotFound(format!("no live token {id}")));
    }
    Ok(Json(serde_json::json!({ "revoked": id })))
}

pub async fn list_tokens(
    State(office): State<Arc<Office>>,
    caller: Caller,
) -> Result<Json<Vec<crate::people::TokenRow>>, ApiError> {
    caller.require_office()?;
    Ok(Json(office.tokens().await?))
}
