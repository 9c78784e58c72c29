"""Scale-out of the per-document stage on a Dask distributed cluster (``--cluster``).

The coordinating ``gate run`` process does bookkeeping, not per-document work: it sends
each batch of inbox files by name (:class:`~gate.intake.FileTask`), and on the Dask worker
the files are read, hashed, staged (``state/blobs`` of the output folder) and extracted and
measured there, from storage every node sees at the same path (a shared file system; the
inbox and the output folder must be mounted alike on every node). The per-document checks
are evaluated there too (:mod:`gate.judge`). The coordinator receives each document's
digest with its results (the text already compressed, the cache rows already encoded, the
record and Slim of its evaluation) and files them; the corpus checks, decisions and
placement stay with it, placing the staged bytes the worker checked, so the bytes checked
are the bytes placed and decisions are identical to a local run.

Tasks travel to Dask in batches (BATCH documents or BATCH_BYTES at most, the last ones
split evenly over the workers), so the scheduler and the client handle a few large tasks
rather than one per document.

On each Dask worker a batch runs through the same isolated worker pool as locally (its
own processes, CPU-time limit and memory cap), so a hostile file costs a ``format``
finding there too, not a Dask worker. The pool's processes are forked from a fork server
that loaded the parsers and language profiles once (:mod:`gate.warm`), so a recycled
worker starts warm. Staged copies are flushed to disk by the node that writes them
(a coordinator's sync does not reach another machine's cache), once per batch and file
system (``syncfs``), not per file.

What crosses the coordinator is kept to what it reads: a page measured again once its
site's template is known gets the reference to its first text's file, which its node
reads (:func:`earlier_read`); the answers leave out the measures of documents the node
evaluated and the blocks of pages measured again, and carry block hashes as arrays
(:func:`lighten`), a batch's answers pickled into one buffer (:class:`Answers`); once
the entries are placed, a Dask worker removes the staged copies
(:meth:`ClusterExecutor.remove_tree`).
"""

from __future__ import annotations

import ctypes
import ctypes.util
import dataclasses
import gc
import multiprocessing
import os
import pickle
import shutil
from collections import deque
from collections.abc import Iterable, Iterator
from pathlib import Path
from queue import SimpleQueue
from typing import Any

import numpy as np

from gate.errors import UsageError
from gate.extract.pool import Failure, WorkerPool
from gate.intake import FileTask, StagedTask, work_on
from gate.state import TEXT_INLINE_BELOW, TEXT_REF, StateError, store_text, text_z_of
from gate.work import Params

# A Dask task costs the coordinator's client a few ms of CPU whatever it carries (on
# loopback, loaded: 0.15 ms a document with 64 answers of this size a task, 0.11 with 128;
# with the texts left in the shared storage an answer is a third of its size, and 256 a
# task took the coordinator from 2.11 to 1.78 ms a document, one run each, 1 Dask worker)
BATCH = 256  # tasks per Dask task, at most ...
BATCH_BYTES = 16 << 20  # ... and bytes read by them (sizes discovery saw)
RECYCLE_AFTER = 2000  # tasks per pool process on a node (forked warm, so rarely needed)

# Dask's client records the code around every submit for its dashboard (a walk up the
# stack each time); gate's submits are all the same line
NO_CODE = {"distributed.diagnostics.computations.nframes": 0}

# The client's own periodic work in the coordinator's process (its event loop's tick
# monitor every 20 ms, the scheduler's information every 2 s) for gate's few large tasks,
# a second and 10 s are enough: idle, a client then costs 0.23 ms of CPU a second rather
# than 0.39 (loopback, loaded, one reading of 15 s each)
CLIENT_SETTINGS = {"distributed.admin.tick.interval": "1s",
                   "distributed.admin.system-monitor.interval": "5s",
                   "distributed.client.scheduler-info-interval": "10s"}

GC_THRESHOLDS = (20000, 20, 20)  # the coordinator's collector while a cluster run lasts

_POOL: WorkerPool | None = None
_POOL_KEY: tuple | None = None


