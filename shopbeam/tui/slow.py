"""Views whose content takes a while: the exact calc sheet, capacity and rating, sizing.

Each computes in an exclusive thread worker and hands the text back to the UI thread with
`call_from_thread`; a newer request cancels the older one, and the view says "working"
until the answer comes; an error is shown in the view, never a crash.
"""

from __future__ import annotations

import os
import shlex
import shutil
import subprocess

from rich.text import Text
from textual import work
from textual.app import ComposeResult
from textual.binding import Binding
from textual.message import Message
from textual.widgets import Button, OptionList, Static
from textual.widgets.option_list import Option

from shopbeam import units
from shopbeam.errors import InputError
from shopbeam.jobs import library, storage
from shopbeam.tui.views import CHECKING_EDIT, View, problems_text, rows_in_words
from shopbeam.tui.widgets import Choice, fit_text


PAPER_WIDTH = 78  # a printed page's columns, as the command line writes its pages


class _SheetView(View):
    """A view of one slow text (calc sheet, capacity): made in a worker for the job as it
    stands, so the screen never waits; a result for an older version of the job is dropped.
    The text is made at the width of the view (at most 78 columns, a printed page's), and
    made again when the view's width changes; until then the text in hand is wrapped to
    the new width, so no line is ever wider than the view."""

    body_id = ""
    busy = "Working..."

    def compose(self) -> ComposeResult:
        yield Static("", id=self.body_id, markup=False, classes="wide-text")

    def text_width(self) -> int:
        """The columns a line may use: the view less its padding and its scroll bar (kept
        in the sum even while the text is short enough to show none)."""
        if self.size.width:
            w = self.scrollable_content_region.width
            if not self.show_vertical_scrollbar:
                w -= self.styles.scrollbar_size_vertical
        else:  # not laid out yet: the screen's width less padding and scroll bar
            w = self.app.size.width - 2 - self.styles.scrollbar_size_vertical
        return max(30, min(78, w))

    def show(self, session) -> None:
        ev = session.evaluation
        body = self.query_one(f"#{self.body_id}", Static)
        width = self.text_width()
        if session.stale:
            # the answer in hand is for the job before the last edit: this view's figures
            # are made from the answer to the job as it stands, once it comes (the screen
            # shows this view again then), never filed under the new text
            body.update(Text(fit_text(f"{CHECKING_EDIT} {self.busy}", width)))
            self._for = None
            return
        if ev.result is None:
            body.update(Text(fit_text(problems_text(ev), width)))
            self._for = None
            return
        refused = self._refused = self.refused(ev.job)
        if refused:  # known before any work: said at once, with no "working out" first
            body.update(Text(fit_text(refused, width)))
            self._for = self._out = None
            return
        text = session.doc.text()
        was = getattr(self, "_for", None)
        if was == (text, width):
            return
        self._for = (text, width)
        out = getattr(self, "_out", None)
        if was is not None and was[0] == text and out is not None:
            # the same job at a new width: the text in hand, wrapped, until it is made again
            self._out = fit_text(out, width)
            body.update(Text(self._out))
        else:
            self._out = None
            body.update(Text(fit_text(self.busy, width)))
        self.make(ev.job, ev.result, text, width)

    def on_resize(self) -> None:
        """Laid out at a new size: the text follows the new width."""
        session = getattr(self.screen, "session", None)
        if session is not None and self.display:
            self.show(session)

    def produce(self, job, result, width: int) -> str:  # pragma: no cover - each view's own
        raise NotImplementedError

    def refused(self, job) -> str:
        """Why this view's sheet is not made for the job, where that is known before any
        work ("" to make it)."""
        return ""

    @work(thread=True, exclusive=True, group="sheet", exit_on_error=False)
    def make(self, job, result, text: str, width: int) -> None:
        self._made_from = (job, result, text)
        try:
            out = self.produce(job, result, width)
        except InputError as exc:  # the job's own limit: its words, not a class name
            out = f"This could not be worked out: {exc.problem.message}"
        except Exception as exc:  # noqa: BLE001 - show it, do not crash the screen
            out = f"This could not be worked out: {type(exc).__name__}: {exc}"
        self.app.call_from_thread(self._done, text, width, fit_text(out, width))

    def _done(self, text: str, width: int, out: str) -> None:
        if getattr(self, "_for", None) == (text, width):
            self._out = out
            self.query_one(f"#{self.body_id}", Static).update(Text(out))

    file_suffix = "sheet"

    def printable(self) -> str | None:
        """The text to write or print (None while it is being worked out)."""
        if getattr(self, "_for", None) is None or getattr(self, "_out", None) is None:
            return None
        return self._out

    _refused = ""  # why this view's sheet is not made for the job shown, if it is not

    def _not_ready(self) -> bool:
        if self.printable() is None:
            self.app.notify(self._refused or "Nothing to write yet: wait for the sheet (or fix "
                            "the job's problems first).", severity="warning")
            return True
        return False

    def on_paper(self, then) -> None:
        """Call `then(text)` with the sheet made at a printed page's width (78 columns, as
        the command line writes it), whatever the width of the view: the text on screen
        when the view is that wide, else made again in a worker."""
        if getattr(self, "_for", (None, None))[1] == PAPER_WIDTH:
            then(self.printable().rstrip("\n") + "\n")
            return
        job, result, text = self._made_from
        self.app.notify("Making the sheet at the page width (78 columns)...", timeout=3)
        self._make_paper(job, result, text, then)

    @work(thread=True, group="paper", exit_on_error=False)
    def _make_paper(self, job, result, text: str, then) -> None:
        try:
            out = self.produce(job, result, PAPER_WIDTH)
        except Exception as exc:  # noqa: BLE001 - said, never a crash
            self.app.call_from_thread(self.app.notify, f"not made: {type(exc).__name__}: "
                                      f"{exc}", severity="error", timeout=10)
            return
        self.app.call_from_thread(then, out.rstrip("\n") + "\n")

    def write_file(self) -> None:
        """Write the sheet, at a printed page's width, beside the job (or in the user
        library for a job not saved yet, or a read-only preset); never over an existing
        file; say the full path."""
        if self._not_ready():
            return
        self.on_paper(self._write)

    def _write(self, sheet: str) -> None:
        session = self.screen.session
        if session.path is not None and not session.read_only:
            folder, stem = session.path.parent, session.path.stem
        else:
            folder = library.user_dir()
            stem = session.name or storage.suggest_name(str(session.doc.get("title") or "job"))
        path = folder / f"{stem}-{self.file_suffix}.txt"
        n = 2
        while path.exists():
            path = folder / f"{stem}-{self.file_suffix}-{n}.txt"
            n += 1
        try:
            folder.mkdir(parents=True, exist_ok=True)
            storage.atomic_write(path, sheet)
        except OSError as exc:
            self.app.notify(f"not written: {exc}", severity="error", timeout=10)
            return
        self.app.notify(f"Written to {path.resolve()}", timeout=10)

    def print_sheet(self) -> None:
        """Send the sheet to the printer command (SHOPBEAM_PRINT, default "lp")."""
        if self._not_ready():
            return

        command = shlex.split(os.environ.get("SHOPBEAM_PRINT", "lp"))
        if not command or shutil.which(command[0]) is None:
            self.app.notify(f"No printer command {command[0] if command else ''!r} on this "
                            "machine: set SHOPBEAM_PRINT (e.g. \"lpr -P shop\"), or write the "
                            "sheet to a file with ctrl+r and print that.", severity="error",
                            timeout=12)
            return
        self.on_paper(lambda sheet: self._print(command, sheet))

    @work(thread=True, group="print", exit_on_error=False)
    def _print(self, command: list[str], text: str) -> None:
        try:
            r = subprocess.run(command, input=text, text=True, capture_output=True,
                               timeout=60)
            msg = (f"Sent to {' '.join(command)}" if r.returncode == 0 else
                   f"{' '.join(command)} failed ({r.returncode}): "
                   f"{(r.stderr or r.stdout).strip()[:200]}")
            sev = "information" if r.returncode == 0 else "error"
        except (OSError, subprocess.SubprocessError) as exc:
            msg, sev = f"{' '.join(command)} failed: {exc}", "error"
        self.app.call_from_thread(self.app.notify, msg, severity=sev, timeout=10)


