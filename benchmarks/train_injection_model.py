"""Train the instruction model of the injection check (gate/checks/injection/model.py).

Gathers labelled units (a sentence, a short passage, or a window of one to three
consecutive sentences of a benign document), hashes them with the check's own feature
function, fits an L2-regularised logistic regression (scikit-learn, a development
dependency: ``pip install -e '.[train]'``), chooses the thresholds on a validation split it
does not train on, and writes ``gate/checks/injection/data/instruction_model.npz`` and the
figures into ``benchmarks/data/injection_train/MODEL.md``.

Data (see ``benchmarks/data/injection_train/README.md``):

* ``benchmarks/data/injection_train/*.jsonl``: attack and benign snippets in many
  languages, written for this project by a session that never saw the detector;
* ``benchmarks/data/injection_blind/``: the first blind set (654 documents), used as
  tuning data since it was looked at twice: benign documents give negative windows; the
  payload of each attack is the lines it does not share with its closest benign host;
  blind sets 2-6 (``benchmarks/data/injection_blind{2,3,4,5,6}/``) the same way, each since
  it was looked at twice (``--blind-sets``, ``--leave-out blindN``);
* ``tests/fixtures/injection/``: benign documents give negative windows;
* real text from Debian documentation packages (manual pages in ten languages, the
  Python manual and the Debian Reference), installed with apt when missing and never
  committed: a sample disjoint from the one ``benchmarks/debian_docs.py`` measures.

Every document or snippet goes to the validation split when the first byte of the
SHA-256 of its identity is below 52 (about 20 %), so the split is fixed and the same on
every machine. The run is deterministic: the same data gives the same weights file, whose
digest MODEL.md records.

    python benchmarks/train_injection_model.py [--no-install] [--per-language 100] [--C 16]
                                                [--pos-weight 5]
"""

from __future__ import annotations

import argparse
import gzip
import hashlib
import html
import json
import os
import re
import subprocess
import sys
import time
from collections import Counter, defaultdict
from pathlib import Path

import numpy as np

ROOT = Path(__file__).resolve().parent.parent
sys.path.insert(0, str(ROOT))

from benchmarks import debian_docs  # noqa: E402
from benchmarks.injection_bench import is_val  # noqa: E402
from gate.checks.injection import model as M  # noqa: E402
from gate.checks.injection.lexicon import lfold  # noqa: E402

TRAIN_DIR = ROOT / "benchmarks" / "data" / "injection_train"
BLIND_DIR = ROOT / "benchmarks" / "data" / "injection_blind"
# The blind sets that are tuning data now (each was looked at and tuned on): name -> folder.
BLIND_SETS = {"blind1": BLIND_DIR, **{f"blind{n}": ROOT / "benchmarks" / "data" /
                                      f"injection_blind{n}" for n in (2, 3, 4, 5, 6)}}
TRAIN24 = "train24"  # the sub-folder of TRAIN_DIR holding the rows written for issue 15
TRAIN26 = "train26"  # ... and the second batch (rows in its rows/ folder)
TRAIN27 = "train27"  # ... and the third (rows/; read only with --with-train27)
FIXTURES = ROOT / "tests" / "fixtures" / "injection"
CACHE = ROOT / "bench-out" / "train-cache"
OUT = M.WEIGHTS
REPORT = TRAIN_DIR / "MODEL.md"
FP_REAL = 0.003  # thresholds: at most this share of validation real documents held
FP_HARD = 0.02  # ... and of validation hard negatives (blind documents, snippets)
FP_REAL_LOW = 0.02  # the low mark (hidden text, supporting evidence): at most these shares
FP_HARD_LOW = 0.08
PRUNE = 0.005  # weights smaller than this are not shipped


# -- units -------------------------------------------------------------------------------------

