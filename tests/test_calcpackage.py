"""Calc package: content, numbers in the drawings against the solution and hand statics,
the title block, the input hash, and safe writing. (The real-browser tests are in
tests/test_browser.py.)"""

from __future__ import annotations

import hashlib
import re
from html import unescape
from pathlib import Path

import pytest

from shopbeam import units
from shopbeam.design.analysis import analyze, to_json
from shopbeam.errors import InputError
from shopbeam.jobs.jobfile import load_job, parse_job_text
from shopbeam.output import calcpackage as cp

REPO = Path(__file__).resolve().parents[1]
PRESETS = REPO / "presets"

# simple span 10 ft, uniform 100 lbf/ft, no self-weight: hand statics (common practice)
# R = wL/2 = 500 lbf, M max = wL^2/8 = 1250 lbf*ft at mid-span, V = +-500 lbf at the ends
SIMPLE = """schema = 1
title = "Simple span, hand case"
[project]
shop = "Test Shop"
job = "J-101"
prepared_by = "A. Fitter"
revision = "B"
[beam]
length = "10 ft"
self_weight = false
section = "HSS4x4x1/4"
material = "A500-C"
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "10 ft"
type = "roller"
[[loads]]
type = "uniform"
start = "0 ft"
end = "10 ft"
value = "-100 lbf/ft"
label = "stock"
"""


def package(text=SIMPLE, **kw):
    job = parse_job_text(text, "simple.toml")
    data = text.encode()
    return cp.build(analyze(job), input_bytes=data, input_name="simple.toml", **kw), job


def extreme_labels(html: str, state: str = "") -> dict:
    """(diagram, which) -> (text, data-si, data-at) for every labelled extreme of the
    diagrams of the load state shown (or of the `state` named)."""
    out = {}
    for m in re.finditer(r'<svg[^>]*data-diagram="(\w+)"( data-state="(\w+)")?.*?</svg>',
                         html, re.S):
        if (m.group(3) or "") != state:
            continue
        name = m.group(1)
        for t in re.finditer(r'<text[^>]*data-which="(\w+)" data-si="([^"]+)" data-at="([^"]+)"'
                             r"[^>]*>([^<]*)</text>", m.group(0)):
            out[(name, t.group(1))] = (unescape(t.group(4)), float(t.group(2)), float(t.group(3)))
    return out


def test_moment_diagram_labels_the_hand_extreme():
    pkg, _ = package()
    html = cp.to_html(pkg)
    labels = extreme_labels(html)
    text, si, at = labels[("moment", "max")]
    assert text == "max 1250 lbf*ft at 5 ft"
    assert si == pytest.approx(1250 * 4.4482216152605 * 0.3048, rel=1e-9)
    assert at == pytest.approx(5 * 0.3048, rel=1e-9)
    # shear: +500 lbf at the left end, -500 lbf at the right
    assert labels[("shear", "max")][0] == "max 500 lbf at 0 ft"
    assert labels[("shear", "min")][0] == "min -500 lbf at 10 ft"


@pytest.mark.parametrize("name", ["demo", "continuous-shelf", "monorail-trolley", "jib-arm",
                                  "pallet-rack-beam-pair"])
def test_every_labelled_extreme_equals_the_json_extreme(name):
    path = PRESETS / f"{name}.toml"
    job = load_job(path)
    result = analyze(job)
    pkg = cp.build(result, input_bytes=path.read_bytes(), input_name=str(path))
    labels = extreme_labels(cp.to_html(pkg))
    ex = to_json(result)["extremes"]
    assert {n for n, _ in labels} == {"shear", "moment", "slope", "deflection"}
    for (fname, which), (text, si, at) in labels.items():
        assert si == ex[fname][which] and at == ex[fname][f"{which}_at"]
        kind = {"shear": "force", "moment": "moment", "slope": "slope",
                "deflection": "small_length"}[fname]
        assert units.fmt(ex[fname][which], kind, job.units) in text
    gov = to_json(result)["governing_state"]
    if gov:  # patterned loads: the governing state's shear and moment are drawn too
        labels = extreme_labels(cp.to_html(pkg), "governing")
        assert {n for n, _ in labels} == {"shear", "moment"}
        for (fname, which), (_, si, at) in labels.items():
            assert si == gov["extremes"][fname][which]


