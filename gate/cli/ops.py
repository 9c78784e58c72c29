"""The operator's commands: review the quarantine, verify the audit log, explain a
document."""

from __future__ import annotations

import json
import sys
from pathlib import Path
from typing import Annotated, Optional

import typer

from gate.cli.common import guard, say

review_app = typer.Typer(add_completion=False, no_args_is_help=True,
                         help="Review quarantined documents: list, show, release, reject, "
                              "purge.")
audit_app = typer.Typer(add_completion=False, no_args_is_help=True,
                        help="The hash-chained log of every decision and review action.")

OutDir = Annotated[Path, typer.Argument(help="The output folder of gate run (--out).")]
Note = Annotated[str, typer.Option("--note", help="Why (required; kept in the audit log).")]
By = Annotated[Optional[str], typer.Option(  # noqa: UP045
    "--by", help="Reviewer name for the audit log (default: the login name).")]
Refs = Annotated[list[str], typer.Argument(help="Entry ids or inbox paths.")]


def _filters(check, code, run, since, until, status) -> dict:
    """review list's filters, each checked: a typo must not make the list look empty."""
    from gate import cliargs
    return {"check": check and cliargs.check_id(check, "--check"),
            "code": code and cliargs.check_or_code(code, "--code"),
            "run": run and cliargs.run_id(run, "--run"),
            "since": since and cliargs.day_or_time(since, "--since"),
            "until": until and cliargs.day_or_time(until, "--until"),
            "status": cliargs.choice(status, "--status", ("open", "rejected", "all"))}


@review_app.command("list")
def review_list(
    out: OutDir,
    check: Annotated[Optional[str], typer.Option(help="Only entries held by this check.")] = None,  # noqa: UP045
    code: Annotated[Optional[str], typer.Option(help="Only this finding code (or a code prefix such as 'source').")] = None,  # noqa: UP045,E501
    source: Annotated[Optional[str], typer.Option(help="Only sources containing this text (host or URL).")] = None,  # noqa: UP045,E501
    run: Annotated[Optional[str], typer.Option(help="Only entries placed by this run id.")] = None,  # noqa: UP045
    since: Annotated[Optional[str], typer.Option(help="Only entries decided on or after this date (YYYY-MM-DD).")] = None,  # noqa: UP045,E501
    until: Annotated[Optional[str], typer.Option(help="Only entries decided on or before this date.")] = None,  # noqa: UP045,E501
    status: Annotated[str, typer.Option(help="open, rejected or all.")] = "open",
    as_json: Annotated[bool, typer.Option("--json", help="JSON for scripts.")] = False,
) -> None:
    """List quarantine entries (open ones by default)."""

    def body():
        from gate.review import list_entries
        entries = list_entries(out, **_filters(check, code, run, since, until, status),
                               source=source)
        if as_json:
            sys.stdout.write(json.dumps([e.to_json() for e in entries], indent=2,
                                        ensure_ascii=True) + "\n")
            return
        if not entries:
            say("no matching entries")
            return
        for entry in entries:
            say(f"{entry.id}  {entry.status:<8}  {entry.path}")
            for reason in entry.record.get("reasons", []):
                say(f"    {reason['code']}: {reason['message']}")
        say(f"{len(entries)} entries")

    guard(body)


