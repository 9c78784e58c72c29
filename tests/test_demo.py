"""The bundled demo: sample_docs/inbox under policies/demo.yaml gives the intended outcome
for every document, as listed in sample_docs/expected.json (generated, together with the
inbox, by sample_docs/make_samples.py).

The real pipeline runs once per module (``gate.pipeline.run``); a second run goes through
the CLI with several workers into a fresh output folder and must produce the same report.
"""

from __future__ import annotations

import hashlib
import importlib.util
import json
import os
import subprocess
import sys
from pathlib import Path

import pytest

from gate import dates
from gate.checks import check_ids
from gate.containers import container_of
from gate.findings import CODES
from gate.pipeline import RunOptions, run
from gate.policy import load_policy

ROOT = Path(__file__).resolve().parents[1]
SAMPLES = ROOT / "sample_docs"
INBOX = SAMPLES / "inbox"
POLICIES = ROOT / "policies"
DEMO_POLICY = POLICIES / "demo.yaml"
EXPECTED = json.loads((SAMPLES / "expected.json").read_text(encoding="utf-8"))
DOCS: dict[str, dict] = EXPECTED["documents"]
AS_OF = dates.parse_as_of(EXPECTED["as_of"])
GATE = [sys.executable, "-m", "gate"]  # the CLI of the interpreter running the tests

# Codes the demo does not show, with the reason (see the end of sample_docs/README.md).
NOT_DEMONSTRATED = {
    "format.timeout": "needs a document that hangs the parser",
    "format.memory": "needs a document that exhausts memory",
    "format.crashed": "needs a document that kills the worker",
    "format.unreadable": "needs a file the user cannot read",
    "format.undecodable": "needs text in no detectable encoding",
    "format.type-not-allowed": "needs a policy narrowing format.allowed_types",
    "integrity.unhashable": "needs a file that cannot be read",
    "duplicate.superseded": "needs a second, later run",
}
# The checks whose every code the demo covers (apart from the exceptions above). The
# injection and quality checks show a selection of their codes here; each of their codes
# has positives and negatives in its own tests (tests/test_injection_*, test_quality.py).
COVERED_CHECKS = ("source", "integrity", "freshness", "language", "format", "duplicate",
                  "signature")


def _inbox_documents() -> set[str]:
    """Every entry of the inbox that is a document: all but the top-level manifest."""
    found = set()
    for folder, dirs, files in os.walk(INBOX, followlinks=False):
        for name in dirs + files:
            full = Path(folder) / name
            if full.is_dir() and not full.is_symlink():
                continue
            rel = full.relative_to(INBOX).as_posix()
            if rel != "manifest.jsonl":
                found.add(rel)
    return found


def _codes(findings: list[dict]) -> list[str]:
    return sorted(f["code"] for f in findings)


def _without_run_id(report: dict) -> dict:
    copy = json.loads(json.dumps(report))
    del copy["run"]["id"]
    return copy


@pytest.fixture(scope="module")
def demo(tmp_path_factory):
    out = tmp_path_factory.mktemp("demo") / "out"
    result = run(RunOptions(inbox=INBOX, policy=load_policy(DEMO_POLICY), out=out,
                            as_of=AS_OF))
    report = json.loads(result.report_path.read_text(encoding="utf-8"))
    return {"out": out, "report": report, "result": result,
            "by_path": {d["path"]: d for d in report["documents"]}}


# -- the sample set itself -----------------------------------------------------------


def test_expected_lists_exactly_the_inbox():
    # a WARC archive or an mbox stands for its records (ARCHIVE#record-NNNNN)
    assert {container_of(p) for p in DOCS} == _inbox_documents()


def test_the_symlink_is_a_link_out_of_the_inbox():
    link = INBOX / "format" / "link-outside.html"
    assert link.is_symlink()
    target = (link.parent / os.readlink(link)).resolve()
    assert INBOX.resolve() not in target.parents


