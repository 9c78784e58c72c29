"""The documentation stays true to the code: generated files, code table, README commands."""

import re
from pathlib import Path

from gate.checks import all_checks, check_ids
from gate.docsgen import outputs
from gate.findings import CODES

ROOT = Path(__file__).resolve().parent.parent


def test_generated_docs_are_up_to_date():
    for path, text in outputs(ROOT).items():
        assert path.read_text(encoding="utf-8") == text, \
            f"{path.relative_to(ROOT)} is out of date: run python -m gate.docsgen"


def test_every_code_belongs_to_a_known_check_and_is_documented():
    codes_md = (ROOT / "docs" / "codes.md").read_text()
    for code, spec in CODES.items():
        assert spec.check in check_ids(), code
        assert re.fullmatch(r"[a-z]+\.[a-z0-9-]+", code), code
        assert f"`{code}`" in codes_md


def test_every_check_has_a_row_in_the_checks_table_and_a_docstring():
    table = (ROOT / "docs" / "checks.md").read_text()
    for check in all_checks():
        assert f"| `{check.id}` |" in table, check.id
        assert "Example::" in check.doc, f"{check.id} documents no policy example"


def test_readme_names_the_two_commands_and_ci_runs_the_test_one():
    readme = (ROOT / "README.md").read_text()
    assert "make demo" in readme and "make test" in readme
    ci = (ROOT / ".ci" / "run").read_text()
    assert "make test" in ci


def test_readme_commands_exist():
    from typer.main import get_command

    from gate.cli import app
    command = get_command(app)
    readme = (ROOT / "README.md").read_text()
    for name in re.findall(r"^\s*(?:\$ )?gate ([a-z]+)", readme, re.M):
        assert name in command.commands, f"README mentions unknown command gate {name}"
