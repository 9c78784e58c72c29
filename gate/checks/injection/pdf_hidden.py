"""Concealment in PDFs: text drawn so nobody sees it, and text outside the pages.

pypdf extracts every string a page shows, visible or not, so the indexed text of a PDF
already holds hidden text. This module finds out which parts were hidden, by replaying the
page's content stream with pypdf's visitor callbacks and tracking the graphics state:

* fill colour set by ``rg``/``g``/``k``/``sc``/``scn`` (white or near-white:
  white-text; the page is assumed white),
* text render mode ``Tr`` 3 (neither fill nor stroke) or 7 (clip only): invisible-render,
* the effective font size, ``Tf`` size scaled by the text and transformation matrices,
  below :data:`TINY_PT` points: tiny-text,
* the text origin outside the MediaBox by more than :data:`MARGIN_PT` points: off-page,
* ``q``/``Q`` save and restore the colour and render mode.

Replaying costs as much as extraction, so it runs only on pages whose raw content stream
contains one of the operators that could hide text (a byte-level regular-expression test),
on at most :data:`MAX_PAGES` pages and :data:`MAX_OPERATORS` operators in all.

Text outside the page content is collected too: the document Info fields
(info-metadata), the XMP packet (xmp-metadata) and annotation contents (annotation).
"""

from __future__ import annotations

import math
import re
from dataclasses import dataclass, field
from typing import Any

MAX_PAGES = 40
MAX_SCANNED_PAGES = 200
MAX_OPERATORS = 200_000
MAX_STREAM = 4_000_000
TINY_PT = 2.5
MARGIN_PT = 5.0
WHITE_LEVEL = 0.94

# Byte patterns that make a page worth replaying.
_HIDING_OPS = re.compile(
    rb"(?:^|\s)[37]\s+Tr\b"  # invisible or clip-only render mode
    rb"|(?:^|[\s\]])(?:0?\.9[4-9]\d*|1(?:\.0*)?)\s+(?:0?\.9[4-9]\d*|1(?:\.0*)?)\s+"
    rb"(?:0?\.9[4-9]\d*|1(?:\.0*)?)\s+(?:rg|sc|scn)\b"  # white RGB fill
    rb"|(?:^|[\s\]])(?:0?\.9[4-9]\d*|1(?:\.0*)?)\s+(?:g|sc|scn)\b"  # white grey fill
    rb"|(?:^|[\s\]])(?:0?\.0[0-6]?\d*|0)\s+(?:0?\.0[0-6]?\d*|0)\s+(?:0?\.0[0-6]?\d*|0)\s+"
    rb"(?:0?\.0[0-6]?\d*|0)\s+(?:k|sc|scn)\b")  # white CMYK fill
# What every match of _HIDING_OPS ends with: a number, white space and the operator. Its
# search starts with a character set, which the engine skips to fast; a stream without it
# is not searched with the whole pattern.
_HIDING_GATE = re.compile(rb"[\d.]\s+(?:Tr|rg|scn?|g|k)\b")
_N = rb"(-?\d*\.?\d+)"
# Groups: 0 Tf size; 1-6 and 7 a Tm/cm matrix; 8-9 and 10 a Td/TD move; 11 a text-showing
# operator; 12 BT.
# The lookahead names every byte a match can start with ("/", a number, "T", "'", white
# space, or "B" at the start): the same matches, and the engine gives up at once at any
# other byte instead of trying each alternative there (the prose inside strings).
_SIZE_OR_MATRIX = re.compile(
    rb"(?=[/\-\d.T'B\s])(?:"
    rb"/[^\s/]+\s+" + _N + rb"\s+Tf\b|" + rb"\s+".join([_N] * 6) + rb"\s+(Tm|cm)\b|" +
    _N + rb"\s+" + _N + rb"\s+(T[dD])\b|(T[jJ]|')(?=\s|$)|(?:^|\s)(BT)\b)")
MAX_SUSPECT_MATCHES = 50_000


