"""Unicode tricks: invisible characters inside words, tag characters, bidi controls, look-alikes.

* **zero-width**: U+200B, U+200C, U+200D, U+2060, U+FEFF (not at the start), U+180E and the
  invisible operators U+2061–U+2064 *between two letters of one alphabetic script* (Latin,
  Cyrillic, Greek ...). Joiners between Arabic, Persian, Indic letters or inside emoji
  sequences are how those scripts are written, so they are not counted.
* **tag characters**: the Tags block U+E0000–U+E007F mirrors ASCII (U+E0020–U+E007E) and
  renders as nothing, so it can carry a whole invisible sentence. Subdivision flag emoji
  (U+1F3F4, tag letters, U+E007F CANCEL TAG) are the one legitimate use and are skipped;
  anything else is decoded and reported with the hidden message.
* **bidi controls**: the embeddings, overrides and isolates U+202A–U+202E and U+2066–U+2069
  (the "Trojan Source" set) make the displayed order differ from the order a model reads.
  Near Hebrew, Arabic or other right-to-left letters they are ordinary typography and are
  not counted; the marks LRM/RLM/ALM are never counted.
* **mixed-script**: a word mixing Latin letters with look-alikes from Cyrillic, Greek,
  Armenian ... (UTS #39 confusables), or a word written entirely in look-alikes inside a
  mostly Latin text.
"""

from __future__ import annotations

import re
from dataclasses import dataclass, field
from typing import Any

from gate.checks.injection import confusables
from gate.checks.injection.normalize import fold, fold_char, visible

ZERO_WIDTH = "\u200b\u200c\u200d\u2060\ufeff\u180e\u2061\u2062\u2063\u2064"
BIDI_EMBED_OVERRIDE = "\u202a\u202b\u202c\u202d\u202e"
BIDI_ISOLATE = "\u2066\u2067\u2068\u2069"
BIDI_OVERRIDES = "\u202d\u202e"
TAG_FIRST, TAG_LAST = 0xE0000, 0xE007F
CANCEL_TAG = 0xE007F
BLACK_FLAG = "\U0001F3F4"

_SPECIAL = re.compile("[" + ZERO_WIDTH + BIDI_EMBED_OVERRIDE + BIDI_ISOLATE +
                      "\U000E0000-\U000E007F]")
_TAG_RUN = re.compile("[\U000E0000-\U000E007F]+")
_RTL = re.compile("[\u0590-\u08ff\ufb1d-\ufdff\ufe70-\ufefc\U00010800-\U00010fff"
                  "\U0001e800-\U0001efff]")
_WORD = re.compile(r"[^\W\d_]{2,64}")
_ZW_RUN = re.compile("[" + ZERO_WIDTH + "]{16,}")
MAX_SPECIAL = 20_000


@dataclass
class UnicodeHit:
    signal: str
    weight: float
    start: int
    end: int
    snippet: str
    detail: dict[str, Any] = field(default_factory=dict)


@dataclass
class Found:
    hits: list[UnicodeHit] = field(default_factory=list)
    payloads: list[tuple[int, int, str, str]] = field(default_factory=list)  # hidden messages


def _letter_script(ch: str) -> str:
    return confusables.script(ch) if ch.isalpha() else ""


def _neighbour(text: str, i: int, step: int) -> str:
    """The nearest character from ``i`` in direction ``step`` that is not zero-width."""
    j = i + step
    n = 0
    while 0 <= j < len(text) and text[j] in ZERO_WIDTH and n < 16:
        j += step
        n += 1
    return text[j] if 0 <= j < len(text) else ""


def scan(text: str) -> Found:
    """Look for the four tricks in ``text`` (pure, bounded)."""
    found = Found()
    if text.isascii():
        return found
    _special(text, found)
    _mixed_script(text, found)
    return found


DISGUISED = ("look-alike letters", "zero-width split words")  # kinds of disguised lines
DISGUISED_WORDS = 2  # disguised words (look-alikes, zero-width splits) a line needs


