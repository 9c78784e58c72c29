"""Language identification on real translated manual pages: gate's whole-text shares against
the three-window sample gate used before and against langdetect paragraph by paragraph.

    .venv/bin/python benchmarks/language_bench.py [--per-language 40] [--no-install]

The pages come from Debian's translated manual packages (manpages-es, -it, -ja, -pl, -pt,
-ru, -de, -fr), installed with apt-get when missing and never committed. Each page is
rendered to text with ``man -l`` (80 columns) and cached under bench-out/.

Labels: a page's label is the language of the folder it is installed in, except where
langdetect (the reference library, run paragraph by paragraph and weighted by letters)
finds English in the majority: such a page was left untranslated, or mostly so, and its
label is ``en``. So a mixed page is labelled by its majority language.

Printed: agreement with the labels per language and overall for the three methods, the
pages in another language that a policy allowing only English would have accepted as
English, and the time per page of each method.
"""

from __future__ import annotations

import argparse
import json
import os
import random
import shutil
import subprocess
import sys
import time
from collections import Counter, defaultdict
from pathlib import Path

ROOT = Path(__file__).resolve().parent.parent
sys.path.insert(0, str(ROOT))

import langdetect  # noqa: E402
from langdetect import DetectorFactory  # noqa: E402
from langdetect.lang_detect_exception import LangDetectException  # noqa: E402

from gate import langid  # noqa: E402

DetectorFactory.seed = 0
LANGUAGES = ("es", "it", "ja", "pl", "pt", "ru", "de", "fr")
PACKAGES = ["man-db"] + [f"manpages-{code}" for code in LANGUAGES]
CACHE = ROOT / "bench-out" / "language-pages.json"


def install() -> None:
    missing = [code for code in LANGUAGES if not Path(f"/usr/share/man/{code}").is_dir()]
    if not missing and shutil.which("man"):
        return
    print(f"installing {' '.join(PACKAGES)} (apt-get) ...", flush=True)
    env = {**os.environ, "DEBIAN_FRONTEND": "noninteractive"}
    subprocess.run(["apt-get", "update", "-qq"], check=True, env=env)
    subprocess.run(["apt-get", "install", "-y", "-qq", *PACKAGES], check=True, env=env,
                   stdout=subprocess.DEVNULL)


def render(path: str) -> str:
    env = {**os.environ, "MANWIDTH": "80", "LANG": "C.UTF-8", "MAN_KEEP_FORMATTING": "0"}
    shown = subprocess.run(["man", "-l", path], capture_output=True, env=env, timeout=60)
    plain = subprocess.run(["col", "-b"], input=shown.stdout, capture_output=True)
    return plain.stdout.decode("utf-8", "replace")


def pages(per_language: int) -> list[tuple[str, str, str]]:
    if CACHE.exists():
        cached = json.loads(CACHE.read_text())
        if cached.get("per_language") == per_language:
            return [tuple(row) for row in cached["pages"]]
    rng = random.Random(1)
    out = []
    for code in LANGUAGES:
        files = sorted(str(p) for p in Path(f"/usr/share/man/{code}").glob("man*/*")
                       if p.is_file())
        rng.shuffle(files)
        for path in files[:per_language]:
            text = render(path)
            if len(text) >= 200:
                out.append((code, path, text))
    CACHE.parent.mkdir(parents=True, exist_ok=True)
    CACHE.write_text(json.dumps({"per_language": per_language, "pages": out}))
    return out


def three_windows(text: str) -> str | None:
    """The sample gate read before: three 400-character windows (start, middle, end)."""
    window = 400
    if len(text) > 3 * window:
        parts = []
        for start in (0, (len(text) - window) // 2, len(text) - window):
            chunk = text[start:start + window]
            space = chunk.find(" ") if start else -1
            parts.append(chunk[space + 1:] if 0 <= space < 50 else chunk)
        text = "\n".join(parts)
    try:
        return langdetect.detect(text)
    except LangDetectException:
        return None


def paragraph_majority(text: str) -> str | None:
    weights: Counter[str] = Counter()
    for piece in langid.chunks(text):
        try:
            weights[langdetect.detect(piece)] += sum(ch.isalpha() for ch in piece)
        except LangDetectException:
            continue
    return weights.most_common(1)[0][0] if weights else None


def whole_text(text: str) -> str | None:
    shares = langid.identify(text).shares
    return shares[0][0] if shares else None


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--per-language", type=int, default=40)
    parser.add_argument("--no-install", action="store_true")
    args = parser.parse_args()
    if not args.no_install:
        install()
    corpus = pages(args.per_language)
    langid.profiles()
    methods = {"whole text (gate)": whole_text, "three windows (before)": three_windows,
               "langdetect per paragraph": paragraph_majority}
    verdicts: dict[str, list[str | None]] = {}
    seconds: dict[str, float] = {}
    for name, method in methods.items():
        started = time.perf_counter()
        verdicts[name] = [method(text) for _code, _path, text in corpus]
        seconds[name] = time.perf_counter() - started
    reference = verdicts["langdetect per paragraph"]
    labels = ["en" if ref == "en" else code for (code, _p, _t), ref in zip(corpus, reference)]
    print(f"{len(corpus)} pages ({args.per_language} drawn per language, seed 1), "
          f"{sum(label == 'en' for label in labels)} labelled en (left untranslated)")
    header = "method".ljust(28) + "".join(code.rjust(6) for code in LANGUAGES) + \
        "   all    ms/page"
    print(header)
    for name in methods:
        per: dict[str, list[bool]] = defaultdict(list)
        for (code, _p, _t), label, got in zip(corpus, labels, verdicts[name]):
            per[code].append(got == label)
        row = name.ljust(28) + "".join(
            f"{sum(per[c]) / max(1, len(per[c])):6.3f}" for c in LANGUAGES)
        hits = sum(sum(v) for v in per.values())
        print(row + f" {hits / len(corpus):6.3f} {1000 * seconds[name] / len(corpus):8.2f}")
    print("pages in another language judged English (accepted by a policy allowing en):")
    for name in methods:
        wrong = [path for (_c, path, _t), label, got in zip(corpus, labels, verdicts[name])
                 if label != "en" and got == "en"]
        print(f"  {name}: {len(wrong)}" + (f"  e.g. {', '.join(wrong[:3])}" if wrong else ""))
    for name in methods:
        missed = [(path, label, got) for (_c, path, _t), label, got
                  in zip(corpus, labels, verdicts[name]) if got != label]
        if name.startswith("whole") and missed:
            print("whole text, disagreements:")
            for path, label, got in missed:
                print(f"  {path}: label {label}, judged {got}")


if __name__ == "__main__":
    main()
