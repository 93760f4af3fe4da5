//! What a framing field change does, as one plain function the run and member screens call
//! (and the field-to-save benchmark measures): the form updated, what reads saved at once,
//! a field that does not read yet keeping its stored value, and each field's problem returned.

use undercroft_core::forms::{FieldError, FramingForm};
use undercroft_core::model::Framing;
use undercroft_core::store::{Result, Store};
use undercroft_core::units::UnitSystem;

/// Whose framing is being typed.
#[derive(Debug, Clone, Copy)]
pub enum FramingOwner<'a> {
    Run {
        id: &'a str,
        label: &'a str,
    },
    /// A joist of a run or a single member.
    Member {
        id: &'a str,
        label: &'a str,
    },
}

/// Sets `field` to `value` in `form` and saves the framing that reads (durably: the store
/// commits with a full sync before this returns). `stored` is the framing as last loaded.
pub fn save_framing_field(
    store: &mut Store,
    owner: FramingOwner,
    form: &mut FramingForm,
    stored: &Framing,
    units: UnitSystem,
    field: &str,
    value: String,
) -> Result<Vec<FieldError>> {
    form.set(field, value);
    let (framing, errors) = form.merged_with(stored, units);
    match owner {
        FramingOwner::Run { id, label } => store.update_run(id, label, &framing)?,
        FramingOwner::Member { id, label } => store.update_member(id, label, &framing)?,
    }
    Ok(errors)
}

#[cfg(test)]
mod tests {
    use super::*;

    fn demo_store(name: &str) -> (Store, std::path::PathBuf) {
        let dir =
            std::env::temp_dir().join(format!("undercroft-edits-{}-{name}", std::process::id()));
        let _ = std::fs::remove_dir_all(&dir);
        std::fs::create_dir_all(&dir).unwrap();
        let mut store = Store::open(&dir.join("store.sqlite")).unwrap();
        let demo =
            undercroft_core::interchange::from_json(crate::startup::DEMO_INSPECTION).unwrap();
        store.import_inspection(&demo).unwrap();
        (store, dir)
    }

    #[test]
    fn a_field_that_reads_is_saved_and_one_that_does_not_keeps_the_stored_value() {
        let (mut store, dir) = demo_store("run");
        let id = "0193a1c2-7d00-7000-8000-00000000d001";
        let stored = store
            .load_inspection(id)
            .unwrap()
            .run("run-kitchen")
            .unwrap()
            .1
            .framing
            .clone();
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
            "clear_span",
            "14' 0\"".into(),
        )
        .unwrap();
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
            "clear_span",
            "14' 0\"x".into(),
        )
        .unwrap();
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
        };
        save_framing_field(
            &mut store,
            owner,
            &mut form,
            &Framing::default(),
            UnitSystem::Imperial,
            "size",
            "2x12".into(),
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
}
