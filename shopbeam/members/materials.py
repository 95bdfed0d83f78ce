"""Materials: the grades a fabrication shop buys, with the source of every value beside it.

Values are specified minimums (yield, tensile) and nominal moduli and densities, entered in
the units the standard states them in and converted exactly to SI. Look-up is tolerant
(``"A500 Gr C"``, ``"a500c"``, ``"ASTM A500 grade C"`` all find ``A500-C``). An inline
material in a job file is a table with ``e``, ``fy`` and ``density`` (plus optional
``name``, ``fu``, ``g``, ``kind``, ``fy_welded``, ``fu_welded``, ``fb``, ``fv``,
``fc_perp``). A lumber one
must give ``fv`` (no shear value is guessed from Fb); without ``fc_perp`` its bearing is not
checked and it is not rated.

Design wall of tube (``hss_wall_factor``): 0.93 x nominal for A500, A53 and as-welded A513
(ERW tube, AISC 360-16 B4.2; A513 is not a grade 360 lists, so its ERW tube takes the ERW
rule, the lower figure), nominal (1.0) for A513 Type 5 DOM (drawn over a mandrel to a close
wall) and for stainless/aluminium tube; None where the grade is not a tube grade.
"""

from __future__ import annotations

import re
from dataclasses import dataclass, field
from functools import lru_cache
from typing import Mapping

from shopbeam.errors import InputError, raise_all
from shopbeam.units import parse

KSI = 6.894757293168361e6  # Pa (lbf/in^2 x 1000, exact from the international pound and inch)
IN = 0.0254  # m (the international inch, exact)
PSI = KSI / 1000
LB_FT3 = 16.018463373960138  # kg/m^3 per lb/ft^3
MPA = 1e6

KINDS = ("steel", "stainless", "aluminum", "lumber", "custom")


@dataclass(frozen=True)
class Material:
    key: str
    name: str
    kind: str
    e: float
    fy: float
    density: float
    fu: float | None = None
    g: float | None = None
    fy_welded: float | None = None
    fb: float | None = None
    fv: float | None = None
    source: str = ""
    notes: tuple[str, ...] = ()
    fu_welded: float | None = None
    hss_wall_factor: float | None = None
    aliases: tuple[str, ...] = field(default=(), compare=False)
    # Fc_perp, reference bearing perpendicular to grain: a typed-in lumber material only (the
    # built-in grades take theirs from shopbeam.members.wood)
    fc_perp: float | None = None
    # the figures as the standard publishes them, (US text, SI text), when a conversion of
    # the stored SI value would print an odd number (stainless 193 GPa is "28,000 ksi")
    published: tuple[str, str] | None = field(default=None, compare=False)
    # the thickness (m) up to which the unwelded and the welded values hold, where the
    # standard gives other values past it (None: no limit recorded)
    max_thickness: float | None = None
    welded_max_thickness: float | None = None


def figures(m: Material, system: str = "us") -> str:
    """The material's strength and stiffness as its trade writes them: lumber in psi with E
    in psi x 10^6 (Fb = 900 psi, E = 1.6e6 psi), stainless at its published round figures,
    metals E and Fy in ksi (MPa and GPa in SI)."""
    from shopbeam.units import fmt, num

    if m.published:
        return m.published[0 if system == "us" else 1]
    if m.kind == "lumber":
        fb = m.fb or m.fy
        # a member in wet service or heat carries E' = E CM Ct (wood.adjusted_material says
        # so in its source): named E', with the reference E and the factors
        adj = re.search(r"E' = E CM Ct = ([\d,]+) psi x ([\d.]+) x ([\d.]+)", m.source or "")
        name = "E'" if adj else "E"
        if system == "us":
            text = f"Fb = {num(fb / PSI, 4)} psi"
            if m.fv:
                text += f", Fv = {num(m.fv / PSI, 4)} psi"
            text += f", {name} = {num(m.e / PSI / 1e6, 3)}e6 psi"
            if adj:
                e0 = float(adj.group(1).replace(",", "")) / 1e6
                text += f" (E {num(e0, 3)}e6 psi x CM {adj.group(2)} x Ct {adj.group(3)})"
            return text
        text = f"Fb = {num(fb / MPA, 3)} MPa"
        if m.fv:
            text += f", Fv = {num(m.fv / MPA, 3)} MPa"
        text += f", {name} = {num(m.e / 1e9, 3)} GPa"
        if adj:
            e0 = float(adj.group(1).replace(",", "")) * PSI / 1e9
            text += f" (E {num(e0, 3)} GPa x CM {adj.group(2)} x Ct {adj.group(3)})"
        return text
    if system == "si":
        return f"E = {num(m.e / 1e9, 4)} GPa, Fy = {num(m.fy / MPA, 4)} MPa"
    return f"E = {fmt(m.e, 'stress', system, 5)}, Fy = {fmt(m.fy, 'stress', system)}"


