"""The run commands: ``gate run``, ``gate policy check|schema``, ``gate report html``,
``gate codes`` and ``gate version``."""

from __future__ import annotations

import os
import sys
from pathlib import Path
from typing import Annotated, Optional

import typer

from gate import __version__, cliargs
from gate.cli.common import (EXIT_CHECK_BUG, EXIT_LIMITS, BarReporter, err_console, guard,
                             out_console, shown)
from gate.errors import UsageError

policy_app = typer.Typer(add_completion=False, no_args_is_help=True,
                         help="Validate policy files and print their schema.")
report_app = typer.Typer(add_completion=False, no_args_is_help=True,
                         help="Render the report of a completed run for people.")


def _print_summary(result, report: dict) -> None:
    s = result.summary
    run = report.get("run", {})
    out_console.print(f"{result.run_id}: {s['documents']} documents, {s['accepted']} "
                      f"accepted, {s['quarantined']} quarantined (as of {run.get('as_of')}"
                      f"{', resumed' if result.resumed else ''})", markup=False)
    if s["quarantined_by_code"]:
        out_console.print("quarantined by reason (a document can have several):",
                          markup=False)
        for code, count in sorted(s["quarantined_by_code"].items(), key=lambda kv: (-kv[1],
                                                                                    kv[0])):
            out_console.print(f"  {code:<28} {count:>6}", markup=False)
    if s["warnings_by_code"]:
        out_console.print("warnings (documents accepted):", markup=False)
        for code, count in sorted(s["warnings_by_code"].items()):
            out_console.print(f"  {code:<28} {count:>6}", markup=False)
    if s["changes"]:
        changes = ", ".join(f"{k} {v}" for k, v in s["changes"].items())
        out_console.print(f"changes for the index: {changes}", markup=False)
    rate = s["documents"] / result.seconds if result.seconds > 0 else 0.0
    out_console.print(f"report: {shown(str(result.report_path))}  ({result.seconds:.1f} s, "
                      f"{rate:.1f} documents/s)", markup=False)


