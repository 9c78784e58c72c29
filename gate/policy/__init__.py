"""Policy files: loading, validation with line numbers, and the JSON Schema.

``load_policy(path)`` is the one way to get a :class:`~gate.policy.model.Policy`. Every
problem is collected and reported as ``line N: key.path: what is wrong`` inside one
:class:`~gate.errors.PolicyError`; unknown keys are errors (with a suggestion when the key
looks like a typo), so a misspelt key never switches a check off silently.
"""

from __future__ import annotations

import difflib
import hashlib
import json
from dataclasses import dataclass
from pathlib import Path
from typing import Any

from pydantic import BaseModel, ValidationError

from gate.errors import PolicyError
from gate.policy import yamlload

__all__ = ["LoadedPolicy", "Policy", "load_policy", "parse_policy", "schema"]

_TAGS = {"domain", "url_prefix", "path"}


def __getattr__(name: str) -> Any:
    # The model is assembled from the check registry, and the checks import
    # gate.policy.base: importing it lazily keeps that cycle from forming.
    if name == "Policy":
        from gate.policy.model import Policy
        return Policy
    raise AttributeError(name)


@dataclass(frozen=True)
class LoadedPolicy:
    """A validated policy and where it came from."""

    policy: Policy
    path: str
    sha256: str  # of the file's bytes: recorded in every provenance record

    @property
    def name(self) -> str:
        return self.policy.name


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
    from gate.policy.model import Policy
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
    import typing
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


def parse_policy(text: str, source: str) -> Policy:
    """Validate policy text; ``source`` names it in error messages."""
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
    from gate.policy.model import Policy
    try:
        return Policy.model_validate(data)
    except ValidationError as exc:
        problems = []
        for err in exc.errors(include_url=False):
            raw_loc = tuple(err.get("loc", ()))
            loc = _clean_loc(raw_loc)
            line = None
            for cut in range(len(loc), -1, -1):
                if loc[:cut] in lines:
                    line = lines[loc[:cut]]
                    break
            where = f"line {line}: " if line else ""
            problems.append((line or 0, f"{where}{_dotted(loc)}: "
                                        f"{_explain(err, loc, raw_loc)}"))
        problems.sort(key=lambda p: p[0])
        raise PolicyError(source, [text for _line, text in problems]) from None


def load_policy(path: str | Path) -> LoadedPolicy:
    """Read, parse and validate a policy file."""
    path = Path(path)
    try:
        data = path.read_bytes()
    except OSError as err:
        raise PolicyError(str(path), [f"cannot read the file ({err.strerror or err})"]) \
            from None
    try:
        text = data.decode("utf-8")
    except UnicodeDecodeError as err:
        raise PolicyError(str(path), [f"the file is not UTF-8 (byte {err.start})"]) from None
    policy = parse_policy(text, str(path))
    return LoadedPolicy(policy=policy, path=str(path),
                        sha256=hashlib.sha256(data).hexdigest())


def schema() -> dict[str, Any]:
    """The JSON Schema of policy files (for editors' completion and validation)."""
    from gate.policy.model import Policy
    out = Policy.model_json_schema()
    out["$schema"] = "https://json-schema.org/draft/2020-12/schema"
    out["title"] = "gate policy"
    return out


def schema_text() -> str:
    return json.dumps(schema(), indent=2, sort_keys=True) + "\n"
