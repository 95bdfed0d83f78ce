"""Rating labels and plaques in shop words: the figures, rounding down, NOT RATED, cautions."""

from __future__ import annotations

import math
import re
from dataclasses import replace
from pathlib import Path

import pytest

from shopbeam.design.analysis import analyze
from shopbeam.design.capacity import capacity
from shopbeam.design.checks import Unchecked
from shopbeam.jobs.jobfile import load_job, parse_job_text
from shopbeam.output import label

PRESETS = Path(__file__).resolve().parents[1] / "presets"
LBF = 4.4482216152605


def rack():
    job = load_job(PRESETS / "pallet-rack-beam-pair.toml")
    return job, capacity(job)


def test_floor_sig_never_rounds_up_and_keeps_three_figures():
    for v in (9429.0, 9420.0, 408.26, 0.012345, 1.0, 999.999, 1e6 + 1, 123456.7, 2.5e-7):
        d = label.floor_sig(v)
        assert d <= v * (1 + 1e-9) and d > v * 0.99  # three figures lose under 1 %
    assert label.floor_sig(9429.0) == 9420.0 and label.floor_sig(9420.0) == 9420.0
    # a figure a few parts in 1e12 short of a round one (a posted 1250 lbf/ft x 4 ft come
    # back through the unit conversions) posts as the round one, not a step below
    assert label.floor_sig(4999.99999999) == 5000.0
    assert label.floor_sig(4999.99) == 4990.0  # a real shortfall still rounds down


def test_a_total_agrees_with_its_posted_intensity():
    # 1250 lbf/ft over 4 ft was posted with TOTAL 4990 lbf
    from shopbeam.jobs.jobfile import parse_job_text

    text = """schema = 1
title = "Bar-stock cantilever rack arm, 48 in, 1800 lb"
tags = ["rack", "cantilever"]
[beam]
length = "48 in"
section = "HSS8x2x1/8"
material = "A500-C"
[[supports]]
at = "0 in"
type = "fixed"
[[loads]]
type = "uniform"
start = "0 in"
end = "48 in"
total = "-1800 lbf"
label = "bar stock"
[criteria]
deflection = "L/180"
impact = "25%"
"""
    cap = capacity(parse_job_text(text))
    figs = {f.label: f.value for f in label.rating(cap).figures}
    w = float(figs["MAX UNIFORM LOAD"].split()[0])
    # the total of the posted line load, itself rounded down to three figures
    assert figs["TOTAL"] == f"{label.floor_sig(w * 4):g} lbf"
    assert float(figs["TOTAL"].split()[0]) <= w * 4


def test_pallet_rack_gives_per_level_per_beam_and_rounds_down_saying_so():
    job, cap = rack()
    r = label.rating(cap)
    k = cap.factor
    # the level carries two pallets of 600 lbf/ft x 40 in = 2000 lbf each (the job's text)
    level = 2 * 600 * 40 / 12 * k
    tot = [f for f in r.figures if f.label == "TOTAL" and f.group.startswith("PER LEVEL")]
    assert len(tot) == 1 and tot[0].group == "PER LEVEL (pair of beams)"
    # the total comes from the posted (rounded down) pallet figures, so it never exceeds what
    # they add up to (common practice: a posted load is never rounded up)
    parts = sum(f.si for f in r.figures if f.label.startswith("max ")) / LBF
    assert tot[0].value == f"{int(label.floor_sig(parts))} lbf" and parts <= level
    assert f"rounded down from {math.floor(level)}" in tot[0].note
    beam = [f for f in r.figures if f.group == "PER BEAM"]
    assert beam and beam[0].si * 2 <= level * LBF * (1 + 1e-12)
    pallets = [f for f in r.figures if f.label.startswith("max pallet")]
    assert len(pallets) == 2
    text = label.label_text(r)
    assert "PER BAY" in text and "upright frames" in text
    assert "x the entered live loads" not in text


def test_label_fits_40_columns_for_every_preset():
    for path in sorted(PRESETS.glob("*.toml")):
        job = load_job(path)
        text = label.label_text(label.rating(capacity(job), analyze(job).unchecked))
        assert max(len(x) for x in text.splitlines()) <= 40, path.name
        assert "SCREENING CHECK ONLY" in text.replace("|", " ").replace("\n", " ") \
            or "SCREENING CHECK" in text, path.name


def test_not_rated_prints_no_number_and_says_why():
    job, cap = rack()
    cap = replace(cap, not_rated=("lateral-torsional buckling could govern: give the brace "
                                  "spacing",))
    r = label.rating(cap)
    assert r.status == "not rated" and r.figures == ()
    text = label.label_text(r)
    flat = " ".join(x.strip("| ") for x in text.splitlines())
    assert "NOT RATED" in flat and "brace spacing" in flat
    assert "lbf" not in flat.split("Member")[1].split("NOT RATED")[1].split("Basis")[0]
    html = label.plaque_html(r)
    assert "NOT RATED" in html and "brace spacing" in html and "MAX" not in html


def test_an_unchecked_limit_state_that_blocks_rating_means_not_rated():
    job, cap = rack()
    u = Unchecked("web crippling", "no bearing length given", "AISC 360-16 J10.3")
    r = label.rating(cap, [u])
    assert r.status == "not rated"
    assert any("web crippling" in x for x in r.not_rated)
    text = label.label_text(r)
    assert "NOT CHECKED" in text and "J10.3" in text
    soft = replace(u, blocks_rating=False)
    r2 = label.rating(cap, [soft])
    assert r2.status == "rated" and "web crippling" in label.label_text(r2)


def test_single_point_load_gives_max_point_load():
    job = load_job(PRESETS / "jib-arm.toml")
    r = label.rating(capacity(job))
    # the jib's hoist travels: rated anywhere from the mast out to its end stop at 9.5 ft
    assert r.figures[0].label == "MAX POINT LOAD" and "anywhere along its travel" in \
        r.figures[0].note
    text = label.label_text(r)
    assert "Rated with the hoist anywhere along" in " ".join(text.replace("|", " ").split())
    assert "LIFTING DEVICE" in text and "NOT FOR LIFTING" not in text
    assert "impact allowance" in text


def test_moving_load_gives_per_wheel_and_set():
    job = load_job(PRESETS / "monorail-trolley.toml")
    r = label.rating(capacity(job))
    labels = [f.label for f in r.figures]
    assert any(x.startswith("MAX PER WHEEL") for x in labels)
    assert any(x.startswith("MAX MOVING LOAD") for x in labels)


