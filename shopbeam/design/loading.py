"""Loads that come and go or move: load states, pattern loading and moving point loads.

The job's member loads split into fixed loads (dead loads and self-weight, never scaled,
never patterned), live loads (scaled by the capacity factor k and by the impact allowance)
and patterned live loads, which are cut at the supports into one piece per span or overhang
and applied in every combination of loaded and empty spans. Every state is a superposition
of solutions solved once (each carries zero loads at every position any other carries, so
all share one set of breaks and add coefficient by coefficient).

Moving point loads (``[[moving]]``: a wheel set at fixed spacing over a travel range) are
found exactly. For a wheel set at position p the response at x is a piecewise polynomial in
(x, p), smooth inside cells bounded by fixed breaks (supports, hinges, load edges, brace
points) and by the wheels. The worst (x, p) is therefore at a p-break (a wheel on a fixed
break or at the end of its travel), at a stationary point in p of the response at a fixed
break, at a stationary point in p of the response under a wheel, or at an interior critical
point of a cell. The second and third kinds are polynomials in p, fitted exactly from solves
at Chebyshev nodes; the fourth comes from the resultant of the two partial derivatives. The
checks are run at every candidate position; the worst position of each check is reported.
Under moving loads Cb is taken as 1.0 (conservative, stated).
"""

from __future__ import annotations

import math
from dataclasses import dataclass, replace

import numpy as np

from shopbeam.engine.model import Beam, Load
from shopbeam.engine.piecewise import Piecewise
from shopbeam.engine.solver import Reaction, Solution, segments, solve

MAX_PATTERN_SEGMENTS = 10  # 2^10 = 1024 states


# ------------------------------------------------------------------ moving loads
@dataclass(frozen=True)
class MovingLoad:
    """A set of wheels at fixed spacing: live loads (scaled) and dead loads (not), + up."""

    label: str
    live: tuple[float, ...]
    dead: tuple[float, ...]
    offsets: tuple[float, ...]  # from the first wheel
    travel: tuple[float, float]  # range the whole set stays within
    key: str = "moving[0]"

    @property
    def p_range(self) -> tuple[float, float]:
        return self.travel[0], self.travel[1] - self.offsets[-1]


def read_moving(job) -> tuple[MovingLoad, ...]:
    """The job's wheel sets as one member carries them (its share of the wheel loads)."""
    share = 1.0 / job.members
    return tuple(MovingLoad(w.label, tuple(x * share for x in w.live),
                            tuple(x * share for x in w.dead), w.offsets, w.travel, w.key)
                 for w in job.moving)


# ------------------------------------------------------------------ load parts
@dataclass(frozen=True)
class LoadParts:
    fixed: tuple[Load, ...]
    live: tuple[Load, ...]
    patterned: tuple[Load, ...]
    moving: tuple[MovingLoad, ...]
    impact: float


def load_parts(job, section=None) -> LoadParts:
    from shopbeam.design.checks import impact_of

    j = job if section is None else replace(job, section=section)
    loads = j.member_loads()
    fixed = tuple(ld for ld in loads if ld.case != "live")
    live = tuple(ld for ld in loads if ld.case == "live" and not ld.patterned)
    pat = tuple(ld for ld in loads if ld.case == "live" and ld.patterned)
    return LoadParts(fixed, live, pat, read_moving(job), impact_of(job))


def needs_states(job) -> bool:
    p = load_parts(job)
    return bool(p.patterned or p.moving or p.impact)


def clip(ld: Load, a: float, b: float) -> Load | None:
    """The part of a distributed load between a and b (None if it misses)."""
    lo, hi = max(ld.start, a), min(ld.end, b)
    if hi <= lo + 1e-12 * max(1.0, abs(b)):
        return None
    if ld.kind == "uniform":
        return replace(ld, start=lo, end=hi)
    f = lambda x: ld.w1 + (ld.w2 - ld.w1) * (x - ld.start) / (ld.end - ld.start)  # noqa: E731
    return replace(ld, start=lo, end=hi, w1=f(lo), w2=f(hi))


