"""Bending of tees (AISC 360-16 F9) and single angles (F10), and loads off the shear centre.

Tees (WT, MT, ST and typed-in tees) bent about the axis of symmetry, by the sign of the
moment along each unbraced length (flange on top: a sagging moment puts the stem in tension,
a hogging one, as on a cantilever loaded down, puts the stem in compression):

- F9.1 yielding: stem in tension Mp = Fy Zx <= 1.6 My (F9-2), My = Fy Sx (F9-3, Sx to the
  stem tip); stem in compression Mp = My (F9-4).
- F9.2 lateral-torsional buckling: stem in tension, Lp = 1.76 ry sqrt(E/Fy) (F9-8), Lr per
  F9-9, Mn = Mp - (Mp - My)(Lb - Lp)/(Lr - Lp) (F9-6), Mcr beyond Lr (F9-7);
  Mcr = 1.95 E / Lb sqrt(Iy J) (B + sqrt(1 + B^2)) (F9-10), B = +2.3 (d/Lb) sqrt(Iy/J)
  (F9-11); stem in compression anywhere along the unbraced length: B = -2.3 (d/Lb)
  sqrt(Iy/J) (F9-12) and Mn = Mcr <= My (F9-13), used then for both signs (conservative).
  Cb is taken 1.0 (F9 gives none; conservative).
- F9.3 flange local buckling (flange in compression): noncompact Mn = Mp - (Mp - 0.7 Fy
  Sxc)(lambda - lambda_pf)/(lambda_rf - lambda_pf) <= 1.6 My (F9-14), slender
  Mn = 0.7 E Sxc / (bf/2tf)^2 (F9-15), lambda_pf = 0.38 sqrt(E/Fy), lambda_rf = 1.0 sqrt(E/Fy).
- F9.4 stem local buckling (stem in compression): Mn = Fcr Sx (F9-16), Fcr = Fy for d/tw <=
  0.84 sqrt(E/Fy) (F9-17), (1.43 - 0.515 (d/tw) sqrt(Fy/E)) Fy up to 1.52 sqrt(E/Fy) (F9-18),
  1.52 E / (d/tw)^2 beyond (F9-19).

Single angles, unless the job says the angle is restrained (``beam.restrained = true``: held
against twist and sideways movement all along, so it bends about its geometric axis), bend
about their principal axes: the vertical-plane moment M splits into Mw = M cos(alpha) about
the major axis and Mz = M sin(alpha) about the minor axis (alpha between the geometric and
principal axes, tan(alpha) from the AISC database or computed). Each is checked by F10 and
the two are added by H2-1 (the ratios are added without their signs: conservative):

- F10.1 yielding Mn = 1.5 My (F10-1), My = Fy S about that axis (S to the farthest point).
- F10.2 lateral-torsional buckling (major axis only): Mcr = 9 E A rz t Cb / (8 Lb)
  [sqrt(1 + (4.4 beta_w rz / (Lb t))^2) + 4.4 beta_w rz / (Lb t)] (F10-4), beta_w = 0 for
  equal legs and -|beta_w| (long leg in compression: the lower value) for unequal legs,
  Cb <= 1.5; Mn = (1.92 - 1.17 sqrt(My/Mcr)) My <= 1.5 My (F10-2) or (0.92 - 0.17 Mcr/My)
  Mcr (F10-3).
- F10.3 leg local buckling, b/t of the longer leg: noncompact Mn = Fy Sc (2.43 - 1.72 (b/t)
  sqrt(Fy/E)) (F10-6), slender Mn = Fcr Sc, Fcr = 0.71 E / (b/t)^2 (F10-7, F10-8),
  lambda_p = 0.54 sqrt(E/Fy), lambda_r = 0.91 sqrt(E/Fy); Sc to the toes.

Vertical deflection of an unrestrained angle is the geometric figure times
Ix (cos^2(alpha)/Iw + sin^2(alpha)/Iz) (curvatures about the two principal axes, projected
back on the vertical plane); it also moves sideways by Ix sin(alpha) cos(alpha)
(1/Iz - 1/Iw) times the geometric figure. Equation numbers and the Cb cap of F10 are recalled
from memory of AISC 360-16.

Channels, angles and tees loaded in the plane of the web are loaded off their shear centre:
the load twists them. AISC 360 gives no beam check for that here; `torsion_note` quantifies
it (torque per unit length or per load, and a rough St Venant shear stress t T / J, named as
such) so it is never silent.
"""

