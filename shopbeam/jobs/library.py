"""The preset library: the shop's, the user's and the bundled job files, in that order.

Three places, searched in this order and always shown with their origin:

- shop: a folder several people share (``--library DIR`` or ``SHOPBEAM_LIBRARY``);
- user: the user's own jobs (platformdirs user data dir ``shopbeam/jobs``; the
  ``SHOPBEAM_USER_DIR`` environment variable names another folder, for tests);
- bundled: the presets that ship with shopbeam (read-only: saving one saves a copy to user).

An entry is a job file by its name (the file name without ``.toml``). Reading an entry for
the list uses only `tomllib` (data, never code); a file that does not parse is still listed,
with its problem. Writes go through `shopbeam.jobs.storage` (atomic, locked, conflict-checked).
The command line for it is `shopbeam.cli.library`.
"""

from __future__ import annotations

import difflib
import os
import tomllib
from dataclasses import dataclass, field
from pathlib import Path

from shopbeam.cautions import is_lifting, normal_tag
from shopbeam.errors import InputError
from shopbeam.jobs import storage
from shopbeam.jobs.limits import MAX_FILE_BYTES, prescan

ORIGINS = ("shop", "user", "bundled")
ENV_SHOP = "SHOPBEAM_LIBRARY"
ENV_USER = "SHOPBEAM_USER_DIR"


# --------------------------------------------------------------------------- places

@dataclass(frozen=True)
class Place:
    origin: str          # "shop" | "user" | "bundled"
    folder: Path
    writable: bool


def shop_dir(library_dir=None) -> Path | None:
    given = library_dir if library_dir not in (None, "") else os.environ.get(ENV_SHOP) or None
    return Path(given).expanduser() if given else None


def user_dir() -> Path:
    given = os.environ.get(ENV_USER)
    if given:
        return Path(given).expanduser()
    import platformdirs

    return Path(platformdirs.user_data_dir("shopbeam")) / "jobs"


def bundled_dir() -> Path | None:
    """The bundled presets: the repository's top-level ``presets/`` (editable install), or a
    copy packaged as ``shopbeam/presets`` (a built wheel)."""
    here = Path(__file__).resolve().parents[1]  # the shopbeam package
    for cand in (here.parent / "presets", here / "presets"):
        if cand.is_dir():
            return cand
    return None


def places(library_dir=None) -> list[Place]:
    out = []
    shop = shop_dir(library_dir)
    if shop is not None:
        out.append(Place("shop", shop, True))
    out.append(Place("user", user_dir(), True))
    b = bundled_dir()
    if b is not None:
        out.append(Place("bundled", b, False))
    return out


def place(origin: str, library_dir=None) -> Place:
    for p in places(library_dir):
        if p.origin == origin:
            return p
    if origin == "shop":
        raise InputError("no shop library is set: give --library DIR or set "
                         f"{ENV_SHOP} to the shared folder", key="--to")
    raise InputError(f"unknown library '{origin}'; choose user or shop", key="--to")


def is_bundled(path) -> bool:
    b = bundled_dir()
    if b is None:
        return False
    try:
        Path(path).resolve().relative_to(b.resolve())
        return True
    except ValueError:
        return False


# --------------------------------------------------------------------------- entries

@dataclass(frozen=True)
class Entry:
    name: str
    title: str
    tags: tuple[str, ...]
    origin: str
    path: Path
    notes: str = ""
    problem: str = ""                 # set when the file cannot be read as TOML
    shadowed_by: str = ""             # origin of an entry of the same name found earlier
    text: str = field(default="", repr=False, compare=False)
    lifting: bool = False  # tagged lifting or naming a [criteria] lifting profile

    @property
    def label(self) -> str:
        return f"{self.origin}:{self.name}"

    @property
    def read_only(self) -> bool:
        return self.origin == "bundled"


