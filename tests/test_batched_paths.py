"""Batched and shortened paths of the moving-load and pattern checks give what the one-by-one
paths give, number for number (not merely close): the batched solver, the batched
flange-as-beam of the lateral trolley check, the bending check on its own, the envelope's
region extremes and the influence polynomials' evaluation."""

from __future__ import annotations

from dataclasses import replace
from pathlib import Path

import numpy as np
import pytest
from hypothesis import given, settings
from hypothesis import strategies as st

from shopbeam.design import lifting, loading
from shopbeam.design.checks import bending_check, checks_for, impact_of, strengths
from shopbeam.engine.influence import _eval2d, _eval2d_many
from shopbeam.engine.model import Beam, Load, Support
from shopbeam.engine.piecewise import _horner
from shopbeam.engine.solver import solve, solve_each
from shopbeam.errors import InputError, UnstableBeam
from shopbeam.jobs.jobfile import load_job, parse_job_text

PRESETS = Path(__file__).resolve().parent.parent / "presets"


def same_solution(a, b) -> None:
    for name in ("load", "shear", "moment", "slope", "deflection"):
        fa, fb = a.function(name), b.function(name)
        assert np.array_equal(fa.breaks, fb.breaks)
        assert np.array_equal(fa.coeffs, fb.coeffs), name
    assert a.reactions == b.reactions
    assert a.hinge_rotations == b.hinge_rotations
    assert (a.ei_slope_0, a.ei_deflection_0) == (b.ei_slope_0, b.ei_deflection_0)
    assert a.condition == b.condition and a.exact == b.exact


SUPPORTS = {
    "simple": lambda L: (Support(0.0, "pin"), Support(L, "roller")),
    "cantilever": lambda L: (Support(0.0, "fixed"),),
    "propped": lambda L: (Support(0.0, "fixed"), Support(L, "roller")),
    "three spans": lambda L: tuple(Support(L * i / 3, "pin" if i == 0 else "roller")
                                   for i in range(4)),
    "spring and hinge": lambda L: (Support(0.0, "fixed"), Support(0.4 * L, "hinge"),
                                   Support(0.7 * L, "spring", stiffness=3e5),
                                   Support(L, "roller")),
}


@settings(max_examples=60, deadline=None, derandomize=True)
@given(st.sampled_from(sorted(SUPPORTS)), st.floats(1.0, 12.0),
       st.lists(st.tuples(st.floats(0.0, 1.0), st.floats(-5e4, 5e4)), min_size=1, max_size=4),
       st.lists(st.floats(0.0, 1.0), min_size=1, max_size=6), st.booleans())
def test_solve_each_is_each_solve(kind, L, wheels, positions, uniform):
    """Wheel sets at several positions on one beam (some sharing their number of breaks,
    some not: a wheel on a support or at an end merges breaks) solve as one by one."""
    sups = SUPPORTS[kind](L)
    base = (Load("uniform", start=0.0, end=L, w1=-800.0, case="dead"),) if uniform else ()
    span = max(d for d, _ in wheels) * 0.3 * L
    beams = []
    for p in positions:
        first = p * (L - span)
        loads = tuple(Load("point", at=min(first + d * 0.3 * L, L), value=v) for d, v in wheels)
        beams.append(Beam(L, 2.1e6, sups, base + loads))
    beams.append(Beam(L, 2.1e6, sups, base + (Load("point", at=0.0, value=-1.0),)))
    for beam, got in zip(beams, solve_each(beams)):
        same_solution(got, solve(beam, candidates=False))


def test_solve_each_says_what_solve_says():
    L = 4.0
    sups = (Support(0.0, "pin"), Support(L, "roller"))
    good = Beam(L, 1e6, sups, (Load("point", at=1.0, value=-10.0),))
    off = Beam(L, 1e6, sups, (Load("point", at=5.0, value=-10.0),))  # off the member
    with pytest.raises(InputError) as one:
        solve(off)
    with pytest.raises(InputError) as batch:
        solve_each([good, off])
    assert str(batch.value) == str(one.value)
    loose = Beam(L, 1e6, (Support(1.0, "pin"),), (Load("point", at=1.0, value=-10.0),))
    with pytest.raises(UnstableBeam):
        solve_each([good, loose])


