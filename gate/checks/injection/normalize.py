"""Matching views of a text: folded for pattern matching, with offsets back to the original.

The wording detectors never match the raw text. They match a *fold* of it:

* NFKD, then combining marks dropped and the result lower-cased, so full-width, mathematical
  and accented letters match their plain form ("ｉｇｎｏｒｅ", "𝐢𝐠𝐧𝐨𝐫𝐞", "précédentes");
* default-ignorable and format characters removed (zero-width space, joiners, soft hyphen,
  bidi controls, tag characters), so "ig\\u200bnore" reads "ignore";
* letters whose UTS #39 confusable prototype is ASCII folded to it (Cyrillic "і", Greek
  "ο"), see :mod:`.confusables`;
* typographic quotes and apostrophes to ASCII, every kind of white space to a space.

Each folded character remembers which original character it came from, so a match in the
fold is reported at its span in the original text. Two further views are built only for
small windows where they are needed: digits and symbols read as letters ("1gn0r3" ->
"ignore"), and letters spaced out ("i g n o r e" -> "ignore").
"""

from __future__ import annotations

import bisect
import re
import unicodedata
from functools import lru_cache

from gate.checks.injection import confusables

# Default_Ignorable_Code_Point ranges (UCD DerivedCoreProperties.txt; from memory, and
# cross-checked with unicodedata: every one is Cf, Mn, Lo filler or unassigned).
_IGNORABLE_RANGES = (
    (0x00AD, 0x00AD), (0x034F, 0x034F), (0x061C, 0x061C), (0x115F, 0x1160),
    (0x17B4, 0x17B5), (0x180B, 0x180F), (0x200B, 0x200F), (0x202A, 0x202E),
    (0x2060, 0x206F), (0x3164, 0x3164), (0xFE00, 0xFE0F), (0xFEFF, 0xFEFF),
    (0xFFA0, 0xFFA0), (0xFFF0, 0xFFF8), (0x1BCA0, 0x1BCA3), (0x1D173, 0x1D17A),
    (0xE0000, 0xE0FFF),
)
_QUOTES = {"\u2018": "'", "\u2019": "'", "\u201a": "'", "\u201b": "'", "\u2032": "'",
           "\u02bc": "'", "\u201c": '"', "\u201d": '"', "\u201e": '"', "\u201f": '"',
           "\u00ab": '"', "\u00bb": '"', "\u2039": "'", "\u203a": "'", "\u2033": '"'}


def is_ignorable(cp: int) -> bool:
    """Default-ignorable or format (Cf) character: invisible when rendered."""
    for low, high in _IGNORABLE_RANGES:
        if low <= cp <= high:
            return True
    return cp > 0x7F and unicodedata.category(chr(cp)) == "Cf"


@lru_cache(maxsize=65536)
def fold_char(ch: str) -> str:
    """The fold of one non-ASCII character (see the module docstring)."""
    cp = ord(ch)
    if cp < 0x80:
        return ch.lower()
    if is_ignorable(cp):
        return ""
    if ch in _QUOTES:
        return _QUOTES[ch]
    category = unicodedata.category(ch)
    if category in ("Zs", "Zl", "Zp"):
        return " "
    if category == "Mn":
        return ""
    decomposed = unicodedata.normalize("NFKD", ch)
    stripped = "".join(c for c in decomposed if unicodedata.category(c) != "Mn")
    if stripped and stripped.isascii():
        return stripped.lower()
    ascii_form = confusables.ascii_prototype(ch)
    if ascii_form is not None:
        # UTS #39 maps every I-like letter to "l"; an upper-case one reads as "i"
        return "i" if ascii_form == "l" and ch.isupper() else ascii_form
    if stripped != ch and stripped:
        return "".join(fold_char(c) if ord(c) >= 0x80 else c.lower() for c in stripped)
    if ch == "\u00df":  # sharp s has no decomposition; its case fold is "ss"
        return "ss"
    lower = ch.lower()
    return lower if len(lower) == 1 else ch


_NON_ASCII = re.compile(r"[^\x00-\x7f]+")


class View:
    """A folded text and the map from its positions back to the original's."""

    __slots__ = ("text", "_pos", "_delta", "source")

    def __init__(self, text: str, source: str, pos: list[int], delta: list[int]):
        self.text = text
        self.source = source
        self._pos = pos
        self._delta = delta

    def orig(self, index: int) -> int:
        """Original offset of the folded character at ``index``."""
        k = bisect.bisect_right(self._pos, index) - 1
        return index + (self._delta[k] if k >= 0 else 0)

    def orig_span(self, start: int, end: int) -> tuple[int, int]:
        """Original span of the folded span ``[start, end)``."""
        if end <= start:
            o = self.orig(start)
            return o, o
        return self.orig(start), self.orig(end - 1) + 1


