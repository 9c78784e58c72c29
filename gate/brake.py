"""The removal brake: a full run may not empty the index by mistake.

A full run treats the inbox as the whole corpus, so every accepted document missing from it
is removed. A mistyped inbox path, an unmounted share or a crawler that produced nothing
would therefore empty the index. A full run that would take more than
:data:`MAX_SHARE` of the accepted corpus out of it (documents missing from the inbox,
quarantined this time, or superseded), or that runs over an empty inbox while a corpus
exists, commits nothing and stops with :class:`RemovalBrake` (exit status 5). The operator
confirms an intended large removal by giving the expected count, ``--allow-removals N``;
the run then goes ahead only when exactly N documents would leave. ``--incremental`` runs
never remove missing documents and are not braked.
"""

from __future__ import annotations

from gate.errors import GateError

MAX_SHARE = 0.5
EXIT_STATUS = 5


class RemovalBrake(GateError):
    """The run would remove too much of the accepted corpus; nothing was committed."""

    exit_code = EXIT_STATUS


def check(*, mode: str, accepted_before: int, removing: int, inbox_documents: int,
          allowed: int | None) -> None:
    """Raise :class:`RemovalBrake` when a full run would remove more than the documented
    share of ``accepted_before`` documents (or runs over an empty inbox) and ``allowed``
    does not confirm exactly ``removing``."""
    if mode != "full" or accepted_before == 0 or removing == 0:
        return
    empty = inbox_documents == 0
    if not empty and removing <= MAX_SHARE * accepted_before:
        return
    if allowed == removing:
        return
    why = ("the inbox is empty" if empty else
           f"that is {removing / accepted_before:.0%} of them, more than the "
           f"{MAX_SHARE:.0%} a full run may remove unconfirmed")
    told = "" if allowed is None else f" (--allow-removals {allowed} was given, but the " \
        f"count is {removing})"
    raise RemovalBrake(
        f"this full run would remove {removing} of the {accepted_before} accepted documents: "
        f"{why}{told}. Nothing was changed. Check the inbox path (a mistyped path, an "
        "unmounted share or an empty crawl looks like this); use --incremental if the inbox "
        f"holds only new documents; or, if the removal is intended, re-run with "
        f"--allow-removals {removing}.")
