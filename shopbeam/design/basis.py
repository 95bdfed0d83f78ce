"""The design basis of a job and the pieces of it every check module shares: the safety
factors of the standards, the basis a material is checked on, the lateral bracing of the member
and the moment-gradient factor Cb.

Below checks, local, open_shapes and lifting (they import it; it imports none of them).
"""

from __future__ import annotations

import numpy as np

from shopbeam.jobs.rules import Basis

OMEGA_B = 1.67  # AISC 360-16 F1
OMEGA_V = 1.67  # AISC 360-16 G1
OMEGA_V_ROLLED_I = 1.50  # AISC 360-16 G2.1(a)
OMEGA_ADM = 1.65  # Aluminum Design Manual 2015, yielding (from memory)
PSI_PA = 6894.757293168361
CB_MAX = 3.0  # AISC 360-16 F1: Cb need not exceed 3.0 (upper bound used here)


def basis_of(job) -> str:
    """"asd", "first-yield", "aluminum" or "lumber" (the material decides the last two)."""
    kind = getattr(job.material, "kind", "custom")
    if kind == "lumber":
        return "lumber"
    asked = job.criteria.basis
    if kind == "aluminum":
        return "first-yield" if asked == Basis.FIRST_YIELD else "aluminum"
    if asked != Basis.AUTO:
        return asked.value
    return "asd" if kind in ("steel", "stainless") else "first-yield"


# the words `checks.on_yield` and the tee and angle rules (open_shapes) put in a bending
# strength's text where the job's safety factor on yield caps it
CAPPED_AT_YIELD = "capped at first yield"


def yield_cap_words(sf: float) -> str:
    """How a bending strength held to first yield over the job's safety factor is said (the
    I-shapes, tubes and channels of `checks.on_yield`, and each axis of a tee or angle)."""
    return (f"{CAPPED_AT_YIELD}, M <= Fy S / {sf:g} (the job's safety factor on the "
            "bending yield strength)")
# the safety factor on yield in bending a job that gives none takes (the contract's example)
DEFAULT_SF = 1.67


def job_omega(own: float, sf) -> float:
    """The factor a bending limit state takes under the job's safety factor on yield: the
    job's where larger than the limit state's own Omega (and than 1.67), its own otherwise."""
    return sf if sf and sf > max(own, DEFAULT_SF) * (1 + 1e-12) else own


def yield_cap_provenance(text: str, clause: str, source: str) -> tuple[str, str]:
    """A bending check's clause and source, naming the first-yield cap where its strength
    `text` says the cap set it."""
    if CAPPED_AT_YIELD not in text:
        return clause, source
    return (clause + "; first yield M <= Fy S / safety_factor",
            source + "; the job's safety_factor on yield in bending")


BASIS_WORDS = {
    "asd": "AISC 360-16 allowable strength design (ASD)",
    "first-yield": "first yield with a safety factor",
    "aluminum": "Aluminum Design Manual 2015 ASD, yielding and rupture (from memory)",
    "lumber": "NDS 2018 allowable stress design with the Table 4.3.1 adjustment factors "
              "(reference values from memory)",
}


def brace_points(job) -> tuple[bool, list[float]]:
    """(continuously braced?, lateral brace positions) from beam.braced / beam.braces.
    `restrained = true` (held against twist and sideways movement all along) braces the
    member all along too: no unbraced length is left to buckle sideways."""
    return job.braced or job.restrained, list(job.braces)


# A bearing support (fixed, pin, roller) holds the section against twist where it sits
# unless the job says brace = false: the usual assumption of AISC 360-16 F2, whose
# unbraced length runs between points braced against twist (common practice). A spring is
# a brace only when the job says brace = true; a hinge never is.
BRACE_BY_DEFAULT = {"fixed": True, "pin": True, "roller": True, "spring": False, "hinge": False}


def support_braces(job, supports) -> list[float]:
    """Positions of the supports that brace the member against twist (see BRACE_BY_DEFAULT)."""
    out = [s.at for s in supports
           if (s.brace if s.brace is not None else BRACE_BY_DEFAULT.get(s.kind, False))
           and s.kind != "hinge"]
    return sorted(set(out))


def unbraced_segments(job, beam) -> list[tuple[float, float, bool]]:
    """(start, end, free end?) of every laterally unbraced length."""
    braced, pts = brace_points(job)
    L = beam.length
    sup = support_braces(job, beam.supports)
    if braced:
        return [(0.0, L, False)]
    stops = sorted(set([0.0, L] + sup + pts))
    held = set(sup) | set(pts)
    tol = 1e-9 * L
    out = []
    for a, b in zip(stops, stops[1:]):
        if b - a <= tol:
            continue
        free = (a <= tol and not any(abs(h) <= tol for h in held)) or (
            b >= L - tol and not any(abs(h - L) <= tol for h in held))
        out.append((a, b, free))
    return out


def cb_factor(mmax, ma, mb, mc):
    """AISC 360-16 F1-1 (Rm = 1): Cb = 12.5 Mmax / (2.5 Mmax + 3 MA + 4 MB + 3 MC) <= 3.

    Takes floats or numpy arrays (the sizing sweep passes one value per section and state)."""
    den = 2.5 * mmax + 3 * ma + 4 * mb + 3 * mc
    if np.ndim(den) == 0:
        return 1.0 if den <= 0 else min(12.5 * mmax / den, CB_MAX)
    safe = np.where(den > 0, den, 1.0)
    return np.where(den > 0, np.minimum(12.5 * mmax / safe, CB_MAX), 1.0)


def nominal_moment(cap, ltb1, cb):
    """Mn = min(cap, Cb x ltb1(Lb)) (floats or numpy arrays): see `Flexure`."""
    return np.minimum(cap, cb * ltb1)


def tip_hung(job) -> tuple[str, ...]:
    """The point loads hung from the bottom flange that bear on its tips (a beam clamp or
    trolley wheels: every hung load but those with `lug = true`), on any job."""
    lugs = set(getattr(job, "lugs", ()) or ())
    return tuple(k for k in (getattr(job, "hung", ()) or ()) if k not in lugs)
