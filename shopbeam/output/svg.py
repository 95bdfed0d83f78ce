"""SVG drawings for the calc package: a sketch of the member and its diagrams.

Plain SVG text, no scripts, fonts or outside files, so a calc package is one self-contained
file that prints the same anywhere. The sketch shows the span with its supports (fixed wall,
pin, roller, spring, hinge) and loads (point arrows, uniform and linear bands, couples) with
their values in the job's units. A diagram draws one of shear, moment, slope or deflection
over the span from the exact piecewise solution (both sides of every jump), and labels its
largest and smallest values at the exact extremes. Each labelled extreme carries its SI value
in `data-si` and its place in `data-at`, so tests can hold the drawing to the solution.
"""

from __future__ import annotations

import math
from html import escape

import numpy as np

from shopbeam import units
from shopbeam.engine.piecewise import unique

DIAGRAM_KINDS = {"shear": "force", "moment": "moment", "slope": "slope",
                 "deflection": "small_length"}
COLOURS = {"shear": "#1f5fa8", "moment": "#a8321f", "slope": "#5a7d1a", "deflection": "#6b3fa0"}

WIDTH = 680
PAD_L, PAD_R = 56, 56


def _x(x: float, length: float) -> float:
    return PAD_L + (WIDTH - PAD_L - PAD_R) * (x / length if length > 0 else 0.0)


def _t(x: float, y: float, text: str, anchor: str = "middle", size: int = 11, cls: str = "",
       extra: str = "") -> str:
    c = f' class="{cls}"' if cls else ""
    return (f'<text x="{x:.1f}" y="{y:.1f}" font-size="{size}" text-anchor="{anchor}"{c}{extra}>'
            f"{escape(text)}</text>")


def _arrow_down(x: float, y_tail: float, y_tip: float, colour: str = "#000") -> str:
    d = 1 if y_tip > y_tail else -1
    return (f'<line x1="{x:.1f}" y1="{y_tail:.1f}" x2="{x:.1f}" y2="{y_tip - 5 * d:.1f}" '
            f'stroke="{colour}" stroke-width="1.4"/>'
            f'<polygon points="{x:.1f},{y_tip:.1f} {x - 3.5:.1f},{y_tip - 7 * d:.1f} '
            f'{x + 3.5:.1f},{y_tip - 7 * d:.1f}" fill="{colour}"/>')


def _support(s, x: float, y: float, length: float, sys_: str) -> str:
    k = s.kind
    if k == "fixed":
        left = s.at <= length / 2
        wx = x - 6 if left else x + 6
        hatch = "".join(
            f'<line x1="{wx:.1f}" y1="{y - 22 + i * 8:.1f}" x2="{wx + (-7 if left else 7):.1f}" '
            f'y2="{y - 15 + i * 8:.1f}" stroke="#000" stroke-width="1"/>' for i in range(6))
        return (f'<line x1="{wx:.1f}" y1="{y - 24:.1f}" x2="{wx:.1f}" y2="{y + 24:.1f}" '
                f'stroke="#000" stroke-width="2.5"/>{hatch}')
    if k in ("pin", "roller"):
        tri = (f'<polygon points="{x:.1f},{y + 4:.1f} {x - 9:.1f},{y + 20:.1f} {x + 9:.1f},'
               f'{y + 20:.1f}" fill="none" stroke="#000" stroke-width="1.4"/>')
        if k == "roller":
            tri += (f'<circle cx="{x - 5:.1f}" cy="{y + 24:.1f}" r="3.5" fill="none" stroke="#000"/>'
                    f'<circle cx="{x + 5:.1f}" cy="{y + 24:.1f}" r="3.5" fill="none" stroke="#000"/>')
            base = y + 28
        else:
            base = y + 20
        return tri + (f'<line x1="{x - 13:.1f}" y1="{base:.1f}" x2="{x + 13:.1f}" y2="{base:.1f}" '
                      f'stroke="#000" stroke-width="1.4"/>')
    if k == "spring":
        pts = [(x, y + 4)] + [(x + (6 if i % 2 else -6), y + 7 + i * 3.2) for i in range(6)]
        pts.append((x, y + 28))
        path = " ".join(f"{a:.1f},{b:.1f}" for a, b in pts)
        return (f'<polyline points="{path}" fill="none" stroke="#000" stroke-width="1.3"/>'
                f'<line x1="{x - 11:.1f}" y1="{y + 28:.1f}" x2="{x + 11:.1f}" y2="{y + 28:.1f}" '
                f'stroke="#000" stroke-width="1.4"/>'
                + _t(x, y + 42, "k " + units.fmt(s.stiffness, "stiffness", sys_), size=9))
    if k == "hinge":
        return f'<circle cx="{x:.1f}" cy="{y:.1f}" r="4.5" fill="#fff" stroke="#000" stroke-width="1.4"/>'
    return ""


