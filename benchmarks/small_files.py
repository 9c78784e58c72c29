"""Per-file overhead: how many tiny documents a second a run gets through.

    .venv/bin/python benchmarks/small_files.py [--docs 5000] [--workers 2] [--profile]

Generates an inbox of tiny invented text notes (one or two sentences each, with a manifest
giving each a source URL, digest and date) under bench-out/small-<N>/, runs gate over it
with every check on (the benchmark policy of benchmarks/corpus.py), and prints documents/s
for the first run and for a second run over the unchanged inbox. The target is at least 500
documents/s on 2 cores. Elapsed rates swing with the machine's load; the CPU time of the
parent and of the workers per document does much less, so each run also prints the rate
that CPU time allows (cores divided by the CPU per document of all processes together),
the parent's CPU by stage and the workers' CPU by extraction step and check.
``--profile`` prints the parent process's top functions (cProfile) for the first run.
``--steps`` also times each step of a worker's loop (reading, staging, extraction and
checks, the verdict, packing, assembling entries, messages) with the thread's CPU clock and
prints them per document; a diagnostic (its wrappers and one small file per message add a
little CPU of their own). The workers' figures are read with the thread's clock because a
pool worker arms a CPU-time timer, and while one is armed the process's clock
(``time.process_time``) lags: short spans read far too small (see gate/work.py).
"""

from __future__ import annotations

import argparse
import hashlib
import json
import os
import resource
import shutil
import sys
import time
from datetime import UTC, datetime
from pathlib import Path

ROOT = Path(__file__).resolve().parent.parent
sys.path.insert(0, str(ROOT))

from benchmarks.corpus import BENCH_POLICY  # noqa: E402
from benchmarks.stages import StageClock  # noqa: E402
from gate.pipeline import RunOptions, run  # noqa: E402
from gate.policy import load_policy  # noqa: E402

AS_OF = datetime(2026, 12, 1, tzinfo=UTC)
WORDS = ("depot timetable freight loading slot driver harbour crane season office monday "
         "notice route platform ticket cargo shift").split()


def make_inbox(root: Path, count: int) -> Path:
    """``count`` tiny notes (invented text) and their manifest; reused when present."""
    inbox = root / "inbox"
    done = root / ".complete"
    if done.exists():
        return inbox
    shutil.rmtree(root, ignore_errors=True)
    inbox.mkdir(parents=True)
    lines = []
    for number in range(count):
        words = [WORDS[(number * 7 + k * 3) % len(WORDS)] for k in range(8 + number % 9)]
        text = (f"Note {number} of the invented Quillby Freight cooperative: "
                + " ".join(words) + ".\n").encode()
        rel = f"notes/{number // 500:03d}/note-{number:05d}.txt"
        (inbox / rel).parent.mkdir(parents=True, exist_ok=True)
        (inbox / rel).write_bytes(text)
        lines.append(json.dumps({"path": rel,
                                 "source_url": f"https://docs.example.org/notes/{number}",
                                 "sha256": hashlib.sha256(text).hexdigest(),
                                 "published_at": "2026-11-01"}))
    (inbox / "manifest.jsonl").write_text("\n".join(lines) + "\n", encoding="utf-8")
    done.touch()
    return inbox


# the worker's steps --steps times: (module, attribute, label)
STEPS = (("gate.intake", "read_path", "reading"), ("gate.intake", "stage", "staging"),
         ("gate.intake", "_with_site", "sniffing"), ("gate.work", "process",
                                                     "extraction and checks"),
         ("gate.judge", "judged", "verdict"), ("gate.intake", "packed", "packing"),
         ("gate.placement", "build_entry", "assembling entries"))


def time_steps(folder: Path) -> None:
    """Wrap the worker's steps (in this process, so forked workers inherit the wrappers)
    and its message loop: each worker adds its step times up and writes them to
    ``folder/steps-<pid>.json`` before each reply."""
    import importlib
    from gate.extract import pool

    spent: dict[str, float] = {}
    clock = time.thread_time

    def wrap(module: str, name: str, label: str) -> None:
        owner = importlib.import_module(module)
        inner = getattr(owner, name)

        def timed_step(*args: object, **kwargs: object) -> object:
            began = clock()
            try:
                return inner(*args, **kwargs)
            finally:
                spent[label] = spent.get(label, 0.0) + clock() - began
        setattr(owner, name, timed_step)

    for module, name, label in STEPS:
        wrap(module, name, label)
    serve = pool._serve

    class Reply:
        """The worker's end of its pipe: the totals are written before each answer."""

        def __init__(self, conn: object):
            self.conn = conn

        def recv(self) -> object:
            began = clock()
            message = self.conn.recv()
            spent["messages"] = spent.get("messages", 0.0) + clock() - began
            return message

        def send(self, value: object) -> None:
            began = clock()
            self.conn.send(value)
            spent["messages"] = spent.get("messages", 0.0) + clock() - began
            spent["worker loop (all)"] = clock()
            (folder / f"steps-{os.getpid()}.json").write_text(json.dumps(spent))

        def close(self) -> None:
            self.conn.close()

    def timed_serve(conn, fn, memory_bytes, cpu_s):  # pool._serve's arguments
        spent.clear()
        serve(Reply(conn), fn, memory_bytes, cpu_s)

    pool._serve = timed_serve


