"""Capacity and rating: the largest multiplier k of the live loads with every check passing.

Dead loads and self-weight stay fixed; every live load (patterned and moving ones too, with
the impact allowance on top) is multiplied by k. Each load state is the superposition
fixed + k x live of solutions solved once, so a check's demand is exact at any k. When
nothing is fixed every ratio is proportional to k (Cb does not change when the whole diagram
scales) and k = 1 / ratio(1) in closed form. Otherwise the governing ratio g(k) is found
equal to 1 by a bracketed root search (Brent's method, written here): bracket [0, k_hi]
with g(0) <= 1 < g(k_hi), then converge to working precision, keeping the side that passes.
Cb changes with the shape of the moment diagram, so g is not linear in k; the bracket makes
the answer safe anyway. For patterned jobs g(k) at each trial factor is read from the exact
pattern envelopes (`loading.envelope_ratio`: the same number as a full evaluation, without
building the checks) and only the answer is evaluated in full.

`shopbeam capacity` (cli/design.py) prints it (or the contract JSON with "factor"); the rating
label and plaque in shop words are `shopbeam.output.label`.
"""

from __future__ import annotations

import math
from dataclasses import dataclass, replace

from shopbeam import units
from shopbeam.design.checks import BASIS_WORDS, Check, basis_of, governing, strengths
from shopbeam.design.loading import (Evaluation, envelope_ratio,
                                     moving_reactions_off, variant_words,
                                     envelope_ratio_applies, evaluate, state_set)
from shopbeam.design.analysis import (analyze, cantilever_top_limits, hogging_demands,
                                       flange_word, hogging_check, hogging_computed,
                                       hogging_checks, hogging_dead_check,
                                       tip_brace_words,
                                       travelling_hook, hogging_limits, hogging_remedy,
                                       cantilever_top_demands, top_flange_check,
                                       travel_words,
                                       hogging_source,
                                       moment_ranges, wheels_count_on_top,
                                       span_top_limits, NOT_JUDGED, SPAN_TOP_CHECK,
                                       span_top_checks, span_top_demands, span_top_rows,
                                       top_words, unchecked_for, wheels_with_top_words)
from shopbeam.design.analysis import bending_s
from shopbeam.design.analysis import to_json as base_json
from shopbeam.design.connections import fixed_end_moments, hinge_shears
from shopbeam.design.checks import impact_of
from shopbeam.design.loading import read_moving
from shopbeam.engine.model import Beam, segments
from shopbeam.members.catalog import other_metal_on_steel_shape
from shopbeam.engine.solver import sound_solve
from shopbeam.design.lifting import profile_of
from shopbeam.design import fatigue, uplift
from shopbeam.cautions import RACK_TAGS
from shopbeam.jobs.rules import rack_arm
from shopbeam.jobs.jobfile import (HOIST_NEAR, STUBBY_LIMIT, WheelSet, grade_gap, kind_mismatch, lifting_uniform_words,
                                   strength_slip, stubby_words, thickness_gap,
                                   wood_gap)


# ------------------------------------------------------------------ root finding
def brent(f, a: float, b: float, fa: float | None = None, fb: float | None = None,
          xtol: float = 0.0, rtol: float = 4e-16, maxiter: int = 200) -> tuple[float, float, float, float]:
    """Zero of f in [a, b] where f(a) and f(b) differ in sign (Brent 1973).

    Returns the final bracket (x1, f1, x2, f2), f1 and f2 of opposite sign (or one of them
    zero): the caller picks the side it needs.
    """
    fa = f(a) if fa is None else fa
    fb = f(b) if fb is None else fb
    if fa == 0:
        return a, fa, a, fa
    if fb == 0:
        return b, fb, b, fb
    if fa * fb > 0:
        raise ValueError("brent: the interval does not bracket a root")
    c, fc = a, fa
    d = e = b - a
    for _ in range(maxiter):
        if fb * fc > 0:
            c, fc = a, fa
            d = e = b - a
        if abs(fc) < abs(fb):
            a, b, c = b, c, b
            fa, fb, fc = fb, fc, fb
        tol = 2 * rtol * abs(b) + 0.5 * xtol
        m = 0.5 * (c - b)
        if abs(m) <= tol or fb == 0:
            break
        if abs(e) >= tol and abs(fa) > abs(fb):
            s = fb / fa
            if a == c:
                p, q = 2 * m * s, 1 - s
            else:
                q, r = fa / fc, fb / fc
                p = s * (2 * m * q * (q - r) - (b - a) * (r - 1))
                q = (q - 1) * (r - 1) * (s - 1)
            if p > 0:
                q = -q
            p = abs(p)
            if 2 * p < min(3 * m * q - abs(tol * q), abs(e * q)):
                e, d = d, p / q
            else:
                d = e = m
        else:
            d = e = m
        a, fa = b, fb
        b += d if abs(d) > tol else math.copysign(tol, m)
        fb = f(b)
    return (b, fb, c, fc)


# ------------------------------------------------------------------ capacity
@dataclass(frozen=True)
class CapacityResult:
    job: object
    factor: float  # k; inf when there are no live loads; 0 when the fixed loads fail alone
    evaluation: Evaluation | None
    method: str
    note: str = ""
    # why no load may be posted although k is computed (a limit state not checked, a failed
    # self-check); empty when the rating stands
    not_rated: tuple[str, ...] = ()
    # the check whose limit drops just past k, where that sets the factor though its ratio at
    # k is under 1 (web sidesway buckling's Cr step): it governs, not the largest ratio
    stepped: str = ""

    @property
    def rated(self) -> bool:
        """A load may be posted: nothing withholds it and there is a factor to post (none
        when the job has no live loads, or they make no demand, and none when the member
        fails under its own weight and dead loads alone: k = 0, DO NOT LOAD)."""
        return not self.not_rated and math.isfinite(self.factor) and self.factor > 0

    @property
    def checks(self) -> tuple[Check, ...]:
        return self.evaluation.checks if self.evaluation else ()

    @property
    def governing(self) -> Check | None:
        if self.stepped:
            c = next((c for c in self.checks if c.name == self.stepped), None)
            if c is not None:
                return c
        return governing(list(self.checks)) if self.checks else None


# A governing ratio under the live loads as entered below this is rounding, not demand (a
# load on a support leaves deflections of 1e-19 in): the factor would be 1e17 or more, a
# number with no meaning, so it is reported as no demand (factor null in the JSON).
NO_DEMAND = 1e-9


def _has_live(ss) -> bool:
    p = ss.parts
    return bool(p.live or p.patterned or (p.moving and any(p.moving[0].live)))


def _fixed_is_zero(ss) -> bool:
    p = ss.parts
    dead = [ld for ld in p.fixed if ld.total_force != 0 or ld.kind == "moment" and ld.value]
    return not dead and not (p.moving and any(p.moving[0].dead))


def not_rated_reasons(job, st, ss) -> tuple[str, ...]:
    """Why a capacity must not be posted: every limit state the member calls for that was not
    checked and would block a rating, a load that pushes up unmarked (a sign mistake), and any
    failed self-check of the solve."""
    out = list(rating_gaps(job, st))
    bad = sorted({d.name for sol in (ss.fixed, ss.live) for d in sol.diagnostics if not d.ok})
    if bad:
        out.append("a self-check of the solve did not pass (" + ", ".join(bad) + ")")
    return tuple(out)


UPWARD_GAP = "load(s) push UP"  # how `rating_gaps` names loads pointing up (a verdict's own)


def held_besides(result) -> list[str]:
    """Why no rating may be posted besides what a verdict already names (the limit states
    not checked, loads pointing up): an input problem that holds the rating, a rack with no
    impact, a job that reads like a lifting device... For `result`, an analysis Result."""
    job = result.job
    gaps = rating_gaps(job, strengths(job, beam=result.solution.beam))
    named = [u.name for u in result.unchecked if u.blocks_rating]
    return [g for g in gaps if not g.startswith(UPWARD_GAP)
            and not any(g.startswith(f"{n} not checked") for n in named)]


