"""The placement a decision records: its fingerprint and payload serialise the record once
(gate.commit._placement) and must equal what the plain definitions give, or every entry
would be rewritten after an upgrade and a payload could be read differently.

Records are invented (paths, digests and URLs made up, example.org); the expected values
are computed by the definitions themselves: placement_fingerprint and json.dumps of the
payload dict, as gate.commit wrote them before."""

from __future__ import annotations

import json

import pytest

from gate.commit import _placement, placement_fingerprint
from gate.placement import payload_head

RUN_INFO = {"id": "run-0001", "as_of": "2026-12-01T00:00:00Z", "mode": "full",
            "inbox": "/srv/inbox", "policy": {"name": "demo", "path": "/srv/policy.yaml",
                                              "sha256": "ab" * 32, "files": ["/srv/p.yaml"]},
            "manifest": {"path": None, "sha256": None, "records": 0}}


def _prov(path: str) -> dict:
    return {"document": {"id": "0123456789abcdef0123", "path": path, "kind": "file",
                         "sha256": "cd" * 32, "size": 12, "link_target": None},
            "extraction": {"type": "text", "text_chars": 11, "encoding": "utf-8"},
            "manifest": {"line": 3, "source_url": "https://docs.example.org/a?b=1&c=ü"},
            "policy": RUN_INFO["policy"], "checks": {"quality": "fail", "source": "pass"},
            "decision": "quarantined",
            "reasons": [{"check": "quality", "code": "quality.word-count",
                         "message": "the text has 2 words", "details": {"words": 2,
                                                                          "ratio": 0.5}}],
            "warnings": [], "measures": {"quality": {"words": 2, "share": 1e-9}},
            "gate": {"version": "0.1.0"}, "date": {"value": "2026-11-01", "source": "x"}}


@pytest.mark.parametrize("path", ["notes/a.txt", "Büro/ä\u2028b.txt", "caf\udce9.txt"])
@pytest.mark.parametrize("text_key", [None, "k" * 16 + ":0123"])
@pytest.mark.parametrize("folder", ["accepted", "quarantine"])
def test_same_fingerprint_and_payload_as_the_definitions(path, text_key, folder):
    prov = _prov(path)
    print_, payload = _placement(folder, path, "cd" * 32, text_key, prov,
                                 json.dumps(RUN_INFO))
    assert print_ == placement_fingerprint(folder, prov, text_key)
    expected = {"path": path, "sha256": "cd" * 32, "text_key": text_key,
                "record": {**prov, "run": RUN_INFO}}
    assert json.loads(payload) == expected
    # the head is read alone while placing (gate.placement.payload_head)
    assert payload_head(payload) == (path, text_key)
    assert payload.startswith(json.dumps(expected)[:40])


def test_a_problem_document_places_no_digest():
    prov = _prov("broken.bin")
    _print, payload = _placement("quarantine", "broken.bin", None, None, prov, "{}")
    assert json.loads(payload)["sha256"] is None
    assert payload_head(payload) == ("broken.bin", None)
