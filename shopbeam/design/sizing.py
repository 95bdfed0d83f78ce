"""Sizing: every catalog (or stock) section that passes the job, lightest first.

The sweep is fast because the layout is solved once, not once per section. Shear and moment
of a beam without springs do not depend on EI, and deflection is EI*u / EI: every load state
is fixed + w_self x (unit self-weight) + k x live, all solved with EI = 1 and sharing one set
of breaks. Each section then only scales and adds coefficient arrays, and the exact extremes
of all sections come from one batched root solve per check. The capacity factor k of every
section is found by a vectorised bracketed root search (Illinois regula falsi) on the same
arrays. With patterns the two states are the exact envelopes over all patterns.

Jobs whose full check reads more than those arrays hold are screened, then checked in full:
- springs: a beam of stiffness EI on springs k has the moments of a beam of EI = 1 on
  springs k / EI, so each section is the reference layout plus extra springs; their forces
  come from one small linear system per section (`_spring_forces`), exact;
- moving loads: every check's governing trolley position for the job's own section and nine
  positions along the travel are solved as static states (patterns: all on, all off and the
  governing ones), with the wheel flange check of lifting jobs under each wheel;
- a load hung from a flange (lifting): its flange check is left to the full check.
Any chosen state is a real load state, so a screened ratio is never above the section's
full-check ratio (a lower bound: above 1 it fails for sure). The rows are then checked in
full (`evaluate`, `capacity`) lightest first, skipping those the screen already fails, until
one passes: every lighter section has failed a full check or a lower bound, so the lightest
that passes is the one checking every section in full would give (tests/test_sizing_exact.py).
Rows heavier than it that pass the screen are "screened only": not listed as passing. A short
list (a stock list of up to 12) is checked in full throughout. Memory: sections go through
in chunks (CHUNK_BYTES per working array), so no count of sections is refused.

Ranking: by weight per length, lightest first; with a priced stock list also by price
(cheapest that passes, found the same way in price order).
"""

from __future__ import annotations

import math
import re
import time
from dataclasses import dataclass, replace

import numpy as np

from shopbeam import units
from shopbeam.cautions import cautions_for
from shopbeam.design import local as _local
from shopbeam.design import uplift
from shopbeam.design.analysis import (HOGGING_CHECK, hogging_allowables, hogging_checks,
                                       hogging_lengths, loaded_on_top, span_top_checks,
                                       top_flange_checks,
                                       top_load_segments, top_only)
from shopbeam.design.capacity import capacity, job_gaps, rating_gaps, solved_gaps
from shopbeam.design.fatigue import fatigue_check
from shopbeam.design.fatigue import given as fatigue_given
from shopbeam.design.checks import (job_factors, BASIS_WORDS, basis_of, brace_points, cb_factor,
                                    deflection_limit, deflection_rule, flexure, nominal_moment,
                                    shear_strength, strengths, unbraced_segments)
from shopbeam.design.lifting import (DEFAULT_WHEEL_EDGE, OMEGA_WHEEL, flange_coefficients,
                                     flange_tf_at_wheel, profile_of, tip_hung)
from shopbeam.design.loading import (_dummies, _positions, build_envelope, evaluate, split_by_span,
                                     load_parts,
                                     state_set)
from shopbeam.design.lumber import service_of
from shopbeam.engine.model import Beam, Load
from shopbeam.engine.piecewise import _horner, _roots_in_pieces
from shopbeam.engine.solver import segments, solve, solve_many
from shopbeam.errors import InputError
from shopbeam.jobs.limits import SIZE_PATTERN_WORK, patterned_spans
from shopbeam.jobs.rules import WOOD_E_MAX
from shopbeam.members import catalog, wood
from shopbeam.members.materials import EN_GRADES, get as get_material
from shopbeam.members.sections import bending_ix, turn



@dataclass(frozen=True)
class SizeRow:
    designation: str
    section: object
    material: object
    weight: float  # kg/m
    ratio: float  # governing ratio at the entered loads
    governing: str
    factor: float  # capacity factor k of the live loads
    price_per_m: float | None = None
    note: str = ""
    # how the ratio was found: "full" (the section's own full check), "batched" (the batched
    # sweep, the same checks exactly) or "screen" (a lower bound over chosen load states: the
    # row fails when it is above 1, and is not known to pass until checked in full)
    checked: str = "batched"
    # why no load may be posted on this section although it passes (a limit state the checks
    # do not cover, see capacity.not_rated_reasons); filled for rows checked in full
    not_rated: tuple[str, ...] = ()

    @property
    def ok(self) -> bool:
        # a factor under 1 where the ratio passes: capacity's own states are stricter than
        # the loads as entered (a hoist given at one place is rated travelling), and a
        # section whose rating is under the loads entered does not carry them
        low = math.isfinite(self.factor) and 0 <= self.factor < 1 - 1e-9
        return self.ratio <= 1.0 and self.checked != "screen" and not low

    @property
    def screened_only(self) -> bool:
        """Passed the screen but not checked in full (heavier than the lightest that passes)."""
        return self.checked == "screen" and self.ratio <= 1.0 + SCREEN_TOL

    def cost(self, length: float) -> float | None:
        return None if self.price_per_m is None else self.price_per_m * length


@dataclass(frozen=True)
class SizeResult:
    job: object
    kind: str
    rows: tuple[SizeRow, ...]  # every section swept, lightest first
    seconds: float
    method: str
    currency: str = ""
    skipped: tuple[str, ...] = ()
    material_note: str = ""  # said when the sweep used another material than the job's
    full_checks: int = 0  # sections checked in full (evaluate + capacity) after the batch

    @property
    def screened_only(self) -> list[SizeRow]:
        return [r for r in self.rows if r.screened_only]

    @property
    def passing(self) -> list[SizeRow]:
        return [r for r in self.rows if r.ok]

    @property
    def lightest(self) -> SizeRow | None:
        p = self.passing
        return p[0] if p else None

    @property
    def lightest_rated(self) -> SizeRow | None:
        """The lightest passing section checked in full with no reason to withhold a rating
        (none when there is no live load to rate: k infinite)."""
        p = [r for r in self.passing if r.checked == "full" and not r.not_rated
             and not math.isinf(r.factor)]
        return p[0] if p else None

    @property
    def cheapest(self) -> SizeRow | None:
        p = [r for r in self.passing if r.price_per_m is not None]
        return min(p, key=lambda r: (r.price_per_m, r.weight)) if p else None


# ------------------------------------------------------------------ batched extremes
def _real_roots_01(c: np.ndarray) -> tuple[np.ndarray, np.ndarray]:
    """Real roots in [0, 1] of rows of ascending coefficients (N, w), w <= 4, in closed form
    (linear, quadratic, trigonometric/Cardano cubic); wider rows go to the companion solve."""
    n, w = c.shape
    if w > 4:  # rows whose top terms are negligible (uniform loads: quartic deflection, cubic
        # derivative) stay in closed form; only the rest go to the companion solve
        top = np.abs(c).max(axis=1)
        wide = (np.abs(c[:, 4:]) > 1e-12 * top[:, None]).any(axis=1)
        if wide.all():
            return _roots_in_pieces(c, np.ones(n))
        narrow = np.flatnonzero(~wide)
        rows, t = _real_roots_01(c[narrow, :4])
        rows = narrow[rows]
        if wide.any():
            wi = np.flatnonzero(wide)
            r2, t2 = _roots_in_pieces(c[wi], np.ones(len(wi)))
            rows, t = np.concatenate([rows, wi[r2]]), np.concatenate([t, t2])
        return rows, t
    size = np.abs(c)
    top = size.max(axis=1)
    rel = size > 1e-12 * top[:, None]
    deg = np.where(top > 0, w - 1 - np.argmax(rel[:, ::-1], axis=1), 0)
    rows_out, t_out = [], []
    r1 = np.nonzero(deg == 1)[0]
    if r1.size:
        rows_out.append(r1)
        t_out.append(-c[r1, 0] / c[r1, 1])
    r2 = np.nonzero(deg == 2)[0]
    if r2.size:
        a, b, cc = c[r2, 2], c[r2, 1], c[r2, 0]
        disc = b * b - 4 * a * cc
        ok = disc >= 0
        sq = np.sqrt(np.where(ok, disc, 0.0))
        q = -0.5 * (b + np.copysign(sq, b))
        with np.errstate(divide="ignore", invalid="ignore"):
            x1 = np.where(ok, q / a, np.nan)
            x2 = np.where(ok & (q != 0), cc / q, np.nan)
        rows_out += [r2, r2]
        t_out += [x1, x2]
    r3 = np.nonzero(deg == 3)[0]
    if r3.size:
        a = c[r3, 3]
        b, cc, d = c[r3, 2] / a, c[r3, 1] / a, c[r3, 0] / a
        p = cc - b * b / 3
        q = 2 * b**3 / 27 - b * cc / 3 + d
        disc = (q / 2) ** 2 + (p / 3) ** 3
        three = disc < 0
        with np.errstate(invalid="ignore", divide="ignore"):
            m = 2 * np.sqrt(np.where(three, -p / 3, 0.0))
            arg = np.where(three, np.clip((3 * q / (2 * np.where(three, p, -1.0)))
                                          * np.sqrt(np.where(three, -3 / p, 0.0)), -1, 1), 0.0)
            th = np.arccos(arg) / 3
            sd = np.sqrt(np.where(three, 0.0, disc))
            one = np.cbrt(-q / 2 + sd) + np.cbrt(-q / 2 - sd)
        for kk in range(3):
            root = np.where(three, m * np.cos(th - 2 * np.pi * kk / 3), one if kk == 0 else np.nan)
            rows_out.append(r3)
            t_out.append(root - b / 3)
    if not rows_out:
        return np.zeros(0, int), np.zeros(0)
    rows = np.concatenate(rows_out)
    t = np.concatenate(t_out)
    keep = np.isfinite(t) & (t > -1e-9) & (t < 1 + 1e-9)
    rows, t = rows[keep], np.clip(t[keep], 0.0, 1.0)
    cr = c[rows]
    dcr = cr[:, 1:] * np.arange(1, w)
    for _ in range(2):  # Newton polish
        f = _horner(cr, t)
        df = _horner(dcr, t)
        step = np.divide(f, df, out=np.zeros_like(f), where=np.abs(df) > 0)
        tn = t - step
        t = np.where((tn >= 0) & (tn <= 1), tn, t)
    return rows, t


