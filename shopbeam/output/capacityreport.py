"""The text page of `shopbeam capacity`: the factor k on the live loads, the load to post (or
why none may be posted), the checks at k as `output.present` words them, and the cautions."""

from __future__ import annotations

import math
import textwrap

from shopbeam.cautions import banner, cautions_for
from shopbeam.design.capacity import CapacityResult, max_load_lines
from shopbeam.design.checks import BASIS_WORDS, basis_of
from shopbeam.escapes import shown
from shopbeam.output.present import present_capacity


def render(res: CapacityResult) -> str:
    job = res.job
    lines = [f"shopbeam capacity: {job.title}", "=" * 78]
    lines += textwrap.wrap(banner(job.tags, job.lifting), 78)
    lines.append("")
    k = res.factor
    if math.isfinite(k):
        lines.append(f"CAPACITY FACTOR k = {k:.6g} on the live loads "
                     "(dead loads and self-weight fixed)")
    else:
        lines.append("CAPACITY FACTOR: unlimited (" + res.note + ")")
    if res.note and math.isfinite(k):
        lines.append(f"  {res.note}")
    lines.append(f"  method: {res.method}")
    lines.append(f"  basis: {BASIS_WORDS[basis_of(job)]}")
    if res.not_rated:
        lines.append("NOT RATED: do not post a load from this factor, because")
        for r in res.not_rated:
            lines += textwrap.wrap(r, 78, initial_indent="  - ", subsequent_indent="    ")
    else:
        for label, value in max_load_lines(res):
            lines.append(f"  {label:<16} {value}")
    lines.append("")
    lines.append("CHECKS AT k")
    p = present_capacity(res)
    for c in p.checks:
        lines.append(f"  {c.name:<11} {c.demand} vs {c.limit}: ratio {c.ratio:.6f}")
        for w in textwrap.wrap(c.formula + (f" [{c.detail_text}]" if c.detail_text else ""), 72):
            lines.append("      " + w)
    if p.governing_name:
        lines.append(f"  governing: {p.governing_name}")
    if p.uplift and math.isfinite(k) and k > 0:
        lines.append("  uplift at k (anchor these supports):")
        for u in p.uplift:
            lines += textwrap.wrap(u, 78, initial_indent="    ", subsequent_indent="      ")
    warns = [p for p in job.warnings if p.warning]
    if warns:
        lines.append("")
        lines.append("INPUT WARNINGS")
        for p in warns:
            lines += textwrap.wrap(p.located(), 78, initial_indent="  ", subsequent_indent="  ")
    lines.append("")
    lines.append("CAUTIONS")
    for c in cautions_for(job.tags, job.lifting):
        lines += textwrap.wrap(c, 78, initial_indent="!! ", subsequent_indent="!! ")
    return shown("\n".join(lines), keep="\n") + "\n"
