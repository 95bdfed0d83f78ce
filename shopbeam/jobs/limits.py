"""Bounded work for every job: what a job may ask for, checked before any solving.

Two gates. `prescan` looks at the raw text before the TOML parser sees it: the nesting depth
(dotted keys, table headers, nested arrays and inline tables) and the number of keys, so a
file of deeply dotted keys is refused in milliseconds instead of tying up the parser. The
counts of what the solve will do (supports, springs, hinges, loads, wheels, and the moving-
load search, whose cells number (wheels x interior supports + 1) x (wheels + fixed positions)
+ 3 x wheels x other fixed positions: `moving_work`) are
checked by the job reader with `cost_problems`. The limits are set so that any job inside
them answers in under 2 s as a whole process on the development machine (bench/: the worst
cases inside the limits); anything outside is refused at once, naming the limit, the file,
the key and its line.
"""

from __future__ import annotations

import re

MAX_FILE_BYTES = 1_000_000  # a job at its 1,000-load limit is about 100 kB
MAX_DEPTH = 6  # beam.section.x is 3; nothing in a job file needs more
MAX_KEYS = 50_000  # a job at its 1,000-load limit has about 5,000; the parser takes 50,000 fast
# a wheel set's own cap: the search below grows linearly in wheels on a member no wheel can
# cross a support of (a simple span, a cantilever), and each load state solved and checked
# reads every wheel, so 200 wheels (no shop trolley has more; a longer train is a uniform
# load) answer `capacity` and `rating` in under 2 s as a whole process (bench/limits.py)
MAX_WHEELS = 200
MAX_SPRINGS = 100
MAX_HINGES = 100
# (wheels x interior supports + 1) x (wheels + fixed positions) + 3 x wheels x (fixed
# positions - interior supports - 1): the (x, trolley position) cells the exact moving-load
# envelope builds and searches (engine/influence.wheel_cells: a strip of the travel per
# wheel crossing an interior support, springs and hinges included, each holding a cell
# between every two neighbouring lines, and three more cells per crossing of a wheel over
# another fixed position). It is never more than the earlier wheels x fixed x (wheels +
# fixed), so every job that bound let in is let in;
# 4,000 keeps `capacity` and `rating` (about ten envelopes each) under 2 s as a whole process
# on the development machine (bench/README.md)
MOVING_WORK = 4000
MAX_WHEEL_FORCE = 1e9  # N, as for a point load (jobfile.LOAD_LIMITS)
# patterned loads: each span that carries one is a unit solution reaching every span, and
# every patterned load is placed in each, so the exact envelopes cost about (spans with a
# patterned load) x (spans + patterned loads); 60,000 (100 patterned spans with 5 loads
# each) answers `rating` in about 1.2 s of processor time on the development machine, and
# 200 spans took 3 s and 470 MB (bench/README.md)
PATTERN_WORK = 60_000
# sizing a patterned job sweeps every section over those envelopes: (spans with a patterned
# load) x spans x sections; 400,000 (25 spans over the 516 HSS) sizes in about 2 s
SIZE_PATTERN_WORK = 400_000
# a wheel set beside patterned loads: the search once per pattern, each pattern's states
# solved and checked (and a floor's live-load check solves more): about four times the
# cost of the same units of search alone, so the product is held to a quarter of
# MOVING_WORK (a 2-wheel cart over 3 patterned 8 ft spans, 8 x about 90: `rating` 1.6 s;
# over 5, 32 x 122: 9.5 s, refused; measured 2026-12-04)
PATTERN_MOVING_WORK = MOVING_WORK // 4


# the exact calc sheet (rational brackets solved by sympy) grows with the loads and, faster,
# with the supports, hinges and springs: loads + 5 x those <= 60 keeps it to a few seconds on
# the development machine (40 loads on 2 supports 2.3 s, 5 loads on 10 supports 2.7 s, 60
# loads 5.5 s, 100 loads 11 s under load: measured 2026-12-04); past it the sheet is refused
# with what to use instead (the report has every figure)
CALC_TERMS = 60


