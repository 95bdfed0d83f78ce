"""Load states: pattern loading on continuous beams and moving point loads."""

from __future__ import annotations

from pathlib import Path

import numpy as np
import pytest

from shopbeam.design.capacity import capacity
from shopbeam.errors import InputErrors
from shopbeam.jobs.jobfile import parse_job_text
from shopbeam.design.loading import (candidate_positions, envelope_bruteforce, evaluate,
                              state_set)
from shopbeam.engine.solver import solve

LBF, FT = 4.4482216152605, 0.3048

THREE_SPANS = """schema = 1
title = "Three-span shelf rail"
[beam]
length = "30 ft"
section = "HSS4x4x1/4"
material = "A500-C"
self_weight = false
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "10 ft"
type = "roller"
[[supports]]
at = "20 ft"
type = "roller"
[[supports]]
at = "30 ft"
type = "roller"
[[loads]]
type = "uniform"
start = "0 ft"
end = "30 ft"
value = "-100 lbf/ft"
patterned = true
"""


def _span_max(sol, a, b):
    return sol.moment.extremes(a, b).max


def test_three_span_patterns_match_the_known_worst_cases():
    # common practice (continuous-beam coefficient tables, from memory): equal spans L,
    # patterned uniform w: support moment worst with the two adjacent spans loaded,
    # -0.1167 wL^2 (all loaded: -0.100); end-span moment worst with alternate spans (1 and 3)
    # loaded, +0.1013 wL^2 (all loaded: +0.080); centre span worst with only it loaded, +0.075
    job = parse_job_text(THREE_SPANS)
    ss = state_set(job)
    w, L = 100 * LBF / FT, 10 * FT
    assert len(ss.patterns) == 8
    mb = {p: ss.state(1.0, p).moment(L) for p in ss.patterns}
    worst_b = min(mb, key=mb.get)
    assert set(worst_b) == {0, 1}
    assert mb[worst_b] / (w * L**2) == pytest.approx(-0.11667, abs=2e-4)
    assert mb[(0, 1, 2)] / (w * L**2) == pytest.approx(-0.100, abs=1e-9)
    m1 = {p: _span_max(ss.state(1.0, p), 0, L) for p in ss.patterns}
    worst_1 = max(m1, key=m1.get)
    assert worst_1 == (0, 2)
    assert m1[worst_1] / (w * L**2) == pytest.approx(0.10125, abs=2e-4)
    assert m1[(0, 1, 2)] / (w * L**2) == pytest.approx(0.080, abs=2e-4)
    m2 = {p: _span_max(ss.state(1.0, p), L, 2 * L) for p in ss.patterns}
    assert max(m2, key=m2.get) == (1,)
    assert m2[(1,)] / (w * L**2) == pytest.approx(0.075, abs=2e-4)


def test_pattern_states_equal_a_direct_solve():
    # superposition check: a pattern state equals the beam solved with only those spans loaded
    job = parse_job_text(THREE_SPANS)
    ss = state_set(job)
    st = ss.state(1.7, (0, 2))
    from dataclasses import replace

    from shopbeam.engine.model import Load

    w = -100 * LBF / FT * 1.7
    loads = (Load("uniform", start=0, end=10 * FT, w1=w), Load("uniform", start=20 * FT, end=30 * FT, w1=w))
    direct = solve(replace(ss.beam, loads=loads))
    xs = np.linspace(0, 30 * FT, 301)
    for name in ("shear", "moment", "deflection"):
        a, b = st.function(name)(xs), direct.function(name)(xs)
        assert np.max(np.abs(a - b)) <= 1e-9 * np.max(np.abs(b))


def test_evaluation_reports_the_worst_pattern_per_check():
    job = parse_job_text(THREE_SPANS)
    ev = evaluate(job)
    bend = next(c for c in ev.checks if c.name == "bending")
    assert set(ev.worst["bending"]["pattern"]) in ({0, 1}, {1, 2})
    assert bend.state and "worst state: " + bend.state in bend.as_dict()["detail"]
    w, L = 100 * LBF / FT, 10 * FT
    assert bend.demand == pytest.approx(0.11667 * w * L**2, rel=2e-3)


