"""Thin pages on heavy site templates: duplicate decisions and template removal, scored
against ground truth.

    .venv/bin/python benchmarks/templates.py [--tuning] [--blind] [--corpus DIR]...
        [--baseline] [--verbose] [--workers 2]

``--tuning`` generates the invented tuning corpus (benchmarks/template_corpus.py);
``--blind`` generates the first blind corpus (benchmarks/data/template_blind/, written by
someone who never saw the detector; its README describes it); ``--corpus DIR`` measures
any corpus in that format: ``DIR/make_corpus.py`` writing ``out/inbox``,
``out/manifest.jsonl``, ``out/pairs.jsonl`` and ``out/bodies/<path>.txt`` (the folder is
copied under ``--work`` and the generator run there), or a folder already holding them.
Each corpus is run through ``gate run`` with only the duplicate check on (threshold
0.80; the manifest given to gate keeps only the keys gate reads) and scored against its
pairs and bodies:

* near-duplicate recall: pairs whose ground-truth bodies have Jaccard >= 0.80 (word
  5-grams, exact), found by gate (one kept and the other held as its duplicate, or both
  held as duplicates of the same keeper);
* false-duplicate rate: pairs labelled distinct that gate calls duplicates; and findings
  between documents no label speaks of, false when their bodies are below 0.5;
* per relation and per format pair (by file ending: html-pdf, txt-md, ...): pairs found;
* exact-claim precision: ``duplicate.exact`` findings whose two documents have the same
  bytes or the same ground-truth body;
* template removal: for every document, the share of its ground-truth body's words found
  in text.txt (kept) and the share of text.txt's words not in the body (template left).

No document is named unless ``--verbose`` (then the pairs missed and the false
duplicates are listed), so a blind set's figures can be shown without showing its pages.

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
    manifest = gate_manifest(corpus, out.parent / f"{out.name}-manifest.jsonl")
    result, seconds = run_once(corpus / "inbox", policy, out, workers, learn, manifest)
    report = json.loads((out / "report.json").read_text(encoding="utf-8"))
    return report, seconds, result.timings


def load_truth(corpus: Path) -> tuple[list[dict], dict[str, str | None]]:
    """The labelled pairs and each document's ground-truth body text (None when the
    corpus has no body file for it)."""
    pairs = [json.loads(line) for line in (corpus / "pairs.jsonl").read_text().splitlines()
             if line.strip()]
    bodies: dict[str, str | None] = {}
    for line in (corpus / "manifest.jsonl").read_text().splitlines():
        if line.strip():
            record = json.loads(line)
            # the tuning corpus names a body by id; the blind ones store it by path
            name = record["x_body"] if "x_body" in record else record["path"]
            body = corpus / "bodies" / f"{name}.txt"
            bodies[record["path"]] = body.read_text(encoding="utf-8") if body.exists() \
                else None
    for pair in pairs:  # a corpus that does not give it: from the bodies
        if "body_jaccard" not in pair:
            x, y = bodies.get(pair["a"]), bodies.get(pair["b"])
            pair["body_jaccard"] = jaccard(x, y) if x is not None and y is not None else \
                (0.0 if pair["relation"] == "distinct" else 1.0)
    return pairs, bodies


def shingles(text: str, w: int = 5) -> set[tuple[str, ...]]:
    tokens = words(text)
    if len(tokens) < w:
        return {tuple(tokens)}
    return {tuple(tokens[i:i + w]) for i in range(len(tokens) - w + 1)}


def jaccard(a: str, b: str) -> float:
    sa, sb = shingles(a), shingles(b)
    return len(sa & sb) / max(1, len(sa | sb))


def kind_of(path: str) -> str:
    """A document's format, by its name's ending (for figures per format pair)."""
    suffix = Path(path).suffix.lower().lstrip(".")
    return {"htm": "html", "markdown": "md", "text": "txt"}.get(suffix, suffix or "none")


def score(report: dict, out: Path, pairs: list[dict], bodies: dict[str, str | None]
          ) -> dict:
    docs = {d["path"]: d for d in report["documents"]}
    keeper: dict[str, str] = {}
    named: dict[str, set[str]] = {}  # every kept document a finding names
    exact: list[tuple[str, str]] = []
    for path, doc in docs.items():
        for reason in doc["reasons"]:
            if reason["code"] in ("duplicate.near", "duplicate.exact"):
                keeper[path] = reason["details"]["keeper"]
                named[path] = {keeper[path]} | {
                    o["keeper"] for o in reason["details"].get("also_keepers", [])}
                if reason["code"] == "duplicate.exact":
                    exact.append((path, reason["details"]["keeper"]))

    def found(a: str, b: str) -> bool:
        """Strict: one held under the other, or both under the same keeper."""
        return keeper.get(a) == b or keeper.get(b) == a or \
            (a in keeper and keeper.get(a) == keeper.get(b))

    def listed(a: str, b: str) -> bool:
        """Also counting every kept document a finding names: one named in the other's
        finding, or a kept document named in both."""
        return found(a, b) or b in named.get(a, ()) or a in named.get(b, ()) or \
            bool(named.get(a, set()) & named.get(b, set()))

    near = [p for p in pairs if p["relation"] != "distinct" and p["body_jaccard"] >= THRESHOLD]
    distinct = [p for p in pairs if p["relation"] == "distinct"]
    recall = sum(found(p["a"], p["b"]) for p in near) / max(1, len(near))
    false = sum(found(p["a"], p["b"]) for p in distinct) / max(1, len(distinct))
    recall_listed = sum(listed(p["a"], p["b"]) for p in near) / max(1, len(near))
    false_listed = sum(listed(p["a"], p["b"]) for p in distinct) / max(1, len(distinct))

    def same_body(a: str, b: str) -> bool:
        x, y = bodies.get(a), bodies.get(b)
        return x is not None and y is not None and words(x) == words(y)

    right = sum(1 for a, b in exact if docs[a]["sha256"] == docs[b]["sha256"] or
                same_body(a, b))
    # per relation and per format pair: (pairs, found)
    relations: dict[str, list[int]] = {}
    formats: dict[str, list[int]] = {}
    missed: list[dict] = []
    wrong: list[dict] = []
    for p in pairs:
        hit = found(p["a"], p["b"])
        counted = p["relation"] == "distinct" or p["body_jaccard"] >= THRESHOLD
        label = p["relation"] if counted else f"{p['relation']} (body Jaccard < {THRESHOLD})"
        relations.setdefault(label, [0, 0])
        relations[label][0] += 1
        relations[label][1] += hit
        side = "distinct" if p["relation"] == "distinct" else "duplicate"
        pair = "-".join(sorted((kind_of(p["a"]), kind_of(p["b"]))))
        if counted:  # the pairs recall and the false-duplicate rate count
            formats.setdefault(f"{side} {pair}", [0, 0])
            formats[f"{side} {pair}"][0] += 1
            formats[f"{side} {pair}"][1] += hit
        if counted and side == "duplicate" and not hit:
            missed.append(p)
        elif side == "distinct" and hit:
            wrong.append(p)
    # findings between documents no label speaks of (the corpora call such pairs
    # distinct): counted as false when their true bodies are below 0.5
    labelled = {frozenset((p["a"], p["b"])) for p in pairs}
    unlabelled = false_unlabelled = 0
    for path, other in keeper.items():
        if frozenset((path, other)) in labelled or other not in docs:
            continue
        unlabelled += 1
        x, y = bodies.get(path), bodies.get(other)
        if x is not None and y is not None and jaccard(x, y) < 0.5:
            false_unlabelled += 1
            wrong.append({"a": path, "b": other, "relation": "unlabelled",
                          "body_jaccard": round(jaccard(x, y), 4)})
    kept = template = total_body = total_text = 0
    no_body = 0
    texts: dict[str, str] = {}
    for path, doc in docs.items():
        location = doc.get("location")
        text_file = out / location / "text.txt" if location else None
        text = text_file.read_text(encoding="utf-8") if text_file and text_file.exists() else ""
        texts[path] = text
        if bodies.get(path) is None:
            no_body += 1
            continue
        body, got = Counter(words(bodies[path] or "")), Counter(words(text))
        common = sum((body & got).values())
        kept += common
        total_body += sum(body.values())
        template += sum(got.values()) - common
        total_text += sum(got.values())
    held_other = Counter(r["code"] for d in docs.values() for r in d["reasons"]
                         if not r["code"].startswith("duplicate."))
    return {"pairs_near": len(near), "recall": recall, "pairs_distinct": len(distinct),
            "false_rate": false, "recall_listed": recall_listed, "false_listed": false_listed,
            "exact_claims": len(exact),
            "exact_precision": right / len(exact) if exact else 1.0,
            "body_kept": kept / max(1, total_body),
            "template_left": template / max(1, total_text),
            "relations": relations, "formats": formats, "unlabelled": unlabelled,
            "false_unlabelled": false_unlabelled, "no_body": no_body,
            "held_other": dict(held_other), "missed": missed, "wrong": wrong,
            "keeper": keeper, "causes": causes(missed, keeper, texts, bodies),
            "texts": texts}


# why a pair was missed, in the order they are tried (the first that applies names it)
CAUSES = {
    "keepers": "gate's texts are above the threshold, but the two were held under "
               "different keepers (or one kept, the other held under a third page)",
    "template": "template left in a text (over 1 % of its words not in its body)",
    "dropped": "body text dropped (under 99 % of a body's words in its text)",
    "tokens": "texts hold their bodies' words but their 5-grams differ from their "
              "bodies' (order, splits, joined words: cross-format token differences)",
    "edge": "texts agree with their bodies (5-gram Jaccard >= 0.97 each) yet the pair "
            "falls below the threshold: the small differences left tip a pair at the edge",
    "label": "the bodies themselves are below the threshold by gate's word 5-grams (the "
             "corpus measured its Jaccard otherwise)",
    "no text": "a document without text.txt (held before extraction, or no text)",
}


def _side(text: str, body: str | None) -> dict[str, float]:
    got, want = Counter(words(text)), Counter(words(body or ""))
    common = sum((got & want).values())
    return {"extra": 1 - common / max(1, sum(got.values())),
            "kept": common / max(1, sum(want.values())),
            "grams": jaccard(text, body or "")}


def causes(missed: list[dict], keeper: dict[str, str], texts: dict[str, str],
           bodies: dict[str, str | None]) -> dict[str, list[dict]]:
    """The missed pairs by cause (see ``CAUSES``), each with gate's text Jaccard."""
    out: dict[str, list[dict]] = {}
    for p in missed:
        a, b = texts.get(p["a"], ""), texts.get(p["b"], "")
        got = jaccard(a, b) if a and b else 0.0
        sides = [_side(a, bodies.get(p["a"])), _side(b, bodies.get(p["b"]))]
        x, y = bodies.get(p["a"]), bodies.get(p["b"])
        if not a or not b:
            why = "no text"
        elif x is not None and y is not None and jaccard(x, y) < THRESHOLD:
            why = "label"
        elif got >= THRESHOLD:
            why = "keepers"
        elif max(s["extra"] for s in sides) > 0.01:
            why = "template"
        elif min(s["kept"] for s in sides) < 0.99:
            why = "dropped"
        elif min(s["grams"] for s in sides) < 0.97:
            why = "tokens"
        else:
            why = "edge"
        out.setdefault(why, []).append({**p, "text_jaccard": round(got, 4), "sides": sides})
    return out


