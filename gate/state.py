"""The corpus state kept with the output: one SQLite file, ``DIR/state/gate.sqlite``.

It remembers, between runs, what was accepted (with the MinHash sketch the duplicate check
needs), every run and its decisions, the placements still to be carried out, and a cache of
extraction results keyed by content digest, so unchanged documents are not parsed again.
The database is the source of truth: ``accepted/`` and ``quarantine/`` are materialised from
it, and a run killed at any point is completed by re-applying what the database says.

The schema is versioned. A file that is not a gate state, or one written by a newer gate,
is refused with a message instead of being overwritten.
"""

from __future__ import annotations

import base64
import hashlib
import json
import os
import sqlite3
import uuid
import zlib
from collections.abc import Iterable, Iterator
from contextlib import contextmanager
from dataclasses import dataclass, field
from pathlib import Path
from typing import Any

from gate import __version__, audit
from gate.errors import StateError

APP_ID = 0x67617465  # "gate": SQLite's application_id marks the file as ours
SCHEMA_VERSION = 1

SCHEMA = """
CREATE TABLE meta (key TEXT PRIMARY KEY, value TEXT NOT NULL);
CREATE TABLE cache (
    key TEXT PRIMARY KEY,
    sha256 TEXT NOT NULL,
    extracted TEXT NOT NULL,
    measures TEXT NOT NULL,
    text BLOB NOT NULL
);
CREATE TABLE runs (
    run_id TEXT PRIMARY KEY,
    seq INTEGER NOT NULL UNIQUE,
    state TEXT NOT NULL,
    fingerprint TEXT NOT NULL,
    as_of TEXT NOT NULL,
    mode TEXT NOT NULL,
    info TEXT NOT NULL,
    summary TEXT
);
CREATE TABLE decisions (
    run_id TEXT NOT NULL,
    path TEXT NOT NULL,
    doc_id TEXT NOT NULL,
    decision TEXT NOT NULL,
    record TEXT NOT NULL,
    PRIMARY KEY (run_id, path)
);
CREATE TABLE corpus (
    doc_id TEXT PRIMARY KEY,
    path TEXT NOT NULL,
    source_url TEXT,
    sha256 TEXT NOT NULL,
    text_sha256 TEXT,
    minhash BLOB,
    trust INTEGER NOT NULL,
    date TEXT,
    first_seen INTEGER NOT NULL,
    run_id TEXT NOT NULL,
    placed TEXT NOT NULL,
    cache_key TEXT NOT NULL
);
CREATE TABLE placements (
    run_id TEXT NOT NULL,
    doc_id TEXT NOT NULL,
    target TEXT NOT NULL,
    payload TEXT NOT NULL,
    done INTEGER NOT NULL DEFAULT 0,
    PRIMARY KEY (run_id, doc_id)
);
CREATE TABLE entries (
    doc_id TEXT PRIMARY KEY,
    folder TEXT NOT NULL,
    path TEXT NOT NULL,
    sha256 TEXT,
    fingerprint TEXT NOT NULL,
    run_id TEXT NOT NULL,
    cache_key TEXT,
    trust INTEGER NOT NULL DEFAULT 0,
    date TEXT,
    status TEXT NOT NULL DEFAULT 'open',
    review TEXT
);
CREATE TABLE releases (
    sha256 TEXT NOT NULL,
    code TEXT NOT NULL,
    note TEXT NOT NULL,
    by TEXT NOT NULL,
    at TEXT NOT NULL,
    PRIMARY KEY (sha256, code)
);
CREATE TABLE audit (
    seq INTEGER PRIMARY KEY,
    action TEXT NOT NULL,
    entry TEXT NOT NULL,
    prev TEXT NOT NULL,
    hash TEXT NOT NULL
);
CREATE TABLE run_docs (
    run_id TEXT NOT NULL,
    idx INTEGER NOT NULL,
    blob TEXT NOT NULL,
    PRIMARY KEY (run_id, idx)
);
CREATE TABLE changes (
    run_id TEXT NOT NULL,
    seq INTEGER NOT NULL,
    line TEXT NOT NULL,
    PRIMARY KEY (run_id, seq)
);
"""


