"""Sizing: every catalog (or stock) section that passes the job, lightest first.

The sweep is fast because the layout is solved once, not once per section. For a fixed set
of supports without springs, shear and moment do not depend on EI and deflection is EI*u /
EI; every load state is fixed + w_self x (unit self-weight) + k x live, all solved with
EI = 1 and sharing one set of breaks. Each section then only scales and adds coefficient
arrays, and the exact extremes of all sections come from one batched root solve per check.
The capacity factor k of every section is found by a vectorised bracketed root search
(Illinois regula falsi) on the same arrays. Jobs with springs (moments then depend on EI)
or moving loads are checked section by section (slower; the sweep says so).

Ranking: by weight per length, lightest first; with a priced stock list also by price
(cheapest that passes).
"""

from __future__ import annotations

import math
import re
import time
from dataclasses import dataclass, replace

import numpy as np

from shopbeam import units
from shopbeam.cautions import cautions_for
from shopbeam.design import local as _local
from shopbeam.design.capacity import capacity
from shopbeam.design.checks import (BASIS_WORDS, basis_of, brace_points, cb_factor,
                                    deflection_limit, deflection_rule, flexure, nominal_moment,
                                    shear_strength, unbraced_segments)
from shopbeam.design.loading import (_dummies, _positions, build_envelope, evaluate, load_parts,
                                     state_set)
from shopbeam.design.lumber import service_of
from shopbeam.engine.model import Beam, Load
from shopbeam.engine.piecewise import _horner, _roots_in_pieces
from shopbeam.engine.solver import segments, solve
from shopbeam.errors import InputError
from shopbeam.members import catalog, wood
from shopbeam.members.materials import get as get_material
from shopbeam.members.sections import bending_ix, turn

SLOW_LIMIT = 80  # sections checked one by one at most (springs, moving loads)


@dataclass(frozen=True)
class SizeRow:
    designation: str
    section: object
    material: object
    weight: float  # kg/m
    ratio: float  # governing ratio at the entered loads
    governing: str
    factor: float  # capacity factor k of the live loads
    price_per_m: float | None = None
    note: str = ""

    @property
    def ok(self) -> bool:
        return self.ratio <= 1.0

    def cost(self, length: float) -> float | None:
        return None if self.price_per_m is None else self.price_per_m * length


@dataclass(frozen=True)
class SizeResult:
    job: object
    kind: str
    rows: tuple[SizeRow, ...]  # every section swept, lightest first
    seconds: float
    method: str
    currency: str = ""
    skipped: tuple[str, ...] = ()
    material_note: str = ""  # said when the sweep used another material than the job's

    @property
    def passing(self) -> list[SizeRow]:
        return [r for r in self.rows if r.ok]

    @property
    def lightest(self) -> SizeRow | None:
        p = self.passing
        return p[0] if p else None

    @property
    def cheapest(self) -> SizeRow | None:
        p = [r for r in self.passing if r.price_per_m is not None]
        return min(p, key=lambda r: (r.price_per_m, r.weight)) if p else None


