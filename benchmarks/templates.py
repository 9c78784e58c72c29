"""Thin pages on heavy site templates: duplicate decisions and template removal, scored
against ground truth.

    .venv/bin/python benchmarks/templates.py [--tuning] [--blind] [--baseline] [--workers 2]

``--tuning`` generates the invented tuning corpus (benchmarks/template_corpus.py);
``--blind`` generates the blind corpus (benchmarks/data/template_blind/, written by
someone who never saw the detector; its README describes it). Each corpus is run
through ``gate run`` with only the duplicate check on (threshold 0.80) and scored against
its pairs and bodies:

* near-duplicate recall: pairs whose ground-truth bodies have Jaccard >= 0.80 (word
  5-grams, exact), found by gate (one kept and the other held as its duplicate, or both
  held as duplicates of the same keeper);
* false-duplicate rate: pairs labelled distinct that gate calls duplicates;
* exact-claim precision: ``duplicate.exact`` findings whose two documents have the same
  bytes or the same ground-truth body;
* template removal: for every document, the share of its ground-truth body's words found
  in text.txt (kept) and the share of text.txt's words not in the body (template left).

``--baseline`` also runs with template learning switched off (trafilatura's text only),
for comparison. ``--cost N`` runs the scale benchmark's generated corpus of N documents
(benchmarks/corpus.py: pages of one host sharing a navigation, cookie-banner and footer
template) with and without template learning and prints documents per second and the
worker seconds per stage, which is what learning and removal cost. The generated corpora
live under bench-out/ (git-ignored).
"""

from __future__ import annotations

import argparse
import json
import shutil
import subprocess
import sys
import time
from collections import Counter
from datetime import UTC, datetime
from pathlib import Path
from typing import Any

ROOT = Path(__file__).resolve().parent.parent
sys.path.insert(0, str(ROOT))

from gate import templates  # noqa: E402
from gate.pipeline import RunOptions, run  # noqa: E402
from gate.policy import load_policy  # noqa: E402
from gate.tokens import words  # noqa: E402

THRESHOLD = 0.80
POLICY = f"version: 1\nname: template-bench\nduplicates:\n  threshold: {THRESHOLD}\n"


def run_once(inbox: Path, policy: Path, out: Path, workers: int, learn: bool,
             manifest: Path | None = None) -> tuple[Any, float]:
    """One fresh ``gate run`` in this process, with or without template learning;
    returns (RunResult, seconds)."""
    shutil.rmtree(out, ignore_errors=True)
    saved = templates.MIN_PAGES
    if not learn:
        templates.MIN_PAGES = 10 ** 9  # no site is large enough to teach a template
    try:
        started = time.perf_counter()
        result = run(RunOptions(inbox=inbox, policy=load_policy(policy), out=out,
                                manifest=manifest, workers=workers,
                                as_of=datetime(2026, 12, 1, tzinfo=UTC)))
        return result, time.perf_counter() - started
    finally:
        templates.MIN_PAGES = saved


def run_gate(corpus: Path, out: Path, workers: int, learn: bool) -> tuple[dict, float, dict]:
    """Run gate over a labelled corpus; returns (report, seconds, worker timings)."""
    out.parent.mkdir(parents=True, exist_ok=True)
    policy = out.parent / "template-bench.yaml"
    policy.write_text(POLICY, encoding="utf-8")
    result, seconds = run_once(corpus / "inbox", policy, out, workers, learn,
                               corpus / "manifest.jsonl")
    report = json.loads((out / "report.json").read_text(encoding="utf-8"))
    return report, seconds, result.timings


def load_truth(corpus: Path) -> tuple[list[dict], dict[str, str]]:
    """The labelled pairs and each document's ground-truth body text."""
    pairs = [json.loads(line) for line in (corpus / "pairs.jsonl").read_text().splitlines()
             if line.strip()]
    bodies = {}
    for line in (corpus / "manifest.jsonl").read_text().splitlines():
        if line.strip():
            record = json.loads(line)
            # the tuning corpus names a body by id; the blind one stores it by path
            name = record["x_body"] if "x_body" in record else record["path"]
            body = corpus / "bodies" / f"{name}.txt"
            bodies[record["path"]] = body.read_text(encoding="utf-8")
    return pairs, bodies


