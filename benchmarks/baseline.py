"""A plain sequential script doing gate's per-document work the straightforward way.

    .venv/bin/python benchmarks/baseline.py INBOX [--limit N]

One process, no worker pool, no cache. Each file is read and hashed, extracted with the
same extractors (trafilatura for HTML, pypdf for PDF, decoding for text), screened with
the same quality and injection functions, and then the two costly steps are done the way
the libraries' documentation shows first: langdetect on the whole text (the library reads
up to 10,000 characters) and a MinHash built with one ``update()`` call per shingle and
datasketch's default SHA-1 hash, queried against and inserted into a ``MinHashLSH`` with
the library's own parameters for threshold 0.8. It prints documents per second, to compare
with ``gate run`` on the same inbox (benchmarks/scale.py does that).
"""

from __future__ import annotations

import argparse
import hashlib
import sys
import time
from pathlib import Path

ROOT = Path(__file__).resolve().parent.parent
sys.path.insert(0, str(ROOT))

import langdetect  # noqa: E402
from datasketch import MinHash, MinHashLSH  # noqa: E402
from langdetect import DetectorFactory  # noqa: E402
from langdetect.lang_detect_exception import LangDetectException  # noqa: E402

from gate.checks import duplicate as dup  # noqa: E402
from gate.checks import injection, quality  # noqa: E402


def shingles(tokens: list[str], w: int = 5) -> set[str]:
    """Broder's w-shingling as plain strings: the brute-force reference."""
    if len(tokens) < w:
        return {" ".join(tokens)} if tokens else set()
    return {" ".join(tokens[i:i + w]) for i in range(len(tokens) - w + 1)}
from gate.extract import extract  # noqa: E402

DetectorFactory.seed = 0


def run(inbox: Path, limit: int | None = None) -> tuple[int, float]:
    files = sorted(p for p in inbox.rglob("*") if p.is_file() and p.name != "manifest.jsonl")
    if limit:
        files = files[:limit]
    lsh = MinHashLSH(threshold=0.8, num_perm=dup.NUM_PERM)
    started = time.perf_counter()
    for number, path in enumerate(files):
        data = path.read_bytes()
        hashlib.sha256(data).hexdigest()
        extraction = extract(data, max_pages=500, max_nesting=250)
        if not extraction.summary.ok:
            continue
        text = extraction.text
        try:
            langdetect.detect_langs(text)
        except LangDetectException:
            pass
        quality.measure(extraction)
        injection.measure(extraction)
        sketch = MinHash(num_perm=dup.NUM_PERM)
        for shingle in shingles(dup.words(text)):
            sketch.update(shingle.encode("utf-8"))
        lsh.query(sketch)
        lsh.insert(str(number), sketch)
    return len(files), time.perf_counter() - started


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("inbox", type=Path)
    parser.add_argument("--limit", type=int)
    args = parser.parse_args()
    count, seconds = run(args.inbox, args.limit)
    print(f"baseline: {count} documents in {seconds:.1f} s ({count / seconds:.1f} docs/s)")


if __name__ == "__main__":
    main()
