"""quality: does the text look like prose a reader would want retrieved?

The filters are the document-quality and repetition filters of the Gopher paper (Rae et
al. 2021, "Scaling Language Models: Methods, Analysis & Insights from Training Gopher",
appendix A, MassiveWeb quality filtering; the repetition limits are its Table A1). Every
default below is the paper's value; every limit can be changed or switched off with
``null``. Words are whitespace-separated tokens; lines and paragraphs (blocks separated by a
blank line) are counted without empty ones.

* how much text: ``words_at_least`` .. ``words_at_most`` words (50 .. 100,000);
* what the words look like: mean word length ``word_length_at_least`` ..
  ``word_length_at_most`` (3 .. 10 characters); at least ``lettered_words_at_least`` (80 %)
  of words containing an alphabetic character; at least ``stop_words_at_least`` (2)
  distinct stop words. The paper's list is English (the, be, to, of, and, that, have,
  with) and is applied to English text; gate ships lists for a few other languages
  (compiled from common usage, not from the paper) and skips the rule for languages it has
  no list for;
* symbols and line shapes: at most ``symbols_per_word_at_most`` (0.1) per word, separately
  for ``#`` and for ellipses (``...``, ``…``); at most ``bullet_lines_at_most`` (90 %) of
  lines starting with a bullet, at most ``ellipsis_lines_at_most`` (30 %) ending with an
  ellipsis;
* repetition: repeated lines and paragraphs (``repeated_lines_at_most``,
  ``repeated_paragraphs_at_most``: share 0.30; ``repeated_line_chars_at_most``,
  ``repeated_paragraph_chars_at_most``: character share 0.20), the most frequent 2-, 3-,
  4-gram's character share (``top_ngram_chars_at_most``: 0.20, 0.18, 0.16), and the
  character share covered by repeated 5- to 10-grams (``repeated_ngram_chars_at_most``:
  0.15 down to 0.10).

Keys are named by what they measure; the rules and values are the paper's.

Example::

    quality:
      words_at_least: 20           # short notices are welcome in this corpus
      stop_words_at_least: null    # switch the stop-word rule off
      action: warn
"""

from __future__ import annotations

import re
from collections import Counter
from itertools import count, repeat
from typing import Any

import numpy as np
from pydantic import Field, field_validator

from gate.checks.base import Document, DocumentCheck, RunContext
from gate.extract.model import Extraction
from gate.findings import Finding, define
from gate.settings import Section

MAX_SCANNED_WORDS = 120_000  # beyond words_at_most the document fails anyway

WORD_COUNT = define("quality.word-count", "too few or too many words",
                    "the text has {words} words; the limits are {low} to {high}")
WORD_LENGTH = define("quality.word-length", "unusual mean word length",
                     "the mean word length is {mean:.1f} characters; the limits are {low} to "
                     "{high}")
SYMBOLS = define("quality.symbols", "too many '#' or ellipses per word",
                 "there are {ratio:.2f} {symbol} per word, more than {limit}")
BULLETS = define("quality.bullets", "mostly bullet lines",
                 "{share:.0%} of lines start with a bullet, more than {limit:.0%}")
ELLIPSIS_LINES = define("quality.ellipsis-lines", "many lines trail off with an ellipsis",
                        "{share:.0%} of lines end with an ellipsis, more than {limit:.0%}")
NON_ALPHA = define("quality.non-alphabetic", "too few words with letters",
                   "only {share:.0%} of words contain a letter, fewer than {limit:.0%}")
STOP_WORDS = define("quality.no-stop-words", "almost no ordinary function words",
                    "the {language} text contains {found} distinct stop words ({words}); at "
                    "least {limit} are expected in running prose")
REPEATED = define("quality.repetition", "the text repeats itself",
                  "the text repeats itself: {summary}")

# Gopher's stop-word list (English). The others are common function words compiled for
# gate from general knowledge of each language (not from the paper; from memory).
STOP_LISTS: dict[str, tuple[str, ...]] = {
    "en": ("the", "be", "to", "of", "and", "that", "have", "with"),
    "de": ("der", "die", "das", "und", "ist", "zu", "mit", "von", "nicht", "ein"),
    "fr": ("le", "la", "les", "et", "de", "des", "est", "que", "pour", "dans"),
    "es": ("el", "la", "los", "las", "y", "de", "que", "en", "es", "para"),
    "nl": ("de", "het", "een", "en", "van", "is", "dat", "op", "te", "met"),
    "it": ("il", "la", "di", "e", "che", "per", "un", "una", "con", "non"),
}
_BULLETS = ("•", "●", "○", "◦", "▪", "▫", "‣", "⁃", "-", "*", "–", "—", "·")
_ELLIPSES = ("...", "…")
_PARAGRAPH = re.compile(r"\n\s*\n")


