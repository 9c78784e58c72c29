"""The whole-text language reading (gate/langid.py) against langdetect, its reference.

langdetect 1.0.9 is the reference library: its own n-gram extraction and its own verdicts are
the expected values. The texts are invented for these tests (invented places and services).
"""

from __future__ import annotations

import pytest
from langdetect import DetectorFactory, detect, detector_factory

from gate import langid

DetectorFactory.seed = 0


def _langdetect_ngrams(text: str) -> list[str]:
    """What langdetect itself extracts (Detector.append, cleaning_text, _extract_ngrams)."""
    detector_factory.init_factory()
    detector = detector_factory._factory.create()
    detector.append(text)
    detector.cleaning_text()
    return sorted(detector._extract_ngrams())


TEXTS = {
    "en": "The northern depot opens at seven and closes at nineteen on weekdays. Drivers "
          "collect their keys from the office beside the wash bay.",
    "de": "Die Fahrgäste der Linie vier sollten am Wochenende mehr Zeit einplanen, weil "
          "die Gleise zwischen dem Hafen und dem Altmarkt erneuert werden.",
    "fr": "Le dépôt du nord ouvre à sept heures et ferme à dix-neuf heures en semaine; les "
          "conducteurs récupèrent leurs clés au bureau à côté de la station de lavage.",
    "es": "El almacén del norte abre a las siete y cierra a las diecinueve entre semana; "
          "los conductores recogen las llaves en la oficina junto al lavadero.",
    "it": "Il deposito nord apre alle sette e chiude alle diciannove nei giorni feriali; "
          "gli autisti ritirano le chiavi nell'ufficio accanto all'autolavaggio.",
    "pl": "Zajezdnia północna jest otwarta od siódmej do dziewiętnastej w dni robocze; "
          "kierowcy odbierają klucze w biurze obok myjni.",
    "ru": "Северное депо открывается в семь и закрывается в девятнадцать часов по будням; "
          "водители забирают ключи в конторе рядом с мойкой.",
    "ja": "北の車庫は平日の七時に開き、十九時に閉まります。運転手は洗車場の隣の事務所で鍵を"
          "受け取ります。",
    "vi": "Kho phía bắc mở cửa lúc bảy giờ và đóng cửa lúc mười chín giờ vào các ngày "
          "trong tuần; tài xế nhận chìa khóa tại văn phòng cạnh khu rửa xe.",
}


@pytest.mark.parametrize("code", sorted(TEXTS))
def test_ngrams_are_langdetects_own(code):
    assert langid.profile_ngrams(TEXTS[code]) == _langdetect_ngrams(TEXTS[code])


@pytest.mark.parametrize("text", [
    "SEE THE NOTICE at https://transit.example.org/notices?id=4 or write to "
    "desk@transit.example.org  --  twice   spaced   words, ALLCAPS and MixedCase.",
    "運転手は ID カード (badge-v2) を提示してください。事務所は 8 時に開きます。",
    "",
    "    ",
])
def test_ngrams_match_langdetect_on_awkward_text(text):
    assert langid.profile_ngrams(text) == _langdetect_ngrams(text)


@pytest.mark.parametrize("code", sorted(TEXTS))
def test_verdict_agrees_with_langdetect(code):
    text = TEXTS[code]
    found = langid.identify(text)
    assert detect(text) == code  # the reference's verdict on the invented text
    assert found.shares[0][0] == code
    assert found.shares[0][1] > 0.95


def test_shares_follow_the_paragraphs():
    # each paragraph is long enough (MIN_CHUNK) to be judged on its own
    text = "\n\n".join([TEXTS["es"] * 2, TEXTS["en"] * 2, TEXTS["es"] * 2, TEXTS["es"] * 2])
    shares = dict(langid.identify(text).shares)
    assert shares["es"] > 0.7 and 0.1 < shares["en"] < 0.3
    assert abs(sum(shares.values()) - 1.0) < 0.02


def test_identifiers_do_not_outvote_japanese():
    # a Japanese page whose option lists are Latin: judged Japanese (man-page shape)
    text = "\n\n".join([TEXTS["ja"], "--verbose --quiet --config FILE --no-color --dry-run",
                        TEXTS["ja"]])
    assert langid.identify(text).shares[0][0] == "ja"


def test_nothing_to_read():
    assert langid.identify("") == langid.Shares(0, 0, ())
    assert langid.identify("1234 5678 — 90").shares == ()


def test_chunks_cover_the_text_and_stay_bounded():
    paragraphs = ["word " * n for n in (3, 50, 400, 10, 2)]
    pieces = langid.chunks("\n\n".join(paragraphs))
    assert " ".join(pieces).split() == "\n\n".join(paragraphs).split()
    assert all(len(piece) <= 2 * langid.CHUNK + langid.MIN_CHUNK for piece in pieces)


def test_profile_table_is_langdetects_own():
    # the reference is langdetect's DetectorFactory table (language order, n-grams and
    # P(n-gram | language)); gate reads the same files with numpy
    import numpy as np

    detector_factory.init_factory()
    factory = detector_factory._factory
    prof = langid.profiles()
    assert prof.langs == tuple(factory.langlist)
    table = factory.word_lang_prob_map
    assert prof.keys.size == len(table)
    rows = np.searchsorted(prof.keys, np.array([langid._Profiles.key(g) for g in table],
                                                dtype=np.uint64))
    expected = np.log(np.array(list(table.values())) + 0.5 / 10_000).astype(np.float32)
    assert np.array_equal(prof.logp[rows], expected)


