"""Discovery: every entry listed once, links never followed, sorted order."""

import os

from gate.discovery import walk


def test_walk_lists_files_links_and_skips_only_the_top_manifest(tmp_path):
    inbox = tmp_path / "inbox"
    (inbox / "sub").mkdir(parents=True)
    (inbox / "b.txt").write_text("b")
    (inbox / "a.txt").write_text("a")
    (inbox / "manifest.jsonl").write_text("{}")
    (inbox / "sub" / "manifest.jsonl").write_text("nested manifests are documents")
    outside = tmp_path / "secret.txt"
    outside.write_text("outside the inbox")
    os.symlink(outside, inbox / "link-out")
    os.symlink(tmp_path, inbox / "sub" / "dirlink")  # a link to a directory: not walked
    os.symlink("loop", inbox / "loop")  # a link to itself
    os.mkfifo(inbox / "pipe")
    entries = {e.path: e for e in walk(inbox)}
    assert sorted(entries) == ["a.txt", "b.txt", "link-out", "loop", "pipe", "sub/dirlink",
                               "sub/manifest.jsonl"]
    assert entries["link-out"].kind == "symlink"
    assert entries["link-out"].link_target == str(outside)
    assert entries["sub/dirlink"].kind == "symlink"
    assert entries["pipe"].kind == "fifo"
    assert entries["a.txt"].kind == "file" and entries["a.txt"].size == 1
    assert list(e.path for e in walk(inbox)) == list(entries)  # deterministic order


def test_unreadable_directory_is_listed(tmp_path):
    inbox = tmp_path / "inbox"
    locked = inbox / "locked"
    locked.mkdir(parents=True)
    (locked / "x.txt").write_text("x")
    locked.chmod(0)
    try:
        if os.access(locked, os.R_OK):  # running as root: permissions are not enforced
            return
        entries = list(walk(inbox))
        assert [(e.path, e.kind) for e in entries] == [("locked", "unreadable-dir")]
    finally:
        locked.chmod(0o755)


def test_odd_names(tmp_path):
    inbox = tmp_path / "inbox"
    inbox.mkdir()
    names = ["with space.txt", "new\nline.txt", "-leading-dash.txt", "ünïcödé.txt",
             "x" * 250 + ".txt"]
    for name in names:
        (inbox / name).write_text("t")
    bad = os.fsencode(inbox) + b"/bad-\xff.txt"  # not valid UTF-8
    with open(bad, "wb") as fh:
        fh.write(b"t")
    paths = [e.path for e in walk(inbox)]
    assert set(names) <= set(paths)
    assert "bad-\\xff.txt" in paths  # the documented escaped form (valid Unicode)
    bad_entry = next(e for e in walk(inbox) if e.path == "bad-\\xff.txt")
    assert os.fsencode(bad_entry.fs_path) == b"bad-\xff.txt"  # opens the real name
    assert len(paths) == len(names) + 1
