"""Quarantine review and the audit log, on a real run of the bundled demo."""

import json
import shutil
import sqlite3
from datetime import UTC, datetime
from pathlib import Path

import pytest

from gate import audit, review
from gate.errors import GateError
from gate.pipeline import RunOptions, run
from gate.policy import load_policy
from gate.visible import visible

ROOT = Path(__file__).resolve().parent.parent
INBOX = ROOT / "sample_docs" / "inbox"
POLICY = ROOT / "policies" / "demo.yaml"
AS_OF = datetime(2026, 12, 1, tzinfo=UTC)
WHEN = datetime(2026, 12, 2, 9, 30, tzinfo=UTC)
EXPECTED = json.loads((ROOT / "sample_docs" / "expected.json").read_text())["documents"]
HELD = sum(d["decision"] == "quarantined" for d in EXPECTED.values())


@pytest.fixture(scope="module")
def demo(tmp_path_factory):
    out = tmp_path_factory.mktemp("demo") / "out"
    run(RunOptions(inbox=INBOX, policy=load_policy(POLICY), out=out, as_of=AS_OF, workers=2))
    return out


@pytest.fixture
def out(demo, tmp_path):
    copy = tmp_path / "out"
    shutil.copytree(demo, copy, symlinks=True)
    return copy


def rerun(out):
    run(RunOptions(inbox=INBOX, policy=load_policy(POLICY), out=out, as_of=AS_OF, workers=1))
    return {d["path"]: d for d in json.loads((out / "report.json").read_text())["documents"]}


def test_list_filters(out):
    everything = review.list_entries(out)
    assert len(everything) == HELD  # the demo's quarantined documents
    assert {e.path for e in review.list_entries(out, check="language")} == {
        "language/avis-aux-voyageurs.html", "language/mixed-bulletin.txt",
        "language/depot-hours.txt"}
    assert [e.path for e in review.list_entries(out, code="integrity.mismatch")] == \
        ["integrity/edited-after-recording.txt"]
    report = json.loads((out / "report.json").read_text())
    held_for_format = {d["path"] for d in report["documents"]
                       if any(r["check"] == "format" for r in d["reasons"])}
    # a check id works as a code prefix
    assert {e.path for e in review.list_entries(out, code="format")} == held_for_format
    assert all("paste.example.net" in e.source_url
               for e in review.list_entries(out, source="paste.example.net"))
    assert review.list_entries(out, run="run-0001") and not review.list_entries(out,
                                                                              run="run-0009")
    assert review.list_entries(out, since="2026-12-01") and \
        not review.list_entries(out, since="2026-12-02")


def test_show_near_duplicate_has_a_diff_against_its_keeper(out):
    shown = review.show(out, "partner/fahrplanwechsel-vorab.html")
    assert shown["folder"] == "quarantine"
    diff = shown["keeper_diffs"][0]["diff"]
    assert "keeper: partner/fahrplanwechsel.html" in diff
    assert "-" in diff and "+" in diff and ("5:12" in diff or "5:14" in diff)


def test_release_moves_to_accepted_updates_changes_and_is_remembered(out):
    path = "freshness/undated-memo.txt"
    with pytest.raises(GateError, match="note is required"):
        review.act(out, "release", [path], note=" ")
    result = review.act(out, "release", [path], note="memo is current, says the office",
                        by="reviewer-a", now=WHEN)
    assert result.review_id.startswith("review-")
    doc_id = result.ids[0]
    assert (out / "accepted" / doc_id / "provenance.json").exists()
    assert not (out / "quarantine" / doc_id).exists()
    prov = json.loads((out / "accepted" / doc_id / "provenance.json").read_text())
    assert prov["released"]["by"] == "reviewer-a" and prov["decision"] == "accepted"
    lines = [json.loads(x) for x in (out / "changes.jsonl").read_text().splitlines()]
    assert lines[-1]["action"] == "add" and lines[-1]["id"] == doc_id
    assert lines[-1]["run"] == result.review_id
    # the next run does not hold the same bytes for the same finding again
    got = rerun(out)[path]
    assert got["decision"] == "accepted"
    assert [w["code"] for w in got["warnings"]] == ["freshness.undated"]
    assert "released by reviewer-a" in got["warnings"][0]["message"]


def test_findings_that_mean_not_evaluated_cannot_be_released(out):
    with pytest.raises(GateError, match="could not evaluate"):
        review.act(out, "release", ["format/truncated-report.pdf"], note="looks fine")


def test_reject_keeps_it_held_and_out_of_the_open_list(out):
    path = "source/fan-blog.html"
    review.act(out, "reject", [path], note="not an official source", by="r", now=WHEN)
    assert path not in {e.path for e in review.list_entries(out)}
    assert path in {e.path for e in review.list_entries(out, status="rejected")}
    rerun(out)  # unchanged bytes: the verdict stays
    assert path in {e.path for e in review.list_entries(out, status="rejected")}


def test_purge_deletes_the_entry_but_not_the_history(out):
    path = "format/logo.html"
    result = review.act(out, "purge", [path], note="an image, not a document", by="r",
                        now=WHEN)
    assert not (out / "quarantine" / result.ids[0]).exists()
    with sqlite3.connect(out / "state" / "gate.sqlite") as conn:
        actions = [e["action"] for e in audit.entries(conn, doc_id=result.ids[0])]
        assert actions[0] == "purge" and "decision" in actions
        assert audit.verify(conn).ok


def test_audit_chain_detects_edits_and_deletions(out):
    review.act(out, "reject", ["source/fan-blog.html"], note="n", by="r", now=WHEN)
    db = out / "state" / "gate.sqlite"
    with sqlite3.connect(db) as conn:
        good = audit.verify(conn)
        # a decision per document, the run, one review
        assert good.ok and good.entries == len(EXPECTED) + 1 + 1
        head = good.head
        conn.execute("UPDATE audit SET entry = replace(entry, 'quarantined', 'accepted') "
                     "WHERE seq = 3")
        bad = audit.verify(conn)
        assert not bad.ok and "entry 3 was altered" in bad.problem
    shutil.copy(db, db.with_name("copy.sqlite"))
    with sqlite3.connect(db.with_name("copy.sqlite")) as conn:
        conn.execute("DELETE FROM audit WHERE seq = 3")
        assert "missing" in audit.verify(conn).problem
    truncated = db.with_name("truncated.sqlite")
    shutil.copy(db.with_name("copy.sqlite"), truncated)
    with sqlite3.connect(truncated) as conn:
        conn.execute("DELETE FROM audit WHERE seq >= 3")
        # cutting off the newest entries leaves a consistent chain...
        assert audit.verify(conn).ok
        # ...which only the head recorded earlier (report.json, an archive) exposes
        assert not audit.verify(conn, expected_head=head).ok


def test_report_records_the_audit_head(out):
    report = json.loads((out / "report.json").read_text())
    with sqlite3.connect(out / "state" / "gate.sqlite") as conn:
        assert report["run"]["audit_head"] == audit.verify(conn).head


def test_visible_makes_invisible_characters_visible():
    assert visible("a\u200bb\u202ec\U000e0041") == "a<U+200B>b<U+202E>c<U+E0041>"
