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
    assert any("0.6 W" in n and "with the dead loads at 0.6" in n and "uplift off" in n
               for n in res.cautions)


def test_the_dead_load_alone_governs_where_the_uplift_only_relieves():
    # a light uplift: the dead load wins and the member sags; the uplift comes and goes, so
    # the worst is the dead load alone, 100 x 4.5 = 450 lbf*ft (against (100 - 30) x 4.5 =
    # 315 lbf*ft as entered and (60 - 30) x 4.5 = 135 lbf*ft at 0.6 D)
    res = analyze(_job('"30 lbf/ft"'))
    b = _check(res, "bending")
    assert b.demand == pytest.approx(450 * LBF * FT, rel=1e-9)
    assert "0.6" not in b.state and "uplift off" in b.state
    # the seats carry the dead load alone on a calm day: 100 x 3 = 300 lbf up
    assert [r["max_up"] for r in res.reaction_envelope] == pytest.approx([300 * LBF] * 2)
    # where the uplift wins, the dead load at 0.6 governs: (300 - 0.6 x 5) x 4.5 lbf*ft
    up = analyze(_job('"300 lbf/ft"', **{'value = "-100 lbf/ft"': 'value = "-5 lbf/ft"'}))
    b = _check(up, "bending")
    assert b.demand == pytest.approx((300 - 3) * 4.5 * LBF * FT, rel=1e-9)
    assert "0.6" in b.state and "uplift off" not in b.state


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
    assert "stay in place: they hold the uplift down" in flat and "0.6" in flat
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


OVERHANG = """schema = 1
title = "Roof beam with overhang, sign on the tip, wind uplift on the span"
tags = ["roof", "not-rack", "not-lifting"]
[beam]
length = "16 ft"
section = "W8x18"
material = "A992"
self_weight = false
braced = true
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "12 ft"
type = "roller"
[[loads]]
type = "point"
at = "16 ft"
value = "-1500 lbf"
label = "sign"
case = "dead"
[[loads]]
type = "uniform"
start = "0 ft"
end = "12 ft"
value = "-20 lbf/ft"
label = "roofing"
case = "dead"
[[loads]]
type = "uniform"
start = "0 ft"
end = "12 ft"
value = "300 lbf/ft"
label = "wind uplift"
uplift = true
"""


def test_supports_at_the_rated_load_take_both_dead_load_multiples():
    # statics with the dead loads at d and the uplift at k: the roller (12 ft) carries
    # (1500 x 16 + 20 x 12 x 6) d / 12 - 300 k x 6 = 2120 d - 1800 k lbf, the pin
    # 1740 d - 3600 k - that = -380 d - 1800 k lbf. The roller pulls down hardest at d = 0.6,
    # the pin at d = 1: each support's range takes its own worse
    cap = capacity(parse_job_text(OVERHANG))
    k = cap.factor
    assert math.isfinite(k) and k > 0
    pin, roller = cap.evaluation.reactions
    assert roller["max_down"] == pytest.approx((1272 - 1800 * k) * LBF, rel=1e-9)
    assert "0.6" in roller["max_down_state"]
    assert pin["max_down"] == pytest.approx((-380 - 1800 * k) * LBF, rel=1e-9)
    assert "0.6" not in pin["max_down_state"]
    # the dead loads alone in full push the roller up hardest (the live load may be absent)
    assert roller["max_up"] == pytest.approx(2120 * LBF, rel=1e-9)
    # and solve's reaction envelope at the loads entered (k = 1) likewise
    env = analyze(parse_job_text(OVERHANG)).reaction_envelope
    assert env[1]["max_down"] == pytest.approx((1272 - 1800) * LBF, rel=1e-9)
    assert env[0]["max_down"] == pytest.approx((-380 - 1800) * LBF, rel=1e-9)


ARM = """schema = 1
title = "Awning bracket, 4 ft, wind uplift"
tags = ["bracket", "awning", "cantilever"]
[beam]
length = "4 ft"
section = "HSS3x2x3/16"
material = "A500-C"
self_weight = false
[[supports]]
at = "0 ft"
type = "fixed"
[[loads]]
type = "uniform"
start = "0 ft"
end = "4 ft"
value = "-18 lbf/ft"
label = "roof panels"
case = "dead"
[[loads]]
type = "point"
at = "4 ft"
value = "-40 lbf"
label = "fascia"
case = "dead"
[[loads]]
type = "uniform"
start = "0 ft"
end = "4 ft"
value = "150 lbf/ft"
label = "wind uplift"
uplift = true
"""