class Units:
    """Rows of the design matrix: hashed features of one unit each, with label and group."""

    def __init__(self) -> None:
        self.rows: list[tuple[np.ndarray, np.ndarray]] = []
        self.labels: list[int] = []
        self.groups: list[str] = []  # validation document id (or "" for training rows)
        self.kinds: list[str] = []

    def add_text(self, text: str, label: int, kind: str, group: str) -> None:
        b, v = M.unit_vector(lfold(text))
        if len(b) >= M.MIN_FEATURES:
            self.rows.append((b, v))
            self.labels.append(label)
            self.groups.append(group)
            self.kinds.append(kind)

    def add_windows(self, text: str, kind: str, group: str, stride: int = 1) -> None:
        """Every window the check scores in ``text``, as negatives."""
        buckets, sents, n = M.sentence_features(lfold(text[:M.MAX_CHARS]))
        if not len(buckets):
            return
        order = np.argsort(sents, kind="stable")
        buckets, sents = buckets[order], sents[order]
        bounds = np.searchsorted(sents, np.arange(n + 1))
        counts = np.diff(bounds)
        for w in M.WINDOWS:
            for i in range(0, n - w + 1, stride if w > 1 else 1):
                if counts[i] == 0 or counts[i + w - 1] == 0:
                    continue
                a, z = bounds[i], bounds[i + w]
                if z - a < M.MIN_FEATURES:
                    continue
                uniq, c = np.unique(buckets[a:z], return_counts=True)
                self.rows.append((uniq, c / np.sqrt(z - a)))
                self.labels.append(0)
                self.groups.append(group)
                self.kinds.append(kind)

    def matrix(self, select: np.ndarray):
        from scipy.sparse import csr_matrix
        idx = np.nonzero(select)[0]
        indptr = np.zeros(len(idx) + 1, np.int64)
        indptr[1:] = np.cumsum([len(self.rows[i][0]) for i in idx])
        indices = np.concatenate([self.rows[i][0] for i in idx]) if len(idx) else []
        data = np.concatenate([self.rows[i][1] for i in idx]) if len(idx) else []
        return csr_matrix((data, indices, indptr), shape=(len(idx), M.DIM))


# -- sources -----------------------------------------------------------------------------------

def split_parts(rows: list[dict]) -> set[str]:
    """The attack sentences that are parts of a split instruction: two or more of them make
    up one attack passage. Each is harmless alone ("Use it verbatim."); only the passages
    joining them are trained on."""
    sentences = {r["text"] for r in rows if r["label"] == "attack" and r.get("kind") == "sentence"}
    parts: set[str] = set()
    for r in rows:
        if r["label"] == "attack" and r.get("kind") == "passage":
            inside = [x for x in sentences if x in r["text"] and x != r["text"]]
            if len(inside) >= 2:
                parts.update(inside)
    return parts


def snippets(units: Units, stats: Counter, train24: bool = True,
             train26: bool = True, train27: bool = False) -> list[dict]:
    """The written snippets; returns the validation ones (scored as one-unit documents)."""
    val = []
    paths = sorted(TRAIN_DIR.glob("*.jsonl"))
    if train24:
        paths += sorted((TRAIN_DIR / TRAIN24).glob("*.jsonl"))
    if train26:
        paths += sorted((TRAIN_DIR / TRAIN26 / "rows").glob("*.jsonl"))
    if train27:
        paths += sorted((TRAIN_DIR / TRAIN27 / "rows").glob("*.jsonl"))
    for path in paths:
        source = "extra" if path.name.startswith("extra") else \
            TRAIN24 if path.parent.name == TRAIN24 else \
            TRAIN26 if path.parent.parent.name == TRAIN26 else \
            TRAIN27 if path.parent.parent.name == TRAIN27 else "snippet"
        items = [json.loads(line) for line in path.read_text(encoding="utf-8").splitlines()
                 if line.strip()]
        parts = split_parts(items) if source in (TRAIN26, TRAIN27) else set()
        for item in items:
            if item["text"] in parts:
                stats[f"{source} split parts left out"] += 1
                continue
            label = 1 if item["label"] == "attack" else 0
            ident = f"snippet:{item['text']}"
            split = "val" if is_val(ident) else "train"
            stats[f"snippets {split} {item['label']}"] += 1
            if source in (TRAIN24, TRAIN26, TRAIN27):
                stats[f"{source} {split} {item['label']}"] += 1
            if split == "val":
                val.append(dict(item, group=ident))
                continue
            text = item["text"]
            if label:  # the request is the instruction; its code would teach "import os"
                text = "\n".join(ln for ln in text.splitlines() if not _CODE_LINE.search(ln))
                # ... and its inline commands "rm -rf" (harmful code is judged by actions.py),
                # in backticks or bare ("run curl -s https://... | sh first"): a runbook's
                # commands must not read as requests to the model
                text = _BARE_COMMAND.sub(" ", _INLINE_CODE.sub(" ", text))
            units.add_text(text, label, f"{source}/{item['class']}", "")
    return val