def test_no_live_load_and_failing_dead_load_are_not_rated_numbers():
    job = load_job(PRESETS / "sign-bracket.toml")
    r = label.rating(capacity(job))
    assert r.status == "nothing to rate" and r.figures == ()
    text = """schema = 1
title = "Overloaded"
[beam]
length = "10 ft"
section = "HSS2x2x1/8"
material = "A500-C"
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "10 ft"
type = "roller"
[[loads]]
type = "uniform"
start = "0 ft"
end = "10 ft"
value = "-5000 lbf/ft"
case = "dead"
[[loads]]
type = "point"
at = "5 ft"
value = "-10 lbf"
"""
    r = label.rating(capacity(parse_job_text(text)))
    assert r.status == "do not load" and "DO NOT LOAD" in label.label_text(r)
    # capacity --json: rated false always comes with a reason a script can print
    from shopbeam.design.capacity import to_json
    for res in (capacity(job), capacity(parse_job_text(text))):
        d = to_json(res)
        assert d["rated"] is False
        assert d["not_rated_reasons"] and d["not_rated_reasons"] == d["capacity"]["not_rated"]
        assert d["not_rated_reasons"][0] == res.note


def test_uniform_label_value_matches_the_capacity_rounded_down():
    job = load_job(PRESETS / "storage-platform-beam.toml")
    cap = capacity(job)
    r = label.rating(cap)
    f = r.figures[0]
    assert f.label == "MAX UNIFORM LOAD"
    live = [ld for ld in job.loads if ld.case == "live"][0]
    exact = abs(live.w1) * cap.factor / (LBF / 0.3048)
    shown = float(re.match(r"[\d.]+", f.value).group(0))
    assert shown <= exact and shown > exact * 0.99


def test_shelf_speaks_per_shelf_and_per_member_without_a_bay():
    # the preset's angle rails are NOT RATED until AISC 360 F10 is checked: the same shelf on
    # channel rails (F2) is rated
    text = (PRESETS / "wall-shelf-brackets.toml").read_text().replace("L2x2x3/16", "C3x4.1")
    r = label.rating(capacity(parse_job_text(text)))
    groups = [f.group for f in r.figures]
    assert "PER SHELF (2 members)" in groups and "PER MEMBER" in groups
    assert "PER BAY" not in label.label_text(r)


# ------------------------------------------------------------------ per bay (issue 16)
def _rack_text(extra: str) -> str:
    text = (PRESETS / "pallet-rack-beam-pair.toml").read_text(encoding="utf-8")
    return text.replace("\nmembers = 2 ", f"\nmembers = 2\n{extra}\n", 1)


def test_rack_with_levels_posts_a_per_bay_total_rounded_down():
    job = parse_job_text(_rack_text("levels = 4"))
    assert job.levels == 4
    cap = capacity(job)
    r = label.rating(cap)
    # the level carries two pallets of 600 lbf/ft x 40 in = 2000 lbf each (the job's text);
    # the bay is four such levels: the posted level total times four, rounded down again
    level = label.floor_sig(2 * 600 * 40 / 12 * cap.factor)
    bay = [f for f in r.figures if f.group == "PER BAY (4 levels)"]
    assert len(bay) == 1 and bay[0].label == "TOTAL"
    assert bay[0].value == f"{int(label.floor_sig(level * 4))} lbf"
    assert bay[0].si <= 4 * level * LBF * (1 + 1e-12)  # never above the levels' figures
    assert "upright frames" in bay[0].note and f"{int(level)} lbf each" in bay[0].note
    text = label.label_text(r)
    assert "PER BAY (4 levels):" in text and "give [beam] levels" not in text
    assert "PER BAY (4 levels)" in label.plaque_html(r)


def test_rack_without_levels_says_how_to_get_the_per_bay_total():
    job, cap = rack()
    assert job.levels is None
    text = label.label_text(label.rating(cap))
    assert "PER BAY" in text and "levels = N" in re.sub(r"[|\s]+", " ", text)


@pytest.mark.parametrize("bad", ["0", "51", "2.5", "\"4\"", "true"])
def test_levels_must_be_a_whole_number(bad):
    from shopbeam.errors import InputErrors

    with pytest.raises(InputErrors) as e:
        parse_job_text(_rack_text(f"levels = {bad}"))
    assert any(p.key == "beam.levels" for p in e.value.problems)


def test_a_rack_label_with_no_impact_is_not_rated_and_says_what_to_give():
    # ANSI MH16.1 (from memory): a rack beam carries 25 % of one unit load as impact; with
    # none given the label posts no figure and says what to write (the preset gives it)
    job, cap = rack()
    assert job.criteria.impact == pytest.approx(0.25) and cap.rated
    assert "Impact NOT included" not in label.label_text(label.rating(cap))
    text = (PRESETS / "pallet-rack-beam-pair.toml").read_text(encoding="utf-8")
    bare = parse_job_text(re.sub(r'\nimpact = "25%".*\n(\s+#.*\n)?', "\n", text))
    assert bare.criteria.impact is None
    flat = " ".join(label.label_text(label.rating(capacity(bare))).replace("|", " ").split())
    assert "NOT RATED" in flat and "MH16.1" in flat and 'impact = "25%"' in flat


def test_a_cantilever_rack_arm_names_its_column_and_rack_standard_not_a_pallet_rack_bay():
    # a rack member with a free end is an arm of a cantilever rack (ANSI MH16.3): the rack
    # that carries it on is the column, its base and the arm connections, not upright frames
    job = load_job(PRESETS / "bar-stock-rack-arm.toml")
    text = label.label_text(label.rating(capacity(job), analyze(job).unchecked))
    flat = " ".join(text.replace("|", " ").split())
    assert "PER COLUMN SIDE" in flat and "arm connections are not checked" in flat
    bare = parse_job_text(re.sub(r'\nimpact = "25%".*\n(\s+#.*\n)?', "\n", (
        PRESETS / "bar-stock-rack-arm.toml").read_text(encoding="utf-8")))
    unrated = label.label_text(label.rating(capacity(bare), analyze(bare).unchecked))
    assert "MH16.3" in " ".join(unrated.replace("|", " ").split())  # its impact, not given
    assert "upright frames" not in flat and "MH16.1" not in flat and "PER BAY" not in flat
    cautions = " ".join(analyze(job).cautions)
    assert "cantilever rack" in cautions and "MH16.1" not in cautions
    # with its levels the column side's total is posted: the levels times the arm's total
    three = replace(job, levels=3)
    r = label.rating(capacity(three), analyze(three).unchecked)
    side = [f for f in r.figures if f.group == "PER COLUMN SIDE (3 levels)"]
    arm = [f for f in r.figures if f.label == "TOTAL" and not f.group]
    assert len(side) == 1 and len(arm) == 1
    assert side[0].si <= 3 * arm[0].si * (1 + 1e-12) and "column is rated for" in side[0].note


