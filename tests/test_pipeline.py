"""End-to-end runs of the pipeline on generated inboxes (invented fixture content)."""

import fcntl
import json
import os
import random
import signal
import subprocess
import sys
import time
from datetime import UTC, datetime
from pathlib import Path

import pytest

from gate.errors import InboxError, LockError, ManifestError, OutputError, StateError
from gate.pipeline import RunOptions, run
from gate.policy import LoadedPolicy, load_policy

from .helpers import make_pdf

AS_OF = datetime(2026, 12, 1, tzinfo=UTC)
POLICY = """version: 1
name: pipeline-test
sources:
  allow:
    - domain: docs.example.org
      subdomains: true
      trust: 2
    - path: local/
  deny:
    - domain: paste.example.net
freshness:
  max_age_days: 365
  undated: warn
language:
  allowed: [en]
  min_chars: 100
  undetermined: warn
duplicates:
  threshold: 0.8
"""

PARAGRAPH = ("The northern depot of the invented Quillby Freight cooperative schedules "
             "deliveries in three windows each weekday, and drivers confirm every window "
             "by radio before they leave the yard. ")
_VOCAB = ("depot route window driver pallet invoice customer harbour siding crane gate "
          "ledger barge schedule weekday morning evening north south river bridge yard "
          "permit tariff season cargo shift relay station canal").split()


def prose(seed: int, words: int = 120) -> str:
    """Invented English-like text that differs from seed to seed."""
    rng = random.Random(seed)
    out = []
    for i in range(words):
        out.append(rng.choice(_VOCAB))
        if i % 12 == 11:
            out[-1] += ". The"
    return "The " + " ".join(out) + "."


def make_inbox(root: Path, n: int = 12) -> Path:
    inbox = root / "inbox"
    (inbox / "local").mkdir(parents=True)
    lines = []
    for i in range(n):
        body = PARAGRAPH + prose(i) + f" Route {i} serves {i * 7 + 3} customers."
        name = f"page-{i:02d}.html"
        (inbox / name).write_text(f"<html><head><title>Route {i}</title></head><body>"
                                  f"<article><p>{body}</p><p>{prose(i + 500)}</p></article>"
                                  "</body></html>")
        lines.append({"path": name, "source_url": f"https://docs.example.org/routes/{i}",
                      "published_at": "2026-10-01"})
    (inbox / "copy.html").write_bytes((inbox / "page-00.html").read_bytes())
    lines.append({"path": "copy.html", "source_url": "https://docs.example.org/copy",
                  "published_at": "2026-10-01"})
    (inbox / "report.pdf").write_bytes(make_pdf([prose(901)]))
    lines.append({"path": "report.pdf", "source_url": "https://docs.example.org/r.pdf",
                  "published_at": "2026-09-01"})
    (inbox / "local" / "notes.txt").write_text(prose(902))
    (inbox / "stale.txt").write_text(prose(903) + " Timetable of an older year.")
    lines.append({"path": "stale.txt", "source_url": "https://docs.example.org/old",
                  "published_at": "2020-01-01"})
    (inbox / "pasted.txt").write_text(prose(904) + " Copied from a paste site.")
    lines.append({"path": "pasted.txt", "source_url": "https://paste.example.net/x"})
    (inbox / "empty.html").write_bytes(b"")
    (inbox / "binary.html").write_bytes(bytes(range(256)) * 4)
    os.symlink("/etc/hostname", inbox / "link.txt")
    (inbox / "manifest.jsonl").write_text("".join(json.dumps(x) + "\n" for x in lines))
    return inbox


def loaded(tmp_path: Path, text: str = POLICY) -> LoadedPolicy:
    path = tmp_path / "policy.yaml"
    path.write_text(text)
    return load_policy(path)


def go(tmp_path, inbox, out, **kw):
    opts = RunOptions(inbox=inbox, policy=loaded(tmp_path), out=out, as_of=AS_OF,
                      workers=kw.pop("workers", 1), **kw)
    return run(opts)


def report(out: Path) -> dict:
    return json.loads((out / "report.json").read_text())


def decisions(out: Path) -> dict:
    return {d["path"]: (d["decision"], sorted(r["code"] for r in d["reasons"]))
            for d in report(out)["documents"]}