def _disguised_lines(text: str, positions: list[int], found: Found, kind: str) -> None:
    """Lines holding at least :data:`DISGUISED_WORDS` disguised words, read with the
    look-alikes as their plain letters and the invisible characters dropped, as payloads:
    the disguise hides the line from filters, so the line is read as concealed text."""
    lines: dict[int, int] = {}
    for pos in positions:
        line = text.rfind("\n", 0, pos) + 1
        lines[line] = lines.get(line, 0) + 1
    for line, count in list(lines.items())[:20]:
        if count < DISGUISED_WORDS:
            continue
        end = text.find("\n", line)
        end = len(text) if end < 0 else end
        if end - line > 4000:
            end = line + 4000
        plain = "".join(c if c.isascii() else fold_char(c) for c in text[line:end]).strip()
        if len(plain) >= 12:
            found.payloads.append((line, end, plain, kind))


def _special(text: str, found: Found) -> None:
    splits: list[int] = []
    words: set[str] = set()
    bidi: dict[str, list[int]] = {"override": [], "embedding": [], "isolate": []}
    count = 0
    for m in _SPECIAL.finditer(text):
        count += 1
        if count > MAX_SPECIAL:
            break
        ch = m.group()
        i = m.start()
        if ch in ZERO_WIDTH:
            if ch == "\ufeff" and i == 0:
                continue
            before, after = _neighbour(text, i, -1), _neighbour(text, i, 1)
            sb, sa = _letter_script(before), _letter_script(after)
            if sb and sb == sa and (sb == "LATIN" or sb in confusables.SIMILAR_TO_LATIN):
                splits.append(i)
                if len(words) < 50:
                    a = i
                    while a > 0 and (text[a - 1].isalpha() or text[a - 1] in ZERO_WIDTH) \
                            and i - a < 40:
                        a -= 1
                    b = i
                    while b < len(text) and (text[b].isalpha() or text[b] in ZERO_WIDTH) \
                            and b - i < 40:
                        b += 1
                    words.add(text[a:b])
        elif ch in BIDI_EMBED_OVERRIDE or ch in BIDI_ISOLATE:
            if ch in ("\u202c", "\u2069"):
                continue  # the closing controls are counted with their openers
            if _RTL.search(text, max(0, i - 40), i + 40):
                continue
            kind = "override" if ch in BIDI_OVERRIDES else \
                "isolate" if ch in BIDI_ISOLATE else "embedding"
            bidi[kind].append(i)
    if splits:
        _disguised_lines(text, [i for n, i in enumerate(splits) if n == 0 or
                                i - splits[n - 1] > 2], found, "zero-width split words")
        n = len(words)
        weight = 0.1 if n == 1 else 0.2 if n == 2 else 0.3 if n < 8 else 0.4
        first = splits[0]
        found.hits.append(UnicodeHit(
            "zero-width", weight, first, first + 1,
            visible(text[max(0, first - 30):first + 30]),
            {"characters": len(splits), "words": n,
             "examples": [visible(w, 60) for w in sorted(words)[:5]]}))
    for kind, positions in bidi.items():
        if not positions:
            continue
        first = positions[0]
        weight = {"override": 0.35, "embedding": 0.15, "isolate": 0.15}[kind]
        end = _bidi_end(text, first)
        logical = text[first:end]
        detail = {"controls": len(positions), "kind": kind,
                  "logical_order": visible(logical, 120)}
        if kind == "override":
            detail["displayed_as"] = visible(_displayed(logical), 120)
        found.hits.append(UnicodeHit("bidi-control", weight, first, end,
                                     visible(text[max(0, first - 20):end + 20]), detail))
    _tags(text, found)
    _zero_width_runs(text, found)


def _zero_width_runs(text: str, found: Found) -> None:
    """Long runs of zero-width characters: an invisible message in two symbols, maybe."""
    from gate.checks.injection.encoded import readable
    runs = 0
    for m in _ZW_RUN.finditer(text):
        runs += 1
        if runs > 20:
            break
        run = m.group()[:8 * 4096]
        symbols = sorted(set(run) - {"\u2060"})
        message = None
        if len(symbols) == 2:
            for zero, one in ((symbols[0], symbols[1]), (symbols[1], symbols[0])):
                bits = "".join("0" if c == zero else "1" for c in run if c in symbols)
                data = bytes(int(bits[i:i + 8], 2) for i in range(0, len(bits) - 7, 8))
                message = readable(data)
                if message:
                    break
        detail = {"characters": len(m.group()), "distinct": len(set(run))}
        if message:
            detail["decoded"] = message[:600]
            found.payloads.append((m.start(), m.end(), message[:4000], "zero-width characters"))
        found.hits.append(UnicodeHit("zero-width", 0.45 if message else 0.3, m.start(), m.end(),
                                     visible(text[max(0, m.start() - 20):m.start() + 12], 120),
                                     detail))


