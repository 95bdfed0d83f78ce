"""Concentrated forces: AISC 360-16 J10 on webs and flanges, the HSS sidewall provisions, and
hinge shear / fixed-end moment. Each figure below is a hand calculation in kips and inches
from the formula of the named clause, with the section's values from the AISC Shapes
Database v15.0 (W12x26: d 12.2, tw 0.230, tf 0.380, kdes 0.680 in)."""

from __future__ import annotations

import json
import math
import subprocess
import sys

import pytest

from shopbeam.design import local
from shopbeam.design.analysis import analyze, to_json
from shopbeam.design.capacity import capacity
from shopbeam.design.loading import evaluate, walk_patterns
from shopbeam.jobs.jobfile import parse_job_text
from shopbeam.errors import InputErrors

IN, KSI, KIP, LBF, FT = 0.0254, 6.894757293168361e6, 4448.2216152605, 4.4482216152605, 0.3048
E, FY = 29000 * KSI, 50 * KSI
W12 = dict(d=12.2 * IN, tw=0.230 * IN, tf=0.380 * IN, k=0.680 * IN)


def test_web_local_yielding_end_and_interior_j10_2_and_j10_3():
    # AISC 360-16 J10-3 (within d of the end): Rn = Fy tw (2.5k + lb)
    #   = 50 x 0.23 x (2.5 x 0.68 + 4) = 65.55 kips
    rn, eq = local.web_local_yielding(FY, W12["tw"], W12["k"], 4 * IN, 0.0, W12["d"])
    assert eq == "J10-3" and rn / KIP == pytest.approx(65.55, rel=1e-9)
    # J10-2 (farther than d): Rn = 50 x 0.23 x (5 x 0.68 + 4) = 85.1 kips
    rn, eq = local.web_local_yielding(FY, W12["tw"], W12["k"], 4 * IN, 13 * IN, W12["d"])
    assert eq == "J10-2" and rn / KIP == pytest.approx(85.1, rel=1e-9)


def test_web_crippling_j10_4_and_j10_5b():
    # J10-5b at the end, lb/d = 4/12.2 = 0.328 > 0.2:
    # 0.40 x 0.23^2 x [1 + (4 x 0.3279 - 0.2)(0.23/0.38)^1.5] x sqrt(29000 x 50 x 0.38/0.23)
    # = 0.02116 x 1.52338 x 1547.79 = 49.89 kips
    rn, eq = local.web_crippling(E, FY, W12["tw"], W12["tf"], W12["d"], 4 * IN, 0.0)
    assert eq == "J10-5b" and rn / KIP == pytest.approx(49.89, rel=2e-4)
    # J10-4 inside: 0.80 x 0.0529 x (1 + 3 x 0.3279 x 0.47089) x 1547.79 = 95.84 kips
    rn, eq = local.web_crippling(E, FY, W12["tw"], W12["tf"], W12["d"], 4 * IN, 60 * IN)
    assert eq == "J10-4" and rn / KIP == pytest.approx(95.84, rel=2e-4)
    # J10-5a: lb/d <= 0.2 (lb = 2 in): 0.02116 x (1 + 3 x 0.16393 x 0.47089) x 1547.79
    # = 0.02116 x 1.23158 x 1547.79 = 40.34 kips
    rn, eq = local.web_crippling(E, FY, W12["tw"], W12["tf"], W12["d"], 2 * IN, 1 * IN)
    assert eq == "J10-5a" and rn / KIP == pytest.approx(40.34, rel=3e-4)


def test_flange_local_bending_j10_1():
    # 6.25 Fy tf^2 = 6.25 x 50 x 0.38^2 = 45.125 kips; half within 10 tf = 3.8 in of the end
    rn, _ = local.flange_local_bending(FY, W12["tf"], 20 * IN)
    assert rn / KIP == pytest.approx(45.125, rel=1e-9)
    rn, _ = local.flange_local_bending(FY, W12["tf"], 3 * IN)
    assert rn / KIP == pytest.approx(22.5625, rel=1e-9)


