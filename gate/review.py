"""Quarantine review: list, show, release, reject and purge entries, with an audit trail.

Review actions go through the same machinery as runs: under the output folder's lock,
one SQLite transaction records the decision, the audit entries, the corpus change and the
placements; then the placements are applied (atomic folder renames) and changes.jsonl is
rewritten. A review killed half-way is completed by the next gate command on the folder.

* **release** moves an entry to ``accepted/`` (a note is required), adds it to the change
  set, and remembers the release: the same bytes are not held again by the same findings
  in later runs (they become warnings that name the reviewer and the note). Findings that
  mean the document could not be evaluated (a broken file, a time-out) cannot be released.
* **reject** keeps the entry in quarantine and marks it reviewed, so it no longer shows
  among open entries while its bytes stay the same.
* **purge** deletes the entry (its stored original too); the audit log keeps the record.
"""

from __future__ import annotations

import difflib
import getpass
import json
import os
from dataclasses import dataclass
from datetime import UTC, datetime
from pathlib import Path
from typing import Any

from gate.commit import Output, SilentReporter, finish, fingerprint, placement_fingerprint, \
    stored_index
from gate.errors import GateError, UsageError
from gate.findings import CODES
from gate.lock import RunLock
from gate.report import dumps_line
from gate.state import Rows, State, open_state
from gate.visible import visible


class ReviewError(GateError):
    """A review action that cannot be carried out (unknown entry, missing note...)."""


@dataclass(frozen=True)
class Entry:
    """One quarantine entry as a reviewer sees it."""

    id: str
    path: str
    sha256: str | None
    status: str
    run: str
    as_of: str
    codes: tuple[str, ...]
    checks: tuple[str, ...]
    source_url: str | None
    record: dict[str, Any]

    def to_json(self) -> dict[str, Any]:
        return {"id": self.id, "path": self.path, "sha256": self.sha256, "status": self.status,
                "run": self.run, "as_of": self.as_of, "codes": list(self.codes),
                "checks": list(self.checks), "source_url": self.source_url,
                "location": f"quarantine/{self.id}",
                "reasons": [{k: r[k] for k in ("check", "code", "message")}
                            for r in self.record.get("reasons", [])]}


def open_folder(out: Path) -> State:
    """The state of an output folder written by ``gate run``."""
    path = out / "state" / "gate.sqlite"
    if not path.exists():
        raise ReviewError(f"{out} holds no gate state (no {path}); run `gate run ... --out "
                          f"{out}` first.")
    return open_state(path)


def _record(out: Path, doc_id: str, folder: str = "quarantine") -> dict[str, Any]:
    name = "reasons.json" if folder == "quarantine" else "provenance.json"
    try:
        return json.loads((out / folder / doc_id / name).read_text(encoding="utf-8"))
    except (OSError, ValueError) as err:
        raise ReviewError(f"the entry {folder}/{doc_id} has no readable {name} ({err}).") \
            from None


def _entry(state: State, out: Path, doc_id: str) -> Entry:
    row = state.entry(doc_id)
    record = _record(out, doc_id)
    reasons = record.get("reasons", [])
    source = (record.get("source") or {}).get("url") or \
        ((record.get("manifest") or {}).get("source_url"))
    run = record.get("run", {})
    return Entry(id=doc_id, path=row["path"], sha256=row["sha256"], status=row["status"],
                 run=row["run_id"], as_of=run.get("as_of", ""),
                 codes=tuple(sorted({r["code"] for r in reasons})),
                 checks=tuple(sorted({r["check"] for r in reasons})), source_url=source,
                 record=record)


def list_entries(out: Path, *, check: str | None = None, code: str | None = None,
                 source: str | None = None, run: str | None = None,
                 since: str | None = None, until: str | None = None,
                 status: str | None = "open") -> list[Entry]:
    """Quarantine entries matching every given filter, in path order."""
    state = open_folder(out)
    try:
        found = []
        for doc_id in state.quarantine_ids():
            entry = _entry(state, out, doc_id)
            if status is not None and status != "all" and entry.status != status:
                continue
            if check and check not in entry.checks:
                continue
            if code and not any(c == code or c.startswith(code + ".") for c in entry.codes):
                continue
            if source and source not in (entry.source_url or ""):
                continue
            if run and entry.run != run:
                continue
            if since and entry.as_of[:len(since)] < since:
                continue
            if until and entry.as_of[:len(until)] > until:
                continue
            found.append(entry)
        return found
    finally:
        state.close()