from __future__ import annotations

import math
from dataclasses import dataclass

from shopbeam import units
from shopbeam.design.basis import (BASIS_WORDS, OMEGA_B, yield_cap_words, basis_of,
                                   brace_points, cb_factor, job_omega, yield_cap_provenance)
from shopbeam.design.results import Check, Unchecked
from shopbeam.members.sections import principal_factors

F9_SOURCE = "AISC 360-16 F9 (equation numbers from memory)"
F10_SOURCE = "AISC 360-16 F10 (equation numbers and Cb cap from memory)"
CB_MAX_ANGLE = 1.5  # AISC 360-16 F10.2 (from memory)


# ------------------------------------------------------------------ F9 tees
@dataclass(frozen=True)
class TeeProps:
    fy: float
    e: float
    d: float
    bf: float
    tf: float
    tw: float
    zx: float
    sx: float  # to the stem tip (the smaller)
    sxc: float  # to the flange (compression flange for F9.3)
    iy: float
    j: float
    ry: float


def tee_props(sec, fy: float, e: float) -> TeeProps:
    d = sec.dims
    s_small, s_big = min(sec.sx_top, sec.sx_bot), max(sec.sx_top, sec.sx_bot)
    return TeeProps(fy, e, d["d"], d["bf"], d["tf"], d["tw"], sec.zx or s_small, s_small, s_big,
                    sec.iy, sec.j, sec.ry)


def flange_on_top(sec) -> bool:
    """The flange side of a tee has the larger section modulus (centroid near the flange)."""
    return sec.sx_top >= sec.sx_bot


def _ln(x: float, system: str, sig: int = 4) -> str:
    """A length in a check's words, in the job's display system (in or mm)."""
    return units.fmt(x, "small_length", system, sig)


def f9_mcr(p: TeeProps, lb: float, stem_compression: bool) -> float:
    """F9-10 with B from F9-11 (stem in tension) or F9-12 (stem in compression)."""
    b = 2.3 * (p.d / lb) * math.sqrt(p.iy / p.j)
    if stem_compression:
        b = -b
    return 1.95 * p.e / lb * math.sqrt(p.iy * p.j) * (b + math.sqrt(1 + b * b))


def f9_stem_tension(p: TeeProps, lb: float | None, system: str = "us") -> tuple[float, str]:
    """Mn and the governing provision for a tee with its stem in tension (flange in
    compression). lb None: continuously braced."""
    my = p.fy * p.sx
    mp = min(p.fy * p.zx, 1.6 * my)
    out = [(mp, "F9-2 yielding Mp = Fy Zx <= 1.6 My")]
    if lb is not None and lb > 0:
        root = math.sqrt(p.e / p.fy)
        lp = 1.76 * p.ry * root
        lr = 1.95 * (p.e / p.fy) * math.sqrt(p.iy * p.j) / p.sx * math.sqrt(
            2.36 * (p.fy / p.e) * p.d * p.sx / p.j + 1)
        if lb > lp:
            if lb <= lr:
                out.append((mp - (mp - my) * (lb - lp) / (lr - lp),
                            f"F9-6 LTB, stem in tension, Lp {_ln(lp, system, 3)} < Lb "
                            f"{_ln(lb, system)} <= Lr {_ln(lr, system)}"))
            else:
                out.append((f9_mcr(p, lb, False), f"F9-7/F9-10 LTB, stem in tension, Lb "
                            f"{_ln(lb, system)} > Lr {_ln(lr, system)}"))
    lam = p.bf / (2 * p.tf)
    root = math.sqrt(p.e / p.fy)
    lpf, lrf = 0.38 * root, 1.0 * root
    if lam > lpf:
        if lam <= lrf:
            m = min(mp - (mp - 0.7 * p.fy * p.sxc) * (lam - lpf) / (lrf - lpf), 1.6 * my)
            out.append((m, f"F9-14 flange local buckling (noncompact, bf/2tf {lam:.3g})"))
        else:
            out.append((0.7 * p.e * p.sxc / lam**2,
                        f"F9-15 flange local buckling (slender, bf/2tf {lam:.3g})"))
    return min(out, key=lambda t: t[0])


