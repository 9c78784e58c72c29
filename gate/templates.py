"""Site templates: blocks that recur across many pages of one host are not the pages' text.

A page on a heavy site template (a mega-menu, a column of teasers, a long legal footer)
can hold far more template than text of its own; shingled whole, every page of the site
looks like every other, and an extractor that picks the template as the main text makes
distinct pages "identical". This module learns each site's template from the pages the
run can see and removes it before the text is checked, shingled or indexed.

Learning (parent process, pure and deterministic): every extraction comes with the page's
blocks (paragraphs, headings, list items, table cells, link lists; for PDF and text, the
lines), each with a hash of its words (:func:`gate.tokens.block_hash`). Pages are grouped
by the host of their ``source_url`` and their type (an HTML template is learnt from the
host's HTML pages, a PDF running header from its PDFs); the pages of a host are the
batch's plus, in an
incremental run, the stored corpus's (their blocks come from the digest-keyed cache). Pages
with identical block sets count once. On a host with ``n`` distinct pages, a block is
template when it occurs

* on at least ``SHARE_ANY`` of them (and at least ``MIN_PAGES``) wherever it stands, or
* on at least ``SHARE_ASIDE`` of them (and at least ``ASIDE_MIN_PAGES``) and outside
  trafilatura's main text on at least half of those (menus, teasers and footers that vary
  by section, teasers that rotate), or on at least ``SHARE_ROTATING`` of them wherever it
  stands (a forum's stock answers) -- removed from a page only where it sits next to a
  link-dominated or an everywhere-template block, so a stock paragraph that several
  notices of a site share (and that trafilatura missed) is not taken for a teaser. Such
  a run does not cross into or out of a table (a newsletter box above a table of the
  page's own), and a paragraph in trafilatura's main text marked up as the page's
  opening paragraph is (its stock paragraphs, or the opening itself, which teasers on
  other pages quote) is not part of one.

Short lines with numbers, dates and names are counted by their shape (:func:`shape_hash`,
and :func:`titled_hash` for a line naming the page's own title) and go wherever they
stand; the unlinked snippets of teaser lists told on a fifth of the pages are weak
template where a page's list was broken up and its snippets counted;
comments signed at their end by their words without the signature (:func:`signed_hash`),
and each page's title (its ``<h1>``) is learnt so that lists quoting it on other pages
are known for teasers (:func:`_quoting`).

Whatever its share of the pages, a block (not on most of them) that stands on pages of
at least ``RECUR_MIN_DOCS`` distinct documents -- pages sharing half their own blocks are
versions of one document and count once -- is *recurring* (:func:`_recurring`): a
promotion the template rotates through a pool of variants, each on a few pages. It goes
only where it stands out of line with the page's text (:func:`_out_of_line`: a paragraph
marked up unlike the page's own paragraphs, a heading over such a one); a stock sentence
written as the notice's paragraphs are, list items and table cells stay.

A host with fewer than ``MIN_PAGES`` distinct pages teaches nothing: its pages keep
trafilatura's text, as before. On the first run of a new site with three or four pages,
only what is on every page is template. A body shared by a few versions of one page
stays, because a version cluster is much smaller than a site; the exception is a site
whose every page is a version of one document, whose shared body is taken for template
(the versions then keep their own differences only).

Removal (worker, :func:`compose`): the page's template blocks are dropped from
trafilatura's text; when what remains is less than ``MAIN_RATIO`` of that text,
trafilatura chose the template as the main text, and the page's own (non-template, not
link-dominated) blocks are used instead. So they are when trafilatura's text
cannot be laid onto the page's blocks line by line and one of its lines holds two or more
whole blocks (a layout table's cell written as one line: the template cannot be taken out
of it, and its list items and rows have lost their order), or template blocks make up at
least ``TEMPLATE_SHARE`` of it; a text whose lines are pieces of paragraphs (a source that
wraps its lines) is kept as it is otherwise. Either happens only when the page's own
blocks hold at least ``MIN_OWN_WORDS`` words (more than trafilatura's remainder, in the
first case): a table of contents or a page of links keeps its text. When nothing would
remain, the page is kept as extracted. On a page with template blocks, a breadcrumb trail
and a heading trafilatura kept without what it heads (its list of links, an author box
outside the main text: :func:`_orphan_headings`) go too.
"""

from __future__ import annotations

import hashlib
import math
import re
from collections.abc import Iterable, Sequence
from dataclasses import dataclass, field
from typing import Any

import numpy as np

from gate import urls
from gate.extract.model import Block, line_hashes, row_cells
from gate.tokens import block_hash, words

TEMPLATES_VERSION = 23  # part of the cache key: bump when blocks or composition change
MIN_PAGES = 3
ASIDE_MIN_PAGES = 5
SHARE_ANY = 0.8
SHARE_ASIDE = 0.2
SHARE_ROTATING = 0.4  # a block on this share of the pages (and ASIDE_MIN_PAGES), in the
# main text or not, rotates through the template (other answers, popular articles)
BYLINE_MAX_WORDS = 6  # "answered by A. N." between two template blocks is template
MAIN_RATIO = 0.5
TEMPLATE_SHARE = 0.3  # template share of an unplaceable text that makes it give way
MIN_OWN_WORDS = 30  # words of its own a page needs before they replace trafilatura's text
LINK_DOMINATED = 0.5  # a block with this share of linked characters is navigation
SHAPE_MIN_WORDS = 3  # a line with numbers this short (3-30 words) may be a per-page
SHAPE_MAX_WORDS = 30  # template line ("Updated 34 days ago"); a title "Notice 2" is not
SHAPE_CELL_WORDS = 8  # a table cell this long may be such a line (a layout table's footer)
MERGED_MIN_WORDS = 3  # blocks this long found whole in one line make it a merged line
TAGLINE_MAX_WORDS = 12  # template lines this short under the page's title are no text
SANDWICH_MAX = 6  # template blocks in a row kept between two blocks of the page's own
TITLE_MIN_WORDS = 3  # a title this long that another page's list quotes makes a teaser
DATE_MAX_WORDS = 4  # "25 February 2026" after a quoted title: a list of events, of news
RECUR_MIN_DOCS = 3  # a block on this many distinct documents of a host, whatever their
# share of its pages, is template where it stands out of line with the page's text
VERSION_SHARE = 0.5  # two pages sharing this share of their own blocks are versions
VERSION_MAX_PAGES = 16  # a block on more pages than this ties no two pages as versions


def site_of(source_url: str | None) -> str | None:
    """The host pages are grouped by (None without a usable ``source_url``: such a
    document keeps trafilatura's text)."""
    if not source_url:
        return None
    try:
        return urls.parse(source_url).host or None
    except ValueError:
        return None


