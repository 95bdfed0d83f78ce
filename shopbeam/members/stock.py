"""Stock list: the sections a shop keeps or can buy, with an optional price per foot.

Sizing (`shopbeam size JOB --stock FILE`) ranks the stock that passes by weight and, where
prices are given, by cost. The file is plain text, TOML or CSV (chosen by its extension;
other extensions are sniffed). Prices are plain numbers in the shop's currency.

TOML::

    currency = "USD"                 # optional, for reports
    [[stock]]
    section = "HSS4x4x1/4"           # a catalog designation, a description such as
                                     # "rect-tube 2 x 1 x 14ga", or a section table
    price_per_ft = 18.40             # or price_per_m = 60.4, or price = "$18.40/ft"
    material = "A500-C"              # optional: the grade this stock is
    note = "rack 3"                  # optional

CSV (first row is the header; ``section`` is required, the rest optional)::

    section,price_per_ft,material,note
    HSS4x4x1/4,18.40,A500-C,rack 3
    "rect-tube 2 x 1 x 14ga",4.10,A513,

Blank lines and lines starting with ``#`` are skipped in CSV. Every problem is reported
with the file, the line (CSV, or TOML syntax errors) and the entry.
"""

from __future__ import annotations

import csv
import io
import re
from dataclasses import dataclass
from pathlib import Path

from shopbeam.errors import InputError, InputErrors, Problem
from shopbeam.members.catalog import not_made_in, other_metal_on_steel_shape
from shopbeam.members.sections import Section
from shopbeam.members.materials import resolve_material
from shopbeam.members.resolve import resolve_section

FT = 0.3048
_ITEM_KEYS = {"section", "price_per_ft", "price_per_m", "price", "material", "note", "axis"}


@dataclass(frozen=True)
class StockItem:
    """One line of the stock list. `price_per_m` is currency per metre (None: no price)."""

    designation: str
    section: Section
    price_per_m: float | None = None
    material: str | None = None
    note: str = ""
    line: int | None = None

    @property
    def price_per_ft(self) -> float | None:
        return None if self.price_per_m is None else self.price_per_m * FT

    def cost(self, length: float) -> float | None:
        """Price of `length` metres of this stock, or None without a price."""
        return None if self.price_per_m is None else self.price_per_m * length


@dataclass(frozen=True)
class StockList:
    path: str
    items: tuple[StockItem, ...]
    currency: str = ""

    def __len__(self) -> int:
        return len(self.items)

    def __iter__(self):
        return iter(self.items)

    @property
    def has_prices(self) -> bool:
        return any(i.price_per_m is not None for i in self.items)

    def sections(self) -> list[Section]:
        return [i.section for i in self.items]


def load_stock(path) -> StockList:
    """Read a stock list file (TOML or CSV). Raises InputError / InputErrors."""
    p = Path(path)
    try:
        text = p.read_text(encoding="utf-8-sig")
    except FileNotFoundError:
        raise InputError("stock list file not found", file=str(p)) from None
    except (OSError, UnicodeDecodeError) as exc:
        raise InputError(f"cannot read the stock list: {exc}", file=str(p)) from None
    ext = p.suffix.lower()
    if ext == ".toml":
        kind = "toml"
    elif ext in (".csv", ".txt"):
        kind = "csv"
    else:
        kind = "toml" if re.search(r"^\s*\[\[\s*stock\s*\]\]", text, re.M) else "csv"
    return parse_stock(text, kind, file=str(p))


def parse_stock(text: str, kind: str = "toml", file: str = "") -> StockList:
    """Parse stock list text; `kind` is "toml" or "csv"."""
    if kind == "toml":
        return _parse_toml(text, file)
    if kind == "csv":
        return _parse_csv(text, file)
    raise ValueError(kind)


