"""Units: the one pint registry of the process, shop-notation parsing, and display.

Every dimensional input is a string with its unit. `parse(text, kind)` turns it into an SI
float (m, N, N/m, N*m, Pa, ...) and understands shop notation that pint alone reads wrong:
mixed fractions (``1-1/2 in``, ``1 1/2 in``), feet and inches (``10 ft 6 in``, ``10' 6"``,
``10'-6 1/2"``). A bare number, a wrong dimension or a value that is not finite raises
`InputError`. Inside shopbeam everything is SI floats; display conversion uses fixed factors
(`fmt`) so reports never need the registry.
"""

from __future__ import annotations

import math
import re
from fractions import Fraction
from functools import lru_cache

from shopbeam.errors import InputError

G0 = 9.80665  # standard gravity, m/s^2 (exact by definition, CGPM 1901)

# Exact conversion factors (international foot and pound, 1959; lbf from g0).
FT = 0.3048
IN = 0.0254
LBF = 4.4482216152605
LB = 0.45359237
KIP = 1000 * LBF
PSI = LBF / IN**2
KSI = 1000 * PSI

_REGISTRY = None

_EXTRA_DEFINITIONS = (
    "plf = force_pound / foot",
    "klf = kip / foot",
    "pli = force_pound / inch",
    "psf = force_pound / foot ** 2",
    "ksf = kip / foot ** 2",
    "pcf = pound / foot ** 3",
)


def ureg():
    """The process's single pint registry, created on first use (it costs ~0.3 s)."""
    global _REGISTRY
    if _REGISTRY is None:
        import pint  # noqa: PLC0415 - startup

        try:
            reg = pint.UnitRegistry(cache_folder=":auto:")
        except Exception:  # an unwritable cache folder must not stop the tool
            reg = pint.UnitRegistry()
        for line in _EXTRA_DEFINITIONS:
            reg.define(line)
        _REGISTRY = reg
    return _REGISTRY


# kind -> (SI reference unit, words for messages, example)
KINDS: dict[str, tuple[str, str, str]] = {
    "length": ("m", "a length", '"8 ft" or "2.4 m"'),
    "force": ("N", "a force", '"-300 lbf" or "-1.2 kN"'),
    "line_load": ("N/m", "a load per length", '"-25 lbf/ft" or "-0.4 kN/m"'),
    "area_load": ("Pa", "a load per area", '"-125 psf" or "-6 kPa"'),
    "moment": ("N*m", "a moment", '"150 lbf*ft" or "0.2 kN*m"'),
    "stiffness": ("N/m", "a spring stiffness (force per length)", '"2000 lbf/in"'),
    "rot_stiffness": ("N*m", "a rotational stiffness (moment per radian)", '"50000 lbf*ft/rad"'),
    "stress": ("Pa", "a stress", '"36 ksi" or "250 MPa"'),
    "area": ("m^2", "an area", '"3.37 in^2"'),
    "inertia": ("m^4", "a second moment of area", '"7.80 in^4"'),
    "modulus": ("m^3", "a section modulus", '"3.90 in^3"'),
    "density": ("kg/m^3", "a density", '"490 lb/ft^3" or "7850 kg/m^3"'),
    "mass_per_length": ("kg/m", "a weight per length", '"12.2 lb/ft" or "18 kg/m"'),
}

# Kinds where a weight (mass) unit is read as the force of that mass under standard gravity:
# shop people say "500 lb" and "200 kg" for loads.
_WEIGHT_OK = {"force": "kg", "line_load": "kg/m", "area_load": "kg/m^2", "moment": "kg*m",
              "stiffness": "kg/m", "rot_stiffness": "kg*m/rad"}
# Kinds where a force unit is read as mass under standard gravity (lbf/ft^3 for density).
_MASS_FROM_FORCE = {"density": "N/m^3", "mass_per_length": "N/m"}

