"""The shopbeam text UI: `make_app(job_path=None, library=None)` builds it.

One job screen owns the open job (a `Session`): the views below it show the session and post
what the user changed; the screen writes the change into the document, re-solves (the
numeric solve is fast enough to run on every key), and shows the new answer. Slow work (calc
sheet, capacity, sizing sweep) runs in workers in `slow.py`. Library, help and the save
dialogs are in `screens.py`.
"""

from __future__ import annotations

import re
import textwrap
import threading
import time
from pathlib import Path

from rich.text import Text
from textual import events, work
from textual.app import App, ComposeResult
from textual.binding import Binding
from textual.screen import Screen
from textual.widgets import ContentSwitcher, Footer, Input, Static
from textual.widgets.input import Selection
from textual.worker import get_current_worker

from shopbeam import escapes, units
from shopbeam.cautions import is_lifting
from shopbeam.errors import InputError
from shopbeam.jobs import jobdoc, library, storage
from shopbeam.tui import session as session_mod
from shopbeam.tui.screens import (AnswerScreen, ConfirmScreen, ConflictScreen, HelpScreen,
                                  LengthScreen, LibraryScreen, SaveAsScreen)
from shopbeam.tui.session import Session
from shopbeam.tui.slow import CalcView, RatingView, SizingView
from shopbeam.tui.views import (CriteriaView, JobView, LoadsView, MaterialView, PlotsView,
                                ResultsView, RowList, RowsView, SectionView, SpanView, View,
                                WHEEL_WORDS, CHECKING_EDIT, CHECKING_WORDS, late,
                                load_warnings,
                                problems_text)
from shopbeam.tui.widgets import (OPTION_DIGITS, Banner, Choice, Field, FieldInput, SteadyKeys,
                                  ViewBar, from_one_line, one_line, shown_now, update_text)


# (id, key, name, short name, class); the first six are the input steps in order
VIEWS = [
    ("job", "1", "Job", "Job", JobView),
    ("span", "2", "Span", "Span", SpanView),
    ("loads", "3", "Loads", "Load", LoadsView),
    ("section", "4", "Section", "Sect", SectionView),
    ("material", "5", "Material", "Matl", MaterialView),
    ("criteria", "6", "Criteria", "Crit", CriteriaView),
    ("results", "7", "Results", "Res", ResultsView),
    ("plots", "8", "Plots", "Plot", PlotsView),
    ("calc", "9", "Calc", "Calc", CalcView),
    ("rating", "0", "Rating", "Rate", RatingView),
    ("sizing", "s", "Size", "Size", SizingView),
]
INPUT_VIEWS = {v[0] for v in VIEWS[:6]}
VIEW_KEYS = frozenset(v[1] for v in VIEWS)  # the keys that switch views with no field picked
VIEW_FKEYS = [f"f{n}" for n in range(2, 13)]  # F2 .. F12: the views in bar order, from anywhere
SOLVE_DEBOUNCE = 0.03  # seconds: keys typed closer together than this cost one solve
SOLVE_LOCK = threading.Lock()  # one solve of the job at a time (`JobScreen._solve`)

SHAPE_DEFAULTS = {
    "rect-tube": {"depth": "4 in", "width": "2 in", "wall": "1/8 in"},
    "square-tube": {"size": "2 in", "wall": "1/8 in"},
    "round-tube": {"od": "2 in", "wall": "0.120 in"},
    "pipe": {"od": "2.375 in", "wall": "0.154 in"},
    "rect-bar": {"depth": "3 in", "width": "1/2 in"},
    "flat-bar": {"depth": "3 in", "width": "1/4 in"},
    "square-bar": {"size": "1 in"},
    "round-bar": {"diameter": "1 in"},
    "angle": {"depth": "3 in", "width": "3 in", "thickness": "1/4 in"},
    "channel": {"depth": "6 in", "flange_width": "2 in", "flange_thickness": "3/8 in",
                "web_thickness": "1/4 in"},
    "i-beam": {"depth": "8 in", "flange_width": "5 in", "flange_thickness": "5/16 in",
               "web_thickness": "1/4 in"},
    "tee": {"depth": "4 in", "flange_width": "4 in", "flange_thickness": "3/8 in",
            "stem_thickness": "1/4 in"},
}


def _number_or_text(text: str):
    """A number as typed ("1.670" is written 1.670, not 1.67), or the text itself (the
    reader then says what is wrong with it)."""
    t = text.strip()
    if not t:
        return None
    try:
        value = int(t) if t.isdigit() else float(t)
    except ValueError:
        return t
    from shopbeam.jobs.jobdoc import number_as_typed  # noqa: PLC0415 - startup

    return number_as_typed(value, t)




def title_bar(title: str, label: str, flags: str, width: int) -> str:
    """Title | where | flags in `width` columns: the flags (UNSAVED CHANGES, read-only
    preset) always whole; the place shortened to its file name, then the title cut."""
    title = " ".join(str(title).split())  # one line: a title's line breaks and tabs as spaces
    tail = f" | {flags}" if flags else ""
    bar = f"{title} | {label}{tail}"
    if len(bar) <= width:
        return bar
    if "/" in label or "\\" in label:
        label = "..." + label.replace("\\", "/").rsplit("/", 1)[-1]
    room = width - len(f" | {label}{tail}")
    if room < 12:  # not even a short title fits beside the place: drop the place
        label, room = "", width - len(tail)
    if len(title) > room:
        title = title[:max(1, room - 3)] + "..."
    return f"{title}{' | ' + label if label else ''}{tail}"[:width]


