"""Random beams, stable and unstable: every unstable one is reported as unstable (in words),
every stable one solves and passes all of its self-checks.

Whether a beam is stable is decided here independently of the solver: by statics, in exact
rational arithmetic. Each rigid piece between hinges has two equilibrium equations (vertical
forces, moments); the unknowns are the support forces and fixed-end moments (a spring counts
as a force support) and the shear carried through each hinge. The beam is stable exactly when
that equilibrium matrix has full row rank, i.e. every load can be carried (common practice:
the static test of geometric stability). The solver instead checks kinematics with an SVD
and then solves the compatibility system, so the two cannot share a mistake.
"""

from __future__ import annotations

import contextlib
import io
from fractions import Fraction

import numpy as np
import pytest
from hypothesis import HealthCheck, given, settings
from hypothesis import strategies as st

from shopbeam.errors import UnstableBeam
from shopbeam.engine.model import Beam, Load, Support
from shopbeam.engine.solver import solve
from jobtext import CUSTOM_MEMBER

SETTINGS = dict(deadline=None, suppress_health_check=[HealthCheck.too_slow,
                                                       HealthCheck.filter_too_much])
GRID = 48  # positions on a grid of L/48, plus a few off-grid ones


def rank(rows: list[list[Fraction]]) -> int:
    """Exact rank by Gaussian elimination over the rationals."""
    m = [r[:] for r in rows]
    r = 0
    ncol = len(m[0]) if m else 0
    for c in range(ncol):
        piv = next((i for i in range(r, len(m)) if m[i][c] != 0), None)
        if piv is None:
            continue
        m[r], m[piv] = m[piv], m[r]
        for i in range(len(m)):
            if i != r and m[i][c] != 0:
                f = m[i][c] / m[r][c]
                m[i] = [a - f * b for a, b in zip(m[i], m[r])]
        r += 1
    return r


def statically_stable(L: Fraction, sups: list[tuple[Fraction, str]]) -> bool:
    """Full row rank of the equilibrium matrix of the rigid pieces between hinges."""
    hinges = sorted(x for x, k in sups if k == "hinge")
    bounds = [Fraction(0)] + hinges + [L]
    nseg = len(bounds) - 1

    def seg(x):  # a support exactly at a hinge is counted on the left piece
        for s in range(nseg):
            if x <= bounds[s + 1]:
                return s
        return nseg - 1

    cols = []
    for x, k in sups:
        if k == "hinge":
            continue
        col = [Fraction(0)] * (2 * nseg)
        s = seg(x)
        col[2 * s], col[2 * s + 1] = Fraction(1), x  # force: sum F, sum M about 0
        cols.append(col)
        if k == "fixed":
            col = [Fraction(0)] * (2 * nseg)
            col[2 * s + 1] = Fraction(1)
            cols.append(col)
    for i, h in enumerate(hinges):  # shear through hinge i, between pieces i and i + 1
        col = [Fraction(0)] * (2 * nseg)
        col[2 * i], col[2 * i + 1] = Fraction(-1), -h
        col[2 * (i + 1)], col[2 * (i + 1) + 1] = Fraction(1), h
        cols.append(col)
    if not cols:
        return False
    rows = [[c[j] for c in cols] for j in range(2 * nseg)]
    return rank(rows) == 2 * nseg