class CalcView(_SheetView):
    """The exact calc sheet (sympy)."""

    file_suffix = "calc"

    title = "Calc sheet"
    body_id = "calc-body"
    busy = ("Working out the exact calc sheet (this takes a few seconds; you can keep "
            "editing)...")

    def produce(self, job, result, width: int) -> str:
        from shopbeam.output.calcsheet import calc_sheet  # noqa: PLC0415 - startup

        return calc_sheet(job, result, width)

    def refused(self, job) -> str:
        """A job past the calc sheet's size (`limits.calc_problem`): said at once."""
        from shopbeam.jobs.limits import calc_problem  # noqa: PLC0415 - startup

        beam = job.beam()
        why = calc_problem(beam.supports, beam.loads)
        return ("No exact calc sheet for this job: "
                + why.replace("the exact calc sheet of ", "a sheet of ", 1)
                + ". The Results and Plots views have every figure." if why else "")


class RatingView(_SheetView):
    """Capacity (largest multiple of the live loads that passes) and the rating label."""

    title = "Rating"
    body_id = "rating-body"
    file_suffix = "rating"
    busy = "Working out the capacity..."

    def produce(self, job, result, width: int) -> str:
        return rating_text(job, date=getattr(self.app, "label_date", None), page_width=width)


def rating_text(job, width: int = 40, date=None, page_width: int = 78) -> str:
    """The capacity report (`page_width` columns) and the printable rating label (`width`
    columns), or why they are not there."""
    # imported in the worker, not before the first screen
    from shopbeam.design.analysis import analyze  # noqa: PLC0415 - startup
    from shopbeam.design.capacity import capacity  # noqa: PLC0415 - startup
    from shopbeam.output import capacityreport  # noqa: PLC0415 - startup
    from shopbeam.output import label as labels  # noqa: PLC0415 - startup

    try:
        res = capacity(job)
        # rows counted from 1, as the lists of the text UI show them ("load 4", not
        # "loads[3]"); the report's lines only get shorter
        text = rows_in_words(capacityreport.render(res, page_width))
    except Exception as exc:  # noqa: BLE001 - shown, never a crash
        return f"The capacity could not be worked out: {type(exc).__name__}: {exc}"
    lines = [text.rstrip(), ""]
    try:
        r = labels.rating(res, analyze(job).unchecked, date=date)
        label = labels.label_text(_label_in_words(r), width)  # in words before it is boxed
        lines += ["RATING LABEL (ctrl+r writes this view to a file, ctrl+p prints it)",
                  label.rstrip()]
    except Exception as exc:  # noqa: BLE001
        lines.append(f"The rating label could not be made: {type(exc).__name__}: {exc}")
    return "\n".join(lines)