def _bytes_json(value: Any) -> Any:
    """json's ``default`` hook: bytes (measured values such as MinHash sketches) are
    written as ``{"$b64": ...}`` (the encoder calls it for nothing else it can write)."""
    if isinstance(value, bytes):
        return {"$b64": base64.b64encode(value).decode("ascii")}
    raise TypeError(f"Object of type {type(value).__name__} is not JSON serializable")


def _bytes_from_json(value: dict[str, Any]) -> Any:
    """json's ``object_hook``: ``{"$b64": ...}`` back to bytes."""
    if len(value) == 1 and "$b64" in value:
        return base64.b64decode(value["$b64"])
    return value


def dumps(value: Any) -> str:
    """Compact JSON with sorted keys, bytes as ``{"$b64": ...}`` (written by the C
    encoder's hook: no walk over the whole value first)."""
    return json.dumps(value, sort_keys=True, ensure_ascii=False, separators=(",", ":"),
                      default=_bytes_json)


def loads(text: str) -> Any:
    """The value :func:`dumps` wrote, bytes included."""
    return json.loads(text, object_hook=_bytes_from_json)


# -- texts kept beside the database -----------------------------------------------------
#
# A cache row's text column holds the compressed text itself, or (filed by a cluster run,
# whose workers write the texts to the output folder's shared storage) a reference to a
# file ``state/texts/<xx>/<sha256>`` holding it, named by the SHA-256 of its compressed
# bytes. A zlib stream starts with 0x78, a reference with ``TEXT_REF``, so the two never
# mix. The file is written and flushed before the reference reaches the database; it is
# checked against its name when read.

TEXT_REF = b"gate-text:"
TEXT_INLINE_BELOW = 512  # compressed texts shorter than this stay in the row


def store_text(texts: str, text_z: bytes) -> bytes:
    """Write a compressed text under ``texts`` (a temporary name, then one rename; not
    flushed: the writer flushes the file system once for many) and return the reference
    a cache row files instead of it. Runs on the node that produced the text."""
    digest = hashlib.sha256(text_z).hexdigest()
    folder = os.path.join(texts, digest[:2])
    target = os.path.join(folder, digest)
    if not os.path.exists(target):
        tmp = os.path.join(folder, f".{digest}.tmp-{os.getpid()}")
        os.makedirs(folder, exist_ok=True)
        fd = os.open(tmp, os.O_WRONLY | os.O_CREAT | os.O_TRUNC | os.O_CLOEXEC, 0o644)
        try:
            view = memoryview(text_z)
            while view:
                view = view[os.write(fd, view):]
        finally:
            os.close(fd)
        os.replace(tmp, target)
    return TEXT_REF + digest.encode("ascii")


def text_z_of(state_dir: Path | str, stored: bytes) -> bytes:
    """The compressed text a cache row's ``stored`` text column stands for (itself, or
    the file its reference names under ``state_dir/texts``)."""
    if not stored.startswith(TEXT_REF):
        return stored
    digest = stored[len(TEXT_REF):].decode("ascii", "replace")
    if len(digest) != 64 or digest.strip("0123456789abcdef"):
        raise StateError(f"a cached text's reference {digest[:80]!r} is no SHA-256 (the state "
                         "database is damaged): restore the output folder whole from a backup.")
    path = os.path.join(os.fspath(state_dir), "texts", digest[:2], digest)
    try:
        with open(path, "rb") as fh:
            data = fh.read()
    except OSError as err:
        raise StateError(f"the cached text {path} cannot be read ({err.strerror or err}). "
                         "Files under state/texts belong to the state database: restore "
                         "the output folder whole from a backup.") from None
    if hashlib.sha256(data).hexdigest() != digest:
        raise StateError(f"the cached text {path} does not match its name (damaged). "
                         "Files under state/texts belong to the state database: restore "
                         "the output folder whole from a backup.")
    return data


# the columns of a corpus row, in the order State.corpus and State.corpus_rows read them
CORPUS_COLS = ("doc_id", "path", "source_url", "sha256", "text_sha256", "minhash", "trust",
               "date", "first_seen", "run_id", "placed", "cache_key")


