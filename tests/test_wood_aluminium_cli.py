"""Wood and aluminium jobs as a shop writes them, through the command line (`solve --json`,
`capacity --json`, `rating`, `check`): every NDS adjustment factor reported with its value,
the repetitive-member rule, timbers on the wide face, LVL, wet service, metric jobs in MPa,
and aluminium element buckling. Hand figures beside each assert; NDS 2018 / Supplement and
ADM 2015 values are recalled from memory (marked)."""

from __future__ import annotations

import json
import subprocess
import sys

import pytest

PSI = 6894.757293168361
KSI = PSI * 1000
IN, FT, LBF = 0.0254, 0.3048, 4.4482216152605


def write(tmp_path, name, beam, loads, units="us", length="10 ft", criteria=""):
    zero = "0 ft" if units == "us" else "0 m"
    text = f"""schema = 1
title = "{name}"
units = "{units}"
[beam]
length = "{length}"
self_weight = false
{beam}
[[supports]]
at = "{zero}"
type = "pin"
[[supports]]
at = "{length}"
type = "roller"
{loads}
[criteria]
{criteria}
"""
    p = tmp_path / f"{name}.toml"
    p.write_text(text)
    return p


def run(*args):
    return subprocess.run([sys.executable, "-m", "shopbeam", *map(str, args)],
                          capture_output=True, text=True, timeout=120)


def solve(path, cmd="solve"):
    r = run(cmd, path, "--json")
    assert r.returncode == 0, r.stderr
    return json.loads(r.stdout)


def chk(d, name):
    return next(c for c in d["checks"] if c["name"] == name)


UNIFORM = """[[loads]]
type = "uniform"
start = "{a}"
end = "{b}"
value = "{w}"
"""


def uniform(w, b="10 ft", a="0 ft", **extra):
    return UNIFORM.format(a=a, b=b, w=w) + "".join(f'{k} = "{v}"\n' for k, v in extra.items())


# ------------------------------------------------------------------ lumber
def test_metric_unbraced_2x10_reports_every_factor_in_mpa(tmp_path):
    # NDS 2018 3.3.3 and Table 3.3.3, DF-L No.2 2x10 (Supplement Table 4A, from memory: Fb 900,
    # Emin 580,000 psi; CF 1.1). Span 3 m, 1.6 kN/m, unbraced. By hand: lu = 118.11 in,
    # lu/d = 12.8 -> le = 1.63 lu + 3d = 220.27 in, RB^2 = le d / b^2 = 905.6,
    # FbE = 1.20 x 580,000 / 905.6 = 768.6 psi, Fb* = 990 psi, FbE/Fb* = 0.7763,
    # CL = 0.9349 - sqrt(0.9349^2 - 0.7763/0.95) = 0.6965; Fb' = 689.5 psi = 4.754 MPa.
    # M = 1.6 x 3^2 / 8 = 1.8 kN m, S = 1.5 x 9.25^2 / 6 = 21.39 in^3: fb = 5.135 MPa
    p = write(tmp_path, "loft", 'section = "2x10"\nmaterial = "DF-L-2"\nbraced = false',
              uniform("-1.6 kN/m", "3 m", "0 m"), units="si", length="3 m")
    d = solve(p)
    b = chk(d, "bending")
    assert b["params"]["CL"] == pytest.approx(0.6965, abs=5e-4)
    assert b["limit"] == pytest.approx(689.5 * PSI, rel=1e-3)
    assert b["demand"] == pytest.approx(1.8e3 / (21.39 * IN**3), rel=1e-3)
    for k, v in {"CD": 1.0, "CM_b": 1.0, "Ct_b": 1.0, "CF": 1.1, "Cfu": 1.0, "Cr": 1.0}.items():
        assert b["params"][k] == pytest.approx(v), k
    assert "MPa" in b["formula"] and "psi" not in b["formula"]
    for name in ("shear", "bearing"):
        assert "psi" not in chk(d, name)["formula"], name
    report = run("solve", p).stdout
    assert "4.754 MPa" in report and "psi" not in report.split("CHECKS")[1].split("SELF")[0]


