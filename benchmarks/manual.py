"""No regression on real documentation: two versions of a real HTML manual.

    .venv/bin/python benchmarks/manual.py [--package postgresql-doc-15]
        [--versions 15.18-0+deb12u1 15.20-0+deb12u1] [--workers 2] [--limit N]

Downloads two versions of a Debian documentation package with ``apt-get download`` (never
committed; cached under bench-out/manual/), unpacks its HTML pages into one inbox
(``<version>/<page>``, both on one invented host, so the manual's navigation and footer
are learnt as the site's template), runs ``gate run`` with only the duplicate check on
(threshold 0.80), with and without template learning, and scores it against exact
Jaccard of word 5-grams between the two versions of each page (computed by brute force
on trafilatura's text of each page, independent of any template learnt):

* every same-page pair with Jaccard >= 0.85 must be found (one held as a duplicate of the
  other, or both of one keeper);
* no duplicate finding may name a keeper whose reference Jaccard is below 0.5.

It also prints the run time with and without template learning (the cost of learning
and removal on 2 x N real pages).
"""

from __future__ import annotations

import argparse
import json
import shutil
import subprocess
import sys
from pathlib import Path

ROOT = Path(__file__).resolve().parent.parent
sys.path.insert(0, str(ROOT))

from benchmarks.templates import run_once  # noqa: E402
from gate.extract import extract  # noqa: E402
from gate.tokens import words  # noqa: E402

POLICY = "version: 1\nname: manual-bench\nduplicates:\n  threshold: 0.80\n"


def fetch(package: str, versions: list[str], work: Path) -> dict[str, Path]:
    """Each version's unpacked HTML folder."""
    folders = {}
    for version in versions:
        target = work / "unpacked" / version
        if not target.exists():
            debs = work / "debs"
            debs.mkdir(parents=True, exist_ok=True)
            subprocess.run(["apt-get", "download", f"{package}={version}"], cwd=debs,
                           check=True, capture_output=True)
            deb = next(debs.glob(f"{package}_{version.replace(':', '%3a')}_*.deb"))
            target.mkdir(parents=True)
            subprocess.run(["dpkg-deb", "-x", str(deb), str(target)], check=True)
        pages = sorted(p for p in target.rglob("*.html") if p.is_file())
        folders[version] = pages[0].parent if pages else target
    return folders


def shingles(text: str) -> set[str]:
    tokens = words(text)
    if len(tokens) < 5:
        return {" ".join(tokens)}
    return {" ".join(tokens[i:i + 5]) for i in range(len(tokens) - 4)}


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.split("\n")[0])
    parser.add_argument("--package", default="postgresql-doc-15")
    parser.add_argument("--versions", nargs=2, default=["15.18-0+deb12u1", "15.20-0+deb12u1"])
    parser.add_argument("--workers", type=int, default=2)
    parser.add_argument("--limit", type=int, default=0, help="pages per version (0: all)")
    parser.add_argument("--work", type=Path, default=ROOT / "bench-out" / "manual")
    parser.add_argument("--learning-only", action="store_true",
                        help="skip the run without template learning")
    args = parser.parse_args()
    folders = fetch(args.package, args.versions, args.work)
    names = sorted(set.intersection(*({p.name for p in f.glob("*.html")}
                                      for f in folders.values())))
    if args.limit:
        names = names[:args.limit]
    inbox = args.work / "inbox"
    shutil.rmtree(inbox, ignore_errors=True)
    inbox.mkdir(parents=True)
    manifest, shingled = [], {}
    for version, folder in folders.items():
        (inbox / version).mkdir()
        for name in names:
            data = (folder / name).read_bytes()
            (inbox / version / name).write_bytes(data)
            path = f"{version}/{name}"
            manifest.append({"path": path,
                             "source_url": f"https://manual.example.org/{version}/{name}"})
            shingled[path] = shingles(extract(data, max_pages=500, max_nesting=400).text)
    (inbox / "manifest.jsonl").write_text(
        "".join(json.dumps(m, sort_keys=True) + "\n" for m in manifest), encoding="utf-8")
    policy = args.work / "manual.yaml"
    policy.write_text(POLICY, encoding="utf-8")

    def jaccard(a: str, b: str) -> float:
        x, y = shingled[a], shingled[b]
        return len(x & y) / len(x | y) if x | y else 1.0

    old, new = args.versions
    same_page = [(f"{old}/{n}", f"{new}/{n}", jaccard(f"{old}/{n}", f"{new}/{n}"))
                 for n in names]
    print(f"{args.package} {old} and {new}: {len(names)} pages each; same-page pairs "
          f"with Jaccard >= 0.85: {sum(j >= 0.85 for *_x, j in same_page)}")
    for learn in (True,) if args.learning_only else (True, False):
        out = args.work / ("out-learn" if learn else "out-plain")
        result, seconds = run_once(inbox, policy, out, args.workers, learn)
        report = json.loads((out / "report.json").read_text(encoding="utf-8"))
        keeper = {}
        for doc in report["documents"]:
            for reason in doc["reasons"]:
                if reason["code"].startswith("duplicate."):
                    keeper[doc["path"]] = reason["details"]["keeper"]
        found = sum(1 for a, b, j in same_page if j >= 0.85 and (
            keeper.get(a) == b or keeper.get(b) == a or
            (a in keeper and keeper.get(a) == keeper.get(b))))
        wrong = sum(1 for a, b in keeper.items() if jaccard(a, b) < 0.5)
        label = "with template learning" if learn else "trafilatura only (no learning)"
        print(f"  {label}: {seconds:.1f} s; same-page pairs >= 0.85 found "
              f"{found}/{sum(j >= 0.85 for *_x, j in same_page)}; duplicate findings "
              f"{len(keeper)}, of which below 0.5: {wrong}; worker seconds "
              + ", ".join(f"{k} {v:.1f}" for k, v in sorted(result.timings.items())))


if __name__ == "__main__":
    main()
