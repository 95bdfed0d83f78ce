"""The calc package: proof of one job to file with it, as HTML, Markdown or PDF.

`build(result, ...)` gathers what an engineer or inspector looks for into one plain
`Package`: a title block (shop, job, member, prepared by, checked by, date, revision; the
sheet numbers are printed on every page), the design basis with the code editions, a sketch
of the member, the loads and load states, the reactions, the diagrams of shear, moment, slope
and deflection with their extremes, every check as demand, limit and ratio with its clause and
source, the self-checks, the cautions, the limit states that were not checked, and the
program's name and version with the SHA-256 of the input file (the HTML embeds the input).

`to_html` renders it as one self-contained printable page (inline SVG, a print stylesheet for
letter and A4 with "Sheet x of y" from CSS page counters, no scripts, no outside files),
`to_markdown` as the same content for diffs and e-mail, and `pdf.print_pdf` turns the HTML
into a PDF with a headless Chromium where the machine has one.
"""

from __future__ import annotations

import datetime as _dt
import hashlib
from dataclasses import dataclass, field
from html import escape

from shopbeam import __version__, units
from shopbeam.cautions import banner
from shopbeam.design.checks import BASIS_WORDS, basis_of
from shopbeam.errors import InputError
from shopbeam.jobs.storage import atomic_write
from shopbeam.output import svg
from shopbeam.output.label import css_string, label_text, rating
from shopbeam.output.present import CheckRow, EnvelopeRow, present, upward_note  # noqa: F401 (CheckRow re-exported)
from shopbeam.output.report import describe_load, describe_support

TITLE_FIELDS = (("shop", "Shop"), ("job", "Job"), ("member", "Member"), ("client", "Client"),
                ("location", "Location"), ("prepared_by", "Prepared by"),
                ("checked_by", "Checked by"), ("date", "Date"), ("revision", "Revision"))

# code editions by the clause prefix a check names (what the design basis lists)
EDITIONS = {
    "AISC 360": "AISC 360-16, Specification for Structural Steel Buildings (ASD)",
    "ADM": "Aluminum Design Manual 2015 (ASD)",
    "NDS": "NDS 2018, National Design Specification for Wood Construction (ASD)",
    "ANSI MH16.1": "ANSI MH16.1, storage racks (deflection limit)",
    "IBC": "IBC Table 1604.3 (deflection limits)",
}
BASIS_EDITIONS = {"asd": "AISC 360", "aluminum": "ADM", "lumber": "NDS"}


@dataclass(frozen=True)
class Diagram:
    name: str
    unit: str
    max: str
    max_at: str
    min: str
    min_at: str
    svg: str


@dataclass(frozen=True)
class Package:
    """Everything a calc package shows, already worded and formatted in the job's units."""

    title: str
    title_block: tuple[tuple[str, str], ...]
    lifting: bool
    basis: tuple[str, ...]
    editions: tuple[str, ...]
    member: tuple[tuple[str, str], ...]
    supports: tuple[str, ...]
    loads: tuple[str, ...]
    load_states: tuple[str, ...]
    sketch: str
    reactions: tuple[tuple[str, str, str, str], ...]  # kind, at, force, moment
    state_reactions: tuple[tuple[str, str, str, str], ...]
    state_words: str
    diagrams: tuple[Diagram, ...]
    state_diagrams: tuple[Diagram, ...]
    checks: tuple[CheckRow, ...]  # the rows of `output.present`, as the report shows them
    governing: str
    verdict: str
    self_checks: tuple[tuple[bool, str, str], ...]
    cautions: tuple[str, ...]
    not_checked: tuple[tuple[str, str, str], ...]  # name, clause, reason
    program: str
    input_name: str
    input_sha256: str
    input_text: str
    paper: str = "letter"
    warnings: tuple[str, ...] = field(default_factory=tuple)
    envelope: tuple[EnvelopeRow, ...] = ()  # each support over every load state
    uplift: tuple[str, ...] = ()  # supports some load state pulls down, in words
    # the rating label as `shopbeam rating` prints it (the figures posted, or NOT RATED and
    # why), and whether a load may be posted
    rating: str = ""
    rated: bool = False


