"""The command line: a thin layer over :mod:`gate.pipeline` and :mod:`gate.policy`.

Every command turns the library's errors into one paragraph on stderr and an exit code:
0 the command completed (whatever was quarantined), 2 it could not run (bad policy,
missing inbox, unreadable manifest, busy or unusable output folder), 3 the run completed
but exceeded a --max-quarantine-rate or --max-code-rate limit, 5 a full run would have
removed too much of the accepted corpus and changed nothing (see gate.brake), 130
interrupted (re-run the same command to resume), 70 an internal error in gate itself.
"""

from __future__ import annotations

import os
import sys
import time
from pathlib import Path
from typing import Annotated, Optional

os.environ.setdefault("OPENBLAS_NUM_THREADS", "1")  # numpy is used single-threaded here

import typer  # noqa: E402
from rich.console import Console  # noqa: E402
from rich.progress import (BarColumn, MofNCompleteColumn, Progress, TextColumn,  # noqa: E402
                           TimeElapsedColumn)

from gate import __version__, cliargs, redact  # noqa: E402
from gate.errors import GateError, UsageError  # noqa: E402

EXIT_UNABLE = 2
EXIT_LIMITS = 3
EXIT_INTERNAL = 70
EXIT_INTERRUPTED = 130

app = typer.Typer(add_completion=False, pretty_exceptions_enable=False, no_args_is_help=True,
                  help="gate: check documents against a policy before they reach a "
                       "retrieval index.")
policy_app = typer.Typer(add_completion=False, no_args_is_help=True,
                         help="Validate policy files and print their schema.")
app.add_typer(policy_app, name="policy")

err_console = Console(stderr=True, highlight=False, soft_wrap=True)
out_console = Console(highlight=False, soft_wrap=True)


_CONTROL = {c: f"\\x{c:02x}" for c in [*range(0x00, 0x20), 0x7F, *range(0x80, 0xA0)]}


def shown(text: str) -> str:
    """A document-controlled string made safe for a terminal: control characters (an
    ESC sequence in a file name could rewrite the screen) become visible escapes, and
    surrogates from undecodable file names become backslash escapes."""
    text = text.encode("utf-8", "backslashreplace").decode("utf-8")
    return text.translate(_CONTROL)


def _fail(message: str, code: int = EXIT_UNABLE) -> None:
    err_console.print(f"error: {shown(redact.text(message))}", markup=False, soft_wrap=True)
    raise typer.Exit(code)


def _guard(fn):
    """Run a command body, mapping every failure to one paragraph and an exit code."""
    try:
        return fn()
    except typer.Exit:
        raise
    except GateError as err:
        _fail(str(err), err.exit_code)
    except KeyboardInterrupt:
        _fail("interrupted. Nothing is lost: re-run the same command to complete the run.",
              EXIT_INTERRUPTED)
    except Exception as err:  # noqa: BLE001 - the last line of defence against tracebacks
        if os.environ.get("GATE_DEBUG"):
            raise
        _fail(f"gate hit an internal error ({type(err).__name__}: {err}). This is a bug; "
              "please report it with the command you ran. Set GATE_DEBUG=1 to see the "
              "traceback.", EXIT_INTERNAL)


class BarReporter:
    """Progress on stderr, drawn only when stderr is a terminal. No refresh thread: the
    worker pool forks, and a forked child must not inherit a thread's locks."""

    def __init__(self, enabled: bool):
        self.enabled = enabled
        self.progress: Progress | None = None
        self.task = None
        self.last = 0.0

    def stage(self, name: str, total: int | None) -> None:
        if not self.enabled:
            return
        if self.progress is None:
            self.progress = Progress(TextColumn("{task.description:<11}"), BarColumn(),
                                     MofNCompleteColumn(), TimeElapsedColumn(),
                                     TextColumn("{task.fields[path]}", style="dim",
                                                markup=False),
                                     console=err_console, auto_refresh=False, transient=True)
            self.progress.start()
        if self.task is not None:
            self.progress.update(self.task, visible=False)
        self.task = self.progress.add_task(name, total=total, path="")
        self.progress.refresh()

    def advance(self, path: str | None = None) -> None:
        if self.progress is None or self.task is None:
            return
        self.progress.update(self.task, advance=1, path=shown((path or "")[-50:]))
        now = time.monotonic()
        if now - self.last > 0.1:
            self.last = now
            self.progress.refresh()

    def note(self, message: str) -> None:
        err_console.print(shown(redact.text(message)), markup=False)

    def close(self) -> None:
        if self.progress is not None:
            self.progress.stop()
            self.progress = None


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


