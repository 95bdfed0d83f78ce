"""size --kind all: every catalog kind of the job's family in one result."""

from __future__ import annotations

from dataclasses import replace

from shopbeam.design.loading import evaluate
from shopbeam.design.sizing import size
from shopbeam.jobs.jobfile import parse_job_text

JOB = """schema = 1
title = "bracket arm"
[beam]
length = "4 ft"
section = "HSS3x2x3/16"
material = "A500-C"
[[supports]]
at = "0 ft"
type = "fixed"
[[loads]]
type = "point"
at = "4 ft"
value = "-400 lbf"
"""


def test_all_kinds_are_swept_once_each_and_the_lightest_really_passes():
    job = parse_job_text(JOB)
    res = size(job, "all", with_capacity=False)
    names = [r.designation for r in res.rows]
    assert len(names) == len(set(names))
    prefixes = {n.split()[0][:2] for n in names}
    assert {"W8", "HS", "C6"} & prefixes and len(prefixes) > 5
    assert not any("lumber" in r.section.shape for r in res.rows)
    best = res.lightest
    assert best is not None
    direct = evaluate(replace(job, section=best.section, material=best.material))
    assert max(c.ratio for c in direct.checks) <= 1.0
    assert all(not r.ok for r in res.rows if r.weight < best.weight)