def test_repetitive_joists_at_16_in_take_cr(tmp_path):
    # NDS 2018 4.3.9: Cr 1.15 for three or more joists at 24 in or less. 2x10 DF-L No.2 at
    # 16 in, 14 ft, 40 psf live + 10 psf dead: w = 50 x 16/12 = 66.7 lbf/ft,
    # M = 66.7 x 14^2 / 8 = 1633 lbf ft, fb = 19,600 / 21.39 = 916.3 psi;
    # Fb' = 900 x CF 1.1 x Cr 1.15 = 1138.5 psi (ratio 0.805)
    loads = (uniform("-40 psf", "14 ft", width="16 in") +
             uniform("-10 psf", "14 ft", width="16 in", case="dead"))
    p = write(tmp_path, "joist", 'section = "2x10"\nmaterial = "DF-L-2"\nbraced = true\n'
              'repetitive = true', loads, length="14 ft", criteria='deflection = "floor"')
    d = solve(p)
    b = chk(d, "bending")
    assert b["params"]["Cr"] == 1.15 and b["limit"] == pytest.approx(1138.5 * PSI, rel=1e-9)
    assert b["ratio"] == pytest.approx(916.3 / 1138.5, rel=1e-3)
    assert d["warnings"] == []


def test_repetitive_is_refused_where_nds_does_not_allow_it(tmp_path):
    # NDS 2018 4.3.9: members spaced not more than 24 in, not less than 3 in number, dimension
    # lumber 2 to 4 in thick. Each case: Cr 1.0 and one warning naming file, key and line.
    wide = write(tmp_path, "wide", 'section = "2x10"\nmaterial = "DF-L-2"\nbraced = true\n'
                 'repetitive = true', uniform("-40 psf", "14 ft", width="48 in"), length="14 ft")
    pair = write(tmp_path, "pair", 'section = "2x10"\nmaterial = "DF-L-2"\nbraced = true\n'
                 'repetitive = true\nmembers = 2', uniform("-160 lbf/ft", "14 ft"),
                 length="14 ft")
    timber = write(tmp_path, "timber", 'section = "6x8"\nmaterial = "DF-L-2"\nbraced = true\n'
                   'repetitive = true', uniform("-200 lbf/ft", "12 ft"), length="12 ft")
    for p, key, word, words in ((wide, "loads[0].width", "width", "24 in or less"),
                                (pair, "beam.repetitive", "repetitive", "three or more"),
                                (timber, "beam.repetitive", "repetitive", "timber")):
        line = 1 + next(i for i, t in enumerate(p.read_text().splitlines())
                        if t.startswith(word))
        d = solve(p)
        assert chk(d, "bending")["params"]["Cr"] == 1.0
        assert len(d["warnings"]) == 1
        w = d["warnings"][0]
        assert f"{p.name}:{line}: {key}" in w and words in w and "Cr 1.0" in w
        c = run("check", p)
        assert c.returncode == 0 and key in c.stdout + c.stderr
    # 48 in joists: 40 psf x 4 ft = 160 lbf/ft, M = 3920 lbf ft, fb = 2199 psi vs 990
    assert chk(solve(wide), "bending")["limit"] == pytest.approx(990 * PSI, rel=1e-9)


