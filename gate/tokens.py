"""The one token stream of a text: what shingles, block hashes and template learning read.

Every format reaches the same words: Markdown markup (heading marks, emphasis, list
bullets, table pipes and separator rows, link targets and image sources), inline HTML tags
and punctuation are not words, so a heading, a list item or a table cell gives the same
tokens whether it came from HTML, PDF, plain text or Markdown. A leaf module: it imports
nothing of gate.
"""

from __future__ import annotations

import hashlib
import re
import unicodedata

_WORD = re.compile(r"[^\W_]+", re.UNICODE)
# [text](target "title") and ![alt](source): the target is not text a reader sees
_MD_LINK = re.compile(r"(!?)\[([^\]\n]*)\]\([^)\n]*\)")
# <https://...> autolinks are visible text; other tags are markup
_TAG = re.compile(r"</?[A-Za-z][A-Za-z0-9-]*(?:\s[^<>\n]*)?/?>")
_REF_DEF = re.compile(r"^\s{0,3}\[[^\]\n]+\]:\s*\S+.*$", re.M)


def plain(text: str) -> str:
    """``text`` without Markdown link targets, reference definitions and HTML tags (the
    rest of the markup is punctuation, which :func:`words` drops anyway)."""
    if "](" in text:
        text = _MD_LINK.sub(lambda m: m.group(2), text)
    if "]:" in text:
        text = _REF_DEF.sub("", text)
    if "<" in text:
        text = _TAG.sub(" ", text)
    return text


def words(text: str) -> list[str]:
    """The normalised words of a text: markup dropped, NFKC, case-folded, punctuation
    removed."""
    text = plain(text)
    if not text.isascii():  # NFKC leaves ASCII as it is
        text = unicodedata.normalize("NFKC", text)
    return _WORD.findall(text.casefold())


def block_hash(text: str) -> int | None:
    """A stable 63-bit hash of a block's words (None when it has none): equal for the same
    words in any format, any process, any run."""
    tokens = words(text)
    if not tokens:
        return None
    digest = hashlib.blake2b(" ".join(tokens).encode("utf-8"), digest_size=8).digest()
    return int.from_bytes(digest, "little") >> 1