def sha256_of(data: bytes) -> str:
    return hashlib.sha256(data).hexdigest()


def _editions(result, basis: str) -> tuple[str, ...]:
    seen = []
    texts = [BASIS_EDITIONS.get(basis, "")]
    for c in result.checks:
        texts += [c.clause, c.source, c.formula]
    for key, words in EDITIONS.items():
        if any(key in (t or "") for t in texts) and words not in seen:
            seen.append(words)
    return tuple(seen)


def _diagrams(sol, system: str, state: str = "") -> tuple[Diagram, ...]:
    ex = sol.extremes()
    breaks = sorted({s.at for s in sol.beam.supports})
    out = []
    for name, kind in svg.DIAGRAM_KINDS.items():
        e = ex[name]
        out.append(Diagram(
            name, units.unit_label(kind, system),
            units.fmt(e.max, kind, system), units.fmt(e.max_at, "length", system),
            units.fmt(e.min, kind, system), units.fmt(e.min_at, "length", system),
            svg.diagram(name, sol.function(name), e, sol.length, system, breaks, state)))
    return tuple(out)


def _reaction_cells(rows, uplift: bool = False):
    """(kind, at, force, moment) of `output.present` reaction rows ("-": no moment)."""
    return tuple((r.kind, r.at, r.force + (" (pulls down: uplift)" if uplift and r.uplift
                                            else ""), r.moment or "-") for r in rows)


