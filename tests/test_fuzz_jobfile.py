"""Fuzzing the job-file reader through the real command line.

Random and mutated TOML, wrong types, huge and tiny numbers, NaN and infinity, unicode,
deeply nested tables and 10,000 loads must all end the same way: exit 2 and one clean
message on stderr naming the file, never a traceback, never an internal error, never a
hang. A mutation that happens to leave a valid job may exit 0, but then it prints a report.
Most cases run in-process through `shopbeam.cli.main`; a handful run as a subprocess.
"""

from __future__ import annotations

import contextlib
import io
import math
import os
import subprocess
import sys
import time
from pathlib import Path

import pytest
from hypothesis import HealthCheck, given, settings
from hypothesis import strategies as st

from shopbeam.cli import main
from jobtext import CUSTOM_MEMBER

SETTINGS = dict(deadline=None, suppress_health_check=[HealthCheck.too_slow])

BASE = """\
schema = 1
title = "Fuzz base: rack arm"
units = "us"
tags = ["rack"]

[beam]
length = "10 ft"
self_weight = true

""" + CUSTOM_MEMBER + """
[[supports]]
at = "0 ft"
type = "pin"

[[supports]]
at = "8 ft"
type = "roller"

[[loads]]
type = "point"
at = "4 ft"
value = "-300 lbf"

[[loads]]
type = "uniform"
start = "0 ft"
end = "10 ft"
value = "-25 lbf/ft"

[[loads]]
type = "linear"
start = "2 ft"
end = "6 ft"
value = ["0 lbf/ft", "-60 lbf/ft"]

[[loads]]
type = "moment"
at = "10 ft"
value = "150 lbf*ft"

[criteria]
deflection = "L/240"
safety_factor = 1.67
"""


@pytest.fixture(scope="module")
def workdir(tmp_path_factory) -> Path:
    return tmp_path_factory.mktemp("fuzz")


_counter = [0]


def write(workdir: Path, content: str | bytes) -> Path:
    _counter[0] += 1
    p = workdir / f"job{_counter[0]}.toml"
    if isinstance(content, bytes):
        p.write_bytes(content)
    else:
        p.write_text(content, encoding="utf-8", errors="surrogatepass")
    return p


def run(args: list[str]) -> tuple[int, str, str, float]:
    out, err = io.StringIO(), io.StringIO()
    t0 = time.perf_counter()
    with contextlib.redirect_stdout(out), contextlib.redirect_stderr(err):
        rc = main(args)
    return rc, out.getvalue(), err.getvalue(), time.perf_counter() - t0


def assert_clean(rc: int, out: str, err: str, dt: float, path: Path, *, may_pass: bool) -> None:
    assert "Traceback" not in err and "Traceback" not in out
    assert "internal error" not in err, err
    if rc == 0 and may_pass:
        assert "SCREENING CHECK ONLY" in out or out.lstrip().startswith("{"), out[:300]
        return
    assert rc == 2, (rc, err[:500])
    assert err.startswith("shopbeam: "), err[:300]
    assert str(path) in err, err[:300]  # the message names the file
    assert out == "", "no numbers printed as if valid"
    # one message: a single line, or one block "N problems in the job:" + indented lines
    lines = err.rstrip("\n").split("\n")
    if len(lines) > 1:
        assert "problem" in lines[0], err[:300]
        assert all(ln.startswith("  ") for ln in lines[1:]), err[:500]


def check(workdir: Path, content, *, may_pass: bool = False, json: bool = False) -> str:
    p = write(workdir, content)
    args = ["solve", str(p)] + (["--json"] if json else [])
    rc, out, err, dt = run(args)
    assert_clean(rc, out, err, dt, p, may_pass=may_pass)
    return err


def test_base_job_solves(workdir):
    # the base job is valid, so every failure below comes from the fuzzing
    p = write(workdir, BASE)
    rc, out, err, _ = run(["solve", str(p)])
    assert rc == 0, err
    assert "SCREENING CHECK ONLY" in out


# ------------------------------------------------------------------ random text
@settings(max_examples=60, **SETTINGS)
@given(st.text(max_size=400))
def test_random_text(workdir, text):
    check(workdir, text)