def _label_in_words(r):
    """The label's words with rows counted from 1 (`rows_in_words`), before they are
    wrapped."""
    import dataclasses  # noqa: PLC0415 - startup

    def say(v):
        if isinstance(v, str):
            return rows_in_words(v)
        if isinstance(v, tuple) and all(isinstance(x, str) for x in v):
            return tuple(rows_in_words(x) for x in v)
        return v

    return dataclasses.replace(r, **{f.name: say(getattr(r, f.name))
                                     for f in dataclasses.fields(r)})


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

    SHAPE_KIND = {"i-beam": "W", "rect-tube": "HSS-rect", "round-tube": "HSS-round",
                  "pipe": "PIPE", "channel": "C", "angle": "L", "rect-bar": "flat-bar"}

    def show(self, session) -> None:
        self._session = session
        job = session.evaluation.job
        if job is not None and not getattr(self, "_kind_set", False):
            self._kind_set = True
            kind = self.SHAPE_KIND.get(getattr(job.section, "shape", ""), None)
            from shopbeam.design import sizing  # noqa: PLC0415 - startup

            try:
                kind = sizing.default_kind(job)
            except Exception:  # noqa: BLE001 - keep the shape's own kind
                pass
            choice = self.query_one(Choice)
            if kind and kind not in choice.options:
                choice.options.append(kind)
            if kind:
                choice.set(kind)
        note = self.query_one("#size-note", Static)
        swept = getattr(self, "_swept_for", None)
        if swept is not None and swept is not job:
            # a sweep of the job before the last edit would read as this job's: taken off
            self._swept_for = None
            self._ran = False
            self._dropped = True  # said until the next sweep, through any problems between
            self.query_one("#size-list", OptionList).clear_options()
        if session.evaluation.result is None:
            note.update(Text(problems_text(session.evaluation)))
        elif not getattr(self, "_ran", False):
            note.update(Text("The job changed since the last sweep: choose a kind, then press "
                             "the button (or r)." if getattr(self, "_dropped", False) else
                             "Choose a kind, then press the button (or r)."))

    BINDINGS = [Binding("r", "run", "sweep", priority=True)]

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
        self._dropped = False
        self._swept_for = ev.job
        self.query_one("#size-note", Static).update(Text(f"Sweeping {kind}..."))
        self.query_one("#size-list", OptionList).clear_options()
        self.sweep(ev.job, kind)

    @work(thread=True, exclusive=True, group="sizing", exit_on_error=False)
    def sweep(self, job, kind: str) -> None:
        rows, note = size_rows(job, kind)
        self.app.call_from_thread(self._done, rows, note, job)

    def _done(self, rows, note: str, job=None) -> None:
        if job is not None and getattr(self, "_swept_for", None) is not job:
            return  # the job changed while it swept: its rows are not this job's
        self.query_one("#size-note", Static).update(Text(note))
        lst = self.query_one("#size-list", OptionList)
        lst.clear_options()
        lst.add_options([Option(Text(text), id=des) for des, text in rows])
        # the list takes the focus only if this view still has it: a sweep that ends while
        # the user types in another view must not pull the keys (an Enter would pick a
        # section) away from the field they are typing in
        focused = self.app.focused
        if rows and self.display and (focused is None or self in focused.ancestors_with_self):
            lst.focus()

    def on_option_list_option_selected(self, event: OptionList.OptionSelected) -> None:
        if event.option_list.id == "size-list":
            event.stop()
            self.post_message(self.Pick(event.option.id))


