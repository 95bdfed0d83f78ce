"""Job files as editable text: comments, key order and layout survive an edit.

The job reader (`shopbeam.jobs.jobfile`) turns a file into numbers for the solver; this module is
the other side, for the text UI and the library: it keeps the file as a tomlkit document so
that changing one load and saving changes exactly that line, and `git diff` shows one line.
`new_job_text` writes the commented template that `shopbeam new` starts from. Writers here
always write `schema = 1`. Nothing in a job file is ever evaluated as code.
"""

from __future__ import annotations

import os
import re
from collections.abc import MutableMapping
from pathlib import Path

import tomlkit
from tomlkit.exceptions import ParseError
from tomlkit.items import AoT, Array, InlineTable, Table

from shopbeam.errors import InputError
from shopbeam.jobs import library, storage

SCHEMA = 1

# Keys whose value is a dimensional quantity: a string with its unit, never a bare number.
DIMENSIONAL = {"at", "start", "end", "value", "length", "stiffness", "total",
               "tributary_width"}

HEADER = """\
# shopbeam job file (schema 1): plain text, safe to edit by hand, diff and e-mail.
# Signs: x runs along the beam from the left end (x = 0) to its length.
#   Forces are + UP, so gravity loads are NEGATIVE: value = "-300 lbf".
#   Couples (applied moments) are + COUNTERCLOCKWISE.
# Units: every value is a string with its unit: "8 ft", "10 ft 6 in", "1-1/2 in",
#   "-300 lbf", "-25 lbf/ft", "-1.2 kN", "150 lbf*ft". A bare number is an error.
# Check it:  shopbeam check FILE      Solve it:  shopbeam solve FILE
"""


def _quote(text: str) -> str:
    return tomlkit.string(str(text)).as_string()


def _pad(code: str, comment: str, col: int = 32) -> str:
    return code.ljust(col - 1) + " " + comment


def new_job_text(title: str, *, length: str = "8 ft", section: str = "HSS4x4x1/4",
                 material: str = "A500-C", tags=(), units: str = "us",
                 notes: str = "") -> str:
    """A commented job template: a simple span on two supports under one uniform load.

    Every line a newcomer needs is there with its unit, plus commented-out examples of the
    other support and load kinds, so the file teaches the format as it is filled in.
    """
    tags_text = "[" + ", ".join(_quote(t) for t in tags) + "]"
    lines = [
        HEADER,
        "schema = 1",
        f"title = {_quote(title)}",
        f"notes = {_quote(notes)}" if notes else '# notes = "free text: where, who, why"',
        _pad(f"units = {_quote(units)}", '# display units: "us" or "si"'),
        _pad(f"tags = {tags_text}", '# e.g. ["rack"]; "lifting" marks a lifting device'),
        "",
        "[beam]",
        f"length = {_quote(length)}",
        _pad(f"section = {_quote(section)}", "# a catalog designation: shopbeam section NAME"),
        f"material = {_quote(material)}",
        "self_weight = true              # the member's own weight, downward, whole length",
        "",
        "[[supports]]                    # type: fixed | pin | roller | spring | hinge",
        'at = "0 ft"',
        'type = "pin"',
        "",
        "[[supports]]",
        f"at = {_quote(length)}",
        'type = "roller"',
        "",
        "[[loads]]                       # type: point | moment | uniform | linear",
        'type = "uniform"',
        'start = "0 ft"',
        f"end = {_quote(length)}",
        'value = "-50 lbf/ft"            # negative: pushes down',
        'label = "stored stock"',
        "",
        "# More loads, each under its own [[loads]] line:",
        '#   point:   at = "4 ft", value = "-300 lbf"',
        '#   moment:  at = "8 ft", value = "150 lbf*ft"  (+ counterclockwise)',
        '#   linear:  start = "0 ft", end = "4 ft", value = ["0 lbf/ft", "-60 lbf/ft"]',
        '#   dead (not scaled by capacity): case = "dead"',
        "",
        "[criteria]",
        'deflection = "L/240"            # "L/n" per span, or a limit such as "0.25 in"',
        "safety_factor = 1.67            # on yield in bending: never past Fy S / this",
        "",
    ]
    return "\n".join(lines)


