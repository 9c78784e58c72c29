"""HTML documents: decoding, one lxml parse, text by trafilatura, metadata from the head.

The page is decoded here (BOM, then the declared charset, then detection), parsed once
with lxml and the same tree is handed to trafilatura, so the text, the metadata and the
raw view the injection screen reads all come from one parse. Dates are taken only from
explicit meta tags; htmldate's guessing from URLs and body text is not used, because a
freshness decision must be explainable ("the page's article:modified_time says ...").

A page nested deeper than ``limits.max_nesting`` is refused: libxml2 silently drops every
element past depth ~255 (and past ~2,048 with ``huge_tree``), including everything after
the deep part, so extracted text would not be the page.
"""

from __future__ import annotations

import codecs
import dataclasses
import hashlib
import re
from bisect import bisect_right
from collections import OrderedDict
from collections.abc import Sequence
from dataclasses import dataclass

import lxml.etree
import lxml.html
import trafilatura

from gate.extract.model import (Block, DateClaim, Extracted, Extraction, failed,
                                line_hashes, row_cells)
from gate.extract.text import clean_text, decode
from gate.tokens import block_hash

_META_CHARSET = re.compile(
    rb"""<meta[^>]+?charset\s*=\s*["']?\s*([A-Za-z0-9_.:-]+)""", re.I)
# WHATWG Encoding Standard: these labels all mean windows-1252 in a browser.
_WINDOWS_1252_LABELS = {"iso-8859-1", "iso8859-1", "latin1", "latin-1", "l1", "ascii",
                        "us-ascii", "iso_8859-1", "cp819", "ibm819", "windows-1252", "cp1252"}

# Meta tags read for dates, as (attribute, value, role); the first found per role wins.
DATE_META = (
    ("property", "article:published_time", "published"),
    ("itemprop", "datepublished", "published"),
    ("name", "dcterms.created", "published"),
    ("name", "dc.date.issued", "published"),
    ("name", "dc.date", "published"),
    ("name", "date", "published"),
    ("property", "article:modified_time", "modified"),
    ("property", "og:updated_time", "modified"),
    ("itemprop", "datemodified", "modified"),
    ("name", "dcterms.modified", "modified"),
    ("http-equiv", "last-modified", "modified"),
)
_SKIP_TEXT = {"script", "style", "noscript", "template", "head", "title"}
_BLOCKS = {"p", "div", "br", "li", "h1", "h2", "h3", "h4", "h5", "h6", "tr", "section",
           "article", "table", "ul", "ol", "blockquote", "pre"}


def declared_charset(data: bytes) -> str | None:
    """The charset a page declares in its first 1024 bytes (WHATWG prescan, simplified)."""
    m = _META_CHARSET.search(data[:1024])
    return m.group(1).decode("ascii").lower() if m else None


def decode_html(data: bytes, encoding: str | None) -> tuple[str, str, str | None, bool] | None:
    """Decode a page; returns (text, encoding used, declared charset, declaration lied)."""
    if encoding is not None:  # a byte-order mark outranks any declaration
        decoded = decode(data, encoding)
        return (decoded[0], decoded[1], None, False) if decoded else None
    declared = declared_charset(data)
    if declared:
        label = "cp1252" if declared in _WINDOWS_1252_LABELS else declared
        try:
            codecs.lookup(label)
        except LookupError:
            label = None
        if label:
            try:
                return data.decode(label), label, declared, False
            except UnicodeDecodeError:
                if label == "cp1252":  # five bytes are undefined in cp1252; latin-1 has them
                    return data.decode("latin-1"), "latin-1", declared, False
    decoded = decode(data)
    if decoded is None:
        return None
    text, used = decoded
    return text, used, declared, bool(declared) and codecs.lookup(used).name != \
        _lookup_name(declared)


def _lookup_name(label: str) -> str:
    try:
        return codecs.lookup("cp1252" if label in _WINDOWS_1252_LABELS else label).name
    except LookupError:
        return label


def max_depth(root: lxml.etree._Element) -> int:
    """Deepest element nesting below ``root``, ``root`` at depth 1 (comments count as
    elements, as processing instructions would; iterative: no recursion limit)."""
    deepest = depth = 0
    for event, _node in lxml.etree.iterwalk(root, events=("start", "end", "comment", "pi")):
        if event == "start":
            depth += 1
            if depth > deepest:
                deepest = depth
        elif event == "end":
            depth -= 1
        elif depth >= deepest:  # a comment or processing instruction: a leaf below depth
            deepest = depth + 1
    return deepest