def test_hss_sidewall_yielding_and_crippling_table_k2_2():
    # HSS8x4x1/4 (t design 0.233 in, H 8 in, k = outside corner 2t = 0.466 in), lb 3 in,
    # Fy 50 ksi, away from the ends. AISC 360-16 Table K2.2 (from memory):
    # yielding 2 Fy t (5k + lb) = 2 x 50 x 0.233 x (2.33 + 3) = 124.19 kips
    t, h, k = 0.233 * IN, 8 * IN, 0.466 * IN
    rn, _ = local.hss_wall_yielding(FY, t, k, 3 * IN, 40 * IN, h)
    assert rn / KIP == pytest.approx(124.189, rel=1e-5)
    # crippling 1.6 t^2 (1 + 3 lb / (H - 3t)) sqrt(E Fy) Qf with Qf 0.7981:
    # 0.0868624 x 2.232708 x 1204.159 x 0.798113 = 186.38 kips
    rn, _ = local.hss_wall_crippling(E, FY, t, h, 3 * IN, 40 * IN, 0.798113)
    assert rn / KIP == pytest.approx(186.38, rel=2e-4)


def _job(extra_beam="", supports=None, loads=None, section="W12x26", length="2 ft",
         material="A992"):
    supports = supports or ['at = "0 ft"\ntype = "pin"', f'at = "{length}"\ntype = "roller"']
    text = f'schema = 1\ntitle = "t"\n[beam]\nlength = "{length}"\nsection = "{section}"\n' \
           f'material = "{material}"\n{extra_beam}\n'
    for s in supports:
        text += f"[[supports]]\n{s}\n"
    for ld in loads or []:
        text += f"[[loads]]\n{ld}\n"
    return parse_job_text(text)


def test_capacity_governed_by_web_local_yielding_under_the_load():
    # W12x26 on 2 ft, point load at mid-span, no bearing given (lb = 0). The load is 12 in
    # from each end, within d = 12.2 in, so J10-3: Rn = 50 x 0.23 x 2.5 x 0.68 = 19.55 kips,
    # Rn / 1.50 = 13.033 kips. Bending (M = P L / 4) and shear are far below at that load.
    job = _job(loads=['type = "point"\nat = "1 ft"\nvalue = "-10 kip"'])
    res = capacity(job)
    p_max = 10 * KIP * res.factor
    assert p_max / KIP == pytest.approx(19.55 / 1.5, rel=1e-6)
    assert res.governing.name == "web local yielding"
    assert res.governing.clause == "AISC 360-16 J10.2"
    assert "lb = 0 taken" in res.governing.detail


def test_bearing_from_the_job_is_used_and_said():
    # lb = 4 in at the supports: the end reactions (x = 0) use J10-3 with lb = 4 in, 65.55
    # kips / 1.5, and web crippling J10-5b 49.89 kips / 2.00
    job = _job(length="16 ft", extra_beam='bearing = "4 in"',
               loads=['type = "point"\nat = "8 ft"\nvalue = "-20 kip"\nbearing = "6 in"'])
    res = analyze(job)
    by = {c.name: c for c in res.checks}
    wcr = by["web crippling"]
    # the governing crippling is at the supports (J10-5b 49.89 / 2 = 24.95 kips limit) or
    # under the load (J10-4 with lb = 6 in: 0.0423 x (1 + 3 x 0.4918 x 0.4709) x 1547.79
    # = 0.04232 x 1.69474 x 1547.79 = 111.01 kips, / 2 = 55.5 kips)
    reaction = max(abs(r.force) for r in res.solution.reactions)
    assert wcr.limit / KIP == pytest.approx(49.89 / 2, rel=2e-4)
    assert wcr.demand == pytest.approx(reaction, rel=1e-12)
    assert "4 in from the job" in wcr.detail
    wly = by["web local yielding"]
    assert "from the job" in wly.detail


def test_hung_load_gets_flange_local_bending_and_no_crippling_there():
    job = _job(length="10 ft", loads=['type = "point"\nat = "5 ft"\nvalue = "-8 kip"\n'
                                      'flange = "bottom"'])
    res = analyze(job)
    by = {c.name: c for c in res.checks}
    flb = by["flange local bending"]
    assert flb.demand / KIP == pytest.approx(8.0, rel=1e-12)
    assert flb.limit / KIP == pytest.approx(45.125 / 1.67, rel=1e-9)
    assert flb.at == pytest.approx(5 * FT)
    # the only crippling is at the supports (the hung load pulls on the web)
    assert by["web crippling"].at in (0.0, pytest.approx(10 * FT))


