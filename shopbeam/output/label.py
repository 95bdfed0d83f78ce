"""Rating labels and plaques in shop words: the load to post, as a person at the rack reads it.

`rating(cap, unchecked)` turns a capacity (`design.capacity.CapacityResult`: the largest
multiplier k of the live loads) into `Rating`: the figures to post in the job's units, each
rounded DOWN to three significant figures and saying so when rounding changed it ("9420 lbf,
rounded down from 9429"). The figures depend on the loads entered:

- one uniform live load: the max uniform load (per length, over where it lies) and its total;
- one point live load: the max point load and where it goes;
- several live loads (pallets, bundles): each one's max load by its label, and the total;
- a moving wheel set: the max load per wheel and for the set;
- loads shared by identical members (`members = 2`: a pair of rack beams, a shelf's two
  rails): the figures are per level / pair of beams (tags rack, pallet) or per shelf (tag
  shelf) for the loads as entered, and per beam or member; racks give the total per bay
  (`[beam] levels = N`: the per-level total times the levels, rounded down) and say it is
  also bounded by the upright frames (not checked).

When the capacity carries "not rated" reasons (`CapacityResult.not_rated`), or a limit state
that blocks a rating was not checked, there is no number: the label says NOT RATED and why.
The governing check, the load state that governs it and every support the rated load pulls
down (uplift: anchor it) come from `output.present.present_capacity`, as the capacity page
shows them. Every label and plaque carries the cautions (the stronger lifting ones for lifting jobs) and
every unchecked limit state. `label_text` is the 40-column label (`shopbeam rating JOB`);
`plaque_text` and `plaque_html` are the full-page plaque (`shopbeam rating JOB --plaque`).
"""

from __future__ import annotations

import datetime as _dt
import math
from dataclasses import dataclass
from html import escape

from shopbeam import units
from shopbeam.cautions import RACK_TAGS, SHELF_TAGS, banner, cautions_for
from shopbeam.design import fatigue, uplift
from shopbeam.design.analysis import (FATIGUE_CHECKED, JUDGED_AT_RATED_LOAD, NO_AXIAL,
                                      hung_by_open_ends,
                                      couple_notes, flange_word, is_outdoor)
from shopbeam.design.basis import tip_hung
from shopbeam.design.capacity import hoist_at, hoist_travels, travelling
from shopbeam.design.checks import basis_of, impact_of
from shopbeam.design.loading import read_moving
from shopbeam.engine.solver import sound_solve
from shopbeam.errors import InputError, UnstableBeam
from shopbeam.jobs.rules import rack_arm
from shopbeam.output.present import design_wall, present_capacity, wrap

BASIS_SHORT = {"asd": "AISC 360-16 ASD", "first-yield": "first yield",
               "aluminum": "ADM 2015 ASD", "lumber": "NDS 2018 ASD"}


@dataclass(frozen=True)
class Figure:
    """One posted figure: what it is for, the value (rounded down) and any note."""

    label: str
    value: str
    note: str = ""  # e.g. "rounded down from 9429", "over 4 in to 44 in"
    si: float = 0.0  # the posted value in SI (after rounding down)
    exact: float = 0.0  # before rounding, SI
    group: str = ""  # heading it sits under, e.g. "PER LEVEL (pair of beams)"


@dataclass(frozen=True)
class Rating:
    title: str
    member: str
    span: str
    factor: float
    figures: tuple[Figure, ...]
    not_rated: tuple[str, ...]
    status: str  # "rated" | "not rated" | "do not load" | "nothing to rate"
    governing: str
    basis: str
    date: str
    lifting: bool
    cautions: tuple[str, ...]
    unchecked: tuple[str, ...]  # "name (clause): reason"
    notes: tuple[str, ...]
    warnings: tuple[str, ...] = ()  # input warnings, "key: what"
    lifting_profile: str = ""  # the lifting profile the rating used (design.lifting.profile_of)
    governing_state: str = ""  # the load state that governs at the rated load ("": one state)
    governing_how: str = ""  # where and on what the governing check was judged, when it matters
    uplift: tuple[str, ...] = ()  # supports the rated load pulls down, in words
    uplift_head: str = "UPLIFT at the rated load: anchor"
    # the full-page plaque: what each support carries at the rated load (the largest up and
    # down over every load state, `output.present.present_capacity`), per member
    reactions: tuple[str, ...] = ()
    reactions_head: str = "SUPPORTS must carry at the rated load (+ up)"


# ------------------------------------------------------------------ rounding
def floor_sig(value: float, sig: int = 3) -> float:
    """`value` (> 0) rounded down to `sig` significant figures (a posted load never rounds up)."""
    if value <= 0 or not math.isfinite(value):
        return 0.0
    e = math.floor(math.log10(value)) - (sig - 1)
    step = 10.0 ** e
    # a figure worked out from posted ones comes back through the unit conversions a few
    # parts in 1e12 short (1250 lbf/ft x 4 ft as 4999.99999999 lbf): nudged by 1e-9 so it
    # posts as 5000, not 4990; never more than that above the value itself
    down = math.floor(value / step * (1 + 1e-9)) * step
    if down > value * (1 + 1e-9):
        down = math.floor(value / step) * step
    return round(down, max(0, -e))


def posted(label: str, si_value: float, kind: str, system: str, note: str = "",
           group: str = "", exact: float | None = None) -> Figure:
    """A figure rounded down in display units, noting the unrounded value when they differ.
    `exact`: the figure's own value before any rounding, where `si_value` is derived from
    another posted (rounded) figure."""
    disp = abs(units.to_display(si_value, kind, system))
    down = floor_sig(disp)
    factor = units.to_display(1.0, kind, system)
    unit = units.unit_label(kind, system)
    text = f"{units.num(down, 6)} {unit}"
    if system == "si" and kind in ("force", "line_load") and "UPWARD" not in label.upper():
        # metric shops post loads in kilograms (not an upward one: no weight pushes up): the
        # weight that makes this force (g0),
        # rounded down on its own
        # from the posted force, so the two agree (never more kilograms than the kN posted)
        kg = floor_sig(down / factor / units.G0)
        text += f" ({units.num(kg, 6)} kg{'/m' if kind == 'line_load' else ''})"
    notes = [note] if note else []
    if exact is not None:  # say what the figure itself was before rounding
        disp = abs(units.to_display(exact, kind, system))
    if down < disp * (1 - 1e-9):
        whole = math.floor(disp)
        notes.append(f"rounded down from {whole}" if disp >= 1000 and whole > down
                     else f"rounded down from {units.num(disp, max(5, len(str(whole)) + 1))}")
    return Figure(label, text, "; ".join(notes), down / factor,
                  abs(si_value) if exact is None else abs(exact), group)