# ------------------------------------------------------------------ batched extremes
def _real_roots_01(c: np.ndarray) -> tuple[np.ndarray, np.ndarray]:
    """Real roots in [0, 1] of rows of ascending coefficients (N, w), w <= 4, in closed form
    (linear, quadratic, trigonometric/Cardano cubic); wider rows go to the companion solve."""
    n, w = c.shape
    if w > 4:
        return _roots_in_pieces(c, np.ones(n))
    size = np.abs(c)
    top = size.max(axis=1)
    rel = size > 1e-12 * top[:, None]
    deg = np.where(top > 0, w - 1 - np.argmax(rel[:, ::-1], axis=1), 0)
    rows_out, t_out = [], []
    r1 = np.nonzero(deg == 1)[0]
    if r1.size:
        rows_out.append(r1)
        t_out.append(-c[r1, 0] / c[r1, 1])
    r2 = np.nonzero(deg == 2)[0]
    if r2.size:
        a, b, cc = c[r2, 2], c[r2, 1], c[r2, 0]
        disc = b * b - 4 * a * cc
        ok = disc >= 0
        sq = np.sqrt(np.where(ok, disc, 0.0))
        q = -0.5 * (b + np.copysign(sq, b))
        with np.errstate(divide="ignore", invalid="ignore"):
            x1 = np.where(ok, q / a, np.nan)
            x2 = np.where(ok & (q != 0), cc / q, np.nan)
        rows_out += [r2, r2]
        t_out += [x1, x2]
    r3 = np.nonzero(deg == 3)[0]
    if r3.size:
        a = c[r3, 3]
        b, cc, d = c[r3, 2] / a, c[r3, 1] / a, c[r3, 0] / a
        p = cc - b * b / 3
        q = 2 * b**3 / 27 - b * cc / 3 + d
        disc = (q / 2) ** 2 + (p / 3) ** 3
        three = disc < 0
        with np.errstate(invalid="ignore", divide="ignore"):
            m = 2 * np.sqrt(np.where(three, -p / 3, 0.0))
            arg = np.where(three, np.clip((3 * q / (2 * np.where(three, p, -1.0)))
                                          * np.sqrt(np.where(three, -3 / p, 0.0)), -1, 1), 0.0)
            th = np.arccos(arg) / 3
            sd = np.sqrt(np.where(three, 0.0, disc))
            one = np.cbrt(-q / 2 + sd) + np.cbrt(-q / 2 - sd)
        for kk in range(3):
            root = np.where(three, m * np.cos(th - 2 * np.pi * kk / 3), one if kk == 0 else np.nan)
            rows_out.append(r3)
            t_out.append(root - b / 3)
    if not rows_out:
        return np.zeros(0, int), np.zeros(0)
    rows = np.concatenate(rows_out)
    t = np.concatenate(t_out)
    keep = np.isfinite(t) & (t > -1e-9) & (t < 1 + 1e-9)
    rows, t = rows[keep], np.clip(t[keep], 0.0, 1.0)
    cr = c[rows]
    dcr = cr[:, 1:] * np.arange(1, w)
    for _ in range(2):  # Newton polish
        f = _horner(cr, t)
        df = _horner(dcr, t)
        step = np.divide(f, df, out=np.zeros_like(f), where=np.abs(df) > 0)
        tn = t - step
        t = np.where((tn >= 0) & (tn <= 1), tn, t)
    return rows, t


def _absmax_many(co: np.ndarray, breaks: np.ndarray, intervals) -> list[np.ndarray]:
    """Exact max |f| over each interval (a, b) (breaks) for every row of co (R, P, w)."""
    r, n, w = co.shape
    h = np.diff(breaks)
    flat = co.reshape(r * n, w)
    left = np.abs(co[..., 0])
    right = np.abs(_horner(flat, np.tile(h, r))).reshape(r, n)
    inner = np.zeros((r, n))
    if w > 1:
        d = flat[:, 1:] * np.arange(1, w)
        d = d * (np.tile(h, r)[:, None] ** np.arange(w - 1))  # in tau = t / h
        rows, tau = _real_roots_01(d)
        if rows.size:
            v = np.abs(_horner(flat[rows], tau * np.tile(h, r)[rows]))
            np.maximum.at(inner.reshape(-1), rows, v)
    best = np.maximum(np.maximum(left, right), inner)
    tol = 1e-9 * (breaks[-1] - breaks[0])
    out = []
    for a, b in intervals:
        j0 = int(np.searchsorted(breaks, a - tol, side="left"))
        j1 = int(np.searchsorted(breaks, b + tol, side="right")) - 1
        j0 = min(max(j0, 0), n - 1)
        j1 = min(max(j1, j0 + 1), n)
        out.append(best[:, j0:j1].max(axis=1))
    return out


def _value_at(co: np.ndarray, breaks: np.ndarray, x: float) -> np.ndarray:
    j = int(np.clip(np.searchsorted(breaks, x, side="right") - 1, 0, len(breaks) - 2))
    t = np.full(co.shape[0], x - breaks[j])
    return _horner(co[:, j, :], t)


