"""The page of an output folder: the report of its newest run joined with what the state
says now, so ``report.html`` is the reviewer's working page.

:func:`page_input` gathers, from the state and the entries' records only (never from the
inbox), what :func:`gate.htmlreport.render` draws: the run's documents and summary, the
review queue (open entries first, ordered by what needs a person), what was released,
rejected or purged since the run, and the previous run's summary for the change since
then. The run writes its page with it and every review action rewrites it
(:func:`gate.commit.finish`), and ``gate report html`` uses it too, so the page written by
a run and a re-render of the same folder are the same bytes.
"""

from __future__ import annotations

import difflib
import json
import shlex
from pathlib import Path
from typing import Any

from gate import report
from gate.findings import CODES
from gate.htmlreport import render
from gate.urgency import urgency
from gate.state import State, open_state
from gate.visible import visible

HTML_REASONS = 5000  # held documents whose reasons' details the page keeps
DIFF_LIMIT = 60  # diff lines shown per near-duplicate on the page
DIFF_ENTRIES = 200  # queue entries whose near-duplicate diff is computed
TEXT_LIMIT = 20_000  # characters of each text compared for a diff

def keeper_diffs(out: Path, record: dict[str, Any], text: str | None, path: str,
                 limit: int = 200) -> list[dict[str, str]]:
    """For a near or exact duplicate: a unified diff of the kept document's text against
    this one's, invisible characters shown as ``<U+XXXX>``."""
    diffs = []
    for reason in record.get("reasons") or record.get("warnings") or []:
        details = reason.get("details") or {}
        keeper = details.get("keeper_id")
        if not keeper or text is None or not reason.get("code", "").startswith("duplicate"):
            continue
        keeper_text = out / "accepted" / keeper / "text.txt"
        if keeper_text.exists():
            theirs = keeper_text.read_text(encoding="utf-8", errors="replace")
            diffs.append({"keeper": details.get("keeper"),
                          "diff": _diff(theirs, text, details.get("keeper"), path, limit)})
    return diffs


def _diff(keeper: str, mine: str, keeper_name: str, my_name: str, limit: int) -> str:
    lines = list(difflib.unified_diff(keeper[:TEXT_LIMIT].splitlines(),
                                      mine[:TEXT_LIMIT].splitlines(),
                                      fromfile=f"keeper: {keeper_name}",
                                      tofile=f"this: {my_name}", lineterm="", n=1))
    if not lines:
        lines = ["(the extracted texts are the same)"]
    if len(lines) > limit:
        lines = lines[:limit] + [f"... ({len(lines) - limit} more diff lines)"]
    return visible("\n".join(lines), keep="\n\t")


def _read_json(path: Path) -> dict[str, Any]:
    try:
        value = json.loads(path.read_text(encoding="utf-8"))
    except (OSError, ValueError):
        return {}
    return value if isinstance(value, dict) else {}


def _text(path: Path) -> str | None:
    try:
        return path.read_text(encoding="utf-8", errors="replace")
    except OSError:
        return None


def commands(folder: str, doc_id: str, status: str, releasable: bool) -> list[str]:
    """The review commands a reviewer can copy for one entry (a note must be written)."""
    base = f"gate review {{}} {shlex.quote(folder)} {doc_id}"
    if status == "released":  # from the decision to a policy that would have admitted it
        return [base.format("policy")]
    if status not in ("open", "rejected"):
        return []
    verbs = (["release"] if releasable else []) + (["reject"] if status == "open" else []) \
        + ["purge"]
    lines = [base.format(verb) + ' --note "WHY"' for verb in verbs]
    return lines + ([base.format("policy")] if releasable else [])


def _item(out: Path, folder: str, row: dict[str, Any], status: str, diff: bool,
          decided: dict[str, Any] | None = None) -> dict[str, Any]:
    """One queue entry. ``decided``: what the newest run's decision says of a held entry
    that run placed (its reasons and source URL, the same as its reasons.json holds), so
    the record file is not read back."""
    where = row["folder"]
    name = "reasons.json" if where == "quarantine" else "provenance.json"
    record = decided if decided is not None else \
        _read_json(out / where / row["doc_id"] / name)
    reasons = record.get("reasons") or []
    review = None
    if status == "released":
        review = record.get("released")
        reasons = record.get("warnings") or []  # a release turns the reasons into warnings
    elif row.get("review"):
        review = json.loads(row["review"])
    rank, ranked_by = urgency(reasons)
    codes = sorted({str(r.get("code")) for r in reasons})
    releasable = not any(CODES.get(c) is None or CODES[c].fail_closed for c in codes)
    diffs = []
    if diff and any((r.get("details") or {}).get("keeper_id") and
                    r.get("code", "").startswith("duplicate") for r in reasons):
        text = _text(out / where / row["doc_id"] / "text.txt")
        diffs = keeper_diffs(out, {"reasons": reasons}, text, row["path"], DIFF_LIMIT)
    source = (record.get("source") or {}).get("url") or \
        (record.get("manifest") or {}).get("source_url")
    return {"id": row["doc_id"], "path": row["path"], "status": status, "rank": rank,
            "ranked_by": ranked_by, "codes": codes, "reasons": reasons, "review": review,
            "diffs": diffs, "source": source, "location": f"{where}/{row['doc_id']}",
            "commands": commands(folder, row["doc_id"], status, releasable)}


