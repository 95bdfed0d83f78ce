"""Wood members by the NDS 2018: reference values by size class, adjustment factors, beam
stability, bearing, creep and floor deflection. Reference values are NDS Supplement 2018
Table 4A/4B/4D recalled from memory; the hand figures beside each check are worked here from
those values and the NDS clauses named."""

from __future__ import annotations

import json
import math
import subprocess
import sys

import pytest

from shopbeam.design import lumber
from shopbeam.design.analysis import analyze
from shopbeam.design.capacity import capacity
from shopbeam.errors import InputErrors
from shopbeam.jobs.jobfile import parse_job_text
from shopbeam.members import wood
from shopbeam.members.catalog import lookup
from shopbeam.members.materials import figures, get
from shopbeam.output.present import present

PSI = 6894.757293168361
IN = 0.0254


def job(section="2x10", material="DF-L-2", length="10 ft", load='value = "-110 lbf/ft"',
        beam="", criteria="", self_weight="false", supports=None, kind="uniform",
        title="wood"):
    sup = supports or f"""[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "{length}"
type = "roller"
"""
    return parse_job_text(f"""schema = 1
title = "{title}"
[beam]
length = "{length}"
section = "{section}"
material = "{material}"
self_weight = {self_weight}
{beam}
{sup}
[[loads]]
type = "{kind}"
{load}
[criteria]
{criteria}
""")


def check(result, name):
    return next(c for c in result.checks if c.name == name)


# ------------------------------------------------------------------ dressed sizes
def test_timber_dressed_sizes():
    # NDS Supplement Table 1B (from memory): timbers are 1/2 in under nominal, a 6x8 is
    # 5-1/2 x 7-1/2 in; dimension lumber 2x10 is 1-1/2 x 9-1/4 in
    s = lookup("6x8")
    assert s.dims["h"] / IN == pytest.approx(7.5) and s.dims["b"] / IN == pytest.approx(5.5)
    s = lookup("2x10")
    assert s.dims["h"] / IN == pytest.approx(9.25) and s.dims["b"] / IN == pytest.approx(1.5)


# ------------------------------------------------------------------ the cases
def test_unbraced_2x10_takes_beam_stability():
    # NDS 2018 3.3.3, Table 3.3.3: 2x10 DF-L No.2 (b 1.5, d 9.25 in), 10 ft simple span,
    # uniform load, lu/d = 120 / 9.25 = 12.97 >= 7: le = 1.63 lu + 3 d = 223.35 in;
    # RB = sqrt(le d / b^2) = 30.30; Emin 580,000 psi (Supplement Table 4A);
    # FbE = 1.20 Emin / RB^2 = 758.0 psi; Fb* = 900 x CF 1.1 = 990 psi;
    # CL = (1 + 0.7657)/1.9 - sqrt(((1 + 0.7657)/1.9)^2 - 0.7657/0.95) = 0.6892;
    # Fb' = 682.3 psi; fb = (110 x 10^2 / 8 x 12) / 21.39 = 771.4 psi; ratio 1.131
    res = analyze(job())
    b = check(res, "bending")
    assert b.params["CL"] == pytest.approx(0.6892, abs=5e-4)
    assert b.limit / PSI == pytest.approx(682.3, rel=1e-3)
    assert b.demand / PSI == pytest.approx(771.4, rel=1e-3)
    assert b.ratio == pytest.approx(1.131, abs=2e-3) and not b.ok
    assert "NDS 3.3.3" in b.formula and "CL 0.689" in b.formula


def test_braced_joist_with_repetitive_member_factor():
    # NDS 2018 Table 4.3.1: Fb' = Fb CF Cr = 900 x 1.1 (Table 4A, 10 in wide) x 1.15
    # (4.3.9, repetitive members) = 1138.5 psi, CL = 1.0 (sheathing braces the top edge)
    res = analyze(job(beam="braced = true\nrepetitive = true"))
    b = check(res, "bending")
    assert b.limit / PSI == pytest.approx(1138.5, rel=1e-9)
    assert b.params["Cr"] == 1.15 and b.params["CF"] == 1.1 and b.params["CL"] == 1.0
    # the same joist as a single member: no Cr
    single = check(analyze(job(beam="braced = true")), "bending")
    assert single.limit / PSI == pytest.approx(990, rel=1e-9)


def test_6x8_timber_uses_posts_and_timbers_values():
    # NDS Supplement 2018 Table 4D (from memory), DF-L No.2 posts and timbers (6x8: width not
    # more than 2 in over thickness): Fb 750 psi, Fv 170 psi, E 1,300,000 psi; 5.5 x 7.5 in;
    # d/b = 1.36 <= 2 so CL = 1.0 (NDS 4.4.1.2); CF 1.0 (d <= 12 in, NDS 4.3.6.2)
    j = job(section="6x8")
    assert j.material.e / PSI == pytest.approx(1_300_000)
    assert j.ei == pytest.approx(1_300_000 * PSI * 5.5 * 7.5**3 / 12 * IN**4, rel=1e-9)
    res = analyze(j)
    b = check(res, "bending")
    assert b.limit / PSI == pytest.approx(750, rel=1e-9)
    assert check(res, "shear").limit / PSI == pytest.approx(170, rel=1e-9)
    # fb = 16500 lbf*in / (5.5 x 7.5^2 / 6 = 51.5625 in^3) = 320.0 psi
    assert b.demand / PSI == pytest.approx(16500 / 51.5625, rel=1e-6)


