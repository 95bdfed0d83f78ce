"""Reference design values of wood members (NDS 2018 Supplement), by species, grade and size.

Sawn lumber is tabulated by size class: dimension lumber (2 to 4 in nominal thickness,
Table 4A; Southern Pine by width in Table 4B, size factors already applied), beams and
stringers (5 in and thicker, width more than 2 in greater than thickness, Table 4D) and
posts and timbers (5 x 5 and larger, width not more than 2 in greater than thickness, Table
4D). Values are in psi as the tables give them and are recalled from memory: check them
against the Supplement before relying on them. LVL is a typical manufacturer's grade
(2.0E-2600Fb), from memory; a real job uses the manufacturer's published values.

`reference(material, thick_in, wide_in)` gives the row for a member of that actual (dressed)
thickness and width; `size_factor`, `flat_use_factor` and `wet_factors` give the Table 4A /
4B / 4D adjustments that depend on the size class.
"""

from __future__ import annotations

import math
from dataclasses import dataclass

from shopbeam.errors import InputError

PSI = 6894.757293168361  # Pa
DEFAULT_BEARING = 1.5 * 0.0254  # one 2x plate: the shortest bearing a shop builds (common practice)


@dataclass(frozen=True)
class Service:
    """How a wood member is used: the job keys that set the NDS adjustment factors."""

    duration: str = "ten-years"  # NDS Table 2.3.2 key (see DURATIONS)
    wet: bool = False  # moisture content over 19 % in service
    temperature: str = "up-to-100F"  # NDS Table 2.3.3 range
    repetitive: bool = False  # NDS 4.3.9: three or more members at 24 in or less


@dataclass(frozen=True)
class WoodValues:
    """One row of reference design values (Pa) and where it comes from."""

    species: str
    grade: str
    size_class: str  # "dimension", "beams-stringers", "posts-timbers", "lvl", "custom"
    fb: float
    ft: float | None
    fv: float
    fc_perp: float | None
    fc: float | None
    e: float
    emin: float
    table: str
    cf_in_table: bool = False  # size factor already in the tabulated Fb (Table 4B)
    depth_exponent: float | None = None  # LVL volume/depth factor (12 / d)^n

    def psi(self, name: str) -> float:
        return getattr(self, name) / PSI


def _row(species, grade, size_class, fb, ft, fv, fcp, fc, e, emin, table, **kw) -> WoodValues:
    return WoodValues(species, grade, size_class, fb * PSI, ft * PSI, fv * PSI, fcp * PSI,
                      fc * PSI, e * PSI, emin * PSI, table, **kw)


_4A = "NDS Supplement 2018 Table 4A (from memory)"
_4B = "NDS Supplement 2018 Table 4B (from memory)"
_4D = "NDS Supplement 2018 Table 4D (from memory)"

