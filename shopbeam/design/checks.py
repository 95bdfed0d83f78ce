"""Strength and stiffness checks of a solved member: demand, limit, ratio, PASS/FAIL.

The basis is stated in every check's formula:

- ``asd`` (default for steel and stainless): AISC 360-16 allowable strength design. Bending
  per chapter F with Omega_b = 1.67: F2 (compact I-shapes and channels, yielding and
  lateral-torsional buckling with Lp, Lr and Cb from the moment diagram), F3 (flange local
  buckling), F6 (I-shapes and channels about the weak axis), F7 (rectangular HSS: flange and
  web local buckling, effective width for slender flanges, lateral-torsional buckling),
  F8 (round HSS and pipe), F11 (solid bars); a slender HSS web takes the smaller of
  compression flange yielding Rpg Fy S and local buckling Rpg Fcr S (F7.3(c), F7-8). Tees, angles, built-up and typed-in sections
  get first yield (My / Omega_b) with a warning that LTB and local buckling are not covered.
  Shear per chapter G: G2 (webs of I-shapes and channels, Omega_v = 1.50 or 1.67), G4
  (rectangular HSS), G5 (round HSS), G6 (weak-axis flanges), G3 (tee stems, angle legs).
- ``first-yield``: M / S against Fy / SF and V / Av against 0.6 Fy / SF (SF from the job).
- aluminium (always its own basis): Aluminum Design Manual 2015 ASD yielding,
  Mn = Z Fty <= 1.5 S Fty and Vn = 0.6 Fty Av with Omega = 1.65, with the welded
  (heat-affected zone) strengths when the beam is welded. Element local buckling and
  lateral-torsional buckling are not covered (a warning says so).
- lumber (always its own basis): NDS 2018 allowable stress, fb = M / S <= Fb' and
  fv = 1.5 V / A <= Fv' with the adjustment factors taken as 1.0 (stated).

Deflection is checked per span and per overhang (a cantilever or overhang on twice its
length) against L/n, an absolute limit or a named preset.

`Flexure` keeps the bending strength in the form every caller needs: Mn = min(cap, Cb x
ltb1(Lb)), linear in Cb until capped, so the capacity search and the sizing sweep can use it
without re-deriving anything.
"""

from __future__ import annotations

import math
import re
from dataclasses import dataclass, replace

from shopbeam.design import aluminum, lifting, local, lumber, open_shapes
from shopbeam.design.basis import (BASIS_WORDS, BRACE_BY_DEFAULT, CB_MAX,  # noqa: F401 (re-exported)
                                   OMEGA_ADM, OMEGA_B, OMEGA_V, OMEGA_V_ROLLED_I, PSI_PA, basis_of,
                                   brace_points, cb_factor, nominal_moment, support_braces,
                                   unbraced_segments, CAPPED_AT_YIELD, job_omega,
                                   yield_cap_words,
                                   yield_cap_provenance)
from shopbeam.design.lifting import (flange_unchecked, lifting_notes, lifting_unchecked,
                                     profile_of)
from shopbeam.design.results import Check, Unchecked
from shopbeam.engine.model import Load
from shopbeam.engine.solver import Solution, segments, solve
from shopbeam.jobs.rules import LIFTING_PROFILES
from shopbeam.members.catalog import lumber_nominal
from shopbeam.jobs.rules import (DEFAULT_IMPACT, DEFLECTION_PRESETS,  # noqa: F401 (re-exported)
                                 LIFTING_DEFAULT_RATIO, LIVE_DEFLECTION_PRESETS, Basis)
from shopbeam.units import fmt



def stress_words(pa: float, system: str = "us", ksi: bool = False) -> str:
    """A stress in a provision's words in the job's units: wood in psi (aluminium in ksi) on a
    US job, MPa on a metric one."""
    if system == "si":
        return f"{pa / 1e6:.3g} MPa"
    return f"{pa / (PSI_PA * 1000):.3g} ksi" if ksi else f"{pa / PSI_PA:,.0f} psi"



# ------------------------------------------------------------------ job options
def impact_of(job) -> float:
    """Impact allowance on live loads: as written, else the lifting profile's, else 0."""
    if job.criteria.impact is None:
        prof = profile_of(job)
        return prof.impact if prof else 0.0
    return job.criteria.impact


def deflection_rule(job) -> tuple[float | None, float | None, str]:
    """(n of L/n or None, absolute limit or None, words) for this job."""
    c = job.criteria
    if c.deflection_preset:
        n, why = DEFLECTION_PRESETS[c.deflection_preset]
        return n, None, f"L/{n:g}: {why}"
    if not c.deflection_given and (job.lifting or getattr(c, "lifting", "")):
        prof = profile_of(job)
        src = LIFTING_PROFILES[prof.name]["deflection_source"]
        return prof.deflection, None, f"L/{prof.deflection:g}: {src} ({prof.name})"
    if c.deflection_abs is not None:
        return None, c.deflection_abs, c.deflection
    return c.deflection_ratio or 240.0, None, c.deflection


# ------------------------------------------------------------------ flexure
@dataclass(frozen=True)
class Flexure:
    """Nominal bending strength Mn = min(cap, Cb x ltb1(Lb)) and its safety factor."""

    cap: float  # N*m: yielding / local buckling (no LTB)
    omega: float
    cap_text: str
    ltb: tuple | None = None  # (kind, params) for ltb1, None when LTB does not apply
    stress_s: float | None = None  # show as stress on this S (first-yield, lumber)
    warnings: tuple[str, ...] = ()
    special: str = ""  # "F9" (tees) or "F10" (angles): checked by shopbeam.design.open_shapes
    # limit states of this section this strength does not cover (the rating refuses on them)
    unchecked: tuple = ()
    wood: object = None  # lumber.Factors for wood members
    uses_cb: bool = True  # False: the stability rule has no Cb (NDS CL)
    # the code's own cap where the job's first-yield cap lowered `cap` (on_yield), else None
    code_cap: float | None = None

    def ltb1(self, lb: float, case: str = "any", system: str = "us") -> tuple[float, str]:
        """LTB strength at Cb = 1 for unbraced length lb (inf when it does not govern), and
        the provision in words with its lengths in the display system; `case` is the load
        arrangement of NDS Table 3.3.3 for wood."""
        if self.ltb is None or lb <= 0:
            return math.inf, ""
        kind, p = self.ltb
        ln = lambda x, sig=4: fmt(x, "small_length", system, sig)  # noqa: E731
        if kind == "NDS":
            fb_star, s, emin, b, d = p
            le, le_words = lumber.effective_length(lb, d, case)
            cl, rb, fbe = lumber.stability_factor(fb_star, emin, b, d, le)
            over = ("; RB over 50, beyond NDS 3.3.3.7: brace the member" if rb > 50 else "")
            return cl * fb_star * s, (
                f"CL {cl:.3f} by NDS 3.3.3: lu {ln(lb)}, {le_words} = "
                f"{ln(le)}, RB = sqrt(le d / b^2) = {rb:.3g}, FbE = 1.20 Emin'/RB^2 "
                f"= {stress_words(fbe, system)}, Fb* {stress_words(fb_star, system)}: Fb' = "
                f"Fb* CL = {stress_words(cl * fb_star, system)}{over}")
        if kind == "F2":
            mp, sx, e, fy, rts, jc, ho, lp, lr = p
            if lb <= lp:
                return math.inf, ""
            if lb <= lr:
                return (mp - (mp - 0.7 * fy * sx) * (lb - lp) / (lr - lp),
                        f"F2-2 inelastic LTB, Lp {ln(lp, 3)} < Lb {ln(lb)} <= Lr {ln(lr)}")
            x = (lb / rts) ** 2
            fcr = math.pi**2 * e / x * math.sqrt(1 + 0.078 * jc / (sx * ho) * x)
            return fcr * sx, f"F2-3/F2-4 elastic LTB, Lb {ln(lb)} > Lr {ln(lr)}"
        if kind == "F4":
            # AISC 360-16 F4-2 and F4-3/F4-5 (from memory), doubly symmetric: Sxc = Sx
            rpc_myc, sx, e, fl_, rt, j, ho, lp, lr = p
            if lb <= lp:
                return math.inf, ""
            if lb <= lr:
                return (rpc_myc - (rpc_myc - fl_ * sx) * (lb - lp) / (lr - lp),
                        f"F4-2 inelastic LTB (noncompact web), Lp {ln(lp, 3)} < Lb {ln(lb)} "
                        f"<= Lr {ln(lr)}")
            x = (lb / rt) ** 2
            fcr = math.pi**2 * e / x * math.sqrt(1 + 0.078 * j / (sx * ho) * x)
            return fcr * sx, f"F4-3/F4-5 elastic LTB (noncompact web), Lb {ln(lb)} > Lr {ln(lr)}"
        if kind == "F7":
            mp, sx, e, fy, ry, ja, lp, lr = p
            if lb <= lp:
                return math.inf, ""
            if lb <= lr:
                return (mp - (mp - 0.7 * fy * sx) * (lb - lp) / (lr - lp),
                        f"F7-10 HSS LTB, Lp {ln(lp)} < Lb {ln(lb)} <= Lr {ln(lr)}")
            return 2 * e * ja / (lb / ry), f"F7-11 HSS elastic LTB, Lb {ln(lb)} > Lr {ln(lr)}"
        if kind == "ADM":
            mnp, sc, e, cc, coef, form, scale = p
            lam = coef * lb if form == "open" else coef * math.sqrt(lb)
            how = ("F.2 open shape: lambda = Lb / ry" if form == "open" else
                   "F.3 closed shape: lambda = 2.3 sqrt(Lb Sc / sqrt(Iy J))")
            if lam < cc:
                m = mnp * (1 - lam / cc) + math.pi**2 * e * lam * sc / cc**3
                eq = "Mnmb = Mnp (1 - lambda/Cc) + pi^2 E lambda Sc / Cc^3"
            else:
                m = math.pi**2 * e * sc / lam**2
                eq = "Mnmb = pi^2 E Sc / lambda^2"
            return m * scale, (f"ADM 2015 {how} = {lam:.3g} (Lb {ln(lb)}, Cb taken as 1.0), "
                               f"Cc {cc:.3g}: lateral-torsional buckling {eq}, Omega "
                               f"{self.omega / scale:.3g} (from memory)")
        if kind == "F11":
            my, mp, e, fy, d, t = p
            r = lb * d / t**2
            if r <= 0.08 * e / fy:
                return math.inf, ""
            if r <= 1.9 * e / fy:
                return (1.52 - 0.274 * r * fy / e) * my, "F11-2 bar LTB, Lb d/t^2 = %.4g" % r
            return 1.9 * e / r * (my / fy), "F11-3/F11-4 bar elastic LTB, Lb d/t^2 = %.4g" % r
        return math.inf, ""  # pragma: no cover

    def ltb_params(self, lb: float) -> dict:
        """The lengths the LTB check used (SI): Lb, and Lp and Lr where the provision has them."""
        if self.ltb is None:
            return {}
        kind, p = self.ltb
        if kind in ("F2", "F4", "F7"):
            return {"Lb": lb, "Lp": p[-2], "Lr": p[-1]}
        return {"Lb": lb}

    def mn(self, cb: float, lb: float, system: str = "us") -> tuple[float, str]:
        l1, why = self.ltb1(lb, system)
        if cb * l1 < self.cap:
            return cb * l1, f"{why}, Cb {cb:.3f}"
        return self.cap, self.cap_text


def _fy_e(mat, basis: str, welded: bool) -> tuple[float, float]:
    fy = mat.fy
    if basis == "aluminum" and welded and mat.fy_welded:
        fy = mat.fy_welded
    return fy, mat.e


def shape_solid(sec) -> bool:
    """Solid round bar: no local buckling and no lateral-torsional buckling."""
    return sec.shape == "round-bar"


def _unchecked_shape(shape: str) -> Unchecked:
    if shape == "tee":
        return Unchecked("tee lateral-torsional and local buckling",
                         "a tee is checked for first yield only; with the stem in compression "
                         "lateral-torsional buckling can govern well below first yield",
                         "AISC 360-16 F9")
    if shape == "angle":
        return Unchecked("angle principal-axis bending, lateral-torsional and leg local "
                         "buckling", "an angle is checked about its geometric axis for first "
                         "yield only; unrestrained it bends about its principal axes",
                         "AISC 360-16 F10")
    return Unchecked(f"{shape} section lateral-torsional and local buckling",
                     "shopbeam has no chapter F rule for this section; it is checked for first "
                     "yield only", "AISC 360-16 F1")