def test_the_demo_covers_every_code_of_the_existing_checks():
    shown = {code for doc in DOCS.values() for code in doc["reasons"] + doc["warnings"]}
    wanted = {code for code, spec in CODES.items()
              if spec.check in COVERED_CHECKS and not code.endswith(".internal-error")}
    assert wanted - shown - set(NOT_DEMONSTRATED) == set()
    assert shown <= set(CODES)
    assert not shown & set(NOT_DEMONSTRATED)


def test_good_examples_in_each_language_and_type():
    accepted = {p for p, d in DOCS.items() if d["decision"] == "accepted" and
                not d["warnings"]}
    for lang in ("en", "de"):
        mine = {p for p in accepted if DOCS[p]["lang"] == lang}
        assert len(mine) >= 2, lang
        assert {Path(p).suffix for p in mine} >= {".html", ".pdf", ".txt", ".md"}, lang


def test_committed_files_match_the_generator():
    spec = importlib.util.spec_from_file_location("make_samples", SAMPLES / "make_samples.py")
    module = importlib.util.module_from_spec(spec)
    sys.modules[spec.name] = module  # dataclasses look their module up
    try:
        spec.loader.exec_module(module)
    finally:
        del sys.modules[spec.name]
    docs = module.documents()
    import fpdf
    same_fpdf = fpdf.__version__ == EXPECTED["generated_with"]["fpdf2"]
    for doc in docs:
        path = INBOX / doc.path
        if doc.link is not None:
            assert os.readlink(path) == doc.link
        elif same_fpdf or not doc.path.endswith(".pdf"):
            assert path.read_bytes() == doc.data, f"{doc.path}: re-run make_samples.py"
    assert json.loads((SAMPLES / "expected.json").read_text(encoding="utf-8")) == \
        json.loads(json.dumps(module.expected(docs)))
    assert (SAMPLES / "README.md").read_text(encoding="utf-8") == module.readme(docs)
    text = (INBOX / "manifest.jsonl").read_text(encoding="utf-8")
    want = module.manifest_text(docs)  # signs the demo batches with ssh-keygen
    if same_fpdf:
        assert text == want
    else:
        def paths(t):
            return [json.loads(line).get("path") for line in t.splitlines()]
        assert paths(text) == paths(want)
    signers = POLICIES / module.formats_demo.SIGNERS_FILE
    assert module.formats_demo.public_line("notice-desk").split(" ", 2)[2] in \
        signers.read_text(encoding="utf-8")
    assert module.formats_demo.public_line("feed-relay") in DEMO_POLICY.read_text()


def test_manifest_digests_are_those_of_the_files():
    lines = [json.loads(line) for line in
             (INBOX / "manifest.jsonl").read_text(encoding="utf-8").splitlines()]
    records = {r["path"]: r for r in lines if "path" in r}  # not the signature lines
    deliberate = {p for p, d in DOCS.items() if set(d["reasons"]) & {
        "integrity.mismatch", "integrity.malformed", "integrity.missing",
        "format.not-regular"}}
    for path in {container_of(p) for p in set(DOCS) - deliberate}:
        if path in records:
            data = (INBOX / path).read_bytes()
            assert records[path]["sha256"] == hashlib.sha256(data).hexdigest(), path


# -- the run -------------------------------------------------------------------------


@pytest.mark.parametrize("path", sorted(DOCS))
def test_document_outcome(demo, path):
    want = DOCS[path]
    got = demo["by_path"][path]
    assert got["decision"] == want["decision"], got["reasons"]
    assert _codes(got["reasons"]) == want["reasons"], got["reasons"]
    assert _codes(got["warnings"]) == want["warnings"], got["warnings"]
    for finding in got["reasons"] + got["warnings"]:
        assert finding["check"] == finding["code"].split(".")[0]
        assert finding["check"] in check_ids()
        assert finding["message"]


def test_every_document_appears_exactly_once(demo):
    paths = [d["path"] for d in demo["report"]["documents"]]
    assert len(paths) == len(set(paths))
    assert set(paths) == set(DOCS)
    assert demo["report"]["manifest_unmatched"] == EXPECTED["manifest_unmatched"]


