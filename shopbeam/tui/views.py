"""The views of the job screen: the six input steps and the result views.

Each view shows the session it is given (`show(session)`) and posts messages about edits;
the job screen applies them to the document, re-solves, and calls `show` again. Input views
write exactly what was typed into the document, so a half-typed entry is kept and its
problem is shown beside the field in words, never lost and never a crash.
"""

from __future__ import annotations

import re
from dataclasses import replace

from rich.text import Text
from textual.app import ComposeResult
from textual.binding import Binding
from textual.containers import Horizontal, Vertical, VerticalScroll
from textual.message import Message
from textual.widgets import Button, OptionList, Static
from textual.widgets.option_list import Option

from shopbeam import units
from shopbeam.cautions import cautions_for
from shopbeam.engine.model import LOAD_KINDS, SUPPORT_KINDS
from shopbeam.jobs.rules import LIFTING_PROFILES
from shopbeam.members.wood import DURATIONS, TEMPERATURES
from shopbeam.tui.widgets import (CHECKING_WORDS, Choice, Field,  # noqa: F401 (re-exported)
                                  KeepFocusOnStaleHide, fit_text, one_line)

# The design modules, the catalog, the materials and the drawings (numpy) are imported where
# a view first needs them: the first screen (the job view) is drawn without them, and the
# solve worker has usually imported them by the time a result view is shown.


def _text(s: str) -> Text:
    return Text(s)


_ROW_KEY = re.compile(r"\b(supports|loads)\[(\d+)\]")


# what a message tells a file's reader to write, said as the control that writes it here
_UI_WAYS = (
    ("add uplift = true to the load", "set Uplift to yes in the load's form (3 Loads)"),
    ("mark a load that really pushes up uplift = true",
     "set Uplift to yes for a load that really pushes up (3 Loads)"),
    ('write basis = "first-yield" under [criteria]', "pick Basis: first-yield (6 Criteria)"),
    ("write its value negative and remove uplift = true",
     "type its Value negative and set Uplift to no"),
    ("remove it, or check the sign", "set Uplift to no, or check the sign"),
    ("Write it positive with uplift = true", "Type its Value positive and set Uplift to yes"),
    ("an uplift is written positive with uplift = true",
     "an uplift is typed positive, with Uplift yes"),
    ("pushes UP (uplift = true)", "pushes UP (Uplift yes)"),
    ("uplift = true says this load", "Uplift yes says this load"),
    ("or remove uplift = true if it is a weight", "or set Uplift to no if it is a weight"),
    ("is marked uplift = true but pushes down", "is marked Uplift yes but pushes down"),
    ('Add tags = ["lifting"]', 'Add lifting to the Tags (1 Job)'),
    ('Add tags = ["rack"]', 'Add rack to the Tags (1 Job)'),
)


def rows_in_words(text: str) -> str:
    """'supports[1].at' -> 'support 2 at': rows counted from 1 as the lists show them (the
    text only gets shorter, so a page already wrapped stays within its width)."""
    text = _ROW_KEY.sub(lambda m: f"{m.group(1)[:-1]} {int(m.group(2)) + 1}", text)
    return re.sub(r"\b(support|load) (\d+)\.(\w+)", r"\1 \2 \3", text)


def in_words(text: str) -> str:
    """A message shown beside a field or in the problem summary: `rows_in_words`, and a key
    the message says to write, where this UI has a control for it, named as the control
    (not on the printable pages, which match the command line's)."""
    for said, here in _UI_WAYS:
        text = text.replace(said, here)
    return rows_in_words(text)


class View(VerticalScroll):
    """Base of every view: a scrolling column that can show a session."""

    title = ""

    def wrap_width(self) -> int:
        """The columns a line of words beside the fields may use: the screen less the view's
        padding and scroll bar (the Static may not be laid out yet)."""
        return max(30, (self.app.size.width or 80) - 6)

    def fields(self) -> list[Field]:
        """The view's fields, found once: a view's widgets are fixed when it is composed,
        and a DOM query on every redraw costs more than the redraw (a key's answer)."""
        found = self.__dict__.get("_fields")
        if found is None:
            found = list(self.query(Field))
            if self.children:  # composed: keep the list
                self._fields = found
        return found

    def choices(self) -> list[Choice]:
        found = self.__dict__.get("_choices")
        if found is None:
            found = list(self.query(Choice))
            if self.children:
                self._choices = found
        return found

    def focusables(self) -> list:
        """Every widget in the view that can take the focus (text boxes, choices, lists)."""
        found = self.__dict__.get("_focusables")
        if found is None:
            found = [w for w in self.query("*") if w.can_focus]
            if self.children:
                self._focusables = found
        return found

    def show(self, session) -> None:  # pragma: no cover - overridden
        pass

    def show_field_messages(self, ev, fields: dict[str, str], session=None) -> None:
        """Put each field's problem (by job-file key) or how it was read beside it; a field
        typed in since the answer shown was worked out, while that answer is said to be
        late (`JobScreen.stale_marked`), says it is being checked instead."""
        session = session or getattr(self.screen, "session", None)
        behind = late(self)
        for f in self.fields():
            key = fields.get(f.key)
            if key is None:
                continue
            if behind and getattr(f, "edited_version", 0) > session.evaluated_version:
                f.show(CHECKING_WORDS)
                continue
            msg = in_words(ev.message_for(key, elements=True))
            if msg and not msg.startswith("warning: "):
                f.show(msg, error=True)
            elif msg:
                f.show(msg)
            else:
                f.show(self.reading(f, ev))

    def reading(self, field: Field, ev) -> str:
        return ""

    def system(self, ev) -> str:
        """The job's units for an echo: the job as read, or, while it has a problem that
        stops it reading, what its units key says (a metric job's echo stays metric)."""
        if ev is not None and ev.job is not None:
            return ev.job.units
        session = getattr(self.screen, "session", None)
        got = session.doc.get("units") if session is not None else None
        return got if got in ("us", "si") else "us"

    def show_choice_messages(self, ev, keys: dict[str, str]) -> None:
        """Under each choice (by its key): the reader's problem or warning on the job-file
        key it edits, else what the chosen word means (`choice_reading`)."""
        for c in self.choices():
            key = keys.get(c.key)
            if key is None:
                continue
            msg = in_words(ev.message_for(key))
            if msg and not msg.startswith("warning: "):
                c.show(msg, error=True)
            else:
                c.show(msg or self.choice_reading(c, ev))

    def choice_reading(self, choice: Choice, ev) -> str:
        return ""


def _given(value) -> bool:
    return value is not None and value != ""


# Every dimensional field: how to read it back for the "as read" echo.
def echo(text: str, kind: str, system: str) -> str:
    parse_kind = "length" if kind == "small_length" else kind  # small_length: display only
    try:
        v = units.parse(text, parse_kind)
    except Exception:  # noqa: BLE001 - the document check reports the problem itself
        return ""
    return "= " + units.fmt(v, kind, system)


class JobView(View):
    title = "Job"

    def compose(self) -> ComposeResult:
        yield Static("Job: what it is and how it is shown.", classes="view-title")
        yield Field("Title", "title", placeholder="e.g. Lumber rack arm, bay 3", classes="-wide")
        yield Field("Notes", "notes", placeholder="free text: where, who, why (ctrl+j: new line)",
                    classes="-wide")
        yield Field("Tags", "tags", placeholder="comma separated, e.g. rack, shelf",
                    classes="-wide")
        yield Choice("Units", ["us", "si"], key="units")
        yield Static("Tag a hoist beam, monorail or jib \"lifting\" for the lifting "
                     "cautions.", classes="hint", markup=False)

    def show(self, session) -> None:
        doc = session.doc
        for f in self.fields():
            if f.key == "title":
                f.set_value(one_line(doc.get("title", "")))
            elif f.key == "notes":
                f.set_value(one_line(doc.get("notes", "")))
            elif f.key == "tags":
                tags = doc.get("tags", [])
                f.set_value(", ".join(tags) if isinstance(tags, list) else str(tags))
        self.query_one(Choice).set(doc.get("units", "us"))
        self.show_field_messages(session.evaluation,
                                 {"title": "title", "notes": "notes", "tags": "tags"})


