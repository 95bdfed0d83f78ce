"""Sizing: the batched sweep agrees with checking each section on its own, is sorted, is
fast, and ranks a shop stock list by weight and by price."""

from __future__ import annotations

import json
import subprocess
import sys
import time
from dataclasses import replace

import pytest

from shopbeam.members import catalog
from shopbeam.design.capacity import capacity
from shopbeam.jobs.jobfile import parse_job_text
from shopbeam.design.loading import evaluate
from shopbeam.design.sizing import size

from jobtext import point_load, simple_span, uniform_load

RACK = """schema = 1
title = "Rack beam pair"
[beam]
length = "96 in"
section = "HSS4x2x3/16"
material = "A500-C"
members = 2
[[supports]]
at = "0 in"
type = "pin"
[[supports]]
at = "96 in"
type = "roller"
[[loads]]
type = "uniform"
start = "4 in"
end = "44 in"
value = "-600 lbf/ft"
[[loads]]
type = "uniform"
start = "52 in"
end = "92 in"
value = "-600 lbf/ft"
[[loads]]
type = "uniform"
start = "0 in"
end = "96 in"
value = "-6 lbf/ft"
case = "dead"
[criteria]
deflection = "rack"
"""

PLATFORM = """schema = 1
title = "Platform beam with overhang"
[beam]
length = "15 ft"
section = "W8x18"
material = "A992"
braces = ["6 ft"]
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "12 ft"
type = "roller"
[[loads]]
type = "uniform"
start = "0 ft"
end = "15 ft"
value = "-90 lbf/ft"
case = "dead"
[[loads]]
type = "uniform"
start = "0 ft"
end = "15 ft"
value = "-300 lbf/ft"
patterned = true
[[loads]]
type = "point"
at = "15 ft"
value = "-800 lbf"
[criteria]
deflection = "L/360"
"""


# a point load on the top flange, braced at the load only: web sidesway buckling (AISC
# 360-16 J10.4) in the sweep, its Cr stepping down where 1.5 Ma reaches My (the dead load
# puts that step inside the range of the factors found)
SIDESWAY = """schema = 1
title = "Point load braced at the load"
tags = ["not-lifting"]
[beam]
length = "12 ft"
section = "W12x14"
material = "A992"
braces = ["6 ft"]
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "12 ft"
type = "roller"
[[loads]]
type = "point"
at = "6 ft"
value = "-1000 lbf"
[[loads]]
type = "uniform"
value = "-0.6 kip/ft"
case = "dead"
"""


@pytest.mark.parametrize("text, kind", [(RACK, "HSS"), (PLATFORM, "W"), (SIDESWAY, "W")],
                         ids=["rack-hss", "platform-w", "sidesway-w"])