def test_a_metric_label_posts_kilograms_beside_newtons_each_rounded_down():
    # metric shops post loads in kg: the weight that makes the force (g0 = 9.80665 m/s^2,
    # exact by definition), rounded down on its own so it never exceeds the rated force
    text = """schema = 1
title = "metric arm"
units = "si"
[beam]
length = "1200 mm"
section = "HSS4x2x1/4"
material = "A500-C"
[[supports]]
at = "0 mm"
type = "fixed"
[[loads]]
type = "point"
at = "1.2 m"
value = "-2.5 kN"
"""
    job = parse_job_text(text)
    r = label.rating(capacity(job))
    fig = next(f for f in r.figures if f.label == "MAX POINT LOAD")
    m = re.fullmatch(r"([\d.]+) kN \((\d+) kg\)", fig.value)
    assert m, fig.value
    kg = int(m.group(2))
    assert kg == label.floor_sig(fig.exact / 9.80665) and kg * 9.80665 <= fig.exact
    us_text = text.replace('units = "si"', 'units = "us"').replace('"1200 mm"', '"4 ft"') \
        .replace('"0 mm"', '"0 ft"').replace('"1.2 m"', '"4 ft"').replace('"-2.5 kN"',
                                                                            '"-560 lbf"')
    us = label.rating(capacity(parse_job_text(us_text)))
    assert "kg" not in next(f for f in us.figures if f.label == "MAX POINT LOAD").value


def _flat(cap, job=None) -> str:
    """The label of a capacity result at 200 columns, as one line of words."""
    job = job or cap.job
    return " ".join(label.label_text(label.rating(cap, analyze(job).unchecked),
                                     width=200).replace("|", " ").split())


@pytest.mark.parametrize("dead, self_weight, words", [
    ('[[loads]]\ntype = "uniform"\nvalue = "-300 lbf/ft"\ncase = "dead"\n', "true",
     "IN ADDITION TO the dead load as entered (3600 lbf in all) and the member's own weight"),
    ("", "true", "IN ADDITION TO the member's own weight"),
    ("", "false", None)])
def test_the_label_says_the_posted_load_comes_on_top_of_the_dead_loads(dead, self_weight, words):
    # a reader of the label must know the dead loads stay on besides the posted figure
    text = ('schema = 1\ntitle = "shelf"\n[beam]\nlength = "12 ft"\nsection = "W8X18"\n'
            f'material = "A992"\nbraced = true\nself_weight = {self_weight}\n[[supports]]\n'
            'at = "0 ft"\n'
            'type = "pin"\n[[supports]]\nat = "12 ft"\ntype = "roller"\n[[loads]]\n'
            'type = "uniform"\nvalue = "-500 lbf/ft"\n' + dead)
    cap = capacity(parse_job_text(text))
    flat = _flat(cap)
    if words:
        assert words in flat
    else:
        assert "IN ADDITION" not in flat
    assert ("own weight was LEFT OUT" in flat) == (self_weight == "false")


def test_a_wheel_set_is_posted_per_axle_and_per_wheel():
    # each load of a [[moving]] set is an axle carried by wheels_per_axle wheels (a monorail
    # trolley runs one each side of the web): the label had posted the axle as "per wheel"
    job = load_job(Path(__file__).resolve().parents[1] / "presets" / "monorail-trolley.toml")
    assert job.moving[0].wheels_per_axle == 2
    cap = capacity(job)
    r = label.rating(cap, analyze(job).unchecked)
    figs = {f.label.split(" (")[0]: f for f in r.figures}
    axle, wheel = figs["MAX PER AXLE"], figs["MAX PER WHEEL"]
    assert wheel.exact == pytest.approx(axle.exact / 2, rel=1e-12)
    assert axle.exact == pytest.approx(max(abs(w) for w in job.moving[0].live) * cap.factor,
                                       rel=1e-12)


@pytest.mark.parametrize("bearing, said", [("", True), ('bearing = "3-1/2 in"', False)])
def test_a_wood_label_says_when_it_rests_on_the_default_bearing(bearing, said):
    # the wood bearing check (NDS 2018 3.10) takes 1-1/2 in where none is given: the label
    # must say the posted load holds only on bearings at least that long
    text = ('schema = 1\ntitle = "shelf"\n[beam]\nlength = "6 ft"\nsection = "2x10"\n'
            f'material = "DF-L-2"\n{bearing}\n[[supports]]\nat = "0 ft"\ntype = "pin"\n'
            '[[supports]]\nat = "6 ft"\ntype = "roller"\n[[loads]]\ntype = "uniform"\n'
            'value = "-100 lbf/ft"\n')
    cap = capacity(parse_job_text(text))
    flat = _flat(cap)
    assert ("Bearing taken as 1-1/2 in" in flat) == said


@pytest.mark.parametrize("extra, words", [
    ("restrained = true", "RATED ONLY WHILE the member is held against twist"),
    ("braced = true", "RATED ONLY WHILE the top flange is braced all along"),
    ('braces = ["4 ft", "8 ft"]', "RATED ONLY WITH the braces in place at 4 ft, 8 ft"),
    ("", None)])
def test_the_label_says_what_restraint_the_rating_rests_on(extra, words):
    # a rating that counts on a deck, sheeting or braces holds only while they are there
    text = ('schema = 1\ntitle = "shelf"\n[beam]\nlength = "12 ft"\nsection = "HSS6x4x1/4"\n'
            f'material = "A500-C"\n{extra}\n[[supports]]\nat = "0 ft"\ntype = "pin"\n'
            '[[supports]]\nat = "12 ft"\ntype = "roller"\n[[loads]]\ntype = "uniform"\n'
            'value = "-200 lbf/ft"\n')
    cap = capacity(parse_job_text(text))
    flat = _flat(cap)
    if words:
        assert words in flat
    else:
        assert "RATED ONLY" not in flat


def test_the_label_says_a_trolley_must_stay_within_its_travel():
    # a rating that holds only while end stops keep the trolley off the rest of the member
    job = load_job(Path(__file__).resolve().parents[1] / "presets" / "monorail-trolley.toml")
    a, b = job.moving[0].travel
    full = replace(job, moving=(replace(job.moving[0], travel=(0.0, job.length)),))
    short = replace(job, moving=(replace(job.moving[0], travel=(a, b - 0.5)),))
    assert "END STOPS must keep it there" not in _flat(capacity(full), full)
    assert "END STOPS must keep it there" in _flat(capacity(short), short)