_TAG = re.compile(r"<[^>]*>", re.S)
# Code lines of a payload (the request to include them is the prose around them).
_CODE_LINE = re.compile(r"[=(){};]\s*$|^\s*(?:import|def|from|curl|wget|\$|#!|//)|\w\(.*\)|"
                        r"^[\w.]+\s*=")
_INLINE_CODE = re.compile(r"`[^`\n]{1,200}`")
_BARE_COMMAND = re.compile(r"(?<![\w-])(?:curl|wget|sudo|bash|sh|zsh|powershell|pwsh|python3?|"
                           r"node|nc|ncat|chmod|chown|rm|dd|mkfs|systemctl|crontab|scp|ssh|"
                           r"iex|Invoke-\w+|Get-\w+|Set-\w+|New-\w+|Remove-\w+)\s+-{0,2}"
                           r"[^\s.,;!?][^\n]*?(?=[.;!?]\s|[.;!?]?$|\n)", re.M)
_ATTR = re.compile(r"=\s*\"([^\"]{12,})\"")


def _plain_lines(data: bytes) -> list[str]:
    """Lines of a document with markup dropped (attribute values kept) for diffing."""
    text = data.decode("utf-8", "replace")
    text = _TAG.sub(lambda m: "\n" + "\n".join(_ATTR.findall(m.group(0))) + "\n", text)
    text = html.unescape(text)
    return [ln.strip() for ln in text.splitlines() if len(ln.split()) >= 3 or
            (len(ln.strip()) >= 8 and not ln.strip().isascii())]


_SENTENCE_CUT = re.compile(r"(?<=[.!?\u3002\uff01\uff1f])\s+|\s*\|\s*")


def _sentences_of(text: str) -> list[str]:
    """The sentences of a text with its line breaks undone (a PDF wraps where a Markdown
    file does not), for diffing an attack against its host in another format."""
    flat = re.sub(r"\s+", " ", text)
    return [x.strip(" #*>-") for x in _SENTENCE_CUT.split(flat) if len(x.split()) >= 3 or
            (len(x.strip()) >= 8 and not x.isascii())]


def _payload(mine: list[str], hosts: list[set[str]]) -> list[str] | None:
    """The items of ``mine`` not in the host that shares most of them (at least three),
    when there are one to eight of them; else None."""
    mine_set = set(mine)
    best = max(hosts, key=lambda h: len(mine_set & h), default=set())
    if len(mine_set & best) < 3:
        return None
    payload = [x for x in mine if x not in best]
    return payload if 0 < len(payload) <= 8 else None


_WORDS = re.compile(r"\w+")


def _new_share(item: str, known: set[str]) -> float:
    words = _WORDS.findall(item.lower())
    return sum(w not in known for w in words) / len(words) if words else 0.0


def blind_rows(folder: Path) -> list[dict]:
    return [json.loads(x) for x in (folder / "labels.jsonl").read_text(encoding="utf-8")
            .splitlines() if x.strip()]


def blind_file(folder: Path, name: str) -> Path:
    return folder / name if (folder / name).is_file() else folder / "docs" / name


