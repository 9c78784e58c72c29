"""Scale-out: a local run against ``--cluster`` with 1, 2 and 4 Dask workers on loopback.

    .venv/bin/python benchmarks/cluster_scale.py [--docs 600] [--dask 1 2 4]
                                                  [--growth 3] [--no-race]

Generates the benchmark corpus (benchmarks/corpus.py: 80 % HTML pages of 10-100 KB, 10 %
PDFs, 10 % text) under bench-out/, starts redis-server and a Dask scheduler on loopback,
and prints for a local run (``--workers 2``) and for a cluster run with each number of
single-threaded Dask workers (each with the shared Redis index):

* (after a small unmeasured run that warms the Dask workers, as a long-lived cluster is)
  elapsed time, documents/s, and documents/s per core used (a run cannot use more cores
  than the machine has: with 4 Dask workers on 2 cores, it is divided by 2), with the
  cluster's per-core rate as a share of the local one;
* the coordinating ``gate run`` process's CPU per document, in total and by stage
  (all its threads: the Dask client's too), and the CPU of every process of the run per
  document (coordinator, local workers or Dask scheduler and workers with their pools):
  on a shared, busy machine elapsed times say little, CPU per document is the figure
  to compare;
* Redis commands per document and Redis memory per indexed document;
* whether every decision is the local run's.

``--growth N`` then runs N further corpora (other seeds) into the same index from their
own output folders and prints documents/s as the index grows; unless ``--no-race``, two
runs are started at once against one index and the loser must be refused by its lock.
Needs redis-server and the ``dask`` command (``pip install '.[cluster]'``).
"""

from __future__ import annotations

import argparse
import json
import os
import resource
import shutil
import signal
import socket
import sqlite3
import subprocess
import sys
import time
from datetime import UTC, datetime
from pathlib import Path
from typing import Any

ROOT = Path(__file__).resolve().parent.parent
sys.path.insert(0, str(ROOT))

from benchmarks.corpus import BENCH_POLICY, make_corpus  # noqa: E402
from benchmarks.stages import StageClock  # noqa: E402
from gate.pipeline import RunOptions, run  # noqa: E402
from gate.policy import load_policy  # noqa: E402

AS_OF = datetime(2026, 12, 1, tzinfo=UTC)
DASK = Path(sys.executable).with_name("dask")
GATE = Path(sys.executable).with_name("gate")


def _port() -> int:
    with socket.socket() as sock:
        sock.bind(("127.0.0.1", 0))
        return sock.getsockname()[1]


def _wait_port(port: int, seconds: float = 30) -> None:
    deadline = time.monotonic() + seconds
    while time.monotonic() < deadline:
        try:
            with socket.create_connection(("127.0.0.1", port), timeout=1):
                return
        except OSError:
            time.sleep(0.2)
    raise RuntimeError(f"nothing listens on 127.0.0.1:{port}")


# Dask's statistical profiler samples every worker thread 100 times a second; gate's
# tasks wait on their pool, so it only costs CPU; so do the event-loop tick every 20 ms,
# the system monitor every 0.5 s and the memory monitor and work stealing every 0.1 s,
# which gate's few large tasks do not need (README: Larger corpora). Idle, they cost a
# scheduler and a worker about 1.9 % of a core each; 0.3 % with these settings.
DASK_SETTINGS = {"DASK_DISTRIBUTED__WORKER__PROFILE__ENABLED": "False",
                 "DASK_DISTRIBUTED__ADMIN__TICK__INTERVAL": "1s",
                 "DASK_DISTRIBUTED__ADMIN__SYSTEM_MONITOR__INTERVAL": "5s",
                 "DASK_DISTRIBUTED__WORKER__MEMORY__MONITOR_INTERVAL": "1s",
                 "DASK_DISTRIBUTED__SCHEDULER__WORK_STEALING": "False"}


def _start(cmd: list[str], work: Path) -> subprocess.Popen:
    env = {**os.environ, **DASK_SETTINGS}
    return subprocess.Popen(cmd, stdout=subprocess.DEVNULL, stderr=subprocess.DEVNULL,
                            start_new_session=True, cwd=work, env=env)


