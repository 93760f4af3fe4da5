//! The report as its readers meet it, read back from the PDF with poppler-utils: the first
//! page says what must be done and by whom, alike findings read as one, the client's pages
//! carry no rule ids or formulas, the contents point at the right pages. (The demo report's
//! length, photos and metadata are read back in `core/cli/tests/demo_report.rs`.)

use std::path::{Path, PathBuf};
use undercroft_engine::units::Length;
use undercroft_engine::{evaluate, Inspection};
use undercroft_report::{build_report, pdf, Paper, PhotoFiles, Report, ReportInput};
use undercroft_store::Store;
use undercroft_tests::{demo_images, demo_path, normalise, tool, TempDir};

fn demo() -> Inspection {
    undercroft_engine::interchange::from_json(&std::fs::read_to_string(demo_path()).unwrap())
        .unwrap()
}

/// The report value and its PDF for an inspection put in a fresh store with the given images.
fn report_of(
    dir: &Path,
    inspection: &Inspection,
    with_images: bool,
    repair_options: bool,
) -> (Report, PathBuf) {
    let mut store = Store::open(&dir.join("store.sqlite")).unwrap();
    let images = if with_images {
        demo_images(inspection)
    } else {
        Default::default()
    };
    store
        .import_inspection_with_images(inspection, &images)
        .unwrap();
    let files: PhotoFiles = store
        .photos_of_inspection(&inspection.id)
        .unwrap()
        .into_iter()
        .filter_map(|p| p.report_path.map(|f| (p.id, f)))
        .collect();
    let inspection = store.load_inspection(&inspection.id).unwrap();
    let evaluation = evaluate(&inspection);
    let report = build_report(&ReportInput {
        inspection: &inspection,
        evaluation: &evaluation,
        notes: &[],
        photo_files: &files,
        paper: Paper::Letter,
        repair_options,
    });
    let path = dir.join("report.pdf");
    std::fs::write(&path, pdf::render(&report)).unwrap();
    (report, path)
}

/// The text of each page, in order.
fn pages(path: &Path) -> Vec<String> {
    let text = tool(
        "pdftotext",
        &["-layout".as_ref(), path.as_os_str(), "-".as_ref()],
    );
    text.split('\u{c}')
        .filter(|p| !p.trim().is_empty())
        .map(str::to_string)
        .collect()
}

#[test]
fn the_first_page_says_what_to_do_most_pressing_first() {
    let t = TempDir::new("reader-first");
    let (report, path) = report_of(&t.0, &demo(), true, false);
    let pages = pages(&path);
    let first = normalise(&pages[0]);
    let at = |needle: &str| {
        first
            .find(needle)
            .unwrap_or_else(|| panic!("{needle:?} not on the first page: {first}"))
    };
    // The title, the house, then what must be done; decay at a bearing leads, not a percent.
    assert!(at("screening report") < at("What needs to be done"));
    assert!(at("What needs to be done") < at("Engineer first"));
    assert!(at("1. Decay or insect damage") < at("2. Cut in a sawn joist"));
    assert!(at("2. Cut in a sawn joist") < at("4. Joist span"));
    // The groups follow one another by priority over the first pages, numbered in order.
    let all = normalise(&pages.join("\n"));
    let groups = [
        "Engineer first",
        "Contractor soon",
        "Measure first",
        "Owner to watch",
    ];
    let found: Vec<usize> = groups.iter().map(|g| all.find(g).unwrap()).collect();
    assert!(found.windows(2).all(|w| w[0] < w[1]), "{found:?}");
    let numbers: Vec<usize> = report
        .actions
        .groups
        .iter()
        .flat_map(|g| g.items.iter().map(|i| i.number))
        .collect();
    assert_eq!(numbers, (1..=numbers.len()).collect::<Vec<_>>());
    // The lead's counts are the items listed under each group.
    for g in &report.actions.groups {
        let n = g.items.len();
        let said = format!("{n} finding{}", if n == 1 { "" } else { "s" });
        assert!(
            report.actions.lead.contains(&said),
            "{}",
            report.actions.lead
        );
    }
    // Every observed condition (damage, cuts) is on the first pages.
    let observed = evaluate(&demo())
        .findings
        .iter()
        .filter(|f| f.status == undercroft_engine::Status::ToEvaluate)
        .count();
    let listed = report
        .actions
        .groups
        .iter()
        .flat_map(|g| &g.items)
        .filter(|i| {
            i.basis == "Observed condition"
                || i.sentence.contains("ecay")
                || i.sentence.contains("Cut")
        })
        .count();
    assert!(
        listed >= observed,
        "{listed} of {observed} observed conditions listed"
    );
}

#[test]
fn the_client_pages_carry_no_rule_ids_or_formulas() {
    let t = TempDir::new("reader-plain");
    let (_, path) = report_of(&t.0, &demo(), true, false);
    let all = pages(&path).join("\n");
    let client = &all[..all
        .find("For the professional")
        .expect("the professional's section")];
    let client = normalise(client);
    for rule in undercroft_engine::rules::all_rule_infos() {
        // Hyphenated ids cannot be ordinary words ("bridging" is one as well as an id).
        if rule.id.contains('-') {
            assert!(
                !client.contains(rule.id),
                "rule id {} in the client pages",
                rule.id
            );
        }
    }
    for formula in [
        "Fc-perp'",
        "Fb'",
        "Fv'",
        "Vr'",
        " Cb ",
        "w L",
        "Use of the limit",
    ] {
        assert!(!client.contains(formula), "{formula:?} in the client pages");
    }
    // The professional's section keeps them.
    let rest = normalise(&all[all.find("For the professional").unwrap()..]);
    assert!(rest.contains("sawn-notch") && rest.contains("Fc-perp'"));
}