def _parse_toml(text: str, file: str) -> StockList:
    import tomllib

    try:
        doc = tomllib.loads(text)
    except tomllib.TOMLDecodeError as exc:
        msg = str(exc)
        m = re.search(r"line (\d+)", msg)
        raise InputError(f"not valid TOML: {msg}", file=file,
                         line=int(m.group(1)) if m else None) from None
    for k in doc:
        if k not in ("stock", "currency"):
            raise InputError(f"unknown key {k!r}: a stock list has [[stock]] entries and an "
                             "optional currency", key=k, file=file)
    entries = doc.get("stock")
    if not isinstance(entries, list) or not entries:
        raise InputError("no [[stock]] entries: each needs section = \"...\" (and optionally "
                         "price_per_ft)", key="stock", file=file)
    currency = doc.get("currency", "")
    if not isinstance(currency, str):
        raise InputError("currency must be text, e.g. \"USD\"", key="currency", file=file)
    items, problems = [], []
    for n, entry in enumerate(entries, 1):
        key = f"stock[{n}]"
        if not isinstance(entry, dict):
            problems.append(Problem("each stock entry must be a table", key, file))
            continue
        try:
            items.append(_item(entry, key, file, None))
        except InputError as exc:
            problems.append(exc.problem)
    _raise(problems)
    return StockList(file, tuple(items), currency)


def _parse_csv(text: str, file: str) -> StockList:
    lines = text.splitlines()
    numbered = [(i + 1, ln) for i, ln in enumerate(lines)
                if ln.strip() and not ln.lstrip().startswith("#")]
    if not numbered:
        raise InputError("the stock list is empty: give a header row such as "
                         "\"section,price_per_ft\" and one row per stock section", file=file)
    reader = csv.reader(io.StringIO("\n".join(ln for _, ln in numbered)), skipinitialspace=True)
    rows = list(reader)
    header = [h.strip().lower().replace(" ", "_") for h in rows[0]]
    head_line = numbered[0][0]
    if "section" not in header:
        raise InputError("the first row must be a header naming the columns, with a "
                         "\"section\" column (e.g. section,price_per_ft)", file=file,
                         line=head_line)
    for h in header:
        if h not in _ITEM_KEYS:
            import difflib

            close = difflib.get_close_matches(h, sorted(_ITEM_KEYS), n=1)
            hint = f" (did you mean {close[0]!r}?)" if close else ""
            raise InputError(f"unknown column {h!r}{hint}; columns are "
                             f"{', '.join(sorted(_ITEM_KEYS))}", file=file, line=head_line)
    items, problems = [], []
    for (line, _), row in zip(numbered[1:], rows[1:]):
        if len(row) > len(header):
            problems.append(Problem(f"{len(row)} values but {len(header)} columns", "",
                                    file, line))
            continue
        entry = {h: v.strip() for h, v in zip(header, row) if v.strip()}
        for k in ("price_per_ft", "price_per_m"):
            if k in entry:
                entry[k] = _number(entry[k], k, file, line, problems)
        if any(v is _BAD for v in entry.values()):
            continue
        try:
            items.append(_item(entry, "", file, line))
        except InputError as exc:
            problems.append(exc.problem)
    _raise(problems)
    if not items:
        raise InputError("no stock rows after the header", file=file, line=head_line)
    return StockList(file, tuple(items))


_BAD = object()


def _number(text, key, file, line, problems):
    t = text.replace("$", "").replace(",", "").strip()
    try:
        return float(t)
    except ValueError:
        problems.append(Problem(f"{key} {text!r} is not a number (write e.g. 18.40)", key,
                                file, line))
        return _BAD


def _raise(problems):
    if len(problems) == 1:
        p = problems[0]
        raise InputError(p.message, p.key, p.file, p.line)
    if problems:
        raise InputErrors(problems)


_PRICE = re.compile(r"^\s*[$\u20ac\u00a3]?\s*(?P<v>\d+(?:\.\d*)?|\.\d+)\s*"
                    r"(?:[A-Za-z]{3}\s*)?(?:/|per)\s*(?P<u>ft|foot|feet|m|metre|meter)\s*$",
                    re.IGNORECASE)


