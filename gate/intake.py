"""Intake: read each document once, safely, hash it and stage it -- where the work runs.

A worker process (local, or on a cluster node that sees the same storage) opens each file
itself with ``O_NOFOLLOW`` (a file swapped for a link after discovery is not followed) and
``O_NONBLOCK`` (a file swapped for a FIFO cannot hang the run), checks it is still a
regular file, and reads at most ``limits.max_bytes`` of it. Larger files are hashed as a
stream and never parsed. The bytes read are hashed, written to the content-addressed
staging area (``state/blobs/<sha256>``, a temporary name then one rename), and extracted
and measured from the same buffer: the bytes checked are the staged bytes, and those are
the bytes placed. The inbox is not read a second time; the coordinating process receives
the digest with the results and never reads the document (:class:`FileTask`).

The coordinator reads a file itself only when the worker gave no answer (it was killed by
a time-out, its memory cap or a crash): it then needs the digest and the bytes to place the
document in quarantine (:func:`read_entry`).
"""

from __future__ import annotations

import errno
import hashlib
import os
import stat
import zlib
from dataclasses import dataclass
from pathlib import Path
from typing import Any

from gate.discovery import Entry
from gate.placement import write_file

CHUNK = 1 << 20


@dataclass
class Intake:
    """What reading one inbox entry produced."""

    data: bytes | None = None  # the bytes, when the file is within max_bytes
    sha256: str | None = None
    size: int | None = None
    problem: str | None = None  # unreadable | not-regular | too-large
    detail: str = ""


def _open(path: str) -> int:
    return os.open(path, os.O_RDONLY | os.O_NOFOLLOW | os.O_NONBLOCK | os.O_CLOEXEC)


def read_entry(inbox: Path, entry: Entry, max_bytes: int) -> Intake:
    """Read and hash one regular-file entry (other kinds are not opened at all)."""
    if not entry.regular:
        return Intake(problem="not-regular")
    return read_path(os.path.join(os.fspath(inbox), entry.fs_path), max_bytes)


def read_path(full: str, max_bytes: int) -> Intake:
    """Read and hash the regular file at ``full`` (see the module docstring)."""
    try:
        fd = _open(full)
    except OSError as err:
        if err.errno == errno.ELOOP:
            return Intake(problem="not-regular", detail="it became a symbolic link")
        return Intake(problem="unreadable", detail=err.strerror or str(err))
    try:
        st = os.fstat(fd)
        if not stat.S_ISREG(st.st_mode):
            return Intake(problem="not-regular", detail="it is no longer a regular file")
        digest = hashlib.sha256()
        if st.st_size > max_bytes:
            size = 0
            while chunk := os.read(fd, CHUNK):
                digest.update(chunk)
                size += len(chunk)
            return Intake(sha256=digest.hexdigest(), size=size, problem="too-large")
        parts: list[bytes] = []
        size = 0
        while chunk := os.read(fd, CHUNK):
            parts.append(chunk)
            digest.update(chunk)
            size += len(chunk)
            if size > max_bytes:  # the file grew while we read it
                while more := os.read(fd, CHUNK):
                    digest.update(more)
                    size += len(more)
                return Intake(sha256=digest.hexdigest(), size=size, problem="too-large")
        return Intake(data=b"".join(parts), sha256=digest.hexdigest(), size=size)
    except OSError as err:
        return Intake(problem="unreadable", detail=err.strerror or str(err))
    finally:
        os.close(fd)


# -- the worker side ---------------------------------------------------------------------

SPECULATE = frozenset({"html", "pdf"})  # types measured only once their template is known


def stage(root: str, sha256: str, data: bytes) -> None:
    """Write ``data`` to the staging area under its digest (temporary name, then one
    rename, so a staged name always holds complete bytes). Made durable by one sync for
    many: the coordinator's before it decides, and on a cluster node one per batch
    (:func:`gate.cluster.run_batch`)."""
    folder = os.path.join(root, sha256[:2])
    target = os.path.join(folder, sha256)
    if os.path.exists(target):
        return
    tmp = os.path.join(folder, f".{sha256}.tmp-{os.getpid()}")
    try:
        write_file(tmp, data, sync=False)
    except FileNotFoundError:  # the folder's first blob (no mkdir call for every file)
        os.makedirs(folder, exist_ok=True)
        write_file(tmp, data, sync=False)
    os.replace(tmp, target)


def _with_site(task: tuple[Any, ...], data: bytes, site: bool) -> tuple[Any, ...]:
    """A page of a site: HTML and PDF are only extracted for their blocks until the
    site's template is known; other types are measured at once (see :class:`FileTask`)."""
    from gate.extract.sniff import sniff
    if not site:
        return task
    return task + (None if sniff(data).type in SPECULATE else (),)


