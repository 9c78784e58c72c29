"""Throughput of `gate run`: documents per second on the demo and on a generated corpus.

    .venv/bin/python benchmarks/throughput.py [--docs 2000] [--workers 1 2] [--skip-demo]

Prints, for each configuration: documents, wall time, documents/s, and the time of a second
run over the unchanged inbox (served from the cache). The corpus is generated once into
bench-out/ and reused. Figures vary by about ±20 % on shared VMs: run it more than once.
"""

from __future__ import annotations

import argparse
import os
import shutil
import sys
import time
from datetime import UTC, datetime
from pathlib import Path

ROOT = Path(__file__).resolve().parent.parent
sys.path.insert(0, str(ROOT))

from benchmarks.corpus import BENCH_POLICY, make_corpus  # noqa: E402
from gate.pipeline import RunOptions, run  # noqa: E402
from gate.policy import load_policy  # noqa: E402

AS_OF = datetime(2026, 12, 1, tzinfo=UTC)


def timed_run(inbox: Path, policy: Path, out: Path, workers: int) -> tuple[float, dict]:
    opts = RunOptions(inbox=inbox, policy=load_policy(policy), out=out, as_of=AS_OF,
                      workers=workers)
    started = time.perf_counter()
    result = run(opts)
    return time.perf_counter() - started, result.summary


def bench(label: str, inbox: Path, policy: Path, workers: int, work: Path) -> None:
    out = work / f"out-{label}-{workers}"
    shutil.rmtree(out, ignore_errors=True)
    seconds, summary = timed_run(inbox, policy, out, workers)
    again, _ = timed_run(inbox, policy, out, workers)
    n = summary["documents"]
    print(f"{label:<12} workers={workers}  docs={n:>6}  first run {seconds:7.2f} s "
          f"({n / seconds:6.1f} docs/s)  second run {again:6.2f} s ({seconds / again:5.1f}x "
          f"faster)  accepted={summary['accepted']} quarantined={summary['quarantined']}",
          flush=True)


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--docs", type=int, nargs="+", default=[2000])
    parser.add_argument("--workers", type=int, nargs="+", default=[1, 2])
    parser.add_argument("--skip-demo", action="store_true")
    parser.add_argument("--work", type=Path, default=ROOT / "bench-out")
    args = parser.parse_args()
    args.work.mkdir(parents=True, exist_ok=True)
    print(f"machine: {os.cpu_count()} cores; python {sys.version.split()[0]}")
    if not args.skip_demo:
        for workers in args.workers:
            bench("demo", ROOT / "sample_docs" / "inbox", ROOT / "policies" / "demo.yaml",
                  workers, args.work)
    policy = args.work / "bench-policy.yaml"
    policy.write_text(BENCH_POLICY)
    for n in args.docs:
        started = time.perf_counter()
        inbox = make_corpus(args.work / f"corpus-{n}", n)
        print(f"corpus-{n}: generated in {time.perf_counter() - started:.1f} s")
        for workers in args.workers:
            bench(f"corpus-{n}", inbox, policy, workers, args.work)


if __name__ == "__main__":
    main()
