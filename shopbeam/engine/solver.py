"""The beam engine: singularity functions (Macaulay brackets) solved as one linear system.

The load intensity q(x) is a sum of bracket terms c<x-a>^n: point forces are n = -1, couples
n = -2, uniform loads start and stop with n = 0, linearly varying loads add n = 1 ramps.
Integrating four times gives V, M, EI*slope and EI*deflection. The unknowns are bracket terms
too: each support force (n = -1), each fixed-end moment (n = -2), each hinge's rotation jump
(n = -3, a step in EI*slope) and the two integration constants (EI*slope(0), n = -3 at 0, and
EI*deflection(0), n = -4 at 0). They are fixed by global equilibrium just past the end
(V(L+) = 0, M(L+) = 0) and one condition of each conjugate pair at every support and hinge:
u = 0 (pin, roller, fixed), slope = 0 (fixed), R = -k u (spring), M = 0 (hinge). The same
system solves determinate and indeterminate beams; a beam that can move without straining
(rigid-body motion or a mechanism) is found by a kinematic check first and described in words.

Integration is done by marching across the breaks: on each piece the state
[q', q, V, M, EI*slope, EI*deflection] is a Taylor polynomial, and every bracket term adds a
jump of one state entry where it starts. One pass carries the known loads and every unknown
side by side, so building the system, and then every piece polynomial, costs time linear in
the number of loads and supports.
"""

from __future__ import annotations

import math
from fractions import Fraction
from dataclasses import dataclass, field
from functools import cached_property

import numpy as np

from shopbeam.engine.model import Beam, segments  # noqa: F401 (segments: re-exported)
from shopbeam.engine.selfcheck import SelfCheck, failed_checks, self_checks
from shopbeam.errors import InputError, UnstableBeam
from shopbeam.engine.piecewise import Extreme, Piecewise, find_candidates

# state entries, by integration level: q' (-1), q (0), V (1), M (2), EI*slope (3), EI*u (4)
_NLEV = 6
SNAP = 1e-9  # positions closer than this fraction of the length share one break
_IDX = {"dq": 0, "q": 1, "V": 2, "M": 3, "EIt": 4, "EIu": 5}


@dataclass(frozen=True)
class Reaction:
    """What a support does to the beam: force + up, moment + counterclockwise."""

    at: float
    kind: str
    force: float
    moment: float = 0.0
    key: str = ""


@dataclass(frozen=True)
class Solution:
    """Everything the solve found, in SI. Renderers (report, JSON, UI) only read this."""

    beam: Beam
    reactions: tuple[Reaction, ...]
    hinge_rotations: tuple[tuple[float, float], ...]  # (at, rotation jump in rad)
    ei_slope_0: float  # integration constant C1 = EI * slope(0)
    ei_deflection_0: float  # integration constant C2 = EI * deflection(0)
    load: Piecewise
    shear: Piecewise
    moment: Piecewise
    slope: Piecewise
    deflection: Piecewise
    condition: float  # condition number of the (equilibrated) linear system
    exact: bool = False  # the linear system was solved in rational arithmetic

    @cached_property
    def diagnostics(self) -> tuple[SelfCheck, ...]:
        """The self-checks, computed on first use (every report and screen shows them)."""
        return tuple(self_checks(self))

    @cached_property
    def _extremes(self) -> dict[str, Extreme]:
        names = ("shear", "moment", "slope", "deflection")
        find_candidates([self.function(name) for name in names])  # one batched pass
        return {name: _chop(self.function(name).extremes()) for name in names}

    @property
    def length(self) -> float:
        return self.beam.length

    def extremes(self) -> dict[str, Extreme]:
        """Exact extremes of shear, moment, slope and deflection over the whole beam."""
        return dict(self._extremes)

    def function(self, name: str) -> Piecewise:
        return {"load": self.load, "shear": self.shear, "moment": self.moment,
                "slope": self.slope, "deflection": self.deflection}[name]


def _chop(e: Extreme) -> Extreme:
    """Rounding residue (|v| below 1e-10 of the largest value) is reported as exactly 0."""
    tiny = 1e-10 * max(abs(e.max), abs(e.min))
    mx = 0.0 if abs(e.max) <= tiny else e.max
    mn = 0.0 if abs(e.min) <= tiny else e.min
    return Extreme(mx, e.max_at, mn, e.min_at)


# ------------------------------------------------------------------ bracket terms
def load_terms(loads) -> list[tuple[float, float, int]]:
    """The applied loads as bracket terms (coefficient, position, power) of q(x)."""
    terms: list[tuple[float, float, int]] = []
    for ld in loads:
        if ld.kind == "point":
            terms.append((ld.value, ld.at, -1))
        elif ld.kind == "moment":
            # a counterclockwise couple C makes M step down by C (M sagging +, V = dM/dx)
            terms.append((-ld.value, ld.at, -2))
        elif ld.kind in ("uniform", "linear"):
            w1 = ld.w1
            w2 = ld.w1 if ld.kind == "uniform" else ld.w2
            span = ld.end - ld.start
            slope = (w2 - w1) / span if span > 0 else 0.0
            terms.append((w1, ld.start, 0))
            terms.append((-w2, ld.end, 0))
            if slope != 0.0:
                terms.append((slope, ld.start, 1))
                terms.append((-slope, ld.end, 1))
        else:  # pragma: no cover - the job reader only makes the four kinds
            raise ValueError(f"unknown load kind {ld.kind!r}")
    return terms