def build(result, *, input_bytes: bytes = b"", input_name: str = "", fields: dict | None = None,
          paper: str | None = None, today: _dt.date | None = None) -> Package:
    """The calc package of an analysed job (`design.analysis.Result`).

    `fields` override the job's [project] title-block fields (e.g. from the command line);
    `input_bytes` is the job file as read, hashed and embedded; `paper` is "letter" or "a4"
    (default: letter for US units, A4 for SI).
    """
    job, sol = result.job, result.solution
    sy = job.units
    tb = dict(getattr(job, "project", {}) or {})
    tb.update({k: v for k, v in (fields or {}).items() if v not in (None, "")})
    tb.setdefault("member", f"{job.section.designation}, {job.material.key}")
    tb.setdefault("date", (today or _dt.date.today()).isoformat())
    title_block = tuple((label, tb.get(key, "")) for key, label in TITLE_FIELDS)

    basis = basis_of(job)
    crit = job.criteria
    basis_lines = [f"Strength: {BASIS_WORDS[basis]}."]
    basis_lines.append(f"Deflection limit: {crit.deflection} per span (an overhang is judged "
                       "on twice its length).")
    if basis == "first-yield":
        basis_lines.append(f"Safety factor on yield: {crit.safety_factor:g}.")
    elif basis != "lumber":
        basis_lines.append(f"Safety factor on yield in bending: {crit.safety_factor:g} (the "
                           "allowable moment is never more than Fy S / this factor, besides "
                           "the code's own limit states).")
    basis_lines.append("Analysis: Euler-Bernoulli beam, exact singularity-function solution; "
                       "extremes found exactly, not sampled.")
    if job.members > 1:
        basis_lines.append(f"The entered loads are shared by {job.members} identical members; "
                           f"each member is checked for 1/{job.members} of them.")

    sec, mat = job.section, job.material
    f = lambda v, k, sig=4: units.fmt(v, k, sy, sig)  # noqa: E731
    member = [("Span", f(job.length, "length")),
              ("Section", f"{sec.designation} ({sec.shape}, {sec.axis} axis)"),
              ("Section properties", f"A = {f(sec.area, 'area')}, I = {f(sec.ix, 'inertia')}, "
                                     f"S = {f(sec.sx, 'modulus')}"),
              ("Material", f"{mat.name}: E = {f(mat.e, 'stress', 5)}, Fy = {f(mat.fy, 'stress')}"),
              ("Self-weight", f(-job.self_weight_load().w1, "line_load") + " (dead load, included)"
               if job.self_weight else "not included (self_weight = false)")]
    if job.members > 1:
        member.append(("Members", f"{job.members} identical members share the loads"))

    loads = [describe_load(ld, sy) for ld in job.loads]
    for w in getattr(job, "moving", ()) or ():
        wheels = ", ".join(units.fmt(v, "force", sy) for v in w.live)
        dead = (" + dead " + ", ".join(units.fmt(v, "force", sy) for v in w.dead)
                if any(w.dead) else "")
        gaps = [b - a for a, b in zip(w.offsets, w.offsets[1:])]
        spacing = (" spaced " + ", ".join(units.fmt(g, "length", sy) for g in gaps)) if gaps else ""
        loads.append(f"moving {w.label}: wheels {wheels}{dead}{spacing}, travelling "
                     f"{units.fmt(w.travel[0], 'length', sy)} to "
                     f"{units.fmt(w.travel[1], 'length', sy)} (checked at its worst position)")
    loads = loads or ["none entered"]
    loads += [f"read as {c}" for c in job.conversions]
    states = []
    if result.shown_state:
        states.append(result.shown_state[0].upper() + result.shown_state[1:] + ".")
    else:
        states.append("One load state: the loads as entered, with self-weight.")
    for c in result.checks:
        if c.state:
            states.append(f"{c.name}: governed by {c.state}.")

    p = present(result)
    verdict = (p.verdict if result.ok else "the member FAILS: " + ", ".join(p.failing))
    # the rating the shop would post, from the same job (`shopbeam rating`): a package filed
    # with the job says what may be posted, or NOT RATED and why
    from shopbeam.design.capacity import capacity  # noqa: PLC0415 - only the package rates

    cap = capacity(job)
    rating_text = label_text(rating(cap, getattr(result, "unchecked", ()),
                                    date=today or None))
    if not cap.rated and "NOT RATED" not in verdict:
        verdict += "; NOT RATED (the rating below says why)"
    note = upward_note(job)
    if note:
        verdict += ". " + note.rstrip(".")  # the page adds the full stop

    diags = list(sol.diagnostics)
    self_checks = [(bool(d.ok), d.name, d.detail) for d in diags]
    if sol.condition > 1e10:
        self_checks.append((False, "conditioning", f"the equations are ill-conditioned "
                            f"(condition {sol.condition:.2g})"))

    not_checked = tuple((u.name, u.clause, u.reason) for u in getattr(result, "unchecked", ()))
    st_sol = result.state_solution
    text = input_bytes.decode("utf-8", "replace")
    return Package(
        title=job.title, title_block=title_block, lifting=job.lifting,
        basis=tuple(basis_lines), editions=_editions(result, basis), member=tuple(member),
        supports=tuple(describe_support(s, sy) for s in job.supports), loads=tuple(loads),
        load_states=tuple(states), sketch=svg.member_sketch(job, moving=getattr(job, "moving", ())),
        reactions=_reaction_cells(p.reactions),
        state_reactions=(_reaction_cells(p.governing_state.reactions, uplift=True)
                         if p.governing_state is not None else ()),
        state_words=p.governing_state.words if p.governing_state is not None else "",
        diagrams=_diagrams(sol, sy),
        state_diagrams=_diagrams(st_sol, sy, "governing") if st_sol is not None else (),
        checks=p.checks, governing=p.governing, verdict=verdict,
        self_checks=tuple(self_checks), cautions=tuple(result.cautions),
        not_checked=not_checked, program=f"shopbeam {__version__}",
        input_name=input_name or (job.path or ""), input_sha256=sha256_of(input_bytes),
        input_text=text, paper=(paper or ("a4" if sy == "si" else "letter")).lower(),
        warnings=tuple(w.located() for w in job.warnings if getattr(w, "warning", False)),
        envelope=p.envelope, uplift=p.uplift, rating=rating_text, rated=cap.rated)