def size_rows(job, kind: str, top: int = 40) -> tuple[list[tuple[str, str]], str]:
    """(designation, line) for sections of `kind` that pass, lightest first; and a note."""
    try:
        return _size_rows(job, kind, top)
    except Exception as exc:  # noqa: BLE001 - a failed sweep is shown, never a crash
        return [], f"The sweep failed: {type(exc).__name__}: {exc}"


def _size_rows(job, kind: str, top: int) -> tuple[list[tuple[str, str]], str]:
    from shopbeam.design import sizing  # noqa: PLC0415 - startup

    sy = job.units
    res = sizing.size(job, kind=kind)
    passing = list(res.passing)
    rows = []
    for r in sizing.shown_rows(res, top):  # each with its rating gaps: NOT RATED is said
        k = "unlimited" if r.factor == float("inf") else f"{r.factor:.2f}"
        # a section that would not be rated shows no capacity to post: NOT RATED in its place
        rows.append((r.designation,
                     f"{r.designation:<16} {units.fmt(r.weight, 'mass_per_length', sy):>11}"
                     f"  ratio {r.ratio:.2f} {r.governing:<10} "
                     + ("NOT RATED" if r.not_rated else f"capacity x{k}")))
    n = len(res.rows)
    more = len(getattr(res, "screened_only", ()) or ())
    note = (f"{len(passing)} of {n} {res.kind} sections pass; lightest first"
            + (f" (first {top} shown)" if len(passing) > top else "") + "."
            + (f" {more} heavier ones pass the quick screen but were not checked in full "
               "(shopbeam size --confirm N lists them)." if more else "")
            if passing else f"None of the {n} {res.kind} sections passes every check.")
    return rows, note