@dataclass(frozen=True)
class _Unknown:
    kind: str  # force | moment | hinge | c1 | c2
    at: float
    power: int
    coef: float  # sign of the bracket term per unit unknown
    support: int = -1


def _unknowns(beam: Beam) -> list[_Unknown]:
    out = []
    for i, s in enumerate(beam.supports):
        if s.takes_force:
            out.append(_Unknown("force", s.at, -1, 1.0, i))
        if s.takes_moment:
            out.append(_Unknown("moment", s.at, -2, -1.0, i))
        if s.kind == "hinge":
            out.append(_Unknown("hinge", s.at, -3, 1.0, i))
    out.append(_Unknown("c1", 0.0, -3, 1.0))
    out.append(_Unknown("c2", 0.0, -4, 1.0))
    return out


# ------------------------------------------------------------------ stability
def _fmt_len(x: float) -> str:
    ft = x / 0.3048
    whole = int(ft + 1e-9)
    inch = (ft - whole) * 12
    if abs(inch) < 0.005:
        return f"{whole} ft"
    if abs(inch - 12) < 0.005:
        return f"{whole + 1} ft"
    if whole == 0:
        return f"{inch:.3g} in"
    return f"{whole} ft {inch:.3g} in"


def stability_problem(beam: Beam, fmt=None) -> str | None:
    """Words for the rigid-body motion or mechanism the beam allows, or None if stable."""
    fmt = fmt or _fmt_len
    L = beam.length
    restraints = [s for s in beam.supports if s.kind != "hinge"]
    hinges = sorted(s.at for s in beam.supports if s.kind == "hinge")
    if not restraints:
        return "the beam has no supports, so nothing holds it up: add supports (at least two, or one fixed end)"
    if not hinges:  # one rigid body: held by a fixed support or two supports well apart
        at = [s.at for s in restraints]
        if any(s.kind == "fixed" for s in restraints) or max(at) - min(at) > 1e-6 * L:
            return None
    bounds = [0.0] + hinges + [L]
    nseg = len(bounds) - 1
    rows = []

    def seg_of(x):
        for s in range(nseg):
            if x <= bounds[s + 1] + 1e-12 * L:
                return s
        return nseg - 1

    for sup in restraints:
        s = seg_of(sup.at)
        r = np.zeros(2 * nseg)
        r[2 * s] = 1.0
        r[2 * s + 1] = (sup.at - bounds[s]) / L
        rows.append(r)
        if sup.kind == "fixed":
            r = np.zeros(2 * nseg)
            r[2 * s + 1] = 1.0
            rows.append(r)
    for s in range(nseg - 1):  # deflection is continuous through each hinge
        r = np.zeros(2 * nseg)
        r[2 * s] = 1.0
        r[2 * s + 1] = (bounds[s + 1] - bounds[s]) / L
        r[2 * (s + 1)] = -1.0
        rows.append(r)
    a = np.array(rows)
    _, sv, vt = np.linalg.svd(a)
    rank = int(np.sum(sv > 1e-10 * sv[0])) if sv.size else 0
    if rank >= 2 * nseg:
        return None
    null = vt[-1]
    null = null / np.max(np.abs(null))
    moving = [s for s in range(nseg) if max(abs(null[2 * s]), abs(null[2 * s + 1])) > 1e-6]

    def unsupported(s):
        return 0 < s < nseg - 1 and not any(
            bounds[s] - 1e-12 * L <= sp.at <= bounds[s + 1] + 1e-12 * L for sp in restraints)

    s = next((s for s in moving if unsupported(s)), moving[0])
    a0, b0 = bounds[s], bounds[s + 1]
    w, r = null[2 * s], null[2 * s + 1] / L
    if nseg == 1:
        if len(restraints) == 1 and restraints[0].kind != "fixed":
            sup = restraints[0]
            return (f"the beam can rotate about its only support at {fmt(sup.at)}: "
                    "add a support or fix one end")
        return "the supports do not hold the beam: add a support or fix one end"
    inside = [sp for sp in restraints if a0 - 1e-12 * L <= sp.at <= b0 + 1e-12 * L]
    part = f"the part of the beam from {fmt(a0)} to {fmt(b0)}"
    if not inside and 0 < s < nseg - 1:
        return (f"the hinges at {fmt(a0)} and {fmt(b0)} are in one span with no support "
                f"between them, so {part} can drop: add a support between them or remove a hinge")
    if abs(r) > 1e-12:
        pivot = a0 - w / r
        near = [x for x in [sp.at for sp in inside] + [a0, b0] if abs(x - pivot) < 1e-6 * L]
        what = "hinge" if near and any(abs(h - pivot) < 1e-6 * L for h in hinges) else "support"
        where = f"about the {what} at {fmt(near[0])}" if near else f"about a point at {fmt(pivot)}"
        return (f"{part} can swing {where}: add a support between {fmt(a0)} and {fmt(b0)}, "
                "fix a support, or remove a hinge")
    return f"{part} can move up and down freely: add a support between {fmt(a0)} and {fmt(b0)}"


