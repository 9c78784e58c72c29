"""What needs a person first: the order of the review queue (page and commands alike)."""

from __future__ import annotations

from typing import Any

from gate.findings import CODES

# what needs a person first: a document gate could not evaluate, then planted
# instructions, then tampering and provenance, then the rest; stale and duplicate last
URGENCY = ("injection", "integrity", "signature", "source", "format", "quality", "language",
           "freshness", "duplicate")


def urgency(reasons: list[dict[str, Any]]) -> tuple[int, str]:
    """The rank of an entry in the queue (lower first) and what it is ranked by."""
    codes = [str(r.get("code")) for r in reasons if isinstance(r, dict)]
    if any(code.endswith(".internal-error") or (CODES.get(code) is not None and
                                                CODES[code].fail_closed) for code in codes):
        return 0, "could not be evaluated"
    ranks = [URGENCY.index(code.split(".")[0]) + 1 for code in codes
             if code.split(".")[0] in URGENCY]
    if not ranks:
        return len(URGENCY) + 1, "other"
    best = min(ranks)
    return best, URGENCY[best - 1]
