"""Catalog: the standard shapes and stock sizes shopbeam knows by name.

- AISC shapes (W, M, S, HP, C, MC, L, WT, MT, ST, HSS, Pipe) with their tabulated
  properties from ``data/aisc-shapes-v15.csv`` (AISC Shapes Database v15.0, trimmed),
  read once on first use.
- Flat, square and round bar in common US stock sizes, computed from dimensions.
- Metric sections by their standard dimensions, computed from dimensions: SHS/RHS/CHS
  (EN 10219-2 cold-formed hollow sections, corner radius per EN 10219-2), IPE, HEA, HEB
  and UPN (EN 10365). These dimension tables are recalled from memory of the standards'
  tables and the tests check them against properties recalled from the same tables.

Look-up is spelling tolerant: case, spaces, ``x``/``X``/``*``, decimal or fraction walls
(``HSS4x4x1/4`` = ``hss 4 x 4 x .250``), mixed numbers (``L3-1/2x3x1/4`` = ``L 3 1/2 x 3 x
1/4``) and the EDI names (``Pipe2SCH40``). Shop descriptions such as ``rect-tube 2 x 1 x
14ga``, ``round-tube 1.5 x 0.065``, ``flat-bar 3 x 1/4`` or ``round-bar 1`` are computed on
the spot; bare numbers there are inches like the AISC designations (or millimetres when
the text says ``mm``), and a wall may be a gauge. A near miss gets "did you mean ...".
"""

from __future__ import annotations

import csv
import difflib
import math
import re
from functools import lru_cache
from importlib import resources

from shopbeam.cautions import SHORT
from shopbeam.errors import InputError
from shopbeam.members import gauges
from shopbeam.members import sections as S
from shopbeam.members.sections import Section
from shopbeam.units import fmt, num, parse

IN = 0.0254
MM = 0.001
LB_FT = 0.45359237 / 0.3048  # kg/m per lb/ft
AISC_SOURCE = "AISC Shapes Database v15.0"
STEEL_DENSITY = 490 * 0.45359237 / 0.3048**3  # 490 lb/ft^3, the basis of the AISC weights

# ----------------------------------------------------------------- designation keys
_MIXED = re.compile(r"(\d+)\s*[- ]\s*(\d+)\s*/\s*(\d+)")


_MIXED_NUM = re.compile(r"(\d+)-(\d+)/(\d+)")
_FRACTION = re.compile(r"(\d+)/(\d+)")
_DECIMAL = re.compile(r"\d*\.?\d+|\d+\.")


def _number(tok: str) -> float | None:
    """A size token: "4", ".250", "1/4", "1-1/2" -> float; None if it is not one."""
    tok = tok.strip()
    if _DECIMAL.fullmatch(tok):
        return float(tok)
    try:
        m = _FRACTION.fullmatch(tok)
        if m:
            return int(m.group(1)) / int(m.group(2))
        m = _MIXED_NUM.fullmatch(tok)
        if m:
            return int(m.group(1)) + int(m.group(2)) / int(m.group(3))
    except ZeroDivisionError:
        return None
    return None


def _prep(text: str) -> str:
    s = text.upper().replace("\u00d7", "X").replace("*", "X").replace('"', "").replace("''", "")
    s = _MIXED.sub(lambda m: f"{m.group(1)}-{m.group(2)}/{m.group(3)}", s)
    s = re.sub(r"\s*/\s*", "/", s)
    s = re.sub(r"\s+", "", s)
    return s


_PIPE = re.compile(r"^PIPE(?P<n>[\d./-]+)(?P<w>STD|XXS|XS|SCH\d+)$")
_HE = re.compile(r"^HE(?P<n>\d+)(?P<s>[AB])$")


def canon(text: str) -> str | None:
    """The canonical key of a designation ("HSS|4|4|0.25"), or None if it does not scan."""
    s = _prep(text)
    if not s:
        return None
    m = _PIPE.match(s)
    if m:
        n = _number(m.group("n"))
        return None if n is None else f"PIPE|{n:g}|{m.group('w')}"
    m = _HE.match(s)
    if m:
        s = f"HE{m.group('s')}{m.group('n')}"
    m = re.match(r"^([A-Z]+)(.*)$", s)
    if not m or not m.group(2):
        return None
    prefix, rest = m.groups()
    nums = []
    for tok in rest.split("X"):
        v = _number(tok)
        if v is None:
            return None
        nums.append(v)
    if prefix == "SHS" and len(nums) == 2:
        nums = [nums[0], nums[0], nums[1]]
    return "|".join([prefix] + [f"{round(v, 4):g}" for v in nums])


# ----------------------------------------------------------------- AISC rows
_FLOAT_COLS = ("W", "A", "d", "Ht", "OD", "bf", "B", "t", "tw", "tf", "tnom", "tdes",
               "kdes", "x", "y", "Ix", "Zx", "Sx", "rx", "Iy", "Zy", "Sy", "ry", "Iz", "rz",
               "tan(a)", "J", "Cw", "rts", "ho", "h/tw", "bf/2tf", "b/t", "b/tdes",
               "h/tdes", "D/t", "Iw", "Sw", "Sz")


@lru_cache(maxsize=1)
def _aisc_lines() -> tuple[str, ...]:
    """The shipped AISC table's header and data lines (comments dropped)."""
    text = resources.files("shopbeam").joinpath("data/aisc-shapes-v15.csv").read_text("utf-8")
    return tuple(ln for ln in text.splitlines() if ln and not ln.startswith("#"))


def _row(r: dict) -> dict:
    row = {"Type": r["Type"], "label": r["AISC_Manual_Label"], "edi": r["EDI_Std_Nomenclature"]}
    for c in _FLOAT_COLS:
        v = r.get(c, "")
        row[c] = float(v) if v else None
    return row


def _rows_of(header: str, lines) -> list[dict]:
    """`_row` of each data line (the same dicts), read by column position: a DictReader
    builds a dict of all 85 columns per line, of which a row keeps 42."""
    names = next(csv.reader([header]))
    at = {c: i for i, c in reversed(list(enumerate(names)))}  # the first column of a name
    cols = [(c, at[c]) for c in _FLOAT_COLS if c in at]
    missing = [c for c in _FLOAT_COLS if c not in at]
    it, il, ie = at["Type"], at["AISC_Manual_Label"], at["EDI_Std_Nomenclature"]
    out = []
    for r in csv.reader(lines):
        n = len(r)
        row = {"Type": r[it], "label": r[il], "edi": r[ie]}
        for c, i in cols:
            v = r[i] if i < n else ""
            row[c] = float(v) if v else None
        for c in missing:
            row[c] = None
        out.append(row)
    return out


@lru_cache(maxsize=1)
def _aisc_rows() -> tuple[dict, ...]:
    return tuple(_row(r) for r in csv.DictReader(_aisc_lines()))


AISC_KEYS_FILE = "data/aisc-keys.json"  # canonical key -> data line, built by aisc_key_index


def aisc_key_index(lines: tuple[str, ...] | None = None) -> dict[str, int]:
    """Canonical key of every AISC label -> its line in the shipped table (first one wins).

    Shipped pre-built as data/aisc-keys.json (a test rebuilds it and compares), so a look-up
    is a dictionary access instead of a scan of the table.
    """
    lines = lines or _aisc_lines()
    out: dict[str, int] = {}
    for i, line in enumerate(lines[1:], start=1):
        k = canon(line.split(",", 2)[1])
        if k is not None and k not in out:
            out[k] = i
    return out


@lru_cache(maxsize=1)
def _aisc_keys() -> dict[str, int]:
    import json

    try:
        data = json.loads(resources.files("shopbeam").joinpath(AISC_KEYS_FILE).read_text("utf-8"))
        if data.get("lines") == len(_aisc_lines()):
            return data["keys"]
    except (OSError, ValueError, KeyError, AttributeError):
        pass
    return aisc_key_index()  # missing or stale: build it (about 60 ms)


