"""Fatigue of steel members under a load that comes and goes: AISC 360-16 Appendix 3.

The allowable stress range of a detail is F_SR = (C_f / n_SR)^0.333 >= F_TH (ksi, eq. A-3-1),
with C_f and the threshold F_TH of its stress category (Table A-3.1); below 20,000 cycles no
fatigue check is needed (A-3.1). Constants recalled from memory; they reproduce the
long-standing allowable ranges at 2,000,000 cycles (A 24, B 18, B' 14.5, C 13, D 10, E 8,
E' 5.8 ksi).

The demand is the live-load bending stress range at the extreme fibre, taken wherever along
the member it is largest (the detail's own place is not known: conservative): every live load
(with the impact allowance) on and off, and over every pattern of patterned loads the sum of
what each span's live load adds either way (a bound). It is judged at the rated load
(`capacity.solved_gaps`): a rating is posted only where the range there passes.
"""

from __future__ import annotations

import math

from shopbeam import units

KSI = 6.894757293168361e6  # Pa
# stress category: (C_f in ksi^3, F_TH in ksi), AISC 360-16 Table A-3.1 (from memory)
CATEGORIES = {"A": (250e8, 24.0), "B": (120e8, 16.0), "B'": (61e8, 12.0), "C": (44e8, 10.0),
              "D": (22e8, 7.0), "E": (11e8, 4.5), "E'": (3.9e8, 2.6)}
FEW_CYCLES = 20_000  # no fatigue check below this many cycles


def allowable_range(category: str, cycles: float) -> float:
    """F_SR (Pa) of eq. A-3-1; inf below 20,000 cycles."""
    if cycles < FEW_CYCLES:
        return math.inf
    cf, fth = CATEGORIES[category]
    return max((cf / cycles) ** 0.333, fth) * KSI


def given(job) -> bool:
    c = job.criteria
    return bool(getattr(c, "fatigue_category", "")) and getattr(c, "cycles", None) is not None


def words(job, fsr: float) -> str:
    c = job.criteria
    n = f"{c.cycles:,.0f}"
    limit = ("no check below 20,000 cycles" if not math.isfinite(fsr) else
             f"F_SR = (C_f / n)^0.333 >= F_TH = {units.fmt(fsr, 'stress', job.units)}")
    return (f"AISC 360-16 Appendix 3, eq. A-3-1 (Table A-3.1, from memory): category "
            f"{c.fatigue_category}, {n} cycles: {limit}")
