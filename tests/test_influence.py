"""Moving loads by exact influence lines (engine/influence.py) against re-solves.

The oracle is the plain solver: the beam re-solved with the wheels placed at a fine grid of
trolley positions, then refined by golden-section search around the best grid positions
(each step a full re-solve). The exact envelope must never be below the oracle, and must
agree with it to 1e-9 of the largest value.
"""

from __future__ import annotations

import math
from dataclasses import replace

import numpy as np
import pytest
from hypothesis import Phase, given, settings, strategies as st

from shopbeam.engine.influence import cell_polys, envelope, influence, reaction_candidates
from shopbeam.engine.model import Beam, Load, Support
from shopbeam.engine.solver import segments, solve

L = 10.0
EI = 2.0e6

BEAMS = {
    "simple span": (Support(0.0, "pin"), Support(L, "roller")),
    "overhang": (Support(0.0, "pin"), Support(7.0, "roller")),
    "3-span, hinge and spring": (Support(0.0, "pin"), Support(3.0, "roller"),
                                 Support(4.5, "hinge"), Support(6.5, "spring", stiffness=4e5),
                                 Support(L, "fixed")),
    "cantilever": (Support(0.0, "fixed"),),
}
STATIC = (Load("uniform", start=0.0, end=L, w1=-300.0, case="dead"),
          Load("linear", start=2.0, end=6.0, w1=-100.0, w2=-900.0),
          Load("point", at=5.2, value=-700.0))
WHEELS = ((0.0, 0.8, 2.1), (-3000.0, -4500.0, -2000.0))


def solved(beam, offsets, forces, p):
    wheels = tuple(Load("point", at=p + o, value=f) for o, f in zip(offsets, forces))
    return solve(replace(beam, loads=beam.loads + wheels))


def oracle(beam, offsets, forces, travel, name, region, n=241):
    """(largest, smallest) of `name` over region by re-solves (grid + golden section).

    The solver merges positions closer than 1e-9 of the length, which moves a wheel that
    near a support or load edge onto it; the oracle leaves such positions out and takes
    every position with a wheel exactly on a break instead."""
    a, b = region
    breaks = np.array(sorted({0.0, L} | {s.at for s in beam.supports}
                             | {x for ld in beam.loads for x in ld.describe_position()}))

    def ext(p):
        gap = np.abs(breaks[None, :] - (p + np.asarray(offsets))[:, None]).min()
        if 0 < gap < 2e-9 * L:
            return -math.inf, math.inf
        e = solved(beam, offsets, forces, p).function(name).extremes(a, b)
        return e.max, e.min

    lo, hi = travel
    on = (breaks[None, :] - np.asarray(offsets)[:, None]).ravel()
    ps = np.unique(np.concatenate([np.linspace(lo, hi, n), on[(on >= lo) & (on <= hi)]]))
    n = len(ps)
    vals = np.array([ext(p) for p in ps])
    out = []
    for col, sign in ((0, 1.0), (1, -1.0)):
        f = lambda p: sign * ext(p)[col]  # noqa: E731
        best = sign * vals[:, col]
        top = -math.inf
        for i in np.argsort(best)[-4:]:
            x0, x1 = max(lo, ps[max(i - 1, 0)]), min(hi, ps[min(i + 1, n - 1)])
            g = (math.sqrt(5) - 1) / 2
            c, d = x1 - g * (x1 - x0), x0 + g * (x1 - x0)
            fc, fd = f(c), f(d)
            for _ in range(60):
                if fc > fd:
                    x1, d, fd = d, c, fc
                    c = x1 - g * (x1 - x0)
                    fc = f(c)
                else:
                    x0, c, fc = c, d, fd
                    d = x0 + g * (x1 - x0)
                    fd = f(d)
            top = max(top, best[i], fc, fd, f(x0), f(x1))
        out.append(sign * top)
    return out


def regions_of(beam):
    return [(a, b) for a, b, _ in segments(beam)]


