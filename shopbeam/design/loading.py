"""Loads that come and go or move: load states, pattern loading and moving point loads.

The job's member loads split into fixed loads (dead loads and self-weight, never scaled,
never patterned), live loads (scaled by the capacity factor k and by the impact allowance)
and patterned live loads, which are cut at the supports into one piece per span or overhang.
Every state is a superposition of solutions solved once, in one `solve_many` pass (they share
one set of breaks and add coefficient by coefficient). The 2^n patterns of loaded and empty
spans are never walked: the exact upper and lower envelopes over all of them (each span's
unit solution taken where it adds and left off where it relieves, see `build_envelope`) give
every extreme and name the pattern that gives it; only those patterns are solved and checked.
`walk_patterns` keeps the walk as a test oracle.

Moving point loads (``[[moving]]``: a wheel set at fixed spacing over a travel range) are
found exactly. For a wheel set at position p the response at x is a piecewise polynomial in
(x, p), smooth inside cells bounded by fixed breaks (supports, hinges, load edges, brace
points) and by the wheels. The worst (x, p) is therefore at a p-break (a wheel on a fixed
break or at the end of its travel), at a stationary point in p of the response at a fixed
break, at a stationary point in p of the response under a wheel, or at an interior critical
point of a cell. The second and third kinds are polynomials in p, fitted exactly from solves
at Chebyshev nodes; the fourth comes from the resultant of the two partial derivatives. The
checks are run at every candidate position; the worst position of each check is reported,
with its wheel positions and loads as plain data (`Evaluation.worst[name]["wheels"]`). The
sampling solves all go in one batched pass; each reaction's stationary points in p are
candidates too, so the reaction envelope is over the same exact positions.
Under moving loads Cb is taken as 1.0 (conservative, stated).
"""

from __future__ import annotations

import math
from dataclasses import dataclass, replace
from functools import lru_cache

import numpy as np

from shopbeam import units
from shopbeam.design import lifting as _lifting
from shopbeam.design.checks import (Check, basic_checks, bending_check, brace_points, cb_factor,
                                    segment_strength, checks_for, impact_of, profile_of)
from shopbeam.design.checks import strengths as strengths_of
from shopbeam.engine.model import Beam, Load
from shopbeam.errors import InputError
from shopbeam.engine.influence import (candidates_many, cell_groups, cell_polys, influence,
                                       reaction_candidates, reaction_extremes, reaction_polys,
                                       wheel_cells)
from shopbeam.engine.piecewise import Piecewise
from shopbeam.engine.piecewise import _horner, _roots_in_pieces, find_candidates
from shopbeam.engine.solver import Reaction, Solution, segments, solve, solve_each, solve_many

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
    return tuple(MovingLoad(w.label, w.live, w.dead, w.offsets, w.travel, w.key)
                 for w in job.member_moving())


# ------------------------------------------------------------------ load parts
@dataclass(frozen=True)
class LoadParts:
    fixed: tuple[Load, ...]
    live: tuple[Load, ...]
    patterned: tuple[Load, ...]
    moving: tuple[MovingLoad, ...]  # dead wheel parts include `hoist_impact`
    impact: float
    hoist_impact: float = 0.0  # on the fixed hoist/trolley weight of a lifting job (above)


def load_parts(job, section=None) -> LoadParts:
    """The job's loads in parts. On a lifting job the impact allowance also raises the hoist
    and trolley weight (dead point loads, the dead part of each wheel): ASCE 7-16 4.9.3
    raises the maximum wheel loads, which are rated load plus trolley and hoist weight
    (4.9.2). The lateral force (4.9.4) is taken without impact, from the loads as entered."""
    j = job if section is None else replace(job, section=section)
    loads = j.member_loads()
    imp = impact_of(job)
    hoist = imp if imp and profile_of(job) is not None else 0.0
    fixed = tuple(replace(ld, value=ld.value * (1 + hoist)) if _hoist_weight(ld, hoist) else ld
                  for ld in loads if ld.case != "live")
    live = tuple(ld for ld in loads if ld.case == "live" and not ld.patterned)
    pat = tuple(ld for ld in loads if ld.case == "live" and ld.patterned)
    return LoadParts(fixed, live, pat, _moving_parts(job, hoist), imp, hoist)


def _moving_parts(job, hoist: float) -> tuple[MovingLoad, ...]:
    """The job's wheel sets, their dead parts raised by the lifting job's impact `hoist`."""
    return tuple(replace(mv, dead=tuple(d * (1 + hoist) for d in mv.dead))
                 for mv in read_moving(job)) if hoist else read_moving(job)


def _hoist_weight(ld: Load, hoist: float) -> bool:
    """A dead point load of a lifting job's [[loads]]: hoist or trolley weight (every point
    load of a lifting job is rated load or that weight, see `lifting.hoist_loads`)."""
    return bool(hoist) and ld.kind == "point" and bool(ld.value) \
        and (ld.key or "").startswith("loads")


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


def split_by_span(loads, segs, length: float) -> list[tuple[Load, ...]]:
    """Each span's and overhang's part of the patterned loads: distributed loads clipped to
    it, and each point load or couple on the one span it lies in (on a support between two,
    the one after it; at the far end, the last), so every patterned load comes and goes
    with its span."""
    tol = 1e-9 * length
    out = []
    for i, (a, b, _) in enumerate(segs):
        last = i == len(segs) - 1
        mine = []
        for ld in loads:
            if ld.kind in ("point", "moment"):
                if a - tol <= ld.at and (ld.at < b - tol or last):
                    mine.append(ld)
            else:
                c = clip(ld, a, b)
                if c is not None:
                    mine.append(c)
        out.append(tuple(mine))
    return out


def _positions(loads) -> set[float]:
    out = set()
    for ld in loads:
        out.update(ld.describe_position())
    return out


def _dummies(positions) -> list[Load]:
    return [Load("point", at=x, value=0.0, label="(break)") for x in sorted(positions)]


_FUNCTIONS = ("load", "shear", "moment", "slope", "deflection")


def _flat(sol: Solution) -> np.ndarray:
    """Every number `combine` adds up, in one flat array (kept on the solution): the five
    functions' coefficients, the reaction forces and moments, the hinge rotations and the
    two integration constants."""
    got = sol.__dict__.get("_flat")
    if got is None:
        got = sol.__dict__["_flat"] = np.concatenate(
            [sol.function(n).coeffs.ravel() for n in _FUNCTIONS]
            + [np.array([r.force for r in sol.reactions], float),
               np.array([r.moment for r in sol.reactions], float),
               np.array([h[1] for h in sol.hinge_rotations], float),
               np.array([sol.ei_slope_0, sol.ei_deflection_0], float)])
    return got