def test_ill_conditioned_beams_go_the_exact_way_as_alone():
    L = 10.0
    sups = (Support(0.0, "pin"), Support(L * (1 - 2e-9), "roller"), Support(L, "roller"))
    beams = [Beam(L, 1e6, sups, (Load("point", at=a, value=-10.0),)) for a in (2.0, 3.0)]
    for beam, got in zip(beams, solve_each(beams)):
        same_solution(got, solve(beam, candidates=False))


def trolley_states():
    job = load_job(PRESETS / "monorail-trolley.toml")
    ss = loading.state_set(job)
    st_ = strengths(job, beam=ss.beam)
    static = ss.static_loads(1.0, ())
    env = loading.moving_envelope(job, ss, static, 1.0, st_, pattern=())
    return job, ss, st_, list(loading.moving_states(job, ss, static, 1.0, st_,
                                                    positions=env.positions))


def test_trolley_positions_and_their_lateral_checks_as_one_by_one():
    job, ss, st_, states = trolley_states()
    assert len(states) > 3
    sec = job.section
    for p, sol in states:
        alone = solve(sol.beam)
        same_solution(sol, alone)
        for name in ("shear", "moment", "slope", "deflection"):  # the batched candidates
            a, b = sol.function(name).extremes(), alone.function(name).extremes()
            assert a == b
        assert "_flange" in sol.__dict__  # solved with the other positions
        mcx = bending_check(job, sol, st_, cb_one=True).limit
        kept = lifting.lateral_check(job, sol, sec, job.material, lifting.profile_of(job),
                                     impact_of(job), mcx)
        fresh = replace(sol)  # the same state without the kept flange: solved alone
        assert "_flange" not in fresh.__dict__
        assert kept == lifting.lateral_check(job, fresh, sec, job.material,
                                             lifting.profile_of(job), impact_of(job), mcx)


@pytest.mark.parametrize("preset", ["monorail-trolley.toml", "continuous-shelf.toml",
                                    "jib-arm.toml", "lumber-rack-arm.toml",
                                    "wall-shelf-brackets.toml"])
def test_bending_check_alone_is_the_first_check(preset):
    job = load_job(PRESETS / preset)
    sol = solve(job.beam())
    st_ = strengths(job, beam=sol.beam)
    for cb_one in (False, True):
        every = checks_for(job, sol, st_, cb_one=cb_one)
        assert bending_check(job, sol, st_, cb_one=cb_one) == every[0]
        assert checks_for(job, sol, st_, cb_one=cb_one, bending=False) == every[1:]


def test_envelope_region_extremes_as_the_region_alone():
    sup = "".join(f'[[supports]]\nat = "{4 * i} ft"\ntype = "{"pin" if i == 0 else "roller"}"\n'
                  for i in range(7))
    job = parse_job_text(f"""schema = 1
title = "six-span shelf"
[beam]
length = "24 ft"
section = "HSS3x2x3/16"
material = "A500B"
braces = ["6 ft", "14 ft"]
{sup}
[[loads]]
type = "uniform"
start = "0 ft"
end = "24 ft"
value = "-150 lbf/ft"
patterned = true

[[loads]]
type = "point"
at = "9 ft"
value = "-300 lbf"
patterned = true
""")
    ss = loading.state_set(job)
    env = loading.Envelopes(ss, 1.7)
    for name in loading.ENVELOPE_QUANTITIES:
        e = env.env[name]
        for upper in (True, False):
            r, x, v, _, _ = env.cand[name, upper]
            for a, b, _ in list(ss.segs) + [(ss.segs[0][0], ss.segs[-1][1], "")]:
                tol = 1e-9 * ss.beam.length
                m = (e.breaks[r] >= a - tol) & (e.breaks[r + 1] <= b + tol)
                rr, xx, vv = r[m], x[m], v[m]
                i = int(np.argmax(vv) if upper else np.argmin(vv))
                got = env.extreme(name, upper, a, b)
                assert (got.value, got.at) == (float(vv[i]), float(xx[i]))
                assert got.pattern == tuple(int(j) for j in np.flatnonzero(
                    (e.up_on if upper else e.down_on)[int(rr[i])]))