def test_summary_counts(demo):
    summary = demo["report"]["summary"]
    accepted = sum(d["decision"] == "accepted" for d in DOCS.values())
    assert summary["documents"] == len(DOCS)
    assert summary["accepted"] == accepted
    assert summary["quarantined"] == len(DOCS) - accepted
    by_code: dict[str, int] = {}
    for doc in DOCS.values():
        for code in set(doc["reasons"]):
            by_code[code] = by_code.get(code, 0) + 1
    assert summary["quarantined_by_code"] == dict(sorted(by_code.items()))


def test_folders_hold_exactly_what_the_report_says(demo):
    out = demo["out"]
    for folder in ("accepted", "quarantine"):
        decision = "accepted" if folder == "accepted" else "quarantined"
        listed = {d["id"] for d in demo["report"]["documents"] if d["decision"] == decision}
        assert {e.name for e in (out / folder).iterdir()} == listed, folder
    for doc in demo["report"]["documents"]:
        entry = out / doc["location"]
        record = "provenance.json" if doc["decision"] == "accepted" else "reasons.json"
        saved = json.loads((entry / record).read_text(encoding="utf-8"))
        assert saved["decision"] == doc["decision"]
        assert saved["document"]["path"] == doc["path"]
        assert _codes(saved["reasons"]) == _codes(doc["reasons"])
        source = INBOX / doc["path"]
        if container_of(doc["path"]) != doc["path"]:  # a record: its bytes are its payload
            if (entry / "original").exists():
                assert hashlib.sha256((entry / "original").read_bytes()).hexdigest() == \
                    doc["sha256"]
            continue
        if source.is_symlink():
            assert not (entry / "original").exists()  # a link is never followed
            continue
        assert hashlib.sha256(source.read_bytes()).hexdigest() == doc["sha256"]
        if "format.too-large" in _codes(doc["reasons"]):
            continue  # hashed as a stream, never staged: its entry may lack the original
        assert (entry / "original").read_bytes() == source.read_bytes()


def test_details_the_demo_shows(demo):
    by_path = demo["by_path"]
    near = by_path["partner/fahrplanwechsel-vorab.html"]["reasons"][0]["details"]
    assert near["keeper"] == "partner/fahrplanwechsel.html"
    assert near["differences"] == [["5:12", "5:14"]]
    trusted = by_path["wiki/tarife-zusammenfassung.txt"]["reasons"][0]["details"]
    assert trusted["keeper"] == "portal/tarifbestimmungen.pdf"
    assert "trust 3 over 1" in trusted["why"]
    assert by_path["recrawl/accessibility-guide.html"]["reasons"][0]["details"]["how"] == \
        "same text"
    assert by_path["recrawl/network-overview.html"]["reasons"][0]["details"]["how"] == \
        "same bytes"
    assert by_path["portal/accessibility-guide.pdf"]["date"]["source"] == "PDF /CreationDate"
    assert by_path["partner/fahrplanwechsel.html"]["date"]["source"] == "meta last-modified"
    assert by_path["freshness/timetable-2027.html"]["reasons"][0]["details"]["source"] == \
        "meta article:published_time"
    assert by_path["wiki/driver-handbook.txt"]["source"]["url"] == \
        "https://wiki.example.org/public/handbook/driver-handbook.txt"
    assert by_path["local/shift-briefing.md"]["source"]["allowed_by"].startswith(
        "sources.allow[3] (path local/")


def test_second_run_gives_the_same_report(demo, tmp_path):
    """The same inbox and clock through the CLI, with several workers, into a fresh
    output folder: the report is identical apart from the run id."""
    out = tmp_path / "out"
    done = subprocess.run(
        [*GATE, "run", str(INBOX), "--policy", str(DEMO_POLICY), "--out", str(out),
         "--as-of", EXPECTED["as_of"], "--workers", "3", "--quiet"],
        capture_output=True, text=True, timeout=120)
    assert done.returncode == 0, done.stderr
    again = json.loads((out / "report.json").read_text(encoding="utf-8"))
    assert _without_run_id(again) == _without_run_id(demo["report"])


