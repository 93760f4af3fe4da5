//! Wood mechanics (NDS allowable stress design): a simply supported joist under uniform
//! load, a beam of one or more plies under a line load, and a solid sawn post in axial
//! compression.

mod beam;
mod column;
mod span;

pub use beam::{check_beam, reactions, BeamChecks, BeamInput, IncisingFactors, INCISED};

pub use column::{
    column_stability_factor, post_capacity, size_factor_fc, PostCapacity, PostInput,
    MAX_SLENDERNESS,
};
pub use span::{allowable_span, Governing, SpanInput, SpanResult};