def solve_reasons(result) -> list[str]:
    """What solve can say of why capacity would post no rating (solve --json
    `not_rated_reasons`): the limit states not checked that block one, and the job's and
    member's own holds (a forgotten impact, a hold the reader made); capacity adds what it
    finds at the rated load."""
    out = [f"{u.name} not checked ({u.clause}): {u.reason}" if u.clause else
           f"{u.name} not checked: {u.reason}" for u in result.unchecked if u.blocks_rating]
    # loads pointing up unmarked: the solve's verdict names them, and capacity holds on them
    up = [g for g in job_gaps(result.job) if g.startswith(UPWARD_GAP)]
    return out + [g for g in held_besides(result) + up if g not in out]


def rating_gaps(job, st) -> tuple[str, ...]:
    """`not_rated_reasons` of the member and the job alone, without a solve's self-checks (a
    sizing sweep asks it of sections it never solves one by one): the member's own gaps (its
    section and grade), then the job's (`job_gaps`, the same for every section)."""
    return member_gaps(job, st) + job_gaps(job)


def member_gaps(job, st) -> tuple[str, ...]:
    """The rating gaps that come with the section and grade: limit states the member calls
    for that are not checked, a grade that does not hold for the shape, thickness or kind,
    a stubby member."""
    sec = getattr(st, "section", None) or job.section
    out = [f"{u.name} not checked ({u.clause}): {u.reason}" for u in unchecked_for(job, st)
           if u.blocks_rating]
    gap = grade_gap(sec, job.material, job.units)
    if gap:
        out.append(gap)
    gap = wood_gap(sec, job.material)
    if gap:
        out.append(gap)
    gap = other_metal_on_steel_shape(sec, job.material)
    if gap:
        out.append(gap)
    mixed = kind_mismatch(job.material, job.units)
    if mixed:
        out.append(f"the typed-in material's {mixed}. Fix e or the kind")
    slip = strength_slip(job.material, job.units)
    if slip:
        out.append(f"the typed-in material's {slip}. Fix fy and its unit")
    if job.length < STUBBY_LIMIT * (getattr(sec, "depth", 0.0) or 0.0):
        out.append(stubby_words(job.length, sec, job.units))
    thick = thickness_gap(sec, job.material, getattr(job, "welded", False), job.units)
    if thick:
        out.append(thick)
    return tuple(out)


def job_gaps(job) -> tuple[str, ...]:
    """The rating gaps of the job itself, whatever the section: its loads, tags and keys (a
    sizing sweep works them out once: with one, no section can be rated)."""
    out = []
    upward = getattr(job, "upward", ())
    if upward:
        out.append(f"{UPWARD_GAP} with no uplift = true, almost always a forgotten minus sign "
                   "(forces are + up, a weight is negative): " + ", ".join(upward)
                   + ". Fix the sign, or mark a load that really pushes up uplift = true")
    live_at = [k for k in getattr(job, "at_support", ()) if _is_live(job, k)]
    if live_at:  # a dead one is never posted: its warning says where it went
        out.append("live load(s) on a support go straight into it and the member's checks do "
                   "not see them, so a rating would post a load never checked: "
                   + ", ".join(live_at)
                   + ". Move each to where it acts (e.g. a cantilever's tip), or remove it")
    out += list(getattr(job, "long_bearings", ()))
    out += _live_both_ways(job) + _live_on_spans_unpatterned(job)
    out += _lifting_spread(job)
    if getattr(job, "members", 1) > 1 and (job.moving or job.lifting
                                            or getattr(job.criteria, "lifting", "")):
        out.append(f"members = {job.members} shares the loads among {job.members} beams, but a "
                   "trolley runs on one beam's flange and a hoist hangs from one beam: its "
                   "wheel and hook loads do not divide between members, and the per-wheel "
                   "figure would be posted for all of them together. Rate each runway beam "
                   "on its own (members = 1) with the trolley or hoist it carries")
    bth = getattr(job, "bth_hint", "")
    if bth:
        out.append(f"it reads like a below-the-hook device ({bth}) but names no lifting "
                   "profile: the guessed monorail or jib profile uses AISC Omega, not the "
                   "ASME BTH-1 design factor. Write lifting = \"below-the-hook\" under "
                   "[criteria], or the profile it is")
    road = getattr(job, "vehicle_hint", "")
    if road:
        out.append(f"it reads like a member of a road vehicle or mobile machine ({road}) but gives no impact: "
                   "road shock multiplies the payload, so a static figure would overstate it. "
                   "Write [criteria] impact = \"100%\" (or the vehicle maker's figure), "
                   "impact = \"0%\" for a member only loaded while parked, or the tag "
                   "\"not-vehicle\" if it is not on a vehicle")
    gap = getattr(job.criteria, "factor_gap", "")
    if gap:
        out.append(gap)
    keys = getattr(job, "factor_keys", ())
    if keys:
        out.append("the job writes a safety factor shopbeam does not read (" + ", ".join(keys)
                   + "), so it is not applied. The factor key is [criteria] safety_factor "
                   "(the factor on yield in bending); write it there, or remove the key")
    cuts = getattr(job, "cut_keys", ())
    if cuts:
        out.append("the job says the member is cut (" + ", ".join(cuts) + "): notches, copes, "
                   "holes and cut-outs are not modelled, and the checks are of the full section "
                   "the cut weakens. Have the cut member checked, or remove the key if it is "
                   "not cut")
    rolling = getattr(job, "rolling_keys", "")
    if rolling:
        out.append(f"{rolling} on the [[moving]] set say{'' if ' and ' in rolling else 's'} a trolley hangs from the bottom "
                   "flange, but on a job not tagged lifting its wheels are taken as rolling on "
                   "the top flange and the flange checks under them are not made. Tag the job "
                   "\"lifting\", or remove the key(s) for a cart on top")
    out += list(getattr(job, "holds", ()))
    out += _rack_impact_gap(job)
    hint = getattr(job, "lifting_hint", "")
    if hint:
        out.append(f"it reads like a lifting device ({hint}) but is not tagged lifting, so the "
                   "impact allowance and the lifting deflection limit were not applied. Add "
                   "tags = [\"lifting\"], or the tag \"not-lifting\" if it is not one")
    return tuple(out)


def _rack_impact_gap(job) -> list[str]:
    """A storage-rack member rated with no impact: a rack beam is designed for the product
    load plus an impact load (ANSI MH16.1: 25 % of one unit load where it does most harm),
    a cantilever-rack arm for the loads ANSI MH16.3 sets (both from memory). A job that
    gives `impact` (even "0%", said on purpose) is rated; a load entered for the impact is
    not enough (it would be posted as product)."""
    if not RACK_TAGS.intersection(job.tags) or job.criteria.impact is not None:
        return []
    if rack_arm(job.tags, job.supports, job.length):
        return ["a cantilever-rack arm is rated for its load with the allowance ANSI MH16.3 "
                "sets for placing it with a lift truck or crane (from memory), and the job "
                "gives no impact: write [criteria] impact = \"25%\" (or the rack maker's "
                "figure)"]
    return ["a storage-rack beam is rated for the product load plus an impact load (ANSI "
            "MH16.1: 25 % of one unit load, where it does the most harm; from memory), and the "
            "job gives none: write [criteria] impact = \"25%\" (on every live load: on the "
            "safe side; a load entered for the impact would be posted as product)"]


def _lifting_spread(job) -> list[str]:
    """A lifting job whose live loads are all uniform or linear (the hook load typed as a
    uniform load): a hoist bears at a point, and the wheel-on-flange and lateral checks apply
    to point loads only, so nothing is posted (the reader warns it too)."""
    if profile_of(job) is None or read_moving(job):
        return []
    live = [ld for ld in job.loads if ld.case == "live" and ld.kind != "moment"
            and ld.total_force]
    if not live or any(ld.kind == "point" for ld in live):
        return []
    return [lifting_uniform_words(live)]


def _is_live(job, words: str) -> bool:
    """Whether the load a `Job.at_support` entry names ("loads[2] (bin) at the pin ...") is
    live."""
    key = words.split(" ", 1)[0]
    return any(ld.key == key and ld.case == "live" for ld in job.loads)