class JobScreen(SteadyKeys, Screen):
    """The open job: input views, result views, the live answer and the safety banner."""

    # One key map for every screen (screens.KEYS says it in words; F1 shows it). Keys a
    # text field never needs work from inside a field: F-keys and ctrl+letters.
    BINDINGS = [
        Binding("ctrl+s", "save", "save", priority=True),
        Binding("ctrl+d", "save_as", "save as", priority=True),
        Binding("ctrl+o", "library", "library", priority=True),
        Binding("ctrl+n", "new", "new job", priority=True, show=False),
        Binding("ctrl+r", "write_sheet", "write to file", priority=True, show=False),
        Binding("ctrl+p", "print_sheet", "print", priority=True, show=False),
        Binding("ctrl+z", "undo_remove", "undo remove", priority=True, show=False),
        Binding("ctrl+l", "positions", "move positions", priority=True, show=False),
        Binding("f1", "app.help", "keys", priority=True),
        Binding("question_mark", "app.help", "keys", show=False),
        Binding("escape", "leave_field", "leave field", show=False),
        # with no field picked (after esc), the rows' keys still work in their views; the
        # view's own bindings take them whenever something in it has the focus
        Binding("ctrl+t", "rows('add')", "add", show=False),
        Binding("ctrl+x", "rows('remove')", "remove", show=False),
    ] + [Binding(",".join([key, f"alt+{key}"] + ([OPTION_DIGITS[key]]
                                                if key in OPTION_DIGITS else [])),
                 f"view('{vid}')", name, show=False, priority=False)
         for (vid, key, name, _s, _c) in VIEWS] + [
        # an F-key back to a view puts the cursor back in the field left there (typing goes
        # on where it stopped); a digit view key (alt+digit too, which a terminal over SSH
        # sends as Esc and the digit) leaves the view itself picked, so the next digit of a
        # burst switches views again and never lands in a field
        Binding(fkey, f"view('{vid}', True)", name, show=False, priority=False)
        for (vid, _k, name, _s, _c), fkey in zip(VIEWS, VIEW_FKEYS)]

    def __init__(self, session: Session) -> None:
        super().__init__()
        session.deferred = True
        self.session = session
        self.current = "job"
        self._left_fields: dict = {}  # view id -> the text field left picked in it

    def compose(self) -> ComposeResult:
        yield Banner(id="banner")
        yield Static("", id="titlebar", markup=False)
        yield ViewBar([(v[0], v[1], v[2]) for v in VIEWS], id="viewbar")
        with ContentSwitcher(initial="job", id="views"):
            yield JobView(id="job")  # the other views are built when first shown
        yield Static("", id="summary", markup=False)
        yield Footer()

    def set_focus(self, widget, scroll_visible: bool = True, from_app_focus: bool = False):
        """Focus moves at once (a key of a burst goes where the keys before it sent the
        focus); a text field entered this way has its text selected now, as it would be
        when typed slowly."""
        before = self.focused
        super().set_focus(widget, scroll_visible, from_app_focus)
        if widget is not None and self.focused is widget and widget is not before \
                and isinstance(widget, FieldInput) and not from_app_focus:
            widget.focus_arrived()

    def on_mount(self) -> None:
        self._settled_length = self.session.doc.get("beam.length")
        self.refresh_all()
        # a job opened unsolved: the first screen is drawn first, then the solve starts (its
        # imports and work in a thread would share the interpreter with the first paint)
        self.call_after_refresh(self.solve_soon)

    def on_resize(self, event: events.Resize) -> None:
        if event.size != getattr(self, "_shown_at", None):  # not again for the same size
            self.refresh_all()

    # ------------------------------------------------------------------ showing
    def refresh_all(self) -> None:
        self._shown_at = self.size
        s, ev = self.session, self.session.evaluation
        tags = ev.job.tags if ev.job is not None else (s.doc.get("tags") or [])
        if not isinstance(tags, list) and not isinstance(tags, tuple):
            tags = []
        prof = s.doc.get("criteria.lifting")
        if ev.job is not None:
            lifting = self._was_lifting = ev.job.caution_lifting
        else:  # while the job does not read (a field being typed), the last word stands: a
            # job read as lifting by its words keeps the stronger caution through an edit
            lifting = isinstance(prof, str) and bool(prof) or getattr(self, "_was_lifting",
                                                                        False)
        self.query_one(Banner).show(tags, lifting)
        title = s.doc.get("title") or "(no title)"
        flags = []
        if s.dirty:
            flags.append("UNSAVED CHANGES")
        if s.read_only:
            flags.append("read-only preset")
        bar = title_bar(str(title), s.label, "; ".join(flags), (self.size.width or 80) - 2)
        if bar != getattr(self, "_bar_shown", None):  # unchanged: no redraw
            self._bar_shown = bar
            update_text(self.query_one("#titlebar", Static), Text(bar, no_wrap=True))
        vb = self.query_one(ViewBar)
        if self.size.width and self.size.width < 112:
            vb.views = [(v[0], v[1], v[3]) for v in VIEWS]
            vb.compact = True
        else:
            vb.views = [(v[0], v[1], v[2]) for v in VIEWS]
            vb.compact = False
        vb.show(self.current)
        view = self.query_one(f"#{self.current}")
        view.show(s)
        # lay the view out now when its fields were shown or hidden: Tab order follows
        # positions on screen, so a Tab typed right after must find them where they will be
        # (an answer that only changes the words beside the fields is laid out with the
        # next frame, as usual)
        stops = self._tab_stops(view)
        if stops != getattr(self, "_laid_out_for", None):
            self._laid_out_for = stops
            self._refresh_layout()
        summary = self.query_one("#summary", Static)
        summary.display = self.current in INPUT_VIEWS
        if self.current in INPUT_VIEWS:
            self._show_summary()
        # a line the answer adds above the form (a load's changed direction) must not push
        # the field being typed in out of sight: typing into a hidden field
        self.call_after_refresh(self._focus_in_view)

    def _focus_in_view(self) -> None:
        f = self.focused
        if isinstance(f, (FieldInput, Choice)) and shown_now(f):
            # the whole field, with the message under it (a load that now points up says
            # why and what to do there), not its text box alone
            target = f.parent if isinstance(f.parent, Field) else f
            target.scroll_visible(animate=False, immediate=True)

    @staticmethod
    def _tab_stops(view) -> tuple:
        """Which of the view's focusable widgets (text boxes, choices, lists) are shown."""
        widgets = view.focusables() if hasattr(view, "focusables") else []
        if not widgets:
            return (view.id, None)
        shown = []
        for w in widgets:
            node = w
            while node is not None and node is not view and node.display:
                node = node.parent
            shown.append(node is view)
        return (view.id, tuple(shown))

    def summary_text(self) -> str:
        ev = self.session.evaluation
        if self.session.stale and ev.job is None and not ev.problems:
            return "Reading and solving the job ..."
        warn = load_warnings(self.session)[:1]
        behind = late(self)
        if behind and ev.result is None:
            warn = [CHECKING_EDIT] + warn
        note = self.length_note()
        if note:  # a length change not settled yet: first, it can move the answer a lot
            warn = [note] + warn
        if ev.result is None:
            return self._problems_summary(warn + problems_text(ev).splitlines())

        from shopbeam.tui import drawing  # noqa: PLC0415 - startup (the worker imported it)

        width = (self.size.width or 80) - 2
        warn = [w if len(w) <= width else textwrap.shorten(w, width, placeholder=" ...")
                for w in warn]
        if behind:  # the answer's line is the job's before the edit: said instead, in
            # its place, with as many lines (the form does not jump up and back per key)
            line = drawing.summary_line(ev.result, width, "   (7 results, 8 plots)")
            more = ["  its answer follows as soon as the job is solved"] + [" "] * 12
            return "\n".join(warn + [CHECKING_EDIT] + more[:len(line.splitlines()) - 1])
        return "\n".join(warn + [drawing.summary_line(ev.result, width,
                                                      "   (7 results, 8 plots)")])

    def _problems_summary(self, lines: list[str]) -> str:
        """The problems in the summary's three rows, each row cut to the screen's width (a
        long message wrapped there hid the rows after it): the first lines, and the count of
        the rest with where to read them all (7 Results)."""
        width = max((self.size.width or 80) - 2, 20)

        def cut(line: str) -> str:  # at a word's end
            if len(line) <= width:
                return line
            head = line[:width - 4]
            head = head.rsplit(" ", 1)[0] if " " in head.strip() else head
            return head.rstrip() + " ..."

        if len(lines) <= 3 and all(len(ln) <= width for ln in lines):
            return "\n".join(lines)
        if len(lines) <= 2:  # one long message: as much of it as fits, then where it all is
            head = lines[:-1]
            rest = textwrap.wrap(lines[-1], width, subsequent_indent="    ")
            room = 3 - len(head)
            if len(rest) <= room:
                return "\n".join(head + rest)
            return "\n".join(head + rest[:room - 1] + ["  ... the whole message: see 7 Results"])
        if len(lines) == 3:  # each row cut to fit: "and 1 more" would hide the one problem
            return "\n".join(cut(ln) for ln in lines)
        more = len(lines) - 2
        return "\n".join([cut(ln) for ln in lines[:2]]
                         + [f"  ... and {more} more: see 7 Results"])

    def changed(self) -> None:
        """The document changed: show it now, solve it in a worker (latest edit wins). Until
        the answer to it comes, the answer shown is said to be for the job before the edit
        (`stale_marked`), from the edit's own frame on: no figure is shown for an older text
        without that mark, however fast or slow the solve."""
        if self.session.stale:
            self.stale_marked = True
        self.refresh_all()
        self.solve_soon()

    def solve_soon(self) -> None:
        s = self.session
        if s.stale:
            # a key on its own is solved at once; keys of a burst (closer together than the
            # debounce) wait it out, so the burst costs one solve
            now = time.monotonic()
            wait = SOLVE_DEBOUNCE if now - getattr(self, "_asked_at", -1e9) < SOLVE_DEBOUNCE \
                else 0.0
            self._asked_at = now
            self._solve(s, *s.snapshot(), wait=wait)

    stale_marked = False  # the answer shown is for an earlier edit, and said so (`changed`)
    typing_pending = False  # a key typed into a field whose edit has not reached the job yet

    def typing_now(self, field) -> None:
        """A key has just changed a field's text (`FieldInput.watch_value`): in the same step,
        before any frame shows the key, the summary and the field say the answer shown is
        for the job before it (the edit's own message comes a moment later)."""
        self.typing_pending = self.stale_marked = True
        if self.current in INPUT_VIEWS and self.is_attached:
            self._show_summary()
        field.show(CHECKING_WORDS)

    def _show_summary(self) -> None:
        """The summary's text as it stands now; unchanged, no redraw."""
        text = self.summary_text()
        if text != getattr(self, "_summary_shown", None):
            self._summary_shown = text
            update_text(self.query_one("#summary", Static), Text(text))

    def _typing_taken(self) -> None:
        """The field's edit has reached the job (or was not one): the mark stands only while
        the job is being solved."""
        if self.typing_pending:
            self.typing_pending = False
            if not self.session.stale and self.stale_marked:
                self.stale_marked = False
                self.refresh_all()

    @work(thread=True, group="solve", exit_on_error=False)
    def _solve(self, session: Session, version: int, data: dict, text: str, name: str,
               wait: float = SOLVE_DEBOUNCE) -> None:
        """Solve a snapshot of the job off the UI thread, after `wait` (a burst of keys
        costs one solve); an answer for an older version of the job is dropped. One solve
        runs at a time (`SOLVE_LOCK`): keys typed while a heavy job is being solved wait
        for it, and of them only the newest edit is solved next (the older ones' workers
        find a newer version and return), so the answer to the last key is never queued
        behind one solve per key."""
        if wait:
            time.sleep(wait)
        if session.version != version or get_current_worker().is_cancelled:
            return  # a newer edit came: its own worker solves it
        with SOLVE_LOCK:
            if session.version != version or get_current_worker().is_cancelled:
                return  # overtaken while an older solve ran
            ev = session_mod.evaluate_data(data, text, name)
        from shopbeam.tui import drawing  # noqa: F401,PLC0415 - startup: imported here, off the UI thread

        if session.version == version and not get_current_worker().is_cancelled:
            self.app.call_from_thread(self._solved, session, version, ev)

    def _solved(self, session: Session, version: int, ev) -> None:
        if session is self.session and session.install(version, ev):
            if not session.stale:
                self.stale_marked = False
            self.refresh_all()

    # ------------------------------------------------------------------ navigation
    async def action_view_key(self, key: str) -> None:
        """The view whose key is `key` (a field sends it for Esc-then-digit)."""
        vid = next((v[0] for v in VIEWS if v[1] == key), None)
        if vid is not None:
            await self.action_view(vid)

    async def action_view(self, vid: str, resume: bool = False) -> None:
        """Show the view `vid`. `resume` (its F-key): the text field that had the cursor when
        that view was left gets it back, the cursor where it was and nothing selected, so
        keys typed next go on where the typing stopped (a view left with no field picked, or
        with Esc, comes back with none)."""
        self.flush_typing()
        left = self.focused
        if isinstance(left, FieldInput) and self.current in {a.id for a in left.ancestors}:
            # the field, and what it showed: it is given the cursor back only while it still
            # shows that (the same job, row and text), never another load's value in its place
            self._left_fields[self.current] = (left, self._field_context(left))
        elif self.current != vid:
            self._left_fields.pop(self.current, None)
        self._switched = (vid, time.monotonic())
        self._switched_key = getattr(self.app, "_key_count", 0)
        switcher = self.query_one(ContentSwitcher)
        if not switcher.query(f"#{vid}"):
            cls = next(v[4] for v in VIEWS if v[0] == vid)
            await switcher.mount(cls(id=vid))
        self.current = vid
        switcher.current = vid
        self.refresh_all()
        view = self.query_one(f"#{vid}")
        back, was = self._left_fields.get(vid, (None, None)) if resume else (None, None)
        if back is not None and back is not left and back.is_attached \
                and view in back.ancestors and shown_now(back) \
                and self._field_context(back)[:-1] == was[:-1]:
            back.resume_next = True  # no selection: the keys typed next are added, not a
            self.set_focus(back)     # replacement of the text
            if self.focused is back:
                at = min(was[-1], len(back.value))  # the cursor where it was, nothing picked
                back.selection = Selection.cursor(at)
                self.call_after_refresh(back.show_cursor)
                return
            back.resume_next = False
        self.set_focus(view)  # now, so the next key of a burst already goes to the new view
        if self.focused is not view:
            self.call_after_refresh(self._focus_first, view)

    def _field_context(self, field) -> tuple:
        """What a text field shows, to know it again: the job, the row of a supports or loads
        view, the field's text, and (last) where its cursor is."""
        rows = next((a for a in field.ancestors if isinstance(a, RowsView)), None)
        return (id(self.session), getattr(rows, "selected", None), field.value,
                field.cursor_position)

    def _focus_first(self, view) -> None:
        """The view itself takes the focus, not its first field: a view key pressed next
        must switch views, never land in a field. Tab goes into the fields. Called after a
        refresh: by then another view key may have switched on (and Tab gone into a field of
        the view now shown), so it acts only while `view` is still the view shown."""
        if self.current != view.id or not view.is_attached:
            return  # a later switch owns the focus now: never pull it into a hidden view
        if self.focused is None or view not in self.focused.ancestors_with_self:
            self.set_focus(view)

    async def action_step(self, step: int) -> None:
        ids = [v[0] for v in VIEWS]
        await self.action_view(ids[(ids.index(self.current) + step) % len(ids)])

    def action_new(self) -> None:
        self.flush_typing()
        self.guard("start a new job", self.new_job)

    def action_write_sheet(self) -> None:
        self.flush_typing()
        view = self.query_one(f"#{self.current}")
        if not hasattr(view, "write_file"):
            self.notify("ctrl+r writes the calc sheet (9 Calc) or the rating label (0 Rating) "
                        "to a file: go to one of those views first.", severity="warning")
            return
        view.write_file()

    def action_print_sheet(self) -> None:
        self.flush_typing()
        view = self.query_one(f"#{self.current}")
        if not hasattr(view, "print_sheet"):
            self.notify("ctrl+p prints the calc sheet (9 Calc) or the rating label (0 Rating): "
                        "go to one of those views first.", severity="warning")
            return
        view.print_sheet()

    def action_leave_field(self) -> None:
        self.set_focus(None)

    def action_rows(self, what: str) -> None:
        """ctrl+t / ctrl+x with nothing in the view focused: the view's add or remove, where
        it has rows; elsewhere it is said where they work (never silently nothing)."""
        view = self.query_one(f"#{self.current}")
        act = getattr(view, f"action_{what}_row", None)
        if act is not None:
            act()
        else:
            self.app.notify(f"ctrl+{'t' if what == 'add' else 'x'} {what}s a row in the "
                            "supports (2 Span) and loads (3 Loads) views.", timeout=5)

    def focus_next(self, selector="*"):
        """Tab: as Textual moves it, but from the view's last field it wraps to the first
        field, not to the view itself (which takes the focus when it is switched to, so that
        a view key typed next switches views): a key typed there would go nowhere, and a
        digit would switch views under a person who meant it for a field."""
        return self._tab(super().focus_next, selector)

    def focus_previous(self, selector="*"):
        """Shift+Tab: from the view's first field it wraps to the last (see `focus_next`)."""
        return self._tab(super().focus_previous, selector)

    def _tab(self, move, selector):
        before = self.focused
        got = move(selector)
        if got is not None and isinstance(got, View) and (
                before is None or before is not got and got in before.ancestors):
            # past the view, onto the field at the other end (or, from no field picked,
            # after esc, onto the first one: the view itself takes no typing)
            got = move(selector)
        return got

    # ------------------------------------------------------------------ edits
    ENTER_NEXT_FIELD = True  # enter in a field moves on (done by the field, in key order)

    def on_input_submitted(self, event) -> None:
        event.stop()

    def on_field_edited(self, event: Field.Edited) -> None:
        event.stop()
        f = event.field
        if event.value != f.input.value or f._typed is None:
            return  # an older keystroke (a newer one follows), or already taken by a flush
        if self.edit_safely(f"the edit of {f.label}", self.apply_edit, f.key, event.value,
                            event.row):
            f.taken(event.value)
            f.edited_version = self.session.version
            if late(f):  # the screen was drawn before this field's edit was counted
                f.show(CHECKING_WORDS)
        self._typing_taken()

    async def key_behind(self, event) -> None:
        """A key that reached a question before it could be read (see `AnswerScreen`): it
        does here what it would have done had the question come after it. Text goes into
        the field that has the focus, Tab and Enter move on, Backspace and the arrows edit;
        a key with nowhere to go is named in the notice of keys not used."""
        focused = self.focused
        if isinstance(focused, Input):
            if event.is_printable:
                await focused._on_key(event)
                return
            if event.key == "enter":
                await focused.action_submit()
                return
            for binding in focused._bindings.key_to_bindings.get(event.key, ()):
                await focused.run_action(binding.action)
                return
        if event.key == "tab":
            self.focus_next()
            return
        if event.key == "shift+tab":
            self.focus_previous()
            return
        if event.is_printable and event.character:
            # a choice too: a key typed before the question could be read is text
            self.not_typed(event.character, focused or self)

    STRAY_WAIT = 0.4  # seconds: keys not used that come closer together make one notice
    # a view key (a digit) typed within this of a key nothing took is text of the same word
    # (typed slowly, at up to a second and a half a key), not a switch of views
    STRAY_WORD_GAP = 2.0  # seconds

    def not_typed(self, character: str, where) -> None:
        """A printable key that nothing took (the focus on a choice, a list or a view, not
        in a text field): it is not used, and a notice says so, with what was typed, once
        the burst is over. Typed text never goes missing without a word."""
        said = self._where(where)
        if self._stray and said != self._stray_where:
            self._say_not_typed()
        if not self._stray:  # a burst's first stray key: right behind a view key?
            vid, at = self._switched
            name = next((v[2] for v in VIEWS if v[0] == vid), vid)
            self._stray_after = (f" (typed right behind the key that switched to the {name} "
                                 "view; a digit on its own, with no field picked, changes "
                                 "views)"
                                 if vid and time.monotonic() - at < self.STRAY_WAIT else "")
        self._stray += character
        self._stray_where = said
        self._stray_at = time.monotonic()
        if self._stray_timer is not None:
            self._stray_timer.stop()
        self._stray_timer = self.set_timer(self.STRAY_WAIT, self._say_not_typed)

    _stray = ""
    _stray_at = -1e9  # when the last key nothing took was typed (time.monotonic)
    _stray_where = ""
    _stray_timer = None
    _stray_after = ""
    _switched = ("", 0.0)  # the last view switched to, and when (time.monotonic)
    _switched_key = -2  # the count of the key that switched it (ShopbeamApp._key_count)

    # keys not used said within this of the last notice (typed slowly, one by one) join it:
    # one notice, updated, not one stacked per key
    STRAY_JOIN = 1.5  # seconds
    _stray_note = None  # (notification, text it names, where, when said)

    def _say_not_typed(self) -> None:
        text, self._stray = self._stray, ""
        self._stray_timer = None
        if not text.strip():
            return  # spaces alone: nothing worth a notice
        now = time.monotonic()
        prev = self._stray_note
        if prev is not None and prev[2] == self._stray_where and now - prev[3] <= \
                self.STRAY_JOIN + self.STRAY_WAIT and prev[0] in self.app._notifications:
            self.app._unnotify(prev[0])  # the slow keys' notice so far: this one extends it
            text = prev[1] + text
        else:
            self.app.bell()
        digits = any(ch.isdigit() for ch in text)
        note = self._note(
            f"Not typed anywhere: \"{escapes.shown(text)}\"{self._stray_after}. The focus was "
            f"on {self._stray_where}, not in a text field. Tab goes to the next field; F2 to "
            "F12 change views." + (" A digit within two seconds of a key not used is taken "
                                   "as text, not as a view: press it again to change views."
                                   if digits else ""),
            title="keys not used", severity="warning", timeout=10)
        self._stray_note = (note, text, self._stray_where, now)

    def _where(self, widget) -> str:
        if isinstance(widget, Choice):
            return (f"the {widget.label.strip()} choice (a first letter pressed on its own, "
                    "or <- ->, picks)")
        view = next((a for a in widget.ancestors_with_self if isinstance(a, View)), None)
        # no widget of a view has the focus: the view on screen (it had said "job" always)
        name = view.title if view is not None else next(
            (v[2] for v in VIEWS if v[0] == getattr(self, "current", "")), "job")
        if isinstance(widget, RowList):
            return f"the list of the {name} view (up and down pick a row)"
        return f"the {name} view, no field picked"

    def flush_typing(self) -> None:
        """Write what is typed in the fields into the job now, before a key that saves,
        changes view or leaves the job acts on it (their messages may still be queued)."""
        for f in self.query(Field):
            if f._typed is not None:
                value = f.input.value
                try:
                    self.edit_safely(f"the edit of {f.label}", self.apply_edit, f.key, value,
                                     f.row)
                finally:
                    f.taken(value)
                    f.forget_typing()
        for c in self.query(Choice):
            if c._pending is not None:
                value, c._pending = c._pending, None
                self.edit_safely(f"the choice of {c.label}", self.apply_choice, c.key, value)
        self._typing_taken()

    def edit_safely(self, what: str, do, *args) -> bool:
        """Apply one edit; a failure inside shopbeam (a bug) refuses that edit with a
        message and keeps the app, the job and the text in the field as they are: it never
        closes the screen with the unsaved work in it. True when the edit was made."""
        try:
            do(*args)
        except Exception as exc:  # noqa: BLE001 - a bug must never cost the user the job
            kept = ", your text stays in the field" if what.startswith("the edit") else ""
            self.notify(f"{what} could not be made ({type(exc).__name__}: {exc}). This is a "
                        f"bug in shopbeam: the job is as before{kept}, and ctrl+s still "
                        "saves.", severity="error", timeout=20)
            try:
                self.refresh_all()
            except Exception:  # noqa: BLE001 - the message above is what matters
                pass
            return False
        return True

    def apply_edit(self, key: str, value: str, row: int = 0) -> None:
        s = self.session
        raw = value.strip()
        if key in ("title", "notes"):
            # the marks stand for the line breaks the text had (a ⏎ typed is a character);
            # a text back as it was opened is that text (a mark deleted and typed again)
            was = s.doc.get(key, "")
            opened = self._opened_value([], key)
            if isinstance(opened, str) and value == one_line(opened):
                text = opened.replace("\r\n", "\n")
            else:
                text = from_one_line(value, was if isinstance(was, str) else "",
                                     breaks=key == "notes")
            s.set(key, text if key == "title" else (text or None))
        elif key == "tags":
            s.set("tags", [t.strip() for t in value.split(",") if t.strip()])
        elif key == "beam.length":
            # an emptied required field stays in the file as "" (its place and comment
            # kept, and a problem shown) until something is typed in it
            s.set(key, raw)  # positions are asked about when the field is left
        elif key in ("criteria.deflection", "criteria.live_deflection", "criteria.impact",
                     "beam.bearing"):
            s.set(key, raw or None)  # optional: emptied means left out
        elif key == "beam.braces":
            # a comma between digits ("1,200 mm", "1,5 ft") is inside a number, not a new
            # entry: the entry is kept whole, and the reader says what to write
            parts = re.split(r"(?<!\d),|,(?!\d)", value)  # "1,5 ft" stays whole too
            s.set(key, [t.strip() for t in parts if t.strip()] or None)
        elif key in ("beam.members", "criteria.safety_factor"):
            s.set(key, _number_or_text(raw))
        elif key == "section.designation":
            s.set("beam.section", raw)
        elif key.startswith("dim.") or key.startswith("custom."):
            if isinstance(s.doc.get("beam.section"), dict):
                s.set("beam.section." + key.split(".", 1)[1], raw or None)
        elif key.startswith("mat."):
            if isinstance(s.doc.get("beam.material"), dict):
                s.set("beam.material." + key[4:], raw or None)
        elif key.startswith("support."):
            if row >= len(s.rows("supports")):
                return
            # bearing is optional: emptied means left out (beam.bearing applies)
            s.set_row("supports", row, key[8:], (raw or None) if key == "support.bearing" else raw)
        elif key.startswith("load."):
            if row >= len(s.rows("loads")):
                return
            i = row
            row = s.rows("loads")[i]
            field = key[5:]
            if field in ("value", "value2") and row.get("type") == "linear":
                old = row.get("value")
                pair = list(old) if isinstance(old, list) and len(old) == 2 else ["", ""]
                pair[0 if field == "value" else 1] = raw
                s.set_row("loads", i, "value", pair)
            elif field == "label":  # its line breaks shown as marks, as in the title
                was = row.get("label")
                text = from_one_line(value, was) if isinstance(was, str) else value
                s.set_row("loads", i, "label", text or None)
            elif field in ("width", "total", "bearing"):  # optional: emptied means left out
                s.set_row("loads", i, field, raw or None)
            else:
                s.set_row("loads", i, field, raw)
        else:
            return
        self.changed()

    def on_field_left(self, event: Field.Left) -> None:
        event.stop()
        if event.field.key == "beam.length":
            self.length_settled()

    def length_settled(self, quiet: bool = False) -> None:
        """The length field was left: if the length changed and supports or loads sit along
        the beam, say so (a notice, and a line under the view until it is settled) and
        leave every position as typed. ctrl+l asks what to do with them: a question that
        popped up here would take the next keys of a burst as its answer."""
        s = self.session
        before, now = getattr(self, "_settled_length", None), s.doc.get("beam.length")
        if now == before:
            return  # settled already (ctrl+l typed before the field's leaving was noted)
        try:
            units.parse(str(now), "length", positive=True)
        except Exception:  # noqa: BLE001 - not a length yet: settled when it is one
            return
        self._settled_length = now
        if self._length_from is None:
            try:
                units.parse(str(before), "length", positive=True)
                self._length_from = str(before)
            except Exception:  # noqa: BLE001 - no length before: nothing was placed on it
                return
        change = self._length_change()
        if change is None:
            self._length_from = None  # back where it was, or nothing placed along the beam
            return
        old_text, now_text, _old, _new, placed = change
        if quiet:
            return
        self.notify(f"The length changed from {old_text} to {now_text}. The {len(placed)} "
                    "positions of supports and loads along the beam stay as typed; ctrl+l "
                    "moves them with the length or keeps the ends at the ends.",
                    title="length changed", timeout=15, markup=False)
        self.refresh_all()

    _length_from = None  # the length the positions were typed for, while not settled

    def _length_change(self):
        """(old text, new text, old, new, placed) while the length differs from the one the
        positions were typed for and something sits along the beam; else None."""
        s = self.session
        if self._length_from is None:
            return None
        now = s.doc.get("beam.length")
        try:
            new = units.parse(str(now), "length", positive=True)
            old = units.parse(self._length_from, "length", positive=True)
        except Exception:  # noqa: BLE001 - not a length (now): nothing to move yet
            return None
        if abs(new - old) <= 1e-9 * old:
            return None
        placed = []
        for table, keys in (("supports", ("at",)), ("loads", ("at", "start", "end"))):
            for i, row in enumerate(s.rows(table)):
                for k in keys:
                    try:
                        x = units.parse(str(row[k]), "length")
                    except Exception:  # noqa: BLE001 - missing or not a length
                        continue
                    if x > 1e-12:
                        placed.append((table, i, k, x))
        # the brace points and a trolley's travel sit along the beam too
        braces = s.doc.get("beam.braces")
        placed += [("braces", j, "at", x) for j, x in _along(braces)]
        moving = s.doc.get("moving")
        for i, mv in enumerate(moving if isinstance(moving, list) else ()):
            travel = mv.get("travel") if isinstance(mv, dict) else None
            placed += [("movings", i, f"travel{j}", x) for j, x in _along(travel)]
        if not placed:
            return None
        return self._length_from, str(now), old, new, placed

    def length_note(self) -> str:
        """The line under the input views while a length change is not settled."""
        change = self._length_change()
        if change is None:
            return ""
        return f"Length {change[0]} -> {change[1]}: positions kept as typed; ctrl+l moves them"

    def action_positions(self) -> None:
        """ctrl+l: what happens to the supports and loads after a length change."""
        self.flush_typing()
        self.length_settled(quiet=True)  # the length typed right before ctrl+l counts
        change = self._length_change()
        if change is None:
            self._length_from = None
            self.notify("The length has not changed since the supports and loads were "
                        "placed (or none sits along the beam): nothing to move.", timeout=6)
            return
        old_text, now_text, old, new, placed = change
        s = self.session
        lines = [f"  {self._placed_words(t, i, k, x)}" for t, i, k, x in placed]
        if len(lines) > 8:
            lines = lines[:7] + [f"  ... and {len(lines) - 7} more"]

        def answer(choice) -> None:
            self._length_from = None  # answered (esc: kept as typed)
            self.edit_safely("moving the positions", self.move_positions, choice or "keep",
                             old, new, placed)

        self.app.push_screen(LengthScreen(old_text, now_text, lines), answer)

    def _placed_words(self, table: str, i: int, k: str, x: float, shown: str = "") -> str:
        """One position along the beam in words ("load 2 start 4 ft", "brace 1 at 6 ft"):
        a support's or load's as typed in its row, a brace's or travel's `shown` or x."""
        system = self.session.doc.get("units") if self.session.doc.get("units") in (
            "us", "si") else "us"
        at = shown or units.fmt(x, "length", system)
        if table == "braces":
            return f"brace {i + 1} at {at}"
        if table == "movings":
            return f"trolley travel {'start' if k.endswith('0') else 'end'} {at}"
        try:
            at = str(self.session.rows(table)[i][k])  # as typed
        except (IndexError, KeyError, TypeError):
            pass
        return f"{table[:-1]} {i + 1} {k} {at}"

    def move_positions(self, how: str, old: float, new: float, placed) -> None:
        s = self.session
        system = s.doc.get("units") if s.doc.get("units") in ("us", "si") else "us"
        moved, moved_at = [], []
        for table, i, k, x in placed:
            if how == "scale":  # (six figures: scaled back, a position comes back as it was)
                to = units.fmt(x * new / old, "length", system, 6)
            elif how == "ends" and abs(x - old) <= 1e-9 * old:
                to = str(s.doc.get("beam.length"))
            else:
                continue
            if table == "braces":
                braces = list(s.doc.get("beam.braces"))
                braces[i] = to
                s.doc.set_value("beam.braces", braces)
            elif table == "movings":
                travel = list(s.doc.get("moving")[i]["travel"])
                travel[int(k[-1])] = to
                s.doc.set_moving(i, travel=travel)
            else:
                (s.doc.set_support if table == "supports" else s.doc.set_load)(i, **{k: to})
            moved.append(self._placed_words(table, i, k, x, to))
            moved_at.append((table, i, k))
        past = [f"{t[:-1]} {i + 1}" for t, i, k, x in placed
                if x > new * (1 + 1e-9) and not (how == "scale" or
                                                 (how == "ends" and abs(x - old) <= 1e-9 * old))]
        if moved:
            s.touched()
            # the field with the focus shows its moved value too (nothing typed is pending:
            # ctrl+l took the typing first); only the next value shown, then typing rules
            here = getattr(self.focused, "parent", None)
            shown = {("beam.braces", None) if t == "braces" else (f"{t[:-1]}.{k}", i)
                     for t, i, k in moved_at if t != "movings"}
            if isinstance(here, Field) and ((here.key, here.row) in shown
                                            or (here.key, None) in shown):
                here.will_move()
            self.app.clear_notifications()  # "positions stay as typed" is no longer so
            self.notify("Moved: " + "; ".join(moved[:6]) + (" ..." if len(moved) > 6 else ""),
                        timeout=8)
        elif how == "keep":
            self.notify("Positions kept as typed." + (
                f" Past the new end (errors until moved): {', '.join(sorted(set(past)))}."
                if past else ""), severity="warning" if past else "information", timeout=8)
        self.changed()

    def on_choice_changed(self, event: Choice.Changed) -> None:
        event.stop()
        c = event.choice
        if c._pending is None or event.value != c._pending:
            return  # already taken by a flush, or an older choice (a newer one follows)
        c._pending = None
        self.edit_safely(f"the choice of {c.label}", self.apply_choice, c.key, event.value)

    def apply_choice(self, key: str, value: str) -> None:
        s = self.session
        if key == "units":
            s.set("units", value)
        elif key == "beam.self_weight":
            s.set("beam.self_weight", value == "included")
        elif key == "support.type":
            i = self.query_one("#span", SpanView).selected
            row = s.rows("supports")[i]
            kept = self._kept_for(("supports", i))
            if "stiffness" in row:  # a stiffness typed for a spring comes back with it
                kept["spring"] = {"stiffness": row["stiffness"]}
            s.set_row("supports", i, "type", value)
            row = s.rows("supports")[i]
            if value == "spring" and "stiffness" not in row:
                s.set_row("supports", i, "stiffness", kept.get("spring", {}).get(
                    "stiffness", "2000 lbf/in" if s.doc.get("units") != "si" else "350 kN/m"))
            elif value != "spring" and "stiffness" in row:
                s.set_row("supports", i, "stiffness", None)
        elif key == "load.type":
            self.change_load_type(self.query_one("#loads", LoadsView).selected, value)
        elif key == "beam.braced":
            s.set("beam.braced", True if value == "all along" else self._as_opened(
                ["beam"], "braced", {False}))
        elif key == "criteria.basis":
            s.set("criteria.basis", "first-yield" if value == "first-yield" else None)
        elif key == "load.patterned":
            i = self.query_one("#loads", LoadsView).selected
            s.set_row("loads", i, "patterned", True if value == "yes" else self._as_opened(
                ["loads", i], "patterned", {False}))
        elif key == "load.uplift":
            i = self.query_one("#loads", LoadsView).selected
            s.set_row("loads", i, "uplift", True if value == "yes" else self._as_opened(
                ["loads", i], "uplift", {False}))
        elif key == "load.case":
            i = self.query_one("#loads", LoadsView).selected
            s.set_row("loads", i, "case", "dead" if value == "dead" else self._as_opened(
                ["loads", i], "case", {"live"}))
        elif key == "load.flange":
            i = self.query_one("#loads", LoadsView).selected
            # "top" is the default, except on a lifting job, whose point loads hang from the
            # bottom flange unless they say flange = "top": write it there
            tags = s.doc.get("tags")
            lifting = is_lifting(tags if isinstance(tags, list) else [],
                                 s.doc.get("criteria.lifting") or "")
            s.set_row("loads", i, "flange",
                      "bottom" if value == "bottom" else ("top" if lifting else self._as_opened(
                          ["loads", i], "flange", {"top"})))
        elif key == "load.wheels":
            i = self.query_one("#loads", LoadsView).selected
            n = WHEEL_WORDS.get(value, 2)
            s.set_row("loads", i, "wheels", None if n == 2 else n)
        elif key == "support.brace":
            i = self.query_one("#span", SpanView).selected
            s.set_row("supports", i, "brace", {"yes": True, "no": False}.get(value))
        elif key == "criteria.lifting":
            self.change_lifting(value)
        elif key == "criteria.category":
            s.set(key, value)
        elif key in ("criteria.duration", "beam.temperature"):
            s.set(key, None if value == MaterialView.WOOD_KEYS[key] else value)
        elif key in ("beam.wet_service", "beam.repetitive"):
            s.set(key, True if value == "yes" else self._as_opened(
                ["beam"], key.split(".")[1], {False}))
        elif key == "section.mode":
            self.change_section_mode(value)
        elif key == "section.shape":
            self.change_section_shape(value)
        elif key == "material.mode":
            self.change_material_mode(value)
        else:
            return
        self.changed()

    def change_lifting(self, value: str) -> None:
        """A lifting profile chosen (or "none"): written to [criteria] lifting (a job that
        names a profile is a lifting device: the stronger cautions on every screen)."""
        s = self.session
        s.set("criteria.lifting", None if value == "none" else value)
        cat = s.doc.get("criteria.category")
        if value != "below-the-hook" and cat is not None:
            s.set("criteria.category", None)
            self.notify(f"category {cat} removed: it is used only with below-the-hook.",
                        severity="warning", timeout=6)

    def _length_text(self, fraction: float) -> str:
        ev, s = self.session.evaluation, self.session
        system = s.doc.get("units", "us") if s.doc.get("units") in ("us", "si") else "us"
        try:
            L = units.parse(s.doc.get("beam.length", ""), "length")
        except Exception:  # noqa: BLE001
            L = ev.job.length if ev.job is not None else (10 * units.FT if system == "us" else 3.0)
        return units.fmt(L * fraction, "length", system)

    def change_load_type(self, i: int, kind: str) -> None:
        s = self.session
        row = s.rows("loads")[i]
        old = row.get("type")
        if old == kind:
            return
        si = s.doc.get("units") == "si"
        fields = {"type": kind}
        # the value's unit changes with the kind (lbf, lbf*ft, lbf/ft): it is cleared, never
        # made up, so the row says "value missing" until the user types one
        if kind in ("point", "moment"):
            fields["at"] = row.get("at") or row.get("start") or self._length_text(0.5)
            fields.update(start=None, end=None, width=None, total=None)
        else:
            fields["start"] = row.get("start") or ("0 m" if si else "0 ft")
            fields["end"] = row.get("end") or self._length_text(1.0)
            fields["at"] = None
            if kind != "uniform":
                fields["total"] = None
        same_unit = {old, kind} <= {"uniform", "linear"}
        v = row.get("value")
        if same_unit and kind == "linear" and isinstance(v, str):
            fields["value"] = [v, v]
        elif same_unit and kind == "uniform" and isinstance(v, list) and v:
            fields["value"] = v[0]
        elif not same_unit:
            fields["value"] = None
        # what the row had as `old` is kept, and what it had as `kind` comes back: a type
        # picked by mistake and picked back loses nothing that was typed
        kept = self._kept_for(("loads", i))
        kept[old] = {k: row.get(k) for k in ("value", "width", "total", "at", "start", "end")
                     if row.get(k) is not None}
        for k, v in kept.get(kind, {}).items():  # as typed for this type: over any default
            fields[k] = v
        # keys dropped leave their place and comment behind, and come back into them (in
        # the reverse of the order they left, so each lands where it was)
        gone = [k for k, v in fields.items() if v is None and k in row]
        back = [k for k, v in fields.items() if v is not None and k not in row]
        order = kept.get("_gone", [])
        back.sort(key=lambda k: -order.index(k) if k in order else 1)
        for k in gone:
            s._forget_or_restore(["loads", i], k, None)
            s.doc.set_load(i, **{k: None})
        for k in back:
            if not s._forget_or_restore(["loads", i], k, fields[k]):
                s.doc.set_load(i, **{k: fields[k]})
        for k, v in fields.items():
            if k not in gone and k not in back:
                s.doc.set_load(i, **{k: v})
        if gone:
            kept["_gone"] = gone
        s.touched()

    def _as_opened(self, path: list, key: str, same: set):
        """A choice set back to its default: the value the file had as opened (or last
        saved) when it said the default in words (`case = "live"`, `patterned = false`), so
        a choice picked away and back leaves the line as it was; None (the key left out)
        when it did not."""
        got = self._opened_value(path, key)
        return got if got is not None and got in same and \
            not (isinstance(got, bool) != any(isinstance(x, bool) for x in same)) else None

    def _opened_value(self, path: list, key: str):
        """The value `key` (under `path`) had in the file as opened or last saved; None."""
        text = self.session.saved_text
        if not text:
            return None
        cache = self.__dict__.setdefault("_opened", {})
        if text not in cache:
            cache.clear()
            try:
                cache[text] = jobdoc.JobDoc.parse(text).doc.unwrap()
            except (InputError, ValueError):
                cache[text] = {}
        node = cache[text]
        for p in path:
            try:
                node = node[p]
            except (KeyError, IndexError, TypeError):
                return None
        return node.get(key) if isinstance(node, dict) else None

    def _kept_of(self, node, kept: dict | None = None) -> dict | None:
        """What the row table `node` had under the other types it was given (type -> {key:
        value}), held for as long as the row is this same table of the job file; `kept`
        given: held for it from now on."""
        store = self.__dict__.setdefault("_kept_by_type", {})
        if kept is not None:
            store[id(node)] = (node, kept)
        held = store.get(id(node))
        return held[1] if held is not None and held[0] is node else None

    def _kept_rows(self, table: str) -> list:
        """`_kept_of` each row of `table`, by index."""
        return [self._kept_of(self.session._node([table, i]))
                for i in range(len(self.session.rows(table)))]

    def _set_kept_rows(self, table: str, kept: list) -> None:
        for i, k in enumerate(kept[:len(self.session.rows(table))]):
            if k is not None:
                self._kept_of(self.session._node([table, i]), k)

    def _kept_for(self, where: tuple[str, int]) -> dict:
        """`_kept_of` the row at `where` (table, index), a new one if it had none."""
        node = self.session._node(list(where))
        kept = self._kept_of(node)
        return kept if kept is not None else self._kept_of(node, {})

    def change_section_mode(self, mode: str) -> None:
        self.flush_typing()  # the figures typed so far belong to the mode left
        s = self.session
        ev = s.evaluation
        cur = s.doc.get("beam.section")
        self._remember_section(cur)
        kept = self.__dict__.setdefault("_typed_sections", {})
        if mode == "catalog":
            s.set("beam.section", getattr(self, "_last_designation", None) or "HSS4x4x1/4")
        elif mode == "dimensions":
            # the shape and sizes typed before, if any (a toggle never throws them away)
            last = kept.get("dimensions")
            s.set("beam.section", dict(last) if last else
                  {"shape": "rect-tube", **SHAPE_DEFAULTS["rect-tube"]})
        elif kept.get("custom"):
            s.set("beam.section", dict(kept["custom"]))
        else:
            sec = ev.job.section if ev.job is not None else None
            sy = s.doc.get("units", "us")
            sy = sy if sy in ("us", "si") else "us"
            if sec is not None:
                f = lambda v, k: units.fmt(v, k, sy, 5)  # noqa: E731
                spec = {"shape": "custom", "area": f(sec.area, "area"), "ix": f(sec.ix, "inertia"),
                        "sx": f(min(sec.sx_top, sec.sx_bot), "modulus"),
                        "shear_area": f(sec.shear_area, "area")}
            else:
                spec = {"shape": "custom", "area": "3.37 in^2", "ix": "7.80 in^4",
                        "sx": "3.90 in^3"}
            s.set("beam.section", spec)

    def _remember_section(self, cur) -> None:
        """What the section was before a mode or shape change: a designation, or the sizes
        typed for a shape (by shape) and the custom figures, so going back brings them."""
        kept = self.__dict__.setdefault("_typed_sections", {})
        if isinstance(cur, str):
            self._last_designation = cur
        elif isinstance(cur, dict):
            shape = cur.get("shape")
            if shape == "custom":
                kept["custom"] = dict(cur)
            elif isinstance(shape, str):
                kept["dimensions"] = dict(cur)
                kept[f"shape:{shape}"] = dict(cur)

    def change_section_shape(self, shape: str) -> None:
        self.flush_typing()  # the figures typed so far belong to the mode left
        s = self.session
        self._remember_section(s.doc.get("beam.section"))
        last = self.__dict__.setdefault("_typed_sections", {}).get(f"shape:{shape}")
        s.set("beam.section", dict(last) if last else {"shape": shape,
                                                       **SHAPE_DEFAULTS.get(shape, {})})

    def change_material_mode(self, mode: str) -> None:
        self.flush_typing()  # the figures typed so far belong to the mode left
        s = self.session
        ev = s.evaluation
        cur = s.doc.get("beam.material")
        if isinstance(cur, str):
            self._last_material = cur
        elif isinstance(cur, dict):
            self._last_custom_material = dict(cur)  # typed figures: kept for the way back
        if mode == "built-in":
            s.set("beam.material", getattr(self, "_last_material", None) or "A36")
        elif getattr(self, "_last_custom_material", None):
            s.set("beam.material", dict(self._last_custom_material))
        else:
            m = ev.job.material if ev.job is not None else None
            sy = s.doc.get("units", "us")
            sy = sy if sy in ("us", "si") else "us"
            if m is not None:
                spec = {"e": units.fmt(m.e, "stress", sy, 5), "fy": units.fmt(m.fy, "stress", sy, 5),
                        "density": units.fmt(m.density, "density", sy, 5)}
            else:
                spec = {"e": "29000 ksi", "fy": "36 ksi", "density": "490 lb/ft^3"}
            s.set("beam.material", spec)

    def on_rows_view_row_add(self, event: RowsView.RowAdd) -> None:
        event.stop()
        self.add_row(event.table, event.kind)

    def add_row(self, table: str, kind: str) -> None:
        """Add a support or load (ctrl+t, a/+ buttons) and put the focus in its first field
        now: keys typed right behind ctrl+t go where they would go typed slowly."""
        self.flush_typing()
        self.edit_safely("adding a row", self._add_row, table, kind)

    def _add_row(self, table: str, kind: str) -> None:
        s = self.session
        si = s.doc.get("units") == "si"
        zero = "0 m" if si else "0 ft"
        if table == "supports":
            n = len(s.rows("supports"))
            at = zero if n == 0 else self._length_text(1.0)
            fields = {"type": kind, "at": at}
            if kind == "spring":
                fields["stiffness"] = "10 kN/m" if si else "2000 lbf/in"
            if kind == "hinge":
                fields["at"] = self._length_text(0.5)
            i = s.add_row("supports", **fields)
            view = self.query_one("#span", SpanView)
        else:
            # no value nobody entered: the row says "value missing" until one is typed
            if kind in ("point", "moment"):
                fields = {"type": kind, "at": self._length_text(0.5)}
            else:
                fields = {"type": kind, "start": zero, "end": self._length_text(1.0)}
            i = s.add_row("loads", **fields)
            view = self.query_one("#loads", LoadsView)
        view.selected = i
        self.changed()
        if view.is_mounted and view.display:
            self._focus_row_field(view)

    def _focus_row_field(self, view) -> None:
        for f in view.query(".row-form Field"):
            if f.display:
                if self.focused is f.input:  # the same field now shows the new row's value:
                    f.input.focus_arrived()  # select it, as a focus arriving would
                else:
                    self.set_focus(f.input)
                return

    def on_rows_view_row_remove(self, event: RowsView.RowRemove) -> None:
        event.stop()
        self.remove_row(event.table, event.index)

    def remove_row(self, table: str, index: int) -> None:
        """Remove the picked support or load now (ctrl+x, x, the button); ctrl+z undoes."""
        self.flush_typing()
        self.edit_safely("removing a row", self._remove_row, table, index)

    def _remove_row(self, table: str, index: int) -> None:
        rows = self.session.rows(table)
        if not rows or not 0 <= index < len(rows):
            return
        kept = {t: self._kept_rows(t) for t in ("supports", "loads")}
        self.__dict__.setdefault("_kept_removed", []).append(kept[table].pop(index))
        self.session.remove_row(table, index)
        for t, lst in kept.items():  # the rows may be new tables now: what each kept follows
            self._set_kept_rows(t, lst)
        view = self.query_one("#span" if table == "supports" else "#loads", RowsView)
        view.selected = max(0, index - 1)
        # a field of the removed row would now show its neighbour's value: keys typed right
        # behind ctrl+x must not edit that row, so the focus goes to the list (they are
        # then said as not typed anywhere)
        if self.focused is not None and view in self.focused.ancestors and \
                isinstance(self.focused, FieldInput):
            lists = view.query(RowList)
            self.set_focus(lists.first() if lists else view)
        self._removed_notes = getattr(self, "_removed_notes", []) + [self._note(
            f"removed {table[:-1]} {index + 1} - ctrl+z puts it back", timeout=8)]
        self.changed()

    def _note(self, message: str, title: str = "", severity: str = "information",
              timeout: float = 8):
        """A notice, returned so that it can be taken down when it is no longer so (App.notify
        returns nothing)."""
        from textual.notifications import Notification, Notify

        note = Notification(message, title, severity, timeout, markup=False)
        self.app.post_message(Notify(note))
        return note

    def action_undo_remove(self) -> None:
        """ctrl+z: in a field whose text was changed since the focus came there, that text
        comes back (a key typed after a Tab replaces the whole text); otherwise the last
        support or load removed comes back at its place (again: the one before it)."""
        focused = self.focused
        done = focused.undo_typing() if isinstance(focused, FieldInput) else ""
        if done:
            self.notify(f"{focused.parent.label}: put back as it was when you came to it "
                        "(ctrl+z again, before you type, brings back what you typed)"
                        if done == "undone" else
                        f"{focused.parent.label}: what you typed is back", timeout=5)
            return
        self.flush_typing()
        kept = {t: self._kept_rows(t) for t in ("supports", "loads")}
        back = self.session.undo_remove()
        if back is not None:  # the row comes back with what it kept under other types
            stack = self.__dict__.setdefault("_kept_removed", [])
            kept[back[0]].insert(back[1], stack.pop() if stack else None)
            for t, lst in kept.items():
                self._set_kept_rows(t, lst)
        if back is None:
            self.notify("ctrl+z puts back the supports and loads removed, last first: none is "
                        "left to put back.", timeout=6)
            return
        table, index = back
        view = self.query("#span" if table == "supports" else "#loads")
        if view:
            view.first().selected = index
        notes = getattr(self, "_removed_notes", [])
        if notes:  # its "removed ... ctrl+z puts it back" is no longer so
            note = notes.pop()
            if note in self.app._notifications:
                self.app._unnotify(note)
        self.notify(f"{table[:-1]} {index + 1} is back", timeout=6)
        self.changed()

    def _pick(self, key: str, value: str, note: str = "") -> None:
        self.session.set(key, value)
        if note:
            self.notify(note)
        self.changed()

    def on_section_view_pick(self, event: SectionView.Pick) -> None:
        event.stop()
        self.edit_safely("picking the section", self._pick, "beam.section", event.designation)

    def on_sizing_view_pick(self, event: SizingView.Pick) -> None:
        event.stop()
        self.edit_safely("picking the section", self._pick, "beam.section", event.designation,
                         f"Using {event.designation} in the job (see 4 Section, 7 Results).")

    def on_material_view_pick(self, event: MaterialView.Pick) -> None:
        event.stop()
        self.edit_safely("picking the material", self._pick, "beam.material", event.key)

    # ------------------------------------------------------------------ saving
    def _writable_places(self) -> list[str]:
        places = [p.origin for p in library.places(self.session.library_dir) if p.writable]
        return ["user"] + [p for p in places if p != "user"]

    def action_save(self, then=None) -> None:
        self.flush_typing()
        s = self.session
        if s.path is None:
            self.action_save_as(then)
            return
        self._try_save(lambda overwrite: s.save(overwrite=overwrite), then)

    def action_save_as(self, then=None) -> None:
        self.flush_typing()
        s = self.session

        def got(answer) -> None:
            if not answer:
                return
            name, to = answer
            self._try_save(lambda overwrite: s.save_as(name, to, overwrite=overwrite), then)


        name = s.name or storage.suggest_name(str(s.doc.get("title") or "job"))
        self.app.push_screen(SaveAsScreen(name, self._writable_places()), got)

    def _try_save(self, do, then=None) -> None:
        try:
            path = do(False)
        except storage.SaveConflict as exc:
            conflict = exc  # `exc` is cleared when this block ends; the answer comes later

            def answer(choice) -> None:
                if choice == "overwrite":
                    try:
                        p = do(conflict)  # only over the file the user was shown
                    except (storage.SaveConflict, InputError, OSError) as exc2:
                        self.notify(f"not saved: {exc2}", severity="error", timeout=10)
                        return
                    self._saved(p, then)
                elif choice == "new":
                    self.action_save_as(then)

            self.app.push_screen(ConflictScreen(exc), answer)
            return
        except (InputError, OSError) as exc:
            self.notify(f"not saved: {exc}", severity="error", timeout=10)
            return
        self._saved(path, then)

    def _saved(self, path, then=None) -> None:
        s = self.session
        # the shown answer may be older than what was saved (a save right after typing): then
        # its problem count would be about other text, so none is given
        n = 0 if s.stale else len(s.evaluation.errors)
        extra = f" - the job still has {n} problem{'s' if n != 1 else ''}" if n else ""
        if s.stale:
            extra = " - checking your last edit now (see the summary line)"
        where = str(Path(path).resolve() if path is not None else s.path)
        name = f"{s.label} " if s.label != where and not _same_file(s.label, where) else ""
        self.notify(f"Saved {name}to {where}{extra}", severity="warning" if n else
                    "information", timeout=8)
        self.refresh_all()
        if then is not None:
            then()

    # ------------------------------------------------------------------ other jobs
    def guard(self, doing: str, proceed) -> None:
        """Run proceed() now, or after the user saved or discarded unsaved changes."""
        if not self.session.dirty:
            proceed()
            return

        def answer(choice) -> None:
            if choice == "save":
                self.action_save(then=proceed)
            elif choice == "discard":
                proceed()

        title = " ".join(str(self.session.doc.get("title") or "This job").split())
        self.app.push_screen(ConfirmScreen(f"'{title}'", doing), answer)

    def action_library(self, highlight=None) -> None:
        self.flush_typing()
        tags = self.session.evaluation.job.tags if self.session.evaluation.job else ()

        def chosen(answer) -> None:
            # keys typed behind the Enter that opened a job, held while the library closed
            behind, self.app._keys_after_open = self.app._keys_after_open or [], None
            if not answer:
                return
            what, path = answer
            if behind and self.session.dirty:
                # a question about the unsaved job comes first: keys typed behind the Enter
                # were meant for the job to open, never for this one (nor as the answer):
                # not used, and said
                self._not_replayed(behind)
                behind = []

            def opened(ok: bool) -> None:
                if not behind:
                    return
                if ok:
                    self.call_next(self._replay_keys, behind)
                else:
                    self._not_replayed(behind)

            if what == "open":
                self.guard("open another job", lambda: opened(self.open_path(path)))
            elif what == "new":
                self.guard("start a new job", lambda: (self.new_job(), opened(True)))

        self.app.push_screen(LibraryScreen(self.session.library_dir, tags,
                                           highlight=highlight or self.session.path), chosen)

    def _not_replayed(self, keys) -> None:
        """Keys held behind the library's Enter that go to no job: named as not typed."""
        for event in keys:
            if isinstance(event, events.Paste):
                self.not_typed(" ".join(event.text.split()), self)
            elif event.is_printable and event.character:
                self.not_typed(event.character, self)

    async def _replay_keys(self, keys) -> None:
        """Keys (and pastes) that reached the library after it chose to open a job, in their
        order, as if typed on the job: posted again, so each does what it does there (a Tab
        and text: the next field gets them; F8: the plots; ctrl+s: a save)."""
        for event in keys:
            if isinstance(event, events.Paste):
                self.app.post_message(events.Paste(event.text))
            else:
                self.app.post_message(events.Key(event.key, event.character))

    def open_path(self, path) -> bool:
        try:
            session = Session.open(path, library_dir=self.session.library_dir)
        except InputError as exc:
            self.notify(f"cannot open: {exc}", severity="error", timeout=10)
            return False
        self.set_session(session)
        self.notify(f"Opened {session.label}")
        return True

    def new_job(self) -> None:
        session = Session.new(library_dir=self.session.library_dir)
        # a new job starts with no loads: nothing on it that nobody entered
        while session.doc.loads():
            session.doc.remove_load(0)
        session.touched()
        self.set_session(session)
        self.solve_soon()
        self.call_later(self.action_view, "job")

    def set_session(self, session: Session) -> None:
        session.deferred = True
        self.session = session
        self._settled_length = session.doc.get("beam.length")
        self._length_from = None  # another job: its positions are as typed for its length
        self.set_focus(None)
        self._left_fields.clear()  # another job: no field of the last one is gone back to
        for f in self.query(Field):
            f.forget_typing()
            f._kept = None
        for fi in self.query(FieldInput):
            fi.at_focus = fi.undone = None  # ctrl+z never puts back the last job's text
        for c in self.query(Choice):
            c._pending = None
        for v in self.query(RowsView):
            v.selected = 0
        for v in self.query(SizingView):
            v._kind_set = False
        for name in ("_typed_sections", "_last_custom_material", "_last_material",
                     "_last_designation"):
            self.__dict__.pop(name, None)  # another job: its own typed values only
        self.refresh_all()


