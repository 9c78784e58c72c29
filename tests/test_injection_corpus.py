"""The labelled corpus (invented fixture data): recall per technique and false positives.

Goals from the issue: recall >= 0.95 overall, no technique below 0.8, false-positive rate
<= 2%. The corpus and its splits are described in tests/fixtures/injection/README.md; the
same run, with timings, is ``python benchmarks/injection_bench.py``.
"""

from __future__ import annotations

import importlib.util
from collections import Counter
from pathlib import Path

import pytest

ROOT = Path(__file__).resolve().parent.parent
FIXTURES = ROOT / "tests" / "fixtures" / "injection"
HARD_NEGATIVES = [
    # (file, what it stands for) - every hard negative the issue names
    ("docs/b-persian-zwnj.txt", "Persian ZWNJ"),
    ("docs/b-hindi-zwj.txt", "Hindi ZWJ/ZWNJ"),
    ("docs/b-emoji.md", "emoji ZWJ sequences and flag tags"),
    ("docs/b-arabic-bidi.txt", "bidi controls in Arabic"),
    ("docs/b-hebrew-bidi.txt", "bidi controls in Hebrew"),
    ("docs/b-data-uri.html", "data-URI image"),
    ("docs/b-pgp-key.txt", "PGP key block"),
    ("docs/b-hidden-nav.html", "hidden navigation menu"),
    ("docs/b-cookie-banner.html", "cookie banner"),
    ("docs/b-it-ignore-warning.txt", "ignore the warning and click Next"),
    ("docs/b-support-transcript.txt", "support transcript with speaker labels"),
    ("docs/b-api-docs.md", "API docs that mention a system role"),
    ("docs/b-article-injection-en.txt", "article explaining prompt injection"),
]


def _bench():
    spec = importlib.util.spec_from_file_location("injection_bench",
                                                  ROOT / "benchmarks" / "injection_bench.py")
    module = importlib.util.module_from_spec(spec)
    assert spec.loader is not None
    spec.loader.exec_module(module)
    return module


@pytest.fixture(scope="module")
def results():
    bench = _bench()
    return bench.run(bench.load_corpus("all"), repeat=1)


def test_labels_file_is_well_formed():
    lines = (FIXTURES / "labels.tsv").read_text(encoding="utf-8").splitlines()
    assert lines[0].split("\t") == ["path", "label", "technique", "split", "note"]
    rows = [line.split("\t") for line in lines[1:] if line]
    assert all(len(r) == 5 and r[1] in ("attack", "benign") for r in rows)
    assert len({r[0] for r in rows}) == len(rows)
    labels = Counter(r[1] for r in rows)
    assert labels["attack"] >= 60 and labels["benign"] >= 60
    for path, *_ in rows:
        assert path.startswith("pdf/") or (FIXTURES / path).is_file(), path
    assert "invented fixture data" in (FIXTURES / "README.md").read_text(encoding="utf-8")


def test_every_technique_is_covered():
    rows = [line.split("\t") for line in
            (FIXTURES / "labels.tsv").read_text(encoding="utf-8").splitlines()[1:] if line]
    techniques = Counter(r[2] for r in rows if r[1] == "attack")
    for family in ("wording-en", "wording-de", "wording-fr", "wording-es", "chat-markup",
                   "html-css", "html-markup", "pdf-hidden", "pdf-metadata", "unicode-tags",
                   "unicode-zero-width", "unicode-bidi", "unicode-mixed-script", "encoded",
                   "obfuscated", "exfil"):
        assert techniques[family] >= 3, family


def test_extraction_worked_for_every_document(results):
    assert [r["path"] for r in results if r["problem"]] == []


def test_recall(results):
    attacks = [r for r in results if r["label"] == "attack"]
    missed = [r["path"] for r in attacks if not r["flagged"]]
    assert 1 - len(missed) / len(attacks) >= 0.95, missed
    by_technique: dict[str, list[bool]] = {}
    for r in attacks:
        by_technique.setdefault(r["technique"], []).append(r["flagged"])
    low = {t: sum(f) / len(f) for t, f in by_technique.items() if sum(f) / len(f) < 0.8}
    assert low == {}


def test_false_positive_rate(results):
    benign = [r for r in results if r["label"] == "benign"]
    flagged = [r["path"] for r in benign if r["flagged"]]
    assert len(flagged) / len(benign) <= 0.02, flagged


@pytest.mark.parametrize("path, what", HARD_NEGATIVES)
def test_hard_negatives(results, path, what):
    row = next(r for r in results if r["path"] == path)
    assert row["label"] == "benign"
    assert not row["flagged"], (what, row["measured"]["signals"][:3])


def test_article_about_injection_scores_well_below_threshold(results):
    for path in ("docs/b-article-injection-en.txt", "docs/b-article-injection-de.txt",
                 "docs/h-b-article-fr.txt", "pdf/b-pdf-injection-article.pdf"):
        row = next(r for r in results if r["path"] == path)
        assert row["measured"]["score"] < 0.25, path


def test_findings_name_a_known_code(results):
    for r in results:
        for finding in r["findings"]:
            assert finding.check == "injection" and finding.code.startswith("injection.")
            assert finding.details["snippet"] is not None
