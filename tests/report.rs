//! The client report: the report value pinned by a snapshot, and the PDF read back with
//! poppler-utils and qpdf: every finding's citation and numbers in the text, every photo an
//! embedded JPEG without EXIF, non-Latin names extractable, big reports build, both papers.

use std::collections::HashSet;
use std::path::Path;
use undercroft_engine::interchange::from_json;
use undercroft_engine::model::FindingNote;
use undercroft_engine::model::PhotoMark;
use undercroft_engine::{evaluate, Inspection};
use undercroft_report::{build_report, pdf, Paper, PhotoFiles, ReportInput};
use undercroft_store::Store;
use undercroft_tests::{demo_images, demo_path, normalise, tool, TempDir};

fn demo() -> Inspection {
    from_json(&std::fs::read_to_string(demo_path()).unwrap()).unwrap()
}

/// A PNG photo with its own colours, `n` picking them.
fn photo(n: u32, width: u32, height: u32) -> Vec<u8> {
    let image = image::RgbImage::from_fn(width, height, |x, y| {
        image::Rgb([
            ((x * 7 + n * 40) % 256) as u8,
            ((y * 5 + n * 90) % 256) as u8,
            ((n * 23) % 256) as u8,
        ])
    });
    let mut out = Vec::new();
    image::DynamicImage::ImageRgb8(image)
        .write_to(&mut std::io::Cursor::new(&mut out), image::ImageFormat::Png)
        .unwrap();
    out
}

/// The demo in a store with its seven drawn photos, four more on three findings and the
/// area, and a note.
fn demo_store(dir: &Path) -> (Store, Inspection) {
    let mut store = Store::open(&dir.join("store.sqlite")).unwrap();
    let inspection = demo();
    let (_, refused) = store
        .import_inspection_with_images(&inspection, &demo_images(&inspection))
        .unwrap();
    assert!(refused.is_empty());
    store
        .add_photo(
            "obs-k7-notch",
            &photo(1, 1600, 1200),
            "Notch at the drain line, seen by 李 Wei",
        )
        .unwrap();
    store
        .add_photo("obs-k7-notch", &photo(2, 1200, 1600), "Same notch, closer")
        .unwrap();
    store
        .add_photo(
            "obs-ij-cut",
            &photo(3, 1600, 1200),
            "Cut flange under the toilet",
        )
        .unwrap();
    store
        .add_photo(
            "area-base",
            &photo(4, 1600, 1200),
            "Basement, looking north",
        )
        .unwrap();
    store
        .set_finding_note(
            &inspection.id,
            &FindingNote {
                key: "sawn-notch/joist-k7/obs-k7-notch".into(),
                note: "Owner says the drain was moved in 2019.".into(),
                ..Default::default()
            },
        )
        .unwrap();
    let loaded = store.load_inspection(&inspection.id).unwrap();
    (store, loaded)
}

fn render(store: &Store, inspection: &Inspection, paper: Paper) -> Vec<u8> {
    let files: PhotoFiles = store
        .photos_of_inspection(&inspection.id)
        .unwrap()
        .into_iter()
        .filter_map(|p| p.report_path.map(|path| (p.id, path)))
        .collect();
    let notes = store.finding_notes(&inspection.id).unwrap();
    let evaluation = evaluate(inspection);
    pdf::render(&build_report(&ReportInput {
        inspection,
        evaluation: &evaluation,
        notes: &notes,
        photo_files: &files,
        paper,
        repair_options: false,
    }))
}

/// The PDF of an inspection with no notes and no photos.
fn render_without_store(inspection: &Inspection, paper: Paper) -> Vec<u8> {
    let evaluation = evaluate(inspection);
    pdf::render(&build_report(&ReportInput {
        inspection,
        evaluation: &evaluation,
        notes: &[],
        photo_files: &PhotoFiles::new(),
        paper,
        repair_options: false,
    }))
}

#[test]
fn report_value_snapshot() {
    let inspection = demo();
    let evaluation = evaluate(&inspection);
    let report = build_report(&ReportInput {
        inspection: &inspection,
        evaluation: &evaluation,
        notes: &[],
        photo_files: &PhotoFiles::new(),
        paper: Paper::Letter,
        repair_options: false,
    });
    insta::assert_json_snapshot!(report);
}

