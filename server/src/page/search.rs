//! The archive page: the search form and the inspections found, newest visit first.

use super::html::{esc, page, url};
use crate::archive::Search;
use crate::Office;
use axum::extract::{Query, State};
use axum::http::HeaderMap;
use axum::response::{Html, IntoResponse, Response};
use std::sync::Arc;

pub async fn page_handler(office: Arc<Office>, headers: HeaderMap, search: Search) -> Response {
    let caller = match super::signed_in(&office, &headers).await {
        Ok(c) => c,
        Err(page) => return page,
    };
    let found = match office.search(&caller, &search).await {
        Ok(found) => found,
        Err(e) => return super::problem_page(&e),
    };
    let field = |name: &str, label: &str, value: &str, kind: &str| {
        format!(
            "<label>{label}<input type=\"{kind}\" name=\"{name}\" value=\"{}\"></label>",
            esc(value)
        )
    };
    let form = format!(
        "<form class=\"search\" method=\"get\" action=\"/office\" role=\"search\">{}{}{}{}{}{}\
         <div class=\"actions\"><button type=\"submit\">Search</button></div></form>",
        field("address", "Address", &search.address, "text"),
        field("client", "Client", &search.client, "text"),
        field("inspector", "Inspector", &search.inspector, "text"),
        field("from", "Visited from", &search.from, "date"),
        field("to", "Visited to", &search.to, "date"),
        field(
            "finding",
            "Finding (e.g. decay at a bearing)",
            &search.finding,
            "text"
        ),
    );
    let mut rows = String::new();
    for i in &found {
        let conflict = if i.conflicts > 0 {
            format!(
                " <span class=\"tag conflict\">{} revision{} from another device</span>",
                i.conflicts,
                if i.conflicts == 1 { "" } else { "s" }
            )
        } else {
            String::new()
        };
        let matching = if i.matching.is_empty() {
            String::new()
        } else {
            format!(
                "<div class=\"muted\">{}</div>",
                i.matching
                    .iter()
                    .map(|m| esc(m))
                    .collect::<Vec<_>>()
                    .join("<br>")
            )
        };
        rows.push_str(&format!(
            "<tr class=\"found\"><td>{}</td><td><a href=\"/office/inspections/{}\">{}</a>{matching}</td><td>{}</td><td>{}</td>\
             <td>{}</td><td>{}{conflict}</td></tr>",
            esc(i.inspected_on.as_deref().unwrap_or("")),
            url(&i.id),
            esc(&i.address),
            esc(&i.client),
            esc(&i.inspector),
            if i.open_findings > 0 {
                format!("<span class=\"tag over-limit\">{} open</span>", i.open_findings)
            } else {
                "<span class=\"tag within\">none open</span>".into()
            },
            i.revisions,
        ));
    }
    let results = if found.is_empty() {
        "<p class=\"muted\" id=\"none-found\">No inspection matches.</p>".to_string()
    } else {
        format!(
            "<p class=\"muted\">{} inspection{} found{}.</p>\
             <table id=\"found\"><thead><tr><th>Visited</th><th>Address</th><th>Client</th><th>Inspector</th>\
             <th>Findings</th><th>Revisions</th></tr></thead><tbody>{rows}</tbody></table>",
            found.len(),
            if found.len() == 1 { "" } else { "s" },
            if found.len() == 500 { " (the first 500; narrow the search)" } else { "" },
        )
    };
    let scope = if caller.role == crate::auth::Role::Office {
        "every inspection the firm's devices have sent"
    } else {
        "the inspections you have sent"
    };
    Html(page(
        "Archive",
        super::who(&caller),
        &format!("<h1>Archive</h1><p class=\"muted\">Searching {scope}.</p>{form}{results}"),
    ))
    .into_response()
}

pub async fn show(
    State(office): State<Arc<Office>>,
    headers: HeaderMap,
    search: Result<Query<Search>, axum::extract::rejection::QueryRejection>,
) -> Response {
    match search {
        Ok(Query(search)) => page_handler(office, headers, search).await,
        Err(e) => super::problem_page(&crate::error::ApiError::BadRequest(e.body_text())),
    }
}
