"""The command line: a thin layer over the library (:mod:`gate.pipeline`,
:mod:`gate.review`, :mod:`gate.explain`, :mod:`gate.policy`).

Every command turns the library's errors into one paragraph on stderr and an exit code:
0 the command completed (whatever was quarantined), 2 it could not run (bad policy,
missing inbox, unreadable manifest, busy or unusable output folder), 3 the run completed
but exceeded a --max-quarantine-rate or --max-code-rate limit, 4 the run completed but a
check failed on a document (``<check>.internal-error``: a bug in gate; the document is
quarantined), 130 interrupted (re-run the same command to resume), 70 an internal error in
gate itself.

``common`` holds the shared plumbing, ``run`` the run commands, ``ops`` the operator's.
"""

from __future__ import annotations

import os
import sys

os.environ.setdefault("OPENBLAS_NUM_THREADS", "1")  # numpy is used single-threaded here

import typer

from gate.cli import ops, run
from gate.cli.common import EXIT_INTERRUPTED, err_console

app = typer.Typer(add_completion=False, pretty_exceptions_enable=False, no_args_is_help=True,
                  help="gate: check documents against a policy before they reach a "
                       "retrieval index.")
app.command("run")(run.run_command)
app.add_typer(run.policy_app, name="policy")
app.add_typer(run.report_app, name="report")
app.command("codes")(run.codes_command)
app.command("version")(run.version_command)
app.add_typer(ops.review_app, name="review")
app.add_typer(ops.audit_app, name="audit")
app.command("explain")(ops.explain_command)


def main() -> None:
    try:
        app()
    except KeyboardInterrupt:
        err_console.print("error: interrupted.", markup=False)
        sys.exit(EXIT_INTERRUPTED)
