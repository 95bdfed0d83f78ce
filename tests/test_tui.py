"""The text UI driven as a user would, with Pilot: type a job in, edit, save, reopen.

Reference values for the two-span shelf: AISC Manual Table 3-23, case 29 (continuous beam,
two equal spans, uniform load): end reactions 3wl/8, middle reaction 10wl/8 (from memory).
"""

from __future__ import annotations

import shutil
from pathlib import Path

import pytest


from tuipilot import _own_library, settle, sync  # noqa: E402,F401 (_own_library: autouse)
from shopbeam.tui.app import JobScreen, make_app  # noqa: E402
from shopbeam.tui.screens import (AnswerScreen, ConfirmScreen, ConflictScreen,  # noqa: E402
                                  LengthScreen, LibraryScreen)
from shopbeam.tui.widgets import Field  # noqa: E402

# a question takes answers only after this long on screen, and a letter only this long
# after the last key typed (one sooner is a word typed on)
READ = max(AnswerScreen.READ_TIME, AnswerScreen.WORD_GAP) + 0.05
ALONE = AnswerScreen.ALONE + 0.1  # a letter answers once no key has followed it this long

PRESETS = Path(__file__).resolve().parents[1] / "presets"
SIZE = (100, 32)


def job_screen(app) -> JobScreen:
    return app.job_screen


def field(app, view: str, key: str) -> Field:
    for f in job_screen(app).query_one(f"#{view}").query(Field):
        if f.key == key:
            return f
    raise LookupError(key)


def text_of(app, selector: str) -> str:
    return str(job_screen(app).query_one(selector).content)


def message_of(f: Field) -> str:
    return str(f.query_one(".field-msg").content)


async def type_into(pilot, app, view: str, key: str, text: str) -> None:
    """Replace a field's text (as a paste would: one change)."""
    f = field(app, view, key)
    f.input.focus()
    await pilot.pause()
    f.input.value = text
    await settle(pilot)


async def type_keys(pilot, app, view: str, key: str, text: str, clear: bool = True) -> None:
    """Type into a field key by key (cleared first unless clear=False)."""
    f = field(app, view, key)
    f.input.focus()
    if clear:
        f.input.value = ""
    else:
        f.input.cursor_position = len(f.input.value)
    await pilot.pause()
    await pilot.press(*[{" ": "space"}.get(c, c) for c in text])
    await settle(pilot)


async def goto(pilot, key: str) -> None:
    await pilot.press("escape", key)
    await settle(pilot)




@sync
async def test_start_shows_library_over_the_demo():
    app = make_app(cursor_blink=False)
    async with app.run_test(size=SIZE) as pilot:
        await settle(pilot)
        assert isinstance(app.screen, LibraryScreen)
        lst = app.screen.query_one("#lib-list")
        highlighted = app.screen.found[lst.highlighted]
        assert highlighted.name == "demo" and highlighted.origin == "bundled"
        await pilot.press("escape")
        await pilot.pause()
        assert isinstance(app.screen, JobScreen)
        assert app.job_screen.session.evaluation.ok
        assert "Screening check only" in str(app.screen.query_one("#banner").content)


