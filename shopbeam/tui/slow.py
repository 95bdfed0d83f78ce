"""Views whose content takes a while: the exact calc sheet, capacity and rating, sizing.

Each computes in an exclusive thread worker and hands the text back to the UI thread with
`call_from_thread`; a newer request cancels the older one, and the view says "working"
until the answer comes. Where a part of shopbeam is not there yet, the view says so.
"""

from __future__ import annotations

import importlib

from rich.text import Text
from textual import work
from textual.app import ComposeResult
from textual.message import Message
from textual.widgets import Button, OptionList, Static
from textual.widgets.option_list import Option

from shopbeam import units
from shopbeam.tui.views import View, problems_text
from shopbeam.tui.widgets import Choice


def _module(name: str):
    try:
        return importlib.import_module(name)
    except ImportError:
        return None


class CalcView(View):
    """The exact calc sheet (sympy), made in a worker so the screen never waits."""

    title = "Calc sheet"

    def compose(self) -> ComposeResult:
        yield Static("", id="calc-body", markup=False)

    def show(self, session) -> None:
        ev = session.evaluation
        body = self.query_one("#calc-body", Static)
        if ev.result is None:
            body.update(Text(problems_text(ev)))
            self._for = None
            return
        text = session.doc.text()
        if getattr(self, "_for", None) == text:
            return
        self._for = text
        body.update(Text("Working out the exact calc sheet (this takes a few seconds; "
                         "you can keep editing)..."))
        self.make(ev.job, ev.result, text)

    @work(thread=True, exclusive=True, group="calc")
    def make(self, job, result, text: str) -> None:
        mod = _module("shopbeam.calcsheet")
        if mod is None:
            out = "The calc sheet is not available yet in this build of shopbeam."
        else:
            try:
                out = mod.calc_sheet(job, result)
            except Exception as exc:  # noqa: BLE001 - show it, do not crash the screen
                out = f"The calc sheet could not be made: {type(exc).__name__}: {exc}"
        self.app.call_from_thread(self._done, text, out)

    def _done(self, text: str, out: str) -> None:
        if getattr(self, "_for", None) == text:
            self.query_one("#calc-body", Static).update(Text(out))


class RatingView(View):
    """Capacity (largest multiple of the live loads that passes) and the rating label."""

    title = "Rating"

    def compose(self) -> ComposeResult:
        yield Static("", id="rating-body", markup=False)

    def show(self, session) -> None:
        ev = session.evaluation
        body = self.query_one("#rating-body", Static)
        if ev.result is None:
            body.update(Text(problems_text(ev)))
            self._for = None
            return
        text = session.doc.text()
        if getattr(self, "_for", None) == text:
            return
        self._for = text
        body.update(Text("Working out the capacity..."))
        self.make(ev.job, text)

    @work(thread=True, exclusive=True, group="rating")
    def make(self, job, text: str) -> None:
        out = rating_text(job)
        self.app.call_from_thread(self._done, text, out)

    def _done(self, text: str, out: str) -> None:
        if getattr(self, "_for", None) == text:
            self.query_one("#rating-body", Static).update(Text(out))


def rating_text(job, width: int = 40) -> str:
    mod = _module("shopbeam.capacity")
    if mod is None or not hasattr(mod, "capacity"):
        return ("Capacity and the rating label are not available yet in this build of "
                "shopbeam.\n(The checks on the Results view are.)")
    try:
        cap = mod.capacity(job)
    except Exception as exc:  # noqa: BLE001
        return f"The capacity could not be worked out: {type(exc).__name__}: {exc}"
    lines = []
    for name in ("summary", "describe", "text"):
        fn = getattr(mod, name, None) if not hasattr(cap, name) else getattr(cap, name)
        if callable(fn):
            try:
                lines.append(str(fn() if hasattr(cap, name) else fn(cap)))
                break
            except Exception:  # noqa: BLE001
                continue
    if not lines:
        k = getattr(cap, "factor", cap)
        try:
            lines.append(f"Capacity: the live loads can be multiplied by {float(k):.3g} "
                         "before the first check fails.")
        except (TypeError, ValueError):
            lines.append(f"Capacity: {cap}")
    label = None
    for name in ("rating_label", "label", "label_text"):
        fn = getattr(mod, name, None)
        if callable(fn):
            try:
                label = fn(job, cap, width=width)
            except TypeError:
                try:
                    label = fn(job, width=width)
                except Exception:  # noqa: BLE001
                    label = None
            except Exception:  # noqa: BLE001
                label = None
            if label:
                break
    lines.append("")
    if label:
        lines.append("RATING LABEL (print it: shopbeam rating JOB.toml)")
        lines.append(str(label))
    else:
        lines.append("The printable rating label is not available yet in this build.")
    return "\n".join(lines)