def _absmax_states(co: np.ndarray, breaks: np.ndarray, nreal: np.ndarray,
                   intervals) -> list[np.ndarray]:
    """Exact max |f| over each interval (a, b) for every section and state: co (n, S, P, w)
    on each state's own breaks (S, P + 1), of which the first nreal[s] pieces are real (the
    rest pad to a common count, zero length and zero coefficients). Returns (n, S) each."""
    return _interval_extremes(co, breaks, nreal, intervals, np.abs, np.maximum)


def _min_states(co: np.ndarray, breaks: np.ndarray, nreal: np.ndarray,
                intervals) -> list[np.ndarray]:
    """Exact least value of f (signed) over each interval, at most 0, for every section and
    state, as `_absmax_states` takes its arrays. Returns (n, S) each."""
    return _interval_extremes(co, breaks, nreal, intervals, lambda x: x, np.minimum)


def _interval_extremes(co, breaks, nreal, intervals, value, pick) -> list[np.ndarray]:
    """The extreme (`pick`: np.maximum or np.minimum) of `value`(f) over each interval, for
    every section and state, and 0 where that is more extreme (its sign's bound): each piece
    at its ends and the real roots of f' inside it, then each interval from its run of
    pieces."""
    n, S, P, w = co.shape
    h = np.diff(breaks, axis=1)
    hh = np.broadcast_to(h[None], (n, S, P)).reshape(-1)
    flat = co.reshape(-1, w)
    best = pick(value(flat[:, 0]), value(_horner(flat, hh)))
    if w > 1:
        d = flat[:, 1:] * np.arange(1, w) * (hh[:, None] ** np.arange(w - 1))  # in tau = t / h
        rows, tau = _real_roots_01(d)
        if rows.size:
            pick.at(best, rows, value(_horner(flat[rows], tau * hh[rows])))
    best = best.reshape(n, S, P)
    reduce = np.max if pick is np.maximum else np.min
    tol = 1e-9 * (breaks[0, -1] - breaks[0, 0])
    out = [np.zeros((n, S)) for _ in intervals]
    for s in range(S):
        # the pieces of an interval are a run of each state's real pieces (breaks ascend):
        # those starting at a or later and ending at b or sooner
        left, right = breaks[s, :nreal[s]], breaks[s, 1:nreal[s] + 1]
        for o, (a, b) in zip(out, intervals):
            j0 = int(np.searchsorted(left, a - tol, side="left"))
            j1 = int(np.searchsorted(right, b + tol, side="right"))
            if j1 > j0:
                o[:, s] = pick(reduce(best[:, s, j0:j1], axis=1), 0.0)
    return out


def _piece_of(breaks: np.ndarray, nreal: np.ndarray, x) -> tuple[np.ndarray, np.ndarray]:
    """(piece, offset in it) of x (S, ...) on each state's own real pieces."""
    x = np.asarray(x, float)
    S = breaks.shape[0]
    xs = np.broadcast_to(x, (S,) + x.shape[1:]) if x.ndim else np.full(S, float(x))
    j = np.stack([np.searchsorted(breaks[s], xs[s], side="right") - 1 for s in range(S)])
    j = np.clip(j, 0, (nreal - 1).reshape((S,) + (1,) * (j.ndim - 1)))
    sidx = np.arange(S).reshape((S,) + (1,) * (j.ndim - 1))
    return j, xs - breaks[sidx, j]


# ------------------------------------------------------------------ candidates
def default_kind(job) -> str:
    if getattr(job.material, "kind", "") == "lumber":
        return "LVL" if job.material.key.startswith("LVL") else "lumber"
    m = re.match(r"[A-Za-z]+", job.section.designation or "")
    if m and m.group(0).upper() in {k.upper() for k in catalog.kinds()}:
        return next(k for k in catalog.kinds() if k.upper() == m.group(0).upper())
    return catalog.kind_of(job.section) or job.section.shape


# The material a sweep of another family uses (stated in the output): the grade a shop
# most often buys for that kind of stock (common practice).
FAMILY_DEFAULTS = {"lumber": "DF-L-2", "LVL": "LVL-2.0E", "W": "A992", "WT": "A992", "M": "A36", "S": "A36",
                   "HP": "A572-50",
                   "HSS": "A500-C", "HSS-rect": "A500-C", "HSS-round": "A500-C",
                   "PIPE": "A53-B", "mech-tube": "A513", "mech-round": "A513",
                   # European sections: S235, the lowest common grade of EN 10025-2 and
                   # EN 10219-1 (common practice)
                   "IPE": "S235", "HEA": "S235", "HEB": "S235", "UPN": "S235", "SHS": "S235",
                   "RHS": "S235", "CHS": "S235"}
EN_KINDS = frozenset({"IPE", "HEA", "HEB", "UPN", "SHS", "RHS", "CHS"})
# kinds an EN structural grade (S235...) is not bought in: their own product grades
EN_PRODUCT_GAPS = frozenset({"PIPE", "mech-tube", "mech-round"})


# Kinds made of tube or pipe (A500, A53, A513 grades); every other steel kind is rolled
# shape, plate or bar (A36, A572-50, A992). AISC Manual 15th ed. Table 2-4 (common practice,
# from memory).
TUBE_KINDS = frozenset({"HSS", "HSS-rect", "HSS-round", "PIPE", "mech-tube", "mech-round",
                        "SHS", "RHS", "CHS"})
W_KINDS = frozenset({"W", "HP", "WT"})  # A992 is the grade of W shapes (and HP, WT)


def _kind_of(section) -> str:
    """The catalog kind a stock section stands for, as far as its grade goes."""
    shape = getattr(section, "shape", "")
    if shape == "pipe":
        return "PIPE"
    if shape in ("rect-tube", "round-tube"):
        return "HSS"
    name = getattr(section, "designation", "").upper()
    return "W" if shape == "i-beam" and name.startswith(("W", "HP")) else "other"


def usual_grade(material, kind: str):
    """The grade a steel sweep of `kind` uses in place of the job's, when the job's grade is
    not one that kind is made to (a tube grade on rolled shapes or bar, a rolled grade on
    tube, A500 on pipe, A992 on anything but W shapes); None when the job's grade fits."""
    if getattr(material, "kind", "") != "steel" or kind in ("lumber", "LVL"):
        return None
    key = getattr(material, "key", "")
    if key in EN_GRADES:
        # made as rolled sections, plate and structural hollow sections alike, but not as
        # mechanical tube (A513) or pipe (A53): those are swept in their own grade
        if kind not in EN_PRODUCT_GAPS:
            return None
        return get_material(FAMILY_DEFAULTS[kind])
    tube_grade = getattr(material, "hss_wall_factor", None) is not None
    if kind in EN_KINDS:
        want = FAMILY_DEFAULTS[kind]
    elif kind in TUBE_KINDS and not tube_grade:
        want = FAMILY_DEFAULTS.get(kind, "A500-C")
    elif kind not in TUBE_KINDS and tube_grade:
        want = FAMILY_DEFAULTS.get(kind, "A36")
    elif kind in TUBE_KINDS and tube_grade and not key.startswith(
            {"PIPE": "A53", "mech-tube": "A513", "mech-round": "A513"}.get(kind, "A500")):
        # a tube grade of another tube product (A500 on gauge tube, DOM on HSS, A500 on
        # pipe): swept in the product's own grade where the job's credits more
        want = FAMILY_DEFAULTS.get(kind, "A500-C")
        own = get_material(want)
        if own is None or not material.fy > own.fy * (1 + 1e-9):
            return None
    elif key == "A992" and kind not in W_KINDS:
        want = FAMILY_DEFAULTS.get(kind, "A36")
    else:
        return None
    return get_material(want) if want != key else None


def material_for_kind(job, kind: str):
    """(job, note): a sweep of lumber on a metal job, or of metal stock on a lumber job,
    switches to a stated default material of the swept family, never a lumber size in
    steel or a steel shape in wood."""
    mkind = getattr(job.material, "kind", "custom")
    wants_wood = kind in ("lumber", "LVL")
    name = getattr(job.material, "key", "")
    if mkind == "custom":
        # a typed-in material is a metal or a wood by its stiffness (jobs.rules.WOOD_E_MAX)
        e = getattr(job.material, "e", 0.0)
        mkind = "a typed-in wood" if e < WOOD_E_MAX else "a typed-in metal"
        name = f"(E {units.fmt(e, 'stress', job.units)})"
        if wants_wood == (e < WOOD_E_MAX):
            return job, ""
    elif wants_wood and mkind == "lumber" and (kind == "LVL") != name.upper().startswith("LVL"):
        # LVL sizes in a sawn grade, or sawn sizes in LVL: each is made in its own product
        mat = get_material(FAMILY_DEFAULTS[kind])
        return replace(job, material=mat), (
            f"--kind {kind} is {'LVL' if kind == 'LVL' else 'sawn lumber'} but the job's "
            f"material {name} is {'a sawn grade' if kind == 'LVL' else 'LVL'}: swept in "
            f"{mat.key} ({mat.name}) instead; give beam.material in the job to choose another "
            "grade")
    elif wants_wood == (mkind == "lumber"):
        grade = usual_grade(job.material, kind)
        if grade is None:
            return job, ""
        return replace(job, material=grade), (
            f"--kind {kind} is not made in the job's grade {name}: swept in {grade.key} "
            f"({grade.name}), the grade it is bought in ("
            + ("EN 10025-2 / EN 10219-1, the lowest common grade" if kind in EN_KINDS
               else "AISC Manual Table 2-4") + ", common practice)" + ("; round tube to an A500 edition before 2018 is 46 ksi "
                           "(A500-C-round)" if kind in ("HSS-round", "CHS") and
                           grade.key == "A500-C" else "")
            + "; give beam.material in the job to choose another grade")
    key = FAMILY_DEFAULTS.get(kind, "A36")
    mat = get_material(key)
    note = (f"--kind {kind} is {'wood' if wants_wood else 'metal'} stock but the job's material "
            f"{name} is {mkind}: swept in {mat.key} ({mat.name}) instead; give "
            "beam.material in the job to choose another grade")
    return replace(job, material=mat), note


