"""Do two versions of gate decide the same? Runs this tree's gate and another tree's (for
example main) over the same inboxes with the same policy and ``--as-of``, and compares what
they wrote.

    git archive main | tar -x -C /tmp/gate-main   # the other version's source
    .venv/bin/python benchmarks/same_results.py --other /tmp/gate-main [--docs 300] [--small 1000]

Two inboxes: the bench mix (:func:`benchmarks.corpus.make_corpus`: HTML pages with
boilerplate, PDFs, text, near-duplicates) and the tiny notes of
``benchmarks/small_files.py``; each is run twice in one output folder (a first run, then a
re-run over the unchanged inbox). Compared, per run: report.json without its ``run``
block (which names the inbox and policy paths), changes.jsonl, report.html with both
trees' paths made alike, and every entry's record files. Prints what differs and exits
1 if anything does. A speed change must leave all of it the same.
"""

from __future__ import annotations

import argparse
import json
import os
import shutil
import subprocess
import sys
from pathlib import Path

ROOT = Path(__file__).resolve().parent.parent
sys.path.insert(0, str(ROOT))

from benchmarks.corpus import BENCH_POLICY, make_corpus  # noqa: E402
from benchmarks.small_files import make_inbox  # noqa: E402

AS_OF = "2026-12-01T00:00:00Z"


def _run(tree: Path, inbox: Path, policy: Path, out: Path, workers: int) -> None:
    """``gate run`` from ``tree``'s source, with this interpreter (the same packages)."""
    env = {**os.environ, "PYTHONPATH": str(tree), "PYTHONDONTWRITEBYTECODE": "1"}
    done = subprocess.run([sys.executable, "-m", "gate", "run", str(inbox), "--policy",
                           str(policy), "--out", str(out), "--as-of", AS_OF, "--workers",
                           str(workers)],
                          cwd=tree, env=env, capture_output=True, text=True, check=False)
    if done.returncode != 0:
        raise SystemExit(f"gate in {tree} exited with {done.returncode}:\n{done.stderr}")


def _snapshot(out: Path, other_out: Path) -> dict[str, bytes]:
    """What a run wrote, with the output folder's own path taken out."""
    files: dict[str, bytes] = {}
    report = json.loads((out / "report.json").read_text(encoding="utf-8"))
    report.pop("run", None)
    files["report.json"] = json.dumps(report, sort_keys=True, indent=1).encode()
    files["changes.jsonl"] = (out / "changes.jsonl").read_bytes()
    page = (out / "report.html").read_bytes()
    for path in (out, out.resolve(), other_out, other_out.resolve()):
        page = page.replace(os.fsencode(path), b"OUT")
    files["report.html"] = page
    for folder in ("accepted", "quarantine"):
        for entry in sorted((out / folder).iterdir()):
            for item in sorted(entry.iterdir()):
                data = item.read_bytes()
                if item.name in ("provenance.json", "reasons.json", "provenance.prov.json"):
                    record = json.loads(data)
                    _drop_paths(record)
                    data = json.dumps(record, sort_keys=True).encode()
                files[f"{folder}/{entry.name}/{item.name}"] = data
    return files


def _drop_paths(value: object) -> None:
    """Records name the inbox folder and the policy file by absolute path: the same
    files under the two trees' paths."""
    if isinstance(value, dict):
        for key in [k for k, v in value.items() if k in ("inbox", "files") or
                    (isinstance(v, str) and v.startswith("/"))]:
            del value[key]
        for item in value.values():
            _drop_paths(item)
    elif isinstance(value, list):
        for item in value:
            _drop_paths(item)


def compare(name: str, inbox: Path, policy: Path, work: Path, other: Path,
            workers: int) -> int:
    mine, theirs = work / f"{name}-this", work / f"{name}-other"
    for out in (mine, theirs):
        shutil.rmtree(out, ignore_errors=True)
    differences = 0
    for attempt in ("first run", "re-run"):
        _run(ROOT, inbox, policy, mine, workers)
        _run(other, inbox, policy, theirs, workers)
        a, b = _snapshot(mine, theirs), _snapshot(theirs, mine)
        differ = sorted(k for k in set(a) | set(b) if a.get(k) != b.get(k))
        report = json.loads((mine / "report.json").read_text(encoding="utf-8"))
        print(f"{name}, {attempt}: {len(a)} files compared, "
              f"{report['summary']['accepted']} accepted, "
              f"{report['summary']['quarantined']} quarantined: "
              + ("the same" if not differ else f"{len(differ)} differ: {differ[:8]}"))
        differences += len(differ)
    return differences


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--other", type=Path, required=True,
                        help="the other version's source tree (run with this interpreter)")
    parser.add_argument("--docs", type=int, default=300, help="bench-mix documents")
    parser.add_argument("--small", type=int, default=1000, help="tiny notes")
    parser.add_argument("--workers", type=int, default=2)
    args = parser.parse_args()
    work = ROOT / "bench-out" / "same-results"
    work.mkdir(parents=True, exist_ok=True)
    policy = work / "policy.yaml"
    policy.write_text(BENCH_POLICY, encoding="utf-8")
    mix = work / f"mix-{args.docs}"
    if not (mix / "manifest.jsonl").exists():
        make_corpus(mix, args.docs)
    small = make_inbox(ROOT / "bench-out" / f"small-{args.small}", args.small)
    differences = compare("mix", mix, policy, work, args.other.resolve(), args.workers)
    differences += compare("small", small, policy, work, args.other.resolve(), args.workers)
    print("all the same" if not differences else f"{differences} differences")
    sys.exit(1 if differences else 0)


if __name__ == "__main__":
    main()
