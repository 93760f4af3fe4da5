//! The date of a visit, as the interchange format and the store keep it: `YYYY-MM-DD`, a real
//! day of the Gregorian calendar.

/// Checks a visit date: four-digit year (1900 to 2200), month, and a day the month has.
pub fn check_date(text: &str) -> Result<(), String> {
    let refuse = || format!("\"{text}\" is not a date written YYYY-MM-DD (for example 2026-12-02)");
    let parts: Vec<&str> = text.split('-').collect();
    let [y, m, d] = parts.as_slice() else {
        return Err(refuse());
    };
    if y.len() != 4
        || m.len() != 2
        || d.len() != 2
        || !text.bytes().all(|b| b.is_ascii_digit() || b == b'-')
    {
        return Err(refuse());
    }
    let (year, month, day): (u32, u32, u32) = (
        y.parse().map_err(|_| refuse())?,
        m.parse().map_err(|_| refuse())?,
        d.parse().map_err(|_| refuse())?,
    );
    if !(1900..=2200).contains(&year) {
        return Err(format!("{text}: the year {year} is not a plausible visit"));
    }
    let leap = year % 4 == 0 && (year % 100 != 0 || year % 400 == 0);
    let days = match month {
        1 | 3 | 5 | 7 | 8 | 10 | 12 => 31,
        4 | 6 | 9 | 11 => 30,
        2 if leap => 29,
        2 => 28,
        _ => return Err(format!("{text}: there is no month {month}")),
    };
    if day == 0 || day > days {
        return Err(format!("{text}: month {month} of {year} has {days} days"));
    }
    Ok(())
}

#[cfg(test)]
mod tests {
    use super::*;

    // Source: the Gregorian calendar (ISO 8601 dates): 2024 is a leap year, 1900 and 2100 are
    // not, 2000 is.
    #[test]
    fn real_days_only() {
        for ok in ["2026-12-02", "2024-02-29", "2000-02-29", "1948-01-31"] {
            assert_eq!(check_date(ok), Ok(()), "{ok}");
        }
        for bad in [
            "2026-02-30",
            "2100-02-29",
            "1900-02-29",
            "yesterday",
            "",
            "2026-13-01",
            "2026-00-10",
            "2026-1-5",
            "26-12-02",
            "2026-12-02T10:00",
            "１２３４-12-02",
            "2026-04-31",
        ] {
            assert!(check_date(bad).is_err(), "{bad}");
        }
    }
}
