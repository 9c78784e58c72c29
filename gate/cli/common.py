"""What every command shares: the consoles, the one-paragraph error and exit codes, the
progress bar, and the one way document-controlled text reaches the terminal."""

from __future__ import annotations

import os
import time

import typer
from rich.console import Console
from rich.progress import BarColumn, MofNCompleteColumn, Progress, TextColumn, TimeElapsedColumn

from gate import redact
from gate.errors import GateError
from gate.visible import visible

EXIT_UNABLE = 2
EXIT_LIMITS = 3
EXIT_CHECK_BUG = 4
EXIT_INTERNAL = 70
EXIT_INTERRUPTED = 130

err_console = Console(stderr=True, highlight=False, soft_wrap=True)
out_console = Console(highlight=False, soft_wrap=True)


def shown(text: str) -> str:
    """A document-controlled string made safe for a terminal: control characters (an
    ESC sequence in a file name could rewrite the screen), bidi overrides, invisible
    characters and surrogates from undecodable file names become ``<U+XXXX>``."""
    return visible(text)


def say(line: str) -> None:
    """Print one line of document-controlled text on stdout."""
    out_console.print(shown(line), markup=False)


def fail(message: str, code: int = EXIT_UNABLE) -> None:
    err_console.print(f"error: {shown(redact.text(message))}", markup=False, soft_wrap=True)
    raise typer.Exit(code)


def guard(fn):
    """Run a command body, mapping every failure to one paragraph and an exit code."""
    try:
        return fn()
    except typer.Exit:
        raise
    except GateError as err:
        fail(str(err), err.exit_code)  # 2, or 5 for the removal brake (gate.brake)
    except KeyboardInterrupt:
        fail("interrupted. Nothing is lost: re-run the same command to complete the run.",
              EXIT_INTERRUPTED)
    except Exception as err:
        if os.environ.get("GATE_DEBUG"):
            raise
        fail(f"gate hit an internal error ({type(err).__name__}: {err}). This is a bug; "
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
