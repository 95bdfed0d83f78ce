"""The less common job keys edited in the text UI: lifting profile and category, bracing,
bearing lengths, a point load's flange, patterned loads and the wood service keys.

Each edit goes into the comment-keeping document (the rest of the file, comments included,
stays as it was), is read back by the job reader, and a value the reader refuses shows the
reader's own message beside the field or choice.
"""

from __future__ import annotations

import shutil
from pathlib import Path

import pytest

from tuipilot import _own_library, settle, sync  # noqa: E402,F401 (_own_library: autouse)
from shopbeam.jobs.jobfile import parse_job_data, parse_job_text  # noqa: E402
from shopbeam.errors import InputErrors  # noqa: E402
from shopbeam.tui.app import make_app  # noqa: E402
from shopbeam.tui.views import in_words  # noqa: E402
from shopbeam.tui.widgets import Choice, Field  # noqa: E402

PRESETS = Path(__file__).resolve().parents[1] / "presets"
SIZE = (80, 24)
COMMENT = "# kept: a note the shop wrote by hand"


def job_copy(tmp_path, preset: str, extra: str = "") -> Path:
    """A preset copied to a file of the user's, with a hand-written comment (and `extra`
    text) added, so the test can see the comment survive the edits."""
    text = (PRESETS / f"{preset}.toml").read_text()
    path = tmp_path / f"{preset}.toml"
    path.write_text(COMMENT + "\n" + text + extra)
    return path


def field(app, view: str, key: str) -> Field:
    return next(f for f in app.job_screen.query_one(f"#{view}").query(Field) if f.key == key)


def choice(app, view: str, key: str) -> Choice:
    return next(c for c in app.job_screen.query_one(f"#{view}").query(Choice) if c.key == key)


async def goto(pilot, key: str) -> None:
    await pilot.press("escape", key)
    await settle(pilot)


async def show_load(app, pilot, i: int) -> None:
    """The loads view's form on load i (picked in the list, as a user would)."""
    if app.job_screen.current != "loads":
        await goto(pilot, "3")
    lst = app.job_screen.query_one("#load-list")
    lst.focus()
    lst.highlighted = i
    await settle(pilot)


async def type_keys(pilot, f: Field, text: str) -> None:
    f.input.focus()
    await pilot.pause()
    f.input.value = ""
    await pilot.press(*[{" ": "space"}.get(c, c) for c in text])
    await settle(pilot)


async def pick(pilot, c: Choice, *keys: str) -> None:
    c.focus()
    await pilot.pause()
    await pilot.press(*keys)
    await settle(pilot)


def message(w) -> str:
    if isinstance(w, Choice):
        return w.message
    return str(w.query_one(".field-msg").content)


def reader_message(doc, key: str) -> str:
    """What the job reader itself says about `key` in this document."""
    try:
        job = parse_job_data(doc.plain(), "", doc.text())
    except InputErrors as exc:
        return next(p.message for p in exc.problems if p.key == key)
    return next(p.message for p in job.warnings if p.key == key)


def reread(path: Path):
    return parse_job_text(path.read_text(), str(path))


@sync
async def test_lifting_profile_and_category_round_trip(tmp_path):
    path = job_copy(tmp_path, "demo")
    app = make_app(path, cursor_blink=False)
    async with app.run_test(size=SIZE) as pilot:
        await settle(pilot)
        s = app.job_screen.session
        assert "LIFTING" not in str(app.job_screen.query_one("#banner").content)
        await goto(pilot, "6")
        lift = choice(app, "criteria", "criteria.lifting")
        cat = choice(app, "criteria", "criteria.category")
        assert lift.value == "none" and not cat.display
        await pick(pilot, lift, "right")  # none -> powered-monorail
        assert s.doc.get("criteria.lifting") == "powered-monorail"
        assert s.evaluation.job.lifting  # a named profile is a lifting device
        assert "lifting" not in s.doc.get("tags")  # no tag written that nobody typed
        assert "LIFTING" in str(app.job_screen.query_one("#banner").content)
        assert "impact 25%" in lift.message
        assert s.evaluation.job.criteria.lifting == "powered-monorail"
        assert s.evaluation.job.criteria.deflection_ratio == 360  # written L/360 stays
        await pick(pilot, lift, "b")  # below-the-hook, by its first letter
        assert s.doc.get("criteria.lifting") == "below-the-hook"
        assert cat.display and cat.value == "B"
        await pick(pilot, cat, "a")
        assert s.doc.get("criteria.category") == "A"
        assert s.evaluation.job.criteria.category == "A"
        await pilot.press("ctrl+s")
        await settle(pilot)
    text = path.read_text()
    assert text.startswith(COMMENT) and 'lifting = "below-the-hook"' in text
    job = reread(path)
    assert (job.criteria.lifting, job.criteria.category, job.lifting) == \
        ("below-the-hook", "A", True)


