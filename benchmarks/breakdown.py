"""Where each millisecond of a document goes: CPU ms per document by stage and by check.

    .venv/bin/python benchmarks/breakdown.py [--docs 600] [--workers 1] [--json FILE]
                                             [--before FILE] [--timeline]

Runs ``gate run`` in this process on the bench mix (benchmarks/corpus.py: about 80 % HTML
pages of 10-100 KB with boilerplate, 10 % multi-page PDFs, 10 % plain text; the same
corpus and policy as benchmarks/ratio.py), with probes wrapped around the functions that
do the work, in the parent and (inherited by fork) in the workers. Every figure is CPU
time, so it is stable on a loaded machine: in the parent the process's
(``time.process_time``), in a worker its thread's (``time.thread_time``, as gate.work times
itself: while the pool's CPU-time limit is armed the kernel updates a process's CPU clock
only now and then, so short spans read wrong), and *exclusive*: a probe inside another
one is charged to itself only, so the lines of one side add up to that side's probed
total; what no probe covers is the ``unprobed`` line (from getrusage of the process and of
its finished children).

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

``--timeline`` adds the wall-time budget of the run (use it with ``--workers 2``): the
parent's phases in order (start-up before the first pass, each pass of the worker pool,
template learning, corpus checks, deciding, placing), and for each pass how long all, some
or none of the workers were busy, its tail (from the last moment every worker was busy to
its end) and the parent's own time between two results. Wall figures grow on a loaded
machine; the CPU seconds of each phase (parent, workers) beside them do not.
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
import subprocess
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
_calls: dict[str, int] = defaultdict(int)  # calls per label (how often a page is parsed, walked)
_stack: list[str] = []
_last = [0.0]
_clock = [time.process_time]  # the worker's own thread clock after a fork (see above)


def _forked() -> None:
    """A worker starts with nothing charged: the parent's figures stay the parent's."""
    _acc.clear()
    _incl.clear()
    _calls.clear()
    _stack.clear()
    _clock[0] = time.thread_time
    _last[0] = _clock[0]()


os.register_at_fork(after_in_child=_forked)


def _enter(label: str) -> None:
    now = _clock[0]()
    if _stack:
        _acc[_stack[-1]] += now - _last[0]
    _stack.append(label)
    _last[0] = now


def _leave() -> None:
    now = _clock[0]()
    _acc[_stack.pop()] += now - _last[0]
    _last[0] = now


def _probe(fn: Any, label: str) -> Any:
    @functools.wraps(fn)
    def probed(*args: Any, **kwargs: Any) -> Any:
        _calls[label] += 1
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
    import gate.extract.model
    import gate.intake
    import gate.judge
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
    _everywhere(html, "fallback_text", "extract html: fallback text (trafilatura gave none)")
    _everywhere(html, "max_depth", "extract html: nesting depth")
    _everywhere(html, "_meta_dates", "extract html: metadata (xpath queries)")
    _everywhere(html, "_first", "extract html: metadata (xpath queries)")
    _everywhere(html, "page_blocks", "blocks: page blocks (html walk)")
    _everywhere(html, "_walk", "blocks: page blocks (html walk)")
    _everywhere(html, "_marked", "blocks: marking the main text's blocks")
    _everywhere(html, "complete_main", "blocks: completing main text")
    _everywhere(html, "without_teasers", "blocks: teaser lists")
    _everywhere(html, "with_title", "blocks: the page's title")
    _everywhere(html, "_line_digests", "blocks: line digests")
    _everywhere(gate.extract.model, "line_hashes", "blocks: line digests")
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
    _everywhere(gate.judge, "judged", "worker: verdict (evaluation, record, Slim)")
    for check in gate.checks.all_checks():
        if check.measure is not None and not getattr(check.measure, "__probed__", False):
            object.__setattr__(check, "measure", _probe(check.measure, f"measure {check.id}"))


def _install_parent_probes() -> None:
    from multiprocessing.connection import Connection
    from multiprocessing.process import BaseProcess

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
    _everywhere(BaseProcess, "start", "parent: forking workers")


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
    started = _clock[0]()
    result = original(task)
    whole = _clock[0]() - started
    _leave()
    if isinstance(result, dict):
        kind = (result.get("extracted") or {}).get("type") or "failed"
        began = _clock[0]()
        pickle.dumps(result, protocol=pickle.HIGHEST_PROTOCOL)
        _acc["worker: pickling the result (timed apart)"] += _clock[0]() - began
        timings = result.setdefault("timings", {})
        for label, seconds in _acc.items():
            timings[f"probe|{label}"] = seconds
        _acc.clear()
        step = f"{kind}|{'measure' if result.get('measured') else 'blocks'}"
        for label, calls in _calls.items():
            timings[f"calls|{step}|{label}"] = float(calls)
        _calls.clear()
        timings[f"whole|{step}"] = whole
        timings[f"count|{step}"] = 1.0
    return result


_spans: list[tuple[str, float, float, float, float]] = []  # parent: label, wall, CPU
_timeline_file: list[str] = []  # where the workers append their spans (JSON lines)


def _span(fn: Any, label: str) -> Any:
    """A parent phase's wall-clock span and CPU seconds (a generator: from its call to
    its exhaustion, with the time spent inside it apart from the consumer's)."""
    import inspect

    if inspect.isgeneratorfunction(fn):
        @functools.wraps(fn)
        def spanned_gen(*args: Any, **kwargs: Any) -> Any:
            wall0, cpu0 = time.monotonic(), time.process_time()
            inside = 0.0
            gen = fn(*args, **kwargs)
            try:
                while True:
                    began = time.monotonic()
                    try:
                        item = next(gen)
                    except StopIteration:
                        break
                    finally:
                        inside += time.monotonic() - began
                    yield item
            finally:
                _spans.append((label, wall0, time.monotonic(), time.process_time() - cpu0,
                               inside))
        return spanned_gen

    @functools.wraps(fn)
    def spanned(*args: Any, **kwargs: Any) -> Any:
        wall0, cpu0 = time.monotonic(), time.process_time()
        try:
            return fn(*args, **kwargs)
        finally:
            _spans.append((label, wall0, time.monotonic(), time.process_time() - cpu0, 0.0))
    return spanned


