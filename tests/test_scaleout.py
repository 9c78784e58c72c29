"""Scale-out mode against real components on loopback: a Redis server (Debian's
redis-server) and a Dask scheduler with two workers, all started here. Decisions must be
identical to the local mode.

Skipped when redis-server or the dask command is missing, unless GATE_REQUIRE_SCALEOUT=1
(CI sets it after installing them), in which case their absence is a failure.
"""

import json
import os
import shutil
import signal
import socket
import subprocess
import sys
import time
from datetime import UTC, datetime
from pathlib import Path

import pytest

from gate import review
from gate.pipeline import RunOptions, run
from gate.policy import load_policy

ROOT = Path(__file__).resolve().parent.parent
INBOX = ROOT / "sample_docs" / "inbox"
POLICY = ROOT / "policies" / "demo.yaml"
AS_OF = datetime(2026, 12, 1, tzinfo=UTC)
DASK = Path(sys.executable).with_name("dask")
REQUIRED = os.environ.get("GATE_REQUIRE_SCALEOUT") == "1"


def _missing() -> str | None:
    if shutil.which("redis-server") is None:
        return "redis-server is not installed (apt-get install redis-server)"
    if not DASK.exists():
        return "the dask command is not installed (pip install distributed)"
    return None


def _port() -> int:
    with socket.socket() as sock:
        sock.bind(("127.0.0.1", 0))
        return sock.getsockname()[1]


def _wait_port(port: int, seconds: float = 30) -> None:
    deadline = time.monotonic() + seconds
    while time.monotonic() < deadline:
        try:
            with socket.create_connection(("127.0.0.1", port), timeout=1):
                return
        except OSError:
            time.sleep(0.2)
    raise RuntimeError(f"nothing listens on 127.0.0.1:{port}")


@pytest.fixture(scope="module")
def services(tmp_path_factory):
    why = _missing()
    if why:
        if REQUIRED:
            pytest.fail(why)
        pytest.skip(why)
    work = tmp_path_factory.mktemp("services")
    redis_port, sched_port = _port(), _port()
    procs = []
    try:
        procs.append(subprocess.Popen(
            ["redis-server", "--port", str(redis_port), "--bind", "127.0.0.1", "--save", "",
             "--appendonly", "no", "--dir", str(work)], stdout=subprocess.DEVNULL,
            stderr=subprocess.DEVNULL, start_new_session=True))
        procs.append(subprocess.Popen(
            [str(DASK), "scheduler", "--host", "127.0.0.1", "--port", str(sched_port),
             "--no-dashboard"], stdout=subprocess.DEVNULL, stderr=subprocess.DEVNULL,
            start_new_session=True))
        _wait_port(redis_port)
        _wait_port(sched_port)
        procs.append(subprocess.Popen(
            [str(DASK), "worker", f"tcp://127.0.0.1:{sched_port}", "--nworkers", "2",
             "--nthreads", "1", "--no-dashboard", "--local-directory", str(work)],
            stdout=subprocess.DEVNULL, stderr=subprocess.DEVNULL, start_new_session=True))
        from distributed import Client
        with Client(f"tcp://127.0.0.1:{sched_port}", timeout=30) as client:
            client.wait_for_workers(2, timeout=60)
        yield {"redis": f"redis://127.0.0.1:{redis_port}/0",
               "cluster": f"tcp://127.0.0.1:{sched_port}"}
    finally:
        for proc in reversed(procs):
            try:
                os.killpg(proc.pid, signal.SIGTERM)
                proc.wait(10)
            except (ProcessLookupError, subprocess.TimeoutExpired):
                os.killpg(proc.pid, signal.SIGKILL)


def go(out, *, inbox=INBOX, **kw):
    run(RunOptions(inbox=inbox, policy=load_policy(POLICY), out=out, as_of=AS_OF,
                   workers=kw.pop("workers", 2), **kw))
    return json.loads((out / "report.json").read_text())


def decisions(report):
    return {d["path"]: (d["decision"], [r["code"] for r in d["reasons"]],
                        [w["code"] for w in d["warnings"]]) for d in report["documents"]}


