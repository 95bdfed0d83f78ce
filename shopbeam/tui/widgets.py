"""Small reusable widgets of the text UI: a labelled field that says what is wrong beside it,
a one-line choice, the view bar and the safety banner.

Widgets here only show what they are given and post messages about what the user did; the
job screen owns the state (attributes down, messages up).
"""

from __future__ import annotations

import re

import textwrap

from rich.text import Text
from textual import events
from textual.app import ComposeResult
from textual.binding import Binding
from textual.containers import Horizontal
from textual.message import Message
from textual.reactive import reactive
from textual.screen import Screen
from textual.widget import Widget
from textual.widgets import Input, Label, Static
from textual.widgets.input import Selection

from shopbeam.cautions import SHORT, SHORT_LIFTING, is_lifting

# beside a field typed in since the answer shown was worked out, until its answer comes
CHECKING_WORDS = "checking what was typed ..."


# Esc typed quickly before a digit (or alt+digit) reaches the app as the character a Mac
# keyboard's Option layer puts on that digit; over SSH and in tmux that is how "Esc 7" arrives.
# The view keys accept these too, and a field hands them on instead of typing them.
OPTION_DIGITS = {"1": "inverted_exclamation_mark", "2": "trade_mark_sign", "3": "pound_sign",
                 "4": "cent_sign", "5": "infinity", "6": "section_sign", "7": "pilcrow_sign",
                 "8": "bullet", "9": "ª", "0": "º"}
_DIGIT_OF = {name: digit for digit, name in OPTION_DIGITS.items()}


# A line break in a text a one-line field shows (notes written as a multi-line string in the
# file): shown as this mark, so the field draws on its own line and shows all of its text,
# and turned back into the line break when the field is edited
LINE_BREAK = "\u23ce"  # ⏎
# Every character Python reads as a line break, each with a mark of its own (a carriage
# return, a form feed or a Unicode line separator in a title would otherwise be invisible in
# the field, and an edit elsewhere in the text would drop it or make it a space)
BREAK_MARKS = {"\n": LINE_BREAK, "\r": "\u240d", "\v": "\u240b", "\f": "\u240c",
               "\x1c": "\u241c", "\x1d": "\u241d", "\x1e": "\u241e", "\x85": "\u2424",
               "\u2028": "\u21b5", "\u2029": "\u204b"}  # ⏎ ␍ ␋ ␌ ␜ ␝ ␞ ␤ ↵ ⁋


def _pieces(text: str) -> list[tuple[str, str]]:
    """(shown character, what it stands for) of `text` in a one-line field: a line break is
    its mark (a Windows line end, CR LF, one mark and a plain line break: a TOML reader reads
    a multi-line string's CR LF as LF), every other character itself."""
    out, i = [], 0
    while i < len(text):
        if text.startswith("\r\n", i):
            out.append((LINE_BREAK, "\n"))
            i += 2
            continue
        ch = text[i]
        out.append((BREAK_MARKS.get(ch, ch), ch))
        i += 1
    return out


def one_line(text) -> str:
    """`text` for a one-line field: each line break shown as its mark (BREAK_MARKS)."""
    return "".join(shown for shown, _ in _pieces("" if text is None else str(text)))


def from_one_line(text: str, was: str, breaks: bool = False) -> str:
    """What a one-line field's text stands for, given the text `was` it showed: what is left
    as it was shown stands for what it was (a mark for its line break), and what was typed is
    itself (a "⏎" typed into a title is a character of it, even beside a real line break).
    `breaks` (the notes): a "⏎" typed or pasted is a line break (ctrl+j types one)."""
    from difflib import SequenceMatcher

    pieces = _pieces(was)
    shown = "".join(p for p, _ in pieces)
    if text == shown:
        return "".join(orig for _, orig in pieces)
    out = []
    for op, i1, i2, j1, j2 in SequenceMatcher(None, shown, text, autojunk=False).get_opcodes():
        typed = text[j1:j2].replace(LINE_BREAK, "\n") if breaks else text[j1:j2]
        out.append("".join(orig for _, orig in pieces[i1:i2]) if op == "equal" else typed)
    return "".join(out)


# Fields whose text may hold line breaks (shown as LINE_BREAK, typed with ctrl+j, kept from a
# paste); every other field holds one line
MULTI_LINE_KEYS = frozenset({"notes"})


