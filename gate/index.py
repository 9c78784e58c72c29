"""A shared near-duplicate index in Redis (``--index redis://host:port/db``).

By default the duplicate check builds its MinHash LSH in memory from the corpus state of
the output folder. With ``--index``, the sketches of accepted documents live in Redis,
under a name (``--index-name``, default ``default``), so that:

* a run only fetches the stored documents that are LSH candidates of its batch, instead of
  loading the whole corpus, and
* several output folders (several teams' inboxes, or shards of one) share one index: a
  document accepted by one folder is a known keeper for all of them.

Decisions for one folder are the same as without ``--index``. Documents another folder
accepted are fixed keepers: a copy of one is held here, and gate never supersedes another
folder's documents. The index is brought in line with the folder's corpus state at the end
of every run and review, as part of committing (a killed run re-syncs when it resumes).
Runs sharing an index must not overlap; a lock in Redis refuses a second one.

The LSH buckets are gate's own layout (the bands of the duplicate check, ``dup.band_params``):
a bucket is a set of members under ``gate:<name>:lsh<tag>:<band>:<digest>``, where
``<digest>`` is the first 16 hex digits of the SHA-1 of the band's MinHash values (little-
endian 32-bit, as stored) and ``<tag>`` a short hash of the layout (permutations, bands,
rows, scheme, seed), so an index built with other parameters is never read by mistake.
Candidates of a batch are fetched by one Lua script for up to QUERY_CHUNK documents
(one ``SUNION`` per band, the exact-copy sets, the candidates' metadata and sketches), and
documents are added and removed by one script per chunk; the scripts compute the bucket
keys themselves (``redis.sha1hex``), so a document costs the coordinator a few arguments
and no command per band.

Other keys: ``gate:<name>:meta`` (hash: member -> JSON of path, digests, trust, date,
first seen), ``gate:<name>:sketch`` (hash: member -> the MinHash values, 1 KiB binary),
``gate:<name>:owner:<tag>:<folder>`` (set of a folder's members, per layout: an index
first built with another layout, or by an earlier gate with datasketch's buckets, is
filled again by the next sync; a member is added to it last, after its buckets),
``gate:<name>:sha:<digest>`` and ``gate:<name>:text:<digest>`` (sets, exact copies) and
``gate:<name>:lock``.
"""

from __future__ import annotations

import hashlib
import json
import os
import socket
from datetime import datetime
from typing import Any
from urllib.parse import urlsplit

from gate import redact
from gate.checks import duplicate as dup
from gate.errors import LockError, UsageError

LOCK_SECONDS = 6 * 3600
QUERY_CHUNK = 500  # documents whose candidates are fetched by one script
SYNC_CHUNK = 500  # documents added or removed by one script

# KEYS: meta, sketch, owner set. ARGV: the bucket prefix, rows per band (bytes: 4 x rows),
# bands, the sha/text prefix, then per document: member, meta JSON, sketch, sha256,
# text sha256 ('' when none). The buckets, digests and meta first, the owner set last.
_ADD = """
local prefix, width, bands, exact = ARGV[1], tonumber(ARGV[2]), tonumber(ARGV[3]), ARGV[4]
for i = 5, #ARGV, 5 do
  local member, sketch = ARGV[i], ARGV[i + 2]
  if #sketch > 0 then
    for band = 0, bands - 1 do
      local key = prefix .. band .. ':' ..
        string.sub(redis.sha1hex(string.sub(sketch, band * width + 1, (band + 1) * width)), 1, 16)
      redis.call('SADD', key, member)
    end
    redis.call('HSET', KEYS[2], member, sketch)
  end
  redis.call('HSET', KEYS[1], member, ARGV[i + 1])
  redis.call('SADD', exact .. 'sha:' .. ARGV[i + 3], member)
  if #ARGV[i + 4] > 0 then redis.call('SADD', exact .. 'text:' .. ARGV[i + 4], member) end
end
for i = 5, #ARGV, 5 do redis.call('SADD', KEYS[3], ARGV[i]) end
return 0
"""

