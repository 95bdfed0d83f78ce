"""Piecewise polynomials: fast vectorised evaluation and exact extremes.

A `Piecewise` holds, for each piece between consecutive breaks, the polynomial coefficients
in the local coordinate t = x - breaks[j] (ascending powers). Extremes are exact: the
candidates are both one-sided values at every break plus the real roots of the derivative
inside each piece (eigenvalues of the companion matrix, batched over pieces, then polished
by Newton steps). Nothing is sampled on a grid.
"""

from __future__ import annotations

from dataclasses import dataclass
from functools import cached_property

import numpy as np


@dataclass(frozen=True)
class Extreme:
    """Largest and smallest value of a function over an interval, with where they occur."""

    max: float
    max_at: float
    min: float
    min_at: float

    @property
    def abs_max(self) -> float:
        return max(abs(self.max), abs(self.min))

    @property
    def abs_max_at(self) -> float:
        return self.max_at if abs(self.max) >= abs(self.min) else self.min_at

    def as_dict(self) -> dict:
        return {"max": self.max, "max_at": self.max_at, "min": self.min, "min_at": self.min_at}


def unique(values) -> np.ndarray:
    """The sorted distinct values of a flat array of numbers (as np.unique, which in numpy
    2.x loads numpy.ma on first use: 20 ms of every process that calls it)."""
    a = np.sort(np.asarray(values, dtype=float).ravel())
    if len(a) < 2:
        return a
    keep = np.empty(len(a), bool)
    keep[0] = True
    np.not_equal(a[1:], a[:-1], out=keep[1:])
    return a[keep]


def _horner(coeffs: np.ndarray, t: np.ndarray) -> np.ndarray:
    """Evaluate rows of ascending coefficients (N, d+1) at t (N,)."""
    out = coeffs[:, -1] + 0.0 * t
    for m in range(coeffs.shape[1] - 2, -1, -1):
        out = out * t + coeffs[:, m]
    return out


def _derivative(coeffs: np.ndarray) -> np.ndarray:
    d = coeffs.shape[1] - 1
    if d == 0:
        return np.zeros((coeffs.shape[0], 1))
    return coeffs[:, 1:] * np.arange(1, d + 1)


def _roots_in_pieces(coeffs: np.ndarray, h: np.ndarray,
                     part: np.ndarray | None = None) -> tuple[np.ndarray, np.ndarray]:
    """Real roots of each row's polynomial with 0 < t < h[row]: (row indices, t).

    `part` (an id per row) finds the rows of each part exactly as a call of their own would
    (the companion size is the largest degree of the call's rows), in one pass per distinct
    size; rows come out in row order either way."""
    n, width = coeffs.shape
    if n == 0 or width < 2:
        return np.zeros(0, int), np.zeros(0)
    # work in tau = t / h so that every piece is [0, 1]: well scaled companion matrices
    powers = h[:, None] ** np.arange(width)
    scaled = coeffs * powers
    size = np.abs(scaled)
    top = size.max(axis=1)
    rel = size > 1e-12 * top[:, None]
    live = top > 0
    degree = np.where(live, width - 1 - np.argmax(rel[:, ::-1], axis=1), 0)
    if part is None:
        return _roots_of_degree(coeffs, h, scaled, degree, int(degree.max()) if n else 0)
    bigs = np.zeros(int(part.max()) + 1, int)
    np.maximum.at(bigs, part, degree)
    row_big = bigs[part]
    sizes = sorted(set(row_big.tolist()))
    if len(sizes) == 1:
        return _roots_of_degree(coeffs, h, scaled, degree, sizes[0])
    rows_out, t_out = [], []
    for big in sizes:
        idx = np.flatnonzero(row_big == big)
        r, t = _roots_of_degree(coeffs[idx], h[idx], scaled[idx], degree[idx], big)
        rows_out.append(idx[r])
        t_out.append(t)
    rows, t = np.concatenate(rows_out), np.concatenate(t_out)
    order = np.argsort(rows, kind="stable")
    return rows[order], t[order]


