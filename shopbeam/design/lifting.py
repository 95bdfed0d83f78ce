"""Lifting devices: the profile a job names (impact, lateral and longitudinal forces, design
factor, deflection), bottom-flange local bending under trolley wheels, and the lateral
trolley force on the runway.

Profiles (`shopbeam.jobs.rules.LIFTING_PROFILES`) come from ``[criteria] lifting``. A job
only tagged ``lifting`` gets the most demanding profile that fits: ``jib-boom`` when the
member is a cantilever held at one place, else ``powered-monorail`` (25 % impact, 20 % lateral, 10 %
longitudinal); a below-the-hook beam is never guessed (its design factor must be named).

Wheel loads on the bottom flange of an I-shape (W, S, HP, M): the local flange stresses of
CMAA 74 (2004) and AISC Design Guide 7 (2nd ed.) for monorail flanges (their section numbers
are not cited: from memory), the same coefficients as EN 1993-6 5.7.2 Table 5.2, all from
memory. With P the load of one wheel, tf the flange
thickness at the wheel, lambda = 2 a / (bf - tw), a the distance from the flange tip to the
wheel contact:

    sigma_x,i = Cx_i P / tf^2 (along the beam),  sigma_y,i = Cy_i P / tf^2 (across)

at point 0 (flange-to-web junction), 1 (under the wheel) and 2 (the flange tip), tension on
the flange's underside positive (the top face of the bottom flange has the same local
stresses with the other sign; both faces are checked). Parallel-flange (W) beams:
    Cx0 = 0.050 - 0.580 lambda + 0.148 e^(3.015 lambda)
    Cx1 = 2.230 - 1.490 lambda + 1.390 e^(-18.33 lambda)
    Cx2 = 0.730 - 1.580 lambda + 2.910 e^(-6.000 lambda)
    Cy0 = -2.110 + 1.977 lambda + 0.0076 e^(6.530 lambda)
    Cy1 = 10.108 - 7.408 lambda - 10.108 e^(-1.364 lambda),  Cy2 = 0
Tapered-flange (S) beams:
    Cx0 = -0.981 - 1.479 lambda + 1.120 e^(1.322 lambda)
    Cx1 = 1.810 - 1.150 lambda + 1.060 e^(-7.700 lambda)
    Cx2 = 1.990 - 2.810 lambda + 0.840 e^(-4.690 lambda)
    Cy0 = -1.096 + 1.095 lambda + 0.192 e^(-6.000 lambda)
    Cy1 = 3.965 - 4.835 lambda - 3.965 e^(-2.675 lambda),  Cy2 = 0
The longitudinal local stress adds to the global bending stress of the bottom fibre at the
wheel; the two directions combine by von Mises, sqrt(sx^2 + sy^2 - sx sy), against
Fy / Omega (Omega 1.67, i.e. 0.60 Fy, the allowable tension of AISC ASD).

Lateral trolley force: the bottom flange alone carries it as a beam on the same supports
(the flange-as-beam approach of AISC Design Guide 7 for runway girders; the torsion of a
force at the flange is carried by this flange, so it covers the twist), combined with
strong-axis bending by AISC 360-16 H1-1b (Pr = 0): Mrx / Mcx + Mry / Mcy <= 1.0, Mcy of the
flange by F6 (flange Zf = tf bf^2 / 4).
"""

from __future__ import annotations

import math
from dataclasses import dataclass, replace
from functools import lru_cache

import numpy as np

from shopbeam.design import fatigue
from shopbeam.design.basis import basis_of, tip_hung  # noqa: F401 (re-exported)
from shopbeam.design.results import Check, Unchecked
from shopbeam.engine.model import Load
from shopbeam.engine.solver import solve, solve_each
from shopbeam.jobs.rules import LIFTING_PROFILES, guessed_profile
from shopbeam.units import fmt

DEFAULT_WHEEL_EDGE = 0.25 * 0.0254  # m: wheel contact 1/4 in from the flange tip (stated)
OMEGA_WHEEL = 1.67  # Fy / 1.67 = 0.60 Fy (AISC 360 ASD allowable tension)


