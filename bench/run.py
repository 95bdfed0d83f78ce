"""Benchmarks: solve latency and growth, symbolic vs numeric, evaluation floor, cold start,
sizing sweep and capacity, peak memory. Prints a table and writes JSON to bench/results/.

    python bench/run.py            # full run (a few minutes on 2 cores)
    python bench/run.py --quick    # fewer repeats, smaller symbolic cases (about a minute)

Everything is measured side by side in one run; times are medians of many runs, and the
comparisons are given as ratios because a shared 2-core machine is noisy. Each figure is
printed beside its target so a missed target is visible at once.
"""

from __future__ import annotations

import argparse
import gc
import json
import os
import platform
import random
import statistics
import subprocess
import sys
import time
from dataclasses import replace
from pathlib import Path

HERE = Path(__file__).resolve().parent
ROOT = HERE.parent
sys.path.insert(0, str(ROOT))

import numpy as np  # noqa: E402

from shopbeam.engine.model import Beam, Load, Support  # noqa: E402
from shopbeam.engine.solver import solve, stability_problem  # noqa: E402

EI = 650_000.0  # N*m^2, about an HSS4x4x1/4 in steel
SPAN = 1.8  # m


# ------------------------------------------------------------------ bench beams
def make_beam(spans: int, nloads: int, seed: int = 0, springs: bool = True,
              hinges: bool = True) -> Beam:
    """A stable continuous beam with `spans` spans (+ an overhang) and `nloads` mixed loads.

    Loads cycle through point, uniform, linear and couple; with two or more spans one
    interior support is a spring and hinges sit near interior supports (one per two spans),
    dropped again if they would make a mechanism. Positions are whole millimetres and values
    whole newtons, so the exact solve sees exactly the same numbers.
    """
    rng = random.Random(seed)
    xs = [round(i * SPAN, 3) for i in range(spans + 1)]
    L = round(xs[-1] + 0.4 * SPAN, 3)  # an overhang past the last support
    sups = [Support(0.0, "pin" if spans > 1 else "fixed")]
    for i, x in enumerate(xs[1:], start=1):
        if springs and spans >= 2 and i == spans // 2 + (spans % 2):
            sups.append(Support(x, "spring", stiffness=2.0e5))
        else:
            sups.append(Support(x, "roller"))
    if hinges and spans >= 2:
        cand = list(sups)
        for j in range(1, spans, 2):
            cand.append(Support(round(xs[j] + 0.25 * SPAN, 3), "hinge"))
            trial = Beam(L, EI, tuple(sorted(cand, key=lambda s: s.at)))
            if stability_problem(trial) is not None:
                cand.pop()
        sups = cand
    sups = tuple(sorted(sups, key=lambda s: s.at))

    def pos() -> float:
        return round(rng.uniform(0.0, L), 3)

    loads = []
    kinds = ("point", "uniform", "linear", "moment")
    hinge_at = {s.at for s in sups if s.kind == "hinge"}
    for i in range(nloads):
        kind = kinds[i % 4]
        if kind == "point":
            loads.append(Load("point", at=pos(), value=-float(rng.randint(100, 3000))))
        elif kind == "moment":
            at = pos()
            while at in hinge_at:
                at = pos()
            loads.append(Load("moment", at=at, value=float(rng.randint(-800, 800) or 1)))
        else:
            a, b = sorted((pos(), pos()))
            if b - a < 0.01:
                a, b = max(0.0, a - 0.2), min(L, b + 0.2)
            w1 = -float(rng.randint(100, 2000))
            w2 = w1 if kind == "uniform" else -float(rng.randint(0, 2000))
            loads.append(Load(kind, start=a, end=b, w1=w1, w2=w2))
    return Beam(L, EI, sups, tuple(loads))


def describe(beam: Beam) -> str:
    kinds = [s.kind for s in beam.supports]
    return (f"{sum(k != 'hinge' for k in kinds) - 1} spans, {len(beam.loads)} loads, "
            f"{kinds.count('spring')} spring, {kinds.count('hinge')} hinge")


