"""Per-document checks on hand-built documents: positives and negatives for every code."""

from datetime import UTC, datetime

import pytest

from gate.checks import format as format_check
from gate.checks import freshness, integrity, language, source
from gate.checks.base import Document, RunContext
from gate.decide import decide
from gate.extract.model import DateClaim, Extracted
from gate.manifest import ManifestRecord

from .helpers import policy

RUN = RunContext(as_of=datetime(2026, 12, 1, tzinfo=UTC))
TEXT = Extracted(type="text", text_chars=500)


def doc(path="a.txt", *, url=None, sha=None, published=None, retrieved=None, digest="0" * 64,
        extracted=TEXT, measures=None, kind="file", size=10, target=None):
    record = ManifestRecord(path=path, line=1, source_url=url, sha256=sha,
                            published_at=published, retrieved_at=retrieved)
    return Document(path=path, kind=kind, size=size, sha256=digest, manifest=record,
                    extracted=extracted, measures=measures or {}, link_target=target)


def codes(findings):
    return sorted(f.code for f in findings or [])


SOURCES = policy("""
sources:
  allow:
    - domain: docs.example.org
      subdomains: true
      trust: 3
    - domain: news.example.net
    - url_prefix: https://wiki.example.org/public/
      max_age_days: 30
    - path: local/
  deny:
    - domain: paste.example.net
    - url_prefix: https://docs.example.org/drafts/
    - path: local/private/
""")


@pytest.mark.parametrize("url,path,expected", [
    ("https://docs.example.org/a", "a", []),
    ("https://deep.sub.docs.example.org/a", "a", []),
    ("https://docs.example.org.evil.test/a", "a", ["source.unlisted"]),
    ("https://docs-example.org/a", "a", ["source.unlisted"]),
    ("https://sub.news.example.net/a", "a", ["source.unlisted"]),  # subdomains: false
    ("ftp://news.example.net/a", "a", ["source.unlisted"]),  # scheme not admitted
    ("https://paste.example.net/x", "a", ["source.denied"]),
    ("https://raw.paste.example.net/x", "a", ["source.denied"]),  # deny covers subdomains
    ("https://docs.example.org/drafts/x", "a", ["source.denied"]),  # deny beats allow
    ("https://docs.example.org/public/../drafts/x", "a", ["source.denied"]),
    ("https://wiki.example.org/public/page", "a", []),
    ("https://wiki.example.org/public/../private/page", "a", ["source.unlisted"]),
    ("https://wiki.example.org/publicity", "a", ["source.unlisted"]),
    ("https://docs.example.org@evil.test/a", "a", ["source.userinfo"]),
    ("https://docs.example.org/a b", "a", ["source.bad-url"]),
    ("docs.example.org/a", "a", ["source.bad-url"]),
    (None, "local/notes.txt", []),
    (None, "localnotes.txt", ["source.missing"]),  # path prefix on segment boundaries
    (None, "local/private/x.txt", ["source.denied"]),
    (None, "elsewhere/x.txt", ["source.missing"]),
    ("https://docs.example.org/a", "local/private/x.txt", ["source.denied"]),
    ("https://unknown.example.org/a", "local/notes.txt", ["source.unlisted"]),  # path rules are
    # only for documents without a URL
])
def test_source_rules(url, path, expected):
    assert codes(source.evaluate(doc(path, url=url), SOURCES, RUN)) == expected


def test_source_trust_and_rule_reported():
    match = source.match(doc(url="https://a.docs.example.org/x"), SOURCES.sources)
    assert match.allowed_by == 0 and match.trust == 3
    assert source.match(doc(url="https://example.com/"), SOURCES.sources).trust == 0


def test_require_provenance_false_only_denies():
    lax = policy("sources:\n  deny:\n    - domain: paste.example.net\n"
                 "  require_provenance: false\n")
    assert codes(source.evaluate(doc(url="https://any.example.com/x"), lax, RUN)) == []
    assert codes(source.evaluate(doc(url="https://paste.example.net/x"), lax, RUN)) == \
        ["source.denied"]


INTEGRITY = policy("integrity:\n  require_checksum: true\n")
# SHA-256("abc"), FIPS 180-4 / NIST example (check-values.md section 5)
ABC = "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad"


@pytest.mark.parametrize("given,expected", [
    (ABC, []),
    (ABC.upper(), []),  # hex case does not matter
    ("0" * 64, ["integrity.mismatch"]),
    (None, ["integrity.missing"]),
    ("abc123", ["integrity.malformed"]),
])
def test_integrity(given, expected):
    assert codes(integrity.evaluate(doc(sha=given, digest=ABC), INTEGRITY, RUN)) == expected


