"""duplicate: is the document a copy or near-copy of one already kept?

A corpus check: it sees every candidate of the batch and every document accepted in
earlier runs. Only documents that pass every other check compete to be kept, so a stale
or denied copy never knocks out a good one; documents already held for other reasons are
still compared with the keepers, so their reasons say they are duplicates too.

How similarity is measured (in the worker): the text is the document's own (a site's
template is removed first, see ``gate/templates.py``); it is normalised (Markdown link
targets and inline tags dropped, NFKC, case-folded, punctuation to spaces, so headings,
list items and table cells give the same words from HTML, PDF, text and Markdown), split
into words, and turned into the set of word 5-grams (the
shingles of Broder 1997, with w = 5 as in published corpus pipelines, for example FineWeb
and RefinedWeb). A MinHash sketch of 256 permutations (datasketch, ``affine32`` scheme,
seed 1; each shingle hashed to 32 bits from the CRC-32 of its words) estimates the Jaccard
similarity of two shingle sets with a standard error of
``sqrt(J(1-J)/256)``, 0.025 at J = 0.8. Exact copies (same bytes, or same normalised text,
whatever the format) are caught first by hash; only they are called exact copies, and
when the text is the same but the bytes differ the finding says that it is the extracted
text that is identical, how long it is, and that a shared text on different pages may be
a site template. Everything else is a near-duplicate with its estimated Jaccard.
Documents with fewer than ``min_shingles`` shingles are compared only exactly, because
sketches of tiny sets collide.

Candidates come from MinHash LSH with ``b`` bands of ``r`` rows chosen so that a pair at
the threshold becomes a candidate with probability at least 0.99 and a pair 0.05 above it
with at least 0.995 (1-(1-t^r)^b, Mining of Massive Datasets section 3.4.2); each
candidate is then confirmed by the estimated Jaccard ``>= duplicates.threshold``; an
estimate within ``EXACT_MARGIN`` of the threshold (where a 256-permutation estimate errs
either way about one time in five) is replaced by the exact Jaccard of the two texts'
shingle sets when both texts can be read (a finding says which it reports).

Which one is kept: documents are ranked by the ``trust`` of their allow rule (higher
first), then by date (newer first; undated last), then by first seen (earlier runs first,
then inbox order), and taken greedily: a document is kept unless it is a near-duplicate of
one already kept. Once every keeper is chosen, a held document is named under the kept
document it is closest to (copies first, then the highest similarity; a keeper ranked below
it can be closer than the one that held it, and the finding then says which one held it),
and ``also_keepers`` lists every other kept document it is a copy or near-duplicate of, each
with its similarity, so a reviewer sees all of them. The finding names the keeper, the
similarity and, when the two differ in numbers, dates or amounts, the differing tokens side
by side. When the keeper replaces a
document accepted in an earlier run, that one is superseded.

Example::

    duplicates:
      threshold: 0.80
"""

from __future__ import annotations

import difflib
import hashlib
import re
import zlib
from collections.abc import Callable, Sequence
from dataclasses import dataclass, field
from datetime import datetime
from functools import lru_cache
from typing import Any

import numpy as np
from datasketch import LeanMinHash, MinHash, MinHashLSH
from pydantic import Field

from gate.checks.base import CorpusCheck, CorpusOutcome, CorpusView
from gate.extract.model import Extraction
from gate.findings import Finding, define
from gate.settings import Section
from gate.tokens import words

__all__ = ["CHECK", "words"]

NUM_PERM = 256
SEED = 1
SCHEME = "affine32"
SHINGLE = 5
MIN_CANDIDATE_PROBABILITY = 0.995
AT_THRESHOLD = 0.99  # candidate probability of a pair at the threshold
FAR_BELOW = 0.15  # at most this for a pair 0.3 below it
# an estimate this close to the threshold is checked against the exact Jaccard of the
# two texts' shingle sets: 2.4 standard errors of a 256-permutation estimate at J = 0.8
EXACT_MARGIN = 0.06

EXACT = define("duplicate.exact", "an exact copy of a kept document",
               "this is an exact copy ({how}) of {keeper}, which is kept{why}{caveat}{also}")
NEAR = define("duplicate.near", "a near-duplicate of a kept document",
              "this is a near-duplicate of {keeper} ({measure} {similarity:.2f}, "
              "threshold {threshold:.2f}), which is kept{why}{diverging}{also}")
SUPERSEDED = define("duplicate.superseded", "replaced by a newer or more trusted version",
                    "accepted in an earlier run, now replaced by {keeper} ({measure} "
                    "{similarity:.2f}){why}{diverging}{also}")