MONTHS = frozenset(
    "january february march april may june july august september october november "
    "december jan feb mar apr jun jul aug sep sept oct nov dec".split())
# a date's weekday varies with it ("Published Thursday 10 September"); "sun" and "sat"
# are words of their own, so only the full names
WEEKDAYS = frozenset("monday tuesday wednesday thursday friday saturday sunday".split())
DATE_WORDS = MONTHS | WEEKDAYS


_RAW_WORD = re.compile(r"[^\W_]+")


def _named(text: str, count: int) -> list[bool]:
    """Which of a line's ``count`` words are names: capitalised words ("Ada", "Quill")
    after the first, as a reader's or an author's name is written; none when the line's
    raw words do not line up with its normalised ones."""
    raw = _RAW_WORD.findall(text)
    if len(raw) != count:
        return [False] * count
    return [i > 0 and len(w) > 1 and w[0].isupper() and w[1:].islower()
            for i, w in enumerate(raw)]


def shape_hash(text: str) -> int | None:
    """The hash of a short line's words with every word holding a digit made one and the
    same, and so is every month's and weekday's name ("Updated 153 days ago" and "Updated
    4 days ago" alike, "Last reviewed 3 May 2026" and "Last reviewed 29 June 2026"), and,
    on such a line, every capitalised word after the first, a name ("Signed in as Ada
    Quill - page 3 of 40", "Signed in as Bo Marrin - page 7 of 12"); None for a block
    that is not such a line (3 to 30 words, a digit among them, and not only numbers,
    dates and names). A line with names and no number ("Narrator Delphine Nettleford",
    a cast table's row in a text export) is no such line: names alone are content."""
    tokens = words(text)
    if not SHAPE_MIN_WORDS <= len(tokens) <= SHAPE_MAX_WORDS or \
            not any(c.isdigit() for c in text):
        return None
    named = _named(text, len(tokens))
    shape = " ".join("#" if name or t in DATE_WORDS or any(c.isdigit() for c in t) else t
                     for t, name in zip(tokens, named))
    if shape.count("#") == len(tokens):
        return None
    digest = hashlib.blake2b(shape.encode("utf-8"), digest_size=8, person=b"shape").digest()
    return int.from_bytes(digest, "little") >> 1


def titled_hash(text: str, title: str) -> int | None:
    """The shape of a short line that names the page's own title (``title``, normalised
    words) among words of the template's ("You are reading: <title>", "Share <title> with
    a friend"): the title made one word, numbers and months made one as in
    :func:`shape_hash`; None when the line does not hold the title or holds little else
    (fewer than two words, or more than ``SHAPE_MAX_WORDS``)."""
    tokens = words(text)
    size = title.count(" ") + 1
    if not title or len(tokens) <= size + 1 or len(tokens) - size > SHAPE_MAX_WORDS:
        return None
    flat = f" {' '.join(tokens)} "
    at = flat.find(f" {title} ")
    if at < 0:
        return None
    rest = (flat[:at] + " \x00 " + flat[at + len(title) + 2:]).split()
    shape = " ".join("#" if t in DATE_WORDS or any(c.isdigit() for c in t) else t
                     for t in rest)
    digest = hashlib.blake2b(shape.encode("utf-8"), digest_size=8, person=b"titled").digest()
    return int.from_bytes(digest, "little") >> 1


# a comment signed at its end: a sentence, then a dash and a name ("Can you post a
# photo? - Ann B.", "... works now. -- Tomas Reed")
_SIGNED = re.compile(r"^(.*[.?!)\"'’”])\s+(?:[-–—]|--)\s+[A-Z][\w'’]*\.?(?:\s+[A-Z][\w'’]*\.?)?$")


def signed_hash(text: str) -> int | None:
    """The hash of a comment's words without its signature ("Does it happen every time?
    - Ann B."), None for a block that is not signed so."""
    m = _SIGNED.match(text.strip())
    if m is None or len(words(m.group(1))) < SHAPE_MIN_WORDS:
        return None
    digest = hashlib.blake2b(" ".join(words(m.group(1))).encode("utf-8"), digest_size=8,
                             person=b"signed").digest()
    return int.from_bytes(digest, "little") >> 1


def block_summary(blocks: Sequence[Block]) -> dict[str, list]:
    """The page's distinct block hashes, in trafilatura's main text or not, and the shapes
    of its short lines with numbers (for the cache and the parent's learning; a few
    hundred bytes a page)."""
    main = sorted({b.hash for b in blocks if b.main and not b.nav})
    taken = set(main)
    # a teaser list's blocks quote other pages (their titles, their first words): counted,
    # they would make a page's own title and opening look like a rotating teaser
    other = sorted({b.hash for b in blocks if b.hash not in taken and not b.nav})
    # a layout table's footer cell is such a line too; a shorter cell is table data
    shaped = sorted({(shape, b.hash) for b in blocks
                     if (b.kind == "text" or (b.kind == "cell" and
                                              len(b.text.split()) >= SHAPE_CELL_WORDS)) and
                     not b.nav and b.links < LINK_DOMINATED and
                     (shape := shape_hash(b.text)) is not None})
    titles = {" ".join(words(b.text)) for b in blocks if b.title}
    if len(titles) == 1:  # lines naming the page's own title ("Share <title> with a friend")
        title = next(iter(titles))
        shaped = sorted(set(shaped) | {
            (shape, b.hash) for b in blocks
            if not b.title and not b.nav and b.links < LINK_DOMINATED and
            b.kind in ("text", "cell") and (shape := titled_hash(b.text, title)) is not None})
    summary: dict[str, Any] = {"main": main, "other": other,
                               "shaped": [list(pair) for pair in shaped]}
    # only their unlinked snippets: a teaser's title (a link, a heading) is another
    # page's title, which stays there
    nav = sorted({b.hash for b in blocks if b.nav and b.kind != "heading" and not b.links}
                 - taken - set(other))
    if nav:  # teaser lists: not counted, but known to be navigation where they are whole
        summary["nav"] = nav
    signed = sorted({(stem, b.hash) for b in blocks if b.links < LINK_DOMINATED and
                     (stem := signed_hash(b.text)) is not None})
    if signed:
        summary["signed"] = [list(pair) for pair in signed]
    if len(titles) == 1:
        summary["title"] = titles.pop()
    dateline = _under_title(blocks)
    if dateline:
        summary["dateline"] = dateline
    return summary


# words that make a numbered line a date or a time: a unit after a number ("4 hours",
# "3 days ago"; "pounds a year" is no time), or a word that is one on its own
TIME_UNITS = frozenset("minute minutes min mins hour hours hr hrs day days week weeks "
                       "month months year years".split())