def _workers(scheduler: str, count: int, work: Path) -> list[subprocess.Popen]:
    """``count`` single-threaded Dask workers without nannies (a nanny cannot be left
    out with --nworkers, so one command each)."""
    return [_start([str(DASK), "worker", scheduler, "--nthreads", "1", "--no-nanny",
                    "--no-dashboard", "--local-directory", str(work)], work)
            for _ in range(count)]


def _stop(proc: subprocess.Popen) -> None:
    try:
        os.killpg(proc.pid, signal.SIGTERM)
        proc.wait(15)
    except (ProcessLookupError, subprocess.TimeoutExpired):
        try:
            os.killpg(proc.pid, signal.SIGKILL)
        except ProcessLookupError:
            pass


def decisions(out: Path) -> dict[str, tuple]:
    report = json.loads((out / "report.json").read_text())
    return {d["path"]: (d["decision"], [r["code"] for r in d["reasons"]],
                        [w["code"] for w in d["warnings"]]) for d in report["documents"]}


class Redis:
    def __init__(self, url: str):
        import redis
        self.client = redis.Redis.from_url(url)

    def commands(self) -> int:
        # INFO itself is one command: the difference of two readings counts one of ours
        return int(self.client.info("stats")["total_commands_processed"])

    def memory(self) -> int:
        return int(self.client.info("memory")["used_memory"])


def _cpu(p) -> float:
    times = p.cpu_times()  # with its reaped children's
    return times.user + times.system + times.children_user + times.children_system


def tree_cpu(procs: list[subprocess.Popen] | None) -> dict[str, float]:
    """CPU seconds used so far by processes (``procs``: the Dask scheduler first, then the
    workers) and their descendants (the workers' pools and fork servers), by role."""
    import psutil
    split = {"scheduler": 0.0, "Dask workers": 0.0, "their pools": 0.0}
    for number, proc in enumerate(procs or ()):
        try:
            root = psutil.Process(proc.pid)
            split["scheduler" if number == 0 else "Dask workers"] += _cpu(root)
            for p in root.children(recursive=True):
                try:
                    split["their pools"] += _cpu(p)
                except psutil.Error:
                    pass
        except psutil.Error:
            pass
    return split


# Finer than the stages: the coordinator's main-thread CPU inside some functions (each
# figure includes the probed functions it calls). Each is (module, class or None, name,
# label); a generator is timed inside its next() calls only.
PROBES = [
    ("gate.cluster", "ClusterExecutor", "run",
     "pool.run on the cluster (Dask submit and results, building the tasks)"),
    ("distributed.client", "Client", "submit", "of which Dask submit"),
    ("distributed.client", "Future", "result", "of which Dask results"),
    ("gate.documents", None, "site_of", "sites of pages"),
    ("gate.documents", None, "doc_id", "document ids"),
    ("gate.documents", None, "verdict", "evaluations here"),
    ("gate.state", "State", "cache_put_packed", "filing cache rows"),
    ("gate.state", "State", "put_run_docs", "filing records"),
    ("gate.state", "State", "cache_meta", "cache look-ups"),
    ("gate.state", "State", "cache_text_z", "cache texts read"),
    ("gate.documents", None, "extraction_of", "answers decoded"),
    ("gate.placement", "Placer", "original_path", "staged copies looked up"),
    ("gate.documents", None, "removal_key", "removal keys"),
    ("gate.state", "State", "run_docs", "records read back"),
    ("gate.documents", None, "learn_quick", "template learning"),
    ("gate.templates", "Removals", "__call__", "template removal sets"),
    ("gate.pipeline", None, "run_corpus_checks", "corpus checks"),
    ("gate.commit", None, "_decide_one", "deciding"),
    ("gate.report", "ReportWriter", "document", "report lines"),
    ("gate.state", "State", "write", "decision rows"),
    ("gate.placement", "Placer", "apply_batch", "placing (with the entries' round trip)"),
    ("gate.index", "SharedIndex", "sync", "index sync"),
    ("gate.commit", None, "render_folder", "folder page"),
    ("gate.placement", "Blobs", "clear", "removing staged copies"),
]


