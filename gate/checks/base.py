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

import functools
from collections.abc import Callable, Mapping
from dataclasses import dataclass, field
from datetime import datetime
from typing import TYPE_CHECKING, Any

from gate.extract.model import Extracted, Extraction
from gate.findings import Finding, define_internal
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
    memo: dict[tuple, Any] = field(default_factory=dict, compare=False, repr=False)

    @property
    def has_text(self) -> bool:
        return self.extracted.ok and self.extracted.text_chars > 0


def once_per_document(fn: Callable[[Document, Any], Any]) -> Callable[[Document, Any], Any]:
    """``fn(document, arg)`` computed once per document and ``arg`` object: a question
    asked in several places (which source rule admits the document, which date it carries)
    gets one answer, paid for once."""

    @functools.wraps(fn)
    def once(document: Document, arg: Any) -> Any:
        key = (fn.__qualname__, id(arg))
        if key not in document.memo:
            document.memo[key] = (arg, fn(document, arg))  # holding arg keeps its id unique
        return document.memo[key][1]

    return once


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
    measure: Callable[[Extraction], Any] | None = None
    measure_version: int = 1
    doc: str = ""
    per_source: bool = True  # an allow rule's overrides may change its section

    def __post_init__(self) -> None:
        define_internal(self.id)


@dataclass(frozen=True)
class Member:
    """One document of the batch as a corpus check sees it."""

    key: str  # the document id
    path: str
    sha256: str | None
    measured: Any  # the check's own measure() value for this document
    trust: int  # the source check's trust for it (0 when unmatched)
    date: datetime | None  # the date freshness used (latest instant); None: undated
    seen: tuple[int, int]  # first-seen order: (run sequence, inbox order)
    accepted_before: bool  # accepted in an earlier run
    candidate: bool  # accepted by the document checks


@dataclass(frozen=True)
class CorpusView:
    """What a corpus check sees: the batch and the corpus accepted in earlier runs."""

    members: list[Member]  # the batch's documents the check can look at, in inbox order
    batch_ids: set[str]  # every document id of the batch (with or without text)
    stored: list[dict[str, Any]]  # corpus rows (gate.state.CORPUS_COLS)
    incremental: bool  # the batch adds to the stored corpus instead of replacing it
    index: Any = None  # a shared index (gate.index.SharedIndex), when --index is used
    text_of: Callable[[str], str | None] | None = None  # a document's text by key


@dataclass
class CorpusOutcome:
    """A corpus check's result: findings per batch document, and stored documents it
    moves to quarantine (superseded by a newer version in the batch)."""

    findings: dict[str, list[Finding]] = field(default_factory=dict)
    superseded: dict[str, Finding] = field(default_factory=dict)


@dataclass(frozen=True)
class CorpusCheck:
    """A check that sees the whole batch and the stored corpus at once.

    ``measure`` runs per document in the worker (like a document check's); the corpus
    stage then calls ``evaluate(view, settings)`` once, with every document of the batch
    that has a measured value, and the stored corpus.
    """

    id: str
    section: str
    settings: type
    measure: Callable[[Extraction], Any]
    evaluate: Callable[[CorpusView, Any], CorpusOutcome]
    measure_version: int = 1
    doc: str = ""
    per_source: bool = False  # a corpus check compares documents, not one source's
    always_on: bool = False  # a corpus check runs only when its section is present

    def __post_init__(self) -> None:
        define_internal(self.id)
