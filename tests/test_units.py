"""Shop notation and unit handling at the input boundary.

Conversion factors are exact by definition: 1 ft = 0.3048 m and 1 in = 0.0254 m
(international yard and pound agreement, 1959); 1 lbf = 4.4482216152605 N (standard gravity
9.80665 m/s^2, CGPM 1901).
"""

from __future__ import annotations

import pytest

from shopbeam import units
from shopbeam.errors import InputError

IN, FT, LBF = 0.0254, 0.3048, 4.4482216152605


@pytest.mark.parametrize("text, inches", [
    ("1-1/2 in", 1.5),
    ("1 1/2 in", 1.5),      # pint alone reads this as 0.5 in
    ("10 ft 6 in", 126.0),  # pint alone reads this as an area
    ("10' 6\"", 126.0),
    ("10'-6 1/2\"", 126.5),
    ("3/16 in", 0.1875),
    ("12 ft", 144.0),
    ("0.25 in", 0.25),
    ("6 mm", 6 / 25.4),
    ("2.4 m", 2400 / 25.4),
    ("10\u2032 6\u2033", 126.0),  # typographic feet and inch marks
    ("-1-1/2 in", -1.5),
])
def test_shop_lengths(text, inches):
    assert units.parse(text, "length") == pytest.approx(inches * IN, rel=1e-12)


@pytest.mark.parametrize("text, kind, si", [
    ("-300 lbf", "force", -300 * LBF),
    ("-500 lb", "force", -500 * LBF),  # shop people say lb for a weight
    ("-1.2 kN", "force", -1200.0),
    ("-25 lbf/ft", "line_load", -25 * LBF / FT),
    ("-25 plf", "line_load", -25 * LBF / FT),
    ("-10 pli", "line_load", -10 * LBF / 0.0254),  # pound per linear inch (common practice)
    ("355 N/mm2", "stress", 355e6),  # a power straight after its unit, as mill certs write it
    ("7850 kg/m3", "density", 7850.0),
    ("150 lbf*ft", "moment", 150 * LBF * FT),
    ("125 psf", "area_load", 125 * LBF / FT**2),
    ("36 ksi", "stress", 36e3 * LBF / IN**2),
    ("490 lb/ft^3", "density", 490 * 0.45359237 / FT**3),
    ("7.80 in^4", "inertia", 7.80 * IN**4),
    ("2000 lbf/in", "stiffness", 2000 * LBF / IN),
])
def test_other_kinds(text, kind, si):
    assert units.parse(text, kind) == pytest.approx(si, rel=1e-12)


@pytest.mark.parametrize("text, kind, words", [
    ("12", "length", "bare number"),
    ("300 lbf", "length", "a force"),
    ("8 ft", "force", "a length"),
    ("nan ft", "length", "cannot read"),
    ("1e400 ft", "length", "not a finite"),
    ("10 ft 6 lbf", "length", "cannot add"),
    ("3 furlongz", "length", "unknown unit"),
    ("1/0 in", "length", "cannot read"),
])
def test_bad_values_say_what_is_wrong(text, kind, words):
    with pytest.raises(InputError) as e:
        units.parse(text, kind, "beam.length")
    assert words in str(e.value) and "beam.length" in str(e.value)


def test_non_string_is_refused():
    with pytest.raises(InputError, match="in quotes"):
        units.parse(12, "length")


def test_positive_and_display():
    with pytest.raises(InputError, match="greater than zero"):
        units.parse("0 ft", "length", positive=True)
    assert units.fmt(3.6576, "length", "us") == "12 ft"
    assert units.fmt(0.0254, "small_length", "us") == "1 in"
    assert units.fmt(1000.0, "force", "si") == "1 kN"


def test_one_registry_for_the_process():
    assert units.ureg() is units.ureg()


# Shop notation, common practice (no source): a compound value runs from the larger unit to
# the smaller, each part under one of the unit before it, and the fraction of a mixed number
# is under one. Anything else adds up, but is more often a slipped digit than meant.
@pytest.mark.parametrize("text, words", [
    ("10 ft 13 in", "the 13 in after the ft is one ft or more"),
    ("1 ft 12 in", "the 12 in after the ft"),
    ("1 m 1000 mm", "the 1000 mm after the m"),
    ("10 in 6 ft", "gives 'ft' after 'in'"),
    ("1 ft 1 ft", "gives 'ft' after 'ft'"),
    ("5 5/4 ft", "it would read 6 1/4"),
    ("5-3/2 ft", "it would read 6 1/2"),
])
def test_a_compound_value_that_is_likely_a_slip_is_refused(text, words):
    with pytest.raises(InputError) as got:
        units.parse(text, "length", "loads[0].at")
    assert words in str(got.value) and "loads[0].at" in str(got.value)


@pytest.mark.parametrize("text, inches", [
    ("10 ft 11.99 in", 131.99), ("3 ft 1-1/2 in", 37.5), ("2 ft 6-3/4 in", 30.75),
    ("10 ft 0 in", 120.0), ("10' 6\"", 126.0), ("10'-6\"", 126.0)])
def test_ordinary_feet_and_inches_still_read(text, inches):
    assert units.parse(text, "length") == pytest.approx(inches * 0.0254)


def test_a_compound_force_is_read_largest_first_only():
    assert units.parse("1 kip 500 lbf", "force") == pytest.approx(1500 * 4.4482216152605)
    with pytest.raises(InputError):
        units.parse("500 lbf 1 kip", "force")


def test_a_spring_stiffness_in_pounds_reads_as_loads_do():
    # "lb" is read as a pound-force for loads ("-400 lb"); a stiffness written "lb/in" alike
    assert units.parse("2000 lb/in", "stiffness") == pytest.approx(2000 * LBF / IN)
    assert units.parse("100 lb*ft/rad", "rot_stiffness") == pytest.approx(100 * LBF * FT)