# ------------------------------------------------------------------ the figures
def _moving(job):
    return read_moving(job)


def _figures(job, k: float) -> tuple[list[Figure], list[str]]:
    sy = job.units
    live = [ld for ld in job.loads if ld.case == "live"]
    mv = _moving(job)
    n = job.members
    tags = {t.strip().lower() for t in job.tags}
    rack = bool(RACK_TAGS & tags)
    shelf = bool(SHELF_TAGS & tags) and not rack
    figs: list[Figure] = []
    notes: list[str] = []
    # a point-load hoist rated travelling (`capacity`): its loads are posted for anywhere
    hoist_x = hoist_at(job) if hoist_travels(job) else None
    where = ""
    if n > 1:
        if rack:
            where = "PER LEVEL (pair of beams)" if n == 2 else f"PER LEVEL ({n} beams)"
        else:
            where = f"PER SHELF ({n} members)" if shelf else f"ALL {n} MEMBERS TOGETHER"

    def pos(x):
        return units.fmt(x, "length", sy)

    if len(live) == 1 and not mv and live[0].kind == "uniform":
        ld = live[0]
        width = (getattr(job, "widths", None) or {}).get(ld.key)
        area = None
        if width:  # given per area: post it per area first, in the unit it was written in
            area = posted(f"MAX {_up(ld)}AREA LOAD", ld.w1 * k / width, "area_load", sy,
                          f"over {pos(width)} tributary width, {pos(ld.start)} to "
                          f"{pos(ld.end)}", where)
            figs.append(area)
        # per length from the posted area figure where there is one, so the area load, the
        # line load and the total agree (each still no more than its exact value)
        w = posted(f"MAX {_up(ld)}UNIFORM LOAD", area.si * width if area else ld.w1 * k,
                   "line_load", sy, f"over {pos(ld.start)} to {pos(ld.end)}", where,
                   exact=ld.w1 * k if area else None)
        figs.append(w)
        # the total of the posted figure (never more than the exact total), so the two agree
        figs.append(posted(f"{_up(ld, 'UPWARD ')}TOTAL", w.si * (ld.end - ld.start), "force",
                           sy, "spread evenly", where, exact=ld.total_force * k))
    elif len(live) == 1 and not mv and live[0].kind == "point":
        ld = live[0]
        moves = hoist_x is not None
        figs.append(posted(f"MAX {_up(ld)}POINT LOAD", ld.value * k, "force", sy,
                           "anywhere along its travel" if moves else f"at {pos(ld.at)}",
                           where))
    else:
        each_live = []  # the posted figures of the live force loads, for their TOTAL
        for i, ld in enumerate(live):
            name = ld.label or f"load {i + 1}"
            if ld.kind == "point":
                figs.append(posted(f"max {name}{_up(ld, ' (upward)')}", ld.value * k, "force", sy,
                                   "anywhere along its travel, with the hoist"
                                   if hoist_x is not None and abs(ld.at - hoist_x) <= 1e-9
                                   * job.length else f"at {pos(ld.at)}", where))
            elif ld.kind == "uniform":
                figs.append(posted(f"max {name}{_up(ld, ' (upward)')}", ld.total_force * k,
                                   "force", sy, f"spread over {pos(ld.start)} to {pos(ld.end)}", where))
            elif ld.kind == "linear":
                w1, w2 = (units.fmt(abs(w) * k, "line_load", sy) for w in (ld.w1, ld.w2))
                figs.append(posted(f"max {name}{_up(ld, ' (upward)')} (total)",
                                   ld.total_force * k, "force", sy,
                                   f"varying from {w1} at {pos(ld.start)} to {w2} at "
                                   f"{pos(ld.end)}", where))
            else:
                turn = "counterclockwise" if ld.value > 0 else "clockwise"
                figs.append(posted(f"max {name}", ld.value * k, "moment", sy,
                                   f"at {pos(ld.at)}, turning {turn}", where))
                continue
            each_live.append(figs[-1].si)
        if mv:
            m = mv[0]
            # on a lifting job each load of a wheel set is an axle (or a wheel pair), carried
            # by wheels_per_axle wheels: a monorail trolley runs one each side of the web; on
            # any other job each load is one wheel (a cart on the top flange)
            wheels = [abs(w) * n * k for w in m.live]
            lifts = bool(job.lifting or getattr(job.criteria, "lifting", ""))
            per = max(int(job.moving[0].wheels_per_axle if job.moving and lifts else 1), 1)
            one, many = ("AXLE", "axles") if lifts else ("WHEEL", "wheels")
            # the per-wheel and whole-set figures come from the posted axle figure where the
            # axles are alike, so the three agree (each still no more than its exact value)
            alike = max(wheels) - min(wheels) <= 1e-9 * max(wheels)
            if alike:
                axle = posted(f"MAX PER {one} ({m.label})", max(wheels), "force", sy,
                              f"{len(wheels)} {many}", where)
            else:  # each axle its own figure (the heaviest is not every axle's)
                each = " / ".join(posted("", w, "force", sy).value for w in wheels)
                axle = posted(f"MAX HEAVIEST {one} ({m.label})", max(wheels), "force", sy,
                              f"{len(wheels)} {many}, in order: {each}", where)
            if len(wheels) > 1:
                figs.append(axle)
            if per > 1:
                figs.append(posted(f"MAX PER WHEEL ({m.label})", axle.si / per, "force",
                                   sy, f"{per} wheels per axle", where,
                                   exact=max(wheels) / per))
            figs.append(posted(f"MAX MOVING LOAD ({m.label})",
                               axle.si * len(wheels) if alike else sum(wheels), "force", sy,
                               "anywhere on its travel" + (
                                   ", either way round" if len(set(m.live)) > 1 else ""),
                               where, exact=sum(wheels)))
        tot = sum(abs(ld.total_force) for ld in live)
        if tot and len(live) > 1:
            # the sum of the posted figures (never more than they add up to, nor than the
            # exact total), so the label adds up
            figs.append(posted("TOTAL", sum(each_live), "force", sy, "placed as listed above",
                               where, exact=tot * k))
        if live and any(ld.kind == "moment" for ld in live):
            notes.append("applied couples are rated with the loads above, as entered")
    tot_all = sum(abs(ld.total_force) for ld in live)
    if mv:
        tot_all += sum(abs(w) for w in mv[0].live) * n
    if n > 1 and tot_all:
        each = "PER BEAM" if rack else "PER MEMBER"
        up = all(ld.total_force > 0 for ld in live) and not mv  # an uplift: no kg beside it
        figs.append(posted("UPWARD TOTAL" if up else "TOTAL", tot_all * k / n, "force", sy,
                           f"each of {n} identical members carries 1/{n}", each))
    levels = getattr(job, "levels", None)
    arm = rack and rack_arm(job.tags, job.supports, job.length)
    # what holds a rack up besides this member: the bay's upright frames (pallet rack), or a
    # cantilever rack's column (its arms on one side at every level)
    if arm:
        per = "PER COLUMN SIDE"
        holder = ("the column is rated for (the column, its base, anchors and the arm "
                  "connections are not checked here)")
    else:
        per = "PER BAY"
        holder = ("the upright frames are rated for (frames, anchors and beam connectors are "
                  "not checked here)")
    if rack and levels and tot_all:
        # the posted per-level total times the levels, rounded down again: never more than
        # the levels' posted figures add up to
        # the level's own posted TOTAL where the label shows one (the posted intensity over
        # its length, or the posted loads added up), so the two figures agree
        level = next((f for f in figs if f.label == "TOTAL" and f.group == where), None) \
            or posted("TOTAL", tot_all * k, "force", sy)
        figs.append(posted(
            "TOTAL", level.si * levels, "force", sy,
            f"{levels} levels at {level.value} each; and no more than {holder}",
            f"{per} ({levels} levels)"))
    elif rack:
        what = "the arms of every level" if arm else "the levels"
        notes.append(f"{per}: {what} added up (give [beam] levels = N for the figure), "
                     f"and no more than {holder}.")
    if rack and not arm and all(sp.kind in ("pin", "roller") for sp in job.supports
                                if sp.kind != "hinge"):
        # a pallet-rack beam hangs on its end connectors: the label's SUPPORTS lines give
        # what each carries at the rated load, and the rating rests on them
        notes.append("RATED ONLY WHILE each beam's end connectors carry what the SUPPORTS "
                     "lines give at the rated load (connectors are rated by the rack maker's "
                     "tests, not checked here) and their locking devices are in place against "
                     "being knocked up (ANSI MH16.1 asks a lock that resists 1,000 lbf upward, "
                     "from memory).")
    if rack and job.criteria.impact == 0:
        notes.append("NO IMPACT allowance: impact = \"0%\" in the job (ANSI MH16.1 asks 25 % "
                     "of one unit load, from memory; MH16.3 for cantilever racks).")
    if rack and job.criteria.impact is None:
        notes.append("Impact NOT included (ANSI MH16.3 for cantilever racks sets it, from "
                     "memory): add it before posting." if arm else
                     "Impact NOT included (ANSI MH16.1: 25 % of one unit load more, from "
                     "memory): add it before posting.")
    if any(ld.patterned for ld in live):
        notes.append("Patterned loads are rated on any or all of their spans; other loads as "
                     "placed in the job, and other placements are not rated.")
    elif hoist_x is not None:
        notes.append("Rated with the hoist anywhere along the member (on a boom, anywhere "
                     "from the mast out to the place given); other loads as placed in the job.")
    elif job.moving:
        notes.append("Rated with the wheel set anywhere on its travel" + (
            " and either way round" if len(set(job.moving[0].live)) > 1 else "")
            + (", with the other loads as placed in the job." if live else "."))
    else:
        notes.append("Rated for the loads placed as in the job; other placements are not rated.")
    notes += _held_words(job)
    notes += _sideways_words(job)
    on_top = _dead_words(job)
    if on_top and uplift.applies(job):
        # an uplift the dead loads hold down: the rating leans on them being there
        notes.append(f"RATED ONLY WHILE {on_top} stay in place: they hold the uplift down, "
                     "counted at the worse of in full and 0.6 of it (ASCE 7-16 2.4.1); a "
                     "lighter roof or deck lowers the figure. Compare 0.6 W of an ASCE 7-16 "
                     "wind uplift with it.")
    elif on_top:
        notes.append(f"These loads are IN ADDITION TO {on_top}, which stay on.")
    if not job.self_weight:
        notes.append("The member's own weight was LEFT OUT (self_weight = false): it must be "
                     "inside the loads entered.")
    if getattr(job.material, "kind", "") == "lumber" and not getattr(job, "bearing", None) \
            and not getattr(job, "bearings", None):
        notes.append("Bearing taken as 1-1/2 in at the supports and under point loads (none "
                     "given): each bearing must be at least that long.")
    return figs, notes