# material key -> size class -> row. Dimension lumber: Fb, Ft, Fv, Fc_perp, Fc, E, Emin (psi).
TABLE: dict[str, dict[str, WoodValues]] = {
    "DF-L-SS": {
        "dimension": _row("Douglas Fir-Larch", "Select Structural", "dimension",
                          1500, 1000, 180, 625, 1700, 1_900_000, 690_000, _4A),
        "beams-stringers": _row("Douglas Fir-Larch", "Select Structural", "beams-stringers",
                                1600, 950, 170, 625, 1100, 1_600_000, 580_000, _4D),
        "posts-timbers": _row("Douglas Fir-Larch", "Select Structural", "posts-timbers",
                              1500, 1000, 170, 625, 1150, 1_600_000, 580_000, _4D),
    },
    "DF-L-1": {
        "dimension": _row("Douglas Fir-Larch", "No.1", "dimension",
                          1000, 675, 180, 625, 1500, 1_700_000, 620_000, _4A),
        "beams-stringers": _row("Douglas Fir-Larch", "No.1", "beams-stringers",
                                1350, 675, 170, 625, 925, 1_600_000, 580_000, _4D),
        "posts-timbers": _row("Douglas Fir-Larch", "No.1", "posts-timbers",
                              1200, 825, 170, 625, 1000, 1_600_000, 580_000, _4D),
    },
    "DF-L-2": {
        "dimension": _row("Douglas Fir-Larch", "No.2", "dimension",
                          900, 575, 180, 625, 1350, 1_600_000, 580_000, _4A),
        "beams-stringers": _row("Douglas Fir-Larch", "No.2", "beams-stringers",
                                875, 425, 170, 625, 600, 1_300_000, 470_000, _4D),
        "posts-timbers": _row("Douglas Fir-Larch", "No.2", "posts-timbers",
                              750, 475, 170, 625, 700, 1_300_000, 470_000, _4D),
    },
    "HF-2": {
        "dimension": _row("Hem-Fir", "No.2", "dimension",
                          850, 525, 150, 405, 1300, 1_300_000, 470_000, _4A),
        "beams-stringers": _row("Hem-Fir", "No.2", "beams-stringers",
                                675, 350, 140, 405, 475, 1_100_000, 400_000, _4D),
        "posts-timbers": _row("Hem-Fir", "No.2", "posts-timbers",
                              575, 375, 140, 405, 575, 1_100_000, 400_000, _4D),
    },
    "SPF-2": {
        "dimension": _row("Spruce-Pine-Fir", "No.1/No.2", "dimension",
                          875, 450, 135, 425, 1150, 1_400_000, 510_000, _4A),
    },
}

# Southern Pine No.2 dimension lumber, Table 4B: size-specific rows by nominal width
# (2-4 in wide, 5-6, 8, 10, 12); Fv 175, Fc_perp 565, E 1,400,000, Emin 510,000 psi.
_SP2 = {4: (1100, 675, 1450), 6: (1000, 600, 1400), 8: (925, 550, 1350), 10: (800, 475, 1300),
        12: (750, 450, 1250)}

# LVL 2.0E-2600Fb, typical manufacturer values (from memory): Fb 2600 psi at 12 in depth with
# the depth factor (12 / d)^0.136, Fv 285 psi (on edge), Fc_perp 750 psi (on edge), Fc 2510,
# Ft 1555, E 2,000,000 psi, Emin 1,016,000 psi.
LVL = WoodValues("LVL (laminated veneer lumber)", "2.0E-2600Fb", "lvl", 2600 * PSI,
                 1555 * PSI, 285 * PSI, 750 * PSI, 2510 * PSI, 2_000_000 * PSI,
                 1_016_000 * PSI, "typical manufacturer's published values for 2.0E-2600Fb "
                 "LVL (from memory; use the manufacturer's own)", depth_exponent=0.136)


def _nominal_width(wide_in: float) -> int:
    """The nominal width of a dressed dimension-lumber width (3.5 -> 4, 9.25 -> 10)."""
    for nominal, dressed in ((2, 1.5), (3, 2.5), (4, 3.5), (5, 4.5), (6, 5.5), (8, 7.25),
                             (10, 9.25), (12, 11.25)):
        if wide_in <= dressed + 0.01:
            return nominal
    return 14


def size_class(thick_in: float, wide_in: float) -> str:
    """NDS Supplement 4.1 size classes from the dressed sizes: thickness over 4-1/2 in is a
    timber (beams and stringers if the width exceeds the thickness by more than 2 in nominal,
    else posts and timbers); otherwise dimension lumber."""
    if thick_in <= 4.0:
        return "dimension"
    return "beams-stringers" if wide_in - thick_in > 2.0 + 0.01 else "posts-timbers"


