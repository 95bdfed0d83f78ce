"""A `Section` from what a job file or the command line says: a catalog designation, a
designation with its orientation, or a [beam.section] table of dimensions or properties.

The shape calculators and the shapes' key lists are `sections.py`; the catalog is
`catalog.py`; this module joins them, so neither imports the other's caller.
"""

from __future__ import annotations

import math
import re
from dataclasses import replace
from typing import Mapping

from shopbeam.errors import InputError, raise_all
from shopbeam.members import catalog
from shopbeam.members.sections import (_ALIASES, _COMMON, _KEYS, _REQUIRED, SHAPES, Section,
                                       shape_keys,
                                       _a, _choice, _in, _len, _sheet, _suggest, _wall,
                                       _wall_factor, angle, channel, cover_plated,
                                       double_channel, i_shape, rect_bar, rect_tube, round_bar,
                                       round_tube, tee, turn)
from shopbeam.units import parse, quantity


# What the keys of the built-up shapes mean, for the message that names a missing one
_KEY_MEANING = {
    "base": "a catalog I-shape, e.g. \"W8x18\"",
    "plate_width": "e.g. \"6 in\"", "plate_thickness": "e.g. \"1/2 in\"",
    "plate": "\"bottom\" (default), \"top\" or \"both\"",
    "channel": "a catalog channel, e.g. \"C6x8.2\"",
    "arrangement": "\"back-to-back\" (default) or \"toe-to-toe\"",
    "gap": "between the channels, default 0",
}


def resolve_section(spec, key: str = "beam.section", axis: str | None = None,
                    material=None) -> Section:
    """A Section from a catalog designation (string) or a job file's section table.

    `axis` (or ``spec["axis"]``) is "strong" (default) or "weak". `material`, when known,
    settles the design wall of tube given by dimensions (see the module docstring).
    """
    if isinstance(spec, str):
        sec = catalog.lookup(spec, key=key, material=material)
        return _orient(sec, axis or "strong", {}, key)
    if not isinstance(spec, Mapping):
        raise InputError(f"section must be a designation such as \"HSS4x4x1/4\" or a table "
                         f"with a shape, not {spec!r}", key)
    if "designation" in spec and "shape" not in spec:
        return _catalog_table(spec, key, axis, material)
    raw_shape = spec.get("shape")
    if not isinstance(raw_shape, str) or not raw_shape.strip():
        raise InputError("the section table needs shape = one of " + ", ".join(SHAPES), 
                         f"{key}.shape")
    shape = raw_shape.strip().lower().replace("_", "-").replace(" ", "-")
    shape = _ALIASES.get(shape, shape)
    if shape not in _KEYS:
        hint = _suggest(shape, _KEYS)
        if not hint:
            try:
                found = catalog.lookup(raw_shape).designation
                hint = (f" ({found!r} is a catalog section: write section = \"{found}\", or "
                        f"designation = \"{found}\" in this table)")
            except InputError:
                pass
        raise InputError(f"unknown shape {raw_shape!r}{hint}; shapes are "
                         + ", ".join(SHAPES), f"{key}.shape")
    allowed = _KEYS[shape] | _COMMON
    bad = []  # every slip of the table named at once, as the rest of the job's are
    for k in spec:
        if k not in allowed and k in BEAM_KEYS:
            bad.append(InputError(f"{k} is read as part of [beam.section] because it comes "
                                  "after that header (a TOML table runs until the next "
                                  f"header): move the {k} line above [beam.section], into "
                                  "[beam]", f"{key}.{k}"))
        elif k not in allowed:
            bad.append(InputError(f"unknown key {k!r} for {_a(shape)}{_suggest(k, allowed)}; "
                                  f"keys are {', '.join(sorted(allowed))}", f"{key}.{k}"))
    missing = [k for k in _REQUIRED[shape] if k not in spec]
    if missing:
        req, opt = shape_keys(shape)
        meant = "; ".join(f"{k} ({_KEY_MEANING[k]})" if k in _KEY_MEANING else k
                          for k in req + opt)
        need = missing[0] if len(missing) == 1 else \
            ", ".join(missing[:-1]) + " and " + missing[-1]
        bad.append(InputError(f"shape = \"{shape}\" needs {need}: its keys are {meant}"
                              + (f" (optional: {', '.join(opt)})" if opt else ""),
                              f"{key}.{missing[0]}"))
    if shape != "custom":  # (custom names all its own slips at once)
        for k in spec:  # each size as _build reads it
            try:
                if k == "wall":
                    _wall(spec, key, "tube")
                elif k == "plate_thickness" or (
                        k in ("depth", "width") and shape in ("rect-bar", "flat-bar")):
                    _sheet(spec, k, key)
                elif k in _KEYS[shape] and k not in _NOT_LENGTHS:
                    _len(spec, k, key, positive=k not in ("corner_radius", "fillet_radius",
                                                          "gap"))
            except InputError as exc:
                bad.append(exc)
    raise_all(bad)
    if "axis" in spec:
        ax = _choice(spec, "axis", ("strong", "weak"), "strong", key)
    else:
        ax = axis or "strong"
    name = spec.get("name")
    if name is not None and not isinstance(name, str):
        raise InputError("name must be text", f"{key}.name")
    mass = None
    if "weight" in spec:
        mass = parse(spec["weight"], "mass_per_length", f"{key}.weight", positive=True)
    try:
        sec = _build(shape, spec, key, material, mass)
    except ValueError as exc:
        raise InputError(f"{exc}", key) from None
    if name:
        sec = replace(sec, designation=name)
    elif _metric_designation(shape, spec):
        sec = replace(sec, designation=_metric_designation(shape, spec))
    return _orient(sec, ax, spec, key)