def f9_stem_compression(p: TeeProps, lb: float | None,
                        system: str = "us") -> tuple[float, str]:
    """Mn and the governing provision for a tee with its stem in compression."""
    my = p.fy * p.sx
    out = [(my, "F9-4 yielding Mp = My = Fy Sx (stem in compression)")]
    if lb is not None and lb > 0:
        mcr = f9_mcr(p, lb, True)
        out.append((min(mcr, my), f"F9-13 LTB, stem in compression, Mcr by F9-10/F9-12 "
                                  f"(Lb {_ln(lb, system)})"))
    dt = p.d / p.tw
    root = math.sqrt(p.e / p.fy)
    if dt <= 0.84 * root:
        fcr, eq = p.fy, "F9-17"
    elif dt <= 1.52 * root:
        fcr, eq = (1.43 - 0.515 * dt / root) * p.fy, "F9-18"
    else:
        fcr, eq = 1.52 * p.e / dt**2, "F9-19"
    out.append((fcr * p.sx, f"F9-16 stem local buckling, Fcr by {eq} (d/tw {dt:.3g})"))
    return min(out, key=lambda t: t[0])


def f9_ltb_with_compression(p: TeeProps, lb: float | None,
                            system: str = "us") -> tuple[float, str] | None:
    """F9.2(b): the stem is in compression somewhere along Lb: Mn = Mcr (B negative) <= My,
    applied to the stem-in-tension moments of the same length too."""
    if lb is None or lb <= 0:
        return None
    return (min(f9_mcr(p, lb, True), p.fy * p.sx),
            f"F9-13 LTB with the stem in compression along Lb {_ln(lb, system)}")


# ------------------------------------------------------------------ F10 angles
@dataclass(frozen=True)
class AngleProps:
    """Principal-axis properties of an angle (SI), the vertical leg d, horizontal leg b."""

    d: float
    b: float
    t: float
    area: float
    ix: float  # geometric, the axis of bending
    iy: float
    iw: float  # major principal
    iz: float  # minor principal
    alpha: float  # angle between the geometric and principal axes (rad)
    sw: float  # to the farthest point from the major axis
    sz: float  # to the farthest point from the minor axis
    sz_toe: float  # minor axis, to the farthest toe
    rz: float
    beta_w: float  # |beta_w|; 0 for equal legs


def _corners(d, b, t):
    return [(0.0, 0.0), (0.0, d), (t, d), (b, 0.0), (b, t)]


def angle_props(sec) -> AngleProps:
    """From the section's tabulated or computed properties: Ix, Iy, Iz and tan(alpha) with the
    leg dimensions and the centroid (x from the back of the vertical leg, y from the heel).
    Section moduli about the principal axes are taken to the outer corners of the legs
    (computed angles) or from the AISC database (Sw, Sz, catalog angles)."""
    dm = sec.dims
    d, b, t = dm["d"], dm["b"], dm["t"]
    xb, yb = dm["x"], dm["y"]
    ix, iy = sec.ix, sec.iy
    iz = dm["iz"]
    iw = ix + iy - iz
    # product of inertia about the centroid: legs along +x and +y from the heel, so negative
    pxy = -math.sqrt(max((ix - iz) * (iy - iz), 0.0))
    # direction (unit vector in x, y) of the major principal axis w: the eigenvector of the
    # coordinate second-moment matrix [[Iy, Pxy], [Pxy, Ix]] with the smaller eigenvalue is
    # the normal of the w axis
    theta = 0.5 * math.atan2(2 * pxy, iy - ix)
    # along u_big the coordinates spread most: it is the normal of the major axis w (bending
    # about w stresses the section in proportion to r . u_big); u_small is the normal of the
    # minor axis z and runs along w
    u_big = (math.cos(theta), math.sin(theta))
    u_small = (-math.sin(theta), math.cos(theta))
    pts = [(px - xb, py - yb) for px, py in _corners(d, b, t)]

    def far(u, which=None):
        return max(abs(px * u[0] + py * u[1]) for px, py in (which or pts))

    sw = iw / far(u_big)
    sz = iz / far(u_small)
    toes = [pts[1], pts[2], pts[3], pts[4]]
    sz_toe = iz / far(u_small, toes)
    alpha = math.acos(min(1.0, abs(u_small[0])))  # w axis against the geometric x axis
    if dm.get("sw") and dm.get("sz"):  # tabulated (AISC Shapes Database v15.0)
        iw = dm.get("iw") or iw
        sw, sz = dm["sw"], dm["sz"]
        sz_toe = max(sz_toe, sz)
    beta = 0.0 if abs(d - b) <= 1e-9 * max(d, b) else abs(beta_w(d, b, t, xb, yb, iw, u_big))
    return AngleProps(d, b, t, sec.area, ix, iy, iw, iz, alpha, sw, sz, sz_toe,
                      math.sqrt(iz / sec.area), beta)


