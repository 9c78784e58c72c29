"""Extraction: bytes in, text and metadata out, by content type.

:func:`extract` sniffs the bytes and dispatches to the HTML, PDF or text extractor. It is
meant to run inside a worker process (see :mod:`gate.extract.pool`): parsers of untrusted
bytes may hang or exhaust memory, and only a process boundary can stop them.
"""

from __future__ import annotations

from gate.extract.model import Extracted, Extraction, failed
from gate.extract.sniff import sniff

__all__ = ["Extracted", "Extraction", "extract"]


def extract(data: bytes, *, max_pages: int, max_nesting: int) -> Extraction:
    """Extract one document's bytes. Never raises for bad input: problems are reported."""
    sniffed = sniff(data)
    if sniffed.type == "empty":
        return failed(None, "empty-file", sniffed.detail)
    if sniffed.type == "pdf":
        from gate.extract.pdf import extract_pdf
        result = extract_pdf(data, max_pages)
    elif sniffed.type == "html":
        from gate.extract.html import extract_html
        result = extract_html(data, sniffed.encoding, max_nesting)
    elif sniffed.type == "text":
        from gate.extract.text import extract_text
        result = extract_text(data, sniffed.encoding)
    else:
        return failed(None, "unsupported", f"the content is {sniffed.detail}; gate reads "
                                           "PDF, HTML and plain text", sniffed=sniffed.detail)
    summary = result.summary
    if summary.ok and not result.text.strip():
        return failed(summary.type, "empty-text", "extraction found no text in the document",
                      **{k: getattr(summary, k) for k in ("pages", "encrypted", "title",
                                                          "encoding", "nesting_depth")})
    return result
