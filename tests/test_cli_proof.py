"""The command line for naming jobs, the calc package, the plaque and `library check`:
real subprocess runs, exit codes and one clear message."""

from __future__ import annotations

import csv
import io
import json
import os
import subprocess
import sys
from pathlib import Path

import pytest

PRESETS = Path(__file__).resolve().parents[1] / "presets"


@pytest.fixture
def env(tmp_path):
    e = dict(os.environ)
    e["SHOPBEAM_USER_DIR"] = str(tmp_path / "user")
    e.pop("SHOPBEAM_LIBRARY", None)
    return e


def run(env, *args, cwd=None):
    return subprocess.run([sys.executable, "-m", "shopbeam", *args], capture_output=True,
                          text=True, timeout=180, env=env, cwd=cwd)


def test_every_command_takes_a_library_name(env, tmp_path):
    want = json.loads(run(env, "solve", str(PRESETS / "demo.toml"), "--json").stdout)
    for name in ("bundled:demo", "demo"):
        r = run(env, "solve", name, "--json")
        assert r.returncode == 0, r.stderr
        assert json.loads(r.stdout)["reactions"] == want["reactions"]
    for args in (("check", "bundled:demo"), ("capacity", "demo"), ("rating", "bundled:jib-arm"),
                 ("size", "bundled:demo", "--top", "2"), ("report", "demo"),
                 ("library", "show", "bundled:demo")):
        r = run(env, *args)
        assert r.returncode == 0, (args, r.stderr)


def test_new_with_spaces_then_solve_by_name(env, tmp_path):
    r = run(env, "new", "bay 4 arm")
    assert r.returncode == 0, r.stderr
    written = tmp_path / "user" / "bay-4-arm.toml"
    assert written.exists() and str(written) in r.stdout
    for name in ("bay-4-arm", "bay 4 arm", "user:bay-4-arm"):
        r = run(env, "check", name)
        assert r.returncode == 0, (name, r.stderr)


def test_near_misses_say_did_you_mean_and_exit_2(env):
    r = run(env, "solve", "bundled:dmeo")
    assert r.returncode == 2 and "did you mean 'bundled:demo'" in r.stderr
    assert "Traceback" not in r.stderr
    r = run(env, "capacity", "jib-arn")
    assert r.returncode == 2 and "'jib-arm'" in r.stderr


def test_report_writes_html_and_markdown_and_refuses_to_overwrite(env, tmp_path):
    out = tmp_path / "pkg.html"
    r = run(env, "report", "bundled:demo", "-o", str(out), "--prepared-by", "R. Fitter",
            "--revision", "B", "--job-number", "Q-7")
    assert r.returncode == 0, r.stderr
    html = out.read_text()
    assert '<span class="lab">Job</span><span class="val">Q-7</span>' in html
    assert "R. Fitter" in html and "Calc package" in html and "SCREENING CHECK ONLY" in html
    assert "Wrote" in r.stdout and "HTML" in r.stdout
    r = run(env, "report", "bundled:demo", "-o", str(out))
    assert r.returncode == 2 and "already exists" in r.stderr and out.read_text() == html
    r = run(env, "report", "bundled:demo", "-o", str(tmp_path / "pkg.md"))
    assert r.returncode == 0 and (tmp_path / "pkg.md").read_text().startswith("# Calc package")
    r = run(env, "report", "bundled:demo", "-o", str(tmp_path / "pkg.docx"))
    assert r.returncode == 2 and ".html, .md or .pdf" in r.stderr


@pytest.mark.parametrize("command", [("report", "bundled:demo"),
                                     ("rating", "bundled:demo", "--plaque")])
def test_a_bad_output_path_is_one_message_about_that_path(env, tmp_path, command):
    # a folder of that name, a place nothing may be written, an empty -o: each said about
    # the -o file (never the hidden temporary file the write goes through), exit 2
    suffix = ".html" if command[0] == "report" else ".txt"
    folder = tmp_path / f"out{suffix}"
    folder.mkdir()
    for more in ((), ("--overwrite",)):  # not "add --overwrite to replace it" first
        r = run(env, *command, "-o", str(folder), *more)
        assert r.returncode == 2 and "is a folder, not a file" in r.stderr
    assert ".saving" not in r.stderr and "Traceback" not in r.stderr
    missing = tmp_path / "nowhere" / f"x{suffix}"
    r = run(env, *command, "-o", str(missing))
    assert r.returncode == 2 and "does not exist" in r.stderr
    assert "nothing was written" in r.stderr and "Make the folder first" in r.stderr
    if os.path.isdir("/proc"):  # a folder the system keeps: nothing can be made there
        r = run(env, *command, "-o", f"/proc/x{suffix}")
        assert r.returncode == 2 and f"cannot write /proc/x{suffix}" in r.stderr
        assert ".saving" not in r.stderr
    r = run(env, *command, "-o", "")
    assert r.returncode == 2 and "names no file" in r.stderr and not r.stdout


def test_pdf_without_a_browser_says_what_to_do(env, tmp_path):
    env["SHOPBEAM_BROWSER"] = str(tmp_path / "no-such-browser")
    out = tmp_path / "pkg.pdf"
    r = run(env, "report", "bundled:demo", "-o", str(out))
    assert r.returncode == 2 and "Traceback" not in r.stderr
    assert "no Chromium" in r.stderr and "apt-get install chromium" in r.stderr
    assert ".html" in r.stderr and not out.exists()


def test_rating_plaque_to_html(env, tmp_path):
    out = tmp_path / "plaque.html"
    r = run(env, "rating", "bundled:pallet-rack-beam-pair", "--plaque", "-o", str(out))
    assert r.returncode == 0, r.stderr
    html = out.read_text()
    assert "LOAD RATING" in html and "PER LEVEL (pair of beams)" in html
    assert "rounded down from" in html and "SCREENING CHECK ONLY" in html
    r = run(env, "rating", "bundled:pallet-rack-beam-pair", "-o", str(tmp_path / "x.html"))
    assert r.returncode == 2 and "--plaque" in r.stderr


def test_library_check_lines_and_csv(env):
    r = run(env, "library", "check", "--from", "bundled")
    assert r.returncode == 0, r.stderr
    assert "bundled:demo" in r.stdout and "PASS" in r.stdout and "jobs:" in r.stdout
    r = run(env, "library", "check", "--from", "bundled", "--csv")
    rows = list(csv.DictReader(io.StringIO(r.stdout)))
    assert len(rows) == len(list(PRESETS.glob("*.toml")))
    assert {x["result"] for x in rows} <= {"PASS", "FAIL", "ERROR"}


def test_the_text_ui_takes_a_library_name_too(tmp_path, monkeypatch):
    from shopbeam.cli import build_parser, resolve_job_arg

    monkeypatch.setenv("SHOPBEAM_USER_DIR", str(tmp_path / "user"))
    monkeypatch.delenv("SHOPBEAM_LIBRARY", raising=False)

    for argv in (["ui", "bundled:jib-arm"], ["ui", "jib-arm"]):
        args = build_parser().parse_args(argv)
        resolve_job_arg(args)
        assert args.job == str(PRESETS / "jib-arm.toml")
