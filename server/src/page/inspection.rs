//! One inspection on the office page: its header, the findings of the revision shown (the
//! latest unless another is picked), every revision with conflicts named, and its delivered
//! reports to download.

use super::html::{esc, page, url};
use crate::Office;
use axum::extract::{Path, Query, State};
use axum::http::HeaderMap;
use axum::response::{Html, IntoResponse, Response};
use serde::Deserialize;
use std::sync::Arc;

#[derive(Deserialize)]
pub struct Pick {
    revision: Option<i64>,
}

pub async fn show(
    State(office): State<Arc<Office>>,
    headers: HeaderMap,
    Path(id): Path<String>,
    pick: Query<Pick>,
) -> Response {
    let caller = match super::signed_in(&office, &headers).await {
        Ok(c) => c,
        Err(page) => return page,
    };
    let view = match office.inspection(&caller, &id, pick.revision).await {
        Ok(v) => v,
        Err(e) => return super::problem_page(&e),
    };
    let shown = if view.revision == view.latest_revision {
        format!("the latest revision ({})", view.revision)
    } else {
        format!(
            "revision {} (an older one; <a href=\"/office/inspections/{}\">see the latest</a>)",
            view.revision,
            url(&view.id)
        )
    };
    let mut findings = String::new();
    for f in &view.findings {
        findings.push_str(&format!(
            "<tr class=\"finding\"><td><span class=\"tag {}\">{}</span></td><td><strong>{}</strong><br>{}</td>\
             <td>{}</td><td>{}<br><span class=\"muted\">{}</span></td></tr>",
            esc(&f.status),
            esc(&f.status_label),
            esc(&f.title),
            esc(&f.summary),
            esc(&f.place),
            esc(&f.citation),
            esc(&f.basis),
        ));
    }
    let open = view
        .findings
        .iter()
        .filter(|f| {
            matches!(
                f.status.as_str(),
                "over-limit" | "to-evaluate" | "near-limit" | "incomplete"
            )
        })
        .count();
    let mut revisions = String::new();
    for r in &view.revisions {
        let conflict = r
            .conflict_with
            .map(|other| {
                format!(
                    " <span class=\"tag conflict\">pushed beside revision {other} from another device: both kept</span>"
                )
            })
            .unwrap_or_default();
        revisions.push_str(&format!(
            "<li class=\"revision\"><a href=\"/office/inspections/{}?revision={}\">Revision {}</a>, {} by {} (device {}){conflict}</li>",
            url(&view.id),
            r.id,
            r.id,
            esc(&r.pushed_at),
            esc(&r.pushed_by),
            esc(&r.device.chars().take(8).collect::<String>()),
        ));
    }
    let mut deliveries = String::new();
    for d in &view.deliveries {
        let link = if d.pdf_kept {
            format!(
                "<a class=\"download\" href=\"/office/inspections/{}/reports/{}\">{}</a>",
                url(&view.id),
                url(&d.report_id),
                esc(&d.file_name)
            )
        } else {
            format!(
                "{} <span class=\"muted\">(the PDF was not on the device when it synced)</span>",
                esc(&d.file_name)
            )
        };
        deliveries.push_str(&format!(
            "<li class=\"delivery\">{link}, delivered {} to {} ({} KB)</li>",
            esc(&d.delivered_at),
            esc(if d.recipient.is_empty() {
                "(not said)"
            } else {
                &d.recipient
            }),
            (d.bytes + 1023) / 1024
        ));
    }
    if deliveries.is_empty() {
        deliveries = "<li class=\"muted\">none</li>".into();
    }
    let body = format!(
        "<h1>{}</h1>\
         <p>Client: {} · Visited: {} · Inspector: {} · {} · {} photos</p>\
         <p class=\"notice\">{}</p>\
         <h2>Delivered reports</h2><ul>{deliveries}</ul>\
         <h2>Findings of {shown}: {} open of {}</h2>\
         <table id=\"findings\"><thead><tr><th>Status</th><th>Finding</th><th>Where</th><th>Limit cited · basis</th></tr></thead>\
         <tbody>{findings}</tbody></table>\
         <h2>Revisions (newest first; nothing is overwritten)</h2><ul>{revisions}</ul>",
        esc(&view.address),
        esc(&view.client),
        esc(view.inspected_on.as_deref().unwrap_or("")),
        esc(&view.inspector),
        esc(&view.code_edition),
        view.photos,
        esc(undercroft_engine::SCREENING_NOTICE),
        open,
        view.findings.len(),
    );
    Html(page(&view.address, super::who(&caller), &body)).into_response()
}

pub async fn download(
    State(office): State<Arc<Office>>,
    headers: HeaderMap,
    Path((id, report_id)): Path<(String, String)>,
) -> Response {
    let caller = match super::signed_in(&office, &headers).await {
        Ok(c) => c,
        Err(page) => return page,
    };
    match office.delivered_pdf(&caller, &id, &report_id).await {
        Ok((name, bytes)) => crate::api::pdf_response(&name, bytes),
        Err(e) => super::problem_page(&e),
    }
}