def _candidates(job, kind, max_depth, stock):
    """[(designation, section, material, price_per_m, note)] to sweep."""
    weak = getattr(job.section, "axis", "strong") == "weak"
    out = []
    if stock is not None:
        for item in stock:
            mat = get_material(item.material) if item.material else None
            note = item.note
            if mat is None:  # no grade on the line: the job's, or the one this stock is made in
                mat = usual_grade(job.material, _kind_of(item.section)) or job.material
                if mat is not job.material:
                    note = "; ".join(x for x in (note, f"in {mat.key}, the grade it is bought "
                                                 f"in (the job's {job.material.key} is not)") if x)
            out.append((item.designation, item.section, mat, item.price_per_m, note))
    else:
        wall = getattr(job.material, "hss_wall_factor", None)
        relook = kind in ("mech-tube", "mech-round") and wall is not None and wall != 0.93
        for sec in catalog.list_sections(kind):
            if relook:  # gauge tube listed at the ERW design wall: the material's own wall
                # (nominal for DOM, stainless, aluminium), as the job's own section takes it
                sec = catalog.lookup(sec.designation, material=job.material)
            out.append((sec.designation, sec, job.material, None, ""))
    if weak:
        out2 = []
        for d, s, m, p, n in out:
            try:
                out2.append((d, turn(s, "weak"), m, p, n))
            except ValueError:
                continue
        out = out2
    if max_depth is not None:
        out = [c for c in out if c[1].depth <= max_depth * (1 + 1e-9)]
    return out


# ------------------------------------------------------------------ the sweep
def size(job, kind: str | None = None, max_depth: float | None = None, stock=None,
         with_capacity: bool = True, confirm: int = 1) -> SizeResult:
    """Sweep sections for the job; rows sorted by weight per length, lightest first.
    `kind = "all"` sweeps every catalog kind of the job's material family (metal or wood).
    `confirm`: how many passing sections to check in full, lightest first (see the module)."""
    t0 = time.perf_counter()
    if kind is not None and kind.lower() == "all" and stock is None:
        return _size_all(job, max_depth, with_capacity, t0, confirm)
    kind = kind or default_kind(job)
    material_note = ""
    if stock is None:
        job, material_note = material_for_kind(job, kind)
    cands = _candidates(job, None if stock is not None else kind, max_depth, stock)
    if stock is None:
        material_note = "; ".join(x for x in (material_note, _steel_shapes_note(job, cands)) if x)
    return _sweep(job, cands, "stock list" if stock is not None else kind, with_capacity,
                  confirm, stock, material_note, t0)


def _steel_shapes_note(job, cands) -> str:
    """Said when an aluminium or stainless job sweeps shapes of the AISC (steel) catalog: the
    sweep keeps the job's material, but an extrusion of the same name has other dimensions."""
    mkind = getattr(job.material, "kind", "")
    if mkind not in ("aluminum", "stainless") or not any(
            catalog.is_steel_shape(c[1]) for c in cands):
        return ""
    metal = "an aluminium" if mkind == "aluminum" else "a stainless"
    return (f"these are steel shapes (AISC Shapes Database v15.0, EN 10365, EN 10219) with "
            f"the job's "
            f"{metal.split()[1]} {job.material.key}: {metal} shape of the same name has other "
            "dimensions, so check the one you order as an inline [beam.section] with the "
            "mill's dimensions")


def _bound_patterned(job, sections: int, label: str) -> None:
    """Refuse, at once, a sweep of a patterned job past SIZE_PATTERN_WORK (jobs/limits)."""
    spans, hit = patterned_spans(job.supports, job.loads, job.length)
    work = hit * spans * sections
    if hit and work > SIZE_PATTERN_WORK:
        raise InputError(
            f"sizing {sections} sections ({label}) over {hit} patterned spans of {spans} takes "
            f"{work:,} units of work (patterned spans x spans x sections), more than shopbeam "
            f"takes ({SIZE_PATTERN_WORK:,}); sweep fewer sections: a smaller --kind, "
            "--max-depth, or --stock with the sections you would buy", "--kind",
            file=getattr(job, "path", "") or "")


def _sweep(job, cands, label, with_capacity, confirm, stock=None, material_note="", t0=None,
           skipped_before=()) -> SizeResult:
    t0 = time.perf_counter() if t0 is None else t0
    _bound_patterned(job, len(cands), label)
    base = replace(job, self_weight=False)
    parts = load_parts(base)
    wood = any(getattr(c[2], "kind", "") == "lumber" for c in cands)
    n_full = 0
    if wood:
        rows, skipped = _slow(job, _wood_values(job, cands))
        n_full = len(rows)
        method = ("section by section (wood members: NDS factors, bearing and creep per size)")
    else:
        rows, skipped, why = _batched(job, base, parts, cands, with_capacity)
        if uplift.applies(job):
            # a live load that pushes up: the dead loads at 0.6 and the uplift off too, each
            # row the worst
            for other, _, _ in uplift.variants(job):
                base6 = replace(other, self_weight=False)
                rows6, _, why6 = _batched(other, base6, load_parts(base6), cands,
                                          with_capacity)
                rows = _worse_rows(rows, rows6)
                why = list(dict.fromkeys(list(why) + list(why6)))
        n_full = _confirm(job, rows, max(1, confirm), with_capacity, stock is not None)
        if not why:
            method = "one layout solve, all sections batched"
        else:
            until = "one passes" if confirm <= 1 else f"{confirm} pass"
            method = (f"all sections screened in one batched pass ({'; '.join(why)}), then "
                      f"checked in full lightest first until {until}")
        method += f"; {n_full} checked in full"
    if uplift.applies(job):
        method += (f"; the dead loads in full and at 0.6 against the uplift ({uplift.CLAUSE}), "
                   "and the uplift off, each section taking the worst")
    rows.sort(key=lambda r: (r.weight, r.designation))
    return SizeResult(job, label, tuple(rows), time.perf_counter() - t0, method,
                      getattr(stock, "currency", "") if stock is not None else "",
                      tuple(skipped_before) + tuple(skipped), material_note, n_full)


def _worse_rows(rows: list, rows6: list) -> list:
    """Each section's row at the worse of the dead loads in full (`rows`) and at 0.6 (`rows6`,
    the same sections): the higher ratio and the lower factor. A row that is exact both ways
    stays exact; otherwise it is a screen (a lower bound), checked in full where it counts."""
    by = {r.designation: r for r in rows6}
    out = []
    for r in rows:
        o = by.get(r.designation)
        if o is None:
            out.append(replace(r, checked="screen"))
            continue
        worse = o if o.ratio > r.ratio else r
        fs = [f for f in (r.factor, o.factor) if not math.isnan(f)]
        out.append(replace(worse, factor=min(fs) if fs else math.nan,
                           checked="batched" if r.checked == o.checked == "batched"
                           else "screen",
                           not_rated=tuple(dict.fromkeys(r.not_rated + o.not_rated))))
    return out


def _size_all(job, max_depth, with_capacity, t0, confirm=1) -> SizeResult:
    """Every catalog kind of the job's material family in one sweep (one row a designation:
    HSS-rect and HSS-round are inside HSS)."""
    wood = getattr(job.material, "kind", "") in ("lumber", "lvl")
    if wood:
        job, _ = material_for_kind(job, "lumber")
    cands, skipped, seen = [], [], set()
    regraded: dict[str, list[str]] = {}
    for k in catalog.kinds():
        if (k.lower() in ("lumber", "lvl")) != wood:
            continue
        try:
            got = _candidates(job, k, max_depth, None)
        except InputError as exc:
            skipped.append(f"{k}: {exc.problem.message}")
            continue
        grade = usual_grade(job.material, k)
        if grade is not None and got:
            regraded.setdefault(grade.key, []).append(k)
        for cnd in got:
            if cnd[0] not in seen:
                seen.add(cnd[0])
                cands.append(cnd if grade is None else cnd[:2] + (grade,) + cnd[3:])
    if not cands:
        raise InputError("no catalog section fits (check --max-depth)", "--kind")
    note = "; ".join(
        [f"{', '.join(ks)} swept in {g}, the grade they are bought in (not the job's "
         f"{job.material.key}; "
         + ("EN 10025-2 / EN 10219-1, the lowest common grade" if g in EN_GRADES
            else "AISC Manual Table 2-4") + ", common practice)"
         for g, ks in regraded.items()] + [_steel_shapes_note(job, cands)])
    res = _sweep(job, cands, "all", with_capacity, confirm, None, note.strip("; "), t0, skipped)
    return replace(res, method="every catalog kind in one sweep: " + res.method)


# ------------------------------------------------------------------ load states as arrays
CHUNK_BYTES = 8 * 2**20  # the largest working array of one chunk of sections (memory bound)
SCREEN_TOL = 1e-6  # a screened ratio above 1 + this fails for sure (it is a lower bound)
CHECK_ALL = 12  # lists this short (a stock list) have every section checked in full


