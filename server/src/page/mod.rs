//! The office page: plain HTML rendered on the server (no script), to sign in with a token,
//! search the archive, open an inspection's findings and revisions, download its delivered
//! PDFs, and (office staff) set the firm's settings and issue and revoke tokens.

mod html;
mod inspection;
mod people;
mod search;
mod settings;
mod sign_in;

use crate::Office;
use axum::http::HeaderMap;
use axum::response::Redirect;
use axum::routing::get;
use axum::Router;
use std::sync::Arc;

pub use sign_in::cookie_token;

pub fn routes() -> Router<Arc<Office>> {
    Router::new()
        .route("/", get(|| async { Redirect::to("/office") }))
        .route("/office", get(search::show))
        .route("/office/sign-in", axum::routing::post(sign_in::sign_in))
        .route("/office/sign-out", axum::routing::post(sign_in::sign_out))
        .route("/office/inspections/{id}", get(inspection::show))
        .route(
            "/office/inspections/{id}/reports/{report_id}",
            get(inspection::download),
        )
        .route("/office/settings", get(settings::show).post(settings::save))
        .route("/office/people", get(people::show).post(people::issue))
        .route(
            "/office/people/revoke/{id}",
            axum::routing::post(people::revoke),
        )
}

/// Whether a request came over TLS through the proxy the server runs behind.
pub(crate) fn behind_tls(headers: &HeaderMap) -> bool {
    headers
        .get("x-forwarded-proto")
        .and_then(|v| v.to_str().ok())
        .is_some_and(|v| v.eq_ignore_ascii_case("https"))
}

/// The signed-in person, or the page to answer with instead: the sign-in form when there is
/// no live token, the reason in words when the archive cannot be read.
pub(crate) async fn signed_in(
    office: &Office,
    headers: &HeaderMap,
) -> Result<crate::auth::Caller, axum::response::Response> {
    use axum::response::IntoResponse;
    let Some(token) = cookie_token(headers) else {
        return Err(sign_in::form(None).into_response());
    };
    match office.caller_of(&token).await {
        Ok(caller) => Ok(caller),
        Err(crate::error::ApiError::SignedOut) => Err((
            axum::http::StatusCode::UNAUTHORIZED,
            sign_in::form(Some(
                "That token is no longer valid (revoked or unknown); ask the office for a new one.",
            )),
        )
            .into_response()),
        Err(e) => Err(problem_page(&e)),
    }
}

/// A refusal or failure as a page, with its status.
pub(crate) fn problem_page(e: &crate::error::ApiError) -> axum::response::Response {
    use axum::response::IntoResponse;
    (
        e.status(),
        axum::response::Html(html::page(
            "Cannot show this",
            None,
            &format!(
                "<h1>Cannot show this</h1><p class=\"error\" role=\"alert\">{}</p><p><a href=\"/office\">Back to the archive</a></p>",
                html::esc(&e.to_string())
            ),
        )),
    )
        .into_response()
}

/// Who is signed in, for the page's header.
pub(crate) fn who(caller: &crate::auth::Caller) -> Option<(&str, bool)> {
    Some((
        caller.name.as_str(),
        caller.role == crate::auth::Role::Office,
    ))
}