@st.composite
def beams(draw, stable: bool | None = None):
    """(Beam, exact positions) with valid geometry; stable or not as drawn."""
    L = Fraction(draw(st.integers(12, 240)), 12)  # 1 to 20 (m), in twelfths
    n_sup = draw(st.integers(1, 5))
    slots = draw(st.lists(st.integers(0, GRID), min_size=n_sup, max_size=n_sup, unique=True))
    kinds = draw(st.lists(st.sampled_from(["fixed", "pin", "roller", "roller", "spring"]),
                          min_size=n_sup, max_size=n_sup))
    sups = [(L * s / GRID, k) for s, k in zip(slots, kinds)]
    n_h = draw(st.integers(0, 3))
    free = [s for s in range(1, GRID) if L * s / GRID not in {x for x, k in sups if k == "fixed"}]
    hslots = draw(st.lists(st.sampled_from(free), min_size=n_h, max_size=n_h, unique=True))
    sups += [(L * s / GRID, "hinge") for s in hslots]
    ok = statically_stable(L, sups)
    if stable is not None:
        from hypothesis import assume

        assume(ok == stable)
    ei = draw(st.sampled_from([2e4, 6.5e5, 3e6, 4e7]))
    k_spring = draw(st.sampled_from([1e3, 2e5, 1e7, 1e9]))
    supports = tuple(Support(float(x), k, stiffness=k_spring if k == "spring" else 0.0)
                     for x, k in sorted(sups))
    hinge_at = {x for x, k in sups if k == "hinge"}
    loads = []
    for _ in range(draw(st.integers(1, 6))):
        kind = draw(st.sampled_from(["point", "uniform", "linear", "moment"]))
        if kind in ("point", "moment"):
            off = draw(st.booleans())
            x = (L * draw(st.integers(0, GRID)) / GRID) if not off else \
                L * Fraction(draw(st.integers(1, 9999)), 10000)
            if kind == "moment" and x in hinge_at:
                x = x + L / (4 * GRID)
            v = float(draw(st.integers(-5000, 5000)) or 7)
            loads.append(Load(kind, at=float(x), value=v))
        else:
            a, b = sorted(draw(st.lists(st.integers(0, GRID), min_size=2, max_size=2,
                                        unique=True)))
            w1 = float(draw(st.integers(-3000, 3000)) or -11)
            w2 = w1 if kind == "uniform" else float(draw(st.integers(-3000, 3000)))
            loads.append(Load(kind, start=float(L * a / GRID), end=float(L * b / GRID),
                              w1=w1, w2=w2))
    return Beam(float(L), ei, supports, tuple(loads)), ok


@settings(max_examples=250, **SETTINGS)
@given(beams())
def test_unstable_is_reported_and_stable_passes_every_self_check(case):
    beam, stable = case
    if not stable:
        with pytest.raises(UnstableBeam) as err:
            solve(beam)
        words = str(err.value)
        assert len(words) > 20 and any(w in words for w in ("support", "hinge", "fix"))
        return
    sol = solve(beam)
    failed = [(d.name, d.detail) for d in sol.diagnostics if not d.ok]
    assert not failed, failed
    _extremes_bound_a_dense_sample(sol)


def _extremes_bound_a_dense_sample(sol) -> None:
    """The exact extremes are at least as large as any sampled value, and a fine sample
    comes close to them (the extremes are real values of the function)."""
    xs = np.linspace(0.0, sol.length, 4001)
    ex = sol.extremes()
    for name in ("shear", "moment", "slope", "deflection"):
        f = sol.function(name)
        vals = np.concatenate([f(xs, "right"), f(xs, "left")])
        e = ex[name]
        scale = max(e.abs_max, 1e-300)
        assert vals.max() <= e.max + 1e-9 * scale, name
        assert vals.min() >= e.min - 1e-9 * scale, name
        # the reported extreme is attained at its position (one side or the other)
        at_max = max(f(e.max_at, "left"), f(e.max_at, "right"))
        at_min = min(f(e.min_at, "left"), f(e.min_at, "right"))
        assert at_max == pytest.approx(e.max, rel=1e-7, abs=1e-9 * scale), name
        assert at_min == pytest.approx(e.min, rel=1e-7, abs=1e-9 * scale), name


@settings(max_examples=60, **SETTINGS)
@given(beams(stable=True))
def test_stable_beams_equilibrium_against_exact_statics(case):
    """Sum of reactions and their moments balance the loads (computed here in Fractions)."""
    beam, _ = case
    sol = solve(beam)
    fy = mz = Fraction(0)
    for ld in beam.loads:
        if ld.kind == "point":
            fy += Fraction(ld.value)
            mz += Fraction(ld.value) * Fraction(ld.at)
        elif ld.kind == "moment":
            mz += Fraction(ld.value)
        else:
            a, b = Fraction(ld.start), Fraction(ld.end)
            w1 = Fraction(ld.w1)
            w2 = w1 if ld.kind == "uniform" else Fraction(ld.w2)
            fy += (w1 + w2) / 2 * (b - a)
            # moment of a trapezoid about 0: integral of w(x) x dx
            mz += (b - a) * (w1 * (2 * a + b) + w2 * (a + 2 * b)) / 6
    scale = sum(abs(r.force) for r in sol.reactions) + float(sum(
        abs(Fraction(ld.value)) if ld.kind == "point" else 0 for ld in beam.loads)) + 1.0
    rf = sum(r.force for r in sol.reactions)
    rm = sum(r.force * r.at + r.moment for r in sol.reactions)
    assert abs(rf + float(fy)) <= 1e-9 * scale
    assert abs(rm + float(mz)) <= 1e-9 * scale * beam.length + 1e-9 * float(abs(mz))


