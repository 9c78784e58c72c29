"""Concealment in HTML: text a reader does not see, read from the parsed tree before extraction.

What counts as hidden (technique slugs in parentheses):

* inline CSS: ``display:none`` (css-display-none), ``visibility:hidden|collapse``
  (css-visibility-hidden), zero or sub-pixel font size, zero width/height or max-height with
  ``overflow:hidden``, ``transform:scale(0)`` (css-zero-size), ``opacity:0``, a transparent
  colour (css-transparent), text colour equal to the background it sits on, white on the
  default white page included (css-same-colour), large negative offsets or text-indent
  (css-off-screen), ``clip:rect(0...)`` / ``clip-path:inset(50%)`` (css-clipped);
* classes hidden by a ``<style>`` rule of the page (css-class-rule) or by the usual
  utility names such as ``sr-only``, ``visually-hidden``, ``d-none`` (hidden-class);
* the ``hidden`` attribute (hidden-attribute), ``<template>`` (template), the body of a
  closed ``<details>`` (closed-details), ``<noscript>`` (noscript), non-JavaScript
  ``<script>`` data such as JSON-LD (script-data), ``<input type=hidden>`` values
  (hidden-input);
* the page ``<title>``, shown in the browser tab only, unless a heading repeats it
  (title-element);
* HTML comments (comment), attribute text: ``alt``, ``title``, ``aria-label``,
  ``aria-description``, ``placeholder`` (attribute), ``<meta content>`` (meta);
* text an extractor may drop or a browser draws without it being page text: inline SVG
  ``<text>``, ``<title>`` and ``<desc>`` (svg-text), ``<input value>``, ``<textarea>`` and
  ``<iframe srcdoc>`` (form-value), CSS ``content:`` strings (css-content), sentences in
  ``data-*`` attributes (data-attribute).

The text extractor keeps some of these and drops others; either way each piece is
scanned, and the caller looks for each finding's text in the extracted text to say whether
it reaches the index. Hidden text with nothing aimed at a model is not a finding: hidden
menus, cookie banners and screen-reader labels are ordinary.

Work is bounded: XPath selects only elements that can hide text, at most
:data:`MAX_NODES` of each kind are read and at most :data:`MAX_CHARS` characters collected.
"""

from __future__ import annotations

import itertools
import re
from dataclasses import dataclass

import lxml.etree

MAX_NODES = 2_000
MAX_CHARS = 400_000
MAX_CSS = 200_000
MAX_LINKS = 400

UTILITY_HIDDEN = frozenset({
    "sr-only", "visually-hidden", "visuallyhidden", "screen-reader-text", "screenreader-only",
    "screen-reader-only", "hidden", "d-none", "hide", "is-hidden", "invisible", "offscreen",
    "off-screen", "u-hidden", "u-visually-hidden", "element-invisible", "a11y-hidden"})
_RESPONSIVE_SHOW = re.compile(r"^(?:d-(?:sm|md|lg|xl|xxl)-(?:block|flex|inline|grid|table)|"
                              r"(?:sm|md|lg|xl):(?:block|flex|inline|grid))")
NAMED = {"white": (255, 255, 255), "black": (0, 0, 0), "snow": (255, 250, 250),
         "whitesmoke": (245, 245, 245), "ivory": (255, 255, 240), "ghostwhite": (248, 248, 255),
         "floralwhite": (255, 250, 240), "seashell": (255, 245, 238), "mintcream": (245, 255, 250),
         "azure": (240, 255, 255), "aliceblue": (240, 248, 255), "linen": (250, 240, 230),
         "honeydew": (240, 255, 240), "lavenderblush": (255, 240, 245), "beige": (245, 245, 220),
         "oldlace": (253, 245, 230), "silver": (192, 192, 192), "gray": (128, 128, 128),
         "grey": (128, 128, 128), "red": (255, 0, 0), "green": (0, 128, 0),
         "blue": (0, 0, 255), "yellow": (255, 255, 0), "navy": (0, 0, 128),
         "lightgray": (211, 211, 211), "lightgrey": (211, 211, 211)}
WHITE = (255, 255, 255)

_DISPLAY_NONE = re.compile(r"(?:^|;)display:none\b")
_VISIBILITY = re.compile(r"(?:^|;)visibility:(?:hidden|collapse)\b")
_OPACITY = re.compile(r"(?:^|;)(?:opacity|filter:opacity\()\s*:?(0?\.0\d*|0)(?:%|\)|;|$|!)")
_FONT_ZERO = re.compile(r"(?:^|;)font-size:(?:0(?:\.\d+)?|0?\.\d+)(?:px|pt|em|rem|%|vw|vh)?"
                        r"(?:;|$|!)|(?:^|;)font-size:1px\b")
