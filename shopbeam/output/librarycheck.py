"""Re-check every job of a library: one line per job, as text or CSV.

What a shop runs after a change of code edition, stock or presets: each job in the shop, user
or bundled library (or all three) is read, analysed and rated again, and summed up as title,
governing check, ratio, PASS/FAIL and the rated load in shop words (or NOT RATED and why, or
the reason the job could not be checked). A job that cannot be read is a line too, never a
stop.
"""

from __future__ import annotations

import csv
import io
from dataclasses import dataclass

from shopbeam import cautions
from shopbeam.design.analysis import analyze
from shopbeam.design.capacity import capacity
from shopbeam.errors import InputError, InputErrors, UnstableBeam
from shopbeam.jobs import library
from shopbeam.jobs.jobfile import parse_job_text
from shopbeam.output import label
from shopbeam.output.present import wrap

COLUMNS = ("job", "title", "governing", "ratio", "result", "rated_load", "problem", "caution")


@dataclass(frozen=True)
class Row:
    job: str  # origin:name
    title: str
    governing: str = ""
    ratio: float | None = None
    result: str = ""  # PASS | FAIL | ERROR
    rated_load: str = ""
    problem: str = ""
    path: str = ""
    lifting: bool = False  # a lifting device: its rated load carries the stronger caution

    @property
    def caution(self) -> str:
        return cautions.banner((), self.lifting)

    def cells(self) -> list[str]:
        return [self.job, self.title, self.governing,
                "" if self.ratio is None else f"{self.ratio:.3f}", self.result, self.rated_load,
                self.problem, self.caution]


def rated_words(r) -> str:
    """The rated load of a `label.Rating` in one short phrase."""
    if r.status == "not rated":
        return "NOT RATED: " + "; ".join(r.not_rated)
    if r.status == "do not load":
        return "DO NOT LOAD"
    if r.status == "nothing to rate":
        return "no live load to rate"
    figs = list(r.figures)
    f = next((x for x in figs if x.label.startswith(("MAX UNIFORM", "MAX POINT", "MAX MOVING"))),
             None) or next((x for x in figs if x.label == "TOTAL"), figs[0])
    group = f"{f.group.lower()} " if f.group else ""
    return f"{group}{f.label.lower()} {f.value}"


def check_entry(entry) -> Row:
    base = Row(entry.label, entry.title, path=str(entry.path))
    if entry.problem:
        return _replace(base, result="ERROR", problem=entry.problem.splitlines()[0])
    try:
        job = parse_job_text(entry.text, str(entry.path))
        result = analyze(job)
        g = result.governing
        r = label.rating(capacity(job), result.unchecked)
    except (InputError, InputErrors, UnstableBeam) as exc:
        errs = [p for p in getattr(exc, "problems", ()) if not getattr(p, "warning", False)]
        if errs:
            more = f" (and {len(errs) - 1} more: shopbeam check {entry.label})" \
                if len(errs) > 1 else ""
            p = errs[0]
            return _replace(base, result="ERROR",
                            problem=(f"{p.key}: " if p.key else "") + p.message + more)
        first = str(exc).strip().splitlines()
        return _replace(base, result="ERROR", problem=first[0] if first else type(exc).__name__)
    return _replace(base, title=job.title, governing=g.name, ratio=float(g.ratio),
                    result="PASS" if result.ok else "FAIL", rated_load=rated_words(r),
                    lifting=job.caution_lifting)


def _replace(row: Row, **kw) -> Row:
    from dataclasses import replace

    return replace(row, **kw)


def check_library(library_dir=None, origin: str | None = None) -> list[Row]:
    """A row per job in the library (`origin` "shop", "user" or "bundled"; None: all three,
    each name once, the one that is found first)."""
    rows = []
    for e in library.entries(library_dir):
        if origin is not None and e.origin != origin:
            continue
        if origin is None and e.shadowed_by:
            continue
        rows.append(check_entry(e))
    return rows


def to_text(rows: list[Row], width: int = 120) -> str:
    if not rows:
        return "No jobs in that library.\n"
    heads = ["JOB", "TITLE", "GOVERNING", "RATIO", "RESULT", "RATED LOAD"]
    data = [[r.job, r.title[:40], r.governing, "" if r.ratio is None else f"{r.ratio:.3f}",
             r.result, r.problem if r.result == "ERROR" else
             ("LIFTING DEVICE, not for service without engineer design and load test: "
              if r.lifting else "") + r.rated_load] for r in rows]
    widths = [max(len(x[i]) for x in data + [heads]) for i in range(len(heads) - 1)]
    lines = wrap(cautions.SCREENING, min(width, 100)) + [""]
    for row in [heads] + data:
        lines.append("  ".join(c.ljust(w) for c, w in zip(row[:-1], widths)) + "  " + row[-1])
    n_fail = sum(r.result == "FAIL" for r in rows)
    n_err = sum(r.result == "ERROR" for r in rows)
    lines.append("")
    lines.append(f"{len(rows)} jobs: {len(rows) - n_fail - n_err} pass, {n_fail} fail, "
                 f"{n_err} could not be checked")
    return "\n".join(lines) + "\n"


def to_csv(rows: list[Row]) -> str:
    buf = io.StringIO()
    w = csv.writer(buf, lineterminator="\n")
    w.writerow(COLUMNS)
    for r in rows:
        w.writerow([_cell(c) for c in r.cells()])
    return buf.getvalue()


def _cell(value):
    """A cell a spreadsheet shows as text: one from a job file that starts with = + - @ (a
    title such as =HYPERLINK(...)) would be run as a formula when the CSV is opened, so it
    gets a leading apostrophe. Numbers (a negative factor) stay numbers."""
    if isinstance(value, str) and value[:1] in ("=", "+", "-", "@", "\t", "\r"):
        try:
            float(value)
        except ValueError:
            return "'" + value
    return value
