"""Commit: decide every document, record it all in one transaction, then place.

:func:`commit` streams the documents' records back from the state in inbox order, adds the
corpus checks' findings to each one's decision, and records in one SQLite transaction the
decisions, the corpus, the change set, the audit entries and every placement still to do,
while report.json is written beside it (``state/pending/``). :func:`finish` then applies
the placements (:mod:`gate.placement`) and moves the report and changes.jsonl into place.
Until the transaction commits nothing visible has changed; after it, :func:`finish` is what
a later command re-runs to complete an interrupted run or review action.
"""

from __future__ import annotations

import functools
import hashlib
import json
import os
import threading
from collections.abc import Callable, Iterator
from dataclasses import dataclass
from pathlib import Path
from typing import Any, Protocol

from gate import __version__, brake, containers, report
from gate.corpus import CorpusResult
from gate.errors import OutputError
from gate.findings import Finding
from gate.folderpage import render_folder
from gate.manifest import Manifest
from gate.placement import Blobs, Placer, payload_head, write_atomic
from gate.policy import LoadedPolicy
from gate.record import DocRecord, Slim
from gate.state import Rows, State

CHUNK = 500  # documents decided per read of the run_docs table
PLACE_BATCH = 4096  # placements per pair of syncs
BUILD_GROUP = 32  # placements decided before the workers may take them to assemble


class Reporter(Protocol):
    """Receives progress; the CLI draws a bar, tests collect calls."""

    def stage(self, name: str, total: int | None) -> None: ...

    def advance(self, path: str | None = None) -> None: ...

    def note(self, message: str) -> None: ...


class SilentReporter:
    def stage(self, name: str, total: int | None) -> None:
        pass

    def advance(self, path: str | None = None) -> None:
        pass

    def note(self, message: str) -> None:
        pass


def fingerprint(*parts: Any) -> str:
    return hashlib.sha256(json.dumps(parts, sort_keys=True, default=str).encode()).hexdigest()


def placement_fingerprint(folder: str, record: dict[str, Any], text_key: str | None) -> str:
    """What an entry holds: an entry whose fingerprint is unchanged is not rewritten."""
    return fingerprint(folder, record, text_key)


def _placement(folder: str, path: str, sha256: str | None, text_key: str | None,
               prov: dict[str, Any], run_json: str) -> tuple[str, str]:
    """(fingerprint, payload JSON) of a decided document's placement, the record
    serialised once for both: the fingerprint is the bytes :func:`placement_fingerprint`
    hashes (``json.dumps`` of a list joins its items with ", "), and the payload is what
    ``json.dumps`` of ``{path, sha256, text_key, record: {**prov, "run": run_info}}``
    holds, its record's keys sorted (whoever reads it re-sorts them anyway).
    ``run_json``: the run's info as JSON, encoded once a run."""
    prov_json = json.dumps(prov, sort_keys=True, default=str)
    key_json = json.dumps(text_key)
    print_ = hashlib.sha256(f"[{json.dumps(folder)}, {prov_json}, {key_json}]".encode()
                            ).hexdigest()
    payload = (f'{{"path": {json.dumps(path)}, "sha256": {json.dumps(sha256)}, '
               f'"text_key": {key_json}, "record": {prov_json[:-1]}, "run": {run_json}}}}}')
    return print_, payload


@dataclass
class Output:
    """An output folder being written: its state, staged originals, placer and the shared
    near-duplicate index (when one is used)."""

    out: Path
    state: State
    index: Any = None

    def __post_init__(self) -> None:
        self.blobs = Blobs(self.out / "state" / "blobs")
        self.placer = Placer(self.out, self.state, self.blobs)


def stored_index(state: State) -> Any:
    """The shared index this folder last used (for review actions), or None."""
    saved = state.meta("index")
    if not saved:
        return None
    from gate.index import SharedIndex
    info = json.loads(saved)
    return SharedIndex(info["url"], info["name"], state.meta("folder_id") or "folder",
                       info["threshold"])


