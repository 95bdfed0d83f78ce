"""One job in, one answer out: solve, check, and gather the cautions.

`analyze(job)` is what the CLI report, the JSON, the rating label and the text UI all render.
"""

from __future__ import annotations

import math
import re
from dataclasses import dataclass, replace

import numpy as np

from shopbeam import units
from shopbeam.cautions import RACK_TAGS, cautions_for, normal_tag
from shopbeam.design import fatigue, loading, uplift
from shopbeam.design.basis import cb_factor, support_braces, tip_hung, unbraced_segments
from shopbeam.design.checks import (Check, Unchecked, aluminum_unchecked, basis_of, check_notes, governing,
                                    impact_of, not_checked_words, strengths, wood_load_case)
from shopbeam.design.connections import connection_notes, fixed_end_moments, hinge_shears
from shopbeam.design.lifting import profile_of
from shopbeam.design.loading import run_checks
from shopbeam.design.local import local_unchecked
from shopbeam.design.open_shapes import open_unchecked, replaces_angle_warning, torsion_note
from shopbeam.jobs.jobfile import NOT_FLOOR, VEHICLE_DECK_TAGS, VEHICLE_TAGS, Job
from shopbeam.jobs.rules import guessed_profile, rack_arm
from shopbeam.errors import InputError, UnstableBeam
from shopbeam.engine.piecewise import Piecewise
from shopbeam.engine.solver import Solution, solve, sound_solve
from shopbeam.members.sections import ANGLE_WARNING


@dataclass(frozen=True)
class Result:
    job: Job
    solution: Solution
    checks: tuple[Check, ...]
    cautions: tuple[str, ...]
    shown_state: str = ""  # which load state the reactions and diagrams show, if not the only one
    # with patterned loads: the load state that governs, for drawing (None: `solution` is it)
    state_solution: Solution | None = None
    state_words: str = ""
    # limit states the member calls for that were not checked (rating refuses on these)
    unchecked: tuple[Unchecked, ...] = ()
    # patterned or moving loads: per support the largest upward and downward reaction over
    # every load state and the state that gives each (see loading.Evaluation.reactions)
    reaction_envelope: tuple = ()
    # patterned or moving loads: the words of the load state that governs the governing
    # check ("" where it is the loads as entered)
    governing_words: str = ""

    @property
    def governing(self) -> Check:
        return governing(list(self.checks))

    @property
    def ok(self) -> bool:
        return all(c.ok for c in self.checks)

    @property
    def blocking(self) -> tuple[str, ...]:
        """The names of the limit states not checked that withhold a rating, each once."""
        return tuple(dict.fromkeys(u.name for u in self.unchecked if u.blocks_rating))


def length_formatter(system: str):
    return lambda x: units.fmt(x, "length", system)


# A storage-rack beam is designed for an impact load on top of the product load (ANSI
# MH16.1 / RMI specification: 25 % of one unit load where it does the most harm, from
# memory); the entered loads do not include it unless the job says so.
RACK_IMPACT = ("Storage-rack beams are designed for an impact load besides the product load "
               "(ANSI MH16.1: 25 % of one unit load, placed where it does the most harm; from "
               "memory); these checks do not add it: set [criteria] impact = \"25%\" "
               "(on every live load: conservative). ")
RACK_REST = ("Beam connectors, upright frames and anchors often govern a storage rack and are "
             "not checked here.")

# A cantilever-rack arm (a rack member with a free end): ANSI MH16.3 sets what the arms must
# carry, impact included (from memory; no figure is given here), and the column, its base
# and the arm connections carry it on to the floor.
ARM_IMPACT = ("Cantilever-rack arms are designed for the loads ANSI MH16.3 sets (from memory), "
              "which include an allowance for placing the load with a lift truck or crane; "
              "these checks add no impact: set [criteria] impact. ")
ARM_REST = ("The upright column of a cantilever rack, its base and anchors, the arm-to-column "
            "connection and the arm's lip or stop often govern it and are not checked here.")


# Members out of doors (signs, awnings, canopies) also take wind, and an awning or canopy
# snow and drift, by ASCE 7 and the local code; only the loads entered are checked.
_OUTDOOR = re.compile(r"\b(signs?|awnings?|canop(y|ies)|outdoors?|marquee|billboard)\b",
                      re.IGNORECASE)
OUTDOOR = ("Out of doors (a sign, awning or canopy) the member also takes wind, sideways and "
           "as uplift that reverses the bending, and an awning or canopy snow and drift (ASCE 7 "
           "and the local code): only the loads entered are checked here. Enter each case "
           "that applies (wind uplift as its own job, with uplift = true on the load).")


def is_outdoor(job) -> bool:
    """Whether the job's tags or title say it stands out of doors (a sign, awning, canopy)."""
    return any(_OUTDOOR.search(t) for t in (*job.tags, job.title))


# Stainless steel has no sharp yield point (a rounded stress-strain curve, Fy its 0.2 %
# proof stress); AISC 360-16 is written for carbon steel, and stainless members are designed
# by AISC 370-21 / AISC Design Guide 27, whose buckling rules give less (from memory).
STAINLESS = ("Stainless steel is checked here by the AISC 360-16 carbon-steel rules with its "
             "0.2 % proof stress as Fy; AISC 370-21 (stainless, from memory) governs it and "
             "gives less where the member buckles, and a stainless member sags more than E "
             "says once it is stressed past about half of Fy. Where buckling sets the bending "
             "strength the member is NOT RATED.")


def job_cautions(job: Job, sol: Solution | None = None, anchors=None) -> list[str]:
    out = cautions_for(job.tags, job.caution_lifting)
    warns = list(getattr(job.section, "warnings", ()) or ())
    if replaces_angle_warning(job):  # F10 checks the principal axes (or the job restrains it)
        warns = [w for w in warns if w != ANGLE_WARNING]
    out.extend(warns)
    if job.members > 1:
        out.append(f"Loads are shared by {job.members} identical members: each is checked for "
                   f"1/{job.members} of the entered loads. Make sure the load really divides "
                   "evenly (stiff deck, centred loads).")
    if RACK_TAGS.intersection(job.tags):
        arm = rack_arm(job.tags, job.supports, job.length)
        out.append(("" if job.criteria.impact is not None else ARM_IMPACT if arm else
                    RACK_IMPACT) + (ARM_REST if arm else RACK_REST))
    if is_outdoor(job) and uplift.pushes_up(job):  # the uplift is this job: the rest
        out.append("Out of doors the member also takes wind sideways, and an awning or canopy "
                   "snow and drift (ASCE 7 and the local code): only the loads entered are "
                   "checked here; check each other case that applies as its own job.")
    elif is_outdoor(job):
        out.append(OUTDOOR)
    if getattr(job.material, "kind", "") == "stainless":
        out.append(STAINLESS)
    if job.lifting and any(s.brace is None and s.kind in ("pin", "roller", "fixed")
                           for s in job.supports):
        out.append(HANGER_BRACE)
    if sol is not None:
        out += uplift_notes(job, sol, anchors) + live_off_uplift(job, sol)
        bad = [d.name for d in sol.diagnostics if not d.ok]
        if bad:
            out.append("A self-check did not pass (" + ", ".join(bad) + "): do not rely on "
                       "these numbers until the job is reviewed.")
    return out


# A bearing support is taken as holding the member against twist where it sits (the braced
# points of AISC 360-16 F2; common practice). A monorail hung from a single rod at each
# support, or a beam resting on a seat with nothing on its flanges, is not held so.
HANGER_BRACE = ("Each support is taken as holding the beam against twist where it sits (its "
                "braced points for lateral-torsional buckling). A beam hung from a single rod, "
                "or resting on a seat with no connection to its flanges, is not held against "
                "twist there: fit the hanger or seat to hold both flanges, or write brace = "
                "false on that support")


def uplift_notes(job: Job, sol: Solution, anchors=None) -> list[str]:
    """A support that pulls the member down (uplift): it must be anchored, not merely bear.
    `anchors`: (row, pull, state) of each support a reaction envelope says is pulled down
    (`uplift.anchors`: a live load marked uplift, over the loads as entered, the dead loads
    at 0.6 and the uplift off), named with the largest pull in place of the loads entered."""
    if anchors is not None:
        return [f"UPLIFT: the {r['type']} at {units.fmt(r['at'], 'length', job.units)} pulls "
                f"the member DOWN with up to {units.fmt(pull, 'force', job.units)}"
                + (f" ({state})" if state else "") + ": anchor it for that force (a seat or "
                "bracket that only bears lets the member lift off), and check the anchor"
                for r, pull, state in anchors if r["type"] in ("pin", "roller", "fixed", "spring")]
    top = max([abs(r.force) for r in sol.reactions] + [0.0])
    out = []
    for r in sol.reactions:
        if r.kind in ("pin", "roller", "fixed", "spring") and r.force < -1e-9 * top:
            out.append(f"UPLIFT: the {r.kind} at {units.fmt(r.at, 'length', job.units)} pulls "
                       f"the member DOWN with {units.fmt(-r.force, 'force', job.units)}: anchor "
                       "it for that force (a seat or bracket that only bears lets the member "
                       "lift off), and check the anchor")
    return out


def live_off_uplift(job: Job, sol: Solution) -> list[str]:
    """A support the dead loads alone pull down harder than the loads as entered do (the
    equipment on an overhang with the storage in the span taken off): a live load may be
    absent, so it must be anchored for that. Jobs of load states list it in their reaction
    envelope (patterns), or at the rated load (`capacity`: wheel sets)."""
    if job.moving or any(ld.patterned for ld in job.loads) \
            or not any(ld.case == "live" and ld.total_force for ld in job.loads):
        return []
    fixed = loading.load_parts(job).fixed
    if not fixed:
        return []
    # the dead loads alone: one plain solve of the same beam (no extremes looked for)
    off = solve(replace(sol.beam, loads=tuple(fixed)), candidates=False).reactions
    top = max([abs(r.force) for r in sol.reactions] + [abs(r.force) for r in off] + [0.0])
    out = []
    for r, r0 in zip(sol.reactions, off):
        if r0.kind in ("pin", "roller", "fixed", "spring") and r0.force < -1e-9 * top \
                and r0.force < r.force - 1e-9 * top:
            out.append(f"UPLIFT with the live loads off: the {r0.kind} at "
                       f"{units.fmt(r0.at, 'length', job.units)} pulls the member DOWN with "
                       f"{units.fmt(-r0.force, 'force', job.units)} under the dead loads alone "
                       "(a live load may be absent): anchor it for that force (a seat or "
                       "bracket that only bears lets the member lift off), and check the anchor")
    return out


MAX_COUPLES_WEIGHED = 4  # couples each taken off in turn to see whether they relieve