# The same KEYS and first ARGV; per document of a batch: its sketch ('' when none),
# sha256 and text sha256 ('' when none). Returns member, meta JSON and sketch (false when
# none) of every stored document sharing a bucket or a digest with one of them: one
# SUNION per band for the batch, every bucket key computed here.
_QUERY = """
local prefix, width, bands, exact = ARGV[1], tonumber(ARGV[2]), tonumber(ARGV[3]), ARGV[4]
local found, keys = {}, {}
for band = 0, bands - 1 do
  local head = prefix .. band .. ':'
  local n = 0
  for i = 5, #ARGV, 3 do
    local sketch = ARGV[i]
    if #sketch > 0 then
      n = n + 1
      keys[n] = head ..
        string.sub(redis.sha1hex(string.sub(sketch, band * width + 1, (band + 1) * width)), 1, 16)
    end
  end
  if n > 0 then
    for _, member in ipairs(redis.call('SUNION', unpack(keys, 1, n))) do found[member] = true end
  end
end
for i = 5, #ARGV, 3 do
  for _, member in ipairs(redis.call('SMEMBERS', exact .. 'sha:' .. ARGV[i + 1])) do
    found[member] = true
  end
  if #ARGV[i + 2] > 0 then
    for _, member in ipairs(redis.call('SMEMBERS', exact .. 'text:' .. ARGV[i + 2])) do
      found[member] = true
    end
  end
end
local out = {}
for member in pairs(found) do
  local meta = redis.call('HGET', KEYS[1], member)
  if meta then
    out[#out + 1] = member
    out[#out + 1] = meta
    out[#out + 1] = redis.call('HGET', KEYS[2], member)
  end
end
return out
"""

# The same KEYS and first ARGV; per document: member, sha256, text sha256 ('' when none).
# Leaves the owner set first, then its buckets (read from its stored sketch) and the rest.
_REMOVE = """
local prefix, width, bands, exact = ARGV[1], tonumber(ARGV[2]), tonumber(ARGV[3]), ARGV[4]
for i = 5, #ARGV, 3 do redis.call('SREM', KEYS[3], ARGV[i]) end
for i = 5, #ARGV, 3 do
  local member = ARGV[i]
  local sketch = redis.call('HGET', KEYS[2], member)
  if sketch then
    for band = 0, bands - 1 do
      local key = prefix .. band .. ':' ..
        string.sub(redis.sha1hex(string.sub(sketch, band * width + 1, (band + 1) * width)), 1, 16)
      redis.call('SREM', key, member)
    end
  end
  redis.call('HDEL', KEYS[2], member)
  redis.call('HDEL', KEYS[1], member)
  if #ARGV[i + 1] > 0 then redis.call('SREM', exact .. 'sha:' .. ARGV[i + 1], member) end
  if #ARGV[i + 2] > 0 then redis.call('SREM', exact .. 'text:' .. ARGV[i + 2], member) end
end
return 0
"""


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


def bucket_digests(sketch: bytes, bands: int, rows: int) -> list[str]:
    """The bucket of each band for a sketch, as the Lua scripts compute them (the
    reference the tests check them against)."""
    width = 4 * rows
    return [hashlib.sha1(sketch[band * width:(band + 1) * width]).hexdigest()[:16]
            for band in range(bands)]


