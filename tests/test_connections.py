"""What a fixed end's and a hinge's connection must carry under a wheel set: the largest over
every position of the wheels, not the one state that governs the member's checks."""

from __future__ import annotations

import numpy as np
import pytest

from shopbeam.design.analysis import analyze
from shopbeam.design.capacity import connections_at
from shopbeam.design.connections import fixed_end_moments, hinge_shears
from shopbeam.jobs.jobfile import parse_job_text

LBF, FT = 4.4482216152605, 0.3048
LBFFT = LBF * FT

TRACK = """schema = 1
title = "cart track"
tags = ["not-lifting", "not-rack"]
[beam]
length = "{L} ft"
section = "W8x18"
material = "A992"
self_weight = false
braced = true
{supports}
[[moving]]
label = "cart"
loads = ["-1000 lbf", "-1000 lbf"]
spacing = ["12 in"]
"""


def supports(*pairs):
    return "".join(f'[[supports]]\nat = "{a} ft"\ntype = "{k}"\n' for a, k in pairs)


def test_a_fixed_end_carries_the_largest_moment_over_every_position_of_the_wheels():
    # fixed-fixed, 10 ft, two 1000 lbf wheels 1 ft apart: each wheel gives M_A = P a b^2 / L^2
    # (AISC Manual Table 3-23 case 16, from memory); over every position the largest sum is
    # found here on a fine grid (2913 lbf*ft with the first wheel near 2.87 ft), where the
    # state governing the member's checks had shown 810 lbf*ft
    job = parse_job_text(TRACK.format(L=10, supports=supports((0, "fixed"), (10, "fixed"))))
    p = np.linspace(0.0, 9.0, 900_001)
    hand = max(((p * (10 - p) ** 2 + (p + 1) * (9 - p) ** 2) / 100 * 1000).max(),
               ((p ** 2 * (10 - p) + (p + 1) ** 2 * (9 - p)) / 100 * 1000).max())
    ends = fixed_end_moments(job, analyze(job).solution)
    assert [abs(e["moment"]) / LBFFT for e in ends] == pytest.approx([hand, hand], rel=1e-6)
    assert all(e["over"] == "over every position of the wheels" for e in ends)
    # at a factor k the figures scale with the wheels (no dead load here)
    at_k, _ = connections_at(job, 2.0)
    assert abs(at_k[0]["moment"]) / LBFFT == pytest.approx(2 * hand, rel=1e-6)


def test_a_gerber_hinge_passes_the_largest_shear_over_every_position():
    # fixed at 0, hinge at 10 ft, roller at 20 ft: the suspended span is simply supported,
    # so the hinge passes P (20 - a) / 10 of a wheel at a (statics): both wheels just past
    # the hinge give 1000 + 900 = 1900 lbf, and the fixed end then develops 10 x 1900 =
    # 19000 lbf*ft
    job = parse_job_text(TRACK.format(L=20, supports=supports((0, "fixed"), (10, "hinge"),
                                                              (20, "roller"))))
    sol = analyze(job).solution
    (h,) = hinge_shears(job, sol)
    assert abs(h["shear"]) / LBF == pytest.approx(1900, rel=1e-6)
    (f,) = fixed_end_moments(job, sol)
    assert abs(f["moment"]) / LBFFT == pytest.approx(19000, rel=1e-6)


def test_capacity_json_keys_its_fixed_ends_as_the_top_level_does(tmp_path):
    # docs/json.md: capacity.fixed_ends are "as the top-level fixed_ends" ({"at", "moment",
    # "shear"}); a script reading "shear" from either must find it
    import json
    import subprocess
    import sys

    p = tmp_path / "arm.toml"
    p.write_text(TRACK.format(L=10, supports=supports((0, "fixed"), (10, "fixed"))))
    r = subprocess.run([sys.executable, "-m", "shopbeam", "capacity", str(p), "--json"],
                       capture_output=True, text=True, timeout=120)
    d = json.loads(r.stdout)
    for e in d["fixed_ends"] + d["capacity"]["fixed_ends"]:
        assert {"at", "moment", "shear"} <= set(e)


@pytest.mark.parametrize("section, material, said, not_said", [
    ("W8X18", "A992", "fillet-welded flanges", "side plates"),
    ("2x10", "DF-L-2", "side plates", "flanges"),
    ('{ shape = "round-tube", od = "2 in", wall = "0.125 in" }', "6061-T6", "welded = true",
     "fillet-welded flanges"),
])
def test_a_fixed_end_connection_is_named_in_the_words_of_its_material(section, material, said,
                                                                    not_said):
    # common practice: a wood member's end moment is taken by a backspan, bolted side plates
    # or a bracket (it has no flanges to weld); welding an aluminium end weakens it there
    from shopbeam.design.connections import connection_notes
    sec = section if section.startswith("{") else f'"{section}"'
    job = parse_job_text(f'schema = 1\ntitle = "arm"\n[beam]\nlength = "3 ft"\nsection = {sec}\n'
                         f'material = "{material}"\nwelded = false\n[[supports]]\nat = "0 ft"\n'
                         'type = "fixed"\n[[loads]]\ntype = "uniform"\nvalue = "-20 lbf/ft"\n')
    notes = " ".join(connection_notes(job, analyze(job).solution))
    assert said in notes and not_said not in notes