class RowList(KeepFocusOnStaleHide, OptionList):
    """The supports or loads of the job, one line each; the highlighted one is edited below."""

    # not in the key bar (ctrl+t / ctrl+x are, and F1 lists it): at 80 columns the bar
    # must keep room for save and quit. No letter acts here: a letter typed on the list
    # is text meant for a field, and the app says it was not used.
    BINDINGS = [
        Binding("delete", "remove", "remove", show=False),
    ]

    class Add(Message):
        pass

    class Remove(Message):
        pass

    def watch_highlighted(self, highlighted: int | None) -> None:
        """The form below shows the picked row at once, not when the message arrives: a
        Tab typed right behind a Down must land in that row's fields (keys keep their
        order at any speed)."""
        super().watch_highlighted(highlighted)
        view = next((a for a in self.ancestors if isinstance(a, RowsView)), None)
        if view is not None and highlighted is not None:
            view.row_picked(highlighted)

    def action_add(self) -> None:
        view = next((a for a in self.ancestors if isinstance(a, RowsView)), None)
        if view is not None:
            view._add(view.new_kind)  # now: the keys behind it go to the new row
        else:
            self.post_message(self.Add())

    def action_remove(self) -> None:
        view = next((a for a in self.ancestors if isinstance(a, RowsView)), None)
        if view is not None:
            view._remove()
        else:
            self.post_message(self.Remove())


class RowButton(Button, can_focus=False):
    """An add/remove button: clicked, or its key (ctrl+t, ctrl+x); never a Tab stop."""


class RowsView(View):
    """Shared by supports and loads: a list, add/remove buttons, and a form for one row.
    ctrl+t adds and ctrl+x removes from anywhere in the view, a field included."""

    BINDINGS = [
        Binding("ctrl+t", "add_row", "add", priority=True),
        Binding("ctrl+x", "remove_row", "remove", priority=True),
    ]

    def action_add_row(self) -> None:
        self._add(self.new_kind)

    def action_remove_row(self) -> None:
        self._remove()

    def _add(self, kind: str) -> None:
        """Added now, as the key is handled (not when a message arrives): the keys typed
        right behind it go into the new row's fields, as they would typed slowly."""
        add = getattr(self.screen, "add_row", None)
        if add is not None:
            add(self.table, kind)
        else:
            self.post_message(self.RowAdd(self.table, kind))

    def _remove(self) -> None:
        remove = getattr(self.screen, "remove_row", None)
        if remove is not None:
            remove(self.table, self.selected)
        else:
            self.post_message(self.RowRemove(self.table, self.selected))

    table = ""  # "supports" | "loads"
    new_kind = ""  # the type a plain "add" (a key on the list) makes
    selected = 0

    def on_button_pressed(self, event: Button.Pressed) -> None:
        bid = event.button.id or ""
        event.stop()
        if bid.startswith("add-"):
            self.post_message(self.RowAdd(self.table, bid[4:]))
        elif bid == "remove-row":
            self.post_message(self.RowRemove(self.table, self.selected))

    def on_row_list_add(self, event: RowList.Add) -> None:
        event.stop()
        self._add(self.new_kind)

    def selected_row(self, session) -> tuple[int, dict | None]:
        """The picked row of this view's table and its index (None when there are none)."""
        rows = session.rows(self.table)
        if getattr(self, "_row_for_edits", None) != self.selected:
            # another row in the same fields: the typing they remember was the other row's
            self._row_for_edits = self.selected
            for f in self.fields():
                f.edited_version = 0
        return (self.selected, rows[self.selected]) if rows else (self.selected, None)

    class RowAdd(Message):
        def __init__(self, table: str, kind: str) -> None:
            super().__init__()
            self.table = table
            self.kind = kind

    class RowRemove(Message):
        def __init__(self, table: str, index: int) -> None:
            super().__init__()
            self.table = table
            self.index = index

    def row_text(self, i: int, row: dict, session) -> str:
        return str(row)

    def fill_rows(self, session) -> None:
        rows = session.rows(self.table)
        lst = self.query_one(RowList)
        ev = session.evaluation
        texts = []
        for i, row in enumerate(rows):
            bad = [p for p in ev.messages_under(f"{self.table}[{i}]") if not p.warning]
            mark = "  <- problem" if bad else ""
            texts.append(f"{i + 1}. {self.row_text(i, row, session)}{mark}")
        hl = lst.highlighted
        if texts != getattr(self, "_row_texts", None):  # the list again only if it changed
            self._row_texts = texts
            lst.clear_options()
            lst.add_options([Option(_text(t)) for t in texts])
        if rows:
            self.selected = min(self.selected, len(rows) - 1)
            # while a row is being picked (its old row's typing flushed first), the list
            # keeps the row picked: the form follows it right after
            want = self._picking if self._picking is not None else self.selected
            if lst.highlighted != min(want, len(rows) - 1):
                lst.highlighted = min(want, len(rows) - 1)
        self.query_one(".row-form").display = bool(rows)

    _picking = None  # the row being picked while the old row's typing is written

    def row_picked(self, index: int) -> None:
        if index != self.selected and self.is_mounted and self._picking is None:
            flush = getattr(self.screen, "flush_typing", None)
            if flush is not None:
                self._picking = index
                try:
                    flush()  # what was typed or chosen for the old row goes into it first
                finally:
                    self._picking = None
            rows = self.app_session().rows(self.table)
            if not 0 <= index < len(rows):
                return
            self.selected = index
            lst = self.query_one(RowList)
            if lst.highlighted != index:  # a redraw during the flush showed the old row
                lst.highlighted = index
            self.show_form(self.app_session())
            self.screen._refresh_layout()  # Tab order: the fields this row shows, now

    def on_option_list_option_highlighted(self, event: OptionList.OptionHighlighted) -> None:
        if isinstance(event.option_list, RowList):
            event.stop()
            # the row highlighted now (the list picked it at once, see watch_highlighted):
            # a message queued for a highlight since moved on must not pick an older row
            now = event.option_list.highlighted
            if now is not None:
                self.row_picked(now)

    def on_row_list_remove(self, event: RowList.Remove) -> None:
        event.stop()
        self._remove()

    def app_session(self):
        return self.screen.session

    def show(self, session) -> None:
        self.fill_rows(session)
        self.show_form(session)

    def show_form(self, session) -> None:
        pass


def load_sign(row: dict) -> int | None:
    """+1 (up or counterclockwise), -1 (down or clockwise), 0, or None (not readable yet);
    a linear load whose ends differ in sign is 0 only when both are zero."""
    kind = row.get("type")
    v = row.get("value")
    texts = v if isinstance(v, list) else [v]
    kinds = ("moment",) if kind == "moment" else ("force", "line_load", "area_load")
    signs = []
    for t in texts:
        if not isinstance(t, (str, int, float)) or str(t).strip() == "":
            return None
        # a plain quantity ("-50 lbf/ft") is read without the full parser (pint), which is
        # only asked about anything else: this runs on the UI thread for every redraw
        x = next((v for v in (units.plain_value(str(t), k) for k in kinds) if v is not None),
                 None)
        for k in kinds if x is None else ():
            try:
                x = units.parse(str(t), k)
                break
            except Exception:  # noqa: BLE001 - not this kind (or not readable at all)
                continue
        if x is None:
            return None
        signs.append((x > 0) - (x < 0))
    if any(s > 0 for s in signs) and any(s < 0 for s in signs):
        return 2  # both ways along a linear load
    return max(signs, key=abs) if signs else None