@settings(max_examples=30, **SETTINGS)
@given(st.binary(max_size=300))
def test_random_bytes(workdir, data):
    check(workdir, data)


# ------------------------------------------------------------------ mutated TOML
BASE_LINES = BASE.splitlines(keepends=True)


@st.composite
def mutated(draw):
    text = BASE
    for _ in range(draw(st.integers(1, 4))):
        op = draw(st.sampled_from(["delete", "insert", "replace", "dup_line", "drop_line",
                                   "swap_lines"]))
        n = len(text)
        if op == "delete" and n:
            a = draw(st.integers(0, n - 1))
            b = draw(st.integers(a, min(n, a + 30)))
            text = text[:a] + text[b:]
        elif op == "insert":
            a = draw(st.integers(0, n))
            ins = draw(st.text(alphabet=st.sampled_from(list("[]{}=\"'#.,-+/\\ \n0123456789e"
                                                             "abcxyzé∞µ²\t")) | st.characters(),
                               min_size=1, max_size=8))
            text = text[:a] + ins + text[a:]
        elif op == "replace" and n:
            a = draw(st.integers(0, n - 1))
            text = text[:a] + draw(st.characters()) + text[a + 1:]
        else:
            lines = text.splitlines(keepends=True)
            if not lines:
                continue
            i = draw(st.integers(0, len(lines) - 1))
            j = draw(st.integers(0, len(lines) - 1))
            if op == "dup_line":
                lines.insert(j, lines[i])
            elif op == "drop_line":
                del lines[i]
            else:
                lines[i], lines[j] = lines[j], lines[i]
            text = "".join(lines)
    return text


@settings(max_examples=150, **SETTINGS)
@given(mutated())
def test_mutated_toml(workdir, text):
    check(workdir, text, may_pass=True)


# ------------------------------------------------------------------ wrong types and values
def toml_value(v) -> str:
    """A Python value as TOML text (enough for the fuzzing; nan and inf included)."""
    if isinstance(v, bool):
        return "true" if v else "false"
    if isinstance(v, int):
        return str(v)
    if isinstance(v, float):
        if math.isnan(v):
            return "nan"
        if math.isinf(v):
            return "inf" if v > 0 else "-inf"
        return repr(v)
    if isinstance(v, str):
        return '"' + v.replace("\\", "\\\\").replace('"', '\\"').replace("\n", "\\n") \
            .replace("\r", "\\r").replace("\t", "\\t") + '"'
    if isinstance(v, list):
        return "[" + ", ".join(toml_value(x) for x in v) + "]"
    if isinstance(v, dict):
        return "{" + ", ".join(f'"{k}" = {toml_value(x)}' for k, x in v.items()) + "}"
    raise TypeError(v)


def _printable(s: str) -> str:
    # TOML basic strings cannot hold control characters other than via escapes we write
    return "".join(c for c in s if c >= " " and c != "\x7f" and not 0xD800 <= ord(c) <= 0xDFFF)


NUMBERS = st.sampled_from([0, -0.0, 1e308, -1e308, 1e-308, 5e-324, 1e16, 2**63 - 1, -(2**63),
                           float("nan"), float("inf"), float("-inf"), 1.5, -3])
NUM_TEXT = st.sampled_from(["1e308", "1e309", "-1e309", "1e-320", "nan", "inf", "-inf", "NaN",
                            "0", "-0", "00012", "1e5000", "9" * 300, ".", "-", "1/0",
                            "0/0", "1 1/0", "1-1/0", "3.4.5", "1e", "e5", "0x10", "1_000",
                            "∞", "٣", "１２", "½", "1e-400", "123456789012345678901234567890"])
UNITS = st.sampled_from(["ft", "in", "m", "lbf", "kN", "lbf/ft", "lbf*ft", "ksi", "psi",
                         "in^4", "in^3", "in^2", "kg", "lb/ft^3", "", "furlong", "ft ft",
                         "rad", "degC", "degF", "delta_degC", "%", "dimensionless", "ft/s",
                         "lbf/in", "Hz", "ft**9999", "m**-1", "__class__", "ft)", "(ft",
                         "'", '"', "in in in", "µm", "m²", "ft⁴", "N·m", "kN×m"])