def _quick_aisc(k: str) -> Section | None:
    """One AISC section by its canonical key from the pre-built key index: a job names one
    section, and a cold `shopbeam solve` should not pay for all 1,450 (None: not found this
    way; the index decides)."""
    i = _aisc_keys().get(k)
    if i is None:
        return None
    lines = _aisc_lines()
    return _from_aisc(_row(next(csv.DictReader([lines[0], lines[i]]))))


def _f(row, c, unit):
    v = row[c]
    return None if v is None else v * unit


def _from_aisc(row) -> Section:
    """A Section (strong axis) from one AISC row; tabulated values, converted exactly."""
    typ, label = row["Type"], row["label"]
    a = row["A"] * IN**2
    ix, iy = row["Ix"] * IN**4, row["Iy"] * IN**4
    sx, sy = row["Sx"] * IN**3, row["Sy"] * IN**3
    zx, zy = _f(row, "Zx", IN**3), _f(row, "Zy", IN**3)
    rx, ry = _f(row, "rx", IN), _f(row, "ry", IN)
    j, cw = _f(row, "J", IN**4), _f(row, "Cw", IN**6)
    mass = row["W"] * LB_FT if row["W"] else None
    src = AISC_SOURCE
    warnings: tuple[str, ...] = ()
    if typ == "HSS" and row["OD"] is None:
        h, b, tn, td = row["Ht"] * IN, row["B"] * IN, row["tnom"] * IN, row["tdes"] * IN
        hf, bf = h - 3 * td, b - 3 * td
        dims = {"h": h, "b": b, "t_nom": tn, "t_des": td, "r_out": 2 * td, "h_flat": hf,
                "b_flat": bf, "h_t": row["h/tdes"], "b_t": row["b/tdes"]}
        shape, s_top, s_bot, shear, depth, axis = "rect-tube", sx, sx, 2 * hf * td, h, "strong"
        src += " (design wall 0.93 x nominal, ERW HSS, AISC 360 B4.2)"
        cw = None
    elif typ in ("HSS", "PIPE"):
        od, tn, td = row["OD"] * IN, row["tnom"] * IN, row["tdes"] * IN
        dims = {"od": od, "t_nom": tn, "t_des": td, "D_t": row["D/t"]}
        shape = "round-tube" if typ == "HSS" else "pipe"
        s_top = s_bot = sx
        shear, depth, axis, cw = a / 2, od, "n/a", None
        src += " (design wall 0.93 x nominal, AISC 360 B4.2)"
    elif typ in ("W", "M", "S", "HP", "C", "MC"):
        d, bf, tf, tw = (row[k] * IN for k in ("d", "bf", "tf", "tw"))
        kdes = row["kdes"] * IN
        dims = {"d": d, "bf": bf, "tf": tf, "tw": tw, "kdes": kdes,
                "ho": _f(row, "ho", IN) or d - tf, "h_tw": row["h/tw"]}
        if row["rts"] is not None:
            dims["rts"] = row["rts"] * IN
        if typ in ("C", "MC"):
            shape = "channel"
            dims["x"] = row["x"] * IN
            dims["b_t"] = row["b/t"] if row["b/t"] is not None else bf / tf
        else:
            shape = "i-beam"
            dims["bf_2tf"] = row["bf/2tf"]
        s_top = s_bot = sx
        shear, depth, axis = d * tw, d, "strong"
    elif typ == "L":
        # the database's Ix is about the axis across the longer leg (longer leg vertical),
        # y measured from the heel along that leg
        legs = [float(v) for v in _label_nums(label)]
        dl, bs, t = legs[0] * IN, legs[1] * IN, row["t"] * IN
        y, x = row["y"] * IN, row["x"] * IN
        dims = {"d": dl, "b": bs, "t": t, "y": y, "x": x, "b_t": row["b/t"],
                "iz": row["Iz"] * IN**4, "rz": row["rz"] * IN, "tan_alpha": row["tan(a)"],
                "iw": row["Iw"] * IN**4, "sw": row["Sw"] * IN**3, "sz": row["Sz"] * IN**3,
                "kdes": row["kdes"] * IN}
        shape, axis = "angle", "geometric"
        s_top, s_bot = ix / (dl - y), ix / y  # horizontal leg at the bottom
        shear, depth = dl * t, dl
        warnings = (S.ANGLE_WARNING,)
    elif typ in ("WT", "MT", "ST"):
        d, bf, tf, tw = (row[k] * IN for k in ("d", "bf", "tf", "tw"))
        y = row["y"] * IN
        dims = {"d": d, "bf": bf, "tf": tf, "tw": tw, "kdes": row["kdes"] * IN, "y": y,
                "d_tw": d / tw, "bf_2tf": row["bf/2tf"] or bf / (2 * tf)}
        shape, axis = "tee", "strong"
        s_top, s_bot = ix / y, ix / (d - y)  # flange on top
        shear, depth = d * tw, d
    else:  # pragma: no cover - the data file holds only the types above
        raise ValueError(typ)
    return Section(label, shape, a, ix, s_top, s_bot, zx, iy, sy, zy, rx, ry, j, cw, shear,
                   depth, axis, dims, src, warnings, mass, STEEL_DENSITY if mass else None)


def _label_nums(label: str) -> list[float]:
    key = canon(label) or ""
    return [float(v) for v in key.split("|")[1:]]


# ----------------------------------------------------------------- generated stock
# US bar stock sizes (common practice: what steel service centres list), inches.
_FB_WIDTHS = ("1/2", "3/4", "1", "1-1/4", "1-1/2", "1-3/4", "2", "2-1/2", "3", "3-1/2", "4",
              "4-1/2", "5", "6", "7", "8", "10", "12")
_FB_THICK = ("1/8", "3/16", "1/4", "5/16", "3/8", "1/2", "5/8", "3/4", "1")
_RB_SIZES = ("1/4", "5/16", "3/8", "1/2", "5/8", "3/4", "7/8", "1", "1-1/8", "1-1/4", "1-3/8",
             "1-1/2", "1-3/4", "2", "2-1/4", "2-1/2", "3", "3-1/2", "4")
_SQ_SIZES = ("1/4", "3/8", "1/2", "5/8", "3/4", "1", "1-1/4", "1-1/2", "2", "2-1/2", "3")

# ASTM A513 mechanical tube commonly stocked by service centres (common practice), inches
# and Birmingham gauge walls (16 ga 0.065, 14 ga 0.083, 11 ga 0.120, 7 ga 0.180 in).
MECH_RECT = {
    ("1/2", "1/2"): (18, 16), ("3/4", "3/4"): (16, 14), ("1", "1"): (16, 14, 11),
    ("1-1/4", "1-1/4"): (16, 14, 11), ("1-1/2", "1-1/2"): (16, 14, 11),
    ("1-3/4", "1-3/4"): (14, 11), ("2", "2"): (16, 14, 11, 7), ("2-1/2", "2-1/2"): (14, 11, 7),
    ("3", "3"): (14, 11, 7), ("4", "4"): (11, 7), ("1", "1/2"): (16,), ("1-1/2", "1"): (16, 14),
    ("1-1/2", "3/4"): (16, 14), ("2", "1"): (16, 14, 11), ("3", "1"): (16, 14, 11),
    ("3", "1-1/2"): (14, 11), ("3", "2"): (14, 11, 7), ("4", "2"): (14, 11, 7),
    ("4", "3"): (11, 7), ("5", "2"): (11, 7), ("6", "2"): (11, 7), ("6", "4"): (11, 7),
}
MECH_ROUND = {
    "1/2": (18, 16), "5/8": (16, 14), "3/4": (16, 14), "7/8": (16, 14), "1": (16, 14, 11),
    "1-1/4": (16, 14, 11), "1-1/2": (16, 14, 11), "1-3/4": (16, 14, 11), "2": (16, 14, 11),
    "2-1/2": (14, 11), "3": (14, 11),
}

