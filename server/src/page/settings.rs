//! The firm's settings on the office page (office staff only): company, the firm's code
//! edition, default loads, each inspector's licence and each county's edition and local
//! amendments. Every device takes them at its next sync.

use super::html::{esc, page};
use crate::auth::Caller;
use crate::Office;
use axum::extract::State;
use axum::http::HeaderMap;
use axum::response::{Html, IntoResponse, Response};
use axum::Form;
use serde::Deserialize;
use std::sync::Arc;
use undercroft_sync::{CountyRule, FirmSettings, LicenseEntry};

#[derive(Deserialize, Default, Clone)]
#[serde(default)]
pub struct SettingsForm {
    company: String,
    code_edition: String,
    live_psf: String,
    dead_psf: String,
    licenses: String,
    counties: String,
}

/// The form's text for settings as stored.
fn as_form(firm: &FirmSettings) -> SettingsForm {
    let number = |v: Option<f64>| v.map(|x| x.to_string()).unwrap_or_default();
    SettingsForm {
        company: firm.company.clone(),
        code_edition: firm.code_edition.clone(),
        live_psf: number(firm.live_psf),
        dead_psf: number(firm.dead_psf),
        licenses: firm
            .licenses
            .iter()
            .map(|l| format!("{}: {}", l.inspector, l.number))
            .collect::<Vec<_>>()
            .join("\n"),
        counties: firm
            .counties
            .iter()
            .map(|c| format!("{} | {} | {}", c.county, c.code_edition, c.local_amendments))
            .collect::<Vec<_>>()
            .join("\n"),
    }
}

/// The form as typed (or as stored), with a message above it.
fn render(caller: &Caller, form: &SettingsForm, message: Option<(&str, bool)>) -> Html<String> {
    let editions: String = std::iter::once("")
        .chain(
            undercroft_engine::forms::CODE_EDITIONS
                .iter()
                .map(|(k, _)| *k),
        )
        .map(|e| {
            format!(
                "<option value=\"{e}\"{}>{}</option>",
                if e == form.code_edition {
                    " selected"
                } else {
                    ""
                },
                if e.is_empty() {
                    "(the device's own)"
                } else {
                    e
                }
            )
        })
        .collect();
    let message = message
        .map(|(text, ok)| {
            format!(
                "<p class=\"{}\" role=\"{}\">{}</p>",
                if ok { "notice" } else { "error" },
                if ok { "status" } else { "alert" },
                esc(text)
            )
        })
        .unwrap_or_default();
    Html(page(
        "Firm settings",
        super::who(caller),
        &format!(
            "<h1>Firm settings</h1>{message}\
             <p class=\"muted\">Every device takes these at its next sync; they fill the fields of new inspections.</p>\
             <form method=\"post\" action=\"/office/settings\" class=\"settings\">\
             <label>Company <input name=\"company\" value=\"{}\"></label>\
             <label>Code edition <select name=\"code_edition\">{editions}</select></label>\
             <label>Default live load, psf <input name=\"live_psf\" inputmode=\"decimal\" value=\"{}\"></label>\
             <label>Default dead load, psf <input name=\"dead_psf\" inputmode=\"decimal\" value=\"{}\"></label>\
             <label>Licences, one a line: name: number <textarea name=\"licenses\" rows=\"5\">{}</textarea></label>\
             <label>Counties, one a line: county | edition | local amendments <textarea name=\"counties\" rows=\"5\">{}</textarea></label>\
             <div class=\"actions\"><button type=\"submit\">Save</button></div></form>",
            esc(&form.company),
            esc(&form.live_psf),
            esc(&form.dead_psf),
            esc(&form.licenses),
            esc(&form.counties),
        ),
    ))
}

pub async fn show(State(office): State<Arc<Office>>, headers: HeaderMap) -> Response {
    let caller = match super::signed_in(&office, &headers).await {
        Ok(c) => c,
        Err(page) => return page,
    };
    if let Err(e) = caller.require_office() {
        return super::problem_page(&e);
    }
    match office.firm_settings().await {
        Ok(firm) => render(&caller, &as_form(&firm.unwrap_or_default()), None).into_response(),
        Err(e) => super::problem_page(&e),
    }
}

/// Reads the form into settings, or says which line cannot be read.
fn parse(form: &SettingsForm) -> Result<FirmSettings, String> {
    let load = |text: &str, what: &str| -> Result<Option<f64>, String> {
        let text = text.trim();
        if text.is_empty() {
            return Ok(None);
        }
        text.parse::<f64>()
            .map(Some)
            .map_err(|_| format!("the {what} load \"{text}\" is not a number of psf"))
    };
    let mut licenses = Vec::new();
    for line in form.licenses.lines().filter(|l| !l.trim().is_empty()) {
        let (name, number) = line
            .split_once(':')
            .ok_or_else(|| format!("licence line \"{line}\" is not \"name: number\""))?;
        licenses.push(LicenseEntry {
            inspector: name.trim().into(),
            number: number.trim().into(),
        });
    }
    let mut counties = Vec::new();
    for line in form.counties.lines().filter(|l| !l.trim().is_empty()) {
        let mut parts = line.splitn(3, '|').map(str::trim);
        let county = parts.next().unwrap_or_default();
        let edition = parts.next().unwrap_or_default();
        let amendments = parts.next().unwrap_or_default();
        if county.is_empty() {
            return Err(format!("county line \"{line}\" names no county"));
        }
        counties.push(CountyRule {
            county: county.into(),
            code_edition: edition.into(),
            local_amendments: amendments.into(),
        });
    }
    Ok(FirmSettings {
        company: form.company.trim().into(),
        licenses,
        code_edition: form.code_edition.trim().into(),
        counties,
        live_psf: load(&form.live_psf, "live")?,
        dead_psf: load(&form.dead_psf, "dead")?,
    })
}

pub async fn save(
    State(office): State<Arc<Office>>,
    headers: HeaderMap,
    Form(form): Form<SettingsForm>,
) -> Response {
    let caller = match super::signed_in(&office, &headers).await {
        Ok(c) => c,
        Err(page) => return page,
    };
    if let Err(e) = caller.require_office() {
        return super::problem_page(&e);
    }
    let firm = match parse(&form) {
        Ok(f) => f,
        // What was typed stays in the form, with what is wrong with it.
        Err(problem) => return render(&caller, &form, Some((&problem, false))).into_response(),
    };
    match office.save_firm_settings(&caller, &firm).await {
        Ok(()) => render(
            &caller,
            &as_form(&firm),
            Some(("Saved. Devices take them at their next sync.", true)),
        )
        .into_response(),
        Err(e) => render(&caller, &form, Some((&e.to_string(), false))).into_response(),
    }
}