GOOD_NUM = st.floats(allow_nan=False, allow_infinity=False, width=32).map(lambda v: f"{v:g}")


@st.composite
def quantity_text(draw):
    parts = [draw(NUM_TEXT | GOOD_NUM) + " " + draw(UNITS) for _ in range(draw(st.integers(1, 3)))]
    sep = draw(st.sampled_from([" ", "-", " + ", "  ", "'", '"', " ft ", "-1/2 "]))
    return sep.join(parts)


VALUES = st.recursive(
    NUMBERS | st.booleans() | quantity_text() | st.text(max_size=30).map(_printable)
    | st.integers(-10**30, 10**30),
    lambda inner: st.lists(inner, max_size=3) | st.dictionaries(
        st.sampled_from(["shape", "area", "ix", "sx", "e", "fy", "at", "type", "value"]),
        inner, max_size=3),
    max_leaves=6)

TARGETS = [
    ("schema = 1", "schema = {}"),
    ('title = "Fuzz base: rack arm"', "title = {}"),
    ('units = "us"', "units = {}"),
    ('tags = ["rack"]', "tags = {}"),
    ('length = "10 ft"', "length = {}"),
    ("self_weight = true", "self_weight = {}"),
    ('area = "3.37 in^2"', "area = {}"),
    ('ix = "7.80 in^4"', "ix = {}"),
    ('sx = "3.90 in^3"', "sx = {}"),
    ('e = "29000 ksi"', "e = {}"),
    ('fy = "46 ksi"', "fy = {}"),
    ('density = "490 lb/ft^3"', "density = {}"),
    ('at = "8 ft"', "at = {}"),
    ('type = "roller"', "type = {}"),
    ('at = "4 ft"', "at = {}"),
    ('value = "-300 lbf"', "value = {}"),
    ('end = "10 ft"\nvalue = "-25 lbf/ft"', 'end = "10 ft"\nvalue = {}'),
    ('value = ["0 lbf/ft", "-60 lbf/ft"]', "value = {}"),
    ('value = "150 lbf*ft"', "value = {}"),
    ('deflection = "L/240"', "deflection = {}"),
    ("safety_factor = 1.67", "safety_factor = {}"),
]


@settings(max_examples=200, **SETTINGS)
@given(st.sampled_from(TARGETS), VALUES)
def test_wrong_types_and_values(workdir, target, value):
    old, template = target
    assert BASE.count(old) == 1
    text = BASE.replace(old, template.format(toml_value(value)))
    check(workdir, text, may_pass=True)


@settings(max_examples=120, **SETTINGS)
@given(st.sampled_from([t for t in TARGETS if '"' in t[0]]), quantity_text())
def test_odd_quantities(workdir, target, qty):
    old, template = target
    text = BASE.replace(old, template.format(toml_value(qty)))
    check(workdir, text, may_pass=True, json=True)


@settings(max_examples=40, **SETTINGS)
@given(st.text(min_size=1, max_size=60).map(_printable))
def test_unicode_in_free_text_is_kept_or_refused_cleanly(workdir, s):
    text = BASE.replace('title = "Fuzz base: rack arm"', f"title = {toml_value(s)}")
    text = text.replace('value = "-300 lbf"', 'value = "-300 lbf"\nlabel = ' + toml_value(s))
    check(workdir, text, may_pass=True)


# ------------------------------------------------------------------ sizes and nesting
@pytest.mark.parametrize("depth", [50, 1000, 100_000])
def test_deeply_nested_arrays(workdir, depth):
    # an unknown key is a warning, so a shallow one may pass; a deep one is refused
    check(workdir, "extra = " + "[" * depth + "]" * depth + "\n" + BASE, may_pass=depth < 1000)


@pytest.mark.parametrize("depth", [50, 1000, 30_000])
def test_deeply_nested_inline_tables(workdir, depth):
    check(workdir, "extra = " + "{a = " * depth + "1" + "}" * depth + "\n" + BASE,
          may_pass=depth < 1000)


