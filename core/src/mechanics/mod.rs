//! Wood mechanics of a simply supported joist under uniform load (NDS allowable stress design).

mod span;

pub use span::{allowable_span, Governing, SpanInput, SpanResult};
