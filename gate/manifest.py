"""The manifest: one JSON object a line saying where each inbox document came from.

``{"path": ..., "source_url": ..., "sha256": ..., "retrieved_at": ..., "published_at": ...}``
with every field but ``path`` optional. Structural problems (not JSON, not an object, a
missing or repeated path, an unknown key, a value of the wrong type) stop the run with the
file and line, because a typo such as ``"sha265"`` would otherwise switch a check off for
that document without anyone noticing. Keys starting with ``x_`` are the operator's own:
they are kept, carried into the provenance record and otherwise ignored.

The *values* (is the URL well formed, is the digest hex, is the date a date) are judged by
the checks, so one bad value holds one document, not the whole batch.

Limits: the manifest must be a regular file (a link, FIFO or device is an error, never
followed or read), of at most :data:`MAX_BYTES`; lines are split on ``\\n`` only (a raw
U+2028 or U+0085 inside a JSON string is text, not a line break), each at most
:data:`MAX_LINE_BYTES`; an ``x_`` value may take at most :data:`MAX_EXTRA_BYTES` written as
JSON, and strings must be valid Unicode (no unpaired ``\\uD800``-style escapes).
"""

from __future__ import annotations

import hashlib
import json
import os
import posixpath
from dataclasses import dataclass, field
from pathlib import Path
from typing import Any

from gate import redact, signing
from gate.bounded import InputFileProblem, lines
from gate.errors import ManifestError

MAX_BYTES = 512 << 20  # the whole manifest
MAX_LINE_BYTES = 64 << 10  # one line
MAX_EXTRA_BYTES = 4 << 10  # one x_ value, as UTF-8 JSON
DEFAULT_NAME = "manifest.jsonl"

FIELDS = ("path", "source_url", "sha256", "retrieved_at", "published_at")


@dataclass(frozen=True)
class ManifestRecord:
    """What the manifest says about one document."""

    path: str
    line: int
    source_url: str | None = None
    sha256: str | None = None
    retrieved_at: str | None = None
    published_at: str | None = None
    extra: dict[str, Any] = field(default_factory=dict, compare=False)
    signature: dict[str, Any] | None = field(default=None, compare=False)  # gate.signing
    # digests checked when a container was read (gate.containers): the container file
    # against this line's sha256, a WARC record's payload against WARC-Payload-Digest
    digests: tuple[dict[str, Any], ...] = field(default=(), compare=False)

    def to_json(self) -> dict[str, Any]:
        out: dict[str, Any] = {"line": self.line}
        for name in FIELDS[1:]:
            value = getattr(self, name)
            if value is not None:
                out[name] = redact.url(value) if name == "source_url" else value
        if self.extra:
            out["extra"] = self.extra
        if self.signature is not None:
            out["signature"] = self.signature
        if self.digests:
            out["digests"] = list(self.digests)
        return out


@dataclass(frozen=True)
class Manifest:
    """All records by inbox-relative path, plus a digest of the file for provenance."""

    source: str | None
    records: dict[str, ManifestRecord]
    sha256: str | None

    def get(self, path: str) -> ManifestRecord | None:
        return self.records.get(path)


EMPTY = Manifest(source=None, records={}, sha256=None)


def normalize_path(value: str) -> str | None:
    """The inbox-relative form of a manifest path, or None if it is not one."""
    if not value or value.startswith("/") or "\x00" in value:
        return None
    norm = posixpath.normpath(value)
    if norm in (".", "") or norm == ".." or norm.startswith("../"):
        return None
    return norm


def parse(text: str, source: str) -> Manifest:
    """Parse manifest text; ``source`` names the file in error messages."""
    data = text.encode("utf-8", "surrogatepass")
    return _parse(enumerate(data.split(b"\n"), 1), source, hashlib.sha256(data))


