"""Plain-text and Markdown documents: charset detection and text cleanup."""

from __future__ import annotations

import re

import charset_normalizer

from gate.extract.model import Extracted, Extraction, failed
from gate.extract.sniff import BOMS
from gate.tokens import words

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


_FRONT_FENCE = re.compile(r"^(?:---|\+\+\+)\s*$")
_FRONT_END = re.compile(r"^(?:---|\.\.\.|\+\+\+)\s*$")
_KEY_LINE = re.compile(r"^\s*[\w][\w .-]{0,30}\s*[:=]\s*\S")  # "title: ...", "Source: ..."
_YAML_KEY = re.compile(r"^[\w][\w .-]{0,30}\s*[:=](?:\s|$)")  # "tags:" opens a list
_CONTINUED = re.compile(r"^(?:\s+\S|\s*-\s)")  # a YAML value or list item going on
_RULE = re.compile(r"^\s*([-=*_~#])\1{2,}\s*$")  # a line of one repeated mark
_MARKER = re.compile(r"^\s*[-=*~#_]{2,}\s*[^\W\d_][\w .'-]{0,40}?\s*[-=*~#_]{2,}\s*$")
FRONT_MAX_LINES = 40  # a front matter block longer than this is not one
HEADER_MAX_LINES = 8  # key lines of an export header
BANNER_MAX_WORDS = 6
LONG_BANNER_MAX_WORDS = 14  # "<organisation's name> - plain text export", when the text
# has a title of its own after the header (an underlined or a "#" heading)
_UNDERLINE = re.compile(r"^\s*(?:=+|-+|~+)\s*$")
_ATX = re.compile(r"^\s{0,3}#{1,6}\s+\S")


def _titled(lines: list[str]) -> bool:
    """Whether the first line with words of ``lines`` is a heading: a "#" heading, or a
    line underlined with "=", "-" or "~" (a setext heading, a plain-text export's title)."""
    for k, line in enumerate(lines):
        if line.strip():
            return bool(_ATX.match(line)) or (
                k + 1 < len(lines) and bool(_UNDERLINE.match(lines[k + 1])) and
                not _UNDERLINE.match(line))
    return False


def without_export_header(text: str) -> str:
    """A text without what an exporter or a static-site generator puts around the
    document: YAML (or TOML) front matter at the very start (``---`` ... ``---``), a header
    of two or more ``Key: value`` lines at the very start (after at most one short banner
    line, such as "Records export", or a longer one naming the exporter, "<organisation> -
    plain text export", when the text goes on with a title of its own) ended by a blank
    line or a rule, and a last line that is only a marker ("-- end of export --"). None of
    it is the document's own text, and a copy of the document in another format does not
    carry it. Anything else is left as it is."""
    lines = text.split("\n")
    start = 0
    if lines and _FRONT_FENCE.match(lines[0]):
        for i in range(1, min(len(lines), FRONT_MAX_LINES + 1)):
            if _FRONT_END.match(lines[i]):
                body = [line for line in lines[1:i] if line.strip()]
                if body and all(_YAML_KEY.match(line) or _CONTINUED.match(line)
                                for line in body) and _YAML_KEY.match(body[0]):
                    start = i + 1
                break
    else:
        filled = 0
        first = 0
        while first < len(lines) and not lines[first].strip():
            first += 1
        i = first
        banner = 0
        if i < len(lines) and not _KEY_LINE.match(lines[i]):
            banner = len(lines[i].split())
            i += 1  # a banner line, perhaps
        while i < len(lines) and lines[i].strip() and _KEY_LINE.match(lines[i]) and \
                filled < HEADER_MAX_LINES:
            filled += 1
            i += 1
        if filled >= 2 and (i >= len(lines) or not lines[i].strip() or
                            _RULE.match(lines[i])):
            start = i + 1 if i < len(lines) and _RULE.match(lines[i]) else i
            # a longer banner is the exporter's only when the text has its own title
            # below: otherwise it may be the document's title over a memo's header
            if banner > BANNER_MAX_WORDS and not (
                    banner <= LONG_BANNER_MAX_WORDS and _titled(lines[start:])):
                start = 0
    if start == 0:
        start = _source_header(lines)
    end = len(lines)
    while end > start and not lines[end - 1].strip():
        end -= 1
    if end > start + 1 and _MARKER.match(lines[end - 1]):
        end -= 1
    # a closing line that is one Markdown link and nothing else ("[Read the original
    # notice][src]", then its reference): a link back, navigation as a link-dominated
    # block of an HTML page is, which the HTML copy does not give as text
    last = end
    while last > start and (not lines[last - 1].strip() or _LINK_REFERENCE.match(lines[last - 1])):
        last -= 1
    if last > start + 1 and last < end and _LINK_ONLY.match(lines[last - 1]):
        end = last - 1
    if start == 0 and end == len(lines):
        return text
    return "\n".join(lines[start:end]).strip("\n")


