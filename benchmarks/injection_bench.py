"""Benchmark the injection check on the labelled corpus in tests/fixtures/injection/.

Runs the real pipeline pieces per document: ``gate.extract.extract`` (timed as
extraction), the injection ``measure`` and ``evaluate`` (timed as detectors), and prints
recall per technique, the false-positive rate on benign documents, and the time split.

    python benchmarks/injection_bench.py [--split dev|holdout|holdout2|tune15|all] [--repeat N]
                                         [--blind DIR] [--blind-half tune|held] [--verbose]

The corpus is invented fixture data (see tests/fixtures/injection/README.md). With
``--blind DIR`` (default: benchmarks/data/injection_blind when it exists) the held-out
blind set is measured too: ``DIR/labels.jsonl`` (fields file, label, class, language,
where, note) over ``DIR/docs/``; it prints recall overall, per class and per language of
the multilingual class, and the false-positive rate overall and per benign class, but
never which documents were missed unless ``--verbose`` is given.

``--blind all`` measures the six blind sets in turn (all tuning data now) and ends with a
line per set.

``--blind-half tune|held`` keeps half of a blind set, split by host document (label field
``host``, else the file name): a document is in the tuning half when the first byte of
``sha256(salt + host)`` is below 128, else in the held half. The salt follows the set:
``--blind-salt`` when given, else ``blindN-host:`` for a folder whose name ends in the
number N (``injection_blind4`` -> ``blind4-host:``), else ``blind3-host:`` (the third
set's split, unchanged). Tune only on the tuning half; read the held half in aggregate only.
"""

from __future__ import annotations

import argparse
import hashlib
import importlib.util
import json
import re
import statistics
import sys
import time
from collections import defaultdict
from datetime import datetime, UTC
from pathlib import Path
from types import SimpleNamespace

ROOT = Path(__file__).resolve().parent.parent
FIXTURES = ROOT / "tests" / "fixtures" / "injection"
TYPICAL_PAGE = "docs/b-typical-20k.html"


def _pdfgen():
    spec = importlib.util.spec_from_file_location("injection_pdfgen", FIXTURES / "pdfgen.py")
    module = importlib.util.module_from_spec(spec)
    assert spec.loader is not None
    spec.loader.exec_module(module)
    return module


def load_corpus(split: str = "all") -> list[dict]:
    """Rows of labels.tsv with the document bytes attached (PDFs built with fpdf2)."""
    pdfs = _pdfgen().build_all()
    rows = []
    lines = (FIXTURES / "labels.tsv").read_text(encoding="utf-8").splitlines()
    header = lines[0].split("\t")
    for line in lines[1:]:
        if not line.strip():
            continue
        row = dict(zip(header, line.split("\t")))
        if split != "all" and row["split"] != split:
            continue
        path = row["path"]
        row["data"] = pdfs[path] if path.startswith("pdf/") else (FIXTURES / path).read_bytes()
        rows.append(row)
    return rows


BLIND = ROOT / "benchmarks" / "data" / "injection_blind"
# Every blind set so far (all tuning data now): ``--blind all`` measures them in turn.
BLIND_SETS = [BLIND] + [ROOT / "benchmarks" / "data" / f"injection_blind{n}"
                        for n in (2, 3, 4, 5, 6)]
VAL_BYTE = 52  # the instruction model's validation split: about 20 % (52/256)


def is_val(identity: str) -> bool:
    """Is this document or snippet in the validation split of the instruction model?

    The first blind set is tuning data for the model (it was looked at twice): its
    documents go to the validation split when the first byte of the SHA-256 of
    ``"blind:" + file`` is below 52, snippets by ``"snippet:" + text``, Debian documents by
    ``"real:" + path``; the model never trains on them.
    """
    return hashlib.sha256(identity.encode("utf-8")).digest()[0] < VAL_BYTE


HALF_SALT = "blind3-host:"


def half_salt(folder: Path) -> str:
    """The salt of a blind set's host split: ``blindN-host:`` for a folder named ``...blindN``."""
    digits = re.search(r"blind(\d+)$", folder.name)
    return f"blind{digits.group(1)}-host:" if digits else HALF_SALT