def _positions(loads) -> set[float]:
    out = set()
    for ld in loads:
        out.update(ld.describe_position())
    return out


def _dummies(positions) -> list[Load]:
    return [Load("point", at=x, value=0.0, label="(break)") for x in sorted(positions)]


def combine(parts: list[tuple[float, Solution]], beam: Beam) -> Solution:
    """sum(f * solution) for solutions sharing one set of breaks."""
    base = parts[0][1]
    for _, s in parts[1:]:
        if s.moment.breaks.shape != base.moment.breaks.shape or not np.allclose(
                s.moment.breaks, base.moment.breaks, rtol=0, atol=1e-12 * beam.length):
            raise ValueError("solutions do not share their breaks")

    def add(name):
        co = sum(f * getattr(s, name).coeffs for f, s in parts)
        return Piecewise(getattr(base, name).breaks, co)

    reactions = tuple(Reaction(r.at, r.kind, sum(f * s.reactions[i].force for f, s in parts),
                               sum(f * s.reactions[i].moment for f, s in parts), r.key)
                      for i, r in enumerate(base.reactions))
    hinges = tuple((h[0], sum(f * s.hinge_rotations[i][1] for f, s in parts))
                   for i, h in enumerate(base.hinge_rotations))
    return Solution(beam=beam, reactions=reactions, hinge_rotations=hinges,
                    ei_slope_0=sum(f * s.ei_slope_0 for f, s in parts),
                    ei_deflection_0=sum(f * s.ei_deflection_0 for f, s in parts),
                    load=add("load"), shear=add("shear"), moment=add("moment"),
                    slope=add("slope"), deflection=add("deflection"),
                    condition=max(s.condition for _, s in parts))


@dataclass(frozen=True)
class StateSet:
    """Unit solutions from which every load state is a weighted sum."""

    beam: Beam  # supports and stiffness (no loads)
    fixed: Solution
    live: Solution
    spans: tuple[Solution, ...]  # patterned loads clipped to each segment
    segs: tuple[tuple[float, float, str], ...]
    parts: LoadParts
    span_loads: tuple[tuple[Load, ...], ...]

    @property
    def patterns(self) -> list[tuple[int, ...]]:
        if not self.parts.patterned:
            return [()]
        n = len(self.segs)
        return [tuple(i for i in range(n) if mask >> i & 1) for mask in range(2**n)]

    def state(self, k: float, pattern: tuple[int, ...]) -> Solution:
        kk = k * (1 + self.parts.impact)
        parts = [(1.0, self.fixed), (kk, self.live)] + [(kk, self.spans[i]) for i in pattern]
        loads = list(self.parts.fixed) + [ld.scaled(kk) for ld in self.parts.live]
        for i in pattern:
            loads += [ld.scaled(kk) for ld in self.span_loads[i]]
        return combine(parts, replace(self.beam, loads=tuple(loads)))

    def static_loads(self, k: float, pattern) -> list[Load]:
        kk = k * (1 + self.parts.impact)
        loads = list(self.parts.fixed) + [ld.scaled(kk) for ld in self.parts.live]
        for i in pattern:
            loads += [ld.scaled(kk) for ld in self.span_loads[i]]
        return loads


