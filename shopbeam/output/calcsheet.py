"""The exact calc sheet: the same singularity-function solve done with sympy, in exact numbers.

The load intensity is written as a sum of brackets <x - a>^n (sympy's SingularityFunction),
integrated four times with sympy, and the reactions, hinge rotations and the two integration
constants come from sympy's linear solver, exactly (rationals) when the inputs are. The sheet
is plain text for a terminal, an e-mail or a job folder. sympy is imported here only, so the
numeric path never pays for it.
"""

from __future__ import annotations

import textwrap
from dataclasses import dataclass
from fractions import Fraction

from shopbeam import units
from shopbeam.cautions import cautions_for
from shopbeam.engine.model import Beam
from shopbeam.engine.solver import solve
from shopbeam.errors import InputError

# display scales per system: (length, force, label words)
SCALES = {
    "us": (units.FT, units.LBF, {"length": "ft", "force": "lbf", "line": "lbf/ft",
                                 "moment": "lbf*ft", "ei": "lbf*ft^2", "stiff": "lbf/ft"}),
    "si": (1.0, 1000.0, {"length": "m", "force": "kN", "line": "kN/m",
                         "moment": "kN*m", "ei": "kN*m^2", "stiff": "kN/m"}),
}


def exact_number(v: float):
    """A float as a sympy Rational: the simple fraction it stands for when there is one."""
    import sympy as sp  # noqa: PLC0415 - startup

    if v == 0:
        return sp.Integer(0)
    f = Fraction(v).limit_denominator(1_000_000)
    if abs(float(f) - v) <= 1e-10 * abs(v):
        return sp.Rational(f.numerator, f.denominator)
    return sp.Rational(f"{v:.12g}")


@dataclass
class Exact:
    """The exact solve: expressions in x (display units) and the solved unknowns."""

    x: object
    ei: object  # the symbol EI
    unknowns: list  # sympy symbols in order
    names: list[str]  # what each unknown is, in words
    equations: list[tuple[str, object]]  # (condition in words, expression = 0)
    solution: dict  # symbol -> exact value
    q: object
    shear: object
    moment: object
    ei_slope: object
    ei_deflection: object
    length: object


def _at(expr, xv, sf):
    """Value just right of xv (point and couple terms vanish away from their point)."""
    def repl(e):
        _, a, n = e.args
        if n < 0:
            return 0
        if xv > a:
            return (xv - a) ** n
        if xv == a and n == 0:
            return 1
        return 0

    out = expr.replace(lambda e: isinstance(e, sf), repl)
    free = [s for s in out.free_symbols if s.name == "x"]
    return out.subs(free[0], xv) if free else out


def exact_solve(beam: Beam, length_unit: float = 1.0, force_unit: float = 1.0) -> Exact:
    """Solve `beam` symbolically in the given units (default SI)."""
    import sympy as sp  # noqa: PLC0415 - startup
    from sympy import SingularityFunction as SF  # noqa: PLC0415 - startup

    lu, fu = length_unit, force_unit
    X = lambda v: exact_number(v / lu)  # noqa: E731
    x = sp.Symbol("x", real=True)
    EI = sp.Symbol("EI", positive=True)
    L = X(beam.length)
    q = sp.Integer(0)
    for ld in beam.loads:
        if ld.kind == "point":
            q += exact_number(ld.value / fu) * SF(x, X(ld.at), -1)
        elif ld.kind == "moment":
            q += -exact_number(ld.value / (fu * lu)) * SF(x, X(ld.at), -2)
        else:
            s, e = X(ld.start), X(ld.end)
            w1 = exact_number(ld.w1 * lu / fu)
            w2 = w1 if ld.kind == "uniform" else exact_number(ld.w2 * lu / fu)
            slope = (w2 - w1) / (e - s)
            q += w1 * SF(x, s, 0) - w2 * SF(x, e, 0)
            if slope != 0:
                q += slope * SF(x, s, 1) - slope * SF(x, e, 1)
    unknowns, names, conds = [], [], []
    hinge_terms = sp.Integer(0)
    n_r = n_m = n_h = 0
    for sup in beam.supports:
        a = X(sup.at)
        if sup.takes_force:
            n_r += 1
            r = sp.Symbol(f"R{n_r}")
            unknowns.append(r)
            names.append(f"{sup.kind} force at x = {a}")
            q += r * SF(x, a, -1)
            conds.append(("force", sup, a, r))
        if sup.takes_moment:
            n_m += 1
            m = sp.Symbol(f"M{n_m}")
            unknowns.append(m)
            names.append(f"fixed-end moment (+ ccw) at x = {a}")
            q += -m * SF(x, a, -2)
            conds.append(("moment", sup, a, m))
        if sup.kind == "hinge":
            n_h += 1
            h = sp.Symbol(f"H{n_h}")
            unknowns.append(h)
            names.append(f"EI x rotation jump at the hinge at x = {a}")
            hinge_terms += h * SF(x, a, 0)
            conds.append(("hinge", sup, a, h))
    c1, c2 = sp.symbols("C1 C2")
    unknowns += [c1, c2]
    names += ["EI x slope at x = 0", "EI x deflection at x = 0"]
    V = sp.integrate(q, x)
    M = sp.integrate(V, x)
    T = sp.integrate(M, x) + hinge_terms + c1
    U = sp.integrate(T - c1, x) + c1 * x + c2
    eqs = [("shear just past the end V(L+) = 0", _at(V, L, SF)),
           ("moment just past the end M(L+) = 0", _at(M, L, SF))]
    for kind, sup, a, sym in conds:
        if kind == "force" and sup.kind == "spring":
            k = exact_number(sup.stiffness * lu / fu)
            eqs.append((f"spring at x = {a}: R = -k u, so EI R + k EI u = 0",
                        EI * sym + k * _at(U, a, SF)))
        elif kind == "force":
            eqs.append((f"no deflection at the {sup.kind} support at x = {a}", _at(U, a, SF)))
        elif kind == "moment":
            eqs.append((f"no slope at the fixed support at x = {a}", _at(T, a, SF)))
        else:
            eqs.append((f"no moment at the hinge at x = {a}", _at(M, a, SF)))
    sol_set = sp.linsolve([sp.expand(e) for _, e in eqs], unknowns)
    sol = dict(zip(unknowns, next(iter(sol_set)))) if sol_set else {}
    return Exact(x, EI, unknowns, names, eqs, sol, q, V, M, T, U, L)