#[test]
fn pdf_holds_every_finding_photo_and_name() {
    let t = TempDir::new("report-readback");
    let (store, inspection) = demo_store(&t.0);
    let bytes = render(&store, &inspection, Paper::Letter);
    let path = t.0.join("report.pdf");
    std::fs::write(&path, &bytes).unwrap();
    tool("qpdf", &["--check".as_ref(), path.as_os_str()]);

    let text = normalise(&tool("pdftotext", &[path.as_os_str(), "-".as_ref()]));
    for name in [
        "Zoë Ångström-Nguyễn",
        "李 Wei",
        "2719 Quillback Road, Marrow Falls",
        "IRC 2018",
        "licensed professional",
        "Owner says the drain was moved in 2019.",
    ] {
        assert!(text.contains(name), "{name:?} not in the text");
    }
    // Every finding is in the report: each that needs action with its numbers and full
    // citation, each check met by its title in the table of its area.
    for f in evaluate(&inspection).findings {
        if f.rule_id() == "span-options" {
            continue;
        }
        assert!(
            text.contains(&normalise(f.title())),
            "{} ({}) missing",
            f.title(),
            f.rule_id()
        );
        if f.status != undercroft_engine::Status::Within {
            let citation = normalise(&f.citation());
            assert!(
                text.contains(&citation),
                "citation {citation:?} of {} missing",
                f.rule_id()
            );
            if let (Some(m), Some(l)) = (f.measured(), f.limit()) {
                assert!(
                    text.contains(&normalise(&m.text)) && text.contains(&normalise(&l.text)),
                    "{} against {} of {} missing",
                    m.text,
                    l.text,
                    f.rule_id()
                );
            }
        }
    }

    // Eleven distinct photos (the demo's seven and four more), each embedded once as a JPEG.
    let list = tool("pdfimages", &["-list".as_ref(), path.as_os_str()]);
    let images: Vec<&str> = list.lines().skip(2).collect();
    assert_eq!(images.len(), 11, "{list}");
    assert!(
        images
            .iter()
            .all(|l| l.split_whitespace().nth(2) == Some("image")
                && l.split_whitespace().nth(8) == Some("jpeg")),
        "{list}"
    );
    let out = t.0.join("img");
    tool(
        "pdfimages",
        &["-j".as_ref(), path.as_os_str(), out.as_os_str()],
    );
    let stored: HashSet<Vec<u8>> = store
        .photos_of_inspection(&inspection.id)
        .unwrap()
        .into_iter()
        .map(|p| std::fs::read(p.report_path.unwrap()).unwrap())
        .collect();
    let mut extracted = 0;
    for entry in std::fs::read_dir(&t.0).unwrap().flatten() {
        let name = entry.file_name().to_string_lossy().into_owned();
        if name.starts_with("img") && name.ends_with(".jpg") {
            let jpeg = std::fs::read(entry.path()).unwrap();
            assert!(
                !jpeg.windows(6).any(|w| w == b"Exif\0\0"),
                "{name} carries EXIF"
            );
            assert!(
                stored.contains(&jpeg),
                "{name} is not byte-identical to a stored report image"
            );
            extracted += 1;
        }
    }
    assert_eq!(extracted, 11);
}

#[test]
fn letter_and_a4() {
    let t = TempDir::new("report-paper");
    let (store, inspection) = demo_store(&t.0);
    for (paper, expect) in [
        (Paper::Letter, "612 x 792 pts (letter)"),
        (Paper::A4, "595.276 x 841.89 pts (A4)"),
    ] {
        let path = t.0.join("paper.pdf");
        std::fs::write(&path, render(&store, &inspection, paper)).unwrap();
        let info = tool("pdfinfo", &[path.as_os_str()]);
        assert!(info.contains(expect), "{info}");
        let pages: usize = info
            .lines()
            .find_map(|l| l.strip_prefix("Pages:"))
            .unwrap()
            .trim()
            .parse()
            .unwrap();
        let text = tool("pdftotext", &[path.as_os_str(), "-".as_ref()]);
        assert!(
            text.contains(&format!("Page {pages} of {pages}")),
            "page numbers"
        );
        assert_eq!(
            text.matches("2719 Quillback Road, Marrow Falls - wood floor framing screening")
                .count(),
            pages,
            "the property on every page"
        );
    }
}

