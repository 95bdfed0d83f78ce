"""Gauge tables and the wall-thickness reader."""

from __future__ import annotations

import pytest

from shopbeam.members import gauges
from shopbeam.errors import InputError

IN = 0.0254


# Birmingham wire gauge for tube walls: the figures the trade quotes (from memory; the same
# three are given in the project's issue text: 14 ga = 0.083, 11 ga = 0.120, 16 ga = 0.065 in)
@pytest.mark.parametrize("text, inches", [
    ("14 ga", 0.083), ("11 ga", 0.120), ("16ga", 0.065), ("13 gauge", 0.095), ("#18", 0.049),
    ("10 ga", 0.134), ("7 ga", 0.180), ("20 ga", 0.035), ("12 GA", 0.109),
])
def test_tube_wall_by_birmingham_gauge(text, inches):
    t, note = gauges.parse_wall(text, "beam.section.wall", "tube")
    assert t == pytest.approx(inches * IN, rel=1e-12)
    assert "Birmingham" in note


# Manufacturers' Standard Gauge for sheet steel (from memory), 14 ga = 0.0747 in
@pytest.mark.parametrize("n, inches", [(14, 0.0747), (11, 0.1196), (16, 0.0598), (10, 0.1345),
                                       (12, 0.1046), (18, 0.0478), (7, 0.1793), (3, 0.2391)])
def test_sheet_by_manufacturers_standard_gauge(n, inches):
    t, note = gauges.parse_wall(f"{n} ga", "", "sheet")
    assert t == pytest.approx(inches * IN, rel=1e-12)
    assert "Manufacturers' Standard Gauge" in note


def test_msg_table_follows_its_weight_basis():
    # The Manufacturers' Standard Gauge is defined from sheet weight: thickness = (lb/ft^2) /
    # 41.82 lb/ft^2 per inch (from memory); gauge 3 weighs 10 lb/ft^2 and each gauge down to
    # 14 is 0.625 lb/ft^2 lighter, then the steps of the published table (from memory).
    weights = {3: 10.0, 4: 9.375, 5: 8.75, 6: 8.125, 7: 7.5, 8: 6.875, 9: 6.25, 10: 5.625,
               11: 5.0, 12: 4.375, 13: 3.75, 14: 3.125, 15: 2.8125, 16: 2.5, 17: 2.25,
               18: 2.0, 19: 1.75, 20: 1.5, 21: 1.375, 22: 1.25, 23: 1.125, 24: 1.0,
               25: 0.875, 26: 0.75, 27: 0.6875, 28: 0.625, 29: 0.5625, 30: 0.5}
    assert set(weights) == set(gauges.MSG)
    for n, w in weights.items():
        assert gauges.MSG[n] == pytest.approx(w / 41.82, abs=0.00006), n


def test_tables_decrease_with_gauge_number():
    for name, (_, table) in gauges.TABLES.items():
        ns = sorted(table)
        assert all(table[a] > table[b] for a, b in zip(ns, ns[1:])), name


def test_awg_by_its_defining_formula():
    # American wire gauge 10 = 0.1019 in, 0000 would be 0.46 in (common practice)
    assert gauges.AWG[10] == pytest.approx(0.1019, abs=5e-5)
    assert gauges.AWG[0] == pytest.approx(0.3249, abs=5e-5)
    t, note = gauges.parse_wall("14 ga awg", "", "tube")
    assert t == pytest.approx(0.0641 * IN, abs=1e-7) and "American" in note


def test_named_table_overrides_shape():
    t, note = gauges.parse_wall("14 ga msg", "", "tube")
    assert t == pytest.approx(0.0747 * IN)


def test_zero_gauges():
    assert gauges.gauge_number("00 ga") == (-1, None)
    assert gauges.gauge_number("3/0 ga") == (-2, None)
    t, _ = gauges.parse_wall("0000 ga", "", "tube")
    assert t == pytest.approx(0.454 * IN)


def test_lengths_pass_through():
    t, note = gauges.parse_wall("1/8 in", "k", "tube")
    assert t == pytest.approx(0.125 * IN) and note == ""
    t, _ = gauges.parse_wall("3 mm", "k", "tube")
    assert t == pytest.approx(0.003)


@pytest.mark.parametrize("text, words", [("40 ga", "not in the Birmingham"), ("14", "unit"),
                                         ("thin", "cannot read"), (None, "wall thickness")])
def test_bad_walls(text, words):
    with pytest.raises(InputError) as exc:
        gauges.parse_wall(text, "beam.section.wall", "tube")
    assert words in exc.value.problem.message
    assert exc.value.problem.key == "beam.section.wall"


def test_plate_and_strip_gauges_use_the_sheet_table():
    from shopbeam.members import catalog
    from shopbeam.members.resolve import resolve_section

    # Manufacturers' Standard Gauge (from memory): 11 ga = 0.1196 in, 3 ga = 0.2391 in
    strip = resolve_section({"shape": "flat-bar", "depth": "2 in", "width": "11 ga"})
    assert strip.dims["b"] == pytest.approx(0.1196 * IN)
    assert "Manufacturers' Standard Gauge" in strip.source
    plated = resolve_section({"shape": "cover-plated", "base": "W8x31",
                              "plate_width": "8 in", "plate_thickness": "3 ga"})
    assert plated.dims["plate_t"] == pytest.approx(0.2391 * IN)
    described = catalog.lookup("flat-bar 2 x 11ga")
    assert described.dims["b"] == pytest.approx(0.1196 * IN)
    # while tube walls in the same words use the Birmingham gauge: 11 ga = 0.120 in
    tube = catalog.lookup("rect-tube 2 x 1 x 11ga")
    assert tube.dims["t_nom"] == pytest.approx(0.120 * IN)