def show(name: str, s: dict, seconds: float, timings: dict, documents: int,
         verbose: bool = False, why_detail: bool = False) -> None:
    print(f"{name}: {documents} documents, {seconds:.1f} s")
    print(f"  near-duplicate recall   {s['recall']:.3f}  ({s['pairs_near']} pairs with body "
          f"Jaccard >= {THRESHOLD})")
    print(f"  false-duplicate rate    {s['false_rate']:.4f}  ({s['pairs_distinct']} distinct "
          "pairs)")
    print(f"  counting every keeper a finding names (not only the one it is held under): "
          f"recall {s['recall_listed']:.3f}, false-duplicate rate {s['false_listed']:.4f}")
    print(f"  unlabelled findings     {s['unlabelled']} (of them with body Jaccard < 0.5: "
          f"{s['false_unlabelled']})")
    print(f"  exact-claim precision   {s['exact_precision']:.3f}  ({s['exact_claims']} "
          "duplicate.exact findings)")
    print(f"  body kept in text.txt   {s['body_kept']:.3f}")
    print(f"  template left in text   {s['template_left']:.3f}  (share of text.txt words "
          "not in the body)" + (f"; {s['no_body']} documents without a body file"
                                if s["no_body"] else ""))
    if s["held_other"]:
        print("  held for other reasons  " + ", ".join(
            f"{code} {n}" for code, n in sorted(s["held_other"].items())))
    print("  per relation (found / pairs):")
    for label, (n, hit) in sorted(s["relations"].items()):
        print(f"    {label:<44} {hit:>4} / {n:<4} {hit / max(1, n):.3f}")
    print(f"  per format pair (found / pairs; duplicates with body Jaccard >= {THRESHOLD}):")
    for label, (n, hit) in sorted(s["formats"].items()):
        print(f"    {label:<44} {hit:>4} / {n:<4} {hit / max(1, n):.3f}")
    if timings:
        parts = ", ".join(f"{k} {v:.2f} s" for k, v in sorted(timings.items()))
        print(f"  worker seconds: {parts}")
    if s["missed"]:
        print("  missed pairs by cause (the first that applies):")
        for why, text in CAUSES.items():
            if s["causes"].get(why):
                print(f"    {why:<9} {len(s['causes'][why]):>4}  {text}")
    if why_detail:
        for why, found in s["causes"].items():
            for p in found:
                sides = "; ".join(f"extra {x['extra']:.3f} kept {x['kept']:.3f} 5-grams "
                                  f"{x['grams']:.3f}" for x in p["sides"])
                print(f"  why {why}: {p['a']} ~ {p['b']} body {p['body_jaccard']} text "
                      f"{p['text_jaccard']} ({sides})")
    if verbose:
        for p in s["missed"]:
            print(f"  missed {p['relation']} ({p['body_jaccard']}): {p['a']} ~ {p['b']}; "
                  f"gate: {s['keeper'].get(p['a'], 'kept')} / "
                  f"{s['keeper'].get(p['b'], 'kept')}")
        for p in s["wrong"]:
            print(f"  false duplicate {p['relation']} ({p['body_jaccard']}): "
                  f"{p['a']} ~ {p['b']}")


