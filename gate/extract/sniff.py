"""Content sniffing: what a file is, from its bytes, not from its name.

The rules follow the WHATWG MIME Sniffing Standard (section 7.1, "identifying a resource
with an unknown MIME type"): leading white space is skipped, the HTML patterns are matched
case-insensitively and must be followed by a space or ``>``, ``%PDF-`` marks a PDF, and a
"binary data byte" in the header means the content is not text. Two additions: a PDF header
is also accepted anywhere in the first 1024 bytes (as PDF readers do), and UTF-16 without a
byte-order mark is recognised by its pattern of zero bytes, so it is decoded rather than
rejected as binary.
"""

from __future__ import annotations

from dataclasses import dataclass

HEADER = 1445  # WHATWG: the "resource header" is at most 1445 bytes

# WHATWG MIME Sniffing section 7.1, the HTML rows of the table, without the leading "<".
_HTML_PATTERNS = (b"!DOCTYPE HTML", b"HTML", b"HEAD", b"SCRIPT", b"IFRAME", b"H1", b"DIV",
                  b"FONT", b"TABLE", b"A", b"STYLE", b"TITLE", b"B", b"BODY", b"BR", b"P",
                  b"!--")
_WHITESPACE = b"\t\n\x0c\r "
# WHATWG MIME Sniffing: a binary data byte is 0x00-0x08, 0x0B, 0x0E-0x1A or 0x1C-0x1F.
_BINARY = frozenset([*range(0x00, 0x09), 0x0B, *range(0x0E, 0x1B), *range(0x1C, 0x20)])
_BINARY_BYTES = bytes(sorted(_BINARY))  # for bytes.translate: one C pass over the header

# Signatures of common non-document formats, so the reason can say what the file is.
_MAGIC = (
    (b"PK\x03\x04", "a ZIP archive (for example an office document)"),
    (b"\x1f\x8b", "gzip-compressed data"),
    (b"\x89PNG\r\n\x1a\n", "a PNG image"),
    (b"\xff\xd8\xff", "a JPEG image"),
    (b"GIF87a", "a GIF image"),
    (b"GIF89a", "a GIF image"),
    (b"\x7fELF", "an ELF executable"),
    (b"MZ", "a Windows executable"),
    (b"\xd0\xcf\x11\xe0\xa1\xb1\x1a\xe1", "an OLE2 file (for example a legacy office document)"),
    (b"{\\rtf", "an RTF document"),
    (b"7z\xbc\xaf\x27\x1c", "a 7-Zip archive"),
    (b"Rar!\x1a\x07", "a RAR archive"),
    (b"BZh", "bzip2-compressed data"),
    (b"\xfd7zXZ\x00", "xz-compressed data"),
    (b"%!PS", "a PostScript file"),
)

BOMS = (
    (b"\xef\xbb\xbf", "utf-8"),
    (b"\xff\xfe\x00\x00", "utf-32-le"),
    (b"\x00\x00\xfe\xff", "utf-32-be"),
    (b"\xff\xfe", "utf-16-le"),
    (b"\xfe\xff", "utf-16-be"),
)


@dataclass(frozen=True)
class Sniffed:
    """The result of sniffing: ``type`` is pdf, html, text, xml, binary or empty, or one of
    the office, e-book and mail types (docx, pptx, xlsx, odt, epub, email, mbox)."""

    type: str
    detail: str = ""
    encoding: str | None = None  # from a BOM or the UTF-16 pattern


def _bom(data: bytes) -> tuple[str | None, int]:
    for mark, name in BOMS:
        if data.startswith(mark):
            return name, len(mark)
    return None, 0


def _utf16_without_bom(head: bytes) -> str | None:
    """Guess UTF-16 from zero bytes in every other position (mostly-Latin text)."""
    if len(head) < 8:
        return None
    head = head[: len(head) - len(head) % 2]
    even, odd = head[0::2], head[1::2]
    zeros_even, zeros_odd = even.count(0) / len(even), odd.count(0) / len(odd)
    if zeros_odd > 0.6 and zeros_even < 0.1:
        return "utf-16-le"
    if zeros_even > 0.6 and zeros_odd < 0.1:
        return "utf-16-be"
    return None