def _pool(params: Params) -> WorkerPool:
    """A long-lived isolated pool inside the Dask worker process (one per process)."""
    global _POOL, _POOL_KEY
    key = (params.timeout_s, params.memory_mb)
    me = multiprocessing.current_process()
    if me.daemon:
        # A Dask worker under a nanny is a daemonic process, and multiprocessing refuses
        # children to those. Ours are tied to this process by a pipe (they exit when it
        # closes) and are killed on time-outs, so they cannot outlive it for long.
        me.daemon = False
    if _POOL is None or _POOL_KEY != key:
        if _POOL is not None:
            _POOL.close()
        # Dask workers run threads, so this process is not forked: a fork server (a clean
        # process that has imported gate.warm) forks the pool's processes
        multiprocessing.get_context("forkserver").set_forkserver_preload(["gate.warm"])
        _POOL = WorkerPool(work_on, workers=1, timeout_s=params.timeout_s,
                           memory_bytes=params.memory_mb * 1024 * 1024,
                           start_method="forkserver", recycle_after=RECYCLE_AFTER,
                           batch_weight=payload_bytes)
        _POOL_KEY = key
    return _POOL


class Batch:
    """A Dask task's documents, opaque to Dask (which would otherwise walk every tuple of
    the list looking for references to other tasks) and pickled once, whole."""

    __slots__ = ("items",)

    def __init__(self, items: list[tuple[int, Any]]):
        self.items = items

    def __getstate__(self) -> list[tuple[int, Any]]:
        return self.items

    def __setstate__(self, items: list[tuple[int, Any]]) -> None:
        self.items = items


class Answers:
    """A Dask task's answers, pickled whole into one buffer. Dask pickles a task's result
    with every NumPy array out of band, one frame each, and the coordinator's client then
    reads and decodes each frame apart: the block hashes of a batch's pages
    (:func:`lighten`) made some 1,500 frames of a few hundred bytes for 600 documents,
    most of what the client's thread spent receiving them. In one buffer, they cost one
    read and one ``pickle.loads``."""

    __slots__ = ("items",)

    def __init__(self, items: list[tuple[int, Any]]):
        self.items = items

    def __reduce__(self) -> tuple[Any, tuple[bytes]]:
        return _answers, (pickle.dumps(self.items, protocol=pickle.HIGHEST_PROTOCOL),)


def _answers(blob: bytes) -> Answers:
    return Answers(pickle.loads(blob))


def run_batch(params: Params, batch: Batch | list[tuple[int, Any]],
              texts: str | None = None) -> Answers:
    """Run on a Dask worker: read, extract and measure a batch; (index, result) each.

    ``texts``: the output folder's ``state/texts`` on the shared storage. The texts of the
    results go there (:func:`gate.state.store_text`) and the answer carries a reference
    instead, so a text never passes through the coordinator: it files the reference and
    the entry's assembly reads the file."""
    items = batch.items if isinstance(batch, Batch) else batch
    if not items:
        return Answers([])
    if texts is not None:
        items = [(index, earlier_read(payload, texts)) for index, payload in items]
    results = list(_pool(params).run(items))
    lighten(items, results)
    roots = {root for _index, payload in items if getattr(payload, "sync", False)
             for root in [getattr(payload, "stage_root", None) or getattr(payload, "out", None)]
             if root}
    if texts is not None and keep_texts(texts, results):
        roots.add(texts)
    # staged copies, texts and built entries are durable before the answer: one flush of
    # each file system written to, not of every file (nor of the node's other ones)
    flush(roots)
    return Answers(results)


def earlier_read(payload: Any, texts: str) -> Any:
    """A page measured again without its site's template comes with the text its first
    extraction gave, or (:class:`ClusterExecutor` knowing the output folder's
    ``state/texts``) the reference its cache row holds: read here, on the node, checked
    against its name (:func:`gate.state.text_z_of`), so the text does not pass through
    the coordinator twice. When the file cannot be read or does not match its name,
    the page is extracted without it (the text is then computed again, as the first
    extraction did: the same result at a higher cost)."""
    extra = getattr(payload, "extra", None)
    if not isinstance(payload, StagedTask) or extra is None or extra[1] is None or \
            not extra[1].startswith(TEXT_REF):
        return payload
    try:
        earlier = text_z_of(os.path.dirname(texts), extra[1])
    except StateError:
        return dataclasses.replace(payload, extra=(extra[0], None))
    return dataclasses.replace(payload, extra=(extra[0], earlier))


