"""The job being edited in the text UI: a comment-preserving document plus its latest answer.

`Session` holds the `JobDoc` (the file as the user will save it), remembers what was last
saved so the UI can guard unsaved changes, and `evaluate()`s the document into either a
solved `Result` or a list of problems, each keyed like the job file (``loads[1].at``) so the
form can show it beside the field. No textual import here: the tests drive it directly.
"""

from __future__ import annotations

import copy
from dataclasses import dataclass, field
from pathlib import Path

import tomlkit

from shopbeam.errors import InputError, InputErrors, Problem, UnstableBeam
from shopbeam.jobs import jobdoc, library


@dataclass
class Evaluation:
    """What the current document means: a job and its result, or why not."""

    job: object | None = None  # shopbeam.jobs.jobfile.Job
    result: object | None = None  # shopbeam.design.analysis.Result
    problems: list[Problem] = field(default_factory=list)  # errors, then warnings
    unstable: str = ""

    @property
    def errors(self) -> list[Problem]:
        return [p for p in self.problems if not p.warning]

    @property
    def ok(self) -> bool:
        return self.result is not None

    def message_for(self, key: str, elements: bool = False) -> str:
        """The first error (or warning) for exactly this key, in words; with `elements`, for
        an element of the list it names when the key itself has none (beam.braces[1], for
        the field that holds the whole list)."""
        matches = [lambda k: k == key]
        if elements:
            matches.append(lambda k: k.startswith(key + "["))
        for keyed in matches:
            for warning in (False, True):
                for p in self.problems:
                    if keyed(p.key) and p.warning == warning:
                        return ("warning: " if warning else "") + p.message
        return ""

    def messages_under(self, prefix: str) -> list[Problem]:
        return [p for p in self.problems if p.key == prefix or p.key.startswith(prefix + ".")
                or p.key.startswith(prefix + "[")]


def evaluate_doc(doc, filename: str = "") -> Evaluation:
    """Validate and solve a JobDoc. Never raises for anything the user typed."""
    try:
        text, data = doc.text(), doc.plain()
    except Exception as exc:  # noqa: BLE001 - a half-typed job must never crash the screen
        return Evaluation(problems=[Problem(f"cannot read the job: {type(exc).__name__}: {exc}")])
    return evaluate_data(data, text, filename)


def evaluate_data(data: dict, text: str, filename: str = "") -> Evaluation:
    """Validate and solve a job given as plain data plus its text (for line numbers).

    Pure: safe to run in a worker thread on a snapshot of the document. The reader and
    the design modules (numpy, pint) are imported here, in the worker, so the first screen
    is drawn without them."""
    from shopbeam.design.analysis import analyze  # noqa: PLC0415 - startup
    from shopbeam.jobs.jobfile import parse_job_data  # noqa: PLC0415 - startup

    try:
        job = parse_job_data(data, filename, text)
    except InputErrors as exc:
        return Evaluation(problems=list(exc.problems))
    except InputError as exc:
        return Evaluation(problems=[exc.problem])
    except Exception as exc:  # noqa: BLE001 - a half-typed job must never crash the screen
        return Evaluation(problems=[Problem(f"cannot read the job: {type(exc).__name__}: {exc}")])
    try:
        result = analyze(job)
    except UnstableBeam as exc:
        msg = str(exc).removeprefix("unstable beam: ")
        return Evaluation(job=job, unstable=msg, problems=[
            Problem(f"the beam is unstable: {msg}", "supports")] + list(job.warnings))
    except InputError as exc:
        return Evaluation(job=job, problems=[exc.problem] + list(job.warnings))
    except Exception as exc:  # noqa: BLE001
        return Evaluation(job=job, problems=[Problem(
            f"the solve failed ({type(exc).__name__}: {exc}); this is a bug in shopbeam")])
    return Evaluation(job=job, result=result, problems=list(job.warnings))


