"""The real command line on good and bad jobs: exit codes, one clear message, no traceback."""

from __future__ import annotations

import json
import subprocess
import sys
from pathlib import Path

import pytest

DATA = Path(__file__).resolve().parent / "data"
GOOD = (DATA / "cantilever_arm.toml").read_text()


def run(*args, cwd=None):
    return subprocess.run([sys.executable, "-m", "shopbeam", *args], capture_output=True,
                          text=True, cwd=cwd, timeout=120)


def write(tmp_path, text, name="job.toml"):
    p = tmp_path / name
    p.write_text(text)
    return p


def test_solve_prints_a_full_report_with_the_caution():
    r = run("solve", str(DATA / "cantilever_arm.toml"))
    assert r.returncode == 0, r.stderr
    for part in ("REACTIONS", "EXTREMES", "CHECKS", "SELF-CHECKS", "SCREENING CHECK ONLY",
                 "licensed", "PASS"):
        assert part in r.stdout


def test_json_follows_the_contract():
    r = run("solve", str(DATA / "cantilever_arm.toml"), "--json")
    assert r.returncode == 0, r.stderr
    d = json.loads(r.stdout)
    for key in ("schema", "title", "length", "reactions", "extremes", "checks", "governing",
                "diagnostics", "cautions"):
        assert key in d
    assert d["schema"] == 1 and d["length"] == pytest.approx(4 * 0.3048)
    assert {c["name"] for c in d["checks"]} >= {"bending", "shear", "deflection"}
    for c in d["checks"]:
        assert c["ratio"] == pytest.approx(c["demand"] / c["limit"])
    for f in ("shear", "moment", "slope", "deflection"):
        assert set(d["extremes"][f]) == {"max", "max_at", "min", "min_at"}
    r0 = d["reactions"][0]
    assert r0["type"] == "fixed" and r0["at"] == 0.0
    # hand statics (common practice): the fixed end carries every downward load
    assert r0["force"] > 0 and r0["moment"] > 0
    assert all(x["ok"] for x in d["diagnostics"])


def test_the_bending_check_in_json_is_a_stress_as_the_contract_shows(tmp_path):
    # the contract's JSON shows bending in Pa: f = M / S against the allowable stress; on the
    # AISC basis (checked on moments, M against Mn / Omega) the JSON states both as stresses
    # over the extreme fibre's S, the ratio unchanged, the moments kept in params. Simple span,
    # uniform load: M = w L^2 / 8 (common practice)
    text = """schema = 1
title = "rail"
tags = ["not-rack"]
[beam]
length = "10 ft"
section = "HSS4x4x1/4"
material = "A500-C"
self_weight = false
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "10 ft"
type = "roller"
[[loads]]
type = "uniform"
value = "-100 lbf/ft"
"""
    p = write(tmp_path, text)
    for cmd in ("solve", "capacity"):
        d = json.loads(run(cmd, str(p), "--json").stdout)
        bend = next(c for c in d["checks"] if c["name"] == "bending")
        sec = json.loads(run("section", "HSS4x4x1/4", "--json").stdout)
        assert bend["unit"] == "Pa"
        m = 100 * 4.4482216152605 / 0.3048 * (10 * 0.3048) ** 2 / 8
        k = d.get("factor") or 1.0
        assert bend["demand"] == pytest.approx(k * m / sec["sx"], rel=1e-6)
        assert bend["params"]["moment_demand"] == pytest.approx(k * m, rel=1e-6)
        assert bend["ratio"] == pytest.approx(bend["demand"] / bend["limit"])
        assert bend["limit"] * sec["sx"] == pytest.approx(bend["params"]["moment_limit"])


def test_calc_sheet_prints_exact_reactions():
    r = run("solve", str(DATA / "cantilever_arm.toml"), "--calc")
    assert r.returncode == 0, r.stderr
    assert "R1 =" in r.stdout and "<x - 7/2>" in r.stdout
    assert "Numeric engine agrees with this sheet: yes" in r.stdout


