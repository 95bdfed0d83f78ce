"""Aluminium elements by the Aluminum Design Manual 2015 (ASD): local buckling of the flat
elements of rectangular tubes, I-beams and channels, and shear buckling of their webs.

All values and formulas here are recalled from memory; check them against the ADM before
relying on them. Stresses are computed in ksi, as the ADM writes its buckling constants, and
returned in Pa.

Buckling constants (ADM 2015 Table B.4.2, artificially aged tempers T5-T9, which the built-in
6061-T6, 6063-T5 and 6063-T6 are), ksi:

- flat elements in uniform compression: Bp = Fcy (1 + Fcy^(1/3) / 11.4),
  Dp = Bp / 10 (Bp / E)^(1/2), k1 = 0.35, k2 = 2.27
- flat elements in flexure: Bbr = 1.3 Fcy (1 + Fcy^(1/3) / 7), Dbr = Bbr / 20 (6 Bbr / E)^(1/2),
  k1 = 0.50, k2 = 2.04
- shear: Bs = Fsy (1 + Fsy^(1/3) / 9.3), Ds = Bs / 10 (Bs / E)^(1/2), Cs = 0.41 Bs / Ds

Table B.4.1 (tempers O, H, T1-T4) has Bp = Fcy (1 + Fcy^(1/3) / 7.6),
Dp = Bp / 20 (6 Bp / E)^(1/2), Bs = Fsy (1 + Fsy^(1/3) / 6.2), Ds = Bs / 20 (6 Bs / E)^(1/2),
Cs = 2 Bs / (3 Ds), k1 = 0.50, k2 = 2.04. A welded member takes the lesser of the stress from
the unwelded constants capped at the welded yield and the stress from the Table B.4.1
constants with the welded yield (conservative either way).

Element strengths (ADM 2015 B.5.4.1, B.5.4.2, B.5.5.1, G.2), slenderness b/t with b the flat
width:

- supported on one edge (flange outstand), uniform compression: Fc = Fcy up to
  lambda1 = (Bp - Fcy) / (5.0 Dp); Bp - 5.0 Dp b/t up to lambda2 = k1 Bp / (5.0 Dp);
  k2 sqrt(Bp E) / (5.0 b/t) beyond
- supported on both edges (tube flange), uniform compression: the same with 1.6 for 5.0
- supported on both edges in flexure (web, neutral axis at mid-depth, m = 0.65): Fb = 1.5 Fcy
  up to lambda1 = (Bbr - 1.5 Fcy) / (m Dbr); Bbr - m Dbr b/t up to lambda2 = k1 Bbr / (m Dbr);
  k2 sqrt(Bbr E) / (m b/t) beyond
- web shear: Fs = Fsy up to lambda1 = (Bs - Fsy) / (1.25 Ds); Bs - 1.25 Ds h/t up to
  lambda2 = Cs / 1.25; pi^2 E / (1.25 h/t)^2 beyond

The member's local buckling moment is taken by the limiting element method (ADM 2015 F.8,
from memory): Mnlb = F Sc for the weakest element more slender than lambda1 (Sc the section
modulus to the compression fibre: conservative for a flange, whose mid-plane stress is lower).
An element at or under lambda1 reaches yield first and is covered by the yielding check.
"""

from __future__ import annotations

import math
from dataclasses import dataclass

from shopbeam.units import KSI, fmt


@dataclass(frozen=True)
class Constants:
    bp: float
    dp: float
    k1c: float
    k2c: float
    bbr: float
    dbr: float
    k1b: float
    k2b: float
    table: str


def constants(fcy_ksi: float, e_ksi: float, aged: bool = True) -> Constants:
    """Buckling constants (ksi) of ADM 2015 Table B.4.2 (aged) or B.4.1 (not aged, welded)."""
    f = fcy_ksi
    bbr = 1.3 * f * (1 + f ** (1 / 3) / 7)
    dbr = bbr / 20 * math.sqrt(6 * bbr / e_ksi)
    if aged:
        bp = f * (1 + f ** (1 / 3) / 11.4)
        return Constants(bp, bp / 10 * math.sqrt(bp / e_ksi), 0.35, 2.27, bbr, dbr, 0.50, 2.04,
                         "ADM 2015 Table B.4.2")
    bp = f * (1 + f ** (1 / 3) / 7.6)
    return Constants(bp, bp / 20 * math.sqrt(6 * bp / e_ksi), 0.50, 2.04, bbr, dbr, 0.50, 2.04,
                     "ADM 2015 Table B.4.1")


