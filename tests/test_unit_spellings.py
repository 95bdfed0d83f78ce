"""Unit spellings a shop writes: hyphenated moments, # for pounds, capitals and plurals, Nm.

Expected values are exact conversions: 1 ft = 0.3048 m and 1 in = 0.0254 m (international
foot and inch, 1959), 1 lb = 0.45359237 kg, 1 lbf = 0.45359237 kg x 9.80665 m/s^2
(standard gravity, CGPM 1901), 1 kip = 1000 lbf."""

from __future__ import annotations

import pytest

from shopbeam import units
from shopbeam.errors import InputError

LBF = 0.45359237 * 9.80665
FT, IN = 0.3048, 0.0254


@pytest.mark.parametrize("text, expected", [
    ("150 ft-lb", 150 * LBF * FT),
    ("150 lb-ft", 150 * LBF * FT),
    ("150 lbf-ft", 150 * LBF * FT),
    ("150 ft-lbs", 150 * LBF * FT),
    ("150 in-lb", 150 * LBF * IN),
    ("150 in-lbs", 150 * LBF * IN),
    ("2 kip-ft", 2000 * LBF * FT),
    ("2 k-ft", 2000 * LBF * FT),
    ("2 ft-kips", 2000 * LBF * FT),
    ("135 Nm", 135.0),
    ("135 N-m", 135.0),
    ("135 N.m", 135.0),
    ("1.2 kN-m", 1200.0),
    ("1.2 kNm", 1200.0),
    ("-150 FT-LB", -150 * LBF * FT),
])
def test_moment_spellings(text, expected):
    assert units.parse(text, "moment") == pytest.approx(expected, rel=1e-12)


@pytest.mark.parametrize("text, expected", [
    ("400#", 400 * LBF),
    ("400 #", 400 * LBF),
    ("-400#", -400 * LBF),
    ("400 LB", 400 * LBF),
    ("400 Lbs", 400 * LBF),
    ("400 LBS", 400 * LBF),
    ("400 LBF", 400 * LBF),
    ("2 Kips", 2000 * LBF),
    ("2 KIPS", 2000 * LBF),
    ("2 k", 2000 * LBF),
    ("3 KN", 3000.0),
])
def test_force_spellings(text, expected):
    assert units.parse(text, "force") == pytest.approx(expected, rel=1e-12)


@pytest.mark.parametrize("text, kind, expected", [
    ("6 FT", "length", 6 * FT),
    ("6 Ft", "length", 6 * FT),
    ("6 feet", "length", 6 * FT),
    ("10 IN", "length", 10 * IN),
    ("10 Inches", "length", 10 * IN),
    ("300 MM", "length", 0.3),
    ("25 PLF", "line_load", 25 * LBF / FT),
    ("25 #/ft", "line_load", 25 * LBF / FT),
    ("2 K/FT", "line_load", 2000 * LBF / FT),
    ("36 KSI", "stress", 36000 * LBF / IN**2),
    ("40 PSF", "area_load", 40 * LBF / FT**2),
])
def test_capitals_plurals_and_pound_signs(text, kind, expected):
    assert units.parse(text, kind) == pytest.approx(expected, rel=1e-12)


def test_shop_notation_still_reads():
    assert units.parse("10' 6 1/2\"", "length") == pytest.approx(10 * FT + 6.5 * IN)
    assert units.parse("10 ft 6 in", "length") == pytest.approx(10 * FT + 6 * IN)
    assert units.parse("1-1/2 in", "length") == pytest.approx(1.5 * IN)


@pytest.mark.parametrize("text, inches", [("10\u00bd ft", 126.0), ("10 \u00bd ft", 126.0),
                                          ("\u00bd in", 0.5), ("3\u00be\"", 3.75),
                                          ("1\u20442 in", 0.5), ("5 ft 6\u215b in", 66.125)])
def test_fraction_characters_read_as_the_fractions_they_are(text, inches):
    # "10½ ft" had been refused as the unknown unit "½ ft" (the unit was never the problem)
    assert units.parse(text, "length") == pytest.approx(inches * IN, rel=1e-12)


