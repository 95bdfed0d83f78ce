"""Text pictures of a solved job for the text UI: elevation, plots and tables.

Plain functions from a `Result` (or `Job`) to strings, so they are tested without a screen.
Meaning is carried by characters and words, never by colour: supports have symbols with a
legend, checks say PASS or FAIL, extremes are labelled with value and position. Plots are
drawn with plotext into a string (imported on first use).
"""

from __future__ import annotations

import textwrap

import math

import numpy as np

from shopbeam import units
from shopbeam.engine.piecewise import unique
from shopbeam.output.present import present


PLOT_KINDS = {  # name -> (display kind, title)
    "shear": ("force", "Shear V"),
    "moment": ("moment", "Bending moment M (+ sagging)"),
    "slope": ("slope", "Slope"),
    "deflection": ("small_length", "Deflection (+ up, sag is -)"),
}

SUPPORT_SYMBOL = {"fixed": "#", "pin": "^", "roller": "o", "spring": "%", "hinge": "*"}
SUPPORT_WORDS = {"fixed": "fixed", "pin": "pin", "roller": "roller", "spring": "spring",
                 "hinge": "hinge (M = 0)"}


def _f(value: float, kind: str, system: str, sig: int = 4) -> str:
    return units.fmt(value, kind, system, sig)


def _place(row: list[str], col: int, text: str) -> bool:
    """Write text into row at col if those cells are free; return whether it fitted."""
    if col < 0 or col + len(text) > len(row):
        return False
    if any(c != " " for c in row[col:col + len(text)]):
        return False
    row[col:col + len(text)] = list(text)
    return True