# Fields of free text, where the Option-layer characters of the digits are ordinary
# characters (£ on a UK keyboard, § before a clause, º in "nº") and are typed, never read as
# Esc-then-digit: a view key there is F2..F12 (or Esc, then the digit a moment later)
FREE_TEXT_KEYS = frozenset({"title", "notes", "tags", "load.label", "support.label",
                            "moving.label"})


def shown_now(widget) -> bool:
    """Whether `widget` is shown at this moment: it and every container up to its screen
    displayed (a view switched away is display: none)."""
    node = widget
    while node is not None and not isinstance(node, Screen):
        if not getattr(node, "display", True):
            return False
        node = node.parent
    return True



class SteadyKeys:
    """A screen whose key line keeps one order. Textual lists a screen's keys in the order it
    meets them along the focus chain, so the same keys swap places as the focus moves (a
    text field's own ctrl+d or ctrl+x puts that key first). Here they are always listed by
    who owns them, the view's own keys first, then the screen's, then the app's, each in the
    order its BINDINGS give."""

    @property
    def active_bindings(self):
        got = super().active_bindings  # type: ignore[misc]

        def rank(item):
            key, active = item
            node = active.node
            tier = 2 if node is self.app else 1 if node is self else 0  # type: ignore[attr-defined]
            # (the node's own map of keys, in BINDINGS order; none known: by key alone)
            order = list(getattr(getattr(node, "_bindings", None), "key_to_bindings", ()))
            return (tier, type(node).__name__, order.index(key) if key in order else len(order))

        return dict(sorted(got.items(), key=rank))

class KeepFocusOnStaleHide:
    """A Hide that arrives after the widget is shown again (a quick switch away and back:
    the Hide of the first switch is handled after the second switch and a Tab had put the
    focus here) must not blur it: Textual's own handler would, and the keys typed next went
    nowhere. A Hide while hidden blurs as before."""

    def _on_hide(self, event: events.Hide) -> None:
        # Textual runs the `_on_hide` of every class in the line; prevent_default stops the
        # ones below this (Widget's would blur)
        if self.has_focus and shown_now(self):
            event.prevent_default()  # stale: shown again, and the focus placed here since