def test_a_linear_load_is_posted_as_its_total_with_its_end_intensities_and_patterns_on_any_span():
    text = ('schema = 1\ntitle = "shelf"\n[beam]\nlength = "12 ft"\nsection = "HSS6x4x1/4"\n'
            'material = "A500-C"\nself_weight = false\n[[supports]]\nat = "0 ft"\ntype = "pin"\n'
            '[[supports]]\nat = "12 ft"\ntype = "roller"\n[[loads]]\ntype = "linear"\n'
            'start = "0 ft"\nend = "12 ft"\nvalue = ["0 lbf/ft", "-100 lbf/ft"]\n'
            '[[loads]]\ntype = "point"\nat = "6 ft"\nvalue = "-100 lbf"\n')
    words = _flat(capacity(parse_job_text(text)))
    assert "(total)" in words and "varying from 0 lbf/ft at 0 ft to" in words
    assert "other placements are not rated" in words
    two = text.replace('length = "12 ft"', 'length = "24 ft"').replace(
        '[[loads]]\ntype = "linear"', '[[supports]]\nat = "24 ft"\ntype = "roller"\n'
        '[[loads]]\ntype = "uniform"\nvalue = "-50 lbf/ft"\npatterned = true\n'
        '[[loads]]\ntype = "linear"')
    # every live load patterned: one left on in every pattern beside them is not rated
    two = two.replace('"-100 lbf/ft"]\n', '"-100 lbf/ft"]\npatterned = true\n').replace(
        'value = "-100 lbf"\n', 'value = "-100 lbf"\npatterned = true\n')
    words = _flat(capacity(parse_job_text(two)))
    assert "rated on any or all of their spans" in words


GERBER = """schema = 1
title = "Gerber girder"
tags = ["not-rack"]
[beam]
length = "30 ft"
section = "W18X35"
material = "A992"
restrained = true
self_weight = false
[[supports]]
at = "0 ft"
type = "fixed"
[[supports]]
at = "10 ft"
type = "hinge"
[[supports]]
at = "30 ft"
type = "roller"
[[loads]]
type = "uniform"
value = "-1000 lbf/ft"
"""


def test_a_rating_names_the_connections_it_rests_on_at_the_rated_load():
    from shopbeam.design.capacity import to_json
    from shopbeam.output.label import label_text, rating
    # statics (common practice): the suspended 20 ft span hands V = w 20 / 2 to the hinge;
    # the 10 ft cantilever carries w and V: root moment w 10^2 / 2 + V 10 = 150 w ft^2,
    # root shear 20 w; at the rated factor k, w = 1000 k lbf/ft
    cap = capacity(parse_job_text(GERBER))
    k = cap.factor
    assert cap.rated and 0.5 < k < 5
    lbf, ft = 4.4482216152605, 0.3048
    got = to_json(cap)["capacity"]
    assert abs(got["fixed_ends"][0]["moment"]) == pytest.approx(150_000 * k * lbf * ft, rel=1e-9)
    assert abs(got["fixed_ends"][0]["force"]) == pytest.approx(20_000 * k * lbf, rel=1e-9)
    assert abs(got["hinges"][0]["shear"]) == pytest.approx(10_000 * k * lbf, rel=1e-9)
    text = " ".join(label_text(rating(cap, analyze(cap.job).unchecked)).split())
    assert "RATED ONLY WHILE the fixed end at 0 ft develops" in text.replace("| ", "")


def test_derived_label_figures_agree_with_the_posted_one_they_come_from():
    # a posted figure is rounded down; the total of a uniform load and a trolley's per-wheel
    # and whole-set figures are taken from it, so the label's figures agree with each other
    # (and each is still no more than its exact value)
    job = load_job(Path(__file__).resolve().parents[1] / "presets" / "monorail-trolley.toml")
    cap = capacity(job)
    figs = {f.label.split(" (")[0]: f for f in label.rating(cap, analyze(job).unchecked).figures}
    axle, wheel, whole = figs["MAX PER AXLE"], figs["MAX PER WHEEL"], figs["MAX MOVING LOAD"]
    assert wheel.si == pytest.approx(axle.si / 2, rel=1e-9)
    assert whole.si == pytest.approx(axle.si * 2, rel=1e-9)
    assert all(f.si <= f.exact * (1 + 1e-12) for f in (axle, wheel, whole))
    gerber = capacity(parse_job_text(GERBER))
    figs = {f.label: f for f in label.rating(gerber, analyze(gerber.job).unchecked).figures}
    w, total = figs["MAX UNIFORM LOAD"], figs["TOTAL"]
    # the posted line load times the 30 ft, rounded down to three figures in turn
    per_ft = float(w.value.split()[0])
    assert total.value == f"{label.floor_sig(per_ft * 30):g} lbf"
    assert total.si <= w.si * 30 * 0.3048 * (1 + 1e-12) and total.si <= total.exact


def test_a_member_that_fails_under_its_dead_loads_is_not_rated_in_the_json():
    # 30 ft W8X18 under 500 lbf/ft dead: w L^2 / 8 = 56.3 kip*ft (common practice) against
    # Mp / 1.67 = 50 x 17.0 / 1.67 / 12 = 42.4 kip*ft (AISC 360-16 F2-1, AISC Shapes
    # Database v15.0 Zx 17.0 in^3): k = 0, nothing may be posted
    from shopbeam.design.capacity import to_json
    text = GERBER.replace('length = "30 ft"', 'length = "30 ft"').replace(
        'section = "W18X35"', 'section = "W8X18"')
    text = text.split("[[supports]]")[0] + (
        '[[supports]]\nat = "0 ft"\ntype = "pin"\n[[supports]]\nat = "30 ft"\ntype = "roller"\n'
        '[[loads]]\ntype = "uniform"\nvalue = "-500 lbf/ft"\ncase = "dead"\n'
        '[[loads]]\ntype = "uniform"\nvalue = "-100 lbf/ft"\n')
    cap = capacity(parse_job_text(text))
    assert cap.factor == 0 and not cap.rated and to_json(cap)["rated"] is False
    assert label.rating(cap, analyze(cap.job).unchecked).status == "do not load"


def test_the_total_of_several_loads_is_no_more_than_their_posted_figures_add_up_to():
    # two live point loads rated together: each is posted rounded down, and the TOTAL "placed
    # as listed above" comes from those posted figures, so a reader adding them up never
    # finds the total larger (common practice: a posted figure is never rounded up)
    text = """schema = 1
title = "press table"
tags = ["not-rack"]
[beam]
length = "10 ft"
section = "W8X18"
material = "A992"
braced = true
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "10 ft"
type = "roller"
[[loads]]
type = "point"
at = "3 ft"
value = "-2000 lbf"
label = "press"
[[loads]]
type = "point"
at = "7 ft"
value = "-500 lbf"
label = "cabinet"
"""
    cap = capacity(parse_job_text(text))
    figs = {f.label: f for f in label.rating(cap, analyze(cap.job).unchecked).figures}
    parts = figs["max press"].si + figs["max cabinet"].si
    total = figs["TOTAL"]
    assert total.si <= parts * (1 + 1e-12)
    assert total.si <= total.exact and total.exact == pytest.approx(2500 * LBF * cap.factor)
    assert total.si >= parts * 0.99  # three figures: within 1 % of the sum