def assert_placed_once(inbox: Path, out: Path) -> None:
    rep = report(out)
    paths = [d["path"] for d in rep["documents"]]
    assert len(paths) == len(set(paths))
    accepted = set(os.listdir(out / "accepted"))
    quarantined = set(os.listdir(out / "quarantine"))
    assert not accepted & quarantined
    for doc in rep["documents"]:
        folder, _, doc_id = doc["location"].partition("/")
        assert doc_id in (accepted if folder == "accepted" else quarantined)
        assert folder == ("accepted" if doc["decision"] == "accepted" else "quarantine")
    assert accepted == {d["id"] for d in rep["documents"] if d["decision"] == "accepted"}


def test_every_document_ends_in_exactly_one_place(tmp_path):
    inbox = make_inbox(tmp_path)
    before = sorted((p, p.stat().st_mtime_ns) for p in inbox.rglob("*") if p.is_file())
    go(tmp_path, inbox, tmp_path / "out")
    got = decisions(tmp_path / "out")
    assert len(got) == 12 + 8
    # copy.html comes first in inbox order, so it is the keeper of the exact pair
    assert got["copy.html"] == ("accepted", [])
    assert got["page-00.html"] == ("quarantined", ["duplicate.exact"])
    assert got["stale.txt"] == ("quarantined", ["freshness.stale"])
    assert got["pasted.txt"] == ("quarantined", ["source.denied"])
    # no manifest entry and not under local/: the source check holds them too
    assert got["empty.html"][1] == ["format.empty-file", "source.missing"]
    assert got["binary.html"][1] == ["format.unsupported", "source.missing"]
    assert got["link.txt"] == ("quarantined", ["format.not-regular", "source.missing"])
    assert got["local/notes.txt"] == ("accepted", [])
    assert got["report.pdf"] == ("accepted", [])
    assert_placed_once(inbox, tmp_path / "out")
    after = sorted((p, p.stat().st_mtime_ns) for p in inbox.rglob("*") if p.is_file())
    assert before == after  # the inbox is never modified
    first = next(d for d in report(tmp_path / "out")["documents"] if d["decision"] == "accepted")
    entry = tmp_path / "out" / "accepted" / first["id"]
    assert sorted(os.listdir(entry)) == ["original", "provenance.json", "provenance.prov.json",
                                         "text.txt"]
    prov = json.loads((entry / "provenance.json").read_text())
    assert prov["policy"]["name"] == "pipeline-test" and prov["run"]["as_of"] == \
        "2026-12-01T00:00:00Z"
    assert prov["checks"]["source"] == "pass" and prov["gate"]["version"]
    link = tmp_path / "out" / "quarantine" / next(
        d["id"] for d in report(tmp_path / "out")["documents"] if d["path"] == "link.txt")
    assert os.listdir(link) == ["reasons.json"]  # a link is never followed or copied


def test_same_inputs_give_byte_identical_reports_for_any_worker_count(tmp_path):
    inbox = make_inbox(tmp_path)
    go(tmp_path, inbox, tmp_path / "one", workers=1)
    go(tmp_path, inbox, tmp_path / "two", workers=2)
    assert (tmp_path / "one" / "report.json").read_bytes() == \
        (tmp_path / "two" / "report.json").read_bytes()


def test_second_run_is_unchanged_and_served_from_the_cache(tmp_path):
    inbox = make_inbox(tmp_path)
    out = tmp_path / "out"
    go(tmp_path, inbox, out)
    first = report(out)
    changes = [json.loads(x) for x in (out / "changes.jsonl").read_text().splitlines()]
    assert {c["action"] for c in changes} == {"add"}
    assert len(changes) == first["summary"]["accepted"]
    result = go(tmp_path, inbox, out)
    second = report(out)
    assert result.run_id == "run-0002"
    assert (out / "changes.jsonl").read_text() == ""
    for a, b in zip(first["documents"], second["documents"]):
        assert (a["path"], a["decision"], a["reasons"]) == (b["path"], b["decision"],
                                                            b["reasons"])
        assert b["change"] in ("unchanged", "none")


def test_full_run_removes_missing_documents_incremental_does_not(tmp_path):
    inbox = make_inbox(tmp_path)
    out = tmp_path / "out"
    go(tmp_path, inbox, out)
    gone = next(d for d in report(out)["documents"] if d["path"] == "page-05.html")
    assert gone["decision"] == "accepted"
    (inbox / gone["path"]).unlink()
    go(tmp_path, inbox, out, incremental=True)
    assert (out / "accepted" / gone["id"]).exists()
    assert (out / "changes.jsonl").read_text() == ""
    go(tmp_path, inbox, out)
    assert not (out / "accepted" / gone["id"]).exists()
    changes = [json.loads(x) for x in (out / "changes.jsonl").read_text().splitlines()]
    assert changes == [{"action": "remove", "run": "run-0003", "id": gone["id"],
                        "path": gone["path"], "sha256": gone["sha256"],
                        "why": "no longer in the inbox"}]
    assert report(out)["removed"][0]["path"] == gone["path"]