def geometry_problems(length: float, supports, loads, fmt=None) -> list[tuple[str, str]]:
    """(key path, message) for every support, hinge and load that sits where it cannot.

    The one geometry rule: the job reader reports these with file and line, `solve` refuses a
    beam that has any. `fmt` formats positions (default: feet and inches).
    """
    fmt = fmt or _fmt_len
    L = length
    tol = 1e-9 * L
    out: list[tuple[str, str]] = []

    def at(obj, what):
        return f"{obj.key}.at" if obj.key else what

    for s in supports:
        if s.at < -tol or s.at > L + tol:
            out.append((at(s, "supports"), f"at {fmt(s.at)} is outside the beam (0 to {fmt(L)})"))
        if s.kind == "hinge" and (s.at <= tol or s.at >= L - tol):
            out.append((at(s, "hinge"), "a hinge at the end of the beam releases nothing; put it "
                        "inside the span or remove it"))
        if s.kind == "spring" and not (s.stiffness > 0 and math.isfinite(s.stiffness)):
            out.append((f"{s.key}.stiffness" if s.key else "spring",
                        "a spring needs a positive stiffness"))
    ordered = list(supports)
    for i, a in enumerate(ordered):
        for b in ordered[i + 1:]:
            if abs(a.at - b.at) > tol:
                continue
            if (a.kind == "hinge") == (b.kind == "hinge"):
                names = " and ".join(x.key or x.kind for x in (a, b))
                out.append((at(b, "supports"), f"{names} are both at {fmt(a.at)}; keep one"))
            elif "fixed" in (a.kind, b.kind):
                fx = a if a.kind == "fixed" else b
                end = fx.at <= tol or fx.at >= L - tol
                out.append((at(b, "hinge"), "a hinge at a fixed support makes it a pin; use "
                            "type = \"pin\"" if end else
                            "a hinge exactly at an interior fixed support is ambiguous (which "
                            "side does the clamp hold?): put the hinge a little to the side "
                            "the clamp does not hold, or make the support a pin"))
    hinges = [s for s in supports if s.kind == "hinge"]
    for ld in loads:
        if ld.kind == "moment" and any(abs(ld.at - h.at) <= tol for h in hinges):
            out.append((at(ld, "couple"), "a couple exactly at a hinge is ambiguous; apply it a "
                        "little to one side"))
        if any(p < -tol or p > L + tol for p in ld.describe_position()):
            out.append((ld.key or "loads", f"lies outside the beam (0 to {fmt(L)})"))
        if ld.kind in ("uniform", "linear") and not ld.end > ld.start:
            out.append((f"{ld.key}.end" if ld.key else "loads", "end must be beyond start"))
    return out


def validate_geometry(beam: Beam) -> list[str]:
    """Problems with the beam's length, stiffness and where its supports, hinges and loads
    sit, as "key: message" lines (empty if none)."""
    L = beam.length
    if not (L > 0 and math.isfinite(L)):
        return ["the beam length must be a positive finite length"]
    out = []
    if not (beam.ei > 0 and math.isfinite(beam.ei)):
        out.append("EI (stiffness of the section) must be positive")
    out += [f"{key}: {msg}" for key, msg in geometry_problems(L, beam.supports, beam.loads)]
    return out


# ------------------------------------------------------------------ marching
def _snap(positions: np.ndarray, L: float) -> np.ndarray:
    """Merge positions closer than SNAP * L (e.g. "4 ft" and "48 in").

    Sorted positions are cut into clusters no wider than SNAP * L, so no position moves
    further than that; each cluster takes the value of its earliest entry (so 0 and L,
    given first, stay exact); a lone position is never moved.
    """
    order = positions.argsort(kind="stable")
    p = positions[order]
    tol = SNAP * L
    starts = np.zeros(p.shape[0], bool)
    if p.size:
        starts[0] = True
        dp = p[1:] - p[:-1]
        wide = dp > tol
        if wide.all():  # every gap wide: nothing to merge, nothing moves
            return positions.copy()
        if not (dp[~wide] != 0).any():
            # only equal positions to merge (a load on a support, the ends given twice): the
            # loop below would start a cluster at exactly the wide gaps
            starts[1:] = wide
        else:
            lead = p[0]
            for i in range(1, p.size):  # a cluster is never wider than tol (no chains)
                if p[i] - lead > tol:
                    starts[i] = True
                    lead = p[i]
    first = starts.nonzero()[0]
    reps = positions[np.minimum.reduceat(order, first)]
    out = np.empty_like(positions)
    out[order] = reps[np.cumsum(starts) - 1]
    return out