_TOP_N = range(2, 5)  # n of the most-frequent n-gram shares measured (Gopher Table A1)
_DUP_N = range(5, 11)  # n of the repeated n-gram shares measured


class QualitySettings(Section):
    """Gopher document-quality filters; defaults are the paper's values, null disables.

    Keys are named by what they measure, then the bound: ``<measure>_at_least`` or
    ``<measure>_at_most``. Groups: how much text (``words_*``), what its words look like
    (``word_length_*``, ``lettered_words_*``, ``stop_words_*``), symbols and line shapes
    (``symbols_per_word_*``, ``bullet_lines_*``, ``ellipsis_lines_*``), and repetition
    (``repeated_*``, ``top_ngram_chars_*``)."""

    # how much text (Gopher: 50 to 100,000 words)
    words_at_least: int | None = Field(50, ge=0, le=100_000_000, description="Fewest words.")
    words_at_most: int | None = Field(100_000, ge=1, le=100_000_000, description="Most words.")
    # what the words look like (Gopher: mean length 3 to 10, 80 % with a letter, 2 stop words)
    word_length_at_least: float | None = Field(
        3, ge=0, le=1000, description="Shortest mean word length, characters.")
    word_length_at_most: float | None = Field(
        10, ge=0, le=1000, description="Longest mean word length, characters.")
    lettered_words_at_least: float | None = Field(
        0.8, ge=0, le=1, description="Smallest share of words containing a letter.")
    stop_words_at_least: int | None = Field(
        2, ge=0, le=10_000,
        description="Fewest distinct stop words (for languages gate has a list for).")
    # symbols and line shapes (Gopher: 0.1 per word, 90 % bullets, 30 % ellipsis endings)
    symbols_per_word_at_most: float | None = Field(
        0.1, ge=0, le=1000, description="Most '#' (or ellipses) per word.")
    bullet_lines_at_most: float | None = Field(
        0.9, ge=0, le=1, description="Largest share of lines starting with a bullet.")
    ellipsis_lines_at_most: float | None = Field(
        0.3, ge=0, le=1, description="Largest share of lines ending with an ellipsis.")
    # repetition (Gopher Table A1)
    repeated_lines_at_most: float | None = Field(
        0.30, ge=0, le=1, description="Largest share of lines that repeat an earlier line.")
    repeated_paragraphs_at_most: float | None = Field(
        0.30, ge=0, le=1, description="Largest share of repeated paragraphs.")
    repeated_line_chars_at_most: float | None = Field(
        0.20, ge=0, le=1, description="Largest character share of repeated lines.")
    repeated_paragraph_chars_at_most: float | None = Field(
        0.20, ge=0, le=1, description="Largest character share of repeated paragraphs.")
    top_ngram_chars_at_most: dict[int, float] = Field(
        {2: 0.20, 3: 0.18, 4: 0.16}, description="n -> largest character share of the most "
        "frequent n-gram (Gopher Table A1); remove an entry to switch it off.")
    repeated_ngram_chars_at_most: dict[int, float] = Field(
        {5: 0.15, 6: 0.14, 7: 0.13, 8: 0.12, 9: 0.11, 10: 0.10},
        description="n -> largest character share covered by n-grams that occur more "
        "than once (Gopher Table A1).")

    @field_validator("top_ngram_chars_at_most", "repeated_ngram_chars_at_most")
    @classmethod
    def _ngram_limits(cls, value: dict[int, float], info: Any) -> dict[int, float]:
        measured = _TOP_N if info.field_name == "top_ngram_chars_at_most" else _DUP_N
        for n, share in value.items():
            if n not in measured:
                raise ValueError(f"n = {n} is not measured; use n from {measured[0]} to "
                                 f"{measured[-1]}")
            if not 0.0 <= share <= 1.0:
                raise ValueError(f"the share for n = {n} must be between 0 and 1")
        return value


def _duplicates(parts: list[str]) -> tuple[float, float]:
    """Share of parts that repeat an earlier part, and their share of characters (what
    is not a part's first appearance)."""
    if not parts:
        return 0.0, 0.0
    distinct = set(parts)
    total = sum(map(len, parts))
    repeated_chars = total - sum(map(len, distinct))
    return (len(parts) - len(distinct)) / len(parts), repeated_chars / total if total else 0.0