def _live_both_ways(job) -> list[str]:
    """Live loads that push both ways: k scales them together, so at the rated figure the
    ones that push one way hold back the others. A relieving load is never counted on at its
    full, scaled value (common practice: wind does not relieve snow, a stored load does not
    relieve an uplift), so nothing is posted from such a job."""
    down, up = [], []
    for ld in job.loads:
        if ld.case != "live" or ld.kind == "moment":
            continue
        ends = (ld.value,) if ld.kind == "point" else \
            (ld.w1, ld.w1 if ld.kind == "uniform" else ld.w2)
        name = ld.key + (f" ({ld.label})" if ld.label else "")
        if any(v < 0 for v in ends):
            down.append(name)
        if any(v > 0 for v in ends):
            up.append(name)
    for mv in read_moving(job):
        if any(v < 0 for v in mv.live):
            down.append(mv.key)
        if any(v > 0 for v in mv.live):
            up.append(mv.key)
    if not (down and up):
        return []
    return [f"live loads push both ways ({', '.join(down)} down; {', '.join(up)} up): the "
            "factor scales them together, so at the rated figure one relieves the other, and "
            "a load that relieves is never counted on at its full scaled value. Rate each "
            "direction in its own job, or enter a relieving load that pushes down as case = "
            "\"dead\" at a value it is sure to have (one that pushes up is never counted on "
            "as dead)"]


def _live_on_spans_unpatterned(job) -> list[str]:
    """Live loads on more than one span or overhang, not patterned: the factor holds only
    while every one of them is on at once. Loading some spans and not the others is worse
    for some checks (a span beside an empty one sags more; a load on an overhang lifts the
    span behind it), and a posted load is read as good for any arrangement."""
    segs = segments(Beam(job.length, 1.0, job.supports, ()))
    if len(segs) < 2:
        return []
    tol = 1e-9 * job.length
    # a free end belongs to its overhang (a load at a stair landing's tip is on it)
    free_lo, free_hi = segs[0][2] != "span", segs[-1][2] != "span"
    on: set[int] = set()
    for ld in job.loads:
        if ld.case != "live" or ld.patterned or not ld.total_force and ld.kind != "moment":
            continue
        for i, (a, b, _) in enumerate(segs):
            if ld.kind in ("point", "moment"):
                if (a + tol < ld.at < b - tol or (i == 0 and free_lo and ld.at <= tol)
                        or (i == len(segs) - 1 and free_hi and ld.at >= job.length - tol)):
                    on.add(i)
            elif min(b, ld.end) - max(a, ld.start) > tol:
                on.add(i)
    rolls = set()
    if on and job.moving and any(job.moving[0].live):
        # a wheel set comes and goes by itself (its every position is checked), but an
        # unpatterned static live load is taken as on with it: the stock that holds down an
        # overhang the cart runs onto is counted on (its spans are the travel's)
        t0, t1 = job.moving[0].travel
        rolls = {i for i, (a, b, _) in enumerate(segs) if min(b, t1) - max(a, t0) > tol}
    pat = set()
    if on:
        # patterned loads come and go span by span, but an unpatterned static live load is
        # taken as on in every pattern: an end bin on an overhang is counted on to hold the
        # span behind it down while the span is loaded (its spans are the patterned loads')
        for ld in job.loads:
            if ld.case != "live" or not ld.patterned or not ld.total_force:
                continue
            for i, (a, b, _) in enumerate(segs):
                if (a - tol < ld.at < b + tol if ld.kind == "point"
                        else min(b, ld.end) - max(a, ld.start) > tol):
                    pat.add(i)
    if len(on | rolls | pat) < 2:
        return []
    return [f"live loads lie on {len(on | rolls | pat)} spans and overhangs"
            + (" (the [[moving]] wheels' travel among them)" if rolls - on else "")
            + (" (the patterned loads' spans among them)" if pat - on - rolls else "")
            + ", the static ones all taken as on at once: "
            "loading only some of them can be worse (a span beside an empty one sags more; "
            "a load on an overhang lifts the span behind it), and a posted load is read as "
            "good for any arrangement. Write patterned = true on the live loads that come and "
            "go span by span, so every arrangement is checked and rated"]


def travelling(job):
    """A monorail's or jib's hoist given as a point load at its worst place (`Job.
    travelling_hoist`) as the wheel set it is: one axle of the live loads hung at the hook's
    place (the hook load, a magnet or spreader under it) with the dead loads hung within a
    foot of it (the hoist's own weight) as its dead wheel load, on the loads' wheels,
    travelling the whole member, or from the mast out to the place given on a jib's boom.
    None where there is no such hoist (`analysis.travelling_hook`), or its place has loads
    that cannot travel
    with it (set on top of the flange, live loads hung beside it): `capacity` then holds."""
    hook = travelling_hook(job)
    if hook is None:
        return None
    hung, lugs = set(job.hung), set(job.lugs)
    tol = 1e-9 * job.length
    points = [ld for ld in job.loads if ld.kind == "point" and ld.value]
    live = [ld for ld in points if abs(ld.at - hook.at) <= tol and ld.case != "dead"]
    dead = [ld for ld in points if abs(ld.at - hook.at) <= HOIST_NEAR and ld.case == "dead"]
    near_live = [ld for ld in points if ld.case != "dead" and ld not in live
                 and abs(ld.at - hook.at) <= HOIST_NEAR]
    if near_live or any(ld.key not in hung or ld.key in lugs for ld in live + dead):
        return None
    gone = {ld.key for ld in live + dead}
    held = sorted(sp.at for sp in job.supports if sp.takes_force)
    travel = (0.0, job.length)
    if held and hook.at > held[-1]:
        travel = (0.0, hook.at)
    elif held and hook.at < held[0]:
        travel = (hook.at, job.length)
    ws = WheelSet(label=hook.label or "hoist", live=(sum(ld.value for ld in live),),
                  dead=(sum(ld.value for ld in dead),), offsets=(0.0,),
                  travel=travel, key="moving[0]",
                  wheels_per_axle=max(job.contacts.get(k, 0) for k in gone) or 2)
    return replace(job, loads=tuple(ld for ld in job.loads if ld.key not in gone),
                   moving=(ws,), hung=tuple(k for k in job.hung if k not in gone),
                   hung_default=tuple(k for k in job.hung_default if k not in gone),
                   contacts={k: v for k, v in job.contacts.items() if k not in gone},
                   travelling_hoist="")


def hoist_travels(job) -> bool:
    """Whether `capacity` rates the job's point-load hoist travelling (the label says so)."""
    return travelling(job) is not None


def hoist_at(job) -> float:
    """Where the travelling hoist's hook load is given (nan where there is none)."""
    hook = travelling_hook(job)
    return hook.at if hook is not None else math.nan


def capacity(job, section=None, ss=None) -> CapacityResult:
    """The largest live-load multiplier k with every check passing (exact, see module doc).
    A hoist given as a point load at its worst place is rated travelling the member (its
    supports and shear are worst beside a hanger or the mast): the checks, the state that
    governs and what the supports carry are the travelling hoist's, the figures the job's."""
    moved = travelling(job)
    if moved is not None:
        res = capacity(moved, section)
        return replace(res, job=job)
    res = _rate(job, section, ss)
    hook = travelling_hook(job)
    if hook is not None:  # a travelling hoist whose loads cannot all travel with it
        f = lambda x: units.fmt(x, "length", job.units)  # noqa: E731
        res = replace(res, not_rated=res.not_rated + (
            f"the hoist ({hook.key}) travels, but the loads at and around its place ({f(hook.at)}) "
            "cannot all be moved with it (a load set on top of the flange there, or another "
            "live load hung beside it), so it is checked at that place only and no rating is "
            "posted for a travelling hoist. Give the hoist as a [[moving]] wheel set (the "
            "hook load and its attachments as the axle load, the hoist's weight as dead)",))
    return res


def _rate(job, section=None, ss=None) -> CapacityResult:
    """`capacity` of the job as given (a wheel set of unequal axles is checked either way
    round by `loading.evaluate` itself)."""
    ss = ss or state_set(job, section)
    st = strengths(job, sec=section, beam=ss.beam)
    reasons = not_rated_reasons(job, st, ss)
    res = _fatigue_cap(job, section, ss, st, _capacity(job, section, ss, st))
    res = _cantilever_top_rate(job, section, ss, st, res)
    res = _span_top_rate(job, section, ss, st, res)
    res = _hogging_rate(job, section, ss, st, res)
    res = _with_live_off(job, section, ss, st, res)
    res = replace(res, not_rated=reasons + solved_gaps(job, st, ss, res.factor)
                  + _relieving_couples(job, section, res.factor)
                  + _relieving_dead_couples(job, section, res.factor))
    return _held_down(job, section, ss, st, res) if uplift.applies(job) else res


