//! Every screen rendered with dioxus-ssr on the demo inspection in a real store, without a
//! display: what the inspector would read on each one.

use dioxus::prelude::*;
use dioxus_history::{provide_history_context, MemoryHistory};
use std::cell::RefCell;
use std::path::PathBuf;
use std::rc::Rc;
use undercroft_app::{App, AppState};
use undercroft_store::Store;

thread_local! {
    static SETUP: RefCell<(PathBuf, String)> = const { RefCell::new((PathBuf::new(), String::new())) };
}

#[allow(non_snake_case)]
fn TestRoot() -> Element {
    let (db, path) = SETUP.with(|s| s.borrow().clone());
    use_hook(|| provide_history_context(Rc::new(MemoryHistory::with_initial_path(path))));
    let state = use_hook(|| AppState::new(Store::open(&db).expect("store opens")));
    use_context_provider(|| state);
    rsx! { App {} }
}

fn demo() -> undercroft_engine::Inspection {
    undercroft_engine::interchange::from_json(include_str!("../../demo-data/demo-inspection.json"))
        .unwrap()
}

/// The HTML of the screen at `path`, with the demo inspection in a fresh store.
fn render(path: &str) -> String {
    render_with(path, &demo())
}

/// The HTML of the screen at `path`, with the given inspection in a fresh store.
fn render_with(path: &str, demo: &undercroft_engine::Inspection) -> String {
    static RENDERS: std::sync::atomic::AtomicUsize = std::sync::atomic::AtomicUsize::new(0);
    let n = RENDERS.fetch_add(1, std::sync::atomic::Ordering::Relaxed);
    let dir = std::env::temp_dir().join(format!("undercroft-app-views-{}-{n}", std::process::id()));
    std::fs::create_dir_all(&dir).unwrap();
    let db = dir.join("store.sqlite");
    Store::open(&db).unwrap().import_inspection(demo).unwrap();
    SETUP.with(|s| *s.borrow_mut() = (db, path.to_string()));
    let mut dom = VirtualDom::new(TestRoot);
    dom.rebuild_in_place();
    let html = dioxus_ssr::render(&dom);
    std::fs::remove_dir_all(&dir).ok();
    html
}

const DEMO: &str = "0193a1c2-7d00-7000-8000-00000000d001";

#[test]
fn inspection_list() {
    let html = render("/");
    assert!(html.contains("2719 Quillback Road, Marrow Falls"), "{html}");
    assert!(html.contains("Zoë Ångström-Nguyễn"));
    assert!(html.contains("Start inspection"));
    assert!(
        !html.contains("screening tool"),
        "the notice is said once, on the inspection screen"
    );
}

#[test]
fn inspection_shows_areas_with_counts_over() {
    let html = render(&format!("/inspection/{DEMO}"));
    assert!(html.contains("Kitchen crawlspace"), "{html}");
    assert!(html.contains("Basement under the bedrooms"));
    // Code limits and engineering references over (25, with the load path and the porch),
    // and the demo's decay, cut joist, shimmed post and torn ground cover as observed
    // conditions to evaluate (4).
    assert!(
        html.contains("25 over a limit, 4 to be evaluated"),
        "{html}"
    );
    assert!(html.contains("over a limit or to be evaluated"));
    assert!(
        html.contains("A screening tool, not an engineering evaluation")
            && html.contains("checked against the IRC 2018")
            && html.contains("Local codes and amendments govern")
            && html.contains("licensed professional"),
        "the notice, with the edition used, once on the inspection screen"
    );
    assert!(
        html.contains("row-status status-over-limit\">Over a limit"),
        "each area row says its worst status in words"
    );
}

#[test]
fn area_lists_runs() {
    let html = render("/area/area-crawl");
    assert!(html.contains("Kitchen joists"), "{html}");
    assert!(html.contains("Dining room joists"));
    assert!(html.contains("Same values as the previous run"));
}

// Source: IRC 2015 Table R502.3.1(2) method, SPF No. 2 2x10 at 16 in with 40 psf live and
// 20 psf dead (tile): allowable 14' 1"; the kitchen run's 15' 2" is 108 % of it.
#[test]
fn run_shows_the_live_check() {
    let html = render("/run/run-kitchen");
    assert!(
        html.contains("OVER LIMIT 108 % of the allowable span"),
        "{html}"
    );
    assert!(html.contains("Clear span 15&#39; 2&#34; is over the allowable span of 14&#39; 1&#34; (bending governs)"), "{html}");
    assert!(
        html.contains("value=\"spruce-pine-fir\""),
        "the stored species is picked"
    );
    assert!(
        html.contains("id=\"spacing\" class=\"tape\" inputmode=\"none\""),
        "lengths take the tape keypad, not the phone's keyboard: {html}"
    );
    assert!(
        html.contains("a number alone is inches"),
        "the rule for a bare number is in sight"
    );
}