def test_fixed_end_connection_figures_take_the_dead_loads_at_six_tenths():
    # AISC Manual Table 3-23, case 22 (uniform) and 24 (tip load), a cantilever: the root
    # moment 150 k x 4^2 / 2 - d (18 x 16 / 2 + 40 x 4) = 1200 k - 304 d lbf*ft, the shear
    # 600 k - 112 d lbf; the uplift wins, so d = 0.6 is worse
    from shopbeam.design.analysis import to_json
    from shopbeam.design.capacity import connections_at

    job = parse_job_text(ARM)
    end, = to_json(analyze(job))["fixed_ends"]
    assert abs(end["moment"]) == pytest.approx((1200 - 0.6 * 304) * LBF * FT, rel=1e-9)
    assert abs(end["shear"]) == pytest.approx((600 - 0.6 * 112) * LBF, rel=1e-9)
    assert any("Fixed end at 0 ft" in c and "in full and at 0.6" in c
               for c in analyze(job).cautions)
    k = capacity(job).factor
    (end_k,), _ = connections_at(job, k)
    assert abs(end_k["moment"]) == pytest.approx((1200 * k - 0.6 * 304) * LBF * FT, rel=1e-9)
    flat = " ".join(label_text(rating(capacity(job), analyze(job).unchecked))
                    .replace("|", " ").split())
    assert f"{1200 * k - 0.6 * 304:.0f} lbf*ft" in flat or \
        f"{math.floor(1200 * k - 0.6 * 304)} lbf*ft" in flat, flat


def test_a_patterned_uplift_envelope_takes_the_dead_loads_at_six_tenths():
    from shopbeam.design import uplift

    text = OVERHANG.replace('length = "16 ft"', 'length = "24 ft"').replace(
        'at = "12 ft"\ntype = "roller"', 'at = "12 ft"\ntype = "pin"\n[[supports]]\n'
        'at = "24 ft"\ntype = "roller"').replace(
        'label = "wind uplift"\nuplift = true', 'label = "wind uplift"\nuplift = true\n'
        'patterned = true').replace('end = "12 ft"\nvalue = "300', 'end = "24 ft"\nvalue = "300')
    job = parse_job_text(text)
    env = analyze(job).reaction_envelope
    from shopbeam.design.loading import evaluate
    full = evaluate(job, 1.0).reactions  # the dead loads in full alone
    held = analyze(uplift.held_down(job)).reaction_envelope
    for e, h in zip(env, held):
        assert e["max_down"] <= h["max_down"] + 1e-9 and e["max_up"] >= h["max_up"] - 1e-9
    assert any("0.6" in e["max_down_state"] for e in env)
    assert [e["max_down"] for e in env] == pytest.approx(
        [min(a["max_down"], b["max_down"]) for a, b in zip(full, held)], rel=1e-12)


WOOD = """schema = 1
title = "Roof purlin, 2x8 at 24 in, wind uplift"
tags = ["roof", "not-rack", "not-lifting"]
[beam]
length = "12 ft"
section = "2x8"
material = "DF-L No.2"
self_weight = false
restrained = true
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "12 ft"
type = "roller"
[[loads]]
type = "uniform"
start = "0 ft"
end = "12 ft"
value = "-20 lbf/ft"
label = "roofing"
case = "dead"
[[loads]]
type = "uniform"
start = "0 ft"
end = "12 ft"
value = "50 lbf/ft"
label = "wind uplift"
uplift = true
[criteria]
deflection = "L/360"
duration = "ten-minutes"
"""


def test_wood_creep_of_a_dead_load_holding_down_an_uplift_is_not_counted_on():
    # NDS 2018 3.5.2: Kcr 1.5 raises the long-term deflection of the dead loads; against
    # an uplift it would lower the net, so the new member (no creep yet) is checked:
    # 5 (50 - 0.6 x 20) L^4 / (384 EI) upward, AISC Manual Table 3-23, case 1
    res = analyze(parse_job_text(WOOD))
    d = _check(res, "deflection")
    ei = res.job.ei
    w = (50 - 0.6 * 20) * LBF_FT
    assert d.demand == pytest.approx(5 * w * (12 * FT) ** 4 / (384 * ei), rel=1e-9)
    assert "without creep" in d.formula
    # a gravity joist keeps its creep: Kcr x the dead-load deflection + the live load's
    down = analyze(parse_job_text(WOOD.replace('value = "50 lbf/ft"', 'value = "-50 lbf/ft"')
                                  .replace("uplift = true", "")))
    dd = _check(down, "deflection")
    assert "without creep" not in dd.formula
    assert dd.demand == pytest.approx(5 * (50 + 1.5 * 20) * LBF_FT * (12 * FT) ** 4
                                      / (384 * ei), rel=1e-9)


