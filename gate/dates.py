"""Date parsing for freshness: ISO 8601 / RFC 3339, RFC 9110 HTTP-dates, PDF dates.

Every parsed date becomes a :class:`Stamp`: the interval of UTC instants the text can mean.
A full timestamp with a zone is one instant. A date without a time, or a time without a
zone, could be anywhere from UTC-12 to UTC+14, so its interval is widened by those offsets;
a year or month alone covers the whole period. Freshness then judges age by the latest
possible instant and "in the future" by the earliest, so vague dates never cause a false
alarm in either direction.

Parsers are strict: a string that matches none of the grammars is rejected (it does not
become "today", "unknown" or a half-guess). Field ranges are checked, so ``D:20251399``
is an error, not the 3rd of January.
"""

from __future__ import annotations

import calendar
import re
from dataclasses import dataclass
from datetime import UTC, datetime, timedelta

# The widest offsets in use: UTC-12:00 (Baker Island) and UTC+14:00 (Line Islands).
# Common knowledge of the tz database; no single published source is cited here.
EARLIEST_ZONE = timedelta(hours=14)
LATEST_ZONE = timedelta(hours=12)


class DateProblem(ValueError):
    """A date string that none of the accepted grammars can read."""


@dataclass(frozen=True)
class Stamp:
    """A parsed date: the text as written and the UTC interval it denotes."""

    text: str
    syntax: str
    earliest: datetime
    latest: datetime

    @property
    def exact(self) -> bool:
        return self.earliest == self.latest

    def iso(self) -> str:
        """A normalised rendering: the instant for exact stamps, else the text itself."""
        if self.exact:
            return self.earliest.isoformat().replace("+00:00", "Z")
        return self.text


def _interval(year: int, month: int | None, day: int | None, hour: int | None,
              minute: int | None, second: int | None, frac: float,
              offset: timedelta | None) -> tuple[datetime, datetime]:
    """Start and end instants of a possibly partial local date-time."""
    if month is None:
        start = datetime(year, 1, 1)
        end = datetime(year + 1, 1, 1) if year < 9999 else datetime(9999, 12, 31, 23, 59, 59)
    elif day is None:
        start = datetime(year, month, 1)
        end = start + timedelta(days=calendar.monthrange(year, month)[1])
    elif hour is None:
        start = datetime(year, month, day)
        end = start + timedelta(days=1)
    else:
        start = datetime(year, month, day, hour, minute or 0, second or 0,
                         int(round(frac * 1_000_000)) if frac else 0)
        end = start
        if minute is None:
            end = start + timedelta(hours=1)
        elif second is None:
            end = start + timedelta(minutes=1)
    if offset is None:
        earliest = start - EARLIEST_ZONE
        latest = end + LATEST_ZONE
    else:
        earliest, latest = start - offset, end - offset
    return earliest.replace(tzinfo=UTC), latest.replace(tzinfo=UTC)


def _check_fields(year: int, month: int | None, day: int | None, hour: int | None,
                  minute: int | None, second: int | None, text: str) -> None:
    if month is not None and not 1 <= month <= 12:
        raise DateProblem(f"{text!r}: month {month} is out of range")
    if day is not None and not 1 <= day <= calendar.monthrange(year, month or 1)[1]:
        raise DateProblem(f"{text!r}: day {day} is out of range")
    if hour is not None and not 0 <= hour <= 23:
        raise DateProblem(f"{text!r}: hour {hour} is out of range")
    if minute is not None and not 0 <= minute <= 59:
        raise DateProblem(f"{text!r}: minute {minute} is out of range")
    # 60 is a leap second (RFC 3339 section 5.6); it is read as :59 below.
    if second is not None and not 0 <= second <= 60:
        raise DateProblem(f"{text!r}: second {second} is out of range")
    if year < 1:
        raise DateProblem(f"{text!r}: year {year} is out of range")


def _offset(sign: str, hours: str | None, minutes: str | None, text: str) -> timedelta:
    h, m = int(hours or 0), int(minutes or 0)
    if h > 23 or m > 59:
        raise DateProblem(f"{text!r}: time-zone offset out of range")
    delta = timedelta(hours=h, minutes=m)
    return -delta if sign in "-\u2212" else delta


_ISO = re.compile(
    r"^(\d{4})(?:-(\d{2})(?:-(\d{2})"
    r"(?:[Tt ](\d{2}):(\d{2})(?::(\d{2})(?:[.,](\d{1,9}))?)?"
    r"(?:([Zz])|([+\-\u2212])(\d{2})(?::?(\d{2}))?)?)?)?)?\Z")


def parse_iso8601(text: str) -> Stamp:
    """ISO 8601 calendar dates and RFC 3339 timestamps (extended format).

    Accepts ``YYYY``, ``YYYY-MM``, ``YYYY-MM-DD`` and ``YYYY-MM-DDThh:mm[:ss[.f]]`` with an
    optional ``Z`` or ``±hh[:mm]`` zone (a space may replace ``T``, as RFC 3339 permits).
    """
    m = _ISO.match(text)
    if not m:
        raise DateProblem(f"{text!r} is not an ISO 8601 date")
    year = int(m.group(1))
    month, day, hour, minute, second = (int(g) if g else None for g in m.group(2, 3, 4, 5, 6))
    _check_fields(year, month, day, hour, minute, second, text)
    frac = float("0." + m.group(7)) if m.group(7) else 0.0
    offset = None
    if m.group(8):
        offset = timedelta(0)
    elif m.group(9):
        offset = _offset(m.group(9), m.group(10), m.group(11), text)
    if second == 60:
        second = 59
    earliest, latest = _interval(year, month, day, hour, minute, second, frac, offset)
    return Stamp(text, "iso8601", earliest, latest)