def _suspect(data: bytes, box: tuple[float, float, float, float]) -> bool:
    """Could the content stream ``data`` hide text? Cheap and over-inclusive.

    Besides hiding colours and render modes, it follows font size times text-matrix scale in
    stream order (tiny text) and absolute positions (``Tm``, ``cm``, large ``Td`` moves).
    """
    if _HIDING_GATE.search(data) and _HIDING_OPS.search(data):
        return True
    x0, y0, x1, y1 = box
    size, scale = 12.0, 1.0
    origin_x = origin_y = 0.0  # translation of the current transformation matrix
    tx = ty = 0.0  # text line position since BT (relative moves accumulate)
    n = 0
    for m in _SIZE_OR_MATRIX.finditer(data):
        n += 1
        if n > MAX_SUSPECT_MATCHES:
            return True
        g = m.groups()
        try:
            if g[0] is not None:
                size = abs(float(g[0]))
            elif g[7] is not None:
                a, b, c, d, e, f = (float(v) for v in g[1:7])
                if g[7] == b"Tm":
                    scale = math.sqrt(abs(a * d - b * c))
                    tx, ty = e, f
                else:
                    if math.sqrt(abs(a * d - b * c)) < 0.3:
                        return True
                    origin_x, origin_y = origin_x + e, origin_y + f
                    continue
            elif g[10] is not None:
                tx, ty = tx + float(g[8]) * scale, ty + float(g[9]) * scale
            elif g[12] is not None:
                tx = ty = 0.0
                scale = 1.0
                continue
            elif size * scale < TINY_PT:  # a string shown at this size
                return True
            else:
                continue
        except ValueError:
            continue
        x, y = origin_x + tx, origin_y + ty
        if x < x0 - 50 or y < y0 - 50 or x > x1 + 50 or y > y1 + 50:
            return True
    return False


class _Stop(Exception):
    """Raised inside a visitor to end a replay that went over its operator budget."""


@dataclass
class Run:
    page: int
    text: str
    technique: str


@dataclass
class PdfFindings:
    runs: list[Run] = field(default_factory=list)
    pages_replayed: int = 0
    pages_skipped: int = 0
    truncated: bool = False
    errors: int = 0


def _is_white(values: list[float], space: str) -> bool:
    if not values:
        return False
    if space == "cmyk" or len(values) == 4:
        return all(v <= 1 - WHITE_LEVEL for v in values)
    return all(v >= WHITE_LEVEL for v in values)


def _num(value: Any) -> float | None:
    try:
        return float(value)
    except (TypeError, ValueError):
        return None


class _Replay:
    """Graphics state tracked while pypdf replays one page."""

    def __init__(self, page_number: int, box: tuple[float, float, float, float],
                 budget: list[int]):
        self.page = page_number
        self.box = box
        self.budget = budget
        self.fill: list[float] = [0.0]
        self.space = "gray"
        self.render = 0
        self.font_size = 12.0
        self.stack: list[tuple[list[float], str, int]] = []
        self.pending: list[str] = []  # reasons of the show-operators since the last flush
        self.runs: list[Run] = []

    def before(self, op: bytes, args: list[Any], cm: list[float], tm: list[float]) -> None:
        self.budget[0] -= 1
        if self.budget[0] <= 0:
            raise _Stop
        if op == b"q":
            if len(self.stack) < 64:
                self.stack.append((list(self.fill), self.space, self.render))
        elif op == b"Q":
            if self.stack:
                self.fill, self.space, self.render = self.stack.pop()
        elif op in (b"rg", b"g", b"k", b"sc", b"scn"):
            values = [v for v in (_num(a) for a in args) if v is not None]
            if values:
                self.fill = values[:4]
                self.space = {b"rg": "rgb", b"g": "gray", b"k": "cmyk"}.get(op, self.space)
        elif op == b"cs":
            name = str(args[0]) if args else ""
            self.space = "cmyk" if "CMYK" in name else "rgb" if "RGB" in name else \
                "gray" if "Gray" in name else "other"
        elif op == b"Tr" and args:
            self.render = int(_num(args[0]) or 0)
        elif op == b"Tf" and len(args) >= 2:
            self.font_size = _num(args[1]) or self.font_size
        elif op in (b"Tj", b"TJ", b"'", b'"'):
            self.pending.append(self._reason(cm, tm))

    def _reason(self, cm: list[float], tm: list[float]) -> str:
        if self.render in (3, 7):
            return "invisible-render"
        if self.space != "other" and _is_white(self.fill, self.space):
            return "white-text"
        try:
            scale_tm = math.sqrt(abs(tm[0] * tm[3] - tm[1] * tm[2]))
            scale_cm = math.sqrt(abs(cm[0] * cm[3] - cm[1] * cm[2]))
            size = abs(self.font_size) * scale_tm * scale_cm
            x = tm[4] * cm[0] + tm[5] * cm[2] + cm[4]
            y = tm[4] * cm[1] + tm[5] * cm[3] + cm[5]
        except (TypeError, IndexError, ValueError):
            return ""
        if size < TINY_PT:
            return "tiny-text"
        x0, y0, x1, y1 = self.box
        if x < x0 - MARGIN_PT or y < y0 - MARGIN_PT or x > x1 + MARGIN_PT or y > y1 + MARGIN_PT:
            return "off-page"
        return ""

    def text(self, text: str, cm: Any, tm: Any, font: Any, size: Any) -> None:
        reasons = self.pending
        self.pending = []
        if not text or not text.strip() or not reasons:
            return
        hidden = [r for r in reasons if r]
        if len(hidden) * 2 < len(reasons):
            return
        technique = max(set(hidden), key=hidden.count)
        if self.runs and self.runs[-1].technique == technique and \
                len(self.runs[-1].text) < 20_000:
            self.runs[-1].text += text
        else:
            self.runs.append(Run(self.page, text, technique))


