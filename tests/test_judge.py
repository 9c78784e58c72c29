"""Documents are evaluated by the worker that measured them (gate.judge): the records and
decisions are those the coordinator computes itself from the same results."""

from __future__ import annotations

import json
from datetime import UTC, datetime
from pathlib import Path

from gate import documents, intake
from gate.pipeline import RunOptions, run
from gate.policy import load_policy

ROOT = Path(__file__).resolve().parent.parent
INBOX = ROOT / "sample_docs" / "inbox"  # the demo inbox (invented organisations)
POLICY = ROOT / "policies" / "demo.yaml"
AS_OF = datetime(2026, 12, 1, tzinfo=UTC)  # the demo's --as-of (Makefile)


def _run(out: Path) -> list[dict]:
    run(RunOptions(inbox=INBOX, policy=load_policy(POLICY), out=out, as_of=AS_OF,
                   workers=2))
    report = json.loads((out / "report.json").read_text())
    return [{k: v for k, v in doc.items() if k != "location"} for doc in report["documents"]]


def test_worker_verdicts_equal_the_coordinators(tmp_path, monkeypatch):
    here = []  # documents the coordinator evaluated itself
    verdict = documents.verdict

    def counted(*args, **kw):
        here.append(args[0])
        return verdict(*args, **kw)

    monkeypatch.setattr(documents, "verdict", counted)
    by_workers = _run(tmp_path / "workers")
    on_workers = len(by_workers) - len(here)
    # the local pool's processes are forked from this one, so the patch reaches them:
    # no worker gives a verdict, the coordinator evaluates every document
    monkeypatch.setattr(intake, "_judged", lambda result, subject, seen: result)
    here.clear()
    by_coordinator = _run(tmp_path / "coordinator")
    assert len(here) == len(by_coordinator)
    assert on_workers > len(by_workers) // 2  # most documents were judged by a worker
    assert by_workers == by_coordinator