def queue(out: Path, state: State, newest: tuple[str, dict[str, Any]] | None = None
          ) -> list[dict[str, Any]]:
    """Every quarantine entry with its status, every entry released since the newest run,
    and every entry purged since then; open entries first, each group by urgency, then
    path. ``newest``: the newest run's id and, by document id, what its decisions say of
    the documents it held (see :func:`_decided`)."""
    folder = str(out.resolve())
    items = []
    diffs = 0
    run_id, held = newest if newest is not None else (None, {})
    for row in state.reviewed_entries():
        if row["folder"] == "quarantine":
            status = row["status"]
        elif row["status"] == "released":
            status = "released"
        else:
            continue
        # an entry the newest run placed and no review action has touched since: its
        # record holds the reasons of that run's decision
        decided = held.get(row["doc_id"]) if row["run_id"] == run_id and \
            row["folder"] == "quarantine" and status in ("open", "rejected") else None
        item = _item(out, folder, row, status, diffs < DIFF_ENTRIES, decided)
        diffs += bool(item["diffs"])
        items.append(item)
    for entry in state.audit_since_run():
        if entry.get("action") != "purge":
            continue
        review = {k: entry.get(k) for k in ("action", "note", "by", "at")}
        review["id"] = entry.get("review")
        codes = sorted(entry.get("codes") or [])
        reasons = [{"check": c.split(".")[0], "code": c, "message": "", "details": {}}
                   for c in codes]
        rank, ranked_by = urgency(reasons)
        items.append({"id": entry.get("id"), "path": entry.get("path"), "status": "purged",
                      "rank": rank, "ranked_by": ranked_by, "codes": codes,
                      "reasons": reasons, "review": review, "diffs": [], "source": None,
                      "location": "(deleted)", "commands": []})
    order = {"open": 0, "rejected": 1, "released": 2, "purged": 3}
    items.sort(key=lambda i: (order.get(i["status"], 4), i["rank"], i["path"], i["id"]))
    return items


def page_input(out: Path, state: State) -> tuple[dict[str, Any], dict[str, Any]] | None:
    """(report, view) for :func:`gate.htmlreport.render`, drawn from the state of ``out``;
    None when the state holds no completed run with a recorded report."""
    runs = state.runs_done(2)
    if not runs:
        return None
    rest = state.report_rest(runs[0]["run_id"])
    if rest is None:
        return None
    docs = []
    held = 0
    decided: dict[str, dict[str, Any]] = {}
    for entry in state.decision_records(runs[0]["run_id"]):
        accepted = entry.get("decision") == "accepted"
        docs.append(report.html_view(entry, accepted or held < HTML_REASONS))
        held += not accepted
        found = _decided(entry)
        if found is not None:
            decided[entry["id"]] = found
    previous = None
    if len(runs) > 1:
        previous = {"id": runs[1]["run_id"], "summary": runs[1]["summary"]}
    view = {"queue": queue(out, state, (runs[0]["run_id"], decided)), "previous": previous,
            "folder": str(out.resolve())}
    return {**rest, "documents": docs}, view


def _decided(entry: dict[str, Any]) -> dict[str, Any] | None:
    """What the queue needs of a held document's record (its reasons and source URL),
    from its report entry: the entry and the record are made from the same decision
    (:func:`gate.report.entry`, :func:`gate.report.provenance`). None when the entry
    cannot tell: not held in quarantine, or without a source URL (the record's manifest
    may still name one)."""
    if entry.get("decision") != "quarantined" or \
            entry.get("location") != f"quarantine/{entry.get('id')}" or \
            not isinstance(entry.get("source"), dict) or not entry["source"].get("url"):
        return None
    return {"reasons": entry.get("reasons") or [], "source": {"url": entry["source"].get("url")}}


def render_folder(out: Path, state: State) -> str | None:
    """The HTML page of an output folder, or None when its state holds no report."""
    found = page_input(out, state)
    if found is None:
        return None
    page_report, view = found
    return render(page_report, view=view)


def render_report(folder: Path, report_json: dict[str, Any]) -> str:
    """The page for ``gate report html``: drawn from the folder's state (the same bytes as
    the run wrote, with the review statuses of now) when the state holds the run of
    ``report_json``; from ``report_json`` alone (no statuses) otherwise, for example for
    an archived report."""
    path = folder / "state" / "gate.sqlite"
    run_id = (report_json.get("run") or {}).get("id") if isinstance(
        report_json.get("run"), dict) else None
    if path.exists() and run_id:
        state = open_state(path)
        try:
            runs = state.runs_done(1)
            if runs and runs[0]["run_id"] == run_id:
                page = render_folder(folder, state)
                if page is not None:
                    return page
        finally:
            state.close()
    return render(report_json)