def test_integrity_given_digest_must_match_even_when_not_required():
    lax = policy("integrity:\n  require_checksum: false\n")
    assert codes(integrity.evaluate(doc(sha=None, digest=ABC), lax, RUN)) == []
    assert codes(integrity.evaluate(doc(sha="1" * 64, digest=ABC), lax, RUN)) == \
        ["integrity.mismatch"]


FRESH = policy("""
sources:
  allow:
    - url_prefix: https://wiki.example.org/public/
      max_age_days: 30
    - domain: docs.example.org
  require_provenance: false
freshness:
  max_age_days: 365
""")


def html(*claims):
    return Extracted(type="html", text_chars=500,
                     dates=tuple(DateClaim(role, source_, text) for role, source_, text in claims))


@pytest.mark.parametrize("kwargs,expected", [
    (dict(published="2026-09-01"), []),
    (dict(published="2024-01-01"), ["freshness.stale"]),
    (dict(published="2027-03-01"), ["freshness.future"]),
    (dict(published="2026-12-01"), []),  # date-only: it is already the 1st east of UTC
    (dict(published="2026-12-01T13:00:00+14:00"), []),  # 23:00 UTC on 30 November
    (dict(published="2026-12-02"), ["freshness.future"]),  # nowhere the 2nd yet at 00:00Z
    (dict(published="Sun, 06 Nov 1994 08:49:37 GMT"), ["freshness.stale"]),  # RFC 9110
    (dict(published="D:20260901120000Z"), []),  # PDF date in the manifest is accepted too
    (dict(published="last spring"), ["freshness.bad-date"]),
    (dict(), ["freshness.undated"]),
    (dict(published="2026-11-01", retrieved="2026-10-01T00:00:00Z"),
     ["freshness.inconsistent"]),
    (dict(retrieved="yesterday", published="2026-11-01"), ["freshness.bad-date"]),
])
def test_freshness_manifest_dates(kwargs, expected):
    assert codes(freshness.evaluate(doc(**kwargs), FRESH, RUN)) == expected


def test_freshness_precedence_manifest_then_modified_then_published():
    ex = html(("published", "meta article:published_time", "2020-01-01"),
              ("modified", "meta article:modified_time", "2026-10-01"))
    assert codes(freshness.evaluate(doc(extracted=ex), FRESH, RUN)) == []  # modified wins
    claim, _ = freshness.choose(doc(extracted=ex), RUN)
    assert claim.source == "meta article:modified_time"
    chosen = freshness.choose(doc(extracted=ex, published="2019-05-05"), RUN)
    assert chosen[0].source == "manifest published_at"  # the manifest wins over the page
    assert codes(freshness.evaluate(doc(extracted=ex, published="2019-05-05"), FRESH,
                                    RUN)) == ["freshness.stale"]


def test_freshness_skips_unreadable_document_dates():
    ex = html(("modified", "meta article:modified_time", "not a date"),
              ("published", "PDF /CreationDate", "D:20260801000000Z"))
    claim, _ = freshness.choose(doc(extracted=ex), RUN)
    assert claim.source == "PDF /CreationDate"


def test_freshness_max_age_override_per_source_rule():
    wiki = doc(url="https://wiki.example.org/public/a", published="2026-09-01")
    assert codes(freshness.evaluate(wiki, FRESH, RUN)) == ["freshness.stale"]  # 30-day rule
    other = doc(url="https://docs.example.org/a", published="2026-09-01")
    assert codes(freshness.evaluate(other, FRESH, RUN)) == []


def test_freshness_undated_policy_choices():
    warn = policy("freshness:\n  undated: warn\n")
    found = freshness.evaluate(doc(), warn, RUN)
    assert codes(found) == ["freshness.undated"]
    assert decide(found, warn).decision == "accepted"
    allow = policy("freshness:\n  undated: allow\n")
    assert freshness.evaluate(doc(), allow, RUN) == []


LANG = policy("language:\n  allowed: [en, de]\n  min_confidence: 0.8\n  min_chars: 200\n")


def lang_doc(chars, languages):
    return doc(measures={"language": {"chars": chars, "letters": chars,
                                      "languages": languages}})