def _roots_of_degree(coeffs, h, scaled, degree, big: int) -> tuple[np.ndarray, np.ndarray]:
    """`_roots_in_pieces` of rows whose companion size is `big`."""
    n = coeffs.shape[0]
    # One batched eigenvalue call for every piece: a piece of degree d < D gets its d x d
    # companion block in the top-left and 2's on the rest of the diagonal (roots at tau = 2,
    # outside the piece, dropped below), so mixed degrees need no grouping.
    if big < 1:
        return np.zeros(0, int), np.zeros(0)
    if big == 1:
        has = degree == 1
        lead = np.where(has, scaled[:, 1], 1.0)
        tau = np.where(has, -scaled[:, 0] / lead, 2.0)[:, None]
    else:
        comp = np.zeros((n, big, big))
        ar = np.arange(big)
        comp[:, ar[1:], ar[:-1]] = (ar[1:][None, :] < degree[:, None])
        comp[:, ar, ar] = 2.0 * (ar[None, :] >= degree[:, None])
        has = degree >= 1
        r_idx, j_idx = np.nonzero(has[:, None] & (ar[None, :] < degree[:, None]))
        d_r = degree[r_idx]
        comp[r_idx, j_idx, d_r - 1] = -scaled[r_idx, j_idx] / scaled[r_idx, d_r]
        eig = np.linalg.eigvals(comp)
        real = np.abs(eig.imag) <= 1e-7 * np.maximum(1.0, np.abs(eig.real))
        tau = np.where(real, eig.real, np.nan)
    rr = np.repeat(np.arange(n), tau.shape[1])
    tt = tau.ravel()
    keep = np.isfinite(tt) & (tt > -1e-9) & (tt < 1 + 1e-9)
    rows = rr[keep]
    tau = np.clip(tt[keep], 0.0, 1.0)
    # two Newton steps on the unscaled polynomial polish the eigenvalue roots
    t = tau * h[rows]
    c = coeffs[rows]
    dc = _derivative(c)
    for _ in range(2):
        f = _horner(c, t)
        df = _horner(dc, t)
        step = np.divide(f, df, out=np.zeros_like(f), where=np.abs(df) > 0)
        t_new = t - step
        t = np.where((t_new >= 0) & (t_new <= h[rows]), t_new, t)
    return rows, t


@dataclass(frozen=True)
class Piecewise:
    """A piecewise polynomial on [breaks[0], breaks[-1]] (local ascending coefficients)."""

    breaks: np.ndarray  # (P + 1,)
    coeffs: np.ndarray  # (P, degree + 1)

    @property
    def h(self) -> np.ndarray:
        return np.diff(self.breaks)

    def __call__(self, x, side: str = "right"):
        """Evaluate at x (scalar or array). At a break, `side` picks the one-sided value."""
        b = self.breaks
        p = len(b) - 1
        # positions this close to a break are at the break (the solver merges positions
        # closer than 1e-9 of the length; this is a quarter of that)
        tol = 2.5e-10 * (b[-1] - b[0])
        if isinstance(x, (int, float)):  # one point: the same steps in plain Python, ~10x faster
            xf = float(x)
            j = int(b.searchsorted(xf + tol, "right") if side == "right"
                    else b.searchsorted(xf - tol, "left")) - 1
            j = min(max(j, 0), p - 1)
            t = min(max(xf, float(b[0])), float(b[-1])) - float(b[j])
            row = self.coeffs[j].tolist()
            out = row[-1]
            for c in row[-2::-1]:
                out = out * t + c
            return out
        xa = np.atleast_1d(np.asarray(x, dtype=float))
        if side == "right":
            j = np.searchsorted(b, xa + tol, side="right") - 1
        else:
            j = np.searchsorted(b, xa - tol, side="left") - 1
        # (np.minimum / np.maximum: np.clip's values, without its wrapper's cost)
        j = np.minimum(np.maximum(j, 0), p - 1)
        t = np.minimum(np.maximum(xa, b[0]), b[-1]) - b[j]
        out = _horner(self.coeffs[j], t)
        return out if np.ndim(x) else float(out[0])

    def derivative(self) -> "Piecewise":
        return Piecewise(self.breaks, _derivative(self.coeffs))

    def scaled(self, k: float) -> "Piecewise":
        return Piecewise(self.breaks, self.coeffs * k)

    def at_ends(self) -> tuple[np.ndarray, np.ndarray]:
        """Values at the left (t=0) and right (t=h) end of every piece."""
        left = self.coeffs[:, 0].copy()
        right = _horner(self.coeffs, self.h)
        return left, right

    @cached_property
    def _candidates(self) -> tuple[np.ndarray, np.ndarray]:
        """Positions and values of every candidate extreme (sorted by position)."""
        left, right = self.at_ends()
        b = self.breaks
        rows, t = _roots_in_pieces(_derivative(self.coeffs), self.h)
        xs = np.concatenate([b[:-1], b[1:], b[rows] + t])
        vs = np.concatenate([left, right, _horner(self.coeffs[rows], t)])
        order = np.argsort(xs, kind="stable")
        return xs[order], vs[order]

    def extremes(self, lo: float | None = None, hi: float | None = None) -> Extreme:
        """Exact max and min over [lo, hi] (default: the whole domain)."""
        xs, vs = self._candidates
        if lo is not None or hi is not None:
            lo = self.breaks[0] if lo is None else lo
            hi = self.breaks[-1] if hi is None else hi
            tol = 1e-12 * max(1.0, abs(self.breaks[-1]))
            # the candidates are sorted by position: those in [lo - tol, hi + tol] are a run
            i0 = int(xs.searchsorted(lo - tol, "left"))
            i1 = max(int(xs.searchsorted(hi + tol, "right")), i0)
            extra_x = np.array([lo, hi])
            extra_v = np.array([self(lo, "right"), self(hi, "left")])
            xs = np.concatenate([xs[i0:i1], extra_x])
            vs = np.concatenate([vs[i0:i1], extra_v])
            extra = (float(lo), float(hi))
        else:
            extra = ()
        imax = _pick(xs, vs, self.breaks, extra, True)
        imin = _pick(xs, vs, self.breaks, extra, False)
        return Extreme(float(vs[imax]), float(xs[imax]), float(vs[imin]), float(xs[imin]))