def calc_problem(supports, loads) -> str:
    """Why the exact calc sheet is not worked out for this job ("" when it is)."""
    held = len(supports)
    terms = len(loads) + 5 * held
    if terms <= CALC_TERMS:
        return ""
    return (f"the exact calc sheet of {len(loads)} loads (the member's own weight counts as "
            f"one) on {held} supports, hinges and springs "
            f"is too large to work out in a few seconds (loads + 5 x supports = {terms}, "
            f"more than {CALC_TERMS}); `shopbeam solve` and `shopbeam report` give every "
            "figure and check without the exact algebra")


def _edges(supports, length=None) -> list[float]:
    """The ends of the spans and overhangs: the member's ends and the supports that take
    force inside it."""
    held = sorted({s.at for s in supports if getattr(s, "takes_force", True)})
    end = length if length is not None else max(held + [0.0])
    return [0.0] + [x for x in held if 0.0 < x < end] + [end]


def patterned_spans(supports, loads, length=None) -> tuple[int, int]:
    """(spans and overhangs, of them carrying a patterned load)."""
    edges = _edges(supports, length)
    hit = set()
    for ld in loads:
        if not getattr(ld, "patterned", False):
            continue
        a, b = (ld.at, ld.at) if ld.kind in ("point", "moment") else (ld.start, ld.end)
        for i, (x0, x1) in enumerate(zip(edges, edges[1:])):
            if (a < x1 and b > x0) if a < b else (x0 <= a <= x1):
                hit.add(i)
    return len(edges) - 1, len(hit)

_STRINGS = re.compile(r'"""[\s\S]*?"""|\'\'\'[\s\S]*?\'\'\'|"(?:[^"\\\n]|\\.)*"|\'[^\'\n]*\'')
_COMMENT = re.compile(r"#[^\n]*")
_KEYLINE = re.compile(r"^[ \t]*(\[\[?)?[ \t]*([^=\[\]\n]*?)[ \t]*(\]\]?[ \t]*$|=)", re.M)


def prescan(text: str) -> list[tuple[str, int]]:
    """Problems with the shape of the TOML text (message, line), found without parsing it."""
    # strings and comments hold no structure: blank them out, keeping the line breaks
    bare = _STRINGS.sub(lambda m: '""' + "\n" * m.group(0).count("\n"), text)
    bare = _COMMENT.sub("", bare)
    out: list[tuple[str, int]] = []
    keys = bare.count("=")
    if keys > MAX_KEYS:
        out.append((f"the file has {keys:,} keys, more than a job file can have "
                    f"({MAX_KEYS:,}); is it the right file?", 1))
    for m in _KEYLINE.finditer(bare):
        dots = m.group(2).count(".")
        depth = dots + 1
        if depth > MAX_DEPTH:
            line = bare.count("\n", 0, m.start()) + 1
            out.append((f"a key nested {depth} deep (the limit is {MAX_DEPTH}); a job file "
                        "needs at most beam.section.key", line))
            break
    depth = worst = 0
    worst_at = 0
    for m in re.finditer(r"[\[\]{}]", bare):
        depth += 1 if m.group(0) in "[{" else -1
        if depth > worst:
            worst, worst_at = depth, m.start()
        if worst > MAX_DEPTH + 2:
            break
    if worst > MAX_DEPTH + 2:
        out.append((f"brackets nested over {MAX_DEPTH + 2} deep; a job file needs 2 "
                    "(a list of values)", bare.count("\n", 0, worst_at) + 1))
    return out


def moving_work(wheels: int, fixed: int, inner: int = 0) -> int:
    """The cells of the moving-load search: `inner` supports, springs and hinges strictly
    inside the member (a wheel crossing one starts a strip of the travel), `fixed` positions
    (supports, load ends, braces, the ends)."""
    return (wheels * inner + 1) * (wheels + fixed) + 3 * wheels * max(fixed - inner - 1, 0)