def test_6x10_is_a_beam_and_stringer():
    # NDS Supplement 4.1 / Table 4D (from memory): 6x10, width 4 in over thickness: beams and
    # stringers, DF-L No.2 Fb 875 psi
    v = wood.reference(get("DF-L-2"), 5.5, 9.5)
    assert v.size_class == "beams-stringers" and v.fb / PSI == 875
    assert check(analyze(job(section="6x10", beam="braced = true")), "bending").limit / PSI \
        == pytest.approx(875, rel=1e-9)


def test_timber_of_a_species_without_table_4d_values_is_refused(tmp_path):
    p = tmp_path / "job.toml"
    p.write_text(f"""schema = 1
title = "t"
[beam]
length = "8 ft"
section = "6x8"
material = "SPF-2"
[[supports]]
at = "0 ft"
type = "fixed"
""")
    r = subprocess.run([sys.executable, "-m", "shopbeam", "solve", str(p)], capture_output=True,
                       text=True, timeout=120)
    assert r.returncode == 2 and "Table 4D" in r.stderr and "Traceback" not in r.stderr


# ------------------------------------------------------------------ adjustment factors
@pytest.mark.parametrize("duration, cd", [("permanent", 0.9), ("ten-years", 1.0),
                                          ("two-months", 1.15), ("seven-days", 1.25),
                                          ("ten-minutes", 1.6)])
def test_load_duration_factor(duration, cd):
    # NDS 2018 Table 2.3.2: CD on Fb and Fv, not on E
    res = analyze(job(beam="braced = true", criteria=f'duration = "{duration}"'))
    assert check(res, "bending").limit / PSI == pytest.approx(990 * cd, rel=1e-9)
    assert check(res, "shear").limit / PSI == pytest.approx(180 * cd, rel=1e-9)


def test_wet_service_factors():
    # NDS Supplement Table 4A (from memory), wet service: Fb x 0.85 only when Fb CF > 1150
    # psi (2x10 No.2: 990 psi, so 1.0), Fv x 0.97, E x 0.9, Fc_perp x 0.67
    j = job(beam="braced = true\nwet_service = true")
    assert j.material.e / PSI == pytest.approx(1_600_000 * 0.9)
    res = analyze(j)
    assert check(res, "bending").limit / PSI == pytest.approx(990, rel=1e-9)
    assert check(res, "shear").limit / PSI == pytest.approx(180 * 0.97, rel=1e-9)
    assert check(res, "bearing").limit / PSI == pytest.approx(625 * 0.67, rel=1e-9)
    # 2x4 Select Structural: Fb CF = 1500 x 1.5 = 2250 psi > 1150: CM = 0.85
    res = analyze(job(section="2x4", material="DF-L-SS", load='value = "-20 lbf/ft"',
                      beam="braced = true\nwet_service = true"))
    assert check(res, "bending").limit / PSI == pytest.approx(1500 * 1.5 * 0.85, rel=1e-9)


def test_temperature_factor():
    # NDS 2018 Table 2.3.3, 100F < T <= 125F, dry: Ct 0.8 on Fb, 0.9 on E
    j = job(beam='braced = true\ntemperature = "100F-125F"')
    assert j.material.e / PSI == pytest.approx(1_600_000 * 0.9)
    assert check(analyze(j), "bending").limit / PSI == pytest.approx(990 * 0.8, rel=1e-9)


def test_flat_use_factor():
    # NDS Supplement Table 4A: a 2x6 on the flat: CF 1.3 x Cfu 1.15, CL 1.0 (d < b)
    res = analyze(job(section="2x6", length="4 ft", load='value = "-20 lbf/ft"',
                      beam='axis = "weak"'))
    b = check(res, "bending")
    assert b.limit / PSI == pytest.approx(900 * 1.3 * 1.15, rel=1e-9)
    assert b.params["Cfu"] == 1.15


def test_southern_pine_values_by_width():
    # NDS Supplement 2018 Table 4B (from memory): SP No.2 2x10 Fb 800 psi, size factor in
    # the table (CF 1.0); 2x4 Fb 1100 psi
    assert check(analyze(job(material="SP-2", beam="braced = true")), "bending").limit / PSI \
        == pytest.approx(800, rel=1e-9)
    v = wood.reference(get("SP-2"), 1.5, 3.5)
    assert v.fb / PSI == 1100 and wood.size_factor(v, 1.5, 3.5)[0] == 1.0


def test_lvl_depth_factor():
    # typical LVL 2.0E-2600Fb (manufacturer values, from memory): Fb x (12/d)^0.136
    v = wood.reference(get("LVL-2.0E"), 1.75, 11.875)
    cf, _ = wood.size_factor(v, 1.75, 11.875)
    assert cf == pytest.approx((12 / 11.875) ** 0.136, rel=1e-12)
    cf16, _ = wood.size_factor(v, 1.75, 16.0)
    assert cf16 == pytest.approx(0.9616, abs=1e-4)  # (12/16)^0.136