@sync
async def test_two_span_shelf_from_scratch_reads_its_reactions():
    app = make_app(cursor_blink=False)
    async with app.run_test(size=SIZE) as pilot:
        await settle(pilot)
        await pilot.press("ctrl+n")  # new job from the library
        await pilot.pause()
        s = app.job_screen.session
        assert s.path is None and s.dirty
        await type_into(pilot, app, "job", "title", "Two-span shelf")
        await goto(pilot, "2")
        await type_into(pilot, app, "span", "beam.length", "10 ft")
        # a new length with supports placed along the beam: nothing moves and nothing pops
        # up; the line at the bottom says so until ctrl+l asks, told here to scale them
        # (the template's roller at 8 ft goes to the new end, 10 ft)
        await pilot.press("tab")
        await settle(pilot)
        assert not isinstance(app.screen, LengthScreen)
        assert "ctrl+l moves them" in text_of(app, "#summary")
        assert s.rows("supports")[1]["at"] == "8 ft"
        await pilot.press("ctrl+l")
        await settle(pilot)
        assert isinstance(app.screen, LengthScreen)
        await pilot.pause(READ)
        await pilot.press("s")
        await pilot.pause(ALONE)
        await settle(pilot)
        assert [r["at"] for r in s.rows("supports")] == ["0 ft", "10 ft"]
        # self-weight left out so the reactions are the entered load alone
        sw = [c for c in app.job_screen.query("#span Choice") if c.key == "beam.self_weight"][0]
        sw.focus()
        await pilot.press("right")
        await settle(pilot)
        # add a support from a field (ctrl+t), make it a roller and put it mid-span
        field(app, "span", "beam.members").input.focus()
        await pilot.press("ctrl+t")
        await settle(pilot)
        assert len(s.rows("supports")) == 3
        kind = [c for c in app.job_screen.query("#span Choice") if c.key == "support.type"][0]
        kind.focus()
        await pilot.press("r")
        await settle(pilot)
        await type_into(pilot, app, "span", "support.at", "5 ft")
        assert [r["type"] for r in s.rows("supports")] == ["pin", "roller", "roller"]
        # a new job has no loads nobody entered: add one and type it in
        await goto(pilot, "3")
        assert s.rows("loads") == []
        await pilot.press("ctrl+t")
        await settle(pilot)
        kind = [c for c in app.job_screen.query("#loads Choice") if c.key == "load.type"][0]
        kind.focus()
        await pilot.press("u")
        await settle(pilot)
        assert s.rows("loads")[0].get("value") is None  # nothing made up
        await type_into(pilot, app, "loads", "load.start", "0 ft")
        await type_into(pilot, app, "loads", "load.end", "10 ft")
        await type_into(pilot, app, "loads", "load.value", "-100 lbf/ft")
        await goto(pilot, "7")
        ev = s.evaluation
        assert ev.ok, ev.problems
        reactions = text_of(app, "#res-reactions")
        # w = 100 lbf/ft, l = 5 ft: ends 3wl/8 = 187.5 lbf, middle 10wl/8 = 625 lbf
        assert reactions.count("187.5 lbf") == 2
        assert "625 lbf" in reactions
        forces = sorted(round(r.force / 4.4482216152605, 3) for r in ev.result.solution.reactions)
        assert forces == [187.5, 187.5, 625.0]
        assert "PASS" in text_of(app, "#res-checks") or "FAIL" in text_of(app, "#res-checks")


@sync
async def test_editing_a_load_changes_the_moment_plot():
    app = make_app(PRESETS / "demo.toml", cursor_blink=False)
    async with app.run_test(size=SIZE) as pilot:
        await settle(pilot)
        await goto(pilot, "8")
        before = text_of(app, "#plot-moment")
        assert "max" in before and "min" in before
        await goto(pilot, "3")
        lst = app.job_screen.query_one("#load-list")
        lst.focus()
        lst.highlighted = 0  # the deck, a dead load over the whole beam (never patterned)
        await pilot.pause()
        assert field(app, "loads", "load.value").value == "-90 lbf/ft"
        await type_into(pilot, app, "loads", "load.value", "-900 lbf/ft")
        assert "down" in message_of(field(app, "loads", "load.value"))
        await goto(pilot, "8")
        after = text_of(app, "#plot-moment")
        assert after != before
        # ten times the deck over the overhang: the post's hogging moment grows most
        mins = [ln for ln in after.splitlines() if " min " in ln]
        assert mins and "at x = 12 ft" in mins[0]
        assert app.job_screen.session.dirty


