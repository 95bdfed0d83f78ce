"""Wood members by the NDS 2018 (allowable stress design): adjusted design values.

Every adjusted value is the reference value (`shopbeam.members.wood`) times the factors of
NDS 2018 Table 4.3.1 that apply, each named with its clause:

- Fb' = Fb CD CM Ct CL CF Cfu Cr (Ci = 1.0, no incising), with Fb* = Fb x all but CL and Cfu
- Fv' = Fv CD CM Ct
- Fc_perp' = Fc_perp CM Ct Cb (no CD: NDS 2.3.2 does not apply it to Fc_perp)
- E' = E CM Ct, Emin' = Emin CM Ct

CL (NDS 3.3.3): effective length le from Table 3.3.3 for the unbraced length lu and the load
arrangement, RB = sqrt(le d / b^2) <= 50, FbE = 1.20 Emin' / RB^2, and
CL = (1 + FbE/Fb*)/1.9 - sqrt(((1 + FbE/Fb*)/1.9)^2 - (FbE/Fb*)/0.95). A member bent about
its weak axis (d <= b) or with d/b <= 2 (NDS 4.4.1.2(a)) needs no lateral support: CL = 1.0.

Creep (NDS 3.5.2): the long-term deflection is Kcr x the deflection under the dead loads
(Kcr 1.5 seasoned lumber or LVL in dry service, 2.0 in wet service or for timbers, 5 in and
thicker, which are sold unseasoned) plus the short-term
deflection under the live loads.
"""

from __future__ import annotations

import math
from dataclasses import dataclass, field

from shopbeam.members import wood

IN = 0.0254
DEFAULT_BEARING = wood.DEFAULT_BEARING
Service = wood.Service


def service_of(job) -> Service:
    """The wood keys of the job as the reader typed them (`Job.wood`); defaults otherwise."""
    typed = getattr(job, "wood", None)
    return typed if isinstance(typed, Service) else Service()


@dataclass(frozen=True)
class Factors:
    """The adjusted values of one wood member in one service (Pa), and the words."""

    values: wood.WoodValues
    thick: float  # in, dressed
    wide: float  # in, dressed
    b: float  # m, breadth as bent
    d: float  # m, depth as bent
    fb_star: float  # Fb x CD CM Ct CF Cr
    cfu: float
    fv: float  # Fv'
    fc_perp: float  # Fc_perp x CM Ct (Cb applied per bearing)
    e: float  # E'
    emin: float  # Emin'
    kcr: float
    factors: dict = field(default_factory=dict)  # name -> value (for params)
    words: tuple[str, ...] = ()

    @property
    def flat(self) -> bool:
        return self.d < self.b


