"""One helper makes invisible and control characters visible, on every screen."""

from __future__ import annotations

import json
import subprocess
import sys
import unicodedata

from gate.htmlreport import text as html_text
from gate.visible import visible


def test_control_format_and_separator_characters_are_shown():
    # Unicode categories from the standard library's unicodedata (the Unicode database):
    # U+0007 BEL and U+001B ESC are Cc; U+200B ZERO WIDTH SPACE, U+202E RIGHT-TO-LEFT
    # OVERRIDE, U+2066 LEFT-TO-RIGHT ISOLATE, U+FEFF and U+E0041 TAG LATIN CAPITAL A are Cf;
    # U+2028 LINE SEPARATOR is Zl.
    samples = {"\x07": "Cc", "\x1b": "Cc", "\u200b": "Cf", "\u202e": "Cf", "\u2066": "Cf",
               "\ufeff": "Cf", "\U000e0041": "Cf", "\u2028": "Zl"}
    for ch, category in samples.items():
        assert unicodedata.category(ch) == category
        assert visible(f"a{ch}b") == f"a<U+{ord(ch):04X}>b"
    assert visible("bad-\udcff.txt") == "bad-<U+DCFF>.txt"  # a surrogate (Cs)
    assert visible("\u3164") == "<U+3164>"  # HANGUL FILLER: a letter that draws nothing


def test_ordinary_text_is_left_alone():
    for value in ("Grüße aus Köln", "Fahrplan 2026 – Änderungen", "日本語のテキスト", "a b\u00a0c"):
        assert visible(value) == value
    assert visible("one\ntwo\tthree", keep="\n\t") == "one\ntwo\tthree"
    assert visible("one\ntwo") == "one<U+000A>two"


def test_the_html_report_uses_the_same_helper():
    assert html_text("report\u202etxt.exe") == "report&lt;U+202E&gt;txt.exe"


def test_a_bidi_override_in_a_file_name_never_reaches_the_terminal(tmp_path):
    inbox = tmp_path / "inbox"
    inbox.mkdir()
    (inbox / "invoice\u202etxt.exe").write_bytes(b"")  # empty: quarantined by format
    policy = tmp_path / "p.yaml"
    policy.write_text("version: 1\nname: p\n")
    out = tmp_path / "out"
    gate = [sys.executable, "-m", "gate"]
    done = subprocess.run([*gate, "run", str(inbox), "--policy", str(policy), "--out",
                           str(out), "--quiet"], capture_output=True, text=True)
    assert done.returncode == 0, done.stderr
    report = json.loads((out / "report.json").read_text(encoding="utf-8"))
    assert report["documents"][0]["path"] == "invoice\u202etxt.exe"  # data keeps the name
    listed = subprocess.run([*gate, "review", "list", str(out)], capture_output=True,
                            text=True)
    assert "invoice<U+202E>txt.exe" in listed.stdout
    assert "\u202e" not in listed.stdout + listed.stderr
    shown = subprocess.run([*gate, "review", "show", str(out), report["documents"][0]["id"]],
                           capture_output=True, text=True)
    assert "path:    invoice<U+202E>txt.exe" in shown.stdout and "\u202e" not in shown.stdout