# ------------------------------------------------------------------ timing
def median_time(fn, min_runs: int = 30, min_seconds: float = 0.3, max_runs: int = 20000) -> float:
    """Median wall time of one call, in seconds (garbage collection off while timing)."""
    fn()  # warm up (lazy imports, caches)
    times = []
    gc_was = gc.isenabled()
    gc.disable()
    try:
        start = time.perf_counter()
        while len(times) < max_runs and (len(times) < min_runs
                                          or time.perf_counter() - start < min_seconds):
            t0 = time.perf_counter_ns()
            fn()
            times.append(time.perf_counter_ns() - t0)
    finally:
        if gc_was:
            gc.enable()
    return statistics.median(times) * 1e-9


def solve_and_extremes(beam: Beam):
    sol = solve(beam)
    sol.extremes()
    return sol


def solve_full(beam: Beam):
    sol = solve_and_extremes(beam)
    sol.diagnostics  # noqa: B018 - the self-checks every report shows
    return sol


def eval_floor(sol) -> None:
    """Evaluate the four final piecewise polynomials on a 2001-point grid (numpy)."""
    grid = np.linspace(0.0, sol.length, 2001)
    for name in ("shear", "moment", "slope", "deflection"):
        sol.function(name)(grid)


def fmt_t(s: float) -> str:
    if s < 1e-3:
        return f"{s * 1e6:.0f} us"
    if s < 1:
        return f"{s * 1e3:.2f} ms"
    return f"{s:.2f} s"


# ------------------------------------------------------------------ sections
def bench_latency(quick: bool) -> dict:
    sizes = [(1, 1), (1, 3), (2, 5), (3, 10), (3, 25), (5, 50), (10, 100), (10, 200)]
    rows = []
    for spans, n in sizes:
        beam = make_beam(spans, n, seed=spans * 1000 + n)
        mt = 0.15 if quick else 0.5
        t_solve = median_time(lambda: solve(beam), min_seconds=mt)
        t_ext = median_time(lambda: solve_and_extremes(beam), min_seconds=mt)
        t_full = median_time(lambda: solve_full(beam), min_seconds=mt)
        sol = solve(beam)
        t_floor = median_time(lambda: eval_floor(sol), min_seconds=mt)
        rows.append({"spans": spans, "loads": n, "beam": describe(beam),
                     "pieces": len(sol.shear.breaks) - 1,
                     "solve_s": t_solve, "solve_extremes_s": t_ext,
                     "solve_extremes_selfchecks_s": t_full, "eval_floor_s": t_floor,
                     "ratio_to_floor": t_ext / t_floor})
    return {"rows": rows}


def bench_growth(quick: bool) -> dict:
    """Per-load and per-support cost slopes, and the growth exponent of each."""
    mt = 0.15 if quick else 0.4
    load_ns = [10, 25, 50, 100, 200, 400]
    t_loads = [median_time(lambda b=make_beam(3, n, seed=n): solve_and_extremes(b),
                           min_seconds=mt) for n in load_ns]
    span_ns = [1, 2, 5, 10, 20, 40]
    t_spans = [median_time(lambda b=make_beam(s, 20, seed=s): solve_and_extremes(b),
                           min_seconds=mt) for s in span_ns]

    def fit(xs, ts):
        slope, icpt = np.polyfit(xs, ts, 1)
        # growth exponent over the top half: t ~ n^p with p <= 1 for linear growth
        p = float(np.log(ts[-1] / ts[-3]) / np.log(xs[-1] / xs[-3]))
        return float(slope), float(icpt), p

    ls, li, lp = fit(load_ns, t_loads)
    ss, si, sp_ = fit(span_ns, t_spans)
    # the same span sweep with one BLAS thread: on a busy 2-core machine a second OpenBLAS
    # thread makes the dense solve of a big system slower, not faster
    one = None
    if os.environ.get("OPENBLAS_NUM_THREADS") != "1":
        env = dict(os.environ, OPENBLAS_NUM_THREADS="1", OMP_NUM_THREADS="1")
        code = ("import sys, json; sys.path.insert(0, sys.argv[1]); "
                "from bench.run import make_beam, median_time, solve_and_extremes; "
                f"print(json.dumps([median_time(lambda b=make_beam(s, 20, seed=s): "
                f"solve_and_extremes(b), min_seconds={mt}) for s in {span_ns}]))")
        p = subprocess.run([sys.executable, "-c", code, str(ROOT)], capture_output=True,
                           text=True, env=env)
        if p.returncode == 0:
            t1 = json.loads(p.stdout.strip().splitlines()[-1])
            s1, i1, p1 = fit(span_ns, t1)
            one = {"n": span_ns, "t": t1, "slope_s_per_span": s1, "intercept_s": i1,
                   "exponent_top": p1}
    return {"loads": {"n": load_ns, "t": t_loads, "slope_s_per_load": ls, "intercept_s": li,
                      "exponent_top": lp},
            "spans": {"n": span_ns, "t": t_spans, "slope_s_per_span": ss, "intercept_s": si,
                      "exponent_top": sp_},
            "spans_one_blas_thread": one}


