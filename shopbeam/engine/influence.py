"""Exact influence lines and the worst positions of a moving set of point loads.

For a solved (linear) beam the response at x to a unit upward point load at a is, between
the breaks of the bare beam (ends, supports, springs, hinges) and on either side of x = a, a
polynomial in (x, a): the unknowns of the solve (support forces and moments, hinge rotation
jumps, the two integration constants) are cubic in a on each piece of the bare beam (the
right-hand side of the linear system is cubic in a there, the matrix does not depend on a),
and each unknown adds a bracket term <x - s>^n. `Influence` holds those cubic coefficients,
found from unit solves at four positions per piece (a cubic through four points is the cubic
itself: nothing is fitted), and the bracket terms in x in closed form, so

    Q(x, a) = sum_u Phi_u(x) Z_u(a) + [x > a] (x - a)^n / n!

is known exactly for shear (n = 0), moment (1), EI slope (2) and EI deflection (3).

A wheel set (loads P_i at offsets d_i) with its first wheel at p adds sum_i P_i Q(x, p + d_i)
to a static response S(x). Over the plane (x, p) that sum is one polynomial on each cell
bounded by two neighbouring lines (a fixed break: support, load edge, region end; or a
wheel) over the p-range on which they are neighbours (`wheel_cells`). The largest and smallest
value of a quantity over a region of x and the whole travel is therefore at a cell corner, at
a stationary point along a cell edge (x at a fixed break: a cubic in p; x under a wheel; p at
a break: a polynomial in x), or at an interior point where both partial derivatives vanish
(the common roots of two polynomials: the real roots of their resultant in p, then x from
the x-derivative at that p). Every candidate is evaluated exactly; none is sampled.

The cost is proportional to the number of cells, each built in a fixed number of operations
(`cell_polys`: the unknowns once per strip, the wheels left of a cell from running sums).
A wheel crossing a support, spring or hinge changes the response at every x, so the travel
is cut into strips there: (wheels x interior supports + 1) strips. On a strip the cells are
the fixed breaks + wheels + the crossings of a wheel over a fixed break inside it. So the
work is linear in wheels where no wheel crosses an interior support within its travel (a
simple span, a cantilever), and about wheels x interior supports x (wheels + fixed breaks)
where wheels do cross them (the response then really is a different polynomial on each of
those cells).
"""

from __future__ import annotations

import math
from dataclasses import dataclass, replace

import numpy as np

from shopbeam.engine.model import Beam, Load
from shopbeam.engine.piecewise import Piecewise, _horner, _roots_in_pieces, unique

LEVELS = {"shear": 1, "moment": 2, "slope": 3, "deflection": 4}
NU = 6  # coefficients in x (static deflection of a linear load is degree 5)
NV = 4  # coefficients in p (the unknowns are cubic in the load position)
_FACT = [math.factorial(i) for i in range(12)]
_BINOM = np.array([[math.comb(i, j) for j in range(12)] for i in range(12)], float)


@dataclass(frozen=True)
class Influence:
    """The unit-load unknowns of a bare beam as cubics in the load position, per piece."""

    beam: Beam
    breaks: np.ndarray  # ends, supports, springs, hinges (sorted, unique)
    z: np.ndarray  # (pieces, 4, unknowns): coefficients in tau = a - breaks[m]
    kind: np.ndarray  # per unknown: 0 force, 1 moment, 2 hinge, 3 c1, 4 c2
    at: np.ndarray  # per unknown: where it acts
    reaction_cols: tuple[int, ...]  # the force unknown of each reaction (solution order)

    # ------------------------------------------------------------------ x side
    def phi(self, level: int) -> np.ndarray:
        """(pieces, NU, unknowns): each unknown's term at `level` on each piece of x, in
        t = x - breaks[k] (its bracket is on where the unknown acts at or left of the piece)."""
        cache = self.__dict__.setdefault("_phi", {})
        if level in cache:
            return cache[level]
        b = self.breaks
        npc = len(b) - 1
        nu = len(self.kind)
        out = np.zeros((npc, NU, nu))
        # power of (x - s) of each unknown kind at this level: force level-1, moment
        # level-2, hinge and c1 level-3, c2 level-4 (negative: no term)
        base = np.array([level - 1, level - 2, level - 3, level - 3, level - 4])[self.kind]
        sign = np.where(self.kind == 1, -1.0, 1.0)  # a reaction couple steps M down
        tol = 1e-12 * b[-1]
        for u in range(nu):
            n = int(base[u])
            if n < 0:
                continue
            on = self.at[u] <= b[:-1] + tol
            d = b[:-1] - self.at[u]
            for i in range(n + 1):  # (t + d)^n / n!
                out[:, i, u] = np.where(on, sign[u] * _BINOM[n, i] * d ** (n - i) / _FACT[n], 0.0)
        cache[level] = out
        return out

    def bicubic(self, level: int) -> np.ndarray:
        """(x pieces, a pieces, NU, NV): sum over unknowns of Phi_u(t) Z_u(tau)."""
        cache = self.__dict__.setdefault("_bic", {})
        if level not in cache:
            cache[level] = np.einsum("kiu,mju->kmij", self.phi(level), self.z)
        return cache[level]

    def value(self, name: str, x: float, a: float, side: str = "right") -> float:
        """Q(x, a) for a unit upward load at a (test and oracle use)."""
        level = LEVELS[name]
        b = self.breaks
        tol = 2.5e-10 * b[-1]
        k = int(np.clip((b.searchsorted(x + tol, "right") if side == "right"
                         else b.searchsorted(x - tol, "left")) - 1, 0, len(b) - 2))
        m = int(np.clip(b.searchsorted(a, "right") - 1, 0, len(b) - 2))
        c = self.bicubic(level)[k, m]
        t, tau = x - b[k], a - b[m]
        v = float(sum(c[i, j] * t**i * tau**j for i in range(NU) for j in range(NV)))
        n = level - 1
        right = x > a + tol or (abs(x - a) <= tol and side == "right")
        if right:
            v += (x - a) ** n / _FACT[n]
        return v / (self.beam.ei if level >= 3 else 1.0)