def _wall_words(job, sy) -> str:
    """A typed-in tube's design wall, which the posted load rests on (AISC 360-16 B4.2)."""
    got = design_wall(job.section)
    return f", design wall {units.fmt(got[0], 'small_length', sy)}" if got else ""


def _stands(sec) -> str:
    """How the member stands, where it could stand two ways: a board, bar or rectangular tube
    on edge or laid flat (18 times apart for a 2x10), and any shape bent about its weak axis."""
    dims = getattr(sec, "dims", {}) or {}
    if getattr(sec, "axis", "strong") == "weak":
        return " LAID FLAT (weak axis)" if sec.shape in ("rect-bar", "rect-tube") else \
            " bent about its WEAK axis"
    if sec.shape in ("rect-bar", "rect-tube") and dims.get("h") and dims.get("b") and \
            abs(dims["h"] - dims["b"]) > 1e-9:
        return " ON EDGE (strong axis)"
    return ""


def _seated_point_loads(job) -> list[str]:
    """The live point loads that bear on the top wall of a rectangular steel HSS: the wall
    checks take them as spread across its width (beta = 1), which the rating then rests on."""
    from shopbeam.design.local import applies  # noqa: PLC0415 - label lines only

    if getattr(job.material, "kind", "") not in ("steel", "stainless"):
        return []
    if applies(job.section) != "hss":
        return []
    hung = set(getattr(job, "hung", ()) or ())
    return [ld.key + (f" ({ld.label})" if ld.label else "") for ld in job.loads
            if ld.kind == "point" and ld.case == "live" and ld.key not in hung]