@review_app.command("show")
def review_show(out: OutDir,
                ref: Annotated[str, typer.Argument(help="Entry id or inbox path.")],
                as_json: Annotated[bool, typer.Option("--json")] = False) -> None:
    """Show one entry: reasons, visible snippets, decoded payloads, the keeper diff."""

    def body():
        from gate.review import show, visible
        data = show(out, ref)
        if as_json:
            sys.stdout.write(json.dumps(data, indent=2, ensure_ascii=True) + "\n")
            return
        record = data["record"]
        doc = record.get("document", {})
        say(f"{data['folder']}/{data['id']}  ({data['status']})")
        say(f"path:    {data['path']}")
        say(f"sha256:  {doc.get('sha256')}")
        source = record.get("source") or {}
        if source.get("url"):
            say(f"source:  {source['url']} (trust {source.get('trust')})")
        if record.get("date"):
            say(f"date:    {record['date']['value']} ({record['date']['source']})")
        say("checks:  " + ", ".join(f"{k} {v}" for k, v in sorted(record.get("checks",
                                                                                {}).items())))
        for title, key in (("reasons", "reasons"), ("warnings", "warnings")):
            items = record.get(key) or []
            if items:
                say(f"{title}:")
            for item in items:
                say(f"  {item['code']}: {visible(item['message'])}")
                details = item.get("details") or {}
                for field in ("snippet", "payload", "decoded", "span", "signal"):
                    if field in details:
                        say(f"      {field}: {visible(str(details[field]))}")
        for review_key in ("review", "released"):
            if record.get(review_key):
                r = record[review_key]
                say(f"{review_key}: {r['action']} by {r['by']} at {r['at']}: {r['note']}")
        for diff in data["keeper_diffs"]:
            say(f"diff against the keeper {diff['keeper']}:")
            for line in diff["diff"].splitlines():
                say(f"  {line}")
        if data["text_start"]:
            say("text (start, invisible characters shown as <U+XXXX>):")
            for line in data["text_start"].splitlines()[:20]:
                say(f"  | {line}")

    guard(body)


def _act(action: str, out: Path, refs: list[str], note: str, by: str | None) -> None:
    def body():
        from gate.review import act
        result = act(out, action, refs, note=note, by=by)
        verb = {"release": "released", "reject": "rejected", "purge": "purged"}[action]
        for doc_id, path in zip(result.ids, result.paths):
            say(f"{verb} {doc_id}  {path}")
        say(f"{result.review_id}: {len(result.ids)} entries {verb}"
               + (" (changes.jsonl updated)" if action == "release" else ""))

    guard(body)


@review_app.command("release")
def review_release(out: OutDir, refs: Refs, note: Note, by: By = None) -> None:
    """Move entries to accepted/; the same bytes are not held again for the same findings."""
    _act("release", out, refs, note, by)


@review_app.command("reject")
def review_reject(out: OutDir, refs: Refs, note: Note, by: By = None) -> None:
    """Keep entries in quarantine, marked as reviewed."""
    _act("reject", out, refs, note, by)


@review_app.command("purge")
def review_purge(out: OutDir, refs: Refs, note: Note, by: By = None) -> None:
    """Delete entries (and their stored originals); the audit log keeps the record."""
    _act("purge", out, refs, note, by)


@audit_app.command("verify")
def audit_verify(out: OutDir, head: Annotated[Optional[str], typer.Option(  # noqa: UP045
        "--head", help="A head hash recorded earlier (report.json run.audit_head) that "
                       "must still be in the log.")] = None) -> None:
    """Recompute the hash chain; exit 1 if any entry was changed or removed."""

    def body():
        from gate.review import open_folder
        state = open_folder(out)
        try:
            verdict = state.verify_audit(head)
        finally:
            state.close()
        if verdict.ok:
            say(f"audit log intact: {verdict.entries} entries, head {verdict.head}")
            return
        say(f"audit log BROKEN after {verdict.entries} entries: {verdict.problem}")
        raise typer.Exit(1)

    guard(body)


@audit_app.command("show")
def audit_show(out: OutDir,
               ref: Annotated[Optional[str], typer.Option("--id", help="Only this entry id or path.")] = None,  # noqa: UP045,E501
               limit: Annotated[int, typer.Option(help="Newest entries to show.")] = 50,
               as_json: Annotated[bool, typer.Option("--json")] = False) -> None:
    """Show the newest audit entries (newest first)."""

    def body():
        from gate.review import open_folder, resolve
        state = open_folder(out)
        try:
            doc_id = resolve(state, ref) if ref else None
            rows = state.audit_entries(doc_id, limit)
        finally:
            state.close()
        if as_json:
            sys.stdout.write(json.dumps(rows, indent=2, ensure_ascii=True) + "\n")
            return
        for row in rows:
            what = row.get("path") or row.get("run")
            extra = row.get("decision") or row.get("note") or ""
            say(f"{row['seq']:>7}  {row['action']:<10}  {what}  {extra}")

    guard(body)