def _box(page: Any) -> tuple[float, float, float, float]:
    try:
        box = page.mediabox
        return (float(box.left), float(box.bottom), float(box.right), float(box.top))
    except Exception:  # noqa: BLE001 - a broken box must not stop the screen
        return (0.0, 0.0, 612.0, 792.0)


def hidden_runs(reader: Any) -> PdfFindings:
    """Text drawn invisibly, tiny or off the page, per page (bounded)."""
    out = PdfFindings()
    if reader is None:
        return out
    budget = [MAX_OPERATORS]
    try:
        pages = reader.pages
        count = len(pages)
    except Exception:  # noqa: BLE001 - hostile page trees
        out.errors += 1
        return out
    for number in range(min(count, MAX_SCANNED_PAGES)):
        if out.pages_replayed >= MAX_PAGES or budget[0] <= 0:
            out.truncated = True
            break
        try:
            page = pages[number]
            contents = page.get_contents()
            data = contents.get_data()[:MAX_STREAM] if contents is not None else b""
        except Exception:  # noqa: BLE001 - pypdf raises many kinds on broken streams
            out.errors += 1
            continue
        box = _box(page)
        if not data or (b"Tj" not in data and b"TJ" not in data and b"'" not in data) \
                or not _suspect(data, box):
            out.pages_skipped += 1
            continue
        replay = _Replay(number + 1, box, budget)
        out.pages_replayed += 1
        try:
            page.extract_text(visitor_operand_before=replay.before, visitor_text=replay.text)
        except _Stop:
            out.truncated = True
        except Exception:  # noqa: BLE001 - extraction already succeeded once; be lenient
            out.errors += 1
        out.runs.extend(r for r in replay.runs if r.text.strip())
    if count > MAX_SCANNED_PAGES:
        out.truncated = True
    return out


META_FIELDS = ("Title", "Author", "Subject", "Keywords", "Creator", "Producer")


def outside_text(metadata: dict[str, str], extras: dict[str, Any]) -> list[tuple[str, str, str]]:
    """``(text, technique, where)`` for Info fields, XMP and annotations."""
    out: list[tuple[str, str, str]] = []
    for key in META_FIELDS:
        value = (metadata or {}).get(key)
        if value and len(value.strip()) >= 8:
            out.append((value, "info-metadata", f"PDF Info /{key}"))
    xmp = (extras or {}).get("xmp") or ""
    if xmp.strip():
        out.append((re.sub(r"\s+", " ", xmp)[:65_536], "xmp-metadata", "PDF XMP metadata"))
    for annot in ((extras or {}).get("annotations") or [])[:2000]:
        text = annot.get("text") or ""
        if text.strip():
            where = f"PDF annotation /{annot.get('key', '?')} on page {annot.get('page', '?')}"
            out.append((text, "annotation", where))
    return out


MAX_FIELDS = 2_000


def form_text(reader: Any) -> list[tuple[str, str, str]]:
    """``(text, technique, where)`` for form-field values, tooltips and rich-text contents.

    Field values are drawn only inside their widgets, often not extracted with the page
    text, and easy to fill with text nobody reads; widgets in annotations carry ``/V``
    and ``/RC`` too.
    """
    out: list[tuple[str, str, str]] = []
    if reader is None:
        return out
    try:
        root = reader.trailer["/Root"].get_object()
        form = root.get("/AcroForm")
        fields = list((form.get_object().get("/Fields") or []) if form is not None else [])
    except Exception:  # noqa: BLE001 - a damaged catalogue means no form, not a failure
        return out
    seen = 0
    stack = fields[:MAX_FIELDS]
    while stack and seen < MAX_FIELDS:
        seen += 1
        try:
            field = stack.pop().get_object()
            name = str(field.get("/T") or "?")[:60]
            for key, technique in (("/V", "form-field"), ("/TU", "form-field"),
                                   ("/RC", "form-field")):
                value = field.get(key)
                if value is not None and not hasattr(value, "keys"):
                    text = str(value)
                    if len(text.strip()) >= 12:
                        out.append((text[:20_000], technique, f"PDF form field {name} {key}"))
            stack.extend(list(field.get("/Kids") or [])[:MAX_FIELDS])
        except Exception:  # noqa: BLE001 - skip one unreadable field
            continue
    return out