def test_a_refused_unit_lists_what_to_write():
    with pytest.raises(InputError) as e:
        units.parse("150 ft-lbz", "moment", "loads[0].value")
    msg = str(e.value)
    assert "unknown unit" in msg and "ft-lb" in msg and "kN*m" in msg and "Nm" in msg
    with pytest.raises(InputError) as e:
        units.parse("3 kg", "length")
    assert "ft, in" in str(e.value)


def test_a_moment_where_a_force_is_expected_is_still_refused():
    with pytest.raises(InputError) as e:
        units.parse("150 ft-lb", "force")
    assert "a force is expected" in str(e.value)


def test_fraction_characters_that_do_not_make_one_number_say_so():
    # "2½½ ft" had been refused as the unknown unit "/2 ft", text the user never typed
    with pytest.raises(InputError) as e:
        units.parse("2\u00bd\u00bd ft", "length", "beam.length")
    assert "fraction characters" in str(e.value) and "unknown unit" not in str(e.value)


@pytest.mark.parametrize("kind, example", [("line_load", "lbf/ft"), ("force", "lbf"),
                                           ("moment", "lbf*ft"), ("length", "ft")])
def test_an_unreadable_value_gets_an_example_of_its_own_kind(kind, example):
    from shopbeam import units
    from shopbeam.errors import InputError

    with pytest.raises(InputError) as e:
        units.parse("lbs/FT!", kind, "loads[1].value")
    assert example in str(e.value)


@pytest.mark.parametrize("text, kind, expected", [
    # pint's own unit names, written with underscores or spaced powers, read as pint reads
    # them (the job file's values are pint strings; shop spellings come on top)
    ("-1000 pound_force", "force", -1000 * LBF),
    ("-1000 force_pound", "force", -1000 * LBF),
    ("-2 kilogram_force", "force", -2 * 9.80665),
    ("-25 pound_force / foot", "line_load", -25 * LBF / FT),
    ("150 foot_pound", "moment", 150 * LBF * FT),
    ("490 pound / foot ** 3", "density", 490 * 0.45359237 / FT**3),
    ("3.37 in ^ 2", "area", 3.37 * IN**2),
])
def test_pint_unit_names_read_as_pint_reads_them(text, kind, expected):
    assert units.parse(text, kind) == pytest.approx(expected, rel=1e-12)


@pytest.mark.parametrize("width, inches", [("16 in o.c.", 16.0), ('16" OC', 16.0),
                                           ("24 in on center", 24.0), ("24 in o.c", 24.0),
                                           ("400 mm c/c", 400 / 25.4),
                                           ("600 mm centres", 600 / 25.4)])
def test_a_tributary_width_written_as_a_joist_spacing_reads_as_that_spacing(width, inches):
    # joists are spaced "16 in o.c." (on centre) in every shop's words: the width a load per
    # area acts over is that spacing (it was refused as an unknown unit, exit 2)
    from shopbeam.jobs.jobfile import parse_job_text
    job = parse_job_text(  # a TOML literal string: the inch mark needs no escape
        'schema = 1\ntitle = "joist"\ntags = ["not-floor"]\n[beam]\nlength = "10 ft"\n'
        'section = "2x10"\nmaterial = "DF-L-2"\n[[supports]]\nat = "0 ft"\ntype = "pin"\n'
        '[[supports]]\nat = "10 ft"\ntype = "roller"\n[[loads]]\ntype = "uniform"\n'
        f"value = \"-40 psf\"\nwidth = '{width}'\n")
    w = job.loads[0].w1  # N/m: 40 psf x the spacing
    assert w == pytest.approx(-40 * 47.880259 * inches * 0.0254, rel=1e-6)


def test_a_width_of_only_spacing_words_is_still_refused():
    from shopbeam.errors import InputErrors
    from shopbeam.jobs.jobfile import parse_job_text
    with pytest.raises((InputError, InputErrors)) as exc:
        parse_job_text(
            'schema = 1\ntitle = "joist"\n[beam]\nlength = "10 ft"\nsection = "2x10"\n'
            'material = "DF-L-2"\n[[supports]]\nat = "0 ft"\ntype = "pin"\n[[supports]]\n'
            'at = "10 ft"\ntype = "roller"\n[[loads]]\ntype = "uniform"\nvalue = "-40 psf"\n'
            'width = "o.c."\n')
    assert "width" in str(exc.value)
