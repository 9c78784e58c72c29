"""Containers in the inbox: web archives (WARC) and mbox files, one document per record.

A file whose content is a WARC archive (ISO 28500; ``WARC/1.0`` or ``WARC/1.1``, plain or
gzip-compressed per record, as crawlers write ``.warc.gz``) is not a document itself: each
``response`` or ``resource`` record in it is, under the path ``<archive>#record-NNNNN``
(NNNNN is the record's position in the archive, counting every record from 1, so
``crawl/site.warc.gz#record-00012`` is the twelfth record). Its provenance comes from the
record headers, as if the manifest had a line for it: ``WARC-Target-URI`` is the source
URL, ``WARC-Date`` the retrieval time, and ``WARC-Payload-Digest`` (``sha1:`` + base32, as
crawlers write it; ``sha256:`` is accepted too) is verified against the payload by the
integrity check. The document's bytes are the HTTP entity body with transfer and content
codings removed. A response that is not a 2xx is held as an error page, not a document.

An mbox (RFC 4155) expands the same way into ``<mbox>#message-NNNNN``, each message one
e-mail document that inherits the mbox's manifest line (source URL, retrieval time,
signature; not ``published_at``: each message's ``Date:`` header dates it).

A manifest line for the container itself still counts: its ``sha256`` is checked against
the container's bytes for every record, and its signature covers every record.

Memory stays bounded: discovery streams through an archive once with warcio, keeping only
each record's offset and headers; a record's payload is read when its turn comes, at most
``limits.max_bytes`` of it. An archive that is truncated or malformed yields the records
before the damage, then one document ``<archive>#record-NNNNN`` held as broken with the
reason, standing for the records that could not be read; the run goes on.
"""

from __future__ import annotations

import base64
import binascii
import contextlib
import dataclasses
import gzip
import hashlib
import io
import os
import zlib
from collections.abc import Iterator
from dataclasses import dataclass
from pathlib import Path
from typing import Any, BinaryIO

from gate.discovery import Entry
from gate.intake import Intake
from gate.manifest import Manifest, ManifestRecord

CHUNK = 1 << 20
BLOCK = 16384  # warcio's read size
# Raw bytes warcio may read while it parses one record's WARC and HTTP headers (real ones
# are a few KB). Compressed, 64 KB inflate to at most about 66 MB (deflate's limit is
# about 1032:1), so even a hostile header stays within bounds.
HEADER_CAP = 4 * BLOCK
_MBOX_HEAD = 65536
_GZIP_HEAD = 8192


@dataclass(frozen=True)
class Member(Entry):
    """A record of a container: read from ``container`` at ``offset``, not from ``path``."""

    container: str = ""
    format: str = ""  # warc | mbox
    offset: int = 0
    length: int | None = None  # mbox: bytes of the message
    number: int = 0
    headers: tuple[tuple[str, str], ...] = ()  # WARC record headers kept for provenance
    problem: str | None = None
    detail: str = ""
    container_digest: dict[str, Any] | None = None  # the manifest's sha256 of the container


def find(file: Path, record: ManifestRecord | None) -> tuple[Path, Member, Manifest] | None:
    """For ``gate explain ARCHIVE#record-NNNNN``: the folder, the member and a manifest
    holding ``record`` (the container's manifest line), or None when there is no such one."""
    container = Path(container_of(str(file)))
    if container == file or not container.is_file():
        return None
    name = container.name
    records = {name: dataclasses.replace(record, path=name)} if record is not None else {}
    manifest = Manifest(source=None, records=records, sha256=None)
    st = container.stat()
    entry = Entry(path=name, kind="file", size=st.st_size, mtime_ns=st.st_mtime_ns)
    wanted = name + "#" + str(file).rsplit("#", 1)[1]
    for member in expand(container.parent, iter([entry]), manifest):
        if member.path == wanted and isinstance(member, Member):
            return container.parent, member, manifest
    return None


def container_of(path: str) -> str:
    """The container's inbox path for a member's path (the path itself otherwise)."""
    head, sep, tail = path.rpartition("#")
    return head if sep and tail.startswith(("record-", "message-")) else path


def _open(path: str) -> BinaryIO:
    fd = os.open(path, os.O_RDONLY | os.O_NOFOLLOW | os.O_NONBLOCK | os.O_CLOEXEC)
    return os.fdopen(fd, "rb")