TIME_WORDS = frozenset("ago today yesterday".split())
_NUMERIC_DATE = re.compile(r"\b\d{1,4}[-/.]\d{1,2}[-/.]\d{1,4}\b")


def _dateline(block: Block) -> bool:
    """A short unlinked line with a number that tells a date or a time ("Updated 4 hours
    ago", "Friday 6 March. Viewed 2,006 times.", "Posted 2026-03-06"); a line whose
    number is another of the page's facts ("Salary 24,000 pounds a year") is none."""
    if block.kind != "text" or block.nav or block.links >= LINK_DOMINATED or \
            len(block.text.split()) > TAGLINE_MAX_WORDS or shape_hash(block.text) is None:
        return False
    tokens = words(block.text)
    return bool(_NUMERIC_DATE.search(block.text)) or \
        any(t in DATE_WORDS or t in TIME_WORDS or
            (t in TIME_UNITS and k > 0 and any(c.isdigit() for c in tokens[k - 1]))
            for k, t in enumerate(tokens))


def _under_title(blocks: Sequence[Block]) -> list[int]:
    """The hashes of the short lines with numbers that stand right under the page's
    (one) title, before anything else: its dateline, in whatever wording."""
    at = [i for i, b in enumerate(blocks) if b.title]
    if len(at) != 1:
        return []
    found: list[int] = []
    for b in blocks[at[0] + 1:at[0] + 1 + SANDWICH_MAX]:
        if not _dateline(b):
            break
        found.append(b.hash)
    return sorted(set(found))


@dataclass(frozen=True)
class Page:
    """One page taking part in learning: its host and its block hashes."""

    site: str
    main: np.ndarray  # uint64, sorted, distinct
    other: np.ndarray  # uint64, sorted, distinct, none of them in main
    shaped: tuple[tuple[int, int], ...] = ()  # (shape hash, block hash) of numbered lines
    title: str = ""  # the words of its title (HTML: its one <h1>), normalised
    signed: tuple[tuple[int, int], ...] = ()  # (stem hash, block hash) of signed comments
    dateline: tuple[int, ...] = ()  # short lines with numbers right under its title
    nav: np.ndarray = field(  # blocks of its teaser lists
        default_factory=lambda: np.zeros(0, dtype=np.uint64))

    @classmethod
    def of(cls, site: str, summary: dict[str, Any]) -> Page:
        return cls(site, np.array(summary.get("main", ()), dtype=np.uint64),
                   np.array(summary.get("other", ()), dtype=np.uint64),
                   tuple((int(s), int(h)) for s, h in summary.get("shaped", ())),
                   str(summary.get("title") or ""),
                   tuple((int(s), int(h)) for s, h in summary.get("signed", ())),
                   tuple(int(h) for h in summary.get("dateline", ())),
                   np.array(summary.get("nav", ()), dtype=np.uint64))

    @property
    def hashes(self) -> np.ndarray:
        return np.union1d(self.main, self.other)

    def signature(self) -> bytes:
        return hashlib.sha256(self.main.tobytes() + b"|" + self.other.tobytes()).digest()


Learnt = dict[str, tuple[np.ndarray, np.ndarray, frozenset[int], frozenset[str],
                         frozenset[int], frozenset[int], bool, np.ndarray]]


def learn(pages: Iterable[Page]) -> Learnt:
    """Each host's template, for hosts that teach any: (blocks on most pages, blocks by
    the aside rule only, as sorted uint64 hashes; shapes of numbered lines on most
    pages; its pages' titles of ``TITLE_MIN_WORDS`` words or more, which lists on other
    pages quote; comments signed by different people that recur, as the aside rule
    counts, on its pages; shapes of numbered lines on a fifth of the pages, the
    wordings a site rotates; whether most pages have a short numbered line under their
    title, a dateline)."""
    by_site: dict[str, dict[bytes, Page]] = {}
    for page in pages:
        by_site.setdefault(page.site, {}).setdefault(page.signature(), page)
    learnt: Learnt = {}
    for site in sorted(by_site):
        distinct = list(by_site[site].values())
        n = len(distinct)
        if n < MIN_PAGES:
            continue
        every, total = np.unique(np.concatenate([p.hashes for p in distinct]),
                                 return_counts=True)
        in_main, main_count = np.unique(np.concatenate([p.main for p in distinct]),
                                        return_counts=True)
        mains = np.zeros(len(every), dtype=np.int64)
        mains[np.searchsorted(every, in_main)] = main_count
        anywhere = total >= max(MIN_PAGES, math.ceil(SHARE_ANY * n))
        aside = (total >= max(ASIDE_MIN_PAGES, math.ceil(SHARE_ASIDE * n))) & \
            (2 * mains <= total)
        aside |= total >= max(ASIDE_MIN_PAGES, math.ceil(SHARE_ROTATING * n))
        strong, weak = every[anywhere], every[aside & ~anywhere]
        # blocks of teaser lists on a fifth of the pages (and five) where they were told
        # for such: weak template on a page where the list was broken up (rotated in
        # among other boxes) and its pieces were counted; a page's own opening, quoted
        # in the teasers of others, follows its title there, not a link
        weak = np.union1d(weak, np.setdiff1d(_on_pages(
            [p.nav for p in distinct], max(ASIDE_MIN_PAGES, math.ceil(SHARE_ASIDE * n))),
            strong))
        # short lines with numbers that differ from page to page ("Updated 153 days
        # ago", "1,849 views"): their shape on most pages, in more than one wording
        shapes = _varied((page.shaped for page in distinct),
                         max(MIN_PAGES, math.ceil(SHARE_ANY * n)))
        # such lines in several wordings that a site rotates ("Viewed 2,006 times",
        # "Updated 4 hours ago"): each shape on a fifth of the pages (and five), taken
        # as template where the template stands, not among the page's own text
        some = _varied((page.shaped for page in distinct),
                       max(ASIDE_MIN_PAGES, math.ceil(SHARE_ASIDE * n))) - shapes
        # a short line with numbers under the title on most pages, in whatever wording
        # (a site may rotate four): the site's dateline
        dated = sum(1 for p in distinct if p.dateline) >= max(MIN_PAGES,
                                                               math.ceil(SHARE_ANY * n))
        # titles of three words or more, not one the site gives most of its pages
        named: dict[str, int] = {}
        for p in distinct:
            named[p.title] = named.get(p.title, 0) + 1
        titles = frozenset(title for title, count in named.items()
                           if title.count(" ") + 1 >= TITLE_MIN_WORDS and
                           count < math.ceil(SHARE_ANY * n))
        # the same comment under different names on many pages: a forum's stock replies
        stems = _varied((page.signed for page in distinct),
                        max(ASIDE_MIN_PAGES, math.ceil(SHARE_ASIDE * n)))
        recurring = _recurring(distinct, strong, weak)
        if len(strong) or len(weak) or shapes or titles or stems or some or dated or \
                len(recurring):
            learnt[site] = (strong, weak, shapes, titles, stems, some, dated, recurring)
    return learnt