def influence(beam: Beam) -> Influence:
    """The exact influence data of the bare beam (its loads are ignored)."""
    from shopbeam.engine.solver import solve_many

    L = beam.length
    sup = sorted(beam.supports, key=lambda s: s.at)
    b = unique(np.array([0.0, L] + [s.at for s in sup]))
    npc = len(b) - 1
    h = np.diff(b)
    frac = np.array([0.0, 1 / 3, 2 / 3, 1.0])
    nodes = b[:-1, None] + h[:, None] * frac[None, :]  # (pieces, 4), ends shared
    flat = unique(nodes)
    empty = replace(beam, loads=())
    sols = solve_many(empty, [(Load("point", at=float(a), value=1.0),) for a in flat],
                      candidates=False)
    # the unknowns as the solution reports them
    kinds, ats, cols = [], [], []
    s0 = sols[0]
    for r in s0.reactions:
        cols.append(len(kinds))
        kinds.append(0)
        ats.append(r.at)
        if r.kind == "fixed":
            kinds.append(1)
            ats.append(r.at)
    for h_at, _ in s0.hinge_rotations:
        kinds.append(2)
        ats.append(h_at)
    kinds += [3, 4]
    ats += [0.0, 0.0]

    def zvec(s):
        out = []
        for r in s.reactions:
            out.append(r.force)
            if r.kind == "fixed":
                out.append(r.moment)
        out += [rot * beam.ei for _, rot in s.hinge_rotations]
        out += [s.ei_slope_0, s.ei_deflection_0]
        return out

    zs = np.array([zvec(s) for s in sols])  # (nodes, unknowns)
    idx = np.searchsorted(flat, nodes)
    vals = zs[idx]  # (pieces, 4, unknowns)
    # the cubic through the four values, in tau / h, then in tau
    vinv = np.linalg.inv(frac[:, None] ** np.arange(4)[None, :])
    cz = np.einsum("jn,mnu->mju", vinv, vals)
    cz = cz / (h[:, None, None] ** np.arange(4)[None, :, None])
    return Influence(beam, b, cz, np.array(kinds), np.array(ats, float), tuple(cols))


# ------------------------------------------------------------------ polynomial helpers
def _shift_matrix(d: np.ndarray, n: int) -> np.ndarray:
    """(N, n, n): row i' -> column i of (s + d)^i' expanded in s."""
    i = np.arange(n)
    expo = i[:, None] - i[None, :]
    mask = expo >= 0
    with np.errstate(all="ignore"):
        pw = np.asarray(d, float)[:, None] ** i[None, :]  # each power once, then placed
    p = np.where(mask[None], pw[:, np.where(mask, expo, 0)], 0.0)
    return p * _BINOM[:n, :n][None]


def _compose(F: np.ndarray, alpha: np.ndarray, beta: np.ndarray) -> np.ndarray:
    """Coefficients in v of F(alpha + beta v, v) (F: (N, NU, NV))."""
    n = F.shape[0]
    T = np.zeros((n, NU, NU))  # (alpha + beta v)^i -> v^l
    for i in range(NU):
        for l_ in range(i + 1):
            T[:, i, l_] = _BINOM[i, l_] * alpha ** (i - l_) * beta**l_
    g = np.zeros((n, NU + NV - 1))
    for j in range(NV):
        g[:, j:j + NU] += (F[:, None, :, j] @ T)[:, 0]
    return g


def _eval2d(F: np.ndarray, u: np.ndarray, v: np.ndarray) -> np.ndarray:
    """F[c] at (u[c], v[c]): Horner in u for every power of v at once, then in v (the same
    operations, value for value, as one Horner pass in u per column)."""
    uc = u[:, None]
    cols = F[:, -1, :] + 0.0 * uc
    for m in range(F.shape[1] - 2, -1, -1):
        cols = cols * uc + F[:, m, :]
    return _horner(cols, v)


def _eval2d_many(F: np.ndarray, u: np.ndarray, v: np.ndarray) -> np.ndarray:
    """(N, k): each of k polynomials F[c, i] (N, k, NU', NV') at (u[c], v[c]), as `_eval2d`
    of each (zero high powers, where one is padded to the others' size, change nothing)."""
    uc = u[:, None, None]
    cols = F[:, :, -1, :] + 0.0 * uc
    for m in range(F.shape[2] - 2, -1, -1):
        cols = cols * uc + F[:, :, m, :]
    vc = v[:, None]
    out = cols[:, :, -1] + 0.0 * vc
    for m in range(cols.shape[2] - 2, -1, -1):
        out = out * vc + cols[:, :, m]
    return out


def _colleague_roots(c: np.ndarray) -> tuple[np.ndarray, np.ndarray]:
    """Real roots in [-1, 1] of rows of Chebyshev series: (row, root)."""
    n, w = c.shape
    top = np.abs(c).max(axis=1)
    rel = np.abs(c) > 1e-11 * top[:, None]
    deg = np.where(top > 0, w - 1 - np.argmax(rel[:, ::-1], axis=1), 0)
    rows_out, r_out = [], []
    for d in sorted(set(deg.tolist())):
        if d < 1:
            continue
        sel = np.flatnonzero(deg == d)
        cc = c[sel, : d + 1]
        if d == 1:
            r = -cc[:, 0] / cc[:, 1]
            ok = (r >= -1.0) & (r <= 1.0)
            rows_out.append(sel[ok])
            r_out.append(r[ok])
            continue
        mat = np.zeros((len(sel), d, d))
        scl = np.array([1.0] + [math.sqrt(0.5)] * (d - 1))
        sup = np.full(d - 1, 0.5)
        sup[0] = math.sqrt(0.5)
        ar = np.arange(d - 1)
        mat[:, ar, ar + 1] = sup
        mat[:, ar + 1, ar] = sup
        mat[:, :, -1] -= (cc[:, :-1] / cc[:, -1:]) * (scl / scl[-1])[None, :] * 0.5
        with np.errstate(all="ignore"):
            eig = np.linalg.eigvals(mat)
        real = np.abs(eig.imag) <= 1e-6
        rr = np.repeat(sel, d).reshape(len(sel), d)
        ok = real & (eig.real >= -1 - 1e-9) & (eig.real <= 1 + 1e-9) & np.isfinite(eig.real)
        rows_out.append(rr[ok])
        r_out.append(np.clip(eig.real[ok], -1.0, 1.0))
    if not rows_out:
        return np.zeros(0, int), np.zeros(0)
    return np.concatenate(rows_out), np.concatenate(r_out)