def kind_of(head: bytes) -> str | None:
    """warc or mbox for the first bytes of a container, else None."""
    if head.startswith((b"WARC/1.0\r\n", b"WARC/1.1\r\n", b"WARC/0.")):
        return "warc"
    if head.startswith(b"\x1f\x8b"):
        try:
            inner = zlib.decompressobj(16 + zlib.MAX_WBITS).decompress(head, 16)
        except zlib.error:
            return None
        return "warc" if inner.startswith(b"WARC/") else None
    if head.startswith(b"From "):
        from gate.extract.mail import sniff_mail
        return "mbox" if sniff_mail(head) == "mbox" else None
    return None


def expand(inbox: Path, entries: Iterator[Entry], manifest: Manifest) -> Iterator[Entry]:
    """The inbox entries with every container replaced by its records (a generator)."""
    for entry in entries:
        if not entry.regular:
            yield entry
            continue
        full = os.path.join(os.fspath(inbox), entry.path)
        try:
            with _open(full) as fh:
                head = fh.read(64)
                if head.startswith(b"From "):  # an mbox is told by its first headers
                    head += fh.read(_MBOX_HEAD - len(head))
                elif head.startswith(b"\x1f\x8b"):  # Huffman tables come before the text
                    head += fh.read(_GZIP_HEAD - len(head))
                kind = kind_of(head)
        except OSError:
            kind = None
        if kind is None:
            yield entry
            continue
        record = manifest.get(entry.path)
        digest = _container_digest(full, record)
        members = _warc(full, entry) if kind == "warc" else _mbox(full, entry)
        count = 0
        for member in members:
            count += 1
            yield dataclasses.replace(member, container_digest=digest)
        if count == 0:
            yield Member(path=entry.path, kind="file", size=entry.size, container=entry.path,
                         format=kind, problem="unsupported",
                         detail=f"the {kind.upper()} archive holds no document records")


def _container_digest(full: str, record: ManifestRecord | None) -> dict[str, Any] | None:
    if record is None or not record.sha256:
        return None
    digest = hashlib.sha256()
    try:
        with _open(full) as fh:
            while chunk := fh.read(CHUNK):
                digest.update(chunk)
    except OSError:
        return None
    actual = digest.hexdigest()
    return {"over": "the container file", "algorithm": "sha256", "claimed": record.sha256,
            "claimed_by": f"manifest line {record.line}", "actual": actual,
            "valid": record.sha256.lower() == actual}


# -- WARC -----------------------------------------------------------------------------------

def _warc(full: str, entry: Entry) -> Iterator[Member]:
    from warcio.archiveiterator import ArchiveIterator
    from warcio.exceptions import ArchiveLoadFailed

    number = 0
    warnings = io.StringIO()  # warcio writes its complaints to stderr; they become reasons
    try:
        with _open(full) as raw:
            fh = _Capped(raw)
            iterator = ArchiveIterator(fh, no_record_parse=True, block_size=BLOCK)
            for record in _quietly(iterator, warnings, fh):
                number += 1
                # a block shorter than its Content-Length: the archive was cut off (warcio
                # reads a truncated last record without complaint)
                declared, got = record.rec_headers.get_header("Content-Length"), 0
                if declared is None or not declared.strip().isdigit():
                    raise _Damaged(number, f"record {number} has no valid Content-Length "
                                           f"({declared!r})")
                while chunk := record.raw_stream.read(CHUNK):
                    got += len(chunk)
                if got < int(declared):
                    raise _Damaged(number, f"record {number} declares {declared} bytes but "
                                           f"only {got} are there (the archive is truncated)")
                if record.rec_type not in ("response", "resource"):
                    continue
                headers = tuple((k, v) for k, v in record.rec_headers.headers
                                if k.lower() in ("warc-target-uri", "warc-date",
                                                 "warc-payload-digest", "warc-record-id",
                                                 "warc-type", "content-type"))
                yield Member(path=f"{entry.path}#record-{number:05d}", kind="file",
                             size=None, mtime_ns=entry.mtime_ns, container=entry.path,
                             format="warc", offset=iterator.get_record_offset(),
                             number=number, headers=headers)
    except (_Damaged, ArchiveLoadFailed, OSError, EOFError, ValueError, zlib.error,
            gzip.BadGzipFile, IndexError, KeyError, TypeError, AttributeError) as err:
        at = err.number if isinstance(err, _Damaged) else number + 1
        yield Member(path=f"{entry.path}#record-{at:05d}", kind="file",
                     container=entry.path, format="warc", number=at, problem="broken",
                     detail=f"the WARC archive cannot be read from record {at} on: "
                            f"{_why(err)}; this and any later records are not read")


