"""The Gopher quality filters: the paper's values as defaults, and each rule's behaviour."""

import random
import re
from collections import Counter

import pytest

from gate.checks import quality
from gate.checks.base import Document, RunContext
from gate.extract.model import Extracted

from .helpers import policy

RUN = RunContext(as_of=None)


class _Extraction:
    def __init__(self, text):
        self.text = text


def test_defaults_are_the_gopher_values():
    # Rae et al. 2021, appendix A (quality filters) and Table A1 (repetition), as verified
    # via an implementation quoting the paper (check-values.md section 4).
    s = quality.QualitySettings()
    assert (s.words_at_least, s.words_at_most) == (50, 100_000)
    assert (s.word_length_at_least, s.word_length_at_most) == (3, 10)
    assert s.symbols_per_word_at_most == 0.1
    assert (s.bullet_lines_at_most, s.ellipsis_lines_at_most) == (0.9, 0.3)
    assert s.lettered_words_at_least == 0.8
    assert s.stop_words_at_least == 2
    assert quality.STOP_LISTS["en"] == ("the", "be", "to", "of", "and", "that", "have", "with")
    assert (s.repeated_lines_at_most, s.repeated_paragraphs_at_most) == (0.30, 0.30)
    assert (s.repeated_line_chars_at_most, s.repeated_paragraph_chars_at_most) == (0.20, 0.20)
    assert s.top_ngram_chars_at_most == {2: 0.20, 3: 0.18, 4: 0.16}
    assert s.repeated_ngram_chars_at_most == {5: 0.15, 6: 0.14, 7: 0.13, 8: 0.12, 9: 0.11,
                                           10: 0.10}


def _reference_shares(words):
    """Straightforward definitions, to check the vectorised implementation against."""
    total = sum(len(w) for w in words)
    top, dup = {}, {}
    for n in range(2, 5):
        grams = Counter(tuple(words[i:i + n]) for i in range(len(words) - n + 1))
        gram, count = max(grams.items(), key=lambda kv: kv[1])
        top[str(n)] = round(count * sum(map(len, gram)) / total, 4) if count > 1 else 0.0
    for n in range(5, 11):
        grams = Counter(tuple(words[i:i + n]) for i in range(len(words) - n + 1))
        covered = [False] * len(words)
        for i in range(len(words) - n + 1):
            if grams[tuple(words[i:i + n])] > 1:
                covered[i:i + n] = [True] * n
        dup[str(n)] = round(sum(len(w) for w, c in zip(words, covered) if c) / total, 4)
    return top, dup


@pytest.mark.parametrize("seed", range(5))
def test_ngram_shares_match_the_plain_definition(seed):
    rng = random.Random(seed)
    vocab = [f"w{i}" * rng.randint(1, 3) for i in range(rng.randint(5, 40))]
    words = [rng.choice(vocab) for _ in range(rng.randint(30, 400))]
    top, dup = quality._ngram_shares(words)
    ref_top, ref_dup = _reference_shares(words)
    for n in top:
        assert top[n] == pytest.approx(ref_top[n], abs=1e-4)
    for n in dup:
        assert dup[n] == pytest.approx(ref_dup[n], abs=1e-4)


def _reference_measure(text):
    """The statistics by their plain definitions (whitespace words; a word has a letter
    when it holds a word character that is neither a digit nor an underscore), to check
    the per-distinct-word implementation against (common practice)."""
    words = text.split()
    lower = [w.lower().strip(quality._PUNCT) for w in words]
    lines = [line.strip() for line in text.split("\n") if line.strip()]
    paragraphs = [p.strip() for p in re.split(r"\n\s*\n", text) if p.strip()]

    def duplicates(parts):
        seen, repeated, chars = set(), 0, 0
        for part in parts:
            if part in seen:
                repeated, chars = repeated + 1, chars + len(part)
            seen.add(part)
        total = sum(len(p) for p in parts)
        return (repeated / len(parts) if parts else 0.0,
                chars / total if parts and total else 0.0)

    n = len(words)
    top, dup = quality._ngram_shares([w for w in lower if w])
    stats = {"words": n,
             "mean_word_length": sum(len(w) for w in words) / n if n else 0.0,
             "hash_ratio": text.count("#") / n if n else 0.0,
             "ellipsis_ratio": (text.count("...") + text.count("\u2026")) / n if n else 0.0,
             "bullet_lines": sum(line.startswith(quality._BULLETS) for line in lines)
             / len(lines) if lines else 0.0,
             "ellipsis_lines": sum(line.endswith(("...", "\u2026")) for line in lines)
             / len(lines) if lines else 0.0,
             "alphabetic_words": sum(bool(re.search(r"[^\W\d_]", w)) for w in words) / n
             if n else 0.0,
             "stop_words": {lang: sorted(set(lower) & set(stop))
                            for lang, stop in quality.STOP_LISTS.items()},
             "top_ngram_chars": top, "duplicate_ngram_chars": dup}
    stats["duplicate_lines"], stats["duplicate_line_chars"] = duplicates(lines)
    stats["duplicate_paragraphs"], stats["duplicate_paragraph_chars"] = duplicates(paragraphs)
    return {k: round(v, 4) if isinstance(v, float) else v for k, v in stats.items()}


