"""gate against the competent sequential baseline of ../shared/bench, side by side.

    .venv/bin/python benchmarks/ratio.py [--docs 600] [--rounds 3] [--workers 2]
                                         [--bench-dir ../shared/bench]

What ../shared/bench/README.md prescribes: the same inbox, policy and --as-of; gate
(``--workers 2``) and the baseline alternated (A B A B A B) in one sitting, warm page cache,
fresh output folders; each command timed by the shared ``measure.py`` (wall time, peak RSS).
Prints every run (for gate also the checks' share of extraction time, from its workers'
CPU seconds per stage) and the ratio of the medians gate / baseline, with the corpus mix
(benchmarks/corpus.py: about 80 % HTML pages of 10-100 KB with boilerplate, 10 % multi-page
PDFs, 10 % plain text). Run it on an otherwise idle machine: the figure means nothing when
other work shares the cores.
"""

from __future__ import annotations

import argparse
import json
import os
import shutil
import statistics
import subprocess
import sys
import tempfile
from pathlib import Path

ROOT = Path(__file__).resolve().parent.parent
sys.path.insert(0, str(ROOT))

from benchmarks.corpus import BENCH_POLICY, make_corpus  # noqa: E402

AS_OF = "2026-12-01T00:00:00Z"


def measured(bench: Path, cmd: list[str]) -> dict:
    with tempfile.NamedTemporaryFile(suffix=".json") as result, \
            tempfile.NamedTemporaryFile(suffix=".err") as err:
        # GATE_TIMINGS: gate prints its workers' CPU seconds per stage on stderr (the
        # baseline ignores it)
        subprocess.run([sys.executable, str(bench / "measure.py"), "--json", result.name,
                        "--stderr", err.name, "--", *cmd], check=True,
                       stdout=subprocess.DEVNULL, env={**os.environ, "GATE_TIMINGS": "1"})
        figures = json.loads(Path(result.name).read_text())
        stderr = Path(err.name).read_text(errors="replace")
    if figures["rc"] != 0:
        raise SystemExit(f"{cmd[0]} failed with status {figures['rc']}: {' '.join(cmd)}\n"
                         f"{stderr[-2000:]}")
    for line in stderr.splitlines():
        if line.startswith("timings: "):
            figures["timings"] = json.loads(line[len("timings: "):])
    return figures


def checks_share(timings: dict) -> str:
    """All checks' measure() and template composition against extract(), workers' CPU."""
    extract = timings.get("extract", 0.0)
    checks = sum(v for k, v in timings.items() if k != "extract")
    if not extract:
        return ""
    return f"  checks {checks / extract:4.0%} of extraction (worker CPU)"


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--docs", type=int, default=600)
    parser.add_argument("--rounds", type=int, default=3)
    parser.add_argument("--workers", type=int, default=2)
    parser.add_argument("--bench-dir", type=Path, default=ROOT.parent / "shared" / "bench")
    args = parser.parse_args()
    bench = args.bench_dir.resolve()
    if not (bench / "naive_baseline.py").is_file():
        raise SystemExit(f"no naive_baseline.py in {bench}; pass --bench-dir")
    work = ROOT / "bench-out"
    inbox = make_corpus(work / f"corpus-{args.docs}", args.docs)
    policy = work / "bench-policy.yaml"
    policy.write_text(BENCH_POLICY)
    naive = subprocess.run(["bash", str(bench / "make_naive_venv.sh")], check=True,
                           capture_output=True, text=True).stdout.strip()
    commands = {
        "gate": lambda out: [sys.executable, "-m", "gate", "run", str(inbox), "--policy",
                             str(policy), "--out", str(out), "--as-of", AS_OF, "--workers",
                             str(args.workers), "--quiet"],
        "baseline": lambda out: [naive, str(bench / "naive_baseline.py"), str(inbox),
                                 "--policy", str(policy), "--out", str(out), "--as-of",
                                 AS_OF],
    }
    walls: dict[str, list[float]] = {name: [] for name in commands}
    print(f"{args.docs} documents (about 80 % HTML 10-100 KB with boilerplate, 10 % PDF, "
          f"10 % text), gate --workers {args.workers}, {args.rounds} rounds A B")
    for round_no in range(1, args.rounds + 1):
        for name, command in commands.items():
            out = work / f"ratio-{name}"
            shutil.rmtree(out, ignore_errors=True)
            figures = measured(bench, command(out))
            walls[name].append(figures["wall_s"])
            print(f"  round {round_no} {name:8s} {figures['wall_s']:7.2f} s  "
                  f"peak RSS {figures['peak_rss_mb']:7.1f} MB"
                  f"{checks_share(figures.get('timings', {}))}", flush=True)
    medians = {name: statistics.median(values) for name, values in walls.items()}
    print(f"median gate {medians['gate']:.2f} s, baseline {medians['baseline']:.2f} s, "
          f"ratio gate/baseline {medians['gate'] / medians['baseline']:.2f}")


if __name__ == "__main__":
    main()