def exact_reactions(beam: Beam) -> tuple[list[float], str]:
    """Reactions by the straightforward symbolic solve, in the solver's reaction order."""
    try:
        from shopbeam.output.calcsheet import exact_solve, exact_number
        how = "shopbeam.output.calcsheet.exact_solve"
    except ImportError:  # pragma: no cover - the calc sheet not there yet
        from bench.symbolic import exact_solve, exact_number  # type: ignore
        how = "bench/symbolic.py"
    ex = exact_solve(beam)
    ei = exact_number(beam.ei)
    vals = {k: v.subs(ex.ei, ei) for k, v in ex.solution.items()}
    out = []
    n_r = n_m = 0
    by_at = []
    for s in beam.supports:
        f = m = 0.0
        if s.takes_force:
            n_r += 1
            f = float(vals[next(u for u in ex.unknowns if u.name == f"R{n_r}")])
        if s.takes_moment:
            n_m += 1
            m = float(vals[next(u for u in ex.unknowns if u.name == f"M{n_m}")])
        if s.kind != "hinge":
            by_at.append((s.at, f, m))
    for _, f, m in sorted(by_at, key=lambda t: t[0]):
        out += [f, m]
    return out, how


def bench_symbolic(quick: bool) -> dict:
    sizes = [(1, 1), (1, 3), (2, 5), (3, 10)] + ([] if quick else [(5, 20)])
    rows = []
    how = ""
    exact_reactions(make_beam(1, 1))  # import sympy and warm its caches before timing
    for spans, n in sizes:
        beam = make_beam(spans, n, seed=spans * 1000 + n)
        from sympy.core.cache import clear_cache

        clear_cache()  # sympy memoises; a repeat on the same beam would be a cache hit
        t0 = time.perf_counter()
        exact, how = exact_reactions(beam)
        t_sym = time.perf_counter() - t0
        reps = 1 if (quick or t_sym > 5) else 3
        ts = [t_sym]
        for _ in range(reps - 1):
            clear_cache()
            t0 = time.perf_counter()
            exact_reactions(beam)
            ts.append(time.perf_counter() - t0)
        t_sym = statistics.median(ts)
        t_num = median_time(lambda: solve(beam), min_seconds=0.2)
        sol = solve(beam)
        num = []
        for r in sol.reactions:
            num += [r.force, r.moment]
        scale = max(abs(v) for v in exact)
        err = max(abs(a - b) for a, b in zip(num, exact)) / scale
        rows.append({"spans": spans, "loads": n, "beam": describe(beam), "symbolic_s": t_sym,
                     "numeric_s": t_num, "speedup": t_sym / t_num, "max_rel_diff": err})
    return {"comparator": how, "rows": rows}


