"""``gate run`` and ``gate explain`` evaluate a document with the same code: every sample
document under every example policy gets the same check outcomes, findings and decision."""

from __future__ import annotations

import json
import shutil
from datetime import UTC, datetime
from pathlib import Path

import pytest

from gate import checks
from gate import manifest as manifest_mod
from gate.containers import container_of
from gate.explain import explain
from gate.pipeline import RunOptions, run
from gate.policy import load_policy

ROOT = Path(__file__).resolve().parent.parent
INBOX = ROOT / "sample_docs" / "inbox"
POLICIES = sorted((ROOT / "policies").glob("*.yaml"))
AS_OF = datetime(2026, 12, 1, tzinfo=UTC)  # the demo's --as-of (Makefile)


def _codes(findings: list[dict], check: str) -> list[str]:
    return sorted(f["code"] for f in findings if f["check"] == check)


def _compare(report: dict, loaded, manifest) -> tuple[int, int, list[str]]:
    """(documents compared, decisions compared, differences) for one policy's run."""
    document_ids = [check.id for check in checks.DOCUMENT_CHECKS]
    corpus_ids = [check.id for check in checks.CORPUS_CHECKS]
    differences: list[str] = []
    decisions = 0
    for doc in report["documents"]:
        path = doc["path"]
        # a record of a web archive or an mbox: explain gets the container's manifest line
        record = manifest.get(path) or manifest.get(container_of(path))
        # with the inbox it arrives with: its site's template is learnt as in the run
        found = explain(INBOX / path, loaded, record=record, as_of=AS_OF, inbox_path=path,
                        batch=INBOX, batch_manifest=manifest)
        shown = {c["check"]: c for c in found.checks}
        held = doc["reasons"] + doc["warnings"]
        for check in document_ids:
            if doc["checks"][check] != shown[check]["outcome"]:
                differences.append(f"{path}: {check} {doc['checks'][check]} in the run, "
                                   f"{shown[check]['outcome']} explained")
            if _codes(held, check) != _codes(shown[check]["findings"], check):
                differences.append(f"{path}: {check} findings differ")
        # the corpus checks compare with the rest of the batch, which explain does not see
        if all(doc["checks"][c] in ("off", "n/a", "pass") for c in corpus_ids):
            decisions += 1
            if doc["decision"] != found.decision:
                differences.append(f"{path}: {doc['decision']} by the run, "
                                   f"{found.decision} explained")
    return len(report["documents"]), decisions, differences


@pytest.mark.parametrize("policy", POLICIES, ids=lambda p: p.stem)
def test_run_and_explain_agree_on_every_sample_document(policy, tmp_path):
    loaded = load_policy(policy)
    run(RunOptions(inbox=INBOX, policy=loaded, out=tmp_path / "out", as_of=AS_OF, workers=2))
    report = json.loads((tmp_path / "out" / "report.json").read_text(encoding="utf-8"))
    manifest = manifest_mod.load(INBOX / "manifest.jsonl")
    documents, decisions, differences = _compare(report, loaded, manifest)
    assert documents == len(report["documents"]) > 40
    assert decisions > documents // 2  # most documents have no duplicate finding
    assert differences == []


def test_an_allow_rules_overrides_apply_in_explain_as_in_run(tmp_path):
    """The drift this module guards against: a French page admitted by an allow rule whose
    overrides allow French was accepted by the run and held by explain."""
    inbox = tmp_path / "inbox"
    inbox.mkdir()
    page = inbox / "avis.html"
    shutil.copy(INBOX / "language" / "avis-aux-voyageurs.html", page)
    # invented source: a partner site of an invented operator
    (inbox / "manifest.jsonl").write_text(json.dumps(
        {"path": "avis.html", "source_url": "https://partner.example.org/avis.html"}) + "\n")
    policy = tmp_path / "p.yaml"
    policy.write_text(
        "version: 1\nname: fr-partner\n"
        "sources:\n  allow:\n    - domain: partner.example.org\n"
        "      overrides:\n        language:\n          allowed: [en, fr]\n"
        "language:\n  allowed: [en]\n")
    loaded = load_policy(policy)
    run(RunOptions(inbox=inbox, policy=loaded, out=tmp_path / "out", as_of=AS_OF))
    report = json.loads((tmp_path / "out" / "report.json").read_text(encoding="utf-8"))
    [doc] = [d for d in report["documents"] if d["path"] == "avis.html"]
    manifest = manifest_mod.load(inbox / "manifest.jsonl")
    found = explain(page, loaded, record=manifest.get("avis.html"), as_of=AS_OF,
                    inbox_path="avis.html")
    assert doc["language"]["code"] == "fr"
    assert doc["decision"] == found.decision == "accepted"
    assert doc["checks"]["language"] == "pass"
    assert {c["check"]: c["outcome"] for c in found.checks}["language"] == "pass"


def test_each_expensive_question_is_answered_once_per_document(monkeypatch, tmp_path):
    """The source match and the document's date are asked for by the evaluation, the
    source check and the freshness check; each is computed once."""
    from gate import dates, urls
    from gate.checks.base import Document, RunContext
    from gate.evaluation import evaluate_document
    from gate.extract.model import Extracted
    from gate.manifest import ManifestRecord

    path = tmp_path / "once.yaml"
    path.write_text("version: 1\nname: once\nfreshness:\n  max_age_days: 30\n"
                    "sources:\n  allow:\n    - domain: docs.example.org\n"
                    "      max_age_days: 90\n"
                    "      overrides:\n        freshness:\n          undated: warn\n")
    loaded = load_policy(path)
    calls = {"parse": 0, "dates": 0}
    real_parse, real_dates = urls.parse, dates.parse_any

    def parse(*args, **kwargs):
        calls["parse"] += 1
        return real_parse(*args, **kwargs)

    def parse_any(*args, **kwargs):
        calls["dates"] += 1
        return real_dates(*args, **kwargs)

    monkeypatch.setattr(urls, "parse", parse)
    monkeypatch.setattr(dates, "parse_any", parse_any)
    # invented document and source
    record = ManifestRecord(path="a.txt", line=1, source_url="https://docs.example.org/a",
                            published_at="2026-11-20")
    document = Document(path="a.txt", kind="file", size=10, sha256="0" * 64, manifest=record,
                        extracted=Extracted(type="text", text_chars=10))
    evaluation = evaluate_document(document, loaded, RunContext(as_of=AS_OF))
    assert evaluation.rule == 0 and evaluation.policy is not loaded.policy
    assert evaluation.marks["source"] == "pass" and evaluation.marks["freshness"] == "pass"
    assert evaluation.date is not None
    assert calls == {"parse": 1, "dates": 1}