@pytest.mark.parametrize("kind", list(BEAMS))
def test_influence_lines_match_unit_load_solves(kind):
    beam = Beam(L, EI, BEAMS[kind], ())
    inf = influence(beam)
    rng = np.random.default_rng(7)
    for _ in range(40):
        a, x = rng.uniform(0, L, 2)
        sol = solve(replace(beam, loads=(Load("point", at=a, value=1.0),)))
        for name in ("shear", "moment", "slope", "deflection"):
            f = sol.function(name)
            scale = np.abs(f(np.linspace(0, L, 101))).max()
            assert inf.value(name, x, a) == pytest.approx(f(x), abs=1e-10 * scale)


@pytest.mark.parametrize("kind", list(BEAMS))
@pytest.mark.parametrize("name", ["shear", "moment", "deflection"])
def test_wheel_set_envelope_matches_fine_resolves(kind, name):
    beam = Beam(L, EI, BEAMS[kind], STATIC)
    offsets, forces = WHEELS
    travel = (0.0, L - offsets[-1])
    regions = regions_of(beam)
    got = envelope(beam, offsets, forces, travel, name, regions)
    for region in regions:
        mx, xa, pa, mn, xb, pb = got[region]
        ref_max, ref_min = oracle(beam, offsets, forces, travel, name, region)
        scale = max(abs(ref_max), abs(ref_min))
        assert mx >= ref_max - 1e-10 * scale and mn <= ref_min + 1e-10 * scale
        # shear is worst with a wheel just inside a support (the limit as it comes near);
        # re-solves merge positions within 1e-9 of the length, so they come only that near
        tol = 1e-8 if name == "shear" else 1e-9
        assert mx == pytest.approx(ref_max, abs=tol * scale)
        assert mn == pytest.approx(ref_min, abs=tol * scale)
        # the reported position is the true one: a re-solve there gives the value there
        for v, x, p in ((mx, xa, pa), (mn, xb, pb)):
            f = solved(beam, offsets, forces, p).function(name)
            assert v == pytest.approx(f(x), abs=1e-9 * scale) or \
                v == pytest.approx(f(x, "left"), abs=1e-9 * scale) or name == "shear"


@pytest.mark.parametrize("kind", list(BEAMS))
def test_reaction_envelope_matches_resolves(kind):
    beam = Beam(L, EI, BEAMS[kind], STATIC)
    offsets, forces = WHEELS
    travel = (0.0, L - offsets[-1])
    inf = influence(beam)
    static = solve(beam)
    got = reaction_candidates(inf, offsets, *travel, [r.force for r in static.reactions], forces)
    ps = np.linspace(*travel, 801)
    forces_at = np.array([[r.force for r in solved(beam, offsets, forces, p).reactions]
                          for p in ps])
    for j, (mx, p1, mn, p2) in enumerate(got):
        scale = np.abs(forces_at).max()
        assert mx >= forces_at[:, j].max() - 1e-12 * scale
        assert mn <= forces_at[:, j].min() + 1e-12 * scale
        r1 = solved(beam, offsets, forces, p1).reactions[j].force
        r2 = solved(beam, offsets, forces, p2).reactions[j].force
        assert mx == pytest.approx(r1, abs=1e-9 * scale)
        assert mn == pytest.approx(r2, abs=1e-9 * scale)


def test_two_equal_wheels_classic_moment():
    # common practice (classic moving-load result): two equal loads P at spacing a on a
    # simple span L (a < 0.586 L): largest moment P (L - a/2)^2 / (2 L), under a wheel
    # a/4 from midspan
    P, a = -1000.0, 1.5
    beam = Beam(L, EI, BEAMS["simple span"], ())
    got = envelope(beam, (0.0, a), (P, P), (0.0, L - a), "moment")[(0.0, L)]
    assert got[0] == pytest.approx(-P * (L - a / 2) ** 2 / (2 * L), rel=1e-12)  # sagging +
    assert min(abs(got[1] - (L / 2 - a / 4)), abs(got[1] - (L / 2 + a / 4))) < 1e-9 * L


@settings(max_examples=12, deadline=None, derandomize=True,
          phases=[Phase.explicit, Phase.generate])
