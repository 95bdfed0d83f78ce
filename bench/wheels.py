"""Growth of the moving-load work in wheels: cells of the exact envelope and CPU time of one
analysis, for wheel trains of 2 to 1,000 wheels. One line per job:

    python bench/wheels.py               # up to 200 wheels
    python bench/wheels.py --big         # and 1,000 (a few seconds more)

The job-file bounds (shopbeam/jobs/limits.py) are lifted in this process only, to see the
growth past them. CPU time (time.process_time) of one warm run, the smallest of --runs: the
machine is shared. No timing asserts anywhere; the cell counts are tested
(tests/test_influence.py).
"""

from __future__ import annotations

import argparse
import sys
import time
from pathlib import Path

HERE = Path(__file__).resolve().parent
sys.path.insert(0, str(HERE.parent))

from shopbeam.design import loading  # noqa: E402
from shopbeam.design.analysis import analyze  # noqa: E402
from shopbeam.jobs import limits  # noqa: E402
from shopbeam.jobs.jobfile import parse_job_text  # noqa: E402

PRESET = (HERE.parent / "shopbeam" / "presets" / "monorail-trolley.toml").read_text()


def rail(n: int, inner: bool) -> str:
    """A 100 ft W12x26 rail with a uniform load, a parked point load, two braces (or a support
    at 40 ft) and a train of n 100 lbf wheels within 60 ft."""
    sp = min(7.0, 0.6 * 1200 / max(n - 1, 1))
    sup = '[[supports]]\nat = "0 ft"\ntype = "pin"\n[[supports]]\nat = "100 ft"\ntype = "roller"\n'
    extra = "" if inner else 'braces = ["30 ft", "60 ft"]\n'
    if inner:
        sup += '[[supports]]\nat = "40 ft"\ntype = "roller"\n'
    return f'''schema = 1
title = "rail"
units = "us"
[beam]
length = "100 ft"
section = "W12x26"
material = "A992"
{extra}{sup}[[loads]]
type = "uniform"
start = "0 ft"
end = "100 ft"
value = "-30 lbf/ft"
[[loads]]
type = "point"
at = "45 ft"
value = "-300 lbf"
[[moving]]
label = "train"
loads = [{", ".join(['"-100 lbf"'] * n)}]
spacing = [{", ".join([f'"{sp:.4f} in"'] * (n - 1))}]
'''


def trolley(n: int) -> str:
    """The monorail-trolley preset (a lifting job) with n wheels sharing its load."""
    sp = min(8.0, 0.5 * 16 * 12 / max(n - 1, 1))
    t = PRESET.replace('loads = ["-1000 lbf", "-1000 lbf"]',
                       "loads = [" + ", ".join([f'"-{2000 / n:g} lbf"'] * n) + "]")
    t = t.replace('dead = ["-60 lbf", "-60 lbf"]',
                  "dead = [" + ", ".join([f'"-{120 / n:g} lbf"'] * n) + "]")
    return t.replace('spacing = ["8 in"]',
                     "spacing = [" + ", ".join([f'"{sp:.5f} in"'] * (n - 1)) + "]")


def measure(text: str, runs: int) -> tuple[int, float]:
    got = {"cells": 0}
    orig = loading.wheel_cells

    def counted(*a, **k):
        c = orig(*a, **k)
        got["cells"] = max(got["cells"], len(c.p0))
        return c

    loading.wheel_cells = counted
    try:
        analyze(parse_job_text(text))  # warm
        best = float("inf")
        for _ in range(runs):
            t = time.process_time()
            analyze(parse_job_text(text))
            best = min(best, time.process_time() - t)
    finally:
        loading.wheel_cells = orig
    return got["cells"], best


def main(argv=None) -> int:
    ap = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    ap.add_argument("--big", action="store_true")
    ap.add_argument("--runs", type=int, default=3)
    a = ap.parse_args(argv)
    limits.MAX_WHEELS, limits.MOVING_WORK = 10**6, 10**12  # this process only
    ns = [2, 8, 32, 64, 200] + ([1000] if a.big else [])
    print(f"{'job':34} {'wheels':>6} {'cells':>7} {'CPU ms':>9}")
    for name, make, top in (("rail, braces (no support inside)", lambda n: rail(n, False), 10**6),
                            ("rail, a support inside", lambda n: rail(n, True), 200),
                            ("monorail-trolley preset (lifting)", trolley, 10**6)):
        for n in ns:
            if n > top:
                continue
            cells, cpu = measure(make(n), a.runs)
            print(f"{name:34} {n:6} {cells:7} {cpu * 1e3:9.1f}", flush=True)
    return 0


if __name__ == "__main__":
    sys.exit(main())