def _read_entry(path: Path, origin: str) -> Entry:
    outside = _outside_link(path)
    if outside:
        return Entry(path.stem, "(link not followed)", (), origin, path, problem=outside)
    try:
        size = path.stat().st_size
    except OSError as exc:
        return Entry(path.stem, "(unreadable)", (), origin, path, problem=str(exc))
    if size > MAX_FILE_BYTES:  # as the job reader refuses it, before reading it all
        return Entry(path.stem, "(too large)", (), origin, path,
                     problem=f"the file is {size:,} bytes, larger than a job file can be "
                     f"({MAX_FILE_BYTES // 1000} kB); is it the right file?")
    try:
        text = storage.read_bytes(path).decode("utf-8")
    except InputError as exc:
        return Entry(path.stem, "(unreadable)", (), origin, path, problem=exc.problem.message)
    except (OSError, UnicodeDecodeError) as exc:
        return Entry(path.stem, "(unreadable)", (), origin, path, problem=str(exc))
    shape = prescan(text)  # nesting and key counts the parser would choke on
    if shape:
        return Entry(path.stem, "(not a job file)", (), origin, path,
                     problem=f"line {shape[0][1]}: {shape[0][0]}", text=text)
    try:
        data = tomllib.loads(text.removeprefix("\ufeff"))
    except tomllib.TOMLDecodeError as exc:
        return Entry(path.stem, "(not valid TOML)", (), origin, path, problem=str(exc),
                     text=text)
    title = data.get("title")
    tags = data.get("tags")
    tags = tuple(dict.fromkeys(normal_tag(t) for t in tags if str(t).strip())) \
        if isinstance(tags, list) else ()  # compared as the job reader does
    notes = data.get("notes") if isinstance(data.get("notes"), str) else ""
    crit = data.get("criteria")
    prof = crit.get("lifting") if isinstance(crit, dict) else None
    lifting = is_lifting(tags, prof.strip() if isinstance(prof, str) else "")
    return Entry(path.stem, str(title) if title is not None else "(no title)", tags, origin,
                 path, notes=notes, text=text, lifting=lifting)


def _outside_link(path: Path) -> str:
    """Why a library entry is not followed ("" when it is fine): a symbolic link whose
    target is outside the library folder (or is not there) is never read or written."""
    if not path.is_symlink():
        return ""
    real = Path(os.path.realpath(path))
    if real.parent != Path(os.path.realpath(path.parent)):
        return ("a symbolic link to a file outside the library folder; shopbeam does not "
                "follow it (copy the file into the folder instead)")
    if not real.is_file():
        return "a symbolic link to something that is not a job file"
    return ""


def _files(folder: Path) -> list[Path]:
    """Job files in a folder: every NAME.toml that is not a dot file (lstat only: nothing
    is opened here). A FIFO, device or folder of that name is listed too and refused when
    read (`_read_entry`: a problem row), never opened and never left out unsaid."""
    import stat

    try:
        names = list(folder.iterdir())
    except (FileNotFoundError, NotADirectoryError, PermissionError):
        return []
    files = []
    for p in names:
        if p.suffix != storage.SUFFIX or p.name.startswith("."):
            continue
        try:
            mode = os.lstat(p).st_mode
        except OSError:
            continue
        if stat.S_ISREG(mode) or stat.S_ISLNK(mode) or stat.S_ISFIFO(mode) \
                or stat.S_ISCHR(mode) or stat.S_ISBLK(mode) or stat.S_ISSOCK(mode) \
                or stat.S_ISDIR(mode):
            files.append(p)
    return sorted(files, key=lambda p: p.name.lower())


def entries(library_dir=None, *, tag: str | None = None, search: str | None = None
            ) -> list[Entry]:
    """Every job in the three places, shop first, each with its origin.

    An entry whose name also appears in an earlier place is kept but marked `shadowed_by`
    (find() returns the earlier one). `tag` keeps entries with that tag (any case);
    `search` keeps entries whose name, title, tags, notes or text contain every word.
    """
    out: list[Entry] = []
    seen: dict[str, str] = {}
    for pl in places(library_dir):
        if pl.writable:
            try:
                storage.tidy(pl.folder)  # temps of saves killed earlier
            except (OSError, InputError):
                pass
        for path in _files(pl.folder):
            e = _read_entry(path, pl.origin)
            key = e.name.lower()
            if key in seen:
                e = _replace(e, shadowed_by=seen[key])
            else:
                seen[key] = pl.origin
            out.append(e)
    if tag:
        t = normal_tag(tag)
        out = [e for e in out if t in e.tags]
    if search:
        words = search.lower().split()
        out = [e for e in out if all(w in _haystack(e) for w in words)]
    return out


