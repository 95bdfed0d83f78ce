"""Text UI measures, driven with Pilot: the first screen, and a typical edit until the answer
and the plots are on screen again.

    python bench/tui.py            # prints a table, writes bench/results/tui.json
    python bench/tui.py --quick    # fewer repeats

- first screen (cold): `shopbeam` with no job (the library, the bundled demo picked, over
  the demo's job screen) in a fresh interpreter, from its start until the first screen is
  drawn (headless, 80x24): what a user waits for; then until the demo's answer is on it.
  `--compare DIR` times another checkout (a git worktree of main) the same way,
  interleaved, for a before/after on a busy machine.
- first screen (warm): the same inside one process (imports done), make_app to drawn.
- per key on the UI thread: one edit of the length applied and the span view redrawn,
  without the solve (the solve runs in a worker): what a typed key costs the screen.
- edit -> answer: a key typed into the length ("15 ft" to "150 ft") until the first frame
  written to the terminal after the answer is installed (a key on its own is solved at
  once; keys of a burst wait out the 30 ms debounce); the processor time of both threads
  over it, which a busy machine does not inflate the way it does the wall time; and, as
  before, until Pilot's `pause()` returns (it also waits for the processor to go idle, in
  steps, so it runs tens of ms past the frame).
- results / plots redraw: the results view and the plots view drawn for the new answer.
- solve (worker): the job read and solved, as the worker does it.
Jobs: the demo, the monorail trolley (moving load), and an 8-span shelf (patterned).
"""

from __future__ import annotations

import argparse
import asyncio
import json
import os
import statistics
import subprocess
import sys
import tempfile
import time
from pathlib import Path

HERE = Path(__file__).resolve().parent
ROOT = HERE.parent
sys.path.insert(0, str(ROOT))

SHELF8 = """schema = 1
title = "8-span shelf rail, patterned parts load"
units = "us"
[beam]
length = "40 ft"
section = "HSS3x2x1/8"
material = "A500-C"
{supports}
[[loads]]
type = "uniform"
start = "0 ft"
end = "40 ft"
value = "-60 lbf/ft"
patterned = true
[criteria]
deflection = "L/240"
"""


def _shelf8(folder: Path) -> Path:
    sup = "\n".join(f'[[supports]]\nat = "{5 * i} ft"\ntype = "{"pin" if i == 0 else "roller"}"'
                    for i in range(9))
    p = folder / "shelf8.toml"
    p.write_text(SHELF8.format(supports=sup), encoding="utf-8")
    return p


COLD = r"""
import time, asyncio, sys
t0 = time.perf_counter()
from shopbeam import cli  # what the `shopbeam` command imports first
from shopbeam.tui import app as tui_app
marks = {}
mounted, solved = tui_app.ShopbeamApp.on_mount, tui_app.JobScreen._solved
def on_mount(self):  # the app is mounted: note when its first screen has been drawn
    mounted(self)
    self.call_after_refresh(
        lambda: marks.setdefault("drawn", (time.perf_counter() - t0, time.time())))
def answer(self, *a):
    solved(self, *a)
    marks.setdefault("answer", time.perf_counter() - t0)
def run(self, *a, **k):  # headless at 80x24, until the job is solved
    async def go():
        async with self.run_test(size=(80, 24)) as pilot:
            while "answer" not in marks or "drawn" not in marks:
                await pilot.pause()
    asyncio.run(go())
tui_app.ShopbeamApp.on_mount, tui_app.JobScreen._solved = on_mount, answer
tui_app.ShopbeamApp.run = run
cli.has_terminal = lambda: True  # headless here: as in a terminal
cli.main(sys.argv[1:])
print(*marks["drawn"], marks["answer"])
"""