def cost_problems(supports, loads, moving, braces=(), length=None) -> list[tuple[str, str]]:
    """Counts beyond what shopbeam takes: (message, key path)."""
    out = []
    patterned = [ld for ld in loads if getattr(ld, "patterned", False)]
    if patterned:
        spans, hit = patterned_spans(supports, loads, length)
        work = hit * (spans + len(patterned))
        if work > PATTERN_WORK:
            out.append((f"{len(patterned)} patterned loads on {hit} of {spans} spans take "
                        f"{work:,} units of work (patterned spans x (spans + patterned loads)), "
                        f"more than shopbeam takes ({PATTERN_WORK:,}); split the member into "
                        "shorter runs, or merge loads", "loads"))
    springs = sum(1 for s in supports if s.kind == "spring")
    hinges = sum(1 for s in supports if s.kind == "hinge")
    if springs > MAX_SPRINGS:
        out.append((f"{springs} springs is more than shopbeam takes ({MAX_SPRINGS})", "supports"))
    if hinges > MAX_HINGES:
        out.append((f"{hinges} hinges is more than shopbeam takes ({MAX_HINGES})", "supports"))
    for w in moving:
        n = len(w.live)
        key = getattr(w, "key", "moving[0]")
        for name, values in (("loads", w.live), ("dead", w.dead)):
            big = max((abs(v) for v in values), default=0.0)
            if not big <= MAX_WHEEL_FORCE:  # the size limit a point load gets
                from shopbeam import units

                out.append((f"{units.fmt(big, 'force')} on a wheel is far beyond any shop load "
                            f"(the limit is {units.fmt(MAX_WHEEL_FORCE, 'force')}): check the "
                            "number and its unit", f"{key}.{name}"))
        if n > MAX_WHEELS:
            out.append((f"{n} wheels is more than shopbeam takes in one wheel set "
                        f"({MAX_WHEELS}); model a long train of wheels as a uniform load",
                        f"{key}.loads"))
            continue
        fixed = {0.0} | {s.at for s in supports} | set(braces)
        for ld in loads:
            fixed.update(ld.describe_position())
        end = length if length is not None else max(fixed)
        inner = len({s.at for s in supports if 0.0 < s.at < end})
        work = moving_work(n, len(fixed) + 1, inner)
        # beside a wheel set, every pattern of the spans that carry a patterned load is a load
        # state the wheel set's envelope is searched in: 2^(those spans) searches
        pat = patterned_spans(supports, loads, length)[1] if any(
            getattr(ld, "patterned", False) for ld in loads) else 0
        if pat and (pat > 20 or work * 2 ** pat > PATTERN_MOVING_WORK):
            total = f"{work * 2 ** pat:,}" if pat <= 20 else f"more than {PATTERN_MOVING_WORK:,}"
            out.append((f"a wheel set of {n} wheels ({work:,} units of search) beside "
                        f"patterned loads on {pat} spans takes {total} units (the search "
                        f"once for each of the 2^{pat} patterns), more than shopbeam takes "
                        f"({PATTERN_MOVING_WORK:,}); use fewer wheels or patterned spans, or make the "
                        "loads beside the wheels not patterned", f"{key}.loads"))
            continue
        if work > MOVING_WORK:
            out.append((f"a wheel set of {n} wheels over {len(fixed) + 1} fixed positions "
                        f"(supports, load ends, braces), {inner} of them supports inside the "
                        f"member, takes {work:,} units of search, more than shopbeam takes "
                        f"({MOVING_WORK:,} = (wheels x inside supports + 1) x (wheels + "
                        "positions) + 3 x wheels x (positions - inside supports - 1)); use "
                        "fewer wheels, supports or loads, or split the job", f"{key}.loads"))
    return out
