"""The preset library: the shop's, the user's and the bundled job files, in that order.

Three places, searched in this order and always shown with their origin:

- shop: a folder several people share (``--library DIR`` or ``SHOPBEAM_LIBRARY``);
- user: the user's own jobs (platformdirs user data dir ``shopbeam/jobs``; the
  ``SHOPBEAM_USER_DIR`` environment variable names another folder, for tests);
- bundled: the presets that ship with shopbeam (read-only: saving one saves a copy to user).

An entry is a job file by its name (the file name without ``.toml``). Reading an entry for
the list uses only `tomllib` (data, never code); a file that does not parse is still listed,
with its problem. Writes go through `shopbeam.jobs.storage` (atomic, locked, conflict-checked).
This module also holds the command-line handlers for ``library``, ``new`` and ``check``.
"""

from __future__ import annotations

import difflib
import os
import sys
import tomllib
from dataclasses import dataclass, field
from pathlib import Path

from shopbeam.jobs import storage
from shopbeam.errors import InputError, InputErrors

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

    @property
    def label(self) -> str:
        return f"{self.origin}:{self.name}"

    @property
    def read_only(self) -> bool:
        return self.origin == "bundled"


def _read_entry(path: Path, origin: str) -> Entry:
    try:
        text = path.read_text(encoding="utf-8")
    except (OSError, UnicodeDecodeError) as exc:
        return Entry(path.stem, "(unreadable)", (), origin, path, problem=str(exc))
    try:
        data = tomllib.loads(text)
    except tomllib.TOMLDecodeError as exc:
        return Entry(path.stem, "(not valid TOML)", (), origin, path, problem=str(exc),
                     text=text)
    title = data.get("title")
    tags = data.get("tags")
    tags = tuple(str(t) for t in tags) if isinstance(tags, list) else ()
    notes = data.get("notes") if isinstance(data.get("notes"), str) else ""
    return Entry(path.stem, str(title) if title is not None else "(no title)", tags, origin,
                 path, notes=notes, text=text)


