"""Findings of the limit-state audit, one test each, run as a shop would run them.

Each job is written the way a shop writes it (invented scenarios), and the figures asserted
are worked out by hand beside each test with the source named. Section properties: AISC
Shapes Database v15.0. Values marked "from memory" are recalled, not looked up.
"""

from __future__ import annotations

import json
import subprocess
import sys

import pytest

from shopbeam.cautions import LIFTING, banner, cautions_for
from shopbeam.design.analysis import analyze, to_json
from shopbeam.design.capacity import capacity, render
from shopbeam.jobs.jobfile import parse_job_text
from shopbeam.output.label import label_text, rating

LBF, IN, FT = 4.4482216152605, 0.0254, 0.3048
KSI = 6894757.293168361


def cli(*args):
    return subprocess.run([sys.executable, "-m", "shopbeam", *args], capture_output=True,
                          text=True, timeout=120)


def monorail(tags='tags = ["lifting"]', criteria="", units="us", section="W12x26",
             supports=None, moving=None, extra_beam=""):
    supports = supports or ('[[supports]]\nat = "0 ft"\ntype = "pin"\n'
                            '[[supports]]\nat = "16 ft"\ntype = "roller"\n')
    moving = moving or ('[[moving]]\nlabel = "trolley"\nloads = ["-2000 lbf", "-2000 lbf"]\n'
                        'spacing = ["12 in"]\n')
    return f"""schema = 1
title = "Bay 4 hoist runway"
units = "{units}"
{tags}
[beam]
length = "16 ft"
section = "{section}"
material = "A992"
{extra_beam}
{supports}
{moving}
[criteria]
{criteria}
"""


# ------------------------------------------------------------------ lifting without the tag
# A job that names its lifting profile in [criteria] is a lifting device whether or not it is
# tagged: the stronger caution (ASME B30.11 / B30.17 and the employer's load test, common
# practice) must appear on the report, the JSON, the capacity, the rating label and the
# text UI banner.
UNTAGGED = monorail(tags="", criteria='lifting = "hand-geared-monorail"')


def test_lifting_profile_without_the_tag_is_a_lifting_device():
    job = parse_job_text(UNTAGGED)
    assert job.lifting
    res = analyze(job)
    assert res.cautions[0] == LIFTING
    assert to_json(res)["cautions"][0] == LIFTING
    cap = capacity(job)
    assert "LIFTING DEVICE" in render(cap)
    text = label_text(rating(cap, res.unchecked), width=200)
    assert "NOT FOR LIFTING" not in text
    assert "LIFTING DEVICE (hand-geared-monorail profile)" in text


def test_lifting_caution_helpers_take_the_profile():
    assert cautions_for((), lifting=True)[0] == LIFTING
    assert cautions_for(("rack",))[0] != LIFTING
    assert banner((), lifting=True).startswith("LIFTING DEVICE")


def test_untagged_lifting_profile_runs_the_wheels_on_the_bottom_flange():
    # The trolley hangs from the bottom flange: the wheels pull it away from the web, so the
    # wheel check (CMAA 74 / Design Guide 7) covers the flange and AISC 360-16 J10.3 web
    # crippling (a force pushing the flange into the web) must not be made at the wheels.
    from shopbeam.design.local import forces_of

    job = parse_job_text(UNTAGGED)
    res = analyze(job)
    assert "wheel flange bending" in {c.name for c in res.checks}
    wheels = [f for f in forces_of(job, res.solution) if f.moving]
    assert wheels and all(f.face == "bottom" and f.pulls for f in wheels)


def test_untagged_lifting_profile_on_the_command_line(tmp_path):
    p = tmp_path / "runway.toml"
    p.write_text(UNTAGGED)
    d = json.loads(cli("solve", str(p), "--json").stdout)
    assert d["cautions"][0] == LIFTING and d["lifting"]["profile"] == "hand-geared-monorail"
    r = cli("rating", str(p))
    assert r.returncode == 0 and "NOT FOR LIFTING" not in r.stdout


def test_untagged_lifting_profile_has_the_lifting_banner_in_the_text_ui(tmp_path, monkeypatch):
    import asyncio

    from shopbeam.tui.app import make_app

    monkeypatch.setenv("SHOPBEAM_USER_DIR", str(tmp_path / "user"))
    monkeypatch.delenv("SHOPBEAM_LIBRARY", raising=False)
    (tmp_path / "user").mkdir()
    p = tmp_path / "runway.toml"
    p.write_text(UNTAGGED)

    async def body():
        app = make_app(p, cursor_blink=False)
        async with app.run_test(size=(100, 32)) as pilot:
            await pilot.pause()
            b = app.job_screen.query_one("#banner")
            return str(b.content), b.has_class("-lifting")

    content, loud = asyncio.run(body())
    assert "LIFTING DEVICE" in content and loud