def test_html_has_every_part_and_the_caution():
    pkg, _ = package()
    html = cp.to_html(pkg)
    for part in ("Design basis", "AISC 360-16", "Member, supports and loads", "Reactions",
                 "Shear, moment, slope and deflection", "Checks", "Not checked",
                 "Self-checks", "Cautions", "SCREENING CHECK ONLY", "Program and input",
                 'counter(page)', 'counter(pages)', "@page", "size:letter"):
        assert part in html, part
    assert "<script" not in html.lower()  # self-contained and inert
    assert "http://" not in html.replace('xmlns="http://www.w3.org/2000/svg"', "")
    assert len(re.findall(r"<svg[^>]*data-diagram=", html)) == 4 and 'class="sketch"' in html
    for c in ("bending", "shear", "deflection"):
        assert f"<td>{c}</td>" in html


def test_title_block_from_project_table_and_command_line_override():
    pkg, _ = package(fields={"checked_by": "P. Engineer", "revision": "C"})
    tb = dict(pkg.title_block)
    assert tb["Shop"] == "Test Shop" and tb["Job"] == "J-101"
    assert tb["Prepared by"] == "A. Fitter" and tb["Checked by"] == "P. Engineer"
    assert tb["Revision"] == "C"  # the command line wins over the file
    assert "rev C" in cp.to_html(pkg)


def test_input_is_hashed_and_embedded():
    pkg, _ = package()
    assert pkg.input_sha256 == hashlib.sha256(SIMPLE.encode()).hexdigest()
    html = cp.to_html(pkg)
    assert pkg.input_sha256 in html
    embedded = re.search(r'<pre id="shopbeam-input">(.*?)</pre>', html, re.S).group(1)
    assert unescape(embedded) == SIMPLE
    md = cp.to_markdown(pkg)
    assert pkg.input_sha256 in md and 'value = "-100 lbf/ft"' in md


def test_markdown_says_the_same_checks_and_extremes():
    pkg, _ = package()
    md = cp.to_markdown(pkg)
    for c in pkg.checks:
        assert f"| {c.name} | {c.demand} | {c.limit} | {c.ratio:.3f} |" in md
    assert "| moment (lbf*ft) | 1250 lbf*ft | 5 ft |" in md
    assert "SCREENING CHECK ONLY" in md and "## 6. Not checked" in md


def test_lifting_package_carries_the_stronger_caution_first():
    path = PRESETS / "jib-arm.toml"
    pkg = cp.build(analyze(load_job(path)), input_bytes=path.read_bytes())
    html = cp.to_html(pkg)
    first = html.index("LIFTING DEVICE")
    assert first < html.index("1. Design basis")
    assert 'class="caution lifting"' in html


def test_unchecked_limit_states_are_listed():
    from dataclasses import replace

    from shopbeam.design.checks import Unchecked

    job = parse_job_text(SIMPLE)
    result = replace(analyze(job), unchecked=(Unchecked(
        "web local yielding", "no bearing length was given", "AISC 360-16 J10.2"),))
    pkg = cp.build(result, input_bytes=SIMPLE.encode())
    assert ("web local yielding", "AISC 360-16 J10.2", "no bearing length was given") \
        in pkg.not_checked
    assert "web local yielding" in cp.to_html(pkg) and "web local yielding" in cp.to_markdown(pkg)


def test_markdown_fence_survives_backticks_in_the_input():
    text = SIMPLE.replace('title = "Simple span, hand case"', 'title = "a ``` b"')
    pkg, _ = package(text)
    md = cp.to_markdown(pkg)
    assert "````toml" in md


def test_write_refuses_to_replace_a_file_and_reads_the_suffix(tmp_path):
    pkg, _ = package()
    out = tmp_path / "pkg.html"
    assert cp.write(pkg, out) == "html"
    first = out.read_text()
    with pytest.raises(InputError, match="already exists"):
        cp.write(pkg, out)
    assert out.read_text() == first
    assert cp.write(pkg, tmp_path / "pkg.md") == "markdown"
    with pytest.raises(InputError, match=r"\.html, \.md or \.pdf"):
        cp.write(pkg, tmp_path / "pkg.txt")
    assert not (tmp_path / "pkg.txt").exists()


def test_paper_follows_the_units_unless_asked():
    pkg, _ = package()
    assert pkg.paper == "letter"
    si = SIMPLE.replace('title = "Simple span, hand case"', 'title = "m"\nunits = "si"')
    assert package(si)[0].paper == "a4" and "size:A4" in cp.to_html(package(si)[0])
    assert package(paper="a4")[0].paper == "a4"


def test_project_table_problems_are_reported():
    from shopbeam.errors import InputErrors

    bad = SIMPLE.replace('revision = "B"', 'revision = ["B"]\nreviewer = "x"')
    with pytest.raises(InputErrors) as e:
        parse_job_text(bad, "bad.toml")
    text = str(e.value)
    assert "project.revision" in text