def _uniform(bt: float, f: float, e: float, c: Constants, n: float) -> tuple[float, float, float]:
    """(Fc ksi, lambda1, lambda2) of a flat element in uniform compression (n = 5.0 one edge,
    1.6 both edges)."""
    l1 = (c.bp - f) / (n * c.dp)
    l2 = c.k1c * c.bp / (n * c.dp)
    if bt <= l1:
        return f, l1, l2
    if bt < l2:
        return min(f, c.bp - n * c.dp * bt), l1, l2
    return min(f, c.k2c * math.sqrt(c.bp * e) / (n * bt)), l1, l2


def _flexural(bt: float, f: float, e: float, c: Constants, m: float = 0.65
              ) -> tuple[float, float, float]:
    """(Fb ksi, lambda1, lambda2) of a flat element supported on both edges in flexure."""
    l1 = (c.bbr - 1.5 * f) / (m * c.dbr)
    l2 = c.k1b * c.bbr / (m * c.dbr)
    if bt <= l1:
        return 1.5 * f, l1, l2
    if bt < l2:
        return min(1.5 * f, c.bbr - m * c.dbr * bt), l1, l2
    return min(1.5 * f, c.k2b * math.sqrt(c.bbr * e) / (m * bt)), l1, l2


@dataclass(frozen=True)
class Element:
    name: str  # "flange", "flange outstand", "web"
    bt: float  # b/t
    kind: str  # "one" | "both" | "flexure"
    stress: float  # Pa, the element's buckling (or yield) stress
    lambda1: float
    lambda2: float
    clause: str

    @property
    def slender(self) -> bool:
        return self.bt > self.lambda1

    def words(self, system: str = "us") -> str:
        what = {"one": "supported on one edge, uniform compression",
                "both": "supported on both edges, uniform compression",
                "flexure": "supported on both edges, in flexure"}[self.kind]
        return (f"{self.name} b/t {self.bt:.3g} ({what}; lambda1 {self.lambda1:.3g}, lambda2 "
                f"{self.lambda2:.3g}): F = {fmt(self.stress, 'stress', system, 3)} ({self.clause})")


def _element(name, bt, kind, fcy, e, welded_fcy=None) -> Element:
    f, ek = fcy / KSI, e / KSI
    clause = {"one": "ADM 2015 B.5.4.1", "both": "ADM 2015 B.5.4.2",
              "flexure": "ADM 2015 B.5.5.1"}[kind]

    def one(fy, aged):
        c = constants(fy, ek, aged)
        return (_uniform(bt, fy, ek, c, 5.0 if kind == "one" else 1.6) if kind != "flexure"
                else _flexural(bt, fy, ek, c))

    stress, l1, l2 = one(f, True)
    if welded_fcy is not None:
        fw = welded_fcy / KSI
        sw, l1w, l2w = one(fw, False)
        cap = 1.5 * fw if kind == "flexure" else fw
        if min(stress, cap) <= sw:
            stress = min(stress, cap)
        else:
            stress, l1, l2 = sw, l1w, l2w
        l1 = min(l1, l1w)
        clause += " (welded: the lesser of Table B.4.2 capped at Fcyw and Table B.4.1 with Fcyw)"
    return Element(name, bt, kind, stress * KSI, l1, l2, clause)