def _meta_dates(root: lxml.etree._Element) -> tuple[DateClaim, ...]:
    found: dict[str, DateClaim] = {}
    metas = [m for m in root.iter("meta")]
    for attr, value, role in DATE_META:
        if role in found:
            continue
        for meta in metas:
            if (meta.get(attr) or "").strip().lower() == value:
                content = (meta.get("content") or "").strip()
                if content:
                    found[role] = DateClaim(role, f"meta {value}", content[:200])
                    break
    return tuple(found[r] for r in ("published", "modified") if r in found)


def _first(root: lxml.etree._Element, xpath: str) -> str | None:
    values = root.xpath(xpath)
    for value in values:
        value = str(value).strip()
        if value:
            return value[:2000]
    return None


def fallback_text(root: lxml.etree._Element) -> str:
    """Body text without scripts, styles, templates or comments.

    Used only when trafilatura returns nothing (it does so for short pages), so a short
    but real page is not mistaken for an empty one.
    """
    body = root.find("body")
    start = body if body is not None else root
    parts: list[str] = []
    skip = 0
    for event, node in lxml.etree.iterwalk(start, events=("start", "end")):
        skipped = not isinstance(node.tag, str) or node.tag in _SKIP_TEXT
        if event == "start":
            if skipped:
                skip += 1
            elif skip == 0 and node.text:
                parts.append(node.text)
            continue
        if skipped:
            skip -= 1
        if skip == 0:
            if node.tag in _BLOCKS:
                parts.append("\n")
            if node.tail and node is not start:
                parts.append(node.tail)
    return re.sub(r"[ \t]+", " ", "".join(parts))


# Elements that start a new block of their own (HTML's block-level and sectioning content,
# list items, table cells, headings).
_PAGE_BLOCKS = _BLOCKS | {"td", "th", "dt", "dd", "li", "nav", "aside", "header", "footer",
                          "main", "figure", "figcaption", "form", "fieldset", "details",
                          "summary", "dl", "address", "hr", "caption", "legend", "option",
                          "label", "button", "menu"}


_KINDS = {"h1": "heading", "h2": "heading", "h3": "heading", "h4": "heading",
          "h5": "heading", "h6": "heading", "li": "item", "dt": "item", "dd": "item",
          "td": "cell", "th": "cell", "caption": "cell"}


def page_blocks(root: lxml.etree._Element, main_text: str) -> tuple[Block, ...]:
    """Every block of the page's body in document order, the template included.

    A block is the inline text between block boundaries (paragraph, heading, list item,
    table cell, ...); ``links`` is the share of its characters inside ``<a>``, ``kind``
    what holds it, and ``main`` says whether trafilatura kept a line with the same words
    in ``main_text``.
    """
    found = _walk(root)
    return _marked(found, _line_digests(main_text, found))


# each block's text, hash, links, kind, lead and markup (its holder's tag and class, after
# those of the block element holding that: "article>p", "div.ad>p")
Walked = list[tuple[str, int, float, str, float, str]]


def _line_digests(text: str, found: Walked) -> list[int | None]:
    """Each line's block hash (a line that is a block's text verbatim takes its hash)."""
    known = {block: digest for block, digest, *_rest in found}
    return [known.get(line.strip()) or block_hash(line) for line in text.split("\n")]


def _marked(found: Walked, digests: list[int | None]) -> tuple[Block, ...]:
    """The walk's blocks, ``main`` where a line of the main text (its ``digests``) has
    the same words."""
    main = set(digests)
    return tuple(Block(text=text, hash=digest, main=digest in main, links=links, kind=kind,
                       lead=lead, markup=markup)
                 for text, digest, links, kind, lead, markup in found)