@sync
async def test_lifting_back_to_none_removes_the_profile_and_its_category(tmp_path):
    path = job_copy(tmp_path, "monorail-hoist-beam")
    path.write_text(path.read_text().replace(
        'lifting = "hand-geared-monorail"', 'lifting = "below-the-hook"\ncategory = "A"', 1))
    app = make_app(path, cursor_blink=False)
    async with app.run_test(size=SIZE) as pilot:
        await settle(pilot)
        s = app.job_screen.session
        await goto(pilot, "6")
        lift = choice(app, "criteria", "criteria.lifting")
        assert lift.value == "below-the-hook"
        assert choice(app, "criteria", "criteria.category").value == "A"
        await pick(pilot, lift, "n")
        assert s.doc.get("criteria.lifting") is None
        assert s.doc.get("criteria.category") is None
        assert s.evaluation.ok, s.evaluation.problems
        # still tagged lifting: the stronger caution stays
        assert "LIFTING" in str(app.job_screen.query_one("#banner").content)


@sync
async def test_a_value_the_reader_refuses_shows_its_message_under_the_choice(tmp_path):
    path = job_copy(tmp_path, "demo")
    text = path.read_text()
    assert "[criteria]" in text
    path.write_text(text.replace("[criteria]", '[criteria]\nlifting = "monorail"\n'
                                 'category = "A"', 1))
    app = make_app(path, cursor_blink=False)
    async with app.run_test(size=SIZE) as pilot:
        await settle(pilot)
        s = app.job_screen.session
        await goto(pilot, "6")
        lift = choice(app, "criteria", "criteria.lifting")
        cat = choice(app, "criteria", "criteria.category")
        want = in_words(reader_message(s.doc, "criteria.lifting"))
        assert "not a lifting profile" in want
        assert lift.message == "problem: " + want
        # beside a refused profile the category says nothing of its own (the profile's
        # message says what to write)
        assert cat.display and not cat.message.startswith("warning: ")
        # choosing a real profile clears the problem
        await pick(pilot, lift, "p")
        assert s.doc.get("criteria.lifting") == "powered-monorail"
        assert not lift.message.startswith("problem")


@sync
async def test_bracing_and_bearing_lengths_in_the_span_view(tmp_path):
    path = job_copy(tmp_path, "demo")
    app = make_app(path, cursor_blink=False)
    async with app.run_test(size=SIZE) as pilot:
        await settle(pilot)
        s = app.job_screen.session
        await goto(pilot, "2")
        bearing = field(app, "span", "beam.bearing")
        await type_keys(pilot, bearing, "4")  # a bare number: the reader says what is wrong
        assert s.doc.get("beam.bearing") == "4"
        want = in_words(reader_message(s.doc, "beam.bearing"))
        assert message(bearing) == "problem: " + want
        assert not s.evaluation.ok
        await type_keys(pilot, bearing, "4 in")
        assert s.evaluation.ok
        assert s.evaluation.job.bearing == pytest.approx(4 * 0.0254)
        assert "for the local checks" in message(bearing)
        braces = field(app, "span", "beam.braces")
        await type_keys(pilot, braces, "4 ft, 8 ft")
        assert s.doc.get("beam.braces") == ["4 ft", "8 ft"]
        # the second support (the roller at 12 ft): no brace, its own bearing
        lst = app.job_screen.query_one("#support-list")
        lst.focus()
        lst.highlighted = 1
        await settle(pilot)
        brace = choice(app, "span", "support.brace")
        assert brace.value == "default" and "default" in brace.message
        await pick(pilot, brace, "n")
        sup_bearing = field(app, "span", "support.bearing")
        await type_keys(pilot, sup_bearing, "3-1/2 in")
        rows = s.rows("supports")
        assert rows[1]["brace"] is False and rows[1]["bearing"] == "3-1/2 in"
        assert "brace" not in rows[0]
        job = s.evaluation.job
        assert job.supports[1].brace is False
        assert job.bearings["supports[1]"] == pytest.approx(3.5 * 0.0254)
        # emptied: the key leaves the file (beam.bearing applies again)
        await type_keys(pilot, sup_bearing, "")
        assert "bearing" not in s.rows("supports")[1]
        await pilot.press("ctrl+s")
        await settle(pilot)
    text = path.read_text()
    assert text.startswith(COMMENT)
    job = reread(path)
    assert job.bearing == pytest.approx(4 * 0.0254) and job.supports[1].brace is False
    assert job.braces == pytest.approx((4 * 0.3048, 8 * 0.3048))