def test_timber_values_and_beams_and_stringers_on_the_wide_face(tmp_path):
    # NDS Supplement 2018 Table 4D (from memory): DF-L No.2 posts and timbers Fb 750 psi,
    # E 1.3e6; a 6x8 is 5-1/2 x 7-1/2 in (Table 1B): S = 51.56 in^3, 200 lbf/ft on 12 ft:
    # M = 3600 lbf ft, fb = 837.8 psi: ratio 1.117 (the "about 1.10 FAIL").
    p = write(tmp_path, "post", 'section = "6x8"\nmaterial = "DF-L-2"\nbraced = true',
              uniform("-200 lbf/ft", "12 ft"), length="12 ft")
    b = chk(solve(p), "bending")
    assert b["limit"] == pytest.approx(750 * PSI, rel=1e-9)
    assert b["ratio"] == pytest.approx(837.8 / 750, rel=1e-3)
    # Table 4D footnote (from memory): beams and stringers loaded on the wide face, Fb x 0.74
    # for No.1 (0.86 Select Structural). 6x10 DF-L No.1 flat: Fb 1350 x 0.74 = 999 psi;
    # S = 9.5 x 5.5^2 / 6 = 47.90 in^3, 200 lbf/ft on 8 ft: fb = 19,200 / 47.90 = 400.9 psi
    p = write(tmp_path, "flatbs", 'section = "6x10"\nmaterial = "DF-L-1"\naxis = "weak"',
              uniform("-200 lbf/ft", "8 ft"), length="8 ft")
    b = chk(solve(p), "bending")
    assert b["params"]["Cfu"] == 0.74
    assert b["limit"] == pytest.approx(999 * PSI, rel=1e-9)
    assert b["demand"] == pytest.approx(400.9 * PSI, rel=1e-3)
    p = write(tmp_path, "flatss", 'section = "6x10"\nmaterial = "DF-L-SS"\naxis = "weak"',
              uniform("-200 lbf/ft", "8 ft"), length="8 ft")
    assert chk(solve(p), "bending")["limit"] == pytest.approx(1600 * 0.86 * PSI, rel=1e-9)


@pytest.mark.parametrize("section, fb_cf, cm", [
    ("2x4", 900 * 1.5, 0.85),   # Fb CF = 1350 > 1150 psi: CM 0.85
    ("2x10", 900 * 1.1, 1.0),   # Fb CF = 990 <= 1150 psi: CM 1.0
])
def test_wet_service_fb_exception(tmp_path, section, fb_cf, cm):
    # NDS Supplement 2018 Table 4A wet service factors (from memory): CM on Fb 0.85, but 1.0
    # when Fb CF <= 1150 psi; Fv 0.97, Fc_perp 0.67, E 0.9
    p = write(tmp_path, "wet", f'section = "{section}"\nmaterial = "DF-L-2"\nbraced = true\n'
              'wet_service = true', uniform("-20 lbf/ft", "6 ft"), length="6 ft")
    d = solve(p)
    b = chk(d, "bending")
    assert b["params"]["CM_b"] == cm and b["params"]["CM_e"] == 0.9
    assert b["limit"] == pytest.approx(fb_cf * cm * PSI, rel=1e-9)
    assert chk(d, "shear")["limit"] == pytest.approx(180 * 0.97 * PSI, rel=1e-9)
    assert chk(d, "bearing")["limit"] == pytest.approx(625 * 0.67 * PSI, rel=1e-9)


def test_lvl_repetitive_and_wet_service(tmp_path):
    # NDS 2018 8.3.7 (from memory): Cr 1.04 for structural composite lumber. LVL 2.0E-2600Fb
    # 1-3/4 x 11-7/8 (maker's values, from memory): Fb' = 2600 x (12/11.875)^0.136 x 1.04
    p = write(tmp_path, "lvl", 'section = "LVL1-3/4x11-7/8"\nmaterial = "LVL-2.0E"\n'
              'braced = true\nrepetitive = true', uniform("-200 lbf/ft", "16 ft"),
              length="16 ft")
    b = chk(solve(p), "bending")
    assert b["params"]["Cr"] == 1.04
    assert b["limit"] == pytest.approx(2600 * (12 / 11.875) ** 0.136 * 1.04 * PSI, rel=1e-9)
    # LVL is sold for dry service only: wet_service is refused with file, key and line
    p = write(tmp_path, "lvlwet", 'section = "LVL1-3/4x11-7/8"\nmaterial = "LVL-2.0E"\n'
              'braced = true\nwet_service = true', uniform("-200 lbf/ft", "16 ft"),
              length="16 ft")
    r = run("solve", p, "--json")
    assert r.returncode == 2 and "Traceback" not in r.stderr
    assert "lvlwet.toml:10: beam.wet_service" in r.stderr and "dry service" in r.stderr