def _slender_wall(sec, mat) -> str:
    """Why a tube's wall buckles before first yield (a slender element, AISC 360-16 Table
    B4.1b cases 17, 19 and 20, from memory), or "" when it does not: first yield is then no
    upper bound on its strength, so a rating on the first-yield basis must not rest on it."""
    d = sec.dims
    e, fy = getattr(mat, "e", 0.0), getattr(mat, "fy", 0.0)
    t = d.get("t_des")
    if not (e > 0 and fy > 0 and t):
        return ""
    root = math.sqrt(e / fy)
    if sec.shape == "rect-tube" and d.get("b_flat") and d.get("h_flat"):
        bt, ht = d["b_flat"] / t, d["h_flat"] / t
        if bt > 1.40 * root:
            return (f"its compression flange b/t = {bt:.3g} is over 1.40 sqrt(E/Fy) = "
                    f"{1.40 * root:.3g} (slender, AISC 360-16 Table B4.1b): it buckles before "
                    "first yield (F7-3)")
        if ht > 5.70 * root:
            return (f"its webs h/t = {ht:.3g} are over 5.70 sqrt(E/Fy) = {5.70 * root:.3g} "
                    "(slender, AISC 360-16 Table B4.1b): first yield is not reached (F7.3)")
    if sec.shape in ("round-tube", "pipe") and d.get("od"):
        dt = d["od"] / t
        if dt > 0.31 * e / fy:
            return (f"its wall D/t = {dt:.3g} is over 0.31 E/Fy = {0.31 * e / fy:.3g} (slender, "
                    "AISC 360-16 Table B4.1b): it buckles before first yield (F8-4)")
    return ""


def _flange_or_web_below_yield(sec, mat) -> str:
    """Why an I-shape's or channel's flange or web buckles locally before first yield (AISC
    360-16 F3, F4, F5 and F6 give Mn below My = Fy S, braced), or "": first yield is then no
    upper bound on its strength, as for a tube's slender wall (`_slender_wall`)."""
    e, fy = getattr(mat, "e", 0.0), getattr(mat, "fy", 0.0)
    if sec.shape not in ("i-beam", "channel") or not (e > 0 and fy > 0 and sec.zx):
        return ""
    try:
        code = _f2_f3(sec, fy, e) if sec.axis == "strong" else _f6(sec, fy, e)
    except (KeyError, TypeError, ValueError, ZeroDivisionError):
        return ""
    my = fy * min(sec.sx_top, sec.sx_bot)
    if code.cap >= my * (1 - 1e-9):
        return ""
    return (f"AISC 360-16 gives it Mn = {code.cap / my:.2f} Fy S, below first yield, by "
            f"{code.cap_text}: it buckles locally before first yield. Rate it on that "
            "strength: a steel material (a key such as \"A36\", or kind = \"steel\") with "
            "basis = \"asd\"")


def flexure(sec, mat, basis: str, sf: float = 1.67, welded: bool = False,
            service=None, system: str = "us") -> Flexure:
    """Bending strength of the section (SI) on the given basis (`service`: the wood keys,
    shopbeam.design.lumber.Service)."""
    s = min(sec.sx_top, sec.sx_bot)
    if basis == "lumber":
        return _lumber_flexure(sec, mat, s, service, system)
    if basis == "first-yield":
        unc = ()
        steel = getattr(mat, "kind", "") in ("steel", "stainless")
        if sec.shape not in ("round-bar", "rect-bar", "round-tube", "pipe", "rect-tube") and not (
                steel and sec.shape in ("tee", "angle")):  # those: design.open_shapes
            unc += (Unchecked("lateral-torsional buckling",
                              "the first-yield basis checks yielding only; an open section "
                              "unbraced over its length can buckle sideways below first yield "
                              "(brace the compression flange all along and say braced = true, "
                              "or use basis = \"asd\" with a catalog section)",
                              "AISC 360-16 chapter F"),)
        if sec.shape == "custom":
            # its walls and flanges are not known: whether they buckle before first yield
            # cannot be told, so no rating rests on first yield (as a custom section of a
            # built-in steel or aluminium is held)
            unc += (Unchecked("local buckling", "the first-yield basis does not check thin "
                              "walls or flanges for local buckling, and a custom section's "
                              "are not known, so whether they buckle before first yield "
                              "cannot be told; give the section by its shape and sizes "
                              "([beam.section] shape = \"rect-tube\", ...) or have it "
                              "checked", "AISC 360-16 B4, chapter F", blocks_rating=True),)
        elif sec.shape in ("cover-plated", "double-channel"):
            # no chapter F rule for the built-up section (as on the AISC basis): a thin cover
            # plate in compression buckles before first yield, which is then no bound
            unc += (Unchecked("local buckling", f"the first-yield basis does not check thin "
                              f"plates or flanges for local buckling, and shopbeam has no "
                              f"rule for a {sec.shape} section's (a thin cover plate in "
                              "compression buckles before first yield), so no rating rests "
                              "on first yield; have it checked", "AISC 360-16 B4, chapter F",
                              blocks_rating=True),)
        elif sec.shape not in ("round-bar", "rect-bar"):
            slender = _slender_wall(sec, mat) or _flange_or_web_below_yield(sec, mat)
            unc += (Unchecked("local buckling", "the first-yield basis does not check thin "
                              "walls or flanges for local buckling"
                              + (f"; {slender}" if slender else ""),
                              "AISC 360-16 B4, chapter F", blocks_rating=bool(slender)),)
        return Flexure(mat.fy * s, sf, f"f = M / S <= Fy / SF = Fy / {sf:g} (first yield)",
                       stress_s=s, unchecked=unc)
    fy, e = _fy_e(mat, basis, welded)
    z = sec.zx
    if basis == "aluminum":
        return _adm_flexure(sec, mat, s, z, welded, system)
    d = sec.dims
    shape, axis = sec.shape, sec.axis
    if shape in ("i-beam", "channel") and axis == "strong" and z:
        return _f2_f3(sec, fy, e)
    if shape in ("i-beam", "channel") and axis == "weak" and z:
        return _f6(sec, fy, e)
    if shape == "rect-tube" and z:
        return _f7(sec, fy, e, system)
    if shape in ("round-tube", "pipe") and z:
        dt = d["od"] / d["t_des"]
        lp, lr = 0.07 * e / fy, 0.31 * e / fy
        warn = ()
        unc = ()
        if dt > 0.45 * e / fy:
            warn = (f"round tube D/t = {dt:.3g} exceeds 0.45 E/Fy: outside AISC 360 F8",)
            unc = (Unchecked("round tube wall local buckling", f"D/t {dt:.3g} exceeds 0.45 E/Fy, "
                             "outside the range of F8", "AISC 360-16 F8"),)
        if dt <= lp:
            return Flexure(fy * z, OMEGA_B, f"F8-1 yielding Mn = Fy Z (compact, D/t {dt:.3g})",
                           warnings=warn, unchecked=unc)
        if dt <= lr:
            return Flexure(min(fy * z, (0.021 * e / dt + fy) * s), OMEGA_B,
                           f"F8-2 local buckling, noncompact wall (D/t {dt:.3g})", warnings=warn,
                           unchecked=unc)
        return Flexure(0.33 * e / dt * s, OMEGA_B, f"F8-3 local buckling Mn = Fcr S, Fcr = "
                       f"0.33 E / (D/t) (F8-4), slender wall "
                       f"(D/t {dt:.3g})", warnings=warn, unchecked=unc)
    if shape == "round-bar":
        return Flexure(min(fy * z, 1.6 * fy * s), OMEGA_B, "F11-1 Mn = Fy Z <= 1.6 Fy S")
    if shape == "rect-bar":
        mp = min(fy * z, 1.6 * fy * s)
        h, b = d["h"], d["b"]
        ltb = ("F11", (fy * s, mp, e, fy, h, b)) if h > b else None
        return Flexure(mp, OMEGA_B, "F11-1 yielding Mn = Fy Z <= 1.6 Fy S", ltb=ltb)
    if (shape == "tee" and axis == "strong" and sec.iy and sec.j and sec.ry) or (
            shape == "angle" and d.get("iz") and sec.iy):
        # the bending check itself is F9 / F10 (shopbeam.design.open_shapes); this first-yield
        # figure only ranks sections in the sizing sweep before they are checked in full
        return Flexure(fy * s, OMEGA_B, "first yield My = Fy S, Omega 1.67 (sizing only)",
                       special="F9" if shape == "tee" else "F10")
    warn = {"tee": "tee bent about its weak axis: AISC 360 F9 covers the axis of symmetry "
                   "only; first yield My = Fy S is checked, lateral-torsional and local "
                   "buckling are not",
            "angle": "angle without its principal-axis properties: AISC 360 F10 is not "
                     "applied; first yield only"}.get(
        shape, f"{shape} section: lateral-torsional and local buckling are not checked; first "
               "yield only")
    return Flexure(fy * s, OMEGA_B, "first yield My = Fy S, Omega 1.67 (lateral-torsional "
                   "and local buckling not covered)", warnings=(warn,),
                   unchecked=() if shape in ("tee", "angle") else (_unchecked_shape(shape),))


def built_up(sec) -> bool:
    """An I-section typed in by its plates (taken as welded, `members.resolve`): AISC 360-16
    Table B4.1b case 11 flanges and G2.1(b) shear, in place of the rolled-shape rules."""
    return sec.shape == "i-beam" and bool(sec.dims.get("built_up"))


def _f2_f3(sec, fy, e) -> Flexure:
    d = sec.dims
    sx, z = min(sec.sx_top, sec.sx_bot), sec.zx
    mp = fy * z
    root = math.sqrt(e / fy)
    lam = d.get("bf_2tf") if sec.shape == "i-beam" else d.get("b_t")
    if lam is None:
        lam = d["bf"] / (2 * d["tf"]) if sec.shape == "i-beam" else d["bf"] / d["tf"]
    lpf, lrf = 0.38 * root, 1.0 * root
    h_tw = d.get("h_tw") or (d["d"] - 2 * d["kdes"]) / d["tw"]
    kc = min(max(4 / math.sqrt(h_tw), 0.35), 0.76)
    built = built_up(sec)
    if built:
        # AISC 360-16 Table B4.1b case 11 (flanges of built-up I-shapes, from memory):
        # lambda_r = 0.95 sqrt(kc E / FL), FL = 0.7 Fy (doubly symmetric)
        lrf = 0.95 * math.sqrt(kc * e / (0.7 * fy))
    warnings, unchecked = [], []
    cap, text = mp, f"F2-1 yielding Mn = Mp = Fy Zx (compact flanges, bf/2tf {lam:.3g})"
    if h_tw > 5.70 * root:
        # AISC 360-16 F5-6 (from memory): Rpg = 1 - aw / (1200 + 300 aw) (hc/tw - 5.7
        # sqrt(E/Fy)) <= 1, aw = hc tw / (bfc tfc) <= 10; compression flange yielding F5-1
        aw = min(10.0, h_tw * d["tw"] ** 2 / (d["bf"] * d["tf"]))
        rpg = min(1.0, 1 - aw / (1200 + 300 * aw) * (h_tw - 5.70 * root))
        cap = rpg * fy * sx
        text = (f"slender web (h/tw {h_tw:.3g} > 5.70 sqrt(E/Fy)): Mn = Rpg Fy Sx, Rpg "
                f"{rpg:.3f} (F5-6, compression flange yielding F5-1; F5 lateral-torsional "
                "and flange local buckling not applied)")
        warnings.append("slender web: bending taken as Rpg Fy Sx (AISC 360-16 F5-1); the rest "
                        "of F5 not applied")
    elif h_tw > 3.76 * root and sec.shape == "i-beam":
        return _f4_flexure(sec, mp, sx, e, fy, h_tw, lam, lpf, lrf, kc)
    elif h_tw > 3.76 * root:
        cap = fy * sx  # a channel: F2 covers compact webs only (AISC 360-16 F2, from memory)
        text = "noncompact web (h/tw %.3g > 3.76 sqrt(E/Fy)): Mn = Fy Sx" % h_tw
        warnings.append("channel with a noncompact web: bending taken as first yield Fy Sx")
    if h_tw > 3.76 * root:
        slender = h_tw > 5.70 * root
        unchecked.append(Unchecked(
            "slender-web bending" if slender else "noncompact-web bending of a channel",
            (f"h/tw {h_tw:.3g} > 5.70 sqrt(E/Fy): bending taken as Rpg Fy Sx (F5-1), without "
             "F5's lateral-torsional and flange local buckling" if slender else
             f"h/tw {h_tw:.3g} > 3.76 sqrt(E/Fy): AISC 360-16 F2 covers channels with compact "
             "webs only, and lateral-torsional buckling by F2-2 with a noncompact web is not "
             "covered"), "AISC 360-16 F5" if slender else "AISC 360-16 F2",
            blocks_rating=True))
    if lam > lpf:
        how = (f", built-up: lambda_r = 0.95 sqrt(kc E / 0.7 Fy) = {lrf:.3g}, kc {kc:.3g}"
               if built else "")
        m = _flange_buckling(mp, 0.7 * fy * sx, lam, lpf, lrf, e, kc, sx)
        t = (f"F3-1 flange local buckling (noncompact, lambda {lam:.3g}{how})" if lam <= lrf
             else f"F3-2 flange local buckling (slender, lambda {lam:.3g}{how})")
        if m < cap:
            cap, text = m, t
    iy, cw, j, ho = sec.iy, sec.cw, sec.j, d.get("ho") or (d["d"] - d["tf"])
    if not (iy and j and sec.ry):
        return Flexure(cap, OMEGA_B, text, warnings=tuple(warnings + [
            "no torsion properties: lateral-torsional buckling not checked"]),
            unchecked=tuple(unchecked) + (Unchecked(
                "lateral-torsional buckling", "the section has no torsion properties (Iy, J); "
                "give them, or brace the compression flange all along (braced = true)",
                "AISC 360-16 F2", blocks_rating=True),))
    rts = d.get("rts")
    if not rts and cw:
        rts = math.sqrt(math.sqrt(iy * cw) / sx)
    if not rts:
        rts = d["bf"] / math.sqrt(12 * (1 + d["d"] * d["tw"] / (6 * d["bf"] * d["tf"])))
    c = 1.0
    if sec.shape == "channel" and cw:
        c = ho / 2 * math.sqrt(iy / cw)
    jc = j * c
    lp = 1.76 * sec.ry * root
    a = jc / (sx * ho)
    lr = 1.95 * rts * e / (0.7 * fy) * math.sqrt(a + math.sqrt(a * a + 6.76 * (0.7 * fy / e) ** 2))
    return Flexure(cap, OMEGA_B, text, ltb=("F2", (mp, sx, e, fy, rts, jc, ho, lp, lr)),
                   warnings=tuple(warnings), unchecked=tuple(unchecked))