def run_command(
    inbox: Annotated[Path, typer.Argument(help="Folder of incoming documents (walked "
                                               "recursively; never modified).")],
    policy: Annotated[Path, typer.Option("--policy", help="Policy file (YAML).")],
    out: Annotated[Path, typer.Option("--out", help="Output folder: accepted/, quarantine/, "
                                                    "report.json, changes.jsonl, state/.")],
    manifest: Annotated[Optional[Path], typer.Option(  # noqa: UP045
        "--manifest", help="Manifest (JSON lines); default INBOX/manifest.jsonl.")] = None,
    as_of: Annotated[Optional[str], typer.Option(  # noqa: UP045
        "--as-of", help="Clock for freshness, ISO 8601 (default: now, UTC).")] = None,
    workers: Annotated[Optional[int], typer.Option(  # noqa: UP045
        "--workers", min=1, max=256, help="Worker processes (default: the number of "
                                          "cores).")] = None,
    incremental: Annotated[bool, typer.Option(
        "--incremental", help="The inbox holds only new or changed documents: do not "
                              "remove earlier documents that are missing from it.")] = False,
    quiet: Annotated[bool, typer.Option("--quiet", "-q", help="No progress bar.")] = False,
    cluster: Annotated[Optional[str], typer.Option(  # noqa: UP045
        "--cluster", help="Run extraction on a Dask cluster: the scheduler address, e.g. "
                          "tcp://10.0.0.5:8786 (decisions stay in this process).")] = None,
    index: Annotated[Optional[str], typer.Option(  # noqa: UP045
        "--index", help="Keep the near-duplicate index in Redis (redis://HOST:PORT/DB), "
                        "shared with other output folders using the same --index-name.")
    ] = None,
    index_name: Annotated[str, typer.Option(
        "--index-name", help="Name of the shared index in Redis.")] = "default",
    max_quarantine_rate: Annotated[Optional[float], typer.Option(  # noqa: UP045
        "--max-quarantine-rate", min=0.0, max=1.0,
        help="Exit 3 when more than this share of documents is quarantined (the run still "
             "completes), so a re-index job can stop on a poisoned batch.")] = None,
    allow_removals: Annotated[Optional[int], typer.Option(  # noqa: UP045
        "--allow-removals", min=0, help="Confirm that a full run removes exactly this many "
        "accepted documents (needed when it would remove more than half of them, or the "
        "inbox is empty; otherwise the run stops with exit 5 and changes nothing).")] = None,
    max_code_rate: Annotated[Optional[list[str]], typer.Option(  # noqa: UP045
        "--max-code-rate", help="CODE=RATE: exit 3 when more than RATE of documents are "
                                "quarantined for CODE (a code, or a check id such as "
                                "injection). Repeatable.")] = None,
) -> None:
    """Check every document of INBOX and route it to accepted/ or quarantine/.

    Exit status: 0 done; 2 could not run; 3 over a --max-quarantine-rate or
    --max-code-rate limit; 4 a check failed on a document (a bug in gate; the document is
    quarantined, the run completed); 5 the removal brake held a full run that would remove
    more than half of the accepted corpus, or ran over an empty inbox (nothing changed;
    confirm with --allow-removals N); 130 interrupted; 70 internal error.
    """
    reporter = BarReporter(enabled=not quiet and err_console.is_terminal)

    def body():
        from gate import dates
        from gate.pipeline import RunOptions
        from gate.pipeline import run as run_pipeline
        from gate.policy import load_policy

        when = None
        if as_of is not None:
            try:
                when = dates.parse_as_of(as_of)
            except dates.DateProblem as err:
                raise UsageError(str(err)) from None
        limits = _code_limits(max_code_rate or [])
        if index is not None:
            from gate.index import connection_settings
            connection_settings(index)  # a malformed --index is an error even unused
        loaded = load_policy(policy)
        options = RunOptions(inbox=inbox, policy=loaded, out=out, manifest=manifest,
                             as_of=when, workers=workers or os.cpu_count() or 1,
                             incremental=incremental, cluster=cluster, index=index,
                             index_name=index_name, allow_removals=allow_removals)
        try:
            result = run_pipeline(options, reporter)
        finally:
            reporter.close()
        import json
        report = json.loads(result.report_path.read_text(encoding="utf-8"))
        _print_summary(result, report)
        if os.environ.get("GATE_TIMINGS"):  # for benchmarks/scale.py: worker seconds by stage
            err_console.print("timings: " + json.dumps(result.timings, sort_keys=True),
                              markup=False, soft_wrap=True)
        bugs = sorted(code for code in result.summary["quarantined_by_code"]
                      if code.endswith(".internal-error"))
        if bugs:
            err_console.print("error: a check failed on some documents (" + ", ".join(bugs) +
                              "): a bug in gate. The run completed and those documents are "
                              "quarantined; please report it.", markup=False, soft_wrap=True)
            raise typer.Exit(EXIT_CHECK_BUG)
        breaches = _breaches(report, max_quarantine_rate, limits)
        if breaches:
            err_console.print("error: the batch exceeds its quarantine limits: " +
                              "; ".join(breaches) + ". The run completed; review the "
                              "quarantine before re-indexing.", markup=False, soft_wrap=True)
            raise typer.Exit(EXIT_LIMITS)

    guard(body)


def _code_limits(values: list[str]) -> dict[str, float]:
    limits: dict[str, float] = {}
    for value in values:
        code, sep, rate = value.partition("=")
        try:
            number = float(rate)
        except ValueError:
            number = -1.0
        if not sep or not code or not 0.0 <= number <= 1.0:
            raise UsageError(f"--max-code-rate {value!r} must be CODE=RATE with RATE between "
                             "0 and 1 (for example injection=0.01).")
        limits[cliargs.check_or_code(code, "--max-code-rate")] = number
    return limits


