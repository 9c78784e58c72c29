"""The per-document stage of a run: every inbox document read once (:mod:`gate.intake`),
staged, extracted and measured in a worker or found in the digest-keyed cache, then
evaluated (:mod:`gate.evaluation`; by the worker that measured it when it can, see
:mod:`gate.judge`). Each document's :class:`~gate.record.DocRecord` goes
to the state at once; only its :class:`~gate.record.Slim` stays in memory for the corpus
checks.

Site templates (:mod:`gate.templates`) sit between extraction and the checks. A document
without a site (no usable ``source_url``) is evaluated as its result arrives. A page of a
site waits, as its block hashes only, until every page of the batch is extracted; then
each site's template is learnt from the batch (and, in an incremental run, the stored
corpus), and a page holding template blocks is extracted again with them removed, so the
checks measure, and the indexer receives, the page's own text. That result is cached
under the digest key plus the name of the removed set, so a resumed run, or a run whose
batch teaches the same template, reuses it, and a different template never does.
"""

from __future__ import annotations

import hashlib
import os
import time
import zlib
from dataclasses import dataclass, field
from pathlib import Path
from typing import Any

from gate import containers
from gate.checks.base import RunContext
from gate.commit import Output, Reporter
from gate.discovery import Entry, walk
from gate.evaluation import Releases, extraction_of
from gate.extract.model import Extracted
from gate.extract.pool import Failure
from gate.intake import FileTask, Intake, StagedTask, read_entry
from gate.judge import Judge, Subject, document_of, verdict
from gate.manifest import Manifest, ManifestRecord
from gate.policy import LoadedPolicy
from gate.record import Slim
from gate.state import dumps
from gate.templates import Page, Removals, learn_quick, removal_key, site_of, stored_pages
from gate.work import Params

CACHE_BATCH = 64  # results written to the cache and the state per transaction, at least
CACHE_PAUSE_S = 0.5  # ... and seconds between two writes (each ends in an fsync)


def doc_id(path: str) -> str:
    """A document's id: stable for its inbox path, safe as a folder name."""
    raw = path.encode("utf-8", "surrogateescape")
    return hashlib.sha256(b"gate-document\x00" + raw).hexdigest()[:20]


def params_of(loaded: LoadedPolicy) -> Params:
    limits = loaded.policy.limits
    return Params(max_pages=limits.max_pages, max_nesting=limits.max_nesting,
                  timeout_s=limits.timeout_s, memory_mb=limits.memory_mb)



def largest_first(items: list[Any], size: Any) -> list[int]:
    """The positions of ``items`` in the order the workers take them: the largest first
    (``size`` of an item: bytes, None for unknown, which go last), ties in their own
    order. A document's cost grows with its size, so the last ones to finish are small
    and the workers finish a pass together rather than one waiting for a large page
    taken last. Only the order of the work changes: every result is filed by its
    document's position."""
    return sorted(range(len(items)), key=lambda i: -(size(items[i]) or 0))


@dataclass
class _Item:
    """One inbox document on its way from intake to its evaluation."""

    index: int
    entry: Entry
    intake: Intake
    record: ManifestRecord | None = None
    cache_key: str | None = None
    extracted: Extracted | None = None
    measures: dict[str, Any] = field(default_factory=dict)
    measure_errors: dict[str, str] = field(default_factory=dict)
    site: str | None = None  # the host whose template it may carry (gate.templates)
    page: Page | None = None  # the page's blocks, while it waits for its site's template
    measured: bool = False  # measured at once (no template assumed), while it waits
    hint: str | None = None  # its digest in the last run
    cached: tuple[dict, dict] | None = None  # that digest's cache entry, if usable
    judged: tuple[str, Slim] | None = None  # a worker's verdict on its measures (gate.judge)


