"""Sections: the `Section` record and the calculators that build one from dimensions.

A section is the cross-section of the member as the checks need it, about the bending axis
the job chose (SI floats: m, m^2, m^3, m^4). Standard shapes come from the built-in catalog
(`shopbeam.members.catalog`); everything else is computed here from the shop's dimensions by one
small engine: each shape is a list of rectangles and quarter discs (positive or cut out),
and area, centroid, second moments, elastic and plastic moduli follow exactly from those
parts. Torsion constants use the usual thin-wall formulas named beside each.

Job-file keys of an inline ``[beam.section]`` table, by ``shape`` (every length is a string
with its unit; a wall may also be a gauge such as ``"14 ga"``):

=================  =============================================================================
rect-tube          ``depth``, ``width`` (outside), ``wall``; optional ``corner_radius`` (outside;
                   default 2 x design wall, as the AISC Shapes Database computes HSS), and
                   ``design_wall`` = ``"nominal"`` | ``"0.93"`` (or any factor). Without it
                   the factor follows the material (0.93 x nominal for ERW tube: A500, A53
                   and as-welded A513, AISC 360 B4.2; nominal for DOM, stainless and
                   aluminium); with no material known, 0.93 (the lower, safer figure). ``square-tube``: ``size``.
round-tube, pipe   ``od``, ``wall``; optional ``design_wall`` as above.
rect-bar           ``depth``, ``width`` (``flat-bar`` is the same; ``square-bar``: ``size``).
                   Sawn lumber is a rect-bar too; the catalog knows ``"2x6"`` etc.
round-bar          ``diameter``.
angle              ``depth`` (leg in the bending plane), ``width`` (the other leg), ``thickness``;
                   optional ``fillet_radius`` (root), ``leg`` = ``"bottom"`` (default: the
                   horizontal leg at the bottom, an L as written) | ``"top"``.
channel            ``depth``, ``flange_width``, ``flange_thickness``, ``web_thickness``;
                   optional ``fillet_radius``; weak axis: ``toes`` = ``"down"`` (default) | ``"up"``.
i-beam             ``depth``, ``flange_width``, ``flange_thickness``, ``web_thickness``;
                   optional ``fillet_radius``.
tee                ``depth``, ``flange_width``, ``flange_thickness``, ``stem_thickness``;
                   optional ``fillet_radius``, ``flange`` = ``"top"`` (default) | ``"bottom"``.
double-channel     ``channel`` (a catalog designation, e.g. ``"C6x8.2"``), ``arrangement`` =
                   ``"back-to-back"`` | ``"toe-to-toe"`` (boxed), optional ``gap`` (between the
                   backs or the toes; default 0).
cover-plated       ``base`` (a catalog W/S/M/HP or rectangular HSS designation),
                   ``plate_width``, ``plate_thickness``, ``plate`` = ``"top"`` | ``"bottom"``
                   | ``"both"`` (default ``"bottom"``: a plate on the tension side of a
                   beam sagging under its load).
custom             ``area``, ``ix``, and ``sx`` or ``depth`` (or ``sx_top`` and ``sx_bot``);
                   optional ``shear_area`` (default: area / 2, stated in the report), ``zx``,
                   ``iy``, ``sy``, ``zy``, ``j``, ``cw``, ``weight`` (e.g. ``"12 lb/ft"``).
=================  =============================================================================

Every shape also takes ``axis`` = ``"strong"`` (default) | ``"weak"`` and an optional
``name``. A catalog section can be oriented with a table too: ``designation`` plus
``axis``, and ``leg`` (angles), ``toes`` (channels, weak axis) or ``flange`` (tees). The ``dims`` mapping of a `Section` holds what the strength checks need, in SI:

- rect-tube: ``h``, ``b`` (outside, h in the bending plane), ``t_nom``, ``t_des``, ``r_out``,
  ``h_flat``, ``b_flat`` (h - 3 t_des, b - 3 t_des, AISC 360 B4.1b), ``h_t``, ``b_t``.
- round-tube/pipe: ``od``, ``t_nom``, ``t_des``, ``D_t``.  round-bar: ``od``.
- rect-bar: ``h``, ``b``.
- i-beam, channel: ``d``, ``bf``, ``tf``, ``tw``, ``kdes``, ``ho``, ``h_tw``, ``bf_2tf`` (``b_t``
  for channels), ``rts`` where known; channel also ``x`` (centroid from the back of the web);
  an i-beam typed in by its dimensions also ``built_up`` = 1.0 (`members.resolve`: checked as
  welded from plates, not as a rolled shape).
- tee: ``d``, ``bf``, ``tf``, ``tw``, ``kdes``, ``y`` (flange outside to centroid), ``d_tw``,
  ``bf_2tf``.
- angle: ``d`` (leg in the bending plane), ``b``, ``t``, ``y`` (heel to centroid along d),
  ``x``, ``b_t``, ``iz``, ``rz`` (minor principal axis), ``tan_alpha``; catalog angles also
  ``iw``, ``sw``, ``sz`` (principal-axis values of the AISC Shapes Database v15.0).
- double-channel: the channel's keys plus ``gap``, ``width`` (overall); cover-plated: the
  base's keys plus ``plate_b``, ``plate_t``, ``width``. Both also carry
  ``weak_shear_area`` (used when turned).
"""

from __future__ import annotations

import difflib
import math
from dataclasses import dataclass, replace
from typing import Mapping

from shopbeam.errors import InputError
from shopbeam.members import gauges
from shopbeam.units import parse

ERW_FACTOR = 0.93  # AISC 360-16 B4.2: design wall of ERW HSS = 0.93 x nominal
ANGLE_WARNING = (
    "angle bent about its geometric axis: an angle that is not braced against twisting and "
    "lateral movement bends about its principal axes and is weaker and deflects more "
    "(minor principal axis shown as Iz); brace it or have it checked"
)