MOVING = """schema = 1
title = "Monorail with overhang"
tags = ["lifting"]
[beam]
length = "20 ft"
section = "W8x18"
material = "A992"
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "{b} ft"
type = "roller"
{more}
[[loads]]
type = "uniform"
start = "0 ft"
end = "20 ft"
value = "-30 lbf/ft"
case = "dead"
[[moving]]
label = "trolley"
loads = ["-1000 lbf", "-1000 lbf"]
dead = ["-60 lbf", "-60 lbf"]
spacing = ["{s}"]
"""


@pytest.mark.parametrize("b, more, s", [
    (20, "", "18 in"),
    (14, "", "18 in"),
    (9, '[[supports]]\nat = "20 ft"\ntype = "roller"', "5 ft"),
])
def test_moving_envelope_matches_a_fine_resolve(b, more, s):
    # test oracle only: the same checks re-solved at 601 evenly spaced trolley positions;
    # the exact envelope may only be (slightly) worse, never better; then re-solved on a
    # fine local grid around the exact worst position, where it must agree closely
    job = parse_job_text(MOVING.format(b=b, more=more, s=s))
    ev = evaluate(job)
    bf = envelope_bruteforce(job, 1.0, 601)
    for c in ev.checks:
        if c.name not in ("bending", "shear", "deflection"):
            # local checks (J10 at supports and wheels): their limit depends on where the
            # force acts, so compare the worst ratio
            ref = bf[c.name][2]
            # the lateral trolley force check (H1-1b, a sum of two moment ratios) is taken at
            # the positions found for the vertical response; its own worst position can lie
            # between them, within 2e-4 of its ratio here (stated in the report)
            low = 2e-4 if c.name == "lateral trolley force" else 1e-12
            assert ref * (1 - low) <= c.ratio <= ref * (1 + 3e-3)
            continue
        ref = bf[c.name][0]
        assert c.demand >= ref * (1 - 1e-12)
        assert c.demand <= ref * (1 + 3e-3)
    from dataclasses import replace

    from shopbeam.design.checks import checks_for, impact_of, strengths
    from shopbeam.engine.model import Load

    ss = state_set(job)
    st = strengths(job, beam=ss.beam)
    mv = ss.parts.moving[0]
    lo, hi = mv.p_range
    for c in ev.checks:
        p0 = ev.worst[c.name]["position"]
        if p0 is None:  # local checks at the supports: each reaction at its exact extremes
            assert "reaction envelope" in ev.worst[c.name]["words"]
            continue
        best = 0.0
        for p in np.clip(np.linspace(p0 - 0.01, p0 + 0.01, 81), lo, hi):
            wheels = tuple(Load("point", at=p + o, value=d + (1 + impact_of(job)) * f,
                                key=mv.key)
                           for o, f, d in zip(mv.offsets, mv.live, mv.dead))
            sol = solve(replace(ss.beam, loads=tuple(ss.static_loads(1.0, ())) + wheels))
            best = max(best, next(x for x in checks_for(job, sol, st, cb_one=True)
                                  if x.name == c.name).demand)
        low = 2e-4 if c.name == "lateral trolley force" else 1e-12
        assert c.demand >= best * (1 - low)
        assert c.demand <= best * (1 + 2e-4)


def test_two_wheels_on_a_simple_span_classic_result():
    # common practice (classic moving-load result): two equal loads P at spacing a on a simple
    # span L (a < 0.586 L): absolute max moment P (L - a/2)^2 / (2 L), under a wheel placed
    # a/4 from midspan; one load alone: PL/4
    text = MOVING.format(b=20, more="", s="4 ft").replace('value = "-30 lbf/ft"', 'value = "0 lbf/ft"')
    text = text.replace('tags = ["lifting"]', "tags = []").replace('dead = ["-60 lbf", "-60 lbf"]', "")
    text = text.replace("[beam]", "[beam]\nself_weight = false")
    job = parse_job_text(text)
    ev = evaluate(job)
    P, L, a = 1000 * LBF, 20 * FT, 4 * FT
    bend = next(c for c in ev.checks if c.name == "bending")
    assert bend.demand == pytest.approx(P * (L - a / 2) ** 2 / (2 * L), rel=1e-9)
    assert bend.at == pytest.approx(L / 2 - a / 4, abs=1e-6) or bend.at == pytest.approx(L / 2 + a / 4, abs=1e-6)


