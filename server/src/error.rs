//! Every refusal the server answers with: an HTTP status and the reason in words, as JSON
//! for the API (`{"error": ...}`); the office page shows the same words.

use axum::http::StatusCode;
use axum::response::{IntoResponse, Response};
use axum::Json;

#[derive(Debug, thiserror::Error)]
pub enum ApiError {
    #[error("sign in with a token issued by the office")]
    SignedOut,
    #[error("{0}")]
    Forbidden(String),
    #[error("{0}")]
    NotFound(String),
    #[error("{0}")]
    BadRequest(String),
    #[error("{0}")]
    Unprocessable(String),
    #[error("{0}")]
    TooLarge(String),
    #[error("{message}")]
    MissingFiles {
        message: String,
        missing: Vec<String>,
    },
    #[error("the office database cannot be reached right now; try again shortly")]
    Unavailable(String),
    #[error("the office server failed: {0}")]
    Internal(String),
}

impl ApiError {
    pub fn status(&self) -> StatusCode {
        match self {
            ApiError::SignedOut => StatusCode::UNAUTHORIZED,
            ApiError::Forbidden(_) => StatusCode::FORBIDDEN,
            ApiError::NotFound(_) => StatusCode::NOT_FOUND,
            ApiError::BadRequest(_) => StatusCode::BAD_REQUEST,
            ApiError::Unprocessable(_) => StatusCode::UNPROCESSABLE_ENTITY,
            ApiError::TooLarge(_) => StatusCode::PAYLOAD_TOO_LARGE,
            ApiError::MissingFiles { .. } => StatusCode::CONFLICT,
            ApiError::Unavailable(_) => StatusCode::SERVICE_UNAVAILABLE,
            ApiError::Internal(_) => StatusCode::INTERNAL_SERVER_ERROR,
        }
    }
}

impl From<tokio_postgres::Error> for ApiError {
    fn from(e: tokio_postgres::Error) -> Self {
        // A closed connection, a broken socket or a database shutting down is the database's
        // absence, not a fault of the request: the device tries again.
        let io = std::error::Error::source(&e).is_some_and(|s| s.is::<std::io::Error>());
        let shutting_down = e.as_db_error().is_some_and(|d| {
            let code = d.code().code();
            code.starts_with("57") || code.starts_with("08")
        });
        if e.is_closed() || io || shutting_down {
            ApiError::Unavailable(e.to_string())
        } else {
            ApiError::Internal(e.to_string())
        }
    }
}

impl From<deadpool_postgres::PoolError> for ApiError {
    fn from(e: deadpool_postgres::PoolError) -> Self {
        ApiError::Unavailable(e.to_string())
    }
}

impl From<std::io::Error> for ApiError {
    fn from(e: std::io::Error) -> Self {
        ApiError::Internal(e.to_string())
    }
}

impl IntoResponse for ApiError {
    fn into_response(self) -> Response {
        let mut body = serde_json::json!({ "error": self.to_string() });
        if let ApiError::MissingFiles { missing, .. } = &self {
            body["missing"] = serde_json::json!(missing);
        }
        if let ApiError::Internal(detail) | ApiError::Unavailable(detail) = &self {
            eprintln!("undercroft-server: {detail}");
        }
        (self.status(), Json(body)).into_response()
    }
}
