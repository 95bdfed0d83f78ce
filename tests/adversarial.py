"""Adversarial job texts (shared by the fuzz test and bench/limits.py): the shapes a
reliability audit found costly or wrong, each built from a fixed recipe (reproducible)."""

from __future__ import annotations

from pathlib import Path

PRESETS = Path(__file__).resolve().parents[1] / "shopbeam" / "presets"

HEAD = '''schema = 1
title = "adversarial"
units = "us"
[beam]
length = "100 ft"
section = "W8x18"
material = "A992"
'''
ENDS = '[[supports]]\nat = "0 ft"\ntype = "pin"\n[[supports]]\nat = "100 ft"\ntype = "roller"\n'


def springs(n: int, stiffness: str = "2000 lbf/in") -> str:
    t = HEAD + ENDS
    for i in range(n):
        t += (f'[[supports]]\nat = "{(i + 1) * 100 / (n + 1):.4f} ft"\ntype = "spring"\n'
              f'stiffness = "{stiffness}"\n')
    return t + '[[loads]]\ntype = "uniform"\nstart = "0 ft"\nend = "100 ft"\nvalue = "-100 lbf/ft"\n'


def wheels(n: int, springs_n: int = 0, force: str = "-10 lbf") -> str:
    t = springs(springs_n) if springs_n else HEAD + ENDS
    t += ('[[moving]]\nloads = [' + ", ".join([f'"{force}"'] * n) + ']\nspacing = ['
          + ", ".join(['"7 in"'] * (n - 1)) + ']\n')
    return t


def hinged(n: int) -> str:
    t = HEAD
    for i in range(n + 1):
        t += f'[[supports]]\nat = "{i * 100 / n:.4f} ft"\ntype = "{"pin" if i == 0 else "roller"}"\n'
    for i in range(0, n - 1, 2):
        t += f'[[supports]]\nat = "{(i + 1.5) * 100 / n:.4f} ft"\ntype = "hinge"\n'
    return t + '[[loads]]\ntype = "uniform"\nstart = "0 ft"\nend = "100 ft"\nvalue = "-100 lbf/ft"\n'


def demo_ramp(start: str, end: str) -> str:
    s = (PRESETS / "demo.toml").read_text()
    return s.replace('start = "2 ft"\nend = "8 ft"', f'start = "{start}"\nend = "{end}"')


def sliver_span(gap_ft: float) -> str:
    return (HEAD.replace('"100 ft"', '"2000 ft"') + ENDS.replace('"100 ft"', '"2000 ft"')
            + f'[[supports]]\nat = "1000 ft"\ntype = "roller"\n[[supports]]\n'
            f'at = "{1000 + gap_ft!r} ft"\ntype = "roller"\n'
            '[[loads]]\ntype = "point"\nat = "300 ft"\nvalue = "-1000 lbf"\n')


CASES = {
    "deep dotted keys": HEAD + "x" + "".join(f".a{i}" for i in range(20000)) + " = 1\n",
    "many keys": HEAD + "".join(f"k{i} = {i}\n" for i in range(60000)),
    "nested brackets": HEAD + "x = " + "[" * 5000 + "]" * 5000 + "\n",
    "1000 wheels": wheels(1000),
    "10000 wheels": wheels(10000),
    "50 springs": springs(50),
    "50 springs and a trolley": wheels(4, springs_n=50),
    "100 springs, stiff": springs(100, "1e9 lbf/in"),
    "99 spans with hinges": hinged(99),
    "wheel of -1e30 lbf": wheels(2, force="-1e30 lbf"),
    # the largest wheel sets the wheel cap and the search bound let in (answered), and one
    # wheel past each
    "200 wheels on a simple span": wheels(200).replace('"7 in"', '"6 in"'),
    "201 wheels on a simple span": wheels(201).replace('"7 in"', '"5.9 in"'),
    "20 wheels over 4 springs": wheels(20, springs_n=4).replace('"7 in"', '"30 in"'),
    "57 wheels over a spring": wheels(57, springs_n=1),
    "58 wheels over a spring": wheels(58, springs_n=1),
    "ramp a hair long": demo_ramp("2 ft", "2.000000001 ft"),
    "ramp to 1e-308 ft": demo_ramp("0 ft", "1e-308 ft"),
    "sliver span 0.01 mm on 2000 ft": sliver_span(1e-5 / 0.3048),
    "sliver span 1e-9 of the length": sliver_span(2.5e-6),
    "title with escapes": (PRESETS / "demo.toml").read_text().replace(
        'title = "Loft beam', 'title = "\\u001b[8mLoft beam'),
}