def test_local_checks_scale_with_the_load_in_capacity():
    job = _job(length="3 ft", loads=['type = "point"\nat = "1.5 ft"\nvalue = "-1 kip"'])
    res = capacity(job)
    # at the capacity factor every check passes and the governing one sits at 1
    assert max(c.ratio for c in res.checks) == pytest.approx(1.0, abs=1e-9)
    assert all(c.ratio <= 1.0 for c in res.checks)


def test_hss_wall_checks_appear_for_tube():
    job = _job(section="HSS8x4x1/4", material="A500-C", length="3 ft",
               loads=['type = "point"\nat = "1.5 ft"\nvalue = "-30 kip"\nbearing = "3 in"'])
    res = analyze(job)
    by = {c.name: c for c in res.checks}
    assert "wall local yielding" in by and "wall crippling" in by
    assert by["wall crippling"].source.endswith("(from memory)")
    assert any("plastification" in u.name for u in res.unchecked)


def test_fixed_end_is_not_a_bearing_and_gets_the_connection_caution():
    job = _job(length="4 ft", supports=['at = "0 ft"\ntype = "fixed"'],
               loads=['type = "point"\nat = "4 ft"\nvalue = "-2 kip"'],
               extra_beam="self_weight = false")
    res = analyze(job)
    names = {c.name: c for c in res.checks}
    # the only concentrated force on a flange is the tip load
    assert names["web local yielding"].at == pytest.approx(4 * FT)
    note = [c for c in res.cautions if c.startswith("Fixed end")]
    assert note and "8000 lbf*ft" in note[0]  # 2 kip x 4 ft by hand
    d = to_json(res)
    assert d["fixed_ends"][0]["moment"] == pytest.approx(8 * KIP * FT, rel=1e-9)


def test_gerber_hinge_shear_in_report_and_json():
    # hinge at 12 ft of a 20 ft member fixed at 0 and pinned at 20; 1 kip at 16 ft. The part
    # from the hinge to the pin is simply supported: the hinge carries 1 x 4 / 8 = 0.5 kip
    job = _job(length="20 ft", extra_beam="self_weight = false",
               supports=['at = "0 ft"\ntype = "fixed"', 'at = "12 ft"\ntype = "hinge"',
                         'at = "20 ft"\ntype = "pin"'],
               loads=['type = "point"\nat = "16 ft"\nvalue = "-1 kip"'])
    res = analyze(job)
    d = to_json(res)
    assert len(d["hinges"]) == 1
    assert abs(d["hinges"][0]["shear"]) / KIP == pytest.approx(0.5, rel=1e-9)
    assert any(c.startswith("Hinge at 12 ft carries a shear of 500 lbf") for c in res.cautions)


def test_bad_bearing_and_flange_are_one_clear_message():
    with pytest.raises(InputErrors) as e:
        _job(loads=['type = "point"\nat = "1 ft"\nvalue = "-1 kip"\nflange = "middle"'])
    assert "loads[0].flange" in str(e.value)
    with pytest.raises(InputErrors) as e:
        _job(extra_beam='bearing = "4"')
    assert "beam.bearing" in str(e.value)


def test_cli_json_carries_the_local_checks(tmp_path):
    p = tmp_path / "j.toml"
    p.write_text('schema = 1\ntitle = "t"\n[beam]\nlength = "2 ft"\nsection = "W12x26"\n'
                 'material = "A992"\n[[supports]]\nat = "0 ft"\ntype = "pin"\n'
                 '[[supports]]\nat = "2 ft"\ntype = "roller"\n[[loads]]\ntype = "point"\n'
                 'at = "1 ft"\nvalue = "-10 kip"\n')
    out = subprocess.run([sys.executable, "-m", "shopbeam", "solve", "--json", str(p)],
                         capture_output=True, text=True, check=True)
    d = json.loads(out.stdout)
    names = [c["name"] for c in d["checks"]]
    assert {"web local yielding", "web crippling"} <= set(names)
    wly = next(c for c in d["checks"] if c["name"] == "web local yielding")
    # 10 kip against 13.033 kip at the load
    assert wly["ratio"] == pytest.approx(10 / (19.55 / 1.5), rel=1e-6)
    assert math.isclose(wly["params"]["Rn"] / KIP, 19.55, rel_tol=1e-9)


