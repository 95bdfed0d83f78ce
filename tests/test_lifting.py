"""Lifting profiles, bottom-flange bending under trolley wheels and the lateral trolley force.

Hand calculations written out below; coefficients of CMAA 74 70-3.3.2.2 / EN 1993-6 Table 5.2
and the ASCE 7-16 4.9 and ASME BTH-1 values are from memory. Section properties: AISC Shapes
Database v15.0 (W12x26: d 12.2, bf 6.49, tf 0.380, tw 0.230 in, Sx 33.4 in^3, rts 1.75 in,
J 0.300 in^4, ho 11.8 in).
"""

from __future__ import annotations

import math

import pytest

from shopbeam.design.analysis import analyze
from shopbeam.design.capacity import capacity
from shopbeam.design.checks import impact_of, strengths
from shopbeam.design.lifting import flange_coefficients, profile_of
from shopbeam.jobs.jobfile import parse_job_text

PSI = 6894.757293168361
LBF, IN = 4.4482216152605, 0.0254


def monorail(loads='["-2000 lbf"]', spacing="", criteria="impact = 0", extra=""):
    return f"""schema = 1
title = "W12x26 monorail"
tags = ["lifting"]
[beam]
length = "16 ft"
section = "W12x26"
material = "A992"
self_weight = false
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "16 ft"
type = "roller"
[[moving]]
label = "trolley"
loads = {loads}
{spacing}
{extra}
[criteria]
{criteria}
"""


def _check(text, name):
    return next(c for c in analyze(parse_job_text(text)).checks if c.name == name)


def test_coefficients_at_hand_values():
    # lambda = 2 a / (bf - tw) = 2 x 0.25 / (6.49 - 0.23) = 0.07987 (parallel flange)
    c = flange_coefficients(0.5 / 6.26, tapered=False)
    assert c["cx1"] == pytest.approx(2.4325, abs=2e-4)   # 2.230 - 0.1190 + 1.390 x 0.23132
    assert c["cy1"] == pytest.approx(0.4515, abs=2e-4)   # 10.108 - 0.5917 - 10.108 x 0.89679
    assert c["cx2"] == pytest.approx(2.4058, abs=2e-4)   # 0.730 - 0.1262 + 2.910 x 0.61926
    assert c["cy0"] == pytest.approx(-1.9393, abs=2e-4)  # -2.110 + 0.1579 + 0.0076 x 1.6847


def test_wheel_flange_bending_hand_calculation():
    # One axle of 2000 lbf (two wheels of 1000 lbf), no impact, at mid-span (worst):
    #   global: M = P L / 4 = 2000 x 192 / 4 = 96000 lbf*in; sigma_g = 96000 / 33.4 = 2874 psi
    #   P / tf^2 = 1000 / 0.380^2 = 6925.2 psi
    #   point 2 (tip): sx = 2.4058 x 6925.2 + 2874 = 19535 psi, sy = 0 -> 19535 psi
    #   point 1: sx = 19719, sy = 3127 -> sqrt(sx^2 + sy^2 - sx sy) = 18356 psi
    #   point 0: sx = 4204, sy = -13430 -> 15954 psi
    #   limit Fy / 1.67 = 29940 psi -> ratio 0.6525
    c = _check(monorail(), "wheel flange bending")
    assert c.demand / PSI == pytest.approx(19535, rel=2e-3)
    assert c.limit / PSI == pytest.approx(50000 / 1.67, rel=1e-4)
    assert c.ratio == pytest.approx(0.6525, abs=2e-3)
    assert "point 2" in c.detail and c.clause and c.source
    assert c.at / 0.3048 == pytest.approx(8.0, abs=1e-3)


def test_wheel_edge_and_wheels_per_axle_are_read():
    far = _check(monorail(extra='wheel_edge = "0.75 in"'), "wheel flange bending")
    near = _check(monorail(), "wheel flange bending")
    assert far.params["a"] == pytest.approx(0.75 * IN) and far.ratio < near.ratio
    one = _check(monorail(extra="wheels_per_axle = 1"), "wheel flange bending")
    assert one.ratio > 1.5 * near.ratio