def member_sketch(job, loads=None, moving=()) -> str:
    """The member to scale along its length: supports, loads with values, span dimension.

    `loads` defaults to the job's entered loads; self-weight is noted under the sketch.
    A wheel set in `moving` is drawn at the start of its travel, with the travel marked.
    """
    sy = job.units
    L = job.length
    loads = tuple(job.loads if loads is None else loads)
    y = 136  # beam axis
    parts = [f'<svg xmlns="http://www.w3.org/2000/svg" class="sketch" viewBox="0 0 {WIDTH} 252" '
             f'width="100%" role="img" aria-label="sketch of the member">',
             f'<title>{escape(job.title)}: member, supports and loads</title>']
    # distributed loads first (behind), each in its own band above the beam
    dist = [ld for ld in loads if ld.kind in ("uniform", "linear")]
    wmax = max((max(abs(ld.w1), abs(ld.w2 if ld.kind == "linear" else ld.w1)) for ld in dist),
               default=0.0) or 1.0
    rows: list[float] = []  # right end of the last band in each row (overlaps stack)
    for ld in dist:
        x1, x2 = _x(ld.start, L), _x(ld.end, L)
        w2 = ld.w2 if ld.kind == "linear" else ld.w1
        row = next((i for i, end in enumerate(rows) if end <= x1 + 0.5), None)
        if row is None:
            rows.append(x2)
            row = len(rows) - 1
        else:
            rows[row] = x2
        row = min(row, 3)
        h1 = 4 + 14 * abs(ld.w1) / wmax
        h2 = 4 + 14 * abs(w2) / wmax
        base = y - 6 - row * 30
        colour = "#7a7a7a" if ld.case == "dead" else "#1f5fa8"
        parts.append(f'<polygon points="{x1:.1f},{base:.1f} {x1:.1f},{base - h1:.1f} '
                     f'{x2:.1f},{base - h2:.1f} {x2:.1f},{base:.1f}" fill="{colour}" '
                     f'fill-opacity="0.12" stroke="{colour}" stroke-width="1"/>')
        n = max(2, int((x2 - x1) / 24) + 1)
        for j in range(n):
            xa = x1 + (x2 - x1) * j / (n - 1)
            hh = h1 + (h2 - h1) * j / (n - 1)
            up = (ld.w1 + (w2 - ld.w1) * j / (n - 1)) > 0
            if up:
                parts.append(_arrow_down(xa, base, base - hh, colour))
            else:
                parts.append(_arrow_down(xa, base - hh, base, colour))
        words = units.fmt(ld.w1, "line_load", sy, 3)
        if ld.kind == "linear":
            words += " to " + units.fmt(w2, "line_load", sy, 3)
        if ld.label:
            words = f"{ld.label}: {words}"
        if ld.case == "dead":
            words += " (dead)"
        parts.append(_t((x1 + x2) / 2, base - max(h1, h2) - 3, words, size=9))
    # the beam
    parts.append(f'<line x1="{_x(0, L):.1f}" y1="{y}" x2="{_x(L, L):.1f}" y2="{y}" '
                 f'stroke="#000" stroke-width="4"/>')
    for s in job.supports:
        parts.append(_support(s, _x(s.at, L), y, L, sy))
    # point loads and couples on top
    for i, ld in enumerate(ld for ld in loads if ld.kind in ("point", "moment")):
        x = _x(ld.at, L)
        colour = "#7a7a7a" if ld.case == "dead" else "#a8321f"
        lab = f"{ld.label}: " if ld.label else ""
        if ld.kind == "point":
            if ld.value <= 0:
                parts.append(_arrow_down(x, y - 100, y - 3, colour))
            else:
                parts.append(_arrow_down(x, y + 58, y + 3, colour))
            ty = y - 104 - 11 * (i % 2) if ld.value <= 0 else y + 70
            parts.append(_t(x, ty, lab + units.fmt(ld.value, "force", sy, 3)
                            + (" (dead)" if ld.case == "dead" else ""), size=10))
        else:
            ccw = ld.value > 0
            a0, a1 = (x + 14, y + 4), (x - 14, y + 4)
            if not ccw:
                a0, a1 = a1, a0
            sweep = 0 if ccw else 1
            parts.append(f'<path d="M {a0[0]:.1f} {a0[1]:.1f} A 14 14 0 1 {sweep} {a1[0]:.1f} '
                         f'{a1[1]:.1f}" fill="none" stroke="{colour}" stroke-width="1.4"/>'
                         f'<circle cx="{a1[0]:.1f}" cy="{a1[1]:.1f}" r="2.5" fill="{colour}"/>')
            parts.append(_t(x, y - 24, lab + units.fmt(ld.value, "moment", sy, 3)
                            + (" ccw" if ccw else " cw"), size=10))
    for w in moving:
        x0 = w.travel[0]
        for off, v in zip(w.offsets, w.live):
            xw = _x(x0 + off, L)
            parts.append(_arrow_down(xw, y - 60, y - 3, "#a8321f"))
        xa, xb = _x(w.travel[0], L), _x(w.travel[1], L)
        parts.append(f'<line x1="{xa:.1f}" y1="{y - 66}" x2="{xb:.1f}" y2="{y - 66}" '
                     f'stroke="#a8321f" stroke-width="1" stroke-dasharray="4,3"/>')
        parts.append(_t((xa + xb) / 2, y - 70, f"{w.label}: "
                        + ", ".join(units.fmt(v, "force", sy, 3) for v in w.live)
                        + " moving (travel dashed)", size=10))
    # span dimension and support positions
    yd = 212
    parts.append(f'<line x1="{_x(0, L):.1f}" y1="{yd}" x2="{_x(L, L):.1f}" y2="{yd}" '
                 f'stroke="#444" stroke-width="0.8"/>')
    for xv in sorted({0.0, L} | {s.at for s in job.supports}):
        xp = _x(xv, L)
        parts.append(f'<line x1="{xp:.1f}" y1="{yd - 5}" x2="{xp:.1f}" y2="{yd + 5}" '
                     f'stroke="#444" stroke-width="0.8"/>')
        parts.append(_t(xp, yd + 16, units.fmt(xv, "length", sy), size=9))
    parts.append(_t(WIDTH / 2, yd - 6, "span " + units.fmt(L, "length", sy), size=10))
    note = []
    if job.self_weight:
        sw = job.self_weight_load()
        note.append("self-weight " + units.fmt(sw.w1, "line_load", sy, 3) + " (not drawn)")
    if job.members > 1:
        note.append(f"loads shown for all {job.members} members together")
    if note:
        parts.append(_t(PAD_L - 40, 248, "; ".join(note), anchor="start", size=9))
    parts.append("</svg>")
    return "".join(parts)


