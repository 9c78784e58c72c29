"""The one token stream of a text: what shingles, block hashes and template learning read.

Every format reaches the same words: Markdown markup (heading marks, emphasis, list
bullets, ordered-list numbers, table pipes and separator rows, link targets, image
sources and reference labels), inline HTML tags, written-out web addresses and
punctuation are not words, so a heading, a list item or a table cell gives the same
tokens whether it came from HTML, PDF, plain text or Markdown. A leaf module: it
imports nothing of gate.
"""

from __future__ import annotations

import hashlib
import re
import unicodedata
from functools import lru_cache

_WORD = re.compile(r"[^\W_]+", re.UNICODE)
# [text](target "title") and ![alt](source): the target is not text a reader sees
_MD_LINK = re.compile(r"(!?)\[([^\]\n]*)\]\([^)\n]*\)")
# [text][label], [text][] and ![alt][label]: a reference link shows its text; the label
# names a definition ("[label]: target") that plain() drops with its line
_MD_REF = re.compile(r"!?\[([^\]\n]*)\]\[[^\]\n]*\]")
# <https://...> autolinks are text (an address, which plain() then drops); other tags are markup
_TAG = re.compile(r"</?[A-Za-z][A-Za-z0-9-]*(?:\s[^<>\n]*)?/?>")
_REF_DEF = re.compile(r"^\s{0,3}\[[^\]\n]+\]:\s*\S+.*$", re.M)
# a web or mail address written out ("https://x.example.org/a", "www.x.example.org"): an
# address, not words; HTML shows its link text instead, an export or a PDF footer writes it
_URL = re.compile(r"(?:\b[A-Za-z][A-Za-z0-9+.-]*://|\bwww\.)[^\s<>()\[\]\"']+")
# an ordered list's number ("1.", "2)") at the start of a line: HTML's <ol> numbers its
# items without writing the numbers into the text, so a list gives the same words in
# every format only without them
_ORDERED = re.compile(r"^(\s*(?:[-*+>]\s+)?)\d{1,3}[.)](?=\s)", re.M)


def plain(text: str) -> str:
    """``text`` without Markdown link targets, reference labels and definitions, HTML
    tags, written-out web addresses and ordered-list numbers (the rest of the markup is
    punctuation, which :func:`words` drops anyway)."""
    if "](" in text:
        text = _MD_LINK.sub(lambda m: m.group(2), text)
    if "][" in text:
        text = _MD_REF.sub(lambda m: m.group(1), text)
    if "]:" in text:
        text = _REF_DEF.sub("", text)
    if "<" in text:
        text = _TAG.sub(" ", text)
    if "://" in text or "www." in text:
        text = _URL.sub(" ", text)
    if "." in text or ")" in text:
        if "\n" in text:
            text = _ORDERED.sub(r"\1", text)
        else:  # one line: the number can only be at its start (a search tries every place)
            found = _ORDERED.match(text)
            if found:
                text = found.group(1) + text[found.end():]
    return text


# For ASCII text: letters lower-cased, digits kept, every other byte a space. There the
# word pattern's words are the runs of [a-z0-9] of the case-folded text (NFKC leaves ASCII
# as it is, case-folding is lower-casing), which is what splitting the translated bytes
# gives, four times faster than the pattern.
_ASCII_FOLD = bytes(c + 32 if 65 <= c <= 90 else c if 48 <= c <= 57 or 97 <= c <= 122
                    else 32 for c in range(256))


def _words(text: str) -> list[str]:
    text = plain(text)
    if text.isascii():
        return text.encode("ascii").translate(_ASCII_FOLD).decode("ascii").split()
    return _WORD.findall(unicodedata.normalize("NFKC", text).casefold())


LINE_CACHE = 2048  # lines whose words are remembered (per process) ...
LINE_CHARS = 2000  # ... when they are at most this long


@lru_cache(maxsize=LINE_CACHE)
def _line_words(line: str) -> tuple[str, ...]:
    return tuple(_words(line))


def words(text: str) -> list[str]:
    """The normalised words of a text: markup dropped, NFKC, case-folded, punctuation
    removed.

    Tokenised once: a line's words are remembered (the last :data:`LINE_CACHE` lines), so
    the words of a document whose lines were already hashed as blocks during extraction
    are put together from them rather than normalised again. A text is the concatenation
    of its lines' words whenever it has no ``<`` and no ``]:`` (the only markup
    :func:`plain` removes across a line break or by a line's indentation); NFKC,
    case-folding and word boundaries never reach across a line break."""
    if "\n" not in text:
        return list(_line_words(text)) if len(text) <= LINE_CHARS else _words(text)
    if "<" in text or "]:" in text:
        return _words(text)
    out: list[str] = []
    for line in text.split("\n"):
        line = line.strip()
        if line:
            out.extend(_line_words(line) if len(line) <= LINE_CHARS else _words(line))
    return out


@lru_cache(maxsize=LINE_CACHE)
def block_hash(text: str) -> int | None:
    """A stable 63-bit hash of a block's words (None when it has none): equal for the same
    words in any format, any process, any run (remembered for the last lines, like their
    words: a site's template blocks recur on every page)."""
    # a line's words straight from the lines remembered (what words() returns for it)
    tokens = _line_words(text) if len(text) <= LINE_CHARS and "\n" not in text else \
        words(text)
    if not tokens:
        return None
    digest = hashlib.blake2b(" ".join(tokens).encode("utf-8"), digest_size=8).digest()
    return int.from_bytes(digest, "little") >> 1
