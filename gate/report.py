"""Report: report.json, changes.jsonl, the summary printed at the end of a run, and the
provenance record kept with every entry.

report.json lists every inbox document exactly once, in inbox order, with its decision,
the reasons it was held (every failing check, not just the first), warnings, its digest and
each check's outcome. Keys are sorted and nothing in it depends on the wall clock, so two
runs over the same inputs and ``--as-of`` produce byte-identical reports.
"""

from __future__ import annotations

import json
import os
from collections import Counter
from urllib.parse import urlsplit
from pathlib import Path
from typing import Any

from gate import __version__, checks, jsontext
from gate.decide import Decision
from gate.record import DocRecord

CAUTIONS = (
    "gate's checks are heuristics: they lower the risk that a tampered, stale, off-language, "
    "duplicated or instruction-laden document reaches the index; they do not remove it.",
    "An accepted document is not proven safe. Keep defence in depth (treat retrieved text "
    "as untrusted in prompts, restrict what the assistant can do, monitor answers) and "
    "follow your organisation's security practice.",
)


NO_MANIFEST = (
    "This run had no manifest (no --manifest and no INBOX/manifest.jsonl): no document has "
    "a recorded source URL, checksum or publication date, so source rules can match only "
    "by inbox path and integrity cannot be checked.")


def cautions(has_manifest: bool) -> list[str]:
    """The cautions report.json and the page carry for a run."""
    return list(CAUTIONS) + ([] if has_manifest else [NO_MANIFEST])


def reason_json(finding: Any) -> dict[str, Any]:
    return {"check": finding.check, "code": finding.code, "message": finding.message,
            "details": finding.details}


NO_SOURCE = "(no source URL)"


def source_key(doc: dict[str, Any]) -> str:
    """The source a report entry is counted under: the host of its source URL, or
    ``(no source URL)``; a URL whose host cannot be read counts as ``(malformed URL)``."""
    source = doc.get("source")
    url = source.get("url") if isinstance(source, dict) else None
    if not isinstance(url, str) or not url:
        return NO_SOURCE
    try:
        host = urlsplit(url).hostname
    except ValueError:
        host = None
    return host or "(malformed URL)"


class Tally:
    """The summary of a run, counted one document at a time. Warnings are counted for
    accepted documents only (a held document's warnings are not what held it)."""

    def __init__(self) -> None:
        self.documents = 0
        self.decisions: Counter[str] = Counter()
        self.by_code: Counter[str] = Counter()
        self.by_check: Counter[str] = Counter()
        self.warn_codes: Counter[str] = Counter()
        self.changes: Counter[str] = Counter()
        self.sources: dict[str, dict[str, Any]] = {}

    def add(self, doc: dict[str, Any]) -> None:
        self.documents += 1
        self.decisions[doc["decision"]] += 1
        self.by_code.update({r["code"] for r in doc["reasons"]})
        self.by_check.update({r["check"] for r in doc["reasons"]})
        if doc["decision"] == "accepted":
            self.warn_codes.update({w["code"] for w in doc["warnings"]})
        source = self.sources.setdefault(source_key(doc), {"documents": 0, "quarantined": 0,
                                                            "codes": Counter()})
        source["documents"] += 1
        source["quarantined"] += doc["decision"] == "quarantined"
        source["codes"].update({r["code"] for r in doc["reasons"]})
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
            "quarantined_by_check": {c: self.by_check[c] for c in
                                     sorted(self.by_check, key=checks.order_of)
                                     if self.by_check[c]},
            "warnings_by_code": dict(sorted(self.warn_codes.items())),
            "changes": dict(sorted(changes.items())),
            "by_source": {name: {"documents": v["documents"], "quarantined": v["quarantined"],
                                 "codes": dict(sorted(v["codes"].items()))}
                          for name, v in sorted(self.sources.items())},
        }


def dumps_line(obj: Any) -> str:
    """One compact JSON line (for changes.jsonl), escaping what UTF-8 cannot hold."""
    text = json.dumps(obj, sort_keys=True, ensure_ascii=False, separators=(",", ":"))
    try:
        text.encode("utf-8")
    except UnicodeEncodeError:
        text = json.dumps(obj, sort_keys=True, separators=(",", ":"))
    return text


def pending(out: Path, run_id: str, suffix: str) -> Path:
    """Where a run's report waits (state/pending) until its placements are done."""
    return out / "state" / "pending" / f"report-{run_id}.{suffix}"