_NUM = r"(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?"
_TERM = re.compile(
    r"\s*(?:(?P<whole>\d+)(?:\s+|-)(?P<n>\d+)\s*/\s*(?P<d>\d+)"  # 1-1/2, 1 1/2
    r"|(?P<fn>\d+)\s*/\s*(?P<fd>\d+)"  # 3/16
    rf"|(?P<dec>{_NUM}))"  # 2.5, 3e4
    r"\s*(?P<unit>[^\d\s+\-.][^\s]*(?:\s+(?![\d.+\-])[^\s]+)*)?"
)
_SEP = re.compile(r"\s*-?\s*")
_UNICODE = {
    "\u2032": "'", "\u2033": '"', "\u2019": "'", "\u201d": '"', "\u201c": '"',
    "\u00b7": "*", "\u22c5": "*", "\u00d7": "*", "\u2212": "-", "\u2013": "-",
    "\u00b2": "^2", "\u00b3": "^3", "\u2074": "^4", "\u00b5": "u", "\u03bc": "u",
}


# Fraction characters as the fractions they are ("10½ ft" is 10 1/2 ft)
_VULGAR = {"\u00bd": "1/2", "\u00bc": "1/4", "\u00be": "3/4", "\u215b": "1/8", "\u215c": "3/8",
           "\u215d": "5/8", "\u215e": "7/8", "\u2153": "1/3", "\u2154": "2/3"}


def _normalise(text: str) -> str:
    for a, b in _UNICODE.items():
        text = text.replace(a, b)
    text = text.replace("\u2044", "/")  # the fraction slash: 1⁄2
    for a, b in _VULGAR.items():
        if a in text:
            text = re.sub(rf"(?<=\d)\s*{a}", f" {b}", text).replace(a, b)
    text = text.replace("''", '"')
    # a power written with spaces, as pint also reads it ("pound / foot ** 3")
    text = re.sub(r"\s*(\*\*|\^)\s*(?=\d)", r"\1", text)
    # feet and inch marks become words; a mark is only a mark right after a number or space
    text = re.sub(r"(?<=[\d\s])'", " ft ", text)
    text = re.sub(r'(?<=[\d\s])"', " in ", text)
    return text.strip()


def normalised(text: str) -> str:
    """Text with shop marks read as units reads them: feet and inch marks as ft and in,
    fraction characters as fractions, typographic quotes and dashes plain."""
    return _normalise(text)


def _terms(text: str) -> tuple[int, list[tuple[Fraction | float, str]]] | None:
    """Split shop notation into (sign, [(number, unit text), ...]); None if it does not scan."""
    s = _normalise(text)
    sign = 1
    if s and s[0] in "+-":  # (note "" in "+-" is True)
        sign = -1 if s[0] == "-" else 1
        s = s[1:]
    pos, out = 0, []
    while pos < len(s):
        if out:
            m = _SEP.match(s, pos)
            pos = m.end()
        m = _TERM.match(s, pos)
        if not m or m.end() == pos:
            return None
        if m.group("whole") is not None:
            d = int(m.group("d"))
            if d == 0:
                return None
            num: Fraction | float = int(m.group("whole")) + Fraction(int(m.group("n")), d)
        elif m.group("fn") is not None:
            d = int(m.group("fd"))
            if d == 0:
                return None
            num = Fraction(int(m.group("fn")), d)
        else:
            dec = m.group("dec")
            try:
                num = Fraction(dec) if "e" not in dec.lower() else float(dec)
            except (ValueError, ZeroDivisionError):
                num = float(dec)
        out.append((num, (m.group("unit") or "").strip()))
        pos = m.end()
    return (sign, out) if out else None


# Shop spellings of units, by lower-case word: capitals and plurals ("6 FT", "400 Lbs",
# "Kips"), "#" for pounds, k for kip, Nm for newton-metres. A hyphen or a dot between two
# unit words is a product ("ft-lb", "lb-ft", "kip-ft", "kN-m", "ft.lb").
_SHOP_WORDS = {
    "ft": "ft", "feet": "ft", "foot": "ft", "in": "inch", "inch": "inch", "inches": "inch",
    "yd": "yd", "yard": "yd", "mm": "mm", "cm": "cm", "m": "m", "meter": "m", "metre": "m",
    "lb": "lb", "#": "lb", "pound": "lb", "lbm": "lb", "lbf": "lbf", "kip": "kip", "k": "kip",
    "kipf": "kip", "n": "N", "kn": "kN", "nm": "N*m", "knm": "kN*m", "nmm": "N*mm",
    "pa": "Pa", "kpa": "kPa", "mpa": "MPa", "gpa": "GPa", "psi": "psi", "ksi": "ksi",
    "psf": "psf", "ksf": "ksf", "plf": "plf", "klf": "klf", "pli": "pli", "pcf": "pcf", "kg": "kg",
    "kgf": "kgf", "rad": "rad", "radian": "rad", "ton": "ton", "tonne": "tonne",
}
_UNIT_WORD = re.compile(r"[A-Za-z#][A-Za-z_#]*")  # pint's own names: pound_force, foot_pound