def cold_first_screen(job: Path, runs: int, root: Path = ROOT, warm: bool = True) -> list[float]:
    """Fresh interpreters on `root`'s copy of shopbeam. Python may write its bytecode cache
    (an installed copy has it from the install; PYTHONDONTWRITEBYTECODE, set in some
    shells, would make every run compile every module again); one run first, not counted,
    writes it."""
    env = {k: v for k, v in os.environ.items() if k != "PYTHONDONTWRITEBYTECODE"}
    out = []
    if warm:
        subprocess.run([sys.executable, "-c", COLD], capture_output=True, text=True,
                       cwd=root, check=True, env=env)
    for _ in range(runs):
        start = time.time()
        r = subprocess.run([sys.executable, "-c", COLD], capture_output=True,
                           text=True, cwd=root, check=True, env=env)
        inside, drawn, answer = map(float, r.stdout.strip().splitlines()[-1].split())
        # from the process being started (interpreter start included) to the screen drawn;
        # not its exit, which a user does not wait for; then to the answer on it
        out.append((drawn - start, inside, answer + (drawn - start - inside)))
    return out


async def warm_and_edit(job: Path, runs: int) -> dict:
    from textual._xterm_parser import XTermParser

    from shopbeam.tui import session as session_mod
    from shopbeam.tui.app import make_app
    from shopbeam.tui.widgets import Field

    from textual.app import App

    res: dict = {"first_warm": [], "key_ui": [], "edit_answer": [], "edit_answer_cpu": [],
                 "edit_answer_pilot": [], "results_draw": [], "plots_draw": [], "solve": []}
    # every frame the app writes (App._display: the compositor's output to the terminal)
    frames: list[float] = []
    display = App._display

    def noted(self, screen, renderable):
        display(self, screen, renderable)
        frames.append(time.perf_counter())

    App._display = noted
    for _ in range(max(1, runs // 3)):
        t = time.perf_counter()
        app = make_app(job, cursor_blink=False)
        async with app.run_test(size=(80, 24)) as pilot:
            await pilot.pause()
            res["first_warm"].append(time.perf_counter() - t)
    app = make_app(job, cursor_blink=False)
    async with app.run_test(size=(80, 24)) as pilot:
        await pilot.pause()
        js = app.job_screen
        await pilot.press("f3")
        await pilot.pause()
        f = next(f for f in js.query_one("#span").query(Field) if f.key == "beam.length")
        f.input.focus()
        await pilot.pause()
        s = js.session
        base = f.input.value  # e.g. "15 ft": a "0" typed after the digits gives "150 ft"
        digits = len(base) - len(base.lstrip("0123456789."))
        longer = base[:digits] + "0" + base[digits:]
        for i in range(runs):
            # the UI thread's share of one key: the edit applied, the view redrawn
            t = time.perf_counter()
            js.apply_edit("beam.length", longer if i % 2 == 0 else base, f.row)
            res["key_ui"].append(time.perf_counter() - t)
            await app.workers.wait_for_complete()
            await pilot.pause()
            f.input.value = base
            f.forget_typing()
            js.apply_edit("beam.length", base, f.row)
            await app.workers.wait_for_complete()
            await pilot.pause()
            # a key typed ("0" after the digits, then backspace): until its answer is shown
            f.input.cursor_position = digits
            before = s.version
            frames.clear()
            t, cpu = time.perf_counter(), time.process_time()
            for e in XTermParser().feed("0"):
                app._driver.send_message(e)
            while time.perf_counter() - t < 10:
                await asyncio.sleep(0.0005)
                if s.version > before and not s.stale:
                    installed = time.perf_counter()
                    break
            # the first frame written after the answer was installed: what the user sees
            while time.perf_counter() - t < 10 and not [x for x in frames if x >= installed]:
                await asyncio.sleep(0.0005)
            res["edit_answer"].append(min(x for x in frames if x >= installed) - t)
            # the processor time of both threads over the same stretch: what the key costs
            # whatever else the machine runs (the wall time above waits for it too)
            res["edit_answer_cpu"].append(time.process_time() - cpu)
            await pilot.pause()  # Pilot's own wait for an idle processor, as before
            res["edit_answer_pilot"].append(time.perf_counter() - t)
            await app.workers.wait_for_complete()
            await pilot.pause()
            f.input.value = base
            await app.workers.wait_for_complete()
            await pilot.pause()
        assert s.evaluation.ok, s.evaluation.problems
        for name, key in (("results_draw", "f8"), ("plots_draw", "f9")):
            await pilot.press(key)
            await pilot.pause()
            view = js.query_one(f"#{js.current}")
            for _ in range(max(3, runs // 2)):
                view.__dict__.pop("_drawn_for", None)  # drawn anew, as for a new answer
                t = time.perf_counter()
                js.refresh_all()
                res[name].append(time.perf_counter() - t)
        for _ in range(runs):
            v, data, text, name = s.snapshot()
            t = time.perf_counter()
            session_mod.evaluate_data(data, text, name)
            res["solve"].append(time.perf_counter() - t)
    return res


def ms(xs) -> str:
    xs = sorted(xs)
    med = statistics.median(xs) * 1000
    return f"{med:.1f} ms (range {xs[0] * 1000:.1f}-{xs[-1] * 1000:.1f})"


def main() -> None:
    ap = argparse.ArgumentParser()
    ap.add_argument("--quick", action="store_true")
    ap.add_argument("--jobs", default="demo,trolley,8-span shelf",
                    help="which jobs to edit (comma separated; '' for none)")
    ap.add_argument("--cold-runs", type=int, default=0,
                    help="cold first-screen runs (default 3, 5 without --quick; 0: default)")
    ap.add_argument("--compare", metavar="CHECKOUT",
                    help="also time the cold first screen of another checkout of shopbeam "
                         "(e.g. a git worktree of main), interleaved with this one")
    args = ap.parse_args()
    runs = 6 if args.quick else 15
    tmp = Path(tempfile.mkdtemp())
    os.environ["SHOPBEAM_USER_DIR"] = str(tmp / "user")
    jobs = {"demo": ROOT / "presets" / "demo.toml",
            "trolley": ROOT / "presets" / "monorail-trolley.toml",
            "8-span shelf": _shelf8(tmp)}
    wanted = [j.strip() for j in args.jobs.split(",") if j.strip()]
    table = []
    n_cold = args.cold_runs or (3 if args.quick else 5)
    out = {}
    roots = [("this checkout", ROOT)] + ([("compared", Path(args.compare).resolve())]
                                         if args.compare else [])
    cold: dict = {name: [] for name, _r in roots}
    for i in range(n_cold):  # interleaved, so both see the same load on a shared machine
        for name, root in roots:
            cold[name] += cold_first_screen(jobs["demo"], 1, root, warm=i == 0)
    for name, _r in roots:
        table.append((f"first screen, cold `shopbeam` (demo, 80x24), {name}",
                      ms([c[0] for c in cold[name]]), "< 1 s"))
        table.append(("  of which after interpreter start",
                      ms([c[1] for c in cold[name]]), ""))
        table.append(("  then the answer on screen (solved in the worker)",
                      ms([c[2] for c in cold[name]]), ""))
        out[f"cold_total {name}"] = [c[0] for c in cold[name]]
        out[f"cold_inside {name}"] = [c[1] for c in cold[name]]
        out[f"cold_answer {name}"] = [c[2] for c in cold[name]]
    print(*table, sep="\n", flush=True)
    for name, job in ((n, j) for n, j in jobs.items() if n in wanted):
        r = asyncio.run(warm_and_edit(job, runs))
        out[name] = r
        table.append((f"{name}: first screen, warm", ms(r["first_warm"]), ""))
        table.append((f"{name}: per key on the UI thread (no solve)", ms(r["key_ui"]), ""))
        table.append((f"{name}: solve in the worker", ms(r["solve"]), ""))
        table.append((f"{name}: key -> new answer on screen", ms(r["edit_answer"]),
                      "< 50 ms"))
        table.append((f"{name}:   processor time of it (both threads)",
                      ms(r["edit_answer_cpu"]), ""))
        table.append((f"{name}:   to Pilot's pause() returning (idle wait)",
                      ms(r["edit_answer_pilot"]), ""))
        table.append((f"{name}: results view redraw", ms(r["results_draw"]), ""))
        table.append((f"{name}: plots view redraw", ms(r["plots_draw"]), ""))
        print(*table[-8:], sep="\n", flush=True)
    w = max(len(t[0]) for t in table)
    for name, fig, target in table:
        print(f"{name:<{w}}  {fig:<32} {target}")
    (HERE / "results").mkdir(exist_ok=True)
    (HERE / "results" / "tui.json").write_text(json.dumps(out, indent=1), encoding="utf-8")


if __name__ == "__main__":
    main()
