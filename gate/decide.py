"""The decision: findings plus policy in, accepted or quarantined out (pure).

A finding quarantines when its code is fail-closed (the document could not be evaluated),
when the check that raised it chose ``quarantine`` for it, or when its policy section's
``action`` is ``quarantine`` (the default). Everything else is a warning: the document is
accepted and the finding is listed under ``warnings``.
"""

from __future__ import annotations

from collections.abc import Iterable
from dataclasses import dataclass
from typing import Any

from gate import checks
from gate.findings import CODES, Finding


def action_of(finding: Finding, policy: Any) -> str:
    """``quarantine`` or ``warn`` for one finding under ``policy``."""
    spec = CODES.get(finding.code)
    if spec is None or spec.fail_closed:
        return "quarantine"
    if finding.action is not None:
        return "quarantine" if finding.action == "quarantine" else "warn"
    section = checks.section_of(finding.check)
    settings = getattr(policy, section, None) if section else None
    return getattr(settings, "action", "quarantine")


@dataclass(frozen=True)
class Decision:
    decision: str  # accepted | quarantined
    reasons: tuple[Finding, ...]
    warnings: tuple[Finding, ...]

    def extend(self, findings: Iterable[Finding], policy: Any) -> Decision:
        """This decision with more findings (a corpus check's) taken into account, as if
        they had been decided together; the findings already decided are not redone."""
        more = decide(findings, policy)
        reasons = self.reasons + more.reasons
        return Decision("quarantined" if reasons else "accepted", reasons,
                        self.warnings + more.warnings)


def decide(findings: Iterable[Finding], policy: Any) -> Decision:
    reasons, warnings = [], []
    for finding in findings:
        (reasons if action_of(finding, policy) == "quarantine" else warnings).append(finding)
    return Decision("quarantined" if reasons else "accepted", tuple(reasons), tuple(warnings))


def outcome(findings: list[Finding] | None, policy: Any, enabled: bool) -> str:
    """A check's outcome for the report: off, n/a, fail, warn or pass."""
    if not enabled:
        return "off"
    if findings is None:
        return "n/a"
    actions = {action_of(f, policy) for f in findings}
    if "quarantine" in actions:
        return "fail"
    return "warn" if actions else "pass"
