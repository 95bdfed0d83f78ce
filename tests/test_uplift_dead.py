"""A live load marked uplift = true is held down by the dead loads: they are counted in full
and at 0.6 (ASCE 7-16 2.4.1, load combination 7, 0.6D + 0.6W), and every check, capacity and
sizing row takes the worse.

The hand figures are simple-beam statics (w L^2 / 8, w L / 2: AISC Manual Table 3-23, case 1)
with the section properties of the AISC Shapes Database v15.0 (HSS6X4X1/4: Sx 8.36 in^3...
read from the shipped catalog here, so the checks test the combination, not the table).
"""

from __future__ import annotations

import json
import math
import subprocess
import sys
from dataclasses import replace
from pathlib import Path

import pytest

from shopbeam.design.analysis import analyze
from shopbeam.design.capacity import capacity
from shopbeam.design.sizing import size
from shopbeam.jobs.jobfile import parse_job_text
from shopbeam.output.label import label_text, rating

LBF, FT = 4.4482216152605, 0.3048
LBF_FT = LBF / FT

CANOPY = """schema = 1
title = "canopy purlin, wind uplift"
[beam]
length = "6 ft"
section = "HSS6x4x1/4"
material = "A500C"
self_weight = false
restrained = true
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "6 ft"
type = "roller"
[[loads]]
type = "uniform"
start = "0 ft"
end = "6 ft"
value = "-100 lbf/ft"
case = "dead"
label = "roof panels"
[[loads]]
type = "uniform"
start = "0 ft"
end = "6 ft"
value = "UPLIFT"
label = "wind uplift"
uplift = true
"""


def _job(uplift: str = '"300 lbf/ft"', **kw):
    text = CANOPY.replace('"UPLIFT"', uplift)
    for k, v in kw.items():
        text = text.replace(k, v)
    return parse_job_text(text)


def _check(res, name):
    return {c.name: c for c in res.checks}[name]


def test_bending_under_uplift_counts_the_dead_load_at_six_tenths():
    # net uplift (300 - 0.6 x 100) lbf/ft = 240 lbf/ft: M = 240 x 6^2 / 8 = 1080 lbf*ft
    # (with the dead load in full it would be 200 x 4.5 = 900 lbf*ft)
    res = analyze(_job())
    b = _check(res, "bending")
    assert b.demand == pytest.approx(1080 * LBF * FT, rel=1e-9)
    assert "0.6" in b.state and "ASCE 7-16 2.4.1" in b.state
    # the shear likewise: 240 x 6 / 2 = 720 lbf
    assert _check(res, "shear").demand == pytest.approx(720 * LBF, rel=1e-9)
    # the reactions shown stay those of the loads as entered (200 x 3 = 600 lbf, pulling)
    assert [r.force for r in res.solution.reactions] == pytest.approx([-600 * LBF] * 2)
    # and the anchors are named for the larger pull, 720 lbf at 0.6 D
    up = [c for c in res.cautions if c.startswith("UPLIFT")]
    assert len(up) == 2 and all("720 lbf" in c and "0.6" in c for c in up), up
    assert any("0.6 W" in n and "in full and at 0.6" in n for n in res.cautions)


def test_dead_load_in_full_governs_where_it_adds():
    # a light uplift: the dead load wins, the member sags, and the full dead load is worse
    # (100 - 30) x 4.5 = 315 lbf*ft against (60 - 30) x 4.5 = 135 lbf*ft at 0.6 D
    res = analyze(_job('"30 lbf/ft"'))
    b = _check(res, "bending")
    assert b.demand == pytest.approx(315 * LBF * FT, rel=1e-9)
    assert "0.6" not in b.state
    assert any("the dead loads in full govern every check" in n for n in res.cautions)