class Probes:
    """Wraps the PROBES while a run is measured, adding up main-thread CPU per label."""

    def __init__(self) -> None:
        self.spent: dict[str, float] = {}
        self.undo: list[tuple[Any, str, Any]] = []

    def __enter__(self) -> Probes:
        import importlib
        import inspect
        for module, cls, name, label in PROBES:
            owner = importlib.import_module(module)
            owner = getattr(owner, cls) if cls else owner
            original = owner.__dict__[name] if cls else getattr(owner, name)
            wrap = self._generator if inspect.isgeneratorfunction(original) else self._plain
            self.undo.append((owner, name, original))
            setattr(owner, name, wrap(original, label))
        return self

    def __exit__(self, *exc: object) -> None:
        for owner, name, original in reversed(self.undo):
            setattr(owner, name, original)

    def _add(self, label: str, seconds: float) -> None:
        self.spent[label] = self.spent.get(label, 0.0) + seconds

    def _plain(self, function: Any, label: str) -> Any:
        def timed(*args: Any, **kwargs: Any) -> Any:
            started = time.thread_time()
            try:
                return function(*args, **kwargs)
            finally:
                self._add(label, time.thread_time() - started)
        return timed

    def _generator(self, function: Any, label: str) -> Any:
        def timed(*args: Any, **kwargs: Any) -> Any:
            inner = function(*args, **kwargs)
            while True:
                started = time.thread_time()
                try:
                    item = next(inner)
                except StopIteration:
                    return
                finally:
                    self._add(label, time.thread_time() - started)
                yield item
        return timed

    def per_document(self, docs: int) -> str:
        return ", ".join(f"{label} {spent / docs * 1000:.2f} ms"
                         for label, spent in self.spent.items())


class GcClock:
    """CPU spent in Python's garbage collector while it is entered, in whichever thread
    of this process the collection ran (a run's, or the Dask client's)."""

    def __init__(self) -> None:
        self.spent = 0.0
        self._began: dict[int, float] = {}

    def _callback(self, phase: str, info: dict) -> None:
        import threading
        me = threading.get_ident()
        if phase == "start":
            self._began[me] = time.thread_time()
        elif me in self._began:
            self.spent += time.thread_time() - self._began.pop(me)

    def __enter__(self) -> GcClock:
        import gc
        gc.callbacks.append(self._callback)
        return self

    def __exit__(self, *exc: object) -> None:
        import gc
        gc.callbacks.remove(self._callback)


def measured(opts: RunOptions, redis: Redis | None, cores_used: int,
             nodes: list[subprocess.Popen] | None = None) -> dict:
    """One run in this process: elapsed, coordinator CPU by stage, Redis costs, and the
    CPU the Dask workers used (``nodes``: their process tree)."""
    clock = StageClock()
    nodes_cpu = tree_cpu(nodes)
    main_cpu = time.thread_time()  # the run's thread, not the Dask client's
    children = resource.getrusage(resource.RUSAGE_CHILDREN)
    commands = redis.commands() if redis else 0
    memory = redis.memory() if redis else 0
    cpu = time.process_time()
    started = time.perf_counter()
    collecting = GcClock()
    with Probes() as probes, collecting:
        result = run(opts, clock)
    clock.stage("end", None)
    seconds = time.perf_counter() - started
    coordinator = time.process_time() - cpu
    main = time.thread_time() - main_cpu
    after = resource.getrusage(resource.RUSAGE_CHILDREN)
    docs = result.summary["documents"]
    nodes_split = {role: (spent - nodes_cpu[role]) / docs * 1e3
                   for role, spent in tree_cpu(nodes).items()} if nodes else {}
    out = {"docs": docs, "seconds": seconds, "main_ms": main / docs * 1e3,
           "nodes_split": nodes_split, "rate": docs / seconds,
           "per_core": docs / seconds / cores_used, "coordinator_ms": coordinator / docs * 1e3,
           "stages": clock.per_document(docs), "probes": probes.per_document(docs),
           "gc_ms": collecting.spent / docs * 1e3,
           "accepted": result.summary["accepted"],
           "local_children_ms": ((after.ru_utime + after.ru_stime) -
                                 (children.ru_utime + children.ru_stime)) / docs * 1e3,
           "nodes_ms": sum(nodes_split.values()),
           "work_ms": sum(result.timings.values()) / docs * 1e3}
    out["total_ms"] = out["coordinator_ms"] + out["local_children_ms"] + out["nodes_ms"]
    with sqlite3.connect(opts.out / "state" / "gate.sqlite") as conn:
        out["result_bytes"] = conn.execute(
            "SELECT AVG(LENGTH(extracted) + LENGTH(measures) + LENGTH(text)) FROM cache"
        ).fetchone()[0] or 0
    texts = opts.out / "state" / "texts"
    out["texts_bytes"] = sum(p.stat().st_size for p in texts.rglob("*") if p.is_file()) \
        / docs if texts.exists() else 0
    if redis:
        out["redis_ops"] = (redis.commands() - commands - 1) / docs
        out["redis_bytes"] = (redis.memory() - memory) / max(1, result.summary["accepted"])
    return out


