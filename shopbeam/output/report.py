"""The plain-text report of `shopbeam solve`: readable in a terminal, an e-mail or a job folder.

Everything is shown in the job's display units; the safety caution is always on it.
"""

from __future__ import annotations


from shopbeam import units
from shopbeam.design.analysis import Result
from shopbeam.output.present import (design_wall, present, upward_note,
                                     warnings_headline, wrap)

WIDTH = 78

CHECK_KINDS = units.CHECK_KINDS


def _design_wall(sec, f) -> str:
    """A typed-in tube's design wall and its rule (`present.design_wall`), for the MEMBER
    lines: a posted load rests on it. Empty for other sections."""
    got = design_wall(sec)
    if got is None:
        return ""
    t_des, t_nom, rule = got
    return (f"wall: design t = {f(t_des, 'small_length')} of nominal "
            f"{f(t_nom, 'small_length')}, {rule}")


def _wrap(text: str, indent: str = "  ", width: int = WIDTH) -> list[str]:
    return wrap(text, width, initial_indent=indent, subsequent_indent=indent) or [indent]


def fmt_pos(x: float, system: str) -> str:
    return units.fmt(x, "length", system)


def describe_load(ld, system: str) -> str:
    f = lambda v, k: units.fmt(v, k, system)  # noqa: E731
    lab = f" ({ld.label})" if ld.label else ""
    case = "" if ld.case == "live" else f" [{ld.case}]"
    if ld.kind == "point":
        return f"point {f(ld.value, 'force')} at {fmt_pos(ld.at, system)}{lab}{case}"
    if ld.kind == "moment":
        return f"couple {f(ld.value, 'moment')} (+ ccw) at {fmt_pos(ld.at, system)}{lab}{case}"
    span = f"from {fmt_pos(ld.start, system)} to {fmt_pos(ld.end, system)}"
    if ld.kind == "uniform":
        return f"uniform {f(ld.w1, 'line_load')} {span}{lab}{case}"
    return f"linear {f(ld.w1, 'line_load')} to {f(ld.w2, 'line_load')} {span}{lab}{case}"


def describe_support(s, system: str) -> str:
    extra = f", k = {units.fmt(s.stiffness, 'stiffness', system)}" if s.kind == "spring" else ""
    return f"{s.kind} at {fmt_pos(s.at, system)}{extra}"


check_value = units.fmt_check  # a check's demand or limit in the job's units


def caution_block(cautions) -> list[str]:
    out = []
    for c in cautions:
        out += _wrap(c, "!! ", WIDTH)
    return out


