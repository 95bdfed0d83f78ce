"""Local checks where a concentrated force enters the member: supports and point loads.

Every support reaction and every point load (moving wheels too) is a concentrated force on a
flange. For I-shapes and channels bent about the strong axis this module applies AISC 360-16
section J10 without stiffeners:

- J10.1 flange local bending, Rn = 6.25 Fyf tf^2 (J10-1), halved within 10 tf of the member
  end, Omega 1.67, where the force pulls the flange away from the web (a load hung from the
  bottom flange, an uplift reaction held down through the bottom flange);
- J10.2 web local yielding, Rn = Fyw tw (5k + lb) (J10-2), or Fyw tw (2.5k + lb) within d of
  the member end (J10-3), Omega 1.50, for forces of either sign;
- J10.3 web crippling, Rn = 0.80 tw^2 [1 + 3 (lb/d)(tw/tf)^1.5] sqrt(E Fyw tf / tw) Qf
  (J10-4), and within d/2 of the member end 0.40 tw^2 [...] (J10-5a, lb/d <= 0.2) or
  0.40 tw^2 [1 + (4 lb/d - 0.2)(tw/tf)^1.5] ... (J10-5b), Qf = 1, Omega 2.00, for forces
  that push the flange into the web.

Rectangular HSS walls under a concentrated force bearing across the full width of the wall
(a cap plate or saddle, beta = 1) get the two sidewall limit states of AISC 360-16 K2
(Table K2.2, recalled from memory; the same provisions were 360-10 K1.3): sidewall local
yielding Rn = 2 Fy t (5k + lb), k the outside corner radius (1.5 t unless typed in:
`hss_corner_k`; 2.5k + lb within the depth of the member end, as J10-3), Omega 1.50;
sidewall local crippling Rn = 1.6 t^2 [1 + 3 lb /
(H - 3t)] sqrt(E Fy) Qf, Omega 2.00, with the end form taken as J10-5 for two walls (from
memory). Qf = 1.3 - 0.4 U / beta <= 1 depends on the utilisation U of the tube; it is taken
at its lower bound 1.3 - 0.4 Z/S, valid whenever the bending check passes (U = M Omega /
(Fy S) <= Z / S), so the check stays linear in the loads.

Web sidesway buckling, AISC 360-16 J10.4 (from memory), for I-shapes and channels: a force
that bears on a flange in compression (a point load pushing down on the top flange where the
moment sags; a reaction pushing up on the bottom flange where it hogs) at a point where nothing
holds the flanges against moving sideways relative to each other. Rn = Cr tw^3 tf / h^2
[1 + 0.4 ((h/tw)/(Lb/bf))^3] (J10-6, loaded flange restrained against rotation, applies while
the ratio is at most 2.3) or Cr tw^3 tf / h^2 [0.4 ((h/tw)/(Lb/bf))^3] (J10-7, not restrained
against rotation, ratio at most 1.7); past those limits the limit state does not apply.
Omega 1.76; Cr = 960,000 ksi where the moment at the force is below My (ASD: 1.5 Ma < My),
else 480,000 ksi; Lb is the largest laterally unbraced length of either flange at the force.
How this model holds the flanges: `restrained = true` holds them against relative movement all
along (J10.4 then does not apply); a support that braces holds both flanges where it sits (so
J10.4 does not apply there); `braces` and `braced = true` are taken as holding the top flange
only (conservative: a deck or a brace clipped to the top flange), unless `braces_flange =
"both"` says the braces hold the bottom flange too (kickers, full-depth stiffeners); the
bottom flange is otherwise held only at the supports that brace; no flange is taken as
restrained against rotation, so J10-7
is used. Where the job has moving loads the moment at a force changes with the trolley: the
force is then taken as on a flange in compression, with Cr 480,000 ksi and Lb the largest
unbraced length of either flange anywhere (conservative). With patterned loads the moment is
the largest over every pattern (`moments`).

Bearing length lb comes from the job (``bearing`` on a support or a point load, ``beam.bearing``
for all). When it is missing: in web local yielding a support reaction within d of the member
end of an I-shape or channel takes lb = k (kdes), the least AISC 360-16 J10.2 lets an end
beam reaction take ("lb not less than k for end beam reactions", from memory); that floor is
J10.2's own, so web crippling (J10.3, which has none) takes lb = 0 there; a trolley wheel
bears at a point, lb = 0; every other force takes lb = 0 (a knife edge: the lowest strength,
conservative). The check says which. Every check is linear in the concentrated force, so the
capacity search scales
it exactly.
"""

from __future__ import annotations

import math
from dataclasses import dataclass
from functools import lru_cache

import numpy as np

from shopbeam import units
from shopbeam.design.basis import support_braces
from shopbeam.design.lifting import profile_of, tip_hung
from shopbeam.design.results import Check, Unchecked

OMEGA_FLB = 1.67  # AISC 360-16 J10.1
OMEGA_WLY = 1.50  # AISC 360-16 J10.2
OMEGA_WCR = 2.00  # AISC 360-16 J10.3
OMEGA_WSB = 1.76  # AISC 360-16 J10.4 (from memory)
# AISC 360-16 J10.4 (from memory): Cr = 960,000 ksi where Mu < My at the force (ASD:
# 1.5 Ma < My), else 480,000 ksi
CR_ELASTIC = 960_000 * units.KSI
CR_YIELDED = 480_000 * units.KSI
SIDESWAY = "web sidesway buckling"
SOURCE = "AISC 360-16"
HSS_SOURCE = "AISC 360-16 (from memory)"
ZERO = 1e-9  # N: smaller forces are not forces


# ------------------------------------------------------------------ the formulas (SI)
def web_local_yielding(fy: float, tw: float, k: float, lb: float, end: float,
                       d: float) -> tuple[float, str]:
    """AISC 360-16 J10.2: (Rn, equation). `end` is the distance from the member end."""
    if end > d:
        return fy * tw * (5 * k + lb), "J10-2"
    return fy * tw * (2.5 * k + lb), "J10-3"