def snap_loads(loads, where: dict[float, float]):
    """The loads with their positions moved onto the merged breaks (`where` maps old to new).

    A distributed load keeps its resultant force: over a merged length its intensities are
    scaled by old length / new length, and one whose two ends merge becomes a point load of
    its resultant. So moving a position by at most SNAP * L changes no total force and moves
    no force further than that: the answer changes by about SNAP relative, far below the
    4 significant figures shown and the self-checks' 1e-7.
    """
    from dataclasses import replace

    out = []
    for ld in loads:
        if ld.kind in ("point", "moment"):
            at = where[ld.at]
            # a load that stays where it is is kept as it is (-0.0 and 0.0 are not the same)
            same = at == ld.at and math.copysign(1.0, at) == math.copysign(1.0, ld.at)
            out.append(ld if same else replace(ld, at=at))
            continue
        a, b = where[ld.start], where[ld.end]
        w2 = ld.w1 if ld.kind == "uniform" else ld.w2
        if a == ld.start and b == ld.end:
            out.append(ld)
        elif b > a:
            k = (ld.end - ld.start) / (b - a)
            out.append(replace(ld, start=a, end=b, w1=ld.w1 * k, w2=w2 * k))
        else:  # both ends on one break: its resultant, a point load there
            out.append(replace(ld, kind="point", at=a, value=ld.total_force, start=0.0,
                               end=0.0, w1=0.0, w2=0.0))
    return out


def _taylor(h: np.ndarray) -> np.ndarray:
    """Transfer matrices (P, 6, 6) carrying the state across pieces of length h."""
    t = np.zeros((h.shape[0], _NLEV, _NLEV))
    # level row k gets sum_m state[k - m] h^m / m!, set in one indexed assignment
    t[:, _TK, _TK - _TM] = h[:, None] ** _TM / _FACT[_TM]
    return t


_TK, _TM = (np.array(v) for v in zip(*[(k, m) for k in range(_NLEV) for m in range(k + 1)]))
_FACT = np.array([math.factorial(m) for m in range(_NLEV)], dtype=float)


def _march_many(breaks: np.ndarray, jumps: np.ndarray) -> np.ndarray:
    """`_march` of a stack of beams with as many breaks each: (beams, P + 1, 6, ncol)."""
    n, nb = breaks.shape
    h = np.diff(breaks, axis=1)
    tm = _taylor(h.ravel()).reshape(n, nb - 1, _NLEV, _NLEV)
    states = np.empty_like(jumps)
    s = jumps[:, 0]
    states[:, 0] = s
    for j in range(nb - 1):
        s = tm[:, j] @ s + jumps[:, j + 1]
        states[:, j + 1] = s
    return states


def _march(breaks: np.ndarray, jumps: np.ndarray) -> np.ndarray:
    """States just right of every break: (P + 1, 6, ncol)."""
    h = np.diff(breaks)
    tm = _taylor(h)
    states = np.empty_like(jumps)
    s = jumps[0]
    states[0] = s
    for j in range(len(h)):
        s = tm[j] @ s + jumps[j + 1]
        states[j + 1] = s
    return states


def _piece_coeffs(states: np.ndarray, level: int) -> np.ndarray:
    """Local Taylor coefficients of one level on each piece from right-limit states."""
    k = level + 1  # state index
    return states[:-1, k::-1] / _FACT[: k + 1]  # column m is state[k - m] / m!


EXACT_BUDGET = 4000  # breaks x (unknowns + 1) up to which the exact fallback runs
ILL = 1e10  # condition number past which float rounding could reach 2e-6 of the answer


def solve(beam: Beam, length_fmt=None, exact: bool | None = None,
          candidates: bool = True) -> Solution:
    """Solve the beam. Raises UnstableBeam for rigid-body motion or a mechanism.

    `length_fmt` formats positions in messages (default: feet and inches). The linear system
    is solved in floating point; when it is ill-conditioned (supports or hinges very close
    together for the length, extreme springs) it is solved again in exact rational
    arithmetic, so rounding never decides the answer. `exact=True` forces that path.
    `candidates=False` leaves the extreme candidates to be found on first use (for a
    solution that is only evaluated at points, or whose extremes of one function are read).
    Raises InputError when the answer cannot be computed accurately.
    """
    problems = validate_geometry(beam)
    if problems:

        raise InputError("; ".join(problems))
    # numbers are checked for being finite below; numpy's own warnings would only reach the
    # terminal as noise
    with np.errstate(all="ignore"):
        sol = _solve(beam, length_fmt, exact, candidates)
        bad = not all(np.all(np.isfinite(f.coeffs)) for f in
                      (sol.load, sol.shear, sol.moment, sol.slope, sol.deflection))
        bad = bad or not all(math.isfinite(r.force) and math.isfinite(r.moment)
                             for r in sol.reactions)
    if bad:

        raise InputError("the answer has numbers too large to be real (an overflow): check the "
                         "loads, lengths, stiffnesses and their units")
    return sol