class Session:
    """One open job: its document, where it lives, and whether it has unsaved changes."""

    def __init__(self, doc, path: Path | None = None, origin: str = "", name: str = "",
                 library_dir=None, evaluate: bool = True):
        self.doc = doc
        self.path = Path(path) if path is not None else None
        self.origin = origin  # "shop" | "user" | "bundled" | "" (a file given on the command line)
        self.name = name or (self.path.stem if self.path else "")
        self.library_dir = library_dir
        self.saved_text = doc.text() if self.path is not None else None
        self.evaluation = Evaluation()
        # Deferred: edits only change the document and bump `version`; the text UI solves
        # a snapshot in a worker and installs the answer if no newer edit came meanwhile.
        self.deferred = False
        self.version = 0
        # the loads as opened or last saved: a load that changes direction is named
        self.baseline_loads = [dict(r) for r in doc.loads()]
        if evaluate:
            self.evaluate()
        else:  # the text UI draws the job first and solves it in a worker (`stale`)
            self.evaluated_version = -1

    # ------------------------------------------------------------------ opening
    @classmethod
    def open(cls, path, library_dir=None, evaluate: bool = True) -> "Session":
        """Open a job file (raises InputError when it is not valid TOML)."""
        doc = jobdoc.load(path)
        origin = ""
        try:
            p = Path(path).resolve()
            for pl in library.places(library_dir):
                try:
                    p.relative_to(pl.folder.resolve())
                    origin = pl.origin
                    break
                except ValueError:
                    continue
        except OSError:
            pass
        return cls(doc, Path(path), origin=origin, library_dir=library_dir, evaluate=evaluate)

    @classmethod
    def new(cls, title: str = "New job", library_dir=None) -> "Session":
        return cls(jobdoc.JobDoc.new(title), None, library_dir=library_dir)

    # ------------------------------------------------------------------ state
    @property
    def label(self) -> str:
        """How the job is named on screen (no machine-specific folders)."""
        if self.origin and self.name:
            return f"{self.origin}:{self.name}"
        if self.path is not None:
            return str(self.path)
        return "(not saved yet)"

    @property
    def dirty(self) -> bool:
        return self.saved_text is None or self.doc.text() != self.saved_text

    @property
    def read_only(self) -> bool:
        return self.origin == "bundled"

    def evaluate(self) -> Evaluation:
        self.evaluation = evaluate_doc(self.doc, str(self.path) if self.path else "")
        self.evaluated_version = self.version
        return self.evaluation

    def touched(self) -> Evaluation:
        """The document was changed directly (through `doc`): note it like any edit."""
        return self._edited()

    def install(self, version: int, evaluation: Evaluation) -> bool:
        """Take a worker's answer for `version`; refused (False) when the job moved on."""
        if version != self.version:
            return False
        self.evaluation = evaluation
        self.evaluated_version = version
        return True

    def _edited(self) -> Evaluation:
        self.version += 1
        return self.evaluation if self.deferred else self.evaluate()

    def snapshot(self) -> tuple[int, dict, str, str]:
        """(version, plain data, text, file name) of the document as it stands now."""
        return (self.version, self.doc.plain(), self.doc.text(),
                str(self.path) if self.path else "")

    @property
    def stale(self) -> bool:
        """The shown evaluation is older than the document (a solve is on its way)."""
        return self.evaluated_version != self.version

    # ------------------------------------------------------------------ edits
    def _node(self, path: list):
        """The tomlkit table at `path` (keys and row indices), or None."""
        node = self.doc.doc
        try:
            for p in path:
                node = node[p]
        except (KeyError, IndexError, TypeError):
            return None
        return node

    def _forget_or_restore(self, path: list, key: str, value) -> bool:
        """A key emptied in a field leaves the file; typed again, it comes back in its old
        place with its comment (typing slowly through an empty field gives the same file as
        typing fast). Returns True when it was put back here."""
        node = self._node(path)
        where = (tuple(path), key)
        places = self.__dict__.setdefault("_places", {})
        if node is None or jobdoc.container_of(node) is None or not hasattr(node, "get"):
            return False
        orders = self.__dict__.setdefault("_orders", {})
        if value is None:
            i = jobdoc.key_index(node, key) if key in node else None
            if i is not None:
                item = node.item(key) if hasattr(node, "item") else None
                places[where] = (i, getattr(item, "trivia", None))
                _merge_order(orders.setdefault(tuple(path), []), _keys_of(node))
            return False
        if key in node or where not in places:
            return False
        i, trivia = places.pop(where)
        jobdoc._check_value(key, value, ".".join(map(str, [*path, key])))
        i = _place_after(node, key, i, orders.get(tuple(path), []))
        return jobdoc.insert_key(node, i, key, value, trivia)

    def set(self, dotted: str, value) -> Evaluation:
        """Set a key (None removes it) and re-evaluate."""
        try:
            *path, key = dotted.split(".")
            if self._forget_or_restore(path, key, value):
                return self._edited()
            self.doc.set_value(dotted, value)
        except InputError as exc:
            self.evaluate()
            self.evaluation.problems.insert(0, exc.problem)
            return self.evaluation
        return self._edited()

    def set_row(self, table: str, index: int, key: str, value) -> Evaluation:
        setter = self.doc.set_load if table == "loads" else self.doc.set_support
        try:
            if self._forget_or_restore([table, index], key, value):
                return self._edited()
            setter(index, **{key: value})
        except InputError as exc:
            self.evaluate()
            self.evaluation.problems.insert(0, exc.problem)
            return self.evaluation
        return self._edited()

    def _forget_places(self) -> None:
        """Drop where emptied keys stood and the key orders they came back by
        (`_forget_or_restore`): rows were added, removed or put back, so their indices
        moved."""
        self.__dict__.pop("_places", None)
        self.__dict__.pop("_orders", None)

    def rows(self, table: str) -> list[dict]:
        return self.doc.loads() if table == "loads" else self.doc.supports()

    def add_row(self, table: str, **fields) -> int:
        if table == "loads":
            i = self.doc.add_load(**fields)
        else:
            i = self.doc.add_support(**fields)
        self._forget_places()  # row indices moved
        self._edited()
        return i

    def remove_row(self, table: str, index: int) -> None:
        """Remove one row; `undo_remove` puts the removed ones back, last first."""
        before = self.doc.text()
        row = copy.deepcopy(self.doc.doc[table][index])
        if table == "loads":
            self.doc.remove_load(index)
        else:
            self.doc.remove_support(index)
        self.removals = self.removals + [(table, index, before, self.doc.text(), row)]
        self._forget_places()  # row indices moved
        self._edited()

    # (table, index, text before, text after, the row) of each removal, the last one last
    removals: list = []

    def undo_remove(self) -> tuple[str, int] | None:
        """Put the last removed row back at its place: with the file exactly as it was
        when nothing was changed since (its comments too), else the row itself (its own
        line comments) at its old index. (table, index), or None when nothing to undo.
        Called again, it puts back the one removed before that, and so on."""
        if not self.removals:
            return None
        table, index, before, after, row = self.removals[-1]
        self.removals = self.removals[:-1]
        if self.doc.text() == after:
            body, _bom = jobdoc._split_bom(before)
            self.doc.doc = jobdoc._parse(body)
        else:
            rows = self.doc.doc.get(table)
            if rows is None:
                self.doc.doc.add(table, tomlkit.aot())
                rows = self.doc.doc[table]
            rows.insert(min(index, len(rows)), row)
            index = min(index, len(rows) - 1)
        self._forget_places()
        self._edited()
        return table, index

    # ------------------------------------------------------------------ saving
    def save(self, *, overwrite: bool = False):
        """Save where it came from (a bundled preset is saved as a user copy).

        Raises storage.SaveConflict (someone changed the file), InputError (no file yet).
        """
        if self.path is None:
            raise InputError("this job has no file yet: use Save as")
        if self.read_only:
            return self.save_as(self.name, "user", overwrite=overwrite)
        base = self.doc.opened
        opened = library.save_job(self.doc.text(), path=self.path, base=base,
                                  overwrite=overwrite)
        self._saved(opened, self.origin)
        return opened.path

    def save_as(self, name: str, to: str = "user", *, overwrite: bool = False):
        opened = library.save_job(self.doc.text(), name=name, to=to,
                                  library_dir=self.library_dir, overwrite=overwrite)
        self._saved(opened, to)
        self.name = Path(opened.path).stem
        return opened.path

    def save_recovery(self) -> Path:
        """Write the unsaved job beside its file (or in the user library) as
        NAME.recovered.toml (-2, -3 ... when taken); never over any file. For the text
        UI's last act when shopbeam itself fails: the work is kept."""
        from shopbeam.jobs import storage  # noqa: PLC0415 - only on this rare path

        folder = self.path.parent if self.path is not None and not self.read_only \
            else library.user_dir()
        stem = self.path.stem if self.path is not None else \
            storage.suggest_name(str(self.doc.get("title") or "job"))
        folder.mkdir(parents=True, exist_ok=True)
        for n in range(1, 1000):
            target = folder / f"{stem}.recovered{'' if n == 1 else f'-{n}'}.toml"
            if target.exists():
                continue
            try:
                return storage.save_text(target, self.doc.text()).path
            except storage.NameTaken:
                continue
        raise OSError(f"no free name for a recovery copy in {folder}")

    def _saved(self, opened, origin: str) -> None:
        self.doc.opened = opened
        self.doc.path = Path(opened.path)
        self.path = Path(opened.path)
        self.origin = origin
        self.name = self.path.stem
        self.saved_text = opened.text
        self.baseline_loads = [dict(r) for r in self.doc.loads()]