_ZERO_BOX = re.compile(r"(?:^|;)(?:width|height|max-height|max-width):0(?:px|em|rem|%)?(?:;|$|!)")
_ONE_BOX = re.compile(r"(?:^|;)(?:width|height):1px(?=;|$|!)")
_OVERFLOW_HIDDEN = re.compile(r"(?:^|;)overflow(?:-[xy])?:hidden\b")
_SCALE_ZERO = re.compile(r"(?:^|;)transform:scale[xy]?\(0(?:\.0+)?\)")
_OFFSET = re.compile(r"(?:^|;)(?:left|top|right|bottom|margin-left|margin-top|text-indent)"
                     r":-(\d{3,}|\d{2,}(?:em|rem|vw|vh|%))")
_CLIP = re.compile(r"(?:^|;)clip:rect\(0(?:px)?,?0(?:px)?|(?:^|;)clip-path:(?:inset\((?:50|100)%"
                   r"|circle\(0)")
_COLOR = re.compile(r"(?:^|;)color:([^;!]{1,60})")
_BACKGROUND = re.compile(r"(?:^|;)background(?:-color)?:([^;!]{1,80})")
_RGB = re.compile(r"rgba?\(\s*(\d{1,3})[\s,]+(\d{1,3})[\s,]+(\d{1,3})(?:[\s,/]+([\d.]+%?))?\s*\)")
_HEX = re.compile(r"#([0-9a-f]{3,8})\b")
_CSS_COMMENT = re.compile(r"/\*.{0,20000}?\*/", re.S)
_SIMPLE_SELECTOR = re.compile(r"([.#])([A-Za-z_][\w-]{0,80})\s*$")


@dataclass
class Piece:
    text: str
    technique: str
    where: str  # a short description a reviewer can find in the source


def parse_colour(value: str) -> tuple[int, int, int] | str | None:
    """An RGB triple, "transparent", or None when the value is not understood."""
    value = value.strip().lower()
    if value in ("transparent",):
        return "transparent"
    if value in NAMED:
        return NAMED[value]
    m = _RGB.search(value)
    if m:
        alpha = m.group(4)
        if alpha is not None:
            a = float(alpha[:-1]) / 100 if alpha.endswith("%") else float(alpha)
            if a <= 0.05:
                return "transparent"
        return tuple(min(255, int(g)) for g in m.groups()[:3])  # type: ignore[return-value]
    m = _HEX.search(value)
    if m:
        h = m.group(1)
        if len(h) in (3, 4):
            if len(h) == 4 and h[3] == "0":
                return "transparent"
            return tuple(int(c * 2, 16) for c in h[:3])  # type: ignore[return-value]
        if len(h) in (6, 8):
            if len(h) == 8 and int(h[6:8], 16) <= 12:
                return "transparent"
            return tuple(int(h[i:i + 2], 16) for i in (0, 2, 4))  # type: ignore[return-value]
    return None


def _close(a: tuple[int, int, int], b: tuple[int, int, int]) -> bool:
    return all(abs(x - y) <= 16 for x, y in zip(a, b))


def _compact(style: str) -> str:
    return re.sub(r"\s+", "", style.lower())[:2000]


def style_technique(style: str) -> str | None:
    """The hiding technique an inline style (or CSS declaration block) uses, if any."""
    s = _compact(style)
    if not s:
        return None
    if _DISPLAY_NONE.search(s):
        return "css-display-none"
    if _VISIBILITY.search(s):
        return "css-visibility-hidden"
    if _OPACITY.search(s):
        return "css-transparent"
    m = _COLOR.search(s)
    if m and parse_colour(m.group(1)) == "transparent":
        return "css-transparent"
    if _FONT_ZERO.search(s) or _SCALE_ZERO.search(s):
        return "css-zero-size"
    if _OVERFLOW_HIDDEN.search(s) and (_ZERO_BOX.search(s) or len(_ONE_BOX.findall(s)) >= 2):
        return "css-zero-size" if _ZERO_BOX.search(s) else "css-clipped"
    if _CLIP.search(s):
        return "css-clipped"
    m = _OFFSET.search(s)
    if m:
        number = re.match(r"\d+", m.group(1))
        unit_px = m.group(1).isdigit()
        if number and (int(number.group()) >= (500 if unit_px else 50)):
            return "css-off-screen"
    return None