def provenance(record: DocRecord, decision: Decision, marks: dict[str, str],
               run_info: dict[str, Any]) -> dict[str, Any]:
    """Every input the decision used, for the entry's provenance.json / reasons.json."""
    out: dict[str, Any] = {
        "document": {"id": record.id, "path": record.path, "kind": record.kind,
                     "sha256": record.sha256, "size": record.size,
                     "link_target": record.link_target},
        "extraction": record.extraction,
        "manifest": record.manifest,
        "policy": {**run_info["policy"], **({"overrides_from": f"sources.allow[{record.rule}]"}
                                             if record.rule is not None else {})},
        "checks": marks,
        "decision": decision.decision,
        "reasons": [reason_json(f) for f in decision.reasons],
        "warnings": [reason_json(f) for f in decision.warnings],
        "measures": record.measures,
        "gate": {"version": __version__},
    }
    if record.source is not None:
        out["source"] = record.source
    if record.date is not None:
        out["date"] = record.date
    return out


def entry(record: DocRecord, decision: Decision, marks: dict[str, str], location: str,
          change: str) -> dict[str, Any]:
    """A document's entry in report.json."""
    extraction = record.extraction
    out: dict[str, Any] = {
        "path": record.path,
        "id": record.id,
        "decision": decision.decision,
        "reasons": [reason_json(f) for f in decision.reasons],
        "warnings": [reason_json(f) for f in decision.warnings],
        "checks": marks,
        "sha256": record.sha256,
        "size": record.size,
        "type": extraction.get("type"),
        "text_chars": extraction.get("text_chars", 0),
        "location": location,
        "change": change,
    }
    if record.source is not None:
        out["source"] = record.source
    if record.date is not None:
        out["date"] = record.date
    if extraction.get("title"):
        out["title"] = extraction["title"]
    language = record.measures.get("language")
    undetermined = any(f.check == "language" and f.code == "language.undetermined"
                       for f in (*decision.reasons, *decision.warnings))
    if language and language.get("languages") and not undetermined:
        out["language"] = {"code": language["languages"][0][0],
                           "probability": language["languages"][0][1]}
    injection = record.measures.get("injection")
    if isinstance(injection, dict) and "score" in injection:
        out["injection_score"] = injection["score"]
    return out


def html_view(entry: dict[str, Any], keep_reasons: bool) -> dict[str, Any]:
    """The small part of a report entry the HTML page draws."""
    view = {k: entry[k] for k in ("path", "id", "decision", "type", "size", "text_chars",
                                  "location", "change", "title", "language",
                                  "injection_score", "source", "checks") if k in entry}
    view["warnings"] = [{"check": w["check"], "code": w["code"], "message": w["message"]}
                        for w in entry["warnings"]]
    view["reasons"] = [{"check": r["check"], "code": r["code"], "message": r["message"],
                        "details": _small(r["details"]) if keep_reasons else {}}
                       for r in entry["reasons"]]
    return view


def _small(details: dict[str, Any]) -> dict[str, Any]:
    out = {}
    for key, value in list(details.items())[:12]:
        if isinstance(value, (str, int, float, bool)) or value is None:
            out[key] = value if not isinstance(value, str) else value[:300]
    return out


class ReportWriter:
    """Writes report.json as it goes, with the layout json.dumps(indent=2, sort_keys=True)
    gives, so a run never holds the whole report in memory."""

    def __init__(self, path: Path):
        self.path = path
        path.parent.mkdir(parents=True, exist_ok=True)
        self.fh = open(path, "w", encoding="utf-8")  # noqa: SIM115 - closed in finish()
        self.count = 0

    @staticmethod
    def _dumps(value: Any, indent: int) -> str:
        text = jsontext.dumps(value, indent=indent)
        try:
            text.encode("utf-8")
        except UnicodeEncodeError:  # undecodable file names: ASCII escapes
            text = jsontext.dumps(value, ensure_ascii=True, indent=indent)
        return text

    def start(self, cautions: list[str]) -> None:
        self.fh.write('{\n  "cautions": ' + self._dumps(cautions, 2) + ',\n  "documents": [')

    def document(self, entry: dict[str, Any]) -> None:
        self.fh.write(("," if self.count else "") + "\n    " + self._dumps(entry, 4))
        self.count += 1

    def finish(self, rest: dict[str, Any]) -> None:
        self.fh.write("\n  ]," if self.count else "],")
        keys = sorted(rest)
        for number, key in enumerate(keys):
            comma = "," if number < len(keys) - 1 else ""
            self.fh.write(f"\n  {json.dumps(key)}: " + self._dumps(rest[key], 2) + comma)
        self.fh.write("\n}\n")
        self.fh.flush()
        os.fsync(self.fh.fileno())
        self.fh.close()
