"""The operator's commands: review the quarantine, verify the audit log, explain a
document."""

from __future__ import annotations

import json
import sys
from pathlib import Path
from typing import Annotated, Optional

import typer

from gate.cli.common import guard, plural, say

review_app = typer.Typer(add_completion=False, no_args_is_help=True,
                         help="Review quarantined documents: list, show, release, reject, "
                              "purge.")
audit_app = typer.Typer(add_completion=False, no_args_is_help=True,
                        help="The hash-chained log of every decision and review action.")

OutDir = Annotated[Path, typer.Argument(metavar="DIR",
                                         help="The output folder of gate run (--out).")]
Note = Annotated[str, typer.Option("--note", metavar="TEXT",
                                   help="Why (required; kept in the audit log).")]
By = Annotated[Optional[str], typer.Option(  # noqa: UP045
    "--by", metavar="NAME", help="Reviewer name for the audit log (default: the login name).")]
Refs = Annotated[Optional[list[str]], typer.Argument(  # noqa: UP045
    metavar="[ENTRY]...", help="Entry ids or inbox paths; or select entries with the "
                               "filters of `review list` instead.", show_default=False)]
Json = Annotated[bool, typer.Option("--json", help="Print JSON (for scripts) instead of "
                                                   "text.")]
# the filters of `review list`, shared with the bulk review actions
Check = Annotated[Optional[str], typer.Option(  # noqa: UP045
    metavar="CHECK", help="Only entries held by this check (a check id, e.g. language).")]
Code = Annotated[Optional[str], typer.Option(  # noqa: UP045
    metavar="CODE", help="Only this finding code, or every code of a check id (e.g. "
                         "source).")]
Source = Annotated[Optional[str], typer.Option(  # noqa: UP045
    metavar="TEXT", help="Only sources containing this text (host or URL).")]
RunId = Annotated[Optional[str], typer.Option(  # noqa: UP045
    metavar="RUN", help="Only entries placed by this run or review id (e.g. run-0001).")]
Since = Annotated[Optional[str], typer.Option(  # noqa: UP045
    metavar="YYYY-MM-DD", help="Only entries of runs as of this day or later.")]
Until = Annotated[Optional[str], typer.Option(  # noqa: UP045
    metavar="YYYY-MM-DD", help="Only entries of runs as of this day or earlier.")]
Status = Annotated[str, typer.Option(metavar="STATUS",
                                     help="open, rejected or all.")]
Yes = Annotated[bool, typer.Option("--yes", help="Carry out an action selected by filters "
                                                 "(without it, only the preview is "
                                                 "printed).")]


@review_app.command("list")
def review_list(out: OutDir, check: Check = None, code: Code = None, source: Source = None,
                run: RunId = None, since: Since = None, until: Until = None,
                status: Status = "open", as_json: Json = False) -> None:
    """List quarantine entries (open ones by default); unknown filter values are errors."""

    def body():
        from gate.review import list_entries
        entries = list_entries(out, check=check, code=code, source=source, run=run,
                               since=since, until=until, status=status)
        if as_json:
            sys.stdout.write(json.dumps([e.to_json() for e in entries], indent=2,
                                        ensure_ascii=True) + "\n")
            return
        if not entries:
            say("no matching entries")
            return
        _print_entries(entries)
        say(plural(len(entries), "entry", "entries"))

    guard(body)


def _print_entries(entries) -> None:
    for entry in entries:
        say(f"{entry.id}  {entry.status:<8}  {entry.path}")
        for reason in entry.record.get("reasons", []):
            say(f"    {reason['code']}: {reason['message']}")


@review_app.command("show")
def review_show(out: OutDir,
                ref: Annotated[str, typer.Argument(metavar="ENTRY",
                                                   help="Entry id or inbox path.")],
                as_json: Json = False) -> None:
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


VERBS = {"release": "released", "reject": "rejected", "purge": "purged"}