def reference(material, thick_in: float, wide_in: float) -> WoodValues:
    """The reference values for `material` at this dressed size (InputError if shopbeam has
    no table row for it)."""
    key = getattr(material, "key", "")
    if key.startswith("LVL"):
        return LVL
    cls = size_class(thick_in, wide_in)
    if key == "SP-2":
        if cls != "dimension":
            raise InputError("Southern Pine timbers (5 in and thicker) are not in shopbeam's "
                             "tables; give the values as an inline lumber material", "beam.material")
        w = _nominal_width(wide_in)
        fb, ft, fc = _SP2[min((k for k in _SP2 if k >= min(w, 12)), default=12)]
        return _row("Southern Pine", "No.2", "dimension", fb, ft, 175, 565, fc, 1_400_000,
                    510_000, _4B, cf_in_table=True)
    rows = TABLE.get(key)
    if rows is None:
        return _custom(material, cls)
    if cls not in rows:
        raise InputError(f"{material.key} has no {cls.replace('-', ' and ')} values in "
                         "shopbeam's tables (NDS Supplement Table 4D); choose DF-L or Hem-Fir "
                         "for timbers, or give the values as an inline lumber material",
                         "beam.material")
    return rows[cls]


def _typed_fv(material) -> float:
    """A typed-in lumber material's Fv: given, never guessed (the reader refuses one without)."""
    if not material.fv:
        raise InputError("a typed-in lumber material needs fv, the reference shear value "
                         "(e.g. \"180 psi\" for Douglas Fir-Larch No.2, NDS Supplement 2018 "
                         "Table 4A)", "beam.material.fv")
    return material.fv


def _custom(material, cls: str) -> WoodValues:
    """An inline lumber material: its fb, fv, fc_perp (None: bearing not checked) and e; Emin from NDS 2018 Appendix D (eq. D-4
    with COV_E = 0.25 for visually graded lumber): Emin = E (1 - 1.645 x 0.25) x 1.03 / 1.66."""
    e = material.e
    return WoodValues("typed-in wood", getattr(material, "name", "custom"), "custom",
                      material.fb or material.fy, None, _typed_fv(material),
                      getattr(material, "fc_perp", None), None, e, e * (1 - 1.645 * 0.25) * 1.03 / 1.66,
                      "typed in; Emin from NDS 2018 Appendix D eq. D-4, COV_E 0.25")


# ------------------------------------------------------------------ size-dependent factors
def size_factor(v: WoodValues, thick_in: float, wide_in: float) -> tuple[float, str]:
    """CF on Fb: Table 4A for dimension lumber, Table 4B footnote for Southern Pine, NDS
    4.3.6.2 (12/d)^(1/9) for timbers deeper than 12 in, the LVL depth factor."""
    if v.size_class == "lvl":
        cf = (12.0 / max(wide_in, 3.5)) ** v.depth_exponent
        return cf, (f"LVL depth factor (12/d)^{v.depth_exponent:g} = {cf:.3f} (manufacturer, "
                    "from memory)")
    if v.size_class in ("beams-stringers", "posts-timbers"):
        if wide_in > 12:
            return (12.0 / wide_in) ** (1 / 9), "NDS 4.3.6.2 CF = (12/d)^(1/9), d > 12 in"
        return 1.0, "NDS 4.3.6.2 CF = 1.0 (timber, d <= 12 in)"
    if v.size_class == "custom":
        return 1.0, "CF = 1.0 (typed-in values taken as already size-adjusted)"
    w = _nominal_width(wide_in)
    four = thick_in > 3.0  # 4 in nominal thickness
    if v.cf_in_table:
        if four and w >= 8 and w <= 12:
            return 1.1, "NDS Supplement Table 4B footnote: CF 1.1 for 4 in thick, 8 in and wider"
        if w > 12:
            return 0.9, "NDS Supplement Table 4B footnote: CF 0.9 wider than 12 in"
        return 1.0, "NDS Supplement Table 4B: size factor in the tabulated value"
    two = {2: 1.5, 3: 1.5, 4: 1.5, 5: 1.4, 6: 1.3, 8: 1.2, 10: 1.1, 12: 1.0, 14: 0.9}
    four_t = {2: 1.5, 3: 1.5, 4: 1.5, 5: 1.4, 6: 1.3, 8: 1.3, 10: 1.2, 12: 1.1, 14: 1.0}
    cf = (four_t if four else two)[w]
    return cf, f"NDS Supplement Table 4A CF {cf:g} ({w} in wide, {4 if four else 2} in thick)"