# Dressed sizes of sawn lumber, inches, by nominal size (NDS Supplement 2018 Table 1A/1B,
# dry dressed, from memory). Dimension lumber (2 to 4 in nominal thickness): 2 -> 1-1/2,
# 3 -> 2-1/2, 4 -> 3-1/2, 6 -> 5-1/2, 8 -> 7-1/4, 10 -> 9-1/4, 12 -> 11-1/4. Timbers (5 in
# nominal and thicker): 1/2 in less than nominal each way, so a 6x8 is 5-1/2 x 7-1/2.
# Boards (1 in nominal) and the widest dimension sizes, 14 and 16 in, the same table: 1 ->
# 3/4, 14 -> 13-1/4, 16 -> 15-1/4 (the catalog lists none of them; a size typed in is read).
DRESSED = {1: 0.75, 2: 1.5, 3: 2.5, 4: 3.5, 6: 5.5, 8: 7.25, 10: 9.25, 12: 11.25, 14: 13.25,
           16: 15.25}
LUMBER_SIZES = ((2, 2), (2, 3), (2, 4), (2, 6), (2, 8), (2, 10), (2, 12), (4, 4), (4, 6),
                (4, 8), (4, 10), (4, 12), (6, 6), (6, 8), (6, 10), (6, 12), (8, 8), (8, 10),
                (8, 12))
_LUMBER = re.compile(r"^\s*(\d{1,2})\s*[xX\u00d7*]\s*(\d{1,2})\s*(?:lumber|sawn|wood|timber)?\s*$",
                     re.IGNORECASE)


def dressed(thick: int, wide: int) -> tuple[float, float]:
    """(thickness, width) in inches of a dressed (surfaced dry) size: dimension lumber by
    DRESSED, timbers 5 in and thicker 1/2 in under nominal (NDS Supplement Table 1B)."""
    if thick >= 5:
        return thick - 0.5, wide - 0.5
    return DRESSED[thick], DRESSED[wide]


def _lumber(thick: int, wide: int, designation: str) -> Section:
    """A sawn lumber member on edge: nominal `thick` x `wide`, dressed sizes."""
    t, w = dressed(thick, wide)
    what = "timber" if thick >= 5 else "dimension lumber"
    return S.rect_bar(w * IN, t * IN, designation=designation,
                      source=f"dressed lumber size {t:g} x {w:g} in ({what}, NDS Supplement "
                      "Table 1B, from memory), computed from dimensions")


# LVL (laminated veneer lumber) stock: 1-3/4 in plies (and two plies, 3-1/2 in) in the
# depths makers sell (common practice, from memory). Designation "LVL1-3/4x11-7/8".
LVL_DEPTHS = ((5.5, "5-1/2"), (7.25, "7-1/4"), (9.25, "9-1/4"), (9.5, "9-1/2"),
              (11.25, "11-1/4"), (11.875, "11-7/8"), (14.0, "14"), (16.0, "16"), (18.0, "18"))
LVL_WIDTHS = ((1.75, "1-3/4"), (3.5, "3-1/2"))


def _lvl(width: float, depth: float, designation: str) -> Section:
    return S.rect_bar(depth * IN, width * IN, designation=designation,
                      source=f"LVL size {width:g} x {depth:g} in (engineered wood, makers' stock "
                      "sizes, from memory), computed from dimensions")


def is_wood_size(sec: Section) -> bool:
    """True for a catalog lumber or LVL size."""
    return is_lumber_size(sec) or (sec.shape == "rect-bar" and "LVL size" in (sec.source or ""))


# catalog sources whose shapes are rolled, welded or cold-formed carbon-steel shapes (not bar
# stock sizes computed from their dimensions): an aluminium or stainless shape of the same
# name differs (EN 10219 hollow sections: steel corner radii and tolerances; stainless and
# aluminium tube are made to other standards)
STEEL_SHAPE_SOURCES = ("AISC Shapes Database", "EN 10365", "EN 10219")


def is_steel_shape(sec: Section) -> bool:
    """True for a catalog shape that exists as a steel shape only (AISC, EN 10365)."""
    return (sec.source or "").startswith(STEEL_SHAPE_SOURCES)


def not_made_in(sec: Section, material) -> str:
    """Why `sec` cannot be made in `material` ("" when it can): a lumber size in a metal, a
    metal shape in wood. The job reader and a stock list refuse it with these words; a
    typed-in material without a kind is judged by the reader on its stiffness."""
    kind = getattr(material, "kind", "custom")
    lumber_size = is_wood_size(sec)
    if lumber_size and kind in ("steel", "stainless", "aluminum"):
        return (f"section {sec.designation!r} is a lumber size (sawn or LVL) but material "
                f"{material.key!r} is {kind}: give a wood material (e.g. material = "
                "\"DF-L-2\") or a metal section (e.g. a flat bar \"FB4x1/2\", or "
                "[beam.section] shape = \"rect-bar\" with its sizes)")
    if kind == "lumber" and "bar stock size" in (sec.source or ""):
        return (f"section {sec.designation!r} is a steel bar stock size (flat, square or "
                f"round bar), not made in wood, but material {material.key!r} is lumber: "
                "give a lumber size such as \"2x10\" (or a [beam.section] rect-bar of its "
                "dressed sizes) or a metal material such as \"A36\"")
    if kind == "lumber" and not lumber_size and sec.shape not in ("rect-bar", "custom"):
        return (f"section {sec.designation!r} ({sec.shape}) is a metal shape, not made in "
                f"wood, but material {material.key!r} is lumber: give a lumber size such as "
                "\"2x10\" (or a [beam.section] rect-bar of its dressed sizes) or a metal "
                "material such as \"A992\"")
    return ""


def other_metal_on_steel_shape(sec: Section | None, material) -> str:
    """A carbon-steel catalog shape given an aluminium or stainless grade: shapes of those
    metals with a similar name have other dimensions, so the properties are not the
    member's ("" otherwise). No rating rests on it (capacity.rating_gaps); a stock list
    refuses the row."""
    kind = getattr(material, "kind", "")
    if kind not in ("aluminum", "stainless") or sec is None or not is_steel_shape(sec):
        return ""
    metal = "aluminium" if kind == "aluminum" else kind
    return (f"section {sec.designation!r} is a carbon-steel catalog shape and the material is "
            f"{metal}: {metal} shapes of a similar name have other dimensions, so the "
            "properties are not the member's. Give [beam.section] with the mill's dimensions")


def lumber_nominal(sec: Section) -> tuple[int, int] | None:
    """(nominal thickness, nominal width) in inches of a catalog lumber size, else None."""
    if sec.shape != "rect-bar" or "dressed lumber size" not in (sec.source or ""):
        return None
    m = _LUMBER.match(sec.designation or "")
    if not m:
        return None
    th, wi = sorted((int(m.group(1)), int(m.group(2))))
    return th, wi


def is_lumber_size(sec: Section) -> bool:
    """True for a sawn lumber size from the catalog ("2x10", "6x8")."""
    return lumber_nominal(sec) is not None


