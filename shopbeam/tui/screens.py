"""Screens over the job screen: help, the library, save as, unsaved changes, save conflicts.

Dialogs return their answer with `dismiss(value)`; the job screen decides what to do.
"""

from __future__ import annotations

import textwrap
from pathlib import Path

from rich.text import Text
from textual import _time, events
from textual.app import ComposeResult
from textual.binding import Binding
from textual.containers import Horizontal, Vertical, VerticalScroll
from textual.screen import ModalScreen, Screen
from textual.widgets import Button, Footer, Input, OptionList, Static
from textual.widgets.option_list import Option

from shopbeam.errors import InputError
from shopbeam.jobs import library, storage
from shopbeam.tui.widgets import Banner, Choice, Field, SteadyKeys


KEYS = [
    ("Anywhere, a text field included (the same on every screen)", [
        ("F1", "these keys"),
        ("F2 to F12", "views in the order of the bar: F2 job, F3 span, F4 loads, F5 section, "
                      "F6 material, F7 criteria, F8 results, F9 plots, F10 calc sheet, "
                      "F11 rating, F12 sizing; back to a view, the cursor goes back into "
                      "the field you left there, where it was (alt+digit switches views too, "
                      "with no field picked; in the title, notes, tags and labels it types "
                      "the character a keyboard gives it there, such as £ and §)"),
        ("ctrl+s", "save (a bundled preset is saved as your own copy; says where)"),
        ("ctrl+d", "save as: this job, or in the library the picked job, under a new name"),
        ("ctrl+o", "library: open a job"),
        ("ctrl+n", "new job (asks first when there are unsaved changes)"),
        ("ctrl+t / ctrl+x", "supports and loads views: add one / remove the picked one"),
        ("ctrl+z", "in a field: put back its text as it was when you came to it (ctrl+z "
                   "again, before you type, brings back what you typed); elsewhere: put "
                   "back the supports and loads removed, last first"),
        ("ctrl+l", "after a length change: move the supports and loads with it (asks how; "
                   "until then they stay where typed)"),
        ("ctrl+r / ctrl+p", "calc sheet and rating views: write it to a file / print it"),
        ("tab / shift+tab", "next / previous field (only what is shown)"),
        ("esc", "leave the field (then the digits and letters below work)"),
        ("ctrl+q", "quit (asks first when there are unsaved changes)"),
    ]),
    ("With no field picked (after esc or a view key)", [
        ("1 to 9, 0, s", "the views, as numbered in the bar"),
        ("?", "these keys"),
        ("other keys", "not used: a notice says what was typed (on a choice or a list too: "
                       "digits there never change the view)"),
    ]),
    ("In a text field", [
        ("type", "the value with its unit: 12 ft, 10' 6\", 1-1/2 in, -300 lbf, -25 lbf/ft"),
        ("enter", "next field"),
        ("right arrow", "accept the grey completion (section designations)"),
        ("ctrl+u / ctrl+k", "delete to the start / the end of the field"),
        ("copy, cut, paste", "with the terminal's own keys (often ctrl+shift+c / v) or the "
                             "mouse: here ctrl+x removes the picked support or load (ctrl+z "
                             "puts it back) and ctrl+c quits"),
    ]),
    ("On a choice  [like] this", [
        ("left / right", "change it (space too)"),
        ("first letter", "jump to that choice (other keys: not used, and said so)"),
    ]),
    ("Supports and loads lists", [
        ("up / down", "pick the one to edit below"),
        ("delete", "remove the picked one (ctrl+t / ctrl+x add and remove anywhere)"),
    ]),
    ("Sizing", [("r", "sweep the chosen kind"), ("enter", "use the picked section")]),
    ("Library", [
        ("type", "search titles, tags, names (e.g. rack, lifting)"),
        ("up / down, enter", "pick, open (enter in the search opens the picked job)"),
        ("esc", "back to the job"),
    ]),
]