# Beams and stringers loaded on the wide face: NDS Supplement 2018 Table 4D footnote size
# factor adjustment on Fb (from memory): Select Structural 0.86, No.1 0.74, No.2 1.00.
WIDE_FACE_BS = {"Select Structural": 0.86, "No.1": 0.74, "No.2": 1.00}


def flat_use_factor(v: WoodValues, thick_in: float, wide_in: float) -> tuple[float, str]:
    """Cfu for dimension lumber bent about its weak axis (load on the wide face), Table 4A/4B
    (NDS 4.3.7); for beams and stringers on the wide face the Table 4D footnote factor."""
    if v.size_class == "beams-stringers":
        f = WIDE_FACE_BS.get(v.grade, 0.74)
        return f, (f"beams and stringers loaded on the wide face: Fb x {f:g} for {v.grade} "
                   "(NDS Supplement 2018 Table 4D footnote, from memory)")
    if v.size_class not in ("dimension", "custom"):
        return 1.0, "Cfu 1.0 (not dimension lumber: NDS 4.3.7 does not apply)"
    w = _nominal_width(wide_in)
    if thick_in > 3.0:
        table = {2: 1.0, 3: 1.0, 4: 1.0, 5: 1.05, 6: 1.05, 8: 1.05}
        cfu = table.get(w, 1.1)
    else:
        table = {2: 1.0, 3: 1.0, 4: 1.1, 5: 1.1, 6: 1.15, 8: 1.15}
        cfu = table.get(w, 1.2)
    return cfu, f"NDS Supplement Table 4A flat use Cfu {cfu:g} (NDS 4.3.7)"


def wet_factors(v: WoodValues, fb_cf: float) -> dict[str, float]:
    """CM per property in wet service (moisture over 19 %): Table 4A/4B for dimension
    lumber (Fb 0.85 only when Fb CF > 1150 psi), Table 4D for timbers."""
    if v.size_class in ("beams-stringers", "posts-timbers"):
        return {"fb": 1.0, "fv": 1.0, "fc_perp": 0.67, "e": 1.0}
    return {"fb": 0.85 if fb_cf > 1150 * PSI else 1.0, "fv": 0.97, "fc_perp": 0.67, "e": 0.9}


def is_dimension(v: WoodValues) -> bool:
    return v.size_class in ("dimension", "custom")


def emin_of(v: WoodValues) -> float:
    return v.emin if math.isfinite(v.emin) else v.e * 0.365


# ------------------------------------------------------------------ service conditions
DURATIONS = {  # NDS 2018 Table 2.3.2, load duration factor CD
    "permanent": (0.9, "permanent (dead load)"),
    "ten-years": (1.0, "ten years (occupancy live load)"),
    "two-months": (1.15, "two months (snow)"),
    "seven-days": (1.25, "seven days (construction)"),
    "ten-minutes": (1.6, "ten minutes (wind, earthquake)"),
    "impact": (2.0, "impact"),
}
TEMPERATURES = ("up-to-100F", "100F-125F", "125F-150F")


def temperature_factors(temp: str, wet: bool) -> dict[str, float]:
    """Ct per property, NDS 2018 Table 2.3.3 (sustained temperature range)."""
    if temp == "100F-125F":
        return {"fb": 0.7 if wet else 0.8, "fv": 0.7 if wet else 0.8,
                "fc_perp": 0.7 if wet else 0.8, "e": 0.9}
    if temp == "125F-150F":
        return {"fb": 0.5 if wet else 0.7, "fv": 0.5 if wet else 0.7,
                "fc_perp": 0.5 if wet else 0.7, "e": 0.9}
    return {"fb": 1.0, "fv": 1.0, "fc_perp": 1.0, "e": 1.0}


def dressed_of(section) -> tuple[float, float]:
    """(thickness, width) in inches of a rectangular wood section, whichever way it bends."""
    h, b = section.dims["h"] / 0.0254, section.dims["b"] / 0.0254
    return min(h, b), max(h, b)


