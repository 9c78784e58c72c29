"""The run: discovery -> extraction -> per-document checks -> corpus checks -> decision ->
commit -> report.

:func:`run` is the library entry point behind ``gate run``. It never prints; it tells a
:class:`Reporter` what happens. Crash safety comes from the order of work:

1. Every document is read once, hashed, staged (``state/blobs``) and extracted in a worker;
   results go to the digest-keyed cache as they arrive, so a killed run loses at most a
   few seconds of extraction.
2. Checks and decisions are computed from the cache only, deterministically, in inbox order.
3. One SQLite transaction records the decisions, the new corpus, the change set and every
   placement still to do. Until it commits, nothing visible has changed.
4. Placements are applied idempotently and marked done; report.json and changes.jsonl are
   written atomically; the run is marked complete.

Re-running the same command after a kill finds the unfinished run and completes it.
"""

from __future__ import annotations

import errno
import hashlib
import json
import os
import sqlite3
import time
from dataclasses import dataclass, field
from datetime import UTC, datetime
from pathlib import Path
from typing import Any, Protocol

from gate import __version__, audit, containers, dates
from gate import manifest as manifest_mod
from gate.checks import CORPUS_CHECKS, DOCUMENT_CHECKS
from gate.checks import duplicate as duplicate_check
from gate.checks import freshness as freshness_check
from gate.checks import source as source_check
from gate.checks.base import Document, RunContext
from gate.commit import Blobs, Placer, write_atomic
from gate.decide import decide, outcome
from gate.discovery import Entry, walk
from gate.errors import InboxError, OutputError, StateError
from gate.extract.model import Extracted
from gate.cluster import executor
from gate.extract.pool import Failure
from gate.extract.sniff import sniff
from gate.findings import CODES, Finding, internal_error
from gate.intake import Intake, read_entry
from gate.lock import RunLock
from gate.policy import LoadedPolicy
from gate.report import dumps_line, reason_json
from gate.state import State, open_state
from gate.work import Params, warm_up

CACHE_BATCH = 64
PLACE_BATCH = 256


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


@dataclass(frozen=True)
class RunOptions:
    inbox: Path
    policy: LoadedPolicy
    out: Path
    manifest: Path | None = None
    as_of: datetime | None = None
    workers: int = 1
    incremental: bool = False
    cluster: str | None = None  # a Dask scheduler address for the per-document stage
    index: str | None = None  # a redis:// URL for a shared near-duplicate index
    index_name: str | None = None


@dataclass
class Item:
    """One inbox document on its way through the run."""

    index: int
    entry: Entry
    doc_id: str
    intake: Intake
    record: manifest_mod.ManifestRecord | None
    cache_key: str | None = None
    extracted: Extracted | None = None
    measures: dict[str, Any] = field(default_factory=dict)
    measure_errors: dict[str, str] = field(default_factory=dict)
    policy: Any = None  # the effective policy (with per-source overrides), set when checked


@dataclass
class RunResult:
    run_id: str
    report_path: Path
    summary: dict[str, Any]
    resumed: bool = False
    seconds: float = 0.0
    timings: dict[str, float] = field(default_factory=dict)  # worker seconds per stage


def doc_id(path: str) -> str:
    """A document's id: stable for its inbox path, safe as a folder name."""
    raw = path.encode("utf-8", "surrogateescape")
    return hashlib.sha256(b"gate-document\x00" + raw).hexdigest()[:20]


def _inside(child: Path, parent: Path) -> bool:
    try:
        child.relative_to(parent)
    except ValueError:
        return False
    return True


def _prepare(opts: RunOptions) -> tuple[Path, Path, manifest_mod.Manifest]:
    inbox = Path(os.path.abspath(opts.inbox))
    if not inbox.exists():
        raise InboxError(f"the inbox {opts.inbox} does not exist.")
    if not inbox.is_dir():
        raise InboxError(f"the inbox {opts.inbox} is not a folder.")
    try:
        os.listdir(inbox)
    except OSError as err:
        raise InboxError(f"the inbox {opts.inbox} cannot be read ({err.strerror}).") from None
    out = Path(os.path.abspath(opts.out))
    real_inbox, real_out = inbox.resolve(), out.resolve()
    if _inside(real_out, real_inbox):
        raise OutputError(f"the output folder {opts.out} is inside the inbox; gate never "
                          "writes into the inbox. Choose an --out folder outside it.")
    if _inside(real_inbox, real_out):
        raise OutputError(f"the inbox {opts.inbox} is inside the output folder {opts.out}; "
                          "keep them apart.")
    try:
        (out / "state").mkdir(parents=True, exist_ok=True)
    except OSError as err:
        raise OutputError(f"cannot create the output folder {opts.out} "
                          f"({err.strerror}).") from None
    if not os.access(out, os.W_OK):
        raise OutputError(f"the output folder {opts.out} is not writable.")
    if opts.manifest is not None:
        manifest = manifest_mod.load(opts.manifest)
    elif (inbox / "manifest.jsonl").is_file():
        manifest = manifest_mod.load(inbox / "manifest.jsonl")
    else:
        manifest = manifest_mod.EMPTY
    return inbox, out, manifest


def _fingerprint(*parts: Any) -> str:
    return hashlib.sha256(json.dumps(parts, sort_keys=True, default=str).encode()).hexdigest()


