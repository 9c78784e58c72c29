"""Findings: the small frozen values every check produces, and the table of their codes.

A finding names its check, a stable code and carries machine-readable ``details``; the
human message is rendered from the details by the code's template, so nothing downstream
ever parses prose. Codes are defined once, with :func:`define`, next to the check that
emits them; the table in docs/codes.md is generated from :data:`CODES` and a test keeps the
committed copy in step. A shipped code is never renamed or reused.
"""

from __future__ import annotations

from dataclasses import dataclass, field
from typing import Any


@dataclass(frozen=True)
class Code:
    """One kind of finding.

    ``fail_closed`` codes always quarantine: a policy ``action: warn`` cannot soften them,
    because they mean the document could not be evaluated at all.
    """

    code: str
    check: str
    title: str
    template: str
    fail_closed: bool = False
    doc: str = ""

    def __call__(self, *, action: str | None = None, **details: Any) -> Finding:
        """Build a finding of this code; the message is rendered from ``details``.

        ``action`` overrides the section's action for this one finding (a policy key such
        as ``freshness.undated: warn`` chooses it); fail-closed codes ignore it.
        """
        try:
            message = self.template.format(**details)
        except (KeyError, IndexError) as err:  # a bug in the check, not in the document
            raise RuntimeError(f"finding {self.code}: template needs {err}") from err
        return Finding(check=self.check, code=self.code, message=message,
                       details=dict(details), action=None if self.fail_closed else action)


@dataclass(frozen=True)
class Finding:
    """A reason to hold (or warn about) a document."""

    check: str
    code: str
    message: str
    details: dict[str, Any] = field(default_factory=dict, compare=False, hash=False)
    action: str | None = None  # None: the policy section's action decides

    def to_json(self) -> dict[str, Any]:
        return {"check": self.check, "code": self.code, "message": self.message,
                "details": self.details}

    @classmethod
    def from_json(cls, data: dict[str, Any]) -> Finding:
        return cls(check=data["check"], code=data["code"], message=data["message"],
                   details=data.get("details", {}), action=data.get("action"))


CODES: dict[str, Code] = {}


def define(code: str, title: str, template: str, *, fail_closed: bool = False,
           doc: str = "") -> Code:
    """Register a finding code. ``code`` is ``<check>.<slug>``."""
    check, _, slug = code.partition(".")
    if not slug or code in CODES:
        raise RuntimeError(f"bad or repeated finding code {code!r}")
    spec = Code(code=code, check=check, title=title, template=template,
                fail_closed=fail_closed, doc=doc)
    CODES[code] = spec
    return spec


INTERNAL: dict[str, Code] = {}


def define_internal(check: str) -> Code:
    """Register ``<check>.internal-error``: the check itself crashed on a document (once
    per check id, however often a check with that id is declared)."""
    if check in INTERNAL:
        return INTERNAL[check]
    spec = define(f"{check}.internal-error", "the check itself failed (a bug in gate)",
                  "the {check} check failed on this document ({error}); the document is "
                  "held because it could not be evaluated; please report this as a bug",
                  fail_closed=True)
    INTERNAL[check] = spec
    return spec


def internal_error(check: str, error: BaseException) -> Finding:
    """The finding recorded when a check's own code raised on a document."""
    return INTERNAL[check](check=check, error=f"{type(error).__name__}: {error}")