@dataclass(frozen=True)
class Profile:
    name: str
    impact: float
    lateral: float
    longitudinal: float
    nd: float | None  # ASME BTH-1 design factor, None: AISC ASD
    deflection: float
    words: str  # one line naming every value and its source
    guessed: bool = False  # picked from tags = ["lifting"], not named
    category: str = ""  # ASME BTH-1 design category where Nd applies ("A" or "B")


def _own_basis(job) -> str:
    """Whose safety factors a lifting profile without Nd leaves in force, by material."""
    kind = getattr(getattr(job, "material", None), "kind", "")
    if kind == "aluminum":
        return "Aluminum Design Manual 2015 ASD"
    if kind == "lumber":
        return "NDS allowable stresses"
    basis = getattr(getattr(job, "criteria", None), "basis", "")
    if basis == "first-yield" or (kind == "custom" and basis != "asd"):
        return "first yield with the job's safety factor"
    return "AISC 360-16 ASD"


def profile_of(job) -> Profile | None:
    """The job's lifting profile (None for a job that is not a lifting device)."""
    name = getattr(job.criteria, "lifting", "") or ""
    guessed = False
    if not name:
        if not job.lifting:
            return None
        name = guessed_profile(job.supports, job.length)
        guessed = True
    given = getattr(job.criteria, "category", "") or ""
    cat = (given or "B") if LIFTING_PROFILES[name]["nd"] else ""
    # every check of every load state asks: the profile is built once per distinct answer
    return _profile(name, guessed, cat, bool(given), _own_basis(job))


@lru_cache(maxsize=64)
def _profile(name: str, guessed: bool, cat: str, cat_given: bool, own: str) -> Profile:
    p = LIFTING_PROFILES[name]
    nd = p["nd"][cat] if p["nd"] else None
    words = (f"lifting profile {name}" + (" (picked for tags = [\"lifting\"]: the most "
                                          "demanding that fits)" if guessed else "")
             + f": impact {p['impact']:.0%} ({p['impact_source']}); lateral "
             f"{p['lateral']:.0%} ({p['lateral_source']}); longitudinal {p['longitudinal']:.0%} "
             f"({p['longitudinal_source']}); "
             + (f"design factor Nd {nd:g}, ASME BTH-1 Category {cat} (3-1.3, from memory)"
                + (" (category not given: B, the stricter)" if not cat_given else "")
                if nd else f"the member's own safety factors ({own})")
             + f"; deflection {p['deflection_source']}")
    return Profile(name, p["impact"], p["lateral"], p["longitudinal"], nd, p["deflection"],
                   words, guessed, cat)


# ------------------------------------------------------------------ wheel loads on a flange
def flange_coefficients(lam: float, tapered: bool) -> dict[str, float]:
    """Cx0, Cx1, Cx2, Cy0, Cy1, Cy2 (see the module doc; CMAA 74 / EN 1993-6 Table 5.2)."""
    e = math.exp
    if tapered:
        return {"cx0": -0.981 - 1.479 * lam + 1.120 * e(1.322 * lam),
                "cx1": 1.810 - 1.150 * lam + 1.060 * e(-7.700 * lam),
                "cx2": 1.990 - 2.810 * lam + 0.840 * e(-4.690 * lam),
                "cy0": -1.096 + 1.095 * lam + 0.192 * e(-6.000 * lam),
                "cy1": 3.965 - 4.835 * lam - 3.965 * e(-2.675 * lam),
                "cy2": 0.0}
    return {"cx0": 0.050 - 0.580 * lam + 0.148 * e(3.015 * lam),
            "cx1": 2.230 - 1.490 * lam + 1.390 * e(-18.33 * lam),
            "cx2": 0.730 - 1.580 * lam + 2.910 * e(-6.000 * lam),
            "cy0": -2.110 + 1.977 * lam + 0.0076 * e(6.530 * lam),
            "cy1": 10.108 - 7.408 * lam - 10.108 * e(-1.364 * lam),
            "cy2": 0.0}


