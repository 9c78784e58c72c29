"""The run: discovery -> extraction -> per-document checks -> corpus checks -> decision ->
commit -> report. This module only orders the stages and makes them crash-safe.

:func:`run` is the library entry point behind ``gate run``. It never prints; it tells a
:class:`~gate.commit.Reporter` what happens. Crash safety comes from the order of work:

1. Every document is read once, hashed, staged (``state/blobs``) and extracted in a worker;
   results go to the digest-keyed cache as they arrive, so a killed run loses at most a
   few seconds of extraction. Each one is evaluated (:mod:`gate.evaluation`) as it
   arrives; its record waits in the state (:mod:`gate.record`).
2. The corpus checks (:mod:`gate.corpus`) see the whole batch and the stored corpus.
3. One SQLite transaction records the decisions, the new corpus, the change set and every
   placement still to do (:mod:`gate.commit`). Until it commits, nothing visible has
   changed.
4. Placements are applied idempotently and marked done; report.json and changes.jsonl are
   written atomically; the run is marked complete.

Re-running the same command after a kill finds the unfinished run and completes it.
"""

from __future__ import annotations

import errno
import json
import os
import sqlite3
import time
from dataclasses import dataclass, field
from datetime import UTC, datetime
from pathlib import Path
from typing import Any

from gate import __version__, dates
from gate import manifest as manifest_mod
from gate.checks.base import RunContext
from gate.commit import Output, Reporter, Run, SilentReporter, commit, finish, fingerprint
from gate.corpus import run_corpus_checks
from gate.cluster import executor
from gate.documents import check_documents, params_of
from gate.errors import InboxError, OutputError, StateError
from gate.lock import RunLock
from gate.policy import LoadedPolicy
from gate.state import State, open_state
from gate.work import warm_up



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
    allow_removals: int | None = None  # confirms a full run's large removal (gate.brake)


@dataclass
class RunResult:
    run_id: str
    report_path: Path
    summary: dict[str, Any]
    resumed: bool = False
    seconds: float = 0.0
    timings: dict[str, float] = field(default_factory=dict)  # worker seconds per stage


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
    # read before anything is created, so a bad manifest leaves no empty state/ behind
    manifest = manifest_mod.for_inbox(inbox, opts.manifest)
    try:
        (out / "state").mkdir(parents=True, exist_ok=True)
    except OSError as err:
        raise OutputError(f"cannot create the output folder {opts.out} "
                          f"({err.strerror}).") from None
    if not os.access(out, os.W_OK):
        raise OutputError(f"the output folder {opts.out} is not writable.")
    return inbox, out, manifest


def run(opts: RunOptions, reporter: Reporter | None = None) -> RunResult:
    """Run the gate over an inbox. Raises :class:`~gate.errors.GateError` subclasses for
    anything that stops the run; a document's problems never do."""
    reporter = reporter or SilentReporter()
    started = time.monotonic()
    inbox, out, manifest = _prepare(opts)
    with RunLock(out / "state" / "lock"):
        state = open_state(out / "state" / "gate.sqlite")
        try:
            output = Output(out, state, _open_index(opts, state))
            try:
                result = _run(opts, inbox, manifest, output, reporter)
            finally:
                if output.index is not None:
                    output.index.unlock()
        except OSError as err:
            raise OutputError(_os_message(err, out)) from None
        except sqlite3.OperationalError as err:
            if "full" in str(err):
                raise OutputError(_os_message(OSError(errno.ENOSPC, str(err)), out)) from None
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


def _open_index(opts: RunOptions, state: State) -> Any:
    """The shared Redis index, when --index is given and duplicates are checked."""
    settings = opts.policy.policy.duplicates
    if not opts.index or settings is None:
        return None
    from gate.index import SharedIndex, display_url
    name = opts.index_name or "default"
    index = SharedIndex(opts.index, name, state.meta("folder_id") or "folder",
                        settings.threshold)
    index.lock()
    state.set_meta("index", json.dumps({"url": display_url(opts.index), "name": name,
                                        "threshold": settings.threshold}))
    return index


