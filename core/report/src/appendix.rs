//! The report's appendix for the professional reader: method, loads, design values,
//! assumptions and sources, and the limits of the inspection.

use super::model::TextSection;
use std::collections::HashSet;
use undercroft_engine::lumber::{design_values, DesignValues};
use undercroft_engine::model::Inspection;
use undercroft_engine::units::UnitSystem;
use undercroft_engine::validate::MemberContext;

pub fn appendix(i: &Inspection, contexts: &[MemberContext]) -> Vec<TextSection> {
    let mut values: Vec<String> = Vec::new();
    let mut seen = HashSet::new();
    for ctx in contexts {
        let Some(l) = &ctx.lumber else { continue };
        let grade = l.grade.grade_for_design();
        if !seen.insert((l.species, grade, l.section.nominal)) {
            continue;
        }
        if let Some(v) = design_values(l.species, grade, l.section.nominal) {
            values.push(design_line(
                &format!(
                    "{} {} {}",
                    l.species.name(),
                    grade.name(),
                    l.section.nominal
                ),
                v,
            ));
        }
    }
    values.sort();
    let units_note = match i.units {
        UnitSystem::Imperial => "Lengths in feet and inches, rounded to 1/16 in.",
        UnitSystem::Metric => "Lengths in millimetres, rounded to 1 mm.",
    };
    vec![
        TextSection {
            heading: "Method, design values and sources".into(),
            paragraphs: vec![
                "Each joist is checked as a simply supported beam under uniform load, as the residential code's span tables are computed: the allowable span is the least of the spans that bending (w L^2 / 8 <= Fb' S, total load), live-load deflection (5 w L^4 / 384 E' I <= L / n, live load) and shear (w L / 2 <= 2/3 Fv' b d, total load) allow. The span is held to the nearest inch, as the printed tables are, and compared with the measured clear span, face to face of the supports.".into(),
                "Fb' = Fb x CD x CM x CF x Cr; Fv' = Fv x CD x CM; E' = E x CM. CD = 1.0 (occupancy live load, NDS Table 2.3.2); Cr = 1.15 for repetitive members at 24 in or less (NDS 4.3.9); CF by width (NDS Supplement Table 4A; included in the southern pine values of Table 4B); CM wet-service factors when a moisture reading is over 19 % (NDS Supplement Table 4A: Fb 0.85 unless Fb x CF <= 1150 psi, Fv 0.97, E 0.9, Fc-perp 0.67).".into(),
                "Bearing needed for the reaction: R = w L / 2 over Fc-perp' times the joist thickness (NDS 3.10.2, Cb taken as 1.0). Notches, holes, bearing, laps, end restraint and bridging are held to IRC R502.6, R502.6.1, R502.7, R502.7.1, R502.8.1 and R502.8.2. Measured sag is compared with the L/360 floor reference of Table R301.7, which is a limit on calculated live-load deflection, not on long-term sag.".into(),
                "Girders are checked span by span between their posts and ends as simple beams under the load of the joists that bear on them (half of each joist span, with any wall or point load above), for bending, shear and live-load deflection (NDS 3.3-3.5, L/360 by Table R301.7), with bearing at each support (R502.6, NDS 3.10). Posts are checked for column stability (NDS 3.7, le/d at most 50) against the load of the spans on each side, and for the minimums and end restraint of R407.3; footings for the area the post load needs on the soil (Table R401.4.1, 1500 psf where the soil is unknown). A footing that cannot be seen is not evaluated.".into(),
                "Loads: live load from the room use above (IRC Table R301.5): 30 psf over sleeping rooms, 40 psf over other rooms; dead load 10 psf, or 20 psf under heavy finishes such as tile (the dead loads of IRC Tables R502.3.1(1) and (2)). Each area's loads are stated with it.".into(),
                format!("Lumber without a visible grade stamp is designed as No. 3 of its species group, a conservative default: a visible stamp may allow more. Rough-sawn lumber is designed with its measured section and the design values of dressed lumber of the same species and grade. Engineered products (I-joists, structural composite lumber, floor trusses, glulam) are not checked against sawn-lumber tables: their spans and holes follow the maker's instructions. {units_note}"),
                if values.is_empty() {
                    "Design values: no sawn lumber was checked.".into()
                } else {
                    format!("Design values used (psi): {}.", values.join("; "))
                },
                format!(
                "Sources: International Residential Code, {} edition as stated on the first page. National Design Specification (NDS) for Wood Construction, 2018, and its Supplement: Design Values for Wood Construction (Tables 1B, 4A, 4B). USDA Forest Products Laboratory, Wood Handbook (FPL-GTR-282), chapters on moisture and on biodeterioration.",
                i.code_edition
            ),
            ],
        },
    ]
}

fn design_line(name: &str, v: &DesignValues) -> String {
    format!(
        "{name}: Fb {:.0}, Fv {:.0}, Fc-perp {:.0}, E {:.0}; {}",
        v.fb.0,
        v.fv.0,
        v.fc_perp.0,
        v.e.0,
        v.source_short(),
    )
}

pub fn limits(i: &Inspection) -> TextSection {
    TextSection {
        heading: "Limits of this inspection".into(),
        paragraphs: vec![
            "Only framing that was visible and reachable on the day was looked at. Insulation, finishes, stored goods and soil can hide damage; hidden conditions are not reported.".into(),
            "Measurements were taken with a tape, a moisture meter and a line; they carry the errors of those tools. Species and grade were read from grade stamps where visible.".into(),
            format!(
                "Findings compare measurements with the prescriptive limits of the {} and with wood mechanics (NDS). Local codes and amendments govern where they differ{}.",
                i.code_edition,
                if i.local_amendments.is_empty() { String::new() } else { format!(" (told to the inspector: {})", i.local_amendments) }
            ),
            "This report is not an engineering evaluation and does not design repairs. Refer every structural concern, and any finding over a limit, to a licensed professional (a structural engineer or architect) before repairs, jacking or added loads.".into(),
        ],
    }
}
