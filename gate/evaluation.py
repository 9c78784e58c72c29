"""One evaluation of a document under a policy: the same code for ``gate run`` and
``gate explain``.

:func:`extraction_of` turns a worker's result into what the checks read;
:func:`evaluate_document` picks the effective policy (the file's, with the matching allow
rule's overrides), runs every document check (a check that raises fails closed with
``<check>.internal-error``), applies reviewer releases, chooses the document's date and
makes the per-document decision. Corpus checks come after, in :mod:`gate.corpus`.
"""

from __future__ import annotations

from dataclasses import dataclass
from datetime import datetime
from typing import Any

from gate import checks
from gate.checks import freshness as freshness_check
from gate.checks import source as source_check
from gate.checks.base import Document, DocumentCheck, RunContext
from gate.decide import Decision, decide, outcome
from gate.extract.model import Extracted
from gate.extract.pool import Failure
from gate.extract.sniff import sniff
from gate.findings import CODES, Finding, internal_error
from gate.policy import LoadedPolicy

Releases = dict[tuple[str, str], dict[str, str]]  # (sha256, code) -> note, by, at


def extraction_of(result: Any, data: bytes | None
                  ) -> tuple[Extracted, dict[str, Any], dict[str, str]]:
    """(extraction summary, measures, measure errors) from a worker's result: its dict,
    or the pool's :class:`Failure` when the worker timed out, ran out of memory or died."""
    if isinstance(result, Failure):
        kind = {"timeout": "timeout", "memory": "memory"}.get(result.kind, "crashed")
        detail = result.detail if result.kind != "error" else f"internal error: {result.detail}"
        head = sniff(data[:2048]) if data else None
        return (Extracted(type=head.type if head and head.type in ("pdf", "html", "text")
                          else None, problem=kind, problem_detail=detail), {}, {})
    return Extracted.from_json(result["extracted"]), result["measures"], \
        result["measure_errors"]


@dataclass(frozen=True)
class CheckResult:
    """One document check's result: ``findings`` None means it could not look (n/a)."""

    check: DocumentCheck
    enabled: bool
    findings: list[Finding] | None
    outcome: str  # off | n/a | pass | warn | fail


@dataclass(frozen=True)
class Evaluation:
    """Everything the document checks found and decided about one document."""

    policy: Any  # the effective policy: the file's, with an allow rule's overrides
    rule: int | None  # the allow rule whose overrides apply, if any
    match: source_check.SourceMatch | None  # None: the policy has no sources section
    dated: tuple[Any, Any] | None  # (DateClaim, Stamp) freshness uses; None: undated
    results: tuple[CheckResult, ...]
    findings: tuple[Finding, ...]  # every check's, after reviewer releases
    decision: Decision  # by the document checks alone (corpus checks come later)

    @property
    def marks(self) -> dict[str, str]:
        return {result.check.id: result.outcome for result in self.results}

    @property
    def trust(self) -> int:
        return self.match.trust if self.match is not None else source_check.UNMATCHED_TRUST

    @property
    def date(self) -> datetime | None:
        return self.dated[1].latest if self.dated is not None else None


def _run_check(check: DocumentCheck, document: Document, policy: Any, ctx: RunContext,
               measure_errors: dict[str, str]) -> CheckResult:
    enabled = check.always_on or getattr(policy, check.section or "", None) is not None
    found: list[Finding] | None
    if not enabled:
        found = None
    elif check.id in measure_errors:
        found = [internal_error(check.id, RuntimeError(measure_errors[check.id]))]
    else:
        try:
            found = check.evaluate(document, policy, ctx)
        except Exception as err:  # noqa: BLE001 - a bug in a check fails closed
            found = [internal_error(check.id, err)]
    return CheckResult(check, enabled, found, outcome(found, policy, enabled))


def evaluate_document(document: Document, loaded: LoadedPolicy, ctx: RunContext, *,
                      measure_errors: dict[str, str] | None = None,
                      releases: Releases | None = None) -> Evaluation:
    """Every document check on ``document`` under ``loaded`` (see the module docstring)."""
    base = loaded.policy
    match = source_check.match(document, base.sources) if base.sources is not None else None
    policy = loaded.for_rule(match.allowed_by) if match is not None else base
    rule = match.allowed_by if policy is not base and match is not None else None
    results = tuple(_run_check(check, document, policy, ctx, measure_errors or {})
                    for check in checks.DOCUMENT_CHECKS)
    found = [finding for result in results for finding in result.findings or []]
    apply_releases(document.sha256, found, releases or {})
    chosen = freshness_check.choose(document, ctx)
    dated = chosen if chosen is not None and not isinstance(chosen, Finding) else None
    return Evaluation(policy=policy, rule=rule, match=match, dated=dated, results=results,
                      findings=tuple(found), decision=decide(found, policy))


def apply_releases(sha256: str | None, found: list[Finding], releases: Releases) -> None:
    """Findings a reviewer released for these exact bytes become warnings (in place)."""
    if not releases:
        return
    for index, finding in enumerate(found):
        release = releases.get((sha256 or "", finding.code))
        if release is None or finding.action == "warn" or CODES[finding.code].fail_closed:
            continue
        found[index] = Finding(
            check=finding.check, code=finding.code,
            message=f"{finding.message} (released by {release['by']} on "
                    f"{release['at'][:10]}: {release['note']})",
            details={**finding.details, "released": release}, action="warn")