class ShopbeamApp(App):
    """The application: one job screen, with the library shown first when asked."""

    _last_key_at: float | None = None  # when the key before this one was made
    _keys_after_open: list | None = None  # keys behind the library's Enter (see on_event)
    _last_text_at: float | None = None  # when the last printable key was made

    CSS_PATH = "app.tcss"
    TITLE = "shopbeam"
    ENABLE_COMMAND_PALETTE = False
    BINDINGS = [Binding("ctrl+q", "quit", "quit", priority=True),
                Binding("ctrl+c", "quit", "quit", show=False, priority=True)]

    def __init__(self, session: Session, *, show_library: bool = False,
                 cursor_blink: bool = True, label_date=None) -> None:
        super().__init__()
        self.label_date = label_date  # the date printed on rating labels (None: today)
        self.first_session = session
        self.show_library = show_library
        self.cursor_blink = cursor_blink

    def on_mount(self) -> None:
        self.job_screen = JobScreen(self.first_session)
        self.push_screen(self.job_screen)
        if self.show_library:
            self.job_screen.action_library(highlight=self.first_session.path)

    def _refresh_notifications(self) -> None:
        """Textual's own, then `_fit_notices` once the notices are laid out."""
        super()._refresh_notifications()
        self.call_after_refresh(self._fit_notices)

    def _fit_notices(self, tries: int = 8) -> None:
        """Notices stack up from the foot of the screen; they never stay over the banners
        (the safety caution, the lifting caution), the title bar or the view bar: where the
        stack would reach them, notices are taken away early, the notices of keys not used
        first, then the oldest (a "Saved" or "ctrl+z puts it back" stays while it can).
        Textual mounts a notice's toast a refresh or two after it is made: until every
        notice has its toast laid out, this looks again after the next refresh (`tries`
        times)."""
        from textual.widgets._toast import Toast, ToastRack  # Textual is pinned exactly

        screen = self.screen
        try:
            rack = screen.get_child_by_type(ToastRack)
        except Exception:  # noqa: BLE001 - no screen or no rack (notices off): nothing
            return
        toasts = list(rack.query(Toast))
        due = sum(not n.has_expired for n in self._notifications)
        if len(toasts) != due or any(not t.region or t._notification not in
                                     self._notifications for t in toasts):
            if tries > 0:
                self.call_after_refresh(self._fit_notices, tries - 1)
            return
        kept = [w.region.bottom for w in screen.query("Banner, ViewBar, #titlebar")
                if w.region and w.display]
        room = screen.size.height - 1 - max(kept, default=0)  # the rack's margin below
        if len(toasts) > 1 and sum(t.outer_size.height + t.styles.margin.top
                                   for t in toasts) > room:
            stray = [t for t in toasts if t._notification.title == "keys not used"]
            self._unnotify((stray or toasts)[0]._notification)

    recovered = None  # where the unsaved job was written when the app failed

    def _handle_exception(self, error: Exception) -> None:
        """A failure no handler caught closes the app (Textual's way, exit code 1): the
        unsaved job is written to a recovery copy first, and the command says where."""
        js = getattr(self, "job_screen", None)
        try:
            if js is not None and js.session.dirty:
                self.recovered = js.session.save_recovery()
        except Exception:  # noqa: BLE001 - the failure itself is reported next
            pass
        super()._handle_exception(error)

    def action_help(self) -> None:
        if not isinstance(self.screen, HelpScreen):
            self.push_screen(HelpScreen())

    async def on_event(self, event) -> None:
        """Every key is handled completely, in the order typed, before the next one.

        Textual hands a key to the focused widget's queue and runs a key binding only when
        the key has bubbled back up to the app, so keys typed fast (a burst over SSH, tmux,
        key repeat, or keys queued while the screen was busy) could run out of order: a
        backspace after the characters typed behind it, a character into the field a Tab
        had already left. Here a bound key runs its action at once and a character for a
        text field goes into it at once; only keys nothing is bound to are passed on."""
        if isinstance(event, events.Paste) and self._keys_after_open is not None \
                and isinstance(self.screen, LibraryScreen):
            self._keys_after_open.append(event)  # behind the Enter that opens a job: its
            return
        if isinstance(event, events.Paste) and not isinstance(self.focused, Input):
            # a paste with no text field picked (a choice, a list, a view), or over a
            # question or the key list: the field behind takes it, else it is said, never
            # dropped (as a typed key that nothing takes)
            js = getattr(self, "job_screen", None)
            if js is not None and event.text.strip() and (
                    self.screen is js or isinstance(self.screen, (AnswerScreen, HelpScreen))):
                behind = js.focused
                if isinstance(behind, FieldInput) and self.screen is not js:
                    behind._on_paste(event)
                else:
                    js.not_typed(" ".join(event.text.split()), behind or js)
                return
        if isinstance(event, events.Key) and not event.is_forwarded \
                and isinstance(self.screen, LibraryScreen):
            if self._keys_after_open is not None:
                # Enter was pressed to open a job, which happens once its message comes
                # through: keys behind that Enter are for the job, held until it is open
                # (`JobScreen._replay_keys`), or given back to the library if nothing opens
                self._keys_after_open.append(event)
                return
            if event.key == "enter":
                self._keys_after_open = []
                # an Enter that opens nothing (a button, an empty list) must not hold the
                # keys behind it for long: they go back to the library
                self.set_timer(0.5, self._release_held_keys)
        if isinstance(event, events.Key) and not event.is_forwarded:
            self.app_focus = True
            self._key_count += 1
            now = getattr(event, "time", None)
            gap = None if now is None or self._last_key_at is None else now - self._last_key_at
            # since the last printable key: a word being typed, whatever came between
            text_gap = None if now is None or self._last_text_at is None \
                else now - self._last_text_at
            if now is not None:
                self._last_key_at = now
                if event.is_printable or event.key in ("backspace", "delete"):
                    self._last_text_at = now  # typing, editing keys too
            # a key right behind a printable one, with the focus where that one went, is
            # part of a word being typed
            typed_on = self._text_before is self.focused and gap is not None \
                and gap < Choice.ALONE
            # on a choice, a key within WORD_GAP of a printable one is a word typed slowly
            slow_text = self._text_before is self.focused and gap is not None \
                and gap < Choice.WORD_GAP
            self._text_before = self.focused if event.is_printable else False
            if event.key == "escape" and self._held_letter is not None:
                self._held_letter[2].stop()  # Esc right behind a letter: it picks nothing
                self._held_letter = None
            self._letter_behind(typed_on and event.is_printable)
            picked, self._picked = self._picked, None
            if picked is not None and event.is_printable and slow_text \
                    and picked[0] is self.focused and picked[0].is_attached:
                # a letter that picked, with more text right behind it: it was the start of a
                # word typed with the focus here, so its pick is taken back and it is named
                choice, before, letter = picked
                choice._choose(before)
                js0 = getattr(self, "job_screen", None)
                if js0 is not None:
                    js0.not_typed(letter, choice)
            if await self._check_bindings(event.key, priority=True):
                return
            focused = self.focused
            js = getattr(self, "job_screen", None)
            on_job = js is not None and self.screen is js
            if js is not None and isinstance(self.screen, HelpScreen) \
                    and event.key not in ("escape", "f1"):
                help_ = self.screen
                if getattr(event, "time", help_.opened_at) < help_.opened_at + help_.READ_TIME:
                    await js.key_behind(event)  # typed on before the key list was read:
                    return  # text, Backspace and Tab do in the field what they would have
                if event.is_printable and event.key not in ("q", "question_mark"):
                    js.not_typed(event.character or "", js)  # the key list takes no text
                    return
            if js is not None and isinstance(self.screen, AnswerScreen):
                question = self.screen
                if event.key == "enter" and question.confirm_held(event):
                    return  # a letter pressed on its own, then Enter: that answer, at once
                held = question.release()  # Esc right behind a letter: the letter is dropped
                if held is not None and event.key != "escape":
                    # a key right behind a letter answer: both were text
                    self._typed_behind(question, held)
                    await js.key_behind(held)
                    await js.key_behind(event)
                    return
                if question.too_early(event, text_gap):
                    self._typed_behind(question, event)
                    await js.key_behind(event)  # typed before it could be read, or text
                    return
                action = question.answers().get(event.key) if event.is_printable else None
                if action is not None:
                    # once keys went on to the field behind, a letter alone is text too
                    # (a slow typist's next letter); the answer is that letter, then Enter
                    def alone(ev=event):  # the letter left alone: text, typed on behind
                        self._typed_behind(question, ev)
                        self.call_later(js.key_behind, ev)

                    alone = alone if question.typed_behind or event.key in question.CONFIRM \
                        else None
                    if alone is not None and not question.typed_behind:
                        self.notify(f"\"{event.key}\" answers this question only with Enter "
                                    "right after it; on its own it goes on into the field.",
                                    timeout=6)
                    question.hold(event, lambda: self.call_later(question.run_action, action),
                                  alone)
                    return
            if isinstance(focused, Choice) and event.is_printable and not slow_text and (
                    event.key == "space" or focused.pick_for(event.character) is not None):
                # a letter picks only when pressed on its own: held for ALONE, it picks
                # then, or before the next key that is not text (a save, Tab, a view key)
                self._hold_letter(event, focused)
                return
            text_here = slow_text if isinstance(focused, Choice) else typed_on
            if on_job and isinstance(focused, (Choice, RowList)) and event.is_printable \
                    and (text_here or event.key not in ("space", "question_mark")):
                # a choice or a list in a form: a digit or letter typed there is meant
                # as text, never as a view key (it would switch views and the rest of
                # the burst would go nowhere); it is not used, and the user is told
                js.not_typed(event.character or "", focused)
                return
            if isinstance(focused, Input) and (event.is_printable or (
                    event.key == "ctrl+j" and isinstance(focused, FieldInput))):
                await focused._on_key(event)  # typed into the field now, not queued (ctrl+j:
                return  # a line break in the notes, in its place among the keys typed)
            after_switch, self._text_after_switch = self._text_after_switch, False
            if on_job and event.is_printable and not isinstance(focused, Input) and \
                    event.key in VIEW_KEYS and gap is not None and \
                    gap < Choice.ALONE and (js._switched_key == self._key_count - 1
                                            or (after_switch and typed_on)):
                # a view key right behind the key that switched views, or in the text typed
                # on from it ("F4 12 ft" in one burst): text, not a second switch; it is not
                # used, and the user is told
                self._text_after_switch = True
                js.not_typed(event.character or "", focused or js)
                return
            if on_job and event.is_printable and not isinstance(focused, Input) and \
                    event.key in VIEW_KEYS and \
                    time.monotonic() - js._stray_at < js.STRAY_WORD_GAP:
                # a view key within STRAY_WORD_GAP of a key nothing took: the same word typed
                # on slowly ("-250" at a second a key, no field picked), not three switches;
                # it is not used, and the notice names it with the rest
                js.not_typed(event.character or "", focused or js)
                return
            if on_job and event.is_printable and after_switch and typed_on:
                self._text_after_switch = True  # the word typed on goes on
            if await self._check_bindings(event.key):
                return
            if on_job and event.is_printable and event.character:
                js.not_typed(event.character, focused or js)  # nothing takes it: said
                return
            (focused or self.screen)._forward_event(event)
            return
        await super().on_event(event)

    # the focused widget when the key before this one was printable (a word being typed
    # there), else False
    _text_before = False
    _key_count = 0  # keys so far (a view switch notes the key that made it)
    _text_after_switch = False  # the key before was text typed right behind a view switch

    def _typed_behind(self, question, event) -> None:
        """A key went on to the field behind a question once the question could be read
        (typed on, not a burst that was on its way as it opened): from now on a letter
        pressed alone is text as well (a slow typist's next letter must not discard or
        overwrite), and the question is answered by its letter and Enter, or by Esc. Said
        once."""
        if getattr(event, "time", 0.0) < question.opened_at + question.READ_TIME:
            # on its way before the question was up: the answer is still a letter, but the
            # key went into a field the question covers, and that is said (once)
            if not getattr(question, "early_said", False) and event.key != "escape":
                question.early_said = True
                self.notify("A key typed as this question came up went on into the field "
                            "behind it (ctrl+z there takes it back after).", timeout=6)
            return
        if not question.typed_behind:
            question.typed_behind = True
            self.notify("Your keys are going on to the field behind this question. To answer "
                        "it, press its letter and then Enter at once; esc closes it and "
                        "changes nothing.", timeout=8)
    _held_letter = None  # (key event, choice, timer): a letter on a choice, not yet a pick
    _picked = None  # (choice, value before, letter): the last pick by a letter, for a while

    def _release_held_keys(self) -> None:
        screen = self.screen
        if self._keys_after_open is not None and isinstance(screen, LibraryScreen) \
                and not screen.opening:
            screen._give_back_keys()

    def _hold_letter(self, event, choice) -> None:
        timer = self.set_timer(Choice.ALONE, lambda: self._letter_behind(False))
        self._held_letter = (event, choice, timer)

    def _letter_behind(self, text: bool) -> None:
        """The letter (or space) held on a choice, if any, is settled: a pick (nothing
        printable came within ALONE behind it), or text (`text`: a printable key came right
        behind it), which is not used and is named in the notice of keys not used."""
        held, self._held_letter = self._held_letter, None
        if held is None:
            return
        event, choice, timer = held
        timer.stop()
        js = getattr(self, "job_screen", None)
        if text:
            if js is not None:
                js.not_typed(event.character or "", choice)
        elif choice.is_attached:
            before = choice.value
            if event.key == "space":
                choice.action_move(1)  # space on its own: the next option
            else:
                choice.type_letter(event.character)
            if choice.value != before:
                self._picked = (choice, before, event.character or " ")

    async def action_quit(self) -> None:
        if isinstance(self.screen, AnswerScreen):
            return  # the question is up already: one at a time (Esc closes it)
        js = getattr(self, "job_screen", None)
        if js is not None:
            js.flush_typing()
        if js is None or not js.session.dirty:
            self.exit()
            return
        js.guard("quit", self.exit)