def state_set(job, section=None, parts: LoadParts | None = None, ei: float | None = None,
              length_fmt=None) -> StateSet:
    from shopbeam.errors import InputError

    parts = parts or load_parts(job, section)
    sec = section or job.section
    if ei is None:
        from shopbeam.members.sections import bending_ix

        ei = job.material.e * bending_ix(sec, job.restrained)
    empty = Beam(job.length, ei, job.supports, ())
    segs = tuple(segments(empty))
    span_loads = []
    if parts.patterned:
        if len(segs) > MAX_PATTERN_SEGMENTS:
            raise InputError(f"{len(segs)} spans and overhangs give 2^{len(segs)} patterns; "
                             f"pattern loading takes up to {MAX_PATTERN_SEGMENTS}: split the "
                             "job or drop patterned = true", "loads")
        for a, b, _ in segs:
            span_loads.append(tuple(c for c in (clip(ld, a, b) for ld in parts.patterned) if c))
    allpos = _positions(parts.fixed) | _positions(parts.live)
    for sl in span_loads:
        allpos |= _positions(sl)
    dummies = _dummies(allpos)

    def sol(loads):
        return solve(replace(empty, loads=tuple(loads) + tuple(dummies)), length_fmt)

    return StateSet(empty, sol(parts.fixed), sol(parts.live), tuple(sol(s) for s in span_loads),
                    segs, parts, tuple(span_loads))


def describe_pattern(ss: StateSet, pattern, fmt=None) -> str:
    if not ss.parts.patterned:
        return ""
    fmt = fmt or (lambda x: f"{x:.4g} m")
    if not pattern:
        return "patterned loads off everywhere"
    names = [f"{ss.segs[i][2]} {fmt(ss.segs[i][0])}-{fmt(ss.segs[i][1])}" for i in pattern]
    return "patterned loads on " + ", ".join(names)


# ------------------------------------------------------------------ evaluation
@dataclass(frozen=True)
class Evaluation:
    """The worst of every check over all load states at factor k."""

    k: float
    checks: tuple  # Check, worst state per check (its detail says which state)
    worst: dict  # check name -> {"pattern": (...), "position": p or None, "words": str}
    states: int
    solution: Solution | None = None  # the state governing the governing check


def _fmt_for(job):
    from shopbeam import units

    return lambda x: units.fmt(x, "length", job.units)


def evaluate(job, k: float = 1.0, section=None, ss: StateSet | None = None,
             strengths=None, moving_cache: dict | None = None) -> Evaluation:
    """Every check at live-load factor k over every pattern and moving-load position."""
    from shopbeam.design.checks import checks_for
    from shopbeam.design.checks import strengths as strengths_of

    ss = ss or state_set(job, section)
    st = strengths or strengths_of(job, sec=section, beam=ss.beam)
    fmt = _fmt_for(job)
    best: dict[str, tuple] = {}
    count = 0
    for pattern in ss.patterns:
        words = describe_pattern(ss, pattern, fmt)
        if ss.parts.moving:
            mv = ss.parts.moving[0]
            static = ss.static_loads(k, pattern)
            for p, sol in moving_states(job, ss, static, k, st, moving_cache):
                count += 1
                shown = round(p / (job.length * 1e-6)) * job.length * 1e-6  # no 1e-7 ft noise
                where = f"{mv.label} first wheel at {fmt(shown)}"
                for c in checks_for(job, sol, st, cb_one=True):
                    _keep(best, c, pattern, p, "; ".join(x for x in (words, where) if x), sol)
        else:
            sol = ss.state(k, pattern)
            count += 1
            for c in checks_for(job, sol, st):
                _keep(best, c, pattern, None, words, sol)
    checks, worst = [], {}
    for name, (c, pattern, p, words, sol) in best.items():
        if words:
            c = replace(c, detail="; ".join(x for x in (c.detail, "worst state: " + words) if x))
        if ss.parts.moving and name == "bending":
            c = replace(c, formula=c.formula + " (moving loads: Cb = 1.0)")
        checks.append(c)
        worst[name] = {"pattern": pattern, "position": p, "words": words}
    gov = max(checks, key=lambda c: c.ratio)
    return Evaluation(k, tuple(checks), worst, count, best[gov.name][4])


def _keep(best, c, pattern, p, words, sol):
    old = best.get(c.name)
    if old is None or c.ratio > old[0].ratio:
        best[c.name] = (c, pattern, p, words, sol)


# ------------------------------------------------------------------ moving-load candidates
_NS = 14  # samples per p-piece (fits of degree <= 10 are exact to rounding)


