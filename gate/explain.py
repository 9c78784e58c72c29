"""Explain one document: every check's outcome, findings and measured values under a
policy, without routing anything. For policy authors tuning thresholds.

The document goes through the same code as in a run: it is extracted in an isolated
worker with the policy's limits, then evaluated by :func:`gate.evaluation.evaluate_document`
(the effective policy with a matching allow rule's overrides, every document check, the
per-document decision). Checks whose section is off are reported as ``off`` but their
measured values are still shown, so an author can see what switching one on would do.
With ``against``, the corpus checks also compare it with the corpus accepted in that
output folder, as an incremental run into that folder would.
"""

from __future__ import annotations

import os
import stat
from dataclasses import dataclass
from datetime import datetime
from pathlib import Path
from typing import Any

from gate import checks, containers
from gate.checks.base import Document, RunContext
from gate.corpus import run_corpus_checks
from gate.discovery import Entry, display_name
from gate.documents import params_of
from gate.errors import InboxError
from gate.evaluation import evaluate_document, extraction_of
from gate.extract.model import Extracted
from gate.extract.pool import WorkerPool
from gate.intake import read_entry
from gate.manifest import ManifestRecord
from gate.policy import LoadedPolicy
from gate.record import doc_record, slim
from gate.work import process, warm_up

_BULKY = {"minhash"}


@dataclass(frozen=True)
class Explanation:
    path: str
    document: Document
    decision: str
    checks: list[dict[str, Any]]

    def to_json(self) -> dict[str, Any]:
        return {"path": self.path, "decision": self.decision, "type": self.document.extracted.type,
                "sha256": self.document.sha256, "size": self.document.size,
                "extraction": self.document.extracted.to_json(), "checks": self.checks}


def _public(value: Any) -> Any:
    if isinstance(value, dict):
        return {k: _public(v) for k, v in value.items() if k not in _BULKY}
    return value


def _entry(file: Path) -> Entry:
    st = os.lstat(file)
    kind = "file" if stat.S_ISREG(st.st_mode) else \
        ("symlink" if stat.S_ISLNK(st.st_mode) else "other")
    shown = display_name(file.name)  # the escaped form runs use, for a name not UTF-8
    return Entry(path=shown, kind=kind, size=st.st_size if kind == "file" else None,
                 link_target=display_name(os.readlink(file)) if kind == "symlink" else None,
                 os_path=file.name if shown != file.name else None)


def explain(file: Path, loaded: LoadedPolicy, *, record: ManifestRecord | None,
            as_of: datetime, inbox_path: str | None = None,
            against: Path | None = None) -> Explanation:
    """Extract, measure and evaluate one file under ``loaded``."""
    file = Path(file)
    limits = loaded.policy.limits
    rel = inbox_path or display_name(file.name)
    # a record of a WARC archive or an mbox (ARCHIVE#record-NNNNN): ``record`` is then the
    # container's manifest line, as in a run
    found = None if os.path.lexists(file) else containers.find(file, record)
    entry: Entry
    if found is not None:
        folder, entry, manifest = found
        intake, record = containers.read(folder, entry, limits.max_bytes, manifest)
    else:
        entry = _entry(file)
        intake = read_entry(file.parent, entry, limits.max_bytes)
    params = params_of(loaded)
    measures: dict[str, Any] = {}
    errors: dict[str, str] = {}
    if intake.problem is not None:
        extracted = Extracted(type=None, problem=intake.problem, problem_detail=intake.detail)
    else:
        warm_up()
        with WorkerPool(process, workers=1, timeout_s=params.timeout_s,
                        memory_bytes=params.memory_mb * 1024 * 1024) as pool:
            [(_tag, result)] = list(pool.run([(rel, (rel, intake.data, params))]))
        extracted, measures, errors = extraction_of(result, intake.data)
    if record is not None and record.path != rel:
        record = ManifestRecord(**{**record.__dict__, "path": rel})
    document = Document(path=rel, kind=entry.kind, size=intake.size, sha256=intake.sha256,
                        manifest=record, extracted=extracted, measures=measures,
                        link_target=entry.link_target)
    evaluation = evaluate_document(document, loaded, RunContext(as_of=as_of),
                                   measure_errors=errors)
    shown = [{"check": r.check.id, "outcome": r.outcome,
              "findings": [f.to_json() for f in r.findings or []],
              "measured": _public(measures.get(r.check.id))} for r in evaluation.results]
    one = slim(doc_record(0, "(this document)", entry, intake, document, evaluation, None,
                          loaded.policy), evaluation, document, errors)
    stored = _stored(against) if against is not None else []
    run_corpus_checks([one], stored, loaded.policy, seq=1 + max(
        (row["first_seen"] for row in stored), default=0), incremental=True)
    for check in checks.CORPUS_CHECKS:
        mark = one.corpus_marks[check.id]
        found = [f for f in one.extra if f.check == check.id]
        if mark == "off":
            note = f"{check.section} section is off"
        elif mark == "n/a":
            note = "no text to compare"
        elif against is None:
            note = "give --against DIR to compare with a stored corpus"
        else:
            note = f"compared with {len(stored)} accepted documents in {against}"
        if against is None and mark not in ("off", "fail"):
            mark, found = "n/a", []
        shown.append({"check": check.id, "outcome": mark,
                      "findings": [f.to_json() for f in found],
                      "measured": _public(measures.get(check.id)), "note": note})
    decision = evaluation.decision.extend(one.extra, evaluation.policy).decision
    return Explanation(path=rel, document=document, decision=decision, checks=shown)


def _stored(against: Path) -> list[dict[str, Any]]:
    from gate.state import open_state
    db = Path(against) / "state" / "gate.sqlite"
    if not db.exists():
        raise InboxError(f"--against {against}: no gate state there ({db} is missing).")
    state = open_state(db)
    try:
        return state.corpus()
    finally:
        state.close()
