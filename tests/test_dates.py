"""Date parsing against the published examples of RFC 9110, ISO 32000-1 and RFC 3339."""

import email.utils
from datetime import UTC, datetime, timedelta

import pytest

from gate import dates

# RFC 9110 section 5.6.7: the three forms of the same instant (check-values.md section 9).
# Unix time 784111777 is that instant: email.utils.formatdate(784111777, usegmt=True)
# gives the IMF-fixdate, verified (computed).
INSTANT = datetime.fromtimestamp(784111777, UTC)


def test_reference_instant_matches_the_standard_library():
    assert email.utils.formatdate(784111777, usegmt=True) == "Sun, 06 Nov 1994 08:49:37 GMT"


@pytest.mark.parametrize("text", [
    "Sun, 06 Nov 1994 08:49:37 GMT",  # IMF-fixdate (preferred)
    "Sunday, 06-Nov-94 08:49:37 GMT",  # obsolete RFC 850 format
    "Sun Nov  6 08:49:37 1994",  # ANSI C asctime() format, two spaces before 6
])
def test_http_date_forms_rfc9110(text):
    stamp = dates.parse_http_date(text, now=datetime(2026, 12, 1, tzinfo=UTC))
    assert stamp.exact
    assert stamp.earliest == INSTANT


def test_rfc850_two_digit_year_rule_rfc9110():
    # RFC 9110: a two-digit year that appears more than 50 years in the future is the most
    # recent past year with the same last two digits. With "now" in 2026, "94" is 1994 and
    # "30" is 2030 (4 years ahead, not more than 50).
    now = datetime(2026, 12, 1, tzinfo=UTC)
    assert dates.parse_http_date("Sunday, 06-Nov-94 08:49:37 GMT", now).earliest.year == 1994
    assert dates.parse_http_date("Wednesday, 06-Nov-30 08:49:37 GMT", now).earliest.year == 2030


def test_pdf_date_iso32000_example():
    # ISO 32000-1:2008 section 7.9.4: D:199812231952-08'00 = December 23, 1998, 7:52 PM,
    # U.S. Pacific Standard Time (UTC-8), i.e. 1998-12-24 03:52 UTC. Verified via secondary
    # copies of the clause (check-values.md section 8).
    # The string has no seconds, so it names the whole minute 03:52-03:53 UTC.
    expected = datetime(1998, 12, 24, 3, 52, tzinfo=UTC)
    for text in ("D:199812231952-08'00", "D:199812231952-08'00'"):  # ISO and PDF 1.7 forms
        stamp = dates.parse_pdf_date(text)
        assert stamp.earliest == expected
        assert stamp.latest == expected + timedelta(minutes=1)
    # U+2212 MINUS SIGN appears in some renderings of the example
    assert dates.parse_pdf_date("D:199812231952\u221208'00").earliest == expected


def test_pdf_date_partial_fields_default_and_unknown_zone():
    # 7.9.4: fields after the year are optional; no zone means "unknown" relation to UT.
    stamp = dates.parse_pdf_date("D:2025")
    assert stamp.earliest == datetime(2025, 1, 1, tzinfo=UTC) - dates.EARLIEST_ZONE
    assert stamp.latest == datetime(2026, 1, 1, tzinfo=UTC) + dates.LATEST_ZONE
    z = dates.parse_pdf_date("D:20250314093000Z")
    assert z.exact and z.earliest == datetime(2025, 3, 14, 9, 30, tzinfo=UTC)


@pytest.mark.parametrize("bad", ["D:20251399", "D:20251301", "D:2025021", "D:20250230",
                                 "D:2025031425", "garbage-date", ""])
def test_pdf_date_field_ranges_are_checked(bad):
    # pypdf's own parser reads D:20251399 as 2025-01-03 09:09 (library-notes.md 3.3); ours
    # must refuse it.
    with pytest.raises(dates.DateProblem):
        dates.parse_pdf_date(bad)


@pytest.mark.parametrize("text,instant", [
    # RFC 3339 section 5.8 examples (from memory of the RFC's list; values recomputed).
    ("1985-04-12T23:20:50.52Z", datetime(1985, 4, 12, 23, 20, 50, 520000, tzinfo=UTC)),
    ("1996-12-19T16:39:57-08:00", datetime(1996, 12, 20, 0, 39, 57, tzinfo=UTC)),
    ("1990-12-31T23:59:60Z", datetime(1990, 12, 31, 23, 59, 59, tzinfo=UTC)),  # leap second
    ("1937-01-01T12:00:27.87+00:20", datetime(1937, 1, 1, 11, 40, 27, 870000, tzinfo=UTC)),
])
def test_rfc3339_examples(text, instant):
    stamp = dates.parse_iso8601(text)
    assert stamp.exact and stamp.earliest == instant


def test_date_only_covers_every_zone():
    stamp = dates.parse_iso8601("2026-09-01")
    assert stamp.earliest == datetime(2026, 8, 31, 10, tzinfo=UTC)  # 00:00 at UTC+14
    assert stamp.latest == datetime(2026, 9, 2, 12, tzinfo=UTC)  # 24:00 at UTC-12
    assert stamp.latest - stamp.earliest == timedelta(hours=50)


def test_parse_any_tries_each_grammar():
    assert dates.parse_any("2026-09-01").syntax == "iso8601"
    assert dates.parse_any("Sun, 06 Nov 1994 08:49:37 GMT").syntax == "http-date"
    assert dates.parse_any("D:19981223195200Z").syntax == "pdf-date"
    with pytest.raises(dates.DateProblem):
        dates.parse_any("next Tuesday")
    with pytest.raises(dates.DateProblem):
        dates.parse_any("2026-02-30")


def test_as_of_naive_means_utc():
    assert dates.parse_as_of("2026-12-01") == datetime(2026, 12, 1, tzinfo=UTC)
    assert dates.parse_as_of("2026-12-01T10:00:00+02:00") == datetime(2026, 12, 1, 8,
                                                                       tzinfo=UTC)
    with pytest.raises(dates.DateProblem):
        dates.parse_as_of("yesterday")