def test_update_and_quarantine_of_an_accepted_document(tmp_path):
    inbox = make_inbox(tmp_path)
    out = tmp_path / "out"
    go(tmp_path, inbox, out)
    notes = inbox / "local" / "notes.txt"
    notes.write_text(prose(902) + " Updated opening hours for the winter.")
    go(tmp_path, inbox, out)
    changes = [json.loads(x) for x in (out / "changes.jsonl").read_text().splitlines()]
    assert [(c["action"], c["path"]) for c in changes] == [("update", "local/notes.txt")]
    notes.write_bytes(b"\x00\x01binary now")
    go(tmp_path, inbox, out)
    changes = [json.loads(x) for x in (out / "changes.jsonl").read_text().splitlines()]
    assert [(c["action"], c["path"]) for c in changes] == [("remove", "local/notes.txt")]
    assert_placed_once(inbox, out)


def test_bad_inputs_stop_the_run_with_a_clear_error(tmp_path):
    inbox = make_inbox(tmp_path)
    with pytest.raises(InboxError, match="does not exist"):
        go(tmp_path, tmp_path / "missing", tmp_path / "out")
    with pytest.raises(OutputError, match="inside the inbox"):
        go(tmp_path, inbox, inbox / "out")
    (inbox / "manifest.jsonl").write_text('{"path": "a"}\n{broken\n')
    with pytest.raises(ManifestError, match="line 2"):
        go(tmp_path, inbox, tmp_path / "out")


def test_foreign_state_file_is_refused_not_overwritten(tmp_path):
    inbox = make_inbox(tmp_path)
    state = tmp_path / "out" / "state"
    state.mkdir(parents=True)
    (state / "gate.sqlite").write_bytes(b"this is not a database, it is someone's notes")
    with pytest.raises(StateError, match="not a gate state database"):
        go(tmp_path, inbox, tmp_path / "out")
    assert (state / "gate.sqlite").read_bytes().startswith(b"this is not")


def test_a_state_file_left_empty_by_a_killed_start_is_initialised(tmp_path):
    """Killed between creating gate.sqlite (WAL mode set) and writing its schema."""
    import sqlite3
    inbox = make_inbox(tmp_path)
    state = tmp_path / "out" / "state"
    state.mkdir(parents=True)
    conn = sqlite3.connect(state / "gate.sqlite")
    conn.execute("PRAGMA journal_mode=WAL")
    conn.close()
    assert (state / "gate.sqlite").stat().st_size > 0
    go(tmp_path, inbox, tmp_path / "out")
    assert report(tmp_path / "out")["summary"]["documents"] == 20
    foreign = tmp_path / "other" / "state"
    foreign.mkdir(parents=True)
    conn = sqlite3.connect(foreign / "gate.sqlite")
    conn.execute("CREATE TABLE notes (line TEXT)")  # someone's database: still refused
    conn.commit()
    conn.close()
    with pytest.raises(StateError, match="not a gate state database"):
        go(tmp_path, inbox, tmp_path / "other")


def test_second_concurrent_run_is_refused(tmp_path):
    inbox = make_inbox(tmp_path)
    lock = tmp_path / "out" / "state" / "lock"
    lock.parent.mkdir(parents=True)
    fd = os.open(lock, os.O_RDWR | os.O_CREAT)
    os.write(fd, b'{"pid": 4242, "host": "h", "started": "t"}')
    fcntl.flock(fd, fcntl.LOCK_EX)
    try:
        with pytest.raises(LockError, match="pid 4242"):
            go(tmp_path, inbox, tmp_path / "out")
    finally:
        os.close(fd)
    go(tmp_path, inbox, tmp_path / "out")  # the lock died with its holder: taken over


def _cli(inbox, out, policy_path):
    return [sys.executable, "-m", "gate", "run", str(inbox), "--policy", str(policy_path),
            "--out", str(out), "--as-of", "2026-12-01T00:00:00Z", "--workers", "2", "-q"]