# What to write, per kind, when a unit is refused.
SPELLINGS: dict[str, str] = {
    "length": "ft, in, yd, mm, cm or m (also 10' 6\")",
    "force": "lbf, lb (or #), kip (or k), N, kN or kg",
    "line_load": "lbf/ft (plf), lbf/in (pli), lb/ft, kip/ft (klf), N/m, kN/m or kg/m",
    "area_load": "psf (lbf/ft^2), ksf, Pa, kPa or kN/m^2",
    "moment": "lbf*ft (ft-lb, lb-ft), lbf*in (in-lb), kip*ft (k-ft), N*m (Nm, N-m) or kN*m "
              "(kN-m)",
    "stiffness": "lbf/in, kip/in, N/mm or kN/m",
    "rot_stiffness": "lbf*ft/rad, kip*in/rad, N*m/rad or kN*m/rad",
    "stress": "psi, ksi, Pa, kPa, MPa or GPa",
    "area": "in^2, ft^2, mm^2 or m^2",
    "inertia": "in^4 or mm^4",
    "modulus": "in^3 or mm^3",
    "density": "lb/ft^3 (pcf), lb/in^3 or kg/m^3",
    "mass_per_length": "lb/ft or kg/m",
}


_TON = re.compile(r"(?<![A-Za-z_])tons?(?![A-Za-z_])", re.IGNORECASE)


def ton_note(text) -> str:
    """What to say of a value written in "ton" (read as the US short ton, as pint reads it):
    a metric job's "1 ton" is usually a tonne, 10 % more. "" when the text has no "ton"."""
    if not isinstance(text, str) or not _TON.search(text):
        return ""
    return (f"{text!r}: \"ton\" is read as the US short ton (2,000 lb, 8.9 kN per ton); for a "
            "metric tonne (1,000 kg, 9.81 kN) write \"t\" or \"tonne\", for the long ton "
            "(2,240 lb) \"long_ton\"")


def _word(w: str) -> str:
    low = w.lower()
    if low in _SHOP_WORDS:
        return _SHOP_WORDS[low]
    if low.endswith("s") and low[:-1] in _SHOP_WORDS:  # plurals: lbs, kips, Kips, FTs
        return _SHOP_WORDS[low[:-1]]
    return w


def shop_unit(text: str) -> str:
    """A unit as a shop writes it, in pint's spelling: "ft-lb" -> "ft*lb", "400#" -> "lb",
    "KIPS" -> "kip", "Nm" -> "N*m". Words it does not know pass through unchanged."""
    out, pos = [], 0
    words = list(_UNIT_WORD.finditer(text))
    for i, m in enumerate(words):
        between = text[pos:m.start()]
        if i > 0 and between.strip() in ("-", ".", "\u00b7"):
            between = "*"
        out.append(between)
        out.append(_word(m.group(0)))
        pos = m.end()
    out.append(text[pos:])
    # a power written straight after its unit, as EN tables and mill certs do ("N/mm2",
    # "kg/m3", "in4")
    return re.sub(r"(?<=[A-Za-z])([234])(?![\d.])", r"^\1", "".join(out))


def as_typed(v) -> str:
    """A value read from a job file, shown as it reads in TOML (true, "3 ft", 10, a table),
    not as Python prints it (True, {'value': 10}, datetime.datetime(...))."""
    import datetime as _dt  # noqa: PLC0415 - only for a message

    if isinstance(v, bool):
        return "true" if v else "false"
    if isinstance(v, str):
        return '"' + v.replace("\\", "\\\\").replace('"', '\\"') + '"'
    if isinstance(v, (int, float)):
        return repr(v)
    if isinstance(v, dict):
        return "a table {" + ", ".join(f"{k} = {as_typed(x)}" for k, x in list(v.items())[:4]) \
            + (", ..." if len(v) > 4 else "") + "}"
    if isinstance(v, list):
        return "a list [" + ", ".join(as_typed(x) for x in v[:4]) + (", ..." if len(v) > 4
                                                                    else "") + "]"
    if isinstance(v, (_dt.date, _dt.time)):
        return f"a date or time ({v.isoformat()}; TOML reads an unquoted date as one)"
    return repr(v)


