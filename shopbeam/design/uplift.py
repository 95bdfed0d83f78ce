"""Dead loads that hold down an uplift: counted at 0.6 as well as in full.

A live load marked `uplift = true` that pushes up (wind uplift, a jack) is resisted by the member's
own weight and its dead loads. ASCE 7-16 2.4.1 (allowable stress design) takes them at 0.6 in
that case, combination 7: 0.6D + 0.6W (and 0.6D + 0.7E, combination 8), so that a dead load a
little lighter than assumed does not leave the member short. shopbeam checks such a job both
ways, with the dead loads in full (D + W: a dead load that adds to the uplift's effect
somewhere along the member, an overhang's weight, counts in full there) and at 0.6, and every
check, capacity and sizing row takes the worse of the two. The uplift load itself is taken as
entered, at the allowable-stress level: a wind load worked out to ASCE 7-16 (strength level)
enters as 0.6 W.

`applies` says when; `held_down` is the job at 0.6 D (`Job.dead_factor`); `merge` takes the
larger ratio of each check (the anchor forces: `analysis.uplift_notes`).
"""

from __future__ import annotations

from dataclasses import replace

DEAD_FACTOR = 0.6
CLAUSE = "ASCE 7-16 2.4.1, combination 7: 0.6D + 0.6W"
STATE = "dead loads at 0.6 against the uplift (ASCE 7-16 2.4.1: 0.6D + 0.6W)"
CALM = "the uplift off (the dead loads alone, with any other load)"


def pushes_up(job) -> list:
    """The live loads marked `uplift = true` that push up somewhere (a force > 0). A load that
    pushes up unmarked is taken as a forgotten minus sign (`Job.upward`: NOT RATED, and not
    checked as an uplift here); a wheel cannot be marked, as a wheel only bears down."""
    slips = {u.split(" ", 1)[0] for u in job.upward}
    return [ld for ld in job.loads if ld.case == "live" and ld.kind != "moment"
            and ld.key not in slips
            and (ld.value > 0 if ld.kind == "point" else
                 ld.w1 > 0 or (ld.kind == "linear" and ld.w2 > 0))]


def has_dead(job) -> bool:
    """Whether anything is dead: the member's own weight, a dead load, a wheel set's weight."""
    return bool(job.self_weight or any(
        ld.case != "live" and (ld.total_force or ld.kind == "moment" and ld.value)
        for ld in job.loads) or any(any(w.dead) for w in job.moving))


def applies(job) -> bool:
    """A job whose dead loads may hold down a live load that pushes up (checked both ways);
    never the held-down job itself."""
    return job.dead_factor == 1.0 and has_dead(job) and bool(pushes_up(job))


def held_down(job):
    """The job with every dead load (self-weight and wheel weights too) at 0.6."""
    return replace(job, dead_factor=DEAD_FACTOR)


def calm(job):
    """The job with the uplift off (a calm day): every load but the uplifts, the dead loads
    in full. The uplift comes and goes, and without it the dead loads (and any other load)
    act alone: the seats carry the weight, a cantilever sags, the wheels roll unrelieved."""
    up = {id(ld) for ld in pushes_up(job)}
    return replace(job, loads=tuple(ld for ld in job.loads if id(ld) not in up))


def variants(job):
    """(the job as another state, the words its checks are marked with, the words its rows
    of a reaction envelope are): the dead loads at 0.6 against the uplift, and the uplift
    off."""
    return ((held_down(job), STATE, "dead loads at 0.6"), (calm(job), CALM, "the uplift off"))


def merge(checks, other, state: str = STATE) -> list:
    """Each check at the larger ratio of the job as entered (`checks`) and of another state
    (`other`, the same checks by name; `state`: its words, 0.6 D by default): the other one
    is taken, its state saying so, where its ratio is higher; a check the other state alone
    calls for (the moment hogs only there) is added."""
    # checks of one name (a cantilever's top-flange loads at each end) pair in their order
    theirs: dict[str, list] = {}
    for o in other:
        theirs.setdefault(o.name, []).append(o)
    out = []
    for c in checks:
        same = theirs.get(c.name)
        o = same.pop(0) if same else None
        out.append(c if o is None or not o.ratio > c.ratio * (1 + 1e-12) else mark(o, state))
    return out + [mark(o, state) for rest in theirs.values() for o in rest]


def mark(check, state: str = STATE):
    """A check made in another state (0.6 D by default), its state saying so."""
    return replace(check, state="; ".join(x for x in (check.state, state) if x))


def rows(sol, words: str) -> list[dict]:
    """A solution's reactions as rows of a reaction envelope (each support's range)."""
    return [{"at": r.at, "type": r.kind, "max_up": r.force, "max_up_state": words,
             "max_down": r.force, "max_down_state": words} for r in sol.reactions]


def widen(env, other, tag: str = "dead loads at 0.6") -> list[dict]:
    """Each support's range (`env`, rows of a reaction envelope) widened by the same rows of
    another state (`other`; `tag` its words, 0.6 D by default), named where they are wider."""
    out = []
    for r, o in zip(env, other):
        r = dict(r)
        for key, wider in (("max_up", o["max_up"] > r["max_up"] + 1e-9 * abs(r["max_up"])),
                           ("max_down", o["max_down"] < r["max_down"] - 1e-9 * abs(r["max_down"]))):
            if wider:
                r[key] = o[key]
                r[key + "_state"] = "; ".join(x for x in (o.get(key + "_state", ""), tag) if x)
        out.append(r)
    return out


def anchors(env) -> list[tuple[dict, float, str]]:
    """(row, pull, state words) of each support an envelope row says is pulled down."""
    return [(r, -r["max_down"], r.get("max_down_state", "")) for r in env if r["max_down"] < 0]


def note(taken: list[str], calm_taken: list[str] = ()) -> str:
    """What the report says of the three ways the job was checked."""
    gov = "; ".join(x for x in (f"at 0.6 D: {', '.join(taken)}" if taken else "",
                                f"with the uplift off: {', '.join(calm_taken)}"
                                if calm_taken else "") if x) \
        or "the loads as entered govern every check"
    return (f"A live load pushes up, and the dead loads and self-weight hold it down: every "
            f"check is made with the loads as entered, with the dead loads at 0.6 ({CLAUSE}), "
            f"and with the uplift off (it comes and goes), and takes the worst; {gov}. The "
            "reactions, extremes and diagrams shown are for the loads as entered; the reaction "
            "envelope gives each support's range over all three. The uplift is taken as "
            "entered, as an allowable-stress load: a wind load worked out to ASCE 7-16 "
            "(strength level) is entered as 0.6 W.")
