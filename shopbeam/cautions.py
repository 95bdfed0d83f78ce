"""The safety wording every screen, report and rating label carries.

One place for it, so the CLI report, the JSON, the calc sheet, the rating label and the text
UI all say the same thing. A lifting device gets the stronger wording: a job tagged
``lifting`` or one that names a lifting profile (``[criteria] lifting = "..."``) without the
tag; every caller passes both (``Job.lifting`` is that one rule).
"""

from __future__ import annotations

SCREENING = (
    "SCREENING CHECK ONLY. shopbeam checks one straight member under the loads you entered. "
    "Storage racks, lifting devices and building members (mezzanines, platforms, floors) must "
    "be reviewed by a licensed professional engineer, and local codes govern."
)

LIFTING = (
    "LIFTING DEVICE: hoist beams, monorails, jib arms and lifting beams must be designed, "
    "marked and load-tested under the applicable lifting standards by a qualified engineer. "
    "Do not put a lifting device into service on the strength of this check."
)

SHORT = "Screening check only - licensed engineer review required; local codes govern."
SHORT_LIFTING = "LIFTING DEVICE - not for service without engineer design and load test."


# tags that make a job a storage rack (its members are the beams of one level) or a shelf
# (its members are the rails or brackets of one shelf): the rating label speaks per level or
# per shelf, `levels` counts rack levels, and a rack beam is told of the impact load
RACK_TAGS = frozenset({"rack", "pallet", "racking"})
SHELF_TAGS = frozenset({"shelf", "shelving"})


def normal_tag(tag) -> str:
    """A tag as compared everywhere: ``"Lifting "`` and ``"lifting"`` are the same tag, and
    ``"not_lifting"`` is ``"not-lifting"``."""
    return str(tag).strip().lower().replace("_", "-")


def is_lifting(tags, profile: str = "") -> bool:
    """The one rule for a lifting device (the reader's `Job.lifting` uses it too): tagged
    ``lifting``, or a lifting profile named in ``[criteria] lifting``."""
    if profile:
        return True
    return any(normal_tag(t) == "lifting" for t in (tags or ()))


def cautions_for(tags, lifting: bool = False) -> list[str]:
    """The cautions for a job with these tags (``lifting``: a lifting device whatever the
    tags say, e.g. `Job.lifting`), strongest first."""
    out = []
    if lifting or is_lifting(tags):
        out.append(LIFTING)
    out.append(SCREENING)
    return out


def banner(tags, lifting: bool = False) -> str:
    """One-line banner for narrow places (text UI header, label footers)."""
    return (SHORT_LIFTING + " " + SHORT) if lifting or is_lifting(tags) else SHORT