def resolve(state: State, ref: str) -> str:
    """An entry id from an id or an inbox path."""
    if state.entry(ref) is not None:
        return ref
    ids = state.ids_at_path(ref)
    if len(ids) == 1:
        return ids[0]
    raise ReviewError(f"no entry {ref!r}: give an entry id (the folder name under "
                      "quarantine/) or a document's inbox path.")


def show(out: Path, ref: str) -> dict[str, Any]:
    """Everything a reviewer needs about one entry: reasons with visible snippets,
    decoded payloads, the text's start and, for a near-duplicate, the diff against its
    keeper."""
    state = open_folder(out)
    try:
        doc_id = resolve(state, ref)
        row = state.entry(doc_id)
        folder = row["folder"]
        record = _record(out, doc_id, folder)
        text_path = out / folder / doc_id / "text.txt"
        text = text_path.read_text(encoding="utf-8", errors="replace") \
            if text_path.exists() else None
        start = visible(text[:1500], keep="\n\t") if text else None
        shown: dict[str, Any] = {"id": doc_id, "folder": folder, "status": row["status"],
                                 "path": row["path"], "record": record, "text_start": start}
        diffs = []
        for reason in record.get("reasons", []):
            keeper = (reason.get("details") or {}).get("keeper_id")
            if keeper and text is not None:
                keeper_text = out / "accepted" / keeper / "text.txt"
                if keeper_text.exists():
                    theirs = keeper_text.read_text(encoding="utf-8", errors="replace")
                    diffs.append({"keeper": reason["details"].get("keeper"),
                                  "diff": _diff(theirs, text, reason["details"].get("keeper"),
                                                row["path"])})
        shown["keeper_diffs"] = diffs
        return shown
    finally:
        state.close()


def _diff(keeper: str, mine: str, keeper_name: str, my_name: str, limit: int = 200) -> str:
    lines = list(difflib.unified_diff(keeper.splitlines(), mine.splitlines(),
                                      fromfile=f"keeper: {keeper_name}",
                                      tofile=f"this: {my_name}", lineterm="", n=1))
    if len(lines) > limit:
        lines = lines[:limit] + [f"... ({len(lines) - limit} more diff lines)"]
    return visible("\n".join(lines), keep="\n\t")


def _who(by: str | None) -> str:
    if by:
        return by
    try:
        return getpass.getuser()
    except (KeyError, OSError):
        return f"uid {os.getuid()}"


@dataclass(frozen=True)
class ActionResult:
    review_id: str
    action: str
    ids: tuple[str, ...]
    paths: tuple[str, ...]


def act(out: Path, action: str, refs: list[str], *, note: str, by: str | None = None,
        now: datetime | None = None) -> ActionResult:
    """Release, reject or purge entries (see the module docstring)."""
    if action not in ("release", "reject", "purge"):
        raise UsageError(f"unknown review action {action!r}")
    if not note or not note.strip():
        raise UsageError(f"a note is required to {action} an entry: say why, with --note.")
    if not refs:
        raise UsageError(f"name at least one entry to {action}.")
    reviewer = _who(by)
    at = (now or datetime.now(UTC)).replace(microsecond=0).isoformat().replace("+00:00", "Z")
    with RunLock(out / "state" / "lock"):
        state = open_folder(out)
        try:
            return _act_locked(out, state, action, refs, note.strip(), reviewer, at)
        finally:
            state.close()


