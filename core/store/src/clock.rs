//! The current time as an RFC 3339 UTC timestamp, without a date library.

use std::time::{SystemTime, UNIX_EPOCH};

/// "2026-12-01T23:40:12.123456Z": microseconds, so that edits a moment apart sort in order.
pub fn now_utc() -> String {
    let since = SystemTime::now()
        .duration_since(UNIX_EPOCH)
        .unwrap_or_default();
    format_utc(since.as_secs() as i64, since.subsec_micros())
}

/// Formats seconds and microseconds since 1970 as a UTC timestamp. Days to civil date: H. Hinnant,
/// "chrono-Compatible Low-Level Date Algorithms" (civil_from_days).
pub fn format_utc(secs: i64, micros: u32) -> String {
    let days = secs.div_euclid(86_400);
    let rem = secs.rem_euclid(86_400);
    let z = days + 719_468;
    let era = z.div_euclid(146_097);
    let doe = z - era * 146_097;
    let yoe = (doe - doe / 1460 + doe / 36_524 - doe / 146_096) / 365;
    let doy = doe - (365 * yoe + yoe / 4 - yoe / 100);
    let mp = (5 * doy + 2) / 153;
    let day = doy - (153 * mp + 2) / 5 + 1;
    let month = if mp < 10 { mp + 3 } else { mp - 9 };
    let year = yoe + era * 400 + i64::from(month <= 2);
    format!(
        "{year:04}-{month:02}-{day:02}T{:02}:{:02}:{:02}.{micros:06}Z",
        rem / 3600,
        rem % 3600 / 60,
        rem % 60
    )
}

/// A stored UTC timestamp in the device's local time, with its offset so it is never
/// ambiguous: "2026-12-03 09:05 (UTC-05:00)". Text that is not a timestamp is shown as is.
pub fn local_time(utc: &str) -> String {
    let offset = chrono::DateTime::parse_from_rfc3339(utc)
        .map(|t| *t.with_timezone(&chrono::Local).offset())
        .ok();
    match offset {
        Some(o) => in_offset(utc, chrono::Offset::fix(&o)),
        None => utc.to_string(),
    }
}

/// A stored UTC timestamp at a fixed offset from UTC (`local_time` with the device's).
pub fn in_offset(utc: &str, offset: chrono::FixedOffset) -> String {
    match chrono::DateTime::parse_from_rfc3339(utc) {
        Ok(t) => t
            .with_timezone(&offset)
            .format("%Y-%m-%d %H:%M (UTC%:z)")
            .to_string(),
        Err(_) => utc.to_string(),
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    // Source: a UTC time at a fixed offset is the same instant written with the clock of that
    // zone: 2026-12-03T14:05Z is 09:05 at UTC-05:00 and 23:35 at UTC+09:30 (ISO 8601).
    #[test]
    fn a_delivery_time_is_shown_at_the_devices_offset() {
        let east = chrono::FixedOffset::east_opt(9 * 3600 + 1800).unwrap();
        let west = chrono::FixedOffset::west_opt(5 * 3600).unwrap();
        let t = "2026-12-03T14:05:12.123456Z";
        assert_eq!(in_offset(t, west), "2026-12-03 09:05 (UTC-05:00)");
        assert_eq!(in_offset(t, east), "2026-12-03 23:35 (UTC+09:30)");
        assert_eq!(in_offset("not a time", west), "not a time");
        assert!(local_time(t).starts_with("2026-12-0"), "{}", local_time(t));
    }

    // Source: POSIX time; 1 000 000 000 s = 2001-09-09T01:46:40Z; 951 782 400 = 2000-02-29
    // (a leap day); 0 = 1970-01-01 (`date -u -d @N`).
    #[test]
    fn known_instants() {
        assert_eq!(format_utc(0, 0), "1970-01-01T00:00:00.000000Z");
        assert_eq!(format_utc(1_000_000_000, 5), "2001-09-09T01:46:40.000005Z");
        assert_eq!(format_utc(951_782_400, 0), "2000-02-29T00:00:00.000000Z");
        assert_eq!(format_utc(1_796_083_200, 0), "2026-12-01T00:00:00.000000Z");
    }
}