def flat_elements(sec, fcy: float, e: float, welded_fcy: float | None = None) -> list[Element]:
    """The compression elements of a rectangular tube (either axis), or an I-beam or channel
    bent about its strong axis, with their ADM strengths; [] for any other section."""
    d, shape = sec.dims, sec.shape
    out = []
    if shape == "rect-tube" and "t_des" in d:
        t = d["t_des"]
        r = _corner(d)
        flange, web = (d["b"] - 2 * r) / t, (d["h"] - 2 * r) / t
        out.append(_element("flange", flange, "both", fcy, e, welded_fcy))
        out.append(_element("web", web, "flexure", fcy, e, welded_fcy))
    elif shape in ("i-beam", "channel") and getattr(sec, "axis", "strong") == "strong" and \
            all(k in d for k in ("bf", "tf", "tw", "d")):
        outstand = (d["bf"] - d["tw"]) / 2 if shape == "i-beam" else d["bf"] - d["tw"]
        out.append(_element("flange outstand", outstand / d["tf"], "one", fcy, e, welded_fcy))
        out.append(_element("web", (d["d"] - 2 * d["tf"]) / d["tw"], "flexure", fcy, e,
                            welded_fcy))
    return out


def _corner(d: dict) -> float:
    """The outside corner radius an aluminium tube's flat widths are taken from: the one
    typed in (corner_radius), at least the wall; with none typed in, the wall itself (a square
    inside corner: the widest flats, so the lowest buckling strength). Extruded tube is made
    with small corners; the 2 x wall the section's properties take is steel HSS practice."""
    t = d["t_des"]
    return max(d.get("r_out", t), t) if d.get("r_given", True) else t


def web_ratio(sec) -> float | None:
    """h/t of the web that carries the shear (clear height over thickness), or None."""
    d, shape = sec.dims, sec.shape
    if shape == "rect-tube" and "t_des" in d:
        t = d["t_des"]
        return (d["h"] - 2 * _corner(d)) / t
    if shape in ("i-beam", "channel") and getattr(sec, "axis", "strong") == "strong" and \
            all(k in d for k in ("tf", "tw", "d")):
        return (d["d"] - 2 * d["tf"]) / d["tw"]
    return None


def web_area(sec) -> float | None:
    """The area of the web(s) that carry the shear, ADM 2015 G.2: the clear height (as in
    `web_ratio`) times the thickness, two webs for a tube; None where `web_ratio` has none.
    (The steel code's d tw takes the flanges' depth in too.)"""
    ht = web_ratio(sec)
    if ht is None:
        return None
    d = sec.dims
    t = d["t_des"] if sec.shape == "rect-tube" else d["tw"]
    return (2 if sec.shape == "rect-tube" else 1) * ht * t * t


def shear_buckling(ht: float, fsy: float, e: float, aged: bool = True, system: str = "us"
                   ) -> tuple[float, float, float, str]:
    """(Fs Pa, lambda1, lambda2, words) of an unstiffened web in shear, ADM 2015 G.2 with the
    shear buckling constants of Table B.4.2 (aged) or B.4.1."""
    f, ek = fsy / KSI, e / KSI
    if aged:
        bs = f * (1 + f ** (1 / 3) / 9.3)
        ds = bs / 10 * math.sqrt(bs / ek)
        cs = 0.41 * bs / ds
    else:
        bs = f * (1 + f ** (1 / 3) / 6.2)
        ds = bs / 20 * math.sqrt(6 * bs / ek)
        cs = 2 * bs / (3 * ds)
    l1, l2 = (bs - f) / (1.25 * ds), cs / 1.25
    if ht <= l1:
        fs, how = f, "Fs = Fsy (h/t <= lambda1)"
    elif ht < l2:
        fs, how = min(f, bs - 1.25 * ds * ht), "Fs = Bs - 1.25 Ds h/t"
    else:
        fs, how = min(f, math.pi ** 2 * ek / (1.25 * ht) ** 2), "Fs = pi^2 E / (1.25 h/t)^2"
    return fs * KSI, l1, l2, (f"web h/t {ht:.3g}, lambda1 {l1:.3g}, lambda2 {l2:.3g}: {how} = "
                              f"{fmt(fs * KSI, 'stress', system, 3)} (ADM 2015 G.2, constants in ksi: "
                              f"Bs {bs:.3g}, Ds {ds:.3g})")