@sync
async def test_point_load_bearing_flange_and_patterned(tmp_path):
    path = job_copy(tmp_path, "demo")
    app = make_app(path, cursor_blink=False)
    async with app.run_test(size=SIZE) as pilot:
        await settle(pilot)
        s = app.job_screen.session
        rows = s.rows("loads")
        pt = next(i for i, r in enumerate(rows) if r["type"] == "point")
        await show_load(app, pilot, pt)
        flange = choice(app, "loads", "load.flange")
        assert flange.display and flange.value == "top"
        await pick(pilot, flange, "b")
        bearing = field(app, "loads", "load.bearing")
        await type_keys(pilot, bearing, "6 in")
        row = s.rows("loads")[pt]
        assert (row["flange"], row["bearing"]) == ("bottom", "6 in")
        job = s.evaluation.job
        assert f"loads[{pt}]" in job.hung
        assert job.bearings[f"loads[{pt}]"] == pytest.approx(6 * 0.0254)
        assert "flange bending" in flange.message
        await pick(pilot, flange, "t")
        assert "flange" not in s.rows("loads")[pt]
        # a uniform load: no flange or bearing to give; patterned can be set
        uni = next(i for i, r in enumerate(rows) if r["type"] == "uniform")
        await show_load(app, pilot, uni)
        assert not flange.display and not bearing.display
        pat = choice(app, "loads", "load.patterned")
        await pick(pilot, pat, "y")
        assert s.rows("loads")[uni]["patterned"] is True
        assert s.evaluation.job.loads[uni].patterned is True


@sync
async def test_a_lifting_jobs_hoist_shows_and_keeps_the_flange_it_is_checked_on(tmp_path):
    # the jib arm's point loads say no flange: on a lifting job's I-beam they hang from the
    # bottom flange, and the form must show that; choosing "top" must write it (removing the
    # key would hang the load again)
    path = job_copy(tmp_path, "jib-arm")
    app = make_app(path, cursor_blink=False)
    async with app.run_test(size=SIZE) as pilot:
        await settle(pilot)
        s = app.job_screen.session
        rows = s.rows("loads")
        pt = next(i for i, r in enumerate(rows) if r["type"] == "point" and "flange" not in r)
        assert f"loads[{pt}]" in s.evaluation.job.hung_default
        await show_load(app, pilot, pt)
        flange = choice(app, "loads", "load.flange")
        assert flange.display and flange.value == "bottom"
        await pick(pilot, flange, "t")
        assert s.rows("loads")[pt]["flange"] == "top"
        assert f"loads[{pt}]" not in s.evaluation.job.hung
        assert flange.value == "top"
        await pick(pilot, flange, "b")
        assert s.rows("loads")[pt]["flange"] == "bottom"
        assert f"loads[{pt}]" in s.evaluation.job.hung
        # how many trolley wheels it hangs on: two (the default) is no key at all
        wheels = choice(app, "loads", "load.wheels")
        assert wheels.display and wheels.value == "two" and "P = load / 2" in wheels.message
        await pick(pilot, wheels, "f")
        assert s.rows("loads")[pt]["wheels"] == 4
        assert s.evaluation.job.contacts[f"loads[{pt}]"] == 4
        await pick(pilot, wheels, "t")
        assert "wheels" not in s.rows("loads")[pt]
        await pick(pilot, flange, "t")
        assert not wheels.display  # a load on top bears on no wheels


WOOD_JOB = """\
# a 2x10 floor joist, checked in the text UI
schema = 1
title = "Joist"

[beam]
length = "12 ft"   # clear span
section = "2x10"
material = "DF-L-2"

[[supports]]
at = "0 ft"
type = "pin"

[[supports]]
at = "12 ft"
type = "roller"

[[loads]]
type = "uniform"
start = "0 ft"
end = "12 ft"
value = "-40 lbf/ft"

[criteria]
deflection = "L/240"
"""


