"""Keys typed at any speed give the same job as keys typed slowly.

A terminal delivers keys typed fast (key repeat, a paste, tmux send-keys, or keys queued
while the screen was busy) as one burst. These tests feed the bytes a terminal would send
through Textual's own terminal parser and hand every key to the app at once, with no pause
between them, and compare the job with the same bytes typed one key at a time with a pause
after each; then again with a solver slowed down to 0.25 s a solve.
"""

from __future__ import annotations

import os
import shutil
import subprocess
import sys
import time
from pathlib import Path

import pytest


from textual._xterm_parser import XTermParser  # noqa: E402

from shopbeam.tui import session as session_mod  # noqa: E402
from tuipilot import _own_library, settle, sync  # noqa: E402,F401 (_own_library: autouse)
from shopbeam.tui.app import make_app  # noqa: E402
from shopbeam.tui.widgets import Field  # noqa: E402

PRESETS = Path(__file__).resolve().parents[1] / "presets"
SIZE = (80, 24)
BS = "\x7f"  # backspace as a terminal sends it
HOME, END, DELETE, LEFT = "\x1b[H", "\x1b[F", "\x1b[3~", "\x1b[D"
CTRL_U = "\x15"  # clear the field up to the cursor
TAB, SHIFT_TAB = "\t", "\x1b[Z"


@pytest.fixture
def slow_solver(monkeypatch):
    real = session_mod.evaluate_data

    def slow(*args, **kwargs):
        time.sleep(0.25)
        return real(*args, **kwargs)

    monkeypatch.setattr(session_mod, "evaluate_data", slow)


def events_of(data: str):
    parser = XTermParser()
    return [e for e in list(parser.feed(data)) + list(parser.feed("")) if hasattr(e, "key")]




async def send(pilot, data: str, fast: bool) -> None:
    """Type `data` (terminal bytes): all at once, or one key at a time with pauses."""
    app = pilot.app
    for event in events_of(data):
        app._driver.send_message(event)
        if not fast:
            await settle(pilot)
    await settle(pilot)


def field(app, view: str, key: str) -> Field:
    return next(f for f in app.job_screen.query_one(f"#{view}").query(Field) if f.key == key)


async def typed_job(preset: str, view_key: str, start: tuple, data: str,
                    fast: bool) -> tuple[str, object]:
    """Open a preset, go to a view (and a row of its list: start[2]), put the cursor at the
    end of one field, type `data`; return the job text and the last evaluation."""
    app = make_app(PRESETS / f"{preset}.toml", cursor_blink=False)
    async with app.run_test(size=SIZE) as pilot:
        await settle(pilot)
        await pilot.press("escape", view_key)
        await settle(pilot)
        if len(start) > 2:
            lst = app.job_screen.query_one(f"#{start[0]}").query_one("RowList")
            lst.focus()
            lst.highlighted = start[2]
            await settle(pilot)
        f = field(app, *start[:2])
        f.input.focus()
        await settle(pilot)
        f.input.cursor_position = len(f.input.value)
        await send(pilot, data, fast)
        s = app.job_screen.session
        assert not s.stale
        return s.doc.text(), s.evaluation