def test_lateral_force_hand_calculation():
    # H = 20 % x 2000 lbf = 400 lbf at mid-span on the bottom flange:
    #   My = 400 x 192 / 4 = 19200 lbf*in; Zf = 0.380 x 6.49^2 / 4 = 4.0014 in^3 (compact:
    #   bf/2tf 8.54 < 0.38 sqrt(E/Fy) 9.15), Mcy = 50 x 4.0014 / 1.67 = 119.80 kip*in
    #   Mcx: F2-4 elastic LTB, Lb 192 in, Cb 1.0: (Lb/rts)^2 = 12037.3,
    #   Fcr = 23.778 x sqrt(1 + 0.078 x 0.300 / (33.4 x 11.8) x 12037.3) = 31.136 ksi,
    #   Mcx = 31.136 x 33.4 / 1.67 = 622.7 kip*in
    #   H1-1b: 96.0 / 622.7 + 19.2 / 119.80 = 0.1542 + 0.1603 = 0.3144
    c = _check(monorail(), "lateral trolley force")
    assert c.ratio == pytest.approx(0.3144, abs=1.5e-3)
    assert "H1" in c.clause


def test_tag_lifting_picks_powered_monorail_and_jib_for_a_cantilever():
    job = parse_job_text(monorail(criteria=""))
    prof = profile_of(job)
    assert prof.name == "powered-monorail" and prof.guessed
    assert impact_of(job) == 0.25 and prof.lateral == 0.20 and prof.longitudinal == 0.10
    jib = monorail(criteria="").replace('at = "16 ft"\ntype = "roller"', 'at = "0 ft"\ntype = '
                                        '"fixed"').replace('at = "0 ft"\ntype = "pin"\n', "")
    jib = jib.replace("[[supports]]\n[[supports]]", "[[supports]]")
    assert profile_of(parse_job_text(jib)).name == "jib-boom"


def test_hand_geared_profile_has_no_impact_and_no_lateral_check():
    text = monorail(criteria='lifting = "hand-geared-monorail"')
    job = parse_job_text(text)
    assert impact_of(job) == 0.0
    names = [c.name for c in analyze(job).checks]
    assert "lateral trolley force" not in names and "wheel flange bending" in names


def test_impact_below_the_profile_warns():
    job = parse_job_text(monorail(criteria='lifting = "powered-monorail"\nimpact = "10%"'))
    assert impact_of(job) == 0.10
    assert any(p.key == "criteria.impact" and p.warning for p in job.warnings)


def test_unknown_profile_is_an_error():
    from shopbeam.errors import InputErrors

    with pytest.raises(InputErrors) as e:
        parse_job_text(monorail(criteria='lifting = "powered-mono"'))
    assert "criteria.lifting" in str(e.value)


def below_the_hook(category):
    cat = f'category = "{category}"' if category else ""
    return f"""schema = 1
title = "lifting beam"
tags = ["lifting"]
[beam]
length = "10 ft"
section = "W12x26"
material = "A992"
self_weight = false
braced = true
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "10 ft"
type = "roller"
[[loads]]
type = "point"
at = "5 ft"
value = "-10 kip"
[criteria]
lifting = "below-the-hook"
{cat}
"""


def test_below_the_hook_design_factor():
    # ASME BTH-1 3-2.3.1 (from memory): Fb = 1.10 Fy / Nd on Sx for a compact braced beam:
    #   Mn = min(Fy Zx, 1.10 Fy Sx) = min(50 x 37.2, 1.10 x 50 x 33.4) = 1837 kip*in;
    #   Category A: / 2.0 = 918.5 kip*in; Category B: / 3.0 = 612.3 kip*in
    a = _check(below_the_hook("A"), "bending")
    b = _check(below_the_hook("B"), "bending")
    kipin = 4448.2216152605 * IN
    assert a.limit / kipin == pytest.approx(1837.0 / 2.0, rel=1e-3)
    assert b.limit / kipin == pytest.approx(1837.0 / 3.0, rel=1e-3)
    assert _check(below_the_hook(""), "bending").limit == pytest.approx(b.limit)
    st = strengths(parse_job_text(below_the_hook("A")))
    # BTH-1 3-2.2: Fv = Fy / (Nd sqrt 3) on the web area d tw
    assert st.shear.vn / st.shear.omega == pytest.approx(
        50e3 * PSI * 12.2 * 0.23 * IN**2 / (2.0 * math.sqrt(3)), rel=1e-6)


def test_issue_monorail_is_governed_by_the_wheels():
    # the issue's W12x26 monorail, 16 ft, 2-ton hoist on a two-axle trolley (2000 lbf an
    # axle), powered: 25 % impact; the wheels govern and the rating is well under 11,600 lbf
    text = monorail(loads='["-2000 lbf", "-2000 lbf"]', spacing='spacing = ["12 in"]',
                    criteria="")
    res = analyze(parse_job_text(text))
    assert res.governing.name == "wheel flange bending"
    cap = capacity(parse_job_text(text))
    assert 4000 * cap.factor < 6000