def _held_down(job, section, ss, st, res: CapacityResult) -> CapacityResult:
    """A live load that pushes up, held down by the dead loads: the job is rated again with
    them at 0.6 (`design.uplift`, ASCE 7-16 2.4.1 combination 7), and the lower factor is
    posted. Every reason to withhold a rating found either way is kept; each support's range
    at the factor posted takes both (and the dead loads alone in full: the most a support is
    pushed down)."""
    job6 = uplift.held_down(job)
    held = _rate(job6, section)
    k, k6 = res.factor, held.factor
    reasons = tuple(dict.fromkeys(res.not_rated + held.not_rated))
    if not k6 < k * (1 - 1e-12):
        # (`res` has its live-off rows already; the rows at 0.6 D are named so)
        return replace(_supports_both_ways(res, job6, section, k), not_rated=reasons)
    e = held.evaluation
    full = evaluate(job, k6, section, ss, st) if e is not None \
        and math.isfinite(k6) and k6 > 0 else None
    if full is not None:
        # each check at the factor found, the worse of the dead loads in full and at 0.6
        # (named where 0.6 D is worse), and the supports' rows over both
        e = replace(e, checks=tuple(uplift.merge(full.checks, e.checks)),
                    reactions=tuple(uplift.widen(full.reactions, e.reactions))
                    if e.reactions else e.reactions)
    elif e is not None:
        e = replace(e, checks=tuple(uplift.mark(c) for c in e.checks))
    held = replace(held, job=job, evaluation=e)
    held = _with_live_off(job, section, ss, st, held)
    said = (f"the dead loads at 0.6 against the uplift govern ({uplift.CLAUSE}); with them "
            f"in full the factor would be {k:.4g}")
    return replace(held, note="; ".join(x for x in (held.note, said) if x), not_rated=reasons)


def _supports_both_ways(res: CapacityResult, job6, section, k: float) -> CapacityResult:
    """`res` with each support's range at the factor k (the dead loads in full) widened by
    the job's at 0.6 D (`job6`) at k."""
    e = res.evaluation
    if e is None or not e.reactions or not math.isfinite(k) or k <= 0:
        return res
    got = evaluate(job6, k, section).reactions
    return replace(res, evaluation=replace(e, reactions=tuple(uplift.widen(e.reactions, got))))


def _with_live_off(job, section, ss, st, res: CapacityResult) -> CapacityResult:
    """What the supports carry "up to" the rated load includes none of it: each support's
    reaction range at the factor found is widened by the state with the live loads off
    (k = 0: the dead loads, and a wheel set's dead weight over its travel), so a support the
    dead loads alone pull down (equipment on an overhang, the storage in the span off) is
    listed as uplift and its anchor force given."""
    k = res.factor
    e = res.evaluation
    if e is None or not e.reactions or not math.isfinite(k) or k <= 0:
        return res
    if ss.parts.moving:
        off = [{"max_up": hi, "max_down": lo} for hi, lo in moving_reactions_off(job, ss)]
        words = (f"live loads off; {job.moving[0].label or 'the wheel set'}'s dead weight at "
                 "its worst place")
    else:
        off = [{"max_up": r.force, "max_down": r.force} for r in ss.fixed.reactions]
        words = "live loads off"
    out = []
    for r, r0 in zip(e.reactions, off):
        r = dict(r)
        if r0["max_up"] > r["max_up"] + 1e-9 * abs(r0["max_up"]):
            r["max_up"], r["max_up_state"] = r0["max_up"], words
        if r0["max_down"] < r["max_down"] - 1e-9 * abs(r0["max_down"]):
            r["max_down"], r["max_down_state"] = r0["max_down"], words
        out.append(r)
    return replace(res, evaluation=replace(e, reactions=tuple(out)))


def _fatigue_cap(job, section, ss, st, res: CapacityResult) -> CapacityResult:
    """Fatigue is a limit state like the others: the live stress range grows with k, so the
    factor where it reaches F_SR is k x F_SR / range, and the rating is the lower of that and
    the strength search's (the checks at that factor, with the fatigue check among them)."""
    k = res.factor
    if not fatigue.given(job) or res.evaluation is None or not math.isfinite(k) or k <= 0:
        return res
    c = fatigue.fatigue_check(job, st, ss, k)
    if c is None:
        return res
    if c.ratio <= 1.0 + 1e-12:
        e = replace(res.evaluation, checks=tuple(res.evaluation.checks) + (c,))
        return replace(res, evaluation=e)
    k_f = k / c.ratio * (1 - 1e-12)  # the range is proportional to k: its own root, a hair in
    e = evaluate(job, k_f, section, ss, st)
    c = fatigue.fatigue_check(job, st, ss, k_f)
    return replace(res, factor=k_f, evaluation=replace(e, checks=tuple(e.checks) + (c,)),
                   note="", stepped="",
                   method="closed form for fatigue: the live stress range is proportional to k "
                          "(the strength checks would allow " + f"{k:.4g})")


MAX_COUPLES_TRIED = 4  # live couples each taken off in turn (one capacity search each)


def _factor_without(job, section, load, k: float) -> float | None:
    """The factor of the job without `load` where it is lower than `k` (the load relieves
    the member), else None: one evaluation just below k first (passing there, the factor
    is no lower), the search only where the answer is said in words."""
    below = k * (1 - 1e-6)
    rest = replace(job, loads=tuple(ld for ld in job.loads if ld is not load))
    ss = state_set(rest, section)
    st = strengths(rest, sec=section, beam=ss.beam)
    if max(ch.ratio for ch in evaluate(rest, below, section, ss, st).checks) <= 1:
        return None
    k2 = _capacity(rest, section, ss, st).factor
    return k2 if k2 < below else None


def _relieving_couples(job, section, k: float) -> tuple[str, ...]:
    """Live couples scaled together with other live loads: k scales them all at once, so a
    couple that holds back the others' moment (an end couple against a gravity load) is
    counted on at its full scaled value. Each live couple is taken off in turn: where the
    factor found without it is lower, it relieves, and nothing is posted (common practice,
    as for live loads that push both ways)."""
    live = [ld for ld in job.loads if ld.case == "live"]
    couples = [ld for ld in live if ld.kind == "moment" and ld.value]
    others = [ld for ld in live if ld.kind != "moment" and ld.total_force] \
        + [mv for mv in read_moving(job) if any(mv.live)]
    if not couples or not (others or len(couples) > 1) or not math.isfinite(k) or k <= 0:
        return ()
    if len(couples) > MAX_COUPLES_TRIED:
        return (f"{len(couples)} live couples are scaled together with the other live loads, "
                f"more than the {MAX_COUPLES_TRIED} shopbeam takes off one by one to see "
                "whether one relieves the others, so nothing is posted. Enter the couples "
                "as case = \"dead\" at values they are sure to have, or rate them in a job "
                "of their own",)
    out = []
    for c in couples:
        k2 = _factor_without(job, section, c, k)
        if k2 is not None:
            name = c.key + (f" ({c.label})" if c.label else "")
            out.append(f"the live couple {name} relieves the other live loads: without it the "
                       f"factor is {k2:.4g}, not {k:.4g}, and a load that relieves is never "
                       "counted on at its full scaled value. Enter it as case = \"dead\" at "
                       "a value it is sure to have, or rate the job without it")
    return tuple(out)


def _relieving_dead_couples(job, section, k: float) -> tuple[str, ...]:
    """A dead couple that relieves the member (without it the factor is lower): a couple's
    sign (+ counterclockwise) is the easiest to slip, and a dead load is counted on as always
    there, so a slipped one raises the figure posted with no other sign of it. As a dead
    force that pushes up (`uplift = true` on a dead load), nothing is posted: the couple's
    sign is to be checked, or the member rated without its help. Each dead couple is taken
    off in turn (at most MAX_COUPLES_TRIED)."""
    couples = [ld for ld in job.loads if ld.case == "dead" and ld.kind == "moment" and ld.value]
    if not couples or not math.isfinite(k) or k <= 0:
        return ()
    if len(couples) > MAX_COUPLES_TRIED:
        return (f"{len(couples)} dead couples, more than the {MAX_COUPLES_TRIED} shopbeam takes "
                "off one by one to see whether one relieves the member (a couple's slipped "
                "sign raises the figure posted), so nothing is posted. Combine couples at one "
                "place into one, or rate the member without those that relieve it",)
    out = []
    for c in couples:
        k2 = _factor_without(job, section, c, k)
        if k2 is not None:
            name = c.key + (f" ({c.label})" if c.label else "")
            turn = "counterclockwise" if c.value > 0 else "clockwise"
            out.append(f"the dead couple {name} relieves the member: without it the factor is "
                       f"{k2:.4g}, not {k:.4g}. A couple's sign is easy to slip (+ is "
                       f"counterclockwise; this one is {turn}), and a dead load is counted on "
                       "as always there: check its sign; if it is right, remove it to rate "
                       "the member without its help")
    return tuple(out)