@dataclass
class _Q:
    """One quantity (moment, shear or EI x deflection) of every load state, on one set of
    breaks: state s of section i is fixed[s] + w_i sw[s] + kk_i live[s], and its live-only
    combination lfixed[s] + kk_i live[s] (lfixed: the wheels' dead loads, which a check of
    the live loads alone counts). With springs, section i adds its spring forces times the
    unit solutions `unit` to each part (see `_spring_forces`)."""

    fixed: np.ndarray  # (S or 1, P, w)
    sw: np.ndarray  # (S or 1, P, w)
    live: np.ndarray  # (S, P, w)
    breaks: np.ndarray  # (S, P + 1): each state's own breaks (moving loads: its wheels)
    nreal: np.ndarray  # (S,): real pieces of each state (the rest pad to P)
    lfixed: np.ndarray | None = None
    unit: np.ndarray | None = None  # (S, m, P, w)

    def parts(self, corr, sl):
        out = [self.fixed[None], self.sw[None], self.live[None],
               None if self.lfixed is None else self.lfixed[None]]
        if corr is not None:
            for i, c in enumerate(corr):
                if out[i] is not None and c is not None:
                    out[i] = out[i] + np.einsum("rsm,smpw->rspw", c[sl], self.unit)
        return out


def _reference_states(job, parts, nseg: int) -> list[tuple[tuple[int, ...], float | None]]:
    """The load states a screen checks, as (pattern, first-wheel position): every check's
    governing state for the job's own section (`evaluate`), every pattern on and off, and
    for moving loads nine positions along the travel. Any state is a real load state, so
    each section's ratio over them is never above its ratio over all states."""
    pats = [tuple(range(nseg)), ()] if parts.patterned else [()]
    out = []
    if parts.moving:
        lo, hi = parts.moving[0].p_range
        out += [(p, float(x)) for p in pats for x in np.linspace(lo, hi, 9)]
    else:
        out += [(p, None) for p in pats]
    try:
        ev = evaluate(job, 1.0)
        for w in ev.worst.values():
            if parts.moving and w.get("position") is None:
                continue
            out.append((tuple(w.get("pattern") or ()), w.get("position")))
    except (InputError, ValueError, ZeroDivisionError):  # the screen then has the grid only
        pass
    tol = 1e-6 * job.length
    kept: list = []
    for pat, p in out:
        if not any(q == pat and (p is None or abs(r - p) <= tol) for q, r in kept):
            kept.append((pat, p))
    return kept


def _spring_forces(sols, unit_sols, xs, k, ei, ei_ref):
    """(R, cases, m): the extra force at each spring of section i for each unit case.

    The unit cases are solved once on the beam at EI = 1 with spring stiffnesses k / ei_ref.
    Section i is the same beam with stiffnesses k / ei_i (a beam of stiffness EI with springs
    k has the moments of a beam of EI = 1 with springs k / EI, and EI times its deflection),
    so it is the reference plus extra springs ds = k / ei_i - k / ei_ref, whose forces F obey
    F = -ds (u + G F) (u: deflection at the springs, G: the springs' mutual flexibility):
    (I + D G) F = -D u, one small system per section, exact."""
    u = np.array([[float(s.deflection(x)) for x in xs] for s in sols])  # (C, m)
    g = np.array([[float(s.deflection(x)) for s in unit_sols] for x in xs])  # (m, m)
    d = k[None, :] / ei[:, None] - k[None, :] / ei_ref  # (R, m)
    m = len(xs)
    a = np.eye(m)[None] + d[:, :, None] * g[None]
    rhs = -d[:, :, None] * u.T[None]  # (R, m, C)
    return np.transpose(np.linalg.solve(a, rhs), (0, 2, 1))


def _state_arrays(job, parts, sw_unit, extra, states, ei):
    """Build the (M, V, U) arrays of `_Q` and the local-check items for the given states
    (patterns x moving positions): one `solve_many` pass per trolley position, so each state
    keeps its own breaks (its wheels only); springs get per-section corrections. Returns
    (M, V, U, corr, items, wheel data or None)."""
    L = job.length
    springs = [s for s in job.supports if s.kind == "spring"]
    ei_ref = float(np.exp(np.mean(np.log(ei)))) if springs else 1.0
    sup = tuple(replace(s, stiffness=s.stiffness / ei_ref) if s.kind == "spring" else s
                for s in job.supports)
    empty = Beam(L, 1.0, sup, ())
    segs = segments(empty)
    span_loads = split_by_span(parts.patterned, segs, L) if parts.patterned else []
    mv = parts.moving[0] if parts.moving else None
    base = [tuple(parts.fixed) + extra, (sw_unit,), tuple(parts.live)] + span_loads
    nb = len(base)
    xs = [s.at for s in springs]
    units_ = [(Load("point", at=x, value=1.0),) for x in xs]
    groups: dict = {}
    for _, p in states:
        if p not in groups:
            wc = [] if p is None else [
                tuple(Load("point", at=p + s, value=d, label=mv.label, key=mv.key, case="dead")
                      for s, d in zip(mv.offsets, mv.dead)),
                tuple(Load("point", at=p + s, value=f, label=mv.label, key=mv.key)
                      for s, f in zip(mv.offsets, mv.live))]
            groups[p] = (solve_many(empty, base + wc + units_), nb + len(wc))

    def combos(pat, p):
        """case indices (in its position's solve) of the fixed, live and live-only parts"""
        wheel = p is not None
        return ([0] + ([nb] if wheel else []), [2] + [3 + i for i in pat] + ([nb + 1] if wheel
                                                                            else []),
                [nb] if wheel else [])

    S = len(states)
    corr = None
    if springs:
        k = np.array([s.stiffness for s in springs])
        forces = {p: _spring_forces(sols[:nc], sols[nc:], xs, k, ei, ei_ref)
                  for p, (sols, nc) in groups.items()}  # (R, cases, m) each
        R, m = len(ei), len(xs)
        cf, cs, cl, clf = (np.zeros((R, S, m)) for _ in range(4))
        for si, (pat, p) in enumerate(states):
            f = forces[p]
            fx, lv, lf = combos(pat, p)
            cf[:, si], cs[:, si], cl[:, si] = f[:, fx].sum(1), f[:, 1], f[:, lv].sum(1)
            if lf:
                clf[:, si] = f[:, lf].sum(1)
        corr = (cf, cs, cl, clf if mv is not None else None)
    pmax = max(len(sols[0].moment.breaks) - 1 for sols, _ in groups.values())

    def pad(c):
        return np.concatenate([c, np.zeros((pmax - c.shape[0],) + c.shape[1:])])

    def q(name):
        fx_, sw_, lv_, lf_, br_, nr_, un_ = [], [], [], [], [], [], []
        for pat, p in states:
            sols, nc = groups[p]
            c = np.stack([getattr(s, name).coeffs for s in sols[:nc]])
            br = getattr(sols[0], name).breaks
            fx, lv, lf = combos(pat, p)
            fx_.append(pad(c[fx].sum(0)))
            sw_.append(pad(c[1]))
            lv_.append(pad(c[lv].sum(0)))
            lf_.append(pad(c[lf].sum(0)) if lf else np.zeros((pmax, c.shape[2])))
            br_.append(np.concatenate([br, np.full(pmax + 1 - len(br), br[-1])]))
            nr_.append(len(br) - 1)
            if springs:
                un_.append(np.stack([pad(getattr(s, name).coeffs) for s in sols[nc:]]))
        return _Q(np.stack(fx_), np.stack(sw_), np.stack(lv_), np.stack(br_), np.array(nr_),
                  np.stack(lf_) if mv is not None else None,
                  np.stack(un_) if springs else None)

    # the local checks read forces only: every case's reactions in one list, as one solve
    first = next(iter(groups.values()))[0]
    rsols = list(first[:nb])
    wcase = {}
    for p, (sols, nc) in groups.items():
        if p is not None:
            wcase[p] = len(rsols)
            rsols += [sols[nb], sols[nb + 1]]
    A = np.zeros((S, len(rsols)))
    B = np.zeros((S, len(rsols)))
    for si, (pat, p) in enumerate(states):
        A[si, 0] = B[si, 2] = 1.0
        for i in pat:
            B[si, 3 + i] = 1.0
        if p is not None:
            A[si, wcase[p]] = B[si, wcase[p] + 1] = 1.0
    items = _state_items(job, parts, rsols, A, B, states, span_loads, mv, wcase,
                         with_reactions=not springs)
    wheels = None
    if mv is not None:
        wx = np.array([[p + s for s in mv.offsets] for _, p in states])  # (S, nw)
        wheels = (wx, np.array(mv.dead, float), np.array(mv.live, float))
    return q("moment"), q("shear"), q("deflection"), corr, items, wheels


def _state_items(job, parts, sols, A, B, states, span_loads, mv, wcase, with_reactions):
    """The concentrated forces of the states in the form of `local.sizing_items` with one
    value per state: (at, face, lb, moving, fixed (S,), self-weight (S,), live (S,), support).
    A wheel that meets another point load is left out in that state, and so is that load's
    part (the check would add them): leaving a force out never raises a ratio."""
    S = len(states)
    out = []
    if with_reactions:
        for n, r in enumerate(sols[0].reactions):
            if r.kind == "fixed":
                continue
            rf = np.array([s.reactions[n].force for s in sols])
            out.append((r.at, "bottom", _local.bearing_of(job, r.key or ""), False, A @ rf,
                        np.full(S, sols[1].reactions[n].force), B @ rf, True))
    tol = 1e-9 * max(job.length, 1e-9)
    groups: dict = {}

    def add(ld, fixed, live):
        key = ld.key or ""
        face = _local.face_of(job, key)
        slot = (round(ld.at / tol), face)
        g = groups.setdefault(slot, {"at": ld.at, "face": face, "lb": [], "a": np.zeros(S),
                                     "lv": np.zeros(S)})
        g["lb"].append(_local.bearing_of(job, key))
        g["a"] += fixed
        g["lv"] += live

    one, zero = np.ones(S), np.zeros(S)
    for ld in parts.fixed:
        if ld.kind == "point" and ld.value:
            add(ld, ld.value * one, zero)
    for ld in parts.live:
        if ld.kind == "point" and ld.value:
            add(ld, zero, ld.value * one)
    for si, loads in enumerate(span_loads):
        on = np.array([1.0 if si in pat else 0.0 for pat, _ in states])
        for ld in loads:
            if ld.kind == "point" and ld.value:
                add(ld, zero, ld.value * on)
    if mv is not None:
        key = mv.key
        face, lb = _local.face_of(job, key), _local.bearing_of(job, key)
        for si, (_, p) in enumerate(states):
            for s, d, f in zip(mv.offsets, mv.dead, mv.live):
                x = p + s
                hit = [g for g in groups.values() if abs(g["at"] - x) <= tol]
                for g in hit:
                    g["a"][si] = g["lv"][si] = 0.0
                if hit or not (d or f):
                    continue
                a, lv = np.zeros(S), np.zeros(S)
                a[si], lv[si] = d, f
                out.append((x, face, lb, True, a, zero, lv))
    for g in groups.values():
        lb = None if any(b is None for b in g["lb"]) else min(g["lb"])
        out.append((g["at"], g["face"], lb, False, g["a"], zero, g["lv"]))
    return out