def test_cluster_and_redis_index_give_the_local_decisions(services, tmp_path):
    local = go(tmp_path / "local")
    scaled = go(tmp_path / "scaled", cluster=services["cluster"], index=services["redis"],
                index_name="same")
    assert decisions(scaled) == decisions(local)
    assert scaled["run"]["index"] == {"url": services["redis"], "name": "same"}
    # the per-document records are the same too, apart from the run facts
    strip = lambda doc: {k: v for k, v in doc.items() if k != "location"}  # noqa: E731
    assert [strip(d) for d in scaled["documents"]] == [strip(d) for d in local["documents"]]
    # the cluster's workers kept the texts in the output folder's state/texts and the
    # coordinator filed references; the entries' texts are the local run's, byte for byte
    import sqlite3

    from gate.state import TEXT_REF
    with sqlite3.connect(tmp_path / "scaled" / "state" / "gate.sqlite") as conn:
        refs = sum(row[0].startswith(TEXT_REF)
                   for row in conn.execute("SELECT text FROM cache"))
    assert refs > 0 and any((tmp_path / "scaled" / "state" / "texts").rglob("*"))
    for folder in ("accepted", "quarantine"):
        for entry in (tmp_path / "local" / folder).iterdir():
            text = entry / "text.txt"
            twin = tmp_path / "scaled" / folder / entry.name / "text.txt"
            assert twin.exists() == text.exists(), entry.name
            if text.exists():
                assert twin.read_bytes() == text.read_bytes(), entry.name


def test_incremental_runs_against_the_shared_index_match_local(services, tmp_path):
    inbox = tmp_path / "inbox"
    shutil.copytree(INBOX, inbox, symlinks=True)
    extra = tmp_path / "extra"
    extra.mkdir()
    import hashlib
    original = (INBOX / "wiki" / "driver-handbook.txt").read_text()
    revised = original + "\nRevision 2 of the handbook replaces the first edition.\n"
    (extra / "handbook-v2.txt").write_text(revised)
    (extra / "manifest.jsonl").write_text(json.dumps({
        "path": "handbook-v2.txt",
        "source_url": "https://wiki.example.org/public/handbook-v2.txt",
        "sha256": hashlib.sha256(revised.encode()).hexdigest(),
        "published_at": "2026-11-28"}) + "\n")
    results = []
    for mode in ("local", "redis"):
        out = tmp_path / mode
        index = dict(index=services["redis"], index_name=f"inc-{tmp_path.name}") \
            if mode == "redis" else {}
        go(out, inbox=inbox, **index)
        report = go(out, inbox=extra, incremental=True, **index)
        results.append((decisions(report), report["removed"]))
    assert results[0] == results[1]
    assert results[0][0]["handbook-v2.txt"][0] == "accepted"
    # the newer version supersedes the one accepted in the first run, in both modes
    assert [(r["path"], r["change"]) for r in results[0][1]] == \
        [("wiki/driver-handbook.txt", "superseded")]


def test_output_folders_sharing_an_index_deduplicate_across_each_other(services, tmp_path):
    first = go(tmp_path / "team-a", index=services["redis"], index_name="shared")
    second = go(tmp_path / "team-b", index=services["redis"], index_name="shared")
    accepted_by_a = {p for p, (d, _r, _w) in decisions(first).items() if d == "accepted"}
    got = decisions(second)
    for path in accepted_by_a:  # team B holds its copies of what team A already accepted
        assert got[path][0] == "quarantined" and "duplicate.exact" in got[path][1]
    message = next(r["message"] for d in second["documents"]
                   if d["path"] == sorted(accepted_by_a)[0] for r in d["reasons"])
    assert "accepted in" in message


def test_review_release_keeps_the_index_in_line(services, tmp_path):
    import redis as redis_lib
    out = tmp_path / "out"
    go(out, index=services["redis"], index_name="review")
    client = redis_lib.Redis.from_url(services["redis"])
    before = client.hlen("gate:review:meta")
    review.act(out, "release", ["language/avis-aux-voyageurs.html"], note="bilingual notice",
               by="r")
    assert client.hlen("gate:review:meta") == before + 1


def _bucket_members(client, index):
    """Every (bucket key, member) pair of the index's LSH buckets."""
    pairs = set()
    for key in client.scan_iter(match=index.buckets + "*", count=1000):
        pairs.update((key.decode(), m.decode()) for m in client.smembers(key))
    return pairs


def _expected_buckets(client, index):
    """The bucket pairs the stored sketches call for, computed here in Python (the Lua
    scripts compute them in Redis)."""
    from gate.index import bucket_digests
    pairs = set()
    for member, sketch in client.hgetall(index.prefix + "sketch").items():
        for band, digest in enumerate(bucket_digests(sketch, index.bands, index.rows)):
            pairs.add((f"{index.buckets}{band}:{digest}", member.decode()))
    return pairs


