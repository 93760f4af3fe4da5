//! The PDF printer: renders a `Report` value with printpdf, nothing more. Photos are embedded
//! as their stored JPEG bytes (DCTDecode), never decoded or re-encoded.

mod draw;
mod fonts;
mod girder_draw;
mod scripts;
mod sections;
mod writer;

use super::Report;

/// The report as PDF bytes.
pub fn render(report: &Report) -> Vec<u8> {
    let (width, height) = report.paper.size_pt();
    let mut w = writer::Writer::new(
        &format!("Floor framing report: {}", report.cover.property),
        width,
        height,
    );
    sections::cover(&mut w, report);
    sections::summary(&mut w, report);
    for area in &report.areas {
        sections::area(&mut w, area);
    }
    sections::appendix(&mut w, report);
    w.finish(&report.running_head)
}