def couple_notes(job: Job, sol: Solution) -> list[str]:
    """A couple that lowers the largest bending moment the other loads make works against
    them. That is rare on purpose (an eccentric hanger or bracket adds to the moment of the
    load it carries) and common by a slipped sign (+ is counterclockwise), so it is named
    with its sense to check. Each couple is taken off in turn (one plain solve each)."""
    couples = [ld for ld in job.loads if ld.kind == "moment" and ld.value]
    if not couples or len(couples) > MAX_COUPLES_WEIGHED \
            or not any(ld.kind != "moment" and ld.total_force for ld in job.loads):
        return []
    fmt = lambda v, q: units.fmt(v, q, job.units)  # noqa: E731
    now = sol.moment.extremes(0.0, job.length).abs_max
    out = []
    for c in couples:
        rest = replace(job, loads=tuple(ld for ld in job.loads if ld is not c))
        try:
            without = sound_solve(rest.beam()).moment.extremes(0.0, job.length).abs_max
        except (UnstableBeam, InputError):
            continue
        if not now < without * 0.99:
            continue
        name = c.key + (f" ({c.label})" if c.label else "")
        sense = "counterclockwise" if c.value > 0 else "clockwise"
        out.append(f"The {c.case} couple {name}, {fmt(c.value, 'moment')} ({sense}), lowers "
                   f"the largest bending moment from {fmt(without, 'moment')} (without it) to "
                   f"{fmt(now, 'moment')}: it works against the other loads. Couples are + "
                   "counterclockwise: check its sign (an eccentric hanger or bracket adds to "
                   "the moment of the load it carries)"
                   + ("; a live couple that does hold the others back is not counted on for a "
                      "rating (capacity posts none)" if c.case == "live" else ""))
    return out


def sound_solution(job: Job) -> Solution:
    """The solve of the job's loads as entered, once it passes its self-checks (exact
    fallback included); a job whose answer fails them, or that cannot stand, is refused
    naming the file (and the supports' line). `analyze` and the commands that rate or size
    a job start from it."""
    try:
        return sound_solve(job.beam(), length_formatter(job.units), file=job.path or "")
    except UnstableBeam as e:
        raise UnstableBeam(e.args[0], file=job.path or "",
                           line=getattr(job, "supports_line", None)) from None
    except InputError as e:
        if not e.problem.file:
            e.problem.file = job.path or ""
        raise


def analyze(job: Job) -> Result:
    """Solve the job's member and run its checks. Raises UnstableBeam."""
    # the loads as entered (`entered`); `sol` is what is shown: a moving-load job shows its
    # governing state
    sol = entered = sound_solution(job)

    shown, state_sol, state_words, envelope = "", None, "", ()
    extra, moving_at, words = [], None, ""
    # one state set for every rule that reads the load states: its unit solutions, wheel
    # variants and influence data are worked out once
    ss = loading.state_set(job) if loading.needs_states(job) or fatigue.given(job) else None
    if loading.needs_states(job):
        # patterns, moving loads or impact: the checks cover every load state. The numbers
        # shown are the loads as entered, except with moving loads (the entered loads do
        # not include them): then the state that governs is shown
        ev = loading.evaluate(job, 1.0, ss=ss)
        checks = list(ev.checks)
        envelope = ev.reactions
        gov = max(checks, key=lambda c: c.ratio)
        words = ev.worst.get(gov.name, {}).get("words", "")
        npat = len(loading.segments(job.beam())) if any(ld.patterned for ld in job.loads) else 0
        if npat and not loading.read_moving(job):
            extra = [f"all {2 ** npat if npat < 64 else f'2^{npat}'} patterns of loaded and empty "
                     f"spans covered by exact envelopes ({ev.states} solved)"]
        else:
            extra = [f"{ev.states} load state{'s' if ev.states != 1 else ''} checked"]
        if impact_of(job):
            extra.append(f"checks include the {impact_of(job):.0%} impact allowance on live loads")
        if loading.read_moving(job) and ev.solution is not None:
            sol = ev.solution
            moving_at = len(extra)  # this line is written again if an uplift state governs
            extra.append(_moving_shown(job, gov.name, words))
        else:
            patterned = any(ld.patterned for ld in job.loads)
            extra.append("reactions and extremes are for the loads as entered"
                         + (" (all patterned loads on)" if patterned else ""))
            if patterned and ev.solution is not None and words:
                state_sol = ev.solution
                state_words = f"the load state that governs {gov.name}: {words}"
        shown = "; ".join(extra)
    else:
        checks = run_checks(job, sol)
    st = strengths(job)
    if fatigue.given(job):  # the fatigue limit state at the loads as entered (k = 1)
        c = fatigue.fatigue_check(job, st, ss, 1.0)
        checks = list(checks) + ([c] if c is not None else [])
    # an unbraced cantilever loaded on its top flange: the strength that loading leaves it,
    # as capacity rates it (a plain job's state set is built only where one applies)
    checks = list(checks) + top_flange_checks(job, st, ss)
    # braced on the top only: the bottom edge under hogging, where its strength is worked out
    checks += hogging_checks(job, st, ss)
    # loads on the top flange of an unbraced length between braces: the strength that
    # loading leaves it, where it is worked out
    top_got = span_top_demands(job, st, ss, 1.0, entered.moment)
    checks += span_top_rows(job, st, top_got)
    unchecked = unchecked_for(job, st) + braced_hogging(job, st, sol.moment, ss) \
        + span_top_unchecked(job, st, top_got)
    notes = connection_notes(job, sol) + member_notes(job) + cantilever_notes(job, sol, checks) \
        + braces_note(job, st, sol.moment) + couple_notes(job, entered)
    # every limit state not checked is named in the report, as on the label and in the JSON
    # (check_notes names the member's own strength ones)
    said = set(st.unchecked)
    notes += [not_checked_words(u) for u in unchecked if u not in said]
    anchors = None
    if uplift.applies(job):
        # a live load pushes up: every check again with the dead loads at 0.6 and with the
        # uplift off, the worst kept, and each support's range over the three
        envelope = envelope or uplift.rows(sol, "the loads as entered")
        states = []  # (the words its checks are marked with, its result)
        for other, state, tag in uplift.variants(job):
            got = analyze(other)
            states.append((state, got))
            checks = uplift.merge(checks, got.checks, state)
            more = [u for u in got.unchecked if u not in unchecked]
            unchecked += more
            notes += [not_checked_words(u) for u in more if u not in said]
            envelope = uplift.widen(envelope, got.reaction_envelope
                                    or uplift.rows(got.solution, ""), tag)
        notes.append(uplift.note([c.name for c in checks if uplift.STATE in c.state],
                                 [c.name for c in checks if uplift.CALM in c.state]))
        anchors = uplift.anchors(envelope)  # the UPLIFT cautions name the largest pull
        if extra:  # patterned or moving loads: the state shown as governing is the one that
            # governs after the uplift states are taken in (the governing check's own)
            top = max(checks, key=lambda c: c.ratio)
            st_words, got = next(((state, g) for state, g in reversed(states)
                                  if top.state.endswith(state)), ("", None))
            if got is not None:
                if got.governing_words:
                    st_words += "; " + got.governing_words
                if moving_at is not None:
                    sol = got.solution
                    extra[moving_at] = _moving_shown(job, top.name, st_words)
                    shown = "; ".join(extra)
                else:
                    state_sol = got.state_solution or got.solution
                    state_words = f"the load state that governs {top.name}: {st_words}"
    return Result(job, sol, tuple(checks),
                  tuple(job_cautions(job, sol, anchors) + check_notes(job, st) + notes), shown,
                  state_sol, state_words, tuple(unchecked),
                  reaction_envelope=tuple(envelope), governing_words=words)


def _moving_shown(job: Job, name: str, words: str) -> str:
    """The report's line on which state a moving-load job's numbers are for."""
    return (f"reactions, extremes and diagrams are for the state that governs {name}"
            + (f" ({words})" if words else "") + (", impact included" if impact_of(job) else ""))


def hung_by_open_ends(job: Job) -> list[tuple[float, float]]:
    """(where, the open end it is near) of each point load hung from the flange tips (a beam
    clamp or trolley wheels, `basis.tip_hung`) within a flange width of an end of an I-shape
    bent about its strong axis that no fixed support closes: the flange check under it (wheel
    flange bending) is for a flange that runs on both sides of the load."""
    sec = job.section
    bf = sec.dims.get("bf", 0.0) if sec.shape == "i-beam" and sec.axis == "strong" else 0.0
    if not bf:
        return []
    tol = 1e-6 * job.length
    built = [sp.at for sp in job.supports if sp.kind == "fixed"]
    ends = [x for x in (0.0, job.length) if not any(abs(x - f) <= tol for f in built)]
    tips = set(tip_hung(job))
    return sorted({(ld.at, x) for ld in job.loads for x in ends
                   if ld.key in tips and ld.kind == "point" and ld.value
                   and abs(ld.at - x) < bf})


def member_notes(job: Job) -> list[str]:
    """Cautions about what the member type does that the checks do not cover in numbers."""
    out = []
    near = hung_by_open_ends(job)
    if near:
        f = lambda x, q="length": units.fmt(x, q, job.units)  # noqa: E731
        bf = job.section.dims["bf"]
        out.append(f"A load hung from the flange tips at {', '.join(f(a) for a, _ in near)} is "
                   f"within a flange width ({f(bf, 'small_length')}) of the open end at "
                   f"{', '.join(dict.fromkeys(f(x) for _, x in near))}: the flange check under "
                   "it is for a flange that runs on both sides of the load, and by an open end "
                   "the flange bends about twice as much (EN 1993-6 5.7.2, from memory). The "
                   "figure posted holds only with the load at least a flange width from that end "
                   "(the label says so), or with the end closed by a plate")
    t = torsion_note(job, job.section)
    if t:
        out.append(t)
    hook = travelling_hook(job)
    if hook is not None:
        # the report checks the hoist where it was entered; capacity and the label take it
        # at every place along its travel, where its moment diagram moves with it and
        # bending is checked with Cb = 1.0: the figure posted can be under the loads that
        # pass here, and a reader comparing the two must know why
        out.append(f"The hoist ({hook.key}{' ' + repr(hook.label) if hook.label else ''}) is "
                   f"checked here at the place entered ({units.fmt(hook.at, 'length', job.units)}"
                   "); capacity and the rating label take it at every place along its travel, "
                   "with bending there checked at Cb = 1.0 (the moment diagram moves with the "
                   "hoist), so the load they post can be lower than what passes here")
    return out


def travelling_hook(job):
    """The hook load of a hoist given as a point load at its worst place, or None (none, or
    hung from a lug under the web: a fixed hoist, which does not travel)."""
    key = getattr(job, "travelling_hoist", "")
    if not key or job.moving:
        return None
    hook = next((ld for ld in job.loads if ld.key == key), None)
    if hook is None or hook.kind != "point" or key not in set(job.hung) \
            or key in set(job.lugs):
        return None
    return hook