# Steel common values: E = 29,000 ksi and G = 11,200 ksi (AISC 360-16 Section B and its
# Glossary / User Note); density 490 lb/ft^3 (AISC Manual, weight of steel).
_E_STEEL, _G_STEEL, _RHO_STEEL = 29000 * KSI, 11200 * KSI, 490 * LB_FT3
_STEEL_SRC = "E 29,000 ksi, G 11,200 ksi: AISC 360-16; density 490 lb/ft^3: AISC Manual"


def _lumber_density(g: float, mc: float = 15.0) -> float:
    """kg/m^3 of wood of specific gravity g (oven-dry weight, volume at mc %) at mc % moisture:
    62.4 [G / (1 + G x 0.009 x mc)] (1 + mc / 100) lb/ft^3 (NDS Supplement, from memory)."""
    return 62.4 * (g / (1 + g * 0.009 * mc)) * (1 + mc / 100) * LB_FT3


def _wood(key, name, e_psi, fb_psi, fv_psi, sg, table, aliases):
    return Material(key, name, "lumber", e_psi * PSI, fb_psi * PSI, _lumber_density(sg),
                    fb=fb_psi * PSI, fv=fv_psi * PSI,
                    source=f"Fb {fb_psi:g} psi, Fv {fv_psi:g} psi, E {e_psi:,} psi: NDS "
                    f"Supplement 2018 {table}, from memory; density from G = {sg:g} at 15 % "
                    "moisture", notes=(_LUMBER_NOTE,), aliases=tuple(aliases))


def _steel(key, name, fy_ksi, fu_ksi, spec, notes=(), aliases=(), wall=None):
    return Material(key, name, "steel", _E_STEEL, fy_ksi * KSI, _RHO_STEEL, fu=fu_ksi * KSI,
                    g=_G_STEEL, source=f"Fy {fy_ksi:g} ksi, Fu {fu_ksi:g} ksi: {spec}; "
                    f"{_STEEL_SRC}", notes=tuple(notes), aliases=tuple(aliases),
                    hss_wall_factor=wall)


EN_GRADES = ("S235", "S275", "S355")  # made as rolled sections, plate and hollow sections


def _en_steel(key, fy_mpa, fu_mpa, aliases):
    return Material(key, f"EN 10025-2 / EN 10219-1 structural steel {key}", "steel", _E_STEEL,
                    fy_mpa * MPA, _RHO_STEEL, fu=fu_mpa * MPA, g=_G_STEEL,
                    source=f"fy {fy_mpa} MPa up to 16 mm thick, fu {fu_mpa} MPa: EN 10025-2 "
                    "and EN 10219-1, from memory (lower yield past 16 mm); E 200 GPa "
                    "(29,000 ksi), G 77.2 GPa (11,200 ksi): AISC 360-16, whose checks these "
                    "are; density 490 lb/ft^3: AISC Manual",
                    notes=(f"{key}'s yield steps down past 16 mm thick ({fy_mpa - 10} MPa to "
                           "40 mm, EN 10025-2, from memory): a thicker section is not rated "
                           "on these values",),
                    aliases=tuple(aliases), max_thickness=0.016,
                    published=(f"E = 29,000 ksi, Fy = {fy_mpa / (KSI / MPA):.1f} ksi "
                               f"({fy_mpa} MPa)", f"E = 200 GPa, Fy = {fy_mpa} MPa"))


_A500_NOTE = ("ASTM A500 editions before 2018 gave round tube a lower yield than shaped "
              "(square/rectangular) tube (Gr B 42 vs 46 ksi, Gr C 46 vs 50 ksi); from A500-18 "
              "on round and shaped tube share one yield. Old stock or an old mill cert: use "
              "the -round key for round tube.")
