"""A document's evaluation, done where it was measured.

The per-document checks' ``evaluate()`` read only the document's extraction and measures,
the policy, the run's clock and the reviewer releases, so the worker that measured a
document (a local worker process, or one on a cluster node) can evaluate it and send back
what the coordinator files: the record's JSON and the :class:`~gate.record.Slim` the corpus
checks need. The coordinator then does bookkeeping only.

It is the same function on both sides (:func:`verdict`), on the same values (the
extraction as the coordinator decodes it from the worker's packed result), so decisions
are the same wherever it runs. The coordinator uses a worker's verdict only when it would
evaluate the document on exactly that result; a document measured again (its site's
template removed) or taken from the cache is evaluated on what it was measured with then
(:mod:`gate.documents`).
"""

from __future__ import annotations

from dataclasses import dataclass
from typing import Any

from gate.checks.base import Document, RunContext
from gate.discovery import Entry
from gate.evaluation import Releases, evaluate_document, extraction_of
from gate.intake import Intake
from gate.manifest import ManifestRecord
from gate.policy import LoadedPolicy
from gate.record import Slim, doc_record, slim


@dataclass(frozen=True)
class Judge:
    """What evaluating a document needs besides the document: one per run."""

    loaded: LoadedPolicy
    ctx: RunContext
    releases: Releases
    cache_print: str  # the cache key's second part (gate.work.Params.fingerprint)


@dataclass(frozen=True)
class Subject:
    """A document a worker evaluates once it has measured it."""

    index: int  # inbox order
    doc_id: str
    entry: Entry
    record: ManifestRecord | None
    judge: Judge
    cache_key: str | None = None  # None: the digest the worker finds, with the judge's print
    intake: Intake | None = None  # None: what the worker's own reading found


def document_of(entry: Entry, record: ManifestRecord | None, intake: Intake,
                extracted: Any, measures: dict[str, Any]) -> Document:
    """The document the checks evaluate: what discovery, the manifest and intake know of
    it, with its extraction and measures."""
    return Document(path=entry.path, kind=entry.kind, size=intake.size, sha256=intake.sha256,
                    manifest=record, extracted=extracted, measures=measures,
                    link_target=entry.link_target)


def verdict(index: int, doc_id: str, entry: Entry, intake: Intake, document: Document,
            measure_errors: dict[str, str], cache_key: str | None,
            judge: Judge) -> tuple[str, Slim]:
    """Every document check on ``document``: (its record's JSON, its Slim)."""
    evaluation = evaluate_document(document, judge.loaded, judge.ctx,
                                   measure_errors=measure_errors, releases=judge.releases)
    rec = doc_record(index, doc_id, entry, intake, document, evaluation, cache_key,
                     judge.loaded.policy)
    return rec.to_json(), slim(rec, evaluation, document, measure_errors)


def judged(subject: Subject, intake: Intake, result: dict[str, Any]) -> tuple[str, Slim]:
    """A worker's verdict on its measured ``result`` (packed, as the coordinator gets it;
    ``intake``: the digest and size as the coordinator files them)."""
    intake = subject.intake or intake
    extracted, measures, errors = extraction_of(result, None)
    document = document_of(subject.entry, subject.record, intake, extracted, measures)
    key = subject.cache_key or f"{intake.sha256}:{subject.judge.cache_print}"
    return verdict(subject.index, subject.doc_id, subject.entry, intake, document, errors,
                   key, subject.judge)