def _held_words(job) -> list[str]:
    """What the rating rests on besides the member: its restraint or bracing, and a wheel
    set's travel narrower than the member (end stops)."""
    sy = job.units
    pos = lambda x: units.fmt(x, "length", sy)  # noqa: E731
    out = []
    if job.restrained:
        out.append("RATED ONLY WHILE the member is held against twist and sideways movement "
                   "all along (restrained = true).")
    elif job.braced:
        out.append(f"RATED ONLY WHILE the top {flange_word(job)} is braced all along "
                   "(braced = true).")
    elif job.braces:
        which = {"top": "top flange", "both": "both flanges"}.get(
            getattr(job, "braces_flange", None) or "both", "both flanges")
        out.append("RATED ONLY WITH the braces in place at "
                   + ", ".join(pos(x) for x in job.braces) + f" ({which}).")
    seated = _seated_point_loads(job)
    if seated:
        out.append("RATED ONLY WHILE " + ", ".join(seated) + (" bears" if len(seated) == 1
                                                              else " bear")
                   + " across the full width of the tube through a cap plate or saddle (wall "
                   "plastification under a narrower bearing, AISC 360-16 K2, is not checked).")
    lugs = getattr(job, "lugs", ())
    if lugs:
        names = [ld.key + (f" ({ld.label})" if ld.label else "") for ld in job.loads
                 if ld.key in lugs]
        out.append("RATED ONLY WHILE " + ", ".join(names) + (" hangs" if len(names) == 1
                                                            else " hang")
                   + " from a lug plate welded under the web, not from a clamp or trolley on "
                   "the flange tips (lug = true; the lug, its welds and the rigging are not "
                   "checked here).")
    if not job.lifting and not (job.restrained or job.braced) and job.section is not None \
            and job.section.shape in ("i-beam", "channel") and job.section.axis == "strong" \
            and getattr(job.material, "kind", "") in ("steel", "stainless", "aluminum"):
        # the lateral-torsional buckling strength takes each support as holding the member
        # against twist (design.basis.BRACE_BY_DEFAULT): a flange resting on a ledge or a
        # seat with nothing on the web or the top flange does not
        held = [pos(s.at) for s in job.supports
                if s.brace is None and s.kind in ("pin", "roller")]
        if held:
            at = held[0] if len(held) == 1 else ", ".join(held[:-1]) + " and " + held[-1]
            out.append(f"RATED ONLY WHILE the support{'s' if len(held) > 1 else ''} at {at} "
                       f"hold{'s' if len(held) == 1 else ''} the member against twist (a web "
                       "clip, stiffener or top-flange tie; a bottom flange resting on a ledge "
                       "does not: write brace = false on such a support to check it so).")
    if job.lifting and not (job.restrained or job.braced):
        # a lifting job's supports are taken as holding it against twist unless brace says
        # otherwise (analysis.HANGER_BRACE): a single hanger rod does not
        held = [pos(s.at) for s in job.supports
                if s.brace is None and s.kind in ("pin", "roller")]
        if held:
            at = held[0] if len(held) == 1 else ", ".join(held[:-1]) + " and " + held[-1]
            bth = getattr(job.criteria, "lifting", "") == "below-the-hook"
            what = ("lifting point", "lifting points") if bth else ("hanger or seat",
                                                                    "hangers or seats")
            out.append((f"RATED ONLY WHILE the {what[0]} at {at} holds" if len(held) == 1
                        else f"RATED ONLY WHILE the {what[1]} at {at} hold")
                       + " the beam against twist (both flanges held; "
                       + ("a single sling or shackle does not: write brace = false on those "
                          "supports to check it unbraced)." if bth else
                          "a single hanger rod does not)."))
    if (job.lifting or getattr(job.criteria, "lifting", "")) and not fatigue.checked(job):
        # lifting.FATIGUE: not checked, and no bar to the rating only while the lifts are few
        bth = getattr(job.criteria, "lifting", "") == "below-the-hook"
        out.append("RATED ONLY WHILE the member sees fewer than 20,000 lifts in its life (no "
                   "fatigue check is needed below that, "
                   + ("ASME BTH-1 service class 0, 3-4.3" if bth else "AISC 360-16 Appendix 3.1")
                   + ", from memory). A hoist in production use passes that within a few "
                   "years: have its fatigue checked for its duty.")
    tol = 1e-6 * job.length
    # a hoist given as a point load is rated travelling (capacity.travelling): its travel
    # and the flange ends it can reach are stated as a wheel set's are
    moved = travelling(job) if not job.moving else None
    sets = job.moving or (moved.moving if moved is not None else ())
    for ws in sets:
        a, b = ws.travel
        if a > tol or b < job.length - tol:
            out.append(f"RATED ONLY WHILE the {ws.label or 'wheel set'} stays between "
                       f"{pos(a)} and {pos(b)}: END STOPS must keep it there.")
        sec = job.section
        bf = sec.dims.get("bf", 0.0) if sec.shape == "i-beam" and sec.axis == "strong" else 0.0
        # an end built into a fixed support (a jib's mast) is closed by its connection
        built = {sp.at for sp in job.supports if sp.kind == "fixed"}
        ends = [x for x, near in ((0.0, a < bf), (job.length, b > job.length - bf))
                if near and not any(abs(x - f) <= tol for f in built)]
        if job.lifting and bf and ends:
            # lifting.lifting_notes: the wheel flange check is for the interior of the flange
            where = ("each end of the beam, or its ends are closed with plates" if len(ends) == 2
                     else f"the open end at {pos(ends[0])}, or that end is closed with a plate")
            out.append(f"RATED ONLY WHILE END STOPS keep the wheels at least "
                       f"{units.fmt(bf, 'small_length', sy)} (a flange width) from {where} "
                       "(the flange check under the wheels is for the flange away from its "
                       "ends).")
    near = hung_by_open_ends(job) if not sets else []
    if near:
        # a load given as a point load hung on the flange tips within a flange width of an
        # open end (a jib's hoist at the end of its reach, a clamp by a bracket's tip): the
        # same flange-end condition (analysis.hung_by_open_ends)
        bf = units.fmt(job.section.dims["bf"], 'small_length', sy)
        at = ", ".join(dict.fromkeys(pos(x) for x, _ in near))
        if job.lifting:
            out.append(f"RATED ONLY WHILE END STOPS keep the hoist's wheels at least {bf} (a "
                       f"flange width) from the open end near {at} (the figure, taken with "
                       "the hoist there, then errs on the safe side), or that end is closed "
                       "with a plate (the flange check under the wheels is for the flange away "
                       "from its ends).")
        else:
            out.append(f"RATED ONLY WHILE the load hung from the flange tips near {at} sits at "
                       f"least {bf} (a flange width) from the open end of the flange (the "
                       "figure, taken with it there, then errs on the safe side), or that end is "
                       "closed with a plate (the flange check under it is for the flange away "
                       "from its ends).")
    return out