_A513_NOTE = ("ASTM A513 mechanical tubing: strength depends on the type (as-welded, DOM), "
              "the steel grade and the mill's processing; the figure here is the specified "
              "minimum recalled from memory for the condition named. Use the mill cert when "
              "you have one. Design wall: 0.93 x nominal for as-welded (ERW) tube, the AISC 360-16 B4.2 "
              "rule for ERW HSS (A513 is not a grade 360 lists: the lower figure is taken); "
              "nominal for DOM. Write design_wall = \"nominal\" on the section where the wall "
              "is measured at its nominal size.")
_LUMBER_NOTE = ("reference design values for visually graded dimension lumber 2-4 in thick "
                "(NDS Supplement 2018, Table 4A/4B, from memory); timbers 5 in and thicker take "
                "their Table 4D values; the checks apply the NDS 2018 adjustment factors "
                "(CD, CM, Ct, CL, CF, Cfu, Cr, Cb) named in the report")

_MATERIALS: tuple[Material, ...] = (
    _steel("A36", "ASTM A36 carbon steel (plate, bar, shapes)", 36, 58, "ASTM A36/A36M",
           aliases=("a36", "astm a36")),
    _steel("A572-50", "ASTM A572 Grade 50 HSLA steel", 50, 65, "ASTM A572/A572M Gr 50",
           aliases=("a57250", "a572gr50", "a572grade50")),
    _steel("A992", "ASTM A992 structural steel (W shapes)", 50, 65, "ASTM A992/A992M",
           notes=("A992 also limits yield to 65 ksi max and Fy/Fu to 0.85",)),
    _steel("A500-B", "ASTM A500 Grade B structural tube (round: A500-18 on)", 46, 58,
           "ASTM A500/A500M Gr B (shaped)", notes=(_A500_NOTE,),
           aliases=("a500b", "a500grb", "a500gradeb", "a500bshaped", "a500brect"), wall=0.93),
    _steel("A500-B-round", "ASTM A500 Grade B structural tube, round (pre-2018 editions)", 42,
           58, "ASTM A500/A500M-13 Gr B (round)", notes=(_A500_NOTE,),
           aliases=("a500bround", "a500grbround"), wall=0.93),
    _steel("A500-C", "ASTM A500 Grade C structural tube (round: A500-18 on)", 50, 62,
           "ASTM A500/A500M Gr C (shaped)", notes=(_A500_NOTE,),
           aliases=("a500c", "a500grc", "a500gradec", "a500crect", "a500cshaped"),
           wall=0.93),
    _steel("A500-C-round", "ASTM A500 Grade C structural tube, round (pre-2018 editions)", 46,
           62, "ASTM A500/A500M-13 Gr C (round)", notes=(_A500_NOTE,),
           aliases=("a500cround", "a500grcround"), wall=0.93),
    _steel("A53-B", "ASTM A53 Grade B pipe (ERW or seamless)", 35, 60, "ASTM A53/A53M Gr B",
           aliases=("a53b", "a53grb", "a53", "a53gradeb"), wall=0.93),
    _steel("A513", "ASTM A513 Type 1/2 ERW mechanical tube, 1008/1010 as-welded", 30, 42,
           "ASTM A513 (Type 1/2, grade 1008, as welded), from memory", notes=(_A513_NOTE,),
           aliases=("a513", "a5131008", "a513type1", "a513type2", "mechanicaltube"), wall=0.93),
    _steel("A513-1020", "ASTM A513 ERW mechanical tube, 1020 as-welded", 38, 52,
           "ASTM A513 (grade 1020, as welded), from memory", notes=(_A513_NOTE,),
           aliases=("a5131020",), wall=0.93),
    _steel("A513-DOM", "ASTM A513 Type 5 DOM mechanical tube, 1020 stress relieved", 60, 70,
           "ASTM A513 (Type 5 DOM, 1020, stress relieved), from memory", notes=(_A513_NOTE,),
           aliases=("a513dom", "dom", "a513type5", "dom1020"), wall=1.0),
    # European structural steel: EN 10025-2 (hot-rolled sections and plate), EN 10210-1 and
    # EN 10219-1 (hollow sections, the "H" grades): minimum yield ReH for nominal thickness up
    # to 16 mm and tensile Rm from 3 mm up, from memory. Past 16 mm the yield steps down (by
    # 10 MPa to 40 mm), so these values hold to 16 mm only (max_thickness). E and G are
    # AISC 360-16's (the checks are AISC 360-16's; EN 1993-1-1 3.2.6 takes E = 210 GPa, so
    # deflections and buckling here are on the safe side by about 5 %).
    _en_steel("S235", 235, 360, ("s235jr", "s235j0", "s235j2", "s235jrh", "s235j0h",
                                  "s235j2h", "en10025s235")),
    _en_steel("S275", 275, 410, ("s275jr", "s275j0", "s275j2", "s275jrh", "s275j0h",
                                  "s275j2h", "en10025s275")),
    _en_steel("S355", 355, 470, ("s355jr", "s355j0", "s355j2", "s355k2", "s355jrh",
                                  "s355j0h", "s355j2h", "s355k2h", "en10025s355")),
    # Stainless: E 193 GPa (28,000 ksi), density 8000 kg/m^3 (ASTM A240 / producer data,
    # from memory); G 77 GPa.
    Material("304", "Type 304 stainless steel (annealed)", "stainless", 193e9, 205 * MPA,
             8000.0, fu=515 * MPA, g=77e9,
             source="Fy 205 MPa (30 ksi), Fu 515 MPa (75 ksi): ASTM A240/A554 annealed "
             "minimums; E 193 GPa, G 77 GPa, density 8000 kg/m^3: producer data, from memory",
             notes=("welding does not lower the annealed strength; cold-worked tube may be "
                    "stronger but is not credited",),
             aliases=("ss304", "304ss", "stainless304", "aisi304", "s30400"), hss_wall_factor=1.0,
             published=("E = 28,000 ksi, Fy = 30 ksi, Fu = 75 ksi", "E = 193 GPa, Fy = 205 MPa, Fu = 515 MPa")),
    Material("304L", "Type 304L stainless steel (annealed)", "stainless", 193e9, 170 * MPA,
             8000.0, fu=485 * MPA, g=77e9,
             source="Fy 170 MPa (25 ksi), Fu 485 MPa (70 ksi): ASTM A240 annealed minimums; "
             "E 193 GPa, G 77 GPa, density 8000 kg/m^3: producer data, from memory",
             aliases=("ss304l", "304lss", "stainless304l", "s30403"), hss_wall_factor=1.0,
             published=("E = 28,000 ksi, Fy = 25 ksi, Fu = 70 ksi", "E = 193 GPa, Fy = 170 MPa, Fu = 485 MPa")),
    Material("316", "Type 316 stainless steel (annealed)", "stainless", 193e9, 205 * MPA,
             8000.0, fu=515 * MPA, g=77e9,
             source="Fy 205 MPa (30 ksi), Fu 515 MPa (75 ksi): ASTM A240 annealed minimums; "
             "E 193 GPa, G 77 GPa, density 8000 kg/m^3: producer data, from memory",
             aliases=("ss316", "316ss", "stainless316", "s31600"), hss_wall_factor=1.0,
             published=("E = 28,000 ksi, Fy = 30 ksi, Fu = 75 ksi", "E = 193 GPa, Fy = 205 MPa, Fu = 515 MPa")),
    Material("316L", "Type 316L stainless steel (annealed)", "stainless", 193e9, 170 * MPA,
             8000.0, fu=485 * MPA, g=77e9,
             source="Fy 170 MPa (25 ksi), Fu 485 MPa (70 ksi): ASTM A240 annealed minimums; "
             "E 193 GPa, G 77 GPa, density 8000 kg/m^3: producer data, from memory",
             aliases=("ss316l", "316lss", "s31603"), hss_wall_factor=1.0,
             published=("E = 28,000 ksi, Fy = 25 ksi, Fu = 70 ksi", "E = 193 GPa, Fy = 170 MPa, Fu = 485 MPa")),
    # Aluminium: Aluminum Design Manual 2015, Part A, minimum mechanical properties of
    # extrusions, unwelded and welded (heat-affected zone), from memory. E 10,100 ksi
    # (compression modulus), density 0.098 lb/in^3 (6061) and 0.097 (6063), from memory.
    Material("6061-T6", "Aluminium 6061-T6 extrusion / tube", "aluminum", 10100 * KSI,
             35 * KSI, 0.098 * 1728 * LB_FT3, fu=38 * KSI, g=3800 * KSI,
             fy_welded=15 * KSI, fu_welded=24 * KSI, welded_max_thickness=0.375 * IN,
             source="Fty 35 ksi, Ftu 38 ksi; welded Ftyw 15 ksi, Ftuw 24 ksi (up to 0.375 in "
             "thick; lower past it); E 10,100 ksi; "
             "G 3,800 ksi; density 0.098 lb/in^3: Aluminum Design Manual 2015, from memory",
             notes=("welding within 1 in of a point lowers the strength there to the welded "
                    "(heat-affected zone) value",),
             aliases=("6061", "6061t6", "al6061", "6061t6511", "aluminum6061", "aluminium6061"),
             hss_wall_factor=1.0),
    Material("6063-T5", "Aluminium 6063-T5 extrusion", "aluminum", 10100 * KSI, 16 * KSI,
             0.097 * 1728 * LB_FT3, fu=22 * KSI, g=3800 * KSI, fy_welded=8 * KSI,
             fu_welded=17 * KSI, max_thickness=0.5 * IN,
             source="Fty 16 ksi, Ftu 22 ksi (up to 0.5 in thick; lower past it); welded Ftyw 8 ksi, Ftuw "
             "17 ksi; E 10,100 ksi; density 0.097 lb/in^3: Aluminum Design Manual 2015, "
             "from memory",
             aliases=("6063t5", "al6063t5"), hss_wall_factor=1.0),
    Material("6063-T6", "Aluminium 6063-T6 extrusion / pipe", "aluminum", 10100 * KSI,
             25 * KSI, 0.097 * 1728 * LB_FT3, fu=30 * KSI, g=3800 * KSI, fy_welded=8 * KSI,
             fu_welded=17 * KSI,
             source="Fty 25 ksi, Ftu 30 ksi; welded Ftyw 8 ksi, Ftuw 17 ksi; E 10,100 ksi; "
             "density 0.097 lb/in^3: Aluminum Design Manual 2015, from memory",
             aliases=("6063t6", "al6063t6"), hss_wall_factor=1.0),
    # Lumber: NDS Supplement 2018 Table 4A/4B reference values for dimension lumber (timber
    # sizes take their Table 4D row, see shopbeam.members.wood); density from specific
    # gravity (NDS Table 12.3.3A: DF-L 0.50, Hem-Fir 0.43, SPF 0.42, Southern Pine 0.55) at
    # about 15 % moisture, from memory.
    _wood("SPF-2", "Spruce-Pine-Fir No.1/No.2 dimension lumber", 1_400_000, 875, 135, 0.42,
          "Table 4A (SPF No.1/No.2)",
          ("spf", "spf2", "spfno2", "sprucepinefir", "spfno1no2", "spf1/2")),
    _wood("DF-L-2", "Douglas Fir-Larch No.2 dimension lumber", 1_600_000, 900, 180, 0.50,
          "Table 4A (DF-L No.2)",
          ("dfl", "dfl2", "dflno2", "douglasfir", "douglasfirlarch", "df2", "df")),
    _wood("DF-L-1", "Douglas Fir-Larch No.1 dimension lumber", 1_700_000, 1000, 180, 0.50,
          "Table 4A (DF-L No.1)", ("dfl1", "dflno1", "df1")),
    _wood("DF-L-SS", "Douglas Fir-Larch Select Structural dimension lumber", 1_900_000, 1500,
          180, 0.50, "Table 4A (DF-L Select Structural)",
          ("dflss", "dflselectstructural", "dfss")),
    _wood("HF-2", "Hem-Fir No.2 dimension lumber", 1_300_000, 850, 150, 0.43,
          "Table 4A (Hem-Fir No.2)", ("hemfir", "hemfir2", "hemfirno2", "hf", "hfno2")),
    _wood("SP-2", "Southern Pine No.2 dimension lumber", 1_400_000, 1100, 175, 0.55,
          "Table 4B (Southern Pine No.2, 2-4 in wide; narrower values for wider sizes)",
          ("sp", "sp2", "spno2", "southernpine", "southernpine2", "syp", "syp2")),
    Material("LVL-2.0E", "LVL 2.0E-2600Fb (laminated veneer lumber)", "lumber",
             2_000_000 * PSI, 2600 * PSI, 42 * LB_FT3, fb=2600 * PSI, fv=285 * PSI,
             source="Fb 2600 psi at 12 in depth, Fv 285 psi, E 2,000,000 psi: typical "
             "manufacturer's values for 2.0E-2600Fb LVL, from memory (use the maker's "
             "published values); density about 42 lb/ft^3, from memory",
             notes=("LVL: dry service only; the depth factor (12/d)^0.136 applies to Fb",),
             aliases=("lvl", "lvl2.0e", "lvl20e", "lvl2.0e2600fb", "lvl2600")),
)