@sync
async def test_wood_service_keys_in_the_material_view(tmp_path):
    path = tmp_path / "joist.toml"
    path.write_text(WOOD_JOB)
    app = make_app(path, cursor_blink=False)
    async with app.run_test(size=SIZE) as pilot:
        await settle(pilot)
        s = app.job_screen.session
        await goto(pilot, "5")
        assert app.job_screen.query_one("#mat-wood").display
        dur = choice(app, "material", "criteria.duration")
        assert dur.value == "ten-years" and "CD 1" in dur.message
        await pick(pilot, dur, "right")  # ten-years -> two-months
        await pick(pilot, choice(app, "material", "beam.wet_service"), "y")
        await pick(pilot, choice(app, "material", "beam.temperature"), "right")
        await pick(pilot, choice(app, "material", "beam.repetitive"), "y")
        w = s.evaluation.job.wood
        assert (w.duration, w.wet, w.temperature, w.repetitive) == \
            ("two-months", True, "100F-125F", True)
        await goto(pilot, "6")
        ld = field(app, "criteria", "criteria.live_deflection")
        await type_keys(pilot, ld, "360")  # not a limit: the reader's words beside it
        assert message(ld) == "problem: " + in_words(
            reader_message(s.doc, "criteria.live_deflection"))
        await type_keys(pilot, ld, "L/360")
        assert s.evaluation.job.criteria.live_deflection_ratio == 360
        await pilot.press("ctrl+s")
        await settle(pilot)
    text = path.read_text()
    assert "length = \"12 ft\"   # clear span" in text  # the hand-written comment stays
    job = reread(path)
    assert (job.wood.duration, job.wood.wet, job.wood.repetitive) == ("two-months", True, True)
    assert job.criteria.live_deflection_ratio == 360


@sync
async def test_a_wood_key_on_steel_shows_the_readers_warning(tmp_path):
    path = job_copy(tmp_path, "demo")
    path.write_text(path.read_text().replace("[beam]", "[beam]\nwet_service = true", 1))
    app = make_app(path, cursor_blink=False)
    async with app.run_test(size=SIZE) as pilot:
        await settle(pilot)
        s = app.job_screen.session
        await goto(pilot, "5")
        assert app.job_screen.query_one("#mat-wood").display  # shown: the file has one
        wet = choice(app, "material", "beam.wet_service")
        assert wet.message.startswith("warning: ") and "wood" in wet.message
        await pick(pilot, wet, "n")
        assert s.doc.get("beam.wet_service") is None
        assert not app.job_screen.query_one("#mat-wood").display


@sync
async def test_a_warning_on_the_whole_material_is_shown_in_the_material_view(tmp_path):
    # a typed-in material with aluminium's E and steel's density (jobs.jobfile._mixed_material)
    # warns on beam.material as a whole: no one field holds it, so the view shows it under the
    # material in use, as the report does under INPUT WARNINGS
    path = job_copy(tmp_path, "demo")
    # the table follows the plain [beam] keys (self_weight is the last of them in the demo)
    text = path.read_text().replace('material = "A992"\n', "").replace(
        "self_weight = true\n", 'self_weight = true\n[beam.material]\ne = "10100 ksi"\n'
        'fy = "35 ksi"\ndensity = "490 lb/ft^3"\n')
    assert parse_job_text(text).material.source == "typed in"
    path.write_text(text)
    app = make_app(path, cursor_blink=False)
    async with app.run_test(size=SIZE) as pilot:
        await settle(pilot)
        await goto(pilot, "5")
        props = str(app.job_screen.query_one("#mat-props").render())
        assert "warning: e = 10100 ksi and density = 490 lb/ft^3 do not belong" in props


@sync
async def test_a_load_that_really_pushes_up_is_said_so_in_the_form(tmp_path):
    # the messages say "add uplift = true to the load": the form has the choice for it
    path = job_copy(tmp_path, "demo")
    app = make_app(path, cursor_blink=False)
    async with app.run_test(size=SIZE) as pilot:
        await settle(pilot)
        s = app.job_screen.session
        rows = s.rows("loads")
        pt = next(i for i, r in enumerate(rows) if r["type"] == "point")
        await show_load(app, pilot, pt)
        up = choice(app, "loads", "load.uplift")
        assert up.display and up.value == "no"
        await pick(pilot, up, "y")
        assert s.rows("loads")[pt]["uplift"] is True
        await pick(pilot, up, "n")
        assert "uplift" not in s.rows("loads")[pt]  # back as the file had it: no key


@sync
async def test_a_choices_long_message_wraps_under_the_options_not_under_the_labels(tmp_path):
    # the uplift warning on a dead load that points up ran back to column 0 on its second line
    app = make_app(job_copy(tmp_path, "demo"), cursor_blink=False)
    async with app.run_test(size=SIZE) as pilot:
        await settle(pilot)
        await show_load(app, pilot, 0)
        c = choice(app, "loads", "load.uplift")
        c.show("this dead load pushes UP (uplift = true): it is taken as on as always there, "
               "never left off, and a live load that relieves it is never counted on; set "
               "Uplift to no if it pushes down")
        await settle(pilot)
        lines = c._content(c.size.width).plain.split("\n")
        said = [ln for ln in lines[1:] if ln.strip()]
        assert len(said) >= 2  # it wraps
        assert all(ln.startswith(" " * 14) and len(ln) <= c.size.width for ln in said)
        assert " ".join(ln.strip() for ln in said) == c.message
