//! Numbers in reading order: findings as the first pages list them (then those set to no
//! action, area by area), and figures in the order they are first shown.

use super::model::Report;
use std::collections::HashMap;

/// Renumbers the findings and figures of a built report in reading order.
pub fn in_reading_order(r: &mut Report) {
    findings(r);
    figures(r);
}

fn findings(r: &mut Report) {
    let order: Vec<usize> = r
        .actions
        .groups
        .iter()
        .flat_map(|g| g.items.iter().map(|i| i.number))
        .chain(
            r.areas
                .iter()
                .flat_map(|a| a.findings.iter().map(|f| f.number)),
        )
        .collect();
    let map: HashMap<usize, usize> = order
        .iter()
        .enumerate()
        .map(|(new, old)| (*old, new + 1))
        .collect();
    let to = |n: &mut usize| *n = map.get(n).copied().unwrap_or(*n);
    for item in r.actions.groups.iter_mut().flat_map(|g| g.items.iter_mut()) {
        to(&mut item.number);
    }
    for row in r.areas.iter_mut().flat_map(|a| a.findings.iter_mut()) {
        to(&mut row.number);
    }
    for note in &mut r.professional {
        to(&mut note.number);
    }
    r.professional.sort_by_key(|n| n.number);
    for (_, numbers) in &mut r.assumptions {
        numbers.iter_mut().for_each(to);
        numbers.sort_unstable();
    }
}

fn figures(r: &mut Report) {
    // Shown: the first pages' photos, then per area its drawings and its own photos.
    let mut shown: Vec<usize> = r
        .actions
        .groups
        .iter()
        .flat_map(|g| g.items.iter())
        .flat_map(|i| i.photos.iter().map(|p| p.number))
        .collect();
    for a in &r.areas {
        shown.extend(a.girders.iter().map(|g| g.figure));
        shown.extend(a.views.iter().map(|v| v.figure));
        shown.extend(a.photos.iter().map(|p| p.number));
    }
    let map: HashMap<usize, usize> = shown
        .iter()
        .filter(|n| **n != 0)
        .enumerate()
        .map(|(new, old)| (*old, new + 1))
        .collect();
    let to = |n: &mut usize| {
        if *n != 0 {
            *n = map.get(n).copied().unwrap_or(*n)
        }
    };
    for item in r.actions.groups.iter_mut().flat_map(|g| g.items.iter_mut()) {
        item.photos.iter_mut().for_each(|p| to(&mut p.number));
        item.drawings.iter_mut().for_each(to);
        item.drawings.sort_unstable();
    }
    for a in &mut r.areas {
        for row in &mut a.findings {
            row.figures.iter_mut().for_each(to);
        }
        a.girders.iter_mut().for_each(|g| to(&mut g.figure));
        a.views.iter_mut().for_each(|v| to(&mut v.figure));
        a.photos.iter_mut().for_each(|p| to(&mut p.number));
    }
}