def _check_more(c: CheckRow) -> str:
    """The line under a check: its formula, where, the numbers it used and its load state."""
    used = ", ".join(f"{k} {v}" for k, v in c.params)
    return (c.formula + (f"; at {c.at}" if c.at else "") + (f"; used {used}" if used else "")
            + (f"; state: {c.state}" if c.state else ""))


# ------------------------------------------------------------------ HTML
CSS = """
*{box-sizing:border-box}
body{font-family:"DejaVu Sans","Liberation Sans",Arial,Helvetica,sans-serif;font-size:10pt;
 color:#000;margin:0 auto;max-width:182mm;line-height:1.35}
h1{font-size:15pt;margin:0 0 4pt}
h2{font-size:11.5pt;margin:14pt 0 5pt;border-bottom:1.2pt solid #000;padding-bottom:1pt;
 break-after:avoid}
table{border-collapse:collapse;width:100%;margin:3pt 0}
th,td{border:0.6pt solid #777;padding:2pt 4pt;text-align:left;vertical-align:top}
th{background:#eee}
td.num{text-align:right;white-space:nowrap}
tr,figure,.titleblock,.caution,tbody.keep,pre.rating{break-inside:avoid}
thead{display:table-header-group}
.titleblock td{width:25%}
.titleblock .lab{font-size:8pt;color:#444;display:block}
.titleblock .val{font-size:10.5pt;min-height:12pt;display:block}
.pass{font-weight:bold}
.fail{font-weight:bold;color:#b00000}
.caution{border:1.6pt solid #000;padding:5pt 7pt;margin:6pt 0;font-weight:bold}
.caution.lifting{border-width:3pt;background:#fff3f0}
figure{margin:4pt 0 8pt}
figcaption{font-size:8.5pt;color:#333}
svg{display:block;max-width:100%}
pre{font-family:"DejaVu Sans Mono","Liberation Mono",monospace;font-size:8pt;
 white-space:pre-wrap;border:0.6pt solid #999;padding:4pt;background:#fafafa}
.small{font-size:8.5pt;color:#333}
.formula{font-size:8.5pt;color:#333}
.sheetbreak{break-before:page}
@media screen{body{padding:12px}}
"""


def _page_css(pkg: Package) -> str:
    size = "A4" if pkg.paper == "a4" else "letter"
    tb = dict(pkg.title_block)
    head = " - ".join(x for x in (tb.get("Shop", ""), tb.get("Job", ""), pkg.title) if x)
    foot = f"{pkg.program}; input SHA-256 {pkg.input_sha256[:16]}"
    # the caution on every printed sheet, at its foot (the stronger one on a lifting device)
    warn = banner((), pkg.lifting)
    rev = tb.get("Revision", "")
    return ("@page{size:" + size + ";margin:16mm 14mm 16mm 14mm;"
            "@top-left{content:" + css_string(head[:110]) + ";font-size:8pt}"
            "@top-right{content:" + css_string(("rev " + rev) if rev else tb.get("Date", ""))
            + ";font-size:8pt}"
            "@bottom-left{content:" + css_string(warn) + ' "\\A " ' + css_string(foot)
            + ";font-size:7.5pt;white-space:pre-wrap;font-weight:bold}"
            '@bottom-right{content:"Sheet " counter(page) " of " counter(pages);font-size:9pt}}')


def _tr(cells, header=False, classes=None) -> str:
    tag = "th" if header else "td"
    classes = classes or [""] * len(cells)
    row = "<tr>" + "".join(
        f"<{tag}{' class=' + chr(34) + c + chr(34) if c else ''}>{escape(str(x))}</{tag}>"
        for x, c in zip(cells, classes)) + "</tr>"
    # a header row is the table's head: printed again at the top of a sheet it runs onto
    return f"<thead>{row}</thead>" if header else row


