"""Loads and spans only a hair long: answered right (against an exact rational solve) or
refused, never answered wrong.

Positions closer than a billionth of the length share one break in the solver; a distributed
load whose ends move keeps its resultant, and one whose ends merge becomes its resultant point
load, so a merge moves no force further than that billionth. The reference for the demo (a
determinate beam: pin, roller, overhang) is statics in exact rational arithmetic (Python
fractions) on exactly the floats the solver sees; for the continuous shelf (indeterminate) it
is the calc sheet's exact sympy solve.
"""

from __future__ import annotations

import json
import subprocess
import sys
import warnings
from dataclasses import replace
from fractions import Fraction as F
from pathlib import Path

import pytest

from shopbeam.engine.model import Load
from shopbeam.engine.solver import solve
from shopbeam.jobs.jobfile import parse_job_text
from jobtext import demo_reactions_without_offcuts

R1, R2 = demo_reactions_without_offcuts()

PRESETS = Path(__file__).resolve().parents[1] / "shopbeam" / "presets"
FT = 0.3048


def demo_with(end: str, start: str = "2 ft", kind: str = "linear") -> str:
    text = (PRESETS / "demo.toml").read_text()
    text = text.replace('start = "2 ft"\nend = "8 ft"', f'start = "{start}"\nend = "{end}"')
    if kind == "uniform":
        text = text.replace('type = "linear"', 'type = "uniform"').replace(
            'value = ["0 lbf/ft", "-200 lbf/ft"]', 'value = "-200 lbf/ft"')
    return text


def statics(beam) -> list[F]:
    """Exact reactions of a beam on two supports (no hinges): vertical forces and moments
    about the first support, each load integrated exactly."""
    (a, _), (b, _) = [(F(s.at), s.kind) for s in beam.supports]
    fy = mz = F(0)
    for ld in beam.loads:
        if ld.kind == "point":
            fy += F(ld.value)
            mz += F(ld.value) * (F(ld.at) - a)
        elif ld.kind == "moment":
            mz += F(ld.value)
        else:
            s, e = F(ld.start), F(ld.end)
            w1 = F(ld.w1)
            w2 = w1 if ld.kind == "uniform" else F(ld.w2)
            ln = e - s
            fy += (w1 + w2) / 2 * ln
            # w(x) = w1 + (w2 - w1) t / ln over t in [0, ln]: moment about a
            mz += w1 * ln * (s - a + ln / 2) + (w2 - w1) * ln * ((s - a) / 2 + ln / 3)
    rb = -mz / (b - a)
    return [-fy - rb, rb]


SLIVERS = ["2.000000001 ft", "2.0000000001 ft", "2.00000001 ft", "2.0000001 ft",
           "2.000001 ft", "2.00001 ft", "2.000000000001 ft"]
# multiples of the merge distance (1e-9 of the 15 ft length) around the line
SLIVERS += [f"{2 + k * 15e-9:.17g} ft" for k in (0.3, 0.5, 0.9, 0.99, 1.01, 1.1, 1.5, 1.9, 2.1, 3)]


@pytest.mark.parametrize("kind", ["linear", "uniform"])
@pytest.mark.parametrize("end", SLIVERS)
def test_sliver_load_on_the_demo_matches_exact_statics(end, kind):
    job = parse_job_text(demo_with(end, kind=kind), "demo.toml")
    beam = job.beam()
    with warnings.catch_warnings():
        warnings.simplefilter("error")  # no numpy warning may escape
        sol = solve(beam)
    ref = statics(beam)
    scale = max(abs(float(r)) for r in ref)
    got = [r.force for r in sol.reactions]
    for g, r in zip(got, ref):
        assert abs(g - float(r)) <= 1e-8 * scale, (end, got, [float(x) for x in ref])
    assert all(d.ok for d in sol.diagnostics), [d for d in sol.diagnostics if not d.ok]


def test_the_demo_with_its_ramp_ending_a_hair_past_its_start_answers_2107_and_4312():
    # the sliver carries next to nothing, so the reactions are the demo's without the pipe
    # offcuts: by statics (jobtext.demo_reactions_without_offcuts), about 2107 and 4312 lbf
    job = parse_job_text(demo_with("2.000000001 ft"), "demo.toml")
    r = [x.force / 4.4482216152605 for x in solve(job.beam()).reactions]
    assert abs(r[0] - R1) < 0.01 and abs(r[1] - R2) < 0.01, r


