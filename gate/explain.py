"""Explain one document: every check's outcome, findings and measured values under a
policy, without routing anything. For policy authors tuning thresholds.

The document is extracted in an isolated worker with the policy's limits, exactly as in a
run; then every document check is evaluated (checks whose section is off are reported as
``off`` but their measured values are still shown, so an author can see what switching
one on would do). With ``against``, the document is also compared with the corpus accepted
in that output folder.
"""

from __future__ import annotations

import os
from dataclasses import dataclass
from datetime import datetime
from pathlib import Path
from typing import Any

from gate.checks import DOCUMENT_CHECKS
from gate.checks import duplicate as duplicate_check
from gate.checks.base import Document, RunContext
from gate.decide import decide, outcome
from gate.discovery import Entry
from gate.errors import InboxError
from gate.extract.model import Extracted
from gate.extract.pool import Failure, WorkerPool
from gate.findings import internal_error
from gate.intake import read_entry
from gate.manifest import ManifestRecord
from gate.policy import LoadedPolicy
from gate.work import Params, process, warm_up

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


def explain(file: Path, loaded: LoadedPolicy, *, record: ManifestRecord | None,
            as_of: datetime, inbox_path: str | None = None,
            against: Path | None = None) -> Explanation:
    """Extract, measure and evaluate one file under ``loaded``."""
    file = Path(file)
    if not file.exists() and not file.is_symlink():
        raise InboxError(f"{file} does not exist.")
    policy = loaded.policy
    limits = policy.limits
    rel = inbox_path or file.name
    st = os.lstat(file)
    import stat as stat_mod
    kind = "file" if stat_mod.S_ISREG(st.st_mode) else \
        ("symlink" if stat_mod.S_ISLNK(st.st_mode) else "other")
    entry = Entry(path=file.name, kind=kind, size=st.st_size if kind == "file" else None,
                  link_target=os.readlink(file) if kind == "symlink" else None)
    intake = read_entry(file.parent, entry, limits.max_bytes)
    params = Params.for_policy(loaded)
    measures: dict[str, Any] = {}
    errors: dict[str, str] = {}
    if intake.problem is not None:
        extracted = Extracted(type=None, problem=intake.problem, problem_detail=intake.detail)
    else:
        warm_up()
        with WorkerPool(process, workers=1, timeout_s=params.timeout_s,
                        memory_bytes=params.memory_mb * 1024 * 1024) as pool:
            [(_tag, result)] = list(pool.run([(rel, (rel, intake.data, params))]))
        if isinstance(result, Failure):
            kind_ = {"timeout": "timeout", "memory": "memory"}.get(result.kind, "crashed")
            extracted = Extracted(type=None, problem=kind_, problem_detail=result.detail)
        else:
            extracted = Extracted.from_json(result["extracted"])
            measures, errors = result["measures"], result["measure_errors"]
    if record is not None and record.path != rel:
        record = ManifestRecord(**{**record.__dict__, "path": rel})
    document = Document(path=rel, kind=kind, size=intake.size, sha256=intake.sha256,
                        manifest=record, extracted=extracted, measures=measures,
                        link_target=entry.link_target)
    ctx = RunContext(as_of=as_of)
    checks: list[dict[str, Any]] = []
    everything = []
    for check in DOCUMENT_CHECKS:
        enabled = check.always_on or getattr(policy, check.section, None) is not None
        found = None
        if enabled:
            if check.id in errors:
                found = [internal_error(check.id, RuntimeError(errors[check.id]))]
            else:
                try:
                    found = check.evaluate(document, policy, ctx)
                except Exception as err:  # noqa: BLE001 - shown, and fails closed
                    found = [internal_error(check.id, err)]
        everything += found or []
        checks.append({"check": check.id, "outcome": outcome(found, policy, enabled),
                       "findings": [f.to_json() for f in found or []],
                       "measured": _public(measures.get(check.id))})
    dup = _duplicates(document, measures, policy, against)
    everything += [f for f in dup["findings_objects"]]
    checks.append({"check": "duplicate", "outcome": dup["outcome"],
                   "findings": [f.to_json() for f in dup["findings_objects"]],
                   "measured": _public(measures.get("duplicate")), "note": dup["note"]})
    decision = decide(everything, policy).decision
    return Explanation(path=rel, document=document, decision=decision, checks=checks)


def _duplicates(document: Document, measures: dict[str, Any], policy: Any,
                against: Path | None) -> dict[str, Any]:
    settings = policy.duplicates
    if settings is None:
        return {"outcome": "off", "findings_objects": [], "note": "duplicates section is off"}
    measured = measures.get("duplicate")
    if measured is None:
        return {"outcome": "n/a", "findings_objects": [], "note": "no text to compare"}
    if against is None:
        return {"outcome": "n/a", "findings_objects": [],
                "note": "give --against DIR to compare with a stored corpus"}
    from gate.state import open_state
    db = Path(against) / "state" / "gate.sqlite"
    if not db.exists():
        raise InboxError(f"--against {against}: no gate state there ({db} is missing).")
    state = open_state(db)
    try:
        rows = state.corpus()
    finally:
        state.close()
    items = [duplicate_check.Item(key=row["doc_id"], path=row["path"], sha256=row["sha256"],
                                  text_sha256=row["text_sha256"], minhash=row["minhash"],
                                  trust=row["trust"], date=None, seen=(0, i), in_batch=False,
                                  accepted_before=True)
             for i, row in enumerate(rows)]
    small = measured["shingles"] < settings.min_shingles
    items.append(duplicate_check.Item(
        key="(this document)", path=document.path, sha256=document.sha256 or "",
        text_sha256=measured["text_sha256"], minhash=None if small else measured["minhash"],
        trust=-1, date=None, seen=(1, 0), candidate=False))
    result = duplicate_check.evaluate(items, settings)
    found = result.findings.get("(this document)", [])
    return {"outcome": outcome(found, policy, True), "findings_objects": found,
            "note": f"compared with {len(rows)} accepted documents in {against}"}