def cantilever_notes(job: Job, sol: Solution, checks=()) -> list[str]:
    """A cantilever unbraced at its tip: Lb is its length with Cb = 1.0 (AISC 360-16 F1),
    which assumes the load at the shear centre. Loads bearing on the top flange destabilise
    it: the effective length factor for a tip free to twist is about 2.5 (`TOP_LOAD_K`: a
    root held against lateral movement and twist, as Lb = L takes it, or an overhang past a
    support; SSRC Guide / BS 5950-1 Table 14, from memory); the ratio at that length is given
    as a caution, from the same demand as the bending check (impact and load states included)
    when that check falls in the span."""
    st = strengths(job, beam=sol.beam)
    fl = st.flexure
    if fl.ltb is None or fl.stress_s is not None or job.braced or job.restrained:
        return []
    out = []
    tol = 1e-9 * job.length
    cite = "ADM 2015 F.2/F.3" if fl.ltb[0] == "ADM" else "AISC 360-16 F1"
    # a cantilever whose loads bear on its top is checked at that length (the check
    # `bending, top-flange loads`): the note is for the others (loads hung below, where it
    # says what loads on top would do)
    checked = {(x[0], x[1]) for x in cantilever_top_limits(job, st)}
    for a, b, free, _l1, _why in st.ltb_segments:
        if not free or any(x - tol <= a and b <= y + tol for x, y in checked):
            continue
        held = [s.at for s in job.supports if s.takes_force]
        root = a if any(abs(h - a) <= tol for h in held) else b
        fixed = any(s.kind == "fixed" and abs(s.at - root) <= tol for s in job.supports)
        k = TOP_LOAD_K
        mmax = sol.moment.extremes(a, b).abs_max
        for c in checks:
            if c.name == "bending" and c.at is not None and a - tol <= c.at <= b + tol:
                mmax = max(mmax, c.demand)
        now = min(fl.cap, _l1) / fl.omega
        top = min(fl.cap, fl.ltb1(k * (b - a))[0]) / fl.omega
        if mmax <= 0 or top >= now * (1 - 1e-9):
            continue  # the longer length changes nothing (a tube, a stocky section)
        ends = sum(any(abs(h - x) <= tol for h in held) for x in (a, b))
        what = (f"Cantilever {units.fmt(a, 'length', job.units)} to "
                f"{units.fmt(b, 'length', job.units)} is unbraced at its tip" if ends < 2 else
                f"Span {units.fmt(a, 'length', job.units)} to "
                f"{units.fmt(b, 'length', job.units)} is not braced against twist at its "
                "supports (springs or hangers that do not brace)")
        lo, hi = _apart_ratios(mmax / top, mmax / now)
        out.append(f"{what}: checked with "
                   f"Lb = its length and Cb = 1.0 ({cite}), loads at the shear centre. "
                   f"If the loads bear on the top flange (destabilising), the effective length "
                   f"is about {k:g} x L ("
                   + ("built-in root held against lateral movement and twist" if fixed else
                      "root over a support")
                   + ", SSRC Guide / BS 5950-1 Table 14, from memory): bending ratio "
                   f"{lo} instead of {hi}. "
                   + ("Brace the tip (beam.braces)" if ends < 2 else
                      "Brace it at its supports (brace = true where they hold both flanges)")
                   + " or hang the load below the shear centre.")
    return out


def _apart_ratios(a: float, b: float) -> tuple[str, str]:
    """Two ratios shown with enough digits to differ ("0.193 instead of 0.188", not "0.19
    instead of 0.19")."""
    for d in range(2, 6):
        x, y = f"{a:.{d}f}", f"{b:.{d}f}"
        if x != y:
            return x, y
    return x, y


def unchecked_for(job: Job, st=None) -> list[Unchecked]:
    """Limit states the member calls for that shopbeam does not check (see `Unchecked`), for
    the section of `st` (its strengths; default the job's own)."""
    st = st or strengths(job)
    sec = st.section
    return list(st.unchecked) + local_unchecked(job, sec) + open_unchecked(job, st) + \
        aluminum_unchecked(job, sec) + floor_unchecked(job) + open_top_unchecked(job, st) \
        + material_unchecked(job, st) + twist_unchecked(job, st) + use_unchecked(job)


NO_AXIAL = "no-axial"  # the tag that says a lifting member's rigging puts no thrust in it
# Words that say something does push a lifting member endwise, against the tag no-axial
_THRUST_WORDS = re.compile(
    r"\b(tie[- ]?(?:rods?|bars?)|tension rods?|rod braces?|knee[- ]?brac\w*|kickers?|"
    r"diagonal (?:brace|tie|rod|strut|sling)s?|guy(?:ed|s| wires?| ropes?)?|braced boom|"
    r"(?:two|2|three|3|four|4)[- ]leg\w*(?: slings?| bridles?)? to (?:one|a single|the) "
    r"(?:crane )?hook|bridles?|"
    r"(?:to|on|from) (?:one|a single) (?:crane )?hook|"
    r"(?:sloped|angled|inclined|leaning) slings?|slings? at (?!90)\d+)(?![\w])",
    re.IGNORECASE)
FATIGUE_CHECKED = "fatigue-checked"  # the tag that says fatigue was checked elsewhere


# Fewer load cycles than this on a road member is a count slipped (a trailer member sees
# millions of bumps in its life: 2,000,000 is the usual design figure, 500,000 a light-duty
# one, common practice; "200000" is a zero dropped)
ROAD_CYCLES = 500_000


def use_unchecked(job: Job) -> list[Unchecked]:
    """Limit states the member's use calls for that shopbeam does not check, each blocking
    the rating until the job says it does not arise (a tag):
    - a below-the-hook beam hung from two or more sling points, or a jib boom held by a tie
      rod or knee brace (held at two places): sloped slings and ties push the member
      endwise, and bending with that thrust is checked together (ASME BTH-1 3-2.2 and 3-2.5,
      AISC 360-16 E3 and H1-1, from memory); shopbeam has no axial force;
    - a member of a road vehicle or mobile machine: every bump is a load cycle, and welds
      and holes crack under a stress range far below the static strength (AISC 360-16
      Appendix 3, fatigue, from memory); shopbeam checks static strength only."""
    out = []
    prof = getattr(job.criteria, "lifting", "") or ""
    if job.lifting and NO_AXIAL not in job.tags:
        tol = 1e-9 * job.length
        held = {round(s.at / tol) for s in job.supports if s.takes_force}  # places held
        name = prof or guessed_profile(job.supports, job.length)
        if name == "below-the-hook" and len(held) >= 2:
            out.append(Unchecked(
                "axial compression from sloped slings",
                "the beam hangs from slings at two or more places: slings that lean in to one "
                "hook push the beam endwise, and bending with that thrust is not checked here "
                "(it lowers what the beam may carry). Have it "
                "checked as a beam-column, or add the tag \"no-axial\" if the slings hang "
                "plumb (two hooks, or a spreader above)",
                "ASME BTH-1 3-2.2 and 3-2.5; AISC 360-16 E3, H1-1"))
        elif len(held) >= 2 and (name in ("jib-boom", "hand-geared-jib") or (
                not prof and re.search(r"\bjibs?\b|jib[- ]?(?:crane|boom|arm)",
                                       " ".join([job.title, job.notes, *job.tags]),
                                       re.IGNORECASE))):
            out.append(Unchecked(
                "axial compression from a tie rod or knee brace",
                "the boom is held at two places: a tie rod or knee brace pushes it endwise "
                "toward the mast, and bending with that thrust is not checked here. Have it "
                "checked as a beam-column, or add the tag \"no-axial\" if nothing pushes it "
                "endwise",
                "AISC 360-16 E3, H1-1"))
    if job.lifting and NO_AXIAL in job.tags:
        said = _THRUST_WORDS.search(" | ".join(
            [job.title or "", job.notes or "", *(getattr(x, "label", "") or ""
                                                 for x in (*job.supports, *job.loads))]))
        if said:
            out.append(Unchecked(
                "axial compression (the tag no-axial contradicted)",
                f"the tag \"no-axial\" says nothing pushes the member endwise, but the job "
                f"says {said.group(0)!r}: a tie rod puts a boom in compression and a knee "
                "brace puts it in tension, slings that lean in to one hook push a beam "
                "endwise, and bending with that axial force is not checked here. Have it "
                "checked as a beam-column; if the words do not describe this member (slings "
                "that hang plumb), reword them",
                "ASME BTH-1 3-2.2 and 3-2.5; AISC 360-16 E3, H1-1"))
    road = getattr(job, "vehicle", "")
    parked = job.criteria.impact == 0 and not job.lifting  # loaded only while parked
    kind = getattr(job.material, "kind", "")
    steel = kind in ("steel", "stainless")
    on_road = bool(road) and FATIGUE_CHECKED not in job.tags and not parked
    if on_road and steel and not fatigue.given(job):
        out.append(Unchecked(
            "fatigue under road loads",
            f"it reads like a member of a road vehicle or mobile machine ({road}): every bump "
            "is a load cycle, and welds, holes and attachments crack under a stress range far "
            "below the static strength checked here. Give the detail's stress category "
            "and the number of load cycles under [criteria] (fatigue_category = \"E\" for a "
            "fillet-welded attachment, cycles = 2000000, AISC 360-16 Table A-3.1) to have "
            "it checked; or add the tag \"fatigue-checked\" once it has been checked "
            "elsewhere, or \"not-vehicle\" if it is not on a vehicle",
            "AISC 360-16 Appendix 3"))
    elif on_road and steel and job.criteria.cycles < ROAD_CYCLES:
        # the count given switches the check off, but a road member's bumps run to
        # millions: "2000" for 2000000 is three zeros dropped, and the rating would rest on
        # no fatigue check at all
        out.append(Unchecked(
            "fatigue under road loads",
            f"it reads like a member of a road vehicle or mobile machine ({road}), where every "
            f"bump is a load cycle and a trailer or truck member sees millions, but cycles = "
            f"{job.criteria.cycles:,.0f} is under {ROAD_CYCLES:,} (under "
            f"{fatigue.FEW_CYCLES:,} no fatigue check is made at all): check the count "
            "(cycles = 2000000 for a road member's life, a digit or zeros dropped?); or add "
            "the tag "
            "\"fatigue-checked\" once it has been checked elsewhere, or \"not-vehicle\" if it "
            "is not on a vehicle",
            "AISC 360-16 Appendix 3.1"))
    elif on_road and not steel:
        # shopbeam's fatigue check is for steel (AISC 360-16 Appendix 3); a wood or aluminium
        # member on a vehicle has its own rules, which are not applied here
        rules = ("NDS 2018 has no fatigue rule: its bolted or nailed connections loosen and "
                 "split under repeated loads (NDS 2018 chapters 11 and 12, from memory)"
                 if kind == "lumber" else
                 "aluminium has no endurance limit and its welds crack at low stress ranges "
                 "(ADM 2015 Appendix 3, from memory)" if kind == "aluminum" else
                 "shopbeam has no fatigue rule for this material")
        out.append(Unchecked(
            "fatigue under road loads",
            f"it reads like a member of a road vehicle or mobile machine ({road}): every bump "
            f"is a load cycle, and {rules}. Have its fatigue and connections checked for the "
            "road duty and add the tag \"fatigue-checked\" once they have been, or "
            "\"not-vehicle\" if it is not on a vehicle (the fatigue_category keys are for "
            "steel details only)",
            "ADM 2015 Appendix 3" if kind == "aluminum" else
            "NDS 2018 chapters 11, 12" if kind == "lumber" else "fatigue"))
    return out