def _run(cmd, env=None, cwd=None) -> float:
    t0 = time.perf_counter()
    p = subprocess.run(cmd, capture_output=True, text=True, env=env, cwd=cwd)
    dt = time.perf_counter() - t0
    if p.returncode != 0:
        raise RuntimeError(f"{cmd} failed ({p.returncode}): {p.stderr[-400:]}")
    return dt


def shopbeam_exe() -> list[str]:
    exe = Path(sys.executable).with_name("shopbeam")
    return [str(exe)] if exe.exists() else [sys.executable, "-m", "shopbeam"]


FLOOR = "import numpy, pint; pint.UnitRegistry(cache_folder=':auto:')"

TUI_FIRST_SCREEN = """
import asyncio, sys, time
t0 = time.perf_counter()
from shopbeam.tui.app import make_app
app = make_app(job_path=sys.argv[1])
async def main():
    async with app.run_test(size=(100, 32)) as pilot:
        await pilot.pause()
asyncio.run(main())
"""


def bench_cold_start(quick: bool, job: Path) -> dict:
    runs = 5 if quick else 11
    py = sys.executable
    cmds = {
        "python -c pass": [py, "-c", "pass"],
        "floor: import numpy, pint + registry": [py, "-c", FLOOR],
        "shopbeam solve JOB --json": shopbeam_exe() + ["solve", str(job), "--json"],
        "shopbeam solve JOB (report)": shopbeam_exe() + ["solve", str(job)],
    }
    custom = HERE / "jobs" / "typical-custom.toml"
    if custom.exists() and job.name == "typical.toml":
        cmds["shopbeam solve JOB --json, inline section"] = (
            shopbeam_exe() + ["solve", str(custom), "--json"])
    tui = (ROOT / "shopbeam" / "tui" / "app.py").exists()
    if tui:
        cmds["text UI to first screen (run_test)"] = [py, "-c", TUI_FIRST_SCREEN, str(job)]
    # a normal install keeps byte-code caches; this machine's environment turns them off
    env = {k: v for k, v in os.environ.items() if k != "PYTHONDONTWRITEBYTECODE"}
    for c in cmds.values():  # warm the file cache, byte-code and pint's registry cache
        try:
            _run(c, env)
        except RuntimeError as e:
            print("  cold start:", e, file=sys.stderr)
    times: dict[str, list[float]] = {k: [] for k in cmds}
    failed = set()
    for _ in range(runs):  # interleaved, so machine noise hits every command alike
        for k, c in cmds.items():
            if k in failed:
                continue
            try:
                times[k].append(_run(c, env))
            except RuntimeError:
                failed.add(k)
    med = {k: statistics.median(v) for k, v in times.items() if v}
    floor = med["floor: import numpy, pint + registry"]
    return {"runs": runs, "median_s": med,
            "ratio_to_floor": {k: v / floor for k, v in med.items()},
            "tui_present": tui, "failed": sorted(failed)}


# Each memory probe runs in a fresh interpreter; this helper is pasted into each one.
PEAK_RSS = '''def peak_rss():  # VmHWM: this process's own peak (ru_maxrss would carry the parent's over exec)
    for line in open("/proc/self/status"):
        if line.startswith("VmHWM:"):
            return int(line.split()[1]) * 1024
    return resource.getrusage(resource.RUSAGE_SELF).ru_maxrss * 1024
'''

MEM_SOLVE = """
import resource, sys, tracemalloc, json
{PEAK_RSS}tracemalloc.start()
from shopbeam.jobs.jobfile import load_job
from shopbeam.design.analysis import analyze, to_json
job = load_job(sys.argv[1])
res = analyze(job)
json.dumps(to_json(res))
cur, peak = tracemalloc.get_traced_memory()
print(json.dumps({"tracemalloc_peak": peak,
                  "maxrss": peak_rss()}))
"""
MEM_SOLVE = MEM_SOLVE.replace("{PEAK_RSS}", PEAK_RSS)

