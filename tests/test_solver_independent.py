"""An independent numeric check of the engine on distributed loads.

Two general-purpose methods that share nothing with the bracket solver: scipy's collocation
boundary-value solver (`scipy.integrate.solve_bvp`) on EI u'''' = q, and a plain numpy
finite-difference solve of the same equation with the support conditions as rows of the
system (for a continuous beam, where solve_bvp's two-point form does not fit).
"""

from __future__ import annotations

import numpy as np
import pytest

import scipy.integrate as scipy_integrate  # noqa: E402

from shopbeam.engine.model import Beam, Load, Support  # noqa: E402
from shopbeam.engine.solver import solve  # noqa: E402

EI = 1.5e6


def bvp(L, q, bc):
    """u, u', u'', u''' with EI u'''' = q(x) and the given boundary residual."""
    def f(x, y):
        return np.vstack([y[1], y[2], y[3], q(x) / EI])

    x = np.linspace(0, L, 401)
    res = scipy_integrate.solve_bvp(f, bc, x, np.zeros((4, x.size)), tol=1e-10, max_nodes=200000)
    assert res.success, res.message
    return res.sol


def test_fixed_fixed_linear_plus_uniform_against_solve_bvp():
    L = 4.0
    w0, w1 = -800.0, -2400.0  # trapezoid over the whole span
    beam = Beam(L, EI, (Support(0, "fixed"), Support(L, "fixed")),
                (Load("linear", start=0, end=L, w1=w0, w2=w1),))
    sol = solve(beam)
    ref = bvp(L, lambda x: w0 + (w1 - w0) * x / L,
              lambda ya, yb: np.array([ya[0], ya[1], yb[0], yb[1]]))
    xs = np.linspace(0, L, 41)
    u_ref = ref(xs)[0]
    assert np.max(np.abs(sol.deflection(xs) - u_ref)) < 1e-7 * np.max(np.abs(u_ref))
    m_ref = EI * ref(xs)[2]
    assert np.max(np.abs(sol.moment(xs) - m_ref)) < 1e-6 * np.max(np.abs(m_ref))


def test_propped_cantilever_parabolic_free_shape_against_solve_bvp():
    # pin at 0 (u = 0, M = 0), fixed at L (u = 0, u' = 0), linear load falling to zero
    L = 3.5
    beam = Beam(L, EI, (Support(0, "pin"), Support(L, "fixed")),
                (Load("linear", start=0, end=L, w1=-3000.0, w2=0.0),))
    sol = solve(beam)
    ref = bvp(L, lambda x: -3000.0 * (1 - x / L),
              lambda ya, yb: np.array([ya[0], ya[2], yb[0], yb[1]]))
    xs = np.linspace(0, L, 36)
    u_ref = ref(xs)[0]
    assert np.max(np.abs(sol.deflection(xs) - u_ref)) < 1e-7 * np.max(np.abs(u_ref))
    # the reaction at the pin is the shear there: V = EI u'''
    assert sol.reactions[0].force == pytest.approx(EI * ref(np.array([0.0]))[3][0], rel=1e-6)


def fd_continuous(L, q, interior, n=1600):
    """Finite differences for EI u'''' = q, pinned at both ends and at each `interior` x.

    Pinned ends: u = 0 and u'' = 0, so the ghost node mirrors antisymmetrically
    (u[-1] = -u[1]). At an interior support the node's own equation is replaced by u = 0
    (its residual is the reaction).
    """
    h = L / n
    x = np.linspace(0, L, n + 1)
    m = n - 1  # unknowns u_1 .. u_{n-1}
    A = np.zeros((m, m))
    b = np.array([q(xi) for xi in x[1:n]]) * h**4 / EI

    def idx(j):  # node j -> (column, sign) after the end conditions
        if j == 0 or j == n:
            return None, 0.0
        if j == -1:
            return 0, -1.0
        if j == n + 1:
            return m - 1, -1.0
        return j - 1, 1.0

    for i in range(1, n):
        for k, c in zip(range(-2, 3), (1, -4, 6, -4, 1)):
            col, sign = idx(i + k)
            if col is not None:
                A[i - 1, col] += sign * c
    for xs in interior:
        r = int(round(xs / h)) - 1
        A[r, :] = 0.0
        A[r, r] = 1.0
        b[r] = 0.0
    u = np.zeros(n + 1)
    u[1:n] = np.linalg.solve(A, b)
    return x, u


def test_two_span_partial_uniform_against_finite_differences():
    L = 8.0
    load = Load("uniform", start=1.0, end=5.5, w1=-1200.0)
    beam = Beam(L, EI, (Support(0, "pin"), Support(3.0, "roller"), Support(L, "roller")), (load,))
    sol = solve(beam)
    q = lambda x: -1200.0 if 1.0 <= x <= 5.5 else 0.0  # noqa: E731
    x, u = fd_continuous(L, q, [3.0])
    got = sol.deflection(x)
    scale = np.max(np.abs(got))
    assert np.max(np.abs(got - u)) < 5e-3 * scale
    # and the extreme deflection agrees in value and place
    i = int(np.argmin(u))
    ex = sol.extremes()["deflection"]
    assert ex.min == pytest.approx(u[i], rel=5e-3)
    assert ex.min_at == pytest.approx(x[i], abs=2 * L / 1600 + 1e-3)