def test_capacity_posts_the_uplift_the_six_tenths_dead_load_allows():
    job = _job()
    cap = capacity(job)
    assert cap.rated, cap.not_rated
    # bending governs a restrained HSS: M = Ma = Fy Zx / 1.67 (F7-1, compact). The factor
    # makes (300 k - 60) x 4.5 lbf*ft = Ma; in full it would make (300 k - 100) x 4.5 = Ma
    ma = _check(cap, "bending").limit / (LBF * FT)  # lbf*ft
    assert cap.governing.name == "bending"
    assert cap.factor == pytest.approx((ma / 4.5 + 60) / 300, rel=1e-9)
    assert f"{(ma / 4.5 + 100) / 300:.4g}" in cap.note and "0.6" in cap.note
    assert all("0.6" in c.state for c in cap.checks)
    # the supports at the rated load: the pull (300 k - 60) x 3 (the reaction pulls the
    # member down), the push of the dead load alone in full, 100 x 3 = 300 lbf (the live
    # load may be absent)
    sup = cap.evaluation.reactions[0]
    assert sup["max_down"] == pytest.approx(-(300 * cap.factor - 60) * 3 * LBF, rel=1e-9)
    assert sup["max_up"] == pytest.approx(300 * LBF, rel=1e-9)
    # a gravity job is untouched: no 0.6 anywhere
    down = capacity(_job('"-300 lbf/ft"', **{"uplift = true": ""}))
    assert "0.6" not in down.note and not any("0.6" in c.state for c in down.checks)
    assert down.factor == pytest.approx((ma / 4.5 - 100) / 300, rel=1e-9)


def test_unmarked_upward_load_is_a_slip_not_an_uplift():
    # pushing up with no uplift = true is read as a forgotten minus sign (NOT RATED); it is
    # not checked as a wind uplift, so the dead load stays in full
    job = _job('"300 lbf/ft"', **{"uplift = true": ""})
    assert job.upward
    b = _check(analyze(job), "bending")
    assert b.demand == pytest.approx(900 * LBF * FT, rel=1e-9)
    assert not capacity(job).rated


def test_label_says_the_dead_load_is_counted_at_six_tenths():
    job = _job()
    flat = " ".join(label_text(rating(capacity(job), analyze(job).unchecked))
                    .replace("|", " ").split())
    assert "only 0.6 of the dead load" in flat
    gravity = _job('"-300 lbf/ft"', **{"uplift = true": ""})
    flat = " ".join(label_text(rating(capacity(gravity), analyze(gravity).unchecked))
                    .replace("|", " ").split())
    assert "0.6" not in flat


@pytest.mark.parametrize("kind", ["HSS", "W"])
def test_sizing_rows_agree_with_the_full_check(kind):
    # every listed row's ratio and factor are the section's own report and capacity, which
    # take the worse of the two dead-load multiples
    job = _job('"500 lbf/ft"', **{"restrained = true": "braced = true"})
    res = size(job, kind)
    assert res.lightest is not None
    seen = 0
    at = res.rows.index(res.lightest)
    for r in res.rows[max(0, at - 5):at + 20]:
        j = replace(job, section=r.section, material=r.material)
        g = max(analyze(j).checks, key=lambda c: c.ratio)
        assert r.ratio == pytest.approx(g.ratio, rel=1e-9), r.designation
        if g.ratio <= 1 and r.checked != "screen":
            assert r.factor == pytest.approx(capacity(j).factor, rel=1e-9), r.designation
            seen += 1
    assert seen >= 3
    assert "in full and at 0.6" in res.method
    lightest = replace(job, section=res.lightest.section, material=res.lightest.material)
    assert max(c.ratio for c in analyze(lightest).checks) <= 1


def test_cli_json_carries_the_worse_combination(tmp_path):
    p = tmp_path / "canopy.toml"
    p.write_text(CANOPY.replace('"UPLIFT"', '"300 lbf/ft"'))
    root = Path(__file__).resolve().parents[1]
    out = subprocess.run([sys.executable, "-m", "shopbeam", "solve", str(p), "--json"],
                         capture_output=True, text=True, cwd=root)
    assert out.returncode == 0, out.stderr
    d = json.loads(out.stdout)
    b = next(c for c in d["checks"] if c["name"] == "bending")
    assert b["params"]["moment_demand"] == pytest.approx(1080 * LBF * FT, rel=1e-9)
    assert "0.6" in b["state"]
    assert math.isfinite(b["ratio"])
