"""Discovery: walk the inbox safely and list every entry that is a document.

Every regular file below the inbox is a document, except ``INBOX/manifest.jsonl``. A
symbolic link, FIFO, socket or device is listed too (as a document that will be held under
``format``) but never opened or followed, so a link cannot pull files from outside the inbox
and a loop cannot trap the walk. A directory that cannot be listed is itself listed, so the
documents inside it are not silently lost.

Entries come out in a fixed order: names sorted by code point within each directory,
depth first. The walk is a generator, so memory does not grow with the inbox.
"""

from __future__ import annotations

import os
import stat
from collections.abc import Iterator
from dataclasses import dataclass
from pathlib import Path

MANIFEST_NAME = "manifest.jsonl"


@dataclass(frozen=True)
class Entry:
    """One inbox entry. ``path`` is inbox-relative with forward slashes."""

    path: str
    kind: str  # file | symlink | fifo | socket | block-device | char-device | unreadable-dir | other
    size: int | None = None
    mtime_ns: int | None = None
    link_target: str | None = None
    error: str | None = None

    @property
    def regular(self) -> bool:
        return self.kind == "file"


def _kind(mode: int) -> str:
    if stat.S_ISREG(mode):
        return "file"
    if stat.S_ISLNK(mode):
        return "symlink"
    if stat.S_ISFIFO(mode):
        return "fifo"
    if stat.S_ISSOCK(mode):
        return "socket"
    if stat.S_ISBLK(mode):
        return "block-device"
    if stat.S_ISCHR(mode):
        return "char-device"
    return "other"


def walk(inbox: Path, exclude: frozenset[str] = frozenset()) -> Iterator[Entry]:
    """Yield the documents of ``inbox`` in a deterministic order.

    ``exclude`` holds inbox-relative paths to skip (besides the top-level manifest).
    Directories are never followed through symbolic links.
    """
    yield from _walk_dir(os.fspath(inbox), "", exclude)


def _walk_dir(root: str, rel: str, exclude: frozenset[str]) -> Iterator[Entry]:
    full = os.path.join(root, rel) if rel else root
    try:
        with os.scandir(full) as it:
            items = sorted(it, key=lambda e: e.name)
    except OSError as err:
        if rel:
            yield Entry(path=rel, kind="unreadable-dir", error=err.strerror or str(err))
            return
        raise
    for item in items:
        path = f"{rel}/{item.name}" if rel else item.name
        if not rel and item.name == MANIFEST_NAME or path in exclude:
            continue
        try:
            st = item.stat(follow_symlinks=False)
        except OSError as err:
            yield Entry(path=path, kind="other", error=err.strerror or str(err))
            continue
        if stat.S_ISDIR(st.st_mode):
            yield from _walk_dir(root, path, exclude)
            continue
        kind = _kind(st.st_mode)
        target = None
        if kind == "symlink":
            try:
                target = os.readlink(item.path)  # reads the link text, does not follow it
            except OSError:
                target = None
        yield Entry(path=path, kind=kind, size=st.st_size if kind == "file" else None,
                    mtime_ns=st.st_mtime_ns, link_target=target)
