"""Policy loading: the contract's example, strictness, and errors with line and key path."""

import json
from pathlib import Path

import pytest

from gate.errors import PolicyError
from gate.policy import load_policy, parse_policy, schema

CONTRACT = Path(__file__).parent / "data" / "contract-policy.yaml"


def problems(text: str) -> list[str]:
    with pytest.raises(PolicyError) as info:
        parse_policy(text, "p.yaml")
    return info.value.problems


def test_contract_example_validates_and_means_what_it_says():
    policy = load_policy(CONTRACT).policy
    allow = policy.sources.allow
    assert allow[0].domain == "docs.example.org" and allow[0].subdomains and allow[0].trust == 3
    assert allow[1].url_prefix == "https://wiki.example.org/public/"
    assert allow[2].path == "local/"
    assert policy.sources.deny[0].domain == "paste.example.net"
    assert policy.sources.require_provenance is True
    assert policy.integrity.require_checksum is True
    assert policy.freshness.max_age_days == 365 and policy.freshness.reject_future is True
    assert policy.language.allowed == ("en", "de")
    assert policy.language.min_confidence == pytest.approx(0.80)
    assert policy.duplicates.threshold == pytest.approx(0.80)
    assert policy.injection.threshold == pytest.approx(0.50)
    assert (policy.limits.max_bytes, policy.limits.max_pages, policy.limits.timeout_s) == \
        (20_000_000, 500, 30)


def test_left_out_sections_switch_checks_off_but_limits_apply():
    policy = parse_policy("version: 1\nname: minimal\n", "p.yaml")
    assert policy.sources is None and policy.language is None and policy.freshness is None
    assert policy.limits.max_bytes == 20_000_000  # the contract's default


def test_unknown_key_is_an_error_with_line_and_suggestion():
    text = "version: 1\nname: x\nsources:\n  allow:\n    - domain: a.example.org\n" \
           "      subdomain: true\n"
    assert problems(text) == ["line 6: sources.allow[0].subdomain: unknown key 'subdomain'; "
                              "did you mean 'subdomains'?"]


def test_unknown_section_is_an_error():
    assert problems("version: 1\nname: x\nfreshnes:\n  max_age_days: 3\n") == \
        ["line 3: freshnes: unknown key 'freshnes'; did you mean 'freshness'?"]


def test_out_of_range_values_name_key_and_line():
    text = ("version: 1\nname: x\nsources:\n  allow:\n    - domain: a.example.org\n"
            "      trust: 300\nduplicates:\n  threshold: 1.5\n")
    got = problems(text)
    assert got[0].startswith("line 6: sources.allow[0].trust: Input should be less than")
    assert got[1].startswith("line 8: duplicates.threshold: Input should be less than")


def test_rule_needs_exactly_one_kind():
    text = "version: 1\nname: x\nsources:\n  allow:\n    - domain: a.example.org\n" \
           "      path: local/\n"
    assert problems(text) == ["line 5: sources.allow[0]: a rule needs exactly one of domain, "
                              "url_prefix, path"]


def test_duplicate_keys_are_errors():
    got = problems("version: 1\nname: a\nname: b\n")
    assert got == ["line 3: YAML syntax: duplicate key 'name' (first at line 2)"]


def test_norway_problem_does_not_happen():
    # YAML 1.1 reads "no" as false; a policy must read it as Norwegian (langdetect: "no").
    policy = parse_policy("version: 1\nname: x\nlanguage:\n  allowed: [en, no]\n", "p.yaml")
    assert policy.language.allowed == ("en", "no")


def test_unknown_language_code_is_an_error():
    got = problems("version: 1\nname: x\nlanguage:\n  allowed: [en, eng]\n")
    assert got[0].startswith("line 4: language.allowed: unknown language code 'eng'")


def test_allow_and_deny_of_the_same_domain_is_a_contradiction():
    text = ("version: 1\nname: x\nsources:\n  allow:\n    - domain: docs.paste.example.net\n"
            "  deny:\n    - domain: paste.example.net\n")
    got = problems(text)
    assert "deny rule covers paste.example.net" in got[0]


def test_bad_domain_and_prefix_values():
    text = ("version: 1\nname: x\nsources:\n  allow:\n    - domain: https://a.example.org/\n"
            "    - url_prefix: https://a.example.org/x?y=1\n")
    got = problems(text)
    assert got[0].startswith("line 5: sources.allow[0].domain: ")
    assert "is not a domain name" in got[0]
    assert got[1].startswith("line 6: sources.allow[1].url_prefix: ")
    assert "query or fragment" in got[1]


def test_domains_are_normalised_at_load():
    policy = parse_policy("version: 1\nname: x\nsources:\n  allow:\n    - domain: Bücher.Example\n",
                          "p.yaml")
    assert policy.sources.allow[0].domain == "xn--bcher-kva.example"


def test_yaml_syntax_error_names_line():
    got = problems("version: 1\nname: x\nsources:\n  allow: [\n")
    assert got[0].startswith("line 5: YAML syntax") or got[0].startswith("line 4: YAML syntax")