_ORIENT_KEYS = {"designation", "axis", "leg", "toes", "flange", "name"}
# a shape's keys that are not a plain length (choices, catalog names, a wall read its own way)
_NOT_LENGTHS = frozenset({"leg", "toes", "flange", "channel", "arrangement", "base", "plate",
                          "design_wall"})
# [beam]'s own keys: written below a [beam.section] header, TOML puts them in the section
BEAM_KEYS = frozenset({"length", "section", "material", "self_weight", "members", "levels",
                       "welded", "braces", "braced", "braces_flange", "bearing", "restrained",
                       "wet_service", "temperature", "repetitive"})


def _catalog_table(spec, key, axis, material) -> Section:
    """``{designation = "L2x2x3/16", leg = "top"}``: a catalog section, oriented."""
    for k in spec:
        if k not in _ORIENT_KEYS and k in BEAM_KEYS:
            raise InputError(f"{k} is read as part of [beam.section] because it comes after "
                             "that header (a TOML table runs until the next header): move the "
                             f"{k} line above [beam.section], into [beam]", f"{key}.{k}")
        if k not in _ORIENT_KEYS:
            raise InputError(f"unknown key {k!r} beside a designation{_suggest(k, _ORIENT_KEYS)};"
                             f" keys are {', '.join(sorted(_ORIENT_KEYS))} (or give shape = "
                             "... with dimensions instead)", f"{key}.{k}")
    sec = catalog.lookup(_text(spec, "designation", key), key=f"{key}.designation",
                         material=material)
    if "leg" in spec and sec.shape != "angle":
        raise InputError("leg applies to angles only", f"{key}.leg")
    if "toes" in spec and sec.shape != "channel":
        raise InputError("toes applies to channels only", f"{key}.toes")
    if "flange" in spec and sec.shape != "tee":
        raise InputError("flange applies to tees only", f"{key}.flange")
    ax = _choice(spec, "axis", ("strong", "weak"), "strong", key) if "axis" in spec else (
        axis or "strong")
    flip = False
    if sec.shape == "angle" and ax == "strong":
        flip = _choice(spec, "leg", ("bottom", "top"), "bottom", key) == "top"
    if sec.shape == "tee" and ax == "strong":
        flip = _choice(spec, "flange", ("top", "bottom"), "top", key) == "bottom"
    if flip:
        sec = replace(sec, sx_top=sec.sx_bot, sx_bot=sec.sx_top)
    sec = _orient(sec, ax, spec, key)
    name = spec.get("name")
    if name is not None:
        if not isinstance(name, str):
            raise InputError("name must be text", f"{key}.name")
        sec = replace(sec, designation=name)
    return sec


