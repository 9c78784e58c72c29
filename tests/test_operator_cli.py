"""The operator's commands end to end on the bundled demo, through the real CLI."""

import json
import shutil
import sqlite3
import subprocess
import sys
from pathlib import Path

import pytest

ROOT = Path(__file__).resolve().parent.parent
INBOX = ROOT / "sample_docs" / "inbox"
POLICY = ROOT / "policies" / "demo.yaml"
DOCUMENTS = len(json.loads((ROOT / "sample_docs" / "expected.json").read_text())["documents"])


def gate(*args):
    return subprocess.run([sys.executable, "-m", "gate", *map(str, args)], capture_output=True,
                          text=True)


@pytest.fixture(scope="module")
def demo(tmp_path_factory):
    out = tmp_path_factory.mktemp("ops") / "out"
    result = gate("run", INBOX, "--policy", POLICY, "--out", out, "--as-of",
                  "2026-12-01T00:00:00Z", "-q")
    assert result.returncode == 0, result.stderr
    return out


@pytest.fixture
def out(demo, tmp_path):
    copy = tmp_path / "out"
    shutil.copytree(demo, copy, symlinks=True)
    return copy


def test_run_writes_the_html_report(demo):
    page = (demo / "report.html").read_text()
    assert "<svg" in page and "<script" not in page
    assert "no check outcomes recorded" not in page  # the run passes each check's outcome
    assert "injection/step-free-access.html" in page


def test_review_list_json_and_filters(out):
    result = gate("review", "list", out, "--code", "source.denied", "--json")
    assert result.returncode == 0
    entries = json.loads(result.stdout)
    assert sorted(e["path"] for e in entries) == ["source/draft-fares.html",
                                                  "source/raw-paste.txt"]
    assert all(e["location"].startswith("quarantine/") for e in entries)
    text = gate("review", "list", out, "--check", "language").stdout
    assert "language/avis-aux-voyageurs.html" in text and text.endswith("3 entries\n")


def test_review_show_makes_the_reasons_readable(out):
    result = gate("review", "show", out, "source/userinfo-trick.html")
    assert result.returncode == 0
    assert "source.userinfo" in result.stdout and "path:    source/userinfo-trick.html" in \
        result.stdout


def test_release_reject_purge_and_audit(out):
    result = gate("review", "release", out, "freshness/undated-memo.txt")
    assert result.returncode == 2 and "--note" in result.stderr  # a note is required
    result = gate("review", "release", out, "freshness/undated-memo.txt", "--note",
                  "confirmed current", "--by", "alex")
    assert result.returncode == 0, result.stderr
    assert result.stdout.splitlines()[-1].endswith("1 entries released (changes.jsonl updated)")
    assert gate("review", "reject", out, "source/fan-blog.html", "--note", "unofficial",
                "--by", "alex").returncode == 0
    assert gate("review", "purge", out, "format/logo.html", "--note", "an image",
                "--by", "alex").returncode == 0
    verify = gate("audit", "verify", out)
    entries = DOCUMENTS + 1 + 3  # the decisions, the run, three review actions
    assert verify.returncode == 0 and \
        verify.stdout.startswith(f"audit log intact: {entries} entries")
    shown = gate("audit", "show", out, "--limit", "3").stdout.splitlines()
    assert [line.split()[1] for line in shown] == ["purge", "reject", "release"]
    with sqlite3.connect(out / "state" / "gate.sqlite") as conn:
        conn.execute("UPDATE audit SET entry = replace(entry, 'alex', 'sam') WHERE seq = ?",
                     (entries - 2,))
    broken = gate("audit", "verify", out)
    assert broken.returncode == 1 and f"entry {entries - 2} was altered" in broken.stdout


def test_unknown_entry_is_a_clear_error(out):
    result = gate("review", "show", out, "no/such/doc.html")
    assert result.returncode == 2
    assert result.stderr.startswith("error: no entry 'no/such/doc.html'")


def test_explain_shows_every_check_without_routing(out, tmp_path):
    doc = INBOX / "language" / "avis-aux-voyageurs.html"
    before = sorted(p.name for p in (out / "quarantine").iterdir())
    result = gate("explain", doc, "--policy", POLICY, "--source-url",
                  "https://docs.example.org/avis.html", "--published-at", "2026-11-01",
                  "--as-of", "2026-12-01", "--against", out, "--json")
    assert result.returncode == 0, result.stderr
    data = json.loads(result.stdout)
    outcomes = {c["check"]: c["outcome"] for c in data["checks"]}
    assert outcomes["language"] == "fail" and outcomes["source"] == "pass"
    assert outcomes["duplicate"] == "pass"
    assert data["decision"] == "quarantined"
    assert sorted(p.name for p in (out / "quarantine").iterdir()) == before


def test_quarantine_rate_limits_fail_the_pipeline(out):
    args = ["run", INBOX, "--policy", POLICY, "--out", out, "--as-of", "2026-12-01T00:00:00Z",
            "-q"]
    assert gate(*args, "--max-quarantine-rate", "0.95").returncode == 0
    over = gate(*args, "--max-quarantine-rate", "0.5")
    assert over.returncode == 3 and "documents quarantined" in over.stderr
    code = gate(*args, "--max-code-rate", "source.denied=0.01")
    assert code.returncode == 3 and "quarantined for source.denied" in code.stderr
    bad = gate(*args, "--max-code-rate", "source.denied")
    assert bad.returncode == 2 and "CODE=RATE" in bad.stderr
