"""One document from extraction to placement, as typed values.

:class:`DocRecord` is everything the per-document stage learnt about a document: it is
kept in the ``run_docs`` table between the checks and the commit (so memory does not grow
with the documents' records) and read back by the commit, which builds the report entry,
the provenance record and the placement from it. :class:`Slim` is the part that stays in
memory for the corpus checks (about a kilobyte, mostly the MinHash sketch).
"""

from __future__ import annotations

import json
from dataclasses import dataclass, field
from datetime import datetime
from typing import Any

from gate import checks, redact
from gate.checks import source as source_check
from gate.checks.base import Document
from gate.decide import Decision
from gate.discovery import Entry
from gate.evaluation import Evaluation
from gate.findings import Finding
from gate.intake import Intake


def _finding_json(finding: Finding) -> dict[str, Any]:
    return {**finding.to_json(), "action": finding.action}


def public_measures(measures: dict[str, Any]) -> dict[str, Any]:
    """Measured values without raw bytes (MinHash sketches), for records and reports."""
    out = {}
    for key, value in measures.items():
        if isinstance(value, dict):
            out[key] = {k: v for k, v in value.items() if not isinstance(v, bytes)}
        else:
            out[key] = value
    return out


@dataclass(frozen=True)
class DocRecord:
    """One document's full record after the document checks (see the module docstring)."""

    index: int  # inbox order
    id: str
    path: str
    kind: str
    size: int | None
    sha256: str | None
    link_target: str | None
    problem: str | None  # why intake could not read it, if so
    extraction: dict[str, Any]
    manifest: dict[str, Any] | None
    manifest_source: str | None
    checks: dict[str, str]  # each document check's outcome
    reasons: tuple[Finding, ...]  # the document checks' decision
    warnings: tuple[Finding, ...]
    measures: dict[str, Any]  # public (no bytes)
    cache_key: str | None
    has_text: bool
    rule: int | None  # the allow rule whose overrides apply
    source: dict[str, Any] | None  # url, trust, allowed_by; None without a sources section
    date: dict[str, Any] | None  # value, source; None when undated

    @property
    def decision(self) -> Decision:
        return Decision("quarantined" if self.reasons else "accepted", self.reasons,
                        self.warnings)

    @property
    def source_url(self) -> str | None:
        return (self.source or {}).get("url") or self.manifest_source

    def to_json(self) -> str:
        data = {key: getattr(self, key) for key in self.__dataclass_fields__}
        data["reasons"] = [_finding_json(f) for f in self.reasons]
        data["warnings"] = [_finding_json(f) for f in self.warnings]
        return json.dumps(data, sort_keys=True)

    @classmethod
    def from_json(cls, text: str) -> DocRecord:
        data = json.loads(text)
        data["reasons"] = tuple(Finding.from_json(f) for f in data["reasons"])
        data["warnings"] = tuple(Finding.from_json(f) for f in data["warnings"])
        return cls(**data)


def doc_record(index: int, doc_id: str, entry: Entry, intake: Intake, document: Document,
               evaluation: Evaluation, cache_key: str | None, base_policy: Any) -> DocRecord:
    match, record = evaluation.match, document.manifest
    source = None
    if match is not None:
        allowed = None if match.allowed_by is None else (
            f"sources.allow[{match.allowed_by}] "
            f"({source_check.rule_text(base_policy.sources.allow[match.allowed_by])})")
        source = {"url": match.url, "trust": match.trust, "allowed_by": allowed}
    date = None
    if evaluation.dated is not None:
        claim, stamp = evaluation.dated
        date = {"value": stamp.iso(), "source": claim.source}
    decision = evaluation.decision
    return DocRecord(
        index=index, id=doc_id, path=entry.path, kind=entry.kind, size=intake.size,
        sha256=intake.sha256, link_target=entry.link_target, problem=intake.problem,
        extraction=document.extracted.to_json(),
        manifest=record.to_json() if record else None,
        manifest_source=redact.url(record.source_url) if record else None,
        checks=evaluation.marks, reasons=decision.reasons, warnings=decision.warnings,
        measures=public_measures(dict(document.measures)), cache_key=cache_key,
        has_text=document.has_text, rule=evaluation.rule, source=source, date=date)


@dataclass
class Slim:
    """What stays in memory of a document between its checks and the commit."""

    index: int
    doc_id: str
    path: str
    sha256: str | None
    cache_key: str | None
    trust: int
    date: datetime | None  # the date freshness used (latest instant)
    candidate: bool  # accepted by the document checks
    rule: int | None  # the allow rule whose overrides apply, if any
    corpus_measures: dict[str, Any] = field(default_factory=dict)  # corpus checks' values
    corpus_errors: dict[str, str] = field(default_factory=dict)  # their measure() bugs
    extra: list[Finding] = field(default_factory=list)  # corpus findings
    corpus_marks: dict[str, str] = field(default_factory=dict)  # corpus checks' outcomes


def slim(record: DocRecord, evaluation: Evaluation, document: Document,
         measure_errors: dict[str, str]) -> Slim:
    corpus_ids = [check.id for check in checks.CORPUS_CHECKS]
    return Slim(index=record.index, doc_id=record.id, path=record.path, sha256=record.sha256,
                cache_key=record.cache_key, trust=evaluation.trust, date=evaluation.date,
                candidate=evaluation.decision.decision == "accepted", rule=record.rule,
                corpus_measures={c: document.measures[c] for c in corpus_ids
                                 if document.has_text and c in document.measures},
                corpus_errors={c: measure_errors[c] for c in corpus_ids
                               if c in measure_errors})