def test_the_label_of_an_uplift_says_the_dead_load_must_stay_and_posts_no_mass():
    flat = " ".join(label_text(rating(capacity(parse_job_text(ARM))))
                    .replace("|", " ").split())
    assert "RATED ONLY WHILE the 2 dead loads as entered" in flat and "stay in place" in flat
    assert "IN ADDITION TO" not in flat
    si = ARM.replace("[beam]", 'units = "si"\n[beam]').replace('"4 ft"', '"1.2 m"').replace(
        '"0 ft"', '"0 m"').replace('"-18 lbf/ft"', '"-0.26 kN/m"').replace(
        '"-40 lbf"', '"-0.18 kN"').replace('"150 lbf/ft"', '"2.2 kN/m"').replace(
        "HSS3x2x3/16", "RHS100x50x4").replace("A500-C", "S355")
    flat = " ".join(label_text(rating(capacity(parse_job_text(si)))).replace("|", " ").split())
    assert "MAX UPWARD UNIFORM LOAD" in flat and " kg" not in flat
    # out of doors (an awning): the wind the figure leaves out is the sideways wind
    assert "WIND sideways is not in this figure" in flat


def test_the_uplift_off_sets_the_connection_the_other_way_and_the_anchor_is_the_envelopes():
    # the awning arm on a calm day: the dead loads alone hog the root the other way,
    # 18 x 4^2 / 2 + 40 x 4 = 304 lbf*ft (AISC Manual Table 3-23, cases 22 and 24): the
    # connection must develop both; and every UPLIFT caution names the envelope's pull
    from shopbeam.design.connections import fixed_end_moments

    job = parse_job_text(ARM)
    res = analyze(job)
    end, = fixed_end_moments(job, res.solution)
    assert abs(end["moment_reversed"]) == pytest.approx(304 * LBF * FT, rel=1e-9)
    assert "uplift off" in end["over"]
    from shopbeam import units

    for text in (OVERHANG, ARM):
        res = analyze(parse_job_text(text))
        pulled = [r for r in res.reaction_envelope if r["max_down"] < 0]
        said = [c for c in res.cautions if c.startswith("UPLIFT:")]
        assert pulled and len(said) == len(pulled)
        for r, c in zip(pulled, said):
            assert f"with up to {units.fmt(-r['max_down'], 'force', 'us')}" in c, (r, c)


def test_capacity_lists_each_check_at_the_worse_dead_load_multiple():
    # where 0.6 D sets the factor, a check the dead loads in full make worse (a local check
    # under a dead point load) is listed at its full-D figure, not the 0.6 D one
    from shopbeam.design.loading import evaluate

    for text in (ARM, OVERHANG, CANOPY.replace('"UPLIFT"', '"300 lbf/ft"')):
        job = parse_job_text(text)
        cap = capacity(job)
        if not (math.isfinite(cap.factor) and cap.factor > 0):
            continue
        full = {c.name: c.ratio for c in evaluate(job, cap.factor).checks}
        for c in cap.checks:
            if c.name in full:
                assert c.ratio >= full[c.name] * (1 - 1e-9), (text[:40], c.name)


PURLIN_2 = """schema = 1
title = "canopy purlin over two bays"
[beam]
length = "20 ft"
section = "HSS4x2x1/8"
material = "A500-C"
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "10 ft"
type = "roller"
[[supports]]
at = "20 ft"
type = "roller"
[[loads]]
type = "uniform"
start = "0 ft"
end = "20 ft"
value = "-5 lbf/ft"
case = "live"
LIVE_EXTRA
[[loads]]
type = "uniform"
start = "0 ft"
end = "20 ft"
value = "-20 lbf/ft"
case = "dead"
label = "roofing"
[[loads]]
type = "uniform"
start = "0 ft"
end = "20 ft"
value = "90 lbf/ft"
uplift = true
label = "wind uplift"
MOVING
[criteria]
deflection = "L/180"
"""


@pytest.mark.parametrize("moving", [False, True], ids=["patterned", "moving"])
def test_the_state_shown_as_governing_is_the_one_after_the_uplift_states(moving):
    """The state a report shows as the one that governs (its reactions, for a moving load
    its diagrams) is the governing check's own, with the dead loads at 0.6 where that state
    governs: its largest moment is the bending check's demand (the state that governed the
    loads as entered had a smaller one). Common practice: the state drawn is the state
    checked."""
    from shopbeam.design import uplift

    text = PURLIN_2.replace("LIVE_EXTRA", "" if moving else "patterned = true").replace(
        "MOVING", '[[moving]]\nlabel = "cart"\nloads = ["-150 lbf", "-150 lbf"]\n'
                  'spacing = ["2 ft"]' if moving else "")
    res = analyze(parse_job_text(text))
    bend = next(c for c in res.checks if c.name == "bending")
    assert bend.state.endswith(uplift.STATE)  # the 0.6 D state governs bending here
    shown = res.solution if moving else res.state_solution
    assert shown is not None
    assert shown.moment.extremes().abs_max == pytest.approx(bend.demand, rel=1e-9)
    said = res.shown_state if moving else res.state_words
    assert "dead loads at 0.6" in said and "governs bending" in said