def test_sweep_agrees_with_checking_each_section(text, kind):
    from shopbeam.design.analysis import span_top_checks
    from shopbeam.design.checks import strengths

    # the batched sweep against the one-section path (evaluate + capacity), section by section
    job = parse_job_text(text)
    res = size(job, kind)
    assert len(res.rows) == len(catalog.list_sections(kind))
    picks = list(res.rows[:: max(1, len(res.rows) // 12)]) + res.passing[:2]
    for r in picks:
        j = replace(job, section=r.section)
        # with the strength loads on the top flange of an unbraced span leave it, as a solve
        # checks it (analysis.span_top_checks)
        every = list(evaluate(j).checks) + span_top_checks(j, strengths(j), None)
        direct = max(c.ratio for c in every)
        if r.checked == "screen":
            # (the platform's overhang is an unbraced cantilever loaded on its top flange:
            # its rows are screened by the batch and checked in full lightest first)
            assert r.ratio <= direct * (1 + 1e-9)
            continue
        assert r.ratio == pytest.approx(direct, rel=1e-9)
        assert r.governing == max(every, key=lambda c: c.ratio).name
        assert r.factor == pytest.approx(capacity(j).factor, rel=1e-9)
    if text is SIDESWAY:
        step = [r for r in picks if capacity(replace(job, section=r.section)).note]
        assert step  # some factors stop where Cr steps down, and agree there too


def test_rows_are_lightest_first_and_passing_means_ratio_at_most_one():
    res = size(parse_job_text(RACK), "HSS")
    w = [r.weight for r in res.rows]
    assert w == sorted(w)
    assert all(r.ratio <= 1 for r in res.passing)
    assert res.lightest is res.passing[0]
    # a lighter section than the lightest passing one fails
    assert all(not r.ok for r in res.rows if r.weight < res.lightest.weight)


def test_self_weight_is_recomputed_per_section():
    job = parse_job_text(RACK)
    res = size(job, "HSS")
    heavy = max(res.rows, key=lambda r: r.weight)
    j = replace(job, section=heavy.section)
    assert j.self_weight_load().w1 != job.self_weight_load().w1
    assert heavy.ratio == pytest.approx(max(c.ratio for c in evaluate(j).checks), rel=1e-9)


def test_whole_hss_catalog_sweep_rates_every_section():
    # the sweep's speed is a bench/ figure; here: it covers the whole kind in one pass and its
    # lightest passing section really passes when checked on its own
    job = parse_job_text(RACK)
    res = size(job, "HSS")
    n = len(catalog.list_sections("HSS"))
    assert n > 500
    assert len(res.rows) + len(res.skipped) == n
    light = res.lightest
    assert light is not None and light.ok
    assert all(r.weight >= light.weight for r in res.passing)


def test_max_depth_filters():
    res = size(parse_job_text(RACK), "HSS", max_depth=3 * 0.0254)
    assert res.rows and all(r.section.depth <= 3 * 0.0254 + 1e-12 for r in res.rows)


STOCK = """section,price_per_ft,material,note
HSS3x2x3/16,9.10,A500-C,rack 3
HSS4x2x1/8,8.20,A500-C,
HSS3x3x1/4,12.50,A500-C,
HSS2x2x1/8,4.10,A500-C,
HSS4x4x1/8,7.95,A500-C,offcut price
"""


def test_stock_list_ranks_by_weight_and_by_price(tmp_path):
    from shopbeam.members.stock import load_stock

    p = tmp_path / "stock.csv"
    p.write_text(STOCK)
    res = size(parse_job_text(RACK), stock=load_stock(p))
    assert len(res.rows) == 5
    passing = {r.designation for r in res.passing}
    assert "HSS2x2x1/8" not in passing
    assert res.lightest.designation == min(res.passing, key=lambda r: r.weight).designation
    assert res.cheapest.designation == min(res.passing, key=lambda r: r.price_per_m).designation
    assert res.cheapest.designation == "HSS4x4x1/8"


def _run(*args):
    return subprocess.run([sys.executable, "-m", "shopbeam", *args], capture_output=True,
                          text=True, timeout=120)


def test_cli_size(tmp_path):
    job = tmp_path / "rack.toml"
    job.write_text(RACK)
    stock = tmp_path / "stock.csv"
    stock.write_text(STOCK)
    r = _run("size", str(job), "--top", "3")
    assert r.returncode == 0, r.stderr
    assert "lightest that passes" in r.stdout and "SCREENING" in r.stdout
    r = _run("size", str(job), "--stock", str(stock), "--json")
    assert r.returncode == 0, r.stderr
    data = json.loads(r.stdout)
    assert data["cheapest"] == "HSS4x4x1/8" and data["swept"] == 5
    assert _run("size", str(job), "--kind", "NOPE").returncode == 2
    assert _run("size", str(job), "--max-depth", "3").returncode == 2
    assert _run("size", str(job), "--stock", str(tmp_path / "none.csv")).returncode == 2


def test_confirm_lists_that_many_fully_checked_sections_lightest_first():
    from pathlib import Path

    job = str(Path(__file__).resolve().parent.parent / "presets" / "monorail-trolley.toml")
    one = json.loads(_run("size", job, "--kind", "W", "--json").stdout)["passing"]
    three = json.loads(_run("size", job, "--kind", "W", "--confirm", "3", "--json").stdout)[
        "passing"]
    assert len(one) == 1 and len(three) == 3
    assert three[0]["designation"] == one[0]["designation"]
    assert all(r["checked"] == "full" for r in three)
    weights = [r["mass_per_length"] for r in three]
    assert weights == sorted(weights)
    bad = _run("size", job, "--kind", "W", "--confirm", "0")
    assert bad.returncode == 2 and "--confirm" in bad.stderr and "Traceback" not in bad.stderr


# a short, heavily loaded stub: round tubes are not rated on their walls at the supports
# (AISC 360-16 K2 not checked there), so the lightest passing sections are not rated while
# rectangular tubes are
STAINLESS_RAIL = simple_span('section = "HSS2x2x1/8"\nmaterial = "A500-C"', 1.5,
                             uniform_load(1.5, "-8000 lbf/ft"), "stub rail under the press")


def test_listed_rows_say_not_rated_as_their_own_full_capacity_does():
    # some listed sections are not rated (round walls at the supports), others are. Every
    # listed row must say NOT RATED exactly when
    # the section's own capacity withholds the rating, checked in full or not
    from shopbeam.design.sizing import shown_rows

    job = parse_job_text(STAINLESS_RAIL)
    res = size(job, "HSS")
    rows = shown_rows(res, 15)
    assert any(r.not_rated for r in rows) and any(not r.not_rated for r in rows)
    for r in rows:
        full = capacity(replace(job, section=r.section, material=r.material))
        assert bool(r.not_rated) == bool(full.not_rated), r.designation
    # the lightest passing section is not rated here, so the sweep went on to a rated one
    assert res.lightest.not_rated
    rated = res.lightest_rated
    assert rated is not None and rated.checked == "full" and not rated.not_rated
    assert rated.weight >= res.lightest.weight
    assert all(r.not_rated for r in res.passing if r.weight < rated.weight
               and r.checked == "full")


def test_size_cli_names_the_lightest_rated_section_and_json_marks_each_row(tmp_path):
    p = tmp_path / "rail.toml"
    p.write_text(STAINLESS_RAIL)
    out = subprocess.run([sys.executable, "-m", "shopbeam", "size", str(p), "--kind", "HSS"],
                         capture_output=True, text=True)
    assert out.returncode == 0
    res = size(parse_job_text(STAINLESS_RAIL), "HSS")
    assert f"lightest that passes and is rated: {res.lightest_rated.designation}" in out.stdout
    js = json.loads(subprocess.run([sys.executable, "-m", "shopbeam", "size", str(p), "--kind",
                                    "HSS", "--json"], capture_output=True, text=True).stdout)
    assert js["lightest_rated"] == res.lightest_rated.designation
    assert all(r["rated"] == (not r["not_rated"]) for r in js["passing"])
    assert any(not r["rated"] for r in js["passing"])


def test_a_job_level_reason_holds_back_every_listed_row_wood_too():
    # a load that points up with no uplift = true (a forgotten minus sign) withholds every
    # rating; the sweep's rows say so, the wood sweep (section by section) as well
    steel = RACK.replace('value = "-', 'value = "', 1)
    res = size(parse_job_text(steel), "HSS")
    from shopbeam.design.sizing import shown_rows

    assert all(any("push UP" in w for w in r.not_rated) for r in shown_rows(res, 5))
    wood = simple_span('section = "2x8"\nmaterial = "SPF-2"', 4, point_load(2, "150 lbf"),
                       "shelf plank")
    res = size(parse_job_text(wood), "lumber")
    assert res.passing and all(any("push UP" in w for w in r.not_rated) for r in res.passing)


def test_text_ui_size_list_marks_rows_that_are_not_rated():
    from shopbeam.tui.slow import size_rows

    job = parse_job_text(STAINLESS_RAIL)
    rows, note = size_rows(job, "HSS", 15)
    marked = {d for d, text in rows if text.endswith("NOT RATED")}
    assert all("capacity x" not in text for d, text in rows if d in marked)  # none to post
    res = size(job, "HSS")
    from shopbeam.design.sizing import shown_rows

    assert marked == {r.designation for r in shown_rows(res, 15) if r.not_rated} != set()
    assert all(len(text) <= 78 for _, text in rows)  # fits the 80-column list


def test_a_kind_not_made_in_the_jobs_grade_is_swept_in_its_own():
    # AISC Manual 15th ed. Table 2-4 (common practice, from memory): flat bar is bought in A36,
    # not the A500-C of tube; swept in A500-C a 10 x 1/8 in bar passed at 50 ksi that fails at
    # 36 ksi (F11-1: Z = t d^2 / 4 = 3.125 in^3, Mn / 1.67 = 5.61 kip*ft against 6.25)
    from shopbeam.design.analysis import analyze
    text = simple_span('section = "HSS6x6x3/16"\nmaterial = "A500-C"\nbraced = true\n'
                       'self_weight = false', 10, uniform_load(10, "-500 lbf/ft"))
    job = parse_job_text(text)
    res = size(job, "flat-bar")
    assert res.lightest.material.key == "A36" and "swept in A36" in res.material_note
    full = analyze(replace(job, section=res.lightest.section, material=res.lightest.material))
    assert max(c.ratio for c in full.checks) <= 1.0
    bar = catalog.lookup("FB10x1/8")
    in_a36 = analyze(replace(job, section=bar, material=res.lightest.material))
    assert max(c.ratio for c in in_a36.checks) > 1.0
    assert res.lightest.designation != bar.designation
    # a tube kind keeps the job's tube grade
    assert size(job, "HSS-rect").material_note == ""


def test_a_stock_line_with_no_grade_is_swept_in_the_grade_it_is_bought_in():
    # AISC Manual Table 2-4 (common practice, from memory): a flat bar on a tube job's stock
    # list is A36 stock, not the job's A500-C
    from shopbeam.members.stock import parse_stock
    text = simple_span('section = "HSS6x6x3/16"\nmaterial = "A500-C"\nbraced = true\n'
                       'self_weight = false', 10, uniform_load(10, "-500 lbf/ft"))
    stock = parse_stock("section,price_per_ft\nHSS6x6x3/16,12.0\nFB10x1/8,3.0\n", "csv")
    res = size(parse_job_text(text), stock=stock)
    mats = {r.designation.upper(): r.material.key for r in res.rows}
    assert mats["FB10X1/8"] == "A36" and mats["HSS6X6X3/16"] == "A500-C"
    assert not any(r.designation.upper() == "FB10X1/8" for r in res.passing)


@pytest.mark.parametrize("job_grade, kind, swept", [
    ("A500-C", "mech-tube", "A513"),       # gauge tube is bought as A513 (30 ksi)
    ("A500-C", "mech-round", "A513"),
    ("A513-DOM", "HSS-round", "A500-C"),   # DOM's 60 ksi is not what HSS is bought in
    ("A513", "HSS-rect", None),            # 30 ksi on HSS: less than A500-C, kept (safe side)
    ("A500-C", "HSS-rect", None),
    ("A53-B", "PIPE", None),
    ("A500-B", "PIPE", "A53-B"),
])
def test_a_tube_sweep_uses_the_grade_its_product_is_bought_in_where_the_job_s_credits_more(
        job_grade, kind, swept):
    # product grades: AISC Manual 15th ed. Table 2-4 (from memory): HSS A500 Gr C, pipe
    # A53 Gr B; mechanical tube ASTM A513
    from shopbeam.design.sizing import usual_grade
    from shopbeam.members.materials import resolve_material
    got = usual_grade(resolve_material(job_grade), kind)
    assert (got.key if got is not None else None) == swept


def test_size_rows_show_and_rank_by_the_tabulated_weight():
    # AISC Shapes Database v15.0: W12X14 is tabulated at 14 lb/ft (area x 490 lb/ft^3 gives
    # 14.16); HSS weights are of the nominal wall, above the design-wall area's
    from pathlib import Path
    from shopbeam.design.sizing import size
    from shopbeam.jobs.jobfile import load_job
    job = load_job(Path(__file__).resolve().parents[1] / "presets" / "storage-platform-beam.toml")
    res = size(job, "W")
    got = {r.designation: r.weight for r in res.rows}
    LBFT = 0.45359237 / 0.3048
    assert got["W12X14"] == pytest.approx(14 * LBFT, rel=1e-9)
    ws = [r.weight for r in res.rows]
    assert ws == sorted(ws)


def test_a_gauge_tube_sweep_in_aluminium_takes_the_wall_the_job_s_own_section_takes():
    # extruded aluminium tube: nominal wall (materials: hss_wall_factor 1.0); the sweep's
    # ratio of a section equals the job's own solve with that section
    from shopbeam.design.analysis import analyze
    from shopbeam.design.sizing import size
    from shopbeam.jobs.jobfile import parse_job_text
    text = ('schema = 1\ntitle = "rail"\ntags = ["not-rack"]\n[beam]\nlength = "6 ft"\n'
            'section = "rect-tube 3 x 1-1/2 x 14ga"\nmaterial = "6061-T6"\nrestrained = true\n'
            '[[supports]]\nat = "0 ft"\ntype = "pin"\n[[supports]]\nat = "6 ft"\n'
            'type = "roller"\n[[loads]]\ntype = "uniform"\nvalue = "-60 lbf/ft"\n')
    job = parse_job_text(text)
    own = analyze(job).governing.ratio
    row = next(r for r in size(job, "mech-tube").rows
               if r.designation == "rect-tube 3 x 1-1/2 x 14ga")
    assert row.ratio == pytest.approx(own, rel=1e-9)


def test_a_fatigue_job_s_listed_rows_carry_fatigue_as_capacity_does():
    # the live stress range is proportional to k (AISC 360-16 Appendix 3): a listed row's k
    # is lowered to where it reaches F_SR, the figure capacity gives that section
    from dataclasses import replace as _replace
    from pathlib import Path
    from shopbeam.design.capacity import capacity
    from shopbeam.design.sizing import shown_rows, size
    from shopbeam.jobs.jobfile import parse_job_text
    text = (Path(__file__).resolve().parents[1] / "presets" / "trailer-cross-member.toml") \
        .read_text().replace("[criteria]", '[criteria]\nfatigue_category = "E"\n'
                                           'cycles = 2000000', 1)
    job = parse_job_text(text)
    rows = shown_rows(size(job, "C"), top=4)
    r = rows[1]
    cap = capacity(_replace(job, section=r.section, material=r.material))
    assert r.factor == pytest.approx(cap.factor, rel=1e-6)
    assert r.governing == "fatigue" and not r.not_rated


def test_size_of_a_job_with_no_live_loads_says_there_is_nothing_to_rate():
    from pathlib import Path
    from shopbeam.design.sizing import size
    from shopbeam.jobs.jobfile import load_job
    from shopbeam.output.sizingreport import render
    root = Path(__file__).resolve().parents[1] / "presets"
    dead = " ".join(render(size(load_job(root / "sign-bracket.toml"), "HSS-round")).split())
    assert "the job has no live loads" in dead
    live = " ".join(render(size(load_job(root / "demo.toml"), "W")).split())
    assert "the job has no live loads" not in live


def test_text_ui_size_note_says_heavier_sections_were_screened_only():
    # "1 of 283 W sections pass" read as if the heavier ones failed: they pass the quick
    # screen and were not checked in full (the lightest that passes ends the full checks)
    from pathlib import Path

    from shopbeam.tui.slow import size_rows

    job = parse_job_text((Path(__file__).resolve().parents[1] / "presets" / "jib-arm.toml")
                         .read_text())
    res = size(job, "W")
    rows, note = size_rows(job, "W", 40)
    assert res.screened_only  # the jib's heavier W shapes: screened only
    assert f"{len(res.screened_only)} heavier ones pass the quick screen" in note


MONORAIL = """schema = 1
title = "Monorail hoist beam, 18 ft, 1 ton electric hoist"
tags = ["lifting", "monorail"]
[beam]
length = "18 ft"
section = "W8x18"
material = "A992"
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "18 ft"
type = "roller"
[[loads]]
type = "point"
at = "9 ft"
value = "-2000 lbf"
label = "rated load"
flange = "bottom"
wheels = 4
[[loads]]
type = "point"
at = "9 ft"
value = "-250 lbf"
label = "hoist and trolley"
case = "dead"
flange = "bottom"
wheels = 4
[criteria]
lifting = "powered-monorail"
"""


def test_a_section_whose_rating_is_under_the_loads_entered_does_not_pass():
    # the hoist passes at the place entered (ratio under 1), but capacity rates it travelling
    # the member, with Cb 1.0 there: W8x18's factor is under 1, so a sweep that called it
    # the lightest that passes recommended a beam rated under the hoist it was sized for
    from shopbeam.design.analysis import analyze

    job = parse_job_text(MONORAIL)
    assert max(c.ratio for c in analyze(job).checks) <= 1
    assert capacity(job).factor < 1
    res = size(job, "W")
    assert res.lightest is not None and res.lightest.designation != "W8X18"
    assert all(r.factor >= 1 for r in res.passing)
    assert capacity(replace(job, section=res.lightest.section)).factor >= 1
    # and the report says why its figure and the rating's differ
    said = [c for c in analyze(job).cautions if "checked here at the place entered" in c]
    assert said and "Cb = 1.0" in said[0]


TOP_LOADED_ARM = """schema = 1
title = "Arm for a sign, W6x15, 6 ft"
tags = ["bracket", "not-lifting"]
[beam]
length = "6 ft"
section = "W6x15"
material = "A992"
[[supports]]
at = "0 ft"
type = "fixed"
[[loads]]
type = "point"
at = "6 ft"
value = "-2000 lbf"
label = "load on top"
"""


def test_a_top_loaded_arm_is_sized_on_the_strength_its_top_flange_loads_leave_it():
    # the batch checks bending at the shear centre; a W8X15 passes that, but its strength at
    # about 2.5 L (loads on the top flange) gives k under 1: it was listed as passing, with
    # the factor from before the top-flange rule lowered it
    job = parse_job_text(TOP_LOADED_ARM)
    res = size(job, "W")
    light = res.lightest
    assert light is not None and all(r.checked == "full" for r in res.passing)
    for r in res.passing:
        cap = capacity(replace(job, section=r.section))
        assert cap.factor >= 1 and cap.factor == pytest.approx(r.factor, rel=1e-12)
    w8 = capacity(replace(job, section=catalog.lookup("W8X15")))
    assert w8.factor < 1 and w8.governing.name == "bending, top-flange loads"
    assert light.designation != "W8X15" and light.weight <= catalog.lookup(
        "W8X15").weight_per_length(job.material.density) * 1.5


def test_a_section_of_the_same_weight_as_the_lightest_that_passes_is_listed_beside_it():
    # HSS4x3x1/8 and HSS5x2x1/8 both weigh 5.61 lb/ft (AISC Shapes Database v15.0): where
    # the first passes, the second is checked in full too and listed, not left out as heavier
    from pathlib import Path

    text = (Path(__file__).resolve().parents[1] / "presets" / "bar-stock-rack-arm.toml"
            ).read_text()
    job = parse_job_text(text.replace("safety_factor = 1.67", "safety_factor = 2.0"))
    res = size(job, "HSS-rect")
    best = res.lightest
    ties = [r for r in res.rows if r.ok and r.checked == "full"
            and abs(r.weight - best.weight) <= 1e-9 * best.weight]
    assert len(ties) >= 2, [r.designation for r in ties]
    for r in ties:  # each passes its own full check
        assert max(c.ratio for c in evaluate(replace(job, section=r.section), 1.0).checks) <= 1


@pytest.mark.parametrize("live", ["", '[[loads]]\ntype = "uniform"\nvalue = "-10 lbf/ft"\n'
                                      'label = "snow"\npatterned = true\n'])
def test_the_lumber_sweep_takes_the_bottom_edge_under_hogging_as_the_report_does(live):
    # a two-span joist braced on its top (braced = true): each row's ratio and governing
    # check are the report's own (bending, hogging and its dead load alone at CD 0.9 among
    # them), so the lightest section listed passes the report's checks
    from shopbeam.design import sizing
    from shopbeam.design.analysis import analyze
    text = ('schema = 1\ntitle = "roof joist"\ntags = ["roof", "not-lifting"]\n[beam]\n'
            'length = "24 ft"\nsection = "2x10"\nmaterial = "DF-L-2"\nbraced = true\n'
            'self_weight = false\n[[supports]]\nat = "0 ft"\ntype = "pin"\n[[supports]]\n'
            'at = "12 ft"\ntype = "roller"\n[[supports]]\nat = "24 ft"\ntype = "roller"\n'
            '[[loads]]\ntype = "uniform"\nvalue = "-58 lbf/ft"\nlabel = "roofing"\n'
            'case = "dead"\n' + live + '[criteria]\nduration = "two-months"\n')
    job = parse_job_text(text)
    res = sizing.size(job, "lumber")
    rows = sizing.shown_rows(res)
    assert rows
    for r in rows:
        checks = analyze(replace(job, section=r.section, material=r.material)).checks
        worst = max(checks, key=lambda c: c.ratio)
        assert r.ratio == pytest.approx(worst.ratio, rel=1e-9), r.designation
        assert r.governing == worst.name, r.designation
    assert any(r.governing.startswith("bending, hogging") for r in rows)
    assert res.lightest.designation != "2x10"  # fails its dead load alone at CD 0.9