@dataclass(frozen=True)
class Section:
    """Cross-section properties about the bending axis chosen by orientation (SI floats).

    ``shear_area``: V / shear_area is the shear stress the check compares with its limit:
    the web area for thin-walled shapes (d*tw for I-shapes and channels, 2*h_flat*t for
    rectangular tube, A/2 for round tube), the peak-stress equivalent for solid bars (2A/3
    rectangular, 3A/4 round). See the module docstring for the ``dims`` keys.
    """

    designation: str
    shape: str
    area: float
    ix: float
    sx_top: float
    sx_bot: float
    zx: float | None
    iy: float | None
    sy: float | None
    zy: float | None
    rx: float | None
    ry: float | None
    j: float | None
    cw: float | None
    shear_area: float
    depth: float
    axis: str
    dims: Mapping[str, float]
    source: str
    warnings: tuple[str, ...] = ()
    mass_per_length: float | None = None
    mass_density: float | None = None  # density a tabulated weight assumes (steel tables)

    @property
    def sx(self) -> float:
        return min(self.sx_top, self.sx_bot)

    def self_weight_mass(self, density: float) -> float:
        """kg/m of the self-weight load: area x density (the job file's rule), or the weight
        typed in for the section (`weight`). A catalog shape's tabulated weight (what sizing
        ranks and shows) is not used here: for tube it is of the nominal wall, about 7 % over
        the design area's."""
        if self.mass_per_length is not None and self.mass_density is None:
            return self.mass_per_length
        return self.area * density

    def weight_per_length(self, density: float) -> float:
        """kg/m: the typed-in weight; or the tabulated weight, scaled when the job's material
        is not the one the table assumes (an AISC shape in aluminium); else area x density."""
        if self.mass_per_length is not None:
            if self.mass_density is None or abs(density / self.mass_density - 1) < 0.02:
                return self.mass_per_length
            return self.mass_per_length * density / self.mass_density
        return self.area * density


def principal_factors(sec: Section) -> tuple[float, float] | None:
    """An angle bent in the vertical plane without restraint curves about both principal
    axes: (vertical, sideways) deflection per unit of the geometric-axis figure, from
    Ix = Iw cos^2 a + Iz sin^2 a and Iw = Ix + Iy - Iz (mechanics of the principal axes).
    None for other shapes."""
    if sec.shape != "angle" or not sec.dims.get("iz") or not sec.iy:
        return None
    ix, iz = sec.ix, sec.dims["iz"]
    iw = ix + sec.iy - iz
    if iw - iz <= 0:
        return None
    c2, s2 = (ix - iz) / (iw - iz), (iw - ix) / (iw - iz)
    return ix * (c2 / iw + s2 / iz), ix * math.sqrt(max(c2 * s2, 0.0)) * abs(1 / iz - 1 / iw)


def bending_ix(sec: Section, restrained: bool = False) -> float:
    """The I that gives the vertical deflection: Ix, except for an angle that is not
    restrained, where Ix / (vertical factor of `principal_factors`)."""
    f = None if restrained else principal_factors(sec)
    return sec.ix / f[0] if f else sec.ix


# ------------------------------------------------------------------ geometry engine
@dataclass(frozen=True)
class Part:
    """A rectangle (z0..z1, y0..y1), a quarter disc (centre zc, yc; radius r; quadrant
    signs sz, sy) or a convex polygon (``pts``, (z, y) pairs counter-clockwise), with sign
    +1 (material) or -1 (cut out). y is up (the bending plane)."""

    kind: str
    a: float
    b: float
    c: float
    d: float
    sign: float = 1.0
    sz: float = 1.0
    sy: float = 1.0
    pts: tuple[tuple[float, float], ...] = ()

    def t(self) -> "Part":
        """The same part with y and z swapped (for the other axis)."""
        if self.kind == "rect":
            return Part("rect", self.c, self.d, self.a, self.b, self.sign)
        if self.kind == "poly":
            return poly([(y, z) for z, y in self.pts], self.sign)
        return Part("qdisk", self.b, self.a, self.c, 0.0, self.sign, self.sy, self.sz)

    def _poly_sums(self):
        """(A, Qz, Qy, Iyy_origin, Izz_origin, Izy_origin) of the polygon about the origin."""
        a = qy = qz = iy = iz = izy = 0.0
        pts = self.pts
        for k in range(len(pts)):
            z0, y0 = pts[k]
            z1, y1 = pts[(k + 1) % len(pts)]
            cr = z0 * y1 - z1 * y0
            a += cr
            qy += (y0 + y1) * cr
            qz += (z0 + z1) * cr
            iy += (y0 * y0 + y0 * y1 + y1 * y1) * cr
            iz += (z0 * z0 + z0 * z1 + z1 * z1) * cr
            izy += (z0 * y1 + 2 * z0 * y0 + 2 * z1 * y1 + z1 * y0) * cr
        return a / 2, qz / 6, qy / 6, iy / 12, iz / 12, izy / 24

    def area(self) -> float:
        if self.kind == "rect":
            return self.sign * (self.b - self.a) * (self.d - self.c)
        if self.kind == "poly":
            return self.sign * self._poly_sums()[0]
        return self.sign * math.pi * self.c**2 / 4

    def cy(self) -> float:
        if self.kind == "rect":
            return (self.c + self.d) / 2
        if self.kind == "poly":
            s = self._poly_sums()
            return s[2] / s[0]
        return self.b + self.sy * 4 * self.c / (3 * math.pi)

    def cz(self) -> float:
        if self.kind == "rect":
            return (self.a + self.b) / 2
        if self.kind == "poly":
            s = self._poly_sums()
            return s[1] / s[0]
        return self.a + self.sz * 4 * self.c / (3 * math.pi)

    def i_own(self) -> float:
        """Second moment about its own centroid, horizontal axis (signed)."""
        if self.kind == "rect":
            return self.sign * (self.b - self.a) * (self.d - self.c) ** 3 / 12
        if self.kind == "poly":
            a, qz, qy, iy, iz, izy = self._poly_sums()
            return self.sign * (iy - qy * qy / a)
        return self.sign * (math.pi / 16 - 4 / (9 * math.pi)) * self.c**4

    def ixy_own(self) -> float:
        if self.kind == "rect":
            return 0.0
        if self.kind == "poly":
            a, qz, qy, iy, iz, izy = self._poly_sums()
            return self.sign * (izy - qz * qy / a)
        r = self.c
        a = math.pi * r * r / 4
        e = 4 * r / (3 * math.pi)
        return self.sign * self.sz * self.sy * (r**4 / 8 - a * e * e)

    def y_range(self) -> tuple[float, float]:
        if self.kind == "rect":
            return self.c, self.d
        if self.kind == "poly":
            ys = [y for _, y in self.pts]
            return min(ys), max(ys)
        return (self.b, self.b + self.c) if self.sy > 0 else (self.b - self.c, self.b)

    def integrals(self, lo: float, hi: float) -> tuple[float, float]:
        """(area, first moment about y=0) of the part between heights lo and hi (signed)."""
        y0, y1 = self.y_range()
        lo, hi = max(lo, y0), min(hi, y1)
        if hi <= lo:
            return 0.0, 0.0
        if self.kind == "rect":
            w = self.b - self.a
            return self.sign * w * (hi - lo), self.sign * w * (hi * hi - lo * lo) / 2
        if self.kind == "poly":
            clipped = _clip(_clip(list(self.pts), lo, 1.0), hi, -1.0)
            if len(clipped) < 3:
                return 0.0, 0.0
            a, _, qy, *_ = Part("poly", 0, 0, 0, 0, pts=tuple(clipped))._poly_sums()
            return self.sign * a, self.sign * qy
        r, yc = self.c, self.b
        # v = distance from the centre line along the quadrant's y direction
        v0, v1 = sorted(((lo - yc) * self.sy, (hi - yc) * self.sy))
        v0, v1 = max(v0, 0.0), min(v1, r)

        def fa(v):  # integral of sqrt(r^2 - v^2)
            v = min(max(v, -r), r)
            return 0.5 * (v * math.sqrt(max(r * r - v * v, 0.0)) + r * r * math.asin(v / r))

        def fm(v):  # integral of v * sqrt(r^2 - v^2)
            return -((max(r * r - v * v, 0.0)) ** 1.5) / 3

        area = fa(v1) - fa(v0)
        mv = fm(v1) - fm(v0)
        moment = yc * area + self.sy * mv  # y = yc + sy * v
        return self.sign * area, self.sign * moment