def run(opts: RunOptions, reporter: Reporter | None = None) -> RunResult:
    """Run the gate over an inbox. Raises :class:`~gate.errors.GateError` subclasses for
    anything that stops the run; a document's problems never do."""
    reporter = reporter or SilentReporter()
    started = time.monotonic()
    inbox, out, manifest = _prepare(opts)
    with RunLock(out / "state" / "lock"):
        state = open_state(out / "state" / "gate.sqlite")
        try:
            try:
                result = _run_locked(opts, inbox, out, manifest, state, reporter)
            except OSError as err:
                raise OutputError(_os_message(err, out)) from None
            except sqlite3.OperationalError as err:
                if "full" in str(err):
                    raise OutputError(_os_message(OSError(errno.ENOSPC, str(err)), out)) \
                        from None
                raise StateError(f"the state database {out / 'state' / 'gate.sqlite'} "
                                 f"failed: {err}. Re-run the same command; if it fails "
                                 "again, the file may be damaged.") from None
        finally:
            state.close()
    result.seconds = time.monotonic() - started
    return result


def _os_message(err: OSError, out: Path) -> str:
    where = f" ({err.filename})" if err.filename else ""
    if err.errno == errno.ENOSPC:
        return (f"the disk holding {out} is full{where}. Nothing is lost: free some space "
                "and re-run the same command to complete the run.")
    return (f"writing the output failed: {err.strerror or err}{where}. Fix the problem and "
            "re-run the same command; the run resumes where it stopped.")


def _run_locked(opts: RunOptions, inbox: Path, out: Path, manifest: manifest_mod.Manifest,
                state: State, reporter: Reporter) -> RunResult:
    index = _open_index(opts, state, opts.policy)
    try:
        return _run_indexed(opts, inbox, out, manifest, state, reporter, index)
    finally:
        if index is not None:
            index.unlock()


def _run_indexed(opts: RunOptions, inbox: Path, out: Path, manifest: manifest_mod.Manifest,
                 state: State, reporter: Reporter, index: Any) -> RunResult:
    blobs = Blobs(out / "state" / "blobs")
    placer = Placer(out, state, blobs)
    policy = opts.policy
    mode = "incremental" if opts.incremental else "full"
    base = _fingerprint(str(inbox), policy.sha256, manifest.sha256, manifest.source, mode,
                        __version__)
    unfinished = state.unfinished_run()
    if unfinished and unfinished["state"] == "decided":
        reporter.note(f"completing the interrupted run {unfinished['run_id']}")
        _finish(state, placer, blobs, out, unfinished["run_id"], reporter, index)
        if unfinished["info"].get("base") == base and (
                opts.as_of is None or dates.parse_as_of(unfinished["as_of"]) == opts.as_of):
            summary = json.loads(json.dumps(_load_summary(state, unfinished["run_id"])))
            return RunResult(unfinished["run_id"], out / "report.json", summary, resumed=True)
        unfinished = None
    as_of = opts.as_of
    resume = None
    if unfinished and unfinished["info"].get("base") == base and (
            as_of is None or dates.parse_as_of(unfinished["as_of"]) == as_of):
        resume = unfinished
        as_of = dates.parse_as_of(unfinished["as_of"])
    elif unfinished:
        state.set_run_state(unfinished["run_id"], "abandoned")
    if as_of is None:
        as_of = datetime.now(UTC).replace(microsecond=0)
    as_of_text = as_of.isoformat().replace("+00:00", "Z")
    if resume:
        run_id, seq = resume["run_id"], resume["seq"]
        reporter.note(f"resuming the interrupted run {run_id}")
    else:
        seq = state.next_seq()
        run_id = f"run-{seq:04d}"
        state.begin_run(run_id, seq, _fingerprint(base, as_of_text), as_of_text, mode,
                        {"base": base, "inbox": str(inbox)})
    ctx = RunContext(as_of=as_of)
    return _run_body(opts, inbox, out, manifest, state, reporter, policy, placer, blobs,
                     ctx, run_id, seq, mode, as_of_text, resume, index)


def _open_index(opts: RunOptions, state: State, policy: LoadedPolicy) -> Any:
    """The shared Redis index, when --index is given and duplicates are checked."""
    if not opts.index or policy.policy.duplicates is None:
        return None
    from gate.index import SharedIndex, display_url
    index = SharedIndex(opts.index, opts.index_name or "default", state.meta("folder_id") or
                        "folder", policy.policy.duplicates.threshold)
    index.lock()
    state.set_meta("index", json.dumps({"url": display_url(opts.index),
                                        "name": opts.index_name or "default",
                                        "threshold": policy.policy.duplicates.threshold}))
    return index


def stored_index(state: State) -> Any:
    """The shared index this folder last used (for review actions), or None."""
    saved = state.meta("index")
    if not saved:
        return None
    from gate.index import SharedIndex
    info = json.loads(saved)
    return SharedIndex(info["url"], info["name"], state.meta("folder_id") or "folder",
                       info["threshold"])