def direction_words(row: dict) -> str:
    """The way a load acts, in words and an arrow: "down ↓", "UP ↑", "cw ↻", "ccw ↺"."""
    sign = load_sign(row)
    if sign is None:
        return ""
    if row.get("type") == "moment":
        return {1: "ccw ↺", -1: "cw ↻", 0: "zero"}.get(sign, "")
    return {1: "UP ↑", -1: "down ↓", 0: "zero", 2: "down ↓ and UP ↑"}[sign]


def load_warnings(session) -> list[str]:
    """Direction warnings for the loads as they stand: every force load points up, or a load
    points the other way from when the job was opened or saved."""
    rows = session.rows("loads")
    out = []
    forces = [(i, r, load_sign(r)) for i, r in enumerate(rows) if r.get("type") != "moment"]
    if forces and all(sg is not None and sg > 0 and sg != 2 for _i, _r, sg in forces) \
            and not all(r.get("uplift") is True for _i, r, _s in forces):
        out.append("WARNING: every load points UP (forces are + up: a weight is negative, "
                   "e.g. -300 lbf)")
    base = getattr(session, "baseline_loads", [])
    for i, r in enumerate(rows):
        if i < len(base) and base[i].get("type") == r.get("type"):
            was, now = load_sign(base[i]), load_sign(r)
            if was in (-1, 1) and now in (-1, 1) and was != now:
                lab = f" ({r['label']})" if r.get("label") else ""
                out.append(f"WARNING: load {i + 1}{lab} changed direction: was "
                           f"{direction_words(base[i])}, now {direction_words(r)}")
    return out


def _load_words(row: dict) -> str:
    kind = row.get("type", "?")
    lab = f" ({row['label']})" if row.get("label") else ""
    case = " [dead]" if row.get("case") == "dead" else ""
    way = direction_words(row)
    way = f" {way}" if way else ""
    if kind in ("point", "moment"):
        return (f"{'couple' if kind == 'moment' else 'point'} {row.get('value', '?')}{way} "
                f"at {row.get('at', '?')}{lab}{case}")
    v = row.get("value", row.get("total") and f"total {row['total']}" or "?")
    if isinstance(v, list):
        v = " to ".join(str(x) for x in v)
    if row.get("width"):
        v = f"{v} x {row['width']} wide"
    return f"{kind} {v}{way} from {row.get('start', 'start')} to {row.get('end', 'end')}{lab}{case}"


class SpanView(RowsView):
    title = "Span"
    table = "supports"
    new_kind = "pin"

    def compose(self) -> ComposeResult:
        yield Static("Span and supports: x runs from the left end (0) to the length.",
                     classes="view-title")
        yield Field("Length", "beam.length", placeholder="e.g. 12 ft or 10' 6\"")
        yield Choice("Self-weight", ["included", "left out"], key="beam.self_weight")
        yield Field("Members", "beam.members", placeholder="1 (members sharing)")
        yield Choice("Braced", ["at supports", "all along"], key="beam.braced")
        yield Field("Braces at", "beam.braces", placeholder="e.g. 4 ft, 8 ft")
        yield Field("Bearing", "beam.bearing", placeholder="e.g. 4 in, all seats")
        yield Static("Supports (ctrl+t add, ctrl+x remove, up/down pick):",
                     classes="sub-title")
        yield RowList(id="support-list", classes="rows")
        with Horizontal(classes="buttons"):
            yield RowButton("+ pin", id="add-pin", compact=True)
            yield RowButton("+ roller", id="add-roller", compact=True)
            yield RowButton("+ fixed", id="add-fixed", compact=True)
            yield RowButton("+ spring", id="add-spring", compact=True)
            yield RowButton("+ hinge", id="add-hinge", compact=True)
            yield RowButton("remove", id="remove-row", compact=True)
        with Vertical(classes="row-form"):
            yield Choice("Type", list(SUPPORT_KINDS), key="support.type")
            yield Field("At", "support.at", placeholder="e.g. 0 ft")
            yield Field("Stiffness", "support.stiffness", placeholder="e.g. 2000 lbf/in")
            yield Choice("Brace", ["default", "yes", "no"], key="support.brace")
            yield Field("Bearing", "support.bearing", placeholder="e.g. 4 in (this one)")

    def row_text(self, i, row, session) -> str:
        k = f", k = {row['stiffness']}" if row.get("type") == "spring" and "stiffness" in row else ""
        return f"{row.get('type', '?')} at {row.get('at', '?')}{k}"


    # the form's examples in the job's units (a US example typed on a metric job is held as
    # a length in the other system)
    EXAMPLES = {"us": {"beam.length": "e.g. 12 ft or 10' 6\"", "beam.braces": "e.g. 4 ft, 8 ft",
                       "beam.bearing": "e.g. 4 in, all seats", "support.at": "e.g. 0 ft",
                       "support.stiffness": "e.g. 2000 lbf/in",
                       "support.bearing": "e.g. 4 in (this one)"},
                "si": {"beam.length": "e.g. 3.6 m or 3600 mm", "beam.braces": "e.g. 1.2 m, 2.4 m",
                       "beam.bearing": "e.g. 100 mm, all seats", "support.at": "e.g. 0 m",
                       "support.stiffness": "e.g. 350 kN/m",
                       "support.bearing": "e.g. 100 mm (this one)"}}

    def show(self, session) -> None:
        doc = session.doc
        examples = self.EXAMPLES["si" if doc.get("units") == "si" else "us"]
        for f in self.fields():
            if f.key in examples and f.input.placeholder != examples[f.key]:
                f.input.placeholder = examples[f.key]
        for f in self.fields():
            if f.key == "beam.length":
                f.set_value(doc.get("beam.length", ""))
            elif f.key == "beam.members":
                f.set_value(str(doc.get("beam.members", 1)))
            elif f.key == "beam.braces":
                b = doc.get("beam.braces", [])
                f.set_value(", ".join(str(x) for x in b) if isinstance(b, list) else str(b))
                f.display = doc.get("beam.braced", False) is not True
            elif f.key == "beam.bearing":
                f.set_value(str(doc.get("beam.bearing", "")))
        sw = doc.get("beam.self_weight", True)
        for c in self.choices():
            if c.key == "beam.self_weight":
                c.set("left out" if sw is False else "included")
            elif c.key == "beam.braced":
                c.set("all along" if doc.get("beam.braced", False) is True else "at supports")
        super().show(session)
        self.show_field_messages(session.evaluation,
                                 {"beam.length": "beam.length", "beam.members": "beam.members",
                                  "beam.braces": "beam.braces", "beam.bearing": "beam.bearing"})
        self.show_choice_messages(session.evaluation, {"beam.braced": "beam.braced"})

    def show_form(self, session) -> None:
        i, row = self.selected_row(session)
        if row is None:
            return
        kind = row.get("type", self.new_kind)
        brace = row.get("brace")
        for c in self.choices():
            if c.key == "support.type":
                c.set(kind)
            elif c.key == "support.brace":
                c.set({True: "yes", False: "no"}.get(brace, "default")
                      if brace is None or isinstance(brace, bool) else "default")
                c.display = kind != "hinge" or "brace" in row
        for f in self.fields():
            if f.key == "support.at":
                f.show_row(i, row.get("at", ""))
            elif f.key == "support.stiffness":
                f.show_row(i, row.get("stiffness", ""))
                f.display = kind == "spring"
            elif f.key == "support.bearing":
                f.show_row(i, row.get("bearing", ""))
                f.display = kind != "hinge" or "bearing" in row
        ev = session.evaluation
        self.show_field_messages(ev, {
            "support.at": f"supports[{i}].at", "support.stiffness": f"supports[{i}].stiffness",
            "support.bearing": f"supports[{i}].bearing"})
        self._row_kind = kind
        self.show_choice_messages(ev, {"support.brace": f"supports[{i}].brace"})
        tmsg = session.evaluation.message_for(f"supports[{i}].type")
        if tmsg:
            self.app.notify(tmsg, severity="error")

    def reading(self, field, ev) -> str:
        system = self.system(ev)
        kinds = {"beam.length": "length", "support.at": "length", "support.stiffness": "stiffness"}
        k = kinds.get(field.key)
        if k and field.value:
            return echo(field.value, k, system)
        if field.key == "beam.braces":
            return ("braced at these points and the supports" if field.value.strip() else
                    "none: buckling over each whole span")
        if field.key == "beam.members" and ev.job is not None and ev.job.members > 1:
            return f"each member carries 1/{ev.job.members} of the loads"
        if field.key in ("beam.bearing", "support.bearing"):
            if field.value.strip():
                return echo(field.value, "small_length", system) + " for the local checks"
            return ("none: knife edge (local checks)"
                    if field.key == "beam.bearing" else "none: the beam's bearing applies")
        return ""

    def choice_reading(self, choice, ev) -> str:
        if choice.key == "support.brace" and choice.value == "default":
            kind = getattr(self, "_row_kind", "")
            return ("default: a spring does not brace it" if kind == "spring" else
                    "default: braces it (stops twist and sway)")
        if choice.key == "support.brace":
            return ("braces it (stops twist and sway)" if choice.value == "yes"
                    else "does not brace it")
        return ""