#[test]
fn findings_over_limit_first_with_citations() {
    let page = render(&format!("/inspection/{DEMO}/findings"));
    let html = &page[page.find("<main").expect("the screen")..];
    let first_over = html.find("OVER CODE LIMIT").expect("an over-limit finding");
    let first_within = html.find("within code limit").unwrap_or(usize::MAX);
    assert!(first_over < first_within, "over limit comes first");
    let first_observed = html.find("TO BE EVALUATED").expect("decay to evaluate");
    let first_within_badge = html.find("within code limit").unwrap_or(usize::MAX);
    assert!(
        first_observed < first_within_badge,
        "observed conditions before within"
    );
    assert!(html.contains("Basis: observed condition"));
    assert!(html.contains("IRC 2018 R502.8.1"));
    assert!(html.contains("licensed professional"));
    // Who acts, as the report says it, and the choice to change it.
    assert!(html.contains("Who acts: Engineer first"), "{html}");
    assert!(html.contains("Who acts: Contractor soon"));
    assert!(
        !html.contains("input-problems"),
        "the demo has no bad entry"
    );
}

#[test]
fn findings_list_entries_that_could_not_be_used() {
    let mut inspection = demo();
    // A spacing of 96 in cannot be what was meant: refused, said, never "not entered".
    inspection.areas[0].runs[1].framing.spacing =
        Some(undercroft_engine::units::Length::inches(96.0));
    let page = render_with(&format!("/inspection/{DEMO}/findings"), &inspection);
    let html = &page[page.find("<main").expect("the screen")..];
    let problems = &html[html.find("input-problems").expect("the problems card")..];
    assert!(
        problems.contains("spacing 96 in is outside 4 to 48 in"),
        "{problems}"
    );
    assert!(html.contains("spacing entered but out of range"), "{html}");
}

// Source: IRC 2018 R502.8.1: the demo's 2 in notch in a 2x10 (limit d/6 = 1.542 in, held as
// shown: 1-1/2 in).
#[test]
fn observation_shows_verdict_citation_and_side_view() {
    let html = render("/observe/joist-k7/notch/obs-k7-notch");
    assert!(html.contains("OVER CODE LIMIT 133 %"), "{html}");
    assert!(html.contains("IRC 2018 R502.8.1"));
    assert!(html.contains("<svg"), "the side view is drawn");
    assert!(html.contains("middle third"));
    assert!(
        html.contains("Take a photo") && html.contains("Pick photos"),
        "photos can be added to a saved observation"
    );
    assert!(
        html.contains("capture=\"environment\""),
        "one tap opens the camera on a phone"
    );
    assert!(html.contains("accept=\"image/*\""));
    assert!(
        html.contains("href=\"/member/joist-k7\"") && html.contains("Remove this observation"),
        "back up to the joist it is on, and a way to remove it"
    );
    let fresh = render("/observe/run-dining/notch/new-one");
    assert!(fresh.contains("Distance from the support face"), "{fresh}");
}

#[test]
fn run_lists_its_observations_and_the_kinds_to_add() {
    let kitchen = render("/run/run-kitchen");
    assert!(
        kitchen.contains("Joist 7") && kitchen.contains("Add a joist of this run"),
        "{kitchen}"
    );
    let html = render("/run/run-dining");
    assert!(html.contains("moisture reading"), "{html}");
    assert!(html.contains("Pick what you saw"));
    assert!(html.contains("Bored hole"));
}

#[test]
fn settings_and_report_screens() {
    let html = render("/settings");
    assert!(
        html.contains("License number") && html.contains("Code edition"),
        "{html}"
    );
    let html = render(&format!("/inspection/{DEMO}/report"));
    assert!(
        html.contains("Build the report") && html.contains("No report delivered yet."),
        "{html}"
    );
}

#[test]
fn area_lists_single_members_and_adds_them() {
    let html = render("/area/area-base");
    assert!(html.contains("href=\"/member/member-hearth\""), "{html}");
    assert!(html.contains("Add member"));
}

// Source: IRC 2015 Table R502.3.1(2) method (as in `run_shows_the_live_check`): joist 7 lists
// nothing of its own framing, so it is checked with its run's 2x10 SPF No. 2 at 15' 2".
#[test]
fn a_joist_shows_its_run_values_and_is_checked_with_them() {
    let html = render("/member/joist-k7");
    assert!(html.contains("Same as the run: 15&#39; 2&#34;"), "{html}");
    assert!(html.contains("Same as the run (No. 2)"), "{html}");
    assert!(
        html.contains("OVER LIMIT 108 % of the allowable span"),
        "{html}"
    );
    assert!(html.contains("href=\"/observe/joist-k7/notch/obs-k7-notch\""));
    assert!(html.contains("enter only what differs"));
}

#[test]
fn a_single_member_shows_its_own_framing() {
    let html = render("/member/member-hearth");
    assert!(html.contains("Deep joist at the hearth"), "{html}");
    assert!(
        !html.contains("Same as the run"),
        "a single member has no run"
    );
    assert!(html.contains("value=\"9&#39; 6&#34;\""), "{html}");
    assert!(html.contains("End restraint") && html.contains("Bridging"));
    let missing = render("/member/no-such-member");
    assert!(missing.contains("This member is not in the store."));
}

