"""Test settings shared by every test file.

Hypothesis runs are reproducible: the default profile is derandomized (the same examples on
every run and every machine), so the suite cannot go red by chance. For a long randomized
search run `SHOPBEAM_HYPOTHESIS=long python -m pytest tests/` (a new random seed each run,
1000 examples where a test does not set its own count); a failure it finds goes into
tests/test_regressions.py as a fixed case.
"""

from __future__ import annotations

import os

from hypothesis import HealthCheck, settings

settings.register_profile("repeatable", derandomize=True, deadline=None, print_blob=True,
                          suppress_health_check=[HealthCheck.too_slow])
settings.register_profile("long", derandomize=False, deadline=None, print_blob=True,
                          max_examples=1000, suppress_health_check=[HealthCheck.too_slow])
settings.load_profile("long" if os.environ.get("SHOPBEAM_HYPOTHESIS") == "long" else "repeatable")
