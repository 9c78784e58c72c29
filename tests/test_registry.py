"""One registry, one order: a new check registered with one line appears everywhere a
check must (policy model and schema, ``policy check``, per-source overrides, report.json,
the report's order, the code table), and a check that raises fails closed with its own
exit status.

The toy checks are invented for these tests. Each test runs in a fresh interpreter so the
registry is changed before anything is derived from it, exactly as an edited
gate/checks/__init__.py would be.
"""

from __future__ import annotations

import json
import subprocess
import sys
import textwrap
from pathlib import Path

ROOT = Path(__file__).resolve().parent.parent

TOY = '''
"""Toy: counts the letter x (an invented check for the registry tests).

Example::

    toy:
      max_x: 3
"""
from pydantic import Field

from gate.checks.base import CorpusCheck, CorpusOutcome, DocumentCheck
from gate.findings import define
from gate.settings import Section


class ToySettings(Section):
    max_x: int = Field(3, ge=0, description="Most letters x allowed.", examples=[3])


TOO_MANY = define("toy.too-many-x", "too many letters x",
                  "the text has {count} letters x (at most {limit})")


def measure(extraction):
    return extraction.text.count("x")


def evaluate(document, policy, run):
    count = document.measures.get("toy")
    if count is None:
        return None
    limit = policy.toy.max_x
    return [TOO_MANY(count=count, limit=limit)] if count > limit else []


CHECK = DocumentCheck(id="toy", section="toy", evaluate=evaluate, settings=ToySettings,
                      measure=measure, doc=__doc__)


class PairSettings(Section):
    pass


SAME_LENGTH = define("pair.same-x", "as many letters x as another document",
                     "as many letters x as {other}")


def compare(view, settings):
    """Invented corpus check: documents with the same count of x, all but the first."""
    outcome, first = CorpusOutcome(), {}
    for member in view.members:
        if member.measured in first:
            outcome.findings[member.key] = [SAME_LENGTH(other=first[member.measured])]
        else:
            first[member.measured] = member.path
    return outcome


PAIR = CorpusCheck(id="pair", section="pair", settings=PairSettings, measure=measure,
                   evaluate=compare, doc=__doc__)
'''


def run_with(tmp_path: Path, registry_line: str, argv: list[str]) -> subprocess.CompletedProcess:
    """Run ``gate ARGV`` in a fresh interpreter whose registry got ``registry_line``."""
    (tmp_path / "toy.py").write_text(textwrap.dedent(TOY), encoding="utf-8")
    script = textwrap.dedent(f"""
        import sys
        sys.path.insert(0, {str(tmp_path)!r})
        import gate.checks as registry
        import toy
        {registry_line}
        from gate.cli import main
        sys.argv = ["gate", *{argv!r}]
        main()
        """)
    return subprocess.run([sys.executable, "-c", script], capture_output=True, text=True,
                          cwd=tmp_path)


def _inbox(tmp_path: Path) -> Path:
    inbox = tmp_path / "inbox"
    inbox.mkdir()
    # invented texts
    (inbox / "many.txt").write_text("The fox, the ox and the lynx relax by the box. " * 4)
    (inbox / "few.txt").write_text("Timetables change on the first Sunday of December. " * 4)
    (inbox / "few-too.txt").write_text("Fares change on the first Monday of December. " * 4)
    return inbox


ADD_TOY = "registry.DOCUMENT_CHECKS = registry.DOCUMENT_CHECKS + (toy.CHECK,)"
ADD_PAIR = "registry.CORPUS_CHECKS = registry.CORPUS_CHECKS + (toy.PAIR,)"


