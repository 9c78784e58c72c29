"""Placement: materialise ``accepted/`` and ``quarantine/`` from the state database.

Every document has one entry folder named by its id, ``accepted/<id>/`` or
``quarantine/<id>/``. An entry is assembled in ``state/tmp/``, its files are flushed to
disk, and only then is the whole folder renamed into place, so a reader never sees a
half-written entry. Replacing an entry renames the old one aside first; the entry for the
same id in the other folder is removed after the new one is in place. Each placement is
idempotent and marked done in the database only after it is durable, so a run killed at
any moment is finished by applying the placements not yet marked.

Originals come from the content-addressed staging area ``state/blobs/`` (the exact bytes
that were hashed and checked, never re-read from the inbox) or, when unchanged, from the
document's existing entry; they are hard-linked where possible and made read-only.
"""

from __future__ import annotations

import contextlib
import json
import os
import re
import shutil
import zlib
from collections.abc import Iterable, Iterator
from dataclasses import dataclass
from pathlib import Path
from typing import Any

from gate import jsontext, provjson
from gate.state import State, text_z_of

FOLDERS = ("accepted", "quarantine")


def _fsync_dir(path: Path) -> None:
    try:
        fd = os.open(path, os.O_RDONLY | os.O_DIRECTORY)
    except OSError:
        return
    try:
        os.fsync(fd)
    finally:
        os.close(fd)


def write_file(path: Path | str, data: bytes, *, sync: bool = True) -> None:
    # os-level calls: a buffered file object costs twice the system time per small file
    fd = os.open(path, os.O_WRONLY | os.O_CREAT | os.O_TRUNC | os.O_CLOEXEC, 0o666)
    try:
        view = memoryview(data)
        while view:
            view = view[os.write(fd, view):]
        if sync:
            os.fsync(fd)
    finally:
        os.close(fd)


def write_atomic(path: Path, data: bytes) -> None:
    """Write then rename, so ``path`` is always either the old or the new content."""
    tmp = path.with_name(f".{path.name}.tmp-{os.getpid()}")
    write_file(tmp, data)
    os.replace(tmp, path)
    _fsync_dir(path.parent)


class Blobs:
    """Content-addressed copies of the bytes that were checked, kept until placement."""

    def __init__(self, root: Path):
        self.root = root
        self._made: set[Path] = set()

    def path(self, sha256: str) -> Path:
        return self.root / sha256[:2] / sha256

    def has(self, sha256: str) -> bool:
        return self.path(sha256).exists()

    def put(self, sha256: str, data: bytes) -> None:
        target = self.path(sha256)
        if target.exists():
            return
        if target.parent not in self._made:  # one mkdir per folder, not per file
            target.parent.mkdir(parents=True, exist_ok=True)
            self._made.add(target.parent)
        tmp = target.with_name(f".{sha256}.tmp-{os.getpid()}")
        write_file(tmp, data, sync=False)  # made durable by one sync before deciding
        os.replace(tmp, target)

    def clear(self, remove: Any = None) -> None:
        """Remove the staged copies (``remove``: a function that removes a folder, where
        the run's worker pool offers one: :meth:`gate.cluster.ClusterExecutor.remove_tree`)."""
        if remove is not None:
            remove(self.root)
        else:
            shutil.rmtree(self.root, ignore_errors=True)
        self._made.clear()