def _recurring(distinct: Sequence[Page], strong: np.ndarray, weak: np.ndarray
               ) -> np.ndarray:
    """The blocks, not on most pages (``strong``), that stand on pages of at least
    ``RECUR_MIN_DOCS`` distinct documents, whatever share of the host's pages that is:
    a promotion the template rotates through a pool of a few variants, each on an eighth
    of the pages. Pages are one document when they share ``VERSION_SHARE`` of their own
    blocks (neither ``strong`` nor ``weak``), counted through blocks on at most
    ``VERSION_MAX_PAGES`` pages: a body republished as versions (updated, printable)
    recurs only together with the rest of its page, and counts once. Such a block goes
    only where it stands out of line with the page's text (:func:`_out_of_line`): a
    stock sentence that several notices share is marked up as their paragraphs are."""
    n = len(distinct)
    template = np.union1d(strong, weak)
    own = [set(np.setdiff1d(p.hashes, template, assume_unique=True).tolist())
           for p in distinct]
    pages_of: dict[int, list[int]] = {}
    for i, page in enumerate(distinct):
        for h in np.setdiff1d(page.hashes, strong, assume_unique=True).tolist():
            pages_of.setdefault(h, []).append(i)
    shared: dict[tuple[int, int], int] = {}
    for h, at in pages_of.items():
        if 2 <= len(at) <= VERSION_MAX_PAGES and h in own[at[0]]:
            for k, a in enumerate(at):
                for b in at[k + 1:]:
                    shared[a, b] = shared.get((a, b), 0) + 1
    parent = list(range(n))

    def root(i: int) -> int:
        while parent[i] != i:
            parent[i] = parent[parent[i]]
            i = parent[i]
        return i

    for (a, b), count in shared.items():
        if count >= 2 and count >= VERSION_SHARE * min(len(own[a]), len(own[b])):
            parent[root(a)] = root(b)
    found = [h for h, at in pages_of.items() if len(at) >= RECUR_MIN_DOCS and
             len({root(i) for i in at}) >= RECUR_MIN_DOCS]
    return np.array(sorted(found), dtype=np.uint64)


def _on_pages(sets: Sequence[np.ndarray], least: int) -> np.ndarray:
    """The hashes in at least ``least`` of ``sets`` (sorted, distinct uint64 arrays)."""
    if not sets or not any(len(x) for x in sets):
        return np.zeros(0, dtype=np.uint64)
    values, counts = np.unique(np.concatenate(sets), return_counts=True)
    return values[counts >= least]


def _varied(per_page: Iterable[Iterable[tuple[int, int]]], least: int) -> frozenset[int]:
    """Keys (a numbered line's shape, a signed comment's stem) that stand on at least
    ``least`` pages in more than one variant (wording, signature); each page gives its
    (key, variant digest) pairs."""
    pages_of: dict[int, int] = {}
    variants: dict[int, set[int]] = {}
    for pairs in per_page:
        pairs = list(pairs)
        for key in {key for key, _digest in pairs}:
            pages_of[key] = pages_of.get(key, 0) + 1
        for key, digest in pairs:
            variants.setdefault(key, set()).add(digest)
    return frozenset(key for key, count in pages_of.items()
                     if count >= least and len(variants[key]) > 1)


def stored_pages(state: Any, batch: set[str]) -> list[Page]:
    """The pages of the stored corpus (documents not in ``batch``, a set of doc ids) that
    can teach a site's template: their blocks come from the cache entry of their text.
    What an incremental run, and ``gate explain --against``, learn from besides the batch."""
    pages = []
    for row in state.corpus(sketches=False):
        site = site_of(row["source_url"])
        if site is None or row["doc_id"] in batch or not row["cache_key"]:
            continue
        cached = state.cache_meta(row["cache_key"])
        if cached is not None and cached[1].get("blocks"):
            pages.append(Page.of(f"{site} {cached[0].get('type')}", cached[1]["blocks"]))
    return pages


# (everywhere, aside-only[, the titles of the site's other pages, blocks that go wherever
# they stand: signed stock comments, lines in a wording of their own[, lines in a wording
# the site rotates, which go where they stand under the page's title]]), or ()
Removal = tuple[tuple[int, ...], ...] | \
    tuple[tuple[int, ...], tuple[int, ...], tuple[str, ...], tuple[int, ...]] | \
    tuple[tuple[int, ...], tuple[int, ...], tuple[str, ...], tuple[int, ...], tuple[int, ...]]


def removal(page: Page, learnt: Learnt) -> Removal | tuple[()]:
    """The template blocks of ``page``: those on most of the site's pages, and those only
    the aside rule names (sorted hashes each), and the titles of the site's other pages
    (lists quoting them are teasers, see :func:`_quoting`); ``()`` when none."""
    template = learnt.get(page.site)
    if template is None:
        return ()
    mine = page.hashes
    if page.title in template[3]:  # its title stays, however many menus link to it
        mine = mine[mine != np.uint64(block_hash(page.title) or 0)]
    found = [tuple(int(h) for h in np.intersect1d(mine, part, assume_unique=True))
             for part in template[:2]]
    # a line in a wording of its own on this page ("Last reviewed 3 May 2026 by Ada
    # Quill") goes wherever it stands, even between two paragraphs of the page's own: it
    # is no stock sentence of the site's notices, which are worded alike on every page
    shaped = {h for shape, h in page.shaped if shape in template[2]} - set(found[0])
    rotated = {h for shape, h in page.shaped if shape in template[5]}
    if template[6]:
        rotated |= set(page.dateline)
    rotated = tuple(sorted(rotated - shaped - set(found[0])))
    titles = tuple(sorted(template[3] - {page.title}))
    signed = tuple(sorted({h for stem, h in page.signed if stem in template[4]} | shaped))
    recurring = tuple(int(h) for h in np.setdiff1d(
        np.intersect1d(mine, template[7], assume_unique=True),
        np.array(found[0], dtype=np.uint64)))  # less the everywhere-template blocks
    if not (found[0] or found[1] or titles or signed or rotated or recurring):
        return ()
    if recurring:
        return (found[0], found[1], titles, signed, rotated, recurring)
    if rotated:
        return (found[0], found[1], titles, signed, rotated)
    return (found[0], found[1], titles, signed) if titles or signed else (found[0], found[1])


