"""What a check of a member gives: `Check` (one limit state, demand against limit, with its
clause, source and the numbers it used) and `Unchecked` (a limit state the member calls for
that was not checked, and why).

The bottom of the design layer: every module that makes checks (checks, local, open_shapes,
lifting) builds these, and nothing here imports them back.
"""

from __future__ import annotations

from dataclasses import dataclass, field


@dataclass(frozen=True)
class Check:
    """One limit state of one member: demand against limit, with where it comes from.

    `clause` names the provision (e.g. "AISC 360-16 F2"), `source` the standard or handbook
    (or "common practice"), `params` the numbers the check used (SI floats, e.g. Lb, Lp, Lr,
    Cb) for renderers to format in the job's units, and `state` the load state that governs
    (empty when the job has one state).
    """

    name: str
    demand: float
    limit: float
    unit: str  # SI unit of demand and limit
    formula: str
    at: float | None = None  # where the demand occurs (m)
    detail: str = ""
    extra: dict = field(default_factory=dict)
    clause: str = ""
    source: str = ""
    params: dict = field(default_factory=dict)
    state: str = ""

    @property
    def ratio(self) -> float:
        if self.limit <= 0:
            return float("inf") if self.demand > 0 else 0.0
        return self.demand / self.limit

    @property
    def ok(self) -> bool:
        return self.ratio <= 1.0

    @property
    def detail_text(self) -> str:
        """The detail with the governing load state, as the JSON's `detail` carries it."""
        return "; ".join(x for x in (self.detail, self.state and "worst state: " + self.state)
                         if x)

    def as_dict(self, stress_s: float | None = None) -> dict:
        """The JSON of the check. `stress_s`: the section modulus (m^3) that states a bending
        check made on moments (AISC, ADM: M against Mn / Omega) as the bending stress the
        contract's JSON gives, f = M / S (Pa) against the allowable Fb = Mn / (Omega S): the
        ratio is the same, and the moments stay in params (moment_demand, moment_limit)."""
        demand, limit, unit = float(self.demand), float(self.limit), self.unit
        params = {k: float(v) for k, v in self.params.items()}
        if self.name == "bending" and unit == "N*m" and stress_s and stress_s > 0:
            params.update(moment_demand=demand, moment_limit=limit, S=float(stress_s))
            demand, limit, unit = demand / stress_s, limit / stress_s, "Pa"
        return {"name": self.name, "demand": demand, "limit": limit,
                "ratio": float(self.ratio), "ok": bool(self.ok), "unit": unit,
                "formula": self.formula, "at": None if self.at is None else float(self.at),
                "detail": self.detail_text, "clause": self.clause, "source": self.source,
                "params": params, "state": self.state}


@dataclass(frozen=True)
class Unchecked:
    """A limit state the member type calls for that shopbeam did not check, and why.

    A capacity or rating never rests on a job with an unchecked limit state that could
    govern: it says "not rated" with these reasons (or carries them as warnings).
    """

    name: str  # e.g. "lateral-torsional buckling"
    reason: str  # what is missing or not implemented, and what to do
    clause: str = ""  # the provision that would apply
    blocks_rating: bool = True  # False: only a caution, the rating may stand

    def as_dict(self) -> dict:
        return {"name": self.name, "reason": self.reason, "clause": self.clause,
                "blocks_rating": self.blocks_rating}
