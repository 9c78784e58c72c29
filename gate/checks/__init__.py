"""The registry: every check, in the order it runs and is reported.

This is the one list of checks. The policy model and its schema, ``gate policy check``,
the sections an allow rule may override, the report's order, the HTML report and the
table of finding codes are all derived from it.

Adding a check: write one module with a settings model, its codes (``define``), an
``evaluate`` function and, if it needs expensive work, a ``measure`` function; add one line
here; add one row to docs/checks.md. See DEVELOPERS.md.
"""

from __future__ import annotations

from gate.checks import format as format_check
from gate.checks import duplicate, freshness, injection, integrity, language, quality, \
    signature, source
from gate.checks.base import CorpusCheck, DocumentCheck

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


def all_checks() -> tuple[DocumentCheck | CorpusCheck, ...]:
    """Every check in the one order: the document checks, then the corpus checks."""
    return DOCUMENT_CHECKS + CORPUS_CHECKS


def check_ids() -> tuple[str, ...]:
    return tuple(check.id for check in all_checks())


def sections() -> tuple[str, ...]:
    """The policy sections that switch a check on, in check order."""
    return tuple(check.section for check in all_checks() if check.section is not None)


def per_source_sections() -> tuple[str, ...]:
    """The sections an allow rule's ``overrides`` may change for the documents it admits."""
    return tuple(check.section for check in DOCUMENT_CHECKS
                 if check.section is not None and check.per_source)


def section_of(check_id: str) -> str | None:
    for check in all_checks():
        if check.id == check_id:
            return check.section
    return None


def order_of(check_id: str) -> int:
    """A check's position in the one order (unknown ids after every known one)."""
    ids = check_ids()
    return ids.index(check_id) if check_id in ids else len(ids)
