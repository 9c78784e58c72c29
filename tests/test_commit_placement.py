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


# -- entries assembled while deciding (Placer.build_ahead) --------------------------------
# Invented notes (an invented cooperative); the expected files are what the run that
# assembles every entry at placing time writes (gate.placement.build_entry).

NOTE = ("The dispatch office of the invented Quillby Freight cooperative posts the loading "
        "timetable on the first Monday of every month, so drivers can plan their slots. ")
AS_OF = "2026-12-01T00:00:00Z"


def _notes(inbox, count):
    inbox.mkdir(exist_ok=True)
    for number in range(count):
        (inbox / f"note-{number}.txt").write_text(f"Note {number}. {NOTE}", encoding="utf-8")


def _go(inbox, out, policy_path, **kw):
    from gate import dates
    from gate.pipeline import RunOptions, run
    from gate.policy import load_policy
    return run(RunOptions(inbox=inbox, policy=load_policy(policy_path), out=out,
                          as_of=dates.parse_as_of(AS_OF), workers=1, **kw))


def _entries(out):
    return {str(p.relative_to(out)): p.read_bytes() for p in sorted(out.rglob("*"))
            if p.is_file() and p.parts[len(out.parts)] in ("accepted", "quarantine")}


def test_entries_assembled_while_deciding_are_the_ones_placed(tmp_path, monkeypatch):
    from gate import commit, placement
    policy_path = tmp_path / "policy.yaml"
    policy_path.write_text("version: 1\nname: ahead-test\n", encoding="utf-8")
    _notes(tmp_path / "inbox", 70)  # more than two groups of BUILD_GROUP
    built_here = []
    build = placement.Placer.build
    monkeypatch.setattr(placement.Placer, "build", lambda self, *a: built_here.append(a[0])
                        or build(self, *a))
    ready = []
    apply = placement.Placer.apply_batch
    monkeypatch.setattr(placement.Placer, "apply_batch", lambda self, batch, pool, built:
                        ready.append(len(built or {})) or apply(self, batch, pool, built))
    _go(tmp_path / "inbox", tmp_path / "ahead", policy_path)
    assert built_here == [] and ready == [70]  # all assembled by the workers while deciding
    assert list((tmp_path / "ahead" / "state" / "tmp").iterdir()) == []

    # the same run with nothing assembled ahead: the entries are the same bytes
    monkeypatch.setattr(placement.Placer, "build_ahead", lambda self, groups, pool, built:
                        [None for _group in groups])
    monkeypatch.setattr(commit, "BUILD_GROUP", 7)
    _go(tmp_path / "inbox", tmp_path / "late", policy_path)
    ahead, late = _entries(tmp_path / "ahead"), _entries(tmp_path / "late")
    # each accepted: its original, text.txt and two record files
    assert len(ahead) == 70 * 4 and ahead == late


def test_a_braked_run_leaves_no_entry_assembled_ahead(tmp_path):
    from gate.brake import RemovalBrake
    policy_path = tmp_path / "policy.yaml"
    policy_path.write_text("version: 1\nname: ahead-test\n", encoding="utf-8")
    inbox, out = tmp_path / "inbox", tmp_path / "out"
    _notes(inbox, 6)
    _go(inbox, out, policy_path)
    before = _entries(out)
    for number in range(4):
        (inbox / f"note-{number}.txt").unlink()  # 4 of 6 removed: more than half
    with pytest.raises(RemovalBrake):
        _go(inbox, out, policy_path)
    assert list((out / "state" / "tmp").iterdir()) == []  # the two left were assembled
    assert _entries(out) == before


def test_a_killed_runs_entries_assembled_ahead_are_removed_by_the_next(tmp_path):
    policy_path = tmp_path / "policy.yaml"
    policy_path.write_text("version: 1\nname: ahead-test\n", encoding="utf-8")
    inbox, out = tmp_path / "inbox", tmp_path / "out"
    _notes(inbox, 3)
    _go(inbox, out, policy_path)
    # what a run killed while deciding leaves: an entry assembled for a document that
    # the next run (its inbox changed meanwhile) does not place
    stale = out / "state" / "tmp" / "0123456789abcdef0123"
    stale.mkdir()
    (stale / "reasons.json").write_text("{}\n", encoding="utf-8")
    (inbox / "note-2.txt").write_text("Note 2, edited. " + NOTE, encoding="utf-8")
    _go(inbox, out, policy_path)
    assert list((out / "state" / "tmp").iterdir()) == []