def _tag_words(job) -> list[str]:
    """What a rating rests on because a tag says so (a limit state that tag lets through
    unchecked), or a spring support's stiffness as typed: the label says it, as for
    restraint and braces."""
    out = []
    springs = [sp for sp in job.supports if sp.kind == "spring"]
    if springs:
        said = ", ".join(f"{units.fmt(sp.at, 'length', job.units)} "
                         f"({units.fmt(sp.stiffness, 'stiffness', job.units)})"
                         for sp in springs)
        out.append(f"RATED ONLY WHILE the spring support{'s' if len(springs) > 1 else ''} at "
                   f"{said} {'are' if len(springs) > 1 else 'is'} as stiff as typed: a "
                   "stiffer or softer one shares the load otherwise (check its unit: lbf/in, "
                   "not kip/in or lbf/ft).")
    if NO_AXIAL in job.tags and (not job.lifting or len(
            {round(s.at, 6) for s in job.supports if s.takes_force}) >= 2):
        out.append("RATED ONLY WHILE nothing pushes or pulls the member endwise (tag "
                   "no-axial: " + ("slings hang plumb, " if job.lifting else "")
                   + "no sloped tie rod or knee brace; axial force is not checked here).")
    if is_outdoor(job) and uplift.pushes_up(job):
        # the figure posted is the wind uplift, or beside one: what it leaves out
        out.append("WIND sideways is not in this figure, nor wind and gravity loads together "
                   "beyond the loads entered (ASCE 7 and the local code).")
    elif is_outdoor(job):
        out.append("WIND is not in this figure: out of doors the member also takes wind, "
                   "sideways and as uplift that reverses the bending (ASCE 7 and the local "
                   "code); only the loads entered are checked here.")
    if getattr(job, "vehicle", "") and FATIGUE_CHECKED in job.tags:
        out.append("RATED ONLY WHILE the fatigue check made elsewhere stands (tag "
                   "fatigue-checked: fatigue under road loads is not checked here).")
    return out


def _governing_how(job, cap) -> str:
    """Where and on what the governing check was judged, where a shop could misread the bare
    name: a deflection limit (a cantilever's or overhang's is taken on twice its length, so
    its tip may move length / (n / 2)), or a local check at a support or load whose bearing
    length was not given (taken as the least, so giving it can lift the figure)."""
    g = cap.governing if cap.evaluation is not None else None
    if g is None:
        return ""
    f = lambda x, q="length": units.fmt(x, q, job.units)  # noqa: E731
    if g.name in ("deflection", "live deflection") and g.detail:
        return f"limit {f(g.limit, 'small_length')} on the {g.detail}"
    if "bearing length not given" in (g.detail or ""):
        place = g.detail.split(":")[0].split(" (")[0]
        lb = (g.params or {}).get("lb")
        took = f", taken as {f(lb, 'small_length')}" if lb is not None else ""
        return (f"at the {place}: bearing length not given{took}; give bearing = \"...\" "
                "(the seat or plate it bears on) if it is longer")
    return ""


def _first_clause(message: str) -> str:
    """A warning's words up to its first colon outside brackets and quotes (the short form
    the label carries)."""
    depth, quote = 0, ""
    for i, ch in enumerate(message):
        if quote:
            quote = "" if ch == quote else quote
        elif ch in "'\"" and (i == 0 or not message[i - 1].isalnum()):
            quote = ch
        elif ch in "([{":
            depth += 1
        elif ch in ")]}":
            depth = max(depth - 1, 0)
        elif ch == ":" and depth == 0:
            return message[:i]
    return message


def _lifting_band(r: "Rating") -> str:
    """The lifting band of a member that is not a lifting device: NOT FOR LIFTING, unless the
    job reads like one (it then carries the lifting caution, and is not rated until tagged)."""
    if any(c.startswith("LIFTING DEVICE") for c in r.cautions):
        return ("LIFTING DEVICE? The job reads like one but is not tagged lifting: tag it "
                "lifting, or not-lifting if it is not one")
    return "NOT FOR LIFTING"


def _weld_words(job, cap) -> list[str]:
    """A welded built-up I-section (typed in by its plates): the rating rests on the
    flange-to-web welds carrying the shear flow q = V Q / I at the rated load (AISC 360-16
    J2; Q of one flange about the neutral axis), which is not checked here."""
    sec = job.section
    d = getattr(sec, "dims", None) or {}
    if not d.get("built_up") or sec.shape != "i-beam" or cap.evaluation is None:
        return []
    v = max((abs(c.demand) for c in cap.evaluation.checks if c.name == "shear"), default=0.0)
    if not v or not sec.ix:
        return []
    q_flange = d["bf"] * d["tf"] * (d["d"] - d["tf"]) / 2
    q = v * q_flange / sec.ix  # N/m
    flow = (f"{q / (4.4482216152605 / 0.0254):,.0f} lbf/in" if job.units == "us"
            else f"{q / 1000:,.0f} N/mm")
    hung = bool(getattr(job, "hung", ()))
    return [f"RATED ONLY WHILE the flange-to-web welds carry a shear flow of {flow} (V Q / I "
            "at the rated load, both welds of a flange together; welds are not checked here): "
            "continuous fillets both sides, or stitch welds sized for it"
            + (", and the bottom flange's welds also the loads hung from it, which reach the "
               "web through them" + (" (a clamp bears on the flange tips)"
                                     if tip_hung(job) else "") if hung else "") + "."]