def help_text(width: int = 74) -> str:
    out = ["shopbeam keys", ""]
    col = min(22, max(len(k) for _g, keys in KEYS for k, _w in keys) + 2)
    for group, keys in KEYS:
        out.append(group)
        for k, what in keys:
            lines = textwrap.wrap(what, max(20, width - col - 2)) or [""]
            if len(k) + 2 >= col:  # a long key gets its own line: never run into its words
                out.append(f"  {k}")
                out += [" " * col + ln for ln in lines]
                continue
            out.append(f"  {k:<{col - 2}}{lines[0]}")
            out += [" " * col + ln for ln in lines[1:]]
        out.append("")
    out.append("Signs: forces + up (gravity loads negative), couples + counterclockwise,")
    out.append("moment + sagging, deflection + up (sag is negative).")
    return "\n".join(out)


# seconds a question or the key list is on screen before a key can be an answer to it:
# shorter than anyone reads one; keys made sooner were typed before it came
READ_TIME = 0.5


class HelpScreen(SteadyKeys, ModalScreen):
    """The key list. Keys typed before it could be read go on to the field behind it, and
    later printable keys it does not use are named in the notice of keys not typed
    (`ShopbeamApp.on_event`), as for a question."""

    BINDINGS = [Binding("escape,q,f1,question_mark", "close", "close")]
    READ_TIME = READ_TIME

    def __init__(self) -> None:
        super().__init__()
        self.opened_at = _time.get_time()

    def compose(self) -> ComposeResult:
        width = min(96, self.app.size.width) - 8
        with VerticalScroll(classes="dialog", id="help"):
            yield Static(help_text(width), markup=False)
            yield Static("esc closes this help.", markup=False)
        yield Banner(classes="dialog-banner")  # the caution stays in sight
        yield Footer()

    def action_close(self) -> None:
        self.dismiss(None)


class AnswerScreen(SteadyKeys, ModalScreen[str]):
    """A question answered with one key (s, d, k, e, n, o ...). Keys typed before it could
    be read are not answers: a dialog that comes up in the middle of a burst (a save that
    meets a conflict) would take the burst's letters as its answer. Keys made less than
    `READ_TIME` after it opened go on to the field behind it instead
    (`JobScreen.key_behind`), as if the dialog had come after them."""

    READ_TIME = READ_TIME
    # no button takes the focus: Enter (or Tab, Enter) typed on from a field must never
    # press one ("Save", "Discard and quit"); the letters and Esc answer, and a click works
    AUTO_FOCUS = ""

    def on_mount(self) -> None:
        for b in self.query(Button):
            b.can_focus = False
    # A letter that answers is a key pressed on its own: one that comes within WORD_GAP of
    # the printable key before it, or has another key within ALONE behind it, is part of a
    # word being typed (a slow link delivers a word typed before the question could be seen
    # after it opened; a slow typist types 2 or 3 keys a second) and goes on to the field
    # behind, with the keys around it. A question can overwrite another person's change or
    # discard every edit: a word typed at any ordinary pace never answers it.
    WORD_GAP = 1.0  # seconds, as a word typed slowly on a choice
    ALONE = 0.6  # seconds a letter answer waits for a key behind it
    # letters whose answer throws work away or sends the typing elsewhere (discard,
    # overwrite, a new name's box): answered only by the letter and Enter right after it, as
    # a hunt-and-peck typist's next letter is alone by any gap; the letter alone is text
    CONFIRM: frozenset[str] = frozenset()

    def __init__(self) -> None:
        super().__init__()
        self.opened_at = _time.get_time()
        self.held = None  # a letter answer waiting ALONE to see that no key follows it
        self._held_timer = None
        # keys went on to the field behind (text typed on): a letter alone is text too, and
        # only its letter confirmed with Enter (or Esc) answers
        self.typed_behind = False

    def too_early(self, event, gap: float | None = None) -> bool:
        """`event` (a key) was made before this question could have been read, or is text
        typed on (a printable key within WORD_GAP of the printable key before it, `gap`, or
        one that answers nothing). Esc is always taken: it answers with the choice that
        changes nothing."""
        if event.key == "escape":
            return False
        if self.typed_behind and not (event.is_printable and event.key in self.answers()):
            return True  # typing on behind the question: every key but a held answer's
        if getattr(event, "time", self.opened_at) < self.opened_at + self.READ_TIME:
            return True
        if gap is not None and gap < self.WORD_GAP:
            return True  # typed on: a letter, Backspace, Tab or Enter of the word goes behind
        if not event.is_printable:
            return False
        return event.key not in self.answers()

    def answers(self) -> dict[str, str]:
        """The action of each letter that answers (Esc, always taken at once, aside)."""
        return {k.strip(): b.action for b in self.BINDINGS for k in b.key.split(",")
                if k.strip() != "escape"}

    def hold(self, event, run, alone=None) -> None:
        """Keep a letter answer for ALONE: `run` answers then, unless a key comes first
        (Enter answers at once). With `alone`, the letter left alone runs that instead (it
        goes on to the field as text): only the letter and Enter answer."""
        self.held = event
        self._held_run = run
        self._held_timer = self.set_timer(self.ALONE,
                                          lambda: self._answer_held(alone or run))

    # Enter confirms a held letter only this soon after it: a deliberate "d, Enter" is one
    # quick movement, while a typist's Enter after a letter at a steady pace comes later
    CONFIRM_ENTER = 0.35  # seconds

    def confirm_held(self, enter=None) -> bool:
        """Enter right behind a letter answer (read, pressed on its own, then confirmed):
        it answers now. False when no letter is held, or when the Enter came later than
        CONFIRM_ENTER after it (both are then text, typed on)."""
        if self.held is None:
            return False
        if enter is not None and getattr(enter, "time", 0.0) - getattr(
                self.held, "time", 0.0) > self.CONFIRM_ENTER:
            return False
        run = self._held_run
        self.release()
        run()
        return True

    def _answer_held(self, run) -> None:
        if self.held is not None:
            self.held = None
            run()

    def release(self):
        """The letter held back (a key came behind it: it was text), or None."""
        event, self.held = self.held, None
        if self._held_timer is not None:
            self._held_timer.stop()
            self._held_timer = None
        return event