def web_crippling(e: float, fy: float, tw: float, tf: float, d: float, lb: float,
                  end: float, qf: float = 1.0) -> tuple[float, str]:
    """AISC 360-16 J10.3: (Rn, equation)."""
    root = math.sqrt(e * fy * tf / tw) * qf
    r = (tw / tf) ** 1.5
    if end >= d / 2:
        return 0.80 * tw**2 * (1 + 3 * (lb / d) * r) * root, "J10-4"
    if lb / d <= 0.2:
        return 0.40 * tw**2 * (1 + 3 * (lb / d) * r) * root, "J10-5a"
    return 0.40 * tw**2 * (1 + (4 * lb / d - 0.2) * r) * root, "J10-5b"


def flange_local_bending(fy: float, tf: float, end: float) -> tuple[float, str]:
    """AISC 360-16 J10.1: Rn = 6.25 Fyf tf^2, halved within 10 tf of the member end."""
    rn = 6.25 * fy * tf**2
    if end < 10 * tf:
        return 0.5 * rn, "J10-1 (x0.5: within 10 tf of the end)"
    return rn, "J10-1"


def hss_wall_yielding(fy: float, t: float, k: float, lb: float, end: float,
                      h: float) -> tuple[float, str]:
    """AISC 360-16 Table K2.2 sidewall local yielding (both walls), from memory."""
    if end > h:
        return 2 * fy * t * (5 * k + lb), "K2.2 sidewall local yielding 2 Fy t (5k + lb)"
    return 2 * fy * t * (2.5 * k + lb), "K2.2 sidewall local yielding 2 Fy t (2.5k + lb) (end)"


def hss_wall_crippling(e: float, fy: float, t: float, h: float, lb: float, end: float,
                       qf: float) -> tuple[float, str]:
    """AISC 360-16 Table K2.2 sidewall local crippling (both walls), from memory."""
    hw = h - 3 * t
    root = math.sqrt(e * fy) * qf
    if end >= h / 2:
        return 1.6 * t**2 * (1 + 3 * lb / hw) * root, \
            "K2.2 sidewall local crippling 1.6 t^2 (1 + 3 lb/(H - 3t)) sqrt(E Fy) Qf"
    if lb / hw <= 0.2:
        return 0.8 * t**2 * (1 + 3 * lb / hw) * root, "K2.2 sidewall crippling, end form as J10-5a"
    return 0.8 * t**2 * (1 + (4 * lb / hw - 0.2)) * root, \
        "K2.2 sidewall crippling, end form as J10-5b"


def web_sidesway_buckling(cr: float, tw: float, tf: float, h: float, lb: float, bf: float,
                          rotation_restrained: bool = False) -> tuple[float | None, str, float]:
    """AISC 360-16 J10.4 (from memory): (Rn, equation, (h/tw)/(Lb/bf)); Rn is None where the
    limit state does not apply (the ratio over 2.3 with the loaded flange restrained against
    rotation, J10-6; over 1.7 without, J10-7)."""
    ratio = (h / tw) / (lb / bf) if lb > 0 else math.inf
    base = cr * tw**3 * tf / h**2
    if rotation_restrained:
        if ratio > 2.3:
            return None, "J10-6 does not apply: (h/tw)/(Lb/bf) > 2.3", ratio
        return base * (1 + 0.4 * ratio**3), "J10-6", ratio
    if ratio > 1.7:
        return None, "J10-7 does not apply: (h/tw)/(Lb/bf) > 1.7", ratio
    return base * 0.4 * ratio**3, "J10-7", ratio


def hss_qf_lower(sec) -> float:
    """Lower bound of Qf = 1.3 - 0.4 U (beta = 1) while the bending check passes."""
    s = min(sec.sx_top, sec.sx_bot)
    z = sec.zx or s
    return max(0.0, min(1.0, 1.3 - 0.4 * z / s))


# ------------------------------------------------------------------ the forces of a state
@dataclass(frozen=True)
class Force:
    """A concentrated force on the member: + up, entering through the top or bottom face."""

    at: float
    force: float
    face: str  # "top" | "bottom"
    bearing: float | None  # m; None: not given
    what: str
    moving: bool = False  # a wheel of a [[moving]] set
    support: bool = False  # a support reaction (not a load)

    @property
    def pulls(self) -> bool:
        """True when the force pulls its flange away from the web (tension in the web)."""
        return (self.face == "top" and self.force > 0) or (self.face == "bottom" and self.force < 0)


def bearing_of(job, key: str) -> float | None:
    """Bearing length (m) of the support or point load with this key, else beam.bearing,
    else None (not given)."""
    got = (getattr(job, "bearings", None) or {}).get(key)
    return got if got is not None else getattr(job, "bearing", None)


def face_of(job, key: str) -> str:
    """The flange a point load enters through: ``flange = "bottom"`` on its [[loads]] entry
    hangs it from the bottom flange (default top); wheels of a [[moving]] set run on the
    bottom flange of a lifting job (a trolley)."""
    if key in (getattr(job, "hung", ()) or ()):
        return "bottom"
    if key.startswith("moving") and job.lifting:
        return "bottom"
    return "top"


@lru_cache(maxsize=4096)
def _where(x: float, negative: bool, system: str) -> str:
    """A position in words (`units.fmt`), kept: the local checks of every load state name
    the same supports and loads (`negative` keeps -0.0 apart from 0.0)."""
    return units.fmt(x, "length", system)