def poly(pts, sign: float = 1.0) -> Part:
    """A convex polygon part; the points are put counter-clockwise."""
    pts = tuple((float(z), float(y)) for z, y in pts)
    probe = Part("poly", 0, 0, 0, 0, pts=pts)._poly_sums()[0]
    if probe < 0:
        pts = pts[::-1]
    return Part("poly", 0.0, 0.0, 0.0, 0.0, sign, pts=pts)


def _clip(pts, level: float, keep: float):
    """Clip a polygon to y >= level (keep=+1) or y <= level (keep=-1)."""
    out = []
    n = len(pts)
    for k in range(n):
        p, q = pts[k], pts[(k + 1) % n]
        dp, dq = keep * (p[1] - level), keep * (q[1] - level)
        if dp >= 0:
            out.append(p)
        if (dp >= 0) != (dq >= 0) and dp != dq:
            f = dp / (dp - dq)
            out.append((p[0] + f * (q[0] - p[0]), level))
    return out


@dataclass(frozen=True)
class AxisProps:
    area: float
    ybar: float
    i: float
    c_top: float
    c_bot: float
    z: float


def axis_props(parts: list[Part]) -> AxisProps:
    """Area, centroid height, I about the horizontal centroidal axis, fibre distances and
    plastic modulus of a set of parts."""
    area = sum(p.area() for p in parts)
    if area <= 0:
        raise ValueError("section has no area")
    ybar = sum(p.area() * p.cy() for p in parts) / area
    i = sum(p.i_own() + p.area() * (p.cy() - ybar) ** 2 for p in parts)
    ranges = [p.y_range() for p in parts if p.sign > 0]
    top = max(r[1] for r in ranges)
    bot = min(r[0] for r in ranges)

    def below(y):
        return sum(p.integrals(bot - 1.0, y)[0] for p in parts)

    half = area / 2
    if abs(below(ybar) - half) <= 1e-12 * area:
        pna = ybar  # symmetric about the axis: the plastic axis is the centroid
    else:
        lo, hi = bot, top
        for _ in range(200):
            mid = (lo + hi) / 2
            if below(mid) < half:
                lo = mid
            else:
                hi = mid
            if hi - lo < 1e-11 * (top - bot):
                break
        pna = (lo + hi) / 2
    z = 0.0
    for p in parts:
        a_up, m_up = p.integrals(pna, top + 1.0)
        a_dn, m_dn = p.integrals(bot - 1.0, pna)
        z += (m_up - pna * a_up) - (m_dn - pna * a_dn)
    return AxisProps(area, ybar, i, top - ybar, ybar - bot, z)


def product_of_inertia(parts: list[Part]) -> float:
    area = sum(p.area() for p in parts)
    yb = sum(p.area() * p.cy() for p in parts) / area
    zb = sum(p.area() * p.cz() for p in parts) / area
    return sum(p.ixy_own() + p.area() * (p.cy() - yb) * (p.cz() - zb) for p in parts)


def transpose(parts: list[Part]) -> list[Part]:
    return [p.t() for p in parts]


def rect(z0, z1, y0, y1, sign=1.0) -> Part:
    return Part("rect", z0, z1, y0, y1, sign)


def rounded_rect(b: float, h: float, r: float, sign: float = 1.0) -> list[Part]:
    """Rectangle b wide, h high, centred on the origin, with corner radius r."""
    r = max(0.0, min(r, b / 2, h / 2))
    parts = [rect(-b / 2, b / 2, -h / 2 + r, h / 2 - r, sign)]
    if r > 0:
        parts += [rect(-b / 2 + r, b / 2 - r, h / 2 - r, h / 2, sign),
                  rect(-b / 2 + r, b / 2 - r, -h / 2, -h / 2 + r, sign)]
        for sz in (1, -1):
            for sy in (1, -1):
                parts.append(Part("qdisk", sz * (b / 2 - r), sy * (h / 2 - r), r, 0.0, sign, sz, sy))
    return [p for p in parts if p.area() != 0]


def fillet(zc: float, yc: float, r: float, sz: float, sy: float) -> list[Part]:
    """A fillet filling the corner at (zc, yc), reaching r along +sz (z) and +sy (y)."""
    if r <= 0:
        return []
    z0, z1 = sorted((zc, zc + sz * r))
    y0, y1 = sorted((yc, yc + sy * r))
    return [rect(z0, z1, y0, y1),
            Part("qdisk", zc + sz * r, yc + sy * r, r, 0.0, -1.0, -sz, -sy)]