@given(st.lists(st.floats(0.5, 9.5), min_size=0, max_size=3, unique=True),
       st.lists(st.floats(0.1, 2.0), min_size=0, max_size=3),
       st.lists(st.floats(-5000, -100), min_size=1, max_size=4),
       st.floats(-800, 0), st.booleans())
def test_random_beams_never_below_the_resolves(inner, gaps, forces, w, cantilever):
    sup = (Support(0.0, "fixed"),) if cantilever else (Support(0.0, "pin"),)
    sup += tuple(Support(x, "roller") for x in sorted(inner))
    if not cantilever and not inner:
        sup += (Support(L, "roller"),)
    offsets = tuple(np.concatenate([[0.0], np.cumsum(gaps[: len(forces) - 1])]).tolist())
    forces = forces[: len(offsets)]
    beam = Beam(L, EI, sup, (Load("uniform", start=0.0, end=L, w1=w),))
    travel = (0.0, L - offsets[-1])
    for name in ("shear", "moment", "deflection"):
        got = envelope(beam, offsets, forces, travel, name)[(0.0, L)]
        ref_max, ref_min = oracle(beam, offsets, forces, travel, name, (0.0, L), n=61)
        scale = max(abs(ref_max), abs(ref_min), 1e-300)
        assert got[0] >= ref_max - 1e-10 * scale and got[3] <= ref_min + 1e-10 * scale
        tol = 1e-8 if name == "shear" else 1e-9  # see above
        assert got[0] == pytest.approx(ref_max, abs=tol * scale)
        assert got[3] == pytest.approx(ref_min, abs=tol * scale)


# ------------------------------------------------------------------ wheel trains
TRAINS = {n: (tuple(0.45 * i for i in range(n)), tuple(-1500.0 - 250.0 * (i % 3) for i in range(n)))
          for n in (1, 2, 4, 8)}


@pytest.mark.parametrize("kind, wheels", [(k, 8) for k in BEAMS] + [
    ("3-span, hinge and spring", 1), ("3-span, hinge and spring", 4), ("overhang", 2)])
def test_wheel_train_envelopes_match_fine_resolves(kind, wheels):
    # 1 to 8 wheels over the static loads (a point load and a ramp whose edges the wheels
    # cross: cells end there without cutting the whole travel): every region's largest and
    # smallest shear, moment and deflection against re-solves at many trolley positions
    beam = Beam(L, EI, BEAMS[kind], STATIC)
    offsets, forces = TRAINS[wheels]
    travel = (0.0, L - offsets[-1])
    for name, regions in (("shear", [(0.0, L)]), ("moment", [(0.0, 2.0), (2.0, 6.0), (6.0, L)]),
                          ("deflection", regions_of(beam))):  # regions side by side
        got = envelope(beam, offsets, forces, travel, name, regions)
        for region in regions:
            mx, _, _, mn, _, _ = got[region]
            ref_max, ref_min = oracle(beam, offsets, forces, travel, name, region, n=121)
            scale = max(abs(ref_max), abs(ref_min))
            assert mx >= ref_max - 1e-10 * scale and mn <= ref_min + 1e-10 * scale
            tol = 1e-8 if name == "shear" else 1e-9  # see above
            assert mx == pytest.approx(ref_max, abs=tol * scale)
            assert mn == pytest.approx(ref_min, abs=tol * scale)


def _cells_of(beam, wheels, spacing):
    from shopbeam.engine.influence import wheel_cells

    offsets = tuple(spacing * i for i in range(wheels))
    static = solve(beam)
    xs = sorted(set(static.moment.breaks.tolist()) | {2.5, 5.0, 7.5})  # braces
    inf = influence(beam)
    return inf, wheel_cells(inf, xs, offsets, 0.0, L - offsets[-1])