def _run_body(opts, inbox, out, manifest, state, reporter, policy, placer, blobs, ctx,
              run_id, seq, mode, as_of_text, resume, index) -> RunResult:
    limits = policy.policy.limits
    params = Params(max_pages=limits.max_pages, max_nesting=limits.max_nesting,
                    timeout_s=limits.timeout_s, memory_mb=limits.memory_mb)
    timings: dict[str, float] = {}
    releases = state.releases()
    slims = _extract_and_check(inbox, manifest, params, limits.max_bytes, opts, state, blobs,
                               placer, reporter, timings, policy, ctx, run_id, releases)
    reporter.stage("comparing", None)
    corpus_rows = state.corpus(sketches=mode == "incremental" and index is None)
    removed_rows, superseded = _corpus_checks(slims, corpus_rows, policy.policy, seq, mode,
                                              state, index, releases)
    run_info = {"id": run_id, "as_of": as_of_text, "mode": mode, "inbox": str(inbox),
                "policy": {"name": policy.name, "path": policy.path, "sha256": policy.sha256,
                           "files": list(policy.files)},
                "manifest": {"path": manifest.source, "sha256": manifest.sha256,
                             "records": len(manifest.records)}}
    _commit(state, placer, blobs, out, run_id, seq, run_info, slims, corpus_rows,
            removed_rows, superseded, manifest, policy, mode, reporter, index)
    summary = _load_summary(state, run_id)
    return RunResult(run_id, out / "report.json", summary, resumed=resume is not None,
                     timings=timings)


# -- extraction and per-document checks --------------------------------------------------


@dataclass
class Slim:
    """What stays in memory of a document between its checks and the commit (about a
    kilobyte, mostly its MinHash sketch); everything else waits in the run_docs table."""

    index: int
    doc_id: str
    path: str
    sha256: str | None
    cache_key: str | None
    has_text: bool
    dup: dict[str, Any] | None  # the duplicate check's measures, when there is text
    dup_error: str | None
    trust: int
    date: datetime | None
    candidate: bool  # accepted by the per-document checks
    rule: int | None  # the allow rule whose overrides apply, if any
    extra: list[Finding] = field(default_factory=list)  # corpus findings
    dup_mark: str = "off"


def _extract_and_check(inbox: Path, manifest: manifest_mod.Manifest, params: Params,
                       max_bytes: int, opts: RunOptions, state: State, blobs: Blobs,
                       placer: Placer, reporter: Reporter, timings: dict[str, float],
                       loaded: LoadedPolicy, ctx: RunContext, run_id: str,
                       releases: dict[tuple[str, str], dict[str, str]]) -> list[Slim]:
    """Read, extract, measure and check every document, streaming: each one's full record
    goes to the run_docs table as soon as it is checked, and only its Slim stays here."""
    entries = list(containers.expand(inbox, walk(inbox), manifest))  # WARC, mbox: records
    reporter.stage("extracting", len(entries))
    fingerprint = params.fingerprint()
    known = state.entries()
    slims: list[Slim | None] = [None] * len(entries)
    cache_rows: list[tuple[str, str, dict, dict, str]] = []
    doc_rows: list[tuple[str, int, str]] = []
    state.conn.execute("DELETE FROM run_docs WHERE run_id = ?", (run_id,))

    def flush() -> None:
        if cache_rows:
            state.cache_put_many(cache_rows)
            cache_rows.clear()
        if doc_rows:
            with state.transaction() as conn:
                conn.executemany("INSERT OR REPLACE INTO run_docs (run_id, idx, blob) "
                                 "VALUES (?, ?, ?)", doc_rows)
            doc_rows.clear()

    def checked(item: Item) -> None:
        slim, blob = _evaluate(item, loaded, ctx, releases)
        slims[item.index] = slim
        doc_rows.append((run_id, item.index, json.dumps(blob, sort_keys=True)))
        if len(doc_rows) >= CACHE_BATCH:
            flush()
        reporter.advance(item.entry.path)

    def tasks():
        for index, entry in enumerate(entries):
            if isinstance(entry, containers.Member):
                intake, record = containers.read(inbox, entry, max_bytes, manifest)
            else:
                intake, record = read_entry(inbox, entry, max_bytes), manifest.get(entry.path)
            item = Item(index=index, entry=entry, doc_id=doc_id(entry.path), intake=intake,
                        record=record)
            intake = item.intake
            if intake.problem is not None:
                item.extracted = Extracted(type=None, problem=intake.problem,
                                           problem_detail=intake.detail)
                checked(item)
                continue
            item.cache_key = f"{intake.sha256}:{fingerprint}"
            placed = known.get(item.doc_id)
            # the placed entry's original is reused when it holds these bytes; an entry
            # without one (a file once over limits.max_bytes, now within) needs them staged
            if placed is None or placed[1] != intake.sha256 or \
                    not placer.has_original(placed[0], item.doc_id):
                blobs.put(intake.sha256, intake.data)
            cached = state.cache_meta(item.cache_key)
            if cached is not None:
                item.extracted = Extracted.from_json(cached[0])
                item.measures = cached[1].get("measures", {})
                item.measure_errors = cached[1].get("errors", {})
                intake.data = None
                checked(item)
                continue
            yield item

    if not opts.cluster:
        warm_up()
    with executor(opts.cluster, opts.workers, params) as pool:
        for item, result in pool.run(
                (item, (item.entry.path, item.intake.data, params)) for item in tasks()):
            _absorb(item, result)
            item.intake.data = None
            if isinstance(result, dict):
                for stage, seconds in result.get("timings", {}).items():
                    timings[stage] = timings.get(stage, 0.0) + seconds
            bug = item.measure_errors or (isinstance(result, Failure) and result.kind == "error")
            if not bug:  # a bug in gate is retried on the next run, not remembered
                cache_rows.append((item.cache_key, item.intake.sha256,
                                   item.extracted.to_json(),
                                   {"measures": item.measures, "errors": {}},
                                   result.get("text", "") if isinstance(result, dict) else ""))
            checked(item)
    flush()
    return [slim for slim in slims if slim is not None]