def _unique_inverse(a: np.ndarray) -> tuple[np.ndarray, np.ndarray]:
    """`np.unique(a, return_inverse=True)` of a flat float array, the same steps without its
    wrapper's cost (every solve of a moving-load state sets up its breaks)."""
    perm = a.argsort(kind="quicksort")
    aux = a[perm]
    if not aux.size or np.isnan(aux[-1]):
        return np.unique(a, return_inverse=True)
    mask = np.empty(aux.shape, dtype=bool)
    mask[:1] = True
    np.not_equal(aux[1:], aux[:-1], out=mask[1:])
    inv = np.empty(mask.shape, dtype=np.intp)
    inv[perm] = np.cumsum(mask) - 1
    return aux[mask], inv


def _setup(beam: Beam):
    """The unknowns, breaks and bracket-term jumps of one beam: (unknowns, index, breaks,
    where, t_pow, t_col, t_coef, jumps, sup_break)."""
    L = beam.length
    unknowns = _unknowns(beam)
    nz = len(unknowns)
    index = {id(u): i for i, u in enumerate(unknowns)}
    load_pos = [p for ld in beam.loads for p in ld.describe_position()]
    # (np.minimum / np.maximum: np.clip's values, without its wrapper's cost)
    raw = np.minimum(np.maximum(np.array([0.0, L] + [s.at for s in beam.supports] + load_pos,
                                         float), 0.0), L)
    snapped = _snap(raw, L)
    moved = dict(zip(load_pos, snapped[2 + len(beam.supports):].tolist()))
    terms = load_terms(snap_loads(beam.loads, moved))
    sup_at = dict(zip(range(len(beam.supports)), snapped[2:2 + len(beam.supports)].tolist()))
    t_coef = np.array([t[0] for t in terms] + [u.coef for u in unknowns], dtype=float)
    t_pos = np.array([t[1] for t in terms]
                     + [sup_at[u.support] if u.support >= 0 else u.at for u in unknowns], float)
    t_pow = np.array([t[2] for t in terms] + [u.power for u in unknowns], dtype=int)
    t_col = np.concatenate([np.zeros(len(terms), int), np.arange(1, nz + 1)])
    breaks, where = _unique_inverse(np.concatenate([[0.0, L], t_pos]))
    where = where[2:]
    jumps = np.zeros((len(breaks), _NLEV, nz + 1))
    # each term c<x-a>^n jumps state level -n by c (ramps n = 1 jump q' by c)
    np.add.at(jumps, (where, -t_pow + 1, t_col), t_coef)
    sup_break = {i: int(breaks.searchsorted(x)) for i, x in sup_at.items()}
    return unknowns, index, breaks, where, t_pow, t_col, t_coef, jumps, sup_break


def _system(beam: Beam, unknowns, index, sup_break, states, one, ratio):
    """Rows and right-hand side of the conditions, from the states (float or exact)."""
    rows, rhs = [], []

    def cond(vec):
        rows.append(vec[1:])
        rhs.append(-vec[0])

    ei = beam.ei
    end = states[-1]
    cond(end[_IDX["V"]])  # V(L+) = 0
    cond(end[_IDX["M"]])  # M(L+) = 0
    for u in unknowns:
        if u.kind == "c1" or u.kind == "c2":
            continue
        sup = beam.supports[u.support]
        st = states[sup_break[u.support]]
        if u.kind == "force":
            if sup.kind == "spring":
                vec = st[_IDX["EIu"]] * ratio(sup.stiffness, ei)
                vec[1 + index[id(u)]] += one  # R + k u = 0
                cond(vec)
            else:
                cond(st[_IDX["EIu"]])
        elif u.kind == "moment":
            cond(st[_IDX["EIt"]])
        elif u.kind == "hinge":
            cond(st[_IDX["M"]])
    return rows, rhs


def _equilibrated(a: np.ndarray) -> tuple[np.ndarray, np.ndarray, np.ndarray]:
    """Rows and columns of the system (or of a stack of them) scaled to a largest entry of 1
    (units differ: N, N*m, N*m^2, N*m^3): (scaled matrix, row scales, column scales)."""
    rs = np.max(np.abs(a), axis=-1)
    rs[~(rs > 0)] = 1.0
    a1 = a / rs[..., None]
    cs = np.max(np.abs(a1), axis=-2)
    cs[~(cs > 0)] = 1.0
    return a1 / cs[..., None, :], rs, cs


