"""The closed sets and defaults a job file can name: strength bases, deflection presets and
the lifting-device defaults.

They live here, below the design layer, so the reader (`jobfile.py`) can resolve and validate
them in its one pass, and the checks read the typed result.
"""

from __future__ import annotations

from enum import StrEnum

from shopbeam.cautions import RACK_TAGS


class Basis(StrEnum):
    """``criteria.basis`` as written. AUTO: the material decides (AISC ASD for steel and
    stainless, first yield for other metals, own bases for aluminium and lumber)."""

    AUTO = "auto"
    ASD = "asd"
    FIRST_YIELD = "first-yield"


# name -> (n in L/n, where the figure comes from)
DEFLECTION_PRESETS: dict[str, tuple[float, str]] = {
    "rack": (180.0, "pallet-rack beams L/180 (ANSI MH16.1, from memory)"),
    "shelf": (180.0, "storage shelves L/180 (as rack beams; common practice)"),
    "floor": (240.0, "floor members L/240 under dead + live load, with L/360 under live load "
              "alone (IBC 2018 Table 1604.3, from memory)"),
    "roof": (240.0, "roof members L/240 (IBC Table 1604.3, from memory)"),
    "hoist": (450.0, "hoist beams and monorails L/450 (common practice)"),
    "monorail": (450.0, "hoist beams and monorails L/450 (common practice)"),
    "jib": (225.0, "jib booms L/225 on twice the reach (common practice)"),
}
# presets that also check the deflection under live load alone: name -> n of L/n
LIVE_DEFLECTION_PRESETS: dict[str, float] = {"floor": 360.0}
DEFAULT_DEFLECTION_RATIO = 240.0
LIFTING_DEFAULT_RATIO = 450.0  # tighter default for jobs tagged lifting (common practice)
DEFAULT_IMPACT = 0.15  # slow powered hoists (common practice)

# Lifting profiles ([criteria] lifting = "..."): what the standard sets for each kind of
# lifting device. Impact on the live load, lateral force (fraction of rated load + hoist +
# trolley, at the wheels), longitudinal force (fraction of the wheel loads), the design factor
# (None: AISC 360 ASD Omega) and the deflection L/n. Values from memory, as named.
_ASCE = "ASCE 7-16 4.9.3"
LIFTING_PROFILES: dict[str, dict] = {
    "powered-monorail": {
        "impact": 0.25, "impact_source": f"{_ASCE}: powered monorail cranes 25 %",
        "lateral": 0.20, "lateral_source": "ASCE 7-16 4.9.4: 20 % of rated load + hoist + "
        "trolley for electrically powered trolleys",
        "longitudinal": 0.10, "longitudinal_source": "ASCE 7-16 4.9.5: 10 % of the wheel loads",
        "nd": None, "deflection": 450.0,
        "deflection_source": "L/450 for monorails (common practice)"},
    "hand-geared-monorail": {
        "impact": 0.0, "impact_source": f"{_ASCE}: hand-geared bridge, trolley and hoist 0 %",
        "lateral": 0.0, "lateral_source": "ASCE 7-16 4.9.4 applies to powered trolleys only",
        "longitudinal": 0.10, "longitudinal_source": "ASCE 7-16 4.9.5: 10 % of the wheel loads",
        "nd": None, "deflection": 450.0,
        "deflection_source": "L/450 for monorails (common practice)"},
    "jib-boom": {
        "impact": 0.25, "impact_source": f"{_ASCE}: powered cranes 25 % (jibs taken as powered "
        "monorail cranes, common practice)",
        "lateral": 0.20, "lateral_source": "ASCE 7-16 4.9.4: 20 % for a powered trolley "
        "(taken for jibs, common practice)",
        "longitudinal": 0.10, "longitudinal_source": "ASCE 7-16 4.9.5: 10 % of the wheel loads",
        "nd": None, "deflection": 225.0,
        "deflection_source": "L/225 on twice the reach for jib booms (common practice)"},
    "hand-geared-jib": {
        "impact": 0.0, "impact_source": f"{_ASCE}: hand-geared bridge, trolley and hoist 0 %",
        "lateral": 0.0, "lateral_source": "ASCE 7-16 4.9.4 applies to powered trolleys only",
        "longitudinal": 0.10, "longitudinal_source": "ASCE 7-16 4.9.5: 10 % of the wheel loads",
        "nd": None, "deflection": 225.0,
        "deflection_source": "L/225 on twice the reach for jib booms (common practice)"},
    "below-the-hook": {
        "impact": 0.0, "impact_source": "ASME BTH-1: the design factor Nd covers impact "
        "(Category A up to 50 % of the rated load, from memory)",
        "lateral": 0.0, "lateral_source": "none (hangs from the hook)",
        "longitudinal": 0.0, "longitudinal_source": "none",
        "nd": {"A": 2.0, "B": 3.0}, "deflection": 450.0,
        "deflection_source": "L/450 (common practice; ASME BTH-1 sets no limit)"},
}


def has_free_end(supports, length: float) -> bool:
    """Held somewhere, with an end that nothing holds: a cantilever, or a span with an
    overhang."""
    tol = 1e-9 * length
    held = [s.at for s in supports if s.takes_force]
    return bool(held) and (min(held) > tol or max(held) < length - tol)


def guessed_profile(supports, length: float) -> str:
    """The lifting profile tags = ["lifting"] picks when none is named, the most demanding
    that fits: a jib boom only when the member is a cantilever held at one place (a boom
    at its mast); a span with an overhang may as well be a monorail run past its last hanger,
    so it takes the powered monorail's stricter limits (L/450 against L/225, the same
    impact and lateral force)."""
    tol = 1e-9 * length
    held = sorted(s.at for s in supports if s.takes_force)
    one_place = bool(held) and held[-1] - held[0] <= tol
    return "jib-boom" if has_free_end(supports, length) and one_place else "powered-monorail"


def rack_arm(tags, supports, length: float) -> bool:
    """A storage-rack member with a free end: a cantilever-rack arm, whose rack is an
    upright column, its base and the arm connections (ANSI MH16.3), not the upright frames
    and beam connectors of a pallet rack (ANSI MH16.1)."""
    return bool(RACK_TAGS & {str(t).strip().lower() for t in tags}) \
        and has_free_end(supports, length)


# A typed-in material given no kind is a wood or a metal by its stiffness: every wood is
# under about 20 GPa (3,000 ksi), every structural metal over 40 GPa (common practice)
WOOD_E_MAX = 30e9  # Pa


# Fatigue stress categories: (C_f in ksi^3, F_TH in ksi), AISC 360-16 Table A-3.1 (from
# memory); design.fatigue works the allowable range from them, the job reader checks the name
FATIGUE_CATEGORIES = {"A": (250e8, 24.0), "B": (120e8, 16.0), "B'": (61e8, 12.0),
                      "C": (44e8, 10.0), "D": (22e8, 7.0), "E": (11e8, 4.5), "E'": (3.9e8, 2.6)}