def beta_w(d, b, t, xb, yb, iw, n_w, cells: int = 400) -> float:
    """beta_w = (1/Iw) int z (w^2 + z^2) dA - 2 z0 (AISC 360-16 Commentary F10, from memory):
    z the coordinate normal to the major axis, z0 the shear centre (the legs' crossing) on it.
    Midpoint rule over the two legs (thin strips; fillets left out)."""
    wdir = (n_w[1], -n_w[0])
    tot = 0.0
    for (x0, x1, y0, y1) in ((0.0, t, 0.0, d), (t, b, 0.0, t)):
        nx, ny = (4, cells) if (y1 - y0) > (x1 - x0) else (cells, 4)
        dx, dy = (x1 - x0) / nx, (y1 - y0) / ny
        for i in range(nx):
            cx = x0 + (i + 0.5) * dx - xb
            for k in range(ny):
                cy = y0 + (k + 0.5) * dy - yb
                z = cx * n_w[0] + cy * n_w[1]
                w = cx * wdir[0] + cy * wdir[1]
                tot += z * (w * w + z * z) * dx * dy
    z0 = (t / 2 - xb) * n_w[0] + (t / 2 - yb) * n_w[1]
    return tot / iw - 2 * z0


def f10_major(p: AngleProps, fy: float, e: float, lb: float | None, cb: float,
              system: str = "us") -> tuple[float, str]:
    my = fy * p.sw
    out = [(1.5 * my, "F10-1 yielding 1.5 My (major axis)")]
    if lb is not None and lb > 0:
        cb = min(cb, CB_MAX_ANGLE)
        g = 4.4 * (-p.beta_w) * p.rz / (lb * p.t)
        mcr = 9 * e * p.area * p.rz * p.t * cb / (8 * lb) * (math.sqrt(1 + g * g) + g)
        if my / mcr <= 1.0:
            m = min((1.92 - 1.17 * math.sqrt(my / mcr)) * my, 1.5 * my)
            eq = "F10-2"
        else:
            m = (0.92 - 0.17 * mcr / my) * mcr
            eq = "F10-3"
        bw = f", beta_w {_ln(-p.beta_w, system, 3)}" if p.beta_w else ", equal legs beta_w 0"
        out.append((m, f"{eq} LTB about the major axis, Mcr by F10-4 (Lb {_ln(lb, system)}, "
                       f"Cb {cb:.2f}{bw})"))
    llb = _leg_buckling(p, fy, e, p.sw)
    if llb:
        out.append(llb)
    return min(out, key=lambda t: t[0])


def f10_minor(p: AngleProps, fy: float, e: float) -> tuple[float, str]:
    out = [(1.5 * fy * p.sz, "F10-1 yielding 1.5 My (minor axis)")]
    llb = _leg_buckling(p, fy, e, p.sz_toe)
    if llb:
        out.append(llb)
    return min(out, key=lambda t: t[0])


def f10_geometric(p: AngleProps, fy: float, e: float, s_min: float) -> tuple[float, str]:
    """Restrained angle bent about its geometric axis: F10.1 and F10.3 only."""
    out = [(1.5 * fy * s_min, "F10-1 yielding 1.5 My (geometric axis, restrained)")]
    llb = _leg_buckling(p, fy, e, s_min)
    if llb:
        out.append(llb)
    return min(out, key=lambda t: t[0])