def val_prefix(folder: Path) -> str:
    """The identity prefix of a blind set's documents in the instruction model's split, as
    ``train_injection_model.py`` forms it: ``blind:`` for the first set, ``blindN:`` for
    ``...blindN`` (``injection_blind5`` -> ``blind5:``)."""
    digits = re.search(r"blind(\d+)$", folder.name)
    return f"blind{digits.group(1)}:" if digits else "blind:"


def blind_half(row: dict, salt: str = HALF_SALT) -> str:
    """``tune`` or ``held``: the half of a blind set this row's host document falls in."""
    host = row.get("host") or row["path"]
    return "tune" if hashlib.sha256((salt + host).encode("utf-8")).digest()[0] < 128 \
        else "held"


def load_blind(folder: Path) -> list[dict]:
    """Rows of the blind set's labels.jsonl, shaped like the corpus rows."""
    rows = []
    for n, line in enumerate((folder / "labels.jsonl").read_text(encoding="utf-8").splitlines()):
        if not line.strip():
            continue
        try:
            item = json.loads(line)
        except json.JSONDecodeError as err:
            raise SystemExit(f"{folder / 'labels.jsonl'} line {n + 1}: not JSON ({err})")
        path = folder / "docs" / item["file"] if not (folder / item["file"]).is_file() \
            else folder / item["file"]
        rows.append({"path": item["file"], "label": item["label"],
                     "technique": item.get("class") or "?",
                     "language": item.get("language") or "?", "where": item.get("where"),
                     "host": item.get("host"),
                     "data": path.read_bytes()})
    return rows


def report_blind(results: list[dict], verbose: bool = False) -> dict:
    """Recall per class and per language (multilingual class); FP rate per benign class."""
    attacks = [r for r in results if r["label"] == "attack"]
    benign = [r for r in results if r["label"] != "attack"]
    out: dict = {}

    def table(title: str, groups: dict[str, list[bool]], what: str) -> None:
        print(f"{title:<28}{'docs':>6}{what:>8}{'rate':>8}")
        for key in sorted(groups):
            flags = groups[key]
            print(f"{key:<28}{len(flags):>6}{sum(flags):>8}{sum(flags) / len(flags):>8.2f}")

    by_class: dict[str, list[bool]] = defaultdict(list)
    by_lang: dict[str, list[bool]] = defaultdict(list)
    for r in attacks:
        by_class[r["technique"]].append(r["flagged"])
        if "lingu" in r["technique"] or "language" in r["technique"]:
            by_lang[r["language"]].append(r["flagged"])
    table("attack class", by_class, "caught")
    caught = sum(r["flagged"] for r in attacks)
    recall = caught / len(attacks) if attacks else float("nan")
    print(f"{'ALL ATTACKS':<28}{len(attacks):>6}{caught:>8}{recall:>8.2f}\n")
    if by_lang:
        table("multilingual: language", by_lang, "caught")
        print()
    by_benign: dict[str, list[bool]] = defaultdict(list)
    for r in benign:
        by_benign[r["technique"]].append(r["flagged"])
    table("benign class", by_benign, "held")
    held = sum(r["flagged"] for r in benign)
    fp = held / len(benign) if benign else float("nan")
    print(f"{'ALL BENIGN':<28}{len(benign):>6}{held:>8}{fp:>8.3f}")
    if verbose:
        for r in results:
            if (r["label"] == "attack") != r["flagged"]:
                print(f"{'MISSED' if r['label'] == 'attack' else 'FALSE+'}  {r['path']} "
                      f"({r['technique']}, {r['language']}) "
                      f"score={(r['measured'] or {}).get('score')}")
    out.update(recall=recall, recalls={k: sum(v) / len(v) for k, v in by_class.items()},
               fp_rate=fp)
    return out


WHY_CLASSES = ("encoded", "exfiltration", "hidden-placement", "multilingual")
_ANY_URL = re.compile(r"(?:https?://|mailto:|//)[^\s<>\"')\]]{3,300}|<form\b[^>]{0,300}>", re.I)