CASES = {
    # the report: Value of the shelf's load cleared at key-repeat speed, then "-250 psf"
    "minus-250-psf": ("continuous-shelf", "3", ("loads", "load.value"),
                      BS * 12 + "-250 psf", {"value": "-250 psf"}),
    "length-12-ft": ("demo", "2", ("span", "beam.length"), BS * 8 + "12 ft",
                     {"length": "12 ft"}),
    "cursor-keys": ("continuous-shelf", "3", ("loads", "load.value"),
                    HOME + DELETE * 4 + "-250" + END + LEFT * 2 + BS + "p" + END,
                    {"value": "-250 psf"}),
    "tab-between-fields": ("demo", "3", ("loads", "load.start"),
                           CTRL_U + "1 ft\t" + CTRL_U + "9 ft\t" + CTRL_U + "-80 lbf/ft",
                           {"start": "1 ft", "end": "9 ft", "value": "-80 lbf/ft"}),
    # the less common keys: bracing and bearing, typed and tabbed between
    "braces-then-bearing": ("demo", "2", ("span", "beam.braces"),
                            CTRL_U + "4 ft, 8 ft\t" + CTRL_U + "3-1/2 in",
                            {"braces": ["4 ft", "8 ft"], "bearing": "3-1/2 in"}),
    "support-bearing": ("demo", "2", ("span", "support.bearing", 1),
                        CTRL_U + "4 in" + BS * 4 + "5-1/2 in", {"bearing": "5-1/2 in"}),
    "point-load-bearing": ("demo", "3", ("loads", "load.bearing", 3),
                           "6" + BS + "-6 in" + HOME + DELETE, {"bearing": "6 in"}),
    "live-deflection": ("demo", "6", ("criteria", "criteria.live_deflection"),
                        CTRL_U + "L/360", {"live_deflection": "L/360"}),
    # a field entered by Tab has its text selected: the next key replaces it, typed fast
    # or slowly alike (backspace clears it all, a character replaces it)
    "tab-back-into-a-filled-field": ("demo", "6", ("criteria", "criteria.deflection"),
                                     TAB + "L/360" + SHIFT_TAB + BS + "L/480" + TAB + "L/400",
                                     {"deflection": "L/480", "live_deflection": "L/400"}),
    "impact": ("demo", "6", ("criteria", "criteria.impact"), CTRL_U + "-25%" + HOME + DELETE,
               {"impact": "25%"}),
}


def _assert_has(text: str, expected: dict) -> None:
    for k, v in expected.items():
        want = ("[" + ", ".join(f'"{x}"' for x in v) + "]") if isinstance(v, list) else f'"{v}"'
        assert f"{k} = {want}" in text, (k, v, text)


@pytest.mark.parametrize("case", list(CASES))
@sync
async def test_fast_typing_gives_the_job_slow_typing_gives(case):
    preset, view_key, start, data, expected = CASES[case]
    slow_text, _ = await typed_job(preset, view_key, start, data, fast=False)
    fast_text, _ = await typed_job(preset, view_key, start, data, fast=True)
    _assert_has(slow_text, expected)
    assert fast_text == slow_text


@pytest.mark.parametrize("case", ["minus-250-psf", "tab-between-fields",
                                  "tab-back-into-a-filled-field",
                                  "braces-then-bearing", "support-bearing",
                                  "point-load-bearing", "impact"])
@sync
async def test_fast_typing_with_a_slow_solver(case, slow_solver):
    preset, view_key, start, data, expected = CASES[case]
    fast_text, ev = await typed_job(preset, view_key, start, data, fast=True)
    _assert_has(fast_text, expected)
    assert ev.ok


@sync
async def test_minus_250_psf_pushes_down_after_a_fast_burst(slow_solver):
    text, ev = await typed_job("continuous-shelf", "3", ("loads", "load.value"),
                               BS * 12 + "-250 psf", fast=True)
    # 250 psf over the 18 in shelf depth = 375 lbf/ft, downward (negative: forces + up)
    load = ev.job.loads[0]
    assert load.w1 == load.w2 == pytest.approx(-375 * 4.4482216152605 / 0.3048, rel=1e-9)


@sync
async def test_a_field_with_focus_is_never_rewritten_by_a_late_solve(slow_solver):
    app = make_app(PRESETS / "demo.toml", cursor_blink=False)
    async with app.run_test(size=SIZE) as pilot:
        await settle(pilot)
        await pilot.press("escape", "2")
        await settle(pilot)
        f = field(app, "span", "beam.length")
        f.input.focus()
        await settle(pilot)
        f.input.cursor_position = len(f.input.value)
        # type, and while the slow solve of the first key runs, keep typing
        for data in (BS * 8, "1", "2", " f", "t"):
            for event in events_of(data):
                app._driver.send_message(event)
            await pilot.pause(0.05)
        assert f.value == "12 ft"
        await settle(pilot)
        assert f.value == "12 ft"
        assert app.job_screen.session.doc.get("beam.length") == "12 ft"


