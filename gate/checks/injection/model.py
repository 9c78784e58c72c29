"""A learnt reading: does a sentence (or two or three in a row) instruct the model?

A logistic-regression model over hashed features of the folded text, trained by
``benchmarks/train_injection_model.py`` on the data described in
``benchmarks/data/injection_train/README.md`` and shipped as ``data/instruction_model.npz``.
Scoring needs numpy only.

Features of a unit (a sentence, or a window of two or three consecutive sentences), all
hashed (CRC-32) into :data:`DIM` buckets:

* every word (letters only; each CJK, kana and Hangul character is a word of its own);
* the first five letters of every word longer than five (inflections share them);
* every pair of consecutive words within a sentence.

A unit's vector holds ``1 / sqrt(n)`` per feature occurrence (``n`` occurrences), so the
score of a window is its sentences' sums over the root of their counts: one pass over the
text's words gives every sentence and window. The words' hashes are cached per process.

Sentences end at ``. ! ? ;``, their CJK, Arabic and Devanagari forms, and line breaks; a
window of up to three sentences reads an instruction split over lines or sentences.
"""

from __future__ import annotations

import hashlib
from dataclasses import dataclass
from pathlib import Path

import numpy as np

WEIGHTS = Path(__file__).resolve().parent / "data" / "instruction_model.npz"
DIM = 1 << 19
PREFIX = 5
WINDOWS = (1, 2, 3)
MIN_FEATURES = 10  # units with fewer feature occurrences (about four words) are not scored
MAX_CHARS = 150_000
MAX_REPORTED = 4
MAX_TRIED = 40  # windows looked at, strongest first
# Text a reader never sees (hidden markup, decoded payloads) has no business sounding like a
# request at all: there a window from this probability on is supporting evidence, which the
# concealment that carries it turns into a finding.
HIDDEN_FLOOR = 0.7
HIDDEN_WEIGHT = 0.3
# In visible text a window from this probability on is an instruction when its content
# words occur nowhere else in the document: a request about something else, planted.
DISCONTINUITY_FLOOR = 0.6  # windows read from here (another language counts from here)
DISCONTINUITY_MIN = 0.7  # words found nowhere else count from here (inflected languages)
DISCONTINUITY_WEIGHT = 0.5
_PAIR_MULT = np.uint64(0x9E3779B1)
_MASK = np.uint64(DIM - 1)

_CJK_RANGES = ((0x3040, 0x30FF), (0x3400, 0x4DBF), (0x4E00, 0x9FFF), (0xF900, 0xFAFF),
               (0xAC00, 0xD7AF))
_HARD_STOPS = "\n\u3002\uff01\uff1f\uff1b\u061f\u06d4\u0964"
OTHER, LETTER, CJK, SOFT_STOP, HARD_STOP, DIGIT = range(6)
# Parts of addresses, left out: which domain a link names says nothing about its sentence.
_SKIP = ("http", "https", "www", "com", "net", "org", "example", "test", "html", "htm", "php",
         "mailto")
_LEAD = frozenset(" \t\r\n-*>#|\"'`\u00ab\u00bb\u201c\u201d\u201e\u2018\u2019\u300c\u300e")
_TRAIL = frozenset(" \t\r\n|\"'`.!?;\u00ab\u00bb\u201c\u201d\u2018\u2019\u300d\u300f\u3002")
_BASE = np.uint64(0x100000001B3)  # odd, so invertible modulo 2**64
_MIX = np.uint64(0xBF58476D1CE4E5B9)
_PREFIX_SALT = np.uint64(0x94D049BB133111EB)


def _classes() -> np.ndarray:
    """The character class of every BMP code point (letters by Unicode category)."""
    import unicodedata
    table = np.zeros(0x10000, np.uint8)
    for cp in range(0x10000):
        cat = unicodedata.category(chr(cp))
        if cat[0] == "L" or cat == "Mn" or cat == "Mc":
            table[cp] = LETTER
        elif cat == "Nd":
            table[cp] = DIGIT
    for lo, hi in _CJK_RANGES:
        table[lo:hi + 1] = CJK
    table[0x30FC] = LETTER  # the prolonged sound mark belongs to its kana word
    for ch in ".!?;":
        table[ord(ch)] = SOFT_STOP
    for ch in _HARD_STOPS:
        table[ord(ch)] = HARD_STOP
    table[ord("_")] = OTHER
    return table