def _num(v) -> str:
    v = float(v)
    return units.num(v, 6)


def _coef(c) -> str:
    import sympy as sp  # noqa: PLC0415 - startup

    c = sp.nsimplify(c) if c.is_number else c
    if c.is_number:
        if c.is_Rational and c.q != 1 and c.q <= 1000:
            return f"{c.p}/{c.q}"
        return _num(c)
    return f"({sp.sstr(c)})" if c.is_Add else sp.sstr(c)


def brackets(expr, x) -> str:
    """A bracket expression as plain text: 445.9 <x>^-1 - 300 <x - 7/2>^-1 ..."""
    import sympy as sp  # noqa: PLC0415 - startup
    from sympy import SingularityFunction as SF  # noqa: PLC0415 - startup

    expr = sp.expand(expr)
    if expr == 0:
        return "0"
    groups: dict = {}
    order = []
    for term in sp.Add.make_args(expr):
        coef, rest = term.as_independent(SF, x, as_Add=False)
        if rest not in groups:
            order.append(rest)
            groups[rest] = sp.Integer(0)
        groups[rest] += coef

    def key(r):
        if isinstance(r, SF):
            return (float(r.args[1]), -int(r.args[2]))
        return (-1.0, 0)

    parts = []
    for rest in sorted(order, key=key):
        coef = sp.simplify(groups[rest])
        if coef == 0:
            continue
        if isinstance(rest, SF):
            a, n = rest.args[1], int(rest.args[2])
            inner = "x" if a == 0 else f"x - {_coef(a)}"
            body = f"<{inner}>^{n}"
        elif rest == 1:
            body = ""
        else:
            body = sp.sstr(rest)
        neg = bool(coef.is_number and coef < 0) or (not coef.is_number and coef.could_extract_minus_sign())
        c = -coef if neg else coef
        ctext = "" if (c == 1 and body) else _coef(c)
        piece = f"{ctext} {body}".strip()
        parts.append(("- " if neg else "+ ") + piece)
    text = " ".join(parts)
    return text[2:] if text.startswith("+ ") else "-" + text[1:] if text.startswith("- ") else text


