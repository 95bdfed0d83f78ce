"""The job's safety factor on yield in bending ([criteria] safety_factor) on every bending
limit state, checked by hand: a factor above the code's Omega_b (and above 1.67) replaces it
on lateral-torsional and local buckling too, for aluminium (ADM 2015 F.2) and for tees and
angles (AISC 360-16 F9, F10) as for the other shapes; where the first-yield cap sets the
limit, the words name the code's own limit state and the JSON keeps the code's own Mn."""

from __future__ import annotations

import math

import pytest

from shopbeam.design.analysis import analyze
from shopbeam.design.capacity import capacity
from shopbeam.jobs.jobfile import parse_job_text

KSI = 6894757.293168361  # Pa
KIP_IN = 4448.2216152605 * 0.0254  # N*m
LBF_FT = 4.4482216152605 / 0.3048  # N/m

HEAD = 'schema = 1\ntitle = "t"\nunits = "us"\ntags = ["not-lifting", "not-rack", "not-floor"]\n'


def _bending(result):
    return next(c for c in result.checks if c.name == "bending")


# --- aluminium I-beam cantilever, tip braced: ADM 2015 F.2 elastic LTB -----------------------

AL_CANT = HEAD + """[beam]
length = "10 ft"
material = "6061-T6"
self_weight = false
welded = false
braces = ["10 ft"]
braces_flange = "both"
[beam.section]
shape = "i-beam"
depth = "6 in"
flange_width = "4 in"
flange_thickness = "0.35 in"
web_thickness = "0.23 in"
[[supports]]
at = "0 ft"
type = "fixed"
[[loads]]
type = "uniform"
start = "0 ft"
end = "10 ft"
value = "-50 lbf/ft"
[criteria]
deflection = "L/240"
{sf}
"""


def _al_hand() -> tuple[float, float]:
    """(Mnmb, Fy S) in kip-in of the I-beam above by hand: no fillets; E 10,100 ksi and
    Fty 35 ksi for 6061-T6 (Aluminum Design Manual 2015, from memory); lambda = Lb / ry
    over Cc (65.7 for Fcy 35 ksi, Table B.4.2 constants, from memory), so Mnmb =
    pi^2 E S / lambda^2 (ADM 2015 F.2, from memory)."""
    d, bf, tf, tw = 6.0, 4.0, 0.35, 0.23
    ix = (bf * d**3 - (bf - tw) * (d - 2 * tf) ** 3) / 12
    iy = 2 * tf * bf**3 / 12 + (d - 2 * tf) * tw**3 / 12
    area = 2 * bf * tf + (d - 2 * tf) * tw
    s = ix / (d / 2)
    lam = 120 / math.sqrt(iy / area)
    assert lam > 65.7  # elastic range
    return math.pi**2 * 10100 * s / lam**2, 35 * s


@pytest.mark.parametrize("sf", [None, 1.8, 2.0, 2.5])
def test_aluminium_lateral_torsional_buckling_takes_the_jobs_factor_above_its_omega(sf):
    mnmb, fy_s = _al_hand()
    job = parse_job_text(AL_CANT.format(sf="" if sf is None else f"safety_factor = {sf}"))
    om = 1.65 if sf is None else max(1.65, sf)  # ADM Omega 1.65 for LTB, or the job's
    want = min(mnmb / om, fy_s / (sf or 1.67))
    bend = _bending(analyze(job))
    assert bend.unit == "N*m"
    assert bend.limit / KIP_IN == pytest.approx(want, rel=2e-3)
    assert bend.params["Omega"] == pytest.approx(om, rel=1e-9)
    assert bend.params["Mn"] / KIP_IN == pytest.approx(mnmb, rel=2e-3)
    assert bend.limit == pytest.approx(
        bend.params["Mn"] / bend.params["Omega"], rel=1e-9)  # the JSON agrees with itself
    # the capacity: a cantilever's root moment w L^2 / 2 at the allowable
    cap = capacity(job)
    w = 2 * want * KIP_IN / 3.048**2 / LBF_FT  # lbf/ft
    assert cap.factor * 50 == pytest.approx(w, rel=2e-3)
    assert _bending(cap).limit == pytest.approx(
        bend.limit, rel=1e-9)  # solve and capacity on the same limit