class SharedIndex:
    """The Redis-backed corpus index for one output folder (``owner``)."""

    def __init__(self, url: str, name: str, owner: str, threshold: float):
        self.config = connection_settings(url)
        try:
            import redis
        except ImportError:
            raise UsageError("--index needs the 'redis' package: pip install "
                             "'gate[cluster]'") from None
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
        self.bands, self.rows = dup.band_params(threshold)
        layout = f"{dup.NUM_PERM}:{self.bands}x{self.rows}:{dup.SCHEME}:{dup.SEED}"
        tag = hashlib.sha1(layout.encode()).hexdigest()[:6]
        self.buckets = f"{self.prefix}lsh{tag}:"
        self.owner_key = f"{self.prefix}owner:{tag}:{owner}"
        self._query = self.redis.register_script(_QUERY)
        self._add = self.redis.register_script(_ADD)
        self._remove = self.redis.register_script(_REMOVE)
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
        keys = [self.prefix + "meta", self.prefix + "sketch"]
        found: dict[str, tuple[bytes, bytes | None]] = {}
        for start in range(0, len(batch), QUERY_CHUNK):
            args = self._script_args()
            for item in batch[start:start + QUERY_CHUNK]:
                args += [item.minhash or b"", item.sha256, item.text_sha256 or ""]
            flat = self._query(keys=keys, args=args)
            for at in range(0, len(flat), 3):
                found[flat[at].decode()] = (flat[at + 1], flat[at + 2] or None)
        out: list[dup.Item] = []
        for member in sorted(found):
            raw, sketch = found[member]
            meta = json.loads(raw)
            owner, _, doc_id = member.partition(":")
            own = owner == self.owner
            if own and (not include_own or doc_id in batch_ids):
                continue
            if sketch is None and meta.get("minhash"):  # written by an earlier gate
                sketch = bytes.fromhex(meta["minhash"])
            out.append(dup.Item(
                key=doc_id if own else member, path=meta["path"] if own else
                f"{meta['path']} (accepted in {owner})", sha256=meta["sha256"],
                text_sha256=meta.get("text_sha256"), minhash=sketch,
                trust=meta["trust"], date=datetime.fromisoformat(meta["date"])
                if meta.get("date") else None, seen=(meta["first_seen"], -1), in_batch=False,
                accepted_before=True, fixed=not own))
        return out

    # -- keeping it in line with the folder's corpus -------------------------------------

    def _script_args(self) -> list[Any]:
        return [self.buckets, 4 * self.rows, self.bands, self.prefix]

    def sync(self, state: Any) -> tuple[int, int]:
        """Make the index hold exactly this folder's accepted corpus; (added, removed).

        Only the documents that changed are read in full, in batches, so syncing a large
        corpus does not load every sketch at once."""
        keys = [self.prefix + "meta", self.prefix + "sketch", self.owner_key]
        current = sorted(m.decode() for m in self.redis.smembers(self.owner_key))
        desired = {self._member(doc_id): sha for doc_id, sha in state.corpus_digests()}
        stale: list[tuple[str, dict[str, Any]]] = []
        for start in range(0, len(current), 1000):
            members = current[start:start + 1000]
            for member, raw in zip(members, self.redis.hmget(self.prefix + "meta", members)):
                meta = json.loads(raw) if raw else {}
                if desired.get(member) != meta.get("sha256"):
                    stale.append((member, meta))
        for start in range(0, len(stale), SYNC_CHUNK):
            args = self._script_args()
            for member, meta in stale[start:start + SYNC_CHUNK]:
                args += [member, meta.get("sha256") or "", meta.get("text_sha256") or ""]
            self._remove(keys=keys, args=args)
        present = set(current) - {member for member, _meta in stale}
        missing = sorted(m for m in desired if m not in present)
        added = 0
        for start in range(0, len(missing), SYNC_CHUNK):
            ids = [m.partition(":")[2] for m in missing[start:start + SYNC_CHUNK]]
            args = self._script_args()
            for row in state.corpus_rows(ids):
                meta = {"path": row["path"], "sha256": row["sha256"],
                        "text_sha256": row["text_sha256"], "trust": row["trust"],
                        "date": row["date"], "first_seen": row["first_seen"]}
                args += [self._member(row["doc_id"]), json.dumps(meta, sort_keys=True),
                         row["minhash"] or b"", row["sha256"], row["text_sha256"] or ""]
                added += 1
            # one script a chunk: a member joins the owner set after its buckets, so a
            # sync killed before the script ran adds the chunk again on the next run
            self._add(keys=keys, args=args)
        return added, len(stale)