# "al 6063", "aluminum 6063": the alloy number alone, to find the tempers built in
_ALLOY_PREFIX = re.compile(r"^(?:al|alu|alum|aluminum|aluminium)(?=\d)")


def untempered(spec, material) -> str:
    """What to say when an aluminium alloy was named without its temper ("6061") and read as
    the one temper built in: the annealed and T4 tempers of the same alloy are far weaker."""
    if not isinstance(spec, str) or getattr(material, "kind", "") != "aluminum":
        return ""
    typed = _ALLOY_PREFIX.sub("", _norm(spec))
    if not typed.isdigit():
        return ""
    return (f"material {spec!r} has no temper and is read as {material.key!r} (Fty "
            f"{material.fy / KSI:g} ksi), the one {typed} temper built in; other tempers "
            f"({typed}-O, {typed}-T4) are far weaker: write {material.key!r} if the mill cert "
            "says so, or give a [beam.material] table with its values")


# Names of a species or specification with no grade, read as the one grade built in
_UNGRADED = {"dfl": "the grade stamp (No.1, No.2, Select Structural; No.3 and Stud are weaker "
                    "and not built in)",
             "df": "the grade stamp", "douglasfir": "the grade stamp",
             "douglasfirlarch": "the grade stamp", "hemfir": "the grade stamp",
             "hf": "the grade stamp", "sp": "the grade stamp", "syp": "the grade stamp",
             "southernpine": "the grade stamp", "a53": "the mill cert (Grade A is 30 ksi)"}