def _cheb_nodes(a: float, b: float, n: int) -> np.ndarray:
    j = np.arange(n)
    return 0.5 * (a + b) + 0.5 * (b - a) * np.cos(np.pi * (j + 0.5) / n)[::-1]


def _stationary(pvals: np.ndarray, fvals: np.ndarray, a: float, b: float, deg: int) -> list[float]:
    """Stationary points in (a, b) of the polynomial through (pvals, fvals)."""
    if b - a <= 0:
        return []
    rho = (2 * pvals - (a + b)) / (b - a)
    c = np.polynomial.chebyshev.chebfit(rho, fvals, deg)
    scale = np.max(np.abs(c)) if c.size else 0.0
    if scale == 0:
        return []
    c[np.abs(c) < 1e-13 * scale] = 0.0
    dc = np.polynomial.chebyshev.chebder(c)
    if not np.any(dc):
        return []
    while dc.size > 1 and dc[-1] == 0:
        dc = dc[:-1]
    if dc.size < 2:
        return []
    r = np.polynomial.chebyshev.chebroots(dc)
    r = r[np.abs(r.imag) < 1e-7].real
    r = r[(r > -1) & (r < 1)]
    return list(0.5 * (a + b) + 0.5 * (b - a) * r)


def _shift(c: np.ndarray, d: float) -> np.ndarray:
    """Ascending coefficients of p(t) -> those of q(tau) = p(tau + d)."""
    n = len(c)
    out = np.zeros(n)
    for m in range(n):
        for i in range(m + 1):
            out[i] += c[m] * math.comb(m, i) * d ** (m - i)
    return out


def _piece(pw: Piecewise, x: float) -> tuple[float, np.ndarray]:
    j = int(np.clip(np.searchsorted(pw.breaks, x, side="right") - 1, 0, len(pw.breaks) - 2))
    return float(pw.breaks[j]), pw.coeffs[j]


def _sylvester_det(f: np.ndarray, g: np.ndarray) -> float:
    """Resultant of two polynomials (descending coefficients) by the Sylvester matrix."""
    m, n = len(f) - 1, len(g) - 1
    size = m + n
    if size == 0:
        return 1.0
    s = np.zeros((size, size))
    for i in range(n):
        s[i, i:i + m + 1] = f
    for i in range(m):
        s[n + i, i:i + n + 1] = g
    return float(np.linalg.det(s))


def _interior(static_c: np.ndarray, cm_fits: list, h: float, a: float, b: float) -> list[float]:
    """p in (a, b) where d/dx and d/dp of static(tau) + sum C_m(p) tau^m vanish together."""
    n_nodes = 40
    rho = np.cos(np.pi * (np.arange(n_nodes) + 0.5) / n_nodes)
    dm = len(cm_fits) - 1
    ds = max(len(static_c) - 1, dm)
    sc = np.zeros(ds + 1)
    sc[: len(static_c)] = static_c
    hp = h ** np.arange(ds + 1)
    fs, gs = [], []
    for r in rho:
        cm = np.zeros(ds + 1)
        dcm = np.zeros(ds + 1)
        for m, fit in enumerate(cm_fits):
            cm[m] = np.polynomial.chebyshev.chebval(r, fit)
            dcm[m] = np.polynomial.chebyshev.chebval(r, np.polynomial.chebyshev.chebder(fit))
        tot = (sc + cm) * hp  # in sigma = tau / h
        fsig = tot[1:] * np.arange(1, ds + 1)  # d/dsigma, ascending
        gp = dcm * hp
        fs.append(fsig)
        gs.append(gp)
    fs, gs = np.array(fs), np.array(gs)

    def degree(arr):
        mag = np.max(np.abs(arr), axis=0)
        top = mag.max() if mag.size else 0.0
        if top == 0:
            return -1
        idx = np.nonzero(mag > 1e-11 * top)[0]
        return int(idx[-1])

    df, dg = degree(fs), degree(gs)
    if df < 1 or dg < 0:  # f independent of x in the cell, or of p: edges cover it
        return []
    dets = np.array([_sylvester_det(fs[i, : df + 1][::-1], gs[i, : dg + 1][::-1])
                     for i in range(n_nodes)])
    top = np.max(np.abs(dets))
    if not np.isfinite(top) or top == 0:
        return []
    c = np.polynomial.chebyshev.chebfit(rho, dets / top, n_nodes - 1)
    c[np.abs(c) < 1e-12] = 0.0
    while c.size > 1 and c[-1] == 0:
        c = c[:-1]
    if c.size < 2:
        return []
    r = np.polynomial.chebyshev.chebroots(c)
    r = r[np.abs(r.imag) < 1e-6].real
    r = r[(r > -1) & (r < 1)]
    return list(0.5 * (a + b) + 0.5 * (b - a) * r)


