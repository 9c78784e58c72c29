"""Language shares of a whole text, read with langdetect's own profiles.

langdetect identifies a language by sampling character n-grams (1 to 3 letters, words padded
with a space) at random and multiplying, for every language, ``alpha / 10000 + P(n-gram |
language)`` until one language dominates; its profiles are the frequency tables of 55
languages built from Wikipedia. Sampling at random in pure Python is what makes it slow,
so gate reads the same profiles differently:

* the text is cut into chunks at paragraph breaks (a paragraph a chunk; short ones join the
  next, long ones are cut at about :data:`CHUNK` characters);
* every chunk's n-grams are extracted exactly as langdetect extracts them (its character
  normalisation, URL and e-mail removal, Vietnamese recomposition, the rule that drops Latin
  letters from mostly non-Latin text, and the rule that skips n-grams inside words in
  capitals), but with numpy over code points instead of a loop over characters;
* an n-gram's row in the profiles is found in a hash table of their keys, or, for text
  that is all ASCII, in dense tables of every 2- and 3-gram of a space and the 52 Latin
  letters (the same rows, without building 64-bit keys; that text is read as bytes);
* each chunk is scored deterministically over *all* its n-grams with the same smoothing
  (``log(0.5 / 10000 + P)`` summed: naive Bayes), and its posterior is the softmax of the
  sums;
* the document's share of each language is the posterior of every chunk weighted by the
  number of letters the chunk holds.

So the whole text is read, a page that is mostly Spanish with untranslated option lists is
judged Spanish, and the result does not depend on a random seed. langdetect itself stays
the reference: the tests compare the two on chunks of real text.
"""

from __future__ import annotations

import itertools
import json
import os
import re
from dataclasses import dataclass

import numpy as np
from scipy import sparse

try:  # scipy's own CSR product routine (private: the public product is the fallback)
    from scipy.sparse._sparsetools import csr_matvecs as _csr_matvecs
except ImportError:  # pragma: no cover - another scipy
    _csr_matvecs = None
from langdetect import detector_factory
from langdetect.detector import Detector
from langdetect.utils import unicode_block
from langdetect.utils.ngram import NGram

CHUNK = 600  # a paragraph longer than twice this is cut into pieces of about this size
MIN_CHUNK = 200  # a shorter paragraph is judged together with the next
MAX_CHARS = 400_000  # beyond this many characters, chunks are taken evenly from the text
DENSE = True  # ASCII text looks its 2- and 3-grams up in dense tables (same rows)
SEPARATOR = "\ue000"  # a private-use character, untouched by langdetect's normalisation
_BASE_FREQ = 10_000  # langdetect's Detector.BASE_FREQ
_ALPHA = 0.5  # langdetect's Detector.ALPHA_DEFAULT (its random jitter is left out)


@dataclass(frozen=True)
class Shares:
    """How a text divides between languages."""

    letters: int  # letters that matched a profile n-gram (the weight of the judgement)
    chunks: int
    shares: tuple[tuple[str, float], ...]  # (language, share of letters), largest first


class _Profiles:
    """langdetect's profiles as arrays: sorted n-gram keys and log-probabilities."""

    def __init__(self) -> None:
        self.langs, self.keys, probs = _read_profiles(detector_factory.PROFILES_DIRECTORY)
        # keys of n letters lie in [2^(21(n-1)), 2^(21n)) (a normalised letter is never
        # NUL): where each length's keys start, and the 1-grams' rows by code point
        self.starts = [int(np.searchsorted(self.keys, np.uint64(1 << (21 * n))))
                       for n in range(3)] + [self.keys.size]
        self.unigram = np.full(0x110000, -1, dtype=np.int32)
        self.unigram[self.keys[:self.starts[1]].astype(np.int64)] = np.arange(self.starts[1])
        self.logp = np.log(probs + _ALPHA / _BASE_FREQ).astype(np.float32)
        # the 2- and 3-grams' rows by key in a hash table (a binary search over the sorted
        # keys cost a few cache misses an n-gram)
        self.slots, self.slot_rows = _hash_table(self.keys[self.starts[1]:], self.starts[1])
        # NGram.normalize maps one character to one character: a table over the BMP
        self.normal = _normal_table()
        self.normal_ascii = self.normal[:128].astype(np.uint8)
        self.upper = np.fromiter(map(str.isupper, map(chr, range(0x10000))), dtype=bool,
                                 count=0x10000)
        # what a character weighs in a share: about the Latin letters it stands for when
        # romanised (kana 2, Hangul syllables and Han ideographs 3; from memory, rounded)
        self.weight = np.ones(0x10000, dtype=np.float64)
        self.weight[0x3040:0x3100] = 2.0  # hiragana, katakana
        self.weight[0xAC00:0xD7B0] = 3.0  # Hangul syllables
        self.weight[0x4E00:0xA000] = 3.0  # CJK unified ideographs
        self.weight[0x3400:0x4DC0] = 3.0  # CJK extension A
        self.small, self.dense = _dense_tables(self)

    @staticmethod
    def key(gram: str) -> int:
        """An n-gram as one integer: 21 bits a code point, so lengths cannot collide."""
        value = 0
        for ch in gram:
            value = (value << 21) | ord(ch)
        return value