def _connection_words(job, k: float) -> list[str]:
    """What a fixed end's connection and an internal hinge must pass at the rated load: the
    rating rests on them and they are not checked (design.connections)."""
    if not any(s.kind in ("fixed", "hinge") for s in job.supports):
        return []
    from shopbeam.design.capacity import connections_at  # noqa: PLC0415 - these members only

    try:
        ends, hinges = connections_at(job, k)
    except (InputError, UnstableBeam):  # the rating stands on capacity's own solve
        return ["RATED ONLY WHILE the fixed ends' and hinges' connections carry what the rated "
                "load puts through them (see shopbeam solve; connections are not checked)."]
    sy = job.units
    parts = [f"the fixed end at {units.fmt(f['at'], 'length', sy)} develops "
             f"{units.fmt(abs(f['moment']), 'moment', sy)}"
             + (f" and {units.fmt(abs(f['moment_reversed']), 'moment', sy)} the other way"
                if f.get("moment_reversed") else "")
             + f" with {units.fmt(abs(f['force']), 'force', sy)} of shear" for f in ends]
    parts += [f"the hinge at {units.fmt(h['at'], 'length', sy)} passes "
              f"{units.fmt(abs(h['shear']), 'force', sy)}" for h in hinges]
    if not parts:
        return []
    return ["RATED ONLY WHILE " + units.and_words(parts)
            + " (the connections are not checked here)."]


def _dead_words(job) -> str:
    """What the rated live loads sit on top of: the dead loads as entered and the member's
    own weight ("" when neither)."""
    sy = job.units
    dead = [ld for ld in job.loads if ld.case == "dead"]
    parts = []
    if dead:
        force = sum(ld.total_force for ld in dead if ld.kind != "moment")
        n = len(dead)
        parts.append(("the dead load" if n == 1 else f"the {n} dead loads") + " as entered"
                     + (f" ({units.fmt(abs(force), 'force', sy)} in all)" if force else ""))
    if any(any(d for d in ws.dead) for ws in job.moving):
        parts.append("the wheel set's own weight (its dead wheel loads)")
    if job.self_weight:
        parts.append("the member's own weight")
    return units.and_words(parts) if parts else ""


def _dead_couple_words(job) -> list[str]:
    """A dead couple that lowers the largest moment the other loads make: the figure counts
    on it, and a slipped sign (+ is counterclockwise) is the usual reason it does; the label
    says so beside the figure (a live one that relieves posts no rating at all)."""
    if not any(ld.kind == "moment" and ld.case == "dead" and ld.value for ld in job.loads):
        return []
    try:
        said = couple_notes(job, sound_solve(job.beam()))
    except Exception:  # noqa: BLE001 - the rating above solved this job; nothing to add
        return []
    out = []
    for note in said:
        if note.startswith("The dead couple "):
            name = note[len("The dead couple "):].split(",")[0]
            out.append(f"CHECK THE SIGN of the dead couple {name} (+ is counterclockwise): it "
                       "lowers the largest bending moment, and this figure counts on it.")
    return out


def rating(cap, unchecked=(), date: _dt.date | None = None) -> Rating:
    """The rating of a capacity result in shop words (see the module doc).

    `unchecked` are the job's `design.checks.Unchecked` records (from `analyze(job).unchecked`).
    """
    job = cap.job
    sy = job.units
    k = cap.factor
    reasons = [str(r) for r in (getattr(cap, "not_rated", ()) or ())]
    for u in unchecked:
        if getattr(u, "blocks_rating", True) and u.name not in JUDGED_AT_RATED_LOAD:
            why = f"{u.name} was not checked: {u.reason}"
            if why not in reasons and not any(u.name in r for r in reasons):
                reasons.append(why)
    figs: list = []
    notes: list = []
    if reasons:
        status = "not rated"
    elif not math.isfinite(k):
        status = "nothing to rate"
        notes.append(cap.note or "no live load entered: enter the load to rate as a live load")
    elif k <= 0:
        status = "do not load"
        notes.append(cap.note or "the member fails under its own weight and the dead loads")
    else:
        status = "rated"
        figs, notes = _figures(job, k)
        notes += _connection_words(job, k)
        notes += _weld_words(job, cap)
        notes += _tag_words(job)
        notes += _dead_couple_words(job)
        if fatigue.given(job) and not math.isfinite(fatigue.job_range(job)):
            c = job.criteria
            cls = fatigue.bth_class(job)
            notes.append(f"No fatigue check: {c.cycles:,.0f} load cycles are too few to need "
                         "one (" + ("ASME BTH-1 service class 0" if cls is not None else
                                    "under 20,000, AISC 360-16 Appendix 3.1")
                         + ", from memory).")
        elif fatigue.given(job):
            c = job.criteria
            cls = fatigue.bth_class(job)
            notes.append(f"Fatigue checked at this rating: a category {c.fatigue_category} "
                         f"detail, {c.cycles:,.0f} load cycles ("
                         + (f"ASME BTH-1 service class {cls[0]}; " if cls is not None else
                            "AISC 360-16 Appendix 3; ")
                         + "the largest live stress range along the member).")
        imp = impact_of(job)
        if imp:
            notes.insert(0, f"Includes a {imp * 100:.3g}% impact allowance on the live "
                         "loads.")
    sups = sorted({s.at for s in job.supports if s.kind != "hinge"})
    span = (units.fmt(job.length, "length", sy) + " (supports at "
            + ", ".join(units.fmt(x, "length", sy) for x in sups) + ")")
    pc = present_capacity(cap)
    unch = tuple(f"{u.name}" + (f" ({u.clause})" if u.clause else "") + f": {u.reason}"
                 for u in unchecked)
    return Rating(
        title=job.title, member=f"{job.section.designation}{_stands(job.section)}, "
                                f"{job.material.key}{_wall_words(job, sy)}", span=span,
        factor=float(k), figures=tuple(figs), not_rated=tuple(reasons), status=status,
        governing=pc.governing_name, basis=BASIS_SHORT[basis_of(job)] + _design_factor_words(job),
        date=(date or _dt.date.today()).isoformat(), lifting=job.lifting,
        cautions=tuple(cautions_for(job.tags, job.caution_lifting)), unchecked=unch, notes=tuple(notes),
        warnings=tuple(f"{p.key}: {_first_clause(p.message)}" for p in job.warnings
                       if getattr(p, "warning", False)),
        lifting_profile=_profile_name(job),
        governing_state=pc.governing_state if status == "rated" else "",
        governing_how=_governing_how(job, cap) if status == "rated" else "",
        uplift=pc.uplift if status == "rated" else (),
        uplift_head="UPLIFT at the rated load" + (" (each member)" if job.members > 1 else "")
        + ": anchor",
        reactions=tuple(e.words() for e in pc.envelope)
        if status == "rated" else (),
        reactions_head="SUPPORTS must carry at the rated load (" + (
            "each member, " if job.members > 1 else "") + "+ up; their brackets, seats, "
        "hangers and anchors are not checked here)")