def _flange_buckling(top: float, low: float, lam: float, lpf: float, lrf: float, e: float,
                     kc: float, sx: float) -> float:
    """Flange local buckling of an I-shape (AISC 360-16 F3-1/F3-2, F4-13/F4-14): a straight
    line from `top` at lambda_pf to `low` (0.7 Fy Sx, or FL Sxc) at lambda_rf, then the
    elastic 0.9 E kc Sx / lambda^2 of a slender flange."""
    if lam <= lrf:
        return top - (top - low) * (lam - lpf) / (lrf - lpf)
    return 0.9 * e * kc * sx / lam**2


def _f4_flexure(sec, mp, sx, e, fy, h_tw, lam, lpf, lrf, kc) -> Flexure:
    """A doubly symmetric I-shape with a noncompact web (3.76 < h/tw <= 5.70 sqrt(E/Fy)),
    by AISC 360-16 F4 (from memory): compression flange yielding Mn = Rpc Myc (F4-1), flange
    local buckling F4-13/F4-14, lateral-torsional buckling F4-2/F4-5 with rt, Lp = 1.1 rt
    sqrt(E/Fy) and Lr (F4-8); the tension flange does not govern (Sxt = Sxc). Here hc = h,
    Iyc / Iy = 0.5 > 0.23 (F4-9a/b for Rpc), FL = 0.7 Fy (F4-6a, Sxt / Sxc = 1)."""
    d = sec.dims
    root = math.sqrt(e / fy)
    myc = fy * sx
    lpw, lrw = 3.76 * root, 5.70 * root
    rpc = min(mp / myc, mp / myc - (mp / myc - 1) * (h_tw - lpw) / (lrw - lpw))
    fl_ = 0.7 * fy
    cap = rpc * myc
    text = (f"F4-1 compression flange yielding Mn = Rpc Myc, Rpc {rpc:.3f} (noncompact web, "
            f"h/tw {h_tw:.3g}; F4-9b)")
    if lam > lpf:
        m = _flange_buckling(cap, fl_ * sx, lam, lpf, lrf, e, kc, sx)
        t = (f"F4-13 flange local buckling (noncompact flange, lambda {lam:.3g})"
             if lam <= lrf else
             f"F4-14 flange local buckling (slender flange, lambda {lam:.3g}, kc {kc:.3g})")
        if m < cap:
            cap, text = m, t
    iy, j = sec.iy, sec.j
    ho = d.get("ho") or (d["d"] - d["tf"])
    if not (iy and j):
        return Flexure(cap, OMEGA_B, text, warnings=(
            "no torsion properties: lateral-torsional buckling not checked",),
            unchecked=(Unchecked(
                "lateral-torsional buckling", "the section has no torsion properties (Iy, J); "
                "give them, or brace the compression flange all along (braced = true)",
                "AISC 360-16 F4", blocks_rating=True),))
    hc = h_tw * d["tw"]
    aw = hc * d["tw"] / (d["bf"] * d["tf"])
    rt = d["bf"] / math.sqrt(12 * (1 + aw / 6))  # F4-11
    lp = 1.1 * rt * root  # F4-7
    a = j / (sx * ho)
    lr = 1.95 * rt * e / fl_ * math.sqrt(a + math.sqrt(a * a + 6.76 * (fl_ / e) ** 2))  # F4-8
    return Flexure(cap, OMEGA_B, text, ltb=("F4", (rpc * myc, sx, e, fl_, rt, j, ho, lp, lr)))


OMEGA_ADM_RUPTURE = 1.95  # Aluminum Design Manual 2015, rupture (from memory)


def _adm_flexure(sec, mat, s, z, welded, system: str = "us") -> Flexure:
    """ADM 2015 F.1 (from memory): the lesser of yielding Mnp = Z Fy <= 1.5 S Fy over
    Omega 1.65 and rupture Mnu = Z Fu / kt over Omega 1.95 (kt 1.0 for 6xxx alloys, ADM
    Table A.3.3), with the welded (heat-affected zone) strengths when the member is welded;
    then local buckling of the flat elements (shopbeam.design.aluminum, ADM 2015 B.5, F.8)
    over Omega 1.65 where an element is more slender than lambda1."""
    fl = _adm_yield_rupture(sec, mat, s, z, welded, system)
    fl = replace(fl, ltb=_adm_ltb(sec, mat, s, z, welded, fl.omega), uses_cb=False)
    w = bool(welded and mat.fy_welded)
    if sec.shape in ("round-tube", "pipe") and "t_des" in sec.dims:
        # the curved wall in flexure buckles locally below the plastic moment well before
        # its uniform-compression limit (aluminum_unchecked) is reached
        fb, words = _adm_curved_flexure(sec, mat.fy_welded if w else mat.fy, mat.e, system)
        mnlb = fb * s
        if mnlb / OMEGA_ADM < fl.cap / fl.omega:
            return Flexure(mnlb, OMEGA_ADM, f"{words} (governs over {fl.cap_text})",
                           warnings=fl.warnings, uses_cb=False)
        return replace(fl, cap_text=f"{fl.cap_text}; {words} does not govern")
    elems = aluminum.flat_elements(sec, mat.fy, mat.e, mat.fy_welded if w else None)
    slender = [el for el in elems if el.slender]
    flats = (" (flat widths = outside less 2 walls: no corner_radius typed in, so square "
             "inside corners)" if sec.shape == "rect-tube" and not sec.dims.get("r_given", True)
             else "")
    if not slender:
        if elems:
            fl = replace(fl, cap_text=fl.cap_text + "; elements compact (" + ", ".join(
                f"{el.name} b/t {el.bt:.3g} <= lambda1 {el.lambda1:.3g}" for el in elems)
                + f", ADM 2015 B.5){flats}: they reach yield first")
        return fl
    lim = min(slender, key=lambda el: el.stress)
    mnlb = lim.stress * s
    text = (f"ADM 2015 F.8 local buckling, limiting element (from memory): Mnlb = F Sc, "
            f"{lim.words(system)}{flats}, Omega 1.65")
    if mnlb / OMEGA_ADM < fl.cap / fl.omega:
        return Flexure(mnlb, OMEGA_ADM, f"{text} (governs over {fl.cap_text})",
                       warnings=fl.warnings,
                       ltb=_adm_ltb(sec, mat, s, z, welded, OMEGA_ADM), uses_cb=False)
    return replace(fl, cap_text=f"{fl.cap_text}; {text} does not govern")


def _adm_curved_flexure(sec, fcy: float, e: float, system: str = "us") -> tuple[float, str]:
    """(Fb Pa, words) of a round tube's wall in flexure, ADM 2015 B.5.5.4 (from memory; the
    artificially aged constants of Table B.4.2): Btb = 1.5 Fcy (1 + Fcy^(1/5) / 8.7), Dtb =
    Btb / 2.7 (Btb / E)^(1/3), Fb = Btb - Dtb sqrt(Rb/t), Rb the mid-wall radius; Mnlb =
    Fb S over Omega 1.65. A welded tube takes the welded yield in the same constants."""
    d = sec.dims
    rbt = (d["od"] - d["t_des"]) / 2 / d["t_des"]
    ksi = PSI_PA * 1000
    f, ek = fcy / ksi, e / ksi
    btb = 1.5 * f * (1 + f ** 0.2 / 8.7)
    dtb = btb / 2.7 * (btb / ek) ** (1 / 3)
    fb = (btb - dtb * math.sqrt(rbt)) * ksi
    return fb, (f"ADM 2015 B.5.5.4 curved wall in flexure (from memory): Mnlb = Fb S, Fb = "
                f"Btb - Dtb sqrt(Rb/t) = {stress_words(fb, system, True)} at Rb/t {rbt:.3g}, "
                "Omega 1.65")


def adm_column_constants(fcy: float, e: float, aged: bool = True) -> tuple[float, float, float]:
    """(Bc, Dc, Cc) in ksi of ADM 2015 Table B.4.2 (artificially aged tempers) or B.4.1 (other
    tempers and welded members), from memory: aged Bc = Fcy (1 + (Fcy / 2250)^(1/2)),
    Dc = Bc / 10 (Bc / E)^(1/2), Cc = 0.41 Bc / Dc; otherwise Bc = Fcy (1 + (Fcy / 1000)^(1/2)),
    Dc = Bc / 20 (6 Bc / E)^(1/2), Cc = 2 Bc / (3 Dc). Stresses given and returned in ksi."""
    if aged:
        bc = fcy * (1 + math.sqrt(fcy / 2250))
        dc = bc / 10 * math.sqrt(bc / e)
        return bc, dc, 0.41 * bc / dc
    bc = fcy * (1 + math.sqrt(fcy / 1000))
    dc = bc / 20 * math.sqrt(6 * bc / e)
    return bc, dc, 2 * bc / (3 * dc)


def _adm_ltb(sec, mat, s, z, welded, omega: float):
    """Lateral-torsional buckling of an aluminium beam bent about its strong axis, ADM 2015
    (from memory): F.2 open shapes symmetric about the bending axis (I-beams, channels),
    lambda = Lb / (ry sqrt(Cb)); F.3 closed shapes (rectangular tube), lambda =
    2.3 sqrt(Lb Sc / (Cb sqrt(Iy J))); Mnmb = Mnp (1 - lambda / Cc) + pi^2 E lambda Sc / Cc^3 below Cc,
    pi^2 E Sc / lambda^2 above, over Omega 1.65, Mnp = Z Fcy <= 1.5 S Fcy. Cb is taken as 1.0
    (conservative; Cb enters inside lambda, not as a factor). A welded member takes the welded
    yield and the Table B.4.1 constants (conservative). The strength is scaled by
    omega / 1.65 so that the caller's single Omega gives Mnmb / 1.65. None where it does not
    apply (weak axis, round and solid shapes) or the section lacks the properties.

    Both slenderness forms reproduce the elastic buckling moment they stand for: with
    Cw = Iy h^2 / 4 and J neglected, Mcr / Sx = pi^2 E / (Lb / ry)^2 for an I-shape; for a
    closed shape, warping neglected and G = E / 2.6, Mcr / Sc = pi sqrt(E Iy G J) / (Lb Sc)
    = pi^2 E / lambda^2 with lambda = 2.25 sqrt(Lb Sc / sqrt(Iy J)) (the ADM's 2.3 a little
    on the safe side)."""
    if sec.axis != "strong" or sec.shape not in ("i-beam", "channel", "rect-tube"):
        return None
    w = bool(welded and mat.fy_welded)
    fcy = mat.fy_welded if w else mat.fy
    ksi = PSI_PA * 1000
    _bc, _dc, cc = adm_column_constants(fcy / ksi, mat.e / ksi, aged=not w)
    mnp = min((z or s) * fcy, 1.5 * s * fcy)
    if sec.shape == "rect-tube":
        if not (sec.iy and sec.j):
            return None
        coef, form = 2.3 * math.sqrt(s / math.sqrt(sec.iy * sec.j)), "closed"
    else:
        if not sec.ry:
            return None
        coef, form = 1 / sec.ry, "open"
    return ("ADM", (mnp, s, mat.e, cc, coef, form, omega / OMEGA_ADM))


