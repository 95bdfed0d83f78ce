"""Job files (TOML, schema 1) in, validated `Job` records out.

The reader is the only code that sees the raw TOML: it turns the file into a complete,
frozen, typed `Job` (bracing, basis, impact, wheel sets, the deflection rule and lifting are
real fields) and the design and output layers read those fields alone.

Validation reports every problem in one pass, each with the file, the key path
(``loads[2].at``, counted from 0 like the file's own order, with the ordinal in words) and the
line where the text gives one. Unknown keys are warnings that name the nearest known key, so a
typo never silently drops a load. A file with a newer schema is refused; schema 1 stays
readable. Nothing in a job file is ever evaluated as code.
"""

from __future__ import annotations

import difflib
import math
import re
import tomllib
from dataclasses import dataclass, field, replace
from enum import StrEnum
from functools import cached_property
from pathlib import Path

from shopbeam import units
from shopbeam.cautions import RACK_TAGS, SHELF_TAGS, is_lifting, normal_tag
from shopbeam.engine.model import LOAD_KINDS, SUPPORT_KINDS, Beam, Load, Support, segments
from shopbeam.engine.solver import geometry_problems
from shopbeam.errors import InputError, InputErrors, Problem
from shopbeam.jobs.limits import MAX_FILE_BYTES
from shopbeam.jobs.rules import (LIVE_DEFLECTION_PRESETS, DEFAULT_DEFLECTION_RATIO, DEFLECTION_PRESETS,
                                 LIFTING_DEFAULT_RATIO, LIFTING_PROFILES, WOOD_E_MAX, Basis,
                                 FATIGUE_CATEGORIES, guessed_profile, has_free_end)
from shopbeam.members import catalog
from shopbeam.members.catalog import is_steel_shape, is_wood_size
from shopbeam.members.materials import (EN_GRADES, get as get_material, resolve_material,
                                        untempered, ungraded)
from shopbeam.members.resolve import resolve_section

SCHEMA = 1
MAX_LOADS = 1000
MAX_SUPPORTS = 200

# Known keys per table (a key missing here is warned about as unknown). A new key is added
# here, as a field of the table's record below, and read in the table's reader function.
KNOWN_KEYS: dict[str, set[str]] = {
    "": {"schema", "title", "notes", "units", "tags", "beam", "supports", "loads", "criteria",
         "moving", "project"},
    "beam": {"length", "section", "material", "self_weight", "axis", "members", "levels", "welded",
             "braces", "braced", "braces_flange", "bearing", "restrained", "wet_service", "temperature",
             "repetitive"},
    "supports": {"at", "type", "stiffness", "label", "bearing", "brace"},
    "loads": {"type", "at", "start", "end", "value", "label", "case", "width", "total",
              "patterned", "uplift", "bearing", "flange", "wheels", "lug"},
    "criteria": {"deflection", "safety_factor", "basis", "impact", "duration",
                 "live_deflection", "lifting", "category", "fatigue_category", "cycles"},
    "moving": {"label", "loads", "dead", "spacing", "travel", "case", "wheels_per_axle",
               "wheel_edge", "bearing"},
    "project": set(),  # filled from PROJECT_KEYS below
}

# Optional [project] table: the title block of a calc package (all text, all optional).
PROJECT_KEYS = ("shop", "job", "member", "client", "location", "prepared_by", "checked_by",
                "date", "revision")
KNOWN_KEYS["project"] = set(PROJECT_KEYS)


@dataclass(frozen=True)
class Criteria:
    """What the member is checked against ([criteria])."""

    deflection: str = "L/240"  # as written ("L/240" when not written)
    deflection_ratio: float | None = DEFAULT_DEFLECTION_RATIO  # n in L/n (lifting default 450)
    deflection_abs: float | None = None  # m
    safety_factor: float = 1.67
    basis: Basis = Basis.AUTO
    impact: float | None = None  # fraction as written; None: the default (15 % when lifting)
    deflection_preset: str = ""  # the preset named ("rack", "hoist", ...), lower case
    deflection_given: bool = False  # the file gives a deflection limit
    live_deflection_ratio: float | None = None  # n of L/n under live load alone, or None
    lifting: str = ""  # lifting profile named (shopbeam.jobs.rules.LIFTING_PROFILES), lower case
    # why the safety_factor as written stops a rating (more than the basis carries and not
    # used, or too little margin on first yield); "" when it does not
    factor_gap: str = ""
    category: str = ""  # ASME BTH-1 design category "A" or "B" (below-the-hook beams)
    # fatigue (AISC 360-16 Appendix 3): the detail's stress category ("A" ... "E'", upper
    # case) and the number of stress-range cycles over the member's life; "" / None: not given
    fatigue_category: str = ""
    cycles: float | None = None


@dataclass(frozen=True)
class WheelSet:
    """One ``[[moving]]`` wheel set, per job (not yet shared between members), SI, + up."""

    label: str
    live: tuple[float, ...]  # N per wheel (loads = [...])
    dead: tuple[float, ...]  # N per wheel (dead = [...]; zeros when not given)
    offsets: tuple[float, ...]  # m from the first wheel (from spacing = [...])
    travel: tuple[float, float]  # m, the range the whole set stays within
    key: str = "moving[0]"
    wheels_per_axle: int = 2  # each load is an axle; a monorail trolley runs a wheel each side
    wheel_edge: float | None = None  # m, flange tip to wheel contact; None: the stated default
    # m, each wheel's contact length along the member (bearing = "..."): a wood member's
    # bearing under the wheels (NDS 3.10); None: not given (a wood member is then not rated)
    bearing: float | None = None


@dataclass(frozen=True)
class Job:
    """A validated job: what the member is, how it is held, what it carries (SI)."""

    title: str
    length: float
    section: object  # shopbeam.members.sections.Section
    material: object  # shopbeam.members.materials.Material
    supports: tuple[Support, ...]
    loads: tuple[Load, ...]  # as entered, per job (before sharing between members)
    criteria: Criteria = field(default_factory=Criteria)
    notes: str = ""
    units: str = "us"
    tags: tuple[str, ...] = ()
    self_weight: bool = True
    members: int = 1
    levels: int | None = None  # beam.levels: levels of beams in one rack bay (the per-bay total)
    welded: bool = False
    braced: bool = False  # top flange or edge braced all along (beam.braced)
    braces: tuple[float, ...] = ()  # lateral brace positions, m, sorted (beam.braces)
    # beam.braces_flange: "top" when the braces hold the top flange only (joist seats, no
    # kicker to the bottom flange), "both" when they hold the section against twist; None when
    # the job does not say (taken as "both", with a caution where the moment hogs)
    braces_flange: str | None = None
    moving: tuple[WheelSet, ...] = ()  # at most one wheel set
    restrained: bool = False  # beam.restrained: held against twist and sideways movement
    bearing: float | None = None  # m, beam.bearing: bearing length at supports and loads
    bearings: dict = field(default_factory=dict)  # "supports[i]" / "loads[i]" -> bearing, m
    # "loads[i]" -> how many trolley wheels (or clamp jaws) a hung point load bears on
    contacts: dict = field(default_factory=dict)
    hung: tuple[str, ...] = ()  # keys of point loads hung from the bottom flange
    # of those, the ones hung by default (a lifting job's I-beam, no `flange` written)
    hung_default: tuple[str, ...] = ()
    # of those, the ones said to hang from a lug plate welded under the web (lug = true): no
    # wheels or jaws on the flange tips, so no flange-tip check (J10.1 still applies)
    lugs: tuple[str, ...] = ()
    # force loads (and wheels) that push UP with no `uplift = true`: almost always a forgotten
    # minus sign. Each entry is "loads[i] (label)"; a capacity or rating is not posted on them.
    upward: tuple[str, ...] = ()
    # what makes an untagged job read like a lifting device (words, tags, wheels); a rating is
    # not posted on it until it is tagged lifting, or tagged not-lifting (see _lifting_hint)
    lifting_hint: str = ""
    # words that name a below-the-hook device on a job tagged lifting with no profile named
    # (its ASME BTH-1 design factor is never guessed; see _below_the_hook_hint)
    bth_hint: str = ""
    # point loads placed on a fixed, pin or roller support: they go straight into it and do
    # not load the member (a tip load typed at the held end). Each entry is "loads[i] (label)
    # at the <kind> support at <x>"; a capacity or rating is not posted on them.
    at_support: tuple[str, ...] = ()
    long_bearings: tuple[str, ...] = ()  # bearing too long for a point model (no rating)
    # the [[moving]] keys that say a trolley hangs from the bottom flange (wheels_per_axle,
    # wheel_edge) on a job not tagged lifting, whose wheels are taken as rolling on the top
    # flange: the wheel flange checks are not made there, so no rating (see _rolling_keys)
    rolling_keys: str = ""
    # keys the reader did not know that say the member is notched, coped or holed (not
    # modelled): no rating is posted on them (see _CUT_KEY)
    cut_keys: tuple[str, ...] = ()
    # keys the reader did not know that read like a safety factor (sf, fos, omega...), or a
    # safety_factor outside [criteria]: the factor meant is not applied, so no rating
    factor_keys: tuple[str, ...] = ()
    # what makes a job with no impact read like a road vehicle's member (see _vehicle_hint)
    vehicle_hint: str = ""
    # what makes a job read like a road vehicle's member, impact given or not (fatigue:
    # analysis.use_unchecked)
    vehicle: str = ""
    # other reasons the reader found to post no rating, each warned too (see _Reader.hold)
    holds: tuple[str, ...] = ()
    # the key of a monorail's or jib's hook load given as a point load at its worst place:
    # the hoist travels, and `capacity` rates it anywhere along the member ("" otherwise)
    travelling_hoist: str = ""
    # the tributary width (m) of each load given per area (psf x width), by load key
    widths: dict = field(default_factory=dict)
    supports_line: int | None = None  # the first [[supports]] header's line, for messages
    path: str = ""
    warnings: tuple[Problem, ...] = ()
    conversions: tuple[str, ...] = ()  # e.g. "loads[0]: -125 psf x 16 in = -166.7 lbf/ft"
    wood: object = None  # shopbeam.members.wood.Service: the wood keys (wood members only)
    project: dict = field(default_factory=dict)  # [project] title-block fields, as text
    # every dead load (self-weight and the wheels' dead parts too) is taken at this multiple:
    # 1 as entered; 0.6 for the combination in which the dead loads hold down an uplift
    # (design.uplift: ASCE 7-16 2.4.1, combination 7). Never read from a job file.
    dead_factor: float = 1.0

    @cached_property
    def lifting(self) -> bool:
        """A lifting device: tagged ``lifting`` or naming a ``[criteria] lifting`` profile
        (worked out once per job: the checks and sizing ask it many times)."""
        return is_lifting(self.tags, self.criteria.lifting)

    @property
    def caution_lifting(self) -> bool:
        """The stronger lifting caution: a lifting device, or a job that reads like one but is
        not tagged (`lifting_hint`: NOT RATED until tagged lifting or not-lifting). The checks
        follow `lifting` alone."""
        return self.lifting or bool(self.lifting_hint)

    @property
    def ei(self) -> float:
        """E times the I that gives the vertical deflection (for an angle that is not
        restrained, about its principal axes: see `sections.bending_ix`)."""
        from shopbeam.members.sections import bending_ix

        return self.material.e * bending_ix(self.section, self.restrained)

    def self_weight_load(self) -> Load | None:
        if not self.self_weight:
            return None
        w = self.section.self_weight_mass(self.material.density) * units.G0
        return Load("uniform", start=0.0, end=self.length, w1=-w, label="self-weight",
                    case="dead", key="beam.self_weight")

    def member_loads(self, live_factor: float = 1.0, dead_factor: float = 1.0) -> tuple[Load, ...]:
        """The loads one member carries: its share of the entered loads plus its own weight."""
        share = 1.0 / self.members
        dead_factor *= self.dead_factor
        out = []
        for ld in self.loads:
            k = share * (live_factor if ld.case == "live" else dead_factor)
            out.append(ld.scaled(k) if k != 1.0 else ld)
        sw = self.self_weight_load()
        if sw is not None:
            out.append(sw.scaled(dead_factor) if dead_factor != 1.0 else sw)
        return tuple(out)

    def member_moving(self) -> tuple[WheelSet, ...]:
        """The wheel sets as one member carries them: its share of each wheel load."""
        share = 1.0 / self.members
        return tuple(replace(w, live=tuple(x * share for x in w.live),
                             dead=tuple(x * share * self.dead_factor for x in w.dead))
                     for w in self.moving)

    def beam(self, live_factor: float = 1.0, dead_factor: float = 1.0) -> Beam:
        return Beam(self.length, self.ei, self.supports,
                    self.member_loads(live_factor, dead_factor))

    def with_changes(self, **kw) -> "Job":
        return replace(self, **kw)


# ------------------------------------------------------------------ line locator
_HEADER = re.compile(r"^\s*(\[\[?)\s*([A-Za-z0-9_.\-\" ]+?)\s*\]\]?\s*(#.*)?$")
_KEYLINE = re.compile(r"^\s*([A-Za-z0-9_\-]+|\"[^\"]*\")\s*=")


def toml_lines(text: str) -> list[str]:
    """The lines of a job file as TOML counts them: only LF (or CR LF) ends one (a U+2028,
    form feed or NEL inside a string is a character; str.splitlines would end a line there
    and name the wrong line in a message)."""
    return [ln[:-1] if ln.endswith("\r") else ln for ln in text.split("\n")]


def key_lines(text: str) -> dict[str, int]:
    """Map key paths (``beam.length``, ``loads[2].at``, ``loads[2]``) to 1-based lines."""
    lines: dict[str, int] = {}
    counts: dict[str, int] = {}
    table = ""
    for n, raw in enumerate(toml_lines(text), start=1):
        m = _HEADER.match(raw)
        if m and not _KEYLINE.match(raw):
            name = m.group(2).replace('"', "").replace(" ", "")
            if m.group(1) == "[[":
                idx = counts.get(name, 0)
                counts[name] = idx + 1
                table = f"{name}[{idx}]"
            else:
                parts = name.split(".")
                # a sub-table of the latest array entry, e.g. [loads.extra]
                if parts[0] in counts:
                    parts[0] = f"{parts[0]}[{counts[parts[0]] - 1}]"
                table = ".".join(parts)
            lines.setdefault(table, n)
            continue
        m = _KEYLINE.match(raw)
        if m:
            key = m.group(1).strip('"')
            path = f"{table}.{key}" if table else key
            lines.setdefault(path, n)
    return lines


# ------------------------------------------------------------------ reading
def _lower_case_hint(name: str, value, options) -> str:
    """"; write it in lower case: name = "dead"" where `value` is one of `options` but for
    its capitals ("Dead"), else "" (the job file's words are exact)."""
    if isinstance(value, str) and value.strip().lower() in options and value not in options:
        return f"; write it in lower case: {name} = \"{value.strip().lower()}\""
    return ""


def _ordinal(i: int) -> str:
    n = i + 1
    suffix = "th" if 10 <= n % 100 <= 20 else {1: "st", 2: "nd", 3: "rd"}.get(n % 10, "th")
    return f"{n}{suffix}"


_BARE_FT_IN = re.compile(r'\(e\.g\. "([^"]+) ft" or "\1 in"\)')


def _si_example(m) -> str:
    """An SI job's bare length read both ways: "2400 mm" or "2.4 m"."""
    try:
        metres = f'"{float(m.group(1)) / 1000:g} m"'
    except ValueError:
        metres = f'"{m.group(1)} m"'
    return f'(e.g. "{m.group(1)} mm" or {metres})'


class _Reader:
    """Collects every problem while reading one job."""

    def __init__(self, filename: str, text: str | None):
        self.file = filename
        self.lines = key_lines(text) if text else {}
        self.problems: list[Problem] = []
        self.system = "us"  # the job's units, for the figures quoted in messages
        self.cuts: list[str] = []  # keys that say the member is notched, coped or holed
        self.factors: list[str] = []  # keys that read like a safety factor shopbeam ignores
        self.holds: list[str] = []  # why no rating may be posted, each said in a warning too
        self.widths: dict[str, float] = {}  # tributary width (m) of each load given per area

    def hold(self, message: str, key: str, reason: str):
        """Warn, and withhold the rating for `reason` (capacity.rating_gaps lists it)."""
        self.warn(message, key)
        self.holds.append(reason)

    def line_for(self, key: str) -> int | None:
        k = key
        while k:
            if k in self.lines:
                return self.lines[k]
            if f"{k}[0]" in self.lines:  # a [[table]] named as a whole: its first header
                return self.lines[f"{k}[0]"]
            if k.endswith("]"):
                k = k[: k.rfind("[")]
            elif "." in k:
                k = k.rsplit(".", 1)[0]
            else:
                k = ""
        return None

    def error(self, message: str, key: str = ""):
        self.problems.append(Problem(message, key, self.file, self.line_for(key)))

    def warn(self, message: str, key: str = ""):
        self.problems.append(Problem(message, key, self.file, self.line_for(key), warning=True))

    def take(self, exc: InputError, key: str = ""):
        for p in [exc.problem] + list(getattr(exc, "more", ())):
            k = p.key or key
            self.problems.append(Problem(p.message, k, self.file, self.line_for(k)))

    def parse(self, table: dict, name: str, kind: str, key: str, required=True, **kw):
        if name not in table:
            if required:
                self.error(f"missing {name!r} ({units.KINDS[kind][1]}, e.g. {units.KINDS[kind][2]})", key)
            return None
        try:
            value = units.parse(table[name], kind, key, **kw)
        except InputError as e:
            if self.system == "si" and kind == "length" and type(e) is InputError \
                    and _BARE_FT_IN.search(e.problem.message):  # an SI job's lengths: mm, m
                e = InputError(_BARE_FT_IN.sub(_si_example, e.problem.message), e.problem.key)
            self.take(e, key)
            return None
        self.ton(table[name], key)
        self.thousands_point(table[name], kind, key)
        return value

    _POINT_THOUSANDS = re.compile(r"^\s*([-+\u2212]?)(\d{1,3})\.(\d{3})\s*([^\d\s.,].*)$")

    def thousands_point(self, raw, kind: str, key: str) -> None:
        """A force or mass in a small unit written "-1.500 lbf" with a European thousands
        point: read as 1.5, and a load a thousand times too small passes every check. Said,
        with both readings (a comma, "1,500", is refused for the same doubt); a larger unit
        ("0.250 kip", "1.250 kN") is written to three places as a matter of course."""
        m = self._POINT_THOUSANDS.match(raw) if isinstance(raw, str) else None
        small = re.match(r"(?:lbf?s?|pounds?|n|newtons?|kgf?|kilograms?|lb/ft|lbf/ft|plf|"
                         r"lbf?/in|pli|n/m|n/mm|psf|lbf/ft\^?2|lb/ft\^?2|kg/m|n/m\^?2|pa|"
                         r"lbf?[*\- ·]?(?:ft|in)|(?:ft|in)[*\- ·]?lbf?s?|n[*\- ·]?m|"
                         r"n[*\- ·]?mm)$", m.group(4).strip(), re.I) if m else None
        if m and kind in ("force", "line_load", "area_load", "moment") and small \
                and m.group(2) != "0":
            sign, a, b, unit = m.group(1), m.group(2), m.group(3), m.group(4).strip()
            sign = "-" if sign == "\u2212" else sign
            self.warn(f"{raw.strip()!r} is read as {sign}{float(a + '.' + b):g} {unit} (a "
                      f"decimal point); if {sign}{a}{b} {unit} was meant (a point between "
                      f"thousands), write \"{sign}{a}{b} {unit}\"", key)

    def ton(self, raw, key: str) -> None:
        """Warn that "ton" is the US short ton (a metric job's "1 ton" is usually a tonne)."""
        note = units.ton_note(raw)
        if note:
            self.warn(note, key)

    # Typed readers: each returns the value (or `default` / None after recording a problem).
    def boolean(self, table: dict, name: str, key: str, default: bool, message: str = "") -> bool:
        v = table.get(name, default)
        if isinstance(v, bool):
            return v
        self.error(message or f"{name} must be true or false", key)
        return default

    def choice(self, table: dict, name: str, key: str, allowed: type[StrEnum], default):
        """A value of a closed set (case and surrounding spaces ignored)."""
        if name not in table:
            return default
        v = table[name]
        try:
            # ("first yield", "First_Yield": the value's words as the set writes them)
            return allowed(re.sub(r"[\s_]+", "-", str(v).strip().lower())) \
                if isinstance(v, str) else allowed(None)
        except ValueError:
            self.error(f"{name} {v!r} is not one of the allowed values: "
                       + ", ".join(f'"{a.value}"' for a in allowed), key)
            return default

    def fraction(self, table: dict, name: str, key: str, lo: float = 0.0, hi: float = 2.0):
        """A fraction written 0.15 or "15%" (None when not written or not readable)."""
        if name not in table:
            return None
        raw = table[name]
        v = None
        if isinstance(raw, (int, float)) and not isinstance(raw, bool):
            v = float(raw)
        elif isinstance(raw, str) and raw.strip().endswith("%"):
            try:
                v = float(raw.strip()[:-1]) / 100
            except ValueError:
                self.error(f"cannot read {raw!r} as a percentage (write \"15%\")", key)
                return None
        if v is None:
            try:
                n = float(str(raw).strip())
            except ValueError:
                n = None
            if n is not None and n > hi:  # "25": a percent with its sign left off
                self.error(f"cannot read {raw!r} (a number in quotes): if {n:g} % is meant, "
                           f"write \"{n:g}%\" (or {name} = {n / 100:g}); a bare number is a "
                           f"fraction ({n:g} would be {n:.0%})", key)
            elif n is not None and n > 1 and name == "impact":  # "1.25": loads x 1.25
                self.error(f"cannot read {raw!r} (a number in quotes): if a factor of {n:g} on "
                           f"the live loads is meant, that is {n - 1:.0%}: write "
                           f"\"{(n - 1) * 100:g}%\" (or impact = {n - 1:g}); impact is the "
                           "allowance added, not the factor", key)
            elif n is not None:  # a number in quotes
                self.error(f"cannot read {raw!r} (a number in quotes): write it without the "
                           f"quotes ({name} = {n:g}, read as {n:.0%}) or with a percent sign "
                           f"(\"{n * 100:g}%\")", key)
            else:
                self.error(f"cannot read {raw!r}: write a fraction such as 0.15 or \"15%\"", key)
            return None
        if not (lo <= v <= hi):
            hint = (f": if {raw:g} % is meant, write \"{raw:g}%\" or {name} = {raw / 100:g} "
                    "(a bare number is a fraction)"
                    if isinstance(raw, (int, float)) and 1 < raw <= 100 * hi else
                    f"; write a fraction such as 0.25 or \"25%\"")
            self.error(f"{raw!r} is outside {lo:.0%} to {hi:.0%}{hint}", key)
            return None
        return v

    def quantities(self, table: dict, name: str, kind: str, key: str, empty_ok: bool = False,
                   **kw) -> tuple[float, ...] | None:
        """A list of values with units (one bare string is a list of one)."""
        v = table.get(name, [])
        if isinstance(v, str):
            v = [v]
        if not isinstance(v, list) or (not v and not empty_ok):
            self.error(f"{name} must be a list of {units.KINDS[kind][1]}s, e.g. "
                       f"[{units.KINDS[kind][2].split(' or ')[0]}]", key)
            return None
        out = [self.parse({name: x}, name, kind, f"{key}[{i}]", **kw) for i, x in enumerate(v)]
        return None if any(x is None for x in out) else tuple(out)

    def unknown_keys(self, table: dict, known: set[str], prefix: str, label: str):
        here = re.sub(r"\[\d+\]$", "", prefix)
        for k in table:
            if k in known:
                continue
            if _FACTOR_KEY.match(str(k)) or (str(k) == "safety_factor" and prefix != "criteria"):
                path = f"{prefix}.{k}" if prefix else k
                if str(k) == "safety_factor" and table[k] == 1.67:  # the default: no change
                    self.warn(f"safety_factor in {label} belongs under [criteria]; written here "
                              "it is not read, and as 1.67 is the default nothing changes: move "
                              "it or remove it", path)
                    continue
                self.factors.append(path)
                where = "" if prefix == "criteria" else " under [criteria]"
                said = (f"safety_factor in {label} belongs under [criteria]: written here it "
                        "is not read" if str(k) == "safety_factor" else
                        f"{k!r} in {label} reads like a safety factor, and shopbeam does not "
                        "read it")
                self.warn(f"{said}, so the checks would not use it and no rating is posted. "
                          f"The factor key is safety_factor{where} (applied with basis = "
                          "\"first-yield\"; AISC and ADM checks carry their own Omega); write "
                          "it there, or remove this key", path)
                continue
            if _IMPACT_KEY.match(str(k)):
                path = f"{prefix}.{k}" if prefix else k
                lower = _LOWER_KEY.match(str(k))
                meant = ("a lower figure (a derating or margin)" if lower else
                         "more load (an impact or dynamic allowance)")
                self.hold(f"{k!r} in {label} reads like it asks for {meant}, and shopbeam "
                          "does not read it, so no rating is posted. An impact or dynamic "
                          "allowance is [criteria] impact = \"25%\" (a factor of 1.25 is "
                          "25 %), added to the live loads; a margin on strength is "
                          "safety_factor with basis = \"first-yield\". Write the one meant, "
                          "or remove this key", path,
                          f"{path} is not read (an impact, dynamic or derating factor by its "
                          "name), so the figure would leave it out. Write [criteria] impact = "
                          "\"25%\" for an allowance on the live loads, or remove the key")
                continue
            if _MULTIPLIER_KEY.match(str(k)) and here in ("", "beam", "loads", "moving") \
                    and isinstance(table[k], (int, float, str)) \
                    and not isinstance(table[k], bool) and table[k] not in (1, "1"):
                path = f"{prefix}.{k}" if prefix else k
                self.hold(f"{k!r} in {label} reads like a multiplier or a count of the load "
                          f"({table[k]!r}), and shopbeam does not read it: each load is "
                          "checked once, as written, so no rating is posted. Give each load "
                          "as its own [[loads]] table, or write the total in its value (a "
                          "factor on the live loads is [criteria] impact; on strength, "
                          "safety_factor" + ("; several beams sharing the loads: [beam] "
                                             "members = N" if here == "beam" else "")
                          + "); or remove this key", path,
                          f"{path} = {table[k]!r} is not read (a multiplier or count by its "
                          "name), so the figure would leave it out. Write the loads as they "
                          "are, or remove the key")
                continue
            if _CUT_KEY.search(str(k)):
                path = f"{prefix}.{k}" if prefix else k
                self.cuts.append(path)
                self.warn(f"{k!r} in {label} says the member is cut there, and shopbeam does "
                          "not model notches, copes, holes or cut-outs: it checks the full "
                          "section, which the cut weakens (a notch on the tension edge of wood "
                          "at a support cuts its shear strength by (dn/d)^2, NDS 2018 3.4.3.2, "
                          "from memory), so no rating is posted. Have the cut member checked "
                          "(NDS 3.2.3 and 3.4.3 for notched wood, AISC Manual Part 9 for a coped "
                          "end, AISC 360-16 B4.3 and J4 for holes), or remove the key if it is "
                          "not cut", path)
                continue
            if here == "supports" and _SETTLE_KEY.search(str(k)) \
                    and not _NOT_SETTLE_KEY.search(str(k)) \
                    and not getattr(self, "settles_matter", True):
                path = f"{prefix}.{k}" if prefix else k
                self.warn(f"{k!r} in {label} reads as a settlement of the support, which "
                          "shopbeam does not model; on a member held at two points with no "
                          "fixed end a settlement only tilts it (no moment or shear), so the "
                          "checks stand. Remove the key if it is something else", path)
                continue
            if here == "supports" and _SETTLE_KEY.search(str(k)) \
                    and not _NOT_SETTLE_KEY.search(str(k)):
                path = f"{prefix}.{k}" if prefix else k
                self.hold(f"{k!r} in {label} reads as a settlement of the support (it drops "
                          "by a set amount), which shopbeam does not model: in a member "
                          "held at more than two points, or at a fixed end, a support that "
                          "settles adds moment and shear the checks would leave out, so no "
                          "rating is posted. Have the settlement checked, or remove the key "
                          "if the support does not settle (a spring support, type = "
                          "\"spring\" with its stiffness, models one that gives under load)",
                          path, f"{path}: support settlement is not modelled, and in a member "
                          "held at more than two points or at a fixed end it adds moment")
                continue
            table_slip = _table_slip(str(k), table[k], here)
            if table_slip:
                self.error(table_slip, f"{prefix}.{k}" if prefix else str(k))
                continue
            held = _table_holds(str(k), table[k]) if not here else ""
            if held:
                self.hold(held, str(k), held)
                continue
            near = difflib.get_close_matches(k, sorted(known), n=1, cutoff=0.6)
            hint = f"; did you mean {near[0]!r}?" if near else f"; known keys: {', '.join(sorted(known))}"
            homes = _homes(k, here)
            slip = []
            if not homes and here != "criteria" and len(str(k)) >= 5 and not (
                    near and _edits(str(k).lower(), near[0]) <= 2):
                # a limit or factor misspelt AND written outside [criteria] (its header left
                # out, or at the top): held as the key spelt right there is
                slip = [c for c in sorted(KNOWN_KEYS["criteria"])
                        if _edits(str(k).lower(), c) <= 2]
                homes = ["criteria"] if slip else homes
            if homes and not difflib.get_close_matches(k, sorted(known), n=1, cutoff=0.85):
                if homes == [""]:  # a top-level key written below a [table] header
                    hint = (f": {k} belongs at the top of the file, before the first [table] "
                            "(TOML puts a key written below a [table] header inside that "
                            "table); move it up")
                else:
                    hint = f": {k} belongs under " + " or ".join(_TABLES[t] for t in homes)
                if slip:
                    hint = (f": it reads like {slip[0]} of [criteria], misspelt and written "
                            "outside it (a [criteria] header left out?)")
            if here == "loads" and str(k).lower() in ("dead", "live", "dead_load", "permanent"):
                # a load's case said as a key of its own: `case` says it
                word = "live" if str(k).lower() == "live" else "dead"
                hint = (f": a load's case is written case = \"{word}\" (dead loads stay on "
                        "while the live loads are rated)")
            path = f"{prefix}.{k}" if prefix else k
            dead_said = here == "loads" and isinstance(table[k], str) and bool(
                _DEAD_WORDS.search(table[k]) or _DEAD_VALUE.match(table[k].strip()))
            if homes == ["criteria"] and here != "criteria" and not dead_said:
                # a limit or factor written in the wrong table changes the figure unseen
                self.hold(f"unknown key {k!r} in {label} is ignored{hint}; until it is, the "
                          "checks do not use it and no rating is posted", path,
                          f"{path} belongs under [criteria]: written here it is not read, so "
                          "the figure would leave it out. Move it")
                continue
            typo = [c for c in sorted(known) if _edits(str(k).lower(), c) <= 2
                    and c[:1] == str(k)[:1].lower()] if here == "criteria" else []
            if typo and not homes and (len(str(k)) >= 5 or str(k).lower() in known):
                # a misspelt limit or factor ("safety_factr", "deflecton", "IMPACT"): read as
                # written, the checks would run at the default, and a verdict printed on it
                # would be wrong; the key meant is plain (a letter or two off, the same first
                # letter), so it is refused like a misspelt table
                self.error(f"unknown key {k!r} in {label}; did you mean {typo[0]!r}? Every key "
                           "there sets a limit or a factor: misspelt, it is not read and the "
                           f"checks would use the default. Write it as {typo[0]}", path)
                continue
            meant = _lowering_meant(str(k), here, near, homes, table[k], table)
            if meant and here == "loads" and str(k).lower() in ("dead", "dead_load",
                                                                "permanent"):
                meant = "case = \"dead\""
            if meant and here == "beam" and near and difflib.SequenceMatcher(
                    None, str(k).lower(), near[0]).ratio() < 0.8:
                hint = ""  # "treated": not 'braced'; what it reads like is said below
            if meant:
                # a slip of a key that would lower the figure: rated without it, the figure
                # would be too high (an ignored key that raises it only errs on the safe side)
                self.hold(f"unknown key {k!r} in {label} is ignored{hint}; it reads like "
                          f"{meant}, which lowers what the member may carry, so no rating is "
                          "posted until it is written right (or removed)", path,
                          f"{path} is not read and reads like {meant}: the figure would leave "
                          "it out. Write the key right, or remove it")
                continue
            self.warn(f"unknown key {k!r} in {label} is ignored{hint}", path)

    @property
    def errors(self) -> list[Problem]:
        return [p for p in self.problems if not p.warning]


_MAIN_TABLES = ("loads", "supports", "moving", "beam", "criteria")
# Names that mean "the loads" ([[point_loads]], [[loading]]); other names with "load" in them
# may be records ([[load_tests]], [[loading_dock]]): held, not refused (`_table_holds`)
_LOAD_TABLE_NAMES = frozenset({"pointloads", "pointload", "loading", "loadings", "loadcases",
                               "loadcase", "extraloads", "moreloads", "liveloads", "deadloads",
                               "udl", "udls", "uniformloads", "distributedloads",
                               "appliedloads", "forces"})
# An entry's key that gives a force: an unknown table whose entries have one may be loads
_FORCE_KEYS = frozenset({"value", "weight", "load", "force", "mass", "wt"})


def _table_holds(k: str, value) -> str:
    """A table of another name whose entries give a force ([[stock]] with weight = ..., a
    name with "load" in it): they may be loads the job leaves out, or a record of them (load
    tests, a loading dock). Not refused (a record is fine), but no rating rests on loads
    that may be missing. "" when the table gives no force."""
    many = isinstance(value, list) and bool(value) and all(isinstance(x, dict) for x in value)
    rows = value if many else [value] if isinstance(value, dict) else []
    forced = [x for x in rows if _FORCE_KEYS.intersection(str(y).lower() for y in x)]
    if not forced and "load" not in re.sub(r"[\W_]", "", k).lower():
        return ""
    if not rows:
        return ""
    return (f"[[{k}]] is not a table shopbeam reads, and its entries give forces or it is "
            "named for loads: if they bear on this member they are left out of every check, "
            "so no rating is posted. Write them as [[loads]] (type, at, value), or, if it is a "
            "record of something that does not bear on this member (load tests, a loading "
            "dock, a parts list), move it into the notes")


def _table_slip(k: str, value, here: str) -> str:
    """What is wrong with an unknown table that is one of the job's own tables written wrong
    ([[Loads]], [[load]], [Criteria], or [[beam.loads]] inside another table): read as
    unknown, its entries would be left out and the job solved without them (every check
    passing on a beam with no loads), so it is refused, as a slip inside a table is. ""
    when the key is not such a table."""
    many = isinstance(value, list) and bool(value) and all(isinstance(x, dict) for x in value)
    if not (isinstance(value, dict) or many):
        return ""
    if isinstance(value, dict):  # [[more.loads]]: the job's table inside one of another name
        for t in ("loads", "supports", "moving"):
            inner = value.get(t)
            if isinstance(inner, list) and inner and all(isinstance(x, dict) for x in inner):
                name = f"{here + '.' if here else ''}{k}"
                return (f"[[{name}.{t}]] is not a table shopbeam reads (it puts the {t} inside "
                        f"[{name}]), so its {len(inner)} entr{'y' if len(inner) == 1 else 'ies'} "
                        f"would be left out and the job checked without "
                        f"{'it' if len(inner) == 1 else 'them'}. Write [[{t}]]")
    bare = re.sub(r"[\W_]", "", k).lower()
    target = next((t for t in _MAIN_TABLES if bare in (t, t.rstrip("s"), t + "s")), None)
    if target is None:
        near = difflib.get_close_matches(bare, _MAIN_TABLES, n=1, cutoff=0.8)
        target = near[0] if near else None
    if target is None and many and not here:
        # a table of loads or supports under a name of its own ([[point_loads]], [[loading]],
        # [[load_cases]]): read by what its entries hold, or by a name that means them (a
        # record of load tests or a loading dock is not one: `_table_holds` says those)
        kinds = {str(x.get("type", "")).strip().lower() for x in value}
        if kinds & set(LOAD_KINDS) - {"point"} or kinds & {"point"} and \
                any("value" in x for x in value) or bare in _LOAD_TABLE_NAMES:
            target = "loads"
        elif kinds & set(SUPPORT_KINDS) or bare in ("support", "supportpoints", "bearings"):
            target = "supports"
        elif bare in ("wheels", "trolley", "trolleys", "wheelset", "axles"):
            target = "moving"
    if target is None or (here and target not in ("loads", "supports", "moving")):
        return ""
    written = f"[[{here + '.' if here else ''}{k}]]" if many else \
        f"[{here + '.' if here else ''}{k}]"
    right = f"[[{target}]]" if target in ("loads", "supports", "moving") else f"[{target}]"
    what = (f"its {len(value)} entr{'y' if len(value) == 1 else 'ies'} would be left out and "
            f"the job checked without {'it' if len(value) == 1 else 'them'}") if many else \
        "its keys would be left out and the job checked without them"
    where = (f"it puts the {target} inside {_TABLES.get(here, here)}" if here else
             "table names are exact: lower case, as the job-file guide writes them")
    return f"{written} is not a table shopbeam reads ({where}), so {what}. Write {right}"


# An unknown key that says the member is cut (notched, coped, drilled, slotted): a limit state
# shopbeam does not check, so the job is not rated (never "unknown key ignored" alone)
_CUT_KEY = re.compile(r"(?:^|[_\- ])(?:notch(?:es|ed)?|copes?|coped|coping|holes?|cut_?outs?|"
                      r"openings?|slots?|slotted|penetrations?|bored|drilled|drilling)"
                      r"(?:$|[_\- ])", re.IGNORECASE)

# ... unless it names a hanger or rod and no settling ("hanger_drop", "drop_rod", "rod_length":
# how far the member hangs below what holds it, not a settlement)
_NOT_SETTLE_KEY = re.compile(r"^(?:hanger|rod)[_-]?(?:drop|length)$|^drop[_-]?rod$|"
                             r"^(?!.*(?:settl|sink|subsid|sag|drop|displace|move|delta|offset))"
                             r".*(?:hangers?|rods?)", re.IGNORECASE)

# An unknown key of a support that reads like a settlement (a drop of the support given)
_SETTLE_KEY = re.compile(r"(?:^|[_-])(?:settle(?:ment|s|d)?|settling|sinks?|sinking|"
                         r"sink(?:age)?|subsidence|drops?|displacement|movement|sag)(?:[_-]|$)|"
                         r"^(?:support[_-]?)?deflection(?:[_-]\w+)?$|"
                         r"^imposed[_-]?(?:deflection|displacement)$|"
                         r"^prescribed_?\w*|^(?:delta|dy|dz|offset_?(?:down|y))(?:_\w+)?$",
                         re.IGNORECASE)

# An unknown key that reads like a safety factor: one the user meant to apply, ignored, so the
# job is not rated on it (a misplaced safety_factor too)
_FACTOR_KEY = re.compile(r"^(?:sf|fs|fos|nd|omega(?:_b)?|factor_?of_?safety|safety|"
                         r"safety_?margin|design_?factor|load_?factor|safety_?factors?)$",
                         re.IGNORECASE)

# An unknown key that reads like an impact, dynamic or derating factor: the user asked for
# more load (or less strength) than the checks use, so the job is not rated on it
_IMPACT_KEY = re.compile(r"^(?:impact_?(?:factor|allowance|percent|pct)|dynamic(?:_?factor)?|"
                         r"dlf|daf|dynamic_?(?:load_?)?(?:factor|allowance)|overload(?:_?factor)?|"
                         r"live_?load_?factor|service_?factor|derat(?:e|ing)(?:_?factor)?|"
                         r"reduction(?:_?factor)?|margin|shock(?:_?factor)?|g_?factor)$",
                         re.IGNORECASE)
_LOWER_KEY = re.compile(r"^(?:derat|reduction|margin)", re.IGNORECASE)

# An unknown key on a load, the member or the file that reads like a multiplier or a count of
# the load (2 pallets, x 1.6): the load is checked once as written, so not rated on it
_MULTIPLIER_KEY = re.compile(r"^(?:factor|multiplier|mult|multiply|scale(?:_?factor)?|"
                             r"count|qty|quantity|times|copies|repeat(?:s|ed)?|"
                             r"number_?of_?(?:loads|pallets|items|units)|n_?(?:loads|pallets))$",
                             re.IGNORECASE)

# How each table is written, for "belongs under [criteria]" ("" is the top of the file)
_TABLES = {"beam": "[beam]", "supports": "[[supports]]", "loads": "[[loads]]",
           "criteria": "[criteria]", "moving": "[[moving]]", "project": "[project]"}


# Keys that can lower what a member may carry, by table: written wrong and ignored, the
# figure posted would be too high. (Keys that only raise it when given, such as braced,
# repetitive or lug, are left to their warning: ignored, the figure errs on the safe side.)
_LOWERING = {"beam": {"axis", "welded", "wet_service", "temperature", "braces_flange"},
             "supports": {"brace"}, "loads": {"patterned"},
             "moving": {"dead", "wheels_per_axle"},
             # a lost tags key loses the lifting or rack rules; a lost [[loads]] table a load
             "": {"tags", "loads", "moving"}}
_LOWERING_WORDS = (  # whole keys of a table that name one of those, whatever the spelling
    (re.compile(r"^(?:axes|orient(?:ation)?|flat|laid_?flat|on_?edge|edge|plank|"
                r"(?:bending|strong|weak)_?axis|weak)$", re.I), "beam", "axis"),
    (re.compile(r"^(?:welds?|weldment|is_?welded)$", re.I), "beam", "welded"),
    (re.compile(r"^(?:wet|wet_?use|moist(?:ure)?|damp|exposure|service_?condition|"
                r"in_?service|moisture_?content)$", re.I), "beam", "wet_service"),
    (re.compile(r"^(?:temps?|heat|hot|operating_?temp(?:erature)?)$", re.I), "beam",
     "temperature"),
    (re.compile(r"^(?:lateral_?brace|torsion(?:al)?(?:_?brace|_?restraint)?|twist|"
                r"restrain(?:ed|t)?)$", re.I), "supports", "brace"),
    (re.compile(r"^pattern(?:s|ed|_?loads?|_?loading)?$", re.I), "loads", "patterned"),
    (re.compile(r"^(?:crit|limits?$|checks?$|design|settings?$)", re.I), "", "criteria"))
# [criteria] keys that are only words (a note, a name): warned, not held
_CRITERIA_WORDS_ONLY = re.compile(r"^(?:notes?|comments?|remarks?|description|by|checked_?by|"
                                  r"references?|sources?|standard|code|"
                                  # a record of who and when ([project] keys and their kin):
                                  # no limit or factor
                                  r"refs?|date|checked|reviewed(?:_?by)?|reviewer|approved"
                                  r"(?:_?by)?|prepared(?:_?by)?|designed_?by|drawn_?by|"
                                  r"revision|rev|engineer|shop|job|client|location)$", re.I)


_BOOL_KEYS = frozenset({"welded", "patterned", "brace", "wet_service"})
# a load's case written under another key ("cas", "load_case"), with a value that says dead
_CASE_KEY = re.compile(r"^(?:cas|cse|csae|caes|case?s|load_?cases?|loadcase|case_?type|"
                       r"load_?type|load_?kind|kind|category|dead_?or_?live)$", re.IGNORECASE)
# words in a load's text that say the load is dead ("dead load, stays on", "(dead)")
_DEAD_WORDS = re.compile(r"(?<![\w-])(?:dead(?:[ _-]?load)?|self[ _-]?weight|permanent(?: load)?)"
                         r"(?![\w-])(?! ?end)", re.IGNORECASE)
_DEAD_VALUE = re.compile(r"^\s*(?:dead|d|dl|permanent|dead[ _-]?load|permanent[ _-]?load|"
                         r"self[ _-]?weight|fixed|static)\s*$", re.IGNORECASE)


def _lifting_typo(tag) -> bool:
    """Whether a tag is 'lifting' mistyped: a letter off, two neighbours swapped, or split by
    a dash or space (never 'lifting' itself, nor another word two letters off)."""
    t = re.sub(r"[\W_]", "", str(tag)).lower()
    if t == "lifting":
        return str(tag).strip().lower() != "lifting"
    d = _edits(t, "lifting")
    return d == 1 or (d == 2 and sorted(t) == sorted("lifting"))


def _edits(a: str, b: str) -> int:
    """The fewest letters added, dropped or changed that turn `a` into `b` (a typing slip is
    one or two: "safety_factr", "deflecton"; "min_safety_factor" is another key)."""
    row = list(range(len(b) + 1))
    for i, ca in enumerate(a, 1):
        prev, row[0] = row[0], i
        for j, cb in enumerate(b, 1):
            prev, row[j] = row[j], min(row[j] + 1, row[j - 1] + 1, prev + (ca != cb))
    return row[-1]


def _lowering_meant(key: str, here: str, near: list[str], homes: list[str], value=None,
                    row=None) -> str:
    """What an unknown `key` in table `here` reads like when that is a key that lowers the
    figure (see `_LOWERING`), in words, or "". Every unknown key of [criteria] does: each
    key there sets a limit or a factor."""
    for table in [here, *homes]:
        for k in _LOWERING.get(table, ()):
            # a near miss close enough to be that key (not "base" for brace)
            close = table == here and near and near[0] == k and \
                (len(key) >= 5 or table == "") and \
                difflib.SequenceMatcher(None, key.lower(), k).ratio() >= 0.8
            if k in _BOOL_KEYS and not isinstance(value, bool):
                continue  # welder = "Ana" is a record, not welded = true
            if key.lower() == k or close:
                where = _TABLES.get(table, "the top of the file" if table == "" else
                                    "[" + table + "]")
                return f"{k} of {where}"
    if here == "criteria" and not _CRITERIA_WORDS_ONLY.match(key):
        return "a limit or factor of [criteria]"
    said_dead = (isinstance(value, str) and (_DEAD_VALUE.match(value.strip().rstrip(".!"))
                                             or _DEAD_WORDS.search(value))) \
        or (key.lower() == "live" and value is False) \
        or (key.lower() in ("dead", "dead_load", "permanent", "is_dead") and value is True)
    if here == "loads" and said_dead and not (_is_table(row) and row.get("case") == "dead"):
        # any key of a load that says it is dead, but not `case`: the dead load would be
        # counted as live and rated up with the others (a `case = "dead"` beside it says so)
        return "case = \"dead\" of [[loads]] (a dead load stays on; read as live it is rated " \
               "up with the others)"
    for words, table, k in _LOWERING_WORDS:
        if words.search(key) and (table == here or k == "criteria"):
            return ("the [criteria] table (a limit or factor)" if k == "criteria" else
                    f"{k} of {_TABLES.get(table, '[' + table + ']')}")
    slip = near[0] if near and difflib.SequenceMatcher(
        None, key.lower(), near[0]).ratio() >= 0.8 else ""
    if slip in _BOOL_KEYS and not isinstance(value, bool):
        slip = ""  # welder = "Ana" is a record, not welded = true
    if here == "beam" and slip and slip not in _RAISING_BEAM_KEYS:
        # a slip of a known key that can lower the figure ("axs" for axis, "bearng" for
        # bearing), however short
        return f"{slip} of [beam]"
    if here == "beam" and not _WORDS_ONLY.match(key) and not homes and not slip:
        # every key of [beam] says what the member is (its grade, size, condition): one that
        # is not read may be one that lowers its strength (a slip of a key that only raises
        # the figure when given, or a key of another table, says what it is: warned)
        return next((what for words, what in _BEAM_MEANT if words.search(key)),
                    "a property of the member (its grade, size or condition)")
    return ""


# [beam] keys that only raise the figure when given: a slip of one (ignored, so left out)
# errs on the safe side, and is warned
_RAISING_BEAM_KEYS = frozenset({"self_weight", "braced", "braces", "repetitive", "restrained",
                                "members", "levels"})
# Keys that are only words (a note, a name, a record): warned, not held
_WORDS_ONLY = re.compile(r"^(?:notes?|comments?|remarks?|description|desc|by|checked_?by|"
                         r"references?|refs?|sources?|standard|code|labels?|names?|ids?|"
                         r"marks?|part(?:_?(?:no|number))?|item|drawing|dwg|job|po|customer|"
                         r"colou?r|finish|paint\w*|primer|coating|galv\w*|hot_?dip\w*|"
                         r"vendor|supplier|location|titles?|heat_?(?:no|num|number)|"
                         r"photos?|images?|pictures?|templates?|welders?|wps|"
                         r"weld_?(?:procedure|spec|wps)|dates?|revisions?|rev|inspect\w*|"
                         r"(?:approved|drawn|made|welded)_?by|owner|project|bay|room|"
                         r"serial\w*|po_?\w*|mill_?certs?|certs?|"
                         r"\w+_(?:notes?|no|num|number|date|by|certs?|ids?|names?|refs?)|"
                         r"date_\w+|prices?|costs?|installed\w*|\w*inspected\w*|"
                         r"purchased\w*|bought\w*|ordered\w*|(?:last|next)_\w+)$", re.I)
# What an unknown [beam] key reads like, and where it is written in a job
_BEAM_MEANT = (
    (re.compile(r"^(?:c[mtifdlrv]|cfu|kcr|cm_?\w*|ct_?\w*)$", re.I),
     "an NDS 2018 adjustment factor (shopbeam sets CM from wet_service, Ct from temperature, "
     "CD from duration under [criteria], and the others from the member's size and use; it "
     "takes no factor typed in)"),
    (re.compile(r"(?:treat|retard|frt|^pt$|preserv|incis|cca|acq)", re.I),
     "a lumber treatment (fire-retardant or preservative treatment lowers wood strength by the "
     "treater's factors, NDS 2018 2.3.4, and incising by Ci, NDS 4.3.8, from memory; shopbeam "
     "does not apply them: have the member rated with them)"),
    (re.compile(r"(?:grade|species|^f[yu]$|yield|tensile|strength|^spec|astm|alloy|temper)", re.I),
     "the member's grade or strength (written in material: a grade key such as \"A500-B\" or "
     "\"HF-2\", or [beam.material] with its figures)"),
    (re.compile(r"(?:wall|thick|^t$|depth|width|height|size|^od$|^id$|diam|gauge|gage)", re.I),
     "the member's size (written in section: a catalog size, or [beam.section] with its "
     "dimensions)"),
    (re.compile(r"(?:outdoor|outside|exterior|service|condition|green|expos|weather|climate|"
                r"environment|moist|wet)", re.I),
     "wet_service of [beam] for wood (wet service takes CM, NDS 2018 Supplement Table 4A), or "
     "on metal a condition shopbeam does not model (corrosion or damage: rate it with the "
     "sizes measured)"),
)


def _homes(key: str, here: str) -> list[str]:
    """The tables other than `here` that know `key` ([""] for a top-level key): an unknown
    key that is a known key of another table was written in the wrong one."""
    if key in KNOWN_KEYS[""] and key not in _TABLES and here != "":
        return [""]
    return [t for t in _TABLES if t != here and key in KNOWN_KEYS[t]]


def _is_table(v) -> bool:
    return isinstance(v, dict)


def _read_criteria(r: _Reader, crit, lifting: bool, material) -> Criteria:
    """[criteria]: the deflection rule (presets resolved), safety factor, basis, impact."""
    if not _is_table(crit):
        r.error("criteria must be a table ([criteria])", "criteria")
        crit = {}
    r.unknown_keys(crit, KNOWN_KEYS["criteria"], "criteria", "[criteria]")
    text, ratio, absolute, preset = "L/240", DEFAULT_DEFLECTION_RATIO, None, ""
    given = "deflection" in crit
    if given:
        text, ratio, absolute, preset = _deflection_criterion(crit["deflection"], r)
    elif lifting:
        ratio = LIFTING_DEFAULT_RATIO
    sf = crit.get("safety_factor", 1.67)
    if isinstance(sf, bool) or not isinstance(sf, (int, float)) or not math.isfinite(sf) or sf <= 0:
        r.error(f"safety_factor must be a positive number such as 1.67, found {units.as_typed(sf)}",
                "criteria.safety_factor")
        sf = 1.67
    elif sf < 1:
        # a factor below 1 lets the stress pass yield: no shop check means that (a divisor
        # typed as a multiplier, 0.6 for 1 / 0.6, is the usual slip), so it is refused
        r.error(f"safety_factor {sf:g} is below 1, so the check would allow more than the "
                f"yield strength; a safety factor divides yield (Fy / SF): write 1.67 (AISC "
                f"ASD) or more" + (f", e.g. {1 / sf:.3g} if {sf:g} was meant as a fraction "
                                   "of yield" if 1 / sf >= 1.5 else ""),
                "criteria.safety_factor")
        sf = 1.67
    elif sf > 10:
        # a dropped decimal point (167 for 1.67, 100 for 1.00): no member check means that
        r.error(f"safety_factor {sf:g} is far above any member check's (AISC ASD 1.67, ASME "
                f"BTH-1 2 to 3, rigging 5): most likely a slipped decimal point"
                + (f" ({sf / 100:g}?)" if sf >= 100 else "") + "; write the factor meant, "
                "up to 10", "criteria.safety_factor")
        sf = 1.67
    elif sf > 5:
        r.warn(f"safety_factor {sf:g} is more than members are usually checked with (AISC ASD "
               "1.67, ASME BTH-1 2 to 3): it is used as written; check it is the factor meant",
               "criteria.safety_factor")
    basis = r.choice(crit, "basis", "criteria.basis", Basis, Basis.AUTO)
    unused = ""
    if "safety_factor" in crit and sf != 1.67:
        unused = _safety_factor_words(r, sf, material, basis)
    if "safety_factor" in crit and 1 <= sf < MIN_POSTED_FACTOR and (
            basis == Basis.FIRST_YIELD or getattr(material, "kind", "custom") == "custom"):
        unused = (f"safety_factor = {sf:g} leaves {'no' if sf == 1 else 'too little'} margin "
                  f"on first yield for a posted load (AISC ASD takes 1.67; under "
                  f"{MIN_POSTED_FACTOR:g} nothing is posted)")
        r.warn(f"{unused}: the checks use it, but no rating is posted; write 1.67 (or your "
               "shop's factor) to rate the member", "criteria.safety_factor")
    kind = getattr(material, "kind", "")
    if (kind == "lumber" and basis != Basis.AUTO) or (kind == "aluminum" and basis == Basis.ASD):
        own = "the NDS allowable stresses" if kind == "lumber" else \
            "the Aluminum Design Manual (or write basis = \"first-yield\")"
        r.warn(f"basis = \"{basis.value}\" does not apply to {kind}: this member is checked by "
               f"{own}; remove basis", "criteria.basis")
    impact = r.fraction(crit, "impact", "criteria.impact")
    raw = crit.get("impact")
    if impact is not None and 0 < impact < 0.01 and isinstance(raw, str):
        # "0.25%" for 25 %: an allowance under 1 % is none a shop means
        r.hold(f"impact = {raw!r} is read as {impact * 100:g} % ({impact:g} of the live load), "
               f"which changes almost nothing; if you meant {impact * 1e4:g} %, write "
               f"\"{impact * 1e4:g}%\" (or {impact * 100:g}); the checks use the value "
               "written, and no rating is posted on it", "criteria.impact",
               f"impact = {raw!r} is {impact * 100:g} %: if {impact * 1e4:g} % was meant, "
               f"write \"{impact * 1e4:g}%\"")
    if impact is not None and impact >= 1 and not isinstance(raw, str):
        # a multiplier typed for the allowance: 1.25 for "loads x 1.25" is 125 % added
        r.warn(f"impact = {raw:g} is read as {impact:.0%} added to the live loads (each live "
               f"load x {1 + impact:g}); an impact allowance is the part added: write "
               f"{impact - 1:g} (or \"{(impact - 1) * 100:g}%\") for loads x {impact:g}, or "
               f"\"{impact * 100:g}%\" if you do mean {impact:.0%}", "criteria.impact")
    live = named_live = LIVE_DEFLECTION_PRESETS.get(preset)
    ld = crit.get("live_deflection")
    if ld is not None:
        m = re.fullmatch(r"\s*[Ll]\s*/\s*(\d+(?:\.\d+)?)\s*", ld) if isinstance(ld, str) else None
        if m and float(m.group(1)) > 0:
            live = float(m.group(1))
        else:
            r.error(f"live_deflection must be a limit like \"L/360\" (checked under the live "
                    f"loads alone), found {units.as_typed(ld)}", "criteria.live_deflection")
    if named_live and live and live < named_live:
        # the limit given twice, the key looser than the named one: the stricter stands
        r.warn(f"live_deflection = {ld!r} is looser than the L/{named_live:g} under live load "
               f"that deflection = \"{preset}\" carries (IBC 2018 Table 1604.3, from memory): "
               f"the stricter, L/{named_live:g}, is checked. To set both limits yourself, write "
               "deflection as a limit (\"L/240\") beside live_deflection",
               "criteria.live_deflection")
        live = named_live
    if ld is not None and live and ratio and not absolute and live < ratio:
        r.warn(f"live_deflection = {ld!r} is looser than deflection = \"L/{ratio:g}\" on the "
               "total load: under gravity loads the live load alone deflects less than the "
               f"total, so it changes nothing. A live-load limit is the stricter one (floors: L/360 live, "
               "L/240 total, IBC Table 1604.3, from memory): swap them, or remove "
               "live_deflection", "criteria.live_deflection")
    lift, cat = "", ""
    if "lifting" in crit:
        raw = crit["lifting"]
        lift = raw.strip().lower() if isinstance(raw, str) else ""
        if lift not in LIFTING_PROFILES:
            r.error(f"lifting {raw!r} is not a lifting profile; use one of "
                    + ", ".join(f'"{n}"' for n in LIFTING_PROFILES), "criteria.lifting")
            lift = ""
    if "category" in crit:
        raw = crit["category"]
        cat = raw.strip().upper() if isinstance(raw, str) else ""
        if cat not in ("A", "B"):
            r.error(f"category {raw!r}: the ASME BTH-1 design category is \"A\" or \"B\"",
                    "criteria.category")
            cat = ""
        elif lift != "below-the-hook" and not ("lifting" in crit and not lift):
            # (not said beside a refused profile: its own message says what to write)
            r.warn("category is the ASME BTH-1 design category of a below-the-hook lifting "
                   "beam; it is used only with lifting = \"below-the-hook\"",
                   "criteria.category")
    if lift and not given:
        ratio = LIFTING_PROFILES[lift]["deflection"]
    # an impact below the device's is held, not only warned: the label posts the hook load,
    # and a hook load typed with its impact already in it under impact = "0%" had been posted
    # 15 % over a powered jib's figure
    if not lift and lifting and impact is not None and impact < 0.25:
        # (10 % is what ASCE 7-16 4.9.3 gives a pendant-operated bridge crane, from memory: a
        # device no profile here rates; the label would post the hook load over the 25 %
        # figure of the profile the tag picks, so it is held, not only warned)
        r.hold(f"impact {impact:.3g} ({impact * 100:.3g}%) is below the 25% of a powered "
               "monorail or jib (ASCE 7-16 4.9.3), the profile tags = [\"lifting\"] picks, so "
               "no rating is posted. Remove impact (the profile's is used; give the hook load "
               "itself, without impact), or name the device with [criteria] lifting = "
               "\"hand-geared-monorail\" or \"hand-geared-jib\" (0%) if that is what it is "
               "(a pendant-operated bridge crane's 10% is for a device shopbeam has no "
               "profile to rate)",
               "criteria.impact",
               f"impact {impact * 100:.3g}% is below the 25% of a powered monorail or jib "
               "(ASCE 7-16 4.9.3). Remove it, or name a hand-geared profile")
    if lift and impact is not None and impact < LIFTING_PROFILES[lift]["impact"]:
        need = LIFTING_PROFILES[lift]["impact"]
        r.hold(f"impact {impact * 100:.3g}% is below the {need:.0%} of the {lift} profile "
               f"({LIFTING_PROFILES[lift]['impact_source']}), so no rating is posted. Remove "
               "impact (the profile's is used; give the hook load itself, without impact), or "
               "name the profile the device is", "criteria.impact",
               f"impact {impact * 100:.3g}% is below the {need:.0%} of the {lift} profile "
               f"({LIFTING_PROFILES[lift]['impact_source']}). Remove it")
    fat_cat, cycles = _read_fatigue(r, crit)
    return Criteria(text, ratio, absolute, float(sf), basis, impact, preset, given,
                    live_deflection_ratio=live, lifting=lift, category=cat,
                    factor_gap=unused, fatigue_category=fat_cat, cycles=cycles)


def _read_fatigue(r: _Reader, crit: dict) -> tuple[str, float | None]:
    """[criteria] fatigue_category and cycles (AISC 360-16 Appendix 3): both or neither."""
    cat, n = "", None
    if "fatigue_category" in crit:
        raw = crit["fatigue_category"]
        cat = raw.strip().upper().replace("\u2019", "'") if isinstance(raw, str) else ""
        if cat not in FATIGUE_CATEGORIES:
            r.error(f"fatigue_category {raw!r} is not an AISC 360-16 Table A-3.1 stress "
                    "category; use one of " + ", ".join(f'"{c}"' for c in FATIGUE_CATEGORIES)
                    + " (a plain rolled member A, a fillet-welded attachment usually E)",
                    "criteria.fatigue_category")
            cat = ""
    if "cycles" in crit:
        raw = crit["cycles"]
        try:
            n = float(raw.replace("_", "")) if isinstance(raw, str) else float(raw)
        except (TypeError, ValueError):
            n = None
        if isinstance(raw, bool) or n is None or not math.isfinite(n) or n <= 0:
            r.error(f"cycles {raw!r}: the number of stress-range cycles over the member's life, "
                    "a plain number such as 2000000 or 2e6", "criteria.cycles")
            n = None
    if ("fatigue_category" in crit) != ("cycles" in crit):
        r.error("fatigue is checked with both fatigue_category (the detail's stress category) "
                "and cycles (how many times the load comes and goes over the member's life): "
                "give both", "criteria.fatigue_category" if "cycles" in crit else
                "criteria.cycles")
    return cat, n


# Below L/100 a deflection limit is almost certainly a slip (a dropped zero): the loosest
# limits in common use for members people load are about L/120 to L/150 (IBC 2018 Table 1604.3
# footnotes and common practice; from memory).
LOOSEST_COMMON_RATIO = 100.0


def _deflection_criterion(text, r: _Reader) -> tuple[str, float | None, float | None, str]:
    """(as written, n of L/n, absolute limit, preset name)."""
    key = "criteria.deflection"
    if not isinstance(text, str):
        r.error(f"expected a limit like \"L/240\" or \"0.25 in\", found {units.as_typed(text)}", key)
        return "L/240", DEFAULT_DEFLECTION_RATIO, None, ""
    name = text.strip().lower()
    if name in DEFLECTION_PRESETS:  # named presets such as "rack", "hoist"
        return text, DEFLECTION_PRESETS[name][0], None, name
    m = re.fullmatch(r"\s*[Ll]\s*/\s*(\d+(?:\.\d+)?)\s*", text)
    if m:
        n = float(m.group(1))
        if n <= 0:
            r.error(f"{text!r}: n in L/n must be positive", key)
            return text, None, None, ""
        if n < LOOSEST_COMMON_RATIO:
            r.hold(f"{text!r} allows a deflection of 1/{n:g} of the span, looser than any common "
                   f"limit (L/{LOOSEST_COMMON_RATIO:g} is already loose; racks, shelves and "
                   "floors use L/180 to L/360, hoist beams L/450 and stiffer): did you mean "
                   f"\"L/{n * 10:g}\"? No rating is posted on it; a loose limit meant on "
                   "purpose is written as a length (e.g. \"2 in\")", key,
                   f"the deflection limit {text} is looser than any common limit (likely a "
                   f"dropped zero: L/{n * 10:g}?); a rating would rest on it. Write the limit "
                   "meant, or a loose one meant on purpose as a length (e.g. \"2 in\")")
        return text, n, None, ""
    try:
        return text, None, units.parse(text, "length", key, positive=True), ""
    except InputError:
        r.error(f"cannot read {text!r} as a deflection limit: write \"L/240\" (span over 240), "
                "an absolute limit such as \"0.25 in\", or a preset ("
                + ", ".join(DEFLECTION_PRESETS) + ")", key)
        return text, None, None, ""


def _read_bracing(r: _Reader, beam: dict, length) -> tuple[bool, tuple[float, ...]]:
    """beam.braced and beam.braces (lateral brace points, sorted)."""
    braced = r.boolean(beam, "braced", "beam.braced", False,
                       "braced must be true or false (the top flange or edge braced all along, "
                       "by a deck, boards or sheeting)")
    raw = beam.get("braces", [])
    if not isinstance(raw, list):
        r.error("braces must be a list of positions, e.g. braces = [\"4 ft\", \"8 ft\"]",
                "beam.braces")
        return braced, ()
    pts = []
    for i in range(len(raw)):
        x = _position(r, {"at": raw[i]}, "at", "", length, path=f"beam.braces[{i}]")
        if x is not None:
            pts.append(x)
    if braced and pts:
        r.warn("braces change nothing with braced = true: the member is taken as braced all "
               "along, so no unbraced length is left for them to split. Remove braced = true "
               "if it is held only at the brace points, or remove braces", "beam.braces")
    return braced, tuple(sorted(pts))


def _read_braces_flange(r: _Reader, beam: dict, braces) -> str | None:
    """beam.braces_flange: which flange the brace points hold ("top" or "both")."""
    if "braces_flange" not in beam:
        return None
    got = beam["braces_flange"]
    if got not in ("top", "both"):
        r.error(f"braces_flange must be \"top\" (the braces hold the top flange only: joist "
                f"seats, a deck) or \"both\" (they hold the section against twist: kickers "
                f"to the bottom flange, full-depth connections), not {got!r}"
                + _lower_case_hint("braces_flange", got, ("top", "both")),
                "beam.braces_flange")
        return None
    if not braces:
        r.warn("braces_flange says which flange the brace points hold, and there are no "
               "braces = [...]: it changes nothing", "beam.braces_flange")
    return got


_NUMBER_WORDS = {8: "eight", 12: "twelve", 16: "sixteen"}
# A trolley's wheels counted in all in the job's words ("four-wheel trolley", "4 wheels")
_WHEELS_IN_ALL = re.compile(r"\b(?:four|4)[- ]?wheel(?:s|ed)?\b", re.IGNORECASE)


def _four_per_axle(r: _Reader, raw, moving, title="", notes="") -> None:
    """wheels_per_axle = 4: each load of [[moving]] is one axle, so the set runs on axles x 4
    wheels, and the wheel flange check shares each axle's load over four. A shop counts a
    trolley's wheels in all (four on a common two-axle trolley), so 4 here is an easy slip
    that posts a higher figure: it is said wherever the set has two axles or more, and held
    where the job's words give four wheels in all. (A set of one load is a whole trolley
    travelling as one point: its four wheels are the trolley's, as a point load's wheels = 4.)"""
    if not moving or moving[0].wheels_per_axle != 4 or not isinstance(raw, list) or not raw:
        return
    axles = len(moving[0].live)
    if axles < 2:
        return
    t = raw[0]
    texts = [x for x in (title, notes, t.get("label") if _is_table(t) else "")
             if isinstance(x, str)]
    in_all = re.compile(rf"\b(?:{axles * 4}|{_NUMBER_WORDS.get(axles * 4, '_')})[- ]?wheel",
                        re.IGNORECASE)
    if any(in_all.search(_as_words(x)) for x in texts):
        return  # the words give the wheels in all as axles x 4: what was meant
    m = next((m for m in (_WHEELS_IN_ALL.search(_as_words(x)) for x in (
        title, notes, t.get("label") if _is_table(t) else "") if isinstance(x, str)) if m),
        None)
    msg = (f"wheels_per_axle = 4 counts the wheels on ONE axle (each of the {axles} loads of "
           f"[[moving]] is an axle), so the set runs on {axles} x 4 = {axles * 4} wheels and "
           "each wheel is checked for a quarter of its axle's load; a trolley with four wheels "
           "in all is 2 axles of 2 (wheels_per_axle = 2, the default)")
    if m:
        r.hold(msg + f". The job says {m.group(0)!r}, so no rating is posted: write "
               "wheels_per_axle = 2, or reword if each axle really runs four wheels",
               "moving[0].wheels_per_axle",
               f"wheels_per_axle = 4 ({axles * 4} wheels) against the job's {m.group(0)!r}: "
               "the wheel flange check would share each axle's load over four wheels")
    else:
        r.warn(msg + ". Check it against the trolley", "moving[0].wheels_per_axle")


def _read_moving(r: _Reader, raw, length) -> tuple[WheelSet, ...]:
    """[[moving]]: at most one wheel set at fixed spacing over a travel range."""
    if raw in (None, []):
        return ()
    if not isinstance(raw, list) or not all(_is_table(t) for t in raw):
        r.error("moving loads are [[moving]] tables", "moving")
        return ()
    if len(raw) > 1:
        r.error("only one [[moving]] wheel set per job: put all wheels that travel together in "
                "one table (loads = [...], spacing = [...])", "moving[1]")
        return ()
    t, key = raw[0], "moving[0]"
    allowed = KNOWN_KEYS["moving"]
    for k in t:
        if k not in allowed:  # an error, not a warning: a misspelt dead part would be lost
            near = difflib.get_close_matches(k, sorted(allowed), n=1, cutoff=0.6)
            hint = f" (did you mean {near[0]!r}?)" if near else ""
            r.error(f"unknown key {k!r} in [[moving]]{hint}; keys are "
                    f"{', '.join(sorted(allowed))}", f"{key}.{k}")
    if t.get("case", "live") != "live":
        r.error("a moving load is live; give its dead part (hoist and trolley weight) as "
                "dead = [...]", f"{key}.case")
    label = t.get("label", "moving load")
    if not isinstance(label, str):
        r.error("label must be text in quotes", f"{key}.label")
        label = "moving load"
    if "loads" not in t:
        r.error("a moving load needs loads = [\"-1000 lbf\", ...] (one force per wheel, + up)",
                f"{key}.loads")
        return ()
    live = r.quantities(t, "loads", "force", f"{key}.loads")
    dead = r.quantities(t, "dead", "force", f"{key}.dead") if "dead" in t else ()
    gaps = r.quantities(t, "spacing", "length", f"{key}.spacing", empty_ok=True, positive=True)
    if live is None or dead is None or gaps is None or length is None:
        return ()
    if dead and len(dead) != len(live):
        r.error(f"dead has {len(dead)} value{'s' if len(dead) != 1 else ''} for "
                f"{len(live)} wheels: give one per wheel, in the order of loads (the "
                "trolley's own weight on each wheel, + up)", f"{key}.dead")
        return ()
    if gaps is not None and len(gaps) != len(live) - 1:
        r.error(f"spacing needs {len(live) - 1} value(s) (one between each pair of wheels)",
                f"{key}.spacing")
        return ()
    offsets = [0.0]
    for g in gaps:
        offsets.append(offsets[-1] + g)
    tr = t.get("travel")
    if tr is None:
        travel = (0.0, length)
    else:
        if not (isinstance(tr, list) and len(tr) == 2):
            r.error("travel = [\"start\", \"end\"] (where the wheels may run)", f"{key}.travel")
            return ()
        ends = r.quantities(t, "travel", "length", f"{key}.travel", nonnegative=True)
        if ends is None:
            return ()
        if ends[1] > length * (1 + 1e-9) or ends[1] <= ends[0]:
            got = (f"[{units.fmt(ends[0], 'length', r.system)}, "
                   f"{units.fmt(ends[1], 'length', r.system)}]")
            why = (f"its end is past the end of the beam ({units.fmt(length, 'length', r.system)})"
                   if ends[1] > length * (1 + 1e-9) else "its end is not beyond its start")
            r.error(f"travel {got}: {why}; travel = [\"start\", \"end\"] is where the first "
                    "and last wheel may run, from the left end (0) to at most the beam's "
                    "length", f"{key}.travel")
            return ()
        travel = (ends[0], min(ends[1], length))
    if travel[1] - travel[0] < offsets[-1] - 1e-12:
        r.error("the wheel set is longer than its travel", f"{key}.travel")
        return ()
    per_axle = t.get("wheels_per_axle", 2)
    if isinstance(per_axle, bool) or per_axle not in (1, 2, 4):
        r.error("wheels_per_axle is 1, 2 or 4 (each load is an axle; a monorail trolley runs a "
                "wheel on each side of the web: 2)", f"{key}.wheels_per_axle")
        per_axle = 2
    edge = None
    if "wheel_edge" in t:
        edge = r.parse(t, "wheel_edge", "length", f"{key}.wheel_edge", nonnegative=True)
    contact = None
    if "bearing" in t:
        contact = r.parse(t, "bearing", "length", f"{key}.bearing", positive=True)
    return (WheelSet(label, live, dead or tuple(0.0 for _ in live), tuple(offsets), travel,
                     key, int(per_axle), edge, contact),)


def _apart(x: float, length: float, system: str = "us") -> tuple[str, str]:
    """A position and the length shown with enough digits to differ ("6.000014 ft" past a
    "6 ft" member, not "6 ft" past "6 ft")."""
    for sig in range(4, 13):
        a, b = (units.fmt(x, "length", system, sig=sig),
                units.fmt(length, "length", system, sig=sig))
        if a != b:
            return a, b
    return a, b


def _position(r: _Reader, table: dict, name: str, key: str, length: float | None,
              default: float | None = None, *, path: str | None = None) -> float | None:
    if name not in table and default is not None:
        return default
    path = path if path is not None else f"{key}.{name}"
    x = r.parse(table, name, "length", path, nonnegative=True)
    if x is None:
        return None
    if length is not None and x > length * (1 + 1e-9):
        shown, end = _apart(x, length, r.system)
        typed = table[name] if name in table else ""
        said = f"{typed!r} ({shown})" if isinstance(typed, str) and typed else shown
        r.error(f"{said} is beyond the end of the beam ({end}): positions run from 0 at the "
                "left end", path)
        return None
    return min(x, length) if length is not None else x


# Words a shop writes for a load or support type, and the type they mean
_LOAD_WORDS = {"couple": "moment", "torque": "moment", "distributed": "uniform",
               "udl": "uniform", "line": "uniform", "concentrated": "point",
               "triangular": "linear", "trapezoidal": "linear", "varying": "linear"}
_SUPPORT_WORDS = {"pinned": "pin", "simple": "pin", "clamped": "fixed", "built-in": "fixed",
                  "builtin": "fixed", "rigid": "fixed", "slider": "roller", "sliding": "roller"}


def _type_hint(kind, kinds, words: dict) -> str:
    """" (did you mean 'moment'?)" for a type written another way ("couple", "Point")."""
    low = str(kind).strip().lower()
    if low in ("torque", "torsion", "twist"):  # about the member's axis: not a bending load
        return (" (a torque twists the member about its own axis, and shopbeam takes no "
                "torsion load: a couple in the plane of bending is type = \"moment\"; have a "
                "member under torsion checked)")
    near = ([low] if low in kinds else [words[low]] if low in words
            else difflib.get_close_matches(low, kinds, n=1))
    return f" (did you mean {near[0]!r}?)" if near else ""


def _read_support(r: _Reader, i: int, s, length) -> Support | None:
    key = f"supports[{i}]"
    if not _is_table(s):
        r.error(f"the {_ordinal(i)} support must be a table ([[supports]])", key)
        return None
    r.unknown_keys(s, KNOWN_KEYS["supports"], key, f"the {_ordinal(i)} support")
    kind = s.get("type")
    kinds = SUPPORT_KINDS
    if kind is None:
        r.error(f"missing 'type' (the {_ordinal(i)} support): the support type is one of "
                f"{', '.join(kinds)}, e.g. type = \"pin\"", f"{key}.type")
    elif kind not in kinds:
        hint = _type_hint(kind, kinds, _SUPPORT_WORDS)
        r.error(f"type {kind!r} is not a support type{hint}; use one of {', '.join(kinds)}",
                f"{key}.type")
        kind = None
    at = _position(r, s, "at", key, length)
    stiffness = 0.0
    if kind == "spring":
        stiffness = r.parse(s, "stiffness", "stiffness", f"{key}.stiffness", positive=True)
    elif "stiffness" in s and kind is not None:  # (a type not read has its own error)
        r.warn(f"stiffness is only used by a spring; this {kind} support ignores it", f"{key}.stiffness")
    if "brace" in s and not isinstance(s["brace"], bool):
        r.error("brace must be true or false (true: this support holds the member against "
                "twist and sideways movement)", f"{key}.brace")
    elif s.get("brace") is True and kind == "hinge":
        r.error("a hinge is not a support and cannot brace the member; put a brace point in "
                "beam.braces instead", f"{key}.brace")
    if kind is None or at is None or stiffness is None:
        return None
    brace = s.get("brace") if isinstance(s.get("brace"), bool) else None
    return Support(at, kind, stiffness or 0.0, key, brace)


def _line_load(r: _Reader, ld: dict, raw, key: str, width_needed: list) -> float | None:
    """A load per length, or a load per area times the tributary width."""
    r.ton(raw, key)
    try:
        got = units.parse(raw, "line_load", key)
        r.thousands_point(raw, "line_load", key)
        return got
    except InputError as first:
        try:
            p = units.parse(raw, "area_load", key)
        except InputError:
            r.take(first, key)
            return None
        r.thousands_point(raw, "area_load", key)
        width_needed.append((raw, p))
        return p  # multiplied by the width by the caller


# Loads beyond these (SI) are typing slips, not shop loads, and would overflow the checks:
# 1e9 N is about 100,000 tonnes.
LOAD_LIMITS = {"point": (1e9, "force"), "moment": (1e10, "moment"),
               "uniform": (1e9, "line_load"), "linear": (1e9, "line_load")}


# Words that say a load hangs from trolley wheels or a clamp on the flange tips (a monorail
# hoist, a beam clamp), not from a lug plate under the web
_TROLLEY_WORDS = re.compile(r"\b(monorails?|trolley|trolleys|beam[- ]?clamps?|"
                            r"push[- ]trolley|geared[- ]trolley)\b", re.IGNORECASE)
_LUG_WORDS = re.compile(r"\b(lugs?|pad[- ]?eyes?|lifting eyes?|eye plates?)\b", re.IGNORECASE)
_FLANGE_TIP_WORDS = re.compile(r"\b(monorails?|trolley|trolleys|beam[- ]?clamps?|clamps?|"
                               r"push[- ]trolley|geared[- ]trolley)\b", re.IGNORECASE)


# The title or notes saying the load hangs at a fixed point, welded under the web
_FIXED_PICK_WORDS = re.compile(
    r"\b(?:lugs?|pad[- ]?eyes?|lifting eyes?|eye plates?|(?:plate|tab) welded (?:under|to) "
    r"the web|(?:does ?n[o']t|doesn't|never|will not|won't) (?:travel|move|run)s?"
    r"(?! (?:past|beyond|over|off|further|farther|more))|no trolley|never moves|"
    r"fixed (?:pick|lifting|hoist|hook)(?:ing)? points?|fixed hoist)\b", re.IGNORECASE)
# ...and words that say the hoist does run along (a trolley by another name)
_RUNS_ALONG = re.compile(r"\b(?:carriers?|carriages?|runs? along|travels? along|travell?ing|"
                         r"rolls? along|rolling|moves? along|wheels?|(?:travel|move|run)s? "
                         r"(?:past|beyond|between|up to|as far as|over))\b", re.IGNORECASE)


def _lug_on_a_trolley(r: _Reader, crit_raw, tags, raw_loads, lugs, loads=(), title="",
                      notes="") -> None:
    """lug = true (the load hangs from a lug plate welded under the web: no flange bending
    under trolley wheels) on a job that says the load runs on a trolley or hangs from a clamp
    on the flange tips: a monorail or jib profile or tag (a hoist runs on both), or the label
    of a load at the same place (placed by value: "42 in" and "3 ft 6 in" are one place). The
    flange check under the wheels (CMAA 74, AISC Design Guide 7) would be left out on what
    the job's own words deny, so the rating is held. A label at that place naming the lug
    lets it stand; on a below-the-hook beam a clamp hangs below the lug (a plate or pipe
    clamp), so only a beam clamp or trolley counts there. A profile's word (a simple span has
    only monorail profiles) gives way where the title or notes say the pick point is fixed
    (a lug, a plate welded under the web, "it does not travel") and name no trolley or
    clamp."""
    if not lugs:
        return
    words = " | ".join(_as_words(t) for t in (title, notes) if isinstance(t, str))
    fixed_said = bool(_FIXED_PICK_WORDS.search(words)) and not _FLANGE_TIP_WORDS.search(
        re.sub(r"\bno trolley\b", "", words, flags=re.IGNORECASE)) \
        and not _RUNS_ALONG.search(words)
    profile = crit_raw.get("lifting", "") if isinstance(crit_raw, dict) else ""
    profile = profile if isinstance(profile, str) else ""
    bth = profile == "below-the-hook"
    rows = [ld for ld in raw_loads if _is_table(ld)] if isinstance(raw_loads, list) else []
    where_at = {ld.key: ld.at for ld in loads if ld.kind == "point"}
    for key in lugs:
        i = int(key[6:-1])
        ld = raw_loads[i]
        said = ""
        at = where_at.get(key)
        # (the title or notes may name the rail the trolley runs on elsewhere: only the
        # loads at this place speak for how it hangs)
        texts = [(f"loads[{j}].label", o.get("label")) for j, o in enumerate(raw_loads)
                 if _is_table(o) and (o is ld or (
                     at is not None and where_at.get(f"loads[{j}]") is not None
                     and abs(where_at[f"loads[{j}]"] - at) <= 1e-6))]
        tip_words = _TROLLEY_WORDS if bth else _FLANGE_TIP_WORDS
        for where, text in texts:
            m = tip_words.search(_as_words(text)) if isinstance(text, str) else None
            if m:
                said = f"{where} says {m.group(0)!r}"
                break
        lug_said = any(isinstance(t, str) and _LUG_WORDS.search(_as_words(t)) for _, t in texts)
        runs = [t for t in tags if t in ("monorail", "trolley", "jib")]
        if said or lug_said:
            pass  # the labels at this place say how it hangs: a clamp or trolley, or a lug
        elif fixed_said:
            pass  # the title or notes say it hangs at a fixed point: the profile's word yields
        elif "monorail" in profile or "jib" in profile:
            said = f"[criteria] lifting = {profile!r}"
        elif runs and not bth:
            said = f"the tag {runs[0]!r}"
        if said and rows:
            r.hold(f"lug = true says {key} hangs from a lug plate welded under the web, so "
                   f"the bottom flange is not checked under trolley wheels or clamp jaws, but "
                   f"{said}: a trolley or beam clamp bears on the flange tips, which bend "
                   "under it (often what governs a hoist beam). Remove lug = true (give "
                   "wheels = 2, 4 or 8 for the trolley's wheels or the clamp's jaws), or, if "
                   "the load really hangs from a welded lug (a fixed pick point, no trolley), "
                   "say so in its label (\"hook load, on a welded lug\")",
                   f"{key}.lug",
                   f"{key} has lug = true but {said}: the flange under a trolley or clamp is "
                   "not checked (CMAA 74, AISC Design Guide 7)")


def _twice(r: _Reader, raw_loads) -> None:
    """A [[loads]] table written twice, key for key (pasted twice): both act, doubling the
    load. Warned on the second."""
    seen: dict[str, int] = {}
    for i, ld in enumerate(raw_loads if isinstance(raw_loads, list) else ()):
        if not _is_table(ld):
            continue
        sig = repr(sorted((str(k), repr(v)) for k, v in ld.items()))
        if sig in seen:
            r.warn(f"loads[{i}] is the same as loads[{seen[sig]}], key for key: both act, so "
                   "that load counts twice. Remove one if it was pasted twice, or give each a "
                   "label if the two are meant", f"loads[{i}]")
        else:
            seen[sig] = i


def _bearing_fits(r: _Reader, b, length, system: str, key: str):
    """A bearing length longer than the member is a unit slip ("40 ft" for "4 in"): the
    local checks would spread the force over it and pass anything. Refused."""
    if b is not None and length is not None and b > length:
        r.error(f"bearing {units.fmt(b, 'length', system)} is longer than the member "
                f"({units.fmt(length, 'length', system)}): it is the length of the seat, plate "
                "or wheel contact the force comes through, a few inches (e.g. \"4 in\" or "
                "\"100 mm\"); check the unit", key)
        return None
    return b


# A support or point load is modelled as acting at a point; its bearing length only feeds the
# local checks (web yielding and crippling, wood bearing). Over about a quarter of the span it
# bears on, the point model no longer holds (the span itself is shorter, the force spreads)
# and the local checks would credit a length a unit slip most often gives ("2 ft" for "2 in";
# common practice, no source).
LONG_BEARING = 0.25


def _bearing_room(r: _Reader, length, supports, loads, bearing, bearings: dict,
                  system: str) -> list[str]:
    """Bearing lengths that run past the member, overlap one another, or are longer than
    LONG_BEARING of the span they bear on: warned, and returned (the job is not rated)."""
    if length is None or (bearing is None and not bearings):
        return []
    from shopbeam.engine.solver import SNAP  # the positions the solver takes as one

    tol = SNAP * length
    held = sorted(s.at for s in supports if s.takes_force)
    places = [(s.key, s.at) for s in supports if s.takes_force and s.kind != "fixed"]
    places += [(ld.key, ld.at) for ld in loads if ld.kind == "point"
               and not any(abs(ld.at - h) <= tol for h in held)]  # on a support: warned
    zones = []
    for key, at in places:
        b = bearings.get(key, bearing)
        if not b:
            continue
        if at <= tol:  # at an end, a plate or seat lies on the member
            lo, hi = 0.0, b
        elif at >= length - tol:
            lo, hi = length - b, length
        else:
            lo, hi = at - b / 2, at + b / 2
        zones.append((lo, hi, key, at, b))
    f = lambda x: units.fmt(x, "length", system)  # noqa: E731
    said_key = lambda key: f"{key}.bearing" if key in bearings else "beam.bearing"  # noqa: E731
    slip = ("a bearing is the length of the plate, seat or wheel contact under the force, "
            "inches as a rule, and the local checks credit it, so the job is NOT RATED. Check "
            "the unit (\"2 in\", not \"2 ft\")")
    out: list[str] = []
    seen: set[str] = set()  # one message a bearing

    def say(words: str, key: str, *more: str) -> None:
        if key in seen or seen.intersection(more):
            return
        seen.update((key, *more))
        r.warn(f"{words}: {slip}", said_key(key))
        out.append(f"{words}. Check the unit (\"2 in\", not \"2 ft\")")

    for lo, hi, key, at, b in zones:
        if lo < -tol or hi > length + tol:
            say(f"bearing {f(b)} centred on {key} at {f(at)} runs "
                f"{f(max(-lo, hi - length))} past the end of the member", key)
    zones.sort()
    for (lo1, hi1, k1, at1, _), (lo2, hi2, k2, at2, _) in zip(zones, zones[1:]):
        if abs(at1 - at2) <= tol and abs(lo1 - lo2) <= tol and abs(hi1 - hi2) <= tol:
            continue  # one plate under two loads at one place (a post's live and dead parts)
        if hi1 > lo2 + tol:
            say(f"the bearings of {k1} ({f(lo1)} to {f(hi1)}) and {k2} ({f(lo2)} to "
                f"{f(hi2)}) overlap", k2, k1)
    for lo, hi, key, at, b in zones:
        left = max((h for h in held if h < at - tol), default=None)
        right = min((h for h in held if h > at + tol), default=None)
        if key.startswith("loads"):  # a load: the span it sits in, support to support
            span = (right if right is not None else length) - (left if left is not None
                                                               else 0.0)
            what = f"the {f(span)} span it sits in"
        else:  # a support: the shorter span beside it
            spans = [at - left] if left is not None else []
            spans += [right - at] if right is not None else []
            span = min(spans) if spans else length
            what = f"the {f(span)} span beside it"
        if b > LONG_BEARING * span * (1 + 1e-9):
            say(f"bearing {units.fmt(b, 'small_length', system)} at {key} ({f(at)}) is more "
                f"than {LONG_BEARING:.0%} of "
                f"{what}, too long for a force taken at a point (model a long seat as a "
                "support at each end of it)", key)
    return out


def _knife_edge_on_wood(r: _Reader, material, bearing, bearings: dict) -> None:
    """A bearing length of 0 on wood: steel takes it as a knife edge (the least web
    crippling length, conservative), but wood under a knife edge has no bearing area, so the
    crushing check (NDS 3.10) has nothing to divide by. Refused, with what to write."""
    if getattr(material, "kind", "") != "lumber":
        return
    given = ([("beam.bearing", bearing)] if bearing is not None else []) + [
        (f"{k}.bearing", v) for k, v in bearings.items()]
    for key, b in given:
        if b is not None and b <= 0:
            r.error("bearing 0 on a wood member: the force would bear on no area, so its "
                    "crushing across the grain (NDS 2018 3.10) cannot be checked; give the "
                    "length of the seat, plate or post it bears on (e.g. \"3.5 in\"), or "
                    "leave bearing out for one 2x plate (1-1/2 in)", key)


def _plausible_load(r: _Reader, ld: Load) -> bool:
    limit, kind = LOAD_LIMITS[ld.kind]
    size = abs(ld.value) if ld.kind in ("point", "moment") else max(abs(ld.w1), abs(ld.w2))
    if size <= limit:
        return True
    r.error(f"{units.fmt(size, kind, r.system)} is far beyond any shop load (the limit is "
            f"{units.fmt(limit, kind, r.system)}): check the number and its unit", f"{ld.key}.value")
    return False


def _read_load(r: _Reader, i: int, ld, length, conversions: list) -> Load | None:
    key = f"loads[{i}]"
    where = f"the {_ordinal(i)} load"
    if not _is_table(ld):
        r.error(f"{where} must be a table ([[loads]])", key)
        return None
    r.unknown_keys(ld, KNOWN_KEYS["loads"], key, where)
    kind = ld.get("type")
    kinds = LOAD_KINDS
    if kind is None:
        r.error(f"missing 'type' ({where}): the load type is one of {', '.join(kinds)}, e.g. "
                "type = \"point\"", f"{key}.type")
        return None
    if kind not in kinds:
        hint = _type_hint(kind, kinds, _LOAD_WORDS)
        r.error(f"type {kind!r} is not a load type{hint}; use one of {', '.join(kinds)}", f"{key}.type")
        return None
    case = ld.get("case", "live")
    if case not in ("live", "dead"):
        r.error(f"case {case!r} must be \"live\" or \"dead\"" + _lower_case_hint(
            "case", case, ("live", "dead")), f"{key}.case")
        case = "live"
    label = ld.get("label", "")
    if not isinstance(label, str):
        r.error("label must be text in quotes", f"{key}.label")
        label = ""
    patterned = ld.get("patterned", False)
    if not isinstance(patterned, bool):
        r.error("patterned must be true or false", f"{key}.patterned")
        patterned = False
    if not isinstance(ld.get("uplift", False), bool):
        r.error("uplift must be true or false (true: this load is meant to push up)",
                f"{key}.uplift")
    if label and case != "dead" and _search(_DEAD_WORDS, _as_words(label)):
        r.hold(f"the label {label!r} says this load is dead, but it has no case = \"dead\": it "
               "is counted as live load and rated up with the others, so no rating is posted. "
               "Write case = \"dead\" on it (it then stays on at its value), or change the label",
               f"{key}.label",
               f"{key} is labelled {label!r} but is live: write case = \"dead\" on it, or change "
               "the label")
    common = dict(label=label, case=case, key=key, patterned=patterned)
    if kind != "point" and ld.get("flange") == "bottom":
        r.warn("flange = \"bottom\" is read on point loads only: this spread load is taken as "
               "bearing on the top flange (so is its lateral-torsional buckling). To hang it "
               "below the member, enter it as point loads at its hangers or clamps, each with "
               "flange = \"bottom\"", f"{key}.flange")
    elif kind != "point" and ("bearing" in ld or "flange" in ld):
        r.warn("bearing and flange describe a point load where it meets the member; "
               f"this {kind} load ignores them", f"{key}.{'bearing' if 'bearing' in ld else 'flange'}")
    if not _placement_keys(r, ld, kind, key):
        return None
    if ld.get("flange", "top") not in ("top", "bottom"):
        r.error("flange must be \"top\" (the load bears on the top flange) or \"bottom\" (it "
                "hangs from the bottom flange)" + _lower_case_hint(
                    "flange", ld.get("flange"), ("top", "bottom")), f"{key}.flange")
    if kind in ("point", "moment"):
        at = _position(r, ld, "at", key, length)
        if kind == "point":
            v = r.parse(ld, "value", "force", f"{key}.value")
        else:
            v = r.parse(ld, "value", "moment", f"{key}.value")
        if at is None or v is None:
            return None
        return Load(kind, at=at, value=v, **common)
    start = _position(r, ld, "start", key, length, default=0.0)
    # no end given and no length read: the length's own message says what is wrong (not a
    # "missing 'end'" on a load that runs the whole member)
    end = None if length is None and "end" not in ld else \
        _position(r, ld, "end", key, length, default=length)
    if start is None or end is None:
        return None
    if not end > start:
        r.error(f"end ({units.fmt(end, 'length', r.system)}) must be beyond start "
                f"({units.fmt(start, 'length', r.system)})",
                f"{key}.end")
        return None
    area: list = []
    if kind == "uniform":
        if "total" in ld and "value" in ld:
            r.error("give either value (load per length) or total (the whole load), not both",
                    f"{key}.total")
            return None
        if "total" in ld:
            total = r.parse(ld, "total", "force", f"{key}.total")
            if total is None:
                return None
            w = total / (end - start)
            conversions.append((key, f"total {ld['total']} over {units.fmt(end - start, 'length', r.system)}",
                                w))
        else:
            if isinstance(ld.get("value"), list):
                r.error("a uniform load has one value (a load per length such as \"-25 "
                        "lbf/ft\"); two values, at the start and at the end, are a linear "
                        "load: write type = \"linear\" for them, or give the one value",
                        f"{key}.value")
                return None
            w = _line_load(r, ld, ld.get("value"), f"{key}.value", area) if "value" in ld else None
            if "value" not in ld:
                r.error("missing 'value' (a load per length such as \"-25 lbf/ft\", a load per "
                        "area with a width, or give 'total')", f"{key}.value")
                return None
            if w is None:
                return None
        w1 = w2 = w
    else:
        vals = ld.get("value")
        if not (isinstance(vals, list) and len(vals) == 2):
            r.error("a linear load needs value = [\"start intensity\", \"end intensity\"], "
                    "e.g. [\"0 lbf/ft\", \"-60 lbf/ft\"]", f"{key}.value")
            return None
        w1 = _line_load(r, ld, vals[0], f"{key}.value[0]", area)
        w2 = _line_load(r, ld, vals[1], f"{key}.value[1]", area)
        if w1 is None or w2 is None:
            return None
        if len(area) not in (0, 2):
            r.error("give both intensities per length or both per area", f"{key}.value")
            return None
    if area:
        width = r.parse(_spaced(ld), "width", "length", f"{key}.width", positive=True)
        if "width" not in ld:
            r.problems[-1] = Problem(
                "a load per area needs the tributary width it acts over (width = \"16 in\", "
                "e.g. the spacing of joists)", f"{key}.width", r.file, r.line_for(f"{key}.width"))
        if width is None:
            return None
        w1, w2 = w1 * width, w2 * width
        r.widths[key] = width
        raw = ld["value"] if kind == "uniform" else " to ".join(ld["value"])
        conversions.append((key, f"{raw} x {ld['width']} tributary width", w1 if kind == "uniform" else None))
    elif "width" in ld and r.parse(_spaced(ld), "width", "length", f"{key}.width", positive=True) is None:
        pass  # not a length at all: said as a problem (a stray word is not an ignored width)
    elif "width" in ld:
        # a width beside a load per length is most often a load per area typed per foot
        # ("-12 lbf/ft" for "-12 psf" with its width left in): a dead load read that way is
        # too light, and the rating holds the dead load fixed
        example = '"-12 psf"' if r.system == "us" else '"-0.6 kPa"'
        said = (f"width = {ld['width']!r} is only used with a load per area (psf, kPa), but "
                + ("this total is a force" if "total" in ld else "this value is per length")
                + ", so the width is ignored: if the load was meant per area, write its value "
                f"so ({example}), else remove width")
        if common.get("case") == "dead":
            r.hold(said + "; a dead load read too light posts a higher live load, so no "
                   "rating is posted on it", f"{key}.width",
                   f"{key} is a dead load " + ("given as a total" if "total" in ld else
                                               "per length")
                   + " with a width beside it: per area meant? Write it in "
                   + ("psf" if r.system == "us" else "kPa") + ", or remove width")
        else:
            r.warn(said, f"{key}.width")
    return Load(kind, start=start, end=end, w1=w1, w2=w2, **common)


# Where each load type is placed and sized: a key of another type's would be read and
# silently dropped (a point load's `total`, a uniform load's `at`)
# a tributary width written as joists are spaced: "16 in o.c.", "16\" OC", "24 in on center",
# "400 mm c/c", "600 mm centres": the spacing is the width
_ON_CENTRES = re.compile(r"\s*(?:o\.\s?c\.?|oc\.?|on\s+cent(?:er|re)s?|c\s?/\s?c|"
                         r"cent(?:er|re)s|crs\.?)\s*$", re.IGNORECASE)


# a member repeated at a spacing (whose tributary width is that spacing)
_REPEATED_MEMBER = re.compile(r"\b(?:joists?|rafters?|purlins?|girts?|studs?|stringers?|"
                              r"deck(?:ing| boards?)|planks?|slats?|battens?|trusses|sleepers?|"
                              r"bearers?|cross ?members?|runners?|arms?|shelf (?:rails?|brackets?)|"
                              r"brackets?)\b", re.IGNORECASE)


def _spacing_widths(r: _Reader, raw_loads, beam, title, notes) -> None:
    """A width written as a spacing ("24 in o.c.") is the tributary width of a member repeated
    at that spacing (a joist). On a member that its title does not name as one (a girder or a
    platform beam that the joists at that spacing bear on) it reads as the spacing of what it
    carries, not its own tributary width (half the joists' spans each side), so NOT RATED:
    write the width without o.c. if it is meant."""
    words = _as_words(title) if isinstance(title, str) else ""
    named = any(not re.search(r"\b(?:carr(?:y|ies|ying)|supports?|supporting|under|below|"
                              r"beneath|for|holds?|holding|with|bears?|bearing)\b[^|]{0,25}$",
                              words[:m.start()], re.IGNORECASE)
                for m in _REPEATED_MEMBER.finditer(words))
    if (isinstance(beam, dict) and beam.get("repetitive") is True) or named:
        return
    for i, ld in enumerate(raw_loads if isinstance(raw_loads, list) else ()):
        w = ld.get("width") if _is_table(ld) else None
        if _spacing_of(w) is not None:
            key = f"loads[{i}].width"
            r.hold(f"width = {w!r} is written as a spacing (on centres): that is the tributary "
                   "width of a member repeated at that spacing, a joist or rafter, but the words "
                   "do not name this member as one. If joists or other members at that spacing "
                   "bear on this one (a girder, a platform beam), its tributary width is half "
                   "their spans on each side, not their spacing, so no rating is posted. Write "
                   "the width without \"o.c.\" if it is this member's own tributary width, or "
                   "say what it is in the title (\"joist\", \"rafter\")", key,
                   f"width = {w!r} is a spacing, and this member is not named as one repeated at "
                   "it (a joist): write its own tributary width without o.c.")


def _spacing_of(w) -> str | None:
    """A width written as a spacing ("16 in o.c.") without its on-centres words ("16 in"),
    or None where it is not written so."""
    if isinstance(w, str) and _ON_CENTRES.search(w) and _ON_CENTRES.sub("", w).strip():
        return _ON_CENTRES.sub("", w)
    return None


def _spaced(ld: dict) -> dict:
    """The load's table with its width read as a spacing ("16 in o.c." is 16 in)."""
    w = _spacing_of(ld.get("width"))
    return ld if w is None else {**ld, "width": w}


_PLACEMENT = {"point": ("at",), "moment": ("at",), "uniform": ("start", "end", "total", "width"),
              "linear": ("start", "end", "width")}


def _placement_keys(r: _Reader, ld: dict, kind: str, key: str) -> bool:
    """Warn of placement keys this load type does not read; False (an error) for a spread
    load given `at` and neither start nor end: where it was meant to be is unknown, and it
    would run over the whole member."""
    used = _PLACEMENT[kind]
    for k in ("at", "start", "end", "total", "width"):
        if k not in ld or k in used:
            continue
        if kind in ("uniform", "linear") and k == "at" and "start" not in ld and "end" not in ld:
            r.error(f"a {kind} load runs from start to end, not at one place: give start and end "
                    "(e.g. start = \"5 ft\", end = \"7 ft\"; they default to the ends of the "
                    "member), or use type = \"point\" for a load at one place", f"{key}.at")
            return False
        if kind in ("point", "moment"):
            why = (f"a {kind} load acts at one place, given by at; for a load spread along the "
                   "member use type = \"uniform\"")
        elif k == "total":
            why = "a linear load is given by its two intensities, value = [start, end]"
        else:
            why = f"a {kind} load runs from start to end"
            if k == "at" and "start" not in ld:  # start = at was most likely meant
                why += (f"; with no start it runs from 0, the member's start; if it was "
                        f"meant to start at {ld['at']}, write start = \"{ld['at']}\""
                        if isinstance(ld["at"], str)
                        else "; with no start it runs from 0, the member's start")
            elif k == "at" and "end" not in ld:
                why += "; with no end it runs to the member's end"
        r.warn(f"{k} is not read by a {kind} load ({why}); ignored", f"{key}.{k}")
    return True


def _resolve(kind: str, spec, key: str, r: _Reader, **kw):
    try:
        if kind == "section":
            sec = resolve_section(spec, key, **kw)
            _wide_first(r, spec, key, kw.get("axis"))
            return sec
        return resolve_material(spec, key)
    except InputError as e:
        r.take(e, key)
        return None


def _wide_first(r: _Reader, spec, key: str, axis) -> None:
    """A lumber size written wide first ("8x2"): read as the 2x8 it is, on edge (strong
    axis), which is right for a joist and 14x wrong for a plank laid flat; said."""
    from shopbeam.members.catalog import _LUMBER  # noqa: PLC0415

    m = _LUMBER.match(spec) if isinstance(spec, str) else None
    if m and int(m.group(1)) > int(m.group(2)) and axis is None:
        size = f"{m.group(2)}x{m.group(1)}"
        # the two readings differ many times over (on edge, flat): held until axis says which
        r.hold(f"{spec.strip()!r} is read as a {size} ON EDGE (bent about its strong axis, as "
               f"a joist); lumber is written thickness first ({size}), and written wide first "
               "it may mean a board laid flat (a plank or shelf board), many times weaker. Write "
               "axis = \"weak\" under [beam] if it lies flat, or axis = \"strong\" if it "
               "stands on edge; no rating is posted until it says", key,
               f"{spec.strip()!r} is written wide first: on edge or laid flat? Write axis = "
               "\"strong\" or \"weak\" under [beam]")


# Words that say a board or bar lies flat (a plank, a shelf board): read on edge by default
_LAID_FLAT = re.compile(r"\b(?:planks?|plank(?:ing|ed)|(?:laid|lay|lays|lying|lies|laying|set|"
                        r"placed|sits?) flat|flat[- ](?:board|plank|shelf)s?|flat side (?:down|"
                        r"up)|flatwise|on (?:the |its )?flat|(?:on|rests on) its wide face|"
                        r"wide face (?:down|up)|shelf[- ]boards?|scaffold(?:ing)?[- ]?boards?|"
                        r"walk[- ]?boards?|deck[- ]?boards?|stair treads?|treads?|bench[- ]?tops?|"
                        r"boards? (?:laid|set|placed) (?:across|on|over))\b", re.IGNORECASE)
_FLAT_TAG = re.compile(r"^(?:planks?|shelf[- ]?boards?|flat|laid[- ]flat|treads?|walk[- ]?boards?)$",
                       re.IGNORECASE)
# the member said to stand on edge
_ON_EDGE = re.compile(r"\b(?:on (?:its |the )?edge|edgewise|edge[- ]?(?:up|on)|stands? upright|"
                      r"standing on (?:its |the )?edge|(?:set|stood|standing) upright|"
                      r"deep side up)\b", re.IGNORECASE)
# a title naming a framing member: words of boards or planks there are what it carries
_FRAMING = re.compile(r"\b(?:joists?|stringers?|rails?|beams?|cross ?bars?|bars?|arms?|headers?|"
                      r"purlins?|girts?|rafters?|studs?|ledgers?|cleats?|bearers?|"
                      r"sleepers?|runners?|supports?)\b", re.IGNORECASE)


_ABOUT_OTHER = re.compile(r"\b(?:on|onto|across|over|between|to|from|under|below|above|"
                          r"the|two|three|four|2|3|4|with|and)\s+(?:\w+\s+)?$", re.IGNORECASE)


def _names_framing(title) -> bool:
    """The title names the member as a framing member (a joist, a rail), not what it sits
    on or carries ("Shelf plank on cleats" names a plank)."""
    words = _as_words(title)
    return any(not _ABOUT_OTHER.search(words[max(0, m.start() - 20):m.start()])
               for m in _FRAMING.finditer(words))


def _said_laid_flat(r: _Reader, section, axis, title, notes, tags=()) -> None:
    """A board or bar the job's words say lies flat ("2x10 plank", "shelf board laid
    across the brackets", a tag "plank") but with no axis: it is read on edge, many times
    stronger than flat. NOT RATED until axis says which. Not where the title names a framing
    member (a joist "decked with planks", a rail under shelf boards): the words are then
    about what it carries."""
    if axis is not None or section is None or getattr(section, "shape", "") != "rect-bar":
        return
    d = getattr(section, "dims", {}) or {}
    h, b = d.get("h"), d.get("b")
    on_edge = _words_found(_ON_EDGE, title, notes, (), ())
    if h and b and b > 1.5 * h and on_edge \
            and not _words_found(_LAID_FLAT, title, notes, (), ()):
        # the mirror: said to stand on edge, read flat (a "3/8 x 3" bar written thickness
        # first): on the safe side, but its figure is a fraction of what was meant
        f = lambda x: units.fmt(x, "small_length", r.system)  # noqa: E731
        r.warn(f"the job says the member stands on edge ({on_edge[0]}), but "
               f"{section.designation!r} is read FLAT, {f(h)} deep and {f(b)} wide (a size is "
               "written depth first), several times weaker than on edge. If it stands on edge, "
               f"write its depth first ({f(b)} deep by {f(h)} wide); if it lies flat, reword "
               "the notes", "beam.section")
        return
    if not (h and b and h > 1.5 * b):  # on edge and flat differ little for a squarish bar
        return
    said = [f"tag {t!r}" for t in tags if isinstance(t, str) and _FLAT_TAG.match(t.strip())]
    if not said and not _names_framing(title):
        said = _words_found(_LAID_FLAT, title, notes, (), ())
    if not said or on_edge or any(
            p.key == "beam.section" and "wide first" in p.message for p in r.problems):
        return  # (a size written wide first is held for its axis already)
    r.hold(f"the job says the member lies flat ({'; '.join(said[:2])}), but "
           f"{section.designation!r} is read ON EDGE (bent about its strong axis, deep side "
           "up), many times stiffer and stronger than laid flat. Write axis = \"weak\" under "
           "[beam] if it lies flat, or axis = \"strong\" if it stands on edge; no rating is "
           "posted until it says", "beam.section",
           f"the job says the member lies flat ({said[0]}) but no axis is given, and it is read "
           "on edge: write axis = \"weak\" (flat) or \"strong\" (on edge) under [beam]")


# Steel, aluminium, titanium and wood along the grain all have a stiffness per weight
# E / density of about 20 to 26 MN*m/kg (common practice: 200 GPa / 7850, 69 GPa / 2700,
# 11 GPa / 560). A typed-in material far outside 12 to 40 has one figure from another
# material or unit (aluminium's E with steel's density): held above (a weight too light or a
# stiffness too great raises the figure), warned below.
SPECIFIC_STIFFNESS = (12e6, 40e6)  # E / density, m^2/s^2


# A carbon or stainless steel weighs 7,750 to 8,000 kg/m^3 (490 to 500 lb/ft^3, common
# practice): a typed-in steel far lighter leaves out own weight (a digit slipped, "390")
STEEL_DENSITY_LOW = 7000.0  # kg/m^3
ALUMINIUM_DENSITY_LOW = 2500.0  # kg/m^3 (aluminium alloys 2,640 to 2,840, common practice)


def _mixed_material(r: _Reader, material, system: str) -> None:
    kind = getattr(material, "kind", "")
    ksi = material.e / (units.PSI * 1000)
    # a steel's E (26,000 to 31,500 ksi) or an aluminium's (9,000 to 11,500 ksi) with a
    # density far under that metal's: the own weight left partly out ("390" for 490)
    metal = ("steel", "490 to 500 lb/ft^3, 7,850 kg/m^3", STEEL_DENSITY_LOW) \
        if kind in ("steel", "stainless") or (kind in ("", "custom") and 26e3 <= ksi <= 31.5e3) \
        else ("aluminium", "169 lb/ft^3, 2,700 kg/m^3", ALUMINIUM_DENSITY_LOW) \
        if kind == "aluminum" else None  # (a composite can have aluminium's E: named only)
    if metal is not None and material.density < metal[2]:
        rho = units.fmt(material.density, "density", system)
        r.hold(f"density = {rho} is far lighter than any {metal[0]} ({metal[1]}): the "
               "member's own weight, a dead load, would be left partly out and the figure "
               "posted too high, so no rating is posted. Check the figure and its unit",
               "beam.material",
               f"the typed-in {metal[0]}'s density {rho} is far under any {metal[0]}'s: check it")
        return
    ratio = material.e / material.density
    lo, hi = SPECIFIC_STIFFNESS
    if lo <= ratio <= hi:
        return
    e = units.fmt(material.e, "stress", system)
    rho = units.fmt(material.density, "density", system)
    said = (f"e = {e} and density = {rho} do not belong to one metal or wood: E / density is "
            f"{ratio / 1e6:.3g} MN*m/kg, while steel, aluminium and wood all lie near 20 to 26 "
            "(steel 29,000 ksi with 490 lb/ft^3, aluminium 10,100 ksi with 169 lb/ft^3); one of "
            "them is another material's figure or unit. A plastic or composite differs: check "
            "both against its data sheet")
    if ratio > hi:  # too light for its stiffness: the own weight too small, or E too large,
        # both raise the figure posted ("490 kg/m^3" for 490 lb/ft^3 is 16 times too light)
        r.hold(said + "; no rating is posted while it stands", "beam.material",
               f"e = {e} and density = {rho} do not belong to one material (the density too "
               "light or E too large for the other): check both and their units")
    else:  # too heavy or too soft for it: on the safe side for the checks
        r.warn(said, "beam.material")


# The elastic modulus of each kind a typed-in material can name (common practice, values
# from memory): carbon and stainless steels 28,000 to 30,000 ksi (AISC 360-16 takes 29,000;
# 200 to 210 GPa in metric tables); aluminium alloys 10,000 to 10,800 ksi (ADM 2015 Table
# A.3.4, 6061-T6 10,100 ksi); wood along the grain under 3,000 ksi (NDS Supplement: sawn
# lumber 0.9 to 2.0 million psi, LVL and glulam up to about 2.3). The bands leave a margin.
KIND_E = {"steel": (26_000, 31_500), "stainless": (26_000, 31_500),
          "aluminum": (9_000, 11_500), "lumber": (0, 3_500)}  # ksi
_KIND_WORDS = {"steel": "steel", "stainless": "stainless steel", "aluminum": "aluminium",
               "lumber": "wood"}


def kind_for_e(e: float) -> str:
    """The material kind whose band holds the elastic modulus e (Pa), or "custom"."""
    ksi = e / units.KSI
    return next((k for k in ("steel", "aluminum", "lumber")
                 if KIND_E[k][0] <= ksi <= KIND_E[k][1]), "custom")


def kind_mismatch(material, system: str = "us") -> str:
    """Why a typed-in material's kind and its E name two families ("" when they agree): the
    kind picks the rules (AISC steel, ADM aluminium, NDS wood), so one of the two is a slip."""
    kind = getattr(material, "kind", "custom")
    if getattr(material, "source", "") != "typed in" or kind not in KIND_E:
        return ""
    lo, hi = KIND_E[kind]
    if lo <= material.e / units.KSI <= hi:
        return ""
    e = units.fmt(material.e, "stress", system)
    gpa = f"{lo * units.KSI / 1e9:.0f} to {hi * units.KSI / 1e9:.0f} GPa"
    band = (f"{lo:,} to {hi:,} ksi, {gpa}" if lo else
            f"under {hi:,} ksi, {hi * units.KSI / 1e9:.0f} GPa")
    return (f"kind = \"{kind}\" but e = {e} is outside the range of {_KIND_WORDS[kind]} "
            f"({band}): the {_KIND_WORDS[kind]} rules would be applied to another material")


# Highest yield strength of the metals whose design rules shopbeam applies (values from
# memory): AISC 360-16 A3.1a lists structural steels up to ASTM A514, Fy 100 ksi, and
# stainless takes its 0.2 % proof stress (duplex grades about 65 to 80 ksi); the strongest
# common aluminium alloy, 7075-T6, has Fty about 70-73 ksi (ADM 2015 Table A.3.4). A typed-in
# yield above these is a unit slip (250 MPa typed as "250 ksi") or a metal the rules do not
# cover.
KIND_FY_TOP = {"steel": 100.0, "stainless": 100.0, "aluminum": 80.0}  # ksi


def strength_slip(material, system: str = "us") -> str:
    """Why a typed-in metal's yield strength is beyond its kind's rules ("" when it is not)."""
    kind = getattr(material, "kind", "custom")
    if getattr(material, "source", "") != "typed in" or kind not in KIND_FY_TOP:
        return ""
    ksi, top = material.fy / units.KSI, KIND_FY_TOP[kind]
    if ksi <= top * (1 + 1e-9):
        return ""
    mpa = f"{ksi:.4g} MPa is {ksi * 1e6 / units.KSI:.3g} ksi" if ksi > 150 else ""
    return (f"fy = {units.fmt(material.fy, 'stress', system)} is above any "
            f"{_KIND_WORDS[kind]} whose rules shopbeam applies ({top:g} ksi at most"
            + ("; ASTM A514, the strongest steel AISC 360-16 A3.1a lists" if kind != "aluminum"
               else "; 7075-T6 has about 73 ksi") + ")"
            + (f": a figure in MPa typed with ksi is likely ({mpa})" if mpa else ""))


# Lowest yield strength of a structural steel or stainless (from memory): 316L annealed 25 ksi
# (ASTM A240), A36 36 ksi, S235 235 MPa. Below it a figure in ksi typed with MPa ("50 MPa" for
# 50 ksi) is likely; the figure posted is then far too low (on the safe side: a warning)
KIND_FY_LOW = {"steel": 24.0, "stainless": 24.0}  # ksi


def _kind_mismatch(r: _Reader, material, system: str) -> None:
    slip = strength_slip(material, system)
    if slip:
        r.warn(f"{slip}. Check fy and its unit; the job is NOT RATED until it reads as the "
               "mill certificate does", "beam.material.fy")
    kind = getattr(material, "kind", "custom")
    if getattr(material, "source", "") == "typed in" and kind in KIND_FY_LOW and \
            material.fy / units.KSI < KIND_FY_LOW[kind]:
        mpa = material.fy / 1e6
        r.warn(f"fy = {units.fmt(material.fy, 'stress', system)} is below any structural "
               f"{_KIND_WORDS[kind]} (about 25 ksi, 170 MPa, at the least; A36 is "
               "36 ksi, S235 235 MPa): "
               + (f"{mpa:.4g} ksi typed as MPa is likely ({mpa:.4g} ksi = "
                  f"{mpa * units.KSI / 1e6:.0f} MPa). "
                  if mpa < 120 and abs(mpa * 2 - round(mpa * 2)) < 1e-6 else "")
               + "The checks use the figure typed, which understates the member: check fy and "
               "its unit", "beam.material.fy")
    why = kind_mismatch(material, system)
    if not why:
        return
    like = kind_for_e(material.e)
    fix = (f"kind = \"{like}\" if it is {_KIND_WORDS[like]}" if like != "custom"
           else "kind = \"custom\" (first-yield checks) if it is neither")
    r.warn(f"{why}. Check e and its unit, or give {fix}", "beam.material")


# Smallest section properties a real member can have (a 0.1 mm wire is ~1e-8 m^2): below
# these the numbers are a typing slip, and the stresses would overflow.
_SECTION_FLOORS = {"area": (1e-10, "area"), "ix": (1e-20, "ix"), "sx_top": (1e-15, "sx"),
                   "sx_bot": (1e-15, "sx"), "shear_area": (1e-10, "shear_area")}


def _thick_6063_t5(r: _Reader, material, section):
    """6063-T5 over 0.5 in thick has the lower minimums of its next thickness range (Fty 15
    ksi, Ftu 21 ksi for 0.501 to 1.000 in, Aluminum Design Manual 2015 Table A.3.4, from
    memory); the built-in figures (16 / 22 ksi) are for up to 0.5 in."""
    if material is None or section is None or getattr(material, "key", "") != "6063-T5":
        return material
    d = getattr(section, "dims", {}) or {}
    t = max((float(d[k]) for k in ("t", "tf", "tw") if d.get(k)), default=0.0)
    if section.shape in ("rect-bar", "round-bar"):
        t = min(float(d.get("b", 0) or d.get("d", 0) or 0), float(d.get("h", 0) or 1e9)) or t
    if t <= 0.5 * 0.0254 * (1 + 1e-9):
        return material
    return replace(material, fy=15 * units.KSI, fu=21 * units.KSI,
                   name=f"{material.name}, over 0.5 in thick",
                   source="Fty 15 ksi, Ftu 21 ksi (0.501 to 1.000 in thick); " + material.source)


def _plausible_section(sec, r: _Reader) -> None:
    for attr, (floor, key) in _SECTION_FLOORS.items():
        v = getattr(sec, attr, None)
        if v is None:
            continue
        if not (math.isfinite(v) and v >= floor):
            r.error(f"the section's {key} ({v:.3g} in SI units) is too small or not a number "
                    "for a real member: check the value and its unit", f"beam.section.{key}")
            return


# A typed-in section's dimensions (a tube's depth, a bar's width, a wall, a radius): a shop
# writes them in inches or millimetres, so one in feet or metres is most often a slip ("3 ft"
# for "3 in" makes a 36 in deep tube, rated many times over)
_SECTION_DIMS = ("depth", "width", "size", "od", "diameter", "wall", "thickness", "flange_width",
                 "flange_thickness", "web_thickness", "stem_thickness", "corner_radius",
                 "fillet_radius", "plate_width", "plate_thickness", "gap")
_FEET_OR_METRES = re.compile(r"\d\s*(?:ft|feet|foot|yd|yards?|'|m|metres?|meters?)\s*$",
                             re.IGNORECASE)
_IN_METRES = re.compile(r"\d\s*(?:m|metres?|meters?)\s*$", re.IGNORECASE)
# the thickness-like sizes: none is ever a foot or more than 2 in (a wall "3/16 ft")
_SECTION_THIN = frozenset({"wall", "thickness", "flange_thickness", "web_thickness",
                           "stem_thickness", "corner_radius", "fillet_radius",
                           "plate_thickness", "gap"})


def _feet_or_metres(text) -> bool:
    """A length typed in feet or metres, however the feet are marked ("3'", "3’", "3′",
    "3 ft.")."""
    if not isinstance(text, str):
        return False
    # the marks read as the unit reader reads them (3' 3’ 3′ are 3 ft)
    return bool(_FEET_OR_METRES.search(units.normalised(text).strip().rstrip(".")))


# A described size with no unit is read in inches. Millimetres typed so ("round-bar 10",
# "rect-tube 10 x 10 x 1") read as a section far heavier than a shop puts on that span: a
# size of 8 or more on a span under 12 times it, or a tube wall of 1 or more (common practice,
# no source: shop tube walls run to 5/8 in); a fraction or a size under 1 says inches
BARE_BIG, BARE_SPAN, BARE_WALL = 8.0, 12.0, 1.0
# ...and a solid bar of 4 or more on a span under 24 times it (shop round and flat bar beams
# are an inch or two; "round-bar 6" on a 24 in towel bar is a 6 mm rod)
BARE_BAR, BARE_BAR_SPAN = 4.0, 24.0


def _bare_sizes_in_mm(r: _Reader, spec, length, system: str) -> None:
    """A unitless description on a US job whose inches are far from a shop section of that
    span (a 10 mm bar typed "round-bar 10" is a 10 in bar): NOT RATED until the unit is
    written."""
    got = catalog.bare_numbers(spec) if system == "us" else None
    if not got or not length:
        return
    shape, nums = got
    if "/" in spec or min(nums) < 1:
        return  # a fraction or a size under 1: inches (millimetres are written whole)
    big = max(nums)
    tube = "tube" in shape.lower() or "pipe" in shape.lower()
    why = ""
    if not tube and big >= BARE_BAR and length / (big * units.IN) < BARE_BAR_SPAN:
        why = (f"a {big:g} in solid bar on a {units.fmt(length, 'length', system)} span (only "
               f"{length / (big * units.IN):.2g} x its size)")
    elif big >= BARE_BIG and length / (big * units.IN) < BARE_SPAN:
        why = (f"a {big:g} in size on a {units.fmt(length, 'length', system)} span (only "
               f"{length / (big * units.IN):.2g} x its size)")
    elif tube and len(nums) >= 2 and nums[-1] >= BARE_WALL:
        why = f"a {nums[-1]:g} in wall"
    if why:
        r.hold(f"{spec!r} gives its sizes without a unit, read as inches: {why} is far from a "
               "shop member of this length, so millimetres may be meant (a 10 mm bar read as "
               "10 in is rated hundreds of times over); no rating is posted until the unit is "
               f"written: \"{spec.strip()} mm\" if millimetres are meant, or \"... in\" "
               "on each size to keep inches", "beam.section",
               f"the section {spec!r} has no unit: write mm or in on its sizes")


def _corner_radius(r: _Reader, section, material, system: str) -> None:
    """A typed-in tube's corner radius over 3 x its wall: past what ASTM A500 allows a tube's
    outside corner (3 t at most, from memory) and a likely unit slip ("5 in" for "5 mm"); the
    wall checks' k grows with it (AISC 360-16 K2), so NOT RATED."""
    if getattr(material, "kind", "steel") not in ("steel", "stainless"):
        return  # an extrusion's corners are its die's
    d = getattr(section, "dims", None) or {}
    rt, t = d.get("r_typed"), d.get("t_nom")
    if not rt or not t or rt <= 3 * t * (1 + 1e-9):
        return
    f = lambda x: units.fmt(x, "small_length", system)  # noqa: E731
    r.hold(f"corner_radius = {f(rt)} is {rt / t:.2g} x the {f(t)} wall: a tube's outside corner "
           "is at most 3 x its wall (ASTM A500, from memory), and the wall checks' k grows with "
           "the radius (AISC 360-16 K2), so no rating is posted. Check its unit (\"5 mm\", not "
           "\"5 in\"), or leave it out (k = 1.5 t)", "beam.section.corner_radius",
           f"the corner_radius {f(rt)} is over 3 x the {f(t)} wall: check its unit, or leave it "
           "out")


def _section_dims_in_feet(r: _Reader, spec, length, system: str) -> None:
    """A [beam.section] size typed in feet or metres where that reading is far from a shop
    section ("3 ft" for "3 in": a 36 in deep tube on a 12 ft span): NOT RATED until written
    in inches or millimetres. A size in feet or metres that makes a sound section is read as
    written (a 2 ft deep girder over 30 ft, 0.2 m on a 6 m span)."""
    if not _is_table(spec):
        return
    said = []
    for k in _SECTION_DIMS:
        v = spec.get(k)
        if not _feet_or_metres(v):
            continue
        try:
            size = units.parse(v, "length", f"beam.section.{k}")
        except InputError:
            continue  # its own message says what is wrong
        other = system == "us" and bool(_IN_METRES.search(v.strip().rstrip(".")))
        if other or (k in _SECTION_THIN and size > 2 * units.IN) or (
                k not in _SECTION_THIN and length and length / size < 12):
            said.append((k, v))
    if not said:
        return
    k, v = said[0]
    r.hold(f"{k} = {v!r} is typed in feet or metres, and read so the section is far from any "
           "shop section (\"3 ft\" for \"3 in\" makes the member many times stronger than it "
           "is); no rating is posted until it is written in inches or millimetres" + (
               f" (and {', '.join(x for x, _ in said[1:])})" if len(said) > 1 else ""),
           f"beam.section.{k}",
           f"the section's {k} ({v!r}) is typed in feet or metres: write it in inches or mm")


# Span-to-depth below which a member is not a beam (common practice): Euler-Bernoulli beam
# theory (plane sections stay plane, shear deformation negligible) is good to a few per cent
# at span/depth 10, falls off below about 4 (ACI 318-19 9.9.1.1 treats a member as a deep
# beam when its clear span is 4 h or less, from memory), and below 2 the load goes to the
# supports as a strut rather than by bending: the bending, shear and deflection figures no
# longer describe the member. Below STUBBY_WARN it is warned (a length unit slip, "10 in" for
# "10 ft", lands here); below STUBBY_LIMIT design.capacity posts no rating.
STUBBY_WARN, STUBBY_LIMIT = 3.0, 2.0


def stubby_words(length: float, section, system: str = "us", typed=None) -> str:
    """What to say of a member whose length is under STUBBY_WARN times its depth ("" if it is
    not): the warning of the reader, and the reason design.capacity gives below STUBBY_LIMIT."""
    d = getattr(section, "depth", 0.0) or 0.0
    if not (d > 0 and length < STUBBY_WARN * d):
        return ""
    ratio = length / d
    shown = f'"{typed}"' if isinstance(typed, str) else units.fmt(length, "small_length", system)
    blocked = ratio < STUBBY_LIMIT
    return (f"the member is {shown} long, only {ratio:.2g} x the depth of section "
            f"{section.designation!r} ({units.fmt(d, 'small_length', system)}): beam theory does "
            "not hold this short (the load goes to the supports as a strut, shear deformation "
            f"is as large as bending; deep-beam action below about {STUBBY_WARN:g} x the depth, "
            "common practice), so " + (f"below {STUBBY_LIMIT:g} x the depth the job is NOT RATED"
                                       if blocked else "its figures are rough")
            + ". Check the length and its unit (\"10 in\" typed for \"10 ft\"); a block this "
            "short is a bearing or connection piece, to be checked as one")


# A shelf, rack beam or floor member spans many times its depth (common practice, no
# source: 15 to 30); one under this many depths is most often a length slip ("12 in" for
# "12 ft"), warned
SHORT_SPAN_DEPTHS = 6.0
# tags a shelf is given besides the shelf tags themselves
_SHELF_WORDS = frozenset({"shelves", "shelving-unit", "storage", "bench", "workbench",
                          "stockroom"})
_SPANNING_TAGS = SHELF_TAGS | RACK_TAGS | _SHELF_WORDS | {"floor", "joist", "mezzanine",
                                                          "platform", "loft", "deck",
                                                          "walkway"}


def _spans_between(supports) -> bool:
    """Whether the member spans between two places that hold it (no free end)."""
    held = sorted(round(sp.at, 9) for sp in supports if getattr(sp, "takes_force", False))
    return len(held) >= 2 and held[-1] - held[0] > 0


def _short_span(r: _Reader, length: float, section, tags, system: str, typed,
                supports=()) -> None:
    """A shelf, rack or floor member under SHORT_SPAN_DEPTHS x its depth: warned."""
    d = getattr(section, "depth", 0.0) or 0.0
    tagset = {normal_tag(t) for t in tags}
    if d <= 0 or length >= SHORT_SPAN_DEPTHS * d or not _SPANNING_TAGS & tagset \
            or tagset & {"bracket", "header", "arm", "cantilever"} \
            or not _spans_between(supports):
        return  # (an arm or bracket is a few depths long: its own free end)
    shown = f'"{typed}"' if isinstance(typed, str) else units.fmt(length, "length", system)
    slip = "a dropped zero, \"300 mm\" typed for \"3000 mm\"" if system == "si" \
        else "\"12 in\" typed for \"12 ft\""
    r.warn(f"the member is {shown} long, only {length / d:.2g} x its depth: shelves, rack "
           "beams and floor members span many times their depth (common practice). Check the "
           f"length and its unit ({slip})", "beam.length")


def _same_both_ways(r: _Reader, section, axis) -> None:
    """axis = "weak" on a section that bends alike about both axes (round, square) is read
    and changes nothing: say so, as for any key that is ignored."""
    ix, iy = getattr(section, "ix", 0.0) or 0.0, getattr(section, "iy", 0.0) or 0.0
    if axis == "weak" and ix > 0 and abs(ix - iy) <= 1e-9 * ix:
        name = section.designation or section.shape
        r.warn(f"axis = \"weak\" changes nothing: {name} bends alike about both axes (a round "
               "or square section); remove it", "beam.axis")


# A force load under TINY_FORCE (about 1 kg or 2 lbf in all) beside one TINY_RATIO times
# larger is almost surely a unit slip (N for kN, N/m for kN/m: 1000 x): common practice, no
# source. A label plate or a cable on a member that carries tons changes nothing anyway.
TINY_FORCE = 10.0  # N
TINY_RATIO = 1000.0
NEXT_TO_NOTHING = 1e-5  # N in all (a milligram's weight): no shop load, whatever the rest


def _unit_typed(raw_loads, ld) -> str:
    """The unit a load's value was typed in ("kn/m", "lbf"), lower case; "" if not known."""
    try:
        i = int(ld.key[ld.key.index("[") + 1:-1])
        v = raw_loads[i].get("value", raw_loads[i].get("total"))
    except (ValueError, IndexError, AttributeError, TypeError):
        return ""
    v = v[-1] if isinstance(v, list) and v else v
    m = re.match(r"\s*[-+\u2212]?[\d.,/\s]*(.*)$", v) if isinstance(v, str) else None
    return re.sub(r"\s+", "", m.group(1)).lower() if m else ""


def _tiny_loads(r: _Reader, loads: list[Load], raw_loads, system: str) -> None:
    """Hold the rating on a force load a thousand times smaller than the job's largest, under
    about 1 kg in all and typed in another unit than that largest one (N beside kN): a dead
    one left 1000 x too small raises the posted figure, a live one 1000 x too small gets a
    multiple of next to nothing posted. A small load in the job's own unit (a 2 lbf sign on
    a 4,000 lbf beam) is what it says."""
    raw_loads = raw_loads if isinstance(raw_loads, list) else []
    sized = [(abs(ld.total_force), ld) for ld in loads if ld.kind != "moment"]
    big = max((f for f, _ in sized), default=0.0)
    big_unit = next((_unit_typed(raw_loads, ld) for f, ld in sized if f == big), "")
    for f, ld in sized:
        if 0 < f < NEXT_TO_NOTHING:
            name = f" ({ld.label})" if ld.label else ""
            r.hold(f"this load{name} comes to {f:.3g} N in all, next to nothing (less than a "
                   "milligram's weight): most likely a slip of the exponent or the unit. Fix "
                   "it, or remove the load; no rating is posted while it stands",
                   f"{ld.key}.value", f"{ld.key}{name} is next to nothing ({f:.3g} N): most "
                   "likely a slip. Fix it or remove it")
        elif 0 < f < TINY_FORCE and f * TINY_RATIO < big \
                and _unit_typed(raw_loads, ld) != big_unit:
            name = f" ({ld.label})" if ld.label else ""
            r.hold(f"this load{name} comes to {units.fmt(f, 'force', system)} in all, under "
                   f"1/{TINY_RATIO:g} of the job's largest load "
                   f"({units.fmt(big, 'force', system)}): most likely a unit slip (N for kN, "
                   "N/m for kN/m, lbf for kip). Fix its unit, or remove it if it is nothing; "
                   "no rating is posted while it stands", f"{ld.key}.value",
                   f"{ld.key}{name} is {units.fmt(f, 'force', system)}, a thousand times "
                   "smaller than the largest load: most likely a unit slip. Fix its unit")


# Two live loads of one kind whose units are a slip apart (12: lbf/in and lbf/ft; 1000 or
# more: kip and lbf, kN and N, kN/mm and kN/m) and whose values are ten times apart, the
# numbers typed alike (within 3 times) or the larger past any shop load: the larger unit
# typed for the smaller. Between a point and a spread load (no number to compare), the larger
# also past what any shop member carries. A spread load in a unit of 500 kN/m or more (kN/mm,
# MN/m) is no shop load at all.
SLIP_VALUE_RATIO = 10.0
SLIP_NUMBER_RATIO = 3.0
SLIP_CROSS_RATIO = 100.0
PAST_SHOP_POINT = 444822.16152605  # N: 100 kip
PAST_SHOP_SPREAD = 145939.02937206  # N/m: 10 kip/ft (klf)
ABSURD_SPREAD_UNIT = 5e5  # N/m per unit typed (kN/mm is 1e6)


def _typed_sizes(r: _Reader, raw_loads, loads, raw_moving) -> list[tuple]:
    """(key, name, "point" or "spread", SI size (N or N/m), number typed, SI per unit typed,
    the unit as typed, the force in all, N) of each live [[loads]] entry (not couples) and each live wheel of
    [[moving]], where it reads as one number and a unit."""
    out = []

    def one(text, kind):
        scanned = units._terms(text) if isinstance(text, str) else None
        if scanned is None or len(scanned[1]) != 1 or not scanned[1][0][1]:
            return None
        n = abs(float(scanned[1][0][0]))
        try:
            v = abs(units.parse(text, kind))
        except InputError:
            return None
        return (v, n, v / n, scanned[1][0][1]) if n > 0 and v > 0 else None

    for ld in loads:
        i = _load_index(ld.key)
        raw = raw_loads[i] if i is not None and i < len(raw_loads) else None
        if ld.case != "live" or ld.kind == "moment" or not _is_table(raw):
            continue
        spread = ld.kind in ("uniform", "linear")
        texts = raw.get("value") if "value" in raw else None
        texts = texts if isinstance(texts, list) else [texts]
        got = [g for g in (one(t, "line_load" if spread else "force") for t in texts) if g]
        if got:
            v, n, per, unit = max(got)
            out.append((ld.key, f" ({ld.label})" if ld.label else "",
                        "spread" if spread else "point", v, n, per, unit, abs(ld.total_force)))
    for j, mv in enumerate(raw_moving if isinstance(raw_moving, list) else ()):
        wheels = mv.get("loads") if _is_table(mv) else None
        got = [g for g in (one(t, "force") for t in (wheels if isinstance(wheels, list)
                                                       else [])) if g]
        if got:
            v, n, per, unit = max(got)
            label = mv.get("label") if isinstance(mv.get("label"), str) else ""
            out.append((f"moving[{j}].loads", f" ({label})" if label else "", "point", v, n,
                        per, unit, v))
    return out


def _huge_loads(r: _Reader, loads: list[Load], raw_loads, system: str, raw_moving=None) -> None:
    """Hold the rating where two live loads (wheels of [[moving]] among them) read as one
    typed in a unit far larger than the other's, as a unit slip does: of one kind, their
    units a slip apart (kip beside lbf, lbf/in beside lbf/ft, kN/mm beside kN/m; not N/mm
    beside kN/m, the same size, nor kN beside kg), their values at least ten times apart
    and the numbers typed alike or the larger past any shop load; a point beside a spread load, a hundred times apart and the larger past what a
    shop member carries (100 kip, 10 klf). A rating shares the rated load out in the
    proportions typed, so with a slip one is posted far over what it carries and the other
    far under. A spread load in a unit of 500 kN/m or more (kN/mm) is held on its own."""
    raw_loads = raw_loads if isinstance(raw_loads, list) else []
    sizes = _typed_sizes(r, raw_loads, loads, raw_moving)
    held = set()
    for key, name, kind, v, n, per, unit, _total in sizes:
        if kind == "spread" and per >= ABSURD_SPREAD_UNIT:
            held.add(key)
            r.hold(f"this spread live load{name} is typed in {unit}, "
                   f"{units.fmt(v, 'line_load', system)}: no shop member carries that; most "
                   f"likely the unit is slipped ({unit} for N/mm or kN/m). Fix its unit; no "
                   "rating is posted while it stands", f"{key}.value" if key.startswith(
                       "loads") else key,
                   f"{key}{name} is typed in {unit}: no shop load is that heavy. Fix its unit")
    for a in sizes:
        for b in sizes:
            ka, name_a, kind_a, va, na, per_a, unit_a, total_a = a
            kb, name_b, kind_b, vb, nb, per_b, unit_b, total_b = b
            if ka == kb or ka in held:
                continue
            if kind_a == kind_b:
                # units a slip's apart: an inch for a foot (12), a prefix or mm for m (1000)
                units_ratio = per_a / per_b
                slipped = 10.0 <= units_ratio <= 14.0 or units_ratio >= 300.0
                past = va >= (PAST_SHOP_SPREAD if kind_a == "spread" else PAST_SHOP_POINT)
                # the numbers typed alike (a heavy load is most often typed small in the
                # larger unit: 4 kip beside 40 lbf is what it says), or the larger past any
                # shop member's load
                slip = (slipped and va >= SLIP_VALUE_RATIO * vb
                        and (na >= nb / SLIP_NUMBER_RATIO or past))
            else:
                # (typed in a unit of a kN or more, or a kN/m or more: kip, kN, klf)
                past = va >= (PAST_SHOP_SPREAD if kind_a == "spread" else PAST_SHOP_POINT)
                slip = past and per_a >= 1000.0 and total_a >= SLIP_CROSS_RATIO * total_b
            if not slip:
                continue
            held.add(ka)
            what = "spread" if kind_a == kind_b == "spread" else "live"
            ratio = va / vb if kind_a == kind_b else total_a / total_b
            size_a = units.fmt(va, "force" if kind_a == "point" else "line_load", system)
            size_b = units.fmt(vb, "force" if kind_b == "point" else "line_load", system)
            r.hold(f"this {what} load{name_a} ({size_a}, typed in {unit_a}) is "
                   f"{ratio:,.3g} times {kb}{name_b} ({size_b}, typed in {unit_b}"
                   f"{'' if kind_a == kind_b else '; the forces in all'}): one of the two is most likely a unit slip (kip for "
                   "lbf, kN for N, per inch for per foot, kN/mm for kN/m). A rating shares the "
                   "rated load out in the proportions typed, so one would be posted far over "
                   "what it carries and the other far under. Check both units; no rating is "
                   "posted while they stand", f"{ka}.value" if ka.startswith("loads") else ka,
                   f"{ka}{name_a} (typed in {unit_a}) is {ratio:,.3g} times {kb}{name_b} "
                   f"(typed in {unit_b}): one of the two is most likely a unit slip. Check both")
            break


# A load's label that names the member's own weight
_OWN_WEIGHT_WORDS = re.compile(
    r"\b(?:(?:self[ _-]?weight|own weight)(?! of (?!(?:the )?(?:beam|member|joist|rail|arm)\b))|"
    r"beam(?:'s)? (?:self[ _-]?)?weight|weight of (?:the )?(?:beam|member|joist|rail|arm))\b",
    re.IGNORECASE)


_UNDER_MM = re.compile(r"^\s*(0?\.\d+|0)\s*mm\s*$", re.IGNORECASE)


def _under_a_millimetre(r: _Reader, raw_loads, raw_supports) -> None:
    """A place typed as a fraction of a millimetre ("0.9 mm"): no load or support is placed to
    a tenth of a millimetre, and the number is most often the place in metres with mm typed
    (0.9 m). Held: a load read 1000 x nearer its support posts a rating far too high."""
    for table, rows in (("loads", raw_loads), ("supports", raw_supports)):
        for i, row in enumerate(rows if isinstance(rows, list) else ()):
            if not _is_table(row):
                continue
            for k in ("at", "start", "end"):
                v = row.get(k)
                m = _UNDER_MM.match(v) if isinstance(v, str) else None
                if m and float(m.group(1)) > 0:
                    key = f"{table}[{i}].{k}"
                    r.hold(f"{k} = {v!r} is a fraction of a millimetre from the left end: no "
                           f"{table[:-1]} is placed that finely, so the number is most likely "
                           f"the place in metres with mm typed ({m.group(1)} m = "
                           f"{float(m.group(1)) * 1000:g} mm). Write the place as meant "
                           f"(\"{m.group(1)} m\" or \"{float(m.group(1)) * 1000:g} mm\")",
                           key, f"{key} = {v!r}: a fraction of a millimetre, most likely "
                           "metres typed as mm")


def _own_weight_twice(r: _Reader, loads: list[Load], self_weight: bool) -> None:
    """A dead load labelled as the member's own weight while self_weight = true (the default)
    adds it in a second time: on the safe side, but it lowers the rating for nothing and
    says the job was read otherwise than meant."""
    if not self_weight:
        return
    for ld in loads:
        if ld.case == "dead" and ld.kind in ("uniform", "linear") and ld.label \
                and _OWN_WEIGHT_WORDS.search(_as_words(ld.label)):
            r.warn(f"{ld.key} ({ld.label}) reads as the member's own weight, which is already "
                   "included (beam.self_weight = true, the default): it is counted twice. "
                   "Remove this load, or write self_weight = false under [beam] to give the "
                   "weight yourself", f"{ld.key}.label")
            return


# A dead spread load's label that names the floor's own build-up (what weighs a floor down)
_DECK_WORDS = re.compile(r"\b(decks?|decking|joists?|floor\w*|slabs?|grating|planks?|plywood|"
                         r"osb|sheathing|topping|finish\w*|tiles?|concrete|framing|dead|dl|d\.l|"
                         r"superimposed|partitions?)\b", re.IGNORECASE)


# The lightest floor deck on its own: 1/2 in plywood, about 1.6 psf (ASCE 7-16 Table C3.1-1a,
# plywood 0.4 psf per 1/8 in of thickness, from memory); a floor's dead load spread over its
# tributary width below it is a total typed for a per-length figure, or a deck left out
LIGHTEST_DECK = 1.6 * 47.880259  # Pa


def _floor_dead_total(r: _Reader, loads: list[Load], raw_loads, tags, section, material,
                      system: str, title="", notes="") -> None:
    """A floor's dead spread load (deck, joists, finishes) given as a total that spreads to less
    than half the member's own weight per length: most often the per-length figure typed as
    `total` ("-90 lbf" for "-90 lbf/ft"), which leaves the dead load a span's length too light
    and posts a higher live load. Held where it is light by both the member's own weight and
    its live load, warned where by one, or where it spreads over the live load's tributary
    width to less than a plywood deck alone weighs; the message gives the per-length figure
    it came to, and writing that as `value` (per length) says it is meant."""
    if not _floor_said(tags, title, notes) or NOT_FLOOR in {normal_tag(t) for t in tags} \
            or section is None or material is None \
            or not isinstance(raw_loads, list):
        return
    try:
        own = section.self_weight_mass(material.density) * units.G0  # N/m
    except (AttributeError, TypeError, ValueError):
        return
    # the live load per length the floor carries (its largest spread one)
    live_w = max((max(abs(ld.w1), abs(ld.w2 if ld.kind == "linear" else ld.w1))
                  for ld in loads if ld.case == "live" and ld.kind in ("uniform", "linear")),
                 default=0.0)
    # the floor's tributary width, where its live load is given per area
    width = max((w for k, w in r.widths.items() if any(
        ld.key == k and ld.case == "live" for ld in loads)), default=0.0)
    for ld in loads:
        i = int(ld.key[6:-1]) if ld.key.startswith("loads[") else -1
        raw = raw_loads[i] if 0 <= i < len(raw_loads) else None
        if ld.kind == "uniform" and ld.case == "dead" and _is_table(raw) \
                and ld.key in r.widths and (not ld.label or _DECK_WORDS.search(
                    _as_words(ld.label)) and not (_LIGHT_DECK.search(_as_words(ld.label))
                                                  and not _WOOD_DECK.search(_as_words(ld.label)))) \
                and 0 < abs(ld.w1) / r.widths[ld.key] < LIGHTEST_DECK:
            # a deck's weight per area lighter than a plywood deck alone: "-1.2 psf" for
            # "-12 psf", a digit or the decimal point slipped
            area = units.fmt(abs(ld.w1) / r.widths[ld.key], "area_load", system)
            r.warn(f"{ld.key}{f' ({ld.label})' if ld.label else ''} is a floor's dead load of "
                   f"{area}, lighter than a 1/2 in plywood deck alone "
                   f"({units.fmt(LIGHTEST_DECK, 'area_load', system)}): a deck, its joists and "
                   "finishes weigh more (10 to 15 psf for a wood floor, 0.5 to 0.7 kPa), so a "
                   "digit or the decimal point may have slipped; a light dead load posts a "
                   "higher live load. Check the figure", f"{ld.key}.value")
            continue
        if ld.kind != "uniform" or ld.case != "dead" or not _is_table(raw) \
                or "total" not in raw or ld.end <= ld.start:
            continue
        if ld.label and not _DECK_WORDS.search(_as_words(ld.label)):
            continue  # a handrail, a conduit run, sprinkler hangers: a small total is real
        per = abs(ld.total_force) / (ld.end - ld.start)
        light = [why for why, yes in (
            (f"less than half the member's own weight ({units.fmt(own, 'line_load', system)})",
             per < 0.5 * own),
            (f"under a fiftieth of the live load it carries "
             f"({units.fmt(live_w, 'line_load', system)})", per < live_w / 50),
            (f"{units.fmt(per / (width or 1.0), 'area_load', system)} over the live load's "
             f"{units.fmt(width, 'length', system)} tributary width, lighter than a 1/2 in "
             f"plywood deck alone ({units.fmt(LIGHTEST_DECK, 'area_load', system)})",
             width > 0 and per / width < LIGHTEST_DECK)) if yes]
        if per <= 0 or not light:
            continue
        name = f" ({ld.label})" if ld.label else ""
        per_words = units.fmt(per, "line_load", system)
        said = (f"total = {raw['total']!r}{name} spreads to {per_words} along the member, "
                f"{' and '.join(light)}: a floor's deck and joists weigh more than that. Most "
                f"often the per-length figure was typed as the total: if {raw['total']!r} per "
                f"length was meant, write value = \"{raw['total']}/"
                f"{'ft' if system == 'us' else 'm'}\" (a too light dead load posts a higher "
                "live load); if the total is right, write it as value = "
                f"\"{'-' if ld.total_force < 0 else ''}{per_words}\"")
        if per < 0.5 * own and per < live_w / 50:  # light by both the member's measures
            r.hold(said + ". No rating is posted while it stands", f"{ld.key}.total",
                   f"{ld.key}{name}: total = {raw['total']!r} spreads to {per_words}, under "
                   "half the member's own weight and a fiftieth of its live load per length: "
                   "the per-length figure typed as a total?")
        else:
            r.warn(said, f"{ld.key}.total")


def _upward_loads(r: _Reader, raw_loads: list, loads: list[Load], system: str) -> list[str]:
    """A force load that pushes up is almost always a forgotten minus sign: name each one,
    unless the load says ``uplift = true``. Returns the keys (with labels) it named."""
    up = []
    for ld in loads:
        if ld.kind == "moment":
            continue
        i = int(ld.key[ld.key.index("[") + 1:-1])
        raw = raw_loads[i] if i < len(raw_loads) and isinstance(raw_loads[i], dict) else {}
        if raw.get("uplift") is True:
            continue
        key, fix = "value", ""
        if ld.kind == "point" and ld.value > 0:
            shown = units.fmt(ld.value, "force", system)
        elif ld.kind == "uniform" and ld.w1 > 0 and "total" in raw:
            shown = units.fmt(ld.total_force, "force", system)  # as typed: a total
            key = "total"
        elif ld.kind == "linear" and max(ld.w1, ld.w2) > 0:
            shown = units.fmt(max(ld.w1, ld.w2), "line_load", system)
            ends = [units.fmt(-abs(w), "line_load", system) for w in (ld.w1, ld.w2)]
            fix = f"value = [\"{ends[0]}\", \"{ends[1]}\"]"
        elif ld.kind == "uniform" and max(ld.w1, ld.w2) > 0:
            shown = units.fmt(max(ld.w1, ld.w2), "line_load", system)
        else:
            continue
        up.append((ld, shown, key, fix or f"{key} = \"-{shown.lstrip('+')}\""))
    forces = sum(1 for x in (raw_loads if isinstance(raw_loads, list) else [])
                 if not (isinstance(x, dict) and x.get("type") == "moment"))

    def mixed(ld):  # a linear load that changes sign along its length
        return ld.kind == "linear" and min(ld.w1, ld.w2) < 0 < max(ld.w1, ld.w2)

    every = (" Every force load of this job points up." if len(up) == forces
             and not any(mixed(ld) for ld, *_ in up) else "")
    for ld, shown, key, fix in up:
        name = f" ({ld.label})" if ld.label else ""
        if mixed(ld):
            ends = [units.fmt(w, "line_load", system) for w in (ld.w1, ld.w2)]
            r.warn(f"this load{name} changes sign along its length ({ends[0]} to {ends[1]}): "
                   f"its {'start' if ld.w1 > 0 else 'end'} pushes UP (+{shown.lstrip('+')}), "
                   f"and forces are + up, so a weight is negative at both ends ({fix} if the "
                   "+ was a slip). If part of it really pushes up, add uplift = true to the "
                   "load", f"{ld.key}.{key}")
            continue
        r.warn(f"this load{name} points UP (+{shown.lstrip('+')}): forces are + up, so a "
               f"weight is negative ({fix}).{every} If the push up "
               "is intended (uplift), add uplift = true to the load", f"{ld.key}.{key}")
    return [ld.key + (f" ({ld.label})" if ld.label else "") for ld, *_ in up]


def _loads_at_supports(r: _Reader, loads, supports, length, system: str) -> list[str]:
    """A point load on a fixed, pin or roller support (where the solver merges positions)
    goes straight into the support: it bends nothing, so the checks never see it and a
    rating scaled on it posts a load the member was never checked for. Almost always a load
    typed at the wrong place (a cantilever's tip load at its held end). Warned; returns the
    keys (with labels) it named."""
    if length is None:
        return []
    from shopbeam.engine.solver import SNAP  # the positions the solver takes as one

    tol = SNAP * length
    held = [s for s in supports if s.kind in ("fixed", "pin", "roller")]
    bearing = [s.at for s in supports if s.takes_force]
    free = []
    if bearing and min(bearing) > tol:
        free.append(0.0)
    if bearing and max(bearing) < length - tol:
        free.append(length)
    out = []
    for ld in loads:
        if ld.kind == "moment" and ld.value:
            # a couple at a fixed end turns the wall, not the member: the member's end is
            # checked without it while the connection is told to develop it
            sup = next((s for s in held if s.kind == "fixed" and abs(s.at - ld.at) <= tol),
                       None)
            if sup is not None:
                where = units.fmt(sup.at, "length", system)
                name = f" ({ld.label})" if ld.label else ""
                r.warn(f"this couple{name} is at the fixed support at {where} "
                       f"({sup.key or 'a support'}): it goes into the support, so the member's "
                       "bending check does not see it while the fixed end's connection moment "
                       "includes it, and the job is NOT RATED. If it acts on the member (an "
                       "eccentric bracket welded to it), put it just inside the end, e.g. at "
                       "the bracket's position; if it acts on the wall, leave it out", f"{ld.key}.at")
                out.append(f"{ld.key}{name} (a couple) at the fixed support at {where}")
            continue
        if ld.kind != "point":
            continue
        sup = next((s for s in held if abs(s.at - ld.at) <= tol), None)
        if sup is None:
            continue
        where = units.fmt(sup.at, "length", system)
        name = f" ({ld.label})" if ld.label else ""
        tip = ""
        if free:
            ends = " or ".join(f'at = "{units.fmt(x, "length", system)}"' for x in free)
            tip = f", e.g. the free end ({ends})"
        held_back = "and the job is NOT RATED" if ld.case == "live" else (
            "(a dead load there is not counted in the member's bending; the rating stands)")
        r.warn(f"this point load{name} is at the {sup.kind} support at {where} "
               f"({sup.key or 'a support'}): it goes straight into the support and does not "
               "bend the member, so the bending, shear and deflection checks do not see it "
               f"{held_back}. It was "
               f"probably meant elsewhere{tip}: check at", f"{ld.key}.at")
        out.append(f"{ld.key}{name} at the {sup.kind} support at {where}")
    return out


def _idle_load_keys(r: _Reader, raw_loads, loads, supports, length, tags, levels) -> None:
    """Keys that change nothing get a warning, so a shop does not believe they were used:
    `patterned` on a dead load or on a member with a single span, `uplift` on a load that
    pushes down, and `levels` on a job that is not a rack."""
    raw = raw_loads if isinstance(raw_loads, list) else []
    by_key = {ld.key: ld for ld in loads}
    pieces = None
    if length is not None and supports:  # none read (too many, or none given): not judged
        try:
            pieces = len(segments(Beam(length=length, ei=1.0, supports=tuple(supports))))
        except Exception:  # noqa: BLE001 - geometry problems are reported elsewhere
            pieces = None
    for i, ld in enumerate(raw):
        if not _is_table(ld):
            continue
        key = f"loads[{i}]"
        got = by_key.get(key)
        if ld.get("patterned") is True:
            if ld.get("case") == "dead":
                r.warn("patterned = true on a dead load changes nothing: a dead load is always "
                       "there, so it is never left off a span; make it case = \"live\" if it "
                       "comes and goes", f"{key}.patterned")
            elif pieces == 1:
                r.warn("patterned = true changes nothing on a member with a single span and no "
                       "overhang: the load is either on (which is checked) or off; patterns "
                       "matter on continuous spans and overhangs", f"{key}.patterned")
        if got is not None and not any((got.value,) if got.kind in ("point", "moment")
                                       else (got.w1, got.w2)):
            r.warn("this load is zero: it changes nothing (and a zero live load is nothing to "
                   "rate); give its value, or remove it", f"{key}.value"
                   if "value" in ld else key)
        point_key = next((f"{key}.{k}" for k in ("value", "total") if any(
            p.key == f"{key}.{k}" and "a point between thousands" in p.message
            for p in r.problems)), None)
        if got is not None and got.case == "dead" and point_key:
            # the rating holds a dead load fixed: one read a thousand times too light posts
            # a live load far too high, so the doubt is not left to a warning
            typed = ld.get(point_key.rsplit(".", 1)[1])
            r.holds.append(f"the dead load {key} ({typed!r}) may be a thousand times "
                           "what is read (a point between thousands): write it without the "
                           "point, or with fewer than three decimals, as meant")
        if got is not None and got.kind != "moment" and ld.get("uplift") is not True \
                and isinstance(got.label, str) and _UPLIFT_WORDS.search(got.label) \
                and _pushes_down(got):
            # a wind uplift typed with the gravity loads' minus sign: checked pushing down,
            # and the member's buckling under the uplift (the bottom flange) is never seen
            r.hold(f"this load is labelled {got.label!r}, but its value pushes DOWN "
                   "(negative): forces are + up, so an uplift is written positive, with "
                   "uplift = true. As written it is checked as a weight, the member is never "
                   "checked pushed up (its bottom flange buckling under the uplift), and the "
                   "label would post it as a capacity for uplift, so no rating is posted. "
                   "Write it positive with uplift = true, or reword the label if it is a "
                   "weight", f"{key}.value" if "value" in ld else key,
                   f"the load labelled {got.label!r} pushes down: an uplift is written "
                   "positive with uplift = true")
        if ld.get("uplift") is True and got is not None and got.kind != "moment":
            if _pushes_down(got) and got.case == "live":
                # an uplift typed with the gravity loads' minus sign (or a weight marked up):
                # checked as a weight, the member is never checked pushed up
                name = f" ({got.label})" if got.label else ""
                r.hold(f"uplift = true says this load{name} pushes up, but its value pushes "
                       "DOWN (negative): forces are + up, so an uplift is written positive. As "
                       "written it is checked as a weight, the member is never checked pushed "
                       "up (its bottom flange buckling under the uplift), and the label would "
                       "post it as a load downward, so no rating is posted. Write it positive "
                       "if it is an uplift, or remove uplift = true if it is a weight",
                       f"{key}.uplift",
                       f"the load{name} is marked uplift = true but pushes down: check its "
                       "sign")
            elif _pushes_down(got) and isinstance(got.label, str) \
                    and _UPLIFT_WORDS.search(got.label):
                # a wind uplift typed as a dead load, with the minus sign: counted on as a
                # weight that is always there, the member is never checked pushed up
                r.hold(f"this load is labelled {got.label!r} and marked uplift = true, but it "
                       "is a dead load whose value pushes DOWN (negative): counted as a weight "
                       "always there, the member is never checked pushed up, so no rating is "
                       "posted. An uplift is a live load written positive with uplift = true "
                       "(remove case = \"dead\")", f"{key}.uplift",
                       f"the load labelled {got.label!r} is a dead load pushing down: an "
                       "uplift is written positive with uplift = true, as a live load")
            elif _pushes_down(got):
                r.warn("uplift = true says this load pushes up, but its value pushes down "
                       "(negative): it changes nothing; remove it, or check the sign",
                       f"{key}.uplift")
            elif got.case == "dead":
                # the wrong fix of a forgotten minus sign: a weight marked uplift, counted on
                # as always there and relieving the member
                name = f" ({got.label})" if got.label else ""
                r.hold(f"this dead load{name} pushes UP (uplift = true): a dead load is counted "
                       "on as always there, so it lowers what the member must carry and "
                       "raises the figure posted. A weight pushes down: write its value "
                       "negative and remove uplift = true. If it really pushes up (a "
                       "counterweight over a pulley), remove it to rate the member without "
                       "its help", f"{key}.uplift",
                       f"the dead load{name} pushes up and relieves the member: check its sign")
    if levels is not None and not RACK_TAGS.intersection(tags):
        r.warn("levels is the number of beam levels in a rack bay, for the rating label's "
               "per-bay total; this job is not tagged rack, pallet or racking, so it changes "
               "nothing: add tags = [\"rack\"] if it is a rack beam", "beam.levels")


# Words that name a lifting device or its parts; a job that uses one but is not tagged
# lifting would be checked without the impact allowance and the stricter deflection limit.
# Words with an everyday shop meaning too (a tackle box, runway lights, lug nuts, a shackle
# on a shelf) count only in the phrase that names the lifting part.
NOT_LIFTING = "not-lifting"  # the tag that says a job that reads like one is not a lifting device
_LIFTING_WORDS = re.compile(
    r"\b(hoists?|hoisting|monorails?|jibs?|cranes?(?! bays?\b| ?way doors?\b)|"
    r"(?<!tool )(?<!tea )(?<!sack )(?<!hand )(?<!shopping )(?<!service )(?<!drinks )"
    r"(?<!platform )trolleys?(?! (?:shel(?:f|ves)|carts?|tops?)\b)|chain[- ]?falls?|chain[- ]?blocks?|"
    r"lifting|lift beams?|spreaders?|davits?|gantry|gantries|below[- ]the[- ]hook|rigging|"
    r"block (?:and|&|n'?) tackle|tackle blocks?|pulling beams?|winch|winches|come[- ]?alongs?|"
    r"a-?frames?(?![- ](?:\w+[- ])?(?:racks?|ladders?|signs?|tables?|carts?|shel(?:f|ves)|"
    r"stands?|houses?)\b)|pad[- ]?eyes?|"
    r"shackle points?|sling points?|beam clamps?|runway (?:beams?|rails?)|pulleys?|"
    r"engine (?:pullers?|lifts?)|strongbacks?|strong-backs?|cherry ?pickers?|"
    # lift tables and vehicle lifts raise a load too (not a shelf beside one's bay)
    r"(?:(?:lift|scissor[- ]lift) tables?|scissor[- ]?lifts?|(?:car|vehicle|auto|automotive|"
    r"truck|two[- ]post|four[- ]post|[24][- ]post) lifts?)(?! (?:bays?|aisles?|parking|"
    r"stor(?:e|age)|charg\w*|pits?)\b)|"
    r"(?:lifting|lift|pick|picking|hoist|rigging) lugs?|"
    r"hook (?:loads?|points?|blocks?|beams?|heights?)|(?:on|from|under) (?:the|a) hook|"
    r"pick(?:ing)? (?:points?|beams?|bars?)|load blocks?|tuggers?|chain motors?|"
    r"(?:man|personnel|work) baskets?|(?:drum|coil|sheet|plate|pipe|vacuum|magnet|bundle|"
    r"pallet|bar) lifters?|lifters?|magnet beams?|booms?(?! ?box(?:es)?\b)|tackle beams?|"
    r"puller beams?|"
    r"lift rails?|overhead lifts?|(?<!easy )(?<!easier )(?:to|for) lift(?! trucks?\b)"
    r"(?! (?:\w+ )?(?:off|out|down)\b)|hoysts?|monorials?|tralleys?|"
    r"equali[sz]er beams?|sling bars?|lift(?:ing)? frames?|lift(?:ing)? bars?|yokes?|"
    r"load bars?|lift(?:ing)?[- ]arms?|lift(?:ing)?[- ]points?|(?:engine|motor|transmission|"
    r"gearbox) (?:hoist|pick)\w*|pull(?:ing)?[- ]beams?|pick[- ]?up arms?|"
    r"(?:to|for) (?:raise|pull) (?:the )?(?:motors?|engines?|transmissions?|gearbox(?:es)?|"
    r"pumps?|dies?|molds?|moulds?)|die[- ]?change|mou?ld[- ]?change|swing[- ]?arms?|"
    r"harrington (?:hoists?|\d\w*)|\d+(?:/\d+)?[- ]?tons? harrington|lodestar|valustar|coffing|budgit|demag|kito|"
    r"(?:yale|chester) (?:hoists?|electric|\d+\w*)(?! (?:forklifts?|lift ?trucks?|trucks?|"
    r"pallet))|hang (?:the )?(?:motor|engine|transmission|pump|die)s?)\b",
    re.IGNORECASE)
_LIFTING_TAGS = frozenset({"lift", "lifts", "lifter"})  # a tag that means lifting, misspelt
# a lifting word run together with the member it names, as one word of a tag or title
# ("hoistbeam", "jibcrane", "liftingdevice", "underhung"): whole compounds only, so
# "Cranebrook" or "Weightlifting" are not read as one
_LIFTING_STEMS = re.compile(
    r"^(?:hoist|lift|lifting|jib|crane|monorail|monorial|trolley|chain|spreader|sling|pick)"
    r"(?:ing)?(?:beams?|arms?|booms?|rails?|cranes?|bars?|frames?|devices?|runways?|hooks?|"
    r"hoists?|blocks?|falls?|trolleys?)$|^underhung$", re.IGNORECASE)
def _pushes_down(ld) -> bool:
    """A force load whose value pushes down (negative) all along, not zero."""
    if ld.kind == "point":
        return ld.value < 0
    return max(ld.w1, ld.w2) <= 0 < abs(min(ld.w1, ld.w2))


# a load's label that says it pushes up (wind uplift, suction, lift-off), not a negation
_UPLIFT_WORDS = re.compile(r"(?<!\bno )(?<!\bnot )(?<!\banti-)(?<!\banti )"
                           r"\b(?:uplift|up-lift|wind suction|lift[- ]?off|blow[- ]?off|"
                           r"suction(?![- ](?:lines?|tables?|cups?|hoses?|pipes?|pumps?|fans?|"
                           r"ducts?|heads?|pads?|lifters?)))\b",
                           re.IGNORECASE)
NOT_RACK = "not-rack"  # the tag that says a job that reads like a storage rack is not one
# Words that name a storage-rack member; a job that uses one but is not tagged rack gets
# neither the rack cautions (the impact load) nor the rating label's per-level wording.
_RACK_WORDS = re.compile(
    # a pipe rack or cable rack carries pipes or trays across a plant, not stored goods
    r"\b(pallet[- ]?racks?|pallet[- ]?racking|racking|"
    r"(?<!pipe )(?<!pipe-)(?<!cable )(?<!conduit )rack beams?|rack arms?|"
    r"cantilever[- ]racks?|storage[- ]racks?|selective[- ]racks?|rack uprights?|"
    r"step beams?|teardrop|drive[- ]?(?:in|thru|through) racks?|cantilever arms?|"
    r"(?:pallet|storage|stock) (?:racks?|bays?) beams?)\b",
    re.IGNORECASE)


# ...and words that name one unless the job is a floor that carries pallets
_RACK_SOFT = re.compile(
    r"\b(pallets?(?![- ]?(?:jacks?|trucks?|wrap))|"
    r"(?:bar|lumber|pipe|stock|timber)[- ]?(?:stock )?arms?|"
    # a rack on its own ("Rack level 2"), not a pipe, cable or tray rack across a plant, nor
    # a rack and pinion; skids (pallets), uprights and beam levels are rack words too
    r"(?<!pipe )(?<!pipe-)(?<!cable )(?<!cable-)(?<!conduit )(?<!tray )(?<!bike )"
    r"(?<!roof )(?<!hose )(?<!towel )(?<!drying )(?<!coat )(?<!tool )(?<!gun )(?<!spice )"
    r"(?<!wine )(?<!shoe )(?<!hat )(?<!dish )(?<!plate )(?<!luggage )(?<!magazine )"
    r"(?<!server )(?<!clamp )(?<!ladder )(?<!hose-)(?<!tool-)(?<!bike-)(?<!pipe-)"
    r"racks?(?! and pinion)(?!-and-pinion)|"
    # a skid of goods, not a plant's equipment skid (a chiller or pump on its frame)
    r"(?<!chiller )(?<!pump )(?<!equipment )(?<!compressor )(?<!process )(?<!tank )"
    r"(?<!generator )(?<!boiler )(?<!fan )(?<!motor )(?<!heater )(?<!filter )(?<!unit )"
    r"(?<!handler )(?<!ahu )(?<!hvac )(?<!equipment )"
    r"skids?(?![- ]mounted)(?![- ]?steers?)|"
    r"beam levels?|levels? \d+ beams?|longspan)\b", re.IGNORECASE)


_RACK_LEVEL_WORDS = re.compile(r"\b(?:per level|levels?|bays?|uprights?|beam pairs?|"
                               r"pallets? per)\b", re.IGNORECASE)
_DOCK_WORDS = re.compile(r"\b(?:(?:loading[- ])?docks?\b(?![- ]?(?:side )?rack)|"
                         r"(?:shipping|loading|receiving|dock) doors?\b|staged|staging)",
                         re.IGNORECASE)


def _judged_longest(supports, length) -> float | None:
    """The longest length a deflection limit is judged on: each span between supports, and a
    cantilever or overhang on twice its length (as the deflection check judges them)."""
    if length is None:
        return None
    held = sorted(s.at for s in supports if s.takes_force)
    if not held:
        return None
    spans = [b - a for a, b in zip(held, held[1:])]
    spans += [2 * held[0], 2 * (length - held[-1])]
    return max(spans) or None


def _ratio_of(criteria: Criteria, supports, length) -> tuple[float | None, str]:
    """(n of the L/n a written limit amounts to, how it is shown): an absolute limit ("1 in")
    is taken over the longest judged length, so "looser" holds on every span."""
    if criteria.deflection_ratio:
        return criteria.deflection_ratio, repr(criteria.deflection)
    longest = _judged_longest(supports, length)
    if criteria.deflection_abs and longest:
        n = longest / criteria.deflection_abs
        return n, f"{criteria.deflection!r} (L/{n:.0f} on the longest span)"
    return None, ""


def _looser_than_lifting(r: _Reader, criteria: Criteria, tags, supports, length) -> None:
    """A deflection limit written on a lifting job that is looser than its lifting profile's
    (L/240 copied from a shelf onto a monorail, or "1 in" on a 16 ft runway): warned and NOT
    RATED (a trolley on a member that sags more runs downhill and binds); the checks use the
    value written."""
    if length is None or not criteria.deflection_given:
        return
    ratio, shown = _ratio_of(criteria, supports, length)
    if not ratio:
        return
    name = criteria.lifting
    if not name:
        if not is_lifting(tags):
            return
        name = guessed_profile(supports, length)  # as design/lifting.profile_of picks it
    p = LIFTING_PROFILES[name]
    if ratio < p["deflection"]:
        r.hold(f"deflection = {shown} is looser than the L/{p['deflection']:g} "
               f"of the {name} lifting profile ({p['deflection_source']}): a hoist or trolley "
               f"on a member that sags more runs downhill and binds; the checks use the value "
               f"written, and no rating is posted on it: write \"L/{p['deflection']:g}\" or "
               "remove deflection to use the profile's limit", "criteria.deflection",
               f"deflection = {shown} is looser than the L/{p['deflection']:g} of the {name} "
               "lifting profile: write the profile's limit, or remove deflection")


def _looser_than_named(criteria: Criteria, tags, supports, length, tagset, name):
    """(n, the limit as written) when a job tagged with one of `tagset` writes a deflection
    limit looser than the named limit `name`'s L/n (but not looser than any common limit,
    warned already); else None."""
    if not criteria.deflection_given or length is None:
        return None
    ratio, shown = _ratio_of(criteria, supports, length)
    if not ratio or not tagset.intersection(normal_tag(t) for t in tags):
        return None
    n = DEFLECTION_PRESETS[name][0]
    return (n, shown) if LOOSEST_COMMON_RATIO <= ratio < n else None


def _looser_than_rack(r: _Reader, criteria: Criteria, tags, supports, length) -> None:
    """A deflection limit written on a storage-rack job that is looser than the rack
    standard's L/180 (the named limit `rack`), or an absolute one that amounts to that: NOT
    RATED on it, as a lifting job looser than its profile is (the figure would rest on a
    limit the rack's own standard does not allow)."""
    got = _looser_than_named(criteria, tags, supports, length, RACK_TAGS, "rack")
    if got:
        n, shown = got
        why = DEFLECTION_PRESETS["rack"][1]
        r.hold(f"deflection = {shown} is looser than the L/{n:g} of storage-rack "
               f"beams ({why.split(' (', 1)[1].rstrip(')')}): the checks use the value "
               "written, and no rating is posted on it; write "
               f"\"L/{n:g}\" (or deflection = \"rack\"), or a tighter limit",
               "criteria.deflection",
               f"deflection = {shown} is looser than the L/{n:g} of storage-rack beams: "
               "write the rack limit, or a tighter one")


FLOOR_TAGS = frozenset({"floor", "mezzanine", "platform", "deck", "joist", "loft", "walkway",
                        "catwalk"})


def _looser_than_floor(r: _Reader, criteria: Criteria, tags, supports, length) -> None:
    """A deflection limit written on a floor, mezzanine or platform job that is looser than a
    floor's L/240 under dead + live load (the named limit `floor`; IBC Table 1604.3, from
    memory): warned, and the value written is used."""
    got = _looser_than_named(criteria, tags, supports, length, FLOOR_TAGS, "floor")
    if got:
        n, shown = got
        r.warn(f"deflection = {shown} is looser than a floor's L/{n:g} under dead + live load "
               f"(with L/{LIVE_DEFLECTION_PRESETS['floor']:g} under live load; IBC Table "
               "1604.3, from memory), and people walk on this member: the checks and the "
               "rating use the value written; write deflection = \"floor\" for both",
               "criteria.deflection")


# A floor named in the title or notes ("Mezzanine joist", "loft floor"): read as the floor tags
# are, for the live-load limit (a roof, ceiling, rack or shelf is not one)
# (as the member's use: "mezzanine joist", "walk-way beam", "loft floor", not "above the floor")
_FLOOR_WORDS = re.compile(
    r"\b(?:(?:floor|mezzanine|mezz|platform|loft|walk[- ]?way|catwalk|landing|balcony|stage|"
    r"deck|gangway|foot[- ]?bridge|bleachers?)(?:[- ](?:level|floor))?[\s-]+(?:joists?|beams?|"
    r"framing|girders?|stringers?|members?|planks?|boards?)|loft floor|people walk\w*|"
    r"foot traffic|walked on)\b", re.IGNORECASE)
_NOT_FLOOR_WORDS = re.compile(r"\b(roofs?|ceilings?|rafters?|purlins?|shelf|shelves|shelving|"
                              r"racks?|racking|canopy|signs?|ducts?|pipes?|conveyors?|doors?|"
                              r"headers?|benches?|tanks?|machines?|equipment|scales?)\b",
                              re.IGNORECASE)
NOT_FLOOR = "not-floor"  # the tag that says a member read as a floor is not one
# a platform or deck tagged beside a vehicle's tag is the vehicle's own (a flatbed's deck)
VEHICLE_DECK_TAGS = frozenset({"platform", "deck"})
VEHICLE_TAGS = frozenset({"trailer", "truck", "flatbed", "vehicle", "truck-body"})
# a floor no vehicle has: a mezzanine, loft or platform is a building's, whatever vans or
# trucks the words mention ("mezzanine above where the service vans park"); a platform
# trailer, truck or bed is the vehicle itself (a flatbed)
_BUILDING_FLOOR = re.compile(r"\b(?:mezzanines?|mezz|lofts?|catwalks?|walkways?|"
                             r"(?<!trailer )(?<!flatbed )(?<!truck )"
                             r"platforms?(?![- ](?:trailers?|trucks?|beds?|bodies|body)\b"
                             r"(?![- ](?:bays?|docks?|doors?|lanes?|parking|stalls?)\b))|"
                             r"offices?|attics?|stor(?:e)?ys?|buildings?)\b", re.IGNORECASE)
# where vehicles are, not what the member is part of ("loft over the van bays")
_VEHICLE_PLACE = re.compile(r"\b(?:over|above|under|beneath|below|beside|behind|next to|near|"
                            r"past|around|along|alongside|in front of|opposite|between) "
                            r"(?:the |a |an |our |two |three |four )?(?:[\w-]+ ){0,2}?"
                            r"(?:vans?|trucks?|trailers?|vehicles?|cars?|pickups?|forklifts?)"
                            r"(?: (?:bays?|parking|doors?|docks?|lanes?|stalls?))?\b",
                            re.IGNORECASE)
# a deck lighter than plywood for real: steel grating, expanded metal, mesh, plate
# (flattened expanded metal about 0.9 psf, wire mesh less, maker's tables from memory; bar
# grating, checker plate and perforated plank weigh 3 to 10 psf and more, heavier than the
# plywood the rule compares with, so they are not excused)
_LIGHT_DECK = re.compile(r"\b(?:expanded[- ]metal|(?:wire |welded )?mesh)\b", re.IGNORECASE)
_WOOD_DECK = re.compile(r"\b(?:plywood|ply|osb|boards?|planks?|decking|concrete|slab|grout|"
                        r"tiles?|gypcrete|topping)\b", re.IGNORECASE)


def _floor_said(tags, title="", notes="") -> str:
    """What reads the job as a floor, in words ("tag 'platform'", "the words 'loft floor'"):
    a floor tag, or the floor words of the title or notes with nothing there that is no
    floor (a roof, a shelf...); "" where nothing does."""
    normal = {normal_tag(t) for t in tags}
    floor = FLOOR_TAGS.intersection(normal)
    if floor and not (floor <= VEHICLE_DECK_TAGS and VEHICLE_TAGS.intersection(normal)):
        return f"tag {sorted(floor)[0]!r}"
    text = " | ".join(_as_words(t) for t in (title, notes))
    m = _search(_FLOOR_WORDS, text)
    # a vehicle's deck (a trailer's deck boards) is not a building floor; a floor over the van
    # bays is (words placing it by vehicles), and so is one tagged not-vehicle
    on_vehicle = NOT_VEHICLE not in normal and not _BUILDING_FLOOR.search(text) \
        and _VEHICLE_WORDS.search(_VEHICLE_PLACE.sub(" ", text))
    return f"the words {m.group(0)!r}" if m and not _NOT_FLOOR_WORDS.search(text) \
        and not on_vehicle else ""


def _floor_live_limit(r: _Reader, criteria: Criteria, tags, supports, length, title="",
                      notes="") -> Criteria:
    """A floor, mezzanine or platform job (by its tags, not a roof) whose total-load limit is
    looser than L/360 and that names no live-load limit gets the floor's L/360 under live load
    alone as well (IBC 2018 Table 1604.3, from memory), with a warning saying so: a rating on
    L/240 total alone can pass a floor that bounces past L/360 under the people and stock on
    it. Under gravity loads a total limit of L/360 or stricter covers the live one."""
    normal = {normal_tag(t) for t in tags}
    what = _floor_said(tags, title, notes)
    # a rack's or a shelf's "deck" is its decking, and a lifting device is no floor
    if (length is None or "roof" in normal or NOT_FLOOR in normal or not what
            or (RACK_TAGS | SHELF_TAGS).intersection(normal)
            or is_lifting(tags, criteria.lifting)):
        return criteria
    live = LIVE_DEFLECTION_PRESETS["floor"]
    if criteria.live_deflection_ratio is not None:
        if criteria.live_deflection_ratio < live * (1 - 1e-9):
            # looser than a floor's: the code minimum for people and stock on it
            r.hold(f"live_deflection = \"L/{criteria.live_deflection_ratio:g}\" is looser than "
                   f"a floor's L/{live:g} under live load (IBC 2018 Table 1604.3 floor members, "
                   f"from memory), and this member is read as a floor ({what}), so no rating "
                   f"is posted. Write live_deflection = \"L/{live:g}\" (or stricter), or add "
                   f"the tag \"{NOT_FLOOR}\" if people do not walk on it",
                   "criteria.live_deflection",
                   f"live_deflection L/{criteria.live_deflection_ratio:g} is looser than a "
                   f"floor's L/{live:g} (IBC 2018 Table 1604.3). Write L/{live:g}")
        return criteria
    ratio, shown = _ratio_of(criteria, supports, length)
    if not ratio or ratio >= live:
        return criteria
    written = (f"deflection = {shown}" if criteria.deflection_given
               else f"the default L/{ratio:g}")
    r.warn(f"this member is read as a floor ({what}): the live load alone is checked "
           f"against L/{live:g} as well (IBC 2018 Table 1604.3 floor members, from memory), "
           f"besides {written} under dead + live load. Write [criteria] live_deflection = "
           f"\"L/n\" for another live-load limit, deflection = \"floor\" for both, or add the "
           f"tag \"{NOT_FLOOR}\" if people do not walk on it",
           "criteria.deflection" if criteria.deflection_given else "criteria")
    return replace(criteria, live_deflection_ratio=live)


# A hoist trolley's axles are inches apart (a wheelbase of about 6 to 24 in; common
# practice, from memory): a spacing past TROLLEY_SPACING on a lifting job is most likely
# feet typed for inches, and it lets the axles act apart, lowering the moment.
TROLLEY_SPACING = 4 * 0.3048  # m


# A hoist travels its beam: a travel typed in inches that covers less than this part of the
# member is most likely feet typed as inches ("16 in" for "16 ft", "29 in" on a 30 ft beam).
SHORT_TRAVEL = 0.25
# A lifting job's travel over less than this share of the member, in any unit, with no end
# stops said, is a slip too (a digit or a decimal point)
HALF_TRAVEL = 0.5
_END_STOP_WORDS = re.compile(r"\b(?:end[- ]?stops?|(?:travel|rail|trolley|bolted|welded) "
                             r"stops?\b(?! (?:over|above|under|below|beside|in front))|"
                             r"stop (?:angles?|lugs?|blocks?|bolts?|plates?)|bumpers?|"
                             r"buffers?|stoppers?|chocks?)\b", re.IGNORECASE)


def _says_length(words: str, length: float) -> bool:
    """The words give the member's whole length ("end stops at 0 and 16 ft" on a 16 ft
    runway): stops that keep the hoist on the whole of it, not on a short travel."""
    for m in re.finditer(r"(\d+(?:\.\d+)?)\s*(in|ft|mm|cm|m)\b", words):
        said = _said_length(m.group(0))
        if said and abs(said - length) <= 0.02 * length:
            return True
    return False


def _inches_said(travel, words: str) -> bool:
    """The words give each end of a travel typed in inches, in inches ("trolley stops bolted
    at 57 in and 87 in" for travel = ["57 in", "87 in"]): the inches are meant."""
    nums = [m.group(1) for v in travel if isinstance(v, str)
            for m in [re.match(r"\s*(\d+(?:\.\d+)?)", v)] if m]
    if len(nums) != 2:
        return False
    inch = r"\s*(?:in\b\.?|inch(?:es)?\b|\"|'')"
    # both ends in one phrase ("stops at 57 in and 87 in"), measured from where the travel is
    # (not "30 in from the right end", which the travel would then have to say)
    said = re.search(rf"(?<![\d.]){re.escape(nums[0])}{inch}\s*(?:and|to|-|–)\s*"
                     rf"{re.escape(nums[1])}{inch}", words)
    # (from the left end or hanger, where the travel is measured from, is what it says)
    return bool(said) and not re.match(r"\s*(?:from|off|in from|short of) (?:the |each |both |"
                                       r"either |its )?(?!left\b)(?:[\w-]+ )?(?:ends?|sides?|"
                                       r"walls?|stops?|supports?|hangers?|right)\b",
                                       words[said.end():])


def _trolley_spacing(r: _Reader, moving, system: str, raw=None, length=None,
                     words: str = "") -> None:
    """A lifting job's wheel set with its axles feet apart, or its travel typed in inches
    over a few inches of a long member, or over less than half of it with no end stops in
    the `words` (title, notes) or its label: a unit or digit slip that lowers the moment
    (the axles act apart; the hoist kept near a support), so NOT RATED."""
    for ws in moving:
        said = " | ".join(x for x in (words, ws.label or "") if x)
        gaps = [b - a for a, b in zip(ws.offsets, ws.offsets[1:])]
        if gaps and max(gaps) > TROLLEY_SPACING:
            apart = units.fmt(max(gaps), 'length', system)
            r.hold(f"the axles of {ws.label or ws.key} are {apart} "
                   "apart, more than a hoist trolley's wheelbase (inches as a rule): check the "
                   "unit (\"12 in\", not \"12 ft\"); axles far apart act apart and lower the "
                   "moment, so no rating is posted on it (two trolleys tied together need "
                   "their own review); the spacing written is used", f"{ws.key}.spacing",
                   f"the axles of {ws.label or ws.key} are {apart} apart, more than a hoist "
                   "trolley's wheelbase: check the unit of spacing")
        tr = (raw[0].get("travel") if isinstance(raw, list) and raw and _is_table(raw[0])
              else None)
        span = ws.travel[1] - ws.travel[0]
        if isinstance(tr, list) and length and span < SHORT_TRAVEL * length \
                and any(isinstance(v, str) and re.search(r"\d\s*(?:in\b|inch|\"|'')", v)
                        for v in tr) \
                and not any(isinstance(v, str) and re.search(r"ft\b|feet|foot|\d\s*'(?!')", v)
                            for v in tr) \
                and not _inches_said(tr, said):  # "1 ft 4 in" is feet and inches, not a slip
            got = ", ".join(f'"{v}"' for v in tr)
            r.hold(f"travel = [{got}] lets the hoist run over only "
                   f"{units.fmt(span, 'length', system)} of the "
                   f"{units.fmt(length, 'length', system)} member, typed in inches: a hoist "
                   "travels its beam, so this reads like feet typed as inches (\"16 in\" for "
                   "\"16 ft\"), and it keeps the hoist near one place; no rating is posted on "
                   "it. Write the travel in feet, or remove travel to cover the whole beam",
                   f"{ws.key}.travel",
                   f"travel [{got}] covers only {units.fmt(span, 'length', system)} of the "
                   "member, typed in inches: feet meant? Write it in feet")
        elif isinstance(tr, list) and length and span < HALF_TRAVEL * length \
                and not (said and any(
                    not _says_length(said[m.start():][:80].split(".")[0].split(";")[0]
                                     .split("|")[0], length)
                    for m in _END_STOP_WORDS.finditer(said))):
            # "1.6 ft" for "16 ft", "6 ft" for "16 ft": the hoist kept off mid-span, where a
            # runway's moment and sag are largest; real end stops are said in words
            got = ", ".join(f'"{v}"' for v in tr)
            cover = units.fmt(span, 'length', system)
            r.hold(f"travel = [{got}] lets {ws.label or 'the hoist'} run over only {cover} of "
                   f"the {units.fmt(length, 'length', system)} member: a hoist travels its "
                   "runway, and a travel cut short (\"1.6 ft\" for \"16 ft\", a digit "
                   "dropped) keeps it off where the moment and sag are largest, so no rating "
                   "is posted on it. Check the travel; if end stops really keep it there, say "
                   "so in the wheel set's label or the notes (\"end stops at 2 ft and 8 ft\")",
                   f"{ws.key}.travel",
                   f"travel [{got}] covers only {cover} of the member: check it, or name the "
                   "end stops that keep the hoist there")


# A force unit of the metric system: N, kN, MN, N/m, kN/m, N/mm, Pa, kPa, N/m^2 ...
_SI_FORCE = re.compile(r"\d\s*(?:(?:k|M|da)?(?:N|Pa)|kgf?|kilograms?)\b"
                       r"(?:\s*/\s*(?:m|mm|cm)\b)?")
# A dead load lighter than this (a point load in N, a spread load in N/m) is too light to be
# the weight of anything a shop hangs on a member: a unit slip ("-0.08 lbf" for kip,
# "-12.8 N/m" for lbf/ft), and a dead load stays on while the live load is rated
TINY_DEAD_POINT = 4.4482216152605  # 1 lbf, N
TINY_DEAD_LINE = 4.4482216152605 / 0.3048  # 1 lbf/ft, N/m


def _mixed_units(r: _Reader, raw_loads, loads) -> None:
    """A load value whose unit mixes the two systems, as the reader reads it (lbf/m, kN/ft,
    N*ft, however spelt: `units.unit_systems`), or is per yard: read as typed, it is a
    size no one means (a foot's load spread over a metre). A dead one is held (a light dead
    load posts a higher live load), a live one warned."""
    for ld in loads:
        i = _load_index(ld.key)
        raw = raw_loads[i] if i is not None and i < len(raw_loads) else None
        if not _is_table(raw):
            continue
        vals = raw.get("value", raw.get("total"))
        key = f"{ld.key}.{'value' if 'value' in raw else 'total'}"
        texts = [v for v in (vals if isinstance(vals, list) else [vals]) if isinstance(v, str)]
        mixed = [v for v in texts if {"us", "metric"} <= units.unit_systems(v)
                 or "yard" in units.unit_systems(v)]
        if not mixed:
            continue
        said = ", ".join(f'"{v}"' for v in mixed)
        name = ld.key + (f" ({ld.label})" if ld.label else "")
        words = (f"{name} is typed in a unit that mixes US and metric units, or per yard "
                 f"({said}): a force of one system over a length of the other is a slip "
                 "(lbf/m for lbf/ft is 3.28 times too light). Write it all in the job's units "
                 "(lbf/ft, lbf*ft; kN/m, kN*m)")
        if ld.case == "dead":
            r.hold(words + "; the rating holds a dead load fixed, so a light one posts a "
                   "higher live load, and no rating is posted on it", key,
                   f"{name} is typed in a unit that mixes US and metric units ({said}): write "
                   "it in the job's units")
        else:
            r.warn(words, key)


# a point mass (kg, t) or a pressure in kPa: each reads heavier than the US unit it could be
# typed for (lb, psf)
_MASS_POINT = re.compile(r"\d\s*(?:kg|kgs|kilo(?:gram)?s?|t|tonnes?)\s*$", re.IGNORECASE)
_KPA = re.compile(r"\d\s*kpa\s*$", re.IGNORECASE)
_LABEL_KG = re.compile(r"(\d+(?:\.\d+)?)\s*(?:kg|kgs|kilo(?:gram)?s?)\b", re.IGNORECASE)


# a mass given per piece ("two chain blocks, 9 kg each"), and how many pieces the label says
_EACH = re.compile(r"\b(?:each|apiece|a piece|per (?:piece|unit|block|item))\b", re.IGNORECASE)
_COUNT = re.compile(r"\b(?:(\d+)(?!\s*(?:\.\d|kg|kgs|kilo|t\b|ton|tonne|mm|cm|m\b|%))"
                    r"|(two|three|four|five|six|seven|eight|nine|ten|a pair of|both))\b",
                    re.IGNORECASE)
_COUNT_WORDS = {"two": 2, "three": 3, "four": 4, "five": 5, "six": 6, "seven": 7, "eight": 8,
                "nine": 9, "ten": 10, "a pair of": 2, "both": 2}


def _label_mass_agrees(ld) -> bool:
    """Whether the load's label gives a mass (kg) whose weight is the force typed, within 5 %
    ("chain block, 9 kg" beside "-90 N"; several masses, their sum): the newtons are meant.
    A mass given each ("two chain blocks, 9 kg each") is taken times the count the label
    gives; with no count read, it does not agree (the total is not known)."""
    label = ld.label or ""
    masses = [float(m.group(1)) for m in _LABEL_KG.finditer(label)]
    if not masses:
        return False
    if _EACH.search(label) and len(masses) == 1:
        m = _COUNT.search(_LABEL_KG.sub(" ", label))
        n = (int(m.group(1)) if m.group(1) else _COUNT_WORDS[m.group(2).lower()]) if m else 0
        w = n * masses[0] * units.G0
        return n >= 2 and abs(abs(ld.total_force) - w) <= 0.05 * w
    top = max(masses)
    # "block 9 kg, trolley 11 kg": the two together; "9 kg + 11 kg = 20 kg": the total given
    w = (top if len(masses) > 2 and abs(2 * top - sum(masses)) <= 0.01 * top
         else sum(masses)) * units.G0
    return w > 0 and abs(abs(ld.total_force) - w) <= 0.05 * w


def _heavier_is_safe(supports, loads, length, moving: bool) -> bool:
    """Whether a dead load read heavier than meant can only raise the demand: a simple span
    held at its two ends, or a cantilever built in at one end, with every load pushing down
    and no couple (a heavier load there adds to every moment and shear; past a support, on
    another span or against an uplift it can relieve the check that governs)."""
    if moving or length is None or any(ld.kind == "moment" and ld.value for ld in loads):
        return False
    if any(ld.total_force > 0 for ld in loads):
        return False
    tol = 1e-9 * length
    held = [sp for sp in supports if sp.takes_force]
    ends = lambda sp: sp.at <= tol or sp.at >= length - tol  # noqa: E731
    if len(held) == 2 and all(ends(sp) for sp in held) and all(sp.kind in ("pin", "roller")
                                                                for sp in held):
        return True
    return len(held) == 1 and held[0].kind == "fixed" and ends(held[0])


def _dead_load_units(r: _Reader, raw_loads, loads, system: str,
                     lifting: bool = False, supports=(), length=None,
                     moving: bool = False) -> None:
    """A dead load typed in metric force units on a job in US units (N for lbf is 4.45 times
    too light, and the rating counts on the dead load it holds fixed), and a dead load too
    light to be real (under 1 lbf or 1 lbf/ft and under a thousandth of the largest live load):
    a unit slip, so NOT RATED. (A live load in
    the other system's units is left alone: the label posts it in the job's units, and N
    typed for lbf only makes the entered load larger, on the safe side.)"""
    live_max = max((abs(x.total_force) for x in loads if x.case == "live"), default=0.0)
    live_texts = [v for x in raw_loads if _is_table(x) and x.get("case", "live") == "live"
                  for v in ([x.get("value")] if not isinstance(x.get("value"), list)
                            else x.get("value")) + [x.get("total")] if isinstance(v, str)]
    kn_live = any(_KILONEWTON_OR_KG.search(v) for v in live_texts)
    kn_only = any(_KILONEWTON.search(v) for v in live_texts)
    # the dead point loads typed in N, all together (a hoist and a trolley given apart)
    n_dead = sum(abs(x.total_force) for x in loads if x.case == "dead" and x.kind == "point"
                 and (lambda i: i is not None and i < len(raw_loads) and _is_table(
                     raw_loads[i]) and isinstance(raw_loads[i].get("value"), str)
                     and _PLAIN_NEWTON.search(raw_loads[i]["value"]))(_load_index(x.key)))
    for ld in loads:
        i = _load_index(ld.key)
        raw = raw_loads[i] if i is not None and i < len(raw_loads) else None
        if not _is_table(raw):
            continue
        vals = raw.get("value", raw.get("total"))
        texts = [v for v in (vals if isinstance(vals, list) else [vals]) if isinstance(v, str)]
        name = ld.key + (f" ({ld.label})" if ld.label else "")
        metric = [v for v in texts if _SI_FORCE.search(v) or units.unit_systems(v) == {"metric"}]
        if system == "us" and metric and ld.kind != "moment":
            said = ", ".join(f'"{v}"' for v in metric)
            heavier = ld.case == "dead" and all(
                (_MASS_POINT if ld.kind == "point" else _KPA).search(v) for v in metric) \
                and _heavier_is_safe(supports, loads, length, moving)
            if heavier:
                # a mass in kg (t) for lb, a kPa for psf: read heavier than the US unit it
                # could be mistaken for, so the dead load held fixed errs on the safe side
                r.warn(f"{name} is a dead load typed in metric units ({said}) on a job in US "
                       f"units: read as {units.fmt(abs(ld.total_force), 'force', system)}. "
                       "Typed for lb or psf, it would read heavier than meant (1 kg = 2.2 lb, "
                       "1 kPa = 20.9 psf), which on this simple span or cantilever with every "
                       "load pushing down errs on the safe side; write it in lbf (psf) to keep "
                       "the job in one system",
                       f"{ld.key}.value")
                continue
            if ld.case == "dead":
                r.hold(f"{name} is a dead load typed in metric units ({said}) on a job in US "
                       "units: if lbf or lbf/ft was meant, it is 4.45 times too light, and the "
                       "rating holds the dead load fixed, so a light one posts a higher live "
                       "load; no rating is posted on it. Write it in lbf (lbf/ft, psf), or set "
                       "units = \"si\" if the whole job is metric", f"{ld.key}.value",
                       f"{name} is a dead load typed in metric units ({said}) on a job in US "
                       "units: write it in lbf, lbf/ft or psf")
            continue
        if system == "si" and ld.case == "dead" and ld.kind == "point" and kn_live and \
                lifting and any(_PLAIN_NEWTON.search(v) for v in texts) and \
                n_dead < live_max / 50 and not _label_mass_agrees(ld):
            # "-40 N" for a 40 kg hoist beside a hook load in kN: 9.81 times too light (a
            # hoist and trolley weigh some 5 to 10 % of what they lift; a light fixture in N
            # beside a shelf's load in kN is real, so only a lifting job's hoist is held)
            said = ", ".join(f'"{v}"' for v in texts)
            r.hold(f"{name} is a dead load typed in N ({said}) beside live loads in kN (or kg, "
                   "t), and with the job's other dead point loads in N under a fiftieth of the "
                   "largest: if kg was meant (a hoist's or a deck's "
                   "weight), it is 9.81 times too light, and the rating holds the dead load "
                   "fixed, so a light one posts a higher live load; no rating is posted on "
                   "it. Write it in kg (kg/m) or kN, as meant (a weight that really is so "
                   "many newtons: in kN, e.g. \"-0.11 kN\" for 110 N)", f"{ld.key}.value",
                   f"{name} is a dead load in N beside live loads in kN: write it in kg or "
                   "kN, as meant")
            continue
        if system == "si" and ld.case == "dead" and ld.kind != "moment" and kn_only and \
                any(_PLAIN_KG.search(v) for v in texts) and \
                0 < abs(ld.total_force) < live_max / 50:
            # "-3 kg/m" for a grating of 3 kN/m beside live loads in kN: 102 times too light;
            # a light fixture in kg beside a shelf's load in kN is real, so it is said only
            said = ", ".join(f'"{v}"' for v in texts)
            r.warn(f"{name} is a dead load typed in kg ({said}) beside live loads in kN, and "
                   "under a fiftieth of the largest: if kN (kN/m) was meant, it is 102 times "
                   "too light, and the rating holds the dead load fixed, so a light one posts "
                   "a higher live load. Check its unit (a kilonewton is about 102 kg)",
                   f"{ld.key}.value")
            continue
        us = [v for v in texts if _US_FORCE.search(v)]
        if system == "si" and us and ld.case == "dead" and ld.kind != "moment":
            # the mirror of the US job's dead load in N: lbf for kg is 2.2 times too light
            said = ", ".join(f'"{v}"' for v in us)
            r.hold(f"{name} is a dead load typed in US units ({said}) on a job in metric "
                   "units: if kg or N was meant it is the wrong size, and the rating holds the "
                   "dead load fixed, so a light one posts a higher live load; no rating is "
                   "posted on it. Write it in kg (kg/m) or N (kN, kN/m), or set units = \"us\" "
                   "if the whole job is in feet and pounds", f"{ld.key}.value",
                   f"{name} is a dead load typed in US units ({said}) on a metric job: write "
                   "it in kg, N or kN")
            continue
        if ld.case != "dead" or ld.kind == "moment" \
                or any(p.key == f"{ld.key}.value" for p in r.problems):  # said already
            continue
        # a light fitting (an LED strip, a clip) is real: only a dead load under a
        # thousandth of the largest live load is too light to be what was meant
        if abs(ld.total_force) >= 1e-3 * live_max:
            continue
        if ld.kind == "point":
            tiny = 0 < abs(ld.value) < TINY_DEAD_POINT
            limit = units.fmt(TINY_DEAD_POINT, "force", system)
        else:
            w = max(abs(ld.w1), abs(ld.w2 if ld.kind == "linear" else ld.w1))
            tiny = 0 < w < TINY_DEAD_LINE
            limit = units.fmt(TINY_DEAD_LINE, "line_load", system)
        if tiny:
            r.hold(f"{name} is a dead load of under {limit}, too light to be the weight of a "
                   "hoist, a deck or a fixture: a unit slip is likely ("
                   + ('"-0.08 N" for "-0.08 kN"' if system == "si" else
                      '"-0.08 lbf" for "-0.08 kip"')
                   + "), and the rating holds the dead load fixed, so a light one "
                   "posts a higher live load; no rating is posted on it. Check the unit, or "
                   "leave the load out if it really is this light", f"{ld.key}.value",
                   f"{name} is a dead load under {limit}: check its unit, or leave it out "
                   "if it really is this light")


_US_FORCE = re.compile(r"\d\s*(?:lbf?s?|pounds?|kips?|k|#|plf|klf|pli|psf|ksf)\b"
                       r"|\d\s*(?:lbf?|kips?)\s*/", re.IGNORECASE)
_PLAIN_NEWTON = re.compile(r"\d\s*N(?:\s*/\s*m)?\s*$")  # "40 N", "80 N/m", not kN
_KILONEWTON = re.compile(r"\d\s*(?:kN|kPa)\b")
# a live load typed in kN or, on a lifting job, its hook load in kg or tonnes
_KILONEWTON_OR_KG = re.compile(r"\d\s*(?:kN|kg|t|tonnes?)\b")
# a spread load in kg per length or per area ("3 kg/m", "30 kg/m^2"): a point load in kg (a
# shelf board, a hoist) is a weight as typed
_PLAIN_KG = re.compile(r"\d\s*kg\s*/\s*(?:m|m\^?2|m\u00b2|sq\.? ?m)\s*$")


# A length or force unit of the other system than the job's (metric among feet and lbf, or
# feet and lbf among metres and N): mixed in one job, the odd one out is a likely slip
_METRIC_UNIT = re.compile(r"\d\s*(?:mm|cm|m|(?:k|M)?N(?:\s*/\s*m)?|(?:k|M)?Pa)\b")
_US_UNIT = re.compile(r"(?:\d\s*(?:in|inch\w*|ft|feet|foot|lbf?|lbs|kips?|psf|plf|klf)\b|"
                      r"\d\s*['\"\u2032\u2033])")
_MIXED_KEYS = {"beam": ("length", "braces", "bearing"), "supports": ("at", "bearing"),
               "loads": ("at", "start", "end", "value", "width", "total", "bearing"),
               "criteria": ("deflection",), "moving": ("loads", "dead", "spacing", "travel")}


def _mixed_unit_systems(r: _Reader, data: dict, system: str) -> None:
    """Positions, lengths, loads and limits typed in the other unit system than the job's
    (`units`): warned once, naming them, since one value in mm or kN among feet and lbf is
    most often a slip (a deflection limit of "0.25 mm" for "0.25 in", a vise of "-450 kN" for
    lbf); it is read as written, and no rating is posted until it is in the job's units."""
    other = _METRIC_UNIT if system == "us" else _US_UNIT
    found: list[tuple[str, str]] = []

    def look(key: str, v) -> None:
        for i, x in enumerate(v if isinstance(v, list) else [v]):
            if isinstance(x, str) and re.fullmatch(r"\s*[-+]?(?:0+\.?0*|\.0+)\s*[^\d.\s].*", x):
                continue  # zero is zero in either system ("0 ft" on a metric job)
            if isinstance(x, str) and other.search(x):
                found.append((key if not isinstance(v, list) else f"{key}[{i}]", x))

    for table, keys in _MIXED_KEYS.items():
        t = data.get(table)
        rows = [(table, t)] if _is_table(t) else (
            [(f"{table}[{i}]", x) for i, x in enumerate(t) if _is_table(x)]
            if isinstance(t, list) else [])
        for where, row in rows:
            for k in keys:
                if k in row:
                    look(f"{where}.{k}", row[k])
    # a key refused, or already said to be in the wrong unit, is not named again (another
    # warning on it, a floor's live-load limit beside a limit typed in cm, is no reason)
    said = {p.key for p in r.problems if not p.warning or "unit" in p.message}
    found = [(k, v) for k, v in found if k.split("[")[0] not in said and k not in said]
    if not found:
        return
    shown = "; ".join(f"{k} = {v!r}" for k, v in found[:4]) + (
        f" and {len(found) - 4} more" if len(found) > 4 else "")
    mine, theirs = (("US", "metric") if system == "us" else ("metric (si)", "US"))
    fix = (", or set units = \"si\" if the job is metric" if system == "us" else
           ", or set units = \"us\" if the job is in feet and pounds")
    # a length or a position is held, not only warned: a load placed at "1.2 m" for 1.2 ft
    # sits 3.3 times further out (a cantilever's tip load slipped toward its root posts a
    # figure far too high), a limit in mm for in is another member's. A live load's size is
    # only warned: the label posts what the member carries, k times it, whatever its unit
    # (a dead load's is held by `_dead_load_units`)
    placed = [(k, v) for k, v in found if not re.search(r"\.(?:value|total|loads|dead)\b", k)]
    said = (f"typed in {theirs} units on a job in {mine} units: {shown}; each is read as "
            f"written, but one value in the other system is most often a slip (\"0.25 mm\" "
            f"for \"0.25 in\", \"1.2 m\" for 1.2 ft, \"-450 kN\" for lbf)")
    if placed:
        where = "; ".join(f"{k} = {v!r}" for k, v in placed[:3])
        r.hold(said + ", and no rating is posted while a length or position is in the other "
               "system: check the unit" + fix, placed[0][0],
               f"a length or position is typed in {theirs} units on a job in {mine} units "
               f"({where}): write it in the job's units" + fix)
    else:
        r.warn(said + ": check the unit" + fix, found[0][0])


def _moving_dead_units(r: _Reader, raw_moving, moving, system: str) -> None:
    """A [[moving]] set's dead wheel loads (the trolley and hoist's own weight) typed in
    metric units on a job in US units, or under 1 lbf a wheel: as `_dead_load_units` (the
    rating holds them fixed, so a light one posts more): NOT RATED."""
    if not moving or not (isinstance(raw_moving, list) and raw_moving
                          and _is_table(raw_moving[0])):
        return
    ws, raw = moving[0], raw_moving[0].get("dead")
    name = ws.key + (f" ({ws.label})" if ws.label else "")
    texts = [v for v in (raw if isinstance(raw, list) else [raw]) if isinstance(v, str)]
    metric = [v for v in texts if _SI_FORCE.search(v)]
    if system == "us" and metric:
        said = ", ".join(f'"{v}"' for v in metric)
        r.hold(f"the dead wheel loads of {name} are typed in metric units ({said}) on a job "
               "in US units: if lbf was meant, they are 4.45 times too light, and the rating "
               "holds the trolley's weight fixed, so a light one posts a higher hook load; no "
               "rating is posted on it. Write them in lbf", f"{ws.key}.dead",
               f"the dead wheel loads of {name} are typed in metric units ({said}) on a job "
               "in US units: write them in lbf")
    elif any(0 < abs(d) < TINY_DEAD_POINT for d in ws.dead):
        r.hold(f"a dead wheel load of {name} is under "
               f"{units.fmt(TINY_DEAD_POINT, 'force', system)}, too light to be a trolley's "
               "weight: a unit slip is likely, and the rating holds it fixed; no rating is "
               "posted on it. Check the unit, or leave dead out if the trolley weighs nothing "
               "worth counting", f"{ws.key}.dead",
               f"a dead wheel load of {name} is under 1 lbf: check its unit, or leave it out")


# Words in a load's label or the notes that say its figure is already one member's share
_PER_MEMBER = re.compile(r"\bper (?:beam|member|rail|arm|joist|stringer)\b(?! pair| set)",
                         re.IGNORECASE)


def _per_member_loads(r: _Reader, raw_loads, members) -> None:
    """`members` > 1 divides every load among the members; a load whose own label says it is
    already per beam (or per member, per rail) would be divided twice, and the label would
    post a member's share as the pair's: NOT RATED until the two agree."""
    if not isinstance(members, int) or members <= 1:
        return
    said = [f"loads[{i}] ({ld.get('label')})" for i, ld in enumerate(raw_loads)
            if _is_table(ld) and isinstance(ld.get("label"), str)
            and _search(_PER_MEMBER, _as_words(ld["label"]))]
    if said:
        r.hold(f"members = {members} divides every load among {members} identical members, "
               f"but {', '.join(said[:3])} say{'s' if len(said) == 1 else ''} the load is "
               "already one member's: it would be divided twice, and the label would post a "
               "member's share as the whole. Enter the loads for all the members together "
               "(the pair's, the level's), or write members = 1 and rate one member",
               f"{said[0].split(' ')[0]}.label",
               f"members = {members}, but {said[0]} is labelled as one member's load: enter "
               "the loads for all the members, or members = 1")


_PALLET = re.compile(r"\b(?:pallet|palette|skid)s?(?![- ]?(?:jacks?|trucks?|wrap))",
                     re.IGNORECASE)
_PAIR = re.compile(r"\b(?:pair|front and (?:back|rear)|front & (?:back|rear)|two beams|"
                   r"2[- ]?beams?|twin beams?|double beams?)\b", re.IGNORECASE)
# the member is not one of a level's beams: an arm, a support bar, a deck support
_NOT_LEVEL_BEAM = re.compile(r"\b(?:arms?|support bars?|pallet supports?|deck supports?|"
                             r"cross ?bars?|drums? supports?|stringers?)\b", re.IGNORECASE)
# words giving a count of members other than a pair ("three rails", "two pairs")
_OTHER_COUNT = re.compile(r"\b(?:(?:three|four|five|six|seven|eight|nine|ten|[3-9]|1\d)\s+"
                          r"(?:\w+\s+)?(?:rails?|beams?|brackets?|members?|bars?|joists?|arms?|"
                          r"stringers?)|(?:two|2|several|three|3) pairs|pairs of|in pairs|"
                          r"middle (?:rail|beam|bar))\b", re.IGNORECASE)


def _plain_found(words: re.Pattern, title, notes, tags, raw_loads) -> list[str]:
    """`_words_found` read plainly: "no damaged pallets" still speaks of pallets."""
    return _words_found(words, title, notes, tags, raw_loads, deny=False)


# Past these counts a rack bay's levels, or a shelf's or rack's members sharing one load, are
# a slip of the count (common practice, no source): the label's totals grow with them
MAX_PLAUSIBLE_LEVELS = 12
MAX_SHELF_MEMBERS = 8


def _shelf_members(r: _Reader, tags, raw_loads, members, section, system: str) -> None:
    """A shelf's or rack's members sharing its load: more than MAX_SHELF_MEMBERS, or more
    than fit side by side in the loaded width (its width / members under the member's own
    width), is a slip of the count ("20" for "2"), and the label's per-shelf figure grows
    with it: NOT RATED."""
    if not isinstance(members, int) or isinstance(members, bool) or members < 2:
        return
    tagset = {normal_tag(t) for t in tags}
    shelf = bool(tagset & (SHELF_TAGS | RACK_TAGS | _SHELF_WORDS))
    own = getattr(section, "width", 0.0) or getattr(section, "depth", 0.0) or 0.0
    widths = []
    for ld in raw_loads if isinstance(raw_loads, list) else ():
        if _is_table(ld) and isinstance(ld.get("width"), str):
            try:
                widths.append(units.parse(ld["width"], "length", "width"))
            except InputError:
                pass
    crowded = [w for w in widths if own > 0 and w / members < own]
    if (shelf and members > MAX_SHELF_MEMBERS) or crowded:
        why = (f"{members} members of {units.fmt(own, 'small_length', system)} cannot sit side "
               f"by side under a {units.fmt(crowded[0], 'small_length', system)} wide load"
               if crowded else f"a shelf or rack of more than {MAX_SHELF_MEMBERS} members "
               "sharing one load evenly is far past shop practice (common practice, no "
               "source)")
        r.hold(f"members = {members}: {why}, and the label's figure for them all grows with "
               "the count, so no rating is posted. Check the count (2 for 20?), or rate one "
               "member with its own share of the load (members = 1)", "beam.members",
               f"members = {members} is past what the shelf or its loaded width holds: check "
               "the count")


def _rack_members(r: _Reader, title, notes, tags, raw_loads, members, supports) -> None:
    """A pallet-rack level rests on a front and a back beam: `members` = 2. More beams than
    that sharing the level evenly is a slip of the count (20 for 2, or beams of several levels
    counted as one level's), and the label's per-level figure grows with it: NOT RATED. A job
    that says "pair" (or front and back) with another count is held the same way. Not for an
    arm, a support bar or a cantilever (no beams of a level), nor where the words give another
    count ("three rails", "two pairs")."""
    if not isinstance(members, int) or isinstance(members, bool) or members < 1:
        return
    held = {round(sp.at, 9) for sp in supports if sp.takes_force}
    if len(held) < 2 or _plain_found(_NOT_LEVEL_BEAM, title, "", (), ()):
        return  # a cantilever arm, or a member that is not a level's beam
    if _plain_found(_OTHER_COUNT, title, notes, (), raw_loads):
        return  # the job counts its members itself
    pallet = _plain_found(_PALLET, title, notes, tags, raw_loads)
    pair = _plain_found(_PAIR, title, notes, (), raw_loads)
    if pallet and members > 2:
        r.hold(f"members = {members} shares each level's load evenly among {members} beams, "
               f"but the job is a pallet rack ({pallet[0]}), whose level rests on a front and a "
               "back beam (members = 2); pallets do not spread evenly onto more beams, and the "
               "label's per-level figure grows with the count, so no rating is posted. Write "
               "members = 2 for a beam pair, or rate one beam with its own share of the load "
               "(members = 1)", "beam.members",
               f"members = {members} on a pallet rack ({pallet[0]}), whose level rests on a "
               "front and back beam: write members = 2, or rate one beam with its own share "
               "(members = 1)")
    elif pair and members > 2:
        r.hold(f"members = {members}, but the job says it is a pair ({pair[0]}): the load is "
               f"shared evenly among {members} members and the label's figure for them all "
               "grows with the count, so no rating is posted. Write members = 2 for a pair, "
               "or say the count in the title (\"three rails\")", "beam.members",
               f"members = {members}, but the job says it is a pair ({pair[0]}): write "
               "members = 2")
    elif pallet and members == 1 and _plain_found(_PAIR, title, "", (), ()):
        r.warn(f"members = 1, but the title says a pair ({pair[0]}): the loads entered are "
               "taken by one beam alone (the figure is for one beam carrying them all, on the "
               "low side). Write members = 2 if the loads are the pair's", "beam.members")


# A point load's words that say something spreads it over the members (a pallet or a deck
# across them, a spreader or cross-bar)
_SHARED_WORDS = re.compile(r"\b(?:shared?|spread|across|both (?:rails|beams|members)|"
                           r"spreaders?|cross[- ]?"
                           r"bars?|pallets?|skids?|decks?|boards?|sheets?|plates?|per (?:rail|"
                           r"beam|member|arm))\b", re.IGNORECASE)


# Words that count the arms sharing a load ("three arms under each pallet", "both arms")
_ARM_COUNT = re.compile(r"\b(?:two|both|three|four|five|six|seven|eight|[2-9]|1\d|a pair of|"
                        r"pairs? of)\s+(?:(?!ft\b|feet\b|in\b|inch\w*|mm\b|m\b)\w+\s+)?arms\b",
                        re.IGNORECASE)


def _members_uneven(r: _Reader, tags, raw_loads, loads, members, supports, title="",
                    notes="") -> None:
    """`members` > 1 shares every load evenly among the members, and the label posts the
    figure for them all. A cantilever rack's arms do not share a bundle evenly (it bears on
    them as it lies, and a load already given as one arm's share is divided again): warned,
    unless the title or notes count the arms that share it ("three arms under each pallet").
    A point load bears on
    one member unless something spreads it (a vise bolted to the front rail): warned, naming
    it, unless its label says what spreads it."""
    if not isinstance(members, int) or isinstance(members, bool) or members < 2:
        return
    held = {round(sp.at, 9) for sp in supports if sp.takes_force}
    rack = RACK_TAGS.intersection(normal_tag(t) for t in tags if isinstance(t, str))
    if len(held) == 1 and rack and not _plain_found(_ARM_COUNT, title, notes, (), ()):
        # (where the words count the arms, "three arms under each pallet", it is meant)
        r.warn(f"members = {members} shares the load entered evenly among {members} arms of a "
               "cantilever rack, and the label posts it for all of them: the load entered "
               "must be the whole bundle or pallet the arms share (one arm's share already, "
               "as a preset for one arm gives it, would be divided again, and the posted "
               "figure would be that many times too high). If it is one arm's share, write "
               "members = 1; say the count in the notes (\"three arms under each pallet\") "
               "and this warning goes", "beam.members")
        return
    normal = {normal_tag(t) for t in tags if isinstance(t, str)}
    if (SHELF_TAGS | FLOOR_TAGS | RACK_TAGS) & normal or re.search(
            r"\bshel(?:f|ves|ving)\b", f"{title} {notes}", re.IGNORECASE) or re.search(
            r"\bdeck", title or "", re.IGNORECASE):
        return  # a box on a shelf, a pallet on a deck: the deck spreads it to the members
    for ld in loads:
        if ld.kind != "point" or ld.case != "live" or not ld.value:
            continue
        if ld.label and _SHARED_WORDS.search(_as_words(ld.label)):
            continue
        name = ld.key + (f" ({ld.label})" if ld.label else "")
        r.warn(f"members = {members} shares every load evenly among {members} members, the "
               f"point load {name} too, and the label posts it for them all: a point load "
               "bears on the one member under it unless something spreads it (a vise or a "
               "hoist on the front rail bears on that rail). If it bears on one, rate that "
               "member with members = 1; if a deck or cross-bar spreads it, say so in its "
               "label", f"{ld.key}.value")
        return


def _said_key(said: str) -> str:
    """The job-file key a `_words_found` entry names ("title: ...", "loads[2] is ...")."""
    if said.startswith("loads["):
        return said.split(" ", 1)[0] + ".label"
    return "tags" if said.startswith("tag") else said.split(":", 1)[0]


_STEP_BEAM = re.compile(r"\b(?:step(?:ped)?[- ]?(?:type[- ]?)?(?:box[- ]?)?beams?|"
                        r"step[- ]type|beams? with (?:a |an? [\w/\- ]{1,14} )?step|"
                        r"box beams? with [\w/\- ]{0,14}step)\b", re.IGNORECASE)
_STEP_TAG = re.compile(r"^(?:step|step[- ]?beams?|stepped)$", re.IGNORECASE)
# the member replaces or sits beside step beams: the words are about other members
_STEP_OTHER = re.compile(r"\b(?:replac\w*|instead of|between|into|under|in place of|"
                         r"beside|on|onto|of the)\s+(?:the\s+)?(?:\w+\s+){0,3}step",
                         re.IGNORECASE)


def _step_beam(r: _Reader, title, notes, tags, raw_loads, section) -> None:
    """A pallet-rack step beam, named by the job's title, a tag or a load label: its deck or
    pallets bear on the step along one edge, off the shear centre, which twists it, and its
    roll-formed section (a step in a box or channel, cold-formed: AISI S100) is not the
    section entered, whatever that is (a tube, a channel). Neither is checked here, so no
    rating is posted on it. Words that place the member beside, into or instead of step
    beams ("set into the step of the front beam", "replacing the step beams") are about its
    neighbours, and an arm or support bar is not one.)"""
    if _plain_found(_NOT_LEVEL_BEAM, title, "", (), ()):
        return  # a support bar or an arm: the step beams are its neighbours
    said = [f"tag {t!r}" for t in tags if isinstance(t, str) and _STEP_TAG.match(t.strip())]
    for key, text in (("title", title), ("notes", notes)):
        words = _as_words(text)
        m = _search(_STEP_BEAM, words)  # "no step beams in this bay" denies it
        if m and not _STEP_OTHER.search(words):
            said.append(f"{key}: {m.group(0)!r}")
    for i, ld in enumerate(raw_loads if isinstance(raw_loads, list) else ()):
        label = ld.get("label") if _is_table(ld) else None
        if isinstance(label, str) and _STEP_BEAM.search(_as_words(label)):  # (a load sits on
            # the member: "pallet on the step beams" names it)
            said.append(f"loads[{i}] is labelled {label!r}")
            break
    if not said:
        return
    r.hold(f"the job names a step beam ({said[0]}): its deck or pallets bear on the step along "
           "one edge, off the shear centre, and twist it (torsion, not checked here), and a "
           "roll-formed step section is cold-formed steel (AISI S100) with the step formed "
           "out of the section, not the section entered; no rating is posted. Post the rack "
           "maker's rated capacity for the beam, or have it checked", _said_key(said[0]),
           f"a step beam ({said[0]}): the load on its step twists it and its cold-formed "
           "section is not the one entered; neither is checked here")


def _rack_impact_slip(r: _Reader, criteria, tags, loads) -> None:
    """A storage rack's impact allowance under ANSI MH16.1's 25 % of one unit load (from
    memory), spread over the unit loads entered (12.5 % of two pallets), but above zero: a
    slip ("2.5%" for "25%"), so NOT RATED; "0%" said on purpose is the label's NO IMPACT."""
    imp = criteria.impact
    if not imp or not RACK_TAGS.intersection(normal_tag(t) for t in tags) or imp < 0.01:
        return  # none, not a rack, or under 1 % (held already)
    # a rack level holds two unit loads at least (one spread load entered for both)
    units_on = max(2, sum(1 for ld in loads if ld.case == "live" and ld.kind != "moment"))
    least = 0.25 / units_on
    if imp < least * (1 - 1e-9):
        r.hold(f"impact = {imp * 100:g} % is less than ANSI MH16.1's 25 % of one unit load "
               f"(from memory) over the {units_on} live load{'s' if units_on > 1 else ''} "
               f"entered ({least * 100:.3g} %): a slip (\"2.5%\" for \"25%\")? No rating "
               "is posted on it: write the allowance (\"25%\"), or \"0%\" if the rack takes "
               "none", "criteria.impact",
               f"impact = {imp * 100:g} % is under MH16.1's 25 % of one unit load "
               f"({least * 100:.3g} % here): write \"25%\", or \"0%\" for none")


def _root_at_the_right(r: _Reader, supports, loads, length, system: str) -> None:
    """A cantilever held only by a fixed end at its right end, all of whose loads sit in the
    half by that end: positions are measured from the left end (0), so loads typed as their
    reach from the root ("35 in" on a 36 in arm) land next to the root and the arm is rated
    as if they were. Warned (a load truly near the root is rated the same either way)."""
    held = [sp for sp in supports if sp.takes_force]
    if length is None or len(held) != 1 or held[0].kind != "fixed":
        return
    root = held[0].at
    if root < length * (1 - 1e-9):
        return
    live = [ld for ld in loads if ld.case == "live" and (ld.total_force or ld.kind == "moment")]
    far = [ld for ld in live if (ld.at if ld.kind in ("point", "moment") else ld.start)
           < length / 2]
    if live and not far:
        where = units.fmt(root, "length", system)
        r.warn(f"the only support is a fixed end at the right end ({where}), and every live "
               "load sits in the half next to it: positions are measured from the left end "
               "(0), so a load typed as its reach from the root lands next to the root, where "
               "the arm carries it easily. Check them: put the fixed end at 0 (the root on "
               "the left) if the positions are reaches from the root",
               held[0].key + ".at")


# a position's unit and the one a slip puts in its place: "3 in" for "3 ft", "4 mm" for "4 m"
_UNIT_TWINS = {"in": ("ft", 0.3048), "inch": ("ft", 0.3048), "inches": ("ft", 0.3048),
               "mm": ("m", 1.0), "cm": ("m", 1.0)}
_PLAIN_POSITION = re.compile(r"\s*([0-9]*\.?[0-9]+)\s*([A-Za-z]+)\s*")
_BIG_WORDS = {"ft": "feet", "m": "metres"}


def _unit_twin(text):
    """(number as typed, small unit as typed, large unit, the number read in the large unit,
    m) of a place typed plainly in a small unit ("3 in"), else None."""
    m = _PLAIN_POSITION.fullmatch(text) if isinstance(text, str) else None
    if not m or m.group(2).lower() not in _UNIT_TWINS:
        return None
    big, size = _UNIT_TWINS[m.group(2).lower()]
    return m.group(1), m.group(2), big, float(m.group(1)) * size


def _unit_twin_support(r: _Reader, raw_supports, length, system: str) -> None:
    """A support's place typed in the small unit whose number is the member's length in the
    large one ("12 in" on a 12 ft joist): read as written, the member becomes a short span
    with a long overhang. NOT RATED until written so that it cannot be that slip."""
    if length is None or not isinstance(raw_supports, list):
        return
    for i, raw in enumerate(raw_supports):
        twin = _unit_twin(raw.get("at")) if _is_table(raw) else None
        if twin is None or abs(twin[3] - length) > 1e-6 * length:
            continue
        num, small, big, _meant = twin
        key = f"supports[{i}].at"
        r.hold(f"{key} = {raw['at']!r}: {num} is the member's length in {_BIG_WORDS[big]} "
               f"({num} {big}), typed with {small}. Read as written, the support "
               f"sits {units.fmt(units.parse(raw['at'], 'length'), 'length', system)} from "
               "the left end and the rest of the member is an overhang, so no rating is "
               f"posted. If {num} {big} is meant, write it so; if the place is right, "
               "write it in the length's unit", key,
               f"{key} = {raw['at']!r} is the member's length in {_BIG_WORDS[big]} typed with "
               f"{small}: write the place meant")


def _unit_twin_slip(r: _Reader, raw_loads, supports, length, system: str) -> bool:
    """A load position or end typed in the small unit whose number is the member's length,
    or a support's place, in the large one: "3 in" on a 3 ft (36 in) arm, end = "14 in" on
    a 14 ft platform beam. Read as written, the load sits next to the root or over a sliver
    of the span and the figure posted is several times what the member carries; a shop
    means the large unit. NOT RATED until the position is written so that it cannot be that
    slip (in the large unit, "0.25 ft", or as the length meant). True where one was found."""
    if length is None or not isinstance(raw_loads, list):
        return False
    marks = [length] + [sp.at for sp in supports if sp.at > 0]
    held = [sp.at for sp in supports if sp.takes_force]
    free_end = not any(abs(x - length) <= 1e-6 * length for x in held)
    found = False
    for i, raw in enumerate(raw_loads):
        if not _is_table(raw):
            continue
        for k in ("at", "start", "end"):
            twin = _unit_twin(raw.get(k))
            if twin is None:
                continue
            num, small, big, meant = twin
            # the slip's reading must be a place the load could be meant at: a spread load
            # does not start at the member's far end ("4 in" as the start of a load on a 4 ft
            # arm is a place by the root, meant), and a point load typed for a support's place
            # or a held end would go straight into it ("6 in" for a vise on a 6 ft rail held
            # at both ends is meant): only a free end, a cantilever's tip, is its twin
            near = (marks[1:] if k == "start" else
                    ([length] if free_end else []) if k == "at" else marks)
            if meant <= 0 or not any(abs(meant - x) <= 1e-6 * length for x in near):
                continue
            what = "length" if abs(meant - length) <= 1e-6 * length else "support place"
            key = f"loads[{i}].{k}"
            read = units.parse(raw[k], "length")
            verb = {"at": "sits", "start": "starts", "end": "ends"}[k]
            r.hold(f"{key} = {raw[k]!r}: {num} is the member's {what} in "
                   f"{_BIG_WORDS[big]} ({num} {big}), typed with {small}. Read as "
                   f"written, the load {verb} "
                   f"{units.fmt(read, 'length', system)} from the left end and the member is "
                   f"rated as if it did, so no rating is posted. If {num} {big} is "
                   "meant, write it so; if the position is right, write it in the length's "
                   "unit, so that it cannot be read as that slip", key,
                   f"{key} = {raw[k]!r} is the member's {what} in {_BIG_WORDS[big]} typed "
                   f"with {small}: write the position meant")
            found = True
            break
    return found


# Words that place a cantilever's load by its root ("near the wall", "6 in from the post")
_ROOT_NOUNS = (r"(?:wall|root|post|column|mast|upright|base|fixed end|support|face|weld|"
               r"heel|(?:mounting|base|wall|end|back) ?plate|bracket|clamp)s?")
_BY_THE_ROOT = re.compile(
    r"\b(?:near|close to|next to|by|beside|against|right at|hard by|tight to) (?:the |its |"
    r"their )?" + _ROOT_NOUNS + r"\b|\bat (?:the |its )?(?:wall|root|weld|heel|face|"
    r"fixed end)s?\b", re.IGNORECASE)  # ("at the column": where the arm is bolted, often)
# "6 in from the wall": a distance that places the load, read to compare with where it is
_FROM_THE_ROOT = re.compile(
    r"(\d+(?:\.\d+)?(?:[ -]\d+/\d+)?)\s*(in|inch(?:es)?|\"|ft|feet|foot|'|mm|cm|m)\.?\s+"
    r"(?:out )?(?:from|off|"
    r"out from|away from) (?:the |its )?" + _ROOT_NOUNS + r"\b", re.IGNORECASE)


def _placed_by_the_root(words: str, reach: float) -> bool:
    """The job's words place its load by the root: "near the wall", "close to the weld",
    or a distance from it ("6 in from the wall") within a tenth of the reach of where the
    farthest live load is (`reach`, m)."""
    if _BY_THE_ROOT.search(words):
        return True
    for m in _FROM_THE_ROOT.finditer(words):
        said = _said_length(f"{m.group(1)} {m.group(2)}")
        if said and abs(said - reach) <= 0.1 * max(reach, said):
            return True
    return False


def _said_length(text: str) -> float | None:
    """A length written in words ("4-1/2 in", "16 ft"), read as a job's lengths are (m);
    None where it does not read as one."""
    try:
        return units.parse(text.replace('"', "in").replace("'", "ft"), "length")
    except InputError:
        return None


def _root_at_the_left_loads_by_it(r: _Reader, supports, loads, length, system: str,
                                  title="", notes="") -> None:
    """A cantilever held only by a fixed end at its left end (0), every live load of which
    sits in the quarter of the reach next to that root: an arm's loads sit out along it, and
    a position typed in the wrong unit or short a digit ("3 in" for "34 in") lands there,
    where the arm carries it easily. Held: the figure posted would be for loads by the root,
    many times what the arm carries out along it (a load truly by the root is rated right
    by an arm no longer than its loads reach). A spread live load from the root over under a
    quarter of the reach, where other live loads reach out past half of it, is warned (a
    snow load's "0.4 ft" for "4 ft")."""
    held = [sp for sp in supports if sp.takes_force]
    if length is None or len(held) != 1 or held[0].kind != "fixed" or held[0].at > 1e-9 * length:
        return
    live = [ld for ld in loads if ld.case == "live" and ld.total_force]
    reach = [(ld.at if ld.kind == "point" else ld.end) for ld in live]
    if any(x <= 1e-9 * length for x in reach):
        return  # a load on the root itself: the at-support rule names it
    if live and max(reach) <= length / 4 * (1 + 1e-9):
        far = units.fmt(max(reach), 'length', system)
        # each load's own label places it there (the title and notes most often speak of
        # how the arm is fixed: "welded at its inboard end", "against the wall")
        if all(isinstance(ld.label, str) and _placed_by_the_root(_as_words(ld.label), x)
               for ld, x in zip(live, reach)):  # the job says its loads sit there
            r.warn(f"the only support is a fixed end at 0 and every live load sits within a "
                   f"quarter of the reach from it (the farthest at {far}), as the job's words "
                   "say; the figure posted is for loads there, not out along the arm",
                   live[0].key + (".at" if live[0].kind == "point" else ".end"))
            return
        r.hold(f"the only support is a fixed end at 0 and every live load sits within a "
               f"quarter of the reach from it (the farthest at {far} of "
               f"{units.fmt(length, 'length', system)}): an arm's loads sit out along it, and "
               "one typed in the wrong unit or short a digit (\"3 in\" for \"34 in\") lands "
               "by the root, where the arm carries it easily, so the figure posted would be "
               "many times what it carries out along it; no rating is posted. Check the "
               "positions; if the loads really sit there, give the member's length as far as "
               "they reach (the arm beyond carries only its own weight)",
               live[0].key + (".at" if live[0].kind == "point" else ".end"),
               f"every live load sits within a quarter of the cantilever's reach from its root "
               f"(the farthest at {far}): a position typed in the wrong unit or short a digit?")
        return
    for ld in live:  # one spread load cut short by the root while the others reach out
        if ld.kind in ("uniform", "linear") and ld.start <= length / 10 \
                and ld.end <= length / 4 * (1 + 1e-9) \
                and any(x > length / 2 for o, x in zip(live, reach) if o is not ld):
            name = f"{ld.key}{f' ({ld.label})' if ld.label else ''}"
            said = f"{name} runs by the root only, to {units.fmt(ld.end, 'length', system)} " \
                   f"of the {units.fmt(length, 'length', system)} reach, while other live " \
                   "loads reach out past half of it: a spread load on an arm most often runs " \
                   "out along it, and an end typed short a digit or in the wrong unit " \
                   "(\"0.4 ft\" for \"4 ft\") puts it by the root, where the arm carries it " \
                   "many times over"
            if isinstance(ld.label, str) and _placed_by_the_root(_as_words(ld.label), ld.end):
                r.warn(said + "; the job's words place it there", f"{ld.key}.end")
            else:
                r.hold(said + ", so no rating is posted. Check its end; if it really lies "
                       "there, say so in its label (\"drift against the wall\")",
                       f"{ld.key}.end", f"{name} runs by the root only, to "
                       f"{units.fmt(ld.end, 'length', system)}, while other loads reach out: "
                       "an end typed short? Check it, or say where it lies in its label")


# Two supports closer than this clamp the member between them like a fixed end
CLOSE_SUPPORTS = 3 * 0.0254  # m


def _close_supports(r: _Reader, supports, length, system: str) -> None:
    """Two supports that take force within a few inches of each other act together as a
    clamp (a fixed end), with large, opposed reactions: most often one support typed twice
    in two units, or a seat given as two supports. Warned; it errs on the safe side for the
    member, but the reactions it prints are not a seat's."""
    held = sorted((sp.at, sp.key) for sp in supports if sp.takes_force)
    for (a, ka), (b, kb) in zip(held, held[1:]):
        if 0 < b - a < min(CLOSE_SUPPORTS, 0.05 * (length or 1.0)):
            r.warn(f"{ka} and {kb} are {units.fmt(b - a, 'small_length', system)} apart: two "
                   "supports that close clamp the member between them like a fixed end, with "
                   "large reactions pulling opposite ways. If one seat was meant, give one "
                   "support (with bearing = \"...\" for its length); if a support was typed "
                   "twice, remove one", f"{kb}.at")
            return


def _load_index(key: str) -> int | None:
    m = re.fullmatch(r"loads\[(\d+)\]", key or "")
    return int(m.group(1)) if m else None


def _lifting_without_live(r: _Reader, criteria: Criteria, tags, loads, moving) -> None:
    """A lifting job whose force loads are all dead (the rated hook load typed case =
    "dead"), or that has none: the impact allowance is added to live loads only and the
    rating scales the live loads, so the hook load was checked without impact and cannot be
    rated."""
    if not is_lifting(tags, criteria.lifting) or moving:
        return
    if any(not p.warning and p.key.startswith("loads") for p in r.problems):
        return  # a load refused: it may be the live one, and the problem says what to fix
    forces = [ld for ld in loads if ld.kind != "moment"]
    live = [ld for ld in forces if ld.case == "live"]
    if live and not any(ld.kind == "point" for ld in live):
        r.warn(lifting_uniform_words(live), f"{live[0].key}.type")
        return
    if live:
        return
    if forces:
        names = ", ".join(ld.key + (f" ({ld.label})" if ld.label else "") for ld in forces[:3])
        r.warn(f"this lifting job has no live load: every force load is case = \"dead\" "
               f"({names}{', ...' if len(forces) > 3 else ''}). The rated (hook) load must be "
               "live (case = \"live\", the default) for the impact allowance and the rating "
               "to apply: keep case = \"dead\" for the hoist and trolley weight only",
               f"{forces[0].key}.case")
    else:
        r.warn("this lifting job has no force load: give the rated (hook) load as a live point "
               "load (case = \"live\", the default) so the impact allowance and the rating "
               "apply", "loads")


# A monorail that runs further than this past its outer hanger has a run-out the hoist
# travels onto (a shorter stub carries the end stop, not the hoist)
RUNOUT_MIN = 0.305  # 1 ft


HOIST_NEAR = 0.305  # m: a dead point load within a foot of the hook load is the hoist's weight


def _hoist_weight(r: _Reader, criteria: Criteria, tags, loads, moving, supports,
                  length) -> None:
    """A monorail or jib (a hoist hangs on the member) with no hoist or trolley weight
    entered: the figure posted would be the hook load and the hoist together, and the hoist
    hung on top of it overloads the member (ASCE 7-16 4.9.2 takes the wheel loads as rated
    load plus trolley and hoist, from memory). NOT RATED until the weight is entered."""
    if length is None or not supports or not is_lifting(tags, criteria.lifting) or r.errors:
        return  # (a job refused already: its own messages first)
    name = criteria.lifting or guessed_profile(supports, length)
    if name not in ("powered-monorail", "hand-geared-monorail", "jib-boom", "hand-geared-jib"):
        return
    hooks = [ld.at for ld in loads if ld.case == "live" and ld.kind == "point" and ld.value]
    if moving:
        if any(d for ws in moving for d in ws.dead):
            return
    elif any(ld.case == "dead" and ld.kind == "point" and ld.value
             and any(abs(ld.at - x) <= HOIST_NEAR for x in hooks) for ld in loads):
        return  # (a dead load elsewhere, a cable clamp at the mast, is not the hoist)
    if not any(ld.case == "live" and ld.total_force for ld in loads) and not moving:
        return  # nothing to rate
    where = ("dead = [...] on [[moving]], the hoist and trolley weight per axle" if moving
             else "a point load at the hoist (within a foot of the hook load) with case = "
             "\"dead\" (the hoist and trolley weight)")
    # a live load labelled as the hoist or trolley: entered, but as live (its case left out)
    named = next((ld for ld in loads if ld.case == "live" and ld.label and re.search(
        r"\b(hoists?|trolley|trolleys|block|carriage)\b", ld.label, re.IGNORECASE)
        and not re.search(r"\b(rated|hook|load|capacity|lift)\b", ld.label, re.IGNORECASE)),
        None) if not moving else None
    if named is not None and any(ld is not named and ld.case == "live" and ld.total_force
                                 for ld in loads):  # (and another live load: the hook's)
        r.hold(f"{named.key} ({named.label}) reads as the hoist and trolley weight but is a "
               "live load (case = \"live\", the default): the weight of the hoist is not "
               "part of the load the rating scales, and a rating counts it as rated load. "
               "Add case = \"dead\" to it", f"{named.key}.label",
               f"{named.key} ({named.label}) is the hoist weight entered as live: add "
               "case = \"dead\"")
        return
    r.hold("no hoist or trolley weight is entered on this " + (
               "jib" if "jib" in name else "monorail") + ": the figure posted would be what "
           "the member carries in all, and the hoist hung on it takes its own weight out of "
           "that (the rated load is hook load plus hoist and trolley, ASCE 7-16 4.9.2, from "
           f"memory), so no rating is posted until it is entered: {where}. A lifting beam "
           "below the hook (a spreader) carries no hoist: name its profile, lifting = "
           "\"below-the-hook\"",
           "moving" if moving else "loads",
           "the hoist and trolley weight is not entered: enter it as " + where)


def _parked_hoist(r: _Reader, criteria: Criteria, tags, loads, hung, moving_raw, supports,
                  length, system: str) -> str:
    """A monorail or jib hoist given as a point load at one place: the hoist travels by
    design. Held where the place is not its worst (a [[moving]] wheel set rates every place
    along the travel); at its worst place (mid-span, the end of the reach) the key of the
    hook load is returned, and `capacity` rates the hoist travelling the whole member (the
    supports and the shear are worst with it beside a hanger or the mast)."""
    if moving_raw or length is None or not supports or not is_lifting(tags, criteria.lifting):
        return ""
    name = criteria.lifting or guessed_profile(supports, length)
    if name not in ("powered-monorail", "hand-geared-monorail", "jib-boom", "hand-geared-jib"):
        return ""
    live = [ld for ld in loads if ld.kind == "point" and ld.case == "live" and ld.value]
    # the hook load: hung from the bottom flange, or (set on top, itself held) the first
    ld = next((ld for ld in live if ld.key in hung), live[0] if live else None)
    if ld is None:
        return ""
    held = sorted(s.at for s in supports if s.takes_force)
    # a jib by its profile, or named so (a knee-braced jib held at two places is guessed a
    # monorail, but its hoist still runs out along the boom)
    jib = "jib" in name or "jib" in {normal_tag(t) for t in tags}
    # the reach runs from the outer support to the free end, whichever end that is (a jib
    # drawn with its mast at the right end reaches out to 0)
    left_free = bool(held) and held[0] > 0 and held[-1] >= length * (1 - 1e-9)
    reach = (held[0] if left_free else length - held[-1]) if held else 0.0
    out = (held[0] - ld.at if left_free else ld.at - held[-1]) if held else 0.0
    if jib and held and out >= min(0.9 * reach, reach - 0.305):
        return ld.key  # at the end of the reach (an end stop up to a foot short of the tip)
    at = units.fmt(ld.at, "length", system)
    runout = max(held[0], length - held[-1]) if held else 0.0
    if not jib and runout > RUNOUT_MIN:
        # the hoist runs out past the last hanger: at the run-out's end it is worst for the
        # run-out (its deflection, the hogging over the hanger), at mid-span for the span;
        # no one place covers both (a hoist at mid-span had been rated 43 % high)
        r.hold(f"{ld.key} is the hoist at {at} only, but this monorail runs "
               f"{units.fmt(runout, 'length', system)} past its outer hanger, and the hoist "
               "travels onto that run-out: at its end the run-out deflects and bends the most, "
               "at mid-span the span does, and no one place covers both, so no rating is "
               "posted. Give the hoist as a [[moving]] wheel set (loads per axle, spacing, "
               "travel between the end stops) to rate every place", f"{ld.key}.at",
               f"the hoist ({ld.key}) is placed at {at} only, on a monorail with a run-out "
               "it travels onto. Give it as [[moving]]")
        return ""
    if not jib and any(abs(ld.at - (a + b) / 2) <= 0.01 * (b - a)
                       for a, b in zip(held, held[1:])):
        return ld.key  # at the middle of a span
    worst = "the end stop" if jib else "mid-span"
    device = "jib boom" if jib else "monorail"
    # a figure for one place away from the worst is not what a label on a travelling hoist
    # may post (an "8 in" typed for "8 ft" rated a monorail 54 % high): held, not only warned
    r.hold(f"{ld.key} is the hoist at {at} only, but on a {device} the hoist "
           f"travels, and it is usually worst at {worst} (and near the supports for shear): "
           "a rating for this one place would be posted for every place, so none is. Check "
           "the position and its unit (\"8 ft\", not \"8 in\"); put the hoist at its worst "
           "place, or give it as a [[moving]] wheel set (loads per axle, spacing, travel "
           "between the end stops) to rate every place", f"{ld.key}.at",
           f"the hoist ({ld.key}) is placed at {at} only, not where it is worst on a "
           f"{device} that it travels along. Put it at {worst}, or give it as [[moving]]")
    return ""


# A support label that says the member hangs from a rod, chain or sling there: a single rod
# does not hold the member against twist, which a bearing support is taken to do
_ROD_WORDS = re.compile(r"\b(hanger rods?|threaded rods?|all[- ]?thread|atr|drop rods?|rods?|"
                        r"eye ?bolts?|u-?bolts?|turnbuckles?|clevis(?:es)?|shackles?|"
                        r"chains?(?! ?(?:hoists?|blocks?|falls?|motors?))|"
                        r"slings?|cables?|wire[- ]ropes?|guy wires?|hanger straps?)(?![\w])",
                        re.IGNORECASE)
# ...and the same said of the member in the title or notes ("hung by two hanger rods")
_HUNG_WORDS = re.compile(r"\b(?:hung|hangs|suspended|hanging)\b[^.;]{0,40}?\b(?:by|from|on)\b"
                         r"[^.;]{0,30}?" + _ROD_WORDS.pattern, re.IGNORECASE)


def _hung_from_rods(r: _Reader, criteria: Criteria, tags, raw_supports, title="",
                    notes="") -> None:
    """A lifting job's support labelled as a hanger rod (chain, sling...) with no brace key:
    the checks take every support as holding the member against twist (its braced point for
    lateral-torsional buckling), which a single rod does not; the rating would rest on what
    the job's own words deny (the label says so), so it is held until brace is written."""
    if not is_lifting(tags, criteria.lifting) or not isinstance(raw_supports, list):
        return
    bearing = [(i, sp) for i, sp in enumerate(raw_supports) if _is_table(sp)
               and sp.get("type") in ("pin", "roller", "spring") and "brace" not in sp]
    said = next((m.group(0) for m in (_HUNG_WORDS.search(_as_words(t)) for t in (title, notes))
                 if m), "")
    if said and bearing:  # the words say so of the member: every support not told is held
        i = bearing[0][0]
        r.hold(f"the job says the member is {said!r}: a member hung from single rods, chains "
               "or slings is not held against twist at them, but the checks take each support "
               "as holding it (its braced point for lateral-torsional buckling), so no rating "
               "is posted. Write brace = true on each support whose hanger holds both flanges "
               "(clamp plates, a bolted seat), or brace = false where it does not",
               f"supports[{i}]",
               f"the job says the member is {said!r} but its supports say nothing of holding "
               "it against twist. Write brace = true or brace = false on each")
        return
    for i, sp in bearing:
        label = sp.get("label")
        m = _ROD_WORDS.search(label) if isinstance(label, str) else None
        if m and not re.search(r"\banchor", label, re.IGNORECASE):
            r.hold(f"the support is labelled {label!r}: a member hung from a single rod, "
                   "chain or sling is not held against twist there, but the checks take each "
                   "support as holding it (its braced point for lateral-torsional buckling), "
                   "so no rating is posted. Write brace = true on the support if the hanger "
                   "holds both flanges (clamp plates, a bolted seat), or brace = false if it "
                   "does not", f"supports[{i}].label",
                   f"supports[{i}] is labelled {label!r} but says nothing of holding the "
                   "member against twist. Write brace = true or brace = false on it")


# A support held by a sloped tie or brace (an awning or sign arm with a tie rod up to the wall,
# a shelf arm on a knee brace, a davit's kicker): what holds the member there also pushes or
# pulls it endwise. Bare "strut" is a channel's trade name (strut channel) and "stay" an
# everyday verb: only their sloped or diagonal forms are read.
_DEG = r"\d+(?:\.\d+)?\s*(?:deg(?:rees?)?|\u00b0)"
_TIE_WORDS = re.compile(
    r"\b(tie[- ]?(?:rods?|bars?)|tie[- ]?backs?(?: rods?)?|tension rods?|rod braces?|"
    r"knee[- ]?brac\w*|kickers?(?! ?(?:plates?|blocks?|boards?))|"
    r"(?:diagonal|sloped|sloping|angled|inclined|raking) (?:braces?|ties?|rods?|struts?|stays?|"
    r"cables?|ropes?|chains?)|(?:rods?|cables?|ropes?|chains?|stays?) (?:sloped|sloping|"
    r"angled|raking)|"
    r"(?:" + _DEG + r" (?:angle )?(?:braces?|struts?|rods?|ties?|stays?))|angle braces?|"
    r"(?:braces?|struts?|rods?|cables?) [^,;]{0,25}?(?:at |@ ?)" + _DEG + r"|"
    r"wire[- ]ropes?(?: stays?)?|stay[- ](?:cables?|wires?|ropes?|rods?)|"
    r"(?:cables?|ropes?|chains?|rods?|straps?) (?:up |down )?(?:to|from) (?:the )?"
    r"(?:wall|column|post|mast|building)|"
    r"guy(?:ed|[- ]wires?|[- ]ropes?|[- ]rods?))(?![\w])", re.IGNORECASE)
# ...said of the member in its title or notes ("arm with a tie rod to the wall", "knee-braced
# arm", "tie-rod awning bracket", "awning arm w/ tie rod"), not of what a rack stores ("tie rod
# rack", "loaded with tie rod bundles": `_TIE_STORED`)
_TIE_SAID = re.compile(
    r"(?:\b(?:with|by|on|from|has)\b|\bw/|\(|\s-)(?: [\w-]+){0,2}? ?"
    + _TIE_WORDS.pattern[2:]
    + r"|" + _TIE_WORDS.pattern + r" (?:to|up|from|above|below|at|supported|held)\b|"
    r"\b(?:tie[- ]?rod(?:ded)?|knee[- ]?brace[ds]?|guyed|stayed|cable[- ]stayed) "
    r"(?:awning|sign|shelf|bracket|arm|boom|beam|davit|canopy|cantilever)s?\b|"
    r"\bknee[- ]?braced\b|\bguyed\b|\bheld up by (?:an? )?(?:cable|rope|rod|chain|stay)s?\b",
    re.IGNORECASE)
# what a rack or arm stores, said beside the words: "loaded with", "stocked with", "bundles"
_TIE_STORED = re.compile(r"\b(?:loaded|stocked|filled|stacked|carrying|holds?|stores?|storage|"
                         r"for)\s+(?:with\s+)?(?:[\w-]+\s+){0,3}$|^\s*(?:bundles?|stock|lengths?|"
                         r"bars? for|racks?)\b", re.IGNORECASE)


# A frame's bracing (X-bracing in a bay, a braced frame) said beside the tie words
_FRAME_BRACING = re.compile(r"\b(?:x[- ]?brac\w*|cross[- ]?brac\w*|braced (?:frames?|bays?)|"
                            r"(?:posts?|columns?|bays?|frames?) (?:have|has|with) [\w -]{0,20}"
                            r"brac\w*)", re.IGNORECASE)


def _tied_or_braced(r: _Reader, tags, raw_supports, title="", notes="") -> None:
    """A job whose support label, title or notes say the member is held by a tie rod, knee
    brace or kicker (a sloped member meeting it): that holds it up by pushing it endwise (a
    tie above) or pulling it (a knee brace below), so it is a beam-column, and bending with
    that axial force is not checked (AISC 360-16 E3, H1-1): the rating is held, unless the
    tag no-axial says nothing pushes or pulls it endwise (the label then says it is rated
    only while so). A lifting job tagged no-axial has its own rule for words that contradict
    the tag (design.analysis.use_unchecked); its support labels are read here."""
    places = [(f"supports[{i}].label", sp.get("label")) for i, sp in
              enumerate(raw_supports if isinstance(raw_supports, list) else [])
              if _is_table(sp)] + [("title", title), ("notes", notes)]
    for key, text in places:
        rule = _TIE_WORDS if key.startswith("supports") else _TIE_SAID
        words = _as_words(text) if isinstance(text, str) else ""
        m = next((m for m in rule.finditer(words)
                  if not _TIE_STORED.search(words[:m.start()])
                  and not _TIE_STORED.search(words[m.end():])), None)
        if not m:
            continue
        said = _TIE_WORDS.search(m.group(0)).group(0) if _TIE_WORDS.search(m.group(0)) \
            else m.group(0)
        if "no-axial" in tags:
            if is_lifting(tags) and key.startswith("supports"):
                r.hold(f"the tag \"no-axial\" says nothing pushes the member endwise, but "
                       f"{key} says {said!r}: a tie rod pushes a lifting member endwise and a "
                       "knee brace pulls it, and bending with that axial force is not checked "
                       "here, so no rating is posted. Have it checked as a beam-column; if "
                       "the words do not describe this support, reword them", key,
                       f"axial force (the tag no-axial contradicted by {key}, {said!r}) "
                       "not checked (AISC 360-16 E3, H1-1)")
            return
        sentence = re.split(r"[.;!?]\s", words[:m.start()])[-1] + words[m.start():].split(". ")[0]
        if _FRAME_BRACING.search(sentence):  # a bay's bracing, not a rod holding this member
            r.hold(f"{key} says {said!r} of a braced bay: the bracing of a bay puts axial force "
                   "into the beams of that bay (a strut or collector force under sway, wind or "
                   "a bump), so a beam there is a beam-column, and bending with that axial "
                   "force is not checked here, so no rating is posted. Have it checked as a "
                   "beam-column with the frame's forces; or add the tag \"no-axial\" if this "
                   "beam is not part of the braced bay and nothing pushes or pulls it endwise",
                   key, f"axial force from the bay's bracing ({said!r}, {key}) not checked: a "
                   "beam-column (AISC 360-16 E3, H1-1)")
            return
        r.hold(f"{key} says {said!r}: a tie rod or brace that meets the member at a slope "
               "holds it up by pushing it endwise (a knee brace below pulls it), so the "
               "member is a beam-column, and bending with that axial force is not checked "
               "here (it lowers what the member may carry), so no rating is posted. Have it "
               "checked as a beam-column; or add the tag \"no-axial\" if the rod or brace "
               "meets it square (a plumb hanger) and nothing pushes or pulls it endwise",
               key, f"axial force from {said!r} ({key}) not checked: a beam-column (AISC "
               "360-16 E3, H1-1)")
        return


# A length written in the title or notes ("12 ft reach", "3.6 m span", 8', "10 1/2 ft"),
# after units' own reading of shop marks (' " and fraction characters); a figure followed by
# a word that makes it some other size (12 in deep, 16 in o.c., 24 ft lumber) is not the
# member's length
_LEN_NUM = r"(\d+(?:\.\d+)?(?:[ -]\d+/\d+)?|\d+/\d+)"
_LEN_UNIT = r"(feet|foot|ft|lf|inches|inch|in|mm|cm|m)"
_LENGTH_WORDS = re.compile(
    r"(?<![\w./])" + _LEN_NUM + r"\s*-?\s*" + _LEN_UNIT + r"(?![a-z0-9])"
    r"(\s*(?:deep|wide|high|tall|thick|depth|width|height|o\.?\s?c\b\.?|on cent\w*|apart|"
    r"spacing|cent(?:er|re)s|dia\w*|square|sq\b|lumber|stock|bars?|pipes?|boards?|lengths?|"
    r"sticks?|tubes?|parts|material|pallets?)\b)?", re.IGNORECASE)
_LENGTH_UNITS = {"feet": "ft", "foot": "ft", "ft": "ft", "lf": "ft", "inches": "in",
                 "inch": "in", "in": "in", "mm": "mm", "cm": "cm", "m": "m"}
_UNIT_M = {"ft": 0.3048, "in": 0.0254, "mm": 0.001, "cm": 0.01, "m": 1.0}


# A spacing the words give: "16 in o.c.", 16" OC, "24 in centres", "1-3/16 in centers"
_SPACING_WORDS = re.compile(_LEN_NUM + r"\s*(?:in\b|inch\w*|\")\s*(?:o\.?\s?c\b\.?|"
                            r"on cent\w*|cent(?:er|re)s|spacing|apart)", re.IGNORECASE)


def _spacings_said(title, notes) -> list[float]:
    """The spacings (in inches) the title and notes give."""
    return [_number(m.group(1)) for t in (title, notes)
            for m in _SPACING_WORDS.finditer(units.normalised(str(t or "")))]


def _number(text: str) -> float:
    """A shop number: 12, 10.5, 10 1/2, 10-1/2, 1/2."""
    m = re.fullmatch(r"(\d+)[ -](\d+)/(\d+)", text)
    if m:
        return int(m.group(1)) + int(m.group(2)) / max(int(m.group(3)), 1)
    m = re.fullmatch(r"(\d+)/(\d+)", text)
    if m:
        return int(m.group(1)) / max(int(m.group(2)), 1)
    return float(text)


def _length_against_words(r: _Reader, raw, length, title, notes, system: str) -> None:
    """beam.length typed as a number and one unit ("12 in") while the title or notes give the
    same number in a longer unit ("12 ft reach"), and nowhere the length typed: the unit
    slipped, and the member is rated for a span it does not have (a jib typed "12 in" for
    "12 ft" had been rated at 10 times its figure). Held; a shorter unit in the words is
    on the safe side and left alone."""
    if not isinstance(raw, str) or length is None:
        return
    m = re.fullmatch(r"\s*" + _LEN_NUM + r"\s*" + _LEN_UNIT + r"\s*", units.normalised(raw),
                     re.IGNORECASE)
    if not m:
        return
    number = _number(m.group(1))
    said = []
    for where, text in (("title", title), ("notes", notes)):
        for w in _LENGTH_WORDS.finditer(units.normalised(str(text or ""))):
            if w.group(3):
                continue  # some other size: a depth, a spacing, the stock's length
            unit = _LENGTH_UNITS[w.group(2).lower()]
            said.append((where, w.group(0).strip(), _number(w.group(1)) * _UNIT_M[unit],
                         _number(w.group(1))))
    if any(abs(v - length) <= 0.02 * length for _, _, v, _ in said):
        return  # the words give the length typed too
    longer = [(where, words) for where, words, v, n in said
              if abs(n - number) < 1e-9 and v > 1.5 * length]
    if not longer:
        return
    where, words = longer[0]
    r.hold(f"beam.length is {raw.strip()}, but the {where} says {words!r}: the same number in "
           "a longer unit, so the unit of the length has likely slipped, and a member rated "
           "for a shorter span than it has posts far too much. Fix the unit of beam.length; "
           f"if the {where}'s {words!r} is some other length, reword it (e.g. \"bay 12\")",
           "beam.length",
           f"beam.length is {raw.strip()} but the {where} says {words!r}. Fix the unit of "
           "beam.length")


TINY_WIDTH = 0.0127  # m: half an inch, under any tributary width (common practice, no source)
WIDE_WIDTH = 15.0  # m (about 50 ft): wider than a shop member's tributary width (the same)


def _narrow_widths(r: _Reader, raw_loads, length, raw_length, system: str, title="",
                   notes="") -> None:
    """An area load's tributary width typed in inches (or mm) on a member whose length is in
    feet (or m), under a foot (300 mm) and under 1/20 of the member: most likely the unit
    slipped ("6 in" for "6 ft" put a platform beam's posted area load 12 times too high).
    Held, unless the words give the same spacing (bar grating's bearing bars at 1-3/16 in
    centres); a load per length says the same without a width."""
    if length is None or not isinstance(raw_length, str) or not isinstance(raw_loads, list):
        return
    # (a width under half an inch, 12.7 mm, is nobody's tributary width, whatever the unit of
    # the member's length: "0.6 mm" for 0.6 m on a member typed in mm)
    big_unit = re.search(r"ft|feet|foot|'|\d\s*m\b", raw_length, re.IGNORECASE)
    said = [x * 0.0254 for x in _spacings_said(title, notes)]
    for i, ld in enumerate(raw_loads):
        key = f"loads[{i}]"
        w = r.widths.get(key)
        raw = ld.get("width") if _is_table(ld) else None
        if w is not None and isinstance(raw, str) and w > max(10 * length, WIDE_WIDTH):
            # the other way round ("600 m" for 600 mm): the area load posted is that many
            # times too low (on the safe side, said)
            r.warn(f"width = {raw!r} is more than ten times the member's length "
                   f"({units.fmt(length, 'length', system)}): a tributary width that wide is "
                   "most likely a unit slip (" + ('"600 m" for "600 mm"' if system == "si"
                                                  else '"16 ft" for "16 in"')
                   + "), and the area load posted is that many times too low. Check its unit",
                   f"{key}.width")
            continue
        if w is None or not isinstance(raw, str) or \
                not re.search(r"(?:in|inch|inches|\"|mm)\.?\s*$", raw.strip(), re.IGNORECASE):
            continue
        if any(abs(x - w) <= 1e-3 * w for x in said):
            continue  # the spacing the words give
        foot = "300 mm" if system == "si" else "a foot"
        if w < TINY_WIDTH or big_unit and w < min(0.305, length / 20):
            r.hold(f"width = {raw!r} is the tributary width of an area load on a member "
                   f"{units.fmt(length, 'length', system)} long, under {foot} and under 1/20 "
                   "of it: most likely the unit slipped ("
                   + ('"0.6 mm" for "0.6 m"' if system == "si" else '"6 in" for "6 ft"')
                   + "), which multiplies the posted area load, so no rating is posted. Check "
                   "the unit; if the width is right, say the spacing in the title ("
                   + ('"bars at 30 mm centres"' if system == "si" else
                      '"bars at 1-3/16 in centres"')
                   + ") or give the load per length instead ("
                   + ("kN/m" if system == "si" else "lbf/ft") + ")",
                   f"{key}.width",
                   f"{key}.width = {raw!r} is under {foot} on a member "
                   f"{units.fmt(length, 'length', system)} long: check the unit, say the "
                   "spacing in the title, or give the load per length")


# A monorail or jib shorter than this is a length typed in the wrong unit (a jib boom of
# 12 in), not a lifting device (common practice, no source); a below-the-hook beam may be
# shorter and is left alone
SHORT_LIFTING = 0.61  # 2 ft


_RUNWAY_WORDS = re.compile(r"\b(jibs?|monorails?|booms?|runways?|trolley beams?)\b",
                           re.IGNORECASE)


def _short_lifting_member(r: _Reader, criteria: Criteria, tags, supports, length,
                          system: str, title="", notes="") -> None:
    """A monorail or jib (named so by its profile or its words) under SHORT_LIFTING long: a
    hook bracket that short is left alone (the stubby-member rule covers it)."""
    if length is None or not supports or not is_lifting(tags, criteria.lifting) \
            or length >= SHORT_LIFTING or criteria.lifting == "below-the-hook":
        return
    named = criteria.lifting in ("powered-monorail", "hand-geared-monorail", "jib-boom",
                                 "hand-geared-jib")
    if not named and not any(_RUNWAY_WORDS.search(_as_words(t)) for t in (title, notes, *tags)):
        return
    r.hold(f"this lifting member is {units.fmt(length, 'length', system)} long: a monorail or "
           "jib that short is almost always a length typed in the wrong unit (\"12 in\" for "
           "\"12 ft\"), and it would be rated at many times its figure, so no rating is "
           "posted. Check beam.length and every position's unit; if the member really is that "
           "short, it is a bracket, not a jib or monorail: name the profile it is, or take "
           "the word out of the title", "beam.length",
           f"a monorail or jib {units.fmt(length, 'length', system)} long: check the unit of "
           "beam.length")


def lifting_uniform_words(live) -> str:
    """What to say of a lifting job whose live loads are all spread (the hook load typed as a
    uniform or linear load): the reader warns it, and design.capacity posts no rating."""
    names = ", ".join(ld.key + (f" ({ld.label})" if ld.label else "") for ld in live[:3])
    return (f"this lifting job's live load is spread along the member ({names}"
            f"{', ...' if len(live) > 3 else ''}, {live[0].kind}), but a hoist or trolley "
            "bears on it at one point: the hook load spread out bends it about half as much "
            "as the same load at mid-span, and the wheel-on-flange and lateral-force checks "
            "apply to point loads only, so the job is NOT RATED. Give the rated (hook) load as "
            "a live point load where it bends most (type = \"point\", e.g. at mid-span), or "
            "trolley wheels ([[moving]]); keep a uniform load for the member's own attachments "
            "as case = \"dead\"")


def _lifting_mismatch(r: _Reader, criteria: Criteria, tags, supports, length) -> None:
    """Lifting words that contradict the job: the jib-boom profile (L/225 on twice the reach)
    named on a member with no free end, where a monorail's L/450 is what a trolley needs; and
    the tags lifting and not-lifting together (it is taken as lifting)."""
    if (criteria.lifting in ("jib-boom", "hand-geared-jib") and length is not None and supports
            and not has_free_end(supports, length)):
        r.warn(f"lifting = \"{criteria.lifting}\" names a cantilever boom, but this member has no free "
               "end: its deflection limit (L/225 on twice the reach) is for a boom, and a "
               "trolley running between supports needs a monorail's (L/450). Name "
               "\"powered-monorail\" or \"hand-geared-monorail\" if that is what it is",
               "criteria.lifting")
    if criteria.lifting and NOT_LIFTING in tags and not is_lifting(tags):
        r.warn(f"lifting = \"{criteria.lifting}\" names a lifting profile but the tags say "
               f"\"{NOT_LIFTING}\": it is checked and rated as a lifting device (impact, "
               "lateral force, lifting deflection limit); remove the one that is wrong",
               "criteria.lifting")
    if is_lifting(tags) and NOT_LIFTING in tags:
        r.warn(f"tags say both \"lifting\" and \"{NOT_LIFTING}\": it is checked and rated as "
               "a lifting device; remove the one that is wrong", "tags")


_POWERED_WORDS = re.compile(
    r"\b(electric(?![a-z])|electric(?:al)?[- ](?:chain[- ])?(?:hoists?|trolleys?|blocks?|drives?|"
    r"motors?)|elec\. (?:chain )?hoists?|powered|motori[sz]ed|motor[- ]driven|"
    r"(?:with|has) (?:a |an )?motor|air (?:chain |wire[- ]rope )?hoists?|pneumatic|vfd|"
    r"push[- ]?buttons?|pendant[- ](?:hoists?|control\w*|stations?|operated|push\w*)|"
    r"radio[- ]?(?:remote|control\w*)|remote[- ]control\w*|chain[- ]?motors?|hoist motors?|"
    r"motor hoists?|battery[- ](?:powered|operated)(?: chain)? (?:hoists?|trolleys?)|"
    r"\d+(?:\.\d+)?\s*(?:hp|kw)|"
    r"(?:\d+\s*v(?:olts?)?|(?:3|three|single|1)[- ]phase)(?:[ -]+[a-z]+)?[ -]+"
    r"(?:chain )?(?:hoists?|motors?|trolleys?))(?![\w])", re.IGNORECASE)


def _profile_contradicted(r: _Reader, crit_raw, raw_loads, title, notes, tags,
                          supports=None, length=None) -> None:
    """A lifting profile the rest of the job contradicts, each of which makes the figure
    generous: a monorail's hook load set on the top flange (a monorail trolley runs on the
    bottom flange, so the wheel flange checks drop out), and a hand-geared profile (no impact,
    no lateral force) on a job that says its hoist is electric or powered."""
    name = crit_raw.get("lifting", "") if isinstance(crit_raw, dict) else ""
    if not isinstance(name, str):
        return
    guessed = not name and is_lifting(tags) and supports and length is not None
    if guessed:  # the profile tags = ["lifting"] picks: a monorail's trolley hangs below too
        name = guessed_profile(supports, length)
    if name in ("powered-monorail", "hand-geared-monorail", "jib-boom", "hand-geared-jib"):
        # a monorail's or a jib boom's hoist trolley runs on the bottom flange (a trolley on
        # top would bear on the flange tips just the same): the hook load on the top flange
        # leaves the wheel flange checks out
        what = "a monorail" if "monorail" in name else "a jib boom"
        # the hook's places: a point load set on top at one of them is the hoist and
        # trolley's own weight (or part of the hook load), which hangs on the wheels; with no
        # hook hung below, a live load on top is the hook load itself. A live load on top
        # beside a hook that hangs below is something else (a tray bearing on the beam)
        def at(ld):  # the position in metres (None when it cannot be read: said elsewhere)
            try:
                return round(units.parse(ld.get("at"), "length", "at"), 6)
            except (InputError, TypeError, ValueError):
                return None

        points = [ld for ld in raw_loads if _is_table(ld) and ld.get("type") == "point"]
        below = [ld for ld in points if ld.get("flange") != "top"]
        hooks = {at(ld) for ld in below if ld.get("case", "live") == "live"} - {None}
        weights = {at(ld) for ld in below if ld.get("case", "live") == "dead"} - {None}
        for i, ld in enumerate(raw_loads):
            # a dead load on top at a hook whose own weight already hangs below is a fitting
            if (_is_table(ld) and ld.get("type") == "point" and ld.get("flange") == "top"
                    and ((ld.get("case", "live") == "live" and not hooks)
                         or (at(ld) in hooks and (ld.get("case", "live") == "live"
                                                  or at(ld) not in weights)))):
                who = (f"the profile tags = [\"lifting\"] picks for this span, \"{name}\","
                       if guessed else f"lifting = \"{name}\"")
                r.hold(f"flange = \"top\" puts this load on the top flange, but {who} "
                       f"is {what}, whose trolley runs on the bottom flange: "
                       "the wheel flange checks under it are not made, so no rating is "
                       "posted. Remove flange (a hoist load hangs from the bottom flange by "
                       "default), or name the profile the member really is",
                       f"loads[{i}].flange",
                       f"loads[{i}] is set on the top flange of {what} ("
                       + ("profile from the tags: " if guessed else "lifting = ")
                       + f"\"{name}\"), whose trolley hangs from the bottom flange: the wheel "
                       "flange checks are not made. Remove flange = \"top\"")
    if name.startswith("hand-geared"):
        said = _words_found(_POWERED_WORDS, title, notes, tags, raw_loads)
        if said:
            hint = "; ".join(said[:3])
            powered = {"hand-geared-monorail": "powered-monorail",
                       "hand-geared-jib": "jib-boom"}.get(name, "powered-monorail")
            r.hold(f"lifting = \"{name}\" takes no impact and no lateral force (a hand-geared "
                   f"hoist and trolley), but the job says it is powered ({hint}): a powered "
                   "hoist and trolley take 25 % impact and 20 % lateral force (ASCE 7-16 "
                   f"4.9.3 and 4.9.4, from memory), so no rating is posted. Name lifting = "
                   f"\"{powered}\" if it is powered, or reword the text if those words are "
                   "not about the hoist or trolley",
                   "criteria.lifting",
                   f"lifting = \"{name}\" (no impact) on a job that says its hoist is powered "
                   f"({hint}). Name \"{powered}\" if it is")


_BTH_WORDS = re.compile(r"\b(spreaders?(?: bars?| beams?)?|lift(?:ing)? beams?|strongbacks?|"
                        r"strong-backs?|below[- ]the[- ]hook|lifters?|sheet lifters?|"
                        r"coil lifters?|equali[sz]er beams?|sling bars?|lift(?:ing)? frames?|"
                        r"lift(?:ing)? bars?|yokes?|pick(?:ing)? beams?|load bars?)\b",
                        re.IGNORECASE)


def thickest(section) -> float | None:
    """The thickest element of a section (m): a tube's wall, an I-shape's, channel's or tee's
    flange or web, an angle's leg, a bar's least dimension; None for a custom section."""
    d = getattr(section, "dims", {}) or {}
    shape = getattr(section, "shape", "")
    if shape in ("rect-tube", "round-tube", "pipe"):
        return d.get("t_nom") or d.get("t_des")
    if shape in ("i-beam", "channel", "tee"):
        return max(d.get("tf", 0.0), d.get("tw", 0.0)) or None
    if shape == "angle":
        return d.get("t")
    if shape == "rect-bar":
        return min(d.get("h", 0.0), d.get("b", 0.0)) or None
    if shape == "round-bar":
        return d.get("od")
    return None


def thickness_gap(section, material, welded: bool, system: str = "us") -> str:
    """Why no rating may rest on this material for this section: the member is thicker than
    the range its values hold for (6063-T5 past 0.5 in, welded 6061-T6 past 0.375 in: Aluminum
    Design Manual 2015 Part A, from memory, lower values past them); "" when none. Judged per
    section, so a sizing sweep is not tainted by the job's own section."""
    if section is None or material is None:
        return ""
    t = thickest(section)
    limit, which = getattr(material, "max_thickness", None), "its values"
    if welded and getattr(material, "welded_max_thickness", None) and (
            limit is None or material.welded_max_thickness < limit):
        limit, which = material.welded_max_thickness, "its welded (heat-affected zone) values"
    if t is None or limit is None or t <= limit * (1 + 1e-6):
        return ""
    f = lambda x: units.fmt(x, "small_length", system)  # noqa: E731
    return (f"section {section.designation!r} is {f(t)} thick where thickest, past the "
            f"{f(limit)} up to which {which} for {material.key!r} hold (the standard gives "
            "lower values past it), so the checks would credit strength the member may not "
            "have")


def _thickness_range(r: _Reader, section, material, welded: bool, system: str) -> None:
    """`thickness_gap` as a warning on the job's own section."""
    words = thickness_gap(section, material, welded, system)
    if words:
        r.warn(f"{words}: no rating is posted. Give the material inline with the values for "
               "this thickness, or use a thinner section", "beam.material")


def _rolling_keys(r: _Reader, raw, moving, tags, criteria) -> str:
    """`wheels_per_axle` or `wheel_edge` written on the [[moving]] set of a job not tagged
    lifting: they describe a trolley hung from the bottom flange, whose wheel flange checks are
    made on lifting jobs only, while here the wheels are taken as rolling on the top flange.
    Warned; the keys are returned (no rating is posted on them)."""
    # an untagged job with wheels is already warned and not rated as reading like a lifting
    # device (_lifting_hint), which says to tag it: this is for one tagged not-lifting
    if not moving or is_lifting(tags, criteria.lifting) or NOT_LIFTING not in tags or \
            not isinstance(raw, list):
        return ""
    said = [k for t in raw if isinstance(t, dict)
            for k in ("wheels_per_axle", "wheel_edge") if k in t]
    if not said:
        return ""
    names = " and ".join(dict.fromkeys(said))
    r.warn(f"{names} describe{'s' if len(set(said)) == 1 else ''} a trolley hung from the "
           "bottom flange, but on a job not tagged lifting the wheels of [[moving]] are taken "
           "as rolling on the top flange (a cart on a track or platform beam), so the flange "
           "checks under the wheels are not made and no rating is posted. A trolley hung from "
           "the flange is a lifting device or runs like one: tag the job \"lifting\" (with "
           "the tag \"not-lifting\" removed); for a cart on top, remove the key(s)",
           f"{moving[0].key}.{said[0]}")
    return names


def _below_the_hook_hint(r: _Reader, title, notes, tags, criteria) -> str:
    """A job tagged lifting, with no profile named, that reads like a below-the-hook device (a
    spreader or lifting beam): the guessed profile (monorail or jib) uses AISC Omega, where
    ASME BTH-1 sets a design factor Nd (2.0 or 3.0, from memory) that is never guessed.
    Warned, and no rating is posted until the profile is named."""
    if not is_lifting(tags) or criteria.lifting or \
            any(p.key == "criteria.lifting" and not p.warning for p in r.problems):
        return ""  # a profile named (or named wrong: refused with its own message)
    said = _words_found(_BTH_WORDS, title, notes, tags, [], frozenset())
    if not said:
        return ""
    hint = "; ".join(said[:3])
    r.warn(f"this reads like a below-the-hook device ({hint}) but names no lifting profile: "
           "it would be checked as a monorail or jib (AISC Omega, trolley forces) where ASME "
           "BTH-1 sets its own design factor, so no rating is posted. Write lifting = "
           "\"below-the-hook\" under [criteria] (with its design category), or the profile "
           "it is", "criteria.lifting")
    return hint


_FIXTURE_WORDS = re.compile(
    r"\b(heaters?|signs?|pipes?|piping|trays?|ducts?|ductwork|lights?|lamps?|luminaires?|"
    r"tracks?|conduits?|fans?|banners?|sprinklers?|cables?|speakers?|curtains?|hvac|"
    r"units?|displays?|screens?|baskets?|tires?|tyres?|bins?|openers?|doors?)\b",
    re.IGNORECASE)


# Tags of a member that hangs things below without lifting them (stored goods, fixtures)
_HANGS_STORED = RACK_TAGS | SHELF_TAGS | {"storage", "pipe", "pipes", "pipe-support", "tray",
                                          "cable-tray", "fixture", "sign", "hanger", "hvac",
                                          "floor", "mezzanine", "platform"}


def _hangs_stored(tags) -> bool:
    """Whether the job's tags say the member hangs stored goods or fixtures below (a load on
    its bottom flange is then no hint of a hoist)."""
    return bool(_HANGS_STORED & {normal_tag(t) for t in tags})


# Words that say outright the member is a lifting device (not a part stored or a word in a
# shelf's name): the tag not-lifting cannot stand against them
_LIFTING_DEVICE_WORDS = re.compile(
    r"\b(lifting devices?|jib[- ]?cranes?|crane booms?|below[- ]the[- ]hook|monorail hoists?|"
    r"spreader (?:bars?|beams?)|lifting beams?|hoist beams?|(?:gantry|underhung|bridge) cranes?|"
    r"crane runways?|davit(?: arms?)?|monorails?|hoist (?:booms?|arms?)|"
    r"(?:wall|pillar|mast|swing)[- ]jibs?|jibs? (?:arms?|booms?)|"
    r"(?:chain|electric|wire[- ]rope|air|lever) hoists?)\b", re.IGNORECASE)
_LIFTING_DEVICE_NOTES = re.compile(r"\b(lifting devices?|below[- ]the[- ]hook|jib[- ]?cranes?)\b",
                                   re.IGNORECASE)
# ...said of where the member is, not what it is ("beside the monorail", "under the runway")
_NEAR_WORDS = re.compile(r"\b(?:beside|under|over|near|next to|below|above|along|behind|by|"
                         r"past|from)\s+(?:the\s+|a\s+)?(?:[\w-]+\s+){0,2}$", re.IGNORECASE)
# ...but a shelf or rack that stores them, or stands on one's column, is no lifting device
_STORES_WORDS = re.compile(r"\b(racks?|shel(?:f|ves|ving)|storage|store[sd]?|storing|bins?|"
                           r"cabinets?|holders?|rests?|cradles?|"
                           r"for (?:the )?\w+ (?:attachments|parts|tools)|"
                           r"on the \w+(?: \w+)? (?:column|mast|post))\b", re.IGNORECASE)


def _braced_boom(r: _Reader, beam: dict, tags, criteria, supports, length) -> None:
    """braced = true or restrained = true on a jib's boom (a lifting member with a free end):
    nothing braces a boom along its reach, and the trolley runs on it; the keys raise the
    bending strength (no lateral-torsional buckling), which the label then rests on. Said."""
    if length is None or not supports or not is_lifting(tags, criteria.lifting):
        return
    name = criteria.lifting or guessed_profile(supports, length)
    if name not in ("jib-boom", "hand-geared-jib"):
        return
    for k in ("braced", "restrained"):
        if beam.get(k) is True:
            r.hold(f"{k} = true on a jib's boom: nothing holds a boom against buckling "
                   "sideways along its reach (the trolley runs along it, and its free end "
                   "swings), so the lateral-torsional buckling it leaves out is most often "
                   "what governs, and no rating is posted on it. Remove it (the boom is then "
                   "checked unbraced), or brace it at points and give them as braces = [...]",
                   f"beam.{k}", f"{k} = true on a jib's boom: nothing braces a boom along its "
                   "reach; remove it, or give the brace points as braces")
            return


def _not_lifting_denied(r: _Reader, title, notes, tags, criteria) -> None:
    """The tag not-lifting on a job whose title or notes say outright it is a lifting device
    ("jib crane", "LIFTING DEVICE: design, marking and load test..."): the tag would post a
    NOT FOR LIFTING label with no impact allowance, lateral force or lifting cautions on a
    crane. Held until one of the two is changed."""
    if NOT_LIFTING not in tags or is_lifting(tags, criteria.lifting):
        return
    if isinstance(title, str) and _STORES_WORDS.search(_as_words(title)):
        return  # a shelf or rack for lifting gear, on a crane's column, a boom's rest
    for key, text in (("title", title), ("notes", notes)):
        words = _as_words(text) if isinstance(text, str) else ""
        # (the notes may speak of a device nearby: only the outright names are read there)
        rule = _LIFTING_DEVICE_WORDS if key == "title" else _LIFTING_DEVICE_NOTES
        m = next((m for m in rule.finditer(words)
                  if not _NEAR_WORDS.search(words[:m.start()])
                  and not _DENIED.search(words[:m.start()])), None)
        if m:
            r.hold(f"the tag \"{NOT_LIFTING}\" says this is not a lifting device, but the "
                   f"{key} says {m.group(0)!r}: a lifting device is checked with its impact "
                   "allowance, sideways trolley force and lifting deflection limit and carries "
                   "the stronger cautions, none of which a job tagged not-lifting gets, so no "
                   f"rating is posted. Tag it \"lifting\" if it lifts; if it does not, take "
                   f"the words out of the {key}", "tags",
                   f"the tag {NOT_LIFTING} against the {key}'s {m.group(0)!r}: a lifting "
                   "device checked as a shelf")
            return


_STORAGE_HOOK = re.compile(
    r"\b(?:ladders?|hoses?|(?:extension )?cords?|cables?|tools?|coats?|jackets?|bikes?|"
    r"bicycles?|chairs?|buckets?|brooms?|rakes?|shovels?|reels?|brushes|bags?|helmets?|"
    r"harness(?:es)?|aprons?)\b[^.;:!?]{0,40}?"
    r"\b(?:hung|hang|hangs|hanging|stored|stowed|kept|sit|sits)\s+(?:up\s+)?on\s+(?:the|a|"
    r"its|their)\s+hooks?\b", re.IGNORECASE)


_MACHINE_WORDS = re.compile(r"\b(?:engines?|motors?|transmissions?|gearbox(?:es)?|pumps?|dies?|"
                            r"mou?lds?|cars?|trucks?|vehicles?|pull(?:ed|ing|s)?|lift(?:ed|ing|s)?|"
                            r"hoist\w*|raise[ds]?|lower(?:ed|ing|s)?|rigg\w*|loads?)\b",
                            re.IGNORECASE)


def _off_storage_hooks(text: str) -> str:
    """The text with goods stored on a hook taken out, sentence by sentence, where the
    sentence names no machine or lift ("an engine, its hoses still on, hung on the hook while
    it is pulled" stays)."""
    return "".join(part if _MACHINE_WORDS.search(part) else _STORAGE_HOOK.sub(" ", part)
                   for part in re.split(r"(?<=[.;!?\n])", _as_words(text)))


def _lifting_hint(r: _Reader, title, notes, tags, raw_loads, moving, criteria) -> str:
    """A job that reads like a lifting device but is not tagged one gets a warning, and what
    gave it away is returned (a rating is not posted on it): the easy slip is a hoist beam
    checked as a shelf, with no impact allowance and no lifting deflection limit. The tag
    ``not-lifting`` says it is not one."""
    if is_lifting(tags, criteria.lifting) or NOT_LIFTING in tags:
        return ""
    # goods stored on a hook ("two ladders hung on the hook") are not a load on a hoist's hook
    title, notes = (_off_storage_hooks(t) if isinstance(t, str) else t for t in (title, notes))
    said = _words_found(_LIFTING_WORDS, title, notes, tags, raw_loads, _LIFTING_TAGS)
    # a tag written as one run-together word ("hoistbeam", "jibcrane", "liftingdevice")
    said += [f"tag {t!r}" for t in tags if _LIFTING_STEMS.search(re.sub(r"[\W_]", "", t))
             and f"tag {t!r}" not in said]
    # "lifti", "liftin": the tag lifting cut short (or being typed: the text UI's lifting
    # caution then stays on from "lift" to "lifting" instead of going out for two keys)
    said += [f"tag {t!r}" for t in tags if len(t.strip()) > 4
             and "lifting".startswith(t.strip().lower()) and f"tag {t!r}" not in said]
    # "liftng", "lfting", "lifitng", "lift-ing": the tag lifting mistyped by a letter (or two
    # letters swapped); "lighting" is another word
    said += [f"tag {t!r}" for t in tags if _lifting_typo(t) and f"tag {t!r}" not in said]
    if not any(x.startswith("title") for x in said):  # and a run-together word of the title
        joined = [w for w in re.findall(r"[^\W\d_]+", str(title or ""))
                  if _LIFTING_STEMS.search(w)]
        said += [f"title: {joined[0]!r}"] if joined else []
    if moving:
        said.append("it has trolley wheels ([[moving]])")
    # a load hung from a lug (a lifting beam's shackle point) or on trolley wheels or clamp
    # jaws: the keys say what the words may not (a load hung below counts unless the words
    # name a fixture: a heater, sign, pipe or cable tray hangs below without being lifted)
    fixture = any(_search(_FIXTURE_WORDS, _as_words(t)) for t in (
        title, notes, *[ld.get("label") for ld in (raw_loads if isinstance(raw_loads, list)
                                                   else ()) if _is_table(ld)]) if t)
    for i, ld in enumerate(raw_loads if isinstance(raw_loads, list) else ()):
        # (a load hung below counts on a job that says nothing of its use: a shelf, rack or
        # pipe support tagged so hangs things below without lifting them)
        if _is_table(ld) and (ld.get("lug") is True or "wheels" in ld
                              or ld.get("flange") == "bottom" and ld.get("type") == "point"
                              and not _hangs_stored(tags) and not fixture):
            said.append(f"loads[{i}] has " + ("lug = true" if ld.get("lug") is True
                                               else "wheels" if "wheels" in ld
                                               else "flange = \"bottom\" (it hangs below)"))
            break
    if not said:
        return ""
    key = "tags" if tags else "title"
    hint = "; ".join(said[:3]) + ("; ..." if len(said) > 3 else "")
    r.warn(f"this reads like a lifting device ({hint}) but is not tagged lifting: it is "
           "checked like a shelf (no impact allowance, no lifting deflection limit) and not "
           "rated. Add tags = [\"lifting\"] if it carries a hoist or trolley, or the tag "
           f"\"{NOT_LIFTING}\" if it does not", key)
    return hint


# A word the text denies ("not electric", "no rain exposure", "never wet") says the opposite
_DENIED = re.compile(r"\b(?:no|not|non|without|never|nor)\b[\w\s-]{0,14}$", re.IGNORECASE)


def _search(words: re.Pattern, text: str):
    """The first match of `words` in `text` that the text does not deny, or None."""
    for m in words.finditer(text):
        if not _DENIED.search(text[max(0, m.start() - 24):m.start()]):
            return m
    return None


def _words_found(words: re.Pattern, title, notes, tags, raw_loads,
                 whole_tags=frozenset(), deny: bool = True) -> list[str]:
    """Where a job's title, notes, tags (or a tag in `whole_tags`) and first matching load
    label use one of `words` (and do not deny it; `deny=False`: read plainly, a "no" before
    the words denies nothing), in words for a warning."""
    find = _search if deny else (lambda w, text: w.search(text))
    said = []
    for key, text in (("title", title), ("notes", notes)):
        m = find(words, _as_words(text))
        if m:
            said.append(f"{key}: {m.group(0)!r}")
    said += [f"tag {t!r}" for t in tags if isinstance(t, str) and words.search(_as_words(t))
             or t in whole_tags]
    for i, ld in enumerate(raw_loads if isinstance(raw_loads, list) else ()):
        label = ld.get("label") if _is_table(ld) else None
        if isinstance(label, str) and find(words, _as_words(label)):
            said.append(f"loads[{i}] is labelled {label!r}")
            break
    return said


def _as_words(text) -> str:
    """Free text as words for the word rules: full-width letters as plain ones (NFKC),
    underscores and camel case as spaces ("hoist_beam", "LiftingBeam" -> "hoist beam",
    "Lifting Beam"), so a word joined up in a tag or file-name style title is still read."""
    import unicodedata  # noqa: PLC0415

    # the ordinal sign typed for a degree sign ("140 \u00baF") stays a degree (NFKC makes it "o")
    t = unicodedata.normalize("NFKC", str(text or "").replace("\u00ba", "\u00b0"))
    t = re.sub(r"(?<=[a-z])(?=[A-Z])", " ", t)
    return t.replace("_", " ")


_VEHICLE_WORDS = re.compile(
    r"\b(trailers?(?! (?:parks?|bays?|docks?|yards?|lots?|parking|storage)\b)|truck (?:bed|body|deck|frame)s?|flat ?beds?|pickup (?:bed|truck)s?|"
    r"vehicles?|chassis|car haulers?|cargo decks?|vans?(?! de[nr]?\b)|utes?|pickup (?:ladder )?(?:racks?|box(?:es)?)|"
    r"service bod(?:y|ies)|headache racks?|ladder racks? (?:on|for) (?:a|the) (?:truck|van)|"
    r"bus (?:luggage|racks?|shel(?:f|ves))|luggage racks?|rvs?|campers?|motor ?homes?|"
    r"caravans?|tow dolly|tow dollies|tow[- ]?behind|pull[- ]?behind|hitch[- ]?mounted|towed|towable|fork ?lift (?:attachments?|forks?|extensions?|"
    r"booms?|jibs?|platforms?|carriages?)|fork extensions?|skid ?steers?|telehandlers?|"
    r"tractor (?:attachments?|loaders?|booms?|forks?|buckets?|frames?)|"
    r"boat (?:racks?|bunks?)|(?:work|box|dump|stake|utility|service|flatbed|tow|semi) trucks?|"
    r"(?<!hand )(?<!pallet )truck (?:racks?|toolbox(?:es)?|shel(?:f|ves)|beds?|boxes)|roof racks?|"
    r"hitch (?:cargo )?(?:carriers?|racks?|baskets?)|goosenecks?|lowboys?|stake beds?|"
    r"dump bod(?:y|ies)|atv racks?|semi(?:-| )?(?:trailers?|decks?)|"
    r"(?:on|for|in|under) (?:my|the|a|our) (?:truck|pickup|van(?! de)|trailer(?! park))|"
    r"truck cross ?members?|tailgates?|food trucks?|fire (?:engines?|trucks?)|horse floats?|"
    r"wagons?)\b",
    re.IGNORECASE)
NOT_VEHICLE = "not-vehicle"  # the tag that says a job that reads like one is not on a vehicle


def _vehicle_hint(r: _Reader, title, notes, tags, raw_loads, criteria, lifting: bool) -> str:
    """A member of a road vehicle (a trailer cross member, a truck bed rail) with no `impact`
    written: road shock multiplies the payload (bumps of 1.5 to 3 g are usual design figures
    for trailers, common practice, from memory) and a static figure would be read as the
    payload it may carry. Warned; the words that gave it away are returned (no rating is
    posted until impact is given). A lifting job has its own impact."""
    if lifting or criteria.impact is not None or NOT_VEHICLE in tags:
        return ""
    said = _words_found(_VEHICLE_WORDS, title, notes, tags, raw_loads)
    if not said:
        return ""
    hint = "; ".join(said[:3])
    r.warn(f"this reads like a member of a road vehicle or mobile machine ({hint}) but gives no impact: road "
           "shock over bumps multiplies the payload (trailers are commonly designed for 1.5 to "
           "3 g, from memory), so a static figure would overstate what may be carried and no "
           "rating is posted. Write [criteria] impact = \"100%\" (or the vehicle maker's "
           "figure) for the road shock, impact = \"0%\" for a member that is only loaded "
           f"while parked, or the tag \"{NOT_VEHICLE}\" if it is not on a vehicle (a shelf at a "
           "truck dock)", "criteria.impact")
    return hint


_GLULAM_WORDS = re.compile(r"\b(glue?[- ]?lams?|glue?d?[- ]?laminated|\d\dF-(?:[VE]\d+|\d\.\dE))\b",
                           re.IGNORECASE)


def _glulam_words(r: _Reader, title, notes, tags, material, data) -> None:
    """A wood member the job calls glued-laminated (glulam, a stress class such as 24F-V4)
    with sawn-lumber or LVL values: glulam has its own design values and a volume factor CV
    that lowers Fb in long, deep members (NDS 2018 5.3.6, from memory), which are not
    applied here, so no rating is posted on it."""
    if getattr(material, "kind", "") not in ("lumber", "wood"):
        return
    mat = data.get("beam", {}).get("material") if _is_table(data.get("beam")) else None
    # the title, tags and material name the member itself (notes may name a neighbour: a
    # joist hung from a glulam ridge)
    said = _words_found(_GLULAM_WORDS, title, "", tags, [])
    if isinstance(mat, str) and _GLULAM_WORDS.search(mat):
        said.append(f"material {mat!r}")
    if not said:
        return
    hint = "; ".join(said[:2])
    r.hold(f"this reads like a glued-laminated (glulam) member ({hint}), but the values used "
           "are sawn-lumber or LVL values: glulam's own design values and its volume factor "
           "CV (NDS 2018 5.3.6, from memory) are not applied, and no rating is posted. Check "
           "it by the glulam maker's tables, or remove the word if it is sawn lumber",
           "beam.material",
           f"glulam is not covered ({hint}): the sawn-lumber values used overstate a long, "
           "deep glulam member (volume factor CV, NDS 2018 5.3.6, from memory)")


def _aluminium_fixed_end(r: _Reader, beam: dict, material, supports, system: str) -> None:
    """An aluminium member with a fixed end and no `welded` written: the usual shop-built
    fixed end is welded, and welding anneals the metal within about 1 in of the weld (6061-T6
    Fty 35 ksi, welded Ftyw 15 ksi: ADM 2015 Table A.3.3, from memory) right where a fixed
    end's moment is largest, so a figure on the unwelded strength may be twice what the weld
    zone carries. Held until the job says which."""
    if getattr(material, "kind", "") != "aluminum" or "welded" in beam \
            or not getattr(material, "fy_welded", None):
        return
    fixed = [s for s in supports if s.kind == "fixed"]
    if not fixed:
        return
    keys = ", ".join(s.key or f"at {s.at:g} m" for s in fixed)
    weak = units.fmt(material.fy_welded, "stress", system)
    strong = units.fmt(material.fy, "stress", system)
    r.hold(f"aluminium member with a fixed end ({keys}) and no welded key: a welded end puts "
           f"the weld's heat-affected zone (yield {weak} against {strong} unwelded, ADM 2015, "
           "from memory) at the largest moment. Write [beam] welded = true to check it at the "
           "welded strength, or welded = false if the end is bolted, clamped or socketed with "
           f"no weld within {_inch_words(system)} of it", "beam",
           f"an aluminium member with a fixed end ({keys}) gives no welded key, and a welded "
           "end is weaker where the moment is largest. Write welded = true or false")


def _inch_words(system: str) -> str:
    """The reach of a weld's heat-affected zone in the job's units (ADM 2015: 1 in)."""
    return "25 mm" if system == "si" else "1 in"


_WELD_WORDS = re.compile(
    r"\b(?:(?:(?:tig|mig|spot|stitch|seam|fillet|plug)[- ]?)?weld(?:s|ed|ing|ments?)?|"
    r"(?:tig|mig)(?:'d|ed|[- ]on)|gtaw|gmaw|smaw|fcaw|"
    r"tack(?:s|ed)?[- ](?:welded|on)|tack welds?)\b", re.IGNORECASE)


def _aluminium_weld_words(r: _Reader, beam: dict, material, title, notes, tags, raw_loads,
                          system: str, more=()) -> None:
    """An aluminium member whose words say welded ("a lug welded on top at mid-span", "ends
    welded to the frame") and no `welded` key: welding anneals the metal near the weld to
    well under half its temper's yield (6061-T6 Fty 35 ksi, welded Ftyw 15 ksi: ADM 2015
    Table A.3.3/A.3.4, from memory), so a figure on the unwelded strength may be twice what
    the weld zone carries. Held until the job says which, as the wood's wet words are;
    `welded = false` beside the words is warned (the words may be about something else)."""
    if getattr(material, "kind", "") != "aluminum":
        return
    said = _words_found(_WELD_WORDS, title, notes, tags, raw_loads)
    for where, text in more:  # a support's label, the [project] block
        if isinstance(text, str) and _search(_WELD_WORDS, _as_words(text)):
            said.append(f"{where}: {text!r}")
    if not said:
        return
    where = "; ".join(said[:2])
    if not getattr(material, "fy_welded", None):
        # a typed-in aluminium with no welded strength: the weld zone's cannot be checked
        if beam.get("welded") is not False:
            r.hold(f"the job's words say welded ({where}), but the typed-in aluminium gives no "
                   "fy_welded: welding anneals the metal near the weld to well under half its "
                   "temper's yield (6061-T6 Fty 35 ksi, welded Ftyw 15 ksi: ADM 2015 Table "
                   "A.3.3/A.3.4, from memory), and the checks used the unwelded fy. Give "
                   "fy_welded under [beam.material] and welded = true, or write welded = false "
                   f"if no weld is within {_inch_words(system)} of the highly stressed parts",
                   "beam.material", f"the words say welded ({where}) on a typed-in aluminium "
                   "with no fy_welded: give fy_welded and welded = true, or welded = false")
        return
    weak = units.fmt(material.fy_welded, "stress", system)
    strong = units.fmt(material.fy, "stress", system)
    if "welded" not in beam:
        r.hold(f"the job's words say welded ({where}) but [beam] has no welded key: a weld on "
               f"an aluminium member anneals it nearby (yield {weak} against {strong} "
               "unwelded, ADM 2015 Table A.3.3/A.3.4, from memory), and the checks used the "
               "unwelded strength. Write welded = true to check it at the welded strength, "
               f"or welded = false if no weld is within {_inch_words(system)} of the highly "
               "stressed parts",
               "beam", f"the words say welded ({where}) on an aluminium member with no welded "
               "key: write welded = true or false")
    elif beam.get("welded") is False:
        r.warn(f"welded = false, but the job's words say welded ({where}): a weld within "
               f"{_inch_words(system)} "
               f"of the highly stressed parts weakens aluminium to {weak} yield (ADM 2015, from "
               "memory); keep welded = false only if every weld is away from them", "beam.welded")


def _rack_fixed_ends(r: _Reader, tags, supports, length) -> None:
    """A rack beam between uprights with a fixed end: its connector (a clip or hook into the
    upright) is semi-rigid at best, rated by test (ANSI MH16.1, from memory), and far from the
    member's full end moment, so a figure resting on a fixed end is not posted. A cantilever
    arm, fixed to its column by design, is not meant."""
    if not RACK_TAGS.intersection(tags) or length is None or not supports:
        return
    if has_free_end(supports, length):
        return
    fixed = [s for s in supports if s.kind == "fixed"]
    if fixed:
        keys = ", ".join(s.key or f"at {s.at:g} m" for s in fixed)
        r.hold(f"a rack beam between uprights with a fixed end ({keys}): a beam connector hooked "
               "or clipped into an upright is semi-rigid at best, its moment capacity found by "
               "test (ANSI MH16.1, from memory), far below the full end moment a fixed end "
               "takes, so no rating is posted on it. Make the ends pin and roller (the usual "
               "screening assumption), or have the connector's tested moment capacity checked",
               fixed[0].key + ".type" if fixed[0].key else "supports",
               f"a rack beam with a fixed end ({keys}) rests on a connector moment no clip "
               "develops. Make the ends pin and roller")


def _odd_springs(r: _Reader, supports, section, material, length, system: str) -> None:
    """A spring far softer or far stiffer than the member itself (48 E I / L^3, its stiffness
    at mid-span on two supports): a unit slip ("5 lbf/in" for 5 kip/in) makes the member ride
    on the spring, which a bigger section will not cure; a huge one is a rigid support."""
    if section is None or material is None or not length:
        return
    own = 48 * material.e * section.ix / length ** 3
    for sp in supports:
        if sp.kind != "spring" or not sp.stiffness:
            continue
        k = units.fmt(sp.stiffness, "stiffness", system)
        if sp.stiffness < own / 100:
            r.warn(f"the spring at {units.fmt(sp.at, 'length', system)} ({k}) is over 100 times "
                   f"softer than the member itself (48 E I / L^3 = "
                   f"{units.fmt(own, 'stiffness', system)}): the member rides on it, and a "
                   "deflection or rating that fails there is the spring's settling, which a "
                   "bigger section will not cure. Check its stiffness and unit (kip/in, not "
                   "lbf/in?)", f"{sp.key}.stiffness")
        elif sp.stiffness > own * 1e6:
            r.warn(f"the spring at {units.fmt(sp.at, 'length', system)} ({k}) is a million times "
                   f"stiffer than the member (48 E I / L^3 = "
                   f"{units.fmt(own, 'stiffness', system)}): it acts as a rigid support; write "
                   "type = \"roller\" (or \"pin\") if that is meant, or check the unit",
                   f"{sp.key}.stiffness")


_METRIC = re.compile(r"\d\s*(?:m|mm|cm|metres?|meters?)\b", re.IGNORECASE)
_IMPERIAL = re.compile(r"\d\s*(?:ft|feet|foot|in|inch|inches|'|\"|\u2032|\u2033)", re.IGNORECASE)


def _length_in_other_units(r: _Reader, data) -> None:
    """The member's length written in one system and every position in the other ("12 m" on a
    job whose supports and loads are all in feet): most likely the wrong unit on the length,
    which adds an unloaded overhang whose own weight can even raise the figure."""
    beam = data.get("beam") if _is_table(data.get("beam")) else {}
    raw = beam.get("length")
    if not isinstance(raw, str):
        return
    if _METRIC.search(raw):
        here, same, other = "metric", _METRIC, _IMPERIAL
    elif _IMPERIAL.search(raw):
        here, same, other = "US", _IMPERIAL, _METRIC
    else:
        return
    where = []
    for name in ("supports", "loads"):
        rows = data.get(name)
        for t in rows if isinstance(rows, list) else ():
            if _is_table(t):
                where += [v for k, v in t.items() if k in ("at", "start", "end")
                          and isinstance(v, str)]
    if not where:
        return
    if all(other.search(v) and not same.search(v) for v in where):
        them = "feet and inches" if here == "metric" else "metric units"
        r.hold(f"length = {raw!r} is in {here} units while every support and load position is "
               f"in {them}: most likely the wrong unit on the length (it changes the member "
               "past the last support, whose own weight can even raise the figure), so no "
               "rating is posted. Write the length in the units of the positions",
               "beam.length",
               f"length = {raw!r} is in {here} units and every position in {them}: write "
               "them in one system")


NOT_CUT = "not-cut"  # the tag that says a job whose words read like a cut member is not one
# a cut word after "no", "not", "without" or "never" (a word or two before) says the member
# is NOT cut; "drilled-in anchors" and the "teardrop slots" of rack uprights are elsewhere
_CUT_WORDS = re.compile(
    r"(?<!\bno )(?<!\bnot )(?<!\bwithout )(?<!\bnever )(?<!\bteardrop )"
    r"\b(coped|copes?|coping|notch(?:ed|es)?|holes?|drilled(?![- ]in\b)|bored|cut-?outs?|"
    r"slotted|slots?|openings? in the (?:web|flange)|penetrations?)\b"
    # ...nor the holes or slots of what the member is fixed to ("bolted through slotted holes
    # in the column flange")
    # (not "the column end of the arm", "the post side": a part of this member named by
    # what it meets)
    r"(?!(?: holes?| slots?)? (?:in|on|of|through) (?:the |a |an )?(?:uprights?|posts?|"
    r"columns?|walls?|slab|floor|cap plates?|base plates?)\b(?!(?: [\w-]+)?? (?:ends?|sides?|"
    r"faces?|edges?)\b))",
    re.IGNORECASE)


def _cut_hint(r: _Reader, title, notes, tags, raw_loads) -> None:
    """A member the title, notes or a load label say is coped, notched or holed: the checks
    are of the full section, which the cut weakens, so no rating is posted (as for a cut
    key). The tag ``not-cut`` says the words do not mean this member is cut."""
    if NOT_CUT in tags:
        return
    said = _words_found(_CUT_WORDS, title, notes, tags, raw_loads)
    if not said:
        return
    hint = "; ".join(said[:3])
    r.hold(f"this reads like a cut member ({hint}): shopbeam does not model notches, copes, "
           "holes or cut-outs and checks the full section, which the cut weakens, so no rating "
           "is posted. Have the cut member checked (AISC Manual Part 9 for a coped end, AISC "
           "360-16 B4.3 and J4 for holes, NDS 3.2.3 and 3.4.3 for notched wood), or add the "
           f"tag \"{NOT_CUT}\" if this member is not cut", "tags" if tags else "title",
           f"it reads like a cut member ({hint}): the checks are of the full section the cut "
           f"weakens. Have the cut checked, or add the tag \"{NOT_CUT}\" if it is not cut")


# where the racks are, not what the member is ("a lean-to over the lumber racks", "the hoist
# runs above the die racks")
_RACK_PLACE = re.compile(r"\b(?:over|above|under|beneath|below|beside|behind|next to|near|"
                         r"by|past|around|along|alongside|in front of|opposite) "
                         r"(?:the |a |an |our |two |three |four )?(?:[\w-]+ ){0,2}?"
                         r"(?:racks?|racking)\b", re.IGNORECASE)
# a plant's equipment skid, named so once: the job's other "skid" words are that skid
_EQUIPMENT_SKID = re.compile(r"\b(?:chiller|pump|equipment|compressor|process|tank|generator|"
                             r"boiler|fan|motor|heater|filter|unit|handler|ahu|hvac|"
                             r"machine|welder) skids?\b|\bskid[- ]mounted\b", re.IGNORECASE)


def _rack_hint(r: _Reader, title, notes, tags, raw_loads, lifting: bool = False,
               vehicle: str = "") -> None:
    """A job that reads like a storage rack ("pallet rack beam", "racking") but is not
    tagged one is warned: the rack cautions (the impact load is not added unless given) and
    the rating label's per-level wording are for rack-tagged jobs. The tag ``not-rack`` says
    it is not one. A lifting device (a hoist beam over the die racks) and a member of a
    vehicle (a headache rack, a skid steer's pallet forks) are not storage racks, and words
    that say where the racks are ("over the lumber racks") do not name the member."""
    if RACK_TAGS.intersection(tags) or NOT_RACK in tags or lifting or vehicle:
        return
    title = _RACK_PLACE.sub(" ", _as_words(title)) if isinstance(title, str) else title
    notes = _RACK_PLACE.sub(" ", _as_words(notes)) if isinstance(notes, str) else notes
    if _EQUIPMENT_SKID.search(" | ".join(_as_words(t) for t in (title, notes)
                                         if isinstance(t, str))):
        # that skid, named again ("the skid", "each skid rail", a tag "skid"); skids of goods
        # ("a skid of filter media", "skids of castings") stay rack words
        tags = [t for t in tags if not (isinstance(t, str) and re.fullmatch(
            r"skid", _as_words(t).strip(), re.IGNORECASE))]
        that = re.compile(r"\b(?:the|this|that|its|each|a|one) skid\b(?!s)(?! of\b)|"
                          + _EQUIPMENT_SKID.pattern,
                          re.IGNORECASE)
        title, notes = (that.sub(" ", _as_words(t)) if isinstance(t, str) else t
                        for t in (title, notes))
        raw_loads = [{**ld, "label": that.sub(" ", _as_words(ld["label"]))}
                     if _is_table(ld) and isinstance(ld.get("label"), str) else ld
                     for ld in (raw_loads if isinstance(raw_loads, list) else ())]
    said = _words_found(_RACK_WORDS, title, notes, tags, raw_loads)
    floor = _search(_FLOOR_WORDS, " | ".join(_as_words(t) for t in (title, notes)))
    if not said and not floor and \
            not (FLOOR_TAGS | SHELF_TAGS).intersection(normal_tag(t) for t in tags):
        # pallets, a bar-stock or lumber arm: a rack unless it is a floor that
        # carries pallets (a platform or mezzanine)
        said = _words_found(_RACK_SOFT, title, notes, tags, raw_loads)
        if said and _DOCK_WORDS.search(" | ".join(_as_words(t) for t in (title, notes))) \
                and not _RACK_LEVEL_WORDS.search(" | ".join(
                    _as_words(t) for t in (title, notes, *(
                        x.get("label") for x in (raw_loads or []) if _is_table(x)))
                    if isinstance(t, str))):
            # pallets at a loading dock (a bumper rail, a dock plate) are not stored on a rack
            said = [w for w in said if not re.search(r"pallet", w, re.IGNORECASE)]
    if not said:
        return
    hint = "; ".join(said[:3])
    r.hold(f"this reads like a storage rack ({hint}) but is not tagged rack: "
           "the rack cautions (the ANSI MH16.1 impact load, not added unless impact is given) "
           "and the rating label's per-level wording are not applied, and no rating is posted. "
           "Add tags = [\"rack\"] "
           f"if it is a rack member, or the tag \"{NOT_RACK}\" if it is not",
           "tags" if tags else "title",
           f"it reads like a storage rack ({hint}) but is not tagged rack, so the rack's impact "
           f"load was not asked for. Tag it \"rack\" (and give impact), or \"{NOT_RACK}\"")


def _upward_wheels(r: _Reader, moving: tuple, system: str) -> list[str]:
    """A wheel that pushes up is a forgotten minus sign (a wheel can only bear down)."""
    out = []
    for ws in moving:
        for what, values in (("loads", ws.live), ("dead", ws.dead)):
            up = [v for v in values if v > 0]
            if not up:
                continue
            shown = units.fmt(max(up), "force", system)
            r.warn(f"{len(up)} wheel load(s) in {what} point UP (largest +{shown.lstrip('+')}): "
                   f"forces are + up and a wheel bears down, so each is negative "
                   f"(\"-{shown.lstrip('+')}\")", f"{ws.key}.{what}")
            out.append(f"{ws.key}.{what} ({ws.label})")
    return out


def _family_mismatch(r: _Reader, section, material, system: str = "us") -> None:
    """A lumber size in steel, or a steel shape in lumber, is refused: the checks and the
    weight would be for a member that does not exist."""
    if section is None or material is None:
        return
    lumber_size = is_wood_size(section)
    mkind = getattr(material, "kind", "custom")
    if mkind == "custom":
        # a typed-in material without a kind is a wood or a metal by its stiffness (wood
        # under about 20 GPa, metals over 40 GPa, common practice): a lumber size in a
        # typed-in metal, or a rolled shape in a typed-in wood, is the same mismatch
        e = getattr(material, "e", 0.0)
        typed = "a typed-in " + ("wood" if e < WOOD_E_MAX else "metal")
        if lumber_size and e >= WOOD_E_MAX or (
                not lumber_size and e < WOOD_E_MAX and is_steel_shape(section)):
            r.error(f"section {section.designation!r} is "
                    + ("a lumber size" if lumber_size else f"a metal shape ({section.shape})")
                    + f" but the material is {typed} (e = {units.fmt(e, 'stress', system)}): "
                    + ("give kind = \"lumber\" with the wood's values, or a metal section "
                       "([beam.section] shape = \"rect-bar\" with its sizes)" if lumber_size
                       else "check e (steel is 29,000 ksi, aluminium 10,100 ksi), or give a "
                       "lumber size with kind = \"lumber\""), "beam.section")
            return
        if e < WOOD_E_MAX:
            # a wood's stiffness (or a plastic's, FRP's) with no kind is checked as a metal
            # on first yield: no beam stability (NDS 3.3.3 CL), shear at 0.6 fy instead of
            # Fv, no bearing across the grain; a glulam's values typed in land here
            r.hold(f"the typed-in material has e = {units.fmt(e, 'stress', system)}, a wood's "
                   "stiffness (or a plastic's or FRP's), but no kind, so it is checked as a "
                   "metal on first yield: a wood's beam stability (NDS 2018 3.3.3, CL), its "
                   "shear (Fv, well under 0.6 fy) and its bearing across the grain (3.10) "
                   "are not checked. For a wood give kind = \"lumber\" with fb, fv and "
                   "fc_perp (its reference values), or use a built-in grade such as "
                   "\"DF-L-2\"; a plastic or FRP member needs its maker's design method",
                   "beam.material.e",
                   "a typed-in material with a wood's stiffness and no kind is checked as a "
                   "metal on first yield (no beam stability, wood shear or bearing)")
    wrong = catalog.not_made_in(section, material)
    if wrong:
        r.error(wrong, "beam.section")
    else:
        _grade_mismatch(r, section, material, mkind, system)
    gap = wood_gap(section, material)
    if gap:
        r.warn(f"{gap}: no rating is posted", "beam.material")
    elif mkind == "lumber" and _is_lvl_size(section) and not _is_lvl(material):
        r.warn(f"section {section.designation!r} is an LVL size but material {material.key!r} "
               "is a sawn grade: it is checked at the sawn grade's values (on the safe side, "
               "LVL is stronger). Write material = \"LVL-2.0E\" (or the maker's values) for "
               "LVL", "beam.material")


# a sawn lumber grade named in words beside a lumber size or a species ("2x10 No.2",
# "No. 1 DF", "Select Structural joists"), and the grade word in a material key ("DF-L-2")
_GRADE_NO = r"(?:(?<![\w#])No\.?\s?|(?<![\w#])#)([123])\b"
_GRADE_BTR = re.compile(_GRADE_NO + r"\s*(?:&|and)\s*(?:btr|better)\b", re.IGNORECASE)
_GRADE_WORDS = re.compile(
    r"(?:\b\d+x\d+\s+|\b(?:DF|DF-L|Doug(?:las)? fir|SPF|HF|Hem[- ]?fir|SP|SYP|pine|"
    r"larch)\s+)"
    + _GRADE_NO
    + r"|" + _GRADE_NO
    + r"(?:\s*(?:&|and)\s*(?:btr|better))?\s+(?:grade|DF|DF-L|Doug|SPF|HF|Hem|SP\b|SYP|"
    r"pine|fir|joists?|lumber|studs?|boards?|planks?|rafters?)"
    r"|\bgrade\s+(?:No\.?\s?|#)?([123])\b"
    r"|\b(select structural|sel\.? str\.?)", re.IGNORECASE)


def _grade_words(r: _Reader, material, title, notes) -> None:
    """A sawn lumber grade named in the title or notes that is not the material's ("2x10
    No.2 joists" with material DF-L-SS): the checks take the key's grade, and Select
    Structural's Fb is 1.7 times No.2's (NDS Supplement Table 4A, from memory). Warned, and
    no rating is posted while they disagree."""
    key = getattr(material, "key", "") or ""
    if getattr(material, "kind", "") != "lumber" or key.startswith("LVL"):
        return
    text = " | ".join(str(x) for x in (title, notes) if isinstance(x, str))
    said = set()
    for m in _GRADE_WORDS.finditer(text):
        said.add("SS" if m.group(4) else (m.group(1) or m.group(2) or m.group(3)))
    for m in _GRADE_BTR.finditer(text):  # "#2 and better": a lumber grade on its own
        said.add(m.group(1))
    if key in ("", "custom"):
        _typed_above_grade(r, material, text, said)
        return
    mine = key.rsplit("-", 1)[-1].upper()
    other = sorted(g for g in said if g != mine)
    if other and mine not in said:
        words = ", ".join("Select Structural" if g == "SS" else f"No.{g}" for g in other)
        grade = 'Select Structural' if mine == 'SS' else 'No.' + mine
        r.hold(f"the title or notes name the grade {words}, but material {key!r} is {grade}: "
               "the checks take the material's grade (its Fb and Fv; Select Structural's Fb is "
               "1.7 times No.2's), so no rating is posted while they disagree. Give the grade "
               "the stamp on the lumber shows, or reword the notes if they speak of another "
               "member", "beam.material",
               f"the notes name the grade {words} but material {key!r} is {grade}: give the "
               "grade on the stamp")


_SPECIES_WORDS = (("DF-L", re.compile(r"\b(?:df(?:-l)?|douglas|doug[- ]?fir|fir[- ]larch)\b",
                                       re.I)),
                  ("HF", re.compile(r"\b(?:hf|hem[- ]?fir)\b", re.I)),
                  ("SPF", re.compile(r"\b(?:spf|spruce[- ]pine[- ]fir)\b", re.I)),
                  ("SP", re.compile(r"\b(?:sp|syp|southern (?:yellow )?pine)\b", re.I)))


def _typed_above_grade(r: _Reader, material, text: str, grades: set) -> None:
    """Typed-in lumber values (no key) beside words that name a species and grade shopbeam
    lists ("DF-L No.2, stamped"): where the typed Fb or E is above that grade's, the values
    are another grade's (Select Structural's typed for No.2), and the figure would be rated
    on them: NOT RATED. Values at or below it, or a species not listed (cedar), say nothing."""
    if len(grades) != 1:
        return
    grade = next(iter(grades))
    for sp, words in _SPECIES_WORDS:
        if not words.search(text):
            continue
        named = get_material(f"{sp}-{grade}")
        if named is None or getattr(named, "kind", "") != "lumber":
            return
        over = [(what, typed, ref) for what, typed, ref in (
            ("Fb", getattr(material, "fb", None), getattr(named, "fb", None)),
            ("E", material.e, named.e)) if typed and ref and typed > 1.05 * ref]
        if over:
            q = (lambda x: f"{x / units.PSI:,.0f} psi") if r.system == "us" else (  # noqa: E731
                lambda x: units.fmt(x, "stress", r.system))
            said = ", ".join(f"{w} {q(t)} against {q(ref)}" for w, t, ref in over)
            r.hold(f"the words name {named.name} ({named.key}), but the typed-in values are "
                   f"above that grade's ({said}; NDS Supplement values, from memory): another "
                   "grade's values typed for this one would rate the member too high, so no "
                   f"rating is posted. Write material = \"{named.key}\", or type the stamped "
                   "grade's values", "beam.material",
                   f"the typed-in wood values are above those of {named.key}, the grade the "
                   f"words name ({said})")
        return


ROUGH_SAWN = "rough-sawn"  # the tag that says a wood section's full sizes are its real ones
_NOMINAL_THICK = (1, 2, 3, 4, 6, 8)
_NOMINAL_WIDE = (2, 3, 4, 6, 8, 10, 12, 14, 16)


def _nominal_as_dressed(r: _Reader, section, material, tags, system: str) -> None:
    """A wood [beam.section] rect-bar typed at a lumber size's nominal inches (2 x 10 for a
    2x10, whose dressed sizes are 1-1/2 x 9-1/4 in): read as written, its section modulus is
    half as much again as the board's (2 x 10^2 / 6 = 33.3 in^3 against 21.4), so the
    figure posted is too. Held until written as the size ("2x10") or its dressed sizes, or
    tagged rough-sawn (full-sawn timber, which is that size)."""
    if section is None or getattr(material, "kind", "") != "lumber" or \
            section.shape != "rect-bar" or catalog.is_lumber_size(section) or \
            ROUGH_SAWN in {normal_tag(t) for t in tags}:
        return
    b, h = (section.dims.get(k, 0.0) / 0.0254 for k in ("b", "h"))
    th, wi = sorted((b, h))
    whole = lambda x: abs(x - round(x)) < 1e-6  # noqa: E731
    if not (whole(th) and whole(wi) and round(th) in _NOMINAL_THICK
            and round(wi) in _NOMINAL_WIDE):
        return
    name = f"{round(th)}x{round(wi)}"
    t, w = catalog.dressed(round(th), round(wi))
    dress = {round(th): t, round(wi): w}  # b and h as typed (on edge or flat)
    ratio = b * h ** 2 / (dress[round(b)] * dress[round(h)] ** 2)
    write = (f"section = \"{name}\" (or the dressed sizes)"
             if (round(th), round(wi)) in catalog.LUMBER_SIZES else "the dressed sizes")
    r.hold(f"the wood section is typed {round(th)} x {round(wi)} in, the nominal size of a "
           f"{name}, whose dressed sizes are {t:g} x {w:g} in: read as written, its section "
           f"modulus is {ratio:.2f} times the board's, and so is the "
           f"figure posted. Write {write}; for full-sawn "
           f"timber of that real size, add the tag \"{ROUGH_SAWN}\"", "beam.section",
           f"the wood section is typed at the nominal size of a {name} ({round(th)} x "
           f"{round(wi)} in; dressed {t:g} x {w:g}): write section = \"{name}\", or tag "
           f"it \"{ROUGH_SAWN}\" if it is full-sawn")


_TUBES = ("rect-tube", "round-tube", "pipe")


def _a(word: str) -> str:
    return ("an " if word[:1] in "aeiou" else "a ") + word


_ROLLED_GRADES = ("A36", "A572-50", "A992")  # grades of rolled shapes, plate and bar
EN_SECTIONS = "EN 10365"  # the source of the catalog's European sections (IPE, HE, UPN)
EN_TUBES = "EN 10219"  # ... and of its European hollow sections (SHS, RHS, CHS)


def is_en_section(section) -> bool:
    """A catalog section of a European standard, made to EN grades (S235, S275, S355)."""
    return str(getattr(section, "source", "") or "").startswith((EN_SECTIONS, EN_TUBES))


def _is_lvl_size(section) -> bool:
    return section is not None and "LVL size" in (getattr(section, "source", "") or "")


def _is_lvl(material) -> bool:
    return str(getattr(material, "key", "")).upper().startswith("LVL")


def wood_gap(section, material) -> str:
    """Why no rating may rest on this wood product for this section: a sawn lumber size
    given an LVL grade, credited LVL's strength (2600 psi against about 1000 psi for a sawn
    No.2, NDS Supplement 2018 Table 4A, from memory) though LVL is made in 1-3/4 in plies, not
    in sawn sizes ("" when none). Judged per section, as grade_gap is."""
    if section is None or getattr(material, "kind", "") != "lumber" or not _is_lvl(material):
        return ""
    if is_wood_size(section) and not _is_lvl_size(section):
        return (f"section {section.designation!r} is a sawn lumber size but material "
                f"{material.key!r} is LVL, which is made in 1-3/4 in plies (the LVL sizes, e.g. "
                "\"LVL1-3/4x9-1/4\"): the check would credit a sawn stick with LVL's strength, "
                "about 2.6 x a sawn No.2's. Give the LVL size, or the sawn grade")
    return ""


def grade_gap(section, material, system: str = "us") -> str:
    """Why no rating may rest on this grade for this section: a grade the product is not
    made to that credits more yield than the grade it is bought in ("" when none), for any
    section a check or a sizing sweep puts with the material (`_grade_mismatch`)."""
    mkind = getattr(material, "kind", "custom")
    if section is None or material is None or mkind == "custom":
        return ""
    return _grade_mismatch(_Reader("", None), section, material, mkind, system)


def _grade_mismatch(r: _Reader, section, material, mkind: str, system: str) -> str:
    """A grade that the product is not made to gets a warning naming the usual grade: a tube
    grade on a rolled shape or bar (the check would credit a yield that shape is not bought
    at), a rolled-shape grade on tube, an aluminium or stainless member given a steel shape
    from the AISC catalog (its dimensions are the steel shape's). Product grades: AISC Manual
    15th ed. Table 2-4 and the ASTM product specifications (common practice; from memory)."""
    key = getattr(material, "key", "")
    shape = section.shape
    where = "beam.material"
    said = len(r.problems)
    usual = ""  # the grade the product is bought in, where the job's is not one it is made to
    if mkind == "steel" and key not in EN_GRADES and get_material(key) is not None \
            and is_en_section(section):  # a built-in ASTM grade (a typed-in one is the cert's)
        usual = "S235"
        family = section.source.split(" ", 2)[:2]
        r.warn(f"section {section.designation!r} is a European section ({' '.join(family)}), "
               f"made to EN grades (S235: fy 235 MPa, S355: 355 MPa, up to 16 mm thick), "
               f"not ASTM {key}: the check credits "
               f"{units.fmt(material.fy, 'stress', system)}, which an S235 section does not "
               "have. Write the mill cert's grade: material = \"S235\", \"S275\" or "
               "\"S355\" (EN 10025-2 / EN 10219-1, from memory)", where)
    elif mkind == "steel" and key in EN_GRADES and (
            shape == "pipe" or catalog.kind_of(section) in ("mech-tube", "mech-round")):
        usual = "A53-B" if shape == "pipe" else "A513"
        product = ("pipe, made to ASTM A53 (Gr B, Fy 35 ksi)" if shape == "pipe" else
                   "mechanical tube, made to ASTM A513 (as-welded, Fy about 30 ksi)")
        r.warn(f"material {key!r} is a European structural grade, but section "
               f"{section.designation!r} is {product} (AISC Manual Table 2-4 and ASTM, from "
               f"memory): the check credits {units.fmt(material.fy, 'stress', system)}. Write "
               f"material = \"{usual}\", or the grade on the mill cert", where)
    elif mkind == "steel" and getattr(material, "hss_wall_factor", None) is not None \
            and shape not in _TUBES + ("custom",):
        bought = ("A992 (W shapes) or A36 / A572-50 (S, C, MC, angles, tees, plate and bar)")
        w_shape = section.designation.upper().startswith(("W", "HP", "WT"))
        usual = "A992" if w_shape and not section.source.startswith(EN_SECTIONS) else "A36"
        r.warn(f"material {key!r} is a grade of tube or pipe, but section "
               f"{section.designation!r} is {_a(shape)}: that product is bought as {bought}, so "
               f"the check may credit a yield ({units.fmt(material.fy, 'stress', system)}) the "
               "member does not have. Give the grade on the mill cert", where)
    elif mkind == "steel" and key in _ROLLED_GRADES and shape in _TUBES:
        # held while it credits more than the tube's own grade (pipe: A53 Gr B, 35 ksi)
        usual = ("A53-B" if shape == "pipe" else "A513"
                 if catalog.kind_of(section) in ("mech-tube", "mech-round") else "A500-C")
        r.warn(f"material {key!r} is a grade of rolled shapes, plate and bar, but section "
               f"{section.designation!r} is {_a(shape)}: structural tube is made to A500 "
               "(\"A500-C\", \"A500-B\") and pipe to A53 (\"A53-B\"); the check uses "
               f"{units.fmt(material.fy, 'stress', system)}. Give the grade on the mill cert",
               where)
    elif mkind == "steel" and key.startswith("A500") and shape == "pipe":
        usual = "A53-B"
        r.warn(f"material {key!r} is a grade of structural tube (HSS), but section "
               f"{section.designation!r} is pipe, made to ASTM A53 Gr B (Fy 35 ksi; AISC "
               "Manual Table 2-4, from memory): the check credits "
               f"{units.fmt(material.fy, 'stress', system)}, more than the pipe has. Write "
               "material = \"A53-B\", or give the round HSS (e.g. \"HSS4.500X0.237\") if "
               "the mill cert says A500", where)
    elif mkind == "steel" and shape == "pipe" and get_material(key) is not None \
            and not key.startswith("A53"):
        # a built-in grade pipe is not made to (mechanical tube grades, say): pipe is A53
        usual = "A53-B"
        r.warn(f"material {key!r} is not a grade pipe is made to: section "
               f"{section.designation!r} is pipe, made to ASTM A53 Gr B (Fy 35 ksi; AISC "
               "Manual Table 2-4, from memory): the check credits "
               f"{units.fmt(material.fy, 'stress', system)}. Write material = \"A53-B\", or "
               "give the tube the mill cert names (a round-tube section) if it is not pipe",
               where)
    elif mkind == "steel" and key.endswith("-round") and shape == "rect-tube":
        usual = key[:-len("-round")]
        r.warn(f"material {key!r} is the grade of round HSS, but section "
               f"{section.designation!r} is square or rectangular tube, whose grade is "
               f"{usual!r} (A500's own figure for shaped tube): write material = \"{usual}\"",
               where)
    elif mkind == "steel" and key == "A513-DOM" and shape == "rect-tube":
        usual = "A500-C"
        r.warn(f"material {key!r} is DOM (drawn over mandrel) tube, which is round, but "
               f"section {section.designation!r} is square or rectangular tube, bought as A500 "
               "(HSS) or A513 Type 1/2 as-welded (30 to 38 ksi, from memory): the check credits "
               f"{units.fmt(material.fy, 'stress', system)}. Write \"A500-C\" for HSS, "
               "\"A513\" for mechanical tube, or the grade on the mill cert", where)
    elif mkind == "steel" and key == "A992" and (
            shape in ("angle", "channel", "rect-bar", "square-bar")
            or shape == "i-beam" and section.designation.upper().startswith("S")) \
            and not section.source.startswith(EN_SECTIONS):
        usual = "A36"
        r.warn(f"material 'A992' is the grade of W shapes (and HP, WT), but section "
               f"{section.designation!r} is {_a(shape)}, bought as A36 (Fy 36 ksi; AISC Manual "
               "Table 2-4 gives A36 for angles, channels and S shapes, and plate and bar are "
               "A36 or A572, from memory): the check credits "
               f"{units.fmt(material.fy, 'stress', system)}. Write material = \"A36\", or "
               "\"A572-50\" if the mill cert says so", where)
    elif mkind in ("aluminum", "stainless") and is_steel_shape(section):
        metal = "aluminium" if mkind == "aluminum" else mkind
        r.warn(f"section {section.designation!r} is a steel shape ({section.source.split(' (')[0]}), but "
               f"material {key!r} is {metal}: {metal} shapes of a similar name have other "
               "dimensions (walls, flanges, fillets), so these properties are not the "
               "member's and no rating is posted on them. Give [beam.section] with the shape "
               "and the mill's dimensions", "beam.section")
    if not usual:
        return ""
    top = getattr(get_material(usual), "fy", float("inf"))
    if not material.fy > top * (1 + 1e-9):
        return ""
    if len(r.problems) > said:  # the warning just given says so too
        p = r.problems[-1]
        p.message += (f". The job is NOT RATED while it credits more than {usual} "
                      f"({units.fmt(top, 'stress', system)})")
    return (f"material {key!r} is not a grade {section.designation!r} is made to: the checks "
            f"credit fy {units.fmt(material.fy, 'stress', system)}, more than the "
            f"{units.fmt(top, 'stress', system)} of {usual}, the grade that product is "
            "bought in. Give the grade on the mill cert (a typed-in [beam.material] with its "
            "fy, or the grade's key)")


# The wood service keys and the table each sits in (what NDS factors they set: `_wood_keys`)
_WOOD_KEYS = (("wet_service", "beam"), ("temperature", "beam"), ("repetitive", "beam"),
              ("duration", "criteria"))


# Words that say a wood member is wet or hot in service, where its keys say nothing: NDS
# 2018 takes CM (wet service, Supplement Table 4A) and Ct (Table 2.3.3) below 1.0 there (from
# memory), so a figure without them is too high (a deck joist "exposed to rain" had been
# posted 17 % high, a loft joist "over the heat-treat furnace, about 120F" 31 %)
_WET_WORDS = re.compile(
    r"\b(outdoors?|(?<!to )outside(?! (?:dimensions?|of|face|corners?|diameter|width|edges?|the|"
    r"walls?|to))|patios?|(?:boat|floating) docks?|not covered|"
    r"exterior(?! walls?| face| dimensions?)|exposed to (?:the )?(?:rain|weather|elements|"
    r"moisture|water)|(?:in|out in) the (?:rain|weather|elements)|weathered|"
    r"rain(?:s|ed|ing|water|fall)?(?! gear| coats?| jackets?| suits?)|"
    r"wet(?! bar| saws?|[- ]pipe)|ground contact|in contact with the ground|"
    r"uncovered|open[- ]air|backyard|boardwalk|pergola|balcony|outdoor deck|humid\w*|"
    r"condensation|open to (?:the )?(?:weather|elements|sky)|"
    r"outside (?:the |of the )?(?:shop|building|back door|door|barn|warehouse|garage|plant|"
    r"mill|yard)|wash[- ]?(?:bays?|downs?|racks?|areas?|stations?|pads?)|cooling towers?|"
    r"greenhouses?|steam rooms?|(?:swimming )?pools?(?:side)?|porch(?:es)?|loading docks?|"
    r"dock levell?ers?)\b", re.IGNORECASE)
# Places wet by what goes on inside them (wash water, humidity): wet whatever dry words say
# ("heated greenhouse", "indoor pool", "interior wash bay")
_WET_PLACES = re.compile(
    r"\b(wash[- ]?(?:bays?|downs?|racks?|areas?|stations?|pads?|houses?|rooms?)|"
    r"(?:car|truck|vehicle|bus) ?wash(?:es)?|cooling towers?|greenhouses?|steam rooms?|"
    r"(?:swimming |indoor )?pools?(?:side)?|shower rooms?|showers|laundr(?:y|ies)|dairy|"
    r"dairies|milk ?houses?)\b", re.IGNORECASE)
# Words that say a wood member is fire-retardant treated or incised: its design values take
# factors shopbeam does not apply (NDS 2018 2.3.4, 4.3.8), so it is not rated
_TREATED_WORDS = re.compile(r"\b(fire[- ]?retardant(?:[- ]treated)?|frtw?|"
                            r"incised|incising)\b", re.IGNORECASE)
# Words that say a wood member is preservative treated: such dimension lumber is often
# incised to take the treatment (Hem-Fir and Douglas Fir-Larch nearly always, common
# practice), and incised lumber takes Ci (NDS 2018 4.3.8), so it is held until the tags say
# the stock is not incised (or untreated: the words are about something else)
_PRESERVED_WORDS = re.compile(
    r"\b(pressure[- ]?treated|preservative[- ]?treated|wolmanized|green[- ]treated|kdat|"
    r"copper azole|ground[- ]contact|(?:cca|acq|mca|ca-?[bc])(?:[- ]treated)?|"
    r"(?<!heat-)(?<!heat )(?<!retardant-)(?<!retardant )treated(?! as\b))\b|\bp\.t\.(?!\w)",
    re.IGNORECASE)  # ("fire-retardant treated" is the FRT rule's, with its own denials)
# "PT" in capitals: pressure treated (not "pt", a point; not a part number "PT-450")
_PT = re.compile(r"\bPT\b(?!-?\d)")
NOT_INCISED = "not-incised"  # the tag that says preservative-treated stock is not incised
_HOT_WORDS = re.compile(
    r"\b(furnaces?|ovens?|kilns?(?![- ]?dried)|boilers?(?! parts?)|"
    r"heat[- ]treat(?!ed (?:pallets?|parts?|stock|steel|bars?))\w*|smelter|saunas?|"
    r"smoke ?houses?|drying rooms?|forges?|foundry|foundries|wood ?stoves?|"
    r"steam (?:pipes?|lines?|heat\w*)|"
    r"(?:10[1-9]|1[1-9]\d|[2-9]\d\d)\s*(?:[\u00b0\u00ba]\s*f?|f|deg\w*\.?(?:\s*f)?(?!\s*c\b))|"
    r"(?:3[89]|[4-9]\d)\s*(?:[\u00b0\u00ba]\s*)?(?:c|deg\w*\.?\s*c))(?![a-z])",
    re.IGNORECASE)
# ...and words that say the member is dry and at room temperature all the same: said of the
# whole member (anywhere in the words), or of a place (only in the phrase of the wet or hot
# word: "mezzanine stair landing outside, exposed to rain" is wet by its second phrase)
_DRY_WORDS = re.compile(r"\b(interior(?! (?:spans?|supports?|bays?|joists?|beams?|rails?|"
                        r"posts?|stringers?))|indoors?|inside (?:the )?(?:building|shop|"
                        r"warehouse)|under (?:the )?roof|covered(?! (?:by|with) (?:a )?tarps?)|"
                        r"enclosed|conditioned|"
                        r"weather[- ]?(?:tight|protected|proof)|dry storage|kept dry|"
                        r"stays dry)\b", re.IGNORECASE)
_DRY_NEAR = re.compile(r"\b(heated)\b", re.IGNORECASE)
_COOL_WORDS = re.compile(r"\b(room temperature|conditioned)\b", re.IGNORECASE)
_COOL_NEAR = re.compile(r"\b(well away from|far from|(?:under|below) 100|separate room|"
                        r"(?:[1-9]\d+|ten|twenty|thirty|forty|fifty) (?:ft|feet) away)\b",
                        re.IGNORECASE)


# a phrase that is only a distance from what came before it ("..., 40 ft away")
_AWAY = re.compile(r"\s*(?:about |some |over |more than )?(?:[1-9]\d*|ten|twenty|thirty|forty|"
                   r"fifty)\s*(?:ft|feet|m|metres?|meters?) away(?: from (?:it|them))?\s*$",
                   re.IGNORECASE)


_OTHER_SPECIES = re.compile(r"\b(?:hem[- ]?fir|hf|douglas|doug[- ]?fir|df(?:-l)?|fir|larch|"
                            r"spf|spruce|cedar|redwood|hemlock)\b", re.IGNORECASE)


def _service_words(r: _Reader, beam: dict, title, notes, tags, section=None,
                   material=None) -> None:
    """A wood member whose words say it is wet or hot in service while its keys say nothing:
    held until wet_service or temperature says so either way."""
    whole = [_as_words(t) for t in (title, notes, *tags)]
    phrases = [p for t in whole
               for p in re.split(r"[.,;:!?()\n]+|\s+-+\s+|\bbut\b", t) if p.strip()]

    # each phrase with the one after it in its sentence: a distance from the heat said just
    # after a comma ("the oven is on the far wall, 40 ft away") is of that phrase
    paired = []
    for t in whole:
        for sent in re.split(r"[.;:!?()\n]+", t):
            parts = [p for p in re.split(r",|\s+-+\s+|\bbut\b", sent) if p.strip()]
            paired += [p + (", " + parts[i + 1] if i + 1 < len(parts)
                            and _AWAY.match(parts[i + 1]) else "")
                       for i, p in enumerate(parts)]

    def said(words, cancel, near, pieces=phrases) -> str:
        if any(_search(cancel, t) for t in whole):
            return ""
        return next((m.group(0) for m in (_search(words, t) for t in pieces
                                          if not _search(near, t)) if m), "")
    wet = said(_WET_WORDS, _DRY_WORDS, _DRY_NEAR) or next(
        (m.group(0) for m in (_search(_WET_PLACES, t) for t in whole) if m), "")
    if wet and "wet_service" not in beam:
        r.hold(f"the job says {wet!r}, but [beam] says nothing of wet service: wood over 19 % "
               "moisture in service takes the wet service factor CM (NDS 2018 Supplement "
               "Table 4A, from memory: Fb 0.85, E 0.9, Fc-perp 0.67...), and checked dry it "
               "is rated too high, so no rating is posted. Write wet_service = true under "
               "[beam], or wet_service = false if it stays dry (under cover)",
               "beam.wet_service",
               f"the job says {wet!r} but not whether the wood is in wet service. Write "
               "wet_service = true or false")
    # a distance from the heat is said of the whole sentence ("the oven is on the far wall,
    # 40 ft away")
    hot = said(_HOT_WORDS, _COOL_WORDS, _COOL_NEAR, paired)
    if hot and "temperature" not in beam:
        r.hold(f"the job says {hot!r}, but [beam] says nothing of its temperature: wood kept "
               "over 100 F takes the temperature factor Ct (NDS 2018 Table 2.3.3, from "
               "memory: Fb 0.8 dry at 100-125 F), and checked at room temperature it is "
               "rated too high, so no rating is posted. Write temperature = \"100F-125F\" "
               "or \"125F-150F\" under [beam], or \"up-to-100F\" if it stays below 100 F",
               "beam.temperature",
               f"the job says {hot!r} but not the wood's temperature. Write temperature = "
               "\"100F-125F\", \"125F-150F\" or \"up-to-100F\"")
    treated = next((m.group(0) for m in (_search(_TREATED_WORDS, t) for t in whole) if m), "")
    if treated and "untreated" not in {normal_tag(t) for t in tags}:
        r.hold(f"the job says {treated!r}: fire-retardant treated lumber takes the treater's "
               "reduction factors on its design values (NDS 2018 2.3.4) and incised lumber "
               "the incising factor Ci (NDS 2018 4.3.8: 0.80 on Fb, Ft, Fc, Fv, from memory), "
               "which shopbeam does not apply, so checked as untreated it is rated too high "
               "and no rating is posted. Have it rated with those factors (lumber pressure-"
               "treated with preservatives only, not incised, takes the untreated values); if "
               "the words are about something else and this member is untreated, add the tag "
               "\"untreated\"",
               "title", f"the job says {treated!r}: shopbeam does not apply the treatment "
               "factors of fire-retardant or incised lumber")
    texts = [title or "", notes or "", *(t for t in tags if isinstance(t, str))]
    kept = {normal_tag(t) for t in tags}
    preserved = "" if treated else next(
        (m.group(0) for m in [*(_search(_PRESERVED_WORDS, t) for t in whole),
                              *(_PT.search(t) for t in texts)] if m), "")
    if not treated and not preserved:
        preserved = next((f"tag {t!r}" for t in tags if normal_tag(t) in ("pt", "p.t.")), "")
    nominal = catalog.lumber_nominal(section) if section is not None else None
    if nominal is not None and nominal[0] >= 5:
        preserved = ""  # a timber (5 in and thicker): Ci is for dimension lumber (NDS 4.3.8)
    said_not = any(re.search(r"\b(?:not|no|non|un)[- ]?incis\w*", t, re.IGNORECASE)
                   for t in whole)  # "preservative treated (ACQ), not incised"
    # Southern Pine by its key, with no other species in the words ("PT Hem-Fir" with an SP
    # key: which it is, the stamp says)
    southern = str(getattr(material, "key", "") or "").upper().startswith(("SP-", "SYP")) \
        and not any(_OTHER_SPECIES.search(t) for t in whole)
    if preserved and not said_not and not kept & {"untreated", NOT_INCISED} and southern:
        # Southern Pine takes preservative without incising as a rule (from memory): said,
        # with the tag that settles it, and not held
        r.warn(f"the job says {preserved!r}: Southern Pine is seldom incised to take the "
               "treatment, and it is checked at its untreated values; if this stock has "
               "incisions (small slits along its faces), its values take the incising factor "
               "Ci (NDS 2018 4.3.8: 0.80 on Fb and Fv, 0.95 on E, from memory), which "
               "shopbeam does not apply. Add the tag \"not-incised\" to say it has none",
               "title")
    elif preserved and not said_not and not kept & {"untreated", NOT_INCISED}:
        r.hold(f"the job says {preserved!r}: preservative-treated dimension lumber is often "
               "incised to take the treatment (Hem-Fir and Douglas Fir-Larch nearly always), "
               "and incised lumber takes the incising factor Ci (NDS 2018 4.3.8: 0.80 on Fb, "
               "Ft, Fc, Fv and 0.95 on E, from memory), which shopbeam does not apply, so "
               "checked as plain lumber it may be rated too high and no rating is posted. If "
               "the stock has no incisions (the small slits along its faces), add the tag "
               "\"not-incised\" and it is checked at the untreated values; if the words are "
               "about something else, add the tag \"untreated\"",
               "title", f"the job says {preserved!r}: treated lumber is often incised (Ci, "
               "NDS 4.3.8, not applied). Add the tag \"not-incised\" if it is not")


# the short-lived loads a duration over ten years is for (NDS 2018 Table 2.3.2), as a live
# load's label names them: (pattern, in words)
# The label must name the load itself ("snow", "roof snow", "snow load 25 psf", "wind
# uplift"), not goods that carry the word ("snow blower", "earthquake kit", "construction
# adhesive"): after the word, only the load's own words, a figure or the end of the label.
_LOAD_TAIL = r"(?=\s*(?:$|\d|\(|(?:loads?|forces?|pressures?|{more})\b))"
_DURATION_LOADS = {
    "two-months": (re.compile(r"^\s*(?:(?:roof|ground|design|balanced|unbalanced|drifting|"
                              r"drift(?:ed)?|sliding|rain[- ]on)[- ]+)*snow"
                              + _LOAD_TAIL.format(more="drifts?|accumulations?|piles?|"
                                                  "build-?ups?|and ice|only"),
                              re.IGNORECASE), "snow"),
    "seven-days": (re.compile(r"^\s*construction"
                              + _LOAD_TAIL.format(more="live|crews?|workers?|only"),
                              re.IGNORECASE), "construction load"),
    "ten-minutes": (re.compile(r"^\s*(?:(?:design|roof|wall)[- ]+)*(?:wind|gusts?|earthquake|"
                               r"seismic)" + _LOAD_TAIL.format(
                                   more="uplift|suction|down(?:ward)?|up(?:ward)?|gusts?|only"),
                               re.IGNORECASE), "wind or earthquake")}


def _wood_keys(r: _Reader, beam: dict, crit, material, section, tags=(), title="",
               notes="", more=(), raw_loads=(), moving=False):
    """The wood member's service keys ([beam] wet_service, temperature, repetitive;
    [criteria] duration); a wood material comes back with
    the reference values of this member's size class and E' (see members.wood)."""
    from shopbeam.members import wood

    crit = crit if isinstance(crit, dict) else {}
    wet = beam.get("wet_service", False)
    if not isinstance(wet, bool):
        r.error("wet_service must be true or false (true: moisture over 19 % in service, "
                "NDS 4.1.4)", "beam.wet_service")
        wet = False
    temp = beam.get("temperature", "up-to-100F")
    if not isinstance(temp, str) or temp not in wood.TEMPERATURES:
        r.error(f"temperature {temp!r} must be one of {', '.join(wood.TEMPERATURES)} (the "
                "sustained temperature range of NDS Table 2.3.3)", "beam.temperature")
        temp = "up-to-100F"
    rep = beam.get("repetitive", False)
    if not isinstance(rep, bool):
        r.error("repetitive must be true or false (true: three or more joists at 24 in or "
                "less sharing the load, NDS 4.3.9)", "beam.repetitive")
        rep = False
    dur = crit.get("duration", "ten-years")
    if isinstance(dur, str):  # ("Permanent", "ten years": the value as the set writes it)
        dur = re.sub(r"[\s_]+", "-", dur.strip().lower()) if re.sub(
            r"[\s_]+", "-", dur.strip().lower()) in wood.DURATIONS else dur
    if not isinstance(dur, str) or dur not in wood.DURATIONS:
        r.error(f"duration {dur!r} must be one of {', '.join(wood.DURATIONS)} (the load "
                "duration of NDS Table 2.3.2)", "criteria.duration")
        dur = "ten-years"
    if material is None:  # refused already: whether these keys apply is not known yet
        return material, None
    if getattr(material, "kind", "") != "lumber":
        for k, where in _WOOD_KEYS:
            if k in (beam if where == "beam" else crit):
                r.warn(f"{k} is for wood members (NDS); this material ignores it",
                       f"{where}.{k}")
        return material, None
    service = wood.Service(dur, wet, temp, rep)
    _service_words(r, beam, title, notes, tuple(tags) + tuple(more), section, material)
    # a metal shape in wood is refused (_family_mismatch): said once, by that error
    if section is not None and section.shape != "rect-bar" \
            and not catalog.not_made_in(section, material):
        for k, where in _WOOD_KEYS:
            if k in (beam if where == "beam" else crit):
                r.warn(f"{k} is not applied: the NDS factors need a rectangular wood section "
                       "(a lumber size, or shape = \"rect-bar\"), and this one is given by its "
                       "properties, so the job is NOT RATED", f"{where}.{k}")
    live = [ld for ld in (raw_loads if isinstance(raw_loads, list) else ())
            if _is_table(ld) and str(ld.get("case", "live")).strip().lower() != "dead"]
    what = _DURATION_LOADS.get(dur)
    named = what is not None and live and not moving and all(
        isinstance(ld.get("label"), str) and re.search(what[0], _as_words(ld["label"]))
        for ld in live)
    if wood.DURATIONS.get(dur, (1.0,))[0] > 1.0 and named:
        # every live load is the short-lived load that duration is for (a roof's snow): the
        # figure posted is that load, which does come and go
        cd, words = wood.DURATIONS[dur]
        r.warn(f"duration = \"{dur}\" takes CD {cd:g} (NDS 2018 Table 2.3.2: {words}) for the "
               f"live loads, each labelled as {what[1]}: the figure posted is the {what[1]} the "
               "member may carry, not a load left on it (stock or equipment placed and left is "
               "a ten-year load: rate it with duration = \"ten-years\")", "criteria.duration")
    elif wood.DURATIONS.get(dur, (1.0,))[0] > 1.0:
        cd, words = wood.DURATIONS[dur]
        r.hold(f"duration = \"{dur}\" takes CD {cd:g} (NDS 2018 Table 2.3.2: {words}), so the "
               f"wood is credited {cd:g} times its ten-year strength. That holds for a load "
               "that comes and goes within that time, not for a load placed on the member and "
               "left, which is what a rating label posts: no rating is posted. Write duration "
               "= \"ten-years\" (or \"permanent\" for stock that stays on) for a rating; an "
               "impact allowance on the load is [criteria] impact = \"25%\"",
               "criteria.duration",
               f"duration = \"{dur}\" credits the wood CD {cd:g} for a short-lived load; a "
               "posted load stays on. Write duration = \"ten-years\" or \"permanent\"")
    if "duration" not in crit and (RACK_TAGS | SHELF_TAGS | {"storage"}).intersection(tags):
        r.warn("a wood rack or shelf with no duration is checked as a ten-year load (CD 1.0, "
               "NDS 2018 Table 2.3.2) with its live loads short-term for deflection; stock "
               "that stays on it for years is a permanent load: write duration = "
               "\"permanent\" under [criteria] (CD 0.9, and Kcr on the deflection of every "
               "load, NDS 3.5.2), or duration = \"ten-years\" to keep this",
               "criteria.duration")
    try:
        return wood.adjusted_material(material, section, wet, temp), service
    except InputError as e:
        r.take(e, "beam.material")
        return None, service


# The title says the member is one on its own: a single or lone joist or beam, or a header,
# girder or lintel named as the member (not one it bears on: "joist between headers")
_LONE_WORDS = re.compile(
    r"\b(?:(?:single|lone)[- ](?:2x\d+|joists?|members?|beams?|headers?|ply|pieces?)(?! per)|"
    r"(?<!\bon )(?<!\bonto )(?<!\binto )(?<!\boff )(?<!\bbetween )(?<!\bfrom )(?<!\bto )"
    r"(?<!\bat )(?<!\bby )(?<!\bunder )(?<!\bover )(?<!\bnear )(?<!\bthe )(?<!\bthat )"
    r"(?:headers?|girders?|lintels?)(?! (?:hangers?|joists?|is separate)))\b",
    re.IGNORECASE)
def _repetitive(r: _Reader, raw_loads, service, material, section, members, title="",
                notes=""):
    """Cr only where NDS 4.3.9 allows it (members.wood.repetitive_rule); a warning otherwise."""
    from shopbeam.members import wood

    if service is None:
        return service
    widths = []
    for i, ld in enumerate(raw_loads if isinstance(raw_loads, list) else []):
        if _is_table(ld) and isinstance(ld.get("width"), str):
            try:
                widths.append((f"loads[{i}].width", units.parse(ld["width"], "length")))
            except InputError:
                pass
    service, problems = wood.repetitive_rule(service, material, section, members, widths)
    for message, key in problems:
        r.warn(message, key)
    if service.repetitive and material is not None:
        # Cr is for three or more members at 24 in or less sharing the load through a deck
        # (NDS 2018 4.3.9, from memory): taken only where the job shows the spacing, and not
        # where its words say the member is on its own (a lone header had been posted 15 %
        # high on Cr 1.15)
        lone = next((m.group(0) for m in [_search(_LONE_WORDS, _as_words(title))] if m), "")
        if lone and re.search(r"\b(?:joists?|rafters?|studs?|purlins?)\b", str(title or ""),
                              re.IGNORECASE) and not re.match(r"(?i)(?:single|lone)", lone):
            lone = ""  # a joist's title naming the header or lintel beside it
        if lone or not (widths or any(0 < x <= 24 for x in _spacings_said(title, notes))):
            why = (f"the title says {lone!r}, a member on its own" if lone else
                   "the job gives no spacing (an area load's tributary width is the joist "
                   "spacing)")
            r.hold(f"repetitive = true takes Cr 1.15, which NDS 2018 4.3.9 allows only for "
                   "three or more members at 24 in or less sharing the load through a deck, "
                   f"and {why}, so no rating is posted. Give the load as an area load with "
                   "width = the spacing (24 in or less) or the spacing in the title (\"16 in "
                   "o.c.\"), reword the title if the word is about another member, or remove "
                   "repetitive",
                   "beam.repetitive",
                   f"repetitive = true (Cr 1.15) but {why}. Give the load per area with "
                   "width = the spacing, or remove repetitive")
    return service


# The least safety factor on first yield a posted load may rest on (common practice: ASD
# bending takes 1.67, and no shop posts a load at first yield with less than about 1.5)
MIN_POSTED_FACTOR = 1.5


def _safety_factor_words(r: _Reader, sf: float, material, basis) -> str:
    """What a safety factor other than 1.67 does on the member's basis, said in a warning.
    On steel, stainless and aluminium by their codes it is the factor on yield in bending
    (`checks.on_yield`: first yield capped at Fy S / safety_factor, and a larger factor taken
    on every bending limit state); wood has no first-yield basis, so there it is not used,
    and one larger than 1.67 is also the reason no rating is posted (the user asked for more
    margin than the label would carry). Returns that reason, or ""."""
    kind = getattr(material, "kind", "custom")
    if kind == "custom" or (basis == Basis.FIRST_YIELD and kind != "lumber"):
        return ""
    if kind in ("steel", "stainless", "aluminum"):
        code = ("AISC 360-16 ASD" if kind != "aluminum" else "the Aluminum Design Manual")
        if sf > 1.67:
            r.warn(f"safety_factor = {sf:g} is taken on bending: first yield is capped at Fy S "
                   f"/ {sf:g}, and every bending limit state of {code} takes {sf:g} in place "
                   "of its own Omega_b; shear and the local checks keep the code's own "
                   "factors", "criteria.safety_factor")
        else:
            r.warn(f"safety_factor = {sf:g} caps bending at first yield, Fy S / {sf:g}; the "
                   f"code's own factors ({code}: Omega_b "
                   f"{'1.67' if kind != 'aluminum' else '1.65'}) still apply to every bending "
                   "limit state and are not lowered by it", "criteria.safety_factor")
        return ""
    uses = "the NDS allowable stresses (their safety is in the reference values)"  # wood
    todo = "remove safety_factor (wood has no first-yield basis)"
    more = sf > 1.67
    r.warn(f"safety_factor = {sf:g} is NOT used: this {kind} member is checked by "
           f"{uses}; {todo}"
           + ("; as it asks for more margin than the checks carry, no rating is posted"
              if more else ""), "criteria.safety_factor")
    return (f"safety_factor = {sf:g} asks for more margin than {uses}, and it is not "
            f"used; {todo}") if more else ""


def _read_project(r: _Reader, table) -> dict:
    """The optional [project] table: text fields for a calc package's title block."""
    if table is None:
        return {}
    if not _is_table(table):
        r.error("project must be a table, e.g. [project] with shop = \"...\"", "project")
        return {}
    r.unknown_keys(table, KNOWN_KEYS["project"], "project", "[project]")
    out = {}
    for k in PROJECT_KEYS:
        v = table.get(k)
        if v is None:
            continue
        if isinstance(v, (str, int)) and not isinstance(v, bool) or hasattr(v, "isoformat"):
            out[k] = str(v).strip()
        else:
            r.error(f"project.{k} must be text in quotes", f"project.{k}")
    return out


def parse_job_data(data: dict, filename: str = "", text: str | None = None) -> Job:
    """Validate parsed TOML data. Raises InputErrors with every problem found."""
    r = _Reader(filename, text)
    if not isinstance(data, dict):
        raise InputErrors([Problem("the job file must be a TOML document", "", filename)])
    r.unknown_keys(data, KNOWN_KEYS[""], "", "the job file")
    schema = data.get("schema")
    if schema is None:
        r.error("missing 'schema = 1' (the job-file format version) at the top of the file", "schema")
    elif not isinstance(schema, int) or isinstance(schema, bool):
        r.error(f"schema must be a whole number, found {units.as_typed(schema)}", "schema")
    elif schema > SCHEMA:
        raise InputErrors([Problem(
            f"this job file is schema {schema}, written by a newer shopbeam; this version reads "
            f"schema {SCHEMA}: upgrade shopbeam to open it (the file was not changed)",
            "schema", filename, r.line_for("schema"))])
    elif schema < 1:
        r.error(f"schema {schema} is not a job-file version; use schema = 1", "schema")
    title = data.get("title")
    if title is not None and not isinstance(title, str):
        r.error(f"title must be text in quotes, found {units.as_typed(title)} (e.g. title = \"Rack arm, "
                f"bay {title}\")" if isinstance(title, (int, float)) and not isinstance(
                    title, bool) else f"title must be text in quotes, found {units.as_typed(title)}", "title")
        title = ""
    elif not isinstance(title, str) or not title.strip():
        r.error("missing 'title' (a name for the job, e.g. title = \"Lumber rack arm, bay 3\")", "title")
        title = ""
    notes = data.get("notes", "")
    if not isinstance(notes, str):
        r.error("notes must be text in quotes", "notes")
        notes = ""
    system = data.get("units", "us")
    if system not in ("us", "si"):
        low = system.strip().lower() if isinstance(system, str) else ""
        meant = ("si" if low in ("metric", "si", "mks", "mm", "m", "kn", "kn-m", "n", "eu")
                 else "us" if low in ("us", "imperial", "usc", "english", "in", "ft", "lb",
                                      "lbf", "kip", "kips") else "")
        r.error(f"units {system!r} must be \"us\" (feet, inches, lbf) or \"si\" (metres, mm, "
                f"N, kN)" + (f": write units = \"{meant}\"" if meant else ""), "units")
        system = "us"
    r.system = system
    tags = data.get("tags", [])
    if not (isinstance(tags, list) and all(isinstance(t, str) for t in tags)):
        r.error("tags must be a list of words, e.g. tags = [\"rack\", \"shelf\"]", "tags")
        tags = []
    tags = tuple(dict.fromkeys(normal_tag(t) for t in tags if t.strip()))

    project = _read_project(r, data.get("project"))

    beam = data.get("beam")
    length = section = material = wood_service = None
    self_weight, members, welded, levels = True, 1, False, None
    braced, braces, braces_flange = False, (), None
    restrained, bearing, bearings, hung = False, None, {}, []
    if not _is_table(beam):
        r.error("missing the [beam] table (length, section, material)", "beam")
        beam = {}
    else:
        r.unknown_keys(beam, KNOWN_KEYS["beam"], "beam", "[beam]")
        length = r.parse(beam, "length", "length", "beam.length", positive=True)
        if length is not None and not (1e-4 <= length <= 1e4):
            r.error(f"{beam['length']!r} is not a member length shopbeam can check "
                    "(0.1 mm to 10 km)", "beam.length")
            length = None
        axis = beam.get("axis")
        if axis is not None and axis not in ("strong", "weak"):
            r.error(f"axis {axis!r} must be \"strong\" or \"weak\"" + _lower_case_hint(
                "axis", axis, ("strong", "weak")), "beam.axis")
            axis = None
        # the material first: it decides the design wall of tube (0.93 x nominal for A500)
        if "material" not in beam:
            if not (_is_table(beam.get("section")) and "material" in beam["section"]):
                r.error("missing 'material' (a key such as \"A500-C\", or a [beam.material] "
                        "table)", "beam.material")  # else: the section's message says where
        else:
            material = _resolve("material", beam["material"], "beam.material", r)
            bare_alloy = untempered(beam["material"], material) or \
                ungraded(beam["material"], material)
            if bare_alloy:
                r.warn(bare_alloy, "beam.material")
            if material is not None and getattr(material, "source", "") == "typed in":
                _mixed_material(r, material, system)
                _kind_mismatch(r, material, system)
        if "section" not in beam:
            r.error("missing 'section' (a catalog designation such as \"HSS4x4x1/4\", or a "
                    "[beam.section] table)", "beam.section")
        elif bare := catalog.bare_size_problem(beam["section"], system):
            r.error(bare, "beam.section")
        else:
            section = _resolve("section", beam["section"], "beam.section", r, axis=axis,
                               material=material)
        if section is not None:
            _plausible_section(section, r)
            _section_dims_in_feet(r, beam["section"], length, system)
            _bare_sizes_in_mm(r, beam["section"], length, system)
            _corner_radius(r, section, material, system)
            _said_laid_flat(r, section, axis, title, notes, tags)
            _same_both_ways(r, section, axis)
            stubby = stubby_words(length, section, system, beam.get("length")) \
                if length is not None else ""
            if stubby:
                r.warn(stubby, "beam.length")
        # words written in other keys (a [beam] record, [project]) say where it stands too
        more = [v for k, v in beam.items() if k not in KNOWN_KEYS["beam"] and isinstance(v, str)]
        more += [v for v in (data.get("project") or {}).values() if isinstance(v, str)] \
            if _is_table(data.get("project")) else []
        material, wood_service = _wood_keys(r, beam, data.get("criteria"), material, section,
                                            tags, title, notes, more, data.get("loads"),
                                            bool(data.get("moving")))
        material = _thick_6063_t5(r, material, section)
        self_weight = beam.get("self_weight", True)
        if not isinstance(self_weight, bool):
            r.error("self_weight must be true or false", "beam.self_weight")
            self_weight = True
        members = beam.get("members", 1)
        if not isinstance(members, int) or isinstance(members, bool) or not 1 <= members <= 100:
            r.error(f"members must be a whole number from 1 to 100 (identical members sharing "
                    f"the loads), not {members!r}"
                    + (" (a number in quotes: write members = 2)" if isinstance(members, str)
                       else ""), "beam.members")
            members = 1
        if members > 1 and (is_lifting(tags) or data.get("moving")):
            r.warn(f"members = {members} divides the loads among identical beams, but a "
                   "trolley runs on one beam and a hoist hangs from one: its wheel and hook "
                   "loads are not shared, so the job is NOT RATED; rate each runway beam on its "
                   "own (members = 1)", "beam.members")
        levels = beam.get("levels")
        if levels is not None and (not isinstance(levels, int) or isinstance(levels, bool)
                                   or not 1 <= levels <= 50):
            r.error("levels must be a whole number from 1 to 50 (the levels of beams in one "
                    "rack bay, for the rating plaque's per-bay total)", "beam.levels")
            levels = None
        elif levels is not None and levels > MAX_PLAUSIBLE_LEVELS:
            # "40" for "4": the per-bay total is ten times what a bay may hold
            r.hold(f"levels = {levels}: a rack bay of more than {MAX_PLAUSIBLE_LEVELS} beam "
                   "levels is far past shop racks (about 12 at most, common practice, no "
                   "source), and the label's per-bay total grows with it, so no rating is "
                   "posted. Check the count (4 for 40?)", "beam.levels",
                   f"levels = {levels} is past any shop rack bay: check the count")
        welded = beam.get("welded", False)
        if not isinstance(welded, bool):
            r.error("welded must be true or false (welded near the point of largest moment)",
                    "beam.welded")
            welded = False
        braced, braces = _read_bracing(r, beam, length)
        braces_flange = _read_braces_flange(r, beam, braces)
        restrained = r.boolean(beam, "restrained", "beam.restrained", False,
                               "restrained must be true or false (true: the member is held "
                               "against twisting and sideways movement all along, so an "
                               "angle bends about its geometric axis)")
        if "bearing" in beam:
            bearing = _bearing_fits(r, r.parse(beam, "bearing", "length", "beam.bearing",
                                               nonnegative=True), length, system, "beam.bearing")

    sups = data.get("supports", [])
    supports: list[Support] = []
    if _is_table(sups):
        r.error("supports must be [[supports]] tables (double brackets), one for each support; "
                "[supports] is a single table", "supports")
        sups = []
    elif not isinstance(sups, list) or not sups:
        r.error("no supports: add [[supports]] tables (at least two, or one fixed end)", "supports")
        sups = []
    if len(sups) > MAX_SUPPORTS:
        r.error(f"{len(sups)} supports is more than shopbeam takes ({MAX_SUPPORTS})", "supports")
        sups = []
    # a settlement matters only where the member is held at more than two points or at a
    # fixed end (unknown_keys reads this for a key that reads as one)
    held = [x for x in sups if _is_table(x) and str(x.get("type", "")).strip().lower()
            not in ("hinge",)]
    r.settles_matter = len(held) > 2 or any(
        str(x.get("type", "")).strip().lower() == "fixed" for x in held)
    for i, s in enumerate(sups):
        sup = _read_support(r, i, s, length)
        if sup is not None:
            supports.append(sup)
        if _is_table(s) and "bearing" in s:  # bearing length for the local checks
            b = _bearing_fits(r, r.parse(s, "bearing", "length", f"supports[{i}].bearing",
                                         nonnegative=True), length, system,
                              f"supports[{i}].bearing")
            if b is not None:
                bearings[f"supports[{i}]"] = b
            if s.get("type") == "hinge":
                r.warn("bearing is the length a support bears on the member; a hinge is a "
                       "moment release inside the member, not a support, so it ignores it",
                       f"supports[{i}].bearing")
            elif s.get("type") == "fixed":
                r.warn("bearing is the length a support bears on the member; a fixed end is a "
                       "connection (welded or bolted into a wall or column), so the web and "
                       "bearing checks are not made there and it changes nothing: check the "
                       "connection itself, or make the support a pin if the member sits on it",
                       f"supports[{i}].bearing")

    raw_loads = data.get("loads", [])
    loads: list[Load] = []
    conv: list = []
    if not isinstance(raw_loads, list):
        r.error("loads must be [[loads]] tables (double brackets), one for each load"
                + ("; [loads] is a single table" if _is_table(raw_loads) else ""), "loads")
        raw_loads = []
    if len(raw_loads) > MAX_LOADS:
        r.error(f"{len(raw_loads)} loads is more than shopbeam takes ({MAX_LOADS}); "
                "combine loads or split the job", "loads")
        raw_loads = []
    # on a lifting device a point load with no `flange` is the hoist: it hangs from the bottom
    # flange of an I-beam (trolley or beam clamp), so the flange is checked under it
    crit_raw = data.get("criteria")
    hang_by_default = (section is not None and section.shape == "i-beam"
                       and section.axis == "strong"
                       and is_lifting(tags, crit_raw.get("lifting", "")
                                      if isinstance(crit_raw, dict) else ""))
    _profile_contradicted(r, crit_raw, raw_loads, title, notes, tags, supports, length)
    hung_default: list[str] = []
    contacts: dict[str, int] = {}
    lugs: list[str] = []
    for i, ld in enumerate(raw_loads):
        got = _read_load(r, i, ld, length, conv)
        if got is not None and _plausible_load(r, got):
            loads.append(got)
        if _is_table(ld) and ld.get("type") == "point":  # where it meets the member
            if "bearing" in ld:
                b = _bearing_fits(r, r.parse(ld, "bearing", "length", f"loads[{i}].bearing",
                                             nonnegative=True), length, system,
                                  f"loads[{i}].bearing")
                if b is not None:
                    bearings[f"loads[{i}]"] = b
            if ld.get("flange") == "bottom":
                hung.append(f"loads[{i}]")
            elif "flange" not in ld and hang_by_default:
                hung.append(f"loads[{i}]")
                hung_default.append(f"loads[{i}]")
            if "wheels" in ld:
                n = ld["wheels"]
                if not (isinstance(n, int) and not isinstance(n, bool) and n in (2, 4, 8)):
                    r.error("wheels must be 2, 4 or 8: the trolley wheels (or clamp jaws) a "
                            "hanging load bears on, half on each side of the web, e.g. "
                            "wheels = 4", f"loads[{i}].wheels")
                elif f"loads[{i}]" not in hung:
                    r.warn("wheels says how a load hung from the bottom flange bears on it; "
                           "this load bears on top (flange = \"bottom\" hangs it), so it "
                           "changes nothing", f"loads[{i}].wheels")
                else:
                    contacts[f"loads[{i}]"] = n
            if "lug" in ld:
                if not isinstance(ld["lug"], bool):
                    r.error("lug must be true or false (true: the load hangs from a lug plate "
                            "welded under the web, not from trolley wheels or a clamp on the "
                            "flange tips)", f"loads[{i}].lug")
                elif ld["lug"] and f"loads[{i}]" not in hung:
                    r.warn("lug = true says a load hung from the bottom flange hangs from a "
                           "lug under the web; this load bears on top (flange = \"bottom\" "
                           "hangs it), so it changes nothing", f"loads[{i}].lug")
                elif ld["lug"] and "wheels" in ld:
                    r.error("lug = true and wheels together: a load hangs either from a lug "
                            "under the web or from trolley wheels or jaws on the flange tips; "
                            "keep the one it is", f"loads[{i}].lug")
                elif ld["lug"]:
                    lugs.append(f"loads[{i}]")
        elif _is_table(ld) and "lug" in ld and ld.get("type") in LOAD_KINDS:
            r.warn(f"lug says a point load hung from the bottom flange hangs from a lug under "
                   f"the web; this load is a {ld.get('type')} load, so it changes nothing",
                   f"loads[{i}].lug")
        if _is_table(ld) and ld.get("type") != "point" and "wheels" in ld and \
                ld.get("type") in LOAD_KINDS:
            r.warn(f"wheels says how a point load hung from the bottom flange bears on it (the "
                   f"trolley wheels or clamp jaws); this load is a {ld.get('type')} load, "
                   "so it changes nothing. Give a hoist as a point load, or trolley "
                   "wheels as [[moving]]", f"loads[{i}].wheels")
    _twice(r, raw_loads)
    _lug_on_a_trolley(r, crit_raw, tags, raw_loads, lugs, loads, title, notes)
    _knife_edge_on_wood(r, material, bearing, bearings)
    upward = _upward_loads(r, raw_loads, loads, system)
    _tiny_loads(r, loads, raw_loads, system)
    _huge_loads(r, loads, raw_loads, system, data.get("moving"))
    _floor_dead_total(r, loads, raw_loads, tags, section, material, system, title, notes)
    _own_weight_twice(r, loads, self_weight)
    _under_a_millimetre(r, raw_loads, data.get("supports"))
    wood_service = _repetitive(r, raw_loads, wood_service, material, section, members, title,
                               notes)
    _family_mismatch(r, section, material, system)
    _nominal_as_dressed(r, section, material, tags, system)
    _grade_words(r, material, title, notes)
    _thickness_range(r, section, material, welded, system)
    if welded and getattr(material, "kind", "") == "aluminum" and \
            not getattr(material, "fy_welded", None):
        r.warn("welded = true on a typed-in aluminium with no fy_welded: welding anneals the "
               "metal near the weld (6061-T6 Fty 35 ksi, welded Ftyw 15 ksi; 6063-T6 25 and "
               "8 ksi: ADM 2015 Table A.3.3/A.3.4, from memory), and without fy_welded the "
               "checks can only use the unwelded fy, so the job is NOT RATED. Give fy_welded "
               "under [beam.material]", "beam.welded")
    elif welded and material is not None and not getattr(material, "fy_welded", None):
        r.warn(f"welded = true changes nothing for material {getattr(material, 'key', '')!r}: "
               "only a grade with a welded (heat-affected zone) strength, such as aluminium "
               "6061-T6, is weakened by welding in these checks; the welds themselves are not "
               "checked", "beam.welded")
    _aluminium_fixed_end(r, beam, material, supports, system)
    _aluminium_weld_words(r, beam, material, title, notes, tags, raw_loads, system, more=[
        *((f"supports[{i}].label", sp.get("label")) for i, sp in enumerate(
            data.get("supports") if isinstance(data.get("supports"), list) else ())
          if _is_table(sp)),
        *((f"project.{k}", v) for k, v in (data.get("project") or {}).items()
          if _is_table(data.get("project")))])
    if length is not None:
        for key, message in geometry_problems(length, supports, loads,
                                              lambda x: units.fmt(x, "length", system)):
            r.error(message, key)
    at_support = _loads_at_supports(r, loads, supports, length, system)
    long_bearings = _bearing_room(r, length, supports, loads, bearing, bearings, system)

    criteria = _read_criteria(r, data.get("criteria", {}), is_lifting(tags), material)
    moving = _read_moving(r, data.get("moving"), length)
    _four_per_axle(r, data.get("moving"), moving, title, notes)
    if is_lifting(tags) or criteria.lifting:
        _trolley_spacing(r, moving, system, data.get("moving"), length,
                         " | ".join(x for x in (title, notes) if isinstance(x, str)))
    upward += _upward_wheels(r, moving, system)
    judged = _judged_longest(supports, length) or length
    if (judged is not None and criteria.deflection_abs is not None
            and criteria.deflection_abs > judged / LOOSEST_COMMON_RATIO):
        said = (f"deflection = {criteria.deflection!r} is more than 1/{LOOSEST_COMMON_RATIO:g} "
                f"of the longest length it is judged on ({units.fmt(judged, 'length', system)}"
                "; a cantilever or overhang on twice its own), looser than any common limit "
                "(racks, shelves and floors use L/180 to L/360): check the number and its "
                "unit, or write the limit as \"L/240\"")
        if _feet_or_metres(str(criteria.deflection)):
            # "0.5 ft" for "0.5 in": a limit in feet or metres this loose is a unit slip; a
            # loose limit meant on purpose is written in inches or mm
            r.hold(said + ". Typed in feet or metres, it is most often \"ft\" for \"in\" (or m "
                   "for mm), so no rating is posted on it; a loose limit meant on purpose is "
                   "written in in or mm", "criteria.deflection",
                   f"the deflection limit {criteria.deflection} is typed in feet or metres and "
                   "is looser than any common limit (\"0.5 ft\" for \"0.5 in\"?): write it in "
                   "in or mm, or as L/n")
        else:
            r.warn(said, "criteria.deflection")
    # a refused support or wheel set leaves the job half read: what would follow from the
    # rest (a profile guessed from the other supports, "no force load") would mislead
    support_refused = any(not p.warning and p.key.startswith("supports") for p in r.problems)
    if not support_refused:
        _looser_than_lifting(r, criteria, tags, supports, length)
        _looser_than_rack(r, criteria, tags, supports, length)
        _looser_than_floor(r, criteria, tags, supports, length)
        criteria = _floor_live_limit(r, criteria, tags, supports, length, title, notes)
    _lifting_without_live(r, criteria, tags, loads, moving or data.get("moving"))
    _dead_load_units(r, raw_loads, loads, system, is_lifting(tags, criteria.lifting),
                     supports, length, bool(moving or data.get("moving")))
    _spacing_widths(r, raw_loads, beam, title, notes)
    _mixed_units(r, raw_loads, loads)
    _per_member_loads(r, raw_loads, beam.get("members") if isinstance(beam, dict) else None)
    _step_beam(r, title, notes, tags, raw_loads, section)
    _rack_members(r, title, notes, tags, raw_loads,
                  beam.get("members", 1) if isinstance(beam, dict) else None, supports)
    _members_uneven(r, tags, raw_loads, loads,
                    beam.get("members", 1) if isinstance(beam, dict) else None, supports,
                    title, notes)
    _shelf_members(r, tags, raw_loads,
                   beam.get("members", 1) if isinstance(beam, dict) else None, section, system)
    _rack_impact_slip(r, criteria, tags, loads)
    _root_at_the_right(r, supports, loads, length, system)
    _unit_twin_support(r, data.get("supports"), length, system)
    if not _unit_twin_slip(r, raw_loads, supports, length, system):
        _root_at_the_left_loads_by_it(r, supports, loads, length, system, title, notes)
    _close_supports(r, supports, length, system)
    if length is not None and section is not None and isinstance(beam, dict) \
            and not stubby_words(length, section, system):
        _short_span(r, length, section, tags, system, beam.get("length"), supports)
    _moving_dead_units(r, data.get("moving"), moving, system)
    travelling_hoist = _parked_hoist(r, criteria, tags, loads, hung, data.get("moving"),
                                     supports, length, system)
    _hoist_weight(r, criteria, tags, loads, moving, supports, length)
    _hung_from_rods(r, criteria, tags, data.get("supports"), title, notes)
    _tied_or_braced(r, tags, data.get("supports"), title, notes)
    _narrow_widths(r, raw_loads, length, beam.get("length") if isinstance(beam, dict) else None,
                   system, title, notes)
    _length_against_words(r, beam.get("length") if isinstance(beam, dict) else None, length,
                          title, notes, system)
    _short_lifting_member(r, criteria, tags, supports, length, system, title, notes)
    if not support_refused:
        _lifting_mismatch(r, criteria, tags, supports, length)
    _idle_load_keys(r, raw_loads, loads, supports, length, tags, levels)
    lifting_hint = _lifting_hint(r, title, notes, tags, raw_loads, moving, criteria)
    _not_lifting_denied(r, title, notes, tags, criteria)
    _braced_boom(r, beam if isinstance(beam, dict) else {}, tags, criteria, supports, length)
    bth_hint = _below_the_hook_hint(r, title, notes, tags, criteria)
    rolling_keys = _rolling_keys(r, data.get("moving"), moving, tags, criteria)
    vehicle_hint = _vehicle_hint(r, title, notes, tags, raw_loads, criteria,
                                 is_lifting(tags, criteria.lifting))
    vehicle = "" if NOT_VEHICLE in tags else "; ".join(  # a truck crane's boom too
        _words_found(_VEHICLE_WORDS, title, notes, tags, raw_loads)[:3])
    _rack_hint(r, title, notes, tags, raw_loads, is_lifting(tags, criteria.lifting), vehicle)
    _rack_fixed_ends(r, tags, supports, length)
    _glulam_words(r, title, notes, tags, material, data)
    _length_in_other_units(r, data)
    if data.get("units", "us") in ("us", "si"):  # a wrong units = ... is its own error
        _mixed_unit_systems(r, data, system)  # after the rules that name a value's unit
    _odd_springs(r, supports, section, material, length, system)
    _cut_hint(r, title, notes, tags, raw_loads)
    for ws in moving:
        if ws.bearing is not None and material is not None and \
                getattr(material, "kind", "") != "lumber":
            r.warn(f"bearing on [[moving]] is each wheel's contact length along a wood member, "
                   f"for its crushing across the grain (NDS 2018 3.10); this "
                   f"{getattr(material, 'kind', '') or 'metal'} member takes each wheel at a "
                   "point (bearing length 0) in its web checks, on the safe side, so it changes "
                   "nothing: remove it", f"{ws.key}.bearing")
        if ws.wheel_edge is not None and section is not None and not (
                section.shape == "i-beam" and section.axis == "strong"):
            r.warn(f"wheel_edge is where a trolley wheel bears on the bottom flange of an "
                   f"I-beam; section {section.designation!r} is {_a(section.shape)} "
                   f"({section.axis} axis), so it changes nothing", f"{ws.key}.wheel_edge")
        elif ws.wheel_edge is not None and section is not None:
            d = section.dims
            out = (float(d.get("bf", 0.0)) - float(d.get("tw", 0.0))) / 2
            if out > 0 and ws.wheel_edge >= out:
                r.error(f"wheel_edge = {units.fmt(ws.wheel_edge, 'small_length', system)} puts "
                        f"the wheel past the web: the flange of {section.designation!r} "
                        f"stands out {units.fmt(out, 'small_length', system)} from it. It is "
                        "the distance from the flange tip to the wheel's contact, usually under "
                        "an inch (check the unit: \"0.25 in\", not \"0.25 ft\")",
                        f"{ws.key}.wheel_edge")
    from shopbeam.jobs.limits import cost_problems  # bounded work: counts checked before solving

    for msg, key in cost_problems(supports, loads, moving, braces, length):
        r.error(msg, key)

    if r.errors:
        raise InputErrors(sorted(r.problems, key=lambda p: (p.warning, p.line or 0)))
    conversions = []
    for key, what, w in conv:
        if w is not None:
            conversions.append(f"{key}: {what} = {units.fmt(w, 'line_load', system)}")
        else:
            conversions.append(f"{key}: {what}")
    return Job(
        title=title.strip(), length=length, section=section, material=material,
        supports=tuple(sorted(supports, key=lambda s: s.at)), loads=tuple(loads),
        criteria=criteria, notes=notes, units=system, tags=tags,
        self_weight=self_weight, members=members, levels=levels, welded=welded, braced=braced,
        braces=braces, braces_flange=braces_flange,
        moving=moving, path=filename, restrained=restrained, bearing=bearing,
        bearings=bearings, contacts=contacts, hung=tuple(hung), hung_default=tuple(hung_default),
        lugs=tuple(lugs),
        upward=tuple(upward), lifting_hint=lifting_hint, bth_hint=bth_hint, at_support=tuple(at_support),
        long_bearings=tuple(long_bearings), rolling_keys=rolling_keys, cut_keys=tuple(r.cuts),
        factor_keys=tuple(r.factors), vehicle_hint=vehicle_hint, vehicle=vehicle,
        holds=tuple(r.holds), travelling_hoist=travelling_hoist,
        widths=dict(r.widths), supports_line=r.line_for("supports[0]"),
        warnings=tuple(r.problems), conversions=tuple(conversions), project=project,
        wood=wood_service,
    )


_KEY_LINE = re.compile(r"""^\s*((?:[A-Za-z0-9_-]+|"[^"]*"|'[^']*')(?:\s*\.\s*(?:[A-Za-z0-9_-]+|"[^"]*"|'[^']*'))*)\s*=""")
_HEADER_LINE = re.compile(r"^\s*\[\[?\s*([^\]]+?)\s*\]\]?")


_VALUE_LINE = re.compile(r"""^\s*([A-Za-z0-9_.-]+)\s*=\s*(.*?)\s*$""")


def _slip_words(text: str, line: int | None) -> str:
    """The commonest slips behind a TOML error, in shop words with the line written right
    ("" when the line is none of them): curly quotes pasted from a word processor, a value
    with no quotes, a list of words with no quotes, an inch mark that ends the string."""
    lines = toml_lines(text)
    here = lines[line - 1] if line and 0 < line <= len(lines) else ""
    m = _VALUE_LINE.match(here)
    if not m:
        return ""
    key, value = m.group(1), re.sub(r"\s+#[^\"']*$", "", m.group(2))
    if re.search("[\u201c\u201d\u2018\u2019]", value):
        fixed = re.sub("[\u201c\u201d]", '"', value)
        return (f"{key}: the value is in curly quotes (\u201c \u201d, as a word processor or "
                f"chat pastes them); TOML needs straight quotes: {key} = {fixed}")
    if re.match(r"^\[[^\]\"']*[A-Za-z][^\]\"']*\]$", value):
        words = [w.strip() for w in value[1:-1].split(",") if w.strip()]
        return (f"{key}: each word of a list is in quotes: {key} = ["
                + ", ".join(f'"{w}"' for w in words) + "]")
    if re.match(r'^"[^"]*\d\s*"".*$|^"[^"]*\d"[^"]+"$', value):
        return (f"{key}: the inch mark \" ends the string early; inside double quotes write it "
                f"\\\" (\"8' 0\\\"\"), or write the value as \"8 ft 0 in\"")
    if value and value[0] not in "\"'[{" and not re.match(r"^[-+]?\d[\d_]*(\.\d+)?([eE][-+]?\d+)?$|^(true|false)$", value):
        return (f"{key}: a value with a unit or a word is written in quotes: {key} = "
                f"\"{value.strip(chr(34) + chr(39))}\"")
    return ""


def _twice_words(msg: str, text: str, line: int | None) -> str:
    """The TOML reader's "Cannot overwrite a value" / "Cannot declare ... twice" in shop words:
    which key or table is written twice, on which lines, and what to do ("" for other
    errors)."""
    if line is None or not ("Cannot overwrite" in msg or "Cannot declare" in msg):
        return ""
    lines = toml_lines(text)
    for name in ("supports", "loads", "moving"):  # [supports] beside [[supports]]
        single = [i + 1 for i, x in enumerate(lines) if re.match(rf"\s*\[\s*{name}\s*\]", x)]
        double = any(re.match(rf"\s*\[\[\s*{name}\s*\]\]", x) for x in lines)
        if single and double:
            return (f"[{name}] on line {single[0]} has single brackets beside [[{name}]] "
                    f"headers: every one of the {name} is its own [[{name}]] table (double "
                    f"brackets); write [[{name}]] there")
    here = lines[line - 1] if 0 < line <= len(lines) else ""
    head = _HEADER_LINE.match(here)
    if "Cannot declare" in msg and head:
        name = head.group(1)
        first = next((i + 1 for i, x in enumerate(lines[:line - 1])
                      if (h := _HEADER_LINE.match(x)) and h.group(1) == name
                      and not x.lstrip().startswith("[[")), None)
        where = f"lines {first} and {line}" if first else f"line {line}"
        if name in ("supports", "loads", "moving"):  # a list of tables written with [ ]
            return (f"[{name}] is written twice ({where}) with single brackets: every one of "
                    f"the {name} is its own [[{name}]] table (double brackets); write "
                    f"[[{name}]] on each header")
        return (f"the table [{name}] is written twice ({where}): a job has one [{name}]; put "
                "all its keys under the first header and delete the second")
    if "Cannot overwrite" in msg and head and "." in head.group(1):
        parent, child = head.group(1).rsplit(".", 1)
        first = next((i + 1 for i, x in enumerate(lines[:line - 1])
                      if (k := _KEY_LINE.match(x)) and re.sub(r"\s+", "", k.group(1)) == child),
                     None)
        said = f" as {child} = ... on line {first}" if first else f" as {child} = ..."
        return (f"{child} is given twice:{said} under [{parent}], and as the [{head.group(1)}] "
                f"table on line {line}; keep one (a catalog key, or the table with its values)")
    key = _KEY_LINE.match(here)
    if not key:
        return ""
    name = re.sub(r"\s+", "", key.group(1))
    # the earlier line in the same table that gave it (back to the table's header)
    first = None
    for i in range(line - 2, -1, -1):
        if _HEADER_LINE.match(lines[i]) and not _KEY_LINE.match(lines[i]):
            break
        k = _KEY_LINE.match(lines[i])
        if k and re.sub(r"\s+", "", k.group(1)) == name:
            first = i + 1
            break
    where = f"lines {first} and {line}" if first else f"line {line}"
    return (f"the key {name!r} is given twice in the same table ({where}): TOML allows one "
            "value per key; keep the one you mean and delete the other (two loads or supports "
            "each need their own [[loads]] or [[supports]] header)")


def parse_job_text(text: str, filename: str = "<job>") -> Job:
    """Parse and validate job-file text. Raises InputErrors."""
    if len(text.encode("utf-8", "surrogatepass")) > MAX_FILE_BYTES:
        raise InputErrors([Problem(f"the file is larger than {MAX_FILE_BYTES // 1000} kB; a job "
                                   "file is a few kB", "", filename)])
    from shopbeam.jobs.limits import prescan  # depth and key count, before the parser

    shape = prescan(text)
    if shape:
        raise InputErrors([Problem(msg, "", filename, line) for msg, line in shape])
    try:
        data = tomllib.loads(text.removeprefix("\ufeff"))  # a byte-order mark is no key
    except tomllib.TOMLDecodeError as e:
        msg = str(e)
        m = re.search(r"\(at line (\d+), column (\d+)\)", msg)
        line = int(m.group(1)) if m else None
        msg = re.sub(r"\s*\(at line \d+, column \d+\)", "", msg)
        slip = _slip_words(text.removeprefix("\ufeff"), line)
        said = _twice_words(msg, text.removeprefix("\ufeff"), line) or (
            f"not valid TOML: {slip}" if slip else "")
        if said:
            raise InputErrors([Problem(said, "", filename, line)]) from None
        if m:
            msg += f" (column {m.group(2)})"
        raise InputErrors([Problem(f"not valid TOML: {msg}. Check quotes, brackets and "
                                   "'key = value' lines", "", filename, line)]) from None
    except RecursionError:
        raise InputErrors([Problem("not valid TOML: nested too deeply", "", filename)]) from None
    return parse_job_data(data, filename, text)


def load_job(path) -> Job:
    """Read and validate a job file. Raises InputErrors (with the file named)."""
    p = Path(path)
    name = str(path)
    try:
        from shopbeam.jobs.storage import read_bytes  # regular files only: a FIFO never hangs

        raw = read_bytes(p)
    except InputError as e:
        raise InputErrors([Problem(e.problem.message, "", name)]) from None
    except FileNotFoundError:
        raise InputErrors([Problem("no such job file; check the name and folder", "", name)]) from None
    except IsADirectoryError:
        raise InputErrors([Problem("this is a folder, not a job file", "", name)]) from None
    except OSError as e:
        raise InputErrors([Problem(f"cannot read the file ({e.strerror})", "", name)]) from None
    if len(raw) > MAX_FILE_BYTES:
        raise InputErrors([Problem(f"the file is larger than {MAX_FILE_BYTES // 1000} kB; a job "
                                   "file is a few kB", "", name)])
    try:
        text = raw.decode("utf-8")
    except UnicodeDecodeError as e:
        line = raw[: e.start].count(b"\n") + 1
        raise InputErrors([Problem("the file is not UTF-8 text; save it as UTF-8", "", name, line)]) from None
    return parse_job_text(text, name)
