"""Shop stock list files (TOML and CSV): reading, prices, errors, ranking."""

from __future__ import annotations

import pytest

from shopbeam.errors import InputError, InputErrors
from shopbeam.members.stock import load_stock, parse_stock, rank

IN = 0.0254
FT = 0.3048

TOML = """
currency = "USD"

[[stock]]
section = "HSS4x4x1/4"
price_per_ft = 18.40
material = "A500-C"
note = "rack 3"

[[stock]]
section = "rect-tube 2 x 1 x 14ga"
price = "$4.10/ft"
material = "A513"

[[stock]]
section = "W8x31"
price_per_m = 95.0

[[stock]]
section = { shape = "rect-bar", depth = "3 in", width = "1/4 in" }
"""

CSV = """# what the yard has, June
section,price_per_ft,material,note
HSS4x4x1/4,18.40,A500-C,rack 3
"rect-tube 2 x 1 x 14ga",4.10,A513,

W8x31,,,
"""


def test_toml_stock(tmp_path):
    f = tmp_path / "stock.toml"
    f.write_text(TOML)
    st = load_stock(f)
    assert len(st) == 4 and st.currency == "USD" and st.has_prices
    hss, tube, w, bar = st.items
    assert hss.section.designation == "HSS4X4X1/4" and hss.material == "A500-C"
    assert hss.price_per_ft == pytest.approx(18.40) and hss.note == "rack 3"
    assert hss.cost(10 * FT) == pytest.approx(184.0)
    # A513 as-welded mechanical tube: 0.93 x nominal wall (14 ga Birmingham = 0.083 in;
    # AISC 360-16 B4.2's ERW rule)
    assert tube.section.dims["t_des"] == pytest.approx(0.93 * 0.083 * IN)
    assert tube.price_per_ft == pytest.approx(4.10)
    assert w.price_per_m == pytest.approx(95.0)
    assert bar.price_per_m is None and bar.section.shape == "rect-bar"


def test_csv_stock(tmp_path):
    f = tmp_path / "stock.csv"
    f.write_text(CSV)
    st = load_stock(f)
    assert [i.designation for i in st] == ["HSS4x4x1/4", "rect-tube 2 x 1 x 14ga", "W8x31"]
    assert [i.line for i in st] == [3, 4, 6]
    assert st.items[2].price_per_m is None
    assert st.items[1].section.dims["t_des"] == pytest.approx(0.93 * 0.083 * IN)


def test_extension_sniffed(tmp_path):
    f = tmp_path / "stock.list"
    f.write_text(TOML)
    assert len(load_stock(f)) == 4
    g = tmp_path / "other.list"
    g.write_text(CSV)
    assert len(load_stock(g)) == 3


def test_rank_by_weight_and_price():
    st = parse_stock(TOML, "toml")
    light = rank(st.items, "weight", density=7850)
    weights = [i.section.weight_per_length(7850) for i in light]
    assert weights == sorted(weights)
    cheap = rank(st.items, "price")
    assert [i.section.designation for i in cheap][:3] == [
        "rect-tube 2 x 1 x 14ga", "HSS4X4X1/4", "W8X31"]  # 4.10/ft, 18.40/ft, 95/m
    assert cheap[-1].price_per_m is None  # unpriced last
    with pytest.raises(ValueError):
        rank(st.items, "colour")


@pytest.mark.parametrize("text, kind, line, words", [
    ("section,price_per_ft\nHSS4x4x3/4,10\n", "csv", 2, "did you mean"),
    ("section,price_per_ft\nHSS4x4x1/4,ten\n", "csv", 2, "not a number"),
    ("sektion,price\nHSS4x4x1/4,1\n", "csv", 1, "header"),
    ("section,prise_per_ft\nHSS4x4x1/4,1\n", "csv", 1, "did you mean 'price_per_ft'"),
    ("section,price_per_ft\n", "csv", 1, "no stock rows"),
    ("[[stock]\nsection = 1", "toml", 1, "not valid TOML"),
    ("[[stock]]\nsection = \"HSS4x4x1/4\"\nprice = \"18.40\"\n", "toml", None, "per length"),
    ("[[stock]]\nsection = \"HSS4x4x1/4\"\nprice_per_ft = \"18\"\n", "toml", None,
     "plain number"),
    ("[[stock]]\nsection = \"HSS4x4x1/4\"\nmaterial = \"A501\"\n", "toml", None,
     "did you mean"),
    ("[[stock]]\nprice_per_ft = 3\n", "toml", None, "needs a section"),
    ("title = \"x\"\n", "toml", None, "unknown key"),
])
def test_bad_stock_lists(text, kind, line, words):
    with pytest.raises(InputError) as exc:
        parse_stock(text, kind, file="stock.x")
    p = exc.value.problem
    assert words in p.message
    assert p.file == "stock.x"
    assert p.line == line


def test_toml_problem_names_the_entry():
    with pytest.raises(InputError) as exc:
        parse_stock('[[stock]]\nsection = "HSS4x4x1/4"\n[[stock]]\nsection = "W8x32"\n', "toml")
    assert exc.value.problem.key == "stock[2].section"


def test_several_problems_reported_together():
    with pytest.raises(InputErrors) as exc:
        parse_stock("section,price_per_ft\nW8x32,1\nHSS4x4x1/4,x\n", "csv", file="s.csv")
    assert [p.line for p in exc.value.problems] == [2, 3]


def test_missing_file(tmp_path):
    with pytest.raises(InputError) as exc:
        load_stock(tmp_path / "nope.toml")
    assert "not found" in exc.value.problem.message


def test_a_row_whose_section_cannot_be_made_in_its_material_is_refused_with_its_line():
    # as a job file refuses a W shape in wood; a carbon-steel catalog shape in aluminium has
    # properties that are not the member's
    text = ("section,material\nW8x18,A992\nW6x12,DF-L-2\nHSS6x4x1/4,6061-T6\n2x10,A36\n")
    with pytest.raises(InputErrors) as exc:
        parse_stock(text, "csv", file="s.csv")
    got = {p.line: p.message for p in exc.value.problems}
    assert sorted(got) == [3, 4, 5]
    assert "not made in wood" in got[3] and "carbon-steel catalog shape" in got[4]
    assert "lumber size" in got[5]