_CLASS = _classes()


def _powers(n: int) -> tuple[np.ndarray, np.ndarray]:
    inverse = np.uint64(pow(int(_BASE), -1, 1 << 64))
    with np.errstate(over="ignore"):
        up = np.cumprod(np.full(n, _BASE, np.uint64))
        down = np.cumprod(np.full(n, inverse, np.uint64))
    return (np.concatenate([[np.uint64(1)], up[:-1]]),
            np.concatenate([[np.uint64(1)], down[:-1]]))


_UP, _DOWN = _powers(MAX_CHARS + 1)


def _mix(h: np.ndarray) -> np.ndarray:
    with np.errstate(over="ignore"):
        h = (h ^ (h >> np.uint64(31))) * _MIX
        return h ^ (h >> np.uint64(29))


_LAST: list = [None, None]  # the last text read and its words: read() needs them twice


def _words(folded: str) -> tuple[np.ndarray, np.ndarray, np.ndarray, np.ndarray, np.ndarray]:
    """Word hashes, prefix hashes (0: none), word starts, sentence of each word, and the
    positions of the sentence ends, of a folded text (at most MAX_CHARS characters)."""
    folded = folded[:MAX_CHARS]
    if _LAST[0] is folded or _LAST[0] == folded:
        return _LAST[1]
    out = _words_of(folded)
    _LAST[0], _LAST[1] = folded, out
    return out


def _words_of(folded: str) -> tuple[np.ndarray, np.ndarray, np.ndarray, np.ndarray,
                                    np.ndarray]:
    cps = np.frombuffer(folded.encode("utf-32-le", "surrogatepass"), np.uint32)
    cls = _CLASS[np.minimum(cps, 0xFFFF)]
    cls[cps > 0xFFFF] = OTHER
    n = len(cls)
    letter = cls == LETTER
    cjk = cls == CJK
    wordish = letter | cjk | (cls == DIGIT)
    nxt = np.concatenate([wordish[1:], [False]])
    stop = (cls == HARD_STOP) | ((cls == SOFT_STOP) & ~nxt)
    prev_letter = np.concatenate([[False], letter[:-1]])
    next_letter = np.concatenate([letter[1:], [False]])
    starts = np.nonzero((letter & ~prev_letter) | cjk)[0]
    ends = np.nonzero((letter & ~next_letter) | cjk)[0] + 1
    # Words of addresses (a run without spaces holding "://", "@" or a dot between
    # letters: links, e-mail addresses, host and file names) are left out: which host a
    # link names says nothing about the sentence around it.
    space = (cps == 32) | (cps == 10) | (cps == 9) | (cps == 13)
    dot = cps == 46
    glue = (cps == 64) | ((cps == 47) & np.concatenate([cps[1:] == 47, [False]])) | \
        (dot & prev_letter & next_letter)
    if glue.any():
        run = np.cumsum(space)
        address = np.bincount(run, weights=glue, minlength=int(run[-1]) + 1) > 0
        inside = address[run[starts]]
        starts, ends = starts[~inside], ends[~inside]
    with np.errstate(over="ignore"):
        vals = (cps.astype(np.uint64) + np.uint64(1)) * _UP[:n]
        prefix_sum = np.concatenate([[np.uint64(0)], np.cumsum(vals, dtype=np.uint64)])
        h = _mix((prefix_sum[ends] - prefix_sum[starts]) * _DOWN[starts])
        cut = np.minimum(ends, starts + PREFIX)
        p = _mix(((prefix_sum[cut] - prefix_sum[starts]) * _DOWN[starts]) ^ _PREFIX_SALT)
    p[ends - starts <= PREFIX] = 0
    stops = np.nonzero(stop)[0]
    sid = np.searchsorted(stops, starts)
    keep = ~np.isin(h, _SKIP_HASHES, kind="sort")
    return h[keep], p[keep], starts[keep], sid[keep], stops


