"""Aluminium by the Aluminum Design Manual 2015 (values and clauses from memory): yielding
and rupture, welded (heat-affected zone) strengths, shear naming the strength used,
deflection with aluminium's own E, and the limit states shopbeam leaves unchecked."""

from __future__ import annotations

import json
import subprocess
import sys

import pytest

from shopbeam.design.analysis import analyze
from shopbeam.design.checks import adm_limits
from shopbeam.jobs.jobfile import parse_job_text

KSI = 6894.757293168361e3
IN, FT, LBF = 0.0254, 0.3048, 4.4482216152605


def job(section='{ shape = "rect-bar", depth = "2 in", width = "1 in" }', welded="false",
        material="6061-T6", beam="", length="3 ft", w="-100 lbf/ft"):
    return parse_job_text(f"""schema = 1
title = "al"
[beam]
length = "{length}"
section = {section}
material = "{material}"
welded = {welded}
self_weight = false
{beam}
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "{length}"
type = "roller"
[[loads]]
type = "uniform"
value = "{w}"
""")


def check(res, name):
    return next(c for c in res.checks if c.name == name)


def test_rupture_governs_unwelded_6061_t6():
    # ADM 2015 F.1 (from memory): rupture Z Ftu / kt / 1.95 = 1.0 in^3 x 38 ksi / 1.95 =
    # 19.49 kip*in for a 1 x 2 in bar (Z = b d^2 / 4 = 1.0 in^3), below yielding
    # min(Z, 1.5 S) Fty / 1.65 = 1.0 x 35 / 1.65 = 21.21 kip*in: about 8 % lower
    b = check(analyze(job()), "bending")
    assert b.limit == pytest.approx(1.0 * IN**3 * 38 * KSI / 1.95, rel=1e-9)
    assert "rupture" in b.formula and "Ftu" in b.formula
    assert (35 / 1.65) / (38 / 1.95) == pytest.approx(1.088, abs=1e-3)


def test_welded_member_uses_the_heat_affected_zone_strengths():
    # ADM 2015 Table A.3.4 (from memory), 6061-T6 welded: Ftyw 15 ksi, Ftuw 24 ksi; yielding
    # 1.0 x 15 / 1.65 = 9.09 kip*in governs over rupture 1.0 x 24 / 1.95 = 12.3 kip*in
    res = analyze(job(welded="true"))
    b = check(res, "bending")
    assert b.limit == pytest.approx(1.0 * IN**3 * 15 * KSI / 1.65, rel=1e-9)
    assert "Ftyw (welded)" in b.formula
    v = check(res, "shear")
    # shear yielding 0.6 Ftyw on Av = 2A/3 (solid rectangle), Omega 1.65; the text names it
    assert v.limit == pytest.approx(0.6 * 15 * KSI * (2 / 3 * 2 * IN**2) / 1.65, rel=1e-9)
    assert "0.6 Ftyw (welded)" in v.formula and "0.6 Fty Av" not in v.formula


def test_unwelded_shear_names_fty():
    v = check(analyze(job()), "shear")
    assert "0.6 Fty Av" in v.formula and "welded" not in v.formula
    assert v.limit == pytest.approx(0.6 * 35 * KSI * (2 / 3 * 2 * IN**2) / 1.65, rel=1e-9)


def test_deflection_uses_aluminium_modulus():
    # ADM 2015 (from memory) E = 10,100 ksi; hand: 5 w L^4 / (384 E I), I = 1 x 2^3 / 12
    j = job()
    d = check(analyze(j), "deflection")
    w, L, i = 100 * LBF / FT, 3 * FT, 2**3 / 12 * IN**4
    assert d.demand == pytest.approx(5 * w * L**4 / (384 * 10100 * KSI * i), rel=1e-9)


def test_slenderness_limits_of_6061_t6():
    # ADM 2015 B.5.4 with Table B.4.2 buckling constants (from memory), Fcy 35 ksi, E 10,100:
    # Bp = 35 (1 + 35^(1/3) / 11.4) = 45.04, Dp = Bp / 10 sqrt(Bp / E) = 0.3008,
    # lambda1 = (Bp - Fcy) / (1.6 Dp) = 20.9 (both edges), (Bp - Fcy) / (5 Dp) = 6.7 (one);
    # Bt = 35 (1 + 35^(1/5) / 5.8) = 47.29, Dt = Bt / 3.7 (Bt / E)^(1/3) = 2.139,
    # Rb/t limit ((Bt - Fcy) / Dt)^2 = 33.0
    lim = adm_limits(35 * KSI, 10100 * KSI)
    assert lim["both"] == pytest.approx(20.86, abs=0.05)
    assert lim["one"] == pytest.approx(6.68, abs=0.02)
    assert lim["curved"] == pytest.approx(33.0, abs=0.2)


def test_thin_tube_lists_local_buckling_as_not_checked():
    thin = '{ shape = "rect-tube", depth = "4 in", width = "4 in", wall = "0.083 in" }'
    res = analyze(job(section=thin))
    names = [u.name for u in res.unchecked]
    assert "element local buckling" in names and "web shear buckling" in names
    assert all(u.blocks_rating for u in res.unchecked)
    assert any("NOT CHECKED" in c for c in res.cautions)
    # a stocky tube (b/t = (4 - 3 x 0.25) / 0.25 = 13 < 20.9) reaches yield first
    stocky = '{ shape = "rect-tube", depth = "4 in", width = "4 in", wall = "0.25 in" }'
    assert analyze(job(section=stocky)).unchecked == ()


def test_unbraced_open_shape_lists_lateral_torsional_buckling(tmp_path):
    ch = '{ shape = "channel", depth = "4 in", flange_width = "1.75 in", flange_thickness = "0.25 in", web_thickness = "0.25 in" }'
    names = [u.name for u in analyze(job(section=ch, length="6 ft")).unchecked]
    assert "lateral-torsional buckling" in names
    braced = [u.name for u in analyze(job(section=ch, length="6 ft",
                                         beam="braced = true")).unchecked]
    assert "lateral-torsional buckling" not in braced
    p = tmp_path / "job.toml"
    p.write_text(f"""schema = 1
title = "al"
[beam]
length = "6 ft"
section = {ch}
material = "6061-T6"
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "6 ft"
type = "roller"
[[loads]]
type = "uniform"
value = "-20 lbf/ft"
""")
    r = subprocess.run([sys.executable, "-m", "shopbeam", "solve", str(p), "--json"],
                       capture_output=True, text=True, timeout=120)
    d = json.loads(r.stdout)
    assert any(u["name"] == "lateral-torsional buckling" and "ADM" in u["clause"]
               for u in d["unchecked"])