# ------------------------------------------------------------------ beam stability pieces
@pytest.mark.parametrize("lu, d, case, le", [
    (120, 9.25, "uniform", 1.63 * 120 + 3 * 9.25),     # NDS Table 3.3.3, lu/d >= 7
    (48, 9.25, "uniform", 2.06 * 48),                  # lu/d < 7
    (120, 9.25, "center-point", 1.37 * 120 + 3 * 9.25),
    (48, 11.25, "cantilever-uniform", 1.33 * 48),
    (96, 7.25, "cantilever-uniform", 0.90 * 96 + 3 * 7.25),
    (96, 7.25, "cantilever-end-point", 1.44 * 96 + 3 * 7.25),
    (200, 9.25, "any", 1.84 * 200),                    # lu/d > 14.3
    (100, 9.25, "any", 1.63 * 100 + 3 * 9.25),
])
def test_effective_length_table(lu, d, case, le):
    assert lumber.effective_length(lu, d, case)[0] == pytest.approx(le, rel=1e-12)


def test_stability_factor_limits():
    # NDS eq. 3.3-6: CL -> 1 as FbE / Fb* grows; CL = 0 when FbE = 0
    cl, _, _ = lumber.stability_factor(1000.0, 1e9, 1.5, 9.25, 10.0)
    assert cl == pytest.approx(1.0, abs=1e-3)
    cl, rb, fbe = lumber.stability_factor(990.0, 580_000.0, 1.5, 9.25, 223.35)
    assert rb == pytest.approx(30.30, abs=0.01) and fbe == pytest.approx(758.0, abs=0.5)


def test_point_load_case_is_read_from_the_loads():
    # a single point load at mid-span takes the Table 3.3.3 centre-point row
    res = analyze(job(kind="point", load='at = "5 ft"\nvalue = "-300 lbf"'))
    assert "point load at centre" in check(res, "bending").formula


@pytest.mark.parametrize("self_weight, row", [("false", "point load at centre"),
                                               ("true", "any load")])
def test_a_centre_point_load_with_the_members_own_weight_takes_the_general_row(self_weight,
                                                                              row):
    # NDS 2018 Table 3.3.3 lists a centre point load alone; a point load together with a
    # uniform one (the member's own weight) is a loading it does not list, and its footnote
    # gives the general row: le = 1.63 lu + 3d for 7 <= lu/d <= 14.3 (from memory)
    res = analyze(job(kind="point", load='at = "5 ft"\nvalue = "-300 lbf"',
                      self_weight=self_weight))
    assert row in check(res, "bending").formula


def test_the_dead_load_alone_check_reads_its_row_from_the_dead_loads():
    # 2x12 DF-L No.1 (Fb 1000 psi, Emin 620,000 psi, NDS Supplement 2018 Table 4A, from
    # memory), 10 ft unbraced, 300 lbf live at mid-span, its own weight the only dead load.
    # Dead load alone (CD 0.9): a uniform load, le = 1.63 x 120 + 3 x 11.25 = 229.35 in,
    # RB = sqrt(le d / b^2) = 33.86, FbE = 1.20 Emin / RB^2 = 648.8 psi, Fb* = 900 psi,
    # CL by NDS eq. 3.3-6 = 0.658, Fb' = 592 psi
    res = analyze(job(section="2x12", material="DF-L-1", kind="point",
                      load='at = "5 ft"\nvalue = "-300 lbf"', self_weight="true"))
    dead = check(res, "bending, dead load")
    rb2 = 229.35 * 11.25 / 1.5 ** 2
    a = 1.20 * 620_000 / rb2 / 900
    c = (1 + a) / 1.9
    cl = c - math.sqrt(c * c - a / 0.95)
    assert dead.limit / PSI == pytest.approx(900 * cl, rel=1e-3)
    assert dead.limit / PSI == pytest.approx(592, abs=1)
    assert "uniform load" in dead.formula


# ------------------------------------------------------------------ bearing
def test_bearing_at_supports_and_under_a_point_load():
    # NDS 2018 3.10.2: fc_perp = R / (b lb); 2x10 DF-L No.2 Fc_perp 625 psi (Table 4A).
    # 600 lbf at mid-span of a 10 ft span: R = 300 lbf at each end over 1.5 x 3.5 in:
    # 57.1 psi (Cb 1.0 at an end); under the load 600 / (1.5 x 3.5) = 114.3 psi against
    # 625 x Cb (3.5 + 0.375)/3.5 = 692.0 psi (NDS 3.10.4)
    res = analyze(job(kind="point", load='at = "5 ft"\nvalue = "-600 lbf"',
                      beam='braced = true\nbearing = "3.5 in"'))
    br = check(res, "bearing")
    assert br.demand / PSI == pytest.approx(600 / 5.25, rel=1e-9)
    assert br.limit / PSI == pytest.approx(625 * 3.875 / 3.5, rel=1e-9)
    assert br.at == pytest.approx(1.524)


def test_default_bearing_length_is_stated():
    res = analyze(job(beam="braced = true"))
    br = check(res, "bearing")
    # R = 550 lbf over 1.5 x 1.5 in = 244.4 psi (the stated 1-1/2 in default)
    assert br.demand / PSI == pytest.approx(550 / 2.25, rel=1e-9)
    assert "default 1-1/2 in" in br.formula


# ------------------------------------------------------------------ deflection
def test_creep_on_the_dead_load_deflection():
    # NDS 2018 3.5.2: long-term deflection = Kcr x dead-load deflection + live-load
    # deflection, Kcr 1.5 (seasoned, dry). Dead load only: 1.5 x 5 w L^4 / (384 E I)
    j = job(load='value = "-110 lbf/ft"\ncase = "dead"', beam="braced = true")
    d = check(analyze(j), "deflection")
    w, L = 110 * 4.4482216152605 / 0.3048, 3.048
    short = 5 * w * L**4 / (384 * j.ei)
    assert d.demand == pytest.approx(1.5 * short, rel=1e-9)
    assert "Kcr 1.5" in d.formula
    # in wet service Kcr = 2.0 (and E' = 0.9 E)
    jw = job(load='value = "-110 lbf/ft"\ncase = "dead"', beam="braced = true\nwet_service = true")
    assert check(analyze(jw), "deflection").demand == pytest.approx(
        2.0 * 5 * w * L**4 / (384 * jw.ei), rel=1e-9)