@dataclass
class Rows:
    """The rows one run (a chunk of its documents) or one review action records, in the
    column order of their tables."""

    decisions: list[tuple] = field(default_factory=list)
    corpus_upserts: list[tuple] = field(default_factory=list)
    corpus_deletes: list[str] = field(default_factory=list)
    placements: list[tuple] = field(default_factory=list)
    entries: list[tuple] = field(default_factory=list)
    entry_updates: list[tuple] = field(default_factory=list)  # folder, fingerprint, run,
    entry_deletes: list[str] = field(default_factory=list)  # status, review, id
    releases: list[tuple] = field(default_factory=list)
    changes: list[str] = field(default_factory=list)  # changes.jsonl lines
    audit: list[dict[str, Any]] = field(default_factory=list)


class State:
    """A connection to the state database. Use :func:`open_state`."""

    def __init__(self, conn: sqlite3.Connection, path: Path):
        self.conn = conn
        self.path = path

    def close(self) -> None:
        self.conn.close()

    @contextmanager
    def transaction(self) -> Iterator[sqlite3.Connection]:
        """One atomic transaction: all of it lands, or none of it."""
        self.conn.execute("BEGIN IMMEDIATE")
        try:
            yield self.conn
        except BaseException:
            self.conn.execute("ROLLBACK")
            raise
        else:
            self.conn.execute("COMMIT")

    # -- cache -------------------------------------------------------------------------

    def cache_meta(self, key: str) -> tuple[dict, dict] | None:
        row = self.conn.execute("SELECT extracted, measures FROM cache WHERE key = ?",
                                (key,)).fetchone()
        return (loads(row[0]), loads(row[1])) if row else None

    def cache_text(self, key: str) -> str | None:
        text_z = self.cache_text_z(key)
        return zlib.decompress(text_z).decode("utf-8") if text_z is not None else None

    def cache_text_z(self, key: str) -> bytes | None:
        """A cached text (zlib-compressed UTF-8), for a worker to unpack."""
        stored = self.cache_text_stored(key)
        return text_z_of(self.path.parent, stored) if stored is not None else None

    def cache_text_stored(self, key: str) -> bytes | None:
        """A cached text as the row holds it: the compressed text, or the reference to
        its file under state/texts (for a worker that resolves it with
        :func:`text_z_of`, so the text does not pass through this process)."""
        row = self.conn.execute("SELECT text FROM cache WHERE key = ?", (key,)).fetchone()
        return row[0] if row else None

    def cache_texts_stored(self, keys: Iterable[str]) -> dict[str, bytes]:
        """:meth:`cache_text_stored` of many keys, one query per 500 (the keys without a
        row are left out)."""
        wanted = sorted(set(keys))
        out: dict[str, bytes] = {}
        for start in range(0, len(wanted), 500):
            chunk = wanted[start:start + 500]
            out.update(self.conn.execute(
                f"SELECT key, text FROM cache WHERE key IN ({', '.join('?' * len(chunk))})",
                chunk).fetchall())
        return out

    def cache_put_packed(self, rows: Iterable[tuple[str, str, str, str, bytes]]) -> None:
        """Cache rows already encoded (by the worker that produced them): key, digest,
        extraction JSON, measures JSON, compressed text. A key filed again (a site's page
        measured after its template was learnt) is updated in place: the same row as a
        replacement, for about 40 % less CPU than deleting and inserting it (SQLite,
        21 KiB rows, loaded)."""
        with self.transaction() as conn:
            conn.executemany(
                "INSERT INTO cache (key, sha256, extracted, measures, text) "
                "VALUES (?, ?, ?, ?, ?) ON CONFLICT (key) DO UPDATE SET "
                "sha256 = excluded.sha256, extracted = excluded.extracted, "
                "measures = excluded.measures, text = excluded.text", rows)

    # -- runs ----------------------------------------------------------------------------

    def unfinished_run(self) -> dict[str, Any] | None:
        row = self.conn.execute(
            "SELECT run_id, seq, state, fingerprint, as_of, mode, info FROM runs "
            "WHERE state != 'complete' AND state != 'abandoned' ORDER BY seq DESC LIMIT 1"
        ).fetchone()
        if row is None:
            return None
        keys = ("run_id", "seq", "state", "fingerprint", "as_of", "mode", "info")
        out = dict(zip(keys, row))
        out["info"] = json.loads(out["info"])
        return out

    def next_seq(self) -> int:
        row = self.conn.execute("SELECT MAX(seq) FROM runs").fetchone()
        return (row[0] or 0) + 1

    def begin_run(self, run_id: str, seq: int, fingerprint: str, as_of: str, mode: str,
                  info: dict[str, Any]) -> None:
        with self.transaction() as conn:
            conn.execute("INSERT INTO runs (run_id, seq, state, fingerprint, as_of, mode, "
                         "info) VALUES (?, ?, 'processing', ?, ?, ?, ?)",
                         (run_id, seq, fingerprint, as_of, mode, json.dumps(info)))

    def set_run_state(self, run_id: str, state: str) -> None:
        with self.transaction() as conn:
            conn.execute("UPDATE runs SET state = ? WHERE run_id = ?", (state, run_id))

    def mark_decided(self, run_id: str, summary: dict[str, Any]) -> None:
        """Inside the commit transaction: the run's decisions are recorded."""
        self.conn.execute("UPDATE runs SET state = 'decided', summary = ? WHERE run_id = ?",
                          (json.dumps(summary, sort_keys=True), run_id))

    def begin_review(self, review_id: str, seq: int, fingerprint: str, at: str,
                     info: dict[str, Any]) -> None:
        """Inside a review's transaction: the review action, recorded as a run."""
        self.conn.execute("INSERT INTO runs (run_id, seq, state, fingerprint, as_of, mode, "
                          "info) VALUES (?, ?, 'decided', ?, ?, 'review', ?)",
                          (review_id, seq, fingerprint, at, json.dumps(info)))

    def complete_run(self, run_id: str) -> None:
        """Every placement of the run is done: mark it complete and drop its work rows."""
        with self.transaction() as conn:
            conn.execute("UPDATE runs SET state = 'complete' WHERE run_id = ?", (run_id,))
            conn.execute("DELETE FROM placements WHERE run_id = ? AND done = 1", (run_id,))
            conn.execute("DELETE FROM run_docs WHERE run_id = ?", (run_id,))

    def run_summary(self, run_id: str) -> dict[str, Any]:
        row = self.conn.execute("SELECT summary FROM runs WHERE run_id = ?",
                                (run_id,)).fetchone()
        return json.loads(row[0]) if row and row[0] else {}

    def change_lines(self) -> list[str]:
        """What changes.jsonl holds: the latest run's changes, then those of every review
        action after it, each line naming the run or review that made it."""
        rows = self.conn.execute(
            "SELECT run_id, seq, mode FROM runs WHERE state IN ('decided', 'complete') "
            "ORDER BY seq").fetchall()
        latest = max((seq for _rid, seq, mode in rows if mode != "review"), default=0)
        lines: list[str] = []
        for rid, seq, _mode in rows:
            if seq >= latest:
                lines.extend(self.changes(rid))
        return lines

    # -- the documents of a run between their checks and the commit --------------------

    def clear_run_docs(self, run_id: str) -> None:
        self.conn.execute("DELETE FROM run_docs WHERE run_id = ?", (run_id,))

    def put_run_docs(self, rows: list[tuple[str, int, str]]) -> None:
        with self.transaction() as conn:
            conn.executemany("INSERT OR REPLACE INTO run_docs (run_id, idx, blob) "
                             "VALUES (?, ?, ?)", rows)

    def run_docs(self, run_id: str, first: int, last: int) -> dict[int, str]:
        """The records of documents ``first`` to ``last`` (inbox order) of a run."""
        return dict(self.conn.execute(
            "SELECT idx, blob FROM run_docs WHERE run_id = ? AND idx BETWEEN ? AND ?",
            (run_id, first, last)).fetchall())

    # -- what a run or a review action records -----------------------------------------

    def restart_rows(self, run_id: str) -> None:
        """Inside the commit transaction: a resumed run writes its rows afresh."""
        self.conn.execute("DELETE FROM placements WHERE run_id = ?", (run_id,))
        self.conn.execute("DELETE FROM changes WHERE run_id = ?", (run_id,))

    def write(self, run_id: str, rows: Rows, first_change: int = 0) -> str:
        """Inside a transaction: record ``rows`` for a run or review action; returns the
        audit log's head after its entries."""
        conn = self.conn
        conn.executemany("INSERT OR REPLACE INTO decisions (run_id, path, doc_id, decision, "
                         "record) VALUES (?, ?, ?, ?, ?)", rows.decisions)
        conn.executemany("DELETE FROM corpus WHERE doc_id = ?",
                         [(k,) for k in rows.corpus_deletes])
        conn.executemany("INSERT OR REPLACE INTO corpus (doc_id, path, sha256, text_sha256, "
                         "minhash, trust, date, first_seen, run_id, placed, cache_key, "
                         "source_url) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)",
                         rows.corpus_upserts)
        conn.executemany("INSERT OR REPLACE INTO placements (run_id, doc_id, target, payload) "
                         "VALUES (?, ?, ?, ?)", rows.placements)
        conn.executemany("INSERT OR REPLACE INTO entries (doc_id, folder, path, sha256, "
                         "fingerprint, run_id, cache_key, trust, date, status, review) "
                         "VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)", rows.entries)
        conn.executemany("UPDATE entries SET folder = ?, fingerprint = ?, run_id = ?, "
                         "status = ?, review = ? WHERE doc_id = ?", rows.entry_updates)
        conn.executemany("DELETE FROM entries WHERE doc_id = ?",
                         [(k,) for k in rows.entry_deletes])
        conn.executemany("INSERT OR REPLACE INTO releases (sha256, code, note, by, at) "
                         "VALUES (?, ?, ?, ?, ?)", rows.releases)
        conn.executemany("INSERT INTO changes (run_id, seq, line) VALUES (?, ?, ?)",
                         [(run_id, first_change + i, line)
                          for i, line in enumerate(rows.changes)])
        return audit.append(conn, rows.audit)

    def verify_audit(self, expected_head: str | None = None) -> audit.Verdict:
        return audit.verify(self.conn, expected_head)

    def audit_entries(self, doc_id: str | None, limit: int) -> list[dict[str, Any]]:
        return list(audit.entries(self.conn, doc_id=doc_id, limit=limit))

    def meta(self, key: str) -> str | None:
        row = self.conn.execute("SELECT value FROM meta WHERE key = ?", (key,)).fetchone()
        return row[0] if row else None

    def set_meta(self, key: str, value: str) -> None:
        with self.transaction() as conn:
            conn.execute("INSERT OR REPLACE INTO meta (key, value) VALUES (?, ?)", (key, value))

    # -- corpus ------------------------------------------------------------------------

    def corpus(self, sketches: bool = True) -> list[dict[str, Any]]:
        """The accepted corpus; ``sketches=False`` leaves the MinHash sketches out (a
        kilobyte each) when the caller does not compare with stored documents."""
        select = ", ".join(c if sketches or c != "minhash" else "NULL" for c in CORPUS_COLS)
        rows = self.conn.execute(f"SELECT {select} FROM corpus ORDER BY first_seen, "
                                 "path").fetchall()
        return [dict(zip(CORPUS_COLS, row)) for row in rows]

    def corpus_digests(self) -> list[tuple[str, str]]:
        """(doc id, sha256) of every accepted document."""
        return self.conn.execute("SELECT doc_id, sha256 FROM corpus").fetchall()

    def pending_count(self, run_id: str) -> int:
        return self.conn.execute("SELECT COUNT(*) FROM placements WHERE run_id = ? AND "
                                 "done = 0", (run_id,)).fetchone()[0]

    def pending_batch(self, run_id: str, after: str, limit: int
                      ) -> list[tuple[str, str, str]]:
        """The next ``limit`` placements of a run not yet done, after doc id ``after``
        (in batches, so a large run never holds every payload in memory); each payload
        as its JSON text."""
        return self.conn.execute(
            "SELECT doc_id, target, payload FROM placements WHERE run_id = ? AND done = 0 "
            "AND doc_id > ? ORDER BY doc_id LIMIT ?", (run_id, after, limit)).fetchall()

    def corpus_rows(self, doc_ids: list[str]) -> list[dict[str, Any]]:
        """Full corpus rows (with sketches) for some documents."""
        out = []
        for start in range(0, len(doc_ids), 500):
            chunk = doc_ids[start:start + 500]
            marks = ", ".join("?" * len(chunk))
            out += [dict(zip(CORPUS_COLS, row)) for row in self.conn.execute(
                f"SELECT {', '.join(CORPUS_COLS)} FROM corpus WHERE doc_id IN ({marks})",
                chunk)]
        return out

    def mark_placed(self, items: Iterable[tuple[str, str]]) -> None:
        with self.transaction() as conn:
            conn.executemany("UPDATE placements SET done = 1 WHERE run_id = ? AND doc_id = ?",
                             list(items))

    def entries(self) -> dict[str, tuple[str, str | None, str, str, str | None]]:
        """The intended content of the folders:
        id -> (folder, sha256, fingerprint, status, review JSON)."""
        return {row[0]: row[1:] for row in self.conn.execute(
            "SELECT doc_id, folder, sha256, fingerprint, status, review FROM entries")}

    def quarantine_ids(self) -> list[str]:
        """The quarantine entries' ids, in inbox path order."""
        return [r[0] for r in self.conn.execute(
            "SELECT doc_id FROM entries WHERE folder = 'quarantine' ORDER BY path")]

    def ids_at_path(self, path: str) -> list[str]:
        return [r[0] for r in self.conn.execute("SELECT doc_id FROM entries WHERE path = ?",
                                                (path,))]

    def entry(self, doc_id: str) -> dict[str, Any] | None:
        cols = ("doc_id", "folder", "path", "sha256", "fingerprint", "run_id", "cache_key",
                "trust", "date", "status", "review")
        row = self.conn.execute(f"SELECT {', '.join(cols)} FROM entries WHERE doc_id = ?",
                                (doc_id,)).fetchone()
        return dict(zip(cols, row)) if row else None

    def releases(self) -> dict[tuple[str, str], dict[str, str]]:
        """Reviewer releases: (sha256, code) -> note, by, at."""
        return {(sha, code): {"note": note, "by": by, "at": at} for sha, code, note, by, at
                in self.conn.execute("SELECT sha256, code, note, by, at FROM releases")}

    # -- what the report page of the folder draws -------------------------------------

    def runs_done(self, limit: int = 2) -> list[dict[str, Any]]:
        """The newest runs (not review actions) whose decisions are recorded, newest
        first: run id, seq, summary and what report.json says under ``run``."""
        rows = self.conn.execute(
            "SELECT run_id, seq, summary, info FROM runs WHERE mode != 'review' AND state IN "
            "('decided', 'complete') ORDER BY seq DESC LIMIT ?", (limit,)).fetchall()
        return [{"run_id": rid, "seq": seq, "summary": json.loads(summary or "{}"),
                 "info": json.loads(info)} for rid, seq, summary, info in rows]

    def put_report_rest(self, run_id: str, rest: dict[str, Any]) -> None:
        """Inside the commit transaction: report.json's keys other than its documents."""
        self.conn.execute("INSERT OR REPLACE INTO meta (key, value) VALUES (?, ?)",
                          (f"report:{run_id}", json.dumps(rest, sort_keys=True)))

    def report_rest(self, run_id: str) -> dict[str, Any] | None:
        saved = self.meta(f"report:{run_id}")
        return json.loads(saved) if saved else None

    def decision_records(self, run_id: str) -> Iterator[dict[str, Any]]:
        """The report entries of a run's documents, in path order, one at a time."""
        for (record,) in self.conn.execute(
                "SELECT record FROM decisions WHERE run_id = ? ORDER BY path", (run_id,)):
            yield json.loads(record)

    def reviewed_entries(self) -> list[dict[str, Any]]:
        """Every entry with its folder, status and review (JSON), in path order."""
        cols = ("doc_id", "folder", "path", "sha256", "run_id", "cache_key", "status",
                "review")
        return [dict(zip(cols, row)) for row in self.conn.execute(
            f"SELECT {', '.join(cols)} FROM entries ORDER BY path, doc_id")]

    def audit_since_run(self) -> list[dict[str, Any]]:
        """The audit entries written after the newest run's, oldest first (the review
        actions since that run)."""
        out = []
        for entry in audit.entries(self.conn):
            if entry.get("action") == "run":
                break
            out.append(entry)
        return out[::-1]

    def run_ids(self) -> list[str]:
        """Every run and review action id, oldest first."""
        return [r[0] for r in self.conn.execute("SELECT run_id FROM runs ORDER BY seq")]

    def count_runs(self, mode_review: bool) -> int:
        """How many runs (or review actions) were begun, for their separate numbers."""
        op = "=" if mode_review else "!="
        return self.conn.execute(f"SELECT COUNT(*) FROM runs WHERE mode {op} 'review'"
                                 ).fetchone()[0]

    def changes(self, run_id: str) -> list[str]:
        return [r[0] for r in self.conn.execute(
            "SELECT line FROM changes WHERE run_id = ? ORDER BY seq", (run_id,))]



