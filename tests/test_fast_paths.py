"""Reading fast paths: plain shop quantities without pint, and the shipped catalog key index.
Each must give what the full path gives."""

from __future__ import annotations

import json
from importlib import resources

import pytest
from hypothesis import given, settings
from hypothesis import strategies as st

from shopbeam import units
from shopbeam.errors import InputError
from shopbeam.members import catalog

UNITS = {"length": ["ft", "in", "m", "mm", "cm"], "force": ["lbf", "kip", "N", "kN"],
         "line_load": ["lbf/ft", "lbf/in", "N/m", "kN/m"],
         "moment": ["lbf*ft", "lbf*in", "N*m", "kN*m"], "stress": ["psi", "ksi", "MPa"]}


@settings(max_examples=300, deadline=None, derandomize=True)
@given(st.sampled_from(sorted(UNITS)), st.data())
def test_plain_quantities_read_as_the_full_parser_reads_them(kind, data):
    unit = data.draw(st.sampled_from(UNITS[kind]))
    whole = data.draw(st.integers(0, 99999))
    frac = data.draw(st.sampled_from(["", ".", ".5", ".125", ".0625", ".3"]))
    sign = data.draw(st.sampled_from(["", "-", "+"]))
    text = f"{sign}{whole}{frac} {unit}"
    fast = units.plain_value(text, kind)
    assert fast is not None
    full = units._parse_full(text, kind)
    assert fast == pytest.approx(full, rel=1e-15, abs=1e-300)


@pytest.mark.parametrize("text, ft", [("10 ft 6 in", 10.5), ("-3 ft 1.5 in", -3.125),
                                      ("0 ft 9 in", 0.75)])
def test_feet_and_inches(text, ft):
    assert units.plain_value(text, "length") == pytest.approx(ft * 0.3048, rel=1e-15)
    assert units.parse(text, "length") == pytest.approx(units._parse_full(text, "length"),
                                                        rel=1e-15)


@pytest.mark.parametrize("text, kind", [("12 FT", "length"), ("400#", "force"),
                                        ("1-1/2 in", "length"), ("10' 6\"", "length"),
                                        ("1e3 N", "force"), ("12 ft", "force"),
                                        ("12", "length"), ("2 ft-lb", "moment")])
def test_anything_else_goes_to_the_full_parser(text, kind):
    assert units.plain_value(text, kind) is None


def test_the_fast_path_keeps_the_sign_rules():
    with pytest.raises(InputError):
        units.parse("0 ft", "length", positive=True)
    with pytest.raises(InputError):
        units.parse("-2 ft", "length", nonnegative=True)


def test_shipped_catalog_key_index_is_the_table_rebuilt():
    shipped = json.loads(resources.files("shopbeam").joinpath(catalog.AISC_KEYS_FILE)
                         .read_text("utf-8"))
    assert shipped["lines"] == len(catalog._aisc_lines())
    assert shipped["keys"] == catalog.aisc_key_index()


@pytest.mark.parametrize("name", ["W8x18", "HSS4x4x1/4", "C6x8.2", "L2x2x3/16", "S8x18.4",
                                  "Pipe2STD"])
def test_lookup_by_index_finds_the_tabulated_row(name):
    # AISC Shapes Database v15.0: the row's own label comes back
    sec = catalog.lookup(name)
    assert catalog.canon(sec.designation) == catalog.canon(name)