F4, DOWN, CTRL_S = "\x1bOS", "\x1b[B", "\x13"
# from the start of the job: the loads view (F4), down the list to the point load, Tab to
# its Bearing, type it, Tab to Flange, "b" for bottom, save: one burst
POINT_LOAD_BURST = F4 + TAB + DOWN * 3 + TAB * 7 + "6 in" + TAB + "b" + CTRL_S


async def saved_after(path: Path, data: str, fast: bool) -> str:
    app = make_app(path, cursor_blink=False)
    async with app.run_test(size=SIZE) as pilot:
        await settle(pilot)
        await send(pilot, data, fast)
    return path.read_text(encoding="utf-8")


@pytest.mark.parametrize("slow", [False, True], ids=["solver", "slow-solver"])
@sync
async def test_a_row_picked_then_tab_and_a_choice_then_save_at_full_speed(tmp_path, slow,
                                                                          monkeypatch):
    """Down in the list then Tab lands in the picked row's fields; a choice's letter then
    ctrl+s saves the choice: typed as one burst or key by key, the same file."""
    if slow:
        real = session_mod.evaluate_data
        monkeypatch.setattr(session_mod, "evaluate_data",
                            lambda *a, **k: (time.sleep(0.25), real(*a, **k))[1])
    texts = []
    for fast in (False, True):
        job = tmp_path / f"demo-{fast}.toml"
        shutil.copy(PRESETS / "demo.toml", job)
        texts.append(await saved_after(job, POINT_LOAD_BURST, fast))
    original = (PRESETS / "demo.toml").read_text(encoding="utf-8")
    slow_text, fast_text = texts
    assert fast_text == slow_text
    # exactly two lines more, both in the point load (the last table of the file)
    added = [ln for ln in fast_text.splitlines() if ln not in original.splitlines()]
    assert added == ['bearing = "6 in"', 'flange = "bottom"'], added
    assert 'label = "stair"\npatterned = true' in fast_text  # the stair's own table
    assert 'lifts the span\nbearing = "6 in"\nflange = "bottom"\n' in fast_text


# ---------------------------------------------------------------------- a real terminal

TMUX = shutil.which("tmux")


def _tmux(*args: str) -> str:
    return subprocess.run([TMUX, *args], check=True, capture_output=True, text=True).stdout


def _wait_for(pred, timeout: float = 30.0) -> bool:
    end = time.monotonic() + timeout
    while time.monotonic() < end:
        if pred():
            return True
        time.sleep(0.2)
    return False


@pytest.mark.skipif(TMUX is None, reason="tmux is not installed")
def test_tmux_keys_sent_at_full_speed_reach_the_saved_job(tmp_path):
    job = tmp_path / "shelf.toml"
    shutil.copy(PRESETS / "continuous-shelf.toml", job)
    sock = str(tmp_path / "tmux.sock")
    env = dict(os.environ, SHOPBEAM_USER_DIR=str(tmp_path / "user"), TERM="xterm-256color")
    env.pop("SHOPBEAM_LIBRARY", None)
    cmd = f"{sys.executable} -m shopbeam ui {job}"
    subprocess.run([TMUX, "-S", sock, "-f", os.devnull, "new-session", "-d", "-x", "80",
                    "-y", "24", cmd], check=True, env=env)
    try:
        def screen() -> str:
            return _tmux("-S", sock, "capture-pane", "-p")

        assert _wait_for(lambda: "Screening check" in screen()), screen()
        # to the loads view (F4, from anywhere), through the list, the type, start and end
        # to the first load's Value, cleared at key-repeat speed, retyped, saved: one burst
        original = job.read_text(encoding="utf-8")
        _tmux("-S", sock, "send-keys", "-t", "0", "F4", "Tab", "Tab", "Tab", "Tab", "Tab",
              "End", *(["BSpace"] * 12), "-250 psf", "C-s")
        assert _wait_for(lambda: job.read_text(encoding="utf-8") != original), screen()
        saved = job.read_text(encoding="utf-8")
        assert 'value = "-250 psf"' in saved, saved
        assert saved.replace('"-250 psf"', '"-100 psf"') == original
    finally:
        subprocess.run([TMUX, "-S", sock, "kill-server"], capture_output=True)


