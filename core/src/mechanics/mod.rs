//! Wood mechanics (NDS allowable stress design): a simply supported joist under uniform
//! load, and a solid sawn post in axial compression.

mod column;
mod span;

pub use column::{
    column_stability_factor, post_capacity, size_factor_fc, PostCapacity, PostInput,
    MAX_SLENDERNESS,
};
pub use span::{allowable_span, Governing, SpanInput, SpanResult};