def test_cells_grow_linearly_in_wheels_on_a_simple_span():
    # a train over a simple span with load edges and braces: no wheel crosses a support,
    # so the travel is one strip and the cells are the lines plus the crossings of a wheel
    # over a fixed break: linear in wheels (they were wheels x fixed x (wheels + fixed))
    beam = Beam(L, EI, BEAMS["simple span"], STATIC)
    counts = {}
    for n in (10, 20, 40, 80, 160):
        inf, cells = _cells_of(beam, n, 3.0 / n)  # a train 3 long whatever its wheels
        assert len(cells.strip_p0) == 1
        nx = len(cells.xs)
        # the gaps between lines, then 3 new ones per crossing of a wheel over a fixed
        # break (each wheel crosses each fixed break at most once)
        assert len(cells.p0) <= (nx + n - 1) + 3 * n * nx
        # nothing is built per cell and wheel: every per-cell array is one value a cell
        for f in ("p0", "wp", "xr", "wu", "k", "strip", "nleft", "lo_idx", "hi_idx"):
            assert getattr(cells, f).shape == (len(cells.p0),)
        assert cells.strip_m.shape == (1, n)
        F = cell_polys(inf, cells, "moment", None, [-100.0] * n)
        assert F.shape[0] == len(cells.p0)
        counts[n] = len(cells.p0)
    for n in (10, 20, 40, 80):
        assert counts[2 * n] <= 2.1 * counts[n]


def test_cells_of_a_continuous_beam_are_cut_only_where_wheels_cross_supports():
    # over interior supports the travel is cut once per wheel crossing one (the response
    # changes for every x there), and only there: not at load edges or braces
    beam = Beam(L, EI, (Support(0.0, "pin"), Support(4.0, "roller"), Support(L, "roller")),
                STATIC)
    for n in (5, 20):
        spacing = 1.0 / n
        _, cells = _cells_of(beam, n, spacing)
        travel_end = L - spacing * (n - 1)
        crossings = sum(1 for i in range(n) if 0 < 4.0 - spacing * i < travel_end)
        assert len(cells.strip_p0) == crossings + 1


def test_moment_extremes_over_extra_lengths_are_reached_and_never_beaten():
    # moving_envelope's extra lengths (the bottom flange's between supports, a cantilever's):
    # each extreme is reached at the (x, position) it names, and a fine walk of positions
    # never goes past it
    from shopbeam.design.checks import strengths
    from shopbeam.design.loading import moving_envelope, moving_states, state_set
    from shopbeam.jobs.jobfile import parse_job_text

    job = parse_job_text("""schema = 1
title = "three-span track with an overhang"
tags = ["not-lifting"]
[beam]
length = "34 ft"
section = "W10x22"
material = "A992"
braced = true
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "10 ft"
type = "roller"
[[supports]]
at = "18 ft"
type = "roller"
[[supports]]
at = "29 ft"
type = "roller"
[[loads]]
type = "uniform"
start = "0 ft"
end = "34 ft"
value = "-60 lbf/ft"
case = "dead"
[[moving]]
label = "cart"
loads = ["-900 lbf", "-2500 lbf", "-1200 lbf"]
spacing = ["2 ft", "3.5 ft"]
""")
    st = strengths(job)
    ss = state_set(job)
    k = 1.0
    static = ss.static_loads(k, ())
    ft = 0.3048
    regions = ((0.0, 10 * ft), (10 * ft, 18 * ft), (18 * ft, 29 * ft), (29 * ft, 34 * ft))
    ext = moving_envelope(job, ss, static, k, st, pattern=(), more=regions).extremes
    lo, hi = job.moving[0].travel[0], job.moving[0].travel[1] - 5.5 * ft
    walk = np.linspace(lo, hi, 1201)
    named = [ext["more", "moment", r, how][2] for r in regions for how in ("min", "max")]
    sols = dict(moving_states(job, ss, static, k, st, positions=sorted(set(walk) | set(named))))
    big = max(abs(v[0]) for v in ext.values())
    for r in regions:
        for how in ("min", "max"):
            value, x, p = ext["more", "moment", r, how]
            assert r[0] - 1e-9 <= x <= r[1] + 1e-9
            assert float(sols[p].moment(x)) == pytest.approx(value, abs=1e-9 * big)
            e = [sols[q].moment.extremes(*r) for q in walk]
            walked = min(v.min for v in e) if how == "min" else max(v.max for v in e)
            assert (walked >= value - 1e-9 * big) if how == "min" else (walked <= value + 1e-9 * big)
            assert walked == pytest.approx(value, abs=2e-3 * big)  # and the walk comes close
