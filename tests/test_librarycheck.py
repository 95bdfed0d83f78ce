"""`library check`: one line per job of a library, broken jobs included, and a CSV."""

from __future__ import annotations

import csv
import io

import pytest

from shopbeam.jobs import library
from shopbeam.output import librarycheck as lc

from test_calcpackage import SIMPLE


@pytest.fixture
def shop(tmp_path, monkeypatch):
    shop, user = tmp_path / "shop", tmp_path / "user"
    shop.mkdir()
    user.mkdir()
    monkeypatch.setenv(library.ENV_USER, str(user))
    monkeypatch.delenv(library.ENV_SHOP, raising=False)
    (shop / "good.toml").write_text(SIMPLE, encoding="utf-8")
    (shop / "tiny.toml").write_text(SIMPLE.replace("HSS4x4x1/4", "HSS2x1x1/8")
                                    .replace("-100 lbf/ft", "-900 lbf/ft"), encoding="utf-8")
    (shop / "broken.toml").write_text("schema = 1\ntitle = \"x\"\n[beam\n", encoding="utf-8")
    (shop / "nobeam.toml").write_text("schema = 1\ntitle = \"no beam\"\n", encoding="utf-8")
    return shop


def test_every_job_is_a_line_pass_fail_or_error(shop):
    rows = {r.job: r for r in lc.check_library(str(shop), "shop")}
    assert set(rows) == {"shop:good", "shop:tiny", "shop:broken", "shop:nobeam"}
    assert rows["shop:good"].result == "PASS" and rows["shop:good"].ratio < 1
    assert "max uniform load" in rows["shop:good"].rated_load
    assert rows["shop:tiny"].result == "FAIL" and rows["shop:tiny"].ratio > 1
    assert rows["shop:broken"].result == "ERROR" and rows["shop:broken"].problem
    assert rows["shop:nobeam"].result == "ERROR" and "beam" in rows["shop:nobeam"].problem
    text = lc.to_text(list(rows.values()))
    assert "4 jobs: 1 pass, 1 fail, 2 could not be checked" in text


def test_csv_has_a_header_and_a_row_per_job(shop):
    rows = lc.check_library(str(shop), "shop")
    got = list(csv.DictReader(io.StringIO(lc.to_csv(rows))))
    assert [g["job"] for g in got] == [r.job for r in rows]
    good = next(g for g in got if g["job"] == "shop:good")
    assert good["result"] == "PASS" and float(good["ratio"]) == pytest.approx(
        next(r.ratio for r in rows if r.job == "shop:good"), abs=1e-3)
    assert good["title"] == "Simple span, hand case"


def test_bundled_library_all_pass(shop):
    rows = lc.check_library(None, "bundled")
    assert len(rows) >= 12 and all(r.result == "PASS" for r in rows)


def test_a_title_that_reads_as_a_formula_is_kept_as_text_in_the_csv(shop):
    # OWASP's advice on CSV injection (a cell starting with = + - @ is run as a formula by
    # a spreadsheet): the title gets a leading apostrophe; numbers stay numbers
    (shop / "formula.toml").write_text(
        SIMPLE.replace('title = "Simple span, hand case"',
                       'title = "=HYPERLINK(\\"http://x\\",\\"ok\\")"'), encoding="utf-8")
    rows = lc.check_library(str(shop), "shop")
    got = {g["job"]: g for g in csv.DictReader(io.StringIO(lc.to_csv(rows)))}
    assert got["shop:formula"]["title"] == "'=HYPERLINK(\"http://x\",\"ok\")"
    assert float(got["shop:good"]["ratio"]) > 0


def test_the_library_check_carries_the_cautions_and_marks_lifting_devices():
    # every screen that posts a rated load carries the screening caution, and a lifting
    # device's row the stronger one (text and CSV)
    from shopbeam.output.librarycheck import check_library, to_csv, to_text
    rows = check_library(origin="bundled")
    text = to_text(rows)
    assert "SCREENING CHECK ONLY" in text and "licensed professional" in " ".join(text.split())
    jib = next(ln for ln in text.splitlines() if ln.startswith("bundled:jib-arm"))
    shelf = next(ln for ln in text.splitlines() if ln.startswith("bundled:wall-shelf"))
    assert "LIFTING DEVICE" in jib and "LIFTING DEVICE" not in shelf
    import csv
    import io
    got = {r["job"]: r for r in csv.DictReader(io.StringIO(to_csv(rows)))}
    assert got["bundled:jib-arm"]["caution"].startswith("LIFTING DEVICE")
    assert got["bundled:wall-shelf-brackets"]["caution"].startswith("Screening check only")