def to_html(pkg: Package) -> str:
    e = escape
    h = ['<!DOCTYPE html>', '<html lang="en"><head><meta charset="utf-8">',
         f"<title>Calc package: {e(pkg.title)}</title>",
         '<meta name="generator" content="' + e(pkg.program) + '">',
         "<style>" + CSS + _page_css(pkg) + "</style></head><body>"]
    h.append(f"<h1>Calc package: {e(pkg.title)}</h1>")
    # title block: 4 columns, label above value
    cells = list(pkg.title_block) + [("Sheet", "see the foot of each page")]
    h.append('<table class="titleblock">')
    for i in range(0, len(cells), 4):
        row = cells[i:i + 4] + [("", "")] * (4 - len(cells[i:i + 4]))
        h.append("<tr>" + "".join(
            f'<td><span class="lab">{e(lab)}</span><span class="val">{e(val)}</span></td>'
            for lab, val in row) + "</tr>")
    h.append("</table>")
    for i, c in enumerate(pkg.cautions):
        cls = "caution lifting" if pkg.lifting and i == 0 else "caution"
        h.append(f'<div class="{cls}">{e(c)}</div>')
        if not pkg.lifting or i > 0:
            break  # the first (strongest) cautions up front; all of them in the cautions section

    h.append("<h2>1. Design basis</h2><ul>")
    h += [f"<li>{e(b)}</li>" for b in pkg.basis]
    h.append("</ul>")
    if pkg.editions:
        h.append("<p>Code editions:</p><ul>" + "".join(f"<li>{e(x)}</li>" for x in pkg.editions)
                 + "</ul>")

    h.append("<h2>2. Member, supports and loads</h2>")
    h.append('<figure>' + pkg.sketch + '<figcaption>Sketch to scale along the span; forces + up, '
             'couples + counterclockwise; gravity loads point down.</figcaption></figure>')
    h.append("<table>" + "".join(_tr(r) for r in pkg.member) + "</table>")
    h.append("<p><b>Supports:</b> " + e("; ".join(pkg.supports)) + "</p>")
    h.append("<p><b>Loads</b> (+ up; gravity loads are negative):</p><ul>"
             + "".join(f"<li>{e(x)}</li>" for x in pkg.loads) + "</ul>")
    h.append("<p><b>Load states:</b></p><ul>" + "".join(f"<li>{e(x)}</li>" for x in pkg.load_states)
             + "</ul>")
    if pkg.warnings:
        h.append("<p><b>Input warnings:</b></p><ul>" + "".join(f"<li>{e(x)}</li>" for x in pkg.warnings)
                 + "</ul>")

    h.append("<h2>3. Reactions</h2><p class=small>What each support does to the beam: "
             "force + up, moment + counterclockwise.</p><table>")
    h.append(_tr(["support", "at", "force", "moment"], header=True))
    h += [_tr(r, classes=["", "num", "num", "num"]) for r in pkg.reactions]
    h.append("</table>")
    if pkg.state_reactions:
        h.append(f"<p>In {e(pkg.state_words)}:</p><table>")
        h.append(_tr(["support", "at", "force", "moment"], header=True))
        h += [_tr(r, classes=["", "num", "num", "num"]) for r in pkg.state_reactions]
        h.append("</table>")
    if pkg.envelope:
        h.append("<p><b>Reaction envelope</b> (each support over every load state: what a "
                 "bracket or anchor must carry):</p><table>")
        h.append(_tr(["support", "at", "largest up", "state", "largest down (uplift) or least up",
                      "state"], header=True))
        h += [_tr([r.kind, r.at, r.max_up, r.up_state, r.max_down
                   + (" (uplift)" if r.uplift else " up (no uplift)"), r.down_state],
                  classes=["", "num", "num", "", "num", ""]) for r in pkg.envelope]
        h.append("</table>")
    if pkg.uplift:
        h.append("<p><b>Uplift:</b> anchor these supports against the pull:</p><ul>"
                 + "".join(f"<li>{e(x)}</li>" for x in pkg.uplift) + "</ul>")

    h.append('<h2 class="sheetbreak">4. Shear, moment, slope and deflection</h2>')
    h.append("<table>" + _tr(["function", "max", "at", "min", "at"], header=True))
    for d in pkg.diagrams:
        h.append(_tr([f"{d.name} ({d.unit})", d.max, d.max_at, d.min, d.min_at],
                     classes=["", "num", "num", "num", "num"]))
    h.append("</table><p class=small>Exact extremes over the whole span, both sides of every "
             "jump. V = dM/dx; M + sagging; deflection + up (sag is negative).</p>")
    for d in pkg.diagrams:
        h.append(f'<figure class="diagram">{d.svg}</figure>')
    if pkg.state_diagrams:
        h.append(f"<p><b>In {e(pkg.state_words)}:</b></p>")
        for d in pkg.state_diagrams:
            if d.name in ("shear", "moment"):
                h.append(f'<figure class="diagram state">{d.svg}</figure>')

    h.append('<h2 class="sheetbreak">5. Checks</h2><table>')
    h.append(_tr(["check", "demand", "limit", "ratio", "result", "clause", "source"], header=True))
    for c in pkg.checks:
        verdict = "PASS" if c.ok else "FAIL"
        # a check and its working on one sheet (a body of their own that does not break)
        h.append(f"<tbody class=keep><tr><td>{e(c.name)}</td><td class=num>{e(c.demand)}</td>"
                 f"<td class=num>{e(c.limit)}</td><td class=num>{c.ratio:.3f}</td>"
                 f'<td class="{verdict.lower()}">{verdict}</td><td>{e(c.clause or "-")}</td>'
                 f"<td>{e(c.source or '-')}</td></tr>")
        more = _check_more(c)
        h.append(f'<tr><td></td><td colspan="6" class="formula">{e(more)}</td></tr></tbody>')
    h.append("</table>")
    h.append(f"<p><b>Governing:</b> {e(pkg.governing)}: {e(pkg.verdict)}.</p>")
    if pkg.rating:
        h.append("<p><b>Rating</b> (the label <code>shopbeam rating</code> prints for this job: "
                 + ("the loads that may be posted" if pkg.rated else
                    "NOT RATED, and why") + "):</p>")
        h.append(f'<pre class="rating">{e(pkg.rating)}</pre>')

    h.append("<h2>6. Not checked</h2>")
    if pkg.not_checked:
        h.append("<p>Limit states this member calls for that shopbeam did not check:</p><table>")
        h.append(_tr(["limit state", "clause", "why / what to do"], header=True))
        h += [_tr(r) for r in pkg.not_checked]
        h.append("</table>")
    else:
        h.append("<p>No limit state was recorded as not checked for this member. Connections, "
                 "supports, welds, bolts and the structure that carries the member are outside "
                 "this check.</p>")

    h.append("<h2>7. Self-checks</h2><table>")
    h.append(_tr(["", "self-check", "detail"], header=True))
    h += [_tr(["pass" if ok else "WARN", n, d]) for ok, n, d in pkg.self_checks]
    h.append("</table>")

    h.append("<h2>8. Cautions</h2>")
    for i, c in enumerate(pkg.cautions):
        cls = "caution lifting" if pkg.lifting and i == 0 else "caution"
        h.append(f'<div class="{cls}">{e(c)}</div>')

    h.append("<h2>9. Program and input</h2><table>")
    h.append(_tr(["Program", pkg.program]))
    h.append(_tr(["Input file", pkg.input_name or "-"]))
    h.append(_tr(["SHA-256 of the input", pkg.input_sha256]))
    h.append("</table><p class=small>To reproduce: save the input below as a .toml file "
             f"(its SHA-256 must match) and run <code>shopbeam report FILE -o OUT.html</code> "
             f"with {e(pkg.program)}.</p>")
    h.append(f'<pre id="shopbeam-input">{e(pkg.input_text)}</pre>')
    h.append("</body></html>")
    return "\n".join(h) + "\n"