# ------------------------------------------------------------------ named unstable cases
def S(at, kind, k=0.0):
    return Support(at, kind, stiffness=k)


UNSTABLE = {
    "no supports": (S(2.0, "hinge"),),
    "lone roller": (S(1.0, "roller"),),
    "lone pin at the end": (S(0.0, "pin"),),
    "lone spring": (S(2.0, "spring", 1e5),),
    "two hinges in one span": (S(0.0, "pin"), S(1.0, "hinge"), S(2.0, "hinge"), S(4.0, "roller")),
    "cantilever with a hinge": (S(0.0, "fixed"), S(2.0, "hinge")),
    "propped with two hinges": (S(0.0, "fixed"), S(1.0, "hinge"), S(3.0, "hinge"),
                                S(4.0, "roller")),
    "simple span with a hinge": (S(0.0, "pin"), S(2.0, "hinge"), S(4.0, "roller")),
    "hinge over-hanging the last support": (S(0.0, "pin"), S(2.0, "roller"), S(3.0, "hinge")),
}


@pytest.mark.parametrize("name", list(UNSTABLE))
def test_named_unstable_beams(name):
    sups = UNSTABLE[name]
    L = 4.0
    assert not statically_stable(Fraction(L), [(Fraction(s.at), s.kind) for s in sups])
    beam = Beam(L, 1e6, sups, (Load("point", at=1.5, value=-100.0),))
    with pytest.raises(UnstableBeam) as err:
        solve(beam)
    assert any(w in str(err.value) for w in ("support", "hinge"))


STABLE = {
    "cantilever": (S(0.0, "fixed"),),
    "beam on two springs": (S(0.0, "spring", 1e5), S(4.0, "spring", 1e5)),
    "gerber beam": (S(0.0, "pin"), S(1.5, "roller"), S(2.5, "hinge"), S(4.0, "roller")),
    "fixed-fixed with a hinge": (S(0.0, "fixed"), S(2.0, "hinge"), S(4.0, "fixed")),
    "hinge over a support": (S(0.0, "pin"), S(2.0, "roller"), S(2.0, "hinge"), S(4.0, "roller")),
    "fixed, hinge, spring": (S(0.0, "fixed"), S(2.0, "hinge"), S(4.0, "spring", 1e4)),
}


@pytest.mark.parametrize("name", list(STABLE))
def test_named_stable_beams_pass_every_self_check(name):
    sups = STABLE[name]
    assert statically_stable(Fraction(4), [(Fraction(s.at), s.kind) for s in sups])
    beam = Beam(4.0, 1e6, sups, (Load("point", at=1.3, value=-100.0),
                                  Load("uniform", start=0.0, end=4.0, w1=-50.0)))
    sol = solve(beam)
    assert all(d.ok for d in sol.diagnostics), [(d.name, d.detail) for d in sol.diagnostics]


# ------------------------------------------------------------------ through the CLI
def _job(sups: str) -> str:
    return f"""schema = 1
title = "random beam"
[beam]
length = "4 m"
self_weight = false
{CUSTOM_MEMBER}{sups}
[[loads]]
type = "point"
at = "1.5 m"
value = "-1 kN"
"""


def _sup_toml(sups) -> str:
    out = []
    for s in sups:
        extra = f'\nstiffness = "{s.stiffness:g} N/m"' if s.kind == "spring" else ""
        out.append(f'[[supports]]\nat = "{s.at:g} m"\ntype = "{s.kind}"{extra}\n')
    return "\n".join(out)


@pytest.mark.parametrize("name", [n for n in UNSTABLE if n != "no supports"])
def test_unstable_through_the_cli_exit_2_in_words(tmp_path, name):
    from shopbeam.cli import main

    p = tmp_path / "job.toml"
    p.write_text(_job(_sup_toml(UNSTABLE[name])), encoding="utf-8")
    out, err = io.StringIO(), io.StringIO()
    with contextlib.redirect_stdout(out), contextlib.redirect_stderr(err):
        rc = main(["solve", str(p), "--json"])
    assert rc == 2, err.getvalue()
    assert out.getvalue() == ""  # no numbers printed as if valid
    assert "unstable" in err.getvalue() and "Traceback" not in err.getvalue()