def _keys_of(node) -> list[str]:
    """The keys of a table in the order of its lines."""
    box = jobdoc.container_of(node)
    return [k.key for k, _v in box.body if k is not None] if box is not None else []


def _merge_order(order: list[str], keys: list[str]) -> None:
    """Fold a table's key order now into `order`, its order as first seen (a key new since
    goes in after the key it follows now)."""
    for n, k in enumerate(keys):
        if k in order:
            continue
        before = next((b for b in reversed(keys[:n]) if b in order), None)
        order.insert(order.index(before) + 1 if before is not None else 0, k)


def _place_after(node, key: str, i: int, order: list[str]) -> int:
    """The line at which `key` comes back into a table: after the nearest key that stood
    before it (in `order`) and is there now, so keys that left and come back in any order
    each land where they were. `i`, the line it left from, is kept when it still lies in that
    gap (a comment line above the key stays above it)."""
    if key not in order:
        return i
    pos = order.index(key)
    here = _keys_of(node)
    before = next((k for k in reversed(order[:pos]) if k in here), None)
    after = next((k for k in order[pos + 1:] if k in here), None)
    lo = jobdoc.key_index(node, before) + 1 if before is not None else 0
    box = jobdoc.container_of(node)
    hi = jobdoc.key_index(node, after) if after is not None else len(box.body)
    return i if lo <= i <= hi else lo
