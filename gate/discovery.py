"""Discovery: walk the inbox safely and list every entry that is a document.

Every regular file below the inbox is a document, except ``INBOX/manifest.jsonl``. A
symbolic link, FIFO, socket or device is listed too (as a document that will be held under
``format``) but never opened or followed, so a link cannot pull files from outside the inbox
and a loop cannot trap the walk. A directory that cannot be listed is itself listed, so the
documents inside it are not silently lost.

Entries come out in a fixed order: names sorted by code point within each directory,
depth first. The walk is iterative (an explicit stack of listed folders, no recursion), so
no depth of folders can exhaust Python's stack; a folder whose path is too long for the
system to open is listed as unreadable like any other.

File names that are not valid UTF-8 (legal on Linux) get a *display path*, the form used
in reports, the state, the manifest and review commands: each byte that is not part of a
UTF-8 sequence is written ``\\xNN`` and, in such a name only, a backslash is written
``\\x5c``, so the escaped form reads back to the exact bytes (a report consumer that needs them can
undo the escapes). ``Entry.os_path`` keeps the
name the operating system knows, for opening the file. Should an escaped name equal the
name of a sibling, ``\\x00`` (never part of a real name) is appended until it is unique.
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
    """One inbox entry. ``path`` is inbox-relative with forward slashes, always valid
    Unicode (see :func:`display_name`); ``os_path`` is the name to open when it differs."""

    path: str
    kind: str  # file | symlink | fifo | socket | block-device | char-device | unreadable-dir | other
    size: int | None = None
    mtime_ns: int | None = None
    link_target: str | None = None
    error: str | None = None
    os_path: str | None = None

    @property
    def regular(self) -> bool:
        return self.kind == "file"

    @property
    def fs_path(self) -> str:
        """The inbox-relative path as the operating system knows it."""
        return self.os_path if self.os_path is not None else self.path


def display_name(name: str) -> str:
    """A name from the file system (surrogate-escaped where it is not UTF-8) as valid
    Unicode text: unchanged when it is UTF-8, else with ``\\xNN`` escapes."""
    try:
        name.encode("utf-8")
    except UnicodeEncodeError:
        raw = name.encode("utf-8", "surrogateescape").replace(b"\\", b"\\x5c")
        return raw.decode("utf-8", "backslashreplace")
    return name


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


def _text(value: str) -> str:
    """An error message or link target as valid Unicode."""
    return value.encode("utf-8", "surrogateescape").decode("utf-8", "backslashreplace")


def walk(inbox: Path, exclude: frozenset[str] = frozenset()) -> Iterator[Entry]:
    """Yield the documents of ``inbox`` in a deterministic order.

    ``exclude`` holds inbox-relative paths to skip (besides the top-level manifest).
    Directories are never followed through symbolic links.
    """
    root = os.fspath(inbox)
    with os.scandir(root) as it:  # an unreadable inbox is the caller's error
        top = _listing(it)
    # each frame: (display prefix, os prefix, remaining children, reversed for pop())
    stack: list[tuple[str, str, list[tuple[str, os.DirEntry]]]] = [("", "", top)]
    while stack:
        rel, os_rel, items = stack[-1]
        if not items:
            stack.pop()
            continue
        shown, item = items.pop()
        path = f"{rel}/{shown}" if rel else shown
        os_path = f"{os_rel}/{item.name}" if os_rel else item.name
        if not rel and item.name == MANIFEST_NAME or path in exclude:
            continue
        extra = {"os_path": os_path} if os_path != path else {}
        try:
            st = item.stat(follow_symlinks=False)
        except OSError as err:
            yield Entry(path=path, kind="other", error=_text(err.strerror or str(err)),
                        **extra)
            continue
        if stat.S_ISDIR(st.st_mode):
            try:
                with os.scandir(os.path.join(root, os_path)) as it:
                    children = _listing(it)
            except OSError as err:
                yield Entry(path=path, kind="unreadable-dir",
                            error=_text(err.strerror or str(err)), **extra)
                continue
            stack.append((path, os_path, children))
            continue
        kind = _kind(st.st_mode)
        target = None
        if kind == "symlink":
            try:
                target = _text(os.readlink(item.path))  # the link text; not followed
            except OSError:
                target = None
        yield Entry(path=path, kind=kind, size=st.st_size if kind == "file" else None,
                    mtime_ns=st.st_mtime_ns, link_target=target, **extra)


def _listing(it: Iterator[os.DirEntry]) -> list[tuple[str, os.DirEntry]]:
    """A folder's entries as (display name, entry), sorted by name and reversed, so that
    ``pop()`` gives them in order. Escaped names are kept distinct from their siblings."""
    items = sorted(it, key=lambda e: e.name)
    names = {item.name for item in items}
    out: list[tuple[str, os.DirEntry]] = []
    for item in items:
        shown = display_name(item.name)
        if shown != item.name:
            while shown in names:
                shown += "\\x00"
            names.add(shown)
        out.append((shown, item))
    out.reverse()
    return out