# ------------------------------------------------------------------ candidates
def default_kind(job) -> str:
    if getattr(job.material, "kind", "") == "lumber":
        return "LVL" if job.material.key.startswith("LVL") else "lumber"
    m = re.match(r"[A-Za-z]+", job.section.designation or "")
    if m and m.group(0).upper() in {k.upper() for k in catalog.kinds()}:
        return next(k for k in catalog.kinds() if k.upper() == m.group(0).upper())
    return catalog.kind_of(job.section) or job.section.shape


# The material a sweep of another family uses (stated in the output): the grade a shop
# most often buys for that kind of stock (common practice).
FAMILY_DEFAULTS = {"lumber": "DF-L-2", "LVL": "LVL-2.0E", "W": "A992", "M": "A36", "S": "A36", "HP": "A572-50",
                   "HSS": "A500-C", "HSS-rect": "A500-C", "HSS-round": "A500-C",
                   "PIPE": "A53-B", "mech-tube": "A513", "mech-round": "A513"}


def material_for_kind(job, kind: str):
    """(job, note): a sweep of lumber on a metal job, or of metal stock on a lumber job,
    switches to a stated default material of the swept family, never a lumber size in
    steel or a steel shape in wood."""
    mkind = getattr(job.material, "kind", "custom")
    wants_wood = kind in ("lumber", "LVL")
    if mkind == "custom" or wants_wood == (mkind == "lumber"):
        return job, ""
    key = FAMILY_DEFAULTS.get(kind, "A36")
    mat = get_material(key)
    note = (f"--kind {kind} is {'wood' if wants_wood else 'metal'} stock but the job's material "
            f"{job.material.key} is {mkind}: swept in {mat.key} ({mat.name}) instead; give "
            "beam.material in the job to choose another grade")
    return replace(job, material=mat), note


def _candidates(job, kind, max_depth, stock):
    """[(designation, section, material, price_per_m, note)] to sweep."""
    weak = getattr(job.section, "axis", "strong") == "weak"
    out = []
    if stock is not None:
        for item in stock:
            mat = get_material(item.material) if item.material else job.material
            out.append((item.designation, item.section, mat or job.material, item.price_per_m,
                        item.note))
    else:
        for sec in catalog.list_sections(kind):
            out.append((sec.designation, sec, job.material, None, ""))
    if weak:
        out2 = []
        for d, s, m, p, n in out:
            try:
                out2.append((d, turn(s, "weak"), m, p, n))
            except ValueError:
                continue
        out = out2
    if max_depth is not None:
        out = [c for c in out if c[1].depth <= max_depth * (1 + 1e-9)]
    return out


# ------------------------------------------------------------------ the sweep
def size(job, kind: str | None = None, max_depth: float | None = None, stock=None,
         with_capacity: bool = True) -> SizeResult:
    """Sweep sections for the job; rows sorted by weight per length, lightest first.
    `kind = "all"` sweeps every catalog kind of the job's material family (metal or wood)."""
    t0 = time.perf_counter()
    if kind is not None and kind.lower() == "all" and stock is None:
        return _size_all(job, max_depth, with_capacity, t0)
    kind = kind or default_kind(job)
    material_note = ""
    if stock is None:
        job, material_note = material_for_kind(job, kind)
    cands = _candidates(job, None if stock is not None else kind, max_depth, stock)

    base = replace(job, self_weight=False)
    parts = load_parts(base)
    springs = any(s.kind == "spring" for s in job.supports)
    wood = any(getattr(c[2], "kind", "") == "lumber" for c in cands)
    if springs or parts.moving or wood:
        rows, skipped = _slow(job, _wood_values(job, cands) if wood else cands)
        method = ("section by section (the job has " + ("springs" if springs else
                  "moving loads" if parts.moving else "wood members: NDS factors, bearing "
                  "and creep per size") + ")")
    else:
        rows, skipped = _fast(job, base, parts, cands, state_set, with_capacity)
        method = "one layout solve, all sections batched"
    rows.sort(key=lambda r: (r.weight, r.designation))
    return SizeResult(job, "stock list" if stock is not None else kind, tuple(rows),
                      time.perf_counter() - t0, method,
                      getattr(stock, "currency", "") if stock is not None else "",
                      tuple(skipped), material_note)


