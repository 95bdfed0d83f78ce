"""The shopbeam text UI: `make_app(job_path=None, library=None)` builds it.

One job screen owns the open job (a `Session`): the views below it show the session and post
what the user changed; the screen writes the change into the document, re-solves (the
numeric solve is fast enough to run on every key), and shows the new answer. Slow work (calc
sheet, capacity, sizing sweep) runs in workers in `slow.py`. Library, help and the save
dialogs are in `screens.py`.
"""

from __future__ import annotations

from pathlib import Path

import time

from rich.text import Text
from textual import work
from textual.app import App, ComposeResult
from textual.binding import Binding
from textual.screen import Screen
from textual.widgets import ContentSwitcher, Footer, Static
from textual.worker import get_current_worker

from shopbeam import units
from shopbeam.tui.screens import (ConfirmScreen, ConflictScreen, HelpScreen, LibraryScreen,
                                  SaveAsScreen)
from shopbeam.tui.session import Session
from shopbeam.tui.slow import CalcView, RatingView, SizingView
from shopbeam.tui.views import (CriteriaView, JobView, LoadsView, MaterialView, PlotsView,
                                ResultsView, RowsView, SectionView, SpanView, problems_text)
from shopbeam.tui.widgets import OPTION_DIGITS, Banner, Choice, Field, ViewBar

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
SOLVE_DEBOUNCE = 0.03  # seconds: keys typed closer together than this cost one solve

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
    t = text.strip()
    if not t:
        return None
    try:
        return int(t) if t.isdigit() else float(t)
    except ValueError:
        return t