def test_a_wheel_set_is_listed_and_drawn():
    path = PRESETS / "monorail-trolley.toml"
    pkg = cp.build(analyze(load_job(path)), input_bytes=path.read_bytes())
    assert any(x.startswith("moving hoist trolley: wheels") for x in pkg.loads)
    assert "travel dashed" in pkg.sketch


def test_governing_pattern_names_uplift_like_the_report():
    path = PRESETS / "continuous-shelf.toml"
    result = analyze(load_job(path))
    pkg = cp.build(result, input_bytes=path.read_bytes())
    up = [r for r in pkg.state_reactions if "uplift" in r[2]]
    down = [r for r in result.state_solution.reactions if r.force < 0]
    assert len(up) == len(down) >= 1


def test_a_title_cannot_end_the_style_element_and_run_markup():
    # the running header is a CSS string inside <style>: a "</style><script>" in a title
    # must stay text there (escaped as CSS), so no script element appears in the package
    from html.parser import HTMLParser

    text = (PRESETS / "demo.toml").read_text().replace(
        'title = "Loft beam over the saw bay, with stair overhang"',
        'title = "</style><script>alert(5)</script><style>"')
    job = parse_job_text(text)
    html = cp.to_html(cp.build(analyze(job), input_bytes=text.encode(), input_name="x.toml"))
    tags = []

    class Tags(HTMLParser):
        def handle_starttag(self, tag, attrs):
            tags.append(tag)

    Tags().feed(html)
    assert "script" not in tags and tags.count("style") == 1


def test_the_package_carries_the_rating_or_not_rated_and_why():
    # the proof filed with a job says what may be posted: the label `shopbeam rating` prints,
    # and, where no load may be posted, NOT RATED in the verdict with the reasons
    from shopbeam.design.capacity import capacity
    from shopbeam.output.label import label_text, rating

    job = load_job(PRESETS / "demo.toml")
    res = analyze(job)
    pkg = cp.build(res)
    cap = capacity(job)
    assert cap.rated and pkg.rated
    assert pkg.rating == label_text(rating(cap, res.unchecked))
    assert pkg.rating in unescape(cp.to_html(pkg)) and pkg.rating.rstrip("\n") in cp.to_markdown(pkg)
    # an upward load with no uplift = true (a forgotten minus sign): NOT RATED, said and why
    text = (PRESETS / "demo.toml").read_text().replace('value = "-1200 lbf"', 'value = "1200 lbf"')
    assert text != (PRESETS / "demo.toml").read_text()
    slip = parse_job_text(text, "slip.toml")
    pkg = cp.build(analyze(slip))
    assert not pkg.rated and "NOT RATED" in pkg.rating and "NOT RATED" in pkg.verdict
    html = " ".join(unescape(cp.to_html(pkg)).split())
    assert "NOT RATED, and why" in html
    flat = " ".join(html.replace("|", " ").split())
    assert "forgotten minus sign" in flat and "loads[3] (stair)" in flat  # the reason in full


def test_the_numbers_a_check_used_are_in_the_jobs_units():
    # "Rn 161137" (newtons) beside a limit in lbf, "fy 3.447e+08" (pascals): every number a
    # check used is shown in the job's units, as its demand and limit are
    job = load_job(PRESETS / "demo.toml")
    pkg = cp.build(analyze(job))
    used = {c.name: dict(c.params) for c in pkg.checks}
    web = used["web local yielding"]
    assert web["Rn"].endswith(" lbf") and web["fy"] == "50 ksi" and web["tw"].endswith(" in")
    assert used["bending"]["M_yield_cap"].endswith(" lbf*ft")
    for c in pkg.checks:
        for name, text in c.params:
            assert "e+" not in text and not re.fullmatch(r"-?\d{5,}(\.\d+)?", text), (c.name, name)


def test_a_printed_check_stays_with_its_working_and_tables_repeat_their_head():
    # a page break had split a check's row from the line of its working, and a table run
    # onto the next sheet had lost its header row
    html = cp.to_html(cp.build(analyze(load_job(PRESETS / "monorail-hoist-beam.toml"))))
    checks = html[html.index("5. Checks"):html.index("6. Not checked")]
    bodies = re.findall(r"<tbody class=keep>(.*?)</tbody>", checks, re.S)
    assert len(bodies) >= 5 and all(b.count("<tr>") == 2 for b in bodies)
    assert "<thead><tr><th>check</th>" in checks
    assert "thead{display:table-header-group}" in html and "tbody.keep" in html