def forces_of(job, sol) -> list[Force]:
    """Every concentrated force of one solved state: reactions (on the bottom face; not at a
    fixed end, which is a connection) and point loads summed where they act together."""
    step = 1e-6 * max(job.length, 1e-9)  # a wheel nudged past a support: 0 ft, not 1e-07 ft

    def fmt(x):
        x = round(x / step) * step + 0.0
        return _where(x, math.copysign(1.0, x) < 0, job.units)
    out = []
    for n, r in enumerate(sol.reactions):
        # a fixed end is a connection (welded or bolted into a wall or column), not a bearing
        if abs(r.force) <= ZERO or r.kind == "fixed":
            continue
        lb = bearing_of(job, r.key or "")
        out.append(Force(r.at, r.force, "bottom", lb, f"{r.kind} support at {fmt(r.at)}",
                         support=True))
    tol = 1e-9 * max(job.length, 1e-9)
    groups: dict[tuple, list] = {}
    for ld in sol.beam.loads:
        if ld.kind != "point" or ld.value == 0:
            continue
        key = ld.key or ""
        face = face_of(job, key)
        lb = bearing_of(job, key)
        slot = (round(ld.at / tol), face)
        groups.setdefault(slot, []).append((ld, lb))
    for (_, face), items in groups.items():
        total = sum(ld.value for ld, _ in items)
        if abs(total) <= ZERO:
            continue
        bearings = [lb for _, lb in items]
        lb = None if any(b is None for b in bearings) else min(bearings)
        at = items[0][0].at
        names = sorted({(ld.label or (f"point load ({ld.key})" if ld.key else "point load"))
                        for ld, _ in items})
        mv = any((ld.key or "").startswith("moving") for ld, _ in items)
        out.append(Force(at, total, face, lb, f"{', '.join(names)} at {fmt(at)}", mv))
    return out


# ------------------------------------------------------------------ checks of one state
def applies(sec) -> str:
    """"web" (I-shapes, channels and their built-up forms, strong axis), "hss" or ""."""
    shape = sec.shape
    if shape in ("i-beam", "channel", "double-channel") and sec.axis == "strong":
        return "web"
    if shape == "cover-plated" and "tw" in sec.dims and sec.axis == "strong":
        return "web"
    if shape == "rect-tube" or (shape == "cover-plated" and "t_des" in sec.dims):
        return "hss"
    return ""


def end_reaction_default(f: Force, end: float, d: float) -> bool:
    """True when lb is not given and f is an end beam reaction (a support within d of the
    member end): lb = k then in web local yielding (AISC 360-16 J10.2, from memory; J10.3's
    web crippling has no such floor and takes lb = 0)."""
    return f.bearing is None and f.support and end <= d


_LIMITS: dict[tuple, tuple] = {}  # limit_states by (section, material, where, how)


def limit_states(sec, mat, length: float, f: Force, lifting: bool = False):
    """(name, Rn, equation, Omega, clause, params) of every local limit state that applies to
    force f on this section (the direction decides: crippling only where the force bears on
    the flange, flange local bending only where it pulls). They read the force's place,
    bearing, kind and direction, never its size, so they are kept for the next load state
    (a capacity search asks the same supports at every factor)."""
    key = (id(sec), id(mat), length, f.at, f.bearing, f.support, f.moving, f.pulls, lifting)
    got = _LIMITS.get(key)
    if got is not None and got[0] is sec and got[1] is mat:
        return got[2]
    out = _limit_states(sec, mat, length, f, lifting)
    if len(_LIMITS) > 4096:
        _LIMITS.clear()
    _LIMITS[key] = (sec, mat, out)  # the objects kept too: an id is not reused while held
    return out


def _limit_states(sec, mat, length: float, f: Force, lifting: bool = False):
    kind = applies(sec)
    if not kind or getattr(mat, "kind", "") not in ("steel", "stainless"):
        return []
    fy, e = mat.fy, mat.e
    d = sec.dims
    end = max(0.0, min(f.at, length - f.at))
    lb = f.bearing if f.bearing is not None else 0.0
    out = []
    if kind == "web":
        webs = 2 if sec.shape == "double-channel" else 1
        tw, tf, dd, k = d["tw"], d["tf"], d["d"], d["kdes"]
        # AISC 360-16 J10.2: lb not less than k for end beam reactions (yielding only)
        lb_y = k if end_reaction_default(f, end, dd) else lb
        rn, eq = web_local_yielding(fy, tw, k, lb_y, end, dd)
        out.append(("web local yielding", webs * rn, eq, OMEGA_WLY, "AISC 360-16 J10.2",
                    {"tw": tw, "k": k, "d": dd, "webs": webs}))
        if f.pulls:
            if not (lifting and f.moving):  # trolley wheels: see the wheel-load check
                rn, eq = flange_local_bending(fy, tf, end)
                out.append(("flange local bending", rn, eq, OMEGA_FLB, "AISC 360-16 J10.1",
                            {"tf": tf}))
        else:
            rn, eq = web_crippling(e, fy, tw, tf, dd, lb, end)
            out.append(("web crippling", webs * rn, eq, OMEGA_WCR, "AISC 360-16 J10.3",
                        {"tw": tw, "tf": tf, "d": dd, "webs": webs, "qf": 1.0}))
    else:
        t, h = d["t_des"], d["h"]
        k = hss_corner_k(d)
        rn, eq = hss_wall_yielding(fy, t, k, lb, end, h)
        out.append(("wall local yielding", rn, eq, OMEGA_WLY, "AISC 360-16 K2, Table K2.2",
                    {"t": t, "k": k, "h": h}))
        if not f.pulls:
            qf = hss_qf_lower(sec)
            rn, eq = hss_wall_crippling(e, fy, t, h, lb, end, qf)
            out.append(("wall crippling", rn, eq, OMEGA_WCR, "AISC 360-16 K2, Table K2.2",
                        {"t": t, "h": h, "qf": qf}))
    return out


def hss_corner_k(dims) -> float:
    """k of the HSS wall checks (Table K2.2): the outside corner radius, which AISC 360-16
    K2 permits to be taken as 1.5 t when it is not known (from memory). A tube's actual
    radius varies from mill to mill; the catalog's 2 t (the AISC Shapes Database's figure
    for its section properties) is not a measured one, so 1.5 t is used unless the job
    typed in the radius (`corner_radius` of a rect-tube)."""
    return dims.get("r_typed") or 1.5 * dims["t_des"]


def design_factor_scale(job) -> float:
    """A below-the-hook beam (ASME BTH-1): the AISC Omegas of these checks times Nd / 1.67,
    the ratio of its design factor to the AISC one (BTH-1 gives no local-force rules of its
    own here; the same margin over AISC ASD as its bending check, from memory). Else 1."""
    prof = profile_of(job)
    return prof.nd / 1.67 if prof is not None and prof.nd else 1.0


