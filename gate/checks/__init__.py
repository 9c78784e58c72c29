"""The registry: every check, in the order it runs and is reported.

Adding a check: write one module with a settings model, its codes (``define``), an
``evaluate`` function and, if it needs expensive work, a ``measure`` function; add one line
here; add one row to docs/checks.md. See DEVELOPERS.md.
"""

from __future__ import annotations

from gate.checks import format as format_check
from gate.checks import duplicate, freshness, injection, integrity, language, quality, \
    signature, source
from gate.checks.base import CorpusCheck, DocumentCheck
from gate.findings import define_internal

DOCUMENT_CHECKS: tuple[DocumentCheck, ...] = (
    format_check.CHECK,
    source.CHECK,
    integrity.CHECK,
    signature.CHECK,
    freshness.CHECK,
    language.CHECK,
    quality.CHECK,
    injection.CHECK,
)

CORPUS_CHECKS: tuple[CorpusCheck, ...] = (
    duplicate.CHECK,
)

# The check ids of the contract, in report order ("further keys may be added": signature).
CHECK_IDS = ("source", "integrity", "freshness", "language", "format", "duplicate",
             "injection", "quality", "signature")

ALL_CHECKS = DOCUMENT_CHECKS + CORPUS_CHECKS

for _check in ALL_CHECKS:
    define_internal(_check.id)


def by_id(check_id: str) -> DocumentCheck:
    for check in DOCUMENT_CHECKS:
        if check.id == check_id:
            return check
    raise KeyError(check_id)