# ------------------------------------------------------------------ cells
@dataclass(frozen=True)
class Cells:
    """The cells of the (x, p) plane for one wheel set on one beam (see module doc): each
    a trapezoid between two lines that stay next to each other (fixed breaks: x constant;
    wheels: x = p + offset) over the cell's own p-range, inside one strip of the travel on
    which no wheel crosses a break of the bare beam."""

    p0: np.ndarray  # (C,) start of the cell's p-range
    wp: np.ndarray  # its width (0 for a travel of one position)
    lo_fixed: np.ndarray  # bool: the cell's left side is a fixed break (else a wheel)
    lo_idx: np.ndarray  # index into xs or wheels
    hi_fixed: np.ndarray
    hi_idx: np.ndarray
    xr: np.ndarray  # x of the left side at p0 (the cell's origin in x)
    wu: np.ndarray  # the cell's largest width in x
    k: np.ndarray  # piece of the bare beam holding the cell
    strip: np.ndarray  # (C,) the strip of the travel holding the cell
    nleft: np.ndarray  # (C,) how many wheels are left of the cell (the first nleft)
    strip_p0: np.ndarray  # (S,) start of each strip
    strip_m: np.ndarray  # (S, wheels): piece of the bare beam under each wheel on the strip
    xs: np.ndarray  # the fixed breaks
    offsets: np.ndarray


def _ragged(lo: np.ndarray, hi: np.ndarray) -> tuple[np.ndarray, np.ndarray]:
    """(owner, value) of every integer value in [lo[j], hi[j]) for each j."""
    n = np.maximum(hi - lo, 0)
    owner = np.repeat(np.arange(len(lo)), n)
    start = np.cumsum(n) - n
    return owner, lo[owner] + np.arange(int(n.sum())) - start[owner]


def _strips(breaks: np.ndarray, d: np.ndarray, p_lo: float, p_hi: float, tol: float):
    """The first-wheel positions where some wheel crosses a break of the bare beam (where
    the influence data under that wheel changes for every x), with the ends of the travel."""
    pb = (breaks[:, None] - d[None, :]).ravel()
    pb = unique(np.concatenate([[p_lo, p_hi], pb[(pb > p_lo + tol) & (pb < p_hi - tol)]]))
    if len(pb) > 1:
        keep = np.concatenate([[True], np.diff(pb) > tol])
        pb = pb[keep]
        pb[-1] = p_hi
    return pb


def wheel_cells(inf: Influence, xs, offsets, p_lo: float, p_hi: float) -> Cells:
    """The cells of the (x, p) plane: on each strip of the travel (no wheel crosses a bare
    beam break inside it) the trapezoids between neighbouring lines, each over the whole
    p-range on which its two lines are neighbours. Lines are the fixed breaks xs (with the
    bare beam's) and the wheels; a wheel crossing a fixed break that is not a break of the
    bare beam (a load edge, a brace) ends only the cells that touch the crossing, so a
    strip holds (fixed breaks + wheels + crossings) cells: linear in wheels and in fixed
    breaks. Only a wheel crossing a support, spring or hinge starts a new strip."""
    L = inf.beam.length
    tol = 1e-11 * L
    xs = unique(np.concatenate([np.asarray(xs, float), inf.breaks]))
    xs = xs[(xs >= -tol) & (xs <= L + tol)]
    d = np.asarray(offsets, float)
    nx, nw = len(xs), len(d)
    b = inf.breaks
    pb = _strips(b, d, p_lo, p_hi, tol)
    if len(pb) == 1:  # a travel of one position: the lines in order at that position
        return _cells_at(inf, xs, d, float(pb[0]))
    P0, P1 = pb[:-1], pb[1:]
    S = len(P0)
    big = 4.0 * (L + abs(p_lo) + abs(p_hi)) + 1.0
    dm = np.concatenate([[-big], d, [big]])  # d[-1] = -inf, d[nw] = +inf, shifted by one
    xm = np.concatenate([[-big], xs, [big]])
    blocks = []  # (strip, lo_fixed, lo_idx, hi_fixed, hi_idx, pa, pb)

    def add(s, lo_f, lo_i, hi_f, hi_i, a, z):
        a = np.maximum(a, P0[s])
        z = np.minimum(z, P1[s])
        ok = z - a > tol
        n = int(ok.sum())
        if n:
            blocks.append((s[ok], np.full(n, lo_f), lo_i[ok], np.full(n, hi_f), hi_i[ok],
                           a[ok], z[ok]))

    sf = np.arange(S)[:, None]
    # fixed f, then wheel i (f < nx - 1): p in (x_f - d_i, min(x_f+1 - d_i, x_f - d_i-1))
    f = np.arange(nx - 1)[None, :]
    ia = np.searchsorted(d, xs[f] - P1[:, None], "right") - 1
    ib = np.searchsorted(d, xs[f] - P0[:, None], "left") + 1
    own, i = _ragged(np.clip(ia, 0, nw).ravel(), np.clip(ib + 1, 0, nw).ravel())
    s, ff = own // (nx - 1), own % (nx - 1)
    add(s, True, ff, False, i, xs[ff] - d[i], np.minimum(xs[ff + 1] - d[i], xs[ff] - dm[i]))
    # wheel i, then fixed f (f > 0): p in (max(x_f-1 - d_i, x_f - d_i+1), x_f - d_i)
    f = np.arange(1, nx)[None, :]
    ia = np.searchsorted(d, xs[f] - P1[:, None], "right") - 2
    ib = np.searchsorted(d, xs[f] - P0[:, None], "left") + 1
    own, i = _ragged(np.clip(ia, 0, nw).ravel(), np.clip(ib, 0, nw).ravel())
    s, ff = own // (nx - 1), own % (nx - 1) + 1
    add(s, False, i, True, ff, np.maximum(xs[ff - 1] - d[i], xs[ff] - dm[i + 2]), xs[ff] - d[i])
    # fixed f, then fixed f + 1 (no wheel between): p in (x_f+1 - d_i+1, x_f - d_i), i = -1..
    f = np.arange(nx - 1)[None, :]
    ia = np.searchsorted(d, xs[f + 1] - P1[:, None], "right") - 2
    ib = np.searchsorted(d, xs[f] - P0[:, None], "left") + 1
    own, i = _ragged(np.clip(ia, -1, nw).ravel() + 1, np.clip(ib, -1, nw).ravel() + 1)
    i = i - 1
    s, ff = own // (nx - 1), own % (nx - 1)
    add(s, True, ff, True, ff + 1, xs[ff + 1] - dm[i + 2], xs[ff] - dm[i + 1])
    # wheel i, then wheel i + 1 (no fixed break between): p in (x_f - d_i, x_f+1 - d_i+1)
    if nw > 1:
        i = np.arange(nw - 1)[None, :]
        fa = np.searchsorted(xs, P0[:, None] + d[i + 1], "right") - 2
        fb = np.searchsorted(xs, P1[:, None] + d[i], "left") + 1
        own, f = _ragged(np.clip(fa, -1, nx).ravel() + 1, np.clip(fb, -1, nx).ravel() + 1)
        f = f - 1
        s, ii = own // (nw - 1), own % (nw - 1)
        add(s, False, ii, False, ii + 1, xm[f + 1] - d[ii], xm[f + 2] - d[ii + 1])
    s, lo_f, lo_i, hi_f, hi_i, pa, pz = (np.concatenate(c) for c in zip(*blocks))
    order = np.lexsort((pa, np.where(lo_f, xs[np.where(lo_f, lo_i, 0)], pa + d[np.where(
        lo_f, 0, lo_i)] if nw else 0.0), s))
    s, lo_f, lo_i, hi_f, hi_i, pa, pz = (a[order] for a in (s, lo_f, lo_i, hi_f, hi_i, pa, pz))
    m = np.clip(np.searchsorted(b, 0.5 * (P0 + P1)[:, None] + d[None, :], "right") - 1,
                0, len(b) - 2)
    return _finish(inf, xs, d, s, lo_f, lo_i, hi_f, hi_i, pa, pz - pa, P0, m)


