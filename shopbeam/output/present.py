"""One presentation of a solved job: the rows and lines every renderer shows, formatted once in
the job's units.

`present(result)` turns an `analysis.Result` into plain text pieces: the reactions, the
governing load state with its reactions and any uplift, every check with its demand, limit,
formula, clause, the numbers it used (`params`) and the state that governs it, the verdict,
what was not checked, the self-checks and the cautions. The text report is laid out from it,
and the text UI shows the same rows, so the two cannot drift; the JSON carries the same facts
in SI (`analysis.to_json`).
"""

from __future__ import annotations

from dataclasses import dataclass

from shopbeam import units
from shopbeam.design.analysis import Result

# params key -> display kind (None: a plain number)
PARAM_KINDS = {"Lb": "small_length", "Lp": "small_length", "Lr": "small_length",
               "Cb": None, "Omega": None, "Mn": "moment", "Vn": "force", "Av": "area",
               "S": "modulus", "n": None, "limit": "small_length", "span_start": "length",
               "span_end": "length", "lb": "small_length"}


@dataclass(frozen=True)
class ReactionRow:
    kind: str
    at: str
    force: str
    moment: str  # "" where the support takes no moment
    uplift: bool  # the support pulls the beam down (force < 0)


@dataclass(frozen=True)
class CheckRow:
    name: str
    demand: str
    limit: str
    at: str  # "" when the check has no one place
    ratio: float
    ok: bool
    formula: str
    state: str  # the load state that governs ("" with one state)
    clause: str
    source: str
    params: tuple[tuple[str, str], ...]  # (name, value in the job's units)
    spans: tuple[str, ...]  # deflection: each span against its limit (when more than one)

    @property
    def verdict(self) -> str:
        return "PASS" if self.ok else "FAIL"


@dataclass(frozen=True)
class GoverningState:
    """The load state that governs (patterned loads): its words, reactions and uplift."""

    words: str
    reactions: tuple[ReactionRow, ...]
    uplift: tuple[str, ...]  # "roller at 10 ft pulls down 120 lbf"


@dataclass(frozen=True)
class Presentation:
    title: str
    units: str
    note: str  # which load state the reactions and diagrams show, if not the only one
    reactions: tuple[ReactionRow, ...]
    governing_state: GoverningState | None
    checks: tuple[CheckRow, ...]
    governing: str  # "bending, ratio 0.812"
    verdict: str  # "all checks PASS" or "the member FAILS this check"
    unchecked: tuple[str, ...]
    self_checks: tuple[str, ...]
    cautions: tuple[str, ...]


def param_text(name: str, value: float, system: str) -> str:
    kind = PARAM_KINDS.get(name)
    return units.fmt(value, kind, system) if kind else units.num(value)


def _reactions(sol, system: str) -> tuple[ReactionRow, ...]:
    f = lambda v, k: units.fmt(v, k, system)  # noqa: E731
    return tuple(ReactionRow(r.kind, f(r.at, "length"), f(r.force, "force"),
                             f(r.moment, "moment") if r.kind == "fixed" else "", r.force < 0)
                 for r in sol.reactions)


def _check_row(c, system: str, wood: bool = False) -> CheckRow:
    f = lambda v, k: units.fmt(v, k, system)  # noqa: E731
    spans = c.extra.get("spans", [])
    span_lines = tuple(f"{s['kind']} {f(s['start'], 'length')}-{f(s['end'], 'length')}: "
                       f"{f(s['demand'], 'small_length')} vs {f(s['limit'], 'small_length')}"
                       for s in spans) if len(spans) > 1 else ()
    return CheckRow(
        c.name, units.fmt_check(c.demand, c.unit, system, wood),
        units.fmt_check(c.limit, c.unit, system, wood),
        f(c.at, "length") if c.at is not None else "", float(c.ratio), bool(c.ok), c.formula,
        c.state, c.clause, c.source,
        tuple((k, param_text(k, v, system)) for k, v in c.params.items()), span_lines)


def present(result: Result) -> Presentation:
    """The presentation of one result, in the job's units."""
    job, sy = result.job, result.job.units
    state = None
    if result.state_solution is not None:
        rows = _reactions(result.state_solution, sy)
        state = GoverningState(result.state_words, rows,
                               tuple(f"{r.kind} at {r.at} pulls down "
                                     f"{r.force.lstrip('-')}" for r in rows if r.uplift))
    g = result.governing
    return Presentation(
        title=job.title, units=sy, note=result.shown_state,
        reactions=_reactions(result.solution, sy), governing_state=state,
        checks=tuple(_check_row(c, sy, getattr(job.material, "kind", "") == "lumber")
                     for c in result.checks),
        governing=f"{g.name}, ratio {g.ratio:.3f}",
        verdict="all checks PASS" if result.ok else "the member FAILS this check",
        unchecked=tuple(f"{u.name}: {u.reason}" + (f" ({u.clause})" if u.clause else "")
                        for u in result.unchecked),
        self_checks=tuple(f"[{'pass' if d.ok else 'WARN'}] {d.name}: {d.detail}"
                          for d in result.solution.diagnostics),
        cautions=tuple(result.cautions))