def test_index_buckets_follow_the_folder_through_removals_and_refills(services, tmp_path):
    import redis as redis_lib

    from gate.index import SharedIndex
    from gate.state import open_state
    out = tmp_path / "out"
    go(out, index=services["redis"], index_name="layout")
    client = redis_lib.Redis.from_url(services["redis"])
    state = open_state(out / "state" / "gate.sqlite")
    try:
        folder = state.meta("folder_id")
        accepted = {doc_id for doc_id, _sha in state.corpus_digests()}
    finally:
        state.close()
    index = SharedIndex(services["redis"], "layout", folder, 0.8)
    owners = {m.decode() for m in client.smembers(index.owner_key)}
    assert owners == {f"{folder}:{doc_id}" for doc_id in accepted}
    pairs = _bucket_members(client, index)
    assert pairs and pairs == _expected_buckets(client, index)
    # one bucket per band for every document with a sketch
    assert len(pairs) == index.bands * client.hlen(index.prefix + "sketch")

    # a full run over a smaller inbox removes documents: their buckets go with them
    smaller = tmp_path / "smaller"
    shutil.copytree(INBOX, smaller, symlinks=True)
    shutil.rmtree(smaller / "wiki")
    go(out, inbox=smaller, index=services["redis"], index_name="layout", allow_removals=100)
    left = {m.decode() for m in client.smembers(index.owner_key)}
    assert left < owners
    assert {m for _key, m in _bucket_members(client, index)} <= left
    assert _bucket_members(client, index) == _expected_buckets(client, index)
    assert {m.decode() for m in client.hkeys(index.prefix + "meta")} == left

    # an index whose buckets were built another way (an earlier gate, another layout)
    # has no owner set for this layout: the next run fills it again
    client.delete(index.owner_key, index.prefix + "sketch",
                  *client.scan_iter(match=index.buckets + "*"))
    go(out, inbox=smaller, index=services["redis"], index_name="layout")
    assert {m.decode() for m in client.smembers(index.owner_key)} == left
    assert _bucket_members(client, index) == _expected_buckets(client, index)
    assert len(_bucket_members(client, index)) == \
        index.bands * client.hlen(index.prefix + "sketch") > 0


def test_a_stored_document_without_its_binary_sketch_is_still_a_candidate(services,
                                                                         tmp_path):
    """Metadata written by an earlier gate (the sketch as hex inside it) still serves."""
    import redis as redis_lib

    from gate.checks import duplicate as dup
    from gate.index import SharedIndex
    go(tmp_path / "team-a", index=services["redis"], index_name="hexmeta")
    client = redis_lib.Redis.from_url(services["redis"])
    sketches = client.hgetall("gate:hexmeta:sketch")
    member, sketch = sorted(sketches.items())[0]
    meta = json.loads(client.hget("gate:hexmeta:meta", member))
    meta["minhash"] = sketch.hex()
    client.hset("gate:hexmeta:meta", member, json.dumps(meta))
    client.delete("gate:hexmeta:sketch")
    index = SharedIndex(services["redis"], "hexmeta", "another-folder", 0.8)
    probe = dup.Item(key="probe", path="probe.txt", sha256=meta["sha256"], text_sha256=None,
                     minhash=None, trust=50, date=None, seen=(1, 0), in_batch=True,
                     accepted_before=False)
    found = index.candidates([probe], batch_ids={"probe"}, include_own=False)
    assert [(item.key, item.minhash, item.fixed) for item in found] == \
        [(member.decode(), sketch, True)]


def test_a_second_folder_is_refused_while_a_run_holds_the_index(services):
    from gate.errors import LockError
    from gate.index import SharedIndex
    first = SharedIndex(services["redis"], "locked", "folder-a", 0.8)
    second = SharedIndex(services["redis"], "locked", "folder-b", 0.8)
    first.lock()
    try:
        with pytest.raises(LockError, match="in use by another gate run"):
            second.lock()
    finally:
        first.unlock()
    second.lock()  # free again once the first run is done
    second.unlock()


