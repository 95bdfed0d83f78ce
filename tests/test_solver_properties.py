"""Properties every correct beam solution has, on random beams (hypothesis).

Equilibrium and the self-checks, superposition, mirror symmetry, Maxwell-Betti reciprocity
and deflection scaling with 1/EI: facts of beam theory (common practice, no source needed).
"""

from __future__ import annotations

from dataclasses import replace

import numpy as np
from hypothesis import given, settings
from hypothesis import strategies as st

from shopbeam.engine.model import Beam, Load, Support
from shopbeam.engine.solver import solve

SETTINGS = settings(max_examples=60, deadline=None)


@st.composite
def layouts(draw):
    """A stable support layout on a beam of random length."""
    L = draw(st.floats(0.5, 20.0))
    kind = draw(st.sampled_from(["simple", "cantilever", "propped", "fixed", "continuous",
                                 "overhang", "springs", "gerber"]))
    f = lambda a, b: draw(st.floats(a, b))  # noqa: E731
    if kind == "simple":
        sups = [Support(0.0, "pin"), Support(L, "roller")]
    elif kind == "cantilever":
        sups = [Support(0.0, "fixed")]
    elif kind == "propped":
        sups = [Support(0.0, "fixed"), Support(L, "roller")]
    elif kind == "fixed":
        sups = [Support(0.0, "fixed"), Support(L, "fixed")]
    elif kind == "continuous":
        n = draw(st.integers(2, 5))
        sups = [Support(L * i / n, "pin" if i == 0 else "roller") for i in range(n + 1)]
    elif kind == "overhang":
        sups = [Support(f(0.05, 0.3) * L, "pin"), Support(f(0.6, 0.95) * L, "roller")]
    elif kind == "springs":
        sups = [Support(0.0, "spring", f(1e4, 1e8)), Support(f(0.5, 1.0) * L, "spring", f(1e4, 1e8))]
    else:
        sups = [Support(0.0, "fixed"), Support(f(0.2, 0.6) * L, "hinge"), Support(L, "roller")]
    ei = draw(st.floats(1e4, 1e8))
    return Beam(L, ei, tuple(sups))


@st.composite
def loads(draw, L, n_max=5):
    out = []
    for _ in range(draw(st.integers(1, n_max))):
        kind = draw(st.sampled_from(["point", "moment", "uniform", "linear"]))
        a = draw(st.floats(0.0, 1.0)) * L
        b = draw(st.floats(0.0, 1.0)) * L
        mag = draw(st.floats(-5000.0, 5000.0))
        if kind == "point":
            out.append(Load("point", at=a, value=mag))
        elif kind == "moment":
            out.append(Load("moment", at=a, value=mag))
        else:
            s, e = sorted((a, b))
            if e - s < 1e-3 * L:
                s, e = 0.0, L
            w2 = draw(st.floats(-5000.0, 5000.0)) if kind == "linear" else mag
            out.append(Load(kind, start=s, end=e, w1=mag, w2=w2))
    return tuple(out)


def hinge_free(beam, lds):
    # a couple right at a hinge is refused by the reader; keep random ones away from it
    hinges = [s.at for s in beam.supports if s.kind == "hinge"]
    return tuple(ld for ld in lds if not (ld.kind == "moment" and any(abs(ld.at - h) < 1e-6 for h in hinges)))


@st.composite
def beams(draw):
    b = draw(layouts())
    return b.with_loads(hinge_free(b, draw(loads(b.length))))


@SETTINGS
@given(beams())
def test_random_beams_pass_every_self_check(beam):
    sol = solve(beam)
    bad = [(d.name, d.detail) for d in sol.diagnostics if not d.ok and "magnitude" not in d.name]
    assert not bad


@SETTINGS
@given(layouts(), st.data())
def test_superposition(layout, data):
    a = hinge_free(layout, data.draw(loads(layout.length)))
    b = hinge_free(layout, data.draw(loads(layout.length)))
    sa, sb, sab = solve(layout.with_loads(a)), solve(layout.with_loads(b)), solve(layout.with_loads(a + b))
    L = layout.length
    xs = np.linspace(0, L, 23)
    load = sum(abs(ld.value) / (L if ld.kind == "moment" else 1.0) + abs(ld.w1) * L + abs(ld.w2) * L
               for ld in a + b) + 1e-9
    floors = (load * L**3 / layout.ei, load * L)
    for (fa, fb, fab), floor in zip(((sa.deflection, sb.deflection, sab.deflection),
                                     (sa.moment, sb.moment, sab.moment)), floors):
        va, vb, vab = fa(xs), fb(xs), fab(xs)
        scale = np.max(np.abs(va)) + np.max(np.abs(vb)) + floor
        assert np.max(np.abs(va + vb - vab)) <= 1e-8 * scale
    for ra, rb, rab in zip(sa.reactions, sb.reactions, sab.reactions):
        assert abs(ra.force + rb.force - rab.force) <= 1e-8 * (abs(ra.force) + abs(rb.force) + load)


