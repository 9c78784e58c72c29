"""Where each millisecond of a document goes: CPU ms per document by stage and by check.

    .venv/bin/python benchmarks/breakdown.py [--docs 600] [--workers 1] [--json FILE]
                                             [--before FILE]

Runs ``gate run`` in this process on the bench mix (benchmarks/corpus.py: about 80 % HTML
pages of 10-100 KB with boilerplate, 10 % multi-page PDFs, 10 % plain text; the same
corpus and policy as benchmarks/ratio.py), with probes wrapped around the functions that
do the work, in the parent and (inherited by fork) in the workers. Every figure is CPU
time (``time.process_time``: user + system of the process), so it is stable on a loaded
machine, and *exclusive*: a probe inside another one is charged to itself only, so the
lines of one side add up to that side's probed total; what no probe covers is the
``unprobed`` line (from getrusage of the process and of its finished children).

Worker side: extraction per format and its parts (decoding, lxml parse, trafilatura,
metadata, page blocks), tokenising (``gate.tokens.words``, wherever it is called),
template composition, and each check's ``measure()`` with its heavy parts; the pickling
of a result is timed once more apart (the real one happens after the probe returns).
Parent side: discovery, intake (reading and hashing), staging, cache look-ups, template
learning, per-document evaluation, records, state writes, corpus checks, deciding and
placing, receiving results from the workers.

The last lines give the issue's ratio: all checks' measure() plus template composition
against the whole of extract() (which includes the page's blocks), in per cent. With
``--json`` the figures are written to a file; ``--before`` prints an earlier file's
figures beside this run's.
"""

from __future__ import annotations

import argparse
import functools
import gc
import json
import os
import pickle
import resource
import shutil
import sys
import time
from collections import defaultdict
from pathlib import Path
from typing import Any

ROOT = Path(__file__).resolve().parent.parent
sys.path.insert(0, str(ROOT))

from benchmarks.corpus import BENCH_POLICY, make_corpus  # noqa: E402

AS_OF = "2026-12-01T00:00:00Z"

_acc: dict[str, float] = defaultdict(float)  # exclusive CPU seconds per label
_incl: dict[str, float] = defaultdict(float)  # inclusive CPU seconds (transparent probes)
_stack: list[str] = []
_last = [0.0]


def _forked() -> None:
    """A worker starts with nothing charged: the parent's figures stay the parent's."""
    _acc.clear()
    _incl.clear()
    _stack.clear()
    _last[0] = time.process_time()


os.register_at_fork(after_in_child=_forked)


def _enter(label: str) -> None:
    now = time.process_time()
    if _stack:
        _acc[_stack[-1]] += now - _last[0]
    _stack.append(label)
    _last[0] = now


def _leave() -> None:
    now = time.process_time()
    _acc[_stack.pop()] += now - _last[0]
    _last[0] = now


def _probe(fn: Any, label: str) -> Any:
    @functools.wraps(fn)
    def probed(*args: Any, **kwargs: Any) -> Any:
        _enter(label)
        try:
            return fn(*args, **kwargs)
        finally:
            _leave()
    probed.__probed__ = True  # type: ignore[attr-defined]
    return probed


def _everywhere(owner: Any, name: str, label: str) -> None:
    """Wrap ``owner.name`` and every gate module's attribute bound to the same function
    (a name the code does not have, such as an older version's, is left out)."""
    original = getattr(owner, name, None)
    if original is None:
        return
    if getattr(original, "__probed__", False):
        return
    probed = _probe(original, label)
    setattr(owner, name, probed)
    for module in list(sys.modules.values()):
        if module is None or not getattr(module, "__name__", "").startswith(("gate", "benchmarks")):
            continue
        for attr, value in list(vars(module).items()):
            if value is original:
                setattr(module, attr, probed)