def test_rerun_into_the_same_folder_changes_nothing(demo, tmp_path):
    first = run(RunOptions(inbox=INBOX, policy=load_policy(DEMO_POLICY),
                           out=tmp_path / "out", as_of=AS_OF))
    second = run(RunOptions(inbox=INBOX, policy=load_policy(DEMO_POLICY),
                            out=tmp_path / "out", as_of=AS_OF))
    assert (first.run_id, second.run_id) == ("run-0001", "run-0002")
    report = json.loads(second.report_path.read_text(encoding="utf-8"))
    for doc, before in zip(report["documents"], demo["report"]["documents"]):
        assert (doc["path"], doc["decision"], doc["reasons"], doc["warnings"]) == \
            (before["path"], before["decision"], before["reasons"], before["warnings"])
        assert doc["change"] == ("unchanged" if doc["decision"] == "accepted" else "none")
    assert report["summary"]["changes"] == {}


# -- the example policies ------------------------------------------------------------


@pytest.mark.parametrize("policy", sorted(p.name for p in POLICIES.glob("*.yaml")))
def test_every_example_policy_passes_policy_check(policy):
    done = subprocess.run([*GATE, "policy", "check", str(POLICIES / policy)],
                          capture_output=True, text=True, timeout=60)
    assert done.returncode == 0, done.stderr
    assert "valid policy" in done.stdout
    loaded = load_policy(POLICIES / policy).policy
    for section in ("sources", "integrity", "freshness", "language", "duplicates", "format"):
        assert getattr(loaded, section) is not None, (policy, section)


def test_there_are_at_least_three_documented_policies():
    names = {p.name for p in POLICIES.glob("*.yaml")}
    assert {"demo.yaml", "regulated-archive.yaml", "public-research.yaml"} <= names
    readme = (POLICIES / "README.md").read_text(encoding="utf-8")
    for name in names:
        assert name in readme, name


def _outcomes(policy: str, tmp_path: Path) -> dict[str, dict]:
    result = run(RunOptions(inbox=INBOX, policy=load_policy(POLICIES / policy),
                            out=tmp_path / policy, as_of=AS_OF))
    report = json.loads(result.report_path.read_text(encoding="utf-8"))
    return {d["path"]: d for d in report["documents"]}


def test_public_research_warns_where_demo_quarantines(tmp_path):
    docs = _outcomes("public-research.yaml", tmp_path)

    def outcome(path):
        # quality only warns under this policy, and the demo's short notes trip its word
        # count; those warnings are left out here (tests/test_quality.py covers them)
        warnings = [w for w in docs[path]["warnings"] if w["check"] != "quality"]
        return docs[path]["decision"], _codes(docs[path]["reasons"]), _codes(warnings)

    assert outcome("freshness/undated-memo.txt") == ("accepted", [], ["freshness.undated"])
    assert outcome("freshness/timetable-2027.html") == ("accepted", [], ["freshness.future"])
    assert outcome("format/timetable-export.pdf") == \
        ("accepted", [], ["format.type-mismatch"])
    assert outcome("source/fan-blog.html") == ("accepted", [], [])  # provenance not required
    assert outcome("language/avis-aux-voyageurs.html") == ("accepted", [], [])  # fr allowed
    assert outcome("source/userinfo-trick.html") == ("quarantined", ["source.userinfo"], [])
    assert outcome("format/locked-minutes.pdf") == ("quarantined", ["format.encrypted"], [])


def test_regulated_archive_takes_nothing_from_the_demo_inbox(tmp_path):
    docs = _outcomes("regulated-archive.yaml", tmp_path)
    assert {d["decision"] for d in docs.values()} == {"quarantined"}
    assert not any(d["warnings"] for d in docs.values())
    assert "format.type-not-allowed" in _codes(docs["portal/network-overview.html"]["reasons"])
    assert _codes(docs["portal/accessibility-guide.pdf"]["reasons"]) == ["source.unlisted"]