def _looks_html(text_head: bytes) -> bool:
    head = text_head.lstrip(_WHITESPACE)
    if not head.startswith(b"<"):
        return False
    upper = head[1:64].upper()
    for pattern in _HTML_PATTERNS:
        if upper.startswith(pattern):
            after = upper[len(pattern):len(pattern) + 1]
            if pattern == b"!--" or after in (b" ", b">"):
                return True
    return False


def sniff(data: bytes) -> Sniffed:
    """Classify ``data`` (the whole file or at least its first 1445 bytes)."""
    if not data:
        return Sniffed("empty", "the file is empty (0 bytes)")
    if b"%PDF-" in data[:1024]:
        return Sniffed("pdf")
    encoding, skip = _bom(data)
    if encoding is None:
        encoding = _utf16_without_bom(data[:HEADER])
    if encoding is not None:
        try:
            head_text = data[skip:skip + 1024].decode(encoding, errors="ignore")
        except LookupError:  # pragma: no cover - the codecs above always exist
            head_text = ""
        head = head_text.encode("utf-8", errors="ignore")
        if _looks_html(head):
            return Sniffed("html", encoding=encoding)
        if head.lstrip(_WHITESPACE).startswith(b"<?xml"):
            return _xml(head, encoding)
        return Sniffed("text", encoding=encoding)
    head = data[:HEADER]
    container = _container(data)
    if container is not None:
        return container
    for magic, name in _MAGIC:
        if head.startswith(magic):
            return Sniffed("binary", name)
    if len(head.translate(None, _BINARY_BYTES)) != len(head):  # a byte of _BINARY in it
        return Sniffed("binary", "binary data (control bytes in the first "
                                 f"{min(len(data), HEADER)} bytes)")
    if _looks_html(head):
        return Sniffed("html")
    if head.lstrip(_WHITESPACE).startswith(b"<?xml"):
        return _xml(head, None)
    from gate.extract.mail import sniff_mail
    mail = sniff_mail(data[:65536])
    if mail is not None:
        return Sniffed(mail)
    return Sniffed("text")


def _container(data: bytes) -> Sniffed | None:
    """Office documents and e-books (ZIP), password-protected OOXML (OLE2)."""
    from gate.extract import office
    if data.startswith(b"PK\x03\x04"):
        kind = office.kind_of(data)
        return Sniffed(kind) if kind is not None else None
    if data.startswith(b"\xd0\xcf\x11\xe0\xa1\xb1\x1a\xe1") and office.ole_encrypted(data):
        return Sniffed("encrypted-office", "a password-protected office document")
    return None


def _xml(head: bytes, encoding: str | None) -> Sniffed:
    # XHTML begins with an XML declaration; any other XML is not a supported document type.
    if b"<html" in head.lower():
        return Sniffed("html", "XHTML", encoding=encoding)
    return Sniffed("xml", "an XML document that is not XHTML", encoding=encoding)


# What a file name's extension promises, for the type-mismatch finding.
EXTENSION_TYPES = {
    ".html": "html", ".htm": "html", ".xhtml": "html", ".shtml": "html",
    ".pdf": "pdf",
    ".txt": "text", ".text": "text", ".md": "text", ".markdown": "text", ".rst": "text",
    ".docx": "docx", ".pptx": "pptx", ".xlsx": "xlsx", ".odt": "odt", ".epub": "epub",
    ".eml": "email", ".mbox": "mbox",
}


def expected_type(path: str) -> str | None:
    """The document type a path's extension promises, or None for unknown extensions."""
    name = path.rsplit("/", 1)[-1]
    dot = name.rfind(".")
    if dot <= 0:
        return None
    return EXTENSION_TYPES.get(name[dot:].lower())
