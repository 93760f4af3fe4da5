//! What a framing field change does, as one plain function the run and member screens call
//! (and the field-to-save benchmark measures): the form updated, what reads saved at once,
//! a field that does not read yet keeping its stored value, and each field's problem returned.

use undercroft_engine::forms::{
    area_with, framing_question, inspection_with, keep_stored, FieldError, FramingForm, Question,
};
use undercroft_engine::model::Framing;
use undercroft_engine::units::UnitSystem;
use undercroft_store::{Result, Store};

/// Whose framing is being typed.
#[derive(Debug, Clone, Copy)]
pub enum FramingOwner<'a> {
    Run {
        id: &'a str,
        label: &'a str,
    },
    /// A joist of a run (`run` holds the run's framing) or a single member.
    Member {
        id: &'a str,
        label: &'a str,
        run: Option<&'a Framing>,
    },
}

/// One field changed on the screen. `confirmed` is true when the inspector answered "keep"
/// to a question about this very value.
#[derive(Debug, Clone)]
pub struct FramingEdit<'a> {
    pub field: &'a str,
    pub value: String,
    pub confirmed: bool,
}

/// What the screen shows after a change: each field's problem, and the question waiting for
/// an answer (its value not saved until kept).
#[derive(Debug, Clone, Default, PartialEq)]
pub struct FieldCheck {
    pub errors: Vec<FieldError>,
    pub question: Option<Question>,
}

/// Sets the edited field in `form` and saves the framing that reads (durably: the store
/// commits with a full sync before this returns). A field that does not read, or whose value
/// cannot be what was meant and is not confirmed, keeps its stored value. `stored` is the
/// framing as last loaded.
pub fn save_framing_field(
    store: &mut Store,
    owner: FramingOwner,
    form: &mut FramingForm,
    stored: &Framing,
    units: UnitSystem,
    edit: FramingEdit,
) -> Result<FieldCheck> {
    form.set(edit.field, edit.value.clone());
    let reading = match owner {
        FramingOwner::Member { run: Some(run), .. } => form.with_run_kinds(run),
        _ => form.clone(),
    };
    let (mut framing, errors) = reading.merged_with(stored, units);
    let reads = !errors.iter().any(|e| e.field == edit.field);
    let question = (reads && !edit.confirmed)
        .then(|| {
            let in_force = match owner {
                FramingOwner::Member { run: Some(run), .. } => framing.over(run),
                _ => framing.clone(),
            };
            framing_question(edit.field, &edit.value, &in_force, units)
        })
        .flatten();
    if question.is_some() {
        keep_stored(&mut framing, stored, edit.field);
    }
    match owner {
        FramingOwner::Run { id, label } => store.update_run(id, label, &framing)?,
        FramingOwner::Member { id, label, .. } => store.update_member(id, label, &framing)?,
    }
    Ok(FieldCheck { errors, question })
}

/// A failed save, said under the fields.
fn not_saved(message: String) -> FieldError {
    FieldError {
        field: "save",
        message,
    }
}

/// One field of the inspection's header changed (its name as in `INSPECTION_FIELDS`): the
/// stored inspection read fresh, the field set, the header rewritten durably; or the
/// field's problem in words, nothing changed.
pub fn save_header_field(
    store: &mut Store,
    inspection_id: &str,
    name: &str,
    text: &str,
) -> std::result::Result<(), FieldError> {
    let current = store
        .load_inspection(inspection_id)
        .map_err(|e| not_saved(e.to_string()))?;
    let next = inspection_with(&current, name, text)?;
    store
        .update_header(&next)
        .map_err(|e| not_saved(e.to_string()))
}

/// One of an area's own fields changed (its name as in `AREA_FIELDS`), as the header.
pub fn save_area_field(
    store: &mut Store,
    area_id: &str,
    name: &str,
    text: &str,
) -> std::result::Result<(), FieldError> {
    let inspection = store
        .inspection_of(area_id)
        .and_then(|i| store.load_inspection(&i))
        .map_err(|e| not_saved(e.to_string()))?;
    let area = inspection
        .area(area_id)
        .ok_or_else(|| not_saved("this area is no longer in the store".into()))?;
    let units = inspection.units;
    let next = area_with(area, name, text, units)?;
    store
        .update_area(&next)
        .map_err(|e| not_saved(e.to_string()))
}

#[cfg(test)]
mod tests {
    use super::*;

