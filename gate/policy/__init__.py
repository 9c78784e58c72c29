"""Policy files: loading, layering, validation with line numbers, and the JSON Schema.

``load_policy(path)`` is the one way to get a :class:`~gate.policy.model.Policy`. Every
problem is collected and reported as ``line N: key.path: what is wrong`` inside one
:class:`~gate.errors.PolicyError`; unknown keys are errors (with a suggestion when the key
looks like a typo), so a misspelt key never switches a check off silently.

Layering: ``extends: base.yaml`` (a path relative to the file) starts from another policy.
Mappings merge key by key, a list or a value replaces the base's, and ``null`` removes a
key or a whole section (switching that check off). Problems in a base file are reported
with that file's name and line.

Per-source overrides: an allow rule may carry ``overrides`` with sections (integrity,
freshness, language, injection, quality, format) merged the same way onto the policy for
the documents that rule admits, for example a partner site allowed to publish in French.
"""

from __future__ import annotations

import difflib
import hashlib
import json
import typing
from dataclasses import dataclass
from pathlib import Path
from typing import Any

from pydantic import BaseModel, ValidationError

from gate import checks, signing
from gate.bounded import InputFileProblem, read_regular
from gate.errors import PolicyError
from gate.policy import yamlload
from gate.policy.model import Policy

__all__ = ["LoadedPolicy", "Policy", "load_policy", "parse_policy", "schema"]

_TAGS = {"domain", "url_prefix", "path"}


MAX_POLICY_BYTES = 4 << 20  # a policy file or a base: far above any real policy
MAX_EXTENDS = 16  # bases in one chain of extends


@dataclass(frozen=True)
class LoadedPolicy:
    """A validated policy, where it came from, and its per-source variants."""

    policy: Policy
    path: str
    sha256: str  # of the files' bytes (the policy and its bases): in every provenance record
    files: tuple[str, ...] = ()
    by_rule: Any = None  # sources.allow index -> the Policy with that rule's overrides

    @property
    def name(self) -> str:
        return self.policy.name

    def for_rule(self, index: int | None) -> Policy:
        if index is None or not self.by_rule:
            return self.policy
        return self.by_rule.get(index, self.policy)


def _clean_loc(loc: tuple) -> tuple:
    """Drop the union tag pydantic inserts after a rule's index (allow.0.domain.trust)."""
    out: list[Any] = []
    i = 0
    while i < len(loc):
        out.append(loc[i])
        if isinstance(loc[i], int) and i + 2 < len(loc) and loc[i + 1] in _TAGS and \
                len(out) >= 2 and out[-2] in ("allow", "deny"):
            i += 2
            continue
        i += 1
    return tuple(out)


def _dotted(loc: tuple) -> str:
    text = ""
    for part in loc:
        text += f"[{part}]" if isinstance(part, int) else (f".{part}" if text else str(part))
    return text or "(top level)"


def _model_at(loc: tuple, raw_loc: tuple) -> type[BaseModel] | None:
    """The model class that owns the last key of ``loc`` (for unknown-key suggestions)."""
    model: Any = Policy
    for index, part in enumerate(loc[:-1]):
        if isinstance(part, int):
            continue
        fields = getattr(model, "model_fields", None)
        if fields is None or part not in fields:
            return None
        annotation = fields[part].annotation
        model = _unwrap(annotation, raw_loc, index)
        if model is None:
            return None
    return model if hasattr(model, "model_fields") else None


def _unwrap(annotation: Any, raw_loc: tuple, index: int) -> Any:
    args = typing.get_args(annotation)
    if hasattr(annotation, "model_fields"):
        return annotation
    if not args:
        return None
    candidates = []
    for arg in args:
        inner = _unwrap(arg, raw_loc, index)
        if inner is not None:
            candidates.append(inner)
    if len(candidates) == 1:
        return candidates[0]
    # a rule union: pick the member whose tag appears in the raw location
    for cand in candidates:
        for tag in _TAGS:
            if tag in raw_loc and tag in cand.model_fields:
                return cand
    return candidates[0] if candidates else None