def score(report: dict, out: Path, pairs: list[dict], bodies: dict[str, str]) -> dict:
    docs = {d["path"]: d for d in report["documents"]}
    keeper: dict[str, str] = {}
    exact: list[tuple[str, str]] = []
    for path, doc in docs.items():
        for reason in doc["reasons"]:
            if reason["code"] in ("duplicate.near", "duplicate.exact"):
                keeper[path] = reason["details"]["keeper"]
                if reason["code"] == "duplicate.exact":
                    exact.append((path, reason["details"]["keeper"]))

    def found(a: str, b: str) -> bool:
        return keeper.get(a) == b or keeper.get(b) == a or \
            (a in keeper and keeper.get(a) == keeper.get(b))

    near = [p for p in pairs if p["relation"] != "distinct" and p["body_jaccard"] >= THRESHOLD]
    distinct = [p for p in pairs if p["relation"] == "distinct"]
    recall = sum(found(p["a"], p["b"]) for p in near) / max(1, len(near))
    false = sum(found(p["a"], p["b"]) for p in distinct) / max(1, len(distinct))
    right = sum(1 for a, b in exact if docs[a]["sha256"] == docs[b]["sha256"] or
                words(bodies[a]) == words(bodies[b]))
    kept = template = total_body = total_text = 0
    for path, doc in docs.items():
        location = doc.get("location")
        text_file = out / location / "text.txt" if location else None
        text = text_file.read_text(encoding="utf-8") if text_file and text_file.exists() else ""
        body, got = Counter(words(bodies[path])), Counter(words(text))
        common = sum((body & got).values())
        kept += common
        total_body += sum(body.values())
        template += sum(got.values()) - common
        total_text += sum(got.values())
    return {"pairs_near": len(near), "recall": recall, "pairs_distinct": len(distinct),
            "false_rate": false, "exact_claims": len(exact),
            "exact_precision": right / len(exact) if exact else 1.0,
            "body_kept": kept / max(1, total_body),
            "template_left": template / max(1, total_text)}


def show(name: str, s: dict, seconds: float, timings: dict, documents: int) -> None:
    print(f"{name}: {documents} documents, {seconds:.1f} s")
    print(f"  near-duplicate recall   {s['recall']:.3f}  ({s['pairs_near']} pairs with body "
          f"Jaccard >= {THRESHOLD})")
    print(f"  false-duplicate rate    {s['false_rate']:.4f}  ({s['pairs_distinct']} distinct "
          "pairs)")
    print(f"  exact-claim precision   {s['exact_precision']:.3f}  ({s['exact_claims']} "
          "duplicate.exact findings)")
    print(f"  body kept in text.txt   {s['body_kept']:.3f}")
    print(f"  template left in text   {s['template_left']:.3f}  (share of text.txt words "
          "not in the body)")
    if timings:
        parts = ", ".join(f"{k} {v:.2f} s" for k, v in sorted(timings.items()))
        print(f"  worker seconds: {parts}")


def bench(name: str, corpus: Path, work: Path, workers: int, baseline: bool) -> None:
    pairs, bodies = load_truth(corpus)
    for learn in ((True, False) if baseline else (True,)):
        label = name if learn else f"{name}, templates not learnt (trafilatura only)"
        out = work / f"{name}-{'learn' if learn else 'plain'}"
        report, seconds, timings = run_gate(corpus, out, workers, learn)
        show(label, score(report, out, pairs, bodies), seconds, timings,
             len(report["documents"]))


def cost(n: int, work: Path, workers: int) -> None:
    from benchmarks.corpus import BENCH_POLICY, make_corpus
    inbox = make_corpus(work / f"cost-corpus-{n}", n)
    policy = work / "cost-policy.yaml"
    policy.write_text(BENCH_POLICY, encoding="utf-8")
    for learn in (False, True):
        out = work / f"cost-{n}-{'learn' if learn else 'plain'}"
        result, seconds = run_once(inbox, policy, out, workers, learn)
        label = "with template learning" if learn else "without (trafilatura only)"
        stages = ", ".join(f"{k} {v:.1f}" for k, v in sorted(result.timings.items()))
        print(f"cost, {n} documents, {workers} workers, {label}: {seconds:.1f} s, "
              f"{n / seconds:.1f} documents/s; worker seconds: {stages}", flush=True)


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.split("\n")[0])
    parser.add_argument("--tuning", action="store_true")
    parser.add_argument("--blind", action="store_true")
    parser.add_argument("--baseline", action="store_true")
    parser.add_argument("--workers", type=int, default=2)
    parser.add_argument("--work", type=Path, default=ROOT / "bench-out" / "templates")
    parser.add_argument("--cost", type=int, default=0, metavar="N")
    args = parser.parse_args()
    if args.cost:
        args.work.mkdir(parents=True, exist_ok=True)
        cost(args.cost, args.work, args.workers)
        return
    if not (args.tuning or args.blind):
        args.tuning = args.blind = True
    args.work.mkdir(parents=True, exist_ok=True)
    if args.tuning:
        corpus = args.work / "tuning-corpus"
        if not (corpus / "pairs.jsonl").exists():
            from benchmarks.template_corpus import make
            make(corpus)
        bench("tuning", corpus, args.work, args.workers, args.baseline)
    if args.blind:
        # the generator writes out/ beside itself: run a copy under bench-out/
        home = args.work / "blind-generator"
        corpus = home / "out"
        if not (corpus / "pairs.jsonl").exists():
            home.mkdir(parents=True, exist_ok=True)
            source = ROOT / "benchmarks" / "data" / "template_blind"
            for name in ("make_corpus.py", "validate.py"):
                shutil.copyfile(source / name, home / name)
            subprocess.run([sys.executable, str(home / "make_corpus.py")], check=True,
                           cwd=home, stdout=subprocess.DEVNULL)
        bench("blind", corpus, args.work, args.workers, args.baseline)


if __name__ == "__main__":
    main()