_METRIC_DIM = re.compile(r"^\s*([\d.]+)\s*(mm|cm|m)\s*$")


def _metric_designation(shape: str, spec) -> str:
    """A section typed in by its sizes in millimetres (cm, m) is named in them, as typed
    ("rect-tube 100 x 50 x 4 mm"), not in inches: "" where the sizes were not all typed in
    one metric unit (the sections module names it in inches then)."""
    keys = _REQUIRED.get(shape, ())
    got = [_METRIC_DIM.match(spec.get(k)) if isinstance(spec.get(k), str) else None
           for k in keys]
    if not keys or not all(got) or len({m.group(2) for m in got}) != 1:
        return ""
    return f"{shape} " + " x ".join(m.group(1) for m in got) + f" {got[0].group(2)}"


def _orient(sec: Section, ax: str, spec, key) -> Section:
    if ax == "strong":
        return sec
    if sec.shape == "custom":
        raise InputError("a custom section is typed in about its bending axis: give the "
                         "weak-axis values as ix/sx instead of axis = \"weak\"", f"{key}.axis")
    if sec.axis == "n/a":
        return sec
    kw = {}
    if sec.shape == "channel":
        kw["toes"] = _choice(spec, "toes", ("down", "up"), "down", key)
    if sec.shape == "angle":
        kw["leg"] = _choice(spec, "leg", ("bottom", "top"), "bottom", key)
    try:
        return turn(sec, "weak", **kw)
    except ValueError as exc:
        raise InputError(str(exc), f"{key}.axis") from None