def material_unchecked(job: Job, st) -> list[Unchecked]:
    """Limit states a typed-in material leaves unchecked for want of a value: bearing
    perpendicular to grain of a lumber member with no fc_perp (NDS 2018 3.10), tensile rupture
    of an aluminium one with no fu (ADM 2015 F.1), and the heat-affected zone of a welded
    aluminium one with no fy_welded (ADM 2015 Table A.3.3/A.3.4). Each blocks the rating: the
    check it stands for can govern (bearing governs a short DF-L 2x12 under a point load)."""
    mat = job.material
    kind = getattr(mat, "kind", "")
    out = []
    wf = getattr(st.flexure, "wood", None)
    if wf is not None and wf.flat and wf.values.size_class == "lvl":
        # LVL laid flat (plank orientation): the makers publish separate, lower flatwise
        # values (Fv and Fc_perp well below the edgewise ones, from memory); the built-in
        # values are edgewise
        out.append(Unchecked(
            "LVL strength used flat (plank orientation)",
            "the built-in LVL values are for the member on edge; laid flat its makers publish "
            "their own, lower flatwise (plank) Fb, Fv and Fc_perp, which shopbeam does not "
            "have, and the edgewise ones were used. Give the maker's flatwise values as an "
            "inline lumber material ([beam.material] kind = \"lumber\" with e, fb, fv, "
            "fc_perp and density), or set the LVL on edge",
            "LVL makers' published design values (flatwise), from memory"))
    if kind == "lumber" and wf is not None and not wf.values.fc_perp:
        at = [f"supports[{i}] ({s.kind})" for i, s in enumerate(job.supports)
              if s.kind in ("pin", "roller", "spring")]
        at += [ld.key for ld in job.loads if ld.kind == "point" and ld.total_force]
        if at:
            out.append(Unchecked(
                "bearing perpendicular to grain",
                "the typed-in lumber material gives no fc_perp, so bearing at "
                + ", ".join(at[:4]) + (", ..." if len(at) > 4 else "")
                + " is not checked, and it can govern a short deep member (DF-L No.2: Fc_perp "
                "625 psi, NDS Supplement 2018 Table 4A, from memory). Give fc_perp under "
                "[beam.material], or use a built-in grade such as \"DF-L-2\"",
                "NDS 2018 3.10.2"))
    if kind == "lumber" and wf is not None and wf.values.fc_perp:
        for ws in getattr(job, "moving", ()):
            if ws.bearing is None:
                out.append(Unchecked(
                    "bearing under the wheels, perpendicular to grain",
                    f"the wheels of {ws.label!r} bear on the wood over their own contact, "
                    "often well under an inch along a caster's tread, not on the seats' "
                    "bearing length, and no contact length is given, so their crushing "
                    "across the grain is not checked (it can govern: Fc_perp 625 psi for "
                    "DF-L No.2, NDS Supplement 2018 Table 4A, from memory). Give each "
                    "wheel's contact length along the member as bearing = \"...\" in "
                    "[[moving]] (a plate under the track: its length), and put the tread "
                    "on the member's full breadth or have the bearing checked",
                    "NDS 2018 3.10.2, 3.10.4"))
    if kind == "aluminum" and basis_of(job) == "aluminum":
        if not getattr(mat, "fu", None):
            out.append(Unchecked(
                "tensile rupture",
                "the typed-in aluminium gives no fu (Ftu), so rupture in bending (Z Ftu / kt "
                "over Omega 1.95) is not checked; it governs unwelded 6061-T6 (Ftu 38 ksi) by "
                "about 8 %. Give fu under [beam.material] (6061-T6 38 ksi, 6063-T6 30 ksi: "
                "ADM 2015 Table A.3.3, from memory)", "ADM 2015 F.1"))
        if job.welded and not getattr(mat, "fy_welded", None):
            out.append(Unchecked(
                "welded (heat-affected zone) strength",
                "welded = true, but the typed-in aluminium gives no fy_welded: welding "
                "anneals the metal near the weld to well under half the temper's yield "
                "(6061-T6 Fty 35 ksi, welded Ftyw 15 ksi; 6063-T6 25 and 8 ksi: ADM 2015 "
                "Table A.3.3/A.3.4, from memory), and the checks used the unwelded fy. Give "
                "fy_welded under [beam.material], or remove welded = true if no weld is within "
                "1 in of the highly stressed parts", "ADM 2015 Table A.3.3, A.3.4"))
        elif job.welded and getattr(mat, "fu", None) and not getattr(mat, "fu_welded", None):
            out.append(Unchecked(
                "welded (heat-affected zone) rupture",
                "welded = true, but the typed-in aluminium gives no fu_welded (Ftuw), so "
                "rupture in bending near the weld (Z Ftuw / kt over Omega 1.95) was checked on "
                "the unwelded fu, which welding lowers (6061-T6 Ftu 38 ksi, welded Ftuw 24 "
                "ksi: ADM 2015 Table A.3.3, from memory). Give fu_welded under "
                "[beam.material]", "ADM 2015 F.1, Table A.3.3"))
    return out


def twist_unchecked(job: Job, st) -> list[Unchecked]:
    """A span with its ends not held against twist. The lateral-torsional buckling
    strength (AISC 360-16 F2, the NDS 3.3.3 beam stability factor, ADM F.2) assumes each
    unbraced length ends where the section is held against twist; a support does that unless
    brace = false, a spring only with brace = true (design.basis.BRACE_BY_DEFAULT). shopbeam
    checks an unbraced length with one end not held as a cantilever from a built-in root
    (Cb 1.0): that is what it is only where the held end is a fixed support. Between supports
    with no end held against twist (both brace = false, two springs), or with one end held at
    a pin, roller or brace point, nothing stops the member rolling over at the end that is not
    held (AISC 360-16 Appendix 6.3 / F1: torsional restraint at the supports, common practice),
    so no rating rests on it: listed, blocking."""
    fl = _rating_flexure(st)
    wf = getattr(st.flexure, "wood", None)
    # sawn lumber deeper than twice its breadth needs its ends held in position against
    # rotation (NDS 2018 4.4.1.2(b) and beyond, from memory); up to d/b = 2 it needs none (a)
    wood = wf is not None and not wf.flat and wf.d > 2 * wf.b
    if (fl is None and not wood) or job.braced or job.restrained:
        return []
    tol = 1e-9 * job.length
    loose = {s.at: i for i, s in enumerate(job.supports) if s.takes_force}
    fixed = {s.at for s in job.supports if s.kind == "fixed"}
    held = set(support_braces(job, job.supports))
    out = []
    for a, b, free, _l1, _why in st.ltb_segments:
        if not free:
            continue
        ends = [x for x in (a, b) if x <= tol or x >= job.length - tol]
        # the free end of this length: a member end with no brace
        open_ends = [x for x in ends if not any(abs(x - h) <= tol for h in held)
                     and not any(abs(x - p) <= tol for p in job.braces)]
        at_support = [x for x in open_ends if any(abs(x - y) <= tol for y in loose)]
        if not at_support:
            continue  # a real free tip: a cantilever or an overhang, checked as such
        other = [x for x in (a, b) if x not in open_ends]
        if other and any(abs(other[0] - f) <= tol for f in fixed) and \
                any(abs(other[0] - h) <= tol for h in held):
            continue  # a built-in root held against twist: a propped cantilever, as checked
        f = lambda x: units.fmt(x, "length", job.units)  # noqa: E731
        names = []
        for x in at_support:
            i = next(i for y, i in loose.items() if abs(x - y) <= tol)
            sup = job.supports[i]
            why = ("brace = false" if sup.brace is False else
                   f"a {sup.kind} does not brace unless brace = true")
            names.append(f"supports[{i}] ({sup.kind} at {f(sup.at)}, {why})")
        what = ("neither end is held against twist" if not other else
                f"only the end at {f(other[0])} is held against twist, and it is not a fixed "
                "support: the span was checked as a cantilever from a built-in root (Cb 1.0), "
                "which it is not")
        out.append(Unchecked(
            "torsional restraint at the supports",
            f"the span {f(a)} to {f(b)} sits on " + ", ".join(names) + f": {what}. "
            "Lateral-torsional buckling strength assumes the member is held against twist "
            "where it is supported (a joist's ends blocked or nailed); without it the member can roll over at the support, and "
            "no rating rests on that. Give brace = true on each support whose connection "
            "holds the member against twist (an end plate, clip angles, stiffeners or blocking "
            "to the flanges), brace the member there (beam.braces), or write restrained = true "
            "if it is held against twist all along",
            "NDS 2018 3.3.3 and 4.4.1.2 (ends held in position, from memory)" if wood else
            "AISC 360-16 F1 and Appendix 6.3 (torsional restraint at supports, common "
            "practice)"))
    return out


def _rating_flexure(st):
    """The flexure whose lateral-torsional buckling a rating rests on, or None where the
    member has none to lose (no LTB rule, or a stress basis that checks first yield)."""
    fl = st.flexure
    return None if fl.ltb is None or fl.stress_s is not None else fl


# Effective length of a cantilever unbraced at its tip with the load on its top flange, which
# destabilises it: 2.5 L where the root holds the member against lateral movement and twist,
# the root the bending check's Lb = L (Cb 1.0) takes, and for an overhang past a support (SSRC
# Guide / BS 5950-1 Table 14, from memory). 1.4 L needs a root that also stops the member
# turning on plan, which an arm or bracket on an upright that can twist does not give, and
# nothing in a job says it is so; see cantilever_notes.
TOP_LOAD_K = 2.5


def top_brace_only(job: Job) -> bool:
    """Brace points said to hold the top flange only (`braces_flange = "top"`)."""
    return bool(job.braces) and getattr(job, "braces_flange", None) == "top"


def top_load_segments(job: Job, beam=None) -> list[tuple[float, float, bool]]:
    """(start, end, free end?) of the unbraced lengths as a cantilever loaded on its top sees
    them: brace points on the top flange only (`top_brace_only`) do not count. A cantilever's
    top flange is its tension flange; a brace there, at the tip or along the arm, leaves the
    bottom flange free to swing, and with the load on top the effective length stays about
    2.5 L, as for a free tip (SSRC Guide / BS 5950-1 Table 14, tip laterally restrained on
    the top flange only, destabilising load; from memory)."""
    return unbraced_segments(replace(job, braces=()) if top_brace_only(job) else job,
                             beam if beam is not None else job)


def tip_brace_words(job: Job) -> str:
    """What to brace a cantilever loaded on its top with, in words (lower case)."""
    return ("brace both flanges at the tip (braces_flange = \"both\": a kicker to the bottom "
            "flange; a brace on the top flange only does not hold it)" if top_brace_only(job)
            else "brace the tip (beam.braces)")


def _top_load_lengths(job: Job, st) -> list[tuple[float, float, bool, float]]:
    """(start, end, free end?, ltb1 at Cb = 1 over it) for `cantilever_top_limits`: the
    bending check's own lengths, or `top_load_segments` where braces hold the top only."""
    if not top_brace_only(job):
        return [(a, b, free, l1) for a, b, free, l1, _why in st.ltb_segments]
    fl = st.flexure
    out = []
    for a, b, free in top_load_segments(job):
        case = wood_load_case(job, a, b, free) if fl.ltb[0] == "NDS" else "any"
        out.append((a, b, free, fl.ltb1(b - a, case, job.units)[0]))
    return out


def cantilever_top_limits(job: Job, st) -> list[tuple[float, float, float, float, float]]:
    """(start, end, effective length factor, strength checked, strength with the loads on
    top) of each unbraced cantilever whose top-flange loading would lower its bending
    strength (both strengths are Mn / Omega). A cantilever braced on its top flange only
    counts as unbraced (`top_load_segments`)."""
    fl = _rating_flexure(st)
    if fl is None or job.braced or job.restrained:
        return []
    hung = set(getattr(job, "hung", ()) or ())
    out = []
    for a, b, free, l1 in _top_load_lengths(job, st):
        if not free:
            continue
        on = loads_on(job, a, b)
        if on and all(ld.key in hung for ld in on):
            continue  # every load hangs below the shear centre: not destabilising
        k = TOP_LOAD_K  # a built-in root or a support alike (see TOP_LOAD_K)
        now = min(fl.cap, l1)
        top = min(fl.cap, fl.ltb1(k * (b - a))[0])
        if top < now * (1 - 1e-9):
            out.append((a, b, k, now / fl.omega, top / fl.omega))
    return out