_LOAD_EXAMPLES = {  # the load form's placeholders in the job's units (short: a field is
    # about 18 columns wide at 80); the Value one follows the load type (a couple is not a
    # force)
    "us": {"point": "e.g. -300 lbf", "moment": "150 lbf*ft (+ ccw)",
           "uniform": "e.g. -60 lbf/ft", "linear": "e.g. 0 lbf/ft", "end": "e.g. -60 lbf/ft",
           "load.at": "e.g. 4 ft", "load.start": "e.g. 0 ft", "load.end": "e.g. 12 ft",
           "load.width": "psf width, e.g. 16 in", "load.total": "e.g. -700 lbf in all",
           "load.bearing": "e.g. 6 in", "title": "(-300 lbf)"},
    "si": {"point": "e.g. -1.5 kN", "moment": "0.2 kN*m (+ ccw)",
           "uniform": "e.g. -0.9 kN/m", "linear": "e.g. 0 kN/m", "end": "e.g. -0.9 kN/m",
           "load.at": "e.g. 1.2 m", "load.start": "e.g. 0 m", "load.end": "e.g. 3.6 m",
           "load.width": "kPa width, e.g. 400 mm", "load.total": "e.g. -3 kN in all",
           "load.bearing": "e.g. 150 mm", "title": "(-1.5 kN)"},
}


def _examples(session) -> dict:
    return _LOAD_EXAMPLES["si" if session.doc.get("units") == "si" else "us"]


def _value_example(kind: str, session) -> str:
    """What the Value field suggests for a load of `kind` (a couple is not a force)."""
    examples = _examples(session)
    return examples.get(kind, examples["point"])