def factors(section, material, service: Service) -> Factors:
    """The NDS 2018 adjustment factors for this member (Table 4.3.1)."""
    h, bb = section.dims["h"], section.dims["b"]
    thick, wide = min(h, bb) / IN, max(h, bb) / IN
    v = wood.reference(material, thick, wide)
    cd, cd_words = wood.DURATIONS.get(service.duration, wood.DURATIONS["ten-years"])
    cf, cf_words = wood.size_factor(v, thick, wide)
    flat = h < bb
    cfu, cfu_words = wood.flat_use_factor(v, thick, wide) if flat else (1.0, "")
    cm = wood.wet_factors(v, v.fb * cf) if service.wet else \
        {"fb": 1.0, "fv": 1.0, "fc_perp": 1.0, "e": 1.0}
    ct = wood.temperature_factors(service.temperature, service.wet)
    cr = 1.0
    if service.repetitive and wood.is_dimension(v) and thick <= 4.0:
        cr = 1.15
    elif service.repetitive and v.size_class == "lvl":
        cr = 1.04  # NDS 2018 8.3.7, structural composite lumber (from memory)
    words = [f"Fb {v.fb / wood.PSI:,.0f} psi, Fv {v.fv / wood.PSI:,.0f} psi, E "
             f"{v.e / wood.PSI / 1e6:.2g}e6 psi, Emin {v.emin / wood.PSI:,.0f} psi "
             f"({v.species} {v.grade}, {v.size_class.replace('-', ' and ')}; {v.table})",
             f"CD {cd:g}: load duration {cd_words} (NDS 2.3.2, Table 2.3.2)",
             f"CM {cm['fb']:g} on Fb, {cm['fv']:g} on Fv, {cm['fc_perp']:g} on Fc_perp, "
             f"{cm['e']:g} on E: {'wet' if service.wet else 'dry'} service (NDS 4.1.4, "
             "Supplement Table 4A/4D)",
             f"Ct {ct['fb']:g} on Fb/Fv/Fc_perp, {ct['e']:g} on E: temperature "
             f"{service.temperature} (NDS 2.3.3, Table 2.3.3)",
             f"CF {cf:g}: {cf_words}"]
    if flat:
        words.append(f"Cfu {cfu:g}: {cfu_words}")
    if cr == 1.04:
        words.append("Cr 1.04: repetitive structural composite lumber, three or more at 24 in "
                     "or less (NDS 2018 8.3.7, from memory)")
    elif service.repetitive and cr == 1.0:
        words.append("Cr 1.0: the repetitive member factor is for dimension lumber 2 to 4 in "
                     "thick only (NDS 4.3.9)")
    else:
        words.append(f"Cr {cr:g}: " + ("repetitive members, three or more at 24 in or less "
                                       "sharing the load (NDS 4.3.9)" if cr > 1 else
                                       "single member (NDS 4.3.9; say repetitive = true under "
                                       "[beam] for joists at 24 in or less)"))
    # timbers (5 in and thicker) are sold unseasoned (surfaced green; their Table 4D values
    # are for green timbers used dry): NDS 3.5.2 takes Kcr 2.0 for unseasoned lumber
    green = v.size_class in ("beams-stringers", "posts-timbers")
    kcr = 2.0 if service.wet or green else 1.5
    fb_star = v.fb * cd * cm["fb"] * ct["fb"] * cf * cr
    fv = v.fv * cd * cm["fv"] * ct["fv"]
    fcp = (v.fc_perp or 0.0) * cm["fc_perp"] * ct["fc_perp"]
    e = v.e * cm["e"] * ct["e"]
    emin = v.emin * cm["e"] * ct["e"]
    fac = {"CD": cd, "CM_b": cm["fb"], "CM_v": cm["fv"], "CM_cp": cm["fc_perp"],
           "CM_e": cm["e"], "Ct_b": ct["fb"], "Ct_e": ct["e"], "CF": cf, "Cfu": cfu, "Cr": cr,
           "Kcr": kcr}
    return Factors(v, thick, wide, bb, h, fb_star, cfu, fv, fcp, e, emin, kcr, fac,
                   tuple(words))


# ------------------------------------------------------------------ beam stability
def effective_length(lu: float, d: float, case: str) -> tuple[float, str]:
    """le from NDS 2018 Table 3.3.3 for unbraced length lu and depth d (any length unit)."""
    r = lu / d
    if case == "cantilever-uniform":
        return ((1.33 * lu, "le = 1.33 lu (cantilever, uniform load, lu/d < 7)") if r < 7 else
                (0.90 * lu + 3 * d, "le = 0.90 lu + 3d (cantilever, uniform load, lu/d >= 7)"))
    if case == "cantilever-end-point":
        return ((1.87 * lu, "le = 1.87 lu (cantilever, point load at the free end, lu/d < 7)")
                if r < 7 else (1.44 * lu + 3 * d, "le = 1.44 lu + 3d (cantilever, point load "
                                                  "at the free end, lu/d >= 7)"))
    if case == "uniform":
        return ((2.06 * lu, "le = 2.06 lu (single span, uniform load, lu/d < 7)") if r < 7 else
                (1.63 * lu + 3 * d, "le = 1.63 lu + 3d (single span, uniform load, lu/d >= 7)"))
    if case == "center-point":
        return ((1.80 * lu, "le = 1.80 lu (single span, point load at centre, lu/d < 7)")
                if r < 7 else (1.37 * lu + 3 * d, "le = 1.37 lu + 3d (single span, point load "
                                                  "at centre, lu/d >= 7)"))
    if r < 7:
        return 2.06 * lu, "le = 2.06 lu (any load, lu/d < 7)"
    if r <= 14.3:
        return 1.63 * lu + 3 * d, "le = 1.63 lu + 3d (any load, 7 <= lu/d <= 14.3)"
    return 1.84 * lu, "le = 1.84 lu (any load, lu/d > 14.3)"