# EN 10365 hot-rolled sections, mm, from memory: (h, b, tw, tf, r)
IPE = {
    80: (80, 46, 3.8, 5.2, 5), 100: (100, 55, 4.1, 5.7, 7), 120: (120, 64, 4.4, 6.3, 7),
    140: (140, 73, 4.7, 6.9, 7), 160: (160, 82, 5.0, 7.4, 9), 180: (180, 91, 5.3, 8.0, 9),
    200: (200, 100, 5.6, 8.5, 12), 220: (220, 110, 5.9, 9.2, 12), 240: (240, 120, 6.2, 9.8, 15),
    270: (270, 135, 6.6, 10.2, 15), 300: (300, 150, 7.1, 10.7, 15),
    330: (330, 160, 7.5, 11.5, 18), 360: (360, 170, 8.0, 12.7, 18),
    400: (400, 180, 8.6, 13.5, 21), 450: (450, 190, 9.4, 14.6, 21),
    500: (500, 200, 10.2, 16.0, 21), 550: (550, 210, 11.1, 17.2, 24),
    600: (600, 220, 12.0, 19.0, 24),
}
HEA = {
    100: (96, 100, 5, 8, 12), 120: (114, 120, 5, 8, 12), 140: (133, 140, 5.5, 8.5, 12),
    160: (152, 160, 6, 9, 15), 180: (171, 180, 6, 9.5, 15), 200: (190, 200, 6.5, 10, 18),
    220: (210, 220, 7, 11, 18), 240: (230, 240, 7.5, 12, 21), 260: (250, 260, 7.5, 12.5, 24),
    280: (270, 280, 8, 13, 24), 300: (290, 300, 8.5, 14, 27), 320: (310, 300, 9, 15.5, 27),
    340: (330, 300, 9.5, 16.5, 27), 360: (350, 300, 10, 17.5, 27), 400: (390, 300, 11, 19, 27),
    450: (440, 300, 11.5, 21, 27), 500: (490, 300, 12, 23, 27),
}
HEB = {
    100: (100, 100, 6, 10, 12), 120: (120, 120, 6.5, 11, 12), 140: (140, 140, 7, 12, 12),
    160: (160, 160, 8, 13, 15), 180: (180, 180, 8.5, 14, 15), 200: (200, 200, 9, 15, 18),
    220: (220, 220, 9.5, 16, 18), 240: (240, 240, 10, 17, 21), 260: (260, 260, 10, 17.5, 24),
    280: (280, 280, 10.5, 18, 24), 300: (300, 300, 11, 19, 27), 320: (320, 300, 11.5, 20.5, 27),
    340: (340, 300, 12, 21.5, 27), 360: (360, 300, 12.5, 22.5, 27),
    400: (400, 300, 13.5, 24, 27), 450: (450, 300, 14, 26, 27), 500: (500, 300, 14.5, 28, 27),
}
# UPN (taper-flange channels; tf at mid-flange, r = root radius), mm, from memory
UPN = {
    80: (80, 45, 6, 8, 8), 100: (100, 50, 6, 8.5, 8.5), 120: (120, 55, 7, 9, 9),
    140: (140, 60, 7, 10, 10), 160: (160, 65, 7.5, 10.5, 10.5), 180: (180, 70, 8, 11, 11),
    200: (200, 75, 8.5, 11.5, 11.5), 220: (220, 80, 9, 12.5, 12.5), 240: (240, 85, 9.5, 13, 13),
    260: (260, 90, 10, 14, 14), 280: (280, 95, 10, 15, 15), 300: (300, 100, 10, 16, 16),
}
UPN_SLOPE = 0.08  # inner flange slope of UPN channels up to 300 mm (from memory)
# EN 10219-2 cold-formed hollow sections commonly stocked, mm
SHS = {20: (2,), 25: (2, 2.5, 3), 30: (2, 2.5, 3), 40: (2, 2.5, 3, 4), 50: (2, 2.5, 3, 4, 5),
       60: (2.5, 3, 4, 5), 70: (3, 4, 5), 80: (3, 4, 5, 6), 90: (4, 5, 6),
       100: (3, 4, 5, 6, 8), 120: (4, 5, 6, 8, 10), 140: (5, 6, 8, 10), 150: (5, 6, 8, 10),
       160: (5, 6, 8, 10), 180: (6, 8, 10), 200: (6, 8, 10, 12.5), 250: (8, 10, 12.5),
       300: (8, 10, 12.5)}
RHS = {(40, 20): (2, 2.5, 3), (50, 25): (2, 2.5, 3), (50, 30): (2, 3, 4),
       (60, 30): (2.5, 3, 4), (60, 40): (2.5, 3, 4), (70, 50): (3, 4), (80, 40): (3, 4, 5),
       (80, 60): (3, 4, 5), (100, 50): (3, 4, 5, 6), (100, 60): (3, 4, 5, 6),
       (120, 60): (4, 5, 6), (120, 80): (4, 5, 6, 8), (140, 80): (4, 5, 6, 8),
       (150, 100): (5, 6, 8, 10), (160, 80): (5, 6, 8), (200, 100): (5, 6, 8, 10),
       (250, 150): (6, 8, 10), (300, 200): (8, 10, 12.5)}
CHS = {21.3: (2, 2.6, 3.2), 26.9: (2, 2.6, 3.2), 33.7: (2.6, 3.2, 4), 42.4: (2.6, 3.2, 4),
       48.3: (2.6, 3.2, 4, 5), 60.3: (2.9, 3.2, 4, 5), 76.1: (3.2, 4, 5),
       88.9: (3.2, 4, 5, 6.3), 114.3: (3.6, 4, 5, 6.3), 139.7: (4, 5, 6.3, 8),
       168.3: (4.5, 5, 6.3, 8, 10), 219.1: (5, 6.3, 8, 10), 273: (6.3, 8, 10),
       323.9: (6.3, 8, 10)}

EN10219 = "EN 10219-2 dimensions (from memory), properties computed from dimensions"
EN10365 = "EN 10365 dimensions (from memory), properties computed from dimensions"


def en10219_corner_radius(t_mm: float) -> float:
    """Outside corner radius used for EN 10219-2 section properties, mm (from memory):
    2 t up to 6 mm, 2.5 t over 6 to 10 mm, 3 t over 10 mm."""
    return (2.0 if t_mm <= 6 else 2.5 if t_mm <= 10 else 3.0) * t_mm


def _mm(v: float) -> str:
    return f"{v:g}"