@lru_cache(maxsize=512)
def _unit(text: str):
    reg = ureg()
    return reg.parse_units(text.replace("^", "**"))


_US_NAMES = re.compile(r"(?:foot|inch|yard|mile|pound|kip|ounce|short_ton|long_ton|"
                       r"(?<!metric_)ton\b|psi|ksi|psf|ksf|plf|klf|pli|pcf|mil\b)")
_SI_NAMES = re.compile(r"(?:meter|metre|newton|gram|pascal|metric_ton|tonne|liter|litre)")


def unit_systems(text: str) -> frozenset[str]:
    """Which systems the units of a value come from, as the reader reads them ("us",
    "metric"; "yard" besides where a yard is among them): "-90 lbf per m" is both, however
    it is spelt. Empty where the text does not read."""
    scanned = _terms(text) if isinstance(text, str) else None
    if scanned is None:
        return frozenset()
    out = set()
    for _, unit in scanned[1]:
        if not unit:
            continue
        try:
            u = _unit(shop_unit(unit))
        except Exception:  # noqa: BLE001 - the reader says what is wrong with it
            continue
        for name in (str(c) for c in getattr(u, "_units", {})):
            if _SI_NAMES.search(name):
                out.add("metric")
            elif _US_NAMES.search(name):
                out.add("us")
            if "yard" in name:
                out.add("yard")
    return frozenset(out)


def quantity(text: str, key: str = "", unit_hint: str = "ft", kind: str | None = None):
    """Parse shop notation to a pint Quantity (sum of compound terms). Raises InputError."""
    if not isinstance(text, str):
        raise InputError(
            f"expected a value with its unit in quotes, found {as_typed(text)}", key)
    if len(text) > 200:
        raise InputError("value is too long (more than 200 characters)", key)
    comma = re.search(r"\d,\d", text)
    if comma:  # "2,000 lbf" (thousands) or "2,5 m" (a decimal comma): neither is read
        plain = re.sub(r"(?<=\d),(?=\d{3}(?!\d))", "", text)
        hint = (f"write {plain!r} without the thousands separator" if "," not in plain else
                f"write a decimal point, not a comma ({text.replace(',', '.')!r})")
        raise InputError(f"{text!r} has a comma inside a number: {hint}; shopbeam reads "
                         "neither thousands separators nor decimal commas, so as not to guess "
                         "which one is meant", key)
    scanned = _terms(text)
    if scanned is None:
        example = ("\"8 ft\", \"1-1/2 in\", \"10' 6\\\"\"" if kind in (None, "length")
                   else KINDS[kind][2] if kind in KINDS else "\"8 ft\", \"-300 lbf\"")
        if kind in KINDS and kind != "length":
            raise InputError(f"cannot read {text!r} as {KINDS[kind][1]}: write a number with "
                             f"its unit, e.g. {example}", key)
        raise InputError(f"cannot read {text!r} as a number with a unit (write e.g. {example})",
                         key)
    sign, terms = scanned
    if any(not unit for _, unit in terms):
        if kind == "length" and len(terms) == 2 and not terms[0][1] and \
                _word(terms[1][1]) in ("", "ft"):
            # "5-6", "5 6" or "5-6 ft": feet and inches with no marks ("5-6 ft" is no number)
            ft_in = f"{'-' if sign < 0 else ''}{terms[0][0]} ft {terms[1][0]} in"
            raise InputError(f"{text!r} has a bare number: for feet and inches write \"{ft_in}\" "
                             "(or 5' 6\"); shopbeam never guesses a unit", key)
        if kind == "length" and len(terms) == 2 and not terms[1][1] and \
                _word(terms[0][1]) == "ft":
            # "5 ft 6" or "5'6": the inches of feet and inches without their mark
            raise InputError(f"{text!r} has a bare number after the feet: for feet and inches "
                             f"write \"{'-' if sign < 0 else ''}{float(terms[0][0]):g} ft "
                             f"{float(terms[1][0]):g} in\" (or 5' 6\"); shopbeam never guesses a unit", key)
        # all numbers: suggest the whole text with a unit; else the first bare number
        shown = text.strip() if all(not u for _, u in terms) else \
            next(str(n) for n, u in terms if not u)
        # a length is as often inches as feet (a rack beam's "96", a wheelbase's "8"): both
        other = "in" if unit_hint == "ft" and kind in (None, "length") else None
        eg = f"\"{shown} {unit_hint}\"" + (f" or \"{shown} {other}\"" if other else "")
        raise InputError(f"{text!r} has a bare number: give its unit (e.g. {eg}); "
                         "shopbeam never guesses a unit", key)
    _mixed_fraction_slip(text, key)
    reg = ureg()
    total = None
    prev = None  # (unit text, size of one unit in base units) of the term before
    try:
        for num, unit in terms:
            try:
                u = _unit(shop_unit(unit))
            except Exception:
                if any(ch in text for ch in _VULGAR) or "\u2044" in text:
                    raise InputError(f"the fraction characters in {text!r} do not read as one "
                                     "number: write it with one fraction, as \"2-1/2 ft\" "
                                     "or \"2\u00bd ft\"", key) from None
                what = (f"; for {KINDS[kind][1]} write {SPELLINGS[kind]}"
                        if kind in SPELLINGS else "")
                raise InputError(f"unknown unit {unit!r} in {text!r}{what} "
                                 f"(e.g. {KINDS[kind][2] if kind in KINDS else chr(34) + '8 ft' + chr(34)})",
                                 key) from None
            _odd_prefix(text, key, unit, u)
            q = reg.Quantity(float(num), u)
            if total is None:
                total = q
            elif q.dimensionality != total.dimensionality:
                raise InputError(f"cannot add {unit!r} to {terms[0][1]!r} in {text!r}", key)
            else:
                _compound_slip(text, key, prev, unit, float(num), q)
                total = total + q.to(total.units)
            prev = (unit, float(reg.Quantity(1.0, u).to_base_units().magnitude))
        value = sign * total
    except InputError:
        raise
    except Exception:  # pint refuses arithmetic on offset units (degC, degF) and the like
        raise InputError(f"cannot use the unit in {text!r} here: temperatures and other offset "
                         "units have no place in a beam job (e.g. \"8 ft\", \"-300 lbf\")",
                         key) from None
    if not math.isfinite(float(value.magnitude)):
        raise InputError(f"{text!r} is not a finite number", key)
    return value