def wheel_flange_stress(p: float, tf: float, bf: float, tw: float, a: float, tapered: bool,
                        global_stress: float) -> tuple[float, str, dict]:
    """Largest von Mises stress of the bottom flange at points 0, 1, 2 under one wheel load p
    (N, magnitude) with the global bending stress of the bottom fibre there (Pa, tension +),
    on both faces of the flange: the coefficients give the underside, and the top face of
    the bottom flange carries the same local stresses with the other sign. Where the beam
    hogs (a jib, a run-out, over a hanger) the global compression adds to the top face's
    local compression, and that face is the worse; the bottom fibre's global stress is taken
    on both faces (a little more than the top face's: on the safe side). Returns (stress,
    point, numbers used)."""
    lam = min(max(2 * a / (bf - tw), 0.0), 1.0)
    c = flange_coefficients(lam, tapered)
    q = p / tf**2
    best = (-1.0, "", {})
    for face, sign in (("underside", 1.0), ("top face", -1.0)):
        for i in ("0", "1", "2"):
            sx = sign * c["cx" + i] * q + global_stress
            sy = sign * c["cy" + i] * q
            vm = math.sqrt(sx * sx + sy * sy - sx * sy)
            if vm > best[0] * (1 + 1e-12):  # the underside where both faces agree
                best = (vm, i, {"lambda": lam, "cx": c["cx" + i], "cy": c["cy" + i], "sx": sx,
                                "sy": sy, "local_x": sign * c["cx" + i] * q, "face": face})
    return best


def flange_tf_at_wheel(sec, a: float) -> tuple[float, bool]:
    """(flange thickness at the wheel, tapered?): S shapes have a 16.67 % (2 in 12) flange
    slope, tf tabulated at mid-way between the web face and the tip (AISC Manual, common
    practice)."""
    d = sec.dims
    tf = d["tf"]
    tapered = str(getattr(sec, "designation", "")).upper().startswith("S")
    if tapered:
        half = (d["bf"] - d["tw"]) / 2
        tf = tf - (half / 2 - a) / 6.0  # slope 1 in 6: thinner toward the tip
    return max(tf, 0.3 * d["tf"]), tapered


