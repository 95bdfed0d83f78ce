"""The calc package and the plaque in a real headless Chromium: they render with no console
error, print to PDF with every sheet numbered and the diagrams present, and the numbers in
the PDF are the solution's.

Needs Chromium (Debian: apt-get install chromium) and pdftotext/pdfinfo (poppler-utils).
On a developer's machine without them these tests skip; under CI (CI=true) they FAIL, so a
missing install step cannot hide behind a green run (.ci/run installs both).
"""

from __future__ import annotations

import os
import re
import shutil
import subprocess
from pathlib import Path

import pytest

from shopbeam.design.analysis import analyze, to_json
from shopbeam.design.capacity import capacity
from shopbeam.jobs.jobfile import load_job, parse_job_text
from shopbeam.output import calcpackage as cp
from shopbeam.output import label
from shopbeam.output.pdf import browser_command, find_browser, print_pdf

from test_calcpackage import SIMPLE

PRESETS = Path(__file__).resolve().parents[1] / "presets"


def _need(tool: str | None, what: str) -> str:
    if tool:
        return tool
    if os.environ.get("CI", "").lower() == "true":
        pytest.fail(f"{what} is missing on CI: .ci/run must install it")
    pytest.skip(f"{what} not installed")


@pytest.fixture(scope="module")
def browser():
    return _need(find_browser(), "Chromium (apt-get install chromium)")


@pytest.fixture(scope="module")
def poppler():
    _need(shutil.which("pdftotext"), "pdftotext (apt-get install poppler-utils)")
    return _need(shutil.which("pdfinfo"), "pdfinfo (apt-get install poppler-utils)")


def _run_browser(browser, tmp_path, *args):
    profile = tmp_path / "profile"
    profile.mkdir(exist_ok=True)
    cmd = browser_command(browser, profile, "--enable-logging=stderr", "--v=0", *args)
    return subprocess.run(cmd, capture_output=True, text=True, timeout=120,
                          stdin=subprocess.DEVNULL)


def _console_errors(stderr: str) -> list[str]:
    """Lines the page itself logged (console messages, uncaught errors, failed loads)."""
    return [ln for ln in stderr.splitlines()
            if "CONSOLE" in ln or "Uncaught" in ln or "net::ERR" in ln
            or "Failed to load resource" in ln]


def _pdf_text(pdf: Path) -> tuple[int, str]:
    info = subprocess.run(["pdfinfo", str(pdf)], capture_output=True, text=True, timeout=60)
    pages = int(re.search(r"^Pages:\s+(\d+)", info.stdout, re.M).group(1))
    text = subprocess.run(["pdftotext", "-layout", str(pdf), "-"], capture_output=True,
                          text=True, timeout=60).stdout
    return pages, text


def test_package_renders_in_chromium_without_console_errors(browser, tmp_path):
    job = parse_job_text(SIMPLE, "simple.toml")
    page = tmp_path / "pkg.html"
    cp.write(cp.build(analyze(job), input_bytes=SIMPLE.encode()), page)
    r = _run_browser(browser, tmp_path, "--dump-dom", page.as_uri())
    assert r.returncode == 0, r.stderr[-2000:]
    dom = r.stdout
    # the browser parsed the whole document: every section, the four diagrams, the input
    assert "9. Program and input" in dom and 'id="shopbeam-input"' in dom
    assert len(re.findall(r"<svg[^>]*data-diagram=", dom)) == 4
    assert "max 1250 lbf*ft at 5 ft" in dom
    assert _console_errors(r.stderr) == []


def test_package_prints_to_pdf_with_sheets_and_diagrams(browser, poppler, tmp_path):
    job = parse_job_text(SIMPLE, "simple.toml")
    pkg = cp.build(analyze(job), input_bytes=SIMPLE.encode())
    out = tmp_path / "pkg.pdf"
    assert cp.write(pkg, out) == "pdf"
    pages, text = _pdf_text(out)
    assert pages >= 3
    # every sheet numbered "Sheet x of y" with the true page count (CSS page counters)
    for n in range(1, pages + 1):
        assert f"Sheet {n} of {pages}" in text
    for title in ("SHEAR (lbf)", "MOMENT (lbf*ft)", "SLOPE (rad)", "DEFLECTION (in)"):
        assert title in text  # the diagrams' own titles, drawn in the SVG
    # hand statics (common practice): wL^2/8 = 1250 lbf*ft at mid-span, wL/2 = 500 lbf
    assert "max 1250 lbf*ft at 5 ft" in text
    assert "max 500 lbf at 0 ft" in text and "min -500 lbf at 10 ft" in text
    assert "SCREENING CHECK ONLY" in text and pkg.input_sha256 in text.replace("\n", "")


@pytest.mark.parametrize("preset, caution", [
    ("demo", "Screening check only - licensed engineer review required"),
    ("jib-arm", "LIFTING DEVICE - not for service without engineer design")])