def test_typed_job_fields_for_the_local_checks():
    job = _job(extra_beam='bearing = "3 in"\nrestrained = true',
               supports=['at = "0 ft"\ntype = "pin"\nbearing = "4 in"',
                         'at = "2 ft"\ntype = "roller"'],
               loads=['type = "point"\nat = "1 ft"\nvalue = "-1 kip"\nflange = "bottom"\n'
                      'bearing = "2 in"'])
    assert job.bearing == pytest.approx(3 * IN)
    assert job.bearings == {"supports[0]": pytest.approx(4 * IN), "loads[0]": pytest.approx(2 * IN)}
    assert job.hung == ("loads[0]",)
    assert job.restrained is True
    with pytest.raises(InputErrors) as e:
        _job(extra_beam='restrained = "yes"')
    assert "beam.restrained" in str(e.value)


def _allowables_one_by_one(job, sec, mat, items):
    """The oracle: per item, the least Rn / (Omega x scale) of local.limit_states for one
    Force at a time, when it pulls (+1 on top, -1 on the bottom) and when it bears."""
    pull, bear = [], []
    scale = local.design_factor_scale(job)
    for at, face, lb, moving, *rest in items:
        support = len(rest) > 3 and bool(rest[3])
        row = []
        for sign in (1.0, -1.0):
            f = local.Force(at, sign if face == "top" else -sign, face, lb, "", moving, support)
            best = (math.inf, "")
            for name, rn, _eq, omega, _c, _x in local.limit_states(sec, mat, job.length, f,
                                                                    job.lifting):
                if rn / (omega * scale) < best[0]:
                    best = (rn / (omega * scale), name)
            row.append(best)
        pull.append(row[0])
        bear.append(row[1])
    return pull, bear


@pytest.mark.parametrize("lifting", [False, True])
def test_vectorised_sizing_allowables_equal_the_section_by_section_ones(lifting):
    # the sweep's vectorised local allowables (sizing_allowables_many) against the scalar
    # limit_states path, name and number, over every branch: near and far from the end (J10-3
    # and J10-5 forms, 10 tf), bearing given or not (lb = k at an end reaction), pulling and
    # bearing, trolley wheels (no J10.1 under them on a lifting job), webs and tube walls
    from dataclasses import replace as _replace
    from pathlib import Path

    from shopbeam.design import local as L
    from shopbeam.jobs.jobfile import load_job
    from shopbeam.members import catalog
    from shopbeam.members.materials import get

    job = load_job(Path(__file__).resolve().parents[1] / "presets" / "demo.toml")
    job = _replace(job, tags=("lifting",) if lifting else ())
    secs = [s for k in ("W", "S", "C", "MC", "HSS", "M") for s in catalog.list_sections(k)][::7]
    secs = [s for s in secs if L.applies(s)]
    mats = [get("A992") if L.applies(s) == "web" else get("A500-C") for s in secs]
    items = [(at, face, lb, moving, 0.0, 0.0, 0.0, sup)
             for at in (0.0, 0.05, 0.2, job.length / 2) for face in ("top", "bottom")
             for lb in (None, 0.1) for moving in (False, True) for sup in (False, True)]
    (pv, pn), (bv, bn) = L.sizing_allowables_many(job, secs, mats, items)
    assert {"web crippling", "wall crippling", "flange local bending"} <= set(bn.ravel()) | \
        set(pn.ravel())
    for i, (s, m) in enumerate(zip(secs, mats)):
        pu, be = _allowables_one_by_one(job, s, m, items)
        for j in range(len(items)):
            assert pv[i, j] == pytest.approx(pu[j][0], rel=1e-12) and pn[i, j] == pu[j][1]
            assert bv[i, j] == pytest.approx(be[j][0], rel=1e-12) and bn[i, j] == be[j][1]