_SMALL_PREFIX = re.compile(r"^(?:milli|micro|nano|pico)(?:metric_ton|ton|kip|force_pound|"
                           r"pound|newton|gram|force_kilogram|kilogram)")


# A metric prefix on a US customary unit: "dlbf" is a tenth of a pound-force to pint, "mft" a
# thousandth of a foot. Only kilo on the pound (klb, klbf, kpsi: the kip) and mega on psi (Mpsi,
# a modulus) are written in shops; any other reads as a slip (a stray letter before the unit)
_US_PREFIXED = re.compile(
    r"^(yocto|zepto|atto|femto|pico|nano|micro|milli|centi|deci|deca|deka|hecto|kilo|mega|"
    r"giga|tera|peta|exa|zetta|yotta)(foot|inch|yard|mile|force_pound|pound|kip|"
    r"pound_force_per_square_inch|kip_per_square_inch|force_ounce|ounce|short_ton|ton|"
    r"force_ton|long_ton|mil)$")
_US_PREFIX_OK = {"kiloforce_pound", "kilopound", "kilopound_force_per_square_inch",
                 "megapound_force_per_square_inch"}


# Units no shop writes a beam's load, size or stress in, that the unit registry still reads:
# typed, they are a slip of letters ("ftlb" is femto-troy-pounds, a force of nothing; "tlb"
# a troy pound, 0.82 lb), or a unit of two sizes ("cwt": 100 lb in the US, 112 lb in the UK)
_NO_SHOP_UNITS = {
    "troy_pound": "a troy pound (0.82 lb, for precious metals)",
    "troy_ounce": "a troy ounce", "apothecary_pound": "an apothecary pound (0.82 lb)",
    "apothecary_ounce": "an apothecary ounce", "pennyweight": "a pennyweight",
    "grain": "a grain (1/7000 lb)", "dram": "a dram", "scruple": "a scruple",
    "carat": "a carat (0.2 g)", "dyne": "a dyne (10 micronewtons)",
    "poundal": "a poundal (0.03 lbf)", "slug": "a slug (32.2 lb)",
    "hundredweight": "a hundredweight (100 lb in the US, 112 lb in the UK)",
    "long_hundredweight": "a hundredweight (112 lb in the UK, 100 lb in the US)",
    "stone": "a stone (14 lb)",
    "centinewton": "a centinewton", "decinewton": "a decinewton (decanewton is daN)",
    "centigram": "a centigram", "decigram": "a decigram",
}
_TINY_PREFIX = re.compile(r"^(yocto|zepto|atto|femto)")