def test_moving_candidates_are_few_and_inside_the_travel():
    job = parse_job_text(MOVING.format(b=14, more="", s="18 in"))
    ss = state_set(job)
    cands = candidate_positions(job, ss, ss.static_loads(1.0, ()), 1.0)
    lo, hi = ss.parts.moving[0].p_range
    assert all(lo - 1e-12 <= p <= hi + 1e-12 for p in cands)
    assert len(cands) < 400


def test_capacity_with_a_moving_load_is_exact():
    job = parse_job_text(MOVING.format(b=14, more="", s="18 in"))
    res = capacity(job)
    assert max(c.ratio for c in res.checks) == pytest.approx(1.0, abs=1e-9)
    assert all(c.ratio <= 1.0 for c in res.checks)


@pytest.mark.parametrize("bad, key", [
    ('spacing = ["18 in", "2 ft"]', "moving[0].spacing"),
    ('travel = ["0 ft", "30 ft"]', "moving[0].travel"),
    ('wheels = 2', "moving[0].wheels"),
])
def test_moving_table_errors_name_the_key(bad, key):
    text = MOVING.format(b=14, more="", s="18 in")
    if bad.startswith("spacing"):
        text = text.replace('spacing = ["18 in"]', bad)
    else:
        text = text.replace('spacing = ["18 in"]', 'spacing = ["18 in"]\n' + bad)
    # the reader finds it with the rest of the file (line included), not the analysis later
    with pytest.raises(InputErrors) as e:
        parse_job_text(text)
    assert [p.key for p in e.value.problems if not p.warning] == [key]
    assert e.value.problems[0].line is not None


def test_trolley_with_a_hung_load_checks_never_below_a_fine_resolve():
    # a hoist on a beam clamp (a point load hung from the bottom flange) beside the trolley:
    # its flange check reads the moment at the clamp, worst at some trolley position; the
    # exact positions must reach at least what re-solves at 401 positions find
    text = (Path(__file__).resolve().parent.parent / "presets" / "monorail-trolley.toml"
            ).read_text().replace("[criteria]", '[[loads]]\ntype = "point"\nat = "5 ft"\n'
                                  'value = "-1500 lbf"\nflange = "bottom"\n\n[criteria]')
    job = parse_job_text(text)
    assert job.hung
    ev = evaluate(job)
    bf = envelope_bruteforce(job, 1.0, 401)
    for c in ev.checks:
        assert c.ratio >= bf[c.name][2] * (1 - 1e-12), c.name
        assert c.ratio <= bf[c.name][2] * (1 + 3e-3), c.name


TRAIN = """schema = 1
title = "Rail with a parked load and a wheel train"
units = "us"
[beam]
length = "20 ft"
section = "W8x18"
material = "A992"
[[supports]]
at = "0 ft"
type = "pin"
bearing = "12 in"
[[supports]]
at = "20 ft"
type = "roller"
bearing = "12 in"
[[loads]]
type = "point"
at = "{a} ft"
value = "-3000 lbf"
[[loads]]
type = "point"
at = "13 ft"
value = "-2500 lbf"
[[moving]]
label = "train"
loads = [{loads}]
spacing = [{spacing}]
travel = ["2 ft", "18 ft"]
"""


def _train(n, heavy=(), a=7.0):
    loads = ", ".join('"-4000 lbf"' if i in heavy else '"-1500 lbf"' for i in range(n))
    return parse_job_text(TRAIN.format(a=a, loads=loads, spacing=", ".join(['"9 in"'] * (n - 1))))


