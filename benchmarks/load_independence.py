"""Load independence: the same inbox, decided on an idle and on a saturated machine.

    .venv/bin/python benchmarks/load_independence.py [--burners N] [--timeout 2]

Generates an inbox of invented text documents whose measuring takes from a few
milliseconds to several seconds of CPU time (word lists of growing length), runs gate over
it with ``limits.timeout_s`` set so that some of them exceed it, once as things are and once
beside N processes that spin on the CPU (default: 2 per core + 2), and prints the elapsed
time of each run, the number of documents held for ``format.timeout`` in each, and whether
every decision and reason is the same. Because the limit is CPU time, the saturated run is
slower but decides the same.
"""

from __future__ import annotations

import argparse
import json
import os
import shutil
import subprocess
import sys
import time
from datetime import UTC, datetime
from pathlib import Path

ROOT = Path(__file__).resolve().parent.parent
sys.path.insert(0, str(ROOT))

from gate.pipeline import RunOptions, run  # noqa: E402
from gate.policy import load_policy  # noqa: E402

AS_OF = datetime(2026, 12, 1, tzinfo=UTC)
# words per document: about 0.45 s of CPU per 100,000 on the 2-core VM
SIZES = (2_000, 20_000, 60_000, 120_000, 200_000, 300_000, 400_000, 600_000, 900_000)


def make_inbox(root: Path) -> Path:
    inbox = root / "inbox"
    shutil.rmtree(root, ignore_errors=True)
    inbox.mkdir(parents=True)
    for size in SIZES:
        (inbox / f"words-{size:07d}.txt").write_text(
            " ".join(f"word{i}" for i in range(size)), encoding="utf-8")
    return inbox


def decide(inbox: Path, policy: Path, out: Path) -> tuple[float, dict[str, list[str]]]:
    shutil.rmtree(out, ignore_errors=True)
    started = time.perf_counter()
    run(RunOptions(inbox=inbox, policy=load_policy(policy), out=out, as_of=AS_OF, workers=2))
    seconds = time.perf_counter() - started
    report = json.loads((out / "report.json").read_text(encoding="utf-8"))
    return seconds, {d["path"]: [r["code"] for r in d["reasons"]]
                     for d in report["documents"]}


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--burners", type=int, default=2 * (os.cpu_count() or 1) + 2)
    parser.add_argument("--timeout", type=float, default=1.5)
    args = parser.parse_args()
    work = ROOT / "bench-out" / "load"
    inbox = make_inbox(work)
    policy = work / "policy.yaml"
    policy.write_text(f"version: 1\nname: load\nlimits:\n  timeout_s: {args.timeout}\n",
                      encoding="utf-8")
    idle_s, idle = decide(inbox, policy, work / "out-idle")
    burners = [subprocess.Popen([sys.executable, "-c", "while True: pass"])
               for _ in range(args.burners)]
    try:
        busy_s, busy = decide(inbox, policy, work / "out-busy")
    finally:
        for burner in burners:
            burner.kill()
            burner.wait()

    def timeouts(decided: dict[str, list[str]]) -> int:
        return sum("format.timeout" in codes for codes in decided.values())

    print(f"{len(SIZES)} documents, limits.timeout_s {args.timeout:g} s of CPU, 2 workers, "
          f"{os.cpu_count()} cores")
    print(f"idle run     : {idle_s:6.1f} s elapsed, {timeouts(idle)} held for format.timeout")
    print(f"beside {args.burners:2d} CPU burners: {busy_s:6.1f} s elapsed, {timeouts(busy)} "
          "held for format.timeout")
    same = idle == busy
    print(f"same decisions and reasons: {'yes' if same else 'NO'}")
    if not same:
        for path in sorted(idle):
            if idle[path] != busy.get(path):
                print(f"  {path}: idle {idle[path]} / busy {busy.get(path)}")


if __name__ == "__main__":
    main()
