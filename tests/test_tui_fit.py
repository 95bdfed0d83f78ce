"""Every view fits the terminal with nothing cut, and a resize lays it out again."""

from __future__ import annotations

import datetime as _dt
from pathlib import Path

import pytest

from tuipilot import _own_library, settle, sync  # noqa: E402,F401 (_own_library: autouse)
from shopbeam.tui.app import make_app  # noqa: E402
from shopbeam.tui import drawing  # noqa: E402

PRESETS = Path(__file__).resolve().parents[1] / "presets"


def text(app, selector: str) -> str:
    return str(app.job_screen.query_one(selector).render())


def widest(s: str) -> int:
    return max((len(line) for line in s.splitlines()), default=0)


@sync
async def test_a_resize_lays_the_results_out_again():
    app = make_app(PRESETS / "demo.toml", cursor_blink=False)
    async with app.run_test(size=(100, 32)) as pilot:
        await settle(pilot)
        await pilot.press("f8")  # results
        await settle(pilot)
        view = app.job_screen.query_one("#results")
        wide = text(app, "#res-elevation")
        assert widest(wide) <= view.content_region.width
        await pilot.resize_terminal(80, 24)
        await settle(pilot)
        narrow = text(app, "#res-elevation")
        assert widest(narrow) < widest(wide)  # drawn again for the new width
        assert widest(narrow) <= view.content_region.width
        # the load labels are all there, whole, at either width
        for label in ("stair", "deck", "stock", "pipe offcuts"):
            assert label in wide and label in narrow
        bar = str(app.job_screen.query_one("#titlebar").render())
        assert widest(bar) <= 78 and "read-only preset" in bar
        await pilot.resize_terminal(100, 32)
        await settle(pilot)
        assert text(app, "#res-elevation") == wide


@sync
async def test_the_summary_of_a_failing_job_fits_80_columns():
    app = make_app(PRESETS / "demo.toml", cursor_blink=False)
    async with app.run_test(size=(80, 24)) as pilot:
        await settle(pilot)
        s = app.job_screen.session
        # a much lighter section: several checks fail, the verdict line would be long
        s.set("beam.section", "W4x13")
        app.job_screen.changed()
        await settle(pilot)
        r = s.evaluation.result
        assert r is not None and not r.ok
        summary = str(app.job_screen.query_one("#summary").render())
        assert widest(summary) <= 78, summary
        assert summary.startswith("FAILS")
        assert "reactions: R@0 ft" in summary
        fails = [c.name for c in r.checks if not c.ok]
        assert fails[0] in summary


def test_summary_names_fewer_items_and_says_how_many_more():
    from shopbeam.jobs.jobfile import parse_job_text
    from shopbeam.design.analysis import analyze

    text_ = (PRESETS / "continuous-shelf.toml").read_text()
    r = analyze(parse_job_text(text_))
    full = drawing.summary_line(r)
    short = drawing.summary_line(r, 40)
    n = len(r.solution.reactions)
    assert len(full.splitlines()[1]) > 40 and full.splitlines()[1].count("R@") == n
    line = short.splitlines()[1]
    assert len(line) <= 40
    shown = line.count("R@")
    assert 0 < shown < n and f"+{n - shown} more" in line


def test_a_load_label_with_no_room_beside_its_bar_gets_a_line_of_its_own():
    from shopbeam.jobs.jobfile import parse_job_text

    job = parse_job_text((PRESETS / "demo.toml").read_text())
    pic = drawing.elevation(job, 74)
    assert widest(pic) <= 74
    assert "0 lbf/ft to -200 lbf/ft pipe offcuts" in pic


def _ink(s: str) -> str:
    """The words of a page, however wrapped: whitespace, rule lines ("====") and the "!!"
    that starts each line of a caution left out."""
    words = []
    for line in s.splitlines():
        body = line.strip()
        if body and len(set(body)) == 1:
            continue
        words += [w for w in body.split() if w != "!!"]
    return "".join(words)


@sync
async def test_calc_sheet_and_rating_fit_80x24_with_nothing_cut():
    from shopbeam.jobs.jobfile import load_job
    from shopbeam.output.calcsheet import calc_sheet
    from shopbeam.tui.slow import rating_text

    # the trolley has the longest title and a lifting caution; the demo is the first job seen
    for name in ("demo", "monorail-trolley"):
        job = load_job(PRESETS / f"{name}.toml")
        app = make_app(PRESETS / f"{name}.toml", cursor_blink=False, label_date=_dt.date(2026, 1, 1))
        async with app.run_test(size=(80, 24)) as pilot:
            await settle(pilot)
            for key, body_id, whole in (
                    ("f10", "#calc-body", calc_sheet(job)),
                    ("f11", "#rating-body", rating_text(job, date=_dt.date(2026, 1, 1)))):
                await pilot.press(key)
                await settle(pilot)
                body = app.job_screen.query_one(body_id)
                shown = str(body.render())
                room = body.size.width
                assert 60 <= room <= 78
                too_wide = [ln for ln in shown.splitlines() if len(ln) > room]
                assert not too_wide, (name, key, room, too_wide)
                # drawn as one screen line per text line: nothing wrapped by the screen
                assert body.size.height == len(shown.split("\n"))
                # every word of the page is there (only the line breaks moved)
                assert _ink(shown) == _ink(whole), (name, key)