class FieldInput(KeepFocusOnStaleHide, Input):
    """A field's text box. Keys come in typing order (the app runs bound keys at once, see
    `ShopbeamApp.on_event`); a key that still arrives after an earlier key of the same burst
    moved the focus away goes on to whatever has the focus now. Esc-then-digit typed fast
    (the Option-layer character of that digit) changes view and types nothing."""

    def _on_paste(self, event: events.Paste) -> None:
        """A paste is typing: every line of it is kept. A field holds one line, so the lines
        are joined with spaces and a notice says so (Textual's own Input keeps the first line
        only; prevent_default keeps its handler, which Textual also runs, from adding the
        first line again); the notes keep each line break as its mark."""
        event.stop()
        event.prevent_default()
        if not event.text:
            return
        text = event.text
        if "\t" in text:
            # a tab has no place in a field, and one is drawn as several cells while the
            # field scrolls as if it were one (the last characters and the cursor then drawn
            # off the edge): each pasted tab is a space, and a notice says so
            text = text.replace("\t", " ")
            self.app.notify("The pasted tab is a space here: a field holds no tabs.",
                            timeout=6)
        event = events.Paste(text)
        pasted = event.text.strip("\r\n")
        if getattr(self.parent, "key", "") in MULTI_LINE_KEYS:
            # the notes keep every line break of a paste, shown as its mark (saved as the
            # line break), and every other character as pasted
            # (all of it, its leading and trailing line breaks too: the notes hold them)
            lines = event.text.splitlines()
            self.type_in(re.sub(r"\r\n|[\r\n\v\f\x1c-\x1e\x85\u2028\u2029]", LINE_BREAK,
                                event.text))
            said = (f"Pasted {len(lines)} lines: each line break is shown as {LINE_BREAK} and "
                    "saved as a line break (ctrl+j types one).")
        else:
            # the line breaks (with the spaces around them) become one space each; the
            # text's own leading and trailing spaces stay (" over the bay" pasted after a word)
            lines = [ln for ln in event.text.splitlines() if ln.strip()]
            self.type_in(re.sub(r"[ \t]*(?:\r\n|[\r\n\v\f\x1c-\x1e\x85\u2028\u2029])+[ \t]*", " ",
                                pasted))
            said = (f"Pasted {len(lines)} lines into one line (a field holds one line): they "
                    "are joined with spaces, nothing left out.")
        if len(lines) > 1:
            self.app.notify(said)

    def type_in(self, text: str) -> None:
        """`text` at the cursor, or in place of the selection, as typing puts it."""
        selection = self.selection
        if selection.is_empty:
            self.insert_text_at_cursor(text)
        else:
            self.replace(text, *selection)

    def _free_text(self) -> bool:
        key = getattr(self.parent, "key", "")
        return key in FREE_TEXT_KEYS or key.startswith("project.")

    async def _on_key(self, event) -> None:
        if self.screen.focused is not self:
            # an earlier key of this burst (tab, enter, a view key) moved the focus on
            event.stop()
            event.prevent_default()
            target = self.screen.focused or self.screen
            if target is not self:
                target.post_message(events.Key(event.key, event.character))
            return
        if event.key == "ctrl+j" and getattr(self.parent, "key", "") in MULTI_LINE_KEYS:
            event.stop()  # a line break in the notes: shown as its mark, saved as a break
            event.prevent_default()
            self.type_in(LINE_BREAK)
            return
        digit = _DIGIT_OF.get(event.key)
        # as a view key only on a screen of views (the library search, a save-as name: text)
        if digit is not None and not self._free_text() \
                and hasattr(self.screen, "action_view_key"):
            event.stop()
            event.prevent_default()
            self.screen.set_focus(None)
            await self.screen.run_action(f"view_key('{digit}')")  # the screen knows its views
            return
        if digit is not None and event.character and event.character not in "£§" \
                and hasattr(self.screen, "action_view_key"):
            # typed as text here; the rarer ones are said, since Esc and the digit typed at
            # once (a laggy link bunches them) arrive as the same character
            self.app.notify(f"Typed \"{event.character}\" into the field. If you meant Esc "
                            f"and then {digit} (a view), Backspace it: from a field, F-keys "
                            "change views.", timeout=5)
        await super()._on_key(event)

    _early_selects = 0  # selections made as the focus came, whose Focus events are queued
    # the whole text is selected when the focus comes (typing replaces it). Textual's own
    # select_on_focus is off: its Focus handler runs after this class's (handlers run down
    # the whole class line) and would select again the text typed since the focus came
    select_all = True

    at_focus = None  # the text when the focus came: what ctrl+z puts back (`undo_typing`)

    undone = None  # the text ctrl+z took away, which a second ctrl+z brings back

    def undo_typing(self) -> str:
        """ctrl+z in a field: its text as it was when the focus came (a Tab selects the
        whole text, and a key typed next replaces it all): "undone"; a second ctrl+z with
        nothing typed between brings back the text it took away: "redone" (nothing typed is
        lost to an undo). "" where there is nothing to put back."""
        if self.at_focus is not None and self.value != self.at_focus:
            self.undone = self.value
            self.value = self.at_focus
            self.cursor_position = len(self.value)
            return "undone"
        if self.undone is not None and self.value == self.at_focus:
            self.value, self.undone = self.undone, None
            self.cursor_position = len(self.value)
            return "redone"
        return ""

    resume_next = False  # the next focus comes back to go on typing (a view's F-key)

    def show_cursor(self) -> None:
        """Scroll a long text to its cursor (the focus coming back to it: the blur left it
        shown from its start)."""
        from textual.geometry import Region  # noqa: PLC0415
        if self.has_focus:
            self.scroll_to_region(Region(self._cursor_offset, 0, width=1, height=1),
                                  force=True, animate=False)

    def focus_arrived(self) -> None:
        """The focus came here (called by the screen as it moves, not when the queued Focus
        event arrives): select the text now, so the next key of a fast burst replaces it
        exactly as it would if typed slowly. Coming back to go on typing (`resume_next`):
        nothing selected, the cursor where it was, and ctrl+z still puts back the text as it
        was before this field's typing began."""
        if self.resume_next:
            self.resume_next = False
            self._early_selects += 1  # its queued Focus event selects nothing either
            return
        self.at_focus, self.undone = self.value, None
        if self.select_all:
            self.selection = Selection(0, len(self.value))
            self._early_selects += 1

    def _on_focus(self, event) -> None:
        # Input._on_focus runs after this one (blink, cursor; no selection: see select_all)
        if self._early_selects > 0:  # selected already; keys may have been typed since
            self._early_selects -= 1
            return
        self.at_focus, self.undone = self.value, None
        if self.select_all and not event.from_app_focus:  # a click, or focus set in code
            self.selection = Selection(0, len(self.value))

    def _on_blur(self, event) -> None:
        # a long value left scrolled to its end read as a whole one ("4 ft, 6 ft, 8 ft" for
        # braces at 2 ft, 4 ft, ...): shown from its start once the focus leaves (the cursor
        # stays; the focus coming back scrolls to it again)
        self.scroll_to(0, 0, animate=False, force=True, immediate=True)

    def watch_value(self, value: str) -> None:
        """Typing is noted at once (not when its message arrives), so a save or a view key
        typed right behind it takes it along (`JobScreen.flush_typing`)."""
        field = self.parent
        if isinstance(field, Field) and value != getattr(field, "_quiet", None):
            field._typed = value
            # the answer shown is the job's before this key from the frame that shows the
            # key: marked now, not when the edit's message arrives (`JobScreen.typing_now`)
            typing_now = getattr(self.screen, "typing_now", None) if self.is_attached else None
            if typing_now is not None:
                typing_now(field)

    async def action_submit(self) -> None:
        if getattr(self.screen, "ENTER_NEXT_FIELD", False):
            self.screen.focus_next()  # now, so the next key of a burst lands in that field
        await super().action_submit()


