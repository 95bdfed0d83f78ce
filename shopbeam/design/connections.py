"""What the connections of a member must pass: the shear through each internal hinge and the
moment and shear at each fixed end, the largest over the job's load states, in numbers for the
JSON and in words for the report (the connections themselves are not checked).

Above `loading` (it reads the load states), beside `local` (the member's own local checks).
"""

from __future__ import annotations

from shopbeam import units
from shopbeam.design import loading, uplift
from shopbeam.engine.solver import solve


def _states(job, sol):
    """The solved states whose hinge shears and end moments count: every wheel position of a
    moving-load job, every pattern of a patterned one, else the solution given; with a live
    load marked uplift, those of the dead loads at 0.6 and of the uplift off as well
    (`design.uplift`)."""
    states, words = _states_of(job, sol)
    if uplift.applies(job):
        for other, _, _ in uplift.variants(job):  # the dead loads at 0.6; the uplift off
            more, _ = _states_of(other, solve(other.beam(), candidates=False))
            states = list(states) + list(more)
        words = ", ".join(x for x in (words, "with the dead loads in full and at 0.6, and "
                                      "with the uplift off") if x)
    return states, words


def _states_of(job, sol):
    """`_states` of the job as it is."""
    try:
        parts = loading.load_parts(job)
        if parts.moving:  # every wheel position (and pattern), every variant of the set
            ss = loading.state_set(job)
            ways = loading.wheel_variants(job, ss)
            return [st for jb, s2 in ways for st in loading.moving_connection_states(jb, ss=s2)], \
                "over every position of the wheels" + loading.variant_words(job, ss)
        if parts.patterned and not parts.moving:  # the extreme patterns, from the envelopes
            return loading.connection_states(job), "over every load pattern"
        if parts.impact and not parts.moving:
            ss = loading.state_set(job)
            return [ss.state(1.0, ())], "impact included"
    except Exception:  # noqa: BLE001 - the job's own checks report bad input
        pass
    return [sol], ""


def hinge_shears(job, sol) -> list[dict]:
    """Shear carried through each internal hinge (N, + as the shear diagram): the force a
    Gerber hinge's connection must pass. Largest magnitude over the load states."""
    hinges = [s.at for s in sol.beam.supports if s.kind == "hinge"]
    if not hinges:
        return []
    states, words = _states(job, sol)
    out = []
    for x in hinges:
        best = None
        for st in states:
            for side in ("left", "right"):
                v = float(st.shear(x, side))
                if best is None or abs(v) > abs(best):
                    best = v
        out.append({"at": float(x), "shear": best, "over": words})
    return out


def fixed_end_moments(job, sol) -> list[dict]:
    """Moment and shear at each fixed support (largest moment over the load states)."""
    fixed = [i for i, r in enumerate(sol.reactions) if r.kind == "fixed"]
    if not fixed:
        return []
    states, words = _states(job, sol)
    out = []
    for i in fixed:
        here = [st.reactions[i] for st in states]
        best = max(here, key=lambda r: abs(r.moment))
        # the largest shear over the states (not only the one beside the largest moment),
        # and the largest moment the other way where the end's moment reverses (patterns,
        # wheels): the connection must develop both
        shear = max(here, key=lambda r: abs(r.force)).force
        other = [r.moment for r in here if r.moment * best.moment < 0]
        back = max(other, key=abs) if other else 0.0
        out.append({"at": float(best.at), "moment": float(best.moment),
                    "force": float(shear), "over": words,
                    "moment_reversed": float(back)
                    if abs(back) > 0.01 * abs(best.moment) else 0.0})
    return out


def connection_notes(job, sol) -> list[str]:
    """Words for the report: hinge shears, and what a fixed end's connection must develop."""
    sy = job.units
    out = []
    for h in hinge_shears(job, sol):
        out.append(f"Hinge at {units.fmt(h['at'], 'length', sy)} carries a shear of "
                   f"{units.fmt(abs(h['shear']), 'force', sy)}"
                   + (f" ({h['over']})" if h["over"] else "")
                   + ": its connection (bolts, pin, seat) must pass this force; it is not "
                   "checked here.")
    for f in fixed_end_moments(job, sol):
        out.append(f"Fixed end at {units.fmt(f['at'], 'length', sy)}: the connection must "
                   f"develop a moment of {units.fmt(abs(f['moment']), 'moment', sy)}"
                   + (f" (and {units.fmt(abs(f['moment_reversed']), 'moment', sy)} the other "
                      "way: it reverses)" if f.get("moment_reversed") else "")
                   + f" with a shear of {units.fmt(abs(f['force']), 'force', sy)}"
                   + (f" ({f['over']})" if f["over"] else "")
                   + _moment_connection(job) + " A bolted shear tab or clip angle is a pin: "
                   "then re-run with type = \"pin\". The connection is not checked here.")
    return out


def _moment_connection(job) -> str:
    """What develops a fixed end's moment, in the words of the member's material."""
    kind = getattr(job.material, "kind", "")
    if kind == "lumber":
        return (" (moment connection: a backspan built in past the support, bolted steel "
                "side plates, or a steel bracket or socket; nailed or toe-screwed ends are "
                "pins).")
    if kind == "aluminum":
        return (" (moment connection: a bolted end plate or a socket; a welded end is checked "
                "at the weld's reduced, heat-affected strength only with welded = true).")
    return " (moment connection: full-penetration or fillet-welded flanges, end plate, or a socket)."
