"""Self-checks run on every solve: the checks an engineer makes on an answer before trusting it.

Each returns a `SelfCheck` with pass/warn and its figures. Exact checks (equilibrium,
boundary conditions, jumps, curvature) hold to rounding for a correct solve; the magnitude
checks are rules of thumb of the trade (common practice, no source) that catch unit slips.
"""

from __future__ import annotations

import math

import numpy as np

from dataclasses import dataclass, field

from shopbeam.engine.model import segments
from shopbeam.engine.piecewise import unique


@dataclass(frozen=True)
class SelfCheck:
    """One of the checks run on every answer: `ok` False means look harder (a warning)."""

    name: str
    ok: bool
    detail: str
    figures: dict = field(default_factory=dict)

REL = 1e-7  # relative tolerance for the exact checks (rounding is ~1e-13)


def _applied_totals(loads) -> tuple[float, float, float, float]:
    """(sum of forces, sum of moments about x = 0, sum |forces|, sum |couples|)."""
    fy = mz = fabs = cabs = 0.0
    for ld in loads:
        if ld.kind == "point":
            fy += ld.value
            mz += ld.value * ld.at
            fabs += abs(ld.value)
        elif ld.kind == "moment":
            mz += ld.value
            cabs += abs(ld.value)
        else:
            s, l = ld.start, ld.end - ld.start
            w1 = ld.w1
            w2 = ld.w1 if ld.kind == "uniform" else ld.w2
            f = 0.5 * (w1 + w2) * l
            fy += f
            mz += l * (w1 * (s + l / 2) + (w2 - w1) * (s / 2 + l / 3))
            fabs += 0.5 * (abs(w1) + abs(w2)) * l
    return fy, mz, fabs, cabs


def _tol(scale: float) -> float:
    return REL * scale + 1e-300