def wheel_check(job, sol, sec, mat, global_allow=None, only_given: bool = False):
    """The bottom-flange check under the worst wheel of the [[moving]] set in this state, and
    under the loads hung from the bottom flange. `only_given`: a job that is not a lifting
    device, whose [[moving]] wheels are not taken as running on the bottom flange (its hung
    loads are taken as on the flange tips all the same, unless `lug = true`)."""
    if sec.shape != "i-beam" or sec.axis != "strong" or not steel_flange(mat):
        return None  # not covered: `lifting_unchecked` / `flange_unchecked` say so
    ws = job.moving[0] if job.moving and not only_given else None
    # (load, contacts, flange tip to contact, words): the trolley's wheels, and on a lifting
    # job every point load hung from the bottom flange (a hoist on a beam clamp or a parked
    # trolley: two contacts at the flange tips, the most demanding fit; a lug welded under
    # the web is lighter on the flange and is J10.1's case, checked too)
    contacts = []
    if ws is not None:
        a_w = ws.wheel_edge if ws.wheel_edge is not None else DEFAULT_WHEEL_EDGE
        contacts += [(ld, ws.wheels_per_axle, a_w,
                      f"wheel load P = axle / {ws.wheels_per_axle}; wheel "
                      + ("given" if ws.wheel_edge is not None else
                         f"default {'6.35 mm' if job.units == 'si' else '1/4 in'}: give "
                         "[[moving]] wheel_edge for the real trolley"))
                     for ld in sol.beam.loads
                     if (ld.key or "") == ws.key and ld.kind == "point"]
    hung = set(getattr(job, "hung", ()) or ())
    # hung loads at one place (the rated load and the hoist's own weight) act on the flange
    # together: one contact carrying their sum
    # (wheels written on any of them count for all; none written: 2, a beam clamp or a
    # two-wheel trolley, the most demanding fit, on any job: a pipe or a heater hung on a
    # beam clamp bends the flange tips as a hoist's clamp does, and only `lug = true` says
    # the load reaches the web through a lug instead)
    given = getattr(job, "contacts", None) or {}
    lugs = set(getattr(job, "lugs", ()) or ())  # on a lug under the web: no flange-tip contact
    together: dict[float, list] = {}
    for ld in sol.beam.loads:
        if ld.kind == "point" and ld.value and (ld.key or "") in hung and ld.key not in lugs:
            got = together.setdefault(ld.at, [ld, 0])
            if got[0] is not ld:
                got[0] = replace(got[0], value=got[0].value + ld.value)
            got[1] = max(got[1], given.get(ld.key or "", 0))
    for ld, n in together.values():
        if not ld.value:
            continue
        if n:
            words = (f"point load hung from the bottom flange on {n} trolley wheels or jaws "
                     f"(wheels = {n}), each 1/4 in in from a flange tip (P = load / {n})")
        else:
            n, words = 2, ("point load hung from the bottom flange, taken as a beam clamp or "
                           "two-wheel trolley bearing on both flange tips 1/4 in in (P = load "
                           "/ 2); write wheels = 4 on it for a four-wheel trolley, or lug = "
                           "true if it hangs from a lug plate welded under the web")
        contacts.append((ld, n, DEFAULT_WHEEL_EDGE, words))
    if not contacts:
        return None
    d = sec.dims
    sbot = sec.sx_bot
    best = None
    for ld, per, a, words in contacts:
        tf, tapered = flange_tf_at_wheel(sec, a)
        p = abs(ld.value) / per
        m = float(sol.moment(ld.at))
        sg = m / sbot  # sagging (+) puts the bottom fibre in tension
        vm, point, used = wheel_flange_stress(p, tf, d["bf"], d["tw"], a, tapered, sg)
        if best is None or vm > best[0]:
            best = (vm, point, used, ld.at, p, sg, a, tf, tapered, per, words)
    vm, point, used, at, p, sg, a, tf, tapered, per, words = best
    prof = profile_of(job)
    scale = prof.nd / 1.67 if prof is not None and prof.nd else 1.0  # below-the-hook: Nd / 1.67
    allow = mat.fy / (OMEGA_WHEEL * scale)
    limit_words = ("Fy / 1.67" if scale == 1.0 else
                   f"Fy / (1.67 x Nd / 1.67) = Fy / {OMEGA_WHEEL * scale:g} (ASME BTH-1 design "
                   "factor Nd in place of the AISC 1.67)")
    names = {"0": "flange-to-web junction", "1": "under the wheel", "2": "flange tip"}
    return Check(
        "wheel flange bending", vm, allow, "Pa",
        f"bottom-flange local bending under a trolley wheel, CMAA 74 / AISC Design "
        f"Guide 7 (2nd ed.) local flange bending (EN 1993-6 Table 5.2 coefficients, from "
        f"memory): sigma = C P / tf^2 ({'tapered' if tapered else 'parallel'} flange, lambda = 2a/(bf - tw) = "
        f"{used['lambda']:.3f}), plus the global bending stress, von Mises <= {limit_words}",
        at,
        detail=f"point {point} ({names[point]}), {used['face']} of the bottom flange; {words}",
        clause="CMAA 74 local flange bending; AISC Design Guide 7 (2nd ed.) monorail flange "
               "bending (sections from memory)",
        source="CMAA 74 / EN 1993-6 5.7.2 coefficients (from memory)",
        params={"P": p, "tf": tf, "a": a, "lambda": used["lambda"], "Cx": used["cx"],
                "Cy": used["cy"], "sigma_global": sg, "sigma_x": used["sx"],
                "sigma_y": used["sy"]})


# ------------------------------------------------------------------ lateral trolley force
def flange_weak_strength(sec, mat) -> tuple[float, str]:
    """Nominal weak-axis moment of one flange alone (AISC 360-16 F6 applied to the flange)."""
    d = sec.dims
    bf, tf = d["bf"], d["tf"]
    fy, e = mat.fy, mat.e
    zf, sf = tf * bf**2 / 4, tf * bf**2 / 6
    mp = min(fy * zf, 1.6 * fy * sf)
    lam = bf / (2 * tf)
    root = math.sqrt(e / fy)
    lp, lr = 0.38 * root, 1.0 * root
    if lam <= lp:
        return mp, "F6-1 Mn = Fy Zf, Zf = tf bf^2 / 4"
    if lam <= lr:
        return mp - (mp - 0.7 * fy * sf) * (lam - lp) / (lr - lp), "F6-2 (noncompact flange)"
    return 0.69 * e / lam**2 * sf, "F6-3 (slender flange)"


