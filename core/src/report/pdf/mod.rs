//! The PDF printer: renders a `Report` value with printpdf, nothing more. Photos are embedded
//! as their stored JPEG bytes (DCTDecode), never decoded or re-encoded. The pages are laid out
//! twice: the first pass finds the page each part starts on, for the contents.

mod cards;
mod draw;
mod fonts;
mod girder_draw;
mod scripts;
mod sections;
mod writer;

use super::Report;
use printpdf::DateTime;

/// The report as PDF bytes, created now.
pub fn render(report: &Report) -> Vec<u8> {
    let now = std::time::SystemTime::now()
        .duration_since(std::time::UNIX_EPOCH)
        .map_or(0, |d| d.as_secs() as i64);
    render_at(report, now)
}

/// The report as PDF bytes with the given creation time (seconds since 1970, UTC).
pub fn render_at(report: &Report, created_unix: i64) -> Vec<u8> {
    let (_, pages) = lay_out(report, None);
    let (mut w, _) = lay_out(report, Some(&pages));
    w.set_meta(
        &report.meta,
        DateTime::from_unix_timestamp(created_unix).unwrap_or_else(|_| DateTime::now_utc()),
    );
    w.finish(&report.running_head)
}

/// Every part of the report in order; returns the writer and the contents (title, page).
fn lay_out(
    report: &Report,
    contents: Option<&[(String, usize)]>,
) -> (writer::Writer, Vec<(String, usize)>) {
    let (width, height) = report.paper.size_pt();
    let mut w = writer::Writer::new(&report.meta.title, width, height);
    let mut found = Vec::new();
    sections::title_block(&mut w, report);
    sections::actions(&mut w, report);
    // The contents has as many lines in both passes; the first pass fills in zeros.
    let entries: Vec<(String, usize)> = match contents {
        Some(c) => c.to_vec(),
        None => content_titles(report).into_iter().map(|t| (t, 0)).collect(),
    };
    sections::contents(&mut w, &entries);
    let mut mark = |w: &writer::Writer, title: String| found.push((title, w.page_number()));
    w.ensure(220.0);
    mark(&w, "About this inspection".into());
    sections::about(&mut w, report);
    for area in &report.areas {
        w.ensure(cards::start_height(area));
        mark(&w, area.heading.clone());
        cards::area(&mut w, area);
    }
    w.ensure(160.0);
    mark(&w, "Inspector's statement".into());
    sections::attestation(&mut w, report);
    w.ensure(90.0);
    mark(&w, "Limits of this inspection".into());
    sections::limits(&mut w, report);
    w.ensure(200.0);
    mark(&w, "For the professional: checks and assumptions".into());
    sections::professional(&mut w, report);
    w.ensure(100.0);
    mark(&w, "Method, design values and sources".into());
    sections::appendix(&mut w, report);
    (w, found)
}

fn content_titles(report: &Report) -> Vec<String> {
    let mut out = vec!["About this inspection".to_string()];
    out.extend(report.areas.iter().map(|a| a.heading.clone()));
    out.extend(
        [
            "Inspector's statement",
            "Limits of this inspection",
            "For the professional: checks and assumptions",
            "Method, design values and sources",
        ]
        .map(String::from),
    );
    out
}