# ASCII text normalises to a space and the 52 Latin letters: numbered 0 .. 52, six bits
# each, a 2-gram is (a << 6) | b and a 3-gram (a << 12) | (b << 6) | c, and a table indexed
# by that number holds the n-gram's profile row (-1: not in the profiles). Looking a row up
# there replaces building 64-bit keys and probing the hash table, with the same rows.
_ASCII_LETTERS = " ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz"


def _dense_tables(prof: _Profiles) -> tuple[np.ndarray, list[np.ndarray | None]]:
    """(each ASCII code point's 6-bit number, -1 for characters ASCII normalisation never
    leaves; for n = 2 and 3 the row of every n-gram of those numbers), for :func:`_grams`'
    ASCII path; the tables come from :func:`_lookup` itself."""
    small = np.full(128, -1, dtype=np.int32)
    letters = np.frombuffer(_ASCII_LETTERS.encode("ascii"), dtype=np.uint8)
    small[letters] = np.arange(letters.size)
    dense: list[np.ndarray | None] = [None, None]
    for length in (2, 3):
        codes = np.arange(1 << (6 * length), dtype=np.int64)
        parts = [(codes >> (6 * (length - 1 - i))) & 63 for i in range(length)]
        valid = np.all([part < letters.size for part in parts], axis=0)
        keys = np.zeros(codes.size, dtype=np.uint64)
        for part in parts:
            keys = (keys << np.uint64(21)) | letters[np.minimum(part, letters.size - 1)] \
                .astype(np.uint64)
        rows, hit = _lookup(prof, keys, length)
        dense.append(np.where(hit & valid, rows, -1).astype(np.int32))
    return small, dense


def _normal_table() -> np.ndarray:
    """``NGram.normalize`` of every BMP code point, as a table: its rules applied to whole
    Unicode blocks at once (langdetect's block list) instead of 65,536 calls, which cost
    about half a second of every run's start-up. A test compares it with the calls."""
    blocks = {name: (start, min(end, 0xFFFF) + 1)
              for name, start, end in unicode_block._unicode_blocks if start <= 0xFFFF}

    def span(name: int) -> slice:
        start, stop = blocks[name]
        return slice(start, stop)

    table = np.arange(0x10000, dtype=np.uint32)
    space = ord(" ")
    latin = table[:0x80]  # BASIC_LATIN (unicode_block's special case: every cp <= 0x7F)
    latin[(latin < ord("A")) | ((latin > ord("Z")) & (latin < ord("a"))) | (latin > ord("z"))] \
        = space
    start, stop = blocks[unicode_block.UNICODE_LATIN_1_SUPPLEMENT]
    for ch in NGram.LATIN1_EXCLUDED:
        if start <= ord(ch) < stop:
            table[ord(ch)] = space
    for block, pairs in ((unicode_block.UNICODE_LATIN_EXTENDED_B,
                          ((0x0219, 0x015F), (0x021B, 0x0163))),
                         (unicode_block.UNICODE_ARABIC, ((0x06CC, 0x064A),))):
        start, stop = blocks[block]
        for old, new in pairs:
            if start <= old < stop:
                table[old] = new
    table[span(unicode_block.UNICODE_GENERAL_PUNCTUATION)] = space
    start, stop = blocks[unicode_block.UNICODE_LATIN_EXTENDED_ADDITIONAL]
    table[max(start, 0x1EA0):stop] = 0x1EC3
    table[span(unicode_block.UNICODE_HIRAGANA)] = 0x3042
    table[span(unicode_block.UNICODE_KATAKANA)] = 0x30A2
    table[span(unicode_block.UNICODE_BOPOMOFO)] = 0x3105
    table[span(unicode_block.UNICODE_BOPOMOFO_EXTENDED)] = 0x3105
    start, stop = blocks[unicode_block.UNICODE_CJK_UNIFIED_IDEOGRAPHS]
    for old, new in NGram.CJK_MAP.items():
        if start <= ord(old) < stop:
            table[ord(old)] = ord(new)
    table[span(unicode_block.UNICODE_HANGUL_SYLLABLES)] = 0xAC00
    return table