def slenderness(le: float, b: float, d: float) -> float:
    """RB = sqrt(le d / b^2), NDS 2018 eq. 3.3-5 (at most 50 by 3.3.3.7)."""
    return math.sqrt(le * d / b**2)


def stability_factor(fb_star: float, emin: float, b: float, d: float, le: float
                     ) -> tuple[float, float, float]:
    """(CL, RB, FbE) by NDS 2018 3.3.3 (eq. 3.3-5, 3.3-6)."""
    rb = slenderness(le, b, d)
    fbe = 1.20 * emin / rb**2
    a = fbe / fb_star
    c = (1 + a) / 1.9
    cl = c - math.sqrt(max(c * c - a / 0.95, 0.0))
    return cl, rb, fbe


def load_case(loads, a: float, b: float, free: bool, free_at_right: bool) -> str:
    """The Table 3.3.3 row for the loads on an unbraced length a..b (self-weight counts as
    a uniform load; anything else than one uniform spread or one point load in the right
    place, such as a point load with the member's own weight, takes the 'any load' row)."""
    tol = 1e-6 * max(b - a, 1e-9)
    points, uniform_ok, other = [], True, False
    for ld in loads:
        if ld.kind == "point":
            if a - tol <= ld.at <= b + tol and ld.value != 0:
                points.append(ld.at)
        elif ld.kind == "uniform":
            if ld.end > a + tol and ld.start < b - tol and not (
                    ld.start <= a + tol and ld.end >= b - tol):
                uniform_ok = False
        elif ld.kind in ("linear", "moment"):
            if getattr(ld, "at", None) is not None or ld.kind == "linear":
                other = True
    # any uniform load with a point load, the member's own weight included, is a loading
    # Table 3.3.3 does not list: its footnote's general row applies
    real = [ld for ld in loads if ld.kind == "uniform" and ld.w1 != 0
            and ld.end > a + tol and ld.start < b - tol]
    if other or not uniform_ok:
        return "any"
    if free:
        if not points:
            return "cantilever-uniform"
        tip = b if free_at_right else a
        if len(points) == 1 and abs(points[0] - tip) <= 1e-3 * (b - a) and not real:
            return "cantilever-end-point"
        return "any"
    if not points:
        return "uniform"
    if len(points) == 1 and abs(points[0] - (a + b) / 2) <= 0.02 * (b - a) and not real:
        return "center-point"
    return "any"


def bearing_area_factor(lb_in: float, end_distance_in: float) -> tuple[float, str]:
    """Cb (NDS 3.10.4): (lb + 0.375)/lb for bearings shorter than 6 in whose near edge is at
    least 3 in from the end of the member; 1.0 nearer the ends."""
    if lb_in < 6.0 and end_distance_in >= 3.0:
        cb = (lb_in + 0.375) / lb_in
        return cb, f"Cb = (lb + 0.375 in)/lb, lb in inches, = {cb:.3f} (NDS 3.10.4)"
    return 1.0, "Cb 1.0 (at the end of the member or lb >= 6 in, NDS 3.10.4)"