def _hogging(job, st, limits, ss, k: float) -> tuple[str, ...]:
    """No rating where, with `braced = true`, the hogging moment at the factor k (over every
    pattern) would exceed the strength the bottom flange's or edge's lateral-torsional
    buckling leaves over its length between supports (`limits`: `analysis.hogging_limits`;
    Cb 1.0, conservative; 0 where shopbeam does not compute that buckling, so that any
    hogging beyond 1 % of the largest moment stops the rating)."""
    if not limits or not math.isfinite(k) or k < 0:
        return ()
    dem, big = hogging_demands(job, st, ss, k, limits)
    big = max(big, 1e-300)
    where = travel_words(job, ss) if ss.parts.moving else ""
    out = []
    for a, b, allow, least, at in dem:
        # (worked out: a hair over from the sweep's own root of the same ratio is not a gap)
        if -least > (allow * (1 + 1e-9) if allow > 0 else 0.01 * big):
            f = lambda x, q="length": units.fmt(x, q, job.units)  # noqa: E731
            wood = getattr(job.material, "kind", "") == "lumber"
            leaves = (f"which exceeds the {f(allow, 'moment')} the bottom "
                      f"{'edge' if wood else 'flange'}'s buckling over {f(a)} to {f(b)} leaves "
                      f"({hogging_source(job, st)}{'' if wood else ', Cb 1.0'}) if only the "
                      "top is braced" if allow > 0 else
                      f"putting the bottom edge in compression over {f(a)} to {f(b)} where "
                      "nothing holds it, and shopbeam does not compute that buckling "
                      f"({hogging_source(job, st)})")
            todo = hogging_remedy(job)
            out.append(f"lateral-torsional buckling of the bottom {'edge' if wood else 'flange'} "
                       f"under hogging moment"
                       + (" (the check bending, hogging)" if allow > 0 else " not checked")
                       + f": {top_words(job)}, but {_at(k)} "
                       f"the moment hogs to {f(-least, 'moment')} at {f(at)}{where}, {leaves}. "
                       f"{todo[0].upper()}{todo[1:]}")
    return tuple(out)


def solved_gaps(job, st, ss, k: float) -> tuple[str, ...]:
    """The reasons not to rate that need the member solved (the bottom flange under hogging
    with braced = true, a cantilever's top-flange loading at the factor k), for a sizing
    sweep's listed rows; `ss` is solved here when None and either can apply."""
    hog, top = hogging_limits(job, st), cantilever_top_limits(job, st)
    span = span_top_limits(job, st)
    fat = fatigue.given(job)
    if not (hog or top or span or fat) or not math.isfinite(k) or k <= 0:
        return ()
    ss = ss or state_set(job)
    # (the cantilever's top-flange strength at k is a check capacity rates on, lowering the
    # factor to it: only the dead loads alone past it withhold the rating, below)
    out = _hogging(job, st, hog, ss, k) + _span_top(job, st, span, ss, k) \
        + (_fatigue(job, st, ss, k) if fat else ())
    # the dead loads alone (k = 0) too: a live load that relieves them (wind uplift on a
    # roof's dead weight) can leave the rated state inside a limit the unloaded one passes
    out += _hogging(job, st, hog, ss, 0.0) + _cantilever_top(job, st, top, ss, 0.0) \
        + _span_top(job, st, span, ss, 0.0)
    return tuple(dict.fromkeys(out))


def _fatigue(job, st, ss, k: float) -> tuple[str, ...]:
    """No rating where the live-load stress range at the factor k exceeds the detail's
    allowable range (AISC 360-16 Appendix 3; `design.fatigue`)."""
    if getattr(job.material, "kind", "") not in ("steel", "stainless"):
        return ("fatigue not checked: the stress categories of AISC 360-16 Appendix 3 are "
                "for steel, and this member is not steel; have it checked by its own "
                "material's fatigue rules, or remove fatigue_category and cycles",)
    if ss.parts.moving and math.isfinite(fatigue.job_range(job)):
        # (under 20,000 cycles no check is needed at all, AISC 360-16)
        return ("fatigue not checked: the stress range of a moving load over its travel is "
                "not worked out here; have it checked, or remove fatigue_category and cycles",)
    if fatigue.tip_loaded(job) and math.isfinite(fatigue.job_range(job)):
        return ("fatigue not checked: trolley wheels or a clamp bear on the bottom flange's "
                "tips, and the local flange bending under them is a stress range of its own "
                "at the flange, which is not worked out here (it can be larger than the "
                "global bending range); have it checked, or remove fatigue_category and "
                "cycles",)
    c = fatigue.fatigue_check(job, st, ss, k)
    if c is None or c.ratio <= 1 + 1e-9:  # None: fewer than 20,000 cycles, no check needed
        return ()
    fr, fsr = c.demand, c.limit
    f = lambda v: units.fmt(v, "stress", job.units)  # noqa: E731
    return (f"fatigue: {_at(k)} the live-load stress range reaches {f(fr)}, above the "
            f"{f(fsr)} the detail may take ({fatigue.words(job, fsr)}); the live loads at "
            f"{fsr / fr * k:.4g} x as entered keep within it (the range is taken where it is "
            "largest along the member, with the impact allowance)",)


def _fails_alone(e, why: str = "", system: str = "us") -> str:
    """Why nothing can be posted when the fixed loads alone fail: the check that fails, and
    the unit slips that usually cause it on a member a shop would not otherwise question."""
    worst = max(e.checks, key=lambda c: c.ratio)
    slips = ("a length in m with the positions in mm, a deflection limit in m for mm, a dead "
             "load in kN for N (kN/m for N/m)" if system == "si" else
             "a length in feet with the positions in inches, a deflection limit in mm, a dead "
             "load in kip for lbf")
    return (f"the member fails under its own weight and the dead loads alone{why} ({worst.name}, "
            f"ratio {worst.ratio:.3g}); if that is not expected, check the units: {slips}")


def _at(k: float) -> str:
    """Where a rule is judged, in words: at the factor found, or with the live loads off."""
    return "with the live loads off (k = 0)" if k == 0 else f"at the factor found (k = {k:.4g})"


def _span_top(job, st, limits, ss, k: float) -> tuple[str, ...]:
    """No rating where the rated load, bearing on the top flange of an unbraced length between
    braces, would exceed the strength that loading leaves it (`limits`:
    `analysis.span_top_limits`; the check `analysis.span_top_checks`): the moment over every
    pattern at k against Mn with Cb (from every load on at k) x 1/1.4."""
    if not limits:
        return ()
    got = span_top_demands(job, st, ss, k)
    if got == NOT_JUDGED:
        return (f"lateral-torsional buckling with the loads on the top flange not checked: "
                f"{wheels_with_top_words(job)} "
                "of an unbraced length, and with patterned loads as well the strength that "
                "leaves (eq. F1-1's Cb x 1/1.4 at every wheel position and pattern) is not "
                "worked out. Brace the member (beam.braces, braced = true), or drop patterned "
                "= true where the loads stay on",)
    out = []
    f = lambda x, q="length": units.fmt(x, q, job.units)  # noqa: E731
    for a, b, demand, top, cb, where, _at_x in got:
        if demand > top * (1 + 1e-9):
            out.append(f"lateral-torsional buckling with the loads on the top flange (the check "
                       f"{SPAN_TOP_CHECK}): {_at(k)} the moment over the unbraced length "
                       f"{f(a)} to {f(b)} reaches {f(demand, 'moment')}{where}, above "
                       f"the {f(top, 'moment')} its strength is with the loads bearing on the "
                       f"top flange (Cb {cb:.3f} = eq. F1-1 x 1/1.4, AISC 360-16 Commentary "
                       "F1, from memory; the bending check takes them at the shear centre)"
                       + (", and the factor is not lowered to it here" if k > 0 else "")
                       + ". Brace the "
                       "member at the loads (beam.braces), or hang them below the flange "
                       "(flange = \"bottom\" on a point load; a spread load hung below goes "
                       "in as point loads at its hangers)")
    return tuple(out)


