"""integrity: are these the bytes the manifest says were gathered?

The SHA-256 of the file's bytes (FIPS 180-4) is computed for every document and always
reported. With an ``integrity`` section, a ``sha256`` given in the manifest must match it
(whatever ``require_checksum`` says), and with ``require_checksum: true`` a document whose
manifest entry carries no digest is held. A digest that is not 64 hex digits is held as
malformed rather than ignored. A mismatch means the file changed after it was recorded:
tampering, a truncated download or a stale manifest.

Records of a container (a WARC archive's responses, an mbox's messages; see
gate/containers.py) are checked against the digests that vouch for them: a WARC record's
payload against its ``WARC-Payload-Digest`` (``integrity.digest-mismatch``), and the
container file against the ``sha256`` of its own manifest line. A record with a matching
digest counts as checksummed for ``require_checksum``.

Example::

    integrity:
      require_checksum: true
"""

from __future__ import annotations

import re
from typing import Any

from pydantic import Field

from gate.checks.base import Document, DocumentCheck, RunContext
from gate.findings import Finding, define
from gate.settings import Section

MISMATCH = define("integrity.mismatch", "the bytes do not match the manifest's sha256",
                  "the file's SHA-256 is {actual} but the manifest says {expected}; the file "
                  "changed after it was recorded")
MISSING = define("integrity.missing", "no sha256 in the manifest, but one is required",
                 "integrity.require_checksum is on and the manifest gives no sha256 for "
                 "this document")
MALFORMED = define("integrity.malformed", "the manifest's sha256 is not 64 hex digits",
                   "the manifest's sha256 {value!r} is not a SHA-256 digest (64 hex digits)")
DIGEST_MISMATCH = define("integrity.digest-mismatch", "a container's digest does not match",
                         "the {algorithm} digest of {over} is {actual} but {claimed_by} says "
                         "{claimed}; the bytes changed after they were recorded")
UNHASHED = define("integrity.unhashable", "the document's bytes could not be read to hash",
                  "the document's bytes could not be read, so its SHA-256 is unknown",
                  fail_closed=True)

_HEX64 = re.compile(r"^[0-9a-fA-F]{64}\Z")


class IntegritySettings(Section):
    """Checksums against the manifest."""

    require_checksum: bool = Field(False, description="Hold documents whose manifest entry "
                                                      "has no sha256.", examples=[True])


def evaluate(document: Document, policy: Any, run: RunContext) -> list[Finding] | None:
    settings: IntegritySettings = policy.integrity
    expected = document.manifest.sha256 if document.manifest else None
    digests = document.manifest.digests if document.manifest else ()
    if digests:  # a container's record: its digests were checked when it was read
        return [DIGEST_MISMATCH(**d) for d in digests if not d.get("valid")]
    if expected is None:
        return [MISSING()] if settings.require_checksum else []
    if not _HEX64.match(expected):
        return [MALFORMED(value=expected)]
    if document.sha256 is None:
        return [UNHASHED()] if document.kind == "file" else None
    if expected.lower() != document.sha256:
        return [MISMATCH(actual=document.sha256, expected=expected.lower())]
    return []


CHECK = DocumentCheck(id="integrity", section="integrity", evaluate=evaluate,
                      settings=IntegritySettings, doc=__doc__ or "")