def _act(action: str, out: Path, refs: list[str] | None, note: str, by: str | None,
         filters: dict, yes: bool) -> None:
    def body():
        from gate.errors import UsageError
        from gate.review import Filters, act, list_entries
        verb = VERBS[action]
        chosen = Filters(**filters)
        if refs and chosen.given():
            raise UsageError(f"name entries or select them with filters, not both: "
                             f"`gate review {action} DIR ENTRY...` or `gate review {action} "
                             "DIR --code CODE ...`.")
        if not refs:
            if not chosen.given():
                raise UsageError(f"name the entries to {action}, or select them with the "
                                 "filters of `review list` (--check, --code, --source, "
                                 "--run, --since, --until, --status).")
            entries = list_entries(out, **filters)
            if not entries:
                say(f"no matching entries: nothing {verb}")
                return
            if not yes:
                _print_entries(entries)
                say(f"{plural(len(entries), 'entry', 'entries')} would be {verb}; add --yes "
                    f"to {action} them.")
                return
            targets = [e.id for e in entries]
        else:
            targets = list(refs)
        if not note.strip():
            raise UsageError(f"a note is required to {action} an entry: say why, with --note.")
        result = act(out, action, targets, note=note, by=by)
        for doc_id, path in zip(result.ids, result.paths):
            say(f"{verb} {doc_id}  {path}")
        say(f"{result.review_id}: {plural(len(result.ids), 'entry', 'entries')} {verb}"
            + (" (changes.jsonl updated)" if action == "release" else "")
            + "; report.html rewritten")

    guard(body)


def _review_action(action: str, doc: str):
    def command(out: OutDir, note: Note, refs: Refs = None, by: By = None,
                check: Check = None, code: Code = None, source: Source = None,
                run: RunId = None, since: Since = None, until: Until = None,
                status: Status = "open", yes: Yes = False) -> None:
        filters = {"check": check, "code": code, "source": source, "run": run,
                   "since": since, "until": until, "status": status}
        _act(action, out, refs, note, by, filters, yes)
    command.__doc__ = doc + (" Entries are named, or selected with the filters of `review "
                             "list`: then the matching entries are previewed, and acted on "
                             "only with --yes.")
    command.__name__ = f"review_{action}"
    return command


review_app.command("release")(_review_action(
    "release", "Move entries to accepted/; the same bytes are not held again for the same "
               "findings."))
review_app.command("reject")(_review_action(
    "reject", "Keep entries in quarantine, marked as reviewed."))
review_app.command("purge")(_review_action(
    "purge", "Delete entries (and their stored originals); the audit log keeps the record."))


@review_app.command("policy")
def review_policy(out: OutDir,
                  ref: Annotated[str, typer.Argument(metavar="ENTRY",
                                                     help="Entry id or inbox path.")],
                  as_json: Json = False) -> None:
    """Print the policy lines that would have admitted an entry (an allow rule for its
    host, per-source overrides), to paste into a policy after a review. Nothing is
    applied."""

    def body():
        from gate.review import policy_lines
        found = policy_lines(out, ref)
        if as_json:
            sys.stdout.write(json.dumps({"id": found.id, "path": found.path,
                                         "yaml": found.yaml, "on_rule": found.on_rule,
                                         "notes": list(found.notes)}, indent=2,
                                        ensure_ascii=True) + "\n")
            return
        if found.yaml:
            where = (f"add under the existing rule {found.on_rule}" if found.on_rule
                     else "add to your policy")
            say(f"# policy lines that would have admitted {found.path} ({found.id}); {where},")
            say("# then run `gate policy check FILE`. gate applies nothing by itself.")
            for line in found.yaml.splitlines():
                say(line)
        else:
            say(f"# no policy line would have admitted {found.path} ({found.id}).")
        for note in found.notes:
            say(f"# {note}")

    guard(body)


