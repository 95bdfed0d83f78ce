"""Structured check results and the one presentation model the report and the text UI share."""

from __future__ import annotations

import json
import re
from pathlib import Path

import pytest

from shopbeam import units
from shopbeam.design.analysis import analyze, to_json
from shopbeam.jobs.jobfile import load_job, parse_job_text
from shopbeam.output import report
from shopbeam.output.present import present
from shopbeam.tui import drawing

FT = 0.3048
PRESETS = Path(__file__).resolve().parents[1] / "shopbeam" / "presets"

# AISC Design Examples F.1-3A (from memory): W18x50 A992, 35 ft simple span, braced at
# midspan: Lb = 17.5 ft > Lr (elastic LTB governs). The same beam written in metres.
METRIC = """schema = 1
title = "Metric W-beam"
units = "si"
[beam]
length = "10.668 m"
section = "W18x50"
material = "A992"
self_weight = false
braces = ["5.334 m"]
[[supports]]
at = "0 m"
type = "pin"
[[supports]]
at = "10.668 m"
type = "roller"
[[loads]]
type = "uniform"
value = "-14.6 kN/m"
"""


def test_bending_carries_its_numbers_as_fields_in_si():
    bend = next(c for c in analyze(parse_job_text(METRIC)).checks if c.name == "bending")
    # AISC Manual Table 3-2 (from memory): W18x50 Lp = 5.83 ft, Lr = 16.9 ft
    assert bend.params["Lp"] / FT == pytest.approx(5.83, rel=5e-3)
    assert bend.params["Lr"] / FT == pytest.approx(16.9, rel=1e-2)
    assert bend.params["Lb"] == pytest.approx(5.334)
    assert 1.0 < bend.params["Cb"] < 1.35  # AISC Design Examples F.1-3A: Cb = 1.30 (from memory)
    # Lb 17.5 ft > Lr 16.9 ft: elastic lateral-torsional buckling, F2.2 eqs. F2-3 and F2-4
    assert bend.clause == "AISC 360-16 F2.2, eq. F2-3/F2-4" and bend.source == "AISC 360-16"
    assert bend.as_dict()["params"]["Lb"] == pytest.approx(5.334)


def test_a_metric_job_shows_metric_in_its_check_formulas():
    # the lengths in the provision's words are in the job's units (mm), never inches
    res = analyze(parse_job_text(METRIC))
    bend = next(c for c in res.checks if c.name == "bending")
    assert "F2-3/F2-4" in bend.formula
    assert re.search(r"Lb 5334 mm > Lr \d+(\.\d+)? mm", bend.formula), bend.formula
    text = report.render(res)
    assert not re.search(r"\d in\b", text), [ln for ln in text.splitlines() if " in" in ln]
    us = analyze(parse_job_text(METRIC.replace('units = "si"', 'units = "us"')))
    assert "Lb 210 in" in next(c for c in us.checks if c.name == "bending").formula


def test_continuous_shelf_report_json_and_ui_show_the_same_governing_state():
    # the continuous-shelf preset is patterned: the state governing deflection loads the
    # right span only, which lifts the left end (uplift at the pin)
    res = analyze(load_job(PRESETS / "continuous-shelf.toml"))
    p = present(res)
    st = p.governing_state
    assert st is not None and "patterned loads on" in st.words
    js = json.loads(json.dumps(to_json(res)))["governing_state"]
    assert js["words"] == st.words
    assert [r.uplift for r in st.reactions] == [r["force"] < 0 for r in js["reactions"]]
    assert [r.force for r in st.reactions] == [
        units.fmt(r["force"], "force", res.job.units) for r in js["reactions"]]
    assert st.uplift == tuple(f"{r.kind} at {r.at} pulls down {r.force.lstrip('-')}"
                              for r in st.reactions if r.uplift)
    text = report.render(res)
    ui = drawing.reactions_table(res)
    for rows in (p.reactions, st.reactions):
        for r in rows:
            assert f"force {r.force}" in text and r.force in ui
    assert st.words in text.replace("\n  ", " ") and st.words in ui
    if st.uplift:
        assert "(pulls down: uplift)" in text and "uplift" in ui
    # each check's governing state: the same words in the report, the UI and the JSON
    checks_ui = drawing.checks_table(res)
    for c, cj in zip(res.checks, to_json(res)["checks"]):
        assert c.state and cj["state"] == c.state
        assert f"worst state: {c.state}" in checks_ui
        assert "worst state: " + c.state in cj["detail"]


def test_uplift_words_match_the_sign():
    res = analyze(load_job(PRESETS / "continuous-shelf.toml"))
    st = present(res).governing_state
    for r, sol_r in zip(st.reactions, res.state_solution.reactions):
        assert r.uplift == (sol_r.force < 0)