@pytest.mark.parametrize("chars,languages,expected", [
    (900, [["en", 0.99]], []),
    (900, [["de", 0.95]], []),
    (900, [["fr", 0.99]], ["language.not-allowed"]),
    (900, [["en", 0.6], ["de", 0.4]], ["language.low-confidence"]),
    (120, [["en", 0.99]], ["language.undetermined"]),
    (900, [], ["language.undetermined"]),
])
def test_language_decisions(chars, languages, expected):
    assert codes(language.evaluate(lang_doc(chars, languages), LANG, RUN)) == expected


def test_language_not_evaluated_without_text():
    empty = doc(extracted=Extracted(type=None, problem="broken"))
    assert language.evaluate(empty, LANG, RUN) is None


class _Extraction:
    def __init__(self, text):
        self.text = text


# langdetect's output on texts in several languages (the reference library itself; the
# first two are the examples of langdetect's README, the rest invented sentences).
@pytest.mark.parametrize("text,code", [
    ("War doesn't show who's right, just who's left.", "en"),
    ("Ein, zwei, drei, vier", "de"),
    ("Le dépôt du nord ouvre à sept heures et ferme à dix-neuf heures en semaine.", "fr"),
    ("El almacén del norte abre a las siete y cierra a las diecinueve entre semana.", "es"),
    ("Het depot in het noorden gaat om zeven uur open en sluit om negentien uur.", "nl"),
])
def test_langdetect_outputs(text, code):
    measured = language.measure(_Extraction(text))
    assert measured["languages"][0][0] == code


def test_language_measure_is_deterministic_and_bounded():
    text = ("The northern depot schedules deliveries in three windows. " * 200 +
            "Die Lieferungen werden in drei Zeitfenstern geplant. " * 200)
    first = language.measure(_Extraction(text))
    assert all(language.measure(_Extraction(text)) == first for _ in range(5))
    shares = dict(first["languages"])
    assert set(shares) == {"en", "de"}  # mixed: both seen, each about half of the letters
    assert 0.4 < shares["en"] < 0.6 and 0.4 < shares["de"] < 0.6


LIMITS = policy("limits:\n  max_bytes: 1000\n")


@pytest.mark.parametrize("kwargs,expected", [
    (dict(), []),
    (dict(size=5000), ["format.too-large"]),
    (dict(kind="symlink", target="/etc/passwd", digest=None), ["format.not-regular"]),
    (dict(kind="fifo", digest=None), ["format.not-regular"]),
    (dict(kind="unreadable-dir", digest=None), ["format.unreadable"]),
    (dict(extracted=Extracted(type=None, problem="unsupported", problem_detail="a PNG")),
     ["format.unsupported"]),
    (dict(path="a.pdf", extracted=Extracted(type="pdf", problem="encrypted", problem_detail="x")),
     ["format.encrypted"]),
    (dict(path="a.pdf", extracted=Extracted(type="pdf", problem="timeout")), ["format.timeout"]),
    (dict(path="a.pdf", extracted=Extracted(type="pdf", problem="memory")), ["format.memory"]),
    (dict(path="a.pdf", extracted=Extracted(type="pdf", problem="crashed", problem_detail="x")),
     ["format.crashed"]),
    (dict(path="report.pdf", extracted=Extracted(type="html", text_chars=50)),
     ["format.type-mismatch"]),
    (dict(path="notes", extracted=Extracted(type="html", text_chars=50)), []),
    (dict(path="page.html", extracted=Extracted(type="html", text_chars=50,
                                                charset_mismatch=True,
                                                declared_charset="utf-8",
                                                encoding="cp1252")),
     ["format.charset-mismatch"]),
])
def test_format(kwargs, expected):
    assert codes(format_check.evaluate(doc(**kwargs), LIMITS, RUN)) == expected


def test_format_fail_closed_codes_ignore_warn():
    warn = policy("format:\n  action: warn\n")
    broken = format_check.evaluate(doc(extracted=Extracted(type="pdf", problem="broken",
                                                           problem_detail="x")), warn, RUN)
    assert decide(broken, warn).decision == "quarantined"
    mismatch = format_check.evaluate(doc(path="a.pdf",
                                         extracted=Extracted(type="html", text_chars=9)),
                                     warn, RUN)
    assert decide(mismatch, warn).decision == "accepted"
    narrow = policy("format:\n  allowed_types: [pdf]\n")
    assert codes(format_check.evaluate(doc(), narrow, RUN)) == ["format.type-not-allowed"]


def test_section_action_warn_downgrades_findings():
    warn = policy("integrity:\n  require_checksum: true\n  action: warn\n")
    found = integrity.evaluate(doc(sha=None), warn, RUN)
    decision = decide(found, warn)
    assert decision.decision == "accepted" and [w.code for w in decision.warnings] == \
        ["integrity.missing"]