def _leg_buckling(p: AngleProps, fy: float, e: float, sc: float):
    lam = max(p.d, p.b) / p.t
    root = math.sqrt(e / fy)
    if lam <= 0.54 * root:
        return None
    if lam <= 0.91 * root:
        return (fy * sc * (2.43 - 1.72 * lam / root),
                f"F10-6 leg local buckling (noncompact, b/t {lam:.3g})")
    return (0.71 * e / lam**2 * sc, f"F10-7/F10-8 leg local buckling (slender, b/t {lam:.3g})")


# ------------------------------------------------------------------ the checks of one state
def applies(sec, basis: str, material_kind: str) -> str:
    """"F9", "F10" or "" for this section on this basis."""
    if basis != "asd" or material_kind not in ("steel", "stainless"):
        return ""
    if sec.shape == "tee" and sec.axis == "strong" and sec.iy and sec.j and sec.ry:
        return "F9"
    if sec.shape == "angle" and sec.dims.get("iz") and sec.iy:
        return "F10"
    return ""


def _segments(job, st):
    braced = brace_points(job)[0]
    return braced, [(a, b, free) for a, b, free, *_ in st.ltb_segments]


def _cb(m, a, b, mmax, free, cb_one) -> float:
    if cb_one or free or mmax <= 0:
        return 1.0
    q = [abs(float(m(a + f * (b - a)))) for f in (0.25, 0.5, 0.75)]
    return cb_factor(mmax, *q)


def bending_check(job, sol, st, sec, cb_one: bool = False):
    """The F9 (tee) or F10 (angle) bending check of one solved state, or None."""

    kind = applies(sec, st.basis, getattr(job.material, "kind", ""))
    if not kind:
        return None
    fy, e = job.material.fy, job.material.e
    # Omega_b, or a below-the-hook beam's ASME BTH-1 design factor Nd (checks._design_factor)
    om = st.flexure.omega or OMEGA_B
    bth = om != OMEGA_B  # Mn capped at 1.10 Fy S too (ASME BTH-1 3-2.3.1, from memory)
    # the job's safety factor on yield, where larger than Omega_b (and than 1.67), is taken
    # on every limit state of F9 and F10 too, as `checks.on_yield` does for the other shapes
    raised = job_omega(om, job.criteria.safety_factor) != om
    om = job_omega(om, job.criteria.safety_factor)
    m = sol.moment
    braced, segs = _segments(job, st)
    worst = None
    for a, b, free in segs:
        lb = None if braced else b - a
        ex = m.extremes(a, b)
        if kind == "F9":
            r = _f9_segment(sec, fy, e, lb, ex, om, bth, job.units,
                            job.criteria.safety_factor)
        else:
            mmax = ex.abs_max
            cb = _cb(m, a, b, mmax, free, cb_one)
            r = _f10_segment(job, sec, fy, e, lb, cb, ex, om, bth)
        if r and (worst is None or r[0] > worst[0]):
            worst = r + ((a, b),)
    ratio, demand, limit, at, text, params, (a, b) = worst

    pos = lambda x: units.fmt(x, "length", job.units)  # noqa: E731
    seg = "" if len(segs) == 1 else f"unbraced length {pos(a)} to {pos(b)} governs"
    if kind == "F9":
        clause, src = "AISC 360-16 F9", F9_SOURCE
        formula = (f"{BASIS_WORDS[st.basis]}: M <= Mn / Omega_b, Mn by {text}, Omega_b "
                   f"{om:g} (F9 yielding, lateral-torsional buckling, flange and stem local "
                   "buckling by the sign of the moment)")
    else:
        clause, src = "AISC 360-16 F10", F10_SOURCE
        formula = f"{BASIS_WORDS[st.basis]}: {text}"
    clause, src = yield_cap_provenance(text, clause, src)
    if raised:
        formula += (f"; Omega_b {st.flexure.omega or OMEGA_B:g} raised to the job's safety "
                    f"factor {om:g}")
    if braced:
        held = ("held against twist all along (beam.restrained): no LTB" if job.restrained
                else "continuously braced (beam.braced): no LTB")
        seg = "; ".join(x for x in (seg, held) if x)
    return Check("bending", demand, limit, "N*m", formula, at, detail=seg, clause=clause,
                 source=src, params=params, extra={"cb": params.get("Cb", 1.0)})