def test_wrong_version_and_empty_file():
    assert problems("version: 2\nname: x\n")[0].startswith("line 1: version: Input should be 1")
    assert problems("")[0].startswith("the file is empty")
    assert problems("- a\n- b\n") == ["line 1: the top level must be a mapping of keys"]


def test_schema_is_json_schema_and_forbids_extra_keys():
    s = schema()
    assert s["$schema"] == "https://json-schema.org/draft/2020-12/schema"
    assert s["additionalProperties"] is False
    assert {"sources", "integrity", "freshness", "language", "duplicates", "limits"} <= \
        set(s["properties"])
    json.dumps(s)  # serialisable


def test_schema_validates_the_contract_example_with_jsonschema():
    jsonschema = pytest.importorskip("jsonschema")
    import yaml
    data = yaml.safe_load(CONTRACT.read_text())
    jsonschema.validate(data, schema())
    with pytest.raises(jsonschema.ValidationError):
        jsonschema.validate({**data, "sorces": {}}, schema())


def write(tmp_path, name, text):
    path = tmp_path / name
    path.write_text(text)
    return path


def test_extends_merges_and_null_removes(tmp_path):
    write(tmp_path, "base.yaml", "version: 1\nname: base\nlanguage:\n  allowed: [en]\n"
          "  min_chars: 300\nfreshness:\n  max_age_days: 100\nintegrity: {}\n")
    child = write(tmp_path, "child.yaml", "extends: base.yaml\nname: child\nlanguage:\n"
                  "  allowed: [en, de]\nintegrity: null\n")
    loaded = load_policy(child)
    policy = loaded.policy
    assert policy.name == "child"
    assert policy.language.allowed == ("en", "de") and policy.language.min_chars == 300
    assert policy.freshness.max_age_days == 100
    assert policy.integrity is None  # null switched the inherited section off
    assert [Path(f).name for f in loaded.files] == ["child.yaml", "base.yaml"]


def test_errors_in_a_base_file_name_that_file(tmp_path):
    write(tmp_path, "base.yaml", "version: 1\nname: base\nlanguage:\n  allowed: [en]\n"
          "  min_confidance: 0.9\n")
    child = write(tmp_path, "child.yaml", "extends: base.yaml\nname: child\n")
    with pytest.raises(PolicyError) as info:
        load_policy(child)
    assert info.value.problems == [f"{tmp_path / 'base.yaml'} line 5: "
                                   "language.min_confidance: unknown key 'min_confidance'; "
                                   "did you mean 'min_confidence'?"]


def test_extends_loops_and_missing_bases(tmp_path):
    write(tmp_path, "a.yaml", "extends: b.yaml\nversion: 1\nname: a\n")
    write(tmp_path, "b.yaml", "extends: a.yaml\nversion: 1\nname: b\n")
    with pytest.raises(PolicyError, match="in a loop"):
        load_policy(tmp_path / "a.yaml")
    write(tmp_path, "c.yaml", "extends: nowhere.yaml\nversion: 1\nname: c\n")
    with pytest.raises(PolicyError, match="cannot read the file"):
        load_policy(tmp_path / "c.yaml")


def test_per_source_overrides(tmp_path):
    path = write(tmp_path, "p.yaml", """version: 1
name: o
sources:
  allow:
    - domain: docs.example.org
    - domain: partner.example.net
      overrides:
        language:
          allowed: [fr]
        freshness:
          max_age_days: 30
language:
  allowed: [en]
freshness:
  max_age_days: 365
""")
    loaded = load_policy(path)
    assert loaded.for_rule(0).language.allowed == ("en",)
    partner = loaded.for_rule(1)
    assert partner.language.allowed == ("fr",) and partner.freshness.max_age_days == 30
    assert partner.language.min_confidence == loaded.policy.language.min_confidence


def test_bad_overrides_name_the_line(tmp_path):
    path = write(tmp_path, "p.yaml", """version: 1
name: o
sources:
  allow:
    - domain: partner.example.net
      overrides:
        language:
          allowed: [fr]
          min_confidence: 7
        limits:
          max_bytes: 5
""")
    with pytest.raises(PolicyError) as info:
        load_policy(path)
    problems = info.value.problems
    assert any(p.startswith("line 10: sources.allow[0].overrides.limits: 'limits' cannot be "
                            "overridden") for p in problems), problems
    path.write_text(path.read_text().replace("        limits:\n          max_bytes: 5\n", ""))
    with pytest.raises(PolicyError) as info:
        load_policy(path)
    assert info.value.problems[0].startswith(
        "line 9: sources.allow[0].overrides.language.min_confidence: Input should be less")


def test_yaml_tags_that_build_objects_are_refused():
    # safe loading: a python/object tag must never construct anything
    got = problems("version: 1\nname: !!python/object/apply:os.system ['true']\n")
    assert got[0].startswith("line 2: YAML syntax")