def _walk(root: lxml.etree._Element) -> Walked:
    """The blocks of the page's body in document order (see :func:`page_blocks`)."""
    body = root.find("body")
    start = body if body is not None else root
    found: Walked = []
    parts: list[str] = []
    holders: list[str] = ["body"]
    marks: list[str] = ["", "body"]  # the holders' tags with their classes
    linked = 0
    in_link = 0
    in_pre = 0
    away: list[bool] = []  # for each open <a>: does it lead to another page?
    lead = 0  # characters at the block's start inside links to another page
    unlinked = False  # whether the block has had text outside such a link yet
    skip = 0

    def flush() -> None:
        nonlocal linked, lead, unlinked
        if not parts:  # nothing since the last boundary (then nothing was linked either)
            return
        raw = "".join(parts)
        parts.clear()
        kind = _KINDS.get(holders[-1], "text")
        # preformatted text is a block per line, as trafilatura writes it
        pieces = raw.split("\n") if in_pre else (raw,)
        for piece in pieces:
            # runs of white space as one space, trimmed (str.split's white space is re's \s)
            text = " ".join(piece.split())
            if text:
                digest = block_hash(text)
                if digest is not None:
                    found.append((text, digest, round(min(1.0, linked / len(text)), 3), kind,
                                  round(min(1.0, lead / len(text)), 3)
                                  if len(pieces) == 1 else 0.0, f"{marks[-2]}>{marks[-1]}"))
        linked = lead = 0
        unlinked = False

    def add(text: str) -> None:
        nonlocal linked, lead, unlinked
        parts.append(text)
        if in_link:
            linked += len(text.strip())
        if not unlinked:
            if any(away):
                lead += len(text.strip())
            elif text.strip():
                unlinked = True

    # the walk inlines what it adds (a call per node costs more than the work)
    for event, node in lxml.etree.iterwalk(start, events=("start", "end")):
        tag = node.tag
        if tag.__class__ is not str or tag in _SKIP_TEXT:  # comments, scripts, ...
            if event == "start":
                skip += 1
            else:
                skip -= 1
                if skip == 0 and node is not start:
                    text = node.tail
                    if text:
                        add(text)
            continue
        if skip:
            continue
        if event == "start":
            if tag in _PAGE_BLOCKS:
                if parts:
                    flush()
                holders.append(tag)
                classes = node.get("class")
                marks.append(f"{tag}.{' '.join(sorted(classes.split()))}" if classes else tag)
                if tag == "pre":
                    in_pre += 1
            if tag == "a":
                in_link += 1
                href = (node.get("href") or "").strip()
                away.append(bool(href) and "#" not in href)  # not to a place in a page
            text = node.text
        else:
            if tag == "a":
                in_link -= 1
                if away:
                    away.pop()
            if tag in _PAGE_BLOCKS:
                if parts:
                    flush()
                holders.pop()
                marks.pop()
                if tag == "pre":
                    in_pre -= 1
            if node is start:
                continue
            text = node.tail
        if text:
            add(text)
    flush()
    return found


def complete_main(text: str, blocks: tuple[Block, ...], digests: list[int | None] | None = None
                  ) -> tuple[str, tuple[Block, ...]]:
    """trafilatura's text with the headings, list items and table cells it dropped inside
    the stretch of the page it chose (and those right before and after it: a title, a
    closing list or table), so a heading, a list or a table counts in HTML as it does in
    PDF, text and Markdown.

    Only when every line trafilatura wrote is one of the page's blocks, or a table row of
    them (so each line has a place in the page); otherwise its text is kept as it is.
    ``digests``: the block hash of each line of ``text``, when already known.
    """
    where: dict[int, list[int]] = {}  # a hash's places among the blocks, ascending
    known: dict[str, int] = {}  # a block's text: its hash (a line that is one takes it)
    for i, block in enumerate(blocks):
        where.setdefault(block.hash, []).append(i)
        known[block.text] = block.hash
    placed: list[tuple[int, int, str]] = []
    covered: set[int] = set()
    cursor = -1
    lines = text.split("\n")
    if digests is None:
        digests = [known.get(line.strip()) or block_hash(line) for line in lines]
    for order, (line, digest) in enumerate(zip(lines, digests)):
        if digest is None:
            continue
        parts = [digest] if digest in where else row_cells(line)
        if not parts or any(part not in where for part in parts):
            return text, blocks
        # the first place after the cursor, else the first place
        places = where[parts[0]]
        after = bisect_right(places, cursor)
        position = places[after] if after < len(places) else places[0]
        cursor = max(cursor, position)
        placed.append((position, order, line))
        covered.update(parts)
    if not placed:
        return text, blocks
    first = min(p for p, _o, _l in placed)
    last = max(p for p, _o, _l in placed)
    while first > 0 and blocks[first - 1].kind == "heading" and \
            blocks[first - 1].links < 0.5:
        first -= 1
    # a closing list or table, up to the first heading after it: a heading there opens
    # a section of its own (an aside's "Trending", "Comments"), no part of this text
    while last + 1 < len(blocks) and blocks[last + 1].kind not in ("text", "heading") and \
            blocks[last + 1].links < 0.5:
        last += 1
    added = [i for i in range(first, last + 1) if blocks[i].hash not in covered and
             blocks[i].kind != "text" and blocks[i].links < 0.5]
    if not added:
        return text, blocks
    main = covered | {blocks[i].hash for i in added}
    kept = tuple(b if b.main == (b.hash in main) else
                 dataclasses.replace(b, main=b.hash in main) for b in blocks)
    lines = sorted(placed + [(i, -1, blocks[i].text) for i in added])
    return "\n".join(line for _p, _o, line in lines), kept


