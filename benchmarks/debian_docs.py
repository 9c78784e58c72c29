"""False positives of the injection check on real documents nobody here wrote.

Installs Debian documentation packages when they are missing (manual pages in ten
languages, the Python manual and the Debian Reference in HTML; needs root and the Debian
archive, and is skipped with ``--no-install``), renders a deterministic sample of manual
pages to text with ``man -l`` (``MANWIDTH=80``), takes a sample of the HTML manuals as they
are, runs gate's extractor and the injection check on each, and prints the share held at
the default threshold, overall and per group, with the strongest signal of each one held.
Nothing is copied into the repository.

    python benchmarks/debian_docs.py [--per-language 100] [--html 150] [--offset 0] [--no-install]
"""

from __future__ import annotations

import argparse
import gzip
import os
import re
import shutil
import subprocess
import sys
import time
from collections import defaultdict
from datetime import UTC, datetime
from pathlib import Path
from types import SimpleNamespace

ROOT = Path(__file__).resolve().parent.parent
PACKAGES = ["man-db", "groff-base", "manpages", "manpages-de", "manpages-fr", "manpages-es",
            "manpages-it", "manpages-pl", "manpages-pt", "manpages-ru", "manpages-ja",
            "python3-doc", "debian-reference-en", "debian-reference-de",
            "debian-reference-fr", "debian-reference-ja"]
MAN_ROOT = Path("/usr/share/man")
MAN_LANGUAGES = ["", "de", "fr", "es", "it", "pl", "pt", "pt_BR", "ru", "ja"]
HTML_ROOTS = [Path("/usr/share/doc/python3.11/html"), Path("/usr/share/debian-reference")]
_OVERSTRIKE = re.compile(".\x08")


def install(packages: list[str]) -> None:
    missing = [p for p in packages if subprocess.run(
        ["dpkg", "-s", p], capture_output=True).returncode != 0]
    if not missing:
        return
    if os.geteuid() != 0 or not shutil.which("apt-get"):
        print(f"missing packages (not installed, need root and apt-get): {' '.join(missing)}")
        return
    print(f"installing: {' '.join(missing)}")
    env = dict(os.environ, DEBIAN_FRONTEND="noninteractive")
    subprocess.run(["apt-get", "update", "-q"], env=env, capture_output=True)
    subprocess.run(["apt-get", "install", "-y", "-q", "--no-install-recommends", *missing],
                   env=env, capture_output=True)


OFFSET = [0]


def sample(paths: list[Path], n: int) -> list[Path]:
    """Every k-th of the sorted paths, from the ``--offset``-th on: deterministic, spread
    over the alphabet; another offset gives another sample."""
    paths = sorted(paths)
    if len(paths) <= n:
        return paths if OFFSET[0] == 0 else []
    step = len(paths) / n
    return sorted({paths[min(len(paths) - 1, int(i * step) + OFFSET[0])] for i in range(n)})


def man_pages(per_language: int) -> list[tuple[str, str, bytes]]:
    out = []
    for lang in MAN_LANGUAGES:
        base = MAN_ROOT / lang if lang else MAN_ROOT
        pages = [p for section in ("man1", "man5", "man7", "man8") for p in
                 (base / section).glob("*.gz")] if base.is_dir() else []
        for page in sample(pages, per_language):
            try:
                with gzip.open(page) as raw:
                    if raw.read(200).startswith(b".so "):
                        continue  # a link to another page
                text = subprocess.run(["man", "-l", "-E", "UTF-8", str(page)],
                                      capture_output=True, timeout=30,
                                      env=dict(os.environ, MANWIDTH="80", MANPAGER="cat",
                                               LANG="C.UTF-8")).stdout
            except (OSError, subprocess.SubprocessError, EOFError, gzip.BadGzipFile):
                continue
            text = _OVERSTRIKE.sub("", text.decode("utf-8", "replace")).encode("utf-8")
            if len(text) > 200:
                out.append((f"man/{lang or 'en'}", str(page), text))
    return out


def html_pages(n: int) -> list[tuple[str, str, bytes]]:
    out = []
    for root in HTML_ROOTS:
        if root.is_dir():
            files = [p for p in root.rglob("*.html") if p.is_file()]
            for page in sample(files, n * 2 // 3 if "python" in str(root) else n // 3):
                out.append((f"html/{root.parent.name if root.name == 'html' else root.name}",
                            str(page), page.read_bytes()))
    return out


def main(argv: list[str] | None = None) -> int:
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--per-language", type=int, default=100)
    parser.add_argument("--html", type=int, default=150)
    parser.add_argument("--threshold", type=float, default=0.5)
    parser.add_argument("--offset", type=int, default=0,
                        help="take the sample this many files further on (another sample)")
    parser.add_argument("--no-install", action="store_true")
    parser.add_argument("-v", "--verbose", action="store_true")
    args = parser.parse_args(argv)
    sys.path.insert(0, str(ROOT))
    from gate.checks.base import Document, RunContext
    from gate.checks.injection import CHECK, InjectionSettings
    from gate.extract import extract

    OFFSET[0] = max(0, args.offset)
    if not args.no_install:
        install(PACKAGES)
    t0 = time.perf_counter()
    docs = man_pages(args.per_language) + html_pages(args.html)
    t1 = time.perf_counter()
    policy = SimpleNamespace(injection=InjectionSettings(threshold=args.threshold))
    ctx = RunContext(as_of=datetime(2026, 12, 1, tzinfo=UTC))
    groups: dict[str, list[bool]] = defaultdict(list)
    held = []
    ext_s = det_s = 0.0
    for group, path, data in docs:
        a = time.perf_counter()
        extraction = extract(data, max_pages=500, max_nesting=250)
        b = time.perf_counter()
        if not extraction.summary.ok:
            continue
        measured = CHECK.measure(extraction)
        document = Document(path=path, kind="file", size=len(data), sha256=None, manifest=None,
                            extracted=extraction.summary, measures={"injection": measured})
        findings = CHECK.evaluate(document, policy, ctx) or []
        c = time.perf_counter()
        ext_s += b - a
        det_s += c - b
        groups[group].append(bool(findings))
        if findings:
            top = measured["signals"][0]
            held.append((path, measured["score"], top["signal"], top["snippet"][:100]))
    total = sum(len(v) for v in groups.values())
    flagged = sum(sum(v) for v in groups.values())
    print(f"documents: {total} ({len(docs)} sampled, rendered in {t1 - t0:.0f} s)")
    print(f"{'group':<28}{'docs':>6}{'held':>6}{'rate':>8}")
    for group in sorted(groups):
        v = groups[group]
        print(f"{group:<28}{len(v):>6}{sum(v):>6}{sum(v) / len(v):>8.3f}")
    rate = flagged / total if total else float("nan")
    print(f"{'ALL':<28}{total:>6}{flagged:>6}{rate:>8.4f}   (target <= 0.005)")
    print(f"time: extraction {ext_s:.1f} s, injection check {det_s:.1f} s "
          f"({det_s / (ext_s + det_s) * 100 if ext_s + det_s else 0:.0f}% of the two)")
    for path, value, signal, snippet in held:
        print(f"HELD  {value:.2f} {signal:<16} {path}  \"{snippet}\"")
    return 0


if __name__ == "__main__":
    raise SystemExit(main())
