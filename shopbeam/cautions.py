"""The safety wording every screen, report and rating label carries.

One place for it, so the CLI report, the JSON, the calc sheet, the rating label and the text
UI all say the same thing. Jobs tagged ``lifting`` get the stronger wording.
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


def normal_tag(tag) -> str:
    """A tag as compared everywhere: ``"Lifting "`` and ``"lifting"`` are the same tag."""
    return str(tag).strip().lower()


def is_lifting(tags) -> bool:
    """The one rule for a lifting device (the reader's `Job.lifting` uses it too)."""
    return any(normal_tag(t) == "lifting" for t in (tags or ()))


def cautions_for(tags) -> list[str]:
    """The cautions for a job with these tags, strongest first."""
    out = []
    if is_lifting(tags):
        out.append(LIFTING)
    out.append(SCREENING)
    return out


def banner(tags) -> str:
    """One-line banner for narrow places (text UI header, label footers)."""
    return (SHORT_LIFTING + " " + SHORT) if is_lifting(tags) else SHORT