def _skip_hashes() -> np.ndarray:
    out = []
    for word in _SKIP:
        cps = np.frombuffer(word.encode("utf-32-le"), np.uint32).astype(np.uint64)
        with np.errstate(over="ignore"):
            out.append(_mix(np.array([np.sum((cps + np.uint64(1)) * _UP[:len(cps)],
                                             dtype=np.uint64)]))[0])
    return np.array(out, np.uint64)


_SKIP_HASHES = np.zeros(0, np.uint64)
_SKIP_HASHES = _skip_hashes()


def sentence_features(folded: str) -> tuple[np.ndarray, np.ndarray, int]:
    """Every feature occurrence as (bucket, sentence number), and the number of sentences.

    Sentence ``k`` lies between the ``k``-th and ``k+1``-th sentence end (see :func:`_words`).
    """
    h, p, _, wsid, stops = _words(folded)
    n = len(stops) + 1
    if not len(h):
        return np.zeros(0, np.int64), np.zeros(0, np.int64), n
    uni = h & _MASK
    has_p = p > 0
    pre = p[has_p] & _MASK
    same = wsid[1:] == wsid[:-1]
    with np.errstate(over="ignore"):
        pair = _mix(h[:-1][same] * _PAIR_MULT ^ h[1:][same]) & _MASK
    buckets = np.concatenate([uni, pre, pair]).astype(np.int64)
    sents = np.concatenate([wsid, wsid[has_p], wsid[1:][same]]).astype(np.int64)
    return buckets, sents, n


def unit_vector(folded: str) -> tuple[np.ndarray, np.ndarray]:
    """A whole text as one unit (training): buckets and their values ``1/sqrt(n)``."""
    buckets, _, _ = sentence_features(folded)
    if not len(buckets):
        return buckets, np.zeros(0)
    uniq, counts = np.unique(buckets, return_counts=True)
    return uniq, counts / np.sqrt(len(buckets))


@dataclass(frozen=True)
class Reading:
    start: int  # offsets in the folded text (= the original text: lfold keeps lengths)
    end: int
    probability: float
    sentences: int
    addressed: bool  # the window names an AI reader, or the reader's answer and its user
    called: bool = False  # ... and opens by calling it ("Facilities notice for the assistant:")


