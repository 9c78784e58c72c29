"""The command line: exit codes and exact one-paragraph errors, never a traceback."""

import json
import subprocess
import sys
from pathlib import Path

ROOT = Path(__file__).resolve().parent.parent


def gate(*args, cwd=None):
    return subprocess.run([sys.executable, "-m", "gate", *map(str, args)], capture_output=True,
                          text=True, cwd=cwd)


def test_policy_check_valid(tmp_path):
    path = tmp_path / "p.yaml"
    path.write_text("version: 1\nname: ok\nsources:\n  allow:\n    - domain: a.example.org\n")
    result = gate("policy", "check", path)
    assert result.returncode == 0
    assert result.stdout == \
        f"{path}: valid policy 'ok' (sections: sources; checks on: format, source)\n"


def test_policy_check_reports_line_and_key(tmp_path):
    path = tmp_path / "p.yaml"
    path.write_text("version: 1\nname: bad\nlanguage:\n  allowed: [en]\n  min_confidense: 0.8\n")
    result = gate("policy", "check", path)
    assert result.returncode == 2
    assert result.stderr == (f"error: policy {path} is invalid: line 5: "
                             "language.min_confidense: unknown key 'min_confidense'; did you "
                             "mean 'min_confidence'?\n")
    assert "Traceback" not in result.stderr


def test_policy_check_missing_file(tmp_path):
    result = gate("policy", "check", tmp_path / "nope.yaml")
    assert result.returncode == 2
    assert result.stderr.startswith(f"error: policy {tmp_path / 'nope.yaml'} is invalid: "
                                    "cannot read the file (No such file or directory)")


def test_policy_schema_is_json():
    result = gate("policy", "schema")
    assert result.returncode == 0
    assert json.loads(result.stdout)["title"] == "gate policy"


def test_run_missing_inbox(tmp_path):
    policy = tmp_path / "p.yaml"
    policy.write_text("version: 1\nname: p\n")
    result = gate("run", tmp_path / "missing", "--policy", policy, "--out", tmp_path / "o")
    assert result.returncode == 2
    assert result.stderr == f"error: the inbox {tmp_path / 'missing'} does not exist.\n"


def test_run_bad_as_of(tmp_path):
    policy = tmp_path / "p.yaml"
    policy.write_text("version: 1\nname: p\n")
    (tmp_path / "in").mkdir()
    result = gate("run", tmp_path / "in", "--policy", policy, "--out", tmp_path / "o",
                  "--as-of", "last tuesday")
    assert result.returncode == 2
    assert result.stderr == ("error: --as-of 'last tuesday' is not an ISO 8601 date-time "
                             "(for example 2026-12-01T00:00:00Z)\n")


def test_run_bad_manifest_names_the_line(tmp_path):
    policy = tmp_path / "p.yaml"
    policy.write_text("version: 1\nname: p\n")
    inbox = tmp_path / "in"
    inbox.mkdir()
    (inbox / "manifest.jsonl").write_text('{"path": "a.txt"}\n{"path": "b.txt", "sha": "x"}\n')
    result = gate("run", inbox, "--policy", policy, "--out", tmp_path / "o")
    assert result.returncode == 2
    assert result.stderr.startswith(f"error: manifest {inbox / 'manifest.jsonl'}, line 2: "
                                    "unknown key 'sha'.")


def test_run_prints_a_summary_and_exits_zero(tmp_path):
    policy = tmp_path / "p.yaml"
    policy.write_text("version: 1\nname: p\n")
    inbox = tmp_path / "in"
    inbox.mkdir()
    (inbox / "a.txt").write_text("The depot opens at seven. " * 20)
    (inbox / "b.bin").write_bytes(b"\x00\x01\x02" * 30)
    result = gate("run", inbox, "--policy", policy, "--out", tmp_path / "o", "--as-of",
                  "2026-12-01", "--workers", "1")
    assert result.returncode == 0, result.stderr
    lines = result.stdout.splitlines()
    assert lines[0] == ("run-0001: 2 documents, 1 accepted, 1 quarantined "
                        "(as of 2026-12-01T00:00:00Z)")
    assert "  format.unsupported" in result.stdout
    assert "changes for the index: add 1" in result.stdout


def test_codes_lists_every_code():
    result = gate("codes")
    assert result.returncode == 0
    assert "source.denied" in result.stdout and "format.timeout" in result.stdout


def test_terminal_output_escapes_control_characters():
    from gate.cli.common import shown
    assert shown("evil\x1b[2J\x07name") == "evil<U+001B>[2J<U+0007>name"
    assert shown("bad-\udcff.txt") == "bad-<U+DCFF>.txt"
    assert shown("Grüße.txt") == "Grüße.txt"


def test_error_messages_with_hostile_names_are_escaped(tmp_path):
    policy = tmp_path / "p.yaml"
    policy.write_text("version: 1\nname: p\n")
    missing = tmp_path / "in\x1b[31mred"
    result = gate("run", missing, "--policy", policy, "--out", tmp_path / "o")
    assert result.returncode == 2 and "\x1b" not in result.stderr
    assert "in<U+001B>[31mred" in result.stderr