def removal_key(template: Removal) -> str:
    """A short stable name for a removal (part of the cache key of the cleaned text)."""
    blob = b"|".join(b"".join(int(h).to_bytes(8, "little") for h in sorted(part))
                     for part in template[:2])
    if len(template) > 2:
        blob += b"|" + "\n".join(template[2]).encode("utf-8") + b"|" + \
            b"".join(int(h).to_bytes(8, "little") for h in template[3])
    for part in template[4:]:
        blob += b"|" + b"".join(int(h).to_bytes(8, "little") for h in part)
    return hashlib.sha256(blob).hexdigest()[:16]


def _dropped(blocks: Sequence[Block], strong: set[int], weak: set[int]) -> set[int]:
    """The blocks removed from this page: every strong one, and a weak one (recurring on
    a fifth of the pages, outside the main text, or on ``SHARE_ROTATING`` of them) only
    where it sits beside a link-dominated or a strong block, or in a run of weak blocks
    that does, as teasers and section menus do; a stock paragraph that several notices
    share sits among their own text and stays, and so do the page's title and a heading
    of the main text that opens text of the page's own (other pages of the site list such
    titles in their asides). A short byline between two such blocks goes with them."""
    drop = set(strong)
    anchored = [b.links >= LINK_DOMINATED or b.hash in strong for b in blocks]

    def opens(i: int) -> bool:  # a heading followed by text of the page's own
        after = blocks[i + 1] if i + 1 < len(blocks) else None
        return after is not None and after.hash not in strong and after.hash not in weak \
            and after.links < LINK_DOMINATED and not after.nav

    # a weak paragraph in trafilatura's main text marked up as the page's opening
    # paragraph (the first under its title, past a dateline) is the page's text: a
    # stock paragraph of its notices, or the opening itself, which teasers on other pages
    # quote; it stays whatever box of the template stands next to it. Answers and
    # comments, marked up otherwise than the question they follow, still go with the box
    # they stand in
    at = [i for i, b in enumerate(blocks) if b.title]
    body = next((b.markup for b in blocks[at[0] + 1:] if b.kind == "text" and b.main and
                 b.links < LINK_DOMINATED and not b.nav and
                 len(b.text.split()) > TAGLINE_MAX_WORDS), None) if len(at) == 1 else None

    changed = True
    while changed:  # a run of weak blocks goes when one end of it touches an anchor
        changed = False
        for i, block in enumerate(blocks):
            if anchored[i] or block.title or (block.kind == "heading" and block.main and
                                               opens(i)) or \
                    (body and block.kind == "text" and block.main and block.markup == body):
                continue
            # a table's cells and the blocks around the table do not anchor each other: a
            # run of weak blocks ending in a box (a newsletter form) beside a table of the
            # page's own stops at the table, whose header row recurs on many pages
            before = i > 0 and anchored[i - 1] and \
                (blocks[i - 1].kind == "cell") == (block.kind == "cell")
            after = i + 1 < len(blocks) and anchored[i + 1] and \
                (blocks[i + 1].kind == "cell") == (block.kind == "cell")
            # a short byline ("answered by A. N.", "posted by ...") between two blocks of
            # the template goes with them
            byline = (before or after) and block.links == 0 and block.kind == "text" and \
                len(block.text.split()) <= BYLINE_MAX_WORDS and \
                0 < i < len(blocks) - 1 and \
                all((anchored[k] or blocks[k].hash in weak) and blocks[k].kind != "cell"
                    for k in (i - 1, i + 1))
            if (block.hash in weak and (before or after)) or byline:
                anchored[i] = changed = True
                drop.add(block.hash)
    return drop


def _sandwiched(blocks: Sequence[Block], drop: set[int]) -> set[int]:
    """Template blocks that stand inside the page's own text: a run of at most
    ``SANDWICH_MAX`` unlinked template blocks whose neighbours on both sides are unlinked
    blocks of the page's own. A table's header row, a cell value such as "Closed" or a
    stock sentence that most notices of a site share are then kept where they stand in a
    notice, while the same words in the menu, an aside or the footer still go."""
    def own(i: int) -> bool:
        b = blocks[i]
        return b.hash not in drop and b.links < LINK_DOMINATED and not b.nav

    kept: set[int] = set()
    i = 0
    while i < len(blocks):
        if blocks[i].hash not in drop:
            i += 1
            continue
        j = i
        while j < len(blocks) and blocks[j].hash in drop:
            j += 1
        run = blocks[i:j]
        # short template lines just under the page's title are its dateline or the
        # site's tagline ("From the Quernstone project wiki", "Updated 4 hours ago"),
        # not a stock sentence of the text
        tagline = i > 0 and blocks[i - 1].title and \
            all(b.kind == "text" and len(b.text.split()) <= TAGLINE_MAX_WORDS for b in run)
        # a longer run all in trafilatura's main text: stock items of a list the pages
        # share ("Work safely and follow our written procedures" among a job's duties)
        longest = SANDWICH_MAX * (2 if all(b.main for b in run) else 1)
        if j - i <= longest and i > 0 and j < len(blocks) and own(i - 1) and own(j) \
                and not tagline and all(b.links < LINK_DOMINATED and not b.nav for b in run):
            kept.update(b.hash for b in run)
        i = j
    return kept


def _datelines(blocks: Sequence[Block], lines: set[int], drop: set[int]) -> set[int]:
    """The blocks of ``lines`` (numbered lines in a wording the site rotates: "Viewed
    2,006 times", "Posted Monday 3 June | 1,204 views") that stand under the page's
    title, alone or among other short template lines there, and tell a date or a time
    (:func:`_dateline`): a dateline. Elsewhere such
    a line may be a stock sentence of the page's own ("Normal opening hours resume on
    Saturday 20 July 2024") and stays."""
    found: set[int] = set()
    for i, block in enumerate(blocks):
        if not block.title:
            continue
        for b in blocks[i + 1:i + 1 + SANDWICH_MAX]:
            if b.kind != "text" or len(b.text.split()) > TAGLINE_MAX_WORDS or \
                    (b.hash not in lines and b.hash not in drop):
                break
            if b.hash in lines and _dateline(b):
                found.add(b.hash)
    return found