def test_a_toy_check_appears_everywhere_a_check_must(tmp_path):
    policy = tmp_path / "p.yaml"
    policy.write_text("version: 1\nname: toy\ntoy:\n  max_x: 3\n"
                      "sources:\n  require_provenance: false\n  allow:\n"
                      "    - path: few.txt\n      overrides:\n        toy:\n          max_x: 99\n")
    checked = run_with(tmp_path, ADD_TOY, ["policy", "check", str(policy)])
    assert checked.returncode == 0, checked.stderr
    assert "(sections: sources, toy; checks on: format, source, toy)" in checked.stdout
    schema = json.loads(run_with(tmp_path, ADD_TOY, ["policy", "schema"]).stdout)
    assert "max_x" in json.dumps(schema["$defs"]["ToySettings"])
    assert "toy" in schema["properties"]
    bad = tmp_path / "bad.yaml"
    bad.write_text("version: 1\nname: bad\ntoy:\n  max_y: 3\n")
    refused = run_with(tmp_path, ADD_TOY, ["policy", "check", str(bad)])
    assert refused.returncode == 2 and "toy.max_y" in refused.stderr  # the model is strict
    codes = run_with(tmp_path, ADD_TOY, ["codes"]).stdout.splitlines()
    ids = [line.split()[0] for line in codes]
    assert ids.index("injection.internal-error") < ids.index("toy.internal-error") \
        < ids.index("toy.too-many-x") < ids.index("duplicate.exact")  # in registry order
    out = tmp_path / "out"
    done = run_with(tmp_path, ADD_TOY, ["run", str(_inbox(tmp_path)), "--policy",
                                        str(policy), "--out", str(out), "--quiet"])
    assert done.returncode == 0, done.stderr
    report = json.loads((out / "report.json").read_text())
    by_path = {d["path"]: d for d in report["documents"]}
    assert by_path["many.txt"]["checks"]["toy"] == "fail"
    assert [r["code"] for r in by_path["many.txt"]["reasons"]] == ["toy.too-many-x"]
    assert by_path["few.txt"]["checks"]["toy"] == "pass"
    assert report["summary"]["quarantined_by_check"] == {"toy": 1}
    assert "toy.too-many-x" in done.stdout
    html = (out / "report.html").read_text()
    outcomes = html[html.index('<section id="checks">'):]  # the check outcomes table
    rows = sorted(("format", "source", "injection", "toy", "duplicate"),
                  key=lambda name: outcomes.index(f'<td class="mono">{name}</td>'))
    assert rows == ["format", "source", "injection", "toy", "duplicate"]  # registry order
    # per-source overrides: the rule for few.txt raises the limit
    provenance = json.loads((out / "accepted" / by_path["few.txt"]["id"] /
                             "provenance.json").read_text())
    assert provenance["policy"]["overrides_from"] == "sources.allow[0]"


def test_a_toy_corpus_check_is_called_by_the_corpus_stage(tmp_path):
    policy = tmp_path / "p.yaml"
    policy.write_text("version: 1\nname: pair\npair: {}\n")
    out = tmp_path / "out"
    done = run_with(tmp_path, ADD_PAIR, ["run", str(_inbox(tmp_path)), "--policy",
                                         str(policy), "--out", str(out), "--quiet"])
    assert done.returncode == 0, done.stderr
    report = json.loads((out / "report.json").read_text())
    held = {d["path"]: [r["code"] for r in d["reasons"]] for d in report["documents"]}
    # "few.txt" and "few-too.txt" have no x: the second in inbox order is held
    assert held == {"few-too.txt": [], "few.txt": ["pair.same-x"], "many.txt": []}
    assert [d["checks"]["pair"] for d in report["documents"]] == ["pass", "fail", "pass"]




def test_a_check_that_raises_holds_the_document_and_exits_4(tmp_path):
    policy = tmp_path / "p.yaml"
    policy.write_text("version: 1\nname: lang\nlanguage:\n  allowed: [en]\n")
    out = tmp_path / "out"
    line = ("import dataclasses\n"
            "        def boom(document, policy, run):\n"
            "            raise ZeroDivisionError('planted bug')\n"
            "        registry.DOCUMENT_CHECKS = tuple(dataclasses.replace(c, evaluate=boom)"
            " if c.id == 'language' else c for c in registry.DOCUMENT_CHECKS)")
    done = run_with(tmp_path, line, ["run", str(_inbox(tmp_path)), "--policy", str(policy),
                                     "--out", str(out), "--quiet"])
    assert done.returncode == 4, done.stderr
    assert "language.internal-error" in done.stderr and "Traceback" not in done.stderr
    report = json.loads((out / "report.json").read_text())
    assert [d["decision"] for d in report["documents"]] == ["quarantined"] * 3
    reason = report["documents"][0]["reasons"][0]
    assert reason["code"] == "language.internal-error"
    assert "ZeroDivisionError: planted bug" in reason["message"]
    assert report["documents"][0]["checks"]["language"] == "fail"
    assert sorted(p.name for p in (out / "quarantine").iterdir()) == \
        sorted(d["id"] for d in report["documents"])  # the run completed its placements
