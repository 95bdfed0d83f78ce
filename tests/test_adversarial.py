"""The adversarial shapes through the command line: each answered or refused, exit 0 or 2,
nothing on stderr but the refusal (no warning, no traceback), the refusal naming the file,
no answer with a failed self-check, no control character on the terminal. Fixed recipes
(tests/adversarial.py), so every run is the same."""

from __future__ import annotations

import json
import re
import subprocess
import sys

import pytest

from adversarial import CASES
from jobtext import demo_reactions_without_offcuts

R1, R2 = demo_reactions_without_offcuts()

CONTROL = re.compile("[\x00-\x08\x0b-\x1f\x7f-\x9f]")


@pytest.mark.parametrize("name", sorted(CASES))
def test_adversarial_job_is_answered_soundly_or_refused(tmp_path, name):
    p = tmp_path / "job.toml"
    p.write_text(CASES[name], encoding="utf-8")
    for argv in (["solve", "--json"], ["check"], ["solve"]):
        r = subprocess.run([sys.executable, "-m", "shopbeam", *argv, str(p)],
                           capture_output=True, text=True, timeout=120)
        assert r.returncode in (0, 2), (name, argv, r.stderr[-2000:])
        assert "Traceback" not in r.stderr and "Warning" not in r.stderr, (name, r.stderr)
        assert not CONTROL.search(r.stdout + r.stderr), name
        if r.returncode == 2:
            assert str(p) in r.stderr, (name, r.stderr)
        elif argv == ["solve", "--json"]:
            data = json.loads(r.stdout)
            bad = [d for d in data["diagnostics"] if not d["ok"] and "magnitude" not in d["name"]]
            assert not bad, (name, bad)
        else:
            assert r.stderr == "" or argv == ["check"], (name, r.stderr)
    codes = {a: subprocess.run([sys.executable, "-m", "shopbeam", a, str(p)],
                               capture_output=True, timeout=120).returncode
             for a in ("check", "solve")}
    assert codes["check"] == codes["solve"], (name, codes)  # check and solve agree


def test_the_ramp_a_hair_long_answers_the_right_reactions(tmp_path):
    p = tmp_path / "job.toml"
    p.write_text(CASES["ramp a hair long"])
    r = subprocess.run([sys.executable, "-m", "shopbeam", "solve", "--json", str(p)],
                       capture_output=True, text=True)
    forces = [x["force"] / 4.4482216152605 for x in json.loads(r.stdout)["reactions"]]
    assert abs(forces[0] - R1) < 0.01 and abs(forces[1] - R2) < 0.01


def test_the_wheel_bound_answers_the_largest_sets_and_refuses_one_more(tmp_path):
    from adversarial import wheels

    from shopbeam.jobs.limits import MAX_WHEELS, MOVING_WORK, moving_work

    def run(text, *argv):
        p.write_text(text, encoding="utf-8")
        return subprocess.run([sys.executable, "-m", "shopbeam", *argv, str(p)],
                              capture_output=True, text=True, timeout=120)

    p = tmp_path / "job.toml"
    # a simple span (fixed positions {0, 100 ft} and the end: 3, no support inside): the
    # search is linear in wheels there, so the wheel cap is what stops a set
    assert MAX_WHEELS == 200 and moving_work(200, 3) <= MOVING_WORK
    r = run(wheels(200).replace('"7 in"', '"6 in"'), "solve", "--json")
    assert r.returncode == 0, r.stderr[-1500:]
    r = run(wheels(201).replace('"7 in"', '"5.9 in"'), "solve")
    assert r.returncode == 2 and "201 wheels is more than shopbeam takes" in r.stderr
    # a spring at mid-span (4 fixed positions, 1 support inside): each wheel crossing it
    # starts a strip of the travel, so the search bound stops the set at 57 wheels
    assert moving_work(57, 4, 1) <= MOVING_WORK < moving_work(58, 4, 1)
    r = run(wheels(57, springs_n=1), "solve", "--json")
    assert r.returncode == 0, r.stderr[-1500:]
    r = run(wheels(58, springs_n=1), "solve")
    assert r.returncode == 2 and "58 wheels" in r.stderr and "units of search" in r.stderr
    assert str(p) in r.stderr and "moving[0].loads" in r.stderr