class Field(Horizontal):
    """Label, one-line input and a message in words beside it (how the entry was read, or
    what is wrong with it)."""

    DEFAULT_CSS = """
    Field { height: auto; min-height: 1; margin: 0 0 0 0; }
    Field > Label.field-label { width: 14; height: 1; }
    Field > Input { width: 24; height: 1; }
    Field > Static.field-msg { width: 1fr; height: auto; padding: 0 0 0 1; }
    Field.-focused > Label.field-label { text-style: bold reverse; }
    Field.-wide > Input { width: 1fr; }
    Field.-wide > Static.field-msg { width: auto; max-width: 40; }
    """

    class Edited(Message):
        """The user changed the text of a field."""

        def __init__(self, field: "Field", value: str) -> None:
            super().__init__()
            self.field = field
            self.value = value
            self.row = field.row  # the supports/loads row shown when it was typed

        @property
        def control(self) -> "Field":
            return self.field

    class Left(Message):
        """The focus left the field (tab, enter, a view key, a click elsewhere)."""

        def __init__(self, field: "Field") -> None:
            super().__init__()
            self.field = field

    def on_descendant_blur(self, event) -> None:
        # the label marks the field with the focus: by a class, which restyles the label at
        # once (Textual did not restyle it when `:focus-within` of its parent changed, and
        # the first field's label stayed marked while typing went into another)
        self.set_class(self.screen.focused is not None
                       and self in self.screen.focused.ancestors, "-focused")
        self.post_message(self.Left(self))

    def on_descendant_focus(self, event) -> None:
        self.set_class(True, "-focused")

    def __init__(self, label: str, key: str, *, placeholder: str = "", value: str = "",
                 suggester=None, id: str | None = None, classes: str | None = None) -> None:
        super().__init__(id=id, classes=classes)
        self.label = label
        self.key = key  # what it edits, e.g. "beam.length" or "load.at"
        self._placeholder = placeholder
        self._value = value
        self._suggester = suggester
        self._typed = None  # the last text typed here that the screen has not taken yet
        self._quiet = None  # a value shown from the document (not typed)
        self.row = 0  # in a supports/loads form: the row this field shows

    def compose(self) -> ComposeResult:
        yield Label(self.label, classes="field-label")
        inp = FieldInput(self._value, placeholder=self._placeholder, compact=True,
                    suggester=self._suggester, select_on_focus=False)
        inp.cursor_blink = getattr(self.app, "cursor_blink", True)
        yield inp
        yield Static("", classes="field-msg", markup=False)

    @property
    def input(self) -> Input:
        return self.query_one(Input)

    @property
    def value(self) -> str:
        return self.input.value

    def set_value(self, value: str) -> None:
        """Show a value from the document without it counting as an edit. A field that has
        the focus, or typing the screen has not taken yet, is never rewritten; nor is the
        text last typed here while the document says the same in its own way ("rack,shelf"
        for the tags rack and shelf, "1.670" for 1.67)."""
        value = "" if value is None else str(value)
        if self._typed is not None or (self.screen.focused is self.input and not self._moved):
            return
        self._moved = False
        kept = self._kept
        if kept is not None and same_entry(kept, value):
            if self.input.value != kept:
                self._quiet = kept
                self.input.value = kept
            return
        self._kept = None
        if self.input.value != value:
            self._quiet = value
            self.input.value = value

    def show_row(self, row: int, value: str) -> None:
        """Show row `row`'s value; another row's value replaces the text even with focus
        (what was typed for the old row is already on its way, stamped with that row)."""
        if row != self.row:
            self.row = row
            self._typed = None
            self._kept = None
            value = "" if value is None else str(value)
            if self.input.value != value:
                self._quiet = value
                self.input.value = value
            return
        self.set_value(value)

    _kept = None  # the text last typed here and written into the document
    edited_version = 0  # the document's version this field's typing last made
    _moved = False  # the user asked to move what this field shows (ctrl+l): show it

    def will_move(self) -> None:
        """The next value shown here is one the user asked for (ctrl+l moved the positions
        after a length change): shown even with the focus, as nothing typed is pending."""
        self._moved = True
        self._kept = None

    def taken(self, value: str) -> None:
        """The screen wrote `value` (typed here) into the document."""
        self._kept = value
        if self._typed == value:
            self._typed = None

    def forget_typing(self) -> None:
        self._typed = None

    def show(self, message: str = "", error: bool = False) -> None:
        """The message beside the field; the same message again changes nothing on screen
        (no redraw, no new layout: an answer that leaves it as it was costs nothing here)."""
        shown = ("problem: " + message) if error else message
        if getattr(self, "_shown", None) == (shown, error):
            return
        was = getattr(self, "_shown", None)
        self._shown = (shown, error)
        if message == CHECKING_WORDS and was is not None:
            # while the edit is checked the message keeps the height it had on screen (its
            # wrapped rows), so the form below does not jump up and back at every key
            msg = self.query_one(".field-msg", Static)
            lines = max(len(was[0].splitlines()), msg.size.height if msg.is_attached else 0)
            shown += "\n " * max(0, min(lines, 12) - 1)
        update_text(self.query_one(".field-msg", Static), Text(shown),
                    fixed_width=not self.has_class("-wide"))
        self.set_class(error, "-error")

    def on_input_changed(self, event: Input.Changed) -> None:
        event.stop()
        if getattr(self, "_quiet", None) == event.value:
            self._quiet = None
            return
        self._quiet = None
        self.post_message(self.Edited(self, event.value))