def local_checks(job, sol, sec=None, moments=None) -> list[Check]:
    """The worst of each local limit state over the concentrated forces of one state.
    `moments(x) -> (largest, smallest)` moment at x over the load states the caller covers
    (web sidesway buckling reads it; default this state's own moment)."""
    sec = sec or job.section
    if not applies(sec) or getattr(job.material, "kind", "") not in ("steel", "stainless"):
        return []
    scale = design_factor_scale(job)
    worst: dict[str, tuple] = {}
    forces = forces_of(job, sol)
    for f in forces:
        for name, rn, eq, omega, clause, extra in limit_states(sec, job.material, job.length,
                                                               f, job.lifting):
            omega = omega * scale
            allow = rn / omega
            ratio = abs(f.force) / allow if allow > 0 else math.inf
            old = worst.get(name)
            if old is None or ratio > old[0]:
                worst[name] = (ratio, f, rn, eq, omega, clause, extra)
    out = [_check(job, sec, name, *w) for name, w in worst.items()]
    side = sidesway_check(job, sol, sec, forces, moments)
    return out + ([side] if side is not None else [])


# ------------------------------------------------------------------ web sidesway buckling
def flange_stops(job) -> tuple[list[float] | None, list[float]]:
    """The points that hold each flange against moving sideways, with the member's ends:
    (top, bottom); top is None when `braced = true` holds it all along. `braces` and
    `braced` are taken as holding the top flange only; the bottom flange is held at the
    supports that brace (conservative, see the module), and at the braces too where the job
    says they hold both flanges (`braces_flange = "both"`: kickers, full-depth
    connections)."""
    L = job.length
    sup = [x for x in support_braces(job, job.supports) if 0.0 <= x <= L]
    both = getattr(job, "braces_flange", None) == "both"
    bottom = sorted({0.0, L, *sup, *(x for x in job.braces if both and 0.0 <= x <= L)})
    if job.braced:
        return None, bottom
    return sorted({0.0, L, *sup, *(x for x in job.braces if 0.0 <= x <= L)}), bottom


def unbraced_at(stops: list[float] | None, x: float, tol: float) -> float:
    """The largest unbraced length of a flange held at `stops` that touches x (0 when held
    all along)."""
    if stops is None:
        return 0.0
    return max((b - a for a, b in zip(stops, stops[1:]) if a - tol <= x <= b + tol),
               default=0.0)


def sidesway_possible(job, sec, mat) -> bool:
    """Whether web sidesway buckling can apply to this section in this job (a sizing sweep
    leaves it to the full check where it can): an I-shape or channel in steel, not
    `restrained`, with a point load, a wheel set or a support that does not brace."""
    if job.restrained or applies(sec) != "web" or \
            getattr(mat, "kind", "") not in ("steel", "stainless"):
        return False
    held = set(support_braces(job, job.supports))
    return bool(any(ld.kind == "point" and ld.value for ld in job.loads)
                or getattr(job, "moving", ())
                or any(sp.kind in ("pin", "roller", "spring") and sp.at not in held
                       for sp in job.supports))


def sidesway_dims(sec) -> dict:
    d = sec.dims
    tw, tf, bf = d["tw"], d["tf"], d["bf"]
    h_tw = d.get("h_tw") or (d["d"] - 2 * d["kdes"]) / tw
    return {"tw": tw, "tf": tf, "bf": bf, "h": h_tw * tw,
            "webs": 2.0 if sec.shape == "double-channel" else 1.0}


def sidesway_check(job, sol, sec, forces=None, moments=None) -> Check | None:
    """AISC 360-16 J10.4 web sidesway buckling (see the module): the worst over the forces
    of one state that bear on a flange in compression where nothing holds the flanges
    against relative sideways movement, or None where it applies to none."""
    if job.restrained or applies(sec) != "web":
        return None
    L = job.length
    tol = 1e-9 * max(L, 1e-9)
    held = support_braces(job, job.supports)
    top, bottom = flange_stops(job)
    moving = bool(getattr(job, "moving", ()))
    dm = sidesway_dims(sec)
    fy = job.material.fy
    my = fy * min(sec.sx_top, sec.sx_bot)
    omega = OMEGA_WSB * design_factor_scale(job)
    if moving:
        lb_all = max(max(b - a for a, b in zip(s, s[1:])) for s in (top or [0.0, 0.0], bottom))
    worst = None
    for f in forces if forces is not None else forces_of(job, sol):
        if f.pulls or abs(f.force) <= ZERO:
            continue
        if any(abs(h - f.at) <= tol for h in held):
            continue  # a support that braces holds both flanges here
        if getattr(job, "braces_flange", None) == "both" and not job.braced and \
                any(abs(x - f.at) <= tol for x in job.braces):
            continue  # so does a brace said to hold both flanges
        if moving:
            mc, lb, lbt, lbb = math.inf, lb_all, lb_all, lb_all
        else:
            hi, lo = moments(f.at) if moments is not None else (float(sol.moment(f.at)),) * 2
            mc = hi if f.face == "top" else -lo  # the loaded flange's compression moment
            if not mc > 1e-9 * abs(f.force) * max(L, 1e-9):
                continue  # the loaded flange is in tension here: not J10.4
            lbt, lbb = unbraced_at(top, f.at, tol), unbraced_at(bottom, f.at, tol)
            lb = max(lbt, lbb)
        cr = CR_ELASTIC if 1.5 * mc < my else CR_YIELDED
        rn, eq, r = web_sidesway_buckling(cr, dm["tw"], dm["tf"], dm["h"], lb, dm["bf"])
        if rn is None:
            continue
        rn *= dm["webs"]
        ratio = abs(f.force) * omega / rn if rn > 0 else math.inf
        if worst is None or ratio > worst[0]:
            worst = (ratio, f, rn, eq, r, cr, mc, lb, lbt, lbb)
    if worst is None:
        return None
    return _sidesway(job, sec, dm, my, omega, moving, *worst[1:])


