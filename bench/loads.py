"""Benchmarks of loads that come and go: patterned shelves, a moving trolley, capacity and
sizing of those jobs. Prints one figure a line beside its target (no timing asserts anywhere).

    python bench/loads.py            # a minute or two on 2 cores
    python bench/loads.py --quick    # fewer repeats
"""

from __future__ import annotations

import argparse
import statistics
import sys
import time
import tracemalloc
from dataclasses import replace
from pathlib import Path

HERE = Path(__file__).resolve().parent
ROOT = HERE.parent
sys.path.insert(0, str(ROOT))

from shopbeam.design.analysis import analyze  # noqa: E402
from shopbeam.design.capacity import capacity  # noqa: E402
from shopbeam.design.sizing import size  # noqa: E402
from shopbeam.jobs.jobfile import load_job, parse_job_text  # noqa: E402


def shelf_text(spans: int, bay_ft: float = 4.0) -> str:
    """A continuous HSS shelf rail over `spans` equal bays, parts load patterned bay by bay."""
    L = spans * bay_ft
    sup = "".join(f'[[supports]]\nat = "{i * bay_ft:g} ft"\ntype = "{"pin" if i == 0 else "roller"}"\n'
                  for i in range(spans + 1))
    return f"""schema = 1
title = "{spans}-span shelf rail"
[beam]
length = "{L:g} ft"
section = "HSS3x2x3/16"
material = "A500-C"
{sup}
[[loads]]
type = "uniform"
start = "0 ft"
end = "{L:g} ft"
value = "-120 lbf/ft"
patterned = true
[criteria]
deflection = "shelf"
"""


def median(fn, runs: int) -> float:
    fn()  # warm
    ts = []
    for _ in range(runs):
        t = time.perf_counter()
        fn()
        ts.append(time.perf_counter() - t)
    return statistics.median(ts)


def peak_mib(fn) -> float:
    tracemalloc.start()
    fn()
    peak = tracemalloc.get_traced_memory()[1]
    tracemalloc.stop()
    return peak / 2**20


def ms(s: float) -> str:
    return f"{s * 1e3:.3g} ms"