def fold(text: str) -> View:
    """Fold ``text`` for matching; ASCII text takes a fast path (lower-casing only)."""
    if text.isascii():
        return View(text.lower(), text, [], [])
    parts: list[str] = []
    pos: list[int] = []
    delta: list[int] = []
    last = 0
    out_len = 0
    shift = 0  # original index minus folded index, for the characters after the last break
    for m in _NON_ASCII.finditer(text):
        start = m.start()
        if start > last:
            chunk = text[last:start].lower()
            parts.append(chunk)
            out_len += len(chunk)
        for offset, ch in enumerate(m.group()):
            folded = fold_char(ch)
            parts.append(folded)
            out_len += len(folded)
            if len(folded) != 1:
                new_shift = (start + offset + 1) - out_len
                if new_shift != shift:
                    if pos and pos[-1] == out_len:
                        delta[-1] = new_shift
                    else:
                        pos.append(out_len)
                        delta.append(new_shift)
                    shift = new_shift
        last = m.end()
    if last < len(text):
        parts.append(text[last:].lower())
    return View("".join(parts), text, pos, delta)


# -- secondary views for small windows ------------------------------------------------------

LEET_AS_I = str.maketrans({"0": "o", "1": "i", "3": "e", "4": "a", "5": "s", "7": "t",
                           "8": "b", "@": "a", "$": "s", "|": "i", "!": "i", "+": "t"})
LEET_AS_L = str.maketrans({"0": "o", "1": "l", "3": "e", "4": "a", "5": "s", "7": "t",
                           "8": "b", "@": "a", "$": "s", "|": "l", "!": "i", "+": "t"})
# A token that mixes letters with digits or symbols commonly read as letters.
_LEET_TOKEN = re.compile(r"[a-z]{1,20}[013457@$|!+][a-z0-9@$|!+]{0,20}|[013457@$|][a-z]{1,20}")
_SPACED = re.compile(r"(?:\b[a-z0-9][ .\-_*·]{1,3}){3,80}[a-z0-9]\b")


def leet_windows(folded: str, limit: int = 40) -> list[tuple[int, int]]:
    """Windows of the fold where letter-digit substitution might hide words.

    Only clusters count: two such tokens within 60 characters (ordinary text has the odd
    "mp3" or "2nd", an obfuscated sentence has several in a row).
    """
    hits = []
    for m in _LEET_TOKEN.finditer(folded):
        token = m.group()
        if any(c.isdigit() for c in token) and token.rstrip("0123456789") and \
                sum(c.isalpha() for c in token) < 2:
            continue
        hits.append(m.start())
        if len(hits) > 2000:
            break
    windows: list[tuple[int, int]] = []
    for a, b in zip(hits, hits[1:]):
        if b - a <= 60:
            start, end = max(0, a - 80), min(len(folded), b + 120)
            if windows and start <= windows[-1][1]:
                windows[-1] = (windows[-1][0], end)
            else:
                windows.append((start, end))
            if len(windows) >= limit:
                break
    return windows


def spaced_runs(folded: str, limit: int = 40) -> list[tuple[str, list[int]]]:
    """Runs of spaced-out letters, closed up: ``(text, map to fold offsets)``.

    A single separator between letters is dropped; a wider gap becomes one space, so
    "i g n o r e   a l l" reads "ignore all".
    """
    runs = []
    for m in _SPACED.finditer(folded):
        chars: list[str] = []
        where: list[int] = []
        i = m.start()
        end = m.end()
        s = folded
        # Letters joined by dots or dashes, words by spaces: then a space is a word gap.
        inner = s[i:end]
        space_gaps = inner.count(" ") and any(c in inner for c in ".-_*·")
        while i < end:
            c = s[i]
            if c.isalnum():
                chars.append(c)
                where.append(i)
                i += 1
                continue
            j = i
            while j < end and not s[j].isalnum():
                j += 1
            if j - i >= 3 or (j - i == 2 and s[i] == s[i + 1] == " ") or (
                    space_gaps and " " in s[i:j]):
                chars.append(" ")
                where.append(i)
            i = j
        if len(chars) >= 4:
            runs.append(("".join(chars), where))
        if len(runs) >= limit:
            break
    return runs


# -- display -------------------------------------------------------------------------------

def visible(text: str, limit: int = 240) -> str:
    """``text`` safe to show a reviewer: invisible and control characters as ``<U+XXXX>``.

    Bidi controls are escaped too, so a snippet cannot reorder the report it appears in.
    """
    out: list[str] = []
    size = 0
    for ch in text:
        cp = ord(ch)
        if ch in "\n\r\t":
            piece = " "
        elif cp < 0x20 or 0x7F <= cp < 0xA0 or cp in (0x2028, 0x2029) or (
                cp > 0x7F and (is_ignorable(cp) or unicodedata.category(ch) in ("Co", "Cn"))):
            piece = f"<U+{cp:04X}>"
        else:
            piece = ch
        out.append(piece)
        size += len(piece)
        if size >= limit:
            out.append("…")
            break
    return re.sub(r" {2,}", " ", "".join(out)).strip()