def _exact_arrays(job, base, parts, sw_unit, extra):
    """Without springs or moving loads: one layout solve; with patterns the S = 2 states are
    the exact upper and lower envelopes over all patterns (see loading.build_envelope), the
    same for every section: the spans' signs do not depend on EI or on the section's own
    weight. Returns (M, V, U, items) as `_state_arrays` does."""
    L = job.length
    parts = replace(parts, fixed=parts.fixed + (sw_unit,) + extra)
    ss = state_set(base, parts=parts, ei=1.0)
    empty = Beam(L, 1.0, job.supports, ())
    allpos = _positions(parts.fixed) | _positions(parts.live)
    for sl in ss.span_loads:
        allpos |= _positions(sl)
    sw_sol = solve(replace(empty, loads=(sw_unit,) + tuple(_dummies(allpos))))
    if sw_sol.moment.breaks.shape != ss.fixed.moment.breaks.shape:
        raise ValueError("sizing: the self-weight solution does not share the layout's breaks")

    def q(name):
        sw = getattr(sw_sol, name).coeffs
        fx = getattr(ss.fixed, name).coeffs
        lv = getattr(ss.live, name).coeffs
        if not parts.patterned:
            br = ss.fixed.moment.breaks
            return _Q((fx - sw)[None], sw[None], lv[None], br[None], np.array([len(br) - 1]))
        e = build_envelope(ss, name)
        s_ = e.carry(sw)
        n_ = len(e.breaks) - 1
        return _Q((e.fixed - s_)[None], s_[None], np.stack([e.live + e.up, e.live + e.down]),
                  np.stack([e.breaks, e.breaks]), np.array([n_, n_]))

    # local checks at supports and point loads (shopbeam.design.local): every force is
    # fixed + w_self x sw + kk x live[state]; with patterns, each span's own part taken where
    # it adds (upper) and where it relieves (lower), the same two states as above
    if parts.patterned:
        basis = [()] + [(i,) for i in range(len(ss.spans))]
        items = []
        for it in _local.sizing_items(base, ss, sw_sol, basis):
            lv = np.asarray(it[6], float)
            d = lv[1:] - lv[0]
            items.append(it[:6] + (np.array([lv[0] + d[d > 0].sum(), lv[0] + d[d < 0].sum()]),)
                         + tuple(it[7:]))
    else:
        items = _local.sizing_items(base, ss, sw_sol, [()])
    S = 2 if parts.patterned else 1
    items = [it[:4] + tuple(np.broadcast_to(np.asarray(v, float), (S,)) for v in it[4:7])
             + tuple(it[7:]) for it in items]
    return q("moment"), q("shear"), q("deflection"), items