class ConfirmScreen(AnswerScreen):
    """Unsaved changes: save, discard, or go back. Dismisses "save", "discard" or "cancel"."""

    CONFIRM = frozenset({"d"})

    BINDINGS = [Binding("escape", "answer('cancel')", "keep editing"),
                Binding("s", "answer('save')", "save"),
                Binding("d", "answer('discard')", "then enter: discard")]

    def __init__(self, what: str, doing: str) -> None:
        super().__init__()
        self.what = what
        self.doing = doing

    def compose(self) -> ComposeResult:
        with Vertical(classes="dialog", id="confirm"):
            yield Static(f"{self.what} has unsaved changes.", markup=False)
            yield Static(f"Save them before you {self.doing}?", markup=False)
            with Horizontal(classes="buttons"):
                yield Button("s  Save", id="save", compact=True)
                yield Button("d+enter  Discard", id="discard", compact=True)
                yield Button("esc  Keep editing", id="cancel", compact=True)
        yield Banner(classes="dialog-banner")  # the caution stays in sight
        yield Footer()

    def on_button_pressed(self, event: Button.Pressed) -> None:
        self.dismiss(event.button.id)

    def action_answer(self, answer: str) -> None:
        self.dismiss(answer)


class LengthScreen(AnswerScreen):
    """The length changed: what happens to the supports and loads? Asked on ctrl+l, never
    by itself (it would take the keys of a burst as its answer). Dismisses "keep", "scale"
    or "ends". Nothing moves unless the user says so (esc keeps the positions)."""

    BINDINGS = [Binding("escape,k", "answer('keep')", "keep positions"),
                Binding("s", "answer('scale')", "scale"),
                Binding("e", "answer('ends')", "ends stay at the ends")]

    def __init__(self, old: str, new: str, lines: list[str]) -> None:
        super().__init__()
        self.old, self.new, self.lines = old, new, lines

    def compose(self) -> ComposeResult:
        with VerticalScroll(classes="dialog", id="length"):
            yield Static(f"The length changed from {self.old} to {self.new}.", markup=False,
                         classes="view-title")
            yield Static("Supports and loads placed along the beam:\n" + "\n".join(
                self.lines), markup=False)
            yield Static("What should happen to them?", markup=False)
            yield Static("  k  keep every position as typed (esc); anything past the new end\n"
                         "     is shown as an error until you move it\n"
                         "  s  scale every position with the length\n"
                         "  e  keep the ends at the ends: what sat at the old end moves to\n"
                         "     the new end; everything else stays", markup=False)
        yield Banner(classes="dialog-banner")  # the caution stays in sight
        yield Footer()

    def action_answer(self, answer: str) -> None:
        self.dismiss(answer)