# ------------------------------------------------------------------ aluminium
TUBE = '{ shape = "rect-tube", depth = "4 in", width = "4 in", wall = "0.083 in" }'
CHANNEL = ('{ shape = "channel", depth = "6 in", flange_width = "2.5 in", '
           'flange_thickness = "0.2 in", web_thickness = "0.17 in" }')


def test_thin_aluminium_tube_is_checked_on_its_local_buckling(tmp_path):
    # ADM 2015 B.5.4.2, F.8 (from memory): 6061-T6 4 x 4 x 0.083 tube, no corner radius
    # given so the flats are 4 - 2 x 0.083 in wide, flange b/t 46.19 > lambda2 32.8:
    # Fc = 2.27 sqrt(Bp E) / (1.6 b/t) = 20.72 ksi (142.9 MPa), below the rupture and
    # yield figures: Mn = Fc Sc, Omega 1.65. Metric job: the words are in MPa.
    p = write(tmp_path, "altube", f"section = {TUBE}\nmaterial = \"6061-T6\"",
              uniform("-1 kN/m", "2.4 m", "0 m"), units="si", length="2.4 m")
    d = solve(p, "capacity")
    b = chk(d, "bending")
    # the only gap is the walls under the support reactions: ADM web crippling (from memory)
    # is not worked out, and a thin wall can cripple there, so the factor is given, not rated
    gaps = [u for u in d["unchecked"] if u["blocks_rating"]]
    assert [u["name"] for u in gaps] == [u["name"] for u in d["unchecked"]] == [
        "web crippling and local yielding under concentrated forces"]
    assert "support reactions" in gaps[0]["reason"] and d["rated"] is False
    assert "B.5.4.2" in b["formula"] and "143 MPa" in b["formula"]
    assert "ksi" not in b["formula"].split("constants in ksi")[0]
    assert d["factor"] > 0


ARM_TUBE = '{ shape = "rect-tube", depth = "6 in", width = "1.5 in", wall = "0.125 in" }'


def arm(tmp_path, name, loads):
    """An aluminium tube arm held by one fixed (bolted) root: no bearing support."""
    p = tmp_path / f"{name}.toml"
    p.write_text(f"""schema = 1
title = "{name}"
[beam]
length = "72 in"
material = "6061-T6"
welded = false
section = {ARM_TUBE}
[[supports]]
at = "0 in"
type = "fixed"
{loads}""")
    return p


def test_an_aluminium_arm_on_a_fixed_root_is_not_withheld_for_bearing(tmp_path):
    # a fixed end is a bolted, welded or socketed connection, not a bearing (as for steel,
    # whose J10 checks skip it): with nothing bearing on the span, the walls' crippling under
    # a concentrated force (ADM 2015 J.8, from memory) has nothing to act on
    d = solve(arm(tmp_path, "spread", uniform("-100 lbf/ft", "72 in", "0 in")), "capacity")
    assert not [u for u in d["unchecked"] if u["name"].startswith("web crippling")]
    assert d["rated"] is True and d["factor"] > 0
    # its top-flange check names the closed shape's rule, as its bending check does
    top = chk(d, "bending, top-flange loads")
    assert top["clause"].startswith("ADM 2015 F.3")
    # a live point load on the arm bears on the top wall: withheld, as before
    live = '[[loads]]\ntype = "point"\nat = "{x}"\nvalue = "-200 lbf"\ncase = "{c}"\n'
    d = solve(arm(tmp_path, "tip", live.format(x="72 in", c="live")), "capacity")
    gap = [u for u in d["unchecked"] if u["name"].startswith("web crippling")]
    assert gap and gap[0]["blocks_rating"] and d["rated"] is False
    # a dead one: named, not withheld on (it does not grow with the rated load)
    d = solve(arm(tmp_path, "dead", live.format(x="72 in", c="dead")
                  + uniform("-50 lbf/ft", "72 in", "0 in")), "capacity")
    gap = [u for u in d["unchecked"] if u["name"].startswith("web crippling")]
    assert gap and not gap[0]["blocks_rating"] and "loads[0]" in gap[0]["reason"]
    assert d["rated"] is True