def _parse(numbered: Any, source: str, digest: Any,
           detached: tuple[Any, ...] | None = None) -> Manifest:
    """``detached``: a detached signature over the whole file and its name (gate.signing)."""
    records: dict[str, ManifestRecord] = {}
    batches = signing.Batches()
    for number, raw in numbered:
        batches.take(raw, number)
        if digest is not None and number > 1:
            digest.update(b"\n")
        if digest is not None:
            digest.update(raw)
        where = f"manifest {source}, line {number}"
        try:
            line = raw.decode("utf-8")
        except UnicodeDecodeError as err:
            raise ManifestError(f"{where}: not UTF-8 (byte {err.start + 1} of the line); "
                                "write the manifest as UTF-8 JSON lines.") from None
        if number == 1:
            line = line.lstrip("\ufeff")
        if '"signature"' in line:  # closes a signed batch of the lines above it
            problem = batches.seal(line, number)
            if problem == "":
                continue
            if problem is not None:
                raise ManifestError(f"{where}: {problem}.")
        batches.add(raw)
        if not line.strip():
            continue
        record = _record(line, number, where)
        if record.path in records:
            raise ManifestError(f"{where}: path {record.path!r} is listed twice (first at "
                                f"line {records[record.path].line}).")
        records[record.path] = record
        batches.member(record.path)
    if detached is not None:
        batches.detached(*detached)
    records = batches.apply(records)
    return Manifest(source=source, records=records,
                    sha256=digest.hexdigest() if digest is not None else None)


def _record(line: str, number: int, where: str) -> ManifestRecord:
    try:
        obj = json.loads(line)
    except json.JSONDecodeError as err:
        raise ManifestError(f"{where}: not valid JSON ({err.msg} at column {err.colno}). "
                            "Each line must hold one JSON object.") from None
    except RecursionError:
        raise ManifestError(f"{where}: the JSON nests too deeply. Each line must hold one "
                            "flat JSON object.") from None
    if not isinstance(obj, dict):
        raise ManifestError(f"{where}: expected a JSON object, found {type(obj).__name__}.")
    unknown = sorted(k for k in obj if k not in FIELDS and not k.startswith("x_"))
    if unknown:
        raise ManifestError(
            f"{where}: unknown key {unknown[0]!r}. Known keys are "
            f"{', '.join(FIELDS)}; put your own fields under keys starting with 'x_'.")
    for name, value in obj.items():
        if name not in FIELDS:
            size = len(_utf8(json.dumps(value, ensure_ascii=False), where, name))
            if size > MAX_EXTRA_BYTES:
                raise ManifestError(f"{where}: {name!r} holds {size:,} bytes; an x_ value "
                                    f"may hold at most {MAX_EXTRA_BYTES:,} (it is copied "
                                    "into every provenance record). Keep large data "
                                    "elsewhere and refer to it.")
        elif value is not None and not isinstance(value, str):
            raise ManifestError(f"{where}: {name!r} must be a string, found "
                                f"{type(value).__name__}.")
        elif value is not None:
            _utf8(value, where, name)
    if "path" not in obj or not obj["path"]:
        raise ManifestError(f"{where}: missing 'path' (the document's path relative to "
                            "the inbox).")
    path = normalize_path(obj["path"])
    if path is None:
        raise ManifestError(f"{where}: path {obj['path']!r} is not relative to the inbox "
                            "(absolute, empty or leaving it with '..').")
    return ManifestRecord(
        path=path, line=number,
        source_url=obj.get("source_url"), sha256=obj.get("sha256"),
        retrieved_at=obj.get("retrieved_at"), published_at=obj.get("published_at"),
        extra={k: v for k, v in obj.items() if k.startswith("x_")})


def _utf8(text: str, where: str, name: str) -> bytes:
    try:
        return text.encode("utf-8")
    except UnicodeEncodeError:
        raise ManifestError(f"{where}: {name!r} holds an unpaired surrogate escape (such "
                            "as \\udce9), which is not text; write the character itself "
                            "or escape a whole pair.") from None


def load(path: Path, default: bool = False) -> Manifest:
    """Read and parse a manifest file; every failure is a :class:`ManifestError`.
    ``default`` says the file is the inbox's own ``manifest.jsonl``, not --manifest."""
    what = f"the inbox's {DEFAULT_NAME}" if default else "--manifest"
    digest = hashlib.sha256()
    try:
        return _parse(lines(path, MAX_BYTES, MAX_LINE_BYTES), str(path), digest,
                      signing.detached_signature(path))
    except InputFileProblem as err:
        raise ManifestError(f"cannot read the manifest {path} ({what}): {err}. The manifest "
                            "must be a regular file of JSON lines.") from None


def for_inbox(inbox: Path, given: Path | None) -> Manifest:
    """The run's manifest: --manifest when given, else ``INBOX/manifest.jsonl`` when
    anything by that name exists (a link or FIFO there is an error, never skipped:
    skipping it would run the batch without the provenance it was meant to have)."""
    if given is not None:
        return load(given)
    default = inbox / DEFAULT_NAME
    if os.path.lexists(default):
        return load(default, default=True)
    return EMPTY