def _worker_span(original: Any, task: Any) -> Any:
    """gate.intake.work_on with its wall-clock span and CPU time appended to the timeline
    file (one line per task; a batch of small tasks gives one line each)."""
    wall0, cpu0 = time.monotonic(), _clock[0]()
    result = original(task)
    wall1, cpu = time.monotonic(), _clock[0]() - cpu0
    inner = result.get("result") if isinstance(result, dict) else None
    kind = ((inner or {}).get("extracted") or {}).get("type") or type(task).__name__
    second = bool(getattr(task, "extra", None))
    with open(_timeline_file[0], "a", encoding="utf-8") as fh:
        fh.write(json.dumps([os.getpid(), wall0, wall1, cpu, kind, second]) + "\n")
    return result


def _install_timeline(folder: Path) -> None:
    import gate.cluster
    import gate.commit
    import gate.corpus
    import gate.documents as documents
    import gate.extract.pool
    import gate.intake
    import gate.pipeline

    _timeline_file[:] = [str(folder / "worker-spans.jsonl")]
    Path(_timeline_file[0]).write_text("")
    gate.cluster.work_on = functools.partial(_worker_span, gate.intake.work_on)
    pool = gate.extract.pool.WorkerPool
    pool.run = _span(pool.run, "pool")
    documents.check_documents = _span(documents.check_documents, "documents")
    gate.pipeline.check_documents = documents.check_documents
    for module, name, label in (
            (documents, "learn", "template learning"),
            (gate.pipeline, "warm_up", "warm-up (profiles, imports)"),
            (gate.pipeline, "run_corpus_checks", "corpus checks"),
            (gate.pipeline, "commit", "commit (decide, record, place)"),
            (gate.commit, "finish", "placing, report files")):
        setattr(module, name, _span(getattr(module, name), label))


def run_once(docs: int, workers: int, timeline: bool = False) -> dict[str, Any]:
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
    if timeline:
        _install_timeline(work)
    loaded = load_policy(policy)
    options = RunOptions(inbox=inbox, policy=loaded, out=out, as_of=parse_as_of(AS_OF),
                         workers=workers)
    _acc.clear()
    _stack.clear()
    self0 = resource.getrusage(resource.RUSAGE_SELF)
    kids0 = resource.getrusage(resource.RUSAGE_CHILDREN)
    wall0 = time.perf_counter()
    start = time.monotonic()
    _enter("parent: unprobed")
    result = run_pipeline(options)
    _leave()
    wall = time.perf_counter() - wall0
    end = time.monotonic()
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
    calls: dict[str, float] = defaultdict(float)
    for key, seconds in result.timings.items():
        if key.startswith("calls|"):
            calls[key[len("calls|"):]] += seconds
        elif key.startswith("probe|"):
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
            "counts": dict(counts), "calls": dict(calls), "stages": stages,
            "decisions": decisions, "startup": startup_cpu(),
            "timeline": _timeline(start, end) if timeline else None}