def _same_file(label: str, where: str) -> bool:
    """The session's label is a path to the file saved (named once in the notice)."""
    try:
        return Path(label).resolve() == Path(where)
    except (OSError, ValueError):
        return False


def _along(values) -> list[tuple[int, float]]:
    """(index, position m) of each entry of a list of lengths that reads as a length past 0."""
    out = []
    for j, v in enumerate(values if isinstance(values, list) else ()):
        try:
            x = units.parse(str(v), "length")
        except Exception:  # noqa: BLE001 - not a length
            continue
        if x > 1e-12:
            out.append((j, x))
    return out


def _demo_path() -> Path | None:
    try:
        return library.find("bundled:demo").path
    except Exception:  # noqa: BLE001 - no bundled presets: start on a new job
        here = Path(__file__).resolve().parents[2] / "presets" / "demo.toml"
        return here if here.is_file() else None


def make_app(job_path=None, library=None, *, cursor_blink: bool = True,
             label_date=None) -> ShopbeamApp:
    """The text UI on a job file, or (no file) on the library with the bundled demo ready.

    `cursor_blink=False` and a fixed `label_date` make the screens reproducible (tests,
    screenshots).
    """
    kw = dict(cursor_blink=cursor_blink, label_date=label_date)
    # the job is read as text here (a file that is not TOML is refused now) and solved in a
    # worker once the first screen is up
    if job_path is not None:
        session = Session.open(job_path, library_dir=library, evaluate=False)
        return ShopbeamApp(session, **kw)
    demo = _demo_path()
    session = Session.open(demo, library_dir=library, evaluate=False) if demo else \
        Session.new(library_dir=library)
    return ShopbeamApp(session, show_library=True, **kw)
