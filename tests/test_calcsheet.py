"""The exact calc sheet: sympy's general SingularityFunction solve gives exact rationals.

Closed forms: AISC Manual Table 3-23, cases 12 and 29 (from memory, standard formulas).
"""

from __future__ import annotations

import sympy as sp

from shopbeam.output.calcsheet import brackets, exact_solve
from shopbeam.engine.model import Beam, Load, Support


def test_propped_cantilever_reactions_are_exact_rationals():
    # AISC Manual Table 3-23, case 12: prop takes 3wL/8, fixed end 5wL/8, M = wL^2/8
    L, w = 8.0, -100.0
    beam = Beam(L, 1e6, (Support(0.0, "roller"), Support(L, "fixed")),
                (Load("uniform", start=0.0, end=L, w1=w),))
    ex = exact_solve(beam)
    R1, R2, M1 = ex.unknowns[:3]
    assert ex.solution[R1] == sp.Rational(3, 8) * 100 * 8
    assert ex.solution[R2] == sp.Rational(5, 8) * 100 * 8
    # the fixed end at the right turns clockwise: its counterclockwise moment is -wL^2/8
    assert ex.solution[M1] == -sp.Rational(1, 8) * 100 * 64


def test_two_span_reactions_exact_and_independent_of_ei():
    # AISC Manual Table 3-23, case 29: 3wl/8, 10wl/8, 3wl/8
    beam = Beam(6.0, 3.3e5, (Support(0.0, "pin"), Support(3.0, "roller"), Support(6.0, "roller")),
                (Load("uniform", start=0.0, end=6.0, w1=-8.0),))
    ex = exact_solve(beam)
    got = [ex.solution[s] for s in ex.unknowns[:3]]
    assert got == [9, 30, 9]
    assert all(not v.free_symbols for v in got)


def test_spring_reactions_keep_ei_as_a_symbol():
    # hand-derived: cantilever propped by a spring, R = (w L^4 / 8EI) / (1/k + L^3/3EI)
    L, w, k = 2.0, -3.0, 5.0
    beam = Beam(L, 1e3, (Support(0.0, "fixed"), Support(L, "spring", k)),
                (Load("uniform", start=0.0, end=L, w1=w),))
    ex = exact_solve(beam)
    R = ex.unknowns[2]  # fixed force R1, fixed moment M1, spring force R2
    EI = ex.ei
    expect = (3 * sp.Integer(2) ** 4 / (8 * EI)) / (sp.Rational(1, 5) + sp.Integer(8) / (3 * EI))
    assert sp.simplify(ex.solution[R] - expect) == 0


def test_brackets_print_as_text():
    x = sp.Symbol("x", real=True)
    e = 3 * sp.SingularityFunction(x, 0, 1) - sp.Rational(1, 2) * sp.SingularityFunction(x, sp.Rational(7, 2), 2)
    assert brackets(e, x) == "3 <x>^1 - 1/2 <x - 7/2>^2"


def test_a_calc_sheet_too_large_to_work_out_quickly_is_refused_with_what_to_use(tmp_path):
    # 100 point loads: the exact algebra took 11 s (254 s at the 1,000-load cap); past the
    # bound the sheet is refused at once, naming the count and the commands that do answer
    import subprocess
    import sys

    from shopbeam.jobs.limits import CALC_TERMS
    text = ('schema = 1\ntitle = "c"\n[beam]\nlength = "16 ft"\nsection = "W8x18"\n'
            'material = "A992"\n[[supports]]\nat = "0 ft"\ntype = "pin"\n[[supports]]\n'
            'at = "16 ft"\ntype = "roller"\n')
    n = CALC_TERMS - 10 + 1  # two supports count 10
    for i in range(n):
        text += f'[[loads]]\ntype = "point"\nat = "{(i + 0.5) * 16 / n:.4f} ft"\nvalue = "-10 lbf"\n'
    p = tmp_path / "many.toml"
    p.write_text(text)
    run = subprocess.run([sys.executable, "-m", "shopbeam", "solve", "--calc", str(p)],
                         capture_output=True, text=True, timeout=120)
    assert run.returncode == 2 and "calc sheet" in run.stderr and str(p) in run.stderr
    assert "shopbeam report" in run.stderr and run.stdout == ""


def test_a_moving_load_sheet_solves_the_state_the_report_shows():
    # the wheel set at the place that governs: the sheet's exact reactions are the report's
    # (it solved the member's own weight alone, and said it agreed with the numeric engine)
    import re
    from pathlib import Path

    from shopbeam.design.analysis import analyze
    from shopbeam.jobs.jobfile import load_job
    from shopbeam.output.calcsheet import calc_sheet

    job = load_job(Path(__file__).resolve().parents[1] / "presets" / "monorail-trolley.toml")
    sheet = calc_sheet(job)
    got = [float(x) for x in re.findall(r"^  R\d+ = \S+ = (-?[\d.]+) lbf$", sheet, re.M)]
    shown = [r.force / 4.4482216152605 for r in analyze(job).solution.reactions]
    assert got == [round(x, 2) for x in shown] or \
        all(abs(a - b) <= 0.005 * abs(b) for a, b in zip(got, shown))
    assert len(got) == 2 and sum(got) > 3000  # two 1000 lbf wheels with impact, not 400 lbf
    assert "Numeric engine agrees with this sheet: yes" in sheet
    assert "the state that governs" in sheet