def test_aluminium_top_flange_rule_of_an_unbraced_cantilever_takes_the_jobs_factor():
    # the same arm with no tip brace, its load on the top flange: the rule for that (the
    # arm's LTB over a longer length) is far below first yield, so at the factor 2.5 the
    # rating is the default's (Omega 1.65) x 1.65 / 2.5
    text = AL_CANT.replace('braces = ["10 ft"]\nbraces_flange = "both"\n', "")
    at_default = capacity(parse_job_text(text.format(sf="")))
    at_25 = capacity(parse_job_text(text.format(sf="safety_factor = 2.5")))
    yield_w = 2 * (35 * 8.41 / 1.67 / 12) / 10**2 * 1000  # lbf/ft at Fy S / 1.67, by hand
    assert at_default.factor * 50 < 0.3 * yield_w  # far below first yield
    assert at_25.factor / at_default.factor == pytest.approx(1.65 / 2.5, rel=1e-6)


# --- WT6X13 cantilever, stem in compression: AISC 360-16 F9.4 ---------------------------------

WT_CANT = HEAD + """[beam]
length = "5 ft"
section = "WT6X13"
material = "A992"
self_weight = false
[[supports]]
at = "0 ft"
type = "fixed"
[[loads]]
type = "uniform"
start = "0 ft"
end = "5 ft"
value = "-100 lbf/ft"
[criteria]
deflection = "L/240"
safety_factor = {sf}
"""


@pytest.mark.parametrize("sf", [1.67, 2.0, 2.5])
def test_a_tee_stem_in_compression_takes_the_jobs_factor_on_its_buckling(sf):
    # AISC Shapes Database v15.0, WT6X13: d 6.11, tw 0.230, y 1.25 in, Ix 11.7 in^4; the stem
    # tip's S = Ix / (d - y). Stem local buckling, 0.84 < (d/tw) / sqrt(E/Fy) <= 1.52:
    # Fcr = (1.43 - 0.515 (d/tw) sqrt(Fy/E)) Fy (AISC 360-16 F9.4, from memory)
    d, tw, y, ix, fy, e = 6.11, 0.23, 1.25, 11.7, 50.0, 29000.0
    s = ix / (d - y)
    assert 0.84 < d / tw / math.sqrt(e / fy) <= 1.52
    mn = (1.43 - 0.515 * d / tw * math.sqrt(fy / e)) * fy * s
    want = min(mn / max(sf, 1.67), fy * s / sf)
    job = parse_job_text(WT_CANT.format(sf=sf))
    bend = _bending(analyze(job))
    assert bend.limit / KIP_IN == pytest.approx(want, rel=5e-3)
    assert bend.params["Mn_stem_compression"] / KIP_IN == pytest.approx(mn, rel=5e-3)
    cap = capacity(job)
    assert cap.factor * 100 == pytest.approx(2 * want * KIP_IN / (5 * 0.3048) ** 2 / LBF_FT,
                                             rel=5e-3)


def test_a_restrained_angle_keeps_the_codes_mn_beside_the_first_yield_cap():
    # L4X4X1/4 in A36 bent about its geometric axis, 5 ft simple span: the cap Fy S / 1.67
    # sets it (docs/json.md: params.Mn is the code's own, M_yield_cap the capped allowable)
    job = parse_job_text(HEAD + """[beam]
length = "5 ft"
section = "L4X4X1/4"
material = "A36"
self_weight = false
restrained = true
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "5 ft"
type = "roller"
[[loads]]
type = "uniform"
start = "0 ft"
end = "5 ft"
value = "-100 lbf/ft"
""")
    bend = _bending(analyze(job))
    assert bend.params["M_yield_cap"] == pytest.approx(bend.limit, rel=1e-9)
    assert bend.params["Mn"] / 1.67 > bend.params["M_yield_cap"] * (1 + 1e-6)


# --- S6X12.5, 10 ft unbraced: the code's own Mn is F2-2, the cap sets the limit ---------------

S_SPAN = HEAD + """[beam]
length = "10 ft"
section = "S6X12.5"
material = "A36"
self_weight = false
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "10 ft"
type = "roller"
[[loads]]
type = "point"
at = "5 ft"
value = "-1000 lbf"
flange = "bottom"
lug = true
"""


def test_the_words_name_the_codes_own_limit_state_where_the_cap_sets_the_limit():
    bend = _bending(analyze(parse_job_text(S_SPAN)))
    # AISC Shapes Database v15.0, S6X12.5: Zx 8.47 in^3; Mp = 36 x 8.47 = 304.9 kip-in
    mp = 36 * 8.47
    assert "M_yield_cap" in bend.params
    assert bend.params["Mn"] / KIP_IN < mp  # inelastic LTB: below Mp
    assert "F2-2" in bend.formula and "F2-1" not in bend.formula
    assert "F2.2" in bend.clause
