"""The package's layers: imports only go downward, no import cycles, and no command-line code
(argparse, print, sys.exit) below `cli/` and `tui/`.

Layer order (DEVELOPERS.md): foundation (units, errors, cautions) -> engine -> members -> jobs
-> design -> output -> cli, tui. Every import counts, also one inside a function.
"""

from __future__ import annotations

import ast
from pathlib import Path

ROOT = Path(__file__).resolve().parents[1] / "shopbeam"
LAYERS = {"foundation": 0, "engine": 1, "members": 2, "jobs": 3, "design": 4, "output": 5,
          "tui": 6, "cli": 7, "entry": 8}
UI = ("cli", "tui", "entry")


def _module(path: Path) -> str:
    parts = list(path.relative_to(ROOT.parent).with_suffix("").parts)
    if parts[-1] == "__init__":
        parts.pop()
    return ".".join(parts)


def _layer(module: str) -> str:
    parts = module.split(".")
    if module == "shopbeam.__main__":
        return "entry"
    if len(parts) > 2 or (len(parts) == 2 and parts[1] in LAYERS):
        return parts[1]
    return "foundation"  # shopbeam, shopbeam.units, shopbeam.errors, shopbeam.cautions


def _modules() -> dict[str, ast.Module]:
    return {_module(p): ast.parse(p.read_text(encoding="utf-8")) for p in ROOT.rglob("*.py")}


def _imports(name: str, tree: ast.Module, known: set[str]) -> set[str]:
    """The shopbeam modules this module imports (a package's submodule when named)."""
    out = set()
    pkg = name if (ROOT.parent / name.replace(".", "/") / "__init__.py").exists() else \
        name.rsplit(".", 1)[0]
    for node in ast.walk(tree):
        if isinstance(node, ast.Import):
            out |= {a.name for a in node.names if a.name.startswith("shopbeam")}
        elif isinstance(node, ast.ImportFrom):
            base = node.module or ""
            if node.level:
                up = pkg.split(".")[: len(pkg.split(".")) - node.level + 1]
                base = ".".join(up + ([base] if base else []))
            if not base.startswith("shopbeam"):
                continue
            for a in node.names:
                sub = f"{base}.{a.name}"
                out.add(sub if sub in known else base)
    out.discard(name)
    return out


GRAPH = None


def _graph() -> dict[str, set[str]]:
    global GRAPH
    if GRAPH is None:
        mods = _modules()
        GRAPH = {m: _imports(m, t, set(mods)) for m, t in mods.items()}
    return GRAPH


def test_imports_only_go_downward():
    wrong = []
    for mod, deps in _graph().items():
        here = LAYERS[_layer(mod)]
        for d in deps:
            if d == "shopbeam":  # the package itself (its version) is foundation
                continue
            if LAYERS[_layer(d)] > here:
                wrong.append(f"{mod} ({_layer(mod)}) imports {d} ({_layer(d)})")
    assert wrong == []


def test_the_layer_test_sees_real_imports():
    # the parser above must find the imports it is meant to judge, or the tests pass vacuously
    g = _graph()
    assert "shopbeam.engine.model" in g["shopbeam.engine.solver"]
    assert "shopbeam.jobs.jobfile" in g["shopbeam.design.analysis"]
    assert _layer("shopbeam.tui.app") == "tui" and _layer("shopbeam.units") == "foundation"


def _cycles(g: dict[str, set[str]]) -> list[set[str]]:
    """The strongly connected groups of more than one module (Tarjan)."""
    index: dict[str, int] = {}
    low: dict[str, int] = {}
    stack: list[str] = []
    on: set[str] = set()
    out: list[set[str]] = []

    def visit(m):
        index[m] = low[m] = len(index)
        stack.append(m)
        on.add(m)
        for d in g.get(m, ()):
            if d not in g:
                continue
            if d not in index:
                visit(d)
                low[m] = min(low[m], low[d])
            elif d in on:
                low[m] = min(low[m], index[d])
        if low[m] == index[m]:
            group = set()
            while True:
                x = stack.pop()
                on.discard(x)
                group.add(x)
                if x == m:
                    break
            if len(group) > 1:
                out.append(group)

    for m in sorted(g):
        if m not in index:
            visit(m)
    return out


def test_no_import_cycles():
    assert [sorted(c) for c in _cycles(_graph())] == []


def test_the_cycle_finder_finds_a_cycle():
    assert _cycles({"a": {"b"}, "b": {"c"}, "c": {"a"}, "d": {"a"}}) == [{"a", "b", "c"}]


def test_no_command_line_code_below_cli_and_tui():
    wrong = []
    for mod, tree in _modules().items():
        if _layer(mod) in UI:
            continue
        for node in ast.walk(tree):
            if isinstance(node, ast.Call) and isinstance(node.func, ast.Name) and \
                    node.func.id == "print":
                wrong.append(f"{mod}:{node.lineno}: print()")
            if isinstance(node, ast.Attribute) and node.attr == "exit" and \
                    isinstance(node.value, ast.Name) and node.value.id == "sys":
                wrong.append(f"{mod}:{node.lineno}: sys.exit")
            if isinstance(node, (ast.Import, ast.ImportFrom)):
                names = [a.name for a in node.names] + [getattr(node, "module", None) or ""]
                if "argparse" in names:
                    wrong.append(f"{mod}:{node.lineno}: argparse")
    assert wrong == []