class LoadsView(RowsView):
    title = "Loads"
    table = "loads"
    new_kind = "point"

    def compose(self) -> ComposeResult:
        yield Static("Loads: forces + up, so gravity loads are negative (-300 lbf).",
                     classes="view-title", id="loads-title")
        yield Static("ctrl+t add, ctrl+x remove, up/down pick:", classes="sub-title")
        yield Static("", id="load-warnings", markup=False, classes="warning")
        yield RowList(id="load-list", classes="rows")
        with Horizontal(classes="buttons"):
            yield RowButton("+ point", id="add-point", compact=True)
            yield RowButton("+ uniform", id="add-uniform", compact=True)
            yield RowButton("+ linear", id="add-linear", compact=True)
            yield RowButton("+ couple", id="add-moment", compact=True)
            yield RowButton("remove", id="remove-row", compact=True)
        with Vertical(classes="row-form"):
            yield Choice("Type", list(LOAD_KINDS), key="load.type")
            yield Field("At", "load.at", placeholder="e.g. 4 ft")
            yield Field("Start", "load.start", placeholder="e.g. 0 ft")
            yield Field("End", "load.end", placeholder="e.g. 12 ft")
            yield Field("Value", "load.value", placeholder="e.g. -300 lbf")
            yield Field("End value", "load.value2", placeholder="e.g. -60 lbf/ft")
            yield Field("Width", "load.width", placeholder="psf width, e.g. 16 in")
            yield Field("Total", "load.total", placeholder="e.g. -700 lbf in all")
            yield Field("Label", "load.label", placeholder="what it is")
            yield Choice("Case", ["live", "dead"], key="load.case")
            yield Choice("Patterned", ["no", "yes"], key="load.patterned")
            yield Field("Bearing", "load.bearing", placeholder="e.g. 6 in")
            yield Choice("Flange", ["top", "bottom"], key="load.flange")
            yield Choice("Wheels", list(WHEEL_WORDS), key="load.wheels")
            # (last: the fields above keep their Tab order)
            yield Choice("Uplift", ["no", "yes"], key="load.uplift")
            yield Static("Patterned: each span is checked loaded and empty in turn (parts "
                         "taken off one bay at a time).", classes="hint", markup=False)

    def row_text(self, i, row, session) -> str:
        return _load_words(row)

    def show(self, session) -> None:
        title = ("Loads: forces + up, so gravity loads are negative "
                 f"{_examples(session)['title']}.")
        if title != getattr(self, "_title_shown", None):
            self._title_shown = title
            self.query_one("#loads-title", Static).update(title)
        warn = self.query_one("#load-warnings", Static)
        lines = load_warnings(session)
        moving = session.doc.get("moving")
        for mv in moving if isinstance(moving, list) else ():
            if isinstance(mv, dict):  # a wheel set is read and checked, not edited here
                wheels = mv.get("loads") if isinstance(mv.get("loads"), list) else []
                lines.append(f"Also a moving wheel set ([[moving]] {mv.get('label') or ''}: "
                             f"{len(wheels)} wheel loads {', '.join(map(str, wheels[:4]))}"
                             f"{' ...' if len(wheels) > 4 else ''}, travel "
                             f"{' to '.join(map(str, mv.get('travel') or []))}), checked at "
                             "every place it travels: edit it in the job file.")
        if not session.rows("loads"):
            lines.append("No fixed loads yet: ctrl+t adds one (then pick its type), or use + "
                         "below." if moving else
                         "No loads yet: ctrl+t adds one (then pick its type), or use + below.")
        warn.update(_text("\n".join(lines)))
        warn.display = bool(lines)
        super().show(session)

    def show_form(self, session) -> None:
        i, row = self.selected_row(session)
        if row is None:
            return
        kind = row.get("type", self.new_kind)
        for c in self.choices():
            if c.key == "load.type":
                c.set(kind)
            elif c.key == "load.case":
                c.set(row.get("case", "live"))
            elif c.key == "load.patterned":
                c.set("yes" if row.get("patterned") is True else "no")
                c.display = kind in ("uniform", "linear", "point")
            elif c.key == "load.uplift":  # a force load that really pushes up says so
                c.set("yes" if row.get("uplift") is True else "no")
                c.display = kind in ("uniform", "linear", "point")
            elif c.key == "load.flange":
                # no flange written: what the checks take (a lifting job's I-beam hangs its
                # point loads from the bottom flange)
                # (while the job does not read, a problem anywhere in it, the last answer's
                # word stands: the form does not flip to top under a typo elsewhere)
                job = session.evaluation.job
                if job is not None:
                    sec = job.section
                    # (the reader's rule: a lifting job's strong-axis I-beam hangs them)
                    self._hangs_by_default = bool(
                        job.lifting and sec is not None and sec.shape == "i-beam"
                        and sec.axis == "strong")
                    hung = f"loads[{i}]" in getattr(job, "hung_default", ())
                else:  # a new row, a typo anywhere: the last answer's rule for this job
                    hung = getattr(self, "_hangs_by_default", False)
                bottom = row.get("flange") == "bottom" or ("flange" not in row and hung)
                c.set("bottom" if bottom else "top")
                c.display = kind == "point" or "flange" in row
                wheels = next(w for w in self.choices() if w.key == "load.wheels")
                n = row.get("wheels", 2)
                wheels.set(next((w for w, v in WHEEL_WORDS.items() if v == n), "two"))
                wheels.display = (kind == "point" and bottom) or "wheels" in row
        v = row.get("value", "")
        v1, v2 = (v + ["", ""])[:2] if isinstance(v, list) else (v, "")
        values = {"load.at": row.get("at", ""), "load.start": row.get("start", ""),
                  "load.end": row.get("end", ""), "load.value": v1, "load.value2": v2,
                  "load.width": row.get("width", ""), "load.total": row.get("total", ""),
                  "load.label": one_line(row.get("label", "")),
                  "load.bearing": row.get("bearing", "")}
        shown = {"load.at": kind in ("point", "moment"),
                 "load.bearing": kind == "point" or "bearing" in row,
                 "load.start": kind in ("uniform", "linear"),
                 "load.end": kind in ("uniform", "linear"), "load.value2": kind == "linear",
                 "load.width": kind in ("uniform", "linear"), "load.total": kind == "uniform"}
        for f in self.fields():
            if f.key in values:
                f.show_row(i, values[f.key])
                f.display = shown.get(f.key, True)
                if f.key == "load.value":
                    f.query_one(".field-label").update(
                        "Start value" if kind == "linear" else "Value")
                    f.input.placeholder = _value_example(kind, session)
                elif f.key == "load.value2":
                    f.input.placeholder = _value_example("end", session)
                elif f.key in _LOAD_EXAMPLES["us"]:
                    f.input.placeholder = _examples(session)[f.key]
        self.show_field_messages(session.evaluation, {
            "load.at": f"loads[{i}].at", "load.start": f"loads[{i}].start",
            "load.end": f"loads[{i}].end",
            "load.value": f"loads[{i}].value" + ("[0]" if kind == "linear" else ""),
            "load.value2": f"loads[{i}].value[1]", "load.width": f"loads[{i}].width",
            "load.total": f"loads[{i}].total", "load.label": f"loads[{i}].label",
            "load.bearing": f"loads[{i}].bearing"})
        self.show_choice_messages(session.evaluation, {
            "load.flange": f"loads[{i}].flange", "load.patterned": f"loads[{i}].patterned",
            "load.uplift": f"loads[{i}].uplift",
            "load.case": f"loads[{i}].case", "load.wheels": f"loads[{i}].wheels"})
        # a problem with the whole value list of a linear load goes beside the first value
        if kind == "linear":
            msg = session.evaluation.message_for(f"loads[{i}].value")
            if msg:
                for f in self.fields():
                    if f.key == "load.value":
                        f.show(msg, error=True)

    def reading(self, field, ev) -> str:
        system = self.system(ev)
        rows = self.app_session().rows("loads")
        kind = rows[self.selected].get("type") if rows else "point"
        value_kind = {"point": "force", "moment": "moment"}.get(kind, "line_load")
        kinds = {"load.at": "length", "load.start": "length", "load.end": "length",
                 "load.value": value_kind, "load.value2": "line_load", "load.width": "small_length",
                 "load.total": "force", "load.bearing": "small_length"}
        k = kinds.get(field.key)
        if k and field.value:
            got = echo(field.value, k, system)
            if not got and k == "line_load":  # a load per area (psf, kPa) with a width
                got = echo(field.value, "area_load", system)
            if field.key in ("load.value", "load.value2") and got:
                way = direction_words({"type": kind, "value": field.value})
                got += f"  {way}" if way else ""
            if field.key == "load.bearing" and got:
                got += " along the flange (local checks)"
            return got
        if field.key == "load.bearing":
            return "none: the beam's bearing applies"
        return ""

    def choice_reading(self, choice, ev) -> str:
        if choice.key == "load.wheels":
            return {"two": "a beam clamp or two-wheel trolley: P = load / 2 (lifting jobs)",
                    "four": "a four-wheel trolley: P = load / 4 (lifting jobs)",
                    "eight": "an eight-wheel trolley: P = load / 8 (lifting jobs)"}.get(
                        choice.value, "")
        if choice.key == "load.flange":
            return ("hangs from the bottom flange: flange bending (J10.1)"
                    if choice.value == "bottom" else
                    "bears on the top flange: web checks (J10.2, J10.3)")
        return ""


# the Wheels choice of a hung point load: its words and the `wheels` value each writes
WHEEL_WORDS = {"two": 2, "four": 4, "eight": 8}


