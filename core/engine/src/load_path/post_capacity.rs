//! A wood post's capacity in compression by NDS column stability (NDS 2018 3.6, 3.7: le/d
//! held to 50, the factor Cp), against the load the girder spans on each side bring to it.

use super::context::{GirderContext, Support};
use crate::finding::{
    Basis, Bound, Check, Finding, FindingBuilder, Missing, RuleInfo, Status, Value, Wording,
};
use crate::lumber::LoadDuration;
use crate::mechanics::{post_capacity, PostCapacity, PostInput, MAX_SLENDERNESS};
use crate::model::{Post, PostMaterial};
use crate::rules::shared::len;
use crate::units::UnitSystem;

pub const RULE: RuleInfo = RuleInfo {
    id: "post-capacity",
    title: "Post capacity (column stability)",
    code_section: None,
    other_source: Some("NDS 2018 3.6, 3.7 (column stability, le/d at most 50)"),
    basis: Basis::Reference,
};

#[derive(Debug, Clone, PartialEq)]
pub enum PostDetail {
    Computed {
        size: String,
        load_lb: f64,
        capacity: Box<PostCapacity>,
        wet: bool,
    },
    TooSlender {
        size: String,
        slenderness: f64,
    },
    Steel,
    Masonry,
}

pub fn check(g: &GirderContext, out: &mut Vec<Finding>) {
    for s in g.supports.iter().filter(|s| s.post.is_some()) {
        let post = s.post.expect("filtered to posts");
        out.push(one(g, s, post));
    }
}

fn one(g: &GirderContext, s: &Support, post: &Post) -> Finding {
    let b = FindingBuilder::at(&RULE, g.post_place(post), &g.common);
    match post.material {
        PostMaterial::Steel => {
            return b.not_checked(
                "a steel column's capacity is the maker's rating, not computed here",
                PostDetail::Steel,
            )
        }
        PostMaterial::Masonry => {
            return b.not_checked(
                "a masonry pier's capacity is not computed here",
                PostDetail::Masonry,
            )
        }
        PostMaterial::Wood => {}
    }
    let mut missing = Vec::new();
    if post.species.is_none() {
        missing.push("species");
    }
    if post.grade.is_none() {
        missing.push("grade");
    }
    if post.size.is_none() {
        missing.push("size");
    }
    if post.height.is_none() {
        missing.push("height");
    }
    let (Some(species), Some(grade), Some(size), Some(height)) =
        (post.species, post.grade, post.size, post.height)
    else {
        return b.not_checked(
            format!("{} not entered", missing.join(", ")),
            Missing("Record the post's species, grade, size and height."),
        );
    };
    if size.thickness > 4 {
        return b.not_checked(
            format!("{size} is a timber (5 in and thicker), whose design values (NDS Supplement Table 4D) are not carried here"),
            Missing("Compare with a timber column table or refer to a licensed professional."),
        );
    }
    let input = PostInput {
        species,
        grade: grade.grade_for_design(),
        size,
        unbraced: height,
        wet_service: g.wet || post_wet(post),
        duration: LoadDuration::TenYears,
    };
    let section = size.dressed_section();
    let d = section.thickness.in_inches().min(section.depth.in_inches());
    let slenderness = height.in_inches() / d;
    let u = g.common.units;
    if slenderness > MAX_SLENDERNESS {
        return b
            .check(Check::numeric(
                "slenderness le/d",
                Value::Number(slenderness),
                Value::Number(MAX_SLENDERNESS),
                Bound::AtMost,
                u,
            ))
            .finish(PostDetail::TooSlender {
                size: size.to_string(),
                slenderness,
            });
    }
    let Some(capacity) = post_capacity(&input) else {
        return b.not_checked(
            format!("no design values for {} {grade} {size}", species.name()),
            Missing("Check the post's species, grade and size."),
        );
    };
    let mut b = b.check(Check::numeric(
        "slenderness le/d",
        Value::Number(slenderness),
        Value::Number(MAX_SLENDERNESS),
        Bound::AtMost,
        u,
    ));
    b = match s.reaction_lb {
        Some(load) => b.check(Check::numeric(
            "load on the post",
            Value::Pounds(load),
            Value::Pounds(capacity.capacity_lb),
            Bound::AtMost,
            u,
        )),
        None => b.check(Check::skipped(
            "load on the post",
            "column capacity",
            g.load
                .as_ref()
                .err()
                .cloned()
                .unwrap_or_else(|| "the girder's length is not entered".into()),
        )),
    };
    b.finish(PostDetail::Computed {
        size: format!("{size} {} {grade}, {} tall", species.name(), len(u, height)),
        load_lb: s.reaction_lb.unwrap_or(0.0),
        capacity: Box::new(capacity),
        wet: input.wet_service,
    })
}

/// A post standing on soil is wet whatever the meter says.
fn post_wet(post: &Post) -> bool {
    post.stands_on == Some(crate::model::PostBase::Soil)
}

impl Wording for PostDetail {
    fn summary(&self, u: UnitSystem) -> String {
        match self {
            PostDetail::Computed {
                size,
                load_lb,
                capacity,
                ..
            } => format!(
                "{size}: carries {} against a capacity of {}",
                Value::Pounds(*load_lb).text(u),
                Value::Pounds(capacity.capacity_lb).text(u)
            ),
            PostDetail::TooSlender { size, slenderness } => format!(
                "{size}: slenderness {slenderness:.1} is over the 50 NDS allows for a solid column"
            ),
            PostDetail::Steel | PostDetail::Masonry => String::new(),
        }
    }

    fn assumptions(&self, _u: UnitSystem) -> Vec<String> {
        let PostDetail::Computed {
            capacity: c, wet, ..
        } = self
        else {
            return vec![];
        };
        vec![
            format!(
                "Pinned at both ends (Ke 1.0), le/d {:.1}; Fc* {:.0} psi (Fc x CD 1.0 x CF{}), FcE {:.0} psi, Cp {:.3}, Fc' {:.0} psi over {:.2} sq in",
                c.slenderness,
                c.fc_star,
                if *wet { " x CM" } else { "" },
                c.fc_e,
                c.cp,
                c.fc_adjusted,
                c.area
            ),
            "Load from the girder spans on each side, each taken as simply supported".into(),
        ]
    }

    fn recommendation(&self, status: Status, _u: UnitSystem) -> String {
        match (self, status) {
            (PostDetail::Steel, _) => "Read the column's label for its rated load and compare it with the load it carries, or refer to a licensed professional.".into(),
            (PostDetail::Masonry, _) => "Look for cracks, missing mortar or lean in the pier; refer any to a licensed professional.".into(),
            (_, Status::OverLimit) => "The post carries more than NDS column stability allows (an engineering reference). Refer to a licensed professional; a larger post or one more post under the girder are the usual remedies.".into(),
            (_, Status::NearLimit) => "The post is close to its capacity; avoid added load above without evaluation.".into(),
            _ => "Within the post's capacity; no action for the post's size.".into(),
        }
    }
}
