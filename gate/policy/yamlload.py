"""A strict YAML reader for policy files that remembers the line of every key.

PyYAML's ``safe_load`` keeps the last of two duplicate keys, reads ``no``/``on``/``off`` as
booleans (so ``allowed: [en, no]`` loses Norwegian) and turns unquoted dates into date
objects. Each of those silently changes what a policy means, so this loader refuses
duplicate keys, reads only ``true``/``false`` as booleans and leaves dates as strings.
It never constructs Python objects from tags (it is built on ``SafeLoader``).

A policy is small and shallow, so the reader has limits that no real policy meets and that
stop hostile ones early: nesting deeper than :data:`MAX_DEPTH` levels is refused while the
document is composed (before Python's recursion limit could be reached), and a document
whose aliases would expand to more than :data:`MAX_NODES` values (an "alias bomb", or an
alias inside its own anchor) is refused before anything is built from it.
"""

from __future__ import annotations

import re
from typing import Any

import yaml
from yaml.constructor import ConstructorError
from yaml.composer import ComposerError
from yaml.events import AliasEvent
from yaml.nodes import MappingNode, Node, ScalarNode, SequenceNode

MAX_DEPTH = 64  # nesting levels; a policy uses about six
MAX_NODES = 250_000  # values after expanding aliases; 1,200 rules with overrides use ~20,000


class StrictLoader(yaml.SafeLoader):
    """SafeLoader without YAML 1.1 surprises and with a nesting limit; see the module
    docstring."""

    def __init__(self, stream: str):
        super().__init__(stream)
        self._depth = 0

    def compose_node(self, parent: Node | None, index: Any) -> Node:
        if self.check_event(AliasEvent):
            return super().compose_node(parent, index)
        self._depth += 1
        try:
            if self._depth > MAX_DEPTH:
                raise ComposerError(None, None, f"nesting deeper than {MAX_DEPTH} levels",
                                    self.peek_event().start_mark)
            return super().compose_node(parent, index)
        finally:
            self._depth -= 1


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


def _expanded_size(root: Node) -> int:
    """How many values the document holds once aliases are expanded, computed on the
    node graph without expanding it (iteratively, each node once). Raises
    :class:`YamlProblem` for an alias inside its own anchor or too large an expansion."""
    sizes: dict[int, int] = {}
    depths: dict[int, int] = {}
    open_nodes: set[int] = set()
    stack: list[tuple[Node, bool]] = [(root, False)]
    while stack:
        node, done = stack.pop()
        key = id(node)
        children = _children(node)
        if done:
            open_nodes.discard(key)
            sizes[key] = min(MAX_NODES + 1, 1 + sum(sizes[id(c)] for c in children))
            depths[key] = 1 + max((depths[id(c)] for c in children), default=0)
            if sizes[key] > MAX_NODES:
                raise YamlProblem(node.start_mark.line + 1,
                                  f"the aliases here expand to more than {MAX_NODES:,} "
                                  "values; write the policy out without such aliases")
            if depths[key] > MAX_DEPTH:
                raise YamlProblem(node.start_mark.line + 1, "aliases here nest values "
                                  f"deeper than {MAX_DEPTH} levels")
            continue
        if key in sizes:
            continue
        if key in open_nodes:
            raise YamlProblem(node.start_mark.line + 1,
                              "an alias refers to the anchor it is inside (a loop)")
        open_nodes.add(key)
        stack.append((node, True))
        stack.extend((child, False) for child in children if id(child) not in sizes)
    return sizes[id(root)]


def _children(node: Node) -> list[Node]:
    if isinstance(node, MappingNode):
        return [part for pair in node.value for part in pair]
    if isinstance(node, SequenceNode):
        return list(node.value)
    return []


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
        _expanded_size(node)
        data = loader.construct_document(node)
    except yaml.MarkedYAMLError as err:
        mark = err.problem_mark or err.context_mark
        line = mark.line + 1 if mark else None
        problem = err.problem or err.context or "syntax error"
        raise YamlProblem(line, str(problem)) from None
    except yaml.YAMLError as err:
        raise YamlProblem(None, str(err)) from None
    except RecursionError:  # not expected within the limits above; never a traceback
        raise YamlProblem(None, f"the document nests too deeply (limit {MAX_DEPTH} "
                                "levels)") from None
    finally:
        loader.dispose()
    lines: dict[tuple, int] = {}
    _walk(node, (), lines)
    return data, lines