def _flange_loads(job, sol, sec, prof: Profile, impact: float):
    """(the wheels or hoist loads, the lateral forces on the flange-as-beam) of the lateral
    trolley force check, or None when it does not apply."""
    if prof is None or not prof.lateral or sec.shape != "i-beam" or sec.axis != "strong":
        return None
    if job.moving:
        mv = job.member_moving()[0]
        wheels = [ld for ld in sol.beam.loads if (ld.key or "") == mv.key and ld.kind == "point"]
        if len(wheels) != len(mv.live):
            return None
    else:
        # a hoist parked at fixed places: every point load of the job is rated load (live)
        # or hoist and trolley weight (dead)
        wheels = hoist_loads(sol)
        if not wheels:
            return None
    # each wheel or hoist load carries (1 + impact) x (its weight + the rated load), the
    # impact raising the hoist and trolley weight too (`loading.load_parts`); the lateral
    # force is 20 % of their sum where they act, without the impact allowance
    lat = [Load("point", at=ld.at, value=prof.lateral * abs(ld.value / (1 + impact)))
           for ld in wheels]
    return wheels, lat


def solve_flanges(job, sols, sec, prof: Profile, impact: float) -> None:
    """The flange-as-beam of each solved state's lateral check solved in one batched pass
    (`solver.solve_each`, the same numbers as one by one) and kept on the state for
    `lateral_check` (many trolley positions are checked in turn)."""
    beams, owners = [], []
    for sol in sols:
        got = _flange_loads(job, sol, sec, prof, impact)
        if got is not None:
            beams.append(replace(sol.beam, ei=1.0, loads=tuple(got[1])))
            owners.append((sol, got))
    if not beams:
        return
    for (sol, got), beam, flange in zip(owners, beams, solve_each(beams)):
        # with what it was worked out from: `lateral_check` with the same takes it as it is
        sol.__dict__["_flange"] = (beam, flange, (job, sec, prof, impact), got)


def lateral_check(job, sol, sec, mat, prof: Profile, impact: float, mcx: float):
    """AISC 360-16 H1-1b with the lateral trolley force on the bottom flange (see module doc)."""
    if not steel_flange(mat):
        return None  # aluminium: not covered (`lifting_unchecked`)
    kept = sol.__dict__.get("_flange")  # solved with the other positions (solve_flanges)
    if kept is not None and kept[2][0] is job and kept[2][1] is sec and kept[2][2] == prof \
            and kept[2][3] == impact:
        (wheels, lat), flange = kept[3], kept[1]
    else:
        got = _flange_loads(job, sol, sec, prof, impact)
        if got is None:
            return None
        wheels, lat = got
        beam = replace(sol.beam, ei=1.0, loads=tuple(lat))
        flange = kept[1] if kept is not None and kept[0] == beam else \
            solve(beam, candidates=False)
    mny, how = flange_weak_strength(sec, mat)
    mcy = mny / 1.67
    # the sum |Mx| / Mcx + |My| / Mcy peaks at a wheel, a support (a cantilever's root, a
    # continuous beam's interior support) or where either moment peaks
    ex, ey = sol.moment.extremes(), flange.moment.extremes()
    spots = ([ld.at for ld in wheels] + [sp.at for sp in sol.beam.supports]
             + [ex.max_at, ex.min_at, ey.max_at, ey.min_at])
    best = None
    at = np.array(spots, float)  # both moments at every spot in one evaluation each
    for x, mx, my in zip(spots, np.abs(sol.moment(at)).tolist(),
                         np.abs(flange.moment(at)).tolist()):
        r = mx / mcx + my / mcy
        if best is None or r > best[0]:
            best = (r, x, mx, my)
    r, x, mx, my = best
    return Check(
        "lateral trolley force", r, 1.0, "",
        f"AISC 360-16 H1-1b (Pr = 0): Mx / Mcx + My / Mcy <= 1.0; the lateral force "
        f"{prof.lateral:.0%} of rated load + hoist + trolley ({prof.name}, ASCE 7-16 4.9.4) "
        f"on the bottom flange alone (flange-as-beam, AISC Design Guide 7); Mcy by {how}, "
        "Omega 1.67", x,
        detail=f"Mx {fmt(mx, 'moment', job.units)} of Mcx {fmt(mcx, 'moment', job.units)}; "
               f"My {fmt(my, 'moment', job.units)} of Mcy {fmt(mcy, 'moment', job.units)}",
        clause="AISC 360-16 H1.1; ASCE 7-16 4.9.4", source="AISC 360-16; ASCE 7-16 (from "
        "memory); AISC Design Guide 7 flange-as-beam",
        params={"Mx": mx, "Mcx": mcx, "My": my, "Mcy": mcy})