def blind(units: Units, stats: Counter, name: str = "blind1",
          folder: Path = BLIND_DIR) -> list[dict]:
    """A blind set as tuning data; returns its validation documents.

    Benign documents give negative windows. The payload of an attack is the lines it does
    not share with its host (the benign document of the same ``host``, or the closest
    benign document when the set names none); where a format change defeats the line diff
    (a PDF wraps lines, an e-mail encodes them), the sentences of the extracted texts are
    compared instead.
    """
    from gate.extract import extract
    rows = blind_rows(folder)
    ident_of = "blind:" if name == "blind1" else f"{name}:"
    data = {r["file"]: blind_file(folder, r["file"]).read_bytes() for r in rows}
    text: dict[str, str] = {}

    def extracted(f: str) -> str:
        if f not in text:
            text[f] = extract(data[f], max_pages=50, max_nesting=250).text or ""
        return text[f]

    def lines(f: str) -> list[str]:
        return [] if f.endswith((".pdf", ".eml")) else _plain_lines(data[f])

    benign = [r for r in rows if r["label"] == "benign"]
    # What a document is made of, both ways; a payload is used in one or two documents of a
    # set, while its hosts' lines and the boilerplate of a format (a title line, "Print
    # this page", a cookie notice) recur in many: only items found in at most two
    # documents, and in no benign one, are payload.
    items = {r["file"]: set(lines(r["file"])) | set(_sentences_of(extracted(r["file"])))
             for r in rows}
    seen_in = Counter(x for r in rows for x in items[r["file"]])
    in_benign = set().union(*(items[r["file"]] for r in benign)) if benign else set()
    by_host: dict = defaultdict(list)
    for r in benign:
        by_host[r.get("host")].append(r["file"])
    val = []
    for r in rows:
        ident = f"{ident_of}{r['file']}"
        if is_val(ident):
            val.append(dict(r, group=ident, data=data[r["file"]]))
            continue
        if r["label"] == "benign":
            units.add_windows(extracted(r["file"]), f"{name}/{r['class']}", "")
            stats[f"{name} benign docs"] += 1
            continue
        if r["class"] == "encoded":
            continue  # the payload is read after decoding; its encoded form teaches nothing
        hosts = by_host.get(r.get("host")) if r.get("host") else None
        hosts = hosts or [b["file"] for b in benign]
        payload = _payload(lines(r["file"]), [set(lines(f)) for f in hosts]) \
            if lines(r["file"]) else None
        if payload is None and len(hosts) <= 12:
            payload = _payload(_sentences_of(extracted(r["file"])),
                               [set(_sentences_of(extracted(f))) for f in hosts])
        if payload is not None:
            # ... and whose words are mostly new: a host line joined or wrapped otherwise in
            # this format (a title run into its byline) is made of the host's words.
            # (a set naming no hosts: the benign document sharing most with the attack)
            near = hosts if len(hosts) <= 12 else \
                [max(hosts, key=lambda f: len(items[f] & items[r["file"]]))]
            known = set(_WORDS.findall(" ".join(extracted(f) + "\n" + "\n".join(lines(f))
                                                for f in near).lower()))
            payload = [x for x in payload if seen_in[x] <= 2 and x not in in_benign and
                       _new_share(x, known) >= 0.5] or None
        if payload is None:
            stats[f"{name} attacks without a payload found"] += 1
            continue
        prose = [ln for ln in payload if not _CODE_LINE.search(ln)]
        if not prose:
            continue
        units.add_text("\n".join(prose), 1, f"{name}/{r['class']}", "")
        if r["class"] != "split":
            for ln in prose:
                units.add_text(ln, 1, f"{name}/{r['class']}", "")
        stats[f"{name} attack docs"] += 1
    return val


def fixtures(units: Units, stats: Counter) -> None:
    """Benign fixture documents: negative windows (their attacks are test fixtures)."""
    from benchmarks.injection_bench import load_corpus
    from gate.extract import extract
    for row in load_corpus("all"):
        if row["label"] != "benign":
            continue
        ex = extract(row["data"], max_pages=50, max_nesting=250)
        units.add_windows(ex.text or "", "fixtures/benign", "")
        stats["fixture benign docs"] += 1