def calc_sheet(job, result=None, width: int = 78) -> str:
    """The calc sheet for a job, in its display units (`result`, the job's analysis, where the
    caller has one: a moving-load job's sheet solves the state it shows, and works it out
    when not given; the sheet checks itself against a numeric solve of the same loads). Its text
    is wrapped at `width` columns (the text UI passes the width of its view)."""
    import sympy as sp  # noqa: PLC0415 - startup

    from shopbeam.jobs.limits import calc_problem  # noqa: PLC0415

    lu, fu, lab = SCALES[job.units]
    beam = job.beam()
    state = ""
    if job.moving:
        # the wheel set at the position the report shows (the state that governs): the
        # sheet solves what the report's reactions and diagrams are for
        from shopbeam.design.analysis import analyze  # noqa: PLC0415 - only moving jobs

        res = result if result is not None else analyze(job)
        beam, state = res.solution.beam, res.shown_state
    too_big = calc_problem(beam.supports, beam.loads)  # the member's own weight is one
    if too_big:
        raise InputError(too_big, "loads", file=getattr(job, "path", "") or "")
    ex = exact_solve(beam, lu, fu)
    ei_val = exact_number(beam.ei / (fu * lu * lu))
    out = textwrap.wrap(f"shopbeam calc sheet: {job.title}", width, subsequent_indent="  ")
    out.append("=" * width)
    for c in cautions_for(job.tags, job.caution_lifting):
        out += textwrap.wrap(c, width, initial_indent="!! ", subsequent_indent="!! ")
    out.append("")
    for para in (f"Units: x and positions in {lab['length']}, forces in {lab['force']}, "
                 f"moments in {lab['moment']}, EI in {lab['ei']}.",
                 "Brackets: <x - a>^n is 0 left of a and (x - a)^n right of it; <x - a>^-1 "
                 "is a point force and <x - a>^-2 a couple (each integrates to the next "
                 "power up).",
                 "Signs: forces + up, couples + counterclockwise, M + sagging, V = dM/dx."):
        out += textwrap.wrap(para, width, break_on_hyphens=False)
    if job.moving:
        said = state.split("; ")[-1] if state else "the state that governs"
        out += textwrap.wrap("This sheet solves the wheel set at one place: the report's "
                             f"{said} (the wheel loads are point loads here, with "
                             "their share of impact where the job has one); every other "
                             "position the checks cover is solved numerically by the same "
                             "method.", width)
    elif any(ld.patterned for ld in job.loads):
        out += textwrap.wrap("This sheet solves the loads as entered (all patterned loads on); "
                             "the load states the checks cover are solved numerically by the "
                             "same method.", width)
    e_text = units.fmt(job.material.e, 'stress', job.units)
    if getattr(job.material, "kind", "") == "lumber" and job.units == "us":
        e_text = f"{units.num(job.material.e / units.PSI / 1e6, 3)}e6 psi"  # wood's own figure
    out.append("")
    out += textwrap.wrap(f"Beam length L = {_coef(ex.length)} {lab['length']}; "
                         f"EI = {_num(ei_val)} {lab['ei']} (E = {e_text}, "
                         f"I = {units.fmt(job.section.ix, 'inertia', job.units)})", width,
                         subsequent_indent="  ")
    out += ["", "Unknowns:"]
    for sym, name in zip(ex.unknowns, ex.names):
        out.append(f"  {sym} = {name}")
    out.append("")
    rows = [("load intensity q(x)", ex.q), ("shear V(x) = integral of q", ex.shear),
            ("moment M(x) = integral of V", ex.moment),
            ("EI slope(x) = integral of M (+ hinge steps + C1)", ex.ei_slope),
            ("EI deflection(x) = integral of EI slope", ex.ei_deflection)]
    for title, expr in rows:
        out.append(title + ":")
        out += textwrap.wrap(brackets(expr, ex.x), width, initial_indent="  ",
                             subsequent_indent="      ")
        out.append("")
    out.append("Conditions (one per unknown):")
    for words, expr in ex.equations:
        out.append(f"  {words}:")
        out += textwrap.wrap(sp.sstr(sp.expand(expr)) + " = 0", width, initial_indent="      ",
                             subsequent_indent="        ")
    out.append("")
    out.append("Solution (exact, then decimal; EI kept as a symbol where it matters):")
    for sym in ex.unknowns:
        val = sp.simplify(ex.solution.get(sym, sp.nan))
        exact = sp.sstr(val)
        decimal = _num(val.subs(ex.ei, ei_val)) if val.free_symbols <= {ex.ei} else "?"
        unit = (lab["force"] if str(sym).startswith("R") else lab["moment"] if str(sym).startswith("M")
                else lab["ei"] if str(sym).startswith(("H", "C1")) else f"{lab['ei']}*{lab['length']}")
        if str(sym).startswith("H"):
            unit = f"{lab['ei']} (rad x EI)"
        out.append(f"  {sym} = {exact}" + (f" = {decimal} {unit}" if exact != decimal else f" {unit}"))
    out.append("")
    out.append("Moment with the unknowns put in:")
    m_final = ex.moment.subs(ex.solution)
    out += textwrap.wrap("M(x) = " + brackets(m_final, ex.x), width, initial_indent="  ",
                         subsequent_indent="      ")
    out.append("")
    # the numeric engine on the very same beam must give the same reactions
    numeric = solve(beam).reactions
    agree = []
    for r, sym in zip(numeric, [s for s in ex.unknowns if str(s).startswith("R")]):
        exact_val = float(ex.solution[sym].subs(ex.ei, ei_val)) * fu
        agree.append(abs(exact_val - r.force) <= 1e-9 * max(1.0, abs(r.force)))
    out.append("Numeric engine agrees with this sheet: " + ("yes" if all(agree) else "NO - report this"))
    out.append("")
    out += textwrap.wrap("CAUTION: " + cautions_for(job.tags, job.caution_lifting)[-1], width)
    from shopbeam.escapes import shown

    return shown("\n".join(out), keep="\n") + "\n"