def gate_manifest(corpus: Path, target: Path) -> Path:
    """The corpus's manifest with only the keys gate reads (a generator may add its own)."""
    from gate.manifest import FIELDS
    lines = []
    for line in (corpus / "manifest.jsonl").read_text(encoding="utf-8").splitlines():
        if line.strip():
            record = json.loads(line)
            lines.append(json.dumps({k: v for k, v in record.items() if k in FIELDS}))
    target.write_text("\n".join(lines) + "\n", encoding="utf-8")
    return target


def bench(name: str, corpus: Path, work: Path, workers: int, baseline: bool,
          verbose: bool = False, why_detail: bool = False) -> None:
    pairs, bodies = load_truth(corpus)
    for learn in ((True, False) if baseline else (True,)):
        label = name if learn else f"{name}, templates not learnt (trafilatura only)"
        out = work / f"{name}-{'learn' if learn else 'plain'}"
        report, seconds, timings = run_gate(corpus, out, workers, learn)
        scored = score(report, out, pairs, bodies)
        show(label, scored, seconds, timings, len(report["documents"]), verbose, why_detail)
        if why_detail:  # each document's text against its body, for comparing two runs
            sides = {path: _side(text, bodies[path]) for path, text in scored["texts"].items()
                     if bodies.get(path) is not None}
            (work / f"{name}-sides.json").write_text(json.dumps(sides, indent=0))