class SaveAsScreen(SteadyKeys, ModalScreen[tuple[str, str] | None]):
    """Name and library place for a save as. Dismisses (name, place) or None."""

    BINDINGS = [Binding("escape", "cancel", "cancel")]

    def __init__(self, name: str, places: list[str], note: str = "") -> None:
        super().__init__()
        self.default_name = name
        self.places = places
        self.note = note

    def compose(self) -> ComposeResult:
        with Vertical(classes="dialog", id="saveas"):
            yield Static("Save as", classes="view-title", markup=False)
            if self.note:
                yield Static(self.note, markup=False)
            yield Field("Name", "saveas.name", value=self.default_name,
                        placeholder="letters, digits, - and _", classes="-wide")
            yield Choice("Library", self.places, key="saveas.place")
            yield Static("enter saves, esc cancels. The file is NAME.toml in that library.",
                         markup=False)
        yield Banner(classes="dialog-banner")  # the caution stays in sight
        yield Footer()

    def on_mount(self) -> None:
        self.query_one(Field).input.focus()

    def on_field_edited(self, event: Field.Edited) -> None:
        event.stop()

        event.field.taken(event.value)
        try:
            storage.safe_name(event.value)
            event.field.show("")
        except InputError as exc:
            event.field.show(exc.problem.message, error=True)

    def on_input_submitted(self, event: Input.Submitted) -> None:
        event.stop()
        self._submit(event.value)  # the name as it was at Enter, not with keys typed behind

    def _submit(self, typed: str | None = None) -> None:
        name = (self.query_one(Field).value if typed is None else typed).strip()

        try:
            storage.safe_name(name)
        except InputError as exc:
            self.query_one(Field).show(exc.problem.message, error=True)
            return
        self.dismiss((name, self.query_one(Choice).value))

    def action_cancel(self) -> None:
        self.dismiss(None)


class ConflictScreen(AnswerScreen):
    """A save was refused: show what changed on disk; save as new name, overwrite, or cancel."""

    CONFIRM = frozenset({"n", "o"})

    BINDINGS = [Binding("escape", "answer('cancel')", "cancel"),
                Binding("n", "answer('new')", "then enter: save as new name"),
                Binding("o", "answer('overwrite')", "then enter: overwrite")]

    def __init__(self, conflict) -> None:
        super().__init__()
        self.conflict = conflict

    def compose(self) -> ComposeResult:
        c = self.conflict
        with Vertical(classes="dialog", id="conflict"):
            yield Static(c.message(), markup=False)  # (it says "not saved" itself)
            yield Static("What overwriting would change: the file on disk now, against "
                         "yours:" if c.reason == "exists" else
                         "What is in the file on disk now, against what you opened:",
                         markup=False)
            with VerticalScroll(id="conflict-diff"):
                yield Static(c.diff or "(no differences to show)", markup=False)
            with Horizontal(classes="buttons"):
                yield Button("n+enter  New name", id="new", compact=True)
                yield Button("o+enter  Overwrite", id="overwrite", compact=True)
                yield Button("esc  Cancel", id="cancel", compact=True)
        yield Banner(classes="dialog-banner")  # the caution stays in sight
        yield Footer()

    def on_button_pressed(self, event: Button.Pressed) -> None:
        self.dismiss(event.button.id)

    def action_answer(self, answer: str) -> None:
        self.dismiss(answer)