@pytest.mark.skipif(TMUX is None, reason="tmux is not installed")
def test_tmux_a_row_picked_and_a_choice_at_full_speed_reach_the_saved_job(tmp_path):
    job = tmp_path / "demo.toml"
    shutil.copy(PRESETS / "demo.toml", job)
    original = job.read_text(encoding="utf-8")
    sock = str(tmp_path / "tmux.sock")
    env = dict(os.environ, SHOPBEAM_USER_DIR=str(tmp_path / "user"), TERM="xterm-256color")
    env.pop("SHOPBEAM_LIBRARY", None)
    cmd = f"{sys.executable} -m shopbeam ui {job}"
    subprocess.run([TMUX, "-S", sock, "-f", os.devnull, "new-session", "-d", "-x", "80",
                    "-y", "24", cmd], check=True, env=env)
    try:
        def screen() -> str:
            return _tmux("-S", sock, "capture-pane", "-p")

        assert _wait_for(lambda: "Screening check" in screen()), screen()
        _tmux("-S", sock, "send-keys", "-t", "0", "F4", "Tab", "Down", "Down", "Down",
              *(["Tab"] * 7), "6 in", "Tab", "b", "C-s")
        assert _wait_for(lambda: job.read_text(encoding="utf-8") != original), screen()
        saved = job.read_text(encoding="utf-8")
        added = [ln for ln in saved.splitlines() if ln not in original.splitlines()]
        assert added == ['bearing = "6 in"', 'flange = "bottom"'], saved
    finally:
        subprocess.run([TMUX, "-S", sock, "kill-server"], capture_output=True)


# ---------------------------------------------------------------------- sheets to file / printer

@sync
async def test_rating_label_is_written_beside_the_job_and_printed(tmp_path, monkeypatch):
    job = tmp_path / "shelf.toml"
    shutil.copy(PRESETS / "continuous-shelf.toml", job)
    printed = tmp_path / "printed.txt"
    printer = tmp_path / "fakelp"
    printer.write_text(f"#!/bin/sh\ncat > {printed}\n", encoding="utf-8")
    printer.chmod(0o755)
    monkeypatch.setenv("SHOPBEAM_PRINT", str(printer))
    app = make_app(job, cursor_blink=False)
    async with app.run_test(size=SIZE) as pilot:
        await settle(pilot)
        await pilot.press("f11")  # the rating view, from anywhere
        await settle(pilot)
        await pilot.press("ctrl+r")
        await settle(pilot)
        out = tmp_path / "shelf-rating.txt"
        assert out.is_file()
        text = out.read_text(encoding="utf-8")
        assert "RATING LABEL" in text and "Screening check only" in text
        # at a printed page's width (78 columns, as `shopbeam capacity` writes), not the
        # 76 columns the view has at 80x24
        from shopbeam.jobs.jobfile import load_job
        from shopbeam.tui.slow import rating_text

        paper = rating_text(load_job(job), date=getattr(app, "label_date", None),
                            page_width=78)
        assert text == paper.rstrip("\n") + "\n"
        assert rating_text(load_job(job), date=getattr(app, "label_date", None),
                           page_width=76) != paper
        await pilot.press("ctrl+r")  # never over the first file
        await settle(pilot)
        assert (tmp_path / "shelf-rating-2.txt").read_text(encoding="utf-8") == text
        await pilot.press("ctrl+p")
        await settle(pilot)
        assert printed.read_text(encoding="utf-8") == text


@sync
async def test_a_missing_printer_command_says_what_to_do(tmp_path, monkeypatch):
    monkeypatch.setenv("SHOPBEAM_PRINT", "no-such-printer-command-here")
    app = make_app(PRESETS / "demo.toml", cursor_blink=False)
    async with app.run_test(size=SIZE) as pilot:
        await settle(pilot)
        await pilot.press("f11")
        await settle(pilot)
        await pilot.press("ctrl+p")
        await settle(pilot)
        notes = [str(n.message) for n in app._notifications]
        assert any("no-such-printer-command-here" in n and "SHOPBEAM_PRINT" in n
                   for n in notes), notes


