"""The manifest parser: strict structure with line numbers, values left to the checks."""

import pytest
from hypothesis import given, settings
from hypothesis import strategies as st

from gate import manifest
from gate.errors import ManifestError


def parse(text: str) -> manifest.Manifest:
    return manifest.parse(text, "m.jsonl")


def error(text: str) -> str:
    with pytest.raises(ManifestError) as info:
        parse(text)
    return str(info.value)


def test_contract_example_line():
    # The example line of shared/design/contract.md.
    m = parse('{"path": "reports/q3.pdf", "source_url": "https://docs.example.org/q3.pdf", '
              '"sha256": "' + "ab" * 32 + '", "retrieved_at": "2026-11-30T10:00:00Z", '
              '"published_at": "2026-09-01"}\n')
    rec = m.get("reports/q3.pdf")
    assert rec.source_url == "https://docs.example.org/q3.pdf"
    assert rec.retrieved_at == "2026-11-30T10:00:00Z" and rec.published_at == "2026-09-01"
    assert rec.line == 1


def test_only_path_is_required_and_blank_lines_are_skipped():
    m = parse('\n{"path": "a.txt"}\n\n{"path": "./b/../c.txt"}\n')
    assert m.get("a.txt").line == 2 and m.get("c.txt").line == 4


def test_errors_name_the_line():
    assert error('{"path": "a"}\nnot json\n').startswith("manifest m.jsonl, line 2: not valid JSON")
    assert "line 1: expected a JSON object" in error("[1, 2]\n")
    assert "line 1: missing 'path'" in error('{"source_url": "https://a.example/"}\n')
    assert "'sha256' must be a string" in error('{"path": "a", "sha256": 5}\n')


def test_unknown_keys_are_errors_but_x_keys_are_kept():
    assert "unknown key 'sha265'" in error('{"path": "a", "sha265": "00"}\n')
    m = parse('{"path": "a", "x_crawler": "nightly-7"}\n')
    assert m.get("a").extra == {"x_crawler": "nightly-7"}


def test_repeated_and_escaping_paths_are_errors():
    assert "listed twice (first at line 1)" in error('{"path": "a"}\n{"path": "./a"}\n')
    assert "not relative to the inbox" in error('{"path": "../etc/passwd"}\n')
    assert "not relative to the inbox" in error('{"path": "/etc/passwd"}\n')


def test_values_are_not_judged_here():
    # a malformed digest or URL is a finding for that one document, not a manifest error
    m = parse('{"path": "a", "sha256": "xyz", "source_url": "not a url"}\n')
    assert m.get("a").sha256 == "xyz"


@settings(max_examples=200, deadline=None)
@given(st.text(max_size=300))
def test_parser_never_raises_anything_but_manifest_error(text):
    try:
        parse(text)
    except ManifestError:
        pass


@settings(max_examples=100, deadline=None)
@given(st.lists(st.dictionaries(st.sampled_from(["path", "source_url", "sha256", "x_n"]),
                                st.one_of(st.text(max_size=20), st.integers(), st.none()),
                                max_size=4), max_size=5))
def test_structured_lines_either_parse_or_fail_cleanly(objs):
    import json
    text = "\n".join(json.dumps(o) for o in objs)
    try:
        m = parse(text)
    except ManifestError as err:
        assert "line" in str(err)
    else:
        assert len(m.records) == len(objs)