#[test]
fn two_hundred_findings_and_three_hundred_photos_build() {
    let t = TempDir::new("report-big");
    let mut store = Store::open(&t.0.join("store.sqlite")).unwrap();
    let inspection = undercroft_engine::generate::inspection_with_members(60);
    store.import_inspection(&inspection).unwrap();
    let owners: Vec<String> = inspection
        .areas
        .iter()
        .flat_map(|a| &a.runs)
        .flat_map(|r| &r.joists)
        .flat_map(|j| j.observations.iter().map(|o| o.id.to_string()))
        .collect();
    for n in 0..300u32 {
        let owner = &owners[n as usize % owners.len()];
        store
            .add_photo(
                owner,
                &photo(n, 96, 72),
                &format!(
                    "Photo {n} of a long series, with a caption that runs on for a while to wrap"
                ),
            )
            .unwrap();
    }
    let inspection = store.load_inspection(&inspection.id).unwrap();
    let findings = evaluate(&inspection).findings.len();
    assert!(findings >= 200, "{findings} findings");
    let bytes = render(&store, &inspection, Paper::A4);
    let path = t.0.join("big.pdf");
    std::fs::write(&path, &bytes).unwrap();
    tool("qpdf", &["--check".as_ref(), path.as_os_str()]);
    let list = tool("pdfimages", &["-list".as_ref(), path.as_os_str()]);
    assert_eq!(
        list.lines().skip(2).count(),
        300,
        "every photo embedded once"
    );
}

#[test]
fn hostile_text_still_makes_a_sound_report() {
    let t = TempDir::new("report-hostile");
    let mut inspection = demo();
    inspection.property.address =
        format!("{} 李 🏠\u{0}\t\r end", "Very long address ".repeat(600));
    inspection.client.name = "Zoë\u{202E}reversed\u{200B}".into();
    inspection.conditions = "wet\n\n\nvery wet ".repeat(400);
    inspection.areas[0].name = "x".repeat(5000);
    inspection.areas[0].notes = "李".repeat(3000);
    let bytes = render_without_store(&inspection, Paper::A4);
    let path = t.0.join("hostile.pdf");
    std::fs::write(&path, &bytes).unwrap();
    tool("qpdf", &["--check".as_ref(), path.as_os_str()]);
    let text = tool("pdftotext", &[path.as_os_str(), "-".as_ref()]);
    assert!(text.contains("李李李"), "CJK notes extract");
    assert!(
        text.contains("very wet"),
        "long conditions wrap onto the page"
    );
}

/// Every script the README promises is drawn and reads back from the PDF: Latin with
/// accents, Greek, Cyrillic, Chinese, Japanese kana, Korean Hangul, Hebrew (in right-to-left
/// order) and Arabic (joined, in right-to-left order; poppler reads the joined presentation
/// forms back in logical order). Observation notes reach the report.
#[test]
fn every_promised_script_reads_back() {
    let t = TempDir::new("report-scripts");
    let mut inspection = demo();
    let samples = [
        "Zoë Ångström-Nguyễn",
        "Ελληνικά",
        "Привет",
        "李小龍",
        "ひらがな",
        "김민준",
        "שלום",
        "مرحبا",
    ];
    inspection.client.name = samples.join(" / ");
    let path = t.0.join("scripts.pdf");
    std::fs::write(&path, render_without_store(&inspection, Paper::Letter)).unwrap();
    let text = tool("pdftotext", &[path.as_os_str(), "-".as_ref()]);
    for sample in &samples[..7] {
        assert!(
            text.contains(sample),
            "{sample} does not read back: {}",
            &text[..600]
        );
    }
    // Arabic: MEEM initial, REH final, HAH initial, BEH medial, ALEF final (Unicode
    // Arabic Presentation Forms-B), read back in logical order.
    assert!(
        text.contains("\u{FEE3}\u{FEAE}\u{FEA3}\u{FE92}\u{FE8E}"),
        "Arabic does not read back joined: {}",
        &text[..600]
    );
    assert!(
        text.contains("Notched for a drain line."),
        "observation notes reach the report"
    );
}