def _build(shape, spec, key, material, mass) -> Section:
    L = lambda n, **kw: _len(spec, n, key, **kw)  # noqa: E731
    if shape in ("rect-tube", "square-tube"):
        if shape == "square-tube":
            h = b = L("size")
        else:
            h, b = L("depth"), L("width")
        t_nom, note = _wall(spec, key, "tube")
        f, rule = _wall_factor(spec, key, material, shape)
        r = L("corner_radius", positive=False)
        if r is not None and r >= min(h, b) / 2:
            raise InputError(f"corner_radius ({_in(r)} in) must be less than half the tube's "
                             f"smaller side ({_in(min(h, b))} in): check its unit (\"5 mm\", "
                             "not \"5 in\"); the outside corner radius is about 2 x the wall",
                             f"{key}.corner_radius")
        sec = rect_tube(h, b, t_nom, t_des=f * t_nom, r_out=r, mass=mass,
                        designation=f"rect-tube {_in(h)} x {_in(b)} in x {_wall_text(spec)}",
                        source="computed from dimensions (" + "; ".join(
                            x for x in (note, rule, "outside corner radius " + (
                                "as given" if r is not None else "2 x design wall")) if x) + ")")
        if r is not None:  # the wall checks' k: the radius measured, not the assumed one
            sec.dims["r_typed"] = r
        return sec
    if shape in ("round-tube", "pipe"):
        od = L("od")
        t_nom, note = _wall(spec, key, "tube")
        f, rule = _wall_factor(spec, key, material, shape)
        return round_tube(od, t_nom, t_des=f * t_nom, shape=shape, mass=mass,
                          designation=f"{shape} {_in(od)} in x {_wall_text(spec)}",
                          source="computed from dimensions (" + "; ".join(
                              x for x in (note, rule) if x) + ")")
    if shape in ("rect-bar", "flat-bar", "square-bar"):
        if shape == "square-bar":
            h = b = L("size")
            notes = []
        else:
            (h, n1), (b, n2) = _sheet(spec, "depth", key), _sheet(spec, "width", key)
            notes = [n for n in (n1, n2) if n]
        src = "computed from dimensions" + (f" ({'; '.join(notes)})" if notes else "")
        return rect_bar(h, b, mass=mass, source=src)
    if shape == "round-bar":
        return round_bar(L("diameter"), mass=mass)
    r = L("fillet_radius", positive=False) or 0.0
    if shape == "angle":
        leg = _choice(spec, "leg", ("bottom", "top"), "bottom", key)
        return angle(L("depth"), L("width"), L("thickness"), r=r, leg=leg, mass=mass)
    if shape == "channel":
        return channel(L("depth"), L("flange_width"), L("flange_thickness"),
                       L("web_thickness"), r=r, mass=mass)
    if shape == "i-beam":
        # an I-section typed in by its plates is taken as welded (built-up): AISC 360-16
        # Table B4.1b case 11 flanges and G2.1(b) shear (conservative; catalog shapes are
        # rolled)
        sec = i_shape(L("depth"), L("flange_width"), L("flange_thickness"),
                      L("web_thickness"), r=r, mass=mass)
        return replace(sec, dims={**sec.dims, "built_up": 1.0},
                       source=sec.source + " (taken as built-up: welded plates)")
    if shape == "tee":
        fl = _choice(spec, "flange", ("top", "bottom"), "top", key)
        return tee(L("depth"), L("flange_width"), L("flange_thickness"), L("stem_thickness"),
                   r=r, flange=fl, mass=mass)
    if shape == "double-channel":
        ch = catalog.lookup(_text(spec, "channel", key), key=f"{key}.channel")
        if ch.shape != "channel":
            raise InputError(f"{spec['channel']!r} is not a channel (C or MC)",
                             f"{key}.channel")
        arr = _choice(spec, "arrangement", ("back-to-back", "toe-to-toe"), "back-to-back", key)
        gap = L("gap", positive=False) or 0.0
        return double_channel(ch, arr, gap)
    if shape == "cover-plated":
        base = catalog.lookup(_text(spec, "base", key), key=f"{key}.base")
        if base.shape not in ("i-beam", "rect-tube"):
            raise InputError(f"{spec['base']!r} is a {base.shape}; a cover plate goes on an "
                             "I-shape (W, S, M, HP) or a rectangular HSS", f"{key}.base")
        pl = _choice(spec, "plate", ("top", "bottom", "both"), "bottom", key)
        tp, note = _sheet(spec, "plate_thickness", key)
        sec = cover_plated(base, L("plate_width"), tp, pl)
        return replace(sec, source=sec.source + (f" ({note})" if note else ""))
    if shape == "custom":
        return _custom(spec, key, mass, parse)
    raise InputError(f"unknown shape {shape!r}", f"{key}.shape")


def _text(spec, name, key):
    v = spec.get(name)
    if not isinstance(v, str) or not v.strip():
        raise InputError(f"{name} must be a catalog designation in quotes", f"{key}.{name}")
    return v


def _wall_text(spec) -> str:
    v = spec.get("wall")
    return v.strip() if isinstance(v, str) else str(v)


_CUSTOM_KINDS = {"area": "area", "ix": "inertia", "sx": "modulus", "depth": "length",
                 "sx_top": "modulus", "sx_bot": "modulus", "shear_area": "area",
                 "iy": "inertia", "rx": "length", "ry": "length", "zx": "modulus",
                 "sy": "modulus", "zy": "modulus", "j": "inertia"}