def _run(opts: RunOptions, inbox: Path, manifest: manifest_mod.Manifest, output: Output,
         reporter: Reporter) -> RunResult:
    state, loaded = output.state, opts.policy
    mode = "incremental" if opts.incremental else "full"
    base = fingerprint(str(inbox), loaded.sha256, manifest.sha256, manifest.source, mode,
                       __version__)
    unfinished = state.unfinished_run()

    def same(run: dict[str, Any]) -> bool:
        return run["info"].get("base") == base and (
            opts.as_of is None or dates.parse_as_of(run["as_of"]) == opts.as_of)

    if unfinished and unfinished["state"] == "decided":
        reporter.note(f"completing the interrupted run {unfinished['run_id']}")
        finish(output, unfinished["run_id"], reporter)
        if same(unfinished):
            return RunResult(unfinished["run_id"], output.out / "report.json",
                             state.run_summary(unfinished["run_id"]), resumed=True)
        unfinished = None
    resume = unfinished if unfinished and same(unfinished) else None
    if unfinished and resume is None:
        state.set_run_state(unfinished["run_id"], "abandoned")
    as_of = dates.parse_as_of(resume["as_of"]) if resume else \
        opts.as_of or datetime.now(UTC).replace(microsecond=0)
    as_of_text = as_of.isoformat().replace("+00:00", "Z")
    if resume:
        run_id, seq = resume["run_id"], resume["seq"]
        reporter.note(f"resuming the interrupted run {run_id}")
    else:
        seq = state.next_seq()
        run_id = f"run-{state.count_runs(False) + 1:04d}"  # reviews are numbered apart
        state.begin_run(run_id, seq, fingerprint(base, as_of_text), as_of_text, mode,
                        {"base": base, "inbox": str(inbox)})
    ctx = RunContext(as_of=as_of)
    timings: dict[str, float] = {}
    releases = state.releases()
    if not opts.cluster:
        warm_up()  # before the workers are forked
    with executor(opts.cluster, opts.workers, params_of(loaded)) as pool:
        _decide(opts, output, reporter, pool, inbox, manifest, run_id, seq, as_of_text,
                mode, ctx, releases, timings, resumed=resume is not None)
    return RunResult(run_id, output.out / "report.json", state.run_summary(run_id),
                     resumed=resume is not None, timings=timings)


def _decide(opts: RunOptions, output: Output, reporter: Reporter, pool: Any, inbox: Path,
            manifest: manifest_mod.Manifest, run_id: str, seq: int, as_of_text: str,
            mode: str, ctx: RunContext, releases: Any, timings: dict[str, float], *,
            resumed: bool) -> None:
    """The stages after the run is begun, with its worker pool (local or the cluster's):
    every document, the corpus checks, the commit and the placements."""
    state, loaded = output.state, opts.policy
    slims = check_documents(inbox, manifest, loaded, output, reporter, ctx, run_id,
                            releases, timings, pool, incremental=opts.incremental,
                            resumed=resumed)
    reporter.stage("comparing", None)
    stored = state.corpus(sketches=opts.incremental and output.index is None)
    corpus = run_corpus_checks(slims, stored, loaded.policy, seq=seq,
                               incremental=opts.incremental, index=output.index,
                               text_of=state.cache_text, releases=releases)
    info = {"id": run_id, "as_of": as_of_text, "mode": mode, "inbox": str(inbox),
            "policy": {"name": loaded.name, "path": loaded.path, "sha256": loaded.sha256,
                       "files": list(loaded.files)},
            "manifest": {"path": manifest.source, "sha256": manifest.sha256,
                         "records": len(manifest.records)}}
    commit(output, Run(run_id, seq, mode, info, opts.allow_removals), slims, corpus, manifest,
           loaded, reporter, pool)
