"""A strict YAML reader for policy files that remembers the line of every key.

PyYAML's ``safe_load`` keeps the last of two duplicate keys, reads ``no``/``on``/``off`` as
booleans (so ``allowed: [en, no]`` loses Norwegian) and turns unquoted dates into date
objects. Each of those silently changes what a policy means, so this loader refuses
duplicate keys, reads only ``true``/``false`` as booleans and leaves dates as strings.
It never constructs Python objects from tags (it is built on ``SafeLoader``).
"""

from __future__ import annotations

import re
from typing import Any

import yaml
from yaml.constructor import ConstructorError
from yaml.nodes import MappingNode, Node, ScalarNode, SequenceNode


class StrictLoader(yaml.SafeLoader):
    """SafeLoader without YAML 1.1 surprises; see the module docstring."""


StrictLoader.yaml_implicit_resolvers = {
    first: [(tag, regexp) for tag, regexp in resolvers
            if tag not in ("tag:yaml.org,2002:bool", "tag:yaml.org,2002:timestamp")]
    for first, resolvers in yaml.SafeLoader.yaml_implicit_resolvers.items()
}
StrictLoader.add_implicit_resolver(
    "tag:yaml.org,2002:bool", re.compile(r"^(?:true|True|TRUE|false|False|FALSE)\Z"),
    list("tTfF"))


def _construct_mapping(loader: StrictLoader, node: MappingNode, deep: bool = False) -> dict:
    seen: dict[Any, int] = {}
    for key_node, _ in node.value:
        key = loader.construct_object(key_node, deep=True)
        try:
            hash(key)
        except TypeError:
            raise ConstructorError(None, None, "a mapping key must be a plain value",
                                   key_node.start_mark) from None
        if key in seen:
            raise ConstructorError(
                None, None, f"duplicate key {key!r} (first at line {seen[key]})",
                key_node.start_mark)
        seen[key] = key_node.start_mark.line + 1
    return yaml.SafeLoader.construct_mapping(loader, node, deep=deep)


StrictLoader.add_constructor("tag:yaml.org,2002:map", _construct_mapping)


def _walk(node: Node, path: tuple, lines: dict[tuple, int]) -> None:
    lines[path] = node.start_mark.line + 1
    if isinstance(node, MappingNode):
        for key_node, value_node in node.value:
            key = key_node.value if isinstance(key_node, ScalarNode) else str(key_node)
            lines[path + (key,)] = key_node.start_mark.line + 1
            _walk(value_node, path + (key,), lines)
            # the key line is the more useful place to point at for a mapping entry
            lines[path + (key,)] = key_node.start_mark.line + 1
    elif isinstance(node, SequenceNode):
        for index, item in enumerate(node.value):
            _walk(item, path + (index,), lines)


class YamlProblem(ValueError):
    """A YAML syntax or structure error, with the 1-based line where it was found."""

    def __init__(self, line: int | None, message: str):
        super().__init__(message)
        self.line = line


def load(text: str) -> tuple[Any, dict[tuple, int]]:
    """Parse ``text``; return the data and a map from key path to 1-based line."""
    try:
        loader = StrictLoader(text)
    except yaml.YAMLError as err:  # the reader rejects control characters up front
        mark = getattr(err, "problem_mark", None)
        raise YamlProblem(mark.line + 1 if mark else None, str(err).splitlines()[0]) from None
    try:
        node = loader.get_single_node()
        if node is None:
            return None, {}
        data = loader.construct_document(node)
    except yaml.MarkedYAMLError as err:
        mark = err.problem_mark or err.context_mark
        line = mark.line + 1 if mark else None
        problem = err.problem or err.context or "syntax error"
        raise YamlProblem(line, str(problem)) from None
    except yaml.YAMLError as err:
        raise YamlProblem(None, str(err)) from None
    finally:
        loader.dispose()
    lines: dict[tuple, int] = {}
    _walk(node, (), lines)
    return data, lines