def _finish(inf, xs, d, s, lo_f, lo_i, hi_f, hi_i, p0, wp, strip_p0, strip_m) -> Cells:
    L = inf.beam.length
    tol = 1e-11 * L
    nw = len(d)

    def at(fixed, idx, p):
        return np.where(fixed, xs[np.where(fixed, idx, 0)],
                        p + (d[np.where(fixed, 0, idx)] if nw else 0.0))

    xr = at(lo_f, lo_i, p0)
    wu = np.maximum(at(hi_f, hi_i, p0), at(hi_f, hi_i, p0 + wp)) - xr
    wu = np.where(wu > 0, wu, tol)  # the cell lies in 0 <= u <= 1 (sides move right)
    pm = p0 + 0.5 * wp
    xm = 0.5 * (at(lo_f, lo_i, pm) + at(hi_f, hi_i, pm))
    b = inf.breaks
    k = np.clip(np.searchsorted(b, xm, "right") - 1, 0, len(b) - 2)
    nleft = np.searchsorted(d, xm - pm, "left") if nw else np.zeros(len(xm), int)
    return Cells(p0, wp, lo_f, lo_i, hi_f, hi_i, xr, wu, k, s, nleft, np.asarray(strip_p0, float),
                 strip_m, xs, d)


def _cells_at(inf: Influence, xs, d, p: float) -> Cells:
    """The cells of a travel of one position p (zero width in p)."""
    L = inf.beam.length
    tol = 1e-11 * L
    nx, nw = len(xs), len(d)
    pos = np.concatenate([xs, p + d])
    order = np.argsort(pos, kind="stable")
    spos = pos[order]
    fixed = order < nx
    idx = np.where(fixed, order, order - nx)
    xm = 0.5 * (spos[:-1] + spos[1:])
    ok = (np.diff(spos) > tol) & (xm > 0) & (xm < L)
    n = int(ok.sum())
    b = inf.breaks
    m = np.clip(np.searchsorted(b, p + d, "right") - 1, 0, len(b) - 2)[None, :]
    return _finish(inf, xs, d, np.zeros(n, int), fixed[:-1][ok], idx[:-1][ok], fixed[1:][ok],
                   idx[1:][ok], np.full(n, p), np.zeros(n), [p], m)


def _tail_moments(loads: np.ndarray, d: np.ndarray, n: int) -> np.ndarray:
    """(wheels + 1, n + 1): R[j, q] = sum over i < j of P_i (d_j-1 - d_i)^q, found by a scan
    (each term shifted by the gap to the next wheel: no cancellation between far wheels)."""
    nw = len(d)
    R = np.zeros((nw + 1, n + 1))
    row = [0.0] * (n + 1)
    for j in range(nw):
        if j:
            g = d[j] - d[j - 1]
            row = [sum(_BINOM[q, r] * g ** (q - r) * row[r] for r in range(q + 1))
                   for q in range(n + 1)]
        row[0] += loads[j]
        R[j + 1] = row
    return R


def strip_unknowns(inf: Influence, cells: Cells, loads) -> np.ndarray:
    """(strips, NV, unknowns): every unknown of the solve under the wheel set (forces +
    up) as a cubic in p - strip start, on each strip (the sum over wheels of each wheel's
    cubic, shifted to the strip's start)."""
    Z = np.zeros((len(cells.strip_p0), NV, inf.z.shape[2]))
    shifts = _geometry(inf, cells)["wheels"]
    for i, P in enumerate(loads):
        if P == 0:
            continue
        mi, SvT = shifts[i]
        Z += P * (SvT @ inf.z[mi])
    return Z


def _geometry(inf: Influence, cells: Cells) -> dict:
    """What `cell_polys` and `strip_unknowns` read of the cells and the bare beam alone (no
    loads): the same arrays for every quantity, load combination and factor, so worked out
    once per (cells, influence) and kept on the cells."""
    kept = cells.__dict__.setdefault("_geometry", {})
    got = kept.get(id(inf))
    if got is not None and got[0] is inf:
        return got[1]
    b = inf.breaks
    m = cells.strip_m
    wheels = []
    for i in range(m.shape[1]):
        mi = m[:, i]
        wheels.append((mi, np.swapaxes(_shift_matrix(cells.strip_p0 + cells.offsets[i] - b[mi],
                                                     NV), 1, 2)))
    ns = len(cells.strip_p0)
    pair = cells.k * ns + cells.strip
    order = np.argsort(pair, kind="stable")
    first = np.ones(len(pair), bool)
    first[1:] = pair[order][1:] != pair[order][:-1]
    inv = np.empty(len(pair), int)
    inv[order] = np.cumsum(first) - 1
    geo = {"wheels": wheels, "ns": ns, "keys": pair[order][first], "inv": inv,
           "SxT": np.swapaxes(_shift_matrix(cells.xr - b[cells.k], NU), 1, 2),
           "Sv": _shift_matrix(cells.p0 - cells.strip_p0[cells.strip], NV)}
    kept[id(inf)] = (inf, geo)  # the influence kept too: an id is not reused while held
    return geo