def generated(source: Path, work: Path) -> Path:
    """A corpus folder in the blind sets' format (inbox/, manifest.jsonl, pairs.jsonl,
    bodies/): ``source`` itself or its out/ when already generated there, otherwise
    ``source/make_corpus.py`` run on a copy of ``source`` under ``work`` (a generator
    writes out/ beside itself)."""
    source = source.resolve()
    for candidate in (source, source / "out"):
        if (candidate / "pairs.jsonl").exists() and (candidate / "inbox").is_dir():
            return candidate
    if not (source / "make_corpus.py").exists():
        raise SystemExit(f"--corpus {source}: neither pairs.jsonl and inbox/ nor "
                         "make_corpus.py there.")
    home = work / f"{source.name}-generator"
    corpus = home / "out"
    if not (corpus / "pairs.jsonl").exists():
        shutil.rmtree(home, ignore_errors=True)
        shutil.copytree(source, home, ignore=shutil.ignore_patterns("out", "__pycache__"))
        done = subprocess.run([sys.executable, str(home / "make_corpus.py")], cwd=home,
                              stdout=subprocess.DEVNULL, stderr=subprocess.PIPE, text=True)
        if done.returncode != 0 or not (corpus / "pairs.jsonl").exists():
            raise SystemExit(f"{source}/make_corpus.py failed (exit {done.returncode}): "
                             f"{done.stderr.strip()[-2000:]}")
    return corpus


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


