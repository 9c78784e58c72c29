"""Regression tests for bugs found while building the demo (sample_docs/), now fixed:
anchors written with ``$`` also matched before a trailing newline (they use ``\\Z`` now).

1. ``integrity``: "A digest that is not 64 hex digits is held as malformed rather than
   ignored." The digest pattern ends in ``$``, which also matches before a trailing newline,
   so ``"<64 hex digits>\\n"`` passes as well formed and is then compared with the file's
   digest: the document is held as ``integrity.mismatch`` ("the file changed after it was
   recorded") even when the digits are the file's true SHA-256. The report then shows two
   identical-looking digests and blames the file instead of the manifest.

2. ``gate.urls.parse``: "Anything the grammar does not allow (spaces, backslashes, control
   characters, ...) is rejected with a named problem." The scheme is checked with a ``$``
   pattern as well, so ``"https\\n://host/..."`` is accepted with the scheme ``"https\\n"``.
   That URL then matches no scheme-sensitive rule: with ``require_provenance: false`` a
   ``url_prefix`` deny rule is bypassed and the document is accepted; with the default it is
   reported as ``source.unlisted`` instead of ``source.bad-url``.
"""

from __future__ import annotations

import hashlib
from datetime import UTC, datetime

import pytest

from gate import urls
from gate.checks import integrity, source
from gate.checks.base import Document, RunContext
from gate.extract.model import Extracted
from gate.manifest import ManifestRecord
from gate.policy import parse_policy

RUN = RunContext(as_of=datetime(2026, 12, 1, tzinfo=UTC))
DATA = b"Lost property office: open Monday to Friday.\n"


def _document(source_url: str | None = None, sha256: str | None = None) -> Document:
    return Document(path="notice.txt", kind="file", size=len(DATA),
                    sha256=hashlib.sha256(DATA).hexdigest(),
                    manifest=ManifestRecord(path="notice.txt", line=1,
                                            source_url=source_url, sha256=sha256),
                    extracted=Extracted(type="text", text_chars=len(DATA)))


def test_digest_with_trailing_newline_is_malformed_not_a_mismatch():
    policy = parse_policy("version: 1\nname: t\nintegrity:\n  require_checksum: true\n", "t")
    digest = hashlib.sha256(DATA).hexdigest()
    assert [f.code for f in integrity.evaluate(_document(sha256=digest), policy, RUN)] == []
    findings = integrity.evaluate(_document(sha256=digest + "\n"), policy, RUN)
    assert [f.code for f in findings] == ["integrity.malformed"]


def test_url_with_newline_in_scheme_is_rejected():
    with pytest.raises(urls.URLProblem):
        urls.parse("https\n://docs.example.org/notice.txt")


def test_newline_in_scheme_does_not_bypass_a_url_prefix_deny_rule():
    policy = parse_policy(
        "version: 1\nname: t\nsources:\n  deny:\n"
        "    - url_prefix: https://wiki.example.org/internal/\n"
        "  require_provenance: false\n", "t")
    plain = _document("https://wiki.example.org/internal/payroll.txt")
    assert [f.code for f in source.evaluate(plain, policy, RUN)] == ["source.denied"]
    tricked = _document("https\n://wiki.example.org/internal/payroll.txt")
    assert [f.code for f in source.evaluate(tricked, policy, RUN)] in (
        ["source.bad-url"], ["source.denied"])