def _odd_prefix(text: str, key: str, word: str, u) -> None:
    """A metric prefix no shop puts on a force or a mass reads as a slip, not a value: "mt"
    (shorthand for metric tons) is milli-tonnes to pint, "mkip" a thousandth of a kip; so
    does a unit no shop writes a beam in (`_NO_SHOP_UNITS`). Refused, saying what it would
    have read as and what to write."""
    for name in (str(c) for c in getattr(u, "_units", {})):
        if name in _NO_SHOP_UNITS or _TINY_PREFIX.match(name):
            tiny = _TINY_PREFIX.match(name)
            what = _NO_SHOP_UNITS.get(name) or (
                f"{tiny.group(1)}-{name[tiny.end():].replace('_', ' ')} (a {tiny.group(1)}- "
                "prefix: next to nothing)")
            raise InputError(f"{text!r}: {word!r} reads as {what}, a unit no beam job is "
                             "written in, so it reads as a slip; write lbf, kip, N, kN, kg or "
                             "t for a force, lbf*ft or kN*m for a moment (ft-lb is written "
                             "with a hyphen or a *, not \"ftlb\")", key)
        if name in ("millimetric_ton", "megametric_ton"):
            big = name.startswith("mega")
            raise InputError(f"{text!r}: {word!r} reads as {'mega' if big else 'milli'}-tonnes "
                             f"({'a million metric tons' if big else 'a thousandth of a metric ton'}); "
                             "for metric tons write \"t\" or \"tonne\" (e.g. \"-1.5 t\"), "
                             "or give the force in kN", key)
        if _SMALL_PREFIX.match(name):
            raise InputError(f"{text!r}: {word!r} is {name.replace('_', ' ')}, a unit no load on "
                             "a beam is written in, so it reads as a slip; write lbf, kip, N, "
                             "kN, kg or t", key)
        m = _US_PREFIXED.match(name)
        if m and name not in _US_PREFIX_OK:
            us = {"force_pound": "pound-force", "pound_force_per_square_inch": "psi",
                  "kip_per_square_inch": "ksi", "force_ounce": "ounce-force",
                  "force_ton": "ton-force"}.get(m.group(2), m.group(2).replace("_", " "))
            raise InputError(f"{text!r}: {word!r} reads as {m.group(1)}-{us} (the metric "
                             f"prefix {m.group(1)!r} on a US unit, {us}), which no shop "
                             "writes, so it reads as a slip of a letter; "
                             "write the unit alone (lbf, kip, ft, in, psi, ksi; e.g. "
                             "\"-4000 lbf/ft\", \"2 ft\")", key)


_MIXED = re.compile(r"(?<![\d./])(\d+)[ -](\d+)/(\d+)(?![\d./])")


def _mixed_fraction_slip(text: str, key: str) -> None:
    """A mixed number's fraction is under one ("5 1/4"); "5 5/4" is a slip (5 1/4? 6 1/4?)
    that shopbeam does not settle by guessing."""
    for m in _MIXED.finditer(_normalise(text)):
        n, d = int(m.group(2)), int(m.group(3))
        if d and n >= d:
            whole = int(m.group(1)) + n // d
            rest = f" {n % d}/{d}" if n % d else ""
            raise InputError(f"{text!r}: the fraction in {m.group(0)!r} is not less than one, "
                             f"so it is not a mixed number (it would read {whole}{rest}); write "
                             "the value as meant, e.g. '5 1/4 in'", key)