MEM_FLOOR = """
import resource, json, tracemalloc
{PEAK_RSS}tracemalloc.start()
import numpy, pint
pint.UnitRegistry(cache_folder=':auto:')
cur, peak = tracemalloc.get_traced_memory()
print(json.dumps({"tracemalloc_peak": peak,
                  "maxrss": peak_rss()}))
"""
MEM_FLOOR = MEM_FLOOR.replace("{PEAK_RSS}", PEAK_RSS)

MEM_BIG = """
import resource, sys, json, tracemalloc
{PEAK_RSS}sys.path.insert(0, sys.argv[1])
from bench.run import make_beam, solve_full
beam = make_beam(10, 200, seed=10200)
solve_full(beam)
tracemalloc.start()
solve_full(beam)
cur, peak = tracemalloc.get_traced_memory()
print(json.dumps({"tracemalloc_peak": peak,
                  "maxrss": peak_rss()}))
"""
MEM_BIG = MEM_BIG.replace("{PEAK_RSS}", PEAK_RSS)

MEM_TUI = """
import asyncio, resource, sys, json, tracemalloc
{PEAK_RSS}tracemalloc.start()
from shopbeam.tui.app import make_app
app = make_app(job_path=sys.argv[1])
async def main():
    async with app.run_test(size=(100, 32)) as pilot:
        await pilot.pause()
asyncio.run(main())
cur, peak = tracemalloc.get_traced_memory()
print(json.dumps({"tracemalloc_peak": peak,
                  "maxrss": peak_rss()}))
"""
MEM_TUI = MEM_TUI.replace("{PEAK_RSS}", PEAK_RSS)


def bench_memory(job: Path) -> dict:
    out = {}
    jobs = {"floor: import numpy, pint + registry": [MEM_FLOOR],
            "solve JOB (load, analyze, JSON)": [MEM_SOLVE, str(job)],
            "solve only, 10 spans/200 loads (in-process, after warm-up)": [MEM_BIG, str(ROOT)]}
    if (ROOT / "shopbeam" / "tui" / "app.py").exists():
        jobs["text UI to first screen"] = [MEM_TUI, str(job)]
    for name, args in jobs.items():
        p = subprocess.run([sys.executable, "-c", *args], capture_output=True, text=True)
        if p.returncode != 0:
            out[name] = {"error": p.stderr.strip().splitlines()[-1:] or ["failed"]}
            continue
        out[name] = json.loads(p.stdout.strip().splitlines()[-1])
    return out


def bench_sizing(job: Path, quick: bool) -> dict:
    out: dict = {}
    from shopbeam.jobs.jobfile import load_job

    try:
        jb = load_job(job)
    except Exception as e:  # noqa: BLE001
        return {"error": f"cannot load {job}: {e}"}
    try:
        from shopbeam.design import sizing
    except ImportError as e:
        out["sizing"] = {"error": f"shopbeam.design.sizing not available ({e})"}
    else:
        from shopbeam.members import catalog

        kind = sizing.default_kind(jb)
        n = len(catalog.list_sections(kind))
        reps = 3 if quick else 7
        ts = []
        result = None
        for _ in range(reps):
            t0 = time.perf_counter()
            result = sizing.size(jb, kind)
            ts.append(time.perf_counter() - t0)
        out["sizing"] = {"kind": kind, "median_s": statistics.median(ts), "catalog_count": n,
                         "rows": len(getattr(result, "rows", ())),
                         "method": getattr(result, "method", "")}
        # the same sweep with a spring (screened with exact per-section spring forces, then
        # checked in full lightest first; was section by section, 80 sections at most)
        spring_job = jb.with_changes(supports=tuple(
            replace(s, kind="spring", stiffness=5e6) if i == 1 else s
            for i, s in enumerate(jb.supports)))
        t0 = time.perf_counter()
        result = sizing.size(spring_job, kind)
        out["sizing, a spring (whole kind)"] = {
            "kind": kind, "median_s": time.perf_counter() - t0, "target": None,
            "catalog_count": len(result.rows) + len(result.skipped),
            "method": getattr(result, "method", "")}
    try:
        from shopbeam.design import capacity as cap
    except ImportError as e:
        out["capacity"] = {"error": f"shopbeam.design.capacity not available ({e})"}
    else:
        t = median_time(lambda: cap.capacity(jb), min_runs=5, min_seconds=0.3, max_runs=200)
        out["capacity"] = {"median_s": t}
    from shopbeam.design.analysis import analyze

    out["analyze JOB in-process (solve, checks, self-checks)"] = {
        "median_s": median_time(lambda: analyze(jb), min_seconds=0.3), "target": None}
    return out