@dataclass(frozen=True)
class FileTask:
    """One inbox file for a worker: read, hash, stage, then extract and measure.

    ``skip``: a digest the coordinator already holds results for (the file's digest in the
    last run, found in the cache); when the bytes still hash to it, nothing is extracted.
    ``probe``: only read, hash and stage (a resumed run: the coordinator looks the digest
    up in the cache first). ``placed``: the digest of the original its placed entry holds
    (not staged again). ``site``: whether the page belongs to a site (its template is
    learnt first: :mod:`gate.templates`); HTML and PDF pages of a site are then only
    extracted for their blocks, other types are measured at once, since a text file
    seldom carries a template (if it does, it is measured again without it)."""

    path: str  # the display path
    full: str  # the path to open
    max_bytes: int
    params: Any
    stage_root: str
    site: bool = False
    skip: str | None = None
    placed: str | None = None
    probe: bool = False
    sync: bool = False  # the node flushes what it staged before answering (a cluster)
    size: int = 0  # the size discovery saw (how tasks are batched)
    subject: Any = None  # evaluate it once measured (gate.judge.Subject), or None

    def run(self) -> dict[str, Any]:
        from gate.work import process
        intake = read_path(self.full, self.max_bytes)
        out: dict[str, Any] = {"intake": {"sha256": intake.sha256, "size": intake.size,
                                          "problem": intake.problem,
                                          "detail": intake.detail}}
        if intake.problem is not None or intake.data is None:
            return out
        if intake.sha256 != self.placed:
            stage(self.stage_root, intake.sha256, intake.data)
        if intake.sha256 == self.skip or self.probe:
            return out
        task = _with_site((self.path, intake.data, self.params), intake.data, self.site)
        out["result"] = _judged(packed(process(task)), self.subject,
                                Intake(**out["intake"]))
        return out


@dataclass(frozen=True)
class StagedTask:
    """A staged document extracted from its staged copy (after a probe, or again with
    its site's template removed): the worker checks the digest before using the bytes.
    ``extra``: the template to remove and the text extracted before (compressed); None
    for a first extraction."""

    path: str
    source: str  # the staged copy (or the placed original holding the same bytes)
    sha256: str
    params: Any
    site: bool = False
    extra: tuple[Any, bytes | None] | None = None
    subject: Any = None  # evaluate it once measured (gate.judge.Subject), or None

    @property
    def size(self) -> int:
        try:
            return os.stat(self.source).st_size
        except OSError:
            return 0

    def run(self) -> dict[str, Any]:
        from gate.work import process
        try:
            with open(self.source, "rb") as fh:
                data = fh.read()
        except OSError:
            data = None
        if data is None or hashlib.sha256(data).hexdigest() != self.sha256:
            return {"missing": True}
        if self.extra is None:
            task = _with_site((self.path, data, self.params), data, self.site)
        else:
            drop, earlier = self.extra
            task = (self.path, data, self.params, drop,
                    zlib.decompress(earlier).decode("utf-8", "surrogatepass")
                    if earlier is not None else None)
        return {"result": _judged(packed(process(task)), self.subject,
                                  Intake(sha256=self.sha256, size=len(data)))}


def _judged(result: dict[str, Any], subject: Any, intake: Intake) -> dict[str, Any]:
    """A measured result with the worker's verdict on it (``judged``: the record's JSON
    and the Slim, see :mod:`gate.judge`) when a subject is given."""
    if subject is not None and result.get("measured", True):
        from gate.judge import judged
        try:
            result["judged"] = judged(subject, intake, result)
        except Exception:  # noqa: BLE001 - the coordinator evaluates it then, as it would
            pass
    return result


def packed(result: dict[str, Any]) -> dict[str, Any]:
    """A worker's result as the coordinator stores it: the text compressed and the cache
    row's JSON encoded here, so the coordinator only files them (``cache``: extraction
    JSON, measures JSON, compressed text)."""
    from gate.state import dumps
    text = result.pop("text", "")
    result["cache"] = (dumps(result["extracted"]),
                       dumps({"measures": result["measures"], "errors": {},
                              "blocks": result.get("blocks", {}),
                              "measured": result.get("measured", True)}),
                       zlib.compress(text.encode("utf-8", "surrogatepass"), 1))
    return result


def work_on(task: Any) -> Any:
    """What a worker process runs for one task: a file to read (:class:`FileTask`), a
    staged copy (:class:`StagedTask`), an entry to assemble
    (:class:`gate.placement.BuildTask`), or a document's bytes read by the coordinator
    (a container's member: ``(path, data, params[, template])``)."""
    from gate.placement import BuildTask
    if isinstance(task, (FileTask, StagedTask, BuildTask)):
        return task.run()
    from gate.work import process
    return packed(process(task))