class Model:
    """The weights, loaded once per process."""

    def __init__(self, path: Path = WEIGHTS):
        with np.load(path, allow_pickle=False) as data:
            self.weights = np.zeros(DIM, dtype=np.float32)
            self.weights[data["index"]] = data["value"].astype(np.float32)
            self.bias = float(data["bias"])
            self.threshold = float(data["threshold"])
            self.low = float(data["low"])
            self.addressed = float(data["addressed"])
            self.digest = str(data["digest"])
        self.file_sha256 = hashlib.sha256(path.read_bytes()).hexdigest()

    def unit_scores(self, folded: str) -> tuple[np.ndarray, np.ndarray, np.ndarray]:
        """Logit per window: (first sentence, window length, logit), all windows."""
        buckets, sents, n = sentence_features(folded)
        if not len(buckets):
            return np.zeros(0, np.int64), np.zeros(0, np.int64), np.zeros(0)
        sums = np.bincount(sents, weights=self.weights[buckets], minlength=n)
        counts = np.bincount(sents, minlength=n).astype(np.float64)
        cs = np.concatenate([[0.0], np.cumsum(sums)])
        cn = np.concatenate([[0.0], np.cumsum(counts)])
        firsts, lengths, logits = [], [], []
        for w in WINDOWS:
            if w > n:
                break
            s = cs[w:] - cs[:-w]
            k = cn[w:] - cn[:-w]
            # a window counts only when its first and last sentences hold words
            ok = (k >= MIN_FEATURES) & (counts[:n - w + 1] > 0) & (counts[w - 1:] > 0)
            idx = np.nonzero(ok)[0]
            firsts.append(idx)
            lengths.append(np.full(len(idx), w))
            logits.append(self.bias + s[idx] / np.sqrt(k[idx]))
        return np.concatenate(firsts), np.concatenate(lengths), np.concatenate(logits)

    def probability(self, folded: str) -> float:
        """The highest probability of any window of the text."""
        _, _, logits = self.unit_scores(folded)
        return float(_sigmoid(logits.max())) if len(logits) else 0.0

    def weight(self, reading: Reading) -> float:
        """The hit weight of a window: from 0.5 at the threshold (an instruction on its
        own) to 0.85; 0.5 from ``addressed`` when the window names an AI reader or the
        reader's answer, and from ``low`` when it opens by calling one; from 0.2 to 0.45
        between ``low`` and the threshold otherwise."""
        p, t, low = reading.probability, self.threshold, self.low
        if p >= t:
            return round(0.5 + 0.35 * (p - t) / max(1e-6, 1.0 - t), 4)
        if reading.addressed and p >= self.addressed:
            return 0.5
        if reading.called and p >= self.low:
            return 0.5
        return round(0.2 + 0.25 * max(0.0, p - low) / max(1e-6, t - low), 4)

    def holds(self, folded: str) -> bool:
        """Would a window of this text be an instruction on its own (validation)?"""
        return any(self.weight(r) >= 0.5 for r in self.read(folded))

    def read(self, folded: str, floor: float | None = None) -> list[Reading]:
        """The strongest non-overlapping windows at or above ``low`` (or ``floor``)."""
        folded = folded[:MAX_CHARS]
        firsts, lengths, logits = self.unit_scores(folded)
        if not len(logits):
            return []
        floor = min(self.low, self.addressed, floor or 1.0)
        cut = np.log(floor / (1.0 - floor))
        hot = np.nonzero(logits >= cut)[0]
        if not len(hot):
            return []
        order = hot[np.argsort(-logits[hot], kind="stable")]
        ends = [-1] + _words(folded)[4].tolist() + [len(folded)]
        taken: list[tuple[int, int]] = []
        out = []
        supporting = False
        for i in order[:MAX_TRIED]:
            a, w = int(firsts[i]), int(lengths[i])
            if any(a < e and s < a + w for s, e in taken):
                continue  # the strongest window first; those overlapping it are skipped
            start, end = ends[a] + 1, ends[a + w]
            while start < end and folded[start] in _LEAD:
                start += 1
            while end > start and folded[end - 1] in _TRAIL:
                end -= 1
            p = round(float(_sigmoid(logits[i])), 4)
            is_addressed = addressed(folded[start:end])
            reading = Reading(start, end, p, w, is_addressed,
                              is_addressed and p >= self.low and called(folded[start:end]))
            if self.weight(reading) < 0.5:
                # One window of supporting evidence per text at most: several weak ones
                # must not add up to an instruction (long manuals have many).
                if supporting:
                    continue
                supporting = True
            taken.append((a, a + w))
            out.append(reading)
            if len(out) >= MAX_REPORTED:
                break
        return out


def addressed(folded_window: str) -> bool:
    """Does a window name an AI reader (any of the 24 languages of the lexicon), or the
    reader's answer together with "you", the user or the reader's activity?"""
    from gate.checks.injection import directive
    unit = folded_window[:directive.MAX_UNIT]
    feats, tokens = directive.features(unit)
    if directive.REFERENCED.search(unit) and not directive.ADDRESSED.search(unit) and \
            "vocative" not in feats.get("*", ()):
        return False  # "Guidelines for using AI assistants": talked about, not talked to
    # Only the languages the window is written in (by their function words) are read:
    # Italian "ai" ("to the") and "modelli di shell" name no AI reader.
    spoken = directive.spoken(tokens)
    return any(cats & {"ai", "bot"} or ("out" in cats and cats & {"you", "user", "when"})
               for lang, cats in feats.items()
               if lang == "*" or not spoken or lang in spoken)


def called(folded_window: str) -> bool:
    """Does the window open by calling a machine reader ("Note for the building assistant:",
    "Till den automatiska läsaren:")? A label that names its addressee is the strongest sign
    that what follows is meant for it."""
    from gate.checks.injection import directive
    feats, _ = directive.features(folded_window[:directive.MAX_UNIT])
    return "vocative" in feats.get("*", ())


def _sigmoid(x: float | np.ndarray) -> float | np.ndarray:
    return 1.0 / (1.0 + np.exp(-x))


_MODEL: list[Model] = []


def model() -> Model:
    """The shipped model, loaded on first use (a missing file is an installation fault)."""
    if not _MODEL:
        _MODEL.append(Model())
    return _MODEL[0]