# ------------------------------------------------------------------ report
def print_table(res: dict) -> None:
    p = print
    p(f"shopbeam benchmarks  {res['when']}  python {res['python']}  "
      f"numpy {res['numpy']}  {res['cpus']} CPUs")
    p("")
    p("SOLVE LATENCY (median; extremes = exact extremes of V, M, slope, deflection)")
    p("  (solve finds the extreme candidates of all four functions in one batched pass)")
    p(f"  {'size':<38}{'pieces':>7}{'solve+extremes':>16}{'+self-checks':>14}"
      f"{'eval floor':>12}{'x floor':>8}")
    for r in res["latency"]["rows"]:
        p(f"  {r['beam']:<38}{r['pieces']:>7}{fmt_t(r['solve_extremes_s']):>16}"
          f"{fmt_t(r['solve_extremes_selfchecks_s']):>14}"
          f"{fmt_t(r['eval_floor_s']):>12}{r['ratio_to_floor']:>8.1f}")
    typ = [r for r in res["latency"]["rows"] if r["spans"] <= 3 and r["loads"] <= 10]
    worst = max(r["solve_extremes_s"] for r in typ)
    p(f"  target: typical job (<= 3 spans, <= 10 loads) solve + extremes < 1 ms: worst "
      f"{fmt_t(worst)} -> {'MET' if worst < 1e-3 else 'MISSED'}")
    g = res["growth"]
    p("")
    p("GROWTH (solve + extremes)")
    p("  loads (3 spans): " + ", ".join(f"{n}: {fmt_t(t)}" for n, t in zip(g['loads']['n'], g['loads']['t'])))
    p(f"    per-load slope {g['loads']['slope_s_per_load'] * 1e6:.1f} us/load, "
      f"growth exponent over the top sizes {g['loads']['exponent_top']:.2f} "
      f"-> {'linear or better' if g['loads']['exponent_top'] <= 1.1 else 'WORSE THAN LINEAR'}")
    p("  spans (20 loads): " + ", ".join(f"{n}: {fmt_t(t)}" for n, t in zip(g['spans']['n'], g['spans']['t'])))
    p(f"    per-span slope {g['spans']['slope_s_per_span'] * 1e6:.1f} us/span, "
      f"growth exponent over the top sizes {g['spans']['exponent_top']:.2f} "
      f"-> {'linear or better' if g['spans']['exponent_top'] <= 1.1 else 'WORSE THAN LINEAR'}")
    one = g.get("spans_one_blas_thread")
    if one:
        p("  spans, one BLAS thread: " + ", ".join(f"{n}: {fmt_t(t)}" for n, t in zip(one['n'], one['t'])))
        p(f"    per-span slope {one['slope_s_per_span'] * 1e6:.1f} us/span, "
          f"growth exponent over the top sizes {one['exponent_top']:.2f} "
          f"-> {'linear or better' if one['exponent_top'] <= 1.1 else 'WORSE THAN LINEAR'}")
    s = res["symbolic"]
    p("")
    p(f"SYMBOLIC VS NUMERIC (reactions; comparator {s['comparator']})")
    p(f"  {'size':<38}{'symbolic':>10}{'numeric':>10}{'speedup':>10}{'rel diff':>11}")
    for r in s["rows"]:
        p(f"  {r['beam']:<38}{fmt_t(r['symbolic_s']):>10}{fmt_t(r['numeric_s']):>10}"
          f"{r['speedup']:>9.0f}x{r['max_rel_diff']:>11.1e}")
    ok_s = all(r["speedup"] >= 100 for r in s["rows"])
    ok_d = all(r["max_rel_diff"] <= 1e-9 for r in s["rows"])
    p(f"  target >= 100x faster: {'MET' if ok_s else 'MISSED'}; agree to 1e-9: "
      f"{'MET' if ok_d else 'MISSED'}")
    c = res["cold_start"]
    p("")
    p(f"COLD START (subprocess, median of {c['runs']} interleaved runs)")
    for k, v in c["median_s"].items():
        p(f"  {k:<44}{fmt_t(v):>10}{c['ratio_to_floor'][k]:>7.2f}x floor")
    for k in ("shopbeam solve JOB --json", "shopbeam solve JOB --json, inline section"):
        r_solve = c["ratio_to_floor"].get(k)
        if r_solve is not None:
            p(f"  target {k[9:]} within 1.3x of the floor: {r_solve:.2f}x -> "
              f"{'MET' if r_solve <= 1.3 else 'MISSED'}")
    if not c["tui_present"]:
        p("  text UI: shopbeam/tui/app.py not there yet, not measured")
    sz = res["sizing"]
    p("")
    p("SIZING SWEEP AND CAPACITY")
    for k, v in sz.items():
        if isinstance(v, dict) and "median_s" in v:
            extra = (f"  ({v['catalog_count']} {v['kind']} sections)"
                     if v.get("catalog_count") else "")
            target = "" if "target" in v else (
                f"  target < 0.5 s -> {'MET' if v['median_s'] < 0.5 else 'MISSED'}")
            p(f"  {k:<52}{fmt_t(v['median_s']):>10}{extra}{target}")
        else:
            p(f"  {k}: {v}")
    p("")
    p("PEAK MEMORY (subprocess; tracemalloc = Python allocations, maxrss = whole process)")
    for k, v in res["memory"].items():
        if "error" in v:
            p(f"  {k}: failed: {v['error']}")
        else:
            p(f"  {k:<58}{v['tracemalloc_peak'] / 2**20:>7.1f} MiB{v['maxrss'] / 2**20:>8.1f} MiB rss")