def _replace(e: Entry, **kw) -> Entry:
    from dataclasses import replace

    return replace(e, **kw)


def _haystack(e: Entry) -> str:
    return " ".join([e.name, e.title, " ".join(e.tags), e.notes, e.text]).lower()


def _split_label(name: str) -> tuple[str | None, str]:
    if ":" in name:
        origin, rest = name.split(":", 1)
        if origin in ORIGINS:
            return origin, rest
    return None, name


def safe_library_name(name: str, key: str = "name") -> str:
    """A library name from what a person typed: spaces and odd characters become '-'
    ("bay 4 arm" -> "bay-4-arm"); a path (separators, '..', a drive) is still refused."""
    text = str(name if name is not None else "").strip()
    try:
        return storage.safe_name(text, key=key)
    except InputError:
        if (not text or "/" in text or "\\" in text or ".." in text or os.path.isabs(text)
                or (len(text) > 1 and text[1] == ":")):
            raise
        made = storage.suggest_name(text)
        return storage.safe_name(made, key=key)


def _near(typed: str, names: list[str], cutoff: float = 0.5) -> list[str]:
    low = [n.lower() for n in names]
    close = difflib.get_close_matches(typed.lower(), low, n=3, cutoff=cutoff)
    out = [n for n in names if n.lower() in close]
    # also offer names that contain what was typed ("rack" -> "pallet-rack-beam")
    out += [n for n in names if typed.lower() in n.lower() and n not in out]
    return out[:3]


def find(name: str, library_dir=None) -> Entry:
    """The job called `name` (first match: shop, user, bundled), or an InputError that
    suggests near names. ``user:NAME`` (or shop:, bundled:) picks one place."""
    origin, bare = _split_label(str(name).strip())
    stem = safe_library_name(bare, key="name")
    all_entries = entries(library_dir)
    for e in all_entries:
        if e.name.lower() == stem.lower() and (origin is None or e.origin == origin):
            return e
    names = sorted({e.name for e in all_entries if origin is None or e.origin == origin})
    close = _near(stem, names)
    if origin:
        close = [f"{origin}:{c}" for c in close]
        if not close:  # the name is in another place: say which
            close = [e.label for e in all_entries if e.name.lower() == stem.lower()][:3]
    where = f"in the {origin} library" if origin else "in the shop, user or bundled library"
    hint = (f"; did you mean {', '.join(repr(c) for c in close[:3])}?" if close
            else "; list them with: shopbeam library list")
    raise InputError(f"no job named '{bare}' {where}{hint}")


def _looks_like_path(text: str) -> bool:
    """A path, not a library name: ends in .toml, or names a folder (/, \\, ~, ./, ../)."""
    t = text.strip()
    return (t.lower().endswith(storage.SUFFIX) or "/" in t or "\\" in t or t.startswith("~")
            or t.startswith("."))


def resolve_job(job, library_dir=None) -> Path:
    """The file for a job named on the command line: one rule for every command.

    A path to an existing file is that file. ``bundled:NAME``, ``shop:NAME`` and
    ``user:NAME`` pick a library place; a bare name (no folder, no ``.toml``) is looked up
    shop -> user -> bundled, and refused when ``./NAME.toml`` is here too. A path that does not exist, or a name not in the library, is an
    InputError with "did you mean" near names (files in that folder, or library names).
    """
    text = str(job)
    origin, _ = _split_label(text.strip())
    p = Path(text).expanduser()
    if origin is None:
        if p.is_file():
            return p
        if p.exists():
            storage.read_bytes(p)  # says what it is: a folder, a FIFO, a device
            raise InputError("this is not a job file", file=text)
        if _looks_like_path(text):
            folder = p.parent if str(p.parent) else Path(".")
            try:
                files = sorted(x.name for x in folder.iterdir() if x.suffix == storage.SUFFIX)
            except OSError:
                files = []
            near = [n if str(p.parent) in ("", ".") else str(folder / n)
                    for n in _near(p.name, files, 0.75)]
            if not near and str(p.parent) in ("", ".") and p.stem:
                try:
                    names = sorted({e.name for e in entries(library_dir)})
                    near = [f"{n} (library name)" for n in _near(p.stem, names, cutoff=0.65)]
                except (InputError, OSError):
                    near = []
            _missing(text, near)
        return _bare_name(text, library_dir)
    return find(text, library_dir).path