def _solve(beam: Beam, length_fmt, exact: bool | None, candidates: bool = True) -> Solution:
    L = beam.length
    unknowns, index, breaks, where, t_pow, t_col, t_coef, jumps, sup_break = _setup(beam)
    nz = len(unknowns)
    states = _march(breaks, jumps)

    def system(states, one, ratio):
        return _system(beam, unknowns, index, sup_break, states, one, ratio)

    rows, rhs = system(states, 1.0, lambda k, e: k / e)
    a = np.array(rows)
    b = np.array(rhs)
    # equilibrate rows and columns before solving
    a2, rs, cs = _equilibrated(a)
    try:
        y = np.linalg.solve(a2, b / rs)
        condition = float(np.linalg.cond(a2))
    except np.linalg.LinAlgError:
        y, condition = None, math.inf
    if not math.isfinite(condition) or condition > 1e14:
        # A mechanism or rigid-body motion makes this system singular, and only then is
        # the kinematic check (which says in words what can move) worth its cost.
        why = stability_problem(beam, length_fmt)
        if why:
            raise UnstableBeam(why)
    budget = len(breaks) * (nz + 1) <= EXACT_BUDGET
    if exact or (exact is None and not condition <= ILL):
        if not budget:
            _too_close(beam, L, length_fmt, "")
        final, z = _exact_answer(breaks, where, t_pow, t_col, t_coef, nz, system)
        if final is None:
            raise UnstableBeam("the supports and hinges leave the beam free to move: "
                               "add a support or fix one end")
        return _finish(beam, breaks, final, z, unknowns, condition, True, candidates)
    z = y / cs
    w = np.concatenate([[1.0], z])
    final = states @ w  # (P + 1, 6)
    return _finish(beam, breaks, final, z, unknowns, condition, False, candidates)


def _finite(sol: Solution) -> bool:
    return (all(np.isfinite(f.coeffs).all() for f in
                (sol.load, sol.shear, sol.moment, sol.slope, sol.deflection))
            and all(math.isfinite(r.force) and math.isfinite(r.moment) for r in sol.reactions))


def solve_each(beams, length_fmt=None) -> list[Solution]:
    """`solve(beam, candidates=False)` of each beam, value for value, with the march and the
    linear systems of beams of one shape (the same supports, as many breaks) done in one
    batched pass each (stacked matrix products and LAPACK calls, one per beam inside). Any
    beam the fast path does not settle at once (a problem in its input, an ill-conditioned
    or singular system, an overflow) is solved by `solve` itself, which says what is wrong
    exactly as it would have."""
    beams = list(beams)
    out: list[Solution | None] = [None] * len(beams)
    groups: dict = {}
    for i, beam in enumerate(beams):
        if validate_geometry(beam):
            continue
        with np.errstate(all="ignore"):
            got = _setup(beam)
        key = (id(beam.supports), beam.supports, len(got[2]), beam.length, beam.ei)
        groups.setdefault(key, []).append((i, got))
    for members in groups.values():
        idx = [i for i, _ in members]
        sets = [g for _, g in members]
        with np.errstate(all="ignore"):
            breaks = np.stack([g[2] for g in sets])
            jumps = np.stack([g[7] for g in sets])
            states = _march_many(breaks, jumps)
            a, b = [], []
            for (unknowns, index, _, _, _, _, _, _, sup_break), st, i in zip(sets, states, idx):
                rows, rhs = _system(beams[i], unknowns, index, sup_break, st, 1.0,
                                    lambda k, e: k / e)
                a.append(rows)
                b.append(rhs)
            a2, rs, cs = _equilibrated(np.array(a))
            try:
                y = np.linalg.solve(a2, (np.array(b) / rs)[..., None])[..., 0]
                conds = np.linalg.cond(a2)
            except np.linalg.LinAlgError:
                continue  # each on its own below
            layout = _layout(beams[idx[0]], sets[0][0])  # one set of supports
            for n, i in enumerate(idx):
                condition = float(conds[n])
                if not (math.isfinite(condition) and condition <= ILL):
                    continue
                unknowns, breaks_i = sets[n][0], sets[n][2]
                z = y[n] / cs[n]
                w = np.concatenate([[1.0], z])
                final = states[n] @ w
                sol = _finish(beams[i], breaks_i, final, z, unknowns, condition, False,
                              candidates=False, layout=layout)
                if _finite(sol):
                    out[i] = sol
    for i, sol in enumerate(out):
        if sol is None:
            out[i] = solve(beams[i], length_fmt, candidates=False)
    return out