def _adm_yield_rupture(sec, mat, s, z, welded, system: str = "us") -> Flexure:
    """ADM 2015 F.1 (from memory): the lesser of yielding Mnp = Z Fy <= 1.5 S Fy over
    Omega 1.65 and rupture Mnu = Z Fu / kt over Omega 1.95 (kt 1.0 for 6xxx alloys, ADM
    Table A.3.3), with the welded (heat-affected zone) strengths when the member is welded."""
    w = bool(welded and mat.fy_welded)
    fy = mat.fy_welded if w else mat.fy
    fu = (mat.fu_welded if w and mat.fu_welded else mat.fu)
    zz = z or s
    mp = min(zz * fy, 1.5 * s * fy)
    yname, uname = ("Ftyw (welded)", "Ftuw (welded)" if mat.fu_welded else
                    "Ftu (unwelded: no fu_welded given)") if w else ("Fty", "Ftu")
    ytext = (f"ADM 2015 F.1 yielding: Mn = Z {yname} <= 1.5 S {yname}, {yname.split()[0]} "
             f"{stress_words(fy, system, True)}, Omega 1.65")
    if not fu:
        return Flexure(mp, OMEGA_ADM, ytext + " (no tensile strength given: rupture not "
                       "checked)", warnings=("aluminium rupture (Z Ftu / 1.95) not checked: the "
                                             "material gives no fu",))
    mu = zz * fu / 1.0
    utext = (f"ADM 2015 F.1 rupture: Mn = Z {uname} / kt, {uname.split()[0]} "
             f"{stress_words(fu, system, True)}, kt 1.0, Omega 1.95")
    if mu / OMEGA_ADM_RUPTURE < mp / OMEGA_ADM:
        return Flexure(mu, OMEGA_ADM_RUPTURE, f"{utext} (governs over yielding Z {yname} / "
                       "1.65)")
    return Flexure(mp, OMEGA_ADM, f"{ytext} (governs over rupture Z {uname} / 1.95)")


def adm_limits(fcy: float, e: float) -> dict[str, float]:
    """Slenderness limits lambda1 below which an element reaches yield, ADM 2015 B.5.4 with
    the buckling constants of Table B.4.2 (artificially aged tempers, from memory), ksi:
    Bp = Fcy (1 + Fcy^(1/3) / 11.4), Dp = Bp / 10 sqrt(Bp / E); flat element supported on both
    edges lambda1 = (Bp - Fcy) / (1.6 Dp) (B.5.4.2), on one edge (Bp - Fcy) / (5.0 Dp)
    (B.5.4.1); curved element Bt = Fcy (1 + Fcy^(1/5) / 5.8), Dt = Bt / 3.7 (Bt / E)^(1/3),
    Rb/t limit ((Bt - Fcy) / Dt)^2 (B.5.4.5)."""
    f, ek = fcy / (PSI_PA * 1000), e / (PSI_PA * 1000)
    bp = f * (1 + f ** (1 / 3) / 11.4)
    dp = bp / 10 * math.sqrt(bp / ek)
    bt = f * (1 + f ** 0.2 / 5.8)
    dt = bt / 3.7 * (bt / ek) ** (1 / 3)
    return {"both": (bp - f) / (1.6 * dp), "one": (bp - f) / (5.0 * dp),
            "curved": ((bt - f) / dt) ** 2}


def aluminum_unchecked(job, sec=None) -> list[Unchecked]:
    """The ADM limit states shopbeam does not compute, named only where they can govern:
    local buckling of an element more slender than lambda1 (ADM B.5.4), shear buckling of such
    a web (ADM G.2), lateral-torsional buckling of an unbraced open shape or deep bar (ADM F.4).
    A compact element reaches yield first, so the yield and rupture checks cover it."""
    sec = sec or job.section
    mat = job.material
    if getattr(mat, "kind", "") != "aluminum" or basis_of(job) != "aluminum":
        return []
    fcy = mat.fy_welded if (job.welded and mat.fy_welded) else mat.fy
    lim = adm_limits(fcy, mat.e)
    d, shape = sec.dims, sec.shape
    elems = []  # (name, ratio, limit key, is web)
    if aluminum.flat_elements(sec, mat.fy, mat.e):
        pass  # flat elements of tubes, I-beams and channels: checked (ADM B.5, F.8, G.2)
    elif shape == "rect-tube" and "t_des" in d:
        elems += [("flange b/t", d["b_flat"] / d["t_des"], "both", False),
                  ("web h/t", d["h_flat"] / d["t_des"], "both", True)]
    elif shape in ("round-tube", "pipe") and "t_des" in d:
        elems.append(("wall Rb/t", (d["od"] - d["t_des"]) / 2 / d["t_des"], "curved", False))
    elif shape in ("i-beam", "channel") and "tf" in d:
        out = (d["bf"] - d["tw"]) / 2 if shape == "i-beam" else d["bf"] - d["tw"]
        h = d["d"] - 2 * d["tf"]
        elems += [("flange outstand b/t", out / d["tf"], "one", False),
                  ("web h/t", h / d["tw"], "both", True)]
    elif shape in ("angle", "tee"):
        t = d.get("t") or d.get("tw") or d.get("tf")
        if t:
            elems.append(("leg or stem b/t", max(d.get("d", 0), d.get("b", 0)) / t, "one", False))
    out = []
    for name, ratio, key, web in elems:
        if ratio > lim[key]:
            out.append(Unchecked(
                "element local buckling",
                f"{name} = {ratio:.3g} is over lambda1 = {lim[key]:.3g} (ADM 2015 B.5.4, from "
                "memory): the element may buckle before it yields, and shopbeam does not compute "
                "the buckled strength; have the section checked before rating it",
                # elements of flexural members (F.8); a single angle has its own section
                "ADM 2015 B.5.4, F.5, F.8" if shape == "angle" else "ADM 2015 B.5.4, F.8"))
            if web:
                out.append(Unchecked(
                    "web shear buckling", f"{name} = {ratio:.3g}: a web this slender may buckle "
                    "in shear (ADM 2015 G.2); not computed", "ADM 2015 G.2"))
    braced, _ = brace_points(job)
    if not braced:
        covered = _adm_ltb(sec, mat, min(sec.sx_top, sec.sx_bot), sec.zx, False, OMEGA_ADM)
        open_shape = shape in ("i-beam", "channel", "angle", "tee") and covered is None \
            and not (shape in ("i-beam", "channel") and sec.axis == "weak")
        deep_bar = False
        if shape == "rect-bar" and d["h"] > d["b"]:
            lb = max((b - a for a, b, _ in unbraced_segments(job, job.beam())), default=0.0)
            deep_bar = lb * d["h"] / d["b"] ** 2 > 0.08 * mat.e / fcy
        if open_shape or deep_bar:
            out.append(Unchecked(
                "lateral-torsional buckling",
                f"an unbraced {shape} in aluminium may buckle sideways (ADM 2015 chapter F); "
                "shopbeam does not compute it: brace the compression edge (braced = true, or "
                "braces = [...]) or have it checked", "ADM 2015 chapter F"))
    if shape == "custom":
        # typed-in properties say nothing of the walls, flanges or the shape's stiffness
        # against twist: neither kind of buckling can be ruled out (as for steel, F1)
        out.append(Unchecked(
            "custom section local and lateral-torsional buckling",
            "a section typed in by its properties gives no walls or flanges to check for "
            "local buckling (ADM 2015 B.5) and no shape for sideways buckling (ADM 2015 "
            "chapter F); it is checked for yielding and rupture only: describe it by its "
            "shape and dimensions, or have it checked", "ADM 2015 B.5, chapter F"))
    return out


# said of repetitive joists deep enough to need lateral support, unless the job is braced
REPETITIVE_UNBRACED = (
    "repetitive joists without braced = true take beam stability CL on their span between "
    "supports; when the deck or sheathing is nailed to the compression edge (with blocking or "
    "bridging as NDS 4.4.1.2 asks for the depth), say braced = true under [beam] for CL = 1.0")


def flexure_warnings(job, fl: Flexure) -> list[str]:
    """The bending strength's words for this job (the joists' CL advice only where the job
    does not already say braced = true or restrained = true)."""
    held = getattr(job, "braced", False) or getattr(job, "restrained", False)
    return [w for w in fl.warnings if not (held and w == REPETITIVE_UNBRACED)]


def _lumber_flexure(sec, mat, s, service, system: str = "us") -> Flexure:
    if sec.shape != "rect-bar":
        fb = mat.fb or mat.fy
        return Flexure(fb * s, 1.0, "NDS 3.3: fb = M / S <= Fb (a wood section that is not a "
                       "rectangle: no adjustment factors applied)", stress_s=s, uses_cb=False,
                       warnings=("wood section not rectangular: NDS adjustment factors and "
                                 "beam stability are not applied",),
                       unchecked=(Unchecked(
                           "NDS adjustment factors and beam stability of a wood section "
                           "given by its properties",
                           "the wood section is not a rectangle of known breadth and depth, "
                           "so beam stability CL (NDS 3.3.3), the load duration, wet service, "
                           "temperature, size and flat-use factors (NDS Table 4.3.1) and "
                           "bearing (NDS 3.10) are not applied: the bending and shear limits "
                           "are the bare reference values, which can be several times the "
                           "adjusted ones. Give the member as a lumber size (\"2x12\") or "
                           "[beam.section] shape = \"rect-bar\" with its dressed width and "
                           "depth", "NDS 2018 Table 4.3.1, 3.3.3, 3.10"),))
    f = lumber.factors(sec, mat, service or lumber.Service())
    fac = f.factors
    lvl = f.values.size_class == "lvl"  # its depth factor is the maker's, not NDS CF
    size = "the maker's depth factor (12/d)^0.136" if lvl else "CF"
    text = (f"NDS 2018 Table {'8.3.1' if lvl else '4.3.1'}: Fb' = Fb CD CM Ct CL "
            f"{'(12/d)^0.136' if lvl else 'CF'} Cfu Cr = "
            f"{stress_words(f.values.fb, system)} x CD {fac['CD']:g} x CM {fac['CM_b']:g} x Ct "
            f"{fac['Ct_b']:g} x {size} {fac['CF']:.3g} x Cfu {fac['Cfu']:g} x Cr {fac['Cr']:g} = "
            f"{stress_words(f.fb_star * f.cfu, system)}")
    ltb = None
    warnings = ()
    nominal = lumber_nominal(sec)  # NDS 4.4.1.1: d/b on nominal sizes for sawn lumber
    ratio = nominal[1] / nominal[0] if nominal else f.d / f.b
    if f.flat:
        text += " (flat use: CL = 1.0, NDS 3.3.3.3 d <= b)"
        if f.values.size_class == "beams-stringers":
            text += (f"; Cfu {f.cfu:g} here is the beams-and-stringers wide-face factor "
                     "(NDS Supplement 2018 Table 4D footnote, from memory)")
    elif ratio <= 2.0:
        text += (f" (d/b = {ratio:.3g}{' nominal' if nominal else ''} <= 2: no lateral support "
                 "needed, CL = 1.0, NDS 4.4.1.2(a))")
    else:
        ltb = ("NDS", (f.fb_star, s, f.emin, f.b, f.d))
        if service is not None and service.repetitive:
            warnings = (REPETITIVE_UNBRACED,)
    return Flexure(f.fb_star * f.cfu * s, 1.0, text, ltb=ltb, stress_s=s, wood=f,
                   uses_cb=False, warnings=warnings)


def _f6(sec, fy, e) -> Flexure:
    d = sec.dims
    sy, zy = min(sec.sx_top, sec.sx_bot), sec.zx
    mp = min(fy * zy, 1.6 * fy * sy)
    # the tabulated slenderness where the catalog gives it, as about the strong axis
    lam = d.get("bf_2tf") if sec.shape == "i-beam" else d.get("b_t")
    if lam is None:
        lam = d["bf"] / (2 * d["tf"]) if sec.shape == "i-beam" else d["bf"] / d["tf"]
    root = math.sqrt(e / fy)
    lpf, lrf = 0.38 * root, 1.0 * root
    if lam <= lpf:
        return Flexure(mp, OMEGA_B, "F6-1 weak-axis yielding Mn = Fy Zy <= 1.6 Fy Sy")
    if lam <= lrf:
        return Flexure(mp - (mp - 0.7 * fy * sy) * (lam - lpf) / (lrf - lpf), OMEGA_B,
                       f"F6-2 weak-axis flange local buckling (noncompact, lambda {lam:.3g})")
    return Flexure(0.69 * e / lam**2 * sy, OMEGA_B,
                   f"F6-3/F6-4 weak-axis flange local buckling (slender, lambda {lam:.3g})")


