"""The text page of `shopbeam size`: the sections swept, the lightest and cheapest that pass,
and the table of those that pass (or the closest), with the cautions."""

from __future__ import annotations

import math

from shopbeam import units
from shopbeam.cautions import cautions_for
from shopbeam.escapes import shown as escaped
from shopbeam.design.checks import BASIS_WORDS, basis_of
from shopbeam.design.sizing import SizeResult, shown_rows
from shopbeam.output.present import wrap


def _k(factor: float) -> str:
    """The factor column: '-' where there is no live load to scale (k infinite)."""
    return f"{factor:7.3f}" if not math.isinf(factor) else f"{'-':>7}"

def render(res: SizeResult, top: int = 15) -> str:
    job = res.job
    sy = job.units
    shown = shown_rows(res, top)  # the listed rows, each with its rating gaps
    lines = [f"shopbeam size: {job.title}", "=" * 78]
    lines.append(f"swept {len(res.rows)} sections ({res.kind}) in {res.seconds * 1000:.0f} ms; "
                 f"{len(res.passing)} pass; {res.method}")
    if res.material_note:
        lines += wrap("NOTE: " + res.material_note, 78, subsequent_indent="  ")
    weight = ("self-weight recomputed per section" if job.self_weight else
              "self-weight not included (self_weight = false)")
    lines.append(f"basis: {BASIS_WORDS[basis_of(job)]}; {weight}")
    more = len(res.screened_only)
    full_ok = sum(1 for r in res.rows if r.checked == "full" and r.ok)
    if more:
        lines += wrap(
            f"{res.full_checks} checked in full, lightest first, until "
            f"{'one' if full_ok <= 1 else full_ok} passed; {more} "
            "heavier sections pass the batched screen but were not checked in full (not "
            "listed: the screen is only a lower bound; --confirm N checks and lists N)",
            78)
    if res.lightest:
        lines.append(f"lightest that passes: {res.lightest.designation} "
                     f"({units.fmt(res.lightest.weight, 'mass_per_length', sy)})")
        if not any(ld.case == "live" for ld in job.loads) and not job.moving:
            lines += wrap("!! the job has no live loads: the sections listed pass under the "
                          "loads entered, but there is nothing to rate (no load to post); "
                          "enter the load to rate as a live load", 78,
                          subsequent_indent="!! ")
        if getattr(res.lightest, "not_rated", ()):
            lines += wrap(
                "!! but it passes only the checks that were made: a limit state it calls for "
                "is not checked (see NOT RATED below), so do not choose it on this sweep "
                "alone; try another kind, or have it checked", 78, subsequent_indent="!! ")
            rated = res.lightest_rated
            if rated is not None:
                lines.append(f"lightest that passes and is rated: {rated.designation} "
                             f"({units.fmt(rated.weight, 'mass_per_length', sy)})")
            elif all(r.not_rated for r in shown):
                lines += wrap(
                    "!! no listed section can be rated on this sweep (each is NOT RATED, see "
                    "below)", 78, subsequent_indent="!! ")
            else:
                lines += wrap(
                    f"!! none of the {res.full_checks} sections checked in full is rated; "
                    "--confirm N checks more", 78, subsequent_indent="!! ")
    if res.cheapest:
        c = res.cheapest
        cost = c.cost(job.length)
        lines.append(f"cheapest that passes: {c.designation} ({_money(c.price_per_m, sy)} per "
                     f"{'ft' if sy == 'us' else 'm'}, {cost:.2f} {res.currency} for the "
                     "member)".replace("  ", " "))
    lines.append("")
    lines.append(f"  {'section':<22} {'weight':>12} {'ratio':>7} {'governing':<11} {'k':>7}"
                 + ("  price" if any(r.price_per_m is not None for r in res.rows) else ""))
    for r in shown:
        price = f"  {_money(r.price_per_m, sy)}" if r.price_per_m is not None else ""
        lines.append(f"  {r.designation[:22]:<22} {units.fmt(r.weight, 'mass_per_length', sy):>12} "
                     f"{r.ratio:7.3f} {r.governing:<11} {_k(r.factor)}{price}"
                     + ("  NOT RATED" if r.not_rated else ""))
    groups: dict[str, list[str]] = {}  # one reason, the rows it holds back
    for r in shown:
        for why in r.not_rated[:2]:
            groups.setdefault(why, []).append(r.designation)
    for why, names in groups.items():
        lines += wrap(f"{', '.join(names)} NOT RATED: {why}", 78,
                      initial_indent="  ", subsequent_indent="    ")
    if not res.passing:
        lines.append("  no section passes; the closest:")
        for r in sorted(res.rows, key=lambda r: r.ratio)[:5]:
            least = " at least (screen)" if r.checked == "screen" else ""
            lines.append(f"  {r.designation[:22]:<22} ratio{least} {r.ratio:.3f} ({r.governing})")
    for s in res.skipped[:5]:
        lines.append(f"  skipped {s}")
    warns = [p for p in job.warnings if p.warning]
    if warns:  # as solve and capacity print them: a slip held in every row is named here
        lines.append("")
        lines.append("INPUT WARNINGS")
        for p in warns:
            lines += wrap(p.located(), 78, initial_indent="  ", subsequent_indent="  ")
    lines.append("")
    for c in cautions_for(job.tags, job.caution_lifting):
        lines += wrap(c, 78, initial_indent="!! ", subsequent_indent="!! ")
    # each line is escaped on its own (a line break or tab in the title is shown, not obeyed)
    return "\n".join(escaped(x) for x in lines) + "\n"


def _money(per_m: float, system: str) -> str:
    return f"{per_m * (0.3048 if system == 'us' else 1.0):.2f}"