def adjusted_material(material, section, wet: bool = False, temp: str = "up-to-100F"):
    """The material with this member's reference values (its size class) and E' = E CM Ct
    (NDS 2018 Table 4.3.1), so deflections use the modulus of this member in this service.
    Non-wood materials and sections that are not rectangles come back unchanged."""
    from dataclasses import replace

    if getattr(material, "kind", "") != "lumber" or section is None or \
            section.shape != "rect-bar":
        return material
    t, w = dressed_of(section)
    v = reference(material, t, w)
    if wet and v.size_class == "lvl":
        raise InputError("LVL is made for dry service (the makers' published values, "
                         "moisture under 16 %); shopbeam has no wet-service values for it: "
                         "keep it dry and remove wet_service, or give the maker's wet values "
                         "as an inline lumber material", "beam.wet_service")
    cf = size_factor(v, t, w)[0]
    cm = wet_factors(v, v.fb * cf)["e"] if wet else 1.0
    ct = temperature_factors(temp, wet)["e"]
    e_adj = v.e * cm * ct
    what = v.size_class.replace("-", " and ") if v.size_class != "dimension" else \
        "dimension lumber"
    name = material.name if v.size_class in ("dimension", "custom", "lvl") else \
        f"{v.species} {v.grade} {what}"
    return replace(material, e=e_adj, fb=v.fb, fv=v.fv, fy=v.fb, name=name,
                   source=f"{v.table}; E' = E CM Ct = {v.e / PSI:,.0f} psi x {cm:g} x {ct:g}"
                   if (cm, ct) != (1.0, 1.0) else material.source if v.size_class ==
                   "dimension" and v.table == _4A else v.table)


# ------------------------------------------------------------------ repetitive members
MAX_REPETITIVE_SPACING = 24 * 0.0254  # NDS 2018 4.3.9: members spaced not more than 24 in


def repetitive_rule(service: Service, material, section, members: int,
                    widths: list[tuple[str, float]]) -> tuple[Service, list[tuple[str, str]]]:
    """NDS 2018 4.3.9 (8.3.7 for LVL): the repetitive member factor is for three or more
    members at 24 in or less joined by a load-distributing deck, dimension lumber 2 to 4 in
    thick (Cr 1.15) or structural composite lumber (Cr 1.04, from memory). Returns the service
    with `repetitive` as it may be applied, and (warning, key) pairs for what the job says
    against it: `members = 2`, an area load's tributary width (the joist spacing) over
    24 in, a timber."""
    if not service.repetitive:
        return service, []
    out = []
    off = Service(service.duration, service.wet, service.temperature, False)
    if members == 2:
        out.append(("repetitive = true needs three or more members sharing the load (NDS 2018 "
                    "4.3.9); members = 2: Cr 1.0 is used", "beam.repetitive"))
        return off, out
    # an area load shared by `members` members: each one's spacing is width / members
    n = members if isinstance(members, int) and members > 1 else 1
    wide = [(k, w) for k, w in widths if w / n > MAX_REPETITIVE_SPACING * (1 + 1e-9)]
    if wide:
        key, w = wide[0]
        each = f" ({n} members: {w / n / 0.0254:.4g} in each)" if n > 1 else ""
        out.append((f"repetitive = true needs members at 24 in or less (NDS 2018 4.3.9), but "
                    f"this load's tributary width is {w / 0.0254:.4g} in{each}: Cr 1.0 is used "
                    "(set the width to the joist spacing, or remove repetitive)", key))
        return off, out
    if getattr(material, "kind", "") == "lumber" and section is not None and \
            section.shape == "rect-bar":
        t, wd = dressed_of(section)
        try:
            v = reference(material, t, wd)
        except InputError:
            return service, out
        if v.size_class in ("beams-stringers", "posts-timbers"):
            out.append((f"repetitive = true: the repetitive member factor is for dimension "
                        f"lumber 2 to 4 in thick (NDS 2018 4.3.9); this member is a timber "
                        f"({v.size_class.replace('-', ' and ')}): Cr 1.0 is used",
                        "beam.repetitive"))
            return off, out
    return service, out