def _wheel_beam(beam: Beam, mv: MovingLoad, p: float, which: str) -> Beam:
    forces = mv.live if which == "live" else mv.dead
    loads = tuple(Load("point", at=p + s, value=f, label=mv.label)
                  for s, f in zip(mv.offsets, forces))
    return replace(beam, loads=loads)


def fixed_breaks(job, ss: StateSet, static_loads) -> list[float]:
    from shopbeam.design.checks import brace_points

    L = job.length
    xs = {0.0, L} | {s.at for s in job.supports} | _positions(static_loads)
    xs |= set(brace_points(job)[1])
    return sorted(x for x in xs if -1e-12 <= x <= L * (1 + 1e-12))


def candidate_positions(job, ss: StateSet, static_loads, k: float, cache=None) -> list[float]:
    """Every first-wheel position where some check can reach its worst (see module doc)."""
    mv = ss.parts.moving[0]
    kk = k * (1 + ss.parts.impact)
    L = job.length
    tol = 1e-9 * L
    p_lo, p_hi = mv.p_range
    X = fixed_breaks(job, ss, static_loads)
    pb = {p_lo, p_hi}
    for x in X:
        for s in mv.offsets:
            if p_lo < x - s < p_hi:
                pb.add(x - s)
    pb = sorted(pb)
    # a wheel on a support or a load edge: the worst shear is the limit as it comes near,
    # so the positions just either side of every p-break are candidates too
    nudge = 1e-8 * L
    cands = set(pb) | {p + d for p in pb for d in (-nudge, nudge)}
    if p_hi - p_lo <= tol:
        return [p_lo]
    static = solve(replace(ss.beam, loads=tuple(static_loads)))
    cache = cache if cache is not None else {}
    has_dead = any(mv.dead)
    for a, b in zip(pb, pb[1:]):
        if b - a <= tol:
            continue
        ps = _cheb_nodes(a, b, _NS)
        sols = []
        for p in ps:
            key = (round(p / tol), "l")
            if key not in cache:
                cache[key] = solve(_wheel_beam(ss.beam, mv, p, "live"))
                cache[(round(p / tol), "d")] = (solve(_wheel_beam(ss.beam, mv, p, "dead"))
                                                if has_dead else None)
            sl, sd = cache[key], cache[(round(p / tol), "d")]
            sols.append((sl, sd))

        def mov(name, x, side, i):
            sl, sd = sols[i]
            v = kk * sl.function(name)(x, side)
            if sd is not None:
                v += sd.function(name)(x, side)
            return v

        mid = 0.5 * (a + b)
        for name, deg_fixed, deg_line in (("shear", 6, 8), ("moment", 6, 8),
                                          ("deflection", 6, 10)):
            spw = static.function(name)
            for x in X:  # (a) at fixed breaks
                for side in ("left", "right"):
                    f = np.array([mov(name, x, side, i) for i in range(_NS)])
                    cands.update(_stationary(ps, f, a, b, deg_fixed))
            for s in mv.offsets:  # (b) under each wheel
                for side in ("left", "right"):
                    f = np.array([spw(p + s, side) + mov(name, p + s, side, i)
                                  for i, p in enumerate(ps)])
                    cands.update(_stationary(ps, f, a, b, deg_line))
            if name == "shear":
                continue  # V is stationary in x only where the static load crosses zero
            # (c) interior critical points of each cell
            pts_mid = sorted(set(X) | {mid + s for s in mv.offsets})
            for lo, hi in zip(pts_mid, pts_mid[1:]):
                if hi - lo <= tol:
                    continue
                xm_mid = 0.5 * (lo + hi)
                bref, sc = _piece(spw, xm_mid)
                rows = []
                for i, p in enumerate(ps):
                    # the same cell at this p: between the same fixed break / wheel
                    lo_p = lo if any(abs(lo - x) <= tol for x in X) else lo - mid + p
                    hi_p = hi if any(abs(hi - x) <= tol for x in X) else hi - mid + p
                    if hi_p <= lo_p:
                        rows = None
                        break
                    xm = 0.5 * (lo_p + hi_p)
                    sl, sd = sols[i]
                    r0, cl = _piece(sl.function(name), xm)
                    c = kk * cl
                    if sd is not None:
                        c = c + _piece(sd.function(name), xm)[1]
                    rows.append(_shift(c, bref - r0))
                if rows is None:
                    continue
                rows = np.array(rows)
                dm = 1 if name == "moment" else 3
                rho = (2 * ps - (a + b)) / (b - a)
                fits = [np.polynomial.chebyshev.chebfit(rho, rows[:, m], 6)
                        for m in range(dm + 1)]
                cands.update(_interior(sc, fits, hi - lo, a, b))
    out = sorted(p for p in cands if p_lo - tol <= p <= p_hi + tol)
    dedup = []
    for p in out:
        if not dedup or p - dedup[-1] > 1e-10 * L:
            dedup.append(min(max(p, p_lo), p_hi))
    return dedup


