//! An inspection with every id made new (for importing a copy beside the original): the
//! inspection, its areas, runs, joists, members, observations, girder lines, posts and photos,
//! with photo owners, run-to-girder links and finding-note keys following their new ids.

use super::Inspection;
use std::collections::HashMap;
use std::sync::Arc;

/// Every id this inspection holds, the inspection's own first.
pub fn ids_of(i: &Inspection) -> Vec<&str> {
    let mut out = vec![i.id.as_str()];
    for area in &i.areas {
        out.push(&area.id);
        for run in &area.runs {
            out.push(&run.id);
            out.extend(run.observations.iter().map(|o| &*o.id));
            for joist in &run.joists {
                out.push(&joist.id);
                out.extend(joist.observations.iter().map(|o| &*o.id));
            }
        }
        for member in &area.members {
            out.push(&member.id);
            out.extend(member.observations.iter().map(|o| &*o.id));
        }
        for girder in &area.girders {
            out.push(&girder.id);
            out.extend(girder.posts.iter().map(|p| p.id.as_str()));
        }
    }
    out.extend(i.photos.iter().map(|p| p.id.as_str()));
    out
}

/// The same inspection with new ids from `new_id`, and the map from old ids to new.
pub fn renumbered(
    i: &Inspection,
    mut new_id: impl FnMut() -> String,
) -> (Inspection, HashMap<String, String>) {
    let map: HashMap<String, String> = ids_of(i)
        .into_iter()
        .map(|id| (id.to_string(), new_id()))
        .collect();
    let to = |id: &str| map.get(id).cloned().unwrap_or_else(|| id.to_string());
    let mut out = i.clone();
    out.id = to(&i.id);
    for area in &mut out.areas {
        area.id = to(&area.id);
        for run in &mut area.runs {
            run.id = to(&run.id);
            for o in &mut run.observations {
                o.id = Arc::from(to(&o.id).as_str());
            }
            for joist in &mut run.joists {
                joist.id = to(&joist.id);
                for o in &mut joist.observations {
                    o.id = Arc::from(to(&o.id).as_str());
                }
            }
        }
        for member in &mut area.members {
            member.id = to(&member.id);
            for o in &mut member.observations {
                o.id = Arc::from(to(&o.id).as_str());
            }
        }
        for run in &mut area.runs {
            for g in &mut run.bears_on {
                *g = to(g);
            }
        }
        for girder in &mut area.girders {
            girder.id = to(&girder.id);
            for post in &mut girder.posts {
                post.id = to(&post.id);
            }
        }
    }
    for photo in &mut out.photos {
        photo.id = to(&photo.id);
        photo.attached_to = to(&photo.attached_to);
    }
    (out, map)
}

/// A finding-note key (rule id / member id / observation id) with its ids renumbered.
pub fn renumbered_key(key: &str, map: &HashMap<String, String>) -> String {
    key.split('/')
        .enumerate()
        .map(|(n, part)| match (n, map.get(part)) {
            (0, _) | (_, None) => part.to_string(),
            (_, Some(new)) => new.clone(),
        })
        .collect::<Vec<_>>()
        .join("/")
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn every_id_is_new_and_references_follow() {
        let demo: Inspection = crate::interchange::demo();
        let mut n = 0;
        let (copy, map) = renumbered(&demo, || {
            n += 1;
            format!("new-{n}")
        });
        let old: Vec<&str> = ids_of(&demo);
        let new: Vec<&str> = ids_of(&copy);
        assert_eq!(old.len(), new.len());
        assert!(new.iter().all(|id| id.starts_with("new-")), "{new:?}");
        assert_eq!(
            renumbered_key("sawn-notch/joist-k7/obs-k7-notch", &map),
            format!("sawn-notch/{}/{}", map["joist-k7"], map["obs-k7-notch"])
        );
        // The copy checks the same as the original.
        assert_eq!(
            crate::evaluate(&copy).findings.len(),
            crate::evaluate(&demo).findings.len()
        );
    }
}
