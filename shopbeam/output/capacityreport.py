"""The text page of `shopbeam capacity`: the factor k on the live loads, the load to post (or
why none may be posted), the checks at k as `output.present` words them, and the cautions."""

from __future__ import annotations

import math

from shopbeam.cautions import banner, cautions_for
from shopbeam.design.capacity import CapacityResult, max_load_lines
from shopbeam.design.checks import BASIS_WORDS, basis_of
from shopbeam.escapes import shown
from shopbeam.output.present import present_capacity, warnings_headline, wrap


def render(res: CapacityResult, width: int = 78) -> str:
    """The page, wrapped at `width` columns (the text UI passes the width of its view)."""
    job = res.job
    lines = wrap(f"shopbeam capacity: {job.title}", width, subsequent_indent="  ")
    lines.append("=" * width)
    lines += wrap(banner(job.tags, job.caution_lifting), width)
    lines += wrap(warnings_headline(job, "posting a load"), width,
                  initial_indent="!! ", subsequent_indent="!! ")
    lines.append("")
    k = res.factor
    if math.isfinite(k):
        lines += wrap(f"CAPACITY FACTOR k = {k:.6g} on the live loads "
                      "(dead loads and self-weight fixed)", width,
                      subsequent_indent="  ")
    else:
        # no live loads: nothing to scale, so no factor at all (not an unlimited one)
        words = "none" if res.method == "no live loads" else "unlimited"
        lines += wrap(f"CAPACITY FACTOR: {words} (" + res.note + ")", width,
                      subsequent_indent="  ")
    more = [res.note] if res.note and math.isfinite(k) else []
    more += [f"method: {res.method}", f"basis: {BASIS_WORDS[basis_of(job)]}"]
    for m in more:
        lines += wrap(m, width, initial_indent="  ", subsequent_indent="    ")
    if res.not_rated:
        lines.append("NOT RATED: do not post a load from this factor, because")
        for r in res.not_rated:
            lines += wrap(r, width, initial_indent="  - ", subsequent_indent="    ")
    else:
        for label, value in max_load_lines(res):
            lines.append(f"  {label:<16} {value}")
    lines.append("")
    lines.append("CHECKS AT k")
    p = present_capacity(res)
    for c in p.checks:
        lines.append(f"  {c.name:<11} {c.demand} vs {c.limit}: ratio {c.ratio:.6f}")
        formula = c.formula + (f" [{c.detail_text}]" if c.detail_text else "")
        for w in wrap(formula, width - 6):
            lines.append("      " + w)
    if p.governing_name:
        lines.append(f"  governing: {p.governing_name}")
    if p.uplift and math.isfinite(k) and k > 0:
        lines.append("  uplift at k (anchor these supports):")
        for u in p.uplift:
            lines += wrap(u, width, initial_indent="    ", subsequent_indent="      ")
    if p.envelope and math.isfinite(k) and k > 0:
        lines += wrap("supports at k (+ up; their brackets, seats, hangers and anchors must "
                      "carry these and are not checked here):", width, initial_indent="  ",
                      subsequent_indent="    ")
        for e in p.envelope:
            lines += wrap(e.words(), width, initial_indent="    ", subsequent_indent="      ")
    warns = [p for p in job.warnings if p.warning]
    if warns:
        lines.append("")
        lines.append("INPUT WARNINGS")
        for p in warns:
            lines += wrap(p.located(), width, initial_indent="  ", subsequent_indent="  ")
    lines.append("")
    lines.append("CAUTIONS")
    for c in cautions_for(job.tags, job.caution_lifting):
        lines += wrap(c, width, initial_indent="!! ", subsequent_indent="!! ")
    return shown("\n".join(lines), keep="\n") + "\n"
