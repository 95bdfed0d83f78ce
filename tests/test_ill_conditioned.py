"""Ill-conditioned but valid beams: an accurate answer, or a clear warning.

Supports 1 mm apart, spans of 0.1 in and of 1000 ft (and both in one beam), springs from
very soft to very stiff. The reference is an exact solve in rational arithmetic (Python
fractions) by the flexibility method on the simple span 0..L: deflections from the
closed forms of AISC Steel Construction Manual Table 3-23 (case 1, uniform load; case 8,
point load anywhere), one compatibility equation per interior support or spring, statics
for the end reactions. It sees exactly the floats the solver sees, so any difference is
the solver's own rounding.
"""

from __future__ import annotations

from fractions import Fraction as F

import pytest

from shopbeam.engine.model import Beam, Load, Support
from shopbeam.engine.solver import solve
from jobtext import CUSTOM_MEMBER

IN, FT = 0.0254, 0.3048
EI = 6.5e5  # N*m^2


def defl_point(L, P, a, x):
    """Downward deflection at x of a simple span L under a downward point load P at a,
    times EI (AISC Manual Table 3-23, case 8)."""
    b = L - a
    if x <= a:
        return P * b * x * (L * L - b * b - x * x) / (6 * L)
    return P * a * (L - x) * (L * L - a * a - (L - x) ** 2) / (6 * L)


def defl_uniform(L, w, x):
    """Downward deflection at x of a simple span under a downward uniform load w, times EI
    (AISC Manual Table 3-23, case 1)."""
    return w * x * (L**3 - 2 * L * x * x + x**3) / 24


def solve_exact(A, b):
    n = len(b)
    m = [row[:] + [b[i]] for i, row in enumerate(A)]
    for c in range(n):
        p = next(i for i in range(c, n) if m[i][c] != 0)
        m[c], m[p] = m[p], m[c]
        for i in range(n):
            if i != c and m[i][c] != 0:
                f = m[i][c] / m[c][c]
                m[i] = [x - f * y for x, y in zip(m[i], m[c])]
    return [m[i][n] / m[i][i] for i in range(n)]


def reference(L, inner, points, w=0.0, springs=None, ei=EI):
    """Exact reactions (upward) of a beam pinned at 0 and L with rigid interior supports
    `inner` (and springs {x: k}), under downward point loads [(a, P)] and a uniform w."""
    springs = springs or {}
    Lq, eiq = F(L), F(ei)
    xs = [F(x) for x in inner] + [F(x) for x in springs]
    ks = [None] * len(inner) + [F(k) for k in springs.values()]
    pts = [(F(a), F(P)) for a, P in points]
    wq = F(w)

    def base(x):  # EI x downward deflection of the simple span under the loads
        return sum(defl_point(Lq, P, a, x) for a, P in pts) + defl_uniform(Lq, wq, x)

    n = len(xs)
    # compatibility: EI*u_i = base_i - sum_j R_j f_ij; rigid: u_i = 0; spring: R_i = k u_i
    A = [[defl_point(Lq, F(1), xs[j], xs[i]) for j in range(n)] for i in range(n)]
    for i in range(n):
        if ks[i] is not None:
            A[i][i] += eiq / ks[i]
    R = solve_exact(A, [base(x) for x in xs]) if n else []
    total = sum(P for _, P in pts) + wq * Lq
    moment = sum(P * a for a, P in pts) + wq * Lq * Lq / 2  # about x = 0, downward loads
    r_end = (moment - sum(r * x for r, x in zip(R, xs))) / Lq
    r_0 = total - sum(R) - r_end
    at = [F(0)] + xs + [Lq]
    out = dict(zip(at, [r_0] + R + [r_end]))
    return out, (lambda x: (base(F(x)) - sum(r * defl_point(Lq, F(1), xj, F(x))
                                               for r, xj in zip(R, xs))) / eiq)


def build(L, inner, points, w=0.0, springs=None, ei=EI):
    sups = [Support(0.0, "pin")] + [Support(x, "roller") for x in inner]
    sups += [Support(x, "spring", stiffness=k) for x, k in (springs or {}).items()]
    sups.append(Support(L, "roller"))
    loads = [Load("point", at=a, value=-P) for a, P in points]
    if w:
        loads.append(Load("uniform", start=0.0, end=L, w1=-w))
    return Beam(L, ei, tuple(sorted(sups, key=lambda s: s.at)), tuple(loads))


EPS = 2.2e-16


