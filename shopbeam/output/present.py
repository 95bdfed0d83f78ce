"""One presentation of a solved job: the rows and lines every renderer shows, formatted once in
the job's units.

`present(result)` turns an `analysis.Result` into plain text pieces: the reactions, the
governing load state with its reactions and any uplift, the reaction envelope over every load
state, every check with its demand, limit, formula, clause, the numbers it used (`params`) and
the state that governs it, the verdict, what was not checked, the self-checks and the
cautions. The text report, the calc package and the text UI are laid out from it, so they
cannot drift; the JSON carries the same facts in SI (`analysis.to_json`).
`present_capacity(cap)` is the same for a capacity (the checks, governing state and reaction
envelope at the rated load): the capacity page and the rating label are laid out from it.
"""

from __future__ import annotations

import textwrap
from dataclasses import dataclass

from shopbeam import units
from shopbeam.design.analysis import Result

# params key -> display kind (None: a plain number)
PARAM_KINDS = {"Lb": "small_length", "Lp": "small_length", "Lr": "small_length",
               "Cb": None, "Omega": None, "Mn": "moment", "Vn": "force", "Av": "area",
               "S": "modulus", "n": None, "limit": "small_length", "span_start": "length",
               "span_end": "length", "lb": "small_length",
               # the local, lifting, fatigue and open-shape checks' numbers (SI floats in
               # the check): in the job's units on every page, never as raw SI
               **dict.fromkeys(("Lb_bottom", "Lb_top", "a", "bf", "d", "end_distance", "h",
                                "k", "t", "tf", "tw"), "small_length"),
               **dict.fromkeys(("M_yield_cap", "Ma", "Mcx", "Mcy", "Mn_omega",
                                "Mn_omega_shear_centre", "Mn_stem_compression",
                                "Mn_stem_tension", "Mnw", "Mnz", "Mp", "Mw", "Mw_yield_cap",
                                "Mx", "My", "Mz", "Mz_yield_cap"), "moment"),
               **dict.fromkeys(("P", "Rn"), "force"),
               **dict.fromkeys(("Cr", "F_SR", "fy", "sigma_global", "sigma_x", "sigma_y"),
                               "stress")}


def wrap(text: str, width: int, **kw) -> list[str]:
    """Lines of `text` for a page or label, never split at a hyphen (a tag to type,
    "not-vehicle", stays whole)."""
    return textwrap.wrap(text, width, break_on_hyphens=False, **kw)


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
    detail: str = ""  # e.g. which unbraced length governs

    @property
    def detail_text(self) -> str:
        """The detail with the governing load state (as the JSON's `detail` says it)."""
        return "; ".join(x for x in (self.detail, self.state and "worst state: " + self.state)
                         if x)

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
class EnvelopeRow:
    """One support over every load state: the largest upward and downward reaction."""

    kind: str
    at: str
    max_up: str
    max_down: str
    uplift: bool  # some load state pulls the beam down here (max_down < 0)
    up_state: str
    down_state: str

    def words(self) -> str:
        """What this support must carry, in one line: up to the largest push, and the
        largest pull where one pulls down (only the pull where it never pushes up)."""
        if self.max_up.lstrip().startswith("-"):  # it only ever holds the beam down
            return f"{self.kind} at {self.at}: pulls down up to {self.max_down.lstrip('-')}"
        return (f"{self.kind} at {self.at}: up to {self.max_up}"
                + (f"; pulls down up to {self.max_down.lstrip('-')}" if self.uplift else ""))


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
    envelope: tuple[EnvelopeRow, ...] = ()  # patterned or moving loads, else empty
    uplift: tuple[str, ...] = ()  # every support some load state pulls down, in words
    failing: tuple[str, ...] = ()  # the names of the checks that fail


@dataclass(frozen=True)
class CapacityPresentation:
    """A capacity at its factor k: the checks at k, what governs and in which load state, and
    the supports the rated load pulls down."""

    title: str
    units: str
    checks: tuple[CheckRow, ...]
    governing: str  # "deflection, ratio 1.000" ("" when nothing was checked)
    governing_name: str
    governing_state: str  # the load state that governs the governing check ("" with one)
    envelope: tuple[EnvelopeRow, ...]
    uplift: tuple[str, ...]


def param_text(name: str, value: float, system: str) -> str:
    kind = PARAM_KINDS.get(name)
    return units.fmt(value, kind, system) if kind else units.num(value)


def _reactions(sol, system: str) -> tuple[ReactionRow, ...]:
    f = lambda v, k: units.fmt(v, k, system)  # noqa: E731
    return tuple(ReactionRow(r.kind, f(r.at, "length"), f(r.force, "force"),
                             f(r.moment, "moment") if r.kind == "fixed" else "", r.force < 0)
                 for r in sol.reactions)


def envelope_rows(envelope, system: str) -> tuple[EnvelopeRow, ...]:
    """The rows of a reaction envelope (`loading.Evaluation.reactions`) in the job's units."""
    f = lambda v: units.fmt(v, "force", system)  # noqa: E731
    return tuple(EnvelopeRow(r["type"], units.fmt(r["at"], "length", system), f(r["max_up"]),
                             f(r["max_down"]), r["max_down"] < 0, r.get("max_up_state", ""),
                             r.get("max_down_state", "")) for r in envelope)