def _colours(style: str) -> tuple[object, object]:
    s = _compact(style)
    fg = _COLOR.search(s)
    bg = _BACKGROUND.search(s)
    return (parse_colour(fg.group(1)) if fg else None,
            parse_colour(bg.group(1)) if bg else None)


def _css_rules(root: lxml.etree._Element) -> tuple[set[str], set[str], object]:
    """Classes and ids a page's own ``<style>`` hides, and the page background."""
    classes: set[str] = set()
    ids: set[str] = set()
    page_bg: object = None
    css = "".join(root.xpath("//style/text()"))[:MAX_CSS]
    if not css:
        return classes, ids, page_bg
    css = _CSS_COMMENT.sub(" ", css)
    depth = 0
    skip_depth = None
    start = 0
    selector = ""
    for m in re.finditer(r"[{}]", css):
        if m.group() == "{":
            head = css[start:m.start()].strip()
            depth += 1
            if head.startswith("@"):
                if skip_depth is None and not head.lower().startswith("@supports"):
                    skip_depth = depth
            else:
                selector = head
            start = m.end()
        else:
            body = css[start:m.start()]
            if skip_depth is None and selector:
                technique = style_technique(body)
                for part in selector.split(","):
                    part = part.strip()
                    if technique:
                        sm = _SIMPLE_SELECTOR.search(part.split(":")[0])
                        if sm:
                            (classes if sm.group(1) == "." else ids).add(sm.group(2))
                    if part.lower() in ("body", "html"):
                        _, bg = _colours(body)
                        if bg is not None:
                            page_bg = bg
            if skip_depth is not None and depth == skip_depth:
                skip_depth = None
            depth = max(0, depth - 1)
            selector = ""
            start = m.end()
    return classes, ids, page_bg


def _text_of(el: lxml.etree._Element, limit: int) -> str:
    parts = []
    size = 0
    for piece in el.itertext():
        parts.append(piece)
        size += len(piece)
        if size >= limit:
            break
    return re.sub(r"\s+", " ", "".join(parts)).strip()[:limit]


def _describe(el: lxml.etree._Element) -> str:
    attrs = []
    for key in ("id", "class", "style"):
        value = el.get(key)
        if value:
            attrs.append(f'{key}="{value.strip()[:60]}"')
    if el.get("hidden") is not None:
        attrs.append("hidden")
    tag = el.tag if isinstance(el.tag, str) else "?"
    return f"<{tag}{' ' if attrs else ''}{' '.join(attrs)}>"


def _background(el: lxml.etree._Element, page_bg: object) -> object:
    node = el
    steps = 0
    while node is not None and steps < 200:
        style = node.get("style")
        if style:
            _, bg = _colours(style)
            if bg is not None and bg != "transparent":
                return bg
        bgcolor = node.get("bgcolor")
        if bgcolor:
            c = parse_colour(bgcolor)
            if c is not None:
                return c
        node = node.getparent()
        steps += 1
    return page_bg if page_bg is not None else WHITE


def _foreground(el: lxml.etree._Element) -> object:
    style = el.get("style")
    if style:
        fg, _ = _colours(style)
        if fg is not None:
            return fg
    if el.tag == "font" and el.get("color"):
        return parse_colour(el.get("color") or "")
    return None


def _own_technique(el: lxml.etree._Element, hidden_classes: set[str], hidden_ids: set[str],
                   page_bg: object) -> str | None:
    tag = el.tag
    if not isinstance(tag, str):
        return None
    if tag == "template":
        return "template"
    if tag == "noscript":
        return "noscript"
    if el.get("hidden") is not None:
        return "hidden-attribute"
    style = el.get("style")
    if style:
        technique = style_technique(style)
        if technique:
            return technique
    classes = (el.get("class") or "").split()
    if classes:
        if any(c in hidden_classes for c in classes):
            return "css-class-rule"
        if any(c.lower() in UTILITY_HIDDEN for c in classes) and \
                not any(_RESPONSIVE_SHOW.match(c) for c in classes):
            return "hidden-class"
    if el.get("id") and el.get("id") in hidden_ids:
        return "css-class-rule"
    fg = _foreground(el)
    if fg is not None and fg != "transparent" and isinstance(fg, tuple):
        bg = _background(el, page_bg)
        if isinstance(bg, tuple) and _close(fg, bg):
            return "css-same-colour"
    return None


_CSS_CONTENT = re.compile(r"\bcontent\s*:\s*([\"'])(.{8,2000}?)(?<!\\)\1", re.S)