def explain_command(
    file: Annotated[Path, typer.Argument(help="The document to explain.")],
    policy: Annotated[Path, typer.Option("--policy", help="Policy file.")],
    source_url: Annotated[Optional[str], typer.Option(help="Its source URL (as the manifest would say).")] = None,  # noqa: UP045,E501
    sha256: Annotated[Optional[str], typer.Option(help="Its recorded SHA-256.")] = None,  # noqa: UP045
    published_at: Annotated[Optional[str], typer.Option(help="Its publication date.")] = None,  # noqa: UP045
    retrieved_at: Annotated[Optional[str], typer.Option(help="When it was gathered.")] = None,  # noqa: UP045
    inbox_path: Annotated[Optional[str], typer.Option(help="The inbox-relative path to use for path rules (default: the file name).")] = None,  # noqa: UP045,E501
    as_of: Annotated[Optional[str], typer.Option("--as-of", help="Clock for freshness (default now).")] = None,  # noqa: UP045,E501
    against: Annotated[Optional[Path], typer.Option(help="An output folder whose accepted corpus to compare with for duplicates.")] = None,  # noqa: UP045,E501
    as_json: Annotated[bool, typer.Option("--json")] = False,
) -> None:
    """Explain one document under a policy: each check's outcome, findings and values."""

    def body():
        from datetime import UTC, datetime

        from gate import dates
        from gate.errors import UsageError
        from gate.discovery import display_name
        from gate.explain import explain
        from gate.manifest import ManifestRecord
        from gate.policy import load_policy
        loaded = load_policy(policy)
        when = datetime.now(UTC).replace(microsecond=0)
        if as_of:
            try:
                when = dates.parse_as_of(as_of)
            except dates.DateProblem as err:
                raise UsageError(str(err)) from None
        rel = inbox_path or display_name(file.name)
        record = None
        if any((source_url, sha256, published_at, retrieved_at)):
            record = ManifestRecord(path=rel, line=0, source_url=source_url, sha256=sha256,
                                    published_at=published_at, retrieved_at=retrieved_at)
        result = explain(file, loaded, record=record, as_of=when, inbox_path=rel,
                         against=against)
        if as_json:
            sys.stdout.write(json.dumps(result.to_json(), indent=2, ensure_ascii=True) + "\n")
            return
        ex = result.document.extracted
        kind = ex.type or (ex.problem or "unsupported").replace("-", " ")
        say(f"{rel}: {kind}, {result.document.size} bytes, "
               f"{ex.text_chars} characters of text")
        say(f"decision under {loaded.name!r}: {result.decision}")
        say("checks (outcome, measured values; findings below each):")
        for check in result.checks:
            say(f"  {check['check']:<10} {check['outcome']:<5} {_measured(check)}")
            for finding in check["findings"]:
                say(f"      {finding['code']}: {finding['message']}")

    guard(body)


def _measured(check: dict) -> str:
    m = check.get("measured")
    cid = check["check"]
    if not m:
        return check.get("note", "")
    if cid == "language" and m.get("languages"):
        return ", ".join(f"{lang} {prob:.2f}" for lang, prob in m["languages"][:3]) + \
            f" ({m['chars']} characters)"
    if cid == "injection" and "score" in m:
        return f"score {m['score']:.2f}"
    if cid == "quality":
        return f"{m['words']} words, mean word length {m['mean_word_length']:.1f}"
    if cid == "duplicate":
        return f"{m['shingles']} shingles; {check.get('note', '')}"
    return ""