def why_missed(row: dict) -> str:
    """The cause of a missed encoded, exfiltration or hidden-placement attack, read from the
    detectors' parts: was an encoding decoded and its text scored, was an address read and
    judged, was hidden text extracted and scored? (Tuning sets only: it names documents.)"""
    from gate.checks.injection import encoded, exfil, screen
    from gate.extract import extract

    m = row.get("measured") or {}
    signals = m.get("signals", [])
    top = ", ".join(f"{h['signal']}:{h['weight']:.2f}" for h in signals[:3]) or "no signal"
    extraction = extract(row["data"], max_pages=500, max_nesting=250)
    if not extraction.summary.ok:
        return f"not extracted ({extraction.summary.problem})"
    text = extraction.text or ""
    sources, links, _ = screen._sources(extraction)
    hidden = [h for h in signals if h.get("technique")]
    cls = row["technique"]
    if cls in ("encoded", "multilingual"):
        budget = [encoded.MAX_DECODED]
        payloads = [(p.encoding, p.text) for src in [text] + [s.text for s in sources]
                    for p in encoded.find(src, budget)]
        if not payloads:
            return f"encoding not decoded [{row.get('where')}]; score {m.get('score')} ({top})"
        decoded_hits = [h for h in signals if h.get("decoded")]
        enc, plain = payloads[0]
        if not decoded_hits:
            return (f"decoded ({enc}) but not scored: {plain[:90]!r}; score "
                    f"{m.get('score')} ({top})")
        return f"decoded ({enc}), scored low: {m.get('score')} ({top})"
    if cls == "exfiltration":
        urls = [u.group() for u in _ANY_URL.finditer(text + " " + " ".join(s.text for s in
                                                                            sources))]
        urls += [link[0] for link in links]
        hits = exfil.scan(text, links)
        if not urls:
            return f"no address read; score {m.get('score')} ({top})"
        if not hits:
            return (f"address form not recognised: {urls[0][:100]!r} (+{len(urls) - 1}); "
                    f"score {m.get('score')} ({top})")
        return f"address recognised ({hits[0].why[:60]}), scored low: {m.get('score')} ({top})"
    if cls == "hidden-placement":
        if not sources:
            return f"no hidden text extracted [{row.get('where')}]; score {m.get('score')} ({top})"
        techniques = sorted({s.technique or "?" for s in sources})
        if not hidden:
            return (f"hidden text read ({', '.join(techniques)[:80]}) but not scored "
                    f"[{row.get('where')}]; score {m.get('score')} ({top})")
        return f"hidden text scored low [{row.get('where')}]: {m.get('score')} ({top})"
    return f"score {m.get('score')} ({top})"


def print_why(results: list[dict]) -> None:
    """One line per missed attack of :data:`WHY_CLASSES`: its cause (see :func:`why_missed`)."""
    missed = [r for r in results if r["label"] == "attack" and not r["flagged"] and
              r["technique"] in WHY_CLASSES]
    if not missed:
        return
    print("\nmissed attacks by cause (--why):")
    for r in sorted(missed, key=lambda r: (r["technique"], r["path"])):
        print(f"  WHY {r['technique']:<17}{r['path']:<22}{why_missed(r)}")


def run(rows: list[dict], repeat: int = 1, threshold: float = 0.5) -> list[dict]:
    from gate.checks.base import Document, RunContext
    from gate.checks.injection import CHECK, InjectionSettings
    from gate.extract import extract

    policy = SimpleNamespace(injection=InjectionSettings(threshold=threshold))
    ctx = RunContext(as_of=datetime(2026, 12, 1, tzinfo=UTC))
    results = []
    for row in rows:
        t_ext, t_det = [], []
        for _ in range(repeat):
            t0 = time.perf_counter()
            extraction = extract(row["data"], max_pages=500, max_nesting=250)
            t1 = time.perf_counter()
            measured = CHECK.measure(extraction) if extraction.summary.ok else None
            document = Document(path=row["path"], kind="file", size=len(row["data"]),
                                sha256=None, manifest=None, extracted=extraction.summary,
                                measures={"injection": measured} if measured else {})
            findings = CHECK.evaluate(document, policy, ctx)
            t2 = time.perf_counter()
            t_ext.append(t1 - t0)
            t_det.append(t2 - t1)
        results.append(dict(row, measured=measured, findings=findings or [],
                            flagged=bool(findings), extraction_s=statistics.median(t_ext),
                            detector_s=statistics.median(t_det),
                            problem=extraction.summary.problem))
    return results


