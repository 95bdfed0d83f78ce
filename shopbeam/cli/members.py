"""`shopbeam section`, `shopbeam shapes` and `shopbeam materials`: the catalog and the
materials, printed."""

from __future__ import annotations

import json

from shopbeam.cautions import SHORT
from shopbeam.cli.common import guarded
from shopbeam.members import catalog
from shopbeam.members.materials import KSI, MPA, list_materials
from shopbeam.members.resolve import resolve_section
from shopbeam.units import PSI, fmt


def _system(args) -> str:
    s = getattr(args, "units", None) or getattr(args, "system", None) or "us"
    return s if s in ("us", "si") else "us"


@guarded
def cmd_section(args) -> int:
    """`shopbeam section DESIGNATION [--json] [--axis weak]`."""
    axis = getattr(args, "axis", None) or "strong"
    sec = resolve_section(args.designation, key="section", axis=axis)
    if getattr(args, "json", False):
        print(json.dumps(catalog.section_json(sec), indent=2))
    else:
        print(catalog.section_report(sec, _system(args)))
    return 0


@guarded
def cmd_shapes(args) -> int:
    """`shopbeam shapes [--kind HSS] [--filter 4x4] [--json]`: list catalog sections."""
    secs = catalog.list_sections(getattr(args, "kind", None), getattr(args, "filter", None))
    if getattr(args, "json", False):
        print(json.dumps([catalog.section_json(s) for s in secs], indent=2))
        return 0
    system = _system(args)
    if not getattr(args, "kind", None) and not getattr(args, "filter", None):
        print("kinds: " + ", ".join(f"{k} ({catalog.KIND_INFO[k]})" for k in catalog.KIND_INFO))
    # every cell keeps a space before it: a long figure widens its column, never runs into
    # the one before ("0.005208 in^38.138e-05 in^4")
    print(f"{'designation':<22}{'weight':>14} {'A':>14} {'Ix':>14} {'Sx':>14} {'Iy':>14}")
    for s in secs:
        wt = fmt(s.mass_per_length, "mass_per_length", system) if s.mass_per_length else "-"
        print(f"{s.designation:<22}{wt:>14} {fmt(s.area, 'area', system):>14} "
              f"{fmt(s.ix, 'inertia', system):>14} {fmt(s.sx, 'modulus', system):>14} "
              f"{fmt(s.iy, 'inertia', system) if s.iy else '-':>14}")
    print(f"{len(secs)} section{'s' if len(secs) != 1 else ''}. {SHORT}")
    return 0


@guarded
def cmd_materials(args) -> int:
    """`shopbeam materials [--json]`: the built-in materials with their sources."""
    mats = list_materials()
    if getattr(args, "json", False):
        print(json.dumps([{"key": m.key, "name": m.name, "kind": m.kind, "e": m.e, "fy": m.fy,
                           "fu": m.fu, "density": m.density, "fy_welded": m.fy_welded,
                           "fu_welded": m.fu_welded, "fb": m.fb, "fv": m.fv, "source": m.source,
                           "notes": list(m.notes)} for m in mats], indent=2))
        return 0
    system = getattr(args, "units", None) or "us"
    print(f"{'key':<14}{'E':>14}{'Fy (Fb)':>12}{'welded':>10}{'density':>16}  name")
    for m in mats:
        fy = fmt(m.fb if m.kind == "lumber" else m.fy, "stress", system)
        if m.kind == "lumber" and system == "us":
            fy = f"{m.fb / PSI:,.0f} psi"
        welded = fmt(m.fy_welded, "stress", system) if m.fy_welded else "-"
        e = fmt(m.e, 'stress', system)
        if m.kind == "lumber" and system == "us":
            e = f"{m.e / PSI / 1e6:.3g}e6 psi"
        elif m.kind == "stainless":  # the published dual figures (ASTM A240), not conversions
            e = "28,000 ksi" if system == "us" else "193 GPa"
            fy = f"{round(m.fy / KSI):g} ksi" if system == "us" else f"{m.fy / MPA:g} MPa"
        print(f"{m.key:<14}{e:>14}{fy:>12}{welded:>10}"
              f"{fmt(m.density, 'density', system):>16}  {m.name}")
    print("Sources: each material's source is in `--json`. Specified minimums; use the mill "
          "certificate where you have one.")
    return 0