BAD = [
    ("force where a length belongs", ('at = "3 ft 6 in"', 'at = "300 lbf"'), "loads[0].at", "a force"),
    ("bare number", ('length = "4 ft"', 'length = "4"'), "beam.length", "bare number"),
    ("negative length", ('length = "4 ft"', 'length = "-4 ft"'), "beam.length", "greater than zero"),
    ("zero length", ('length = "4 ft"', 'length = "0 ft"'), "beam.length", "greater than zero"),
    ("load beyond the end", ('at = "3 ft 6 in"', 'at = "6 ft"'), "loads[0].at", "beyond the end"),
    ("support beyond the end", ('at = "0 ft"\ntype = "fixed"', 'at = "9 ft"\ntype = "fixed"'),
     "supports[0].at", "beyond the end"),
    ("unknown support type", ('type = "fixed"', 'type = "clamp"'), "supports[0].type", "not a support type"),
    ("bad TOML", ('title = "Test', 'title = Test'), "", "not valid TOML"),
    ("newer schema", ("schema = 1", "schema = 7"), "schema", "newer shopbeam"),
    ("unstable", ('type = "fixed"', 'type = "roller"'), "", "can rotate about its only support"),
]


@pytest.mark.parametrize("what, change, key, words", BAD, ids=[b[0] for b in BAD])
def test_bad_input_exits_2_with_one_clear_message(tmp_path, what, change, key, words):
    old, new = change
    assert old in GOOD
    p = write(tmp_path, GOOD.replace(old, new, 1))
    r = run("solve", str(p))
    assert r.returncode == 2
    assert "Traceback" not in r.stderr and r.stdout == ""
    assert words in r.stderr
    assert str(p) in r.stderr
    if key:
        assert key in r.stderr


def test_line_numbers_are_given(tmp_path):
    p = write(tmp_path, GOOD.replace('at = "3 ft 6 in"', 'at = "300 lbf"'))
    r = run("solve", str(p))
    line = next(i for i, t in enumerate(p.read_text().splitlines(), 1) if '"300 lbf"' in t)
    assert f"{p}:{line}: loads[0].at" in r.stderr


def test_every_problem_in_one_pass(tmp_path):
    text = GOOD.replace('length = "4 ft"', 'length = "4"').replace('value = "-300 lbf"', 'value = "-300 ft"')
    r = run("check", str(write(tmp_path, text)))
    assert r.returncode == 2
    assert "beam.length" in r.stderr and "loads[0].value" in r.stderr
    assert "2 problems" in r.stderr


def test_typo_in_a_key_warns_with_the_nearest_key(tmp_path):
    text = GOOD.replace('label = "bundle"', 'lable = "bundle"')
    r = run("check", str(write(tmp_path, text)))
    assert r.returncode == 0
    assert "unknown key 'lable'" in r.stderr and "did you mean 'label'" in r.stderr


@pytest.mark.parametrize("command", ["solve", "capacity"])
def test_with_json_an_input_warning_goes_to_stderr_and_stdout_stays_the_json(tmp_path, command):
    job = write(tmp_path, GOOD.replace('label = "bundle"', 'lable = "bundle"'))
    r = run(command, str(job), "--json")
    assert r.returncode == 0
    data = json.loads(r.stdout)  # stdout is the JSON alone
    assert any("lable" in w for w in data["warnings"])
    assert "unknown key 'lable'" in r.stderr and "job.toml" in r.stderr
    clean = run(command, str(write(tmp_path, GOOD, "clean.toml")), "--json")
    assert clean.returncode == 0 and clean.stderr == ""  # nothing to say: nothing said


def test_missing_file_and_two_hinges_in_one_span(tmp_path):
    r = run("solve", str(tmp_path / "nope.toml"))
    assert r.returncode == 2 and "no such job file" in r.stderr
    text = GOOD.replace('[[supports]]\nat = "0 ft"\ntype = "fixed"',
                        '[[supports]]\nat = "0 ft"\ntype = "pin"\n\n[[supports]]\nat = "4 ft"\n'
                        'type = "roller"\n\n[[supports]]\nat = "1 ft"\ntype = "hinge"\n\n'
                        '[[supports]]\nat = "2 ft"\ntype = "hinge"')
    r = run("solve", str(write(tmp_path, text)))
    assert r.returncode == 2 and "Traceback" not in r.stderr
    assert "hinges at 1 ft and 2 ft are in one span" in r.stderr


def test_help_lists_the_commands():
    r = run("--help")
    assert r.returncode == 0
    for cmd in ("solve", "check", "capacity", "rating", "size", "section", "shapes"):
        assert cmd in r.stdout