def _absorb(item: Item, result: Any) -> None:
    if isinstance(result, Failure):
        kind = {"timeout": "timeout", "memory": "memory"}.get(result.kind, "crashed")
        detail = result.detail if result.kind != "error" else f"internal error: {result.detail}"
        head = sniff(item.intake.data[:2048]) if item.intake.data else None
        item.extracted = Extracted(type=head.type if head and head.type in
                                   ("pdf", "html", "text") else None,
                                   problem=kind, problem_detail=detail)
        return
    item.extracted = Extracted.from_json(result["extracted"])
    item.measures = result["measures"]
    item.measure_errors = result["measure_errors"]


def _document(item: Item) -> Document:
    assert item.extracted is not None
    return Document(path=item.entry.path, kind=item.entry.kind, size=item.intake.size,
                    sha256=item.intake.sha256, manifest=item.record,
                    extracted=item.extracted, measures=item.measures,
                    link_target=item.entry.link_target)


def effective_policy(document: Document, loaded: LoadedPolicy) -> Any:
    """The policy for one document: the file's, with the matching allow rule's overrides."""
    base = loaded.policy
    if not loaded.by_rule or base.sources is None:
        return base
    return loaded.for_rule(source_check.match(document, base.sources).allowed_by)


def _finding_json(finding: Finding) -> dict[str, Any]:
    return {**finding.to_json(), "action": finding.action}


def _evaluate(item: Item, loaded: LoadedPolicy, ctx: RunContext,
              releases: dict[tuple[str, str], dict[str, str]]) -> tuple[Slim, dict[str, Any]]:
    """Every document check on one document; its Slim and its full record."""
    document = _document(item)
    policy = effective_policy(document, loaded)
    found: list[Finding] = []
    marks: dict[str, str] = {}
    for check in DOCUMENT_CHECKS:
        enabled = check.always_on or getattr(policy, check.section, None) is not None
        result: list[Finding] | None
        if not enabled:
            result = None
        elif check.id in item.measure_errors:
            result = [internal_error(check.id, RuntimeError(item.measure_errors[check.id]))]
        else:
            try:
                result = check.evaluate(document, policy, ctx)
            except Exception as err:  # noqa: BLE001 - a bug in a check fails closed
                result = [internal_error(check.id, err)]
        marks[check.id] = outcome(result, policy, enabled)
        found.extend(result or [])
    _apply_releases(item.intake.sha256, found, releases)
    base = loaded.policy
    match = source_check.match(document, base.sources) if base.sources is not None else None
    chosen = freshness_check.choose(document, ctx)
    dated = chosen is not None and not isinstance(chosen, Finding)
    date = chosen[1].latest if dated else None
    rule = match.allowed_by if policy is not base and match is not None else None
    blob: dict[str, Any] = {
        "path": item.entry.path, "id": item.doc_id, "kind": item.entry.kind,
        "size": item.intake.size, "sha256": item.intake.sha256,
        "link_target": item.entry.link_target, "problem": item.intake.problem,
        "extraction": document.extracted.to_json(),
        "manifest": item.record.to_json() if item.record else None,
        "findings": [_finding_json(f) for f in found], "checks": marks,
        "measures": _public_measures(item.measures), "cache_key": item.cache_key,
        "has_text": document.has_text, "rule": rule,
        "manifest_source": item.record.source_url if item.record else None,
    }
    if match is not None:
        blob["source"] = {"url": match.url, "trust": match.trust,
                          "allowed_by": None if match.allowed_by is None else
                          f"sources.allow[{match.allowed_by}] "
                          f"({source_check.rule_text(base.sources.allow[match.allowed_by])})"}
    if dated:
        blob["date"] = {"value": chosen[1].iso(), "source": chosen[0].source}
    dup = item.measures.get("duplicate")
    slim = Slim(index=item.index, doc_id=item.doc_id, path=item.entry.path,
                sha256=item.intake.sha256, cache_key=item.cache_key,
                has_text=document.has_text,
                dup=dup if document.has_text else None,
                dup_error=item.measure_errors.get("duplicate"),
                trust=match.trust if match is not None else source_check.UNMATCHED_TRUST,
                date=date, candidate=decide(found, policy).decision == "accepted", rule=rule)
    return slim, blob


def _apply_releases(sha256: str | None, found: list[Finding],
                    releases: dict[tuple[str, str], dict[str, str]]) -> None:
    """Findings a reviewer released for these exact bytes become warnings."""
    if not releases:
        return
    for index, finding in enumerate(found):
        release = releases.get((sha256 or "", finding.code))
        if release is None or finding.action == "warn" or CODES[finding.code].fail_closed:
            continue
        found[index] = Finding(
            check=finding.check, code=finding.code,
            message=f"{finding.message} (released by {release['by']} on "
                    f"{release['at'][:10]}: {release['note']})",
            details={**finding.details, "released": release}, action="warn")


# -- corpus checks -----------------------------------------------------------------------