def _install_worker_probes() -> None:
    import lxml.html
    import trafilatura

    import gate.checks
    import gate.extract
    import gate.extract.html as html
    import gate.extract.pdf as pdf
    import gate.extract.text as text
    import gate.intake
    import gate.langid
    import gate.placement
    import gate.templates
    import gate.tokens
    from gate.checks import duplicate
    from gate.checks.injection import screen

    _everywhere(gate.extract, "sniff", "extract: sniffing")
    _everywhere(html, "decode_html", "extract html: decoding")
    _everywhere(lxml.html, "document_fromstring", "extract html: lxml parse")
    _everywhere(trafilatura, "extract", "extract html: trafilatura")
    _everywhere(html, "fallback_text", "extract html: trafilatura")
    _everywhere(html, "max_depth", "extract html: nesting depth")
    _everywhere(html, "_meta_dates", "extract html: metadata")
    _everywhere(html, "_first", "extract html: metadata")
    _everywhere(html, "page_blocks", "blocks: page blocks (html walk)")
    _everywhere(html, "_walk", "blocks: page blocks (html walk)")
    _everywhere(html, "_marked", "blocks: marking the main text's blocks")
    _everywhere(html, "complete_main", "blocks: completing main text")
    _everywhere(gate.extract, "line_blocks", "blocks: line blocks (pdf, text)")
    _everywhere(pdf, "_extract", "extract pdf: pypdf")
    _everywhere(text, "extract_text", "extract text: decoding")
    _everywhere(gate.extract.text, "clean_text", "extract: clean_text")
    _everywhere(gate.tokens, "block_hash", "tokenising: block hashes")
    _everywhere(gate.tokens, "words", "tokenising: words()")
    _everywhere(gate.tokens, "_line_words", "tokenising: words()")
    _everywhere(gate.templates, "block_summary", "blocks: block summary")
    _everywhere(gate.templates, "compose", "templates: composing the page's text")
    _everywhere(duplicate, "shingle_hashes", "measure duplicate: shingle hashes")
    _everywhere(duplicate, "sketch_values" if hasattr(duplicate, "sketch_values")
                else "sketch_hashes", "measure duplicate: MinHash sketch")
    _everywhere(gate.langid, "identify", "measure language: langid.identify")
    _everywhere(screen.html_hidden, "collect", "measure injection: hidden HTML (collect)")
    _everywhere(screen, "_raw_text", "measure injection: raw page text")
    _everywhere(screen.Screen, "scan", "measure injection: scanning sources")
    _everywhere(gate.intake, "read_path", "worker: intake (read, hash)")
    _everywhere(gate.intake, "stage", "worker: staging the bytes")
    _everywhere(gate.intake, "packed", "worker: packing the result (compress, JSON)")
    _everywhere(gate.placement, "build_entry", "worker: building entries (placement)")
    for check in gate.checks.all_checks():
        if check.measure is not None and not getattr(check.measure, "__probed__", False):
            object.__setattr__(check, "measure", _probe(check.measure, f"measure {check.id}"))


def _install_parent_probes() -> None:
    from multiprocessing.connection import Connection

    import gate.commit
    import gate.containers
    import gate.corpus
    import gate.documents as documents
    import gate.pipeline
    import gate.placement
    import gate.report
    import gate.state

    _everywhere(documents, "read_entry", "parent: intake (read, hash)")
    _everywhere(gate.containers, "expand", "parent: discovery")
    _everywhere(gate.placement.Blobs, "put", "parent: staging blobs")
    for name in ("cache_meta", "cache_text"):
        _everywhere(gate.state.State, name, "parent: cache look-ups")
    for name in ("cache_put_packed", "put_run_docs"):
        _everywhere(gate.state.State, name, "parent: state writes (cache, run docs)")
    _everywhere(documents, "extraction_of", "parent: results into records")
    _everywhere(documents, "evaluate_document", "parent: per-document evaluation")
    _everywhere(documents, "doc_record", "parent: records (DocRecord, Slim)")
    _everywhere(documents, "slim", "parent: records (DocRecord, Slim)")
    _everywhere(documents, "learn", "parent: template learning")
    _everywhere(documents, "removal", "parent: template removal sets")
    _everywhere(gate.pipeline, "warm_up", "parent: warm-up (profiles, imports)")
    _everywhere(gate.pipeline, "run_corpus_checks", "parent: corpus checks (duplicates)")
    _everywhere(gate.pipeline, "commit", "parent: commit (decide, record)")
    _everywhere(gate.commit, "_decide_one", "parent: commit: deciding")
    _everywhere(gate.commit, "finish", "parent: commit: placing, report files")
    _everywhere(Connection, "recv", "parent: receiving results (unpickling)")
    _everywhere(Connection, "send", "parent: sending tasks (pickling)")


