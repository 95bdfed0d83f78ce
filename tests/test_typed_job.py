"""One typed job, read once: every key is a real field, validated in the reader's one pass."""

from __future__ import annotations

import ast
import pathlib
from dataclasses import fields

import pytest

from shopbeam.cautions import cautions_for, is_lifting
from shopbeam.design.analysis import analyze
from shopbeam.design.checks import basis_of, impact_of, strengths
from shopbeam.errors import InputErrors
from shopbeam.jobs.jobfile import Basis, Criteria, Job, parse_job_text
from shopbeam.jobs.rules import DEFLECTION_PRESETS

FT, LBF, KIP = 0.3048, 4.4482216152605, 4448.2216152605

BASE = """schema = 1
title = "Hoist beam"
tags = {tags}
[beam]
length = "16 ft"
section = "S8x18.4"
material = "A36"
self_weight = false
{beam}
[[supports]]
at = "0 ft"
type = "pin"
[[supports]]
at = "16 ft"
type = "roller"
[[loads]]
type = "point"
at = "8 ft"
value = "-2 kip"
[criteria]
{criteria}
"""


def text(tags='[]', beam="", criteria=""):
    return BASE.format(tags=tags, beam=beam, criteria=criteria)


def test_four_errors_in_one_pass_with_file_key_and_line():
    # the file of the issue: a bare number, an unreadable impact, a brace with a bad unit and
    # an unknown basis: four problems in one read, each located
    src = text(beam='braces = ["4 fx"]', criteria='basis = "lrfd"\nimpact = "abc"')
    src = src.replace('value = "-2 kip"', "value = -2000")
    with pytest.raises(InputErrors) as e:
        parse_job_text(src, "hoist.toml")
    errs = [p for p in e.value.problems if not p.warning]
    keys = sorted(p.key for p in errs)
    assert keys == ["beam.braces[0]", "criteria.basis", "criteria.impact", "loads[0].value"]
    lines = src.splitlines()
    for p in errs:
        assert p.file == "hoist.toml"
        assert p.line is not None
        name = p.key.split(".")[-1].split("[")[0]
        assert lines[p.line - 1].lstrip().startswith(name), (p.key, lines[p.line - 1])
    basis = next(p for p in errs if p.key == "criteria.basis")
    assert '"asd"' in basis.message and '"first-yield"' in basis.message


@pytest.mark.parametrize("tag", ["lifting", "lifting ", "Lifting", " LIFTING"])
def test_lifting_tag_is_one_rule_everywhere(tag):
    # "lifting " (trailing space) and "Lifting" behave exactly as "lifting": caution, impact,
    # L/450 default deflection limit
    job = parse_job_text(text(tags=f'["{tag}"]'))
    assert job.lifting and is_lifting(job.tags) and job.tags == ("lifting",)
    assert "LIFTING DEVICE" in cautions_for(job.tags)[0]
    assert impact_of(job) == pytest.approx(0.25)  # powered monorail, ASCE 7-16 4.9.3
    assert strengths(job).defl_ratio == 450
    b = next(c for c in analyze(job).checks if c.name == "bending")
    assert b.demand == pytest.approx(2 * KIP * 1.25 * 16 * FT / 4, rel=1e-9)  # hand: PL/4 x 1.25


def test_typed_fields():
    job = parse_job_text(text(beam='braced = true\nbraces = ["12 ft", "4 ft"]',
                              criteria='basis = " First-Yield "\nimpact = "25%"\n'
                                       'deflection = "Hoist"'))
    assert job.braced is True
    assert job.braces == pytest.approx((4 * FT, 12 * FT))
    assert job.criteria.basis is Basis.FIRST_YIELD and basis_of(job) == "first-yield"
    assert job.criteria.impact == pytest.approx(0.25) and impact_of(job) == pytest.approx(0.25)
    assert job.criteria.deflection == "Hoist"
    assert job.criteria.deflection_preset == "hoist"
    assert job.criteria.deflection_ratio == DEFLECTION_PRESETS["hoist"][0]
    plain = parse_job_text(text())
    assert plain.criteria.basis is Basis.AUTO and basis_of(plain) == "asd"
    assert plain.criteria.impact is None and impact_of(plain) == 0.0
    assert plain.braces == () and plain.moving == ()


def test_wheel_sets_are_read_with_the_job():
    src = text() + """
[[moving]]
label = "trolley"
loads = ["-1000 lbf", "-1000 lbf"]
dead = ["-60 lbf", "-60 lbf"]
spacing = ["18 in"]
travel = ["1 ft", "15 ft"]
"""
    job = parse_job_text(src)
    (w,) = job.moving
    assert w.label == "trolley"
    assert w.live == pytest.approx((-1000 * LBF, -1000 * LBF))
    assert w.dead == pytest.approx((-60 * LBF, -60 * LBF))
    assert w.offsets == pytest.approx((0.0, 1.5 * FT))
    assert w.travel == pytest.approx((1 * FT, 15 * FT))


@pytest.mark.parametrize("bad, key", [
    ('impact = true', "criteria.impact"),
    ('impact = 3.5', "criteria.impact"),
    ('basis = 1', "criteria.basis"),
])
def test_criteria_values_are_checked_by_the_reader(bad, key):
    with pytest.raises(InputErrors) as e:
        parse_job_text(text(criteria=bad))
    assert [p.key for p in e.value.problems if not p.warning] == [key]


def test_no_module_outside_the_reader_reads_raw_toml():
    # the reader is the only code that parses job TOML into values; jobdoc, storage and the
    # library edit or index the text (the editor), and stock.py reads stock lists, not jobs
    assert "data" not in {f.name for f in fields(Job)}
    assert "extra" not in {f.name for f in fields(Criteria)}
    root = pathlib.Path(__file__).resolve().parents[1] / "shopbeam"
    allowed = {"jobs/jobfile.py", "jobs/jobdoc.py", "jobs/storage.py", "jobs/library.py",
               "members/stock.py"}
    offenders = []
    for path in root.rglob("*.py"):
        rel = path.relative_to(root).as_posix()
        tree = ast.parse(path.read_text(encoding="utf-8"))
        for node in ast.walk(tree):
            if isinstance(node, ast.Attribute) and node.attr == "data" and \
                    isinstance(node.value, ast.Name) and node.value.id == "job":
                offenders.append(f"{rel}: job.data")
            if isinstance(node, (ast.Import, ast.ImportFrom)) and rel not in allowed:
                names = [a.name for a in node.names] + [getattr(node, "module", "") or ""]
                if "tomllib" in names:
                    offenders.append(f"{rel}: imports tomllib")
    assert offenders == []


def test_library_compares_tags_as_the_reader_does(tmp_path, monkeypatch):
    from shopbeam.jobs import library

    shop = tmp_path / "shop"
    shop.mkdir()
    monkeypatch.setenv(library.ENV_USER, str(tmp_path / "user"))
    (shop / "hoist.toml").write_text(text(tags='["Lifting "]'), encoding="utf-8")
    found = [e for e in library.entries(shop, tag="lifting") if e.origin == "shop"]
    assert [e.name for e in found] == ["hoist"] and found[0].tags == ("lifting",)
    assert parse_job_text(text(tags='["Lifting "]')).tags == found[0].tags