_HASH_BITS = 18  # 2^18 slots for the profiles' 84,439 2- and 3-gram keys: a third full
_HASH_MUL = np.uint64(0x9E3779B97F4A7C15)  # Fibonacci hashing (Knuth, TAOCP vol. 3, 6.4)


def _slot(keys: np.ndarray) -> np.ndarray:
    """Each key's home slot: the top bits of the key times the golden-ratio constant."""
    with np.errstate(over="ignore"):
        return ((keys * _HASH_MUL) >> np.uint64(64 - _HASH_BITS)).astype(np.int64)


def _hash_table(keys: np.ndarray, first_row: int) -> tuple[np.ndarray, np.ndarray]:
    """An open-addressing table (linear probing) of ``keys`` (unique, never 0): the key in
    each slot (0 where empty) and its row (``first_row`` + its index in ``keys``). The
    table has spare slots at its end, so a probe never wraps around."""
    size = 1 << _HASH_BITS
    slots = np.zeros(size + 64, dtype=np.uint64)
    rows = np.zeros(size + 64, dtype=np.int64)
    pending = np.arange(keys.size)
    where = _slot(keys)
    while pending.size:
        # of the keys whose slot is still free, the first one for each slot takes it; the
        # others try the next slot
        free = slots[where] == 0
        taken, first = np.unique(where[free], return_index=True)
        winners = pending[free][first]
        slots[taken] = keys[winners]
        rows[taken] = first_row + winners
        placed = np.zeros(pending.size, dtype=bool)
        placed[np.flatnonzero(free)[first]] = True
        pending, where = pending[~placed], where[~placed] + 1
        if where.size and where.max() >= slots.size:
            raise ValueError("the language profiles' hash table overflowed")
    return slots, rows


def _read_profiles(directory: str) -> tuple[tuple[str, ...], np.ndarray, np.ndarray]:
    """(languages, sorted n-gram keys, P(n-gram | language) with a row per key): the
    table langdetect's ``DetectorFactory.load_profile`` builds, read with numpy.

    langdetect's rules, kept: the profile files are read in ``os.listdir`` order (a
    language's column), dot files and folders skipped; an n-gram of ``n`` letters has the
    probability ``freq / n_words[n - 1]`` in its language and 0 in the others. Its table
    is a dict of Python lists (about 90,000 n-grams times 55 languages) that took most of
    a second to build; here each file's n-grams become keys (:meth:`_Profiles.key`, the
    n-gram padded on the left with NULs to three code points of 21 bits) at once, and
    the columns are filled by index. A test compares the result with langdetect's."""
    langs: list[str] = []
    all_keys, columns, values = [], [], []
    for name in os.listdir(directory):
        path = os.path.join(directory, name)
        if name.startswith(".") or not os.path.isfile(path):
            continue
        with open(path, encoding="utf-8") as fh:
            profile = json.load(fh)
        grams = list(profile["freq"])
        lengths = np.fromiter(map(len, grams), dtype=np.int64, count=len(grams))
        if grams and not (lengths.min() >= 1 and lengths.max() <= 3):
            raise ValueError(f"{path}: an n-gram of more than 3 letters")
        padded = "".join(map(str.rjust, grams, itertools.repeat(3), itertools.repeat("\0")))
        points = np.frombuffer(padded.encode("utf-32-le"), dtype=np.uint32)
        points = points.astype(np.uint64).reshape(-1, 3)
        all_keys.append((points[:, 0] << np.uint64(42)) | (points[:, 1] << np.uint64(21)) |
                        points[:, 2])
        freq = np.fromiter(profile["freq"].values(), dtype=np.float64, count=len(grams))
        n_words = np.asarray(profile["n_words"], dtype=np.float64)
        values.append(freq / n_words[lengths - 1])
        columns.append(np.full(len(grams), len(langs)))
        langs.append(profile["name"])
    keys, rows = np.unique(np.concatenate(all_keys), return_inverse=True)
    probs = np.zeros((keys.size, len(langs)), dtype=np.float64)
    probs[rows, np.concatenate(columns)] = np.concatenate(values)
    return tuple(langs), keys, probs