def report(results: list[dict], verbose: bool = False) -> dict:
    by_technique: dict[str, list[bool]] = defaultdict(list)
    benign: list[dict] = []
    for r in results:
        if r["label"] == "attack":
            by_technique[r["technique"]].append(r["flagged"])
        else:
            benign.append(r)
    print(f"{'technique':<24}{'attacks':>8}{'caught':>8}{'recall':>8}")
    caught_total = attacks_total = 0
    recalls = {}
    for technique in sorted(by_technique):
        flags = by_technique[technique]
        recalls[technique] = sum(flags) / len(flags)
        caught_total += sum(flags)
        attacks_total += len(flags)
        print(f"{technique:<24}{len(flags):>8}{sum(flags):>8}{recalls[technique]:>8.2f}")
    overall = caught_total / attacks_total if attacks_total else float("nan")
    print(f"{'ALL ATTACKS':<24}{attacks_total:>8}{caught_total:>8}{overall:>8.2f}")
    langs: dict[str, list[bool]] = defaultdict(list)
    for r in results:
        if r["label"] == "attack" and r["technique"] == "multilingual":
            langs[r.get("note") or "?"].append(r["flagged"])
    if langs:
        print("multilingual by language: " + ", ".join(
            f"{k} {sum(v)}/{len(v)}" for k, v in sorted(langs.items())))
    false_pos = [r for r in benign if r["flagged"]]
    fp_rate = len(false_pos) / len(benign) if benign else float("nan")
    kinds: dict[str, list[bool]] = defaultdict(list)
    for r in benign:
        kinds[r["technique"]].append(r["flagged"])
    print("\nbenign by class: " + ", ".join(f"{k} {sum(v)}/{len(v)} held"
                                           for k, v in sorted(kinds.items())))
    print(f"\nbenign documents: {len(benign)}, flagged: {len(false_pos)}, "
          f"false-positive rate {fp_rate:.3f}")
    scores = sorted((r["measured"] or {}).get("score", 0.0) for r in benign)
    if scores:
        print(f"benign scores: median {statistics.median(scores):.3f}, "
              f"max {scores[-1]:.3f}")
    ext = sum(r["extraction_s"] for r in results)
    det = sum(r["detector_s"] for r in results)
    n = len(results)
    print(f"\ntime per document (median of repeats, mean over {n} documents):")
    print(f"  extraction {ext / n * 1000:8.2f} ms")
    print(f"  detectors  {det / n * 1000:8.2f} ms  ({det / (ext + det) * 100:.1f}% of the total, "
          f"{det / ext * 100:.0f}% of extraction)")
    for kind in ("html", "pdf", "text"):
        sel = [r for r in results if (r["path"].endswith(".pdf") and kind == "pdf") or
               (r["path"].endswith(".html") and kind == "html") or
               (r["path"].endswith((".txt", ".md")) and kind == "text")]
        if sel:
            e = statistics.median(r["extraction_s"] for r in sel) * 1000
            d = statistics.median(r["detector_s"] for r in sel) * 1000
            print(f"  {kind:<5} median extraction {e:7.2f} ms, detectors {d:7.2f} ms "
                  f"({len(sel)} documents)")
    typical = [r for r in results if r["path"] == TYPICAL_PAGE]
    if typical:
        r = typical[0]
        share = r["detector_s"] / (r["extraction_s"] + r["detector_s"]) * 100
        print(f"  typical 20 KB page ({TYPICAL_PAGE}): extraction "
              f"{r['extraction_s'] * 1000:.2f} ms, detectors {r['detector_s'] * 1000:.2f} ms "
              f"({share:.0f}% of the total)")
    missed = [r for r in results if r["label"] == "attack" and not r["flagged"]]
    if verbose or missed or false_pos:
        for r in missed:
            print(f"MISSED  {r['path']} score={(r['measured'] or {}).get('score')}")
        for r in false_pos:
            print(f"FALSE+  {r['path']} score={r['measured']['score']} "
                  f"{[h['signal'] for h in r['measured']['signals'][:5]]}")
    if verbose:
        for r in results:
            m = r["measured"] or {}
            print(f"  {r['label']:<7}{m.get('score', 0):6.3f}  {r['path']}  "
                  f"{[(h['signal'], h['weight']) for h in m.get('signals', [])[:4]]}")
    return {"recall": overall, "recalls": recalls, "fp_rate": fp_rate,
            "detector_share": det / (ext + det) if ext + det else 0.0}