def test_a_monorail_label_says_what_its_rating_rests_on_at_the_hangers_and_the_flange_ends():
    # the lateral-torsional buckling strength of a hung beam takes each hanger as holding it
    # against twist (AISC 360-16 F1, braced points; common practice), and the wheel flange
    # check is for the flange away from its ends (CMAA 74 / AISC Design Guide 7 give the
    # interior figures, from memory): a posted rating rests on both, so the label says so
    job = load_job(PRESETS / "monorail-trolley.toml")
    text = label.label_text(label.rating(capacity(job), analyze(job).unchecked))
    flat = " ".join(x.strip("| ") for x in text.splitlines())
    assert "hangers or seats at 0 ft and 16 ft hold the beam against twist" in flat
    bf = job.section.dims["bf"] / 0.0254  # AISC Shapes Database v15.0 S10X25.4: bf 4.66 in
    assert bf == pytest.approx(4.66, abs=0.01)
    assert "END STOPS keep the wheels at least 4.66 in" in flat
    # hangers said to hold it (brace = true) and a travel kept a flange width off the ends:
    # neither line
    said = job.path and Path(job.path).read_text()
    said = said.replace('type = "pin"', 'type = "pin"\nbrace = true').replace(
        'type = "roller"', 'type = "roller"\nbrace = true')
    said = said.replace('travel = ["0 ft", "16 ft"]', 'travel = ["6 in", "15 ft 6 in"]')
    kept = parse_job_text(said)
    assert kept.moving[0].travel[0] > 0
    text = label.label_text(label.rating(capacity(kept), analyze(kept).unchecked))
    flat = " ".join(x.strip("| ") for x in text.splitlines())
    assert "against twist" not in flat and "flange width" not in flat


def test_the_capacity_page_total_is_the_labels():
    # one uniform load: the capacity page and the label both post the total of the posted
    # (rounded down) figure over its length (common practice: never round a posted load up)
    from shopbeam.design.capacity import max_load_lines

    cap = capacity(parse_job_text(GERBER))
    lines = dict(max_load_lines(cap))
    figs = {f.label: f for f in label.rating(cap, analyze(cap.job).unchecked).figures}
    assert lines["total"] == figs["TOTAL"].value
    w = float(lines["max uniform load"].split()[0])
    assert float(lines["total"].split()[0]) <= w * 30 + 1e-9


@pytest.mark.parametrize("preset", ["jib-arm", "monorail-hoist-beam", "monorail-trolley"])
def test_a_lifting_label_says_the_device_is_rated_at_the_least_of_its_parts(preset):
    # a lifting device is marked with the least rated load of its parts (ASME B30.11 / B30.17
    # practice, from memory): the beam's figure alone would invite a lift past the hoist's
    job = load_job(PRESETS / f"{preset}.toml")
    cap = capacity(job)
    r = label.rating(cap, analyze(job).unchecked)
    for text in (label.label_text(r), label.plaque_text(r), label.plaque_html(r)):
        flat = " ".join(x.strip("| ") for x in text.splitlines())
        assert "BEAM ONLY" in flat and "LEAST of this figure" in flat
    shelf = load_job(PRESETS / "workbench-top.toml")
    assert "BEAM ONLY" not in label.label_text(label.rating(capacity(shelf),
                                                            analyze(shelf).unchecked))


def test_posted_kilograms_never_exceed_the_posted_force():
    # a metric label gives kg beside kN: each rounded down, the kg from the posted kN (g0 =
    # 9.80665 m/s^2, the standard gravity), so 294 kg is never posted beside 2.88 kN
    for value in (2885.0, 9999.0, 1234.5, 7911.0):
        f = label.posted("MAX", value, "force", "si")
        kn = float(f.value.split()[0]) * 1000
        kg = float(f.value.split("(")[1].split()[0])
        assert kg * 9.80665 <= kn * (1 + 1e-12) and kn <= value


def test_a_load_given_per_area_is_posted_per_area_first():
    # the posted area load times the tributary width is the posted line load (no more than
    # it), in the unit the job was written in
    from pathlib import Path

    from shopbeam.design.capacity import capacity
    from shopbeam.jobs.jobfile import parse_job_text
    from shopbeam.output.label import rating
    text = (Path(__file__).resolve().parent.parent / "presets" / "mezzanine-joist.toml").read_text()
    job = parse_job_text(text)
    r = rating(capacity(job))
    area, line = r.figures[0], r.figures[1]
    assert area.label == "MAX AREA LOAD" and "psf" in area.value
    assert line.label == "MAX UNIFORM LOAD"
    live = next(ld for ld in job.loads if ld.case == "live")
    width = job.widths[live.key]
    assert width == pytest.approx(24 * 0.0254)  # the preset's width = "24 in"
    # both rounded down from the same exact figure: area x width within rounding of the line
    assert area.exact * width == pytest.approx(line.exact, rel=1e-12)
    assert area.si <= area.exact and line.si <= line.exact
    # the line load and the total are worked out from the posted area figure, so the three
    # figures on the label agree: 146 psf x 2 ft is 292 lbf/ft, never 293
    assert line.si <= area.si * width * (1 + 1e-12)
    total = next(f for f in r.figures if f.label == "TOTAL")
    assert total.si <= area.si * width * (live.end - live.start) * (1 + 1e-12)


def test_solve_json_names_the_holds_that_capacity_would_post_no_rating_for(tmp_path):
    # a script reading solve --json had seen every check pass and nothing blocking on a rack
    # beam with no impact; every reason solve names, capacity names too
    from shopbeam.design.capacity import capacity as cap
    from shopbeam.design.capacity import solve_reasons

    for path in sorted(PRESETS.glob("*.toml")):
        job = load_job(path)
        said = solve_reasons(analyze(job))
        res = cap(job)
        assert all(r in res.not_rated for r in said), path.name
        if said:
            assert not res.rated, path.name
    text = (PRESETS / "pallet-rack-beam-pair.toml").read_text()
    line = next(ln for ln in text.splitlines() if ln.startswith("impact"))
    job = parse_job_text(text.replace(line, ""))
    said = solve_reasons(analyze(job))
    assert any("impact" in r for r in said) and not cap(job).rated
    # and solve --json carries them
    import json
    import subprocess
    import sys
    path = tmp_path / "noimpact.toml"
    path.write_text(text.replace(line, ""), encoding="utf-8")
    out = subprocess.run([sys.executable, "-m", "shopbeam", "solve", str(path), "--json"],
                         capture_output=True, text=True, timeout=120)
    assert json.loads(out.stdout)["not_rated_reasons"] == said


def test_a_wood_rating_speaks_of_its_top_edge_not_a_flange():
    text = """schema = 1
title = "Loft joist"
tags = ["not-lifting"]
[beam]
length = "12 ft"
section = "2x10"
material = "DF-L-2"
braced = true
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "12 ft"
type = "roller"
[[loads]]
type = "uniform"
value = "-60 lbf/ft"
"""
    words = label.label_text(label.rating(capacity(parse_job_text(text))))
    assert "top edge is braced all along" in " ".join(re.sub(r"[|+=]", " ", words).split())
    assert "flange" not in words