@sync
async def test_calc_sheet_follows_a_resize():
    app = make_app(PRESETS / "demo.toml", cursor_blink=False)
    async with app.run_test(size=(120, 32)) as pilot:
        await settle(pilot)
        await pilot.press("f10")
        await settle(pilot)
        body = app.job_screen.query_one("#calc-body")
        wide = str(body.render())
        assert widest(wide) == 78  # a printed page's width when the view has room
        await pilot.resize_terminal(60, 24)
        await settle(pilot)
        narrow = str(body.render())
        assert widest(narrow) <= body.size.width < 78
        assert _ink(narrow) == _ink(wide)
        await pilot.resize_terminal(120, 32)
        await settle(pilot)
        assert str(body.render()) == wide


@sync
async def test_a_long_choice_shows_every_option_at_80x24():
    from shopbeam.jobs.rules import LIFTING_PROFILES
    from shopbeam.tui.widgets import Choice

    app = make_app(PRESETS / "monorail-trolley.toml", cursor_blink=False)
    async with app.run_test(size=(80, 24)) as pilot:
        await settle(pilot)
        await pilot.press("f7")  # criteria
        await settle(pilot)
        choice = next(c for c in app.job_screen.query(Choice) if c.key == "criteria.lifting")
        choice.focus()
        await settle(pilot)
        shown = str(choice.render())
        lines = shown.splitlines()
        # too many for one line: they go on two, all in sight, none wider than the field
        assert len(lines) >= 3  # options on two lines, and the reading under them
        assert widest(shown) <= choice.size.width
        assert choice.size.height == len(lines)
        for opt in ["none", *LIFTING_PROFILES]:
            assert opt in shown, opt
        assert f"[{choice.value}]" in shown
        before = choice.value
        await pilot.press("right")
        await settle(pilot)
        opts = choice.options
        assert choice.value == opts[(opts.index(before) + 1) % len(opts)]
        assert f"[{choice.value}]" in str(choice.render())
        assert app.job_screen.session.doc.get("criteria.lifting") == choice.value


def test_a_choice_too_narrow_for_one_option_a_line_shows_the_chosen_one():
    from shopbeam.tui.widgets import Choice

    c = Choice("Lifting", ["none", "hand-geared-monorail"], key="k")
    assert "[none]" in str(c._render_choice(80)) and "hand-geared-monorail" in \
        str(c._render_choice(80))
    narrow = str(c._render_choice(30))
    assert "< [none] >" in narrow and "1 of 2" in narrow


@pytest.mark.parametrize("width", [78, 60, 40])
def test_the_summary_in_sight_while_typing_keeps_not_rated_at_any_width(width):
    # the trailer preset passes every check but its fatigue under road loads is not checked:
    # the one line in sight in the form views must say NOT RATED, shortened, never dropped
    from shopbeam.design.analysis import analyze
    from shopbeam.jobs.jobfile import parse_job_text

    r = analyze(parse_job_text((PRESETS / "trailer-cross-member.toml").read_text()))
    assert r.ok and r.blocking  # the case: passes, not rated
    verdict = drawing.summary_line(r, width).splitlines()[0]
    assert len(verdict) <= width and "NOT RATED" in verdict
    if width >= 78:
        assert "fatigue" in verdict


def test_the_summary_says_not_rated_for_a_rack_with_no_impact():
    # a hold that is no limit state left unchecked (ANSI MH16.1's impact, from memory, not
    # given) still reaches the line in sight while typing, not only the Rating view
    from shopbeam.design.analysis import analyze
    from shopbeam.jobs.jobfile import parse_job_text

    text = (PRESETS / "pallet-rack-beam-pair.toml").read_text().replace('impact = "25%"', "")
    r = analyze(parse_job_text(text))
    assert r.ok and not r.blocking
    assert "NOT RATED" in drawing.summary_line(r, 78).splitlines()[0]
    rated = analyze(parse_job_text((PRESETS / "pallet-rack-beam-pair.toml").read_text()))
    assert "NOT RATED" not in drawing.summary_line(rated, 78)


def test_a_title_with_a_line_break_keeps_the_title_bar_on_one_line_with_its_flags():
    from shopbeam.tui.app import title_bar
    bar = title_bar("Loft beam\nover the saw bay", "lib/mltitle.toml", "UNSAVED CHANGES", 78)
    assert "\n" not in bar and bar.endswith("UNSAVED CHANGES") and "mltitle.toml" in bar


@sync
async def test_the_problem_summary_keeps_to_three_rows_of_the_width_and_says_where_the_rest_is():
    app = make_app(PRESETS / "demo.toml", cursor_blink=False)
    async with app.run_test(size=(80, 24)) as pilot:
        await settle(pilot)
        js = app.job_screen
        head = "The job has 2 problems; no results until they are fixed:"
        long1 = "  - supports[1].at: '16 ft' (16 ft) is beyond the end of the beam (12 ft): " \
                "positions run from 0 at the left end"
        long2 = "  - moving[0].travel: the travel runs past the end of the beam (12 ft)"
        for lines, pointer in (([head, long1, long2, long2], "and 2 more: see 7 Results"),
                               ([head, long1 + " and more words" * 8], "see 7 Results"),
                               ([head, "  - a short one"], None)):
            got = js._problems_summary(lines).splitlines()
            assert len(got) <= 3 and widest("\n".join(got)) <= 78
            assert got[0] == head
            assert (pointer in got[-1]) if pointer else got == lines
        # three rows: each is shown, cut to fit ("and 1 more" had hidden the one problem
        # under a warning)
        got = js._problems_summary([head, long1, long2]).splitlines()
        assert len(got) == 3 and widest("\n".join(got)) <= 78
        assert got[1].startswith("  - supports[1].at") and got[2].startswith("  - moving[0]")
