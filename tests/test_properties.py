"""Property-based tests (hypothesis, bounded): parsers fail cleanly and round-trip."""

import email.utils
import string
from datetime import UTC, datetime, timedelta

from hypothesis import HealthCheck, given, settings
from hypothesis import strategies as st

from gate import dates, urls
from gate.errors import PolicyError
from gate.extract.text import clean_text
from gate.policy import parse_policy

BOUNDED = settings(max_examples=300, deadline=None,
                   suppress_health_check=[HealthCheck.too_slow])

label = st.text(alphabet=string.ascii_lowercase + string.digits, min_size=1, max_size=12)
host = st.lists(label, min_size=2, max_size=4).map(".".join)
segment = st.text(alphabet=string.ascii_letters + string.digits + "-._~!$&'()*+,;=:@%",
                  max_size=8).filter(lambda s: "%" not in s)
path = st.lists(segment, max_size=5).map(lambda parts: "/" + "/".join(parts))


@BOUNDED
@given(st.text(max_size=200))
def test_url_parse_only_raises_url_problem(text):
    try:
        urls.parse(text)
    except urls.URLProblem:
        pass


@BOUNDED
@given(st.sampled_from(["http", "https", "HTTP", "ftp"]), host, st.one_of(st.none(),
       st.integers(0, 65535)), path, st.one_of(st.none(), segment))
def test_normalisation_is_idempotent(scheme, hostname, port, path_, query):
    text = f"{scheme}://{hostname.upper()}{'' if port is None else f':{port}'}{path_}"
    if query is not None:
        text += "?" + query
    once = urls.parse(text)
    assert urls.parse(str(once)) == once
    assert once.host == hostname  # case-folded
    assert ".." not in once.segments() and "." not in once.segments()


@BOUNDED
@given(host, label, st.text(alphabet=string.ascii_lowercase, min_size=1, max_size=6))
def test_host_match_is_on_label_boundaries(domain, sub, glue):
    assert urls.host_matches(f"{sub}.{domain}", domain, subdomains=True)
    assert not urls.host_matches(f"{sub}.{domain}", domain, subdomains=False)
    for other in (f"{glue}{domain}", f"{domain}.{glue}", f"{domain}{glue}"):
        # the definition on labels: the host's labels end with the domain's labels
        by_labels = other.split(".")[-len(domain.split(".")):] == domain.split(".")
        assert urls.host_matches(other, domain, subdomains=True) is by_labels


@BOUNDED
@given(st.text(max_size=60))
def test_date_parsers_only_raise_date_problem(text):
    for parser in (dates.parse_any, dates.parse_iso8601, dates.parse_pdf_date,
                   dates.parse_http_date):
        try:
            stamp = parser(text)
        except dates.DateProblem:
            continue
        assert stamp.earliest <= stamp.latest


instants = st.datetimes(min_value=datetime(1971, 1, 1), max_value=datetime(2090, 12, 31),
                        timezones=st.just(UTC)).map(lambda d: d.replace(microsecond=0))


@BOUNDED
@given(instants, st.integers(-12 * 60, 14 * 60))
def test_iso_http_and_pdf_forms_round_trip(instant, offset_minutes):
    offset = timedelta(minutes=offset_minutes)
    local = instant + offset
    sign = "+" if offset >= timedelta(0) else "-"
    hh, mm = divmod(abs(offset_minutes), 60)
    iso = local.strftime("%Y-%m-%dT%H:%M:%S") + f"{sign}{hh:02d}:{mm:02d}"
    assert dates.parse_iso8601(iso).earliest == instant
    pdf = local.strftime("D:%Y%m%d%H%M%S") + f"{sign}{hh:02d}'{mm:02d}'"
    assert dates.parse_pdf_date(pdf).earliest == instant
    http = email.utils.format_datetime(instant, usegmt=True)  # the stdlib as reference
    assert dates.parse_http_date(http, now=instant).earliest == instant


@settings(max_examples=150, deadline=None)
@given(st.text(max_size=300))
def test_policy_loader_only_raises_policy_error(text):
    try:
        parse_policy(text, "p.yaml")
    except PolicyError as err:
        assert err.problems and all(isinstance(p, str) for p in err.problems)


yaml_values = st.recursive(
    st.one_of(st.none(), st.booleans(), st.integers(-5, 500), st.floats(-2, 2),
              st.text(alphabet=string.ascii_letters + ".-/:", max_size=12)),
    lambda inner: st.one_of(st.lists(inner, max_size=3),
                            st.dictionaries(st.sampled_from(
                                ["allow", "deny", "domain", "path", "trust", "threshold",
                                 "max_age_days", "allowed", "action", "subdomains"]),
                                inner, max_size=3)),
    max_leaves=8)


@settings(max_examples=150, deadline=None)
@given(st.dictionaries(st.sampled_from(["sources", "freshness", "language", "duplicates",
                                        "integrity", "limits", "quality", "format"]),
                       yaml_values, max_size=3))
def test_structured_policies_validate_or_fail_with_line_numbers(sections):
    import yaml
    text = yaml.safe_dump({"version": 1, "name": "p", **sections})
    try:
        parse_policy(text, "p.yaml")
    except PolicyError as err:
        assert all(p.startswith("line ") for p in err.problems), err.problems


@BOUNDED
@given(st.text(max_size=300))
def test_clean_text_is_idempotent_and_removes_controls(text):
    cleaned = clean_text(text)
    assert clean_text(cleaned) == cleaned
    assert "\r" not in cleaned and "\x00" not in cleaned
    assert not any(ord(c) < 32 and c not in "\n\t" for c in cleaned)
