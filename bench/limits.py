"""Whole-process time of the worst jobs inside shopbeam's limits (shopbeam/jobs/limits.py)
and of the adversarial jobs outside them (refused at once). One line per job:

    python bench/limits.py

Target: every job answers or is refused in under 2 s as a whole process (wall and CPU are
both printed: a shared 2-core machine's wall time is noisy, its CPU time less so).
"""

from __future__ import annotations

import os
import resource
import subprocess
import sys
import tempfile
import time
from pathlib import Path

HERE = Path(__file__).resolve().parent
sys.path.insert(0, str(HERE.parent / "tests"))

from adversarial import CASES, hinged, springs, wheels  # noqa: E402

PRESET = (HERE.parent / "shopbeam" / "presets" / "monorail-trolley.toml").read_text()


def TROLLEY(n: int, inner: str = "") -> str:  # noqa: N802 - a recipe, like the others
    """The monorail-trolley preset with n wheels sharing its load (and a support inside)."""
    sp = min(8.0, 0.5 * 16 * 12 / max(n - 1, 1))
    t = PRESET.replace('loads = ["-1000 lbf", "-1000 lbf"]',
                       "loads = [" + ", ".join([f'"-{2000 / n:g} lbf"'] * n) + "]")
    t = t.replace('dead = ["-60 lbf", "-60 lbf"]',
                  "dead = [" + ", ".join([f'"-{120 / n:g} lbf"'] * n) + "]")
    t = t.replace('spacing = ["8 in"]', "spacing = [" + ", ".join([f'"{sp:.5f} in"'] * (n - 1)) + "]")
    if inner:
        t = t.replace('[[supports]]\nat = "16 ft"',
                      f'[[supports]]\nat = "{inner}"\ntype = "roller"\n[[supports]]\nat = "16 ft"')
    return t


INSIDE = {
    "100 springs (limit)": springs(100),
    "99 spans, 49 hinges": hinged(99),
    "16 wheels on 2 supports": wheels(16),
    "200 wheels on 2 supports (wheel cap)": wheels(200).replace('"7 in"', '"6 in"'),
    "57 wheels over 1 spring (moving limit)": wheels(57, springs_n=1),
    "20 wheels, 4 springs (moving limit)": wheels(20, springs_n=4).replace('"7 in"', '"30 in"'),
    "8 wheels, 14 springs (moving limit)": wheels(8, springs_n=14),
    "4 wheels, 26 springs (moving limit)": wheels(4, springs_n=26),
    "lifting trolley, 200 wheels on 2 supports": TROLLEY(200),
    "lifting trolley, 57 wheels over 3 supports (limit)": TROLLEY(57, inner="8 ft"),
    "1000 loads (limit)": springs(0) + "".join(
        f'[[loads]]\ntype = "linear"\nstart = "{i / 10:.2f} ft"\nend = "{i / 10 + 0.07:.2f} ft"\n'
        'value = ["-1 lbf/ft", "-3 lbf/ft"]\n' for i in range(999)),
}


def run(text: str, argv: list[str]) -> tuple[float, float, int]:
    with tempfile.TemporaryDirectory() as d:
        p = Path(d) / "job.toml"
        p.write_text(text, encoding="utf-8")
        before = resource.getrusage(resource.RUSAGE_CHILDREN)
        t = time.perf_counter()
        rc = subprocess.run([sys.executable, "-m", "shopbeam", *argv, str(p)],
                            capture_output=True).returncode
        wall = time.perf_counter() - t
        after = resource.getrusage(resource.RUSAGE_CHILDREN)
        cpu = (after.ru_utime - before.ru_utime) + (after.ru_stime - before.ru_stime)
    return wall, cpu, rc


def main() -> None:
    print(f"{'job':40} {'command':14} {'wall s':>7} {'cpu s':>7} exit  (target < 2 s)")
    for group, jobs in (("inside", INSIDE), ("adversarial", CASES)):
        for name, text in jobs.items():
            for argv in (["solve", "--json"], ["capacity"], ["rating"]):
                wall, cpu, rc = run(text, argv)
                flag = "" if wall < 2 else "  OVER"
                print(f"{group[:3]} {name[:36]:36} {' '.join(argv):14} {wall:7.2f} {cpu:7.2f} "
                      f"{rc:4}{flag}")


if __name__ == "__main__":
    os.environ.setdefault("PYTHONWARNINGS", "default")
    main()
