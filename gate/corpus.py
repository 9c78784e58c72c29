"""The corpus stage: every corpus check over the whole batch and the stored corpus.

Each corpus check (``gate.checks.CORPUS_CHECKS``) is called once with a
:class:`~gate.checks.base.CorpusView`: the batch's documents that have its measured value,
and the corpus accepted in earlier runs. Its findings join the documents' own; the stored
documents it supersedes leave the corpus for quarantine. A corpus check that raises fails
closed: every document it was to judge gets ``<check>.internal-error``.
"""

from __future__ import annotations

from collections.abc import Callable
from dataclasses import dataclass, field
from typing import Any

from gate import checks
from gate.checks.base import CorpusView, Member
from gate.decide import outcome
from gate.evaluation import Releases, apply_releases
from gate.findings import Finding, internal_error
from gate.record import Slim


@dataclass
class CorpusResult:
    """What the corpus stage changes beyond the batch's own documents."""

    stored: list[dict[str, Any]]  # the corpus rows read (gate.state.CORPUS_COLS)
    removed: list[dict[str, Any]] = field(default_factory=list)  # gone from a full run's inbox
    superseded: dict[str, tuple[dict, Finding]] = field(default_factory=dict)  # id -> row


def run_corpus_checks(slims: list[Slim], stored: list[dict[str, Any]], policy: Any, *,
                      seq: int, incremental: bool, index: Any = None,
                      text_of: Callable[[str | None], str | None] | None = None,
                      releases: Releases | None = None) -> CorpusResult:
    """Run every corpus check; sets each Slim's corpus findings and outcomes.

    ``seq`` is this run's sequence number (first-seen order for new documents);
    ``text_of`` reads a text by cache key (for the findings' diffs)."""
    in_batch = {s.doc_id for s in slims}
    by_id = {row["doc_id"]: row for row in stored}
    result = CorpusResult(stored=stored, removed=[] if incremental else
                          [row for row in stored if row["doc_id"] not in in_batch])
    cache_keys = {s.doc_id: s.cache_key for s in slims}

    def text_by_key(key: str) -> str | None:
        cache_key = cache_keys[key] if key in cache_keys else \
            (by_id[key]["cache_key"] if key in by_id else None)
        return text_of(cache_key) if text_of is not None and cache_key else None

    for check in checks.CORPUS_CHECKS:
        settings = getattr(policy, check.section, None)
        members: list[Member] = []
        for s in slims:
            if settings is None:
                s.corpus_marks[check.id] = "off"
            elif check.id in s.corpus_errors:
                s.extra.append(internal_error(check.id, RuntimeError(s.corpus_errors[check.id])))
                s.corpus_marks[check.id] = "fail"
            elif s.corpus_measures.get(check.id) is None:
                s.corpus_marks[check.id] = "n/a"
            else:
                before = by_id.get(s.doc_id)
                members.append(Member(
                    key=s.doc_id, path=s.path, sha256=s.sha256,
                    measured=s.corpus_measures[check.id], trust=s.trust, date=s.date,
                    seen=(before["first_seen"] if before else seq, s.index),
                    accepted_before=before is not None, candidate=s.candidate))
        if settings is None:
            continue
        view = CorpusView(members=members, batch_ids=in_batch, stored=stored,
                          incremental=incremental, index=index, text_of=text_by_key)
        try:
            found = check.evaluate(view, settings)
        except Exception as err:  # noqa: BLE001 - a bug in a check fails closed
            found = None
            bug = internal_error(check.id, err)
        judged = {m.key for m in members}
        for s in slims:
            if s.doc_id not in judged:
                continue
            extra = found.findings.get(s.doc_id, []) if found is not None else [bug]
            apply_releases(s.sha256, extra, releases or {})
            s.extra.extend(extra)
            s.corpus_marks[check.id] = outcome(extra, policy, True)
        for key, finding in (found.superseded.items() if found is not None else ()):
            result.superseded[key] = (by_id[key], finding)
    return result