def _bidi_end(text: str, start: int) -> int:
    close = min((p for p in (text.find("\u202c", start), text.find("\u2069", start),
                             text.find("\n", start)) if p >= 0), default=-1)
    end = close + 1 if close >= 0 else min(len(text), start + 200)
    return min(end, start + 400)


def _displayed(logical: str) -> str:
    """What an override displays: the overridden run reversed (a simplification of UAX #9)."""
    inner = logical.strip("\u202a\u202b\u202c\u202d\u202e\u2066\u2067\u2068\u2069\n")
    return inner[::-1] if "\u202e" in logical else inner


def _tags(text: str, found: Found) -> None:
    runs = 0
    for m in _TAG_RUN.finditer(text):
        runs += 1
        if runs > 200:
            break
        run = m.group()
        start = m.start()
        cps = [ord(c) for c in run]
        if start > 0 and text[start - 1] == BLACK_FLAG and cps[-1] == CANCEL_TAG and \
                2 <= len(cps) - 1 <= 6 and all(0xE0030 <= c <= 0xE0039 or 0xE0061 <= c <= 0xE007A
                                                for c in cps[:-1]):
            continue  # a subdivision flag such as England
        message = "".join(chr(c - TAG_FIRST) for c in cps if 0xE0020 <= c <= 0xE007E)
        if not message.strip():
            continue
        found.payloads.append((start, m.end(), message[:4000], "tag characters"))
    tags = [p for p in found.payloads if p[3] == "tag characters"]
    if tags:
        total = sum(len(p[2]) for p in tags)
        first = tags[0]
        weight = 0.5 if total >= 8 else 0.3
        decoded = " ".join(p[2] for p in tags)[:600]
        found.hits.append(UnicodeHit(
            "tag-characters", weight, first[0], first[1],
            visible(text[max(0, first[0] - 20):first[0] + 12], 120),
            {"runs": len(tags), "characters": total, "decoded": decoded}))


def _mixed_script(text: str, found: Found) -> None:
    latin = other = 0
    mixed: list[tuple[int, int, str]] = []
    whole: list[tuple[int, int, str]] = []
    tokens = 0
    for m in _WORD.finditer(text):
        tokens += 1
        if tokens > 50_000:
            break
        word = m.group()
        if word.isascii():
            latin += 1
            continue
        if len(word) <= 3 and any(confusables.script(c) == "GREEK" for c in word):
            # "θd", "σσ", "αβ": mathematical notation, not a disguised word
            other += 1
            continue
        scripts = set()
        lookalike = False
        for c in word:
            s = confusables.script(c)
            scripts.add(s)
            if s in confusables.SIMILAR_TO_LATIN and confusables.ascii_prototype(c):
                lookalike = True
        scripts.discard("COMMON")
        if "LATIN" in scripts:
            latin += 1
            if lookalike and len(mixed) < 200:
                mixed.append((m.start(), m.end(), word))
        else:
            other += 1
            if lookalike and scripts <= confusables.SIMILAR_TO_LATIN and len(whole) < 200 and \
                    all(confusables.ascii_prototype(c) for c in word):
                whole.append((m.start(), m.end(), word))
    candidates = list(mixed)
    if whole and latin >= 4 * max(1, other):  # look-alike words inside a Latin text
        candidates += whole
    if not candidates:
        return
    candidates.sort()
    _disguised_lines(text, [c[0] for c in candidates], found, "look-alike letters")
    n = len(candidates)
    weight = 0.15 if n == 1 else 0.25 if n == 2 else 0.35 if n < 6 else 0.45
    start, end, word = candidates[0]
    found.hits.append(UnicodeHit(
        "mixed-script", weight, start, end, visible(word, 80),
        {"words": n, "examples": [
            {"word": visible(w, 60), "reads_as": fold(w).text[:60],
             "scripts": sorted({confusables.script(c) for c in w if c.isalpha()})}
            for _, _, w in candidates[:5]]}))