class SectionView(View):
    title = "Section"

    class Pick(Message):
        def __init__(self, designation: str) -> None:
            super().__init__()
            self.designation = designation

    MODES = ["catalog", "dimensions", "custom"]
    DIM_ORDER = ["depth", "width", "size", "od", "diameter", "wall", "thickness",
                 "flange_width", "flange_thickness", "web_thickness", "stem_thickness",
                 "corner_radius", "fillet_radius"]
    CUSTOM = [("area", "Area", "area", "e.g. 3.37 in^2"),
              ("ix", "I (bending)", "inertia", "e.g. 7.80 in^4"),
              ("sx", "S (modulus)", "modulus", "e.g. 3.90 in^3"),
              ("depth", "Depth", "small_length", "or S from I and depth"),
              ("shear_area", "Shear area", "area", "optional")]

    def compose(self) -> ComposeResult:
        yield Static("Section: by catalog designation, by dimensions, or custom properties.",
                     classes="view-title")
        yield Choice("Give it by", self.MODES, key="section.mode")
        with Vertical(id="sec-catalog"):
            yield Field("Designation", "section.designation",
                        placeholder="e.g. W8x18, HSS4x4x1/4")
            yield Static("", id="sec-matches-note", markup=False)
            yield OptionList(id="sec-matches")
        with Vertical(id="sec-dims"):
            yield Choice("Shape", self.shapes(), key="section.shape")
            keys = {k for ks in self._dim_keys().values() for k in ks}
            for k in sorted(keys, key=lambda k: (self.DIM_ORDER.index(k)
                                                 if k in self.DIM_ORDER else 99, k)):
                yield Field(k.replace("_", " ").capitalize(), f"dim.{k}", placeholder="e.g. 4 in")
        with Vertical(id="sec-custom"):
            for k, label, _kind, ph in self.CUSTOM:
                yield Field(label, f"custom.{k}", placeholder=ph)
        yield Static("", id="sec-props", markup=False)

    @staticmethod
    def shapes() -> list[str]:
        """The built-in shapes (imported when the section view is first shown)."""
        from shopbeam.members.sections import DIMENSION_SHAPES  # noqa: PLC0415 - startup

        return list(DIMENSION_SHAPES)

    @staticmethod
    def _dim_keys() -> dict[str, tuple[str, ...]]:
        out = {}
        from shopbeam.members.sections import shape_keys  # noqa: PLC0415 - startup

        for shape in SectionView.shapes():
            req, optional = shape_keys(shape)  # the shapes' own key lists
            opt = tuple(k for k in optional if k in ("corner_radius", "fillet_radius"))
            out[shape] = req + opt
        return out

    def mode_of(self, session) -> str:
        sec = session.doc.get("beam.section")
        if isinstance(sec, dict):
            return "custom" if str(sec.get("shape", "")).lower() == "custom" else "dimensions"
        return "catalog"

    def show(self, session) -> None:
        doc, ev = session.doc, session.evaluation
        mode = self.mode_of(session)
        sec = doc.get("beam.section")
        for c in self.choices():
            if c.key == "section.mode":
                c.set(mode)
            elif c.key == "section.shape" and isinstance(sec, dict):
                c.set(str(sec.get("shape", "")).lower())
        self.query_one("#sec-catalog").display = mode == "catalog"
        self.query_one("#sec-dims").display = mode == "dimensions"
        self.query_one("#sec-custom").display = mode == "custom"
        dims = self._dim_keys()
        shape = str(sec.get("shape", "")).lower() if isinstance(sec, dict) else ""
        for f in self.fields():
            if f.key == "section.designation":
                f.set_value(sec if isinstance(sec, str) else "")
            elif f.key.startswith("dim."):
                k = f.key[4:]
                f.display = k in dims.get(shape, ())
                if isinstance(sec, dict):
                    f.set_value(str(sec.get(k, "")))
            elif f.key.startswith("custom.") and isinstance(sec, dict):
                f.set_value(str(sec.get(f.key[7:], "")))
        keys = {"section.designation": "beam.section"}
        for f in self.fields():
            if f.key.startswith("dim.") or f.key.startswith("custom."):
                keys[f.key] = "beam.section." + f.key.split(".", 1)[1]
        self.show_field_messages(ev, keys)
        if mode == "catalog":
            self.fill_matches(sec if isinstance(sec, str) else "")
        # the section as shopbeam reads it
        props = self.query_one("#sec-props", Static)
        job = ev.job
        if job is not None and job.section is not None:
            s, sy = job.section, job.units
            f = lambda v, k: units.fmt(v, k, sy)  # noqa: E731
            wt = ""
            if job.material is not None:
                wt = f"  weight {f(s.weight_per_length(job.material.density), 'mass_per_length')}"
            lines = [f"Read as: {s.designation} ({s.shape}, {s.axis} axis)",
                     f"  A {f(s.area, 'area')}  I {f(s.ix, 'inertia')}  "
                     f"S {f(min(s.sx_top, s.sx_bot), 'modulus')}",
                     f"  depth {f(s.depth, 'small_length')}  shear area "
                     f"{f(s.shear_area, 'area')}{wt}"]
            lines += [f"  note: {w}" for w in (getattr(s, "warnings", ()) or ())]
            props.update(_text(fit_text("\n".join(lines), self.wrap_width())))
        else:
            props.update(_text("Read as: (not readable yet - see the problem above)"))

    def fill_matches(self, text: str) -> None:
        lst = self.query_one("#sec-matches", OptionList)
        note = self.query_one("#sec-matches-note", Static)

        text = (text or "").strip()
        if len(text) < 1:
            note.update(_text("Type part of a designation to see matches."))
            lst.clear_options()
            lst.display = False
            return
        try:
            from shopbeam.members import catalog  # noqa: PLC0415 - startup

            found = catalog.list_sections(None, text)
        except Exception:  # noqa: BLE001 - a half-typed filter
            found = []
        if not found:
            # the kind prefix alone, e.g. "W8" matches "W8X..."
            note.update(_text(f"No catalog section matches {text!r}."))
            lst.clear_options()
            lst.display = False
            return
        shown = found[:60]
        more = f" (first {len(shown)} of {len(found)})" if len(found) > len(shown) else ""
        n = len(found)
        note.update(_text(f"{n} match{'es' if n != 1 else ''}{more}: down to pick, enter to use."))
        lst.display = True
        lst.clear_options()
        lst.add_options([Option(_text(
            f"{s.designation:<18} {units.fmt(s.ix, 'inertia', 'us'):>12} "
            f"{units.fmt(min(s.sx_top, s.sx_bot), 'modulus', 'us'):>11}"), id=s.designation)
            for s in shown])

    def on_option_list_option_selected(self, event: OptionList.OptionSelected) -> None:
        if event.option_list.id == "sec-matches":
            event.stop()
            self.post_message(self.Pick(event.option.id))

    def reading(self, field, ev) -> str:
        system = self.system(ev)
        if field.key.startswith("dim."):
            return echo(field.value, "small_length", system) if field.value else ""
        for k, _label, kind, _ph in self.CUSTOM:
            if field.key == f"custom.{k}" and field.value:
                return echo(field.value, kind, system)
        return ""