def hoist_loads(sol) -> list:
    """The point loads a lifting job's hoist puts on the member (its [[loads]] entries)."""
    return [ld for ld in sol.beam.loads
            if ld.kind == "point" and ld.value and (ld.key or "").startswith("loads")]


def _hand_geared(job) -> str:
    """The hand-geared profile that fits the member: a boom (a free end) or a monorail."""
    from shopbeam.jobs.rules import has_free_end

    return ("hand-geared-jib" if has_free_end(job.supports, job.length)
            else "hand-geared-monorail")


def _static_hoist(job) -> bool:
    return not job.moving and any(ld.kind == "point" and ld.value for ld in job.loads)


# ------------------------------------------------------------------ words
def lifting_notes(job, prof: Profile | None) -> list[str]:
    """The profile named in the report, and the longitudinal force as a quantified caution."""
    if prof is None:
        return []
    out = [prof.words[0].upper() + prof.words[1:] + "."]
    # a hoist given as point loads hung from the flange tips (a trolley or clamp that can
    # travel; not a fixed pick on a lug): the same force from its loads
    tips = set(tip_hung(job)) if not job.moving else set()
    hoist = [ld for ld in job.loads if ld.key in tips and ld.kind == "point" and ld.value]
    if prof.longitudinal and (job.moving or hoist):
        if job.moving:
            ws = job.moving[0]
            per = max(abs(w + d) for w, d in zip(ws.live, ws.dead)) * (1 + prof.impact)
            total = prof.longitudinal * per * len(ws.live)
        else:
            total = prof.longitudinal * abs(sum(ld.value for ld in hoist)) * (1 + prof.impact)
        from shopbeam.jobs.rules import has_free_end  # noqa: PLC0415 - as _hand_geared

        boom = has_free_end(job.supports, job.length)
        out.append(f"Longitudinal force {prof.longitudinal:.0%} of the wheel loads (ASCE 7-16 "
                   f"4.9.5, from memory): about {fmt(total, 'force', job.units)} at the "
                   "entered loads, " + ("along the boom at the wheels, endwise into the mast "
                                        "connection and the end stops, which must carry it"
                                        if boom else
                                        "along the runway at the wheels; the hangers, end "
                                        "stops and their bracing must carry it")
                   + " (not checked on this member).")
    if job.moving and _i_shape(job.section):
        ws, bf = job.moving[0], job.section.dims.get("bf", 0.0)
        first, last = ws.travel[0], ws.travel[1]
        if bf and (first < bf or last > job.length - bf):
            out.append("Wheels reach the end of the beam, where the bottom flange ends: near "
                       "an unstiffened flange end the local flange stresses are higher than "
                       "the interior figures the wheel flange bending check uses (CMAA 74 / "
                       "AISC Design Guide 7 give them for the interior; end values are larger, "
                       "from memory). Fit end stops that keep the wheels at least a flange "
                       "width from the end, or close the end with a plate.")
    default = getattr(job, "hung_default", ())
    if default and _i_shape(job.section):
        out.append("Point loads " + ", ".join(default) + " are taken as the hoist hanging from "
                   "the bottom flange (a trolley or beam clamp), so the flange is checked under "
                   "them; write flange = \"top\" on a load that bears on the top flange.")
    if prof.lateral and (job.moving or _static_hoist(job)) and not _i_shape(job.section):
        out.append(f"Lateral force {prof.lateral:.0%} of rated load + hoist + trolley (ASCE "
                   "7-16 4.9.4): weak-axis bending and torsion of this section are not checked.")
    return out