@pytest.mark.parametrize("heavy, a", [((), 7.0), ((3,), 7.0), ((0, 5), 7.0), ((2,), 7.75)])
def test_wheel_train_local_checks_match_resolves_with_every_wheel_on_each_load(heavy, a):
    # a wheel on a parked point load adds to it (web yielding and crippling read the sum);
    # the envelope places only the first and last wheel of each class of equal wheels there
    # (and every position with wheels on both parked loads: 7.75 ft and 13 ft are 7 gaps of
    # 9 in apart), so the oracle re-solves with every wheel on each load, and on a fine grid
    from dataclasses import replace

    from shopbeam.design.checks import checks_for, strengths as strengths_of
    from shopbeam.design.loading import read_moving
    from shopbeam.engine.model import Load

    job = _train(8, heavy, a)
    ev = evaluate(job)
    ss = state_set(job)
    st_ = strengths_of(job, beam=ss.beam)
    mv = read_moving(job)[0]
    lo, hi = mv.p_range
    kk = 1.0 + ss.parts.impact
    on = [x - d for x in (a * FT, 13 * FT) for d in mv.offsets if lo <= x - d <= hi]
    worst = {}
    for p in sorted(set(np.linspace(lo, hi, 241).tolist() + on)):
        wheels = tuple(Load("point", at=p + o, value=d + kk * f, key=mv.key)
                       for o, f, d in zip(mv.offsets, mv.live, mv.dead))
        sol = solve(replace(ss.beam, loads=tuple(ss.static_loads(1.0, ())) + wheels))
        for c in checks_for(job, sol, st_, cb_one=True):
            worst[c.name] = max(worst.get(c.name, 0.0), c.ratio)
    local = [c for c in ev.checks if c.name in ("web local yielding", "web crippling")]
    assert len(local) == 2
    # a wheel on a parked load governs (web yielding; crippling at times at a support)
    assert any("train first wheel at" in c.state for c in local)
    for c in local:
        assert c.ratio >= worst[c.name] * (1 - 1e-12)
        assert c.ratio <= worst[c.name] * (1 + 1e-9)


def test_load_states_solved_do_not_grow_with_equal_wheels():
    # a train of equal wheels over parked point loads: the positions solved (the governing
    # ones, the travel ends, a wheel on each parked load) do not grow with the wheels
    counts = {n: evaluate(_train(n)).states for n in (4, 12, 20)}
    assert counts[20] <= counts[4] + 6, counts


LIFT_TRAIN = """schema = 1
title = "Monorail with a long trolley"
units = "us"
tags = ["lifting"]
[beam]
length = "16 ft"
section = "W12x26"
material = "A992"
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "16 ft"
type = "roller"
[[moving]]
label = "trolley"
loads = [{loads}]
dead = [{dead}]
spacing = [{spacing}]
[criteria]
lifting = "powered-monorail"
"""


def _lift_train(n, heavy=()):
    return parse_job_text(LIFT_TRAIN.format(
        loads=", ".join('"-2500 lbf"' if i in heavy else '"-1200 lbf"' for i in range(n)),
        dead=", ".join(['"-40 lbf"'] * n), spacing=", ".join(['"10 in"'] * (n - 1))))


@pytest.mark.parametrize("heavy", [(), (2,), (0, 5)])
def test_lifting_train_wheel_checks_match_a_fine_resolve(heavy):
    # the wheel flange check and the lateral trolley force of a 6-wheel trolley: only the
    # positions that reach each one's worst are solved (from the exact extremes under every
    # wheel), so every position's state is checked by the oracle (grid of 601 positions):
    # the exact answer may only be (slightly) worse, never better
    job = _lift_train(6, heavy)
    ev = evaluate(job)
    bf = envelope_bruteforce(job, 1.0, 601)
    for name in ("wheel flange bending", "lateral trolley force", "bending"):
        c = next(c for c in ev.checks if c.name == name)
        ref = bf[name][2]
        low = 2e-4 if name == "lateral trolley force" else 1e-12  # see the test above
        assert ref * (1 - low) <= c.ratio <= ref * (1 + 3e-3)


def test_lifting_load_states_do_not_grow_with_wheels():
    # two solves per wheel (its largest and smallest moment) were made for the wheel flange
    # check and the lateral force; now only the positions that reach their worst
    counts = {n: evaluate(_lift_train(n)).states for n in (2, 6, 16)}
    assert counts[16] <= counts[2] + 6, counts