def _size_all(job, max_depth, with_capacity, t0) -> SizeResult:
    wood = getattr(job.material, "kind", "") in ("lumber", "lvl")
    rows: dict[str, SizeRow] = {}
    skipped, methods = [], set()
    for k in catalog.kinds():
        if (k.lower() in ("lumber", "lvl")) != wood:
            continue
        try:
            res = size(job, k, max_depth, None, with_capacity)
        except InputError as exc:  # e.g. a kind with no section under --max-depth
            skipped.append(f"{k}: {exc.problem.message}")
            continue
        methods.add(res.method)
        skipped += list(res.skipped)
        for r in res.rows:  # kinds overlap (HSS is HSS-rect and HSS-round): one row each
            rows.setdefault(r.designation, r)
    out = sorted(rows.values(), key=lambda r: (r.weight, r.designation))
    return SizeResult(job, "all", tuple(out), time.perf_counter() - t0,
                      "every catalog kind: " + "; ".join(sorted(methods)), "", tuple(skipped))


def _fast(job, base, parts, cands, state_set, with_capacity):
    if not cands:
        return [], []
    L = job.length
    sw_unit = Load("uniform", start=0.0, end=L, w1=-1.0, label="self-weight", case="dead")

    braced, braces = brace_points(job)
    # brace points become breaks (zero loads), so unbraced lengths are whole pieces
    extra = tuple(Load("point", at=x, value=0.0) for x in braces)
    parts = replace(parts, fixed=parts.fixed + (sw_unit,) + extra)
    ss = state_set(base, parts=parts, ei=1.0)
    empty = Beam(L, 1.0, job.supports, ())
    ltb_segs = unbraced_segments(job, empty)
    spans = segments(empty)
    n_ratio, d_abs, _ = deflection_rule(job)
    imp = parts.impact
    # the self-weight solution alone: fixed = dead + sw_unit; split by solving sw alone

    allpos = _positions(parts.fixed) | _positions(parts.live)
    for sl in ss.span_loads:
        allpos |= _positions(sl)
    sw_sol = solve(replace(empty, loads=(sw_unit,) + tuple(_dummies(allpos))))
    if sw_sol.moment.breaks.shape != ss.fixed.moment.breaks.shape:
        raise ValueError("sizing: the self-weight solution does not share the layout's breaks")

    def stack(name):
        """(dead, self-weight per unit, live states (S, P, w), breaks). Without patterns S = 1;
        with them the S = 2 states are the exact upper and lower envelopes over all patterns
        (see loading.build_envelope), the same for every section: the spans' signs do not
        depend on EI or on the section's own weight."""
        sw = getattr(sw_sol, name).coeffs
        fx = getattr(ss.fixed, name).coeffs
        lv = getattr(ss.live, name).coeffs
        if not parts.patterned:
            return fx - sw, sw, lv[None], ss.fixed.moment.breaks
        e = build_envelope(ss, name)
        s_ = e.carry(sw)
        return e.fixed - s_, s_, np.stack([e.live + e.up, e.live + e.down]), e.breaks

    M = stack("moment")
    V = stack("shear")
    U = stack("deflection")  # EI * u (EI = 1)
    # per-section constants
    g0 = units.G0
    rs = []
    skipped = []
    for des, sec, mat, price, note in cands:
        try:
            b = basis_of(replace(job, material=mat))
            fl = flexure(sec, mat, b, job.criteria.safety_factor, job.welded)
            sh = shear_strength(sec, mat, b, job.criteria.safety_factor, job.welded)
        except (KeyError, TypeError, ValueError, ZeroDivisionError) as exc:
            skipped.append(f"{des}: {exc}")
            continue
        seg = [(fl.cap, fl.ltb1(0.0 if braced else bb - a)[0], free) for a, bb, free in ltb_segs]
        rs.append((des, sec, mat, price, note, sec.weight_per_length(mat.density) * g0,
                   fl.omega, seg, sh.vn / sh.omega, mat.e * bending_ix(sec, job.restrained), fl.cap,
                   fl.uses_cb))
    if not rs:
        raise InputError("no section of this kind can be checked", "--kind")
    R = len(rs)
    S = M[2].shape[0]
    wsw = np.array([r[5] for r in rs])
    ei = np.array([r[9] for r in rs])
    vallow = np.array([r[8] for r in rs])
    omega = np.array([r[6] for r in rs])
    cap = np.array([r[10] for r in rs])
    uses_cb = np.array([r[11] for r in rs])  # False: Cb is not a factor (NDS CL, ADM lambda)
    ltb1 = np.array([[s[1] for s in r[7]] for r in rs])  # (R, nseg)
    free = [s[2] for s in rs[0][7]]
    limits, live_limits = [], []
    live_n = job.criteria.live_deflection_ratio  # floors: L/360 under live load alone
    for a, bb, kind in spans:
        limits.append(deflection_limit(a, bb, kind, n_ratio, d_abs))
        live_limits.append(deflection_limit(a, bb, kind, live_n, None) if live_n else math.inf)
    # local checks at supports and point loads (shopbeam.design.local): every force is
    # fixed + w_self x sw + kk x live[state]; its allowable depends on its direction

    # live part per state of each force: with patterns, from each span's own part taken
    # where it adds (upper) and where it relieves (lower), the same two states as above
    if parts.patterned:
        basis = [()] + [(i,) for i in range(len(ss.spans))]
        items = []
        for it in _local.sizing_items(base, ss, sw_sol, basis):
            lv = np.asarray(it[6], float)
            d = lv[1:] - lv[0]
            items.append(it[:6] + (np.array([lv[0] + d[d > 0].sum(), lv[0] + d[d < 0].sum()]),)
                         + tuple(it[7:]))
    else:
        items = _local.sizing_items(base, ss, sw_sol, [()])
    n_it = len(items)
    if n_it:
        orient = np.array([1.0 if it[1] == "top" else -1.0 for it in items])  # + pulls
        fa = np.array([it[4] for it in items])
        fs = np.array([it[5] for it in items])
        flv = np.array([it[6] for it in items]).T  # (S, n_it)
        al_pull = np.empty((R, n_it))
        al_bear = np.empty((R, n_it))
        nm_pull, nm_bear = [], []
        for i, r in enumerate(rs):
            pu, be = _local.sizing_allowables(job, r[1], r[2], items)
            al_pull[i] = [x[0] for x in pu]
            al_bear[i] = [x[0] for x in be]
            nm_pull.append([x[1] for x in pu])
            nm_bear.append([x[1] for x in be])

    def local_ratio(kk, want_name=False):
        """(R,) worst local ratio over states and forces at factors kk."""
        if not n_it:
            return np.zeros(R), [""] * R
        force = (fa[None, None, :] + wsw[:, None, None] * fs[None, None, :]
                 + kk[:, None, None] * flv[None, :, :])  # (R, S, n_it)
        pulls = orient[None, None, :] * force > 0
        allow = np.where(pulls, al_pull[:, None, :], al_bear[:, None, :])
        with np.errstate(divide="ignore", invalid="ignore"):
            rr = np.where(np.isinf(allow), 0.0, np.abs(force) / allow)
        flat = rr.reshape(R, -1)
        worst = flat.max(axis=1)
        if not want_name:
            return worst, None
        idx = flat.argmax(axis=1)
        names = []
        for i in range(R):
            s_, j = divmod(int(idx[i]), n_it)
            names.append(nm_pull[i][j] if pulls[i, s_, j] else nm_bear[i][j])
        return worst, names

    def combo(arrs, kk):
        f, s, lv, _ = arrs  # (P,w), (P,w), (S,P,w)
        base_ = f[None] + wsw[:, None, None] * s[None]  # (R,P,w)
        out = base_[:, None] + kk[:, None, None, None] * lv[None]  # (R,S,P,w)
        return out.reshape(R * S, *f.shape)

    def ratios(k):
        """(R,) governing ratio and (R,) index of the governing check at factors k."""
        kk = k * (1 + imp)
        mco = combo(M, kk)
        mb, vb, ub = M[3], V[3], U[3]
        bend = np.zeros(R)
        mmaxes = _absmax_many(mco, mb, [(a, bb) for a, bb, _ in ltb_segs])
        for si, (a, bb, _free) in enumerate(ltb_segs):
            # with patterns: Mmax, MA, MB, MC each the largest over both envelopes (the
            # evaluation's rule, conservative against every single pattern)
            mmax = mmaxes[si].reshape(R, S).max(axis=1)
            if np.all(np.isinf(ltb1[:, si])) or free[si]:
                cb = np.ones(R)
            else:
                q = [np.abs(_value_at(mco, mb, a + f_ * (bb - a))).reshape(R, S).max(axis=1)
                     for f_ in (0.25, 0.5, 0.75)]
                cb = np.where(uses_cb, cb_factor(mmax, *q), 1.0)
            mn = nominal_moment(cap, ltb1[:, si], cb)
            bend = np.maximum(bend, mmax * omega / mn)
        shear = (_absmax_many(combo(V, kk), vb, [(0.0, L)])[0].reshape(R, S).max(axis=1)
                 / vallow)
        uco = combo(U, kk)
        defl = np.zeros(R)
        for um, lim in zip(_absmax_many(uco, ub, [(a, bb) for a, bb, _ in spans]), limits):
            defl = np.maximum(defl, um.reshape(R, S).max(axis=1) / ei / lim)
        ldef = np.zeros(R)
        if live_n:
            lv = U[2]
            lco = (kk[:, None, None, None] * lv[None]).reshape(R * S, *lv.shape[1:])
            for um, lim in zip(_absmax_many(lco, ub, [(a, bb) for a, bb, _ in spans]),
                               live_limits):
                ldef = np.maximum(ldef, um.reshape(R, S).max(axis=1) / ei / lim)
        allr = np.stack([bend, shear, defl, ldef])
        allr = np.vstack([allr, local_ratio(kk)[0][None, :]])
        return allr.max(axis=0), allr.argmax(axis=0)

    r1, gi = ratios(np.ones(R))
    if with_capacity:
        k = _capacity_vector(ratios, R)
    else:
        k = np.full(R, np.nan)
    local_names = local_ratio(np.ones(R) * (1 + imp), True)[1]
    names = ("bending", "shear", "deflection", "live deflection")
    rows = [SizeRow(r[0], r[1], r[2], r[5] / g0, float(r1[i]),
                    names[gi[i]] if gi[i] < 4 else local_names[i], float(k[i]),
                    r[3], r[4]) for i, r in enumerate(rs)]
    # tees and angles: bending by F9 / F10 needs the whole check (sign of the moment along
    # each unbraced length, principal axes); those rows are checked one by one
    special = [i for i, r in enumerate(rs) if flexure(
        r[1], r[2], basis_of(replace(job, material=r[2])), job.criteria.safety_factor,
        job.welded).special]
    if special:
        for i in special:
            r = rs[i]
            j = replace(job, section=r[1], material=r[2])
            ev = evaluate(j, 1.0)
            g = max(ev.checks, key=lambda c: c.ratio)
            kf = capacity(j).factor if with_capacity else float("nan")
            rows[i] = replace(rows[i], ratio=g.ratio, governing=g.name, factor=kf)
    return rows, skipped