def _css_texts(root: lxml.etree._Element) -> list[str]:
    """Style sheets and style attributes that set generated content, bounded."""
    out = []
    size = 0
    for text in root.xpath("//style/text()|//@style")[:MAX_NODES]:
        text = str(text)
        if "content" in text:
            out.append(text[:MAX_CSS])
            size += len(out[-1])
            if size >= MAX_CSS:
                break
    return out


# Elements whose queries below are skipped when a page has none ("{*}svg": in any
# namespace or none, as local-name() matches).
_RARE_TAGS = ("template", "noscript", "font", "details", "input", "textarea", "iframe", "{*}svg")


@dataclass
class Collected:
    pieces: list[Piece]
    links: list[tuple[str, ...]]  # (url, kind[, words of its paragraph]) for exfil
    hidden_chars: int


def collect(root: lxml.etree._Element | None) -> Collected:
    """Every piece of hidden or unrendered text in a page, with its technique."""
    if root is None:
        return Collected([], [], 0)
    hidden_classes, hidden_ids, page_bg = _css_rules(root)
    # Which of the rarer elements the page has at all (one walk in C, no element objects
    # made for the others): a query for an element the page lacks is skipped unasked.
    present = {el.tag.rpartition("}")[2] if el.tag.startswith("{") else el.tag
               for el in root.iter(*_RARE_TAGS)}
    pieces: list[Piece] = []
    budget = [MAX_CHARS]
    hidden_chars = 0

    def add(text: str, technique: str, where: str) -> None:
        nonlocal hidden_chars
        text = text.strip()
        if not text or budget[0] <= 0:
            return
        text = text[:budget[0]]
        budget[0] -= len(text)
        hidden_chars += len(text)
        pieces.append(Piece(text, technique, where))

    # Elements that hide their whole subtree.
    queries = [q for q, tag in (("//template", "template"), ("//noscript", "noscript"),
                                ("//*[@hidden]", None), ("//*[@style]", None),
                                ("//font[@color]", "font"),
                                ("//details[not(@open)]", "details")) if tag is None or
               tag in present]
    queries.append("//*[@class]")  # checked in Python: cheaper than XPath string tests
    if hidden_ids:
        ids = sorted(hidden_ids)[:80]
        queries.append("//*[" + " or ".join(f"@id='{i}'" for i in ids if "'" not in i) + "]")
    candidates: list[lxml.etree._Element] = []
    for query in queries:
        try:
            found = root.xpath(query)
        except lxml.etree.XPathError:
            continue
        candidates.extend(found[:MAX_NODES])
    # Decide each candidate first, then keep only the outermost hidden ones.
    decided: dict[lxml.etree._Element, str] = {}
    details: list[lxml.etree._Element] = []
    seen: set[lxml.etree._Element] = set()
    for el in candidates:
        if el in seen:
            continue
        seen.add(el)
        if el.tag == "details":
            details.append(el)
            continue
        technique = _own_technique(el, hidden_classes, hidden_ids, page_bg)
        if technique is not None:
            decided[el] = technique
    for el in [*decided, *details]:
        if any(a in decided for a in el.iterancestors()):
            continue
        if el.tag == "details" and el not in decided:
            text = " ".join(_text_of(child, 20_000) + (child.tail or "")
                            for child in el if child.tag != "summary")
            text = (el.text or "") + " " + text
            if text.strip():
                add(re.sub(r"\s+", " ", text), "closed-details", _describe(el))
            continue
        add(_text_of(el, 50_000), decided[el], _describe(el))
    # Comments, attribute text, meta content, non-JavaScript script data, hidden inputs.
    # root.iter, not XPath: libxml2's //comment() is quadratic in the number of siblings.
    for comment in itertools.islice(root.iter(lxml.etree.Comment), MAX_NODES):
        add(comment.text or "", "comment", "<!-- comment -->")
    for value in root.xpath("//@alt|//@title|//@aria-label|//@aria-description|"
                            "//@placeholder|//@aria-roledescription")[:MAX_NODES]:
        if len(value) >= 12:
            add(str(value), "attribute", f"{value.attrname}= on <{value.getparent().tag}>")
    for value in root.xpath("//input[translate(@type,'HIDEN','hiden')='hidden']/@value"
                            )[:MAX_NODES] if "input" in present else ():
        add(str(value), "hidden-input", "<input type=hidden>")
    for meta in root.xpath("//meta[@content]")[:MAX_NODES]:
        content = meta.get("content") or ""
        key = meta.get("name") or meta.get("property") or meta.get("itemprop") or ""
        if content.count(" ") >= 2 and key.lower() not in ("viewport", "robots"):
            add(content, "meta", f"<meta {('name=' + key[:40]) if key else ''}>")
    headings: dict[str, None] = {}  # the first 30 headings' texts, read as far as needed
    heading_els = itertools.islice(root.iter("h1", "h2", "h3"), 30)
    for el in root.xpath("//title[not(ancestor::*[local-name()='svg'])]")[:3]:
        title = _text_of(el, 2_000)
        words = " ".join(title.split())
        while words not in headings:
            heading = next(heading_els, None)
            if heading is None:
                break
            headings[" ".join(_text_of(heading, 2_000).split())] = None
        if words not in headings:  # a title the page shows is no secret
            add(title, "title-element", "the page <title> (shown in the browser tab)")
    for el in root.xpath("//*[local-name()='svg']//*[local-name()='text' or "
                         "local-name()='title' or local-name()='desc']")[:MAX_NODES] \
            if "svg" in present else ():
        add(_text_of(el, 20_000), "svg-text", f"<svg> <{el.tag}>")
    for value in root.xpath("//input[not(translate(@type,'HIDEN','hiden')='hidden')]/@value|"
                            "//textarea/text()|//iframe/@srcdoc")[:MAX_NODES] \
            if present & {"input", "textarea", "iframe"} else ():
        if len(value) >= 12:
            add(str(value), "form-value", f"<{value.getparent().tag}> value")
    for value in root.xpath("//@*[starts-with(name(), 'data-')]")[:MAX_NODES]:
        text = str(value)
        if text.count(" ") >= 3 and not text.lstrip().startswith(("{", "[")):
            add(text, "data-attribute", f"{value.attrname}= on <{value.getparent().tag}>")
    for css in _css_texts(root):
        for m in _CSS_CONTENT.finditer(css):
            add(m.group(2), "css-content", "CSS content: property")
    for script in root.xpath("//script[@type]")[:MAX_NODES]:
        kind = (script.get("type") or "").lower()
        if "javascript" in kind or kind in ("module", "text/ecmascript", ""):
            continue
        add(script.text or "", "script-data", f"<script type={kind[:40]}>")
    links: list[tuple[str, ...]] = []
    for value in root.xpath("//@href|//@src|//@action|//@data|//@srcset")[:MAX_LINKS * 5]:
        v = str(value)
        if "?" in v or "{" in v or "%7" in v or "[" in v or "$" in v:
            el = value.getparent()
            tag = el.tag
            kind = "image" if tag in ("img", "source", "embed", "video", "picture") else "link"
            holder = el.getparent() if v.endswith("=") else None
            if holder is not None:  # a slot: the words of its paragraph say what goes in
                links.append((v[:4096], kind, _text_of(holder, 600)))
            else:
                links.append((v[:4096], kind))
            if len(links) >= MAX_LINKS:
                break
    return Collected(pieces, links, hidden_chars)


