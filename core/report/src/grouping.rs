//! Alike findings made one: the joists of a run (or the posts and spans of a girder line)
//! that share a rule and a status become one group with a count and its worst case, and the
//! groups are put in the order the reader needs them (priority, then rule, then severity).

use std::collections::HashMap;
use undercroft_engine::finding::{Basis, Finding, Status};
use undercroft_engine::model::FindingNote;
use undercroft_engine::model::Inspection;
use undercroft_engine::priority::{effective_priority, Priority};

/// What kind of part a finding's member is, for the count's noun.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
enum Part {
    Joist,
    Post,
    Other,
}

/// Where each member sits: the location findings of it are grouped under, and its kind.
pub struct Parents {
    parent: HashMap<String, (String, Part)>,
}

impl Parents {
    /// Joists are grouped under their run, posts under their girder line; every other
    /// member is its own group place.
    pub fn of(inspection: &Inspection) -> Parents {
        let mut parent = HashMap::new();
        for area in &inspection.areas {
            for run in &area.runs {
                let at = format!("{} > {}", area.name, run.label);
                for joist in &run.joists {
                    parent.insert(joist.id.clone(), (at.clone(), Part::Joist));
                }
            }
            for girder in &area.girders {
                let at = format!("{} > {}", area.name, girder.label);
                for post in &girder.posts {
                    parent.insert(post.id.clone(), (at.clone(), Part::Post));
                }
            }
        }
        Parents { parent }
    }

    fn place_of(&self, f: &Finding) -> (String, Part) {
        self.parent
            .get(&*f.place.member_id)
            .cloned()
            .unwrap_or_else(|| (f.place.location.to_string(), Part::Other))
    }
}

/// Findings of one rule and status at one place, worst first.
#[derive(Debug, Clone)]
pub struct Group<'a> {
    pub findings: Vec<&'a Finding>,
    pub priority: Priority,
    /// The run, girder line or member the group is at ("Crawlspace > Kitchen joists").
    pub place: String,
    parts: Vec<Part>,
}

impl<'a> Group<'a> {
    pub fn worst(&self) -> &'a Finding {
        self.findings[0]
    }

    /// "3 joists", "2 posts", "2 places"; None for a single finding.
    pub fn count_text(&self) -> Option<String> {
        let n = self.findings.len();
        if n < 2 {
            return None;
        }
        let noun = if self.parts.iter().all(|p| *p == Part::Joist) {
            "joists"
        } else if self.parts.iter().all(|p| *p == Part::Post) {
            "posts"
        } else {
            "places"
        };
        Some(format!("{n} {noun}"))
    }

    pub fn status(&self) -> Status {
        self.worst().status
    }
}

/// How the rules are ordered among themselves: observed conditions first, then code limits,
/// then engineering references, then the engine's own order of rules.
fn rule_rank(f: &Finding) -> (u8, usize) {
    let basis = match f.basis {
        Basis::Observed => 0,
        Basis::CodeLimit => 1,
        Basis::Reference => 2,
    };
    let order = undercroft_engine::rules::all_rule_infos()
        .position(|r| r.id == f.rule_id())
        .unwrap_or(usize::MAX);
    (basis, order)
}

/// Most pressing first: priority, then rule (observed conditions first), then status, then
/// the use of the limit within the rule (never percent against percent across unlike rules).
pub fn order(a: &Group, b: &Group) -> std::cmp::Ordering {
    a.priority
        .cmp(&b.priority)
        .then(rule_rank(a.worst()).cmp(&rule_rank(b.worst())))
        .then(a.status().cmp(&b.status()))
        .then(
            b.worst()
                .ratio()
                .unwrap_or(0.0)
                .total_cmp(&a.worst().ratio().unwrap_or(0.0)),
        )
}

/// What the grouping gives: the groups, and the findings set aside by the inspector.
pub struct Grouped<'a> {
    pub groups: Vec<Group<'a>>,
    pub set_aside: Vec<(&'a Finding, String)>,
}

