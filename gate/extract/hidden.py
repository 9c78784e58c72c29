"""Text a reader does not see, collected by the office, EPUB and e-mail extractors.

Each extractor puts the text it would show a reader into the indexed text and everything
else it found (and white or tiny text, which is in both) into
``Extraction.extras["hidden"]``: a list of pieces
``{"text": ..., "where": ..., "technique": ...}`` (``where`` names the place in words, for
example "comment 2 of the DOCX", ``technique`` is a slug such as ``hidden-run``,
``white-text``, ``tiny-text``, ``comment``, ``tracked-deletion``, ``speaker-notes``,
``hidden-slide``, ``hidden-sheet``, ``hidden-row``, ``hidden-column``, ``hidden-format``,
``alt-text``, ``metadata``, ``field-code``, ``html-part``, ``attachment``). The injection
screen scans every piece as concealed text, the way it scans hidden HTML and PDF text.

:func:`markup_pieces` does the same for an XHTML/HTML tree (EPUB chapters, the HTML part of
a mail): inline-styled hidden elements, the ``hidden`` attribute, comments, ``alt`` and
``title`` attributes; :func:`visible_text` gives the text without them.
"""

from __future__ import annotations

import re
from typing import Any

import lxml.etree

MAX_PIECES = 400
MAX_PIECE_CHARS = 100_000
MAX_CHARS = 2_000_000

_HIDING_STYLE = re.compile(
    r"display\s*:\s*none|visibility\s*:\s*hidden|font-size\s*:\s*0*(?:\.\d+)?(?:px|pt|em)?"
    r"\s*(?:;|$)|opacity\s*:\s*0(?:\.0+)?\s*(?:;|$)|color\s*:\s*(?:#fff(?:fff)?|white)\b",
    re.I)
_SKIP_TAGS = {"script", "style", "head", "title", "noscript", "template"}


class Pieces:
    """A bounded list of hidden pieces."""

    def __init__(self) -> None:
        self.items: list[dict[str, str]] = []
        self.chars = 0
        self.dropped = 0

    def add(self, text: str | None, where: str, technique: str) -> None:
        text = (text or "").strip()
        if not text:
            return
        if len(self.items) >= MAX_PIECES or self.chars >= MAX_CHARS:
            self.dropped += 1
            return
        text = text[:MAX_PIECE_CHARS]
        self.chars += len(text)
        self.items.append({"text": text, "where": where, "technique": technique})


def _local(tag: Any) -> str:
    if not isinstance(tag, str):
        return ""
    return tag.rsplit("}", 1)[-1].lower()


def _hidden_element(node: Any) -> str | None:
    style = node.get("style") or ""
    if node.get("hidden") is not None:
        return "hidden-attribute"
    if style and _HIDING_STYLE.search(style.replace("\n", " ")):
        return "hidden-style"
    return None


def markup_pieces(root: Any, pieces: Pieces, where: str) -> None:
    """Collect the hidden parts of an (X)HTML tree into ``pieces``."""
    if root is None:
        return
    for node in root.iter():
        if isinstance(node, lxml.etree._Comment):
            pieces.add(node.text, f"a comment in {where}", "comment")
            continue
        if not isinstance(node.tag, str):
            continue
        technique = _hidden_element(node)
        if technique:
            pieces.add(" ".join(node.itertext()), f"a hidden element in {where}", technique)
        for attr in ("alt", "title", "aria-label"):
            value = node.get(attr)
            if value:
                pieces.add(value, f"the {attr} attribute of <{_local(node.tag)}> in {where}",
                           "alt-text")


def visible_text(root: Any) -> str:
    """Text of an (X)HTML tree a reader sees: hidden elements, scripts and styles left out."""
    if root is None:
        return ""
    body = next((n for n in root.iter() if _local(n.tag) == "body"), root)
    out: list[str] = []
    blocks = {"p", "div", "br", "li", "tr", "h1", "h2", "h3", "h4", "h5", "h6", "section",
              "article", "blockquote", "pre", "table", "ul", "ol", "dd", "dt"}

    def walk(node: Any) -> None:
        tag = _local(node.tag)
        if not isinstance(node.tag, str) or tag in _SKIP_TAGS or _hidden_element(node):
            if node.tail:
                out.append(node.tail)
            return
        if tag in blocks:
            out.append("\n")
        if node.text:
            out.append(node.text)
        for child in node:
            walk(child)
        if tag in blocks:
            out.append("\n")
        if node.tail:
            out.append(node.tail)

    stack_safe = body if body is not None else root
    try:
        walk(stack_safe)
    except RecursionError:
        return " ".join(stack_safe.itertext())
    text = "".join(out)
    text = re.sub(r"[ \t\r\f\v]+", " ", text)
    return re.sub(r"\s*\n\s*", "\n", text).strip()