def render(result: Result) -> str:
    job, sol = result.job, result.solution
    sy = job.units
    p = present(result)
    f = lambda v, k, sig=4: units.fmt(v, k, sy, sig)  # noqa: E731
    lines = [f"shopbeam report: {job.title}"]
    if job.path:
        lines.append(f"job file: {job.path}")
    lines.append("=" * WIDTH)
    lines += caution_block(result.cautions[:1])
    head = warnings_headline(job, "using these figures")
    if head:
        lines += _wrap(head, "!! ")
    lines.append("")
    sec, mat = job.section, job.material
    lines.append("MEMBER")
    lines.append(f"  span     {f(job.length, 'length')}")
    lines.append(f"  section  {sec.designation} ({sec.shape}, {sec.axis} axis): "
                 f"I = {f(sec.ix, 'inertia')}, S = {f(sec.sx, 'modulus')}, "
                 f"A = {f(sec.area, 'area')}")
    wall = _design_wall(sec, f)
    if wall:
        lines += _wrap(wall, "           ")
    from shopbeam.members.materials import figures

    lines.append(f"  material {mat.name}: {figures(mat, sy)}")
    if job.self_weight:
        sw = job.self_weight_load()
        lines.append(f"  self-weight {f(-sw.w1, 'line_load')} (included, dead load)")
    else:
        lines.append("  self-weight not included (self_weight = false)")
    if job.members > 1:
        lines.append(f"  {job.members} identical members share the loads: each carries 1/{job.members}")
    lines.append(f"  supports {'; '.join(describe_support(s, sy) for s in job.supports)}")
    lines.append("  loads (+ up; gravity loads are negative)")
    if not job.loads:
        lines.append("    none entered")
    for ld in job.loads:
        lines.append(f"    {describe_load(ld, sy)}")
    for c in job.conversions:
        lines.append(f"    read as {c}")
    lines.append("")

    if result.shown_state:
        lines += _wrap("Note: " + result.shown_state + ".", "")
        lines.append("")
    lines.append("REACTIONS (what each support does to the beam: + up, + counterclockwise)")
    for r in p.reactions:
        mom = f"   moment {r.moment}" if r.moment else ""
        lines.append(f"  {r.kind:<7} at {r.at:<12} force {r.force:<14}{mom}")
    if p.governing_state is not None:
        lines += _wrap(f"In {p.governing_state.words}:", "  ")
        for r in p.governing_state.reactions:
            mom = f"   moment {r.moment}" if r.moment else ""
            up = "  (pulls down: uplift)" if r.uplift else ""
            lines.append(f"    {r.kind:<7} at {r.at:<12} force {r.force}{mom}{up}")
    if p.envelope:
        lines.append("")
        lines.append("REACTION ENVELOPE (each support over every load state: what a bracket or "
                     "anchor must carry)")
        for r in p.envelope:
            # the other end of the envelope: a pull down (uplift) where some state reverses the
            # reaction, else the least push up (never "largest down" for a support that only
            # ever pushes up)
            low = (f"largest down {r.max_down}  (uplift)" if r.uplift else
                   f"least up {r.max_down}  (no uplift)")
            lines.append(f"  {r.kind:<7} at {r.at:<12} largest up {r.max_up:<14} {low}")
            for which, state in (("up", r.up_state), ("down" if r.uplift else "least",
                                                      r.down_state)):
                if state:
                    lines += _wrap(f"{which}: {state}", "      ")
    lines.append("")

    lines.append("EXTREMES (exact, with where they occur)")
    kinds = {"shear": "force", "moment": "moment", "slope": "slope", "deflection": "small_length"}
    for name, e in sol.extremes().items():
        k = kinds[name]
        lines.append(f"  {name:<10} max {f(e.max, k):<16} at {fmt_pos(e.max_at, sy):<10}"
                     f" min {f(e.min, k):<16} at {fmt_pos(e.min_at, sy)}")
    lines.append("")

    lines.append("CHECKS")
    for c in p.checks:
        where = f" at {c.at}" if c.at else ""
        lines.append(f"  {c.name:<11} {c.demand} vs limit {c.limit}{where}: ratio {c.ratio:.3f}  "
                     f"{c.verdict}")
        lines += _wrap(c.formula, "      ")
        if c.state:  # pattern or moving-load position that governs
            lines += _wrap(f"worst state: {c.state}", "      ")
        for s in c.spans:
            lines.append(f"      {s}")
    lines += _wrap(f"governing: {p.governing} -> {p.verdict}", "  ")
    note = upward_note(job)
    if note:
        lines += _wrap(note, "  !! ")
    lines.append("")

    lines.append("SELF-CHECKS (run on every solve)")
    for d in p.self_checks:
        lines += _wrap(d, "  ")[:2]
    if sol.condition > 1e10 and not getattr(sol, "exact", False):
        lines.append(f"  [WARN] the equations are ill-conditioned (condition {sol.condition:.2g}): "
                     "check supports very close together or extreme spring stiffnesses")
    warns = [p for p in job.warnings if p.warning]
    if warns:
        lines.append("")
        lines.append("INPUT WARNINGS")
        for p in warns:
            lines += _wrap(p.located(), "  ")
    lines.append("")
    lines.append("CAUTIONS")
    lines += caution_block(result.cautions)
    from shopbeam.escapes import shown

    # each line is escaped on its own: a line break or tab in a title or label is shown as
    # \n or \t, so text from the job file never adds a line of its own to the report
    return "\n".join(shown(x) for x in lines) + "\n"
