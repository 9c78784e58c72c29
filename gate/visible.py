"""One way to show document-controlled text to a person: invisible and control characters
made visible.

A file name, a finding's snippet or a document's text may hold control characters (an ESC
sequence can rewrite a terminal), bidi overrides that reorder what is read (``U+202E``),
zero-width and tag characters, or surrogates from undecodable file names. :func:`visible`
shows each of them as ``<U+XXXX>``; the terminal, report.html and the review commands all
use it, so a name reads the same everywhere and as it is.
"""

from __future__ import annotations

import re
import unicodedata

# control (Cc), format (Cf: bidi controls, zero-width, tags, soft hyphen), surrogate (Cs)
# and the line/paragraph separators (Zl, Zp)
SHOWN_CATEGORIES = frozenset({"Cc", "Cf", "Cs", "Zl", "Zp"})
# letters that draw nothing (Hangul fillers, braille blank): invisible though not Cf
BLANK_LETTERS = frozenset({0x115F, 0x1160, 0x2800, 0x3164, 0xFFA0})
_BLANK = re.compile("[" + "".join(chr(c) for c in sorted(BLANK_LETTERS)) + "]")


def visible(text: str, keep: str = "") -> str:
    """``text`` with every invisible or control character shown as ``<U+XXXX>``, except
    the characters in ``keep`` (``"\\n\\t"`` for multi-line text)."""
    if text.isprintable() and not _BLANK.search(text):
        return text
    out = []
    for ch in text:
        code = ord(ch)
        if ch not in keep and (unicodedata.category(ch) in SHOWN_CATEGORIES or
                               code in BLANK_LETTERS):
            out.append(f"<U+{code:04X}>")
        else:
            out.append(ch)
    return "".join(out)