def test_floor_checks_live_and_total_deflection():
    # IBC 2018 Table 1604.3 floor members (from memory): L/360 under live load, L/240 under
    # dead + live
    text = 'value = "-110 lbf/ft"'
    res = analyze(job(load=text, beam="braced = true", criteria='deflection = "floor"'))
    total, live = check(res, "deflection"), check(res, "live deflection")
    assert total.limit == pytest.approx(3.048 / 240, rel=1e-9)
    assert live.limit == pytest.approx(3.048 / 360, rel=1e-9)
    assert live.demand == pytest.approx(total.demand, rel=1e-9)  # all load is live here


# ------------------------------------------------------------------ reader and output
@pytest.mark.parametrize("beam, criteria, key", [
    ("", 'duration = "forever"', "criteria.duration"),
    ('temperature = "hot"', "", "beam.temperature"),
    ('wet_service = "yes"', "", "beam.wet_service"),
    ('repetitive = 1', "", "beam.repetitive"),
    ('bearing = "3.5"', "", "beam.bearing"),
    ("", 'live_deflection = "360"', "criteria.live_deflection"),
])
def test_bad_wood_keys_are_errors(beam, criteria, key):
    with pytest.raises(InputErrors) as e:
        job(beam=beam, criteria=criteria)
    assert key in str(e.value)


def test_wood_keys_on_steel_are_warned_as_ignored():
    j = job(section="W8x18", material="A992", beam="wet_service = true")
    assert any(p.key == "beam.wet_service" and p.warning for p in j.warnings)


def test_lumber_and_stainless_show_their_trade_figures(tmp_path):
    assert figures(get("DF-L-2")) == "Fb = 900 psi, Fv = 180 psi, E = 1.6e6 psi"
    assert figures(get("304")) == "E = 28,000 ksi, Fy = 30 ksi, Fu = 75 ksi"
    assert figures(get("316"), "si") == "E = 193 GPa, Fy = 205 MPa, Fu = 515 MPa"
    p = tmp_path / "job.toml"
    p.write_text("""schema = 1
title = "w"
[beam]
length = "10 ft"
section = "2x10"
material = "DF-L-2"
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "10 ft"
type = "roller"
[[loads]]
type = "uniform"
value = "-50 lbf/ft"
""")
    r = subprocess.run([sys.executable, "-m", "shopbeam", "solve", str(p)], capture_output=True,
                       text=True, timeout=120)
    assert "Fb = 900 psi" in r.stdout and "E = 1.6e6 psi" in r.stdout
    assert "Fy = 0.9 ksi" not in r.stdout and " psi vs limit " in r.stdout
    r = subprocess.run([sys.executable, "-m", "shopbeam", "materials"], capture_output=True,
                       text=True, timeout=120)
    assert "27992" not in r.stdout and "28,000 ksi" in r.stdout and "1.6e6 psi" in r.stdout
    row304 = next(line for line in r.stdout.splitlines() if line.startswith("304 "))
    assert "30 ksi" in row304 and "29.73" not in row304  # ASTM A240: 30 ksi (205 MPa)


def test_capacity_of_a_wood_member_is_exact():
    # every ratio is proportional to the live load (no dead load, no self-weight): k = 1/ratio
    j = job(beam="braced = true")
    res = analyze(j)
    g = max(c.ratio for c in res.checks)
    assert capacity(j).factor == pytest.approx(1 / g, rel=1e-9)


def test_json_carries_the_factors(tmp_path):
    p = tmp_path / "job.toml"
    p.write_text("""schema = 1
title = "w"
[beam]
length = "10 ft"
section = "2x10"
material = "DF-L-2"
self_weight = false
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "10 ft"
type = "roller"
[[loads]]
type = "uniform"
value = "-110 lbf/ft"
""")
    r = subprocess.run([sys.executable, "-m", "shopbeam", "solve", str(p), "--json"],
                       capture_output=True, text=True, timeout=120)
    d = json.loads(r.stdout)
    b = next(c for c in d["checks"] if c["name"] == "bending")
    assert math.isclose(b["params"]["CL"], 0.6892, abs_tol=5e-4)
    assert b["params"]["CF"] == 1.1 and "NDS" in b["clause"]
    assert {c["name"] for c in d["checks"]} >= {"bending", "shear", "deflection", "bearing"}


def test_a_length_ending_at_a_brace_takes_the_general_row():
    # NDS 2018 Table 3.3.3 footnote: arrangements the table does not list take the general
    # rows; 2x6 braced at mid-span of 14 ft: lu = 84 in, lu/d = 15.3 > 14.3: le = 1.84 lu
    # (a 2x4 needs no lateral support at all: nominal d/b = 2, NDS 4.4.1.2(a))
    res = analyze(job(section="2x6", length="14 ft", load='value = "-10 lbf/ft"',
                      beam='braces = ["7 ft"]'))
    f = check(res, "bending").formula
    assert "le = 1.84 lu (any load, lu/d > 14.3) = 154.6 in" in f