def same_entry(typed: str, shown: str) -> bool:
    """Whether the text typed in a field and the text the document gives back for it say
    the same: the same number, or the same comma-separated items (spaces and empty items
    aside)."""
    a, b = typed.strip(), shown.strip()
    try:
        return float(a) == float(b)
    except ValueError:
        pass
    return [p.strip() for p in a.split(",") if p.strip()] == \
        [p.strip() for p in b.split(",") if p.strip()]


class Choice(KeepFocusOnStaleHide, Widget, can_focus=True):
    """One of a few words, chosen with left/right (or the first letter); the chosen one is
    shown in [brackets] so it reads without colour."""

    DEFAULT_CSS = """
    Choice { height: auto; min-height: 1; width: 1fr; }
    Choice:focus { text-style: bold; }
    """

    BINDINGS = [
        Binding("left", "move(-1)", "previous", show=False),
        Binding("right", "move(1)", "next", show=False),
        Binding("space", "move(1)", "next", show=False),
    ]

    value: reactive[str] = reactive("")

    class Changed(Message):
        def __init__(self, choice: "Choice", value: str) -> None:
            super().__init__()
            self.choice = choice
            self.value = value

        @property
        def control(self) -> "Choice":
            return self.choice

    def __init__(self, label: str, options: list[str], value: str | None = None, *,
                 key: str = "", id: str | None = None, classes: str | None = None) -> None:
        super().__init__(id=id, classes=classes)
        self.label = label
        self.options = list(options)
        self.key = key
        self.set_reactive(Choice.value, value if value in self.options else self.options[0])
        self.message = ""  # what the reader says about this key, shown under the choice
        self._pending = None  # a value the user chose that the screen has not taken yet

    def show(self, message: str = "", error: bool = False) -> None:
        """Put the reader's word on this key (a problem, a warning, or what it means) on
        the line under the choice; "" clears it."""
        text = ("problem: " + message) if error and message else message
        if text != self.message:
            self.message = text
            self.set_class(error and bool(message), "-error")
            self.refresh(layout=True)

    def render(self) -> Text:
        return self._content(self.size.width or 80)

    def get_content_height(self, container, viewport, width: int) -> int:
        """As many lines as the options take at this width (they wrap under each other
        when one line cannot hold them all), and the message under them."""
        if not width:
            return 0
        return len(self._content(width).wrap(self.app.console, width))

    def _content(self, width: int) -> Text:
        t = self._render_choice(width)
        if self.message:
            # wrapped in the column right of the label, as a field's message is
            style = "bold" if self.has_class("-error") else ""
            for line in textwrap.wrap(self.message, max(20, width - 14),
                                      break_on_hyphens=False) or [""]:
                t.append("\n" + " " * 14)
                t.append(line, style=style)
        return t

    def _render_choice(self, width: int) -> Text:
        """The label, then every option with the chosen one in [brackets]; options that do
        not fit on one line go on lines below, under the first option, so all of them are
        always in sight. Only a field too narrow for even one option a line shows just the
        chosen one ("< [pin] >  2 of 5")."""
        t = Text()
        focus = self.has_focus
        t.append(f"{self.label:<14}", style="bold reverse" if focus else "")
        chosen = "bold reverse" if focus else "bold"
        full = sum(len(o) + 3 for o in self.options) + 14
        if full <= width:
            for opt in self.options:
                if opt == self.value:
                    t.append(f"[{opt}]", style=chosen)
                else:
                    t.append(f" {opt} ")
                t.append(" ")
            if focus:
                t.append("  <- ->", style="dim")
            return t
        if 14 + max(len(o) for o in self.options) + 2 > width:
            i = self.options.index(self.value)
            t.append(f"< [{self.value}] >", style=chosen)
            t.append(f"  {i + 1} of {len(self.options)}")
            if focus:
                t.append("  <- ->", style="dim")
            return t
        col = 14
        for opt in self.options:
            cell = f"[{opt}]" if opt == self.value else f" {opt} "
            if col > 14 and col + len(cell) > width:
                t.append("\n" + " " * 14)
                col = 14
            t.append(cell, style=chosen if opt == self.value else "")
            col += len(cell)
            if col < width:
                t.append(" ")
                col += 1
        if focus:
            if col + 6 > width:
                t.append("\n" + " " * 14)
            t.append(" <- ->", style="dim")
        return t

    def set(self, value: str) -> None:
        """Show a value from the document (no Changed message); not while a pick of the
        user's is still on its way to the document (an answer redrawn mid-burst had put the
        choice back a few keys, and the arrows behind it moved on from there: a load ended
        on a type not picked)."""
        if getattr(self, "_pending", None) is not None:
            return
        if value in self.options:
            self.set_reactive(Choice.value, value)
            self.refresh()

    def action_move(self, step: int) -> None:
        i = (self.options.index(self.value) + step) % len(self.options)
        self._choose(self.options[i])

    def _choose(self, value: str) -> None:
        """The user chose `value`: noted at once (a save typed right behind it takes it
        along, see `JobScreen.flush_typing`), and said in a Changed message."""
        self.value = value
        self._pending = value
        self.post_message(self.Changed(self, value))

    # A letter picks an option only when pressed on its own: one right behind another
    # printable key, or with one right behind it (closer than ALONE), is part of a word
    # typed with the focus here by mistake, and picks nothing (the app holds the letter
    # for ALONE to see; see `ShopbeamApp._letter_behind`)
    ALONE = 0.3  # seconds, as for a letter that answers a question
    # a key within WORD_GAP of the printable key before it (on the same choice) is a word
    # typed slowly: it picks nothing, and a pick made by the letter before it is taken back
    WORD_GAP = 1.0  # seconds

    def pick_for(self, character: str | None) -> str | None:
        """The first option (after the shown one) starting with this letter, or None."""
        ch = (character or "").lower()
        if ch and ch.isalpha():
            for opt in self.options:
                if opt.lower().startswith(ch) and opt != self.value:
                    return opt
        return None

    def type_letter(self, character: str | None) -> bool:
        """Pick the option `pick_for` names; True if one was picked."""
        opt = self.pick_for(character)
        if opt is not None:
            self._choose(opt)
        return opt is not None

    def on_focus(self) -> None:
        self.refresh(layout=True)  # the "<- ->" hint may take a line of its own

    def on_blur(self) -> None:
        self.refresh(layout=True)


