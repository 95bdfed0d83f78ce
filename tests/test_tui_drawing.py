"""The text pictures of the UI (elevation to scale, plots, tables), without a screen."""

from __future__ import annotations

from pathlib import Path

from shopbeam.jobs.jobfile import load_job
from shopbeam.design.analysis import analyze
from shopbeam.tui import drawing
from shopbeam.tui.session import Session
from shopbeam.tui.views import in_words

PRESETS = Path(__file__).resolve().parents[1] / "presets"


def test_elevation_puts_supports_to_scale():
    job = load_job(PRESETS / "demo.toml")  # 15 ft, pin at 0, roller at 12 ft
    lines = drawing.elevation(job, width=76).splitlines()
    beam = next(i for i, ln in enumerate(lines) if set(ln) == {"="})
    supports = lines[beam + 1]
    assert supports[0] == "^" and supports.index("o") == round(12 / 15 * 75)
    dims = lines[beam + 2]
    assert "12 ft" in dims and "3 ft" in dims
    # the stair load (a point load at the free end) is drawn as a downward arrow at the end
    assert any(ln.endswith("v") and len(ln) == 76 for ln in lines[:beam])


def test_plot_marks_and_labels_the_exact_extremes():
    result = analyze(load_job(PRESETS / "demo.toml"))
    text = drawing.plot(result, "moment", width=70, height=12)
    ex = result.solution.extremes()["moment"]
    assert "O" in text and "X" in text
    assert f"at x = {drawing._f(ex.max_at, 'length', 'us')}" in text
    assert all(len(ln) <= 72 for ln in text.splitlines())


def test_nice_ticks_are_round_and_include_zero():
    ticks = drawing.nice_ticks(-3300.0, 2800.0, 5)
    assert 0.0 in ticks and all(t % 1000 == 0 for t in ticks)
    assert ticks[0] >= -3300 and ticks[-1] <= 2800


def test_checks_say_pass_or_fail_in_words():
    result = analyze(load_job(PRESETS / "demo.toml"))
    table = drawing.checks_table(result)
    lines = table.splitlines()
    for c in result.checks:
        # a name longer than its column has a line of its own, the figures on the next
        i = next(i for i, ln in enumerate(lines) if ln.startswith(c.name)
                 and (len(ln) == len(c.name) or ln[len(c.name)] == " "))
        row = lines[i] if lines[i].strip() != c.name else lines[i + 1]
        assert ("PASS" if c.ok else "FAIL") in row


def test_a_half_typed_job_gives_problems_not_an_exception():
    s = Session.open(PRESETS / "demo.toml")
    s.set("beam.length", "15")  # a bare number
    assert not s.evaluation.ok
    assert "unit" in s.evaluation.message_for("beam.length")
    s.set("beam.length", "15 ft")
    assert s.evaluation.ok


def test_a_key_to_write_is_named_as_the_control_that_writes_it():
    # the UI has an Uplift choice and a Basis choice: a message read there names them
    said = in_words("loads[2].value: this load points UP (+300 lbf): forces are + up. If the "
                    "push up is intended (uplift), add uplift = true to the load")
    assert "load 3 value" in said and "Uplift to yes" in said and "uplift = true" not in said
    said = in_words('criteria.safety_factor: write basis = "first-yield" under [criteria] to '
                    "check first yield with this factor")
    assert "Basis: first-yield (6 Criteria)" in said
    # the reader's own words for a dead load marked uplift, as the form shows them
    from shopbeam.jobs.jobfile import parse_job_data

    data = {"schema": 1, "title": "t",
            "beam": {"length": "10 ft", "section": "W8x18", "material": "A992"},
            "supports": [{"at": "0 ft", "type": "pin"}, {"at": "10 ft", "type": "roller"}],
            "loads": [{"type": "uniform", "value": "50 lbf/ft", "case": "dead",
                       "uplift": True}]}
    job = parse_job_data(data)
    msg = next(str(w) for w in job.warnings if "pushes UP" in str(w))
    said = in_words(msg)
    assert "remove uplift = true" in msg and "remove uplift = true" not in said
    assert "set Uplift to no" in said and "(uplift = true)" not in said
    # a live load marked uplift that pushes down: held, its message in the form's words
    data["loads"] = [{"type": "uniform", "value": "-50 lbf/ft", "uplift": True}]
    msg = next(str(w) for w in parse_job_data(data).warnings if "pushes DOWN" in str(w))
    said = in_words(msg)
    assert "uplift = true" in msg and "uplift = true" not in said
    assert "Uplift yes says" in said and "set Uplift to no if it is a weight" in said
    said = in_words('this reads like a lifting device (hoist) but is not tagged lifting. '
                    'Add tags = ["lifting"] if it carries a hoist')
    assert "Tags (1 Job)" in said and "tags = [" not in said


def test_row_keys_read_as_the_lists_number_them():
    assert in_words("supports[1].at: supports[0] and supports[1] clash") == \
        "support 2 at: support 1 and support 2 clash"


def test_rating_view_counts_loads_as_the_list_does(tmp_path):
    # the demo tagged lifting: its hoist (the fourth load) is named in the label's reasons
    # and input warnings; the Rating view says "load 4", as the Loads list numbers it
    from shopbeam.tui.slow import rating_text

    text = (PRESETS / "demo.toml").read_text(encoding="utf-8")
    job = tmp_path / "lift.toml"
    job.write_text(text.replace('tags = [', 'tags = ["lifting", ', 1), encoding="utf-8")
    shown = rating_text(load_job(job))
    assert "loads[" not in shown and "load 4" in shown
    # still boxed: every label line keeps the box's width
    box = [ln for ln in shown.splitlines() if ln.startswith("|")]
    assert box and len({len(ln) for ln in box}) == 1


def test_the_basis_words_say_why_first_yield_is_used_when_the_choice_shows_code():
    # a typed-in metal with no kind: no code rule, so bending is on first yield though the
    # Basis choice shows [code] (nothing written)
    from types import SimpleNamespace

    from shopbeam.jobs.jobfile import parse_job_text
    from shopbeam.tui.views import basis_words

    base = """schema = 1
title = "t"
[beam]
length = "10 ft"
section = "W8x18"
{mat}
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "10 ft"
type = "roller"
[[loads]]
type = "uniform"
value = "-50 lbf/ft"
{crit}"""
    typed = 'material = { e = "29000 ksi", fy = "36 ksi", density = "490 lb/ft^3" }'
    said = basis_words(SimpleNamespace(job=parse_job_text(base.format(mat=typed, crit="")),
                                       result=None))
    assert said.startswith("Basis code has no rule") and "first yield" in said
    asked = basis_words(SimpleNamespace(job=parse_job_text(base.format(
        mat=typed, crit='[criteria]\nbasis = "first-yield"')), result=None))
    assert not asked.startswith("Basis code") and asked.startswith("Bending on first yield")
    steel = basis_words(SimpleNamespace(job=parse_job_text(base.format(
        mat='material = "A992"', crit="")), result=None))
    assert "Basis code has no rule" not in steel