@pytest.mark.parametrize("seed", range(20))
def test_measure_matches_the_plain_definitions(seed):
    # invented random texts: words with case, punctuation, digits, non-Latin letters,
    # bullets, ellipses and repeated lines and paragraphs
    rng = random.Random(seed)
    vocab = ["the", "The", "of", "and,", "Quillby", "depot.", "#", "...", "\u2026", "-",
             "12", "a1", "_", "\u2014", "\u00e9t\u00e9", "\u0130stanbul", "\ufb01le",
             "\u65e5\u672c", "\u0663", "(x)", "\u201cquoted\u201d", "\u00df"]
    lines = []
    for _ in range(rng.randint(0, 40)):
        line = " ".join(rng.choice(vocab) for _ in range(rng.randint(0, 12)))
        lines.append(rng.choice(["", "* ", "\u2022 ", "  "]) + line)
        if rng.random() < 0.2:
            lines.append(rng.choice(lines))
        if rng.random() < 0.1:
            lines.append("")
    text = "\n".join(lines)
    assert quality.measure(_Extraction(text)) == _reference_measure(text)


@pytest.mark.parametrize("seed", range(10))
def test_short_texts_counted_in_python_give_the_numpy_figures(seed, monkeypatch):
    # invented random word-id sequences up to SMALL_TEXT_WORDS long, many with a copied
    # run (repeated n-grams up to 10 words): the plain-Python counts are the vectorised ones
    import numpy as np
    rng = random.Random(seed)
    for _ in range(300):
        size = rng.randint(0, quality.SMALL_TEXT_WORDS)
        vocab = rng.randint(1, 12)
        seq = [rng.randint(1, vocab) for _ in range(size)]
        if size > 10 and rng.random() < 0.4:
            start, length, to = rng.randint(0, size - 5), rng.randint(3, 10), rng.randint(0, size)
            seq = (seq[:to] + seq[start:start + length] + seq[to:])[:size]
        length_of = [0] + [rng.randint(0, 9) for _ in range(vocab)]
        assert quality._shares_small(seq, length_of) == quality._shares(
            np.array(seq, dtype=np.uint64), np.array(length_of, dtype=np.int64))
    # and whole measures, short texts taken either way
    vocab = ["the", "The", "of", "and,", "Quillby", "depot.", "#", "...", "12", "a1", "_",
             "\u00e9t\u00e9", "\u65e5\u672c", "(x)", "\u00df"]
    texts = [" ".join(rng.choice(vocab) for _ in range(rng.randint(0, 64))) for _ in range(50)]
    short = [quality.measure(_Extraction(text)) for text in texts]
    monkeypatch.setattr(quality, "SMALL_TEXT_WORDS", -1)
    assert short == [quality.measure(_Extraction(text)) for text in texts]


PROSE = ("The northern depot of the invented Quillby Freight cooperative schedules "
         "deliveries in three windows each weekday. Drivers confirm every window by radio "
         "before they leave the yard, and the dispatcher keeps a ledger of each confirmed "
         "slot. When a lorry is late, the next customer on the route is called and offered "
         "a later window or a pick-up at the depot counter, which is open until seven in the "
         "evening. Pallets that miss their window stay in the covered bay overnight and are "
         "loaded first the following morning.")


def evaluate(text, settings="quality: {}\n", language="en"):
    doc = Document(path="a.txt", kind="file", size=len(text), sha256="0" * 64, manifest=None,
                   extracted=Extracted(type="text", text_chars=len(text)),
                   measures={"quality": quality.measure(_Extraction(text)),
                             "language": {"languages": [[language, 0.99]]}})
    return sorted(f.code for f in quality.evaluate(doc, policy(settings), RUN))


def test_ordinary_prose_passes():
    assert evaluate(PROSE) == []


@pytest.mark.parametrize("text,code", [
    ("The depot opens at seven and closes at nineteen on weekdays.", "quality.word-count"),
    ("# " * 30 + PROSE, "quality.symbols"),
    ("\n".join(f"- item {i} of the list of depot supplies" for i in range(30)),
     "quality.bullets"),
    ("\n".join(f"and then the driver of lorry {i} waited..." for i in range(30)),
     "quality.ellipsis-lines"),
    (" ".join(["12345", "67890", "--", "the", "of"] * 20), "quality.non-alphabetic"),
    (" ".join(["depot", "lorry", "yard", "ledger", "window"] * 20), "quality.no-stop-words"),
    ("\n".join([PROSE] * 4), "quality.repetition"),
    ("a b c d e f g " * 20, "quality.word-length"),
])
def test_each_rule_fires(text, code):
    assert code in evaluate(text)


def test_rules_can_be_switched_off_or_changed():
    short = "The depot opens at seven and closes at nineteen on weekdays."
    assert evaluate(short, "quality:\n  words_at_least: 5\n") == []
    assert evaluate(short, "quality:\n  words_at_least: null\n") == []


def test_stop_word_rule_follows_the_detected_language():
    german = ("Das Depot im Norden öffnet um sieben Uhr und schließt um neunzehn Uhr. Die "
              "Fahrer bestätigen jedes Zeitfenster per Funk, bevor sie den Hof verlassen, und "
              "der Disponent führt ein Buch über jede bestätigte Lieferung. Wenn ein Lastwagen "
              "zu spät ist, wird der nächste Kunde auf der Route angerufen und bekommt ein "
              "späteres Fenster angeboten, oder die Abholung am Schalter des Depots, der bis "
              "sieben Uhr abends geöffnet ist.")
    assert evaluate(german, language="de") == []
    assert "quality.no-stop-words" in evaluate(german, language="en")
    assert "quality.no-stop-words" not in evaluate(german, language="sw")  # no list: skipped


def test_repetition_is_one_finding_listing_every_measure():
    doc_codes = evaluate("\n".join([PROSE] * 5))
    assert doc_codes.count("quality.repetition") == 1