class ViewBar(Static):
    """The row of views with their keys; the current one in [brackets]."""

    DEFAULT_CSS = "ViewBar { height: 1; }"

    def __init__(self, views: list[tuple[str, str, str]], **kw) -> None:
        super().__init__("", markup=False, **kw)
        self.views = views  # (id, key, short name)
        self.current = views[0][0]
        self.compact = False

    def show(self, current: str) -> None:
        self.current = current
        t = Text()
        pad = "" if self.compact else " "
        for vid, key, name in self.views:
            if vid == self.current:
                t.append(f"[{key} {name}]", style="bold reverse")
            else:
                t.append(f"{pad}{key} {name}{pad}")
            t.append(" " if self.compact else "")
        if t.plain != getattr(self, "_shown", None):  # unchanged: no redraw
            self._shown = t.plain
            self.update(t)


def update_text(static: Static, text: Text, fixed_width: bool = True) -> None:
    """Show `text` in `static`, laying the screen out again only when its height could change.

    Every `Static.update` asks for a new layout of the whole screen by default, which costs
    more than the rest of an answer's redraw; a widget whose width does not follow its text
    (`fixed_width`) and whose new text has as many lines as the old, none wider than the
    widget, keeps its size, so a repaint is enough."""
    from rich.cells import cell_len  # noqa: PLC0415 - small, and only here

    lines = text.plain.split("\n")
    width = static.content_region.width
    fits = width > 0 and all(cell_len(line) <= width for line in lines)
    same = fixed_width and fits and getattr(static, "_lines_shown", None) == len(lines)
    static._lines_shown = len(lines) if fits else None
    static.update(text, layout=not same)