@pytest.mark.parametrize("end", ["1e-308 ft", "1e-320 ft", "1e-200 ft", "1e-12 ft"])
def test_ramp_to_next_to_nothing_from_zero_is_finite_and_quiet(end):
    job = parse_job_text(demo_with(end, start="0 ft"), "demo.toml")
    with warnings.catch_warnings():
        warnings.simplefilter("error")
        sol = solve(job.beam())
    ref = statics(job.beam())
    for g, r in zip((x.force for x in sol.reactions), ref):
        assert abs(g - float(r)) <= 1e-8 * abs(float(r))
    assert all(d.ok for d in sol.diagnostics)


def test_sliver_ramp_via_the_command_line_is_right_and_stderr_is_clean(tmp_path):
    p = tmp_path / "sliver.toml"
    p.write_text(demo_with("1e-308 ft", start="0 ft"))
    run = subprocess.run([sys.executable, "-m", "shopbeam", "solve", "--json", str(p)],
                         capture_output=True, text=True)
    # stderr holds the input warnings only (one line each: the sliver is named), nothing else
    assert run.returncode == 0, run.stderr
    assert all(": warning: " in line for line in run.stderr.splitlines()), run.stderr
    assert "Traceback" not in run.stderr
    data = json.loads(run.stdout)
    assert all(d["ok"] for d in data["diagnostics"])
    assert abs(data["reactions"][0]["force"] / 4.4482216152605 - R1) < 0.01


@pytest.mark.parametrize("frac", [0.4e-9, 0.9e-9, 1.1e-9, 2.5e-9])
def test_sliver_ramp_on_a_continuous_beam_matches_the_exact_sympy_solve(frac):
    pytest.importorskip("sympy")
    from shopbeam.output.calcsheet import exact_solve

    job = parse_job_text((PRESETS / "continuous-shelf.toml").read_text(), "shelf.toml")
    beam = job.beam()
    L = beam.length
    ramp = Load("linear", start=0.3 * L, end=0.3 * L + frac * L, w1=-3000.0, w2=-9e5)
    beam = replace(beam, loads=tuple(beam.loads) + (ramp,))
    ex = exact_solve(beam)
    ref = [float(ex.solution[u]) for u in ex.unknowns if str(u).startswith("R")]
    got = [r.force for r in sorted(solve(beam).reactions, key=lambda r: r.at)]
    scale = max(abs(v) for v in ref)
    assert max(abs(g - r) for g, r in zip(got, ref)) <= 1e-7 * scale, (got, ref)


STRADDLE = """schema = 1
title = "sliver across a support"
tags = ["not-lifting"]
[beam]
length = "8 ft"
section = "W8x18"
material = "A992"
self_weight = false
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "2 ft"
type = "roller"
[[loads]]
type = "uniform"
start = "1.999999999 ft"
end = "2.000000001 ft"
value = "-1e6 lbf/ft"
[[loads]]
type = "point"
at = "8 ft"
value = "-100 lbf"
"""


@pytest.mark.parametrize("command", [["solve"], ["capacity"], ["capacity", "--json"],
                                     ["rating"], ["size", "--kind", "W"]])
def test_a_job_whose_answer_fails_its_self_check_is_refused_by_every_command(tmp_path,
                                                                            command):
    # a sliver of load straddling a support: whether or not a command's own solves pass,
    # the job's answer does not, so none of them may print figures from it (exit 2, named)
    path = tmp_path / "straddle.toml"
    path.write_text(STRADDLE)
    from shopbeam.engine.solver import failed_checks
    job = parse_job_text(STRADDLE)
    if not failed_checks(solve(job.beam())):
        pytest.skip("this platform's solve passes the self-checks: nothing to refuse")
    out = subprocess.run([sys.executable, "-m", "shopbeam", *command, str(path)],
                         capture_output=True, text=True)
    assert out.returncode == 2 and out.stdout == ""
    assert "straddle.toml" in out.stderr and "self-check" in out.stderr


@pytest.mark.parametrize("command", ["solve", "check", "capacity", "rating", "size"])
def test_an_unstable_beam_is_named_with_its_line_by_every_command(tmp_path, command):
    # the contract: one message naming the file, the key and, where TOML gives one, the line
    path = tmp_path / "unstable.toml"
    path.write_text('schema = 1\ntitle = "one pin"\n[beam]\nlength = "10 ft"\n'
                    'section = "W8x18"\nmaterial = "A992"\n[[supports]]\nat = "0 ft"\n'
                    'type = "pin"\n[[loads]]\ntype = "point"\nat = "5 ft"\nvalue = "-100 lbf"\n')
    out = subprocess.run([sys.executable, "-m", "shopbeam", command, str(path)],
                         capture_output=True, text=True)
    assert out.returncode == 2 and f"{path}:7: supports:" in out.stderr, out.stderr