@sync
async def test_bad_entry_shows_the_problem_beside_the_field_and_keeps_the_job():
    app = make_app(PRESETS / "demo.toml", cursor_blink=False)
    async with app.run_test(size=SIZE) as pilot:
        await settle(pilot)
        await goto(pilot, "2")
        await type_keys(pilot, app, "span", "beam.length", "12")
        f = field(app, "span", "beam.length")
        msg = message_of(f)
        assert msg.startswith("problem:") and "unit" in msg
        assert "problem" in text_of(app, "#summary")
        s = app.job_screen.session
        assert not s.evaluation.ok
        assert len(s.rows("loads")) == 4  # the rest of the job is still there
        await type_keys(pilot, app, "span", "beam.length", " ft", clear=False)
        assert message_of(f) == "= 12 ft"
        # leaving the field moves nothing; ctrl+l asks what happens to the positions
        assert s.rows("loads")[3]["at"] == "15 ft"
        await pilot.press("enter")
        await settle(pilot)
        assert not isinstance(app.screen, LengthScreen)
        assert s.rows("loads")[3]["at"] == "15 ft"
        await pilot.press("ctrl+l")
        await settle(pilot)
        assert isinstance(app.screen, LengthScreen)
        await pilot.pause(READ)
        await pilot.press("e")  # the ends stay at the ends
        await pilot.pause(ALONE)
        await settle(pilot)
        # what sat at the old end (15 ft: the stair load, the deck's end) went to the new
        # end; the post at 12 ft did not move
        loads = s.rows("loads")
        assert loads[3]["at"] == "12 ft" and loads[0]["end"] == "12 ft"
        assert [r["at"] for r in s.rows("supports")] == ["0 ft", "12 ft"]
        assert s.evaluation.ok
        # a position beyond the end is a problem named by its own row
        await type_into(pilot, app, "span", "support.at", "20 ft")
        msg = message_of(field(app, "span", "support.at"))
        assert msg.startswith("problem:") and "beyond the end" in msg


@sync
async def test_save_reopen_gives_the_identical_job(tmp_path):
    path = tmp_path / "shelf.toml"
    shutil.copy(PRESETS / "continuous-shelf.toml", path)
    app = make_app(path, cursor_blink=False)
    async with app.run_test(size=SIZE) as pilot:
        await settle(pilot)
        await type_into(pilot, app, "job", "title", "Shelf, bay 7")
        await goto(pilot, "2")
        await type_into(pilot, app, "span", "beam.length", "10 ft 6 in")
        s = app.job_screen.session
        assert s.dirty
        first = s.evaluation.result
        await pilot.press("ctrl+s")
        await pilot.pause()
        assert not s.dirty
        saved = path.read_text(encoding="utf-8")
        assert saved == s.doc.text()
        assert 'length = "10 ft 6 in"' in saved
    app2 = make_app(path, cursor_blink=False)
    async with app2.run_test(size=SIZE) as pilot:
        await settle(pilot)
        s2 = app2.job_screen.session
        assert s2.doc.text() == saved and not s2.dirty
        again = s2.evaluation.result
        assert again.job.title == "Shelf, bay 7"
        assert [round(r.force, 6) for r in again.solution.reactions] == \
            [round(r.force, 6) for r in first.solution.reactions]
        # comments of the original file survive the edit
        assert saved.splitlines()[0] == (PRESETS / "continuous-shelf.toml").read_text(
            encoding="utf-8").splitlines()[0]


@sync
async def test_save_conflict_shows_the_diff_and_can_overwrite(tmp_path):
    path = tmp_path / "arm.toml"
    shutil.copy(PRESETS / "lumber-rack-arm.toml", path)
    app = make_app(path, cursor_blink=False)
    async with app.run_test(size=SIZE) as pilot:
        await settle(pilot)
        await type_into(pilot, app, "job", "title", "Mine")
        path.write_text(path.read_text(encoding="utf-8").replace("title =", "# theirs\ntitle ="),
                        encoding="utf-8")
        await pilot.press("ctrl+s")
        await pilot.pause()
        assert isinstance(app.screen, ConflictScreen)
        assert "# theirs" in app.screen.conflict.diff
        await pilot.pause(READ)  # a key made sooner is not taken as the answer
        await pilot.press("o", "enter")  # overwriting asks for Enter after its letter
        await pilot.pause()
        assert isinstance(app.screen, JobScreen)
        assert 'title = "Mine"' in path.read_text(encoding="utf-8")


@sync
async def test_saving_a_bundled_preset_makes_a_user_copy(_own_library):
    app = make_app(PRESETS / "demo.toml", cursor_blink=False)
    async with app.run_test(size=SIZE) as pilot:
        await settle(pilot)
        await type_into(pilot, app, "job", "title", "Our loft beam")
        await pilot.press("ctrl+s")
        await pilot.pause()
        copy = _own_library / "demo.toml"
        assert copy.is_file() and 'title = "Our loft beam"' in copy.read_text(encoding="utf-8")
        assert app.job_screen.session.origin == "user"
        assert "Loft beam over the saw bay" in (PRESETS / "demo.toml").read_text(encoding="utf-8")


