"""The exception family of the library; the CLI turns each into one paragraph."""

from __future__ import annotations


class GateError(Exception):
    """Base of every error the gate reports to the user instead of a traceback.

    ``str(err)`` is a complete, one-paragraph message: what is wrong, where (file, line,
    key path) and how to fix it. ``exit_code`` is the command's exit status for it.
    """

    exit_code = 2


class PolicyError(GateError):
    """A policy file could not be read or is invalid."""

    def __init__(self, path: str, problems: list[str]):
        self.path = path
        self.problems = problems
        joined = "; ".join(problems)
        super().__init__(f"policy {path} is invalid: {joined}")


class ManifestError(GateError):
    """The manifest could not be read or a line of it is malformed."""


class InboxError(GateError):
    """The inbox is missing or cannot be walked."""


class OutputError(GateError):
    """The output folder cannot be used (not writable, inside the inbox, disk full...)."""


class StateError(GateError):
    """The stored corpus state is corrupted, foreign or from a newer version of gate."""


class LockError(GateError):
    """Another run holds the output folder."""


class UsageError(GateError):
    """A command-line value is malformed (for example --as-of)."""