def _i_shape(sec) -> bool:
    return sec.shape == "i-beam" and sec.axis == "strong"


def steel_flange(material) -> bool:
    """Whether the flange checks under wheels (CMAA 74 / AISC Design Guide 7 coefficients,
    Fy / 1.67; the lateral force by AISC 360-16 F6 and H1) apply to this material: steel and
    stainless, or a typed-in metal as stiff as steel (E 150 GPa or more). Aluminium is not
    covered by them (ADM allowables, rupture, welded strengths)."""
    kind = getattr(material, "kind", "custom")
    return kind in ("steel", "stainless") or (kind == "custom"
                                              and getattr(material, "e", 0.0) >= 150e9)


def _first_yield_lateral(job) -> list:
    """An I-beam on the first-yield basis (a typed-in metal, or basis = "first-yield"): the
    lateral trolley force check adds Mx / Mcx to My / Mcy and needs the bending strength as a
    moment (AISC 360-16 H1-1b), which that basis does not give, so it is not made; a powered
    profile then gets no rating."""
    prof = profile_of(job)
    if not (prof and prof.lateral and (job.moving or _static_hoist(job))):
        return []
    if basis_of(job) != "first-yield":
        return []
    return [Unchecked("lateral trolley force (weak-axis bending of the bottom flange)",
                      f"{prof.lateral:.0%} of rated load + hoist + trolley is checked with the "
                      "AISC 360-16 H1-1b sum, which needs the bending strength as a moment; the "
                      "first-yield basis checks a stress, so it is not made: use a catalog "
                      "section and material (AISC basis), or name a hand-geared device with "
                      f"[criteria] lifting = \"{_hand_geared(job)}\" if the trolley is not "
                      "powered", "ASCE 7-16 4.9.4; AISC 360-16 H1", blocks_rating=True)]


def lifting_unchecked(job, sec) -> list:
    """Trolley-wheel and lateral-force limit states of sections these checks do not cover,
    and fatigue, which no lifting check here covers."""
    if not (job.lifting or getattr(job.criteria, "lifting", "")):
        return []
    # fatigue_category and cycles given and worked out: the fatigue check stands instead
    return ([] if fatigue.checked(job) else [FATIGUE]) + _lifting_unchecked(job, sec)


# Every lift is a load cycle. Below about 20,000 cycles in the member's life fatigue need not
# be checked (AISC 360-16 Appendix 3.1, from memory): a hoist used a few times a day stays
# under it for years. A caution, not a bar to the rating: the static checks decide the load
# to post, and the duty (how many lifts, how heavy) decides whether fatigue must be looked at.
FATIGUE = Unchecked(
    "fatigue under repeated lifts",
    "every lift is a load cycle, and welds, lug holes and the flange under the trolley wheels "
    "crack under many of them; fatigue is not checked. Fewer than about 20,000 lifts in the "
    "member's life need no fatigue check; a hoist in production use (a few lifts an hour) "
    "passes that within a few years: have it checked for its duty (CMAA 74 service class, "
    "ASME BTH-1 service class)",
    "AISC 360-16 Appendix 3; CMAA 74 / ASME BTH-1 service classes (from memory)",
    blocks_rating=False)