def solve_many(beam: Beam, cases, length_fmt=None, candidates: bool = True) -> list[Solution]:
    """One solution per load case (a list of loads each) on the same supports, in one pass.

    Every case shares one set of breaks (the positions of all cases), so their piece
    coefficients add term by term (superposition). The cases share one march and one
    factorised system (a right-hand side each). If that system is ill-conditioned each case
    is solved on its own by `solve` (which then answers in exact arithmetic). `beam.loads`
    is ignored. `candidates=False` skips finding the extreme candidates (for solutions that
    are only evaluated at points); they are then found on first use.
    """
    from dataclasses import replace

    from shopbeam.engine.model import Load

    cases = [tuple(c) for c in cases]
    if not cases:
        return []
    everything = tuple(ld for c in cases for ld in c)
    problems = validate_geometry(replace(beam, loads=everything))
    if problems:
        from shopbeam.errors import InputError

        raise InputError("; ".join(problems))
    L, ei = beam.length, beam.ei
    unknowns = _unknowns(beam)
    nz = len(unknowns)
    m = len(cases)
    index = {id(u): i for i, u in enumerate(unknowns)}
    load_pos = [p for ld in everything for p in ld.describe_position()]
    raw = np.minimum(np.maximum(np.array([0.0, L] + [s.at for s in beam.supports] + load_pos,
                                         float), 0.0), L)
    snapped = _snap(raw, L)
    moved = dict(zip(load_pos, snapped[2 + len(beam.supports):].tolist()))
    sup_at = dict(zip(range(len(beam.supports)), snapped[2:2 + len(beam.supports)].tolist()))

    def one_by_one():
        dummies = tuple(Load("point", at=x, value=0.0) for x in sorted(set(load_pos)))
        return [solve(replace(beam, loads=c + dummies), length_fmt) for c in cases]

    terms, cols = [], []
    for c, loads in enumerate(cases):
        tc = load_terms(snap_loads(loads, moved))
        terms += tc
        cols += [c] * len(tc)
    t_coef = np.array([t[0] for t in terms] + [u.coef for u in unknowns], dtype=float)
    t_pos = np.array([t[1] for t in terms]
                     + [sup_at[u.support] if u.support >= 0 else u.at for u in unknowns]
                     + snapped[2 + len(beam.supports):].tolist(), float)
    t_pow = np.array([t[2] for t in terms] + [u.power for u in unknowns], dtype=int)
    t_col = np.concatenate([np.array(cols, dtype=int), np.arange(m, m + nz)])
    # every load position is a break of every case (zero terms keep them), as in one_by_one
    breaks, where = np.unique(np.concatenate([[0.0, L], t_pos]), return_inverse=True)
    where = where[2:2 + len(t_coef)]
    jumps = np.zeros((len(breaks), _NLEV, nz + m))
    np.add.at(jumps, (where, -t_pow + 1, t_col), t_coef)
    with np.errstate(all="ignore"):
        states = _march(breaks, jumps)
    sup_break = {i: int(np.searchsorted(breaks, x)) for i, x in sup_at.items()}
    rows, rhs = [], []

    def cond(vec):
        rows.append(vec[m:])
        rhs.append(-vec[:m])

    end = states[-1]
    cond(end[_IDX["V"]])
    cond(end[_IDX["M"]])
    for u in unknowns:
        if u.kind == "c1" or u.kind == "c2":
            continue
        sup = beam.supports[u.support]
        st = states[sup_break[u.support]]
        if u.kind == "force":
            if sup.kind == "spring":
                vec = st[_IDX["EIu"]] * (sup.stiffness / ei)
                vec[m + index[id(u)]] += 1.0  # R + k u = 0
                cond(vec)
            else:
                cond(st[_IDX["EIu"]])
        elif u.kind == "moment":
            cond(st[_IDX["EIt"]])
        elif u.kind == "hinge":
            cond(st[_IDX["M"]])
    a = np.array(rows)
    b = np.array(rhs)
    rs = np.max(np.abs(a), axis=1)
    rs[~(rs > 0)] = 1.0
    a1 = a / rs[:, None]
    cs = np.max(np.abs(a1), axis=0)
    cs[~(cs > 0)] = 1.0
    a2 = a1 / cs[None, :]
    try:
        with np.errstate(all="ignore"):
            y = np.linalg.solve(a2, b / rs[:, None])
            condition = float(np.linalg.cond(a2))
    except np.linalg.LinAlgError:
        return one_by_one()
    if not condition <= ILL or not np.all(np.isfinite(y)):
        return one_by_one()
    zs = y / cs[:, None]
    out = []
    layout = _layout(beam, unknowns)
    with np.errstate(all="ignore"):
        for c in range(m):
            w = np.zeros(m + nz)
            w[c] = 1.0
            w[m:] = zs[:, c]
            final = states @ w
            if not np.all(np.isfinite(final)):
                return one_by_one()
            out.append(_finish(replace(beam, loads=cases[c]), breaks, final, zs[:, c],
                               unknowns, condition, False, candidates=False, layout=layout))
    if candidates:  # one batched pass for every case
        find_candidates([s.function(n) for s in out
                         for n in ("shear", "moment", "slope", "deflection")])
    return out


def _too_close(beam: Beam, L: float, length_fmt, extra: str):

    fmt = length_fmt or _fmt_len
    xs = sorted(s.at for s in beam.supports)
    gaps = [(b - a, a, b) for a, b in zip(xs, xs[1:]) if b > a]
    near = ""
    if gaps:
        g, a, b = min(gaps)
        near = (f" (the closest are at {fmt(a)} and {fmt(b)}, "
                f"{g / L:.1e} of the length apart)")
    raise InputError("the equations cannot be solved accurately: supports or hinges are "
                     f"far too close together for a beam this long{near}, or the beam is "
                     "on the edge of being a mechanism, and the job is too large to solve in "
                     f"exact arithmetic{extra}. Merge supports that close, move them apart, "
                     "or check the supports and hinges")