def _place_near(rows: list[list[str]], col: int, text: str, width: int) -> None:
    """Put a label just right of col, else just left, in the first row where it fits."""
    for row in rows:
        for start in (col + 1, col - len(text), max(0, min(col - len(text) // 2, width - len(text)))):
            if _place(row, start, text):
                return


def elevation(job, width: int = 76) -> str:
    """The beam to scale: loads above, the beam, supports below, then dimensions."""
    sy = job.units
    L = job.length
    w = max(20, width)
    span = w - 1

    def col(x: float) -> int:
        return int(round(x / L * span)) if L > 0 else 0

    lines: list[str] = []
    lines.append(f"Elevation to scale: {_f(L, 'length', sy)} long, 1 char = "
                 f"{_f(L / span, 'length', sy, 2)}")
    # point loads and couples: a label row and an arrow row
    concentrated = [ld for ld in job.loads if ld.kind in ("point", "moment")]
    if concentrated:
        labels = [[" "] * w for _ in range(2)]
        arrows = [" "] * w
        for ld in sorted(concentrated, key=lambda d: d.at):
            c = col(ld.at)
            if ld.kind == "point":
                arrows[c] = "v" if ld.value < 0 else "^"
                text = _f(ld.value, "force", sy)
            else:
                arrows[c] = "@"
                text = _f(ld.value, "moment", sy) + (" ccw" if ld.value > 0 else " cw")
            if ld.label:
                text += f" {ld.label}"
            _place_near(labels, c, text, w)
        lines += ["".join(r).rstrip() for r in labels if "".join(r).strip()]
        lines.append("".join(arrows).rstrip())
    # distributed loads: one row each (intensity drawn with ramp characters)
    ramp = " .:-=+*#"
    for ld in job.loads:
        if ld.kind not in ("uniform", "linear"):
            continue
        row = [" "] * w
        a, b = col(ld.start), col(ld.end)
        w1, w2 = ld.w1, (ld.w2 if ld.kind == "linear" else ld.w1)
        top = max(abs(w1), abs(w2)) or 1.0
        down = (w1 + w2) <= 0
        for c in range(a, b + 1):
            t = 0.0 if b == a else (c - a) / (b - a)
            mag = abs(w1 + (w2 - w1) * t) / top
            if ld.kind == "uniform":
                ch = "v" if down else "^"
            else:
                ch = ramp[min(len(ramp) - 1, max(1, int(round(mag * (len(ramp) - 1)))))] \
                    if mag > 0 else " "
            row[c] = ch
        row[a] = "|"
        row[b] = "|"
        if ld.kind == "uniform":
            text = _f(ld.w1, "line_load", sy)
        else:
            text = f"{_f(ld.w1, 'line_load', sy)} to {_f(ld.w2, 'line_load', sy)}"
        if ld.label:
            text += f" {ld.label}"
        if not (_place(row, b + 2, text) or _place(row, a - len(text) - 1, text)):
            inside = f" {text} "
            mid = max(a + 1, (a + b - len(inside)) // 2)
            if mid + len(inside) <= b:
                row[mid:mid + len(inside)] = list(inside)
            else:  # no room beside or inside: the words on their own line below, whole
                lines.append("".join(row).rstrip())
                for part in textwrap.wrap(text, w) or [""]:
                    lines.append(" " * max(0, min(a, w - len(part))) + part)
                continue
        lines.append("".join(row).rstrip())
    # the beam, with hinges on it
    beam = ["="] * w
    for s in job.supports:
        if s.kind == "hinge":
            beam[col(s.at)] = "*"
    lines.append("".join(beam))
    sup = [" "] * w
    for s in job.supports:
        if s.kind != "hinge":
            sup[col(s.at)] = SUPPORT_SYMBOL[s.kind]
    lines.append("".join(sup).rstrip())
    # dimensions between the ends and every support
    stations = sorted({0.0, L, *(s.at for s in job.supports)})
    dim = [" "] * w
    for x0, x1 in zip(stations, stations[1:]):
        a, b = col(x0), col(x1)
        if b - a < 2:
            continue
        for c in range(a + 1, b):
            dim[c] = "-"
        dim[a] = "|"
        dim[b] = "|"
        text = _f(x1 - x0, "length", sy, 3)
        if len(text) + 2 <= b - a - 1:
            mid = (a + b - len(text)) // 2
            dim[mid - 1:mid + len(text) + 1] = list(f" {text} ")
    lines.append("".join(dim).rstrip())
    kinds = []
    for s in job.supports:
        if s.kind not in kinds:
            kinds.append(s.kind)
    legend = "  ".join(f"{SUPPORT_SYMBOL[k]} {SUPPORT_WORDS[k]}" for k in kinds)
    lines.append(f"below the beam: {legend} | above: v load down  ^ load up  @ couple")
    return "\n".join(lines)


# ---------------------------------------------------------------------- plots

def sample(pw, length: float, n: int = 400) -> tuple[list[float], list[float]]:
    """Points along a piecewise function, with both one-sided values at every break
    (evaluated all at once)."""
    xs = unique(np.concatenate([np.linspace(0.0, length, n),
                                np.asarray(pw.breaks, dtype=float)]))
    left = np.asarray(pw(xs, "left"), dtype=float)
    right = np.asarray(pw(xs, "right"), dtype=float)
    jump = np.abs(left - right) > 1e-12 * (np.abs(left) + np.abs(right) + 1e-30)
    out_x: list[float] = []
    out_y: list[float] = []
    for x, lv, rv, j in zip(xs.tolist(), left.tolist(), right.tolist(), jump.tolist()):
        if j:
            out_x += [x, x]
            out_y += [lv, rv]
        else:
            out_x.append(x)
            out_y.append(rv)
    return out_x, out_y


def nice_ticks(lo: float, hi: float, n: int = 5) -> list[float]:
    """Round tick values covering lo..hi (zero among them when the range crosses it)."""
    span = hi - lo
    if span <= 0 or not math.isfinite(span):
        return [lo]
    raw = span / max(1, n - 1)
    mag = 10 ** math.floor(math.log10(raw))
    step = next(m * mag for m in (1, 2, 2.5, 5, 10) if m * mag >= raw)
    first = math.ceil(lo / step) * step
    out = []
    t = first
    while t <= hi + 1e-9 * step:
        out.append(0.0 if abs(t) < 1e-9 * step else t)
        t += step
    return out


def plot(result, name: str, width: int = 76, height: int = 12) -> str:
    """One plotext plot of shear, moment, slope or deflection, extremes marked and labelled."""
    import plotext as plt  # noqa: PLC0415 - startup

    sol, job = result.solution, result.job
    sy = job.units
    kind, title = PLOT_KINDS[name]
    fx = units.to_display(1.0, "length", sy)
    fy = units.to_display(1.0, kind, sy)
    # a few points for each column the plot has (more add nothing on screen but time);
    # the breaks and the exact extremes are there whatever the spacing
    xs, ys = sample(sol.function(name), sol.length, n=max(100, 3 * width))
    dx = [x * fx for x in xs]
    dy = [y * fy for y in ys]
    ex = sol.extremes()[name]
    plt.clf()
    plt.plotsize(max(30, width), max(8, height))
    plt.theme("clear")
    plt.plot(dx, dy, marker="dot")
    plt.plot([dx[0], dx[-1]], [0, 0], marker="-")
    marks = []
    for value, at, word in ((ex.max, ex.max_at, "max"), (ex.min, ex.min_at, "min")):
        if word == "min" and math.isclose(ex.min, ex.max):
            continue
        marks.append((value, at, word))
        plt.scatter([at * fx], [value * fy], marker="O" if word == "max" else "X")
    lo, hi = min(min(dy), 0.0), max(max(dy), 0.0)
    pad = (hi - lo) * 0.12 or abs(hi) * 0.15 or 1.0
    plt.ylim(lo - pad, hi + pad)
    ticks = nice_ticks(lo - pad, hi + pad, 5 if height >= 12 else 3)
    plt.yticks(ticks, [units.num(t, 3) for t in ticks])
    plt.xlim(dx[0], dx[-1])
    xt = nice_ticks(dx[0], dx[-1], 6)
    plt.xticks(xt, [units.num(t, 3) for t in xt])
    unit = units.unit_label(kind, sy)
    plt.title(f"{title} ({unit})")
    plt.xlabel(f"x ({units.unit_label('length', sy)}) from the left end")
    text = plt.uncolorize(plt.build())
    lines = [ln.rstrip() for ln in text.splitlines()]
    for value, at, word in marks:
        mark = "O" if word == "max" else "X"
        lines.append(f"  {mark} {word} {_f(value, kind, sy)} at x = {_f(at, 'length', sy)}")
    return "\n".join(lines)


# ---------------------------------------------------------------------- tables

def reactions_table(result) -> str:
    """The reactions, and with patterned loads those of the load state that governs (uplift
    named) and every support some load state pulls down: the same rows as the report
    (`output.present`)."""
    p = present(result)

    def row(r, indent=""):
        up = "  uplift" if r.uplift else ""
        return f"{indent}{r.kind:<8} {r.at:>10} {r.force:>16} {r.moment or '-':>18}{up}"

    rows = [f"{'support':<8} {'at':>10} {'force (+ up)':>16} {'moment (+ ccw)':>18}"]
    rows += [row(r) for r in p.reactions]
    if p.governing_state is not None:
        rows.append(f"In {p.governing_state.words}:")
        rows += [row(r) for r in p.governing_state.reactions]
    if p.uplift:
        rows.append("Uplift over every load state (anchor these supports):")
        rows += [f"  {u}" for u in p.uplift]
    return "\n".join(rows)


def extremes_table(result) -> str:
    sy = result.job.units
    rows = [f"{'':<10} {'max':>14} {'at':>9}  {'min':>14} {'at':>9}"]
    for name, e in result.solution.extremes().items():
        k = PLOT_KINDS[name][0]
        rows.append(f"{name:<10} {_f(e.max, k, sy):>14} {_f(e.max_at, 'length', sy):>9}  "
                    f"{_f(e.min, k, sy):>14} {_f(e.min_at, 'length', sy):>9}")
    return "\n".join(rows)


check_value = units.fmt_check  # a check's demand or limit in the job's units


def checks_table(result) -> str:
    """Every check (as the report shows it, `output.present`), with the load state that
    governs it when there is more than one."""
    checks = present(result).checks
    # the name column as wide as the longest name up to 20; a longer name has its own line
    nw = min(20, max([11] + [len(c.name) for c in checks]))
    rows = [f"{'check':<{nw}} {'demand':>12} {'limit':>12} {'ratio':>6}  verdict   where"]
    for c in checks:
        name = c.name
        if len(name) > nw:
            rows.append(name)
            name = ""
        rows.append(f"{name:<{nw}} {c.demand:>12} {c.limit:>12} {c.ratio:>6.2f}  "
                    f"{c.verdict:<8}  {c.at}")
        if c.state:
            rows.append(f"{'':<{nw}} worst state: {c.state}")
    return "\n".join(rows)


def verdict_line(result, other: list[str] | None = None) -> str:
    """The verdict; `other`: `other_gaps(result)` when the caller has it already."""
    g = result.governing
    if result.ok:
        up = getattr(result.job, "upward", ())
        but = f" - BUT {len(up)} load(s) point UP: check the signs" if up else ""
        gaps = [u for u in result.unchecked if u.blocks_rating]
        if gaps:
            but += (f" - BUT {len(gaps)} limit state(s) NOT CHECKED (no rating): "
                    + "; ".join(result.blocking))
        other = other_gaps(result) if other is None else other
        if other:
            but += f" - NOT RATED: {len(other)} reason(s), named in the Rating view"
        return (f"ALL CHECKS PASS - governing: {g.name}, ratio {g.ratio:.2f} "
                f"(used {g.ratio:.0%}){but}")
    fails = [c.name for c in result.checks if not c.ok]
    return (f"FAILS: {', '.join(fails)} - governing: {g.name}, ratio {g.ratio:.2f} "
            f"({g.ratio:.0%} of the limit)")


def selfchecks_text(result) -> str:
    out = []
    for d in result.solution.diagnostics:
        out.append(f"[{'pass' if d.ok else 'WARN'}] {d.name}: {d.detail}")
    return "\n".join(out)


def other_gaps(result) -> list[str]:
    """`capacity.held_besides`: why no rating is posted besides what the verdict names; []
    if it cannot be worked out here (the Rating view says it in full; never a crash)."""
    from shopbeam.design.capacity import held_besides  # noqa: PLC0415 - design on demand

    try:
        return held_besides(result)
    except Exception:  # noqa: BLE001
        return []


def summary_line(result, width: int = 0, tail: str = "") -> str:
    """Two lines for the bottom of the editor views: the verdict and the reactions, each
    kept within `width` columns (0: no limit) by naming fewer items and saying how many
    more there are, never by cutting words; `tail` ends the reactions line when it fits."""
    sy = result.job.units
    other = other_gaps(result) if result.ok else []  # worked out once, for both lines
    verdict = verdict_line(result, other)
    if width and len(verdict) > width and not result.ok:
        g = result.governing
        fails = [c.name for c in result.checks if not c.ok]
        for n in range(len(fails) - 1, 0, -1):
            verdict = (f"FAILS: {', '.join(fails[:n])} +{len(fails) - n} more - governing: "
                       f"{g.name}, ratio {g.ratio:.2f}")
            if len(verdict) <= width:
                break
        else:
            verdict = f"FAILS {len(fails)} checks - governing: {g.name}, ratio {g.ratio:.2f}"
    elif width and len(verdict) > width:
        # a pass with loads pointing up, or with a limit state not checked: the warning and
        # NOT RATED stay in sight, shortened, never dropped
        g, up = result.governing, getattr(result.job, "upward", ())
        gaps = [u for u in result.unchecked if u.blocks_rating]
        # what holds the rating: limit states not checked, and other reasons (input problems,
        # a rack with no impact...: named in full in the Rating view)
        names = "; ".join(x for x in (
            f"not checked: {'; '.join(result.blocking)}" if result.blocking else "",
            (f"{len(other)} other reason{'s' if len(other) > 1 else ''} (0 Rating names "
             f"{'them' if len(other) > 1 else 'it'})") if other else "") if x)
        gaps = gaps + list(other)
        no = (" - NOT RATED" if gaps else "")
        short = ([f"PASS, ratio {g.ratio:.2f} - BUT {len(up)} load(s) point UP: check the "
                  f"signs{no}", f"PASS {g.ratio:.2f} - BUT {len(up)} load(s) point UP{no}",
                  f"PASS - {len(up)} load(s) point UP{' - NOT RATED' if gaps else ''}"]
                 if up else
                 [f"ALL CHECKS PASS - governing: {g.name}, ratio {g.ratio:.2f} - NOT RATED, "
                  f"{names}",
                  f"PASS {g.name} {g.ratio:.2f} - NOT RATED, {names}",
                  f"PASS {g.ratio:.2f} - NOT RATED, {names}",
                  f"PASS {g.ratio:.2f} - NOT RATED: {len(gaps)} reason(s), see 0 Rating",
                  "PASS - NOT RATED"]
                 if gaps else
                 [f"ALL CHECKS PASS - governing: {g.name}, ratio {g.ratio:.2f}"])
        for verdict in short:
            if len(verdict) <= width:
                break
    items = [f"R@{_f(r.at, 'length', sy, 3)} {_f(r.force, 'force', sy, 3)}"
             for r in result.solution.reactions]
    rs = "reactions: " + "  ".join(items)
    if width and len(rs) > width:
        for n in range(len(items) - 1, 0, -1):
            rs = f"reactions: {'  '.join(items[:n])}  +{len(items) - n} more"
            if len(rs) <= width:
                break
    elif tail and (not width or len(rs + tail) <= width):
        rs += tail
    return f"{verdict}\n{rs}"