def _ngram_shares(words: list[str]) -> tuple[dict[str, float], dict[str, float]]:
    """Top 2..4-gram and duplicated 5..10-gram character shares of ``words``."""
    ids = {w: i for i, w in enumerate(dict.fromkeys(words), 1)}
    seq = np.fromiter(map(ids.__getitem__, words), dtype=np.uint64, count=len(words))
    lengths = np.fromiter(map(len, ids), dtype=np.int64, count=len(ids))
    return _shares(seq, np.concatenate(([0], lengths)))


def _occurrences(values: np.ndarray) -> np.ndarray:
    """How often each element's value occurs among ``values`` (what ``counts[inverse]`` of
    ``np.unique`` gives, from one sort and the lengths of its runs)."""
    if not values.size:
        return np.zeros(0, dtype=np.int64)
    order = np.argsort(values)
    ordered = values[order]
    starts = np.flatnonzero(np.concatenate(([True], ordered[1:] != ordered[:-1])))
    runs = np.diff(np.append(starts, values.size))
    out = np.empty(values.size, dtype=np.int64)
    out[order] = np.repeat(runs, runs)
    return out


def _shares(seq: np.ndarray, length_of: np.ndarray) -> tuple[dict[str, float], dict[str, float]]:
    """Top 2..4-gram and duplicated 5..10-gram character shares, vectorised, of the words
    ``seq`` (ids numbered from 1 in order of first appearance; ``length_of[id]`` is a
    word's length in characters).

    Each n-gram is identified by a 64-bit polynomial hash of its word ids (a collision
    would need two different n-grams of one document to hash alike: negligible).
    """
    top = {str(n): 0.0 for n in _TOP_N}
    dup = {str(n): 0.0 for n in _DUP_N}
    size = seq.size
    if size < 2:
        return top, dup
    positions = seq.astype(np.int64)
    lengths = length_of[positions]
    total = int(lengths.sum())
    if not total:
        return top, dup
    prefix = np.concatenate(([0], np.cumsum(lengths)))
    prime = np.uint64(1_000_003)
    hashes = seq.copy()
    # An n-gram can repeat only where the (n-1)-gram starting at the same word repeats,
    # and every occurrence of a repeated n-gram is such a place: so each n counts only
    # among the places where the shorter gram repeated (from the words that repeat), with
    # the same counts, a fraction of the sorting.
    word_counts = np.bincount(positions)
    places = np.flatnonzero(word_counts[positions] > 1)
    with np.errstate(over="ignore"):
        for n in range(2, 11):
            if size < n:
                break
            hashes = hashes[:-1] * prime + seq[n - 1:]
            places = places[places < hashes.size]
            per_gram = _occurrences(hashes[places])
            repeated = per_gram > 1
            if n <= 4:
                if repeated.any():
                    at = int(np.argmax(per_gram))  # the first place with the most repeats
                    best = int(places[at])
                    chars = int(prefix[best + n] - prefix[best])
                    top[str(n)] = round(float(per_gram[at]) * chars / total, 4)
            else:
                starts = places[repeated]
                if not starts.size:
                    # no n-gram repeats, so no longer one can: the rest stay 0
                    break
                marks = np.zeros(size + 1, dtype=np.int64)
                np.add.at(marks, starts, 1)
                np.add.at(marks, starts + n, -1)
                covered = np.cumsum(marks[:-1]) > 0
                dup[str(n)] = round(float(lengths[covered].sum()) / total, 4)
            places = places[repeated]
    return top, dup


# up to this many words :func:`measure` counts in plain Python (:func:`_shares_small`):
# numpy's fixed cost per call is most of the work on a short note (about 85 -> 30 us)
SMALL_TEXT_WORDS = 64