def _breaches(report: dict, overall: float | None, per_code: dict[str, float]) -> list[str]:
    docs = report["documents"]
    total = len(docs) or 1
    out = []
    held = sum(d["decision"] == "quarantined" for d in docs)
    if overall is not None and held / total > overall:
        out.append(f"{held} of {len(docs)} documents quarantined ({held / total:.1%}, limit "
                   f"{overall:.1%})")
    for code, limit in sorted(per_code.items()):
        count = sum(any(r["code"] == code or r["code"].startswith(code + ".")
                        for r in d["reasons"]) for d in docs)
        if count / total > limit:
            out.append(f"{count} documents quarantined for {code} ({count / total:.1%}, limit "
                       f"{limit:.1%})")
    return out


@policy_app.command("check")
def policy_check(file: Annotated[Path, typer.Argument(help="Policy file to validate.")]
                 ) -> None:
    """Validate a policy file; errors name the line and the key path."""

    def body():
        from gate import checks
        from gate.policy import load_policy
        loaded = load_policy(file)
        on = [check for check in checks.all_checks() if check.always_on or
              getattr(loaded.policy, check.section or "", None) is not None]
        sections = [check.section for check in on
                    if getattr(loaded.policy, check.section or "", None) is not None]
        out_console.print(f"{shown(str(file))}: valid policy {shown(loaded.name)!r} (sections: "
                          f"{', '.join(sections) or 'none'}; checks on: "
                          f"{', '.join(check.id for check in on)})", markup=False)

    guard(body)


@policy_app.command("schema")
def policy_schema() -> None:
    """Print the JSON Schema of policy files (for editor completion)."""

    def body():
        from gate.policy import schema_text
        sys.stdout.write(schema_text())

    guard(body)


@report_app.command("html")
def report_html(
    directory: Annotated[Path, typer.Argument(help="Output folder of a completed run "
                                                   "(the one holding report.json).")],
    output: Annotated[Optional[Path], typer.Option(  # noqa: UP045
        "--output", "-o", help="HTML file to write (default: DIR/report.html).")] = None,
) -> None:
    """Write DIR/report.json as one self-contained HTML page (no scripts, loads nothing)."""

    def body():
        import json

        from gate.placement import write_atomic
        from gate.errors import OutputError
        from gate.htmlreport import render

        source = directory / "report.json"
        target = output if output is not None else directory / "report.html"
        hint = "DIR must be the output folder of a completed run (gate run ... --out DIR)."
        try:
            report = json.loads(source.read_bytes().decode("utf-8"))
        except FileNotFoundError:
            raise OutputError(f"there is no report {source}: {hint}") from None
        except OSError as err:
            raise OutputError(f"cannot read the report {source} "
                              f"({err.strerror or err}).") from None
        except (ValueError, RecursionError) as err:  # JSON and UTF-8 errors are ValueErrors
            raise OutputError(f"the report {source} is not valid JSON ({err}); it may have "
                              "been edited, or read before gate run exited with status "
                              "0.") from None
        if not isinstance(report, dict) or not isinstance(report.get("documents"), list):
            raise OutputError(f"{source} is not a gate report (expected a JSON object with "
                              f"a \"documents\" list). {hint}")
        if target.resolve() == source.resolve():
            raise OutputError(f"--output {target} would overwrite the report it is drawn "
                              "from; choose another file.")
        try:
            write_atomic(target, render(report).encode("utf-8"))
        except OSError as err:
            raise OutputError(f"cannot write {target} ({err.strerror or err}); check that "
                              "its folder exists and is writable.") from None
        out_console.print(f"wrote {shown(str(target))}", markup=False)

    guard(body)


def codes_command(markdown: Annotated[bool, typer.Option(
        "--markdown", help="Print the table as Markdown (docs/codes.md).")] = False) -> None:
    """List every finding code with its check and meaning."""

    def body():
        from gate.codes import markdown_table, text_table
        sys.stdout.write(markdown_table() if markdown else text_table())

    guard(body)


def version_command() -> None:
    """Print gate's version."""
    out_console.print(f"gate {__version__}", markup=False)