def _f7(sec, fy, e, system: str = "us") -> Flexure:
    d = sec.dims
    s, z = min(sec.sx_top, sec.sx_bot), sec.zx
    mp = fy * z
    root = math.sqrt(e / fy)
    t = d["t_des"]
    bt, ht = d["b_flat"] / t, d["h_flat"] / t
    cap, text = mp, f"F7-1 yielding Mn = Fy Z (compact walls, b/t {bt:.3g}, h/t {ht:.3g})"
    warnings = []
    if bt > 1.12 * root:
        if bt <= 1.40 * root:
            m = min(mp, mp - (mp - fy * s) * (3.57 * bt / root - 4.0))
            tx = f"F7-2 flange local buckling (noncompact, b/t {bt:.3g})"
        else:
            be = min(1.92 * t * root * (1 - 0.38 / bt * root), d["b_flat"])
            m = fy * _hss_se(sec, be)
            tx = (f"F7-3 flange local buckling (slender, b/t {bt:.3g}, effective width "
                  f"{fmt(be, 'small_length', system, 3)})")
        if m < cap:
            cap, text = m, tx
    if ht > 2.42 * root:
        if ht <= 5.70 * root:
            m = min(mp, mp - (mp - fy * s) * (0.305 * ht / root - 0.738))
            tx = f"F7-6 web local buckling (noncompact, h/t {ht:.3g})"
        else:
            # AISC 360-16 F7.3(c), recalled from memory: Mn = Rpg Fy S (compression flange
            # yielding) with Rpg per F5-6 and aw = 2 h tw / (b tf) <= 10 (= 2 h / b for a tube)
            aw = min(2 * d["h_flat"] / d["b_flat"], 10.0)
            rpg = min(1.0, 1 - aw / (1200 + 300 * aw) * (ht - 5.7 * root))
            m = rpg * fy * s
            tx = f"F7.3(c) slender web (h/t {ht:.3g}): Mn = Rpg Fy S, Rpg {rpg:.3g}"
            # and compression flange local buckling (F7-8, F7-9, from memory): Mn = Rpg Fcr
            # S, Fcr = 0.9 E kc / (b/t)^2 with kc = 4; the smaller of the two
            fcr = 0.9 * e * 4.0 / bt**2
            if rpg * fcr * s < m:
                m = rpg * fcr * s
                tx = (f"F7-8 compression flange local buckling with a slender web (h/t "
                      f"{ht:.3g}, b/t {bt:.3g}): Mn = Rpg Fcr S, Fcr = 0.9 E kc / (b/t)^2 = "
                      f"{fmt(fcr, 'stress', system)} (F7-9, kc 4), Rpg {rpg:.3g} (F5-6)")
            warnings.append("slender HSS web: AISC 360 F7.3(c) applied from memory; "
                            "have the section checked by an engineer")
        if m < cap:
            cap, text = m, tx
    ltb = None
    if sec.axis == "strong" and d["h"] > d["b"] and sec.j and sec.ry:
        ja = math.sqrt(sec.j * sec.area)
        lp = 0.13 * e * sec.ry * ja / mp
        lr = 2 * e * sec.ry * ja / (0.7 * fy * s)
        ltb = ("F7", (mp, s, e, fy, sec.ry, ja, lp, lr))
    return Flexure(cap, OMEGA_B, text, ltb=ltb, warnings=tuple(warnings))


def _hss_se(sec, be: float) -> float:
    """Effective section modulus of a rectangular HSS with the compression flange's flat
    width reduced to be (thin-wall: the lost strip sits at the flange mid-thickness)."""
    d = sec.dims
    t, h = d["t_des"], d["h"]
    lost = (d["b_flat"] - be) * t
    y = h / 2 - t / 2  # strip centroid above the centroid
    a = sec.area - lost
    ybar = -lost * y / a
    i = sec.ix + sec.area * ybar**2 - lost * (y - ybar) ** 2
    c = max(h / 2 - ybar, h / 2 + ybar)
    return i / c


# ------------------------------------------------------------------ shear
@dataclass(frozen=True)
class ShearStrength:
    vn: float  # N
    omega: float
    text: str
    area: float  # the area the stress is shown on (first-yield, lumber)
    stress: bool = False


def _cv2(ratio: float, kv: float, e: float, fy: float) -> float:
    a = 1.10 * math.sqrt(kv * e / fy)
    if ratio <= a:
        return 1.0
    if ratio <= 1.37 * math.sqrt(kv * e / fy):
        return a / ratio
    return 1.51 * kv * e / (ratio**2 * fy)


def shear_strength(sec, mat, basis: str, sf: float = 1.67, welded: bool = False,
                   service=None, system: str = "us") -> ShearStrength:
    av = sec.shear_area
    if basis == "lumber":
        if sec.shape == "rect-bar":
            f = lumber.factors(sec, mat, service or lumber.Service())
            fac = f.factors
            return ShearStrength(f.fv * av, 1.0, f"NDS 3.4.2: fv = 1.5 V / A <= Fv' = Fv CD CM "
                                 f"Ct = {stress_words(f.values.fv, system)} x CD {fac['CD']:g} "
                                 f"x CM {fac['CM_v']:g} x Ct {fac['Ct_b']:g} = "
                                 f"{stress_words(f.fv, system)} (NDS 2018 Table 4.3.1)", av,
                                 True)
        fv = mat.fv or 0.6 * mat.fy
        return ShearStrength(fv * av, 1.0, "NDS 3.4: fv = V / Av <= Fv (a wood section that is "
                             "not a rectangle: adjustment factors not applied)", av, True)
    if basis == "first-yield":
        return ShearStrength(0.6 * mat.fy * av, sf, f"fv = V / Av <= 0.6 Fy / SF = 0.6 Fy / "
                             f"{sf:g} (average shear on the shear area)", av, True)
    fy, e = _fy_e(mat, basis, welded)
    if basis == "aluminum":
        w = "Ftyw (welded)" if (welded and mat.fy_welded) else "Fty"
        text = (f"ADM 2015 G: Vn = Fsy Av = 0.6 {w} Av, 0.6 {w.split()[0]} = "
                f"{stress_words(0.6 * fy, system, True)}, Omega 1.65")
        web = aluminum.web_area(sec)
        if web is not None and web < av:  # the web's clear height, not the steel code's d tw
            av = web
            text += ", Av = the webs' clear height x thickness (ADM 2015 G.2)"
        ht = aluminum.web_ratio(sec)
        if ht is not None:
            fs, l1, _, words = aluminum.shear_buckling(ht, 0.6 * mat.fy, e, system=system)
            if welded and mat.fy_welded:
                fs = min(fs, 0.6 * fy)
                fw, l1w, _, ww = aluminum.shear_buckling(ht, 0.6 * fy, e, aged=False,
                                                         system=system)
                if fw < fs:
                    fs, words = fw, ww + " (Table B.4.1 constants with the welded Fsy)"
            if fs < 0.6 * fy * (1 - 1e-9):  # (a tie to round-off is the yield branch)
                return ShearStrength(fs * av, OMEGA_ADM, f"ADM 2015 G.2 web shear buckling: Vn = "
                                     f"Fs Av, {words}, Omega 1.65 (below {text})", av)
            text += f"; web h/t {ht:.3g} reaches shear yield (ADM 2015 G.2)"
        return ShearStrength(0.6 * fy * av, OMEGA_ADM, text, av)
    d, shape, axis = sec.dims, sec.shape, sec.axis
    if shape in ("i-beam", "channel") and axis == "strong":
        h_tw = d.get("h_tw") or (d["d"] - 2 * d["kdes"]) / d["tw"]
        aw = d["d"] * d["tw"]
        if shape == "i-beam" and not built_up(sec) and h_tw <= 2.24 * math.sqrt(e / fy):
            return ShearStrength(0.6 * fy * aw, OMEGA_V_ROLLED_I, f"G2-1 web yielding Vn = 0.6 "
                                 f"Fy Aw, Cv1 = 1.0 (h/tw {h_tw:.3g} <= 2.24 sqrt(E/Fy)), "
                                 "Omega 1.50", aw)
        kv = 5.34
        lim = 1.10 * math.sqrt(kv * e / fy)
        cv1 = 1.0 if h_tw <= lim else lim / h_tw
        return ShearStrength(0.6 * fy * aw * cv1, OMEGA_V, f"G2-1 Vn = 0.6 Fy Aw Cv1, Cv1 = "
                             f"{cv1:.3g} (h/tw {h_tw:.3g}, kv 5.34), Omega 1.67"
                             + (" (built-up: G2.1(b); the Omega 1.50 of G2.1(a) is for rolled "
                                "I-shapes)" if built_up(sec) else ""), aw)
    if shape in ("i-beam", "channel") and axis == "weak":
        b = d["bf"] / 2 if shape == "i-beam" else d["bf"]
        cv2 = _cv2(b / d["tf"], 1.2, e, fy)
        return ShearStrength(0.6 * fy * av * cv2, OMEGA_V, f"G6-1 weak-axis shear of the "
                             f"flanges Vn = 0.6 Fy bf tf Cv2 (each), Cv2 = {cv2:.3g}", av)
    if shape == "rect-tube":
        ht = d["h_flat"] / d["t_des"]
        cv2 = _cv2(ht, 5.0, e, fy)
        return ShearStrength(0.6 * fy * av * cv2, OMEGA_V, f"G4-1 HSS webs Vn = 0.6 Fy Aw Cv2, "
                             f"Aw = 2 h t, Cv2 = {cv2:.3g} (h/t {ht:.3g}, kv 5)", av)
    if shape in ("round-tube", "pipe"):
        dt = d["od"] / d["t_des"]
        fcr = min(0.78 * e / dt**1.5, 0.6 * fy)
        return ShearStrength(fcr * sec.area / 2, OMEGA_V, f"G5-1 round HSS Vn = Fcr Ag / 2, "
                             f"Fcr = min(0.78 E/(D/t)^1.5, 0.6 Fy) = {fmt(fcr, 'stress', system)} "
                             "(the Lv term of G5-2a left out: conservative)", sec.area / 2)
    if shape in ("tee", "angle"):
        ratio = d["d"] / (d["tw"] if shape == "tee" else d["t"])
        cv2 = _cv2(ratio, 1.2, e, fy)
        return ShearStrength(0.6 * fy * av * cv2, OMEGA_V, f"G3-1 Vn = 0.6 Fy b t Cv2 "
                             f"(kv 1.2), Cv2 = {cv2:.3g}", av)
    if shape in ("rect-bar", "round-bar"):
        return ShearStrength(0.6 * fy * av, OMEGA_V, "Vn = 0.6 Fy on the peak shear stress "
                             "(Av = 2A/3 rectangle, 3A/4 round; chapter G gives no bar rule: "
                             "common practice), Omega 1.67", av)
    return ShearStrength(0.6 * fy * av, OMEGA_V, "Vn = 0.6 Fy Av (shear yielding), Omega 1.67",
                         av)


# ------------------------------------------------------------------ the member's strengths
@dataclass(frozen=True)
class Strengths:
    """Everything about the member's resistance that does not depend on the loads."""

    basis: str
    flexure: Flexure
    shear: ShearStrength
    ltb_segments: tuple  # (start, end, free end?, ltb1 at Cb=1, why)
    defl_ratio: float | None
    defl_abs: float | None
    defl_words: str
    section: object = None  # the section these strengths are for
    unchecked: tuple = ()  # Unchecked limit states of this member (see member_unchecked)
    live_ratio: float | None = None  # n of L/n under live load alone (floors), or None


def member_unchecked(job, sec, flex: Flexure) -> tuple[Unchecked, ...]:
    """The limit states this member calls for that the checks do not cover."""
    braced = brace_points(job)[0]
    out = [u for u in flex.unchecked
           if not (braced and u.name == "lateral-torsional buckling")]
    out += lifting_unchecked(job, sec) + flange_unchecked(job, sec)
    prof = profile_of(job)
    sf = job.criteria.safety_factor
    if prof is not None and prof.nd is not None and (
            flex.stress_s is not None or flex.omega not in (OMEGA_B, prof.nd)
            and not (flex.omega == sf and sf > prof.nd)):  # (a larger factor asked: on_yield)
        # _design_factor puts Nd in place of the AISC Omegas of steel on the AISC basis only
        out.append(Unchecked(
            "ASME BTH-1 design factor on this member",
            f"a below-the-hook device takes the BTH-1 design factor Nd {prof.nd:g} on its "
            "strength; BTH-1 is written for steel, and this member is checked by "
            + ("first yield with safety_factor" if basis_of(job) == "first-yield" else
               "its own rules (ADM Omega 1.65 / 1.95, NDS reference values)")
            + f", which do not carry Nd {prof.nd:g}, so no rating is posted: use a steel "
            "member on the AISC basis, or have the device checked",
            "ASME BTH-1 3-1.3 and chapter 3 (from memory)", blocks_rating=True))
    return tuple(out)


def live_deflection_ratio(job) -> float | None:
    """L/n under live load alone: 360 for deflection = "floor" (IBC Table 1604.3), or
    [criteria] live_deflection = "L/n" (the reader resolves both)."""
    return job.criteria.live_deflection_ratio