def test_normalisation_table_is_langdetects_normalize_of_every_bmp_character():
    # the reference is langdetect's NGram.normalize, called on each of the 65,536 code
    # points (what the table was built from before the block rules were vectorised)
    import numpy as np
    from langdetect.utils.ngram import NGram

    expected = np.fromiter(map(ord, map(NGram.normalize, map(chr, range(0x10000)))),
                           dtype=np.uint32, count=0x10000)
    got = langid._normal_table()
    assert got.dtype == np.uint32
    assert np.array_equal(got, expected), np.flatnonzero(got != expected)[:10]
    assert np.array_equal(langid.profiles().normal, expected)


def test_grouped_sums_are_each_groups_own_sparse_products_bits():
    # the reference is one CSR product per group of rows (what identify did before it
    # summed every (part, length) group in one product): the same float32 bits, group by
    # group and chunk by chunk; random rows (invented data), empty groups included
    import numpy as np
    from scipy import sparse

    prof = langid.profiles()
    rng = np.random.default_rng(11)
    for chunks, sizes in ((1, (0, 0, 0)), (1, (1, 0, 37)), (3, (400, 0, 4000)),
                          (6, (4000, 3000, 2, 0, 5, 9000))):
        rows, bounds, expected = [], [], []
        for n in sizes:
            rows.append(rng.integers(0, prof.keys.size, n))
            bounds.append(np.concatenate(([0], np.sort(rng.integers(0, n + 1, chunks - 1)),
                                          [n])))
            counts = sparse.csr_matrix((np.ones(n, dtype=np.float32), rows[-1], bounds[-1]),
                                       shape=(chunks, prof.keys.size))
            expected.append(counts @ prof.logp)
        got = langid._sums(prof, rows, bounds)
        assert got.dtype == np.float32 and got.shape == (len(sizes) * chunks, 55)
        assert np.array_equal(got, np.concatenate(expected)), (chunks, sizes)


def test_hash_lookup_finds_every_profile_key_and_nothing_else():
    # the hash table must answer as the sorted keys do: each 2- and 3-gram key of
    # langdetect's profiles at its own row, and keys the profiles lack (their neighbours
    # plus one, invented) not at all
    import numpy as np

    prof = langid.profiles()
    for length in (2, 3):
        lo, hi = prof.starts[length - 1], prof.starts[length]
        keys = prof.keys[lo:hi]
        rows, hit = langid._lookup(prof, keys.copy(), length)
        assert hit.all() and np.array_equal(rows, np.arange(lo, hi))
        missing = np.setdiff1d(keys + np.uint64(1), keys)
        _rows, hit = langid._lookup(prof, missing, length)
        assert missing.size > 1000 and not hit.any()


def test_dense_ascii_tables_hold_exactly_the_profiles_ascii_ngrams():
    # every 2- and 3-gram key of langdetect's profiles made of a space and ASCII letters is
    # in the dense table at its own row, and no other entry is filled (checked against the
    # sorted keys, not against the hash table the dense tables are built with)
    import numpy as np

    prof = langid.profiles()
    letters = {ord(ch): i for i, ch in enumerate(langid._ASCII_LETTERS)}
    for length in (2, 3):
        expected = {}
        for row in range(prof.starts[length - 1], prof.starts[length]):
            key = int(prof.keys[row])
            points = [(key >> (21 * i)) & 0x1FFFFF for i in reversed(range(length))]
            if all(p in letters for p in points):
                code = 0
                for p in points:
                    code = (code << 6) | letters[p]
                expected[code] = row
        table = prof.dense[length]
        filled = np.flatnonzero(table >= 0)
        assert len(expected) > 1000 and sorted(expected) == filled.tolist()
        assert all(table[code] == row for code, row in expected.items())


@pytest.mark.parametrize("text", [
    TEXTS["en"],
    "\n\n".join([TEXTS["en"]] * 9 + ["NOTICE FOR DRIVERS: the YARD gate closes EARLY",
                                     "see http://depot.example.org/keys or mail a@b.test"]),
    "Short words ab cd ef. " * 40 + "\n\n" + "x" * 3000,
    TEXTS["en"] + "\0 a NUL inside\n\n" + TEXTS["en"].upper() + "\n\n" + TEXTS["en"],
])
def test_dense_ascii_path_gives_the_same_shares_bit_for_bit(text, monkeypatch):
    # invented ASCII texts: the dense path and the hash-table path agree exactly
    dense = langid.identify(text)
    monkeypatch.setattr(langid, "DENSE", False)
    assert langid.identify(text) == dense


def test_public_product_fallback_gives_the_same_bits(monkeypatch):
    # without scipy's private CSR routine, the public product: the same float32 bits
    # (random rows, invented data)
    import numpy as np

    prof = langid.profiles()
    rng = np.random.default_rng(5)
    rows = [rng.integers(0, prof.keys.size, n) for n in (300, 0, 2000)]
    bounds = [np.array([0, n // 3, n]) for n in (300, 0, 2000)]
    direct = langid._sums(prof, rows, bounds)
    monkeypatch.setattr(langid, "_csr_matvecs", None)
    assert np.array_equal(langid._sums(prof, rows, bounds), direct)