@audit_app.command("verify")
def audit_verify(out: OutDir, head: Annotated[Optional[str], typer.Option(  # noqa: UP045
        "--head", metavar="HASH", help="A head hash recorded earlier (report.json "
                                       "run.audit_head) that must still be in the log.")
] = None) -> None:
    """Recompute the hash chain; exit 1 if any entry was changed or removed.

    Exit status: 0 intact; 1 the log was edited; 2 could not check (no state, bad --head).
    """

    def body():
        import re

        from gate.errors import UsageError
        from gate.review import open_folder
        if head is not None and not re.fullmatch(r"[0-9a-f]{64}", head):
            raise UsageError(f"--head {head!r} is not a head hash: give the 64 lower-case "
                             "hex digits of report.json's run.audit_head.")
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
               ref: Annotated[Optional[str], typer.Option("--id", metavar="ENTRY", help="Only this entry id or path.")] = None,  # noqa: UP045,E501
               limit: Annotated[int, typer.Option(metavar="N", min=1, help="Newest entries to show.")] = 50,  # noqa: E501
               as_json: Json = False) -> None:
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
            say(audit_line(row))

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
    against: Annotated[Optional[Path], typer.Option(metavar="DIR", help="An output folder whose accepted corpus to compare with for duplicates (and whose stored pages teach site templates).")] = None,  # noqa: UP045,E501
    batch: Annotated[Optional[Path], typer.Option(metavar="INBOX", help="The inbox the document arrives with: its other pages of the same site teach the site's template, as in a run; its manifest line is used unless given by the options above.")] = None,  # noqa: UP045,E501
    as_json: Json = False,
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
        import re
        if sha256 is not None and not re.fullmatch(r"[0-9a-fA-F]{64}", sha256):
            raise UsageError(f"--sha256 {sha256!r} is not a SHA-256 digest (64 hex digits).")
        for name, value in (("--published-at", published_at),
                            ("--retrieved-at", retrieved_at)):
            if value is not None:
                try:
                    dates.parse_iso8601(value)
                except dates.DateProblem as err:
                    raise UsageError(f"{name}: {err}; give an ISO 8601 date such as "
                                     "2026-11-01 or 2026-11-01T08:00:00Z.") from None
        listed = None
        if batch is not None:
            from gate.manifest import for_inbox
            if not batch.is_dir():
                raise UsageError(f"--batch {batch}: not a folder; give the inbox the "
                                 "document arrives with.")
            listed = for_inbox(batch, None)
        rel = inbox_path or _inside(file, batch) or display_name(file.name)
        record = None
        if any((source_url, sha256, published_at, retrieved_at)):
            record = ManifestRecord(path=rel, line=0, source_url=source_url, sha256=sha256,
                                    published_at=published_at, retrieved_at=retrieved_at)
        elif listed is not None:
            record = listed.get(rel)
        result = explain(file, loaded, record=record, as_of=when, inbox_path=rel,
                         against=against, batch=batch, batch_manifest=listed)
        if as_json:
            sys.stdout.write(json.dumps(result.to_json(), indent=2, ensure_ascii=True) + "\n")
            return
        ex = result.document.extracted
        kind = ex.type or (ex.problem or "unsupported").replace("-", " ")
        say(f"{rel}: {kind}, {result.document.size} bytes, "
               f"{ex.text_chars} characters of text")
        say(f"decision under {loaded.name!r}: {result.decision}")
        if result.site_template is not None:
            say(_template_line(result.site_template, ex.template))
        say("checks (outcome, measured values; findings below each):")
        for check in result.checks:
            say(f"  {check['check']:<10} {check['outcome']:<5} {_measured(check)}")
            for finding in check["findings"]:
                say(f"      {finding['code']}: {finding['message']}")

    guard(body)


def _inside(file: Path, batch: Path | None) -> str | None:
    """The file's path inside ``batch`` (as a run names it), when it lies there."""
    if batch is None:
        return None
    from gate.discovery import display_name
    try:
        parts = file.resolve().relative_to(batch.resolve()).parts
    except ValueError:
        return None
    return "/".join(display_name(part) for part in parts) or None


def _template_line(learnt: dict, done: dict | None) -> str:
    site, pages = learnt["site"], learnt["pages"]
    if not learnt["removed"]:
        return (f"site template of {site}: none on this page (learnt from {pages} distinct "
                f"page{'s' if pages != 1 else ''}; a site teaches one from 3)")
    kept = (done or {}).get("kept")
    how = {"main": "the main text without it", "page": "the page's own blocks"}.get(
        kept or "", f"the text as extracted ({kept})" if kept else "the text as extracted")
    return (f"site template of {site} (learnt from {pages} distinct pages): "
            f"{learnt['removed']} blocks of this page are template; checked: {how}")


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


def audit_line(row: dict) -> str:
    """One audit entry as text: what happened to what, by whom and when."""
    what = row.get("path") or row.get("run")
    if row.get("by"):  # a review action
        who = f"by {row['by']} at {row.get('at')} ({row.get('review')}): {row.get('note')}"
    elif row.get("action") == "run":
        who = f"as of {row.get('as_of')}, policy {(row.get('policy') or {}).get('name')}"
    else:
        codes = ", ".join(row.get("codes") or [])
        who = f"{row.get('decision') or row.get('why') or ''}" + \
            (f" ({codes})" if codes else "") + (f" in {row['run']}" if row.get("run") else "")
    return f"{row['seq']:>7}  {row['action']:<10}  {what}  {who.strip()}"