/// Groups the findings of an inspection (repair options left out: they are not checks).
pub fn group<'a>(
    findings: &'a [Finding],
    parents: &Parents,
    notes: &HashMap<&str, &FindingNote>,
) -> Grouped<'a> {
    let mut groups: Vec<Group<'a>> = Vec::new();
    let mut index: HashMap<(String, &'static str, Status, Basis, Priority), usize> = HashMap::new();
    let mut set_aside = Vec::new();
    for f in findings {
        if f.rule_id() == "span-options" {
            continue;
        }
        let note = notes.get(f.key().as_str());
        if let Some(reason) = note.and_then(|n| n.not_applicable_reason.clone()) {
            set_aside.push((f, reason));
            continue;
        }
        let priority = effective_priority(f, note.and_then(|n| n.priority));
        let (place, part) = parents.place_of(f);
        // A finding with its own note or recommendation stays on its own card.
        let own = note.is_some_and(|n| !n.note.is_empty() || n.recommendation.is_some());
        let key = (
            if own { f.key() } else { place.clone() },
            f.rule_id(),
            f.status,
            f.basis,
            priority,
        );
        match index.get(&key) {
            Some(&g) => {
                groups[g].findings.push(f);
                groups[g].parts.push(part);
            }
            None => {
                index.insert(key, groups.len());
                groups.push(Group {
                    findings: vec![f],
                    priority,
                    place,
                    parts: vec![part],
                });
            }
        }
    }
    for g in &mut groups {
        // Worst first; equal ones keep the inspection's order.
        g.findings.sort_by(|a, b| {
            b.ratio()
                .unwrap_or(0.0)
                .total_cmp(&a.ratio().unwrap_or(0.0))
        });
    }
    groups.sort_by(order);
    Grouped { groups, set_aside }
}

#[cfg(test)]
mod tests {
    use super::*;
    use undercroft_engine::units::Length;

    fn inspection() -> Inspection {
        undercroft_engine::interchange::demo()
    }

    #[test]
    fn five_joists_over_span_are_one_group_with_the_worst_first() {
        let mut i = inspection();
        // Five joists of the dining room run, each with its own (longer) span: each is
        // checked on its own, and the five over-spans read as one.
        let run = &mut i.areas[0].runs[1];
        let template = run.joists[0].clone();
        run.joists.clear();
        for (n, span) in [16.0, 16.5, 17.0, 16.2, 16.8].into_iter().enumerate() {
            let mut j = template.clone();
            j.id = format!("walk-{n}");
            j.label = format!("Joist {}", n + 1);
            j.observations.clear();
            j.framing.clear_span = Some(Length::feet(span));
            run.joists.push(j);
        }
        let e = undercroft_engine::evaluate(&i);
        let g = group(&e.findings, &Parents::of(&i), &HashMap::new());
        let spans: Vec<&Group> = g
            .groups
            .iter()
            .filter(|g| g.worst().rule_id() == "joist-span" && g.place.contains("Dining"))
            .filter(|g| g.findings.len() > 1)
            .collect();
        assert_eq!(spans.len(), 1, "one group of joists over span");
        assert_eq!(spans[0].count_text().as_deref(), Some("5 joists"));
        assert_eq!(&*spans[0].worst().place.member_id, "walk-2");
        // Alike within checks merge too; nothing is lost.
        let total: usize = g.groups.iter().map(|g| g.findings.len()).sum();
        let options = e
            .findings
            .iter()
            .filter(|f| f.rule_id() == "span-options")
            .count();
        assert_eq!(total + options, e.findings.len());
    }

    #[test]
    fn priority_comes_before_percent_across_rules() {
        let i = inspection();
        let e = undercroft_engine::evaluate(&i);
        let g = group(&e.findings, &Parents::of(&i), &HashMap::new());
        let first = g.groups.first().unwrap();
        assert_eq!(first.priority, Priority::EngineerFirst);
        assert_eq!(
            first.worst().basis,
            Basis::Observed,
            "observed damage leads"
        );
        for pair in g.groups.windows(2) {
            assert!(pair[0].priority <= pair[1].priority);
        }
    }
}