def test_lvl_stock_sizes_and_family():
    # LVL plies are 1-3/4 in thick (makers' stock sizes, from memory)
    s = lookup("LVL1-3/4x11-7/8")
    assert s.dims["h"] / IN == pytest.approx(11.875) and s.dims["b"] / IN == pytest.approx(1.75)
    j = job(section="LVL1-3/4x11-7/8", material="LVL-2.0E", beam="braced = true")
    # Fb' = 2600 x (12 / 11.875)^0.136 (LVL depth factor), CD = CM = Ct = 1
    assert check(analyze(j), "bending").limit / PSI == pytest.approx(
        2600 * (12 / 11.875) ** 0.136, rel=1e-9)
    with pytest.raises(InputErrors) as e:
        job(section="LVL1-3/4x11-7/8", material="A36")
    assert "lumber size" in str(e.value)


def test_sizing_a_floor_checks_the_live_load_deflection_too():
    # the batched sweep and the one-by-one checks agree on a floor job where L/360 under the
    # live load alone governs (IBC 2018 Table 1604.3, from memory)
    from dataclasses import replace

    from shopbeam.design.sizing import size
    from shopbeam.members.catalog import list_sections

    j = parse_job_text("""schema = 1
title = "floor"
[beam]
length = "20 ft"
section = "W8x18"
material = "A992"
braced = true
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "20 ft"
type = "roller"
[[loads]]
type = "uniform"
value = "-40 lbf/ft"
case = "dead"
[[loads]]
type = "uniform"
value = "-500 lbf/ft"
[criteria]
deflection = "floor"
""")
    res = size(j, "W", with_capacity=False)
    rows = {r.designation: r for r in res.rows}
    lightest = res.lightest
    assert lightest.governing == "live deflection"
    for des in (lightest.designation, "W8X18", "W10X22"):
        sec = next(s for s in list_sections("W") if s.designation.upper() == des.upper())
        full = analyze(replace(j, section=sec))
        des = sec.designation
        assert rows[des].ratio == pytest.approx(max(c.ratio for c in full.checks), rel=1e-6)


def test_no_bearing_check_at_a_fixed_end():
    # a fixed end is a connection, not a bearing (NDS 3.10 is bearing on a support or under a
    # load); the 300 lbf tip load is the only bearing: 300 / (1.5 x 1.5) = 133.3 psi against
    # 625 psi x Cb 1.0 (at the end of the member, NDS 3.10.4)
    fixed = '[[supports]]\nat = "0 ft"\ntype = "fixed"\n'
    res = analyze(job(kind="point", length="4 ft", load='at = "4 ft"\nvalue = "-300 lbf"',
                      beam="braced = true", supports=fixed))
    br = check(res, "bearing")
    assert br.at == pytest.approx(4 * 0.3048)
    assert br.demand / PSI == pytest.approx(300 / 2.25, rel=1e-9)
    assert br.limit / PSI == pytest.approx(625, rel=1e-9)


def test_dead_load_alone_is_checked_with_cd_0_9():
    # NDS 2018 2.3.2 / Table 2.3.2: permanent load CD 0.9. A 2x10 DF-L No.2 braced, carrying
    # only dead load: the dead-load check allows 900 x CF 1.1 x 0.9 = 891 psi where the
    # ten-year duration of the job allows 990 psi
    res = analyze(job(load='value = "-110 lbf/ft"\ncase = "dead"', beam="braced = true"))
    b, bd = check(res, "bending"), check(res, "bending, dead load")
    assert b.limit / PSI == pytest.approx(990, rel=1e-9)
    assert bd.limit / PSI == pytest.approx(891, rel=1e-9)
    assert bd.demand == pytest.approx(b.demand, rel=1e-9)
    assert check(res, "shear, dead load").limit / PSI == pytest.approx(162, rel=1e-9)
    # a job whose duration is already permanent needs no second check
    res = analyze(job(load='value = "-110 lbf/ft"\ncase = "dead"', beam="braced = true",
                      criteria='duration = "permanent"'))
    assert not [c for c in res.checks if "dead load" in c.name]


@pytest.mark.parametrize("span, over", [("23 ft", False), ("24 ft", True), ("30 ft", True)])
def test_a_member_past_rb_50_is_not_rated(span, over):
    # NDS 2018 3.3.3.7: RB shall not exceed 50 (from memory). 2x12 (1-1/2 x 11-1/4 in), single
    # span, uniform load, lu/d >= 7: le = 1.63 lu + 3 d (Table 3.3.3). Hand figures: 23 ft,
    # le = 483.6 in, RB = sqrt(le d / b^2) = 49.2; 24 ft: 503.2 in, RB = 50.2; 30 ft: 55.7
    j = job("2x12", "DF-L-SS", span, load='value = "-5 lbf/ft"')
    cap = capacity(j)
    why = [r for r in cap.not_rated if "RB over 50" in r]
    assert bool(why) == over
    if over:
        assert "3.3.3.7" in why[0] and "brace" in why[0].lower()
        assert "NOT CHECKED" in present(analyze(j)).verdict
    else:
        assert cap.rated
    braced = capacity(job("2x12", "DF-L-SS", span, load='value = "-5 lbf/ft"',
                          beam="braced = true"))
    assert not [r for r in braced.not_rated if "RB over 50" in r]