def strengths(job, sec=None, beam=None) -> Strengths:
    sec = sec or job.section
    beam = beam or job.beam()
    b = basis_of(job)
    sf = job.criteria.safety_factor
    service = None
    if b == "lumber":
        service = lumber.service_of(job)
    fl = flexure(sec, job.material, b, sf, job.welded, service=service, system=job.units)
    sh = shear_strength(sec, job.material, b, sf, job.welded, service=service,
                        system=job.units)
    # (code: the code's own strength: whether buckling sets it is judged on it, not the cap)
    fl, sh, code = job_factors(job, sec, fl, sh)
    segs = []
    braced = brace_points(job)[0]
    for a, bb, free in unbraced_segments(job, beam):
        case = "any"
        if fl.ltb is not None and fl.ltb[0] == "NDS":
            case = wood_load_case(job, a, bb, free)
        # the strengths of the lengths after the job's factors: ADM's carries the ratio of
        # its own Omega to the flexure's, which the job's factor can change (on_yield)
        l1, why = fl.ltb1(0.0 if braced else bb - a, case, job.units)
        segs.append((a, bb, free, l1, why))
    n, absolute, words = deflection_rule(job)
    extra = () if braced else _deep_bar_first_yield(job, sec, b, segs)
    extra += _stainless_buckling(job, b, code, segs)
    extra += _wood_slenderness(job, fl, segs, braced)
    return Strengths(b, fl, sh, tuple(segs), n, absolute, words, sec,
                     member_unchecked(job, sec, fl) + extra,
                     live_ratio=live_deflection_ratio(job))


def _wood_slenderness(job, fl: Flexure, segs, braced: bool) -> tuple[Unchecked, ...]:
    """A lumber member whose slenderness ratio RB = sqrt(le d / b^2) passes 50 on an unbraced
    length: NDS 2018 3.3.3.7 does not allow it (RB shall not exceed 50, from memory), so the
    CL figure past that is no strength to rate on."""
    if fl.ltb is None or fl.ltb[0] != "NDS" or braced:
        return ()
    _fb, _s, _emin, b, d = fl.ltb[1]
    worst = None
    for a, bb, free, _l1, _why in segs:
        le, le_words = lumber.effective_length(bb - a, d, wood_load_case(job, a, bb, free))
        rb = lumber.slenderness(le, b, d)
        if rb > 50 and (worst is None or rb > worst[0]):
            worst = (rb, a, bb, le, le_words)
    if worst is None:
        return ()
    rb, a, bb, le, le_words = worst
    ln = lambda x: fmt(x, "length", job.units)  # noqa: E731
    return (Unchecked(
        "bending strength of a member with RB over 50",
        f"the unbraced length {ln(a)} to {ln(bb)} ({le_words} = "
        f"{fmt(le, 'small_length', job.units)}) gives RB = sqrt(le d / b^2) = {rb:.3g}, over "
        "the 50 NDS 2018 3.3.3.7 allows: the member may not be used unbraced over that "
        "length, whatever its load. Brace its compression edge (beam.braces = [...], or "
        "braced = true where a deck is nailed to it), or use a broader member",
        "NDS 2018 3.3.3.7 (RB shall not exceed 50, from memory)"),)


def _stainless_buckling(job, basis: str, fl: Flexure, segs) -> tuple[Unchecked, ...]:
    """A stainless member whose bending strength is set by buckling (lateral-torsional at
    Cb = 1, or local) rather than yielding: the AISC 360-16 carbon-steel buckling rules do not
    hold for stainless (AISC 370-21, from memory), so no rating rests on them."""
    if getattr(job.material, "kind", "") != "stainless" or basis != "asd":
        return ()
    why = ""
    text = fl.cap_text
    if fl.special:  # tees and angles: F9 / F10 mix yielding with buckling rules throughout
        why = f"its {fl.special} strength (AISC 360-16 tee or angle rules) includes buckling"
    elif ("local buckling" in text or "slender" in text) and not text.startswith("first yield"):
        why = f"local buckling sets its strength ({text.split(': Mn')[0].split(' Mn')[0]})"
    else:
        short = [(bb - a, l1) for a, bb, _f, l1, _w in segs if l1 < fl.cap]
        if short:
            lb = max(s[0] for s in short)
            why = (f"lateral-torsional buckling can set its strength (unbraced "
                   f"{fmt(lb, 'length', job.units)})")
    if not why:
        return ()
    return (Unchecked(
        "stainless buckling strength",
        f"{why}: that is the AISC 360-16 carbon-steel rule; stainless (rounded stress-strain "
        "curve) buckles at less by AISC 370-21 (from memory), which shopbeam does not apply. "
        "Brace it (braced = true, or braces = [...]), use a stockier section, or have it "
        "checked", "AISC 370-21 chapter F"),)


def _deep_bar_first_yield(job, sec, basis: str, segs) -> tuple[Unchecked, ...]:
    """A deep bar on the first-yield basis (a typed-in metal): sideways buckling is not
    checked, and past Lb d/t^2 = 1.9 E / Fy it comes before first yield (AISC 360-16 F11-2
    with Cb = 1 reaches My there, F11-3 is below it beyond), so the rating must not rest on
    first yield alone."""
    d = sec.dims
    if basis != "first-yield" or sec.shape != "rect-bar" or not d.get("h", 0) > d.get("b", 0) > 0:
        return ()
    e, fy = getattr(job.material, "e", 0.0), getattr(job.material, "fy", 0.0)
    if not (e > 0 and fy > 0):
        return ()
    lb = max((bb - a for a, bb, *_ in segs), default=0.0)
    r = lb * d["h"] / d["b"] ** 2
    if r <= 1.9 * e / fy:
        return ()
    return (Unchecked(
        "lateral-torsional buckling",
        f"a deep bar unbraced over {fmt(lb, 'length', job.units)}: Lb d/t^2 = {r:.4g} "
        f"is over 1.9 E/Fy = {1.9 * e / fy:.4g}, where it buckles sideways below first yield "
        "(AISC 360-16 F11-2/F11-3 with Cb = 1); the first-yield basis checks yielding only: "
        "brace the compression edge (braced = true, or braces = [...]) or have it checked",
        "AISC 360-16 F11.2"),)


def wood_load_case(job, a: float, b: float, free: bool, loads=None) -> str:
    """NDS Table 3.3.3 row for the loads of the job (or `loads`, e.g. the dead loads alone)
    on the unbraced length a..b."""
    if job.moving:
        return "any"
    tol = 1e-9 * job.length
    held = [sp.at for sp in job.supports if sp.takes_force]
    ends_held = [any(abs(x - h) <= tol for h in held) for x in (a, b)]
    if not free and not all(ends_held):
        return "any"  # a length ending at a brace: Table 3.3.3 footnote (general rows)
    if not free and (len({round(h / tol) for h in held}) > 2
                     or any(sp.kind == "fixed" for sp in job.supports)):
        return "any"  # a span of a continuous or fixed-ended member: the table's rows are
        # for single spans and cantilevers, so its footnote's general rows apply
    return lumber.load_case(job.member_loads() if loads is None else loads, a, b, free,
                            free and b >= job.length * (1 - 1e-9))


def _design_factor(job, sec, fl: Flexure, sh: "ShearStrength"):
    """A below-the-hook beam: ASME BTH-1 design factor Nd in place of the AISC Omegas
    (3-2.3.1: Fb = 1.10 Fy / Nd for compact sections, so Mn is capped at 1.10 Fy S; 3-2.2:
    Fv = Fy / (Nd sqrt 3), i.e. Omega_v = 0.6 sqrt(3) Nd on Vn = 0.6 Fy Aw; from memory)."""
    prof = profile_of(job)
    if prof is None or prof.nd is None or fl.stress_s is not None or fl.omega != OMEGA_B:
        return fl, sh
    cap = min(fl.cap, 1.10 * job.material.fy * min(sec.sx_top, sec.sx_bot))
    text = fl.cap_text + (" capped at 1.10 Fy S (ASME BTH-1 3-2.3.1)" if cap < fl.cap else "")
    fl = replace(fl, cap=cap, omega=prof.nd, cap_text=text + f"; ASME BTH-1 design factor Nd "
                 f"{prof.nd:g} in place of Omega_b")
    sh = replace(sh, omega=0.6 * math.sqrt(3) * prof.nd,
                 text=sh.text + f"; ASME BTH-1 Fv = Fy / (Nd sqrt 3), Nd {prof.nd:g}")
    return fl, sh


def job_factors(job, sec, fl: Flexure, sh: "ShearStrength"):
    """The job's own factors on the code's strengths, in their order: a below-the-hook
    beam's design factor (`_design_factor`), then the safety factor on yield in bending
    (`on_yield`). (flexure, shear, the flexure before that cap)."""
    fl, sh = _design_factor(job, sec, fl, sh)
    return on_yield(fl, sec, job.material, job.criteria.safety_factor, job.welded), sh, fl


def on_yield(fl: Flexure, sec, mat, sf: float, welded: bool = False) -> Flexure:
    """The job's safety factor on the material's yield strength in bending (`[criteria]
    safety_factor`, default 1.67): the allowable moment is never more than first yield over
    it, Fy S / safety_factor, besides the code's own limit states (AISC 360-16 chapter F, ADM
    2015 chapter F: Mn / Omega_b, which for a compact, braced section credits the plastic
    moment Fy Z, up to 1.2 Fy S for a tube and 1.5 Fy S for a bar). A factor larger than
    the code's Omega_b (and than 1.67) is also taken on every bending limit state
    (lateral-torsional and local buckling), so the margin asked for holds whichever comes
    first. A basis that already checks a stress (first yield, wood) is left as it is."""
    if fl.stress_s is not None or not getattr(mat, "fy", None) or not sf or sf <= 0 \
            or fl.special:  # tees and angles: open_shapes caps each axis's own strength
        return fl
    text = fl.cap_text
    if job_omega(fl.omega, sf) != fl.omega:
        text += f"; Omega_b {fl.omega:g} raised to the job's safety factor {sf:g}"
        fl = replace(fl, omega=sf)
    if fl.ltb is not None and fl.ltb[0] == "ADM":
        # ADM lateral-torsional buckling has its own Omega, 1.65 (the flexure's is the cap's,
        # 1.95 where rupture sets it): the job's factor replaces it where larger than 1.67
        # too, and the strength carried is scaled to the flexure's Omega (`_adm_ltb`)
        fl = replace(fl, ltb=("ADM", fl.ltb[1][:-1] + (fl.omega / job_omega(OMEGA_ADM, sf),)))
    # first yield of a welded aluminium member is in the weld's heat-affected zone (Ftyw)
    fy = mat.fy_welded if welded and getattr(mat, "kind", "") == "aluminum" and getattr(
        mat, "fy_welded", None) else mat.fy
    allow = fy * min(sec.sx_top, sec.sx_bot) / sf
    if fl.cap / fl.omega > allow * (1 + 1e-12):
        fl = replace(fl, cap=allow * fl.omega, code_cap=fl.cap)
        text += f"; {yield_cap_words(sf)}"
    return replace(fl, cap_text=text) if text != fl.cap_text else fl


def judged_length(a: float, b: float, kind: str) -> float:
    """The length a span's deflection is judged on: cantilevers and overhangs on twice theirs
    (contract; common practice)."""
    return 2 * (b - a) if kind in ("cantilever", "overhang") else b - a


def deflection_limit(a: float, b: float, kind: str, ratio: float | None,
                     absolute: float | None) -> float:
    """The deflection limit of one span or overhang: an absolute limit, or judged length / n."""
    return absolute if absolute is not None else judged_length(a, b, kind) / ratio


def deflection_limits(job, sol: Solution, st: Strengths | None = None,
                      ratio: float | None = None, bounds=None) -> list[dict]:
    """Each span and overhang with its largest deflection and its limit (L/`ratio` when
    given, else the job's rule). `bounds`: an upper bound of each one's deflection over its
    limit (every limit above zero); then only the spans that can hold the largest ratio are
    worked out, largest bound first, and the list holds those (in order)."""
    st = st or strengths(job, beam=sol.beam)
    segs = segments(sol.beam)
    if bounds is not None and len(bounds) == len(segs):
        top, keep = -1.0, []
        for i in sorted(range(len(segs)), key=lambda i: -bounds[i]):
            if bounds[i] < top:
                break
            got = _span_deflection(st, sol, *segs[i], ratio)
            top = max(top, got["demand"] / got["limit"])
            keep.append((i, got))
        return [got for _, got in sorted(keep, key=lambda t: t[0])]
    return [_span_deflection(st, sol, a, b, kind, ratio) for a, b, kind in segs]


def _span_deflection(st: Strengths, sol: Solution, a: float, b: float, kind: str,
                     ratio: float | None) -> dict:
    """One span's or overhang's entry of `deflection_limits`."""
    length = b - a
    judged = judged_length(a, b, kind)
    if ratio is None and st.defl_abs is not None:
        limit, rule = st.defl_abs, st.defl_words
    else:
        n = ratio or st.defl_ratio
        limit = deflection_limit(a, b, kind, n, None)
        rule = (f"2 x {kind} length / {n:g}, i.e. its tip may move {kind} length / {n / 2:g}"
                if judged != length else f"{kind} length / {n:g}")
    ex = sol.deflection.extremes(a, b)
    return {"start": a, "end": b, "kind": kind, "demand": ex.abs_max, "limit": limit,
            "at": ex.abs_max_at, "rule": rule}