def ungraded(spec, material) -> str:
    """What to say when a species or specification was named without its grade ("DF-L",
    "SYP", "A53") and read as the one grade built in: other grades of it are weaker."""
    if not isinstance(spec, str) or material is None:
        return ""
    typed = _norm(spec)
    if typed not in _UNGRADED:
        return ""
    if material.kind == "lumber":
        strength = f"Fb {material.fb / PSI:,.0f} psi" if getattr(material, "fb", None) else ""
    else:
        strength = f"Fy {material.fy / KSI:g} ksi"
    return (f"material {spec!r} names no grade and is read as {material.key!r} ({material.name}"
            f"{', ' + strength if strength else ''}); a lower grade of it is weaker: write "
            f"{material.key!r} if {_UNGRADED[typed]} says so, or the grade it is")


def _norm(text: str) -> str:
    t = text.strip().lower()
    t = re.sub(r"\bastm\b", "", t)
    t = re.sub(r"\b(grade|gr\.?)\b", "", t)
    t = re.sub(r"\btype\b", "", t)
    t = re.sub(r"[\s\-_.]+", "", t)
    t = t.replace("no.", "no")
    return t


@lru_cache(maxsize=1)
def _index() -> dict[str, Material]:
    idx: dict[str, Material] = {}
    for m in _MATERIALS:
        for name in (m.key, *m.aliases):
            idx.setdefault(_norm(name), m)
    return idx


