"""PROV-JSON beside provenance.json: structure per the W3C submission, read back by `prov`.

Fixture documents are invented (example.org hosts).
"""

import json
from datetime import UTC, datetime

import pytest

from gate.pipeline import RunOptions, run
from gate.policy import load_policy
from gate.provjson import FILE_NAME, from_record

# Top-level members of a PROV-JSON document (W3C PROV-JSON Member Submission, 2013-04-24,
# section 2): the prefix map, the three node kinds and the relation names.
TOP_LEVEL = {"prefix", "entity", "activity", "agent", "wasGeneratedBy", "used",
             "wasInformedBy", "wasStartedBy", "wasEndedBy", "wasInvalidatedBy",
             "wasDerivedFrom", "wasAttributedTo", "wasAssociatedWith", "actedOnBehalfOf",
             "wasInfluencedBy", "specializationOf", "alternateOf", "hadMember", "bundle"}
# The roles each relation names (same submission, section 3.2; PROV-DM's attribute names).
ROLES = {"wasGeneratedBy": ("prov:entity", "prov:activity"),
         "used": ("prov:activity", "prov:entity"),
         "wasDerivedFrom": ("prov:generatedEntity", "prov:usedEntity"),
         "wasAttributedTo": ("prov:entity", "prov:agent"),
         "wasAssociatedWith": ("prov:activity", "prov:agent")}
# SHA-256 of "Hello World!", the example of RFC 6920 section 3, whose ni name is
# ni:///sha-256;f4OxZX_x_FO5LcGBSKHWXfwtSx-j1ncoSt3SABJtkGk (from memory, recomputed)
SHA = "7f83b1657ff1fc53b92dc18148a1d65dfc2d4b1fa3d677284addd200126d9069"


def record(**manifest):
    return {"document": {"id": "d1", "path": "a.txt", "sha256": SHA, "size": 11},
            "extraction": {"type": "text", "title": "Depot notes", "text_chars": 11},
            "manifest": {"line": 1, **manifest}, "policy": {"name": "p", "sha256": "ab" * 32},
            "decision": "accepted", "gate": {"version": "0.1.0"},
            "run": {"id": "run-0001", "as_of": "2026-12-01T00:00:00Z", "mode": "full",
                    "manifest": {"sha256": "cd" * 32}}}


def check_structure(doc):
    assert set(doc) <= TOP_LEVEL and {"prefix", "entity", "activity", "agent"} <= set(doc)
    nodes = set(doc["entity"]) | set(doc["activity"]) | set(doc["agent"])
    for relation, (first, second) in ROLES.items():
        for attrs in doc.get(relation, {}).values():
            assert attrs[first] in nodes and attrs[second] in nodes, (relation, attrs)
    used_prefixes = {ident.split(":", 1)[0] for ident in nodes}
    assert used_prefixes <= set(doc["prefix"]) | {"prov"}


def test_record_with_source_retrieval_and_signer():
    doc = from_record(record(source_url="https://docs.example.org/a.txt",
                             retrieved_at="2026-11-30T10:00:00Z",
                             signature={"valid": True, "fingerprint": "SHA256:ab+c/d",
                                        "lines": [1, 4]}))
    check_structure(doc)
    assert "ni:f4OxZX_x_FO5LcGBSKHWXfwtSx-j1ncoSt3SABJtkGk" in doc["entity"]
    assert doc["prefix"]["ni"] == "ni:///sha-256;"
    generated = [r for r in doc["wasGeneratedBy"].values()
                 if r["prov:entity"].startswith("ni:")]
    assert generated[0]["prov:time"] == {"$": "2026-11-30T10:00:00Z", "type": "xsd:dateTime"}
    assert any(r.get("prov:type") == "prov:PrimarySource"
               for r in doc["wasDerivedFrom"].values())
    assert "gate:host/docs.example.org" in doc["agent"]
    assert any(a.startswith("gate:key/") for a in doc["agent"])


def test_the_prov_library_reads_it_back():
    prov_model = pytest.importorskip("prov.model")
    doc = from_record(record(source_url="https://docs.example.org/a.txt",
                             retrieved_at="2026-11-30T10:00:00Z"))
    parsed = prov_model.ProvDocument.deserialize(content=json.dumps(doc), format="json")
    records = parsed.get_records()
    kinds = {type(r).__name__ for r in records}
    assert {"ProvEntity", "ProvActivity", "ProvAgent", "ProvGeneration", "ProvUsage",
            "ProvDerivation", "ProvAttribution", "ProvAssociation"} <= kinds
    # the round trip keeps every statement
    again = json.loads(parsed.serialize(format="json"))
    assert sum(len(v) for k, v in again.items() if k != "prefix") == \
        sum(len(v) for k, v in doc.items() if k != "prefix")


def test_accepted_documents_get_a_prov_json_file(tmp_path):
    inbox = tmp_path / "inbox"
    inbox.mkdir()
    (inbox / "a.txt").write_text("The invented depot opens at six on weekdays.\n")
    (inbox / "manifest.jsonl").write_text(json.dumps(
        {"path": "a.txt", "source_url": "https://docs.example.org/a.txt",
         "retrieved_at": "2026-11-30T10:00:00Z"}) + "\n")
    path = tmp_path / "policy.yaml"
    path.write_text("version: 1\nname: prov\n")
    run(RunOptions(inbox=inbox, policy=load_policy(path), out=tmp_path / "out",
                   as_of=datetime(2026, 12, 1, tzinfo=UTC), workers=1))
    report = json.loads((tmp_path / "out" / "report.json").read_text())
    entry = tmp_path / "out" / report["documents"][0]["location"]
    doc = json.loads((entry / FILE_NAME).read_text())
    check_structure(doc)
    provenance = json.loads((entry / "provenance.json").read_text())
    assert doc["activity"]["gate:" + provenance["run"]["id"]]["gate:as_of"]["$"] == \
        "2026-12-01T00:00:00Z"
    assert any(e.get("prov:location") == "https://docs.example.org/a.txt"
               for e in doc["entity"].values())
