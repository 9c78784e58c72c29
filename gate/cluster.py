"""Scale-out of the per-document stage on a Dask distributed cluster (``--cluster``).

The parent still discovers, reads and hashes every document (so the bytes checked are the
bytes staged and placed) and still runs every decision; only extraction and measurement,
the expensive part, are shipped to the cluster in batches. On each Dask worker the batch
runs through the same isolated worker pool as locally (its own processes, deadline and
memory cap), so a hostile file costs a ``format`` finding there too, not a Dask worker.
Results are the same values the local pool returns, so decisions are identical.
"""

from __future__ import annotations

import multiprocessing
import os
from collections.abc import Iterable, Iterator
from typing import Any

from gate.errors import UsageError
from gate.extract.pool import Failure, WorkerPool
from gate.work import Params, process

BATCH = 16

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
        # Dask workers run threads: fork a clean interpreter instead of this process
        _POOL = WorkerPool(process, workers=1, timeout_s=params.timeout_s,
                           memory_bytes=params.memory_mb * 1024 * 1024, start_method="spawn")
        _POOL_KEY = key
    return _POOL


def run_batch(batch: list[tuple[int, tuple[str, bytes, Params]]]) -> list[tuple[int, Any]]:
    """Run on a Dask worker: extract and measure a batch, returning (index, result)."""
    if not batch:
        return []
    params = batch[0][1][2]
    return list(_pool(params).run(batch))


class ClusterExecutor:
    """The WorkerPool interface, backed by a Dask cluster at ``address``."""

    def __init__(self, address: str, *, in_flight: int | None = None):
        try:
            from distributed import Client
        except ImportError:
            raise UsageError("--cluster needs the 'distributed' package: pip install "
                             "'gate[cluster]'") from None
        try:
            self.client = Client(address, timeout=20)
        except (OSError, TimeoutError) as err:
            raise UsageError(f"cannot reach the Dask scheduler at {address} ({err}); start "
                             "it, or run without --cluster.") from None
        workers = len(self.client.scheduler_info().get("workers", {}))
        if workers == 0:
            self.client.close()
            raise UsageError(f"the Dask scheduler at {address} has no workers.")
        self.in_flight = in_flight or max(2, 3 * workers)

    def __enter__(self) -> ClusterExecutor:
        return self

    def __exit__(self, *exc: object) -> None:
        self.client.close()

    def run(self, tasks: Iterable[tuple[Any, Any]]) -> Iterator[tuple[Any, Any]]:
        """Yield (tag, result) as batches complete; a lost batch fails closed per document."""
        from distributed import as_completed
        pending = iter(tasks)
        tags: dict[int, Any] = {}
        members: dict[Any, list[int]] = {}
        counter = 0
        futures = as_completed()

        def submit() -> bool:
            nonlocal counter
            batch = []
            for tag, payload in pending:
                tags[counter] = tag
                batch.append((counter, payload))
                counter += 1
                if len(batch) >= BATCH:
                    break
            if not batch:
                return False
            future = self.client.submit(run_batch, batch, pure=False)
            members[future] = [index for index, _payload in batch]
            futures.add(future)
            return True

        while len(members) < self.in_flight and submit():
            pass
        for future in futures:
            indices = members.pop(future)
            try:
                results = future.result()
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
        return ClusterExecutor(cluster)
    return WorkerPool(process, workers=max(1, workers), timeout_s=params.timeout_s,
                      memory_bytes=params.memory_mb * 1024 * 1024,
                      batch_weight=_payload_bytes)


def _payload_bytes(payload: tuple[str, bytes | None, Params]) -> int:
    """How much a task carries: small documents travel to the workers in batches."""
    return len(payload[1] or b"")


def cpu_count() -> int:
    return os.cpu_count() or 1
