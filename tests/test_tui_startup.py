"""The first screen of the text UI is drawn before the heavy modules load: numpy, pint, the
design modules, the catalog, the drawings, plotext and sympy come with the solve (in a
worker) or with the view that needs them. Checked in a fresh interpreter (what is imported
is a fact; how long it takes is measured in bench/tui.py)."""

from __future__ import annotations

import json
import os
import subprocess
import sys
from pathlib import Path

DEMO = Path(__file__).resolve().parents[1] / "presets" / "demo.toml"

HEAVY = ["numpy", "pint", "sympy", "plotext", "shopbeam.design.analysis",
         "shopbeam.design.checks", "shopbeam.jobs.jobfile", "shopbeam.members.catalog",
         "shopbeam.members.materials", "shopbeam.output.present", "shopbeam.tui.drawing"]

FIRST_SCREEN = r"""
import asyncio, json, sys
from shopbeam.tui import app as tui_app
tui_app.JobScreen.solve_soon = lambda self: None  # hold the solve back: the screen alone
async def main():
    app = tui_app.make_app(sys.argv[1], cursor_blink=False)
    async with app.run_test(size=(80, 24)) as pilot:
        await pilot.pause()
        summary = str(app.job_screen.query_one("#summary").render())
        title = app.job_screen.query_one("#job").query("Field").first().input.value
        print(json.dumps({"modules": sorted(sys.modules), "summary": summary,
                          "title": title}))
asyncio.run(main())
"""


def _first_screen(tmp_path) -> dict:
    env = {**os.environ, "SHOPBEAM_USER_DIR": str(tmp_path / "user")}
    out = subprocess.run([sys.executable, "-c", FIRST_SCREEN, str(DEMO)], capture_output=True,
                         text=True, check=True, env=env, timeout=300)
    return json.loads(out.stdout.strip().splitlines()[-1])


def test_the_first_screen_is_drawn_without_the_heavy_modules(tmp_path):
    got = _first_screen(tmp_path)
    mods = set(got["modules"])
    assert "textual" in mods  # the screen really ran
    assert got["title"].startswith("Loft beam")  # the job is on it, read from the file
    assert "Reading and solving" in got["summary"]
    assert [m for m in HEAVY if m in mods] == []


def test_the_solve_brings_them_in():
    """The other side: solving (as the worker does) does import the design modules, so the
    test above is not passing only because nothing is ever loaded."""
    code = ("import sys, json\n"
            "from shopbeam.tui import session\n"
            "from shopbeam.jobs import jobdoc\n"
            f"ev = session.evaluate_doc(jobdoc.load({str(DEMO)!r}))\n"
            "assert ev.result is not None, ev.problems\n"
            "print(json.dumps(sorted(sys.modules)))\n")
    out = subprocess.run([sys.executable, "-c", code], capture_output=True, text=True,
                         check=True, timeout=300)
    mods = set(json.loads(out.stdout.strip().splitlines()[-1]))
    assert {"numpy", "shopbeam.design.analysis", "shopbeam.jobs.jobfile"} <= mods


def test_the_command_reaches_the_text_ui_without_the_design_modules():
    """`shopbeam` (no command: the text UI) builds its parser and parses its arguments
    without importing the design modules either; `solve` still brings them."""
    code = ("import sys, json\n"
            "from shopbeam import cli\n"
            "args = cli.build_parser().parse_args(['ui'])\n"
            "assert args.func is cli.cmd_ui\n"
            "print(json.dumps(sorted(sys.modules)))\n")
    out = subprocess.run([sys.executable, "-c", code], capture_output=True, text=True,
                         check=True, timeout=300)
    mods = set(json.loads(out.stdout.strip().splitlines()[-1]))
    assert [m for m in HEAVY + ["shopbeam.cli.proof"] if m in mods] == []