def _parse(text: str, filename: str = ""):
    try:
        return tomlkit.parse(text)
    except ParseError as exc:
        msg = str(exc)
        cut = msg.find(" at line ")
        raise InputError(f"not valid TOML: {msg[:cut] if cut > 0 else msg}",
                         file=filename, line=getattr(exc, "line", None)) from None


class JobDoc:
    """One job file as a tomlkit document plus what the file was when it was opened.

    Editing helpers change only what they are asked to; `save()` writes atomically and
    refuses to overwrite a file someone else changed since it was opened (see `storage`).
    Load and support indices are 0-based positions in the file's `[[loads]]` and
    `[[supports]]` lists.
    """

    def __init__(self, doc, path: Path | None = None, opened: storage.Opened | None = None,
                 bom: bool = False):
        self.doc = doc
        self.path = Path(path) if path is not None else None
        self.opened = opened
        self.bom = bom  # the file began with a UTF-8 byte-order mark: it is kept on save

    # ------------------------------------------------------------------ in and out
    @classmethod
    def load(cls, path: str | os.PathLike) -> "JobDoc":
        opened = storage.open_text(path)
        body, bom = _split_bom(opened.text)
        return cls(_parse(body, str(opened.path)), opened.path, opened, bom)

    @classmethod
    def parse(cls, text: str, filename: str = "") -> "JobDoc":
        body, bom = _split_bom(text)
        return cls(_parse(body, filename), Path(filename) if filename else None, None, bom)

    @classmethod
    def new(cls, title: str, **kw) -> "JobDoc":
        return cls.parse(new_job_text(title, **kw))

    def text(self) -> str:
        return (BOM if self.bom else "") + tomlkit.dumps(self.doc)

    def plain(self) -> dict:
        """The document as plain Python dicts, lists and strings."""
        return self.doc.unwrap()

    @property
    def changed(self) -> bool:
        return self.opened is None or self.text() != self.opened.text

    def save(self, path: str | os.PathLike | None = None, *, overwrite: bool = False) -> Path:
        """Save to `path` (default: where it was opened). See `storage.save_text`.

        Saving back to the file it came from uses the fingerprint taken when it was opened;
        saving to any other path is a new file (refused if it exists, unless `overwrite`).
        A bundled preset is never written: it is saved as a copy in the user library.
        """
        target = Path(path) if path is not None else self.path
        if target is None:
            raise InputError("this job has no file yet; give a name or path to save it as")
        self._ensure_schema()
        if library.is_bundled(target):
            # bundled presets are read-only: "save" means "save a copy" to the user library
            self.opened = library.save_job(self.text(), path=target, overwrite=overwrite)
            self.path = self.opened.path
            return self.path
        same = (self.opened is not None and self.opened.path is not None
                and Path(target).resolve() == Path(self.opened.path).resolve())
        base = self.opened if same else None
        self.opened = storage.save_text(target, self.text(), base, overwrite=overwrite)
        self.path = self.opened.path
        return self.path

    def _ensure_schema(self) -> None:
        if "schema" not in self.doc:
            # first key of the file, after any leading comment block
            body = self.doc.body
            i = 0
            while i < len(body) and body[i][0] is None:
                i += 1
            if i < len(body):
                self.doc._insert_at(i, "schema", SCHEMA)
            else:
                self.doc.add("schema", SCHEMA)

    # ------------------------------------------------------------------ plain keys
    def get(self, dotted: str, default=None):
        node = self.doc
        for part in dotted.split("."):
            if not hasattr(node, "get") or part not in node:
                return default
            node = node[part]
        return node.unwrap() if hasattr(node, "unwrap") else node

    def set_value(self, dotted: str, value) -> None:
        """Set a key such as "title", "beam.length" or "criteria.deflection"; None removes it."""
        parts = dotted.split(".")
        node = self.doc
        for part in parts[:-1]:
            if part not in node:
                if value is None:
                    return
                node[part] = _table()
            node = node[part]
            if not isinstance(node, (Table, InlineTable, MutableMapping)):
                raise InputError(f"'{part}' is not a table", key=dotted)
        _assign(node, parts[-1], value, dotted)

    def set_title(self, title: str) -> None:
        self.set_value("title", str(title))

    def set_notes(self, notes: str | None) -> None:
        self.set_value("notes", notes or None)

    def set_tags(self, tags) -> None:
        arr = tomlkit.array()
        arr.extend(str(t) for t in tags)
        self.set_value("tags", arr)

    def set_units(self, system: str) -> None:
        self.set_value("units", system)

    def set_length(self, length: str) -> None:
        self.set_value("beam.length", length)

    def set_section(self, section) -> None:
        """A designation string, or a dict for an inline `[beam.section]` table."""
        self.set_value("beam.section", _table(section) if isinstance(section, dict) else section)

    def set_material(self, material) -> None:
        """A material key, or a dict for an inline `[beam.material]` table."""
        self.set_value("beam.material",
                       _table(material) if isinstance(material, dict) else material)

    def set_criteria(self, **fields) -> None:
        for k, v in fields.items():
            self.set_value(f"criteria.{k}", v)

    # ------------------------------------------------------------------ lists
    def _list(self, name: str):
        return self.doc[name] if name in self.doc else None

    def _row(self, name: str, index: int):
        rows = self._list(name)
        n = len(rows) if rows is not None else 0
        if not isinstance(index, int) or not -n <= index < n:
            raise InputError(f"there is no {name[:-1]} at index {index}: the job has {n} "
                             f"{name} (indices 0 to {n - 1})" if n else
                             f"there is no {name[:-1]} at index {index}: the job has no {name}",
                             key=f"{name}[{index}]")
        return rows[index]

    def loads(self) -> list[dict]:
        rows = self._list("loads")
        return [dict(r.unwrap()) for r in rows] if rows is not None else []

    def supports(self) -> list[dict]:
        rows = self._list("supports")
        return [dict(r.unwrap()) for r in rows] if rows is not None else []

    def set_load(self, index: int, **fields) -> None:
        """Change fields of one load (e.g. value="-400 lbf"); a field set to None is removed."""
        row = self._row("loads", index)
        for k, v in fields.items():
            _assign(row, k, v, f"loads[{index}].{k}")

    def set_support(self, index: int, **fields) -> None:
        row = self._row("supports", index)
        for k, v in fields.items():
            _assign(row, k, v, f"supports[{index}].{k}")

    def set_moving(self, index: int, **fields) -> None:
        """Change fields of one [[moving]] wheel set (e.g. travel=["0 ft", "20 ft"])."""
        row = self._row("moving", index)
        for k, v in fields.items():
            _assign(row, k, v, f"moving[{index}].{k}")

    def add_load(self, type: str, **fields) -> int:
        """Append a load (`type` first, then the fields in the order given); its index."""
        return self._add("loads", {"type": type, **fields})

    def add_support(self, type: str, at: str, **fields) -> int:
        return self._add("supports", {"at": at, "type": type, **fields})

    def remove_load(self, index: int) -> None:
        self._remove("loads", index)

    def remove_support(self, index: int) -> None:
        self._remove("supports", index)

    def _add(self, name: str, fields: dict) -> int:
        fields = {k: v for k, v in fields.items() if v is not None}
        rows = self._list(name)
        n = len(rows) if rows is not None else 0
        for k, v in fields.items():
            _check_value(k, v, f"{name}[{n}].{k}")
        if rows is None:
            # a parsed array of tables lays out like a hand-written one
            if not self.text().endswith("\n\n") and self.text():
                self.doc.add(tomlkit.nl())
            fresh = tomlkit.parse(tomlkit.dumps({name: [fields]}) + "\n")
            self.doc.add(name, fresh[name])
            return 0
        if isinstance(rows, AoT):
            row = tomlkit.table()
            for k, v in fields.items():
                row.add(k, _item(v))
            row.add(tomlkit.nl())
            if len(rows):
                _end_with_blank_line(rows[-1])
            rows.append(row)
        elif isinstance(rows, Array):
            it = tomlkit.inline_table()
            it.update(fields)
            rows.append(it)
        else:
            raise InputError(f"'{name}' must be a list of tables", key=name)
        return len(rows) - 1

    def _remove(self, name: str, index: int) -> None:
        """Remove one row with its own comment (the comment lines right above its header);
        the next row keeps its comment, and nothing else changes."""
        self._row(name, index)
        rows = self._list(name)
        n = len(rows)
        index = index % n
        if isinstance(rows, AoT):
            text = tomlkit.dumps(self.doc)
            cut = _cut_row(text, name, index)
            if cut is not None:
                try:
                    doc = tomlkit.parse(cut)
                except ParseError:
                    doc = None
                before = [r.unwrap() for i, r in enumerate(rows) if i != index]
                # (the last row gone, the key goes with it: no "loads = []" left at the top)
                if doc is not None and _without(doc, name) == _without(self.doc, name) and (
                        [r.unwrap() for r in doc[name]] == before if name in doc
                        else not before):
                    self.doc = doc
                    return
        del rows[index]
        if not len(rows):
            # an empty array of tables is written "name = []" at the top of the file, where
            # a [[name]] table added by hand below would no longer parse
            del self.doc[name]


