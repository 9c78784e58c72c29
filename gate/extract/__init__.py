"""Extraction: bytes in, text and metadata out, by content type.

:func:`extract` sniffs the bytes and dispatches to the HTML, PDF, text, office/e-book
(:mod:`.office`) or e-mail (:mod:`.mail`) extractor. It is
meant to run inside a worker process (see :mod:`gate.extract.pool`): parsers of untrusted
bytes may hang or exhaust memory, and only a process boundary can stop them.
"""

from __future__ import annotations

from gate.extract.model import Extracted, Extraction, failed
from gate.extract.office import TYPES as OFFICE_TYPES
from gate.extract.sniff import sniff

__all__ = ["EXTRACT_VERSION", "TYPES", "Extracted", "Extraction", "extract"]

# Every type extraction produces, in the order the policy reference lists them.
TYPES = ("html", "pdf", "text", *OFFICE_TYPES, "email", "mbox")
# Part of the cache key: bump when an extractor's output changes for the same bytes.
EXTRACT_VERSION = 4


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
    return result