def test_influence_polynomials_evaluate_as_column_by_column():
    rng = np.random.default_rng(7)
    F = rng.normal(size=(40, 6, 4)) * 10.0 ** rng.integers(-6, 6, size=(40, 1, 1))
    u, v = rng.uniform(-0.2, 1.2, 40), rng.uniform(-0.2, 1.2, 40)
    cols = np.stack([_horner(F[:, :, j], u) for j in range(4)], axis=1)
    assert np.array_equal(_eval2d(F, u, v), _horner(cols, v))
    G = np.zeros((40, 2, 6, 4))
    G[:, 0] = F
    G[:, 1, :4, :3] = F[:, :4, :3]
    both = _eval2d_many(G, u, v)
    assert np.array_equal(both[:, 0], _eval2d(F, u, v))
    assert np.array_equal(both[:, 1], _eval2d(F[:, :4, :3], u, v))


def moving_cases():
    """(cells, asks) of wheel sets on a simple span, a propped cantilever with an overhang and
    a three-span beam on a spring, as the moving-load envelope asks for them."""
    from shopbeam.engine.influence import cell_groups, cell_polys, influence, wheel_cells

    out = []
    for sups, L, offsets, forces, regions in (
            ((Support(0.0, "pin"), Support(6.0, "roller")), 6.0, (0.0, 0.3),
             (-9e3, -7e3), [(0.0, 2.0), (2.0, 6.0)]),
            ((Support(0.0, "fixed"), Support(5.0, "roller")), 6.5, (0.0, 0.8, 1.1),
             (-4e3, -4e3, -2e3), [(0.0, 5.0), (5.0, 6.5)]),
            ((Support(0.0, "pin"), Support(4.0, "spring", stiffness=2e6),
              Support(8.0, "roller"), Support(12.0, "roller")), 12.0, (0.0, 1.5, 3.0, 4.5),
             (-3e3, -5e3, -5e3, -3e3), [(0.0, 4.0), (4.0, 8.0), (8.0, 12.0)])):
        beam = Beam(L, 4e6, sups, (Load("uniform", start=0.0, end=L, w1=-500.0),))
        static = solve(beam)
        inf = influence(beam)
        xs = sorted(set(static.moment.breaks.tolist()) | {x for r in regions for x in r})
        cells = wheel_cells(inf, xs, offsets, 0.0, L - offsets[-1])
        asks = []
        for name in ("shear", "moment", "deflection"):
            F = cell_polys(inf, cells, name, static.function(name), forces)
            asks.append((F, cell_groups(cells, regions), name == "moment", True))
        asks.append((asks[1][0] * 0.7 + asks[0][0], None, True, True))
        asks.append((asks[2][0], cell_groups(cells, regions), False, False))
        out.append((cells, asks))
    return out


@pytest.mark.parametrize("case", range(3))
def test_candidates_in_one_pass_as_each_alone(case):
    from shopbeam.engine.influence import candidates, candidates_many

    cells, asks = moving_cases()[case]
    together = candidates_many(cells, asks)
    for (F, groups, lines, prune), got in zip(asks, together):
        alone = candidates(cells, F, groups=groups, lines=lines, prune=prune)
        assert np.array_equal(got.cell, alone.cell) and np.array_equal(got.wheel, alone.wheel)
        for field in ("value", "x", "p"):  # the same numbers (1e-12: any BLAS)
            np.testing.assert_allclose(getattr(got, field), getattr(alone, field),
                                       rtol=1e-12, atol=1e-12 * np.abs(alone.value).max())


def test_moving_envelope_kept_parts_give_what_a_fresh_state_set_gives():
    """What the state set keeps between factors (cells, parts, the lateral check's Mcx) gives
    the envelope a fresh state set gives at the next factor, number for number."""
    job = load_job(PRESETS / "monorail-trolley.toml")
    used = loading.state_set(job)
    st_used = strengths(job, beam=used.beam)
    for k in (0.0, 1.0):
        loading.moving_envelope(job, used, used.static_loads(k, ()), k, st_used, pattern=())
    assert used.__dict__["_mcx"]
    fresh = loading.state_set(job)
    st_fresh = strengths(job, beam=fresh.beam)
    k = 1.31
    a = loading.moving_envelope(job, used, used.static_loads(k, ()), k, st_used, pattern=())
    b = loading.moving_envelope(job, fresh, fresh.static_loads(k, ()), k, st_fresh,
                                pattern=())
    assert a == b
    assert any(key[0] == "lateral" for key in a.extremes)