def _sidesway(job, sec, dm, my, omega, moving, f, rn, eq, r, cr, mc, lb, lbt, lbb) -> Check:
    sy = job.units
    ln = lambda x: units.fmt(x, "length", sy)  # noqa: E731
    sm = lambda x: units.fmt(x, "small_length", sy)  # noqa: E731
    flange = "top" if f.face == "top" else "bottom"
    crw = "960,000 ksi" if cr == CR_ELASTIC else "480,000 ksi"
    if moving:
        where = ("moving loads: the moment at the force changes with the trolley, so its "
                 f"flange is taken as in compression, Cr {crw} and Lb {ln(lb)} the largest "
                 "unbraced length of either flange anywhere (conservative)")
    else:
        sense = "sags" if flange == "top" else "hogs"
        where = (f"the moment {sense} there ({units.fmt(mc, 'moment', sy)}), so the loaded "
                 f"{flange} flange is in compression; Cr {crw} (1.5 Ma "
                 f"{'<' if cr == CR_ELASTIC else '>='} My = Fy Sx = "
                 f"{units.fmt(my, 'moment', sy)}); Lb {ln(lb)}, the largest unbraced length "
                 f"of either flange at the force (top flange {ln(lbt) if lbt else 'braced all along'}, "
                 f"bottom flange {ln(lbb)})")
    hold = ("braces and braced = true are taken as holding the top flange only (conservative; "
            "braces_flange = \"both\" says the braces hold the bottom flange too); "
            "the bottom flange is held only at the supports that brace; the loaded flange is "
            "not taken as restrained against rotation, so J10-7 (restrained = true would hold "
            "the flanges against relative sideways movement, and J10.4 would not apply)")
    webs = " x 2 webs" if dm["webs"] == 2 else ""
    formula = (f"AISC 360-16 J10.4: Ru <= Rn / {omega:.3g}, Rn = Cr tw^3 tf / h^2 [0.4 "
               "((h/tw)/(Lb/bf))^3] (J10-7, loaded flange not restrained against rotation; "
               "applies while (h/tw)/(Lb/bf) <= 1.7; J10-6 [1 + 0.4 (...)^3] when restrained, "
               f"<= 2.3), Cr 960,000 ksi where 1.5 Ma < My, else 480,000 ksi (from memory)"
               f"{webs}; {eq} at {f.what}: (h/tw)/(Lb/bf) = {dm['h'] / dm['tw']:.3g} / "
               f"({ln(lb)} / {sm(dm['bf'])}) = {r:.3g}")
    scale = design_factor_scale(job)
    if scale != 1.0:
        formula += (f"; below-the-hook: Omega x Nd / 1.67 = {omega:.3g} (ASME BTH-1 design "
                    f"factor Nd {scale * 1.67:g} in place of the AISC 1.67)")
    params = {"Rn": rn, "omega": omega, "Cr": cr, "h": dm["h"], "tw": dm["tw"],
              "tf": dm["tf"], "bf": dm["bf"], "Lb": lb, "Lb_top": lbt, "Lb_bottom": lbb,
              "ratio_h_tw_Lb_bf": r, "My": my, "webs": dm["webs"]}
    if math.isfinite(mc):
        params["Ma"] = mc
    return Check(SIDESWAY, abs(f.force), rn / omega, "N", formula, f.at,
                 detail=f"{f.what} (bears on the {flange} flange): {eq}; {where}; {hold}",
                 clause=f"AISC 360-16 J10.4, eq. {eq}", source="AISC 360-16 (from memory)",
                 params=params)


def sizing_items(job, ss, sw_sol, pats) -> list[tuple]:
    """The concentrated forces of a sizing sweep as (Force with force = +1 or -1 never used,
    fixed part, self-weight part per unit weight, live part per state): every state's force
    is fixed + w_self x sw + k (1 + impact) x live[state]. Reactions come from the unit
    solutions; point loads from the load parts."""
    out = []
    for n, r in enumerate(ss.fixed.reactions):
        if r.kind == "fixed":
            continue
        lb = bearing_of(job, r.key or "")
        a = r.force - sw_sol.reactions[n].force
        s = sw_sol.reactions[n].force
        lv = np.array([ss.live.reactions[n].force + sum(ss.spans[i].reactions[n].force
                                                         for i in p) for p in pats])
        out.append((r.at, "bottom", lb, False, a, s, lv, True))
    tol = 1e-9 * max(job.length, 1e-9)
    groups: dict = {}

    def add(ld, part, p_index=None):
        key = ld.key or ""
        face = face_of(job, key)
        lb = bearing_of(job, key)
        slot = (round(ld.at / tol), face)
        g = groups.setdefault(slot, {"at": ld.at, "lb": [], "a": 0.0,
                                     "lv": np.zeros(len(pats))})
        g["lb"].append(lb)
        if part == "fixed":
            g["a"] += ld.value
        elif part == "live":
            g["lv"] += ld.value
        else:
            g["lv"] += np.array([ld.value if p_index in p else 0.0 for p in pats])

    parts = ss.parts
    for ld in parts.fixed:
        if ld.kind == "point" and ld.value:
            add(ld, "fixed")
    for ld in parts.live:
        if ld.kind == "point" and ld.value:
            add(ld, "live")
    for si, loads in enumerate(ss.span_loads):
        for ld in loads:
            if ld.kind == "point" and ld.value:
                add(ld, "span", si)
    for (_, face), g in groups.items():
        lb = None if any(b is None for b in g["lb"]) else min(g["lb"])
        out.append((g["at"], face, lb, False, g["a"], 0.0, g["lv"]))
    return out


