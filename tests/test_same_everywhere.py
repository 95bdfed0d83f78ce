"""One presentation (`output.present`) behind every renderer: the text report, the JSON, the
text UI's tables, the calc package (HTML and Markdown), the capacity page and the rating label
show the same governing check, governing load state, reactions and uplift.

The case is the bundled continuous shelf: a rail over three brackets, two 5 ft spans, a
patterned uniform live load. With the live load on one span only, the far end of the other
span lifts: R = -w L / 16 for two equal spans with one span loaded, plus 3 w_d L / 8 of the
dead load on both spans (continuous-beam coefficients, any beam handbook, e.g. AISC Manual
Table 3-23 case 29/30, from memory).
"""

from __future__ import annotations

import re
from pathlib import Path

import pytest

from shopbeam import units
from shopbeam.design.analysis import analyze, to_json
from shopbeam.design.capacity import capacity
from shopbeam.jobs.jobfile import load_job
from shopbeam.output import calcpackage, capacityreport, label, report
from shopbeam.output.present import present, present_capacity
from shopbeam.tui import drawing

PRESET = Path(__file__).resolve().parents[1] / "presets" / "continuous-shelf.toml"
LBF, FT = 4.4482216152605, 0.3048


@pytest.fixture(scope="module")
def shelf():
    job = load_job(PRESET)
    return job, analyze(job)


def _lifted_end(state: str) -> float:
    """The support that lifts in a one-span-loaded state: the far end of the unloaded span.
    The two one-span states are mirror images and govern deflection alike (equal to the last
    bit or two), so which of them a machine reports is not fixed; the other end lifts."""
    assert state.count("span") == 1, state
    return 10 * FT if "span 0 ft-5 ft" in state else 0.0


def test_hand_figures_of_the_uplift(shelf):
    job, result = shelf
    # per member: the entered -150 lbf/ft is shared by 2 rails
    w = 150 * LBF / FT / job.members
    wd = -job.self_weight_load().w1
    span = 5 * FT
    hand = -w * span / 16 + 3 * wd * span / 8  # far end of the unloaded span
    ups = [r for r in result.state_solution.reactions if r.force < 0]
    end = _lifted_end(result.governing.state)
    assert len(ups) == 1 and ups[0].at == pytest.approx(end, abs=1e-9)
    assert ups[0].force == pytest.approx(hand, rel=1e-6)
    # every pattern: each end support lifts when only the far span is loaded
    env = {round(r["at"] / FT, 6): r for r in result.reaction_envelope}
    assert env[0.0]["max_down"] == pytest.approx(hand, rel=1e-6)
    assert env[10.0]["max_down"] == pytest.approx(hand, rel=1e-6)


def test_report_json_ui_and_calc_package_show_the_same_governing_state(shelf):
    job, result = shelf
    p = present(result)
    gov = result.governing
    assert p.governing == f"{gov.name}, ratio {gov.ratio:.3f}"
    assert p.governing_state is not None and p.uplift
    up_rows = [r for r in p.governing_state.reactions if r.uplift]
    assert [r.at for r in up_rows] == [units.fmt(_lifted_end(gov.state), "length", job.units)]

    # text report
    text = report.render(result)
    assert f"governing: {p.governing}" in text
    assert f"In {p.governing_state.words}:" in re.sub(r"\s*\n\s*", " ", text)
    for r in p.reactions:
        assert re.search(rf"{r.kind}\s+at {re.escape(r.at)}\s+force {re.escape(r.force)}", text)
    for r in up_rows:
        assert re.search(rf"{re.escape(r.force)}\s+\(pulls down: uplift\)", text)

    # JSON (SI): the same governing check, state and reactions
    data = to_json(result)
    assert data["governing"] == gov.name
    g = next(c for c in data["checks"] if c["name"] == gov.name)
    assert f"{g['ratio']:.3f}" in p.governing and g["state"] == gov.state
    assert data["governing_state"]["words"] == p.governing_state.words
    js_forces = [units.fmt(r["force"], "force", job.units)
                 for r in data["governing_state"]["reactions"]]
    assert js_forces == [r.force for r in p.governing_state.reactions]
    assert [units.fmt(r["force"], "force", job.units) for r in data["reactions"]] == \
        [r.force for r in p.reactions]
    lifts = [r for r in data["reaction_envelope"] if r["max_down"] < 0]
    assert len(lifts) == len(p.uplift) == 2

    # text UI tables
    table = drawing.reactions_table(result)
    assert f"In {p.governing_state.words}:" in table
    for r in up_rows:
        assert re.search(rf"{re.escape(r.force)}\s+-\s+uplift", table)
    assert all(line in table for line in p.uplift)
    checks = drawing.checks_table(result)
    assert f"worst state: {gov.state}" in checks

    # calc package: the same rows, the same governing line, the same uplift
    pkg = calcpackage.build(result, input_bytes=PRESET.read_bytes())
    assert pkg.governing == p.governing and pkg.checks == p.checks
    assert pkg.state_words == p.governing_state.words and pkg.uplift == p.uplift
    assert [r[2] for r in pkg.reactions] == [r.force for r in p.reactions]
    lifted = [r for r in pkg.state_reactions if "uplift" in r[2]]
    assert [r[1] for r in lifted] == [r.at for r in up_rows]
    html, md = calcpackage.to_html(pkg), calcpackage.to_markdown(pkg)
    for doc in (html, md):
        assert p.governing in doc
        for line in p.uplift:
            assert line in doc
    assert "Reaction envelope" in html and "Reaction envelope" in md