# ------------------------------------------------------------------ Markdown
def _md(text: str) -> str:
    return str(text).replace("|", "\\|").replace("\n", " ")


def _md_table(headers, rows) -> list[str]:
    out = ["| " + " | ".join(_md(x) for x in headers) + " |",
           "|" + "|".join("---" for _ in headers) + "|"]
    out += ["| " + " | ".join(_md(x) for x in r) + " |" for r in rows]
    return out


def to_markdown(pkg: Package) -> str:
    import re

    longest = max((len(r) for r in re.findall(r"`+", pkg.input_text)), default=0)
    fence = "`" * max(3, longest + 1)
    m = [f"# Calc package: {pkg.title}", ""]
    m += _md_table(["field", "value"], [(a, b or "") for a, b in pkg.title_block]
                   + [("Sheet", "1 of 1 (this document)")])
    m.append("")
    m += [f"> **{c}**" for c in pkg.cautions[:2 if pkg.lifting else 1]]
    m += ["", "## 1. Design basis", ""]
    m += [f"- {b}" for b in pkg.basis]
    if pkg.editions:
        m += ["", "Code editions:", ""] + [f"- {x}" for x in pkg.editions]
    m += ["", "## 2. Member, supports and loads", ""]
    m += _md_table(["", ""], pkg.member)
    m += ["", "Supports: " + "; ".join(pkg.supports), "", "Loads (+ up; gravity loads are "
          "negative):", ""] + [f"- {x}" for x in pkg.loads]
    m += ["", "Load states:", ""] + [f"- {x}" for x in pkg.load_states]
    if pkg.warnings:
        m += ["", "Input warnings:", ""] + [f"- {x}" for x in pkg.warnings]
    m += ["", "(The HTML package has the sketch of the member.)", "", "## 3. Reactions", ""]
    m += _md_table(["support", "at", "force", "moment"], pkg.reactions)
    if pkg.state_reactions:
        m += ["", f"In {pkg.state_words}:", ""]
        m += _md_table(["support", "at", "force", "moment"], pkg.state_reactions)
    if pkg.envelope:
        m += ["", "Reaction envelope (each support over every load state: what a bracket or "
              "anchor must carry):", ""]
        m += _md_table(["support", "at", "largest up", "state",
                        "largest down (uplift) or least up", "state"],
                       [(r.kind, r.at, r.max_up, r.up_state,
                         r.max_down + (" (uplift)" if r.uplift else " up (no uplift)"),
                         r.down_state)
                        for r in pkg.envelope])
    if pkg.uplift:
        m += ["", "Uplift: anchor these supports against the pull:", ""]
        m += [f"- {x}" for x in pkg.uplift]
    m += ["", "## 4. Shear, moment, slope and deflection", ""]
    m += _md_table(["function", "max", "at", "min", "at"],
                   [(f"{d.name} ({d.unit})", d.max, d.max_at, d.min, d.min_at)
                    for d in pkg.diagrams])
    m += ["", "Exact extremes over the whole span (the HTML package draws the diagrams).", "",
          "## 5. Checks", ""]
    m += _md_table(["check", "demand", "limit", "ratio", "result", "clause", "source"],
                   [(c.name, c.demand, c.limit, f"{c.ratio:.3f}", "PASS" if c.ok else "FAIL",
                     c.clause or "-", c.source or "-") for c in pkg.checks])
    m.append("")
    for c in pkg.checks:
        m.append(f"- {c.name}: {_check_more(c)}")
    m += ["", f"**Governing:** {pkg.governing}: {pkg.verdict}.", ""]
    if pkg.rating:
        m += ["**Rating** (the label `shopbeam rating` prints for this job: "
              + ("the loads that may be posted" if pkg.rated else "NOT RATED, and why") + "):",
              "", "```", pkg.rating.rstrip("\n"), "```", ""]
    m += ["## 6. Not checked", ""]
    if pkg.not_checked:
        m += _md_table(["limit state", "clause", "why / what to do"], pkg.not_checked)
    else:
        m.append("No limit state was recorded as not checked for this member. Connections, "
                 "supports, welds, bolts and the structure that carries the member are outside "
                 "this check.")
    m += ["", "## 7. Self-checks", ""]
    m += _md_table(["", "self-check", "detail"],
                   [("pass" if ok else "WARN", n, d) for ok, n, d in pkg.self_checks])
    m += ["", "## 8. Cautions", ""] + [f"- **{c}**" for c in pkg.cautions]
    m += ["", "## 9. Program and input", "", f"- Program: {pkg.program}",
          f"- Input file: {pkg.input_name or '-'}", f"- SHA-256 of the input: `{pkg.input_sha256}`",
          "", fence + "toml", pkg.input_text.rstrip("\n"), fence, ""]
    return "\n".join(m)