def sample(pw, length: float, extra=(), n: int = 240) -> tuple[np.ndarray, np.ndarray]:
    """Points to draw a piecewise function: a grid, both sides of every break, and `extra`."""
    breaks = np.asarray(pw.breaks, dtype=float)
    grid = np.linspace(0.0, length, n)
    inner = unique(np.concatenate([grid, np.asarray(list(extra), dtype=float)]))
    inner = inner[(inner > 0) & (inner < length)]
    xs, ys = [], []
    bset = set(np.round(breaks / length * 1e9).astype(np.int64)) if length > 0 else set()
    inner = np.array([x for x in inner if int(round(x / length * 1e9)) not in bset])
    pts = sorted([(float(b), 0) for b in breaks] + [(float(x), 1) for x in inner])
    for x, kind in pts:
        if kind == 0:
            left = float(pw(x, side="left"))
            right = float(pw(x, side="right"))
            if x > breaks[0]:
                xs.append(x)
                ys.append(left)
            if x < breaks[-1]:
                xs.append(x)
                ys.append(right)
        else:
            xs.append(x)
            ys.append(float(pw(x)))
    return np.array(xs), np.array(ys)


def diagram(name: str, pw, extreme, length: float, system: str, breaks_at=(),
            state: str = "") -> str:
    """One diagram (shear, moment, slope or deflection) with its extremes labelled.

    `extreme` is the exact `Extreme` of the function; its max and min are marked and
    labelled in the job's units (`data-si`, `data-at` hold the SI numbers). `state` names a
    load state other than the one the report shows (`data-state="governing"`).
    """
    kind = DIAGRAM_KINDS[name]
    colour = COLOURS[name]
    xs, ys = sample(pw, length, extra=(extreme.max_at, extreme.min_at))
    h, top, bottom = 150, 32, 124
    lo = min(0.0, float(np.min(ys)), extreme.min)
    hi = max(0.0, float(np.max(ys)), extreme.max)
    span = hi - lo
    if span <= 0 or not math.isfinite(span):
        lo, hi, span = -1.0, 1.0, 2.0

    def Y(v):  # noqa: N802 - a coordinate map
        return bottom - (v - lo) / span * (bottom - top)

    unit = units.unit_label(kind, system)
    st = f' data-state="{escape(state)}"' if state else ""
    parts = [f'<svg xmlns="http://www.w3.org/2000/svg" class="diagram" data-diagram="{name}"{st} '
             f'viewBox="0 0 {WIDTH} {h}" width="100%" role="img" aria-label="{name} diagram">',
             f'<title>{name} diagram ({unit})</title>']
    y0 = Y(0.0)
    pts = " ".join(f"{_x(x, length):.1f},{Y(v):.1f}" for x, v in zip(xs, ys))
    area = f"{_x(0, length):.1f},{y0:.1f} {pts} {_x(length, length):.1f},{y0:.1f}"
    parts.append(f'<polygon points="{area}" fill="{colour}" fill-opacity="0.15" stroke="none"/>')
    parts.append(f'<polyline points="{pts}" fill="none" stroke="{colour}" stroke-width="1.6"/>')
    parts.append(f'<line x1="{_x(0, length):.1f}" y1="{y0:.1f}" x2="{_x(length, length):.1f}" '
                 f'y2="{y0:.1f}" stroke="#000" stroke-width="0.8"/>')
    for b in breaks_at:
        xb = _x(b, length)
        parts.append(f'<line x1="{xb:.1f}" y1="{top - 4}" x2="{xb:.1f}" y2="{bottom + 4}" '
                     f'stroke="#bbb" stroke-width="0.5" stroke-dasharray="2,3"/>')
    parts.append(_t(4, 12, f"{name.upper()} ({unit})", anchor="start", size=11, cls="dtitle"))
    marks = [("max", extreme.max, extreme.max_at), ("min", extreme.min, extreme.min_at)]
    if abs(extreme.max - extreme.min) <= 1e-12 * max(1.0, abs(extreme.max)) or \
            (extreme.max == 0 and extreme.min == 0):
        marks = marks[:1]
    placed = []
    for which, v, at in marks:
        px, py = _x(at, length), Y(v)
        anchor = "start" if px < WIDTH * 0.5 else "end"
        dx = 6 if anchor == "start" else -6
        ty = py - 6 if which == "max" else py + 14
        ty = min(max(ty, top - 8), h - 14)
        if any(abs(ty - q) < 12 and abs(px - p) < 160 for p, q in placed):
            ty += 14 if which == "min" else -14
        placed.append((px, ty))
        text = (f"{which} {units.fmt(v, kind, system)} at {units.fmt(at, 'length', system)}")
        parts.append(f'<circle cx="{px:.1f}" cy="{py:.1f}" r="3" fill="{colour}"/>')
        parts.append(_t(px + dx, ty, text, anchor=anchor, size=10, cls=f"extreme {which}",
                        extra=f' data-which="{which}" data-si="{v!r}" data-at="{at!r}"'))
    parts.append(_t(_x(0, length), h - 2, units.fmt(0.0, "length", system), size=9))
    parts.append(_t(_x(length, length), h - 2, units.fmt(length, "length", system), size=9))
    parts.append("</svg>")
    return "".join(parts)