@dataclass(frozen=True)
class Run:
    """The run being committed: its id, sequence number, mode and what report.json says
    about it under ``run``."""

    id: str
    seq: int
    mode: str  # full | incremental
    info: dict[str, Any]
    allow_removals: int | None = None  # confirms a full run's large removal (gate.brake)

    @functools.cached_property
    def info_json(self) -> str:
        """``info`` as JSON, for every placement's record (:func:`_placement`)."""
        return json.dumps(self.info)


def commit(output: Output, run: Run, slims: list[Slim], corpus: CorpusResult,
           manifest: Manifest, loaded: LoadedPolicy, reporter: Reporter,
           pool: Any = None) -> None:
    """Decide every document and record it all in one transaction, then :func:`finish`."""
    state = output.state
    reporter.stage("deciding", len(slims))
    stored = {row["doc_id"]: row for row in corpus.stored}
    known = state.entries()
    writer = report.ReportWriter(report.pending(output.out, run.id, "json"))
    cautions = report.cautions(manifest.source is not None)
    writer.start(cautions)
    tally = report.Tally()
    seen_ids: dict[str, str] = {}
    change_no = 0

    def decided() -> Iterator[list[tuple[str, str, str]]]:
        """Decide the documents in inbox order, recorded chunk by chunk; yields their
        placements (document id, target, payload) in groups of about BUILD_GROUP, so the
        workers assemble the entries while the next ones are decided."""
        nonlocal change_no
        for start in range(0, len(slims), CHUNK):
            chunk = slims[start:start + CHUNK]
            records = state.run_docs(run.id, chunk[0].index, chunk[-1].index)
            rows = Rows()
            handed = 0
            for slim in chunk:
                if slim.doc_id in seen_ids:  # 80-bit ids: a collision is astronomically rare
                    raise OutputError(f"document id collision between "
                                      f"{seen_ids[slim.doc_id]!r} and {slim.path!r}; please "
                                      "report this")
                seen_ids[slim.doc_id] = slim.path
                entry = _decide_one(DocRecord.from_json(records[slim.index]), slim, run,
                                    loaded, known.get(slim.doc_id), stored.get(slim.doc_id),
                                    rows)
                writer.document(entry)
                tally.add(entry)
                if len(rows.placements) - handed >= BUILD_GROUP:
                    yield [row[1:] for row in rows.placements[handed:]]
                    handed = len(rows.placements)
            state.write(run.id, rows, change_no)
            change_no += len(rows.changes)
            for slim in chunk:
                reporter.advance(slim.path)
            yield [row[1:] for row in rows.placements[handed:]]

    # the staged blobs must be durable before the decision that refers to them commits:
    # flushed in a thread while the documents are decided, waited for before the commit
    syncing = _Background(os.sync)
    # the entries assembled ahead (state/tmp, not visible) are removed if this raises
    with output.placer.ahead() as built, state.transaction():
        state.restart_rows(run.id)
        if pool is None:
            for _group in decided():
                pass
        else:
            output.placer.build_ahead(decided(), pool, built)
        removed_report, rows = _removals(run, corpus)
        for _run_id, doc_id, *_rest in rows.placements:  # placed as these rows say
            built.pop(doc_id, None)
        unmatched = sorted(set(manifest.records) - set(seen_ids.values()) -
                           {containers.container_of(p) for p in seen_ids.values()})
        summary = tally.summary(removed_report)
        brake.check(mode=run.mode, accepted_before=len(stored), inbox_documents=len(slims),
                    removing=sum(summary["changes"].get(k, 0) for k in ("remove", "superseded")),
                    allowed=run.allow_removals)  # raises before anything is committed
        rows.audit.append({"action": "run", "run": run.id, "as_of": run.info["as_of"],
                           "mode": run.mode, "policy": run.info["policy"],
                           "summary": summary})
        run_info = {**run.info, "audit_head": state.write(run.id, rows, change_no)}
        if output.index is not None:
            run_info["index"] = {"url": output.index.url, "name": output.index.name}
        rest = {"gate": {"version": __version__}, "manifest_unmatched": unmatched,
                "removed": removed_report, "run": run_info, "summary": summary}
        writer.finish(rest)
        state.put_report_rest(run.id, {**rest, "cautions": cautions})
        state.mark_decided(run.id, summary)
        syncing.join()  # before the transaction commits
    finish(output, run.id, reporter, pool, built)