    fn edit<'a>(field: &'a str, value: &str) -> FramingEdit<'a> {
        FramingEdit {
            field,
            value: value.into(),
            confirmed: false,
        }
    }

    fn demo_store(name: &str) -> (Store, std::path::PathBuf) {
        let dir =
            std::env::temp_dir().join(format!("undercroft-edits-{}-{name}", std::process::id()));
        let _ = std::fs::remove_dir_all(&dir);
        std::fs::create_dir_all(&dir).unwrap();
        let mut store = Store::open(&dir.join("store.sqlite")).unwrap();
        let demo =
            undercroft_engine::interchange::from_json(crate::startup::DEMO_INSPECTION).unwrap();
        store.import_inspection(&demo).unwrap();
        (store, dir)
    }

    /// The demo kitchen run's framing as stored.
    fn kitchen_framing(store: &Store, id: &str) -> Framing {
        let inspection = store.load_inspection(id).unwrap();
        inspection.run("run-kitchen").unwrap().1.framing.clone()
    }

    #[test]
    fn a_field_that_reads_is_saved_and_one_that_does_not_keeps_the_stored_value() {
        let (mut store, dir) = demo_store("run");
        let id = "0193a1c2-7d00-7000-8000-00000000d001";
        let stored = kitchen_framing(&store, id);
        let mut form = FramingForm::from_framing(&stored, UnitSystem::Imperial);
        let owner = FramingOwner::Run {
            id: "run-kitchen",
            label: "Kitchen",
        };
        let errors = save_framing_field(
            &mut store,
            owner,
            &mut form,
            &stored,
            UnitSystem::Imperial,
            edit("clear_span", "14' 0\""),
        )
        .unwrap()
        .errors;
        assert!(errors.is_empty(), "{errors:?}");
        let saved = store.load_inspection(id).unwrap();
        let (_, run) = saved.run("run-kitchen").unwrap();
        assert_eq!(run.label, "Kitchen");
        assert_eq!(run.framing.clear_span.map(|l| l.in_inches()), Some(168.0));

        let errors = save_framing_field(
            &mut store,
            owner,
            &mut form,
            &stored,
            UnitSystem::Imperial,
            edit("clear_span", "14' 0\"x"),
        )
        .unwrap()
        .errors;
        assert_eq!(errors.len(), 1);
        assert_eq!(errors[0].field, "clear_span");
        let saved = store.load_inspection(id).unwrap();
        assert_eq!(
            saved.run("run-kitchen").unwrap().1.framing.clear_span,
            stored.clear_span,
            "a field that does not read keeps the value stored when the screen opened"
        );
        std::fs::remove_dir_all(dir).ok();
    }

    #[test]
    fn a_joist_saves_only_what_differs() {
        let (mut store, dir) = demo_store("joist");
        let mut form = FramingForm::default();
        let owner = FramingOwner::Member {
            id: "joist-k7",
            label: "Joist 7",
            run: None,
        };
        save_framing_field(
            &mut store,
            owner,
            &mut form,
            &Framing::default(),
            UnitSystem::Imperial,
            edit("size", "2x12"),
        )
        .unwrap();
        let saved = store
            .load_inspection("0193a1c2-7d00-7000-8000-00000000d001")
            .unwrap();
        let joist = saved.member("joist-k7").unwrap();
        assert_eq!(
            joist.framing.size.map(|s| s.to_string()).as_deref(),
            Some("2x12")
        );
        assert_eq!(
            joist.framing.species, None,
            "the run's species is not copied in"
        );
        assert_eq!(joist.label, "Joist 7");
        std::fs::remove_dir_all(dir).ok();
    }

    #[test]
    fn a_span_that_cannot_be_meant_waits_for_an_answer_and_is_kept_when_confirmed() {
        let (mut store, dir) = demo_store("question");
        let id = "0193a1c2-7d00-7000-8000-00000000d001";
        let span_now = || store_span(&dir, id);
        let stored = kitchen_framing(&store, id);
        let mut form = FramingForm::from_framing(&stored, UnitSystem::Imperial);
        let owner = FramingOwner::Run {
            id: "run-kitchen",
            label: "Kitchen joists",
        };
        let check = save_framing_field(
            &mut store,
            owner,
            &mut form,
            &stored,
            UnitSystem::Imperial,
            edit("clear_span", "182'"),
        )
        .unwrap();
        let question = check.question.expect("182 ft is asked about");
        assert_eq!(question.field, "clear_span");
        assert_eq!(span_now(), stored.clear_span, "not saved before the answer");
        let kept = FramingEdit {
            confirmed: true,
            ..edit("clear_span", "182'")
        };
        let check = save_framing_field(
            &mut store,
            owner,
            &mut form,
            &stored,
            UnitSystem::Imperial,
            kept,
        )
        .unwrap();
        assert_eq!(check, FieldCheck::default());
        assert_eq!(span_now().map(|l| l.in_inches()), Some(182.0 * 12.0));
        std::fs::remove_dir_all(dir).ok();
    }

    /// The run's span as a fresh process would read it.
    fn store_span(dir: &std::path::Path, id: &str) -> Option<undercroft_engine::units::Length> {
        let store = Store::open(&dir.join("store.sqlite")).unwrap();
        store
            .load_inspection(id)
            .unwrap()
            .run("run-kitchen")
            .unwrap()
            .1
            .framing
            .clear_span
    }

    #[test]
    fn a_joist_takes_a_bearing_length_alone_bearing_on_what_its_run_bears_on() {
        let (mut store, dir) = demo_store("joist-bearing");
        let id = "0193a1c2-7d00-7000-8000-00000000d001";
        let inspection = store.load_inspection(id).unwrap();
        let run = inspection.run("run-kitchen").unwrap().1.framing.clone();
        let mut form = FramingForm::default();
        let owner = FramingOwner::Member {
            id: "joist-k7",
            label: "Joist 7",
            run: Some(&run),
        };
        let check = save_framing_field(
            &mut store,
            owner,
            &mut form,
            &Framing::default(),
            UnitSystem::Imperial,
            edit("bearing_length", "2"),
        )
        .unwrap();
        assert!(check.errors.is_empty(), "{:?}", check.errors);
        let saved = store.load_inspection(id).unwrap();
        let bearing = saved.member("joist-k7").unwrap().framing.bearing.unwrap();
        assert_eq!(bearing.length.map(|l| l.in_inches()), Some(2.0));
        assert_eq!(Some(bearing.on), run.bearing.map(|b| b.on));
        std::fs::remove_dir_all(dir).ok();
    }
}
