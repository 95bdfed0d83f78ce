"""Fatigue of steel members under a load that comes and goes: AISC 360-16 Appendix 3.

The allowable stress range of a detail is F_SR = (C_f / n_SR)^0.333 >= F_TH (ksi, eq. A-3-1),
with C_f and the threshold F_TH of its stress category (Table A-3.1); below 20,000 cycles no
fatigue check is needed (A-3.1). Constants recalled from memory; they reproduce the
long-standing allowable ranges at 2,000,000 cycles (A 24, B 18, B' 14.5, C 13, D 10, E 8,
E' 5.8 ksi).

The demand is the live-load bending stress range at the extreme fibre, taken wherever along
the member it is largest (the detail's own place is not known: conservative): every live load
(with the impact allowance) on and off, and over every pattern of patterned loads the largest
of every arrangement less the smallest, exactly (at each place the sum of what the static live
loads and each span's load add either way). It is a check like the others
(`fatigue_check`): where it comes first it sets the capacity factor (`capacity._fatigue_cap`);
a sizing row whose factor comes from the batched search is judged at that factor instead
(`capacity._fatigue`).
"""

from __future__ import annotations

import math

import numpy as np

from shopbeam import units
from shopbeam.design.basis import tip_hung
from shopbeam.design.results import Check
from shopbeam.jobs.rules import FATIGUE_CATEGORIES as CATEGORIES

KSI = 6.894757293168361e6  # Pa
FEW_CYCLES = 20_000  # no fatigue check below this many cycles


# ASME BTH-1 3-4.3 (from memory): a below-the-hook lifting device is designed for fatigue by
# its service class, set by its load cycles in life (Table 3-2: class 0 up to 20,000, 1 to
# 100,000, 2 to 500,000, 3 to 2,000,000, 4 over), and the allowable stress range of its class
# (Table 3-4), which is eq. A-3-1 at the class's upper bound of cycles and the threshold F_TH
# for class 4 (category E: 22, 13, 8 and 4.5 ksi): never more than A-3-1 at the count itself
BTH_CLASSES = ((FEW_CYCLES, 0), (100_000, 1), (500_000, 2), (2_000_000, 3))


def bth_class(job) -> tuple[int, float] | None:
    """(service class, the cycles its allowable range is read at; inf for class 4) of a
    below-the-hook device (`[criteria] lifting = "below-the-hook"`), or None for any other
    job (AISC 360-16 Appendix 3 at the cycles given)."""
    c = job.criteria
    if getattr(c, "lifting", "") != "below-the-hook" or getattr(c, "cycles", None) is None:
        return None
    for top, n in BTH_CLASSES:
        if c.cycles <= top:
            return n, float(top)
    return 4, math.inf


def allowable_range(category: str, cycles: float) -> float:
    """F_SR (Pa) of eq. A-3-1; inf below 20,000 cycles; the threshold F_TH at inf cycles."""
    if cycles < FEW_CYCLES:
        return math.inf
    cf, fth = CATEGORIES[category]
    return max((cf / cycles) ** 0.333, fth) * KSI


def job_range(job) -> float:
    """The allowable stress range (Pa) of the job's detail: ASME BTH-1's service class for a
    below-the-hook device (`bth_class`), eq. A-3-1 at the cycles given otherwise."""
    c = job.criteria
    cls = bth_class(job)
    if cls is None:
        return allowable_range(c.fatigue_category, c.cycles)
    if cls[0] == 0:
        return math.inf  # service class 0 (up to 20,000 cycles): no fatigue check
    return allowable_range(c.fatigue_category, cls[1])


def given(job) -> bool:
    c = job.criteria
    return bool(getattr(c, "fatigue_category", "")) and getattr(c, "cycles", None) is not None


def tip_loaded(job) -> bool:
    """Trolley wheels or a clamp bear on the bottom flange's tips (a lifting job's trolley,
    a load hung on a clamp): their local flange bending is a stress range of its own at the
    flange, which the range worked out here (global bending) leaves out."""
    lifting = bool(job.lifting or getattr(job.criteria, "lifting", ""))
    return bool(tip_hung(job)) or (lifting and bool(job.moving))


def checked(job) -> bool:
    """Whether the job's fatigue is settled here: `fatigue_check` works the range out (the
    keys given, a steel member, no moving load, nothing on the flange tips), or the keys
    give fewer than 20,000 cycles, which need no check (AISC 360-16 A-3.1)."""
    if given(job) and not math.isfinite(job_range(job)):
        return True  # A-3.1 (BTH-1 service class 0): too few cycles to need a check: settled
    return (given(job) and getattr(job.material, "kind", "") in ("steel", "stainless")
            and not job.moving and not tip_loaded(job))