@sync
async def test_quit_with_unsaved_changes_asks_first():
    app = make_app(PRESETS / "demo.toml", cursor_blink=False)
    async with app.run_test(size=SIZE) as pilot:
        await settle(pilot)
        await type_into(pilot, app, "job", "title", "Changed")
        await pilot.press("ctrl+q")
        await pilot.pause()
        assert isinstance(app.screen, ConfirmScreen)
        await pilot.press("escape")
        await pilot.pause()
        assert isinstance(app.screen, JobScreen) and app.is_running
        await pilot.press("ctrl+q")
        await pilot.pause(READ)
        await pilot.press("d", "enter")  # discarding asks for Enter after its letter
        await pilot.pause()
    assert app.return_code == 0 or app.return_code is None


@sync
async def test_lifting_job_has_the_stronger_banner():
    app = make_app(PRESETS / "jib-arm.toml", cursor_blink=False)
    async with app.run_test(size=SIZE) as pilot:
        await settle(pilot)
        banner = app.job_screen.query_one("#banner")
        assert "LIFTING DEVICE" in str(banner.content)
        assert banner.has_class("-lifting")


@sync
async def test_calc_sheet_is_made_in_a_worker():
    app = make_app(PRESETS / "demo.toml", cursor_blink=False)
    async with app.run_test(size=SIZE) as pilot:
        await settle(pilot)
        await goto(pilot, "9")
        await app.workers.wait_for_complete()
        await pilot.pause()
        text = text_of(app, "#calc-body")
        assert "calc sheet" in text.lower()


@sync
async def test_a_job_past_the_calc_sheet_size_is_told_at_once_in_its_own_words(tmp_path):
    # 30 point loads on a 12-span rail: loads + 5 x supports past the sheet's limit
    # (limits.CALC_TERMS); the view says so at once, with no "takes a few seconds" first and
    # no class name or file prefix, and points to where the figures are
    lines = ['schema = 1', 'title = "long rail"', 'tags = ["not-rack"]', '[beam]',
             'length = "48 ft"', 'section = "HSS3x2x3/16"', 'material = "A500-C"']
    for x in range(0, 49, 4):
        lines += ['[[supports]]', f'at = "{x} ft"', f'type = "{"pin" if x == 0 else "roller"}"']
    for i in range(30):
        lines += ['[[loads]]', 'type = "point"', f'at = "{1 + 1.5 * i} ft"', 'value = "-20 lbf"']
    path = tmp_path / "long.toml"
    path.write_text("\n".join(lines) + "\n", encoding="utf-8")
    app = make_app(path, cursor_blink=False)
    async with app.run_test(size=(100, 40)) as pilot:
        await settle(pilot)
        await app.workers.wait_for_complete()
        await goto(pilot, "9")
        await pilot.pause()
        text = " ".join(text_of(app, "#calc-body").split())
        assert "No exact calc sheet for this job" in text and "more than 60" in text
        assert "few seconds (" in text  # the limit's own words, not the busy line
        assert "Working out" not in text and "InputError" not in text
        assert "long.toml" not in text and "The exact" not in text  # said once, in lower case
        # ctrl+r (write to a file) says why there is no sheet, not "wait for the sheet"
        await pilot.press("ctrl+r")
        await pilot.pause()
        said = [str(n.message) for n in app._notifications]
        assert any("No exact calc sheet" in m for m in said)
        assert not any("wait for the sheet" in m for m in said)


@sync
async def test_picking_a_catalog_section_from_type_ahead():
    app = make_app(PRESETS / "demo.toml", cursor_blink=False)
    async with app.run_test(size=SIZE) as pilot:
        await settle(pilot)
        await goto(pilot, "4")
        await type_into(pilot, app, "section", "section.designation", "W10x")
        lst = app.job_screen.query_one("#sec-matches")
        assert lst.option_count > 3
        lst.focus()
        lst.highlighted = 0
        await pilot.press("enter")
        await pilot.pause()
        s = app.job_screen.session
        des = s.doc.get("beam.section")
        assert des.upper().startswith("W10X")
        assert s.evaluation.ok and s.evaluation.job.section.designation.upper() == des.upper()