def sizing_allowables_many(job, secs, mats, items):
    """The local allowable of every item (at, face, lb, moving, ..., support) on many
    sections at once (a sizing sweep), vectorised over the sections: the least Rn / (Omega x
    design factor scale) of the `limit_states` that apply, when the force pulls and when it
    bears: (pull, bear), each (allowables (S, items), names (S, items); inf and "" where
    none applies). Every section must have a local limit state (`applies`) and a steel or
    stainless material; the numbers are those of `limit_states`, equation for equation
    (tested equal, force by force)."""
    S, n = len(secs), len(items)
    scale = design_factor_scale(job)
    lifting, length = job.lifting, job.length
    out = {sign: (np.full((S, n), math.inf), np.full((S, n), "", dtype=object))
           for sign in (1.0, -1.0)}
    kinds = np.array([applies(s) for s in secs])
    fy = np.array([m.fy for m in mats])
    e = np.array([m.e for m in mats])
    for kind in ("web", "hss"):
        sel = np.flatnonzero(kinds == kind)
        if not len(sel):
            continue
        ss = [secs[i] for i in sel]
        f_y, e_ = fy[sel], e[sel]
        if kind == "web":
            tw = np.array([s.dims["tw"] for s in ss])
            tf = np.array([s.dims["tf"] for s in ss])
            dd = np.array([s.dims["d"] for s in ss])
            kd = np.array([s.dims["kdes"] for s in ss])
            webs = np.array([2.0 if s.shape == "double-channel" else 1.0 for s in ss])
        else:
            t_ = np.array([s.dims["t_des"] for s in ss])
            h_ = np.array([s.dims["h"] for s in ss])
            kr = np.array([hss_corner_k(s.dims) for s in ss])
            qf = np.array([hss_qf_lower(s) for s in ss])
        for j, it in enumerate(items):
            at, face, lb0, moving = it[:4]
            support = len(it) > 7 and bool(it[7])
            end = max(0.0, min(at, length - at))
            lb = np.full(len(sel), lb0 if lb0 is not None else 0.0)
            for sign in (1.0, -1.0):
                pulls = sign > 0  # a force + up on the top face or - up on the bottom pulls
                states = []  # (name, Rn array, Omega), in limit_states order
                if kind == "web":
                    lbw = np.where((lb0 is None) & support & (end <= dd), kd, lb)
                    rn = np.where(end > dd, f_y * tw * (5 * kd + lbw),
                                  f_y * tw * (2.5 * kd + lbw))
                    states.append(("web local yielding", webs * rn, OMEGA_WLY))
                    if pulls:
                        if not (lifting and moving):
                            rn = 6.25 * f_y * tf**2 * np.where(end < 10 * tf, 0.5, 1.0)
                            states.append(("flange local bending", rn, OMEGA_FLB))
                    else:
                        root = np.sqrt(e_ * f_y * tf / tw)
                        r = (tw / tf) ** 1.5
                        ld = lb / dd  # J10.3 has no floor of k at an end reaction
                        rn = np.where(end >= dd / 2, 0.80 * tw**2 * (1 + 3 * ld * r) * root,
                                      np.where(ld <= 0.2, 0.40 * tw**2 * (1 + 3 * ld * r) * root,
                                               0.40 * tw**2 * (1 + (4 * ld - 0.2) * r) * root))
                        states.append(("web crippling", webs * rn, OMEGA_WCR))
                else:
                    rn = np.where(end > h_, 2 * f_y * t_ * (5 * kr + lb),
                                  2 * f_y * t_ * (2.5 * kr + lb))
                    states.append(("wall local yielding", rn, OMEGA_WLY))
                    if not pulls:
                        hw = h_ - 3 * t_
                        root = np.sqrt(e_ * f_y) * qf
                        rn = np.where(end >= h_ / 2, 1.6 * t_**2 * (1 + 3 * lb / hw) * root,
                                      np.where(lb / hw <= 0.2,
                                               0.8 * t_**2 * (1 + 3 * lb / hw) * root,
                                               0.8 * t_**2 * (1 + (4 * lb / hw - 0.2)) * root))
                        states.append(("wall crippling", rn, OMEGA_WCR))
                vals, names = out[sign]
                best = np.full(len(sel), math.inf)
                name = np.full(len(sel), "", dtype=object)
                for nm, rn, om in states:  # strictly less: the first of equals, as the scalar
                    a = rn / (om * scale)
                    take = a < best
                    best = np.where(take, a, best)
                    name = np.where(take, nm, name)
                vals[sel, j] = best
                names[sel, j] = name
    return out[1.0], out[-1.0]


def _check(job, sec, name, ratio, f, rn, eq, omega, clause, extra) -> Check:
    params_lb = f.bearing if f.bearing is not None else 0.0
    end = max(0.0, min(f.at, job.length - f.at))
    k_end = (name == "web local yielding" and end_reaction_default(f, end, sec.dims["d"]))
    if k_end:
        params_lb = sec.dims["kdes"]
    small = (f"{params_lb / units.IN:.4g} in" if job.units == "us"
             else f"{params_lb * 1000:.4g} mm")
    give = "give bearing = \"...\" on the support or load, or beam.bearing"
    if f.bearing is not None:
        given = short = f"bearing length lb = {small} from the job"
    elif k_end:
        given = (f"bearing length not given: lb = k = {small}, the least AISC 360-16 J10.2 "
                 f"allows for an end beam reaction (from memory); {give}")
        short = f"lb = k = {small}: end reaction, bearing length not given"
    elif f.moving:
        given = ("a trolley wheel bears at a point: lb = 0 (the force spreads through the "
                 "flange over 5k, or 2.5k near the end)")
        short = "lb = 0: a wheel bears at a point"
    else:
        given = f"bearing length not given: lb = 0 taken (a knife edge, conservative); {give}"
        short = "lb = 0: bearing length not given (conservative)"
    if name == "flange local bending":  # J10-1 has no bearing length
        given = short = "J10-1 does not depend on the bearing length"
    src = HSS_SOURCE if clause.endswith("K2.2") else SOURCE
    formula = {"web local yielding": "Ru <= Rn / 1.50, Rn = Fyw tw (5k + lb) (J10-2) or "
                                     "Fyw tw (2.5k + lb) within d of the end (J10-3)",
               "web crippling": "Ru <= Rn / 2.00, Rn = 0.80 tw^2 [1 + 3 (lb/d)(tw/tf)^1.5] "
                                "sqrt(E Fyw tf / tw) Qf (J10-4; J10-5a/b within d/2 of the end)",
               "flange local bending": "Ru <= Rn / 1.67, Rn = 6.25 Fyf tf^2 (J10-1; half within "
                                       "10 tf of the end)",
               "wall local yielding": "Ru <= Rn / 1.50, Rn = 2 Fy t (5k + lb), k = outside "
                                      "corner radius, 1.5 t unless corner_radius is typed in "
                                      "(load across the full wall width)",
               "wall crippling": "Ru <= Rn / 2.00, Rn = 1.6 t^2 [1 + 3 lb/(H - 3t)] sqrt(E Fy) "
                                 "Qf, Qf = 1.3 - 0.4 Z/S (lower bound while bending passes)"}[name]
    params = {"Rn": rn, "omega": omega, "lb": params_lb, "fy": job.material.fy,
              "end_distance": max(0.0, min(f.at, job.length - f.at))}
    params.update({k: float(v) for k, v in extra.items()})
    sense = "pulls on" if f.pulls else "bears on"
    part = "flange" if applies(sec) == "web" else "wall"  # a tube has walls, not flanges
    scale = design_factor_scale(job)
    if scale != 1.0:
        formula += (f"; below-the-hook: Omega x Nd / 1.67 = {omega:.3g} (ASME BTH-1 design "
                    f"factor Nd {scale * 1.67:g} in place of the AISC 1.67)")
    return Check(name, abs(f.force), rn / omega, "N",
                 f"{clause}: {formula}; {eq} at {f.what}, {short}", f.at,
                 detail=f"{f.what} ({sense} the {f.face} {part}): {eq}; {given}",
                 clause=clause, source=src, params=params)


