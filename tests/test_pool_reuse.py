"""The worker pool keeps its idle workers from one run() to the next: a gate run calls
run() for extraction, for pages without their site template and for every batch of
placements, and forking for each cost a fresh worker's start-up every time (common
practice for process pools: fork once, reuse)."""

from __future__ import annotations

import os

from gate.extract.pool import Failure, WorkerPool


def _pid(_payload: object) -> int:
    return os.getpid()


def _crash(payload: object) -> int:
    if payload == "die":
        os._exit(3)
    return os.getpid()


def test_workers_serve_every_run_of_the_pool():
    with WorkerPool(_pid, workers=2, timeout_s=10, memory_bytes=None) as pool:
        seen = [{pid for _tag, pid in pool.run((n, n) for n in range(40))} for _ in range(4)]
        assert len(pool._workers) <= 2
    first = seen[0]
    assert first and len(first) <= 2
    assert all(pids <= first for pids in seen[1:])  # no new process after the first run


def test_a_worker_lost_between_runs_is_replaced():
    with WorkerPool(_crash, workers=1, timeout_s=10, memory_bytes=None) as pool:
        before = {pid for _tag, pid in pool.run([(0, "ok")])}
        died = dict(pool.run([(1, "die")]))
        assert isinstance(died[1], Failure) and died[1].kind == "crashed"
        after = {pid for _tag, pid in pool.run([(2, "ok"), (3, "ok")])}
        assert after and not after & before
        assert len(pool._workers) == 1
