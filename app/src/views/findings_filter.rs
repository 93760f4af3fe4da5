//! Which findings the findings screen shows: a status filter in the inspector's words, an
//! area, and the checks within their limits folded away until asked for.

use undercroft_engine::Status;

/// The status filter's choices.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum StatusFilter {
    /// Everything not within its limit.
    NotWithin,
    Over,
    Observed,
    Near,
    NotChecked,
    Within,
}

impl StatusFilter {
    pub const ALL: [StatusFilter; 6] = [
        StatusFilter::NotWithin,
        StatusFilter::Over,
        StatusFilter::Observed,
        StatusFilter::Near,
        StatusFilter::NotChecked,
        StatusFilter::Within,
    ];

    pub fn key(self) -> &'static str {
        match self {
            StatusFilter::NotWithin => "not-within",
            StatusFilter::Over => "over",
            StatusFilter::Observed => "observed",
            StatusFilter::Near => "near",
            StatusFilter::NotChecked => "not-checked",
            StatusFilter::Within => "within",
        }
    }

    pub fn label(self) -> &'static str {
        match self {
            StatusFilter::NotWithin => "Everything not within its limit",
            StatusFilter::Over => "Over a limit",
            StatusFilter::Observed => "Seen, to be evaluated",
            StatusFilter::Near => "Near a limit",
            StatusFilter::NotChecked => "Not (fully) checked",
            StatusFilter::Within => "Within its limit",
        }
    }

    pub fn parse(key: &str) -> StatusFilter {
        StatusFilter::ALL
            .into_iter()
            .find(|f| f.key() == key)
            .unwrap_or(StatusFilter::NotWithin)
    }

    pub fn admits(self, status: Status) -> bool {
        match self {
            StatusFilter::NotWithin => status != Status::Within,
            StatusFilter::Over => status == Status::OverLimit,
            StatusFilter::Observed => status == Status::ToEvaluate,
            StatusFilter::Near => status == Status::NearLimit,
            StatusFilter::NotChecked => {
                matches!(status, Status::Incomplete | Status::NotChecked)
            }
            StatusFilter::Within => status == Status::Within,
        }
    }
}

/// What is shown: the rows the filter and area admit, and how many within ones are folded.
pub fn shown<'r, R>(
    rows: &'r [R],
    status_of: impl Fn(&R) -> (Status, &str),
    filter: StatusFilter,
    area: Option<&str>,
) -> Vec<&'r R> {
    rows.iter()
        .filter(|r| {
            let (status, area_id) = status_of(r);
            filter.admits(status) && area.is_none_or(|a| a == area_id)
        })
        .collect()
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn filters_by_status_and_area() {
        let rows = [
            (Status::OverLimit, "a"),
            (Status::Within, "a"),
            (Status::ToEvaluate, "b"),
            (Status::NotChecked, "b"),
            (Status::Incomplete, "a"),
        ];
        fn of<'a>(r: &'a (Status, &'static str)) -> (Status, &'a str) {
            (r.0, r.1)
        }
        assert_eq!(shown(&rows, of, StatusFilter::NotWithin, None).len(), 4);
        assert_eq!(shown(&rows, of, StatusFilter::Within, None).len(), 1);
        assert_eq!(shown(&rows, of, StatusFilter::NotChecked, None).len(), 2);
        assert_eq!(
            shown(&rows, of, StatusFilter::NotWithin, Some("b")).len(),
            2
        );
        assert_eq!(shown(&rows, of, StatusFilter::Over, Some("b")).len(), 0);
        for f in StatusFilter::ALL {
            assert_eq!(StatusFilter::parse(f.key()), f);
        }
        assert_eq!(StatusFilter::parse("garbage"), StatusFilter::NotWithin);
    }
}