def _explain(err: dict[str, Any], loc: tuple, raw_loc: tuple) -> str:
    kind = err.get("type")
    if kind == "extra_forbidden":
        key = loc[-1]
        owner = _model_at(loc, raw_loc)
        known = sorted(owner.model_fields) if owner else []
        hint = ""
        close = difflib.get_close_matches(str(key), known, n=1, cutoff=0.75)
        if close:
            hint = f"; did you mean {close[0]!r}?"
        elif known:
            hint = f"; known keys here: {', '.join(known)}"
        return f"unknown key {key!r}{hint}"
    if kind == "missing":
        return "this key is required"
    message = err.get("msg", "invalid value")
    return message.removeprefix("Value error, ")


def _problems(exc: ValidationError, where: dict[tuple, tuple[str, int]], top: str,
              prefix: tuple = ()) -> list[str]:
    problems = []
    for err in exc.errors(include_url=False):
        raw_loc = tuple(err.get("loc", ()))
        loc = _clean_loc(raw_loc)
        found = None
        for candidate in ((prefix + loc) if prefix else None, loc):
            if candidate is None:
                continue
            for cut in range(len(candidate), -1, -1):
                if candidate[:cut] in where and (cut or not prefix):
                    found = where[candidate[:cut]]
                    break
            if found:
                break
        shown = prefix + loc if prefix else loc
        if found:
            file, line = found
            place = f"line {line}: " if file == top else f"{file} line {line}: "
        else:
            file, line, place = top, 0, ""
        problems.append(((file != top, line), f"{place}{_dotted(shown)}: "
                                              f"{_explain(err, loc, raw_loc)}"))
    problems.sort(key=lambda p: p[0])
    return [text for _key, text in problems]


def _parse_text(text: str, source: str) -> tuple[dict, dict[tuple, int]]:
    try:
        data, lines = yamlload.load(text)
    except yamlload.YamlProblem as err:
        where = f"line {err.line}: " if err.line else ""
        raise PolicyError(source, [f"{where}YAML syntax: {err}"]) from None
    if data is None:
        raise PolicyError(source, ["the file is empty; a policy needs at least "
                                   "'version: 1' and 'name'"])
    if not isinstance(data, dict):
        raise PolicyError(source, ["line 1: the top level must be a mapping of keys"])
    return data, lines


def _merge(base: Any, child: Any) -> Any:
    if not isinstance(base, dict) or not isinstance(child, dict):
        return child
    out = dict(base)
    for key, value in child.items():
        if value is None:
            out.pop(key, None)
        elif isinstance(value, dict) and isinstance(out.get(key), dict):
            out[key] = _merge(out[key], value)
        else:
            out[key] = value
    return out


def _merge_where(base: dict, child: dict, data: Any, path: tuple = ()) -> dict:
    """Line origins after a merge: the child's lines win, and the base's lines under a
    value the child replaced wholesale are dropped."""
    out = dict(base)
    replaced = [p for p in child if p[:len(path)] == path and not _is_mapping_at(data, p)]
    for key in list(out):
        if any(key[:len(p)] == p and len(key) > len(p) for p in replaced):
            del out[key]
    out.update(child)
    return out


def _is_mapping_at(data: Any, path: tuple) -> bool:
    for part in path:
        if isinstance(data, dict) and part in data:
            data = data[part]
        elif isinstance(data, list) and isinstance(part, int) and part < len(data):
            data = data[part]
        else:
            return False
    return isinstance(data, dict)


def _read_layers(path: Path, chain: tuple[Path, ...] = ()) -> tuple[dict, dict, list]:
    """The merged data of a policy and its bases, line origins, and (file, bytes) read."""
    try:
        raw = read_regular(path, MAX_POLICY_BYTES)
    except InputFileProblem as err:
        raise PolicyError(str(path), [err.clause()]) from None
    try:
        text = raw.decode("utf-8")
    except UnicodeDecodeError as err:
        raise PolicyError(str(path), [f"the file is not UTF-8 (byte {err.start})"]) from None
    data, lines = _parse_text(text, str(path))
    where = {key: (str(path), line) for key, line in lines.items()}
    signer_files, problems = signing.expand_signer_files(data, path.parent)
    if problems:
        raise PolicyError(str(path), [f"line {lines.get(loc, 1)}: {_dotted(loc)}: {message}"
                                      for loc, message in problems])
    files = [(str(path), raw), *signer_files]
    base_ref = data.get("extends")
    if base_ref is None:
        return data, where, files
    if not isinstance(base_ref, str) or not base_ref:
        raise PolicyError(str(path), [f"line {lines.get(('extends',), 1)}: extends: give the "
                                      "path of the base policy file"])
    if len(chain) >= MAX_EXTENDS:
        raise PolicyError(str(path), [f"line {lines.get(('extends',), 1)}: extends: more "
                                      f"than {MAX_EXTENDS} policies extend one another; "
                                      "flatten the chain"])
    base_path = (path.parent / base_ref).resolve()
    if base_path in chain or base_path == path.resolve():
        loop = " -> ".join(str(p) for p in (*chain, path.resolve(), base_path))
        raise PolicyError(str(path), [f"line {lines.get(('extends',), 1)}: extends: the "
                                      f"policies extend each other in a loop ({loop})"])
    base_data, base_where, base_files = _read_layers(base_path, (*chain, path.resolve()))
    child = {k: v for k, v in data.items() if k != "extends"}
    merged = _merge({k: v for k, v in base_data.items() if k != "extends"}, child)
    where = _merge_where(base_where, where, merged)
    return merged, where, files + base_files