def _cantilever_top(job, st, limits, ss, k: float) -> tuple[str, ...]:
    """No rating where the rated load, bearing on an unbraced cantilever's top flange, would
    exceed the lower strength that loading leaves it (`limits`:
    `analysis.cantilever_top_limits`; the moments of `_cantilever_top_demands`). `capacity`
    rates the job at that strength where it can (`_cantilever_top_rate`), so this is left to
    say only what cannot be rated so: the dead loads alone past it (`solved_gaps` asks at
    k = 0)."""
    if not limits:
        return ()
    out = []
    for a, b, kl, now, top, demand, _at_x, rolled in cantilever_top_demands(
            job, st, limits, ss, k):
        if demand > top:
            f = lambda x, q="length": units.fmt(x, q, job.units)  # noqa: E731
            out.append(f"lateral-torsional buckling of the cantilever {f(a)} to {f(b)} with its "
                       f"loads on the top flange: {_at(k)} "
                       f"its moment {f(demand, 'moment')}"
                       + (travel_words(job, ss) if rolled else "")
                       + f" exceeds the {f(top, 'moment')} that "
                       f"top-flange loading leaves it (effective length about {kl:g} x L, SSRC "
                       f"Guide, from memory; {f(now, 'moment')} with the loads at the shear "
                       "centre, as checked). " + tip_brace_words(job).capitalize()
                       + " where one can be fitted, hang a point load below the flange (flange = "
                       "\"bottom\"), or choose a section that passes at the lower strength "
                       "(shopbeam size)")
    return tuple(out)


def _cantilever_top_rate(job, section, ss, st, res: CapacityResult) -> CapacityResult:
    """An unbraced cantilever whose loads bear on its top flange: where the moment at the
    factor found passes the lower strength that loading leaves it (`analysis.
    cantilever_top_limits`, effective length about 2.5 L), the factor is lowered to where it
    reaches it, and that limit state is among the checks at the answer, as the governing one
    (a rating on the lower strength, not NOT RATED). The moment is linear in k on each
    length, so its largest is convex in k: one bracketed root (Brent's method) from k = 0,
    where the dead loads alone must pass it (else `_cantilever_top` says why nothing is
    posted)."""
    k = res.factor
    if res.evaluation is None or not math.isfinite(k) or k <= 0:
        return res
    limits = cantilever_top_limits(job, st)
    if not limits:
        return res

    def worst(kk):
        got = cantilever_top_demands(job, st, limits, ss, kk)
        return max(got, key=lambda g: g[5] / g[4]) if got else None

    g = worst(k)
    if g is None:
        return res
    words = travel_words(job, ss) if job.moving else ""

    def listed(r: CapacityResult, gk) -> CapacityResult:
        """The check among the checks at the factor, as the report lists it."""
        c = top_flange_check(job, ss, gk, words, st)
        return replace(r, evaluation=replace(r.evaluation,
                                             checks=tuple(r.evaluation.checks) + (c,)))

    if g[5] <= g[4]:
        return listed(res, g)  # it does not come first: listed at the factor found
    g0 = worst(0.0)
    if g0[5] >= g0[4]:
        return listed(res, g)  # the dead loads alone pass it: nothing to post (a reason)

    def ratio(kk):
        gk = worst(kk)
        return gk[5] / gk[4]

    # Brent's method on the ratio (one crossing: convex, below 1 at k = 0), then its
    # passing side, stepped down a float at a time if rounding leaves it a hair over
    k2 = passing_root(ratio, k, g[5] / g[4], g0[5] / g0[4])
    g = worst(k2)
    e = evaluate(job, k2, section, ss, st)
    # fatigue, listed at the factor found (`_fatigue_cap`), is listed at the lower one too
    fat = fatigue.fatigue_check(job, st, ss, k2) if fatigue.given(job) else None
    c = (top_flange_check(job, ss, g, words, st),) + ((fat,) if fat is not None else ())
    return replace(res, factor=k2, evaluation=replace(e, checks=tuple(e.checks) + c),
                   note="", stepped="", method=res.method + "; lowered to where the cantilever's moment reaches "
                   "the strength its top-flange loads leave it (a bracketed root: the moment "
                   "is linear in k)")


def _span_top_rate(job, section, ss, st, res: CapacityResult) -> CapacityResult:
    """An unbraced length between braces whose loads bear on its top flange: where the moment
    at the factor found passes the lower strength that loading leaves it (`analysis.
    span_top_checks`: Cb x 1/1.4), the factor is lowered to where it reaches it, and the
    check is among the checks at the answer (a rating on the lower strength, not NOT RATED),
    as for a cantilever (`_cantilever_top_rate`). The largest moment is convex in k and Cb
    moves little with it: one bracketed root (Brent's method) from k = 0, where the dead
    loads alone must pass it (else nothing can be posted: k = 0, the fixed loads fail alone),
    then its passing side."""
    k = res.factor
    if res.evaluation is None or not math.isfinite(k) or k <= 0 \
            or not span_top_limits(job, st):
        return res

    def ratio_of(got):
        if got == NOT_JUDGED:
            return None
        # (no entry: no moment on a length loaded on top, as wheels with the live loads off)
        return max(((d / t if t > 0 else math.inf) for _, _, d, t, *_ in got), default=0.0)

    def ratio(kk):
        return ratio_of(span_top_demands(job, st, ss, kk))

    got_k = span_top_demands(job, st, ss, k)
    # listed at the factor found where it does not come first
    listed = replace(res, evaluation=replace(res.evaluation, checks=tuple(
        res.evaluation.checks) + tuple(span_top_rows(job, st, got_k))))
    rk = ratio_of(got_k)
    if rk is None or rk <= 1.0:
        return listed
    got_0 = span_top_demands(job, st, ss, 0.0)
    r0 = ratio_of(got_0)
    if r0 is None:
        return listed
    if r0 >= 1.0:  # the dead loads alone pass it (`_span_top` says so): no factor passes
        e0 = evaluate(job, 0.0, section, ss, st)
        e0 = replace(e0, checks=tuple(e0.checks) + tuple(span_top_rows(job, st, got_0)))
        return CapacityResult(job, 0.0, e0, "fixed loads fail alone",
                              _fails_alone(e0, "", job.units))
    k2 = passing_root(ratio, k, rk, r0)
    e = evaluate(job, k2, section, ss, st)
    more = list(span_top_checks(job, st, ss, k2))
    if fatigue.given(job):
        fat = fatigue.fatigue_check(job, st, ss, k2)
        more += [fat] if fat is not None else []
    top = cantilever_top_limits(job, st)
    if top:
        got = cantilever_top_demands(job, st, top, ss, k2)
        more.append(top_flange_check(job, ss, max(got, key=lambda g: g[5] / g[4]),
                                     travel_words(job, ss) if job.moving else "", st))
    return replace(res, factor=k2, evaluation=replace(e, checks=tuple(e.checks) + tuple(more)),
                   note="", stepped="", method=res.method + "; lowered to where the moment "
                   "reaches the strength its loads on the top flange leave the unbraced "
                   "length (Cb x 1/1.4; a bracketed root)")


def passing_root(ratio, k: float, rk: float, r0: float) -> float:
    """The factor in (0, k) where `ratio` (of the factor; rk at k above 1, r0 at 0 below it)
    reaches 1, by Brent's method, on its passing side: stepped down a float at a time while
    rounding leaves it a hair over (the rules lowered to a strength of their own: a
    cantilever's or a span's top-flange loads, the bottom flange under hogging)."""
    def h(kk):
        return ratio(kk) - 1.0

    a0, fa, b0, _fb = brent(h, 0.0, k, r0 - 1.0, rk - 1.0)
    k2 = a0 if fa <= 0 else b0
    while h(k2) > 0:
        k2 = math.nextafter(k2, 0.0)
    return k2