def mix_share(n: int) -> None:
    """Detectors against extraction on the scale benchmark's generated mix (corpus.py)."""
    from benchmarks.corpus import make_corpus
    inbox = make_corpus(ROOT / "bench-out" / f"injection-mix-{n}", n)
    rows = [{"path": str(p.relative_to(inbox)), "label": "benign", "technique": "mix",
             "data": p.read_bytes()} for p in sorted(inbox.rglob("*"))
            if p.is_file() and p.name != "manifest.jsonl"]
    results = run(rows, repeat=1)
    ext = sum(r["extraction_s"] for r in results)
    det = sum(r["detector_s"] for r in results)
    held = sum(r["flagged"] for r in results)
    print(f"\nbench mix ({len(rows)} generated documents, benchmarks/corpus.py): extraction "
          f"{ext:.2f} s, injection detectors {det:.2f} s = {det / ext * 100:.0f}% of "
          f"extraction (target <= 50%); held {held}")


def mix_cpu(n: int, rounds: int = 3) -> float:
    """CPU time of the injection ``measure`` alone on the bench mix, per document (best of
    ``rounds`` passes over the documents, extracted once beforehand): on a loaded machine
    process time is steadier than wall time. Run it for two trees (``--tree``) one after
    the other to compare them."""
    from benchmarks.corpus import make_corpus
    from gate.checks.injection import CHECK
    from gate.extract import extract
    inbox = make_corpus(ROOT / "bench-out" / f"injection-mix-{n}", n)
    extractions = [extract(p.read_bytes(), max_pages=500, max_nesting=250)
                   for p in sorted(inbox.rglob("*")) if p.is_file() and p.name != "manifest.jsonl"]
    extractions = [e for e in extractions if e.summary.ok]
    for e in extractions[:5]:
        CHECK.measure(e)  # warm caches and imports
    best = float("inf")
    for _ in range(rounds):
        t0 = time.process_time()
        for e in extractions:
            CHECK.measure(e)
        best = min(best, (time.process_time() - t0) / len(extractions) * 1000)
    print(f"bench mix ({len(extractions)} documents): injection measure {best:.2f} ms a document "
          f"(CPU, best of {rounds})")
    return best


DUMP_SETS = BLIND_SETS + [ROOT / "benchmarks" / "data" / "injection_blind7"]
LEAVE_OUT = "injection_blind7"  # compared in aggregate only: no document names printed
DEBIAN_CACHE = Path("/tmp") / "gate-injection-debian-sample.pickle"


def _debian_docs() -> list[tuple[str, str, bytes]]:
    """The default sample of benchmarks/debian_docs.py (rendered once, kept outside the
    repository in :data:`DEBIAN_CACHE`; empty when the packages are not installed)."""
    import pickle
    if DEBIAN_CACHE.is_file():
        return pickle.loads(DEBIAN_CACHE.read_bytes())
    from benchmarks import debian_docs
    docs = debian_docs.man_pages(100) + debian_docs.html_pages(150)
    DEBIAN_CACHE.write_bytes(pickle.dumps(docs))
    return docs