_profiles: _Profiles | None = None


def profiles() -> _Profiles:
    """The profiles, loaded once per process (workers inherit them from the parent)."""
    global _profiles
    if _profiles is None:
        _profiles = _Profiles()
    return _profiles


_PARAGRAPH = re.compile(r"\n\s*\n|\n(?=\s*[-*•·]|\s*\d+[.)] )")


def chunks(text: str) -> list[str]:
    """Paragraphs, each its own chunk; one shorter than MIN_CHUNK characters (a heading, a
    list item) joins the next, one longer than twice CHUNK is cut at spaces."""
    out: list[str] = []
    current = ""
    for part in _PARAGRAPH.split(text):
        part = part.strip()
        if not part:
            continue
        current = f"{current}\n{part}" if current else part
        while len(current) > 2 * CHUNK:
            cut = current.rfind(" ", CHUNK, 2 * CHUNK)
            cut = cut if cut > 0 else CHUNK
            out.append(current[:cut])
            current = current[cut:].lstrip()
        if len(current) >= MIN_CHUNK:
            out.append(current)
            current = ""
    if current:
        if out and len(current) < MIN_CHUNK:
            out[-1] = f"{out[-1]}\n{current}"
        else:
            out.append(current)
    if len(text) > MAX_CHARS and out:
        keep = max(1, MAX_CHARS // CHUNK)
        if len(out) > keep:
            picks = np.linspace(0, len(out) - 1, keep).round().astype(int)
            out = [out[i] for i in sorted(set(picks.tolist()))]
    return out


def _grams(pieces: list[str], prof: _Profiles, dense: bool = False):
    """langdetect's n-grams of every piece, vectorised: the normalised code points, the
    piece each belongs to, and (keys, end positions) for n = 1, 2, 3, each in text order.
    With ``dense`` and text that is all ASCII, the 2- and 3-grams' keys are their numbers
    in the dense tables (see :func:`_dense_tables`) and a fourth value, True, says so."""
    # ASCII pieces (the separator is not): no combining mark to recompose and no
    # non-Latin letter to outnumber the Latin ones, so those two steps are left out
    ascii_text = all(map(str.isascii, pieces))
    # ASCII pieces for the dense tables are read as bytes, a NUL between two (a piece
    # holding a NUL itself takes the general way): a quarter of the memory to go through
    narrow = dense and ascii_text
    if narrow:
        joined = "\0".join(pieces)
        narrow = joined.count("\0") == len(pieces) - 1
    if not narrow:
        joined = SEPARATOR.join(pieces)
    # each pass only where it can match (a URL needs "http", an address "@", Vietnamese
    # recomposition a combining mark): the same text, without three scans of it
    if "http" in joined:
        joined = Detector.URL_RE.sub(" ", joined)
    if "@" in joined:
        joined = Detector.MAIL_RE.sub(" ", joined)
    if not ascii_text and any(mark in joined for mark in NGram.DMARK_CLASS):
        joined = NGram.normalize_vi(joined)
    if narrow:
        raw = np.frombuffer(joined.encode("ascii"), dtype=np.uint8)
        sep = raw == 0
        cps = prof.normal_ascii[raw]  # a NUL becomes a space, as the separator does below
    else:
        cps = np.frombuffer(joined.encode("utf-32-le"), dtype=np.uint32)
        if cps.size and (ascii_text or cps.max() < 0x10000):  # the usual case: one gather
            cps = prof.normal[cps]
        else:
            cps = cps.copy()
            bmp = cps < 0x10000
            cps[bmp] = prof.normal[cps[bmp]]
        sep = cps == ord(SEPARATOR)
    chunk_of = np.cumsum(sep)
    n_chunks = len(pieces)
    if not ascii_text:
        # langdetect drops Latin letters from a text whose non-Latin letters are more than
        # twice as many (cleaning_text); here per chunk (ASCII text has no non-Latin ones)
        latin = (cps >= 65) & (cps <= 122)
        nonlatin = (cps >= 0x300) & ~((cps >= 0x1E00) & (cps <= 0x1EFF)) & ~sep
        drop_latin = (np.bincount(chunk_of, latin, n_chunks) * 2 <
                      np.bincount(chunk_of, nonlatin, n_chunks))
        if drop_latin.any():
            keep = ~(latin & drop_latin[chunk_of])
            cps, sep, chunk_of = cps[keep], sep[keep], chunk_of[keep]
    space = (cps == 32) | sep
    cps[sep] = 32
    # runs of spaces become one (Detector.append), and the text starts with one (NGram())
    keep = ~space
    keep[1:] |= ~space[:-1]
    cps = np.concatenate((np.array([32], dtype=cps.dtype), cps[keep]))
    space = np.concatenate(([True], space[keep]))
    chunk_of = np.concatenate(([0], chunk_of[keep]))
    if ascii_text or cps.max() < 0x10000:
        upper = prof.upper[cps]
    else:
        upper = np.zeros(cps.size, dtype=bool)
        bmp = cps < 0x10000
        upper[bmp] = prof.upper[cps[bmp]]
    skip = upper
    skip[1:] &= upper[:-1].copy()  # inside a word in capitals
    skip[0] = False
    one = ~space & ~skip
    two = ~(space[:-1] & space[1:]) & ~skip[1:]
    three = ~space[1:-1] & ~skip[2:]
    if dense and ascii_text:
        small = prof.small[cps]
        grams = (
            (cps[one], np.flatnonzero(one)),
            ((small[:-1][two] << 6) | small[1:][two], np.flatnonzero(two) + 1),
            ((small[:-2][three] << 12) | (small[1:-1][three] << 6) | small[2:][three],
             np.flatnonzero(three) + 2))
        return cps, chunk_of, grams, True
    wide = cps.astype(np.uint64)
    grams = (  # (key, end position) of every 1-, 2- and 3-gram, each in text order
        (wide[one], np.flatnonzero(one)),
        ((wide[:-1][two] << np.uint64(21)) | wide[1:][two], np.flatnonzero(two) + 1),
        ((wide[:-2][three] << np.uint64(42)) | (wide[1:-1][three] << np.uint64(21)) |
         wide[2:][three], np.flatnonzero(three) + 2))
    return cps, chunk_of, grams, False


def _lookup(prof: _Profiles, keys: np.ndarray, length: int,
            dense: bool = False) -> tuple[np.ndarray, np.ndarray]:
    """Each key's row in the profiles, and whether the profiles have it at all (the
    n-grams of one ``length``: 1-grams by table, longer ones among their own length, or
    with ``dense`` in the dense ASCII tables)."""
    if dense and length > 1:
        found = prof.dense[length][keys]
        hit = found >= 0
        return np.where(hit, found, 0), hit
    if length == 1:
        found = prof.unigram[keys.astype(np.int64)]
        hit = found >= 0
        return np.where(hit, found, 0), hit
    where = _slot(keys)
    held = prof.slots[where]
    hit = held == keys
    going = np.flatnonzero(~hit & (held != 0))  # another key in the slot: probe on
    while going.size:
        where[going] += 1
        held = prof.slots[where[going]]
        hit[going] = held == keys[going]
        going = going[~hit[going] & (held != 0)]
    return prof.slot_rows[where], hit


def _sums(prof: _Profiles, rows: list[np.ndarray], bounds: list[np.ndarray]) -> np.ndarray:
    """Each group's and chunk's sum of profile rows, in float32, added one row after the
    other in text order: ``rows[g]`` are group ``g``'s rows, chunk ``c``'s being
    ``rows[g][bounds[g][c]:bounds[g][c + 1]]``; the result has a row per group and chunk.
    A sparse count matrix times the profiles does exactly that (scipy's CSR product adds
    ``1 * row`` into a zeroed float32 row, in index order); one product serves every
    group."""
    n_chunks = bounds[0].size - 1
    offsets = np.cumsum([0] + [r.size for r in rows])
    indptr = np.concatenate([offsets[g] + b[:-1] for g, b in enumerate(bounds)] +
                            [offsets[-1:]])
    indices = np.concatenate(rows).astype(np.int64, copy=False)
    n_rows = len(rows) * n_chunks
    ones = np.ones(indices.size, dtype=np.float32)
    if _csr_matvecs is not None:
        # the routine ``csr_matrix(...) @ prof.logp`` calls, called directly: the same
        # float32 additions in the same order, without the checks and conversions of a
        # freshly built matrix (they cost more than the product on a short text)
        out = np.zeros((n_rows, prof.logp.shape[1]), dtype=np.float32)
        try:
            _csr_matvecs(n_rows, prof.keys.size, prof.logp.shape[1],
                         indptr.astype(np.int64, copy=False), indices, ones,
                         prof.logp.ravel(), out.ravel())
            return out
        except (TypeError, ValueError):  # another scipy's private signature: the public way
            pass
    counts = sparse.csr_matrix((ones, indices, indptr), shape=(n_rows, prof.keys.size))
    return counts @ prof.logp


def profile_ngrams(text: str) -> list[str]:
    """The n-grams of ``text`` (as one piece) that the profiles know, sorted: what
    langdetect's ``Detector._extract_ngrams`` yields, for the tests to compare."""
    prof = profiles()
    _cps, _owner, grams, _dense = _grams([text], prof)
    out = []
    for length, (keys, _ends) in enumerate(grams, start=1):
        _found, hit = _lookup(prof, keys, length)
        for key in keys[hit].tolist():
            out.append("".join(chr((key >> (21 * i)) & 0x1FFFFF)
                               for i in reversed(range(length))))
    return sorted(out)


def identify(text: str) -> Shares:
    """The share of each language in ``text`` (see the module docstring)."""
    prof = profiles()
    pieces = chunks(text)
    if not pieces:
        return Shares(0, 0, ())
    n_chunks = len(pieces)
    cps, chunk_of, grams, dense = _grams(pieces, prof, DENSE)
    # a chunk is scored twice: its n-grams that end in a Latin letter, and the others, so
    # identifiers in a Japanese page or a Russian quote in a German one are judged apart
    # (a text below U+0250 has Latin ends only, each letter weighing 1: nothing to split)
    top = int(cps.max())
    only_latin = top < 0x250
    latin_end = None if only_latin else (cps < 0x250) | ((cps >= 0x1E00) & (cps < 0x1F00))
    if only_latin:
        char_weight = None
    elif top < 0x10000:
        char_weight = prof.weight[cps]
    else:
        bmp = cps < 0x10000
        char_weight = np.ones(cps.size)
        char_weight[bmp] = prof.weight[cps[bmp]]
    weight = np.zeros((2, n_chunks))
    bounds = np.arange(n_chunks + 1)
    # the rows of every (part, length) group, each in text order (so grouped by chunk): one
    # sparse product sums them all, a row of the count matrix per (part, length, chunk)
    rows: list[np.ndarray] = [np.empty(0, dtype=np.int64)] * 6
    starts: list[np.ndarray] = [bounds] * 6
    for length, (keys, ends) in enumerate(grams, start=1):
        found, hit = _lookup(prof, keys, length, dense)
        found, ends = found[hit], ends[hit]
        if latin_end is None:  # the other part's groups stay empty
            owner = chunk_of[ends]
            rows[length - 1] = found
            starts[length - 1] = np.searchsorted(owner, bounds)
            starts[3 + length - 1] = np.zeros(n_chunks + 1, dtype=np.int64)
            if length == 1:
                weight[0] = np.bincount(owner, minlength=n_chunks)
            continue
        latin = latin_end[ends]
        for part, mask in enumerate((latin, ~latin)):
            owner = chunk_of[ends[mask]]
            rows[3 * part + length - 1] = found[mask]
            starts[3 * part + length - 1] = np.searchsorted(owner, bounds)
            if length == 1:  # a part weighs by the letters of it that the profiles know
                weight[part] = np.bincount(owner, char_weight[ends[mask]], n_chunks)
    sums = _sums(prof, rows, starts).reshape(2, 3, n_chunks, -1)
    # added in the order langdetect's scores grow: 1-grams, then 2-grams, then 3-grams
    scores = np.zeros((2, n_chunks, len(prof.langs)), dtype=np.float32)
    for length in range(3):
        scores += sums[:, length]
    total = weight.sum()
    if total <= 0:
        return Shares(0, n_chunks, ())
    scores64 = scores.reshape(2 * n_chunks, -1).astype(np.float64)
    scores64 -= scores64.max(axis=1, keepdims=True)
    posterior = np.exp(scores64)
    posterior /= posterior.sum(axis=1, keepdims=True)
    share = (posterior * weight.reshape(-1, 1)).sum(axis=0) / total
    ranked = np.argsort(-share, kind="stable")
    shares = tuple((prof.langs[i], round(float(share[i]), 4)) for i in ranked
                   if share[i] >= 0.005)
    return Shares(int(total), n_chunks, shares)