TEASER_MIN_CARDS = 3  # cards in a row that make a teaser list
TITLE_MAX_WORDS = 20  # a teaser's linked title is short ...
SNIPPET_MAX_WORDS = 80  # ... and so is the snippet under it
SNIPPET_MIN_WORDS = 3
BYLINE_MAX_WORDS = 6  # a date or a byline between a teaser's title and its snippet
LIST_HEADING_MAX_WORDS = 6  # "Related articles", "More things to do", "See also"
PAGE_MIN_WORDS = 15  # fewer left without the teaser lists: the lists are the page
LINKED = 0.5  # a block with this share of linked characters is a link (of a site map)


def _card(blocks: Sequence[Block], i: int, sizes: Sequence[int]) -> int:
    """The number of blocks of a teaser card starting at ``blocks[i]`` (0: none): a title
    that is wholly a link to another page followed by a short unlinked snippet (or by a
    date or a byline and a snippet; a snippet is a paragraph, never a heading nor a term's
    definition), or a list item that begins with such a link and goes on unlinked ("Title
    - snippet ...": negative, such cards count only in a run of ``TEASER_MIN_CARDS``).
    ``sizes``: each block's number of words."""
    block = blocks[i]
    size = sizes[i]
    if block.lead >= 0.9 and size <= TITLE_MAX_WORDS:
        def snippet(j: int, least: int) -> bool:  # not a heading, nor a term's definition
            return j < len(blocks) and blocks[j].links < 0.5 and blocks[j].lead == 0 and \
                blocks[j].kind == "text" and least <= sizes[j] <= SNIPPET_MAX_WORDS

        if snippet(i + 1, 1) and sizes[i + 1] <= BYLINE_MAX_WORDS and \
                snippet(i + 2, SNIPPET_MIN_WORDS):
            return 3  # a title, a date or a byline, a snippet
        if snippet(i + 1, SNIPPET_MIN_WORDS):
            return 2
    if block.kind == "item" and 0.05 <= block.lead < 0.9 and block.links < 0.6 and \
            SNIPPET_MIN_WORDS + 1 <= size <= SNIPPET_MAX_WORDS + TITLE_MAX_WORDS:
        return -1  # a list item: counts in a run of TEASER_MIN_CARDS only
    return 0


def teaser_lists(blocks: Sequence[Block]) -> set[int]:
    """Indices of the blocks in teaser lists: runs of at least ``TEASER_MIN_CARDS`` cards
    (see :func:`_card`) one after the other, or with links between them (a site map's
    columns with a teaser card here and there) -- "related articles", "see also", "more
    things to do", "other notices", "similar threads" -- with the short heading right before a
    run; a shorter run only between a short heading of its own and another short block,
    a link or the end of the page. Each card quotes another page, so the list is
    navigation whatever its words are, and it differs from page to page, so learning a
    site's template cannot name it."""
    found: set[int] = set()
    sizes = [len(block.text.split()) for block in blocks]  # words, counted once
    i = 0
    while i < len(blocks):
        start, cards, items = i, 0, 0
        end = i  # after the last card
        while i < len(blocks):
            size = _card(blocks, i, sizes)
            if size:
                i = end = i + abs(size)
                cards += 1
                items += size < 0
            elif cards and size >= 0 and blocks[i].links >= LINKED:
                i += 1  # a site map's links between the cards ("fat footer")
            else:
                break
        i = end
        if not cards:  # no list starts here
            i = start + 1
            continue
        before = start - 1
        headed = before >= 0 and blocks[before].links < 0.5 and \
            sizes[before] <= LIST_HEADING_MAX_WORDS
        if headed and blocks[before].kind == "heading" and blocks[before].main:
            headed = False  # a heading of the main text (a page's title) is no list's
        # a shorter run counts under a heading of its own ("Related articles") and
        # before another short heading, a link or the end of the page
        closed = i >= len(blocks) or blocks[i].links >= 0.5 or \
            sizes[i] <= LIST_HEADING_MAX_WORDS
        if cards >= TEASER_MIN_CARDS or (not items and headed and closed):
            found.update(range(start, i))
            if headed:
                found.add(before)
        i = max(i, start + 1)
    return found