BOM = "\ufeff"


def _split_bom(text: str) -> tuple[str, bool]:
    return (text[1:], True) if text.startswith(BOM) else (text, False)


def _without(doc, name: str) -> dict:
    plain = doc.unwrap()
    plain.pop(name, None)
    return plain


_ANY_HEADER = re.compile(r"^\s*\[")
_COMMENT = re.compile(r"^\s*#")


def _cut_row(text: str, name: str, index: int) -> str | None:
    """The text without row `index` of the array of tables `name` and its own comment
    block (comment lines directly above its header). None when the layout is not plain
    enough to be sure (the caller then lets tomlkit remove it)."""
    lines = text.split("\n")  # TOML's lines: a U+2028 or form feed in a string is no end
    lines = [ln + "\n" for ln in lines[:-1]] + ([lines[-1]] if lines[-1] else [])
    own = re.compile(r"^\s*\[\[\s*" + re.escape(name) + r"\s*\]\]\s*(#.*)?$")
    headers = [i for i, ln in enumerate(lines) if _ANY_HEADER.match(ln)
               and re.match(r"^\s*\[\[?\s*[A-Za-z0-9_.\"' -]+\s*\]\]?\s*(#.*)?$", ln)]
    mine = [i for i in headers if own.match(lines[i])]
    if index >= len(mine):
        return None

    def comment_top(h: int) -> int:
        j = h
        while j > 0 and _COMMENT.match(lines[j - 1]):
            j -= 1
        return j

    start = comment_top(mine[index])
    after = [i for i in headers if i > mine[index]]
    end = comment_top(after[0]) if after else len(lines)
    if end <= mine[index]:
        return None
    return "".join(lines[:start] + lines[end:])


