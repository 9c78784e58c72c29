"""Intake where the work runs: a worker reads, hashes and stages an inbox file
(:class:`gate.intake.FileTask`), the coordinator only files the answer. Fixture texts are
invented."""

from __future__ import annotations

import hashlib
import json
import os
from datetime import UTC, datetime
from pathlib import Path

from gate.intake import FileTask, StagedTask, work_on
from gate.pipeline import RunOptions, run
from gate.work import Params

from .helpers import policy

AS_OF = datetime(2026, 12, 1, tzinfo=UTC)
# FIPS 180-4 / NIST example: SHA-256("abc")
ABC_SHA256 = "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad"


def _params() -> Params:
    limits = policy().limits
    return Params(max_pages=limits.max_pages, max_nesting=limits.max_nesting,
                  timeout_s=limits.timeout_s, memory_mb=limits.memory_mb)


def _task(tmp_path: Path, name: str, **kw) -> FileTask:
    return FileTask(path=name, full=str(tmp_path / name), max_bytes=kw.pop("max_bytes", 1000),
                    params=_params(), stage_root=str(tmp_path / "blobs"), **kw)


def _staged(tmp_path: Path) -> list[Path]:
    return sorted(p for p in (tmp_path / "blobs").rglob("*") if p.is_file())


def test_a_worker_reads_hashes_stages_and_extracts(tmp_path):
    (tmp_path / "a.txt").write_bytes(b"abc")
    answer = work_on(_task(tmp_path, "a.txt"))
    assert answer["intake"] == {"sha256": ABC_SHA256, "size": 3, "problem": None,
                                "detail": ""}
    staged = _staged(tmp_path)
    assert [p.name for p in staged] == [ABC_SHA256] and staged[0].read_bytes() == b"abc"
    assert staged[0].parent.name == ABC_SHA256[:2]
    extracted, measures_json, text_z = answer["result"]["cache"]
    assert json.loads(extracted)["type"] == "text"
    assert json.loads(measures_json)["measured"] is True


def test_a_link_swapped_in_is_not_followed_and_nothing_is_staged(tmp_path):
    (tmp_path / "secret.txt").write_bytes(b"outside the inbox")
    os.symlink(tmp_path / "secret.txt", tmp_path / "a.txt")
    answer = work_on(_task(tmp_path, "a.txt"))
    assert answer == {"intake": {"sha256": None, "size": None, "problem": "not-regular",
                                 "detail": "it became a symbolic link"}}
    assert _staged(tmp_path) == []


def test_a_file_over_the_limit_is_hashed_whole_but_neither_staged_nor_parsed(tmp_path):
    data = b"x" * 5000
    (tmp_path / "big.txt").write_bytes(data)
    answer = work_on(_task(tmp_path, "big.txt", max_bytes=1000))
    assert answer["intake"]["problem"] == "too-large"
    assert answer["intake"]["sha256"] == hashlib.sha256(data).hexdigest()
    assert answer["intake"]["size"] == 5000
    assert "result" not in answer and _staged(tmp_path) == []


def test_known_bytes_are_not_extracted_again_and_placed_bytes_not_staged_again(tmp_path):
    (tmp_path / "a.txt").write_bytes(b"abc")
    answer = work_on(_task(tmp_path, "a.txt", skip=ABC_SHA256, placed=ABC_SHA256))
    assert "result" not in answer and answer["intake"]["sha256"] == ABC_SHA256
    assert _staged(tmp_path) == []
    # the file changed since: the digest no longer matches, so it is staged and extracted
    (tmp_path / "a.txt").write_bytes(b"abd")
    answer = work_on(_task(tmp_path, "a.txt", skip=ABC_SHA256, placed=ABC_SHA256))
    assert "result" in answer and len(_staged(tmp_path)) == 1


def test_a_probe_only_stages(tmp_path):
    (tmp_path / "a.txt").write_bytes(b"abc")
    answer = work_on(_task(tmp_path, "a.txt", probe=True))
    assert "result" not in answer and [p.name for p in _staged(tmp_path)] == [ABC_SHA256]


def test_a_staged_copy_is_used_only_if_it_still_has_its_digest(tmp_path):
    blob = tmp_path / "blob"
    blob.write_bytes(b"abc")
    params = _params()
    assert "result" in work_on(StagedTask("a.txt", str(blob), ABC_SHA256, params))
    blob.write_bytes(b"abd")  # altered after staging
    assert work_on(StagedTask("a.txt", str(blob), ABC_SHA256, params)) == {"missing": True}
    blob.unlink()
    assert work_on(StagedTask("a.txt", str(blob), ABC_SHA256, params)) == {"missing": True}


def test_text_pages_measured_at_once_still_lose_their_sites_template(tmp_path):
    """Text pages of a site are measured before the template is known (speculatively);
    when their site does have one, they are measured again without it."""
    inbox = tmp_path / "inbox"
    inbox.mkdir()
    footer = "Quillby Freight notices are published by the invented depot office weekly."
    lines = []
    for number in range(4):
        body = (f"Notice {number}: the {['north', 'south', 'river', 'canal'][number]} "
                f"siding closes on day {number + 3} for crane works and pallet loading.")
        (inbox / f"n{number}.txt").write_text(f"{body}\n\n{footer}\n")
        lines.append(json.dumps({"path": f"n{number}.txt",
                                 "source_url": f"https://depot.example.org/n{number}"}))
    (inbox / "manifest.jsonl").write_text("\n".join(lines) + "\n")
    pol = tmp_path / "policy.yaml"
    pol.write_text("version: 1\nname: t\nquality: {}\n")
    from gate.policy import load_policy
    out = tmp_path / "out"
    run(RunOptions(inbox=inbox, policy=load_policy(pol), out=out, as_of=AS_OF, workers=2))
    report = json.loads((out / "report.json").read_text())
    assert len(report["documents"]) == 4
    for doc in report["documents"]:
        text = (out / doc["location"] / "text.txt").read_text()
        assert "Notice" in text and footer not in text