def flange_unchecked(job, sec) -> list:
    """An aluminium I-beam with trolley wheels (a lifting job's [[moving]] set or hung hoist,
    or loads hung on a clamp or wheels on any job, `tip_hung`): the flange checks under them use steel's
    method and allowable, so they are not made and no rating is posted."""
    if not _i_shape(sec) or steel_flange(job.material):
        return []
    lifting = bool(job.lifting or getattr(job.criteria, "lifting", ""))
    hung = set(getattr(job, "hung", ()) or ())
    under = bool(lifting and (job.moving or hung)) or bool(tip_hung(job))
    if not under:
        return []
    out = [Unchecked("flange local bending under trolley wheels or clamp jaws",
                     f"the bottom flange of this {getattr(job.material, 'kind', 'typed-in')} "
                     "I-beam carries wheels or jaws; the flange check under them (CMAA 74 / "
                     "AISC Design Guide 7 coefficients against Fy / 1.67) is for steel, and "
                     "aluminium's allowables (ADM: yield and rupture, welded strengths) are "
                     "not applied to it, so it is not made and no rating is posted: have the "
                     "flange checked, or use a steel runway beam",
                     "CMAA 74; AISC Design Guide 7; ADM 2015 (from memory)",
                     blocks_rating=True)]
    prof = profile_of(job)
    if lifting and prof and prof.lateral and (job.moving or _static_hoist(job)):
        out.append(Unchecked("lateral trolley force (weak-axis bending and torsion)",
                             f"{prof.lateral:.0%} of rated load + hoist + trolley is checked on "
                             "steel flanges only (AISC 360-16 F6 and H1); not on aluminium",
                             "ASCE 7-16 4.9.4; AISC 360-16 H1", blocks_rating=True))
    return out


def _lifting_unchecked(job, sec) -> list:
    if _i_shape(sec) and not steel_flange(job.material):
        return []  # flange_unchecked says it
    if _i_shape(sec):
        return _first_yield_lateral(job)
    prof = profile_of(job)
    if not job.moving:
        out = []
        hung = set(getattr(job, "hung", ()) or ())
        hooks = [ld.key for ld in job.loads if ld.kind == "point" and ld.value
                 and ld.case == "live"
                 and not (sec.shape == "rect-tube" and ld.key in hung)]  # K2.2 says it there
        if hooks:
            wood = getattr(job.material, "kind", "") == "lumber"
            part = ("wood (the bolt or lag hole's net section, crushing under the washer or "
                    "plate, NDS 2018 3.1.2, 3.10, 12)" if wood else
                    "wall" if sec.shape in ("rect-tube", "round-tube", "pipe") else "flange")
            what = ("timber" if wood else {"rect-bar": "bar", "round-bar": "bar",
                                           "rect-tube": "tube", "round-tube": "tube"}.get(
                                               sec.shape, sec.shape))
            out.append(Unchecked(
                "the member under the hook, clamp or trolley",
                f"{', '.join(hooks)} hang from or bear on this {what} through a hook, lug, "
                f"eye bolt, clamp or parked trolley; the {part} there is not checked under it "
                "(only a steel I-beam's bottom flange is checked under a hung load), so no "
                "rating is posted: hang the load from an I-beam, or have the attachment and "
                "the member at it checked",
                "NDS 2018 3.1.2, 3.10, 12" if wood else
                "CMAA 74 local flange bending; AISC 360-16 J10, K2", blocks_rating=True))
        if prof and prof.lateral and _static_hoist(job):
            return out + [Unchecked("lateral trolley force (weak-axis bending and torsion)",
                              f"{prof.lateral:.0%} of rated load + hoist + trolley at the hoist "
                              f"is not checked for a {sec.shape} ({sec.axis} axis): only the "
                              "bottom flange of an I-beam is checked for it (AISC Design Guide "
                              "7); use an I-beam, or name a hand-geared device with [criteria] "
                              f"lifting = \"{_hand_geared(job)}\" if the trolley is not "
                              "powered",
                              "ASCE 7-16 4.9.4; AISC 360-16 H1, H3", blocks_rating=True)]
        return out
    out = [Unchecked("flange local bending under trolley wheels",
                     f"trolley wheels on a {sec.shape} ({sec.axis} axis) are not covered by the "
                     "CMAA 74 / Design Guide 7 method (I-shapes only)",
                     "CMAA 74 local flange bending; AISC Design Guide 7", blocks_rating=True)]
    if prof and prof.lateral:
        out.append(Unchecked("lateral trolley force (weak-axis bending and torsion)",
                             f"{prof.lateral:.0%} of rated load + hoist + trolley at the wheels "
                             "is not checked for this section", "ASCE 7-16 4.9.4; AISC 360-16 "
                             "H1, H3", blocks_rating=True))
    return out