def _act_locked(out: Path, state: State, action: str, refs: list[str], note: str,
                reviewer: str, at: str) -> ActionResult:
    output = Output(out, state)
    pending = state.unfinished_run()
    if pending and pending["state"] == "decided":
        finish(output, pending["run_id"], SilentReporter())
    seq = state.next_seq()
    review_id = f"review-{seq:04d}"
    ids: list[str] = []
    for ref in refs:
        doc_id = resolve(state, ref)
        if doc_id not in ids:
            ids.append(doc_id)
    rows = Rows()
    paths = []
    for doc_id in ids:
        row = state.entry(doc_id)
        if row["folder"] != "quarantine":
            raise ReviewError(f"{row['path']!r} ({doc_id}) is not in quarantine; only "
                              "quarantine entries can be reviewed.")
        record = _record(out, doc_id)
        reasons = record.get("reasons", [])
        codes = sorted({r["code"] for r in reasons})
        review = {"action": action, "note": note, "by": reviewer, "at": at, "id": review_id}
        paths.append(row["path"])
        rows.audit.append({"action": action, "id": doc_id, "path": row["path"],
                              "sha256": row["sha256"], "codes": codes, "note": note,
                              "by": reviewer, "at": at, "review": review_id})
        if action == "release":
            stuck = [c for c in codes if CODES.get(c) is None or CODES[c].fail_closed]
            if stuck:
                raise ReviewError(
                    f"{row['path']!r} cannot be released: {', '.join(stuck)} means gate "
                    "could not evaluate it (fix the input or raise the limit and re-run).")
            new_record = {**record, "decision": "accepted", "warnings":
                          record.get("warnings", []) + reasons, "reasons": [],
                          "released": review}
            text_key = row["cache_key"] if (out / "quarantine" / doc_id / "text.txt").exists() \
                else None
            payload = {"path": row["path"], "sha256": row["sha256"], "text_key": text_key,
                       "record": new_record}
            rows.placements.append((review_id, doc_id, "accepted", json.dumps(payload)))
            measures = {}
            cached = state.cache_meta(row["cache_key"]) if row["cache_key"] else None
            if cached:
                measures = (cached[1].get("measures") or {}).get("duplicate") or {}
            rows.corpus_upserts.append((
                doc_id, row["path"], row["sha256"], measures.get("text_sha256"),
                measures.get("minhash"), row["trust"], row["date"], seq, review_id, "accepted",
                row["cache_key"] or "", (record.get("source") or {}).get("url") or
                (record.get("manifest") or {}).get("source_url")))
            rows.entry_updates.append(("accepted", placement_fingerprint("accepted", new_record,
                                                                     text_key),
                                  review_id, "released", json.dumps(review), doc_id))
            rows.releases += [(row["sha256"], code, note, reviewer, at) for code in codes]
            rows.changes.append(dumps_line(
                {"action": "add", "run": review_id, "id": doc_id, "path": row["path"],
                 "sha256": row["sha256"], "text": f"accepted/{doc_id}/text.txt",
                 "why": "released: " + note}))
        elif action == "reject":
            new_record = {**record, "review": review}
            text_key = row["cache_key"] if (out / "quarantine" / doc_id / "text.txt").exists() \
                else None
            payload = {"path": row["path"], "sha256": row["sha256"], "text_key": text_key,
                       "record": new_record, "reused": True}
            rows.placements.append((review_id, doc_id, "quarantine", json.dumps(payload)))
            rows.entry_updates.append(("quarantine", placement_fingerprint(
                "quarantine", new_record, text_key), review_id, "rejected", json.dumps(review),
                doc_id))
        else:
            rows.placements.append((review_id, doc_id, "absent", json.dumps({"path": row["path"]})))
            rows.entry_deletes.append(doc_id)
    with state.transaction():
        state.begin_review(review_id, seq, fingerprint(review_id, ids), at,
                           {"action": action, "ids": ids, "by": reviewer})
        state.write(review_id, rows)
    output.index = stored_index(state)  # keep a shared near-duplicate index in line
    if output.index is not None:
        output.index.lock()
    try:
        finish(output, review_id, SilentReporter())
    finally:
        if output.index is not None:
            output.index.unlock()
    return ActionResult(review_id, action, tuple(ids), tuple(paths))