_LINK_REFERENCE = re.compile(r"^\s{0,3}\[[^\]]+\]:\s*\S+")  # "[src]: https://..."
_LINK_ONLY = re.compile(r"^\s*\[[^\]]+\](?:\[[^\]]*\]|\([^)\s]+\))\s*$")
_ADDRESS = re.compile(r"\b(?:https?|ftp)://\S+|\bwww\.\S+\.\S+", re.IGNORECASE)
SOURCE_HEADER_MAX_LINES = 4
SOURCE_HEADER_MAX_WORDS = 14


def _source_header(lines: list[str]) -> int:
    """Where the text starts after an exporter's header in free wording ("<organisation>",
    "Text export of https://...", "Exported 27 June 2026"): at most
    ``SOURCE_HEADER_MAX_LINES`` short lines at the very start, one of them naming an
    address (where the document came from), then a blank line and the text's own title
    (a "#" heading or an underlined line). 0 when there is no such header: a line of
    the document above its title stays unless the block names its source."""
    first = 0
    while first < len(lines) and not lines[first].strip():
        first += 1
    end = first
    while end < len(lines) and lines[end].strip():
        end += 1
    head = lines[first:end]
    if not 2 <= len(head) <= SOURCE_HEADER_MAX_LINES or end >= len(lines) or \
            any(len(line.split()) > SOURCE_HEADER_MAX_WORDS for line in head) or \
            not any(_ADDRESS.search(line) for line in head) or not _titled(lines[end:]):
        return 0
    return end


# a word broken at a line's end ("resi-" + "dents"): letters, one hyphen (or a soft
# hyphen) and the end of the line; the next line goes on with a lower-case letter
_BROKEN_TAIL = re.compile(r"(?<![\w-])([^\W\d_]{2,})[-\u00ad]$")
_BROKEN_HEAD = re.compile(r"^(\s*)([^\W\d_]+)")


def joined_hyphens(text: str) -> str:
    """A hard-wrapped text (a text export, a PDF's lines) with the words that typesetting
    broke at a line's end made whole again, so that it gives the words HTML gives for the
    same body: "resi-" / "dents of" becomes "residents" / "of". A hyphen at a line's end
    may also belong to a compound ("well-" / "known"), which HTML writes with its hyphen
    (two words); the document's own words are the dictionary (common practice in
    dehyphenation): the pieces are joined when the whole word occurs elsewhere in the
    text, or when either piece does not occur as a word of its own; a compound whose two
    parts both occur alone, and never joined, keeps its hyphen."""
    if "-\n" not in text and "\u00ad\n" not in text:
        return text
    lines = text.split("\n")
    breaks = []  # (line index, head piece, tail piece)
    for i in range(len(lines) - 1):
        tail = _BROKEN_TAIL.search(lines[i])
        head = _BROKEN_HEAD.match(lines[i + 1]) if tail else None
        if tail and head and head.group(2)[0].islower():
            breaks.append((i, tail, head))
    if not breaks:
        return text
    counts: dict[str, int] = {}
    for word in words(text):
        counts[word] = counts.get(word, 0) + 1
    pieces: dict[str, int] = {}  # how often a word occurs as a broken piece
    for _i, tail, head in breaks:
        for piece in (tail.group(1), head.group(2)):
            key = piece.casefold()
            pieces[key] = pieces.get(key, 0) + 1

    def alone(piece: str) -> bool:
        key = piece.casefold()
        return counts.get(key, 0) > pieces.get(key, 0)

    for i, tail, head in breaks:
        first, second = tail.group(1), head.group(2)
        if not (counts.get((first + second).casefold()) or
                not alone(first) or not alone(second)):
            continue  # a compound: "well-" / "known" with "well" and "known" elsewhere
        broken = tail.group(0)  # the line's end, as found before any join
        if not lines[i].endswith(broken) or not lines[i + 1].startswith(head.group(0)):
            continue  # a line that an earlier join emptied
        lines[i] = lines[i][:len(lines[i]) - len(broken)] + first + second
        rest = lines[i + 1][head.end():].lstrip()
        lines[i + 1] = head.group(1) + rest if rest else ""
    return "\n".join(lines)


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
    stripped = without_export_header(cleaned)
    cleaned = joined_hyphens(stripped if stripped.strip() else cleaned)
    summary = Extracted(type="text", encoding=used, text_chars=len(cleaned))
    return Extraction(summary=summary, text=cleaned, raw=data, decoded=text)