def _corpus_checks(slims: list[Slim], corpus_rows: list[dict], policy: Any, seq: int,
                   mode: str, state: State, index: Any,
                   releases: dict[tuple[str, str], dict[str, str]]):
    """Run the corpus checks; returns (stored rows to remove, superseded stored rows)."""
    in_batch = {slim.doc_id for slim in slims}
    stored = {row["doc_id"]: row for row in corpus_rows}
    removed = [row for row in corpus_rows if row["doc_id"] not in in_batch] \
        if mode == "full" else []
    superseded: dict[str, tuple[dict, Finding]] = {}
    for check in CORPUS_CHECKS:
        settings = getattr(policy, check.section, None)
        if settings is None:
            for slim in slims:
                slim.dup_mark = "off"
            continue
        assert check is duplicate_check.CHECK
        dup_items: list[duplicate_check.Item] = []
        keys: dict[str, str | None] = {}
        for slim in slims:
            if slim.dup_error is not None:
                slim.extra.append(internal_error(check.id, RuntimeError(slim.dup_error)))
                slim.dup_mark = "fail"
                continue
            if slim.dup is None:
                slim.dup_mark = "n/a"
                continue
            keys[slim.doc_id] = slim.cache_key
            small = slim.dup["shingles"] < settings.min_shingles
            dup_items.append(duplicate_check.Item(
                key=slim.doc_id, path=slim.path, sha256=slim.sha256 or "",
                text_sha256=slim.dup["text_sha256"],
                minhash=None if small else slim.dup["minhash"], trust=slim.trust,
                date=slim.date,
                seen=(stored[slim.doc_id]["first_seen"] if slim.doc_id in stored else seq,
                      slim.index),
                in_batch=True, accepted_before=slim.doc_id in stored,
                candidate=slim.candidate))
        if index is not None:
            # only the stored documents that are candidates of this batch, from Redis
            fetched = index.candidates(dup_items, batch_ids=in_batch,
                                       include_own=mode == "incremental")
            for extra_item in fetched:
                if not extra_item.fixed:
                    keys[extra_item.key] = stored[extra_item.key]["cache_key"] \
                        if extra_item.key in stored else None
            dup_items.extend(fetched)
        elif mode == "incremental":
            for row in corpus_rows:
                if row["doc_id"] in in_batch:
                    continue
                keys[row["doc_id"]] = row["cache_key"]
                dup_items.append(duplicate_check.Item(
                    key=row["doc_id"], path=row["path"], sha256=row["sha256"],
                    text_sha256=row["text_sha256"], minhash=row["minhash"],
                    trust=row["trust"],
                    date=datetime.fromisoformat(row["date"]) if row["date"] else None,
                    seen=(row["first_seen"], -1), in_batch=False, accepted_before=True))
        result = duplicate_check.evaluate(
            dup_items, settings,
            text_of=lambda key: state.cache_text(keys[key]) if keys.get(key) else None)
        for slim in slims:
            if slim.dup_mark in ("n/a", "fail"):
                continue
            extra = result.findings.get(slim.doc_id, [])
            _apply_releases(slim.sha256, extra, releases)
            slim.extra.extend(extra)
            slim.dup_mark = outcome(extra, policy, True)
        for key, finding in result.superseded.items():
            superseded[key] = (stored[key], finding)
    return removed, superseded


# -- decision and commit -----------------------------------------------------------------


def _public_measures(measures: dict[str, Any]) -> dict[str, Any]:
    out = {}
    for key, value in measures.items():
        if isinstance(value, dict):
            out[key] = {k: v for k, v in value.items() if not isinstance(v, bytes)}
        else:
            out[key] = value
    return out


def _record(blob: dict[str, Any], decision: Any, marks: dict[str, str],
            run_info: dict[str, Any]) -> dict[str, Any]:
    """Every input the decision used, for the entry's provenance.json / reasons.json."""
    record: dict[str, Any] = {
        "document": {"id": blob["id"], "path": blob["path"], "kind": blob["kind"],
                     "sha256": blob["sha256"], "size": blob["size"],
                     "link_target": blob["link_target"]},
        "extraction": blob["extraction"],
        "manifest": blob["manifest"],
        "policy": {**run_info["policy"], **({"overrides_from": f"sources.allow[{blob['rule']}]"}
                                             if blob["rule"] is not None else {})},
        "checks": marks,
        "decision": decision.decision,
        "reasons": [reason_json(f) for f in decision.reasons],
        "warnings": [reason_json(f) for f in decision.warnings],
        "measures": blob["measures"],
        "gate": {"version": __version__},
    }
    for key in ("source", "date"):
        if key in blob:
            record[key] = blob[key]
    return record


def _report_entry(blob: dict[str, Any], decision: Any, marks: dict[str, str],
                  location: str, change: str) -> dict[str, Any]:
    extraction = blob["extraction"]
    entry: dict[str, Any] = {
        "path": blob["path"],
        "id": blob["id"],
        "decision": decision.decision,
        "reasons": [reason_json(f) for f in decision.reasons],
        "warnings": [reason_json(f) for f in decision.warnings],
        "checks": marks,
        "sha256": blob["sha256"],
        "size": blob["size"],
        "type": extraction.get("type"),
        "text_chars": extraction.get("text_chars", 0),
        "location": location,
        "change": change,
    }
    for key in ("source", "date"):
        if key in blob:
            entry[key] = blob[key]
    if extraction.get("title"):
        entry["title"] = extraction["title"]
    language = blob["measures"].get("language")
    if language and language.get("languages"):
        entry["language"] = {"code": language["languages"][0][0],
                             "probability": language["languages"][0][1]}
    injection = blob["measures"].get("injection")
    if isinstance(injection, dict) and "score" in injection:
        entry["injection_score"] = injection["score"]
    return entry