def without_teasers(text: str, blocks: tuple[Block, ...]) -> tuple[str, tuple[Block, ...]]:
    """``text`` without the lines of the page's teaser lists (:func:`teaser_lists`), the
    blocks marked ``nav``; a line whose words are also a block outside any teaser list
    stays. A page that would keep fewer than ``PAGE_MIN_WORDS`` words keeps its text (the
    lists are the page: an index, a table of contents) and no block is marked."""
    nav = teaser_lists(blocks)
    if not nav:
        return text, blocks
    marked = tuple(dataclasses.replace(b, nav=True, main=False) if i in nav else b
                   for i, b in enumerate(blocks))
    gone = {b.hash for b in marked if b.nav} - {b.hash for b in marked if not b.nav}
    kept = []
    for line, digest in zip(text.split("\n"), line_hashes(text, blocks)):
        cells = [digest] if digest is not None else row_cells(line)
        if cells and all(cell in gone for cell in cells):
            continue
        kept.append(line)
    rest = "\n".join(kept)
    if len(rest.split()) < PAGE_MIN_WORDS:  # the list is the page (an index, a contents)
        return text, blocks
    return rest, marked


def with_title(text: str, blocks: tuple[Block, ...], root: lxml.etree._Element
               ) -> tuple[str, tuple[Block, ...]]:
    """``text`` with the page's title on top when trafilatura left it out: the text of
    the page's one ``<h1>``, when it is a heading block of the page (not a link, not in a
    teaser list) that is nowhere in ``text`` (a forum thread's or a product page's title
    stands in a header of its own, apart from the text below it)."""
    heads = root.xpath("//body//h1")
    if len(heads) != 1:
        return text, blocks
    digest = block_hash(" ".join(heads[0].text_content().split()))
    for i, block in enumerate(blocks):
        # the heading itself (a menu before it may link to the page by the same words)
        if block.hash == digest and block.kind == "heading" and block.links < 0.5 and \
                not block.nav:
            # marked as the title: other pages of the site that quote it are teasers
            title = dataclasses.replace(block, title=True)
            if digest in line_hashes(text, blocks):
                return text, blocks[:i] + (title,) + blocks[i + 1:]
            marked = blocks[:i] + (dataclasses.replace(title, main=True),) + blocks[i + 1:]
            return f"{block.text}\n{text}" if text else block.text, marked
    return text, blocks


@dataclass(frozen=True)
class _Read:
    """What a page's tree gives besides its text: kept between a page's two passes."""

    depth: int
    title: str | None
    canonical: str | None
    lang: str | None
    dates: tuple[DateClaim, ...]
    found: Walked
    size: int  # about how many bytes it holds


# A page of a site is extracted twice in the same run: for its blocks (its site's template
# is not known yet), then again, with the first pass's text, to have the template removed
# and be measured. What the first pass read from the tree is kept here (per process, up to
# about REMEMBERED_BYTES, oldest dropped first) under a digest of the bytes, so the second
# pass parses the page again (the injection screen reads the tree) but neither walks it,
# hashes its blocks nor reads its metadata a second time. Same tree, same values: which
# worker runs the second pass changes nothing but the time it takes.
_remembered: OrderedDict[tuple[bytes, str | None, int], _Read] = OrderedDict()
_remembered_bytes = [0]
BLOCK_OVERHEAD = 200  # bytes of a remembered block besides its text (tuple, int, float)


