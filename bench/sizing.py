"""Benchmarks of sizing sweeps over whole catalog kinds: plain, patterned, moving-load and
spring jobs and their mixtures, `--kind all`, peak memory, and the whole process against
`solve`. Prints one figure a line beside its target (no timing asserts anywhere).

    python bench/sizing.py            # a few minutes on 2 shared cores
    python bench/sizing.py --quick    # fewer repeats
"""

from __future__ import annotations

import argparse
import statistics
import subprocess
import sys
import time
from pathlib import Path

HERE = Path(__file__).resolve().parent
ROOT = HERE.parent
sys.path.insert(0, str(ROOT))
sys.path.insert(0, str(ROOT / "tests"))

from shopbeam.design import sizing  # noqa: E402
from shopbeam.jobs.jobfile import load_job, parse_job_text  # noqa: E402

from loads import peak_mib, shelf_text  # noqa: E402  (bench/loads.py)
from test_sizing_exact import JOBS  # noqa: E402  (the jobs of the exactness tests)


def timed(fn, runs: int) -> tuple[float, float, object]:
    """(median wall, median CPU, last result) after one warm run."""
    out = fn()
    wall, cpu = [], []
    for _ in range(runs):
        t, c = time.perf_counter(), time.process_time()
        out = fn()
        wall.append(time.perf_counter() - t)
        cpu.append(time.process_time() - c)
    return statistics.median(wall), statistics.median(cpu), out


def process_s(args, runs: int) -> float:
    ts = []
    for _ in range(runs):
        t = time.perf_counter()
        subprocess.run([sys.executable, "-m", "shopbeam", *args], capture_output=True,
                       check=False, cwd=ROOT)
        ts.append(time.perf_counter() - t)
    return statistics.median(ts)


def main(argv=None) -> int:
    ap = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    ap.add_argument("--quick", action="store_true")
    a = ap.parse_args(argv)
    n = 2 if a.quick else 5

    def row(what, res, wall, cpu, target=""):
        extra = f"{len(res.rows)} rows, {res.full_checks} in full, {res.lightest.designation}" \
            if res.lightest else f"{len(res.rows)} rows, none passes"
        print(f"{what:<52} {wall * 1e3:8.0f} ms wall {cpu * 1e3:8.0f} ms CPU  {target:<9} "
              f"{extra}", flush=True)

    typical = load_job(HERE / "jobs" / "typical.toml")
    trolley = load_job(ROOT / "presets" / "monorail-trolley.toml")
    j10 = parse_job_text(shelf_text(10))
    jobs = [("typical plain job", typical, "< 0.1 s"), ("10-span patterned shelf", j10, "< 0.3 s"),
            ("monorail trolley (moving)", trolley, "< 0.3 s")]
    jobs += [(name, parse_job_text(text), "") for name, text in JOBS.items()
             if name != "monorail trolley preset"]
    for kind in ("HSS", "W", "all"):
        for name, job, target in jobs:
            if kind != "HSS":
                target = "< 0.5 s" if kind == "all" and name.startswith("typical") else ""
            wall, cpu, res = timed(lambda: sizing.size(job, kind), n)
            row(f"size --kind {kind}, {name}", res, wall, cpu, target)
    for name, job in (("monorail trolley", trolley), ("spring and trolley",
                                                      parse_job_text(JOBS["spring and trolley"]))):
        print(f"{'peak memory, size --kind all, ' + name:<52} "
              f"{peak_mib(lambda: sizing.size(job, 'all')):8.1f} MiB (Python allocations)  "
              "< 150 MB", flush=True)
    for label, path in (("typical", HERE / "jobs" / "typical.toml"),
                        ("monorail trolley", ROOT / "presets" / "monorail-trolley.toml")):
        s = process_s(["solve", str(path), "--json"], n)
        z = process_s(["size", str(path), "--kind", "HSS", "--json"], n)
        print(f"{'whole process, ' + label + ': size --kind HSS / solve':<52} "
              f"{z:6.2f} s / {s:4.2f} s = {z / s:4.2f}x   < 1.3x", flush=True)
    return 0


if __name__ == "__main__":
    raise SystemExit(main())