_STARTUP = """
import json, time
t0 = time.process_time()
import gate.cli  # what the command loads (typer, pydantic, the checks)
import gate.pipeline  # noqa: F401 - and what a run loads (datasketch, lxml, trafilatura)
t1 = time.process_time()
from gate.work import warm_up
warm_up()
print(json.dumps([t1 - t0, time.process_time() - t1]))
"""


def startup_cpu() -> dict[str, float]:
    """The CPU seconds a `gate run` spends before its first document, on one core: the
    imports and the warm-up (language profiles, extractors) that every forked worker
    inherits, measured in a fresh interpreter (best of two: a cold page cache reads more)."""
    best = [float("inf"), float("inf")]
    for _ in range(2):
        out = subprocess.run([sys.executable, "-c", _STARTUP], cwd=ROOT, text=True,
                             capture_output=True, check=True).stdout
        best = [min(a, b) for a, b in zip(best, json.loads(out))]
    return {"imports": best[0], "warm_up": best[1]}


def _occupancy(spans: list[tuple[float, float]], begin: float, end: float,
               workers: int) -> tuple[dict[int, float], float]:
    """Seconds of [begin, end] during which 0, 1, ... workers were busy, and the tail:
    from the last moment all ``workers`` were busy (or ``begin``) to ``end``."""
    points = sorted([(max(s, begin), 1) for s, e in spans if e > begin and s < end] +
                    [(min(e, end), -1) for s, e in spans if e > begin and s < end])
    busy: dict[int, float] = defaultdict(float)
    level, at, full_until = 0, begin, begin
    for moment, step in points:
        busy[level] += moment - at
        if level >= workers:
            full_until = moment
        level += step
        at = moment
    busy[level] += end - at
    return dict(busy), end - full_until


def _timeline(start: float, end: float) -> dict[str, Any]:
    """The run's wall-time budget (see the module docstring)."""
    rows = [json.loads(line) for line in Path(_timeline_file[0]).read_text().splitlines()]
    workers = len({pid for pid, *_rest in rows}) or 1
    phases = []
    passes = 0
    for label, wall0, wall1, cpu, inside in sorted(_spans, key=lambda s: s[1]):
        phase = {"label": label, "from": wall0 - start, "to": wall1 - start, "cpu": cpu}
        if label == "pool":
            spans = [(s, e) for _pid, s, e, *_rest in rows if s >= wall0 and e <= wall1]
            mine = [r for r in rows if r[1] >= wall0 and r[2] <= wall1]
            if not mine:
                continue  # an empty pass
            passes += 1
            busy, tail = _occupancy(spans, wall0, wall1, 2)
            kinds: dict[str, int] = defaultdict(int)
            for row in mine:
                kinds[f"{row[4]}{' (2nd)' if row[5] else ''}"] += 1
            # between two tasks of one worker: its result to the parent, the next task
            # back (pipe, pickling, the parent's turn)
            mine_by: dict[int, list[tuple[float, float]]] = defaultdict(list)
            for row in mine:
                mine_by[row[0]].append((row[1], row[2]))
            waits = [b[0] - a[1] for spans_of in mine_by.values()
                     for a, b in zip(sorted(spans_of), sorted(spans_of)[1:])]
            phase.update(label=f"pool pass {passes}", busy=busy, tail=tail,
                         between=sum(waits), gaps=sum(1 for w in waits if w > 0.0005),
                         parent_outside=(wall1 - wall0) - inside,
                         worker_cpu=sum(r[3] for r in mine),
                         tasks=dict(kinds), first_task=min(r[1] for r in mine) - wall0,
                         longest=max(r[2] - r[1] for r in mine),
                         longest_cpu=max(r[3] for r in mine))
        phases.append(phase)
    return {"wall": end - start, "workers": workers, "phases": phases}