# ------------------------------------------------------------------ web sidesway buckling
# AISC 360-16 J10.4 (formulas from memory). W12x14 from the AISC Shapes Database v15.0:
# d 11.9, bf 3.97, tw 0.200, tf 0.225 in, h/tw 54.3, Sx 14.9 in^3. All figures below are
# worked out by hand in kips and inches, not by the code under test.
W12X14 = dict(tw=0.200, tf=0.225, bf=3.97, h_tw=54.3, sx=14.9)
SIDESWAY_JOB = """schema = 1
title = "W12x14 point load braced at the load"
units = "us"
tags = ["not-lifting"]
[beam]
length = "{length}"
section = "W12X14"
material = "A992"
self_weight = false
{beam}
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "{length}"
type = "roller"
[[loads]]
type = "point"
at = "{at}"
value = "-1000 lbf"
{load}
"""


def _sidesway_job(length="12 ft", at="6 ft", beam='braces = ["6 ft"]', load=""):
    return parse_job_text(SIDESWAY_JOB.format(length=length, at=at, beam=beam, load=load))


def _hand_j10_7(cr_ksi, lb_in):
    """J10-7 by hand, kips: Cr tw^3 tf / h^2 x 0.4 ((h/tw)/(Lb/bf))^3."""
    s = W12X14
    h = s["h_tw"] * s["tw"]  # 10.86 in
    ratio = s["h_tw"] / (lb_in / s["bf"])
    return cr_ksi * s["tw"] ** 3 * s["tf"] / h**2 * 0.4 * ratio**3, ratio


def test_web_sidesway_formulas_j10_6_and_j10_7():
    # Lb = 12 ft = 144 in: (h/tw)/(Lb/bf) = 54.3 / (144 / 3.97) = 1.4970 <= 1.7;
    # Cr tw^3 tf / h^2 = 960,000 x 0.008 x 0.225 / 10.86^2 = 1728 / 117.94 = 14.651 kips;
    # J10-7: 14.651 x 0.4 x 1.4970^3 = 14.651 x 0.4 x 3.3550 = 19.66 kips
    want, r = _hand_j10_7(960_000, 144)
    assert want == pytest.approx(19.66, rel=1e-3) and r == pytest.approx(1.4970, rel=1e-4)
    rn, eq, ratio = local.web_sidesway_buckling(960_000 * KSI, 0.2 * IN, 0.225 * IN,
                                                10.86 * IN, 144 * IN, 3.97 * IN)
    assert eq == "J10-7" and rn / KIP == pytest.approx(want, rel=1e-9)
    assert ratio == pytest.approx(r, rel=1e-12)
    # J10-6 (flange restrained against rotation): 14.651 x (1 + 0.4 x 3.3550) = 34.31 kips
    rn, eq, _ = local.web_sidesway_buckling(960_000 * KSI, 0.2 * IN, 0.225 * IN, 10.86 * IN,
                                            144 * IN, 3.97 * IN, rotation_restrained=True)
    assert eq == "J10-6" and rn / KIP == pytest.approx(14.651 * (1 + 0.4 * 3.3550), rel=1e-3)
    # past the limits the limit state does not apply: Lb = 96 in gives 54.3 / (96 / 3.97)
    # = 2.245 (> 1.7, <= 2.3); Lb = 90 in gives 2.395 (> 2.3)
    assert local.web_sidesway_buckling(960_000 * KSI, 0.2 * IN, 0.225 * IN, 10.86 * IN,
                                       96 * IN, 3.97 * IN)[0] is None
    assert local.web_sidesway_buckling(960_000 * KSI, 0.2 * IN, 0.225 * IN, 10.86 * IN,
                                       96 * IN, 3.97 * IN, rotation_restrained=True)[0] > 0
    assert local.web_sidesway_buckling(960_000 * KSI, 0.2 * IN, 0.225 * IN, 10.86 * IN,
                                       90 * IN, 3.97 * IN, rotation_restrained=True)[0] is None