def main(argv=None) -> int:
    ap = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    ap.add_argument("--quick", action="store_true")
    a = ap.parse_args(argv)
    n = 5 if a.quick else 20
    rows = []

    def row(what, figure, target=""):
        rows.append((what, figure, target))
        print(f"{what:<58} {figure:<22} {target}", flush=True)

    t10, t50, t1 = shelf_text(10), shelf_text(50), shelf_text(1)
    row("read + analyze, 1-span shelf", ms(median(lambda: analyze(parse_job_text(t1)), n)))
    row("read + analyze, 10-span patterned shelf",
        ms(median(lambda: analyze(parse_job_text(t10)), n)), "< 5 ms")
    row("read + analyze, 50-span patterned shelf",
        ms(median(lambda: analyze(parse_job_text(t50)), n)), "< 20 ms")
    j10, j50 = parse_job_text(t10), parse_job_text(t50)
    row("capacity, 10-span patterned shelf", ms(median(lambda: capacity(j10), n)), "< 20 ms")
    row("capacity, 50-span patterned shelf", ms(median(lambda: capacity(j50), n)), "< 20 ms")
    trolley = load_job(ROOT / "presets" / "monorail-trolley.toml")
    row("analyze, monorail-trolley preset", ms(median(lambda: analyze(trolley), n)), "< 5 ms")
    row("capacity, monorail-trolley preset", ms(median(lambda: capacity(trolley), max(3, n // 4))),
        "< 20 ms")
    from shopbeam.design.loading import moving_envelope, state_set

    ss = state_set(trolley)
    row("exact moving envelope alone, monorail-trolley",
        ms(median(lambda: moving_envelope(trolley, ss, ss.static_loads(1.0, ()), 1.0), n)))
    sys.path.insert(0, str(ROOT / "tests"))
    from adversarial import wheels  # noqa: E402

    for name, text in (("16 wheels on 2 supports", wheels(16)),
                       ("8 wheels, 14 springs (moving limit)", wheels(8, springs_n=14)),
                       ("4 wheels, 26 springs (moving limit)", wheels(4, springs_n=26))):
        j = parse_job_text(text)
        row(f"analyze, {name}", ms(median(lambda: analyze(j), max(2, n // 10))))
        row(f"capacity, {name}", ms(median(lambda: capacity(j), max(2, n // 10))))
    typical = load_job(HERE / "jobs" / "typical.toml")
    m = max(3, n // 4)
    row("size --kind HSS, typical plain job", ms(median(lambda: size(typical, "HSS"), m)),
        "< 0.1 s")
    row("size --kind HSS, 10-span patterned shelf", ms(median(lambda: size(j10, "HSS"), m)),
        "< 0.3 s")
    try:  # past the sizing bound for patterned jobs (jobs/limits.SIZE_PATTERN_WORK)
        row("size --kind HSS, 50-span patterned shelf", ms(median(lambda: size(j50, "HSS"), 3)),
            "")
    except Exception as exc:  # noqa: BLE001 - a refusal is a figure too
        row("size --kind HSS, 50-span patterned shelf", "refused", str(exc)[:60])
    try:
        t = median(lambda: size(trolley, "HSS"), 1)
        row("size --kind HSS, monorail trolley (moving)", ms(t), "< 0.3 s")
    except Exception as exc:  # noqa: BLE001 - a refusal is a figure too
        row("size --kind HSS, monorail trolley (moving)", "refused", str(exc)[:60])
    from shopbeam.members import catalog

    def all_kinds(job):
        for kind in catalog.kinds():
            try:
                size(job, kind, with_capacity=True)
            except Exception:  # noqa: BLE001
                pass

    row("size --kind all (one sweep), typical plain job",
        ms(median(lambda: size(typical, "all"), 3)), "< 0.5 s")
    row("size --kind K for every kind K in turn, typical plain job",
        ms(median(lambda: all_kinds(typical), 1)), "(28 commands' worth)")
    j25 = parse_job_text(shelf_text(25))  # about the largest the sizing bound lets in on HSS
    row("peak memory, size --kind HSS, 25-span patterned",
        f"{peak_mib(lambda: size(j25, 'HSS')):.1f} MiB", "< 150 MB")
    row("peak memory, size --kind HSS, 10-span patterned",
        f"{peak_mib(lambda: size(j10, 'HSS')):.1f} MiB", "< 150 MB")
    whole_process(row, 5 if a.quick else 11, t1, t10)
    return 0


def whole_process(row, runs: int, t1: str, t10: str) -> None:
    """The issue's whole-process ratios: each command a fresh interpreter of this checkout
    (`python -m shopbeam`), run in turn so both see the same load, medians of `runs`. Keep
    the bytecode cache (no PYTHONDONTWRITEBYTECODE), as an installed copy has it."""
    import subprocess
    import tempfile

    def cmd(*args) -> float:
        t = time.perf_counter()
        r = subprocess.run([sys.executable, "-m", "shopbeam", *args], cwd=ROOT,
                           capture_output=True, text=True)
        if r.returncode != 0:
            raise RuntimeError(f"shopbeam {' '.join(args)}: {r.stderr.strip()[:200]}")
        return time.perf_counter() - t

    typical = str(HERE / "jobs" / "typical.toml")
    with tempfile.TemporaryDirectory() as tmp:
        one, ten = Path(tmp, "shelf-1.toml"), Path(tmp, "shelf-10.toml")
        one.write_text(t1)
        ten.write_text(t10)
        pairs = {"solve": [], "size": [], "one": [], "ten": []}
        for _ in range(runs + 1):  # the first round warms the bytecode cache and is dropped
            got = (cmd("solve", typical, "--json"), cmd("size", typical, "--kind", "HSS"),
                   cmd("solve", str(one), "--json"), cmd("solve", str(ten), "--json"))
            for key, v in zip(pairs, got):
                pairs[key].append(v)
        med = {k: statistics.median(v[1:]) for k, v in pairs.items()}
    row("whole process: size --kind HSS / solve --json, typical",
        f"{med['size'] / med['solve']:.2f}x ({med['size']:.2f} / {med['solve']:.2f} s)",
        "< 1.3x")
    row("whole process: solve --json, 10-span / 1-span shelf",
        f"{med['ten'] / med['one']:.2f}x ({med['ten']:.2f} / {med['one']:.2f} s)", "< 1.2x")


if __name__ == "__main__":
    raise SystemExit(main())