@sync
async def test_a_save_right_after_typing_does_not_quote_the_old_answer(tmp_path, slow_solver):
    # the answer shown is for the text before the last keys (a solve is on its way): the save
    # message must not count that old answer's problems as the saved job's
    job = tmp_path / "demo.toml"
    shutil.copy(PRESETS / "demo.toml", job)
    app = make_app(job, cursor_blink=False)
    async with app.run_test(size=SIZE) as pilot:
        await settle(pilot)
        await pilot.press("f2")
        await settle(pilot)
        await send(pilot, TAB, fast=True)
        await settle(pilot)
        assert getattr(app.focused, "value", None) == app.job_screen.session.doc.get("title"), app.focused
        await send(pilot, END + CTRL_U, fast=True)  # an empty title: a problem
        await settle(pilot)
        assert app.job_screen.session.evaluation.errors
        await send(pilot, "Rack beam" + "\x13", fast=True)  # the fix, then ctrl+s at once
        await pilot.pause()
        notes = [str(n.message) for n in app._notifications if "Saved" in str(n.message)]
        assert notes and not any("still has" in n for n in notes), notes
        await settle(pilot)
    assert 'title = "Rack beam"' in job.read_text(encoding="utf-8")


CTRL_T, CTRL_X = "\x14", "\x18"


@pytest.mark.parametrize("fast", [True, False])
@sync
async def test_keys_right_behind_ctrl_x_never_edit_the_neighbouring_row(fast):
    # a point load added (ctrl+t), typed into, removed (ctrl+x), and more keys behind it:
    # the field would now show the row before it (the stair at 15 ft), which must not change
    app = make_app(PRESETS / "demo.toml", cursor_blink=False)
    async with app.run_test(size=SIZE) as pilot:
        await settle(pilot)
        await pilot.press("escape", "3")
        await settle(pilot)
        before = app.job_screen.session.doc.text()
        await send(pilot, CTRL_T + "3 ft 7 in" + CTRL_X + "abc", fast)
        s = app.job_screen.session
        assert s.doc.text() == before  # the added row is gone; no other row changed
        assert 'at = "15 ft"' in s.doc.text() and "abc" not in s.doc.text()


def test_the_save_notice_names_a_file_opened_by_a_relative_path_once(tmp_path, monkeypatch):
    from shopbeam.tui.app import _same_file

    monkeypatch.chdir(tmp_path)
    (tmp_path / "jobs").mkdir()
    where = str((tmp_path / "jobs" / "rack.toml").resolve())
    assert _same_file("jobs/rack.toml", where)  # "Saved jobs/rack.toml to /.../rack.toml"
    assert not _same_file("jobs/other.toml", where)
    assert not _same_file("shop:rack", where)  # a library name is worth saying


@sync
async def test_lifting_caution_stays_on_while_lifting_is_typed_into_the_tags():
    # typed a key at a time, ", lift" reads like a lifting device (the caution comes on), and
    # "lifting" is one: "lifti" and "liftin" between them must not put it out for two keys
    # (every row of the screen moved up and back down under the user's eyes)
    app = make_app(PRESETS / "demo.toml", cursor_blink=False)
    async with app.run_test(size=SIZE) as pilot:
        await settle(pilot)
        await pilot.press("escape", "1")
        await settle(pilot)
        f = field(app, "job", "tags")
        f.input.focus()
        await settle(pilot)
        f.input.cursor_position = len(f.input.value)
        banner = app.job_screen.query_one("#banner")
        shown = []
        for ch in ", lifting":
            await send(pilot, ch, fast=False)
            shown.append("LIFTING" in str(banner.content))
        assert shown == [False, False, False, False, False, True, True, True, True], shown
        assert app.job_screen.session.evaluation.job.lifting