def _capacity_vector(ratios, R: int) -> np.ndarray:
    """k with governing ratio 1 for every section at once (Illinois regula falsi, bracketed)."""
    g0, _ = ratios(np.zeros(R))
    g1, _ = ratios(np.ones(R))
    live = g0 <= 1.0
    # the ratios are convex in k (a max of |a + k b|), so the chord through k = 0 and 1
    # brackets the root from the safe side; a small margin and a check keep it honest
    with np.errstate(divide="ignore", invalid="ignore"):
        est = np.where(g1 > g0, (1 - g0) / (g1 - g0), np.inf)
    est = np.where(np.isfinite(est), est, 1e6)
    over = g1 > 1
    lo = np.where(over, np.minimum(est, 1.0) * (1 - 1e-9), 1.0)
    hi = np.where(over, 1.0, np.maximum(est, 1.0) * (1 + 1e-9))
    lo = np.where(live, lo, 0.0)
    flo = ratios(lo)[0] - 1.0
    bad = live & (flo > 0)
    lo, flo = np.where(bad, 0.0, lo), np.where(bad, g0 - 1.0, flo)
    fhi = ratios(hi)[0] - 1.0
    for _ in range(40):
        need = live & (fhi <= 0)
        if not need.any():
            break
        lo = np.where(need, hi, lo)
        flo = np.where(need, fhi, flo)
        hi = np.where(need, hi * 4, hi)
        fhi = np.where(need, ratios(hi)[0] - 1.0, fhi)
    bounded = live & (fhi > 0)
    side = np.zeros(R)
    for _ in range(100):
        width = hi - lo
        done = ~bounded | (width <= 1e-13 * np.maximum(hi, 1e-300)) | (np.abs(flo) <= 1e-13)
        if done.all():
            break
        x = np.where(fhi != flo, (lo * fhi - hi * flo) / np.where(fhi != flo, fhi - flo, 1), 0.5 * (lo + hi))
        x = np.where((x <= lo) | (x >= hi) | ~np.isfinite(x), 0.5 * (lo + hi), x)
        fx = ratios(x)[0] - 1.0
        up = (fx <= 0) & ~done
        dn = (fx > 0) & ~done
        lo, flo = np.where(up, x, lo), np.where(up, fx, flo)
        hi, fhi = np.where(dn, x, hi), np.where(dn, fx, fhi)
        # Illinois: halve the stale end's value when the same side moves twice
        fhi = np.where(up & (side == 1), fhi / 2, fhi)
        flo = np.where(dn & (side == -1), flo / 2, flo)
        side = np.where(up, 1, np.where(dn, -1, side))
    k = np.where(bounded, lo, np.where(live, np.inf, 0.0))
    return k


