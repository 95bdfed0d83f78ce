"""JSON text for the command line and files: finite numbers only."""

from __future__ import annotations

import json

from shopbeam.errors import InputError


def _no_negative_zero(v):
    """-0.0 (a zero reached from below) as 0.0: a script reading the sign, or a report that
    prints "-0 lbf", must not see a direction where there is no force."""
    if isinstance(v, float):
        return 0.0 if v == 0.0 else v
    if isinstance(v, dict):
        return {k: _no_negative_zero(x) for k, x in v.items()}
    if isinstance(v, (list, tuple)):
        return [_no_negative_zero(x) for x in v]
    return v


def dumps_finite(data, job_path="") -> str:
    """JSON text; a number that overflowed is bad input, never the non-JSON token Infinity."""
    try:
        return json.dumps(_no_negative_zero(data), indent=2, allow_nan=False)
    except ValueError:
        raise InputError("the answer has numbers too large to be real (an overflow): check the "
                         "section properties, loads and their units", file=str(job_path)) from None