def all_on_moment(ss, k: float) -> Piecewise:
    """The moment with every live load on at the factor k (patterned spans too)."""
    kk = k * (1 + ss.parts.impact)
    co = ss.fixed.moment.coeffs + kk * ss.live.moment.coeffs
    for sp in ss.spans:
        co = co + kk * sp.moment.coeffs
    return Piecewise(ss.fixed.moment.breaks, co)


def cantilever_top_demands(job, st, limits, ss, k: float) -> list[tuple]:
    """(start, end, effective length factor, strength as checked, top-flange strength,
    moment, at, travelling) of each unbraced cantilever of `limits` at the factor k. The
    moment in a cantilever or overhang comes from the loads on it alone, so every load on at
    the factor (patterned spans too) gives its largest; [[moving]] wheels on it are taken at
    every position of the set (`analysis.moment_ranges`)."""
    m = all_on_moment(ss, k)
    rolls = [(a, b) for a, b, *_ in limits if wheels_count_on_top(job, a, b)]
    ranges = moment_ranges(job, st, ss, k, rolls)[0] if rolls else {}
    out = []
    for a, b, kl, now, top in limits:
        if (a, b) in ranges:
            lo, hi = ranges[a, b][0], ranges[a, b][2]
            demand, at = max(abs(lo), abs(hi)), None
        else:
            ex = m.extremes(a, b)
            demand = ex.abs_max
            at = ex.max_at if abs(ex.max) >= abs(ex.min) else ex.min_at
        out.append((a, b, kl, now, top, demand, at, (a, b) in ranges))
    return out


def open_top_unchecked(job: Job, st) -> list[Unchecked]:
    """An unbraced tee or angle cantilever with its stem or leg up and loads bearing on its
    top: F9 and F10 take the load at the shear centre, and one on the stem's tip, well above
    it, destabilises the member, but no strength at the longer effective length (about 2.5 L,
    `TOP_LOAD_K`) is worked out for these shapes, so no rating rests on it (blocking)."""
    sec = st.section if getattr(st, "section", None) is not None else job.section
    if sec.shape not in ("tee", "angle") or job.braced or job.restrained:
        return []
    if not sec.sx_top < sec.sx_bot:
        return []  # the flange (or the heel) on top: the load sits by the shear centre
    out = []
    for a, b, free in top_load_segments(job):
        if free and loaded_on_top(job, a, b):
            f = lambda x: units.fmt(x, "length", job.units)  # noqa: E731
            out.append(Unchecked(
                "lateral-torsional buckling of a cantilever loaded on its top",
                f"the {sec.shape} cantilever {f(a)} to {f(b)} is unbraced at its tip and its "
                "loads bear on its top, which destabilises it (effective length about "
                f"{TOP_LOAD_K:g} x L); the {sec.shape}'s bending rule takes the load at the "
                "shear centre and its strength at that length is not worked out here, so no "
                "rating is posted. " + tip_brace_words(job).capitalize() + ", hang the load "
                "below, or have it checked",
                "AISC 360-16 " + ("F9" if sec.shape == "tee" else "F10")
                + "; SSRC Guide / BS 5950-1 Table 14 (from memory)", blocks_rating=True))
    return out


def travel_words(job: Job, ss) -> str:
    """" (the worst position of <set> over its travel[, either way round])"."""
    return (f" (the worst position of {job.moving[0].label or 'the wheel set'} over its travel"
            f"{loading.variant_words(job, ss)})")


TOP_FLANGE_CHECK = "bending, top-flange loads"  # an unbraced cantilever's top-flange loads


# the lateral-torsional buckling rule each flexure's figure comes from (Flexure.ltb[0])
_LTB_RULES = {"F2": ("AISC 360-16 F2", "AISC 360-16"), "F4": ("AISC 360-16 F4", "AISC 360-16"),
              "F7": ("AISC 360-16 F7.4", "AISC 360-16"),
              "F11": ("AISC 360-16 F11.2", "AISC 360-16"),
              "ADM": ("ADM 2015 F.2", "Aluminum Design Manual 2015 (from memory)"),
              "NDS": ("NDS 2018 3.3.3", "NDS 2018 (from memory)")}


def top_flange_check(job: Job, ss, g, travel_words: str = "", st=None) -> Check:
    """The check of an unbraced cantilever whose loads bear on its top flange, from one entry
    `g` of `cantilever_top_demands`: its moment against the strength that loading leaves it
    (the section's own lateral-torsional buckling rule at about 2.5 L, `TOP_LOAD_K`)."""
    a, b, kl, now, top, demand, at, rolled = g
    f = lambda x, q="length": units.fmt(x, q, job.units)  # noqa: E731
    ltb = getattr(getattr(st, "flexure", None), "ltb", None)
    rule, src = _LTB_RULES.get(ltb[0] if ltb else "F2", _LTB_RULES["F2"])
    if ltb and ltb[0] == "ADM" and ltb[1][5] != "open":
        rule = "ADM 2015 F.3"  # a closed shape (a tube): its own rule, as the bending check
    return Check(TOP_FLANGE_CHECK, demand, top, "N*m",
                 f"{rule} (Cb 1.0) with the effective length of a cantilever "
                 f"loaded on its top flange, about {kl:g} x L over {f(a)} to {f(b)} (SSRC "
                 f"Guide / BS 5950-1 Table 14, from memory): M <= {f(top, 'moment')}, "
                 f"against {f(now, 'moment')} with the loads at the shear centre"
                 + (travel_words if rolled else ""),
                 at, detail="the loads bear on the top flange of the unbraced cantilever, "
                 "which destabilises it; " + tip_brace_words(job) + " or hang a point load "
                 "below the flange (flange = \"bottom\") to rate it on the bending check",
                 clause=f"{rule}; effective length for top-flange loading",
                 source=f"{src}; SSRC Guide / BS 5950-1 Table 14 (from memory)",
                 params={"k_eff": kl, "Mn_omega": top, "Mn_omega_shear_centre": now})


def top_flange_checks(job: Job, st, ss) -> list[Check]:
    """`top_flange_check` of every unbraced cantilever whose top-flange loading lowers its
    strength, at the loads as entered (k = 1: every live load on, the impact allowance in)."""
    limits = cantilever_top_limits(job, st)
    if not limits:
        return []
    ss = ss or loading.state_set(job)
    words = travel_words(job, ss) if job.moving else ""
    return [top_flange_check(job, ss, g, words, st)
            for g in cantilever_top_demands(job, st, limits, ss, 1.0)]


def loaded_on_top(job: Job, a: float, b: float) -> bool:
    """Whether a load of the job bears on a..b and not every one there hangs below (a load
    hung from the bottom flange or a lug does not destabilise the length)."""
    on = loads_on(job, a, b)
    hung = set(getattr(job, "hung", ()) or ())
    return bool(on) and not all(ld.key in hung for ld in on)


def loads_on(job: Job, a: float, b: float) -> list:
    """The loads of the job (not couples) that bear on a..b."""
    tol = 1e-9 * job.length
    return [ld for ld in job.loads if ld.kind != "moment" and ld.total_force
            and (a - tol < ld.at < b + tol if ld.kind == "point"
                 else min(b, ld.end) - max(a, ld.start) > tol)]


def wheels_count_on_top(job: Job, a: float, b: float) -> bool:
    """Whether the moment of the [[moving]] wheels counts in the top-flange rule of the
    unbraced cantilever a..b: they roll on its top flange (`rolling_on_top`), or a load of
    the job bears on its top there (the wheels' moment then adds to what it destabilises)."""
    if not job.moving:
        return False
    hung = set(getattr(job, "hung", ()) or ())
    return _rolls_through(job, a, b) or any(ld.key not in hung for ld in loads_on(job, a, b))


# A load bearing on the top flange at a point not braced destabilises the member: AISC
# 360-16 Commentary F1 (from memory) scales Cb by 1.4^(2y/ho), y = -ho/2 for the top flange,
# that is by 1/1.4. Eq. F1-1's Cb, which the bending check uses, is for loads at the shear
# centre.
TOP_FLANGE_CB = 1 / 1.4


# Limit states not checked whose rule `capacity` judges at the rated load itself: blocking in a
# solve only where the loads as entered already pass them; a rating takes capacity's word.
TOP_FLANGE_LTB = "lateral-torsional buckling with the loads on the top flange"
HOGGING_LTB = "lateral-torsional buckling of the bottom flange under hogging moment"
JUDGED_AT_RATED_LOAD = frozenset({TOP_FLANGE_LTB, HOGGING_LTB})


def span_top_limits(job: Job, st) -> list[tuple[float, float, float]]:
    """(start, end, LTB strength at Cb = 1) of each unbraced length between brace points
    (not a cantilever: see `cantilever_top_limits`) that carries a load on its top flange at
    a point not braced: a point load or spread load not hung from the bottom flange."""
    fl = _rating_flexure(st)
    # F2 I-shapes and channels (F4 with a noncompact web), and F11 bars on edge (their LTB
    # strength is Cb times the Cb = 1 figure as F2's: the same 1/1.4 for a load on the top
    # edge, from memory)
    if fl is None or fl.ltb[0] not in ("F2", "F4", "F11") or not fl.uses_cb or job.braced \
            or job.restrained:
        return []
    tol = 1e-9 * job.length
    hung = set(getattr(job, "hung", ()) or ())
    held = set(job.braces) | set(support_braces(job, job.supports))
    out = []
    for a, b, free, l1, _why in st.ltb_segments:
        if free or not math.isfinite(l1):
            continue
        on = [ld for ld in job.loads if ld.kind != "moment" and ld.total_force
              and ld.key not in hung
              and (a + tol < ld.at < b - tol and not any(abs(ld.at - h) <= tol for h in held)
                   if ld.kind == "point" else min(b, ld.end) - max(a, ld.start) > tol)]
        if on or _rolls_through(job, a, b):
            out.append((a, b, l1))
    return out


def rolling_on_top(job: Job) -> bool:
    """A `[[moving]]` set on a job that is not a lifting device: its wheels are taken as
    rolling on the top flange (a cart on a platform or track beam); a lifting job's trolley
    hangs from the bottom flange."""
    return bool(job.moving) and not (job.lifting or getattr(job.criteria, "lifting", ""))


def _rolls_through(job: Job, a: float, b: float) -> bool:
    """Whether the wheels rolling on the top flange can stand inside a..b."""
    if not rolling_on_top(job):
        return False
    t0, t1 = job.moving[0].travel
    return min(b, t1) - max(a, t0) > 1e-9 * job.length


# Wheel positions judged for the top-flange rule of a rolling set: every 1/MOVING_TOP_STEPS of
# the travel, with the positions where the exact envelopes peak
MOVING_TOP_STEPS = 200
# `moving_top_worst`'s answer for a patterned job: not judged (2^n patterns x the positions)
NOT_JUDGED = "patterned"


def moving_top_worst(job: Job, st, ss, k: float, limits):
    """`_moving_top_worst` of the wheel set in each of its variants (`loading.
    wheel_variants`: as entered, turned round, empty), the worst for each length, with the
    job (the variant) it holds for: (demand, top strength, Cb x 1/1.4, first-wheel position,
    job)."""
    if ss.parts.patterned:
        return NOT_JUDGED
    out = {}
    for jb, s2 in loading.wheel_variants(job, ss):
        for key, got in _moving_top_worst(jb, st, s2, k, limits).items():
            best = out.get(key)
            if best is None or got[0] / got[1] > best[0] / best[1]:
                out[key] = got + (jb,)
    return out


