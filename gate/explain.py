"""Explain one document: every check's outcome, findings and measured values under a
policy, without routing anything. For policy authors tuning thresholds.

The document goes through the same code as in a run: it is extracted in an isolated
worker with the policy's limits, then evaluated by :func:`gate.evaluation.evaluate_document`
(the effective policy with a matching allow rule's overrides, every document check, the
per-document decision). Checks whose section is off are reported as ``off`` but their
measured values are still shown, so an author can see what switching one on would do.
With ``against``, the corpus checks also compare it with the corpus accepted in that
output folder, as an incremental run into that folder would.

Site templates (:mod:`gate.templates`) are learnt as a run learns them: a page with a
site (a ``source_url`` host) is extracted for its blocks, its site's template is learnt
from the pages of ``batch`` (the inbox it arrives with: its other pages of that host are
extracted for their blocks) and, with ``against``, the stored corpus's pages (their
blocks from that folder's cache), and the page is measured on its own text. Without
either there is one page to learn from, which teaches nothing, as in a run of that page
alone.
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
from gate.documents import doc_id, params_of
from gate.errors import InboxError
from gate.evaluation import evaluate_document, extraction_of
from gate.extract.model import Extracted
from gate.extract.pool import WorkerPool
from gate.intake import read_entry
from gate.manifest import Manifest, ManifestRecord
from gate.policy import LoadedPolicy
from gate.record import doc_record, slim
from gate.templates import Page, Removals, learn_quick, site_of, stored_pages
from gate.work import Params, process, warm_up

_BULKY = {"minhash"}


@dataclass(frozen=True)
class Explanation:
    path: str
    document: Document
    decision: str
    checks: list[dict[str, Any]]
    site_template: dict[str, Any] | None = None  # what was learnt for its site, if asked

    def to_json(self) -> dict[str, Any]:
        return {"path": self.path, "decision": self.decision, "type": self.document.extracted.type,
                "sha256": self.document.sha256, "size": self.document.size,
                "extraction": self.document.extracted.to_json(), "checks": self.checks,
                "site_template": self.site_template}


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
            against: Path | None = None, batch: Path | None = None,
            batch_manifest: Manifest | None = None) -> Explanation:
    """Extract, measure and evaluate one file under ``loaded`` (``batch``: the inbox it
    arrives with, whose manifest is ``batch_manifest``; see the module docstring)."""
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
    site = site_of(record.source_url if record else None)
    learning = site is not None and (batch is not None or against is not None)
    template: dict[str, Any] | None = None
    if intake.problem is not None:
        extracted = Extracted(type=None, problem=intake.problem, problem_detail=intake.detail)
    else:
        warm_up()
        with WorkerPool(process, workers=1, timeout_s=params.timeout_s,
                        memory_bytes=params.memory_mb * 1024 * 1024) as pool:
            if not learning:
                [(_tag, result)] = list(pool.run([(rel, (rel, intake.data, params))]))
            else:
                assert site is not None
                result, template = _on_own_text(pool, rel, intake.data, params, site, loaded,
                                                batch, batch_manifest, against)
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
    return Explanation(path=rel, document=document, decision=decision, checks=shown,
                       site_template=template)


# first-pass blocks of a batch's pages, by (sha256, limits' fingerprint): explaining the
# pages of one inbox one after another extracts each of them once
_BLOCKS: dict[tuple[str, str], tuple[str | None, dict[str, list[int]] | None]] = {}
_BLOCKS_MAX = 4096


def _first_pass(pool: WorkerPool, path: str, data: bytes | None, params: Params
                ) -> dict[str, Any] | None:
    """A page extracted for its blocks only (as a run's first pass); None on failure."""
    [(_tag, result)] = list(pool.run([(path, (path, data, params, None))]))
    if not isinstance(result, dict) or result["measure_errors"]:
        return None
    return result


def _on_own_text(pool: WorkerPool, rel: str, data: bytes | None, params: Params, site: str,
                 loaded: LoadedPolicy, batch: Path | None, batch_manifest: Manifest | None,
                 against: Path | None) -> tuple[Any, dict[str, Any]]:
    """A page of ``site`` measured on its own text, as in a run: (the worker's result,
    what was learnt for the site)."""
    first = _first_pass(pool, rel, data, params)
    if first is None or not Extracted.from_json(first["extracted"]).ok or not first["blocks"]:
        # as in a run: a page that failed or has nothing to learn from is taken as it is
        [(_tag, result)] = list(pool.run([(rel, (rel, data, params))]))
        return result, {"site": site, "pages": 0, "removed": 0}
    kind = first["extracted"].get("type")
    own = Page.of(f"{site} {kind}", first["blocks"])
    pages, members = [own], {doc_id(rel)}
    if batch is not None:
        for path, page in _batch_pages(pool, batch, batch_manifest, site, rel, loaded, params):
            members.add(doc_id(path))
            if page is not None and page.site == own.site:
                pages.append(page)
    if against is not None:
        pages += [p for p in _stored_template_pages(against, members) if p.site == own.site]
    drop = Removals(learn_quick(pages))(own)
    [(_tag, result)] = list(pool.run([(rel, (rel, data, params, drop, first["text"]))]))
    return result, {"site": site, "pages": len({p.signature() for p in pages}),
                    "removed": len(drop[0]) + len(drop[1]) if drop else 0}


def _batch_pages(pool: WorkerPool, batch: Path, manifest: Manifest | None, site: str,
                 rel: str, loaded: LoadedPolicy, params: Params):
    """(inbox path, first-pass Page or None) of every other document of ``batch``, the
    Page only for those of ``site`` (the rest are named: they are the batch too)."""
    from gate.discovery import walk
    from gate.manifest import for_inbox
    manifest = manifest if manifest is not None else for_inbox(batch, None)
    print_ = params.fingerprint()
    max_bytes = loaded.policy.limits.max_bytes
    for entry in containers.expand(batch, walk(batch), manifest):
        if entry.path == rel:
            continue
        if isinstance(entry, containers.Member):
            intake, record = containers.read(batch, entry, max_bytes, manifest)
        else:
            intake, record = read_entry(batch, entry, max_bytes), manifest.get(entry.path)
        if intake.problem is not None or site_of(record.source_url if record else None) != site:
            yield entry.path, None
            continue
        key = (intake.sha256, print_)
        if key not in _BLOCKS:
            first = _first_pass(pool, entry.path, intake.data, params)
            ok = first is not None and Extracted.from_json(first["extracted"]).ok
            if len(_BLOCKS) >= _BLOCKS_MAX:
                _BLOCKS.clear()
            _BLOCKS[key] = ((first["extracted"].get("type"), first["blocks"] or None)
                            if ok and first is not None else (None, None))
        kind, blocks = _BLOCKS[key]
        yield entry.path, Page.of(f"{site} {kind}", blocks) if blocks else None


def _stored_template_pages(against: Path, batch: set[str]) -> list[Page]:
    from gate.state import open_state
    db = Path(against) / "state" / "gate.sqlite"
    if not db.exists():
        raise InboxError(f"--against {against}: no gate state there ({db} is missing).")
    state = open_state(db)
    try:
        return stored_pages(state, batch)
    finally:
        state.close()


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