def _html_view(entry: dict[str, Any], keep_reasons: bool) -> dict[str, Any]:
    """The small part of a report entry the HTML page draws."""
    view = {k: entry[k] for k in ("path", "id", "decision", "type", "size", "text_chars",
                                  "location", "change", "title", "language",
                                  "injection_score", "source", "checks") if k in entry}
    view["warnings"] = [{"check": w["check"], "code": w["code"], "message": w["message"]}
                        for w in entry["warnings"]]
    view["reasons"] = [{"check": r["check"], "code": r["code"], "message": r["message"],
                        "details": _small(r["details"]) if keep_reasons else {}}
                       for r in entry["reasons"]]
    return view


def _small(details: dict[str, Any]) -> dict[str, Any]:
    out = {}
    for key, value in list(details.items())[:12]:
        if isinstance(value, (str, int, float, bool)) or value is None:
            out[key] = value if not isinstance(value, str) else value[:300]
    return out


def _placement_fingerprint(folder: str, record: dict[str, Any], text_key: str | None) -> str:
    return _fingerprint(folder, record, text_key)


class _ReportWriter:
    """Writes report.json as it goes, with the layout json.dumps(indent=2, sort_keys=True)
    gives, so a run never holds the whole report in memory."""

    def __init__(self, path: Path):
        self.path = path
        path.parent.mkdir(parents=True, exist_ok=True)
        self.fh = open(path, "w", encoding="utf-8")  # noqa: SIM115 - closed in finish()
        self.count = 0

    @staticmethod
    def _dumps(value: Any, indent: int) -> str:
        text = json.dumps(value, indent=2, sort_keys=True, ensure_ascii=False)
        try:
            text.encode("utf-8")
        except UnicodeEncodeError:  # undecodable file names: ASCII escapes
            text = json.dumps(value, indent=2, sort_keys=True)
        return text.replace("\n", "\n" + " " * indent)

    def start(self, cautions: list[str]) -> None:
        self.fh.write('{\n  "cautions": ' + self._dumps(cautions, 2) + ',\n  "documents": [')

    def document(self, entry: dict[str, Any]) -> None:
        self.fh.write(("," if self.count else "") + "\n    " + self._dumps(entry, 4))
        self.count += 1

    def finish(self, rest: dict[str, Any]) -> None:
        self.fh.write("\n  ]," if self.count else "],")
        keys = sorted(rest)
        for number, key in enumerate(keys):
            comma = "," if number < len(keys) - 1 else ""
            self.fh.write(f"\n  {json.dumps(key)}: " + self._dumps(rest[key], 2) + comma)
        self.fh.write("\n}\n")
        self.fh.flush()
        os.fsync(self.fh.fileno())
        self.fh.close()


def _pending(out: Path, run_id: str, suffix: str) -> Path:
    return out / "state" / "pending" / f"report-{run_id}.{suffix}"


