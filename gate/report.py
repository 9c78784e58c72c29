"""Report: report.json, changes.jsonl, and the summary printed at the end of a run.

report.json lists every inbox document exactly once, in inbox order, with its decision,
the reasons it was held (every failing check, not just the first), warnings, its digest and
each check's outcome. Keys are sorted and nothing in it depends on the wall clock, so two
runs over the same inputs and ``--as-of`` produce byte-identical reports.
"""

from __future__ import annotations

import json
from collections import Counter
from typing import Any

from gate import __version__
from gate.checks import CHECK_IDS

CAUTIONS = (
    "gate's checks are heuristics: they lower the risk that a tampered, stale, off-language, "
    "duplicated or instruction-laden document reaches the index; they do not remove it.",
    "An accepted document is not proven safe. Keep defence in depth (treat retrieved text "
    "as untrusted in prompts, restrict what the assistant can do, monitor answers) and "
    "follow your organisation's security practice.",
)


def reason_json(finding: Any) -> dict[str, Any]:
    return {"check": finding.check, "code": finding.code, "message": finding.message,
            "details": finding.details}


class Tally:
    """The summary of a run, counted one document at a time."""

    def __init__(self) -> None:
        self.documents = 0
        self.decisions: Counter[str] = Counter()
        self.by_code: Counter[str] = Counter()
        self.by_check: Counter[str] = Counter()
        self.warn_codes: Counter[str] = Counter()
        self.changes: Counter[str] = Counter()

    def add(self, doc: dict[str, Any]) -> None:
        self.documents += 1
        self.decisions[doc["decision"]] += 1
        self.by_code.update({r["code"] for r in doc["reasons"]})
        self.by_check.update({r["check"] for r in doc["reasons"]})
        self.warn_codes.update({w["code"] for w in doc["warnings"]})
        if doc["change"] not in ("unchanged", "none"):
            self.changes[doc["change"]] += 1

    def summary(self, removed: list[dict[str, Any]]) -> dict[str, Any]:
        changes = Counter(self.changes)
        changes.update(r["change"] for r in removed)
        return {
            "documents": self.documents,
            "accepted": self.decisions.get("accepted", 0),
            "quarantined": self.decisions.get("quarantined", 0),
            "quarantined_by_code": dict(sorted(self.by_code.items())),
            "quarantined_by_check": {c: self.by_check[c] for c in CHECK_IDS
                                     if self.by_check[c]},
            "warnings_by_code": dict(sorted(self.warn_codes.items())),
            "changes": dict(sorted(changes.items())),
        }


def summary(documents: list[dict[str, Any]], removed: list[dict[str, Any]]) -> dict[str, Any]:
    """The summary of a whole list of report entries (a run counts with Tally as it goes)."""
    tally = Tally()
    for doc in documents:
        tally.add(doc)
    return tally.summary(removed)


def build(run: dict[str, Any], documents: list[dict[str, Any]],
          removed: list[dict[str, Any]], manifest_unmatched: list[str]) -> dict[str, Any]:
    return {
        "gate": {"version": __version__},
        "run": run,
        "summary": summary(documents, removed),
        "documents": documents,
        "removed": removed,
        "manifest_unmatched": manifest_unmatched,
        "cautions": list(CAUTIONS),
    }


def dumps_line(obj: Any) -> str:
    """One compact JSON line (for changes.jsonl), escaping what UTF-8 cannot hold."""
    text = json.dumps(obj, sort_keys=True, ensure_ascii=False, separators=(",", ":"))
    try:
        text.encode("utf-8")
    except UnicodeEncodeError:
        text = json.dumps(obj, sort_keys=True, separators=(",", ":"))
    return text
