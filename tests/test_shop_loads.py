"""Loads the way shop people say them: area loads over a tributary width, total loads,
identical members sharing a load. Each case is worked by hand here (said so) and run through
the job reader, the solver and the real CLI.
"""

from __future__ import annotations

import json
import subprocess
import sys

import pytest

from shopbeam.design.analysis import analyze
from shopbeam.jobs.jobfile import parse_job_text
from shopbeam.errors import InputErrors

LBF, FT = 4.4482216152605, 0.3048

HEAD = """schema = 1
title = "{title}"
[beam]
length = "{length}"
self_weight = false
{members}
material = {{ e = "29000 ksi", fy = "50 ksi", density = "490 lb/ft^3" }}
[beam.section]
shape = "custom"
area = "1.2 in^2"
ix = "3.0 in^4"
sx = "1.5 in^3"
shear_area = "0.6 in^2"
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "{length}"
type = "roller"
"""


def job(title, length, load, members=""):
    return HEAD.format(title=title, length=length, members=members) + load


def test_deck_joist_area_load_with_tributary_width():
    # worked by hand: 125 psf on joists at 16 in is 125 x 16/12 = 166.67 lbf/ft; a 12 ft
    # simple span takes R = wL/2 = 1000 lbf and M = wL^2/8 = 3000 lbf*ft
    text = job("Deck joist", "12 ft",
               '[[loads]]\ntype = "uniform"\nvalue = "-125 psf"\nwidth = "16 in"\n')
    j = parse_job_text(text)
    assert j.loads[0].w1 == pytest.approx(-125 * 16 / 12 * LBF / FT, rel=1e-12)
    r = analyze(j)
    assert r.solution.reactions[0].force == pytest.approx(1000 * LBF, rel=1e-9)
    assert r.solution.extremes()["moment"].max == pytest.approx(3000 * LBF * FT, rel=1e-9)
    assert any("125 psf x 16 in" in c and "166.7 lbf/ft" in c for c in j.conversions)


def test_two_rail_shelf_total_load_shared_by_members():
    # worked by hand: 700 lbf spread over a 6 ft shelf on two rails: each rail carries
    # 350 lbf, w = 58.33 lbf/ft, R = 175 lbf, M = WL/8 = 350 x 6 / 8 = 262.5 lbf*ft
    text = job("Two-rail shelf", "6 ft",
               '[[loads]]\ntype = "uniform"\nstart = "0 ft"\nend = "6 ft"\ntotal = "-700 lbf"\n',
               members="members = 2")
    r = analyze(parse_job_text(text))
    assert r.solution.reactions[0].force == pytest.approx(175 * LBF, rel=1e-9)
    assert r.solution.extremes()["moment"].max == pytest.approx(262.5 * LBF * FT, rel=1e-9)
    assert any("2 identical members" in c for c in r.cautions)


def test_fish_tank_stand_rail_through_the_cli(tmp_path):
    # worked by hand: a filled 75 gal tank is about 850 lb all in (from memory: 75 gal x
    # 8.34 lb/gal of water is 625 lb, plus glass, gravel and lid) on a 48 in long stand with
    # a front and a back rail: each rail carries 425 lbf over 4 ft: R = 212.5 lbf and
    # M = WL/8 = 425 x 4 / 8 = 212.5 lbf*ft
    text = job("Fish-tank stand rail", "48 in",
               '[[loads]]\ntype = "uniform"\ntotal = "-850 lb"\n', members="members = 2")
    p = tmp_path / "tank.toml"
    p.write_text(text)
    out = subprocess.run([sys.executable, "-m", "shopbeam", "solve", str(p), "--json"],
                         capture_output=True, text=True, timeout=120)
    assert out.returncode == 0, out.stderr
    d = json.loads(out.stdout)
    assert d["reactions"][0]["force"] == pytest.approx(212.5 * LBF, rel=1e-9)
    assert d["extremes"]["moment"]["max"] == pytest.approx(212.5 * LBF * FT, rel=1e-9)
    assert d["members"] == 2
    rep = subprocess.run([sys.executable, "-m", "shopbeam", "solve", str(p)],
                         capture_output=True, text=True, timeout=120)
    assert "2 identical members share the loads" in rep.stdout


def test_area_load_without_width_is_refused_with_the_reason():
    text = job("Deck joist", "12 ft", '[[loads]]\ntype = "uniform"\nvalue = "-125 psf"\n')
    with pytest.raises(InputErrors) as e:
        parse_job_text(text, "deck.toml")
    assert "loads[0].width" in str(e.value) and "tributary width" in str(e.value)


def test_a_width_that_is_not_a_length_beside_a_line_load_is_a_problem():
    # a stray word in width is a mistake to mend, not a width that is merely ignored
    text = job("Shelf", "8 ft", '[[loads]]\ntype = "uniform"\nvalue = "-60 lbf/ft"\n'
               'width = "wind uplift (suction)"\n')
    with pytest.raises(InputErrors) as e:
        parse_job_text(text, "shelf.toml")
    assert "loads[0].width" in str(e.value) and "wind uplift" in str(e.value)
    # a length there is only warned as ignored, as before
    ok = parse_job_text(text.replace("wind uplift (suction)", "16 in"), "shelf.toml")
    assert any(p.key == "loads[0].width" and "ignored" in p.message for p in ok.warnings)


def test_total_and_value_together_is_refused():
    text = job("x", "6 ft", '[[loads]]\ntype = "uniform"\ntotal = "-700 lbf"\nvalue = "-5 lbf/ft"\n')
    with pytest.raises(InputErrors, match="either value"):
        parse_job_text(text)


def test_uniform_load_defaults_to_the_whole_beam():
    j = parse_job_text(job("x", "6 ft", '[[loads]]\ntype = "uniform"\nvalue = "-10 lbf/ft"\n'))
    assert j.loads[0].start == 0.0 and j.loads[0].end == pytest.approx(6 * FT)