def _sec(designation, shape, parts, *, axis, shear_area, dims, source, j=None, cw=None,
         warnings=(), mass=None, flip=False) -> Section:
    """Build a Section from parts laid out for bending about the horizontal axis."""
    px = axis_props(parts)
    py = axis_props(transpose(parts))
    c_top, c_bot = (px.c_bot, px.c_top) if flip else (px.c_top, px.c_bot)
    cy = max(py.c_top, py.c_bot)
    return Section(
        designation=designation, shape=shape, area=px.area, ix=px.i,
        sx_top=px.i / c_top, sx_bot=px.i / c_bot, zx=px.z,
        iy=py.i, sy=py.i / cy, zy=py.z,
        rx=math.sqrt(px.i / px.area), ry=math.sqrt(py.i / py.area),
        j=j, cw=cw, shear_area=shear_area, depth=c_top + c_bot, axis=axis,
        dims=dict(dims), source=source, warnings=tuple(warnings), mass_per_length=mass,
    )


# ------------------------------------------------------------------ calculators
def _check_pos(**vals):
    for k, v in vals.items():
        if not (v > 0 and math.isfinite(v)):
            raise ValueError(f"{k} must be greater than zero")


def rect_tube(h: float, b: float, t_nom: float, *, t_des: float | None = None,
              r_out: float | None = None, designation: str = "", source: str = "",
              mass: float | None = None) -> Section:
    """Rectangular or square tube, h deep (bending plane) and b wide, outside dimensions.

    t_des defaults to t_nom; r_out (outside corner radius) to 2 x t_des, as the AISC Shapes
    Database computes HSS properties. J = 4 Ap^2 t / p on the wall's mid-line (thin wall).
    """
    t = t_nom if t_des is None else t_des
    _check_pos(depth=h, width=b, wall=t)
    if 2 * t >= min(h, b):
        raise ValueError("the wall is thicker than half the tube width: give outside "
                         "dimensions and the wall thickness")
    r = 2 * t if r_out is None else r_out
    r = min(r, min(h, b) / 2)
    ri = max(r - t, 0.0)
    rm = max(r - t / 2, 0.0)
    ap = (h - t) * (b - t) - (4 - math.pi) * rm * rm
    p = 2 * (h - t) + 2 * (b - t) - (8 - 2 * math.pi) * rm
    j = 4 * ap * ap * t / p
    h_flat, b_flat = h - 3 * t, b - 3 * t
    dims = {"h": h, "b": b, "t_nom": t_nom, "t_des": t, "r_out": r, "h_flat": h_flat,
            "b_flat": b_flat, "h_t": h_flat / t, "b_t": b_flat / t,
            "r_given": r_out is not None}
    if not designation:
        designation = f"rect-tube {_in(h)} x {_in(b)} x {_in(t_nom, 3)}"
    # closed form (fast: the catalog builds hundreds of these); the parts engine gives the
    # same numbers (tests/test_sections.py compares them)
    ao, ixo, zxo = _rounded_rect_props(b, h, r)
    ai, ixi, zxi = _rounded_rect_props(b - 2 * t, h - 2 * t, ri)
    _, iyo, zyo = _rounded_rect_props(h, b, r)
    _, iyi, zyi = _rounded_rect_props(h - 2 * t, b - 2 * t, ri)
    a, ix, zx, iy, zy = ao - ai, ixo - ixi, zxo - zxi, iyo - iyi, zyo - zyi
    return Section(
        designation, "rect-tube", a, ix, ix / (h / 2), ix / (h / 2), zx, iy, iy / (b / 2), zy,
        math.sqrt(ix / a), math.sqrt(iy / a), j, None, 2 * h_flat * t, h,
        "strong" if h >= b else "weak", dims,
        source or f"computed from dimensions (outside corner radius {_in(r, 3)} in)", (), mass)


def _rounded_rect_props(b: float, h: float, r: float) -> tuple[float, float, float]:
    """(A, I, Z) about the horizontal centroidal axis of a solid b x h rectangle with corner
    radius r: the rectangle less four corner squares, plus four quarter discs."""
    if b <= 0 or h <= 0:
        return 0.0, 0.0, 0.0
    r = max(0.0, min(r, b / 2, h / 2))
    qa = math.pi * r * r / 4
    e = 4 * r / (3 * math.pi)
    i_q = (math.pi / 16 - 4 / (9 * math.pi)) * r**4
    ys, yq = h / 2 - r / 2, h / 2 - r + e  # centroid heights of a corner square, quarter disc
    a = b * h - (4 - math.pi) * r * r
    i = b * h**3 / 12 - 4 * ((r**4 / 12 + r * r * ys * ys) - (i_q + qa * yq * yq))
    z = 2 * (b * h * h / 8 - 2 * (r * r * ys - qa * yq))
    return a, i, z


def round_tube(od: float, t_nom: float, *, t_des: float | None = None, shape: str = "round-tube",
               designation: str = "", source: str = "", mass: float | None = None) -> Section:
    """Round tube or pipe by outside diameter and wall. J = 2 I (exact for a ring)."""
    t = t_nom if t_des is None else t_des
    _check_pos(od=od, wall=t)
    if 2 * t >= od:
        raise ValueError("the wall is at least half the diameter (give the outside diameter)")
    di = od - 2 * t
    a = math.pi / 4 * (od**2 - di**2)
    i = math.pi / 64 * (od**4 - di**4)
    z = (od**3 - di**3) / 6
    s = i / (od / 2)
    r = math.sqrt(i / a)
    dims = {"od": od, "t_nom": t_nom, "t_des": t, "D_t": od / t}
    if not designation:
        designation = f"{shape} {_in(od)} x {_in(t_nom, 3)}"
    return Section(designation, shape, a, i, s, s, z, i, s, z, r, r, 2 * i, 0.0, a / 2, od,
                   "n/a", dims, source or "computed from dimensions", (), mass)


def round_bar(d: float, *, designation: str = "", source: str = "",
              mass: float | None = None) -> Section:
    _check_pos(diameter=d)
    a = math.pi * d * d / 4
    i = math.pi * d**4 / 64
    s = i / (d / 2)
    z = d**3 / 6
    r = d / 4
    return Section(designation or f"round-bar {_in(d)}", "round-bar", a, i, s, s, z, i, s, z,
                   r, r, 2 * i, 0.0, 0.75 * a, d, "n/a", {"od": d},
                   source or "computed from dimensions", (), mass)