def show(name: str, m: dict) -> None:
    print(f"{name}: {m['seconds']:6.1f} s, {m['rate']:5.1f} documents/s, "
          f"{m['per_core']:5.1f} per core; coordinator CPU {m['coordinator_ms']:.2f} ms/doc"
          + (f", local worker processes {m['local_children_ms']:.1f} ms/doc"
             if m["local_children_ms"] > 0.05 else "")
          + (f", Dask scheduler and workers (with their pools) {m['nodes_ms']:.1f} ms/doc"
             if m["nodes_ms"] > 0.05 else ""))
    print(f"    CPU of every process of the run: {m['total_ms']:.1f} ms/doc, so "
          f"{1000 / m['total_ms']:.1f} documents per CPU-second")
    print(f"    coordinator CPU by stage: {m['stages']}")
    print(f"    coordinator main thread (the run, without the Dask client's threads): "
          f"{m['main_ms']:.2f} ms/doc")
    print(f"    of which inside (main thread, each with what it calls): {m['probes']}")
    print(f"    garbage collection (any thread of the coordinator): {m['gc_ms']:.2f} ms/doc")
    if m["nodes_split"]:
        print("    Dask CPU by process: " + ", ".join(
            f"{role} {spent:.1f} ms/doc" for role, spent in m["nodes_split"].items()))
    print(f"    extraction and checks inside the workers: {m['work_ms']:.1f} ms/doc (time)")
    print(f"    a worker's answer (the cache row it fills): {m['result_bytes'] / 1024:.1f} KiB"
          " per document" + (f"; texts written by the workers to the shared storage "
                             f"(state/texts), not sent: {m['texts_bytes'] / 1024:.1f} KiB "
                             "per document" if m["texts_bytes"] else ""))
    if "redis_ops" in m:
        print(f"    Redis: {m['redis_ops']:.1f} commands/doc, "
              f"{m['redis_bytes'] / 1024:.1f} KiB per indexed document")