_MONTHS = {name: i for i, name in enumerate(
    ["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"], 1)}
_WKDAY = r"(?:Mon|Tue|Wed|Thu|Fri|Sat|Sun)"
_WEEKDAY = r"(?:Monday|Tuesday|Wednesday|Thursday|Friday|Saturday|Sunday)"
_MON = r"(Jan|Feb|Mar|Apr|May|Jun|Jul|Aug|Sep|Oct|Nov|Dec)"
# RFC 9110 section 5.6.7: IMF-fixdate, then the two obsolete forms.
_IMF = re.compile(rf"^{_WKDAY}, (\d{{2}}) {_MON} (\d{{4}}) (\d{{2}}):(\d{{2}}):(\d{{2}}) GMT\Z")
_RFC850 = re.compile(rf"^{_WEEKDAY}, (\d{{2}})-{_MON}-(\d{{2}}) (\d{{2}}):(\d{{2}}):(\d{{2}}) GMT\Z")
_ASCTIME = re.compile(rf"^{_WKDAY} {_MON} ([ \d]\d) (\d{{2}}):(\d{{2}}):(\d{{2}}) (\d{{4}})\Z")


def parse_http_date(text: str, now: datetime | None = None) -> Stamp:
    """RFC 9110 HTTP-date in any of its three forms (all are in GMT).

    For the two-digit years of rfc850-date, RFC 9110 says a date that appears to be more
    than 50 years in the future is taken as the most recent past year with the same last
    two digits; ``now`` is that reference (the run's as-of clock).
    """
    if m := _IMF.match(text):
        day, mon, year, hh, mm, ss = m.groups()
    elif m := _RFC850.match(text):
        day, mon, yy, hh, mm, ss = m.groups()
        ref = (now or datetime.now(UTC)).year
        year = (ref // 100) * 100 + int(yy)
        if year > ref + 50:
            year -= 100
        year = str(year)
    elif m := _ASCTIME.match(text):
        mon, day, hh, mm, ss, year = m.groups()
    else:
        raise DateProblem(f"{text!r} is not an HTTP-date")
    y, mo, d, h, mi, s = int(year), _MONTHS[mon], int(day), int(hh), int(mm), int(ss)
    _check_fields(y, mo, d, h, mi, s, text)
    earliest, latest = _interval(y, mo, d, h, mi, min(s, 59), 0.0, timedelta(0))
    return Stamp(text, "http-date", earliest, latest)


# ISO 32000-1 section 7.9.4: (D:)YYYYMMDDHHmmSSOHH'mm, each field optional after the year
# only if all before it are present. PDF Reference 1.7 adds a trailing apostrophe; both are
# read. U+2212 MINUS SIGN appears in some renderings of the standard and is read as "-".
_PDF = re.compile(
    r"^(?:D:)?(\d{4})(?:(\d{2})(?:(\d{2})(?:(\d{2})(?:(\d{2})(?:(\d{2}))?)?)?)?)?"
    r"(?:([Zz+\-\u2212])(?:(\d{2})'?(?:(\d{2})'?)?)?)?\Z")


def parse_pdf_date(text: str) -> Stamp:
    """A PDF date string (ISO 32000-1:2008 section 7.9.4)."""
    m = _PDF.match(text.strip())
    if not m:
        raise DateProblem(f"{text!r} is not a PDF date")
    year = int(m.group(1))
    month, day, hour, minute, second = (int(g) if g else None for g in m.group(2, 3, 4, 5, 6))
    _check_fields(year, month, day, hour, minute, second, text)
    offset = None
    if m.group(7):
        offset = timedelta(0) if m.group(7) in "Zz" else \
            _offset(m.group(7), m.group(8), m.group(9), text)
    # "If no UT information is specified, the relationship of the specified time to UT
    # shall be considered to be unknown" (7.9.4): the interval is widened like a naive time.
    if second == 60:
        second = 59
    earliest, latest = _interval(year, month, day, hour, minute, second, 0.0, offset)
    return Stamp(text, "pdf-date", earliest, latest)


def parse_any(text: str, now: datetime | None = None) -> Stamp:
    """Try ISO 8601, then HTTP-date, then the PDF date format."""
    if not isinstance(text, str):
        raise DateProblem(f"{text!r} is not a date string")
    text = text.strip()
    for parser in (parse_iso8601, lambda t: parse_http_date(t, now), parse_pdf_date):
        try:
            return parser(text)
        except DateProblem:
            continue
    raise DateProblem(f"{text!r} is not a date in any accepted format (ISO 8601 / RFC 3339, "
                      "RFC 9110 HTTP-date, or PDF D:YYYYMMDDHHmmSS)")


def parse_as_of(text: str) -> datetime:
    """The run clock from ``--as-of``: an ISO 8601 date or date-time; naive means UTC."""
    try:
        stamp = parse_iso8601(text.strip())
    except DateProblem as err:
        raise DateProblem(f"--as-of {text!r} is not an ISO 8601 date-time "
                          "(for example 2026-12-01T00:00:00Z)") from err
    m = _ISO.match(text.strip())
    assert m
    if m.group(8) or m.group(9):
        return stamp.earliest
    # No zone given: read the value as UTC rather than as an interval.
    return (stamp.earliest + EARLIEST_ZONE)