def show_timeline(timeline: dict[str, Any]) -> None:
    print(f"wall-time budget of the run ({timeline['wall']:.2f} s wall; from the start of "
          "gate's run(); CPU s of the parent, and of the workers in a pass):")
    covered = 0.0
    last = 0.0
    for phase in timeline["phases"]:
        if phase["label"] == "documents":
            continue  # the passes and learning inside it are shown
        gap = phase["from"] - last
        if gap > 0.005:
            print(f"  {'':30s} {last:7.2f} -> {phase['from']:7.2f}  {gap:6.2f} s  "
                  "parent, in no phase listed (set-up, discovery, evaluation)")
        print(f"  {phase['label']:30s} {phase['from']:7.2f} -> {phase['to']:7.2f}  "
              f"{phase['to'] - phase['from']:6.2f} s  parent CPU {phase['cpu']:6.2f} s")
        if "busy" in phase:
            busy = phase["busy"]
            print(f"      {', '.join(f'{n} {v}' for n, v in sorted(phase['tasks'].items()))}"
                  f"; workers' CPU {phase['worker_cpu']:.2f} s")
            print(f"      both workers busy {busy.get(2, 0.0):.2f} s, one {busy.get(1, 0.0):.2f}"
                  f" s, none {busy.get(0, 0.0):.2f} s (first task began after "
                  f"{phase['first_task']:.2f} s); tail {phase['tail']:.2f} s; longest task "
                  f"{phase['longest']:.2f} s wall, {phase['longest_cpu']:.2f} s CPU")
            print(f"      the parent outside the pool (filing results, evaluating) "
                  f"{phase['parent_outside']:.2f} s; workers waiting between two of their "
                  f"tasks {phase['between']:.2f} s in all ({phase['gaps']} waits over 0.5 ms)")
        covered += phase["to"] - phase["from"]
        last = max(last, phase["to"])
    if timeline["wall"] - last > 0.005:
        print(f"  {'':30s} {last:7.2f} -> {timeline['wall']:7.2f}  "
              f"{timeline['wall'] - last:6.2f} s  parent, after the last phase listed")


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
          "ms per document (exclusive; the parent's process time, the workers' thread "
          "time), % of extract() time")
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
    show_calls(now)
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


# the probes that read a page's whole tree (or parse it): how often each runs per page
_TREE_READS = ("extract html: lxml parse", "extract html: trafilatura",
               "extract html: fallback text (trafilatura gave none)",
               "extract html: nesting depth", "blocks: page blocks (html walk)",
               "extract html: metadata (xpath queries)", "blocks: the page's title",
               "measure injection: hidden HTML (collect)", "measure injection: raw page text",
               "extract pdf: pypdf", "tokenising: words()", "tokenising: block hashes",
               "measure language: langid.identify", "blocks: block summary")


def show_calls(now: dict[str, Any]) -> None:
    """Calls per document of the probes that parse or walk a whole page, per pass."""
    calls = now.get("calls") or {}
    steps = sorted({key.rsplit("|", 1)[0] for key in calls})
    if not steps:
        return
    print("  calls per document and pass (how often a page is parsed, walked, tokenised):")
    print(f"    {'':52s}" + "".join(f"{step:>15s}" for step in steps))
    for label in _TREE_READS:
        row = [calls.get(f"{step}|{label}", 0.0) / max(now["counts"].get(step, 0.0), 1.0)
               for step in steps]
        if any(row):
            print(f"    {label:52s}" + "".join(f"{value:15.2f}" for value in row))


def show_startup(now: dict[str, Any], before: dict[str, Any] | None) -> None:
    start = now.get("startup")
    if not start:
        return
    old = (before or {}).get("startup")
    print(f"start-up on one core before the first document (a fresh interpreter, CPU s): "
          f"imports {start['imports']:.2f}, warm-up {start['warm_up']:.2f}"
          + (f" (before {old['imports']:.2f}, {old['warm_up']:.2f})" if old else "")
          + "; the workers are forked after it and inherit both")


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--docs", type=int, default=600)
    parser.add_argument("--workers", type=int, default=1)
    parser.add_argument("--json", type=Path, help="write the figures to this file")
    parser.add_argument("--before", type=Path, help="an earlier --json file to show beside")
    parser.add_argument("--timeline", action="store_true",
                        help="also the run's wall-time budget (phases, busy workers, tail)")
    args = parser.parse_args()
    os.environ.pop("GATE_TIMINGS", None)
    now = run_once(args.docs, args.workers, args.timeline)
    before = json.loads(args.before.read_text()) if args.before else None
    show(now, before)
    show_startup(now, before)
    if now["timeline"]:
        show_timeline(now["timeline"])
    if args.json:
        args.json.write_text(json.dumps(now, indent=1, sort_keys=True))


if __name__ == "__main__":
    main()