def _decide_one(record: DocRecord, slim: Slim, run: Run, loaded: LoadedPolicy,
                placed: tuple | None, before: dict[str, Any] | None, rows: Rows
                ) -> dict[str, Any]:
    """One document's final decision and the rows it adds; returns its report entry."""
    decision = record.decision.extend(slim.extra, loaded.for_rule(slim.rule))
    marks = {**record.checks, **slim.corpus_marks}
    prov = report.provenance(record, decision, marks, run.info)
    folder = "accepted" if decision.decision == "accepted" else "quarantine"
    status, review = "open", None
    if placed is not None and placed[0] == folder == "quarantine" and \
            placed[1] == slim.sha256 and placed[3] == "rejected":
        # a reviewer rejected these bytes: the verdict stands while unchanged
        status, review = "rejected", placed[4]
        prov["review"] = json.loads(review)
    if folder == "accepted":
        change = "add" if before is None else (
            "update" if before["sha256"] != slim.sha256 else "unchanged")
    else:
        change = "remove" if before is not None else "none"
    text_key = slim.cache_key if record.has_text else None
    print_, payload = _placement(folder, slim.path,
                                 slim.sha256 if record.problem is None else None, text_key,
                                 prov, run.info_json)
    if placed is None or placed[0] != folder or placed[2] != print_:
        rows.placements.append((run.id, slim.doc_id, folder, payload))
    date = slim.date.isoformat() if slim.date else None
    rows.entries.append((slim.doc_id, folder, slim.path, slim.sha256, print_, run.id,
                         slim.cache_key, slim.trust, date, status, review))
    rows.audit.append({"action": "decision", "run": run.id, "id": slim.doc_id,
                       "path": slim.path, "sha256": slim.sha256,
                       "decision": decision.decision,
                       "codes": sorted({f.code for f in decision.reasons}),
                       "warnings": sorted({f.code for f in decision.warnings})})
    entry = report.entry(record, decision, marks, f"{folder}/{slim.doc_id}", change)
    rows.decisions.append((run.id, slim.path, slim.doc_id, decision.decision,
                           json.dumps(entry, sort_keys=True)))
    if folder == "accepted":
        dup = slim.corpus_measures.get("duplicate") or {}
        rows.corpus_upserts.append((
            slim.doc_id, slim.path, slim.sha256, dup.get("text_sha256"), dup.get("minhash"),
            slim.trust, date, before["first_seen"] if before else run.seq, run.id, folder,
            slim.cache_key or "", record.source_url))
        if change in ("add", "update"):
            rows.changes.append(report.dumps_line(
                {"action": change, "run": run.id, "id": slim.doc_id, "path": slim.path,
                 "sha256": slim.sha256, "text": f"accepted/{slim.doc_id}/text.txt"}))
    elif before is not None:
        rows.corpus_deletes.append(slim.doc_id)
        rows.changes.append(report.dumps_line(
            {"action": "remove", "run": run.id, "id": slim.doc_id, "path": slim.path,
             "sha256": before["sha256"], "why": "quarantined in this run"}))
    return entry


def _removals(run: Run, corpus: CorpusResult) -> tuple[list[dict[str, Any]], Rows]:
    """Rows for documents leaving the corpus: missing from a full run's inbox, or
    superseded by a newer version."""
    rows = Rows()
    removed_report: list[dict[str, Any]] = []
    for row in corpus.removed:
        why = "no longer in the inbox"
        rows.corpus_deletes.append(row["doc_id"])
        rows.entry_deletes.append(row["doc_id"])
        rows.placements.append((run.id, row["doc_id"], "absent",
                                json.dumps({"path": row["path"]})))
        rows.changes.append(report.dumps_line(
            {"action": "remove", "run": run.id, "id": row["doc_id"], "path": row["path"],
             "sha256": row["sha256"], "why": why}))
        rows.audit.append({"action": "removal", "run": run.id, "id": row["doc_id"],
                           "path": row["path"], "sha256": row["sha256"], "why": why})
        removed_report.append({"id": row["doc_id"], "path": row["path"], "change": "remove",
                               "why": why})
    for key, (row, finding) in sorted(corpus.superseded.items()):
        _superseded(run, key, row, finding, rows, removed_report)
    return removed_report, rows