#[test]
fn the_screen_follows_the_setting() {
    let html = render("/settings");
    assert!(html.contains("class=\"app screen-device\""), "{html}");
    assert!(html.contains("Dark, for dim light"));
}

#[test]
fn an_archived_inspection_can_be_brought_back() {
    let html = render(&format!("/inspection/{DEMO}"));
    assert!(html.contains("Archive it"), "{html}");
    let list = render("/");
    assert!(list.contains("Show archived inspections"), "{list}");
}

#[test]
fn girder_screen_shows_posts_spans_and_what_it_carries() {
    let html = render("/girder/girder-centre");
    assert!(html.contains("Centre girder"), "{html}");
    // The side view: spans with their use, the over span named in words.
    assert!(html.contains("10&#39; 0&#34;, 150 % over"), "{html}");
    assert!(html.contains(" over"), "{html}");
    assert!(html.contains("Post 1") && html.contains("Post 2"));
    assert!(html.contains("Carries: Kitchen joists"), "{html}");
    // Its findings and its posts' findings, in the words of their basis.
    assert!(html.contains("BEYOND REFERENCE"), "{html}");
    assert!(html.contains("TO BE EVALUATED"), "{html}");
    assert!(html.contains("id=\"girder-plies\""), "{html}");
}

#[test]
fn post_screen_shows_its_findings_and_fields() {
    let html = render("/post/post-2");
    assert!(html.contains("Post 2"), "{html}");
    assert!(
        html.contains("The footing under the post cannot be seen"),
        "{html}"
    );
    assert!(html.contains("not fully checked"), "{html}");
    assert!(html.contains("id=\"post-footing-visible\""), "{html}");
}

#[test]
fn area_lists_girders_and_the_conditions_of_the_space() {
    let html = render("/area/area-crawl");
    assert!(html.contains("Girders and posts"), "{html}");
    assert!(html.contains("Centre girder"));
    assert!(html.contains("id=\"site-vapor-retarder\""), "{html}");
    assert!(html.contains("The space under the floor"));
}

#[test]
fn run_screen_links_its_girder() {
    let html = render("/run/run-kitchen");
    assert!(html.contains("Bears on"), "{html}");
    assert!(html.contains("Centre girder (Kitchen crawlspace)"));
}

#[test]
fn report_screen_says_what_to_look_at_before_handing_over() {
    let page = render(&format!("/inspection/{DEMO}/report"));
    let html = &page[page.find("<main").expect("the screen")..];
    let check = &html[html.find("before-handover").expect("the checklist")..];
    // The demo's photos are references here, without their images on this device.
    assert!(check.contains("7 photos are not on this device"), "{check}");
    assert!(check.contains("have no photo"), "{check}");
    assert!(!check.contains("No licence number"));
    assert!(html.contains("repair-options"));
}

#[test]
fn the_joist_walk_shows_the_place_and_carries_the_previous_joist_forward() {
    let html = render("/walk/run-kitchen/16");
    assert!(html.contains("Joist at 1&#39; 4&#34;"), "{html}");
    assert!(html.contains("joist 1, 16&#34; on centre"), "{html}");
    assert!(html.contains("Same as the run"), "{html}");
    assert!(html.contains("Next joist") && html.contains("id=\"observe-notch\""));

    let mut demo = demo();
    let run = demo.areas[0]
        .runs
        .iter_mut()
        .find(|r| r.id == "run-kitchen")
        .unwrap();
    run.joists.push(undercroft_engine::model::Joist {
        id: "walked".into(),
        label: "Joist at 2' 8\"".into(),
        at: Some(undercroft_engine::units::Length::inches(32.0)),
        framing: undercroft_engine::model::Framing {
            size: "2x12".parse().ok(),
            ..Default::default()
        },
        observations: vec![],
    });
    let here = render_with("/walk/run-kitchen/32", &demo);
    assert!(here.contains("Differs from the run: 2x12"), "{here}");
    let next = render_with("/walk/run-kitchen/48", &demo);
    assert!(next.contains("Same as the previous joist"), "{next}");
    let run_screen = render_with("/run/run-kitchen", &demo);
    assert!(
        run_screen.contains("Joist at 2&#39; 8&#34;") && run_screen.contains("2x12"),
        "the walked joist is listed with what differs"
    );
    let nowhere = render("/walk/run-kitchen/not-a-place");
    assert!(nowhere.contains("This is not a place along a run."));
}

#[test]
fn settings_offer_the_office_and_say_what_the_firm_sent() {
    let html = render("/settings");
    assert!(
        html.contains("The firm&#39;s office") || html.contains("The firm's office"),
        "{html}"
    );
    assert!(html.contains("id=\"office-url\""));
    assert!(
        html.contains("type=\"password\""),
        "the token is not shown as typed"
    );
    // The demo has no delivered report: nothing is finished yet, and the button says so.
    assert!(html.contains("Send 0 finished to the office"), "{html}");
    assert!(
        !html.contains("From the office"),
        "no firm settings taken yet"
    );
}