def _key(data: bytes, encoding: str | None, max_nesting: int) -> tuple[bytes, str | None, int]:
    return hashlib.blake2b(data, digest_size=16).digest(), encoding, max_nesting


def _remember(key: tuple[bytes, str | None, int], read: _Read, budget: int) -> None:
    if read.size > budget:
        return
    while _remembered and _remembered_bytes[0] + read.size > budget:
        _remembered_bytes[0] -= _remembered.popitem(last=False)[1].size
    _remembered[key] = read
    _remembered_bytes[0] += read.size


def _recall(key: tuple[bytes, str | None, int]) -> _Read | None:
    read = _remembered.pop(key, None)
    if read is not None:
        _remembered_bytes[0] -= read.size
    return read


def _read(root: lxml.etree._Element, depth: int) -> _Read:
    """The page's metadata and blocks (see :func:`page_blocks`), from its tree."""
    title = _first(root, "//meta[@property='og:title']/@content") or \
        _first(root, "//title/text()")
    canonical = _first(root, "//link[translate(@rel,'CANONICAL','canonical')='canonical']/@href") \
        or _first(root, "//meta[@property='og:url']/@content")
    lang = _first(root, "/html/@lang")
    found = _walk(root)
    size = sum(len(block[0]) for block in found) + BLOCK_OVERHEAD * len(found)
    return _Read(depth=depth, title=title, canonical=canonical, lang=lang,
                 dates=_meta_dates(root), found=found, size=size)


def extract_html(data: bytes, encoding: str | None, max_nesting: int,
                 main_text: str | None = None, remember: int = 0) -> Extraction:
    """Extract an HTML page (``encoding`` comes from a byte-order mark, if any).

    ``main_text`` is this page's text from an earlier extraction of the same bytes: the
    same result, without running trafilatura again (nor walking the tree again, when the
    earlier extraction in this process was told to ``remember`` it: a budget in bytes for
    all pages remembered)."""
    decoded = decode_html(data, encoding)
    if decoded is None:
        return failed("html", "undecodable",
                      "the page is in no character encoding that could be detected")
    markup, used, declared, mismatch = decoded
    parser = lxml.html.HTMLParser(encoding="utf-8", huge_tree=True, remove_comments=False,
                                  remove_pis=True, no_network=True)
    try:
        root = lxml.html.document_fromstring(markup.encode("utf-8", "surrogatepass"),
                                             parser=parser)
    except (lxml.etree.ParserError, ValueError) as err:
        if not markup.strip():
            return failed("html", "empty-text", "the page holds only white space")
        return failed("html", "broken", f"the HTML could not be parsed ({err})")
    key = _key(data, encoding, max_nesting) if remember or \
        (main_text is not None and _remembered) else None
    read = _recall(key) if key is not None and main_text is not None else None
    depth = read.depth if read is not None else max_depth(root)
    common = dict(type="html", encoding=used, declared_charset=declared,
                  charset_mismatch=mismatch, nesting_depth=depth)
    if depth > max_nesting:
        return failed(problem="too-deep",
                      detail=f"elements are nested {depth} levels deep (limit "
                             f"{max_nesting}); HTML parsers silently drop content past "
                             "about 255 levels, so the extracted text would not be the page",
                      type_="html", **{k: v for k, v in common.items() if k != "type"})
    if main_text is not None:
        text = main_text
    else:
        text = trafilatura.extract(root, include_comments=False, include_tables=True,
                                   deduplicate=False, with_metadata=False) or ""
        if not text.strip():
            text = fallback_text(root)
        text = clean_text(text)
    if read is None:
        read = _read(root, depth)  # trafilatura copies the tree it is given: unchanged
        if remember and key is not None:
            _remember(key, read, remember)
    summary = Extracted(title=read.title, canonical_url=read.canonical,
                        declared_lang=read.lang, dates=read.dates, text_chars=len(text),
                        **common)
    digests = _line_digests(text, read.found)
    text, blocks = without_teasers(*complete_main(text, _marked(read.found, digests), digests))
    text, blocks = with_title(text, blocks, root)
    summary = dataclasses.replace(summary, text_chars=len(text))
    return Extraction(summary=summary, text=text, raw=data, decoded=markup, tree=root,
                      blocks=blocks)