def rect_bar(h: float, b: float, *, designation: str = "", source: str = "",
             mass: float | None = None) -> Section:
    """Solid rectangle h deep, b wide. J by the series formula for a solid rectangle."""
    _check_pos(depth=h, width=b)
    a = h * b
    ix, iy = b * h**3 / 12, h * b**3 / 12
    lo, hi = min(h, b), max(h, b)
    j = hi * lo**3 * (1 / 3 - 0.21 * lo / hi * (1 - lo**4 / (12 * hi**4)))
    return Section(designation or f"rect-bar {_in(h)} x {_in(b)}", "rect-bar", a, ix,
                   ix / (h / 2), ix / (h / 2), b * h * h / 4, iy, iy / (b / 2), h * b * b / 4,
                   math.sqrt(ix / a), math.sqrt(iy / a), j, 0.0, 2 * a / 3, h,
                   "strong" if h >= b else "weak", {"h": h, "b": b},
                   source or "computed from dimensions", (), mass)


def i_parts(d, bf, tf, tw, r, slope=0.0):
    """I-shape centred on the origin; `slope` is the inner flange surface's slope (0 for
    parallel flanges, 1/6 for American standard S beams), tf the mean flange thickness."""
    q = (bf - tw) / 4  # half of one flange half's projection
    t_web, t_toe = tf + slope * q, tf - slope * q
    parts = []
    for sy in (1, -1):
        o = sy * d / 2
        parts.append(poly([(-bf / 2, o), (-bf / 2, o - sy * t_toe), (-tw / 2, o - sy * t_web),
                           (tw / 2, o - sy * t_web), (bf / 2, o - sy * t_toe), (bf / 2, o)]))
    parts.append(rect(-tw / 2, tw / 2, -d / 2 + t_web, d / 2 - t_web))
    for sz in (1, -1):
        parts += fillet(sz * tw / 2, d / 2 - t_web, r, sz, -1)
        parts += fillet(sz * tw / 2, -d / 2 + t_web, r, sz, 1)
    return parts


def i_shape(d: float, bf: float, tf: float, tw: float, *, r: float = 0.0, axis: str = "strong",
            slope: float = 0.0, designation: str = "", source: str = "",
            mass: float | None = None) -> Section:
    """Doubly symmetric I-shape with web-to-flange fillets of radius r (kdes - tf for
    parallel flanges). `slope`: inner flange slope of a tapered flange (1/6 for S shapes),
    tf then being the mean flange thickness.

    J = (2 bf tf^3 + (d - tf) tw^3) / 3 (open thin-walled, fillets ignored);
    Cw = Iy ho^2 / 4 with ho = d - tf.
    """
    _check_pos(depth=d, flange_width=bf, flange_thickness=tf, web_thickness=tw)
    if 2 * tf >= d or tw >= bf:
        raise ValueError("flanges or web too thick for the depth / flange width")
    parts = i_parts(d, bf, tf, tw, r, slope)
    ho = d - tf
    j = (2 * bf * tf**3 + ho * tw**3) / 3
    py = axis_props(transpose(parts))
    cw = py.i * ho * ho / 4
    kdes = tf + slope * (bf - tw) / 4 + r
    dims = {"d": d, "bf": bf, "tf": tf, "tw": tw, "kdes": kdes, "ho": ho,
            "h_tw": (d - 2 * kdes) / tw, "bf_2tf": bf / (2 * tf)}
    sec = _sec(designation or f"i-beam {_in(d)} x {_in(bf)}", "i-beam", parts, axis="strong",
               shear_area=d * tw, dims=dims, j=j, cw=cw, mass=mass,
               source=source or "computed from dimensions")
    return turn(sec, "weak") if axis == "weak" else sec


def channel_parts(d, bf, tf, tw, r, slope=0.0, r_toe=0.0):
    """Channel with its web's back on z = 0 and toes toward +z, centred on y = 0; `slope`
    is the inner flange slope (1/6 for American standard C), tf the mean thickness; `r_toe`
    the radius that rounds each flange's inner toe corner (the material it takes away is
    taken off, the corner taken as square)."""
    q = (bf - tw) / 2
    t_web, t_toe = tf + slope * q, tf - slope * q
    parts = []
    for sy in (1, -1):
        o = sy * d / 2
        parts.append(poly([(0, o), (0, o - sy * t_web), (tw, o - sy * t_web),
                           (bf, o - sy * t_toe), (bf, o)]))
        r2 = min(r_toe, t_toe, bf - tw)
        if r2 > 0:  # the toe's inner corner at (bf, o - sy t_toe), rounded
            y0 = o - sy * t_toe
            ya, yb = sorted((y0, y0 + sy * r2))
            parts += [rect(bf - r2, bf, ya, yb, -1.0),
                      Part("qdisk", bf - r2, y0 + sy * r2, r2, 0.0, 1.0, 1.0, -sy)]
    parts.append(rect(0, tw, -d / 2 + t_web, d / 2 - t_web))
    parts += fillet(tw, d / 2 - t_web, r, 1, -1) + fillet(tw, -d / 2 + t_web, r, 1, 1)
    return parts


def channel(d: float, bf: float, tf: float, tw: float, *, r: float = 0.0, axis: str = "strong",
            toes: str = "down", slope: float = 0.0, designation: str = "", source: str = "",
            mass: float | None = None, r_toe: float = 0.0) -> Section:
    """Channel; `slope` is the inner flange slope of a tapered flange (1/6 for C shapes,
    0.08 for UPN), tf then the mean flange thickness; r the root fillet radius, r_toe the
    flange toes' rounding."""
    _check_pos(depth=d, flange_width=bf, flange_thickness=tf, web_thickness=tw)
    if 2 * tf >= d or tw >= bf:
        raise ValueError("flanges or web too thick for the depth / flange width")
    parts = channel_parts(d, bf, tf, tw, r, slope, r_toe)
    ho = d - tf
    j = (2 * (bf - tw / 2) * tf**3 + ho * tw**3) / 3
    pz = axis_props(transpose(parts))
    x = pz.c_bot  # back of web to centroid (z from 0)
    kdes = tf + slope * (bf - tw) / 2 + r
    # Cw of a channel (thin-walled, mid-line): tf b^3 h^2 / 12 * (3 b tf + 2 h tw)/(6 b tf + h tw)
    bm = bf - tw / 2
    cw = tf * bm**3 * ho**2 / 12 * (3 * bm * tf + 2 * ho * tw) / (6 * bm * tf + ho * tw)
    dims = {"d": d, "bf": bf, "tf": tf, "tw": tw, "kdes": kdes, "ho": ho, "x": x,
            "h_tw": (d - 2 * kdes) / tw, "b_t": bf / tf}
    sec = _sec(designation or f"channel {_in(d)} x {_in(bf)}", "channel", parts,
               axis="strong", shear_area=d * tw, dims=dims, j=j, cw=cw, mass=mass,
               source=source or ("computed from dimensions" + (
                   f" (flange slope {slope:.3g})" if slope else "")))
    return turn(sec, "weak", toes=toes) if axis == "weak" else sec