def lighten(items: list[tuple[int, Any]], results: list[tuple[int, Any]]) -> None:
    """Leave out of ``results`` what the coordinator does not read, and send what it
    reads in a form that costs it less to receive (a Dask client unpickles the answers in
    its own thread of the coordinator's process):

    * a document's measures when the worker evaluated them (``judged``): the coordinator
      files the cache row (which holds them, encoded here) and uses the verdict; it reads
      the measures only to evaluate a document itself;
    * the block summary of a page measured again without its site's template (a
      :class:`~gate.intake.StagedTask` with ``extra``): the coordinator learnt the
      template from the first extraction's blocks and files the cache row, which holds
      them; of a first extraction, the block hashes as 64-bit arrays rather than lists
      of Python integers (what :meth:`gate.templates.Page.of` makes of them anyway);
    * the timings (for benchmarks) added up over the batch, in its first answer.

    Decisions are unchanged: what the coordinator files and decides on is the same."""
    again = {index for index, payload in items if getattr(payload, "extra", None) is not None}
    total: dict[str, float] = {}
    first: dict[str, Any] | None = None
    for index, answer in results:
        result = answer.get("result", answer) if isinstance(answer, dict) else None
        if not isinstance(result, dict) or "cache" not in result:
            continue
        if "judged" in result and result.get("measures"):
            result["measures"] = {}
        blocks = result.get("blocks")
        if blocks:
            if index in again:
                result["blocks"] = {}
            else:
                result["blocks"] = {key: (np.array(value, dtype=np.uint64)
                                          if key in HASH_LISTS else value)
                                    for key, value in blocks.items()}
        for stage, seconds in result.pop("timings", {}).items():
            total[stage] = total.get(stage, 0.0) + seconds
        if first is None:
            first = result
    if first is not None:
        first["timings"] = total


HASH_LISTS = ("main", "other", "nav")  # the block summary's lists of 64-bit hashes


def keep_texts(texts: str, results: list[tuple[int, Any]]) -> bool:
    """Move the compressed texts of ``results`` (as :func:`gate.intake.packed` left them
    in their cache rows) to files under ``texts``, leaving references; a text that cannot
    be written stays in its answer. Whether any was written."""
    wrote = False
    for _index, answer in results:
        if not isinstance(answer, dict):
            continue
        result = answer.get("result", answer)
        row = result.get("cache") if isinstance(result, dict) else None
        if not row or len(row[2]) < TEXT_INLINE_BELOW:
            continue
        try:
            result["cache"] = (row[0], row[1], store_text(texts, row[2]))
        except OSError:
            continue
        wrote = True
    return wrote


def remove_tree(folder: str) -> None:
    shutil.rmtree(folder, ignore_errors=True)


_LIBC: Any = None


def flush(folders: set[str]) -> None:
    """Flush to disk the file systems holding ``folders`` (Linux ``syncfs``; elsewhere, or
    when it fails, every file system with ``os.sync``)."""
    global _LIBC
    if not folders:
        return
    if _LIBC is None:
        name = ctypes.util.find_library("c")
        _LIBC = ctypes.CDLL(name, use_errno=True) if name else False
    syncfs = getattr(_LIBC, "syncfs", None) if _LIBC else None
    done: set[int] = set()
    for folder in sorted(folders):
        try:
            fd = os.open(folder, os.O_RDONLY)
        except OSError:
            continue  # nothing was written there
        try:
            device = os.fstat(fd).st_dev
            if device in done:
                continue
            if syncfs is None or syncfs(fd) != 0:
                os.sync()
                return
            done.add(device)
        finally:
            os.close(fd)


