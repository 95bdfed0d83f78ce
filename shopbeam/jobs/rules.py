"""The closed sets and defaults a job file can name: strength bases, deflection presets and
the lifting-device defaults.

They live here, below the design layer, so the reader (`jobfile.py`) can resolve and validate
them in its one pass, and the checks read the typed result.
"""

from __future__ import annotations

from enum import StrEnum


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