def tee(d: float, bf: float, tf: float, tw: float, *, r: float = 0.0, flange: str = "top",
        axis: str = "strong", designation: str = "", source: str = "",
        mass: float | None = None) -> Section:
    """Tee: flange bf x tf with a stem tw thick, d overall; flange on top by default."""
    _check_pos(depth=d, flange_width=bf, flange_thickness=tf, stem_thickness=tw)
    if tf >= d or tw >= bf:
        raise ValueError("flange or stem too thick for the depth / flange width")
    parts = [rect(-bf / 2, bf / 2, d - tf, d), rect(-tw / 2, tw / 2, 0, d - tf)]
    for sz in (1, -1):
        parts += fillet(sz * tw / 2, d - tf, r, sz, -1)
    px = axis_props(parts)
    y = d - px.ybar  # flange outside to centroid
    j = (bf * tf**3 + (d - tf / 2) * tw**3) / 3
    cw = (bf**3 * tf**3 / 4 + (d - tf / 2) ** 3 * tw**3) / 36
    dims = {"d": d, "bf": bf, "tf": tf, "tw": tw, "kdes": tf + r, "y": y, "d_tw": d / tw,
            "bf_2tf": bf / (2 * tf)}
    sec = _sec(designation or f"tee {_in(d)} x {_in(bf)}", "tee", parts, axis="strong",
               shear_area=d * tw, dims=dims, j=j, cw=cw, mass=mass,
               flip=(flange == "bottom"),
               source=source or "computed from dimensions")
    return turn(sec, "weak") if axis == "weak" else sec


def angle(d: float, b: float, t: float, *, r: float = 0.0, leg: str = "bottom",
          designation: str = "", source: str = "", mass: float | None = None) -> Section:
    """Angle with leg d in the bending plane and leg b horizontal, bent about the geometric
    axis parallel to leg b; root fillet r. Principal axes are computed for the warning."""
    _check_pos(depth=d, width=b, thickness=t)
    if t >= min(d, b):
        raise ValueError("the thickness is not less than the legs")
    parts = [rect(0, t, 0, d), rect(t, b, 0, t)] + fillet(t, t, r, 1, 1)
    px = axis_props(parts)
    pz = axis_props(transpose(parts))
    ixy = product_of_inertia(parts)
    avg = (px.i + pz.i) / 2
    rad = math.hypot((px.i - pz.i) / 2, ixy)
    iz = avg - rad
    ang = 0.5 * math.atan2(-2 * ixy, px.i - pz.i)
    j = (d - t / 2 + b - t / 2) * t**3 / 3
    cw = t**3 / 36 * ((d - t / 2) ** 3 + (b - t / 2) ** 3)
    dims = {"d": d, "b": b, "t": t, "y": px.ybar, "x": pz.ybar, "b_t": max(d, b) / t,
            "iz": iz, "rz": math.sqrt(iz / px.area), "tan_alpha": abs(math.tan(ang)),
            "kdes": t + r}
    return _sec(designation or f"angle {_in(d)} x {_in(b)} x {_in(t, 3)}", "angle", parts,
                axis="geometric", shear_area=d * t, dims=dims, j=j, cw=cw,
                warnings=(ANGLE_WARNING,), mass=mass, flip=(leg == "top"),
                source=source or "computed from dimensions")


def turn(sec: Section, axis: str, *, toes: str = "down", leg: str = "bottom",
         flange: str = "top") -> Section:
    """The section bent about its other axis ("weak"), from its own properties.

    Channels: toes down puts the back of the web on top (fibre distances x and bf - x).
    Angles: the other leg goes in the bending plane. Round shapes do not turn.
    """
    if axis not in ("strong", "weak"):
        raise ValueError(f"axis must be 'strong' or 'weak', not {axis!r}")
    if sec.shape in ("round-tube", "pipe", "round-bar", "custom") or axis == "strong":
        return sec
    if sec.shape in ("rect-tube", "rect-bar") and sec.dims["h"] == sec.dims["b"]:
        return sec  # square: both axes alike
    if sec.iy is None or sec.sy is None:
        raise ValueError("this section has no weak-axis properties")
    dm = dict(sec.dims)
    iy = sec.iy
    warnings = sec.warnings
    if sec.shape in ("rect-tube", "rect-bar"):
        dm["h"], dm["b"] = sec.dims["b"], sec.dims["h"]
        if sec.shape == "rect-tube":
            for a, b_ in (("h_flat", "b_flat"), ("h_t", "b_t")):
                dm[a], dm[b_] = sec.dims[b_], sec.dims[a]
            shear = 2 * dm["h_flat"] * dm["t_des"]
        else:
            shear = 2 * sec.area / 3
        depth = dm["h"]
        s_top = s_bot = sec.sy
    elif sec.shape == "i-beam" or sec.shape == "tee":
        depth = sec.dims["bf"]
        s_top = s_bot = iy / (depth / 2)
        shear = (2 if sec.shape == "i-beam" else 1) * sec.dims["bf"] * sec.dims["tf"]
    elif sec.shape == "channel":
        depth = sec.dims["bf"]
        x = sec.dims["x"]
        near, far = iy / x, iy / (depth - x)
        s_top, s_bot = (near, far) if toes == "down" else (far, near)
        shear = 2 * sec.dims["bf"] * sec.dims["tf"]
    elif sec.shape == "angle":
        depth = sec.dims["b"]
        dm["d"], dm["b"] = sec.dims["b"], sec.dims["d"]
        dm["x"], dm["y"] = sec.dims["y"], sec.dims["x"]
        heel, toe = iy / dm["y"], iy / (depth - dm["y"])
        s_top, s_bot = (toe, heel) if leg == "bottom" else (heel, toe)
        shear = depth * sec.dims["t"]
    elif sec.shape in ("double-channel", "cover-plated"):
        depth = sec.dims.get("width", 0.0) or sec.dims["bf"]
        s_top = s_bot = sec.sy
        shear = sec.dims.get("weak_shear_area", sec.shear_area)
    else:
        raise ValueError(f"cannot turn a {sec.shape}")
    if sec.shape == "angle":
        label = "geometric"
    elif sec.shape in ("rect-tube", "rect-bar"):
        label = "strong" if dm["h"] >= dm["b"] else "weak"
    else:
        label = "weak"
    return replace(sec, ix=iy, iy=sec.ix, sx_top=s_top, sx_bot=s_bot, zx=sec.zy, zy=sec.zx,
                   sy=min(sec.sx_top, sec.sx_bot), rx=sec.ry, ry=sec.rx, shear_area=shear,
                   depth=depth, axis=label, dims=dm, warnings=warnings)


