"""A shared near-duplicate index in Redis (``--index redis://host:port/db``).

By default the duplicate check builds its MinHash LSH in memory from the corpus state of
the output folder. With ``--index``, the sketches of accepted documents live in Redis
through datasketch's Redis storage, under a name (``--index-name``, default ``default``),
so that:

* a run only fetches the stored documents that are LSH candidates of its batch, instead of
  loading the whole corpus, and
* several output folders (several teams' inboxes, or shards of one) share one index: a
  document accepted by one folder is a known keeper for all of them.

Decisions for one folder are the same as without ``--index``. Documents another folder
accepted are fixed keepers: a copy of one is held here, and gate never supersedes another
folder's documents. The index is brought in line with the folder's corpus state at the end
of every run and review, as part of committing (a killed run re-syncs when it resumes).
Runs sharing an index must not overlap; a lock in Redis refuses a second one.

Keys: ``gate:<name>:meta`` (hash: member -> JSON), ``gate:<name>:owner:<bands>x<rows>:<folder>``
(set; per LSH layout, so a layout that changed is filled again by the next sync),
``gate:<name>:sha:<digest>`` and ``gate:<name>:text:<digest>`` (sets, exact copies),
``gate:<name>:lock``, and datasketch's bucket keys under a basename that encodes the
permutations, bands, rows, scheme and seed (an index built with other parameters is never
read by mistake).
"""

from __future__ import annotations

import json
import os
import pickle
import socket
from typing import Any
from urllib.parse import urlsplit

from gate import redact
from gate.checks import duplicate as dup
from gate.errors import LockError, UsageError

LOCK_SECONDS = 6 * 3600
QUERY_CHUNK = 500  # sketches whose LSH buckets are fetched in one pipeline per band


def connection_settings(url: str) -> dict[str, Any]:
    """redis-py's connection settings for an --index URL. Messages never repeat the URL
    as given (it may hold a password), only its redacted form."""
    shown = redact.text(url)
    form = ("--index must look like redis://HOST:PORT/DB or rediss://HOST:PORT/DB (TLS); "
            f"got {shown!r}")
    try:
        parts = urlsplit(url)
        port = parts.port
    except ValueError:  # a port that is not a number from 0 to 65535
        raise UsageError(f"{form}: the port must be a number from 1 to 65535.") from None
    if parts.scheme not in ("redis", "rediss") or not parts.hostname:
        raise UsageError(form + ".")
    if port == 0:
        raise UsageError(f"{form}: the port must be a number from 1 to 65535.")
    try:
        db = int(parts.path.lstrip("/") or 0)
    except ValueError:
        raise UsageError(f"{form}: the database must be a number.") from None
    if not 0 <= db <= 65535:
        raise UsageError(f"{form}: the database must be a number from 0 to 65535.")
    return {"host": parts.hostname, "port": port or 6379, "db": db,
            "password": parts.password or os.environ.get("GATE_REDIS_PASSWORD"),
            "ssl": parts.scheme == "rediss",
            "socket_connect_timeout": 5, "socket_timeout": 30}


def display_url(url: str) -> str:
    """The URL without user information, for state, reports and messages."""
    try:
        parts = urlsplit(url)
        port = f":{parts.port}" if parts.port else ""
    except ValueError:
        return redact.text(url)
    return f"{parts.scheme}://{parts.hostname or ''}{port}{parts.path}"