def list_materials() -> list[Material]:
    """The built-in materials, in the order above (steel, stainless, aluminium, lumber)."""
    return list(_MATERIALS)


def get(key: str) -> Material | None:
    return _index().get(_norm(key))


def resolve_material(spec, key: str = "beam.material") -> Material:
    """A Material from a built-in key (spelling tolerant) or an inline table.

    A bare specification with several grades ("A500", "A572") is not guessed: the message
    names the grades to choose from."""
    if isinstance(spec, str):
        m = get(spec)
        if m is not None:
            return m
        bare = _ALLOY_PREFIX.sub("", _norm(spec))
        grades = [x.key for x in _MATERIALS if _norm(x.key).startswith(bare) and bare]
        if len(grades) > 1 or (grades and len(bare) >= 3):
            what = ("an alloy with several tempers built in" if bare.isdigit()
                    else "a specification with grades")
            raise InputError(f"{spec!r} names {what}: say which, "
                             f"{' or '.join(repr(g) for g in grades)}", key)
        import difflib

        keys = [x.key for x in _MATERIALS]
        norm = {_norm(k): k for k in keys} | {a: m.key for a, m in _index().items()}
        close = difflib.get_close_matches(_norm(spec), list(norm), n=3, cutoff=0.5)
        seen = []
        for c in close:
            if norm[c] not in seen:
                seen.append(norm[c])
        hint = f"did you mean {' or '.join(repr(s) for s in seen)}? " if seen else ""
        if re.fullmatch(r"\s*\d{2}F-[VE]\d+\w*\s*", str(spec), re.IGNORECASE):
            hint = ("that is a glued-laminated timber (glulam) stress class, and glulam is not "
                    "built in nor rated (its volume factor, NDS 2018 5.3.6, is not checked): "
                    "pick a sawn grade or LVL, or have the glulam member checked; a table of "
                    "its values needs kind = \"lumber\" with fb, fv and fc_perp, else it "
                    "is checked as a metal on first yield; ")
        raise InputError(f"unknown material {spec!r}; {hint}built-in materials are "
                         f"{', '.join(keys)} (or give a table with e, fy and density)", key)
    if isinstance(spec, Mapping):
        return _inline(spec, key)
    raise InputError(f"material must be a name such as \"A36\" or a table with e, fy and "
                     f"density, not {spec!r}", key)