def _wood_values(job, cands):
    """Each wood candidate with the reference values of its own size class and E'."""
    svc = service_of(job)
    out = []
    for des, sec, mat, price, note in cands:
        if getattr(mat, "kind", "") == "lumber":
            base = get_material(mat.key) or mat
            try:
                mat = wood.adjusted_material(base, sec, svc.wet, svc.temperature)
            except Exception:  # noqa: BLE001 - no table row: the sweep says it skipped it
                continue
        out.append((des, sec, mat, price, note))
    return out


def _slow(job, cands):
    if len(cands) > SLOW_LIMIT:
        raise InputError(f"{len(cands)} sections to check one by one (the job has springs or "
                         f"moving loads); narrow the sweep to {SLOW_LIMIT} or fewer with "
                         "--max-depth or --stock", "--kind")
    rows, skipped = [], []
    for des, sec, mat, price, note in cands:
        j = replace(job, section=sec, material=mat)
        try:
            ev = evaluate(j, 1.0)
            cap = capacity(j)
        except Exception as exc:  # noqa: BLE001 - one odd section must not stop the sweep
            skipped.append(f"{des}: {exc}")
            continue
        g = max(ev.checks, key=lambda c: c.ratio)
        rows.append(SizeRow(des, sec, mat, sec.weight_per_length(mat.density), g.ratio, g.name,
                            cap.factor, price, note))
    return rows, skipped


# ------------------------------------------------------------------ output
def to_json(res: SizeResult, top: int | None = None) -> dict:
    rows = res.passing if top is None else res.passing[:top]

    def row(r):
        return {"designation": r.designation, "mass_per_length": r.weight, "ratio": r.ratio,
                "governing": r.governing, "factor": r.factor if math.isfinite(r.factor) else None,
                "price_per_m": r.price_per_m, "material": getattr(r.material, "key", "")}

    return {"schema": 1, "title": res.job.title, "kind": res.kind, "swept": len(res.rows),
            "passing": [row(r) for r in rows], "seconds": res.seconds, "method": res.method,
            "lightest": res.lightest.designation if res.lightest else None,
            "cheapest": res.cheapest.designation if res.cheapest else None,
            "basis": BASIS_WORDS[basis_of(res.job)], "cautions": cautions_for(res.job.tags, res.job.lifting),
            "material": getattr(res.job.material, "key", ""),
            "material_note": res.material_note}
