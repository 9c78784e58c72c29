"""What every check sees and what it declares.

A document check is two pure functions in one module:

* ``measure(extraction) -> value`` (optional) runs in the worker process next to the parser
  and does the expensive, policy-independent work (language detection, MinHash, injection
  signals). Its value is cached by the document's digest, so a second run does not redo it.
* ``evaluate(document, policy, run) -> findings`` runs in the parent, is cheap, and compares
  the document (with the measured values) to the policy. It returns ``None`` when it could
  not look at the document at all (for example no text was extracted), which the report
  shows as ``n/a``.

Neither function prints, touches files or reads the environment.
"""

from __future__ import annotations

from collections.abc import Callable, Mapping
from dataclasses import dataclass, field
from datetime import datetime
from typing import TYPE_CHECKING, Any

from gate.extract.model import Extracted, Extraction
from gate.findings import Finding
from gate.manifest import ManifestRecord

if TYPE_CHECKING:
    from gate.policy.model import Policy


@dataclass(frozen=True)
class Document:
    """One inbox document as the checks see it."""

    path: str
    kind: str  # from discovery: file, symlink, fifo, ...
    size: int | None
    sha256: str | None
    manifest: ManifestRecord | None
    extracted: Extracted
    measures: Mapping[str, Any] = field(default_factory=dict)
    link_target: str | None = None

    @property
    def has_text(self) -> bool:
        return self.extracted.ok and self.extracted.text_chars > 0


@dataclass(frozen=True)
class RunContext:
    """Facts about the run that checks may use: the as-of clock."""

    as_of: datetime


Evaluate = Callable[[Document, "Policy", RunContext], "list[Finding] | None"]


@dataclass(frozen=True)
class DocumentCheck:
    """A check that looks at one document at a time.

    ``section`` is the policy key holding the check's settings; leaving it out switches the
    check off unless ``always_on``. ``measure_version`` is part of the cache key; bump it
    when ``measure`` changes what it returns.
    """

    id: str
    section: str | None
    evaluate: Evaluate
    always_on: bool = False
    settings: type | None = None
    measure: Callable[..., Any] | None = None
    measure_version: int = 1
    doc: str = ""
    measure_params: bool = False  # measure(extraction, params) gets the run's work.Params


@dataclass(frozen=True)
class CorpusCheck:
    """A check that sees the whole batch and the stored corpus at once.

    ``measure`` runs per document in the worker (like a document check's); the corpus
    stage then calls the module's own ``evaluate`` with every candidate. The pipeline knows
    each corpus check explicitly (it has to assemble the corpus view), so this declaration
    is what the policy and the report read.
    """

    id: str
    section: str
    settings: type
    measure: Callable[[Extraction], Any]
    measure_version: int = 1
    doc: str = ""