def _shares_small(seq: list[int], length_of: list[int]
                  ) -> tuple[dict[str, float], dict[str, float]]:
    """What :func:`_shares` gives for a short text, in plain Python: the n-grams are
    compared as tuples of word ids (exactly, where :func:`_shares` compares hashes)."""
    top = {str(n): 0.0 for n in _TOP_N}
    dup = {str(n): 0.0 for n in _DUP_N}
    size = len(seq)
    if size < 2:
        return top, dup
    lengths = [length_of[i] for i in seq]
    total = sum(lengths)
    if not total:
        return top, dup
    for n in range(2, min(size, 10) + 1):
        grams = list(zip(*(seq[k:size - n + 1 + k] for k in range(n))))
        counts = Counter(grams)
        if n <= 4:
            most = max(counts.values())
            if most == 1:  # no n-gram repeats, so no longer one can: the rest stay 0
                break
            # the first place with the most repeats
            best = next(i for i, gram in enumerate(grams) if counts[gram] == most)
            top[str(n)] = round(float(most) * sum(lengths[best:best + n]) / total, 4)
        else:
            covered: set[int] = set()
            for i, gram in enumerate(grams):
                if counts[gram] > 1:
                    covered.update(range(i, i + n))
            if not covered:  # no n-gram repeats, so no longer one can: the rest stay 0
                break
            dup[str(n)] = round(float(sum(lengths[i] for i in covered)) / total, 4)
    return top, dup


_PUNCT = "".join(chr(c) for c in range(0x21, 0x7F) if not chr(c).isalnum()) + \
    "\u2026\u201c\u201d\u2018\u2019\u00ab\u00bb\u2013\u2014"
# a token counts as a word with a letter when it holds a word character that is neither a
# digit nor an underscore
_LETTER = re.compile(r"[^\W\d_]", re.UNICODE)


def measure(extraction: Extraction) -> dict[str, Any]:
    """Text statistics for the Gopher filters (runs in the worker).

    Each distinct word is looked at once (lower-cased, punctuation stripped, whether it
    has a letter); the words are then numbers in numpy arrays."""
    text = extraction.text
    tokens = text.split()
    words = tokens[:MAX_SCANNED_WORDS]
    lines = [line for line in map(str.strip, text.split("\n")) if line]
    paragraphs = [p for p in map(str.strip, _PARAGRAPH.split(text)) if p]
    n = len(tokens)
    # the distinct tokens in order of first appearance, and each token's place among them
    distinct = dict(zip(dict.fromkeys(words), count()))
    # each distinct token lower-cased and stripped of punctuation; the forms numbered from
    # 1 in order of first appearance (0: nothing left, dropped from the n-grams)
    forms = list(map(str.strip, map(str.lower, distinct), repeat(_PUNCT)))
    number = dict(zip(dict.fromkeys(filter(None, forms)), count(1)))
    small = len(words) <= SMALL_TEXT_WORDS
    if small:  # the same figures in plain Python (numpy's cost per call dominates here)
        place_list = list(map(distinct.__getitem__, words))
        form_ids = list(map(number.get, forms, repeat(0)))
        lettered = sum(map(bool, map(_LETTER.search, words)))
        letters = sum(map(len, words))
    else:
        place = np.fromiter(map(distinct.__getitem__, words), dtype=np.int64,
                            count=len(words))
        ids = np.fromiter(map(number.get, forms, repeat(0)), dtype=np.uint64,
                          count=len(forms))
        has_letter = np.fromiter(map(bool, map(_LETTER.search, distinct)), dtype=bool,
                                 count=len(distinct))
        lettered = int(np.count_nonzero(has_letter[place]))
        letters = int(np.fromiter(map(len, distinct), dtype=np.int64,
                                  count=len(distinct))[place].sum())
    stats: dict[str, Any] = {
        "words": n,
        "mean_word_length": letters / len(words) if words else 0.0,
        "hash_ratio": text.count("#") / n if n else 0.0,
        "ellipsis_ratio": (text.count("...") + text.count("\u2026")) / n if n else 0.0,
        "bullet_lines": sum(map(str.startswith, lines, repeat(_BULLETS))) / len(lines)
        if lines else 0.0,
        "ellipsis_lines": sum(map(str.endswith, lines, repeat(_ELLIPSES))) / len(lines)
        if lines else 0.0,
        "alphabetic_words": lettered / len(words) if words else 0.0,
    }
    vocabulary = set(number)
    stats["stop_words"] = {lang: sorted(vocabulary.intersection(stop))
                           for lang, stop in STOP_LISTS.items()}
    stats["duplicate_lines"], stats["duplicate_line_chars"] = _duplicates(lines)
    stats["duplicate_paragraphs"], stats["duplicate_paragraph_chars"] = _duplicates(paragraphs)
    if small:
        stats["top_ngram_chars"], stats["duplicate_ngram_chars"] = _shares_small(
            [i for i in map(form_ids.__getitem__, place_list) if i],
            [0, *map(len, number)])
    else:
        seq = ids[place]
        seq = seq[seq > 0]
        length_of = np.zeros(len(number) + 1, dtype=np.int64)
        length_of[1:] = np.fromiter(map(len, number), dtype=np.int64, count=len(number))
        stats["top_ngram_chars"], stats["duplicate_ngram_chars"] = _shares(seq, length_of)
    return {k: round(v, 4) if isinstance(v, float) else v for k, v in stats.items()}