def _compound_slip(text: str, key: str, prev, unit: str, num: float, q) -> None:
    """Feet then inches, metres then millimetres: a compound value goes from the larger unit
    to the smaller, and each part is less than one of the unit before it. "10 ft 13 in",
    "10 in 6 ft" or "1 ft 1 ft" all add up, but each is more likely a slip than meant."""
    if prev is None:
        return
    before, size = prev
    whole = float(q.to_base_units().magnitude)
    here = whole / num if num else None
    if here is not None and here >= size * (1 - 1e-12):
        raise InputError(f"{text!r} gives {unit!r} after {before!r}: a compound value goes "
                         "from the larger unit to the smaller, each unit once (e.g. '10 ft "
                         "6 in', '2 m 50 mm'); write it as meant", key)
    if whole >= size * (1 - 1e-12):
        raise InputError(f"{text!r}: the {num:g} {unit} after the {before} is one {before} or "
                         f"more; write the value as meant (e.g. '10 ft 6 in': the inches "
                         "after the feet are under 12), so a slipped digit is not read as "
                         "a sum", key)


@lru_cache(maxsize=64)
def _dim(ref: str):
    return _unit(ref).dimensionality


def describe_dimension(q) -> str:
    for kind, (ref, words, _) in KINDS.items():
        if kind in ("stiffness",):
            continue
        if q.dimensionality == _dim(ref):
            return words
    if q.dimensionality == _dim("kg"):
        return "a mass"
    if not q.dimensionality:
        return "a plain number"
    return f"a quantity in {q.units:~}"


# The plain quantities most jobs are made of ("12 ft", "-250 lbf", "10 ft 6 in"), read
# without pint; anything else goes to the full parser below. SI factor per unit and kind.
_PLAIN_UNITS: dict[str, dict[str, float]] = {
    "length": {"ft": FT, "in": IN, "m": 1.0, "mm": 1e-3, "cm": 1e-2},
    "force": {"lbf": LBF, "kip": KIP, "N": 1.0, "kN": 1e3},
    "line_load": {"lbf/ft": LBF / FT, "lbf/in": LBF / IN, "N/m": 1.0, "kN/m": 1e3},
    "moment": {"lbf*ft": LBF * FT, "lbf*in": LBF * IN, "N*m": 1.0, "kN*m": 1e3},
    "stress": {"psi": PSI, "ksi": KSI, "MPa": 1e6},
}
_PLAIN = re.compile(r"\s*([+-]?)(\d+(?:\.\d*)?|\.\d+)\s+([A-Za-z*/]+)\s*")
_FT_IN = re.compile(r"\s*([+-]?)(\d+)\s+ft\s+(\d+(?:\.\d*)?|\.\d+)\s+in\s*")


def plain_value(text, kind: str) -> float | None:
    """SI value of a plain shop quantity ("12 ft", "-250 lbf", "10 ft 6 in"), or None when
    the text is anything else (then `parse` reads it with the full parser)."""
    table = _PLAIN_UNITS.get(kind)
    if table is None or not isinstance(text, str) or len(text) > 40:
        return None
    m = _PLAIN.fullmatch(text)
    if m:
        f = table.get(m.group(3))
        if f is None:
            return None
        v = float(m.group(2)) * f
        return -v if m.group(1) == "-" else v
    if kind == "length":
        m = _FT_IN.fullmatch(text)
        if m and float(m.group(3)) < 12:  # 12 in or more: the full parser says why not
            v = (int(m.group(2)) + float(m.group(3)) / 12) * FT
            return -v if m.group(1) == "-" else v
    return None


def parse(text, kind: str, key: str = "", *, positive: bool = False,
          nonnegative: bool = False) -> float:
    """Parse `text` as a `kind` (see KINDS) and return the SI value as a float."""
    value = plain_value(text, kind)
    if value is None:
        value = _parse_full(text, kind, key)
    if positive and value <= 0:
        raise InputError(f"{text!r} must be greater than zero", key)
    if nonnegative and value < 0:
        raise InputError(f"{text!r} must not be negative", key)
    return value


def _parse_full(text, kind: str, key: str = "") -> float:
    ref, words, example = KINDS[kind]
    hint = re.search(r'"[-\d.]+ ([^"]+)"', example)
    unit_hint = hint.group(1) if hint else "ft"
    if kind == "length" and ".section" in key:  # a wall or flange is inches, not feet
        unit_hint = "in"
    q = quantity(text, key, unit_hint, kind)
    if q.dimensionality == _dim(ref):
        value = float(q.to(ref).magnitude)
    elif kind in _WEIGHT_OK and q.dimensionality == _dim(_WEIGHT_OK[kind]):
        value = float(q.to(_WEIGHT_OK[kind]).magnitude) * G0
    elif kind in _MASS_FROM_FORCE and q.dimensionality == _dim(_MASS_FROM_FORCE[kind]):
        value = float(q.to(_MASS_FROM_FORCE[kind]).magnitude) / G0
    else:
        raise InputError(f"{text!r} is {describe_dimension(q)}, but {words} is expected here: "
                         f"write {SPELLINGS.get(kind, ref)} (e.g. {example})", key)
    if not math.isfinite(value):
        raise InputError(f"{text!r} is out of range", key)
    return value


