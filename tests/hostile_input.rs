//! Hostile inspection files: the demo with values swapped for garbage, huge, empty, negative
//! and non-Latin ones. Reading either refuses the file with a path, or the engine evaluates
//! it and every finding can be worded and written as JSON. Nothing panics.

use proptest::prelude::*;
use serde_json::Value;
use undercroft_engine::evaluate;
use undercroft_engine::interchange::from_json;
use undercroft_tests::demo_path;

fn demo_value() -> Value {
    serde_json::from_slice(&std::fs::read(demo_path()).unwrap()).unwrap()
}

/// Every leaf of the JSON tree, as a path of keys and indexes.
fn leaves(v: &Value, path: &mut Vec<Step>, out: &mut Vec<Vec<Step>>) {
    match v {
        Value::Object(map) => {
            for (k, child) in map {
                path.push(Step::Key(k.clone()));
                leaves(child, path, out);
                path.pop();
            }
        }
        Value::Array(items) => {
            for (i, child) in items.iter().enumerate() {
                path.push(Step::Index(i));
                leaves(child, path, out);
                path.pop();
            }
        }
        _ => out.push(path.clone()),
    }
}

#[derive(Clone, Debug)]
enum Step {
    Key(String),
    Index(usize),
}

fn at<'v>(v: &'v mut Value, path: &[Step]) -> &'v mut Value {
    path.iter().fold(v, |v, step| match step {
        Step::Key(k) => &mut v[k.as_str()],
        Step::Index(i) => &mut v[*i],
    })
}

fn garbage() -> Vec<Value> {
    vec![
        Value::from(0),
        Value::from(-1),
        Value::from(1e308),
        Value::from(12_000),
        Value::from(0.0001),
        Value::from(u64::MAX),
        Value::from(""),
        Value::from("NaN"),
        Value::from("13''7"),
        Value::from("-4"),
        Value::from("1e309"),
        Value::from("0\""),
        Value::from("1000 ft"),
        Value::from("李 Nguyễn Zoë"),
        Value::from("x".repeat(20_000)),
        Value::Null,
        Value::Bool(true),
        Value::Array(vec![]),
        serde_json::json!({}),
    ]
}

fn exercise(text: &str) {
    match from_json(text) {
        Err(e) => assert!(!e.to_string().is_empty()),
        Ok(inspection) => {
            let evaluation = evaluate(&inspection);
            for f in &evaluation.findings {
                let _ = (
                    f.summary(),
                    f.assumptions(),
                    f.recommendation(),
                    f.options(),
                    f.citation(),
                );
            }
            serde_json::to_string(&evaluation).expect("findings serialize");
        }
    }
}

proptest! {
    #![proptest_config(ProptestConfig { cases: 400, ..ProptestConfig::default() })]

    #[test]
    fn swapped_values_never_panic(picks in prop::collection::vec((any::<prop::sample::Index>(), any::<prop::sample::Index>()), 1..6)) {
        let mut v = demo_value();
        let mut paths = Vec::new();
        leaves(&v, &mut Vec::new(), &mut paths);
        let pool = garbage();
        for (leaf, value) in picks {
            let path = &paths[leaf.index(paths.len())];
            *at(&mut v, path) = pool[value.index(pool.len())].clone();
        }
        exercise(&v.to_string());
    }

    #[test]
    fn truncated_files_never_panic(cut in 0usize..20_000) {
        let text = std::fs::read_to_string(demo_path()).unwrap();
        let mut end = cut.min(text.len());
        while !text.is_char_boundary(end) {
            end -= 1;
        }
        exercise(&text[..end]);
    }
}

#[test]
fn zero_and_extreme_measurements_evaluate() {
    // Every length leaf set to 0, then to the largest accepted length.
    for extreme in [Value::from(0), Value::from(12_000)] {
        let mut v = demo_value();
        let mut paths = Vec::new();
        leaves(&v, &mut Vec::new(), &mut paths);
        for path in &paths {
            let slot = at(&mut v, path);
            if slot
                .as_str()
                .is_some_and(|s| s.ends_with('"') || s.ends_with("in") || s.contains('\''))
            {
                *slot = extreme.clone();
            }
        }
        exercise(&v.to_string());
    }
}