class _Damaged(Exception):
    """Record ``number`` of an archive is cut off or malformed."""

    def __init__(self, number: int, message: str):
        super().__init__(message)
        self.number = number


class _Capped:
    """A file whose reads are counted against ``budget`` while warcio parses headers.

    warcio reads a header line to its end however long it is; without a cap a hostile
    archive with one endless header line would exhaust the parent's memory. Payloads are
    read with the budget off (``None``), in chunks.
    """

    def __init__(self, fh: BinaryIO):
        self.fh = fh
        self.budget: int | None = None

    def read(self, size: int = -1) -> bytes:
        data = self.fh.read(size)
        if self.budget is not None:
            self.budget -= len(data)
            if self.budget < 0:
                raise ValueError(f"a record's headers run past {HEADER_CAP:,} bytes")
        return data

    def __getattr__(self, name: str) -> Any:
        return getattr(self.fh, name)


def _headers(fh: _Capped, iterator: Any) -> Any:
    """The next record of ``iterator`` (or None), its headers read within the cap."""
    fh.budget = HEADER_CAP
    try:
        return next(iterator, None)
    finally:
        fh.budget = None


def _quietly(iterator: Any, sink: io.StringIO, fh: _Capped) -> Iterator[Any]:
    """Records of ``iterator``; a warning warcio prints about one is raised as an error."""
    while True:
        with contextlib.redirect_stderr(sink):
            record = _headers(fh, iterator)
        if sink.getvalue():
            raise ValueError(" ".join(sink.getvalue().split())[:300])
        if record is None:
            return
        yield record


def _payload_digest(claimed: str | None, raw_sha1: bytes, raw_sha256: bytes
                    ) -> dict[str, Any] | None:
    if not claimed:
        return None
    label, _, value = claimed.partition(":")
    label = label.strip().lower()
    digests = {"sha1": raw_sha1, "sha256": raw_sha256}
    if label not in digests:
        return {"over": "the record payload", "algorithm": label, "claimed": claimed,
                "claimed_by": "WARC-Payload-Digest", "actual": None, "valid": False,
                "problem": f"unsupported digest algorithm {label!r}"}
    actual = digests[label]
    value = value.strip()
    try:
        given = base64.b32decode(value.upper()) if len(value) != len(actual) * 2 \
            else bytes.fromhex(value)
    except (binascii.Error, ValueError):
        given = b""
    return {"over": "the record payload", "algorithm": label, "claimed": claimed,
            "claimed_by": "WARC-Payload-Digest",
            "actual": f"{label}:{base64.b32encode(actual).decode('ascii')}",
            "valid": given == actual}


def _read_warc(inbox: Path, member: Member, max_bytes: int) -> tuple[Intake, dict[str, Any]]:
    from warcio.archiveiterator import ArchiveIterator

    full = os.path.join(os.fspath(inbox), member.container)
    facts: dict[str, Any] = {}
    with _open(full) as raw, contextlib.redirect_stderr(io.StringIO()):
        raw.seek(member.offset)
        fh = _Capped(raw)
        record = _headers(fh, iter(ArchiveIterator(fh, block_size=BLOCK)))
        sha1, sha256, size = hashlib.sha1(), hashlib.sha256(), 0  # WARC's own digest
        while chunk := record.raw_stream.read(CHUNK):
            sha1.update(chunk)
            sha256.update(chunk)
            size += len(chunk)
        status = record.http_headers.get_statuscode() if record.http_headers else None
        facts["payload_digest"] = _payload_digest(
            record.rec_headers.get_header("WARC-Payload-Digest"), sha1.digest(), sha256.digest())
        facts["http_status"] = status
    if status is not None and not str(status).startswith("2"):
        return Intake(problem="unsupported", detail=f"the crawler got HTTP {status} for this "
                                                    "URL: the record holds an error page or a "
                                                    "redirect, not the document"), facts
    with _open(full) as raw, contextlib.redirect_stderr(io.StringIO()):
        raw.seek(member.offset)
        fh = _Capped(raw)
        record = _headers(fh, iter(ArchiveIterator(fh, block_size=BLOCK)))
        stream = record.content_stream()
        data = stream.read(max_bytes + 1)
    if len(data) > max_bytes:
        return Intake(size=max(size, len(data)), problem="too-large"), facts
    return Intake(data=data, sha256=hashlib.sha256(data).hexdigest(), size=len(data)), facts