def test_a_tag_to_type_is_not_split_at_its_hyphen_on_the_label():
    res = capacity(load_job(PRESETS / "trailer-cross-member.toml"))
    assert '"not-vehicle"' in label.label_text(label.rating(res))
    # and on the capacity page, at the text UI's width as at 78 columns
    from shopbeam.output.capacityreport import render
    for width in (78, 76):
        assert '"not-vehicle"' in render(res, width)


def test_the_label_and_capacity_page_give_what_each_support_must_carry_at_the_rated_load():
    # the rating rests on the brackets, clips and seats carrying the reactions, which are not
    # checked here: a simple span under a uniform load gives each end w L / 2 (statics)
    from pathlib import Path
    from shopbeam.design.analysis import analyze
    from shopbeam.design.capacity import capacity
    from shopbeam.jobs.jobfile import load_job
    from shopbeam.output import capacityreport, label
    from shopbeam import units
    job = load_job(Path(__file__).resolve().parents[1] / "presets" / "mezzanine-joist.toml")
    cap = capacity(job)
    assert cap.rated
    k = cap.factor
    total = sum(-ld.total_force * (k if ld.case == "live" else 1.0) for ld in job.loads)
    if job.self_weight:
        total += -job.self_weight_load().total_force
    each = units.fmt(total / 2, "force", job.units)
    text = " ".join(label.label_text(label.rating(cap, analyze(job).unchecked))
                    .replace("|", " ").split())
    assert "SUPPORTS must carry at the rated load" in text and "not checked here" in text
    assert f"pin at 0 ft: up to {each}" in text and f"roller at 12 ft: up to {each}" in text
    page = " ".join(capacityreport.render(cap).split())
    assert "supports at k" in page and f"pin at 0 ft: up to {each}" in page


def test_a_hoist_given_as_a_point_load_at_a_jib_end_is_rated_only_with_end_stops():
    # the wheel flange check is for the flange away from its ends (lifting.lifting_notes):
    # a hoist within a flange width of the end is rated only while end stops keep it off
    # the open end, as for a [[moving]] set
    from shopbeam.output import label
    text = (Path(__file__).resolve().parents[1] / "presets" / "jib-arm.toml").read_text()
    job = load_job(Path(__file__).resolve().parents[1] / "presets" / "jib-arm.toml")
    inside = label.rating(capacity(job), analyze(job).unchecked)
    # rated travelling from the mast out to the place given (capacity.travelling): the
    # hoist must be kept there, but the mast end is closed by its fixed connection
    assert any("stays between 0 ft and 9.5 ft: END STOPS" in n for n in inside.notes)
    assert not any("a flange width" in n for n in inside.notes)
    at = next(ld for ld in job.loads if ld.case == "live")
    end = parse_job_text(text.replace('at = "9 ft 6 in"', 'at = "10 ft"'))
    assert next(ld for ld in end.loads if ld.case == "live").at > at.at
    r = label.rating(capacity(end), analyze(end).unchecked)
    assert any("END STOPS keep the wheels" in n and "the open end at 10 ft" in n
               for n in r.notes)
    assert not any("stays between" in n for n in r.notes)  # it may run the whole boom


def test_a_monorail_hoist_given_as_a_point_load_is_rated_only_with_end_stops_at_both_ends():
    # rated "anywhere along its travel" over the whole beam: its wheels can reach either open
    # flange end, where the wheel flange check does not hold (as for a [[moving]] trolley)
    from shopbeam.output import label
    job = load_job(Path(__file__).resolve().parents[1] / "presets" / "monorail-hoist-beam.toml")
    assert not job.moving and any(ld.kind == "point" for ld in job.loads)
    r = label.rating(capacity(job), analyze(job).unchecked)
    assert any("END STOPS keep the wheels at least" in n and "each end of the beam" in n
               for n in r.notes)


def test_a_welded_built_up_beam_is_rated_only_while_its_flange_welds_carry_the_shear_flow():
    # q = V Q / I (mechanics of materials, common practice): a 12 x 6 x 3/8 flange x 1/4 web
    # plate girder, Q = 6 x 0.375 x (12 - 0.375) / 2 = 13.08 in^3, I by its plates
    from shopbeam.output import label
    job = parse_job_text(
        'schema = 1\ntitle = "platform girder"\ntags = ["not-floor"]\n[beam]\nlength = "16 ft"\n'
        'material = "A36"\nbraced = true\n[beam.section]\nshape = "i-beam"\ndepth = "12 in"\n'
        'flange_width = "6 in"\nflange_thickness = "3/8 in"\nweb_thickness = "1/4 in"\n'
        '[[supports]]\nat = "0 ft"\ntype = "pin"\n[[supports]]\nat = "16 ft"\ntype = "roller"\n'
        '[[loads]]\ntype = "uniform"\nvalue = "-800 lbf/ft"\n')
    cap = capacity(job)
    r = label.rating(cap, analyze(job).unchecked)
    IN = 0.0254
    hw = 12 - 2 * 0.375
    i_in4 = (6 * 12**3 - (6 - 0.25) * hw**3) / 12
    v = max(abs(c.demand) for c in cap.evaluation.checks if c.name == "shear") / 4.4482216152605
    q = v * 6 * 0.375 * (12 - 0.375) / 2 / i_in4
    note = next(n for n in r.notes if "flange-to-web welds" in n)
    got = float(re.search(r"shear flow of ([\d,]+) lbf/in", note).group(1).replace(",", ""))
    assert got == pytest.approx(q, abs=1.0)
    assert job.section.ix == pytest.approx(i_in4 * IN**4, rel=1e-9)
    # a rolled W shape: no such line
    w = load_job(Path(__file__).resolve().parents[1] / "presets" / "storage-platform-beam.toml")
    assert not any("flange-to-web" in n for n in label.rating(capacity(w)).notes)


def test_a_pallet_rack_beam_is_rated_only_while_its_connectors_carry_the_end_forces():
    from shopbeam.output import label
    root = Path(__file__).resolve().parents[1] / "presets"
    job = load_job(root / "pallet-rack-beam-pair.toml")
    r = label.rating(capacity(job), analyze(job).unchecked)
    assert any("end connectors" in n and "locking devices" in n for n in r.notes)
    assert r.reactions  # the SUPPORTS lines the note points to
    arm = load_job(root / "bar-stock-rack-arm.toml")  # a cantilever arm: its column instead
    assert not any("end connectors" in n for n in label.rating(capacity(arm)).notes)


def test_a_rating_that_rests_on_the_tag_fatigue_checked_says_so_on_the_label():
    from shopbeam.output import label
    text = (Path(__file__).resolve().parents[1] / "presets" / "trailer-cross-member.toml") \
        .read_text()
    tags = next(ln for ln in text.splitlines() if ln.startswith("tags = "))
    job = parse_job_text(text.replace(tags, tags.rstrip("]") + ', "fatigue-checked"]', 1))
    cap = capacity(job)
    assert cap.rated, cap.not_rated
    r = label.rating(cap, analyze(job).unchecked)
    assert any("tag fatigue-checked" in n for n in r.notes)