#[test]
fn five_joists_over_span_read_as_one_finding_with_the_worst() {
    let t = TempDir::new("reader-group");
    let mut inspection = demo();
    let run = &mut inspection.areas[0].runs[1];
    let template = run.joists[0].clone();
    run.joists.clear();
    for (n, feet) in [16.0, 16.5, 17.0, 16.2, 16.8].into_iter().enumerate() {
        let mut j = template.clone();
        j.id = format!("walk-{n}");
        j.label = format!("Joist {}", n + 1);
        j.observations.clear();
        j.framing.clear_span = Some(Length::feet(feet));
        run.joists.push(j);
    }
    inspection.photos.clear();
    let (_, path) = report_of(&t.0, &inspection, false, false);
    let text = normalise(&pages(&path).join("\n"));
    // Source: IRC 2018 Table R502.3.1(2), 2x10 SPF No. 2 at 16 in, 40 psf live, 10 psf dead:
    // 14' 1" allowable; the worst of the five is 17' 0".
    let sentence = "Joist span at 5 joists, worst: 2x10 Spruce-pine-fir, No. 2, at 16\" o.c.: clear span 17' 0\" against allowable 14' 1\"";
    assert_eq!(text.matches(sentence).count(), 1, "{text}");
    assert_eq!(
        text.matches("Joist span at").count(),
        1,
        "one finding, not five"
    );
    assert!(text.contains("Joist 1 (16' 0\")"), "{text}");
}

#[test]
fn repair_options_only_when_turned_on() {
    let t = TempDir::new("reader-options");
    let mut inspection = demo();
    inspection.photos.clear();
    let (_, off) = report_of(&t.0, &inspection, false, false);
    let off_text = normalise(&pages(&off).join("\n"));
    assert!(!off_text.contains("Repair option"));
    assert!(!off_text.contains("options to discuss are listed"));
    let t2 = TempDir::new("reader-options-on");
    let (_, on) = report_of(&t2.0, &inspection, false, true);
    let on_text = normalise(&pages(&on).join("\n"));
    assert!(on_text.contains("Repair option"), "{on_text}");
}

#[test]
fn a_spacing_of_19_2_in_reads_as_typed_and_a_refused_one_is_listed() {
    let t = TempDir::new("reader-spacing");
    let mut inspection = demo();
    inspection.photos.clear();
    // Source: IRC 2018 Table R502.3.1(2) heads a column "19.2".
    inspection.areas[0].runs[0].framing.spacing = Some(Length::inches(19.2));
    inspection.areas[2].runs[0].framing.spacing = Some(Length::inches(96.0));
    let (_, path) = report_of(&t.0, &inspection, false, false);
    let text = normalise(&pages(&path).join("\n"));
    assert!(text.contains("at 19.2\" o.c."), "{text}");
    assert!(!text.contains("19-3/16"));
    assert!(text.contains("Entries that could not be used"));
    assert!(text.contains("spacing 96 in is outside 4 to 48 in"));
    assert!(text.contains("spacing entered but out of range"));
}

#[test]
fn the_contents_point_at_the_right_pages_and_no_heading_ends_a_page() {
    let t = TempDir::new("reader-contents");
    let (report, path) = report_of(&t.0, &demo(), true, false);
    let pages = pages(&path);
    let contents_page = pages.iter().find(|p| p.contains("Contents")).unwrap();
    let mut checked = 0;
    for area in &report.areas {
        let line = contents_page
            .lines()
            .find(|l| l.trim_start().starts_with(&area.heading))
            .unwrap_or_else(|| panic!("{} not in the contents", area.heading));
        let page: usize = line.split_whitespace().last().unwrap().parse().unwrap();
        // The heading is on that page, on a line of its own.
        assert!(
            pages[page - 1].lines().any(|l| l.trim() == area.heading),
            "{} is not on page {page}",
            area.heading
        );
        checked += 1;
    }
    assert_eq!(checked, report.areas.len());
    // No page ends with a heading: the last line of text above the footer is not one.
    let headings: Vec<String> = report
        .areas
        .iter()
        .flat_map(|a| [a.heading.clone(), format!("Checks met in {}", a.heading)])
        .chain(["What needs to be done", "Contents", "Inspector's statement"].map(String::from))
        .collect();
    for (n, page) in pages.iter().enumerate() {
        let body: Vec<&str> = page
            .lines()
            .map(str::trim)
            .filter(|l| !l.is_empty() && !l.starts_with("Screening report, not an engineering"))
            .collect();
        let last = body.last().copied().unwrap_or("");
        assert!(
            !headings.iter().any(|h| h == last),
            "page {} ends with the heading {last:?}",
            n + 1
        );
    }
}