def _generated() -> list[tuple[str, str, object]]:
    """(kind, designation, builder) for the stock that is computed from dimensions."""
    out: list[tuple[str, str, object]] = []
    for w in _FB_WIDTHS:
        wv = _number(w)
        for t in _FB_THICK:
            tv = _number(t)
            if tv < wv:
                des = f"FB{w}x{t}"
                out.append(("flat-bar", des, lambda w=wv, t=tv, des=des: S.rect_bar(
                    w * IN, t * IN, designation=des,
                    source="flat bar stock size, computed from dimensions")))
    for s in _SQ_SIZES:
        sv = _number(s)
        des = f"SQ{s}"
        out.append(("square-bar", des, lambda s=sv, des=des: S.rect_bar(
            s * IN, s * IN, designation=des,
            source="square bar stock size, computed from dimensions")))
    for s in _RB_SIZES:
        sv = _number(s)
        des = f"RB{s}"
        out.append(("round-bar", des, lambda s=sv, des=des: S.round_bar(
            s * IN, designation=des, source="round bar stock size, computed from dimensions")))
    # as-welded (ERW) mechanical tube: the design wall takes AISC 360-16 B4.2's ERW rule, as
    # a typed-in A513 tube does (sections._wall_factor; A513 is not a grade 360 lists)
    erw = S.ERW_FACTOR
    mech = ("design wall 0.93 x nominal (ASTM A513 ERW mechanical tube, AISC 360 B4.2); "
            "outside corner radius 2 x design wall")
    for (h, b), gs in MECH_RECT.items():
        for g in gs:
            des = f"rect-tube {h} x {b} x {g}ga" if h != b else f"square-tube {h} x {g}ga"
            out.append(("mech-tube", des, lambda h=h, b=b, g=g, des=des: S.rect_tube(
                _number(h) * IN, _number(b) * IN, gauges.BWG[g] * IN,
                t_des=erw * gauges.BWG[g] * IN, designation=des,
                source=f"mechanical tube stock size, computed from dimensions ({g} ga = "
                f"{gauges.BWG[g]:g} in, Birmingham wire gauge; {mech})")))
    for od, gs in MECH_ROUND.items():
        for g in gs:
            des = f"round-tube {od} x {g}ga"
            out.append(("mech-round", des, lambda od=od, g=g, des=des: S.round_tube(
                _number(od) * IN, gauges.BWG[g] * IN, t_des=erw * gauges.BWG[g] * IN,
                designation=des,
                source=f"mechanical tube stock size, computed from dimensions ({g} ga = "
                f"{gauges.BWG[g]:g} in, Birmingham wire gauge; design wall 0.93 x nominal, "
                "ASTM A513 ERW mechanical tube, AISC 360 B4.2)")))
    for th, wi in LUMBER_SIZES:
        des = f"{th}x{wi}"
        out.append(("lumber", des, lambda th=th, wi=wi, des=des: _lumber(th, wi, des)))
    for w, wt in LVL_WIDTHS:
        for d, dt in LVL_DEPTHS:
            des = f"LVL{wt}x{dt}"
            out.append(("LVL", des, lambda w=w, d=d, des=des: _lvl(w, d, des)))
    for size, ts in SHS.items():
        for t in ts:
            des = f"SHS{size}x{size}x{_mm(t)}"
            out.append(("SHS", des, lambda a=size, t=t, des=des: S.rect_tube(
                a * MM, a * MM, t * MM, r_out=en10219_corner_radius(t) * MM, designation=des,
                source=EN10219)))
    for (h, b), ts in RHS.items():
        for t in ts:
            des = f"RHS{h}x{b}x{_mm(t)}"
            out.append(("RHS", des, lambda h=h, b=b, t=t, des=des: S.rect_tube(
                h * MM, b * MM, t * MM, r_out=en10219_corner_radius(t) * MM, designation=des,
                source=EN10219)))
    for od, ts in CHS.items():
        for t in ts:
            des = f"CHS{_mm(od)}x{_mm(t)}"
            out.append(("CHS", des, lambda od=od, t=t, des=des: S.round_tube(
                od * MM, t * MM, designation=des, source=EN10219)))
    for name, table in (("IPE", IPE), ("HEA", HEA), ("HEB", HEB)):
        for n, (h, b, tw, tf, r) in table.items():
            des = f"{name}{n}"
            out.append((name, des, lambda h=h, b=b, tw=tw, tf=tf, r=r, des=des: S.i_shape(
                h * MM, b * MM, tf * MM, tw * MM, r=r * MM, designation=des, source=EN10365)))
    for n, (h, b, tw, tf, r) in UPN.items():
        des = f"UPN{n}"
        # the flange thickness of a UPN is given at half the flange width b/2 from the back
        # of the web; the calculator wants it at the middle of the projection (b + tw)/2
        # (the toes are rounded with r2 = r1 / 2, EN 10365 / DIN 1026, from memory: left
        # square, the section came out about 1 % stiffer and stronger than the tables)
        out.append(("UPN", des, lambda h=h, b=b, tw=tw, tf=tf, r=r, des=des: S.channel(
            h * MM, b * MM, (tf - UPN_SLOPE * tw / 2) * MM, tw * MM, r=r * MM,
            slope=UPN_SLOPE, designation=des, r_toe=r / 2 * MM,
            source=EN10365 + " (8 % flange slope; toes rounded r1 / 2)")))
    return out


# ----------------------------------------------------------------- the index
KIND_INFO = {
    "HSS": "AISC hollow structural sections, rectangular, square and round",
    "HSS-rect": "AISC rectangular and square HSS", "HSS-round": "AISC round HSS",
    "PIPE": "AISC Pipe STD / XS / XXS", "W": "AISC W shapes", "M": "AISC M shapes",
    "S": "AISC S shapes (American standard beams)", "HP": "AISC HP bearing piles",
    "C": "AISC C channels", "MC": "AISC MC channels", "L": "AISC angles",
    "WT": "AISC WT tees (cut from W)", "MT": "AISC MT tees", "ST": "AISC ST tees",
    "flat-bar": "flat bar, US stock sizes (FBwidth x thickness)",
    "square-bar": "square bar, US stock sizes", "round-bar": "round bar, US stock sizes",
    "lumber": "sawn lumber on edge, dressed sizes (2x4 = 1-1/2 x 3-1/2 in)",
    "LVL": "LVL on edge, 1-3/4 in plies (LVL1-3/4x11-7/8; use with material LVL-2.0E)",
    "mech-tube": "A513 mechanical square/rectangular tube by gauge (design wall 0.93 x nominal)",
    "mech-round": "A513 mechanical round tube by gauge (design wall 0.93 x nominal)",
    "SHS": "EN 10219 square hollow sections", "RHS": "EN 10219 rectangular hollow sections",
    "CHS": "EN 10219 circular hollow sections", "IPE": "EN 10365 IPE beams",
    "HEA": "EN 10365 HEA wide-flange beams", "HEB": "EN 10365 HEB wide-flange beams",
    "UPN": "EN 10365 UPN channels",
}
SHAPE_KINDS = {"rect-tube": ("HSS-rect", "SHS", "RHS", "mech-tube"),
                "round-tube": ("HSS-round", "CHS", "mech-round"),
                "pipe": ("PIPE",), "i-beam": ("W", "M", "S", "HP", "IPE", "HEA", "HEB"),
                "channel": ("C", "MC", "UPN"), "angle": ("L",), "tee": ("WT", "MT", "ST"),
                "rect-bar": ("flat-bar", "square-bar"), "round-bar": ("round-bar",)}


_LAZY = object()


class _Entry:
    __slots__ = ("kind", "designation", "_key", "row", "builder", "_sec")

    def __init__(self, kind, designation, key=_LAZY, row=None, builder=None):
        self.kind, self.designation, self._key = kind, designation, key
        self.row, self.builder, self._sec = row, builder, None

    @property
    def key(self) -> str | None:
        """The canonical key of the designation (`canon`), worked out when first asked: a
        sweep of one kind never needs it."""
        if self._key is _LAZY:
            self._key = canon(self.designation)
        return self._key

    def section(self) -> Section:
        if self._sec is None:
            self._sec = _from_aisc(self.row) if self.row is not None else self.builder()
        return self._sec


@lru_cache(maxsize=1)
def _index() -> tuple[dict[str, _Entry], dict[str, list[_Entry]]]:
    by_key: dict[str, _Entry] = {}
    by_kind: dict[str, list[_Entry]] = {k: [] for k in KIND_INFO}
    for row in _aisc_rows():
        typ = row["Type"]
        kind = typ if typ != "HSS" else ("HSS-round" if row["OD"] is not None else "HSS-rect")
        e = _Entry(kind, row["label"], canon(row["label"]), row=row)
        by_kind[kind].append(e)
        if typ == "HSS":
            by_kind["HSS"].append(e)
        if e.key:
            by_key.setdefault(e.key, e)
        if row["edi"] != row["label"]:
            k = canon(row["edi"])
            if k:
                by_key.setdefault(k, e)
    for kind, des, builder in _generated():
        if kind == "lumber":
            key = "LUMBER|" + des.replace("x", "|")
        elif kind in ("mech-tube", "mech-round"):
            head, _, rest = des.partition(" ")
            key = "|".join([head.upper()] + [f"{_number(v.strip()) or 0:g}" if "ga" not in v
                                              else v.strip().upper() for v in rest.split(" x ")])
        else:
            key = canon(des)
        e = _Entry(kind, des, key, builder=builder)
        by_kind[kind].append(e)
        by_key.setdefault(e.key, e)
    return by_key, by_kind


def kind_of(sec: Section) -> str:
    """The catalog kind a section belongs to ("HSS-rect", "W", "lumber", "mech-tube" ...),
    or its shape for sections made from dimensions: the natural set to size it against."""
    by_key, by_kind = _index()
    for kind, entries in by_kind.items():
        if kind == "HSS":
            continue
        for e in entries:
            if e.designation == sec.designation:
                return kind
    return sec.shape


def kinds() -> list[str]:
    """The kinds `list_sections` takes (plus shape names such as "rect-tube")."""
    return list(KIND_INFO)