def _validate(data: dict, where: dict, top: str) -> tuple[Any, dict[int, Any]]:
    try:
        policy = Policy.model_validate(data)
    except ValidationError as exc:
        raise PolicyError(top, _problems(exc, where, top)) from None
    by_rule: dict[int, Any] = {}
    rules = (data.get("sources") or {}).get("allow") or []
    problems: list[str] = []
    for index, rule in enumerate(rules):
        overrides = rule.get("overrides") if isinstance(rule, dict) else None
        if not overrides:
            continue
        prefix = ("sources", "allow", index, "overrides")
        overridable = checks.per_source_sections()
        bad = [k for k in overrides if k not in overridable]
        if bad:
            file, line = where.get(prefix + (bad[0],), (top, 0))
            place = f"line {line}: " if file == top else f"{file} line {line}: "
            problems.append(f"{place}{_dotted(prefix + (bad[0],))}: {bad[0]!r} cannot be "
                            f"overridden per source (only the sections {', '.join(overridable)})")
            continue
        variant, found = _override(policy, data, overrides, where, top, prefix)
        problems += found
        if not found:
            by_rule[index] = variant
    if problems:
        raise PolicyError(top, problems)
    return policy, by_rule


def _override(policy: Any, data: dict, overrides: dict, where: dict, top: str,
              prefix: tuple) -> tuple[Any, list[str]]:
    """The policy with one rule's overrides merged in. Only the overridden sections are
    validated (the rest of the policy already is), so each rule costs the size of its own
    overrides, not of the whole policy: 1,200 rules do not validate the policy 1,200
    times."""
    update: dict[str, Any] = {}
    problems: list[str] = []
    for section, value in overrides.items():
        if value is None:
            update[section] = None  # the rule switches this check off
            continue
        settings = type(policy).model_fields[section].annotation
        model = next(arg for arg in typing.get_args(settings) if arg is not type(None))
        try:
            update[section] = model.model_validate(_merge(data.get(section), value))
        except ValidationError as exc:
            problems += _problems(exc, where, top, prefix + (section,))
    return policy.model_copy(update=update), problems


def parse_policy(text: str, source: str) -> Policy:
    """Validate policy text (no ``extends``: that needs a file); ``source`` names it."""
    data, lines = _parse_text(text, source)
    if "extends" in data:
        raise PolicyError(source, [f"line {lines.get(('extends',), 1)}: extends: only a "
                                   "policy file can extend another (use load_policy)"])
    where = {key: (source, line) for key, line in lines.items()}
    return _validate(data, where, source)[0]


def load_policy(path: str | Path) -> LoadedPolicy:
    """Read, layer and validate a policy file."""
    path = Path(path)
    data, where, files = _read_layers(path)
    policy, by_rule = _validate(data, where, str(path))
    digest = hashlib.sha256()
    for name, raw in files:
        digest.update(hashlib.sha256(raw).digest())
    sha = hashlib.sha256(files[0][1]).hexdigest() if len(files) == 1 else digest.hexdigest()
    return LoadedPolicy(policy=policy, path=str(path), sha256=sha,
                        files=tuple(name for name, _raw in files), by_rule=by_rule)


def schema() -> dict[str, Any]:
    """The JSON Schema of policy files (for editors' completion and validation)."""
    out = Policy.model_json_schema()
    out["$schema"] = "https://json-schema.org/draft/2020-12/schema"
    out["title"] = "gate policy"
    return out


def schema_text() -> str:
    return json.dumps(schema(), indent=2, sort_keys=True) + "\n"