def test_unbraced_aluminium_channel_is_checked_for_lateral_torsional_buckling(tmp_path):
    # ADM 2015 F.2 (from memory), by hand: channel 6 x 2.5 in, tf 0.2, tw 0.17 (no fillets),
    # A = 2 (2.5 x 0.2) + 5.6 x 0.17 = 1.952 in^2, x-bar = (1.0 x 1.25 + 0.952 x 0.085) / 1.952
    # = 0.6818 in, Iy = 2 (0.2 x 2.5^3 / 12) + 1.0 (1.25 - 0.6818)^2 + 5.6 x 0.17^3 / 12
    # + 0.952 (0.6818 - 0.085)^2 = 1.1850 in^4, ry = 0.7792 in; unbraced 8 ft: lambda = 96 /
    # 0.7792 = 123.2 > Cc 65.67 (6061-T6): Mnmb = pi^2 x 10,100 x 3.634 / 123.2^2 = 23.86 kip
    # in, / 1.65 = 14.46 kip in. Braced, its flange outstand (b/t 11.65 > lambda2 10.48, Fc
    # 26.29 ksi) limits Mn = Fc Sc = 26.29 x 3.634 = 95.5 kip in, / 1.65 = 57.9 kip in
    loose = write(tmp_path, "loose", f"section = {CHANNEL}\nmaterial = \"6061-T6\"",
                  uniform("-100 lbf/ft", "8 ft"), length="8 ft")
    d = solve(loose, "capacity")
    b = chk(d, "bending")
    # the JSON gives bending as a stress (M / S); the moment is params.moment_limit
    assert b["unit"] == "Pa" and b["params"]["S"] > 0
    assert b["params"]["moment_limit"] == pytest.approx(14.46e3 * LBF * IN, rel=3e-3)
    assert "F.2" in b["clause"] and "lateral-torsional" in b["formula"]
    # loaded in the plane of its web, off the shear centre, it twists: that is not checked,
    # so it is not rated until a deck or shelf holds it (restrained = true)
    assert d["rated"] is False
    assert sorted(u["name"] for u in d["unchecked"] if u["blocks_rating"]) == [
        "torsion from loads off the shear centre",
        "web crippling and local yielding under concentrated forces"]
    assert "NOT RATED" in run("rating", loose).stdout
    fixed = write(tmp_path, "fixed", f"section = {CHANNEL}\nmaterial = \"6061-T6\"\n"
                  "restrained = true", uniform("-100 lbf/ft", "8 ft"), length="8 ft")
    d = solve(fixed, "capacity")
    # held against twist: the torsion gap closes; the web at the supports remains
    assert [u["name"] for u in d["unchecked"] if u["blocks_rating"]] == [
        "web crippling and local yielding under concentrated forces"]
    r = run("rating", fixed)
    assert r.returncode == 0 and "NOT RATED" in r.stdout and "torsion" not in r.stdout
    held = write(tmp_path, "held", f"section = {CHANNEL}\nmaterial = \"6061-T6\"\nbraced = true"
                 "\nrestrained = true", uniform("-100 lbf/ft", "8 ft"), length="8 ft")
    d = solve(held, "capacity")
    assert chk(d, "bending")["params"]["moment_limit"] == pytest.approx(57.9e3 * LBF * IN,
                                                                      rel=3e-3)