def _kind_names(kind: str) -> tuple[str, ...]:
    k = kind.strip()
    for name in KIND_INFO:
        if name.lower() == k.lower():
            return (name,)
    low = k.lower().replace("_", "-")
    low = {"hss-rectangular": "rect-tube", "rect": "rect-tube", "square-tube": "rect-tube",
           "round": "round-tube", "flat": "flat-bar", "channel": "channel",
           "angles": "angle", "beam": "i-beam", "w-shape": "W"}.get(low, low)
    if low in SHAPE_KINDS:
        return SHAPE_KINDS[low]
    if low in ("w",):
        return ("W",)
    close = difflib.get_close_matches(k, list(KIND_INFO) + list(SHAPE_KINDS), n=1, cutoff=0.5)
    hint = f" (did you mean {close[0]!r}?)" if close else ""
    raise InputError(f"unknown kind {kind!r}{hint}; kinds are {', '.join(KIND_INFO)} or a "
                     f"shape ({', '.join(SHAPE_KINDS)})", "--kind")


_AISC_TYPES = {"HSS": "HSS", "HSS-rect": "HSS", "HSS-round": "HSS", "W": "W", "M": "M",
               "S": "S", "HP": "HP", "C": "C", "MC": "MC", "L": "L", "WT": "WT", "MT": "MT",
               "ST": "ST", "PIPE": "PIPE"}


@lru_cache(maxsize=None)
def _aisc_kind(name: str) -> tuple[_Entry, ...]:
    """The entries of one AISC kind, read from its own lines of the table only (a sweep of
    one kind need not parse and index the other 900 rows); the same rows and order as the
    whole index gives."""
    typ = _AISC_TYPES[name]
    lines = _aisc_lines()
    mine = [ln for ln in lines[1:] if ln.split(",", 1)[0] == typ]
    out = []
    for row in _rows_of(lines[0], mine):
        kind = typ if typ != "HSS" else ("HSS-round" if row["OD"] is not None else "HSS-rect")
        if name in (kind, "HSS"):
            out.append(_Entry(kind, row["label"], row=row))
    return tuple(out)


def list_sections(kind: str | None = None, filter: str | None = None) -> list[Section]:
    """Catalog sections of a kind (all when None), optionally filtered by a piece of the
    designation ("4x4", "x1/4"; spelling tolerant like look-up). Sections are built once."""
    names = _kind_names(kind) if kind else tuple(k for k in KIND_INFO if k != "HSS")
    if all(n in _AISC_TYPES for n in names) and _index.cache_info().currsize == 0:
        entries = [e for n in names for e in _aisc_kind(n)]
    else:
        by_key, by_kind = _index()
        entries = [e for n in names for e in by_kind[n]]
    if filter:
        pieces = [_filter_piece(w) for w in filter.split(",") if _prep(w)]
        entries = [e for e in entries if all(_matches(e, p) for p in pieces)]
    return [e.section() for e in entries]


def _filter_piece(word: str) -> tuple[str, str | None]:
    """(raw fragment, canonical numeric fragment or None): "x1/4" -> ("X1/4", "|0.25|")."""
    w = _prep(word)
    nums = [_number(p) for p in w.split("X") if p]
    if nums and all(v is not None for v in nums):
        return w, "|" + "|".join(f"{round(v, 4):g}" for v in nums) + "|"
    return w, None


def _matches(e: _Entry, piece: tuple[str, str | None]) -> bool:
    raw, num = piece
    if num is not None:
        return num in f"|{e.key}|"
    return raw in _prep(e.designation)


# ----------------------------------------------------------------- look-up
_DESCRIBED = re.compile(
    r"^\s*(?P<shape>rect(?:angular)?[- ]tube|square[- ]tube|round[- ]tube|tube|"
    r"flat[- ]bar|rect[- ]bar|square[- ]bar|round[- ]bar|pipe)\s+(?P<dims>.*\d.*)$",
    re.IGNORECASE,
)


def lookup(designation: str, key: str = "beam.section", material=None) -> Section:
    """The catalog section for a designation (strong axis), spelling tolerant.

    Also builds shop descriptions ("rect-tube 2 x 1 x 14ga") from their dimensions; `material`
    then settles the design wall (0.93 x nominal for ERW tube: A500, A53, as-welded A513;
    nominal for DOM; see sections).
    """
    if not isinstance(designation, str) or not designation.strip():
        raise InputError("give a section designation such as \"HSS4x4x1/4\" or \"W8x31\"", key)
    lm = _LUMBER.match(designation)
    if lm:
        th, wi = sorted((int(lm.group(1)), int(lm.group(2))))
        if (th, wi) in LUMBER_SIZES:
            return _lumber(th, wi, f"{th}x{wi}")
        raise InputError(f"{designation!r}: lumber sizes in the catalog are "
                         f"{', '.join(f'{a}x{b}' for a, b in LUMBER_SIZES)}", key)
    m = _DESCRIBED.match(designation)
    if m and not _PIPE.match(_prep(designation)):
        return _described(m.group("shape"), m.group("dims"), designation, key, material)
    k = canon(designation)
    if k and _index.cache_info().currsize == 0:  # the index is not built yet: try one row
        quick = _quick_aisc(k)
        if quick is not None:
            return quick
    by_key, _ = _index()
    if k and k in by_key:
        return by_key[k].section()
    near = _rounded_match(k) if k else None
    if near is not None:
        return near.section()
    raise InputError(_not_found(designation, k), key)


def _rounded_match(k: str):
    """The one entry whose sizes match a designation typed with rounded decimals
    ("HSS12x2x.312" or ".313" for 5/16, ".19" for 3/16), or None."""
    prefix, *nums = k.split("|")
    try:
        vals = [float(v) for v in nums]
    except ValueError:
        return None
    found = []
    for e in _index()[0].values():
        if not e.key or not e.key.startswith(prefix + "|"):
            continue
        p2, *n2 = e.key.split("|")
        if p2 != prefix or len(n2) != len(vals):
            continue
        try:
            if all(abs(float(a) - b) <= 0.0026 for a, b in zip(n2, vals)):
                found.append(e)
        except ValueError:
            continue
    unique = {id(e): e for e in found}
    return next(iter(unique.values())) if len(unique) == 1 else None


_DOUBLE_ANGLE = re.compile(r"\s*2\s*-?\s*L\s*\d", re.IGNORECASE)
_GLULAM_SIZE = re.compile(r"\s*\d+\s*[- ]\s*\d+\s*/\s*\d+\s*(in|\")?\s*x\s*\d+(\.\d+)?"
                          r"(\s*-?\s*\d+\s*/\s*\d+)?\s*(in|\")?\s*$", re.IGNORECASE)
_AXIS_WORDS = {"weak": "weak", "strong": "strong", "weak axis": "weak", "strong axis": "strong",
               "minor": "weak", "major": "strong", "minor axis": "weak", "major axis": "strong",
               "y-y": "weak", "x-x": "strong", "yy": "weak", "xx": "strong"}
_LEG_WORDS = {"llv": "the long leg vertical", "lsv": "the short leg vertical",
              "llh": "the long leg horizontal", "lsh": "the short leg horizontal"}


