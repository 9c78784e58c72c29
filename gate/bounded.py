"""Bounded reads of the files that configure a run: the policy, its bases, the manifest.

Such a file must be a regular file: a FIFO would hang the run, ``/dev/zero`` would be read
until memory runs out, and a symbolic link could pull a file from anywhere. The file is
opened with ``O_NOFOLLOW`` (a link is refused, not followed) and ``O_NONBLOCK`` (opening a
FIFO cannot block), checked with ``fstat`` to be a regular file, and read up to a cap. A
file over the cap is refused whole, never truncated.
"""

from __future__ import annotations

import errno
import os
import stat
from collections.abc import Iterator
from pathlib import Path

CHUNK = 1 << 20


class InputFileProblem(ValueError):
    """The file is missing, not a regular file, a link, or over its cap; ``str()`` says
    which in a few words, for the caller to put into its own error. ``system`` is True
    when the operating system refused (the message is then its reason, for example
    "No such file or directory")."""

    def __init__(self, message: str, system: bool = False):
        super().__init__(message)
        self.system = system

    def clause(self, verb: str = "read") -> str:
        """``cannot read the file (reason)`` or ``cannot use the file: it is ...``."""
        return f"cannot {verb} the file ({self})" if self.system else \
            f"cannot use the file: {self}"


_KINDS = ((stat.S_ISFIFO, "a FIFO (named pipe)"), (stat.S_ISCHR, "a character device"),
          (stat.S_ISBLK, "a block device"), (stat.S_ISSOCK, "a socket"),
          (stat.S_ISDIR, "a folder"))


def _kind(mode: int) -> str:
    for test, name in _KINDS:
        if test(mode):
            return name
    return "not a regular file"


def open_regular(path: str | os.PathLike[str]) -> int:
    """Open ``path`` for reading if it is a regular file (not through a link); return the
    descriptor. Raises :class:`InputFileProblem`."""
    try:
        fd = os.open(path, os.O_RDONLY | os.O_NOFOLLOW | os.O_NONBLOCK | os.O_CLOEXEC)
    except OSError as err:
        if err.errno == errno.ELOOP:
            raise InputFileProblem("it is a symbolic link, and gate does not follow links "
                                   "here; give the file itself") from None
        raise InputFileProblem(err.strerror or str(err), system=True) from None
    try:
        mode = os.fstat(fd).st_mode
    except OSError as err:
        os.close(fd)
        raise InputFileProblem(err.strerror or str(err), system=True) from None
    if not stat.S_ISREG(mode):
        os.close(fd)
        raise InputFileProblem(f"it is {_kind(mode)}, not a regular file")
    return fd


def _too_large(cap: int) -> InputFileProblem:
    return InputFileProblem(f"it is larger than the {cap:,} bytes gate reads from such a "
                            "file")


def read_regular(path: str | os.PathLike[str], cap: int) -> bytes:
    """All the bytes of a regular file of at most ``cap`` bytes."""
    fd = open_regular(path)
    try:
        parts: list[bytes] = []
        size = 0
        while chunk := os.read(fd, min(CHUNK, cap + 1 - size)):
            parts.append(chunk)
            size += len(chunk)
            if size > cap:
                raise _too_large(cap)
        return b"".join(parts)
    except OSError as err:
        raise InputFileProblem(err.strerror or str(err), system=True) from None
    finally:
        os.close(fd)


def lines(path: Path, cap: int, line_cap: int) -> Iterator[tuple[int, bytes]]:
    """The ``\\n``-separated lines of a regular file of at most ``cap`` bytes, numbered
    from 1, without their ``\\n``. A line longer than ``line_cap`` bytes raises
    :class:`InputFileProblem` naming its number; only one line is held at a time."""
    fd = open_regular(path)
    try:
        with os.fdopen(fd, "rb", closefd=False) as fh:
            total = 0
            number = 0
            while True:
                line = fh.readline(line_cap + 1)
                if not line:
                    return
                number += 1
                total += len(line)
                if total > cap:
                    raise _too_large(cap)
                if len(line) > line_cap and not (len(line) == line_cap + 1 and
                                                 line.endswith(b"\n")):
                    raise InputFileProblem(f"line {number} is longer than the {line_cap:,} "
                                           "bytes allowed for one line")
                yield number, line.removesuffix(b"\n")
    except OSError as err:
        raise InputFileProblem(err.strerror or str(err), system=True) from None
    finally:
        os.close(fd)
