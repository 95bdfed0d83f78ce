"""One regression test per engine bug found by the benchmarks and the robustness suite.

Each test is named after what broke and fails on the code before its fix.
"""

from __future__ import annotations

import pytest

from shopbeam.model import Beam, Load, Support
from shopbeam.solver import solve


def test_positions_not_rounded_to_a_grid_of_one_billionth_of_the_length():
    # The solver used to round every position to a grid of 1e-9 L to merge near-equal ones,
    # which moved a load at L/3 by ~1e-9 L and made the reactions good to only ~1e-9.
    # Simple span, point load P at a from the left: R_left = P (L - a) / L, R_right = P a / L
    # (statics, AISC Manual Table 3-23, case 8).
    L, a, P = 3.0, 1.0, 1000.0
    sol = solve(Beam(L, 1e6, (Support(0.0, "pin"), Support(L, "roller")),
                     (Load("point", at=a, value=-P),)))
    left, right = (r.force for r in sol.reactions)
    assert left == pytest.approx(P * (L - a) / L, rel=1e-13)
    assert right == pytest.approx(P * a / L, rel=1e-13)
    # the load still sits exactly where it was put: the shear steps at x = a
    assert sol.shear(a - 1e-6) == pytest.approx(P * (L - a) / L, rel=1e-12)
    assert sol.shear(a + 1e-6) == pytest.approx(-P * a / L, rel=1e-12)


def test_positions_a_rounding_apart_still_merge():
    # "4 ft" and "48 in" convert to floats that differ in the last bits; they must be one
    # break, so a support there and a load there act at the same point (common practice).
    L = 3.6576
    x1, x2 = 4 * 0.3048, 48 * 0.0254
    sol = solve(Beam(L, 1e6, (Support(0.0, "pin"), Support(x1, "roller"), Support(L, "roller")),
                     (Load("point", at=x2, value=-1000.0),)))
    # the load sits on the middle support, so it takes it all
    assert sol.reactions[1].force == pytest.approx(1000.0, rel=1e-9)
    assert abs(sol.reactions[0].force) < 1e-6 and abs(sol.reactions[2].force) < 1e-6