def _up(ld, words: str = "UPWARD ") -> str:
    """`words` for a load that pushes up (a figure with no direction reads as a weight)."""
    return words if ld.kind != "moment" and ld.total_force > 0 else ""


def _sideways_words(job) -> list[str]:
    """A lifting profile's lateral trolley force: the member is checked for it (the lateral
    trolley force check), but the supports' and a fixed end's figures on the label are the
    vertical ones; the hangers, seats and a jib's mast take it too."""
    from shopbeam.design.lifting import profile_of

    prof = profile_of(job)
    if prof is None or not prof.lateral:
        return []
    fixed = any(s.kind == "fixed" for s in job.supports)
    return [f"The supports{' and the fixed end' if fixed else ''} also take the trolley's "
            f"SIDEWAYS force, {prof.lateral:.0%} of rated load + hoist + trolley at the bottom "
            "flange (ASCE 7-16 4.9.4, from memory)"
            + (", and the sideways bending and twist it makes at the root" if fixed else "")
            + ": not in the figures here, and not checked."]


def _design_factor_words(job) -> str:
    """A below-the-hook device's ASME BTH-1 design category and factor, beside the basis: the
    same basis line posts 1.5 times as much under Category A as under B's Nd 3.0 (none for
    other jobs)."""
    from shopbeam.design.lifting import profile_of

    prof = profile_of(job)
    if prof is None or not prof.nd:
        return ""
    return f" with ASME BTH-1 Design Category {prof.category}, Nd {prof.nd:g}"


def _profile_name(job) -> str:
    from shopbeam.design.lifting import profile_of

    prof = profile_of(job)
    return prof.name if prof else ""


def _lifting_words(r: Rating) -> str:
    """The lifting line of a label: the profile the numbers used, and what must follow."""
    return ("LIFTING DEVICE" + (f" ({r.lifting_profile} profile)" if r.lifting_profile else "")
            + ": proof load test and marking by a qualified engineer required before use. "
            + ("BEAM ONLY: the device's rated load is the LEAST of this figure and the rated "
               "loads of the hoist, trolley, hangers, connections and rigging; mark the least."
               if r.status == "rated" else
               "No figure is posted for the beam here; once it is rated, the device's rated "
               "load is the LEAST of the beam's figure and the rated loads of the hoist, "
               "trolley, hangers, connections and rigging."))


# ------------------------------------------------------------------ 40-column label
def label_text(r: Rating, width: int = 40) -> str:
    """A plain-text label no wider than `width` columns (30 to 200)."""
    if width < 30 or width > 200:
        raise InputError("a label is 30 to 200 characters wide", "--width")
    inner = width - 4
    out: list[str] = []

    def rule(ch="="):
        out.append("+" + ch * (width - 2) + "+")

    def row(text="", indent=""):
        for piece in (wrap(text, inner, subsequent_indent=indent) or [""]):
            out.append("| " + piece.ljust(inner) + " |")

    rule()
    row("LOAD RATING".center(inner))
    rule("-")
    row(r.title)
    row("")
    row(f"Member: {r.member}")
    row(f"Span: {r.span}")
    rule("-")
    _body(r, row)
    if r.governing and r.status == "rated":
        row(f"Governing check: {r.governing}")
        if r.governing_how:
            row(f"  {r.governing_how}", "  ")
        if r.governing_state:
            row(f"  worst with {r.governing_state}", "  ")
    if r.uplift:
        row(r.uplift_head)
        for u in r.uplift:
            row("- " + u, "  ")
    if r.reactions:  # the rating rests on the brackets, seats and anchors carrying these
        row(r.reactions_head + ":")
        for line in r.reactions:
            row("- " + line, "  ")
    for w in r.warnings:
        row(f"INPUT WARNING {w} (see shopbeam check)")
    row(f"Basis: {r.basis}")
    row(f"Date: {r.date}")
    rule("-")
    if r.lifting:
        row(_lifting_words(r))
    else:
        row(_lifting_band(r))
    if r.unchecked:
        rule("-")
        row("NOT CHECKED:")
        for u in r.unchecked:
            row("- " + u, "  ")
    rule("-")
    for c in r.cautions:
        row(c)
    rule()
    from shopbeam.escapes import shown

    return shown("\n".join(out), keep="\n") + "\n"


def _body(r: Rating, row) -> None:
    if r.status == "not rated":
        row("NOT RATED")
        for why in r.not_rated:
            row("- " + why, "  ")
        return
    if r.status == "do not load":
        row("DO NOT LOAD: " + "; ".join(r.notes))
        return
    if r.status == "nothing to rate":
        row("No live load entered: nothing to rate")
        return
    group = ""
    for f in r.figures:
        if f.group != group:
            group = f.group
            row(group + ":")
        ind = "  " if group else ""
        row(f"{ind}{f.label}: {f.value}", ind + "  ")
        if f.note:
            row(f"{ind}  ({f.note})", ind + "   ")
    for n in r.notes:
        row(n)


# ------------------------------------------------------------------ full-page plaque
def plaque_text(r: Rating, width: int = 78) -> str:
    """The full-page plaque as plain text (fits a letter or A4 page at 10 characters per inch):
    the label, with what each support carries at the rated load, at the plaque's width."""
    return label_text(r, width)


def _long(r: Rating) -> bool:
    """A plaque whose figures and notes would run past one page in the full-size type."""
    words = sum(len(f.note) + 40 for f in r.figures) + sum(len(n) for n in r.notes)
    words += sum(len(x) for x in r.not_rated) + 60 * len(r.reactions)
    return len(r.figures) + len(r.notes) >= 6 or words > 700