def _commit(state: State, placer: Placer, blobs: Blobs, out: Path, run_id: str, seq: int,
            run_info: dict[str, Any], slims: list[Slim], corpus_rows: list[dict],
            removed_rows: list[dict], superseded: dict[str, tuple[dict, Finding]],
            manifest: manifest_mod.Manifest, policy: LoadedPolicy, mode: str,
            reporter: Reporter, index: Any = None) -> None:
    """Decide every document and record it all in one transaction, streaming the
    per-document records from the run_docs table in inbox order."""
    from gate.htmlreport import render
    from gate.report import CAUTIONS, Tally
    reporter.stage("deciding", len(slims))
    stored = {row["doc_id"]: row for row in corpus_rows}
    known = state.entries()
    writer = _ReportWriter(_pending(out, run_id, "json"))
    writer.start(list(CAUTIONS))
    tally = Tally()
    html_docs: list[dict[str, Any]] = []
    held_shown = 0
    seen_ids: dict[str, str] = {}
    change_no = 0
    os.sync()  # the staged blobs must be durable before the decision refers to them
    conn = state.conn
    conn.execute("BEGIN IMMEDIATE")
    try:
        for chunk_start in range(0, len(slims), 500):
            chunk = slims[chunk_start:chunk_start + 500]
            rows = dict(conn.execute(
                "SELECT idx, blob FROM run_docs WHERE run_id = ? AND idx BETWEEN ? AND ?",
                (run_id, chunk[0].index, chunk[-1].index)).fetchall())
            decisions_rows, corpus_upserts, corpus_deletes = [], [], []
            placements, entries_rows, audit_entries, changes = [], [], [], []
            for slim in chunk:
                blob = json.loads(rows[slim.index])
                if slim.doc_id in seen_ids:  # 80-bit ids: a collision is astronomically rare
                    raise OutputError(f"document id collision between "
                                      f"{seen_ids[slim.doc_id]!r} and {slim.path!r}; please "
                                      "report this")
                seen_ids[slim.doc_id] = slim.path
                found = [Finding.from_json(f) for f in blob["findings"]] + slim.extra
                marks = {**blob["checks"], "duplicate": slim.dup_mark}
                decision = decide(found, policy.for_rule(slim.rule))
                record = _record(blob, decision, marks, run_info)
                folder = "accepted" if decision.decision == "accepted" else "quarantine"
                placed = known.get(slim.doc_id)
                status, review = "open", None
                if placed is not None and placed[0] == folder == "quarantine" and \
                        placed[1] == slim.sha256 and placed[3] == "rejected":
                    # a reviewer rejected these bytes: the verdict stands while unchanged
                    status, review = "rejected", placed[4]
                    record["review"] = json.loads(review)
                before = stored.get(slim.doc_id)
                if folder == "accepted":
                    change = "add" if before is None else (
                        "update" if before["sha256"] != slim.sha256 else "unchanged")
                else:
                    change = "remove" if before is not None else "none"
                text_key = slim.cache_key if slim.has_text else None
                fingerprint = _placement_fingerprint(folder, record, text_key)
                if placed is None or placed[0] != folder or placed[2] != fingerprint:
                    payload = {"path": slim.path,
                               "sha256": slim.sha256 if blob["problem"] is None else None,
                               "text_key": text_key, "record": {**record, "run": run_info}}
                    placements.append((run_id, slim.doc_id, folder, json.dumps(payload)))
                date = slim.date.isoformat() if slim.date else None
                entries_rows.append((slim.doc_id, folder, slim.path, slim.sha256,
                                     fingerprint, run_id, slim.cache_key, slim.trust, date,
                                     status, review))
                audit_entries.append({"action": "decision", "run": run_id, "id": slim.doc_id,
                                      "path": slim.path, "sha256": slim.sha256,
                                      "decision": decision.decision,
                                      "codes": sorted({f.code for f in decision.reasons}),
                                      "warnings": sorted({f.code for f in decision.warnings})})
                entry = _report_entry(blob, decision, marks, f"{folder}/{slim.doc_id}", change)
                writer.document(entry)
                tally.add(entry)
                keep = decision.decision == "accepted" or held_shown < 5000
                held_shown += decision.decision != "accepted"
                html_docs.append(_html_view(entry, keep))
                decisions_rows.append((run_id, slim.path, slim.doc_id, decision.decision,
                                       json.dumps(entry, sort_keys=True)))
                if folder == "accepted":
                    dup = slim.dup or {}
                    corpus_upserts.append((
                        slim.doc_id, slim.path, slim.sha256, dup.get("text_sha256"),
                        dup.get("minhash"), slim.trust, date,
                        before["first_seen"] if before else seq, run_id, folder,
                        slim.cache_key or "",
                        (blob.get("source") or {}).get("url") or blob["manifest_source"]))
                    if change in ("add", "update"):
                        changes.append({"action": change, "run": run_id, "id": slim.doc_id,
                                        "path": slim.path, "sha256": slim.sha256,
                                        "text": f"accepted/{slim.doc_id}/text.txt"})
                elif before is not None:
                    corpus_deletes.append(slim.doc_id)
                    changes.append({"action": "remove", "run": run_id, "id": slim.doc_id,
                                    "path": slim.path, "sha256": before["sha256"],
                                    "why": "quarantined in this run"})
            _write_rows(conn, run_id, decisions_rows, corpus_upserts, corpus_deletes,
                        placements, entries_rows, changes, change_no, chunk_start == 0)
            change_no += len(changes)
            audit.append(conn, audit_entries)
            for slim in chunk:
                reporter.advance(slim.path)
        removed_report, tail_rows = _removals(run_id, run_info, removed_rows, superseded)
        placements, entries_rows, audit_entries, changes, corpus_deletes = tail_rows
        _write_rows(conn, run_id, [], [], corpus_deletes, placements, entries_rows, changes,
                    change_no, not slims)
        conn.executemany("DELETE FROM entries WHERE doc_id = ?",
                         [(row["doc_id"],) for row in removed_rows])
        unmatched = sorted(set(manifest.records) - set(seen_ids.values()) -
                           {containers.container_of(p) for p in seen_ids.values()})
        summary = tally.summary(removed_report)
        audit_entries.append({"action": "run", "run": run_id, "as_of": run_info["as_of"],
                              "mode": mode, "policy": run_info["policy"],
                              "summary": summary})
        run_info = {**run_info, "audit_head": audit.append(conn, audit_entries)}
        if index is not None:
            run_info["index"] = {"url": index.url, "name": index.name}
        rest = {"gate": {"version": __version__}, "manifest_unmatched": unmatched,
                "removed": removed_report, "run": run_info, "summary": summary}
        writer.finish(rest)
        html = render({**rest, "documents": html_docs, "cautions": list(CAUTIONS)})
        html_path = _pending(out, run_id, "html")
        html_path.write_text(html, encoding="utf-8")
        conn.execute("UPDATE runs SET state = 'decided', summary = ? WHERE run_id = ?",
                     (json.dumps(summary, sort_keys=True), run_id))
    except BaseException:
        conn.execute("ROLLBACK")
        raise
    conn.execute("COMMIT")
    _finish(state, placer, blobs, out, run_id, reporter, index)


