"""Throughput, scaling, time shares and memory of `gate run` at 2,000 and 20,000 documents.

    .venv/bin/python benchmarks/scale.py [--docs 2000 20000] [--workers 1 2] [--baseline 2000]

On a generated mixed corpus (about 80 % HTML pages of 10-100 KB with boilerplate, 10 %
multi-page PDFs, 10 % plain text; benchmarks/corpus.py) it runs `gate run` as a separate
process, fresh output each time, and prints for each size and worker count: documents per
second, the speed-up of 2 workers over 1, the share of worker time spent in the checks
against extraction, and the peak memory of the whole process tree (parent and workers).
It then runs benchmarks/baseline.py (a plain sequential script doing the same work the
straightforward way) on the first corpus and prints the gate's speed-up over it.
Figures vary by about +-20 % on shared VMs.
"""

from __future__ import annotations

import argparse
import json
import os
import shutil
import subprocess
import sys
import time
from pathlib import Path

ROOT = Path(__file__).resolve().parent.parent
sys.path.insert(0, str(ROOT))

from benchmarks.corpus import BENCH_POLICY, make_corpus  # noqa: E402
from benchmarks.procmem import Sampler  # noqa: E402


def gate_run(inbox: Path, out: Path, policy: Path, workers: int,
             index: str | None = None) -> dict:
    shutil.rmtree(out, ignore_errors=True)
    cmd = [sys.executable, "-m", "gate", "run", str(inbox), "--policy", str(policy), "--out",
           str(out), "--as-of", "2026-12-01T00:00:00Z", "--workers", str(workers), "-q"]
    if index:  # a fresh index name per run, so runs do not see each other's documents
        cmd += ["--index", index, "--index-name", f"bench-{out.name}-{time.time_ns()}"]
    started = time.perf_counter()
    proc = subprocess.Popen(cmd, stdout=subprocess.PIPE, stderr=subprocess.PIPE,
                            env={**os.environ, "GATE_TIMINGS": "1"})
    sampler = Sampler(proc.pid)
    sampler.start()
    stdout, stderr = proc.communicate()
    seconds = time.perf_counter() - started
    peak = sampler.stop()
    peak_pss = sampler.peak_pss
    if proc.returncode != 0:
        raise SystemExit(f"gate run failed: {stderr.decode()}")
    timings = {}
    for line in stderr.decode().splitlines():
        if line.startswith("timings: "):
            timings = json.loads(line[len("timings: "):])
    docs = json.loads((out / "report.json").read_text())["summary"]["documents"]
    return {"seconds": seconds, "docs": docs, "peak": peak, "pss": peak_pss,
            "timings": timings}


def shares(timings: dict) -> str:
    extract = timings.get("extract", 0.0)
    checks = {k: v for k, v in timings.items() if k != "extract"}
    total = sum(checks.values())
    parts = ", ".join(f"{k} {v / extract:.0%}" for k, v in sorted(checks.items(),
                                                                  key=lambda kv: -kv[1]))
    return (f"checks {total / extract:.0%} of extraction time (extraction {extract:.1f} "
            f"worker-s; {parts})")


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--docs", type=int, nargs="+", default=[2000, 20000])
    parser.add_argument("--workers", type=int, nargs="+", default=[1, 2])
    parser.add_argument("--baseline", type=int, default=2000,
                        help="corpus size for the sequential baseline (0: skip)")
    parser.add_argument("--work", type=Path, default=ROOT / "bench-out")
    parser.add_argument("--index", help="run with the near-duplicate index in Redis (URL)")
    args = parser.parse_args()
    args.work.mkdir(parents=True, exist_ok=True)
    policy = args.work / "bench-policy.yaml"
    policy.write_text(BENCH_POLICY)
    print(f"machine: {os.cpu_count()} cores, python {sys.version.split()[0]}"
          + (f"; near-duplicate index in Redis at {args.index}" if args.index else ""),
          flush=True)
    results: dict[tuple[int, int], dict] = {}
    for n in args.docs:
        inbox = make_corpus(args.work / f"corpus-{n}", n)
        for workers in args.workers:
            r = gate_run(inbox, args.work / f"scale-{n}-{workers}", policy, workers, args.index)
            results[(n, workers)] = r
            print(f"{n:>6} docs, {workers} worker(s): {r['seconds']:7.1f} s, "
                  f"{r['docs'] / r['seconds']:6.1f} docs/s, peak memory "
                  f"{r['pss'] / 2**20:5.0f} MiB PSS ({r['peak'] / 2**20:5.0f} MiB RSS summed); "
                  f"{shares(r['timings'])}", flush=True)
        if (n, 1) in results and (n, 2) in results:
            speedup = results[(n, 1)]["seconds"] / results[(n, 2)]["seconds"]
            print(f"{n:>6} docs: 2 workers are {speedup:.2f}x one worker (goal >= 1.7x)",
                  flush=True)
    sizes = sorted({n for n, _w in results})
    if len(sizes) >= 2:
        for workers in args.workers:
            small, large = results[(sizes[0], workers)], results[(sizes[-1], workers)]
            print(f"peak memory {sizes[-1]} vs {sizes[0]} documents, {workers} worker(s): "
                  f"{large['pss'] / small['pss']:.2f}x PSS, {large['peak'] / small['peak']:.2f}x "
                  "RSS summed (goal within 1.3x)", flush=True)
    if args.baseline:
        inbox = make_corpus(args.work / f"corpus-{args.baseline}", args.baseline)
        from benchmarks.baseline import run as baseline_run
        count, seconds = baseline_run(inbox)
        print(f"baseline (plain sequential script): {count} docs in {seconds:.1f} s "
              f"({count / seconds:.1f} docs/s)", flush=True)
        best = max(args.workers)
        if (args.baseline, best) in results:
            gate_s = results[(args.baseline, best)]["seconds"]
            print(f"gate with {best} workers is {seconds / gate_s:.2f}x the baseline "
                  f"(goal >= 2.5x)", flush=True)


if __name__ == "__main__":
    main()