def _not_found(designation: str, k: str | None) -> str:
    if _DOUBLE_ANGLE.match(str(designation)):
        return (f"unknown section {designation!r}: double angles (2L) are not in the catalog "
                "and their checks (the pair acting together, connectors, the gap) are not "
                "made; check one angle (e.g. \"L3x3x1/4\") carrying its share of the load, or "
                "give the pair's figures in a [beam.section] table with shape = \"custom\" "
                "(analysed, but not rated)")
    dm = re.fullmatch(r"\s*(\d+(?:\.\d+)?)\s*(?:in|\")?\s*x\s*(\d+(?:\.\d+)?)\s*(?:in|\")?\s*",
                      str(designation), re.IGNORECASE)
    if dm and ("." in dm.group(1) or "." in dm.group(2)):
        a, b = sorted((float(dm.group(1)), float(dm.group(2))))
        nominal = next((f"{t}x{w}" for t, w in LUMBER_SIZES
                        if all(abs(x - y) < 1e-6 for x, y in zip(dressed(t, w), (a, b)))),
                       None)
        said = (f"{a:g} x {b:g} in is the dressed size of a {nominal}: write \"{nominal}\""
                if nominal else "the catalog takes lumber by its nominal size (e.g. \"2x10\")")
        return (f"unknown section {designation!r}: {said}, or give shape = \"rect-bar\" with "
                "its depth and width (with units) for a size of its own")
    if _GLULAM_SIZE.match(str(designation)):
        return (f"unknown section {designation!r}: glued-laminated timber (glulam) sizes are "
                "not offered; sawn lumber (e.g. \"2x10\", \"4x12\") and LVL are, or give the "
                "member as shape = \"rect-bar\" with its width and depth and a typed-in "
                "material with the glulam's published design values")
    # a grade or other words typed after a good designation ("W8x18 A992", "HSS4x4x1/4 gr
    # C"): say where the rest belongs
    words = str(designation).split()
    for i in range(len(words) - 1, 0, -1):
        head, tail = " ".join(words[:i]), " ".join(words[i:])
        hk = canon(head)
        if hk and (hk in _index()[0] or _rounded_match(hk) is not None):
            found = (_index()[0][hk] if hk in _index()[0] else _rounded_match(hk)).designation
            low = tail.lower().strip()
            if low in _AXIS_WORDS:
                return (f"unknown section {designation!r}: {found!r} followed by {tail!r}; the "
                        f"axis goes in its own key: write section = '{found}' and axis = "
                        f"'{_AXIS_WORDS[low]}' under [beam] (bending about the "
                        f"{_AXIS_WORDS[low]} axis)")
            if low in _LEG_WORDS:
                return (f"unknown section {designation!r}: {found!r} followed by {tail!r} "
                        f"({_LEG_WORDS[low]}); an angle's orientation goes in a [beam.section] "
                        f"table: designation = '{found}', axis = 'strong' (about x-x, the "
                        "catalog's Ix) or 'weak' (y-y), and leg = 'bottom' or 'top' (where the "
                        "horizontal leg sits); `shopbeam section` shows both axes")
            from shopbeam.members.materials import get  # noqa: PLC0415 - this message only

            grade = get(tail)
            said = (f"section = \"{found}\" and material = \"{grade.key}\"" if grade else
                    f"section = \"{found}\", with the grade in material = (`shopbeam "
                    "materials` lists them)")
            return (f"unknown section {designation!r}: it starts with the catalog section "
                    f"{found!r} followed by {tail!r}; the section key takes the designation "
                    f"alone and a grade goes in material: write {said}")
    # a tube's sizes the wrong way round ("HSS2x4x3/16"): the catalog names the larger side
    # first; a tube lying flat is that section about its weak axis
    m = re.fullmatch(r"\s*(HSS|TS)\s*([0-9./-]+)\s*[xX]\s*([0-9./-]+)\s*[xX]\s*(\S+)\s*",
                     str(designation), re.IGNORECASE)
    if m:
        turned = f"{m.group(1)}{m.group(3)}x{m.group(2)}x{m.group(4)}"
        tk = canon(turned)
        hit = _index()[0].get(tk) if tk else None
        if hit is not None:
            return (f"unknown section {designation!r}: the catalog names a tube's larger side "
                    f"first, so it is {hit.designation!r}; write section = "
                    f"\"{hit.designation}\", and axis = \"weak\" under [beam] if it lies flat "
                    "(bent about its narrow side)")
    sugg = suggestions(designation)
    hint = f"did you mean {', '.join(sugg)}? " if sugg else ""
    prefix = (k or "").split("|")[0] or (re.match(r"\s*([A-Za-z]+)", str(designation)) or
                                         re.match("", "")).group(0).strip().upper()
    kind = next((n for n in KIND_INFO if n.upper() == prefix), None) or (
        "HSS" if prefix == "HSS" else None)
    listing = f"`shopbeam shapes --kind {kind or 'HSS'}` lists {'them' if kind else 'the catalog'}"
    return (f"unknown section {designation!r}: {hint}{listing}, or describe the section "
            "(e.g. \"rect-tube 2 x 1 x 14ga\") or give a [beam.section] table")


def suggestions(designation: str, n: int = 3) -> list[str]:
    """Near misses for an unknown designation: same family and nearest sizes first, then
    the closest spellings."""
    by_key, by_kind = _index()
    k = canon(designation)
    out: list[str] = []
    if k:
        prefix, *nums = k.split("|")
        try:
            vals = [float(v) for v in nums]
        except ValueError:
            vals = []
        if vals:
            cands = []
            for e in by_key.values():
                if not e.key:
                    continue
                p2, *n2 = e.key.split("|")
                # a half-typed designation ("HSS4x4") is the start of a longer one
                # ("HSS4x4x1/4"): compare the sizes typed, not a shorter family's sizes
                if p2 != prefix or len(n2) < len(vals):
                    continue
                try:
                    v2 = [float(v) for v in n2]
                except ValueError:
                    continue
                if any(a <= 0 or b <= 0 for a, b in zip(vals, v2)):
                    continue
                # the first size (the depth) weighs most, and a size that starts as typed
                # ("S8x1" for S8X18.4, a designation not finished) comes first
                dist = sum((10.0 if i == 0 else 1.0) * abs(math.log(a / b))
                           for i, (a, b) in enumerate(zip(vals, v2)))
                started = nums[:-1] == n2[:len(nums) - 1] and \
                    n2[len(nums) - 1].startswith(nums[-1])
                cands.append((not started, dist, len(n2) - len(vals), e.designation))
            cands.sort()
            for *_, des in cands[:n]:
                if des not in out:
                    out.append(des)
    if len(out) < n:
        labels = {_prep(e.designation): e.designation for e in by_key.values()}
        for c in difflib.get_close_matches(_prep(designation), list(labels), n=n, cutoff=0.6):
            if labels[c] not in out:
                out.append(labels[c])
    return out[:n]


# A described size with no unit is read in inches; a solid bar over 12 in or a tube over 24
# in is far past shop stock (common practice, no source) and is likely millimetres.
_BARE_LIMIT_IN = {"bar": 12.0, "tube": 24.0}


def bare_description(designation) -> tuple[str, float] | None:
    """For a shop description whose sizes carry no unit at all ("round-bar 25", "rect-tube 40
    x 20 x 2"): (the shape word, the largest number). None for anything else."""
    got = bare_numbers(designation)
    return (got[0], max(got[1])) if got else None


def bare_numbers(designation) -> tuple[str, list[float]] | None:
    """For a shop description whose sizes carry no unit at all: (the shape word, its numbers
    in the order written). None for anything else."""
    if not isinstance(designation, str):
        return None
    m = _DESCRIBED.match(designation)
    if not m or _PIPE.match(_prep(designation)):
        return None
    dims = m.group("dims")
    if re.search(r"[a-wyzA-WYZ\"'\u2032\u2033]", dims):  # a unit, a gauge or an inch mark
        return None
    nums = [_number(_MIXED.sub(lambda n: f"{n.group(1)}-{n.group(2)}/{n.group(3)}", t.strip()))
            for t in re.split(r"\s*[xX\u00d7*]\s*", dims.strip()) if t.strip()]
    nums = [v for v in nums if v is not None]
    return (m.group("shape"), nums) if nums else None


def bare_size_problem(designation, system: str) -> str:
    """What is wrong with a unitless description on this job, or "": on an SI job the inches
    it would be read in are not what was meant; on a US job a size past any shop stock
    (a bar over 12 in, a tube over 24 in) is likely millimetres."""
    bare = bare_description(designation)
    if bare is None:
        return ""
    shape, biggest = bare
    if system == "si":
        return (f"{designation!r} gives its sizes without a unit, which would be read as "
                "inches, but this job is in SI units: write the unit, e.g. "
                f"\"{designation.strip()} mm\" (or \"... in\" if inches are meant)")
    limit = _BARE_LIMIT_IN["bar" if "bar" in shape.lower() else "tube"]
    if biggest > limit:
        return (f"{designation!r} gives its sizes without a unit, read as inches: {biggest:g} "
                f"in is past any shop stock of that shape (over {limit:g} in). Write the "
                f"unit: \"{designation.strip()} mm\" if millimetres are meant, or \"... in\" "
                "to keep inches")
    return ""