# ------------------------------------------------------------------ writing
FORMATS = {".html": "html", ".htm": "html", ".md": "markdown", ".markdown": "markdown",
           ".pdf": "pdf"}


def format_of(path) -> str:
    """"html", "markdown" or "pdf" by the file's suffix; InputError for anything else."""
    from pathlib import Path

    suffix = Path(path).suffix.lower()
    if suffix not in FORMATS:
        raise InputError(f"{str(path)!r}: the package is written as .html, .md or .pdf (by the "
                         "file's suffix), e.g. -o bay3-arm.html", key="-o")
    return FORMATS[suffix]


def render_bytes(pkg: Package, kind: str) -> bytes:
    """The package as the bytes of a .html, .md or .pdf file (pdf: raises pdf.NoBrowser)."""
    if kind == "markdown":
        return to_markdown(pkg).encode("utf-8")
    html = to_html(pkg)
    if kind == "pdf":
        from shopbeam.output.pdf import print_pdf  # noqa: PLC0415 - only for a PDF

        return print_pdf(html)
    return html.encode("utf-8")


def write(pkg: Package, path, *, overwrite: bool = False) -> str:
    """Write the package to `path` (format by suffix) atomically; return the format written.

    An existing file is never replaced silently: InputError unless `overwrite`.
    """
    from pathlib import Path

    p = Path(path)
    kind = format_of(p)
    check_out(p, overwrite)
    data = render_bytes(pkg, kind)
    write_out(p, data)
    return kind


def check_out(p, overwrite: bool) -> None:
    """An -o file that may be written: not a folder, not an existing file unless
    `overwrite`, in a folder that exists (the package and the plaque alike)."""
    if p.is_dir():
        raise InputError(f"{p} is a folder, not a file; nothing was written. Give a file name "
                         "(with its suffix)", key="-o")
    if p.exists() and not overwrite:
        raise InputError(f"{p} already exists; nothing was written. Give another file name, or "
                         "add --overwrite to replace it", key="-o")
    if not p.parent.is_dir():
        raise InputError(f"the folder {p.parent} does not exist; nothing was written. Make the "
                         "folder first, or give a file in a folder that exists", key="-o")


def write_out(p, data: bytes) -> None:
    """`data` written to the file `p` atomically, every failure one message about `p` (a
    folder of that name, a place nothing may be written: never the hidden temporary file
    the write goes through)."""
    if p.is_dir():
        raise InputError(f"{p} is a folder, not a file; nothing was written. Give a file name "
                         "(with its suffix)", key="-o")
    try:
        atomic_write(p, data)
    except OSError as e:
        raise InputError(f"cannot write {p} ({e.strerror or e}); nothing was written. Write it "
                         "in a folder you may write", key="-o") from None