def test_web_sidesway_governs_the_rating_of_a_beam_braced_at_the_load_only():
    # 12 ft simple span, point load at mid-span on the top flange, the top flange braced at
    # the load: the bottom flange is unbraced over the 12 ft between the supports, so
    # Lb = 144 in and J10-7 gives 19.66 kips / 1.76 = 11.17 kips. At that load Ma = P L / 4
    # = 11.17 x 3 = 33.5 kip-ft, 1.5 Ma = 50.3 < My = 50 x 14.9 / 12 = 62.1 kip-ft: Cr
    # 960,000 ksi holds. Bending (Mp / 1.67 = 43.4 kip-ft) allows 14.5 kips.
    want, _ = _hand_j10_7(960_000, 144)
    res = capacity(_sidesway_job())
    assert res.governing.name == "web sidesway buckling"
    assert 1000 * LBF * res.factor / KIP == pytest.approx(want / 1.76, rel=1e-9)
    c = res.governing
    assert c.clause == "AISC 360-16 J10.4, eq. J10-7" and "from memory" in c.source
    assert c.params["Lb"] == pytest.approx(144 * IN) and c.params["Cr"] == pytest.approx(
        960_000 * KSI)
    assert "top flange only" in c.detail and "not taken as restrained against rotation" \
        in c.detail
    assert res.rated


def test_web_sidesway_cr_halves_past_my_and_the_factor_stops_there():
    # the same beam with a dead 3.6 kip hung from a lug under the bottom flange at 3 ft and at
    # 9 ft (M = 3.6 x 3 = 10.8 kip-ft at mid; hung below, they neither destabilise the top
    # flange, as a spread load on it between braces would, nor bear on it for J10.4):
    # Cr halves once 1.5 Ma reaches My = 62.083 kip-ft, i.e. Ma = 41.389 kip-ft, at
    # P = (41.389 - 10.8) / 3 = 10.196 kips; there J10-7 with Cr 480,000 allows only
    # 19.66 / 2 / 1.76 = 5.59 kips, so the rated load stops at 10.196 kips
    # (safety_factor = 1: at the default 1.67 on yield, bending stops at My / 1.67, below the
    # step's My / 1.5, which a job reaches only with a factor under 1.5; checks.on_yield)
    hung = "".join(f'[[loads]]\ntype = "point"\nat = "{x} ft"\nvalue = "-3.6 kip"\ncase = "dead"\n'
                   'flange = "bottom"\nlug = true\n' for x in (3, 9))
    job = _sidesway_job(load=hung + '[criteria]\nsafety_factor = 1.0')
    res = capacity(job)
    p = 1000 * LBF * res.factor / KIP
    assert p == pytest.approx((50 * 14.9 / 12 / 1.5 - 10.8) / 3, rel=1e-6)
    assert "Cr halves" in res.note
    # the step sets the factor, so it governs (its ratio at k is under the largest)
    assert res.governing.name == "web sidesway buckling"
    past = {c.name: c for c in evaluate(job, res.factor * (1 + 1e-6)).checks}
    assert past["web sidesway buckling"].params["Cr"] == pytest.approx(480_000 * KSI)
    assert past["web sidesway buckling"].ratio > 1
    # live loads alone (no dead load): the closed form's k lands past the step and the
    # bracket finds it: 1.8 kip hung below at 3 ft and at 9 ft with a 2 kip point load at mid
    hung = "".join(f'[[loads]]\ntype = "point"\nat = "{x} ft"\nvalue = "-1.8 kip"\n'
                   'flange = "bottom"\nlug = true\n' for x in (3, 9))
    job = parse_job_text(SIDESWAY_JOB.format(length="12 ft", at="6 ft", beam='braces = '
                                             '["6 ft"]', load=hung + '[criteria]\n'
                                             'safety_factor = 1.0').replace(
        '"-1000 lbf"', '"-2000 lbf"'))
    res = capacity(job)
    # M = k (2 x 3 + 1.8 x 3) = 11.4 k kip-ft reaches 41.389 at k = 3.6306
    assert res.factor == pytest.approx(50 * 14.9 / 12 / 1.5 / 11.4, rel=1e-6)
    assert all(c.ratio <= 1 for c in res.checks)