class MaterialView(View):
    title = "Material"

    class Pick(Message):
        def __init__(self, key: str) -> None:
            super().__init__()
            self.key = key

    CUSTOM = [("e", "E (modulus)", "stress", "e.g. 29000 ksi"),
              ("fy", "Fy (yield)", "stress", "e.g. 36 ksi"),
              ("density", "Density", "density", "e.g. 490 lb/ft^3")]

    def compose(self) -> ComposeResult:
        yield Static("Material: a built-in grade, or your own values.", classes="view-title")
        yield Choice("Give it by", ["built-in", "custom"], key="material.mode")
        with Vertical(id="mat-builtin"):
            yield OptionList(id="mat-list")
        with Vertical(id="mat-custom"):
            for k, label, _kind, ph in self.CUSTOM:
                yield Field(label, f"mat.{k}", placeholder=ph)
        yield Static("", id="mat-props", markup=False)

        with Vertical(id="mat-wood"):
            yield Static("Wood in service (NDS 2018):", classes="sub-title")
            yield Choice("Duration", list(DURATIONS), key="criteria.duration")
            yield Choice("Wet service", ["no", "yes"], key="beam.wet_service")
            yield Choice("Temperature", list(TEMPERATURES), key="beam.temperature")
            yield Choice("Repetitive", ["no", "yes"], key="beam.repetitive")

    def on_mount(self) -> None:
        from shopbeam.members.materials import list_materials  # noqa: PLC0415 - startup

        lst = self.query_one("#mat-list", OptionList)
        lst.add_options([Option(_text(f"{m.key:<13} {m.name}"), id=m.key)
                         for m in list_materials()])

    def show(self, session) -> None:
        doc, ev = session.doc, session.evaluation
        mat = doc.get("beam.material")
        mode = "custom" if isinstance(mat, dict) else "built-in"
        for c in self.choices():
            if c.key == "material.mode":
                c.set(mode)
        self.query_one("#mat-builtin").display = mode == "built-in"
        self.query_one("#mat-custom").display = mode == "custom"
        if mode == "built-in" and isinstance(mat, str):
            lst = self.query_one("#mat-list", OptionList)
            job = ev.job
            want = job.material.key if job is not None and job.material is not None else mat
            for i in range(lst.option_count):
                if lst.get_option_at_index(i).id == want:
                    if lst.highlighted != i:
                        lst.highlighted = i
                    break
        for f in self.fields():
            if isinstance(mat, dict) and f.key.startswith("mat."):
                f.set_value(str(mat.get(f.key[4:], "")))
        self.show_field_messages(ev, {f"mat.{k}": f"beam.material.{k}" for k, *_ in self.CUSTOM})
        props = self.query_one("#mat-props", Static)
        msg = ev.message_for("beam.material")
        if ev.job is not None and ev.job.material is not None:
            m, sy = ev.job.material, ev.job.units

            from shopbeam.members.materials import figures  # noqa: PLC0415 - startup

            shown = figures(m, sy) if m.kind in ("lumber", "stainless") else \
                f"E {units.fmt(m.e, 'stress', sy, 5)}  Fy {units.fmt(m.fy, 'stress', sy)}"
            lines = [f"In use: {m.key} - {m.name}",
                     f"  {shown}  density {units.fmt(m.density, 'density', sy)}"]
            if m.source:
                lines.append(f"  values: {m.source}")
            if msg:  # a warning on the material as a whole (a grade the product is not made
                lines.append(msg)  # to, an E and a density of two materials)
            props.update(_text(fit_text("\n".join(lines), self.wrap_width())))
        else:
            props.update(_text(f"problem: {msg}" if msg else "In use: (not readable yet)"))
        self.show_wood(doc, ev)

    WOOD_KEYS = {"criteria.duration": "ten-years", "beam.wet_service": False,
                 "beam.temperature": "up-to-100F", "beam.repetitive": False}

    def show_wood(self, doc, ev) -> None:
        """The wood keys: shown for a wood member, or when the file has one (so a warning
        that the material ignores it can be seen and the key set back)."""
        m = ev.job.material if ev.job is not None else None
        wood = getattr(m, "kind", "") == "lumber" or any(
            doc.get(k) is not None for k in self.WOOD_KEYS)
        self.query_one("#mat-wood").display = wood
        if not wood:
            return
        for c in self.query("#mat-wood Choice").results(Choice):
            v = doc.get(c.key, self.WOOD_KEYS[c.key])
            if isinstance(v, bool):
                v = "yes" if v else "no"
            c.set(str(v))
        self.show_choice_messages(ev, {k: k for k in self.WOOD_KEYS})

    def choice_reading(self, choice, ev) -> str:
        if choice.key == "criteria.duration":
            cd, words = DURATIONS[choice.value]
            return f"CD {cd:g}: {words} (NDS Table 2.3.2)"
        if choice.key == "beam.wet_service":
            return ("wet: CM factors, creep Kcr 2.0 (NDS Supp. 4A/4D)"
                    if choice.value == "yes" else "dry: moisture 19 % or less in service")
        if choice.key == "beam.temperature":
            return "Ct 1.0" if choice.value == "up-to-100F" else "Ct below 1 (NDS Table 2.3.3)"
        if choice.key == "beam.repetitive":
            return ("Cr 1.15: 3+ joists at 24 in or less (NDS 4.3.9)"
                    if choice.value == "yes" else "Cr 1.0: one member alone")
        return ""

    def on_option_list_option_selected(self, event: OptionList.OptionSelected) -> None:
        if event.option_list.id == "mat-list":
            event.stop()
            self.post_message(self.Pick(event.option.id))

    def reading(self, field, ev) -> str:
        system = self.system(ev)
        for k, _label, kind, _ph in self.CUSTOM:
            if field.key == f"mat.{k}" and field.value:
                return echo(field.value, kind, system)
        return ""


class CriteriaView(View):
    title = "Criteria"

    def compose(self) -> ComposeResult:
        yield Static("Criteria: what the member is checked against.", classes="view-title")
        yield Field("Deflection", "criteria.deflection", placeholder="L/240 or 0.25 in")
        yield Field("Live defl.", "criteria.live_deflection",
                    placeholder="e.g. L/360 (live only)")
        yield Choice("Basis", ["code", "first-yield"], key="criteria.basis")
        yield Field("Safety factor", "criteria.safety_factor", placeholder="1.67")
        yield Static("", id="crit-basis", markup=False)
        yield Static("Lifting device (hoist beam, monorail, jib, lifting beam):",
                     classes="sub-title")
        yield Choice("Lifting", ["none", *LIFTING_PROFILES], key="criteria.lifting")
        yield Choice("Category", ["B", "A"], key="criteria.category")
        yield Field("Impact", "criteria.impact", placeholder="e.g. 25%")
        yield Static("Deflection \"L/n\" applies per span; a cantilever or overhang is judged "
                     "on twice its length.", classes="hint", markup=False)

    def show(self, session) -> None:
        doc = session.doc
        for f in self.fields():
            v = doc.get(f.key, "")
            f.set_value("" if v is None else str(v))
        ev = session.evaluation
        self.show_field_messages(ev, {
            "criteria.deflection": "criteria.deflection",
            "criteria.live_deflection": "criteria.live_deflection",
            "criteria.safety_factor": "criteria.safety_factor",
            "criteria.impact": "criteria.impact"})
        basis = str(doc.get("criteria.basis", "") or "").strip().lower()
        lift = doc.get("criteria.lifting")
        cat = doc.get("criteria.category")
        for c in self.choices():
            if c.key == "criteria.basis":
                c.set("first-yield" if basis == "first-yield" else "code")
            elif c.key == "criteria.lifting":
                c.set(lift.strip().lower() if isinstance(lift, str) else "none")
            elif c.key == "criteria.category":
                c.set(cat.strip().upper() if isinstance(cat, str) else "B")
                c.display = lift == "below-the-hook" or cat is not None
        self.show_choice_messages(ev, {"criteria.basis": "criteria.basis",
                                       "criteria.lifting": "criteria.lifting",
                                       "criteria.category": "criteria.category"})
        self.query_one("#crit-basis", Static).update(
            _text(fit_text(basis_words(ev), self.wrap_width())))

    def reading(self, field, ev) -> str:
        if ev.job is None:
            return ""
        c = ev.job.criteria
        if field.key == "criteria.deflection":
            if c.deflection_abs is not None:
                return f"= {units.fmt(c.deflection_abs, 'small_length', ev.job.units)} in every span"
            if c.deflection_ratio:
                return f"= span / {c.deflection_ratio:g}"
        if field.key == "criteria.live_deflection":
            n = getattr(c, "live_deflection_ratio", None)
            return f"= span / {n:g} under the live loads alone" if n else "not checked"
        if field.key == "criteria.impact":
            if c.impact is not None:
                return f"= {c.impact:.0%} on the live loads"

            from shopbeam.design.lifting import profile_of  # noqa: PLC0415 - startup

            prof = profile_of(ev.job)
            return f"default: {prof.impact:.0%} ({prof.name})" if prof else "default: none"
        return ""

    def choice_reading(self, choice, ev) -> str:
        if choice.key == "criteria.lifting":
            p = LIFTING_PROFILES.get(choice.value)
            if p is None:
                from shopbeam.design.lifting import profile_of  # noqa: PLC0415 - startup

                prof = profile_of(ev.job) if ev.job is not None else None
                return (f"tagged lifting: taken as {prof.name} (the strictest fit)"
                        if prof else "not a lifting device")
            if p["nd"]:
                return (f"ASME BTH-1 design factor Nd {p['nd']['A']:g} (A) / "
                        f"{p['nd']['B']:g} (B); L/{p['deflection']:g}")
            return (f"impact {p['impact']:.0%}, lateral {p['lateral']:.0%}, long. "
                    f"{p['longitudinal']:.0%}, L/{p['deflection']:g} (ASCE 7-16 4.9)")
        if choice.key == "criteria.category":
            return ("Nd 2.0: predictable loads, mild service (BTH-1, from memory)"
                    if choice.value == "A" else "Nd 3.0: the default (ASME BTH-1)")
        return ""