def words(job, fsr: float) -> str:
    c = job.criteria
    n = f"{c.cycles:,.0f}"
    cls = bth_class(job)
    if cls is not None:
        at = ("the threshold F_TH" if not math.isfinite(cls[1]) else
              f"F_SR = (C_f / n)^0.333 at the class's {cls[1]:,.0f} cycles")
        limit = ("no check in service class 0 (up to 20,000 cycles)" if not math.isfinite(fsr)
                 else f"{at} = {units.fmt(fsr, 'stress', job.units)}")
        return (f"ASME BTH-1 3-4.3, service class {cls[0]} for {n} cycles (Tables 3-2 and "
                f"3-4, from memory; the ranges of AISC 360-16 eq. A-3-1, Table A-3.1): "
                f"category {c.fatigue_category}: {limit}")
    limit = ("no check below 20,000 cycles" if not math.isfinite(fsr) else
             f"F_SR = (C_f / n)^0.333 >= F_TH = {units.fmt(fsr, 'stress', job.units)}")
    return (f"AISC 360-16 Appendix 3, eq. A-3-1 (Table A-3.1, from memory): category "
            f"{c.fatigue_category}, {n} cycles: {limit}")


def fatigue_range(job, st, ss, k: float) -> tuple[float, float] | None:
    """(live stress range, allowable F_SR), Pa, at the factor k (see design.fatigue), or None
    where it is not worked out (a moving load, wheels or a clamp on the flange tips)."""
    if ss.parts.moving or tip_loaded(job):
        return None
    kk = k * (1 + ss.parts.impact)
    live = ss.live.moment
    if not ss.spans:
        m = abs(live.extremes(0.0, job.length).abs_max)
    else:
        m = _largest_sum_of_abs([live] + [sp.moment for sp in ss.spans])
    sec = getattr(st, "section", None) or job.section
    s = min(sec.sx_top, sec.sx_bot)
    return kk * m / s, job_range(job)


def _largest_sum_of_abs(funcs) -> float:
    """max over x of sum |f_i(x)|, exactly, for piecewise polynomials on the same breaks: the
    live moment range where each f_i comes and goes by itself (the static live loads, each
    span's patterned load), as the largest of every arrangement less the smallest is, at each
    x, the sum of what each adds either way. On each piece the f_i keep their signs between
    their real roots, so there the sum is one polynomial, whose largest is at an end of the
    stretch or a root of its derivative."""
    br = funcs[0].breaks
    co = np.stack([f.coeffs for f in funcs])  # (functions, pieces, degree + 1)
    best = 0.0
    for j, h in enumerate(np.diff(br)):
        if h <= 0:
            continue
        c = co[:, j, :]
        cuts = [0.0, float(h)]
        for row in c:
            cuts += _real_roots_in(row, h)
        cuts = sorted(set(cuts))
        for t0, t1 in zip(cuts[:-1], cuts[1:]):
            if t1 - t0 <= 1e-15 * h:
                continue
            mid = 0.5 * (t0 + t1)
            signs = np.sign(np.polynomial.polynomial.polyval(mid, c.T))
            g = signs @ c  # the sum of |f_i| on this stretch, ascending powers
            ts = [t0, t1] + [t for t in _real_roots_in(
                np.polynomial.polynomial.polyder(g), h) if t0 < t < t1]
            best = max(best, float(np.max(np.polynomial.polynomial.polyval(
                np.array(ts), g))))
    return best


def _real_roots_in(asc, h: float) -> list[float]:
    """The real roots of the polynomial (ascending coefficients) strictly inside (0, h)."""
    a = np.trim_zeros(np.asarray(asc, dtype=float), "b")
    if len(a) < 2:
        return []
    r = np.roots(a[::-1])
    scale = max(abs(h), 1e-300)
    return [float(x.real) for x in r
            if abs(x.imag) <= 1e-9 * scale and 0.0 < x.real < h]


def fatigue_check(job, st, ss, k: float) -> Check | None:
    """The fatigue limit state at the factor k (AISC 360-16 Appendix 3, `design.fatigue`)
    as a check, or None where the job gives no fatigue detail or it is not worked out here
    (not steel, a moving load: `capacity._fatigue` then holds the rating)."""
    if not given(job) or getattr(job.material, "kind", "") not in ("steel", "stainless"):
        return None
    got = fatigue_range(job, st, ss, k)
    if got is None:
        return None
    fr, fsr = got
    if not math.isfinite(fsr):
        return None  # fewer than 20,000 cycles: no fatigue check is needed
    cls = bth_class(job)
    return Check("fatigue", fr, fsr, "Pa",
                 "live-load stress range (every live load on and off, with the impact "
                 "allowance; the largest along the member) against " + words(job, fsr),
                 clause=("AISC 360-16 Appendix 3, eq. A-3-1" if cls is None else
                         f"ASME BTH-1 3-4.3, service class {cls[0]}"),
                 source=("AISC 360-16" if cls is None else
                         "ASME BTH-1 (from memory); AISC 360-16 Appendix 3"),
                 params={"F_SR": fsr, "cycles": float(job.criteria.cycles),
                         **({"service_class": float(cls[0])} if cls is not None else {})})