def hogging_root(job, st, ss, limits, k: float, dem=None) -> float | None:
    """The factor below k where the hogging moment reaches the strength the bottom flange's
    or edge's buckling leaves (`limits`: `analysis.hogging_limits`, worked out), where at k
    it exceeds it and the dead loads alone (k = 0) do not; else None. The largest hogging over
    every load state is the largest of functions linear in k: convex, one bracketed root
    (Brent's method), then its passing side, stepped down a float at a time if rounding
    leaves it a hair over. `dem`: `hogging_demands` at k, where already worked out."""
    def ratio(kk, got=None):
        got = got or hogging_demands(job, st, ss, kk, limits)[0]
        return max(-d[3] / d[2] for d in got)

    rk = ratio(k, dem)
    if rk <= 1.0:
        return None
    r0 = ratio(0.0)
    if r0 >= 1.0:
        return None
    return passing_root(ratio, k, rk, r0)


def _hogging_rate(job, section, ss, st, res: CapacityResult) -> CapacityResult:
    """A member braced on its top only (`braced = true`, or braces on the top flange) whose
    moment hogs: the bottom flange or edge is in compression and held at the supports only.
    Where shopbeam works out the strength its buckling leaves (`analysis.hogging_computed`),
    that is a check the rating is taken from, like the others: where the hogging moment at
    the factor found passes it, the factor is lowered to where it reaches it (the largest
    hogging over every load state is the largest of functions linear in k: convex, one
    bracketed root from k = 0, where the dead loads alone must stay within it, else `_hogging`
    says why nothing is posted); the check is listed at the answer either way. A wood
    member's dead loads alone are checked at CD 0.9 too (`analysis.hogging_dead_check`), and
    a job with no live loads is judged at the loads entered: past either, nothing is posted
    (k = 0)."""
    k = res.factor
    if res.evaluation is None or k <= 0 or math.isnan(k):
        return res
    limits = hogging_limits(job, st)
    if not hogging_computed(limits):
        return res
    words = travel_words(job, ss) if job.moving else ""
    dead = hogging_dead_check(job, st, ss)  # a wood member's dead loads alone, CD 0.9

    def fails_alone(c) -> CapacityResult:
        """The dead loads alone exceed the bottom edge's strength: nothing to post."""
        e0 = res.evaluation if math.isinf(k) else evaluate(job, 0.0, section, ss, st)
        e0 = replace(e0, checks=tuple(e0.checks) + (c,))
        return CapacityResult(job, 0.0, e0, "fixed loads fail alone",
                              _fails_alone(e0, "", job.units))

    if dead is not None and dead.ratio > 1.0:
        return fails_alone(dead)
    if math.isinf(k):  # no live loads: the loads as entered are all there is
        c = hogging_checks(job, st, ss, 1.0)
        worst = max(c, key=lambda x: x.ratio, default=None)
        if worst is not None and worst.ratio > 1.0:
            return fails_alone(worst)
        return replace(res, evaluation=replace(res.evaluation,
                                               checks=tuple(res.evaluation.checks) + tuple(c)))

    def check(kk):
        dem, big = hogging_demands(job, st, ss, kk, limits)
        return hogging_check(job, st, dem, big, words), dem

    c, dem = check(k)
    k2 = hogging_root(job, st, ss, limits, k, dem) if c is not None else None
    if k2 is None:  # it does not come first, or the dead loads alone pass it (`_hogging`)
        more = tuple(x for x in (c, dead) if x is not None)
        return replace(res, evaluation=replace(res.evaluation,
                                               checks=tuple(res.evaluation.checks) + more))
    e = evaluate(job, k2, section, ss, st)
    more = [x for x in (fatigue.fatigue_check(job, st, ss, k2) if fatigue.given(job) else None,
                        ) if x is not None]
    top = cantilever_top_limits(job, st)
    if top:
        got = cantilever_top_demands(job, st, top, ss, k2)
        more.append(top_flange_check(job, ss, max(got, key=lambda g: g[5] / g[4]), words, st))
    hc = check(k2)[0]
    more += [x for x in (hc, dead) if x is not None] + span_top_checks(job, st, ss, k2)
    return replace(res, factor=k2, evaluation=replace(e, checks=tuple(e.checks) + tuple(more)),
                   note="", stepped="", method=res.method + "; lowered to where the hogging "
                   "moment reaches the strength the bottom " + flange_word(job) + "'s buckling "
                   "leaves (a bracketed root: the moment is linear in k)")


def _capacity(job, section, ss, st, fast: bool = True) -> CapacityResult:
    """The search of `capacity`. Where `loading.envelope_ratio` covers every check and
    `fast`, each trial factor reads the governing ratio from it (the same number as a full
    evaluation, without building the checks) and only the answer is evaluated in full;
    `fast=False` evaluates every trial in full (the tests compare)."""
    memo: dict[float, Evaluation] = {}
    quick: dict[float, float] | None = {} if fast and envelope_ratio_applies(job, ss, st) \
        else None

    def ev(k):  # the root search ends on a factor it has already evaluated: not again
        if k not in memo:
            memo[k] = evaluate(job, k, section, ss, st)
        return memo[k]

    def g(k):
        if quick is None:
            return max(c.ratio for c in ev(k).checks)
        if k not in quick:
            quick[k] = envelope_ratio(job, ss, k, st)
        return quick[k]

    if not _has_live(ss):
        e = ev(1.0)
        if max(c.ratio for c in e.checks) > 1:  # nothing to scale, and it fails as it is
            return CapacityResult(job, 0.0, e, "fixed loads fail alone",
                                  _fails_alone(e, " (the job has no live loads)", job.units))
        return CapacityResult(job, math.inf, e, "no live loads",
                              "the job has no live loads to scale: enter the load to rate "
                              "as a live load")
    g0 = g(0.0)
    if g0 > 1:
        e0 = ev(0.0)
        return CapacityResult(job, 0.0, e0, "fixed loads fail alone",
                              _fails_alone(e0, "", job.units))
    if _fixed_is_zero(ss):
        g1 = g(1.0)
        if g1 <= NO_DEMAND:
            return CapacityResult(job, math.inf, ev(1.0), "no demand",
                                  "the live loads cause no demand on any check")
        k = 1.0 / g1
        gk = g(k)
        if gk <= 1.0 + 1e-9:
            # rounding can leave the ratio a hair above 1: step down to the passing side
            k, e = _passing(ev, k)
            return CapacityResult(job, k, e, "closed form: every ratio is proportional to k")
        # a limit that changes with the load (web sidesway buckling's Cr halves once the
        # moment at the force reaches My / 1.5): not proportional, so bracket [0, k]
        return _root(job, ev, g, 0.0, g0 - 1.0, k, gk - 1.0,
                     " (a limit changes with the load)")
    k_lo, h_lo = 0.0, g0 - 1.0
    g1 = g(1.0)
    k_hi, h_hi = (1.0, g1 - 1.0) if g1 > 1.0 else (None, None)
    if k_hi is None:
        k_lo, h_lo = 1.0, g1 - 1.0
    # the chord through k = 0 and k = 1: a ratio |a + k b| / limit is convex in k, so the
    # chord lies above the ratios between 0 and 1 and below them past 1, and where it reaches
    # 1 (nudged to the side it should bracket) usually brackets the root tightly; if Cb's
    # change of shape breaks that, the point still narrows the bracket from the side it lands
    if g1 > g0:
        est = (1.0 - g0) / (g1 - g0) * (1.0 - 1e-9 if k_hi is not None else 1.0 + 1e-9)
        if k_lo < est and (k_hi is None or est < k_hi):
            h = g(est) - 1.0
            if h > 0:
                k_hi, h_hi = est, h
            else:
                k_lo, h_lo = est, h
    n = 0
    while k_hi is None:
        k = k_lo * 4.0
        h = g(k) - 1.0
        if h > 0:
            k_hi, h_hi = k, h
            break
        k_lo, h_lo = k, h
        n += 1
        if n > 60:
            return CapacityResult(job, math.inf, ev(k_lo), "unbounded",
                                  "no multiplier of the live loads makes a check fail")
    return _root(job, ev, g, k_lo, h_lo, k_hi, h_hi)


def _passing(ev, k: float) -> tuple[float, Evaluation]:
    """k stepped down (one float at a time) until every ratio passes: rounding can leave a
    root's ratio a hair above 1."""
    e = ev(k)
    while max(c.ratio for c in e.checks) > 1.0:
        k = math.nextafter(k, 0.0)
        e = ev(k)
    return k, e