def race(policy: Path, inbox: Path, work: Path, index: str) -> None:
    """Two runs at once into one index from two folders: one runs, the other is refused."""
    procs = []
    for name in ("race-a", "race-b"):
        out = work / name
        shutil.rmtree(out, ignore_errors=True)
        procs.append(subprocess.Popen(
            [str(GATE), "run", str(inbox), "--policy", str(policy), "--out", str(out),
             "--as-of", "2026-12-01T00:00:00Z", "--index", index, "--index-name", "race",
             "--workers", "1"], stdout=subprocess.DEVNULL, stderr=subprocess.PIPE, text=True))
    codes = [(p.wait(), p.stderr.read()) for p in procs]
    refused = [err for code, err in codes if code != 0 and "in use by another gate run" in err]
    print(f"race: exit statuses {[c for c, _ in codes]}; refused by the index lock: "
          f"{len(refused)} (expected 1: the runs do not overlap)")


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--docs", type=int, default=600)
    parser.add_argument("--dask", type=int, nargs="+", default=[1, 2, 4])
    parser.add_argument("--local-workers", type=int, default=2)
    parser.add_argument("--growth", type=int, default=0)
    parser.add_argument("--no-race", action="store_true")
    args = parser.parse_args()
    signal.signal(signal.SIGTERM, lambda *_: sys.exit(1))  # stop the services on the way
    if shutil.which("redis-server") is None or not DASK.exists():
        sys.exit("needs redis-server and the dask command (pip install '.[cluster]')")
    work = ROOT / "bench-out" / f"cluster-{args.docs}"
    work.mkdir(parents=True, exist_ok=True)
    inbox = make_corpus(work / "inbox", args.docs)
    warm = make_corpus(work / "warm", 4 * (os.cpu_count() or 1) * max(args.dask), seed=3)
    policy_path = work / "policy.yaml"
    policy_path.write_text(BENCH_POLICY, encoding="utf-8")
    policy = load_policy(policy_path)
    cores = os.cpu_count() or 1
    size = sum(p.stat().st_size for p in inbox.rglob("*") if p.is_file())
    print(f"{args.docs} documents (benchmarks/corpus.py, {size / args.docs / 1024:.0f} KiB "
          f"each on average), {cores} cores, loopback")
    services = []
    try:
        redis_port, sched_port = _port(), _port()
        services.append(_start(["redis-server", "--port", str(redis_port), "--bind",
                                "127.0.0.1", "--save", "", "--appendonly", "no"], work))
        services.append(_start([str(DASK), "scheduler", "--host", "127.0.0.1", "--port",
                                str(sched_port), "--no-dashboard"], work))
        _wait_port(redis_port)
        _wait_port(sched_port)
        url, scheduler = f"redis://127.0.0.1:{redis_port}/0", f"tcp://127.0.0.1:{sched_port}"
        redis = Redis(url)
        out = work / "out-local"
        shutil.rmtree(out, ignore_errors=True)
        local = measured(RunOptions(inbox=inbox, policy=policy, out=out, as_of=AS_OF,
                                    workers=args.local_workers), None,
                         min(args.local_workers, cores))
        show(f"local --workers {args.local_workers}", local)
        expected = decisions(out)
        for count in args.dask:
            worker = _workers(scheduler, count, work)
            try:
                from distributed import Client
                with Client(scheduler, timeout=30) as client:
                    client.wait_for_workers(count, timeout=120)
                # a long-lived cluster is warm: its workers imported gate and forked their
                # pools' fork servers in an earlier run (a small one here, not measured)
                warm_out = work / "out-warm"
                shutil.rmtree(warm_out, ignore_errors=True)
                run(RunOptions(inbox=warm, policy=policy, out=warm_out, as_of=AS_OF,
                               cluster=scheduler))
                out = work / f"out-dask-{count}"
                shutil.rmtree(out, ignore_errors=True)
                m = measured(RunOptions(inbox=inbox, policy=policy, out=out, as_of=AS_OF,
                                        cluster=scheduler, index=url,
                                        index_name=f"bench-{count}"),
                             redis, min(count, cores), [services[1], *worker])
                show(f"cluster, {count} Dask worker(s)", m)
                same = decisions(out) == expected
                print(f"    per core: {m['per_core'] / local['per_core']:.2f} x local by "
                      f"elapsed time, {local['total_ms'] / m['total_ms']:.2f} x local by CPU "
                      f"per document; decisions identical to local: {same}")
            finally:
                for proc in worker:
                    _stop(proc)
        if args.growth:
            worker = _workers(scheduler, 2, work)
            try:
                for step in range(args.growth):
                    batch = make_corpus(work / f"growth-{step}", args.docs, seed=100 + step)
                    out = work / f"out-growth-{step}"
                    shutil.rmtree(out, ignore_errors=True)
                    m = measured(RunOptions(inbox=batch, policy=policy, out=out, as_of=AS_OF,
                                            cluster=scheduler, index=url,
                                            index_name="growth"), redis, min(2, cores))
                    size = redis.client.hlen("gate:growth:meta")
                    print(f"growth {step + 1}: index holds {size} documents after the run; "
                          f"{m['rate']:.1f} documents/s, coordinator "
                          f"{m['coordinator_ms']:.2f} ms/doc, {m['redis_ops']:.1f} "
                          "Redis commands/doc")
            finally:
                for proc in worker:
                    _stop(proc)
        if not args.no_race:
            race(policy_path, inbox, work, url)
    finally:
        for proc in reversed(services):
            _stop(proc)


if __name__ == "__main__":
    main()