def test_a_lifting_beam_rated_on_the_tag_no_axial_says_so_on_the_label():
    from shopbeam.output import label
    job = parse_job_text(
        'schema = 1\ntitle = "spreader bar"\ntags = ["lifting", "no-axial"]\n[beam]\n'
        'length = "10 ft"\nsection = "W8x18"\nmaterial = "A992"\nrestrained = true\n'
        '[[supports]]\nat = "1 ft"\ntype = "pin"\n[[supports]]\nat = "9 ft"\ntype = "roller"\n'
        '[[loads]]\ntype = "point"\nat = "5 ft"\nvalue = "-2000 lbf"\nlug = true\n'
        'flange = "bottom"\n[criteria]\nlifting = "below-the-hook"\n')
    r = label.rating(capacity(job), analyze(job).unchecked)
    assert any("tag no-axial" in n for n in r.notes)


def test_an_outdoor_bracket_label_says_wind_is_not_in_the_figure():
    from shopbeam.output import label
    root = Path(__file__).resolve().parents[1] / "presets"
    job = load_job(root / "awning-bracket.toml")
    assert any(n.startswith("WIND is not in this figure") for n in
               label.rating(capacity(job), analyze(job).unchecked).notes)
    shelf = load_job(root / "wall-shelf-brackets.toml")
    assert not any("WIND" in n for n in label.rating(capacity(shelf)).notes)


def test_a_rating_on_a_spring_support_states_the_stiffness_it_rests_on():
    from shopbeam.output import label
    job = parse_job_text(
        'schema = 1\ntitle = "rail"\ntags = ["not-rack"]\n[beam]\nlength = "10 ft"\n'
        'section = "W8x18"\nmaterial = "A992"\nbraced = true\n[[supports]]\nat = "0 ft"\n'
        'type = "pin"\n[[supports]]\nat = "10 ft"\ntype = "spring"\nstiffness = "5000 lbf/in"\n'
        '[[loads]]\ntype = "point"\nat = "5 ft"\nvalue = "-1000 lbf"\n')
    r = label.rating(capacity(job), analyze(job).unchecked)
    assert any("spring support at 10 ft (5000 lbf/in)" in n for n in r.notes), r.notes


def _shelf_tube(extra_support: str = "", length: str = "8 ft", deflection: str = "L/180") -> str:
    return f"""schema = 1
title = "Tube shelf beam"
[beam]
length = "{length}"
section = "HSS4x2x1/8"
material = "A500-C"
[[supports]]
at = "0 ft"
type = "pin"
{extra_support}
[[supports]]
at = "8 ft"
type = "roller"
[[loads]]
type = "uniform"
start = "0 ft"
end = "8 ft"
value = "-100 lbf/ft"
[criteria]
deflection = "{deflection}"
"""


def test_a_governing_local_check_without_a_bearing_length_says_where_and_what_to_give():
    # the wall's local yielding at an end support governs with the bearing length not given
    # (taken as a knife edge): the bare name would read as a weak member
    shelf = _shelf_tube(deflection="L/120").replace("HSS4x2x1/8", "HSS6x6x1/8")
    cap = capacity(parse_job_text(shelf))
    assert cap.governing.name == "wall local yielding"
    text = _flat(cap)
    assert "Governing check: wall local yielding at the pin support at 0 ft: bearing length " \
           "not given, taken as 0 in; give bearing" in text
    # with the seat given, the words go (the bearing length is no longer the least)
    cap2 = capacity(parse_job_text(shelf.replace(
        'type = "pin"', 'type = "pin"\nbearing = "4 in"').replace(
        'type = "roller"', 'type = "roller"\nbearing = "4 in"')))
    assert "bearing length not given" not in _flat(cap2)


def test_a_governing_overhang_deflection_names_its_limit_on_twice_the_length():
    cap = capacity(parse_job_text(_shelf_tube(length="8.5 ft", deflection="L/180").replace(
        'type = "pin"', 'type = "pin"\nbearing = "4 in"').replace(
        'type = "roller"', 'type = "roller"\nbearing = "4 in"')))
    g = cap.governing
    assert g.name == "deflection" and g.detail.startswith("overhang")
    text = _flat(cap)
    limit_in = 2 * 6 / 180  # twice the 6 in overhang / 180 (the contract's rule)
    assert f"Governing check: deflection limit {limit_in:.4g} in on the overhang 8 ft to " \
           "8.5 ft (2 x overhang length / 180, i.e. its tip may move overhang length / 90)" \
           in text


def test_a_wheel_set_of_unequal_axles_posts_each_axle_not_the_heaviest_for_all():
    text = """schema = 1
title = "Cart on a shop rail"
tags = ["not-lifting"]
[beam]
length = "14 ft"
section = "W8x18"
material = "A992"
braced = true
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "14 ft"
type = "roller"
[[moving]]
label = "cart"
loads = ["-3000 lbf", "-1000 lbf", "-500 lbf"]
spacing = ["2 ft", "2 ft"]
"""
    cap = capacity(parse_job_text(text))
    r = label.rating(cap)
    # a job not tagged lifting: each load of the set is one wheel (docs/job-file.md), so the
    # label speaks of wheels, with no per-axle split of a figure already per wheel
    heavy = next(f for f in r.figures if f.label.startswith("MAX HEAVIEST WHEEL"))
    k = cap.factor
    for w in (3000, 1000, 500):  # each wheel's own figure, rounded down, in order
        assert f"{label.floor_sig(w * k):g} lbf" in heavy.note
    assert "3 wheels" in heavy.note
    assert not any("AXLE" in f.label or "axle" in f.note for f in r.figures)
    assert not any(f.label.startswith("MAX PER WHEEL") for f in r.figures)


def test_a_typed_in_tube_s_member_line_says_its_units():
    # "rect-tube 3.937 x 1.9685 x 3 mm" had the sizes converted to inches with no unit
    # beside a wall still in millimetres: a section typed in millimetres is named in them
    from shopbeam.jobs.jobfile import parse_job_text

    text = ('schema = 1\ntitle = "Storage shelf beam"\ntags = ["shelf"]\n[beam]\n'
            'length = "8 ft"\nsection = { shape = "rect-tube", width = "50 mm", '
            'depth = "100 mm", wall = "3 mm" }\nmaterial = "A500-C"\n[[supports]]\n'
            'at = "0 ft"\ntype = "pin"\n[[supports]]\nat = "8 ft"\ntype = "roller"\n'
            '[[loads]]\ntype = "uniform"\nvalue = "-100 lbf/ft"\n')
    r = label.rating(capacity(parse_job_text(text)))
    assert "rect-tube 100 x 50 x 3 mm" in r.member


