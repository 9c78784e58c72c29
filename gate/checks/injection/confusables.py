"""UTS #39 confusables: the skeleton, mixed-script words, and the fold of look-alikes to ASCII.

The prototype table is generated from Unicode's published ``confusables.txt`` (see
``data/build_confusables.py``; the version is :data:`VERSION`). :func:`skeleton` is the
UTS #39 skeleton of that version: NFD, each character replaced by its prototype, NFD again.
(Unicode 15.1 added a step that first removes default-ignorable characters; the fold in
:mod:`.normalize` removes those anyway.)

The script of a letter is read from its Unicode character name ("CYRILLIC SMALL LETTER
A" is Cyrillic), which is exact for the alphabetic scripts that matter here (Latin, Greek,
Cyrillic, Armenian, Cherokee, Coptic ...) with the standard library's UCD.
"""

from __future__ import annotations

import unicodedata
from functools import lru_cache

from gate.checks.injection import _confusables as _data

VERSION = _data.VERSION

# Scripts whose letters are commonly swapped into Latin words; only their look-alikes are
# folded to ASCII (an Arabic or Devanagari letter that happens to resemble "o" is left).
SIMILAR_TO_LATIN = frozenset({"CYRILLIC", "GREEK", "ARMENIAN", "CHEROKEE", "COPTIC",
                              "LISU", "VAI", "OSAGE", "TIFINAGH", "GEORGIAN", "GLAGOLITIC"})
_FOLDED_SCRIPTS = SIMILAR_TO_LATIN | {"LATIN", "COMMON"}


@lru_cache(maxsize=1)
def prototypes() -> dict[str, str]:
    """Source character -> prototype string, as listed in confusables.txt."""
    table: dict[str, str] = {}
    for entry in _data.DATA.replace("\n", "").split(";"):
        if not entry:
            continue
        source, _, target = entry.partition(">")
        table[chr(int(source, 16))] = "".join(chr(int(t, 16)) for t in target.split())
    return table


def skeleton(text: str) -> str:
    """The UTS #39 skeleton of ``text`` (for comparison only, never for display)."""
    table = prototypes()
    nfd = unicodedata.normalize("NFD", text)
    return unicodedata.normalize("NFD", "".join(table.get(c, c) for c in nfd))


def confusable(a: str, b: str) -> bool:
    """UTS #39: two strings are confusable when their skeletons are equal."""
    return skeleton(a) == skeleton(b)


@lru_cache(maxsize=1)
def _ascii_prototypes() -> dict[str, str]:
    out: dict[str, str] = {}
    for source, target in prototypes().items():
        if ord(source) < 0x80 or len(source) != 1:
            continue
        if script(source) not in _FOLDED_SCRIPTS and source.isalpha():
            continue
        plain = "".join(c for c in unicodedata.normalize("NFKD", target)
                        if unicodedata.category(c) != "Mn")
        if plain and plain.isascii() and plain.isalnum():
            out[source] = plain.lower()
    return out


def ascii_prototype(ch: str) -> str | None:
    """The ASCII letters a non-ASCII look-alike stands for, or None."""
    return _ascii_prototypes().get(ch)


@lru_cache(maxsize=8192)
def script(ch: str) -> str:
    """The script of a letter, from its character name; "" for non-letters."""
    if not ch.isalpha():
        return ""
    if ch.isascii():
        return "LATIN"
    name = unicodedata.name(ch, "")
    if not name:
        return "UNKNOWN"
    first = name.split(" ", 1)[0]
    if first in ("MATHEMATICAL", "FULLWIDTH", "MODIFIER", "SMALL", "CIRCLED",
                 "PARENTHESIZED", "SQUARED", "NEGATIVE", "DOUBLE-STRUCK", "SCRIPT",
                 "BLACK-LETTER"):
        return "COMMON"
    return first