def _write_rows(conn: Any, run_id: str, decisions_rows: list, corpus_upserts: list,
                corpus_deletes: list, placements: list, entries_rows: list, changes: list,
                first_change: int, first: bool) -> None:
    if first:  # a resumed run starts its rows afresh
        conn.execute("DELETE FROM placements WHERE run_id = ?", (run_id,))
        conn.execute("DELETE FROM changes WHERE run_id = ?", (run_id,))
    conn.executemany("INSERT OR REPLACE INTO decisions (run_id, path, doc_id, decision, "
                     "record) VALUES (?, ?, ?, ?, ?)", decisions_rows)
    conn.executemany("DELETE FROM corpus WHERE doc_id = ?", [(k,) for k in corpus_deletes])
    conn.executemany("INSERT OR REPLACE INTO corpus (doc_id, path, sha256, text_sha256, "
                     "minhash, trust, date, first_seen, run_id, placed, cache_key, "
                     "source_url) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)", corpus_upserts)
    conn.executemany("INSERT OR REPLACE INTO placements (run_id, doc_id, target, payload) "
                     "VALUES (?, ?, ?, ?)", placements)
    conn.executemany("INSERT OR REPLACE INTO entries (doc_id, folder, path, sha256, "
                     "fingerprint, run_id, cache_key, trust, date, status, review) "
                     "VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)", entries_rows)
    conn.executemany("INSERT INTO changes (run_id, seq, line) VALUES (?, ?, ?)",
                     [(run_id, first_change + i, dumps_line(c)) for i, c in enumerate(changes)])


def _removals(run_id: str, run_info: dict[str, Any], removed_rows: list[dict],
              superseded: dict[str, tuple[dict, Finding]]):
    """Rows for documents leaving the corpus: missing from a full run's inbox, or
    superseded by a newer version."""
    placements, entries_rows, audit_entries, changes, corpus_deletes = [], [], [], [], []
    removed_report: list[dict[str, Any]] = []
    for row in removed_rows:
        corpus_deletes.append(row["doc_id"])
        placements.append((run_id, row["doc_id"], "absent", json.dumps({"path": row["path"]})))
        changes.append({"action": "remove", "run": run_id, "id": row["doc_id"],
                        "path": row["path"], "sha256": row["sha256"],
                        "why": "no longer in the inbox"})
        audit_entries.append({"action": "removal", "run": run_id, "id": row["doc_id"],
                              "path": row["path"], "sha256": row["sha256"],
                              "why": "no longer in the inbox"})
        removed_report.append({"id": row["doc_id"], "path": row["path"], "change": "remove",
                               "why": "no longer in the inbox"})
    for key, (row, finding) in sorted(superseded.items()):
        corpus_deletes.append(key)
        record = {"document": {"id": key, "path": row["path"], "sha256": row["sha256"]},
                  "decision": "quarantined", "reasons": [reason_json(finding)],
                  "policy": run_info["policy"], "gate": {"version": __version__}}
        payload = {"path": row["path"], "sha256": row["sha256"], "text_key": row["cache_key"],
                   "reused": True, "record": {**record, "run": run_info}}
        placements.append((run_id, key, "quarantine", json.dumps(payload)))
        entries_rows.append((key, "quarantine", row["path"], row["sha256"],
                             _placement_fingerprint("quarantine", record, row["cache_key"]),
                             run_id, row["cache_key"], row["trust"], row["date"], "open",
                             None))
        audit_entries.append({"action": "superseded", "run": run_id, "id": key,
                              "path": row["path"], "sha256": row["sha256"],
                              "codes": [finding.code], "keeper": finding.details["keeper"]})
        changes.append({"action": "remove", "run": run_id, "id": key, "path": row["path"],
                        "sha256": row["sha256"], "why": finding.message})
        removed_report.append({"id": key, "path": row["path"], "change": "superseded",
                               "why": finding.message, "location": f"quarantine/{key}"})
    return removed_report, (placements, entries_rows, audit_entries, changes, corpus_deletes)


def _finish(state: State, placer: Placer, blobs: Blobs, out: Path, run_id: str,
            reporter: Reporter, index: Any = None) -> None:
    """Apply the run's outstanding placements, then write the report and change set."""
    reporter.stage("placing", state.pending_count(run_id))
    after = ""
    while batch := state.pending_batch(run_id, after, PLACE_BATCH):
        placer.apply_batch(batch)
        state.mark_placed([(run_id, doc) for doc, _target, _payload in batch])
        for _doc, _target, payload in batch:
            reporter.advance(payload.get("path"))
        after = batch[-1][0]
    if index is not None:
        reporter.stage("indexing", None)
        index.sync(state)
    for suffix in ("json", "html"):  # review actions change the folders but write no report
        pending = _pending(out, run_id, suffix)
        if pending.exists():
            os.replace(pending, out / f"report.{suffix}")
    write_atomic(out / "changes.jsonl",
                 "".join(line + "\n" for line in change_lines(state)).encode("utf-8"))
    placer.empty_trash()
    blobs.clear()
    with state.transaction() as conn:
        conn.execute("UPDATE runs SET state = 'complete' WHERE run_id = ?", (run_id,))
        conn.execute("DELETE FROM placements WHERE run_id = ? AND done = 1", (run_id,))
        conn.execute("DELETE FROM run_docs WHERE run_id = ?", (run_id,))


def change_lines(state: State) -> list[str]:
    """What changes.jsonl holds: the latest run's changes, then those of every review
    action after it, each line naming the run or review that made it."""
    rows = state.conn.execute(
        "SELECT run_id, seq, mode FROM runs WHERE state IN ('decided', 'complete') "
        "ORDER BY seq").fetchall()
    latest = max((seq for _rid, seq, mode in rows if mode != "review"), default=0)
    lines: list[str] = []
    for rid, seq, _mode in rows:
        if seq >= latest:
            lines.extend(state.changes(rid))
    return lines


def _load_summary(state: State, run_id: str) -> dict[str, Any]:
    row = state.conn.execute("SELECT summary FROM runs WHERE run_id = ?", (run_id,)).fetchone()
    return json.loads(row[0]) if row and row[0] else {}