class SizingView(View):
    """Sweep one catalog kind for sections that pass; pick one to use it."""

    title = "Sizing"

    class Pick(Message):
        def __init__(self, designation: str) -> None:
            super().__init__()
            self.designation = designation

    KINDS = ["HSS-rect", "HSS-round", "PIPE", "W", "C", "MC", "L", "flat-bar", "SHS",
             "RHS", "IPE", "UPN"]

    def compose(self) -> ComposeResult:
        yield Static("Sizing: catalog sections of one kind that pass every check, lightest "
                     "first. Pick one (enter) to use it in the job.", classes="view-title",
                     markup=False)
        yield Choice("Kind", self.KINDS, key="size.kind")
        yield Button("Sweep this kind", id="size-run", compact=True)
        yield Static("", id="size-note", markup=False)
        yield OptionList(id="size-list")

    def show(self, session) -> None:
        self._session = session
        note = self.query_one("#size-note", Static)
        if session.evaluation.result is None:
            note.update(Text(problems_text(session.evaluation)))
        elif not getattr(self, "_ran", False):
            note.update(Text("Choose a kind, then press the button (or r)."))

    BINDINGS = [("r", "run", "sweep")]

    def on_button_pressed(self, event: Button.Pressed) -> None:
        if event.button.id == "size-run":
            event.stop()
            self.action_run()

    def action_run(self) -> None:
        session = getattr(self, "_session", None) or self.screen.session
        ev = session.evaluation
        if ev.job is None:
            self.query_one("#size-note", Static).update(Text(problems_text(ev)))
            return
        kind = self.query_one(Choice).value
        self._ran = True
        self.query_one("#size-note", Static).update(Text(f"Sweeping {kind}..."))
        self.query_one("#size-list", OptionList).clear_options()
        self.sweep(ev.job, kind)

    @work(thread=True, exclusive=True, group="sizing")
    def sweep(self, job, kind: str) -> None:
        rows, note = size_rows(job, kind)
        self.app.call_from_thread(self._done, rows, note)

    def _done(self, rows, note: str) -> None:
        self.query_one("#size-note", Static).update(Text(note))
        lst = self.query_one("#size-list", OptionList)
        lst.clear_options()
        lst.add_options([Option(Text(text), id=des) for des, text in rows])
        if rows:
            lst.focus()

    def on_option_list_option_selected(self, event: OptionList.OptionSelected) -> None:
        if event.option_list.id == "size-list":
            event.stop()
            self.post_message(self.Pick(event.option.id))


def size_rows(job, kind: str, top: int = 40) -> tuple[list[tuple[str, str]], str]:
    """(designation, line) for sections of `kind` that pass, lightest first; and a note."""
    sizing = _module("shopbeam.sizing")
    sy = job.units
    if sizing is not None and hasattr(sizing, "size"):
        try:
            found = sizing.size(job, kind=kind)
        except Exception as exc:  # noqa: BLE001
            return [], f"The sweep failed: {type(exc).__name__}: {exc}"
        rows = []
        for item in list(found)[:top]:
            sec = getattr(item, "section", item)
            des = getattr(sec, "designation", str(sec))
            ratio = getattr(item, "ratio", None)
            gov = getattr(item, "governing", "")
            gov = getattr(gov, "name", gov)
            w = getattr(item, "weight", None)
            text = f"{des:<18}"
            if w is not None:
                text += f" {units.fmt(w, 'mass_per_length', sy):>11}"
            if ratio is not None:
                text += f"  ratio {ratio:.2f} {gov}"
            rows.append((des, text))
        return rows, (f"{len(rows)} sections of {kind} pass." if rows else
                      f"No {kind} section passes every check.")
    # Without the sizing module: the same sweep done here with the public analysis.
    catalog = _module("shopbeam.catalog")
    if catalog is None:
        return [], "Sizing is not available yet (no catalog in this build)."
    from dataclasses import replace

    from shopbeam.analysis import analyze

    passing = []
    try:
        secs = catalog.list_sections(kind)
    except Exception as exc:  # noqa: BLE001
        return [], f"Cannot list {kind}: {exc}"
    for sec in secs:
        try:
            r = analyze(replace(job, section=sec))
        except Exception:  # noqa: BLE001 - a section the beam cannot use is just skipped
            continue
        if r.ok:
            passing.append((sec.weight_per_length(job.material.density), sec, r.governing))
    passing.sort(key=lambda t: t[0])
    rows = [(s.designation, f"{s.designation:<18} {units.fmt(w, 'mass_per_length', sy):>11}  "
             f"ratio {g.ratio:.2f} {g.name}") for w, s, g in passing[:top]]
    note = (f"{len(passing)} of {len(secs)} {kind} sections pass; lightest first"
            + (f" (first {top})" if len(passing) > top else "") + "."
            if passing else f"None of the {len(secs)} {kind} sections passes every check.")
    return rows, note