def _superseded(run: Run, key: str, row: dict[str, Any], finding: Finding, rows: Rows,
                removed_report: list[dict[str, Any]]) -> None:
    rows.corpus_deletes.append(key)
    record = {"document": {"id": key, "path": row["path"], "sha256": row["sha256"]},
              "decision": "quarantined", "reasons": [report.reason_json(finding)],
              "policy": run.info["policy"], "gate": {"version": __version__}}
    payload = {"path": row["path"], "sha256": row["sha256"], "text_key": row["cache_key"],
               "reused": True, "record": {**record, "run": run.info}}
    rows.placements.append((run.id, key, "quarantine", json.dumps(payload)))
    rows.entries.append((key, "quarantine", row["path"], row["sha256"],
                         placement_fingerprint("quarantine", record, row["cache_key"]),
                         run.id, row["cache_key"], row["trust"], row["date"], "open", None))
    rows.audit.append({"action": "superseded", "run": run.id, "id": key, "path": row["path"],
                       "sha256": row["sha256"], "codes": [finding.code],
                       "keeper": finding.details["keeper"]})
    rows.changes.append(report.dumps_line(
        {"action": "remove", "run": run.id, "id": key, "path": row["path"],
         "sha256": row["sha256"], "why": finding.message}))
    removed_report.append({"id": key, "path": row["path"], "change": "superseded",
                           "why": finding.message, "location": f"quarantine/{key}"})


def finish(output: Output, run_id: str, reporter: Reporter, pool: Any = None,
           built: dict[str, str] | None = None) -> None:
    """Apply the run's outstanding placements (assembled by ``pool``'s workers when
    given; ``built``: document id -> target of the entries already assembled in
    state/tmp while deciding), then write the report and change set."""
    state, placer = output.state, output.placer
    reporter.stage("placing", state.pending_count(run_id))
    after = ""
    while batch := state.pending_batch(run_id, after, PLACE_BATCH):
        placer.apply_batch(batch, pool, built)
        state.mark_placed([(run_id, doc) for doc, _target, _payload in batch])
        for _doc, _target, payload in batch:
            reporter.advance(payload_head(payload)[0])
        after = batch[-1][0]
    remove = getattr(pool, "remove_tree", None)

    def tidy() -> None:
        placer.empty_trash()
        output.blobs.clear(remove)

    # every placement is durable: the trash and the staged copies go in a thread while
    # the page is rendered (removing files waits on the disk, not on this process's CPU);
    # on a cluster its pool removes them
    tidying = _Background(tidy) if remove is None else None
    if output.index is not None:
        reporter.stage("indexing", None)
        output.index.sync(state)
    waiting = report.pending(output.out, run_id, "json")  # review actions write no report
    if waiting.exists():
        os.replace(waiting, output.out / "report.json")
    page = render_folder(output.out, state)  # the reviewer's page, after every action
    if page is not None:
        write_atomic(output.out / "report.html", page.encode("utf-8"))
    write_atomic(output.out / "changes.jsonl",
                 "".join(line + "\n" for line in state.change_lines()).encode("utf-8"))
    if tidying is None:
        tidy()
    else:
        tidying.join()
    state.complete_run(run_id)


class _Background(threading.Thread):
    """Runs a function in a thread; :meth:`join` waits for it and raises what it raised."""

    def __init__(self, work: Callable[[], None]):
        super().__init__(daemon=True)
        self.work = work
        self.error: BaseException | None = None
        self.start()

    def run(self) -> None:
        try:
            self.work()
        except BaseException as err:  # noqa: BLE001 - raised again in the caller's thread
            self.error = err

    def join(self, timeout: float | None = None) -> None:
        super().join(timeout)
        if self.error is not None:
            raise self.error