class Placer:
    """Applies placements: (document id, target folder, payload)."""

    def __init__(self, out: Path, state: State, blobs: Blobs):
        self.out = out
        self.state = state
        self.blobs = blobs
        self.tmp = out / "state" / "tmp"
        self.trash = out / "state" / "trash"
        for folder in FOLDERS:
            (out / folder).mkdir(parents=True, exist_ok=True)
        self.tmp.mkdir(parents=True, exist_ok=True)
        self.trash.mkdir(parents=True, exist_ok=True)

    def entry(self, folder: str, doc_id: str) -> Path:
        return self.out / folder / doc_id

    def has_original(self, folder: str, doc_id: str) -> bool:
        """Whether the entry placed in ``folder`` holds a copy of its original."""
        return folder in FOLDERS and (self.entry(folder, doc_id) / "original").exists()

    def original_path(self, doc_id: str, sha256: str | None) -> Path | None:
        """Where the staged (or placed) bytes of a document are, unread and unverified."""
        return _source(self.out, doc_id, sha256)

    def _aside(self, path: Path) -> None:
        try:
            os.lstat(path)  # one call for "exists or is a (dangling) link"
        except (FileNotFoundError, NotADirectoryError):
            return
        target = self.trash / f"{path.parent.name}-{path.name}-{os.getpid()}"
        if target.exists():
            shutil.rmtree(target, ignore_errors=True)
        os.replace(path, target)

    def build(self, doc_id: str, target: str, payload: dict[str, Any]) -> Path | None:
        """Assemble an entry in state/tmp (not yet visible). None for removals."""
        if target == "absent":
            return None
        text = self.state.cache_text_z(payload["text_key"]) if payload.get("text_key") \
            else None
        return build_entry(self.out, doc_id, target, payload, text)

    def install(self, doc_id: str, target: str, build: Path | None) -> None:
        """Make an assembled entry visible (one rename) and remove the other folder's."""
        if target == "absent":
            for folder in FOLDERS:
                self._aside(self.entry(folder, doc_id))
            return
        assert build is not None
        other = "quarantine" if target == "accepted" else "accepted"
        final = self.entry(target, doc_id)
        self._aside(final)
        os.replace(build, final)
        self._aside(self.entry(other, doc_id))

    def apply_batch(self, placements: list[tuple[str, str, Any]],
                    pool: Any = None, prebuilt: dict[str, str] | None = None) -> None:
        """Apply placements durably with two syncs for the whole batch, not per file:
        every entry is written in state/tmp, everything is flushed to disk, only then are
        the entries renamed into place, and the renames are flushed before the caller
        marks them done. A crash at any point leaves either the old entry or the complete
        new one visible, and the placements not yet marked are simply applied again.

        A payload may be its JSON text. With a ``pool`` (the run's worker pool, local or
        on the cluster) the entries are assembled by its workers (:class:`BuildTask`),
        this process only renames them into place; one a worker could not build is built
        here. ``prebuilt``: document id -> target of the entries :meth:`build_ahead`
        already assembled in state/tmp for these placements."""
        tmp = self.tmp
        built: list[tuple[str, str, Path | None]] = []
        prebuilt = prebuilt or {}
        if pool is None:
            for doc_id, target, payload in placements:
                if target != "absent" and prebuilt.get(doc_id) == target:
                    built.append((doc_id, target, tmp / doc_id))
                    continue
                payload = json.loads(payload) if isinstance(payload, str) else payload
                built.append((doc_id, target, self.build(doc_id, target, payload)))
        else:
            todo = []
            for doc_id, target, payload in placements:
                if target == "absent":
                    built.append((doc_id, target, None))
                elif prebuilt.get(doc_id) == target:
                    built.append((doc_id, target, tmp / doc_id))
                else:
                    todo.append((doc_id, target, payload))
            for (doc_id, target, raw), answer in pool.run(self._build_tasks(todo, pool)):
                if answer is not True:  # the worker failed: build it here
                    self.build(doc_id, target, json.loads(raw))
                built.append((doc_id, target, tmp / doc_id))
        os.sync()
        for doc_id, target, path in built:
            self.install(doc_id, target, path)
        os.sync()

    def _build_tasks(self, placements: list[tuple[str, str, Any]], pool: Any
                     ) -> list[tuple[tuple[str, str, str], BuildTask]]:
        """(tag, task) for each entry a worker of ``pool`` is to assemble (no removals),
        their texts read from the cache in one query."""
        todo = []
        for doc_id, target, payload in placements:
            raw = payload if isinstance(payload, str) else json.dumps(payload)
            todo.append((doc_id, target, raw, _text_key(raw)))
        texts = self.state.cache_texts_stored(key for *_, key in todo if key)
        out, sync = str(self.out), getattr(pool, "remote", False)
        return [((doc_id, target, raw),
                 BuildTask(out, doc_id, target, raw, texts.get(key) if key else None,
                           sync=sync))
                for doc_id, target, raw, key in todo]

    @contextlib.contextmanager
    def ahead(self) -> Iterator[dict[str, str]]:
        """A record of entries :meth:`build_ahead` assembles; they are removed from
        state/tmp if the block raises (their decisions were never committed). What
        state/tmp holds on entering is a killed run's (before a commit, no placement is
        outstanding): removed first."""
        for leftover in os.listdir(self.tmp):
            shutil.rmtree(self.tmp / leftover, ignore_errors=True)
        built: dict[str, str] = {}
        try:
            yield built
        except BaseException:
            for doc_id in built:
                shutil.rmtree(self.tmp / doc_id, ignore_errors=True)
            raise

    def build_ahead(self, groups: Iterable[list[tuple[str, str, str]]], pool: Any,
                    built: dict[str, str]) -> None:
        """Have ``pool``'s workers assemble entries in state/tmp (not visible) while the
        groups of placements (document id, target, payload JSON) are still being decided:
        the pool takes the next group when a worker is free, so deciding and assembling
        overlap. Adds document id -> target of each entry assembled to ``built``
        (:meth:`ahead`); the caller applies them with :meth:`apply_batch` once the
        decisions are committed (an entry not assembled is assembled then)."""

        def tasks() -> Iterator[tuple[tuple[str, str, str], BuildTask]]:
            for group in groups:
                yield from self._build_tasks(
                    [(doc_id, target, raw) for doc_id, target, raw in group
                     if target != "absent"], pool)

        for (doc_id, target, _raw), answer in pool.run(tasks()):
            if answer is True:
                built[doc_id] = target

    def empty_trash(self) -> None:
        for item in self.trash.iterdir():
            if item.is_dir() and not item.is_symlink():
                shutil.rmtree(item, ignore_errors=True)
            else:
                item.unlink(missing_ok=True)


