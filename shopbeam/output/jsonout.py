"""JSON text for the command line and files: finite numbers only."""

from __future__ import annotations

import json

from shopbeam.errors import InputError


def dumps_finite(data, job_path="") -> str:
    """JSON text; a number that overflowed is bad input, never the non-JSON token Infinity."""
    try:
        return json.dumps(data, indent=2, allow_nan=False)
    except ValueError:
        raise InputError("the answer has numbers too large to be real (an overflow): check the "
                         "section properties, loads and their units", file=str(job_path)) from None