def test_the_scale_benchmarks_probes_find_their_functions_and_put_them_back():
    """benchmarks/cluster_scale.py times functions of gate and Dask by wrapping them: each
    must still exist where it is named, a generator must yield what it yielded, and the
    originals must be back afterwards (no services needed)."""
    pytest.importorskip("distributed")
    import importlib

    from benchmarks.cluster_scale import PROBES, Probes

    def target(module, cls, name):
        owner = importlib.import_module(module)
        return getattr(getattr(owner, cls) if cls else owner, name)

    before = [target(m, c, n) for m, c, n, _label in PROBES]
    with Probes() as probes:
        assert all(target(m, c, n) is not b for (m, c, n, _l), b in zip(PROBES, before))
        counted = probes._generator(lambda n: (yield from range(n)), "counting")
        assert list(counted(3)) == [0, 1, 2]
        assert "counting" in probes.per_document(1)
    assert [target(m, c, n) for m, c, n, _label in PROBES] == before


def test_a_cache_key_filed_again_holds_the_later_row_only(tmp_path):
    """The coordinator files a site page's row twice under one key (blocks first, then
    measured): the second filing wins and no second row appears (invented rows)."""
    import zlib

    from gate.state import open_state
    state = open_state(tmp_path / "gate.sqlite")
    first = ("k:print", "ab" * 32, '{"type": "html"}', '{"measured": false}',
             zlib.compress(b"page text", 1))
    later = ("k:print", "ab" * 32, '{"type": "html", "ok": true}', '{"measured": true}',
             zlib.compress(b"page text", 1))
    other = ("j:print", "cd" * 32, '{"type": "text"}', '{"measured": true}',
             zlib.compress(b"other", 1))
    state.cache_put_packed([first, other])
    state.cache_put_packed([later])
    assert state.cache_meta("k:print") == ({"type": "html", "ok": True}, {"measured": True})
    assert state.cache_meta("j:print") == ({"type": "text"}, {"measured": True})
    assert state.cache_text("k:print") == "page text"
    assert state.conn.execute("SELECT COUNT(*) FROM cache").fetchone()[0] == 2
    state.close()


def test_texts_kept_in_shared_storage_are_filed_as_references_and_read_back(tmp_path):
    """A Dask worker moves each answer's compressed text to state/texts (keep_texts); the
    state resolves the reference, an entry's assembly reads the file, and a damaged or
    missing file is a clear StateError, never a wrong text (invented texts)."""
    import zlib

    from gate.cluster import keep_texts
    from gate.errors import StateError
    from gate.placement import build_entry
    from gate.state import TEXT_REF, open_state

    state_dir = tmp_path / "out" / "state"
    state_dir.mkdir(parents=True)
    long_text = " ".join(f"word{n}" for n in range(2000)).encode()
    big, small = zlib.compress(long_text, 1), zlib.compress(b"short note", 1)
    results = [(0, {"intake": {}, "result": {"cache": ("{}", "{}", big)}}),
               (1, {"cache": ("{}", "{}", small)}),  # a container member's packed result
               (2, True), (3, {"missing": True})]
    assert keep_texts(str(state_dir / "texts"), results)
    ref = results[0][1]["result"]["cache"][2]
    assert ref.startswith(TEXT_REF) and len(ref) < 100
    assert results[1][1]["cache"][2] == small  # short texts stay in the row
    state = open_state(state_dir / "gate.sqlite")
    state.cache_put_packed([("a:p", "aa" * 32, "{}", "{}", ref),
                            ("b:p", "bb" * 32, "{}", "{}", small)])
    assert state.cache_text("a:p") == long_text.decode()
    assert state.cache_text_z("a:p") == big
    assert state.cache_text_stored("a:p") == ref
    assert state.cache_text("b:p") == "short note"
    payload = {"path": "a.html", "sha256": None, "text_key": "a:p",
               "record": {"document": {"path": "a.html"}}}
    built = build_entry(tmp_path / "out", "doc-a", "quarantine", payload, ref)
    assert (built / "text.txt").read_bytes() == long_text
    stored = next(p for p in (state_dir / "texts").rglob("*") if p.is_file())
    stored.write_bytes(big[:-3])
    with pytest.raises(StateError, match="does not match its name"):
        state.cache_text("a:p")
    stored.unlink()
    with pytest.raises(StateError, match="cannot be read"):
        state.cache_text_z("a:p")
    # a reference that names no SHA-256 (a damaged row) never becomes a path
    state.cache_put_packed([("c:p", "cc" * 32, "{}", "{}", TEXT_REF + b"../../../etc/passwd"),
                            ("d:p", "dd" * 32, "{}", "{}", TEXT_REF + b"\xff" * 64)])
    for key in ("c:p", "d:p"):
        with pytest.raises(StateError, match="no SHA-256"):
            state.cache_text(key)
    state.close()