def evaluate(document: Document, policy: Any, run: RunContext) -> list[Finding] | None:
    settings: QualitySettings = policy.quality
    m = document.measures.get("quality")
    if not document.has_text or m is None:
        return None
    s = settings
    found: list[Finding] = []
    words = m["words"]
    low = s.words_at_least if s.words_at_least is not None else 0
    high = s.words_at_most if s.words_at_most is not None else "unlimited"
    if (s.words_at_least is not None and words < s.words_at_least) or \
            (s.words_at_most is not None and words > s.words_at_most):
        found.append(WORD_COUNT(words=words, low=low, high=high))
    mean = m["mean_word_length"]
    if (s.word_length_at_least is not None and mean < s.word_length_at_least) or \
            (s.word_length_at_most is not None and mean > s.word_length_at_most):
        found.append(WORD_LENGTH(mean=mean, low=s.word_length_at_least,
                                 high=s.word_length_at_most))
    if s.symbols_per_word_at_most is not None:
        for key, symbol in (("hash_ratio", "'#'"), ("ellipsis_ratio", "ellipses")):
            if m[key] > s.symbols_per_word_at_most:
                found.append(SYMBOLS(ratio=m[key], symbol=symbol,
                                     limit=s.symbols_per_word_at_most))
    if s.bullet_lines_at_most is not None and m["bullet_lines"] > s.bullet_lines_at_most:
        found.append(BULLETS(share=m["bullet_lines"], limit=s.bullet_lines_at_most))
    if s.ellipsis_lines_at_most is not None and m["ellipsis_lines"] > s.ellipsis_lines_at_most:
        found.append(ELLIPSIS_LINES(share=m["ellipsis_lines"], limit=s.ellipsis_lines_at_most))
    if s.lettered_words_at_least is not None and \
            m["alphabetic_words"] < s.lettered_words_at_least:
        found.append(NON_ALPHA(share=m["alphabetic_words"], limit=s.lettered_words_at_least))
    language = (document.measures.get("language") or {}).get("languages") or []
    lang = language[0][0] if language else None
    if s.stop_words_at_least is not None and lang in m["stop_words"]:
        present = m["stop_words"][lang]
        if len(present) < s.stop_words_at_least:
            found.append(STOP_WORDS(language=lang, found=len(present),
                                    words=", ".join(present) or "none",
                                    limit=s.stop_words_at_least))
    repeats: list[dict[str, Any]] = []
    for key, limit, name in (
            ("duplicate_lines", s.repeated_lines_at_most, "repeated lines"),
            ("duplicate_paragraphs", s.repeated_paragraphs_at_most, "repeated paragraphs"),
            ("duplicate_line_chars", s.repeated_line_chars_at_most,
             "characters in repeated lines"),
            ("duplicate_paragraph_chars", s.repeated_paragraph_chars_at_most,
             "characters in repeated paragraphs")):
        if limit is not None and m[key] > limit:
            repeats.append({"measure": key, "name": name, "value": m[key], "limit": limit})
    for n, limit in sorted(s.top_ngram_chars_at_most.items()):
        value = m["top_ngram_chars"].get(str(n))
        if value is not None and value > limit:
            repeats.append({"measure": f"top_{n}gram_chars", "value": value, "limit": limit,
                            "name": f"characters in the most frequent {n}-gram"})
    for n, limit in sorted(s.repeated_ngram_chars_at_most.items()):
        value = m["duplicate_ngram_chars"].get(str(n))
        if value is not None and value > limit:
            repeats.append({"measure": f"duplicate_{n}gram_chars", "value": value,
                            "limit": limit, "name": f"characters in repeated {n}-grams"})
    if repeats:
        summary = "; ".join(f"{r['value']:.0%} {r['name']} (limit {r['limit']:.0%})"
                            for r in repeats)
        found.append(REPEATED(summary=summary, measures=repeats))
    return found


CHECK = DocumentCheck(id="quality", section="quality", evaluate=evaluate,
                      settings=QualitySettings, measure=measure, measure_version=2,
                      doc=__doc__ or "")