def _out_of_line(blocks: Sequence[Block], recurring: set[int], drop: set[int]) -> set[int]:
    """The blocks of ``recurring`` (on several distinct documents of the host, see
    :func:`_recurring`) that stand out of line with the page's text: a paragraph marked
    up (its holder's tag and class) as none of the page's own paragraphs is (a promotion
    boxed in among them; the markup most of the main text's paragraphs have is the
    page's own too), and a heading over such a paragraph or over nothing of the page's
    own. The page's title stays; so do a stock sentence written as the notice's
    paragraphs are, list items and table cells (a stock list of documents, a table of
    start times: the page's structure, not a box put into it), and every line of a text,
    PDF or Markdown copy (their markup is one and the same)."""
    gone = drop | recurring

    def own(b: Block) -> bool:
        return b.hash not in gone and b.links < LINK_DOMINATED and not b.nav

    mine = {b.markup for b in blocks if b.kind == "text" and own(b)}
    # and the markup most of the main text's paragraphs have, though all of them recur (a
    # forum's question and answer put together from stock sentences)
    main = [b.markup for b in blocks if b.kind == "text" and b.main and b.hash not in drop]
    if main:
        mine.add(max(sorted(set(main)), key=main.count))
    inline = [own(b) or b.title or b.kind in ("item", "cell") or
              (b.kind == "text" and b.hash in recurring and b.markup in mine)
              for b in blocks]
    for i in range(len(blocks) - 2, -1, -1):  # a heading over text in line is in line
        b = blocks[i]
        if b.hash in recurring and b.kind == "heading" and inline[i + 1] and \
                blocks[i + 1].links < LINK_DOMINATED and not blocks[i + 1].nav:
            inline[i] = True
    out = {b.hash for i, b in enumerate(blocks) if b.hash in recurring and not inline[i]}
    # a block in line on one spot of the page stays on all
    return out - {b.hash for i, b in enumerate(blocks) if b.hash in recurring and inline[i]}


def _rows(blocks: Sequence[Block], certain: set[int], drop: set[int]) -> set[int]:
    """The blocks of ``certain`` that are lines with numbers or dates standing beside
    another short line with a number (``TAGLINE_MAX_WORDS`` words at most), of the
    page's own or such a line too: rows of a table or a running order ("06:44
    Introductions", "16:38 A walk at night") in a text, PDF or Markdown copy, which recur
    in shape on many pages of a site and are still the page's own where they stand
    among its text. A line alone between two paragraphs, or between the title and a
    paragraph ("Last reviewed 3 May 2026 by Ada Quill"), is none."""
    def short(i: int) -> bool:
        if not 0 <= i < len(blocks):
            return False
        b = blocks[i]
        return b.kind in ("text", "cell") and not b.title and not b.nav and \
            b.links < LINK_DOMINATED and (b.hash in certain or b.hash not in drop) and \
            len(b.text.split()) <= TAGLINE_MAX_WORDS and shape_hash(b.text) is not None

    return {b.hash for i, b in enumerate(blocks) if b.hash in certain and
            signed_hash(b.text) is None and shape_hash(b.text) is not None and
            (short(i - 1) or short(i + 1))}


def _once(lines: list[str], titles: set[int]) -> list[str]:
    """``lines`` without a line that repeats the one before it when that is the page's
    title."""
    out: list[str] = []
    for line in lines:
        if out and line.strip() == out[-1].strip() and block_hash(line) in titles:
            continue
        out.append(line)
    return out


def _dateish(word: str) -> bool:
    """A word of a date or a time ("25", "february", "2026", "9:30am")."""
    return word in DATE_WORDS or any(c.isdigit() for c in word)


def _quoting(blocks: Sequence[Block], titles: Iterable[str]) -> set[int]:
    """The blocks that quote other pages of the site, linked or not: a block that is
    another page's title (``titles``, normalised words), alone or followed by a date;
    and blocks that begin with one ("Title Snippet ...") standing next to another such
    block, or making up half or more of a list (its other items then quote pages the run
    does not hold). An unlinked list of "upcoming events" or "more news" is a teaser list
    whatever its words, and it differs from page to page, so counting blocks cannot name
    it. The page's own title and a paragraph that merely begins with another page's
    title (a story and its update) stay."""
    by_start: dict[tuple[str, ...], list[str]] = {}
    for title in titles:
        by_start.setdefault(tuple(title.split()[:TITLE_MIN_WORDS]), []).append(title)
    if not by_start:
        return set()
    quoted = [0] * len(blocks)  # 2: a title (and a date), 1: begins with a title
    for i, block in enumerate(blocks):
        if block.title:
            continue
        tokens = words(block.text)
        if len(tokens) < TITLE_MIN_WORDS:
            continue
        flat = " ".join(tokens)
        for title in by_start.get(tuple(tokens[:TITLE_MIN_WORDS]), ()):
            if flat == title or flat.startswith(title + " "):
                rest = tokens[title.count(" ") + 1:]
                quoted[i] = max(quoted[i], 2 if len(rest) <= DATE_MAX_WORDS and
                                all(_dateish(w) for w in rest) else 1)
    found = {i for i, q in enumerate(quoted) if q == 2 or (q and (
        (i > 0 and quoted[i - 1]) or (i + 1 < len(blocks) and quoted[i + 1])))}
    i = 0
    while i < len(blocks):  # lists with half or more of their items quoting titles
        j = i
        while j < len(blocks) and blocks[j].kind == "item":
            j += 1
        hits = sum(1 for k in range(i, j) if quoted[k])
        if hits >= 2 and 2 * hits >= j - i:
            found.update(range(i, j))
        i = max(j, i + 1)
    # a list item that is the page's own title (a menu linking to it) is left to the rules
    # that count blocks: their removal spares the title
    return {blocks[i].hash for i in found} - {b.hash for b in blocks if b.title}


def _word_count(lines: Iterable[str]) -> int:
    """Words by white space: enough to compare two amounts of text, and cheap."""
    return sum(len(line.split()) for line in lines)


_CRUMB = re.compile(r"\s+(?:>|/|»|›|→|::)\s+")


def _crumb_trails(blocks: Sequence[Block]) -> set[int]:
    """Breadcrumb trails ("Home > Routes > Service changes > Route N62 ..."): a block of
    three or more short parts split by one and the same separator whose last part, of two
    words or more, is another block of the page (its title). Such a trail is navigation,
    linked or not, and differs from page to page, so learning cannot name it."""
    trails = []
    for b in blocks:
        text = b.text.strip()
        parts = _CRUMB.split(text)
        if len(parts) < 3 or any(len(part.split()) > 6 for part in parts[:-1]) or \
                len({m.strip() for m in _CRUMB.findall(text)}) != 1:
            continue  # not three or more short parts split by one and the same separator
        trails.append((b, parts))
    if not trails:
        return set()
    others: dict[str, int] = {}
    for b in blocks:
        others.setdefault(" ".join(words(b.text)), b.hash)
    found = set()
    for b, parts in trails:
        last = words(parts[-1])
        if len(last) >= 2 and others.get(" ".join(last), b.hash) != b.hash:
            found.add(b.hash)
    return found


