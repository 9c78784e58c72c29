"""The shape of the code: no import cycles inside gate/ (module-level imports only)."""

from __future__ import annotations

import ast
from pathlib import Path

GATE = Path(__file__).resolve().parent.parent / "gate"


def _module_name(path: Path) -> str:
    parts = list(path.relative_to(GATE.parent).with_suffix("").parts)
    if parts[-1] == "__init__":
        parts.pop()
    return ".".join(parts)


def _is_type_checking(node: ast.If) -> bool:
    test = node.test
    return (isinstance(test, ast.Name) and test.id == "TYPE_CHECKING") or \
        (isinstance(test, ast.Attribute) and test.attr == "TYPE_CHECKING")


def _top_level_imports(tree: ast.Module) -> list[ast.Import | ast.ImportFrom]:
    """Imports executed when the module is imported: the module body and the bodies of
    module-level if/try blocks, except ``if TYPE_CHECKING:``."""
    found: list[ast.Import | ast.ImportFrom] = []
    pending: list[ast.stmt] = list(tree.body)
    while pending:
        node = pending.pop()
        if isinstance(node, (ast.Import, ast.ImportFrom)):
            found.append(node)
        elif isinstance(node, ast.If) and not _is_type_checking(node):
            pending += node.body + node.orelse
        elif isinstance(node, ast.Try):
            pending += node.body + node.orelse + node.finalbody
            for handler in node.handlers:
                pending += handler.body
    return found


def import_graph() -> dict[str, set[str]]:
    """module -> the gate modules it imports at module level (a package import also
    runs the package's __init__, so ``a.b.c`` depends on ``a``, ``a.b`` and ``a.b.c``)."""
    modules = {_module_name(p): p for p in GATE.rglob("*.py")}
    graph: dict[str, set[str]] = {name: set() for name in modules}
    for name, path in modules.items():
        package = name if path.name == "__init__.py" else name.rpartition(".")[0]
        tree = ast.parse(path.read_text(encoding="utf-8"))
        for node in _top_level_imports(tree):
            targets: list[str] = []
            if isinstance(node, ast.Import):
                targets = [alias.name for alias in node.names]
            else:
                base = node.module or ""
                if node.level:
                    anchor = package.split(".")
                    anchor = anchor[:len(anchor) - node.level + 1]
                    base = ".".join(anchor + ([base] if base else []))
                targets = [base] + [f"{base}.{alias.name}" for alias in node.names]
            for target in targets:
                parts = target.split(".")
                for cut in range(1, len(parts) + 1):
                    prefix = ".".join(parts[:cut])
                    if prefix in modules and prefix != name and \
                            not name.startswith(prefix + "."):
                        graph[name].add(prefix)
    return graph


def cycles(graph: dict[str, set[str]]) -> list[list[str]]:
    """Every strongly connected group of more than one module (Tarjan's algorithm)."""
    index: dict[str, int] = {}
    low: dict[str, int] = {}
    stack: list[str] = []
    on_stack: set[str] = set()
    groups: list[list[str]] = []

    def visit(node: str) -> None:
        index[node] = low[node] = len(index)
        stack.append(node)
        on_stack.add(node)
        for nxt in sorted(graph[node]):
            if nxt not in index:
                visit(nxt)
                low[node] = min(low[node], low[nxt])
            elif nxt in on_stack:
                low[node] = min(low[node], index[nxt])
        if low[node] == index[node]:
            group = []
            while True:
                top = stack.pop()
                on_stack.discard(top)
                group.append(top)
                if top == node:
                    break
            if len(group) > 1:
                groups.append(sorted(group))

    for node in sorted(graph):
        if node not in index:
            visit(node)
    return groups


def test_the_detector_finds_a_planted_cycle():
    graph = {"gate.a": {"gate.b"}, "gate.b": {"gate.c"}, "gate.c": {"gate.a"}, "gate.d": set()}
    assert cycles(graph) == [["gate.a", "gate.b", "gate.c"]]
    assert cycles({"gate.a": {"gate.b"}, "gate.b": set()}) == []


def test_the_graph_sees_real_imports():
    graph = import_graph()
    assert "gate.checks" in graph["gate.policy.model"]
    assert "gate.settings" in graph["gate.checks.source"]


def test_no_import_cycle_inside_gate():
    found = cycles(import_graph())
    assert found == [], f"import cycles: {found}"