class SharedIndex:
    """The Redis-backed corpus index for one output folder (``owner``)."""

    def __init__(self, url: str, name: str, owner: str, threshold: float):
        self.config = connection_settings(url)
        try:
            import redis
        except ImportError:
            raise UsageError("--index needs the 'redis' package: pip install "
                             "'gate[cluster]'") from None
        from datasketch import MinHashLSH
        self.url = display_url(url)
        self.name = name
        self.owner = owner
        self.prefix = f"gate:{name}:"
        self.redis = redis.Redis(**self.config)
        try:
            self.redis.ping()
        except redis.RedisError as err:
            raise UsageError(f"cannot reach the index at {self.url} ({redact.text(str(err))}); "
                             "start Redis or "
                             "run without --index.") from None
        bands, rows = dup.band_params(threshold)
        self.layout = f"{bands}x{rows}"
        basename = (f"gate:{name}:lsh:{dup.NUM_PERM}:{bands}x{rows}:{dup.SCHEME}:"
                    f"{dup.SEED}").encode()
        self.lsh = MinHashLSH(num_perm=dup.NUM_PERM, params=(bands, rows),
                              storage_config={"type": "redis", "basename": basename,
                                              "redis": {k: v for k, v in self.config.items()
                                                        if v is not None}})
        self._token = f"{owner}:{socket.gethostname()}:{os.getpid()}"

    # -- one run at a time -------------------------------------------------------------

    def lock(self) -> None:
        key = self.prefix + "lock"
        if not self.redis.set(key, self._token, nx=True, ex=LOCK_SECONDS):
            holder = self.redis.get(key)
            holder = holder.decode(errors="replace") if holder else "unknown"
            if holder.split(":")[0] == self.owner:  # our own folder, a killed earlier run
                self.redis.set(key, self._token, ex=LOCK_SECONDS)
                return
            raise LockError(f"the index {self.name!r} at {self.url} is in use by another gate "
                            f"run ({holder}); runs sharing an index must not overlap. It "
                            f"frees itself within {LOCK_SECONDS // 3600} h if that run died.")

    def unlock(self) -> None:
        key = self.prefix + "lock"
        if self.redis.get(key) == self._token.encode():
            self.redis.delete(key)

    # -- queries -----------------------------------------------------------------------

    def _member(self, doc_id: str) -> str:
        return f"{self.owner}:{doc_id}"

    def candidates(self, batch: list[dup.Item], *, batch_ids: set[str],
                   include_own: bool) -> list[dup.Item]:
        """Stored documents that could be duplicates of the batch, as duplicate Items."""
        members: set[str] = set()
        pipe = self.redis.pipeline(transaction=False)
        for item in batch:
            pipe.smembers(self.prefix + "sha:" + item.sha256)
            if item.text_sha256:
                pipe.smembers(self.prefix + "text:" + item.text_sha256)
        for found in pipe.execute():
            members.update(m.decode() for m in found)
        members.update(self._lsh_candidates([dup.lean(item.minhash) for item in batch
                                             if item.minhash is not None]))
        out: list[dup.Item] = []
        wanted = sorted(members)
        metas = self.redis.hmget(self.prefix + "meta", wanted) if wanted else []
        for member, raw in zip(wanted, metas):
            if raw is None:
                continue
            meta = json.loads(raw)
            owner, _, doc_id = member.partition(":")
            own = owner == self.owner
            if own and (not include_own or doc_id in batch_ids):
                continue
            from datetime import datetime
            out.append(dup.Item(
                key=doc_id if own else member, path=meta["path"] if own else
                f"{meta['path']} (accepted in {owner})", sha256=meta["sha256"],
                text_sha256=meta.get("text_sha256"),
                minhash=bytes.fromhex(meta["minhash"]) if meta.get("minhash") else None,
                trust=meta["trust"], date=datetime.fromisoformat(meta["date"])
                if meta.get("date") else None, seen=(meta["first_seen"], -1), in_batch=False,
                accepted_before=True, fixed=not own))
        return out

    def _lsh_candidates(self, sketches: list[Any]) -> set[str]:
        """The union of ``lsh.query`` over many sketches, with one Redis round trip per
        band for up to QUERY_CHUNK sketches instead of one per band and sketch (the
        bucket keys are computed as datasketch's ``query`` does, by its ``_H``)."""
        lsh, found = self.lsh, set()
        for start in range(0, len(sketches), QUERY_CHUNK):
            chunk = sketches[start:start + QUERY_CHUNK]
            for (lo, hi), table in zip(lsh.hashranges, lsh.hashtables):
                for keys in table.getmany(*[lsh._H(m.hashvalues[lo:hi]) for m in chunk]):
                    found.update(keys)
        if lsh.prepickle:  # keys are stored pickled (datasketch's default with Redis)
            found = {pickle.loads(key) for key in found}
        return {k.decode() if isinstance(k, bytes) else k for k in found}

    # -- keeping it in line with the folder's corpus -------------------------------------

    def sync(self, state: Any) -> tuple[int, int]:
        """Make the index hold exactly this folder's accepted corpus; (added, removed).

        Only the documents that changed are read in full, in batches, so syncing a large
        corpus does not load every sketch at once."""
        # the owner set is kept per LSH layout: an index first built with other bands and
        # rows holds none of this folder's documents in the buckets read now
        owner_key = self.prefix + "owner:" + self.layout + ":" + self.owner
        current = sorted(m.decode() for m in self.redis.smembers(owner_key))
        desired = {self._member(doc_id): sha for doc_id, sha in state.corpus_digests()}
        stale: list[tuple[str, dict[str, Any]]] = []
        for start in range(0, len(current), 1000):
            members = current[start:start + 1000]
            for member, raw in zip(members, self.redis.hmget(self.prefix + "meta", members)):
                meta = json.loads(raw) if raw else {}
                if desired.get(member) != meta.get("sha256"):
                    stale.append((member, meta))
        for member, meta in stale:
            if member in self.lsh:
                self.lsh.remove(member)
            pipe = self.redis.pipeline()
            pipe.hdel(self.prefix + "meta", member)
            pipe.srem(owner_key, member)
            if meta.get("sha256"):
                pipe.srem(self.prefix + "sha:" + meta["sha256"], member)
            if meta.get("text_sha256"):
                pipe.srem(self.prefix + "text:" + meta["text_sha256"], member)
            pipe.execute()
        present = set(current) - {member for member, _meta in stale}
        missing = sorted(m for m in desired if m not in present)
        added = 0
        for start in range(0, len(missing), 500):
            ids = [m.partition(":")[2] for m in missing[start:start + 500]]
            rows = state.corpus_rows(ids)
            # the sketches first: a member of the owner set is fully indexed, so a sync
            # killed in between inserts the chunk again on the next run
            with self.lsh.insertion_session() as session:
                for row in rows:
                    if row["minhash"]:
                        session.insert(self._member(row["doc_id"]), dup.lean(row["minhash"]),
                                       check_duplication=False)
            pipe = self.redis.pipeline()  # one round trip for the chunk's documents
            for row in rows:
                member = self._member(row["doc_id"])
                meta = {"path": row["path"], "sha256": row["sha256"],
                        "text_sha256": row["text_sha256"],
                        "minhash": row["minhash"].hex() if row["minhash"] else None,
                        "trust": row["trust"], "date": row["date"],
                        "first_seen": row["first_seen"]}
                pipe.hset(self.prefix + "meta", member, json.dumps(meta, sort_keys=True))
                pipe.sadd(owner_key, member)
                pipe.sadd(self.prefix + "sha:" + row["sha256"], member)
                if row["text_sha256"]:
                    pipe.sadd(self.prefix + "text:" + row["text_sha256"], member)
                added += 1
            pipe.execute()
        return added, len(stale)