def basis_words(ev) -> str:
    """How bending is judged, on the same basis as the results: the factor divides the
    strength the results use (Fy Z for a compact steel section, Fy S at first yield), so
    the criteria and the results never disagree without saying why."""
    job = ev.job
    if job is None or job.material is None:
        return ""
    from shopbeam.design.checks import BASIS_WORDS, basis_of  # noqa: PLC0415 - startup

    basis = basis_of(job)
    sf = job.criteria.safety_factor
    fy = units.fmt(job.material.fy / sf, "stress", job.units)
    bend = next((c for c in (ev.result.checks if ev.result is not None else ())
                 if c.name == "bending"), None)
    how = f"\n  results use: {bend.formula}" if bend is not None else ""
    if basis == "first-yield":
        # the choice shows [code] (nothing written) on a material no code covers here
        why = ("" if job.criteria.basis.value == "first-yield" else
               "Basis code has no rule for a typed-in metal of no known kind: "
               "first yield is used. ")
        return (f"{why}Bending on {BASIS_WORDS[basis]}: M <= Fy S / {sf:g}, a stress of "
                f"Fy / {sf:g} = {fy} at the extreme fibre.{how}")
    if basis == "lumber":
        return (f"Bending by {BASIS_WORDS.get(basis, basis)}: the factor above is NOT used "
                f"(wood has no first-yield basis; its safety is in the reference values).{how}")
    return (f"Bending by {BASIS_WORDS.get(basis, basis)}, and never more than first yield "
            f"over the factor above: M <= Fy S / {sf:g}, a stress of {fy} at the extreme "
            f"fibre. The code's own factor divides its nominal strength (e.g. Fy Zx / "
            f"{max(1.67, sf):g} for a compact steel section"
            + (": a factor over 1.67 takes Omega_b's place" if sf > 1.67 else "")
            + f"), whichever is lower.{how}")


# ---------------------------------------------------------------------- results

def problems_text(ev) -> str:
    lines = []
    errs = ev.errors
    if errs:
        lines.append(f"The job has {len(errs)} problem{'s' if len(errs) != 1 else ''}; "
                     "no results until they are fixed:")
        for p in errs:
            lines.append(in_words(f"  - {p.key + ': ' if p.key else ''}{p.message}"))
    return "\n".join(lines)


# said while the answer to an edit is late (a heavy job): the summary and the Results view,
# and beside a field typed in since the answer shown was worked out
CHECKING_EDIT = "Checking your last edit ..."


def late(view) -> bool:
    """Whether the answer the screen of `view` shows is for the job before an edit and said
    to be so (`JobScreen.stale_marked`, from the edit on until its answer comes)."""
    screen = view.screen
    session = getattr(screen, "session", None)
    return bool(getattr(screen, "stale_marked", False) and session is not None
                and (session.stale or getattr(screen, "typing_pending", False)))


class ResultsView(View):
    title = "Results"

    def compose(self) -> ComposeResult:
        yield Static("", id="res-problems", markup=False)
        yield Static("", id="res-elevation", markup=False, classes="drawing")
        yield Static("", id="res-verdict", markup=False, classes="verdict")
        yield Static("", id="res-checks", markup=False)
        yield Static("", id="res-reactions", markup=False)
        yield Static("", id="res-extremes", markup=False)
        yield Static("", id="res-self", markup=False)
        yield Static("", id="res-cautions", markup=False)

    def show(self, session) -> None:
        from shopbeam.tui import drawing  # noqa: PLC0415 - startup: numpy, the report model

        ev = session.evaluation
        width = max(40, self.app.size.width - 6)
        q = lambda i: self.query_one(i, Static)  # noqa: E731
        behind = late(self)
        top = "\n".join(([CHECKING_EDIT + " The results follow when its answer comes."]
                         if behind else []) + load_warnings(session)
                        + ([problems_text(ev)] if ev.errors else []))
        q("#res-problems").update(_text(top))
        q("#res-problems").display = bool(top)
        r = ev.result
        for i in ("#res-elevation", "#res-verdict", "#res-checks", "#res-reactions",
                  "#res-extremes", "#res-self"):
            # while the answer is late no figure of the job before the edit is shown at all
            # (the mark at the top scrolls away; a figure lower down would not say whose it is)
            q(i).display = r is not None and not behind
        if r is not None:
            q("#res-elevation").update(Text(drawing.elevation(r.job, width), no_wrap=True,
                                            overflow="crop"))
            note = f"\nNote: {r.shown_state}." if r.shown_state else ""
            q("#res-verdict").update(_text(drawing.verdict_line(r) + note))
            q("#res-verdict").set_class(not r.ok, "-fail")
            q("#res-checks").update(_text("CHECKS\n" + drawing.checks_table(r)))
            q("#res-reactions").update(_text(
                "REACTIONS (what each support does to the beam)\n" + drawing.reactions_table(r)))
            q("#res-extremes").update(_text("EXTREMES (exact)\n" + drawing.extremes_table(r)))
            q("#res-self").update(_text("SELF-CHECKS\n" + drawing.selfchecks_text(r)))
            cautions = list(r.cautions)
        else:
            cautions = cautions_for(ev.job.tags if ev.job is not None else (),
                                    ev.job is not None and ev.job.caution_lifting)
        warns = [p for p in ev.problems if p.warning]
        extra = ["INPUT WARNINGS"] + [in_words(f"  {p.key}: {p.message}") for p in warns] \
            if warns else []
        q("#res-cautions").update(_text("\n".join(extra + ["CAUTIONS"] + [f"!! {c}" for c in cautions])))


class PlotsView(View):
    title = "Plots"

    def compose(self) -> ComposeResult:
        from shopbeam.tui import drawing  # noqa: PLC0415 - startup: numpy, the report model

        yield Static("", id="plot-problems", markup=False)
        for name in drawing.PLOT_KINDS:
            yield Static("", id=f"plot-{name}", markup=False, classes="plot")

    def show(self, session) -> None:
        from shopbeam.tui import drawing  # noqa: PLC0415 - startup: numpy, the report model

        ev = session.evaluation
        width = max(40, self.app.size.width - 6)
        height = 12 if self.app.size.height < 30 else 14
        r = ev.result
        # drawn only while this view is shown (the screen shows the current view alone),
        # and not again for the answer and size it already shows (switching back is free)
        behind = late(self)
        was = getattr(self, "_drawn_for", None)
        if was is not None and was[0] is ev and was[1:] == (width, height, behind):
            return
        self._drawn_for = (ev, width, height, behind)
        head = self.query_one("#plot-problems", Static)
        mark = CHECKING_EDIT + " the plots follow when its answer comes.\n" if behind else ""
        if r is not None and r.state_solution is not None:
            # patterned loads: draw the pattern that governs, and say which it is

            head.update(_text(f"{mark}Diagrams of {r.state_words}."))
            r = replace(r, solution=r.state_solution)
        else:
            head.update(_text(mark + problems_text(ev)))
        head.display = behind or r is None or ev.result.state_solution is not None
        for name in drawing.PLOT_KINDS:
            st = self.query_one(f"#plot-{name}", Static)
            st.display = r is not None and not behind  # (the old job's curves: not shown)
            if r is not None and not behind:
                st.update(Text(drawing.plot(r, name, width, height), no_wrap=True,
                               overflow="crop"))