def double_channel(ch: Section, arrangement: str = "back-to-back", gap: float = 0.0,
                   designation: str = "") -> Section:
    """Two identical channels side by side, webs vertical: back-to-back (webs touching or
    `gap` apart) or toe-to-toe (boxed, toes `gap` apart). Strong axis from the single
    channel doubled; the other axis by parallel axes (exact for the pair)."""
    if ch.shape != "channel":
        raise ValueError("double-channel needs a channel")
    if gap < 0:
        raise ValueError("gap must not be negative")
    a, x, bf = ch.area, ch.dims["x"], ch.dims["bf"]
    off = gap / 2 + (x if arrangement == "back-to-back" else bf - x)
    iy = 2 * (ch.iy + a * off * off)
    width = gap + 2 * bf
    dims = dict(ch.dims) | {"gap": gap, "width": width,
                            "weak_shear_area": 4 * bf * ch.dims["tf"]}
    mass = 2 * ch.mass_per_length if ch.mass_per_length else None
    j = 2 * ch.j if ch.j else None
    if arrangement == "toe-to-toe" and gap == 0:
        # boxed: closed cell on the mid-line (thin wall), the walls being webs and flanges
        hm, bm = ch.dims["d"] - ch.dims["tf"], width - ch.dims["tw"]
        tw, tf = ch.dims["tw"], ch.dims["tf"]
        j = 4 * (hm * bm) ** 2 / (2 * hm / tw + 2 * bm / tf)
    return Section(
        designation or f"2x {ch.designation} {arrangement}", "double-channel", 2 * a,
        2 * ch.ix, 2 * ch.sx_top, 2 * ch.sx_bot, 2 * ch.zx if ch.zx else None, iy,
        iy / (width / 2), 2 * a * off, ch.rx, math.sqrt(iy / (2 * a)), j, None,
        2 * ch.shear_area, ch.depth, "strong", dims,
        f"{ch.source}; pair by parallel axes ({arrangement}, gap {_in(gap, 3)} in)",
        (), mass, ch.mass_density if mass else None)


def cover_plated(base: Section, plate_b: float, plate_t: float, plate: str = "bottom",
                 designation: str = "") -> Section:
    """A W/S/M/HP or rectangular tube (strong axis) with a plate welded across the top, the
    bottom or both. Elastic properties by parallel axes from the base's own; the plastic
    modulus from the base's plate-and-fillet model plus the plate(s)."""
    _check_pos(plate_width=plate_b, plate_thickness=plate_t)
    if plate not in ("top", "bottom", "both"):
        raise ValueError("plate must be 'top', 'bottom' or 'both'")
    if base.shape not in ("i-beam", "rect-tube") or base.axis != "strong":
        raise ValueError("a cover plate goes on an I-shape or rectangular tube (strong axis)")
    d = base.depth
    ap = plate_b * plate_t
    ys = {"top": [d / 2 + plate_t / 2], "bottom": [-d / 2 - plate_t / 2],
          "both": [d / 2 + plate_t / 2, -d / 2 - plate_t / 2]}[plate]
    a = base.area + ap * len(ys)
    ybar = sum(ap * y for y in ys) / a
    i = base.ix + base.area * ybar**2 + sum(plate_b * plate_t**3 / 12 + ap * (y - ybar) ** 2
                                           for y in ys)
    top = d / 2 + (plate_t if plate in ("top", "both") else 0.0)
    bot = d / 2 + (plate_t if plate in ("bottom", "both") else 0.0)
    c_top, c_bot = top - ybar, bot + ybar
    dm = base.dims
    if base.shape == "i-beam":
        parts = i_parts(dm["d"], dm["bf"], dm["tf"], dm["tw"], dm["kdes"] - dm["tf"])
        bw = dm["bf"]
    else:
        t = dm["t_des"]
        parts = rounded_rect(dm["b"], dm["h"], dm["r_out"]) + rounded_rect(
            dm["b"] - 2 * t, dm["h"] - 2 * t, max(dm["r_out"] - t, 0), -1.0)
        bw = dm["b"]
    parts += [rect(-plate_b / 2, plate_b / 2, y - plate_t / 2, y + plate_t / 2) for y in ys]
    z = axis_props(parts).z
    iy = base.iy + len(ys) * plate_t * plate_b**3 / 12
    width = max(bw, plate_b)
    zy = base.zy + len(ys) * plate_t * plate_b**2 / 4 if base.zy else None
    dims = dict(dm) | {"plate_b": plate_b, "plate_t": plate_t, "width": width,
                       "weak_shear_area": base.area - base.shear_area + len(ys) * ap}
    return Section(
        designation or f"{base.designation} + PL {_in(plate_b)} x {_in(plate_t, 3)} {plate}",
        "cover-plated", a, i, i / c_top, i / c_bot, z, iy, iy / (width / 2), zy,
        math.sqrt(i / a), math.sqrt(iy / a), None, None, base.shear_area, top + bot, "strong",
        dims, f"{base.source}; cover plate by parallel axes", (), None)


def _in(x: float, digits: int = 4) -> str:
    """A length in inches for a designation (trailing zeros dropped)."""
    v = round(x / 0.0254, digits)
    text = f"{v:.{digits}f}".rstrip("0").rstrip(".")
    return text or "0"