def _root(job, ev, g, k_lo, h_lo, k_hi, h_hi, why: str = "") -> CapacityResult:
    """The factor where the governing ratio reaches 1, by Brent's method in the bracket
    [k_lo, k_hi] (h = ratio - 1 at each end), on its passing side."""
    a, fa, b, fb = brent(lambda k: g(k) - 1.0, k_lo, k_hi, h_lo, h_hi)
    k, e = _passing(ev, a if fa <= 0 else b)
    note, stepped = _step_note(e, lambda: ev(b if fa <= 0 else a))
    return CapacityResult(job, k, e, "bracketed root (Brent's method) of governing ratio = 1"
                          + why, note, stepped=stepped)


def _step_note(at_k: Evaluation, past) -> tuple[str, str]:
    """Words for a factor that stops where a limit drops as the load grows (no ratio reaches
    1 at k, and just past k one is over it): web sidesway buckling's Cr halves once the
    moment at the force reaches My / 1.5 (AISC 360-16 J10.4). Empty otherwise. `past()`
    evaluates just past k (only when asked). With the words, the name of that check (it
    governs)."""
    if max(c.ratio for c in at_k.checks) >= 1.0 - 1e-6:
        return "", ""
    over = [c for c in past().checks if c.ratio > 1.0]
    if not over:
        return "", ""
    c = max(over, key=lambda c: c.ratio)
    before = next((x.ratio for x in at_k.checks if x.name == c.name), 0.0)
    why = (" (Cr halves once 1.5 Ma reaches My at the force, AISC 360-16 J10.4)"
           if c.name == "web sidesway buckling" else "")
    return (f"the factor stops where the {c.name} limit drops as the load grows{why}: its "
            f"ratio is {before:.3f} at k and {c.ratio:.3f} just past it"), c.name


# ------------------------------------------------------------------ what to post
def max_load_lines(res: CapacityResult) -> list[tuple[str, str]]:
    """(label, value) pairs in the job's units: the load a user would post."""
    job, k = res.job, res.factor
    sy = job.units
    live = [ld for ld in job.loads if ld.case == "live"]
    mv = read_moving(job)
    if not math.isfinite(k):
        return [("max load", "the live loads make no demand on any check"
                 if res.method == "no demand" else "no multiplier of the live loads makes a "
                 "check fail (unbounded)" if res.method == "unbounded"
                 else "no live load entered")]
    out = []
    if not mv and len(live) == 1 and live[0].kind == "uniform":
        w = abs(live[0].w1) * k
        out.append(("max uniform load", _floor_fmt(w, "line_load", sy)))
        out.append(("over", f"{units.fmt(live[0].start, 'length', sy)} to "
                             f"{units.fmt(live[0].end, 'length', sy)}"))
        # the total of the posted (rounded down) figure, as the label gives it, so the two
        # agree and the total is never more than the posted load over its length
        out.append(("total", _floor_fmt(_floor_si(w, "line_load", sy)
                                        * (live[0].end - live[0].start), "force", sy)))
    elif not mv and len(live) == 1 and live[0].kind == "point":
        out.append(("max point load", _floor_fmt(abs(live[0].value) * k, "force", sy)))
        moved = travelling(job)  # a hoist rated travelling: where it may run, not its place
        out.append(("at", units.fmt(live[0].at, "length", sy) if moved is None else
                    "anywhere from {} to {}".format(
                        *(units.fmt(x, "length", sy) for x in moved.moving[0].travel))))
    else:
        shown = math.floor(k * 1000 * (1 + 1e-12)) / 1000  # rounded DOWN, as posted
        if shown > k:
            shown = math.floor(k * 1000) / 1000
        out.append(("max load", f"{shown:.3f} x the entered live loads"))
        tot = sum(abs(ld.total_force) for ld in live)
        if mv:
            wheels = [abs(w) * k for w in job.moving[0].live]
            # as the label: axles alike take the whole set from the posted axle figure, so
            # the two agree and neither is more than its exact value
            if wheels and max(wheels) - min(wheels) <= 1e-9 * max(wheels):
                whole = _floor_si(max(wheels), "force", sy) * len(wheels)
            else:
                whole = sum(wheels)
            out.append(("moving", _floor_fmt(whole, "force", sy) + f" ({mv[0].label})"))
        if tot:
            # as the label's TOTAL: the sum of each force load's posted (rounded down) figure
            parts = sum(_floor_si(abs(ld.total_force) * k, "force", sy) for ld in live
                        if ld.kind != "moment")
            out.append(("static live", _floor_fmt(min(parts, tot * k), "force", sy) + " total"))
    if not mv and len(live) == 1 and live[0].kind in ("uniform", "point") \
            and live[0].total_force > 0:
        # the label says UPWARD: a figure with no direction reads as a weight (the keys stay
        # the same for scripts that read them)
        out.append(("direction", "upward (the load pushes up: uplift = true)"))
    if job.members > 1:
        out.append(("shared by", f"{job.members} identical members"))
    if impact_of(job):
        out.append(("impact", f"{impact_of(job):.0%} allowance included"))
    return out


def _floor_si(value: float, kind: str, system: str) -> float:
    """The SI value whose display is `value`'s rounded DOWN to 3 significant figures."""
    disp = units.to_display(value, kind, system)
    if disp <= 0:
        return 0.0
    e = math.floor(math.log10(disp)) - 2
    down = math.floor(disp / 10**e * (1 + 1e-12)) * 10**e
    return value * min(down / disp, 1.0)


def _floor_fmt(value: float, kind: str, system: str) -> str:
    """Format rounded DOWN to 3 significant figures (a posted load must not round up)."""
    return units.fmt(_floor_si(value, kind, system), kind, system, 3)


def at_factor(job, k: float):
    """The job with every live load (and each wheel set's live part) times k."""
    loads = tuple(replace(ld, value=ld.value * k, w1=ld.w1 * k, w2=ld.w2 * k)
                  if ld.case == "live" else ld for ld in job.loads)
    moving = tuple(replace(ws, live=tuple(v * k for v in ws.live)) for ws in job.moving)
    return replace(job, loads=loads, moving=moving)


def connections_at(job, k: float) -> tuple[list[dict], list[dict]]:
    """(fixed ends, hinges) as `analysis.to_json` gives them, at the live-load factor k: what
    the connections a rating rests on must carry at the rated load (not checked here)."""
    if not any(s.kind in ("fixed", "hinge") for s in job.supports) or not math.isfinite(k):
        return [], []
    at_k = at_factor(job, k)
    # the loads as entered at k, as analyze solves them; with a wheel set, the state analyze
    # shows (its governing one), which the connection figures read
    sol = analyze(at_k).solution if at_k.moving else sound_solve(at_k.beam())
    return fixed_end_moments(at_k, sol), hinge_shears(at_k, sol)


# ------------------------------------------------------------------ output
def to_json(res: CapacityResult) -> dict:
    out = base_json(analyze(res.job))
    k = res.factor
    out["factor"] = float(k) if math.isfinite(k) else None
    out["checks"] = [c.as_dict(bending_s(res.job)) for c in res.checks]
    out["governing"] = res.governing.name if res.governing else None
    out["rated"] = res.rated
    # with no factor to post (no live load; DO NOT LOAD) the note is the reason: a script
    # that prints the reasons when rated is false has one to print
    reasons = list(res.not_rated) or ([res.note or "no factor to post"] if not res.rated else [])
    out["not_rated_reasons"] = reasons
    out["capacity"] = {"method": res.method, "note": res.note,
                       "not_rated": list(reasons),
                       "basis": BASIS_WORDS[basis_of(res.job)],
                       # the load to post: none where no rating is posted (NOT RATED),
                       # as the printed label withholds it
                       "max_load": dict(max_load_lines(res)) if res.rated else {},
                       "worst_state": {n: w["words"] for n, w in res.evaluation.worst.items()}
                       if res.evaluation else {}}
    # what each support carries at the factor found, over every load state (the label's
    # SUPPORTS lines; a point-load hoist's rated travelling, so beside each hanger)
    out["capacity"]["supports"] = [dict(r) for r in res.evaluation.reactions] \
        if res.evaluation is not None and math.isfinite(k) else []
    if k > 0 and math.isfinite(k):  # what the connections carry at the factor found
        ends, hinges = connections_at(res.job, k)
        # keyed as the top-level fixed_ends ("shear"), with "force" kept beside it
        out["capacity"]["fixed_ends"] = [dict(e, shear=e["force"]) for e in ends]
        out["capacity"]["hinges"] = hinges
    return out