def _files(folder: Path) -> list[Path]:
    try:
        files = [p for p in folder.iterdir()
                 if p.suffix == storage.SUFFIX and not p.name.startswith(".") and p.is_file()]
    except (FileNotFoundError, NotADirectoryError):
        return []
    except PermissionError:
        return []
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
        for path in _files(pl.folder):
            e = _read_entry(path, pl.origin)
            key = e.name.lower()
            if key in seen:
                e = _replace(e, shadowed_by=seen[key])
            else:
                seen[key] = pl.origin
            out.append(e)
    if tag:
        t = tag.strip().lower()
        out = [e for e in out if t in (x.lower() for x in e.tags)]
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
    shop -> user -> bundled. A path that does not exist, or a name not in the library, is an
    InputError with "did you mean" near names (files in that folder, or library names).
    """
    text = str(job)
    origin, _ = _split_label(text.strip())
    p = Path(text).expanduser()
    if origin is None:
        if p.is_file():
            return p
        if p.exists():
            raise InputError("this is a folder, not a job file", file=text)
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
                    near = [f"{n} (library name)" for n in _near(p.stem, names)]
                except (InputError, OSError):
                    near = []
            _missing(text, near)
    return find(text, library_dir).path


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


# --------------------------------------------------------------------------- command line

def _err(msg) -> None:
    print(msg, file=sys.stderr)


def _run(fn, args) -> int:
    try:
        return fn(args)
    except InputErrors as exc:
        _err(str(exc))
        return 2
    except InputError as exc:
        _err(f"shopbeam: {exc}")
        return 2
    except storage.SaveConflict as exc:
        _err(f"shopbeam: {exc.message()}")
        if exc.diff and exc.reason != "exists":
            _err(exc.diff.rstrip("\n"))
        _err("Nothing was written. Choose another name (library copy: --as NEWNAME), or "
             "add --overwrite to replace it.")
        return 2
    except BrokenPipeError:
        raise
    except OSError as exc:
        where = f"{exc.filename}: " if exc.filename else ""
        _err(f"shopbeam: {where}{exc.strerror or exc}")
        return 2


def _banner(tags=()) -> str:
    from shopbeam import cautions

    return cautions.banner(tags)


def _table(rows: list[list[str]], headers: list[str]) -> str:
    widths = [max(len(r[i]) for r in rows + [headers]) for i in range(len(headers))]
    lines = ["  ".join(h.ljust(w) for h, w in zip(headers, widths)).rstrip()]
    lines.append("  ".join("-" * w for w in widths))
    lines += ["  ".join(c.ljust(w) for c, w in zip(r, widths)).rstrip() for r in rows]
    return "\n".join(lines)


def _library_list(args) -> int:
    found = entries(getattr(args, "library", None), tag=args.tag, search=args.search)
    pls = places(getattr(args, "library", None))
    for pl in pls:
        state = "" if pl.folder.is_dir() else " (empty: not created yet)"
        ro = " (read-only)" if not pl.writable else ""
        print(f"{pl.origin:8} {pl.folder}{ro}{state}")
    print()
    if not found:
        what = " and ".join(x for x in (f"tag '{args.tag}'" if args.tag else "",
                                        f"text '{args.search}'" if args.search else "") if x)
        print(f"No jobs found{' with ' + what if what else ''}.")
    else:
        rows = []
        for e in found:
            title = e.title + (f"  [hidden by {e.shadowed_by}]" if e.shadowed_by else "")
            title += f"  [problem: {e.problem.splitlines()[0]}]" if e.problem else ""
            rows.append([e.name, e.origin, ",".join(e.tags), title])
        print(_table(rows, ["NAME", "ORIGIN", "TAGS", "TITLE"]))
    print()
    print(_banner(tuple(t for e in found for t in e.tags)))
    return 0


def _library_show(args) -> int:
    e = find(args.name, getattr(args, "library", None))
    print(f"# {e.label}  ({e.path}){'  read-only' if e.read_only else ''}")
    if e.shadowed_by:
        print(f"# note: hidden by a job of the same name in the {e.shadowed_by} library")
    text = e.text or storage.open_text(e.path).text
    print(text.rstrip("\n"))
    print()
    print(f"# {_banner(e.tags)}")
    return 0


def _library_copy(args) -> int:
    target = copy(args.name, to=args.to, library_dir=getattr(args, "library", None),
                  new_name=args.as_name, overwrite=args.overwrite)
    print(f"Copied to {target}")
    return 0


def cmd_library(args) -> int:
    """`shopbeam library list|show|copy ...`."""
    action = getattr(args, "library_cmd", None)
    from shopbeam.cli.proof import cmd_library_check  # noqa: PLC0415 - temporary until cli/ owns it

    handlers = {"list": _library_list, "show": _library_show, "copy": _library_copy,
                "check": cmd_library_check}
    if action not in handlers:
        _err("shopbeam library: say what to do: list, show NAME or copy NAME "
             "(see shopbeam library --help)")
        return 2
    return _run(handlers[action], args)


def _new(args) -> int:
    from shopbeam.jobs.jobdoc import new_job_text

    lib = getattr(args, "library", None)
    name = args.name
    to = args.to
    stem = None
    if to is not None and to not in ("user", "shop"):
        if not to.lower().endswith(storage.SUFFIX):
            raise InputError(f"--to {to!r}: give user, shop or a file path ending in .toml",
                             key="--to")
        safe_library_name(name)
        target = Path(to)
    elif to is None and name.lower().endswith(storage.SUFFIX):
        target = Path(name)  # a file the user names on their own disk: `shopbeam new arm.toml`
    else:
        dest = place(to or "user", lib)
        stem = safe_library_name(name)
        target = storage.path_in(dest.folder, stem)
        dest.folder.mkdir(parents=True, exist_ok=True)
    if not target.parent.is_dir():
        raise InputError(f"the folder {target.parent} does not exist", key="--to")
    title = args.title or storage.suggest_name(Path(name).stem).replace("-", " ").capitalize()
    tags = [t.strip() for t in (args.tags or "").split(",") if t.strip()]
    storage.save_text(target, new_job_text(title, tags=tags), None, overwrite=args.overwrite)
    print(f"Wrote {target}")
    if stem is not None:
        made = f" (made safe from {name.strip()!r})" if stem != name.strip() else ""
        print(f"Library name: {stem}{made}")
        print(f"Edit it, then: shopbeam check {stem}   and   shopbeam solve {stem}")
    else:
        import shlex

        print(f"Edit it, then: shopbeam check {shlex.quote(str(target))}   and   "
              f"shopbeam solve {shlex.quote(str(target))}")
    return 0


def cmd_new(args) -> int:
    """`shopbeam new NAME [--to user|shop|PATH.toml]`: a commented template job."""
    return _run(_new, args)


def _check(args) -> int:
    from shopbeam.jobs.jobfile import load_job

    path = resolve_job(args.job, getattr(args, "library", None))
    job = load_job(path)
    warnings = list(getattr(job, "warnings", None) or ())
    for w in warnings:
        print(w.located() if hasattr(w, "located") else str(w))
    n = len(warnings)
    print(f"OK: {path}" + (f" ({n} warning{'s' if n != 1 else ''})" if n else ""))
    print(_banner(getattr(job, "tags", ()) or ()))
    return 0


def cmd_check(args) -> int:
    """`shopbeam check JOB`: validate only; every problem with its key and line; exit 2."""
    return _run(_check, args)


def add_parsers(subparsers) -> None:
    """Register `library` and `new` (and `check`, unless the caller registered it)."""
    import argparse

    def command(sub, name, summary, description, examples):
        import textwrap

        return sub.add_parser(name, help=summary, description=textwrap.fill(description, 78),
                              epilog="examples:\n" + "\n".join(f"  {e}" for e in examples),
                              formatter_class=argparse.RawDescriptionHelpFormatter)

    def lib_opt(p):
        p.add_argument("--library", metavar="DIR", default=argparse.SUPPRESS,
                       help=f"the shop library folder (default: ${ENV_SHOP})")

    lib = command(subparsers, "library", "list, show, copy and re-check saved and bundled jobs",
                  "Jobs in the shop library (--library DIR or $SHOPBEAM_LIBRARY), your own "
                  f"library (${ENV_USER} or the platform's user data folder) and the bundled "
                  "presets, searched in that order. Name one as shop:NAME, user:NAME, "
                  "bundled:NAME or a bare NAME (the first found).",
                  ["shopbeam library list --tag rack", "shopbeam library show bundled:jib-arm",
                   "shopbeam library copy bundled:pallet-rack-beam-pair --as bay-a-level-2",
                   "shopbeam library check --from shop --csv > recheck.csv"])
    lib_opt(lib)
    lsub = lib.add_subparsers(dest="library_cmd", metavar="{list,show,copy,check}")
    p = command(lsub, "list", "list jobs with their origin",
                "Every job of the three libraries with its origin, tags and title; a job "
                "hidden by one of the same name found earlier is marked.",
                ["shopbeam library list", "shopbeam library list --tag lifting",
                 "shopbeam library list --search \"pallet 96\""])
    lib_opt(p)
    p.add_argument("--tag", help="only jobs with this tag, e.g. rack or lifting")
    p.add_argument("--search", metavar="TEXT", help="only jobs whose title, tags or text "
                                                    "contain every word of TEXT")
    p = command(lsub, "show", "print a job file",
                "Print a job file exactly as it is saved, with where it is.",
                ["shopbeam library show demo", "shopbeam library show user:bay-3-arm"])
    lib_opt(p)
    p.add_argument("name", help="job name (user:NAME, shop:NAME or bundled:NAME to pick one)")
    p = command(lsub, "copy", "copy a job into your library or the shop library",
                "Copy a job's file, comments and all, into your user library or the shop "
                "library. An existing job of that name is never replaced without --overwrite.",
                ["shopbeam library copy bundled:jib-arm",
                 "shopbeam library copy demo --as loft-beam --to shop --library /srv/shopbeam"])
    lib_opt(p)
    p.add_argument("name", help="the job to copy (user:NAME, shop:NAME, bundled:NAME or NAME)")
    p.add_argument("--to", choices=("user", "shop"), default="user",
                   help="the library to copy into (default user)")
    p.add_argument("--as", dest="as_name", metavar="NEWNAME", help="name of the copy")
    p.add_argument("--overwrite", action="store_true",
                   help="replace a job of that name that already exists there")
    p = command(lsub, "check", "re-check every job of a library: one line per job",
                "Read, solve, check and rate every job again and print one line per job: "
                "title, governing check, ratio, PASS/FAIL and the rated load (or why it could "
                "not be checked). What to run after a change of code, stock or presets.",
                ["shopbeam library check", "shopbeam library check --from bundled",
                 "shopbeam library check --from shop --library /srv/shopbeam --csv > jobs.csv"])
    lib_opt(p)
    p.add_argument("--from", dest="origin", choices=ORIGINS, default=None,
                   help="only this library (default: all three, each name once)")
    p.add_argument("--csv", action="store_true", help="print CSV for a spreadsheet")
    lib.set_defaults(func=cmd_library)

    new = command(subparsers, "new", "start a job file from a commented template",
                  "Write a commented template job to fill in. A name goes to your user "
                  "library (or --to shop); spaces and odd characters are made safe "
                  "(\"bay 4 arm\" -> bay-4-arm) and the file written is named. A name ending "
                  "in .toml is a file in the current folder.",
                  ["shopbeam new \"bay 4 arm\" --tags rack,arm",
                   "shopbeam new shelf-2 --to shop --library /srv/shopbeam",
                   "shopbeam new arm.toml --title \"Bay 3 arm\""])
    lib_opt(new)
    new.add_argument("name", help="a library name, or a path ending in .toml")
    new.add_argument("--to", metavar="user|shop|PATH.toml", default=None,
                     help="where to write it (default: your user library)")
    new.add_argument("--title", help="the job's title (default: from the name)")
    new.add_argument("--tags", help="comma-separated tags, e.g. rack,shelf")
    new.add_argument("--overwrite", action="store_true",
                     help="replace an existing file of that name")
    new.set_defaults(func=cmd_new)

    if "check" not in getattr(subparsers, "choices", {}):
        chk = subparsers.add_parser("check", help="validate a job file without solving it")
        lib_opt(chk)
        chk.add_argument("job", help="a job file or a library name")
        chk.set_defaults(func=cmd_check)