def _bare_name(text: str, library_dir=None) -> Path:
    """A bare NAME is a library name (shop -> user -> bundled); when ./NAME.toml is also in
    this folder it is refused, naming both, so `shopbeam rating jib-arm` never checks the
    bundled preset while the shop meant the file beside it."""
    here = Path(text.strip() + storage.SUFFIX)
    local = here if here.is_file() else None
    try:
        entry = find(text, library_dir)
    except InputError as e:
        if local is None:
            raise
        raise InputError(f"{e.problem.message.split(';')[0]}; the file in this folder is "
                         f"./{local.name}: write ./{local.name} (a bare name is a library "
                         "name)", file=text) from None
    if local is not None and local.resolve() != entry.path.resolve():
        raise InputError(f"'{text}' is both the file ./{local.name} in this folder and the "
                         f"library job {entry.label}: write ./{local.name} for the file or "
                         f"{entry.label} for the library job", file=text)
    return entry.path


def _missing(text: str, near: list[str]):
    hint = (f"; did you mean {', '.join(repr(n) for n in near)}?" if near
            else "; check the name and folder, or give a library name (shopbeam library list)")
    raise InputError("no such job file" + hint, file=text)


# --------------------------------------------------------------------------- writing

def copy(name: str, to: str = "user", library_dir=None, new_name: str | None = None, *,
         overwrite: bool = False) -> Path:
    """Copy a job (text exactly as it is, comments and all) into the user or shop library.

    Refuses (storage.NameTaken) when the target name exists, unless `overwrite`.
    """
    src = find(name, library_dir)
    dest = place(to, library_dir)
    if src.problem:
        raise InputError(f"cannot copy '{src.label}': {src.problem}", file=str(src.path))
    target = storage.path_in(dest.folder, safe_library_name(new_name or src.name, key="--as"),
                             key="--as")
    if target.resolve() == src.path.resolve():
        raise InputError(f"'{src.label}' is already in the {to} library; give --as NEWNAME "
                         "to make a second copy", key="--as")
    dest.folder.mkdir(parents=True, exist_ok=True)
    text = storage.open_text(src.path).text
    storage.save_text(target, text, None, overwrite=overwrite)
    return target


def save_job(text: str, *, name: str | None = None, to: str = "user", path=None,
             library_dir=None, base: storage.Opened | None = None,
             overwrite: bool = False) -> storage.Opened:
    """Save job text; return the new `storage.Opened` (keep it as the base for the next save).

    - `path` given: save to that file (base = what was read from it, for the conflict
      check). A path inside the bundled presets is read-only: the job is saved as a copy of
      the same name in the user library instead (refused if that name is taken there).
    - else `name` in the `to` library ("user" or "shop"); a new file, refused if the name
      is taken, unless `overwrite`.
    Conflicts raise `storage.SaveConflict` / `storage.NameTaken` with a diff of the file on
    disk: offer "save as new name" or "overwrite after seeing the changes".
    """
    if path is not None and is_bundled(path):
        to, name, path, base = "user", Path(path).stem, None, None
    if path is not None:
        target = Path(path)
    else:
        if not name:
            raise InputError("give a name to save the job as", key="name")
        dest = place(to, library_dir)
        target = storage.path_in(dest.folder, name)
        dest.folder.mkdir(parents=True, exist_ok=True)
    if base is not None and Path(base.path).resolve() != target.resolve():
        base = None  # saving to another file: it is a new file there
    return storage.save_text(target, text, base, overwrite=overwrite)


def save_entry_copy(entry: Entry, text: str, library_dir=None, new_name: str | None = None,
                    overwrite: bool = False) -> storage.Opened:
    """'Save' on a bundled preset: a copy to the user library."""
    return save_job(text, name=new_name or entry.name, to="user", library_dir=library_dir,
                    overwrite=overwrite)
