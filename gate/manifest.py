"""The manifest: one JSON object a line saying where each inbox document came from.

``{"path": ..., "source_url": ..., "sha256": ..., "retrieved_at": ..., "published_at": ...}``
with every field but ``path`` optional. A line ``{"signature": "<armored SSH signature>"}``
closes a signed batch of the lines above it (see :mod:`gate.signing`). Structural problems
(not JSON, not an object, a missing or repeated path, an unknown key, a value of the wrong
type) stop the run with the file and line, because a typo such as ``"sha265"`` would
otherwise switch a check off for that document without anyone noticing. Keys starting
with ``x_`` are the operator's own: they are kept, carried into the provenance record and
otherwise ignored.

The *values* (is the URL well formed, is the digest hex, is the date a date) are judged by
the checks, so one bad value holds one document, not the whole batch.
"""

from __future__ import annotations

import hashlib
import json
import posixpath
from dataclasses import dataclass, field
from pathlib import Path
from typing import Any

from gate import signing
from gate.errors import ManifestError

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
                out[name] = value
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


def parse(text: str, source: str, detached: tuple[str, str] | None = None) -> Manifest:
    """Parse manifest text; ``source`` names the file in error messages; ``detached`` is a
    detached signature over the whole text and its file name."""
    records: dict[str, ManifestRecord] = {}
    batches = signing.Batches(text)
    for number, raw in enumerate(text.splitlines(), 1):
        line = raw.lstrip("\ufeff") if number == 1 else raw
        if not line.strip():
            continue
        where = f"manifest {source}, line {number}"
        try:
            obj = json.loads(line)
        except json.JSONDecodeError as err:
            raise ManifestError(f"{where}: not valid JSON ({err.msg} at column {err.colno}). "
                                "Each line must hold one JSON object.") from None
        if not isinstance(obj, dict):
            raise ManifestError(f"{where}: expected a JSON object, found "
                                f"{type(obj).__name__}.")
        if "signature" in obj:  # closes a signed batch of the lines above (gate.signing)
            problem = batches.seal(obj, number)
            if problem:
                raise ManifestError(f"{where}: {problem}.")
            continue
        unknown = sorted(k for k in obj if k not in FIELDS and not k.startswith("x_"))
        if unknown:
            raise ManifestError(
                f"{where}: unknown key {unknown[0]!r}. Known keys are "
                f"{', '.join(FIELDS)}; put your own fields under keys starting with 'x_'.")
        for name in FIELDS:
            value = obj.get(name)
            if value is not None and not isinstance(value, str):
                raise ManifestError(f"{where}: {name!r} must be a string, found "
                                    f"{type(value).__name__}.")
        if "path" not in obj or not obj["path"]:
            raise ManifestError(f"{where}: missing 'path' (the document's path relative to "
                                "the inbox).")
        path = normalize_path(obj["path"])
        if path is None:
            raise ManifestError(f"{where}: path {obj['path']!r} is not relative to the inbox "
                                "(absolute, empty or leaving it with '..').")
        if path in records:
            raise ManifestError(f"{where}: path {path!r} is listed twice (first at line "
                                f"{records[path].line}).")
        records[path] = ManifestRecord(
            path=path, line=number,
            source_url=obj.get("source_url"), sha256=obj.get("sha256"),
            retrieved_at=obj.get("retrieved_at"), published_at=obj.get("published_at"),
            extra={k: v for k, v in obj.items() if k.startswith("x_")})
        batches.member(path)
    if detached is not None:
        batches.detached(*detached)
    return Manifest(source=source, records=batches.apply(records),
                    sha256=hashlib.sha256(text.encode("utf-8")).hexdigest())


def load(path: Path) -> Manifest:
    """Read and parse a manifest file; every failure is a :class:`ManifestError`."""
    try:
        data = path.read_bytes()
    except OSError as err:
        raise ManifestError(f"cannot read manifest {path}: {err.strerror or err}.") from None
    try:
        text = data.decode("utf-8")
    except UnicodeDecodeError as err:
        raise ManifestError(f"manifest {path} is not UTF-8 (byte {err.start}); write it as "
                            "UTF-8 JSON lines.") from None
    return parse(text, str(path), signing.detached_signature(path))
