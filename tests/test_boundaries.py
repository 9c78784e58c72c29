"""Trust boundaries: nothing in the inbox, manifest, policy or arguments can stop, crash,
fool or wipe a run. Every hostile input is generated here; file contents are invented
(an invented freight cooperative, example.org / example.net / .test hosts)."""

import json
import os
import subprocess
import sys
from datetime import UTC, datetime
from pathlib import Path

import pytest

from gate import review
from gate.pipeline import RunOptions, run
from gate.policy import load_policy

AS_OF = datetime(2026, 12, 1, tzinfo=UTC)
PROSE = ("The dispatch office of the invented Quillby Freight cooperative posts the loading "
         "timetable on the first Monday of every month, so drivers can plan their slots. ")


def gate(*args, cwd=None, env=None):
    return subprocess.run([sys.executable, "-m", "gate", *map(str, args)],
                          capture_output=True, text=True, cwd=cwd,
                          env={**os.environ, **(env or {})})


def write_policy(path: Path, text: str = "") -> Path:
    path.write_text("version: 1\nname: boundary-test\n" + text, encoding="utf-8")
    return path


def run_inbox(tmp_path: Path, inbox: Path, policy_text: str = "", **kw):
    loaded = load_policy(write_policy(tmp_path / "policy.yaml", policy_text))
    return run(RunOptions(inbox=inbox, policy=loaded, out=tmp_path / "out", as_of=AS_OF,
                          workers=1, **kw))


def deep_folder(top: Path, depth: int) -> bytes:
    """Create ``depth`` nested folders below ``top`` without recursion or long paths
    (one directory fd at a time); return the relative path of the innermost folder."""
    fd = os.open(top, os.O_RDONLY | os.O_DIRECTORY)
    try:
        for _ in range(depth):
            os.mkdir("d", dir_fd=fd)
            inner = os.open("d", os.O_RDONLY | os.O_DIRECTORY, dir_fd=fd)
            os.close(fd)
            fd = inner
        note = os.open("note.txt", os.O_WRONLY | os.O_CREAT, 0o644, dir_fd=fd)
        os.write(note, PROSE.encode())
        os.close(note)
    finally:
        os.close(fd)
    return b"/".join([b"d"] * depth)


# -- 1. file names that are not UTF-8 --------------------------------------------------


def test_a_name_that_is_not_utf8_is_reported_escaped_placed_and_reviewable(tmp_path):
    inbox = tmp_path / "inbox"
    inbox.mkdir()
    raw = os.fsencode(inbox) + b"/caf\xe9-latin1.txt"  # Latin-1 e-acute: legal on Linux
    with open(raw, "wb") as fh:
        fh.write(PROSE.encode())
    with open(os.fsencode(inbox) + b"/back\\slash-\xff.txt", "wb") as fh:
        fh.write(PROSE.encode())
    (inbox / "plain.txt").write_text(PROSE)
    policy_text = "sources:\n  allow:\n    - path: plain.txt\n  require_provenance: true\n"
    result = run_inbox(tmp_path, inbox, policy_text)
    out = tmp_path / "out"
    data = (out / "report.json").read_bytes()
    report = json.loads(data.decode("utf-8"))  # strict UTF-8: no lone surrogates
    docs = {d["path"]: d for d in report["documents"]}
    assert set(docs) == {"caf\\xe9-latin1.txt", "back\\x5cslash-\\xff.txt", "plain.txt"}
    assert docs["plain.txt"]["decision"] == "accepted"
    held = docs["caf\\xe9-latin1.txt"]
    assert held["decision"] == "quarantined"
    assert [r["code"] for r in held["reasons"]] == ["source.missing"]
    assert (out / held["location"] / "original").read_bytes() == PROSE.encode()
    assert result.summary["documents"] == 3
    # review commands take the escaped path as printed
    shown = review.show(out, "caf\\xe9-latin1.txt")
    assert shown["path"] == "caf\\xe9-latin1.txt"
    review.act(out, "release", ["caf\\xe9-latin1.txt"], note="checked by the depot office",
               by="reviewer-a")
    assert (out / "accepted" / held["id"] / "original").exists()
    listed = gate("review", "list", out, "--json")
    assert listed.returncode == 0, listed.stderr
    # the next run over the same inbox completes too (the name never blocks a re-index)
    again = run_inbox(tmp_path, inbox, policy_text)
    assert again.summary["documents"] == 3


# -- 2. folders deeper than Python's recursion limit -------------------------------------


def test_a_folder_1100_levels_deep_is_walked(tmp_path):
    inbox = tmp_path / "inbox"
    inbox.mkdir()
    rel = deep_folder(inbox, 1100)
    (inbox / "top.txt").write_text(PROSE)
    result = run_inbox(tmp_path, inbox)
    report = json.loads((tmp_path / "out" / "report.json").read_text(encoding="utf-8"))
    paths = {d["path"]: d["decision"] for d in report["documents"]}
    assert paths == {"top.txt": "accepted", rel.decode() + "/note.txt": "accepted"}
    assert result.summary["accepted"] == 2