# ---------------------------------------------------------------- display
# (factor from SI, label) per display system and kind
DISPLAY: dict[str, dict[str, tuple[float, str]]] = {
    "us": {
        "length": (1 / FT, "ft"),
        "small_length": (1 / IN, "in"),
        "force": (1 / LBF, "lbf"),
        "line_load": (FT / LBF, "lbf/ft"),
        "area_load": (FT**2 / LBF, "psf"),
        "moment": (1 / (LBF * FT), "lbf*ft"),
        "stiffness": (IN / LBF, "lbf/in"),
        "rot_stiffness": (1 / (LBF * FT), "lbf*ft/rad"),
        "stress": (1 / KSI, "ksi"),
        "area": (1 / IN**2, "in^2"),
        "inertia": (1 / IN**4, "in^4"),
        "modulus": (1 / IN**3, "in^3"),
        "density": (FT**3 / LB, "lb/ft^3"),
        "mass_per_length": (FT / LB, "lb/ft"),
        "slope": (1.0, "rad"),
        "ei": (1 / (LBF * IN**2), "lbf*in^2"),
    },
    "si": {
        "length": (1.0, "m"),
        "small_length": (1000.0, "mm"),
        "force": (1e-3, "kN"),
        "line_load": (1e-3, "kN/m"),
        "area_load": (1e-3, "kPa"),
        "moment": (1e-3, "kN*m"),
        "stiffness": (1e-3, "kN/m"),
        "rot_stiffness": (1e-3, "kN*m/rad"),
        "stress": (1e-6, "MPa"),
        "area": (1e6, "mm^2"),
        "inertia": (1e12, "mm^4"),
        "modulus": (1e9, "mm^3"),
        "density": (1.0, "kg/m^3"),
        "mass_per_length": (1.0, "kg/m"),
        "slope": (1.0, "rad"),
        "ei": (1e-3, "kN*m^2"),
    },
}


def to_display(value: float, kind: str, system: str = "us") -> float:
    return value * DISPLAY[system][kind][0]


def unit_label(kind: str, system: str = "us") -> str:
    return DISPLAY[system][kind][1]


def and_words(words) -> str:
    """"a", "a and b", "a, b and c"."""
    words = list(words)
    return words[0] if len(words) < 2 else ", ".join(words[:-1]) + " and " + words[-1]


def num(value: float, sig: int = 4) -> str:
    """A number to `sig` significant figures, without exponent for shop-sized values."""
    if value == 0 or not math.isfinite(value):
        return "0" if value == 0 else str(value)
    mag = math.floor(math.log10(abs(value)))
    if mag >= 7 or mag <= -5:
        return f"{value:.{sig - 1}e}"
    decimals = max(sig - 1 - mag, 0)
    text = f"{value:.{decimals}f}"
    if "." in text:
        text = text.rstrip("0").rstrip(".")
    return "0" if text in ("-0", "") else text


def fmt(value: float, kind: str, system: str = "us", sig: int = 4) -> str:
    """Format an SI value in the display system: fmt(3.6576, 'length') -> '12 ft'."""
    factor, label = DISPLAY[system][kind]
    return f"{num(value * factor, sig)} {label}"


# SI unit of a check's demand and limit -> the display kind it is shown as
CHECK_KINDS = {"Pa": "stress", "m": "small_length", "N": "force", "N*m": "moment"}


def fmt_check(value: float, unit: str, system: str = "us", wood: bool = False) -> str:
    """A check's demand or limit (SI, in `unit`) in the job's units (wood stresses in psi, as
    its trade writes them)."""
    if wood and unit == "Pa" and system == "us":
        return f"{num(value / PSI)} psi"
    kind = CHECK_KINDS.get(unit)
    if kind:
        return fmt(value, kind, system)
    # an interaction sum or other pure number: three decimals, no unit to print
    return f"{value:.3f}" if not unit.strip() else f"{num(value)} {unit}"