def test_permanent_duration_takes_creep_on_every_load():
    # NDS 2018 3.5.2: long-term deflection = Kcr x the deflection under long-term load (Kcr
    # 1.5 seasoned, dry; from memory); duration = "permanent" (NDS Table 2.3.2) says every
    # load stays. Hand figure, 2x12 (I = 177.98 in^4) DF-L No.2 (E 1.6e6 psi, NDS Supplement
    # Table 4A, from memory), 20 ft, 30 lbf/ft: 5 w L^4 / (384 E I) = 0.3793 in; x 1.5 = 0.5690
    short = check(analyze(job("2x12", length="20 ft", load='value = "-30 lbf/ft"',
                              beam="braced = true")), "deflection")
    lasting = check(analyze(job("2x12", length="20 ft", load='value = "-30 lbf/ft"',
                                beam="braced = true", criteria='duration = "permanent"')),
                    "deflection")
    assert short.demand / IN == pytest.approx(0.3793, rel=2e-3)
    assert lasting.demand / IN == pytest.approx(0.5690, rel=2e-3)
    assert "Kcr 1.5" in lasting.formula and "permanent" in lasting.formula


@pytest.mark.parametrize("tags, duration, warned", [
    ('["shelf"]', "", True), ('["rack"]', "", True), ('["storage"]', "", True),
    ('["shelf"]', 'duration = "ten-years"', False), ('["bench"]', "", False)])
def test_a_wood_rack_or_shelf_with_no_duration_is_told_what_it_is_checked_as(tags, duration,
                                                                            warned):
    text = f"""schema = 1
title = "wood shelf"
tags = {tags}
[beam]
length = "6 ft"
section = "2x10"
material = "DF-L-2"
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "6 ft"
type = "roller"
[[loads]]
type = "uniform"
value = "-50 lbf/ft"
[criteria]
{duration}
"""
    said = [w for w in parse_job_text(text).warnings if w.key == "criteria.duration"]
    assert bool(said) == warned
    if warned:
        assert "permanent" in said[0].message


@pytest.mark.parametrize("inset, cb", [("3.5 in", 1.0), ("3.7 in", 1.0), ("4 in", 1.25)])
def test_bearing_factor_measures_the_end_distance_to_the_bearing_edge(inset, cb):
    # NDS 2018 3.10.4 (from memory): Cb = (lb + 0.375)/lb for bearings under 6 in long and
    # not nearer than 3 in to the end of the member. A 1-1/2 in bearing centred 3.5 in in runs
    # from 2.75 in (3.7 in: 2.95 in): nearer than 3 in, Cb 1.0; centred 4 in it starts at 3.25 in: Cb
    # (1.5 + 0.375)/1.5 = 1.25
    far = 120 - float(inset.split()[0])
    sup = f"""[[supports]]
at = "{inset}"
type = "pin"
[[supports]]
at = "{far:g} in"
type = "roller"
"""
    res = analyze(job("2x10", length="10 ft", supports=sup))
    bear = check(res, "bearing")
    assert bear.limit / PSI == pytest.approx(625 * cb, rel=1e-6)


@pytest.mark.parametrize("axis, flat", [("", False), ('axis = "weak"', True)])
def test_lvl_laid_flat_is_not_rated_on_its_edgewise_values(axis, flat):
    # LVL makers publish separate flatwise (plank) values, lower than the edgewise ones in
    # shear and bearing (makers' literature, from memory); shopbeam's are edgewise
    j = job("LVL1-3/4x11-7/8", "LVL-2.0E", "4 ft", beam=axis)
    why = [r for r in capacity(j).not_rated if "LVL strength used flat" in r]
    assert bool(why) == flat


def test_a_wood_section_given_by_its_properties_is_not_rated_and_its_wood_keys_are_warned():
    # a 2x12's properties typed as shape = "custom": no b and d, so no CL (NDS 3.3.3) and no
    # Table 4.3.1 factors; the same beam as "2x12", 16 ft unbraced at 60 lbf/ft, fails at CL
    # 0.311 (hand: le = 1.63 x 192 + 3 x 11.25 = 346.7 in, RB 41.6, FbE 478 psi, NDS 2018
    # 3.3.3, DF-L Select Structural Fb 1,500 psi, Emin 690,000 psi, from memory)
    custom = ('[beam.section]\nshape = "custom"\narea = "16.875 in^2"\nix = "177.98 in^4"\n'
              'sx = "31.64 in^3"')
    text = f"""schema = 1
title = "shelf"
[beam]
length = "16 ft"
material = "DF-L-SS"
self_weight = false
wet_service = true
{custom}
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "16 ft"
type = "roller"
[[loads]]
type = "uniform"
value = "-60 lbf/ft"
"""
    j = parse_job_text(text)
    assert [w for w in j.warnings if w.key == "beam.wet_service" and "not applied" in w.message]
    cap = capacity(j)
    assert not cap.rated and any("given by its properties" in r for r in cap.not_rated)
    sized = job("2x12", "DF-L-SS", "16 ft", load='value = "-60 lbf/ft"')
    assert check(analyze(sized), "bending").ratio > 1.5


def test_a_metal_shape_in_wood_is_refused_once_without_a_follow_on_warning():
    # the wood service keys are not "not applied to a section given by its properties":
    # the section is a W shape, refused as not made in wood, and that one message says so
    with pytest.raises(InputErrors) as e:
        job(section="W8x10", criteria='duration = "ten-years"')
    assert len(e.value.problems) == 1 and "not made in wood" in e.value.problems[0].message