def main(argv=None) -> int:
    ap = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    ap.add_argument("--quick", action="store_true")
    ap.add_argument("--job", default=str(HERE / "jobs" / "typical.toml"))
    ap.add_argument("--only", default=None,
                    help="comma list of: latency,growth,symbolic,cold,sizing,memory")
    args = ap.parse_args(argv)
    only = set(args.only.split(",")) if args.only else None
    job = Path(args.job)
    res = {"when": time.strftime("%Y-%m-%d %H:%M:%S"), "python": platform.python_version(),
           "numpy": np.__version__, "cpus": os.cpu_count(), "quick": args.quick}
    steps = [("latency", lambda: bench_latency(args.quick)),
             ("growth", lambda: bench_growth(args.quick)),
             ("symbolic", lambda: bench_symbolic(args.quick)),
             ("cold_start", lambda: bench_cold_start(args.quick, job)),
             ("sizing", lambda: bench_sizing(job, args.quick)),
             ("memory", lambda: bench_memory(job))]
    for name, fn in steps:
        short = {"cold_start": "cold"}.get(name, name)
        if only and short not in only:
            continue
        print(f"... {name}", file=sys.stderr, flush=True)
        res[name] = fn()
    out_dir = HERE / "results"
    out_dir.mkdir(exist_ok=True)
    stamp = time.strftime("%Y%m%d-%H%M%S")
    text = json.dumps(res, indent=2, default=float)
    (out_dir / f"bench-{stamp}.json").write_text(text)
    (out_dir / "latest.json").write_text(text)
    if only:
        print(json.dumps(res, indent=2, default=float))
    else:
        print_table(res)
    print(f"\nwritten: {out_dir / f'bench-{stamp}.json'}")
    return 0


if __name__ == "__main__":
    sys.exit(main())