class JobScreen(Screen):
    """The open job: input views, result views, the live answer and the safety banner."""

    BINDINGS = [
        Binding("ctrl+s", "save", "save", priority=True),
        Binding("ctrl+d", "save_as", "save as", priority=True),
        Binding("ctrl+o", "library", "library", priority=True),
        Binding("ctrl+n", "step(1)", "next view", priority=True),
        Binding("ctrl+p", "step(-1)", "prev view", priority=True, show=False),
        Binding("f1", "app.help", "help", priority=True),
        Binding("tab", "app.focus_next", "fields", show=True),
        Binding("question_mark", "app.help", "help", show=False),
        Binding("l", "library", "library", show=False),
        Binding("escape", "leave_field", "leave field", show=False),
    ] + [Binding(",".join([key, f"alt+{key}"] + ([OPTION_DIGITS[key]] if key in OPTION_DIGITS
                                                  else [])),
                 f"view('{vid}')", name, show=False)
         for vid, key, name, _s, _c in VIEWS]

    def __init__(self, session: Session) -> None:
        super().__init__()
        session.deferred = True
        self.session = session
        self.current = "job"

    def compose(self) -> ComposeResult:
        yield Banner(id="banner")
        yield Static("", id="titlebar", markup=False)
        yield ViewBar([(v[0], v[1], v[2]) for v in VIEWS], id="viewbar")
        with ContentSwitcher(initial="job", id="views"):
            yield JobView(id="job")  # the other views are built when first shown
        yield Static("", id="summary", markup=False)
        yield Footer()

    def on_mount(self) -> None:
        self.refresh_all()

    def on_resize(self) -> None:
        self.refresh_all()

    # ------------------------------------------------------------------ showing
    def refresh_all(self) -> None:
        s, ev = self.session, self.session.evaluation
        if ev.job is not None:
            self._last_length = ev.job.length
        tags = ev.job.tags if ev.job is not None else (s.doc.get("tags") or [])
        if not isinstance(tags, list) and not isinstance(tags, tuple):
            tags = []
        self.query_one(Banner).show(tags)
        title = s.doc.get("title") or "(no title)"
        flags = []
        if s.dirty:
            flags.append("UNSAVED CHANGES")
        if s.read_only:
            flags.append("read-only preset")
        bar = f"{title} | {s.label}" + (" | " + "; ".join(flags) if flags else "")
        self.query_one("#titlebar", Static).update(Text(bar))
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
        summary = self.query_one("#summary", Static)
        summary.display = self.current in INPUT_VIEWS
        if self.current in INPUT_VIEWS:
            summary.update(Text(self.summary_text()))

    def summary_text(self) -> str:
        ev = self.session.evaluation
        if ev.result is None:
            text = problems_text(ev)
            lines = text.splitlines()
            return "\n".join(lines[:3]) + ("\n  ... see 7 Results" if len(lines) > 3 else "")
        from shopbeam.tui import drawing

        return drawing.summary_line(ev.result) + "   (7 results, 8 plots)"

    def changed(self) -> None:
        """The document changed: show it now, solve it in a worker (latest edit wins)."""
        self.refresh_all()
        self.solve_soon()

    def solve_soon(self) -> None:
        s = self.session
        if s.stale:
            self._solve(s, *s.snapshot())

    @work(thread=True, exclusive=True, group="solve", exit_on_error=False)
    def _solve(self, session: Session, version: int, data: dict, text: str, name: str) -> None:
        """Solve a snapshot of the job off the UI thread. Waits a moment first, so a burst
        of keys costs one solve; an answer for an older version of the job is dropped."""
        time.sleep(SOLVE_DEBOUNCE)
        if session.version != version or get_current_worker().is_cancelled:
            return
        from shopbeam.tui import session as session_mod

        ev = session_mod.evaluate_data(data, text, name)
        if session.version == version and not get_current_worker().is_cancelled:
            self.app.call_from_thread(self._solved, session, version, ev)

    def _solved(self, session: Session, version: int, ev) -> None:
        if session is self.session and session.install(version, ev):
            self.refresh_all()

    # ------------------------------------------------------------------ navigation
    async def action_view(self, vid: str) -> None:
        switcher = self.query_one(ContentSwitcher)
        if not switcher.query(f"#{vid}"):
            cls = next(v[4] for v in VIEWS if v[0] == vid)
            await switcher.mount(cls(id=vid))
        self.current = vid
        switcher.current = vid
        self.refresh_all()
        view = self.query_one(f"#{vid}")
        self.set_focus(view)  # now, so the next key of a burst already goes to the new view
        if self.focused is not view:
            self.call_after_refresh(self._focus_first, view)

    def _focus_first(self, view) -> None:
        """The view itself takes the focus, not its first field: a view key pressed next
        must switch views, never land in a field. Tab goes into the fields."""
        if self.focused is None or view not in self.focused.ancestors_with_self:
            self.set_focus(view)

    async def action_step(self, step: int) -> None:
        ids = [v[0] for v in VIEWS]
        await self.action_view(ids[(ids.index(self.current) + step) % len(ids)])

    def action_leave_field(self) -> None:
        self.set_focus(None)

    # ------------------------------------------------------------------ edits
    def on_input_submitted(self, event) -> None:
        """Enter in a field moves to the next one."""
        event.stop()
        self.focus_next()

    def on_field_edited(self, event: Field.Edited) -> None:
        event.stop()
        try:
            self.apply_edit(event.field.key, event.value, event.row)
        finally:
            event.field.taken(event.value)

    def apply_edit(self, key: str, value: str, row: int = 0) -> None:
        s = self.session
        raw = value.strip()
        if key == "title":
            s.set("title", value)
        elif key == "notes":
            s.set("notes", value or None)
        elif key == "tags":
            s.set("tags", [t.strip() for t in value.split(",") if t.strip()])
        elif key == "beam.length":
            s.set(key, raw or None)
            self.follow_the_end(getattr(self, "_last_length", None), raw)
        elif key == "criteria.deflection":
            s.set(key, raw or None)
        elif key in ("beam.members", "criteria.safety_factor"):
            s.set(key, _number_or_text(raw))
        elif key == "section.designation":
            s.set("beam.section", raw or None)
        elif key.startswith("dim.") or key.startswith("custom."):
            if isinstance(s.doc.get("beam.section"), dict):
                s.set("beam.section." + key.split(".", 1)[1], raw or None)
        elif key.startswith("mat."):
            if isinstance(s.doc.get("beam.material"), dict):
                s.set("beam.material." + key[4:], raw or None)
        elif key.startswith("support."):
            if row >= len(s.rows("supports")):
                return
            s.set_row("supports", row, key[8:], raw or None)
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
            elif field == "label":
                s.set_row("loads", i, "label", value or None)
            else:
                s.set_row("loads", i, field, raw or None)
        else:
            return
        self.changed()

    def follow_the_end(self, old: float | None, new_text: str) -> None:
        """Supports and load ends that sat at the old end of the beam move to the new end,
        so lengthening a span does not leave its end support behind as an overhang."""
        s = self.session
        if old is None:
            return
        try:
            new = units.parse(new_text, "length", positive=True)
        except Exception:  # noqa: BLE001 - not a length yet: nothing follows
            return
        if abs(new - old) <= 1e-9 * old:
            return

        def at_old_end(text) -> bool:
            try:
                return abs(units.parse(text, "length") - old) <= 1e-9 * old
            except Exception:  # noqa: BLE001
                return False

        moved = 0
        for table, keys in (("supports", ("at",)), ("loads", ("at", "end"))):
            for i, row in enumerate(s.rows(table)):
                for k in keys:
                    if k in row and isinstance(row[k], str) and at_old_end(row[k]):
                        (s.doc.set_support if table == "supports" else s.doc.set_load)(
                            i, **{k: new_text.strip()})
                        moved += 1
        if moved:
            s.touched()

    def on_choice_changed(self, event: Choice.Changed) -> None:
        event.stop()
        s, key, value = self.session, event.choice.key, event.value
        if key == "units":
            s.set("units", value)
        elif key == "beam.self_weight":
            s.set("beam.self_weight", value == "included")
        elif key == "support.type":
            i = self.query_one("#span", SpanView).selected
            s.set_row("supports", i, "type", value)
            row = s.rows("supports")[i]
            if value == "spring" and "stiffness" not in row:
                s.set_row("supports", i, "stiffness", "2000 lbf/in")
            elif value != "spring" and "stiffness" in row:
                s.set_row("supports", i, "stiffness", None)
        elif key == "load.type":
            self.change_load_type(self.query_one("#loads", LoadsView).selected, value)
        elif key == "load.case":
            i = self.query_one("#loads", LoadsView).selected
            s.set_row("loads", i, "case", "dead" if value == "dead" else None)
        elif key == "section.mode":
            self.change_section_mode(value)
        elif key == "section.shape":
            s.set("beam.section", {"shape": value, **SHAPE_DEFAULTS.get(value, {})})
        elif key == "material.mode":
            self.change_material_mode(value)
        else:
            return
        self.changed()

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
        if kind in ("point", "moment"):
            fields["at"] = row.get("at") or row.get("start") or self._length_text(0.5)
            fields.update(start=None, end=None)
            fields["value"] = ("-1 kN" if si else "-200 lbf") if kind == "point" else \
                ("0.5 kN*m" if si else "200 lbf*ft")
        else:
            fields["start"] = row.get("start") or "0 ft" if not si else row.get("start") or "0 m"
            fields["end"] = row.get("end") or self._length_text(1.0)
            fields["at"] = None
            line = "-1 kN/m" if si else "-50 lbf/ft"
            fields["value"] = line if kind == "uniform" else ["0 kN/m" if si else "0 lbf/ft", line]
        for k, v in fields.items():
            s.doc.set_load(i, **{k: v})
        s.touched()

    def change_section_mode(self, mode: str) -> None:
        s = self.session
        ev = s.evaluation
        cur = s.doc.get("beam.section")
        if isinstance(cur, str):
            self._last_designation = cur
        if mode == "catalog":
            s.set("beam.section", getattr(self, "_last_designation", None) or "HSS4x4x1/4")
        elif mode == "dimensions":
            s.set("beam.section", {"shape": "rect-tube", **SHAPE_DEFAULTS["rect-tube"]})
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

    def change_material_mode(self, mode: str) -> None:
        s = self.session
        ev = s.evaluation
        cur = s.doc.get("beam.material")
        if isinstance(cur, str):
            self._last_material = cur
        if mode == "built-in":
            s.set("beam.material", getattr(self, "_last_material", None) or "A36")
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
        s = self.session
        si = s.doc.get("units") == "si"
        zero = "0 m" if si else "0 ft"
        if event.table == "supports":
            n = len(s.rows("supports"))
            at = zero if n == 0 else self._length_text(1.0)
            fields = {"type": event.kind, "at": at}
            if event.kind == "spring":
                fields["stiffness"] = "10 kN/m" if si else "2000 lbf/in"
            if event.kind == "hinge":
                fields["at"] = self._length_text(0.5)
            i = s.add_row("supports", **fields)
            view = self.query_one("#span", SpanView)
        else:
            kind = event.kind
            if kind in ("point", "moment"):
                value = ("-1 kN" if si else "-200 lbf") if kind == "point" else \
                    ("0.5 kN*m" if si else "200 lbf*ft")
                fields = {"type": kind, "at": self._length_text(0.5), "value": value}
            else:
                line = "-1 kN/m" if si else "-50 lbf/ft"
                fields = {"type": kind, "start": zero, "end": self._length_text(1.0),
                          "value": line if kind == "uniform" else ["0 kN/m" if si else "0 lbf/ft", line]}
            i = s.add_row("loads", **fields)
            view = self.query_one("#loads", LoadsView)
        view.selected = i
        self.changed()
        self.call_after_refresh(self._focus_row_field, view)

    def _focus_row_field(self, view) -> None:
        for f in view.query(".row-form Field"):
            if f.display:
                f.input.focus()
                return

    def on_rows_view_row_remove(self, event: RowsView.RowRemove) -> None:
        event.stop()
        rows = self.session.rows(event.table)
        if not rows:
            return
        self.session.remove_row(event.table, event.index)
        view = self.query_one("#span" if event.table == "supports" else "#loads", RowsView)
        view.selected = max(0, event.index - 1)
        self.notify(f"removed {event.table[:-1]} {event.index + 1}")
        self.changed()

    def on_section_view_pick(self, event: SectionView.Pick) -> None:
        event.stop()
        self.session.set("beam.section", event.designation)
        self.changed()

    def on_sizing_view_pick(self, event: SizingView.Pick) -> None:
        event.stop()
        self.session.set("beam.section", event.designation)
        self.notify(f"Using {event.designation} in the job (see 4 Section, 7 Results).")
        self.changed()

    def on_material_view_pick(self, event: MaterialView.Pick) -> None:
        event.stop()
        self.session.set("beam.material", event.key)
        self.changed()

    # ------------------------------------------------------------------ saving
    def _writable_places(self) -> list[str]:
        from shopbeam.jobs import library

        places = [p.origin for p in library.places(self.session.library_dir) if p.writable]
        return ["user"] + [p for p in places if p != "user"]

    def action_save(self, then=None) -> None:
        s = self.session
        if s.path is None:
            self.action_save_as(then)
            return
        self._try_save(lambda overwrite: s.save(overwrite=overwrite), then)

    def action_save_as(self, then=None) -> None:
        s = self.session

        def got(answer) -> None:
            if not answer:
                return
            name, to = answer
            self._try_save(lambda overwrite: s.save_as(name, to, overwrite=overwrite), then)

        from shopbeam.jobs import storage

        name = s.name or storage.suggest_name(str(s.doc.get("title") or "job"))
        self.app.push_screen(SaveAsScreen(name, self._writable_places()), got)

    def _try_save(self, do, then=None) -> None:
        from shopbeam.jobs import storage
        from shopbeam.errors import InputError

        try:
            path = do(False)
        except storage.SaveConflict as exc:
            def answer(choice) -> None:
                if choice == "overwrite":
                    try:
                        p = do(True)
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
        n = len(s.evaluation.errors)
        extra = f" - the job still has {n} problem{'s' if n != 1 else ''}" if n else ""
        self.notify(f"Saved {s.label}{extra}", severity="warning" if n else "information")
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

        self.app.push_screen(ConfirmScreen(f"'{self.session.doc.get('title') or 'This job'}'",
                                           doing), answer)

    def action_library(self, highlight=None) -> None:
        tags = self.session.evaluation.job.tags if self.session.evaluation.job else ()

        def chosen(answer) -> None:
            if not answer:
                return
            what, path = answer
            if what == "open":
                self.guard("open another job", lambda: self.open_path(path))
            elif what == "new":
                self.guard("start a new job", self.new_job)

        self.app.push_screen(LibraryScreen(self.session.library_dir, tags,
                                           highlight=highlight or self.session.path), chosen)

    def open_path(self, path) -> None:
        from shopbeam.errors import InputError

        try:
            session = Session.open(path, library_dir=self.session.library_dir)
        except InputError as exc:
            self.notify(f"cannot open: {exc}", severity="error", timeout=10)
            return
        self.set_session(session)
        self.notify(f"Opened {session.label}")

    def new_job(self) -> None:
        self.set_session(Session.new(library_dir=self.session.library_dir))
        self.call_later(self.action_view, "job")

    def set_session(self, session: Session) -> None:
        session.deferred = True
        self.session = session
        self.set_focus(None)
        for f in self.query(Field):
            f.forget_typing()
        self._last_length = None
        for v in self.query(RowsView):
            v.selected = 0
        for v in self.query(SizingView):
            v._kind_set = False
        self.refresh_all()


class ShopbeamApp(App):
    """The application: one job screen, with the library shown first when asked."""

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

    def action_help(self) -> None:
        if not isinstance(self.screen, HelpScreen):
            self.push_screen(HelpScreen())

    async def action_quit(self) -> None:
        js = getattr(self, "job_screen", None)
        if js is None or not js.session.dirty:
            self.exit()
            return
        js.guard("quit", self.exit)


def _demo_path() -> Path | None:
    try:
        from shopbeam.jobs import library

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
    if job_path is not None:
        session = Session.open(job_path, library_dir=library)
        return ShopbeamApp(session, **kw)
    demo = _demo_path()
    session = Session.open(demo, library_dir=library) if demo else Session.new(library_dir=library)
    return ShopbeamApp(session, show_library=True, **kw)