_INLINE_KEYS = {"e": "stress", "fy": "stress", "density": "density", "fu": "stress",
                "g": "stress", "fy_welded": "stress", "fu_welded": "stress", "fb": "stress",
                "fv": "stress",
                "fc_perp": "stress"}


# Highest reference design values of any graded sawn lumber, glulam or structural composite
# lumber, with room to spare (NDS Supplement 2018 Tables 4A-4D, 5A and the SCL makers'
# literature top out near Fb 3,000 psi, Fv 300 psi, Fc_perp 1,000 psi; common
# practice, from memory). Past these a unit was slipped: "900 MPa" or "180 ksi" for psi.
_WOOD_TOP = {"fb": (6000.0, "Fb 900 psi for DF-L No.2, 2,400 psi for 24F glulam"),
             "fy": (6000.0, "Fb 900 psi for DF-L No.2, 2,400 psi for 24F glulam"),
             "fv": (600.0, "Fv 180 psi for DF-L No.2, 265 psi for glulam"),
             "fc_perp": (2000.0, "Fc_perp 625 psi for DF-L No.2")}
# (an e no wood has, a steel's typed under kind = "lumber", is the kind mismatch the reader
# warns of and capacity does not rate: see jobs.jobfile.kind_mismatch)


def _plausible_wood(spec: Mapping, vals: dict, key: str) -> None:
    """Refuse a typed-in lumber value no wood product has (a unit slip)."""
    for k, (top, usual) in _WOOD_TOP.items():
        if k in spec and k in vals and vals[k] > top * PSI:
            typed = str(spec[k]).strip()
            num = typed.split()[0] if typed.split() else typed
            raise InputError(
                f"{k} = {spec[k]!r} ({vals[k] / PSI:,.0f} psi) is more than any lumber, glulam "
                f"or composite lumber has (about {top:,.0f} psi at most; {usual}): check the "
                f"unit, e.g. \"{num} psi\" rather than {typed!r}",
                f"{key}.{k}")