def test_unbraced_aluminium_angle_is_not_rated(tmp_path):
    # an angle's lateral-torsional buckling (ADM 2015 chapter F) is not computed: no rating
    ang = '{ shape = "angle", depth = "3 in", width = "3 in", thickness = "0.25 in" }'
    p = write(tmp_path, "ang", f"section = {ang}\nmaterial = \"6061-T6\"",
              uniform("-20 lbf/ft", "6 ft"), length="6 ft")
    r = run("rating", p)
    assert r.returncode == 0 and "NOT RATED" in r.stdout and "lateral-torsional" in r.stdout
    assert solve(p, "capacity")["rated"] is False


def test_welded_aluminium_uses_heat_affected_zone_strength(tmp_path):
    # ADM 2015 Table A.3.4 (from memory): 6061-T6 welded Ftyw 15 ksi, Ftuw 24 ksi. Solid
    # 1 x 2 in bar, Z = 1.0 in^3, S = 0.667 in^3: yielding min(Z, 1.5 S) Ftyw / 1.65 =
    # 9.09 kip in governs rupture 24 / 1.95 = 12.3; unwelded, rupture Z Ftu / 1.95 = 19.49
    bar = '{ shape = "rect-bar", depth = "2 in", width = "1 in" }'
    for welded, limit in (("true", 15 / 1.65), ("false", 38 / 1.95)):
        # (safety_factor = 1: the first-yield cap, Fy S / safety_factor, above these figures)
        p = write(tmp_path, f"bar{welded}", f"section = {bar}\nmaterial = \"6061-T6\"\n"
                  f"welded = {welded}\nbraced = true", uniform("-100 lbf/ft", "3 ft"),
                  length="3 ft", criteria="safety_factor = 1.0")
        b = chk(solve(p), "bending")
        assert b["params"]["moment_limit"] == pytest.approx(limit * 1e3 * LBF * IN, rel=1e-9)


def test_nominal_depth_to_breadth_for_lateral_support(tmp_path):
    # NDS 2018 4.4.1.1-4.4.1.2(a): d/b on nominal dimensions; d/b <= 2 needs no lateral
    # support (CL = 1.0): a 2x4 (4/2) and a 4x8 (8/4), although dressed 3.5/1.5 = 2.33 and
    # 7.25/3.5 = 2.07. A 2x6 (6/2 = 3) unbraced on 8 ft takes CL: lu/d = 96/5.5 = 17.5 >
    # 14.3 but uniform load -> le = 1.63 lu + 3d = 173.0 in, RB^2 = 173.0 x 5.5 / 2.25 = 422.9,
    # FbE = 696,000 / 422.9 = 1646 psi, Fb* = 900 x 1.3 = 1170: CL = 0.9149
    for section, cl in (("2x4", 1.0), ("4x8", 1.0), ("2x6", 0.9149)):
        p = write(tmp_path, f"b{section}", f'section = "{section}"\nmaterial = "DF-L-2"',
                  uniform("-20 lbf/ft", "8 ft"), length="8 ft")
        assert chk(solve(p), "bending")["params"]["CL"] == pytest.approx(cl, abs=5e-4), section


def test_shear_bearing_and_deflection_report_their_factors(tmp_path):
    # NDS 2018 Table 4.3.1: Fv' = Fv CD CM Ct, Fc_perp' = Fc_perp CM Ct Cb, E' = E CM Ct.
    # Wet 2x10 DF-L No.2 at 100-125 F (Table 2.3.3: wet Ct 0.7, E 0.9; Table 4A wet: Fv 0.97,
    # Fc_perp 0.67, E 0.9), two-month duration (CD 1.15): Fv' = 180 x 1.15 x 0.97 x 0.7
    p = write(tmp_path, "hot", 'section = "2x10"\nmaterial = "DF-L-2"\nbraced = true\n'
              'wet_service = true\ntemperature = "100F-125F"', uniform("-50 lbf/ft", "8 ft"),
              length="8 ft", criteria='duration = "two-months"')
    d = solve(p)
    v = chk(d, "shear")
    assert (v["params"]["CD"], v["params"]["CM_v"], v["params"]["Ct_b"]) == (1.15, 0.97, 0.7)
    assert v["limit"] == pytest.approx(180 * 1.15 * 0.97 * 0.7 * PSI, rel=1e-9)
    b = chk(d, "bearing")
    assert (b["params"]["CM_cp"], b["params"]["Ct_b"]) == (0.67, 0.7)
    assert b["limit"] == pytest.approx(625 * 0.67 * 0.7 * PSI, rel=1e-9)
    f = chk(d, "deflection")
    assert (f["params"]["CM_e"], f["params"]["Ct_e"]) == (0.9, 0.9)