def _f9_segment(sec, fy, e, lb, ex, omega=OMEGA_B, bth=False, system="us", sf=None):
    p = tee_props(sec, fy, e)
    top = flange_on_top(sec)
    # sagging (M > 0) compresses the top fibres
    # a moment of rounding size (1e-9 of the largest: a scaled state's end value) is none:
    # it would put the stem "in compression" along the length and bring in F9-13
    noise = 1e-9 * max(abs(ex.max), abs(ex.min))
    m_stem_t = max(ex.max, 0.0) if top else max(-ex.min, 0.0)
    m_stem_c = max(-ex.min, 0.0) if top else max(ex.max, 0.0)
    m_stem_t, m_stem_c = (x if x > noise else 0.0 for x in (m_stem_t, m_stem_c))
    at_t = ex.max_at if top else ex.min_at
    at_c = ex.min_at if top else ex.max_at
    mn_t, why_t = f9_stem_tension(p, lb, system)
    mn_c, why_c = f9_stem_compression(p, lb, system)
    if m_stem_c > 0:
        both = f9_ltb_with_compression(p, lb, system)
        if both and both[0] < mn_t:
            mn_t, why_t = both
    if bth:
        mn_t, why_t = _bth_cap(mn_t, why_t, fy * p.sx)
        mn_c, why_c = _bth_cap(mn_c, why_c, fy * p.sx)
    # the code's own figures in params; the job's first-yield cap beside the one it sets
    params = {"Lb": lb or 0.0, "Mn_stem_tension": mn_t, "Mn_stem_compression": mn_c,
              "My": fy * p.sx, "Mp": min(fy * p.zx, 1.6 * fy * p.sx), "Cb": 1.0}
    mn_t, why_t = _sf_cap(mn_t, why_t, fy * p.sx, omega, sf)
    mn_c, why_c = _sf_cap(mn_c, why_c, fy * p.sx, omega, sf)
    allow_t, allow_c = mn_t / omega, mn_c / omega
    r_t = m_stem_t / allow_t if allow_t > 0 else math.inf
    r_c = m_stem_c / allow_c if allow_c > 0 else math.inf
    if r_c >= r_t and m_stem_c > 0:
        return (r_c, m_stem_c, allow_c, at_c, f"{why_c} (stem in compression; Cb 1.0)",
                _with_cap(params, "Mn_stem_compression", mn_c, omega))
    return (r_t, m_stem_t, allow_t, at_t, f"{why_t} (stem in tension)",
            _with_cap(params, "Mn_stem_tension", mn_t, omega))


def _with_cap(params: dict, key: str, mn: float, omega: float, cap_key: str = "M_yield_cap"
              ) -> dict:
    """`params` with the capped allowable moment beside the code's own `params[key]` where
    the job's first-yield cap (`_sf_cap`) lowered it (docs/json.md)."""
    if mn < params[key] * (1 - 1e-12):
        return {**params, cap_key: mn / omega}
    return params


def _bth_cap(mn, why, my):
    """ASME BTH-1 3-2.3.1 (from memory): Fb = 1.10 Fy / Nd at most, i.e. Mn <= 1.10 My."""
    if mn > 1.10 * my:
        return 1.10 * my, why + " capped at 1.10 Fy S (ASME BTH-1 3-2.3.1)"
    return mn, why


def _sf_cap(mn, why, my, omega, sf):
    """The job's safety factor on yield in bending (checks.on_yield): Mn / Omega_b no more
    than first yield over it, My / safety_factor."""
    if sf and sf > 0 and mn / omega > my / sf * (1 + 1e-12):
        return my * omega / sf, why + f" {yield_cap_words(sf)}"
    return mn, why