def dump(out: Path, debian: bool = True) -> None:
    """Every document's injection measure and findings (codes and messages) as JSON: the
    fixtures, blind sets 1-7 and (``debian``) the Debian sample. Two dumps, one from each
    version (``--tree``), compared with ``--compare``, prove a speed change left every
    result the same."""
    from gate.checks.base import Document, RunContext
    from gate.checks.injection import CHECK, InjectionSettings
    from gate.extract import extract

    policy = SimpleNamespace(injection=InjectionSettings(threshold=0.5))
    ctx = RunContext(as_of=datetime(2026, 12, 1, tzinfo=UTC))
    groups: dict[str, list[tuple[str, bytes]]] = {
        "fixtures": [(r["path"], r["data"]) for r in load_corpus("all")]}
    for folder in DUMP_SETS:
        groups[folder.name] = [(r["path"], r["data"]) for r in load_blind(folder)]
    if debian:
        groups["debian"] = [(path, data) for _, path, data in _debian_docs()]
    result: dict[str, dict[str, object]] = {}
    cpu = 0.0
    for name, docs in groups.items():
        result[name] = {}
        for path, data in docs:
            extraction = extract(data, max_pages=500, max_nesting=250)
            if not extraction.summary.ok:
                result[name][path] = {"problem": extraction.summary.problem}
                continue
            t0 = time.process_time()
            measured = CHECK.measure(extraction)
            cpu += time.process_time() - t0
            document = Document(path=path, kind="file", size=len(data), sha256=None,
                                manifest=None, extracted=extraction.summary,
                                measures={"injection": measured})
            findings = CHECK.evaluate(document, policy, ctx) or []
            result[name][path] = {"measured": measured, "findings": [
                [f.code, f.message] for f in findings]}
        print(f"{name}: {len(docs)} documents")
    out.write_text(json.dumps(result, sort_keys=True, default=str), encoding="utf-8")
    print(f"wrote {out} (measure CPU {cpu:.1f} s, loaded)")


def compare(a: Path, b: Path) -> int:
    """Documents whose measure or findings differ between two dumps, per group (names only
    outside the leave-out set). Exit 1 when any differ."""
    one = json.loads(a.read_text(encoding="utf-8"))
    two = json.loads(b.read_text(encoding="utf-8"))
    differ = 0
    for name in sorted(set(one) | set(two)):
        x, y = one.get(name, {}), two.get(name, {})
        diff = sorted(k for k in set(x) | set(y) if x.get(k) != y.get(k))
        differ += len(diff)
        print(f"{name:<22}{len(set(x) | set(y)):>6} documents, {len(diff)} differ")
        if name != LEAVE_OUT:
            for k in diff[:20]:
                print(f"  DIFFERS {k}")
    return 1 if differ else 0