def test_repetitive_joist_left_unbraced_is_told_how_to_say_braced(tmp_path):
    p = write(tmp_path, "joists", 'section = "2x10"\nmaterial = "DF-L-2"\nrepetitive = true',
              uniform("-80 lbf/ft", "14 ft"), length="14 ft")
    d = solve(p)
    assert chk(d, "bending")["params"]["CL"] < 1.0
    assert any("braced = true" in c and "repetitive" in c for c in d["cautions"])


@pytest.mark.parametrize("braced, said", [("true", False), ("false", True)])
def test_the_joists_cl_advice_is_given_only_where_braced_is_not_said(tmp_path, braced, said):
    # NDS 2018 4.4.1.2: a 2x10 (d/b 5 nominal) needs its compression edge held; with
    # braced = true CL = 1.0 and the report must not tell the shop to write what it wrote
    loads = uniform("-40 psf", "14 ft", width="16 in")
    p = write(tmp_path, f"joist-{braced}", 'section = "2x10"\nmaterial = "DF-L-2"\n'
              f'braced = {braced}\nrepetitive = true', loads, length="14 ft")
    d = solve(p)
    assert any("repetitive joists without braced = true" in c for c in d["cautions"]) == said
    assert ("CL" in chk(d, "bending")["params"] and chk(d, "bending")["params"]["CL"] < 1) == said


def test_the_report_names_the_wet_service_modulus_e_prime(tmp_path):
    # NDS 2018 Table 4.3.1 and Supplement Table 4A (from memory): DF-L No.2 E 1,600,000 psi;
    # wet service CM 0.9 on E and, wet at 100F-125F, Ct 0.9 on E (Table 2.3.3): E' = E CM Ct
    # = 1.296e6 psi. The MEMBER line gives it as E' with the reference E beside it
    beam = ('section = "2x10"\nmaterial = "DF-L-2"\nbraced = true\nwet_service = true\n'
            'temperature = "100F-125F"')
    p = write(tmp_path, "wet", beam, uniform("-60 lbf/ft", "12 ft"), length="12 ft")
    r = run("solve", p)
    assert r.returncode == 0, r.stderr
    line = next(x for x in r.stdout.splitlines() if x.strip().startswith("material"))
    assert "E' = 1.3e6 psi (E 1.6e6 psi x CM 0.9 x Ct 0.9)" in line
    dry = write(tmp_path, "dry", 'section = "2x10"\nmaterial = "DF-L-2"\nbraced = true',
                uniform("-60 lbf/ft", "12 ft"), length="12 ft")
    line = next(x for x in run("solve", dry).stdout.splitlines()
                if x.strip().startswith("material"))
    assert "E = 1.6e6 psi" in line and "E'" not in line


@pytest.mark.parametrize("section, kcr", [("6x10", 2), ("2x10", 1.5)])
def test_timbers_take_the_unseasoned_creep_factor(tmp_path, section, kcr):
    # NDS 2018 3.5.2 (from memory): Kcr 1.5 for seasoned lumber in dry service, 2.0 for
    # unseasoned; timbers (5 in and thicker, Supplement Table 4D) are sold surfaced green
    loads = uniform("-40 lbf/ft", "12 ft") + uniform("-20 lbf/ft", "12 ft", case="dead")
    p = write(tmp_path, f"t{section}", f'section = "{section}"\nmaterial = "DF-L-2"\n'
              "braced = true", loads, length="12 ft")
    d = solve(p)
    assert f"Kcr {kcr:g} x the dead-load deflection" in chk(d, "deflection")["formula"]
