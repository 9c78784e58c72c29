"""gate.templates.learn_quick (what a run calls) against gate.templates.learn (the rules as
written): the same template for every host, on invented random hosts built to exercise
every rule: menus on most pages, asides outside the main text, teaser lists, numbered
lines in several wordings, signed stock comments, titles quoted by other pages, datelines,
promotions rotated over a few pages and bodies republished as versions."""

from __future__ import annotations

import random

import numpy as np
import pytest

from gate import templates


def _host(rng: random.Random, site: str) -> list[templates.Page]:
    """Invented pages of one host: hashes are small integers drawn from pools."""
    pages = []
    menu = list(range(1, 1 + rng.randint(0, 8)))
    asides = list(range(100, 100 + rng.randint(0, 12)))
    promos = list(range(200, 200 + rng.randint(0, 6)))
    bodies = [list(range(1000 + 50 * b, 1000 + 50 * b + rng.randint(1, 12)))
              for b in range(rng.randint(2, 30))]
    for _ in range(rng.randint(0, 40)):
        body = list(rng.choice(bodies))
        if rng.random() < 0.5:  # a version: most of the body and a line of its own
            body = body[:max(1, len(body) - rng.randint(0, 3))] + [rng.randint(5000, 5100)]
        main = body + [h for h in asides if rng.random() < 0.15]
        other = [h for h in menu if rng.random() < 0.9] + \
            [h for h in asides if rng.random() < 0.25] + \
            [h for h in promos if rng.random() < 0.2]
        shaped = tuple((rng.randint(1, 4), rng.randint(1, 3)) for _ in range(rng.randint(0, 2)))
        signed = tuple((rng.randint(1, 3), rng.randint(1, 4)) for _ in range(rng.randint(0, 2)))
        title = rng.choice(["", "Annual notice of the board", "Help", "Opening hours of the "
                            "reading room", "Annual notice of the board"])
        nav = np.array(sorted({h for h in asides if rng.random() < 0.3}), dtype=np.uint64)
        dateline = (rng.randint(1, 5),) if rng.random() < 0.7 else ()
        main_set = sorted(set(main))
        pages.append(templates.Page(
            site, np.array(main_set, dtype=np.uint64),
            np.array(sorted(set(other) - set(main_set)), dtype=np.uint64), shaped, title,
            signed, dateline, nav))
    return pages


def _same(a: templates.Learnt, b: templates.Learnt) -> bool:
    if a.keys() != b.keys():
        return False
    for site in a:
        for x, y in zip(a[site], b[site], strict=True):
            if isinstance(x, np.ndarray):
                if x.dtype != y.dtype or not np.array_equal(x, y):
                    return False
            elif x != y:
                return False
    return True


@pytest.mark.parametrize("seed", range(60))
def test_learn_quick_learns_what_learn_learns(seed):
    rng = random.Random(seed)
    pages = [p for h in range(rng.randint(1, 4)) for p in _host(rng, f"h{h}.example.org html")]
    rng.shuffle(pages)
    assert _same(templates.learn(pages), templates.learn_quick(pages))


def test_learn_quick_finds_recurring_blocks_and_versions():
    """Not only empty templates agree: a promotion on pages of three documents recurs,
    and the same promotion on three versions of one document does not (invented)."""
    def pg(main, other):
        return templates.Page("p.example.org html", np.array(main, dtype=np.uint64),
                              np.array(other, dtype=np.uint64))
    filler = [pg([300 + i, 400 + i], [1]) for i in range(12)]
    rotating = [pg([10, 11], [1, 50]), pg([20, 21], [1, 50]), pg([30, 31], [1, 50])]
    versions = [pg([60, 61, 62, 63], [1, 70]), pg([60, 61, 62, 64], [1, 70]),
                pg([60, 61, 62, 65], [1, 70])]
    learnt = templates.learn_quick(filler + rotating + versions)
    assert _same(learnt, templates.learn(filler + rotating + versions))
    assert learnt["p.example.org html"][7].tolist() == [50]
    assert templates.learn_quick([]) == {}
    empty = [pg([], []) for _ in range(3)] + [pg([1], [])]
    assert _same(templates.learn(empty), templates.learn_quick(empty))


@pytest.mark.parametrize("seed", range(30))
def test_removals_remove_what_removal_removes(seed):
    rng = random.Random(1000 + seed)
    pages = [p for h in range(rng.randint(1, 3)) for p in _host(rng, f"h{h}.example.org html")]
    learnt = templates.learn(pages)
    removals = templates.Removals(learnt)
    stranger = templates.Page("other.example.org html", np.array([1, 2], dtype=np.uint64),
                              np.zeros(0, dtype=np.uint64))
    for page in [*pages, stranger]:
        assert removals(page) == templates.removal(page, learnt)
