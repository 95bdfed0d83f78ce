"""No control character from a job file reaches the terminal: titles, labels, notes and keys
are shown with their control characters escaped in every output (JSON escapes them itself)."""

from __future__ import annotations

import json
import os
import re
import subprocess
import sys
from pathlib import Path

import pytest

from shopbeam.escapes import shown

PRESETS = Path(__file__).resolve().parents[1] / "shopbeam" / "presets"
CONTROL = re.compile("[\x00-\x08\x0b-\x1f\x7f-\x9f\u202a-\u202e\u2066-\u2069]")
TITLE = "Loft \u001b[8m beam \u009b31m bell\u0007 \u202e"


def job_text() -> str:
    s = (PRESETS / "demo.toml").read_text()
    s = s.replace('title = "Loft beam over the saw bay, with stair overhang"',
                  'title = "Loft \\u001b[8m beam \\u009b31m bell\\u0007 \\u202e"')
    s = s.replace('label = "stair"', 'label = "st\\u001b[2Jair"')
    return s.replace('notes = "Demo', 'notes = "\\u001b]0;title\\u0007 Demo')


def run(*argv, env=None):
    return subprocess.run([sys.executable, "-m", "shopbeam", *argv], capture_output=True,
                          text=True, env={**os.environ, **(env or {})})


def test_shown_escapes_controls_and_keeps_the_rest():
    assert shown("a\x1b[8mb") == "a\\x1b[8mb"
    assert shown("tab\there\nnext", keep="\n") == "tab\\there\nnext"
    assert shown("\u202eevil") == "\\u202eevil"
    assert shown("Träger 5 kN·m ✓") == "Träger 5 kN·m ✓"


@pytest.mark.parametrize("argv", [["solve"], ["solve", "--calc"], ["rating"], ["capacity"],
                                  ["check"]])
def test_every_report_escapes_the_job_text(tmp_path, argv):
    p = tmp_path / "esc.toml"
    p.write_text(job_text())
    r = run(*argv, str(p))
    assert r.returncode == 0, r.stderr
    assert not CONTROL.search(r.stdout + r.stderr)
    if argv == ["solve"]:
        assert "\\x1b[8m" in r.stdout and "FAIL" in r.stdout or "PASS" in r.stdout


def test_json_keeps_the_title_exactly(tmp_path):
    p = tmp_path / "esc.toml"
    p.write_text(job_text())
    r = run("solve", "--json", str(p))
    assert r.returncode == 0 and not CONTROL.search(r.stdout)
    assert json.loads(r.stdout)["title"] == TITLE


def test_library_list_show_and_error_messages_escape(tmp_path):
    (tmp_path / "esc.toml").write_text(job_text())
    (tmp_path / "bad.toml").write_text('title = "x"\n"\\u001b[8mk" = 1\n')
    env = {"SHOPBEAM_USER_DIR": str(tmp_path / "user")}
    for argv in (["library", "list"], ["library", "show", "shop:esc"], ["check", "shop:bad"]):
        r = run(*argv, "--library", str(tmp_path), env=env)
        assert not CONTROL.search(r.stdout + r.stderr), argv
    r = run("check", str(tmp_path / "bad.toml"))
    assert r.returncode == 2 and "\\x1b[8mk" in r.stderr and "bad.toml" in r.stderr


def test_the_report_renderer_itself_escapes():
    from shopbeam.design.analysis import analyze
    from shopbeam.jobs.jobfile import parse_job_text
    from shopbeam.output.report import render

    text = render(analyze(parse_job_text(job_text(), "esc.toml")))
    assert not CONTROL.search(text) and "\\x1b[8m" in text


@pytest.mark.parametrize("argv", [["solve"], ["size", "--kind", "W", "--top", "3"],
                                  ["capacity"], ["rating"], ["solve", "--calc"]])
def test_a_line_break_in_a_title_or_label_adds_no_line_to_a_report(tmp_path, argv):
    # a title or label is one line: "\n" and "\t" in it are shown, not obeyed, so a job file
    # cannot print a line that reads as shopbeam's own verdict
    fake = "FAKE governing: bending, ratio 0.100 -> PASS"
    s = job_text().replace('label = "st\\u001b[2Jair"', f'label = "stair\\n{fake}\\tx"')
    s = s.replace('title = "Loft \\u001b[8m beam \\u009b31m bell\\u0007 \\u202e"',
                  f'title = "Loft\\n{fake}"')
    p = tmp_path / "nl.toml"
    p.write_text(s)
    r = run(*argv, str(p))
    assert r.returncode == 0, r.stderr
    assert not any(line.lstrip().startswith("FAKE") for line in r.stdout.splitlines())
    assert "\t" not in r.stdout