# Markdown that renders without showing some of its text: the title of a link or image
# (shown only on hover), and the title of a link reference definition (the definition line
# is not rendered at all).
_MD_TITLE = re.compile(r"\]\(\s*<?[^)\s>]{1,2048}>?\s+(?:\"([^\"\n]{8,400})\"|'([^'\n]{8,400})')"
                       r"\s*\)")
_MD_REFERENCE = re.compile(r"^ {0,3}\[[^\]\n]{1,100}\]:\s*<?\S{1,2048}>?\s+(?:\"([^\"\n]{8,400})\"|"
                           r"'([^'\n]{8,400})'|\(([^()\n]{8,400})\))[ \t]*$", re.M)
MAX_MARKDOWN_PIECES = 200


def markdown_pieces(text: str) -> list[tuple[str, str, str]]:
    """``(text, where, technique)`` for each Markdown link title and reference-definition
    title of ``text`` (see above); at most :data:`MAX_MARKDOWN_PIECES`."""
    out: list[tuple[str, str, str]] = []
    if "](" in text:
        for m in _MD_TITLE.finditer(text[:MAX_CHARS]):
            out.append((m.group(1) or m.group(2),
                        "the title of a Markdown link (shown only on hover)", "link-title"))
            if len(out) >= MAX_MARKDOWN_PIECES:
                return out
    if "]:" in text:
        for m in _MD_REFERENCE.finditer(text[:MAX_CHARS]):
            out.append((m.group(1) or m.group(2) or m.group(3),
                        "the title of a Markdown link reference definition (not rendered)",
                        "link-title"))
            if len(out) >= MAX_MARKDOWN_PIECES:
                break
    return out