class DuplicatesSettings(Section):
    """Near-duplicate detection."""

    threshold: float = Field(0.80, ge=0.3, le=1.0, description="Estimated Jaccard "
                             "similarity at or above which two documents are "
                             "near-duplicates.", examples=[0.8])
    min_shingles: int = Field(20, ge=1, le=1_000_000, description="Documents with fewer "
                              "word 5-grams are only compared exactly.")



@lru_cache(maxsize=1)
def _permutations() -> Any:
    return MinHash(num_perm=NUM_PERM, seed=SEED).permutations


def lean(hashvalues: bytes) -> LeanMinHash:
    values = np.frombuffer(hashvalues, dtype="<u4").astype(np.uint64)
    return LeanMinHash(seed=SEED, hashvalues=values, scheme=SCHEME)


_PRIME = np.uint64(1_099_511_628_211)  # the 64-bit FNV prime, as a multiplier


def shingle_hashes(tokens: Sequence[str], w: int = SHINGLE) -> np.ndarray:
    """32-bit hashes of the distinct word w-shingles, computed without building strings.

    Each word is hashed with CRC-32; a shingle's hash folds its w word hashes with a
    polynomial (mod 2^64) down to 32 bits. Equal shingles always hash equal, in every
    document and process; two different shingles of one document colliding is as rare as
    a 32-bit hash collision, which affects the MinHash estimate negligibly (checked against
    exact Jaccard in tests/test_duplicate.py).
    """
    if not tokens:
        return np.zeros(0, dtype=np.uint32)
    # each distinct word hashed once; the per-token lookup is a C-level map
    distinct = set(tokens)
    table = dict(zip(distinct, map(zlib.crc32, map(str.encode, distinct))))
    values = np.fromiter(map(table.__getitem__, tokens), dtype=np.uint64, count=len(tokens))
    if len(tokens) < w:
        return np.array([int.from_bytes(hashlib.sha256(" ".join(tokens).encode()).digest()[:4],
                                        "little")], dtype=np.uint32)
    grams = values[:len(values) - w + 1].copy()
    with np.errstate(over="ignore"):
        for k in range(1, w):
            grams = grams * _PRIME + values[k:len(values) - w + 1 + k]
    folded = ((grams ^ (grams >> np.uint64(32))) & np.uint64(0xFFFFFFFF)).astype(np.uint32)
    # distinct and sorted, as np.unique gives them; sorting and dropping repeats is several
    # times faster than np.unique's hash table on numpy 2.x
    folded.sort()
    if folded.size < 2:
        return folded
    return folded[np.concatenate(([True], folded[1:] != folded[:-1]))]


def _fmix32(values: np.ndarray) -> np.ndarray:
    """MurmurHash3's 32-bit finalizer (fmix32), element-wise, wrapping: the pre-mix
    datasketch's affine32 scheme applies to every input hash."""
    h = values.astype(np.uint32)
    with np.errstate(over="ignore"):
        h ^= h >> np.uint32(16)
        h *= np.uint32(0x85EBCA6B)
        h ^= h >> np.uint32(13)
        h *= np.uint32(0xC2B2AE35)
        h ^= h >> np.uint32(16)
    return h


SLICE = 512  # items per block: a block of SLICE x NUM_PERM uint32 stays in cache


def sketch_values(hashes: np.ndarray) -> np.ndarray:
    """The MinHash values (uint32, NUM_PERM of them) of precomputed 32-bit item hashes:
    exactly what datasketch's ``MinHash(num_perm=256, seed=1, scheme="affine32",
    hashfunc=int).update_batch(hashes)`` holds (``min_k(a_k * fmix32(h) + b_k mod 2^32)``
    with datasketch's own ``a``, ``b``; tests/test_duplicate.py compares the two), computed
    in numpy blocks (one buffer, written in place) without datasketch's per-item Python
    hashing."""
    a, b = _uint32_permutations()
    out = np.full(NUM_PERM, 0xFFFFFFFF, dtype=np.uint32)
    mixed = _fmix32(hashes)
    buffer = np.empty((min(SLICE, mixed.size), NUM_PERM), dtype=np.uint32)
    with np.errstate(over="ignore"):
        for start in range(0, mixed.size, SLICE):
            column = mixed[start:start + SLICE, None]
            block = buffer[:column.shape[0]]
            np.multiply(column, a, out=block)
            np.add(block, b, out=block)
            np.minimum(out, block.min(axis=0), out=out)
    return out