def _exact_answer(breaks, where, t_pow, t_col, t_coef, nz, system):
    """The march and the linear system in exact rational arithmetic (Python fractions) on
    exactly the floats the float path sees: (final states as floats, unknowns) or
    (None, None) when the system is singular."""
    zero = Fraction(0)
    jumps = np.full((len(breaks), _NLEV, nz + 1), zero, dtype=object)
    for w_, lev, col, c in zip(where.tolist(), (-t_pow + 1).tolist(), t_col.tolist(),
                               t_coef.tolist()):
        jumps[w_, lev, col] += Fraction(c)
    fb = [Fraction(x) for x in breaks.tolist()]
    states = np.empty_like(jumps)
    s = jumps[0].copy()
    states[0] = s
    for j in range(len(fb) - 1):
        h = fb[j + 1] - fb[j]
        hp = [Fraction(1)]
        for m in range(1, _NLEV):
            hp.append(hp[-1] * h / m)
        new = np.empty_like(s)
        for k in range(_NLEV):  # level k gets sum_m state[k - m] h^m / m!
            acc = s[k].copy()
            for m in range(1, k + 1):
                if any(v for v in s[k - m]):
                    acc = acc + s[k - m] * hp[m]
            new[k] = acc
        s = new + jumps[j + 1]
        states[j + 1] = s
    rows, rhs = system(states, Fraction(1), lambda k, e: Fraction(k) / Fraction(e))
    z = _gauss_exact([list(r) for r in rows], list(rhs))
    if z is None:
        return None, None
    w = np.array([Fraction(1)] + z, dtype=object)
    final = np.array((states @ w).tolist(), dtype=float)
    return final, np.array([float(v) for v in z])


def _gauss_exact(a: list[list[Fraction]], b: list[Fraction]) -> list[Fraction] | None:
    n = len(b)
    m = [row + [b[i]] for i, row in enumerate(a)]
    for c in range(n):
        p = next((i for i in range(c, n) if m[i][c] != 0), None)
        if p is None:
            return None
        m[c], m[p] = m[p], m[c]
        piv = m[c][c]
        for i in range(c + 1, n):
            if m[i][c] != 0:
                f = m[i][c] / piv
                m[i] = [x - f * y for x, y in zip(m[i], m[c])]
    z = [Fraction(0)] * n
    for i in range(n - 1, -1, -1):
        z[i] = (m[i][n] - sum(m[i][j] * z[j] for j in range(i + 1, n))) / m[i][i]
    return z


def _layout(beam, unknowns):
    """Where each reaction, hinge rotation and integration constant sits among the unknowns:
    (reactions in order of position as (support, force index, moment index), hinges as (at,
    index), c1 index, c2 index). The same for every load case on one set of supports."""
    force, moment = {}, {}
    hinges = []
    for i, u in enumerate(unknowns):
        if u.kind == "force":
            force[u.support] = i
        elif u.kind == "moment":
            moment[u.support] = i
        elif u.kind == "hinge":
            hinges.append((u.at, i))
    rows = [(s, force.get(i), moment.get(i)) for i, s in enumerate(beam.supports)
            if s.kind != "hinge"]
    rows.sort(key=lambda r: r[0].at)  # stable: as the reactions were sorted
    c1 = [i for i, u in enumerate(unknowns) if u.kind == "c1"][0]
    c2 = [i for i, u in enumerate(unknowns) if u.kind == "c2"][0]
    return rows, hinges, c1, c2


def _finish(beam, breaks, final, z, unknowns, condition, exact, candidates=True,
            layout=None) -> Solution:
    ei = beam.ei

    def pw(level: int, scale: float = 1.0) -> Piecewise:
        return Piecewise(breaks, _piece_coeffs(final, level) * scale)

    rows, hinges, i1, i2 = layout or _layout(beam, unknowns)
    zl = np.asarray(z, float).tolist()
    reactions = tuple(Reaction(s.at, s.kind, 0.0 if fi is None else zl[fi],
                               0.0 if mi is None else zl[mi], s.key) for s, fi, mi in rows)
    hinge_rot = tuple((at, zl[i] / ei) for at, i in hinges)
    funcs = dict(shear=pw(1), moment=pw(2), slope=pw(3, 1.0 / ei), deflection=pw(4, 1.0 / ei))
    if candidates:
        find_candidates(list(funcs.values()))  # every renderer and check asks for extremes
    return Solution(
        beam=beam,
        reactions=reactions,
        hinge_rotations=hinge_rot,
        ei_slope_0=zl[i1],
        ei_deflection_0=zl[i2],
        load=pw(0),
        condition=condition,
        exact=exact,
        **funcs,
    )


def sound_solve(beam, length_fmt=None, file: str = "") -> Solution:
    """`solve`, but never an answer whose exact self-checks fail: such a solve is done again
    in exact arithmetic, and if that fails too (or the job is too large for it) the job is
    refused with what to change (InputError naming the file)."""
    sol = solve(beam, length_fmt)
    bad = failed_checks(sol)
    if bad and not sol.exact:
        try:
            sol = solve(beam, length_fmt, exact=True)
            bad = failed_checks(sol)
        except InputError:
            pass
    if bad:
        what = "; ".join(f"{d.name}: {d.detail}" for d in bad)
        raise InputError(
            f"the answer failed its self-check ({what}), so it is not given. Look for loads, "
            "supports or hinges very close together, or lengths, loads and stiffnesses many "
            "orders of magnitude apart, and merge, move or correct them", key="supports",
            file=file)
    return sol
