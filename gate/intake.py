"""Intake: read each document once, safely, and hash it.

The parent process opens every file itself with ``O_NOFOLLOW`` (a file swapped for a link
after discovery is not followed) and ``O_NONBLOCK`` (a file swapped for a FIFO cannot hang
the run), checks it is still a regular file, and reads at most ``limits.max_bytes`` of it.
Larger files are hashed as a stream and never parsed. The bytes read here are the bytes
that get checked, staged and placed: the inbox is not read a second time.
"""

from __future__ import annotations

import errno
import hashlib
import os
import stat
from dataclasses import dataclass
from pathlib import Path

from gate.discovery import Entry

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
    full = os.path.join(os.fspath(inbox), entry.fs_path)
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
