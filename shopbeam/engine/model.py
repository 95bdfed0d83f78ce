"""The beam as the solver sees it: plain frozen records in SI units (m, N, N/m, N*m, Pa).

`Support` and `Load` describe the mechanics; `Beam` bundles them with the length and the
flexural rigidity EI. The job file reader builds these from user input; the solver never
sees units, sections or materials.
"""

from __future__ import annotations

from dataclasses import dataclass, field

SUPPORT_KINDS = ("fixed", "pin", "roller", "spring", "hinge")
LOAD_KINDS = ("point", "uniform", "linear", "moment")


@dataclass(frozen=True)
class Support:
    """A support or internal hinge at `at` (m).

    fixed: stops deflection and slope; pin/roller: stops deflection; spring: force
    R = -stiffness * u (N/m); hinge: internal moment release (M = 0), not a support.
    """

    at: float
    kind: str
    stiffness: float = 0.0
    key: str = ""  # where it came from in the job file, e.g. "supports[1]"
    brace: bool | None = None  # holds the member against twist? None: by kind (design layer)

    @property
    def takes_force(self) -> bool:
        return self.kind in ("fixed", "pin", "roller", "spring")

    @property
    def takes_moment(self) -> bool:
        return self.kind == "fixed"

    @property
    def stops_deflection(self) -> bool:
        return self.kind in ("fixed", "pin", "roller")


@dataclass(frozen=True)
class Load:
    """An applied load. Forces + up, couples + counterclockwise (see the contract).

    point:  `value` N at `at`.       moment: `value` N*m at `at`.
    uniform: `w1` N/m from `start` to `end`.
    linear:  `w1` at `start` varying linearly to `w2` at `end`.
    """

    kind: str
    at: float = 0.0
    value: float = 0.0
    start: float = 0.0
    end: float = 0.0
    w1: float = 0.0
    w2: float = 0.0
    label: str = ""
    case: str = "live"  # "live" (scaled by capacity) or "dead"
    key: str = ""
    patterned: bool = False

    @property
    def total_force(self) -> float:
        if self.kind == "point":
            return self.value
        if self.kind in ("uniform", "linear"):
            w2 = self.w1 if self.kind == "uniform" else self.w2
            return 0.5 * (self.w1 + w2) * (self.end - self.start)
        return 0.0

    def scaled(self, k: float) -> "Load":
        from dataclasses import replace

        return replace(self, value=self.value * k, w1=self.w1 * k, w2=self.w2 * k)

    def describe_position(self) -> tuple[float, ...]:
        return (self.at,) if self.kind in ("point", "moment") else (self.start, self.end)


@dataclass(frozen=True)
class Beam:
    """A straight prismatic Euler-Bernoulli beam from x = 0 to x = length."""

    length: float
    ei: float
    supports: tuple[Support, ...]
    loads: tuple[Load, ...] = field(default_factory=tuple)

    def with_loads(self, loads) -> "Beam":
        from dataclasses import replace

        return replace(self, loads=tuple(loads))


def segments(beam: Beam) -> list[tuple[float, float, str]]:
    """Spans between deflection supports and overhangs beyond them: (start, end, kind).

    kind is "span" between two supports, "overhang" beyond the outermost support, or
    "cantilever" when a fixed end carries it. Springs count as supports here.
    """
    L = beam.length
    pts = sorted({s.at for s in beam.supports if s.takes_force})
    out: list[tuple[float, float, str]] = []
    if not pts:
        return [(0.0, L, "span")]
    tol = 1e-9 * L
    fixed = {s.at for s in beam.supports if s.kind == "fixed"}
    if pts[0] > tol:
        out.append((0.0, pts[0], "cantilever" if pts[0] in fixed else "overhang"))
    for a, b in zip(pts, pts[1:]):
        out.append((a, b, "span"))
    if pts[-1] < L - tol:
        out.append((pts[-1], L, "cantilever" if pts[-1] in fixed else "overhang"))
    return out