class ClusterExecutor:
    """The WorkerPool interface, backed by a Dask cluster at ``address``."""

    remote = True  # its workers' writes are flushed on their nodes

    def __init__(self, address: str, params: Params, *, in_flight: int | None = None):
        self.params = params
        try:
            from distributed import Client
        except ImportError:
            raise UsageError("--cluster needs the 'distributed' package: pip install "
                             "'gate[cluster]'") from None
        import dask
        try:
            with dask.config.set(CLIENT_SETTINGS):
                self.client = Client(address, timeout=20)
        except (OSError, TimeoutError) as err:
            raise UsageError(f"cannot reach the Dask scheduler at {address} ({err}); start "
                             "it, or run without --cluster.") from None
        workers = len(self.client.scheduler_info().get("workers", {}))
        if workers == 0:
            self.client.close()
            raise UsageError(f"the Dask scheduler at {address} has no workers.")
        self.workers = workers
        self.in_flight = in_flight or max(2, 2 * workers)
        self.texts: str | None = None  # the output folder's state/texts (keep_texts)

    def __enter__(self) -> ClusterExecutor:
        # What this process holds when the run starts (gate's, Dask's and their
        # libraries' modules, the policy) lives through the run: moved out of the
        # garbage collector's sight while it lasts, the collections that the stream of
        # answers triggers do not walk it again and again
        gc.freeze()
        # and the young objects of the stream (answers, records, rows: a few hundred a
        # document, most of them freed within the batch) are collected every 20,000
        # allocations rather than 700 (GC_THRESHOLDS), the older generations more rarely
        self._thresholds = gc.get_threshold()
        gc.set_threshold(*GC_THRESHOLDS)
        return self

    def __exit__(self, *exc: object) -> None:
        gc.set_threshold(*self._thresholds)
        gc.unfreeze()
        self.client.close()

    def remove_tree(self, folder: Path | str) -> None:
        """Remove ``folder`` (the staged copies, once placed) on a Dask worker, which sees
        the same storage: its hundreds of unlinks are no work for the coordinator. Here
        when the cluster cannot (a worker lost on the way)."""
        import dask
        try:
            with dask.config.set(NO_CODE):
                self.client.submit(remove_tree, os.fspath(folder), pure=False).result()
        except Exception:  # noqa: BLE001 - done here instead
            remove_tree(os.fspath(folder))

    def run(self, tasks: Iterable[tuple[Any, Any]]) -> Iterator[tuple[Any, Any]]:
        """Yield (tag, result) as batches complete; a lost batch fails closed per document.

        Tasks travel in batches of up to BATCH tasks and BATCH_BYTES, read ahead by a
        window of ``in_flight`` batches; once the tasks run out, what is left is split
        evenly over the workers, so they finish together instead of one worker taking
        the last full batch while the others wait."""
        import dask
        pending = iter(tasks)
        ahead: deque[tuple[Any, Any]] = deque()
        exhausted = False
        tags: dict[int, Any] = {}
        members: dict[Any, list[int]] = {}
        counter = 0
        # finished tasks, in the order they finish: put there by Dask's callback thread,
        # waited for without a time-out (Dask's as_completed wakes up ten times a second
        # to look, a cost that grows with the length of the run, not its work)
        finished: SimpleQueue[Any] = SimpleQueue()

        def read_ahead() -> None:
            nonlocal exhausted
            while not exhausted and len(ahead) < BATCH * self.in_flight:
                try:
                    ahead.append(next(pending))
                except StopIteration:
                    exhausted = True

        def submit() -> bool:
            nonlocal counter
            read_ahead()
            if not ahead:
                return False
            limit = BATCH
            if exhausted:  # the tail: an even share for each worker
                limit = max(1, min(BATCH, -(-len(ahead) // self.workers)))
            batch = []
            weight = 0
            while ahead and len(batch) < limit and weight < BATCH_BYTES:
                tag, payload = ahead.popleft()
                if self.texts is None and isinstance(payload, FileTask):
                    self.texts = os.path.join(os.path.dirname(payload.stage_root), "texts")
                tags[counter] = tag
                batch.append((counter, payload))
                counter += 1
                weight += payload_bytes(payload)
            with dask.config.set(NO_CODE):
                future = self.client.submit(run_batch, self.params, Batch(batch),
                                            self.texts, pure=False)
            members[future] = [index for index, _payload in batch]
            future.add_done_callback(finished.put)
            return True

        while len(members) < self.in_flight and submit():
            pass
        while members:
            future = finished.get()
            indices = members.pop(future)
            try:
                results = future.result().items
            except Exception as err:  # noqa: BLE001 - the batch's worker was lost
                results = [(i, Failure("crashed", f"the cluster task failed ({err})"))
                           for i in indices]
            for index, result in results:
                yield tags.pop(index), result
            while len(members) < self.in_flight and submit():
                pass


def executor(cluster: str | None, workers: int, params: Params) -> Any:
    """A local isolated pool, or the cluster when an address is given."""
    if cluster:
        return ClusterExecutor(cluster, params)
    return WorkerPool(work_on, workers=max(1, workers), timeout_s=params.timeout_s,
                      memory_bytes=params.memory_mb * 1024 * 1024,
                      batch_weight=payload_bytes)


def payload_bytes(payload: Any) -> int:
    """How much a task carries or reads: small documents travel in batches."""
    if isinstance(payload, tuple):
        return len(payload[1] or b"")
    return payload.size


def cpu_count() -> int:
    return os.cpu_count() or 1