def _orphan_headings(blocks: Sequence[Block]) -> set[int]:
    """Headings of the template that trafilatura kept in its main text without what they
    head ("Most viewed", "About the author", "On this page" over a page's own contents):
    a heading, not the page's title, whose next block is link-dominated, navigation, or
    outside trafilatura's main text (a table's cell aside: trafilatura drops a table of
    the page's own at times, and its heading stays). A heading of the page's own text is
    followed by that text, which trafilatura keeps; a section that is only a list of
    links loses its heading's few words."""
    found = set()
    for i, b in enumerate(blocks[:-1]):
        after = blocks[i + 1]
        if b.kind == "heading" and b.main and not b.title and b.links < LINK_DOMINATED \
                and (after.links >= LINK_DOMINATED or after.nav or
                     (not after.main and after.kind != "cell")):
            found.add(b.hash)
    return found - {b.hash for b in blocks if b.title}


def _merged(lines: Sequence[str], blocks: Sequence[Block]) -> bool:
    """Whether a line holds two or more whole blocks of the page, words for words (a
    layout table's cell written as one line, which loses the cell's own structure: its
    list items and table order). Lines that are pieces of one block (a page whose source
    wraps its paragraphs) are not merged."""
    def norm(text: str) -> str:
        return f" {' '.join(words(text))} "

    known = [n for n in {norm(b.text) for b in blocks} if n.count(" ") > MERGED_MIN_WORDS]
    for line in lines:
        flat = norm(line)
        if flat.count(" ") > 2 * MERGED_MIN_WORDS and \
                sum(1 for n in known if n in flat) >= 2:
            return True
    return False


def compose(text: str, blocks: Sequence[Block], template: Removal | tuple[()]
            ) -> tuple[str, dict[str, int | str]]:
    """The page's own text: ``text`` (trafilatura's) without the template blocks, or the
    page's own blocks when trafilatura had chosen the template (see the module
    docstring). Returns the text and what was done, for the record."""
    if not template:
        return text, {}
    blocks = tuple(blocks)
    drop = _dropped(blocks, set(template[0]), set(template[1]))
    # teasers quoting other pages, stock comments and lines in a wording of their own go
    # wherever they stand; such a line among rows (a table's, a running order's) is one
    # of them, and only goes where the template does (see _rows)
    certain = _quoting(blocks, template[2]) | set(template[3]) if len(template) > 2 else set()
    if len(template) > 4:
        certain |= _datelines(blocks, set(template[4]), drop | certain)
    if len(template) > 5:
        certain |= _out_of_line(blocks, set(template[5]), drop | certain)
    rows = _rows(blocks, certain, drop)
    drop |= certain
    drop -= _sandwiched(blocks, drop) - (certain - rows)
    if not drop:
        return text, {}
    drop |= _crumb_trails(blocks) | _orphan_headings(blocks)
    page = {b.hash for b in blocks}
    main_rest: list[str] = []
    unplaced: list[str] = []  # lines that are no block nor a row of blocks
    for line, digest in zip(text.split("\n"), line_hashes(text, blocks)):
        parts = [digest] if digest is None or digest in page else row_cells(line)
        if not parts or any(part is not None and part not in page for part in parts):
            unplaced.append(line)  # a layout cell in one line, or a hard-wrapped piece
            continue
        if any(part is None or part not in drop for part in parts):
            main_rest.append(line)
    placed = not unplaced
    own = [b.text for b in blocks
           if b.hash not in drop and b.links < LINK_DOMINATED and not b.nav]
    # the title said twice once the template between went (a breadcrumb trail's last
    # crumb, then the heading): once
    titles = {b.hash for b in blocks if b.title}
    main_rest, own = _once(main_rest, titles), _once(own, titles)
    main_words, own_words = _word_count(main_rest), _word_count(own)
    if not placed:
        # how much of trafilatura's text is template: the template blocks found in it
        found = {b.hash: b.text for b in blocks if b.hash in drop and b.text in text}
        if _word_count(found.values()) < TEMPLATE_SHARE * _word_count(text.split("\n")) \
                and not _merged(unplaced, blocks):
            return text, {"template_blocks": len(drop), "kept": "all (little template in it)"}
    # the page's own blocks replace trafilatura's text only when most of that text was
    # template (trafilatura chose the template); a text that is mostly the page's own
    # stays, however much else (comments, a byline, an author's note) the page holds
    if placed and main_words and (main_words >= MAIN_RATIO * _word_count(text.split("\n"))
                                  or own_words - main_words < MIN_OWN_WORDS):
        cleaned, source = "\n".join(main_rest).strip("\n"), "main"
    elif own_words >= MIN_OWN_WORDS:
        cleaned, source = "\n".join(own), "page"
    else:
        return text, {"template_blocks": len(drop), "kept": "all (nothing of its own)"}
    return cleaned, {"template_blocks": len(drop), "kept": source,
                     "chars_before": len(text), "chars_after": len(cleaned)}


# -- learning in bulk (the coordinator of a cluster run) -----------------------------------


def learn_quick(pages: Iterable[Page]) -> Learnt:
    """:func:`learn`, with the same result, at a fraction of its cost on large batches:
    each host's (block, page) pairs are sorted once, and the counts, including those of
    the recurring blocks (:func:`_recurring`, most of learning's time on 600 pages of
    three hosts), are taken from them in arrays rather than in dictionaries of Python
    integers. A run calls this one; tests hold it to :func:`learn`'s result, so a change
    there that is not made here fails them."""
    by_site: dict[str, dict[bytes, Page]] = {}
    for page in pages:
        by_site.setdefault(page.site, {}).setdefault(page.signature(), page)
    learnt: Learnt = {}
    for site in sorted(by_site):
        distinct = list(by_site[site].values())
        n = len(distinct)
        if n < MIN_PAGES:
            continue
        block, page = _pairs(distinct)
        starts = np.flatnonzero(np.r_[True, block[1:] != block[:-1]]) if len(block) \
            else np.zeros(0, dtype=np.int64)
        every, total = block[starts], np.diff(np.r_[starts, len(block)])
        in_main, main_count = np.unique(np.concatenate([p.main for p in distinct]),
                                        return_counts=True)
        mains = np.zeros(len(every), dtype=np.int64)
        mains[np.searchsorted(every, in_main)] = main_count
        anywhere = total >= max(MIN_PAGES, math.ceil(SHARE_ANY * n))
        aside = (total >= max(ASIDE_MIN_PAGES, math.ceil(SHARE_ASIDE * n))) & \
            (2 * mains <= total)
        aside |= total >= max(ASIDE_MIN_PAGES, math.ceil(SHARE_ROTATING * n))
        strong, weak = every[anywhere], every[aside & ~anywhere]
        weak = np.union1d(weak, np.setdiff1d(_on_pages(
            [p.nav for p in distinct], max(ASIDE_MIN_PAGES, math.ceil(SHARE_ASIDE * n))),
            strong))
        shapes, some = _varied_at((page.shaped for page in distinct),
                                  max(MIN_PAGES, math.ceil(SHARE_ANY * n)),
                                  max(ASIDE_MIN_PAGES, math.ceil(SHARE_ASIDE * n)))
        some -= shapes
        dated = sum(1 for p in distinct if p.dateline) >= max(MIN_PAGES,
                                                               math.ceil(SHARE_ANY * n))
        named: dict[str, int] = {}
        for p in distinct:
            named[p.title] = named.get(p.title, 0) + 1
        titles = frozenset(title for title, count in named.items()
                           if title.count(" ") + 1 >= TITLE_MIN_WORDS and
                           count < math.ceil(SHARE_ANY * n))
        [stems] = _varied_at((page.signed for page in distinct),
                             max(ASIDE_MIN_PAGES, math.ceil(SHARE_ASIDE * n)))
        recurring = recurring_quick(block, page, n, strong, weak)
        if len(strong) or len(weak) or shapes or titles or stems or some or dated or \
                len(recurring):
            learnt[site] = (strong, weak, shapes, titles, stems, some, dated, recurring)
    return learnt