@app.command("run")
def run_command(
    inbox: Annotated[Path, typer.Argument(help="Folder of incoming documents (walked "
                                               "recursively; never modified).")],
    policy: Annotated[Path, typer.Option("--policy", help="Policy file (YAML).")],
    out: Annotated[Path, typer.Option("--out", help="Output folder: accepted/, quarantine/, "
                                                    "report.json, changes.jsonl, state/.")],
    manifest: Annotated[Optional[Path], typer.Option(  # noqa: UP007
        "--manifest", help="Manifest (JSON lines); default INBOX/manifest.jsonl.")] = None,
    as_of: Annotated[Optional[str], typer.Option(  # noqa: UP007
        "--as-of", help="Clock for freshness, ISO 8601 (default: now, UTC).")] = None,
    workers: Annotated[Optional[int], typer.Option(  # noqa: UP007
        "--workers", min=1, max=256, help="Worker processes (default: the number of "
                                          "cores).")] = None,
    incremental: Annotated[bool, typer.Option(
        "--incremental", help="The inbox holds only new or changed documents: do not "
                              "remove earlier documents that are missing from it.")] = False,
    quiet: Annotated[bool, typer.Option("--quiet", "-q", help="No progress bar.")] = False,
    cluster: Annotated[Optional[str], typer.Option(  # noqa: UP007
        "--cluster", help="Run extraction on a Dask cluster: the scheduler address, e.g. "
                          "tcp://10.0.0.5:8786 (decisions stay in this process).")] = None,
    index: Annotated[Optional[str], typer.Option(  # noqa: UP007
        "--index", help="Keep the near-duplicate index in Redis (redis://HOST:PORT/DB), "
                        "shared with other output folders using the same --index-name.")
    ] = None,
    index_name: Annotated[str, typer.Option(
        "--index-name", help="Name of the shared index in Redis.")] = "default",
    max_quarantine_rate: Annotated[Optional[float], typer.Option(  # noqa: UP007
        "--max-quarantine-rate", min=0.0, max=1.0,
        help="Exit 3 when more than this share of documents is quarantined (the run still "
             "completes), so a re-index job can stop on a poisoned batch.")] = None,
    allow_removals: Annotated[Optional[int], typer.Option(  # noqa: UP007
        "--allow-removals", min=0, help="Confirm that a full run removes exactly this many "
        "accepted documents (needed when it would remove more than half of them, or the "
        "inbox is empty; otherwise the run stops with exit 5 and changes nothing).")] = None,
    max_code_rate: Annotated[Optional[list[str]], typer.Option(  # noqa: UP007
        "--max-code-rate", help="CODE=RATE: exit 3 when more than RATE of documents are "
                                "quarantined for CODE (a code, or a check id such as "
                                "injection). Repeatable.")] = None,
) -> None:
    """Check every document of INBOX and route it to accepted/ or quarantine/."""
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
        breaches = _breaches(report, max_quarantine_rate, limits)
        if breaches:
            err_console.print("error: the batch exceeds its quarantine limits: " +
                              "; ".join(breaches) + ". The run completed; review the "
                              "quarantine before re-indexing.", markup=False, soft_wrap=True)
            raise typer.Exit(EXIT_LIMITS)

    _guard(body)


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
        from gate.policy import load_policy
        loaded = load_policy(file)
        sections = [name for name in ("sources", "integrity", "freshness", "language",
                                      "duplicates", "injection", "quality", "format")
                    if getattr(loaded.policy, name, None) is not None]
        out_console.print(f"{file}: valid policy {loaded.name!r} (checks on: "
                          f"{', '.join(sections) or 'format only'})", markup=False)

    _guard(body)


@policy_app.command("schema")
def policy_schema() -> None:
    """Print the JSON Schema of policy files (for editor completion)."""

    def body():
        from gate.policy import schema_text
        sys.stdout.write(schema_text())

    _guard(body)


report_app = typer.Typer(add_completion=False, no_args_is_help=True,
                         help="Render the report of a completed run for people.")
app.add_typer(report_app, name="report")


@report_app.command("html")
def report_html(
    directory: Annotated[Path, typer.Argument(help="Output folder of a completed run "
                                                   "(the one holding report.json).")],
    output: Annotated[Optional[Path], typer.Option(  # noqa: UP007
        "--output", "-o", help="HTML file to write (default: DIR/report.html).")] = None,
) -> None:
    """Write DIR/report.json as one self-contained HTML page (no scripts, loads nothing)."""

    def body():
        import json

        from gate.commit import write_atomic
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

    _guard(body)


@app.command("codes")
def codes_command(markdown: Annotated[bool, typer.Option(
        "--markdown", help="Print the table as Markdown (docs/codes.md).")] = False) -> None:
    """List every finding code with its check and meaning."""

    def body():
        from gate.codes import markdown_table, text_table
        sys.stdout.write(markdown_table() if markdown else text_table())

    _guard(body)


@app.command("version")
def version_command() -> None:
    """Print gate's version."""
    out_console.print(f"gate {__version__}", markup=False)


from gate.cli_ops import audit_app, explain_command, review_app  # noqa: E402

app.add_typer(review_app, name="review")
app.add_typer(audit_app, name="audit")
app.command("explain")(explain_command)


def main() -> None:
    try:
        app()
    except KeyboardInterrupt:
        err_console.print("error: interrupted.", markup=False)
        sys.exit(EXIT_INTERRUPTED)
