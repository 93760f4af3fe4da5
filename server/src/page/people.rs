//! The firm's people on the office page (office staff only): every token issued, live or
//! revoked (never its secret); a form to issue one, shown once; a button to revoke one, which
//! stops it at once.

use super::html::{esc, page, url};
use crate::auth::{Caller, Role};
use crate::Office;
use axum::extract::{Path, State};
use axum::http::HeaderMap;
use axum::response::{Html, IntoResponse, Response};
use axum::Form;
use serde::Deserialize;
use std::sync::Arc;

async fn render(office: &Office, caller: &Caller, message: Option<String>) -> Response {
    let tokens = match office.tokens().await {
        Ok(t) => t,
        Err(e) => return super::problem_page(&e),
    };
    let mut rows = String::new();
    for t in &tokens {
        let state = match &t.revoked_at {
            Some(at) => format!("revoked {}", esc(at)),
            None => format!(
                "live <form method=\"post\" action=\"/office/people/revoke/{}\" class=\"inline\">\
                 <button class=\"revoke\" aria-label=\"Revoke {}'s token {}\">Revoke</button></form>",
                url(&t.id),
                esc(&t.person),
                esc(&t.id)
            ),
        };
        rows.push_str(&format!(
            "<tr class=\"token\"><td>{}</td><td>{}</td><td><code>{}</code></td><td>{}</td><td>{state}</td></tr>",
            esc(&t.person),
            esc(&t.role),
            esc(&t.id),
            esc(&t.created_at),
        ));
    }
    let body = format!(
        "<h1>People and tokens</h1>{}\
         <form method=\"post\" action=\"/office/people\" class=\"settings\">\
         <label>Name <input name=\"name\" required maxlength=\"200\"></label>\
         <label>Role <select name=\"role\"><option value=\"inspector\">Inspector: sends and reads their own inspections</option>\
         <option value=\"office\">Office staff: reads all, sets the firm's settings, manages tokens</option></select></label>\
         <div class=\"actions\"><button type=\"submit\">Issue a token</button></div></form>\
         <h2>Tokens issued</h2>\
         <table id=\"tokens\"><thead><tr><th>Person</th><th>Role</th><th>Token id</th><th>Issued</th><th>State</th></tr></thead>\
         <tbody>{rows}</tbody></table>",
        message.unwrap_or_default()
    );
    Html(page("People and tokens", super::who(caller), &body)).into_response()
}

async fn office_staff(office: &Office, headers: &HeaderMap) -> Result<Caller, Response> {
    let caller = super::signed_in(office, headers).await?;
    caller
        .require_office()
        .map_err(|e| super::problem_page(&e))?;
    Ok(caller)
}

pub async fn show(State(office): State<Arc<Office>>, headers: HeaderMap) -> Response {
    match office_staff(&office, &headers).await {
        Ok(caller) => render(&office, &caller, None).await,
        Err(page) => page,
    }
}

#[derive(Deserialize)]
pub struct Issue {
    name: String,
    role: String,
}

pub async fn issue(
    State(office): State<Arc<Office>>,
    headers: HeaderMap,
    Form(form): Form<Issue>,
) -> Response {
    let caller = match office_staff(&office, &headers).await {
        Ok(c) => c,
        Err(page) => return page,
    };
    let message = match Role::from_key(&form.role) {
        None => "<p class=\"error\" role=\"alert\">Pick a role: inspector or office staff.</p>".to_string(),
        Some(role) => match office.issue_token(&form.name, role).await {
            Ok(token) => format!(
                "<div class=\"notice\" role=\"status\"><p>Token for {}: hand it over now; it is not kept and cannot be shown again.</p>\
                 <p><code id=\"issued-token\">{}</code></p></div>",
                esc(form.name.trim()),
                esc(&token)
            ),
            Err(e) => format!("<p class=\"error\" role=\"alert\">{}</p>", esc(&e.to_string())),
        },
    };
    render(&office, &caller, Some(message)).await
}

pub async fn revoke(
    State(office): State<Arc<Office>>,
    headers: HeaderMap,
    Path(id): Path<String>,
) -> Response {
    let caller = match office_staff(&office, &headers).await {
        Ok(c) => c,
        Err(page) => return page,
    };
    let message = match office.revoke_token(&id).await {
        Ok(true) => format!(
            "<p class=\"notice\" role=\"status\">Token {} revoked: it no longer works.</p>",
            esc(&id)
        ),
        Ok(false) => format!(
            "<p class=\"error\" role=\"alert\">No live token {}.</p>",
            esc(&id)
        ),
        Err(e) => format!(
            "<p class=\"error\" role=\"alert\">{}</p>",
            esc(&e.to_string())
        ),
    };
    render(&office, &caller, Some(message)).await
}