def uplift_lines(rows: tuple[ReactionRow, ...] = (), env: tuple[EnvelopeRow, ...] = (),
                 words: str = "") -> tuple[str, ...]:
    """Each support that pulls the beam down, once: from the envelope where there is one
    (the largest pull over every state, and the state), else from the reactions shown."""
    if env:
        return tuple(f"{r.kind} at {r.at} pulls down up to {r.max_down.lstrip('-')}"
                     + (f" ({r.down_state})" if r.down_state else "") for r in env if r.uplift)
    return tuple(f"{r.kind} at {r.at} pulls down {r.force.lstrip('-')}"
                 + (f" ({words})" if words else "") for r in rows if r.uplift)


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
        tuple((k, param_text(k, v, system)) for k, v in c.params.items()), span_lines,
        c.detail)


def present(result: Result) -> Presentation:
    """The presentation of one result, in the job's units."""
    job, sy = result.job, result.job.units
    state = None
    if result.state_solution is not None:
        rows = _reactions(result.state_solution, sy)
        state = GoverningState(result.state_words, rows,
                               tuple(f"{r.kind} at {r.at} pulls down "
                                     f"{r.force.lstrip('-')}" for r in rows if r.uplift))
    reactions = _reactions(result.solution, sy)
    env = envelope_rows(result.reaction_envelope, sy)
    g = result.governing
    return Presentation(
        title=job.title, units=sy, note=result.shown_state,
        reactions=reactions, governing_state=state,
        checks=_check_rows(job, result.checks),
        governing=f"{g.name}, ratio {g.ratio:.3f}",
        verdict=_verdict(result),
        unchecked=tuple(f"{u.name}: {u.reason}" + (f" ({u.clause})" if u.clause else "")
                        for u in result.unchecked),
        self_checks=tuple(f"[{'pass' if d.ok else 'WARN'}] {d.name}: {d.detail}"
                          for d in result.solution.diagnostics),
        cautions=tuple(result.cautions), envelope=env,
        uplift=uplift_lines(reactions, env),
        failing=tuple(c.name for c in result.checks if not c.ok))


def _verdict(result) -> str:
    """The verdict line; a pass that leaves a limit state unchecked, on which no rating can
    rest, names it there rather than only among the cautions."""
    if not result.ok:
        return "the member FAILS this check"
    from shopbeam.design.capacity import held_besides  # noqa: PLC0415

    held = held_besides(result)
    if not result.blocking:
        return "all checks PASS" + (f", but NOT RATED for {len(held)} reason(s) that "
                                    "`shopbeam capacity` names" if held else "")
    return ("all checks PASS, but NOT CHECKED: " + "; ".join(result.blocking)
            + " (see CAUTIONS; no rating rests on this)"
            + (f"; and NOT RATED for {len(held)} more reason(s) that `shopbeam capacity` "
               "names" if held else ""))


def warnings_headline(job, before: str) -> str:
    """One line for the top of a page when the job has input warnings, naming their keys, so a
    slip in the input is read before the answer ("" when there are none)."""
    warned = [w for w in job.warnings if w.warning]
    if not warned:
        return ""
    keys = ", ".join(dict.fromkeys(w.key for w in warned))
    return (f"{len(warned)} INPUT WARNING(S) on {keys}: read them under INPUT WARNINGS below "
            f"before {before}")


def upward_note(job) -> str:
    """One line when force loads push UP with no ``uplift = true`` (a forgotten minus sign is
    the usual cause): the checks then answer for loads the shop did not mean. "" otherwise."""
    up = getattr(job, "upward", ())
    if not up:
        return ""
    return (f"BUT {len(up)} load(s) push UP with no uplift = true ({', '.join(up)}): forces "
            "are + up, a weight is negative. These checks are for the loads as typed; fix the "
            "sign, or mark a load that really pushes up uplift = true. Not rated until then.")


def _check_rows(job, checks) -> tuple[CheckRow, ...]:
    wood = getattr(job.material, "kind", "") == "lumber"
    return tuple(_check_row(c, job.units, wood) for c in checks)


def present_capacity(cap) -> CapacityPresentation:
    """The presentation of a capacity (`design.capacity.CapacityResult`) at its factor k."""
    job, sy = cap.job, cap.job.units
    g = cap.governing
    ev = cap.evaluation
    words = ev.worst.get(g.name, {}).get("words", "") if (ev is not None and g) else ""
    env = envelope_rows(ev.reactions if ev is not None else (), sy)
    return CapacityPresentation(
        title=job.title, units=sy, checks=_check_rows(job, cap.checks),
        governing=f"{g.name}, ratio {g.ratio:.3f}" if g else "",
        governing_name=g.name if g else "", governing_state=words, envelope=env,
        uplift=uplift_lines(env=env))


def design_wall(sec) -> tuple[float, float, str] | None:
    """(design wall, nominal wall, the rule in words) of a tube whose wall shopbeam set from
    its dimensions and grade (AISC 360-16 B4.2: typed in, or gauge stock), which a posted
    load rests on; None for other sections (a catalog HSS's design wall is the published
    one)."""
    d = getattr(sec, "dims", None) or {}
    src = getattr(sec, "source", "") or ""
    if "t_des" not in d or "t_nom" not in d or "design wall" not in src \
            or "computed from dimensions" not in src:
        return None
    i = src.index("design wall")
    depth, j = 0, i
    while j < len(src):  # to the "; " or ")" that closes the rule (its own brackets kept)
        ch = src[j]
        if ch == "(":
            depth += 1
        elif ch == ")":
            if depth == 0:
                break
            depth -= 1
        elif ch == ";" and depth == 0:
            break
        j += 1
    return d["t_des"], d["t_nom"], src[i:j].strip()