def combine(parts: list[tuple[float, Solution]], beam: Beam) -> Solution:
    """sum(f * solution) for solutions sharing one set of breaks."""
    base = parts[0][1]
    b0 = base.moment.breaks
    for _, s in parts[1:]:
        b = s.moment.breaks
        if b is not b0 and (b.shape != b0.shape or
                            float(np.abs(b - b0).max()) > 1e-12 * beam.length):
            raise ValueError("solutions do not share their breaks")
    # every number at once, each the same sum term by term in the same order as one by one
    # (0 + f1 x1 + f2 x2 + ...)
    total = 0
    for f, s in parts:
        total = total + f * _flat(s)
    funcs, at = {}, 0
    for name in _FUNCTIONS:
        c = base.function(name).coeffs
        funcs[name] = Piecewise(base.function(name).breaks,
                                total[at:at + c.size].reshape(c.shape))
        at += c.size
    nr, nh = len(base.reactions), len(base.hinge_rotations)
    rest = total[at:].tolist()
    reactions = tuple(Reaction(r.at, r.kind, fo, mo, r.key) for r, fo, mo in
                      zip(base.reactions, rest[:nr], rest[nr:2 * nr]))
    hinges = tuple((h[0], v) for h, v in zip(base.hinge_rotations, rest[2 * nr:2 * nr + nh]))
    return Solution(beam=beam, reactions=reactions, hinge_rotations=hinges,
                    ei_slope_0=rest[-2], ei_deflection_0=rest[-1], **funcs,
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
        # only the spans that carry a patterned load: a span with none is the same state
        # loaded or not (walked in mask order, each state comes before its duplicates did)
        hit = [i for i in range(len(self.segs)) if self.span_loads[i]]
        return [tuple(i for b, i in enumerate(hit) if mask >> b & 1)
                for mask in range(2 ** len(hit))]

    def _scaled(self, kk: float):
        """(the live loads, each span's patterned loads) scaled by kk (kept per kk)."""
        cache = self.__dict__.setdefault("_scaled_loads", {})
        if kk not in cache:
            if len(cache) > 64:
                cache.clear()
            cache[kk] = ([ld.scaled(kk) for ld in self.parts.live],
                         [[ld.scaled(kk) for ld in sl] for sl in self.span_loads])
        return cache[kk]

    def state(self, k: float, pattern: tuple[int, ...]) -> Solution:
        kk = k * (1 + self.parts.impact)
        parts = [(1.0, self.fixed), (kk, self.live)] + [(kk, self.spans[i]) for i in pattern]
        live, spans = self._scaled(kk)
        loads = list(self.parts.fixed) + live
        for i in pattern:
            loads += spans[i]
        return combine(parts, replace(self.beam, loads=tuple(loads)))

    def static_loads(self, k: float, pattern) -> list[Load]:
        kk = k * (1 + self.parts.impact)
        live, spans = self._scaled(kk)
        loads = list(self.parts.fixed) + live
        for i in pattern:
            loads += spans[i]
        return loads


def state_set(job, section=None, parts: LoadParts | None = None, ei: float | None = None,
              length_fmt=None) -> StateSet:
    parts = parts or load_parts(job, section)
    sec = section or job.section
    if ei is None:
        from shopbeam.members.sections import bending_ix

        ei = job.material.e * bending_ix(sec, job.restrained)
    empty = Beam(job.length, ei, job.supports, ())
    segs = tuple(segments(empty))
    span_loads = []
    if parts.patterned:
        if parts.moving and len(segs) > MAX_PATTERN_SEGMENTS:
            raise InputError(f"{len(segs)} spans and overhangs with a moving load give "
                             f"2^{len(segs)} patterns at every wheel position; patterned and "
                             f"moving loads together take up to {MAX_PATTERN_SEGMENTS} spans: "
                             "split the job or drop patterned = true", "loads")
        span_loads = split_by_span(parts.patterned, segs, job.length)
    allpos = _positions(parts.fixed) | _positions(parts.live)
    for sl in span_loads:
        allpos |= _positions(sl)
    if parts.patterned:  # unbraced lengths end on breaks, so envelopes split there exactly
        from shopbeam.design.checks import brace_points

        allpos |= {x for x in brace_points(job)[1] if 0 < x < job.length}
    dummies = tuple(_dummies(allpos))
    # one pass for every unit solution: they share the breaks (every position of every case
    # is a break of all) and the factorised system. Their extremes are never read (every
    # state is a new sum of them), so none are looked for here (found on first use if asked)
    sols = solve_many(empty, [tuple(parts.fixed) + dummies, tuple(parts.live)]
                      + [tuple(sl) for sl in span_loads], length_fmt, candidates=False)
    return StateSet(empty, sols[0], sols[1], tuple(sols[2:]), segs, parts, tuple(span_loads))


def describe_pattern(ss: StateSet, pattern, fmt=None) -> str:
    if not ss.parts.patterned:
        return ""
    if not pattern:
        return "patterned loads off everywhere"
    cache = ss.__dict__.setdefault("_words", {})
    key = (pattern, fmt)
    if key not in cache:
        names = cache.get(("names", fmt))
        if names is None:
            f = fmt or (lambda x: f"{x:.4g} m")
            names = cache[("names", fmt)] = [f"{k} {f(a)}-{f(b)}" for a, b, k in ss.segs]
        cache[key] = "patterned loads on " + ", ".join(names[i] for i in pattern)
    return cache[key]


# ------------------------------------------------------------------ pattern envelopes
# Every pattern state is fixed + kk (live + sum of the loaded spans' unit solutions), kk > 0.
# At each x the worst pattern for a quantity takes span i where its unit solution S_i(x) adds
# and leaves it where it relieves, so the upper envelope is F + kk (Lv + sum max(0, S_i)) and
# the lower one F + kk (Lv + sum min(0, S_i)). Each S_i is a polynomial on every piece, so
# its sign changes only at its roots there: the pieces are cut at every root of every S_i,
# and on each cut piece the envelope is one polynomial (the sum over a fixed set of spans).
# The envelope is then an ordinary piecewise polynomial whose extremes are exact, and the set
# of spans on the cut piece where an extreme falls is the pattern that gives it.
ENVELOPE_QUANTITIES = ("shear", "moment", "deflection")


def _shift_rows(c: np.ndarray, d: np.ndarray) -> np.ndarray:
    """Rows of ascending coefficients re-expanded about t = d (one offset per row); c may
    stack several such sets of rows ((..., rows, w)), each re-expanded alike."""
    w = c.shape[-1]
    out = np.zeros_like(c)
    dp = d[:, None] ** np.arange(w)  # d^0 .. d^(w-1)
    for m in range(w):
        for i in range(m + 1):
            out[..., i] += c[..., m] * (math.comb(m, i) * dp[:, m - i])
    return out


@dataclass(frozen=True)
class PatternEnvelope:
    """Upper and lower envelope of one quantity over every pattern, on cut pieces.

    For each cut piece: the coefficients (local to the cut piece) of the fixed part, the
    always-on live part, and the sums of the spans that raise (`up`) or lower (`down`) the
    quantity there, with which spans those are (`up_on`, `down_on`: (pieces, spans) bools).
    """

    name: str
    breaks: np.ndarray
    fixed: np.ndarray
    live: np.ndarray
    up: np.ndarray
    down: np.ndarray
    up_on: np.ndarray
    down_on: np.ndarray
    piece: np.ndarray  # the original piece each cut piece lies in
    t0: np.ndarray  # where in it the cut piece starts

    def carry(self, coeffs: np.ndarray) -> np.ndarray:
        """Another function on the original pieces, re-expanded on the cut pieces."""
        return _shift_rows(coeffs[self.piece], self.t0)

    def coeffs(self, kk: float, upper: bool) -> np.ndarray:
        return self.fixed + kk * (self.live + (self.up if upper else self.down))

    def pattern(self, row: int, upper: bool) -> tuple[int, ...]:
        on = self.up_on[row] if upper else self.down_on[row]
        return tuple(np.flatnonzero(on).tolist())


def build_envelope(ss: "StateSet", name: str) -> PatternEnvelope:
    """The exact envelope of shear, moment or deflection over all 2^n patterns (n solves)."""
    f0 = ss.fixed.function(name)
    b = f0.breaks
    h = np.diff(b)
    npc = len(h)
    fc, lc = f0.coeffs, ss.live.function(name).coeffs
    n = len(ss.spans)
    w = fc.shape[1]
    S = (np.stack([s.function(name).coeffs for s in ss.spans]) if n
         else np.zeros((0, npc, w)))
    # rounding residue (a span that does not reach a piece at all) carries no sign
    scale = np.abs(S * h[None, :, None] ** np.arange(w)).max(axis=2) if n else np.zeros((0, npc))
    top = scale.max() if scale.size else 0.0
    S = np.where((scale <= 1e-13 * top)[:, :, None], 0.0, S)
    piece = np.arange(npc)
    t0 = np.zeros(npc)
    if n:
        rows, t = _roots_in_pieces(S.reshape(n * npc, w), np.tile(h, n))
        pc = rows % npc
        inside = (t > 1e-11 * h[pc]) & (t < h[pc] * (1 - 1e-11))
        piece = np.concatenate([piece, pc[inside]])
        t0 = np.concatenate([t0, t[inside]])
        order = np.lexsort((t0, piece))
        piece, t0 = piece[order], t0[order]
        keep = np.ones(len(piece), bool)  # drop cuts within 1e-11 of the piece of the last
        same = piece[1:] == piece[:-1]
        keep[1:] = ~(same & (t0[1:] - t0[:-1] <= 1e-11 * h[piece[1:]]))
        piece, t0 = piece[keep], t0[keep]
    x0 = b[piece] + t0
    nb = np.concatenate([x0, [b[-1]]])
    nb[0] = b[0]
    t1 = np.where(np.concatenate([piece[1:] == piece[:-1], [False]]),
                  np.concatenate([t0[1:], [0.0]]), h[piece])
    tm = 0.5 * (t0 + t1)
    if n:
        Sp = S[:, piece, :]  # (n, cut pieces, w)
        # (n, cut pieces): every span's value at every cut piece's middle, in one pass (on
        # the (cut pieces, n) order numpy lays such an indexed array out in: no copy)
        vals = _horner(Sp.transpose(1, 0, 2).reshape(-1, w),
                       np.repeat(tm, n)).reshape(len(tm), n).T
        up_on, down_on = (vals > 0).T, (vals < 0).T
        up = np.einsum("sn,nsw->sw", up_on.astype(float), Sp)
        down = np.einsum("sn,nsw->sw", down_on.astype(float), Sp)
    else:
        up_on = down_on = np.zeros((len(piece), 0), bool)
        up = down = np.zeros((len(piece), w))
    # the four parts re-expanded on the cut pieces together
    f_, l_, u_, d_ = _shift_rows(np.stack([fc[piece], lc[piece], up, down]), t0)
    return PatternEnvelope(name, nb, f_, l_, u_, d_, up_on, down_on, piece, t0)


def _extreme_rows(breaks: np.ndarray, c: np.ndarray) -> tuple[np.ndarray, np.ndarray, np.ndarray]:
    """(row, x, value) of every candidate extreme of a piecewise polynomial."""
    h = np.diff(breaks)
    npc = len(h)
    d = c[:, 1:] * np.arange(1, c.shape[1]) if c.shape[1] > 1 else np.zeros((npc, 1))
    rows, t = _roots_in_pieces(d, h)
    r = np.concatenate([np.arange(npc), np.arange(npc), rows])
    x = np.concatenate([breaks[:-1], breaks[1:], breaks[rows] + t])
    v = np.concatenate([c[:, 0], _horner(c, h), _horner(c[rows], t)])
    return r, x, v


def _extreme_rows_many(items) -> list[tuple[np.ndarray, np.ndarray, np.ndarray]]:
    """`_extreme_rows` of each (breaks, coefficients) in `items`, with one root search for
    all of them (by part: each as its own search would find them)."""
    hs = [np.diff(b) for b, _ in items]
    ds = [c[:, 1:] * np.arange(1, c.shape[1]) if c.shape[1] > 1 else np.zeros((len(h), 1))
          for (_, c), h in zip(items, hs)]
    width = max(d.shape[1] for d in ds)
    D = np.zeros((sum(len(d) for d in ds), width))  # zero high powers change no root
    start = np.concatenate([[0], np.cumsum([len(d) for d in ds])])
    for d, a in zip(ds, start):
        D[a:a + len(d), :d.shape[1]] = d
    part = np.repeat(np.arange(len(ds)), [len(d) for d in ds])
    rows, t = _roots_in_pieces(D, np.concatenate(hs), part)
    out = []
    for k, ((breaks, c), h) in enumerate(zip(items, hs)):
        npc = len(h)
        m = part[rows] == k
        rk, tk = rows[m] - start[k], t[m]
        r = np.concatenate([np.arange(npc), np.arange(npc), rk])
        x = np.concatenate([breaks[:-1], breaks[1:], breaks[rk] + tk])
        v = np.concatenate([c[:, 0], _horner(c, h), _horner(c[rk], tk)])
        out.append((r, x, v))
    return out


class EnvelopeExtreme:
    """The largest (upper) or smallest (lower) value of an envelope in a region, where it
    falls, and the pattern that gives it (worked out when first read: most searches read
    only the value)."""

    __slots__ = ("value", "at", "_env", "_row", "_upper", "_pattern")

    def __init__(self, value: float, at: float, env: "PatternEnvelope", row: int, upper: bool):
        self.value = value  # signed: the largest upward (upper) or downward (lower) value
        self.at = at
        self._env, self._row, self._upper, self._pattern = env, row, upper, None

    @property
    def pattern(self) -> tuple[int, ...]:
        if self._pattern is None:
            self._pattern = self._env.pattern(self._row, self._upper)
        return self._pattern


class Envelopes:
    """The exact pattern envelopes of one state set at one live-load factor."""

    def __init__(self, ss: "StateSet", k: float):
        self.ss = ss
        self.kk = k * (1 + ss.parts.impact)
        cache = ss.__dict__.setdefault("_envelopes", {})
        self.env = {}
        self.cand = {}
        self._memo: dict = {}  # (name, upper, lo, hi) -> EnvelopeExtreme (asked again)
        self.coeffs: dict = {}  # (name, upper) -> the envelope's coefficients at kk
        keys = []
        for name in ENVELOPE_QUANTITIES:
            if name not in cache:
                cache[name] = build_envelope(ss, name)
            e = cache[name]
            self.env[name] = e
            for upper in (True, False):
                self.coeffs[name, upper] = e.coeffs(self.kk, upper)
                keys.append((name, upper))
        # the candidates of all six envelopes from one root search
        found = _extreme_rows_many([(self.env[n].breaks, self.coeffs[n, u]) for n, u in keys])
        for (name, upper), (r, x, v) in zip(keys, found):
            b = self.env[name].breaks  # each candidate's piece ends, for the region masks
            self.cand[name, upper] = (r, x, v, b[r], b[r + 1])

    def extreme(self, name: str, upper: bool, lo: float | None = None,
                hi: float | None = None) -> EnvelopeExtreme:
        """Largest (upper) or smallest (lower) value over all patterns in [lo, hi]."""
        key = (name, upper, lo, hi)
        got = self._memo.get(key)
        if got is not None:
            return got
        e = self.env[name]
        r, x, v, left, right = self.cand[name, upper]
        if lo is not None or hi is not None:
            tol = 1e-9 * self.ss.beam.length
            lo = e.breaks[0] if lo is None else lo
            hi = e.breaks[-1] if hi is None else hi
            # the candidates on pieces inside [lo - tol, hi + tol] are those of one run of
            # pieces, so one run of the candidates sorted by piece
            b = e.breaks
            r0 = int(b.searchsorted(lo - tol, "left"))
            r1 = int(b.searchsorted(hi + tol, "right")) - 1  # pieces r0 .. r1 - 1
            order, r_sorted = self._by_piece(name, upper)
            run = order[int(r_sorted.searchsorted(r0, "left")):
                        int(r_sorted.searchsorted(r1 - 1, "right"))]
            if not len(run):
                raise ValueError(f"no piece of the {name} envelope lies in [{lo}, {hi}]")
            vr = v[run]
            best = vr.max() if upper else vr.min()
            if best != best:  # a NaN: the first in the candidates' own order, as argmax
                i = int(run[np.flatnonzero(vr != vr)].min())
            else:  # the first largest (smallest) in the candidates' own order, as argmax
                i = int(run[np.flatnonzero(vr == best)].min())
        else:
            i = int(np.argmax(v) if upper else np.argmin(v))
        out = EnvelopeExtreme(float(v[i]), float(x[i]), e, int(r[i]), upper)
        self._memo[key] = out
        return out

    def _by_piece(self, name: str, upper: bool) -> tuple[np.ndarray, np.ndarray]:
        """The candidates' order sorted by piece (stable) and their pieces in that order."""
        key = ("by piece", name, upper)
        if key not in self._memo:
            r = self.cand[name, upper][0]
            order = np.argsort(r, kind="stable")
            self._memo[key] = (order, r[order])
        return self._memo[key]

    def abs_value(self, name: str, x: float) -> float:
        """The largest |value| at x over all patterns (both envelopes)."""
        return max(abs(v) for v in self.values(name, x))

    def values(self, name: str, x: float) -> tuple[float, float]:
        """(largest, smallest) value at x over all patterns (the two envelopes)."""
        e = self.env[name]
        j = int(np.clip(np.searchsorted(e.breaks, x, side="right") - 1, 0, len(e.breaks) - 2))
        t = np.array([x - e.breaks[j]])
        hi, lo = (float(_horner(self.coeffs[name, u][j:j + 1], t)[0]) for u in (True, False))
        return hi, lo

    def abs_extreme(self, name: str, lo=None, hi=None) -> EnvelopeExtreme:
        a, b = self.extreme(name, True, lo, hi), self.extreme(name, False, lo, hi)
        return a if abs(a.value) >= abs(b.value) else b

    def reactions(self) -> list[dict]:
        """Per support: the largest upward and downward force over all patterns (worked out
        once; read-only)."""
        if "_reactions" not in self.__dict__:
            self._reactions = self._work_out_reactions()
        return self._reactions

    def _work_out_reactions(self) -> list[dict]:
        ss, kk = self.ss, self.kk
        out = []
        cache = ss.__dict__.setdefault("_span_reactions", {})
        if "v" not in cache:  # (spans, reactions): each span's unit solution's forces
            cache["v"] = np.array([[r.force for r in s.reactions] for s in ss.spans], float)
        forces = cache["v"]
        for j, r in enumerate(ss.fixed.reactions):
            base = r.force + kk * ss.live.reactions[j].force
            each = (forces[:, j] if ss.spans else np.zeros(0)) * kk
            top = max(abs(base), float(np.max(np.abs(each))) if each.size else 0.0)
            each = np.where(np.abs(each) <= 1e-13 * top, 0.0, each)
            up = tuple(int(i) for i in np.flatnonzero(each > 0))
            down = tuple(int(i) for i in np.flatnonzero(each < 0))
            out.append({"at": float(r.at), "type": r.kind,
                        "max_up": float(base + each[each > 0].sum()), "max_up_pattern": up,
                        "max_down": float(base + each[each < 0].sum()),
                        "max_down_pattern": down})
        return out


def connection_states(job, k: float = 1.0, ss: "StateSet | None" = None) -> list[Solution]:
    """The few pattern states that give, over every pattern, the largest and smallest shear
    on each side of every hinge and reaction moment at every fixed support (the same
    extremes a walk of all 2^n patterns finds; at most 4 per hinge and 2 per fixed end)."""
    ss = ss or state_set(job)
    env = Envelopes(ss, k)
    e = env.env["shear"]
    tol = 2.5e-10 * ss.beam.length
    pats = set()
    for s in ss.beam.supports:
        if s.kind != "hinge":
            continue
        for side in ("left", "right"):
            j = int(e.breaks.searchsorted(s.at + tol, "right") if side == "right"
                    else e.breaks.searchsorted(s.at - tol, "left")) - 1
            j = min(max(j, 0), len(e.breaks) - 2)
            pats.update((e.pattern(j, True), e.pattern(j, False)))
    for j, r in enumerate(ss.fixed.reactions):
        if r.kind == "fixed":
            each = [sp.reactions[j].moment for sp in ss.spans]
            top = max([abs(v) for v in each] + [0.0])
            pats.add(tuple(i for i, v in enumerate(each) if v > 1e-13 * top))
            pats.add(tuple(i for i, v in enumerate(each) if v < -1e-13 * top))
    return [ss.state(k, p) for p in sorted(pats)]


# First-wheel positions, besides the exact ones, at which a wheel set's hinge shears are read
# (every 1/CONNECTION_STEPS of the travel, and a wheel just either side of every break)
CONNECTION_STEPS = 100


def moving_connection_states(job, k: float = 1.0, ss: "StateSet | None" = None
                             ) -> list[Solution]:
    """The states of a wheel-set job whose fixed-end reactions and hinge shears a connection
    must carry, over the whole travel (and every pattern): at each fixed support the exact
    largest and smallest reaction moment and force (cubics in the wheel position,
    engine/influence.py), and for the hinges a wheel just either side of every break, the
    ends of the travel and every 1/CONNECTION_STEPS of it (a hinge's shear under a wheel
    set peaks with a wheel at a break in the common determinate cases; the steps cover the
    rest to well within the figures shown)."""
    ss = ss or state_set(job)
    mv = ss.parts.moving[0]
    kk = k * (1 + ss.parts.impact)
    inf = beam_influence(ss)
    P = wheel_forces(mv, kk)
    p_lo, p_hi = mv.p_range
    L = job.length
    st = strengths_of(job, beam=ss.beam)
    fixed = [j for j, r in enumerate(ss.fixed.reactions) if r.kind == "fixed"]
    hinges = [sp.at for sp in ss.beam.supports if sp.kind == "hinge"]
    base = set()
    if hinges:
        base.update(np.linspace(p_lo, p_hi, CONNECTION_STEPS + 1).tolist() if p_hi > p_lo
                    else [p_lo])
        nudge = NUDGE * L
        for x in inf.breaks:
            for d in mv.offsets:
                for p in (x - d - nudge, x - d + nudge):
                    if p_lo <= p <= p_hi:
                        base.add(float(p))
    out = []
    for pattern in ss.patterns:
        static_sol = ss.state(k, pattern)
        pos = set(base) | {p_lo, p_hi}
        if fixed:
            mcols = [inf.reaction_cols[j] + 1 for j in fixed]
            fcols = [inf.reaction_cols[j] for j in fixed]
            for cols, vals in ((mcols, [static_sol.reactions[j].moment for j in fixed]),
                               (fcols, [static_sol.reactions[j].force for j in fixed])):
                for hi, phi, lo, plo in reaction_extremes(*reaction_polys(
                        inf, mv.offsets, p_lo, p_hi, vals, P, cols=cols)):
                    pos.update((phi, plo))
        static = ss.static_loads(k, pattern)
        out += [sol for _, sol in moving_states(job, ss, static, k, st,
                                                positions=sorted(pos))]
    return out


def pattern_checks(job, ss: "StateSet", k: float, st):
    """The checks over every pattern from the exact envelopes: (best per check, states run).

    Shear and deflection: the envelope's extreme is the demand, and the pattern that gives it
    is solved and checked. Bending: each unbraced length's largest moment over all patterns
    comes from the envelope, and Cb (AISC 360-16 F1-1) is taken with Mmax, MA, MB and MC each
    the largest over all patterns. Since M / (Cb Mn1) = (2.5 Mmax + 3 MA + 4 MB + 3 MC) / (12.5
    Mn1), that ratio is never below any single pattern's own (conservative), and it is that
    pattern's exactly whenever one pattern governs all four (the usual case) or Cb does not
    matter (braced, short, or yielding governs). The governing length's pattern is solved and
    checked for the words and fields of the check.
    """
    from shopbeam.design.checks import BASIS_WORDS, bending_check, provenance

    env = Envelopes(ss, k)
    fmt = _fmt_for(job)
    L = ss.beam.length
    wanted: list[tuple[int, ...]] = []

    def want(p):
        if p not in wanted:
            wanted.append(p)

    want(env.abs_extreme("shear").pattern)
    want(_envelope_deflection(job, ss, st, env)[1])
    live_n = getattr(st, "live_ratio", None)
    if live_n:  # deflection under the live loads alone (floors): its own worst pattern
        e = env.env["deflection"]
        tol = 1e-9 * L
        top, pat_l = -1.0, ()
        for upper in (True, False):
            r_, x_, v_ = _extreme_rows(e.breaks, e.live + (e.up if upper else e.down))
            for a, b, kind in ss.segs:
                m = (e.breaks[r_] >= a - tol) & (e.breaks[r_ + 1] <= b + tol)
                if not m.any():
                    continue
                i = int(np.argmax(np.where(m, np.abs(v_), -1.0)))
                judged = 2 * (b - a) if kind in ("cantilever", "overhang") else b - a
                ratio = abs(v_[i]) / (judged / live_n)
                if ratio > top:
                    top, pat_l = ratio, e.pattern(int(r_[i]), upper)
        want(pat_l)
    fl = st.flexure
    r_b, idx, e_b, cb, allow, text = _envelope_bending(env, st)
    best: dict[str, tuple] = {}
    done: dict[tuple, Solution] = {}

    def get(p):
        if p not in done:
            done[p] = ss.state(k, p)
        return done[p]

    bounds = _deflection_bounds(job, ss, st, env)  # the spans list is the envelope's below
    for p in wanted:
        sol = get(p)
        for c in checks_for(job, sol, st, bending=False, defl_bounds=bounds):  # shear,
            # deflection (its largest span: only those the envelope lets hold it), local checks
            _keep(best, c, p, None, describe_pattern(ss, p, fmt), sol)
    # local checks (concentrated forces at supports and point loads): each support's largest
    # upward and downward reaction, and every patterned point load on at once
    # (a local check reads only the reactions and the point loads, so one state with every
    # support at its largest upward reaction and one at its largest downward reaction, all
    # patterned point loads on, cover every pattern without solving one per support)
    allon = tuple(range(len(ss.segs)))
    base_sol = get(allon)
    for which, c in _envelope_local(job, ss, st, env, base_sol):
        _keep(best, c, allon, None, describe_pattern(ss, allon, fmt) if which is None else
              f"each support at its largest {which} reaction over all patterns (see the "
              "reaction envelope)", base_sol)
    # bending: the governing length's pattern, checked on that length alone for the check's
    # fields, with the envelope's demand, Cb and limit
    p = e_b.pattern
    sol = get(p)
    a, b = st.ltb_segments[idx][:2]
    c = bending_check(job, sol, replace(st, ltb_segments=(st.ltb_segments[idx],)))
    if not fl.stress_s and not getattr(fl, "special", False):
        c = replace(c, demand=abs(e_b.value), limit=allow, at=e_b.at,
                    formula=f"{BASIS_WORDS[st.basis]}: M <= Mn / Omega_b, Mn by {text}, "
                            f"Omega_b {fl.omega:g}", extra={**c.extra, "cb": cb},
                    # the figures the limit rests on: the envelope's Cb and its Mn, not the
                    # governing pattern's own (which the check's words do not use)
                    params={**c.params, "Cb": cb, "Mn": allow * fl.omega},
                    **provenance(st.basis, text, "bending"))
    if len(st.ltb_segments) > 1:
        c = replace(c, detail="; ".join(x for x in (c.detail, f"unbraced length {fmt(a)} to "
                                                    f"{fmt(b)} governs") if x))
    best = {"bending": (c, p, None, describe_pattern(ss, p, fmt), sol), **best}
    # the span list of the deflection check: each span's worst over all patterns
    c = best["deflection"][0]
    spans = []
    for (a, b, kind), (_, lim, rule) in zip(ss.segs, deflection_spans(job, ss, st)):
        e = env.abs_extreme("deflection", a, b)
        spans.append({"start": a, "end": b, "kind": kind, "demand": abs(e.value), "limit": lim,
                      "at": e.at, "rule": rule,
                      "state": describe_pattern(ss, e.pattern, fmt)})
    best["deflection"] = (replace(c, extra={**c.extra, "spans": spans}),) + best["deflection"][1:]
    return best, len(done), env


def _envelope_bending(env: Envelopes, st) -> tuple:
    """(ratio, index, extreme, Cb, allowable, words) of the unbraced length whose bending
    ratio over every pattern is largest: its largest moment from the envelope, Cb (AISC
    360-16 F1-1) with Mmax, MA, MB, MC each the largest over every pattern."""
    from shopbeam.design.checks import cb_factor

    fl = st.flexure
    segs = []
    for idx, (a, b, free, l1, why) in enumerate(st.ltb_segments):
        e = env.abs_extreme("moment", a, b)
        mmax = abs(e.value)
        if l1 == math.inf or free:
            cb = 1.0
        else:
            cb = cb_factor(mmax, *(env.abs_value("moment", a + f * (b - a))
                                   for f in (0.25, 0.5, 0.75)))
        if cb * l1 < fl.cap:
            mn, text = cb * l1, f"{why}, Cb {cb:.3f}" + (" (free end: Cb 1.0)" if free else "")
        else:
            mn, text = fl.cap, fl.cap_text
        allow = mn / fl.omega
        segs.append((mmax / allow if allow > 0 else math.inf, idx, e, cb, allow, text))
    return max(segs, key=lambda t: t[0])


def _envelope_deflection(job, ss: "StateSet", st, env: Envelopes) -> tuple:
    """(ratio, pattern) of the span or overhang whose deflection over every pattern is the
    largest part of its limit (the first span when a limit is zero)."""
    worst_d, pat_d = -1.0, ()
    for (a, b, _), (_, lim, _) in zip(ss.segs, deflection_spans(job, ss, st)):
        e = env.abs_extreme("deflection", a, b)
        r = abs(e.value) / lim if lim > 0 else math.inf
        if r > worst_d:
            worst_d, pat_d = r, e.pattern
    return worst_d, pat_d


def _envelope_local(job, ss: "StateSet", st, env: Envelopes, base_sol: Solution):
    """(None or "upward" / "downward", check) of the local checks over every pattern: the
    state with every pattern on, then every support at its largest upward and at its largest
    downward reaction (a local check reads only the reactions and the point loads; web
    sidesway buckling reads the moment at the force, the largest over every pattern). A wood
    member's bearing perpendicular to grain (NDS 2018 3.10.2) reads the reactions and the
    point loads too, so it is judged the same way."""
    from shopbeam.design import local as _local
    from shopbeam.design.checks import bearing_checks

    sec = getattr(st, "section", None) or job.section
    reactions = env.reactions()
    moments = lambda x: env.values("moment", x)  # noqa: E731
    wood = getattr(st.flexure, "wood", None)
    for c in _local.local_checks(job, base_sol, sec, moments):
        yield None, c
    for key, which in (("max_up", "upward"), ("max_down", "downward")):
        fake = replace(base_sol, reactions=tuple(
            replace(r, force=e[key]) for r, e in zip(base_sol.reactions, reactions)))
        for c in _local.local_checks(job, fake, sec, moments):
            yield which, c
        if wood is not None:
            for c in bearing_checks(job, fake, wood):
                yield which, c


def envelope_ratio_applies(job, ss: "StateSet", st) -> bool:
    """Whether `envelope_ratio` covers every check of this job: patterned loads (no moving
    ones), a member whose checks are bending (moment, not stress), shear, deflection and the
    local checks (no wood, tee or angle rules, no lifting checks, no live-load deflection),
    every deflection limit above zero."""
    fl = st.flexure
    return bool(ss.parts.patterned and not ss.parts.moving and not st.live_ratio
                and fl.wood is None and not fl.stress_s and not getattr(fl, "special", False)
                and not (job.lifting or getattr(job.criteria, "lifting", ""))
                and not _lifting.tip_hung(job)  # the flange-tip check under a hung load
                and all(lim > 0 for _, lim, _ in deflection_spans(job, ss, st)))


# a state's value is below the envelope's by rounding at most: far less than this part of
# the envelope's largest size, which `envelope_ratio` adds to each bound it prunes by
BOUND_SLACK = 1e-9


def envelope_ratio(job, ss: "StateSet", k: float, st) -> float:
    """The governing ratio of `evaluate(job, k, ...)` (the largest of its checks' ratios), the
    same number, without building the checks. Bending and the local checks are worked out
    as `pattern_checks` works them out (bending's demand is the envelope's; the local
    checks read the sum of the unit solutions, no extremes). Shear and deflection are the
    extremes of the solved pattern states, as `checks_for` takes them, but only where they
    can govern: the envelope bounds each state's shear and each state's deflection in each
    span from above, so a state or span whose bound is below the largest ratio already
    found is not searched (most are not: its extremes are the costly part). The capacity
    search reads this at every trial factor and evaluates in full only at the answer
    (`envelope_ratio_applies` says where it covers every check)."""
    from shopbeam.design import local as _local

    if k == 0 and not any(ld.total_force or ld.kind == "moment" and ld.value
                          for ld in ss.parts.fixed):
        return 0.0  # no load at all: every demand is zero (the search starts here)
    env = Envelopes(ss, k)
    sec = getattr(st, "section", None) or job.section
    _, _, e_b, _, allow, _ = _envelope_bending(env, st)
    best = _ratio(abs(e_b.value), allow)  # as the bending check's own ratio
    shear_p = env.abs_extreme("shear").pattern
    states: dict[tuple, Solution] = {}
    for p in (shear_p, _envelope_deflection(job, ss, st, env)[1]):
        if p not in states:  # the solved states' own local checks, as `checks_for` has them
            states[p] = ss.state(k, p)
            best = max([best] + [c.ratio for c in _local.local_checks(job, states[p], sec)])
    allon = tuple(range(len(ss.segs)))
    base = states.get(allon) or ss.state(k, allon)
    best = max([best] + [c.ratio for _, c in _envelope_local(job, ss, st, env, base)])
    # shear and deflection of each solved state, largest bound first, while one can govern
    sh = st.shear
    allow_v = sh.vn / sh.omega
    v_top = abs(env.abs_extreme("shear").value)
    bounds = []
    for p, sol in states.items():
        bounds.append((v_top * (1 + BOUND_SLACK) / allow_v if allow_v > 0 else math.inf,
                       "shear", sol, None))
    for (a, b, _), (_, lim, _), bound in zip(ss.segs, deflection_spans(job, ss, st),
                                             _deflection_bounds(job, ss, st, env)):
        for sol in states.values():
            bounds.append((bound, "deflection", sol, (a, b, lim)))
    bounds.sort(key=lambda t: -t[0])
    for bound, what, sol, span in bounds:
        if bound < best:
            break
        if what == "shear":
            v = sol.shear.extremes().abs_max
            r = _ratio(v / sh.area, allow_v / sh.area) if sh.stress else _ratio(v, allow_v)
        else:
            a, b, lim = span
            r = sol.deflection.extremes(a, b).abs_max / lim
        best = max(best, r)
    return best


def _deflection_bounds(job, ss: "StateSet", st, env: Envelopes) -> list[float] | None:
    """Per span and overhang, an upper bound of any pattern state's deflection there over its
    limit: the envelopes' extreme there plus BOUND_SLACK of their largest size. None where a
    limit is not above zero or the check reads another deflection (wood's creep)."""
    spans = deflection_spans(job, ss, st)
    if st.flexure.wood is not None or any(lim <= 0 for _, lim, _ in spans):
        return None
    top = max(abs(env.abs_extreme("deflection").value), 1e-300)
    return [(abs(env.abs_extreme("deflection", a, b).value) + BOUND_SLACK * top) / lim
            for (a, b, _), (_, lim, _) in zip(ss.segs, spans)]


def _ratio(demand: float, limit: float) -> float:
    """`Check.ratio` of a demand and its limit."""
    if limit <= 0:
        return math.inf if demand > 0 else 0.0
    return demand / limit


def deflection_spans(job, ss: "StateSet", st) -> list[tuple[float, float, str]]:
    """(start, limit, rule) of each span and overhang, as the deflection check judges them."""
    cache = ss.__dict__.setdefault("_defl_spans", {})
    if "v" not in cache:
        out = []
        for a, b, kind in ss.segs:
            length = b - a
            judged = 2 * length if kind in ("cantilever", "overhang") else length
            if st.defl_abs is not None:
                out.append((a, st.defl_abs, st.defl_words))
            else:
                rule = f"{'2 x ' if judged != length else ''}{kind} length / {st.defl_ratio:g}"
                out.append((a, judged / st.defl_ratio, rule))
        cache["v"] = out
    return cache["v"]


def walk_patterns(job, k: float = 1.0, ss: "StateSet | None" = None):
    """Test oracle only: every check of every one of the 2^n pattern states."""
    from shopbeam.design.checks import checks_for, strengths

    ss = ss or state_set(job)
    st = strengths(job, beam=ss.beam)
    best: dict[str, tuple] = {}
    for pattern in ss.patterns:
        sol = ss.state(k, pattern)
        for c in checks_for(job, sol, st):
            _keep(best, c, pattern, None, "", sol)
    return best


# ------------------------------------------------------------------ evaluation
@dataclass(frozen=True)
class Evaluation:
    """The worst of every check over all load states at factor k."""

    k: float
    checks: tuple  # Check, worst state per check (its `state` says which state)
    worst: dict  # check name -> {"pattern": (...), "position": p or None, "words": str}
    states: int
    solution: Solution | None = None  # the state governing the governing check
    # per support: largest upward and downward reaction over every load state and the state
    # that gives each ({"at", "type", "max_up", "max_up_state", "max_down", ...}; + up)
    reactions: tuple = ()


def _fmt_for(job):
    return _length_fmt(job.units)


@lru_cache(maxsize=8)
def _length_fmt(system: str):
    """One formatter per unit system (also the key of the pattern-words cache)."""

    return lambda x: units.fmt(x, "length", system)


def _first(mv) -> str:
    """"first wheel " of a wheel set's position in words ("" for a set of one axle: the
    hoist is at that place)."""
    return "first wheel " if len(mv.live) > 1 else ""


def turned_round(job):
    """The job with its wheel set turned round (the last axle first), or None where that is
    the same set (one axle, or axles and spacings alike both ways)."""
    if not job.moving:
        return None
    ws = job.moving[0]
    span = ws.offsets[-1] if ws.offsets else 0.0
    back = replace(ws, live=ws.live[::-1], dead=ws.dead[::-1],
                   offsets=tuple(span - o for o in ws.offsets[::-1]))
    if back.live == ws.live and back.dead == ws.dead and all(
            abs(a - b) <= 1e-12 * max(span, 1e-9) for a, b in zip(back.offsets, ws.offsets)):
        return None
    back = replace(back, label=f"{ws.label or 'wheel set'} turned round")
    return replace(job, moving=(back,) + tuple(job.moving[1:]))


def evaluate(job, k: float = 1.0, section=None, ss: StateSet | None = None,
             strengths=None) -> Evaluation:
    """Every check at live-load factor k over every pattern and moving-load position, with a
    wheel set in each of its variants (`wheel_variants`: turned round, empty): each check and
    each support's reactions the worst of them."""
    ss = ss or state_set(job, section)
    ev = _evaluate(job, k, section, ss, strengths)
    for jb, s2 in wheel_variants(job, ss)[1:]:
        ev = _worse(ev, _evaluate(jb, k, section, s2, strengths))
    return ev


def wheel_variants(job, ss: StateSet) -> list[tuple]:
    """[(job, its state set)] as entered, then the wheel set's other variants, each with a
    state set that shares every unit solution and the bare beam's influence data (only the
    wheels differ): turned round, for unequal axles (`turned_round`: a cart turned, a trolley
    hung the other way); and empty, its live part off and its dead weight on, where other
    live loads come with it (a cart's payload comes and goes like a patterned load: the empty
    cart on the span no longer holds down an overhang's stock), turned too. Every rule that
    reads wheel positions judges them all, as `evaluate` does."""
    got = ss.__dict__.get("_variants")
    if got is None:
        got = [(job, ss)]
        words = ""
        if job.moving:
            ws = job.moving[0]
            sets = [job]
            if (ss.parts.live or ss.parts.patterned) and any(ws.live):
                empty = replace(ws, live=tuple(0.0 for _ in ws.live),
                                label=f"{ws.label or 'wheel set'} empty")
                sets.append(replace(job, moving=(empty,) + tuple(job.moving[1:])))
            turned = [turned_round(jb) for jb in sets]
            for jb, t in zip(sets, turned):
                for v in ([jb] if jb is not job else []) + ([t] if t is not None else []):
                    s2 = replace(ss, parts=replace(
                        ss.parts, moving=_moving_parts(v, ss.parts.hoist_impact)))
                    s2.__dict__["_influence"] = ss.__dict__.setdefault("_influence", {})
                    got.append((v, s2))
            words = (", either way round" if any(t is not None for t in turned) else "") \
                + (", loaded or empty" if len(sets) > 1 else "")
        ss.__dict__["_variants"] = got
        ss.__dict__["_variant_words"] = words
    return got


def variant_words(job, ss: StateSet) -> str:
    """The variants `wheel_variants` judges, in words: ", either way round" and/or ", loaded
    or empty" ("" for a set judged only as entered)."""
    wheel_variants(job, ss)
    return ss.__dict__["_variant_words"]


def moving_reactions_off(job, ss: StateSet) -> list[tuple[float, float]]:
    """Per reaction (solution order): (largest, smallest) with the live loads off (k = 0):
    the fixed loads and the wheel set's dead weight anywhere on its travel, either way round
    (exact, from the reactions' cubics in the wheel position)."""
    out: list[tuple[float, float]] = []
    for _jb, s2 in wheel_variants(job, ss):
        mv = s2.parts.moving[0]
        p_lo, p_hi = mv.p_range
        got = reaction_extremes(*reaction_polys(
            beam_influence(s2), mv.offsets, p_lo, p_hi, [r.force for r in s2.fixed.reactions],
            np.asarray(mv.dead, float)))
        out = [(hi, lo) for hi, _ph, lo, _pl in got] if not out else \
            [(max(a[0], hi), min(a[1], lo)) for a, (hi, _ph, lo, _pl) in zip(out, got)]
    return out


def _worse(a: Evaluation, b: Evaluation) -> Evaluation:
    """Each check, worst state and support reaction the worse of two evaluations."""
    by_b = {c.name: c for c in b.checks}
    checks, worst = [], {}
    for c in a.checks:
        other = by_b.get(c.name)
        take_b = other is not None and other.ratio > c.ratio
        checks.append(other if take_b else c)
        worst[c.name] = (b if take_b else a).worst.get(c.name)
    names = {c.name for c in a.checks}
    for c in b.checks:
        if c.name not in names:
            checks.append(c)
            worst[c.name] = b.worst.get(c.name)
    reactions = []
    for ra, rb in zip(a.reactions, b.reactions):
        r = dict(ra)
        if rb["max_up"] > r["max_up"]:
            r["max_up"], r["max_up_state"] = rb["max_up"], rb["max_up_state"]
        if rb["max_down"] < r["max_down"]:
            r["max_down"], r["max_down_state"] = rb["max_down"], rb["max_down_state"]
        reactions.append(r)
    gov = max(checks, key=lambda c: c.ratio)
    solution = b.solution if any(c is gov for c in b.checks) else a.solution
    return Evaluation(a.k, tuple(checks), worst, a.states + b.states, solution,
                      tuple(reactions) or a.reactions)


def _evaluate(job, k: float, section, ss: StateSet, strengths) -> Evaluation:
    """`evaluate` of the job as entered."""
    st = strengths or strengths_of(job, sec=section, beam=ss.beam)
    fmt = _fmt_for(job)
    best: dict[str, tuple] = {}
    count = 0
    reactions: list[dict] = []
    envs: list = []
    if ss.parts.patterned and not ss.parts.moving:
        best, count, env = pattern_checks(job, ss, k, st)
        for r in env.reactions():
            reactions.append({"at": r["at"], "type": r["type"],
                              "max_up": r["max_up"],
                              "max_up_state": describe_pattern(ss, r["max_up_pattern"], fmt),
                              "max_down": r["max_down"],
                              "max_down_state": describe_pattern(ss, r["max_down_pattern"], fmt)})
    for pattern in (() if reactions else ss.patterns):
        words = describe_pattern(ss, pattern, fmt)
        if ss.parts.moving:
            mv = ss.parts.moving[0]
            static = ss.static_loads(k, pattern)
            env = moving_envelope(job, ss, static, k, st, pattern=tuple(pattern))
            envs.append((pattern, env))
            for p, sol in moving_states(job, ss, static, k, st, positions=env.positions):
                count += 1
                shown = round(p / (job.length * 1e-6)) * job.length * 1e-6  # no 1e-7 ft noise
                where = f"{mv.label} {_first(mv)}at {fmt(shown)}"
                full = "; ".join(x for x in (words, where) if x)
                for c in checks_for(job, sol, st, cb_one=True):
                    _keep(best, c, pattern, p, full, sol)
                _keep_reactions(reactions, sol, full)
            _exact_reactions(reactions, env, words, mv, job, fmt)
            _support_local_checks(job, best, sol, env, pattern, words)
        else:
            sol = ss.state(k, pattern)
            count += 1
            for c in checks_for(job, sol, st):
                _keep(best, c, pattern, None, words, sol)
            _keep_reactions(reactions, sol, words)
    checks, worst = [], {}
    for name, (c, pattern, p, words, sol) in best.items():
        if name == "shear" and p is not None:
            c = _limit_shear(c, sol, [e for pat, e in envs if pat == pattern])
        if words:
            c = replace(c, state=words)
        if ss.parts.moving and name == "bending":
            c = replace(c, formula=c.formula + " (moving loads: Cb = 1.0)")
        checks.append(c)
        worst[name] = {"pattern": pattern, "position": p, "words": words}
        if p is not None:  # plain data for checks under the wheels: (x, force + up) each
            worst[name]["wheels"] = wheel_loads(ss.parts.moving[0], p,
                                                k * (1 + ss.parts.impact))
    gov = max(checks, key=lambda c: c.ratio)
    return Evaluation(k, tuple(checks), worst, count, best[gov.name][4], tuple(reactions))


def wheel_loads(mv: MovingLoad, p: float, kk: float) -> list[tuple[float, float]]:
    """Where each wheel stands and what it carries (N, + up; live x kk plus dead) with the
    first wheel at p: the governing wheel positions as plain data (`Evaluation.worst`)."""
    return [(float(p + s), float(d + kk * f)) for s, f, d in zip(mv.offsets, mv.live, mv.dead)]


def _support_local_checks(job, best, sol: Solution, env: "MovingEnvelope", pattern,
                          words: str) -> None:
    """The local checks at the supports (J10 at a bearing) with every support at its largest
    upward and then its largest downward reaction over the whole travel (exact, from the
    envelope), as for patterned loads: a local check reads only the forces, so two states
    cover every trolley position without solving one per support."""
    from shopbeam.design import local as _local

    sec = job.section
    if not _local.applies(sec):
        return
    for i, which in ((0, "upward"), (2, "downward")):
        fake = replace(sol, beam=replace(sol.beam, loads=tuple(
            ld for ld in sol.beam.loads if not (ld.key or "").startswith("moving"))),
            reactions=tuple(replace(r, force=e[i]) for r, e in zip(sol.reactions,
                                                                   env.reactions)))
        text = "; ".join(x for x in (words, f"each support at its largest {which} reaction "
                                     "over the travel (see the reaction envelope)") if x)
        for c in _local.local_checks(job, fake, sec):
            _keep(best, c, pattern, None, text, sol)


def _exact_reactions(out: list[dict], env: "MovingEnvelope", words: str, mv, job, fmt) -> None:
    """Each reaction at its exact extremes over the travel (`moving_envelope`)."""
    for d, (hi, p_hi, lo, p_lo) in zip(out, env.reactions):
        for value, p, key, better in ((hi, p_hi, "max_up", hi > d["max_up"]),
                                      (lo, p_lo, "max_down", lo < d["max_down"])):
            if better:
                shown = round(p / (job.length * 1e-6)) * job.length * 1e-6
                where = f"{mv.label} {_first(mv)}at {fmt(shown)}"
                d[key], d[key + "_state"] = float(value), "; ".join(x for x in (words, where) if x)


def _keep_reactions(out: list[dict], sol: Solution, words: str) -> None:
    if not out:
        out.extend({"at": float(r.at), "type": r.kind, "max_up": -math.inf, "max_up_state": "",
                    "max_down": math.inf, "max_down_state": ""} for r in sol.reactions)
    for d, r in zip(out, sol.reactions):
        if r.force > d["max_up"]:
            d["max_up"], d["max_up_state"] = float(r.force), words
        if r.force < d["max_down"]:
            d["max_down"], d["max_down_state"] = float(r.force), words


def _keep(best, c, pattern, p, words, sol):
    old = best.get(c.name)
    if old is None or c.ratio > old[0].ratio:
        best[c.name] = (c, pattern, p, words, sol)


# ------------------------------------------------------------------ moving-load envelopes
@dataclass(frozen=True)
class MovingEnvelope:
    """The exact extremes of one static state plus the wheel set over its whole travel
    (see `moving_envelope`)."""

    positions: tuple[float, ...]  # every first-wheel position where some check is worst
    # (combination, quantity, region, "max" | "min") -> (value, x, first-wheel position);
    # regions are (start, end) of an unbraced length (moment), a span (deflection), the
    # whole beam (shear), or ("wheel", i) for the line under wheel i (moment)
    extremes: dict
    reactions: tuple  # per reaction (solution order): (largest, its p, smallest, its p)


NUDGE = 4e-9  # of the length: just past the solver's merging of positions (1e-9)


def beam_influence(ss: StateSet):
    """The exact influence data of the state set's bare beam (cached on it)."""
    cache = ss.__dict__.setdefault("_influence", {})
    if "v" not in cache:
        cache["v"] = influence(ss.beam)
    return cache["v"]


def flange_influence(beam: Beam, inf):
    """The influence data of the flange-as-beam (the bare beam with EI 1) from the beam's own
    `inf`: the unknowns per unit load are found in EI times slope and deflection, so EI
    enters them only through springs (k / EI) and hinge rotations (stored over EI, read back
    times EI); without either they are the same numbers, and the moment is read at EI 1."""
    flat = replace(beam, ei=1.0)
    if any(s.kind in ("spring", "hinge") for s in beam.supports):
        return influence(flat)
    return replace(inf, beam=flat)


def wheel_forces(mv: MovingLoad, kk: float) -> np.ndarray:
    return np.array([d + kk * f for f, d in zip(mv.live, mv.dead)])


def moving_envelope(job, ss: StateSet, static_loads, k: float, st=None,
                    pattern: tuple | None = None, more: tuple = ()) -> MovingEnvelope:
    """Exact extremes of shear, moment (each unbraced length, and under each wheel),
    deflection (each span) and every reaction over the whole travel of the wheel set, on top
    of the static loads, from the beam's influence lines (engine/influence.py): every
    candidate (x, p) is a cell corner, a stationary point along a cell edge or a common root
    of both partial derivatives, evaluated exactly. `positions` holds the first-wheel
    positions where any of them is reached, the ends of the travel (a wheel nearest each end
    of the member), a wheel on each static point load (their forces add: `_on_point_loads`), and for lifting
    jobs the worst position of Mx / Mcx + My / Mcy under each wheel. `more`: more (start,
    end) lengths, covering the member one after another, whose moment extremes are wanted
    too (the lengths between supports, a cantilever: `analysis.moment_ranges`): kept as
    ("more", "moment", (start, end), "max" | "min"); they add no positions."""
    mv = ss.parts.moving[0]
    kk = k * (1 + ss.parts.impact)
    L = job.length
    tol = 1e-10 * L
    p_lo, p_hi = mv.p_range
    st = st or strengths_of(job, beam=ss.beam)
    inf = beam_influence(ss)
    P = wheel_forces(mv, kk)
    ltb = [(float(s[0]), float(s[1])) for s in st.ltb_segments]
    spans = [(float(a), float(b)) for a, b, _ in ss.segs]
    # every state at every factor k is fixed + kk live (the state set's unit solutions, which
    # share their breaks), so the cells and each combination's two parts are found once
    # per pattern and re-weighted for each k (capacity calls this ten times or so)
    cache = ss.__dict__.setdefault("_moving", {}) if pattern is not None else {}
    if pattern is not None:
        live_sol = combine([(1.0, ss.live)] + [(1.0, ss.spans[i]) for i in pattern],
                           ss.beam)
        static = combine([(1.0, ss.fixed), (kk, live_sol)], ss.beam)
    else:
        static = solve(replace(ss.beam, loads=tuple(static_loads)))
    if (pattern, "cells", id(st)) not in cache:
        xs = set(static.moment.breaks.tolist()) | {x for r in ltb + spans for x in r}
        xs |= {x for x in brace_points(job)[1] if 0 <= x <= L}
        cache[pattern, "cells", id(st)] = (wheel_cells(inf, sorted(xs), mv.offsets, p_lo, p_hi),
                                           sorted(xs))
    cells, xs = cache[pattern, "cells", id(st)]
    ext: dict = {}
    pos = {p_lo, p_hi}
    regions = {"shear": [(0.0, L)], "moment": ltb, "deflection": spans}

    def keep(key, c, m):
        if not m.any():
            return
        for how, pick in (("max", np.argmax), ("min", np.argmin)):
            i = int(pick(np.where(m, c.value, -np.inf if how == "max" else np.inf)))
            ext[key + (how,)] = (float(c.value[i]), float(c.x[i]), float(c.p[i]))

    polys = {}
    sec = getattr(st, "section", None) or job.section
    lifting = bool(job.lifting or getattr(job.criteria, "lifting", ""))
    i_strong = sec.shape == "i-beam" and sec.axis == "strong"
    under = lifting and i_strong  # wheel flange check
    # the loads hung from the bottom flange whose moment the flange check reads: on a lifting
    # job every one; on any other, those on a clamp or wheels (not `lug = true`)
    hung_keys = set() if not i_strong else set(getattr(job, "hung", ()) or ()) if lifting \
        else set(_lifting.tip_hung(job))
    groups = {name: cell_groups(cells, regions[name]) for name in regions}
    # every quantity's candidates (and the lateral check's) are found in one batched pass
    asks, reads = [], []
    for tag, name, spw, loads in _combinations(job, ss, static, static_loads, st, mv, kk, P):
        if pattern is None:
            F = cell_polys(inf, cells, name, spw, loads)
        else:
            key = (pattern, tag, name, id(st))
            if key not in cache:
                cache[key] = _parts(inf, cells, ss, live_sol, mv, tag, name)
            fd, fl_ = cache[key]
            F = fd + kk * fl_
        polys[tag, name] = F
        lines = under and name == "moment" and tag == "total"
        # a point load hung from the bottom flange gets the flange check too: the moment at
        # it is read, so every cell's sides are searched (no pruning)
        hung = [ld.at for ld in static_loads if ld.kind == "point" and ld.value
                and (ld.key or "") in hung_keys] \
            if hung_keys and name == "moment" and tag == "total" else []
        asks.append((F, groups[name], lines, not hung))
        reads.append((tag, name, lines, hung))
    lat = _lateral(job, ss, st, mv, k, static_loads)
    if lat is not None:  # Mx / Mcx + My / Mcy under each wheel: max over the four signs
        lat_loads, ratio = lat
        cache_f = ss.__dict__.setdefault("_influence", {})
        if "flange" not in cache_f:  # the flange-as-beam of the check (EI 1)
            cache_f["flange"] = flange_influence(ss.beam, inf)
        inf_f = cache_f["flange"]
        Fy = cell_polys(inf_f, cells, "moment", None, lat_loads)
        for s in (1.0, -1.0):  # the check takes the sum at the wheels, the supports and
            # where either moment peaks: the whole beam and the line under each wheel
            asks.append((polys["total", "moment"] + s * ratio * Fy, None, True, True))
    if more:
        asks.append((polys["total", "moment"], cell_groups(cells, more), False, True))
    found = candidates_many(cells, asks)
    if more:
        c = found.pop()
        for a, b in more:
            keep(("more", "moment", (a, b)), c, (c.x >= a - tol) & (c.x <= b + tol))
    for (tag, name, lines, hung), c in zip(reads, found):
        for a, b in regions[name]:
            keep((tag, name, (a, b)), c, (c.x >= a - tol) & (c.x <= b + tol))
        for x0 in hung:
            keep((tag, name, ("hung", x0)), c, np.abs(c.x - x0) <= tol)
        if lines:  # under each wheel (wheel flange bending)
            for i in range(len(P)):
                keep((tag, name, ("wheel", i)), c, c.wheel == i)
    for s, c in zip((1.0, -1.0), found[len(reads):]):
        keep(("lateral", s, (0.0, L)), c, np.ones(len(c.x), bool))
        for i in range(len(P)):
            keep(("lateral", s, ("wheel", i)), c, c.wheel == i)
    _governing_positions(job, ss, st, {k_: e for k_, e in ext.items() if k_[0] != "more"},
                         pos, P)
    if pattern is None:
        reactions = tuple(reaction_candidates(inf, mv.offsets, p_lo, p_hi,
                                              [r.force for r in static.reactions], P))
    else:
        key = (pattern, "reactions")
        if key not in cache:
            cache[key] = (reaction_polys(inf, mv.offsets, p_lo, p_hi,
                                         [r.force for r in ss.fixed.reactions], mv.dead),
                          reaction_polys(inf, mv.offsets, p_lo, p_hi,
                                         [r.force for r in live_sol.reactions], mv.live))
        (p0s, wps, gd), (_, _, gl) = cache[key]
        reactions = tuple(reaction_extremes(p0s, wps, gd + kk * gl))
    # the local checks at the supports read each reaction's extremes directly (evaluate);
    # wood bearing checks are run on the solved states, so their positions are solved
    if getattr(st.flexure, "wood", None) is not None:
        for r in reactions:
            pos.update((r[1], r[3]))
    pos.update(_on_point_loads(mv, static_loads, p_lo, p_hi, tol))
    # a wheel on a support or a load edge: the worst shear there is the limit as the wheel
    # comes near (on the break itself its force goes straight in), so just inside too
    fixed = np.array(sorted(xs))
    nudge = NUDGE * L
    for p in list(pos):
        at = p + np.asarray(mv.offsets)
        j = np.clip(np.searchsorted(fixed, at), 1, len(fixed) - 1)
        if np.any(np.minimum(np.abs(fixed[j] - at), np.abs(fixed[j - 1] - at)) <= tol):
            pos.update((p - nudge, p + nudge))
    out = []
    for p in sorted(pos):
        p = min(max(p, p_lo), p_hi)
        if not out or p - out[-1] > tol:
            out.append(p)
    return MovingEnvelope(tuple(out), ext, reactions)


def _on_point_loads(mv, static_loads, p_lo: float, p_hi: float, tol: float) -> list[float]:
    """First-wheel positions that put a wheel on a static point load (the forces add there:
    the local checks). Wheels of the same load (live and dead) give the same force at the
    same place, so of each such class the first and the last wheel are placed; positions
    that put wheels on two or more point loads at once are all kept. A long train of equal
    wheels then adds a few positions per point load, not one per wheel."""
    at = [ld.at for ld in static_loads if ld.kind == "point" and ld.value]
    if not at:
        return []
    d = np.asarray(mv.offsets, float)
    rep: dict = {}
    for i, key in enumerate(zip(mv.live, mv.dead)):
        rep.setdefault(key, []).append(i)
    keep = sorted({i for idx in rep.values() for i in (idx[0], idx[-1])})
    out = [x - d[i] for x in at for i in keep if p_lo - tol <= x - d[i] <= p_hi + tol]
    if len(at) > 1:  # two wheels on two point loads at once
        p = np.concatenate([x - d for x in at])
        src = np.repeat(np.arange(len(at)), len(d))
        ok = (p >= p_lo - tol) & (p <= p_hi + tol)
        p, src = p[ok], src[ok]
        order = np.argsort(p, kind="stable")
        p, src = p[order], src[order]
        near = np.flatnonzero((np.diff(p) <= tol) & (src[1:] != src[:-1]))
        out += p[near].tolist() + p[near + 1].tolist()
    return out


def _governing_positions(job, ss, st, ext: dict, pos: set, forces=None) -> None:
    """The positions to solve and check: for each check the position of its largest ratio.

    Under moving loads Cb is 1.0, so each unbraced length's allowable moment and each span's
    deflection limit do not depend on the loads: the bending check is worst where the largest
    |M| / allowable over the lengths is, the deflection check where the largest |u| / limit
    over the spans is, the shear check where the largest |V| is. Checks that read more than
    one extreme (tees and angles, wood creep and dead-load checks, the live-load deflection
    rule, the wheel flange check under each wheel) get every extreme's position."""
    from shopbeam.design.checks import nominal_moment

    fl = st.flexure
    plain = not getattr(fl, "special", False) and fl.wood is None

    def best_of(tag, name, weights):
        top = None
        for region, w in weights.items():
            for how in ("max", "min"):
                e = ext.get((tag, name, region, how))
                if e is not None and (top is None or abs(e[0]) * w > top[0]):
                    top = (abs(e[0]) * w, e[2])
        if top is not None:
            pos.add(top[1])

    if plain:
        weights = {}
        for a, b, free, l1, why in st.ltb_segments:
            if l1 < fl.cap and not fl.uses_cb:
                mn = l1
            elif l1 < fl.cap:
                mn = float(nominal_moment(fl.cap, l1, 1.0))
            else:
                mn = fl.cap
            weights[(float(a), float(b))] = fl.omega / mn if mn > 0 else math.inf
        best_of("total", "moment", weights)
        best_of("total", "shear", {(0.0, float(job.length)): 1.0})
        best_of("total", "deflection", {
            (float(a), float(b)): (1.0 / lim if lim > 0 else math.inf)
            for (a, b, _), (_, lim, _) in zip(ss.segs, deflection_spans(job, ss, st))})
    lines = _wheel_line_positions(job, st, ext, forces) if plain else None
    for key, e in ext.items():
        if not plain or key[0] in ("live", "dead") or \
                key[2][0] == "hung" and key[0] == "total" or \
                key[2][0] == "wheel" and key[0] == "total" and lines is None:
            pos.add(e[2])
    if lines is not None:
        pos.update(lines)
    pos.update(_lateral_positions(ext, [sp.at for sp in ss.beam.supports], job.length))


def _wheel_line_positions(job, st, ext: dict, forces) -> list[float] | None:
    """Where the wheel flange check is worst, from the moment extremes under each wheel
    (None: solve every wheel's extremes). Its stress under wheel i is convex in the
    moment there (a von Mises norm of the local stresses plus the global one), so over the
    travel it is largest at that wheel's largest or smallest moment: the check's worst is
    the largest of those 2 x wheels values, worked out here with the check's own formula,
    and only the positions that reach it (within 1e-9) are solved, not two per wheel."""
    from shopbeam.design import lifting

    keys = [k for k in ext if k[0] == "total" and k[1] == "moment" and k[2][0] == "wheel"]
    if not keys:
        return []
    sec = getattr(st, "section", None) or job.section
    ws = job.moving[0] if getattr(job, "moving", None) else None
    if forces is None or ws is None or sec.shape != "i-beam" or "bf" not in sec.dims:
        return None
    a = ws.wheel_edge if ws.wheel_edge is not None else lifting.DEFAULT_WHEEL_EDGE
    tf, tapered = lifting.flange_tf_at_wheel(sec, a)
    d = sec.dims
    vals = []
    for key in keys:
        m, _, p = ext[key]
        load = abs(float(forces[key[2][1]])) / ws.wheels_per_axle
        vm, _, _ = lifting.wheel_flange_stress(load, tf, d["bf"], d["tw"], a, tapered,
                                               m / sec.sx_bot)
        vals.append((vm, p))
    top = max(v for v, _ in vals)
    return [p for v, p in vals if v >= top * (1 - 1e-9)]


def _lateral_positions(ext: dict, supports, length: float) -> list[float]:
    """Where the lateral trolley force check can be worst: the positions of the extremes of
    Mx + s (Mcx / Mcy) My over the whole beam, and under the wheels the ones that reach the
    largest of them. A state's check reads that sum at points of the beam (the wheels, the
    supports, where either moment peaks), so it is at most the whole-beam extreme; when a
    wheel line or a support reaches that extreme, the state there reads it and a state at
    another wheel's extreme cannot exceed it, so that one is not solved (else every wheel's
    is, as before)."""
    lat = {k: e for k, e in ext.items() if k[0] == "lateral"}
    if not lat:
        return []
    whole = [k for k in lat if k[2][0] != "wheel"]
    line = [k for k in lat if k[2][0] == "wheel"]
    out = [lat[k][2] for k in whole]
    top_whole = max((abs(lat[k][0]) for k in whole), default=0.0)
    top_line = max((abs(lat[k][0]) for k in line), default=0.0)
    tol = 1e-9 * length
    read = any(abs(lat[k][0]) >= top_whole and any(abs(lat[k][1] - x) <= tol for x in supports)
               for k in whole)
    if read:
        out += [lat[k][2] for k in line if abs(lat[k][0]) >= top_whole * (1 - 1e-9)]
    elif line and top_whole <= top_line:
        out += [lat[k][2] for k in line if abs(lat[k][0]) >= top_line * (1 - 1e-9)]
    else:
        out += [lat[k][2] for k in line]
    return out


def _parts(inf, cells, ss: StateSet, live_sol: Solution, mv, tag: str, name: str):
    """The fixed part and the part per unit kk of one combination's cell polynomials."""
    zero = np.zeros(len(mv.live))
    dead, live = np.array(mv.dead, float), np.array(mv.live, float)
    if tag == "total":
        return (cell_polys(inf, cells, name, ss.fixed.function(name), dead),
                cell_polys(inf, cells, name, live_sol.function(name), live))
    if tag == "live":
        return (cell_polys(inf, cells, name, None, zero),
                cell_polys(inf, cells, name, live_sol.function(name), live))
    return (cell_polys(inf, cells, name, ss.fixed.function(name), dead),
            cell_polys(inf, cells, name, None, zero))


def _combinations(job, ss, static, static_loads, st, mv, kk, P):
    """(tag, quantity, static response, wheel forces) of every load combination a check
    reads: all loads; the live loads alone (floor live-load deflection); the dead loads
    alone (wood: NDS 2018 2.3.2)."""
    for name in ("shear", "moment", "deflection"):
        yield "total", name, static.function(name), P
    if st.live_ratio:
        live = solve(replace(ss.beam, loads=tuple(ld for ld in static_loads if ld.case != "dead")),
                     candidates=False)
        yield "live", "deflection", live.function("deflection"), kk * np.array(mv.live)
    if getattr(st.flexure, "wood", None) is not None:
        dead = solve(replace(ss.beam, loads=tuple(ld for ld in static_loads if ld.case == "dead")),
                     candidates=False)
        for name in ("shear", "moment", "deflection"):
            yield "dead", name, dead.function(name), np.array(mv.dead, float)


def _lateral(job, ss, st, mv, k, static_loads):
    """(lateral wheel forces, Mcx / Mcy) when the lateral trolley force check applies."""
    from shopbeam.design import lifting

    prof = lifting.profile_of(job) if (job.lifting or getattr(job.criteria, "lifting", "")) \
        else None
    sec = getattr(st, "section", None) or job.section
    if prof is None or not prof.lateral or sec.shape != "i-beam" or sec.axis != "strong":
        return None
    # Mcx is the bending check's allowable strength (Cb = 1 under moving loads): read it
    # from the bending check of one state. With one unbraced length (and no tee or angle
    # rules) it does not depend on the loads, so it is read once per state set and strengths
    # (capacity asks at several factors)
    cache = ss.__dict__.setdefault("_mcx", {})
    got = cache.get(id(st))
    fl = st.flexure
    if got is not None and got[0] is st:
        unit, limit = got[1]
    elif len(st.ltb_segments) == 1 and not getattr(fl, "special", False):
        # the bending check's allowable of its one length at Cb 1.0, without a state solved
        # for it (`bending_check` takes the same steps: Mn / Omega_b, over S on a stress basis)
        _, _, free, l1, why = st.ltb_segments[0]
        allow = segment_strength(fl, l1, 1.0, free, why)[0] / fl.omega
        unit, limit = ("Pa", allow / fl.stress_s) if fl.stress_s else ("N*m", allow)
        cache[id(st)] = (st, (unit, limit))
    else:
        wheels = [Load("point", at=mv.travel[0] + s, value=d + k * (1 + ss.parts.impact) * f,
                       label=mv.label, key=mv.key)
                  for s, f, d in zip(mv.offsets, mv.live, mv.dead)]
        sol = solve(replace(ss.beam, loads=tuple(static_loads) + tuple(wheels)))
        bend = bending_check(job, sol, st, cb_one=True)
        unit, limit = bend.unit, bend.limit
        if len(st.ltb_segments) == 1 and not getattr(st.flexure, "special", False):
            cache[id(st)] = (st, (unit, limit))
    if unit != "N*m" or not limit > 0:
        return None
    mny, _ = lifting.flange_weak_strength(sec, job.material)
    h = 1 + ss.parts.hoist_impact  # the lateral force is taken without impact (4.9.4)
    loads = np.array([prof.lateral * abs(k * f + d / h) for f, d in zip(mv.live, mv.dead)])
    return loads, limit / (mny / 1.67)


def candidate_positions(job, ss: StateSet, static_loads, k: float, cache=None,
                        st=None) -> list[float]:
    """Every first-wheel position where some check can reach its worst (`moving_envelope`)."""
    return list(moving_envelope(job, ss, static_loads, k, st).positions)


def _limit_shear(c: Check, sol: Solution, envs) -> Check:
    """The shear check at its exact envelope value: with a wheel just inside a support the
    solve stands NUDGE of the length away from the limit the envelope gives exactly."""
    if not envs:
        return c
    e = envs[0].extremes
    v = max(abs(e.get(("total", "shear", (0.0, sol.beam.length), h), (0.0,))[0])
            for h in ("max", "min"))
    got = sol.shear.extremes().abs_max
    if got > 0 and 1.0 < v / got <= 1.0 + 1e-6:
        c = replace(c, demand=c.demand * (v / got))
    return c


def moving_states(job, ss: StateSet, static_loads, k: float, st, cache=None, positions=None):
    """(first-wheel position, full solution) at every candidate position."""
    mv = ss.parts.moving[0]
    kk = k * (1 + ss.parts.impact)
    if positions is None:
        positions = candidate_positions(job, ss, static_loads, k, cache, st)
    beams = []
    for p in positions:
        wheels = [Load("point", at=p + s, value=d + kk * f, label=mv.label, key=mv.key)
                  for s, f, d in zip(mv.offsets, mv.live, mv.dead)]
        beams.append(replace(ss.beam, loads=tuple(static_loads) + tuple(wheels)))
    # one batched march and one stack of linear systems for every position (each the same
    # numbers as its own solve)
    sols = list(zip(positions, solve_each(beams)))
    # each wheel is one point load (its dead and live parts together); its dead weight is
    # noted on the state for the checks of the dead loads alone (wood's CD 0.9, NDS 2.3.2)
    for p, sol in sols:
        sol.__dict__["dead_wheels"] = tuple((p + s, d) for s, d in zip(mv.offsets, mv.dead) if d)
    if (job.lifting or getattr(job.criteria, "lifting", "")) and not st.flexure.stress_s:
        from shopbeam.design import lifting  # the lateral check's flange-as-beam, batched too

        lifting.solve_flanges(job, [s for _, s in sols], getattr(st, "section", None)
                              or job.section, lifting.profile_of(job), impact_of(job))
    # the extreme candidates of every position's four functions in one batched pass (the
    # same per function as each solve's own pass: each row's search depends on that row)
    # (and the moment of each flange-as-beam, which the lateral check reads the extremes of)
    find_candidates([s.function(n) for _, s in sols
                     for n in ("shear", "moment", "slope", "deflection")]
                    + [s.__dict__["_flange"][1].moment for _, s in sols
                       if "_flange" in s.__dict__])
    yield from sols


def run_checks(job, sol: Solution) -> list[Check]:
    """All checks for the job. Jobs with patterned or moving loads (or an impact allowance)
    are checked over every load state (see this module); `sol` is then only the
    all-loaded picture."""
    if needs_states(job):
        return list(evaluate(job, 1.0).checks)
    return basic_checks(job, sol)


def envelope_bruteforce(job, k: float = 1.0, n: int = 2001):
    """Test oracle only: the checks re-solved at n evenly spaced positions: per check the
    largest demand, where, and the largest ratio (local checks have a limit that depends on
    where the force acts, so their worst is by ratio)."""
    ss = state_set(job)
    st = strengths_of(job, beam=ss.beam)
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
           "needs_states", "state_set", "evaluate", "run_checks", "combine", "clip", "candidate_positions",
           "envelope_bruteforce"]