@pytest.mark.parametrize("load, title, held", [
    ('value = "-110 lbf/ft"', "wood", True),                       # no spacing shown
    ('value = "-55 psf"\nwidth = "16 in"', "wood", False),          # joists at 16 in
    ('value = "-55 psf"\nwidth = "16 in"', "Single 2x10 header", True),
    ('value = "-110 lbf/ft"', "Floor joist 2x10 at 16 in o.c.", False),  # spacing in words
    ('value = "-55 psf"\nwidth = "16 in"', "Floor joist, single span", False),
    ('value = "-55 psf"\nwidth = "16 in"', "Single-family house, floor joist", False),
    ('value = "-55 psf"\nwidth = "16 in"', "Joist between headers", False),
    ('value = "-55 psf"\nwidth = "16 in"', "Ceiling joist, lintel over the window is separate",
     False),
    ('value = "-55 psf"\nwidth = "16 in"', "Header over the patio door, 2-ply 2x10", True),
])
def test_the_repetitive_member_factor_needs_the_spacing_shown(load, title, held):
    # NDS 2018 4.3.9 (from memory): Cr 1.15 for three or more members at 24 in or less
    # sharing the load; a lone header with repetitive = true had been posted 15 % high
    from shopbeam.design.capacity import capacity

    res = capacity(job(beam="braced = true\nrepetitive = true", load=load, title=title))
    assert any("repetitive = true (Cr 1.15)" in w for w in res.not_rated) == held


@pytest.mark.parametrize("title, key, held", [
    ("Outdoor deck joist, exposed to rain", "", True),
    ("Outdoor deck joist, exposed to rain", "wet_service = true", False),
    ("Outdoor deck joist, under the roof", "wet_service = false", False),
    ("Loft joist over the heat-treat furnace, about 120F", "", True),
    ("Loft joist over the heat-treat furnace, about 120F", 'temperature = "100F-125F"', False),
    ("Shelf for hot-rolled bar", "", False),   # a steel grade's words, not the wood's heat
    ("Exposed joist in the showroom", "", False),  # exposed to view, not to the weather
    # words of a dry, room-temperature member (each had held a rating)
    ("Loft joist, kiln-dried DF", "", False),
    ("Joist, not exposed to weather", "", False),
    ("Loft joist, Rainbow Woodworks", "", False),
    ("Outside dimensions 12x16 ft", "", False),
    ("Attic joist, stays under 100F", "", False),
    ("Bakery joist near the ovens, conditioned space", "", False),
    ("Garage loft joist, weather-protected", "", False),
    # and wet or hot said other ways
    ("Backyard deck joist", "", True),
    ("Drying room joist, 140\u00b0", "", True),
    ("Sauna bench joist", "", True),
    ("Loft joist", "", False),
    # a near word (heated) cancels a wet word in its own phrase only; mezzanine and loft
    # say nothing of the weather
    ("Mezzanine stair landing beam outside, exposed to rain", "", True),
    ("Heated shop to lumber shed walkway, exposed to rain", "", True),
    ("Open loft over the yard, exposed to rain", "", True),
    ("Outdoor mezzanine joist", "", True),
    ("Mezzanine joist, enclosed, exposed to rain during the build", "", False),  # whole member
    ("Patio cover joist", "", True),
    ("Boat dock stringer", "", True),
    ("Shelf joist beside the wet saw", "", False),
    ("Joist along the outside wall", "", False),
    ("Shelf joist, 2 ft away from the forge", "", True),
    ("Shelf joist, forge 30 ft away", "", False),
    ("Rack joist for annealed wire stock", "", False),
    ("Shelf over the wood stove", "", True),
    ("Drying shelf at 140 \u00baF", "", True),
    # words that are not the member's service (a span's place, stored goods, a tarp)
    ("Outdoor deck joist, interior span of three", "", True),
    ("Outdoor lumber rack joist, covered by a tarp in winter only", "", True),
    ("Joist, 12 ft outside to outside", "", False),
    ("Shelf joist for heat-treated pallets", "", False),
    ("Joist under the wet-pipe sprinkler main", "", False),
    ("Rain gear shelf joist", "", False),
    ("Boiler parts shelf joist", "", False),
    # heat said in a metal shop's words
    ("Shelf joist over the forge", "", True),
    ("Foundry pattern shelf beam", "", True),
    ("Drying shed shelf at 140 degrees", "", True),
    ("Shelf beside the steam pipes", "", True),
])
def test_wet_or_hot_service_said_in_words_needs_its_key(title, key, held):
    # NDS 2018 Supplement Table 4A CM and Table 2.3.3 Ct (from memory): a 2x6 deck joist
    # exposed to rain had been posted 17 % high, a joist over a furnace 31 %
    from shopbeam.design.capacity import capacity

    res = capacity(job(beam=f"braced = true\n{key}", title=title))
    said = [w for w in res.not_rated if "wet service" in w or "temperature" in w]
    assert bool(said) == held, res.not_rated


