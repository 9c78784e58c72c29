"""Crash harness: kill `gate run` with SIGKILL at random moments, re-run, check invariants.

    .venv/bin/python benchmarks/crash.py [--kills 25] [--docs 300] [--seconds 600]

The inbox is a generated corpus plus hostile files (a FlateDecode bomb, a 3,000-page PDF,
a 100,000-level HTML nesting, an encrypted PDF, truncated and random files, links).
After every kill it checks that no half-written entry is visible in accepted/ or
quarantine/; after the final, completing run it checks that every inbox document is in the
report exactly once, in exactly one folder, with the same decision as an uninterrupted run.
It prints kills survived, documents accounted for, hostile files handled, the peak memory
of the whole process tree (RSS summed over parent and workers, an upper bound, sampled
every 50 ms) and wall times.
"""

from __future__ import annotations

import argparse
import json
import os
import random
import shutil
import signal
import subprocess
import sys
import time
from pathlib import Path

ROOT = Path(__file__).resolve().parent.parent
sys.path.insert(0, str(ROOT))

from benchmarks.corpus import BENCH_POLICY, make_corpus, pdf_document  # noqa: E402
from benchmarks.procmem import Sampler  # noqa: E402
from tests.helpers import flate_bomb_pdf, make_pdf  # noqa: E402

HOSTILE = {
    "hostile/bomb.pdf": "format.bomb",
    "hostile/thousands.pdf": "format.too-many-pages",
    "hostile/deep.html": "format.too-deep",
    "hostile/locked.pdf": "format.encrypted",
    "hostile/truncated.pdf": "format.broken",
    "hostile/random.html": "format.unsupported",
    "hostile/empty.txt": "format.empty-file",
    "hostile/link-out.txt": "format.not-regular",
}


def add_hostile(inbox: Path) -> None:
    folder = inbox / "hostile"
    if folder.exists():
        return
    folder.mkdir()
    (folder / "bomb.pdf").write_bytes(flate_bomb_pdf(300_000_000))
    (folder / "thousands.pdf").write_bytes(pdf_document([["a page"]] * 3000))
    (folder / "deep.html").write_bytes(b"<html><body>" + b"<div>" * 100_000 + b"x" +
                                       b"</div>" * 100_000 + b"</body></html>")
    (folder / "locked.pdf").write_bytes(make_pdf(["minutes"], user_password="pw"))
    good = make_pdf(["a report"])
    (folder / "truncated.pdf").write_bytes(good[: len(good) // 2])
    rng = random.Random(1)
    (folder / "random.html").write_bytes(bytes(rng.randrange(256) for _ in range(4096)))
    (folder / "empty.txt").write_bytes(b"")
    os.symlink("/etc/passwd", folder / "link-out.txt")


def command(inbox: Path, out: Path, policy: Path) -> list[str]:
    return [sys.executable, "-m", "gate", "run", str(inbox), "--policy", str(policy),
            "--out", str(out), "--as-of", "2026-12-01T00:00:00Z", "--workers", "2", "-q"]


def run_watched(cmd: list[str]) -> tuple[int, float, int]:
    started = time.perf_counter()
    proc = subprocess.Popen(cmd, stdout=subprocess.DEVNULL, stderr=subprocess.PIPE,
                            start_new_session=True)
    sampler = Sampler(proc.pid)
    sampler.start()
    _, err = proc.communicate()
    sampler.running = False
    sampler.join()
    if proc.returncode != 0:
        print(err.decode(errors="replace"), file=sys.stderr)
    return proc.returncode, time.perf_counter() - started, sampler.peak


def entries_complete(out: Path) -> bool:
    for folder, record in (("accepted", "provenance.json"), ("quarantine", "reasons.json")):
        base = out / folder
        if not base.exists():
            continue
        for entry in base.iterdir():
            try:
                json.loads((entry / record).read_text())
            except (OSError, ValueError):
                return False
    return True


def decisions(out: Path) -> dict[str, tuple]:
    report = json.loads((out / "report.json").read_text())
    return {d["path"]: (d["decision"], tuple(sorted(r["code"] for r in d["reasons"])),
                        d["location"]) for d in report["documents"]}


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--kills", type=int, default=25)
    parser.add_argument("--docs", type=int, default=300)
    parser.add_argument("--seconds", type=float, default=600, help="overall time budget")
    parser.add_argument("--work", type=Path, default=ROOT / "bench-out" / "crash")
    args = parser.parse_args()
    args.work.mkdir(parents=True, exist_ok=True)
    inbox = make_corpus(args.work / f"corpus-{args.docs}", args.docs)
    add_hostile(inbox)
    policy = args.work / "policy.yaml"
    policy.write_text(BENCH_POLICY)
    clean = args.work / "clean"
    shutil.rmtree(clean, ignore_errors=True)
    code, clean_seconds, clean_peak = run_watched(command(inbox, clean, policy))
    assert code == 0, "the uninterrupted run failed"
    expected = decisions(clean)
    print(f"uninterrupted run: {len(expected)} documents in {clean_seconds:.1f} s, peak "
          f"memory of the process tree {clean_peak / 2**20:.0f} MiB")
    out = args.work / "killed"
    shutil.rmtree(out, ignore_errors=True)
    rng = random.Random(2026)
    deadline = time.monotonic() + args.seconds
    kills = torn = 0
    peak = 0
    started = time.perf_counter()
    while kills < args.kills and time.monotonic() < deadline:
        proc = subprocess.Popen(command(inbox, out, policy), stdout=subprocess.DEVNULL,
                                stderr=subprocess.DEVNULL, start_new_session=True)
        sampler = Sampler(proc.pid)
        sampler.start()
        time.sleep(rng.uniform(0.2, clean_seconds * 1.1))
        finished = proc.poll() is not None
        if not finished:
            os.killpg(proc.pid, signal.SIGKILL)
            kills += 1
        proc.wait()
        sampler.running = False
        sampler.join()
        peak = max(peak, sampler.peak)
        if not entries_complete(out):
            torn += 1
        if finished:  # the run got to the end: start over from an empty folder
            shutil.rmtree(out, ignore_errors=True)
    code, final_seconds, final_peak = run_watched(command(inbox, out, policy))
    peak = max(peak, final_peak)
    got = decisions(out)
    report = json.loads((out / "report.json").read_text())
    listed = [d["path"] for d in report["documents"]]
    accepted = set(os.listdir(out / "accepted"))
    quarantined = set(os.listdir(out / "quarantine"))
    same = sum(1 for path, value in expected.items() if got.get(path) == value)
    hostile_ok = sum(1 for path, code_ in HOSTILE.items()
                     if code_ in got.get(path, ("", ()))[1])
    print(f"kills survived: {kills} (torn entries seen after a kill: {torn}); total "
          f"{time.perf_counter() - started:.0f} s")
    print(f"final run exit {code} in {final_seconds:.1f} s; documents accounted for: "
          f"{len(set(listed))}/{len(expected)} (listed twice: {len(listed) - len(set(listed))},"
          f" in both folders: {len(accepted & quarantined)}); decisions equal to the "
          f"uninterrupted run: {same}/{len(expected)}")
    print(f"hostile files handled with their expected reason: {hostile_ok}/{len(HOSTILE)}")
    print(f"peak memory of the whole process tree over all runs: {peak / 2**20:.0f} MiB "
          f"(goal: under 1024 MiB)")


if __name__ == "__main__":
    main()