@sync
async def test_library_search_and_the_guard_on_opening_another_job():
    app = make_app(PRESETS / "demo.toml", cursor_blink=False)
    async with app.run_test(size=SIZE) as pilot:
        await settle(pilot)
        await type_into(pilot, app, "job", "title", "Edited demo")
        await pilot.press("ctrl+o")
        await pilot.pause()
        lib = app.screen
        assert isinstance(lib, LibraryScreen)
        every = len(lib.found)
        lib.query_one("#lib-list").focus()
        await pilot.press("l", "i", "f", "t", "i", "n", "g")  # typing on the list searches
        await pilot.pause()
        assert 0 < len(lib.found) < every
        assert all("lifting" in (e.title + " ".join(e.tags) + e.text).lower() for e in lib.found)
        names = [e.name for e in lib.found]
        lst = lib.query_one("#lib-list")
        lst.focus()
        lst.highlighted = names.index("jib-arm")
        await pilot.press("enter")
        await pilot.pause()
        assert isinstance(app.screen, ConfirmScreen)  # unsaved changes: asked first
        await pilot.pause(READ)
        await pilot.press("d", "enter")
        await pilot.pause()
        s = app.job_screen.session
        assert s.name == "jib-arm" and not s.dirty
        assert "LIFTING DEVICE" in str(app.job_screen.query_one("#banner").content)


@sync
async def test_area_load_with_a_tributary_width_typed_in_the_loads_form():
    # worked by hand: 50 psf over a 16 in wide strip is 66.67 lbf/ft; on the demo's first
    # load row (0 to 15 ft, pin at 0, roller at 12 ft) the row's total is 66.67 x 15 = 1000 lbf
    app = make_app(PRESETS / "demo.toml", cursor_blink=False)
    async with app.run_test(size=SIZE) as pilot:
        await settle(pilot)
        await goto(pilot, "3")
        s = app.job_screen.session
        before = sum(r.force for r in s.evaluation.result.solution.reactions)
        old_w = -90 * 15  # the row as shipped: -90 lbf/ft over 15 ft
        await type_into(pilot, app, "loads", "load.value", "-50 psf")
        # without a width the job is refused, and the width field says why
        assert not s.evaluation.ok
        assert "width" in message_of(field(app, "loads", "load.width"))
        await type_into(pilot, app, "loads", "load.width", "16 in")
        assert s.evaluation.ok, s.evaluation.problems
        assert "16 in" in message_of(field(app, "loads", "load.width"))
        after = sum(r.force for r in s.evaluation.result.solution.reactions)
        assert (after - before) / 4.4482216152605 == pytest.approx(-(-1000 - old_w), rel=1e-9)
        assert 'width = "16 in"' in s.doc.text()  # plain in the job file too


@sync
async def test_plots_of_a_patterned_job_draw_the_governing_pattern():
    app = make_app(PRESETS / "continuous-shelf.toml", cursor_blink=False)
    async with app.run_test(size=SIZE) as pilot:
        await settle(pilot)
        await goto(pilot, "8")
        head = text_of(app, "#plot-problems")
        assert "Diagrams of the load state that governs" in head
        # the two one-bay patterns are mirror images: either may be the one named
        assert ("patterned loads on span 5 ft-10 ft" in head) != (
            "patterned loads on span 0 ft-5 ft" in head)
        lo, hi = (5.0, 10.0) if "span 5 ft-10 ft" in head else (0.0, 5.0)
        # one bay loaded: the deflection plot's largest sag is in that bay
        defl = text_of(app, "#plot-deflection")
        mins = [ln for ln in defl.splitlines() if " min " in ln]
        at = float(mins[0].split("at x = ")[1].split()[0])
        assert lo < at < hi


@sync
async def test_esc_then_digit_typed_fast_in_a_field_changes_view_and_types_nothing():
    # over SSH and in tmux, Esc followed at once by 7 arrives as one key, the Option-layer
    # character of 7 (pilcrow sign): in a field of numbers and units it must not land in the
    # field (in a free-text field it is a character: see test_tui_keep)
    app = make_app(PRESETS / "demo.toml", cursor_blink=False)
    async with app.run_test(size=SIZE) as pilot:
        await settle(pilot)
        await pilot.press("f3")
        await settle(pilot)
        length = field(app, "span", "beam.length")
        before = length.value
        length.input.focus()
        await pilot.pause()
        await pilot.press("pilcrow_sign")
        await pilot.pause()
        assert app.job_screen.current == "results"
        assert field(app, "span", "beam.length").value == before