def _shelf(spans: int, per_span: int = 1) -> str:
    # a continuous shelf rail, 4 ft bays, every bay carrying `per_span` patterned loads
    t = (f'schema = 1\ntitle = "shelf"\ntags = ["shelf"]\n[beam]\nlength = "{4 * spans} ft"\n'
         'section = "W8x18"\nmaterial = "A992"\nbraced = true\n')
    for i in range(spans + 1):
        t += f'[[supports]]\nat = "{4 * i} ft"\ntype = "{"pin" if i == 0 else "roller"}"\n'
    for i in range(spans):
        for j in range(per_span):
            a = 4 * i + 4 * j / per_span
            t += (f'[[loads]]\ntype = "uniform"\nstart = "{a:g} ft"\nend = '
                  f'"{a + 4 / per_span:g} ft"\nvalue = "-100 lbf/ft"\npatterned = true\n')
    return t


def test_the_pattern_bound_answers_inside_it_and_refuses_past_it(tmp_path):
    from shopbeam.jobs.limits import PATTERN_WORK, SIZE_PATTERN_WORK

    def run(text, *argv):
        p.write_text(text, encoding="utf-8")
        return subprocess.run([sys.executable, "-m", "shopbeam", *argv, str(p)],
                              capture_output=True, text=True, timeout=120)

    p = tmp_path / "shelf.toml"
    # patterned spans x (spans + patterned loads): 100 x (100 + 100) inside, 199 x 398 past
    assert 100 * 200 <= PATTERN_WORK < 199 * 398
    assert run(_shelf(100), "check").returncode == 0
    r = run(_shelf(199), "solve")
    assert r.returncode == 2 and "units of work" in r.stderr and str(p) in r.stderr
    # sizing: patterned spans x spans x sections; 25 spans over the W shapes inside, 50 not
    from shopbeam.members import catalog
    n_w = len(catalog.list_sections("W"))
    assert 25 * 25 * n_w <= SIZE_PATTERN_WORK < 50 * 50 * n_w
    r = run(_shelf(50), "size", "--kind", "W")
    assert r.returncode == 2 and "--kind" in r.stderr and str(p) in r.stderr
    assert r.stdout == ""


def test_a_wheel_set_beside_patterned_loads_counts_the_search_once_per_pattern(tmp_path):
    # a train near the search bound plus patterned loads took 8.8 s for rating: the search
    # runs once per patterned span (and once more), so that product is bounded
    from adversarial import wheels

    from shopbeam.jobs.limits import PATTERN_MOVING_WORK, moving_work
    pattern = ('[[loads]]\ntype = "uniform"\nstart = "0 ft"\nend = "100 ft"\n'
               'value = "-10 lbf/ft"\npatterned = true\n')
    p = tmp_path / "job.toml"
    # 57 wheels over a spring at mid-span: inside the bound alone, past it with the pattern
    assert moving_work(57, 4, 1) * 4 > PATTERN_MOVING_WORK >= moving_work(4, 4, 1) * 4
    p.write_text(wheels(57, springs_n=1) + pattern, encoding="utf-8")
    r = subprocess.run([sys.executable, "-m", "shopbeam", "check", str(p)],
                       capture_output=True, text=True, timeout=120)
    assert r.returncode == 2 and "patterned" in r.stderr and "moving[0].loads" in r.stderr
    p.write_text(wheels(4, springs_n=1) + pattern, encoding="utf-8")
    r = subprocess.run([sys.executable, "-m", "shopbeam", "check", str(p)],
                       capture_output=True, text=True, timeout=120)
    assert r.returncode == 0, r.stderr