# Candidates whose values differ by less than this fraction of the function's largest size
# are equal to rounding: a turning point that flat and a break (an end, a load, a support)
# give the same value.
TIE = 1e-12


def _pick(xs: np.ndarray, vs: np.ndarray, breaks: np.ndarray, extra: tuple, upper: bool) -> int:
    """Index of the largest (upper) or smallest value. Of values equal to rounding, the first
    break (or end of the range asked for, `extra`) in order of position is where the extreme
    is, else the first turning point: a flat turning point (a triple root of the derivative, as at the tip of a
    cantilever under a load tapering to nothing) is found only to the cube root of the
    rounding, so its position is noise."""
    i = int(np.argmax(vs) if upper else np.argmin(vs))
    if len(xs) < 2:
        return i
    tol = TIE * float(np.abs(vs).max())
    tied = np.flatnonzero((vs >= vs[i] - tol) if upper else (vs <= vs[i] + tol))
    if len(tied) == 1:
        return i
    for j in tied:  # in order of position: the first break that ties
        if _at_break(float(xs[j]), breaks, extra):
            return int(j)
    # equal to rounding at several turning points (a symmetric beam's two spans): the
    # first, so the place named does not turn on the last bit of the arithmetic
    return int(tied[0])


def _at_break(x: float, breaks: np.ndarray, extra: tuple) -> bool:
    k = int(breaks.searchsorted(x))
    return (k < len(breaks) and float(breaks[k]) == x) or x in extra


def find_candidates(pieces) -> None:
    """Find the candidate extremes of several piecewise polynomials in one batched pass.

    Same result as each one's own `extremes()`, but one eigenvalue call and a handful of
    array operations for all of them: a solve's four functions cost about a quarter as much.
    The results are cached on each Piecewise.
    """
    pieces = [p for p in pieces if "_candidates" not in p.__dict__]
    if not pieces:
        return
    width = max(p.coeffs.shape[1] for p in pieces)
    sizes = [p.coeffs.shape[0] for p in pieces]
    offsets = np.concatenate([[0], np.cumsum(sizes)])
    c = np.zeros((offsets[-1], width))
    for p, o in zip(pieces, offsets):
        c[o:o + p.coeffs.shape[0], : p.coeffs.shape[1]] = p.coeffs
    left_x = np.concatenate([p.breaks[:-1] for p in pieces])
    right_x = np.concatenate([p.breaks[1:] for p in pieces])
    h = right_x - left_x
    rows, t = _roots_in_pieces(_derivative(c), h)
    right = _horner(c, h)
    at_root = _horner(c[rows], t)
    piece_of = np.repeat(np.arange(len(pieces)), sizes)
    # all candidates at once, sorted by (function, position); lexsort is stable, so ties keep
    # the order left ends, right ends, roots, as each function's own extremes() would
    xs = np.concatenate([left_x, right_x, left_x[rows] + t])
    vs = np.concatenate([c[:, 0], right, at_root])
    own = np.concatenate([piece_of, piece_of, piece_of[rows]])
    order = np.lexsort((xs, own))
    xs, vs = xs[order], vs[order]
    ends = np.cumsum(2 * np.asarray(sizes) + np.bincount(piece_of[rows], minlength=len(pieces)))
    for p, lo, hi in zip(pieces, np.concatenate([[0], ends[:-1]]), ends):
        p.__dict__["_candidates"] = (xs[lo:hi], vs[lo:hi])