def _f10_segment(job, sec, fy, e, lb, cb, ex, omega=OMEGA_B, bth=False):
    p = angle_props(sec)
    mmax = ex.abs_max
    at = ex.abs_max_at
    if job.restrained:
        mn, why = f10_geometric(p, fy, e, min(sec.sx_top, sec.sx_bot))
        if bth:
            mn, why = _bth_cap(mn, why, fy * min(sec.sx_top, sec.sx_bot))
        params = {"Lb": 0.0, "Mn": mn, "Cb": 1.0}
        mn, why = _sf_cap(mn, why, fy * min(sec.sx_top, sec.sx_bot), omega,
                          job.criteria.safety_factor)
        allow = mn / omega
        text = (f"restrained angle (beam.restrained) bent about its geometric axis: M <= Mn / "
                f"Omega_b, Mn by {why}, Omega_b {omega:g}")
        return (mmax / allow if allow > 0 else math.inf, mmax, allow, at, text,
                _with_cap(params, "Mn", mn, omega))
    mnw, why_w = f10_major(p, fy, e, lb, cb, job.units)
    mnz, why_z = f10_minor(p, fy, e)
    if bth:
        mnw, why_w = _bth_cap(mnw, why_w, fy * p.sw)
        mnz, why_z = _bth_cap(mnz, why_z, fy * p.sz)
    sf = job.criteria.safety_factor
    own = {"Mnw": mnw, "Mnz": mnz}
    mnw, why_w = _sf_cap(mnw, why_w, fy * p.sw, omega, sf)
    mnz, why_z = _sf_cap(mnz, why_z, fy * p.sz, omega, sf)
    c, s = math.cos(p.alpha), math.sin(p.alpha)
    # H2-1: Mw / (Mnw / Omega) + Mz / (Mnz / Omega) <= 1 with Mw = M cos a, Mz = M sin a
    inv = omega * (c / mnw + s / mnz)
    allow = 1 / inv
    text = (f"angle not restrained: M resolved on the principal axes, Mw = M cos a, "
            f"Mz = M sin a (a = {math.degrees(p.alpha):.1f} deg), combined by H2-1 as "
            f"Mw Omega / Mnw + Mz Omega / Mnz <= 1 (signs ignored: conservative); major axis "
            f"Mnw by {why_w}; minor axis Mnz by {why_z}; Omega_b {omega:g}")
    params = {"Lb": lb or 0.0, **own, "alpha": p.alpha, "Cb": min(cb, CB_MAX_ANGLE),
              "Mw": mmax * c, "Mz": mmax * s}
    params = _with_cap(_with_cap(params, "Mnw", mnw, omega, "Mw_yield_cap"), "Mnz", mnz,
                       omega, "Mz_yield_cap")
    return (mmax / allow, mmax, allow, at, text, params)


def deflection_words(job, sec) -> str:
    """What the deflection check means for an angle."""

    f = principal_factors(sec)
    if f is None:
        return ""
    if job.restrained:
        return "restrained angle: deflection about the geometric axis"
    return (f"angle not restrained: deflection about its principal axes, vertical sag "
            f"{f[0]:.3g} x the geometric-axis figure (shown), and it also moves sideways "
            f"{f[1]:.3g} x that figure")