def _moving_top_worst(job: Job, st, ss, k: float, limits):
    """For each unbraced length (a, b, l1) of `limits` the wheels can stand in: (demand, top
    strength, Cb x 1/1.4, first-wheel position) where the moment over a..b stands highest
    against the strength left by wheels rolling on the top flange, over the wheel positions
    with a wheel inside a..b (every position where static loads bear on the top flange there
    too). Each position's Cb is eq. F1-1 of that position's own moment diagram x 1/1.4; the
    positions are every 1/MOVING_TOP_STEPS of the travel plus those where the exact envelopes
    peak (the ratio is continuous in the position, so a step of travel / 200 misses at most
    a sliver of it). A length no position puts a wheel in (or whose wheels carry nothing at
    k) is left out. Not for a patterned job (`moving_top_worst` answers NOT_JUDGED: each
    pattern would need the whole sweep)."""
    from shopbeam.engine.model import Load
    from shopbeam.engine.solver import solve_each

    fl = st.flexure
    mv = ss.parts.moving[0]
    kk = k * (1 + ss.parts.impact)
    forces = [d + kk * f for f, d in zip(mv.live, mv.dead)]
    if not any(forces):
        return {}
    lo, hi = mv.p_range
    tol = 1e-9 * job.length
    static = set((round(x / tol), round(y / tol))
                 for x, y, _ in span_top_limits(replace(job, moving=()), st))
    grid = set(np.linspace(lo, hi, MOVING_TOP_STEPS + 1).tolist()) if hi > lo else {lo}
    loads = ss.static_loads(k, ())
    env = loading.moving_envelope(job, ss, loads, k, st, pattern=())
    pos = sorted(grid | {float(p) for p in env.positions})
    asked = {}
    for a, b, l1 in limits:
        on = (round(a / tol), round(b / tol)) in static
        mine = [p for p in pos if on or any(a + tol < p + s < b - tol for s in mv.offsets)]
        if mine:
            asked[(a, b, l1)] = set(mine)
    if not asked:
        return {}
    need = sorted(set().union(*asked.values()))
    beams = [replace(ss.beam, loads=tuple(loads) + tuple(
        Load("point", at=p + s, value=f, label=mv.label, key=mv.key)
        for s, f in zip(mv.offsets, forces))) for p in need]
    out = {}
    for p, sol in zip(need, solve_each(beams)):
        for (a, b, l1), ps in asked.items():
            if p not in ps:
                continue
            top, cb, m = span_top_strength(fl, l1, sol.moment, a, b)
            best = out.get((a, b))
            if top > 0 and (best is None or m / top > best[0] / best[1]):
                out[(a, b)] = (m, top, cb, float(p))
    return out


def rolling_where(job: Job, p: float) -> str:
    """" with the first wheel of <set> at <p> (...)": where a wheel set's top-flange rule is
    worst, in words."""
    return (f" with the first wheel of {job.moving[0].label or 'the set'} at "
            f"{units.fmt(p, 'length', job.units)} " + (
                "(the wheels of [[moving]] on a job not tagged lifting are taken as rolling "
                "on the top flange)" if rolling_on_top(job) else
                "(its wheels hang from the bottom flange; their moment adds to that of the "
                "loads on the top flange)"))


def wheels_with_top_words(job: Job) -> str:
    """Why a wheel set's positions enter the top-flange rule of an unbraced length, in words."""
    return ("the wheels of [[moving]] on a job not tagged lifting roll on the top flange" if
            rolling_on_top(job) else "loads bear on the top flange and the moment of the "
            "[[moving]] trolley adds to theirs")


def span_top_strength(fl, l1: float, moment, a: float, b: float
                      ) -> tuple[float, float, float]:
    """(Mn / Omega with the top-flange Cb, that Cb, the largest |M|) over a..b for the moment
    diagram given."""
    mmax = moment.extremes(a, b).abs_max
    q = [abs(float(moment(a + f * (b - a)))) for f in (0.25, 0.5, 0.75)]
    cb = float(cb_factor(mmax, *q)) * TOP_FLANGE_CB
    return min(fl.cap, cb * l1) / fl.omega, cb, mmax


def pattern_span_top(fl, l1: float, ss, env, a: float, b: float
                     ) -> tuple[float, float, float]:
    """`span_top_strength` over every pattern of a patterned job (`env`: its Envelopes at the
    factor): the largest |M| over the whole pieces that cover a..b (a brace inside a piece
    is no break of it) and Cb by eq. F1-1 with Mmax, MA, MB and MC each the largest over the
    patterns, x 1/1.4. As for the bending check, M / (Cb Mn1) = (2.5 Mmax + 3 MA + 4 MB + 3
    MC) / (12.5 Mn1), so the ratio is never below any one pattern's own."""
    L = ss.beam.length
    br = ss.fixed.moment.breaks
    lo = float(br[max(int(br.searchsorted(a + 1e-9 * L, "right")) - 1, 0)])
    hi = float(br[min(int(br.searchsorted(b - 1e-9 * L, "left")), len(br) - 1)])
    mmax = max(abs(env.extreme("moment", up, lo, hi).value) for up in (True, False))
    q = [env.abs_value("moment", a + f * (b - a)) for f in (0.25, 0.5, 0.75)]
    cb = float(cb_factor(mmax, *q)) * TOP_FLANGE_CB
    return min(fl.cap, cb * l1) / fl.omega, cb, mmax


def span_top_unchecked(job: Job, st, got) -> list[Unchecked]:
    """Loads on the top flange of an unbraced length between braces whose strength under that
    loading is not worked out (wheels rolling on the top flange beside patterned loads: `got`,
    the job's `span_top_demands`, is NOT_JUDGED): listed, and no rating is posted. Where it
    is worked out it is a check (`span_top_rows`)."""
    if got != NOT_JUDGED:
        return []
    rolling = span_top_limits(job, st)
    f = lambda x, q="length": units.fmt(x, q, job.units)  # noqa: E731
    return [Unchecked(
        TOP_FLANGE_LTB,
        wheels_with_top_words(job) + " of the unbraced length"
        + ("s " if len(rolling) > 1 else " ")
        + ", ".join(f"{f(a)} to {f(b)}" for a, b, _ in rolling) + ", which destabilises "
        "it; with patterned loads as well, the strength that leaves (eq. F1-1's Cb x 1/1.4 "
        "at every wheel position and pattern) is not worked out, so no rating is posted. "
        "Brace the member (beam.braces, braced = true), or drop patterned = true where "
        "the loads stay on",
        "AISC 360-16 Commentary F1 (top-flange loading, Cb x 1.4^(2y/ho), from memory)",
        blocks_rating=True)]


SPAN_TOP_CHECK = "bending, top-flange loads between braces"


# patterns (of the spans a patterned load is on) up to which the top-flange rule between
# braces is worked out pattern by pattern; past it, from the envelopes (an upper bound)
EXACT_TOP_PATTERNS = 64


def span_top_demands(job: Job, st, ss, k: float, moment=None):
    """(start, end, moment, strength with the top-flange Cb, that Cb, where in words, where
    the moment is largest or None) of each
    unbraced length between braces that carries loads on its top flange (`span_top_limits`)
    at the live-load factor k: every pattern (each worked out where there are up to
    `EXACT_TOP_PATTERNS`, else eq. F1-1's moments each the largest over the patterns, an upper
    bound), every wheel position; `moment`: the diagram of a job with neither (else every
    load on at k from `ss`). NOT_JUDGED where wheels roll on top beside patterned loads."""
    limits = span_top_limits(job, st)
    if not limits:
        return []
    moving = bool(job.moving)
    if ss is None and (moving or moment is None or any(ld.patterned for ld in job.loads)):
        ss = loading.state_set(job)
    worst = moving_top_worst(job, st, ss, k, limits) if moving else {}
    if worst == NOT_JUDGED:
        return NOT_JUDGED
    patterned = ss is not None and bool(ss.spans) and not moving
    # few patterns: each worked out, the worst taken (exact); many: the envelope's bound
    pats = ss.patterns if patterned and len(ss.patterns) <= EXACT_TOP_PATTERNS else None
    moms = {p: ss.state(k, p).moment for p in pats} if pats else None
    env = loading.Envelopes(ss, k) if patterned and pats is None else None
    # (a job with neither patterns nor wheels: every load on at k, or the diagram given)
    m = all_on_moment(ss, k) if ss is not None and not patterned and not moving else moment
    out = []
    for a, b, l1 in limits:
        where = ""
        if moving:  # every wheel position, each with its own Cb
            got = worst.get((a, b))
            if got is None:
                continue
            demand, top, cb, p, jb = got
            where, at = rolling_where(jb, p), None
        elif pats:  # each pattern with its own moment diagram and Cb: the worst
            best = None
            for p in pats:
                t_, c_, d_ = span_top_strength(st.flexure, l1, moms[p], a, b)
                r_ = d_ / t_ if t_ > 0 else math.inf
                if best is None or r_ > best[0]:
                    best = (r_, t_, c_, d_, p)
            _, top, cb, demand, p = best
            where = (" (the worst pattern of the patterned loads: "
                     f"{loading.describe_pattern(ss, p, loading._fmt_for(job))})")
            at = moms[p].extremes(a, b).abs_max_at
        elif patterned:  # an upper bound over the patterns, Cb included
            top, cb, demand = pattern_span_top(st.flexure, l1, ss, env, a, b)
            where = (" (the moments of eq. F1-1 each the largest over every pattern of the "
                     "patterned loads)")
            at = env.abs_extreme("moment", a, b).at
        else:
            top, cb, demand = span_top_strength(st.flexure, l1, m, a, b)
            at = m.extremes(a, b).abs_max_at
        out.append((a, b, demand, top, cb, where, at))
    return out


def span_top_checks(job: Job, st, ss, k: float = 1.0, moment=None) -> list[Check]:
    """`span_top_rows` of the job's `span_top_demands` at the factor k."""
    return span_top_rows(job, st, span_top_demands(job, st, ss, k, moment))


def span_top_rows(job: Job, st, got) -> list[Check]:
    """The check of the unbraced lengths between braces whose loads bear on the top flange
    (edge), where that loading lowers the strength below the bending check's cap (`got`: their
    `span_top_demands`): the length whose ratio is largest (one row, as the bending check
    names the length that governs): its largest moment against Mn / Omega with Cb x 1/1.4
    (AISC 360-16 Commentary F1, from memory; the bending check takes the loads at the shear
    centre)."""
    if got == NOT_JUDGED:
        return []
    fl = st.flexure
    rows = [g for g in got if g[3] < fl.cap / fl.omega * (1 - 1e-9) and g[2] > 0]
    if not rows:
        return []
    a, b, demand, top, cb, where, at = max(rows, key=lambda g: g[2] / g[3] if g[3] > 0
                                           else math.inf)
    f = lambda x, q="length": units.fmt(x, q, job.units)  # noqa: E731
    bar = fl.ltb[0] == "F11"
    part = "top edge" if bar else "top flange"
    rule = {"F4": "AISC 360-16 F4", "F11": "AISC 360-16 F11.2"}.get(fl.ltb[0], "AISC 360-16 F2")
    more = f" ({len(rows)} lengths so loaded: this one governs)" if len(rows) > 1 else ""
    return [Check(
        SPAN_TOP_CHECK, demand, top, "N*m",
        f"{rule} (Cb {cb:.3f} = eq. F1-1 x 1/1.4 for loads bearing on the {part}, "
        f"Commentary F1, from memory) over the unbraced length {f(a)} to {f(b)}{more}: "
        f"M <= {f(top, 'moment')}{where}", at,
        detail=f"the loads bear on the {part} at points not braced, which destabilises it; "
        "brace the member at the loads (beam.braces), or hang them below (flange = "
        "\"bottom\" on a point load; a spread load hung below goes in as point loads at its "
        "hangers)",
        clause=f"{rule} with Commentary F1 (loads on the {part}, Cb x 1/1.4)",
        source="AISC 360-16 Commentary F1 (from memory)",
        params={"Cb": cb, "Mn_omega": top, "Lb": b - a})]