def _span_forces(job) -> list[str]:
    """The live point loads and wheel sets of the job (concentrated forces between the
    supports that a rating scales: the ones whose unchecked local effect withholds it; a dead
    point load keeps its size and is named in the caution instead)."""
    points = [ld.key or "a point load" for ld in job.loads
              if ld.kind == "point" and ld.value and ld.case == "live"]
    return points + [ws.key for ws in (getattr(job, "moving", ()) or ())]


def _live_bearings(job) -> list[str]:
    """The supports that bear the member (pin, roller, spring: a fixed end is a connection)
    when the job has live loads: their reactions grow with the rated load, so a local limit
    state there that is not checked withholds the rating as one under a point load does."""
    live = any(ld.case == "live" and (ld.value if ld.kind in ("point", "moment")
                                      else ld.total_force) for ld in job.loads) or any(
        any(ws.live) for ws in (getattr(job, "moving", ()) or ()))
    if not live:
        return []
    fmt = lambda x: units.fmt(x, "length", job.units)  # noqa: E731
    return [f"the {sp.kind} at {fmt(sp.at)}" for sp in job.supports
            if sp.kind in ("pin", "roller", "spring")]


def _round_wall(job, clause: str) -> Unchecked:
    """A round tube's wall under a concentrated force is not checked: a point load or wheel
    set on the span, or a support reaction that carries live load, withholds the rating: a
    narrow strap, plate, hook or seat on a thin wall can crush it far below the member's
    bending strength (AISC 360-16 Table K2.1 plastification goes with Fy t^2, from memory).
    Only dead load on the supports is a caution (bear it on a saddle)."""
    points = _span_forces(job)
    seats = _live_bearings(job)
    steel = getattr(job.material, "kind", "") in ("steel", "stainless")
    return Unchecked(f"round {'HSS' if steel else 'tube'} wall under a concentrated force",
                     "local plastification of a round wall at supports and point loads is not "
                     "checked" + ("" if points or seats else " (bear it on a saddle)")
                     + (f"; {', '.join(points)} bear on the wall between the supports, and a "
                        "narrow strap, plate or hook can crush a thin wall first" if points
                        else "")
                     + (f"; the live load comes down through {units.and_words(seats)}, whose "
                        "reactions bear on the wall: a seat or strap narrower than a full "
                        "saddle can crush a thin wall first" if seats else "")
                     + ("; so no rating is posted. shopbeam has no way to check the wall "
                        "or to be told it is safe (no key says \"full saddle\"), so whatever "
                        "the seats are, a round member carrying live load this way is not "
                        "rated here: have the wall checked at each seat and load (full saddles "
                        "or sleeves that spread the force are what such a check usually asks "
                        "for), and rate the member from that check"
                        if points or seats else ""),
                     clause, blocks_rating=bool(points or seats))


def _open_local_applies(sec) -> bool:
    """A member whose flange edges, stem or leg take a concentrated force: weak-axis I-shapes
    and channels, tees and angles (no local check is made for any of them)."""
    return (sec.shape in ("i-beam", "channel") and sec.axis == "weak") or \
        sec.shape in ("tee", "angle")


def _open_local(job, sec, clause: str) -> list[Unchecked]:
    """The local limit state under concentrated forces of a member `_open_local_applies` to,
    not checked: blocking where a live load comes through it (the same for every metal)."""
    points = _span_forces(job)
    if sec.shape in ("i-beam", "channel") and sec.axis == "weak":
        return [Unchecked("local bearing of the flanges (weak axis)",
                          "concentrated forces on a member bent about its weak axis load "
                          "the flange edges; no check is made"
                          + (f"; {', '.join(points)} bear on a flange edge between the "
                             "supports, which can bend or crush first, so no rating is "
                             "posted (spread the load with a plate across both flanges, or "
                             "have it checked)" if points else ""),
                          clause, blocks_rating=bool(points))]
    # a tee or an angle: a point load or a wheel on a single leg or stem bends it locally,
    # and a support reaction bears on a tee's stem (its tip, or through the flange with the
    # stem up): none is computed (J10 is written for I-shapes and channels), so no rating
    # rests on a live load that comes through them; dead load alone on the supports is a
    # caution. An angle bears on its seat across a flat leg, which is taken as sound there
    # (a caution, common practice)
    seats = _live_bearings(job) if sec.shape == "tee" else []
    part = "stem" if sec.shape == "tee" else "leg"
    return [Unchecked("stem or leg local yielding under a concentrated force",
                      "concentrated forces at supports and point loads of tees and "
                      "angles are not checked locally"
                      + (f"; {', '.join(points)} bear on a single leg or stem, which "
                         "can bend or yield locally first" if points else "")
                      + (f"; the live load comes down through {units.and_words(seats)}, "
                         f"whose reactions bear on the {part}"
                         + (" (its tip, or the flange with the stem up)"
                            if part == "stem" else "")
                         + ", which can yield or cripple there first" if seats else "")
                      + ("; so no rating is posted (bear the member on a plate or "
                         "bracket across it, spread the load the same way, or have "
                         f"the {part} checked)" if points or seats else ""),
                      clause, blocks_rating=bool(points or seats))]