def test_bearing_of_a_patterned_wood_beam_is_judged_at_each_supports_largest_reaction():
    # three spans, live load patterned, a 1 in seat at the third support: its reaction is
    # largest with the two spans beside it loaded, a state neither the shear nor the
    # deflection pattern need be. The check must read the worst of every pattern (the
    # all-patterns walk is the oracle)
    from shopbeam.design.loading import evaluate, walk_patterns

    text = """schema = 1
title = "three-span lumber shelf rail"
units = "us"
tags = ["shelf"]
[beam]
length = "30 ft 6 in"
section = "2x12"
material = "DF-L-2"
self_weight = false
restrained = true
bearing = "3.5 in"
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "10 ft 6 in"
type = "roller"
bearing = "6 in"
[[supports]]
at = "20 ft 6 in"
type = "roller"
bearing = "1 in"
[[supports]]
at = "30 ft 6 in"
type = "roller"
[[loads]]
type = "uniform"
value = "-120 lbf/ft"
patterned = true
label = "stock"
[criteria]
deflection = "L/120"
duration = "ten-years"
"""
    job = parse_job_text(text)
    got = {c.name: c for c in evaluate(job, 1.0).checks}["bearing"]
    walked = walk_patterns(job, 1.0)["bearing"][0]
    assert got.ratio == pytest.approx(walked.ratio, rel=1e-9)
    # and it is the 1 in seat: R / (1.5 in x 1 in), with R = 1441.6 lbf by the three-moment
    # equation (spans 10.5/10/10 ft, the last two loaded: M1 = -389.6, M2 = -1402.6 lbf*ft;
    # R = 600 + 101.3 + 600 + 140.3 lbf), worked by hand
    assert got.demand * 1.5 * 1.0 * 0.0254 ** 2 / 4.4482216152605 == pytest.approx(1442, rel=0.01)
    cap = capacity(job)
    assert {c.name: c for c in cap.evaluation.checks}["bearing"].ratio <= 1 + 1e-9


CART_DECK = """schema = 1
title = "Lumber deck joist over three posts, cart aisle"
units = "us"
tags = ["not-lifting", "not-floor"]
[beam]
length = "20 ft"
section = "4x10"
material = "DF-L-2"
self_weight = false
braced = true
wet_service = false
temperature = "up-to-100F"
[[supports]]
at = "0 ft"
type = "pin"
bearing = "5.5 in"
[[supports]]
at = "10 ft"
type = "roller"
bearing = "5.5 in"
[[supports]]
at = "20 ft"
type = "roller"
bearing = "5.5 in"
[[moving]]
label = "cart"
loads = ["-1200 lbf", "-300 lbf"]
spacing = ["2 ft"]
{contact}
[criteria]
deflection = "L/240"
"""


def test_wheels_on_wood_bear_on_their_own_contact_or_the_member_is_not_rated():
    # no contact length given: the wheels never borrow the seats' 5.5 in (nor the 1-1/2 in
    # plate default); the member is not rated, and says what to write
    cap = capacity(parse_job_text(CART_DECK.format(contact=""), "deck.toml"))
    held = [w for w in cap.not_rated if "bearing under the wheels" in w]
    assert held and "[[moving]]" in held[0] and not cap.rated
    # given: NDS 2018 3.10.2 fc_perp = P / (b lb) <= Fc_perp Cb; at the member's end Cb = 1
    # (NDS 3.10.4), so the 1200 lbf wheel there rates k = 625 psi x 3.5 in x 0.75 in / 1200
    # lbf (Fc_perp 625 psi for DF-L No.2, NDS Supplement Table 4A, from memory; b = 3.5 in)
    cap = capacity(parse_job_text(CART_DECK.format(contact='bearing = "0.75 in"'), "deck.toml"))
    assert not [w for w in cap.not_rated if "bearing under the wheels" in w]
    assert cap.governing.name == "bearing" and "each wheel's contact" in cap.governing.formula
    assert cap.factor == pytest.approx(625 * 3.5 * 0.75 / 1200, rel=1e-6)


def test_a_wheel_contact_on_a_steel_member_is_warned_as_unused():
    text = CART_DECK.format(contact='bearing = "1 in"').replace('section = "4x10"',
                                                               'section = "W8x18"')
    text = text.replace('material = "DF-L-2"', 'material = "A992"')
    text = text.replace("wet_service = false\ntemperature = \"up-to-100F\"\n", "")
    j = parse_job_text(text, "deck.toml")
    assert any(p.key == "moving[0].bearing" and "changes nothing" in p.message
               for p in j.warnings)


def test_a_span_of_a_continuous_wood_member_takes_the_general_row_of_table_3_3_3():
    # NDS 2018 Table 3.3.3 (from memory): its rows are for single spans and cantilevers; a
    # span of a two-span 2x6 rail (lu 144 in, d 5.5 in, lu/d 26 > 14.3) takes the footnote's
    # general row, le = 1.84 lu, not the single span's 1.63 lu + 3d (Fb' was 3 % high)
    from shopbeam.design.analysis import analyze
    from shopbeam.jobs.jobfile import parse_job_text

    text = ('schema = 1\ntitle = "two-span rail"\ntags = ["not-lifting"]\n[beam]\n'
            'length = "{L}"\nsection = "2x6"\nmaterial = "DF-L-2"\nself_weight = false\n'
            'bearing = "3.5 in"\n[[supports]]\nat = "0 ft"\ntype = "pin"\n[[supports]]\n'
            'at = "12 ft"\ntype = "roller"\n{more}[[loads]]\ntype = "uniform"\n'
            'value = "-10 lbf/ft"\n')
    two = analyze(parse_job_text(text.format(
        L="24 ft", more='[[supports]]\nat = "24 ft"\ntype = "roller"\n')))
    bend = next(c for c in two.checks if c.name == "bending")
    assert "le = 1.84 lu" in bend.formula, bend.formula
    one = analyze(parse_job_text(text.format(L="12 ft", more="")))
    assert "single span, uniform load" in next(c for c in one.checks
                                               if c.name == "bending").formula
