"""Per-file overhead: how many tiny documents a second a run gets through.

    .venv/bin/python benchmarks/small_files.py [--docs 5000] [--workers 2] [--profile]

Generates an inbox of tiny invented text notes (one or two sentences each, with a manifest
giving each a source URL, digest and date) under bench-out/small-<N>/, runs gate over it
with every check on (the benchmark policy of benchmarks/corpus.py), and prints documents/s
for the first run and for a second run over the unchanged inbox. The target is at least 500
documents/s on 2 cores. ``--profile`` prints the parent process's top functions (cProfile)
for the first run.
"""

from __future__ import annotations

import argparse
import hashlib
import json
import os
import shutil
import sys
import time
from datetime import UTC, datetime
from pathlib import Path

ROOT = Path(__file__).resolve().parent.parent
sys.path.insert(0, str(ROOT))

from benchmarks.corpus import BENCH_POLICY  # noqa: E402
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


def timed(inbox: Path, policy: Path, out: Path, workers: int) -> tuple[float, dict]:
    opts = RunOptions(inbox=inbox, policy=load_policy(policy), out=out, as_of=AS_OF,
                      workers=workers)
    started = time.perf_counter()
    result = run(opts)
    return time.perf_counter() - started, result.summary


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--docs", type=int, default=5000)
    parser.add_argument("--workers", type=int, default=2)
    parser.add_argument("--profile", action="store_true")
    args = parser.parse_args()
    work = ROOT / "bench-out" / f"small-{args.docs}"
    inbox = make_inbox(work, args.docs)
    policy = work / "policy.yaml"
    policy.write_text(BENCH_POLICY, encoding="utf-8")
    out = work / f"out-{args.workers}"
    shutil.rmtree(out, ignore_errors=True)
    print(f"{args.docs} tiny text documents, {args.workers} workers, "
          f"{os.cpu_count()} cores")
    if args.profile:
        import cProfile
        import pstats
        profiler = cProfile.Profile()
        profiler.enable()
    seconds, summary = timed(inbox, policy, out, args.workers)
    if args.profile:
        profiler.disable()
        pstats.Stats(profiler).sort_stats("cumulative").print_stats(25)
    print(f"first run : {seconds:6.1f} s, {summary['documents'] / seconds:7.0f} documents/s "
          f"({summary['accepted']} accepted, {summary['quarantined']} quarantined)")
    seconds, summary = timed(inbox, policy, out, args.workers)
    print(f"second run: {seconds:6.1f} s, {summary['documents'] / seconds:7.0f} documents/s "
          "(unchanged inbox, cached extraction)")


if __name__ == "__main__":
    main()
