"""Time and peak memory of loading a large policy: N allow rules, each with overrides.

    .venv/bin/python benchmarks/policy_load.py [--rules 1200]

Each measurement runs `gate policy check` in a fresh process and prints its wall time and
peak resident memory (ru_maxrss of the child). The policy is generated (invented hosts
under example.org). Overrides are validated once per rule, so the time grows linearly with
the number of rules.
"""

from __future__ import annotations

import argparse
import resource
import subprocess
import sys
import tempfile
import time
from pathlib import Path


def policy_text(rules: int) -> str:
    lines = ["version: 1", "name: many-rules", "language:", "  allowed: [en]",
             "freshness:", "  max_age_days: 365", "sources:", "  allow:"]
    for number in range(rules):
        lines += [f"    - domain: site{number}.example.org",
                  "      overrides:",
                  "        language: {allowed: [en, de]}",
                  f"        freshness: {{max_age_days: {30 + number % 300}}}"]
    return "\n".join(lines) + "\n"


def measure(path: Path) -> tuple[float, float, int]:
    before = resource.getrusage(resource.RUSAGE_CHILDREN).ru_maxrss
    started = time.perf_counter()
    done = subprocess.run([sys.executable, "-m", "gate", "policy", "check", str(path)],
                          capture_output=True, text=True)
    seconds = time.perf_counter() - started
    peak = resource.getrusage(resource.RUSAGE_CHILDREN).ru_maxrss
    if done.returncode != 0:
        raise SystemExit(f"policy check failed: {done.stderr}")
    return seconds, max(peak, before) / 1024, done.returncode


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--rules", type=int, nargs="+", default=[10, 1200])
    args = parser.parse_args()
    with tempfile.TemporaryDirectory() as tmp:
        for rules in args.rules:
            path = Path(tmp) / f"policy-{rules}.yaml"
            path.write_text(policy_text(rules), encoding="utf-8")
            seconds, peak_mib, _ = measure(path)
            print(f"{rules:>6} allow rules with overrides: {seconds:6.2f} s, peak RSS of "
                  f"`gate policy check` {peak_mib:7.1f} MiB "
                  f"(file {path.stat().st_size / 1024:.0f} KiB)")


if __name__ == "__main__":
    main()