def _described(shape_word: str, dims_text: str, designation: str, key: str,
               material) -> Section:
    """Sections described as 'rect-tube 2 x 1 x 14ga' (inches unless a unit is written)."""
    shape = shape_word.lower().replace(" ", "-").replace("rectangular", "rect")
    if shape == "tube":
        shape = "rect-tube"
    default_unit = "mm" if re.search(r"\bmm\b|\dmm", dims_text, re.IGNORECASE) else "in"
    toks = [t.strip() for t in re.split(r"\s*[xX\u00d7*]\s*", dims_text.strip()) if t.strip()]
    toks = [re.sub(r"(?i)\s*mm$", "", t) if default_unit == "mm" else t for t in toks]

    def length(tok):
        if re.search(r"[a-zA-Z\"']", tok):
            return parse(tok, "length", key, positive=True)
        v = _number(_MIXED.sub(lambda m: f"{m.group(1)}-{m.group(2)}/{m.group(3)}", tok))
        if v is None or v <= 0:
            raise InputError(f"cannot read {tok!r} in {designation!r} as a size", key)
        return v * (MM if default_unit == "mm" else IN)

    def wall(tok):
        if gauges.gauge_number(tok) is not None:
            return gauges.parse_wall(tok, key, "tube")
        return length(tok), ""

    need = len(S.shape_keys(shape)[0])
    if len(toks) != need:
        form = {"rect-tube": "rect-tube DEPTH x WIDTH x WALL (e.g. 2 x 1 x 14ga)",
                "square-tube": "square-tube SIZE x WALL", "round-tube": "round-tube OD x WALL",
                "pipe": "pipe OD x WALL", "flat-bar": "flat-bar WIDTH x THICKNESS",
                "rect-bar": "rect-bar DEPTH x WIDTH", "square-bar": "square-bar SIZE",
                "round-bar": "round-bar DIAMETER"}[shape]
        raise InputError(f"{designation!r}: write it as {form}", key)
    unit_note = "sizes in inches" if default_unit == "in" else "sizes in mm"
    try:
        if shape in ("rect-tube", "square-tube", "round-tube", "pipe"):
            t, note = wall(toks[-1])
            spec = {}
            f, rule = S._wall_factor(spec, key, material, shape)
            src = "computed from dimensions (" + "; ".join(
                x for x in (unit_note, note, rule) if x) + ")"
            if shape in ("round-tube", "pipe"):
                return S.round_tube(length(toks[0]), t, t_des=f * t, shape=shape,
                                    designation=designation.strip(), source=src)
            h = length(toks[0])
            b = h if shape == "square-tube" else length(toks[1])
            sec = S.rect_tube(h, b, t, t_des=f * t, designation=designation.strip(),
                              source=src[:-1] + "; outside corner radius 2 x design wall)")
            return sec
        if shape == "round-bar":
            return S.round_bar(length(toks[0]), designation=designation.strip())
        h = length(toks[0])
        note = ""
        if shape == "square-bar":
            b = h
        elif gauges.gauge_number(toks[1]) is not None:  # strip sheared from sheet
            b, note = gauges.parse_wall(toks[1], key, "plate")
        else:
            b = length(toks[1])
        # a flat or square bar written out is bar stock, as FB and SQ are (not_made_in)
        stock = "flat bar stock size, " if shape == "flat-bar" else (
            "square bar stock size, " if shape == "square-bar" else "")
        return S.rect_bar(h, b, designation=designation.strip(), source=(
            stock + "computed from dimensions ("
            + "; ".join(x for x in (unit_note, note) if x) + ")"))
    except ValueError as exc:
        raise InputError(f"{designation!r}: {exc}", key) from None


# ----------------------------------------------------------------- output
_PROPS = (  # (json key, label, display kind)
    ("area", "Area A", "area"), ("ix", "Ix (bending axis)", "inertia"),
    ("sx_top", "Sx top fibre", "modulus"), ("sx_bot", "Sx bottom fibre", "modulus"),
    ("zx", "Zx plastic", "modulus"), ("rx", "rx", "small_length"),
    ("iy", "Iy (other axis)", "inertia"), ("sy", "Sy", "modulus"), ("zy", "Zy", "modulus"),
    ("ry", "ry", "small_length"), ("j", "J torsion", "inertia"),
    ("shear_area", "Shear area", "area"), ("depth", "Depth", "small_length"),
)


def _cw_text(cw: float, system: str) -> str:
    return f"{num(cw / IN**6)} in^6" if system == "us" else f"{num(cw * 1e18)} mm^6"


def section_report(sec: Section, system: str = "us") -> str:
    """The text `shopbeam section X` prints: properties in the display system."""
    lines = [f"{sec.designation}  ({sec.shape}, {_axis_words(sec)})", f"source: {sec.source}"]
    for k, label, kind in _PROPS:
        v = getattr(sec, k)
        if v is None:
            continue
        if k == "sx_top" and abs(sec.sx_top - sec.sx_bot) <= 1e-9 * sec.sx_top:
            lines.append(f"  {'Sx':<20} {fmt(v, kind, system)}")
            continue
        if k == "sx_bot" and abs(sec.sx_top - sec.sx_bot) <= 1e-9 * sec.sx_top:
            continue
        lines.append(f"  {label:<20} {fmt(v, kind, system)}")
    if sec.cw:
        lines.append(f"  {'Cw warping':<20} {_cw_text(sec.cw, system)}")
    if sec.mass_per_length:
        lines.append(f"  {'Weight':<20} {fmt(sec.mass_per_length, 'mass_per_length', system)}"
                     " (tabulated)")
    else:
        lines.append(f"  {'Weight':<20} {fmt(sec.area * 7850.0, 'mass_per_length', system)}"
                     " (steel at 7850 kg/m^3; the job's material sets it)")
    dim_lines = []
    for k, v in sec.dims.items():
        if isinstance(v, bool):  # a flag kept with the dimensions (r_given), not a length
            continue
        if k in ("h_t", "b_t", "D_t", "h_tw", "bf_2tf", "d_tw", "tan_alpha"):
            dim_lines.append(f"{k} {v:.3g}")
        elif k in ("iz", "iw"):  # principal-axis moments of inertia
            dim_lines.append(f"{k} {fmt(v, 'inertia', system)}")
        elif k in ("sw", "sz"):  # principal-axis section moduli
            dim_lines.append(f"{k} {fmt(v, 'modulus', system)}")
        elif k == "weak_shear_area":
            continue
        else:
            dim_lines.append(f"{k} {fmt(v, 'small_length', system)}")
    if dim_lines:
        lines.append("  dimensions: " + ", ".join(dim_lines))
    for w in sec.warnings:
        lines.append(f"warning: {w}")
    lines.append(SHORT)
    return "\n".join(lines)


def _axis_words(sec: Section) -> str:
    return {"strong": "bending about the strong axis", "weak": "bending about the weak axis",
            "geometric": "bending about a geometric axis", "n/a": "round: any axis"}.get(
        sec.axis, sec.axis)


def section_json(sec: Section) -> dict:
    """The `section --json` object: SI base units (m, m^2, m^3, m^4, m^6, kg/m)."""
    return {
        "designation": sec.designation, "shape": sec.shape, "axis": sec.axis,
        "area": sec.area, "ix": sec.ix, "sx": sec.sx, "sx_top": sec.sx_top,
        "sx_bot": sec.sx_bot, "zx": sec.zx, "iy": sec.iy, "sy": sec.sy, "zy": sec.zy,
        "rx": sec.rx, "ry": sec.ry, "j": sec.j, "cw": sec.cw, "shear_area": sec.shear_area,
        "depth": sec.depth, "mass_per_length": sec.mass_per_length,
        "dims": {k: v for k, v in sec.dims.items() if not isinstance(v, bool)},
        "source": sec.source,
        "warnings": list(sec.warnings), "cautions": [SHORT],
    }