def moving_states(job, ss: StateSet, static_loads, k: float, st, cache=None):
    """(first-wheel position, full solution) at every candidate position."""
    mv = ss.parts.moving[0]
    kk = k * (1 + ss.parts.impact)
    for p in candidate_positions(job, ss, static_loads, k, cache):
        wheels = [Load("point", at=p + s, value=d + kk * f, label=mv.label, key=mv.key)
                  for s, f, d in zip(mv.offsets, mv.live, mv.dead)]
        yield p, solve(replace(ss.beam, loads=tuple(static_loads) + tuple(wheels)))


def envelope_bruteforce(job, k: float = 1.0, n: int = 2001):
    """Test oracle only: the checks re-solved at n evenly spaced positions: per check the
    largest demand, where, and the largest ratio (local checks have a limit that depends on
    where the force acts, so their worst is by ratio)."""
    from shopbeam.design.checks import checks_for, strengths

    ss = state_set(job)
    st = strengths(job, beam=ss.beam)
    mv = ss.parts.moving[0]
    kk = k * (1 + ss.parts.impact)
    worst = {}
    p_lo, p_hi = mv.p_range
    static = ss.static_loads(k, ())
    for p in np.linspace(p_lo, p_hi, n):
        wheels = [Load("point", at=p + s, value=d + kk * f, key=mv.key)
                  for s, f, d in zip(mv.offsets, mv.live, mv.dead)]
        sol = solve(replace(ss.beam, loads=tuple(static) + tuple(wheels)))
        for c in checks_for(job, sol, st, cb_one=True):
            d, at, r = worst.get(c.name, (-1.0, 0.0, -1.0))
            if c.demand > d:
                d, at = c.demand, float(p)
            worst[c.name] = (d, at, max(r, c.ratio))
    return worst


__all__ = ["MovingLoad", "LoadParts", "StateSet", "Evaluation", "read_moving", "load_parts",
           "needs_states", "state_set", "evaluate", "combine", "clip", "candidate_positions",
           "envelope_bruteforce"]
