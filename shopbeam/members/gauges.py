"""Gauges: wall and sheet thickness by gauge number, read the way shops write them.

Tube walls are sold by the Birmingham (Stubs iron) wire gauge, BWG; steel sheet and plate by
the Manufacturers' Standard Gauge for sheet steel, MSG; aluminium sheet by the American
(Brown & Sharpe) wire gauge, AWG. The gauge tables below are recalled from memory of the
published tables (values in inches) and are checked in the tests against the figures the
trade quotes most (14 ga tube = 0.083 in, 11 ga = 0.120 in, 16 ga = 0.065 in; 14 ga sheet =
0.0747 in). `parse_wall` accepts a length (``"1/8 in"``, ``"3 mm"``) or a gauge (``"14 ga"``,
``"14ga"``, ``"14 gauge"``, ``"#14"``) and says which table it used.
"""

from __future__ import annotations

import re

from shopbeam.errors import InputError
from shopbeam.units import parse

IN = 0.0254

# Birmingham wire gauge (Stubs iron wire), inches. From memory of the published table.
BWG: dict[int, float] = {
    -3: 0.454, -2: 0.425, -1: 0.380, 0: 0.340,  # 0000, 000, 00, 0
    1: 0.300, 2: 0.284, 3: 0.259, 4: 0.238, 5: 0.220, 6: 0.203, 7: 0.180, 8: 0.165,
    9: 0.148, 10: 0.134, 11: 0.120, 12: 0.109, 13: 0.095, 14: 0.083, 15: 0.072, 16: 0.065,
    17: 0.058, 18: 0.049, 19: 0.042, 20: 0.035, 21: 0.032, 22: 0.028, 23: 0.025, 24: 0.022,
    25: 0.020, 26: 0.018, 27: 0.016, 28: 0.014,
}

# Manufacturers' Standard Gauge for sheet steel, inches. From memory of the published table.
MSG: dict[int, float] = {
    3: 0.2391, 4: 0.2242, 5: 0.2092, 6: 0.1943, 7: 0.1793, 8: 0.1644, 9: 0.1495, 10: 0.1345,
    11: 0.1196, 12: 0.1046, 13: 0.0897, 14: 0.0747, 15: 0.0673, 16: 0.0598, 17: 0.0538,
    18: 0.0478, 19: 0.0418, 20: 0.0359, 21: 0.0329, 22: 0.0299, 23: 0.0269, 24: 0.0239,
    25: 0.0209, 26: 0.0179, 27: 0.0164, 28: 0.0149, 29: 0.0135, 30: 0.0120,
}

# American (Brown & Sharpe) wire gauge, used for aluminium sheet, inches: d = 0.005 in x
# 92^((36 - n) / 39), rounded to 4 places (the defining formula of the gauge).
AWG: dict[int, float] = {n: round(0.005 * 92 ** ((36 - n) / 39), 4) for n in range(0, 31)}

TABLES = {
    "bwg": ("Birmingham wire gauge (tube wall)", BWG),
    "msg": ("Manufacturers' Standard Gauge (sheet steel)", MSG),
    "awg": ("American wire gauge (aluminium sheet)", AWG),
}
# which table a shape's thickness is sold by
FOR_SHAPE = {"tube": "bwg", "sheet": "msg", "plate": "msg", "bar": "msg",
             "aluminum-sheet": "awg"}

_GAUGE = re.compile(
    r"^\s*(?:#\s*(?P<a>\d{1,2}|0{1,4})\s*(?:ga|gauge|gage|g)?"
    r"|(?P<b>\d{1,2}|0{1,4}|\d/0)\s*(?:-\s*)?(?:ga\.?|gauge|gage|g)"
    r"(?:\s*(?P<table>bwg|msg|awg|stubs|sheet|tube|b&s))?)\s*$",
    re.IGNORECASE,
)


def gauge_number(text: str) -> tuple[int, str | None] | None:
    """(gauge number, table named in the text or None), or None if `text` is no gauge.

    "0000" and "4/0" are -3, "000"/"3/0" -2, "00"/"2/0" -1, "0" is 0.
    """
    if not isinstance(text, str):
        return None
    m = _GAUGE.match(text)
    if not m:
        return None
    g = m.group("a") or m.group("b")
    if "/" in g:
        n = 1 - int(g.split("/")[0])
    elif len(g) > 1 and set(g) == {"0"}:
        n = 1 - len(g)
    else:
        n = int(g)
    t = (m.group("table") or "").lower() if m.groupdict().get("table") else None
    table = {"stubs": "bwg", "tube": "bwg", "sheet": "msg", "b&s": "awg"}.get(t, t) if t else None
    return n, table


def thickness(n: int, table: str = "bwg") -> float:
    """Thickness in metres of gauge `n` in `table` ("bwg", "msg", "awg"); KeyError if none."""
    name, tab = TABLES[table]
    return tab[n] * IN


def gauge_name(n: int) -> str:
    return "0" * (1 - n) if n <= 0 else str(n)


def parse_wall(value, key: str = "", shape: str = "tube") -> tuple[float, str]:
    """A wall thickness given as a length or a gauge -> (metres, note on the table used).

    The note is "" for a plain length and e.g. "14 ga = 0.083 in, Birmingham wire gauge
    (tube wall)" for a gauge.
    """
    if isinstance(value, str):
        g = gauge_number(value)
        if g is not None:
            n, named = g
            table = named or FOR_SHAPE.get(shape, "bwg")
            name, tab = TABLES[table]
            if n not in tab:
                lo, hi = min(tab), max(tab)
                raise InputError(
                    f"gauge {gauge_name(n)} is not in the {name} table (it runs "
                    f"{gauge_name(lo)} to {gauge_name(hi)}); give the wall as a length, "
                    "e.g. \"0.083 in\"", key)
            return tab[n] * IN, f"{gauge_name(n)} ga = {tab[n]:g} in, {name}"
    if value is None:
        raise InputError("a wall thickness is needed, e.g. \"1/8 in\" or \"14 ga\"", key)
    return parse(value, "length", key, positive=True), ""