def test_size_from_the_bundled_stock_list_ranks_by_weight_and_price():
    root = Path(__file__).resolve().parents[1]
    r = run("size", str(root / "presets" / "pallet-rack-beam-pair.toml"),
            "--stock", str(root / "presets" / "stock" / "quillhaven-stock.csv"), "--json")
    assert r.returncode == 0, r.stderr
    d = json.loads(r.stdout)
    assert d["swept"] == 13 and d["passing"]
    # the lightest passing row is the lightest of all passing rows; the cheapest likewise
    rows = d["passing"]
    assert d["lightest"] == min(rows, key=lambda x: x["mass_per_length"])["designation"]
    priced = [x for x in rows if x.get("price_per_m") is not None]
    assert d["cheapest"] == min(priced, key=lambda x: x["price_per_m"] * 1.0)["designation"]


def test_patterned_shelf_reports_the_uplift_of_the_governing_pattern():
    # AISC Manual Table 3-23, case 30 (two equal spans, uniform load on one span; from
    # memory): the far end of the empty span pulls down by wl/16. The preset: 100 psf x 18 in
    # = 150 lbf/ft on two rails (75 lbf/ft each), l = 5 ft, plus the rail's own weight on
    # both spans, area x density: HSS2x1x1/8 A = 0.608 in^2 (AISC Shapes Database v15.0) x
    # 490 lb/ft^3 = 2.069 lbf/ft (case 29: 3wl/8 up at the end): -75 x 5/16 + 3 x 2.069 x 5/8
    # = -19.56 lbf
    root = Path(__file__).resolve().parents[1]
    r = run("solve", str(root / "presets" / "continuous-shelf.toml"))
    assert r.returncode == 0, r.stderr
    text = r.stdout
    # the two one-span patterns are mirror images: either may be named as governing
    line = next(ln for ln in text.splitlines() if "uplift" in ln)
    assert "-19.56 lbf" in line
    far, loaded = ("0 ft", "5 ft-10 ft") if "at 0 ft" in line else ("10 ft", "0 ft-5 ft")
    assert f"at {far}" in line and f"patterned loads on span {loaded}" in text
    # the reaction envelope: each end support's largest uplift over every pattern
    env = text[text.index("REACTION ENVELOPE"):text.index("EXTREMES")]
    assert env.count("largest down -19.56 lbf  (uplift)") == 2
    # the middle support only ever pushes up: its other end is the least push, with the
    # patterned loads off, 10/8 x 2.069 x 5 = 12.93 lbf (case 29, from memory), never "down"
    mid = next(ln for ln in env.splitlines() if "at 5 ft" in ln)
    assert "least up 12.93 lbf  (no uplift)" in mid and "down" not in mid


def test_json_of_a_patterned_job_carries_the_governing_state():
    # same case as above (AISC Manual Table 3-23, case 30, from memory): uplift wl/16 at the
    # end of the empty span, less the rail's own weight; in SI for the JSON
    root = Path(__file__).resolve().parents[1]
    r = run("solve", str(root / "presets" / "continuous-shelf.toml"), "--json")
    d = json.loads(r.stdout)
    g = d["governing_state"]
    assert "patterned loads on" in g["words"]
    # (mirror patterns tie: the uplift is at whichever end the governing pattern leaves empty)
    assert min(g["reactions"][0]["force"], g["reactions"][-1]["force"]) == pytest.approx(
        -19.56 * 4.4482216152605, rel=2e-3)
    env = d["reaction_envelope"]
    assert [e["at"] for e in env] == [x["at"] for x in d["reactions"]]
    for e in (env[0], env[-1]):
        assert e["max_down"] == pytest.approx(-19.56 * 4.4482216152605, rel=2e-3)
        assert "patterned loads on span" in e["max_down_state"]
    # the loads as entered (all spans loaded) stay the contract's reactions: no uplift there
    assert d["reactions"][0]["force"] > 0


def test_an_unstable_layout_names_the_file_and_the_supports_line(tmp_path):
    p = tmp_path / "cant.toml"
    p.write_text('schema = 1\ntitle = "arm"\n[beam]\nlength = "4 ft"\nsection = "W8x18"\n'
                 'material = "A992"\n[[supports]]\nat = "0 ft"\ntype = "pin"\n')
    r = subprocess.run([sys.executable, "-m", "shopbeam", "solve", str(p)], capture_output=True,
                       text=True, timeout=120)
    assert r.returncode != 0 and f"{p}:7: supports: unstable beam" in r.stderr
