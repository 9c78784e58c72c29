"""ZIP containers read within bounds: office documents and EPUB are ZIP archives.

Before any entry is read, the central directory is checked: at most :data:`MAX_ENTRIES`
entries, at most :data:`MAX_TOTAL` bytes declared uncompressed in all, no entry declaring
more than :data:`MAX_RATIO` times its compressed size once it is over :data:`RATIO_FLOOR`
bytes (a decompression bomb), no encrypted entry, and no entry name that is absolute or
leaves the archive with ``..``. While an entry is read, the bytes actually inflated are
counted against the same caps, so a directory that lies about sizes gains nothing. Entries
are only ever read into memory by name; nothing is written to disk, and a relationship
target that resolves outside the archive root is refused (:func:`resolve`).

The ratio cap follows common practice: Apache POI's ``ZipSecureFile`` refuses entries that
inflate more than 100-fold (its default minimum inflate ratio 0.01; from memory).
"""

from __future__ import annotations

import io
import posixpath
import zipfile
import zlib

from gate.extract.model import Refused

MAX_ENTRIES = 10_000
MAX_TOTAL = 256 * 1024 * 1024
MAX_ENTRY = 64 * 1024 * 1024
MAX_RATIO = 100
RATIO_FLOOR = 1024 * 1024
CHUNK = 1 << 16




def unsafe_name(name: str) -> bool:
    """True for an entry name that is absolute or climbs out of the archive root."""
    if not name or "\x00" in name or name.startswith(("/", "\\")) or \
            (len(name) > 1 and name[1] == ":"):
        return True
    parts = name.replace("\\", "/").split("/")
    return ".." in parts


class SafeZip:
    """An archive whose directory passed the checks; entries read with :meth:`read`."""

    def __init__(self, data: bytes, *, max_entries: int = MAX_ENTRIES,
                 max_total: int = MAX_TOTAL, max_ratio: int = MAX_RATIO):
        try:
            self._zip = zipfile.ZipFile(io.BytesIO(data))
            infos = self._zip.infolist()
        except (zipfile.BadZipFile, zipfile.LargeZipFile, ValueError, OSError, EOFError) as err:
            raise Refused("broken", f"the ZIP container cannot be read: {_why(err)}") \
                from None
        if len(infos) > max_entries:
            raise Refused("bomb", f"the ZIP container has {len(infos):,} entries "
                                     f"(at most {max_entries:,} are read)")
        declared = 0
        self.infos: dict[str, zipfile.ZipInfo] = {}
        for info in infos:
            if unsafe_name(info.filename):
                raise Refused("broken", f"the ZIP entry name {info.filename[:200]!r} "
                                           "points outside the archive")
            if info.flag_bits & 0x1:
                raise Refused("encrypted", f"the ZIP entry {info.filename[:200]!r} is "
                                              "encrypted, so its content cannot be read")
            declared += info.file_size
            if info.file_size > RATIO_FLOOR and \
                    info.file_size > max_ratio * max(1, info.compress_size):
                raise Refused("bomb", f"the ZIP entry {info.filename[:200]!r} inflates "
                                         f"{info.file_size // max(1, info.compress_size):,}-fold "
                                         f"(at most {max_ratio}-fold is read)")
            self.infos.setdefault(info.filename, info)
        if declared > max_total:
            raise Refused("bomb", f"the ZIP container declares {declared:,} bytes "
                                     f"uncompressed (at most {max_total:,} are read)")
        self.max_total = max_total
        self.max_ratio = max_ratio
        self.inflated = 0

    def names(self) -> list[str]:
        return list(self.infos)

    def has(self, name: str) -> bool:
        return name in self.infos

    def read(self, name: str, limit: int = MAX_ENTRY) -> bytes:
        """The entry's bytes, counting what actually inflates against the caps."""
        info = self.infos.get(name)
        if info is None:
            raise Refused("broken", f"the ZIP container has no entry {name[:200]!r}")
        parts: list[bytes] = []
        size = 0
        try:
            with self._zip.open(info) as fh:
                while chunk := fh.read(CHUNK):
                    size += len(chunk)
                    self.inflated += len(chunk)
                    if size > limit or self.inflated > self.max_total or (
                            size > RATIO_FLOOR and
                            size > self.max_ratio * max(1, info.compress_size)):
                        raise Refused("bomb", f"the ZIP entry {name[:200]!r} inflates past "
                                                 "the safety cap")
                    parts.append(chunk)
        except (zipfile.BadZipFile, zlib.error, EOFError, OSError, ValueError,
                NotImplementedError, RuntimeError) as err:
            raise Refused("broken", f"the ZIP entry {name[:200]!r} cannot be read: "
                                       f"{_why(err)}") from None
        return b"".join(parts)


def resolve(base_part: str, target: str) -> str | None:
    """The archive name a relationship ``target`` of ``base_part`` points at, or None.

    Targets are relative to the folder of the part (ECMA-376 Part 2, 9.3), or absolute
    from the package root when they start with ``/``; one that leaves the root is refused.
    """
    if not target or "\x00" in target or "://" in target:
        return None
    if target.startswith("/"):
        joined = target.lstrip("/")
    else:
        joined = posixpath.join(posixpath.dirname(base_part), target)
    norm = posixpath.normpath(joined)
    if norm in (".", "") or norm == ".." or norm.startswith("../") or norm.startswith("/"):
        return None
    return norm


def _why(err: BaseException) -> str:
    return (str(err).strip() or type(err).__name__)[:300]