def self_checks(sol: "Solution") -> list[SelfCheck]:
    beam = sol.beam
    L, ei = beam.length, beam.ei
    fy, mz, fabs, cabs = _applied_totals(beam.loads)
    rf = sum(r.force for r in sol.reactions)
    rm = sum(r.force * r.at + r.moment for r in sol.reactions)
    fscale = fabs + sum(abs(r.force) for r in sol.reactions)
    mscale = fscale * L + cabs + sum(abs(r.moment) for r in sol.reactions)
    out = []

    res_f, res_m = fy + rf, mz + rm
    ok = abs(res_f) <= _tol(fscale) and abs(res_m) <= _tol(mscale)
    out.append(SelfCheck(
        "equilibrium", ok,
        f"vertical forces balance to {abs(res_f) / (fscale or 1.0):.1e} and moments about the "
        f"left end to {abs(res_m) / (mscale or 1.0):.1e} of the loads and reactions",
        {"sum_force": res_f, "sum_moment": res_m, "force_scale": fscale}))

    ex = sol.extremes()
    umax, tmax, mmax, vmax = (ex["deflection"].abs_max, ex["slope"].abs_max,
                              ex["moment"].abs_max, ex["shear"].abs_max)
    # natural scales of the answer, so that a residual is judged against the loads even
    # where the response itself is zero (a load right over a support)
    lref = max(b - a for a, b, _ in segments(beam))
    f_all = fscale + (cabs + sum(abs(r.moment) for r in sol.reactions)) / lref
    u_scale = max(umax, f_all * lref**3 / ei)
    t_scale = max(tmax, f_all * lref**2 / ei)
    m_scale = max(mmax, mscale)
    worst = 0.0
    counts = {"no deflection": 0, "no slope": 0, "no moment at a hinge": 0, "R = -k u": 0}
    for s in beam.supports:
        if s.stops_deflection:
            worst = max(worst, abs(sol.deflection(s.at)) / (u_scale or 1.0))
            counts["no deflection"] += 1
        if s.kind == "fixed":
            worst = max(worst, abs(sol.slope(s.at)) / (t_scale or 1.0))
            counts["no slope"] += 1
        if s.kind == "hinge":
            worst = max(worst, abs(sol.moment(s.at)) / (m_scale or 1.0))
            counts["no moment at a hinge"] += 1
        if s.kind == "spring":
            r = next(r for r in sol.reactions if r.at == s.at and r.kind == "spring")
            gap = r.force + s.stiffness * sol.deflection(s.at)
            # judged against its two terms: the forces (couples count too) and k times the
            # deflection scale, which carries rounding k-fold for a very stiff spring
            worst = max(worst, abs(gap) / (max(f_all, s.stiffness * u_scale) or 1.0))
            counts["R = -k u"] += 1
    met = ", ".join(f"{k} ({n})" for k, n in counts.items() if n)
    out.append(SelfCheck(
        "boundary conditions", worst <= REL,
        f"{met}: met to {worst:.1e} of the answer's size" if met else "no conditions",
        {"worst_relative": worst}))

    # jumps: shear by each force (loads and reactions), moment by each couple
    forces: dict[float, float] = {}
    couples: dict[float, float] = {}
    breaks = sol.shear.breaks  # the solver merges positions within 1e-9 L onto one break

    def add(d, x, v):
        # the nearest break by bisection (log of the pieces per load, not all of them)
        i = int(np.searchsorted(breaks, x))
        j = i if i == 0 or (i < len(breaks) and breaks[i] - x < x - breaks[i - 1]) else i - 1
        j = min(j, len(breaks) - 1)
        k = float(breaks[j]) if abs(breaks[j] - x) <= 1.01e-9 * L else x
        d[k] = d.get(k, 0.0) + v

    for ld in beam.loads:
        if ld.kind == "point":
            add(forces, ld.at, ld.value)
        elif ld.kind == "moment":
            add(couples, ld.at, -ld.value)
    for r in sol.reactions:
        add(forces, r.at, r.force)
        if r.moment:
            add(couples, r.at, -r.moment)
    for name, fn, items, scale in (("shear jumps", sol.shear, forces, fscale),
                                   ("moment jumps", sol.moment, couples, mscale / max(L, 1e-12))):
        worst_gap, count = 0.0, 0
        for x, expect in items.items():
            left = fn(x, "left") if x > breaks[0] else 0.0
            right = fn(x, "right") if x < breaks[-1] else 0.0
            worst_gap = max(worst_gap, abs((right - left) - expect))
            count += 1
        places = f"{count} place{'s' if count != 1 else ''}"
        if name == "moment jumps":
            what = (f"moment steps down by each counterclockwise couple and end moment ({places})"
                    if count else "no couples or end moments, so no moment steps")
        else:
            what = f"shear steps by each point load and reaction ({places})"
        rel = worst_gap / (scale or 1.0)
        out.append(SelfCheck(name, worst_gap <= _tol(scale),
                             f"{what}, to within {rel:.1e}" if count else what,
                             {"worst": worst_gap}))

    # curvature: u'' = M / EI everywhere, so the shape curves the way the moment says
    curv = sol.deflection.derivative().derivative()
    mid = 0.5 * (sol.moment.breaks[:-1] + sol.moment.breaks[1:])
    xs = np.concatenate([mid, [ex["moment"].max_at, ex["moment"].min_at]])
    gap = np.max(np.abs(curv(xs) * ei - sol.moment(xs))) if xs.size else 0.0
    signs_ok = True
    mvals = sol.moment(xs)
    big = np.abs(mvals) > 1e-6 * (mmax or 1.0)
    if np.any(big):
        signs_ok = bool(np.all(np.sign(curv(xs)[big]) == np.sign(mvals[big])))
    out.append(SelfCheck(
        "curvature", signs_ok and gap <= _tol(m_scale),
        "sags where the moment is positive and hogs where it is negative (EI u'' = M)",
        {"worst": float(gap)}))

    # Magnitudes: rules of thumb of the trade (common practice, no source). The lever arm is
    # the longest span or overhang; the deflection scale adds a spring's own give. The forces
    # on the beam are its loads and its reactions: two close supports under a long overhang
    # (bolts of a bracket) carry many times the load, and so does the shear between them.
    fref = (fabs + sum(abs(r.force) for r in sol.reactions)
            + (cabs + sum(abs(r.moment) for r in sol.reactions)) / max(lref, 1e-12))
    springs = [s.stiffness for s in beam.supports if s.kind == "spring"]
    # deflection is levered up where the beam tips about a support or hinge close to another
    # (a spring's give, or the bending beyond a hinge, carried out to a long overhang)
    pts = unique([s.at for s in beam.supports])
    lever = max(1.0, L / float(np.min(np.diff(pts)))) if pts.size > 1 else 1.0
    uref = lever * (fref * lref**3 / ei + (fref / min(springs) if springs else 0.0))
    if fref > 0:
        # a load of next to nothing (a subnormal float) can leave a scale 0: no ratio then
        rv = vmax / fref
        rm_ = mmax / (fref * lref) if fref * lref > 0 else (0.0 if mmax == 0 else math.inf)
        ru = umax / uref if uref > 0 else (0.0 if umax == 0 else math.inf)
        ok_v, ok_m, ok_u = rv <= 1.5, rm_ <= 1.5, ru <= 1.0
        out.append(SelfCheck(
            "shear magnitude", ok_v,
            f"largest shear is {rv:.3g} x the total of loads and reactions (expect 1 or less)",
            {"ratio": rv}))
        out.append(SelfCheck(
            "moment magnitude", ok_m,
            f"largest moment is {rm_:.3g} x force x longest span or overhang "
            "(expect 1 or less)", {"ratio": rm_}))
        out.append(SelfCheck(
            "deflection magnitude", ok_u,
            f"EI x largest deflection is {ru:.3g} x P L^3 (expect 1 or less)", {"ratio": ru}))
    # Conditioning: rounding grows with the condition number of the solved equations, so the
    # answer is good to about eps x condition (supports or hinges very close together on a
    # long beam). Warn when that could reach the 4th significant figure the report shows.
    if getattr(sol, "exact", False):
        out.append(SelfCheck(
            "conditioning", True,
            f"the equations were solved in exact arithmetic (their condition number, "
            f"{sol.condition:.1e}, is too large for floating point): results good to rounding",
            {"condition": sol.condition, "relative_accuracy": 2.2e-16}))
        return out
    est = 2.2e-16 * sol.condition
    out.append(SelfCheck(
        "conditioning", est <= 1e-4,
        f"results good to about {est:.0e} relative (condition number {sol.condition:.1e})"
        + ("" if est <= 1e-4 else ": supports or hinges are very close together for the "
           "length; merge them or move them apart"),
        {"condition": sol.condition, "relative_accuracy": est}))
    return out


# the self-checks that hold to rounding for every correct solve; the magnitude checks are
# rules of thumb (a warning to look again, not a sign of a wrong answer)
EXACT_CHECKS = ("equilibrium", "boundary conditions", "shear jumps", "moment jumps",
                "curvature", "conditioning")


def failed_checks(sol: "Solution") -> list[SelfCheck]:
    return [d for d in sol.diagnostics if d.name in EXACT_CHECKS and not d.ok]