def _inline(spec: Mapping, key: str) -> Material:
    allowed = set(_INLINE_KEYS) | {"name", "kind", "key", "source"}
    bad = []  # every slip of the table named at once, as the rest of the job's are
    for k in spec:
        if k not in allowed:
            import difflib

            close = difflib.get_close_matches(k, list(allowed), n=1)
            hint = f" (did you mean {close[0]!r}?)" if close else ""
            bad.append(InputError(f"unknown key {k!r} in the material table{hint}; keys are "
                                  f"{', '.join(sorted(allowed))}", f"{key}.{k}"))
    kind = spec.get("kind", "custom")
    if kind not in KINDS:
        low = kind.strip().lower() if isinstance(kind, str) else ""
        bad.append(InputError(f"kind must be one of {', '.join(KINDS)}, not {kind!r}" + (
            f"; write it in lower case: kind = \"{low}\"" if low in KINDS else ""),
            f"{key}.kind"))
    vals = {}
    for k, unit_kind in _INLINE_KEYS.items():
        if k in spec:
            try:
                vals[k] = parse(spec[k], unit_kind, f"{key}.{k}", positive=True)
            except InputError as exc:
                bad.append(exc)
    if "fy" not in spec and "fb" in vals:
        vals["fy"] = vals["fb"]
    for k in ("e", "fy", "density"):
        if k not in vals and not (k in spec or k == "fy" and "fb" in spec):
            what = {"e": "the elastic modulus e (e.g. \"29000 ksi\")",
                    "fy": "the yield strength fy (e.g. \"36 ksi\"; for lumber fb)",
                    "density": "the density (e.g. \"490 lb/ft^3\")"}[k]
            bad.append(InputError(f"an inline material needs {what}", f"{key}.{k}"))
    raise_all(bad)
    if vals["e"] < 1e9 or vals["e"] > 1e12:
        raise InputError(f"e = {spec['e']!r} is not a plausible elastic modulus (steel is "
                         "29000 ksi, aluminium 10100 ksi, lumber about 1600 ksi)", f"{key}.e")
    # Plausible ranges (common practice, no source): yield of any structural metal or bending
    # strength of any graded lumber lies between about 2 MPa (290 psi) and 2000 MPa (290 ksi);
    # any solid a shop makes a beam of weighs between about 50 and 25,000 kg/m^3 (balsa to
    # tungsten). Outside them a unit was slipped ("50 psi" for 50 ksi, lb/in^3 for lb/ft^3).
    named = "fy" if "fy" in spec else "fb"
    if not 2e6 <= vals["fy"] <= 2e9:
        raise InputError(f"{named} = {spec.get('fy', spec.get('fb'))!r} is not a plausible strength "
                         "(mild steel 36 ksi, A500-C 50 ksi, 6061-T6 35 ksi, lumber Fb about "
                         "0.9 ksi): check the unit, e.g. \"50 ksi\" rather than \"50 psi\"",
                         f"{key}.fy" if "fy" in spec else f"{key}.fb")
    if not 50.0 <= vals["density"] <= 25000.0:
        raise InputError(f"density = {spec['density']!r} is not a plausible density (steel "
                         "490 lb/ft^3, aluminium 169 lb/ft^3, lumber about 35 lb/ft^3): check the "
                         "unit, e.g. lb/ft^3 rather than lb/in^3", f"{key}.density")
    if vals["fy"] >= vals["e"]:
        raise InputError("fy is not less than e: check the units", f"{key}.fy")
    if "fu" in vals and vals["fu"] < vals["fy"]:
        raise InputError("fu is less than fy", f"{key}.fu")
    if "fu_welded" in vals and vals["fu_welded"] < vals.get("fy_welded", 0.0):
        raise InputError("fu_welded is less than fy_welded", f"{key}.fu_welded")
    if "fu_welded" in vals and "fu" in vals and vals["fu_welded"] > vals["fu"]:
        raise InputError("fu_welded is more than fu: welding lowers the strength near the "
                         "weld (6061-T6 Ftu 38 ksi, Ftuw 24 ksi, ADM 2015 Table A.3.3, from "
                         "memory); check the two figures", f"{key}.fu_welded")
    if kind == "lumber":
        _plausible_wood(spec, vals, key)
    if kind == "lumber" and "fv" not in vals:
        # NDS shear values are not a fixed share of Fb (DF-L No.2: Fb 900 psi, Fv 180 psi,
        # NDS Supplement 2018 Table 4A, from memory): nothing is guessed
        raise InputError("a typed-in lumber material needs fv, the reference shear value "
                         "parallel to grain (e.g. fv = \"180 psi\" for Douglas Fir-Larch No.2, "
                         "NDS Supplement 2018 Table 4A): shear is checked against it, and "
                         "no value is guessed from fb. Give fv (and fc_perp for bearing, "
                         "e.g. \"625 psi\")", f"{key}.fv")
    name = spec.get("name", "custom material")
    if not isinstance(name, str):
        raise InputError("name must be text", f"{key}.name")
    return Material(key=spec.get("key", "custom"), name=name, kind=kind, source="typed in",
                    **vals)