# the head of a placement's payload as gate.commit writes it (json.dumps, keys in order)
_HEAD = re.compile(r'\{"path": ("(?:[^"\\]|\\.)*"), "sha256": (?:null|"[0-9a-f]*"), '
                   r'"text_key": (null|"[^"\\]*")')


def payload_head(raw: str) -> tuple[str | None, str | None]:
    """(path, text key) of a placement's payload JSON, read from its head alone (the
    record after it is large); the whole is parsed when the head is not as written."""
    match = _HEAD.match(raw)
    if match is None:
        payload = json.loads(raw)
        return payload.get("path"), payload.get("text_key")
    return json.loads(match.group(1)), json.loads(match.group(2))


def _text_key(raw: str) -> str | None:
    return payload_head(raw)[1]


def build_entry(out: Path, doc_id: str, target: str, payload: dict[str, Any],
                text_z: bytes | None) -> Path:
    """Assemble an entry in ``out/state/tmp/<doc_id>`` (not yet visible): its original
    (a hard link to the staged bytes, or to the placed entry's), text.txt from the
    compressed text (or the file under state/texts its reference names), and the record
    files. Runs in the coordinator or in a worker."""
    tmp = out / "state" / "tmp"
    build = tmp / doc_id
    try:
        os.mkdir(build)
    except OSError:  # a killed run's half-built entry, or no state/tmp yet
        shutil.rmtree(build, ignore_errors=True)
        build.mkdir(parents=True)
    source = _source(out, doc_id, payload.get("sha256"))
    if payload.get("sha256") and source is None and not payload.get("reused"):
        raise FileNotFoundError(f"the staged copy of {payload['path']!r} is missing")
    if source is not None:
        dest = build / "original"
        try:
            os.link(source, dest)
        except OSError:
            shutil.copyfile(source, dest)
        os.chmod(dest, 0o444)
    if text_z is not None:
        write_file(build / "text.txt", zlib.decompress(text_z_of(out / "state", text_z)),
                   sync=False)
    record_name = "provenance.json" if target == "accepted" else "reasons.json"
    record = jsontext.dumps(payload["record"])
    write_file(build / record_name, record.encode("utf-8", "surrogatepass") + b"\n",
               sync=False)
    if target == "accepted":  # the same facts in W3C PROV-JSON (gate.provjson)
        prov = jsontext.dumps(provjson.from_record(payload["record"]))
        write_file(build / provjson.FILE_NAME, prov.encode("utf-8", "surrogatepass") + b"\n",
                   sync=False)
    return build


def _source(out: Path, doc_id: str, sha256: str | None) -> Path | None:
    """The bytes an entry's original is made from: the staged copy, else the copy the
    document's placed entry holds."""
    if sha256 is None:
        return None
    staged = out / "state" / "blobs" / sha256[:2] / sha256
    if staged.exists():
        return staged
    for folder in FOLDERS:
        candidate = out / folder / doc_id / "original"
        if candidate.exists():
            return candidate
    return None


@dataclass(frozen=True)
class BuildTask:
    """One entry assembled by a worker (its payload as JSON text, its text compressed or
    a reference to the file holding it, which the worker reads);
    ``sync``: flush the files where they are written (a cluster node)."""

    out: str
    doc_id: str
    target: str
    payload: str
    text_z: bytes | None
    sync: bool = False

    @property
    def size(self) -> int:
        return len(self.payload) + len(self.text_z or b"")

    def run(self) -> bool:
        build_entry(Path(self.out), self.doc_id, self.target, json.loads(self.payload),
                    self.text_z)
        return True