@pytest.mark.parametrize("case", ["short", "hung", "restrained", "overhang", "braced support"])
def test_web_sidesway_does_not_apply(case):
    job = {
        # 10 ft: 54.3 / (120 / 3.97) = 1.796 > 1.7
        "short": lambda: _sidesway_job(length="10 ft", at="5 ft", beam='braces = ["5 ft"]'),
        # hung from the bottom flange: it pulls, not J10.4
        "hung": lambda: _sidesway_job(load='flange = "bottom"'),
        # restrained = true holds the flanges against relative movement
        "restrained": lambda: _sidesway_job(beam='braces = ["6 ft"]\nrestrained = true'),
        # a load on an overhang's tip side: the moment hogs, the top flange is in tension
        "overhang": lambda: parse_job_text(SIDESWAY_JOB.format(
            length="12 ft", at="11 ft", beam="", load="").replace(
            'at = "12 ft"\ntype = "roller"', 'at = "9 ft"\ntype = "roller"')),
        # a point load over a support that braces: both flanges held there
        "braced support": lambda: parse_job_text(SIDESWAY_JOB.format(
            length="24 ft", at="12 ft", beam="", load="").replace(
            '[[loads]]', '[[supports]]\nat = "12 ft"\ntype = "roller"\n[[loads]]', 1)),
    }[case]()
    names = {c.name for c in analyze(job).checks} | {c.name for c in capacity(job).checks}
    assert "web sidesway buckling" not in names
    assert "web crippling" in names  # the force is still checked locally


def test_web_sidesway_at_a_support_that_does_not_brace_under_hogging():
    # two spans of 10 ft, the middle roller does not brace (brace = false), the moment hogs
    # over it: its reaction bears on the bottom flange in compression, unbraced over the
    # 20 ft between the end supports (240 in): 54.3 / (240 / 3.97) = 0.8982;
    # J10-7 = 14.651 x 0.4 x 0.8982^3 = 4.247 kips (Cr 960,000: the hogging moment is small)
    # (the load hangs from the bottom flange, so the support is the only force J10.4 takes)
    text = SIDESWAY_JOB.format(length="20 ft", at="5 ft", beam="",
                               load='flange = "bottom"').replace(
        '[[loads]]', '[[supports]]\nat = "10 ft"\ntype = "roller"\nbrace = false\n[[loads]]', 1)
    res = analyze(parse_job_text(text))
    c = next(c for c in res.checks if c.name == "web sidesway buckling")
    want, _ = _hand_j10_7(960_000, 240)
    assert want == pytest.approx(14.651 * 0.4 * 0.8982**3, rel=1e-3)
    assert c.at == pytest.approx(10 * FT) and c.limit / KIP == pytest.approx(want / 1.76,
                                                                             rel=1e-9)
    assert "bottom flange" in c.detail and "hogs" in c.detail


def test_web_sidesway_with_patterns_is_the_worst_pattern():
    # patterned loads: the check takes the largest moment over every pattern at the force,
    # the same as walking all of them (test oracle)
    text = SIDESWAY_JOB.format(length="24 ft", at="6 ft", beam='braces = ["6 ft", "18 ft"]',
                               load="").replace(
        '[[loads]]', '[[supports]]\nat = "12 ft"\ntype = "roller"\n[[loads]]\ntype = '
        '"uniform"\nvalue = "-400 lbf/ft"\npatterned = true\n[[loads]]', 1)
    job = parse_job_text(text)
    for k in (1.0, 6.0):  # 6: past the step of Cr
        got = {c.name: c for c in evaluate(job, k).checks}["web sidesway buckling"]
        walk = walk_patterns(job, k)["web sidesway buckling"][0]
        assert got.ratio == pytest.approx(walk.ratio, rel=1e-12)
        assert got.params["Cr"] == walk.params["Cr"]


# ------------------------------------------------------------------ tees and round tubes
@pytest.mark.parametrize("section, material, name", [
    ("WT6x7", "A36", "stem or leg local yielding under a concentrated force"),
    ("HSS4.000x0.250", "A500-C", "round HSS wall under a concentrated force")])