def step_figures(folder: Path, docs: int) -> str:
    """The workers' step times per document, from their files (removed after reading)."""
    total: dict[str, float] = {}
    for path in sorted(folder.glob("steps-*.json")):
        for label, seconds in json.loads(path.read_text()).items():
            total[label] = total.get(label, 0.0) + seconds
        path.unlink()
    return ", ".join(f"{label} {seconds / docs * 1000:.2f} ms"
                     for label, seconds in sorted(total.items(), key=lambda kv: -kv[1]))


# stages workers share: they read, extract and measure while the parent files their
# answers, and assemble the entries while it decides (gate.placement.Placer.build_ahead)
# and places (an entry not assembled ahead)
PARALLEL = ("extracting", "removing site templates", "deciding", "placing")


def _idle_seconds(stages: dict[str, float], workers_cpu: float, cores: int) -> float:
    """Elapsed time the run would take on ``cores`` otherwise idle cores: in the stages
    the workers share the parent overlaps with them; the other stages run in the parent
    alone."""
    shared = sum(stages.get(name, 0.0) for name in PARALLEL)
    rest = sum(spent for name, spent in stages.items() if name not in PARALLEL)
    return max(shared, (shared + workers_cpu) / cores) + rest


def timed(inbox: Path, policy: Path, out: Path, workers: int, cores: int,
          steps: Path | None = None) -> tuple[float, dict]:
    """Run once; print elapsed time, documents/s and CPU time per document (the parent's
    and the workers'), which depends far less than elapsed time on what else the machine
    is doing, and the rate that CPU time allows on ``cores`` cores."""
    opts = RunOptions(inbox=inbox, policy=load_policy(policy), out=out, as_of=AS_OF,
                      workers=workers)
    children = resource.getrusage(resource.RUSAGE_CHILDREN)
    cpu = time.process_time()
    started = time.perf_counter()
    clock = StageClock()
    result = run(opts, clock)
    clock.stage("end", None)
    seconds = time.perf_counter() - started
    parent = time.process_time() - cpu
    after = resource.getrusage(resource.RUSAGE_CHILDREN)
    workers_cpu = (after.ru_utime + after.ru_stime) - (children.ru_utime + children.ru_stime)
    docs = result.summary["documents"]
    idle = _idle_seconds(clock.stages, workers_cpu, workers)
    total = (parent + workers_cpu) / docs
    print(f"  {seconds:6.1f} s, {docs / seconds:7.0f} documents/s; CPU per document: parent "
          f"{parent / docs * 1000:.2f} ms, workers {workers_cpu / docs * 1000:.2f} ms "
          f"(so on {workers} idle cores: about {docs / idle:.0f} documents/s)")
    # what the CPU time alone allows, whatever else the machine was doing: every process
    # of the run sharing the cores, none waiting for another
    print(f"  CPU-time rate: {total * 1000:.2f} ms of CPU per document in all, so at most "
          f"{cores / total:.0f} documents/s on {cores} cores (500/s needs less than "
          f"{cores / 500 * 1000:.1f} ms: some stages run in the parent alone)")
    print("  parent CPU per document by stage: " + clock.per_document(docs))
    print("  elapsed time per document by stage: " + clock.wall_per_document(docs))
    if result.timings:
        print("  worker CPU per document in extraction and measures (work.process): " +
              ", ".join(f"{name} {spent / docs * 1000:.2f} ms"
                        for name, spent in sorted(result.timings.items(),
                                                  key=lambda kv: -kv[1])) +
              f"; outside them (reading, staging, packing, assembling the entries, "
              f"messages, start-up) "
              f"{(workers_cpu - sum(result.timings.values())) / docs * 1000:.2f} ms")
    if steps is not None:
        print("  worker CPU per document by step (thread clock, --steps): " +
              step_figures(steps, docs))
    return seconds, result.summary


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--docs", type=int, default=5000)
    parser.add_argument("--workers", type=int, default=2)
    parser.add_argument("--cores", type=int, default=2,
                        help="cores the CPU-time rate is computed for (default 2)")
    parser.add_argument("--profile", action="store_true")
    parser.add_argument("--steps", action="store_true",
                        help="time each step of the workers' loop (a diagnostic)")
    args = parser.parse_args()
    work = ROOT / "bench-out" / f"small-{args.docs}"
    inbox = make_inbox(work, args.docs)
    policy = work / "policy.yaml"
    policy.write_text(BENCH_POLICY, encoding="utf-8")
    out = work / f"out-{args.workers}"
    shutil.rmtree(out, ignore_errors=True)
    steps = None
    if args.steps:
        steps = work / "steps"
        shutil.rmtree(steps, ignore_errors=True)
        steps.mkdir()
        time_steps(steps)
    print(f"{args.docs} tiny text documents, {args.workers} workers, "
          f"{os.cpu_count()} cores")
    if args.profile:
        import cProfile
        import pstats
        profiler = cProfile.Profile(time.process_time)  # CPU, not waiting
        profiler.enable()
    print("first run (extraction, checks, placement):")
    seconds, summary = timed(inbox, policy, out, args.workers, args.cores, steps)
    if args.profile:
        profiler.disable()
        pstats.Stats(profiler).sort_stats("tottime").print_stats(30)
    print(f"  {summary['accepted']} accepted, {summary['quarantined']} quarantined")
    print("second run (unchanged inbox, cached extraction):")
    timed(inbox, policy, out, args.workers, args.cores, steps)


if __name__ == "__main__":
    main()
