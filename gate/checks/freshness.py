"""freshness: is the document recent enough, and not dated in the future?

The document's date is the first usable one in this order (the precedence is fixed and
reported with every decision):

1. the manifest's ``published_at`` (the operator's own record);
2. the document's last-modified date: HTML ``article:modified_time``, ``og:updated_time``,
   ``dateModified``, ``dcterms.modified``, ``http-equiv last-modified``; PDF ``/ModDate``,
   XMP ``xmp:ModifyDate``;
3. the document's publication date: HTML ``article:published_time``, ``datePublished``,
   ``dcterms.created``, ``DC.date.issued``, ``DC.date``, ``date``; PDF ``/CreationDate``,
   XMP ``xmp:CreateDate``.

Dates may be ISO 8601 / RFC 3339, RFC 9110 HTTP-dates or PDF dates (ISO 32000-1 section
7.9.4); see :mod:`gate.dates`. A date without a time or zone covers the whole span it could
mean, so age is measured from the latest instant it allows and "future" from the earliest.
A malformed date in the manifest is held (the operator's record is broken); a malformed
date inside a document is skipped in favour of the next one.

``max_age_days`` may be overridden per allow rule in ``sources``. ``undated`` says what
happens to a document with no usable date: ``quarantine``, ``warn`` or ``allow``; left out,
the section's ``action`` decides (quarantine by default).
``published_at`` later than ``retrieved_at`` in the manifest is held as inconsistent.

Example::

    freshness:
      max_age_days: 365
      reject_future: true
      undated: warn
"""

from __future__ import annotations

from datetime import timedelta
from typing import Any, Literal

from pydantic import Field

from gate import dates
from gate.checks import source as source_check
from gate.checks.base import Document, DocumentCheck, RunContext, once_per_document
from gate.extract.model import DateClaim
from gate.findings import Finding, define
from gate.settings import Section

STALE = define("freshness.stale", "older than the allowed age",
               "the document is dated {date} ({source}), {age_days} days before the as-of "
               "time; the limit is {max_age_days} days")
FUTURE = define("freshness.future", "dated in the future",
                "the document is dated {date} ({source}), after the as-of time {as_of}")
UNDATED = define("freshness.undated", "no usable date",
                 "no usable date was found in the manifest or the document")
BAD_DATE = define("freshness.bad-date", "the manifest's date cannot be read",
                  "manifest {field} {value!r} is not a date: {problem}")
INCONSISTENT = define("freshness.inconsistent", "published after it was retrieved",
                      "the manifest says published_at {published} but retrieved_at "
                      "{retrieved}: a document cannot be published after it was gathered")


class FreshnessSettings(Section):
    """Age limits."""

    max_age_days: int | None = Field(None, ge=0, le=100_000, description="Hold documents "
                                     "older than this (days before the as-of time); none: no "
                                     "age limit.",
                                     examples=[365])
    reject_future: bool = Field(True, description="Hold documents dated after the as-of time.")
    undated: Literal["quarantine", "warn", "allow"] | None = Field(
        None, description="What to do with a document that has no usable date; default: "
        "the section's action.", examples=["warn"])


def _claims(document: Document) -> list[DateClaim]:
    claims: list[DateClaim] = []
    if document.manifest and document.manifest.published_at is not None:
        claims.append(DateClaim("published", "manifest published_at",
                                document.manifest.published_at))
    found = document.extracted.dates
    claims += [c for c in found if c.role == "modified"]
    claims += [c for c in found if c.role != "modified"]
    return claims


@once_per_document
def choose(document: Document, run: RunContext) -> tuple[DateClaim, dates.Stamp] | Finding | None:
    """The document's date by the documented precedence, a bad-date finding, or None."""
    for claim in _claims(document):
        try:
            return claim, dates.parse_any(claim.text, now=run.as_of)
        except dates.DateProblem as err:
            if claim.source.startswith("manifest"):
                return BAD_DATE(field="published_at", value=claim.text, problem=str(err))
    return None


def evaluate(document: Document, policy: Any, run: RunContext) -> list[Finding] | None:
    settings: FreshnessSettings = policy.freshness
    findings: list[Finding] = []
    record = document.manifest
    retrieved = None
    if record and record.retrieved_at is not None:
        try:
            retrieved = dates.parse_any(record.retrieved_at, now=run.as_of)
        except dates.DateProblem as err:
            findings.append(BAD_DATE(field="retrieved_at", value=record.retrieved_at,
                                     problem=str(err)))
    chosen = choose(document, run)
    if isinstance(chosen, Finding):
        return findings + [chosen]
    if chosen is None:
        if settings.undated != "allow":
            findings.append(UNDATED(action=settings.undated))  # None: the section decides
        return findings
    claim, stamp = chosen
    if retrieved is not None and claim.source == "manifest published_at" and \
            stamp.earliest > retrieved.latest:
        findings.append(INCONSISTENT(published=claim.text, retrieved=record.retrieved_at))
    as_of = run.as_of
    if settings.reject_future and stamp.earliest > as_of:
        findings.append(FUTURE(date=claim.text, source=claim.source,
                               as_of=as_of.isoformat().replace("+00:00", "Z")))
    max_age = settings.max_age_days
    if policy.sources is not None:
        override = source_check.match(document, policy.sources).max_age_days
        if override is not None:
            max_age = override
    if max_age is not None:
        age = as_of - stamp.latest
        if age > timedelta(days=max_age):
            findings.append(STALE(date=claim.text, source=claim.source,
                                  age_days=age.days, max_age_days=max_age))
    return findings


CHECK = DocumentCheck(id="freshness", section="freshness", evaluate=evaluate,
                      settings=FreshnessSettings, doc=__doc__ or "")