@pytest.mark.parametrize("depth", [50, 2000])
def test_deeply_nested_dotted_tables(workdir, depth):
    text = BASE.replace("[beam.section]", "[beam.section." + ".".join(["x"] * depth) + "]\n"
                        "[beam.section]")
    err = check(workdir, text, may_pass=True)
    assert len(err) < 20_000


def test_ten_thousand_loads_is_refused_quickly(workdir):
    load = '[[loads]]\ntype = "point"\nat = "4 ft"\nvalue = "-3 lbf"\n'
    text = BASE + load * 10_000
    assert len(text.encode()) < 1_000_000  # under the size cap, so the load cap must act
    err = check(workdir, text)
    assert "loads" in err and "10" in err


def test_ten_thousand_supports_is_refused(workdir):
    sup = '[[supports]]\nat = "4 ft"\ntype = "roller"\n'
    check(workdir, BASE + sup * 10_000)


def test_many_problems_make_one_bounded_message(workdir):
    # 900 loads each with a bad value: one block, and not megabytes of it
    load = '[[loads]]\ntype = "point"\nat = "4 ft"\nvalue = "-3"\n'
    err = check(workdir, BASE + load * 900)
    assert len(err) < 400_000


def test_file_over_the_size_cap(workdir):
    check(workdir, BASE + "# " + "x" * 1_100_000 + "\n")


def test_long_value_strings(workdir):
    check(workdir, BASE.replace('"-300 lbf"', '"' + "1" * 5000 + ' lbf"'))
    check(workdir, BASE.replace('"-300 lbf"', '"-300 ' + "ft*" * 3000 + 'lbf"'))


@pytest.mark.parametrize("content", [
    b"\xef\xbb\xbf" + BASE.encode(),  # UTF-8 byte-order mark
    BASE.encode("utf-16"),
    BASE.encode()[:200] + b"\xff\xfe\x00" + BASE.encode()[200:],
    b"\x00" * 100,
    b"",
    BASE.replace("\n", "\r\n").encode(),
    BASE.replace("\n", "\r").encode(),
])
def test_odd_encodings(workdir, content):
    check(workdir, content, may_pass=True)


def test_not_a_file(workdir):
    d = workdir / "a_folder.toml"
    d.mkdir(exist_ok=True)
    rc, out, err, dt = run(["solve", str(d)])
    assert rc == 2 and err.startswith("shopbeam: ") and str(d) in err
    missing = workdir / "missing.toml"
    rc, out, err, dt = run(["solve", str(missing)])
    assert rc == 2 and str(missing) in err and "Traceback" not in err


# ------------------------------------------------------------------ real subprocesses
SUBPROCESS_CASES = {
    "garbage": "this is = = not toml [[[",
    "nan length": BASE.replace('length = "10 ft"', 'length = "nan ft"'),
    "inf toml float": BASE.replace("safety_factor = 1.67", "safety_factor = inf"),
    "deep nesting": BASE + "extra = " + "[" * 100_000 + "]" * 100_000 + "\n",
    "ten thousand loads": BASE + '[[loads]]\ntype = "point"\nat = "4 ft"\nvalue = "-3 lbf"\n' * 10_000,
    "lone roller": BASE.replace('[[supports]]\nat = "0 ft"\ntype = "pin"\n', ""),
}


@pytest.mark.parametrize("name", list(SUBPROCESS_CASES))
def test_real_cli_subprocess(tmp_path, name):
    p = tmp_path / "job.toml"
    p.write_text(SUBPROCESS_CASES[name], encoding="utf-8")
    env = {k: v for k, v in os.environ.items() if k != "SHOPBEAM_DEBUG"}
    # timeout: a hang guard only (speed is measured in bench/), so a busy machine never fails it
    proc = subprocess.run([sys.executable, "-m", "shopbeam", "solve", str(p), "--json"],
                          capture_output=True, text=True, timeout=300, env=env)
    assert proc.returncode == 2, proc.stderr
    assert proc.stdout == ""
    assert "Traceback" not in proc.stderr and "internal error" not in proc.stderr
    assert proc.stderr.startswith("shopbeam: ") and str(p) in proc.stderr
    if name == "lone roller":
        assert "unstable" in proc.stderr and "support" in proc.stderr