def _collecting(phase: str, info: dict[str, Any]) -> None:
    """Garbage collections, charged to themselves rather than to what triggered them."""
    if phase == "start":
        _enter(f"garbage collection (generation {info['generation']})")
    elif _stack:
        _leave()


def _worker_process(original: Any, task: Any) -> Any:
    """gate.work.process with the probes' figures added to its timings: those since the
    previous result (this task's intake and staging, the previous result's packing)."""
    _enter("worker: unprobed in process()")
    started = time.process_time()
    result = original(task)
    whole = time.process_time() - started
    _leave()
    if isinstance(result, dict):
        kind = (result.get("extracted") or {}).get("type") or "failed"
        began = time.process_time()
        pickle.dumps(result, protocol=pickle.HIGHEST_PROTOCOL)
        _acc["worker: pickling the result (timed apart)"] += time.process_time() - began
        timings = result.setdefault("timings", {})
        for label, seconds in _acc.items():
            timings[f"probe|{label}"] = seconds
        _acc.clear()
        timings[f"whole|{kind}|{'measure' if result.get('measured') else 'blocks'}"] = whole
        timings[f"count|{kind}|{'measure' if result.get('measured') else 'blocks'}"] = 1.0
    return result


def run_once(docs: int, workers: int) -> dict[str, Any]:
    from gate import checks as _checks  # noqa: F401 - the registry, before probes
    import gate.work
    from gate.pipeline import RunOptions
    from gate.pipeline import run as run_pipeline
    from gate.policy import load_policy
    from gate.dates import parse_as_of

    work = ROOT / "bench-out"
    inbox = make_corpus(work / f"corpus-{docs}", docs)
    policy = work / "bench-policy.yaml"
    policy.write_text(BENCH_POLICY)
    out = work / "breakdown-out"
    shutil.rmtree(out, ignore_errors=True)
    gate.work.warm_up()
    gc.callbacks.append(_collecting)
    _install_worker_probes()
    _install_parent_probes()
    gate.work.process = functools.partial(_worker_process, gate.work.process)
    loaded = load_policy(policy)
    options = RunOptions(inbox=inbox, policy=loaded, out=out, as_of=parse_as_of(AS_OF),
                         workers=workers)
    _acc.clear()
    _stack.clear()
    self0 = resource.getrusage(resource.RUSAGE_SELF)
    kids0 = resource.getrusage(resource.RUSAGE_CHILDREN)
    wall0 = time.perf_counter()
    _enter("parent: unprobed")
    result = run_pipeline(options)
    _leave()
    wall = time.perf_counter() - wall0
    self1 = resource.getrusage(resource.RUSAGE_SELF)
    kids1 = resource.getrusage(resource.RUSAGE_CHILDREN)
    parent_cpu = (self1.ru_utime + self1.ru_stime) - (self0.ru_utime + self0.ru_stime)
    worker_cpu = (kids1.ru_utime + kids1.ru_stime) - (kids0.ru_utime + kids0.ru_stime)
    report = json.loads(result.report_path.read_text())
    decisions = {e["path"]: json.dumps([e["decision"], e["reasons"], e["warnings"],
                                        e["language"], e["text_chars"]], sort_keys=True)
                 for e in report["documents"]}
    worker: dict[str, float] = defaultdict(float)
    whole: dict[str, float] = defaultdict(float)
    counts: dict[str, float] = defaultdict(float)
    for key, seconds in result.timings.items():
        if key.startswith("probe|"):
            worker[key[len("probe|"):]] += seconds
        elif key.startswith("whole|"):
            whole[key[len("whole|"):]] += seconds
        elif key.startswith("count|"):
            counts[key[len("count|"):]] += seconds
        else:
            worker[f"work.py stage {key} (inclusive)"] += 0.0  # names only
    stages = {k: v for k, v in result.timings.items() if "|" not in k}
    return {"docs": report["summary"]["documents"], "workers": workers, "wall_s": wall,
            "parent_cpu_s": parent_cpu, "worker_cpu_s": worker_cpu,
            "parent": dict(_acc), "worker": dict(worker), "whole": dict(whole),
            "counts": dict(counts), "stages": stages, "decisions": decisions}


