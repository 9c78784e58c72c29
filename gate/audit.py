"""The audit log: every decision and every review action, append-only, hash-chained.

Entries live in the state database, written in the same transaction as the change they
record, so the log and the folders never disagree. Each entry stores the SHA-256 of the
previous entry's hash joined with its own canonical JSON; editing or deleting any entry
breaks every hash after it, which ``gate audit verify`` detects. An attacker who rewrites
the whole chain could make it consistent again, so every run also records the current head
hash in report.json: archive reports (or note the head printed by ``gate audit verify``)
and pass it as ``--head`` to prove the log still contains that history.
"""

from __future__ import annotations

import hashlib
import json
import sqlite3
from collections.abc import Iterable, Iterator
from dataclasses import dataclass
from typing import Any

GENESIS = "0" * 64

def canonical(entry: dict[str, Any]) -> str:
    return json.dumps(entry, sort_keys=True, separators=(",", ":"), ensure_ascii=True)


def chain(prev: str, text: str) -> str:
    return hashlib.sha256(f"{prev}\n{text}".encode("ascii")).hexdigest()


def head(conn: sqlite3.Connection) -> tuple[int, str]:
    row = conn.execute("SELECT seq, hash FROM audit ORDER BY seq DESC LIMIT 1").fetchone()
    return (row[0], row[1]) if row else (0, GENESIS)


def append(conn: sqlite3.Connection, entries: Iterable[dict[str, Any]]) -> str:
    """Append entries inside the caller's transaction; returns the new head hash."""
    seq, prev = head(conn)
    rows = []
    for entry in entries:
        seq += 1
        text = canonical(entry)
        digest = chain(prev, text)
        rows.append((seq, entry["action"], text, prev, digest))
        prev = digest
    conn.executemany("INSERT INTO audit (seq, action, entry, prev, hash) VALUES (?, ?, ?, ?, ?)",
                     rows)
    return prev


@dataclass(frozen=True)
class Verdict:
    ok: bool
    entries: int
    head: str
    problem: str = ""


def verify(conn: sqlite3.Connection, expected_head: str | None = None) -> Verdict:
    """Recompute the chain; report the first entry that does not fit."""
    prev = GENESIS
    count = 0
    seen_head = expected_head is None
    last_seq = 0
    for seq, text, stored_prev, stored_hash in conn.execute(
            "SELECT seq, entry, prev, hash FROM audit ORDER BY seq"):
        count += 1
        if seq != last_seq + 1:
            return Verdict(False, count, prev, f"entries {last_seq + 1} to {seq - 1} are "
                                                "missing (deleted)")
        last_seq = seq
        if stored_prev != prev:
            return Verdict(False, count, prev, f"entry {seq} does not follow entry {seq - 1} "
                                                "(an entry before it was changed or removed)")
        digest = chain(prev, text)
        if digest != stored_hash:
            return Verdict(False, count, prev, f"entry {seq} was altered after it was "
                                                "written (its hash does not match)")
        prev = digest
        if expected_head is not None and digest == expected_head:
            seen_head = True
    if not seen_head:
        return Verdict(False, count, prev, f"the head {expected_head} is not in the log: "
                                            "history after it was rewritten or removed")
    return Verdict(True, count, prev)


def entries(conn: sqlite3.Connection, *, doc_id: str | None = None,
            limit: int | None = None) -> Iterator[dict[str, Any]]:
    query = "SELECT seq, entry, hash FROM audit ORDER BY seq DESC"
    count = 0
    for seq, text, digest in conn.execute(query):
        entry = json.loads(text)
        if doc_id is not None and entry.get("id") != doc_id:
            continue
        yield {"seq": seq, "hash": digest, **entry}
        count += 1
        if limit is not None and count >= limit:
            return