@lru_cache(maxsize=1)
def _uint32_permutations() -> tuple[np.ndarray, np.ndarray]:
    a, b = _permutations()
    return a.astype(np.uint32), b.astype(np.uint32)


def sketch_hashes(hashes: np.ndarray) -> MinHash:
    """A datasketch MinHash (affine32, seed 1) of precomputed 32-bit item hashes."""
    return MinHash(num_perm=NUM_PERM, seed=SEED, permutations=_permutations(), scheme=SCHEME,
                   hashvalues=sketch_values(hashes))


def measure(extraction: Extraction) -> dict[str, Any]:
    """Shingle the text and sketch it (runs in the worker)."""
    tokens = words(extraction.text)
    normal = " ".join(tokens)
    grams = shingle_hashes(tokens)
    values = sketch_values(grams).astype("<u4").tobytes()
    return {"text_sha256": hashlib.sha256(normal.encode("utf-8")).hexdigest(),
            "shingles": len(grams), "words": len(tokens), "minhash": values}


def _curve(s: float, bands: int, rows: int) -> float:
    return 1 - (1 - s ** rows) ** bands


def band_params(threshold: float, num_perm: int = NUM_PERM) -> tuple[int, int]:
    """LSH bands and rows for ``threshold``, by the S-curve P(s) = 1-(1-s^r)^b (Mining of
    Massive Datasets, section 3.4.2).

    The fewest bands (memory and query time grow with them) such that a pair at the
    threshold is a candidate with P >= ``AT_THRESHOLD`` (0.99), a pair 0.05 above it with
    P >= 0.995, and a pair 0.3 below it with P <= ``FAR_BELOW`` (0.15: candidates cost an
    estimate each, and pages sharing a template do not all become candidates of each
    other). Where no choice meets all three, the most rows that still give P >= 0.995 at
    the threshold. For 0.80 and 256 permutations: 20 bands of 7 rows (0.991 at 0.80, 0.145
    at 0.50; the earlier 21 x 9, from P >= 0.9 at the threshold, left a pair at 0.80 out
    one time in twenty, and copies of a thin page sit there).
    """
    high, low = min(1.0, threshold + 0.05), max(0.0, threshold - 0.3)
    best: tuple[int, int] | None = None
    for rows in range(1, num_perm + 1):
        for bands in range(2, num_perm // rows + 1):
            if _curve(threshold, bands, rows) >= AT_THRESHOLD and \
                    _curve(high, bands, rows) >= MIN_CANDIDATE_PROBABILITY:
                if _curve(low, bands, rows) <= FAR_BELOW and (best is None or bands < best[0]):
                    best = (bands, rows)
                break
    if best is not None:
        return best
    fallback = (num_perm, 1)
    for rows in range(1, num_perm + 1):
        bands = num_perm // rows
        if bands >= 2 and _curve(threshold, bands, rows) >= MIN_CANDIDATE_PROBABILITY:
            fallback = (bands, rows)
    return fallback


@dataclass(frozen=True)
class Item:
    """One document taking part in duplicate detection."""

    key: str  # document id
    path: str
    sha256: str
    text_sha256: str | None
    minhash: bytes | None  # None: too few shingles for a sketch comparison
    trust: int
    date: datetime | None  # the date freshness used (latest instant); None: undated
    seen: tuple  # first-seen order: (run sequence, inbox order)
    in_batch: bool = True  # False: accepted in an earlier run and not in this inbox
    accepted_before: bool = False  # accepted in an earlier run (in this inbox or not)
    candidate: bool = True  # False: already held by another check
    fixed: bool = False  # accepted by another output folder sharing the index: always kept
    words: int | None = None  # words of its normalised text, when known


@dataclass
class Outcome(CorpusOutcome):
    keepers: set[str] = field(default_factory=set)


def _rank(item: Item) -> tuple:
    date = item.date.timestamp() if item.date is not None else float("-inf")
    return (not item.fixed, -item.trust, -date, item.seen, item.key)


def _why(kept: Item, other: Item) -> str:
    if kept.fixed:
        return " (another output folder sharing the index accepted it first)"
    if kept.trust != other.trust:
        return f" (its source is more trusted: trust {kept.trust} over {other.trust})"
    if kept.date and (other.date is None or kept.date > other.date):
        return " (it is newer)"
    return " (it was seen first)"


_NUMBERISH = re.compile(r"\d")


def diverging_tokens(left: str, right: str, limit: int = 8) -> list[list[str]]:
    """Pairs of differing word runs that involve digits (numbers, dates, amounts)."""
    a, b = left.split(), right.split()
    pairs: list[list[str]] = []
    matcher = difflib.SequenceMatcher(a=a, b=b, autojunk=False)
    for op, i1, i2, j1, j2 in matcher.get_opcodes():
        if op == "equal":
            continue
        old, new = " ".join(a[i1:i2]), " ".join(b[j1:j2])
        if _NUMBERISH.search(old) or _NUMBERISH.search(new):
            pairs.append([old[:80], new[:80]])
            if len(pairs) >= limit:
                break
    return pairs


def evaluate(items: Sequence[Item], settings: DuplicatesSettings,
             text_of: Callable[[str], str | None] | None = None) -> Outcome:
    """Decide keepers among ``items`` (pure, apart from reading texts for diffs)."""
    outcome = Outcome()
    bands, rows = band_params(settings.threshold)
    lsh = MinHashLSH(num_perm=NUM_PERM, params=(bands, rows))
    by_bytes: dict[str, Item] = {}
    by_text: dict[str, Item] = {}
    kept: dict[str, Item] = {}
    competing = sorted((i for i in items if i.candidate), key=_rank)
    held = [i for i in items if not i.candidate]

    exact_sets: dict[str, np.ndarray | None] = {}

    def shingled(key: str) -> np.ndarray | None:
        if key not in exact_sets:
            text = text_of(key) if text_of is not None else None
            exact_sets[key] = None if text is None else shingle_hashes(words(text))
        return exact_sets[key]

    def similar(item: Item, key: str, estimate: float) -> tuple[float, str]:
        """The similarity that decides: the estimate, or the exact Jaccard of the two
        shingle sets when the estimate is within ``EXACT_MARGIN`` of the threshold and
        both texts can be read (an estimate there is a coin toss either way)."""
        if abs(estimate - settings.threshold) >= EXACT_MARGIN:
            return estimate, "near"
        mine, theirs = shingled(item.key), shingled(key)
        if mine is None or theirs is None or not mine.size or not theirs.size:
            return estimate, "near"
        common = np.intersect1d(mine, theirs, assume_unique=True).size
        return common / (mine.size + theirs.size - common), "near exact"

    def matches(item: Item) -> list[tuple[Item, str, float]]:
        """Every kept document ``item`` is a copy or near-duplicate of, closest first
        (copies first, then by similarity, then by rank)."""
        found: dict[str, tuple[Item, str, float]] = {}
        if item.sha256 in by_bytes:
            hit = by_bytes[item.sha256]
            found[hit.key] = (hit, "same bytes", 1.0)
        if item.text_sha256 and item.text_sha256 in by_text:
            hit = by_text[item.text_sha256]
            found.setdefault(hit.key, (hit, "same text", 1.0))
        if item.minhash is not None:
            mine = lean(item.minhash)
            for key in sorted(lsh.query(mine)):
                if key in found or key == item.key:
                    continue
                # sketches are rebuilt from their bytes for the few candidates, rather
                # than kept as objects for every kept document (memory grows with the
                # corpus)
                similarity, how = similar(item, key,
                                          float(mine.jaccard(lean(kept[key].minhash))))
                if similarity >= settings.threshold:
                    found[key] = (kept[key], how, similarity)
        return sorted(found.values(), key=lambda hit: (
            hit[1].startswith("near"), -hit[2], _rank(hit[0])))

    lost: dict[str, tuple[Item, str, float]] = {}  # the keeper ranked above that held it
    for item in competing:
        hits = matches(item)
        if not hits:
            kept[item.key] = item
            by_bytes.setdefault(item.sha256, item)
            if item.text_sha256:
                by_text.setdefault(item.text_sha256, item)
            if item.minhash is not None:
                lsh.insert(item.key, lean(item.minhash), check_duplication=False)
            continue
        lost[item.key] = hits[0]
    # with every keeper chosen, each held document is named under the kept document it
    # is closest to, and its finding lists every other kept one it duplicates too (a
    # keeper ranked below it can be closer than the one that held it)
    for item in competing:
        if item.key in kept:
            continue
        hits = matches(item) or [lost[item.key]]
        if not item.in_batch:  # superseded: named under the keeper that replaced it
            hits = [lost[item.key]] + [h for h in hits if h[0].key != lost[item.key][0].key]
        finding = _finding(item, hits, settings, text_of, lost[item.key][0])
        if not item.in_batch:
            outcome.superseded[item.key] = finding
        else:
            outcome.findings.setdefault(item.key, []).append(finding)
    for item in held:
        hits = matches(item)
        if hits:
            outcome.findings.setdefault(item.key, []).append(
                _finding(item, hits, settings, text_of, hits[0][0]))
    outcome.keepers = set(kept)
    return outcome


def _finding(item: Item, hits: Sequence[tuple[Item, str, float]],
             settings: DuplicatesSettings, text_of: Callable[[str], str | None] | None,
             held_by: Item) -> Finding:
    """The finding for ``item``: named under ``hits[0]`` (the closest kept document),
    listing the other kept documents it duplicates; ``held_by`` is the keeper ranked above
    it that kept it out (the why names it when the closest one ranks below it)."""
    keeper, how, similarity = hits[0]
    if keeper.key == held_by.key or _rank(keeper) < _rank(item):
        why = _why(keeper, item)
    else:
        why = (f" (this one is held because it also duplicates {held_by.path}, which is "
               f"kept before it{_why(held_by, item).replace(' (', ': ', 1)}")
    others = [{"keeper": other.path, "keeper_id": other.key, "similarity": round(value, 4),
               "measure": {"same bytes": "same bytes", "same text": "same text",
                           "near exact": "exact Jaccard"}.get(kind, "estimated Jaccard")}
              for other, kind, value in hits[1:]]
    also = ""
    if others:
        also = "; it is also a near-duplicate of " + ", ".join(
            f"{o['keeper']} ({o['measure']}" + ("" if o["measure"].startswith("same") else
                                                 f" {o['similarity']:.2f}") + ")"
            for o in others) + ", which " + ("is" if len(others) == 1 else "are") + " kept"
    pairs: list[list[str]] = []
    near = how.startswith("near")
    if near and text_of is not None:
        left, right = text_of(item.key), text_of(keeper.key)
        if left is not None and right is not None:
            pairs = diverging_tokens(left, right)
    diverging = ""
    if pairs:
        diverging = "; the versions disagree: " + ", ".join(
            f"{old!r} here vs {new!r} in the keeper" for old, new in pairs[:3])
    details = dict(keeper=keeper.path, keeper_id=keeper.key, similarity=round(similarity, 4),
                   measure="exact Jaccard" if how == "near exact" else "estimated Jaccard",
                   threshold=settings.threshold, why=why, diverging=diverging,
                   differences=pairs, also=also, also_keepers=others)
    if item.accepted_before and not keeper.accepted_before:
        return SUPERSEDED(**details)
    if not near:
        same = {k: v for k, v in details.items()
                if k not in ("diverging", "differences", "threshold", "similarity", "measure")}
        caveat, extra = "", {}
        if how == "same text":
            excerpt = " ".join((text_of(item.key) or "").split()[:12]) if text_of else ""
            size = f"{item.words} words" if item.words is not None else "the whole text"
            caveat = (f"; the files differ, only their extracted text is identical ({size}"
                      + (f", beginning {excerpt!r}" if excerpt else "") + "): if these are "
                      "different documents, the shared text may be a site template")
            extra = {"identical": "extracted text", "words": item.words, "excerpt": excerpt}
        else:
            extra = {"identical": "bytes"}
        return EXACT(how=how, caveat=caveat, **same, **extra)
    return NEAR(**details)


def compare(view: CorpusView, settings: DuplicatesSettings) -> Outcome:
    """The corpus stage's call: the batch's documents with text, plus the stored documents
    they compete with (in an incremental run: every stored one, or with a shared index
    only the stored documents that are LSH candidates of the batch)."""
    items = [Item(key=m.key, path=m.path, sha256=m.sha256 or "",
                  text_sha256=m.measured["text_sha256"],
                  minhash=None if m.measured["shingles"] < settings.min_shingles
                  else m.measured["minhash"], words=m.measured.get("words"),
                  trust=m.trust, date=m.date, seen=m.seen, in_batch=True,
                  accepted_before=m.accepted_before, candidate=m.candidate)
             for m in view.members]
    if view.index is not None:
        items.extend(view.index.candidates(items, batch_ids=view.batch_ids,
                                           include_own=view.incremental))
    elif view.incremental:
        items.extend(Item(key=row["doc_id"], path=row["path"], sha256=row["sha256"],
                          text_sha256=row["text_sha256"], minhash=row["minhash"],
                          trust=row["trust"],
                          date=datetime.fromisoformat(row["date"]) if row["date"] else None,
                          seen=(row["first_seen"], -1), in_batch=False, accepted_before=True)
                     for row in view.stored if row["doc_id"] not in view.batch_ids)
    return evaluate(items, settings, text_of=view.text_of)


CHECK = CorpusCheck(id="duplicate", section="duplicates", settings=DuplicatesSettings,
                    measure=measure, evaluate=compare, measure_version=5,
                    doc=__doc__ or "")