def test_capacity_page_and_label_name_the_same_governing_check_and_state(shelf):
    job, result = shelf
    cap = capacity(job)
    pc = present_capacity(cap)
    gov = result.governing
    # the live load scales the demand of every check alike here, so the check and the load
    # state that govern at the entered loads govern at the rated load too
    assert pc.governing_name == gov.name and pc.governing_state == gov.state
    assert pc.governing.endswith("ratio 1.000")
    # the same supports lift, pulled harder at the rated load
    names = lambda lines: [x.split(" pulls down")[0] for x in lines]  # noqa: E731
    assert names(pc.uplift) == names(present(result).uplift)
    page = capacityreport.render(cap)
    assert f"governing: {gov.name}" in page and "uplift at k" in page
    rating = label.rating(cap, result.unchecked)
    assert rating.status == "rated" and rating.governing == gov.name
    assert rating.governing_state == gov.state and rating.uplift == pc.uplift
    text = label.label_text(rating)
    assert "Governing check: deflection" in text and "UPLIFT at the rated load" in text
    flat = re.sub(r"[|\s]+", " ", text)
    assert gov.state in flat
    plaque = label.plaque_html(rating)
    assert gov.state in plaque and all(u in plaque for u in pc.uplift)


def test_plaque_lists_what_each_support_carries_at_the_rated_load(shelf):
    job, result = shelf
    cap = capacity(job)
    rating = label.rating(cap, result.unchecked)
    k = cap.factor
    # both spans loaded (the state that loads the middle bracket most): two equal spans under
    # a uniform load w, middle reaction 10/8 w L (continuous-beam coefficients, from memory);
    # w per member = k x 150/2 lbf/ft live + the self-weight
    w = k * 150 * LBF / FT / job.members - job.self_weight_load().w1
    mid = 1.25 * w * 5 * FT
    expect = f"roller at {units.fmt(5 * FT, 'length', job.units)}: up to " \
             f"{units.fmt(mid, 'force', job.units)}"
    assert expect in rating.reactions
    assert len(rating.reactions) == 3
    assert sum("pulls down up to" in x for x in rating.reactions) == 2  # both end brackets lift
    page = label.plaque_text(rating)
    flat = re.sub(r"[|\s]+", " ", page)
    assert ("SUPPORTS must carry at the rated load (each member, + up; their brackets, "
            "seats, hangers and anchors are not checked here):") in flat and expect in flat
    assert all(len(line) <= 78 for line in page.splitlines())
    assert expect in label.plaque_html(rating)
    # the 40-column label carries them too: the rating rests on the brackets carrying them
    short = re.sub(r"[|\s]+", " ", label.label_text(rating))
    assert "SUPPORTS must carry at the rated load" in short