def test_every_sheet_of_the_package_carries_the_caution(browser, poppler, tmp_path, preset,
                                                        caution):
    # a sheet taken out of the package (the diagrams, the checks) still says what it is
    path = PRESETS / f"{preset}.toml"
    pkg = cp.build(analyze(load_job(path)), input_bytes=path.read_bytes(),
                   input_name=str(path))
    out = tmp_path / "pkg.pdf"
    assert cp.write(pkg, out) == "pdf"
    pages, _ = _pdf_text(out)
    assert pages >= 3
    for n in range(1, pages + 1):
        sheet = subprocess.run(["pdftotext", "-f", str(n), "-l", str(n), str(out), "-"],
                               capture_output=True, text=True, timeout=60).stdout
        assert caution in " ".join(sheet.split()), n


def test_a_plaque_over_several_sheets_names_numbers_and_cautions_each(browser, poppler,
                                                                      tmp_path):
    # fifteen bins with long labels on a continuous shelf: the plaque runs past one sheet,
    # and a sheet taken off the wall on its own must still say what it is
    sup = "\n".join(f'[[supports]]\nat = "{5 * i} ft"\ntype = "{"pin" if i == 0 else "roller"}"'
                    for i in range(7))
    bins = "\n".join(f'[[loads]]\ntype = "point"\nat = "{1.5 + 2 * i} ft"\nvalue = "-150 lbf"\n'
                     f'label = "the bin of fasteners number {i + 1} that sits here on the '
                     f'shelf, with a long description of what is in it"\npatterned = true'
                     for i in range(15))
    text = ('schema = 1\ntitle = "Long shelf with many bins"\ntags = ["shelf", "not-rack"]\n'
            '[beam]\nlength = "30 ft"\nsection = "HSS4x2x1/4"\nmaterial = "A500-C"\n'
            f'restrained = true\n{sup}\n{bins}\n')
    job = parse_job_text(text, "long.toml")
    r = label.rating(capacity(job), analyze(job).unchecked)
    pdf = tmp_path / "plaque.pdf"
    pdf.write_bytes(print_pdf(label.plaque_html(r), browser))
    pages, _ = _pdf_text(pdf)
    assert pages >= 2
    for n in range(1, pages + 1):
        sheet = " ".join(subprocess.run(["pdftotext", "-f", str(n), "-l", str(n), str(pdf),
                                         "-"], capture_output=True, text=True,
                                        timeout=60).stdout.split())
        assert "Screening check only" in sheet and f"Sheet {n} of {pages}" in sheet, n
        assert "Load rating: Long shelf with many bins" in sheet, n


def test_preset_pdf_carries_the_json_extremes(browser, poppler, tmp_path):
    path = PRESETS / "demo.toml"
    job = load_job(path)
    result = analyze(job)
    html = cp.to_html(cp.build(result, input_bytes=path.read_bytes(), input_name=str(path),
                               paper="a4"))
    pdf = tmp_path / "demo.pdf"
    pdf.write_bytes(print_pdf(html, browser))
    pages, text = _pdf_text(pdf)
    info = subprocess.run(["pdfinfo", str(pdf)], capture_output=True, text=True).stdout
    assert "A4" in info or "595" in info  # A4 is 595 x 842 pt
    from shopbeam import units

    ex = to_json(result)["extremes"]
    for name, kind in (("moment", "moment"), ("shear", "force"), ("deflection", "small_length")):
        for which in ("max", "min"):
            assert units.fmt(ex[name][which], kind, "us") in text, (name, which)
    assert f"Sheet {pages} of {pages}" in text


def test_plaque_prints_on_one_page(browser, poppler, tmp_path):
    job = load_job(PRESETS / "pallet-rack-beam-pair.toml")
    r = label.rating(capacity(job), analyze(job).unchecked)
    pdf = tmp_path / "plaque.pdf"
    pdf.write_bytes(print_pdf(label.plaque_html(r), browser))
    pages, text = _pdf_text(pdf)
    assert pages == 1
    assert "LOAD RATING" in text and "PER LEVEL (pair of beams)" in text
    assert "rounded down from" in text and "SCREENING CHECK ONLY" in text


def test_a_long_plaque_still_prints_on_one_page(browser, poppler, tmp_path):
    # a rack bay: per-pallet, per-level, per-beam and per-bay figures and the rack notes
    text = (PRESETS / "pallet-rack-beam-pair.toml").read_text(encoding="utf-8")
    job = parse_job_text(text.replace("\nmembers = 2 ", "\nmembers = 2\nlevels = 4\n", 1))
    r = label.rating(capacity(job), analyze(job).unchecked)
    assert label._long(r)  # the compact type is used
    for paper in ("letter", "a4"):
        pdf = tmp_path / f"bay-{paper}.pdf"
        pdf.write_bytes(print_pdf(label.plaque_html(r, paper), browser))
        pages, got = _pdf_text(pdf)
        assert pages == 1, paper
        assert "PER BAY (4 levels)" in got and "upright frames" in got