def css_string(text: str) -> str:
    """Text as a CSS string literal (for @page margin boxes)."""
    out = text.replace("\\", "\\\\").replace('"', '\\"').replace("\n", " ")
    # < and > as CSS escapes: the string sits inside a <style> element, where a "</style>"
    # in a title would end it and let markup (a script) run in the package
    out = out.replace("<", "\\3c ").replace(">", "\\3e ")
    return '"' + "".join(ch if ch.isprintable() else " " for ch in out) + '"'



def plaque_html(r: Rating, paper: str = "letter") -> str:
    """The full-page plaque as a self-contained printable HTML page (big type, one page)."""
    e = escape
    size = "A4" if paper.lower() == "a4" else "letter"
    # a plaque long enough for a second sheet: every sheet names the member, is numbered and
    # carries the caution at its foot (the lifting one too on a lifting device)
    warn = banner((), r.lifting)
    margins = ("@top-left{content:" + css_string(f"Load rating: {r.title}"[:110])
               + ";font-size:8pt}@bottom-left{content:" + css_string(warn)
               + ";font-size:7.5pt;font-weight:bold}"
               '@bottom-right{content:"Sheet " counter(page) " of " counter(pages);'
               "font-size:8pt}")
    h = ["<!DOCTYPE html>", '<html lang="en"><head><meta charset="utf-8">',
         f"<title>Load rating: {e(r.title)}</title><style>",
         "@page{size:" + size + ";margin:14mm;" + margins + "}"
         "body{font-family:'DejaVu Sans','Liberation Sans',Arial,sans-serif;margin:0 auto;"
         "max-width:182mm;color:#000}"
         ".plaque{border:4pt solid #000;padding:8mm}"
         "h1{font-size:30pt;text-align:center;margin:0 0 4mm;letter-spacing:2pt}"
         ".title{font-size:15pt;text-align:center;margin-bottom:5mm}"
         ".fig{font-size:20pt;font-weight:bold;margin:3mm 0 0}"
         ".group{font-size:13pt;font-weight:bold;margin:4mm 0 0;border-bottom:1pt solid #000}"
         ".note{font-size:10.5pt;margin:0 0 2mm 6mm}"
         ".notrated{font-size:30pt;font-weight:bold;text-align:center;border:3pt solid #b00000;"
         "color:#b00000;padding:3mm;margin:4mm 0}"
         ".meta{font-size:11pt;margin:1mm 0}"
         ".lift{font-size:13pt;font-weight:bold;border:2pt solid #000;padding:2mm;margin:4mm 0}"
         ".caution{font-size:10pt;font-weight:bold;margin:2mm 0}"
         "ul{margin:1mm 0 2mm 5mm;padding-left:4mm;font-size:10.5pt}"
         ".plaque{break-inside:avoid}"
         # a plaque with many figures or notes (a rack bay, say) uses smaller type so it
         # still prints on one page
         ".compact .plaque{padding:5mm}.compact h1{font-size:24pt;margin:0 0 2mm}"
         ".compact .title{font-size:13pt;margin-bottom:3mm}"
         ".compact .fig{font-size:15pt;margin:2mm 0 0}"
         ".compact .group{font-size:11.5pt;margin:3mm 0 0}"
         ".compact .note,.compact ul{font-size:9.5pt}.compact .meta{font-size:10pt}"
         ".compact .caution{font-size:9pt;margin:1mm 0}.compact .lift{font-size:11pt}"
         "</style></head><body" + (' class="compact"' if _long(r) else "")
         + "><div class=plaque>",
         "<h1>LOAD RATING</h1>", f'<div class="title">{e(r.title)}</div>']
    if r.status == "not rated":
        h.append('<div class="notrated">NOT RATED</div><ul>'
                 + "".join(f"<li>{e(x)}</li>" for x in r.not_rated) + "</ul>")
    elif r.status == "do not load":
        h.append('<div class="notrated">DO NOT LOAD</div><p>' + e("; ".join(r.notes)) + "</p>")
    elif r.status == "nothing to rate":
        h.append('<div class="notrated">NOT RATED</div><p>No live load entered: nothing to '
                 "rate.</p>")
    else:
        group = ""
        for f in r.figures:
            if f.group != group:
                group = f.group
                h.append(f'<p class="group">{e(group)}</p>')
            h.append(f'<p class="fig">{e(f.label)}: {e(f.value)}</p>')
            if f.note:
                h.append(f'<p class="note">{e(f.note)}</p>')
        h.append("<ul>" + "".join(f"<li>{e(n)}</li>" for n in r.notes) + "</ul>")
    h.append(f'<p class="meta">Member: {e(r.member)}</p><p class="meta">Span: {e(r.span)}</p>')
    if r.governing and r.status == "rated":
        h.append(f'<p class="meta">Governing check: {e(r.governing)}'
                 + (f"; {e(r.governing_how)}" if r.governing_how else "")
                 + (f" (worst with {e(r.governing_state)})" if r.governing_state else "")
                 + "</p>")
    if r.reactions:
        h.append(f"<p class=meta><b>{e(r.reactions_head)}</b></p><ul>"
                 + "".join(f"<li>{e(x)}</li>" for x in r.reactions) + "</ul>")
    if r.uplift:
        h.append(f"<p class=meta><b>{e(r.uplift_head)}</b></p><ul>"
                 + "".join(f"<li>{e(u)}</li>" for u in r.uplift) + "</ul>")
    h += [f'<p class="meta"><b>INPUT WARNING</b> {e(w)} (see shopbeam check)</p>'
          for w in r.warnings]
    h.append(f'<p class="meta">Basis: {e(r.basis)} &nbsp; Date: {e(r.date)}</p>')
    h.append('<div class="lift">' + e(_lifting_words(r) if r.lifting else _lifting_band(r))
             + "</div>")
    if r.unchecked:
        h.append("<p class=meta><b>Not checked:</b></p><ul>"
                 + "".join(f"<li>{e(u)}</li>" for u in r.unchecked) + "</ul>")
    h += [f'<p class="caution">{e(c)}</p>' for c in r.cautions]
    h.append("</div></body></html>")
    return "\n".join(h) + "\n"