# -- mbox -----------------------------------------------------------------------------------

def _mbox(full: str, entry: Entry) -> Iterator[Member]:
    """Messages start at a ``From `` line at the file's start or after an empty line."""
    starts: list[int] = []
    offset, previous_blank, line_start = 0, True, True
    with _open(full) as fh:
        while line := fh.readline(CHUNK):  # bounded: a huge line comes in pieces
            if line_start and previous_blank and line.startswith(b"From "):
                if starts:
                    yield _mbox_member(entry, len(starts), starts[-1], offset)
                starts.append(offset)
            if line_start:
                previous_blank = line in (b"\n", b"\r\n")
            line_start = line.endswith(b"\n")
            offset += len(line)
    if starts:
        yield _mbox_member(entry, len(starts), starts[-1], offset)


def _mbox_member(entry: Entry, number: int, start: int, end: int) -> Member:
    return Member(path=f"{entry.path}#message-{number:05d}", kind="file", size=end - start,
                  mtime_ns=entry.mtime_ns, container=entry.path, format="mbox",
                  offset=start, length=end - start, number=number)


def _read_mbox(inbox: Path, member: Member, max_bytes: int) -> Intake:
    import re

    if member.length is not None and member.length > max_bytes:
        return Intake(size=member.length, problem="too-large")
    with _open(os.path.join(os.fspath(inbox), member.container)) as fh:
        fh.seek(member.offset)
        raw = fh.read(member.length or 0)
    _, _, message = raw.partition(b"\n")  # the From_ separator line is not the message's
    data = re.sub(rb"(?m)^>(>*From )", rb"\1", message)
    return Intake(data=data, sha256=hashlib.sha256(data).hexdigest(), size=len(data))


# -- reading --------------------------------------------------------------------------------

def read(inbox: Path, member: Member, max_bytes: int,
         manifest: Manifest) -> tuple[Intake, ManifestRecord | None]:
    """A member's bytes and the manifest record standing for it (never raises for input)."""
    container_record = manifest.get(member.container)
    if member.problem is not None:
        return Intake(problem=member.problem, detail=member.detail), container_record
    facts: dict[str, Any] = {}
    try:
        if member.format == "warc":
            intake, facts = _read_warc(inbox, member, max_bytes)
        else:
            intake = _read_mbox(inbox, member, max_bytes)
    except (OSError, EOFError, ValueError, StopIteration, AttributeError, zlib.error,
            gzip.BadGzipFile) as err:
        intake = Intake(problem="broken", detail=f"the record cannot be read from "
                                                 f"{member.container}: {_why(err)}")
    digests = tuple(d for d in (member.container_digest, facts.get("payload_digest")) if d)
    if member.format == "mbox":
        # the mbox's line gives source and retrieval; each message has its own Date:
        base = container_record or ManifestRecord(path=member.path, line=0)
        return intake, dataclasses.replace(base, path=member.path, sha256=None,
                                           published_at=None, digests=digests)
    headers = dict((k.lower(), v) for k, v in member.headers)
    extra = {"x_container": {"archive": member.container, "record": member.number,
                             "offset": member.offset,
                             "warc_record_id": headers.get("warc-record-id"),
                             "http_status": facts.get("http_status")}}
    record = ManifestRecord(
        path=member.path, line=container_record.line if container_record else 0,
        source_url=headers.get("warc-target-uri"), retrieved_at=headers.get("warc-date"),
        extra=extra, digests=digests,
        signature=container_record.signature if container_record else None)
    return intake, record


def _why(err: BaseException) -> str:
    return (str(err).strip() or type(err).__name__)[:300]