def test_killed_runs_resume_to_the_same_result(tmp_path):
    """Kill a run with SIGKILL at random moments, re-run, and compare with a clean run."""
    inbox = make_inbox(tmp_path, n=30)
    policy_path = tmp_path / "policy.yaml"
    policy_path.write_text(POLICY)
    clean = tmp_path / "clean"
    started = time.monotonic()
    subprocess.run(_cli(inbox, clean, policy_path), check=True, capture_output=True)
    full = time.monotonic() - started
    expected = decisions(clean)
    rng = random.Random(2026)
    for attempt in range(4):
        out = tmp_path / f"killed-{attempt}"
        proc = subprocess.Popen(_cli(inbox, out, policy_path), stdout=subprocess.DEVNULL,
                                stderr=subprocess.DEVNULL, start_new_session=True)
        time.sleep(rng.uniform(0.3, full))
        os.killpg(proc.pid, signal.SIGKILL)  # the run and its workers
        proc.wait()
        finish = subprocess.run(_cli(inbox, out, policy_path), capture_output=True,
                                text=True)
        assert finish.returncode == 0, finish.stderr
        assert decisions(out) == expected
        assert_placed_once(inbox, out)
        assert not list((out / "state" / "tmp").iterdir())


def _can_mount() -> bool:
    return os.geteuid() == 0 and subprocess.run(["which", "mount"], capture_output=True
                                                ).returncode == 0


@pytest.mark.skipif(not _can_mount(), reason="needs root to mount a small tmpfs")
def test_disk_full_stops_cleanly_and_resumes(tmp_path):
    inbox = make_inbox(tmp_path, n=40)
    for i in range(40):  # make the inbox larger than the small disk
        (inbox / f"bulk-{i:02d}.txt").write_text(prose(2000 + i, words=6000))
    out = tmp_path / "small"
    out.mkdir()
    mounted = subprocess.run(["mount", "-t", "tmpfs", "-o", "size=1200k", "tmpfs", str(out)],
                             capture_output=True)
    if mounted.returncode != 0:
        pytest.skip("mounting a tmpfs is not permitted here")
    try:
        policy_path = tmp_path / "policy.yaml"
        policy_path.write_text(POLICY)
        first = subprocess.run(_cli(inbox, out, policy_path), capture_output=True, text=True)
        assert first.returncode == 2
        assert "is full" in first.stderr and "re-run the same command" in first.stderr
        assert "Traceback" not in first.stderr
        subprocess.run(["mount", "-o", "remount,size=64m", str(out)], check=True)
        second = subprocess.run(_cli(inbox, out, policy_path), capture_output=True, text=True)
        assert second.returncode == 0, second.stderr
        assert_placed_once(inbox, out)
        assert len(report(out)["documents"]) == len(list(walk_paths(inbox)))
    finally:
        subprocess.run(["umount", str(out)], capture_output=True)


def walk_paths(inbox):
    from gate.discovery import walk
    return [e.path for e in walk(inbox)]


def test_per_source_overrides_apply_to_the_documents_a_rule_admits(tmp_path):
    inbox = tmp_path / "inbox"
    inbox.mkdir()
    french = ("Le dépôt du nord de la coopérative inventée ouvre à sept heures et ferme à "
              "dix-neuf heures en semaine. Les chauffeurs confirment chaque créneau par radio "
              "avant de quitter la cour, et le répartiteur tient un registre des livraisons.")
    (inbox / "partner.txt").write_text(french)
    (inbox / "own.txt").write_text(french)
    (inbox / "manifest.jsonl").write_text(
        json.dumps({"path": "partner.txt", "source_url": "https://partner.example.net/a"}) +
        "\n" + json.dumps({"path": "own.txt", "source_url": "https://docs.example.org/a"}) +
        "\n")
    policy = tmp_path / "p.yaml"
    policy.write_text("""version: 1
name: overrides
sources:
  allow:
    - domain: docs.example.org
    - domain: partner.example.net
      overrides:
        language:
          allowed: [fr]
language:
  allowed: [en]
  min_chars: 50
""")
    out = tmp_path / "out"
    run(RunOptions(inbox=inbox, policy=load_policy(policy), out=out, as_of=AS_OF, workers=1))
    got = decisions(out)
    assert got["partner.txt"] == ("accepted", [])
    assert got["own.txt"] == ("quarantined", ["language.not-allowed"])
    prov = json.loads(next((out / "accepted").glob("*/provenance.json")).read_text())
    assert prov["policy"]["overrides_from"] == "sources.allow[1]"