# ------------------------------------------------------------------ job-file input
_KEYS = {
    "rect-tube": {"depth", "width", "wall", "corner_radius", "design_wall"},
    "square-tube": {"size", "wall", "corner_radius", "design_wall"},
    "round-tube": {"od", "wall", "design_wall"},
    "pipe": {"od", "wall", "design_wall"},
    "rect-bar": {"depth", "width"},
    "flat-bar": {"depth", "width"},
    "square-bar": {"size"},
    "round-bar": {"diameter"},
    "angle": {"depth", "width", "thickness", "fillet_radius", "leg"},
    "channel": {"depth", "flange_width", "flange_thickness", "web_thickness", "fillet_radius",
                "toes"},
    "i-beam": {"depth", "flange_width", "flange_thickness", "web_thickness", "fillet_radius"},
    "tee": {"depth", "flange_width", "flange_thickness", "stem_thickness", "fillet_radius",
            "flange"},
    "double-channel": {"channel", "arrangement", "gap"},
    "cover-plated": {"base", "plate_width", "plate_thickness", "plate"},
    "custom": {"area", "ix", "sx", "sx_top", "sx_bot", "depth", "shear_area", "zx", "iy",
               "sy", "zy", "j", "cw", "rx", "ry"},
}
_COMMON = {"shape", "axis", "name", "weight"}
_REQUIRED = {
    "rect-tube": ("depth", "width", "wall"), "square-tube": ("size", "wall"),
    "round-tube": ("od", "wall"), "pipe": ("od", "wall"), "rect-bar": ("depth", "width"),
    "flat-bar": ("depth", "width"), "square-bar": ("size",), "round-bar": ("diameter",),
    "angle": ("depth", "width", "thickness"),
    "channel": ("depth", "flange_width", "flange_thickness", "web_thickness"),
    "i-beam": ("depth", "flange_width", "flange_thickness", "web_thickness"),
    "tee": ("depth", "flange_width", "flange_thickness", "stem_thickness"),
    "double-channel": ("channel",), "cover-plated": ("base", "plate_width", "plate_thickness"),
    "custom": ("area", "ix"),
}

# The one list of shapes: everything else (messages, the text UI's shape picker, described
# stock such as "rect-tube 2 x 1 x 14ga") derives from _KEYS and _REQUIRED.
SHAPES = tuple(_KEYS)
DIMENSION_SHAPES = tuple(x for x in SHAPES if x not in ("double-channel", "cover-plated",
                                                         "custom"))  # from dimensions alone
STOCK_SHAPES = ("rect-tube", "square-tube", "round-tube", "pipe", "rect-bar", "flat-bar",
                "square-bar", "round-bar")  # tube and bar: also written "SHAPE 2 x 1 x 14ga"


def shape_keys(shape: str) -> tuple[tuple[str, ...], tuple[str, ...]]:
    """(required, optional) dimension keys of a shape's [beam.section] table."""
    req = tuple(_REQUIRED[shape])
    return req, tuple(sorted(k for k in _KEYS[shape] if k not in req))
_ALIASES = {"rectangular-tube": "rect-tube", "rhs": "rect-tube", "shs": "square-tube",
            "tube": "rect-tube", "round": "round-tube", "chs": "round-tube",
            "flat": "flat-bar", "bar": "rect-bar", "rod": "round-bar", "i": "i-beam",
            "w": "i-beam", "beam": "i-beam", "l": "angle", "c": "channel", "t": "tee"}


def _a(word: str) -> str:
    return ("an " if word[:1] in "aeiou" else "a ") + word


def _suggest(word: str, choices) -> str:
    close = difflib.get_close_matches(word, list(choices), n=1, cutoff=0.6)
    return f" (did you mean {close[0]!r}?)" if close else ""


def _choice(spec, name, options, default, key):
    v = spec.get(name, default)
    if not isinstance(v, str) or v.strip().lower() not in options:
        raise InputError(f"{name} must be one of {', '.join(repr(o) for o in options)}, "
                         f"not {v!r}", f"{key}.{name}")
    return v.strip().lower()


def _wall_factor(spec, key, material, shape) -> tuple[float, str]:
    """(design wall factor, the rule in words)."""
    v = spec.get("design_wall")
    if v is not None:
        if isinstance(v, str) and v.strip().lower() in ("nominal", "nom", "1", "1.0"):
            return 1.0, "design wall = nominal (as given)"
        if isinstance(v, str) and v.strip().lower() in ("erw", "a500", "0.93"):
            return ERW_FACTOR, "design wall 0.93 x nominal (ERW HSS, AISC 360 B4.2; as given)"
        try:
            f = float(v)
        except (TypeError, ValueError):
            raise InputError(f"design_wall must be \"nominal\", \"0.93\" or a factor such as "
                             f"0.9, not {v!r}", f"{key}.design_wall") from None
        if not 0.5 <= f <= 1.0:
            raise InputError(f"design_wall factor {f} is outside 0.5 .. 1.0",
                             f"{key}.design_wall")
        return f, f"design wall {f:g} x nominal (as given)"
    wf = getattr(material, "hss_wall_factor", None) if material is not None else None
    if wf is not None:
        mname = getattr(material, "key", "the material")
        if wf < 1.0:
            return wf, f"design wall {wf:g} x nominal ({mname} ERW tube, AISC 360 B4.2)"
        return wf, f"design wall = nominal ({mname}: not ERW tube, AISC 360 B4.2's 0.93 is not taken)"
    if material is not None and getattr(material, "kind", "") != "steel":
        return 1.0, "design wall = nominal"
    if material is not None:  # a plate or shape grade, or a typed-in steel: not a tube grade
        return ERW_FACTOR, ("design wall 0.93 x nominal (AISC 360 B4.2 ERW rule; the material "
                            "is not a tube grade, so the lower figure: write design_wall = "
                            "\"nominal\" if the wall is measured at its nominal size)")
    return ERW_FACTOR, ("design wall 0.93 x nominal (AISC 360 B4.2 ERW rule; no material "
                        "given, so the lower figure)")


def _len(spec, name, key, *, positive=True, default=None):
    if name not in spec:
        return default
    return parse(spec[name], "length", f"{key}.{name}", positive=positive,
                 nonnegative=not positive)


def _sheet(spec, name, key):
    """A plate or bar thickness: a length, or a gauge read in the Manufacturers' Standard
    Gauge for sheet steel -> (metres, note)."""
    return gauges.parse_wall(spec.get(name), f"{key}.{name}", "plate")


def _wall(spec, key, shape):
    v = spec.get("wall")
    return gauges.parse_wall(v, f"{key}.wall", shape)