/// Pixels of the marks' colour (bright yellow) on every page, rendered at 30 dpi.
fn mark_pixels(pdf_bytes: &[u8], dir: &Path, name: &str) -> usize {
    let pdf_path = dir.join(format!("{name}.pdf"));
    std::fs::write(&pdf_path, pdf_bytes).unwrap();
    let prefix = dir.join(name);
    tool(
        "pdftoppm",
        &[
            "-r".as_ref(),
            "30".as_ref(),
            "-png".as_ref(),
            pdf_path.as_os_str(),
            prefix.as_os_str(),
        ],
    );
    let mut count = 0;
    for entry in std::fs::read_dir(dir).unwrap() {
        let path = entry.unwrap().path();
        let is_page = path
            .file_name()
            .and_then(|n| n.to_str())
            .is_some_and(|n| n.starts_with(&format!("{name}-")) && n.ends_with(".png"));
        if is_page {
            let page = image::open(&path).unwrap().to_rgb8();
            count += page
                .pixels()
                .filter(|p| p[0] > 225 && p[1] > 170 && p[1] < 235 && p[2] < 70)
                .count();
        }
    }
    count
}

#[test]
fn marks_are_drawn_over_the_photo_and_its_file_is_untouched() {
    let dir = TempDir::new("report-marks");
    let (mut store, inspection) = demo_store(&dir.0);
    let photo = store
        .photos_of("obs-k7-notch")
        .unwrap()
        .into_iter()
        .find(|p| p.caption.starts_with("Notch at the drain line"))
        .unwrap();
    let file = photo.report_path.clone().unwrap();
    let stored = std::fs::read(&file).unwrap();
    let plain = render(&store, &inspection, Paper::Letter);
    let marks = vec![
        PhotoMark::Circle {
            centre: [0.5, 0.5],
            radius: 0.2,
        },
        PhotoMark::Arrow {
            from: [0.1, 0.1],
            to: [0.4, 0.4],
        },
        PhotoMark::Dimension {
            from: [0.2, 0.85],
            to: [0.8, 0.85],
            label: "2-1/2\"".into(),
        },
    ];
    store.set_photo_marks(&photo.id, &marks).unwrap();
    let inspection = store.load_inspection(&inspection.id).unwrap();
    let marked = render(&store, &inspection, Paper::Letter);
    let (before, after) = (
        mark_pixels(&plain, &dir.0, "plain"),
        mark_pixels(&marked, &dir.0, "marked"),
    );
    assert!(
        after > before + 40,
        "the marks are drawn: {before} mark-coloured pixels before, {after} after"
    );
    assert_eq!(
        std::fs::read(&file).unwrap(),
        stored,
        "the photo's file is as taken"
    );
    // pdfimages -list: page, size, encoding and bytes of each image (not its object number).
    let list = |pdf_bytes: &[u8], name: &str| {
        let path = dir.0.join(format!("{name}-list.pdf"));
        std::fs::write(&path, pdf_bytes).unwrap();
        let mut rows: Vec<String> = tool("pdfimages", &["-list".as_ref(), path.as_os_str()])
            .lines()
            .skip(2)
            .map(|l| {
                let f: Vec<&str> = l.split_whitespace().collect();
                format!("{} {} {} {} {}", f[0], f[3], f[4], f[8], f[14])
            })
            .collect();
        rows.sort();
        rows
    };
    assert_eq!(
        list(&plain, "plain"),
        list(&marked, "marked"),
        "the same images, embedded as they were: the marks are a layer over them"
    );
    let text = normalise(&tool_text(&marked, &dir.0));
    assert!(
        text.contains("2-1/2\""),
        "the dimension's label is in the report"
    );
}

fn tool_text(pdf_bytes: &[u8], dir: &Path) -> String {
    let path = dir.join("text.pdf");
    std::fs::write(&path, pdf_bytes).unwrap();
    tool("pdftotext", &[path.as_os_str(), "-".as_ref()])
}