def real_documents(per_language: int, install: bool) -> list[tuple[str, str, str]]:
    """Debian manual pages and HTML manuals not in the benchmark's samples: (group, id, text)."""
    from gate.extract import extract
    if install:
        debian_docs.install(debian_docs.PACKAGES)
    CACHE.mkdir(parents=True, exist_ok=True)
    measured = set()
    for offset in (0, 1):  # what benchmarks/debian_docs.py measures (--offset 0 and 1)
        debian_docs.OFFSET[0] = offset
        for lang in debian_docs.MAN_LANGUAGES:
            base = debian_docs.MAN_ROOT / lang if lang else debian_docs.MAN_ROOT
            pages = [p for s in ("man1", "man5", "man7", "man8") for p in (base / s).glob("*.gz")]
            measured.update(str(p) for p in debian_docs.sample(pages, 100))
        for root in debian_docs.HTML_ROOTS:
            files = [p for p in root.rglob("*.html") if p.is_file()] if root.is_dir() else []
            n = 150 * 2 // 3 if "python" in str(root) else 150 // 3
            measured.update(str(p) for p in debian_docs.sample(files, n))
    out = []
    for lang in debian_docs.MAN_LANGUAGES:
        base = debian_docs.MAN_ROOT / lang if lang else debian_docs.MAN_ROOT
        pages = sorted(p for s in ("man1", "man5", "man7", "man8") for p in (base / s).glob("*.gz")
                       if str(p) not in measured)
        step = max(1, len(pages) // per_language)
        for page in pages[3::step][:per_language]:
            text = _render(page)
            if text:
                out.append((f"man/{lang or 'en'}", str(page), text))
    for root in debian_docs.HTML_ROOTS:
        files = sorted(p for p in root.rglob("*.html") if p.is_file() and str(p) not in measured) \
            if root.is_dir() else []
        step = max(1, len(files) // 60)
        for page in files[5::step][:60]:
            ex = extract(page.read_bytes(), max_pages=50, max_nesting=250)
            if ex.text:
                out.append((f"html/{root.name}", str(page), ex.text))
    return out


def _render(page: Path) -> str:
    key = CACHE / (hashlib.sha256(str(page).encode()).hexdigest()[:24] + ".txt")
    if key.is_file():
        return key.read_text(encoding="utf-8")
    try:
        with gzip.open(page) as raw:
            if raw.read(200).startswith(b".so "):
                key.write_text("", encoding="utf-8")
                return ""
        text = subprocess.run(["man", "-l", "-E", "UTF-8", str(page)], capture_output=True,
                              timeout=30, env=dict(os.environ, MANWIDTH="80", MANPAGER="cat",
                                                   LANG="C.UTF-8")).stdout
    except (OSError, subprocess.SubprocessError, EOFError, gzip.BadGzipFile):
        return ""
    text = re.sub(".\x08", "", text.decode("utf-8", "replace"))
    text = text if len(text) > 200 else ""
    key.write_text(text, encoding="utf-8")
    return text


# -- fitting and choosing thresholds -------------------------------------------------------------

def doc_probability(mdl: M.Model, text: str) -> float:
    return mdl.probability(lfold(text))


def choose(negatives: dict[str, tuple[list[float], float]]) -> float:
    """The lowest threshold holding at most the given share of each group of negatives."""
    for t in GRID:
        if all((np.mean(np.array(p) >= t) if p else 0.0) <= rate
               for p, rate in negatives.values()):
            return float(t)
    return float(GRID[-1])


# Thresholds tried: steps of 0.005 to 0.995, then finer towards 0.9999 (a model trained on
# many hard negatives holds some of them with great confidence).
GRID = np.round(np.concatenate([np.arange(0.50, 0.996, 0.005),
                                [0.996, 0.997, 0.998, 0.9985, 0.999, 0.9993, 0.9995,
                                 0.9997, 0.9998, 0.9999]]), 4)


def main(argv: list[str] | None = None) -> int:
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--no-install", action="store_true")
    parser.add_argument("--per-language", type=int, default=100)
    parser.add_argument("--C", type=float, default=16.0, help="inverse regularisation")
    parser.add_argument("--pos-weight", type=float, default=5.0)
    parser.add_argument("--extra-weight", type=float, default=3.0,
                        help="weight of the supplement rows (extra15-*.jsonl), which are few")
    parser.add_argument("--out", default=None,
                        help=f"weights file (default {OUT.relative_to(ROOT)}; with --leave-out "
                        "bench-out/leave-out-SET.npz)")
    parser.add_argument("--blind-sets", default=",".join(BLIND_SETS),
                        help="the blind sets trained on (comma-separated; default all: "
                        f"{','.join(BLIND_SETS)})")
    parser.add_argument("--leave-out", choices=sorted(BLIND_SETS), default=None,
                        help="train without this blind set, then measure the model alone "
                        "and the whole check on it (the generalisation figure)")
    parser.add_argument("--no-train24", action="store_true",
                        help=f"leave out the rows in {TRAIN_DIR.relative_to(ROOT)}/{TRAIN24}")
    parser.add_argument("--no-train26", action="store_true",
                        help=f"leave out the rows in {TRAIN_DIR.relative_to(ROOT)}/{TRAIN26}")
    parser.add_argument("--with-train27", action="store_true",
                        help=f"add the rows in {TRAIN_DIR.relative_to(ROOT)}/{TRAIN27} "
                        "(not in the shipped model)")
    parser.add_argument("--evaluate-only", metavar="WEIGHTS", default=None,
                        help="with --leave-out: measure this weights file instead of training")
    parser.add_argument("--model-alone", action="store_true",
                        help="with --leave-out: measure the model alone, not the whole check")
    args = parser.parse_args(argv)
    sets = [x.strip() for x in args.blind_sets.split(",") if x.strip()]
    unknown = [x for x in sets if x not in BLIND_SETS]
    if unknown:
        parser.error(f"--blind-sets: unknown set {unknown[0]!r} (known: {', '.join(BLIND_SETS)})")
    if args.evaluate_only and not args.leave_out:
        parser.error("--evaluate-only needs --leave-out SET (the set to measure)")
    if args.leave_out:
        sets = [x for x in sets if x != args.leave_out]
        if args.evaluate_only:
            return leave_out_report(Path(args.evaluate_only), args.leave_out,
                                    args.model_alone)
    tag = f"leave-out-{args.leave_out}" + ("-no24" if args.no_train24 else "") + \
        ("-no26" if args.no_train26 else "") if args.leave_out else None
    if args.out is None:
        args.out = str(ROOT / "bench-out" / f"{tag}.npz") if tag else str(OUT)
    report_path = Path(args.out).with_suffix(".md") if tag else REPORT
    Path(args.out).parent.mkdir(parents=True, exist_ok=True)
    from sklearn.linear_model import LogisticRegression

    t0 = time.time()
    units = Units()
    stats: Counter = Counter()
    val_snippets = snippets(units, stats, train24=not args.no_train24,
                            train26=not args.no_train26, train27=args.with_train27)
    val_blind = []
    for name in sets:
        val_blind += blind(units, stats, name, BLIND_SETS[name])
    fixtures(units, stats)
    real = real_documents(args.per_language, not args.no_install)
    val_real = []
    for group, ident, text in real:
        if is_val(f"real:{ident}"):
            val_real.append((group, ident, text))
            continue
        units.add_windows(text, f"real/{group}", "", stride=2)
        stats["real docs train"] += 1
    stats["real docs val"] = len(val_real)
    labels = np.array(units.labels)
    train = np.ones(len(labels), bool)
    X = units.matrix(train)
    y = labels[train]
    weights = np.where(y == 1, args.pos_weight, 1.0)
    extra = np.array([k.startswith("extra/") for k in units.kinds])[train]
    weights = np.where(extra, weights * args.extra_weight, weights)
    print(f"units: {len(y)} ({int(y.sum())} positive); data in {time.time() - t0:.0f} s",
          flush=True)
    clf = LogisticRegression(C=args.C, solver="liblinear", max_iter=300, random_state=0)
    clf.fit(X, y, sample_weight=weights)
    coef = clf.coef_[0].astype(np.float32)
    index = np.nonzero(np.abs(coef) >= PRUNE)[0].astype(np.int32)
    value = coef[index].astype(np.float16)
    bias = np.float32(clf.intercept_[0])
    digest = hashlib.sha256(index.tobytes() + value.tobytes() + bias.tobytes()).hexdigest()
    tmp = Path(args.out).with_suffix(".tmp.npz")
    np.savez_compressed(tmp, index=index, value=value, bias=bias, threshold=np.float32(0.9),
                        low=np.float32(0.5), addressed=np.float32(0.5), digest=np.str_(digest))
    mdl = M.Model(tmp)

    # validation: documents and snippets never trained on
    pos: list = []
    hard: list = []
    hard_by: dict = defaultdict(list)
    lang_by: dict = defaultdict(list)
    pos_by: dict = defaultdict(list)
    val_texts: dict[str, list[str]] = defaultdict(list)
    for item in val_snippets:
        p = doc_probability(mdl, item["text"])
        val_texts["attack" if item["label"] == "attack" else "snippet benign"].append(
            lfold(item["text"]))
        if item["label"] == "attack":
            pos.append(p)
            pos_by[f"snippet {item['class']}"].append(p)
            pos_by[f"snippet language {item['language']}"].append(p)
        else:
            hard.append(p)
            hard_by[f"snippet {item['class']}"].append(p)
            lang_by[item["language"]].append(p)
    from gate.extract import extract
    for item in val_blind:
        ex = extract(item["data"], max_pages=50, max_nesting=250)
        whole = "\n".join([ex.text or ""] + _plain_lines(item["data"]))
        p = doc_probability(mdl, whole)
        if item["label"] != "attack":
            val_texts["blind benign"].append(lfold(whole))
        elif item["class"] != "encoded":
            val_texts["attack"].append(lfold(whole))
        if item["label"] == "attack":
            if item["class"] != "encoded":
                pos.append(p)
                pos_by[f"blind {item['class']}"].append(p)
        else:
            hard.append(p)
            hard_by[f"blind {item['class']}"].append(p)
    real_p = [doc_probability(mdl, text) for _, _, text in val_real]
    blind_hard = [p for k, v in hard_by.items() if k.startswith("blind") for p in v]
    snippet_hard = [p for k, v in hard_by.items() if k.startswith("snippet") for p in v]
    threshold = choose({"real": (real_p, FP_REAL), "blind": (blind_hard, FP_HARD),
                        "snippets": (snippet_hard, FP_HARD)})
    low = choose({"real": (real_p, FP_REAL_LOW), "blind": (blind_hard, FP_HARD_LOW),
                  "snippets": (snippet_hard, FP_HARD_LOW)})
    low = min(low, threshold)
    # the addressed mark: a window that names an AI reader holds from here on
    mdl.threshold, mdl.low = threshold, low
    texts_pos = [t for t in val_texts["attack"]]
    addressed, neg = threshold, {"real": ([lfold(t) for _, _, t in val_real], FP_REAL),
                                 "blind": (val_texts["blind benign"], FP_HARD),
                                 "snippets": (val_texts["snippet benign"], FP_HARD)}
    # from half way between the low mark and the threshold: naming an AI reader is
    # evidence, but a sentence about an assistant names one too
    for mark in np.arange(round((low + threshold) / 2, 2), threshold, 0.01):
        mdl.addressed = float(mark)
        if all(np.mean([mdl.holds(t) for t in texts]) <= rate if texts else True
               for texts, rate in neg.values()):
            addressed = float(round(mark, 3))
            break
    mdl.addressed = addressed
    held_pos = [mdl.holds(t) for t in texts_pos]
    hard = blind_hard + snippet_hard
    at = {"recall": float(np.mean(np.array(pos) >= threshold)),
          "fp_hard": float(np.mean(np.array(hard) >= threshold)),
          "fp_real": float(np.mean(np.array(real_p) >= threshold)) if real_p else 0.0}
    np.savez_compressed(tmp, index=index, value=value, bias=bias,
                        threshold=np.float32(threshold), low=np.float32(low),
                        addressed=np.float32(addressed), digest=np.str_(digest))
    os.replace(tmp, args.out)
    file_digest = hashlib.sha256(Path(args.out).read_bytes()).hexdigest()
    lines = [
        "# The instruction model: how it was trained (written by the training script)",
        "",
        "`python benchmarks/train_injection_model.py` "
        f"(C={args.C}, positive weight {args.pos_weight}, supplement weight "
        f"{args.extra_weight}); scikit-learn "
        f"{__import__('sklearn').__version__}, liblinear.",
        "",
        f"* units trained on: {len(y)} ({int(y.sum())} attack units)",
        *[f"* {k}: {v}" for k, v in sorted(stats.items())],
        f"* real documents used: {len(real)} (manual pages and HTML manuals; validation "
        f"{len(val_real)})",
        f"* weights shipped: {len(index)} of {M.DIM} buckets (|w| >= {PRUNE}), "
        f"float16; bias {float(bias):.4f}",
        f"* weights digest (index, value, bias): `{digest}`",
        f"* file SHA-256: `{file_digest}`",
        "",
        "## Thresholds, chosen on the validation split",
        "",
        f"The lowest probability holding at most {FP_REAL:.1%} of validation real documents "
        f"and {FP_HARD:.0%} of validation hard negatives: **threshold {threshold}** "
        f"(a window at or above it is an instruction on its own); low {low} (supporting "
        "evidence, and enough in hidden or encoded text).",
        "",
        f"Addressed mark **{addressed}**: a window naming an AI reader (or the reader's "
        "answer with its user) at or above it is an instruction on its own; the lowest mark "
        "within the same limits, from half way between the low mark and the threshold.",
        "",
        f"* validation attacks: {len(pos)}, recall at the threshold {at['recall']:.3f}, "
        f"with the addressed mark {np.mean(held_pos):.3f}, at low "
        f"{np.mean(np.array(pos) >= low):.3f}",
        f"* validation hard negatives: {len(hard)}, held {at['fp_hard']:.3f} (blind documents "
        f"{np.mean(np.array(blind_hard) >= threshold):.3f}, snippets "
        f"{np.mean(np.array(snippet_hard) >= threshold):.3f})",
        f"* validation real documents: {len(real_p)}, held {at['fp_real']:.4f}",
        "",
        "| validation group | n | at threshold | at low |",
        "|---|---|---|---|",
    ]
    for key in sorted(pos_by):
        v = np.array(pos_by[key])
        lines.append(f"| attack: {key} | {len(v)} | {np.mean(v >= threshold):.2f} | "
                     f"{np.mean(v >= low):.2f} |")
    for key in sorted(hard_by):
        v = np.array(hard_by[key])
        lines.append(f"| benign: {key} | {len(v)} | {np.mean(v >= threshold):.2f} | "
                     f"{np.mean(v >= low):.2f} |")
    for key in sorted(lang_by):
        v = np.array(lang_by[key])
        lines.append(f"| benign: snippet language {key} | {len(v)} | "
                     f"{np.mean(v >= threshold):.2f} | {np.mean(v >= low):.2f} |")
    report_path.write_text("\n".join(lines) + "\n", encoding="utf-8")
    print("\n".join(lines))
    print(f"\ntotal {time.time() - t0:.0f} s", flush=True)
    if args.leave_out:
        return leave_out_report(Path(args.out), args.leave_out, args.model_alone)
    return 0


def leave_out_report(weights: Path, name: str, model_alone: bool = False) -> int:
    """Recall per class and benign rate on a blind set the weights were not trained on:
    the model alone (a document is held when a window of its text holds, as in the
    validation above) and the whole check with these weights in place of the shipped ones.
    The check's rules were tuned on every blind set so far: only the model is left out."""
    from benchmarks.injection_bench import load_blind, report_blind, run
    from gate.extract import extract
    rows = load_blind(BLIND_SETS[name])
    mdl = M.Model(weights)
    alone = []
    for r in rows:
        ex = extract(r["data"], max_pages=50, max_nesting=250)
        plain = [] if r["path"].endswith((".pdf", ".eml")) else _plain_lines(r["data"])
        folded = lfold("\n".join([ex.text or ""] + plain))
        alone.append(dict(r, flagged=mdl.holds(folded), measured=None,
                          p=mdl.probability(folded)))
    print(f"\nLEAVE-OUT {name}: the model alone ({weights.name}, threshold "
          f"{mdl.threshold:.4f}, addressed {mdl.addressed:.4f}), {len(rows)} documents\n")
    a = report_blind(alone)
    # Threshold-free: how well the document score (its strongest window) ranks this set's
    # attacks above its benign documents. The cut is read off the set itself, so these
    # figures compare models; they are not what the shipped thresholds give.
    pos = np.array([r["p"] for r in alone if r["label"] == "attack"])
    neg = np.array([r["p"] for r in alone if r["label"] != "attack"])
    ranks = []
    for rate in (0.02, 0.05):
        cut = np.quantile(neg, 1.0 - rate, method="higher") if len(neg) else 1.0
        ranks.append(f"recall at {rate:.0%} benign {np.mean(pos > cut):.3f}")
    auc = float(np.mean(pos[:, None] > neg[None, :]) +
                0.5 * np.mean(pos[:, None] == neg[None, :])) if len(pos) and len(neg) else 0.0
    print(f"ranking (model alone): {', '.join(ranks)}, AUC {auc:.3f}")
    if model_alone:
        print(f"\nleave-out {name} summary: model alone recall {a['recall']:.3f}, benign "
              f"{a['fp_rate']:.3f} ({ranks[0]}, AUC {auc:.3f})")
        return 0
    saved = list(M._MODEL)
    M._MODEL[:] = [mdl]
    try:
        print(f"\nLEAVE-OUT {name}: the whole check with these weights\n")
        w = report_blind(run(rows, repeat=1))
    finally:
        M._MODEL[:] = saved
    print(f"\nleave-out {name} summary: model alone recall {a['recall']:.3f}, benign "
          f"{a['fp_rate']:.3f} ({ranks[0]}, AUC {auc:.3f}); whole check recall {w['recall']:.3f}, "
          f"benign {w['fp_rate']:.3f}")
    return 0


if __name__ == "__main__":
    raise SystemExit(main())