def cell_polys(inf: Influence, cells: Cells, name: str, static: Piecewise | None,
               loads) -> np.ndarray:
    """(C, NU, NV): the quantity on each cell as a polynomial in (u, v), u = (x - xr) / wu,
    v = (p - p0) / wp (v = 0 on a cell of zero width).

    On a cell Q(x, p) = S(x) + sum_u Phi_u(x) Z_u(p) + T(x - p): the static response, the
    unknowns of the solve under the wheel set (one cubic per strip, `strip_unknowns`) times
    their bracket terms, and the free-body part of the wheels left of the cell, T(y) =
    sum over those wheels of P_i (y - d_i)^n / n!. Each part is built once per strip or
    cell, so the work is linear in cells and wheels, not their product."""
    level = LEVELS[name]
    n = len(cells.p0)
    F = np.zeros((n, NU, NV))
    u0 = cells.xr
    loads = np.asarray(loads, float)
    if level >= 3:  # slope and deflection: the unknowns and brackets are EI times them
        loads = loads / inf.beam.ei
    if static is not None:
        sb = static.breaks
        xin = np.minimum(cells.xr + 1e-9 * cells.wu, sb[-1])  # the static piece of the cell
        j = np.clip(np.searchsorted(sb, xin, "right") - 1, 0, len(sb) - 2)
        c = static.coeffs[j]
        w = c.shape[1]
        S = _shift_matrix(u0 - sb[j], w)
        F[:, :w, 0] += (c[:, None, :] @ S)[:, 0]
    if not np.any(loads):
        F[cells.wp <= 0, :, 1:] = 0.0
        return _to_unit(F, cells)
    Z = strip_unknowns(inf, cells, loads)  # (strips, NV, unknowns)
    phi = inf.phi(level)  # (pieces, NU, unknowns)
    # Phi_k(t) Z_s(sigma) once per (piece, strip) pair, then shifted to each cell's origin
    geo = _geometry(inf, cells)
    ns, keys = geo["ns"], geo["keys"]
    C = np.einsum("kiu,kju->kij", phi[keys // ns], Z[keys % ns])[geo["inv"]]
    F += geo["SxT"] @ (C @ geo["Sv"])
    # the wheels left of the cell: T(y0 + s), y0 = xr - p0, s = (x - xr) - (p - p0)
    npow = level - 1
    j = cells.nleft
    has = j > 0
    if has.any():
        R = _tail_moments(loads, cells.offsets, npow)[j]  # about wheel j - 1
        e = np.where(has, cells.xr - cells.p0 - cells.offsets[np.maximum(j - 1, 0)], 0.0)
        # A_q = sum_i<j P_i (y0 - d_i)^q = sum_r C(q, r) e^(q - r) R_r (all terms >= 0
        # for loads of one sign)
        A = np.zeros((n, npow + 1))
        for q in range(npow + 1):
            for r in range(q + 1):
                A[:, q] += _BINOM[q, r] * e ** (q - r) * R[:, r]
        # T = sum_a A_(n-a) s^a / (a! (n-a)!), s^a = sum_c C(a, c) U^c (-V)^(a-c)
        for a in range(npow + 1):
            coef = A[:, npow - a] / (_FACT[a] * _FACT[npow - a])
            for c_ in range(a + 1):
                F[:, c_, a - c_] += coef * _BINOM[a, c_] * (-1.0) ** (a - c_)
    F[cells.wp <= 0, :, 1:] = 0.0  # a travel of one position: nothing depends on p
    return _to_unit(F, cells)


def _to_unit(F: np.ndarray, cells: Cells) -> np.ndarray:
    su = cells.wu[:, None] ** np.arange(NU)[None, :]
    sv = np.where(cells.wp > 0, cells.wp, 1.0)[:, None] ** np.arange(NV)[None, :]
    F *= su[:, :, None]
    F *= sv[:, None, :]
    return F


@dataclass(frozen=True)
class Candidates:
    """Every candidate extreme of one quantity: value, x, p, cell, and the wheel under
    which it lies (-1 if not on a wheel line)."""

    value: np.ndarray
    x: np.ndarray
    p: np.ndarray
    cell: np.ndarray
    wheel: np.ndarray


def _bounds(cells: Cells):
    """u of the cell's sides as alpha + beta v."""
    wu = cells.wu
    wp = cells.wp
    xs, d = cells.xs, cells.offsets
    nw = len(d)

    def side(fixed, idx):
        x0 = np.where(fixed, xs[np.where(fixed, idx, 0)],
                      cells.p0 + (d[np.where(fixed, 0, idx)] if nw else 0.0))
        alpha = (x0 - cells.xr) / wu
        beta = np.where(fixed, 0.0, wp / wu)
        return alpha, beta

    return side(cells.lo_fixed, cells.lo_idx), side(cells.hi_fixed, cells.hi_idx)


def _bernstein_matrix(n: int) -> np.ndarray:
    """Power-to-Bernstein coefficients on [0, 1] for degree n - 1: b = M @ a."""
    d = n - 1
    M = np.zeros((n, n))
    for k in range(n):
        for i in range(k + 1):
            M[k, i] = math.comb(k, i) / math.comb(d, i)
    return M


_MU, _MV = _bernstein_matrix(NU), _bernstein_matrix(NV)


def cell_groups(cells: Cells, regions) -> np.ndarray:
    """The region (index into `regions`, (start, end) of x) each cell lies in."""
    (al, bl), (ah, bh) = _bounds(cells)
    xm = cells.xr + cells.wu * 0.5 * (al + ah + 0.5 * (bl + bh))
    g = np.full(len(xm), -1)
    for i, (a, b) in enumerate(regions):
        g[(g < 0) & (xm >= a) & (xm <= b)] = i
    return np.maximum(g, 0)


def candidates(cells: Cells, F: np.ndarray, interior: bool = True,
               lines_only: bool = False, groups: np.ndarray | None = None,
               lines: bool = True, prune: bool = True) -> Candidates:
    """Every point where the quantity F can reach its largest or smallest value over each
    group of cells (a region of x), and under each wheel when `lines`.

    Cells are pruned by bounds: the largest and smallest Bernstein coefficient of a cell's
    polynomial on the unit square bound it there, so a cell whose bounds lie within the
    best values already found in its group (its corners first, then its sides) cannot hold
    that group's extreme and is not searched further (its wheel-line sides are when
    `lines`: they carry the extremes under each wheel)."""
    if lines_only:
        return _candidates_lines_only(cells, F)
    return candidates_many(cells, [(F, groups, lines, prune)], interior)[0]


def candidates_many(cells: Cells, asks, interior: bool = True) -> list[Candidates]:
    """`candidates(cells, F, groups=groups, lines=lines, prune=prune)` for each (F, groups,
    lines, prune) in `asks` on the same cells, in one batched pass: every step runs once
    over the cells of all of them, each keeping its own groups, pruning and root searches
    (`_roots_in_pieces` by part), so each answer is the one its own call gives, candidate
    for candidate and in the same order."""
    n = len(cells.p0)
    K = len(asks)
    (al1, bl1), (ah1, bh1) = _bounds(cells)
    al, bl, ah, bh = (np.tile(a, K) for a in (al1, bl1, ah1, bh1))
    F = np.concatenate([np.asarray(f, float) for f, _, _, _ in asks]) if K > 1 else \
        np.asarray(asks[0][0], float)
    N = n * K
    part = np.repeat(np.arange(K), n)
    cell = np.tile(np.arange(n), K)
    # each ask's groups numbered after the previous ask's
    groups, start = [], 0
    for _, g, _, _ in asks:
        g = np.zeros(n, int) if g is None else np.asarray(g, int)
        groups.append(g + start)
        start += int(g.max()) + 1 if n else 1
    groups = np.concatenate(groups)
    lines = np.repeat(np.array([bool(x[2]) for x in asks]), n)
    prune = np.repeat(np.array([bool(x[3]) for x in asks]), n)
    lo_fixed, hi_fixed = np.tile(cells.lo_fixed, K), np.tile(cells.hi_fixed, K)
    lo_idx, hi_idx = np.tile(cells.lo_idx, K), np.tile(cells.hi_idx, K)
    us, vs, cs, ws = [], [], [], []
    cidx = np.arange(N)
    # corners
    cu = np.concatenate([al, ah, al + bl, ah + bh])
    cv = np.concatenate([np.zeros(N), np.zeros(N), np.ones(N), np.ones(N)])
    cc = np.tile(cidx, 4)
    cw = np.concatenate([np.where(lo_fixed, -1, lo_idx), np.where(hi_fixed, -1, hi_idx)] * 2)
    us.append(cu)
    vs.append(cv)
    cs.append(cc)
    ws.append(cw)
    bern = _MU[None] @ F @ _MV.T[None]
    bmax, bmin = bern.max(axis=(1, 2)), bern.min(axis=(1, 2))
    best_hi = np.full(start, -np.inf)
    best_lo = np.full(start, np.inf)

    def keep_best(g, val):
        if not len(g):
            return
        order = np.argsort(g, kind="stable")
        gs, vs = g[order], val[order]
        first = np.flatnonzero(np.concatenate([[True], gs[1:] != gs[:-1]]))
        ids = gs[first]
        best_hi[ids] = np.maximum(best_hi[ids], np.maximum.reduceat(vs, first))
        best_lo[ids] = np.minimum(best_lo[ids], np.minimum.reduceat(vs, first))

    def update(c, u, v):
        keep_best(groups[c], _eval2d(F[c], u, v))

    def alive():
        return ~prune | (bmax > best_hi[groups]) | (bmin < best_lo[groups])

    # the corners of every cell, each row of F at its own corner (no copy of F per corner)
    zero, one = np.zeros(N), np.ones(N)
    cval = np.concatenate([_eval2d(F, al, zero), _eval2d(F, ah, zero),
                           _eval2d(F, al + bl, one), _eval2d(F, ah + bh, one)])
    keep_best(groups[cc], cval)
    live = alive()
    # sides: x on a fixed break or under a wheel
    for alpha, beta, fixed, idx in ((al, bl, lo_fixed, lo_idx), (ah, bh, hi_fixed, hi_idx)):
        wheel = np.where(fixed, -1, idx)
        sel = live | (~fixed & lines)
        if not sel.any():
            continue
        g = _compose(F[sel], alpha[sel], beta[sel])
        sub = cidx[sel]
        rows, t = _roots_in_pieces(g[:, 1:] * np.arange(1, g.shape[1]), np.ones(sel.sum()),
                                   part[sub])
        c2 = sub[rows]
        u2 = alpha[c2] + beta[c2] * t
        us.append(u2)
        vs.append(t)
        cs.append(c2)
        ws.append(wheel[c2])
        if len(c2):
            update(c2, u2, t)
    live = alive()
    # bottom and top: p at a break, x along the cell
    for v in (0.0, 1.0):
        if not live.any():
            break
        sub = cidx[live]
        ulo, uhi = al[sub] + bl[sub] * v, ah[sub] + bh[sub] * v
        g = F[sub] @ (v ** np.arange(NV))  # coefficients in u
        dg = g[:, 1:] * np.arange(1, NU)
        # shift to ulo and find roots inside (ulo, uhi)
        S = _shift_matrix(ulo, NU - 1)
        dgs = (dg[:, None, :] @ S)[:, 0]
        width = np.maximum(uhi - ulo, 0.0)
        rows, t = _roots_in_pieces(dgs, np.where(width > 0, width, 1e-300), part[sub])
        c2 = sub[rows]
        us.append(ulo[rows] + t)
        vs.append(np.full(len(rows), v))
        cs.append(c2)
        ws.append(np.full(len(rows), -1))
        if len(c2):
            update(c2, us[-1], vs[-1])
    live = alive()
    inner = [[] for _ in range(K)]
    if interior and live.any():
        sub = cidx[live]
        for k, blocks in enumerate(_interior(F[sub], al[sub], bl[sub], ah[sub], bh[sub],
                                             part[sub], K)):
            inner[k] = [(iu, iv, sub[ic]) for iu, iv, ic in blocks]
    u = np.concatenate(us)
    v = np.concatenate(vs)
    c = np.concatenate(cs).astype(int)
    w = np.concatenate(ws).astype(int)
    ncorner = len(cc)
    out = []
    for k in range(K):
        m = part[c] == k
        uk = np.concatenate([u[m]] + [b[0] for b in inner[k]])
        vk = np.concatenate([v[m]] + [b[1] for b in inner[k]])
        ck = np.concatenate([c[m]] + [b[2] for b in inner[k]]).astype(int)
        wk = np.concatenate([w[m], np.full(sum(len(b[2]) for b in inner[k]), -1)]).astype(int)
        nc = int(m[:ncorner].sum())  # the corners come first, their values already known
        val = np.concatenate([cval[m[:ncorner]], _eval2d(F[ck[nc:]], uk[nc:], vk[nc:])])
        own = cell[ck]
        x = cells.xr[own] + uk * cells.wu[own]
        p = cells.p0[own] + vk * cells.wp[own]
        out.append(Candidates(val, x, p, own, wk))
    return out


def _candidates_lines_only(cells: Cells, F: np.ndarray) -> Candidates:
    """The candidates under each wheel alone (the sides that are wheel lines)."""
    n = len(cells.p0)
    (al, bl), (ah, bh) = _bounds(cells)
    cidx = np.arange(n)
    us, vs, cs, ws = [], [], [], []
    for alpha, beta, fixed, idx in ((al, bl, cells.lo_fixed, cells.lo_idx),
                                    (ah, bh, cells.hi_fixed, cells.hi_idx)):
        wheel = np.where(fixed, -1, idx)
        sel = ~fixed
        if not sel.any():
            continue
        g = _compose(F[sel], alpha[sel], beta[sel])
        rows, t = _roots_in_pieces(g[:, 1:] * np.arange(1, g.shape[1]), np.ones(sel.sum()))
        c2 = cidx[sel][rows]
        us.append(alpha[c2] + beta[c2] * t)
        vs.append(t)
        cs.append(c2)
        ws.append(wheel[c2])
    cu = np.concatenate([al, ah, al + bl, ah + bh])
    u = np.concatenate([cu] + us)
    v = np.concatenate([np.zeros(n), np.zeros(n), np.ones(n), np.ones(n)] + vs)
    c = np.concatenate([np.tile(cidx, 4)] + cs).astype(int)
    w = np.concatenate([np.where(cells.lo_fixed, -1, cells.lo_idx),
                        np.where(cells.hi_fixed, -1, cells.hi_idx)] * 2 + ws).astype(int)
    val = _eval2d(F[c], u, v)
    return Candidates(val, cells.xr[c] + u * cells.wu[c], cells.p0[c] + v * cells.wp[c], c, w)


_NR = 24  # Chebyshev nodes for a resultant (its degree in v is at most 3*3 + 2*4 = 17)
_RHO = np.cos(np.pi * (np.arange(_NR) + 0.5) / _NR)
_CHEB = np.polynomial.chebyshev.chebvander(_RHO, _NR - 1)
_CHEB_INV = np.linalg.inv(_CHEB)


def _newton(F, u, v, al, bl, ah, bh, steps: int = 3):
    """Newton steps on F_u = F_v = 0 from the resultant's roots (a root of a resultant of
    high degree can be a little off where the value is small), kept inside the cell."""
    Fu = F[:, 1:, :] * np.arange(1, NU)[None, :, None]
    Fv = F[:, :, 1:] * np.arange(1, NV)[None, None, :]
    Fuu = Fu[:, 1:, :] * np.arange(1, NU - 1)[None, :, None]
    Fuv = Fu[:, :, 1:] * np.arange(1, NV)[None, None, :]
    Fvv = Fv[:, :, 1:] * np.arange(1, NV - 1)[None, None, :]
    # the five derivatives side by side, each padded with zero high powers: one evaluation
    D = np.zeros((F.shape[0], 5, NU, NV))
    for i, G in enumerate((Fu, Fv, Fuu, Fuv, Fvv)):
        D[:, i, :G.shape[1], :G.shape[2]] = G
    for _ in range(steps):
        a, b, h11, h12, h22 = _eval2d_many(D, u, v).T
        det = h11 * h22 - h12 * h12
        with np.errstate(all="ignore"):
            du = np.where(det != 0, (h22 * a - h12 * b) / det, 0.0)
            dv = np.where(det != 0, (h11 * b - h12 * a) / det, 0.0)
        un, vn = u - du, v - dv
        inside = np.isfinite(un) & np.isfinite(vn) & (vn >= 0) & (vn <= 1) & \
            (un >= al + bl * vn) & (un <= ah + bh * vn)
        u, v = np.where(inside, un, u), np.where(inside, vn, v)
    return u, v


def _strip(A: np.ndarray, axis: int, tiny: np.ndarray) -> np.ndarray:
    """A divided by its lowest power along `axis` (1: u, 2: v) with a coefficient above tiny."""
    mag = np.abs(A).max(axis=3 - axis) > tiny  # (n, powers along axis)
    low = np.where(mag.any(1), np.argmax(mag, axis=1), 0)
    if not low.any():
        return A
    size = A.shape[axis]
    idx = np.arange(size)[None, :] + low[:, None]  # (n, size)
    ok = idx < size
    idx = np.minimum(idx, size - 1)
    if axis == 1:
        out = np.take_along_axis(A, idx[:, :, None], axis=1)
        return out * ok[:, :, None]
    out = np.take_along_axis(A, idx[:, None, :], axis=2)
    return out * ok[:, None, :]


def _interior(F, al, bl, ah, bh, part: np.ndarray | None = None, parts: int = 1):
    """Interior points of each cell where both partial derivatives vanish: (u, v, cell)
    arrays, or with `part` (an id below `parts` per cell) a list per part of its (u, v,
    cell) blocks, each part's blocks as a call with its cells alone gives them."""
    n = F.shape[0]
    top = np.abs(F).max(axis=(1, 2))
    top = np.where(top > 0, top, 1.0)
    Fu = F[:, 1:, :] * np.arange(1, NU)[None, :, None]  # (n, NU-1, NV)
    Fv = F[:, :, 1:] * np.arange(1, NV)[None, None, :]  # (n, NU, NV-1)
    tiny = 1e-11 * top[:, None]
    # a factor u^k or v^k common to both (a fixed end at the cell's side: F = u^2 (...))
    # would make the resultant vanish identically; its roots lie on the cell's sides, which
    # the edges cover, so each derivative is divided by its own lowest powers of u and v
    Fu, Fv = _strip(_strip(Fu, 1, tiny), 2, tiny), _strip(_strip(Fv, 1, tiny), 2, tiny)
    mu = np.abs(Fu).max(axis=2) > tiny  # per power of u
    mv = np.abs(Fv).max(axis=2) > tiny
    du = np.where(mu.any(1), Fu.shape[1] - 1 - np.argmax(mu[:, ::-1], axis=1), -1)
    dv = np.where(mv.any(1), Fv.shape[1] - 1 - np.argmax(mv[:, ::-1], axis=1), -1)
    ok = (du >= 1) & (dv >= 0)
    one = part is None
    part = np.zeros(n, int) if one else part
    vnode = 0.5 * (_RHO + 1.0)
    found = {}  # (degree in u, degree in v) -> (u, v, cell, polished u, polished v)
    for a_deg, b_deg in {(int(a), int(b)) for a, b in zip(du[ok], dv[ok])}:
        sel = np.flatnonzero(ok & (du == a_deg) & (dv == b_deg))
        size = a_deg + b_deg
        # f_u and f_v at each node: coefficients in u
        fu = np.swapaxes(Fu[sel, : a_deg + 1, :] @ (vnode[:, None] ** np.arange(NV)).T, 1, 2)
        fv = np.swapaxes(Fv[sel, : b_deg + 1, :] @ (vnode[:, None] ** np.arange(NV - 1)).T,
                         1, 2)
        S = np.zeros((len(sel), _NR, size, size))
        for r in range(b_deg):  # b_deg rows of f_u (descending powers)
            S[:, :, r, r:r + a_deg + 1] = fu[:, :, ::-1]
        for r in range(a_deg):
            S[:, :, b_deg + r, r:r + b_deg + 1] = fv[:, :, ::-1]
        if b_deg == 0:  # resultant = f_v^deg_u
            dets = fv[:, :, 0] ** a_deg
        else:
            with np.errstate(all="ignore"):
                dets = np.linalg.det(S)
        scale = np.abs(dets).max(axis=1)
        good = np.isfinite(scale) & (scale > 0)
        if not good.any():
            continue
        sel, dets = sel[good], dets[good] / scale[good, None]
        coef = dets @ _CHEB_INV.T
        rows, rho = _colleague_roots(coef)
        if not len(rows):
            continue
        cc = sel[rows]
        v = 0.5 * (rho + 1.0)
        # x from the x-derivative at that p
        g = (Fu[cc] @ (v[:, None] ** np.arange(NV))[:, :, None])[:, :, 0]
        ulo, uhi = al[cc] + bl[cc] * v, ah[cc] + bh[cc] * v
        S2 = _shift_matrix(ulo, NU - 1)
        gs = (g[:, None, :] @ S2)[:, 0]
        width = np.maximum(uhi - ulo, 0.0)
        r2, t2 = _roots_in_pieces(gs, np.where(width > 0, width, 1e-300), part[cc])
        uu, vv, c3 = ulo[r2] + t2, v[r2], cc[r2]
        pu, pv = _newton(F[c3], uu, vv, al[c3], bl[c3], ah[c3], bh[c3])
        found[a_deg, b_deg] = (uu, vv, c3, pu, pv)
    out = []
    for k in range(parts):
        mine = ok & (part == k)
        blocks = []
        # in the order a call with this part's cells alone meets its degree pairs
        for key in {(int(a), int(b)) for a, b in zip(du[mine], dv[mine])}:
            if key not in found:
                continue
            uu, vv, c3, pu, pv = found[key]
            m = part[c3] == k
            if not one and not m.any():
                continue
            blocks.append((uu[m], vv[m], c3[m]))
            blocks.append((pu[m], pv[m], c3[m]))
        out.append(blocks)
    if not one:
        return out
    if not out[0]:
        return np.zeros(0), np.zeros(0), np.zeros(0, int)
    return tuple(np.concatenate([b[i] for b in out[0]]) for i in range(3))


# ------------------------------------------------------------------ reactions
def reaction_polys(inf: Influence, offsets, p_lo: float, p_hi: float, static_r, loads,
                   cols=None):
    """Every reaction (solution order) as a cubic in p on each p-range where no wheel crosses
    a break of the bare beam: (starts, widths, coefficients (reactions, ranges, 4)). `cols`:
    other unknowns instead of the reaction forces (a fixed support's moment: its force's
    column + 1), with `static_r` their static values."""
    L = inf.beam.length
    tol = 1e-11 * L
    d = np.asarray(offsets, float)
    b = inf.breaks
    pb = (b[:, None] - d[None, :]).ravel()
    pb = unique(np.concatenate([[p_lo, p_hi], pb[(pb > p_lo + tol) & (pb < p_hi - tol)]]))
    p0s = pb[:-1] if len(pb) > 1 else pb
    wps = np.diff(pb) if len(pb) > 1 else np.zeros(1)
    pm = p0s + 0.5 * wps
    m = np.clip(np.searchsorted(b, pm[:, None] + d[None, :], "right") - 1, 0, len(b) - 2)
    cols = np.array(inf.reaction_cols if cols is None else cols, int)
    G = np.zeros((len(cols), len(p0s), NV))
    for i, P in enumerate(loads):
        if P == 0:
            continue
        c = inf.z[m[:, i]][:, :, cols]  # (ranges, NV, reactions)
        S = _shift_matrix(p0s + d[i] - b[m[:, i]], NV)
        G += P * np.transpose(np.swapaxes(S, 1, 2) @ c, (2, 0, 1))
    G[:, :, 0] += np.asarray(static_r, float)[:, None]
    return p0s, wps, G


def reaction_extremes(p0s, wps, G) -> list[tuple[float, float, float, float]]:
    """Per reaction: (largest, its p, smallest, its p) from `reaction_polys`."""
    nr, npc, _ = G.shape
    flat = G.reshape(nr * npc, NV)
    w = np.tile(wps, nr)
    p0 = np.tile(p0s, nr)
    rows, t = _roots_in_pieces(flat[:, 1:] * np.arange(1, NV), np.where(w > 0, w, 1e-300))
    own = np.concatenate([np.repeat(np.arange(nr), npc)] * 2 + [rows // npc])
    ps = np.concatenate([p0, p0 + w, p0[rows] + t])
    vals = np.concatenate([flat[:, 0], _horner(flat, w), _horner(flat[rows], t)])
    out = []
    for j in range(nr):
        sel = np.flatnonzero(own == j)
        i1, i2 = sel[int(np.argmax(vals[sel]))], sel[int(np.argmin(vals[sel]))]
        out.append((float(vals[i1]), float(ps[i1]), float(vals[i2]), float(ps[i2])))
    return out


def reaction_candidates(inf: Influence, offsets, p_lo: float, p_hi: float, static_r,
                        loads) -> list[tuple[float, float, float, float]]:
    """Per reaction (solution order): (largest, its p, smallest, its p) over the travel."""
    return reaction_extremes(*reaction_polys(inf, offsets, p_lo, p_hi, static_r, loads))


def envelope(beam: Beam, offsets, loads, travel: tuple[float, float], name: str,
             regions=None, inf: Influence | None = None, static=None) -> dict:
    """The exact largest and smallest `name` over each region (start, end) of x and every
    first-wheel position p in `travel`, with the wheel set (forces + up at offsets from the
    first wheel) on top of the beam's own loads: {region: (max, x, p, min, x, p)}. Regions
    lie side by side (a cell counts for the first region holding its middle; the search
    prunes by region), e.g. the spans or the unbraced lengths."""
    from shopbeam.engine.solver import solve

    inf = inf or influence(beam)
    static = static or solve(beam)
    L = beam.length
    regions = regions or [(0.0, L)]
    xs = set(static.moment.breaks.tolist()) | {x for r in regions for x in r}
    cells = wheel_cells(inf, sorted(xs), offsets, travel[0], travel[1])
    c = candidates(cells, cell_polys(inf, cells, name, static.function(name), loads),
                   groups=cell_groups(cells, regions), lines=False)
    tol = 1e-10 * L
    out = {}
    for a, b in regions:
        m = (c.x >= a - tol) & (c.x <= b + tol)
        i = int(np.argmax(np.where(m, c.value, -np.inf)))
        j = int(np.argmin(np.where(m, c.value, np.inf)))
        out[(a, b)] = (float(c.value[i]), float(c.x[i]), float(c.p[i]),
                       float(c.value[j]), float(c.x[j]), float(c.p[j]))
    return out