def _other_metal_unchecked(job, sec, mkind: str) -> list[Unchecked]:
    """Aluminium and typed-in metals: the web or tube wall under a concentrated force is not
    checked (the J10 and K2 rules here are for steel). A point load or a wheel set on the span,
    or the support reactions (thin aluminium webs cripple there too), withhold the rating."""
    if mkind not in ("aluminum", "custom"):
        return []
    if sec.shape in ("round-tube", "pipe"):
        return [_round_wall(job, "ADM 2015 chapter J, concentrated forces (from memory)"
                            if mkind == "aluminum" else "AISC 360-16 K2, Table K2.1 (written "
                            "for steel, not applied to a typed-in metal)")]
    if _open_local_applies(sec):  # as for steel: flange edges, stems and legs
        return _open_local(job, sec, "ADM 2015 chapter J, concentrated forces (from memory)"
                           if mkind == "aluminum" else "AISC 360-16 J10 (written for steel, "
                           "not applied to a typed-in metal)")
    if not ((sec.shape in ("i-beam", "channel") and sec.axis == "strong")
            or sec.shape == "rect-tube"):
        return []
    points = _span_forces(job)
    what = "tube walls" if sec.shape == "rect-tube" else "web"
    bearings = [sp for sp in job.supports if sp.kind in ("pin", "roller", "spring")]
    if not points and not bearings:
        # held by fixed ends only (a welded, bolted or socketed root: a connection, not a
        # bearing, as for steel) with no live force on the span: nothing here scales with a
        # rating; a dead point load is named, not withheld on
        dead = [ld.key or "a point load" for ld in job.loads
                if ld.kind == "point" and ld.value and ld.case != "live"]
        return [Unchecked(
            "web crippling and local yielding under concentrated forces",
            f"the {what} under {', '.join(dead)} (dead, on the span) "
            f"{'are' if what.endswith('s') else 'is'} not checked for "
            f"{'aluminium' if mkind == 'aluminum' else 'a typed-in metal'}; have the "
            + ("web crippling checked (ADM 2015 J.8, from memory)" if mkind == "aluminum"
               else "web checked") + " or bear the load on a plate across the flange",
            "ADM 2015 chapter J, concentrated forces (from memory)" if mkind == "aluminum"
            else "AISC 360-16 J10 / K2 (written for steel, not applied to a typed-in metal)",
            blocks_rating=False)] if dead else []
    # thin aluminium webs and walls cripple at the supports too (ADM web crippling covers
    # end and interior reactions, from memory): no rating rests on that, loads on the span
    # or not
    clause = ("ADM 2015 chapter J, concentrated forces (from memory)" if mkind == "aluminum"
              else "AISC 360-16 J10 / K2 (written for steel, not applied to a typed-in metal)")
    return [Unchecked(
        "web crippling and local yielding under concentrated forces",
        f"the {what} under a support reaction or a point load "
        f"{'are' if what.endswith('s') else 'is'} not checked for "
        f"{'aluminium' if mkind == 'aluminum' else 'a typed-in metal'}"
        + (f"; {', '.join(points)} bear on it between the supports and can cripple it first"
           if points else "; the support reactions bear on it")
        + ", so no rating is posted. shopbeam has no check of it and no key that says it is "
        "safe, so bearing plates or stiffeners do not change this: have the "
        + ("web crippling checked (ADM 2015 J.8, from memory)" if mkind == "aluminum"
           else "web checked") + " and rate the member from that check",
        clause, blocks_rating=True)]


def local_unchecked(job, sec=None) -> list[Unchecked]:
    """Concentrated-force limit states this module does not check, for shapes it does not
    cover."""
    sec = sec or job.section
    mkind = getattr(job.material, "kind", "")
    if mkind not in ("steel", "stainless"):
        return _other_metal_unchecked(job, sec, mkind)
    kind = applies(sec)
    out = []
    if kind == "hss":
        hung = [k for k in (getattr(job, "hung", ()) or ()) if k.startswith("loads")]
        wheels = [ws.key for ws in (getattr(job, "moving", ()) or ())]
        out.append(Unchecked(
            "HSS wall plastification and punching under a narrow bearing",
            "the wall checks assume the load bears across the full width of the tube (a cap "
            "plate or saddle, beta = 1); a narrower plate, a bolt or a hanging lug needs the "
            "other rows of Table K2.2"
            + (f"; {', '.join(hung)} hang from the bottom wall (flange = \"bottom\"): a lug or "
               "clamp pulls on the wall there and its plastification can govern, so no rating "
               "is posted (bear the load on a full-width saddle, or have the wall checked)"
               if hung else "")
            + (f"; the wheels of {', '.join(wheels)} bear on a narrow patch of the wall, not "
               "across its width, so its plastification can govern and no rating is posted "
               "(run the wheels on a full-width plate or rail, or have the wall checked)"
               if wheels else ""),
            "AISC 360-16 K2, Table K2.2", blocks_rating=bool(hung or wheels)))
    elif sec.shape == "channel" and sec.axis == "strong" and tip_hung(job) \
            and not (job.lifting or getattr(job.criteria, "lifting", "")):
        # a lifting job's hook on a channel is withheld by lifting_unchecked
        clamped = ", ".join(tip_hung(job))
        out.append(Unchecked(
            "flange tip bending under a clamp or trolley wheels",
            f"{clamped} hang from the bottom flange of this channel, taken as a beam clamp or "
            "wheels on its flange tip (no lug = true): the one-sided flange bends as a short "
            "cantilever under it and no check of it is made here (the flange-tip check is for "
            "I-beams), so no rating is posted; hang it from a lug plate welded under the web "
            "(lug = true on the load), or have the flange checked",
            "CMAA 74 local flange bending; AISC 360-16 J10", blocks_rating=True))
    elif _open_local_applies(sec):
        out += _open_local(job, sec, "AISC 360-16 J10")
    elif sec.shape in ("round-tube", "pipe"):
        out.append(_round_wall(job, "AISC 360-16 K2, Table K2.1"))
    return out