def _pairs(pages: Sequence[Page]) -> tuple[np.ndarray, np.ndarray]:
    """The distinct (block hash, page number) pairs of ``pages`` (each page's
    :attr:`Page.hashes`), sorted by hash, then page."""
    parts = [part for p in pages for part in (p.main, p.other)]
    block = np.concatenate(parts).astype(np.uint64, copy=False)
    page = np.repeat(np.arange(len(pages), dtype=np.int64),
                     [len(p.main) + len(p.other) for p in pages])
    order = np.lexsort((page, block))
    block, page = block[order], page[order]
    if len(block):
        distinct = np.r_[True, (block[1:] != block[:-1]) | (page[1:] != page[:-1])]
        block, page = block[distinct], page[distinct]
    return block, page


def recurring_quick(block: np.ndarray, page: np.ndarray, n: int, strong: np.ndarray,
                    weak: np.ndarray) -> np.ndarray:
    """:func:`_recurring` of ``n`` pages given as their (block hash, page number) pairs
    (:func:`_pairs`), counted in arrays: the pairs of pages sharing a block of their own
    generated per group size, and the versions joined in a union-find over the few
    pairs of pages that qualify."""
    own_len = np.bincount(page[~np.isin(block, np.union1d(strong, weak))], minlength=n)
    rest = ~np.isin(block, strong)
    block, page = block[rest], page[rest]
    if not len(block):
        return np.zeros(0, dtype=np.uint64)
    starts = np.flatnonzero(np.r_[True, block[1:] != block[:-1]])
    sizes = np.diff(np.r_[starts, len(block)])
    # pairs of pages sharing a block of their own (not weak template) on 2..VERSION_MAX
    shareable = (sizes >= 2) & (sizes <= VERSION_MAX_PAGES) & ~np.isin(block[starts], weak)
    pair_keys = []
    for size in np.unique(sizes[shareable]).tolist():
        at = starts[shareable & (sizes == size)]
        members = page[at[:, None] + np.arange(size)]  # (groups, size), pages ascending
        first, second = np.triu_indices(size, 1)
        pair_keys.append(members[:, first].ravel() * n + members[:, second].ravel())
    parent = list(range(n))

    def root(i: int) -> int:
        while parent[i] != i:
            parent[i] = parent[parent[i]]
            i = parent[i]
        return i

    if pair_keys:
        keys, counts = np.unique(np.concatenate(pair_keys), return_counts=True)
        a, b = keys // n, keys % n
        ok = (counts >= 2) & (counts >= VERSION_SHARE * np.minimum(own_len[a], own_len[b]))
        for x, y in zip(a[ok].tolist(), b[ok].tolist()):
            parent[root(x)] = root(y)
    component = np.array([root(i) for i in range(n)], dtype=np.int64)
    wide = sizes >= RECUR_MIN_DOCS
    if not wide.any():
        return np.zeros(0, dtype=np.uint64)
    # distinct (block, component) pairs, counted per block
    group = np.repeat(np.arange(len(starts)), sizes)
    keep = wide[group]
    pairs = np.unique(np.stack([group[keep], component[page[keep]]]), axis=1)
    per_group = np.bincount(pairs[0], minlength=len(starts))
    return block[starts[per_group >= RECUR_MIN_DOCS]]


def _varied_at(per_page: Iterable[Iterable[tuple[int, int]]], *least: int
               ) -> list[frozenset[int]]:
    """:func:`_varied` at each of the thresholds ``least``, counted once."""
    pages_of: dict[int, int] = {}
    variants: dict[int, set[int]] = {}
    for pairs in per_page:
        keys = set()
        for key, digest in pairs:
            keys.add(key)
            variants.setdefault(key, set()).add(digest)
        for key in keys:
            pages_of[key] = pages_of.get(key, 0) + 1
    varied = {key: count for key, count in pages_of.items() if len(variants[key]) > 1}
    return [frozenset(key for key, count in varied.items() if count >= at) for at in least]


class Removals:
    """:func:`removal` for many pages against one learnt template, with the same result:
    each host's template held as sets of Python integers, so a page's removal is a few
    set operations rather than six array operations on small arrays (a run's coordinator
    takes it for every page of a site)."""

    def __init__(self, learnt: Learnt):
        self.learnt = learnt
        self.sets: dict[str, tuple[frozenset[int], frozenset[int], frozenset[int]]] = {}

    def __call__(self, page: Page) -> Removal | tuple[()]:
        template = self.learnt.get(page.site)
        if template is None:
            return ()
        held = self.sets.get(page.site)
        if held is None:
            held = self.sets[page.site] = (frozenset(template[0].tolist()),
                                           frozenset(template[1].tolist()),
                                           frozenset(template[7].tolist()))
        mine = set(page.main.tolist())
        mine.update(page.other.tolist())
        if page.title in template[3]:  # its title stays, however many menus link to it
            mine.discard(block_hash(page.title) or 0)
        everywhere = mine & held[0]
        found = (tuple(sorted(everywhere)), tuple(sorted(mine & held[1])))
        shaped = {h for shape, h in page.shaped if shape in template[2]} - everywhere
        rotated = {h for shape, h in page.shaped if shape in template[5]}
        if template[6]:
            rotated |= set(page.dateline)
        rotated = tuple(sorted(rotated - shaped - everywhere))
        titles = tuple(sorted(template[3] - {page.title}))
        signed = tuple(sorted({h for stem, h in page.signed if stem in template[4]} | shaped))
        recurring = tuple(sorted((mine & held[2]) - everywhere))
        if not (found[0] or found[1] or titles or signed or rotated or recurring):
            return ()
        if recurring:
            return (found[0], found[1], titles, signed, rotated, recurring)
        if rotated:
            return (found[0], found[1], titles, signed, rotated)
        return (found[0], found[1], titles, signed) if titles or signed else found