def check(L, inner, points, w=0.0, springs=None, ei=EI, rel=1e-9):
    """Accurate reactions and deflections, or a clear (conditioning) warning.

    Always: the error stays within the solver's own estimate, eps x condition number. With
    no warning: reactions good to `rel` of the largest one and deflections to 1e3 x `rel`,
    or at worst 1e-6 (six figures; the report prints four) where `rel` is looser.
    """
    beam = build(L, inner, points, w, springs, ei)
    sol = solve(beam)
    ref, defl = reference(L, inner, points, w, springs, ei)
    scale = float(max(abs(v) for v in ref.values()))
    worst = max(abs(r.force - float(ref[F(r.at)])) / scale for r in sol.reactions)
    # deflections at a few points, against the exact superposition
    pts = (0.13 * L, 0.5 * L, 0.77 * L)
    u_exact = [float(defl(x)) for x in pts]
    u_scale = max(max(abs(u) for u in u_exact), sol.extremes()["deflection"].abs_max)
    u_err = max(abs(-sol.deflection(x) - u) for x, u in zip(pts, u_exact)) / u_scale
    # an ill-conditioned system is solved again in exact arithmetic: rounding of the final
    # floats only
    bound = 1e-12 if sol.exact else max(1e-12, 10 * EPS * sol.condition)
    assert worst <= bound and u_err <= 10 * bound, (worst, u_err, sol.condition)
    assert sol.exact or sol.condition <= 1e10
    warned = [d.name for d in sol.diagnostics if not d.ok]
    assert not warned, warned  # never an answer with a failed self-check
    assert worst <= max(rel, 1e-6) and u_err <= max(1e3 * rel, 1e-6), (worst, u_err)
    if rel <= 1e-9:
        assert worst <= rel and u_err <= 1e3 * rel, (worst, u_err)
    return sol, worst


# ------------------------------------------------------------------ close supports
def test_reference_matches_a_textbook_two_span_beam():
    # the reference itself: two equal spans under a uniform load, middle reaction 10wL/8
    # (AISC Manual Table 3-23, case 29: two equal spans, uniform load)
    ref, _ = reference(2.0, [1.0], [], w=100.0)
    assert ref[F(1)] == F(10, 8) * 100 * 1
    assert ref[F(0)] == F(3, 8) * 100 * 1


@pytest.mark.parametrize("gap", [1e-3, 1e-4, 0.1 * IN])
def test_two_supports_a_millimetre_apart(gap):
    # the pair acts almost like a fixed support: large and opposite reactions
    sol, err = check(3.0, [1.5, 1.5 + gap], [(0.7, 1000.0), (2.4, 350.0)], w=100.0, rel=1e-7)
    r = [x.force for x in sol.reactions]
    assert r[1] > 0 > r[2] and abs(r[1]) > 10 * 1300  # levered up by the close pair


def test_thousand_foot_beam_with_supports_a_millimetre_apart_is_solved_exactly():
    s = 1000 * FT
    sol, _ = check(2 * s, [s, s + 1e-3], [(0.3 * s, 1000.0)], w=1.0, rel=1e-9)
    assert sol.condition > 1e11 and sol.exact  # past the line: the exact path answered
    assert next(d for d in sol.diagnostics if d.name == "conditioning").ok


def test_supports_far_too_close_for_floats_are_solved_exactly():
    s = 1000 * FT
    sol, _ = check(2 * s, [s, s + 1e-5], [(0.3 * s, 1000.0)], rel=1e-9)
    assert sol.condition > 1e14 and sol.exact


def test_supports_too_close_in_a_job_too_big_for_exact_arithmetic_are_refused_in_words():
    from shopbeam.errors import InputError

    s = 1000 * FT
    beam = build(2 * s, [s, s + 1e-5], [(0.3 * s + i * 0.5, 10.0) for i in range(900)])
    with pytest.raises(InputError) as err:
        solve(beam)
    words = str(err.value)
    assert "too close together" in words and "1000 ft" in words


def test_close_supports_at_the_end_like_a_fixed_end():
    # a roller 1 mm from the pin at the left end of a 3 m span with a load at mid-span
    check(3.0, [0.001], [(1.5, 1000.0)], rel=1e-8)


# ------------------------------------------------------------------ tiny and huge spans
def test_spans_of_a_tenth_of_an_inch():
    s = 0.1 * IN
    check(3 * s, [s, 2 * s], [(0.5 * s, 1000.0), (2.2 * s, 40.0)], w=5e4)


def test_spans_of_a_thousand_feet():
    s = 1000 * FT
    check(3 * s, [s, 2 * s], [(0.5 * s, 1000.0), (2.2 * s, 40.0)], w=2.0)


def test_thousand_foot_spans_with_supports_a_tenth_of_an_inch_apart():
    s = 1000 * FT
    check(2 * s, [s, s + 0.1 * IN], [(0.5 * s, 1000.0), (1.7 * s, 250.0)], w=1.0, rel=1e-7)