def test_state_from_a_newer_gate_is_refused(tmp_path):
    import sqlite3
    inbox = make_inbox(tmp_path, n=2)
    go(tmp_path, inbox, tmp_path / "out")
    db = tmp_path / "out" / "state" / "gate.sqlite"
    with sqlite3.connect(db) as conn:
        conn.execute("UPDATE meta SET value = '99' WHERE key = 'schema_version'")
    with pytest.raises(StateError, match="written by a newer gate"):
        go(tmp_path, inbox, tmp_path / "out")


def test_damaged_state_is_refused_not_overwritten(tmp_path):
    inbox = make_inbox(tmp_path, n=2)
    go(tmp_path, inbox, tmp_path / "out")
    db = tmp_path / "out" / "state" / "gate.sqlite"
    for suffix in ("-wal", "-shm"):
        db.with_name(db.name + suffix).unlink(missing_ok=True)
    data = bytearray(db.read_bytes())
    data[100:8192] = b"\xAA" * (8192 - 100)  # clobber the schema pages
    db.write_bytes(bytes(data))
    with pytest.raises(StateError):
        go(tmp_path, inbox, tmp_path / "out")
    assert db.read_bytes()[100:110] == b"\xAA" * 10


def test_the_gate_never_opens_a_network_connection(tmp_path, monkeypatch):
    """Documents full of URLs, links, canonical addresses and images: nothing is fetched.
    The socket patch is inherited by the forked workers."""
    import socket
    attempts = []

    def refuse(self, address, *args, **kwargs):
        attempts.append(address)
        raise OSError("network access attempted during a gate run")

    monkeypatch.setattr(socket.socket, "connect", refuse)
    monkeypatch.setattr(socket.socket, "connect_ex", refuse)
    monkeypatch.setattr(socket, "create_connection", lambda *a, **k: refuse(None, a))
    inbox = tmp_path / "inbox"
    inbox.mkdir()
    (inbox / "links.html").write_text(
        "<html><head><link rel=canonical href='https://docs.example.org/x'>"
        "<meta property='og:url' content='https://docs.example.org/x'>"
        "<link rel=stylesheet href='https://cdn.example.net/s.css'></head><body>"
        "<img src='https://img.example.net/a.png'><p>See https://docs.example.org/y and "
        "<a href='http://example.com/z'>this page</a>. " + prose(5) + "</p>"
        "<iframe src='https://embed.example.net/'></iframe></body></html>")
    (inbox / "url.txt").write_text("https://docs.example.org/only-a-url\n")
    (inbox / "manifest.jsonl").write_text(json.dumps(
        {"path": "links.html", "source_url": "https://docs.example.org/links.html"}) + "\n")
    go(tmp_path, inbox, tmp_path / "out", workers=2)
    assert attempts == []
    assert len(report(tmp_path / "out")["documents"]) == 2


def test_a_file_once_over_max_bytes_is_placed_with_its_original_when_the_limit_rises(tmp_path):
    # Regression: a file over limits.max_bytes is quarantined without a copy of its bytes.
    # A later run under a policy with a higher limit reads the same bytes; it must stage
    # them rather than count on the entry's (absent) original, or the run cannot commit.
    inbox = tmp_path / "inbox"
    (inbox / "local").mkdir(parents=True)
    body = prose(77, words=400)  # invented fixture text, about 3 KB
    (inbox / "local" / "big.txt").write_text(body)
    out = tmp_path / "out"
    small = POLICY + "limits:\n  max_bytes: 1024\n"
    first = run(RunOptions(inbox=inbox, policy=loaded(tmp_path, small), out=out, as_of=AS_OF,
                           workers=1))
    assert first.summary["quarantined"] == 1
    entry = out / report(out)["documents"][0]["location"]
    assert "format.too-large" in [r["code"] for r in report(out)["documents"][0]["reasons"]]
    assert not (entry / "original").exists()
    second = run(RunOptions(inbox=inbox, policy=loaded(tmp_path), out=out, as_of=AS_OF,
                            workers=1))
    assert second.summary["documents"] == 1
    doc = report(out)["documents"][0]
    assert "format.too-large" not in [r["code"] for r in doc["reasons"]]
    assert (out / doc["location"] / "original").read_bytes() == body.encode()
    assert_placed_once(inbox, out)
