"""What extraction produces.

:class:`Extraction` lives only inside the worker process: besides the summary it holds the
raw bytes and the parsed objects (lxml tree, PDF reader) that measurements such as the
injection screen read. Only :class:`Extracted`, a small picklable summary, and the text
travel back to the parent process.
"""

from __future__ import annotations

import copy
from collections.abc import Sequence
from dataclasses import dataclass, field, fields
from typing import Any

from gate.tokens import block_hash

# Extraction problems. Each one becomes a ``format`` finding in the parent.
PROBLEMS = {
    "empty-file", "unsupported", "undecodable", "broken", "encrypted", "too-large",
    "too-many-pages", "too-deep", "timeout", "crashed", "memory", "unreadable",
    "not-regular", "empty-text", "bomb",
}


@dataclass(frozen=True)
class DateClaim:
    """A date a document or its manifest states, and where it was found."""

    role: str  # published | modified
    source: str  # e.g. "manifest published_at", "meta article:published_time", "PDF /ModDate"
    text: str


@dataclass(frozen=True)
class Extracted:
    """The picklable summary of one extraction (no text; the text travels separately)."""

    type: str | None  # pdf | html | text, or None when the type is not supported
    problem: str | None = None  # one of PROBLEMS, or None when extraction succeeded
    problem_detail: str = ""
    sniffed: str = ""  # what sniffing said, e.g. "a PNG image"
    text_chars: int = 0
    title: str | None = None
    canonical_url: str | None = None
    declared_lang: str | None = None
    encoding: str | None = None
    declared_charset: str | None = None
    charset_mismatch: bool = False
    pages: int | None = None
    encrypted: bool = False
    nesting_depth: int | None = None
    dates: tuple[DateClaim, ...] = ()
    metadata: dict[str, str] = field(default_factory=dict)
    template: dict[str, Any] = field(default_factory=dict)  # site-template removal done

    @property
    def ok(self) -> bool:
        return self.problem is None

    def to_json(self) -> dict[str, Any]:
        # what dataclasses.asdict gives, field by field: it copies deeply by recursion,
        # which cost more than the rest of a tiny document's summary
        out = {name: getattr(self, name) for name in _EXTRACTED_FIELDS}
        out["dates"] = [{"role": d.role, "source": d.source, "text": d.text}
                        for d in self.dates]
        out["metadata"] = dict(self.metadata)
        out["template"] = copy.deepcopy(self.template) if self.template else {}
        return {k: v for k, v in out.items() if v not in (None, "", {}, [], False)
                or k in ("type", "text_chars")}

    @classmethod
    def from_json(cls, data: dict[str, Any]) -> Extracted:
        data = dict(data)
        data["dates"] = tuple(DateClaim(**d) for d in data.get("dates", ()))
        return cls(**data)


_EXTRACTED_FIELDS = tuple(f.name for f in fields(Extracted))


@dataclass(frozen=True)
class Block:
    """One block of a document (a paragraph, heading, list item, table cell, link list or
    line) with the hash of its words (:func:`gate.tokens.block_hash`)."""

    text: str
    hash: int
    main: bool = True  # in the main text the extractor chose (HTML: trafilatura's)
    links: float = 0.0  # share of its characters inside links (HTML)
    kind: str = "text"  # heading | item (list item, term) | cell (table) | text
    # share of its characters at its start inside a link to another page (HTML; a link
    # with a #fragment goes to a place in a page): a teaser's linked title, "Title -
    # snippet" in one list item
    lead: float = 0.0
    nav: bool = False  # navigation by its structure (a run of teasers), never the text
    title: bool = False  # the page's title (its one ``<h1>``, HTML)
    # the element holding it and the block element around that, by tag and class
    # ("article>p", "article>div.promo", "div.ad>p"; HTML, else ""): a block marked up
    # unlike the paragraphs around it was put there by the template
    markup: str = ""


@dataclass
class Extraction:
    """Worker-side result: the summary, the text and the raw material measurements use."""

    summary: Extracted
    text: str = ""
    raw: bytes = b""
    decoded: str | None = None  # the decoded markup or text, for HTML and text documents
    tree: Any = None  # lxml root element, for HTML
    reader: Any = None  # pypdf.PdfReader, for PDF
    extras: dict[str, Any] = field(default_factory=dict)  # e.g. PDF annotations, XMP text
    # the whole page in blocks, in document order (HTML: every block of the body, the
    # template included; other formats: the text's lines), for template removal
    blocks: tuple[Block, ...] = ()


class Refused(Exception):
    """Raised inside an extractor for input it will not read; ``problem`` is in PROBLEMS."""

    def __init__(self, problem: str, detail: str):
        super().__init__(detail)
        assert problem in PROBLEMS, problem
        self.problem = problem
        self.detail = detail


def failed(type_: str | None, problem: str, detail: str, sniffed: str = "",
           **more: Any) -> Extraction:
    """An extraction that did not produce usable text."""
    assert problem in PROBLEMS, problem
    return Extraction(Extracted(type=type_, problem=problem, problem_detail=detail,
                                sniffed=sniffed, **more))


def line_hashes(text: str, blocks: Sequence[Block]) -> list[int | None]:
    """The block hash of each line of ``text`` (a line that is a block's text verbatim
    takes its hash without normalising it again)."""
    known = {b.text: b.hash for b in blocks}
    return [known.get(line.strip()) or block_hash(line) for line in text.split("\n")]


def row_cells(line: str) -> list[int]:
    """The cell hashes of a table row written as ``| a | b |`` (trafilatura's tables)."""
    if not line.lstrip().startswith("|"):
        return []
    return [h for h in map(block_hash, line.strip().strip("|").split("|")) if h is not None]