def test_reactions_of_live_load_on_a_stem_or_round_wall_withhold_the_rating(section, material,
                                                                            name):
    # the reactions bear on the stem (its tip, stem down) or a thin round wall, which no
    # clause here checks (J10 is written for I-shapes and channels; Table K2.1 is not
    # applied): a live load that comes down through them withholds the rating
    live = _job(section=section, material=material, extra_beam="braced = true",
                loads=['type = "uniform"\nvalue = "-1 kip/ft"'])
    res = capacity(live)
    u = next(u for u in analyze(live).unchecked if u.name == name)
    assert u.blocks_rating and "the pin at 0 ft and the roller at 2 ft" in u.reason
    assert not res.rated and any(r.startswith(name) for r in res.not_rated)
    # dead load alone on the supports (nothing rated) is a caution only
    dead = _job(section=section, material=material, extra_beam="braced = true",
                loads=['type = "uniform"\nvalue = "-1 kip/ft"\ncase = "dead"'])
    u = next(u for u in analyze(dead).unchecked if u.name == name)
    assert not u.blocks_rating
    # a cantilever from a fixed end has no bearing support (a fixed end is a connection)
    cant = _job(section=section, material=material, extra_beam="braced = true",
                supports=['at = "0 ft"\ntype = "fixed"'],
                loads=['type = "uniform"\nvalue = "-1 kip/ft"'])
    u = next(u for u in analyze(cant).unchecked if u.name == name)
    assert not u.blocks_rating


def test_hss_sidewall_yielding_takes_k_as_1_5_t_unless_the_radius_is_typed_in():
    # AISC 360-16 K2 (from memory): k, the outside corner radius, is permitted to be taken
    # as 1.5 t when unknown; the catalog's 2 t is the AISC Shapes Database's assumption for
    # section properties, not a measured radius. HSS10x2x1/8, t_des 0.116 in (AISC Shapes
    # Database v15.0), A500-B Fy 46 ksi, a reaction at the member end (K2.2 end form,
    # 2.5k + lb, lb = 0): Rn = 2 x 46 x 0.116 x 2.5 x 1.5 x 0.116 = 4.642 kips; / 1.50
    text = ('schema = 1\ntitle = "short tube"\n[beam]\nlength = "2 ft"\nsection = "HSS10x2x1/8"\n'
            'material = "A500-B"\nself_weight = false\n[[supports]]\nat = "0 ft"\ntype = "pin"\n'
            '[[supports]]\nat = "2 ft"\ntype = "roller"\n[[loads]]\ntype = "uniform"\n'
            'value = "-5000 lbf/ft"\n')
    res = analyze(parse_job_text(text))
    wly = next(c for c in res.checks if c.name == "wall local yielding")
    t = 0.116
    assert wly.limit / KIP == pytest.approx(2 * 46 * t * 2.5 * 1.5 * t / 1.50, rel=1e-6)
    # typed in with its radius measured (3/8 in): k is that radius
    typed = text.replace('section = "HSS10x2x1/8"\n', '').replace(
        'self_weight = false\n', 'self_weight = false\n[beam.section]\nshape = "rect-tube"\n'
        'depth = "10 in"\nwidth = "2 in"\nwall = "1/8 in"\ncorner_radius = "0.375 in"\n')
    res = analyze(parse_job_text(typed))
    wly = next(c for c in res.checks if c.name == "wall local yielding")
    tt = 0.125 * 0.93  # A500 design wall, 0.93 t_nom (AISC 360-16 B4.2, from memory)
    assert wly.limit / KIP == pytest.approx(2 * 46 * tt * 2.5 * 0.375 / 1.50, rel=1e-6)


def test_web_sidesway_is_not_checked_at_a_brace_said_to_hold_both_flanges():
    # AISC 360-16 J10.4 (from memory) applies where nothing holds the loaded flange and the
    # other one against moving sideways relative to each other at the force. Braces taken as
    # holding the top flange only (the default, conservative) leave it; braces_flange =
    # "both" (kickers to the bottom flange) holds both at the brace, and J10.4 falls away
    text = ('schema = 1\ntitle = "third points"\n[beam]\nlength = "20 ft"\nsection = "W12x26"\n'
            'material = "A992"\nself_weight = false\nbraces = ["80 in", "160 in"]\n{both}'
            '[[supports]]\nat = "0 ft"\ntype = "pin"\n[[supports]]\nat = "20 ft"\n'
            'type = "roller"\n[[loads]]\ntype = "point"\nat = "80 in"\nvalue = "-5000 lbf"\n'
            '[[loads]]\ntype = "point"\nat = "160 in"\nvalue = "-5000 lbf"\n')
    names = lambda t: {c.name for c in analyze(parse_job_text(t)).checks}  # noqa: E731
    assert "web sidesway buckling" in names(text.replace("{both}", ""))
    assert "web sidesway buckling" not in names(text.replace("{both}", 'braces_flange = "both"\n'))
