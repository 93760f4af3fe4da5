//! The PDF printer: renders a `Report` value with printpdf, nothing more. Photos are embedded
//! as their stored JPEG bytes (DCTDecode), never decoded or re-encoded. The contents' page
//! numbers are written in once every part is placed.

mod cards;
mod draw;
mod fonts;
mod girder_draw;
mod marks_draw;
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
    let mut w = lay_out(report);
    w.set_meta(
        &report.meta,
        DateTime::from_unix_timestamp(created_unix).unwrap_or_else(|_| DateTime::now_utc()),
    );
    w.finish(&report.running_head)
}

/// Every part of the report in order, the contents' page numbers filled in at the end.
fn lay_out(report: &Report) -> writer::Writer {
    let (width, height) = report.paper.size_pt();
    let mut w = writer::Writer::new(&report.meta.title, width, height);
    let mut pages = Vec::new();
    sections::title_block(&mut w, report);
    sections::actions(&mut w, report);
    let slots = sections::contents(&mut w, &content_titles(report));
    let mark = |w: &writer::Writer, pages: &mut Vec<usize>| pages.push(w.page_number());
    w.ensure(220.0);
    mark(&w, &mut pages);
    sections::about(&mut w, report);
    for area in &report.areas {
        w.ensure(cards::start_height(area));
        mark(&w, &mut pages);
        cards::area(&mut w, area);
    }
    w.ensure(160.0);
    mark(&w, &mut pages);
    sections::attestation(&mut w, report);
    w.ensure(90.0);
    mark(&w, &mut pages);
    sections::limits(&mut w, report);
    w.ensure(200.0);
    mark(&w, &mut pages);
    sections::professional(&mut w, report);
    w.ensure(100.0);
    mark(&w, &mut pages);
    sections::appendix(&mut w, report);
    sections::fill_contents(&mut w, &slots, &pages);
    w
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
