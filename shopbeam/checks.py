"""Strength and stiffness checks of a solved member: demand, limit, ratio, PASS/FAIL.

Basic basis (first yield with a safety factor): bending stress M/S against Fy / SF, shear
stress V/Av against 0.6 Fy / SF on the shear area, and deflection per span against the
criterion (a cantilever or overhang is judged on twice its length). Each check says the
formula it used.
"""

from __future__ import annotations

from dataclasses import dataclass, field

from shopbeam.solver import Solution, segments


@dataclass(frozen=True)
class Check:
    name: str
    demand: float
    limit: float
    unit: str  # SI unit of demand and limit
    formula: str
    at: float | None = None  # where the demand occurs (m)
    detail: str = ""
    extra: dict = field(default_factory=dict)

    @property
    def ratio(self) -> float:
        if self.limit <= 0:
            return float("inf") if self.demand > 0 else 0.0
        return self.demand / self.limit

    @property
    def ok(self) -> bool:
        return self.ratio <= 1.0

    def as_dict(self) -> dict:
        return {"name": self.name, "demand": float(self.demand), "limit": float(self.limit),
                "ratio": float(self.ratio), "ok": bool(self.ok), "unit": self.unit,
                "formula": self.formula, "at": None if self.at is None else float(self.at),
                "detail": self.detail}


def deflection_limits(job, sol: Solution) -> list[dict]:
    """Each span and overhang with its largest deflection and its limit."""
    c = job.criteria
    out = []
    for a, b, kind in segments(sol.beam):
        length = b - a
        judged = 2 * length if kind in ("cantilever", "overhang") else length
        if c.deflection_abs is not None:
            limit = c.deflection_abs
            rule = c.deflection
        else:
            limit = judged / c.deflection_ratio
            rule = f"{'2 x ' if judged != length else ''}{kind} length / {c.deflection_ratio:g}"
        ex = sol.deflection.extremes(a, b)
        demand = ex.abs_max
        out.append({"start": a, "end": b, "kind": kind, "demand": demand, "limit": limit,
                    "at": ex.abs_max_at, "rule": rule})
    return out


def basic_checks(job, sol: Solution) -> list[Check]:
    sec, mat, sf = job.section, job.material, job.criteria.safety_factor
    ex = sol.extremes()
    m = ex["moment"]
    # top fibre in compression under sagging moment, bottom under hogging
    stress_pos = max(m.max, 0.0) / min(sec.sx_top, sec.sx_bot)
    stress_neg = max(-m.min, 0.0) / min(sec.sx_top, sec.sx_bot)
    bend_at = m.max_at if stress_pos >= stress_neg else m.min_at
    fy = mat.fy
    checks = [Check(
        "bending", max(stress_pos, stress_neg), fy / sf, "Pa",
        f"f = |M|max / S against Fy / SF = Fy / {sf:g} (first yield with a safety factor)",
        bend_at)]
    v = ex["shear"]
    checks.append(Check(
        "shear", v.abs_max / sec.shear_area, 0.6 * fy / sf, "Pa",
        f"fv = |V|max / Av against 0.6 Fy / SF = 0.6 Fy / {sf:g} (average shear on the shear area)",
        v.abs_max_at))
    spans = deflection_limits(job, sol)
    worst = max(spans, key=lambda s: s["demand"] / s["limit"] if s["limit"] > 0 else 0.0)
    checks.append(Check(
        "deflection", worst["demand"], worst["limit"], "m",
        f"largest deflection in each span against {job.criteria.deflection} "
        "(cantilevers and overhangs on twice their length)",
        worst["at"], detail=f"{worst['kind']} {worst['start']:.4g}-{worst['end']:.4g} m ({worst['rule']})",
        extra={"spans": spans}))
    return checks


def run_checks(job, sol: Solution) -> list[Check]:
    """All checks for the job (the basic set)."""
    return basic_checks(job, sol)


def governing(checks: list[Check]) -> Check:
    return max(checks, key=lambda c: c.ratio)
