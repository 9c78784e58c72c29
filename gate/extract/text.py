"""Plain-text and Markdown documents: charset detection and text cleanup."""

from __future__ import annotations

import re

import charset_normalizer

from gate.extract.model import Extracted, Extraction, failed
from gate.extract.sniff import BOMS

# C0 controls other than tab, line feed and carriage return, plus DEL. They carry no
# text and confuse downstream tokenisers; NUL in particular truncates C strings.
_CONTROLS = re.compile(r"[\x00-\x08\x0b\x0c\x0e-\x1f\x7f]")
_NEWLINES = re.compile(r"\r\n?|\u2028|\u2029|\x85")


def clean_text(text: str) -> str:
    """Normalise line ends to ``\\n``, drop C0 controls, trim trailing space per line.

    Invisible format characters (zero-width, bidi controls, tag characters) are kept on
    purpose: they can be legitimate (Persian ZWNJ, emoji sequences) and the injection
    screen needs to see them.
    """
    text = _NEWLINES.sub("\n", text)
    text = _CONTROLS.sub("", text)
    lines = [line.rstrip(" \t") for line in text.split("\n")]
    return "\n".join(lines).strip("\n")


def decode(data: bytes, encoding: str | None = None) -> tuple[str, str] | None:
    """Decode bytes to text: a known encoding, else strict UTF-8, else detection.

    Returns ``(text, encoding)`` or None when no encoding fits.
    """
    if encoding is not None:
        for mark, name in BOMS:
            if name == encoding and data.startswith(mark):
                data = data[len(mark):]
                break
        try:
            return data.decode(encoding), encoding
        except UnicodeDecodeError:
            return None
    try:
        return data.decode("utf-8"), "utf-8"
    except UnicodeDecodeError:
        pass
    matches = list(charset_normalizer.from_bytes(data))
    if not matches:
        return None
    # charset detection is unreliable on short texts; among the least garbled candidates,
    # prefer windows-1252, which is what browsers fall back to for undeclared pages
    # (WHATWG HTML standard, "determining the character encoding", default for most locales).
    least = min(m.chaos for m in matches)
    calm = [m for m in matches if m.chaos == least]
    best = next((m for m in calm if m.encoding == "cp1252"), calm[0])
    return str(best), best.encoding


def extract_text(data: bytes, encoding: str | None) -> Extraction:
    """Extract a plain-text (or Markdown) document."""
    decoded = decode(data, encoding)
    if decoded is None:
        return failed("text", "undecodable",
                      "the text is in no character encoding that could be detected",
                      encoding=encoding)
    text, used = decoded
    cleaned = clean_text(text)
    summary = Extracted(type="text", encoding=used, text_chars=len(cleaned))
    return Extraction(summary=summary, text=cleaned, raw=data, decoded=text)