def _end_with_blank_line(table) -> None:
    """Make sure a table's text ends with an empty line before the next header."""
    text = table.as_string()
    if not text.endswith("\n\n"):
        table.add(tomlkit.nl())


def _table(fields: dict | None = None):
    t = tomlkit.table()
    for k, v in (fields or {}).items():
        t.add(k, _item(v))
    return t


def _toml_item(value):
    """The TOML item for a plain value: a text with line breaks (notes) as a multi-line
    string, as a person writes one, not one line of \n escapes."""
    if isinstance(value, str) and "\n" in value:
        return tomlkit.string(value, multiline=True)
    return tomlkit.item(_item(value))


def _item(value):
    if isinstance(value, (list, tuple)):
        arr = tomlkit.array()
        arr.extend(value)
        return arr
    return value


def _check_value(key: str, value, where: str) -> None:
    if key in DIMENSIONAL and isinstance(value, (int, float)) and not isinstance(value, bool):
        raise InputError(f"a bare number ({value}) needs its unit, e.g. \"{value} ft\" or "
                         f"\"{value} lbf\"", key=where)
    if key in DIMENSIONAL and isinstance(value, (list, tuple)):
        for v in value:
            _check_value(key, v, where)


def _assign(node, key: str, value, where: str) -> None:
    """Set node[key] = value keeping the old value's inline comment and spacing."""
    if value is None:
        if key in node:
            del node[key]
        return
    _check_value(key, value, where)
    old = node.get(key) if hasattr(node, "get") else None
    plain = value.unwrap() if hasattr(value, "unwrap") else value
    if isinstance(plain, tuple):
        plain = list(plain)
    if old is not None and hasattr(old, "unwrap") and not isinstance(old, (Table, AoT)):
        if type(old.unwrap()) is type(plain) and old.unwrap() == plain and (
                not hasattr(value, "as_string") or value.as_string() == old.as_string()):
            return  # unchanged: keep its layout and comments exactly
        if isinstance(old, Array) and isinstance(plain, list) and len(old) == len(plain) \
                and all(not isinstance(v, (list, dict)) for v in plain):
            for i, v in enumerate(plain):  # item by item: comments inside the value stay
                if old[i] != v:
                    old[i] = v
            return
    new = _toml_item(plain if isinstance(plain, str) else value) \
        if not hasattr(value, "trivia") else value
    if old is not None and hasattr(old, "trivia") and not isinstance(new, (Table, AoT)) \
            and not isinstance(old, (Table, AoT)):
        t, n = old.trivia, new.trivia
        n.indent, n.comment_ws, n.comment, n.trail = t.indent, t.comment_ws, t.comment, t.trail
    if isinstance(new, Table) and key not in node:
        new.add(tomlkit.nl())
    if key not in node and not isinstance(new, (Table, AoT)):
        # a new key of a table goes after its last key, before the blank line that ends it
        box = container_of(node)
        if box is not None and isinstance(node, Table):
            i = len(box.body)
            while i > 0 and box.body[i - 1][0] is None and \
                    isinstance(box.body[i - 1][1], tomlkit.items.Whitespace):
                i -= 1
            if 0 < i < len(box.body) and insert_key(node, i, key, new):
                return
    node[key] = new