def mirror(beam: Beam) -> Beam:
    L = beam.length
    sups = tuple(replace(s, at=L - s.at) for s in beam.supports)
    out = []
    for ld in beam.loads:
        if ld.kind == "point":
            out.append(replace(ld, at=L - ld.at))
        elif ld.kind == "moment":
            out.append(replace(ld, at=L - ld.at, value=-ld.value))  # a mirror turns ccw to cw
        else:
            w2 = ld.w1 if ld.kind == "uniform" else ld.w2
            out.append(replace(ld, start=L - ld.end, end=L - ld.start, w1=w2, w2=ld.w1))
    return Beam(L, beam.ei, sups, tuple(out))


@SETTINGS
@given(beams())
def test_mirror_symmetry(beam):
    s, m = solve(beam), solve(mirror(beam))
    L = beam.length
    load = sum(abs(ld.value) / (L if ld.kind == "moment" else 1.0) + abs(ld.w1) * L + abs(ld.w2) * L
               for ld in beam.loads) + 1e-9
    floor = {0: load * L**3 / beam.ei, 1: load * L**2 / beam.ei, 2: load * L}
    xs = np.linspace(0.01, 0.99, 17) * L
    for i, (f, g, sign) in enumerate(((s.deflection, m.deflection, 1), (s.slope, m.slope, -1),
                                      (s.moment, m.moment, 1))):
        a, b = f(xs, "right"), g(L - xs, "left")  # the right side of x mirrors to the left
        assert np.max(np.abs(a - sign * b)) <= 1e-8 * (np.max(np.abs(a)) + floor[i])
    ra = sorted(r.force for r in s.reactions)
    rb = sorted(r.force for r in m.reactions)
    assert np.allclose(ra, rb, rtol=1e-8, atol=1e-8 * (max(map(abs, ra)) + load))


@SETTINGS
@given(layouts(), st.floats(0.0, 1.0), st.floats(0.0, 1.0))
def test_maxwell_betti_reciprocity(layout, fa, fb):
    L = layout.length
    a, b = fa * L, fb * L
    ua = solve(layout.with_loads((Load("point", at=a, value=-1.0),))).deflection(b)
    ub = solve(layout.with_loads((Load("point", at=b, value=-1.0),))).deflection(a)
    springs = [s.stiffness for s in layout.supports if s.kind == "spring"]
    compliance = L**3 / layout.ei + (1 / min(springs) if springs else 0.0)
    assert abs(ua - ub) <= 1e-8 * (max(abs(ua), abs(ub)) + compliance)


@SETTINGS
@given(beams(), st.floats(0.1, 10.0))
def test_deflection_scales_with_one_over_ei(beam, factor):
    # springs scale with EI too, so the whole structure is `factor` times stiffer
    stiffer = Beam(beam.length, beam.ei * factor,
                   tuple(replace(s, stiffness=s.stiffness * factor) for s in beam.supports),
                   beam.loads)
    s1, s2 = solve(beam), solve(stiffer)
    xs = np.linspace(0, beam.length, 19)
    u1, u2 = s1.deflection(xs), s2.deflection(xs)
    assert np.max(np.abs(u1 - factor * u2)) <= 1e-8 * (np.max(np.abs(u1)) + 1e-30)
    # reactions do not change; the tolerance scales with the forces in play, so a reaction
    # that is zero in exact arithmetic (round-off ~1e-14 of the loads) cannot fail it
    scale = max([abs(r.force) for r in s1.reactions] + [abs(ld.total_force) for ld in beam.loads]
                + [abs(ld.value) / beam.length for ld in beam.loads if ld.kind == "moment"] + [1e-300])
    for r1, r2 in zip(s1.reactions, s2.reactions):
        assert abs(r1.force - r2.force) <= 1e-9 * scale


def test_a_tie_between_symmetric_turning_points_names_the_first():
    # three equal spans under a uniform load: the end spans' largest sagging moments are
    # equal (0.08 w L^2, AISC Manual Table 3-23 case 36, from memory); the place named is the
    # first, not whichever the last bit of the arithmetic favours
    import pytest

    from shopbeam.jobs.jobfile import parse_job_text
    from shopbeam.design.analysis import analyze
    job = parse_job_text(
        'schema = 1\ntitle = "3 spans"\nunits = "si"\n[beam]\nlength = "12 m"\n'
        'section = "W8x18"\nmaterial = "A992"\nself_weight = false\n'
        + "".join(f'[[supports]]\nat = "{x} m"\ntype = "{t}"\n'
                  for x, t in ((0, "pin"), (4, "roller"), (8, "roller"), (12, "roller")))
        + '[[loads]]\ntype = "uniform"\nvalue = "-4 kN/m"\n')
    ex = analyze(job).solution.extremes()
    assert ex["moment"].max == pytest.approx(0.08 * 4000 * 16)
    assert ex["moment"].max_at == pytest.approx(1.6)
    assert ex["deflection"].min_at < 4.0