def hogging_limits(job: Job, st) -> list[tuple[float, float, float]]:
    """(start, end, allowable moment) of each length between the supports (the points that
    hold the bottom flange or edge) over which that edge's lateral-torsional buckling (Cb 1.0)
    would lower the bending strength of a member taken as braced all along (`braced = true`,
    not `restrained`): by AISC 360-16 F2 for steel shapes, by NDS 2018 3.3.3 (CL over the
    length, its Table 3.3.3 row) for lumber. A member whose sideways buckling shopbeam does
    not compute (an aluminium open shape or deep bar, a typed-in metal's deep bar on the
    first-yield basis: listed as not checked when unbraced) gets 0 on every length, so any
    hogging moment stops its rating."""
    if not top_only(job):
        return []
    fl = st.flexure
    lengths = hogging_lengths(job)
    got = hogging_allowables(job, fl, lengths)
    if got is not None:
        return [(a, b, allow) for (a, b, _c), allow in zip(lengths, got) if allow is not None]
    loose = replace(job, braced=False, braces=())
    if any(u.name == "lateral-torsional buckling" for u in unchecked_for(loose)):
        return [(a, b, 0.0) for a, b, _c in lengths]
    return []


def hogging_lengths(job: Job) -> list[tuple[float, float, str]]:
    """(start, end, NDS Table 3.3.3 row) of each length between the points that hold the
    bottom flange or edge of a member braced on its top only: its supports, and brace points
    that hold both flanges (`braces` beside `braced = true`, unless `braces_flange = "top"`).
    The row: a cantilever's by its loads; a length between two held points takes the table's
    general row (footnote 1), as its rows for single spans are for a span's sagging moment
    under those loads, not the hogging over a support."""
    held = set(support_braces(job, job.supports))
    if job.braces and getattr(job, "braces_flange", None) != "top":
        held |= set(job.braces)
    stops = sorted({0.0, job.length, *held})
    tol = 1e-9 * job.length
    out = []
    for a, b in zip(stops, stops[1:]):
        if b - a > tol:
            free = not (any(abs(a - h) <= tol for h in held)
                        and any(abs(b - h) <= tol for h in held))
            out.append((a, b, wood_load_case(job, a, b, free) if free else "any"))
    return out


def hogging_allowables(job: Job, fl, lengths) -> list[float | None] | None:
    """The moment (Mn / Omega, Cb 1.0) the bottom flange's or edge's lateral-torsional
    buckling leaves over each of `lengths` (`hogging_lengths`) for the flexure `fl`, None on
    a length where it does not lower the strength; None for all where shopbeam does not
    work that buckling out for the section (steel shapes by AISC F2 and its kin, lumber by
    NDS 3.3.3 are worked out)."""
    wood = fl.ltb is not None and fl.ltb[0] == "NDS"
    if not (fl.ltb is not None and (fl.stress_s is None or wood)):
        return None
    out = []
    for a, b, case in lengths:
        l1 = fl.ltb1(b - a, case if wood else "any")[0]
        out.append(l1 / fl.omega if l1 < fl.cap else None)
    return out


def top_only(job: Job) -> bool:
    """True when what braces the member holds its top flange or edge only: `braced = true`
    (a deck, boards, sheeting) or braces said to hold the top flange (`braces_flange =
    "top"`), and the member is not held against twist all along (`restrained`)."""
    return not job.restrained and (job.braced or (
        bool(job.braces) and getattr(job, "braces_flange", None) == "top"))


def top_words(job: Job) -> str:
    """What the job said that holds the top only, for the messages."""
    return "braced = true" if job.braced else "braces_flange = \"top\""


def hogging(moment):
    """The moment's extremes when it hogs by 1 % or more of its largest value, else None (a
    hogging under that is no compression of the bottom flange worth a word)."""
    ex = moment.extremes()
    big = max(abs(ex.max), abs(ex.min))
    return ex if big > 0 and ex.min < -0.01 * big else None


def flange_word(job: Job) -> str:
    """What the member's top and bottom are called in words: a wood member's edges, a metal
    one's flanges."""
    return "edge" if getattr(job.material, "kind", "") == "lumber" else "flange"


def hogging_remedy(job: Job) -> str:
    """What to write when the top-only bracing leaves the bottom flange free under hogging."""
    part = flange_word(job)
    return (f"give the bottom {part}'s brace points with braces = [...] in place of braced = "
            "true" if job.braced else f"brace the bottom {part} too (kickers) and say "
            "braces_flange = \"both\"") + (", or write restrained = true if the member is "
                                            "held against twist all along")


def braces_note(job: Job, st, moment) -> list[str]:
    """Brace points of a member whose moment hogs, where the job does not say which flange
    they hold: taken as holding the section against twist (both flanges), which a joist seat
    on the top flange does not do. A caution naming the key."""
    if not job.braces or job.braced or job.restrained or \
            getattr(job, "braces_flange", None) is not None or st.flexure.ltb is None:
        return []
    ex = hogging(moment)
    if ex is None:
        return []
    return [f"the brace points (beam.braces) are taken as holding the member against twist, "
            f"both flanges; the moment hogs here ({units.fmt(ex.min, 'moment', job.units)} at "
            f"{units.fmt(ex.min_at, 'length', job.units)}), putting the bottom flange in "
            "compression. If the braces hold the top flange only (joist seats or a deck with no "
            "kicker to the bottom flange), say braces_flange = \"top\": the bottom flange is "
            "then checked as held at the supports only, and no rating is posted where its "
            "buckling would govern"]


def hogging_source(job: Job, st) -> str:
    """The clause a bottom edge's buckling under hogging moment falls under, by basis."""
    fl = st.flexure
    if fl.ltb is not None and fl.ltb[0] == "NDS":
        return ("NDS 2018 3.3.3 (CL = 1.0 only where the compression edge is supported "
                "throughout its length) and 4.4.1.2")
    if fl.ltb is not None and fl.stress_s is None and fl.ltb[0] in ("ADM", "F4", "F7"):
        # worked out by the section's own rule (the F2 wording below is the I-shapes')
        return f"{_LTB_RULES[fl.ltb[0]][0]} (Lb between braces of the compression flange)"
    if getattr(job.material, "kind", "") == "aluminum":
        return "ADM 2015 chapter F (lateral-torsional buckling, not computed)"
    if getattr(getattr(job, "section", None), "shape", "") == "custom":
        return ("AISC 360-16 chapter F (lateral-torsional buckling of the compression edge; "
                "a custom section's shape is not known, so it is not computed here)")
    if fl.ltb is None or fl.stress_s is not None:
        return "AISC 360-16 F11 (deep bar lateral-torsional buckling, not computed here)"
    return "AISC 360-16 F1, F2 (Lb between braces of the compression flange)"


def moment_ranges(job: Job, st, ss, k: float, lengths) -> tuple[dict, float]:
    """({(start, end): (least moment, where, largest moment, where)} over each of `lengths`,
    the largest |moment| anywhere), over every state at the factor k: each pattern of
    patterned spans, and for [[moving]] every position of the wheel set over its travel in
    each of its variants (`loading.wheel_variants`: turned round, empty; exact, from its
    influence lines), not one governing state."""
    L = job.length
    out: dict = {}
    if ss.parts.moving:
        stops = sorted({0.0, L} | {x for a, b in lengths for x in (a, b)})
        regions = tuple((a, b) for a, b in zip(stops, stops[1:]) if b - a > 1e-9 * L)
        big = 0.0
        for jb, s2, pattern in ((jb, s2, p) for jb, s2 in loading.wheel_variants(job, ss)
                                for p in s2.patterns):  # every variant of the wheel set
            ext = loading.moving_envelope(jb, s2, s2.static_loads(k, pattern), k, st,
                                          pattern=tuple(pattern), more=regions).extremes
            for r in regions:
                lo = ext.get(("more", "moment", r, "min"))
                hi = ext.get(("more", "moment", r, "max"))
                if lo is None or hi is None:
                    continue
                big = max(big, abs(lo[0]), abs(hi[0]))
                was = out.get(r)
                out[r] = (min(was[:2], lo[:2]) if was else lo[:2]) \
                    + (max(was[2:], hi[:2]) if was else hi[:2])
        return {r: out.get(r, (0.0, r[0], 0.0, r[0])) for r in lengths}, big
    env = loading.Envelopes(ss, k)
    big = max(abs(env.extreme("moment", up, 0.0, L).value) for up in (True, False))
    for a, b in lengths:
        lo, hi = env.extreme("moment", False, a, b), env.extreme("moment", True, a, b)
        out[a, b] = (lo.value, lo.at, hi.value, hi.at)
    return out, big


def hogging_demands(job: Job, st, ss, k: float, limits
                    ) -> tuple[list[tuple[float, float, float, float, float]], float]:
    """([(start, end, allowable, least moment over start..end, where)] for each length of
    `limits` (`hogging_limits`), the largest |moment| anywhere), over every state at the
    factor k (`moment_ranges`)."""
    got, big = moment_ranges(job, st, ss, k, [(a, b) for a, b, _ in limits])
    return [(a, b, allow) + got[a, b][:2] for a, b, allow in limits], big


HOGGING_CHECK = "bending, hogging"  # the bottom flange or edge, held at the supports only


def hogging_computed(limits) -> bool:
    """Whether shopbeam works out the strength each length of `limits` (`hogging_limits`)
    leaves the bottom flange or edge (steel shapes by F2, lumber by NDS 3.3.3): the hogging
    moment is then a check the rating is taken from, not a limit state left unchecked."""
    return bool(limits) and all(allow > 0 for _a, _b, allow in limits)


def hogging_check(job: Job, st, dem, big: float, travel: str = "") -> Check | None:
    """The check of the bottom flange or edge of a member braced on its top only, from
    `hogging_demands`' answer `dem` (and its largest |moment| `big`): over each length between
    the supports, the hogging moment against the strength that edge's lateral-torsional
    buckling leaves it (Cb 1.0, conservative); the length whose ratio is largest governs.
    None where the moment does not hog by 1 % of its largest (no compression worth a check)."""
    if not dem or not any(-d[3] > 0.01 * big for d in dem):
        return None
    a, b, allow, least, at = max(dem, key=lambda d: -d[3] / d[2])
    f = lambda x, q="length": units.fmt(x, q, job.units)  # noqa: E731
    part = flange_word(job)
    ltb = st.flexure.ltb[0] if st.flexure.ltb is not None else "F2"
    wood = ltb == "NDS"
    rule = "NDS 2018 3.3.3 (CL over the length, Table 3.3.3)" if wood else \
        f"{_LTB_RULES.get(ltb, _LTB_RULES['F2'])[0]} (Lb = the length between supports, Cb 1.0)"
    case = next((c for x, y, c in hogging_lengths(job) if (x, y) == (a, b)), "any")
    how = st.flexure.ltb1(b - a, case if wood else "any", job.units)[1]
    return Check(
        HOGGING_CHECK, max(0.0, -least), allow, "N*m",
        f"{rule}: the bottom {part} is in compression where the moment hogs and is held at "
        f"the supports only ({top_words(job)} holds the top): M <= {f(allow, 'moment')} over "
        f"{f(a)} to {f(b)}" + (f" ({how})" if how else "") + travel, at,
        detail=f"the bottom {part} of a member braced on its top only. To rate it on the "
        "bending check alone, " + hogging_remedy(job),
        clause=hogging_source(job, st), source=_LTB_RULES.get(ltb, _LTB_RULES["F2"])[1],
        params={"Lb": b - a, "Mn_omega": allow} | ({} if wood else {"Cb": 1.0}))