def _custom(spec, key, mass, parse) -> Section:
    values, bad = {}, []
    for name, kind in _CUSTOM_KINDS.items():  # every figure read, every slip named at once
        if name in spec:
            try:
                values[name] = parse(spec[name], kind, f"{key}.{name}", positive=True)
            except InputError as exc:
                bad.append(exc)
    raise_all(bad)

    def q(name, kind):
        return values.get(name)

    area, ix = q("area", "area"), q("ix", "inertia")
    sx, depth = q("sx", "modulus"), q("depth", "length")
    s_top, s_bot = q("sx_top", "modulus"), q("sx_bot", "modulus")
    if s_top is None and s_bot is None:
        if sx is None and depth is None:
            raise InputError("a custom section needs sx (elastic section modulus) or depth "
                             "(then S = I / (depth / 2))", f"{key}.sx")
        s = sx if sx is not None else ix / (depth / 2)
        s_top = s_bot = s
    elif s_top is None or s_bot is None:
        raise InputError("give both sx_top and sx_bot, or sx", f"{key}.sx_top")
    _possible_moduli(key, area, ix, depth, sx, spec, s_top, s_bot)
    if depth is None:
        depth = ix / s_top + ix / s_bot
    shear = q("shear_area", "area")
    notes = ()
    if shear is None:
        shear = area / 2
        notes = ("custom section: no shear_area given, half the area is used",)
    iy = q("iy", "inertia")
    rx = q("rx", "length") or math.sqrt(ix / area)
    ry = q("ry", "length") or (math.sqrt(iy / area) if iy else None)
    if shear > area * 1.0000001:
        raise InputError("shear_area is larger than the area: the shear area is the part that "
                         "carries shear (the web, d x tw for an I-shape, 2 h t for a tube), so "
                         "it is a part of the area; check both values and their units, or "
                         "leave shear_area out (half the area is then used)",
                         f"{key}.shear_area")
    return Section(
        spec.get("name") or "custom", "custom", area, ix, s_top, s_bot, q("zx", "modulus"), iy,
        q("sy", "modulus"), q("zy", "modulus"), rx, ry, q("j", "inertia"), _cw(spec, key), shear, depth, "strong", {}, "typed in", notes, mass)


def _possible_moduli(key, area, ix, depth, sx, spec, s_top, s_bot) -> None:
    """A section modulus no section can have is a slip (I typed for S, a unit off). The
    fibre farthest from the axis is c_max away, every fibre lies within it, so I <= A c_max^2
    and the smaller modulus S = I / c_max <= sqrt(I A); with a depth d, c_max >= d / 2, so
    S <= 2 I / d (elementary section geometry). Only the smaller modulus is bounded: the
    other side of a tee or a cover-plated shape sits near the axis and may be far larger.
    Refused, naming the bound."""
    from shopbeam.units import fmt

    if "sx_top" in spec and "sx_bot" in spec:
        name, v = ("sx_top", s_top) if s_top <= s_bot else ("sx_bot", s_bot)
    elif "sx" in spec:
        name, v = "sx", sx
    else:
        return
    most = math.sqrt(ix * area)
    if v > most * (1 + 1e-6):
        raise InputError(
            f"{name} = {fmt(v, 'modulus', 'us')} is more than any section of area "
            f"{fmt(area, 'area', 'us')} and I = {fmt(ix, 'inertia', 'us')} can have "
            f"(the smaller S = I / c_max <= sqrt(I A) = {fmt(most, 'modulus', 'us')}, as "
            "I <= A c_max^2): check the value and its unit (was I typed for S?)",
            f"{key}.{name}")
    if depth is not None and v > 2 * ix / depth * (1 + 1e-6):
        raise InputError(
            f"{name} = {fmt(v, 'modulus', 'us')} and depth = {fmt(depth, 'small_length', 'us')} "
            f"disagree: the farthest fibre is at least depth / 2 from the axis, so the smaller "
            f"S <= 2 I / depth = {fmt(2 * ix / depth, 'modulus', 'us')}; check both, or give "
            "only one of them", f"{key}.{name}")


def _cw(spec, key):
    """Warping constant (m^6) typed in as e.g. "530 in^6"."""
    if "cw" not in spec:
        return None
    q = quantity(spec["cw"], f"{key}.cw")
    try:
        v = float(q.to("m**6").magnitude)
    except Exception:
        raise InputError(f"{spec['cw']!r} is not a warping constant (length^6, e.g. "
                         "\"530 in^6\")", f"{key}.cw") from None
    if v <= 0:
        raise InputError("cw must be greater than zero", f"{key}.cw")
    return v