def _k(where: str, name: str) -> str:
    return f"{where}.{name}" if where else name


def _price(entry, key, file, line) -> float | None:
    given = [k for k in ("price_per_ft", "price_per_m", "price") if k in entry]
    if len(given) > 1:
        raise InputError(f"give one of {', '.join(given)}, not both", _k(key, given[1]),
                         file, line)
    if not given:
        return None
    k = given[0]
    v = entry[k]
    if k == "price":
        m = _PRICE.match(v) if isinstance(v, str) else None
        if not m:
            raise InputError(f"price {v!r}: write it per length, e.g. \"$18.40/ft\" or "
                             "\"60.40/m\" (or use price_per_ft = 18.40)", _k(key, "price"),
                             file, line)
        value = float(m.group("v"))
        per_m = value / FT if m.group("u").lower() in ("ft", "foot", "feet") else value
    else:
        if isinstance(v, bool) or not isinstance(v, (int, float)):
            raise InputError(f"{k} must be a plain number (e.g. 18.40), not {v!r}",
                             _k(key, k), file, line)
        per_m = float(v) / FT if k == "price_per_ft" else float(v)
    if not (per_m >= 0) or per_m == float("inf"):
        raise InputError(f"{k} must not be negative", _k(key, k), file, line)
    return per_m


def _item(entry: dict, key: str, file: str, line: int | None) -> StockItem:
    where = key
    for k in entry:
        if k not in _ITEM_KEYS:
            import difflib

            close = difflib.get_close_matches(k, sorted(_ITEM_KEYS), n=1)
            hint = f" (did you mean {close[0]!r}?)" if close else ""
            raise InputError(f"unknown key {k!r}{hint}", _k(where, k),
                             file, line)
    spec = entry.get("section")
    if spec is None or spec == "":
        raise InputError("each stock entry needs a section", _k(where, "section"), file,
                         line)
    mat_key = entry.get("material")
    material = None
    if mat_key is not None:
        if not isinstance(mat_key, str):
            raise InputError("material must be a built-in material name", _k(where, "material"),
                             file, line)
        try:
            material = resolve_material(mat_key, _k(where, "material"))
        except InputError as exc:
            raise InputError(exc.problem.message, exc.problem.key, file, line) from None
    skey = _k(where, "section")
    try:
        sec = resolve_section(spec, key=skey, axis=entry.get("axis"), material=material)
    except InputError as exc:
        raise InputError(exc.problem.message, exc.problem.key, file, line) from None
    if material is not None:
        # the job reader's words: the row is refused as a job file would refuse it
        wrong = not_made_in(sec, material) or other_metal_on_steel_shape(sec, material)
        if wrong:
            raise InputError(wrong, skey, file, line)
    note = entry.get("note", "")
    if not isinstance(note, str):
        raise InputError("note must be text", _k(where, "note"), file, line)
    designation = spec if isinstance(spec, str) else sec.designation
    return StockItem(designation.strip(), sec, _price(entry, where, file, line),
                     material.key if material else None, note, line)


def rank(items, by: str = "weight", density: float | None = None,
         length: float | None = None) -> list[StockItem]:
    """Stock items ordered lightest first (`by="weight"`, kg/m from the section's table or
    area x density) or cheapest first (`by="price"`, per metre, or for `length` metres;
    unpriced items last, lightest first among them)."""
    def weight(i: StockItem) -> float:
        return i.section.weight_per_length(density if density is not None else 7850.0)

    if by == "weight":
        return sorted(items, key=lambda i: (weight(i), i.designation))
    if by == "price":
        return sorted(items, key=lambda i: (i.price_per_m is None,
                                            i.price_per_m if i.price_per_m is not None else 0,
                                            weight(i), i.designation))
    raise ValueError(f"rank by 'weight' or 'price', not {by!r}")