class Banner(Static):
    """The safety caution, always on screen; the lifting one is louder."""

    DEFAULT_CSS = "Banner { height: auto; }"

    def on_mount(self) -> None:
        """A dialog's banner says what the job screen's says (the same job behind it)."""
        if getattr(self, "_shown", None) is None:
            js = getattr(self.app, "job_screen", None)
            loud = False
            if js is not None and js is not self.screen:
                first = js.query(Banner)
                loud = bool(first and getattr(first.first(), "_shown", False))
            self.show((), loud)

    def show(self, tags, lifting: bool = False) -> None:
        """`lifting`: a lifting device whatever the tags say (a named lifting profile)."""
        loud = bool(lifting or is_lifting(tags))
        if getattr(self, "_shown", None) == loud:  # unchanged: no redraw
            return
        self._shown = loud
        self.set_class(loud, "-lifting")
        self.update(Text("!! " + SHORT_LIFTING + "\n" + SHORT if loud else SHORT))


def fit_text(text: str, width: int) -> str:
    """Every line of `text` within `width` columns, nothing cut: a rule line ("====") is
    shortened, any other long line is wrapped under its own indent (two more for the
    continuation). Lines that fit are left as they are."""
    width = max(20, width)
    out = []
    for line in text.splitlines():
        if len(line) <= width:
            out.append(line)
            continue
        body = line.strip()
        if body and len(set(body)) == 1:  # a rule: as wide as the room
            out.append(line[:width])
            continue
        indent = line[:len(line) - len(line.lstrip())]
        if len(indent) > width // 2:
            indent = ""
        out += textwrap.wrap(body, width, initial_indent=indent,
                             subsequent_indent=indent + "  ", break_long_words=True,
                             break_on_hyphens=False) or [""]
    return "\n".join(out) + ("\n" if text.endswith("\n") else "")
