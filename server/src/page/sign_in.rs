//! Signing in to the office page with a token issued by the office, kept in a cookie the
//! page's own requests carry (HttpOnly; SameSite=Lax, so a link from an e-mail opens signed
//! in while another site cannot post with it; Secure behind TLS).

use super::html::{esc, page};
use crate::Office;
use axum::extract::State;
use axum::http::{header, HeaderMap};
use axum::response::{Html, IntoResponse, Redirect, Response};
use axum::Form;
use serde::Deserialize;
use std::sync::Arc;

const COOKIE: &str = "undercroft_office";

/// The token in the office page's cookie, if any.
pub fn cookie_token(headers: &HeaderMap) -> Option<String> {
    headers
        .get_all(header::COOKIE)
        .iter()
        .filter_map(|v| v.to_str().ok())
        .flat_map(|v| v.split(';'))
        .filter_map(|pair| pair.trim().split_once('='))
        .find(|(name, _)| *name == COOKIE)
        .map(|(_, value)| value.to_string())
}

/// The sign-in form, with a reason in words when there is one.
pub fn form(problem: Option<&str>) -> Html<String> {
    let problem = problem
        .map(|p| format!("<p class=\"error\" role=\"alert\">{}</p>", esc(p)))
        .unwrap_or_default();
    Html(page(
        "Sign in",
        None,
        &format!(
            "<h1>Sign in</h1>{problem}\
             <p>Paste the token the office issued you. Inspectors see their own inspections; office staff see the firm's.</p>\
             <form method=\"post\" action=\"/office/sign-in\">\
             <label>Token <input name=\"token\" autocomplete=\"off\" size=\"60\" required></label> \
             <p><button>Sign in</button></p></form>"
        ),
    ))
}

#[derive(Deserialize)]
pub struct SignIn {
    token: String,
}

pub async fn sign_in(
    State(office): State<Arc<Office>>,
    headers: HeaderMap,
    Form(form_data): Form<SignIn>,
) -> Response {
    match office.caller_of(&form_data.token).await {
        Ok(_) => {
            let secure = if super::behind_tls(&headers) {
                "; Secure"
            } else {
                ""
            };
            (
                [(
                    header::SET_COOKIE,
                    format!(
                        "{COOKIE}={}; Path=/; HttpOnly; SameSite=Lax; Max-Age=43200{secure}",
                        form_data.token.trim()
                    ),
                )],
                Redirect::to("/office"),
            )
                .into_response()
        }
        Err(e) => (e.status(), form(Some(&e.to_string()))).into_response(),
    }
}

pub async fn sign_out() -> Response {
    (
        [(
            header::SET_COOKIE,
            format!("{COOKIE}=; Path=/; HttpOnly; SameSite=Lax; Max-Age=0"),
        )],
        Redirect::to("/office"),
    )
        .into_response()
}