def _ms(seconds: float, docs: int) -> float:
    return 1000.0 * seconds / docs


def show(now: dict[str, Any], before: dict[str, Any] | None) -> None:
    docs = now["docs"]
    stages = now["stages"]
    extract_s = stages.get("extract", 0.0)

    def line(label: str, seconds: float, old: float | None, base: float) -> None:
        text = f"  {label:58s} {_ms(seconds, docs):8.2f}"
        if base:
            text += f" {seconds / base:7.0%}"
        if old is not None:
            text += f"   (before {_ms(old, before['docs']):7.2f})"
        print(text)

    print(f"{docs} documents, {now['workers']} worker(s), wall {now['wall_s']:.1f} s; CPU "
          f"ms per document (process time, exclusive), % of extract() time")
    print(f"worker side: {_ms(now['worker_cpu_s'], docs):.2f} ms/doc of CPU in the workers "
          f"(getrusage), probes cover {_ms(sum(now['worker'].values()), docs):.2f}")
    old = before["worker"] if before else {}
    for label, seconds in sorted(now["worker"].items()):
        if seconds:
            line(label, seconds, old.get(label) if before else None, extract_s)
    for label in sorted(set(old) - set(now["worker"])):
        line(label, 0.0, old[label], extract_s)
    print("  per pass and format (inclusive process(), documents):")
    for key, seconds in sorted(now["whole"].items()):
        count = int(now["counts"].get(key, 0))
        print(f"    {key:40s} {count:5d} docs {1000 * seconds / max(count, 1):8.2f} ms each")
    print(f"parent side: {_ms(now['parent_cpu_s'], docs):.2f} ms/doc of CPU in the parent "
          f"(getrusage), probes cover {_ms(sum(now['parent'].values()), docs):.2f}")
    old = before["parent"] if before else {}
    for label, seconds in sorted(now["parent"].items()):
        line(label, seconds, old.get(label) if before else None, extract_s)
    checks = sum(v for k, v in stages.items() if k != "extract")
    print("work.py stages (inclusive, CPU): " + ", ".join(
        f"{k} {_ms(v, docs):.2f}" for k, v in sorted(stages.items(), key=lambda kv: -kv[1])))
    print(f"all checks' measure() and template composition: {_ms(checks, docs):.2f} ms/doc "
          f"= {checks / extract_s:.0%} of extract() ({_ms(extract_s, docs):.2f} ms/doc)")
    if before:
        bstages = before["stages"]
        bchecks = sum(v for k, v in bstages.items() if k != "extract")
        print(f"before: {_ms(bchecks, before['docs']):.2f} ms/doc = "
              f"{bchecks / bstages['extract']:.0%} of extract() "
              f"({_ms(bstages['extract'], before['docs']):.2f} ms/doc); total CPU "
              f"{_ms(before['parent_cpu_s'] + before['worker_cpu_s'], before['docs']):.2f} "
              f"ms/doc, now {_ms(now['parent_cpu_s'] + now['worker_cpu_s'], docs):.2f}")
        changed = sorted(p for p, s in now["decisions"].items()
                         if before["decisions"].get(p) != s)
        print(f"decisions that differ from before: {len(changed)}"
              + (": " + ", ".join(changed[:20]) if changed else ""))


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--docs", type=int, default=600)
    parser.add_argument("--workers", type=int, default=1)
    parser.add_argument("--json", type=Path, help="write the figures to this file")
    parser.add_argument("--before", type=Path, help="an earlier --json file to show beside")
    args = parser.parse_args()
    os.environ.pop("GATE_TIMINGS", None)
    now = run_once(args.docs, args.workers)
    before = json.loads(args.before.read_text()) if args.before else None
    show(now, before)
    if args.json:
        args.json.write_text(json.dumps(now, indent=1, sort_keys=True))


if __name__ == "__main__":
    main()
