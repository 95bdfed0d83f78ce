"""The core stays free of the UI toolkit, and sympy loads only for the calc sheet."""

from __future__ import annotations

import json
import subprocess
import sys
from pathlib import Path

PRESET = Path(__file__).resolve().parents[1] / "tests" / "data" / "cantilever_arm.toml"


def _modules_after(code: str) -> set[str]:
    out = subprocess.run([sys.executable, "-c", code + "\nimport sys, json; print(json.dumps(sorted(sys.modules)))"],
                         capture_output=True, text=True, check=True)
    return set(json.loads(out.stdout.strip().splitlines()[-1]))


def test_solve_imports_neither_textual_nor_sympy():
    mods = _modules_after(
        "from shopbeam.jobs.jobfile import load_job\n"
        "from shopbeam.design.analysis import analyze, to_json\n"
        "from shopbeam import cli, units\n"
        "from shopbeam.output import report\n"
        "from shopbeam.design import checks\n"
        f"r = analyze(load_job({str(PRESET)!r}))\n"
        "report.render(r); to_json(r); r.solution.diagnostics\n")
    assert "textual" not in mods
    assert "sympy" not in mods


def test_calc_sheet_brings_sympy_but_not_textual():
    mods = _modules_after(
        "from shopbeam.jobs.jobfile import load_job\n"
        "from shopbeam.output.calcsheet import calc_sheet\n"
        f"calc_sheet(load_job({str(PRESET)!r}))\n")
    assert "sympy" in mods and "textual" not in mods


def test_no_core_module_imports_textual_at_all():
    root = Path(__file__).resolve().parents[1] / "shopbeam"
    for path in root.rglob("*.py"):
        if "tui" in path.relative_to(root).parts:
            continue
        text = path.read_text()
        assert "import textual" not in text and "from textual" not in text, path