@sync
async def test_a_sizing_sweep_that_ends_while_typing_elsewhere_leaves_the_focus_there(
        monkeypatch):
    # the sweep runs in a worker (slowed here so it ends while the user is typing in
    # another view); an Enter there must not pick a section from the hidden sizing list
    import time

    from shopbeam.tui import slow
    real = slow.size_rows

    def slowly(*args, **kwargs):
        time.sleep(0.6)
        return real(*args, **kwargs)

    monkeypatch.setattr(slow, "size_rows", slowly)
    app = make_app(PRESETS / "demo.toml", cursor_blink=False)
    async with app.run_test(size=(80, 24)) as pilot:
        await settle(pilot)
        await pilot.press("escape", "s", "r")  # sizing view, run the sweep
        await pilot.press("6")  # criteria, while it runs
        f = field(app, "criteria", "criteria.deflection")
        f.input.focus()
        await settle(pilot)  # the sweep has ended
        await app.workers.wait_for_complete()
        await pilot.pause()
        assert app.focused is f.input
        before = job_screen(app).session.doc.get("beam.section")
        await pilot.press("enter")
        await settle(pilot)
        assert job_screen(app).session.doc.get("beam.section") == before



@sync
async def test_key_line_keeps_its_order_as_the_focus_moves(tmp_path):
    # a text field's own ctrl+d (delete right) and ctrl+x (cut) put those keys first in the
    # key line while it had the focus: the same keys swapped places from frame to frame
    from textual.widgets._footer import FooterKey

    path = tmp_path / "demo.toml"
    shutil.copy(PRESETS / "demo.toml", path)
    app = make_app(path, cursor_blink=False)

    def line():
        return [k.key for k in app.screen.query(FooterKey)]

    async with app.run_test(size=(80, 24)) as pilot:
        await settle(pilot)
        for view, want in (("1", ["ctrl+s", "ctrl+d", "ctrl+o", "f1", "ctrl+q"]),
                           ("3", ["ctrl+t", "ctrl+x", "ctrl+s", "ctrl+d", "ctrl+o", "f1",
                                  "ctrl+q"])):
            await pilot.press("escape", view)
            await settle(pilot)
            assert line() == want
            seen = set()
            for _ in range(6):  # through the list, the choices and the text fields
                await pilot.press("tab")
                await settle(pilot)
                seen.add(type(app.focused).__name__)
                assert line() == want, (type(app.focused).__name__, line())
            assert "FieldInput" in seen
        # the library keeps its order too, as it did
        await pilot.press("ctrl+o")
        await settle(pilot)
        first = line()
        await pilot.press("tab")
        await settle(pilot)
        assert line() == first and first


@sync
async def test_after_esc_the_row_keys_work_and_tab_picks_the_first_field(tmp_path):
    # esc leaves the field: ctrl+t then did nothing (the view's own keys need something in
    # it focused), and the first Tab picked the view itself, where typing goes nowhere
    from shopbeam.tui.widgets import FieldInput

    path = tmp_path / "demo.toml"
    shutil.copy(PRESETS / "demo.toml", path)
    app = make_app(path, cursor_blink=False)
    async with app.run_test(size=(80, 24)) as pilot:
        await settle(pilot)
        await pilot.press("escape", "3")
        await settle(pilot)
        s = app.job_screen.session
        n = len(s.doc.get("loads"))
        await pilot.press("escape")
        await settle(pilot)
        assert app.focused is None
        await pilot.press("ctrl+t")
        await settle(pilot)
        assert len(s.doc.get("loads")) == n + 1
        await pilot.press("escape", "1")
        await settle(pilot)
        await pilot.press("escape", "tab")
        await settle(pilot)
        assert app.focused is not None and not isinstance(app.focused, type(
            app.job_screen.query_one("#job"))), type(app.focused).__name__