def check_documents(inbox: Path, manifest: Manifest, loaded: LoadedPolicy, output: Output,
                    reporter: Reporter, ctx: RunContext, run_id: str, releases: Releases,
                    timings: dict[str, float], pool: Any, *, incremental: bool = False,
                    resumed: bool = False) -> list[Slim]:
    """Read, extract, measure and evaluate every document: each one's record goes to the
    state as soon as it is evaluated, and only its Slim stays in memory (pages of a site
    wait for its template as block hashes, see the module docstring). ``timings`` gathers
    the workers' seconds per stage (for benchmarks). ``pool`` is the run's
    (:func:`gate.cluster.executor`).

    The workers read, hash and stage the inbox files themselves (:class:`FileTask`); this
    process only files what they return. A document whose digest in the last run is in
    the cache is read and hashed by a worker but not extracted while the digest holds. In
    a resumed run, a document new to the folder is first only read, hashed and staged, so
    what the killed run extracted is taken from the cache; the rest is extracted from the
    staged copy."""
    state = output.state
    params = params_of(loaded)
    max_bytes = loaded.policy.limits.max_bytes
    entries = list(containers.expand(inbox, walk(inbox), manifest))  # WARC, mbox: records
    reporter.stage("extracting", len(entries))
    cache_print = params.fingerprint()
    known = state.entries()
    slims: list[Slim | None] = [None] * len(entries)
    cache_rows: list[tuple[str, str, str, str, bytes]] = []
    doc_rows: list[tuple[str, int, str]] = []
    state.clear_run_docs(run_id)
    stage_root = str(output.blobs.root)
    judge = Judge(loaded, ctx, releases, cache_print)

    flushed = [time.monotonic()]

    def flush() -> None:
        flushed[0] = time.monotonic()
        if cache_rows:
            state.cache_put_packed(cache_rows)
            cache_rows.clear()
        if doc_rows:
            state.put_run_docs(doc_rows)
            doc_rows.clear()

    def evaluated(item: _Item) -> None:
        """Its record and Slim: the worker's verdict when it evaluated these measures."""
        assert item.extracted is not None
        if item.judged is None:
            document = document_of(item.entry, item.record, item.intake, item.extracted,
                                   item.measures)
            item.judged = verdict(item.index, doc_id(item.entry.path), item.entry,
                                  item.intake, document, item.measure_errors,
                                  item.cache_key, judge)
        record_json, slims[item.index] = item.judged
        item.judged = None
        doc_rows.append((run_id, item.index, record_json))
        if len(doc_rows) >= CACHE_BATCH and (time.monotonic() - flushed[0] >= CACHE_PAUSE_S
                                             or len(doc_rows) >= 16 * CACHE_BATCH):
            flush()

    def unread(item: _Item) -> None:
        """A document intake could not read: evaluated on the problem alone."""
        item.extracted = Extracted(type=None, problem=item.intake.problem,
                                   problem_detail=item.intake.detail)
        evaluated(item)

    def subject(item: _Item, cache_key: str | None, intake: Intake | None) -> Subject:
        """The worker evaluates what it measures (gate.judge); the bytes stay here."""
        return Subject(item.index, doc_id(item.entry.path), item.entry, item.record, judge,
                       cache_key, Intake(sha256=intake.sha256, size=intake.size,
                                         problem=intake.problem, detail=intake.detail)
                       if intake is not None else None)

    waiting: list[_Item] = []

    def arrived(item: _Item, blocks: dict[str, list[int]] | None, measured: bool) -> None:
        """A document's extraction is known: evaluate it, or let it wait for its site
        (with its measures when they were taken at once: see :class:`FileTask`)."""
        assert item.extracted is not None
        reporter.advance(item.entry.path)
        if item.site is None or not blocks or item.measure_errors or not item.extracted.ok:
            evaluated(item)
            return
        item.page = Page.of(f"{item.site} {item.extracted.type}", blocks)
        item.measured = measured
        if not measured:
            item.measures = {}  # measured after learning, on the page's own text
            item.judged = None
        waiting.append(item)

    def received(item: _Item, result: Any) -> dict[str, list[int]]:
        """A worker's result, into the cache unless a bug in gate; returns its blocks."""
        item.extracted, item.measures, item.measure_errors = \
            extraction_of(result, item.intake.data)
        item.judged = result.get("judged") if isinstance(result, dict) else None
        item.intake.data = None
        if isinstance(result, dict):
            for stage, seconds in result.get("timings", {}).items():
                timings[stage] = timings.get(stage, 0.0) + seconds
        bug = item.measure_errors or (isinstance(result, Failure) and result.kind == "error")
        blocks = result.get("blocks", {}) if isinstance(result, dict) else {}
        if not bug:  # a bug in gate is retried on the next run, not remembered
            if isinstance(result, dict):
                cache_rows.append((item.cache_key, item.intake.sha256, *result["cache"]))
            else:
                cache_rows.append((item.cache_key, item.intake.sha256,
                                   dumps(item.extracted.to_json()),
                                   dumps({"measures": {}, "errors": {}, "blocks": {},
                                          "measured": True}), zlib.compress(b"", 1)))
            # pages waiting for their site's template are not evaluated yet: their
            # extractions go to the cache as they arrive, not all at the end of the pass
            if len(cache_rows) >= 16 * CACHE_BATCH:
                flush()
        return blocks

    def from_cache(item: _Item, cached: tuple[dict, dict]) -> None:
        item.judged = None
        item.extracted = Extracted.from_json(cached[0])
        item.measures = cached[1].get("measures", {})
        arrived(item, cached[1].get("blocks"), cached[1].get("measured", True))

    def usable(key: str, site: str | None) -> tuple[dict, dict] | None:
        """The cache entry for ``key`` if it serves this document: a page of a site is
        first extracted for its blocks only, and such an entry serves no other document."""
        cached = state.cache_meta(key)
        if cached is not None and (site is not None or cached[1].get("measured", True)):
            return cached
        return None

    def staged_task(item: _Item, extra: tuple | None) -> StagedTask | None:
        source = output.placer.original_path(doc_id(item.entry.path), item.intake.sha256)
        if source is None:
            return None
        return StagedTask(item.entry.path, str(source), item.intake.sha256, params,
                          site=item.site is not None, extra=extra,
                          subject=subject(item, item.cache_key, item.intake))

    def missing(item: _Item) -> None:
        """The staged copy vanished: fail closed."""
        item.extracted = Extracted(type=item.extracted.type if item.extracted else None,
                                   problem="unreadable",
                                   problem_detail="its staged copy is missing")
        evaluated(item)

    again: list[_Item] = []  # read by a worker, to be extracted from the staged copy

    def answered(item: _Item, answer: Any) -> None:
        """What a worker did with a file: its intake, then its result or the cache's."""
        if isinstance(answer, Failure):  # no answer: read it here, to hold it in quarantine
            item.intake = read_entry(inbox, item.entry, max_bytes)
            if item.intake.problem is not None:
                unread(item)
                return
            output.blobs.put(item.intake.sha256, item.intake.data)
            item.cache_key = f"{item.intake.sha256}:{cache_print}"
            arrived(item, received(item, answer), True)
            return
        if answer.get("missing"):
            missing(item)
            return
        if "intake" in answer:
            item.intake = Intake(**answer["intake"])
            if item.intake.problem is not None:
                unread(item)
                return
            item.cache_key = f"{item.intake.sha256}:{cache_print}"
        if "result" in answer:
            result = answer["result"]
            arrived(item, received(item, result), result.get("measured", True))
            return
        cached = item.cached if item.intake.sha256 == item.hint else \
            usable(item.cache_key, item.site)
        item.cached = None
        if cached is not None:
            from_cache(item, cached)
        else:
            again.append(item)

    def tasks():
        for index in largest_first(entries, lambda entry: entry.size):
            entry = entries[index]
            if isinstance(entry, containers.Member):
                intake, record = containers.read(inbox, entry, max_bytes, manifest)
                item = _Item(index=index, entry=entry, intake=intake, record=record,
                             site=site_of(record.source_url if record else None))
                if intake.problem is not None:
                    unread(item)
                    continue
                item.cache_key = f"{intake.sha256}:{cache_print}"
                output.blobs.put(intake.sha256, intake.data)
                cached = usable(item.cache_key, item.site)
                if cached is not None:
                    intake.data = None
                    from_cache(item, cached)
                    continue
                yield item, ((entry.path, intake.data, params) if item.site is None else
                             (entry.path, intake.data, params, None))
                continue
            record = manifest.get(entry.path)
            item = _Item(index=index, entry=entry, intake=Intake(), record=record,
                         site=site_of(record.source_url if record else None))
            if not entry.regular:
                item.intake = Intake(problem="not-regular")
                unread(item)
                continue
            did = doc_id(entry.path)
            placed = known.get(did)
            # the placed entry's original is reused when it holds these bytes; an entry
            # without one (a file once over limits.max_bytes, now within) needs them staged
            holds = placed[1] if placed is not None and placed[1] is not None and \
                output.placer.has_original(placed[0], did) else None
            if placed is not None and placed[1] is not None:
                item.hint = placed[1]
                item.cached = usable(f"{placed[1]}:{cache_print}", item.site)
            yield item, FileTask(
                path=entry.path, full=os.path.join(os.fspath(inbox), entry.fs_path),
                max_bytes=max_bytes, params=params, stage_root=stage_root,
                site=item.site is not None,
                skip=item.hint if item.cached is not None else None, placed=holds,
                probe=resumed and placed is None, sync=getattr(pool, "remote", False),
                size=entry.size or 0, subject=subject(item, None, None))

    def extract_again() -> Any:
        for item in again:
            task = staged_task(item, None)
            if task is None:
                missing(item)
                continue
            yield item, task

    def cleaning(learnt: dict) -> Any:
        """Pages holding template blocks, to be extracted again from the staged bytes."""
        removal = Removals(learnt)
        for at in largest_first(waiting, lambda item: item.intake.size):
            item = waiting[at]
            drop = removal(item.page) if item.page is not None else ()
            if not drop and item.measured:  # measured at once, and nothing to remove
                evaluated(item)
                continue
            cached = usable(item.cache_key, None) if not drop else None
            if cached is not None:
                item.measures = cached[1].get("measures", {})
                item.judged = None
                evaluated(item)
                continue
            # on a cluster, the reference to the text's file: its node reads it there
            earlier = state.cache_text_stored(item.cache_key) if getattr(pool, "texts", None) \
                else state.cache_text_z(item.cache_key)
            key = f"{item.cache_key}:t{removal_key(drop)}" if drop else item.cache_key
            cached = state.cache_meta(key) if drop else None
            if cached is not None:
                item.cache_key = key
                item.extracted = Extracted.from_json(cached[0])
                item.measures = cached[1].get("measures", {})
                item.judged = None
                evaluated(item)
                continue
            item.cache_key = key
            task = staged_task(item, (drop, earlier))
            if task is None:
                missing(item)
                continue
            yield item, task

    for item, answer in pool.run(tasks()):
        answered(item, answer)
    if again:
        for item, answer in pool.run(extract_again()):
            answered(item, answer)
    flush()
    if waiting:
        learnt = learn_quick([item.page for item in waiting if item.page is not None] +
                             (stored_pages(state, {doc_id(e.path) for e in entries})
                              if incremental else []))
        reporter.stage("removing site templates", None)
        for item, answer in pool.run(cleaning(learnt)):
            item.page = None
            if isinstance(answer, dict) and answer.get("missing"):
                missing(item)
                continue
            received(item, answer["result"] if isinstance(answer, dict) else answer)
            evaluated(item)
    flush()
    return [s for s in slims if s is not None]

