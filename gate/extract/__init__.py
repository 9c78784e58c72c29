"""Extraction: bytes in, text and metadata out, by content type.

:func:`extract` sniffs the bytes and dispatches to the HTML, PDF, text, office/e-book
(:mod:`.office`) or e-mail (:mod:`.mail`) extractor. It is
meant to run inside a worker process (see :mod:`gate.extract.pool`): parsers of untrusted
bytes may hang or exhaust memory, and only a process boundary can stop them.
"""

from __future__ import annotations

import re

from gate.extract.model import Block, Extracted, Extraction, failed
from gate.extract.office import TYPES as OFFICE_TYPES
from gate.extract.sniff import sniff
from gate.tokens import block_hash

__all__ = ["EXTRACT_VERSION", "TYPES", "Extracted", "Extraction", "extract"]

# Every type extraction produces, in the order the policy reference lists them.
TYPES = ("html", "pdf", "text", *OFFICE_TYPES, "email", "mbox")
# Part of the cache key: bump when an extractor's output changes for the same bytes.
EXTRACT_VERSION = 10


def extract(data: bytes, *, max_pages: int, max_nesting: int,
            main_text: str | None = None, remember: int = 0) -> Extraction:
    """Extract one document's bytes. Never raises for bad input: problems are reported.

    ``main_text``: an HTML page's or a PDF's text from an earlier extraction of the same
    bytes (trafilatura, or pypdf's text extraction, is then not run again). ``remember``:
    the document will be extracted again with its ``main_text``; an HTML page's blocks
    and metadata are kept for that in this process (a budget in bytes, see
    :mod:`gate.extract.html`)."""
    sniffed = sniff(data)
    if sniffed.type == "empty":
        return failed(None, "empty-file", sniffed.detail)
    if sniffed.type == "pdf":
        from gate.extract.pdf import extract_pdf
        result = extract_pdf(data, max_pages, main_text)
    elif sniffed.type == "html":
        from gate.extract.html import extract_html
        result = extract_html(data, sniffed.encoding, max_nesting, main_text, remember)
    elif sniffed.type == "text":
        from gate.extract.text import extract_text
        result = extract_text(data, sniffed.encoding)
    elif sniffed.type in OFFICE_TYPES:
        from gate.extract.office import extract_office
        result = extract_office(data, sniffed.type, max_pages)
    elif sniffed.type in ("email", "mbox"):
        from gate.extract.mail import extract_mail
        result = extract_mail(data, sniffed.type)
    elif sniffed.type == "encrypted-office":
        return failed(None, "encrypted", "the file is a password-protected office document "
                                         "(an OLE2 container holding an encrypted package), so "
                                         "its text cannot be read", encrypted=True)
    else:
        return failed(None, "unsupported", f"the content is {sniffed.detail}; gate reads "
                                           "PDF, HTML, plain text, office documents (DOCX, "
                                           "PPTX, XLSX, ODT), EPUB and e-mail",
                      sniffed=sniffed.detail)
    summary = result.summary
    if summary.ok and not result.text.strip():
        return failed(summary.type, "empty-text", "extraction found no text in the document",
                      **{k: getattr(summary, k) for k in ("pages", "encrypted", "title",
                                                          "encoding", "nesting_depth")})
    if summary.ok and not result.blocks:
        result.blocks = line_blocks(result.text)
    return result


# a list item's line: a bullet or a number, then its text ("- Keep daily records",
# "• Keep daily records", "2. Keep daily records")
_ITEM = re.compile(r"^\s*(?:[-*+\u2022\u2023\u25e6\u2013]|\d{1,2}[.)])\s+\S")


def line_blocks(text: str) -> tuple[Block, ...]:
    """A text's lines as blocks (PDF, plain text, Markdown: a line is the unit a running
    header, a footer or a repeated notice occupies); a line that opens with a bullet or
    a number is a list item, as an HTML page's ``<li>`` is."""
    blocks = []
    for line in text.split("\n"):
        digest = block_hash(line)
        if digest is not None:
            blocks.append(Block(text=line.strip(), hash=digest,
                                kind="item" if _ITEM.match(line) else "text"))
    return tuple(blocks)
