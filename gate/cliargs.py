"""Strict validation of command-line values that name a check, a finding code, a status,
a run or a date.

A typo in such a value must not quietly switch a guard off (``--max-code-rate
injektion=0.1`` would otherwise never trip) or make a filter match nothing. Each function
returns the value in its canonical form or raises :class:`~gate.errors.UsageError` naming
the option, listing the valid values and suggesting the closest one.
"""

from __future__ import annotations

import difflib
import re

from gate.errors import UsageError


def _known() -> tuple[list[str], list[str]]:
    from gate.checks import check_ids
    from gate.findings import CODES
    return list(check_ids()), sorted(CODES)


def _suggest(value: str, candidates: list[str]) -> str:
    close = difflib.get_close_matches(value, candidates, n=1, cutoff=0.6)
    return f" (did you mean {close[0]!r}?)" if close else ""


def check_id(value: str, option: str) -> str:
    """A check id such as ``injection``."""
    checks, _codes = _known()
    if value in checks:
        return value
    raise UsageError(f"{option} {value!r} is not a check{_suggest(value, checks)}. The "
                     f"checks are: {', '.join(checks)}.")


def check_or_code(value: str, option: str) -> str:
    """A check id (standing for all its codes) or a finding code such as
    ``injection.instructions``."""
    checks, codes = _known()
    if value in checks or value in codes:
        return value
    prefix = value.split(".", 1)[0]
    if prefix in checks:
        own = [code for code in codes if code.startswith(prefix + ".")]
        raise UsageError(f"{option} {value!r} is not a finding code"
                         f"{_suggest(value, own)}. The codes of the {prefix} check are: "
                         f"{', '.join(own)} (or give {prefix!r} for all of them).")
    raise UsageError(f"{option} {value!r} is neither a check nor a finding code"
                     f"{_suggest(value, checks + codes)}. The checks are: "
                     f"{', '.join(checks)}; `gate codes` lists the {len(codes)} finding "
                     "codes.")


def choice(value: str, option: str, allowed: tuple[str, ...]) -> str:
    """One of a fixed set of words (a status, for example)."""
    if value in allowed:
        return value
    raise UsageError(f"{option} {value!r} is not one of {', '.join(allowed)}"
                     f"{_suggest(value, list(allowed))}.")


_RUN = re.compile(r"(?:run|review)-\d{4,}\Z")


def run_id(value: str, option: str) -> str:
    """A run or review id such as ``run-0003``."""
    if _RUN.match(value):
        return value
    raise UsageError(f"{option} {value!r} is not a run id: ids look like run-0003 or "
                     "review-0004 (report.json's run.id; `gate audit show` lists them).")


def day_or_time(value: str, option: str) -> str:
    """A calendar date ``YYYY-MM-DD``, or an ISO 8601 date and time given in its UTC
    ``YYYY-MM-DDTHH:MM:SSZ`` form (the form runs are recorded in)."""
    from datetime import date

    from gate import dates
    if len(value) == 10:
        try:
            return date.fromisoformat(value).isoformat()
        except ValueError:
            pass
    else:
        try:
            return dates.parse_as_of(value).isoformat().replace("+00:00", "Z")
        except dates.DateProblem:
            pass
    raise UsageError(f"{option} {value!r} is not a date: give YYYY-MM-DD (for example "
                     "2026-12-01) or an ISO 8601 date and time with its offset.")