def open_state(path: Path) -> State:
    """Open (creating if needed) the state database, refusing foreign or newer files."""
    path.parent.mkdir(parents=True, exist_ok=True)
    existed = path.exists() and path.stat().st_size > 0
    try:
        conn = sqlite3.connect(path, isolation_level=None, timeout=30)
        conn.execute("PRAGMA journal_mode=WAL")
        conn.execute("PRAGMA synchronous=FULL")
        conn.execute("PRAGMA foreign_keys=ON")
        app_id = conn.execute("PRAGMA application_id").fetchone()[0]
        # a run killed while it created the file leaves an SQLite file with no tables and
        # no application id yet: that is an unfinished start, not someone else's database
        if existed and app_id == 0 and \
                conn.execute("SELECT count(*) FROM sqlite_master").fetchone()[0] == 0:
            existed = False
    except sqlite3.DatabaseError as err:
        raise StateError(
            f"{path} is not a gate state database ({err}). It may be damaged or belong to "
            "another program; move it away to start a fresh corpus state, or restore it "
            "from a backup.") from None
    if existed:
        if app_id != APP_ID:
            conn.close()
            raise StateError(f"{path} is an SQLite file but not a gate state database; gate "
                             "will not overwrite it. Use another --out folder or move the "
                             "file away.")
        try:
            row = conn.execute("SELECT value FROM meta WHERE key = 'schema_version'"
                               ).fetchone()
            integrity = conn.execute("PRAGMA quick_check").fetchone()[0]
        except sqlite3.DatabaseError as err:
            conn.close()
            raise StateError(f"{path} is damaged ({err}); restore it from a backup or move "
                             "it away to start a fresh corpus state.") from None
        if integrity != "ok":
            conn.close()
            raise StateError(f"{path} failed SQLite's integrity check ({integrity}); restore "
                             "it from a backup or move it away.")
        version = int(row[0]) if row else None
        if version is None:
            conn.close()
            raise StateError(f"{path} has no schema version; it was not written by gate.")
        if version > SCHEMA_VERSION:
            conn.close()
            raise StateError(f"{path} was written by a newer gate (state schema {version}; "
                             f"this gate {__version__} reads up to {SCHEMA_VERSION}). "
                             "Upgrade gate, or use another --out folder.")
        return State(conn, path)
    with conn:
        conn.executescript(SCHEMA)
        conn.execute(f"PRAGMA application_id = {APP_ID}")
        conn.execute("INSERT INTO meta VALUES ('schema_version', ?)", (str(SCHEMA_VERSION),))
        conn.execute("INSERT INTO meta VALUES ('created_by', ?)", (f"gate {__version__}",))
        conn.execute("INSERT INTO meta VALUES ('folder_id', ?)", (uuid.uuid4().hex[:16],))
    return State(conn, path)