def test_a_lifting_label_is_rated_only_while_the_lifts_are_few_where_fatigue_is_not_checked():
    # fatigue under repeated lifts is not checked (lifting.FATIGUE) and does not withhold the
    # figure: the label says what it rests on, fewer than 20,000 lifts (AISC 360-16 Appendix
    # 3.1, from memory: no fatigue check below that)
    from shopbeam.output import label
    for name in ("monorail-trolley", "jib-arm", "monorail-hoist-beam"):
        job = load_job(Path(__file__).resolve().parents[1] / "presets" / f"{name}.toml")
        r = label.rating(capacity(job), analyze(job).unchecked)
        assert any(n.startswith("RATED ONLY WHILE the member sees fewer than 20,000 lifts")
                   for n in r.notes), name
    plain = load_job(Path(__file__).resolve().parents[1] / "presets" / "mezzanine-joist.toml")
    r = label.rating(capacity(plain), analyze(plain).unchecked)
    assert not any("20,000 lifts" in n for n in r.notes)


def test_a_below_the_hook_label_names_its_design_category_and_factor():
    # ASME BTH-1 3-1.3 (from memory): Nd 2.0 for Category A, 3.0 for B; the same basis line
    # would otherwise post 1.5 times as much under A with nothing to tell the two apart
    from shopbeam.output import label
    text = """schema = 1
title = "spreader"
tags = ["lifting"]
[beam]
length = "10 ft"
section = "W8x18"
material = "A992"
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "10 ft"
type = "roller"
[[loads]]
type = "point"
at = "5 ft"
value = "-2000 lbf"
lug = true
flange = "bottom"
[criteria]
lifting = "below-the-hook"
category = "{cat}"
"""
    said = {}
    for cat in ("A", "B"):
        job = parse_job_text(text.replace("{cat}", cat))
        r = label.rating(capacity(job), analyze(job).unchecked)
        said[cat] = r.basis
    assert said["A"].endswith("ASME BTH-1 Design Category A, Nd 2")
    assert said["B"].endswith("ASME BTH-1 Design Category B, Nd 3")
    plain = load_job(PRESETS / "mezzanine-joist.toml")
    assert "BTH-1" not in label.rating(capacity(plain)).basis


def test_a_lifting_label_says_the_supports_take_the_sideways_trolley_force_too():
    # ASCE 7-16 4.9.4 (from memory): 20 % of rated load + hoist + trolley for a powered
    # trolley; the member is checked for it, the supports' and root's figures are vertical
    from shopbeam.output import label
    jib = load_job(PRESETS / "jib-arm.toml")
    notes = label.rating(capacity(jib), analyze(jib).unchecked).notes
    said = [n for n in notes if "SIDEWAYS" in n]
    assert said and "20%" in said[0] and "at the root" in said[0]
    plain = load_job(PRESETS / "mezzanine-joist.toml")
    assert not any("SIDEWAYS" in n for n in label.rating(capacity(plain)).notes)


def test_capacity_names_where_a_travelling_hoist_may_run_not_where_it_was_typed():
    # the label rates the hoist anywhere along its travel; capacity's max load line says the
    # same, not the place typed (the worst place, where the job put it)
    from shopbeam.design.capacity import max_load_lines
    job = load_job(PRESETS / "monorail-hoist-beam.toml")
    lines = dict(max_load_lines(capacity(job)))
    assert lines["at"] == "anywhere from 0 ft to 16 ft"
    plain = dict(max_load_lines(capacity(parse_job_text(
        'schema = 1\ntitle = "bench"\n[beam]\nlength = "6 ft"\nsection = "HSS4x4x1/4"\n'
        'material = "A500-C"\n[[supports]]\nat = "0 ft"\ntype = "pin"\n[[supports]]\n'
        'at = "6 ft"\ntype = "roller"\n[[loads]]\ntype = "point"\nat = "2 ft"\n'
        'value = "-500 lbf"\n'))))
    assert plain["at"] == "2 ft"


CLAMP_BRACKET = """schema = 1
title = "wall bracket, pipe on a beam clamp"
units = "us"
tags = ["not-lifting"]
[beam]
length = "4 ft"
section = "W8x18"
material = "A992"
[[supports]]
at = "0 ft"
type = "fixed"
[[loads]]
type = "point"
at = "3 ft 9 in"
value = "-2500 lbf"
label = "process pipe on beam clamp"
flange = "bottom"
"""


@pytest.mark.parametrize("at, extra, held", [
    ('"3 ft 9 in"', "", True),          # 3 in from the open tip, bf = 5.25 in
    ('"3 ft 6 in"', "", False),         # 6 in in: the flange runs on both sides
    ('"3 ft 9 in"', "lug = true\n", False),  # a lug under the web: no flange-tip load
    ('"2 in"', "", False),              # by the root: the fixed connection closes that end
])
def test_a_clamp_hung_by_an_open_flange_end_is_rated_only_a_flange_width_in(at, extra, held):
    # The flange-tip check (wheel flange bending) takes a flange that runs on both sides of
    # the load; by an unstiffened open end the flange bends about twice as much (EN 1993-6
    # 5.7.2, from memory), so a job that is not a lifting device gets the same condition as a
    # hoist does: rated only while the clamp sits a flange width (AISC Shapes Database v15.0
    # W8X18 bf = 5.25 in) from the open end, with a caution in the report
    from shopbeam.output import label
    job = parse_job_text(CLAMP_BRACKET.replace('"3 ft 9 in"', at).replace(
        'flange = "bottom"\n', 'flange = "bottom"\n' + extra))
    res = analyze(job)
    r = label.rating(capacity(job), res.unchecked)
    cond = [n for n in r.notes if "RATED ONLY WHILE the load hung from the flange tips" in n]
    said = [c for c in res.cautions if "within a flange width (5.25 in)" in c]
    assert bool(cond) == held and bool(said) == held
    if held:
        assert "near 3.75 ft" in cond[0] and "5.25 in" in cond[0]
        assert "open end at 4 ft" in said[0]


def test_a_not_rated_lifting_label_speaks_of_no_figure():
    # "the LEAST of this figure and ..." under NOT RATED pointed at a figure the label does
    # not show
    from shopbeam.design.analysis import analyze
    from shopbeam.design.capacity import capacity
    from shopbeam.jobs.jobfile import parse_job_text
    from shopbeam.output.label import label_text, rating

    text = (PRESETS / "jib-arm.toml").read_text()
    ok = parse_job_text(text)
    flat = " ".join(label_text(rating(capacity(ok), analyze(ok).unchecked)).replace("|", " ")
                    .split())
    assert "LEAST of this figure" in flat
    slip = parse_job_text(text + '\n[[loads]]\ntype = "point"\nat = "5 ft"\nvalue = "50 lbf"\n')
    cap = capacity(slip)
    assert not cap.rated
    flat = " ".join(label_text(rating(cap, analyze(slip).unchecked)).replace("|", " ").split())
    assert "LIFTING DEVICE" in flat and "this figure" not in flat
    assert "No figure is posted for the beam here" in flat