def hogging_checks(job: Job, st, ss, k: float = 1.0) -> list[Check]:
    """`hogging_check` at the factor k (the loads as entered at k = 1) over every load state,
    and a wood member's dead loads alone at CD 0.9 (`hogging_dead_check`), where shopbeam
    works out the strength (`hogging_computed`); none otherwise (the limit state is then
    listed as not checked, `braced_hogging`)."""
    limits = hogging_limits(job, st)
    if not hogging_computed(limits):
        return []
    ss = ss or loading.state_set(job)
    dem, big = hogging_demands(job, st, ss, k, limits)
    c = hogging_check(job, st, dem, big, travel_words(job, ss) if job.moving else "")
    return [x for x in (c, hogging_dead_check(job, st, ss)) if x is not None]


HOGGING_DEAD_CHECK = "bending, hogging, dead load"


def hogging_dead_check(job: Job, st, ss) -> Check | None:
    """NDS 2018 2.3.2 for the bottom edge under hogging, as `checks.dead_load_checks` does for
    bending: the dead loads alone (the live loads off, k = 0) with CD 0.9 (permanent) where the
    job's duration is shorter, against the edge's strength over each length with its CL
    worked out again at that Fb*. None where it does not apply or the dead loads do not hog."""
    fl = st.flexure
    wf = getattr(fl, "wood", None)
    if wf is None or fl.ltb is None or fl.ltb[0] != "NDS" or wf.factors["CD"] <= 0.9:
        return None
    r = 0.9 / wf.factors["CD"]
    scaled = replace(fl, cap=fl.cap * r, ltb=("NDS", (wf.fb_star * r,) + fl.ltb[1][1:]))
    lengths = hogging_lengths(job)
    got = hogging_allowables(job, scaled, lengths) or []
    limits = [(a, b, allow) for (a, b, _c), allow in zip(lengths, got) if allow is not None]
    if not limits:
        return None
    dem, big = hogging_demands(job, st, ss, 0.0, limits)
    if not dem or not any(-d[3] > 0.01 * big for d in dem):
        return None
    a, b, allow, least, at = max(dem, key=lambda d: -d[3] / d[2])
    f = lambda x, q="length": units.fmt(x, q, job.units)  # noqa: E731
    case = next((c for x, y, c in lengths if (x, y) == (a, b)), "any")
    how = scaled.ltb1(b - a, case, job.units)[1]
    return Check(HOGGING_DEAD_CHECK, max(0.0, -least), allow, "N*m",
                 "dead load alone with CD 0.9 (permanent, NDS 2018 2.3.2, Table 2.3.2), the "
                 f"bottom edge under hogging held at the supports only: M <= "
                 f"{f(allow, 'moment')} over {f(a)} to {f(b)}" + (f" ({how})" if how else ""),
                 at, clause="NDS 2018 2.3.2, 3.3.3", source="NDS 2018 (from memory)",
                 params={"CD": 0.9, "Lb": b - a, "Mn_omega": allow})


def braced_hogging(job: Job, st, moment, ss=None) -> list[Unchecked]:
    """`braced = true` holds the member all along, but what shops brace it with (a deck,
    boards, sheeting) sits on the top flange or edge. Where the moment hogs, the bottom one
    is in compression, and between the supports nothing holds it: its lateral-torsional
    buckling is not checked. Listed here; `capacity` posts no rating where the hogging moment
    at the rated load would pass that lower strength (any hogging, where shopbeam does not
    compute that buckling). `restrained = true` (held against twist all along) says the
    bottom flange is held too. A job of load states (patterned spans, [[moving]] wheels) is
    judged over all of them (`hogging_demands`), not on `moment`, one state's."""
    limits = hogging_limits(job, st)
    if not limits or hogging_computed(limits):  # computed: a check (`hogging_checks`)
        return []
    if loading.needs_states(job):
        dem, big = hogging_demands(job, st, ss or loading.state_set(job), 1.0, limits)
        lo = min(dem, key=lambda d: d[3])
        if not (big > 0 and lo[3] < -0.01 * big):
            return []
        least, least_at = lo[3], lo[4]
        over = [(-d[3], d[2]) for d in dem]
        entered = ("under the loads as entered, over " + ("the wheels' travel"
                   if job.moving else "every pattern of the patterned loads"))
    else:
        ex = hogging(moment)
        if ex is None:
            return []
        least, least_at = ex.min, ex.min_at
        over = [(-moment.extremes(a, b).min, allow) for a, b, allow in limits]
        entered = "under the loads as entered"
    f = lambda x, q="length": units.fmt(x, q, job.units)  # noqa: E731
    computed = any(allow > 0 for _a, _b, allow in limits)
    # already past that strength under the loads as entered: the verdict must not read as a
    # clean pass (blocking), as capacity posts no rating from it
    over = [(m, allow) for m, allow in over if m > allow * (1 + 1e-9)]  # hogs past it
    worst = max(over, key=lambda x: x[0] / x[1] if x[1] > 0 else math.inf, default=None)
    here = ""
    if worst is not None and worst[1] > 0:
        here = (f". Under the loads as entered it is already exceeded: {f(worst[0], 'moment')} "
                f"hogging against the {f(worst[1], 'moment')} that buckling leaves")
    return [Unchecked(
        HOGGING_LTB,
        (f"braced = true takes the member as braced all along, but a deck, boards or "
         "sheeting brace only the flange or edge they sit on" if job.braced else
         "the braces hold the top flange only (braces_flange = \"top\")")
        + "; here the moment hogs "
        f"({f(least, 'moment')} at {f(least_at)} {entered}), putting the "
        "bottom flange or edge in compression where nothing holds it between the supports, "
        "and its lateral-torsional buckling is not checked. "
        + ("No rating is posted where the hogging moment at the rated load would exceed the "
           "strength that buckling leaves (Cb 1.0); " if computed else
           "shopbeam does not compute that buckling for this member, so no rating is posted "
           "while the moment hogs; ")
        + hogging_remedy(job) + here, hogging_source(job, st),
        blocks_rating=worst is not None)]


# A member people walk on (a floor, mezzanine, platform, walkway): its deflection limit does
# not keep it from bouncing underfoot; walking vibration is its own serviceability limit
# state (AISC Design Guide 11 for steel framing, from memory). A caution: it does not decide
# strength, so it does not hold back a rating.
_FLOOR = re.compile(r"\b(floors?|mezzanines?|mezz|walkways?|catwalks?|joists?|lofts?|"
                    r"(?<!trailer )(?<!flatbed )(?<!truck )"
                    r"platforms?(?![- ](?:trailers?|trucks?|beds?|bodies|body)\b"
                    r"(?![- ](?:bays?|docks?|doors?|lanes?|parking|stalls?)\b)))\b",
                    re.IGNORECASE)  # (a platform trailer or truck is the vehicle: a flatbed)


def floor_unchecked(job: Job) -> list[Unchecked]:
    """Walking vibration of a floor member (named by its tags or title), as not checked. A
    lifting device's title naming where it hangs ("hoist beam in the loft") is not a floor."""
    lifting = job.lifting or getattr(job.criteria, "lifting", "")
    normal = {normal_tag(t) for t in job.tags}
    # a platform or deck tagged beside a vehicle's tag is the vehicle's (a flatbed's deck)
    tags = tuple(t for t in job.tags if not (normal_tag(t) in VEHICLE_DECK_TAGS
                                               and VEHICLE_TAGS.intersection(normal)))
    if NOT_FLOOR in normal or \
            not any(_FLOOR.search(t) for t in tags + (() if lifting else (job.title,))):
        return []
    wood = getattr(job.material, "kind", "") == "lumber"
    return [Unchecked(
        "floor vibration under walking",
        "a floor, mezzanine or platform that meets its deflection limit can still bounce "
        "underfoot; its walking vibration (framing frequency and damping) is not checked. If "
        "people walk or work on it, have that checked with the whole floor",
        ("wood floors: stiffness and span limits beyond L/360 are common practice, no single "
         "standard (from memory)" if wood else
         "AISC Design Guide 11 for steel floors, from memory"), blocks_rating=False)]


def _lifting_json(job) -> dict | None:
    p = profile_of(job)
    if p is None:
        return None
    return {"profile": p.name, "picked_from_tags": p.guessed, "impact": impact_of(job),
            "profile_impact": p.impact, "lateral": p.lateral, "longitudinal": p.longitudinal,
            "design_factor": p.nd, "deflection_ratio": p.deflection, "words": p.words}


def bending_s(job) -> float | None:
    """The section modulus a bending check's JSON states its stress with: the extreme
    fibre's, S = min(S top, S bottom) about the bending axis (`Check.as_dict`)."""
    sec = job.section
    s = min(getattr(sec, "sx_top", 0.0) or 0.0, getattr(sec, "sx_bot", 0.0) or 0.0)
    return s if s > 0 else None


def to_json(result: Result) -> dict:
    """The contract's JSON (SI units throughout)."""
    job, sol = result.job, result.solution
    ex = sol.extremes()
    return {
        "schema": 1,
        "title": job.title,
        "length": job.length,
        "reactions": [
            {"at": float(r.at), "type": r.kind, "force": float(r.force), "moment": float(r.moment)}
            for r in sol.reactions
        ],
        "extremes": {name: e.as_dict() for name, e in ex.items()},
        "checks": [c.as_dict(bending_s(job)) for c in result.checks],
        "governing": result.governing.name,
        "diagnostics": [{"name": d.name, "ok": bool(d.ok), "detail": d.detail} for d in sol.diagnostics],
        "cautions": list(result.cautions),
        "unchecked": [u.as_dict() for u in result.unchecked],
        "lifting": _lifting_json(job),
        "hinges": [{"at": h["at"], "shear": h["shear"]} for h in hinge_shears(job, sol)],
        "fixed_ends": [{"at": f["at"], "moment": f["moment"], "shear": f["force"]}
                       for f in fixed_end_moments(job, sol)],
        "warnings": [p.located() for p in job.warnings if p.warning],
        "members": job.members,
        "section": getattr(job.section, "designation", ""),
        "material": getattr(job.material, "key", ""),
        "ei": job.ei,
        "self_weight": (-job.self_weight_load().w1 if job.self_weight else 0.0),
        "units": "SI (m, N, N*m, Pa, rad)",
        "shown_state": result.shown_state,
        "governing_state": None if result.state_solution is None else {
            "words": result.state_words,
            "reactions": [{"at": float(r.at), "type": r.kind, "force": float(r.force),
                           "moment": float(r.moment)} for r in result.state_solution.reactions],
            "extremes": {n: e.as_dict() for n, e in result.state_solution.extremes().items()},
        },
        # per support over every load state (patterned or moving loads; else empty):
        # max_up / max_down are the largest and smallest force (+ up), with their states
        "reaction_envelope": [dict(r) for r in result.reaction_envelope],
    }