def test_a_page_measured_again_gets_its_earlier_text_read_on_the_node(tmp_path):
    """The coordinator sends the reference its cache row holds; the node reads the file
    (checked against its name). A file gone or damaged leaves the page without it, to be
    extracted as the first time, never with a wrong text (invented texts)."""
    import zlib

    from gate.cluster import earlier_read, keep_texts
    from gate.intake import StagedTask

    texts = tmp_path / "state" / "texts"
    text_z = zlib.compress(" ".join(f"w{n}" for n in range(3000)).encode(), 1)
    results = [(0, {"cache": ("{}", "{}", text_z)})]
    assert keep_texts(str(texts), results)
    ref = results[0][1]["cache"][2]
    task = StagedTask("a.html", "/nowhere", "ab" * 32, None, extra=(("h",), ref))
    assert earlier_read(task, str(texts)).extra == (("h",), text_z)
    inline = StagedTask("a.html", "/nowhere", "ab" * 32, None, extra=(("h",), text_z))
    assert earlier_read(inline, str(texts)) is inline  # a text in its row travels as is
    first = StagedTask("a.html", "/nowhere", "ab" * 32, None)
    assert earlier_read(first, str(texts)) is first
    stored = next(p for p in texts.rglob("*") if p.is_file())
    stored.write_bytes(text_z[:-2])
    assert earlier_read(task, str(texts)).extra == (("h",), None)
    stored.unlink()
    assert earlier_read(task, str(texts)).extra == (("h",), None)


def test_answers_are_lightened_without_losing_what_the_coordinator_reads():
    """What a node leaves out of a batch's answers (gate.cluster.lighten) and how it
    sends the block hashes (invented values; the hashes are 64-bit, as gate.templates
    makes them)."""
    import numpy as np

    from gate.cluster import lighten
    from gate.intake import StagedTask
    from gate.templates import Page

    big = 2 ** 64 - 5
    blocks = {"main": [3, big], "other": [7], "shaped": [[1, 2]], "title": "t"}

    def answer(judged: bool) -> dict:
        result = {"cache": ("{}", "{}", b"x"), "measures": {"quality": {"n": 1}},
                  "measure_errors": {}, "blocks": {k: list(v) if isinstance(v, list) else v
                                                   for k, v in blocks.items()},
                  "timings": {"extract": 0.5, "quality": 0.25}}
        if judged:
            result["judged"] = ("{}", None)
        return {"intake": {}, "result": result}

    again = StagedTask("b.html", "/nowhere", "cd" * 32, None, extra=((), None))
    items = [(0, None), (1, again), (2, None)]
    results = [(0, answer(True)), (1, answer(True)), (2, answer(False)), (3, True)]
    lighten(items, results)
    first, second, third = (results[i][1]["result"] for i in range(3))
    assert first["measures"] == {} and third["measures"] == {"quality": {"n": 1}}
    assert first["blocks"]["main"].dtype == np.uint64
    assert first["blocks"]["shaped"] == [[1, 2]] and first["blocks"]["title"] == "t"
    assert Page.of("s html", first["blocks"]).signature() == \
        Page.of("s html", blocks).signature()
    assert second["blocks"] == {}
    assert first["timings"] == {"extract": 1.5, "quality": 0.75}
    assert "timings" not in second and "timings" not in third


def test_a_batchs_answers_travel_in_one_frame():
    """Dask sends every NumPy array of a result as a frame of its own; a batch's answers
    (gate.cluster.Answers) go as one buffer, and arrive equal (invented values)."""
    import numpy as np
    from distributed.protocol import deserialize, serialize

    from gate.cluster import Answers

    items = [(i, {"result": {"blocks": {"main": np.arange(i, i + 40, dtype=np.uint64),
                                         "other": np.array([2 ** 64 - 1], dtype=np.uint64),
                                         "nav": np.zeros(0, dtype=np.uint64)},
                             "cache": ("{}", "{}", b"x" * i)}}) for i in range(200)]
    assert len(serialize(items, serializers=("dask", "pickle"))[1]) > 200  # arrays apart
    header, frames = serialize(Answers(items), serializers=("dask", "pickle"))
    assert len(frames) == 1
    back = deserialize(header, frames).items
    assert [index for index, _answer in back] == list(range(200))
    for (_i, sent), (_j, got) in zip(items, back, strict=True):
        for key, array in sent["result"]["blocks"].items():
            assert got["result"]["blocks"][key].dtype == np.uint64
            assert np.array_equal(got["result"]["blocks"][key], array)
        assert got["result"]["cache"] == sent["result"]["cache"]