def cross_format(n: int, verbose: bool = False) -> None:
    """The same body as HTML, PDF, text and Markdown (benchmarks/template_corpus.py's
    renderings, invented bodies with a heading, a list and a table each): the Jaccard of
    the word 5-grams of gate's text of each format against the body, and between formats."""
    import random
    from itertools import combinations

    from benchmarks.template_corpus import make_body, renderings, title
    from gate.extract import extract

    rng = random.Random(2026)
    streams: dict[str, list[list[str]]] = {}
    bodies: list[list[str]] = []
    for i in range(n):
        body = make_body(rng, *((150, 470) if i % 2 else (500, 1200)))  # half over a page
        kinds = {kind for kind, _value in body["parts"]}
        if "heading" not in kinds:
            body["parts"].insert(1, ("heading", title(rng)))
        if "list" not in kinds:
            body["parts"].insert(2, ("list", [title(rng) + " before noon" for _ in range(3)]))
        if "table" not in kinds:
            body["parts"].append(("table", [["Street", "From", "Until"]] + [
                [title(rng), f"{rng.randint(6, 11)}:00", f"{rng.randint(12, 20)}:30"]
                for _ in range(3)]))
        truth = "\n".join([body["title"]] + [
            "\n".join(" ".join(r) for r in v) if k == "table" else
            ("\n".join(v) if k == "list" else v) for k, v in body["parts"]])
        bodies.append(words(truth))
        for name, data in renderings(body, "Invented Records Office").items():
            text = extract(data, max_pages=50, max_nesting=100).text
            streams.setdefault(name, []).append(words(text))

    def jac(a: list[str], b: list[str]) -> float:
        x = {tuple(a[i:i + 5]) for i in range(len(a) - 4)}
        y = {tuple(b[i:i + 5]) for i in range(len(b) - 4)}
        return len(x & y) / max(1, len(x | y))

    def line(label: str, values: list[float], same: int) -> None:
        values = sorted(values)
        print(f"  {label:<24} mean {sum(values) / len(values):.3f}  min {values[0]:.3f}  "
              f">= 0.95: {sum(v >= 0.95 for v in values):>3}/{len(values)}  identical "
              f"token stream: {same}/{len(values)}")

    print(f"cross-format agreement, {n} invented bodies of 150-1,200 words (heading, list and "
          "table in each); Jaccard of word 5-grams:")
    for name, got in streams.items():
        line(f"{name} vs body", [jac(g, b) for g, b in zip(got, bodies)],
             sum(g == b for g, b in zip(got, bodies)))
    for x, y in combinations(streams, 2):
        line(f"{x} vs {y}", [jac(a, b) for a, b in zip(streams[x], streams[y])],
             sum(a == b for a, b in zip(streams[x], streams[y])))
    if verbose:
        import difflib
        for name, got in streams.items():
            for g, b in zip(got, bodies):
                if g != b:
                    diff = [d for d in difflib.ndiff(b, g) if d[0] in "+-"]
                    print(f"  {name}: {' '.join(diff[:16])}")
                    break


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.split("\n")[0])
    parser.add_argument("--tuning", action="store_true", help="the invented tuning corpus")
    parser.add_argument("--blind", action="store_true",
                        help="the first blind corpus (benchmarks/data/template_blind)")
    parser.add_argument("--corpus", type=Path, action="append", default=[], metavar="DIR",
                        help="a corpus in the blind sets' format: DIR/make_corpus.py (run on "
                             "a copy under --work) or an already generated folder")
    parser.add_argument("--baseline", action="store_true")
    parser.add_argument("--verbose", action="store_true",
                        help="also name the pairs missed and the false duplicates")
    parser.add_argument("--why", action="store_true",
                        help="also name each missed pair with its cause and its texts' "
                             "agreement with their bodies")
    parser.add_argument("--workers", type=int, default=2)
    parser.add_argument("--work", type=Path, default=ROOT / "bench-out" / "templates")
    parser.add_argument("--cost", type=int, default=0, metavar="N")
    parser.add_argument("--cross-format", type=int, default=0, metavar="N",
                        help="the same N bodies as HTML, PDF, text and Markdown: token "
                             "stream agreement")
    args = parser.parse_args()
    args.work.mkdir(parents=True, exist_ok=True)
    if args.cross_format:
        cross_format(args.cross_format, args.verbose)
        return
    if args.cost:
        cost(args.cost, args.work, args.workers)
        return
    if not (args.tuning or args.blind or args.corpus):
        args.tuning = args.blind = True
    if args.tuning:
        corpus = args.work / "tuning-corpus"
        if not (corpus / "pairs.jsonl").exists():
            from benchmarks.template_corpus import make
            make(corpus)
        bench("tuning", corpus, args.work, args.workers, args.baseline, args.verbose,
              args.why)
    if args.blind:
        args.corpus.insert(0, ROOT / "benchmarks" / "data" / "template_blind")
    for source in args.corpus:
        name = source.resolve().name
        name = "blind" if name == "template_blind" else name
        bench(name, generated(source, args.work), args.work, args.workers, args.baseline,
              args.verbose, args.why)


if __name__ == "__main__":
    main()