def segment_strength(fl, l1: float, cb: float, free: bool, why: str) -> tuple[float, str]:
    """(Mn, words) of one unbraced length with its Cb (`bending_check`; the allowable is
    Mn / Omega_b): it reads no loads but through Cb."""
    if cb * l1 < fl.cap and fl.ltb is not None and fl.ltb[0] == "ADM":
        return l1, f"{why} (governs over {fl.cap_text})"
    if cb * l1 < fl.cap and not fl.uses_cb:
        return l1, f"{fl.cap_text}; {why}"
    buckling = f"{why}, Cb {cb:.3f}" + (" (free end: Cb 1.0)" if free else "")
    if cb * l1 < fl.cap:
        return float(nominal_moment(fl.cap, l1, cb)), buckling
    if fl.code_cap is not None and cb * l1 < fl.code_cap:
        # the job's first-yield cap sets it, below the code's own strength, which is this
        # length's buckling (not the cap's text's limit state): name that one, then the cap
        cut = fl.cap_text.find("; " + CAPPED_AT_YIELD)
        return fl.cap, buckling + (fl.cap_text[cut:] if cut >= 0 else "")
    return fl.cap, fl.cap_text


def bending_check(job, sol: Solution, st: Strengths, cb_one: bool = False) -> Check:
    """The bending check of one solved load state (the first of `checks_for`), alone: for
    callers that read only it (the allowable moment, one length's check)."""
    fl = st.flexure
    basis = BASIS_WORDS[st.basis]
    m = sol.moment
    worst = None
    for a, b, free, l1, why in st.ltb_segments:
        ex = m.extremes(a, b)
        mmax = ex.abs_max
        if l1 == math.inf or cb_one or free or not fl.uses_cb:
            cb = 1.0
        else:
            q = [abs(float(m(a + f * (b - a)))) for f in (0.25, 0.5, 0.75)]
            cb = cb_factor(mmax, *q)
        mn, text = segment_strength(fl, l1, cb, free, why)
        allow = mn / fl.omega
        r = mmax / allow if allow > 0 else math.inf
        if worst is None or r > worst[0]:
            worst = (r, mmax, allow, ex.abs_max_at, text, (a, b), cb, mn, l1)
    r, mmax, allow, at, text, (a, b), cb, mn, l1 = worst
    lb = 0.0 if brace_points(job)[0] else b - a
    omega = fl.omega
    if fl.ltb is not None and fl.ltb[0] == "ADM" and mn < fl.cap:
        # ADM lateral-torsional buckling governs: its own Mnmb over Omega 1.65 (the strength
        # carried is scaled to the cap's Omega so every consumer gets Mnmb / 1.65)
        mn, omega = mn / fl.ltb[1][-1], fl.omega / fl.ltb[1][-1]
    bend_params = {"Mn": mn, "Omega": omega, "Cb": cb, **fl.ltb_params(lb)}
    if fl.code_cap is not None and mn >= fl.cap * (1 - 1e-12):
        # the first-yield cap sets it: Mn is the code's own figure, and the cap beside it
        bend_params["Mn"] = min(fl.code_cap, cb * l1)
        if fl.ltb is not None and fl.ltb[0] == "ADM" and cb * l1 < fl.code_cap:
            # the code's own figure is ADM's buckling Mnmb with its own Omega (the length's
            # strength is carried scaled to the rupture cap's Omega)
            bend_params["Mn"] = cb * l1 / fl.ltb[1][-1]
            bend_params["Omega"] = fl.omega / fl.ltb[1][-1]
        bend_params["M_yield_cap"] = fl.cap / fl.omega
    pos = lambda x: fmt(x, "length", job.units)  # noqa: E731
    seg_words = "" if len(st.ltb_segments) == 1 else \
        f"; unbraced length {pos(a)} to {pos(b)} governs"
    if fl.stress_s:
        s = fl.stress_s
        params = {}
        if fl.wood is not None:
            params = {k: float(v) for k, v in fl.wood.factors.items()}
            params["CL"] = min(1.0, allow / (fl.wood.fb_star * fl.wood.cfu * s))
        bend = Check("bending", mmax / s, allow / s, "Pa", f"{basis}: {text}", at,
                     detail=seg_words.lstrip("; "), params={**bend_params, **params, "S": s},
                     **({"clause": "NDS 2018 3.3, 3.3.3, Table 4.3.1",
                         "source": "NDS 2018 and Supplement (from memory)"}
                        if fl.wood is not None else _provenance(st.basis, text, "bending")))
    else:
        bend = Check("bending", mmax, allow, "N*m",
                     f"{basis}: M <= Mn / Omega_b, Mn by {text}, Omega_b {omega:g}", at,
                     detail=seg_words.lstrip("; "), extra={"cb": cb}, params=bend_params,
                     **_provenance(st.basis, text, "bending"))
    if fl.special:
        sec = st.section or job.section
        bend = open_shapes.bending_check(job, sol, st, sec, cb_one) or bend
    return bend


def checks_for(job, sol: Solution, st: Strengths, cb_one: bool = False,
               bending: bool = True, defl_bounds=None) -> list[Check]:
    """The three contract checks of one solved load state, then the member's others.
    `bending=False` leaves the bending check out of the list (a caller that takes it from
    elsewhere); it is still worked out where another check reads its limit (lifting).
    `defl_bounds`: `deflection_limits`' bounds (the caller then replaces the span list)."""
    fl, sh = st.flexure, st.shear
    basis = BASIS_WORDS[st.basis]
    lifting_job = bool(job.lifting or getattr(job.criteria, "lifting", ""))
    bend = bending_check(job, sol, st, cb_one) if bending or lifting_job else None
    pos = lambda x: fmt(x, "length", job.units)  # noqa: E731
    v = sol.shear.extremes()
    allow_v = sh.vn / sh.omega
    shear_params = {"Vn": sh.vn, "Omega": sh.omega, "Av": sh.area}
    if fl.wood is not None:  # Fv' = Fv CD CM Ct (NDS 2018 Table 4.3.1)
        shear_params |= {k: float(fl.wood.factors[k]) for k in ("CD", "CM_v", "Ct_b")}
    if sh.stress:
        shear = Check("shear", v.abs_max / sh.area, allow_v / sh.area, "Pa",
                      f"{basis}: {sh.text}", v.abs_max_at, params=shear_params,
                      **_provenance(st.basis, sh.text, "shear"))
    else:
        shear = Check("shear", v.abs_max, allow_v, "N",
                      f"{basis}: V <= Vn / Omega_v, {sh.text}", v.abs_max_at,
                      params=shear_params, **_provenance(st.basis, sh.text, "shear"))
    creep = ""
    dsol = sol
    # every load is long-term when the job says its loads are permanent (NDS Table 2.3.2
    # "permanent": over ten years), the dead loads alone otherwise
    lasting = fl.wood is not None and lumber.service_of(job).duration == "permanent"
    if fl.wood is not None and any(ld.case == "dead" or lasting for ld in sol.beam.loads):
        kcr = fl.wood.kcr
        dsol = _solve_loads(sol, [ld.scaled(kcr) if ld.case == "dead" or lasting else ld
                                  for ld in sol.beam.loads])
        service = ('seasoned, dry' if kcr <= 1.5 else 'wet service' if job_wet(job) else
                   'a timber, sold unseasoned')
        creep = (f"; long-term: Kcr {kcr:g} x the deflection under every load, all of them "
                 f"permanent (duration = \"permanent\"; NDS 2018 3.5.2, {service})" if lasting else
                 f"; long-term: Kcr {kcr:g} x the dead-load deflection + the live-load "
                 f"deflection (NDS 2018 3.5.2, {service})")
    spans = deflection_limits(job, dsol, st, bounds=defl_bounds if dsol is sol else None)
    w = max(spans, key=lambda s: s["demand"] / s["limit"] if s["limit"] > 0 else 0.0)
    if creep and not lasting and any(ld.total_force > 0 for ld in sol.beam.loads):
        # a load that pushes up (an uplift the dead loads hold down): creep of the dead loads
        # then relieves it, and before the member has crept (new) it is not there; the worse
        # of with and without creep (NDS 2018 3.5.2 raises the long-term deflection only)
        now = deflection_limits(job, sol, st, bounds=defl_bounds)
        w0 = max(now, key=lambda s: s["demand"] / s["limit"] if s["limit"] > 0 else 0.0)
        if w0["limit"] > 0 and w["limit"] > 0 and \
                w0["demand"] / w0["limit"] > w["demand"] / w["limit"]:
            spans, w = now, w0
            creep = (f"; taken without creep: the dead loads hold down a load that pushes "
                     f"up, and a new member, before they creep, deflects more (NDS 2018 "
                     f"3.5.2's Kcr {fl.wood.kcr:g} raises only the long-term deflection)")
    defl = Check("deflection", w["demand"], w["limit"], "m",
                 f"largest deflection in each span against {st.defl_words} "
                 f"(cantilevers and overhangs on twice their length){creep}", w["at"],
                 detail=f"{w['kind']} {pos(w['start'])} to {pos(w['end'])} ({w['rule']})",
                 extra={"spans": spans},
                 params={"span_start": w["start"], "span_end": w["end"]}
                 | ({"n": st.defl_ratio} if st.defl_abs is None else {"limit": st.defl_abs})
                 | ({"Kcr": fl.wood.kcr} if creep else {})
                 | ({k: float(fl.wood.factors[k]) for k in ("CM_e", "Ct_e")}
                    if fl.wood is not None else {}),
                 **dict(zip(("clause", "source"), deflection_provenance(job))))
    sec = st.section or job.section
    angle_words = open_shapes.deflection_words(job, sec)
    if angle_words:
        defl = replace(defl, formula=f"{defl.formula}; {angle_words}")
    out = ([bend] if bending else []) + [shear, defl] + local.local_checks(job, sol, sec)
    if st.live_ratio:
        lsol = _solve_loads(sol, [ld for ld in sol.beam.loads if ld.case != "dead"])
        spans = deflection_limits(job, lsol, st, st.live_ratio)
        w = max(spans, key=lambda s: s["demand"] / s["limit"] if s["limit"] > 0 else 0.0)
        out.append(Check("live deflection", w["demand"], w["limit"], "m",
                         f"largest deflection under the live loads alone against L/"
                         f"{st.live_ratio:g}" + (" (IBC 2018 Table 1604.3 floor members, from "
                                                 "memory)" if st.live_ratio == 360 else
                                                 " (the job's live_deflection)"),
                         w["at"], detail=f"{w['kind']} {pos(w['start'])} to {pos(w['end'])} "
                         f"({w['rule']})", extra={"spans": spans},
                         **dict(zip(("clause", "source"), live_deflection_provenance(job)))))
    if fl.wood is not None:
        out += bearing_checks(job, sol, fl.wood)
        out += dead_load_checks(job, sol, st)
    if lifting_job or lifting.tip_hung(job):
        # a load hung from the bottom flange bears on the flange tips (a clamp or trolley
        # wheels; not a lug under the web) whether or not the job is a lifting device
        wc = lifting.wheel_check(job, sol, sec, job.material, only_given=not lifting_job)
        if wc is not None:
            out.append(wc)
    if lifting_job:
        if bend.unit == "N*m":
            lc = lifting.lateral_check(job, sol, sec, job.material, lifting.profile_of(job),
                                       impact_of(job), bend.limit)
            if lc is not None:
                out.append(lc)
    return out


def job_wet(job) -> bool:
    """Whether the job says its wood is in wet service."""
    return bool(getattr(getattr(job, "wood", None), "wet", False))


def dead_load_checks(job, sol: Solution, st: Strengths) -> list[Check]:
    """NDS 2018 2.3.2: the dead load alone is checked with CD = 0.9 (permanent) when the job's
    duration is shorter; it governs when the dead load is a large part of the total."""
    fl, sh = st.flexure, st.shear
    wf = fl.wood
    cd = wf.factors["CD"]
    # (a wheel set's dead weight too: each wheel is one load of the state, its dead part
    # noted by `loading.moving_states`)
    dead = [ld for ld in sol.beam.loads if ld.case == "dead"] + [
        Load("point", at=x, value=d, case="dead", label="wheel (dead weight)")
        for x, d in sol.__dict__.get("dead_wheels", ())]
    if cd <= 0.9 or not dead:
        return []
    r = 0.9 / cd
    dsol = _solve_loads(sol, dead)
    s = fl.stress_s
    scaled = replace(fl, cap=fl.cap * r, ltb=("NDS", (wf.fb_star * r,) + fl.ltb[1][1:])
                      if fl.ltb else None)
    braced = brace_points(job)[0]
    worst = None
    for a, b, free in ((x[0], x[1], x[2]) for x in st.ltb_segments):
        l1, why = scaled.ltb1(0.0 if braced else b - a, wood_load_case(job, a, b, free, dead))
        mn = min(scaled.cap, l1)
        ex = dsol.moment.extremes(a, b)
        if worst is None or ex.abs_max / mn > worst[0]:
            worst = (ex.abs_max / mn, ex.abs_max, mn, ex.abs_max_at,
                     why if l1 < scaled.cap else "")
    _, mmax, mn, at, why = worst
    words = "dead load alone with CD 0.9 (permanent, NDS 2018 2.3.2, Table 2.3.2)"
    bend = Check("bending, dead load", mmax / s, mn / s, "Pa",
                 f"{words}: Fb* = {stress_words(fl.cap / s * r, job.units)}"
                 + (f"; {why}" if why else " (CL = 1)"), at,
                 clause="NDS 2018 2.3.2, 3.3", source="NDS 2018 (from memory)",
                 params={"CD": 0.9})
    v = dsol.shear.extremes()
    shear = Check("shear, dead load", v.abs_max / sh.area, sh.vn * r / sh.area, "Pa",
                  f"{words}: Fv' = {stress_words(sh.vn * r / sh.area, job.units)}",
                  v.abs_max_at,
                  clause="NDS 2018 2.3.2, 3.4", source="NDS 2018 (from memory)",
                  params={"CD": 0.9})
    return [bend, shear]