def test_ten_spans_of_very_different_lengths():
    xs, x = [], 0.0
    for i in range(9):
        x += (0.1 * IN) if i % 2 else (50 * FT)
        xs.append(x)
    L = x + 50 * FT
    check(L, xs, [(0.3 * L, 800.0), (0.61 * L, 120.0)], w=10.0, rel=1e-7)


# ------------------------------------------------------------------ springs
@pytest.mark.parametrize("k", [1e-6, 1e-2, 1e2, 1e4, 1e6, 1e8, 1e10, 1e12, 1e14, 1e16,
                               1e18, 1e22, 1e30])
def test_spring_from_very_soft_to_very_stiff(k):
    # soft: the spring takes nothing (simple span); stiff: it acts as a rigid support
    sol, _ = check(3.0, [], [(0.7, 1000.0), (2.0, 500.0)], w=50.0, springs={1.4: k})
    spring = next(r for r in sol.reactions if r.kind == "spring")
    rigid, _ = reference(3.0, [1.4], [(0.7, 1000.0), (2.0, 500.0)], w=50.0)
    if k <= 1e-2:
        assert abs(spring.force) < 1e-4 * 1650
    if k >= 1e14:
        assert spring.force == pytest.approx(float(rigid[F(1.4)]), rel=1e-6)


@pytest.mark.parametrize("k", [1e-3, 1.0, 1e5, 1e12, 1e20])
def test_beam_on_two_springs_only(k):
    # determinate: each spring takes its statical share whatever its stiffness
    beam = Beam(3.0, EI, (Support(0.0, "spring", stiffness=k), Support(3.0, "spring", stiffness=k)),
                (Load("point", at=1.0, value=-900.0),))
    sol = solve(beam)
    assert [r.force for r in sol.reactions] == pytest.approx([600.0, 300.0], rel=1e-12)
    # rigid-body give of the springs plus bending: u(1) = -(600 (2/3) + 300 (1/3)) / k - ...
    bend = 900.0 * 1.0 * 2.0 * (9 - 4 - 1) / (6 * 3.0) / EI  # Table 3-23 case 8 at x = a
    expect = -(600.0 * 2 / 3 + 300.0 / 3) / k - bend
    assert sol.deflection(1.0) == pytest.approx(expect, rel=1e-9)
    assert all(d.ok for d in sol.diagnostics), [(d.name, d.detail) for d in sol.diagnostics]


def test_very_soft_and_very_stiff_springs_in_one_beam():
    check(4.0, [], [(1.0, 1000.0), (3.1, 700.0)], w=20.0, springs={1.5: 1e-3, 2.5: 1e16})


# ------------------------------------------------------------------ extreme stiffness EI
@pytest.mark.parametrize("ei", [1e-2, 1e12])
def test_extreme_flexural_rigidity(ei):
    # reactions of an indeterminate beam do not depend on EI; deflections scale as 1/EI
    check(3.0, [1.2], [(0.5, 1000.0), (2.5, 200.0)], w=30.0, ei=ei)


# ------------------------------------------------------------------ through the job file
@pytest.mark.parametrize("span, unit", [("0.1", "in"), ("1000", "ft")])
def test_extreme_spans_through_the_cli(tmp_path, span, unit):
    import contextlib
    import io
    import json

    from shopbeam.cli import main

    job = f"""schema = 1
title = "three spans of {span} {unit}"
[beam]
length = "{3 * float(span):g} {unit}"
self_weight = false
{CUSTOM_MEMBER}[[supports]]
at = "0 {unit}"
type = "pin"
[[supports]]
at = "{span} {unit}"
type = "roller"
[[supports]]
at = "{2 * float(span):g} {unit}"
type = "roller"
[[supports]]
at = "{3 * float(span):g} {unit}"
type = "roller"
[[loads]]
type = "point"
at = "{0.5 * float(span):g} {unit}"
value = "-1000 N"
"""
    p = tmp_path / "job.toml"
    p.write_text(job, encoding="utf-8")
    out, err = io.StringIO(), io.StringIO()
    with contextlib.redirect_stdout(out), contextlib.redirect_stderr(err):
        rc = main(["solve", str(p), "--json"])
    assert rc == 0, err.getvalue()
    data = json.loads(out.getvalue())
    s = float(span) * (IN if unit == "in" else FT)
    ref, _ = reference(3 * s, [s, 2 * s], [(0.5 * s, 1000.0)])
    got = [r["force"] for r in data["reactions"]]
    want = [float(ref[k]) for k in sorted(ref)]
    assert got == pytest.approx(want, rel=1e-9, abs=1e-9 * 1000)
    # three equal spans, load at the middle of the first: 0.4 P, 0.725 P, -0.15 P, 0.025 P
    # (the flexibility solve by hand, the same in any span length)
    assert want == pytest.approx([400.0, 725.0, -150.0, 25.0], rel=1e-12)
    assert all(d["ok"] for d in data["diagnostics"]), data["diagnostics"]