def _batched(job, base, parts, cands, with_capacity):
    """(rows, skipped, why): every candidate rated in one vectorised pass. `why` is empty when
    the rows' ratios are each section's own full check exactly (no springs, no moving loads,
    no load hung from a flange, no tee or angle); otherwise it says why rows come from a
    screen over chosen load states (see the module) whose ratios are lower bounds."""
    if not cands:
        return [], [], []
    L = job.length
    sw_unit = Load("uniform", start=0.0, end=L, w1=-1.0, label="self-weight", case="dead")
    braced, braces = brace_points(job)
    # brace points become breaks (zero loads), so unbraced lengths are whole pieces
    extra = tuple(Load("point", at=x, value=0.0) for x in braces)
    springs = any(s.kind == "spring" for s in job.supports)
    moving = bool(parts.moving)
    lifting = bool(job.lifting or getattr(job.criteria, "lifting", ""))
    # a load hung from the bottom flange gets the flange-tip check on a lifting job, and on any
    # job unless `lug = true` says it hangs from a lug under the web (checks.checks_for)
    hung = bool(lifting and getattr(job, "hung", ()) or tip_hung(job))
    empty = Beam(L, 1.0, job.supports, ())
    ltb_segs = unbraced_segments(job, empty)
    # an unbraced cantilever with loads on its top flange: the strength that loading leaves
    # it (analysis.top_flange_checks, about 2.5 L) is in the full check, not the batch
    # (and a length between braces loaded on its top: Cb x 1/1.4, analysis.span_top_checks)
    on_top = not (job.braced or job.restrained) and any(
        loaded_on_top(job, a, b) for a, b, _free in top_load_segments(job, empty))
    exact = not springs and not moving and not hung and not on_top
    spans = segments(empty)
    n_ratio, d_abs, _ = deflection_rule(job)
    imp = parts.impact
    g0 = units.G0
    prof = profile_of(job) if lifting else None
    ws = job.moving[0] if (moving and lifting) else None
    a_w = (ws.wheel_edge if ws is not None and ws.wheel_edge is not None else DEFAULT_WHEEL_EDGE)
    rs, skipped = [], []
    # a member braced on its top only whose moment hogs: the lengths between supports over
    # which the bottom flange's or edge's buckling may set `bending, hogging`
    hog_len = hogging_lengths(job) if top_only(job) else []
    hog_allow: list[list[float]] = []
    per_material: dict[int, tuple] = {}  # candidates mostly share one material: one job each
    for des, sec, mat, price, note in cands:
        try:
            got = per_material.get(id(mat))
            if got is None or got[0] is not mat:
                jm = replace(job, material=mat)
                got = per_material[id(mat)] = (mat, jm, basis_of(jm))
            _m, jm, b = got
            fl = flexure(sec, mat, b, job.criteria.safety_factor, job.welded)
            sh = shear_strength(sec, mat, b, job.criteria.safety_factor, job.welded)
            # a below-the-hook beam's BTH-1 Nd, the job's factor on yield in bending
            fl, sh, _code = job_factors(jm, sec, fl, sh)
            wheel = None
            if ws is not None and sec.shape == "i-beam" and sec.axis == "strong":
                tf, tapered = flange_tf_at_wheel(sec, a_w)
                d = sec.dims
                lam = min(max(2 * a_w / (d["bf"] - d["tw"]), 0.0), 1.0)
                c = flange_coefficients(lam, tapered)
                scale = prof.nd / 1.67 if prof is not None and prof.nd else 1.0
                wheel = (tf, [c["cx" + i] for i in "012"], [c["cy" + i] for i in "012"],
                         sec.sx_bot, mat.fy / (OMEGA_WHEEL * scale))
        except (KeyError, TypeError, ValueError, ZeroDivisionError) as exc:
            skipped.append(f"{des}: {exc}")
            continue
        seg = [(fl.cap, fl.ltb1(0.0 if braced else bb - a)[0], free) for a, bb, free in ltb_segs]
        if hog_len:  # braced on the top only: the bottom flange under hogging, as checked
            got = hogging_allowables(jm, fl, hog_len)
            hog_allow.append([math.inf if x is None else x for x in got] if got is not None
                             else [math.inf] * len(hog_len))  # not worked out: a rating gap
        rs.append((des, sec, mat, price, note, sec.self_weight_mass(mat.density) * g0,
                   fl.omega, seg, sh.vn / sh.omega, mat.e * bending_ix(sec, job.restrained),
                   fl.cap, fl.uses_cb, wheel, bool(fl.special),
                   _local.sidesway_possible(job, sec, mat)))
    if not rs:
        raise InputError("no section of this kind can be checked", "--kind")
    R = len(rs)
    hog_al = np.array(hog_allow).reshape(R, len(hog_len))
    # the job's self_weight = false holds for every section (its dead loads carry it)
    # (at the job's dead-load multiple: 0.6 where the dead loads hold down an uplift)
    wsw = np.array([r[5] * job.dead_factor if job.self_weight else 0.0 for r in rs])
    ei = np.array([r[9] for r in rs])
    vallow = np.array([r[8] for r in rs])
    omega = np.array([r[6] for r in rs])
    cap = np.array([r[10] for r in rs])
    uses_cb = np.array([bool(r[11]) for r in rs])
    special = np.array([r[13] for r in rs])  # tees and angles (F9, F10): see below
    sidesway = np.array([r[14] for r in rs])  # web sidesway buckling can apply (J10.4)
    ltb1 = np.array([[s[1] for s in r[7]] for r in rs])  # (R, nseg)
    free = [s[2] for s in rs[0][7]]
    if exact:
        M, V, U, items = _exact_arrays(job, base, parts, sw_unit, extra)
        corr, wheels, cb_one = None, None, False
    else:
        states = _reference_states(job, parts, len(spans))
        M, V, U, corr, items, wheels = _state_arrays(job, parts, sw_unit, extra, states, ei)
        if ws is None:  # no wheel flange check (not a lifting job)
            wheels = None
        cb_one = moving  # the full check takes Cb = 1 under moving loads
    S = M.live.shape[0]
    limits, live_limits = [], []
    live_n = job.criteria.live_deflection_ratio  # floors: L/360 under live load alone
    for a, bb, kind in spans:
        limits.append(deflection_limit(a, bb, kind, n_ratio, d_abs))
        live_limits.append(deflection_limit(a, bb, kind, live_n, None) if live_n else math.inf)
    n_it = len(items)
    if n_it:
        orient = np.array([1.0 if it[1] == "top" else -1.0 for it in items])  # + pulls
        fa = np.array([it[4] for it in items]).T  # (S, n_it)
        fs = np.array([it[5] for it in items]).T
        flv = np.array([it[6] for it in items]).T
        al_pull = np.empty((R, n_it))
        al_bear = np.empty((R, n_it))
        # an allowable reads the force's distance from the member end only against d, h and
        # 10 tf (local.limit_states): forces farther in than all of those share one value
        far = 1.01 * max(max(r[1].depth, 10 * r[1].dims.get("tf", 0.0)) for r in rs)
        keys, uniq = [], {}
        for it in items:
            end = min(max(0.0, min(it[0], L - it[0])), far)
            key = (end, it[1], it[2], bool(it[3]), len(it) > 7 and bool(it[7]))
            if key not in uniq:
                uniq[key] = len(uniq)
            keys.append(uniq[key])
        reps = [(k_[0],) + k_[1:4] + (0.0, 0.0, 0.0, k_[4]) for k_ in uniq]
        keys = np.array(keys)
        # every section with a local limit state at once (local.sizing_allowables_many);
        # the others have none (local.limit_states gives none): inf, no name
        ok = [i for i, r in enumerate(rs) if _local.applies(r[1])
              and getattr(r[2], "kind", "") in ("steel", "stainless")]
        pv, bv = np.full((R, len(reps)), math.inf), np.full((R, len(reps)), math.inf)
        pn = np.full((R, len(reps)), "", dtype=object)
        bn = np.full((R, len(reps)), "", dtype=object)
        if ok:
            (a, an), (b, bnm) = _local.sizing_allowables_many(
                job, [rs[i][1] for i in ok], [rs[i][2] for i in ok], reps)
            pv[ok], pn[ok], bv[ok], bn[ok] = a, an, b, bnm
        al_pull[:], al_bear[:] = pv[:, keys], bv[:, keys]
        nm_pull = [list(row) for row in pn[:, keys]]
        nm_bear = [list(row) for row in bn[:, keys]]
    # web sidesway buckling (local.sidesway_check): each force that bears on a flange in
    # compression, with the moment at it; in the exact sweep with patterns the largest over
    # them (the envelope, as the full check takes it), in a screen each state's own (a real
    # state: never above the full check, which takes moving loads conservatively)
    side_on = bool(n_it and sidesway.any())
    if side_on:
        tol_x = 1e-9 * L
        s_top, s_bot = _local.flange_stops(job)
        s_held = _local.support_braces(job, job.supports)
        xs = np.array([it[0] for it in items])
        s_lb = np.array([max(_local.unbraced_at(s_top, x, tol_x),
                             _local.unbraced_at(s_bot, x, tol_x)) for x in xs])
        s_free = np.array([not any(abs(h - x) <= tol_x for h in s_held) for x in xs])
        dm = [(_local.sidesway_dims(r[1]) if sidesway[i] else None) for i, r in enumerate(rs)]
        one = {"tw": 1.0, "tf": 1.0, "bf": 1.0, "h": 1.0, "webs": 0.0}
        s_tw, s_tf, s_bf, s_h, s_webs = (np.array([(d or one)[key] for d in dm])
                                         for key in ("tw", "tf", "bf", "h", "webs"))
        s_my = np.array([r[2].fy * min(r[1].sx_top, r[1].sx_bot) if sidesway[i] else 1.0
                         for i, r in enumerate(rs)])
        s_om = _local.OMEGA_WSB * _local.design_factor_scale(job)
        # (h/tw)/(Lb/bf) of every section at every force, and whether J10-7 applies there
        with np.errstate(divide="ignore"):
            s_r = (s_h / s_tw * s_bf)[:, None] / s_lb[None, :]
        s_base = (s_webs * s_tw**3 * s_tf / s_h**2)[:, None] * 0.4 * s_r**3
        s_ok = sidesway[:, None] & (s_r <= 1.7) & s_free[None, :]
        s_j, s_t = _piece_of(M.breaks, M.nreal, np.broadcast_to(xs, (S, n_it)))
    side_rows = np.flatnonzero(sidesway) if side_on else np.zeros(0, int)

    def sidesway_jumps():
        """(R, S x items): the factor k at which each force's Cr halves (1.5 Ma reaches My,
        the moment being fixed + k (1 + impact) x live at it), inf where none; None when no
        section has web sidesway buckling. With patterns the largest moment over the states
        is a max of lines in k, so its crossing is among the states' own."""
        if not side_on or not side_rows.size:
            return None
        out = np.full((R, S * n_it), np.inf)
        for sl in chunks(side_rows):
            f, sw_, lv, _lf = M.parts(corr, sl)
            def at_x(co):  # (1 or n, S, n_it): the part's moment at each force
                co = np.broadcast_to(co, (co.shape[0], S) + co.shape[2:])
                return sum(co[:, np.arange(S)[:, None], s_j, e] * s_t[None] ** e
                           for e in range(co.shape[-1]))

            m0 = orient[None, None, :] * (at_x(f) + wsw[sl, None, None] * at_x(sw_))
            m1 = orient[None, None, :] * at_x(lv) * (1 + imp)
            with np.errstate(divide="ignore", invalid="ignore"):
                kj = (s_my[sl, None, None] / 1.5 - m0) / m1
            kj = np.where((m1 > 0) & (kj > 0) & s_ok[sl][:, None, :], kj, np.inf)
            out[sl] = kj.reshape(len(sl), -1)
        return out

    def sidesway_ratio(kk, sl, mco):
        n = len(sl)
        if not side_on:
            return np.zeros(n)
        force = (fa[None] + wsw[sl, None, None] * fs[None] + kk[:, None, None] * flv[None])
        c = mco[:, np.arange(S)[:, None], s_j, :]  # (n, S, n_it, w)
        mx = sum(c[..., e] * s_t[None] ** e for e in range(c.shape[-1]))
        mc = orient[None, None, :] * mx  # (n, S, n_it): the loaded flange's compression
        if exact:
            mc = np.broadcast_to(mc.max(axis=1, keepdims=True), mc.shape)
        bears = orient[None, None, :] * force < 0
        af = np.abs(force)
        comp = mc > 1e-9 * af * max(L, 1e-9)
        cr = np.where(1.5 * mc < s_my[sl, None, None], _local.CR_ELASTIC, _local.CR_YIELDED)
        allow = (cr * s_base[sl][:, None, :]) / s_om  # (n, S, n_it)
        live_ = bears & comp & (af > _local.ZERO) & s_ok[sl][:, None, :]
        with np.errstate(divide="ignore", invalid="ignore"):
            rr = np.where(live_, af / allow, 0.0)
        return rr.reshape(n, -1).max(axis=1)

    if wheels is not None:
        wx, wd, wl = wheels
        per = ws.wheels_per_axle
        has_w = np.array([r[12] is not None for r in rs])
        w_tf = np.array([r[12][0] if r[12] else 1.0 for r in rs])
        w_cx = np.array([r[12][1] if r[12] else [0.0] * 3 for r in rs])
        w_cy = np.array([r[12][2] if r[12] else [0.0] * 3 for r in rs])
        w_sb = np.array([r[12][3] if r[12] else 1.0 for r in rs])
        w_al = np.array([r[12][4] if r[12] else math.inf for r in rs])
        wj, wt = _piece_of(M.breaks, M.nreal, wx)  # (S, nw) each
    # sections in chunks so that the largest working array stays within CHUNK_BYTES
    P, w = M.live.shape[1], max(M.live.shape[2], U.live.shape[2])
    chunk = max(1, int(CHUNK_BYTES // (8 * S * P * w * 2)))

    def chunks(rows):  # the sections, as arrays of row numbers of at most `chunk` each
        return [rows[i:i + chunk] for i in range(0, len(rows), chunk)]

    def local_ratio(kk, sl, want_name=False):
        n = len(sl)
        if not n_it:
            return np.zeros(n), [""] * n
        force = (fa[None] + wsw[sl, None, None] * fs[None] + kk[:, None, None] * flv[None])
        pulls = orient[None, None, :] * force > 0
        allow = np.where(pulls, al_pull[sl, None, :], al_bear[sl, None, :])
        with np.errstate(divide="ignore", invalid="ignore"):
            rr = np.where(np.isinf(allow), 0.0, np.abs(force) / allow)
        flat = rr.reshape(n, -1)
        worst = flat.max(axis=1)
        if not want_name:
            return worst, None
        idx = flat.argmax(axis=1)
        names = []
        for i in range(n):
            s_, j = divmod(int(idx[i]), n_it)
            g = int(sl[i])
            names.append(nm_pull[g][j] if pulls[i, s_, j] else nm_bear[g][j])
        return worst, names

    def combo(q, kk, sl, live_only=False):
        f, s, lv, lf = q.parts(corr, sl)
        n = len(sl)
        k4 = kk[:, None, None, None]
        if live_only:
            out = k4 * lv if lf is None else lf + k4 * lv
        else:
            out = f + wsw[sl, None, None, None] * s + k4 * lv
        return np.broadcast_to(out, (n, S) + out.shape[2:])

    def chunk_ratios(k, sl):
        n = len(sl)
        kk = k * (1 + imp)
        mco = combo(M, kk, sl)
        bend = np.zeros(n)
        mmaxes = _absmax_states(mco, M.breaks, M.nreal, [(a, bb) for a, bb, _ in ltb_segs])
        for si, (a, bb, _free) in enumerate(ltb_segs):
            # with patterns: Mmax, MA, MB, MC each the largest over both envelopes (the
            # evaluation's rule, conservative against every single pattern)
            mmax = mmaxes[si].max(axis=1)
            if cb_one or np.all(np.isinf(ltb1[sl, si])) or free[si]:
                cb = np.ones(n)
            else:
                qs = []
                for f_ in (0.25, 0.5, 0.75):
                    j, t = _piece_of(M.breaks, M.nreal, a + f_ * (bb - a))
                    c = mco[:, np.arange(S), j, :]  # (n, S, w)
                    qs.append(np.abs(sum(c[..., e] * t[None] ** e
                                         for e in range(c.shape[-1]))).max(axis=1))
                cb = np.where(uses_cb[sl], cb_factor(mmax, *qs), 1.0)
            mn = nominal_moment(cap[sl], ltb1[sl, si], cb)
            bend = np.maximum(bend, np.where(special[sl], 0.0, mmax * omega[sl] / mn))
        shear = (_absmax_states(combo(V, kk, sl), V.breaks, V.nreal, [(0.0, L)])[0].max(axis=1)
                 / vallow[sl])
        uco = combo(U, kk, sl)
        defl = np.zeros(n)
        for um, lim in zip(_absmax_states(uco, U.breaks, U.nreal, [(a, bb) for a, bb, _ in spans]),
                           limits):
            defl = np.maximum(defl, um.max(axis=1) / ei[sl] / lim)
        ldef = np.zeros(n)
        if live_n:
            lco = combo(U, kk, sl, live_only=True)
            for um, lim in zip(_absmax_states(lco, U.breaks, U.nreal,
                                              [(a, bb) for a, bb, _ in spans]), live_limits):
                ldef = np.maximum(ldef, um.max(axis=1) / ei[sl] / lim)
        hog = np.zeros(n)
        if hog_len:  # analysis.hogging_checks: the most negative moment over each length
            for li, lo in enumerate(_min_states(mco, M.breaks, M.nreal,
                                                [(a, bb) for a, bb, _c in hog_len])):
                with np.errstate(divide="ignore", invalid="ignore"):
                    hog = np.maximum(hog, np.where(np.isinf(hog_al[sl, li]), 0.0,
                                                   -lo.min(axis=1) / hog_al[sl, li]))
        rows = [bend, shear, defl, ldef, local_ratio(kk, sl)[0], sidesway_ratio(kk, sl, mco),
                hog]
        if wheels is not None:  # bottom-flange bending under each wheel (lifting.wheel_check)
            cw = mco[:, np.arange(S)[:, None], wj]  # (n, S, nw, w)
            mw = sum(cw[..., e] * wt[None] ** e for e in range(cw.shape[-1]))
            sg = mw / w_sb[sl, None, None]
            pw = np.abs(wd[None] + kk[:, None] * wl[None]) / per  # (n, nw)
            qq = (pw / w_tf[sl, None] ** 2)[:, None, :, None]
            sx = w_cx[sl, None, None, :] * qq + sg[..., None]
            sy = w_cy[sl, None, None, :] * qq
            vm = np.sqrt(np.maximum(sx * sx + sy * sy - sx * sy, 0.0))
            rows.append(np.where(has_w[sl], vm.reshape(n, -1).max(axis=1) / w_al[sl], 0.0))
        allr = np.stack(rows)
        return allr.max(axis=0), allr.argmax(axis=0)

    def ratios(k, rows=None):
        """Governing ratio and index of the governing check at factors k, of every section
        (R,) or of the sections numbered in `rows` (k and both answers then len(rows),): a
        section's figures do not depend on which others are worked out with it."""
        rows = np.arange(R) if rows is None else np.asarray(rows, int)
        out_r, out_i = np.empty(len(rows)), np.empty(len(rows), int)
        at = 0
        for sl in chunks(rows):
            out_r[at:at + len(sl)], out_i[at:at + len(sl)] = chunk_ratios(k[at:at + len(sl)], sl)
            at += len(sl)
        return out_r, out_i

    r1, gi = ratios(np.ones(R))
    if with_capacity and exact:  # a screened row's k would only be an upper bound: the rows
        # checked in full get theirs from `capacity`
        k = _capacity_vector(ratios, R, r1, sidesway_jumps())
    else:
        k = np.full(R, np.nan)
    local_names = []
    for sl in chunks(np.arange(R)):
        local_names += local_ratio(np.ones(len(sl)) * (1 + imp), sl, True)[1]
    names = ("bending", "shear", "deflection", "live deflection", None,
             _local.SIDESWAY, HOGGING_CHECK, "wheel flange bending")
    # tees and angles: bending by F9 / F10 needs the whole check (sign of the moment along
    # each unbraced length, principal axes); the batch leaves their bending out, so their
    # rows are a screen by the other checks (a lower bound) and are checked in full as any
    # screened row is, lightest first
    # ranked and shown by the tabulated weight (what is ordered and paid for); the checks'
    # self-weight load is area x density (r[5])
    rows = [SizeRow(r[0], r[1], r[2], r[1].weight_per_length(r[2].density), float(r1[i]),
                    names[gi[i]] or local_names[i],
                    float(k[i]) if exact and not special[i] else float("nan"), r[3], r[4],
                    checked="batched" if exact and not special[i] else "screen")
            for i, r in enumerate(rs)]
    why = [x for x, on in (("springs: exact per-section spring forces", springs),
                           ("moving loads", moving),
                           ("a load hung from a flange", hung),
                           ("loads on the top flange of an unbraced length: the strength that "
                            "leaves it (a cantilever's at about 2.5 L, a span's with Cb x 1/1.4) "
                            "in the full check", on_top),
                           ("tees and angles: F9 / F10 bending in the full check",
                            special.any())) if on]
    return rows, skipped, why


def _full_row(job, row: SizeRow, with_capacity: bool) -> SizeRow:
    """The row from the section's own full check (`evaluate`, `capacity`): the authority."""
    j = replace(job, section=row.section, material=row.material)
    try:
        ss = state_set(j)  # shared: the moving-load cells and parts cached on it are reused
        st = strengths(j, beam=ss.beam)
        g = _worst_check(j, ss, st)
        fat = fatigue_check(j, st, ss, 1.0)  # fatigue given: a check
        if fat is not None and fat.ratio > g.ratio:
            g = fat
        # k of a section that fails at the entered loads is below 1 and never listed
        cap = capacity(j, ss=ss) if with_capacity and g.ratio <= 1.0 else None
        kf = cap.factor if cap is not None else float("nan")
        why = tuple(cap.not_rated) if cap is not None else ()
    except (InputError, ValueError, ZeroDivisionError, KeyError, TypeError) as exc:
        return replace(row, ratio=math.inf, governing="not checked", factor=float("nan"),
                       note=f"{row.note}; full check failed: {exc}".lstrip("; "),
                       checked="full")
    return replace(row, ratio=g.ratio, governing=g.name, factor=kf, checked="full",
                   not_rated=why)


def _worst_check(j, ss, st):
    """The section's governing check at the entered loads, as the report finds it: the
    evaluation's checks with a cantilever's top-flange loads and the bottom flange or edge
    under hogging (a wood member's dead loads alone at CD 0.9 among them); with a live load
    that pushes up, the worst of the dead loads in full, at 0.6, and the uplift off
    (`design.uplift`)."""
    g = max(list(evaluate(j, 1.0, ss=ss).checks) + top_flange_checks(j, st, ss)
            + hogging_checks(j, st, ss) + span_top_checks(j, st, ss), key=lambda c: c.ratio)
    if uplift.applies(j):
        for h, state, _ in uplift.variants(j):  # the dead loads at 0.6; the uplift off
            hs = state_set(h)
            g6 = _worst_check(h, hs, strengths(h, beam=hs.beam))
            if g6.ratio > g.ratio:
                g = uplift.mark(g6, state)
    return g


def shown_rows(res: "SizeResult", top: int | None = None) -> list["SizeRow"]:
    """The passing rows to list (all, or the first `top`), each with the rating gaps of its
    section (limit states it calls for that are not checked, `capacity.rating_gaps`) when it
    was not checked in full: a listed row must not read as rated when its section would not
    be. Worked out only for the rows listed (a sweep passes hundreds), once per result."""
    rows = res.passing if top is None else res.passing[:top]
    memo = res.__dict__.setdefault("_gaps", {})
    out = []
    fat = fatigue_given(res.job)
    for r in rows:
        if fat and r.checked != "full":
            # the batched search leaves fatigue out: its closed form, as capacity has it
            key = ("fatigue", r.designation)
            if key not in memo:
                memo[key] = _with_fatigue(res.job, r)
            r = memo[key]
        if r.checked != "full" and not r.not_rated:
            if r.designation not in memo:
                memo[r.designation] = _gaps_of(res.job, r)
            if memo[r.designation]:
                r = replace(r, not_rated=tuple(memo[r.designation]))
        out.append(r)
    return out


def _with_fatigue(job, r: "SizeRow") -> "SizeRow":
    """A listed row of a job that gives fatigue_category and cycles, with fatigue in: its
    ratio at the entered loads, and its factor lowered to where the live stress range
    reaches the allowable (the range is proportional to k, as `capacity._fatigue_cap` takes
    it). The row as it was where fatigue is not worked out (a gap then says so)."""
    j = replace(job, section=r.section, material=r.material)
    try:
        ss = state_set(j)
        st = strengths(j, beam=ss.beam)
        f1 = fatigue_check(j, st, ss, 1.0)
        if f1 is None:
            return r
        out = r
        if f1.ratio > r.ratio:
            out = replace(out, ratio=f1.ratio, governing=f1.name)
        if math.isfinite(r.factor) and r.factor > 0:
            fk = fatigue_check(j, st, ss, r.factor)
            if fk is not None and fk.ratio > 1:
                out = replace(out, factor=r.factor / fk.ratio * (1 - 1e-12))
        return out
    except (InputError, ValueError, ZeroDivisionError, KeyError, TypeError):
        return r


def _gaps_of(job, r: "SizeRow", any_only: bool = False) -> tuple[str, ...]:
    """The rating gaps of a row's section and grade; `any_only`: stop at the member's own
    gaps when it has some (the solved ones cost about a millisecond a row), for callers that
    only ask whether a row has any (the look-ahead past a NOT RATED row)."""
    j = replace(job, section=r.section, material=r.material)
    try:
        st = strengths(j)
        own = rating_gaps(j, st)
        if own and any_only:
            return own
        return own + solved_gaps(j, st, None, r.factor)
    except (InputError, ValueError, ZeroDivisionError, KeyError, TypeError) as exc:
        return (f"its rating could not be assessed ({exc})",)


# Past the lightest passing section that is NOT RATED, how many more passing ones are
# checked in full looking for one that is rated (each a full check: evaluate + capacity)
UNRATED_SKIP = 10


def _confirm(job, rows: list, confirm: int, with_capacity: bool, by_price: bool) -> int:
    """Check rows in full lightest first (and cheapest first with prices) until `confirm`
    of them pass, skipping screened rows whose lower-bound ratio already fails. Every row
    lighter than the lightest that passes has then failed its full check or a lower bound,
    so that row is the same as checking every section in full would give. Returns how many
    rows were checked in full."""
    orders = [sorted(range(len(rows)), key=lambda i: (rows[i].weight, rows[i].designation))]
    if by_price:
        orders.append(sorted((i for i in range(len(rows)) if rows[i].price_per_m is not None),
                             key=lambda i: (rows[i].price_per_m, rows[i].weight)))
    want = len(rows) if len(rows) <= CHECK_ALL else confirm
    gapped_job = bool(job_gaps(job))  # the job's own gaps hold every section alike
    n = 0
    for order in orders:
        found = unrated = 0
        tie = None  # the weight of the last section wanted: its equals are checked too
        for i in order:
            r = rows[i]
            if tie is not None and r.weight > tie * (1 + 1e-9):
                break
            if r.checked == "screen" and r.ratio > 1 + SCREEN_TOL:
                continue
            if r.checked == "batched" and not r.ok:
                continue
            if r.checked != "full":
                # looking past a NOT RATED lightest for a rated one: a section whose own
                # rating gaps already withhold it (wheels on a tube wall) is not worth a full
                # check (its gaps are found in microseconds)
                if unrated and (gapped_job or _gaps_of(job, r, any_only=True)):
                    continue
                rows[i] = r = _full_row(job, r, with_capacity)
                n += 1
            if r.ok:
                if r.not_rated and unrated < UNRATED_SKIP:  # not posted: look for a rated one
                    unrated += 1
                    continue
                found += 1
                if found >= want and tie is None:
                    if want > 1 or order is not orders[0]:
                        break  # --confirm N: that many, as asked; by price: the cheapest
                    # the lightest: a section of the same weight may pass as well
                    # (HSS4x3x1/8 and HSS5x2x1/8), shown beside it, not left out as heavier
                    tie = r.weight
    return n


def _capacity_vector(ratios, R: int, g1=None, jumps=None) -> np.ndarray:
    """k with governing ratio 1 for every section at once (Illinois regula falsi, bracketed).
    `ratios(k, rows)` gives the governing ratios of the sections numbered in rows; each step
    works out only the sections whose k is still moving. `jumps` (R, m): factors where a
    ratio steps up (inf where none), tried first."""

    def at(k, which):
        """The ratios at k of the sections where `which` holds (NaN elsewhere)."""
        out = np.full(R, np.nan)
        rows = np.flatnonzero(which)
        if rows.size:
            out[rows] = ratios(k[rows], rows)[0]
        return out

    g0, _ = ratios(np.zeros(R))
    g1 = ratios(np.ones(R))[0] if g1 is None else g1  # the ratios at the entered loads
    live = g0 <= 1.0
    # the ratios are convex in k (a max of |a + k b|), so the chord through k = 0 and 1
    # brackets the root from the safe side; a small margin and a check keep it honest
    with np.errstate(divide="ignore", invalid="ignore"):
        est = np.where(g1 > g0, (1 - g0) / (g1 - g0), np.inf)
    est = np.where(np.isfinite(est), est, 1e6)
    over = g1 > 1
    lo = np.where(over, np.minimum(est, 1.0) * (1 - 1e-9), 1.0)
    hi = np.where(over, 1.0, np.maximum(est, 1.0) * (1 + 1e-9))
    lo = np.where(live, lo, 0.0)
    # one end of each bracket is k = 1, whose ratios are known (g1)
    flo = np.where(over, at(lo, live & over), g1) - 1.0
    bad = live & (flo > 0)
    lo, flo = np.where(bad, 0.0, lo), np.where(bad, g0 - 1.0, flo)
    fhi = np.where(over, g1, at(hi, live & ~over)) - 1.0
    for _ in range(40):
        need = live & (fhi <= 0)
        if not need.any():
            break
        lo = np.where(need, hi, lo)
        flo = np.where(need, fhi, flo)
        hi = np.where(need, hi * 4, hi)
        fhi = np.where(need, at(hi, need) - 1.0, fhi)
    bounded = live & (fhi > 0)
    if jumps is not None:
        # a ratio with a step (web sidesway buckling's Cr halves at a known factor): where a
        # step lies inside the bracket, try just below and at it; a root there is the step
        for _ in range(jumps.shape[1]):
            inside = np.where((jumps > lo[:, None]) & (jumps < hi[:, None]), jumps, np.inf)
            kj = inside.min(axis=1)
            try_ = bounded & np.isfinite(kj)
            if not try_.any():
                break
            kj = np.where(try_, kj, 1.0)
            kb = kj * (1 - 1e-12)
            fb = at(kb, try_) - 1.0
            fj = at(kj, try_) - 1.0
            below = try_ & (fb > 0)  # the root is under the step
            step = try_ & (fb <= 0) & (fj > 0)  # the step is the root
            above = try_ & (fj <= 0)
            hi, fhi = np.where(below, kb, hi), np.where(below, fb, fhi)
            lo, flo = np.where(step, kb, lo), np.where(step, fb, flo)
            hi, fhi = np.where(step, kj, hi), np.where(step, fj, fhi)
            lo, flo = np.where(above, kj, lo), np.where(above, fj, flo)
            jumps = np.where(jumps <= kj[:, None], np.inf, jumps)
    side = np.zeros(R)
    for _ in range(100):
        width = hi - lo
        done = ~bounded | (width <= 1e-13 * np.maximum(hi, 1e-300)) | (np.abs(flo) <= 1e-13)
        if done.all():
            break
        with np.errstate(divide="ignore", invalid="ignore"):
            x = np.where(fhi != flo, (lo * fhi - hi * flo) / np.where(fhi != flo, fhi - flo, 1),
                         0.5 * (lo + hi))
        x = np.where((x <= lo) | (x >= hi) | ~np.isfinite(x), 0.5 * (lo + hi), x)
        fx = at(x, ~done) - 1.0
        up = (fx <= 0) & ~done
        dn = (fx > 0) & ~done
        lo, flo = np.where(up, x, lo), np.where(up, fx, flo)
        hi, fhi = np.where(dn, x, hi), np.where(dn, fx, fhi)
        # Illinois: halve the stale end's value when the same side moves twice
        fhi = np.where(up & (side == 1), fhi / 2, fhi)
        flo = np.where(dn & (side == -1), flo / 2, flo)
        side = np.where(up, 1, np.where(dn, -1, side))
    k = np.where(bounded, lo, np.where(live, np.inf, 0.0))
    return k


def _wood_values(job, cands):
    """Each wood candidate with the reference values of its own size class and E'."""
    svc = service_of(job)
    out = []
    for des, sec, mat, price, note in cands:
        if getattr(mat, "kind", "") == "lumber":
            base = get_material(mat.key) or mat
            try:
                mat = wood.adjusted_material(base, sec, svc.wet, svc.temperature)
            except Exception:  # noqa: BLE001 - no table row: the sweep says it skipped it
                continue
        out.append((des, sec, mat, price, note))
    return out


def _slow(job, cands):
    """Wood: every section checked in full (NDS factors, bearing and creep per size; the wood
    catalogs are short)."""
    rows, skipped = [], []
    for des, sec, mat, price, note in cands:
        j = replace(job, section=sec, material=mat)
        try:
            ss = state_set(j)
            st = strengths(j, beam=ss.beam)
            # the report's own checks beside the evaluation's (`_worst_check`)
            g = _worst_check(j, ss, st)
            cap = capacity(j, ss=ss)
        except Exception as exc:  # noqa: BLE001 - one odd section must not stop the sweep
            skipped.append(f"{des}: {exc}")
            continue
        rows.append(SizeRow(des, sec, mat, sec.weight_per_length(mat.density), g.ratio, g.name,
                            cap.factor, price, note, checked="full",
                            not_rated=tuple(cap.not_rated)))
    return rows, skipped


# ------------------------------------------------------------------ output
def to_json(res: SizeResult, top: int | None = None) -> dict:
    rows = shown_rows(res, top)

    def row(r):
        return {"designation": r.designation, "mass_per_length": r.weight, "ratio": r.ratio,
                "governing": r.governing, "factor": r.factor if math.isfinite(r.factor) else None,
                "price_per_m": r.price_per_m, "material": getattr(r.material, "key", ""),
                "checked": r.checked, "not_rated": list(r.not_rated),
                "rated": not r.not_rated and not math.isinf(r.factor)}  # inf: nothing to rate

    return {"schema": 1, "title": res.job.title, "kind": res.kind, "swept": len(res.rows),
            "passing": [row(r) for r in rows], "seconds": res.seconds, "method": res.method,
            "lightest": res.lightest.designation if res.lightest else None,
            "lightest_rated": res.lightest_rated.designation if res.lightest_rated else None,
            "cheapest": res.cheapest.designation if res.cheapest else None,
            "basis": BASIS_WORDS[basis_of(res.job)], "cautions": cautions_for(res.job.tags, res.job.caution_lifting),
            "material": getattr(res.job.material, "key", ""),
            "material_note": res.material_note, "checked_in_full": res.full_checks,
            "screened_not_checked": len(res.screened_only),
            "warnings": [p.located() for p in res.job.warnings if p.warning]}