def number_as_typed(value, text: str):
    """`value` as a TOML number written the way it was typed ("1.670", "2"), when that text
    is a TOML number of the same value; else the plain value (written the usual way)."""
    try:
        parsed = tomlkit.parse(f"x = {text}\n")["x"]
    except Exception:  # noqa: BLE001 - not TOML as typed (".5", "01"): the usual way
        return value
    if type(parsed.unwrap()) is not type(value) or parsed.unwrap() != value:
        return value
    return parsed


def container_of(node):
    """The tomlkit container that holds a table's lines (the document is its own)."""
    if isinstance(node, tomlkit.container.Container):
        return node
    inner = getattr(node, "value", None)
    return inner if isinstance(inner, tomlkit.container.Container) else None


def key_index(node, key: str) -> int | None:
    """Where `key` stands among the lines of a table (None when it is not there)."""
    box = container_of(node)
    if box is None:
        return None
    return next((n for n, (k, _v) in enumerate(box.body) if k is not None and k.key == key),
                None)


def insert_key(node, index: int, key: str, value, trivia=None) -> bool:
    """Put `key = value` back at line `index` of a table (with the comment and spacing of
    `trivia`). A table's lines and its keys are two records in tomlkit: both are kept in
    step, so the key can be read, changed and removed again afterwards. False when the
    table has no such place (the caller then sets the key the ordinary way)."""
    box = container_of(node)
    if box is None or key in node or not 0 <= index <= len(box.body):
        return False
    item = _toml_item(value)
    if trivia is not None:
        t = item.trivia
        t.indent, t.comment_ws, t.comment, t.trail = (trivia.indent, trivia.comment_ws,
                                                      trivia.comment, trivia.trail)
    if index == len(box.body):
        node[key] = item
        return True
    box._insert_at(index, key, item)
    if box is not node and isinstance(node, dict):
        dict.__setitem__(node, key, box[key] if key in box else item)
    return True


def load(path: str | os.PathLike) -> JobDoc:
    """Open a job file for editing."""
    return JobDoc.load(path)


def parse(text: str, filename: str = "") -> JobDoc:
    return JobDoc.parse(text, filename)