class LibraryScreen(SteadyKeys, Screen[object]):
    """The three library places with the origin of every job; search, open, duplicate, new.

    Dismisses ("open", path) or ("new", None) or None (back)."""

    BINDINGS = [
        Binding("escape", "back", "back to the job"),
        Binding("ctrl+d", "duplicate", "save as (copy)", priority=True),
        Binding("ctrl+n", "new", "new job", priority=True),
        Binding("f1", "app.help", "keys", priority=True),
        Binding("down", "move(1)", "next", show=False, priority=True),
        Binding("up", "move(-1)", "previous", show=False, priority=True),
        Binding("pagedown", "move(10)", "page down", show=False, priority=True),
        Binding("pageup", "move(-10)", "page up", show=False, priority=True),
    ]

    def __init__(self, library_dir=None, tags=(), highlight=None) -> None:
        super().__init__()
        self.opening = False  # a job is being opened: the keys held behind Enter are its
        self.highlight = highlight
        self.library_dir = library_dir
        self.tags = tags
        self.found = []

    def compose(self) -> ComposeResult:
        yield Banner(id="banner")
        yield Static("Library: shop, user and bundled jobs. Type to search; enter opens.",
                     classes="view-title", markup=False)
        yield Field("Search", "library.search", placeholder="title, tag or name words")
        yield OptionList(id="lib-list")
        yield Static("", id="lib-detail", markup=False)
        yield Footer()

    def on_mount(self) -> None:
        self.query_one(Banner).show(self.tags)
        self.fill("")
        self.query_one(Field).input.focus()  # type to search at once; enter opens

    def fill(self, search: str, keep: bool = False) -> None:
        lst = self.query_one("#lib-list", OptionList)
        was = lst.highlighted
        if not keep:
            self._filled_for = search
            try:
                self.found = library.entries(self.library_dir, search=search or None)
            except Exception as exc:  # noqa: BLE001
                self.found = []
                self.query_one("#lib-detail", Static).update(Text(
                    f"cannot read the library: {exc}"))
        lst.clear_options()
        opts = []
        for e in self.found:
            tags = f" [{', '.join(e.tags)}]" if e.tags else ""
            shadow = f" (hidden by the {e.shadowed_by} copy)" if e.shadowed_by else ""
            bad = " (PROBLEM)" if e.problem else ""
            title = " ".join(e.title.split())  # one line: a title's line breaks as spaces
            line = f"{e.origin:<8} {e.name:<24} {title}{tags}{shadow}{bad}"
            width = max(40, (self.size.width or 80) - 4)
            if len(line) > width:
                line = line[: width - 3] + "..."
            opts.append(Option(Text(line, no_wrap=True)))
        lst.add_options(opts)
        places = ", ".join(f"{p.origin}" for p in library.places(self.library_dir))
        n = len(self.found)
        if not self.found:
            self.query_one("#lib-detail", Static).update(Text(
                f"No job matches. Places searched: {places}."))
        else:
            lst.highlighted = 0
            if keep and was is not None and was < n:
                lst.highlighted = was
            elif self.highlight is not None:
                for i, e in enumerate(self.found):
                    if Path(e.path).resolve() == Path(self.highlight).resolve():
                        lst.highlighted = i
                        break
            self.query_one("#lib-list", OptionList).border_subtitle = f"{n} jobs"

    def on_field_edited(self, event: Field.Edited) -> None:
        event.stop()
        self.highlight = None
        self.fill(event.value)
        event.field.taken(event.value)

    def on_key(self, event) -> None:
        """Typing on the list goes to the search field."""
        lst = self.query_one("#lib-list", OptionList)
        if lst.has_focus and event.is_printable and event.character and event.character != " ":
            inp = self.query_one(Field).input
            inp.focus()
            inp.insert_text_at_cursor(event.character)
            event.stop()
            event.prevent_default()

    def on_input_submitted(self, event: Input.Submitted) -> None:
        """Enter in the search opens the picked job: type, then one Enter."""
        event.stop()
        search = event.value  # as it was at Enter: keys typed behind it are not part of it
        if search != getattr(self, "_filled_for", ""):  # typed fast: its search not run yet
            self.highlight = None
            self.fill(search)
        lst = self.query_one("#lib-list", OptionList)
        if lst.highlighted is not None and 0 <= lst.highlighted < len(self.found):
            self.on_option_list_option_selected(
                OptionList.OptionSelected(lst, lst.get_option_at_index(lst.highlighted),
                                          lst.highlighted))
        else:
            self._give_back_keys()  # nothing matched: nothing opens

    def action_move(self, step: int) -> None:
        """Up, down, page up and page down pick in the list, from the search field too."""
        lst = self.query_one("#lib-list", OptionList)
        n = lst.option_count
        if not n:
            return
        i = 0 if lst.highlighted is None else lst.highlighted
        lst.highlighted = max(0, min(n - 1, i + step))

    def on_resize(self) -> None:
        if self.is_mounted and self.found is not None:
            self.fill(self.query_one(Field).value, keep=True)

    def on_option_list_option_highlighted(self, event: OptionList.OptionHighlighted) -> None:
        if 0 <= event.option_index < len(self.found):
            e = self.found[event.option_index]
            lines = [f"{e.label}: {' '.join(e.title.split())}"]
            if e.notes:
                lines.append(e.notes[:200])
            if e.read_only:
                lines.append("bundled preset: read-only; saving it makes your own copy.")
            if e.shadowed_by:
                lines.append(f"A {e.shadowed_by} job of the same name comes first.")
            if e.problem:
                lines.append(f"problem: {e.problem}")
            self.query_one("#lib-detail", Static).update(Text("\n".join(lines)))

    def on_option_list_option_selected(self, event: OptionList.OptionSelected) -> None:
        event.stop()
        if 0 <= event.option_index < len(self.found):
            e = self.found[event.option_index]
            if e.problem:
                self.notify(f"{e.label} cannot be opened: {e.problem}", severity="error")
                self._give_back_keys()
                return
            self.opening = True
            self.dismiss(("open", e.path))  # the keys held since Enter go to the job
            return
        self._give_back_keys()

    def _give_back_keys(self) -> None:
        """Nothing opens after all: the keys held behind Enter (`ShopbeamApp.on_event`) are
        the library's again, in their order."""
        held, self.app._keys_after_open = self.app._keys_after_open, None
        for event in held or ():
            self.app.post_message(events.Key(event.key, event.character))

    def action_new(self) -> None:
        self.app._keys_after_open = []  # keys from here on are for the new job
        self.opening = True
        self.dismiss(("new", None))

    def action_back(self) -> None:
        self._give_back_keys()  # nothing held is lost: Esc goes back to the job as it was
        self.dismiss(None)

    def action_duplicate(self) -> None:
        lst = self.query_one("#lib-list", OptionList)
        i = lst.highlighted
        if i is None or not (0 <= i < len(self.found)):
            return
        e = self.found[i]

        places = [p.origin for p in library.places(self.library_dir) if p.writable]
        places = ["user"] + [p for p in places if p != "user"]

        def done(answer) -> None:
            if not answer:
                return
            name, to = answer

            try:
                library.copy(e.label, to=to, library_dir=self.library_dir, new_name=name)
            except storage.SaveConflict as exc:
                self.notify(f"not copied: {exc.message()}", severity="error", timeout=8)
                return
            except InputError as exc:
                self.notify(f"not copied: {exc}", severity="error", timeout=8)
                return
            self.notify(f"copied {e.label} to {to}:{name}")
            self.fill(self.query_one(Field).value)

        self.app.push_screen(SaveAsScreen(f"{e.name}-copy", places,
                                          note=f"Duplicate {e.label} as:"), done)