def torsion_note(job, sec) -> str:
    """A quantified caution for loads in the plane of the web of a channel, tee or angle:
    the load acts off the shear centre and twists the member."""

    shape = sec.shape
    d = sec.dims
    if shape not in ("channel", "angle", "tee") or not sec.j:
        return ""
    if shape == "channel" and sec.axis == "strong":
        # shear centre behind the web: e0 = 3 bf'^2 tf / (6 bf' tf + h tw) from the web
        # mid-line (thin-walled channel, common practice), plus half the web
        bm = d["bf"] - d["tw"] / 2
        h = d["d"] - d["tf"]
        e0 = 3 * bm**2 * d["tf"] / (6 * bm * d["tf"] + h * d["tw"]) + d["tw"] / 2
        t_max = max(d["tf"], d["tw"])
        where = ("the shear centre lies behind the web; measured to the web's inside face, "
                 "conservative for a load on the web's centre line")
    elif shape == "angle":
        # shear centre at the heel (legs' crossing); a load through the centroid is off it
        e0 = d["x"] - d["t"] / 2
        t_max = d["t"]
        where = "between the centroid and the heel (legs' crossing)"
    else:
        if sec.axis != "strong":
            return ""
        # a tee loaded in its plane of symmetry passes through the shear centre: no torsion
        return ""
    loads = [ld for ld in job.loads if ld.kind == "point"]
    p = max((abs(ld.value) for ld in loads), default=0.0) / job.members
    w = max((max(abs(ld.w1), abs(ld.w2)) for ld in job.loads
             if ld.kind in ("uniform", "linear")), default=0.0) / job.members
    sy = job.units
    parts = []
    if p:
        t = p * e0
        tau = t_max * t / sec.j
        parts.append(f"the largest point load {units.fmt(p, 'force', sy)} gives a torque "
                     f"{units.fmt(t, 'moment', sy)}, a rough St Venant shear stress "
                     f"t T / J = {units.fmt(tau, 'stress', sy)} if the ends alone resist it")
    if w:
        per = "ft/ft" if sy == "us" else "m/m"
        parts.append(f"the largest line load gives a torque of {units.fmt(w * e0, 'force', sy)}"
                     f"*{per} along the member")
    if not parts:
        return ""
    off = f"{e0 / units.IN:.3g} in" if sy == "us" else f"{e0 * 1000:.3g} mm"
    if job.restrained:  # held against twist all along: the restraint takes the torque
        return (f"{shape} held against twist (beam.restrained): the loads act {off} off the "
                f"shear centre ({where}), so the restraint and its fastenings carry the torque: "
                + "; ".join(p.split(", a rough")[0] for p in parts) + " (not checked here).")
    return (f"{shape}: the loads act {off} off the shear centre "
            f"({where}) and twist it; " + "; ".join(parts) + ". AISC 360 has no beam check for "
            "this here (AISC Design Guide 9 covers torsion): load through the shear centre, "
            "brace it against twist, or have it checked. Rough estimate, not a check.")


def open_unchecked(job, st):
    """Unchecked limit states of open shapes (see `shopbeam.design.checks.Unchecked`)."""

    sec = st.section or job.section
    out = []
    steel = getattr(job.material, "kind", "") in ("steel", "stainless")
    # a channel bent about its weak axis is loaded along its axis of symmetry, which holds
    # the shear centre: no twist; a restrained member (beam.restrained) is held against it.
    # The twist is the shape's, whatever the metal: an aluminium or typed-in channel twists
    # as a steel one does
    kind = getattr(job.material, "kind", "")
    if sec.shape in ("channel", "angle") and kind != "lumber" and not job.restrained and not (
            sec.shape == "channel" and sec.axis != "strong"):
        clause = {"aluminum": "ADM 2015 chapter H (torsion, from memory)"}.get(
            kind, "AISC 360-16 H3 / Design Guide 9")
        out.append(Unchecked(
            "torsion from loads off the shear centre",
            "the loads act off the shear centre and twist the member; the cautions give a "
            "rough figure, not a check (AISC Design Guide 9 method not applied), so no rating "
            "is posted on it. A deck, shelf or sheeting fastened along the member holds it "
            "against twist: say so with beam.restrained = true",
            clause, blocks_rating=True))
    if sec.shape == "tee" and sec.axis != "strong" and steel and st.basis == "asd":
        out.append(Unchecked("lateral-torsional and local buckling of a tee bent about its "
                             "weak axis", "F9 covers bending about the axis of symmetry only; "
                             "first yield is checked", "AISC 360-16 F9", blocks_rating=True))
    if sec.shape == "angle" and steel and st.basis == "asd" and not applies(
            sec, st.basis, job.material.kind):
        out.append(Unchecked("angle bending about the principal axes (F10)",
                             "the section has no principal-axis properties", "AISC 360-16 F10",
                             blocks_rating=True))
    if sec.shape in ("tee", "angle") and steel and st.basis == "first-yield":
        out.append(Unchecked("lateral-torsional and local buckling (F9/F10)",
                             "basis = \"first-yield\" checks first yield only; use the AISC "
                             "basis (the default) for F9/F10", "AISC 360-16 F9/F10",
                             blocks_rating=True))
    return out


def replaces_angle_warning(job) -> bool:
    """True when the angle is checked by F10 (principal axes, or restrained as the job says),
    so the section's warning about geometric-axis bending no longer applies."""

    sec = job.section
    if sec.shape != "angle":
        return False
    return bool(applies(sec, basis_of(job), getattr(job.material, "kind", "")))