def test_kept_flange_serves_only_the_loads_it_was_solved_for():
    # the flange-as-beam kept with a batched state is used only for the same job, section,
    # profile and impact; any other asks for its own loads (a stale one would be wrong)
    job, ss, st_, states = trolley_states()
    sec = job.section
    prof = lifting.profile_of(job)
    for _, sol in states[:3]:
        mcx = bending_check(job, sol, st_, cb_one=True).limit
        for impact, p in ((0.5, prof), (impact_of(job), replace(prof, lateral=0.1))):
            got = lifting.lateral_check(job, sol, sec, job.material, p, impact, mcx)
            fresh = replace(sol)
            assert got == lifting.lateral_check(job, fresh, sec, job.material, p, impact, mcx)
            assert got.demand != lifting.lateral_check(job, sol, sec, job.material, prof,
                                                       impact_of(job), mcx).demand


@pytest.mark.parametrize("section", ["S10x25.4", "S8x23", "W12x26", "W8x10"])
def test_lateral_mcx_read_without_a_solve_is_the_bending_checks(section):
    # one unbraced length: Mcx of the lateral check is the bending check's allowable,
    # whatever the loads (read from the strength alone, no state solved for it)
    text = (PRESETS / "monorail-trolley.toml").read_text()
    job = parse_job_text(text.replace('section = "S10x25.4"', f'section = "{section}"'))
    ss = loading.state_set(job)
    st_ = strengths(job, beam=ss.beam)
    assert len(st_.ltb_segments) == 1
    got = loading._lateral(job, ss, st_, ss.parts.moving[0], 1.0, ss.static_loads(1.0, ()))
    sol = solve(job.beam())
    mcx = bending_check(job, sol, st_, cb_one=True).limit
    mny, _ = lifting.flange_weak_strength(job.section, job.material)
    assert got[1] == mcx / (mny / 1.67)


def test_lifting_profile_follows_the_category():
    text = (PRESETS / "monorail-trolley.toml").read_text()
    text = text.replace('lifting = "powered-monorail"', 'lifting = "below-the-hook"')
    a = lifting.profile_of(parse_job_text(text + 'category = "A"\n'))
    b = lifting.profile_of(parse_job_text(text + 'category = "B"\n'))
    none = lifting.profile_of(parse_job_text(text))
    assert (a.nd, b.nd, none.nd) == (2.0, 3.0, 3.0)  # ASME BTH-1 3-1.3 (from memory)
    assert "category not given" in none.words and "category not given" not in b.words
    assert "Category A" in a.words


@pytest.mark.parametrize("supports", [
    (("pin", 0.0), ("roller", 16.0)),
    (("fixed", 0.0),),
    (("pin", 2.0), ("roller", 9.0), ("roller", 14.5)),
    (("fixed", 0.0), ("roller", 11.0)),
    (("pin", 0.0), ("spring", 8.0), ("roller", 16.0)),
    (("fixed", 0.0), ("hinge", 7.0), ("roller", 16.0)),
])
def test_flange_influence_is_the_one_solved_at_ei_one(supports):
    # the lateral check's flange-as-beam (EI 1) takes the beam's own influence data where
    # EI enters none of its unknowns: number for number what solving it at EI 1 gives
    sups = tuple(Support(at=a * 0.3048, kind=k, stiffness=2e6 if k == "spring" else 0.0)
                 for k, a in supports)
    beam = Beam(16 * 0.3048, 2.1e6, sups, ())
    got = loading.flange_influence(beam, loading.influence(beam))
    alone = loading.influence(replace(beam, ei=1.0))
    assert got.beam == alone.beam and got.reaction_cols == alone.reaction_cols
    for name in ("breaks", "z", "kind", "at"):
        assert np.array_equal(getattr(got, name), getattr(alone, name))
    assert np.array_equal(got.phi(2), alone.phi(2))