def _solve_loads(sol: Solution, loads) -> Solution:
    """The same beam under other loads (creep and live-only deflection)."""
    return solve(replace(sol.beam, loads=tuple(loads)))


def bearing_checks(job, sol: Solution, wf) -> list[Check]:
    """Bearing perpendicular to grain at every pin, roller and spring support and every point
    load (NDS 2018 3.10.2; a fixed end is a connection, not checked here):
    fc_perp = R / (b lb) <= Fc_perp' = Fc_perp CM Ct Cb, lb the job's bearing length there
    (``bearing`` on the support or load, else ``[beam] bearing``, else 1-1/2 in, stated)."""
    if not wf.values.fc_perp:
        return []
    b = wf.b
    bearings = getattr(job, "bearings", {}) or {}
    common = getattr(job, "bearing", None)

    def length_at(key):
        lb = bearings.get(key) or common
        if lb:
            return lb, "as given"
        return lumber.DEFAULT_BEARING, ("default 1-1/2 in, one 2x plate: give bearing under [beam] or "
                                 "on the support or load (common practice)")

    # a fixed end is a connection (its design is not a bearing check); pins, rollers and
    # springs bear on what holds them
    spots = [(r.at, abs(r.force), "support", r.key) for r in sol.reactions
             if r.kind in ("pin", "roller", "spring")]
    # a wheel bears on its own contact (bearing on [[moving]]), never on the seats' length;
    # not given, the wheels are not checked here and the member is not rated (analysis.
    # material_unchecked says so)
    contact = {ws.key: ws.bearing for ws in getattr(job, "moving", ())}
    spots += [(ld.at, abs(ld.value), "wheel" if ld.key in contact else "point load", ld.key)
              for ld in sol.beam.loads if ld.kind == "point" and ld.value != 0
              and (ld.key not in contact or contact[ld.key] is not None)]
    worst = None
    for at, force, what, key in spots:
        lb, stated = (contact[key], "each wheel's contact, as given") if key in contact \
            else length_at(key)
        # NDS 3.10.4 measures "not nearer than 3 in to the end" to the bearing's near edge;
        # the support or load sits at the bearing's centre
        end = (min(at, sol.beam.length - at) - lb / 2) / 0.0254
        cb, cb_words = lumber.bearing_area_factor(lb / 0.0254, end)
        demand, limit = force / (b * lb), wf.fc_perp * cb
        if worst is None or demand / limit > worst[0]:
            worst = (demand / limit, demand, limit, at, what, cb, cb_words, lb, stated)
    if worst is None:
        return []
    _, demand, limit, at, what, cb, cb_words, lb, stated = worst
    fac = wf.factors
    return [Check("bearing", demand, limit, "Pa",
                  f"NDS 2018 3.10.2: fc_perp = R / (b lb) <= Fc_perp' = Fc_perp CM Ct Cb = "
                  f"{stress_words(wf.values.fc_perp, job.units)} x CM {fac['CM_cp']:g} x Ct "
                  f"{fac['Ct_b']:g} x {cb_words} = {stress_words(limit, job.units)}; bearing "
                  f"length "
                  f"lb {fmt(lb, 'small_length', job.units, 4)} ({stated})", at,
                  detail=f"{what} governs, of every pin, roller and spring support and every "
                  "point load and wheel",
                  clause="NDS 2018 3.10.2, 3.10.4", source="NDS 2018 (from memory)",
                  params={"lb": lb, "Cb": cb, "CM_cp": float(fac["CM_cp"]),
                          "Ct_b": float(fac["Ct_b"])})]


_SOURCES = {"asd": "AISC 360-16", "first-yield": "common practice: first yield with the "
            "job's safety factor ([criteria] safety_factor)",
            "aluminum": "Aluminum Design Manual 2015 (from memory)",
            "lumber": "NDS 2018 (from memory)"}

# AISC 360-16 chapters F and G: the section each equation belongs to (section and equation
# numbers from memory). F3-1/F3-2 are the flange local buckling of F3.2; F7-10/F7-11 the
# lateral-torsional buckling of F7.4.
_AISC_SECTION = {"F2-1": "F2.1", "F2-2": "F2.2", "F2-3": "F2.2", "F3-1": "F3.2",
                 "F3-2": "F3.2", "F6-1": "F6.1", "F6-2": "F6.2", "F6-3": "F6.2",
                 "F7-1": "F7.1", "F7-2": "F7.2", "F7-3": "F7.2", "F7-6": "F7.3", "F7-8": "F7.3",
                 "F7-10": "F7.4", "F7-11": "F7.4", "F8-1": "F8.1", "F8-2": "F8.2",
                 "F8-3": "F8.2", "F8-4": "F8.2", "F11-1": "F11.1", "F11-2": "F11.2",
                 "F11-3": "F11.2",
                 "G2-1": "G2.1", "G3-1": "G3", "G4-1": "G4", "G5-1": "G5", "G6-1": "G6"}


def _aisc_clause(text: str, what: str) -> str:
    """The AISC 360-16 section and equation a strength text names ("F2-2 inelastic LTB ..."
    -> "AISC 360-16 F2.2, eq. F2-2")."""
    m = re.search(r"\b([FG]\d+-\d+)(/[FG]\d+-\d+)?", text)
    if m and m.group(1) in _AISC_SECTION:
        return f"AISC 360-16 {_AISC_SECTION[m.group(1)]}, eq. {m.group(0)}"
    m = re.search(r"\b([FG]\d+(?:\.\d+)?(?:\([a-z]\))?)", text)
    if m:
        return f"AISC 360-16 {m.group(1)}"
    if what == "bending":  # a section chapter F has no rule for: first yield only
        return "AISC 360-16 chapter F (no rule for this section): first yield My = Fy S"
    return "AISC 360-16 chapter G (no rule for this section): Vn = 0.6 Fy Av, common practice"


def provenance(basis: str, text: str, what: str) -> dict:
    """clause and source of a strength check ("bending" or "shear") from its basis and the
    provision its text names."""
    out = _provenance_of(basis, text, what)
    if what == "bending":
        out["clause"], out["source"] = yield_cap_provenance(text, out["clause"], out["source"])
    if what == "bending" and "raised to the job's safety factor" in text:
        out["clause"] += "; Omega_b = safety_factor"
    return out


def _provenance_of(basis: str, text: str, what: str) -> dict:
    if basis == "asd":
        clause, source = _aisc_clause(text, what), _SOURCES[basis]
        if "ASME BTH-1" in text:
            clause += "; ASME BTH-1 " + ("3-2.3.1" if what == "bending" else "3-2.2")
            source += "; ASME BTH-1 (from memory)"
        return {"clause": clause, "source": source}
    if basis == "aluminum":
        # the governing provision leads the strength text ("ADM 2015 F.8 local buckling ...")
        m = re.match(r"ADM 2015 ([BFG](?:\.\d+)*):? ([a-z ]+?)(?::| \(|,|$)", text)
        if m and m.group(1) != "G":
            clause = f"ADM 2015 {m.group(1)}, {m.group(2).strip()}"
        elif what == "bending":
            clause = "ADM 2015 chapter F, yielding and rupture"
        else:
            clause = "ADM 2015 chapter G, shear yielding Vn = Fsy Av, Fsy = 0.6 Fty"
        return {"clause": clause, "source": _SOURCES[basis]}
    if basis == "lumber":
        return {"clause": "NDS 2018 " + ("3.3" if what == "bending" else "3.4.2, fv = 1.5 V / A")
                + ", Table 4.3.1", "source": _SOURCES[basis]}
    return {"clause": "first yield: f = M / S <= Fy / SF" if what == "bending" else
            "first yield in shear: fv = V / Av <= 0.6 Fy / SF", "source": _SOURCES["first-yield"]}


_provenance = provenance


# the default deflection limit when a job gives none
DEFAULT_DEFLECTION_SOURCE = ("L/240: IBC 2018 Table 1604.3, floor and roof members under dead "
                             "+ live load (from memory)")


def deflection_provenance(job) -> tuple[str, str]:
    """(clause, source) of the deflection check: a serviceability limit set by the job's
    criteria, and where the figure (or the default L/240) comes from."""
    c = job.criteria
    n, absolute, words = deflection_rule(job)
    limit = f"L/{n:g}" if absolute is None else c.deflection
    if c.deflection_preset:
        return (f"serviceability limit from the job's criteria: deflection = "
                f"\"{c.deflection_preset}\" ({limit} per span)", DEFLECTION_PRESETS[
                    c.deflection_preset][1])
    if not c.deflection_given and (job.lifting or c.lifting):
        prof = profile_of(job)
        return (f"serviceability limit of the {prof.name} lifting profile ({limit} per span; "
                "no [criteria] deflection given)",
                LIFTING_PROFILES[prof.name]["deflection_source"])
    if not c.deflection_given:
        return (f"serviceability limit from the job's criteria: the default {limit} per span "
                "(no [criteria] deflection given)", DEFAULT_DEFLECTION_SOURCE)
    return (f"serviceability limit from the job's criteria: deflection = \"{c.deflection}\" "
            "per span", "set by the job ([criteria] deflection); the default, "
            + DEFAULT_DEFLECTION_SOURCE)


def live_deflection_provenance(job) -> tuple[str, str]:
    """(clause, source) of the live-load-alone deflection check."""
    c = job.criteria
    n = c.live_deflection_ratio
    if c.deflection_preset and LIVE_DEFLECTION_PRESETS.get(c.deflection_preset) == n:
        return (f"IBC 2018 Table 1604.3, L/{n:g} under live load (deflection = "
                f"\"{c.deflection_preset}\")", "IBC 2018 (from memory)")
    if n == LIVE_DEFLECTION_PRESETS["floor"]:
        return (f"IBC 2018 Table 1604.3, L/{n:g} under live load for floor members (the "
                "job's live_deflection, or its floor tags)", "IBC 2018 (from memory)")
    return (f"serviceability limit from the job's criteria: live_deflection = \"L/{n:g}\"",
            "set by the job ([criteria] live_deflection); L/360 for floor members is IBC 2018 "
            "Table 1604.3 (from memory)")


def warnings_for(job, st: Strengths | None = None) -> list[str]:
    """Words the report must carry about what the checks do not cover."""
    st = st or strengths(job)
    out = flexure_warnings(job, st.flexure)
    out.append(f"Checks on the basis of {BASIS_WORDS[st.basis]}.")
    return out


def basic_checks(job, sol: Solution) -> list[Check]:
    """The checks of one solved state (no patterns, no moving loads)."""
    return checks_for(job, sol, strengths(job, beam=sol.beam))


def governing(checks: list[Check]) -> Check:
    return max(checks, key=lambda c: c.ratio)


def not_checked_words(u: Unchecked) -> str:
    """The report's line for a limit state that was not checked."""
    return (f"NOT CHECKED: {u.name}" + (f" ({u.clause})" if u.clause else "") + f": {u.reason}"
            + ("; no rating is posted" if u.blocks_rating and "no rating" not in u.reason
               else ""))


def check_notes(job, st: Strengths | None = None) -> list[str]:
    """What the report must say about the basis, what is not covered, and the allowances
    (`st`: the job's strengths, when the caller has them)."""
    st = st or strengths(job)
    out = [f"Strength basis: {BASIS_WORDS[st.basis]}; deflection limit {st.defl_words}."]
    out += flexure_warnings(job, st.flexure)
    out += [not_checked_words(u) for u in st.unchecked]
    imp = impact_of(job)
    prof = profile_of(job)
    if imp:
        why = ("as written in [criteria] impact" if job.criteria.impact is not None else
               f"the {prof.name} profile" if prof else "")
        out.append(f"Impact allowance {imp:.0%} on the live loads ({why}) is included in the "
                   "checks.")
    out += lifting_notes(job, prof)
    # said only where the job has no hoist weight of its own yet (a caution that is always
    # there is one people learn to skip), and not of a below-the-hook beam (no hoist on it)
    given = any(ld.case == "dead" and ld.kind == "point" and ld.value for ld in job.loads) or \
        any(any(ws.dead) for ws in (getattr(job, "moving", ()) or ()))
    if job.lifting and not given and (prof is None or prof.name != "below-the-hook"):
        out.append("Enter the hoist and trolley weight as its own load (case = \"dead\", or "
                   "dead = [...] on a [[moving]] wheel set) so it is not rated as payload.")
    return out