def main(argv: list[str] | None = None) -> int:
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--split", default="all",
                        choices=["dev", "holdout", "holdout2", "tune15", "all"])
    parser.add_argument("--blind", default=None, help="folder of the blind set (labels.jsonl), "
                        "or 'all' for every set in benchmarks/data/injection_blind* (1-6)")
    parser.add_argument("--mix", type=int, default=300,
                        help="documents of the generated bench mix to time (0: skip)")
    parser.add_argument("--repeat", type=int, default=3)
    parser.add_argument("--blind-split", default="all", choices=["all", "val", "train"],
                        help="blind-set documents: all, or only the instruction model's "
                        "validation (never trained on) or training split (identity "
                        "blindN:FILE for ...blindN, blind:FILE for the first set)")
    parser.add_argument("--blind-half", default="all", choices=["all", "tune", "held"],
                        help="blind-set documents: all, or the tuning or held half split by "
                        "host document (see the module docstring)")
    parser.add_argument("--blind-salt", default=None,
                        help="salt of the host split (default: from the folder name, "
                        "blindN-host: for ...blindN)")
    parser.add_argument("--blind-only", action="store_true",
                        help="measure only the blind set (skip the fixture corpus and the mix)")
    parser.add_argument("--weights", default=None,
                        help="instruction-model weights to use instead of the shipped file "
                        "(e.g. bench-out/leave-out-blind4.npz from train_injection_model.py "
                        "--leave-out blind4: the check on a set its model never saw)")
    parser.add_argument("--verbose", action="store_true")
    parser.add_argument("--dump", default=None, metavar="FILE",
                        help="write every document's measure and findings (fixtures, blind "
                        "sets 1-7, the Debian sample) to FILE as JSON, and stop")
    parser.add_argument("--no-debian", action="store_true",
                        help="with --dump: leave the Debian sample out")
    parser.add_argument("--tree", default=None, metavar="DIR",
                        help="import gate from DIR (another version's source, e.g. main "
                        "from git archive) instead of this tree")
    parser.add_argument("--mix-cpu", type=int, default=0, metavar="N",
                        help="print the CPU time of measure() a document on an N-document "
                        "bench mix (with --tree: of that tree), and stop")
    parser.add_argument("--compare", nargs=2, default=None, metavar=("A", "B"),
                        help="compare two --dump files; exit 1 when any document differs")
    parser.add_argument("--why", action="store_true",
                        help="for each missed encoded, exfiltration, hidden-placement or "
                        "multilingual attack of a blind set, print its cause (tuning sets only)")
    args = parser.parse_args(argv)
    if (args.verbose or args.why) and args.blind_half == "held":
        parser.error("--verbose and --why list documents; the held half is read in aggregate "
                     "only")
    sys.path.insert(0, str(ROOT))
    if args.compare:
        return compare(Path(args.compare[0]), Path(args.compare[1]))
    if args.tree:
        if not (Path(args.tree) / "gate").is_dir():
            parser.error(f"--tree {args.tree}: no gate package in that folder")
        sys.path.insert(0, str(Path(args.tree).resolve()))
    if args.dump:
        dump(Path(args.dump), debian=not args.no_debian)
        return 0
    if args.mix_cpu:
        mix_cpu(args.mix_cpu)
        return 0
    if args.weights:
        from gate.checks.injection import model as learnt
        try:
            learnt._MODEL[:] = [learnt.Model(Path(args.weights))]
        except (OSError, ValueError, KeyError) as err:
            parser.error(f"--weights {args.weights}: not a weights file ({err})")
    if not args.blind_only:
        rows = load_corpus(args.split)
        run(rows[:3], repeat=1)  # warm caches and imports before timing
        results = run(rows, repeat=args.repeat)
        for r in results:  # the typical page gets more repeats: its timing is the headline
            if r["path"] == TYPICAL_PAGE:
                r.update(run([r], repeat=max(20, args.repeat))[0])
        print(f"tuning corpus, split: {args.split}, documents: {len(rows)}\n")
        report(results, verbose=args.verbose)
        if args.mix:
            mix_share(args.mix)
    folders = BLIND_SETS if args.blind == "all" else \
        [Path(args.blind) if args.blind else BLIND]
    summary = []
    for blind in folders:
        if not blind.is_dir():
            if args.blind:
                parser.error(f"--blind {blind}: not a folder")
            continue
        brows = load_blind(blind)
        if args.blind_split != "all":
            prefix = val_prefix(blind)
            brows = [r for r in brows if is_val(prefix + r["path"]) ==
                     (args.blind_split == "val")]
        if args.blind_half != "all":
            salt = args.blind_salt if args.blind_salt is not None else half_salt(blind)
            brows = [r for r in brows if blind_half(r, salt) == args.blind_half]
        print(f"\nBLIND SET {blind.relative_to(ROOT) if blind.is_relative_to(ROOT) else blind}"
              f", documents: {len(brows)} (split: {args.blind_split}, half: "
              f"{args.blind_half})\n")
        bresults = run(brows, repeat=1)
        out = report_blind(bresults, verbose=args.verbose)
        if args.why:
            print_why(bresults)
        ext = sum(r["extraction_s"] for r in bresults)
        det = sum(r["detector_s"] for r in bresults)
        n = len(bresults)
        print(f"\nblind set time: extraction {ext * 1000 / n:.2f} ms/doc, detectors "
              f"{det * 1000 / n:.2f} ms/doc ({det / (ext + det) * 100:.0f}% of the two)")
        summary.append((blind.name, out))
    if len(summary) > 1:
        print("\nset                    recall  benign held")
        for name, out in summary:
            print(f"{name:<22}{out['recall']:>7.3f}{out['fp_rate']:>12.3f}")
    return 0


if __name__ == "__main__":
    raise SystemExit(main())
