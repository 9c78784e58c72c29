"""Do two runs decide alike? Compares two report.json files document by document.

    .venv/bin/python benchmarks/same_decisions.py BEFORE/report.json AFTER/report.json

For a speed change that must not change any decision: run ``gate run`` on the same inbox,
policy and ``--as-of`` with the old code (``git archive`` of the earlier commit) and the new,
then compare. Per document (by path) the decision, reasons, warnings, language and text
length are compared; the documents that differ are listed, with both sides. Exit status 0
when all agree, 1 when any differ, 2 when a file cannot be read.
"""

from __future__ import annotations

import json
import sys
from pathlib import Path
from typing import Any

FIELDS = ("decision", "reasons", "warnings", "language", "text_chars")


def _load(path: str) -> dict[str, tuple[Any, ...]]:
    try:
        report = json.loads(Path(path).read_text(encoding="utf-8"))
        return {e["path"]: tuple(e.get(f) for f in FIELDS) for e in report["documents"]}
    except (OSError, ValueError, KeyError, TypeError) as err:
        raise SystemExit(f"error: {path} is not a readable gate report.json ({err}); give "
                         "the report.json of two gate runs")


def main(argv: list[str]) -> int:
    if len(argv) != 2:
        print("usage: same_decisions.py BEFORE/report.json AFTER/report.json", file=sys.stderr)
        return 2
    try:
        before, after = _load(argv[0]), _load(argv[1])
    except SystemExit as err:
        print(err, file=sys.stderr)
        return 2
    differ = sorted(p for p in before.keys() | after.keys() if before.get(p) != after.get(p))
    for path in differ:
        print(f"{path}\n  before: {before.get(path)}\n  after:  {after.get(path)}")
    print(f"{len(before)} documents before, {len(after)} after; {len(differ)} differ "
          f"(compared: {', '.join(FIELDS)})")
    return 1 if differ else 0


if __name__ == "__main__":
    sys.exit(main(sys.argv[1:]))
